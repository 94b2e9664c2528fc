package scale

import (
	"bytes"
	"fmt"
	"math"
	"math/rand/v2"
	"os"
	"strings"
	"time"

	"testing"

	"sepcost/costing"
	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/templates"
)

// BenchmarkSweep200: a 200-mass sweep, 100 µg to 10 kg, with the
// decision's and the pairwise crossovers found by bisection, no draws: the
// solid demo (chromatography and crystallization; distillation not
// assessed), the liquid demo (chromatography and distillation;
// crystallization not assessed) and "three", the solid demo with a
// distillation section (all three methods). Beside the clock and processor
// time, evals/op counts the model runs of the crossover search (lean and
// full; the 200 × 3 runs of the sweep's own table not counted).
func BenchmarkSweep200(b *testing.B) {
	three, err := os.ReadFile("testdata/solid-with-distillation.yaml")
	if err != nil {
		b.Fatal(err)
	}
	for _, c := range []struct {
		name string
		yaml []byte
	}{{"solid", templates.Scenario}, {"liquid", templates.Liquid}, {"three", three}} {
		b.Run(c.name, func(b *testing.B) {
			p, pt := plan(b, c.yaml)
			masses, _ := LogSpace(1e-4, 10, 200)
			b.ReportAllocs()
			start := cpuTime()
			var r *Report
			for b.Loop() {
				if r, err = SweepWith(p, pt, masses, Options{}); err != nil {
					b.Fatal(err)
				}
			}
			reportCPU(b, start)
			b.ReportMetric(float64(searchRuns(b, p, pt, r)), "evals/op")
		})
	}
}

// searchRuns is the number of model runs the crossover search of a
// sweep's report makes.
func searchRuns(b *testing.B, p *costing.Plan, pt *prices.Table, r *Report) int {
	e, err := planEvals(p, pt)
	if err != nil {
		b.Fatal(err)
	}
	grid := gridOf(r)
	if _, err := findDecisionCrossovers(r.Methods, r.MassesKg, grid, e); err != nil {
		b.Fatal(err)
	}
	if _, err := findPairwise(r.Methods, r.MassesKg, grid, e); err != nil {
		b.Fatal(err)
	}
	return e.runs
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

// BenchmarkDraws10k: 10,000 draws of every uncertain input at the solid
// demo's target mass, both methods, summarised as the bands at that mass
// (the figure the uncertainty work is held to: under 1 s on two cores).
// The rank correlations and the value of information of the inputs are
// timed on their own (BenchmarkValueOfInformation).
func BenchmarkDraws10k(b *testing.B) {
	p, pt := plan(b, templates.Scenario)
	t, err := p.SitePrices(pt)
	if err != nil {
		b.Fatal(err)
	}
	nominal := ledger.NewRates(t)
	ms := []float64{p.Scenario.TargetKg}
	d := newDesign(p, t, usedPrices(p, t, ms...))
	names, nJ := p.MethodNames(), len(p.Methods)
	b.ReportAllocs()
	defer reportCPU(b, cpuTime())
	for b.Loop() {
		_, perG, err := d.drawAll(p, nominal, ms, 10000, 1, nil)
		if err != nil {
			b.Fatal(err)
		}
		rows := make([][]float64, 10000)
		for k := range rows {
			rows[k] = perG[k*nJ : (k+1)*nJ]
		}
		bands(names, rows)
	}
}

// BenchmarkBands50x1000: bands over a 50-mass sweep with 1,000 draws (each
// draw runs both methods of the solid demo at 50 masses and the target).
func BenchmarkBands50x1000(b *testing.B) {
	p, pt := plan(b, templates.Scenario)
	masses, _ := LogSpace(1e-4, 10, 50)
	b.ReportAllocs()
	defer reportCPU(b, cpuTime())
	for b.Loop() {
		if _, err := SampleAcross(p, pt, p.Scenario.TargetKg, masses, 1000, 1, nil); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkValueOfInformation: the rank correlations and the value of
// perfect information of every input from 10,000 draws already made.
func BenchmarkValueOfInformation(b *testing.B) {
	p, pt := plan(b, templates.Scenario)
	u, err := Sample(p, pt, p.Scenario.TargetKg, 10000, 1, nil)
	if err != nil {
		b.Fatal(err)
	}
	d := newDesign(p, pt, usedPrices(p, pt, u.TargetKg))
	nI := len(d.inputs)
	x := make([]float64, 10000*nI)
	perG := make([][]float64, 10000)
	for k := range perG {
		d.sample(rand.New(rand.NewPCG(1, uint64(k))), x[k*nI:(k+1)*nI])
		perG[k] = []float64{float64(k % 7), float64(k % 5), math.NaN()}
	}
	r := ledger.NewRates(pt)
	b.ResetTimer()
	defer reportCPU(b, cpuTime())
	for b.Loop() {
		v := &Uncertainty{TargetKg: u.TargetKg, Inputs: d.inputs, ProductG: u.ProductG}
		v.weighInputs(p, r, x, perG)
	}
}

// reportCPU adds the processor time per operation, all threads together:
// on a shared machine it varies much less than the clock time.
func reportCPU(b *testing.B, start time.Duration) {
	if b.N > 0 && start > 0 {
		b.ReportMetric((cpuTime()-start).Seconds()/float64(b.N), "cpu-s/op")
	}
}

// BenchmarkPortfolio1000: a plan of 1,000 rows over the two demo
// scenarios at ten masses, each scenario file read and prepared by the
// loader as the portfolio command does.
func BenchmarkPortfolio1000(b *testing.B) {
	var sb strings.Builder
	sb.WriteString("scenario,mass,runs\n")
	masses := []string{"100 mg", "500 mg", "1 g", "5 g", "20 g", "100 g", "250 g", "1 kg", "2 kg", "5 kg"}
	for i := range 1000 {
		f := "solid.yaml"
		if i%2 == 1 {
			f = "liquid.yaml"
		}
		fmt.Fprintf(&sb, "%s,%s,%d\n", f, masses[i/2%len(masses)], 1+i%4)
	}
	rows, err := ReadPlan(strings.NewReader(sb.String()), "plan.csv")
	if err != nil {
		b.Fatal(err)
	}
	files := map[string][]byte{"solid.yaml": templates.Scenario, "liquid.yaml": templates.Liquid}
	_, pt := plan(b, templates.Scenario)
	load := func(path string) (*costing.Plan, error) {
		sc, err := scenario.Load(bytes.NewReader(files[path]), path)
		if err != nil {
			return nil, err
		}
		return costing.Prepare(sc)
	}
	b.ReportAllocs()
	defer reportCPU(b, cpuTime())
	for b.Loop() {
		if _, err := BuildPortfolio("plan.csv", rows, load, pt); err != nil {
			b.Fatal(err)
		}
	}
}
