package chrom

import (
	"math"
	"testing"
)

// The blurred triangle is a distribution: 0 far before its front, 1 far
// after its end, ½ at its mean when the kinetic part dominates, and its
// closed form agrees with a direct numerical convolution (Simpson's rule,
// 4000 intervals) to 1e-6. A mirrored band is the reflection.
func TestBlurredTriangle(t *testing.T) {
	t.Parallel()
	b := Band{Front: 2, End: 2.6, Kinetic: 0.1, Kg: 1}
	if f := b.share(1); f > 1e-9 {
		t.Errorf("F before the band = %g", f)
	}
	if f := b.share(4); math.Abs(f-1) > 1e-9 {
		t.Errorf("F after the band = %g", f)
	}
	direct := func(x float64) float64 {
		const n = 4000
		w := b.End - b.Front
		h := w / n
		sum := 0.0
		for i := 0; i <= n; i++ {
			y := b.Front + float64(i)*h
			f := 2 * (b.End - y) / (w * w) * phi((x-y)/b.Kinetic)
			switch {
			case i == 0 || i == n:
				sum += f
			case i%2 == 1:
				sum += 4 * f
			default:
				sum += 2 * f
			}
		}
		return sum * h / 3
	}
	for _, x := range []float64{1.8, 2, 2.1, 2.3, 2.6, 2.8} {
		if got, want := b.share(x), direct(x); math.Abs(got-want) > 1e-6 {
			t.Errorf("F(%g) = %.8f, numerical %.8f", x, got, want)
		}
		if got, want := b.mirror().share(-x), 1-b.share(x); math.Abs(got-want) > 1e-12 {
			t.Errorf("mirrored F(%g) = %g, want %g", -x, got, want)
		}
	}
	g := Band{Front: 3, End: 3, Kinetic: 0.2}
	if f := g.share(3); math.Abs(f-0.5) > 1e-12 {
		t.Errorf("a band of no width is normal: F(mean) = %g", f)
	}
	// Mean and variance of the right triangle: front + w/3 and w²/18.
	if m := b.Mean(); math.Abs(m-2.2) > 1e-12 {
		t.Errorf("mean %g, want 2.2", m)
	}
	if s := b.Sigma(); math.Abs(s*s-(0.01+0.36/18)) > 1e-12 {
		t.Errorf("variance %g", s*s)
	}
}

// The ideal overloaded band width of Golshan-Shirazi and Guiochon 1988
// (from memory): w = k(2√Lf − Lf); at Lf = 1 the band spans the whole
// retention, w = k; at Lf = 0.25, w = k·0.75.
func TestOverloadWidth(t *testing.T) {
	t.Parallel()
	if w := OverloadWidth(2, 1); math.Abs(w-2) > 1e-12 {
		t.Errorf("w(Lf=1) = %g", w)
	}
	if w := OverloadWidth(2, 0.25); math.Abs(w-1.5) > 1e-12 {
		t.Errorf("w(Lf=0.25) = %g", w)
	}
	if OverloadWidth(2, 4) != OverloadWidth(2, 1) {
		t.Error("Lf above 1 is capped")
	}
}

// tails gives Φ and φ as math.Erfc and math.Exp do, to the last bit, on
// a fine grid across and beyond its thresholds (the limits of the two
// library functions stated beside it).
func TestTailsAreTheCalls(t *testing.T) {
	t.Parallel()
	xs := []float64{}
	for _, th := range []float64{-40, 8.5, 40} {
		xs = append(xs, math.Nextafter(th, math.Inf(-1)), th, math.Nextafter(th, math.Inf(1)))
	}
	for k := -200000; k <= 200000; k++ {
		xs = append(xs, float64(k)/2000) // −100 to 100 in steps of 0.0005
	}
	for _, x := range xs {
		P, d := tails(x)
		wantP, wantD := phi(x), math.Exp(-x*x/2)/sqrt2Pi
		if math.Float64bits(P) != math.Float64bits(wantP) || math.Float64bits(d) != math.Float64bits(wantD) {
			t.Fatalf("t = %v: tails %v %v, calls %v %v", x, P, d, wantP, wantD)
		}
	}
}
