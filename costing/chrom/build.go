package chrom

import (
	"fmt"
	"math"
	"strconv"

	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/usage"
)

// runPlan is one candidate's quantities per run, filled step by step.
type runPlan struct {
	e          equip
	ratio      float64
	runs       float64
	crudeRun   float64
	v0         float64 // m³ column volume
	flow       float64 // m³/s
	cut        Cut
	plates     float64
	bandCV     float64
	used       vols // per run
	evaporated vols // product fractions, per run
	dryLoad    vols // dry-load solvent evaporated before the column, per run
	drySilica  float64
	fracSize   float64
	fractions  float64
	plates2    float64 // TLC plates per run
	rerunP     float64 // kg of product in the mixed fractions sent to a second run
	rerunI     float64 // kg of impurity going with it
	prodFrac   float64
	productVol float64
	ev         SiteEvaporator
	evapHours  float64 // h over all runs
	colHours   float64 // h over all runs
}

// bedCut is a candidate's plates and cut at its own bed, which depend
// only on the equipment, the loading and the analysis.
type bedCut struct {
	plates float64
	cut    Cut
}

// build fills one candidate's usage: equipment, cut at its own bed,
// eluent, fractions, time, energy, product, waste and demands. known,
// when not nil, is the plates and cut an earlier build of the same
// candidate found; build returns those it used.
func build(u *usage.Usage, a analysis, sc *scenario.Scenario, coef source.Set, site Site, e equip, ratio float64, known *bedCut) bedCut {
	p := &runPlan{e: e, ratio: ratio, runs: float64(e.runs), crudeRun: u.CrudeKg / float64(e.runs)}
	get := coef.Get
	p.v0 = e.silicaRun * ColumnVolumePerMass(get(KeyBedDensity), get(KeySkeletalDensity))
	if known != nil {
		p.plates, p.cut = known.plates, known.cut
	} else {
		p.plates = platesFor(coef, e.bedHeight)
		p.cut = a.cutAt(p.crudeRun/e.silicaRun, p.plates)
	}
	bc := bedCut{plates: p.plates, cut: p.cut}
	if !usable(p.cut, coef) {
		u.Feasible = false
		u.Reason = fmt.Sprintf("on %s the bed of %.0f cm (%.0f plates) gives a cut of %.1f %% recovery at %.4g %% purity", e.name, e.bedHeight*100, p.plates, p.cut.Recovery*100, a.target*100)
		return bc
	}
	p.equipmentFigures(u, coef)
	p.eluent(u, sc, coef)
	p.fractionsAndTLC(u, sc, coef)
	p.times(u, sc, coef, site)
	p.product(u, a, coef)
	var second *usage.Usage
	if sc.Chromatography.RerunMixed {
		second = p.rerun(u, a, sc, coef, site)
	}
	p.wasteAndDemands(u, a, sc, coef)
	if second != nil {
		mergeRerun(u, second)
	}
	return bc
}

// equipmentFigures reports the equipment and the silica.
func (p *runPlan) equipmentFigures(u *usage.Usage, coef source.Set) {
	e, fig := p.e, u.AddFigure
	fig("ratio_used", "silica : crude used (the loading chosen)", e.silicaRun*p.runs/u.CrudeKg, "")
	fig("silica_needed", "silica needed at the loading chosen", u.CrudeKg*p.ratio, "g")
	fig("column_diameter", "column inner diameter", e.diameter, "mm")
	fig("bed_height", "bed height", e.bedHeight, "cm")
	fig("plates", "theoretical plates of the bed", p.plates, "")
	fig("runs", "columns run", p.runs, "")
	fig("crude_per_run", "crude per run", p.crudeRun, "g")
	fig("silica_per_run", "silica per run", e.silicaRun, "g")
	fig("silica_total", "silica used", e.silicaRun*p.runs, "g")
	fig("load_factor", "load over the bed's capacity (crude / (q_s · silica))", p.crudeRun/(coef.Get(KeyQs)*e.silicaRun), "")
	fig("column_volume", "column volume", p.v0, "mL")
	p.equipmentNotes(u, coef)
}

