package scale

import (
	"bytes"
	"math"
	"strings"
	"testing"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/equipment"
	"sepcost/costing/scenario"
	"sepcost/costing/usage"
	"sepcost/scale/campaign"
	"sepcost/templates"
)

// The demo's campaign (5 kg of product from 2 kg batches, in
// templates/scenario.yaml): each method needs ⌈5 kg / product per batch⌉
// batches, its one-time lines are charged once, and the decision at the
// target is the method cheapest per gram over the campaign.
func TestDemoCampaign(t *testing.T) {
	t.Parallel()
	p, pt := plan2(t)
	r, err := EstimateWith(p, pt, []float64{p.Scenario.TargetKg}, Options{Draws: 50, Seed: 1})
	if err != nil {
		t.Fatal(err)
	}
	c := r.Campaign
	if c == nil || len(c.Costs) != 2 {
		t.Fatalf("campaign %+v", c)
	}
	best := ""
	bestPG := math.Inf(1)
	for _, k := range c.Costs {
		res, err := p.RunOne(indexOf(p.MethodNames(), k.Method), 2, pt)
		if err != nil {
			t.Fatal(err)
		}
		per := res.Usage.ProductOutKg
		if want := int(math.Ceil(5 / per)); k.Batches != want {
			t.Errorf("%s: %d batches for 5 kg at %.4g kg a batch, want %d", k.Method, k.Batches, per, want)
		}
		ot := res.Ledger.Subtotal(usage.OneTime)
		want := res.Ledger.Total.Sub(ot).Mul(decimal.NewFromInt(int64(k.Batches))).Add(ot)
		if !k.Total.Equal(want) {
			t.Errorf("%s: campaign %s, want %s (batches × recurring + one-time once)", k.Method, k.Total, want)
		}
		if k.PerGram < bestPG {
			best, bestPG = k.Method, k.PerGram
		}
	}
	if c.Winner != best || r.Decision.Winner != best || r.Decision.WinnerPerG != bestPG {
		t.Errorf("winner %s (decision %s at %v), want %s at %v", c.Winner, r.Decision.Winner, r.Decision.WinnerPerG, best, bestPG)
	}
	if !strings.HasPrefix(r.Decision.Explanation[0], "For the campaign") {
		t.Errorf("decision does not begin with the campaign: %q", r.Decision.Explanation[0])
	}
	// The map has a winner in every cell and the payback row for
	// crystallization; at the campaign's own batch mass it agrees with the
	// campaign's payback.
	m := c.Map
	if len(m.Winner) != MapPoints || len(m.Winner[0]) != len(MapBatches) {
		t.Fatalf("map %d × %d", len(m.Winner), len(m.Winner[0]))
	}
	if len(c.Paybacks) != 1 || c.Paybacks[0].Method != "crystallization" {
		t.Errorf("paybacks %+v", c.Paybacks)
	}
}

// The budget's headings add up to its subtotal, which is the chosen
// campaign's cost to the cent; the one-time heading is the demo's
// development, 40 h × 75.00 EUR/h + 20 g × 0.82 × 5.00 EUR/g = 3082.00
// (example prices and scenario, invented; hand computation); the
// contingency is round(subtotal × (P90/P50 − 1)).
func TestBudget(t *testing.T) {
	t.Parallel()
	p, pt := plan2(t)
	r, err := EstimateWith(p, pt, []float64{p.Scenario.TargetKg}, Options{Draws: 50, Seed: 1})
	if err != nil {
		t.Fatal(err)
	}
	b := r.Budget
	w, _ := r.Campaign.Cost(r.Campaign.Winner)
	sum := b.Capital.Add(b.Consumables).Add(b.Labour).Add(b.Equipment).Add(b.Disposal).Add(b.ProductLost).Add(b.OneTime)
	if !sum.Equal(b.Subtotal) || !b.Subtotal.Equal(w.Total) {
		t.Errorf("headings %s, subtotal %s, campaign %s", sum, b.Subtotal, w.Total)
	}
	if b.Method != "crystallization" || b.OneTime.StringFixed(2) != "3082.00" {
		t.Errorf("%s one-time %s, want crystallization 3082.00", b.Method, b.OneTime)
	}
	var band Band
	for _, x := range r.Uncertainty.Bands {
		if x.Method == b.Method {
			band = x
		}
	}
	want := decimal.NewFromFloat(b.Subtotal.InexactFloat64() * (band.P90/band.P50 - 1)).Round(2)
	if !b.Contingency.Equal(want) || !b.Total.Equal(b.Subtotal.Add(want)) || !b.Contingency.IsPositive() {
		t.Errorf("contingency %s, want %s; total %s", b.Contingency, want, b.Total)
	}
	// Without draws there is no contingency.
	r0, err := EstimateWith(p, pt, []float64{p.Scenario.TargetKg}, Options{})
	if err != nil {
		t.Fatal(err)
	}
	if !r0.Budget.Contingency.IsZero() || !r0.Budget.Total.Equal(r0.Budget.Subtotal) {
		t.Errorf("unsampled budget: contingency %s", r0.Budget.Contingency)
	}
}

