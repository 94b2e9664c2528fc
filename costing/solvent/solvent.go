// Package solvent holds the physical data of common laboratory solvents —
// density, normal boiling point, enthalpy of vaporization, heat capacity,
// flash point, hazard flags and Antoine vapour-pressure constants — with
// the source and certainty of every value, and the equations built on them:
// molar mass from the formula, vapour pressure and boiling point at reduced
// pressure (Antoine; Clausius–Clapeyron; Trouton's rule).
//
// Values are SI inside (kg/m³, K, J/mol, J/(mol·K), Pa). A Book holds the
// built-in table plus solvents a user defines; Coefficients lists every
// value with its provenance for the workbook's Sources sheet.
package solvent

import (
	"fmt"
	"math"
	"strings"
	"sync"

	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Prop is one property value in SI with its provenance.
type Prop struct {
	V      float64
	Source string
	Mark   source.Mark
}

// Basis records why a yes/no property was set, and how sure that is.
type Basis struct {
	Source string
	Mark   source.Mark
}

// Solvent is one solvent with its data.
type Solvent struct {
	ID      string   // lower-case canonical name, e.g. "ethyl acetate"
	Aliases []string // other names and abbreviations, e.g. "EtOAc"
	Formula string   // molecular formula, e.g. "C4H8O2"
	CAS     string   // CAS Registry Number, e.g. "141-78-6"; optional

	Density       Prop // kg/m³ at 20 °C
	BoilingPoint  Prop // K at 101.325 kPa
	HVap          Prop // J/mol at the normal boiling point
	Cp            Prop // liquid, J/(mol·K) near 25 °C
	FlashPoint    Prop // K, closed cup; only meaningful when HasFlashPoint
	HasFlashPoint bool

	Halogenated    bool // contains F, Cl, Br or I (must agree with Formula)
	PeroxideFormer bool // forms explosive peroxides on storage or concentration
	PeroxideBasis  Basis

	Antoine []Antoine // in order of preference; may be empty
}

// IgnitabilityLimit is the flash point below which a liquid counts as
// flammable here, in K (60 °C).
//
// Source: US EPA, 40 CFR 261.21(a)(1), characteristic of ignitability
// (D001): a liquid with a flash point below 60 °C (140 °F) (confirmed). The
// UN GHS (Rev. 9, 2021, ch. 2.6) puts flammable liquids of categories 1–3 at
// flash points ≤ 60 °C (from memory); the two differ only at exactly 60 °C.
const IgnitabilityLimit = 333.15

// MolarMass is the molar mass in kg/mol computed from Formula with the IUPAC
// CIAAW abridged standard atomic weights (see ParseFormula and
// Composition.MolarMass). It is NaN when the formula does not parse;
// Validate reports why, and a Book never holds such a solvent.
func (s Solvent) MolarMass() float64 {
	if v, ok := molarMasses.Load(s.Formula); ok {
		return v.(float64)
	}
	c, err := ParseFormula(s.Formula)
	if err != nil {
		return math.NaN()
	}
	m := c.MolarMass()
	molarMasses.Store(s.Formula, m)
	return m
}

// molarMasses caches MolarMass by formula: models ask for it in inner loops.
var molarMasses sync.Map

// CarbonFraction is the mass fraction of carbon,
//
//	w_C = n_C · 12.011 g/mol / M
//
// used for the CO₂ from incinerating the solvent (kg CO₂/kg = w_C·44/12).
// NaN when the formula does not parse.
func (s Solvent) CarbonFraction() float64 {
	c, err := ParseFormula(s.Formula)
	if err != nil {
		return math.NaN()
	}
	return c.MassFraction("C")
}

// SpecificHVap is the enthalpy of vaporization per mass at the normal
// boiling point, in J/kg:
//
//	Δh_vap = ΔH_vap / M
//
// with ΔH_vap in J/mol (HVap) and M in kg/mol (MolarMass). NaN when the
// formula does not parse.
func (s Solvent) SpecificHVap() float64 { return s.HVap.V / s.MolarMass() }

// SpecificCp is the liquid heat capacity per mass near 25 °C, in J/(kg·K):
//
//	c_p = C_p / M
//
// with C_p in J/(mol·K) (Cp) and M in kg/mol (MolarMass). NaN when the
// formula does not parse.
func (s Solvent) SpecificCp() float64 { return s.Cp.V / s.MolarMass() }

// Flammable reports whether the closed-cup flash point is below 60 °C:
//
//	flammable ⇔ HasFlashPoint and T_flash < 333.15 K
//
// (IgnitabilityLimit; 40 CFR 261.21(a)(1)). A solvent without a flash point
// is not flammable in this sense.
func (s Solvent) Flammable() bool {
	return s.HasFlashPoint && s.FlashPoint.V < IgnitabilityLimit
}

// Names lists the ID followed by the aliases.
func (s Solvent) Names() []string {
	return append([]string{s.ID}, s.Aliases...)
}

// clone copies the slices so that a caller cannot change a Book's data.
func (s Solvent) clone() Solvent {
	s.Aliases = append([]string(nil), s.Aliases...)
	s.Antoine = append([]Antoine(nil), s.Antoine...)
	return s
}

// KeyID is the form of the ID used in coefficient keys: spaces become
// underscores ("ethyl acetate" → "ethyl_acetate").
func KeyID(id string) string { return strings.ReplaceAll(strings.TrimSpace(id), " ", "_") }

// Coefficients lists every property as a source.Coefficient with key
// "solvent.<id>.<property>" (id as in KeyID), method "solvent data" and a
// display unit, for the workbook's Sources sheet. Antoine sets appear as
// "solvent.<id>.antoine<n>.a", ".b", ".c", ".tmin", ".tmax" (n from 1).
// Yes/no properties appear as 1 or 0.
func (s Solvent) Coefficients() []source.Coefficient {
	const method = "solvent data"
	key := func(prop string) string { return "solvent." + KeyID(s.ID) + "." + prop }
	c := func(prop, label string, si float64, dim units.Dim, unit, src string, mark source.Mark) source.Coefficient {
		return source.Coefficient{Key: key(prop), Method: method, Label: s.ID + ": " + label,
			SI: si, Dim: dim, Unit: unit, Source: src, Mark: mark}
	}
	out := []source.Coefficient{
		c("molar_mass", "molar mass of "+s.Formula, s.MolarMass(), units.MolarMass, "g/mol",
			"computed from the formula with IUPAC CIAAW abridged standard atomic weights (Prohaska et al., Pure Appl. Chem. 2022, 94, 573)",
			source.Derived),
		c("density", "density at 20 °C", s.Density.V, units.Density, "g/mL", s.Density.Source, s.Density.Mark),
		c("boiling_point", "normal boiling point", s.BoilingPoint.V, units.Temperature, "°C", s.BoilingPoint.Source, s.BoilingPoint.Mark),
		c("hvap", "enthalpy of vaporization at the normal boiling point", s.HVap.V, units.MolarEnergy, "kJ/mol", s.HVap.Source, s.HVap.Mark),
		c("cp", "liquid heat capacity near 25 °C", s.Cp.V, units.MolarHeatCapacity, "J/(mol K)", s.Cp.Source, s.Cp.Mark),
	}
	if s.HasFlashPoint {
		out = append(out, c("flash_point", "flash point, closed cup", s.FlashPoint.V, units.Temperature, "°C", s.FlashPoint.Source, s.FlashPoint.Mark))
	}
	out = append(out,
		c("halogenated", "halogenated (1 yes, 0 no)", b2f(s.Halogenated), units.None, "",
			"from the formula: 1 when it contains F, Cl, Br or I, else 0", source.Derived),
		c("peroxide_former", "peroxide former (1 yes, 0 no)", b2f(s.PeroxideFormer), units.None, "",
			s.PeroxideBasis.Source, s.PeroxideBasis.Mark),
	)
	for i, a := range s.Antoine {
		n := fmt.Sprintf("antoine%d.", i+1)
		lbl := fmt.Sprintf("Antoine set %d, log10(P/bar) = A - B/(T/K + C), %.2f-%.2f K: ", i+1, a.Tmin, a.Tmax)
		out = append(out,
			c(n+"a", lbl+"A", a.A, units.None, "", a.Source, a.Mark),
			c(n+"b", lbl+"B", a.B, units.Temperature, "K", a.Source, a.Mark),
			c(n+"c", lbl+"C", a.C, units.Temperature, "K", a.Source, a.Mark),
			c(n+"tmin", lbl+"lower limit", a.Tmin, units.Temperature, "K", a.Source, a.Mark),
			c(n+"tmax", lbl+"upper limit", a.Tmax, units.Temperature, "K", a.Source, a.Mark),
		)
	}
	return out
}

func b2f(b bool) float64 {
	if b {
		return 1
	}
	return 0
}
