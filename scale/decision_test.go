package scale

import (
	"math"
	"strings"
	"testing"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/costingtest"
	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/usage"
	"sepcost/templates"
)

func plan(t testing.TB, yaml []byte) (*costing.Plan, *prices.Table) {
	t.Helper()
	return costingtest.Plan(t, yaml, "test.yaml")
}

// withPrice copies a table with one item's price changed.
func withPrice(t *prices.Table, item string, p decimal.Decimal) *prices.Table {
	c := *t
	c.Items = append([]prices.Item(nil), t.Items...)
	i, _ := t.Find(item)
	c.Items[i].Price = p
	return &c
}

// The demo is the common pattern of the trade (common practice, no
// source): chromatography is cheaper for a few hundred milligrams, a
// recrystallization at kilograms, so there is a crossover between.
func TestDemoCrossover(t *testing.T) {
	t.Parallel()
	p, pt := plan(t, templates.Scenario)
	masses, _ := LogSpace(1e-4, 1, 25)
	r, err := Sweep(p, pt, masses)
	if err != nil {
		t.Fatal(err)
	}
	first, last := r.Results[0], r.Results[len(masses)-1]
	if !(first[0].PerGram() < first[1].PerGram()) {
		t.Errorf("at 100 mg chromatography should be cheaper: %g vs %g", first[0].PerGram(), first[1].PerGram())
	}
	if !(last[1].PerGram() < last[0].PerGram()) {
		t.Errorf("at 1 kg crystallization should be cheaper: %g vs %g", last[1].PerGram(), last[0].PerGram())
	}
	found := false
	for _, c := range r.Crossovers {
		if c.CheaperBelow == "chromatography" && c.CheaperAbove == "crystallization" {
			found = true
		}
	}
	if !found {
		t.Fatalf("no chromatography → crystallization crossover: %+v", r.Crossovers)
	}
	// Brute force on a fine grid of the model itself: every sign change of
	// the cost difference lies within a grid step of a reported crossover.
	fine, _ := LogSpace(1e-4, 1, 400)
	var changes []float64
	prev := math.NaN()
	for _, m := range fine {
		a, _ := p.RunOne(0, m, pt)
		b, _ := p.RunOne(1, m, pt)
		d := a.PerGram() - b.PerGram()
		if !math.IsNaN(prev) && !math.IsNaN(d) && (d > 0) != (prev > 0) {
			changes = append(changes, m)
		}
		prev = d
	}
	step := math.Log(fine[1] / fine[0])
	for _, m := range changes {
		ok := false
		for _, c := range r.Pairwise {
			if c.A == "chromatography" && c.B == "crystallization" && math.Abs(math.Log(c.MassKg/m)) <= step*1.01 {
				ok = true
			}
		}
		if !ok {
			t.Errorf("brute force finds a change near %g kg that the sweep missed (%+v)", m, r.Pairwise)
		}
	}
}

// Break-even prices really flip the decision when applied: 1 % beyond the
// break-even the runner-up wins, 1 % short of it the winner stays.
func TestBreakEvenFlips(t *testing.T) {
	t.Parallel()
	p, pt := plan(t, templates.Scenario)
	d, err := Decide(p, pt, 2)
	if err != nil {
		t.Fatal(err)
	}
	if d.Winner != "crystallization" || len(d.Flips) == 0 {
		t.Fatalf("decision %+v", d)
	}
	for _, f := range d.Flips {
		beyond, short := 1.01, 0.99
		if !f.Rising {
			beyond, short = 0.99, 1.01
		}
		for _, c := range []struct {
			factor float64
			want   string
		}{{beyond, d.RunnerUp}, {short, d.Winner}} {
			tb := withPrice(pt, f.Item, f.BreakEven.Mul(decimal.NewFromFloat(c.factor)))
			d2, err := Decide(p, tb, 2)
			if err != nil {
				t.Fatal(err)
			}
			if d2.Winner != c.want {
				t.Errorf("%s at %.2f × break-even %s: winner %s, want %s", f.Item, c.factor, f.BreakEven, d2.Winner, c.want)
			}
		}
	}
}

// A method that is infeasible is never recommended: a crystallization whose
// impurity co-crystallises cannot reach the target purity.
func TestInfeasibleNeverRecommended(t *testing.T) {
	t.Parallel()
	y := strings.Replace(string(templates.Scenario), `solubility: {"0 C": "30 g/L", "75 C": "140 g/L"}`, `solubility: {"0 C": "0.5 g/L", "75 C": "2 g/L"}`, 1)
	p, pt := plan(t, []byte(y))
	for _, m := range []float64{1e-3, 0.1, 2} {
		d, err := Decide(p, pt, m)
		if err != nil {
			t.Fatal(err)
		}
		if d.Winner == "crystallization" {
			t.Errorf("%g kg: an infeasible crystallization was recommended", m)
		}
		if _, ok := d.Infeasible["crystallization"]; !ok {
			t.Errorf("%g kg: crystallization should be infeasible here", m)
		}
	}
}

