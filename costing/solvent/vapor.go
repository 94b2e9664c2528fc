package solvent

import (
	"math"

	"sepcost/costing/source"
)

// R is the molar gas constant in J/(mol·K).
//
// Source: CODATA 2018 recommended values (Tiesinga et al., Rev. Mod. Phys.
// 2021, 93, 025010); exact since the 2019 SI redefinition, R = N_A·k.
const R = 8.314462618

// StandardPressure is one standard atmosphere, the pressure at which the
// normal boiling point is defined, in Pa (exact by definition).
const StandardPressure = 101325.0

// TroutonEntropy is the entropy of vaporization at the normal boiling point
// that Trouton's rule assumes, in J/(mol·K).
//
// Source: Trouton, F. "On molecular latent heat", Philos. Mag. 1884, 18,
// 54–57 (from memory). Non-associating liquids lie at about 85–88
// J/(mol·K) (textbook range, e.g. Atkins, Physical Chemistry, from memory),
// so the rule is good to about ±10 %; hydrogen-bonded liquids (water 109,
// alcohols about 110–125) and very low boilers lie outside it.
const TroutonEntropy = 88.0

// Antoine is one set of Antoine constants in the NIST WebBook form
//
//	log₁₀(P/bar) = A − B/(T/K + C)
//
// valid for Tmin ≤ T ≤ Tmax (K). B is in K, C in K; A is a plain number.
// Source: Antoine, C. Compt. Rend. 1888, 107, 681 (equation form, from
// memory); constants from the table named in Source.
type Antoine struct {
	A, B, C    float64
	Tmin, Tmax float64
	Source     string
	Mark       source.Mark
}

// Holds reports whether T (K) lies in the set's valid range.
func (a Antoine) Holds(T float64) bool { return T >= a.Tmin && T <= a.Tmax }

// Pressure is the vapour pressure in Pa at T (K), with no range check:
//
//	P = 10^(A − B/(T + C)) · 10⁵ Pa/bar
//
// It is NaN where T + C ≤ 0, below the pole of the equation.
func (a Antoine) Pressure(T float64) float64 {
	if !(T+a.C > 0) {
		return math.NaN()
	}
	return math.Pow(10, a.A-a.B/(T+a.C)) * 1e5
}

// Temperature inverts Pressure in closed form, in K at p (Pa):
//
//	T = B/(A − log₁₀(p/10⁵ Pa)) − C
//
// It is NaN for p ≤ 0 and for p ≥ 10^A bar, which the equation reaches only
// as T → ∞.
func (a Antoine) Temperature(p float64) float64 {
	if !(p > 0) {
		return math.NaN()
	}
	d := a.A - math.Log10(p/1e5)
	if !(d > 0) {
		return math.NaN()
	}
	return a.B/d - a.C
}

// distance is how far T lies outside the valid range (0 inside it).
func (a Antoine) distance(T float64) float64 {
	switch {
	case T < a.Tmin:
		return a.Tmin - T
	case T > a.Tmax:
		return T - a.Tmax
	}
	return 0
}

// ClapeyronHVap is the enthalpy of vaporization in J/mol that the slope of
// an Antoine set implies at T (K), by the Clapeyron equation:
//
//	ΔHvap = ΔZ · R · ln10 · B · T²/(T + C)²
//
// where ΔZ = Z(vapour) − Z(liquid) is the compressibility difference (about
// 0.95–0.97 for organic liquids at their normal boiling point, from memory:
// Poling, Prausnitz & O'Connell, The Properties of Gases and Liquids, 5th
// ed., 2001, ch. 7). Valid only inside the set's range.
func ClapeyronHVap(a Antoine, T, deltaZ float64) float64 {
	x := T / (T + a.C)
	return deltaZ * R * math.Ln10 * a.B * x * x
}

// ClausiusClapeyron is the vapour pressure in Pa at T (K) of a liquid with
// normal boiling point Tb (K) and a constant enthalpy of vaporization hvap
// (J/mol):
//
//	P = 101325 Pa · exp(−(ΔHvap/R)·(1/T − 1/Tb))
//
// It assumes an ideal vapour, a negligible liquid volume and ΔHvap
// independent of T, so it is good to a few per cent within about 30 K of Tb
// and drifts further away. Clausius, R. Ann. Phys. 1850, 79, 368 and
// Clapeyron, É. J. École Polytech. 1834, 14, 153 (from memory); the
// integrated form is textbook material (e.g. Atkins, Physical Chemistry).
func ClausiusClapeyron(T, Tb, hvap float64) float64 {
	return StandardPressure * math.Exp(-(hvap/R)*(1/T-1/Tb))
}

// clausiusClapeyronT inverts ClausiusClapeyron: the temperature (K) at which
// the pressure is p (Pa),
//
//	1/T = 1/Tb − (R/ΔHvap)·ln(p/101325 Pa)
//
// NaN where p ≤ 0 or the right-hand side is not positive.
func clausiusClapeyronT(p, Tb, hvap float64) float64 {
	if !(p > 0) {
		return math.NaN()
	}
	inv := 1/Tb - (R/hvap)*math.Log(p/StandardPressure)
	if !(inv > 0) {
		return math.NaN()
	}
	return 1 / inv
}

