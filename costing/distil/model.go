package distil

import (
	"sepcost/costing/scenario"
	"sepcost/costing/source"
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

// Model is a distillation ready to run at any batch mass: the scenario's
// section with the coefficients read and checked once.
type Model struct {
	sc   *scenario.Scenario
	d    *scenario.Distillation
	coef source.Set
	p    params
	bad  string // why the coefficients make the model meaningless; "" when they do not
	// sep is the outcome of the stages that do not depend on the batch
	// mass (compounds, pressure, volatility, design), found once by New;
	// compute starts every mass from a copy.
	sep outcome
	// Quiet makes usages that are only costed (usage.Usage.Quiet: no
	// notes); every quantity is the same.
	Quiet bool
}

// New reads the coefficients (the defaults with the user's settings) once.
func New(sc *scenario.Scenario, coef source.Set) *Model {
	m := &Model{sc: sc, d: sc.Distillation, coef: coef}
	m.p, m.bad = readParams(coef)
	if m.d != nil && m.bad == "" {
		m.sep = m.separation()
	}
	return m
}

// Run models the batch distillation of crudeKg of crude (the still charge)
// as the scenario's distillation section describes it. coef must hold
// Defaults() (with the user's settings applied). A scenario without a
// distillation section gives an infeasible usage saying so. It is
// New(sc, coef).Run.
func Run(sc *scenario.Scenario, coef source.Set, crudeKg float64) usage.Usage {
	return New(sc, coef).Run(crudeKg)
}

// Run models the batch distillation of crudeKg of crude: compute (the
// physics, compute.go, stage by stage) then report (figures, notes, waste
// and demands, report.go and prose.go).
func (m *Model) Run(crudeKg float64) usage.Usage {
	u := usage.New(Method, crudeKg, 0)
	u.Quiet = m.Quiet
	if m.d == nil {
		u.Feasible = false
		u.Reason = "the scenario has no distillation section"
		return u
	}
	u.ProductInKg = crudeKg * m.d.FeedPurity
	if m.bad != "" {
		u.Feasible = false
		u.Reason = m.bad
		return u
	}
	o := m.compute(crudeKg)
	m.report(&u, &o)
	return u
}
