package costing

import (
	"bytes"
	"math"
	"os"
	"path/filepath"
	"testing"

	"sepcost/costing/chrom"
	"sepcost/costing/cryst"
	"sepcost/costing/distil"
	"sepcost/costing/green"
	"sepcost/costing/scenario"
	"sepcost/costing/usage"
	"sepcost/templates"
)

// TestMassBalanceCloses checks that every feasible model output of both
// demos and of every scenario fixture in testdata closes its mass balance,
// so that PMI = E + 1 (Jiménez-González, C.; Ponder, C. S.; Broxterman,
// Q. B.; Manley, J. B. "Using the Right Green Yardstick: Why Process Mass
// Intensity Is Used in the Pharmaceutical Industry To Drive More
// Sustainable Processes", Org. Process Res. Dev. 2011, 15, 912: PMI =
// E-factor + 1 when every input leaves as product or waste) to 1e-9, at
// the scenario's masses and from 100 mg to 100 kg. Chromatography is
// checked on every candidate plan the plan prices (loadings and equipment).
func TestMassBalanceCloses(t *testing.T) {
	t.Parallel()
	closes := map[string]bool{chrom.Method: true, cryst.Method: true, distil.Method: true}
	cases := map[string][]byte{"demo": templates.Scenario, "liquid demo": templates.Liquid}
	fixtures, _ := filepath.Glob(filepath.Join("..", "testdata", "*.yaml"))
	for _, f := range fixtures {
		b, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		cases[f] = b
	}
	for name, data := range cases {
		sc, err := scenario.Load(bytes.NewReader(data), name)
		if err != nil {
			t.Fatal(err)
		}
		p, err := Prepare(sc)
		if err != nil {
			t.Fatal(err)
		}
		checked := 0
		for _, m := range append([]float64{1e-4, 1e-2, 1, 5, 100}, sc.MassesKg...) {
			var us []usage.Usage
			for _, meth := range p.Methods {
				if meth.Choices != nil {
					us = append(us, meth.Choices(m)...)
				} else {
					us = append(us, meth.Run(m))
				}
			}
			for _, u := range us {
				if !u.Feasible || !closes[u.Method] {
					continue
				}
				g, err := green.Compute(u, sc.Solvents)
				if err != nil {
					t.Fatalf("%s, %s at %g kg: %v", name, u.Method, m, err)
				}
				checked++
				if d := math.Abs(g.PMI - (g.EFactor + 1)); d > 1e-9*g.PMI {
					t.Errorf("%s, %s at %g kg: PMI %.10g, E + 1 = %.10g, gap %.3g kg, not counted %v", name, u.Method, m, g.PMI, g.EFactor+1, g.BalanceGapKg, g.NotCounted)
				}
			}
		}
		if checked == 0 && (sc.Crystallization != nil || sc.Distillation != nil) {
			t.Errorf("%s: no feasible crystallization or distillation to check", name)
		}
	}
}
