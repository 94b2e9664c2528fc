package costing

import (
	"bytes"
	"math"
	"testing"

	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/templates"
)

// The lean path of the Monte Carlo draws gives the reported cost per gram:
// the same candidate plan chosen (loading and equipment), the same
// rounding line by line, within a cent per line of the decimal ledger
// (the float path's only difference: a product that lies on a half-cent).
func TestPerGramLeanMatchesRunOne(t *testing.T) {
	t.Parallel()
	pt, err := prices.Read(bytes.NewReader(templates.Prices), "prices.csv")
	if err != nil {
		t.Fatal(err)
	}
	for name, y := range map[string][]byte{"demo": templates.Scenario, "liquid demo": templates.Liquid} {
		sc, err := scenario.Load(bytes.NewReader(y), name)
		if err != nil {
			t.Fatal(err)
		}
		p, err := Prepare(sc)
		if err != nil {
			t.Fatal(err)
		}
		st, err := p.SitePrices(pt)
		if err != nil {
			t.Fatal(err)
		}
		r := ledger.NewRates(st)
		for _, kg := range []float64{0.0001, 0.001, 0.02, 0.3, 5} {
			for j, m := range p.Methods {
				res, err := p.RunOne(j, kg, pt)
				if err != nil {
					t.Fatal(err)
				}
				want := res.PerGram()
				got, err := p.PerGramLean(j, kg, r)
				if err != nil {
					t.Fatal(err)
				}
				if math.IsNaN(want) != math.IsNaN(got) {
					t.Errorf("%s %s at %g kg: lean %g, reported %g", name, m.Name, kg, got, want)
					continue
				}
				if tol := 0.01 * float64(len(res.Ledger.Lines)) / (res.Usage.ProductOutKg * 1000); !math.IsNaN(want) && math.Abs(got-want) > tol {
					t.Errorf("%s %s at %g kg: lean %g, reported %g", name, m.Name, kg, got, want)
				}
			}
		}
	}
}