// Every ledger group is under exactly one budget heading, so the headings
// always add up to the campaign's cost.
func TestBudgetGroupsCoverLedger(t *testing.T) {
	t.Parallel()
	seen := map[usage.Group]int{}
	for _, gs := range BudgetGroups {
		for _, g := range gs {
			seen[g]++
		}
	}
	for _, g := range usage.Groups {
		if seen[g] != 1 {
			t.Errorf("group %q is under %d budget headings", g, seen[g])
		}
	}
}

// Capital: with the site's jacketed reactors marked "to buy", the demo's
// crystallization campaign asks for the reactor its 2 kg batch needs as
// capital, once (its purchase price as written in the table), drops the
// reactor's wear from the running cost, and its payback counts the
// purchase: the smallest n with n·(g_c·R_x − g_x·R_c) ≤ g_x·K_c − g_c·K_x
// (campaign.Payback, tested by hand there).
func TestCampaignCapital(t *testing.T) {
	t.Parallel()
	eqCSV := strings.NewReplacer(
		"jacketed reactor 20 L,reactor,20 L,,,20.00,owned,,EUR,,", "jacketed reactor 20 L,reactor,20 L,,,20.00,to buy,18000.00,EUR,20000 h,",
		"jacketed reactor 100 L,reactor,100 L,,,45.00,owned,,EUR,,", "jacketed reactor 100 L,reactor,100 L,,,45.00,to buy,42000.00,EUR,20000 h,",
	).Replace(string(templates.Equipment))
	eq, err := equipment.Read(strings.NewReader(eqCSV), "eq.csv")
	if err != nil {
		t.Fatal(err)
	}
	sc, err := scenario.Load(bytes.NewReader(templates.Scenario), "demo.yaml")
	if err != nil {
		t.Fatal(err)
	}
	p, err := costing.PrepareWith(sc, costing.Options{Equipment: eq})
	if err != nil {
		t.Fatal(err)
	}
	_, pt := plan2(t)
	r, err := EstimateWith(p, pt, []float64{sc.TargetKg}, Options{})
	if err != nil {
		t.Fatal(err)
	}
	items := r.Campaign.Capital["crystallization"]
	if len(items) != 1 || items[0].Kind != equipment.Reactor || !strings.HasPrefix(items[0].Name, "jacketed reactor") {
		t.Fatalf("capital %+v", items)
	}
	k, _ := r.Campaign.Cost("crystallization")
	if !k.Capital.Equal(items[0].Price) || !k.Total.Equal(k.PerBatch.Mul(decimal.NewFromInt(int64(k.Batches))).Add(k.OneTime).Add(k.Capital)) {
		t.Errorf("capital %s (item %s), total %s", k.Capital, items[0].Price, k.Total)
	}
	c, _ := r.Campaign.Cost("chromatography")
	n, ok := campaignPayback(k, c)
	for _, pb := range r.Campaign.Paybacks {
		if pb.Method == "crystallization" && (pb.Never == ok || pb.Batches != n) {
			t.Errorf("payback %+v, want %d (%v)", pb, n, ok)
		}
	}
	if b := r.Budget; b.Method == "crystallization" && (!b.Capital.Equal(items[0].Price) || len(b.CapitalItems) != 1) {
		t.Errorf("budget capital %s %v", b.Capital, b.CapitalItems)
	}
}

// campaignPayback restates campaign.Payback's inequality by brute force:
// the first n from which developing is at most as dear per gram.
func campaignPayback(dev, stay campaign.Cost) (int, bool) {
	gd := dev.ProductKg * 1000 / float64(dev.Batches)
	gs := stay.ProductKg * 1000 / float64(stay.Batches)
	for n := 1; n <= 100000; n++ {
		N := decimal.NewFromInt(int64(n))
		d := dev.PerBatch.Mul(N).Add(dev.OneTime).Add(dev.Capital).InexactFloat64() / (float64(n) * gd)
		s := stay.PerBatch.Mul(N).Add(stay.OneTime).Add(stay.Capital).InexactFloat64() / (float64(n) * gs)
		if d <= s {
			return n, true
		}
	}
	return 0, false
}
