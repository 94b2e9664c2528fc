package scale

import (
	"bytes"
	"errors"
	"fmt"
	"strings"
	"testing"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/templates"
)

func loaderFor(t *testing.T, files map[string][]byte) Loader {
	return func(path string) (*costing.Plan, error) {
		data, ok := files[path]
		if !ok {
			return nil, fmt.Errorf("%s: no such scenario file", path)
		}
		sc, err := scenario.Load(bytes.NewReader(data), path)
		if err != nil {
			return nil, err
		}
		return costing.Prepare(sc)
	}
}

// Portfolio totals equal the sum of the per-row estimates to the cent
// (identity: each row is runs × an estimate's ledger total).
func TestPortfolioReconciles(t *testing.T) {
	plan := "scenario,mass,runs,method\nsolid.yaml,20 g,3,\nsolid.yaml,2 kg,2,\nliquid.yaml,2 kg,4,\nsolid.yaml,1 g,5,chromatography\n"
	rows, err := ReadPlan(strings.NewReader(plan), "plan.csv")
	if err != nil {
		t.Fatal(err)
	}
	files := map[string][]byte{"solid.yaml": templates.Scenario, "liquid.yaml": templates.Liquid}
	_, pt := plan2(t)
	pf, err := BuildPortfolio("plan.csv", rows, loaderFor(t, files), pt)
	if err != nil {
		t.Fatal(err)
	}
	sum := decimal.Zero
	for _, row := range rows {
		p, _ := loaderFor(t, files)(row.Scenario)
		est, err := Estimate(p, pt, []float64{row.MassKg})
		if err != nil {
			t.Fatal(err)
		}
		j := -1
		method := row.Method
		if method == "" {
			d, err := Decide(p, pt, row.MassKg)
			if err != nil {
				t.Fatal(err)
			}
			method = d.Winner
		}
		for k, n := range est.Methods {
			if n == method {
				j = k
			}
		}
		sum = sum.Add(est.Results[0][j].Ledger.Total.Mul(decimal.NewFromInt(int64(row.Runs))))
	}
	if !pf.Total.Equal(sum) {
		t.Errorf("portfolio total %s, sum of estimates %s", pf.Total, sum)
	}
	byMethod := decimal.Zero
	for _, v := range pf.ByMethod {
		byMethod = byMethod.Add(v)
	}
	if !byMethod.Equal(pf.Total) {
		t.Errorf("by method %s ≠ total %s", byMethod, pf.Total)
	}
	if !pf.Lines[3].Forced || pf.Lines[3].Method != "chromatography" {
		t.Errorf("forced row: %+v", pf.Lines[3].PlanRow)
	}
	if len(pf.Classes) == 0 || len(pf.Codes) == 0 || len(pf.Solvents) == 0 {
		t.Errorf("empty roll-up: %+v", pf)
	}
}

func plan2(t testing.TB) (*costing.Plan, *prices.Table) {
	return plan(t, templates.Scenario)
}

func TestPlanErrors(t *testing.T) {
	cases := []struct{ csv, want string }{
		{"scenario,mass,runs\na.yaml,20 g,-1\n", "plan.csv:2: runs"},
		{"scenario,mass,runs\na.yaml,20,1\n", "plan.csv:2: mass"},
		{"scenario,mass\na.yaml,20 g\n", "runs: missing column"},
		{"scenario,mass,runs,colour\n", "colour: unknown column"},
		{"scenario,mass,runs\n", "no rows"},
	}
	for _, c := range cases {
		_, err := ReadPlan(strings.NewReader(c.csv), "plan.csv")
		if err == nil || !strings.Contains(err.Error(), c.want) || !errors.Is(err, ErrPlan) {
			t.Errorf("%q: error %v, want %q", c.csv, err, c.want)
		}
	}
	// A row pointing at a missing file: the error names the row.
	rows, err := ReadPlan(strings.NewReader("scenario,mass,runs\nsolid.yaml,1 g,1\nmissing.yaml,1 g,1\n"), "plan.csv")
	if err != nil {
		t.Fatal(err)
	}
	_, pt := plan2(t)
	_, err = BuildPortfolio("plan.csv", rows, loaderFor(t, map[string][]byte{"solid.yaml": templates.Scenario}), pt)
	if err == nil || !strings.Contains(err.Error(), "plan.csv:3: scenario: missing.yaml") {
		t.Errorf("missing file error: %v", err)
	}
}
