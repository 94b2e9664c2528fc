package workbook

import (
	"archive/zip"
	"bytes"
	"errors"
	"io"
	"testing"
)

// packageParts reads a zip package into its parts by name.
func packageParts(t *testing.T, data []byte) map[string][]byte {
	t.Helper()
	zr, err := zip.NewReader(bytes.NewReader(data), int64(len(data)))
	if err != nil {
		t.Fatalf("not a zip package: %v", err)
	}
	out := map[string][]byte{}
	for _, f := range zr.File {
		rc, err := f.Open()
		if err != nil {
			t.Fatal(err)
		}
		b, err := io.ReadAll(rc)
		rc.Close()
		if err != nil {
			t.Fatalf("part %s: %v", f.Name, err)
		}
		out[f.Name] = b
	}
	return out
}

// The package streamed through excelize's zip writer hook (writePackage)
// holds the same parts, byte for byte, as excelize's own buffered
// File.WriteToBuffer gives for the same workbook, and reads back as a
// valid zip (every part's checksum is checked on reading).
func TestStreamedPackageIsTheBufferedOne(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		name string
		opt  Options
	}{{"cached values", Options{}}, {"without cached values", Options{OmitCachedValues: true}}} {
		r := demoReport(t)
		f, _, err := build(r, c.opt, false)
		if err != nil {
			t.Fatal(err)
		}
		buffered, err := f.WriteToBuffer()
		if err != nil {
			t.Fatal(err)
		}
		var streamed bytes.Buffer
		if err := writePackage(f, &streamed); err != nil {
			t.Fatal(err)
		}
		f.Close()
		want, got := packageParts(t, buffered.Bytes()), packageParts(t, streamed.Bytes())
		if len(got) != len(want) {
			t.Errorf("%s: %d parts streamed, %d buffered", c.name, len(got), len(want))
		}
		for name, w := range want {
			if g, ok := got[name]; !ok {
				t.Errorf("%s: part %s missing from the streamed package", c.name, name)
			} else if !bytes.Equal(g, w) {
				t.Errorf("%s: part %s differs between the streamed and the buffered package", c.name, name)
			}
		}
	}
}

// failAfter accepts n bytes, then fails every write.
type failAfter struct{ n int }

var errDiskFull = errors.New("disk full")

func (w *failAfter) Write(p []byte) (int, error) {
	if len(p) > w.n {
		k := w.n
		w.n = 0
		return k, errDiskFull
	}
	w.n -= len(p)
	return len(p), nil
}

// A destination that fails part way (a full disk) makes Write fail with
// its error, wherever in the package the failure falls.
func TestWriteReportsAFailedDestination(t *testing.T) {
	t.Parallel()
	r := demoReport(t)
	for _, n := range []int{0, 100, 5000, 60000} {
		err := Write(&failAfter{n: n}, r, Options{})
		if !errors.Is(err, errDiskFull) {
			t.Errorf("destination failing after %d bytes: Write returned %v, want the destination's error", n, err)
		}
	}
}
