package parallel

import (
	"runtime"
	"sync/atomic"
	"testing"
)

// Every job runs exactly once, each in its own slot, and For returns only
// when all have: the sum of 1 … n (Gauss's closed form n(n+1)/2) and a
// call count of n, with one core and with four.
func TestForRunsEveryJobOnce(t *testing.T) {
	for _, procs := range []int{1, 4} {
		old := runtime.GOMAXPROCS(procs)
		const n = 1000
		slots := make([]int, n)
		var calls atomic.Int64
		For(n, func(k int) {
			calls.Add(1)
			slots[k] += k + 1
		})
		runtime.GOMAXPROCS(old)
		sum := 0
		for _, v := range slots {
			sum += v
		}
		if calls.Load() != n || sum != n*(n+1)/2 {
			t.Errorf("GOMAXPROCS %d: %d calls, sum %d; want %d and %d", procs, calls.Load(), sum, n, n*(n+1)/2)
		}
	}
	For(0, func(int) { t.Error("a job ran for n = 0") })
}
