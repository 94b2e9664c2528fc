package costing

import (
	"bytes"
	"strings"
	"testing"

	"sepcost/costing/cryst"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/templates"
)

// TestCrystallizationImpurityFromCrude: the crystallization's impurity
// amount is crude.nearest_impurity when the scenario gives it (the demo:
// 10 % of a crude at 82 %), not all of 1 − purity (18 %). At 5 kg the
// cautious default needs more passes and costs more; the issue that
// reported the hidden default measured twice the passes and 42 % more
// cost in a user case (not this one), so only the direction and the
// amounts are asserted here.
func TestCrystallizationImpurityFromCrude(t *testing.T) {
	t.Parallel()
	run := func(yaml string) (passes, total, impurity float64) {
		t.Helper()
		sc, err := scenario.Load(strings.NewReader(yaml), "demo.yaml")
		if err != nil {
			t.Fatal(err)
		}
		tab, err := prices.Read(bytes.NewReader(templates.Prices), "prices")
		if err != nil {
			t.Fatal(err)
		}
		p, err := Prepare(sc)
		if err != nil {
			t.Fatal(err)
		}
		j := -1
		for k, m := range p.Methods {
			if m.Name == cryst.Method {
				j = k
			}
		}
		r, err := p.RunOne(j, 5, tab)
		if err != nil {
			t.Fatal(err)
		}
		if !r.Usage.Feasible {
			t.Fatalf("crystallization at 5 kg not feasible: %s", r.Usage.Reason)
		}
		f, _ := r.Usage.Figure("passes")
		return f.SI, r.Ledger.Total.InexactFloat64(), sc.Crystallization.ImpurityFraction * 5
	}
	// The demo with a less soluble impurity, so that the liquor's capacity
	// for it matters (invented values, like the demo's).
	// At 5 kg the first pass dissolves 4.1 kg of product in
	// 4.1/150 × 1.1 = 30.07 L, which holds 30.07 × 20 = 601 g of the
	// impurity at 0 °C: all of the 0.5 kg given, but not the 0.9 kg of the
	// default, whose excess co-crystallises and needs a further pass.
	demo := strings.Replace(string(templates.Scenario), `solubility: {"0 C": "30 g/L", "75 C": "140 g/L"}`, `solubility: {"0 C": "20 g/L", "75 C": "60 g/L"}`, 1)
	if !strings.Contains(demo, "nearest_impurity: 0.10\n") || !strings.Contains(demo, `"60 g/L"`) {
		t.Fatal("the demo has changed; update this case")
	}
	pGiven, cGiven, iGiven := run(demo)
	pDefault, cDefault, iDefault := run(strings.Replace(demo, "nearest_impurity: 0.10\n", "", 1))
	// 0.10 × 5 kg and 0.18 × 5 kg (demo crude at 82 %).
	if relErr(iGiven, 0.5) > 1e-12 || relErr(iDefault, 0.9) > 1e-12 {
		t.Errorf("impurity %g kg given, %g kg by default; want 0.5 and 0.9", iGiven, iDefault)
	}
	if !(pGiven == 1 && pDefault > pGiven && cDefault > cGiven) {
		t.Errorf("5 kg: %g passes and %.2f with nearest_impurity, %g passes and %.2f without; the larger impurity should not cost less", pGiven, cGiven, pDefault, cDefault)
	}
	t.Logf("5 kg: %g passes, %.2f with nearest_impurity; %g passes, %.2f (%.0f %% more) without", pGiven, cGiven, pDefault, cDefault, (cDefault/cGiven-1)*100)
}

func relErr(a, b float64) float64 {
	if b == 0 {
		return a
	}
	d := (a - b) / b
	if d < 0 {
		return -d
	}
	return d
}
