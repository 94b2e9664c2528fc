// Package parallel runs independent jobs on every core.
package parallel

import (
	"runtime"
	"sync"
)

// For calls job(k) for k = 0 … n−1 on runtime.GOMAXPROCS(0) goroutines
// and returns when every call has returned. Jobs must be independent and
// write only their own slot of any shared result (job k to index k), so
// that what they produce is the same on any number of cores.
func For(n int, job func(k int)) {
	jobs := make(chan int)
	var wg sync.WaitGroup
	for w := 0; w < runtime.GOMAXPROCS(0); w++ {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for k := range jobs {
				job(k)
			}
		}()
	}
	for k := 0; k < n; k++ {
		jobs <- k
	}
	close(jobs)
	wg.Wait()
}