// eluent adds up the eluent per run, by segment, in column volumes, and
// the loading solvent.
func (p *runPlan) eluent(u *usage.Usage, sc *scenario.Scenario, coef source.Set) {
	ch, get := sc.Chromatography, coef.Get
	p.used, p.evaporated, p.dryLoad = newVols(), newVols(), newVols()
	first := ch.TLCEluent
	if len(ch.Gradient) > 0 {
		first = ch.Gradient[0].Eluent
	}
	p.used.addMix(first, get(KeyEquilibrationCV)*p.v0)
	collected := 0.0
	for _, st := range ch.Gradient {
		p.used.addMix(st.Eluent, st.ColumnVolumes*p.v0)
		collected += st.ColumnVolumes
	}
	b := ComponentBand(ch.ProductRf, p.crudeRun*sc.Purity/(get(KeyQs)*p.e.silicaRun), p.plates, 1)
	p.bandCV = b.End - b.Front + 4*b.Kinetic
	elute := b.End + 2*b.Kinetic + get(KeyTailCV) + get(KeyFlushCV)
	p.used.addMix(ch.TLCEluent, elute*p.v0)
	collected += elute
	u.AddFigure("eluent_cv", "eluent per run (column volumes)", p.used.total()/p.v0, "")
	u.AddFigure("band_cv", "product band width, front to rear ±2σ (column volumes)", p.bandCV, "")
	u.MarkDetail("band_cv") // the method sheet and JSON only
	loadMix := ch.TLCEluent
	if ch.LoadingSolvent != "" {
		loadMix = scenario.Mix{{Solvent: ch.LoadingSolvent, Fraction: 1}}
	}
	if ch.Loading == scenario.DryLoading {
		p.drySilica = p.crudeRun * get(KeyDrySorbent)
		v := p.crudeRun * get(KeyDrySolventPerKg)
		p.used.addMix(loadMix, v)
		p.dryLoad.addMix(loadMix, v)
	} else {
		p.used.addMix(loadMix, p.crudeRun*get(KeyLoadSolventPerKg))
	}
	p.fractions = collected // column volumes collected, turned into fractions next
}

// fractionsAndTLC sizes the fractions (Still's table, scaled with the
// cross-section), the TLC plates and the product fractions evaporated.
func (p *runPlan) fractionsAndTLC(u *usage.Usage, sc *scenario.Scenario, coef source.Set) {
	get, fig := coef.Get, u.AddFigure
	p.fracSize = StillFraction(p.e.diameter)
	p.fractions = math.Ceil(p.fractions * p.v0 / p.fracSize)
	analysed := math.Ceil(p.fractions / get(KeyTLCEvery))
	p.plates2 = math.Ceil(analysed / get(KeyLanes))
	p.prodFrac = math.Max(1, math.Ceil(p.bandCV*p.v0/p.fracSize))
	p.used.addMix(sc.Chromatography.TLCEluent, p.plates2*get(KeyTLCSolvent))
	p.productVol = math.Min(p.prodFrac*p.fracSize, p.used.total())
	p.evaporated.addMix(sc.Chromatography.TLCEluent, p.productVol)
	fig("fraction_size", "fraction size", p.fracSize, "mL")
	fig("fractions", "fractions per run", p.fractions, "")
	fig("tlc_plates", "TLC plates per run", p.plates2, "")
	fig("product_fractions", "product fractions per run", p.prodFrac, "")
}

