package scale

import (
	"math"
	"math/rand/v2"
	"testing"
)

// unitNormalLoss is L(z) = φ(z) − z(1 − Φ(z)), the unit normal linear loss
// integral (Raiffa, H.; Schlaifer, R. Applied Statistical Decision Theory,
// Harvard, 1961, the table of the unit-normal loss integral — from memory).
func unitNormalLoss(z float64) float64 {
	phi := math.Exp(-z*z/2) / math.Sqrt(2*math.Pi)
	return phi - z*0.5*math.Erfc(z/math.Sqrt2)
}

// Two actions whose difference in net benefit is normal with mean μ and
// standard deviation σ: EVPI = σ·L(|μ|/σ) (Raiffa and Schlaifer 1961). With
// NB₁ = X + Z, NB₂ = 0, X ~ N(1, 2²), Z ~ N(0, 2²):
//
//	EVPI     = √8 · L(1/√8) = 0.6982   (all inputs known)
//	EVPPI(X) = 2 · L(1/2)   = 0.3956   (E[NB₁ | X] = X)
//	EVPPI(Y) = 0                        (an input the benefit ignores)
//
// (hand computation of the closed form; L(0.5) = 0.19780). The one-level
// estimator of Strong and Oakley (2013) must recover them from one set of
// draws.
func TestEVPIClosedForm(t *testing.T) {
	t.Parallel()
	if got := unitNormalLoss(0.5); math.Abs(got-0.19780) > 5e-5 {
		t.Fatalf("L(0.5) = %g", got)
	}
	const n = 40000
	rng := rand.New(rand.NewPCG(11, 12))
	xs, ys := make([]float64, n), make([]float64, n)
	nb := make([][]float64, n)
	for k := range nb {
		x, z := 1+2*rng.NormFloat64(), 2*rng.NormFloat64()
		xs[k], ys[k] = x, rng.Float64()
		nb[k] = []float64{x + z, 0}
	}
	wantAll := math.Sqrt(8) * unitNormalLoss(1/math.Sqrt(8))
	wantX := 2 * unitNormalLoss(0.5)
	if got := evpi(nb); math.Abs(got-wantAll) > 0.04*wantAll {
		t.Errorf("EVPI %g, closed form %g", got, wantAll)
	}
	if got := evppi(xs, nb); math.Abs(got-wantX) > 0.06*wantX {
		t.Errorf("EVPPI(X) %g, closed form %g", got, wantX)
	}
	if got := evppi(ys, nb); got > 0.05*wantX {
		t.Errorf("EVPPI of an irrelevant input %g, want about 0", got)
	}
}

// A discrete input is binned by value: two alternatives with NB₁ = +1 or −1
// (equally likely) and NB₂ = 0 are worth E[max] − max E = 0.5 − 0 = 0.5
// when known (hand computation).
func TestEVPPIDiscrete(t *testing.T) {
	t.Parallel()
	var xs []float64
	var nb [][]float64
	for k := 0; k < 1000; k++ {
		v := float64(k % 2)
		xs = append(xs, v)
		nb = append(nb, []float64{2*v - 1, 0})
	}
	if got := evppi(xs, nb); math.Abs(got-0.5) > 1e-12 {
		t.Errorf("EVPPI %g, want 0.5", got)
	}
}

// Spearman's rank correlation on the textbook example of IQ against hours
// of television a week (ten people): Σd² = 194, ρ = 1 − 6·194/(10·99) =
// −29/165 = −0.1758 (Wikipedia, "Spearman's rank correlation coefficient",
// worked example — from memory; hand computation agrees). A monotone
// transform gives 1, a reversal −1, ties take their mean rank.
func TestSpearman(t *testing.T) {
	t.Parallel()
	iq := []float64{106, 100, 86, 101, 99, 103, 97, 113, 112, 110}
	tv := []float64{7, 27, 2, 50, 28, 29, 20, 12, 6, 17}
	if got := spearman(iq, tv); math.Abs(got-(-29.0/165)) > 1e-12 {
		t.Errorf("ρ = %g, want %g", got, -29.0/165)
	}
	x := []float64{1, 2, 3, 4, 5}
	if got := spearman(x, []float64{1, 8, 27, 64, 125}); math.Abs(got-1) > 1e-12 {
		t.Errorf("monotone: %g", got)
	}
	if got := spearman(x, []float64{5, 4, 3, 2, 1}); math.Abs(got+1) > 1e-12 {
		t.Errorf("reversed: %g", got)
	}
	if r := ranks([]float64{10, 20, 20, 30}); r[1] != 2.5 || r[2] != 2.5 || r[3] != 4 {
		t.Errorf("ties: %v", r)
	}
	if got := spearman(x, []float64{1, math.NaN(), 3, 4, 5}); math.Abs(got-1) > 1e-12 {
		t.Errorf("a NaN pair is left out: %g", got)
	}
}
