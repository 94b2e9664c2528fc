package cryst

import (
	"fmt"

	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// report fills the usage from the outcome: figures, equipment, activities,
// waste, demands, notes and, when the target is not reached, the reason.
func (m *Model) report(u *usage.Usage, o *outcome) {
	fig := u.AddFigure
	fig("s_hot", "product solubility at the dissolution temperature", o.sHot, "g/L")
	fig("s_cold", "product solubility at the isolation temperature", o.sCold, "g/L")
	if !m.cr.ImpurityByPurge {
		fig("impurity_s_cold", "impurity solubility at the isolation temperature", o.impCold, "g/L")
		fig("distribution", "logarithmic distribution coefficient λ of the impurity", m.p.distribution, "")
	}
	if o.hSol > 0 {
		fig("dissolution_enthalpy", "enthalpy of solution of the product", o.hSol, "kJ/mol")
	}
	m.solubilityNotes(u, o)
	fig("product_in", "product in the crude", u.ProductInKg, "g")
	fig("passes", "recrystallizations (passes)", float64(len(o.purify.Passes)), "")
	fig("purity_reached", "purity reached", o.purify.Purity, "%")
	for i, r := range o.purify.Passes {
		fig(usage.FigureKey(fmt.Sprintf("yield_pass_%d", i+1)), fmt.Sprintf("yield of pass %d", i+1), r.Yield(), "%")
		fig(usage.FigureKey(fmt.Sprintf("purity_pass_%d", i+1)), fmt.Sprintf("purity after pass %d", i+1), r.Out.Purity(), "%")
		fig(usage.FigureKey(fmt.Sprintf("ceiling_pass_%d", i+1)), fmt.Sprintf("purity ceiling of pass %d (impurity inside the crystals; no wash does better)", i+1), r.Ceiling(), "%")
	}
	m.passNotes(u, o)
	if o.purify.Stop != Reached {
		u.Feasible = false
		u.Reason = m.reason(o)
		return
	}
	if o.noVessels {
		u.Feasible = false
		u.Reason = "no vessels: the scenario's vessel lists are empty"
		return
	}
	m.equipmentFigures(u, o)
	u.ProductOutKg = o.product.Product
	u.ImpurityOutKg = o.product.Impurity + o.product.Other
	fig("yield_overall", "overall yield of the passes", o.purify.Yield(), "%")
	m.cropNotes(u, o)
	fig("product_out", "product recovered", u.ProductOutKg, "g")
	fig("impurity_out", "impurity isolated with the product", u.ImpurityOutKg, "g")
	fig("recovery", "recovery", u.ProductOutKg/u.ProductInKg, "%")
	if o.product.Purity() != o.purify.Purity {
		fig("purity_final", "purity of the combined product", o.product.Purity(), "%")
	}
	for _, name := range activityOrder {
		if a := o.acts[name]; a != nil {
			u.Activities = append(u.Activities, *a)
		}
	}
	// Hours by activity, elapsed and hands-on, are in u.Activities (every
	// report shows them); these are the physical step times.
	fig("hours_heating", "heating (all batches)", o.heatS, "h")
	fig("hours_cooling", "cooling (all batches)", o.coolS, "h")
	fig("hours_filtration", "transfer, filtration and washing (all batches)", o.filtS, "h")
	fig("drying_area", "drying area per batch (oven trays or the filter-dryer)", o.dry.area, "m^2")
	fig("drying_time", "drying time per batch to the loss-on-drying target, after loading", o.dry.time, "h")
	fig("heat_input", "heat to warm and dissolve", o.heatIn, "kWh")
	fig("heat_removed", "heat removed on cooling", o.heatOut, "kWh")
	fig("heat_chilled", "heat removed below room temperature (chiller)", o.chillHeat, "kWh")
	fig("heat_evaporation", "heat to dry the crystals and concentrate liquor", o.dryHeat+o.evapHeat, "kWh")
	fig("electricity", "electricity", o.electric, "kWh")
	fig(usage.FigSolventTotal, "solvent used", o.used.Total(), "L")
	for _, id := range o.used.IDs() {
		fig(usage.SolventFigure(id), "solvent: "+id, o.used[id], "L")
	}
	fig("wash_total_l", "wash liquid used", o.washVol, "L")
	fig("screening_hours", "one-time screening and development", m.p.screeningTime, "h")
	fig("screening_material", "one-time crude used in screening", m.p.screeningMass, "g")
	m.scaleNotes(u, o)
	m.waste(u, o)
	m.demands(u, o)
}

// equipmentFigures reports the first pass's vessel, batches and step
// times, and the filter and cake.
func (m *Model) equipmentFigures(u *usage.Usage, o *outcome) {
	fig := u.AddFigure
	b, r := o.plans[0], o.purify.Passes[0]
	fig("solvent_per_batch_l", "solvent per batch (first pass)", r.Solvent/b.n, "L")
	fig("vessel_volume", "vessel nominal volume (first pass)", b.vessel.Volume, "L")
	fig("jacketed_reactor", "jacketed reactor (1) or flask (0), first pass", b2f(b.vessel.Reactor), "")
	fig("vessel_fill", "share of the vessel filled (first pass)", b.vessel.Fill, "%")
	fig("batches", "batches (first pass)", b.n, "")
	fig("batches_total", "batches over all passes", float64(o.batches), "")
	kind := "flask"
	if b.vessel.Reactor {
		kind = "jacketed reactor"
	}
	u.Equipment = fmt.Sprintf("%s %s", units.FormatVolume(b.vessel.Volume), kind)
	if b.vessel.Batches > 1 {
		u.Equipment += fmt.Sprintf(" × %d batches", b.vessel.Batches)
	}
	u.EquipmentID = u.Equipment // a vessel of the table and a count: nothing that follows the mass smoothly
	fig("heating_time", "heating time per batch (first pass)", b.tHeat, "h")
	fig("cooling_time", "cooling time per batch (first pass)", b.tCool, "h")
	fig("cooling_time_jacket", "jacket-limited cooling time per batch (first pass)", b.tCoolJacket, "h")
	fig("cooling_rate", "mean cooling rate (first pass)", b.rate, "K/h")
	fig("inclusion", "mother liquor occluded per mass of crystals at that rate (first pass)", b.inclusion, "%")
	A, dp, _ := m.filterOf(r, b)
	fig("filter_area", "filter area (first pass)", A, "m^2")
	fig("filter_pressure", "pressure difference across the filter (first pass)", dp, "bar")
	fig("cake_depth", "cake depth per batch (first pass)", r.CakeVolume/b.n/A, "cm")
	fig("filtration_time", "transfer, filtration and wash time per batch (first pass)", m.filtration(r, b), "h")
	fig("operators", "people attending a hands-on step (first pass)", b.crew, "")
}

// waste lists the mother liquors (with the second crop's concentrate),
// the washes, and the solvent evaporated from the cake and the liquor.
func (m *Model) waste(u *usage.Usage, o *outcome) {
	class := m.liq.class()
	stream := func(name string, vol float64, f Feed) usage.Stream {
		s := usage.Stream{Name: name, Class: class, VolumeM3: vol, Components: m.liq.components(vol)}
		s.Components = append(s.Components,
			usage.Component{Name: "product (dissolved)", Kg: f.Product},
			usage.Component{Name: "impurity (dissolved)", Kg: f.Impurity})
		if f.Other > 0 {
			s.Components = append(s.Components, usage.Component{Name: "other impurities (dissolved)", Kg: f.Other})
		}
		return s
	}
	u.Waste = append(u.Waste, stream("mother liquor", o.mlVol, o.ml), stream("washings", o.washVol, o.wash))
	if cond := o.dryVol + o.crop.evap*b2f(o.crop.taken); cond > 0 {
		u.Waste = append(u.Waste, usage.Stream{Name: "solvent evaporated from the cake and liquor (condensate)", Class: class, VolumeM3: cond, Components: m.liq.components(cond)})
	}
}

// demands lists what the ledger prices: solvents, hands-on time,
// electricity, disposal, the product lost and the one-time development.
func (m *Model) demands(u *usage.Usage, o *outcome) {
	d := u.AddDemand
	for _, id := range o.used.IDs() {
		d(id, "solvent: "+id, usage.Materials, o.used[id], units.Volume)
	}
	_, attended := u.Hours()
	d(ItemLabour, "hands-on time", usage.Labour, attended*3600, units.Time)
	d(ItemElectricity, "heating, chiller and drying", usage.Energy, o.electric, units.Energy)
	u.AddDisposals()
	d(ItemProduct, "product left in mother liquors and washes", usage.ProductLoss, u.ProductInKg-u.ProductOutKg, units.Mass)
	d(ItemLabour, "solvent screening and development (one-time)", usage.OneTime, m.p.screeningTime, units.Time)
	d(ItemProduct, "crude used in screening, product content (one-time)", usage.OneTime, m.p.screeningMass*m.sc.Purity, units.Mass)
}