// times lays out the activities per run, the evaporator, runs per working
// day and elapsed working days.
func (p *runPlan) times(u *usage.Usage, sc *scenario.Scenario, coef source.Set, site Site) {
	get, ch := coef.Get, sc.Chromatography
	area := math.Pi * p.e.diameter * p.e.diameter / 4
	p.flow = get(KeyFrontVelocity) * area
	if p.e.cartridge != nil {
		p.flow = p.e.cartridge.Flow
	}
	evapRun := p.productVol + p.dryLoad.total()
	act := func(name string, elapsed, attended float64) {
		u.Activities = append(u.Activities, usage.Activity{Name: name, Elapsed: elapsed * p.runs, Attended: elapsed * attended * p.runs})
	}
	loadVol := 0.0
	if ch.Loading != scenario.DryLoading {
		loadVol = p.crudeRun * get(KeyLoadSolventPerKg)
	}
	elution := (p.used.total() - loadVol - p.dryLoad.total() - p.plates2*get(KeyTLCSolvent)) / p.flow
	if p.e.packedByMe {
		act("pack the column", math.Min(get(KeyPackBase)+get(KeyPackPerKg)*p.e.silicaRun, get(KeyPackMax)), 1)
	} else {
		act("mount the cartridge", get(KeyLoadTime), 1)
	}
	act("load the sample", get(KeyLoadTime), 1)
	act("equilibrate and elute", elution, 1)
	act("TLC of fractions", p.plates2*get(KeyTLCTime), 1)
	act("combine product fractions", p.prodFrac*get(KeyCombinePerFrac), 1)
	if p.e.packedByMe {
		act("empty and clean the column", get(KeyCleanTime), 1)
	}
	// The evaporator: the smallest that takes a run's product fractions
	// (and dry-load solvent) within what the working day leaves after the
	// column work (at least a quarter of the day).
	other, _ := u.Hours()
	left := math.Max(get(KeyWorkingDay)-other*3600/p.runs, get(KeyWorkingDay)/4)
	p.ev = site.Evaporators[ChooseEvaporator(evapRun, left, site.Evaporators)]
	if ch.Loading == scenario.DryLoading {
		act("adsorb the crude on silica (dry load)", p.dryLoad.total()/p.ev.Rate, get(KeyEvapAttended))
	}
	act("evaporate product fractions", p.productVol/p.ev.Rate, get(KeyEvapAttended))
	what := "product fractions"
	if p.dryLoad.total() > 0 {
		what += " and dry-load solvent"
	}
	p.evaporatorNote(u, evapRun, what, left)
	p.evapHours = evapRun / p.ev.Rate * p.runs / 3600
	elapsed, attended := u.Hours()
	p.colHours = elapsed - p.evapHours
	p.workingDays(u, coef, elapsed, attended)
	u.AddFigure("flow", "flow rate", p.flow, "mL/min")
	u.Equipment = p.equipmentWords(true)
	u.EquipmentID = p.equipmentWords(false) // the bed height follows the mass smoothly
}

// equipmentWords names the equipment: "name (prepacked)" or "name, H cm
// bed" (without the bed when bed is false: the equipment's identity,
// usage.Usage.EquipmentID), " × n runs" when there are several, and "; "
// the evaporator's name; written in one buffer (no fmt), as fmt's %s,
// %.0f and %d write them.
func (p *runPlan) equipmentWords(bed bool) string {
	e := p.e
	b := make([]byte, 0, len(e.name)+len(p.ev.Name)+32)
	b = append(b, e.name...)
	if e.cartridge != nil {
		b = append(b, " (prepacked)"...)
	} else if bed {
		b = append(b, ", "...)
		b = strconv.AppendFloat(b, e.bedHeight*100, 'f', 0, 64)
		b = append(b, " cm bed"...)
	}
	if e.runs > 1 {
		b = append(b, " × "...)
		b = strconv.AppendInt(b, int64(e.runs), 10)
		b = append(b, " runs"...)
	}
	b = append(b, "; "...)
	b = append(b, p.ev.Name...)
	return string(b)
}

// workingDays reports runs per day and elapsed working days, and warns
// when the work exceeds one chemist's working week.
func (p *runPlan) workingDays(u *usage.Usage, coef source.Set, elapsed, attended float64) {
	day, week := coef.Get(KeyWorkingDay)/3600, coef.Get(KeyWorkingWeek)/3600
	perRun := elapsed / p.runs
	fig := u.AddFigure
	fig("hours_per_run", "elapsed hours per run", perRun*3600, "h")
	fig("runs_per_day", "runs per working day", math.Floor(day/perRun), "")
	fig("working_days", "elapsed working days", elapsed/day, "")
	fig("evaporation_hours", "evaporation hours", p.evapHours*3600, "h")
	p.weekNote(u, elapsed, attended, day, week)
}

// product splits the product into the pure cut, the mixed fractions and the
// silica, and states the purity reached.
func (p *runPlan) product(u *usage.Usage, a analysis, coef source.Set) {
	retained := u.ProductInKg * coef.Get(KeyRetainedLoss)
	eluted := u.ProductInKg - retained
	u.ProductOutKg = eluted * p.cut.Recovery
	fig := u.AddFigure
	fig("recovery", "product recovered (pure cut)", u.ProductOutKg/u.ProductInKg, "%")
	fig("mixed_share", "product in mixed fractions", eluted*p.cut.Mixed/u.ProductInKg, "%")
	fig("retained_share", "product held on the silica", coef.Get(KeyRetainedLoss), "%")
	fig("purity_reached", "purity of the pooled product fractions (product over product and nearest impurity)", p.cut.Purity, "%")
	p.cutNote(u, a)
}

// evaporationElectricity is the bath's and the chiller's electricity to
// evaporate a heat load.
func evaporationElectricity(coef source.Set, heat float64) float64 {
	return heat/coef.Get(KeyHeaterEff) + heat/coef.Get(KeyChillerCOP)
}
