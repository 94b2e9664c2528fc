package cryst

import "math"

// SecondCrop is the crop recovered by evaporating a mother liquor of volume
// V (m³) holding the dissolved solids liq (kg) down to a share f of its
// volume and cooling it to the isolation temperature again:
//
//	P_2 = max(0, P_liq − f·V·S_cold)
//	I_2 = P_2·(1 − p_2)/p_2   (at most the impurities in the liquor)
//
// p_2 is the second crop's purity as the scenario states it (second crops
// are less pure; the model does not predict how much less). The impurity
// is taken from the described impurity and the others in proportion. It
// returns the crop and the volume evaporated, (1 − f)·V. Solvent retained
// by the second cake is neglected.
func SecondCrop(V float64, liq Feed, sCold, f, purity float64) (crop Feed, evaporated float64) {
	evaporated = (1 - f) * V
	crop.Product = math.Max(0, liq.Product-f*V*sCold)
	imp := liq.Impurity + liq.Other
	want := math.Min(crop.Product*(1-purity)/purity, imp)
	if imp > 0 {
		crop.Impurity = want * liq.Impurity / imp
		crop.Other = want * liq.Other / imp
	}
	return crop, evaporated
}
