package costing

import (
	"fmt"
	"os"
	"testing"
	"time"

	"sepcost/costing/prices"
	"sepcost/costing/scenario"
)

// threeMethodPlan is the solid demo with a distillation section: a scenario
// that describes all three methods.
func threeMethodPlan(b testing.TB) (*Plan, *prices.Table) {
	f, err := os.Open("../scale/testdata/solid-with-distillation.yaml")
	if err != nil {
		b.Fatal(err)
	}
	defer f.Close()
	sc, err := scenario.Load(f, "solid-with-distillation.yaml")
	if err != nil {
		b.Fatal(err)
	}
	_, t := demoPlan(b)
	p, err := Prepare(sc)
	if err != nil {
		b.Fatal(err)
	}
	if len(p.Methods) != 3 {
		b.Fatalf("%d methods, want 3", len(p.Methods))
	}
	for _, m := range p.Methods {
		if m.Run == nil {
			b.Fatalf("%s is not described", m.Name)
		}
	}
	return p, t
}

// BenchmarkOneMassThreeMethods: one batch mass (the scenario's target,
// 2 kg) through chromatography, crystallization and distillation, each
// model then its ledger and green metrics (Plan.RunOne); the sub-benchmarks
// are each method alone (model: its Run or Choices; lean: what the priced
// run asks of a model with lean candidates). Processor time is reported beside clock time
// (cpu-µs/op: the machine is shared).
func BenchmarkOneMassThreeMethods(b *testing.B) {
	p, t := threeMethodPlan(b)
	st, err := p.SitePrices(t)
	if err != nil {
		b.Fatal(err)
	}
	m := p.Scenario.TargetKg
	b.Run("all", func(b *testing.B) {
		b.ReportAllocs()
		start := cpuTime()
		for b.Loop() {
			for j := range p.Methods {
				if _, err := p.RunOne(j, m, st); err != nil {
					b.Fatal(err)
				}
			}
		}
		reportCPU(b, start)
	})
	for j, me := range p.Methods {
		b.Run(fmt.Sprintf("%s/model", me.Name), func(b *testing.B) {
			b.ReportAllocs()
			start := cpuTime()
			for b.Loop() {
				if me.Choices != nil {
					me.Choices(m)
				} else {
					me.Run(m)
				}
			}
			reportCPU(b, start)
		})
		if me.Lean != nil {
			// What the priced run asks of the model: the lean candidates
			// and one of them in full.
			b.Run(fmt.Sprintf("%s/lean", me.Name), func(b *testing.B) {
				b.ReportAllocs()
				start := cpuTime()
				for b.Loop() {
					_, full := me.Lean(m)
					full(0)
				}
				reportCPU(b, start)
			})
		}
		b.Run(fmt.Sprintf("%s/priced", me.Name), func(b *testing.B) {
			b.ReportAllocs()
			start := cpuTime()
			for b.Loop() {
				if _, err := p.RunOne(j, m, st); err != nil {
					b.Fatal(err)
				}
			}
			reportCPU(b, start)
		})
	}
}

// reportCPU reports the processor time per operation since start.
func reportCPU(b *testing.B, start time.Duration) {
	b.ReportMetric(float64((cpuTime()-start).Microseconds())/float64(b.N), "cpu-µs/op")
}
