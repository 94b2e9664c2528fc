package main

import (
	"fmt"
	"io"
	"os"
	"sync"

	"github.com/schollz/progressbar/v3"
	"golang.org/x/term"
)

// progressFrom is the smallest number of draws worth a progress display.
const progressFrom = 1000

// newProgress returns a callback for the Monte Carlo draws: a bar on
// stderr when stderr is a terminal, else a plain line every 10 %; nil for
// small runs.
func newProgress(stderr io.Writer, total int) func(done int) {
	if total < progressFrom {
		return nil
	}
	if f, ok := stderr.(*os.File); ok && term.IsTerminal(int(f.Fd())) {
		bar := progressbar.NewOptions(total, progressbar.OptionSetWriter(stderr), progressbar.OptionSetDescription("uncertainty draws"),
			progressbar.OptionClearOnFinish(), progressbar.OptionThrottle(100_000_000))
		return func(done int) { _ = bar.Set(done) }
	}
	var mu sync.Mutex
	next := 10
	return func(done int) {
		mu.Lock()
		defer mu.Unlock()
		if pct := done * 100 / total; pct >= next {
			fmt.Fprintf(stderr, "uncertainty draws: %d %%\n", pct)
			next = pct/10*10 + 10
		}
	}
}
