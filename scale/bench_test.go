package scale

import (
	"testing"

	"sepcost/templates"
)

// BenchmarkSweep200: a 200-mass sweep over the three methods of the liquid
// demo plus the solid demo's two (chromatography, crystallization,
// distillation across the two), with crossovers found by bisection, without
// the Monte Carlo draws.
func BenchmarkSweep200(b *testing.B) {
	for _, c := range []struct {
		name string
		yaml []byte
	}{{"solid", templates.Scenario}, {"liquid", templates.Liquid}} {
		b.Run(c.name, func(b *testing.B) {
			p, pt := plan(b, c.yaml)
			masses, _ := LogSpace(1e-4, 10, 200)
			b.ReportAllocs()
			for b.Loop() {
				if _, err := SweepWith(p, pt, masses, Options{}); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// BenchmarkSample400: the default 400 uncertainty draws at one mass.
func BenchmarkSample400(b *testing.B) {
	p, pt := plan(b, templates.Scenario)
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Sample(p, pt, 2, 400, 1, nil); err != nil {
			b.Fatal(err)
		}
	}
}
