package main

import (
	"runtime/debug"
	"testing"

	"sepcost/scale"
)

// A run longer than a report holds in full gets the soft heap limit for
// its duration and gives the old one back; a shorter run, or one under a
// user's GOMEMLIMIT, keeps the runtime's. (Changes process state: not
// parallel.)
func TestBoundMemory(t *testing.T) {
	before := debug.SetMemoryLimit(-1) // -1 reads the limit
	if r := boundMemory(scale.HeldMasses); debug.SetMemoryLimit(-1) != before {
		t.Errorf("a run of %d masses changed the heap limit", scale.HeldMasses)
		r()
	} else {
		r()
	}
	restore := boundMemory(scale.HeldMasses + 1)
	if got := debug.SetMemoryLimit(-1); got != longRunHeap {
		t.Errorf("heap limit %d during a long run, want %d", got, longRunHeap)
	}
	restore()
	if got := debug.SetMemoryLimit(-1); got != before {
		t.Errorf("heap limit %d after the run, want %d back", got, before)
	}
	t.Setenv("GOMEMLIMIT", "1GiB")
	restore = boundMemory(scale.HeldMasses + 1)
	if got := debug.SetMemoryLimit(-1); got != before {
		t.Errorf("heap limit %d under the user's GOMEMLIMIT, want it left at %d", got, before)
	}
	restore()
}
