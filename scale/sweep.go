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
	for i := range masses {
		grid[i] = make([]point, len(r.Methods))
		for j := range r.Methods {
			grid[i][j] = pointOf(r.Results[i][j])
		}
	}
	eval := planEval(p, t)
	if r.Crossovers, err = findDecisionCrossovers(r.Methods, masses, grid, eval); err != nil {
		return nil, err
	}
	r.Pairwise, err = findPairwise(r.Methods, masses, grid, eval)
	return r, err
}
