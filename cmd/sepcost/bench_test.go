package main

import (
	"context"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"runtime"
	"runtime/metrics"
	"strconv"
	"strings"
	"testing"
	"time"

	"sepcost/templates"
)

// BenchmarkDemoWorkbook: the whole `sepcost demo` run, from the embedded
// scenario and prices to the workbook on disk.
func BenchmarkDemoWorkbook(b *testing.B) {
	dir := b.TempDir()
	out := filepath.Join(dir, "demo.xlsx")
	b.ReportAllocs()
	for b.Loop() {
		if err := run(context.Background(), []string{"demo", "-o", out, "--force"}, io.Discard, io.Discard); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkSweepMemory: `sepcost sweep` of the demo over 1,000 and 10,000
// masses (default draws) into a file of each format, reporting two
// measures of its peak memory: peak-heap-MB, the largest bytes in heap
// objects (live and not yet collected; runtime/metrics sampled every
// millisecond) while the command runs in this process, what the sweep and
// its writer hold without the runtime's own overhead; and peak-RSS-MB,
// the peak resident set of the same command run alone in a child process
// (its VmHWM, Linux only), runtime, garbage not yet returned to the system
// and the test binary included. Run with -benchtime 1x.
func BenchmarkSweepMemory(b *testing.B) {
	dir := b.TempDir()
	sc, pr := filepath.Join(dir, "scenario.yaml"), filepath.Join(dir, "prices.csv")
	if err := os.WriteFile(sc, templates.Scenario, 0o644); err != nil {
		b.Fatal(err)
	}
	if err := os.WriteFile(pr, templates.Prices, 0o644); err != nil {
		b.Fatal(err)
	}
	for _, n := range []int{1000, 10000} {
		for _, format := range []string{"xlsx", "json", "csv"} {
			b.Run(fmt.Sprintf("%s/masses=%d", format, n), func(b *testing.B) {
				out := filepath.Join(dir, "sweep."+format)
				args := []string{"sweep", sc, "--prices", pr, "--points", strconv.Itoa(n), "-o", out, "--force"}
				peak := 0.0
				for b.Loop() {
					runtime.GC()
					stop := samplePeakHeap()
					if err := run(context.Background(), args, io.Discard, io.Discard); err != nil {
						b.Fatal(err)
					}
					peak = max(peak, stop())
				}
				b.ReportMetric(peak/1e6, "peak-heap-MB")
				b.StopTimer()
				if rss, err := peakRSS(args); err != nil {
					b.Log(err)
				} else {
					b.ReportMetric(rss/1e6, "peak-RSS-MB")
				}
			})
		}
	}
}

// memoryArgsEnv carries the arguments of the command TestMemoryChild
// runs, joined by memoryArgsSep.
const (
	memoryArgsEnv = "SEPCOST_MEMORY_ARGS"
	memoryArgsSep = "\x1f"
)

// TestMemoryChild is the child process of BenchmarkSweepMemory's peak
// resident set (peakRSS): it runs the command its environment names,
// prints its own peak resident set and exits. Without that environment it
// does nothing.
func TestMemoryChild(t *testing.T) {
	args := os.Getenv(memoryArgsEnv)
	if args == "" {
		t.Skip("run by BenchmarkSweepMemory only")
	}
	if err := run(context.Background(), strings.Split(args, memoryArgsSep), io.Discard, io.Discard); err != nil {
		fmt.Println(err)
		os.Exit(1)
	}
	line, err := ownPeakRSS()
	if err != nil {
		fmt.Println(err)
		os.Exit(1)
	}
	fmt.Println(line)
	os.Exit(0)
}

// samplePeakHeap samples the bytes in heap objects every millisecond until
// the returned function is called, which gives the largest seen.
func samplePeakHeap() func() float64 {
	s := []metrics.Sample{{Name: "/memory/classes/heap/objects:bytes"}}
	done, result := make(chan struct{}), make(chan float64)
	go func() {
		peak := 0.0
		t := time.NewTicker(time.Millisecond)
		defer t.Stop()
		for {
			metrics.Read(s)
			peak = max(peak, float64(s[0].Value.Uint64()))
			select {
			case <-done:
				result <- peak
				return
			case <-t.C:
			}
		}
	}()
	return func() float64 {
		close(done)
		return <-result
	}
}
