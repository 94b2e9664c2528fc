// Package solubility holds the solubility equations of the recrystallization
// model: a van 't Hoff fit of measured points (ln S linear in 1/T) and the
// ideal solubility of a solid from its melting point and enthalpy of fusion
// (Schröder–van Laar), converted from mole fraction to mass per volume of
// solvent. Both give S(T) in kg of solute per m³ of solvent (numerically
// g/L), the unit in which chemists write solubility for a recrystallization.
//
// It imports nothing from the rest of the project, so that the scenario
// reader can check a user's solubility data with the same equations the
// model uses.
package solubility

// R is the molar gas constant in J/(mol·K).
//
// Source: CODATA 2018 recommended values (Tiesinga et al., Rev. Mod. Phys.
// 2021, 93, 025010); exact since the 2019 SI redefinition, R = N_A·k
// (confirmed; the same value as solvent.R).
const R = 8.314462618
