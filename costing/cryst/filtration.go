package cryst

import "math"

// FilterArea is the filter area for a cake of volume Vc (m³) at cake depth
// L (m), not below the smallest filter Amin (m²):
//
//	A = max(Vc / L, Amin)
//
// A Büchner funnel or Nutsche filter is chosen so that the cake is a few
// centimetres deep (common practice, no source).
func FilterArea(Vc, L, Amin float64) float64 { return math.Max(Vc/L, Amin) }

// FiltrationTime is the time to pass a volume V (m³) of filtrate and wash
// through a filter of area A (m²) at a flux J (m³ per m² per s), s:
//
//	t = V / (J · A)
//
// J is a bulk figure for a crystalline cake under vacuum (coefficient
// crystallization.filtration_flux); cake resistance that rises with depth
// is folded into it because the cake depth is held constant.
func FiltrationTime(V, J, A float64) float64 { return V / (J * A) }
