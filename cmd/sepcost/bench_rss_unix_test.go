//go:build unix

package main

import (
	"fmt"
	"os"
	"os/exec"
	"runtime"
	"strings"
	"syscall"
)

// peakRSS runs `sepcost args` in a child process (this test binary,
// running TestMemoryChild) and gives its peak resident set in bytes
// (getrusage's ru_maxrss, in kilobytes on Linux and bytes on macOS): the
// memory of the whole command, the Go runtime and the test binary included.
func peakRSS(args []string) (float64, error) {
	cmd := exec.Command(os.Args[0], "-test.run=^TestMemoryChild$")
	cmd.Env = append(os.Environ(), memoryArgsEnv+"="+strings.Join(args, memoryArgsSep))
	if out, err := cmd.CombinedOutput(); err != nil {
		return 0, fmt.Errorf("child sepcost %s: %v: %s", strings.Join(args, " "), err, out)
	}
	ru, ok := cmd.ProcessState.SysUsage().(*syscall.Rusage)
	if !ok {
		return 0, fmt.Errorf("child sepcost: no resource usage on %s", runtime.GOOS)
	}
	if runtime.GOOS == "darwin" {
		return float64(ru.Maxrss), nil
	}
	return float64(ru.Maxrss) * 1024, nil
}
