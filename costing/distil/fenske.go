package distil

import "math"

// Fenske is the minimum number of equilibrium stages (including the pot or
// partial reboiler) for a binary separation at total reflux:
//
//	N_min = ln[ (x_D/(1 − x_D)) · ((1 − x_B)/x_B) ] / ln α
//
// x_D and x_B are the light-component mole fractions of the distillate and
// the bottoms (0 < x_B < x_D < 1) and α > 1 the relative volatility, taken
// constant. Source: Fenske, M. R. "Fractionation of straight-run
// Pennsylvania gasoline", Ind. Eng. Chem. 1932, 24, 482–485 (from memory);
// as given in the project's reference notes and in Seader, Henley & Roper,
// Separation Process Principles (from memory). It returns NaN outside the
// valid range.
func Fenske(xD, xB, alpha float64) float64 {
	if !(xB > 0 && xB < xD && xD < 1 && alpha > 1) {
		return math.NaN()
	}
	return math.Log(xD/(1-xD)*(1-xB)/xB) / math.Log(alpha)
}
