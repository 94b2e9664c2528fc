package cryst

import (
	"math"

	"sepcost/costing/scenario"
	"sepcost/costing/usage"
)

// outcome is what the physics of one run found, in SI; report turns it
// into figures, demands, waste and notes.
type outcome struct {
	crudeKg, productIn float64
	sHot, sCold        float64 // product solubility, kg/m³ of solvent
	impHot, impCold    float64 // impurity solubility (0 when by purge factor)
	hSol               float64 // enthalpy of solution used, J/mol (0: left out)
	feed               Feed
	purify             Outcome
	noVessels          bool

	// Only when the target is reached and a vessel found:
	plans       []batchPlan // per pass
	batches     int         // over all passes
	product     Feed        // isolated product (with a second crop when taken)
	crop        cropResult
	used        scenario.Volumes
	mlVol       float64 // mother liquor volume, m³
	washVol     float64 // wash liquid, m³
	ml, wash    Feed    // dissolved in mother liquors and washings
	dryVol      float64 // liquid evaporated from the final cake, m³
	heatIn      float64 // J
	heatOut     float64 // J
	chillHeat   float64 // J removed below room temperature
	dryHeat     float64 // J to evaporate the cake's liquid
	evapHeat    float64 // J to evaporate the second crop's liquor
	electric    float64 // J of electricity
	heatS       float64 // heating, all batches, s
	coolS       float64 // cooling, all batches, s
	filtS       float64 // filtration and washing, all batches, s
	dry         dryResult
	acts        map[string]*usage.Activity
	lastBatches float64
}

// cropResult is the second crop, when one is described.
type cropResult struct {
	described bool
	crop      Feed    // recovered (zero when none)
	blend     Feed    // first product plus crop
	evap      float64 // liquor evaporated, m³
	taken     bool
}

// dryResult is the drying of the final cake, per batch.
type dryResult struct {
	area, time, liquidKg, solidKg float64
}

// batchPlan is the equipment and the heating and cooling of one pass,
// set from the pass's feed.
type batchPlan struct {
	liquid      float64 // solvent and crystals of the pass, m³
	vessel      Vessel
	n           float64 // batches
	C           float64 // heat capacity of the pass, J/K
	qDiss       float64 // heat of dissolution of the pass, J
	qCryst      float64 // heat of crystallization of the pass, J
	area        float64 // wetted area of one batch, m²
	ua          float64 // U·A of one batch, W/K
	tHeat       float64 // heating time of one batch, s
	tCool       float64 // cooling time of one batch, s
	tCoolJacket float64 // jacket-limited cooling time of one batch, s
	rate        float64 // cooling rate, K/s
	inclusion   float64 // occluded liquor per mass of crystals
	crew        float64 // people attending a hands-on step
}

// compute runs the physics of one batch mass.
func (m *Model) compute(crudeKg float64) outcome {
	cr, p := m.cr, m.p
	o := outcome{crudeKg: crudeKg, productIn: crudeKg * m.sc.Purity}
	TH, TC := cr.DissolveK, cr.IsolateK
	o.sHot, o.sCold = cr.Product.Curve.At(TH), cr.Product.Curve.At(TC)
	if !cr.ImpurityByPurge {
		o.impHot, o.impCold = cr.Impurity.Curve.At(TH), cr.Impurity.Curve.At(TC)
	}
	if h := cr.Product.Curve.Enthalpy(); cr.Product.MolarMass > 0 && h > 0 {
		o.hSol = h
	}
	other := math.Max(0, crudeKg*(1-m.sc.Purity-cr.ImpurityFraction))
	o.feed = Feed{Product: o.productIn, Impurity: crudeKg * cr.ImpurityFraction, Other: other}
	base := m.basePass(o)
	o.purify = PurifyWith(func(in Feed) Pass {
		ps := base
		ps.Inclusion = m.plan(in, o).inclusion
		return ps
	}, o.feed, cr.TargetPurity, p.maxPasses)
	if o.purify.Stop != Reached {
		return o
	}
	if len(p.flasks)+len(p.reactors) == 0 {
		o.noVessels = true
		return o
	}
	m.passes(&o)
	m.secondCrop(&o)
	m.finish(&o)
	return o
}

// basePass is the pass conditions that do not depend on the feed.
func (m *Model) basePass(o outcome) Pass {
	cr, p := m.cr, m.p
	ps := Pass{
		SHot: o.sHot, SCold: o.sCold, Excess: p.excess,
		ByPurge: cr.ImpurityByPurge, Purge: cr.PurgeFactor, ImpHot: o.impHot, ImpCold: o.impCold,
		LiquidDensity: cr.LiquidDensity, CrystalDensity: p.crystalDensity,
		Porosity: p.porosity, Saturation: p.saturation, Distribution: p.distribution,
		WashCakeVolumes: p.washCakeVolumes, WashSaturation: p.washSaturation,
	}
	if cr.WashCakeVolumes != nil {
		ps.WashCakeVolumes = *cr.WashCakeVolumes
	}
	if cr.WashFraction != nil {
		ps.WashFraction = *cr.WashFraction
		if ps.WashFraction == 0 {
			ps.WashCakeVolumes = 0
		}
	}
	if cr.WashLoss != nil {
		ps.WashLoss, ps.WashLossGiven = *cr.WashLoss, true
	}
	return ps
}

