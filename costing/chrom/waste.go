package chrom

import (
	"math"

	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// wasteAndDemands totals the runs, splits the solvent into the streams as
// they are collected and asks the ledger for every quantity. Solvent left
// in the pores of the spent silica goes with the solids; the dry-load
// solvent, evaporated before the column, is collected on its own; the rest
// of the eluent, with the impurities and mixed fractions, is liquid waste;
// a share distilled for reuse leaves as recovered solvent.
func (p *runPlan) wasteAndDemands(u *usage.Usage, a analysis, sc *scenario.Scenario, coef source.Set) {
	ch, get := sc.Chromatography, coef.Get
	used, dry := p.used.times(p.runs), p.dryLoad.times(p.runs)
	silicaTotal := (p.e.silicaBuy + p.drySilica) * p.runs
	silicaWaste := (p.e.silicaRun + p.drySilica) * p.runs
	area := math.Pi * p.e.diameter * p.e.diameter / 4
	sand := 0.0
	if p.e.packedByMe {
		sand = get(KeySandHeight) * area * get(KeySandDensity) * p.runs
	}
	tlcPlates := p.plates2 * p.runs
	u.AddFigure(usage.FigSolventTotal, "solvent used", used.total(), "L")
	for i, id := range used.ids {
		si := a.solventOf(id)
		u.AddFigure(si.key, si.label, used.v[i], "L")
	}
	liquid := used.times(1)
	for i, id := range liquid.ids {
		liquid.v[i] = used.v[i] - dry.get(id)
	}
	wetSolvent := newVols()
	wetSolvent.addMix(ch.TLCEluent, silicaWaste*get(KeyPoreVolume))
	for i, id := range wetSolvent.ids {
		l := liquid.slot(id)
		liquid.v[l] -= wetSolvent.v[i]
		if liquid.v[l] < 0 {
			wetSolvent.v[i] += liquid.v[l]
			liquid.v[l] = 0
		}
	}
	recovered := p.recover(u, liquid, coef, ch.RecoverSolvent)
	impurityInProduct := u.ProductOutKg * (1 - p.cut.Purity) / p.cut.Purity
	// Mixed fractions sent to a second run leave this pass's waste.
	lostMixed := (u.ProductInKg-u.ProductInKg*get(KeyRetainedLoss))*p.cut.Mixed - p.rerunP
	lostSilica := u.ProductInKg * get(KeyRetainedLoss)
	u.ImpurityOutKg = impurityInProduct
	u.AddFigure(usage.FigImpurityInProduct, "nearest impurity in the isolated product", impurityInProduct, "g")
	spent := a.solventStream("spent eluent and mixed fractions", liquid)
	spent.Components = append(spent.Components,
		usage.Component{Name: "impurities", Kg: u.CrudeKg - u.ProductInKg - impurityInProduct - p.rerunI},
		usage.Component{Name: "product in mixed fractions", Kg: lostMixed})
	wet := usage.Stream{Name: "solvent-wet silica, sand and TLC plates", Class: usage.WetSolids}
	wet.Components = append(wet.Components, usage.Component{Name: "silica gel", Kg: silicaWaste}, usage.Component{Name: "sea sand", Kg: sand}, usage.Component{Name: "TLC plates", Kg: tlcPlates * get(KeyPlateMass)})
	for i, id := range wetSolvent.ids {
		wet.Components = append(wet.Components, usage.Component{Name: id, Kg: wetSolvent.v[i] * a.solventOf(id).density, Solvent: true})
	}
	wet.Components = append(wet.Components, usage.Component{Name: "product retained on silica", Kg: lostSilica})
	u.Waste = []usage.Stream{spent, wet}
	if dry.total() > 0 {
		u.Waste = append(u.Waste, a.solventStream("dry-load solvent (evaporated before the column)", dry))
	}
	p.demands(u, a, coef, used, recovered, silicaTotal, sand, tlcPlates, lostMixed+lostSilica)
}

// solventStream is a stream of solvents, halogenated when any is.
func (a analysis) solventStream(name string, v vols) usage.Stream {
	st := usage.Stream{Name: name, Class: usage.NonHalogenated, VolumeM3: v.total(), Components: make([]usage.Component, 0, len(v.ids)+2)}
	for i, id := range v.ids {
		s := a.solventOf(id)
		if s.halogenated && v.v[i] > 0 {
			st.Class = usage.Halogenated
		}
		st.Components = append(st.Components, usage.Component{Name: id, Kg: v.v[i] * s.density, Solvent: true})
	}
	return st
}

// recover takes the share of the spent eluent distilled for reuse out of
// the liquid waste: the scenario's share times the distillation's yield,
// at most the share of recovered eluent a later run may take.
func (p *runPlan) recover(u *usage.Usage, liquid vols, coef source.Set, share float64) vols {
	if share <= 0 {
		return vols{}
	}
	eff := share * coef.Get(KeyRecoveryYield)
	limit := coef.Get(KeyReuseShare)
	recovered := liquid.times(0)
	for i, v := range liquid.v {
		r := math.Min(v*eff, limit*v)
		recovered.v[i] = r
		liquid.v[i] -= r
	}
	if u.Quiet {
		return recovered
	}
	u.Notef(usage.Info, "%.0f %% of the spent eluent is sent to distillation for reuse; at a yield of %.0f %% it returns %.0f %% (at most %.0f %% of a later run's eluent may be recovered solvent); recovered solvent is credited at its purchase price and its distillation charged as electricity.",
		share*100, coef.Get(KeyRecoveryYield)*100, math.Min(eff, limit)*100, limit*100)
	return recovered
}

// demands asks the ledger for every quantity of the candidate.
func (p *runPlan) demands(u *usage.Usage, a analysis, coef source.Set, used, recovered vols, silica, sand, tlcPlates, lost float64) {
	get := coef.Get
	evap := p.evaporated.times(p.runs)
	for i, id := range p.dryLoad.ids {
		evap.add(id, p.dryLoad.v[i]*p.runs)
	}
	heat := a.heatToEvaporate(evap, get(KeyBathDelta))
	u.AddFigure("evaporation_heat", "heat to evaporate product fractions and dry-load solvent", heat, "kWh")
	_, attended := u.Hours()
	d := u.AddDemand
	if silica > 0 {
		d(ItemSilica, "silica gel 40–63 µm (columns and dry load)", usage.Materials, silica, units.Mass)
	}
	if sand > 0 {
		d(ItemSand, "sand layers", usage.Materials, sand, units.Mass)
	}
	for i, id := range used.ids {
		d(id, a.solventOf(id).used, usage.Materials, used.v[i], units.Volume)
	}
	u.AddCountedDemand(ItemTLCPlate, "TLC plates for fractions", usage.Materials, tlcPlates, tlcPlates*get(KeyPlateMass))
	d(ItemLabour, "hands-on time", usage.Labour, attended*3600, units.Time)
	d(ItemElectricity, "evaporator bath and chiller", usage.Energy, evaporationElectricity(coef, heat), units.Energy)
	addDemandsOfEquipment(u, p.e, p.ev, p.colHours*3600, p.evapHours*3600)
	u.AddDisposals()
	d(ItemProduct, "product lost (mixed fractions, retained on silica)", usage.ProductLoss, lost, units.Mass)
	if len(recovered.ids) > 0 {
		for i, id := range recovered.ids {
			d(id, a.solventOf(id).recovered, usage.Credit, -recovered.v[i], units.Volume)
		}
		d(ItemElectricity, "distilling the recovered eluent", usage.Energy, evaporationElectricity(coef, a.heatToEvaporate(recovered, get(KeyBathDelta))), units.Energy)
	}
}
