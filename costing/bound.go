package costing

import (
	"math"

	"sepcost/costing/prices"
	"sepcost/costing/usage"
)

// PerGramBound is method j at one crude mass (kg) as a search over masses
// needs it: the plan RunOne keeps (the same candidate: loading and
// equipment), its cost per gram of purified product priced with float
// rates, and a bound on that cost's distance from the reported one:
//
//	|perG − RunOne(j, crudeKg, t).PerGram()| ≤ bound
//
// perG is NaN (bound 0) when the kept plan is not feasible or recovers
// nothing, exactly when the reported cost per gram is NaN. t is the plan's
// site price table (SitePrices). Made for a quiet plan (Quiet): the usage
// has the quantities, equipment and words of the equipment RunOne gives,
// without notes and with no ledger.
//
// The candidates are ranked as priceCandidates ranks them, with
// ledger.Rates.TotalBound (float total F and bound B on |F − decimal
// total|, per line a minor unit, a quantity step and 10⁻⁹ of the amount,
// far above the rounding of a float division): the cheapest by F/g is the
// one runPriced keeps when its highest possible cost per gram, (F + B)/g,
// lies below every other feasible candidate's lowest, (F − B)/g. When it
// does not, or the float rates cannot price a candidate, the method is
// priced in decimal as runPriced prices it and bound is 0.
func (p *Plan) PerGramBound(j int, crudeKg float64, t *prices.Table) (u usage.Usage, perG, bound float64, err error) {
	m := p.Methods[j]
	var cands []usage.Usage
	if m.Choices == nil {
		cands = []usage.Usage{m.Run(crudeKg)}
	} else {
		cands, _ = leanChoices(m, crudeKg) // the candidates choose ranks
	}
	r := p.rates(t)
	lo := make([]float64, len(cands))
	best, bestHi := -1, 0.0
	for i, c := range cands {
		lo[i] = math.NaN()
		f, b, err := r.TotalBound(c)
		if err != nil || math.IsNaN(f) || math.IsInf(f, 0) {
			return p.perGramDecimal(j, crudeKg, t)
		}
		if !c.Feasible || c.ProductOutKg <= 0 {
			continue
		}
		g := c.ProductOutKg * 1000
		lo[i] = (f - b) / g
		if est := f / g; best < 0 || est < perG {
			best, perG, bound, bestHi = i, est, b/g, (f+b)/g
		}
	}
	if best < 0 {
		return cands[0], math.NaN(), 0, nil
	}
	for i, l := range lo {
		if i != best && !(l > bestHi) && !math.IsNaN(l) {
			return p.perGramDecimal(j, crudeKg, t)
		}
	}
	return cands[best], perG, bound, nil
}

// perGramDecimal is PerGramBound priced in decimal, as RunOne prices.
func (p *Plan) perGramDecimal(j int, crudeKg float64, t *prices.Table) (usage.Usage, float64, float64, error) {
	u, l, err := p.runPriced(j, crudeKg, t)
	if err != nil {
		return usage.Usage{}, 0, 0, err
	}
	return u, Result{Usage: u, Ledger: l}.PerGram(), 0, nil
}
