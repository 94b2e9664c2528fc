package main

import (
	"sort"
	"strings"
	"testing"

	"sepcost/costing/scenario"
)

// FuzzMassFlag: --mass never panics; the masses it accepts lie within
// scenario.BatchRange, are at most scenario.MaxMasses and come sorted; a
// refusal names the flag. Seeds in testdata/fuzz/FuzzMassFlag.
func FuzzMassFlag(f *testing.F) {
	for _, s := range []string{"250mg,20g,2kg", "1e30kg", "1e-30g", "1e306 t", "20", ",,,", "1 kg^4 kg^4 kg^4"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		var m massList
		if err := m.Set(s); err != nil {
			if !strings.HasPrefix(err.Error(), "--mass") {
				t.Fatalf("%q: message does not name the flag: %v", s, err)
			}
			return
		}
		if len(m.kg) == 0 || len(m.kg) > scenario.MaxMasses || !sort.Float64sAreSorted(m.kg) {
			t.Fatalf("%q: masses %v", s, m.kg)
		}
		for _, kg := range m.kg {
			if scenario.CheckBatchMass(kg) != nil {
				t.Fatalf("%q: accepted %g kg", s, kg)
			}
		}
	})
}
