package main

import (
	"bytes"
	"testing"

	"sepcost/costing/costingtest"
	"sepcost/scale"
	"sepcost/templates"
)

// Every writer writes the same bytes from a report that holds every
// result as from one that holds rows and recomputes the results
// (scale.Options.Hold): a sweep of 300 masses (three chunks of
// recomputation) and an estimate at three masses, each in JSON, CSV and
// text, the waste forecast included.
func TestWritersSameFromHeldAndRecomputed(t *testing.T) {
	t.Parallel()
	p, pt := costingtest.Plan(t, templates.Scenario, "scenario.yaml")
	masses, err := scale.LogSpace(1e-4, 10, 300)
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name   string
		masses []float64
		sweep  bool
	}{{"sweep", masses, true}, {"estimate", []float64{0.002, 0.05, 1}, false}} {
		reports := make([]*scale.Report, 2)
		for k, hold := range []int{len(c.masses), 1} {
			opt := scale.Options{Hold: hold, Seed: 1}
			if c.sweep {
				reports[k], err = scale.SweepWith(p, pt, c.masses, opt)
			} else {
				reports[k], err = scale.EstimateWith(p, pt, c.masses, opt)
			}
			if err != nil {
				t.Fatal(err)
			}
		}
		if reports[0].Results == nil || reports[1].Results != nil {
			t.Fatalf("%s: the first report must hold its results, the second not", c.name)
		}
		for _, kind := range []struct {
			name string
			rs   renderers[*scale.Report]
		}{{"report", reportRenderers}, {"waste", wasteRenderers}} {
			for f := range kind.rs {
				a, err := kind.rs.render(f, reports[0])
				if err != nil {
					t.Fatalf("%s %s %s: %v", c.name, kind.name, f, err)
				}
				b, err := kind.rs.render(f, reports[1])
				if err != nil {
					t.Fatalf("%s %s %s, recomputed: %v", c.name, kind.name, f, err)
				}
				if f == formatXLSX {
					continue // not the same bytes twice (zip times, map order): TestWorkbookSameFromHeldAndRecomputed compares the cells
				}
				if !bytes.Equal(a.Bytes(), b.Bytes()) || a.Len() == 0 {
					t.Errorf("%s %s %s: %d bytes held, %d recomputed, and they differ", c.name, kind.name, f, a.Len(), b.Len())
				}
			}
		}
	}
}
