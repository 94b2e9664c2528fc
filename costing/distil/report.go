package distil

import (
	"fmt"
	"math"

	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// report fills the usage from the outcome, stage by stage as far as the
// physics got: figures, notes, and for a finished run the equipment,
// activities, waste and demands; for a stopped one the reason.
func (m *Model) report(u *usage.Usage, o *outcome) {
	m.compoundNotes(u, o)
	parts := []struct {
		st     stage
		report func(*usage.Usage, *outcome)
	}{{stCompounds, m.reportVolatile}, {stPressure, m.reportPressure}, {stVolatility, m.reportVolatility},
		{stDesign, m.reportDesign}, {stStill, m.reportStill}, {stDone, m.reportBatch}}
	for _, p := range parts {
		if o.reached < p.st {
			break
		}
		p.report(u, o)
	}
	if o.fail != "" {
		u.Feasible = false
		u.Reason = o.fail
		return
	}
	m.reportEnergy(u, o)
	u.Activities = append(u.Activities, o.acts...)
	m.waste(u, o)
	m.demands(u, o)
}

func (m *Model) reportPressure(u *usage.Usage, o *outcome) {
	fig := u.AddFigure
	fig("pot_pressure_needed", "highest pot pressure within the stability limit", o.psatH, "mbar")
	fig("head_pressure", "operating pressure at the still head", o.pr.Head, "mbar")
	fig("pot_pressure", "pressure in the pot", o.pr.Pot, "mbar")
	fig("pot_temperature", "pot temperature (boiling point of the less volatile component at the pot pressure)", o.tPot, "°C")
	fig("head_temperature", "head temperature (boiling point of the more volatile component at the head pressure)", o.tHead, "°C")
	m.pressureNotes(u, o)
}

func (m *Model) reportVolatility(u *usage.Usage, o *outcome) {
	u.AddFigure("alpha_top", "relative volatility at the head temperature", o.aTop, "")
	u.AddFigure("alpha_bottom", "relative volatility at the pot temperature", o.aBot, "")
	m.vapourNotes(u, o)
	u.AddFigure("alpha", "relative volatility α (geometric mean of head and pot)", o.alpha, "")
	m.volatilityNote(u, o)
}

func (m *Model) reportDesign(u *usage.Usage, o *outcome) {
	fig := u.AddFigure
	m.azeotropeNote(u, o)
	fig("n_min", "minimum equilibrium stages, incl. the pot (Fenske)", o.nMin, "")
	fig("r_min", "minimum reflux ratio (Underwood)", math.Max(o.rMin, 0), "")
	fig("reflux_multiple", "reflux ratio / minimum", o.mult, "")
	m.shortcutNote(u, o)
	fig("stages_available", "equilibrium stages available, incl. the pot", o.nAvail, "")
	switch {
	case o.rMin <= 0:
		fig("stages_needed", "equilibrium stages needed at the reflux used, incl. the pot", o.nReq, "")
	case m.d.ColumnStages == 0:
		fig("stages_needed", "equilibrium stages a column would need at the chosen reflux multiple, incl. the pot (Gilliland)", o.nReq, "")
		fig("reflux_for_stages_needed", "reflux ratio that column would use", o.mult*o.rMin, "")
	default:
		fig("stages_needed", "equilibrium stages needed at the reflux used, incl. the pot (Gilliland)", o.nReq, "")
		fig("reflux_used", "reflux ratio used", o.R, "")
		fig("reflux_for_available", "reflux ratio the available stages need (Gilliland)", o.rAvail, "")
	}
	m.stagesNote(u, o)
	fig("reflux_used_batch", "reflux ratio of the batch", o.R, "")
	fig("stages_equivalent", "total-reflux equivalent stages of column and pot", o.nEq, "")
	fig("alpha_equivalent", "equivalent relative volatility α^N_eq", o.alphaEq, "")
}

func (m *Model) reportStill(u *usage.Usage, o *outcome) {
	fig := u.AddFigure
	fig("still_volume", "still volume", o.st.Volume, "L")
	fig("batches", "batches", o.batches, "")
	u.Equipment = fmt.Sprintf("%.4g L still, %.4g stages above the pot", o.st.Volume*1e3, m.d.ColumnStages)
	if o.st.Batches > 1 {
		u.Equipment += fmt.Sprintf(" × %d batches", o.st.Batches)
	}
	u.EquipmentID = u.Equipment // a still of the list, the stages and a count: nothing that follows the mass smoothly
	fig("charge_per_batch", "charge per batch", o.mBatch, "g")
	m.batchesNote(u, o)
	fig("holdup", "hold-up of head and column", o.vHold, "mL")
}

func (m *Model) reportBatch(u *usage.Usage, o *outcome) {
	fig := u.AddFigure
	fig("first_distillate_purity", "product in the first distillate (mass)", o.firstDrop, "%")
	m.residueNote(u, o)
	u.ProductOutKg = o.productOut
	u.ImpurityOutKg = o.impurityOut
	fig("product_in", "product in the charge", u.ProductInKg, "g")
	fig("product_out", "product recovered", u.ProductOutKg, "g")
	fig("impurity_out", "impurity isolated with the product", u.ImpurityOutKg, "g")
	fig("recovery", "recovery", u.ProductOutKg/u.ProductInKg, "%")
	fig("product_purity", "purity of the product cut (mass)", o.purity, "%")
	fig("loss_forerun", map[bool]string{true: "product lost in the fore-run", false: "product lost in the distilled impurity cut"}[o.productLight], o.lossFore, "g")
	fig("loss_tails", "product left in the pot residue and tails", o.lossTails, "g")
	fig("loss_holdup", "product lost in the column and head hold-up", o.lossHold, "g")
	fig("loss_cold_trap", "product lost to the cold trap", o.lossTrap, "g")
	m.recoveryNote(u, o)
}

func (m *Model) reportEnergy(u *usage.Usage, o *outcome) {
	fig := u.AddFigure
	fig("boilup_rate", "boil-up rate (liquid evaporated)", o.boil, "L/h")
	fig("heater_power", "heat delivered to the pot while boiling", o.power, "W")
	fig("boilup_time", "boil-up time per batch", o.tBoil, "h")
	fig("heat_input", "heat to the pot (sensible, vaporization, total-reflux start)", o.heatIn, "kWh")
	fig("condenser_duty", "condenser duty", o.condenser, "kWh")
	fig("energy", "electricity (heater, chiller, vacuum pump)", o.electric, "kWh")
	fig("operators", "people attending a hands-on step", o.crew, "")
	m.energyNotes(u, o)
}

// waste lists the cuts that are not product, the cold-trap condensate and
// the rinse.
func (m *Model) waste(u *usage.Usage, o *outcome) {
	type part = struct {
		s  species
		kg float64
	}
	stream := func(name string, parts ...part) usage.Stream {
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
	parts := func(c Cut) []part {
		return []part{{o.light, o.nBatch * c.Light * o.light.M * o.batches}, {o.heavy, o.nBatch * (c.N - c.Light) * o.heavy.M * o.batches}}
	}
	br := o.br
	if o.productLight {
		u.Waste = append(u.Waste, stream("fore-run", parts(o.forerun)...))
		drained := Cut{N: br.Pot.N + br.Holdup.N, Light: br.Pot.Light + br.Holdup.Light}
		u.Waste = append(u.Waste, stream("pot residue, tails and drained hold-up", parts(drained)...))
	} else {
		u.Waste = append(u.Waste, stream("distilled impurity cut", parts(o.forerun)...))
		u.Waste = append(u.Waste, stream("column and head hold-up", parts(br.Holdup)...))
	}
	if o.trap > 0 {
		u.Waste = append(u.Waste, stream("cold-trap condensate", parts(o.trapCut)...))
	}
	if o.rinse > 0 {
		rs := o.rinseSolvent
		w := usage.Stream{Name: "still and column rinse", Class: usage.NonHalogenated, VolumeM3: o.rinse}
		if rs.Halogenated {
			w.Class = usage.Halogenated
		}
		w.Components = append(w.Components, usage.Component{Name: rs.ID, Kg: o.rinse * rs.Density.V, Solvent: true})
		u.Waste = append(u.Waste, w)
	}
	u.AddFigure(usage.FigSolventTotal, "solvent used (rinse)", o.rinse, "L")
	if o.rinse > 0 {
		u.AddFigure(usage.SolventFigure(m.d.RinseSolvent), "solvent: "+m.d.RinseSolvent, o.rinse, "L")
	}
	m.classNote(u, o)
}

// demands lists what the ledger prices.
func (m *Model) demands(u *usage.Usage, o *outcome) {
	_, attended := u.Hours()
	dm := u.AddDemand
	if o.rinse > 0 {
		dm(m.d.RinseSolvent, "rinse solvent: "+m.d.RinseSolvent, usage.Materials, o.rinse, units.Volume)
	}
	dm(ItemLabour, "hands-on time", usage.Labour, attended*3600, units.Time)
	dm(ItemElectricity, "heater, condenser chiller and vacuum pump", usage.Energy, o.electric, units.Energy)
	u.AddDisposals()
	dm(ItemProduct, "product lost (fore-run, tails, hold-up, cold trap)", usage.ProductLoss, u.ProductInKg-u.ProductOutKg, units.Mass)
}
