//go:build !unix

package costing

import "time"

// cpuTime is not measured on this platform; the benchmarks report 0.
func cpuTime() time.Duration { return 0 }
