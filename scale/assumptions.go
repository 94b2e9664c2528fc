package scale

import (
	"fmt"
	"math"
	"sort"

	"sepcost/costing"
	"sepcost/costing/parallel"
	"sepcost/costing/prices"
	"sepcost/costing/source"
)

// AssumptionSwing is the change in a method's cost per gram, between a
// default's low and high plausible values, from which the default is
// listed as an assumption the decision rests on: 10 % (common practice, no
// source: below it a default moves the cost less than the prices drift
// within a budget year, PriceSpread).
const AssumptionSwing = 0.10

// PlausibleZ is how far, in standard deviations of its spread (Spread by
// mark), a default's low and high plausible values lie: 1.2816, the 10th
// and 90th percentiles of the normal distribution, the same P10 and P90
// the Monte Carlo bands report (Abramowitz and Stegun 1964, table 26.1,
// from memory).
const PlausibleZ = 1.2816

// Assumption is a default the user did not set whose plausible range moves
// a method's cost per gram at the target mass by more than
// AssumptionSwing, found by changing that default alone.
type Assumption struct {
	Method     string  // the method whose cost it moves
	Key, Label string  // the setting's key (for settings:) and its words
	Unit       string  // display unit of the values; "" for plain numbers
	Default    float64 // display units
	Low, High  float64 // the plausible values tried (P10 and P90 of its spread), display units
	Mark       source.Mark
	Source     string
	PerGram    float64 // cost per gram at the default
	PerGramLo  float64 // at Low; NaN when the method is then not feasible
	PerGramHi  float64 // at High; NaN when the method is then not feasible
	Swing      float64 // |PerGramHi − PerGramLo| / PerGram; +Inf when feasibility changes
	Flips      bool    // at Low or High another method would be cheapest at the target mass
}

// markFlips sets Flips on each assumption whose low or high value would
// change the decision: the winner becoming dearer than the runner-up, or
// another method cheaper than the winner.
func markFlips(as []Assumption, d *Decision) {
	if d == nil || d.Winner == "" {
		return
	}
	for k := range as {
		a := &as[k]
		for _, v := range []float64{a.PerGramLo, a.PerGramHi} {
			switch {
			case a.Method == d.Winner:
				a.Flips = a.Flips || math.IsNaN(v) || (d.RunnerUp != "" && v > d.RunnerPerG)
			default:
				a.Flips = a.Flips || v < d.WinnerPerG
			}
		}
	}
}

// Words is the assumption in one line: "chromatography: packed bed
// density 0.5 g/mL (not set; plausible 0.41–0.61) moves the cost per gram
// from 51.8 to 35.5 (default 42.6), 38 %".
func (a Assumption) Words() string {
	cost := func(v float64) string {
		if math.IsNaN(v) {
			return "not feasible"
		}
		return fmt.Sprintf("%.4g", v)
	}
	swing := "feasibility changes"
	if !math.IsInf(a.Swing, 0) {
		swing = fmt.Sprintf("%.0f %%", a.Swing*100)
	}
	s := fmt.Sprintf("%s: %s (%s) %.4g%s, not set in the scenario; over its plausible range %.4g–%.4g the cost per gram goes from %s to %s (%s at the default): %s",
		a.Method, a.Label, a.Key, a.Default, unitSuffix(a.Unit), a.Low, a.High, cost(a.PerGramLo), cost(a.PerGramHi), cost(a.PerGram), swing)
	if a.Flips {
		s += "; within that range the decision would change"
	}
	return s + ". Source: " + a.Source + " (" + string(a.Mark) + ")."
}

