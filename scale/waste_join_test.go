package scale

import (
	"strings"
	"testing"

	"sepcost/templates"
)

// Every waste row carries the disposal its ledger bills for that stream,
// and the rows of a result add up to the ledger's disposal subtotal (the
// identity of the ledger: each stream is billed once). Checked on the demo
// with the mixed fractions run again, whose second run's streams are
// billed too.
func TestWasteRowsCarryTheirDisposal(t *testing.T) {
	t.Parallel()
	y := strings.Replace(string(templates.Scenario), "mixed_fractions: set aside", "mixed_fractions: rerun", 1)
	p, pt := plan(t, []byte(y))
	r, err := Estimate(p, pt, []float64{0.0025, 0.2})
	if err != nil {
		t.Fatal(err)
	}
	rerun := 0
	for i := range r.MassesKg {
		for j := range r.Methods {
			res := r.Results[i][j]
			if !res.Usage.Feasible {
				continue
			}
			sum := res.Ledger.Subtotal("disposal")
			for _, w := range r.Waste {
				if w.Mass != i || w.Col != j {
					continue
				}
				if w.Kg > 0 && !w.HasDisposal {
					t.Errorf("%s at %g kg: stream %q has no disposal line", r.Methods[j], r.MassesKg[i], w.Stream.Name)
				}
				if strings.HasPrefix(w.Stream.Name, "re-run: ") && w.HasDisposal {
					rerun++
				}
				sum = sum.Sub(w.Disposal)
			}
			if !sum.IsZero() {
				t.Errorf("%s at %g kg: waste rows differ from the disposal subtotal by %s", r.Methods[j], r.MassesKg[i], sum)
			}
		}
	}
	if rerun == 0 {
		t.Error("no re-run stream carried its disposal")
	}
}
