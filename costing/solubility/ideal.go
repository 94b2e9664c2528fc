package solubility

import "math"

// IdealMoleFraction is the ideal solubility of a solid, as the mole
// fraction of solute in the saturated solution, by the Schröder–van Laar
// equation:
//
//	ln x_ideal = −(ΔH_fus/R)·(1/T − 1/T_m)
//
// T and T_m (melting point) in K, ΔH_fus (enthalpy of fusion) in J/mol,
// R in J/(mol·K). It neglects the difference between the heat capacities
// of the subcooled liquid and the solid, and solid–solid transitions, so
// it is good to a few per cent for rigid aromatic solids within some 50 K
// of the melting point and degrades further below (Prausnitz, J. M.;
// Lichtenthaler, R. N.; de Azevedo, E. G. "Molecular Thermodynamics of
// Fluid-Phase Equilibria", 3rd ed., 1999, §11.2 — from memory). At and
// above T_m the solute is a liquid, miscible
// in the ideal model: the result is 1.
func IdealMoleFraction(T, Tm, Hfus float64) float64 {
	if T >= Tm {
		return 1
	}
	return math.Exp(-Hfus / R * (1/T - 1/Tm))
}

// MolarDensity is the amount of solvent per volume of a solvent mixture
// made up by volume, mol/m³:
//
//	n = Σ φ_i·ρ_i / M_i
//
// φ_i volume fraction (Σφ = 1), ρ_i density (kg/m³), M_i molar mass
// (kg/mol); the volume change on mixing is neglected (ideal mixing).
func MolarDensity(fractions, densities, molarMasses []float64) float64 {
	n := 0.0
	for i := range fractions {
		n += fractions[i] * densities[i] / molarMasses[i]
	}
	return n
}

// MassPerVolume converts a mole fraction of solute into mass of solute per
// volume of solvent, kg/m³:
//
//	S = x/(1 − x) · n_solv · M
//
// x mole fraction of solute in the solution, n_solv amount of solvent per
// volume of solvent (MolarDensity, mol/m³), M molar mass of the solute
// (kg/mol). x/(1 − x) is moles of solute per mole of solvent. It is +Inf
// at x ≥ 1 (miscible).
func MassPerVolume(x, nSolvent, M float64) float64 {
	if x >= 1 {
		return math.Inf(1)
	}
	return x / (1 - x) * nSolvent * M
}

// MoleFraction inverts MassPerVolume: x = (S/M) / (S/M + n_solv).
func MoleFraction(S, nSolvent, M float64) float64 {
	m := S / M
	return m / (m + nSolvent)
}

// Ideal is the solubility of a solid estimated from its melting data, in
// mass per volume of solvent, with an activity factor:
//
//	x = x_ideal(T) / γ
//	S = x/(1 − x) · n_solv · M
//
// γ is the solute's activity coefficient in the saturated solution,
// referred to the pure subcooled liquid (the symmetric, Raoult's-law
// convention, as in Prausnitz et al. 1999, §11.2 — from memory): γ = 1
// ideal, γ > 1 a solvent that dissolves the solute less than ideally
// (usual for polar solutes in hydrocarbons and for most solutes in
// water), γ < 1 one that dissolves it better. The activity factor divides
// the ideal mole fraction; it is held constant with temperature.
type Ideal struct {
	Tm       float64 // melting point, K
	Hfus     float64 // enthalpy of fusion, J/mol
	M        float64 // molar mass of the solute, kg/mol
	Gamma    float64 // activity factor γ > 0
	NSolvent float64 // amount of solvent per volume of solvent, mol/m³ (MolarDensity)
}

// MoleFraction is x = x_ideal(T)/γ, capped at 1.
func (d Ideal) MoleFraction(T float64) float64 {
	return math.Min(1, IdealMoleFraction(T, d.Tm, d.Hfus)/d.Gamma)
}

// At is the estimated solubility at T (K), kg/m³ of solvent.
func (d Ideal) At(T float64) float64 {
	return MassPerVolume(d.MoleFraction(T), d.NSolvent, d.M)
}