// FindAssumptions changes each default the scenario does not set, one at a
// time and as a setting in the scenario would (calibrations that depend on
// it rerun), to its low and then its high plausible value (P10 and P90 of the
// spread its mark is given, Spread) and reruns the method it belongs to at
// the target mass. A default that moves that method's cost per gram by
// more than AssumptionSwing, or decides whether the method is feasible, is
// listed, largest swing first. Methods not feasible at the default stay
// out unless a plausible value makes them feasible; a method the scenario
// does not describe (costing.StatusNotAssessed) is not assessed whatever
// its coefficients, so its defaults are not tried. The reruns are pure
// functions of the plan and the value: they run on all cores, each in its
// own slot, so the list is the same on any number.
func FindAssumptions(p *costing.Plan, t *prices.Table, targetKg float64) ([]Assumption, error) {
	names := p.MethodNames()
	base := make([]float64, len(names))
	assessed := make([]bool, len(names))
	for j := range names {
		r, err := p.RunOne(j, targetKg, t)
		if err != nil {
			return nil, err
		}
		base[j], assessed[j] = r.PerGram(), r.Status() != costing.StatusNotAssessed
	}
	var tries []trial
	for _, key := range p.Coef.Keys() {
		co := p.Coef.Of(key)
		if co.Mark == source.Override {
			continue
		}
		lo, okLo := perturb(co, -PlausibleZ)
		hi, okHi := perturb(co, PlausibleZ)
		if !okLo || !okHi {
			continue
		}
		lo.SI, hi.SI = clamp(co, lo.SI), clamp(co, hi.SI)
		for j, name := range names {
			if co.Method != name || !assessed[j] {
				continue
			}
			tries = append(tries, trial{j: j, lo: lo, hi: hi, a: Assumption{Method: name, Key: key, Label: co.Label, Unit: co.Unit,
				Default: co.Display(), Low: lo.Display(), High: hi.Display(), Mark: co.Mark, Source: co.Source, PerGram: base[j]}})
		}
	}
	if err := runTrials(p, t, targetKg, tries); err != nil {
		return nil, err
	}
	var out []Assumption
	for _, tr := range tries {
		if tr.a.Swing > AssumptionSwing {
			out = append(out, tr.a)
		}
	}
	sort.SliceStable(out, func(a, b int) bool { return out[a].Swing > out[b].Swing })
	return out, nil
}

// trial is one default of method j tried at its low and high values.
type trial struct {
	j      int
	lo, hi source.Coefficient
	a      Assumption
}

// runTrials runs every trial at m on all cores, filling each one's costs
// per gram and swing; the first error in trial order is returned.
func runTrials(p *costing.Plan, t *prices.Table, m float64, tries []trial) error {
	errs := make([]error, len(tries))
	parallel.For(len(tries), func(k int) {
		tr := &tries[k]
		var err error
		if tr.a.PerGramLo, err = runWith(p, t, tr.j, m, tr.lo); err == nil {
			tr.a.PerGramHi, err = runWith(p, t, tr.j, m, tr.hi)
		}
		tr.a.Swing = swing(tr.a.PerGram, tr.a.PerGramLo, tr.a.PerGramHi)
		errs[k] = err
	})
	for _, err := range errs {
		if err != nil {
			return err
		}
	}
	return nil
}

// swing is |hi − lo| / base; +Inf when the method is feasible at some of
// the three values and not at others; 0 when it is feasible at none.
func swing(base, lo, hi float64) float64 {
	nan := 0
	for _, v := range []float64{base, lo, hi} {
		if math.IsNaN(v) {
			nan++
		}
	}
	switch nan {
	case 0:
		return math.Abs(hi-lo) / base
	case 3:
		return 0
	}
	return math.Inf(1)
}

// clamp keeps a plausible value inside the coefficient's physical range.
func clamp(co source.Coefficient, v float64) float64 {
	if !co.Bounded() {
		return v
	}
	return math.Min(math.Max(v, co.Lo), co.Hi)
}

// runWith runs method j at m with one coefficient set as a user would set
// it (calibrations rerun); it returns the cost per gram (NaN when not
// feasible), the one WithSetting then RunOne report
// (costing.Plan.PerGramWithSetting: only method j built, quiet).
func runWith(p *costing.Plan, t *prices.Table, j int, m float64, co source.Coefficient) (float64, error) {
	return p.PerGramWithSetting(co.Key, co.SI, j, m, t)
}

func unitSuffix(u string) string {
	if u == "" {
		return ""
	}
	return " " + u
}