// Scale 1 reproduces estimate: the sweep's result at a mass equals an
// estimate at that mass, to the cent.
func TestSweepReproducesEstimate(t *testing.T) {
	t.Parallel()
	p, pt := plan(t, templates.Scenario)
	masses, _ := LogSpace(0.02, 2, 3)
	sw, err := Sweep(p, pt, masses)
	if err != nil {
		t.Fatal(err)
	}
	est, err := Estimate(p, pt, []float64{masses[1]})
	if err != nil {
		t.Fatal(err)
	}
	for j := range sw.Methods {
		if !sw.Results[1][j].Ledger.Total.Equal(est.Results[0][j].Ledger.Total) {
			t.Errorf("%s: sweep %s vs estimate %s", sw.Methods[j], sw.Results[1][j].Ledger.Total, est.Results[0][j].Ledger.Total)
		}
	}
}

// Total cost never falls when a run or batch is added: along a fine sweep,
// wherever the number of chromatography runs or crystallization batches
// goes up, the batch's total cost does not go down (identity of the models).
func TestCostNeverFallsWhenRunsAdded(t *testing.T) {
	t.Parallel()
	p, pt := plan(t, templates.Scenario)
	masses, _ := LogSpace(0.1, 20, 300)
	r, err := SweepWith(p, pt, masses, Options{}) // no Monte Carlo draws: the identity is of the models
	if err != nil {
		t.Fatal(err)
	}
	for j, name := range r.Methods {
		key := map[string]usage.FigureKey{"chromatography": "runs", "crystallization": "batches"}[name]
		if key == "" {
			continue
		}
		walk := r.Walk() // a sweep of 300 masses holds rows; the walk recomputes the results
		for i := 1; i < len(masses); i++ {
			ra, err := walk.At(i - 1)
			if err != nil {
				t.Fatal(err)
			}
			rb, err := walk.At(i)
			if err != nil {
				t.Fatal(err)
			}
			a, b := ra[j], rb[j]
			fa, okA := a.Usage.Figure(key)
			fb, okB := b.Usage.Figure(key)
			if !okA || !okB || !a.Usage.Feasible || !b.Usage.Feasible {
				continue
			}
			if fb.SI > fa.SI && b.Ledger.Total.LessThan(a.Ledger.Total) {
				t.Errorf("%s: %g → %g %s between %g and %g kg, cost fell %s → %s", name, fa.SI, fb.SI, key, masses[i-1], masses[i], a.Ledger.Total, b.Ledger.Total)
			}
		}
	}
}

// Crystallization cost per gram falls as the one-time development cost is
// spread over more product (the development cost is one-time, usage.OneTime).
func TestDevelopmentCostSpread(t *testing.T) {
	t.Parallel()
	p, pt := plan(t, templates.Scenario)
	prev := math.Inf(1)
	for _, m := range []float64{1e-3, 1e-2, 0.1, 1} {
		r, err := p.RunOne(1, m, pt)
		if err != nil {
			t.Fatal(err)
		}
		if pg := r.PerGram(); !(pg < prev) {
			t.Errorf("%g kg: %.2f per g, not below %.2f", m, pg, prev)
		} else {
			prev = pg
		}
	}
}

// A cost driver is an item with at least half a percent of the method's
// cost (one that would print as "0 %" is not named): of lines of 60.00,
// 39.70 and 0.30 (0.3 %), the first two are drivers (a presentational
// rule of this project, no source).
func TestDriversLeaveOutCrumbs(t *testing.T) {
	t.Parallel()
	line := func(item, amount string) ledger.Line {
		return ledger.Line{Demand: usage.Demand{Item: item, Group: usage.Materials}, Amount: decimal.RequireFromString(amount)}
	}
	r := costing.Result{Ledger: ledger.Ledger{Total: decimal.RequireFromString("100.00"),
		Lines: []ledger.Line{line("silica gel", "60.00"), line("n-heptane", "39.70"), line("sand", "0.30")}}}
	got := topDrivers("chromatography", r, 3)
	if len(got) != 2 || got[0].Item != "silica gel" || got[1].Item != "n-heptane" {
		t.Errorf("drivers %+v, want silica gel and n-heptane only", got)
	}
	for _, y := range [][]byte{templates.Scenario, templates.Liquid} {
		p, pt := plan(t, y)
		r, err := EstimateWith(p, pt, []float64{p.Scenario.TargetKg}, Options{})
		if err != nil {
			t.Fatal(err)
		}
		for _, d := range r.Decision.Drivers {
			if d.Share < minDriverShare {
				t.Errorf("%s: driver %s at %.2f %% of its cost", d.Method, d.Item, d.Share*100)
			}
		}
	}
}
