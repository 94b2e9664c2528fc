package scale

import (
	"bytes"
	"errors"
	"fmt"
	"strings"
	"testing"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/costing/usage"
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

// Portfolio totals reconcile to the cent with the ledger: each row is
// runs × (the batch's ledger total less its one-time lines), plus the
// one-time lines once per scenario and method in the plan (identity).
func TestPortfolioReconciles(t *testing.T) {
	t.Parallel()
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
	sum, once := decimal.Zero, decimal.Zero
	charged := map[string]bool{}
	for i, row := range rows {
		p, _ := loaderFor(t, files)(row.Scenario)
		method := pf.Lines[i].Method
		for k, n := range p.MethodNames() {
			if n != method {
				continue
			}
			// One batch priced at the bands of the row's purchases.
			st, _ := p.SitePrices(pt)
			r, err := p.RunOne(k, row.MassKg, pt)
			if err != nil {
				t.Fatal(err)
			}
			l, err := ledger.PriceCampaign(r.Usage, st, row.Runs)
			if err != nil {
				t.Fatal(err)
			}
			ot := l.Subtotal(usage.OneTime)
			sum = sum.Add(l.Total.Sub(ot).Mul(decimal.NewFromInt(int64(row.Runs))))
			if key := row.Scenario + method; !charged[key] {
				charged[key] = true
				sum, once = sum.Add(ot), once.Add(ot)
			}
		}
	}
	if !pf.Total.Equal(sum) || !pf.OneTime.Equal(once) {
		t.Errorf("portfolio total %s (one-time %s), sum of estimates %s (one-time %s)", pf.Total, pf.OneTime, sum, once)
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

// Charge-once: ten runs of 100 g of the demo by crystallization bear its
// development once. The demo's one-time lines (templates/scenario.yaml and
// the example prices, invented) are 40 h × 75.00 EUR/h = 3000.00 and 20 g
// of crude × 0.82 purity × 5.00 EUR/g = 82.00: 3082.00 (hand computation).
// The row's total is 10 × (batch total − 3082.00) + 3082.00, where the
// same row charged every run would cost 10 × the batch total. A second row
// of the same scenario does not pay again; a row marked row pays its own;
// a row marked done pays none.
func TestPortfolioChargeOnce(t *testing.T) {
	t.Parallel()
	plan := "scenario,mass,runs,method,development,date\n" +
		"solid.yaml,100 g,10,crystallization,,2026-02-10\n" +
		"solid.yaml,50 g,4,crystallization,,2026-03-31\n" +
		"solid.yaml,50 g,4,crystallization,row,2026-04-01\n" +
		"solid.yaml,50 g,4,crystallization,done,\n"
	rows, err := ReadPlan(strings.NewReader(plan), "plan.csv")
	if err != nil {
		t.Fatal(err)
	}
	p, pt := plan2(t)
	pf, err := BuildPortfolio("plan.csv", rows, loaderFor(t, map[string][]byte{"solid.yaml": templates.Scenario}), pt)
	if err != nil {
		t.Fatal(err)
	}
	dev := decimal.RequireFromString("3082.00")
	j := 1 // crystallization
	if p.MethodNames()[j] != "crystallization" {
		t.Fatal("method order changed")
	}
	batch := func(kg float64) decimal.Decimal {
		r, err := p.RunOne(j, kg, pt)
		if err != nil {
			t.Fatal(err)
		}
		if got := r.Ledger.Subtotal(usage.OneTime); !got.Equal(dev) {
			t.Fatalf("one-time lines %s, want %s", got, dev)
		}
		return r.Ledger.Total.Sub(dev)
	}
	ten := decimal.NewFromInt(10)
	four := decimal.NewFromInt(4)
	want := []decimal.Decimal{
		batch(0.1).Mul(ten).Add(dev),
		batch(0.05).Mul(four),
		batch(0.05).Mul(four).Add(dev),
		batch(0.05).Mul(four),
	}
	for i, w := range want {
		if !pf.Lines[i].Total.Equal(w) {
			t.Errorf("row %d: %s, want %s", i+2, pf.Lines[i].Total, w)
		}
	}
	if !pf.OneTime.Equal(dev.Mul(decimal.NewFromInt(2))) {
		t.Errorf("one-time in the plan %s, want 2 × %s", pf.OneTime, dev)
	}
	// By quarter: Q1 holds rows 2 and 3, Q2 row 4, the undated row last.
	if len(pf.Quarters) != 3 || pf.Quarters[0].Quarter != "2026-Q1" || !pf.Quarters[0].Total.Equal(want[0].Add(want[1])) ||
		pf.Quarters[1].Quarter != "2026-Q2" || pf.Quarters[2].Quarter != "" {
		t.Errorf("quarters %+v", pf.Quarters)
	}
}

// Each row's method is chosen on its campaign: the cheaper per gram over
// the runs as charged, not over one batch bearing all one-time costs.
func TestPortfolioChoosesOnCampaign(t *testing.T) {
	t.Parallel()
	p, pt := plan2(t)
	for _, runs := range []int{1, 4, 40} {
		rows, err := ReadPlan(strings.NewReader(fmt.Sprintf("scenario,mass,runs\nsolid.yaml,50 g,%d\n", runs)), "plan.csv")
		if err != nil {
			t.Fatal(err)
		}
		pf, err := BuildPortfolio("plan.csv", rows, loaderFor(t, map[string][]byte{"solid.yaml": templates.Scenario}), pt)
		if err != nil {
			t.Fatal(err)
		}
		best, bestPG := "", 0.0
		for j, name := range p.MethodNames() {
			r, err := p.RunOne(j, 0.05, pt)
			if err != nil {
				t.Fatal(err)
			}
			u := r.Usage
			if !u.Feasible {
				continue
			}
			// Priced at the bands of the row's purchases (runs batches).
			st, _ := p.SitePrices(pt)
			l, err := ledger.PriceCampaign(u, st, runs)
			if err != nil {
				t.Fatal(err)
			}
			ot := l.Subtotal(usage.OneTime)
			total := l.Total.Sub(ot).Mul(decimal.NewFromInt(int64(runs))).Add(ot)
			pg := total.InexactFloat64() / (float64(runs) * u.ProductOutKg * 1000)
			if best == "" || pg < bestPG {
				best, bestPG = name, pg
			}
		}
		if pf.Lines[0].Method != best {
			t.Errorf("%d runs of 50 g: %s chosen, %s is cheaper per gram over the campaign", runs, pf.Lines[0].Method, best)
		}
	}
}

func plan2(t testing.TB) (*costing.Plan, *prices.Table) {
	return plan(t, templates.Scenario)
}

func TestPlanErrors(t *testing.T) {
	t.Parallel()
	cases := []struct{ csv, want string }{
		{"scenario,mass,runs\na.yaml,20 g,-1\n", "plan.csv:2: runs"},
		{"scenario,mass,runs\na.yaml,20,1\n", "plan.csv:2: mass"},
		{"scenario,mass\na.yaml,20 g\n", "runs: missing column"},
		{"scenario,mass,runs,colour\n", "colour: unknown column"},
		{"scenario,mass,runs\n", "no rows"},
		{"scenario,mass,runs,date\na.yaml,20 g,1,31/03/2026\n", "plan.csv:2: date"},
		{"scenario,mass,runs,development\na.yaml,20 g,1,twice\n", "plan.csv:2: development"},
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

// Each scenario file is loaded once per portfolio, however many rows name
// it (a prepared plan is a pure function of the file).
func TestPortfolioLoadsEachScenarioOnce(t *testing.T) {
	plan := "scenario,mass,runs\nsolid.yaml,20 g,3\nsolid.yaml,2 kg,2\nliquid.yaml,2 kg,4\nsolid.yaml,1 g,5\nliquid.yaml,20 g,1\n"
	rows, err := ReadPlan(strings.NewReader(plan), "plan.csv")
	if err != nil {
		t.Fatal(err)
	}
	base := loaderFor(t, map[string][]byte{"solid.yaml": templates.Scenario, "liquid.yaml": templates.Liquid})
	calls := map[string]int{}
	load := func(path string) (*costing.Plan, error) {
		calls[path]++
		return base(path)
	}
	_, pt := plan2(t)
	pf, err := BuildPortfolio("plan.csv", rows, load, pt)
	if err != nil {
		t.Fatal(err)
	}
	if len(pf.Lines) != 5 {
		t.Fatalf("%d lines, want 5", len(pf.Lines))
	}
	if calls["solid.yaml"] != 1 || calls["liquid.yaml"] != 1 {
		t.Errorf("loads per file %v, want one each", calls)
	}
}
