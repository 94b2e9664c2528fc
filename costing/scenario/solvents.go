package scenario

import (
	"strconv"
	"strings"

	"sepcost/costing/solvent"
	"sepcost/costing/source"
	"sepcost/costing/units"
)

// solvent reads a user-defined solvent. Properties the user does not give
// stay zero and are refused by solvent.Validate where a model needs them.
func (c *collector) solvent(r rawSolvent, field string, line int) (solvent.Solvent, bool) {
	n := len(c.list)
	c.unknown(r.Extra, field, rawSolvent{})
	src := r.Source.Value
	if src == "" {
		src = "given in the scenario, no source stated"
	}
	prop := func(t Text, name string, dim units.Dim) solvent.Prop {
		v, _ := c.quantity(t, field+"."+name, dim)
		return solvent.Prop{V: v, Source: src, Mark: source.Override}
	}
	var s solvent.Solvent
	if !c.required(r.Name, line, field+".name", "the solvent's name, e.g. anisole") {
		return s, false
	}
	s.ID = strings.ToLower(r.Name.Value)
	for _, a := range r.Aliases {
		s.Aliases = append(s.Aliases, a.Value)
	}
	if c.required(r.Formula, r.Name.Line, field+".formula", "the molecular formula, e.g. C7H8O") {
		s.Formula = r.Formula.Value
	}
	if c.required(r.Density, r.Name.Line, field+".density", units.Accepted(units.Density)) {
		s.Density = prop(r.Density, "density", units.Density)
	}
	if c.required(r.BoilingPoint, r.Name.Line, field+".boiling_point", units.Accepted(units.Temperature)) {
		s.BoilingPoint = prop(r.BoilingPoint, "boiling_point", units.Temperature)
	}
	if r.HVap.Set {
		s.HVap = prop(r.HVap, "enthalpy_of_vaporization", units.MolarEnergy)
	} else if s.BoilingPoint.V > 0 {
		s.HVap = solvent.Prop{V: solvent.TroutonHVap(s.BoilingPoint.V), Source: "estimated by Trouton's rule from the boiling point", Mark: source.Derived}
	}
	if c.required(r.Cp, r.Name.Line, field+".heat_capacity", units.Accepted(units.MolarHeatCapacity)) {
		s.Cp = prop(r.Cp, "heat_capacity", units.MolarHeatCapacity)
	}
	if r.FlashPoint.Set && strings.ToLower(r.FlashPoint.Value) != "none" {
		s.FlashPoint = prop(r.FlashPoint, "flash_point", units.Temperature)
		s.HasFlashPoint = true
	}
	s.Halogenated = c.boolean(r.Halogenated, field+".halogenated")
	s.PeroxideFormer = c.boolean(r.Peroxide, field+".peroxide_former")
	if a := r.Antoine; a != nil {
		c.unknown(a.Extra, field+".antoine", rawAntoine{})
		num := func(t Text, name string) float64 {
			v, err := strconv.ParseFloat(t.Value, 64)
			if err != nil {
				c.add(t.Line, field+".antoine."+name, "%q: write the Antoine constant as a plain number (log10(P/bar) = A − B/(T/K + C))", t.Value)
			}
			return v
		}
		ant := solvent.Antoine{A: num(a.A, "a"), B: num(a.B, "b"), C: num(a.C, "c"), Source: src, Mark: source.Override}
		ant.Tmin, _ = c.quantity(a.Tmin, field+".antoine.t_min", units.Temperature)
		ant.Tmax, _ = c.quantity(a.Tmax, field+".antoine.t_max", units.Temperature)
		s.Antoine = []solvent.Antoine{ant}
	}
	return s, len(c.list) == n
}

func (c *collector) boolean(t Text, field string) bool {
	if !t.Set {
		return false
	}
	switch strings.ToLower(t.Value) {
	case "true", "yes":
		return true
	case "false", "no":
		return false
	}
	c.add(t.Line, field, "%q: write true or false", t.Value)
	return false
}
