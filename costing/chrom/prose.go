package chrom

import (
	"fmt"
	"math"

	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Sentences a user reads about the separation; the physics is in
// analyse.go, the report in model.go, build.go and waste.go.

// separationNotes words the separation: which band elutes first, a ΔRf or
// Rf outside the range the loading models hold for, and how the two
// loading rules compare.
func (a analysis) separationNotes(u *usage.Usage, ch *scenario.Chromatography, coef source.Set) {
	note := u.Notef
	if a.first {
		note(usage.Info, "The product runs above the nearest impurity (Rf %.2f vs %.2f) and elutes first.", ch.ProductRf, ch.ImpurityRf)
	} else {
		note(usage.Info, "The product runs below the nearest impurity (Rf %.2f vs %.2f) and elutes after it.", ch.ProductRf, ch.ImpurityRf)
	}
	if a.dRf < 0.05 {
		note(usage.Warning, "ΔRf %.3f is below 0.05: one flash pass is unlikely to separate; look for a better eluent first.", a.dRf)
	} else if a.dRf < StillHardDeltaRf {
		note(usage.Warning, "ΔRf %.3f is below the 0.1 of Still's table: the table's loading is extrapolated.", a.dRf)
	}
	if ch.ProductRf < 0.15 || ch.ProductRf > 0.45 {
		note(usage.Warning, "Product Rf %.2f is outside about 0.15–0.45, the range the loading models are calibrated for (Still et al. 1978 aim at 0.35).", ch.ProductRf)
	}
	theory := math.Max(a.ratioTheory, a.ratioCeil)
	if f := theory / a.ratioTable; f > coef.Get(KeyRouteTolerance) || f < 1/coef.Get(KeyRouteTolerance) {
		note(usage.Warning, "The two loading rules differ by a factor %.1f: elution theory (bounded by the ceiling) %.0f : 1, Still's table %.0f : 1; the silica is sized by %s.", math.Max(f, 1/f), theory, a.ratioTable, a.why)
	} else {
		note(usage.Info, "Silica sized by %s; elution theory %.0f : 1, Still's table %.0f : 1.", a.why, theory, a.ratioTable)
	}
}

// infeasible says why no loading reaches the purity, and what ΔRf would.
func (a analysis) infeasible(coef source.Set) string {
	need := a.deltaRfNeeded(coef)
	why := fmt.Sprintf("no loading up to %.0f : 1 silica : crude gives a cut of %.4g %% purity holding at least %.0f %% of the product: ΔRf %.3f on a bed of about %.0f theoretical plates",
		coef.Get(KeyMaxRatio), a.target*100, coef.Get(KeyMinRecovery)*100, a.dRf, a.plates)
	if math.IsNaN(need) {
		return why + "; no eluent that keeps the product's Rf would do at this purity"
	}
	return why + fmt.Sprintf("; an eluent giving ΔRf ≥ %.3f would", need)
}

// equipmentNotes words the equipment chosen: repeated runs, a large
// column's static and pressure caution, a loading far above the usual.
func (p *runPlan) equipmentNotes(u *usage.Usage, coef source.Set) {
	if u.Quiet { // the notes' numbers would be worded for nothing
		return
	}
	e := p.e
	if e.runs > 1 {
		u.Notef(usage.RepeatLevel(e.runs), "The batch needs %.3g kg of silica, more than the largest %s holds: %d runs of %s of crude each.%s", u.CrudeKg*p.ratio, kindWord(e), e.runs, units.FormatMass(p.crudeRun), impractical(e.runs, kindWord(e)+" runs"))
	}
	if e.diameter > 0.3 && e.cartridge == nil {
		u.Notef(usage.Caution, "A %.0f mm column runs %.0f L/min of flammable eluent: bond and earth the column, lines and receivers against static charge, stay within the column's pressure rating, and have the set-up reviewed under your site's process-safety rules.", e.diameter*1000, coef.Get(KeyFrontVelocity)*math.Pi*e.diameter*e.diameter/4*60000)
	}
	if r := e.silicaRun * p.runs / u.CrudeKg; r > 300 {
		u.Notef(usage.Warning, "Silica : crude of %.0f : 1 is far above the usual 20–150 : 1; a better eluent, a longer column or another method will pay.", r)
	}
}

// kindWord names the kind of equipment in a sentence.
func kindWord(e equip) string {
	if e.cartridge != nil {
		return "cartridge"
	}
	return "column"
}

// evaporatorNote says which evaporator was taken and why.
func (p *runPlan) evaporatorNote(u *usage.Usage, evapRun float64, what string, left float64) {
	if u.Quiet {
		return
	}
	u.Notef(usage.Info, "Evaporator: %s (%.3g L/h), the smallest the site lists that takes a run's %.3g L of %s within the %.1f h the working day leaves after the column work, or else the fastest.",
		p.ev.Name, p.ev.Rate*3.6e6, evapRun*1000, what, left/3600)
}

// weekNote warns when the runs exceed one chemist's working week.
func (p *runPlan) weekNote(u *usage.Usage, elapsed, attended, day, week float64) {
	if !u.Quiet && attended > week || elapsed > week {
		u.Notef(usage.Warning, "%d runs take %.0f h elapsed (%.1f working days of %.0f h), %.0f h of them at the bench: more than one chemist's working week of %.0f h; plan larger equipment, a second chemist or another method.", int(p.runs), elapsed, elapsed/day, day, attended, week)
	}
}

// cutNote says how much of the eluted product the pure cut keeps.
func (p *runPlan) cutNote(u *usage.Usage, a analysis) {
	if !u.Quiet && p.cut.Recovery < 0.9 {
		u.Notef(usage.Info, "The cut for %.4g %% purity keeps %.0f %% of the eluted product; the rest is in mixed fractions.", a.target*100, p.cut.Recovery*100)
	}
}

// impractical adds, from usage.ManyRepeats repeats on, why the plan is
// impractical as it stands.
func impractical(n int, what string) string {
	if n < usage.ManyRepeats {
		return ""
	}
	return fmt.Sprintf(" %d %s are impractical as one batch: a larger column (process equipment) or another method would serve.", n, what)
}
