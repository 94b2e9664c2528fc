package distil

import (
	"math"

	"sepcost/costing/scenario"
	"sepcost/costing/solvent"
	"sepcost/costing/source"
)

// species is a compound with every property the model needs, in SI.
type species struct {
	name        string
	sv          solvent.Solvent // vapour-pressure data, with HVap filled in
	antoine     bool            // vapour pressure from Antoine constants (else Clausius–Clapeyron)
	M           float64         // molar mass, kg/mol
	cp          float64         // liquid heat capacity, J/(mol·K)
	rho         float64         // liquid density, kg/m³
	hvap        float64         // enthalpy of vaporization, J/mol
	known       bool            // a solvent the scenario knows
	halogenated bool
	peroxide    bool
	defaults    []string // properties that took a default, for a note
}

// newSpecies completes a scenario compound with the model's stated
// defaults:
//
//   - ΔHvap not given: from the slope of the Antoine equation at the normal
//     boiling point (solvent.ClapeyronHVap with ΔZ = KeyDeltaZ) when Antoine
//     constants are given, else Trouton's rule (solvent.TroutonHVap);
//   - molar mass not given (impurity only): the product's, productM;
//   - density not given: KeyDefaultDensity;
//   - heat capacity not given: KeyDefaultCp × M.
func newSpecies(c scenario.Compound, productM float64, coef source.Set) species {
	s := species{name: c.Name, sv: c.Data, antoine: len(c.Data.Antoine) > 0, M: c.MolarMass,
		known: c.Solvent != "", halogenated: c.Data.Halogenated, peroxide: c.Data.PeroxideFormer}
	tb := c.Data.BoilingPoint.V
	switch {
	case c.HVapGiven:
		s.hvap = c.Data.HVap.V
	case s.antoine:
		a := c.Data.Antoine[0]
		s.hvap = solvent.ClapeyronHVap(a, tb, coef.Get(KeyDeltaZ))
		s.defaults = append(s.defaults, "enthalpy of vaporization from the Antoine slope (Clapeyron)")
	default:
		s.hvap = solvent.TroutonHVap(tb)
		s.defaults = append(s.defaults, "enthalpy of vaporization by Trouton's rule (±10 % for non-associating liquids; 15–25 % low for hydrogen-bonded ones)")
	}
	if !(s.hvap > 0) || math.IsInf(s.hvap, 0) {
		s.hvap = solvent.TroutonHVap(tb)
	}
	s.sv.HVap.V = s.hvap
	if !(s.M > 0) {
		s.M = productM
		s.defaults = append(s.defaults, "molar mass taken equal to the product's")
	}
	s.rho = c.Data.Density.V
	if !(s.rho > 0) {
		s.rho = coef.Get(KeyDefaultDensity)
		s.defaults = append(s.defaults, "default density")
	}
	s.cp = c.Data.Cp.V
	if !(s.cp > 0) {
		s.cp = coef.Get(KeyDefaultCp) * s.M
		s.defaults = append(s.defaults, "default specific heat")
	}
	return s
}

// pressure is the vapour pressure at T (Pa) and whether T lies inside the
// range of the Antoine constants used (always false for Clausius–Clapeyron).
func (s species) pressure(T float64) (float64, bool) { return s.sv.VaporPressure(T) }

// boilingAt is the boiling point (K) at p (Pa).
func (s species) boilingAt(p float64) (float64, bool) { return s.sv.BoilingPointAt(p) }
