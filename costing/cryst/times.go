package cryst

import "math"

// FilterArea is the area of a funnel for a cake of volume Vc (m³) at cake
// depth L (m), not below the smallest funnel Amin (m²):
//
//	A = max(Vc / L, Amin)
//
// At flask scale a Büchner funnel is chosen so that the cake is a few
// centimetres deep (common practice, no source).
func FilterArea(Vc, L, Amin float64) float64 { return math.Max(Vc/L, Amin) }

// PlantFilterArea is the area of the filter (or filter-dryer) that serves
// a reactor of nominal volume V (m³), m²:
//
//	A = a_f · V^(2/3)
//
// a_f is crystallization.filter_area_factor (about 1: a 1 m² filter for a
// 1 m³ reactor; common practice, no source). The filter is sized with the
// reactor, not with the cake, so the cake deepens as the batch grows.
func PlantFilterArea(af, V float64) float64 { return af * math.Pow(V, 2.0/3) }

// CakeFiltrationTime is the time to pass a filtrate volume V (m³) through
// a filter of area A (m²) at a constant pressure difference Δp (Pa) while
// the cake builds up, s — Darcy's law integrated for an incompressible
// cake (Ruth, B. F. "Studies in filtration", Ind. Eng. Chem. 1935, 27,
// 708, from memory; the linearised form t/V = μαc/(2A²Δp)·V + μR_m/(AΔp)
// used to measure α, confirmed in a published calculation guide):
//
//	t = μ·α·c·V² / (2·A²·Δp) + μ·R_m·V / (A·Δp)
//
// μ the filtrate viscosity (Pa·s), α the specific cake resistance (m/kg),
// c the dry cake deposited per volume of filtrate (kg/m³), R_m the filter
// medium's resistance (1/m). Valid for laminar flow through a cake that
// does not compress (α independent of Δp); compressible cakes take longer
// at high pressure.
func CakeFiltrationTime(V, A, dp, mu, alpha, c, Rm float64) float64 {
	if V <= 0 {
		return 0
	}
	return mu*alpha*c*V*V/(2*A*A*dp) + mu*Rm*V/(A*dp)
}

// CakeWashTime is the time to pass a wash of volume W (m³) through the
// finished cake (built from a filtrate volume Vf at c kg/m³) at the final
// filtration rate, s — Darcy's law with the cake's resistance fixed:
//
//	t_w = μ·(α·c·Vf/A + R_m)·W / (A·Δp)
//
// Symbols as for CakeFiltrationTime (same sources).
func CakeWashTime(W, Vf, A, dp, mu, alpha, c, Rm float64) float64 {
	if W <= 0 {
		return 0
	}
	return mu * (alpha*c*Vf/A + Rm) * W / (A * dp)
}

// DryingTime is the time to dry a cake holding mLiquid kg of liquid down to
// a loss on drying LOD (kg of liquid per kg of dry solid) of mSolid kg of
// solid, at a mean flux N (kg per m² of cake per s) over an area A (m²), s:
//
//	t = max(0, m_liquid − LOD·m_solid) / (N·A)
//
// N is a mean over the constant-rate and falling-rate periods (common
// practice, no source; measure it). The area is the oven trays' (the cake
// spread to a set depth, so the time barely changes with the batch) or the
// filter-dryer's (a fixed area, so the time grows with the cake's depth).
func DryingTime(mLiquid, mSolid, lod, N, A float64) float64 {
	return math.Max(0, mLiquid-lod*mSolid) / (N * A)
}

// TransferTime is the time to move a volume V (m³) at a rate Q (m³/s), s:
// t = V/Q.
func TransferTime(V, Q float64) float64 { return V / Q }

// CleaningTime is the time to empty and clean a vessel of wetted wall area
// A (m²), s: t = t₀ + k·A, with t₀ the fixed part and k the time per area
// (boil-out, rinse, dry; common practice, no source). With A ∝ V^(2/3) a
// 1 m³ reactor takes hours where a flask takes minutes.
func CleaningTime(t0, k, A float64) float64 { return t0 + k*A }

// InclusionAt is the mother liquor occluded per mass of crystals grown at a
// cooling rate R (K/s), given φ_ref at the reference rate R_ref:
//
//	φ(R) = φ_ref · R / R_ref
//
// Inclusions form more readily as crystals grow faster (Mullin, J. W.
// Crystallization, 4th ed., 2001, ch. 6, from memory); the proportionality
// is an assumption (common practice, no source), so a slow jacket-limited
// cool in a large reactor occludes less than a fast ramp in a flask.
func InclusionAt(phiRef, R, Rref float64) float64 {
	if !(R > 0) {
		return 0
	}
	return phiRef * R / Rref
}
