package main

import (
	"context"
	"io"
	"path/filepath"
	"testing"
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
