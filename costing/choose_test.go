package costing

import (
	"bytes"
	"math"
	"testing"

	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/costing/usage"
	"sepcost/templates"
)

// chooseAllDecimal is the choice priced the long way: every candidate in
// decimal, the cheapest feasible per gram kept (first of equals), and the
// note listing the shown cheapest. runPriced must give the same usage and
// ledger.
func chooseAllDecimal(t *testing.T, p *Plan, j int, m float64, pt *prices.Table) (usage.Usage, ledger.Ledger) {
	t.Helper()
	var ps []priced
	for _, u := range p.Methods[j].Choices(m) {
		l, err := ledger.Price(u, pt)
		if err != nil {
			t.Fatal(err)
		}
		ps = append(ps, priced{u, l, Result{Usage: u, Ledger: l}.PerGram()})
	}
	best := -1
	for i, c := range ps {
		if c.u.Feasible && c.perGram == c.perGram && (best < 0 || c.perGram < ps[best].perGram) {
			best = i
		}
	}
	if best < 0 {
		return ps[0].u, ps[0].l
	}
	if len(ps) > 1 {
		ps[best].u.Notef(usage.Info, "Chosen as the cheapest per gram of purified product of %d plans priced (loading and equipment): %s.", len(ps), describeChoices(ps, pt.Currency))
	}
	return ps[best].u, ps[best].l
}

// Ranking the candidates with float rates before pricing them in decimal
// changes nothing: at 300 masses from 10 mg to 50 kg of both demos, the
// chromatography kept, its ledger to the last digit and the note that
// lists the cheapest plans are those of pricing every candidate in
// decimal (property check; the decimal ledger is the reference).
func TestRankedChoiceIsTheDecimalChoice(t *testing.T) {
	for _, yaml := range []string{"solid", "liquid"} {
		p, pt := demoPlanOf(t, yaml)
		st, err := p.SitePrices(pt)
		if err != nil {
			t.Fatal(err)
		}
		for k := range 300 {
			m := 1e-5 * math.Pow(5e6, float64(k)/299)
			u, l, err := p.runPriced(0, m, st)
			if err != nil {
				t.Fatal(err)
			}
			wu, wl := chooseAllDecimal(t, p, 0, m, st)
			if u.Equipment != wu.Equipment || !l.Total.Equal(wl.Total) || l.Total.String() != wl.Total.String() || len(l.Lines) != len(wl.Lines) {
				t.Fatalf("%s at %g kg: kept %q at %s, all in decimal %q at %s", yaml, m, u.Equipment, l.Total, wu.Equipment, wl.Total)
			}
			if len(u.Notes) != len(wu.Notes) || (len(u.Notes) > 0 && u.Notes[len(u.Notes)-1] != wu.Notes[len(wu.Notes)-1]) {
				t.Fatalf("%s at %g kg: notes differ:\n%v\n%v", yaml, m, u.Notes, wu.Notes)
			}
		}
	}
}

// demoPlanOf is the plan of the solid or the liquid demo with the example
// prices.
func demoPlanOf(t testing.TB, which string) (*Plan, *prices.Table) {
	yaml := templates.Scenario
	if which == "liquid" {
		yaml = templates.Liquid
	}
	sc, err := scenario.Load(bytes.NewReader(yaml), which)
	if err != nil {
		t.Fatal(err)
	}
	pt, err := prices.Read(bytes.NewReader(templates.Prices), "prices")
	if err != nil {
		t.Fatal(err)
	}
	p, err := Prepare(sc)
	if err != nil {
		t.Fatal(err)
	}
	return p, pt
}
