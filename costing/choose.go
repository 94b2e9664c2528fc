package costing

import (
	"fmt"
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
		l, err := ledger.Price(u, t)
		return u, l, err
	}
	cands := m.Choices(crudeKg)
	ps := make([]priced, 0, len(cands))
	for _, u := range cands {
		l, err := ledger.Price(u, t)
		if err != nil {
			return u, ledger.Ledger{}, err
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
		return ps[0].u, ps[0].l, nil
	}
	if len(ps) > 1 {
		ps[best].u.Notef(usage.Info, "Chosen as the cheapest per gram of purified product of %d plans priced (loading and equipment): %s.", len(ps), describeChoices(ps, t.Currency))
	}
	return ps[best].u, ps[best].l, nil
}

// priced is a candidate with its ledger and cost per gram.
type priced struct {
	u       usage.Usage
	l       ledger.Ledger
	perGram float64
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
		ratio, _ := c.u.Figure("ratio_used")
		parts[i] = fmt.Sprintf("%.0f : 1 on %s, %.4g %s/g", ratio.SI, c.u.Equipment, c.perGram, currency)
	}
	return strings.Join(parts, "; ")
}
