package scale

import (
	"math"
	"math/rand/v2"
	"runtime"
	"strings"
	"testing"

	"sepcost/costing/ledger"
	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/templates"
)

// Sample quantiles by the spreadsheet PERCENTILE rule (Hyndman, R. J.; Fan,
// Y. "Sample quantiles in statistical packages", Am. Stat. 1996, 50, 361,
// definition 7): for 1..10, P10 = 1.9, P50 = 5.5, P90 = 9.1 (hand
// computation: h = q·(n − 1)).
func TestQuantile(t *testing.T) {
	t.Parallel()
	v := []float64{1, 2, 3, 4, 5, 6, 7, 8, 9, 10}
	for _, c := range []struct{ q, want float64 }{{0.1, 1.9}, {0.5, 5.5}, {0.9, 9.1}, {0, 1}, {1, 10}} {
		if got := quantile(v, c.q); math.Abs(got-c.want) > 1e-12 {
			t.Errorf("q %g: %g, want %g", c.q, got, c.want)
		}
	}
}

// The same seed gives the same bands whatever the number of workers; the
// bands are ordered and the nominal cost per gram lies inside P10–P90.
func TestSampleDeterministic(t *testing.T) {
	p, pt := plan(t, templates.Scenario)
	a, err := Sample(p, pt, 2, 200, 7, nil)
	if err != nil {
		t.Fatal(err)
	}
	old := runtime.GOMAXPROCS(1)
	b, err := Sample(p, pt, 2, 200, 7, nil)
	runtime.GOMAXPROCS(old)
	if err != nil {
		t.Fatal(err)
	}
	for j := range a.Bands {
		x, y := a.Bands[j], b.Bands[j]
		if x.P50 != y.P50 && !(math.IsNaN(x.P50) && math.IsNaN(y.P50)) || x.Cheapest != y.Cheapest {
			t.Errorf("%s: %+v vs %+v", x.Method, x, y)
		}
	}
	share := 0.0
	for j, band := range a.Bands {
		share += band.Cheapest
		if band.Feasible == 0 {
			continue
		}
		if !(band.P10 <= band.P50 && band.P50 <= band.P90) {
			t.Errorf("%s: bands out of order %+v", band.Method, band)
		}
		r, _ := p.RunOne(j, 2, pt)
		if nominal := r.PerGram(); nominal < band.P10 || nominal > band.P90 {
			t.Errorf("%s: nominal %.3f outside P10–P90 %.3f–%.3f", band.Method, nominal, band.P10, band.P90)
		}
	}
	if math.Abs(share-1) > 1e-9 {
		t.Errorf("cheapest shares sum to %g", share)
	}
}

// Drawn shares stay inside (0, 1), temperatures and the site's equipment
// are not drawn, shared quantities take one draw for every method.
func TestDrawnCoefficientsStayPhysical(t *testing.T) {
	t.Parallel()
	p, pt := plan(t, templates.Liquid)
	d := newDesign(p, pt, usedPrices(p, pt, p.Scenario.TargetKg))
	r := ledger.NewRates(pt)
	x := make([]float64, len(d.inputs))
	for k := 0; k < 300; k++ {
		d.sample(rand.New(rand.NewPCG(3, uint64(k))), x)
		q, _ := d.apply(p, r, x)
		for i := range p.Coef.Len() {
			orig, co := p.Coef.At(i), q.Coef.At(i)
			if (orig.Dim == units.Temperature || NotDrawn(orig) != "") && co.SI != orig.SI {
				t.Fatalf("%s: drawn although %q", orig.Key, NotDrawn(orig))
			}
			if orig.Dim == units.None && orig.SI > 0 && orig.SI < 1 && !(co.SI > 0 && co.SI < 1) {
				t.Fatalf("%s: share %g drawn to %g", orig.Key, orig.SI, co.SI)
			}
			if math.IsNaN(co.SI) || math.IsInf(co.SI, 0) || !orig.InRange(co.SI) {
				t.Fatalf("%s: %g (range %g to %g)", orig.Key, co.SI, orig.Lo, orig.Hi)
			}
		}
		// One chiller: the same factor for every method that has one.
		f1 := q.Coef.Get("crystallization.chiller_cop") / p.Coef.Get("crystallization.chiller_cop")
		f2 := q.Coef.Get("distillation.chiller_cop") / p.Coef.Get("distillation.chiller_cop")
		if math.Abs(f1-f2) > 1e-12 || f1 == 1 {
			t.Fatalf("chiller drawn %g and %g", f1, f2)
		}
	}
	if c := p.Coef.Of("crystallization.flask_03"); NotDrawn(c) == "" {
		t.Errorf("a flask size is drawn")
	}
}

