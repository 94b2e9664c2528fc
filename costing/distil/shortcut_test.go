package distil

import (
	"math"
	"testing"
)

// McCabe, W. L.; Smith, J. C.; Harriott, P. Unit Operations of Chemical
// Engineering (5th–7th ed., ch. 21 "Distillation"), the worked example of a
// continuous column separating benzene and toluene: feed 40 %, overhead
// 97 % benzene, bottoms 98 % toluene (by weight), reflux ratio 3.5, "an
// ideal system with a relative volatility of about 2.5", feed liquid at its
// boiling point. All from memory, not re-checked against the book:
//   - mole fractions x_F = 0.44, x_D = 0.974, x_B = 0.0235;
//   - minimum reflux read from the equilibrium curve, about 1.45;
//   - 11 ideal plates plus the reboiler, 12 equilibrium stages, at R = 3.5
//     by McCabe–Thiele.
//
// Molar masses: benzene C6H6 78.11, toluene C7H8 92.14 g/mol (IUPAC
// standard atomic weights).
func TestBenzeneTolueneShortcut(t *testing.T) {
	t.Parallel()
	const alpha, mB, mT = 2.5, 78.11, 92.14
	xF, xD, xB := MoleFraction(0.40, mB, mT), MoleFraction(0.97, mB, mT), MoleFraction(0.02, mB, mT)
	// The book's mole fractions to its three figures.
	for _, c := range []struct{ got, want, tol float64 }{{xF, 0.44, 0.0005}, {xD, 0.974, 0.0005}, {xB, 0.0235, 0.00005}} {
		if math.Abs(c.got-c.want) > c.tol {
			t.Errorf("mole fraction %.5f, book %v", c.got, c.want)
		}
	}
	// Underwood at constant α = 2.5 against the book's graphical minimum
	// reflux of about 1.45: 5 % (α varies from about 2.4 to 2.6 along the
	// real curve, which the book reads directly).
	rMin := UnderwoodMinReflux(xF, xD, alpha)
	if e := relErr(rMin, 1.45); e > 0.05 {
		t.Errorf("R_min = %.3f, book about 1.45 (%.1f %% off)", rMin, e*100)
	}
	// Underwood's binary form equals the pinch at the feed (McCabe–Thiele
	// construction): R_min = (x_D − y_F)/(y_F − x_F).
	yF := EquilibriumVapour(xF, alpha)
	if e := relErr(rMin, (xD-yF)/(yF-xF)); e > 1e-12 {
		t.Errorf("Underwood %.6f differs from the feed pinch %.6f", rMin, (xD-yF)/(yF-xF))
	}
	// Fenske: hand computation from the example's data,
	// ln[(0.9745/0.0255)(0.9765/0.0235)]/ln 2.5 = 8.04 stages incl. reboiler.
	nMin := Fenske(xD, xB, alpha)
	if math.Abs(nMin-8.04) > 0.01 {
		t.Errorf("N_min = %.3f, hand computation 8.04", nMin)
	}
	// Gilliland (Molokanov form) at R = 3.5 against the book's 12
	// equilibrium stages: 10 %, the correlation's scatter about Gilliland's
	// data (from memory).
	n := GillilandStages(nMin, 3.5, rMin)
	if e := relErr(n, 12); e > 0.10 {
		t.Errorf("N at R = 3.5: %.2f stages, book 12 (%.1f %% off)", n, e*100)
	}
	// And the inverse: the reflux the book's 12 stages need must come out
	// near its 3.5, within the same 10 % in N (about 20 % in R here).
	if r := GillilandReflux(nMin, 12, rMin); relErr(r, 3.5) > 0.2 {
		t.Errorf("reflux for 12 stages = %.2f, book uses 3.5", r)
	}
}

// The Gilliland correlation: Molokanov's form meets the limits exactly and
// agrees with Eduljee's fit of the same chart within 0.015 in Y for
// 0.05 ≤ X ≤ 1 (both fit Gilliland's curve to a few hundredths, from
// memory; Eduljee's fit is not meant for X → 0, where it gives 0.75).
// Stages and reflux are inverses of each other.
func TestGilliland(t *testing.T) {
	t.Parallel()
	if GillilandMolokanov(0) != 1 || GillilandMolokanov(1) != 0 {
		t.Errorf("limits: Y(0) = %v, Y(1) = %v; want 1 and 0", GillilandMolokanov(0), GillilandMolokanov(1))
	}
	prev := 1.0
	for X := 0.05; X <= 1.0001; X += 0.05 {
		m, e := GillilandMolokanov(X), GillilandEduljee(X)
		if math.Abs(m-e) > 0.015 {
			t.Errorf("X = %.2f: Molokanov %.4f, Eduljee %.4f", X, m, e)
		}
		if m > prev {
			t.Errorf("Y must fall as X rises: %.4f at X = %.2f", m, X)
		}
		prev = m
	}
	// Eduljee 1975 at X = 0.5: 0.75(1 − 0.5^0.5668) = 0.2437 (arithmetic of
	// the published form).
	if got := GillilandEduljee(0.5); math.Abs(got-0.75*(1-math.Pow(0.5, 0.5668))) > 1e-12 {
		t.Errorf("Eduljee(0.5) = %v", got)
	}
	for _, c := range []struct{ nMin, rMin, R float64 }{{8.04, 1.40, 3.5}, {3, 0.5, 0.6}, {12, 4, 20}} {
		N := GillilandStages(c.nMin, c.R, c.rMin)
		if back := GillilandReflux(c.nMin, N, c.rMin); relErr(back, c.R) > 1e-6 {
			t.Errorf("reflux for %.3f stages = %.6f, want %.6f", N, back, c.R)
		}
		if eq := EquivalentStages(N, c.R, c.rMin); math.Abs(eq-c.nMin) > 1e-9 && c.nMin >= 1 {
			t.Errorf("equivalent stages of %.3f at R = %v: %.6f, want N_min %v", N, c.R, eq, c.nMin)
		}
	}
	if !math.IsInf(GillilandStages(5, 1, 1), 1) || !math.IsInf(GillilandReflux(5, 5, 1), 1) {
		t.Error("at minimum reflux the stages, and at N_min stages the reflux, must be infinite")
	}
}

// Fenske and Underwood refuse compositions outside their range (NaN, not a
// made-up number), and α^N_min carries x_B to x_D: the total-reflux identity
// x_D/(1−x_D) = α^N_min · x_B/(1−x_B).
func TestFenskeIdentityAndRange(t *testing.T) {
	t.Parallel()
	n := Fenske(0.95, 0.05, 2.5)
	// Hand computation: ln(19 × 19)/ln 2.5 = 5.8889/0.91629 = 6.4269.
	if math.Abs(n-6.4269) > 0.0001 {
		t.Errorf("Fenske(0.95, 0.05, 2.5) = %.4f, want 6.4269", n)
	}
	if got := math.Pow(2.5, n) * 0.05 / 0.95; math.Abs(got-0.95/0.05) > 1e-9 {
		t.Errorf("identity fails: %v", got)
	}
	for _, bad := range [][3]float64{{0.5, 0.6, 2}, {1, 0.1, 2}, {0.9, 0, 2}, {0.9, 0.1, 1}} {
		if v := Fenske(bad[0], bad[1], bad[2]); !math.IsNaN(v) {
			t.Errorf("Fenske%v = %v, want NaN", bad, v)
		}
	}
	if v := UnderwoodMinReflux(0, 0.9, 2); !math.IsNaN(v) {
		t.Errorf("Underwood at x_F = 0 = %v, want NaN", v)
	}
}
