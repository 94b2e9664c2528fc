package cryst

import (
	"fmt"
	"math"

	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// The notes and reasons of the crystallization model, in words.

func degC(T float64) float64 { return T - 273.15 }

// solubilityNotes: an ideal-solubility estimate, extrapolation beyond the
// measured points, no molar mass, dissolution at reflux, a dilute batch.
func (m *Model) solubilityNotes(u *usage.Usage, o *outcome) {
	cr, p := m.cr, m.p
	TH, TC := cr.DissolveK, cr.IsolateK
	note := u.Notef
	if d := cr.Product.Curve.Ideal; d != nil {
		note(usage.Info, "The product's solubility is an ideal-solubility estimate (Schröder–van Laar) from its melting point %.1f °C and enthalpy of fusion %.3g kJ/mol, divided by an activity factor of %.3g: %.3g g/L at %.1f °C and %.3g g/L at %.1f °C. Measure it before relying on the cost.",
			degC(d.Tm), d.Hfus/1000, d.Gamma, o.sHot, degC(TH), o.sCold, degC(TC))
	}
	extrap := func(who string, c interface{ Outside(float64) float64 }, T float64) {
		if d := c.Outside(T); d > p.extrapolation {
			note(usage.Warning, "The %s's solubility at %.1f °C is extrapolated %.0f K beyond the measured points; the van 't Hoff line is a guess that far out.", who, degC(T), d)
		}
	}
	extrap("product", cr.Product.Curve, TH)
	extrap("product", cr.Product.Curve, TC)
	if !cr.ImpurityByPurge {
		extrap("impurity", cr.Impurity.Curve, TH)
		extrap("impurity", cr.Impurity.Curve, TC)
	}
	if cr.Product.MolarMass == 0 {
		note(usage.Info, "No molar mass for the product: the heat of dissolution and crystallization is left out of the energy and the heating and cooling times.")
	}
	if TH > cr.BoilingK-1 {
		note(usage.Caution, "The crude is dissolved at the boiling point of %s (about %.1f °C): work at reflux with a condenser, and keep flammable vapour away from ignition sources.", cr.Mix, degC(cr.BoilingK))
	}
	if vpg := (1 + p.excess) / o.sHot; vpg > p.dilution {
		note(usage.Warning, "The crystallization needs %.0f mL of solvent per g of product, above about %.0f: it is dilute; a solvent that dissolves more when hot would pay.", vpg*1000, p.dilution*1000)
	}
	if o.feed.Other > 0 {
		note(usage.Info, "%.3g %% of the crude is impurity other than the one described; it is taken to stay in the mother liquor.", o.feed.Other/o.crudeKg*100)
	}
	if !cr.ImpurityByPurge && cr.Distribution == nil {
		note(usage.Info, "The impurity's uptake by the crystals uses the default logarithmic distribution coefficient λ = %.3g (crystallization.impurity_distribution), an assumption: a structurally related impurity can reach 0.1–1 and set a purity ceiling. Measure it (crystallization.impurity.distribution_coefficient).", p.distribution)
	}
}

// passNotes: co-crystallization, a wash loss above the solubility,
// impurity left undissolved.
func (m *Model) passNotes(u *usage.Usage, o *outcome) {
	TH, TC := m.cr.DissolveK, m.cr.IsolateK
	washLoss := m.cr.WashLoss != nil
	for i, r := range o.purify.Passes {
		if r.CoCrystallised > 0 {
			u.Notef(usage.Warning, "Pass %d: %.3g %% of the impurity exceeds its solubility at %.1f °C (%.3g g/L) and co-crystallises with the product.", i+1, r.CoCrystallised/r.In.Impurity*100, degC(TC), o.impCold)
		}
		if washLoss && r.Wash > 0 && r.WashDissolved/r.Wash > o.sCold*(1+1e-9) {
			u.Notef(usage.Warning, "Pass %d: the stated wash loss needs the wash to carry %.3g g/L of product, above its solubility at %.1f °C (%.3g g/L); check wash_loss and the wash volume.", i+1, r.WashDissolved/r.Wash, degC(TC), o.sCold)
		}
		if r.Undissolved > 0 {
			u.Notef(usage.Warning, "Pass %d: part of the impurity does not dissolve at %.1f °C; a hot filtration would remove it (not modelled: it is counted in the cake).", i+1, degC(TH))
		}
	}
}

// reason says why the target purity is not reached.
func (m *Model) reason(o *outcome) string {
	cr := m.cr
	switch o.purify.Stop {
	case NoCrystals:
		return fmt.Sprintf("nothing crystallises: with %.3g %% excess solvent the liquor holds (1 + excess)·S_cold/S_hot = %.3g of the product at %.1f °C", m.p.excess*100, (1+m.p.excess)*o.sCold/o.sHot, degC(cr.IsolateK))
	case Stalled:
		ps := o.purify.Passes
		last := ps[len(ps)-1]
		why := "the liquor retained in the cake and the occluded liquor carry the impurity over faster than the passes purge it"
		switch {
		case last.CoCrystallised > 0:
			why = fmt.Sprintf("the impurity exceeds its solubility at the isolation temperature (%.3g g/L against the product's %.3g g/L) and co-crystallises with the product, so a further pass does not raise the purity", o.impCold, o.sCold)
		case last.Incorporated > last.Included:
			why = fmt.Sprintf("the crystals take up the impurity (logarithmic distribution coefficient λ = %.3g): a pass leaves its ratio to the product multiplied by about %.3g, so passes do not purify; a solvent in which the two differ more, or another method, is needed", m.p.distribution, stallFactor(last))
		case cr.ImpurityByPurge && cr.PurgeFactor == 0:
			why = "a purge factor of 0 removes none of the impurity"
		}
		best := o.feed.Purity()
		for _, r := range ps {
			best = math.Max(best, r.Out.Purity())
		}
		return fmt.Sprintf("target purity %.4g %% not reachable: passes do not raise the purity past %.4g %% (crude %.4g %%, %d pass(es) run); %s", cr.TargetPurity*100, best*100, o.feed.Purity()*100, len(ps), why)
	case TooManyPasses:
		last := o.purify.Passes[len(o.purify.Passes)-1]
		why := "the liquor occluded in the crystals"
		switch {
		case last.CoCrystallised > last.Incorporated && last.CoCrystallised > last.Included:
			why = "the impurity co-crystallised above its solubility"
		case last.Incorporated > last.Included:
			why = fmt.Sprintf("the crystals take up the impurity (logarithmic distribution coefficient λ = %.3g)", m.p.distribution)
		case cr.ImpurityByPurge:
			why = fmt.Sprintf("the impurity the purge factor (%.3g) leaves", cr.PurgeFactor)
		}
		return fmt.Sprintf("target purity %.4g %% not reachable in %d passes (the most run on one batch): %.4g %% after the last, whose crystals hold the impurity at a ceiling of %.4g %% that no wash improves, set by %s; a more selective solvent or another method is needed", cr.TargetPurity*100, m.p.maxPasses, o.purify.Purity*100, last.Ceiling()*100, why)
	}
	return ""
}

// stallFactor is the ratio of impurity to product after a pass over that
// before it.
func stallFactor(r PassResult) float64 {
	if r.In.Product <= 0 || r.Out.Product <= 0 || r.In.Impurity <= 0 {
		return math.NaN()
	}
	return (r.Out.Impurity / r.Out.Product) / (r.In.Impurity / r.In.Product)
}

// cropNotes: the second crop taken, skipped or empty.
func (m *Model) cropNotes(u *usage.Usage, o *outcome) {
	k := o.crop
	if !k.described {
		return
	}
	sc2, TC := m.cr.SecondCrop, m.cr.IsolateK
	switch {
	case k.crop.Product <= 0:
		u.Notef(usage.Info, "No second crop: the mother liquor concentrated to %.0f %% still holds all its product at %.1f °C.", sc2.ConcentrateTo*100, degC(TC))
	case !k.taken:
		u.Notef(usage.Info, "Second crop skipped: at %.4g %% purity it would bring the combined product to %.4g %%, below the target %.4g %%.", sc2.Purity*100, k.blend.Purity()*100, m.cr.TargetPurity*100)
	default:
		u.AddFigure("second_crop", "second crop recovered", k.crop.Product, "g")
		u.Notef(usage.Info, "A second crop of %s (%.4g %% product) from the last mother liquor, evaporated to %.0f %% of its volume, is combined with the first: %.4g %% purity.", units.FormatMass(k.crop.Total()), sc2.Purity*100, sc2.ConcentrateTo*100, k.blend.Purity()*100)
	}
}

// scaleNotes: batches above the largest vessel, screening crude above the
// batch, and how the hours at reactor scale are reckoned.
func (m *Model) scaleNotes(u *usage.Usage, o *outcome) {
	p := m.p
	b := o.plans[0]
	if b.vessel.Batches > 1 {
		fill := p.flaskFill
		if b.vessel.Reactor {
			fill = p.reactorFill
		}
		u.Notef(usage.RepeatLevel(b.vessel.Batches), "The batch needs %.3g L of liquid, more than the largest vessel (%.4g L at %.0f %% fill) holds: %d batches run one after another.", b.liquid*1000, b.vessel.Volume*1000, fill*100, b.vessel.Batches)
	}
	if b.vessel.Reactor {
		A, _, _ := m.filterOf(o.purify.Passes[0], b)
		u.Notef(usage.Info, "Reactor scale: %.3g operators attend each hands-on step; liquids move at %.3g L/min and solids are charged at %.3g kg/h; the slurry is filtered on a %.2g m² pressure filter sized with the reactor (Darcy's law, specific cake resistance %.2g m/kg) and dried there to %.2g %% loss on drying; cleaning grows with the wall area.",
			b.crew, p.transferRate*60e3, p.solidChargeRate*3600, A, p.cakeResistance, p.lodTarget*100)
		u.Notef(usage.Caution, "At reactor scale: charging solids into a vessel that holds flammable solvent can ignite the vapour by static discharge, so inert the vessel and charge by the site's procedure; a pressure filter works under gas pressure, so relieve it before opening; and the operating limits of the reactor and filter are those the site has approved. Follow local codes and licensed practice.")
	}
	if p.screeningMass > o.crudeKg {
		u.Notef(usage.Warning, "Screening uses %s of crude, more than the batch itself (%s): the plan is impractical at this scale, and the development cost dominates.", units.FormatMass(p.screeningMass), units.FormatMass(o.crudeKg))
	}
}
