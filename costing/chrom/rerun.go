package chrom

import (
	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// rerun pools the mixed fractions of the first pass (the product outside
// the pure cut and the impurity eluted with it), evaporates them and runs
// them once more at the same silica : crude on the same kind of equipment.
// It returns the second pass's usage, or nil when the mixed fractions are
// too small to run or the second cut is not usable (then they are set
// aside, and a note says so).
func (p *runPlan) rerun(u *usage.Usage, a analysis, sc *scenario.Scenario, coef source.Set, site Site) *usage.Usage {
	eluted := u.ProductInKg * (1 - coef.Get(KeyRetainedLoss))
	mp := eluted * p.cut.Mixed
	mi := u.CrudeKg * sc.NearestImpurity * p.cut.MixedImpurity
	if mp <= 1e-9*u.ProductInKg {
		return nil
	}
	crude2 := mp + mi
	sc2 := *sc
	ch2 := *sc.Chromatography
	ch2.RerunMixed = false
	sc2.Chromatography = &ch2
	sc2.Purity, sc2.NearestImpurity = mp/crude2, mi/crude2
	a2 := a
	a2.sep.Product, a2.sep.Impurity = sc2.Purity, sc2.NearestImpurity
	var e2 *equip
	for _, e := range equipmentFor(a2, coef, site, crude2*p.ratio, crude2) {
		if (e.cartridge != nil) == (p.e.cartridge != nil) {
			e := e
			e2 = &e
		}
	}
	if e2 == nil {
		return nil
	}
	v := usage.New(Method, crude2, mp)
	v.Quiet = u.Quiet
	build(&v, a2, &sc2, coef, site, *e2, p.ratio, nil)
	if !v.Feasible {
		if u.Quiet {
			return nil
		}
		u.Notef(usage.Info, "The mixed fractions (%s of product) cannot be cut to the purity asked on a second run (%s): they are set aside.", units.FormatMass(mp), v.Reason)
		return nil
	}
	p.rerunP, p.rerunI = mp, mi
	return &v
}

// mergeRerun adds the second pass to the first: its product, impurity,
// materials, time, waste and notes, each labelled as the re-run's.
func mergeRerun(u, v *usage.Usage) {
	gained := v.ProductOutKg
	u.ProductOutKg += gained
	u.ImpurityOutKg += v.ImpurityOutKg
	u.AddFigure("rerun_crude", "mixed fractions run again (product and impurity)", v.CrudeKg, "g")
	u.AddFigure("rerun_product", "product recovered from the mixed fractions", gained, "g")
	if f, ok := v.Figure(usage.FigImpurityInProduct); ok {
		for i := range u.Figures {
			if u.Figures[i].Key == usage.FigImpurityInProduct {
				u.Figures[i].SI += f.SI
			}
		}
	}
	for i := range u.Figures {
		switch f := &u.Figures[i]; f.Key {
		case "recovery":
			f.SI = u.ProductOutKg / u.ProductInKg
		case "working_days", "evaporation_hours":
			if g, ok := v.Figure(f.Key); ok {
				f.SI += g.SI
			}
		}
	}
	streams := len(u.Waste) // the re-run's streams follow the first run's
	for _, d := range v.Demands {
		d.Label = "re-run: " + d.Label
		if d.Stream > 0 {
			d.Stream += streams
		}
		u.Demands = append(u.Demands, d)
	}
	for _, s := range v.Waste {
		s.Name = "re-run: " + s.Name
		u.Waste = append(u.Waste, s)
	}
	for _, a := range v.Activities {
		a.Name = "re-run: " + a.Name
		u.Activities = append(u.Activities, a)
	}
	u.Equipment += "; mixed fractions re-run on " + v.Equipment
	u.EquipmentID += "; mixed fractions re-run on " + v.EquipmentID
	if u.Quiet {
		return
	}
	u.Notef(usage.Info, "The mixed fractions (%s of crude) are pooled, evaporated and run once more at the same loading: %s more product, %.1f %% of the product in the crude.",
		units.FormatMass(v.CrudeKg), units.FormatMass(gained), gained/u.ProductInKg*100)
}
