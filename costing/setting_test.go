package costing

import (
	"math"
	"testing"
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
