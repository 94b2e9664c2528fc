// Package costing costs one purification at one batch mass: it prepares a
// checked scenario (model coefficients with the user's settings applied and
// calibrations run), runs each applicable method model to get physical
// usage, and prices that usage into a ledger.
package costing

import (
	"fmt"
	"math"
	"sort"
	"sync"

	"sepcost/costing/equipment"
	"sepcost/costing/green"
	"sepcost/costing/ledger"
	"sepcost/costing/parallel"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/costing/waste"
)

// Method is one purification method ready to run at any batch mass.
type Method struct {
	Name string
	Use  green.Use // what its solvents do (Entry.Use)
	Run  func(crudeKg float64) usage.Usage
	// Choices, when set, lists the candidate plans at a mass (loadings,
	// equipment); the plan prices them and keeps the cheapest per gram.
	Choices func(crudeKg float64) []usage.Usage
	// Lean, when set, is Choices made to be ranked by cost (the plan
	// words only the candidates it reports).
	Lean LeanChoices
}

// LeanChoices lists a method's candidate plans at a mass as Choices does,
// in the same order with the same quantities, demands and equipment, but
// quiet (usage.Usage.Quiet: no notes or tables); full(i) is the i-th as
// Choices gives it, notes and all.
type LeanChoices func(crudeKg float64) (lean []usage.Usage, full func(i int) usage.Usage)

// Plan is a scenario with its model coefficients settled.
type Plan struct {
	Scenario *scenario.Scenario
	Coef     source.Set
	Methods  []Method
	// Equipment is the site equipment table the models choose from
	// (equipment.Default unless Options gave one).
	Equipment *equipment.Table
	// WasteSector is the List of Waste chapter the scenario names.
	WasteSector waste.Sector

	sitePrices sync.Map // *prices.Table → the same with the equipment's charges
	rateCache  sync.Map // *prices.Table → its *ledger.Rates
	pricers    sync.Map // *prices.Table → its *ledger.Pricer
}

// Options are what Prepare takes besides the scenario.
type Options struct {
	Equipment *equipment.Table // nil: the built-in default table
}

// SitePrices is the price table with the equipment's hourly and per-use
// charges appended (equipment.Table.WithPrices), the table every ledger of
// the plan is priced against. Reports should hold this table so that
// ledger rows point into it.
func (p *Plan) SitePrices(t *prices.Table) (*prices.Table, error) {
	if v, ok := p.sitePrices.Load(t); ok {
		return v.(*prices.Table), nil
	}
	out, err := p.Equipment.WithPrices(t)
	if err != nil {
		return nil, err
	}
	p.sitePrices.Store(t, out)
	if out != t {
		p.sitePrices.Store(out, out)
	}
	return out, nil
}

// Result is one method at one batch mass: physical usage, its ledger and
// its green metrics (nil when the method is not feasible).
type Result struct {
	Usage   usage.Usage
	Ledger  ledger.Ledger
	Metrics *green.Metrics
}

// result assembles a Result, computing the green metrics of a feasible usage.
func (p *Plan) result(u usage.Usage, l ledger.Ledger) (Result, error) {
	r := Result{Usage: u, Ledger: l}
	if u.Feasible && u.ProductOutKg > 0 {
		m, err := green.Compute(u, p.Scenario.Solvents)
		if err != nil {
			return Result{}, err
		}
		r.Metrics = &m
	}
	return r, nil
}

// Prepare settles the coefficients: model defaults, the user's settings
// (each checked for a known key and the right dimension), then the
// calibrations that depend on them. Problems name the scenario file, line
// and setting.
func Prepare(sc *scenario.Scenario) (*Plan, error) { return PrepareWith(sc, Options{}) }

// PrepareWith is Prepare with the site's equipment table.
func PrepareWith(sc *scenario.Scenario, opt Options) (*Plan, error) {
	eq := opt.Equipment
	if eq == nil {
		eq = equipment.Default()
	}
	coef, err := settle(sc)
	if err != nil {
		return nil, err
	}
	p := newPlan(sc, coef, eq, false)
	if sc.WasteSector.Text != "" {
		sec, err := waste.ParseSector(sc.WasteSector.Text)
		if err != nil {
			return nil, &scenario.Problem{Of: scenario.ErrInvalid, File: sc.File, Line: sc.WasteSector.Line, Field: "waste_sector", Msg: err.Error()}
		}
		p.WasteSector = sec
	}
	return p, nil
}

