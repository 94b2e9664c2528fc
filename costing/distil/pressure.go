package distil

import (
	"sepcost/costing/solvent"
)

// Pressures are the pressures a batch still runs at.
type Pressures struct {
	Head   float64 // at the still head and condenser, where the pump acts, Pa
	Pot    float64 // in the pot, below the column, Pa
	Vacuum bool    // Head below one atmosphere
}

// OperatingPressures picks the highest pressure at which the pot stays at
// or below its stability limit. The pot temperature is taken as the boiling
// point of the less volatile component at the pot pressure — the upper
// bound the pot approaches as it is depleted of the lighter component (the
// charge's own bubble point is lower) — so the pot pressure is that
// component's vapour pressure at the limit:
//
//	P_pot  = min( P_H^sat(T_max), 101325 Pa + n ΔP )
//	P_head = P_pot − n ΔP
//
// psatHeavyAtMax is P_H^sat(T_max) in Pa, n the column's theoretical stages
// above the pot and ΔP the pressure drop per theoretical stage (Pa). A still
// never runs above atmospheric pressure at the head. The caller checks that
// P_head is positive and not below what the pump reaches.
func OperatingPressures(psatHeavyAtMax, stages, dpStage float64) Pressures {
	drop := stages * dpStage
	if psatHeavyAtMax >= solvent.StandardPressure+drop {
		return Pressures{Head: solvent.StandardPressure, Pot: solvent.StandardPressure + drop}
	}
	return Pressures{Head: psatHeavyAtMax - drop, Pot: psatHeavyAtMax, Vacuum: true}
}

// BubblePoint is the temperature (K) at which a liquid of light mole
// fraction x boils at pressure p (Pa), for an ideal solution (Raoult's law):
//
//	x P_L^sat(T) + (1 − x) P_H^sat(T) = p
//
// (solvent.BubblePoint for the pair). NaN when either boiling point is
// undefined.
func BubblePoint(x float64, light, heavy solvent.Solvent, p float64) float64 {
	return solvent.BubblePoint([]solvent.Solvent{light, heavy}, []float64{x, 1 - x}, p)
}
