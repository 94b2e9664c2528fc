package costing

import (
	"math"
	"strings"
	"testing"

	"sepcost/costing/chrom"
	"sepcost/costing/equipment"
)

// PerGramWithSetting gives, bit for bit, the cost per gram that
// WithSetting then RunOne report (derived: the same settling, a quiet
// model of the one method, the decimal ledger): every coefficient of the
// three-method scenario set 10 % above its value, at 10 g and at the
// target mass; a value the coefficient refuses is refused by both.
func TestPerGramWithSettingIsTheReportedCost(t *testing.T) {
	t.Parallel()
	p, pt := threeMethodPlan(t)
	compared := 0
	for _, kg := range []float64{0.01, p.Scenario.TargetKg} {
		for _, key := range p.Coef.Keys() {
			co := p.Coef.Of(key)
			j := -1
			for i, m := range p.Methods {
				if m.Name == co.Method {
					j = i
				}
			}
			if j < 0 {
				continue
			}
			si := co.SI * 1.1
			q, errWant := p.WithSetting(key, si)
			got, errGot := p.PerGramWithSetting(key, si, j, kg, pt)
			if (errWant != nil) != (errGot != nil) {
				t.Fatalf("%s = %g: error %v, reported path %v", key, si, errGot, errWant)
			}
			if errWant != nil {
				continue
			}
			compared++
			r, err := q.RunOne(j, kg, pt)
			if err != nil {
				t.Fatal(err)
			}
			if want := r.PerGram(); math.Float64bits(got) != math.Float64bits(want) && !(math.IsNaN(got) && math.IsNaN(want)) {
				t.Errorf("%s = %g at %g kg: %v, reported %v", key, si, kg, got, want)
			}
		}
	}
	if compared < p.Coef.Len() {
		t.Errorf("%d comparisons for %d coefficients at two masses", compared, p.Coef.Len())
	}
}

// A plan on the site's own equipment table tries its settings on that
// table, not on the built-in one: with one 40 mm column and one small
// evaporator charged by the hour (a site table of two lines; the rate is
// an invented example), chromatography's cost per gram with a setting
// left at its own value is the plan's own, by both paths.
func TestSettingsTriedOnTheSiteEquipment(t *testing.T) {
	t.Parallel()
	p, pt := demoPlan(t)
	eq, err := equipment.Read(strings.NewReader("item,kind,size,throughput,max_load,hourly_rate,ownership,price,currency,service_life,source\n"+
		"c,column,40 mm,,,,owned,,,,\nsmall evaporator,evaporator,1 L,2 L/h,,40.00,owned,,EUR,,example (invented)\n"), "site.csv")
	if err != nil {
		t.Fatal(err)
	}
	q, err := PrepareWith(p.Scenario, Options{Equipment: eq})
	if err != nil {
		t.Fatal(err)
	}
	st, err := q.SitePrices(pt)
	if err != nil {
		t.Fatal(err)
	}
	const kg = 0.01
	own, err := q.RunOne(0, kg, st)
	if err != nil {
		t.Fatal(err)
	}
	builtin, err := p.RunOne(0, kg, pt)
	if err != nil {
		t.Fatal(err)
	}
	if own.PerGram() == builtin.PerGram() {
		t.Fatalf("the site table costs the same as the built-in one (%v): the test cannot tell them apart", own.PerGram())
	}
	key := chrom.KeyTailCV
	co, ok := q.Coef.Lookup(key)
	if !ok {
		t.Fatalf("no setting %s", key)
	}
	lean, err := q.PerGramWithSetting(key, co.SI, 0, kg, st)
	if err != nil {
		t.Fatal(err)
	}
	w, err := q.WithSetting(key, co.SI)
	if err != nil {
		t.Fatal(err)
	}
	full, err := w.RunOne(0, kg, st)
	if err != nil {
		t.Fatal(err)
	}
	if lean != own.PerGram() || full.PerGram() != own.PerGram() {
		t.Errorf("cost per gram with %s at its own value: %v and %v, the plan's own %v (built-in table %v)", key, lean, full.PerGram(), own.PerGram(), builtin.PerGram())
	}
}
