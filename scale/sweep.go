package scale

import (
	"sepcost/costing"
	"sepcost/costing/prices"
)

// Sweep runs every method across the masses (normally LogSpace), finds the
// masses where the decision changes (the cheapest feasible method per gram
// of purified product) and, as a secondary table, where any two methods
// change places, each by bisection on the models; and decides at the
// scenario's target mass.
func Sweep(p *costing.Plan, t *prices.Table, masses []float64) (*Report, error) {
	return SweepWith(p, t, masses, DefaultOptions)
}

// SweepWith is Sweep with chosen sampling options.
func SweepWith(p *costing.Plan, t *prices.Table, masses []float64, opt Options) (*Report, error) {
	r, err := EstimateWith(p, t, masses, opt)
	if err != nil {
		return nil, err
	}
	r.IsSweep = true
	grid := make([][]point, len(masses))
	nm := len(r.Methods)
	for k, row := range r.Rows() {
		if grid[k/nm] == nil {
			grid[k/nm] = make([]point, nm)
		}
		// pointOf's fields, from the row (the same Result's).
		grid[k/nm][k%nm] = point{perG: row.PerGram, equipment: row.Equipment, reason: row.Reason}
	}
	eval := planEval(p, t)
	if r.Crossovers, err = findDecisionCrossovers(r.Methods, masses, grid, eval); err != nil {
		return nil, err
	}
	r.Pairwise, err = findPairwise(r.Methods, masses, grid, eval)
	return r, err
}
