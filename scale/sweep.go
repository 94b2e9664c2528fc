package scale

import (
	"sepcost/costing"
	"sepcost/costing/prices"
)

// Sweep runs every method across the masses (normally LogSpace), finds the
// crossover masses between each pair of methods by bisection on the model,
// and decides at the scenario's target mass.
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
	grid := make([][]float64, len(masses))
	for i := range masses {
		grid[i] = make([]float64, len(r.Methods))
		for j := range r.Methods {
			grid[i][j] = r.Results[i][j].PerGram()
		}
	}
	r.Crossovers, err = findCrossovers(r.Methods, masses, grid, planCost(p, t))
	return r, err
}
