package distil

import "math"

// UnderwoodMinReflux is the minimum reflux ratio of a binary column with a
// saturated-liquid feed (q = 1) at constant relative volatility:
//
//	R_min = [ x_D/x_F − α (1 − x_D)/(1 − x_F) ] / (α − 1)
//
// x_F and x_D are the light-component mole fractions of the feed and the
// distillate (0 < x_F < x_D < 1), α > 1. For a binary it equals the pinch
// at the feed, R_min = (x_D − y_F)/(y_F − x_F) with y_F in equilibrium with
// x_F. Source: Underwood, A. J. V. "Fractional distillation of multicomponent
// mixtures", Chem. Eng. Prog. 1948, 44, 603–614 (from memory); binary form
// as given in the project's reference notes. A negative value means one
// equilibrium stage already makes x_D from the feed; it is returned as is.
// NaN outside the valid range.
func UnderwoodMinReflux(xF, xD, alpha float64) float64 {
	if !(xF > 0 && xF < 1 && xD > 0 && xD < 1 && alpha > 1) {
		return math.NaN()
	}
	return (xD/xF - alpha*(1-xD)/(1-xF)) / (alpha - 1)
}
