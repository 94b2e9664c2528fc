package distil

import (
	"fmt"
	"math"
	"strings"

	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// The notes and reasons of the distillation model, in words.

func degC(T float64) float64 { return T - 273.15 }

func (m *Model) compoundNotes(u *usage.Usage, o *outcome) {
	for _, s := range []species{o.P, o.I} {
		if len(s.defaults) > 0 {
			u.Notef(usage.Info, "%s: %s.", s.name, strings.Join(s.defaults, "; "))
		}
	}
	if m.d.FeedFromCrude {
		u.Notef(usage.Info, "The still charge is the crude at %.3g %% product (crude.purity); the other %.3g %% is all taken as the key impurity, the cautious case.", o.wF*100, (1-o.wF)*100)
	}
}

func (m *Model) reportVolatile(u *usage.Usage, o *outcome) {
	if o.productLight {
		u.Notef(usage.Info, "The product is the more volatile component: it is distilled over as the heart cut and the key impurity stays in the pot.")
	} else {
		u.Notef(usage.Info, "The product is the less volatile component: the key impurity is distilled off and the purified product is the pot residue (non-volatile impurities stay with it; the model treats the crude as a binary).")
	}
}

func (m *Model) pressureNotes(u *usage.Usage, o *outcome) {
	d, dp := m.d, m.p.pressureDrop
	if o.pr.Vacuum {
		u.Notef(usage.Info, "Operating pressure: %.3g mbar at the head (%.3g mbar in the pot after %.3g mbar per theoretical stage), the highest at which the pot stays at or below %.1f °C. The pot temperature is taken as the boiling point of the less volatile component (%s) at the pot pressure, the upper bound it approaches as the pot is depleted; the charge starts boiling lower, at its bubble point.", o.pr.Head/100, o.pr.Pot/100, dp/100, degC(d.MaxPotK), o.heavy.name)
		u.Notef(usage.Caution, "The pot is run up to its stability limit of %.1f °C: that limit must already include the safety margin your site requires below the decomposition onset found by DSC or ARC.", degC(d.MaxPotK))
	} else {
		u.Notef(usage.Info, "The less volatile component (%s) boils at %.1f °C at atmospheric pressure, below the pot limit of %.1f °C: no vacuum is needed.", o.heavy.name, degC(o.tPot), degC(d.MaxPotK))
	}
}

func (m *Model) vapourNotes(u *usage.Usage, o *outcome) {
	for _, c := range []struct {
		s        species
		in1, in2 bool
		t1, t2   float64
	}{{o.light, o.inLT && o.inHead, o.inLB, o.tHead, o.tPot}, {o.heavy, o.inHT, o.inHB && o.inPot, o.tHead, o.tPot}} {
		if c.s.antoine && !(c.in1 && c.in2) {
			a := c.s.sv.Antoine[0]
			if len(c.s.sv.Antoine) > 1 {
				u.Notef(usage.Warning, "%s: at least one of %.1f °C and %.1f °C lies outside every Antoine range; the vapour pressure there is extrapolated.", c.s.name, degC(c.t1), degC(c.t2))
			} else {
				u.Notef(usage.Warning, "%s: %.1f–%.1f °C reaches outside the Antoine constants' range (%.1f–%.1f °C); the vapour pressure there is extrapolated.", c.s.name, degC(math.Min(c.t1, c.t2)), degC(math.Max(c.t1, c.t2)), degC(a.Tmin), degC(a.Tmax))
			}
		}
		if !c.s.antoine {
			u.Notef(usage.Info, "%s: vapour pressure by the Clausius–Clapeyron equation from the normal boiling point (%.1f °C) and ΔHvap %.1f kJ/mol; good to a few per cent within about 10 K of the boiling point; some 5–10 %% high 30 K below it, where the true ΔHvap is larger.", c.s.name, degC(c.s.sv.BoilingPoint.V), c.s.hvap/1000)
		}
	}
}

func (m *Model) volatilityNote(u *usage.Usage, o *outcome) {
	u.Notef(usage.Info, "Relative volatility from Raoult's law (ideal solution, pure-component vapour pressures): α = %.3g at the head and %.3g in the pot; their geometric mean %.3g is used.", o.aTop, o.aBot, o.alpha)
}

func (m *Model) azeotropeNote(u *usage.Usage, o *outcome) {
	if az := m.d.Azeotrope; az != nil {
		u.Notef(usage.Warning, "An azeotrope is declared at %.3g %% product. Distillation cannot cross it; between it and the pure product the real volatility is lower than the ideal α used here, so stages, reflux and recovery are optimistic.", az.ProductFraction*100)
	}
}

func (m *Model) shortcutNote(u *usage.Usage, o *outcome) {
	u.Notef(usage.Info, "Shortcut design: the still charge is treated as the saturated-liquid feed of a continuous column making %.3g %% product at %.0f %% recovery (Fenske N_min %.3g, Underwood R_min %.3g, Gilliland correlation in Molokanov's form). These methods are for continuous columns; the batch is estimated as a constant-reflux batch in which column and pot act as one stage of relative volatility α^N_eq, N_eq being the total-reflux equivalent of the column at the reflux used (Gilliland solved for N_min), followed by the Rayleigh equation. That equivalent stage ignores the rise of the minimum reflux as the pot is depleted, so the tails (product left in the pot) are underestimated; fore-run and hold-up losses are not affected.", o.wT*100, m.p.designRecovery*100, o.nMin, math.Max(o.rMin, 0))
}

func (m *Model) stagesNote(u *usage.Usage, o *outcome) {
	stages := m.d.ColumnStages
	switch {
	case o.rMin <= 0:
		u.Notef(usage.Info, "One equilibrium stage already makes the target from the charge (R_min ≤ 0): the still is run as a simple distillation%s.", map[bool]string{true: " through the column without reflux", false: ""}[stages > 0])
	case stages == 0:
		u.Notef(usage.Info, "Simple distillation (no column, no reflux): one equilibrium stage, the Rayleigh equation at α exactly.")
	}
}

func (m *Model) batchesNote(u *usage.Usage, o *outcome) {
	if o.st.Batches > 1 {
		u.Notef(usage.RepeatLevel(o.st.Batches), "The charge (%.3g L) is more than the largest still (%.3g L at %.0f %% fill) holds: %d batches of %s.", o.crudeKg/o.rhoMix*1000, o.st.Volume*1000, o.fill*100, o.st.Batches, units.FormatMass(o.mBatch))
	}
}

func (m *Model) residueNote(u *usage.Usage, o *outcome) {
	if o.br.Limited && o.productLight {
		u.Notef(usage.Info, "The product cut ends where %.0f %% of the charge is left in the pot (never distil to dryness), before its purity falls to the target.", m.p.minResidue*100)
	}
}

func (m *Model) recoveryNote(u *usage.Usage, o *outcome) {
	if r := u.ProductOutKg / u.ProductInKg; r < 0.5 {
		u.Notef(usage.Warning, "Only %.0f %% of the product is recovered: %s", r*100, map[bool]string{true: "a column with more stages or more reflux would give a larger heart cut, and the tails can be recycled into the next batch.", false: "a column with reflux would hold more product back in the pot."}[o.productLight])
	}
}

func (m *Model) energyNotes(u *usage.Usage, o *outcome) {
	p := m.p
	u.Notef(usage.Info, "Energy: (R + 1) × distillate × ΔHvap plus the sensible heat of the charge to the pot temperature; ΔHvap is taken at the normal boiling point (a few per cent low at reduced pressure). The condenser removes the vaporization heat through a chiller.")
	if o.tHead < p.coolant+p.condenserMargin {
		u.Notef(usage.Warning, "The head temperature (%.1f °C) is within %.0f K of the condenser coolant (%.1f °C) or below it: %s will pass the condenser into the cold trap unless a colder condenser is used.", degC(o.tHead), p.condenserMargin, degC(p.coolant), o.light.name)
	}
	if m.d.ColumnStages > 0 && o.pr.Vacuum {
		u.Notef(usage.Info, "Under vacuum the vapour volume is large; check that the boil-up of %.2g L/h does not flood the column.", o.boil*3.6e6)
	}
	if o.crew > 1 {
		u.Notef(usage.Info, "Plant still (%s): %.3g operators attend the set-up, charging, draining and cleaning, and the watched share of the distillation; liquids move at %.3g L/min and cleaning grows with the still's wall area.", units.FormatVolume(o.st.Volume), o.crew, p.transferRate*60e3)
		u.Notef(usage.Caution, "A plant still holds tens of litres of hot flammable liquid under vacuum: inert it before letting air in, keep the vacuum and heating interlocks the site requires, and run it within the pressure and temperature limits the site has approved. Follow local codes and licensed practice.")
	}
}

func (m *Model) classNote(u *usage.Usage, o *outcome) {
	if !o.P.halogenated && !o.I.halogenated {
		u.Notef(usage.Info, "Waste streams are classed as non-halogenated: neither compound is marked as halogenated.")
	}
}

// Reasons a run stops.

func failNoPressure(maxPot, pP, pI float64) string {
	return fmt.Sprintf("the vapour pressures at the pot limit %.1f °C cannot be evaluated (product %.3g Pa, impurity %.3g Pa); check the boiling points and Antoine constants", degC(maxPot), pP, pI)
}

func (m *Model) failVacuum(o *outcome) string {
	d, stages, dp := m.d, m.d.ColumnStages, m.p.pressureDrop
	if !(o.pr.Head > 0) {
		return fmt.Sprintf("the column's pressure drop (%d stages × %.3g mbar) exceeds the %.3g mbar at which %s boils at the pot limit of %.1f °C; use a shorter column or a short-path still", int(math.Round(stages)), dp/100, o.psatH/100, o.heavy.name, degC(d.MaxPotK))
	}
	potBest := d.BestVacuumPa + stages*dp
	tBest, _ := o.heavy.boilingAt(potBest)
	return fmt.Sprintf("pot temperature above the limit even at the best vacuum: at the pump's %.3g mbar (%.3g mbar in the pot) %s boils at %.1f °C, above the limit of %.1f °C; keeping under the limit needs %.3g mbar at the head", d.BestVacuumPa/100, potBest/100, o.heavy.name, degC(tBest), degC(d.MaxPotK), o.pr.Head/100)
}

func failBoiling(pr Pressures) string {
	return fmt.Sprintf("the boiling points at %.3g mbar (head) and %.3g mbar (pot) cannot be evaluated from the compounds' data; check the boiling points and Antoine constants", pr.Head/100, pr.Pot/100)
}

func failCrossing(aTop, aBot float64) string {
	return fmt.Sprintf("the vapour-pressure curves of the product and the impurity cross between the head (α %.3g) and the pot (α %.3g): an ideal solution cannot be separated across that point, and a real one very likely forms an azeotrope there", aTop, aBot)
}

func failAlpha(alpha, min float64) string {
	return fmt.Sprintf("relative volatility α = %.4g is too close to 1 (below %.3g): distillation would need more than about %.0f theoretical stages", alpha, min, Fenske(0.9, 0.1, alpha))
}

func failAzeotrope(az, wF, wT float64) string {
	return fmt.Sprintf("the declared azeotrope at %.3g %% product lies between the feed (%.3g %%) and the target (%.3g %%): distillation cannot cross an azeotrope", az*100, wF*100, wT*100)
}

func failStages(o *outcome, stages float64) string {
	if math.IsInf(o.nReq, 1) {
		return fmt.Sprintf("at the minimum reflux (multiple %.3g) a column needs infinitely many stages; raise reflux_multiple above 1", o.mult)
	}
	if math.IsInf(o.rAvail, 1) {
		return fmt.Sprintf("needs %.1f equilibrium stages (pot included) at reflux %.3g; the column has %.3g above the pot, fewer than the minimum %.1f even at total reflux", o.nReq, o.R, stages, o.nMin)
	}
	return fmt.Sprintf("needs %.1f equilibrium stages (pot included) at reflux %.3g (%.3g × R_min); the column has %.3g above the pot. A reflux ratio of %.3g (%.3g × R_min) would do with this column", o.nReq, o.R, o.mult, stages, o.rAvail, o.rAvail/o.rMin)
}

func failHoldup(o *outcome) string {
	return fmt.Sprintf("the still head and column hold about %.2g mL, %.0f %% of the %.2g mL charge in the smallest suitable still (%s): too small a batch for this apparatus; a bulb-to-bulb short-path distillation or a larger batch would suit", o.vHold*1e6, o.holdShare*100, o.st.Charge*1e6, units.FormatVolume(o.st.Volume))
}

func (m *Model) failUnreachable(o *outcome) string {
	wT := o.wT
	if o.productLight {
		if m.d.ColumnStages == 0 {
			return fmt.Sprintf("simple distillation cannot reach %.3g %%: the first distillate holds only %.3g %% product; a column of about %.0f equilibrium stages at a reflux of %.2g is needed", wT*100, o.firstDrop*100, math.Ceil(GillilandStages(o.nMin, o.mult*o.rMin, o.rMin)), o.mult*o.rMin)
		}
		return fmt.Sprintf("the column at reflux %.3g gives a first distillate of only %.3g %% product, below the %.3g %% wanted; raise reflux_multiple or use more stages", o.R, o.firstDrop*100, wT*100)
	}
	return fmt.Sprintf("distilling the impurity off until the pot holds %.3g %% product would leave less than the %.0f %% of the charge that must stay in the pot (never distil to dryness); a column or a reflux would keep more product back", wT*100, m.p.minResidue*100)
}
