package costing

import (
	"bytes"
	"math"
	"strings"
	"testing"

	"sepcost/costing/scenario"
	"sepcost/costing/usage"
	"sepcost/templates"
)

// TestFigureKeySuffixes: a unit suffix in a figure key names the display
// unit (usage.FigureKey): _l litres, _kg kilograms, _h hours; the SI value
// stays SI (a figure shown in L holds m³: 1 L = 1e-3 m³, SI Brochure, 9th
// ed., 2019, Table 8). Every figure of both demos at 100 mg, 10 g and
// 5 kg is checked.
func TestFigureKeySuffixes(t *testing.T) {
	t.Parallel()
	suffix := map[string]string{"_l": "L", "_kg": "kg", "_h": "h"}
	for name, data := range map[string][]byte{"demo": templates.Scenario, "liquid demo": templates.Liquid} {
		sc, err := scenario.Load(bytes.NewReader(data), name)
		if err != nil {
			t.Fatal(err)
		}
		p, err := Prepare(sc)
		if err != nil {
			t.Fatal(err)
		}
		seen := 0
		for _, m := range []float64{1e-4, 0.01, 5} {
			for _, meth := range p.Methods {
				u := meth.Run(m)
				for _, f := range u.Figures {
					for s, unit := range suffix {
						if strings.HasSuffix(string(f.Key), s) && f.Unit != unit {
							t.Errorf("%s %s: key %q claims %s, display unit %q", name, meth.Name, f.Key, unit, f.Unit)
						}
					}
					if f.Key == usage.FigSolventTotal {
						seen++
						if v := f.Display(); math.Abs(v-f.SI*1000) > 1e-12*v {
							t.Errorf("%s %s: %g m³ shown as %g L", name, meth.Name, f.SI, v)
						}
					}
					if f.Key.PerSolvent() != f.Detail && f.Key != "k_product" && f.Key != "band_cv" {
						t.Errorf("%s: figure %q detail %v", name, f.Key, f.Detail)
					}
				}
			}
		}
		if seen == 0 {
			t.Errorf("%s: no method reported its total solvent", name)
		}
	}
}
