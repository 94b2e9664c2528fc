// Package distil models the batch distillation of a liquid (or volatile)
// product from its key impurity: operating pressure under the compound's
// stability limit, relative volatility from the pure-component vapour
// pressures, the shortcut design of the column (Fenske, Underwood,
// Gilliland), the batch itself by the Rayleigh equation, and the still,
// energy, time, losses and waste of one purification at one batch mass.
//
// The model computes physical quantities only (SI inside); pricing is the
// ledger's job. Every coefficient is in coefficients.go with its source.
//
// Vapour pressures come from package solvent (Antoine constants with their
// ranges; otherwise Clausius–Clapeyron from the normal boiling point and
// the enthalpy of vaporization, estimated by Trouton's rule when unknown).
//
// Batch operation. The shortcut methods were made for continuous columns.
// Here they are applied to a batch still as follows, and a note says so:
//
//  1. The design figures (N_min, R_min, N at the chosen reflux, or the
//     reflux needed for the available stages) are those of a continuous
//     column fed with the still charge as a saturated liquid, making the
//     target purity at a design recovery of the product.
//  2. The batch is run at constant reflux R. The column and pot together act
//     as one equilibrium stage with an equivalent relative volatility
//     α_eq = α^N_eq, where N_eq is the number of stages that would make the
//     same separation at total reflux: the Gilliland correlation solved for
//     N_min at the available stages and the reflux used. A simple
//     distillation (no column, no reflux) is one stage, α_eq = α, exactly.
//  3. The pot composition follows the Rayleigh equation with α_eq (closed
//     form for constant α). The equivalent α ignores that the minimum reflux
//     rises as the pot is depleted, so late cuts are estimated somewhat
//     optimistically.
package distil
