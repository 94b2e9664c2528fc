package chrom

import (
	"fmt"
	"math"

	"sepcost/costing/scenario"
	"sepcost/costing/solvent"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Price-table items the model asks for (besides one item per solvent id).
const (
	ItemSilica      = "silica gel"
	ItemSand        = "sea sand"
	ItemTLCPlate    = "tlc plate"
	ItemLabour      = usage.ItemLabour
	ItemElectricity = usage.ItemElectricity
	ItemProduct     = usage.ItemProduct
)

// Run models one flash-chromatography purification of crudeKg of crude.
// coef must hold Defaults() plus the calibrated saturation capacity and
// plate number (AddCalibration).
func Run(sc *scenario.Scenario, coef source.Set, crudeKg float64) usage.Usage {
	ch := sc.Chromatography
	u := usage.New(Method, crudeKg, crudeKg*sc.Purity)
	note := u.Notef
	fig := u.AddFigure
	get := coef.Get

	// TLC to column.
	sep := Separation{ProductRf: ch.ProductRf, ImpurityRf: ch.ImpurityRf, Product: sc.Purity, Impurity: sc.NearestImpurity}
	// Rounded to 1e-9 so that Rf values written to two places (0.35 − 0.25)
	// compare as the chemist wrote them, not as 0.0999999….
	dRf := math.Round(math.Abs(ch.ProductRf-ch.ImpurityRf)*1e9) / 1e9
	alpha := sep.Alpha()
	fig("k_product", "retention factor k of the product", RetentionFactor(ch.ProductRf), "")
	fig("cv_product", "product elutes at (column volumes)", ElutionCV(ch.ProductRf), "")
	fig("delta_cv", "separation ΔCV from the nearest impurity", DeltaCV(ch.ProductRf, ch.ImpurityRf), "")
	fig("alpha", "separation factor α", alpha, "")
	if sep.FirstIsProduct() {
		note(usage.Info, "The product runs above the nearest impurity (Rf %.2f vs %.2f) and elutes first.", ch.ProductRf, ch.ImpurityRf)
	} else {
		note(usage.Info, "The product runs below the nearest impurity (Rf %.2f vs %.2f) and elutes after it.", ch.ProductRf, ch.ImpurityRf)
	}
	if dRf < 0.05 {
		note(usage.Warning, "ΔRf %.3f is below 0.05: one flash pass is unlikely to separate; look for a better eluent first.", dRf)
	} else if dRf < StillHardDeltaRf {
		note(usage.Warning, "ΔRf %.3f is below the 0.1 of Still's table: the loading is extrapolated.", dRf)
	}
	if ch.ProductRf < 0.15 || ch.ProductRf > 0.45 {
		note(usage.Warning, "Product Rf %.2f is outside about 0.15–0.45, the range the loading models are calibrated for (Still et al. 1978 aim at 0.35).", ch.ProductRf)
	}

	// Silica by the two routes.
	h, rhoB := get(KeyBedHeight), get(KeyBedDensity)
	qs, plates := get(KeyQs), get(KeyPlates)
	loadTheory := LoadPerSilica(sep, qs, plates)
	ratioTable := StillRatio(dRf, h, rhoB)
	fig("ratio_table", "silica : crude by Still's table", ratioTable, "")
	var ratio float64
	if loadTheory > 0 {
		ratioTheory := 1 / loadTheory
		fig("ratio_theory", "silica : crude by elution theory", ratioTheory, "")
		if f := ratioTheory / ratioTable; f > get(KeyRouteTolerance) || (f < 1/get(KeyRouteTolerance) && dRf <= StillEasyDeltaRf) {
			note(usage.Warning, "The two loading routes disagree by a factor %.2f (theory %.0f : 1, Still's table %.0f : 1); the separation is outside the range where they were calibrated to agree.", math.Max(f, 1/f), ratioTheory, ratioTable)
		}
		ratio = ratioTheory
	}
	if ch.LoadingRule == scenario.RuleTable {
		ratio = ratioTable
	} else if loadTheory <= 0 {
		u.Feasible = false
		u.Reason = fmt.Sprintf("ΔRf %.3f cannot be resolved by a flash bed of about %.0f effective plates (analytical resolution %.2f < 1)", dRf, plates, AnalyticalResolution(ch.ProductRf, ch.ImpurityRf, plates))
		return u
	}
	fig("ratio_used", "silica : crude used", ratio, "")
	if ratio > 300 {
		note(usage.Warning, "Silica : crude of %.0f : 1 is far above the usual 20–150 : 1; a better eluent, a longer column or another method will pay.", ratio)
	}
	silicaNeeded := crudeKg * ratio

	// Column and runs.
	diameters := ch.ColumnsM
	if len(diameters) == 0 {
		diameters = DefaultColumnsM
	}
	col := ChooseColumn(silicaNeeded, get(KeyBedMin), get(KeyBedMax), rhoB, diameters)
	runs := float64(col.Runs)
	crudeRun := crudeKg / runs
	v0PerKg := ColumnVolumePerMass(rhoB, get(KeySkeletalDensity))
	v0 := col.Silica * v0PerKg
	area := math.Pi * col.Diameter * col.Diameter / 4
	u.Equipment = fmt.Sprintf("%.0f mm column, %.0f cm bed", col.Diameter*1000, col.BedHeight*100)
	if col.Runs > 1 {
		u.Equipment += fmt.Sprintf(" × %d runs", col.Runs)
	}
	fig("silica_needed", "silica needed by the loading rule", silicaNeeded, "g")
	fig("column_diameter", "column inner diameter", col.Diameter, "mm")
	fig("bed_height", "bed height", col.BedHeight, "cm")
	fig("runs", "columns run", runs, "")
	fig("crude_per_run", "crude per run", crudeRun, "g")
	fig("silica_per_run", "silica per run", col.Silica, "g")
	fig("silica_total", "silica used", col.Silica*runs, "g")
	fig("cv_per_g", "column volume per gram of silica", v0PerKg, "mL/g")
	fig("column_volume", "column volume", v0, "mL")
	if col.Runs > 1 {
		note(usage.RepeatLevel(col.Runs), "The batch needs %.1f kg of silica, more than the largest column (%.0f mm) holds: %d runs of %s of crude each.%s", silicaNeeded, col.Diameter*1000, col.Runs, scenario.FormatMass(crudeRun), impractical(col.Runs, "column runs"))
	}
	if col.Silica > 1.2*silicaNeeded/runs {
		note(usage.Info, "The narrowest column is packed to the shortest useful bed (%.0f cm): %.3g g of silica where %.3g g would do.", col.BedHeight*100, col.Silica*1000, silicaNeeded/runs*1000)
	}
	if col.Diameter > 0.05 || col.Diameter < 0.01 {
		note(usage.Info, "Column diameter %.0f mm is outside Still's table (10–50 mm); fractions and eluent are scaled with the cross-section.", col.Diameter*1000)
	}

	// Eluent per run, by segment, in column volumes.
	used := scenario.Volumes{}
	first := ch.TLCEluent
	if len(ch.Gradient) > 0 {
		first = ch.Gradient[0].Eluent
	}
	used.Add(first, get(KeyEquilibrationCV)*v0)
	collectedCV := 0.0
	for _, st := range ch.Gradient {
		used.Add(st.Eluent, st.ColumnVolumes*v0)
		collectedCV += st.ColumnVolumes
	}
	lfProduct := crudeRun * sc.Purity / (qs * col.Silica)
	band := BandCV(ch.ProductRf, lfProduct, plates)
	elute := ElutionCV(ch.ProductRf) + band/2 + get(KeyTailCV) + get(KeyFlushCV)
	used.Add(ch.TLCEluent, elute*v0)
	collectedCV += elute
	eluentRun := used.Total()
	fig("eluent_cv", "eluent per run (column volumes)", eluentRun/v0, "")
	fig("band_cv", "product band width (column volumes)", band, "")

	loadMix := ch.TLCEluent
	if ch.LoadingSolvent != "" {
		loadMix = scenario.Mix{{Solvent: ch.LoadingSolvent, Fraction: 1}}
	}
	evaporated := scenario.Volumes{}
	drySilica := 0.0
	if ch.Loading == scenario.DryLoading {
		drySilica = crudeRun * get(KeyDrySorbent)
		v := crudeRun * get(KeyDrySolventPerKg)
		used.Add(loadMix, v)
		evaporated.Add(loadMix, v)
	} else {
		used.Add(loadMix, crudeRun*get(KeyLoadSolventPerKg))
	}

	// Fractions and TLC.
	fracSize := StillFraction(col.Diameter)
	fractions := math.Ceil(collectedCV * v0 / fracSize)
	analysed := math.Ceil(fractions / get(KeyTLCEvery))
	plateCount := math.Ceil(analysed / get(KeyLanes))
	productFractions := math.Max(1, math.Ceil(band*v0/fracSize))
	used.Add(ch.TLCEluent, plateCount*get(KeyTLCSolvent))
	fig("fraction_size", "fraction size", fracSize, "mL")
	fig("fractions", "fractions per run", fractions, "")
	fig("tlc_plates", "TLC plates per run", plateCount, "")
	fig("product_fractions", "product fractions per run", productFractions, "")

	// Product fractions are evaporated; their volume is the product band.
	productVol := math.Min(productFractions*fracSize, eluentRun)
	evaporated.Add(ch.TLCEluent, productVol)

	// Flow and time per run.
	flow := get(KeyFrontVelocity) * area
	elutionTime := math.Max(0, eluentRun-crudeRun*get(KeyLoadSolventPerKg)) / flow // the loading solution may be more than the eluent
	fig("flow", "flow rate", flow, "mL/min")
	act := func(name string, elapsed, attendedShare float64) {
		u.Activities = append(u.Activities, usage.Activity{Name: name, Elapsed: elapsed * runs, Attended: elapsed * attendedShare * runs})
	}
	act("pack the column", get(KeyPackBase)+get(KeyPackPerKg)*col.Silica, 1)
	if ch.Loading == scenario.DryLoading {
		act("adsorb the crude on silica (dry load)", crudeRun*get(KeyDrySolventPerKg)/get(KeyEvapRate), get(KeyEvapAttended))
	}
	act("load the sample", get(KeyLoadTime), 1)
	act("equilibrate and elute", elutionTime, 1)
	act("TLC of fractions", plateCount*get(KeyTLCTime), 1)
	act("combine product fractions", productFractions*get(KeyCombinePerFrac), 1)
	act("evaporate product fractions", productVol/get(KeyEvapRate), get(KeyEvapAttended))
	act("empty and clean the column", get(KeyCleanTime), 1)

	// Energy to evaporate: heat to warm and vaporise, over the bath's
	// efficiency, plus the chiller's electricity to remove the same heat.
	heat := 0.0
	for _, id := range evaporated.IDs() {
		s := mustSolvent(sc.Solvents, id)
		m := evaporated[id] * s.Density.V
		heat += m * (s.SpecificCp()*get(KeyBathDelta) + s.SpecificHVap())
	}
	heat *= runs
	electric := heat/get(KeyHeaterEff) + heat/get(KeyChillerCOP)
	fig("evaporation_heat", "heat to evaporate product fractions", heat, "kWh")

	// Totals over all runs.
	for id := range used {
		used[id] *= runs
	}
	silicaTotal := (col.Silica + drySilica) * runs
	sand := get(KeySandHeight) * area * get(KeySandDensity) * runs
	tlcPlates := plateCount * runs
	fig("solvent_total_l", "solvent used", used.Total(), "L")
	for _, id := range used.IDs() {
		fig("solvent:"+id, "solvent: "+id, used[id], "L")
	}

	// Product.
	lostMixed := u.ProductInKg * get(KeyMixedLoss)
	lostSilica := u.ProductInKg * get(KeyRetainedLoss)
	u.ProductOutKg = u.ProductInKg - lostMixed - lostSilica

	// Waste. Solvent left in the pores of the spent silica goes with the
	// solids; the rest of the eluent, with the impurities and mixed
	// fractions, is liquid waste; a recovered share leaves as reusable solvent.
	retainedVol := silicaTotal * get(KeyPoreVolume)
	liquid := scenario.Volumes{}
	for id, v := range used {
		liquid[id] = v
	}
	wetSolvent := scenario.Volumes{}
	wetSolvent.Add(ch.TLCEluent, retainedVol)
	for id, v := range wetSolvent {
		liquid[id] -= v
		if liquid[id] < 0 {
			wetSolvent[id] += liquid[id]
			liquid[id] = 0
		}
	}
	recovered := scenario.Volumes{}
	if ch.RecoverSolvent > 0 {
		for id, v := range liquid {
			recovered[id] = v * ch.RecoverSolvent
			liquid[id] -= recovered[id]
		}
	}
	spent := usage.Stream{Name: "spent eluent and mixed fractions", Class: usage.NonHalogenated, VolumeM3: liquid.Total()}
	for _, id := range liquid.IDs() {
		s := mustSolvent(sc.Solvents, id)
		if s.Halogenated && liquid[id] > 0 {
			spent.Class = usage.Halogenated
		}
		spent.Components = append(spent.Components, usage.Component{Name: id, Kg: liquid[id] * s.Density.V, Solvent: true})
	}
	spent.Components = append(spent.Components,
		usage.Component{Name: "impurities", Kg: crudeKg - u.ProductInKg},
		usage.Component{Name: "product in mixed fractions", Kg: lostMixed})
	wet := usage.Stream{Name: "solvent-wet silica, sand and TLC plates", Class: usage.WetSolids}
	wet.Components = append(wet.Components, usage.Component{Name: "silica gel", Kg: silicaTotal}, usage.Component{Name: "sea sand", Kg: sand}, usage.Component{Name: "TLC plates", Kg: tlcPlates * get(KeyPlateMass)})
	for _, id := range wetSolvent.IDs() {
		wet.Components = append(wet.Components, usage.Component{Name: id, Kg: wetSolvent[id] * mustSolvent(sc.Solvents, id).Density.V, Solvent: true})
	}
	wet.Components = append(wet.Components, usage.Component{Name: "product retained on silica", Kg: lostSilica})
	u.Waste = []usage.Stream{spent, wet}

	// Demands for the ledger.
	_, attended := u.Hours()
	d := u.AddDemand
	d(ItemSilica, "silica gel 40–63 µm (columns and dry load)", usage.Materials, silicaTotal, units.Mass)
	d(ItemSand, "sand layers", usage.Materials, sand, units.Mass)
	for _, id := range used.IDs() {
		d(id, "solvent: "+id, usage.Materials, used[id], units.Volume)
	}
	d(ItemTLCPlate, "TLC plates for fractions", usage.Materials, tlcPlates, units.Count)
	d(ItemLabour, "hands-on time", usage.Labour, attended*3600, units.Time)
	d(ItemElectricity, "rotary evaporator bath and chiller", usage.Energy, electric, units.Energy)
	for _, s := range u.Waste {
		d(s.Class.DisposalItem(), s.DisposalLabel(), usage.Disposal, s.Kg(), units.Mass)
	}
	d(ItemProduct, "product lost (mixed fractions, retained on silica)", usage.ProductLoss, lostMixed+lostSilica, units.Mass)
	if ch.RecoverSolvent > 0 {
		recHeat := 0.0
		for _, id := range recovered.IDs() {
			s := mustSolvent(sc.Solvents, id)
			m := recovered[id] * s.Density.V
			recHeat += m * (s.SpecificCp()*get(KeyBathDelta) + s.SpecificHVap())
			d(id, "recovered for reuse: "+id, usage.Credit, -recovered[id], units.Volume)
		}
		d(ItemElectricity, "distilling the recovered eluent", usage.Energy, recHeat/get(KeyHeaterEff)+recHeat/get(KeyChillerCOP), units.Energy)
		note(usage.Info, "%.0f %% of the spent eluent is recovered; recovered solvent is credited at its purchase price and its distillation charged as electricity.", ch.RecoverSolvent*100)
	}
	return u
}

// mustSolvent returns a solvent the scenario has already checked exists.
func mustSolvent(b *solvent.Book, id string) solvent.Solvent {
	s, ok := b.View(id)
	if !ok {
		panic("chrom: solvent " + id + " was not checked by the scenario reader")
	}
	return s
}

// impractical adds, from usage.ManyRepeats repeats on, why the plan is
// impractical as it stands.
func impractical(n int, what string) string {
	if n < usage.ManyRepeats {
		return ""
	}
	return fmt.Sprintf(" %d %s are impractical as one batch: a larger column (process equipment) or another method would serve.", n, what)
}
