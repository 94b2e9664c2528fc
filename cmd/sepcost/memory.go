package main

import (
	"os"
	"runtime/debug"

	"sepcost/scale"
)

// longRunHeap is the soft limit on the Go heap (runtime/debug.SetMemoryLimit)
// for a run of more masses than a report holds in full (scale.HeldMasses):
// such a report keeps compact rows whose live heap stays well under it
// (BenchmarkSweepMemory: about 60 MB at the largest sweep, 10,000
// masses), so the limit only makes the collector return garbage sooner,
// keeping the process's peak resident memory near 110 MB rather than
// 150 to 160 MB, at no measured cost in time. 100 MiB (common practice,
// no source: the heap a long sweep needs, with room).
const longRunHeap = 100 << 20

// boundMemory sets longRunHeap for a run of n masses longer than a report
// holds in full, unless the user set GOMEMLIMIT (which the runtime then
// follows), and returns the function that restores the limit before.
func boundMemory(n int) (restore func()) {
	if n <= scale.HeldMasses || os.Getenv("GOMEMLIMIT") != "" {
		return func() {}
	}
	old := debug.SetMemoryLimit(longRunHeap)
	return func() { debug.SetMemoryLimit(old) }
}
