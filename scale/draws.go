package scale

import (
	"fmt"
	"math"
	"math/rand/v2"
	"sort"
	"strings"

	"sepcost/costing"
	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Spread is the relative uncertainty (σ of the natural log of a
// multiplicative factor) given to a model coefficient by how sure its value
// is. A value seen in a published table is known to a few per cent; one
// from memory to some 15 %; a habit of the trade to a quarter (common
// practice, no source: these are this project's choices and are printed on
// the Uncertainty sheet).
var Spread = map[source.Mark]float64{
	source.Confirmed:      0.05,
	source.Derived:        0.10,
	source.Calibrated:     0.10,
	source.FromMemory:     0.15,
	source.Override:       0.10,
	source.CommonPractice: 0.25,
	source.Example:        0.25,
}

// perturbable reports whether a coefficient is drawn at all: it has a
// spread for its mark, is not a temperature and not zero.
func perturbable(co source.Coefficient) bool {
	_, ok := Spread[co.Mark]
	return ok && co.Dim != units.Temperature && co.SI != 0
}

// perturb moves a coefficient z standard deviations (σ = Spread of its
// mark) on the log scale: a plain share or fraction below 1 on its odds,
// so that it stays in (0, 1), anything else by the factor exp(z σ).
// Temperatures (not scale quantities), zeros, whole shares and marks
// without a spread are left alone (ok false). The Monte Carlo draws use
// the same rule (factorValue).
func perturb(co source.Coefficient, z float64) (source.Coefficient, bool) {
	if !perturbable(co) || co.Dim == units.None && co.SI == 1 {
		return co, false // a whole share (e.g. fully attended) stays whole
	}
	sigma := Spread[co.Mark]
	co.SI = factorValue(co.SI, math.Exp(sigma*z), co.Dim == units.None && co.SI < 1)
	return co, true
}

// RuleWeights are the weights of the two routes that size the silica
// (preparative elution theory and Still's table), drawn as a discrete
// alternative: equal, as nothing here says which to trust more when they
// part (common practice, no source: with no other information each
// alternative is given the same weight).
var RuleWeights = map[scenario.Rule]float64{scenario.RuleTheory: 0.5, scenario.RuleTable: 0.5}

// Shared names the physical quantity behind coefficients that several
// methods carry under their own keys: one draw serves all of them, so the
// same chiller is not better for one method and worse for another in the
// same draw.
var Shared = map[string]string{
	"chromatography.chiller_cop":                 "coefficient of performance of the chiller",
	"crystallization.chiller_cop":                "coefficient of performance of the chiller",
	"distillation.chiller_cop":                   "coefficient of performance of the chiller",
	"crystallization.heater_efficiency":          "share of heater electricity that reaches the batch",
	"distillation.heater_efficiency":             "share of heater electricity that reaches the batch",
	"chromatography.evaporation_attended_share":  "share of rotary evaporation a person attends",
	"crystallization.evaporation_attended_share": "share of rotary evaporation a person attends",
}

// NotDrawn names coefficients that are not drawn, with the reason: what the
// site owns or decides (its vessel and column sizes, how full it fills
// them, how many passes it allows) is known, and thresholds that decide
// when to warn are choices, not measurements.
func NotDrawn(c source.Coefficient) string {
	k := c.Key
	switch {
	case c.Dim == units.Temperature:
		return "a temperature: not a scale quantity"
	case c.SI == 0:
		return "zero: nothing to spread"
	case c.Dim == units.None && c.SI == 1:
		return "a whole share stays whole"
	case strings.HasPrefix(k, "crystallization.flask_") || strings.HasPrefix(k, "crystallization.reactor_"):
		return "the site's own equipment"
	}
	switch k {
	case "crystallization.flask_fill_limit", "crystallization.reactor_fill_limit", "distillation.fill_limit",
		"chromatography.bed_height_max", "chromatography.bed_height_min", "chromatography.tlc_lanes_per_plate",
		"chromatography.tlc_every_nth_fraction", "crystallization.max_passes", "distillation.vacuum_pump_power",
		"crystallization.min_filter_area":
		return "the site's own equipment or practice"
	case "chromatography.route_agreement", "crystallization.dilution_warning", "crystallization.extrapolation_margin",
		"distillation.min_relative_volatility", "distillation.max_holdup_share", "distillation.condenser_margin":
		return "a threshold for a warning or a limit, chosen, not measured"
	}
	return ""
}

// InputKind says where an uncertain input comes from.
type InputKind string

// Kinds of uncertain input.
const (
	KindMeasured    InputKind = "measured"    // a scenario value (Rf, purity, solubility…)
	KindSetting     InputKind = "setting"     // a model setting written with a range
	KindCoefficient InputKind = "coefficient" // a model default, spread by how sure it is
	KindPrice       InputKind = "price"       // a price-table row
	KindModelForm   InputKind = "model form"  // a choice between models
)

// Uncertain is one uncertain input of the Monte Carlo draws.
type Uncertain struct {
	Name    string    // plain words
	Field   string    // scenario field, setting or coefficient key, "price: item"
	Kind    InputKind //
	Unit    string    // display unit of Nominal, Lo and Hi; "" for plain numbers
	Nominal float64   // as used for the nominal answer, display unit
	Lo, Hi  float64   // limits (rectangular), or P10 and P90 (log-normal), display unit
	Dist    string    // the distribution in words
	Basis   string    // where the spread comes from, with its source or mark
	Keys    []string  // coefficient keys that share this draw
	Act     string    // what to do to know it, in words; "" for the kind's usual words (Advice)
}

// design says how one draw is made: which inputs, how each is drawn and
// where it goes in the scenario, the coefficient set and the prices.
type design struct {
	inputs   []Uncertain
	draw     []func(*rand.Rand) float64 // per input: the drawn value (SI, factor or alternative index)
	measured []int                      // per scenario Measured: input index
	coef     []coefDraw                 // per coefficient position
	price    []int                      // per price row: input index, or -1
	rule     int                        // input index of the loading rule, or -1
	base     []float64                  // nominal coefficient values
	lo, hi   []float64                  // their physical ranges (both 0: none)
	rules    []scenario.Rule            // alternatives of the loading rule
}

// coefDraw is how one coefficient position is drawn.
type coefDraw struct {
	input int  // input index, or -1 (not drawn)
	odds  bool // a share in (0, 1): the factor acts on its odds
	value bool // the input is the value itself (a setting with a range), not a factor
}

// newDesign lists the uncertain inputs of a plan and a price table. used
// names the price rows the plan's methods ask for at the masses drawn.
func newDesign(p *costing.Plan, t *prices.Table, used map[int]bool) *design {
	d := &design{rule: -1}
	d.addMeasured(p.Scenario)
	d.addCoefficients(p)
	d.addPrices(t, used)
	d.addRule(p.Scenario)
	return d
}

func (d *design) add(in Uncertain, draw func(*rand.Rand) float64) int {
	d.inputs = append(d.inputs, in)
	d.draw = append(d.draw, draw)
	return len(d.inputs) - 1
}

// rectangular draws uniformly between lo and hi.
func rectangular(lo, hi float64) func(*rand.Rand) float64 {
	return func(rng *rand.Rand) float64 { return lo + (hi-lo)*rng.Float64() }
}

// logNormal draws a factor exp(σ z), z standard normal.
func logNormal(sigma float64) func(*rand.Rand) float64 {
	return func(rng *rand.Rand) float64 { return math.Exp(sigma * rng.NormFloat64()) }
}

// z90 is the standard normal 90th percentile (Abramowitz and Stegun,
// Handbook of Mathematical Functions, 1964, Table 26.5: 1.2816 — from
// memory).
const z90 = 1.2815515655446004

func (d *design) addMeasured(sc *scenario.Scenario) {
	for _, m := range sc.Measured {
		basis := "as written"
		if m.Default {
			sp := scenario.Spreads[m.Kind]
			basis = fmt.Sprintf("written without a range: default for %s (%s; %s)", m.Kind, sp.Source, sp.Mark)
		}
		r := m.Range
		act := "measure the " + m.Label + " again"
		if m.Kind == scenario.KindEstimate {
			act = "firm up the estimate of the " + m.Label
		}
		d.measured = append(d.measured, d.add(Uncertain{Name: m.Label, Field: m.Field, Kind: KindMeasured, Unit: m.Unit,
			Nominal: m.Display(r.Nominal), Lo: m.Display(r.Lo()), Hi: m.Display(r.Hi()),
			Dist: "rectangular", Basis: basis, Act: act}, rectangular(r.Lo(), r.Hi())))
	}
}

func (d *design) addCoefficients(p *costing.Plan) {
	ranged := map[string]scenario.Setting{}
	for _, s := range p.Scenario.Settings {
		if s.Range.Half > 0 {
			ranged[s.Key] = s
		}
	}
	n := p.Coef.Len()
	d.base = p.Coef.Values()
	d.lo, d.hi = make([]float64, n), make([]float64, n)
	for k := range n {
		d.lo[k], d.hi[k] = p.Coef.At(k).Lo, p.Coef.At(k).Hi
	}
	d.coef = make([]coefDraw, n)
	group := map[string]int{}
	order := make([]int, n) // draw in key order, so inputs are listed sorted
	for i := range order {
		order[i] = i
	}
	sort.Slice(order, func(a, b int) bool { return p.Coef.At(order[a]).Key < p.Coef.At(order[b]).Key })
	for _, k := range order {
		c := p.Coef.At(k)
		d.coef[k] = coefDraw{input: -1}
		if s, ok := ranged[c.Key]; ok {
			cd := c
			show := func(si float64) float64 { cd.SI = si; return cd.Display() }
			d.coef[k] = coefDraw{input: d.add(Uncertain{Name: c.Label, Field: "settings." + c.Key, Kind: KindSetting, Unit: c.Unit,
				Nominal: show(s.Range.Nominal), Lo: show(s.Range.Lo()), Hi: show(s.Range.Hi()), Dist: "rectangular", Basis: "as written",
				Keys: []string{c.Key}}, rectangular(s.Range.Lo(), s.Range.Hi())), value: true}
			continue
		}
		sigma, ok := Spread[c.Mark]
		if !ok || NotDrawn(c) != "" {
			continue
		}
		odds := c.Dim == units.None && c.SI < 1
		if g, ok := Shared[c.Key]; ok {
			if i, seen := group[g]; seen {
				d.coef[k] = coefDraw{input: i, odds: odds}
				d.inputs[i].Keys = append(d.inputs[i].Keys, c.Key)
				continue
			}
		}
		dist := fmt.Sprintf("log-normal, σ(ln) %.2g", sigma)
		if odds {
			dist = fmt.Sprintf("log-normal on the odds, σ(ln) %.2g", sigma)
		}
		lo, hi := c, c
		lo.SI, hi.SI = factorValue(c.SI, math.Exp(-z90*sigma), odds), factorValue(c.SI, math.Exp(z90*sigma), odds)
		in := Uncertain{Name: c.Label, Field: c.Key, Kind: KindCoefficient, Unit: c.Unit, Nominal: c.Display(), Lo: lo.Display(), Hi: hi.Display(),
			Dist: dist, Basis: fmt.Sprintf("spread by how sure the value is (%s)", c.Mark), Keys: []string{c.Key}}
		if g, ok := Shared[c.Key]; ok {
			in.Name = g + " (one draw for every method)"
		}
		i := d.add(in, logNormal(sigma))
		if g, ok := Shared[c.Key]; ok {
			group[g] = i
		}
		d.coef[k] = coefDraw{input: i, odds: odds}
	}
}

// factorValue applies a factor to a value, or to its odds for a share.
func factorValue(v, f float64, odds bool) float64 {
	if !odds {
		return v * f
	}
	o := v / (1 - v) * f
	return o / (1 + o)
}

func (d *design) addPrices(t *prices.Table, used map[int]bool) {
	d.price = make([]int, len(t.Items))
	for i, it := range t.Items {
		d.price[i] = -1
		if !used[i] || it.Category == "equipment" {
			continue // not asked for, or the site's own equipment charges (its equipment table): not drawn
		}
		s := it.PriceSpread()
		if s == 0 {
			continue
		}
		basis := fmt.Sprintf("written in the price table (%s line %d)", t.File, it.Line)
		if it.Spread == nil {
			basis = fmt.Sprintf("default ±%.0f %% (a quoted or catalogue price; common practice, no source)", prices.DefaultSpread*100)
		}
		p := it.Price.InexactFloat64()
		d.price[i] = d.add(Uncertain{Name: "price of " + it.Name, Field: "price: " + it.Name, Kind: KindPrice,
			Unit: t.Currency + "/" + it.Unit, Nominal: p, Lo: p * (1 - s), Hi: p * (1 + s),
			Dist: "rectangular", Basis: basis}, rectangular(1-s, 1+s))
	}
}

func (d *design) addRule(sc *scenario.Scenario) {
	if sc.Chromatography == nil {
		return
	}
	d.rules = []scenario.Rule{scenario.RuleTheory, scenario.RuleTable}
	w := RuleWeights[scenario.RuleTheory]
	nominal := 0.0
	if sc.Chromatography.LoadingRule == scenario.RuleTable {
		nominal = 1
	}
	d.rule = d.add(Uncertain{Name: "which route sizes the silica (0 elution theory, 1 Still's table)", Field: "chromatography.loading_rule",
		Kind: KindModelForm, Nominal: nominal, Lo: 0, Hi: 1,
		Dist:  fmt.Sprintf("two alternatives, weights %.2g and %.2g", w, RuleWeights[scenario.RuleTable]),
		Basis: "the two routes differ most at small Rf differences; equal weights (common practice, no source)"},
		func(rng *rand.Rand) float64 {
			if rng.Float64() < w {
				return 0
			}
			return 1
		})
}

// sample draws one row of inputs.
func (d *design) sample(rng *rand.Rand, x []float64) {
	for i, f := range d.draw {
		x[i] = f(rng)
	}
}

// apply builds the drawn plan and rates from a row of inputs.
func (d *design) apply(p *costing.Plan, r *ledger.Rates, x []float64) (*costing.Plan, *ledger.Rates) {
	sc := p.Scenario
	if len(d.measured) > 0 || d.rule >= 0 {
		vals := make([]float64, len(d.measured))
		for k, i := range d.measured {
			vals[k] = x[i]
		}
		sc = sc.With(vals)
		if d.rule >= 0 {
			sc.Chromatography.LoadingRule = d.rules[int(x[d.rule])]
		}
	}
	cv := make([]float64, len(d.base))
	for k, cd := range d.coef {
		switch {
		case cd.input < 0:
			cv[k] = d.base[k]
		case cd.value:
			cv[k] = x[cd.input]
		default:
			cv[k] = factorValue(d.base[k], x[cd.input], cd.odds)
		}
		if d.lo[k] != 0 || d.hi[k] != 0 { // a draw stays inside the physical range
			cv[k] = math.Min(math.Max(cv[k], d.lo[k]), d.hi[k])
		}
	}
	f := make([]float64, len(d.price))
	for k, i := range d.price {
		f[k] = 1
		if i >= 0 {
			f[k] = x[i]
		}
	}
	return p.Quiet(sc, p.Coef.WithValues(cv)), r.Scaled(f)
}

// usedPrices lists the price rows the plan's methods ask for at the
// masses, at their nominal values.
func usedPrices(p *costing.Plan, t *prices.Table, kgs ...float64) map[int]bool {
	used := map[int]bool{}
	for _, kg := range kgs {
		for _, m := range p.Methods {
			for _, dm := range m.Run(kg).Demands {
				if i, ok := t.Find(dm.Item); ok {
					used[i] = true
				}
			}
		}
	}
	return used
}
