// Package cryst models a cooling recrystallization of the product from a
// solvent or a solvent/anti-solvent pair: from solubility data (measured
// points or an ideal-solubility estimate) to the solvent, passes, yield,
// purity, vessels and batches, hours, energy, one-time development cost
// and waste of one purification at one batch mass.
//
// The model computes physical quantities only (SI inside); pricing is the
// ledger's job. Every coefficient is in coefficients.go with its source;
// the solubility equations are in the solubility sub-package.
package cryst

import (
	"fmt"
	"math"
	"sort"

	"sepcost/costing/scenario"
	"sepcost/costing/solvent"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Price-table items the model asks for (besides one item per solvent id and
// the disposal items of the waste classes).
const (
	ItemLabour      = usage.ItemLabour
	ItemElectricity = usage.ItemElectricity
	ItemProduct     = usage.ItemProduct
)

// Activity names, in the order they are reported.
const (
	ActCharge   = "charge the vessel"
	ActHeat     = "heat and dissolve"
	ActCool     = "cool and crystallise"
	ActFilter   = "filter and wash"
	ActCheck    = "check purity"
	ActClean    = "clean the vessel"
	ActCropEvap = "second crop: evaporate the mother liquor"
	ActCrop     = "second crop: crystallise and filter"
	ActDry      = "dry the crystals"
)

var activityOrder = []string{ActCharge, ActHeat, ActCool, ActFilter, ActCheck, ActClean, ActCropEvap, ActCrop, ActDry}

// liquid is the crystallization liquid with the solvent data the model needs.
type liquid struct {
	mix     scenario.Mix
	parts   []solvent.Solvent
	density float64 // kg/m³
}

// heatCapacity is the heat capacity of a volume V (m³) of the liquid, J/K:
// Σ φ_i·V·ρ_i·c_p,i.
func (l liquid) heatCapacity(V float64) float64 {
	c := 0.0
	for i, p := range l.mix {
		c += p.Fraction * V * l.parts[i].Density.V * l.parts[i].SpecificCp()
	}
	return c
}

// evaporationHeat is the heat to warm a volume V (m³) of the liquid by dT
// (K) and evaporate it, J: Σ φ_i·V·ρ_i·(c_p,i·dT + Δh_vap,i).
func (l liquid) evaporationHeat(V, dT float64) float64 {
	q := 0.0
	for i, p := range l.mix {
		m := p.Fraction * V * l.parts[i].Density.V
		q += m * (l.parts[i].SpecificCp()*dT + l.parts[i].SpecificHVap())
	}
	return q
}

// class is the waste class of the liquid: halogenated when any part is,
// aqueous when it is water alone, else non-halogenated solvent.
func (l liquid) class() usage.WasteClass {
	allWater := true
	for _, s := range l.parts {
		if s.Halogenated {
			return usage.Halogenated
		}
		if s.ID != "water" {
			allWater = false
		}
	}
	if allWater {
		return usage.Aqueous
	}
	return usage.NonHalogenated
}

// components lists the liquid's solvents in a volume V (m³) as waste components.
func (l liquid) components(V float64) []usage.Component {
	var out []usage.Component
	for i, p := range l.mix {
		out = append(out, usage.Component{Name: p.Solvent, Kg: p.Fraction * V * l.parts[i].Density.V, Solvent: true})
	}
	return out
}

// Run models the recrystallization of crudeKg of crude. coef must hold
// Defaults() (with the user's settings applied).
//
// Steps, each in its own file:
//
//   - solubility of product and impurity at the dissolution and isolation
//     temperatures (solubility package: van 't Hoff fit or Schröder–van
//     Laar estimate), with a warning beyond the measured range;
//   - passes (Pass.Run, Purify): solvent V = P/S_hot·(1 + excess), losses
//     to mother liquor and washes, the impurity's fate, until the target
//     purity; Feasible=false with the reason when it cannot be reached;
//   - an optional second crop from the last mother liquor (SecondCrop),
//     taken only if the combined product still meets the target;
//   - vessels and batches per pass (ChooseVessel); heating and cooling
//     times limited by the jacket (JacketTime, A ∝ V^(2/3)) and by the
//     cooling ramp; filtration (FilterArea, FiltrationTime); drying;
//   - energy: sensible heat of liquid and solids and the enthalpy of
//     solution over the heater efficiency; heat removed below room
//     temperature over the chiller COP (above it, cooling water); solvent
//     evaporated in drying and for the second crop over both;
//   - one-time development (usage.OneTime): screening hours and the
//     product content of the crude used in screening;
//   - waste by stream, classed by the liquid (halogenated if any part is,
//     aqueous for water alone, else non-halogenated solvent).
//
// Quantities scale with the batch except the one-time lines and the fixed
// times per batch, which is why a crystallization loses to a column at a
// few hundred milligrams and wins at kilograms.
func Run(sc *scenario.Scenario, coef source.Set, crudeKg float64) usage.Usage {
	cr := sc.Crystallization
	u := usage.New(Method, crudeKg, crudeKg*sc.Purity)
	note := u.Notef
	fig := u.AddFigure
	get := coef.Get
	or := func(p *float64, key string) float64 {
		if p != nil {
			return *p
		}
		return get(key)
	}
	if why := checkCoefficients(coef); why != "" {
		u.Feasible = false
		u.Reason = why
		return u
	}
	liq := liquid{mix: cr.Mix, density: cr.LiquidDensity}
	for _, p := range cr.Mix {
		liq.parts = append(liq.parts, mustSolvent(sc.Solvents, p.Solvent))
	}
	TH, TC, Troom := cr.DissolveK, cr.IsolateK, get(KeyRoomT)
	degC := func(T float64) float64 { return T - 273.15 }

	// Solubilities.
	sHot, sCold := cr.Product.Curve.At(TH), cr.Product.Curve.At(TC)
	fig("s_hot", "product solubility at the dissolution temperature", sHot, "g/L")
	fig("s_cold", "product solubility at the isolation temperature", sCold, "g/L")
	if cr.Product.Curve.Ideal != nil {
		d := cr.Product.Curve.Ideal
		note(usage.Info, "The product's solubility is an ideal-solubility estimate (Schröder–van Laar) from its melting point %.1f °C and enthalpy of fusion %.3g kJ/mol, divided by an activity factor of %.3g: %.3g g/L at %.1f °C and %.3g g/L at %.1f °C. Measure it before relying on the cost.",
			degC(d.Tm), d.Hfus/1000, d.Gamma, sHot, degC(TH), sCold, degC(TC))
	}
	margin := get(KeyExtrapolation)
	extrap := func(who string, c interface {
		Outside(float64) float64
	}, T float64) {
		if d := c.Outside(T); d > margin {
			note(usage.Warning, "The %s's solubility at %.1f °C is extrapolated %.0f K beyond the measured points; the van 't Hoff line is a guess that far out.", who, degC(T), d)
		}
	}
	extrap("product", cr.Product.Curve, TH)
	extrap("product", cr.Product.Curve, TC)
	var impHot, impCold float64
	if !cr.ImpurityByPurge {
		impHot, impCold = cr.Impurity.Curve.At(TH), cr.Impurity.Curve.At(TC)
		fig("impurity_s_cold", "impurity solubility at the isolation temperature", impCold, "g/L")
		extrap("impurity", cr.Impurity.Curve, TH)
		extrap("impurity", cr.Impurity.Curve, TC)
	}
	hSol := cr.Product.Curve.Enthalpy()
	molar := cr.Product.MolarMass
	if molar > 0 && hSol > 0 {
		fig("dissolution_enthalpy", "enthalpy of solution of the product", hSol, "kJ/mol")
	} else {
		hSol = 0
		if molar == 0 {
			note(usage.Info, "No molar mass for the product: the heat of dissolution and crystallization is left out of the energy and the heating and cooling times.")
		}
	}
	if TH > cr.BoilingK-1 {
		note(usage.Caution, "The crude is dissolved at the boiling point of %s (about %.1f °C): work at reflux with a condenser, and keep flammable vapour away from ignition sources.", cr.Mix, degC(cr.BoilingK))
	}
	excess := or(cr.Excess, KeyExcess)
	if vpg := (1 + excess) / sHot; vpg > get(KeyDilution) {
		note(usage.Warning, "The crystallization needs %.0f mL of solvent per g of product, above about %.0f: it is dilute; a solvent that dissolves more when hot would pay.", vpg*1000, get(KeyDilution)*1000)
	}

	// Passes.
	pass := Pass{
		SHot: sHot, SCold: sCold, Excess: excess,
		ByPurge: cr.ImpurityByPurge, Purge: cr.PurgeFactor, ImpHot: impHot, ImpCold: impCold,
		LiquidDensity: cr.LiquidDensity, CrystalDensity: get(KeyCrystalDensity),
		Porosity: get(KeyCakePorosity), Saturation: get(KeyCakeSaturation), Inclusion: get(KeyInclusion),
		WashCakeVolumes: get(KeyWashCakeVolumes), WashSaturation: get(KeyWashSaturation),
	}
	if cr.WashCakeVolumes != nil {
		pass.WashCakeVolumes = *cr.WashCakeVolumes
	}
	if cr.WashFraction != nil {
		pass.WashFraction = *cr.WashFraction
		if pass.WashFraction == 0 {
			pass.WashCakeVolumes = 0
		}
	}
	if cr.WashLoss != nil {
		pass.WashLoss, pass.WashLossGiven = *cr.WashLoss, true
	}
	other := math.Max(0, crudeKg*(1-sc.Purity-cr.ImpurityFraction))
	feed := Feed{Product: u.ProductInKg, Impurity: crudeKg * cr.ImpurityFraction, Other: other}
	if other > 0 {
		note(usage.Info, "%.3g %% of the crude is impurity other than the one described; it is taken to stay in the mother liquor.", other/crudeKg*100)
	}
	maxPasses := int(math.Max(1, math.Round(get(KeyMaxPasses))))
	out := Purify(pass, feed, cr.TargetPurity, maxPasses)
	fig("product_in", "product in the crude", u.ProductInKg, "g")
	fig("passes", "recrystallizations (passes)", float64(len(out.Passes)), "")
	fig("purity_reached", "purity reached", out.Purity, "%")
	for i, r := range out.Passes {
		fig(fmt.Sprintf("yield_pass_%d", i+1), fmt.Sprintf("yield of pass %d", i+1), r.Yield(), "%")
		fig(fmt.Sprintf("purity_pass_%d", i+1), fmt.Sprintf("purity after pass %d", i+1), r.Out.Purity(), "%")
		if r.CoCrystallised > 0 {
			note(usage.Warning, "Pass %d: %.3g %% of the impurity exceeds its solubility at %.1f °C (%.3g g/L) and co-crystallises with the product.", i+1, r.CoCrystallised/r.In.Impurity*100, degC(TC), impCold)
		}
		if pass.WashLossGiven && r.Wash > 0 && r.WashDissolved/r.Wash > sCold*(1+1e-9) {
			note(usage.Warning, "Pass %d: the stated wash loss needs the wash to carry %.3g g/L of product, above its solubility at %.1f °C (%.3g g/L); check wash_loss and the wash volume.", i+1, r.WashDissolved/r.Wash, degC(TC), sCold)
		}
		if r.Undissolved > 0 {
			note(usage.Warning, "Pass %d: part of the impurity does not dissolve at %.1f °C; a hot filtration would remove it (not modelled: it is counted in the cake).", i+1, degC(TH))
		}
	}
	if out.Stop != Reached {
		u.Feasible = false
		switch out.Stop {
		case NoCrystals:
			u.Reason = fmt.Sprintf("nothing crystallises: with %.3g %% excess solvent the liquor holds (1 + excess)·S_cold/S_hot = %.3g of the product at %.1f °C", excess*100, (1+excess)*sCold/sHot, degC(TC))
		case Stalled:
			last := out.Passes[len(out.Passes)-1]
			why := "the liquor retained in the cake and the occluded liquor carry the impurity over faster than the passes purge it"
			if last.CoCrystallised > 0 {
				why = fmt.Sprintf("the impurity exceeds its solubility at the isolation temperature (%.3g g/L against the product's %.3g g/L) and co-crystallises with the product, so a further pass does not raise the purity", impCold, sCold)
			} else if cr.ImpurityByPurge && cr.PurgeFactor == 0 {
				why = "a purge factor of 0 removes none of the impurity"
			}
			best := feed.Purity()
			for _, r := range out.Passes {
				best = math.Max(best, r.Out.Purity())
			}
			u.Reason = fmt.Sprintf("target purity %.4g %% not reachable: passes do not raise the purity past %.4g %% (crude %.4g %%, %d pass(es) run); %s", cr.TargetPurity*100, best*100, feed.Purity()*100, len(out.Passes), why)
		case TooManyPasses:
			u.Reason = fmt.Sprintf("target purity %.4g %% not reachable in %d passes (the most run on one batch): %.4g %% after the last; a more selective solvent or another method is needed", cr.TargetPurity*100, maxPasses, out.Purity*100)
		}
		return u
	}

	// Equipment, time, energy and solvent pass by pass.
	flasks, reactors := cr.FlasksM3, cr.ReactorsM3
	if len(flasks)+len(reactors) == 0 {
		flasks, reactors = seriesFrom(coef, KeyFlask), seriesFrom(coef, KeyReactor)
	}
	flaskFill, reactorFill := get(KeyFlaskFill), get(KeyReactorFill)
	if cr.FillLimit != nil {
		flaskFill, reactorFill = *cr.FillLimit, *cr.FillLimit
	}
	acts := map[string]*usage.Activity{}
	act := func(name string, elapsed, share float64) {
		a := acts[name]
		if a == nil {
			a = &usage.Activity{Name: name}
			acts[name] = a
		}
		a.Elapsed += elapsed
		a.Attended += elapsed * share
	}
	used := scenario.Volumes{}
	var mlVol, washVol, heatIn, heatOut, chillHeat, coolS, heatS, filtS float64
	var ml, wash Feed
	batchesTotal, lastBatches, lastUA := 0, 0.0, 0.0
	carried := 0.0
	cpSolid := get(KeySolidCp)
	for i, r := range out.Passes {
		solids := r.In.Total()
		liquidVol := r.Solvent + solids/get(KeyCrystalDensity)
		ves := ChooseVessel(liquidVol, flasks, reactors, flaskFill, reactorFill)
		if ves.Batches == 0 {
			u.Feasible = false
			u.Reason = "no vessels: the scenario's vessel lists are empty"
			return u
		}
		n := float64(ves.Batches)
		batchesTotal += ves.Batches
		lastBatches = n
		if i == 0 {
			fig("solvent_per_batch_l", "solvent per batch (first pass)", r.Solvent/n, "L")
			fig("vessel_volume", "vessel nominal volume (first pass)", ves.Volume, "L")
			fig("jacketed_reactor", "jacketed reactor (1) or flask (0), first pass", b2f(ves.Reactor), "")
			fig("vessel_fill", "share of the vessel filled (first pass)", ves.Fill, "%")
			fig("batches", "batches (first pass)", n, "")
			kind := "flask"
			if ves.Reactor {
				kind = "jacketed reactor"
			}
			u.Equipment = fmt.Sprintf("%s %s", volumeLabel(ves.Volume), kind)
			if ves.Batches > 1 {
				u.Equipment += fmt.Sprintf(" × %d batches", ves.Batches)
			}
			if ves.Batches > 1 {
				fill := flaskFill
				if ves.Reactor {
					fill = reactorFill
				}
				note(usage.RepeatLevel(ves.Batches), "The batch needs %.3g L of liquid, more than the largest vessel (%.4g L at %.0f %% fill) holds: %d batches run one after another.", liquidVol*1000, ves.Volume*1000, fill*100, ves.Batches)
			}
		}
		// Solvent bought: the charge plus the wash, less what the wet cake of
		// the previous pass brings along.
		buy := math.Max(0, r.Solvent-carried) + r.Wash
		used.Add(cr.Mix, buy)
		carried = r.Retained
		mlVol += r.LiquorVolume
		washVol += r.Wash
		ml = addFeed(ml, r.Liquor)
		wash = addFeed(wash, r.Washings)

		// Heat: sensible heat of liquid and solids, plus the enthalpy of
		// solution of the product dissolved and crystallised.
		C := liq.heatCapacity(r.Solvent) + solids*cpSolid
		var qDiss, qCryst float64
		if hSol > 0 {
			qDiss = hSol * r.In.Product / molar
			qCryst = hSol * r.Crystallised / molar
		}
		up := math.Max(0, TH-Troom)
		qIn := C*up + qDiss
		qOut := C*(TH-TC) + qCryst
		heatIn += qIn
		heatOut += qOut
		if TC < Troom {
			chillHeat += qOut * (math.Min(Troom, TH) - TC) / (TH - TC)
		}

		// Times per batch: jacket-limited heating and cooling of a batch of
		// 1/n of the pass.
		U, a := get(KeyUFlask), get(KeyAreaFlask)
		if ves.Reactor {
			U, a = get(KeyUReactor), get(KeyAreaReactor)
		}
		A := WettedArea(a, liquidVol/n)
		lastUA = U * A
		tHeat := 0.0
		if up > 0 {
			tHeat = JacketTime(EffectiveHeatCapacity(C/n, qDiss/n, up), U, A, Troom, TH, TH+get(KeyHeatApproach))
		}
		tCoolHT := JacketTime(EffectiveHeatCapacity(C/n, qCryst/n, TH-TC), U, A, TH, TC, TC-get(KeyCoolApproach))
		tCool := math.Max(tCoolHT, (TH-TC)/get(KeyMaxCoolingRate))
		cake := r.CakeVolume / n
		tFilt := get(KeyFilterSetup) + FiltrationTime((r.LiquorVolume+r.Wash)/n, get(KeyFilterFlux), FilterArea(cake, get(KeyCakeDepth), get(KeyMinFilterArea)))
		if i == 0 {
			fig("heating_time", "heating time per batch (first pass)", tHeat, "h")
			fig("cooling_time", "cooling time per batch (first pass)", tCool, "h")
			fig("cooling_time_jacket", "jacket-limited cooling time per batch (first pass)", tCoolHT, "h")
			fig("filtration_time", "filtration and wash time per batch (first pass)", tFilt, "h")
		}
		heatS += n * tHeat
		coolS += n * tCool
		filtS += n * tFilt
		act(ActCharge, n*get(KeySetupTime), 1)
		act(ActHeat, n*(tHeat+get(KeyHotHold)), get(KeyHeatAttended))
		act(ActCool, n*(tCool+get(KeyAging)), get(KeyCoolAttended))
		act(ActFilter, n*tFilt, get(KeyFilterAttended))
		act(ActCheck, get(KeyCheckTime), 1)
		act(ActClean, n*get(KeyCleanTime), 1)
	}
	last := out.Passes[len(out.Passes)-1]
	fig("batches_total", "batches over all passes", float64(batchesTotal), "")
	product := last.Out
	fig("yield_overall", "overall yield of the passes", out.Yield(), "%")

	// Second crop from the last mother liquor.
	evaporated := 0.0
	if sc2 := cr.SecondCrop; sc2 != nil {
		crop, evap := SecondCrop(last.LiquorVolume, last.Liquor, sCold, sc2.ConcentrateTo, sc2.Purity)
		blend := addFeed(product, crop)
		switch {
		case crop.Product <= 0:
			note(usage.Info, "No second crop: the mother liquor concentrated to %.0f %% still holds all its product at %.1f °C.", sc2.ConcentrateTo*100, degC(TC))
		case blend.Purity() < cr.TargetPurity:
			note(usage.Info, "Second crop skipped: at %.4g %% purity it would bring the combined product to %.4g %%, below the target %.4g %%.", sc2.Purity*100, blend.Purity()*100, cr.TargetPurity*100)
		default:
			product = blend
			evaporated = evap
			ml = subFeed(ml, crop)
			mlVol -= evap
			fig("second_crop", "second crop recovered", crop.Product, "g")
			note(usage.Info, "A second crop of %s (%.4g %% product) from the last mother liquor, evaporated to %.0f %% of its volume, is combined with the first: %.4g %% purity.", scenario.FormatMass(crop.Total()), sc2.Purity*100, sc2.ConcentrateTo*100, blend.Purity()*100)
			// Boiled off in the vessel at the jacket's heat-transfer rate.
			qb := liq.evaporationHeat(evap/lastBatches, math.Max(0, cr.BoilingK-TC))
			act(ActCropEvap, lastBatches*qb/(lastUA*get(KeyHeatApproach)), get(KeyEvapAttended))
			act(ActCrop, lastBatches*get(KeyCropTime), get(KeyCropAttended))
		}
	}
	u.ProductOutKg = product.Product
	fig("product_out", "product recovered", u.ProductOutKg, "g")
	fig("recovery", "recovery", u.ProductOutKg/u.ProductInKg, "%")
	if product.Purity() != out.Purity {
		fig("purity_final", "purity of the combined product", product.Purity(), "%")
	}

	// Drying the final cake: its retained liquid evaporates.
	dryVol := last.Retained
	act(ActDry, lastBatches*get(KeyDryingTime), get(KeyDryAttended))
	dryHeat := liq.evaporationHeat(dryVol, get(KeyDryWarmup))
	evapHeat := liq.evaporationHeat(evaporated, math.Max(0, cr.BoilingK-TC))

	// Activities in report order.
	for _, name := range activityOrder {
		if a := acts[name]; a != nil {
			u.Activities = append(u.Activities, *a)
		}
	}
	// Hours by activity, elapsed and hands-on, are in u.Activities (every
	// report shows them); these are the physical step times.
	fig("hours_heating", "heating (all batches)", heatS, "h")
	fig("hours_cooling", "cooling (all batches)", coolS, "h")
	fig("hours_filtration", "filtration and washing (all batches)", filtS, "h")

	// Energy: heaters at their efficiency; heat removed above room
	// temperature goes to cooling water, below it to a chiller at its COP;
	// evaporation (drying, second crop) pays heater and condenser.
	eff, cop := get(KeyHeaterEff), get(KeyChillerCOP)
	electric := heatIn/eff + chillHeat/cop + (dryHeat+evapHeat)/eff + (dryHeat+evapHeat)/cop
	fig("heat_input", "heat to warm and dissolve", heatIn, "kWh")
	fig("heat_removed", "heat removed on cooling", heatOut, "kWh")
	fig("heat_chilled", "heat removed below room temperature (chiller)", chillHeat, "kWh")
	fig("heat_evaporation", "heat to dry the crystals and concentrate liquor", dryHeat+evapHeat, "kWh")
	fig("electricity", "electricity", electric, "kWh")

	// Solvent.
	fig("solvent_total_l", "solvent used", used.Total(), "L")
	for _, id := range used.IDs() {
		fig("solvent:"+id, "solvent: "+id, used[id], "L")
	}
	fig("wash_total_l", "wash liquid used", washVol, "L")

	// Development, once per campaign.
	screenS, screenKg := or(cr.ScreeningS, KeyScreeningTime), or(cr.ScreeningKg, KeyScreeningMass)
	fig("screening_hours", "one-time screening and development", screenS, "h")
	fig("screening_material", "one-time crude used in screening", screenKg, "g")
	if screenKg > crudeKg {
		note(usage.Warning, "Screening uses %s of crude, more than the batch itself (%s): the plan is impractical at this scale, and the development cost dominates.", scenario.FormatMass(screenKg), scenario.FormatMass(crudeKg))
	}

	// Waste: mother liquors (with the second crop's concentrate), washes,
	// and the solvent evaporated from the cake and the liquor.
	class := liq.class()
	stream := func(name string, vol float64, f Feed) usage.Stream {
		s := usage.Stream{Name: name, Class: class, VolumeM3: vol, Components: liq.components(vol)}
		s.Components = append(s.Components,
			usage.Component{Name: "product (dissolved)", Kg: f.Product},
			usage.Component{Name: "impurity (dissolved)", Kg: f.Impurity})
		if f.Other > 0 {
			s.Components = append(s.Components, usage.Component{Name: "other impurities (dissolved)", Kg: f.Other})
		}
		return s
	}
	u.Waste = append(u.Waste, stream("mother liquor", mlVol, ml), stream("washings", washVol, wash))
	if cond := dryVol + evaporated; cond > 0 {
		u.Waste = append(u.Waste, usage.Stream{Name: "solvent evaporated from the cake and liquor (condensate)", Class: class, VolumeM3: cond, Components: liq.components(cond)})
	}

	// Demands for the ledger.
	d := u.AddDemand
	for _, id := range used.IDs() {
		d(id, "solvent: "+id, usage.Materials, used[id], units.Volume)
	}
	_, attended := u.Hours()
	d(ItemLabour, "hands-on time", usage.Labour, attended*3600, units.Time)
	d(ItemElectricity, "heating, chiller and drying", usage.Energy, electric, units.Energy)
	for _, s := range u.Waste {
		d(s.Class.DisposalItem(), s.DisposalLabel(), usage.Disposal, s.Kg(), units.Mass)
	}
	d(ItemProduct, "product left in mother liquors and washes", usage.ProductLoss, u.ProductInKg-u.ProductOutKg, units.Mass)
	d(ItemLabour, "solvent screening and development (one-time)", usage.OneTime, screenS, units.Time)
	d(ItemProduct, "crude used in screening, product content (one-time)", usage.OneTime, screenKg*sc.Purity, units.Mass)
	return u
}

// checkCoefficients returns why a coefficient (possibly set by the user
// under settings:) makes the model meaningless, or "".
func checkCoefficients(coef source.Set) string {
	positive := []string{KeyCrystalDensity, KeySolidCp, KeyHeatApproach, KeyCoolApproach, KeyMaxCoolingRate,
		KeyUFlask, KeyUReactor, KeyAreaFlask, KeyAreaReactor, KeyFlaskFill, KeyReactorFill, KeyFilterFlux,
		KeyCakeDepth, KeyMinFilterArea, KeyHeaterEff, KeyChillerCOP, KeyMaxPasses}
	for _, k := range positive {
		if v := coef.Get(k); !(v > 0) || math.IsInf(v, 0) {
			return fmt.Sprintf("setting %s = %s must be above zero", k, coef.Of(k).String())
		}
	}
	unit := []string{KeyCakeSaturation, KeyWashSaturation, KeyFlaskFill, KeyReactorFill, KeyHeaterEff, KeyHeatAttended, KeyCoolAttended,
		KeyFilterAttended, KeyDryAttended, KeyEvapAttended, KeyCropAttended}
	for _, k := range unit {
		if v := coef.Get(k); !(v >= 0 && v <= 1) {
			return fmt.Sprintf("setting %s = %s must lie between 0 and 1", k, coef.Of(k).String())
		}
	}
	if v := coef.Get(KeyCakePorosity); !(v > 0 && v < 1) {
		return fmt.Sprintf("setting %s = %s must lie above 0 and below 1", KeyCakePorosity, coef.Of(KeyCakePorosity).String())
	}
	nonNeg := []string{KeyExcess, KeyWashCakeVolumes, KeyInclusion, KeyExtrapolation, KeyDilution, KeySetupTime, KeyHotHold,
		KeyAging, KeyFilterSetup, KeyCheckTime, KeyCleanTime, KeyDryingTime, KeyDryWarmup, KeyCropTime, KeyScreeningTime, KeyScreeningMass}
	for _, k := range nonNeg {
		if v := coef.Get(k); !(v >= 0) || math.IsInf(v, 0) {
			return fmt.Sprintf("setting %s = %s must be zero or more", k, coef.Of(k).String())
		}
	}
	return ""
}

// seriesFrom reads a vessel series from numbered coefficients (KeyFlask or
// KeyReactor) until one is missing, ascending.
func seriesFrom(coef source.Set, key func(int) string) []float64 {
	var out []float64
	for i := 1; ; i++ {
		c, ok := coef.Lookup(key(i))
		if !ok {
			break
		}
		if c.SI > 0 {
			out = append(out, c.SI)
		}
	}
	sort.Float64s(out)
	return out
}

func addFeed(a, b Feed) Feed {
	return Feed{Product: a.Product + b.Product, Impurity: a.Impurity + b.Impurity, Other: a.Other + b.Other}
}

func subFeed(a, b Feed) Feed {
	return Feed{Product: a.Product - b.Product, Impurity: a.Impurity - b.Impurity, Other: a.Other - b.Other}
}

func b2f(b bool) float64 {
	if b {
		return 1
	}
	return 0
}

// mustSolvent returns a solvent the scenario has already checked exists.
func mustSolvent(b *solvent.Book, id string) solvent.Solvent {
	s, ok := b.View(id)
	if !ok {
		panic("cryst: solvent " + id + " was not checked by the scenario reader")
	}
	return s
}

// volumeLabel writes a vessel volume (m³) as "250 mL" or "20 L".
func volumeLabel(v float64) string {
	if v < 1e-3 {
		return fmt.Sprintf("%.0f mL", v*1e6)
	}
	return fmt.Sprintf("%.4g L", v*1e3)
}
