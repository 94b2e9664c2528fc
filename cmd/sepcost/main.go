// Command sepcost costs the purification of a compound by flash column
// chromatography and its alternatives across batch masses, and writes the
// plan as a workbook, JSON, CSV or a terminal summary.
package main

import (
	"context"
	"fmt"
	"os"
	"os/signal"
	"syscall"
)

func main() {
	os.Exit(mainWith(os.Args[1:]))
}

// mainWith runs the command line and returns the exit code. An interrupt
// (SIGINT) or termination (SIGTERM) removes any temporary output file
// before the process ends, with the shell's exit code 128 + signal.
func mainWith(args []string) int {
	sigs := make(chan os.Signal, 1)
	signal.Notify(sigs, os.Interrupt, syscall.SIGTERM)
	go func() {
		s := <-sigs
		removeTemps()
		fmt.Fprintf(os.Stderr, "sepcost: stopped (%v); any unfinished output file was removed\n", s)
		code := 130
		if s == syscall.SIGTERM {
			code = 143
		}
		os.Exit(code)
	}()
	err := run(context.Background(), args, os.Stdout, os.Stderr)
	if err != nil {
		os.Stderr.Write(sanitize([]byte("sepcost: " + err.Error() + "\n")))
	}
	return exitCode(err)
}
