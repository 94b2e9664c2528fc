package distil

import (
	"fmt"
	"math"
	"strings"

	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Price-table items the model asks for (besides the rinse solvent by its id
// and disposal by waste class).
const (
	ItemLabour      = usage.ItemLabour
	ItemElectricity = usage.ItemElectricity
	ItemProduct     = usage.ItemProduct
)

// maxAlphaEq caps the equivalent relative volatility α^N_eq: beyond 10¹²
// the Rayleigh equation gives the same cuts to double precision.
const maxAlphaEq = 1e12

// Run models the batch distillation of crudeKg of crude (the still charge)
// as the scenario's distillation section describes it. coef must hold
// Defaults() (with the user's settings applied). A scenario without a
// distillation section gives an infeasible usage saying so.
func Run(sc *scenario.Scenario, coef source.Set, crudeKg float64) usage.Usage {
	d := sc.Distillation
	u := usage.New(Method, crudeKg, 0)
	if d == nil {
		u.Feasible = false
		u.Reason = "the scenario has no distillation section"
		return u
	}
	u.ProductInKg = crudeKg * d.FeedPurity
	note := u.Notef
	fig := u.AddFigure
	fail := func(format string, a ...any) usage.Usage {
		u.Feasible = false
		u.Reason = fmt.Sprintf(format, a...)
		return u
	}
	get := coef.Get
	degC := func(T float64) float64 { return T - 273.15 }

	// Compounds.
	P := newSpecies(d.Product, 0, coef)
	I := newSpecies(d.Impurity, P.M, coef)
	for _, s := range []species{P, I} {
		if len(s.defaults) > 0 {
			note(usage.Info, "%s: %s.", s.name, strings.Join(s.defaults, "; "))
		}
	}
	wF, wT := d.FeedPurity, d.TargetPurity
	if d.FeedFromCrude {
		note(usage.Info, "The still charge is the crude at %.3g %% product (crude.purity); the other %.3g %% is all taken as the key impurity, the cautious case.", wF*100, (1-wF)*100)
	}

	// Which component is the more volatile: compare at the pot limit.
	pP, _ := P.pressure(d.MaxPotK)
	pI, _ := I.pressure(d.MaxPotK)
	if !(pP > 0) || !(pI > 0) {
		return fail("the vapour pressures at the pot limit %.1f °C cannot be evaluated (product %.3g Pa, impurity %.3g Pa); check the boiling points and Antoine constants", degC(d.MaxPotK), pP, pI)
	}
	productLight := pP > pI
	light, heavy := P, I
	if !productLight {
		light, heavy = I, P
	}
	if productLight {
		note(usage.Info, "The product is the more volatile component: it is distilled over as the heart cut and the key impurity stays in the pot.")
	} else {
		note(usage.Info, "The product is the less volatile component: the key impurity is distilled off and the purified product is the pot residue (non-volatile impurities stay with it; the model treats the crude as a binary).")
	}

	// Operating pressure.
	stages := d.ColumnStages
	dp := get(KeyPressureDrop)
	psatH, _ := heavy.pressure(d.MaxPotK)
	pr := OperatingPressures(psatH, stages, dp)
	fig("pot_pressure_needed", "highest pot pressure within the stability limit", psatH, "mbar")
	if !(pr.Head >= d.BestVacuumPa) {
		potBest := d.BestVacuumPa + stages*dp
		tBest, _ := heavy.boilingAt(potBest)
		if !(pr.Head > 0) {
			return fail("the column's pressure drop (%d stages × %.3g mbar) exceeds the %.3g mbar at which %s boils at the pot limit of %.1f °C; use a shorter column or a short-path still", int(math.Round(stages)), dp/100, psatH/100, heavy.name, degC(d.MaxPotK))
		}
		return fail("pot temperature above the limit even at the best vacuum: at the pump's %.3g mbar (%.3g mbar in the pot) %s boils at %.1f °C, above the limit of %.1f °C; keeping under the limit needs %.3g mbar at the head", d.BestVacuumPa/100, potBest/100, heavy.name, degC(tBest), degC(d.MaxPotK), pr.Head/100)
	}
	tPot, inPot := heavy.boilingAt(pr.Pot)
	tHead, inHead := light.boilingAt(pr.Head)
	if math.IsNaN(tPot) || math.IsNaN(tHead) {
		return fail("the boiling points at %.3g mbar (head) and %.3g mbar (pot) cannot be evaluated from the compounds' data; check the boiling points and Antoine constants", pr.Head/100, pr.Pot/100)
	}
	fig("head_pressure", "operating pressure at the still head", pr.Head, "mbar")
	fig("pot_pressure", "pressure in the pot", pr.Pot, "mbar")
	fig("pot_temperature", "pot temperature (boiling point of the less volatile component at the pot pressure)", tPot, "C")
	fig("head_temperature", "head temperature (boiling point of the more volatile component at the head pressure)", tHead, "C")
	if pr.Vacuum {
		note(usage.Info, "Operating pressure: %.3g mbar at the head (%.3g mbar in the pot after %.3g mbar per theoretical stage), the highest at which the pot stays at or below %.1f °C. The pot temperature is taken as the boiling point of the less volatile component (%s) at the pot pressure, the upper bound it approaches as the pot is depleted; the charge starts boiling lower, at its bubble point.", pr.Head/100, pr.Pot/100, dp/100, degC(d.MaxPotK), heavy.name)
		note(usage.Caution, "The pot is run up to its stability limit of %.1f °C: that limit must already include the safety margin your site requires below the decomposition onset found by DSC or ARC.", degC(d.MaxPotK))
	} else {
		note(usage.Info, "The less volatile component (%s) boils at %.1f °C at atmospheric pressure, below the pot limit of %.1f °C: no vacuum is needed.", heavy.name, degC(tPot), degC(d.MaxPotK))
	}

	// Relative volatility, top and bottom.
	plTop, inLT := light.pressure(tHead)
	phTop, inHT := heavy.pressure(tHead)
	plBot, inLB := light.pressure(tPot)
	phBot, inHB := heavy.pressure(tPot)
	aTop := RelativeVolatility(plTop, phTop)
	aBot := RelativeVolatility(plBot, phBot)
	fig("alpha_top", "relative volatility at the head temperature", aTop, "")
	fig("alpha_bottom", "relative volatility at the pot temperature", aBot, "")
	for _, c := range []struct {
		s        species
		in1, in2 bool
		t1, t2   float64
	}{{light, inLT && inHead, inLB, tHead, tPot}, {heavy, inHT, inHB && inPot, tHead, tPot}} {
		if c.s.antoine && !(c.in1 && c.in2) {
			a := c.s.sv.Antoine[0]
			if len(c.s.sv.Antoine) > 1 {
				note(usage.Warning, "%s: at least one of %.1f °C and %.1f °C lies outside every Antoine range; the vapour pressure there is extrapolated.", c.s.name, degC(c.t1), degC(c.t2))
			} else {
				note(usage.Warning, "%s: %.1f–%.1f °C reaches outside the Antoine constants' range (%.1f–%.1f °C); the vapour pressure there is extrapolated.", c.s.name, degC(math.Min(c.t1, c.t2)), degC(math.Max(c.t1, c.t2)), degC(a.Tmin), degC(a.Tmax))
			}
		}
		if !c.s.antoine {
			note(usage.Info, "%s: vapour pressure by the Clausius–Clapeyron equation from the normal boiling point (%.1f °C) and ΔHvap %.1f kJ/mol; good to a few per cent within about 10 K of the boiling point; some 5–10 %% high 30 K below it, where the true ΔHvap is larger.", c.s.name, degC(c.s.sv.BoilingPoint.V), c.s.hvap/1000)
		}
	}
	if !(aTop > 1) || !(aBot > 1) {
		return fail("the vapour-pressure curves of the product and the impurity cross between the head (α %.3g) and the pot (α %.3g): an ideal solution cannot be separated across that point, and a real one very likely forms an azeotrope there", aTop, aBot)
	}
	alpha := MeanVolatility(aTop, aBot)
	fig("alpha", "relative volatility α (geometric mean of head and pot)", alpha, "")
	note(usage.Info, "Relative volatility from Raoult's law (ideal solution, pure-component vapour pressures): α = %.3g at the head and %.3g in the pot; their geometric mean %.3g is used.", aTop, aBot, alpha)
	if alpha < get(KeyMinAlpha) {
		return fail("relative volatility α = %.4g is too close to 1 (below %.3g): distillation would need more than about %.0f theoretical stages", alpha, get(KeyMinAlpha), Fenske(0.9, 0.1, alpha))
	}

	// Compositions as light-component mole fractions.
	xProd := func(w float64) float64 { return MoleFraction(w, P.M, I.M) }
	var xF, xTarget float64
	if productLight {
		xF, xTarget = xProd(wF), xProd(wT)
	} else {
		xF, xTarget = 1-xProd(wF), 1-xProd(wT)
	}

	// A declared azeotrope: the method cannot cross it.
	if az := d.Azeotrope; az != nil {
		if wF < az.ProductFraction && wT >= az.ProductFraction {
			return fail("the declared azeotrope at %.3g %% product lies between the feed (%.3g %%) and the target (%.3g %%): distillation cannot cross an azeotrope", az.ProductFraction*100, wF*100, wT*100)
		}
		note(usage.Warning, "An azeotrope is declared at %.3g %% product. Distillation cannot cross it; between it and the pure product the real volatility is lower than the ideal α used here, so stages, reflux and recovery are optimistic.", az.ProductFraction*100)
	}

	// Shortcut design for the charge as a continuous feed (saturated liquid).
	rd := get(KeyDesignRecovery)
	if !(rd > 0 && rd < 1) {
		return fail("setting %s = %.4g must lie above 0 and below 1", KeyDesignRecovery, rd)
	}
	var xD, xB float64
	if productLight {
		xD = xTarget
		D := rd * xF / xD
		xB = xF * (1 - rd) / (1 - D)
	} else {
		xB = xTarget
		B := rd * (1 - xF) / (1 - xB)
		xD = (xF - B*xB) / (1 - B)
	}
	nMin := Fenske(xD, xB, alpha)
	rMin := UnderwoodMinReflux(xF, xD, alpha)
	mult := d.RefluxMultiple
	if mult == 0 {
		mult = get(KeyRefluxMultiple)
	}
	fig("n_min", "minimum equilibrium stages, incl. the pot (Fenske)", nMin, "")
	fig("r_min", "minimum reflux ratio (Underwood)", math.Max(rMin, 0), "")
	fig("reflux_multiple", "reflux ratio / minimum", mult, "")
	note(usage.Info, "Shortcut design: the still charge is treated as the saturated-liquid feed of a continuous column making %.3g %% product at %.0f %% recovery (Fenske N_min %.3g, Underwood R_min %.3g, Gilliland correlation in Molokanov's form). These methods are for continuous columns; the batch is estimated as a constant-reflux batch in which column and pot act as one stage of relative volatility α^N_eq, N_eq being the total-reflux equivalent of the column at the reflux used (Gilliland solved for N_min), followed by the Rayleigh equation. That equivalent stage ignores the rise of the minimum reflux as the pot is depleted, so the tails (product left in the pot) are underestimated; fore-run and hold-up losses are not affected.", wT*100, rd*100, nMin, math.Max(rMin, 0))

	nAvail := stages + 1
	fig("stages_available", "equilibrium stages available, incl. the pot", nAvail, "")
	R, nEq := 0.0, 1.0
	switch {
	case rMin <= 0:
		note(usage.Info, "One equilibrium stage already makes the target from the charge (R_min ≤ 0): the still is run as a simple distillation%s.", map[bool]string{true: " through the column without reflux", false: ""}[stages > 0])
		fig("stages_needed", "equilibrium stages needed at the reflux used, incl. the pot", math.Max(nMin, 1), "")
	case stages == 0:
		nReq := GillilandStages(nMin, mult*rMin, rMin)
		fig("stages_needed", "equilibrium stages a column would need at the chosen reflux multiple, incl. the pot (Gilliland)", nReq, "")
		fig("reflux_for_stages_needed", "reflux ratio that column would use", mult*rMin, "")
		note(usage.Info, "Simple distillation (no column, no reflux): one equilibrium stage, the Rayleigh equation at α exactly.")
	default:
		R = mult * rMin
		nReq := GillilandStages(nMin, R, rMin)
		rAvail := GillilandReflux(nMin, nAvail, rMin)
		fig("stages_needed", "equilibrium stages needed at the reflux used, incl. the pot (Gilliland)", nReq, "")
		fig("reflux_used", "reflux ratio used", R, "")
		fig("reflux_for_available", "reflux ratio the available stages need (Gilliland)", rAvail, "")
		if !(nReq <= nAvail) {
			if math.IsInf(nReq, 1) {
				return fail("at the minimum reflux (multiple %.3g) a column needs infinitely many stages; raise reflux_multiple above 1", mult)
			}
			if math.IsInf(rAvail, 1) {
				return fail("needs %.1f equilibrium stages (pot included) at reflux %.3g; the column has %.3g above the pot, fewer than the minimum %.1f even at total reflux", nReq, R, stages, nMin)
			}
			return fail("needs %.1f equilibrium stages (pot included) at reflux %.3g (%.3g × R_min); the column has %.3g above the pot. A reflux ratio of %.3g (%.3g × R_min) would do with this column", nReq, R, mult, stages, rAvail, rAvail/rMin)
		}
		nEq = EquivalentStages(nAvail, R, rMin)
	}
	alphaEq := math.Min(math.Pow(alpha, nEq), maxAlphaEq)
	fig("reflux_used_batch", "reflux ratio of the batch", R, "")
	fig("stages_equivalent", "total-reflux equivalent stages of column and pot", nEq, "")
	fig("alpha_equivalent", "equivalent relative volatility α^N_eq", alphaEq, "")

	// Still, batches and hold-up.
	mMean := 1 / (wF/P.M + (1-wF)/I.M) // kg/mol of the charge
	rhoMix := 1 / (wF/P.rho + (1-wF)/I.rho)
	fill := d.FillLimit
	if fill == 0 {
		fill = get(KeyFillLimit)
	}
	stills := d.StillsM3
	if len(stills) == 0 {
		stills = DefaultStillsM3
	}
	st := ChooseStill(crudeKg/rhoMix, fill, stills)
	batches := float64(st.Batches)
	mBatch := crudeKg / batches
	nBatch := mBatch / mMean
	fig("still_volume", "still volume", st.Volume, "L")
	fig("batches", "batches", batches, "")
	u.Equipment = fmt.Sprintf("%.4g L still, %.4g stages above the pot", st.Volume*1e3, d.ColumnStages)
	if st.Batches > 1 {
		u.Equipment += fmt.Sprintf(" × %d batches", st.Batches)
	}
	fig("charge_per_batch", "charge per batch", mBatch, "g")
	if st.Batches > 1 {
		note(usage.RepeatLevel(st.Batches), "The charge (%.3g L) is more than the largest still (%.3g L at %.0f %% fill) holds: %d batches of %s.", crudeKg/rhoMix*1000, st.Volume*1000, fill*100, st.Batches, scenario.FormatMass(mBatch))
	}
	vHold := HoldupVolume(st.Volume, stages, get(KeyHoldupHead), get(KeyHoldupStage))
	holdShare := vHold / st.Charge
	fig("holdup", "hold-up of head and column", vHold, "mL")
	if holdShare > get(KeyMaxHoldup) {
		return fail("the still head and column hold about %.2g mL, %.0f %% of the %.2g mL charge in the smallest suitable still (%s): too small a batch for this apparatus; a short-path (Kugelrohr) distillation or a larger batch would suit", vHold*1e6, holdShare*100, st.Charge*1e6, formatL(st.Volume))
	}

	// The batch.
	br := BatchRun(Batch{X0: xF, AlphaEq: alphaEq, ProductLight: productLight, Target: xTarget,
		Forerun: get(KeyForerun), Holdup: holdShare, MinResidue: get(KeyMinResidue)})
	fig("first_distillate_purity", "product in the first distillate (mass)", func() float64 {
		if productLight {
			return MassFraction(br.FirstDrop, P.M, I.M)
		}
		return MassFraction(1-br.FirstDrop, P.M, I.M)
	}(), "%")
	if !br.Reachable {
		if productLight {
			y := MassFraction(br.FirstDrop, P.M, I.M)
			if stages == 0 {
				return fail("simple distillation cannot reach %.3g %%: the first distillate holds only %.3g %% product; a column of about %.0f equilibrium stages at a reflux of %.2g is needed", wT*100, y*100, math.Ceil(GillilandStages(nMin, mult*rMin, rMin)), mult*rMin)
			}
			return fail("the column at reflux %.3g gives a first distillate of only %.3g %% product, below the %.3g %% wanted; raise reflux_multiple or use more stages", R, y*100, wT*100)
		}
		return fail("distilling the impurity off until the pot holds %.3g %% product would leave less than the %.0f %% of the charge that must stay in the pot (never distil to dryness); a column or a reflux would keep more product back", wT*100, get(KeyMinResidue)*100)
	}
	if br.Limited && productLight {
		note(usage.Info, "The product cut ends where %.0f %% of the charge is left in the pot (never distil to dryness), before its purity falls to the target.", get(KeyMinResidue)*100)
	}

	// Per batch, from moles per mole of charge to kg.
	mL, mH := light.M, heavy.M
	prodKg := func(c Cut) float64 {
		if productLight {
			return nBatch * c.Light * mL
		}
		return nBatch * (c.N - c.Light) * mH
	}
	trap := 0.0
	if pr.Vacuum {
		trap = get(KeyColdTrap)
	}
	split := func(c Cut, share float64) Cut { return Cut{N: c.N * share, Light: c.Light * share} }
	trapCut := Cut{N: trap * (br.Forerun.N + br.Heart.N), Light: trap * (br.Forerun.Light + br.Heart.Light)}
	forerun := split(br.Forerun, 1-trap)
	heart := split(br.Heart, 1-trap)

	var recovered, lossFore, lossTails, lossHold, lossTrap float64
	if productLight {
		recovered = prodKg(heart)
		lossTails = prodKg(br.Pot)
	} else {
		recovered = prodKg(br.Pot)
	}
	lossFore = prodKg(forerun)
	lossHold = prodKg(br.Holdup)
	lossTrap = prodKg(trapCut)
	u.ProductOutKg = recovered * batches
	purity := heart.X()
	if productLight {
		purity = MassFraction(purity, P.M, I.M)
	} else {
		purity = MassFraction(1-br.Pot.X(), P.M, I.M)
	}
	fig("product_in", "product in the charge", u.ProductInKg, "g")
	fig("product_out", "product recovered", u.ProductOutKg, "g")
	fig("recovery", "recovery", u.ProductOutKg/u.ProductInKg, "%")
	fig("product_purity", "purity of the product cut (mass)", purity, "%")
	fig("loss_forerun", map[bool]string{true: "product lost in the fore-run", false: "product lost in the distilled impurity cut"}[productLight], lossFore*batches, "g")
	fig("loss_tails", "product left in the pot residue and tails", lossTails*batches, "g")
	fig("loss_holdup", "product lost in the column and head hold-up", lossHold*batches, "g")
	fig("loss_cold_trap", "product lost to the cold trap", lossTrap*batches, "g")
	if r := u.ProductOutKg / u.ProductInKg; r < 0.5 {
		note(usage.Warning, "Only %.0f %% of the product is recovered: %s", r*100, map[bool]string{true: "a column with more stages or more reflux would give a larger heart cut, and the tails can be recycled into the next batch.", false: "a column with reflux would hold more product back in the pot."}[productLight])
	}

	// Energy per batch.
	vap := Cut{N: (R+1)*(br.Forerun.N+br.Heart.N) + br.Holdup.N, Light: (R+1)*(br.Forerun.Light+br.Heart.Light) + br.Holdup.Light}
	vapHeavy := vap.N - vap.Light
	qVap := nBatch * (vap.Light*light.hvap + vapHeavy*heavy.hvap)
	vBoil := nBatch * (vap.Light*mL/light.rho + vapHeavy*mH/heavy.rho)
	cpMass := wF*P.cp/P.M + (1-wF)*I.cp/I.M // J/(kg·K)
	qSens := mBatch * cpMass * math.Max(0, tPot-get(KeyRoomTemperature))
	boil := get(KeyBoilup) * HeatedAreaScale(st.Volume, ReferenceStillM3)
	tBoil := vBoil / boil
	power := qVap / tBoil // W delivered to the pot while boiling
	tHeat := qSens / power
	tEq := 0.0
	if stages > 0 && R > 0 {
		tEq = get(KeyEquilibration)
	}
	qEq := power * tEq
	heatIn := (qSens + qVap + qEq) * batches
	condenser := (qVap + qEq) * batches
	pump := 0.0
	if pr.Vacuum {
		pump = get(KeyPumpPower) * (tHeat + tEq + tBoil + get(KeyCooldown)) * batches
	}
	electric := heatIn/get(KeyHeaterEff) + condenser/get(KeyChillerCOP) + pump
	fig("boilup_rate", "boil-up rate (liquid evaporated)", boil, "L/h")
	fig("heater_power", "heat delivered to the pot while boiling", power, "W")
	fig("boilup_time", "boil-up time per batch", tBoil, "h")
	fig("heat_input", "heat to the pot (sensible, vaporization, total-reflux start)", heatIn, "kWh")
	fig("condenser_duty", "condenser duty", condenser, "kWh")
	fig("energy", "electricity (heater, chiller, vacuum pump)", electric, "kWh")
	note(usage.Info, "Energy: (R + 1) × distillate × ΔHvap plus the sensible heat of the charge to the pot temperature; ΔHvap is taken at the normal boiling point (a few per cent low at reduced pressure). The condenser removes the vaporization heat through a chiller.")
	if tHead < get(KeyCoolant)+get(KeyCondenserMargin) {
		note(usage.Warning, "The head temperature (%.1f °C) is within %.0f K of the condenser coolant (%.1f °C) or below it: %s will pass the condenser into the cold trap unless a colder condenser is used.", degC(tHead), get(KeyCondenserMargin), degC(get(KeyCoolant)), light.name)
	}
	if stages > 0 && pr.Vacuum {
		note(usage.Info, "Under vacuum the vapour volume is large; check that the boil-up of %.2g L/h does not flood the column.", boil*3.6e6)
	}

	// Time.
	act := func(name string, elapsed, attendedShare float64) {
		if elapsed > 0 {
			u.Activities = append(u.Activities, usage.Activity{Name: name, Elapsed: elapsed, Attended: elapsed * attendedShare})
		}
	}
	att := get(KeyAttended)
	cuts := 3.0
	if !productLight {
		cuts = 2
	}
	act("set up still, column and vacuum; leak test", get(KeySetupTime), 1)
	act("heat the charge to boiling", tHeat*batches, att)
	act("equilibrate the column at total reflux", tEq*batches, att)
	act("distil and take the cuts", tBoil*batches, att)
	act("cool the pot before venting", get(KeyCooldown)*batches, 0)
	act("analyse the cuts (GC or NMR)", cuts*get(KeyAnalysisPerCut)*batches, 1)
	act("dismantle and clean the still", get(KeyCleanup), 1)

	// Waste.
	stream := func(name string, parts ...struct {
		s  species
		kg float64
	}) usage.Stream {
		w := usage.Stream{Name: name, Class: usage.NonHalogenated}
		for _, p := range parts {
			if !(p.kg > 0) {
				continue
			}
			if p.s.halogenated {
				w.Class = usage.Halogenated
			}
			w.Components = append(w.Components, usage.Component{Name: p.s.name, Kg: p.kg, Solvent: p.s.known})
			w.VolumeM3 += p.kg / p.s.rho
		}
		return w
	}
	type part = struct {
		s  species
		kg float64
	}
	parts := func(c Cut) []part {
		return []part{{light, nBatch * c.Light * mL * batches}, {heavy, nBatch * (c.N - c.Light) * mH * batches}}
	}
	if productLight {
		u.Waste = append(u.Waste, stream("fore-run", parts(forerun)...))
		drained := Cut{N: br.Pot.N + br.Holdup.N, Light: br.Pot.Light + br.Holdup.Light}
		u.Waste = append(u.Waste, stream("pot residue, tails and drained hold-up", parts(drained)...))
	} else {
		u.Waste = append(u.Waste, stream("distilled impurity cut", parts(forerun)...))
		u.Waste = append(u.Waste, stream("column and head hold-up", parts(br.Holdup)...))
	}
	if trap > 0 {
		u.Waste = append(u.Waste, stream("cold-trap condensate", parts(trapCut)...))
	}
	rinse := get(KeyRinse) * st.Volume
	if rinse > 0 {
		rs, ok := sc.Solvents.Find(d.RinseSolvent)
		if ok {
			w := usage.Stream{Name: "still and column rinse", Class: usage.NonHalogenated, VolumeM3: rinse}
			if rs.Halogenated {
				w.Class = usage.Halogenated
			}
			w.Components = append(w.Components, usage.Component{Name: rs.ID, Kg: rinse * rs.Density.V, Solvent: true})
			u.Waste = append(u.Waste, w)
		} else {
			rinse = 0
		}
	}
	fig("solvent_total_l", "solvent used (rinse)", rinse, "L")
	if rinse > 0 {
		fig("solvent:"+d.RinseSolvent, "solvent: "+d.RinseSolvent, rinse, "L")
	}
	if !P.halogenated && !I.halogenated {
		note(usage.Info, "Waste streams are classed as non-halogenated: neither compound is marked as halogenated.")
	}

	// Demands for the ledger.
	_, attended := u.Hours()
	dm := u.AddDemand
	if rinse > 0 {
		dm(d.RinseSolvent, "rinse solvent: "+d.RinseSolvent, usage.Materials, rinse, units.Volume)
	}
	dm(ItemLabour, "hands-on time", usage.Labour, attended*3600, units.Time)
	dm(ItemElectricity, "heater, condenser chiller and vacuum pump", usage.Energy, electric, units.Energy)
	for _, w := range u.Waste {
		dm(w.Class.DisposalItem(), w.DisposalLabel(), usage.Disposal, w.Kg(), units.Mass)
	}
	dm(ItemProduct, "product lost (fore-run, tails, hold-up, cold trap)", usage.ProductLoss, u.ProductInKg-u.ProductOutKg, units.Mass)
	return u
}

// formatL writes a still volume as "250 mL" or "2 L".
func formatL(m3 float64) string {
	if m3 < 1e-3 {
		return fmt.Sprintf("%.4g mL", m3*1e6)
	}
	return fmt.Sprintf("%.4g L", m3*1e3)
}
