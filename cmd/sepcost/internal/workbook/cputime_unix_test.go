//go:build unix

package workbook

import (
	"syscall"
	"time"
)

// cpuTime is the processor time the process has used, user and system,
// in all its threads (the garbage collector's too): a benchmark measure
// that other programs on the machine disturb less than the clock.
func cpuTime() time.Duration {
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err != nil {
		return 0
	}
	return time.Duration(ru.Utime.Nano() + ru.Stime.Nano())
}
