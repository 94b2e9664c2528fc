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
	grid := gridOf(r)
	e, err := planEvals(p, t)
	if err != nil {
		return nil, err
	}
	if r.Crossovers, err = findDecisionCrossovers(r.Methods, masses, grid, e); err != nil {
		return nil, err
	}
	r.Pairwise, err = findPairwise(r.Methods, masses, grid, e)
	return r, err
}

// gridOf is the report's rows as the crossover search's points (pointOf's
// fields, from the row of the same Result).
func gridOf(r *Report) [][]point {
	nm := len(r.Methods)
	grid := make([][]point, len(r.MassesKg))
	for k, row := range r.Rows() {
		i := k / nm
		if grid[i] == nil {
			grid[i] = make([]point, nm)
		}
		grid[i][k%nm] = point{kg: row.CrudeKg, perG: row.PerGram, id: row.EquipmentID, equipment: row.Equipment, reason: row.Reason}
	}
	return grid
}
