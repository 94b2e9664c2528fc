package distil

import "math"

// RayleighRatio is the fraction W/W0 of a batch left in the pot of a simple
// (differential) distillation when the pot's light-component mole fraction
// has fallen from x0 to x, at constant relative volatility α:
//
//	ln(W0/W) = ∫_x^x0 dx/(y − x)
//	         = [ ln(x0/x) + α ln((1 − x)/(1 − x0)) ] / (α − 1)
//
// W0, W moles in the pot at the start and now; y = αx/(1 + (α − 1)x) the
// vapour leaving it. Valid for 0 < x ≤ x0 < 1 and α > 1; NaN otherwise.
// Source: Rayleigh, Lord (J. W. Strutt). "On the distillation of binary
// mixtures", Phil. Mag. 1902, 4, 521–537 (from memory); constant-α closed
// form as given in the project's reference notes and in McCabe, Smith &
// Harriott, Unit Operations of Chemical Engineering (from memory).
func RayleighRatio(x0, x, alpha float64) float64 {
	if !(x > 0 && x <= x0 && x0 < 1 && alpha > 1) {
		return math.NaN()
	}
	return math.Exp(-(math.Log(x0/x) + alpha*math.Log((1-x)/(1-x0))) / (alpha - 1))
}

// RayleighComposition inverts RayleighRatio: the pot's light mole fraction
// x when the fraction f = W/W0 of the batch is left (0 < f ≤ 1). W/W0 falls
// monotonically as x falls, so x is found by bisection on ln x. NaN outside
// the valid range.
func RayleighComposition(x0, f, alpha float64) float64 {
	if !(f > 0 && f <= 1 && x0 > 0 && x0 < 1 && alpha > 1) {
		return math.NaN()
	}
	if f == 1 {
		return x0
	}
	lo, hi := math.Log(1e-300), math.Log(x0)
	for i := 0; i < 100 && hi-lo > bisectTol; i++ {
		mid := (lo + hi) / 2
		if RayleighRatio(x0, math.Exp(mid), alpha) > f {
			hi = mid
		} else {
			lo = mid
		}
	}
	return math.Exp((lo + hi) / 2)
}

// bisectTol ends a bisection on ln x: a width of 1e-12 in ln x is a
// relative precision of 1e-12 in x (about 50 halvings of the 690-wide start
// interval; the loops also stop after 100, as the spacing of float64 near
// ln 1e-300 is itself about 1e-13).
const bisectTol = 1e-12

// CutComposition is the light mole fraction of everything distilled while
// the pot goes from W0 at x0 to W = f·W0 at x (mass balance on the light
// component):
//
//	x̄_D = (x0 − f x) / (1 − f)
func CutComposition(x0, x, f float64) float64 { return (x0 - f*x) / (1 - f) }
