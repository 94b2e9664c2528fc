package costing

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/usage"
)

// runPriced runs method j at one mass and prices it. A method with Choices
// has every candidate priced and the cheapest per gram of purified product
// kept (feasible candidates first); the kept usage says which it is, why,
// and what the others cost.
func (p *Plan) runPriced(j int, crudeKg float64, t *prices.Table) (usage.Usage, ledger.Ledger, error) {
	u, l, err := p.choose(j, crudeKg, t)
	u.Compact()
	return u, l, err
}

// choose is runPriced before the kept usage is compacted.
func (p *Plan) choose(j int, crudeKg float64, t *prices.Table) (usage.Usage, ledger.Ledger, error) {
	m := p.Methods[j]
	if m.Choices == nil {
		u := m.Run(crudeKg)
		l, err := p.Pricer(t).Price(u)
		return u, l, err
	}
	cands, full := leanChoices(m, crudeKg)
	ps, err := p.priceCandidates(cands, t)
	if err != nil {
		return full(len(ps) - 1), ledger.Ledger{}, err
	}
	best := -1
	for i, c := range ps {
		if c.u.Feasible && c.perGram == c.perGram && (best < 0 || c.perGram < ps[best].perGram) {
			best = i
		}
	}
	if best < 0 {
		return full(0), ps[0].l, nil
	}
	// The kept candidate is worded in full; its ledger is the lean one's,
	// whose demands are the same (Method.Lean).
	kept := full(best)
	if len(ps) > 1 {
		kept.Notef(usage.Info, "Chosen as the cheapest per gram of purified product of %d plans priced (loading and equipment): %s.", len(ps), describeChoices(ps, t.Currency))
	}
	return kept, ps[best].l, nil
}

// leanChoices is the method's candidates at a mass made to be ranked, and
// full(i), the i-th worded as Choices gives it (Method.Lean; the same
// candidates when the method has no lean form).
func leanChoices(m Method, crudeKg float64) (cands []usage.Usage, full func(i int) usage.Usage) {
	if m.Lean != nil {
		return m.Lean(crudeKg)
	}
	cands = m.Choices(crudeKg)
	return cands, func(i int) usage.Usage { return cands[i] }
}

// priced is a candidate with its ledger and cost per gram.
type priced struct {
	u       usage.Usage
	l       ledger.Ledger
	perGram float64
}

// shown is how many of the cheapest candidates describeChoices lists.
const shown = 4

// priceCandidates prices the candidates that can be the cheapest per gram
// or among the shown cheapest, in decimal as every reported ledger is; the
// others keep a NaN cost per gram and no ledger, which neither the choice
// nor describeChoices can reach. It ranks them first with float rates
// (ledger.Rates.TotalBound: the float total F and a bound B on its
// distance from the decimal total). A candidate whose lowest possible
// cost per gram, (F − B)/g, is above the shown-th lowest of the highest
// possible ones, (F + B)/g, is dearer per gram in decimal than shown
// candidates that are priced, so leaving it unpriced changes neither the
// choice nor the list. Where the float rates cannot price every candidate
// (an item missing, a volume priced per mass), every candidate is priced
// in decimal, as are all when none is feasible. On error the last
// candidate returned is the one that failed.
func (p *Plan) priceCandidates(cands []usage.Usage, t *prices.Table) ([]priced, error) {
	ps := make([]priced, len(cands))
	lo := make([]float64, len(cands))
	hi := make([]float64, 0, len(cands))
	r := p.rates(t)
	ranked := true
	for i, u := range cands {
		ps[i] = priced{u: u, perGram: math.NaN()}
		f, b, err := r.TotalBound(u)
		if err != nil {
			ranked = false
			break
		}
		lo[i] = math.Inf(1)
		if u.Feasible && u.ProductOutKg > 0 {
			g := u.ProductOutKg * 1000
			lo[i] = (f - b) / g
			hi = append(hi, (f+b)/g)
		}
	}
	if len(hi) == 0 {
		ranked = false
	}
	limit := math.Inf(1)
	if ranked && len(hi) > shown {
		sort.Float64s(hi)
		limit = hi[shown-1]
	}
	for i := range ps {
		c := &ps[i]
		if ranked && lo[i] > limit {
			continue
		}
		l, err := p.Pricer(t).Price(c.u)
		if err != nil {
			return ps[:i+1], err
		}
		c.l, c.perGram = l, Result{Usage: c.u, Ledger: l}.PerGram()
	}
	return ps, nil
}

// rates is the float form of a price table (ledger.NewRates), made once
// per table.
func (p *Plan) rates(t *prices.Table) *ledger.Rates {
	if v, ok := p.rateCache.Load(t); ok {
		return v.(*ledger.Rates)
	}
	r := ledger.NewRates(t)
	p.rateCache.Store(t, r)
	return r
}

// Pricer is the price table prepared for pricing (ledger.NewPricer: the
// ledgers of ledger.Price and ledger.PriceCampaign), made once per table
// and kept by the plan; t must not change while the plan is in use.
func (p *Plan) Pricer(t *prices.Table) *ledger.Pricer {
	if v, ok := p.pricers.Load(t); ok {
		return v.(*ledger.Pricer)
	}
	pr := ledger.NewPricer(t)
	p.pricers.Store(t, pr)
	return pr
}

// describeChoices lists the four cheapest feasible candidates with their
// loading, equipment and cost per gram, cheapest first.
func describeChoices(ps []priced, currency string) string {
	var fs []priced
	for _, c := range ps {
		if c.u.Feasible && c.perGram == c.perGram {
			fs = append(fs, c)
		}
	}
	sort.SliceStable(fs, func(i, j int) bool { return fs[i].perGram < fs[j].perGram })
	if len(fs) > 4 {
		fs = fs[:4]
	}
	parts := make([]string, len(fs))
	for i, c := range fs {
		ratio, _ := c.u.Figure(usage.FigRatioUsed)
		parts[i] = fmt.Sprintf("%.0f : 1 on %s, %.4g %s/g", ratio.SI, c.u.Equipment, c.perGram, currency)
	}
	return strings.Join(parts, "; ")
}
