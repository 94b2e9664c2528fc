package plain

import (
	"bytes"
	"encoding/json"
	"strconv"
	"testing"

	"sepcost/scale"
	"sepcost/templates"
)

// The JSON carries the Monte Carlo result as the report holds it: the
// value of perfect information as a fixed-decimal string in the currency's
// minor units (two for EUR, ISO 4217), a band per method and mass, every
// input drawn; a quantile that is not a number is null, not an error.
func TestJSONUncertainty(t *testing.T) {
	t.Parallel()
	p, pt := demoPlan(t, templates.Scenario)
	masses, _ := scale.LogSpace(1e-3, 5, 9)
	r, err := scale.SweepWith(p, pt, masses, scale.Options{Draws: 200, Seed: 3, TargetKg: 0.02})
	if err != nil {
		t.Fatal(err)
	}
	var b bytes.Buffer
	if err := JSON(&b, r); err != nil {
		t.Fatal(err)
	}
	var got struct {
		Uncertainty struct {
			Draws  int    `json:"draws"`
			EVPI   string `json:"value_of_perfect_information"`
			Across []struct {
				CrudeKg float64 `json:"crude_kg"`
				Methods []struct {
					P50 *float64 `json:"p50_cost_per_g"`
				} `json:"methods"`
			} `json:"across_masses"`
			Inputs []struct {
				Field string `json:"input"`
			} `json:"inputs"`
		} `json:"uncertainty"`
	}
	if err := json.Unmarshal(b.Bytes(), &got); err != nil {
		t.Fatal(err)
	}
	u := got.Uncertainty
	if u.Draws != 200 || u.EVPI != strconv.FormatFloat(r.Uncertainty.EVPI, 'f', 2, 64) {
		t.Errorf("draws %d, EVPI %q (report %g)", u.Draws, u.EVPI, r.Uncertainty.EVPI)
	}
	if len(u.Across) != len(masses) || len(u.Inputs) != len(r.Uncertainty.Inputs) {
		t.Fatalf("%d masses, %d inputs", len(u.Across), len(u.Inputs))
	}
	// Distillation is not assessed in the solid demo: its quantiles are null.
	for _, m := range u.Across {
		if len(m.Methods) != 3 || m.Methods[2].P50 != nil || m.Methods[0].P50 == nil {
			t.Errorf("%g kg: %+v", m.CrudeKg, m.Methods)
		}
	}
}
