package costing

import (
	"errors"
	"strings"
	"testing"

	"sepcost/costing/scenario"
)

// Every coefficient a scenario may set has a physical range, and its
// default (or calibrated value) lies inside it. The ranges themselves are
// physical limits stated beside each model's coefficients.
func TestEveryCoefficientBounded(t *testing.T) {
	t.Parallel()
	plan, err := Prepare(load(t, base))
	if err != nil {
		t.Fatal(err)
	}
	if plan.Coef.Len() < 100 {
		t.Fatalf("only %d coefficients; the three models have more", plan.Coef.Len())
	}
	for _, c := range plan.Coef.Sorted() {
		switch {
		case !c.Bounded():
			t.Errorf("%s has no range", c.Key)
		case !(c.Lo < c.Hi):
			t.Errorf("%s: range %g to %g is empty", c.Key, c.Lo, c.Hi)
		case c.Lo < 0:
			t.Errorf("%s: range starts at %g; no coefficient of these models is negative", c.Key, c.Lo)
		case !c.InRange(c.SI):
			t.Errorf("%s: default %g lies outside its range %g to %g", c.Key, c.SI, c.Lo, c.Hi)
		}
	}
}

// Settings outside their range are refused with the file, the line, the
// setting and the range; a rate or share that a model divides by cannot be
// zero.
func TestSettingsOutOfRange(t *testing.T) {
	t.Parallel()
	cases := []struct {
		setting string
		want    []string
	}{
		// A share above 100 % of the product cannot be lost (mass balance).
		{`chromatography.silica_retention_loss: "150 %"`, []string{"s.yaml:9:", "settings.chromatography.silica_retention_loss", `"150 %"`, "0 to 0.5"}},
		// A time cannot be negative.
		{`distillation.setup_time: "-5 min"`, []string{"s.yaml:9:", "settings.distillation.setup_time", "0 to 2880 min"}},
		// A zero heater efficiency would divide by zero.
		{`chromatography.evaporator_heat_efficiency: "0 %"`, []string{"s.yaml:9:", "settings.chromatography.evaporator_heat_efficiency", "0.01 to 1"}},
		// A reflux of less than the minimum gives no finite column (Gilliland).
		{`distillation.reflux_multiple: 0.5`, []string{"settings.distillation.reflux_multiple", "1.01 to 10"}},
		{`crystallization.u_flask: "-100 W/(m^2 K)"`, []string{"settings.crystallization.u_flask", "10 to 2000"}},
	}
	for _, c := range cases {
		_, err := Prepare(load(t, base+"settings:\n  "+c.setting+"\n"))
		if err == nil {
			t.Errorf("%s: accepted", c.setting)
			continue
		}
		if !errors.Is(err, scenario.ErrInvalid) {
			t.Errorf("%s: %v does not unwrap to ErrInvalid", c.setting, err)
		}
		for _, w := range c.want {
			if !strings.Contains(err.Error(), w) {
				t.Errorf("%s: %q lacks %q", c.setting, err, w)
			}
		}
	}
}
