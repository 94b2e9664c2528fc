package costing

import (
	"sepcost/costing/prices"
)

// PerGramWithSetting is method j's cost per gram of purified product at
// crudeKg (kg) on the plan WithSetting(key, si) gives, the number
// WithSetting(key, si) then RunOne(j, crudeKg, t).PerGram() reports (NaN
// when not feasible), for a caller that needs only it (FindAssumptions):
// the coefficients are settled as Prepare settles them (calibrations
// rerun, on the plan's own equipment table), but only
// method j's model is built, quiet (the same costs, TestQuietPlanCostsTheSame),
// and no green metrics are computed. The scenario's waste sector, which
// PrepareWith checks, is the plan's own, already checked.
func (p *Plan) PerGramWithSetting(key string, si float64, j int, crudeKg float64, t *prices.Table) (float64, error) {
	sc, err := p.withSetting(key, si)
	if err != nil {
		return 0, err
	}
	coef, err := settle(sc)
	if err != nil {
		return 0, err
	}
	q := &Plan{Scenario: sc, Coef: coef, Equipment: p.Equipment, Methods: make([]Method, len(Registry))}
	q.Methods[j] = buildMethod(Registry[j], sc, coef, q.Equipment, true)
	st, err := q.SitePrices(t)
	if err != nil {
		return 0, err
	}
	u, l, err := q.runPriced(j, crudeKg, st)
	if err != nil {
		return 0, err
	}
	return Result{Usage: u, Ledger: l}.PerGram(), nil
}