// settle is the coefficients of Prepare: defaults, settings, calibrations,
// with every problem of the settings named, and the check that the
// scenario describes a method.
func settle(sc *scenario.Scenario) (source.Set, error) {
	defaults := make([][]source.Coefficient, len(Registry))
	calibrated := map[string]bool{}
	for i, e := range Registry {
		defaults[i] = e.Defaults()
		for _, k := range e.Calibrated {
			calibrated[k] = true
		}
	}
	coef := source.NewSet(defaults...)
	var problems scenario.Problems
	apply := func(later bool) {
		for _, s := range sc.Settings {
			if calibrated[s.Key] != later {
				continue
			}
			err := coef.Override(s.Key, s.Value, s.Written)
			if c, ok := coef.Lookup(s.Key); err == nil && ok && s.Range.Half > 0 && s.Range.Lo() < 0 && c.Dim != units.Temperature {
				err = fmt.Errorf("%q reaches below zero; a range of %s must stay at zero or above", s.Written, s.Key)
			} else if err == nil && ok && s.Range.Half > 0 && !(c.InRange(s.Range.Lo()) && c.InRange(s.Range.Hi())) {
				lo, hi := c, c
				lo.SI, hi.SI = c.Lo, c.Hi
				err = fmt.Errorf("%q reaches outside the range %s accepts: %.4g to %.4g %s", s.Written, s.Key, lo.Display(), hi.Display(), c.Unit)
			}
			if err != nil {
				problems = append(problems, &scenario.Problem{Of: scenario.ErrInvalid, File: sc.File, Line: s.Line, Field: "settings." + s.Key, Msg: err.Error()})
			}
		}
	}
	apply(false)
	for _, e := range Registry {
		if e.Calibrate != nil {
			e.Calibrate(coef)
		}
	}
	apply(true)
	if len(problems) > 0 {
		return source.Set{}, problems
	}
	described := false
	for _, e := range Registry {
		described = described || e.Described(sc)
	}
	if !described {
		return source.Set{}, &scenario.Problem{Of: scenario.ErrInvalid, File: sc.File, Msg: "describes no purification method; add " + sectionList() + " (see `sepcost init`)"}
	}
	return coef, nil
}

// newPlan registers the methods of the Registry on a settled coefficient
// set. Each model reads and checks its coefficients once here, not at
// every run. A method the scenario does not describe stays in the plan as
// "not assessed", with the reason, so that no report silently drops it.
func newPlan(sc *scenario.Scenario, coef source.Set, eq *equipment.Table, quiet bool) *Plan {
	p := &Plan{Scenario: sc, Coef: coef, Equipment: eq}
	for _, e := range Registry {
		p.Methods = append(p.Methods, buildMethod(e, sc, coef, eq, quiet))
	}
	return p
}

// buildMethod is one registry entry's method on a settled coefficient set.
func buildMethod(e Entry, sc *scenario.Scenario, coef source.Set, eq *equipment.Table, quiet bool) Method {
	m := Method{Name: e.Name, Use: e.Use}
	if e.Described(sc) {
		m.Run, m.Choices, m.Lean = e.Build(sc, coef, eq, quiet)
	} else {
		m.Run = notAssessed(sc, e.Name)
	}
	return m
}

// WithCoefficients is the same plan on another coefficient set (used to
// sample the models' uncertainty).
func (p *Plan) WithCoefficients(coef source.Set) *Plan { return p.With(p.Scenario, coef) }

// With is the plan on a drawn scenario and coefficient set (a Monte Carlo
// draw: scenario.Scenario.With, source.Set.WithValues).
func (p *Plan) With(sc *scenario.Scenario, coef source.Set) *Plan {
	q := newPlan(sc, coef, p.Equipment, false)
	q.WasteSector = p.WasteSector
	return q
}

// Quiet is With for a plan whose usages are only costed, as a Monte
// Carlo draw's are (PerGramLean): the models leave out their notes and
// the words they need work to find (Entry.Build's quiet); every quantity
// and cost is the one With gives (TestQuietPlanCostsTheSame).
func (p *Plan) Quiet(sc *scenario.Scenario, coef source.Set) *Plan {
	q := newPlan(sc, coef, p.Equipment, true)
	q.WasteSector = p.WasteSector
	return q
}

// PerGramLean is method j's cost per gram of purified product at one mass
// priced with float rates: the lean path for Monte Carlo draws (no
// decimal ledger, no green metrics), choosing among a method's candidate
// plans (loading and equipment) the cheapest per gram as runPriced does.
// NaN when the method is not feasible or recovers nothing.
func (p *Plan) PerGramLean(j int, crudeKg float64, r *ledger.Rates) (float64, error) {
	m := p.Methods[j]
	if m.Choices == nil {
		return perGramRates(m.Run(crudeKg), r)
	}
	best := math.NaN()
	cands, _ := leanChoices(m, crudeKg)
	for _, u := range cands {
		v, err := perGramRates(u, r)
		if err != nil {
			return 0, err
		}
		if v == v && !(v >= best) { // a number, and below best (or best still NaN)
			best = v
		}
	}
	return best, nil
}

// perGramRates is one usage's cost per gram of purified product with float
// rates; NaN when it is not feasible or recovers nothing.
func perGramRates(u usage.Usage, r *ledger.Rates) (float64, error) {
	if !u.Feasible || u.ProductOutKg <= 0 {
		return math.NaN(), nil
	}
	total, err := r.Total(u)
	if err != nil {
		return 0, err
	}
	return total / (u.ProductOutKg * 1000), nil
}

