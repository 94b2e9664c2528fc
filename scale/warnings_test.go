package scale

import (
	"bytes"
	"strings"
	"testing"

	"sepcost/costing/usage"
	"sepcost/templates"
)

// Impractical plans are warnings and reach the report: in the solid demo
// the crystallization's screening (2 g of crude, templates/scenario.yaml)
// is more than a 500 mg batch, and at 5 kg chromatography on a site whose
// largest column is 300 mm (column_diameters; the built-in equipment table
// has process columns) needs dozens of runs (a 300 mm column with a 20 cm
// bed holds about 7 kg of silica, 50–110 g of crude at the loadings tried:
// 45–95 runs; usage.ManyRepeats is 10). The same
// warning at several masses, with other figures, is listed once with all
// its masses.
func TestImpracticalPlansWarn(t *testing.T) {
	t.Parallel()
	y := bytes.Replace(templates.Scenario, []byte("  loading_rule: theory\n"), []byte("  loading_rule: theory\n  column_diameters: [\"100 mm\", \"200 mm\", \"300 mm\"]\n"), 1)
	p, pt := plan(t, y)
	r, err := EstimateWith(p, pt, []float64{0.0005, 0.001, 5}, Options{})
	if err != nil {
		t.Fatal(err)
	}
	var screening, runs *Warning
	for k := range r.Warnings {
		w := &r.Warnings[k]
		if w.Level != usage.Warning && w.Level != usage.Caution {
			t.Errorf("collected a %s note: %q", w.Level, w.Text)
		}
		switch {
		case w.Method == "crystallization" && strings.Contains(w.Text, "Screening uses"):
			screening = w
		case w.Method == "chromatography" && strings.Contains(w.Text, "impractical"):
			runs = w
		}
	}
	if screening == nil || len(screening.MassesKg) != 2 || screening.MassesKg[0] != 0.0005 {
		t.Errorf("screening larger than the batch: %+v, want one warning at 500 mg and 1 g", screening)
	}
	if runs == nil || len(runs.MassesKg) != 1 || runs.MassesKg[0] != 5 {
		t.Errorf("dozens of column runs at 5 kg: %+v, want a warning at 5 kg", runs)
	}
	// Every warning of every result is in the list.
	for i := range r.MassesKg {
		for j := range r.Methods {
			for _, n := range r.Results[i][j].Usage.Notes {
				if n.Level == usage.Info {
					continue
				}
				found := false
				for _, w := range r.Warnings {
					if w.Method == r.Methods[j] && figures.ReplaceAllString(w.Text, "#") == figures.ReplaceAllString(n.Text, "#") {
						found = true
					}
				}
				if !found {
					t.Errorf("%s at %g kg: %q not collected", r.Methods[j], r.MassesKg[i], n.Text)
				}
			}
		}
	}
}
