// Command sepcost costs the purification of a compound by flash column
// chromatography and its alternatives across batch masses, and writes the
// plan as a workbook, JSON, CSV or a terminal summary.
package main

import (
	"context"
	"fmt"
	"os"
)

func main() {
	err := run(context.Background(), os.Args[1:], os.Stdout, os.Stderr)
	if err != nil {
		fmt.Fprintln(os.Stderr, "sepcost:", err)
	}
	os.Exit(exitCode(err))
}
