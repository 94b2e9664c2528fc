package costing

import (
	"math"
	"regexp"
	"testing"

	"sepcost/costing/prices"
)

// PerGramBound keeps the plan RunOne reports (the same equipment, in words
// and as an identity) and brackets its cost per gram: the reported cost
// lies within the bound of the float one, and both are NaN together.
// Checked on the two demos and the solid demo with a distillation section
// at 80 masses from 50 µg to 50 kg, across the changes of loading, column,
// cartridge, evaporator, vessel and still there (derived: RunOne is the
// decimal path every report uses).
func TestPerGramBoundHoldsTheReportedCost(t *testing.T) {
	t.Parallel()
	three, tp := threeMethodPlan(t)
	solid, sp := demoPlanOf(t, "solid")
	liquid, lp := demoPlanOf(t, "liquid")
	for _, c := range []struct {
		name string
		p    *Plan
		t    *prices.Table
	}{{"solid", solid, sp}, {"liquid", liquid, lp}, {"three", three, tp}} {
		st, err := c.p.SitePrices(c.t)
		if err != nil {
			t.Fatal(err)
		}
		q := c.p.Quiet(c.p.Scenario, c.p.Coef)
		for k := range 80 {
			kg := 5e-8 * math.Pow(1e9, float64(k)/79)
			for j, m := range c.p.Methods {
				want, err := c.p.RunOne(j, kg, st)
				if err != nil {
					t.Fatal(err)
				}
				u, perG, bound, err := q.PerGramBound(j, kg, st)
				if err != nil {
					t.Fatal(err)
				}
				w := want.PerGram()
				switch {
				case math.IsNaN(w) != math.IsNaN(perG) || !(bound >= 0):
					t.Errorf("%s %s at %g kg: bounded %g ± %g, reported %g", c.name, m.Name, kg, perG, bound, w)
				case !math.IsNaN(w) && math.Abs(perG-w) > bound:
					t.Errorf("%s %s at %g kg: reported %g lies outside %g ± %g", c.name, m.Name, kg, w, perG, bound)
				}
				if u.Equipment != want.Usage.Equipment || u.EquipmentID != want.Usage.EquipmentID {
					t.Errorf("%s %s at %g kg: kept %q (%q), reported %q (%q)", c.name, m.Name, kg,
						u.Equipment, u.EquipmentID, want.Usage.Equipment, want.Usage.EquipmentID)
				}
			}
		}
	}
}

// The equipment identity is the equipment in words without the bed height,
// the one part of them that follows the mass smoothly (a column's bed is
// sized to the silica): checked on every candidate of the three-method
// scenario at 80 masses, with the mixed fractions re-run and without.
func TestEquipmentIDLeavesOutTheBed(t *testing.T) {
	t.Parallel()
	bed := regexp.MustCompile(`, [0-9]+ cm bed`)
	p, _ := threeMethodPlan(t)
	sc := *p.Scenario
	ch := *sc.Chromatography
	ch.RerunMixed = !ch.RerunMixed
	sc.Chromatography = &ch
	for _, q := range []*Plan{p, p.Quiet(&sc, p.Coef)} {
		beds := 0
		for k := range 80 {
			kg := 5e-8 * math.Pow(1e9, float64(k)/79)
			for _, m := range q.Methods {
				for _, u := range usagesOf(m, kg) {
					if got := bed.ReplaceAllString(u.Equipment, ""); got != u.EquipmentID {
						t.Errorf("%s at %g kg: identity %q, words %q", m.Name, kg, u.EquipmentID, u.Equipment)
					}
					if u.Equipment != u.EquipmentID {
						beds++
					}
				}
			}
		}
		if beds == 0 {
			t.Error("no candidate on a column: the bed is not checked")
		}
	}
}
