//go:build unix

package costing

import (
	"syscall"
	"time"
)

// cpuTime is the processor time the process has used, user and system,
// in all its threads: on a shared machine the clock time of a benchmark
// follows the other work, the processor time much less.
func cpuTime() time.Duration {
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err != nil {
		return 0
	}
	return time.Duration(ru.Utime.Nano() + ru.Stime.Nano())
}
