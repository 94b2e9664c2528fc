package plain

import (
	"bytes"
	"encoding/json"
	"strings"
	"testing"

	"sepcost/costing"
	"sepcost/costing/costingtest"
	"sepcost/costing/prices"
	"sepcost/costing/usage"
	"sepcost/scale"
	"sepcost/templates"
)

func demoPlan(t *testing.T, yaml []byte) (*costing.Plan, *prices.Table) {
	t.Helper()
	return costingtest.Plan(t, yaml, "demo.yaml")
}

// Every warning reaches the text summary, of an estimate (per mass) and
// of a sweep (collected, once per method and wording), and the JSON; the
// models' notes on what they assumed are printed at the decision's mass.
// The solid demo warns that crystallization screening (2 g of crude) is
// more than a 500 mg batch and that chromatography needs dozens of runs
// at 5 kg (usage.ManyRepeats).
func TestTextAndJSONCarryEveryWarning(t *testing.T) {
	t.Parallel()
	p, pt := demoPlan(t, templates.Scenario)
	est, err := scale.EstimateWith(p, pt, []float64{0.0005, 5}, scale.Options{TargetKg: 5, TargetWhy: "test"})
	if err != nil {
		t.Fatal(err)
	}
	sw, err := scale.SweepWith(p, pt, []float64{0.0005, 0.05, 5}, scale.Options{})
	if err != nil {
		t.Fatal(err)
	}
	for name, r := range map[string]*scale.Report{"estimate": est, "sweep": sw} {
		var txt, js bytes.Buffer
		if err := Text(&txt, r); err != nil {
			t.Fatal(err)
		}
		if err := JSON(&js, r); err != nil {
			t.Fatal(err)
		}
		if len(r.Warnings) < 2 {
			t.Fatalf("%s: %d warnings, want at least the screening and the column runs", name, len(r.Warnings))
		}
		var got struct {
			Warnings []struct{ Method, Text string } `json:"warnings"`
		}
		if err := json.Unmarshal(js.Bytes(), &got); err != nil {
			t.Fatal(err)
		}
		if len(got.Warnings) != len(r.Warnings) {
			t.Errorf("%s: JSON has %d warnings, the report %d", name, len(got.Warnings), len(r.Warnings))
		}
		for _, w := range r.Warnings {
			if !strings.Contains(txt.String(), w.Text) {
				t.Errorf("%s: the text lacks %s's warning %q", name, w.Method, w.Text)
			}
		}
	}
	// The estimate prints the info notes at the target mass (5 kg here).
	var txt bytes.Buffer
	if err := Text(&txt, est); err != nil {
		t.Fatal(err)
	}
	for j := range est.Methods {
		for _, n := range est.Results[1][j].Usage.Notes {
			if n.Level == usage.Info && !strings.Contains(txt.String(), n.Text) {
				t.Errorf("the text lacks the note %q at the target mass", n.Text)
			}
		}
	}
}
