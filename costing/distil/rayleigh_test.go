package distil

import (
	"math"
	"testing"
)

// rayleighNumeric integrates ln(W0/W) = ∫_x^x0 dx/(y − x) by Simpson's rule
// on n intervals, with y from the constant-α equilibrium; an independent
// route to the closed form.
func rayleighNumeric(x0, x, alpha float64, n int) float64 {
	f := func(v float64) float64 { return 1 / (EquilibriumVapour(v, alpha) - v) }
	h := (x0 - x) / float64(n)
	s := f(x) + f(x0)
	for i := 1; i < n; i++ {
		w := 4.0
		if i%2 == 0 {
			w = 2
		}
		s += w * f(x+float64(i)*h)
	}
	return s * h / 3
}

// The closed form of the Rayleigh equation against numeric integration of
// dx/(y − x) (Simpson, 20 000 intervals: error far below 1e-8), and against
// a case worked by hand: α = 2, x0 = 0.5, x = 0.25 gives
// W/W0 = (x/x0)·((1 − x0)/(1 − x))² = 0.5 · (0.5/0.75)² = 2/9 (Source:
// hand computation from Rayleigh 1902's equation at constant α).
func TestRayleigh(t *testing.T) {
	t.Parallel()
	if got := RayleighRatio(0.5, 0.25, 2); math.Abs(got-2.0/9) > 1e-12 {
		t.Errorf("W/W0 = %.12f, want 2/9", got)
	}
	for _, c := range []struct{ x0, x, alpha float64 }{
		{0.5, 0.25, 2}, {0.44, 0.05, 2.5}, {0.9, 0.6, 1.3}, {0.15, 0.001, 8}, {0.7, 0.69, 1.05},
	} {
		closed := -math.Log(RayleighRatio(c.x0, c.x, c.alpha))
		num := rayleighNumeric(c.x0, c.x, c.alpha, 20000)
		if math.Abs(closed-num) > 1e-8*math.Max(1, num) {
			t.Errorf("x0 %v → x %v, α %v: closed form %.10f, numeric %.10f", c.x0, c.x, c.alpha, closed, num)
		}
		// The inverse returns the composition.
		f := RayleighRatio(c.x0, c.x, c.alpha)
		if back := RayleighComposition(c.x0, f, c.alpha); relErr(back, c.x) > 1e-9 {
			t.Errorf("RayleighComposition(%v, %v, %v) = %v, want %v", c.x0, f, c.alpha, back, c.x)
		}
		// The distillate is richer than the charge, the pot poorer.
		if d := CutComposition(c.x0, c.x, f); !(d > c.x0 && d < 1) {
			t.Errorf("cut composition %v not between x0 %v and 1", d, c.x0)
		}
	}
	for _, bad := range [][3]float64{{0.5, 0.6, 2}, {0.5, 0, 2}, {0.5, 0.2, 1}} {
		if v := RayleighRatio(bad[0], bad[1], bad[2]); !math.IsNaN(v) {
			t.Errorf("RayleighRatio%v = %v, want NaN", bad, v)
		}
	}
}

// The batch closes its mass balances (total and light moles) in both
// modes, meets the purity target, and keeps the minimum residue.
func TestBatchBalances(t *testing.T) {
	t.Parallel()
	cases := []Batch{
		{X0: 0.8, AlphaEq: 30, ProductLight: true, Target: 0.98, Forerun: 0.03, Holdup: 0.02, MinResidue: 0.05},
		{X0: 0.8, AlphaEq: 2.5, ProductLight: true, Target: 0.9, Forerun: 0.03, Holdup: 0.01, MinResidue: 0.05},
		{X0: 0.15, AlphaEq: 4, ProductLight: false, Target: 0.01, Holdup: 0.02, MinResidue: 0.05},
		{X0: 0.8, AlphaEq: 1e6, ProductLight: true, Target: 0.99, Forerun: 0.03, Holdup: 0.02, MinResidue: 0.05},
	}
	for i, b := range cases {
		r := BatchRun(b)
		if !r.Reachable {
			t.Errorf("case %d: not reachable", i)
			continue
		}
		n := r.Forerun.N + r.Heart.N + r.Pot.N + r.Holdup.N
		l := r.Forerun.Light + r.Heart.Light + r.Pot.Light + r.Holdup.Light
		if math.Abs(n-1) > 1e-9 || math.Abs(l-b.X0) > 1e-9 {
			t.Errorf("case %d: balance %v mol, %v light (want 1 and %v)", i, n, l, b.X0)
		}
		if r.Pot.N < b.MinResidue*(1-1e-9) {
			t.Errorf("case %d: pot left at %v, below the minimum residue %v", i, r.Pot.N, b.MinResidue)
		}
		if b.ProductLight && r.Heart.X() < b.Target-1e-9 {
			t.Errorf("case %d: heart cut %.5f below target %.5f", i, r.Heart.X(), b.Target)
		}
		if !b.ProductLight && r.Pot.X() > b.Target+1e-9 {
			t.Errorf("case %d: pot %.5f above the allowed %.5f", i, r.Pot.X(), b.Target)
		}
	}
	// A first distillate below the target: unreachable.
	if r := BatchRun(Batch{X0: 0.8, AlphaEq: 2, ProductLight: true, Target: 0.95, Forerun: 0.03, MinResidue: 0.05}); r.Reachable {
		t.Errorf("y(0.8) at α = 2 is 0.889 < 0.95: must be unreachable")
	}
}