// plan sizes the vessel of a pass charged with in and times its heating
// and cooling: jacket-limited heating and cooling of a batch of 1/n of the
// pass, the cooling no faster than the controlled ramp; the occluded
// liquor follows the cooling rate (InclusionAt).
func (m *Model) plan(in Feed, o outcome) batchPlan {
	cr, p := m.cr, m.p
	TH, TC, Troom := cr.DissolveK, cr.IsolateK, p.roomT
	V := in.Product / o.sHot * (1 + p.excess)
	var b batchPlan
	b.liquid = V + in.Total()/p.crystalDensity
	b.vessel = ChooseVessel(b.liquid, p.flasks, p.reactors, p.flaskFill, p.reactorFill)
	b.n = math.Max(1, float64(b.vessel.Batches))
	b.crew = 1
	if b.vessel.Reactor {
		b.crew = p.crew
	}
	b.C = m.liq.heatCapacity(V) + in.Total()*p.solidCp
	if o.hSol > 0 {
		b.qDiss = o.hSol * in.Product / cr.Product.MolarMass
		b.qCryst = o.hSol * math.Max(0, in.Product-V*o.sCold) / cr.Product.MolarMass
	}
	U, a := p.uFlask, p.areaFlask
	if b.vessel.Reactor {
		U, a = p.uReactor, p.areaReactor
	}
	b.area = WettedArea(a, b.liquid/b.n)
	b.ua = U * b.area
	if up := TH - Troom; up > 0 {
		b.tHeat = JacketTime(EffectiveHeatCapacity(b.C/b.n, b.qDiss/b.n, up), U, b.area, Troom, TH, TH+p.heatApproach)
	}
	b.tCoolJacket = JacketTime(EffectiveHeatCapacity(b.C/b.n, b.qCryst/b.n, TH-TC), U, b.area, TH, TC, TC-p.coolApproach)
	b.tCool = math.Max(b.tCoolJacket, (TH-TC)/p.maxCoolingRate)
	b.rate = (TH - TC) / b.tCool
	b.inclusion = InclusionAt(p.inclusion, b.rate, p.inclusionRate)
	return b
}

// passes accounts pass by pass for the solvent bought, the liquors, the
// heat and the hands-on steps up to the wet cake.
func (m *Model) passes(o *outcome) {
	cr, p := m.cr, m.p
	TH, TC, Troom := cr.DissolveK, cr.IsolateK, p.roomT
	o.used = scenario.Volumes{}
	o.acts = map[string]*usage.Activity{}
	carried := 0.0
	for _, r := range o.purify.Passes {
		b := m.plan(r.In, *o)
		o.plans = append(o.plans, b)
		n := b.n
		o.batches += b.vessel.Batches
		o.lastBatches = n
		// Solvent bought: the charge plus the wash, less what the wet cake
		// of the previous pass brings along.
		o.used.Add(cr.Mix, math.Max(0, r.Solvent-carried)+r.Wash)
		carried = r.Retained
		o.mlVol += r.LiquorVolume
		o.washVol += r.Wash
		o.ml = addFeed(o.ml, r.Liquor)
		o.wash = addFeed(o.wash, r.Washings)

		up := math.Max(0, TH-Troom)
		o.heatIn += b.C*up + b.qDiss
		qOut := b.C*(TH-TC) + b.qCryst
		o.heatOut += qOut
		if TC < Troom {
			o.chillHeat += qOut * (math.Min(Troom, TH) - TC) / (TH - TC)
		}
		tFilt := m.filtration(r, b)
		o.heatS += n * b.tHeat
		o.coolS += n * b.tCool
		o.filtS += n * tFilt

		charge := p.setupTime + TransferTime(r.Solvent/n, p.transferRate)
		if b.vessel.Reactor {
			charge += r.In.Total() / n / p.solidChargeRate
		}
		o.act(ActCharge, n*charge, n*charge*b.crew)
		o.act(ActHeat, n*(b.tHeat+p.hotHold), n*(b.tHeat+p.hotHold)*p.heatAttended*b.crew)
		o.act(ActCool, n*(b.tCool+p.aging), n*(b.tCool+p.aging)*p.coolAttended*b.crew)
		o.act(ActFilter, n*tFilt, n*tFilt*p.filterAttended*b.crew)
		o.act(ActCheck, p.checkTime, p.checkTime)
		clean := CleaningTime(p.cleanTime, p.cleanPerArea, WettedArea(m.areaFactor(b), b.vessel.Volume))
		o.act(ActClean, n*clean, n*clean*p.cleanAttended*b.crew)
	}
	last := o.purify.Passes[len(o.purify.Passes)-1]
	o.product = last.Out
}

// areaFactor is the wetted-area factor of the pass's vessel.
func (m *Model) areaFactor(b batchPlan) float64 {
	if b.vessel.Reactor {
		return m.p.areaReactor
	}
	return m.p.areaFlask
}

