package costing

import (
	"bytes"
	"fmt"
	"math"
	"testing"

	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/templates"
)

// FuzzModels is a property test of every model over settings within their
// ranges: whatever values a scenario may set (each coefficient anywhere in
// its range) and whatever accepted batch mass, no model returns NaN or an
// infinity, a negative mass, volume, time or quantity (credits excepted),
// a negative cost line (credits excepted), or more product out than went
// in. The properties are those of any mass balance and any bill; no
// published value is involved.
func FuzzModels(f *testing.F) {
	f.Add(0.5, false, []byte{})
	f.Add(0.0, true, []byte{})
	f.Add(1.0, false, []byte{0, 0, 0, 1, 0, 255, 2, 0, 128})
	f.Add(0.3, true, []byte{0, 10, 255, 0, 40, 0, 0, 70, 255, 0, 90, 0})
	solid := loadTemplate(f, templates.Scenario)
	liquid := loadTemplate(f, templates.Liquid)
	table, err := prices.Read(bytes.NewReader(templates.Prices), "prices.csv")
	if err != nil {
		f.Fatal(err)
	}
	base, err := Prepare(solid)
	if err != nil {
		f.Fatal(err)
	}
	defaults := base.Coef
	keys := defaults.Keys()
	f.Fuzz(func(t *testing.T, massShare float64, isLiquid bool, settings []byte) {
		if math.IsNaN(massShare) || math.IsInf(massShare, 0) {
			return
		}
		if massShare = math.Abs(massShare); massShare > 1 {
			massShare -= math.Floor(massShare)
		}
		// An accepted batch mass, log-uniform over the whole range.
		kg := scenario.MinBatchKg * math.Pow(scenario.MaxBatchKg/scenario.MinBatchKg, massShare)
		sc := solid
		if isLiquid {
			sc = liquid
		}
		// Settings as a scenario would write them, each within its range.
		var set []scenario.Setting
		for i := 0; i+2 < len(settings) && i < 60; i += 3 {
			c := defaults.Of(keys[(int(settings[i])<<8|int(settings[i+1]))%len(keys)])
			v := within(c, float64(settings[i+2])/255)
			set = append(set, scenario.Setting{Key: c.Key, Value: units.Quantity{SI: v, Dim: c.Dim}, Written: fmt.Sprint(v), Line: 1})
		}
		s := *sc
		s.Settings = set
		for _, st := range set {
			t.Logf("setting %s = %g", st.Key, st.Value.SI)
		}
		plan, err := Prepare(&s)
		if err != nil {
			t.Fatal(err)
		}
		for j := range plan.Methods {
			r, err := plan.RunOne(j, kg, table)
			if err != nil {
				t.Fatalf("%s at %g kg: %v", plan.Methods[j].Name, kg, err)
			}
			checkResult(t, r, kg)
		}
	})
}

// within is the value at share f of a coefficient's range, log-spaced when
// the range is above zero.
func within(c source.Coefficient, f float64) float64 {
	if c.Lo > 0 {
		return c.Lo * math.Pow(c.Hi/c.Lo, f)
	}
	return c.Lo + f*(c.Hi-c.Lo)
}

func loadTemplate(f *testing.F, data []byte) *scenario.Scenario {
	sc, err := scenario.Load(bytes.NewReader(data), "template.yaml")
	if err != nil {
		f.Fatal(err)
	}
	return sc
}

// checkResult asserts the physical and money properties of one result.
func checkResult(t *testing.T, r Result, kg float64) {
	t.Helper()
	u := r.Usage
	bad := func(what string, v float64) bool { return math.IsNaN(v) || math.IsInf(v, 0) || v < 0 }
	for _, v := range []float64{u.CrudeKg, u.ProductInKg, u.ProductOutKg} {
		if bad("mass", v) {
			t.Fatalf("%s at %g kg: mass %g (crude %g, in %g, out %g)", u.Method, kg, v, u.CrudeKg, u.ProductInKg, u.ProductOutKg)
		}
	}
	if u.ProductOutKg > u.ProductInKg*(1+1e-9) {
		t.Fatalf("%s at %g kg: %g kg product out of %g kg in", u.Method, kg, u.ProductOutKg, u.ProductInKg)
	}
	if !u.Feasible {
		return
	}
	for _, d := range u.Demands {
		if math.IsNaN(d.Qty) || math.IsInf(d.Qty, 0) || (d.Qty < 0 && d.Group != usage.Credit) {
			t.Fatalf("%s at %g kg: demand %q = %g", u.Method, kg, d.Label, d.Qty)
		}
	}
	for _, w := range u.Waste {
		if bad("volume", w.VolumeM3) {
			t.Fatalf("%s at %g kg: waste %q volume %g", u.Method, kg, w.Name, w.VolumeM3)
		}
		for _, c := range w.Components {
			if bad("mass", c.Kg) {
				t.Fatalf("%s at %g kg: waste %q holds %g kg of %s", u.Method, kg, w.Name, c.Kg, c.Name)
			}
		}
	}
	for _, a := range u.Activities {
		if bad("time", a.Elapsed) || bad("time", a.Attended) {
			t.Fatalf("%s at %g kg: activity %q %g s elapsed, %g s attended", u.Method, kg, a.Name, a.Elapsed, a.Attended)
		}
	}
	for _, l := range r.Ledger.Lines {
		if l.Amount.IsNegative() && l.Demand.Group != usage.Credit {
			t.Fatalf("%s at %g kg: ledger line %q = %s", u.Method, kg, l.Demand.Label, l.Amount)
		}
	}
}
