package distil

import "math"

// RelativeVolatility is the volatility of the light component relative to
// the heavy one for an ideal solution (Raoult's law, ideal vapour):
//
//	α = P_L^sat(T) / P_H^sat(T)
//
// P_L^sat and P_H^sat are the pure-component vapour pressures (Pa) at the
// same temperature T. For a non-ideal solution α also carries the ratio of
// activity coefficients γ_L/γ_H, which this model takes as 1 (azeotropes
// are for the user to declare). Source: Raoult, F.-M. Compt. Rend. 1887,
// 104, 1430 (from memory); the ideal-solution α is textbook material, e.g.
// Seader, J. D.; Henley, E. J.; Roper, D. K. Separation Process Principles,
// 3rd ed., Wiley, 2011, ch. 2 (from memory).
func RelativeVolatility(pLight, pHeavy float64) float64 { return pLight / pHeavy }

// MeanVolatility is the geometric mean of the relative volatilities at the
// top (head) and the bottom (pot) of a column:
//
//	α = √(α_top · α_bottom)
//
// the usual average for the Fenske equation when α varies along the column
// (e.g. Seader, Henley & Roper 2011, ch. 9, from memory).
func MeanVolatility(top, bottom float64) float64 { return math.Sqrt(top * bottom) }

// EquilibriumVapour is the light-component mole fraction of the vapour in
// equilibrium with a liquid of light mole fraction x, at constant relative
// volatility α:
//
//	y = α x / (1 + (α − 1) x)
//
// valid for 0 ≤ x ≤ 1 and α > 0 (definition of α for a binary).
func EquilibriumVapour(x, alpha float64) float64 { return alpha * x / (1 + (alpha-1)*x) }

// MoleFraction converts the mass fraction w of component 1 in a binary to
// its mole fraction:
//
//	x = (w/M1) / (w/M1 + (1 − w)/M2)
//
// M1, M2 molar masses (any consistent unit).
func MoleFraction(w, m1, m2 float64) float64 { return (w / m1) / (w/m1 + (1-w)/m2) }

// MassFraction is the inverse of MoleFraction: w = x M1 / (x M1 + (1 − x) M2).
func MassFraction(x, m1, m2 float64) float64 { return x * m1 / (x*m1 + (1-x)*m2) }