// TroutonHVap estimates the enthalpy of vaporization at the normal boiling
// point in J/mol from Trouton's rule:
//
//	ΔHvap ≈ ΔSvap·Tb,  ΔSvap = 88 J/(mol·K)
//
// Use it only when no measured value exists; see TroutonEntropy for its
// accuracy (about ±10 % for non-associating liquids; it underestimates
// hydrogen-bonded ones by 15–25 %).
func TroutonHVap(Tb float64) float64 { return TroutonEntropy * Tb }

// VaporPressure is the vapour pressure in Pa at T (K).
//
// Antoine sets are listed in order of preference; the first whose range
// holds T is used and inRange is true. If none holds T, the set whose range
// lies nearest T is extrapolated and inRange is false. A solvent with no
// Antoine set falls back to ClausiusClapeyron from BoilingPoint and HVap,
// also with inRange false. T ≤ 0, or T below an extrapolated set's pole,
// gives NaN.
func (s Solvent) VaporPressure(T float64) (p float64, inRange bool) {
	if !(T > 0) || math.IsInf(T, 0) {
		return math.NaN(), false
	}
	if len(s.Antoine) == 0 {
		return ClausiusClapeyron(T, s.BoilingPoint.V, s.HVap.V), false
	}
	i, in := s.antoineFor(T)
	return s.Antoine[i].Pressure(T), in
}

// antoineFor picks the set for T: the first that holds it, else the nearest.
func (s Solvent) antoineFor(T float64) (int, bool) {
	for i, a := range s.Antoine {
		if a.Holds(T) {
			return i, true
		}
	}
	best, bestD := 0, math.Inf(1)
	for i, a := range s.Antoine {
		if d := a.distance(T); d < bestD {
			best, bestD = i, d
		}
	}
	return best, false
}

// BoilingPointAt is the boiling temperature in K at pressure p (Pa), the
// inverse of VaporPressure. Each Antoine set is inverted in closed form
// (Antoine.Temperature); the answer is a set's temperature that VaporPressure
// would itself evaluate with that set, preferring one inside its range
// (inRange true). Otherwise the set whose answer lies nearest its range is
// extrapolated (inRange false). With no Antoine set the Clausius–Clapeyron
// equation is inverted (inRange false). p ≤ 0 gives NaN.
func (s Solvent) BoilingPointAt(p float64) (T float64, inRange bool) {
	if !(p > 0) || math.IsInf(p, 0) {
		return math.NaN(), false
	}
	if len(s.Antoine) == 0 {
		return clausiusClapeyronT(p, s.BoilingPoint.V, s.HVap.V), false
	}
	// First choice: a set whose answer lies in its own range and which
	// VaporPressure would pick at that temperature.
	for i, a := range s.Antoine {
		t := a.Temperature(p)
		if math.IsNaN(t) || !a.Holds(t) {
			continue
		}
		if j, _ := s.antoineFor(t); j == i {
			return t, true
		}
	}
	// Otherwise extrapolate: prefer an answer consistent with VaporPressure,
	// then the one nearest its set's range.
	best, bestD, bestConsistent := math.NaN(), math.Inf(1), false
	for i, a := range s.Antoine {
		t := a.Temperature(p)
		if math.IsNaN(t) {
			continue
		}
		j, _ := s.antoineFor(t)
		consistent := j == i
		d := a.distance(t)
		if (consistent && !bestConsistent) || (consistent == bestConsistent && d < bestD) {
			best, bestD, bestConsistent = t, d, consistent
		}
	}
	return best, false
}

// BubblePoint is the temperature (K) at which an ideal-solution liquid of
// the solvents ss with mole fractions x (normalised here) boils at
// pressure p (Pa), by Raoult's law:
//
//	Σ x_i · P_i^sat(T) = p
//
// with P_i^sat from VaporPressure (Antoine, or Clausius–Clapeyron), found
// by bisection between the components' boiling points at p (widened by
// 1 K). NaN when a boiling point is undefined or the root is not bracketed.
// Real mixtures deviate (ethanol–water has an azeotrope boiling at 78.2 °C,
// from memory); callers say so where it matters.
func BubblePoint(ss []Solvent, x []float64, p float64) float64 {
	if len(ss) == 0 || len(ss) != len(x) {
		return math.NaN()
	}
	sum := 0.0
	lo, hi := math.Inf(1), math.Inf(-1)
	for i, s := range ss {
		sum += x[i]
		t, _ := s.BoilingPointAt(p)
		lo, hi = math.Min(lo, t), math.Max(hi, t)
	}
	if !(sum > 0) || math.IsNaN(lo) || math.IsNaN(hi) {
		return math.NaN()
	}
	f := func(T float64) float64 {
		total := 0.0
		for i, s := range ss {
			pi, _ := s.VaporPressure(T)
			total += x[i] / sum * pi
		}
		return total - p
	}
	lo, hi = lo-1, hi+1
	if !(f(lo) <= 0 && f(hi) >= 0) {
		return math.NaN()
	}
	for i := 0; i < 100; i++ {
		mid := (lo + hi) / 2
		if f(mid) > 0 {
			hi = mid
		} else {
			lo = mid
		}
	}
	return (lo + hi) / 2
}
