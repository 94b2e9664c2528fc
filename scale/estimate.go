// Package scale runs a purification across batch masses: the estimate at
// the masses a user names, and (with the sweep) the scale-up curve.
package scale

import (
	"sepcost/costing"
	"sepcost/costing/green"
	"sepcost/costing/prices"
	"sepcost/costing/usage"
	"sepcost/costing/waste"
)

// Estimate runs every method of the plan at each mass, prices it and
// gathers what a writer needs.
func Estimate(p *costing.Plan, t *prices.Table, massesKg []float64) (*Report, error) {
	res, err := p.Run(massesKg, t)
	if err != nil {
		return nil, err
	}
	sc := p.Scenario
	r := &Report{
		Title:        sc.Name,
		ScenarioFile: sc.File,
		PricesFile:   t.File,
		Prices:       t,
		MassesKg:     massesKg,
		Methods:      p.MethodNames(),
		Results:      res,
		Coefficients: p.Coefficients(),
		Cautions:     p.Cautions(),
	}
	r.TargetKg = sc.TargetKg
	r.Waste = wasteRows(p, massesKg, r.Methods, res)
	r.Greenness = greenness(p)
	r.WasteSector = sc.WasteSector.String()
	r.Coefficients = append(r.Coefficients, waste.Sources()...)
	r.Coefficients = append(r.Coefficients, green.Sources()...)
	if r.Decision, err = Decide(p, t, sc.TargetKg); err != nil {
		return nil, err
	}
	for _, in := range sc.Inputs {
		r.Inputs = append(r.Inputs, Input(in))
	}
	if sc.Notes != "" {
		r.Notes = append(r.Notes, usage.Note{Level: usage.Info, Text: sc.Notes})
	}
	return r, nil
}