// Rectangular draws between limits a ± h have mean a and variance h²/3
// (JCGM 100:2008 §4.3.7); the log-normal factor exp(σz) has mean
// exp(σ²/2) (Aitchison, J.; Brown, J. A. C. The Lognormal Distribution,
// 1957 — from memory; it follows from the normal moment generating
// function); the loading rule is drawn with its stated weights.
func TestDrawsMatchTheirMoments(t *testing.T) {
	t.Parallel()
	p, pt := plan(t, templates.Scenario)
	d := newDesign(p, pt, usedPrices(p, pt, p.Scenario.TargetKg))
	n := 20000
	x := make([]float64, len(d.inputs))
	sum := make([]float64, len(d.inputs))
	sq := make([]float64, len(d.inputs))
	for k := 0; k < n; k++ {
		d.sample(rand.New(rand.NewPCG(9, uint64(k))), x)
		for i, v := range x {
			sum[i] += v
			sq[i] += v * v
		}
	}
	checked := map[InputKind]bool{}
	for i, in := range d.inputs {
		mean := sum[i] / float64(n)
		vr := sq[i]/float64(n) - mean*mean
		switch {
		case in.Kind == KindPrice:
			h := in.Hi/in.Nominal - 1
			if math.Abs(mean-1) > 0.01 || math.Abs(vr-h*h/3)/(h*h/3) > 0.05 {
				t.Errorf("%s: mean %g var %g, want 1 and %g", in.Name, mean, vr, h*h/3)
			}
		case in.Kind == KindMeasured:
			m := p.Scenario.Measured[position(d.measured, i)]
			a, h := m.Range.Nominal, m.Range.Half
			if math.Abs(mean-a) > 0.02*h || math.Abs(vr-h*h/3)/(h*h/3) > 0.05 {
				t.Errorf("%s: mean %g var %g, want %g and %g", in.Name, mean, vr, a, h*h/3)
			}
		case in.Kind == KindModelForm:
			if w := RuleWeights[scenario.RuleTable]; math.Abs(mean-w) > 0.015 {
				t.Errorf("share of Still's table %g, want %g", mean, w)
			}
		case in.Kind == KindCoefficient:
			sigma := Spread[source.Mark(strings.TrimSuffix(strings.TrimPrefix(in.Basis, "spread by how sure the value is ("), ")"))]
			if want := math.Exp(sigma * sigma / 2); math.Abs(mean-want) > 0.01 {
				t.Errorf("%s: mean factor %g, want %g", in.Name, mean, want)
			}
		}
		checked[in.Kind] = true
	}
	for _, k := range []InputKind{KindPrice, KindMeasured, KindModelForm, KindCoefficient} {
		if !checked[k] {
			t.Errorf("the demo has no input of kind %s", k)
		}
	}
}

func position(v []int, x int) int {
	for i, y := range v {
		if y == x {
			return i
		}
	}
	return -1
}

// Bands across the masses: ordered, the cheapest shares at each mass sum
// to one, and the same seed gives the same numbers on one core or two.
func TestSampleAcrossReproducible(t *testing.T) {
	p, pt := plan(t, templates.Scenario)
	masses, _ := LogSpace(1e-3, 5, 8)
	a, err := SampleAcross(p, pt, 0.25, masses, 150, 5, nil)
	if err != nil {
		t.Fatal(err)
	}
	old := runtime.GOMAXPROCS(1)
	b, err := SampleAcross(p, pt, 0.25, masses, 150, 5, nil)
	runtime.GOMAXPROCS(old)
	if err != nil {
		t.Fatal(err)
	}
	if len(a.Across) != len(masses) || len(a.Worth) != len(b.Worth) || a.EVPI != b.EVPI {
		t.Fatalf("runs differ: %d masses, worth %d vs %d, EVPI %g vs %g", len(a.Across), len(a.Worth), len(b.Worth), a.EVPI, b.EVPI)
	}
	for m, mb := range a.Across {
		share := 0.0
		for j, band := range mb.Bands {
			if o := b.Across[m].Bands[j]; o.P50 != band.P50 && !(math.IsNaN(o.P50) && math.IsNaN(band.P50)) {
				t.Errorf("%g kg %s: P50 %g vs %g", mb.Kg, band.Method, band.P50, o.P50)
			}
			share += band.Cheapest
			if band.Feasible > 0 && !(band.P10 <= band.P50 && band.P50 <= band.P90) {
				t.Errorf("%g kg %s: out of order %+v", mb.Kg, band.Method, band)
			}
		}
		if math.Abs(share-1) > 1e-9 {
			t.Errorf("%g kg: cheapest shares sum to %g", mb.Kg, share)
		}
	}
	for _, c := range a.Crossings {
		if !(c.P10 <= c.P50 && c.P50 <= c.P90 && c.P10 >= masses[0] && c.P90 <= masses[len(masses)-1] && c.Share > 0 && c.Share <= 1) {
			t.Errorf("crossing %+v", c)
		}
	}
	// At 250 g the demo's two methods are close (the crossover lies near
	// there), so the choice is worth something to know.
	if a.EVPI <= 0 || len(a.Worth) == 0 {
		t.Errorf("no value of information at 250 g: EVPI %g, %d inputs", a.EVPI, len(a.Worth))
	}
	for k, w := range a.Worth {
		if w != b.Worth[k] {
			t.Errorf("worth %d: %+v on two cores, %+v on one", k, w, b.Worth[k])
		}
	}
	for k, s := range a.Sensitivity {
		if s.Input != b.Sensitivity[k].Input {
			t.Errorf("sensitivity rank %d: input %d vs %d", k, s.Input, b.Sensitivity[k].Input)
		}
	}
	for _, w := range a.Worth {
		if !(w.Value > 0 && w.Value <= a.EVPI+1e-9) {
			t.Errorf("%s worth %g, EVPI %g", a.Inputs[w.Input].Name, w.Value, a.EVPI)
		}
	}
}

// Thin keeps the ends and spreads the rest evenly: 0..9 thinned to 4 is
// 0, 3, 6, 9 (positions k·9/3, hand computation).
func TestThin(t *testing.T) {
	t.Parallel()
	v := []float64{0, 1, 2, 3, 4, 5, 6, 7, 8, 9}
	got := Thin(v, 4)
	if len(got) != 4 || got[0] != 0 || got[1] != 3 || got[2] != 6 || got[3] != 9 {
		t.Errorf("Thin = %v", got)
	}
	if len(Thin(v, 20)) != 10 {
		t.Error("Thin must keep a short list whole")
	}
}
