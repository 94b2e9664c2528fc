package main

import (
	"bytes"
	"os"
	"testing"
)

// Progress is drawn only on a terminal: a buffer, a pipe or a file gets
// nothing, so logs and captured output stay clean.
func TestProgressOnlyOnATerminal(t *testing.T) {
	var b bytes.Buffer
	if newProgress(&b, 100000) != nil {
		t.Error("progress to a buffer")
	}
	r, w, err := os.Pipe()
	if err != nil {
		t.Fatal(err)
	}
	defer r.Close()
	defer w.Close()
	if newProgress(w, 100000) != nil {
		t.Error("progress to a pipe")
	}
	if newProgress(os.Stderr, 10) != nil {
		t.Error("progress for a short run")
	}
}
