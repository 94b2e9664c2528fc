// Package cryst models a cooling recrystallization of the product from a
// solvent or a solvent/anti-solvent pair: from solubility data (measured
// points or an ideal-solubility estimate) to the solvent, passes, yield,
// purity, vessels and batches, hours, energy, one-time development cost
// and waste of one purification at one batch mass.
//
// The model computes physical quantities only (SI inside); pricing is the
// ledger's job. Every coefficient is in coefficients.go and
// coefficients_scale.go with its source; the solubility equations are in
// the solubility sub-package. A run is compute (compute.go: the physics,
// a typed outcome) then report (report.go: figures, demands, waste;
// prose.go: the notes and reasons in words).
package cryst

import (
	"sepcost/costing/scenario"
	"sepcost/costing/solvent"
	"sepcost/costing/source"
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
	ActCharge    = "charge the vessel"
	ActHeat      = "heat and dissolve"
	ActCool      = "cool and crystallise"
	ActFilter    = "transfer, filter and wash"
	ActCheck     = "check purity"
	ActClean     = "clean the vessel"
	ActCropEvap  = "second crop: evaporate the mother liquor"
	ActCrop      = "second crop: crystallise and filter"
	ActDry       = "dry the crystals"
	ActDischarge = "discharge and pack the product"
)

var activityOrder = []string{ActCharge, ActHeat, ActCool, ActFilter, ActCheck, ActClean, ActCropEvap, ActCrop, ActDry, ActDischarge}

// Model is a crystallization ready to run at any batch mass: the scenario's
// section with the coefficients read and checked once.
type Model struct {
	sc  *scenario.Scenario
	cr  *scenario.Crystallization
	p   params
	liq liquid
	bad string // why the coefficients make the model meaningless; "" when they do not
	// Quiet makes usages that are only costed (usage.Usage.Quiet: no
	// notes); every quantity is the same.
	Quiet bool
}

// New reads the coefficients (the defaults with the user's settings) and
// the scenario's crystallization section once. sc.Crystallization must not
// be nil.
func New(sc *scenario.Scenario, coef source.Set) *Model {
	m := &Model{sc: sc, cr: sc.Crystallization}
	m.p, m.bad = readParams(coef)
	cr := m.cr
	m.liq = liquid{mix: cr.Mix, density: cr.LiquidDensity}
	for _, p := range cr.Mix {
		m.liq.parts = append(m.liq.parts, mustSolvent(sc.Solvents, p.Solvent))
	}
	if cr.Excess != nil {
		m.p.excess = *cr.Excess
	}
	if cr.Distribution != nil {
		m.p.distribution = *cr.Distribution
	}
	if len(cr.FlasksM3)+len(cr.ReactorsM3) > 0 {
		m.p.flasks, m.p.reactors = cr.FlasksM3, cr.ReactorsM3
	}
	if cr.FillLimit != nil {
		m.p.flaskFill, m.p.reactorFill = *cr.FillLimit, *cr.FillLimit
	}
	if cr.ScreeningS != nil {
		m.p.screeningTime = *cr.ScreeningS
	}
	if cr.ScreeningKg != nil {
		m.p.screeningMass = *cr.ScreeningKg
	}
	return m
}

// Run models the recrystallization of crudeKg of crude. coef must hold
// Defaults() (with the user's settings applied). It is New(sc, coef).Run.
func Run(sc *scenario.Scenario, coef source.Set, crudeKg float64) usage.Usage {
	return New(sc, coef).Run(crudeKg)
}

// Run models the recrystallization of crudeKg of crude.
//
// Steps, each in its own file:
//
//   - solubility of product and impurity at the dissolution and isolation
//     temperatures (solubility package: van 't Hoff fit or Schröder–van
//     Laar estimate), with a warning beyond the measured range;
//   - passes (Pass.Run, PurifyWith): solvent V = P/S_hot·(1 + excess),
//     losses to mother liquor and washes, the impurity's fate (its
//     solubility, its uptake by the Doerner–Hoskins law, the liquor
//     occluded at the pass's cooling rate), until the target purity;
//     Feasible=false with the reason when it cannot be reached;
//   - an optional second crop from the last mother liquor (SecondCrop),
//     taken only if the combined product still meets the target;
//   - vessels and batches per pass (ChooseVessel); heating and cooling
//     times limited by the jacket (JacketTime, A ∝ V^(2/3)) and by the
//     cooling ramp; charging and transfers by volume; filtration and
//     washing by Darcy's law for a cake (CakeFiltrationTime); drying to a
//     loss on drying (DryingTime); cleaning by the vessel's wall area;
//     operators per operation (two at reactor scale);
//   - energy: sensible heat of liquid and solids and the enthalpy of
//     solution over the heater efficiency; heat removed below room
//     temperature over the chiller COP (above it, cooling water); solvent
//     evaporated in drying and for the second crop over both;
//   - one-time development (usage.OneTime): screening hours and the
//     product content of the crude used in screening;
//   - waste by stream, classed by the liquid (halogenated if any part is,
//     aqueous for water alone, else non-halogenated solvent).
func (m *Model) Run(crudeKg float64) usage.Usage {
	u := usage.New(Method, crudeKg, crudeKg*m.sc.Purity)
	u.Quiet = m.Quiet
	if m.bad != "" {
		u.Feasible = false
		u.Reason = m.bad
		return u
	}
	o := m.compute(crudeKg)
	m.report(&u, &o)
	return u
}

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
