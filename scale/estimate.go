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

// Options tune an estimate's uncertainty sampling.
type Options struct {
	Draws    int    // Monte Carlo draws at the target mass; 0 skips the sampling
	Seed     uint64 // the same seed gives the same draws
	Progress func(done int)
	// TargetKg is the crude mass to decide at; 0 takes the scenario's
	// (target_mass, else its largest mass). TargetWhy says where a
	// non-zero TargetKg comes from, e.g. "--target".
	TargetKg  float64
	TargetWhy string
	// Hold is the most batch masses whose full results the report holds
	// (Report.Results); 0 takes HeldMasses. Beyond it the report keeps
	// Rows and recomputes full results for its writers.
	Hold int
}

// DefaultOptions: 400 draws put the P10 and P90 within a few per cent of
// their limits for these smooth models (common practice, no source).
var DefaultOptions = Options{Draws: 400, Seed: 1}

// Estimate runs every method of the plan at each mass, prices it, decides
// at the target mass and samples the uncertainty there (DefaultOptions).
func Estimate(p *costing.Plan, t *prices.Table, massesKg []float64) (*Report, error) {
	return EstimateWith(p, t, massesKg, DefaultOptions)
}

// EstimateWith is Estimate with chosen sampling options.
func EstimateWith(p *costing.Plan, t *prices.Table, massesKg []float64, opt Options) (*Report, error) {
	// The report holds the price table with the site equipment's charges,
	// so that every ledger line points into it.
	t, err := p.SitePrices(t)
	if err != nil {
		return nil, err
	}
	hold := opt.Hold
	if hold <= 0 {
		hold = HeldMasses
	}
	c, err := collect(p, t, massesKg, p.MethodNames(), hold)
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
		Results:      c.results,
		rows:         c.rows,
		plan:         p,
		Coefficients: p.Coefficients(),
		Cautions:     p.Cautions(),
		Equipment:    p.Equipment,
	}
	r.TargetKg, r.TargetWhy = sc.TargetKg, "target_mass in the scenario"
	for _, in := range sc.Inputs {
		if in.Field == "target_mass" && in.Written == "(not given)" {
			r.TargetWhy = "the scenario's largest batch mass"
		}
	}
	if opt.TargetKg > 0 {
		r.TargetKg, r.TargetWhy = opt.TargetKg, opt.TargetWhy
	}
	r.Waste = c.waste
	r.Warnings = c.warn.list()
	r.Greenness = greenness(p)
	r.WasteSector = p.WasteSector.String()
	r.Coefficients = append(r.Coefficients, waste.Sources()...)
	r.Coefficients = append(r.Coefficients, green.Sources()...)
	r.Coefficients = append(r.Coefficients, DecisionCoefficients()...)
	if r.Decision, err = Decide(p, t, r.TargetKg); err != nil {
		return nil, err
	}
	if r.Assumptions, err = FindAssumptions(p, t, r.TargetKg); err != nil {
		return nil, err
	}
	markFlips(r.Assumptions, r.Decision)
	if opt.Draws > 0 {
		if r.Uncertainty, err = SampleAcross(p, t, r.TargetKg, Thin(massesKg, MaxBandMasses), opt.Draws, opt.Seed, opt.Progress); err != nil {
			return nil, err
		}
		r.Decision.weigh(r.Uncertainty)
		if r.Decision.Winner != "" && r.Decision.RunnerUp != "" {
			r.Decision.Explanation = append(r.Decision.Explanation, r.Uncertainty.AdviceLines(3)...)
		}
	}
	if sc.Campaign != nil {
		sp := *sc.Campaign
		if !sp.BatchGiven {
			sp.BatchKg = r.TargetKg
		}
		if r.Campaign, err = RunCampaign(p, t, &sp); err != nil {
			return nil, err
		}
		r.Coefficients = append(r.Coefficients, CampaignCoefficients()...)
		r.Decision.onCampaign(r.Campaign)
		if w, ok := r.Campaign.Cost(r.Campaign.Winner); ok {
			// The contingency comes from the draws at the campaign's own
			// batch mass.
			u := r.Uncertainty
			if u != nil && sp.BatchKg != u.TargetKg {
				if u, err = Sample(p, t, sp.BatchKg, opt.Draws, opt.Seed, nil); err != nil {
					return nil, err
				}
			}
			r.Budget = NewBudget(w, u)
			r.Budget.CapitalItems = r.Campaign.Capital[w.Method]
		}
	}
	for _, in := range sc.Inputs {
		r.Inputs = append(r.Inputs, Input(in))
	}
	if sc.Notes != "" {
		r.Notes = append(r.Notes, usage.Note{Level: usage.Info, Text: sc.Notes})
	}
	if n := unusedNote(t, c.used); n != nil {
		r.Notes = append(r.Notes, *n)
	}
	return r, nil
}
