package chrom

import (
	"bytes"
	"math"
	"math/rand"
	"testing"
	"time"

	"sepcost/costing/scenario"
	"sepcost/templates"
)

// cutForPlain is the cut search written the plain way, every share
// computed afresh from the Band (a mirrored band rebuilt at each call):
// the oracle CutFor, which keeps what it has computed, must equal to the
// last bit.
func cutForPlain(p, imp Band, first bool, target float64) Cut {
	if !first {
		p, imp = p.mirror(), imp.mirror()
	}
	purity := func(x float64) (float64, float64) { return purityPlain(p, x, imp.Kg*sharePlain(imp, x)) }
	reaches := func(x float64) bool {
		im := imp.Kg * sharePlain(imp, x)
		if im > 0 && p.Kg/(p.Kg+im) < target-1e-9 {
			return false
		}
		pu, _ := purityPlain(p, x, im)
		return pu >= target
	}
	lo, hi := p.Front-6*p.Kinetic, p.End+6*p.Kinetic
	const n = 48
	best := math.NaN()
	for i := n; i >= 0; i-- {
		x := lo + (hi-lo)*float64(i)/n
		if reaches(x) {
			best = x
			break
		}
	}
	if math.IsNaN(best) {
		return Cut{}
	}
	if best < hi {
		a, b := best, best+(hi-lo)/n
		for i := 0; i < 30; i++ {
			m := (a + b) / 2
			if reaches(m) {
				a = m
			} else {
				b = m
			}
		}
		best = a
	}
	pu, rec := purity(best)
	mixedImp := math.Max(sharePlain(imp, hi)-sharePlain(imp, best), 0)
	return Cut{Recovery: rec, Purity: pu, Mixed: 1 - rec, MixedImpurity: mixedImp, OK: rec > 0}
}

func purityPlain(p Band, x, im float64) (float64, float64) {
	ps := sharePlain(p, x)
	pr := p.Kg * ps
	if pr+im <= 0 {
		return 1, 0
	}
	return pr / (pr + im), ps
}

func sharePlain(b Band, x float64) float64 {
	if b.mirrored {
		return 1 - sharePlain(Band{Front: -b.End, End: -b.Front, Kinetic: b.Kinetic}, -x)
	}
	s, w := b.Kinetic, b.End-b.Front
	if w <= 1e-6*s {
		return phi(((x - b.End) / s))
	}
	g := func(t float64) float64 {
		P, d := phi(t), math.Exp(-t*t/2)/math.Sqrt(2*math.Pi)
		return (b.End-x)*(t*P+d) + s*((t*t-1)*P+t*d)/2
	}
	f := 2 * s / (w * w) * (g((x-b.Front)/s) - g((x-b.End)/s))
	return math.Min(math.Max(f, 0), 1)
}

// sameCut fails unless two cuts agree to the last bit.
func sameCut(t *testing.T, what string, got, want Cut) {
	t.Helper()
	bits := math.Float64bits
	if bits(got.Recovery) != bits(want.Recovery) || bits(got.Purity) != bits(want.Purity) || bits(got.Mixed) != bits(want.Mixed) ||
		bits(got.MixedImpurity) != bits(want.MixedImpurity) || got.OK != want.OK {
		t.Errorf("%s: cut %+v, the plain search gives %+v", what, got, want)
	}
}

// CutFor keeps the shares it has computed and prepares each band once; its
// cut is the plain search's to the last bit: on 4,000 random pairs of
// bands (Rf 0.05–0.9 apart by 0.01–0.3, loading factors 0–1.2, 5–5,000
// plates, purities 0.5–0.9999, either order) and on every loading of both
// demos' trade-off tables at the reference bed.
func TestCutForIsThePlainSearch(t *testing.T) {
	t.Parallel()
	rng := rand.New(rand.NewSource(1))
	for n := 0; n < 4000; n++ {
		rf := 0.05 + 0.85*rng.Float64()
		d := 0.01 + 0.29*rng.Float64()
		rfI := rf - d
		if rng.Intn(2) == 0 {
			rfI = rf + d
		}
		rfI = math.Min(math.Max(rfI, 0.02), 0.98)
		plates := 5 * math.Pow(1000, rng.Float64())
		pk := 0.5 + 0.49*rng.Float64()
		p := ComponentBand(rf, 1.2*rng.Float64(), plates, pk)
		i := ComponentBand(rfI, 1.2*rng.Float64(), plates, 1-pk)
		if rng.Intn(10) == 0 {
			i.End, i.Front = i.End+0.5, i.End+0.5 // no width: the normal band
		}
		target := 1 - math.Pow(10, -0.3-3.7*rng.Float64())
		first := rf > rfI
		sameCut(t, "random", CutFor(p, i, first, target), cutForPlain(p, i, first, target))
	}
	for _, name := range []string{"solid", "liquid"} {
		a := demoAnalysis(t, name)
		for _, r := range a.trade {
			s := a.sep
			alpha := s.Alpha()
			lt := a.qs * TouchingLoad(alpha, s.AmountRatio())
			l := 1 / r.ratio
			second := math.Pow(1-1/math.Sqrt(alpha), 2) * l / lt
			lfP, lfI := l*s.Product/a.qs, second
			if !a.first {
				lfP, lfI = second, l*s.Impurity/a.qs
			}
			p := ComponentBand(s.ProductRf, lfP, a.plates, s.Product)
			i := ComponentBand(s.ImpurityRf, lfI, a.plates, s.Impurity)
			sameCut(t, name, r.cut, cutForPlain(p, i, a.first, a.target))
		}
	}
}

// BenchmarkCutFor: one cut search on the solid demo's bands at the rule's
// loading.
func BenchmarkCutFor(b *testing.B) {
	p := ComponentBand(0.35, 0.3, 400, 0.85)
	i := ComponentBand(0.25, 0.2, 400, 0.1)
	b.ReportAllocs()
	for b.Loop() {
		CutFor(p, i, true, 0.98)
	}
}

// demoAnalysis is the analysis of a demo scenario ("solid" or "liquid").
func demoAnalysis(t *testing.T, name string) analysis {
	t.Helper()
	y := map[string][]byte{"solid": templates.Scenario, "liquid": templates.Liquid}[name]
	sc, err := scenario.Load(bytes.NewReader(y), name)
	if err != nil {
		t.Fatal(err)
	}
	if sc.Chromatography == nil {
		t.Fatalf("the %s demo has no chromatography", name)
	}
	return analyse(sc, testCoefficients())
}

// BenchmarkCutForOverPlain times CutFor and the plain search in turn on
// the same bands (paired, for a shared machine) and reports their ratio.
func BenchmarkCutForOverPlain(b *testing.B) {
	p := ComponentBand(0.35, 0.3, 400, 0.85)
	i := ComponentBand(0.25, 0.2, 400, 0.1)
	var fast, plain time.Duration
	for b.Loop() {
		t0 := time.Now()
		CutFor(p, i, true, 0.98)
		t1 := time.Now()
		cutForPlain(p, i, true, 0.98)
		fast += t1.Sub(t0)
		plain += time.Since(t1)
	}
	b.ReportMetric(float64(fast)/float64(plain), "ratio")
}