// notAssessed is the run of a method the scenario does not describe.
func notAssessed(sc *scenario.Scenario, name string) func(float64) usage.Usage {
	return func(m float64) usage.Usage {
		return usage.Usage{Method: name, CrudeKg: m, ProductInKg: m * sc.Purity,
			Reason: NotAssessed + ": the scenario has no " + name + " section"}
	}
}

// NotAssessed begins the reason of a method the scenario does not describe.
const NotAssessed = "not assessed"

// MethodNames lists the plan's methods in order.
func (p *Plan) MethodNames() []string {
	names := make([]string, len(p.Methods))
	for i, m := range p.Methods {
		names[i] = m.Name
	}
	return names
}

// Run runs every method at every mass and prices the results. Missing
// prices from all runs come back together in one error.
func (p *Plan) Run(massesKg []float64, t *prices.Table) ([][]Result, error) {
	t, err := p.SitePrices(t)
	if err != nil {
		return nil, err
	}
	for _, m := range massesKg {
		if !(m > 0) {
			return nil, fmt.Errorf("batch mass %g kg: %w", m, units.ErrUnit)
		}
	}
	// The models, the ledger and the metrics are pure functions of the
	// plan, the prices and the mass: run them on all cores, each result in
	// its own slot, so the order is kept.
	n := len(p.Methods)
	us := make([]usage.Usage, len(massesKg)*n)
	rs := make([]Result, len(us))
	errs := make([]error, len(us))
	parallel.For(len(us), func(k int) {
		var l ledger.Ledger
		var err error
		us[k], l, err = p.runPriced(k%n, massesKg[k/n], t)
		if err == nil {
			rs[k], err = p.result(us[k], l)
		}
		errs[k] = err
	})
	for _, err := range errs {
		if err != nil {
			// Price everything together so that every missing price
			// comes back in one error.
			if _, perr := ledger.PriceAll(us, t); perr != nil {
				return nil, perr
			}
			return nil, err
		}
	}
	out := make([][]Result, len(massesKg))
	for i := range massesKg {
		out[i] = rs[i*n : (i+1)*n : (i+1)*n]
	}
	return out, nil
}

// Coefficients lists every coefficient the plan uses, with the properties of
// the solvents the scenario names.
func (p *Plan) Coefficients() []source.Coefficient {
	out := p.Coef.Sorted()
	for _, id := range p.SolventsUsed() {
		if s, ok := p.Scenario.Solvents.Find(id); ok {
			out = append(out, s.Coefficients()...)
		}
	}
	return out
}

// SolventsUsed lists the ids of the solvents the scenario's methods use.
func (p *Plan) SolventsUsed() []string {
	seen := map[string]bool{}
	for _, name := range p.MethodNames() {
		for _, id := range p.methodSolvents(name) {
			seen[id] = true
		}
	}
	ids := make([]string, 0, len(seen))
	for id := range seen {
		ids = append(ids, id)
	}
	sort.Strings(ids)
	return ids
}

// Uses reports whether a method of the scenario uses a solvent.
func (p *Plan) Uses(method, id string) bool {
	for _, s := range p.methodSolvents(method) {
		if s == id {
			return true
		}
	}
	return false
}

// methodSolvents lists the solvent ids one method's section names.
func (p *Plan) methodSolvents(method string) []string {
	e, ok := EntryOf(method)
	if !ok || !e.Described(p.Scenario) {
		return nil
	}
	return e.Solvents(p.Scenario)
}

// RunOne runs method j at one mass and prices it.
func (p *Plan) RunOne(j int, crudeKg float64, t *prices.Table) (Result, error) {
	t, err := p.SitePrices(t)
	if err != nil {
		return Result{}, err
	}
	u, l, err := p.runPriced(j, crudeKg, t)
	if err != nil {
		return Result{}, err
	}
	return p.result(u, l)
}

// PerGram is the cost per gram of purified product, or NaN when the
// method is not feasible or recovers nothing.
func (r Result) PerGram() float64 {
	if !r.Usage.Feasible || r.Usage.ProductOutKg <= 0 {
		return math.NaN()
	}
	return r.Ledger.Total.InexactFloat64() / (r.Usage.ProductOutKg * 1000)
}

// WithSetting is the plan as if the scenario's settings also set key to
// si (in the coefficient's SI unit): the coefficients are settled again,
// calibrations included, exactly as for a setting written in the file.
func (p *Plan) WithSetting(key string, si float64) (*Plan, error) {
	sc, err := p.withSetting(key, si)
	if err != nil {
		return nil, err
	}
	return PrepareWith(sc, Options{Equipment: p.Equipment})
}

// withSetting is the scenario whose settings also set key to si.
func (p *Plan) withSetting(key string, si float64) (*scenario.Scenario, error) {
	co, ok := p.Coef.Lookup(key)
	if !ok {
		return nil, fmt.Errorf("unknown model setting %q", key)
	}
	sc := *p.Scenario
	co.SI = si
	sc.Settings = append(append([]scenario.Setting(nil), p.Scenario.Settings...),
		scenario.Setting{Key: key, Value: units.Quantity{SI: si, Dim: co.Dim}, Written: co.String()})
	return &sc, nil
}
