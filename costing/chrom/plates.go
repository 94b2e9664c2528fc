package chrom

import "math"

// ChromatographicVelocity is the mobile phase's mean linear velocity
// through the bed, from the speed of the falling solvent level above it
// (the superficial velocity, flow over the column's cross-section):
//
//	u0 = us / εt,   εt = ρb · V0/m   (total porosity: mobile-phase volume per bed volume)
//
// us in m/s, ρb packed density (kg/m³), V0/m the column volume per mass of
// silica (m³/kg). With 5 cm/min and εt ≈ 0.78 this is about 1.1 mm/s.
func ChromatographicVelocity(levelSpeed, bedDensity, v0PerKg float64) float64 {
	return levelSpeed / (bedDensity * v0PerKg)
}

// ReducedVelocity is Giddings' reduced velocity ν = u·dp/Dm (u in m/s,
// dp the particle diameter in m, Dm the solute's diffusion coefficient in
// the eluent in m²/s).
func ReducedVelocity(u, dp, dm float64) float64 { return u * dp / dm }

// KnoxPlateHeight is the reduced plate height of a packed bed by the Knox
// equation:
//
//	h = H/dp = A·ν^(1/3) + B/ν + C·ν
//
// A (flow inhomogeneity of the packing), B (axial diffusion) and C (mass
// transfer) are dimensionless; a well-packed analytical bed has A ≈ 1,
// B ≈ 2, C ≈ 0.05, a hand-packed bed of irregular particles a larger A.
// Source: Kennedy, G. J.; Knox, J. H. J. Chromatogr. Sci. 1972, 10, 549
// (the equation; coefficient values from memory). Valid for ν from about
// 1 to a few hundred.
func KnoxPlateHeight(nu, a, b, c float64) float64 {
	return a*math.Cbrt(nu) + b/nu + c*nu
}

// PlateNumber is N = L / (h·dp) for a bed of height L (m).
func PlateNumber(bedHeight, reducedHeight, dp float64) float64 {
	return bedHeight / (reducedHeight * dp)
}
