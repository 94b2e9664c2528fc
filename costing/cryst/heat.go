package cryst

import "math"

// Area factors a in A = a·V^(2/3) for geometrically similar vessels.
//
//	sphere:                        a = (36π)^(1/3)          ≈ 4.836
//	cylinder, H = D, wall + bottom: a = (5π/4)·(4/π)^(2/3)   ≈ 4.613
//
// Derived: a sphere of volume V = πD³/6 has area πD²; a cylinder of
// diameter D and height D has volume πD³/4 and wall plus bottom area
// πD² + πD²/4.
var (
	AreaFactorSphere   = math.Cbrt(36 * math.Pi)
	AreaFactorCylinder = 5 * math.Pi / 4 * math.Pow(4/math.Pi, 2.0/3)
)

// WettedArea is the heat-transfer area of a batch of volume V (m³) in a
// vessel of shape factor a, m²:
//
//	A = a · V^(2/3)
//
// For geometrically similar batches the area grows as V^(2/3) while the
// heat to move grows as V, which is why heating and cooling take longer at
// scale (standard heat transfer: the square–cube law for similar vessels,
// from memory).
func WettedArea(a, V float64) float64 { return a * math.Pow(V, 2.0/3) }

// JacketTime is the time to bring a well-stirred batch from T0 to Tf with
// the jacket (or bath) held at Tj, s:
//
//	t = (m·c_p / (U·A)) · ln((T0 − Tj)/(Tf − Tj))
//
// C = m·c_p the batch's heat capacity (J/K), U the overall heat-transfer
// coefficient (W/(m²·K)), A the wetted area (m²), temperatures in K. It
// follows from m·c_p·dT/dt = −U·A·(T − Tj) with U and c_p constant
// (batch heating and cooling of a stirred tank; McCabe, W. L.; Smith,
// J. C.; Harriott, P. "Unit Operations of Chemical Engineering", ch. 15 —
// from memory). Valid when Tj lies beyond
// Tf on the far side from T0; otherwise Tf is never reached and the result
// is +Inf. With A = a·V^(2/3) and C ∝ V the time grows as V^(1/3).
func JacketTime(C, U, A, T0, Tf, Tj float64) float64 {
	if T0 == Tf {
		return 0
	}
	r := (T0 - Tj) / (Tf - Tj)
	if !(r > 1) {
		return math.Inf(1)
	}
	return C / (U * A) * math.Log(r)
}

// EffectiveHeatCapacity spreads a heat of dissolution or crystallization Q
// (J) evenly over the temperature change ΔT (K) of a batch of heat
// capacity C (J/K), so that JacketTime covers the latent heat too:
//
//	C_eff = C + Q/|ΔT|
//
// An assumption: the solute comes out of solution in proportion to the
// temperature drop (it actually comes out faster near the top for a
// van 't Hoff curve, which this ignores).
func EffectiveHeatCapacity(C, Q, dT float64) float64 {
	if dT == 0 {
		return C
	}
	return C + math.Abs(Q/dT)
}
