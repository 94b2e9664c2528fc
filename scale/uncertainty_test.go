package scale

import (
	"math"
	"math/rand/v2"
	"runtime"
	"testing"

	"sepcost/costing/units"
	"sepcost/templates"
)

// Sample quantiles by the spreadsheet PERCENTILE rule (Hyndman, R. J.; Fan,
// Y. "Sample quantiles in statistical packages", Am. Stat. 1996, 50, 361,
// definition 7): for 1..10, P10 = 1.9, P50 = 5.5, P90 = 9.1 (hand
// computation: h = q·(n − 1)).
func TestQuantile(t *testing.T) {
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

// Drawn shares stay inside (0, 1) and temperatures are not drawn.
func TestDrawnCoefficientsStayPhysical(t *testing.T) {
	p, _ := plan(t, templates.Liquid)
	for d := 0; d < 300; d++ {
		c := drawCoefficients(p.Coef, rand.New(rand.NewPCG(3, uint64(d))))
		for k, co := range c {
			orig := p.Coef[k]
			if orig.Dim == units.Temperature && co.SI != orig.SI {
				t.Fatalf("%s: a temperature was drawn", k)
			}
			if orig.Dim == units.None && orig.SI > 0 && orig.SI < 1 && !(co.SI > 0 && co.SI < 1) {
				t.Fatalf("%s: share %g drawn to %g", k, orig.SI, co.SI)
			}
			if math.IsNaN(co.SI) || math.IsInf(co.SI, 0) {
				t.Fatalf("%s: %g", k, co.SI)
			}
		}
	}
}