// filterOf is the filter that takes one batch of a pass: its area (m²),
// the pressure difference (Pa) and the dry cake per volume of filtrate
// (kg/m³). A funnel under vacuum at flask scale, sized to the cake; the
// reactor's pressure filter, sized to the reactor, at reactor scale.
func (m *Model) filterOf(r PassResult, b batchPlan) (A, dp, c float64) {
	p := m.p
	cake := r.CakeVolume / b.n
	A, dp = FilterArea(cake, p.cakeDepth, p.minFilterArea), p.vacuumDrop
	if b.vessel.Reactor {
		A, dp = PlantFilterArea(p.filterAreaFactor, b.vessel.Volume), p.pressureDrop
	}
	if r.LiquorVolume > 0 {
		c = cake * (1 - p.porosity) * p.crystalDensity / (r.LiquorVolume / b.n)
	}
	return A, dp, c
}

// filtration is the time to transfer, filter and wash one batch of a
// pass, s: setting up, moving the slurry and the wash at the transfer
// rate, the cake built at constant pressure and the wash through it.
func (m *Model) filtration(r PassResult, b batchPlan) float64 {
	p := m.p
	A, dp, c := m.filterOf(r, b)
	vf, w := r.LiquorVolume/b.n, r.Wash/b.n
	return p.filterSetup + TransferTime(b.liquid/b.n+w, p.transferRate) +
		CakeFiltrationTime(vf, A, dp, p.viscosity, p.cakeResistance, c, p.mediumResistance) +
		CakeWashTime(w, vf, A, dp, p.viscosity, p.cakeResistance, c, p.mediumResistance)
}

// secondCrop takes a second crop from the last mother liquor when the
// scenario describes one and the combined product still meets the target.
func (m *Model) secondCrop(o *outcome) {
	cr := m.cr
	sc2 := cr.SecondCrop
	if sc2 == nil {
		return
	}
	last := o.purify.Passes[len(o.purify.Passes)-1]
	k := &o.crop
	k.described = true
	k.crop, k.evap = SecondCrop(last.LiquorVolume, last.Liquor, o.sCold, sc2.ConcentrateTo, sc2.Purity)
	k.blend = addFeed(o.product, k.crop)
	if k.crop.Product <= 0 || k.blend.Purity() < cr.TargetPurity {
		return
	}
	k.taken = true
	o.product = k.blend
	o.ml = subFeed(o.ml, k.crop)
	o.mlVol -= k.evap
	// Boiled off in the vessel at the jacket's heat-transfer rate.
	b := o.plans[len(o.plans)-1]
	qb := m.liq.evaporationHeat(k.evap/o.lastBatches, math.Max(0, cr.BoilingK-cr.IsolateK))
	t := o.lastBatches * qb / (b.ua * m.p.heatApproach)
	o.act(ActCropEvap, t, t*m.p.evapAttended*b.crew)
	tc := o.lastBatches * m.p.cropTime
	o.act(ActCrop, tc, tc*m.p.cropAttended*b.crew)
}

// finish dries the final cake to the loss-on-drying target, discharges
// the product and adds up the energy.
func (m *Model) finish(o *outcome) {
	cr, p := m.cr, m.p
	last := o.purify.Passes[len(o.purify.Passes)-1]
	b := o.plans[len(o.plans)-1]
	n := b.n
	o.dryVol = last.Retained
	d := &o.dry
	d.liquidKg = last.Retained * cr.LiquidDensity / n
	d.solidKg = last.Out.Total() / n
	d.area = last.CakeVolume / n / p.trayDepth
	if b.vessel.Reactor {
		d.area, _, _ = m.filterOf(last, b)
	}
	d.time = DryingTime(d.liquidKg, d.solidKg, p.lodTarget, p.dryingFlux, d.area)
	o.act(ActDry, n*(p.drySetup+d.time), n*(p.drySetup+d.time*p.dryAttended)*b.crew)
	dis := p.setupTime + o.product.Total()/n/p.dischargeRate
	o.act(ActDischarge, n*dis, n*dis*b.crew)
	o.dryHeat = m.liq.evaporationHeat(o.dryVol, p.dryWarmup)
	o.evapHeat = m.liq.evaporationHeat(o.crop.evap*b2f(o.crop.taken), math.Max(0, cr.BoilingK-cr.IsolateK))
	// Heaters at their efficiency; heat removed above room temperature
	// goes to cooling water, below it to a chiller at its COP; evaporation
	// (drying, second crop) pays heater and condenser.
	ev := o.dryHeat + o.evapHeat
	o.electric = o.heatIn/p.heaterEff + o.chillHeat/p.chillerCOP + ev/p.heaterEff + ev/p.chillerCOP
}

// act adds elapsed and attended seconds to an activity.
func (o *outcome) act(name string, elapsed, attended float64) {
	a := o.acts[name]
	if a == nil {
		a = &usage.Activity{Name: name}
		o.acts[name] = a
	}
	a.Elapsed += elapsed
	a.Attended += attended
}
