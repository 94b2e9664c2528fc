package workbook

import (
	"bytes"
	"io"
	"testing"

	"sepcost/costing/costingtest"
	"sepcost/scale"
	"sepcost/templates"
)

// The workbook and the waste workbook have the same cells, styles, pages
// and charts (dumpWorkbook) whether the report holds every result or holds
// rows and recomputes the results (scale.Options.Hold): a sweep of 300
// masses (three chunks of recomputation) and an estimate at three masses
// (detail sheets).
func TestWorkbookSameFromHeldAndRecomputed(t *testing.T) {
	t.Parallel()
	p, pt := costingtest.Plan(t, templates.Scenario, "scenario.yaml")
	masses, err := scale.LogSpace(1e-4, 10, 300)
	if err != nil {
		t.Fatal(err)
	}
	writers := map[string]func(io.Writer, *scale.Report) error{
		"workbook": func(w io.Writer, r *scale.Report) error { return Write(w, r, Options{}) },
		"waste":    WriteWaste,
	}
	for _, c := range []struct {
		name   string
		masses []float64
		sweep  bool
	}{{"sweep", masses, true}, {"estimate", []float64{0.002, 0.05, 1}, false}} {
		var dumps [2]map[string]string
		for k, hold := range []int{len(c.masses), 1} {
			opt := scale.Options{Hold: hold, Seed: 1, Draws: 20}
			var r *scale.Report
			if c.sweep {
				r, err = scale.SweepWith(p, pt, c.masses, opt)
			} else {
				r, err = scale.EstimateWith(p, pt, c.masses, opt)
			}
			if err != nil {
				t.Fatal(err)
			}
			if (r.Results != nil) != (k == 0) {
				t.Fatalf("%s: report %d holds %d results", c.name, k, len(r.Results))
			}
			dumps[k] = map[string]string{}
			for name, write := range writers {
				var buf bytes.Buffer
				if err := write(&buf, r); err != nil {
					t.Fatalf("%s %s, hold %d: %v", c.name, name, hold, err)
				}
				if dumps[k][name], err = dumpWorkbook(bytes.NewReader(buf.Bytes()), int64(buf.Len())); err != nil {
					t.Fatal(err)
				}
			}
		}
		for name := range writers {
			if a, b := dumps[0][name], dumps[1][name]; a != b || a == "" {
				t.Errorf("%s %s: the workbook from recomputed results differs from the held (%d and %d characters of dump)", c.name, name, len(a), len(b))
			}
		}
	}
}
