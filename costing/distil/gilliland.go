package distil

import "math"

// GillilandMolokanov is the Gilliland correlation in the analytical form of
// Molokanov et al.:
//
//	Y = 1 − exp[ ((1 + 54.4 X)/(11 + 117.2 X)) · ((X − 1)/√X) ]
//	X = (R − R_min)/(R + 1),   Y = (N − N_min)/(N + 1)
//
// R reflux ratio, N equilibrium stages including the pot (reboiler), both
// at the same separation as the minima. It meets the correlation's limits
// exactly: Y → 1 as X → 0 (minimum reflux, infinite stages) and Y = 0 at
// X = 1 (total reflux). Source: Molokanov, Yu. K.; Korablina, T. P.;
// Mazurina, N. I.; Nikiforov, G. A. Int. Chem. Eng. 1972, 12, 209 (from
// memory); after Gilliland, E. R. Ind. Eng. Chem. 1940, 32, 1220 (from
// memory). The correlation scatters about ±10 % in N around Gilliland's
// chart data (from memory). X is clamped to [0, 1].
func GillilandMolokanov(X float64) float64 {
	switch {
	case !(X > 0):
		return 1
	case X >= 1:
		return 0
	}
	return 1 - math.Exp((1+54.4*X)/(11+117.2*X)*(X-1)/math.Sqrt(X))
}

// GillilandEduljee is Eduljee's fit of the Gilliland correlation:
//
//	Y = 0.75 (1 − X^0.5668)
//
// (symbols as for GillilandMolokanov). It is not used by the model, whose
// limits at X → 0 need Molokanov's form (Eduljee gives Y = 0.75 there, not
// 1); it is kept as a cross-check. Source: Eduljee, H. E. Hydrocarbon
// Processing 1975, 54(9), 120 (from memory). X is clamped to [0, 1].
func GillilandEduljee(X float64) float64 {
	X = math.Max(0, math.Min(1, X))
	return 0.75 * (1 - math.Pow(X, 0.5668))
}

// GillilandStages is the number of equilibrium stages (including the pot)
// at reflux R, from Y = (N − N_min)/(N + 1):
//
//	N = (N_min + Y) / (1 − Y),   Y = GillilandMolokanov((R − R_min)/(R + 1))
//
// +Inf at or below the minimum reflux.
func GillilandStages(nMin, R, rMin float64) float64 {
	Y := GillilandMolokanov((R - rMin) / (R + 1))
	if Y >= 1 {
		return math.Inf(1)
	}
	return (nMin + Y) / (1 - Y)
}

// GillilandReflux is the reflux ratio that a column of N equilibrium stages
// (including the pot) needs for a separation with minima N_min and R_min:
// Y = (N − N_min)/(N + 1), X solved from GillilandMolokanov(X) = Y (it falls
// monotonically in X), and
//
//	R = (X + R_min) / (1 − X)
//
// +Inf when N ≤ N_min (no finite reflux suffices).
func GillilandReflux(nMin, N, rMin float64) float64 {
	Y := (N - nMin) / (N + 1)
	if !(Y > 0) {
		return math.Inf(1)
	}
	lo, hi := 0.0, 1.0
	for i := 0; i < 200; i++ {
		mid := (lo + hi) / 2
		if GillilandMolokanov(mid) > Y {
			lo = mid
		} else {
			hi = mid
		}
	}
	X := (lo + hi) / 2
	return (X + rMin) / (1 - X)
}

// EquivalentStages is the number of equilibrium stages that would make, at
// total reflux, the separation that N stages (including the pot) make at
// reflux R with minimum reflux R_min — Gilliland's relation solved for N_min:
//
//	N_eq = N − Y (N + 1),   Y = GillilandMolokanov((R − R_min)/(R + 1))
//
// It is never below 1: the pot alone is one equilibrium stage. This is the
// project's way of carrying a column at finite reflux into the Rayleigh
// equation (α_eq = α^N_eq; see the package comment); an approximation, not
// a published method.
func EquivalentStages(N, R, rMin float64) float64 {
	Y := GillilandMolokanov((R - rMin) / (R + 1))
	return math.Max(1, N-Y*(N+1))
}
