package main

import (
	"io"
	"os"

	"github.com/schollz/progressbar/v3"
	"golang.org/x/term"
)

// progressFrom is the smallest number of draws worth a progress display.
const progressFrom = 1000

// newProgress returns a callback for the Monte Carlo draws: a bar on
// stderr when stderr is a terminal; nil (nothing written) when it is not —
// a log file or a pipe gets no progress lines — or for small runs.
func newProgress(stderr io.Writer, total int) func(done int) {
	if total < progressFrom {
		return nil
	}
	f, ok := stderr.(*os.File)
	if !ok || !term.IsTerminal(int(f.Fd())) {
		return nil
	}
	bar := progressbar.NewOptions(total, progressbar.OptionSetWriter(stderr), progressbar.OptionSetDescription("uncertainty draws"),
		progressbar.OptionClearOnFinish(), progressbar.OptionThrottle(100_000_000))
	return func(done int) { _ = bar.Set(done) }
}
