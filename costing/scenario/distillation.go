package scenario

import (
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"go.yaml.in/yaml/v3"

	"sepcost/costing/solvent"
	"sepcost/costing/source"
	"sepcost/costing/units"
)

// The distillation section: a binary batch distillation of the product from
// its key impurity (the impurity nearest to it in volatility). Each of the
// two is either a solvent the scenario knows (built-in or under solvents:)
// or a compound described by its normal boiling point or Antoine constants.

type rawDistil struct {
	Product        *rawCompound      `yaml:"product"`
	Impurity       *rawCompound      `yaml:"impurity"`
	FeedPurity     Text              `yaml:"feed_purity"`
	TargetPurity   Text              `yaml:"target_purity"`
	MaxPotTemp     Text              `yaml:"max_pot_temperature"`
	BestVacuum     Text              `yaml:"best_vacuum"`
	ColumnStages   Text              `yaml:"column_stages"`
	RefluxMultiple Text              `yaml:"reflux_multiple"`
	Azeotrope      *rawAzeotrope     `yaml:"azeotrope"`
	StillSizes     []Text            `yaml:"still_sizes"`
	FillLimit      Text              `yaml:"fill_limit"`
	RinseSolvent   Text              `yaml:"rinse_solvent"`
	Extra          map[string]rawAny `yaml:",inline"`
}

type rawCompound struct {
	Name         Text              `yaml:"name"`
	Solvent      Text              `yaml:"solvent"`
	BoilingPoint Text              `yaml:"boiling_point"`
	HVap         Text              `yaml:"enthalpy_of_vaporization"`
	Antoine      *rawAntoine       `yaml:"antoine"`
	MolarMass    Text              `yaml:"molar_mass"`
	Cp           Text              `yaml:"heat_capacity"`
	Density      Text              `yaml:"density"`
	Halogenated  Text              `yaml:"halogenated"`
	Peroxide     Text              `yaml:"peroxide_former"`
	Source       Text              `yaml:"source"`
	Extra        map[string]rawAny `yaml:",inline"`
}

type rawAzeotrope struct {
	ProductFraction Text              `yaml:"product_fraction"`
	BoilingPoint    Text              `yaml:"boiling_point"`
	Extra           map[string]rawAny `yaml:",inline"`
}

// DefaultRinseSolvent is the solvent used to rinse the still and column
// after the run unless the scenario names another (common practice, no
// source: acetone is the usual glassware rinse).
const DefaultRinseSolvent = "acetone"

// Compound is the product or the key impurity of a distillation.
//
// Data carries what the vapour-pressure equations of package solvent need
// (BoilingPoint, HVap, Antoine) together with density, heat capacity and the
// halogen and peroxide flags. For a solvent the scenario knows, Data is that
// solvent's entry; for a described compound, properties the user left out
// are zero and the model supplies its stated defaults:
//   - HVap zero: estimated from the Antoine slope when Antoine constants are
//     given, else by Trouton's rule (HVapGiven false);
//   - Density or Cp zero: the model's default coefficients;
//   - MolarMass zero (impurity only): taken equal to the product's.
type Compound struct {
	Name      string          // the solvent id, or the name written (or "product"/"key impurity")
	Solvent   string          // the solvent id when the compound is a known solvent, else ""
	Data      solvent.Solvent // vapour-pressure data and properties, SI
	MolarMass float64         // kg/mol; 0 when not given (impurity only)
	HVapGiven bool            // ΔHvap given (or tabulated for a solvent)
	Line      int             // line of the compound's key, for messages
}

// Azeotrope is an azeotrope the user declares between product and impurity.
type Azeotrope struct {
	ProductFraction float64 // mass fraction of product in the azeotrope, in (0, 1)
	BoilingPointK   float64 // boiling point at 101.325 kPa, K; 0 when not given
}

// Distillation describes a batch distillation of the product from its key
// impurity, in SI.
type Distillation struct {
	Product, Impurity Compound
	FeedPurity        float64    // mass fraction of product in the still charge, (0, 1)
	FeedFromCrude     bool       // FeedPurity was taken from crude.purity
	TargetPurity      float64    // wanted mass fraction of product, (FeedPurity, 1)
	MaxPotK           float64    // highest safe pot temperature, K
	BestVacuumPa      float64    // lowest head pressure the site's pump reaches, Pa, (0, 101325]
	ColumnStages      float64    // theoretical stages of the column above the pot; 0 for a simple distillation
	RefluxMultiple    float64    // R / R_min, ≥ 1; 0 when not given (model default)
	Azeotrope         *Azeotrope // nil when none is declared
	StillsM3          []float64  // available still (flask) volumes, m³, ascending; empty for the model default
	FillLimit         float64    // highest fill of a still, (0, 1]; 0 when not given (model default)
	RinseSolvent      string     // solvent id for rinsing the still and column
}

// Solvents lists the ids of the known solvents the section names (product,
// impurity and rinse solvent), sorted, without repeats.
func (d *Distillation) Solvents() []string {
	if d == nil {
		return nil
	}
	seen := map[string]bool{}
	for _, id := range []string{d.Product.Solvent, d.Impurity.Solvent, d.RinseSolvent} {
		if id != "" {
			seen[id] = true
		}
	}
	out := make([]string, 0, len(seen))
	for id := range seen {
		out = append(out, id)
	}
	sort.Strings(out)
	return out
}

// Limits of what the reader accepts (plausibility, common practice, no
// source): no laboratory or pilot still is run above 500 °C, and no column
// in a laboratory has more than a few hundred theoretical stages (spinning-
// band columns reach about 100–200).
const (
	maxPotLimitK    = 773.15
	maxColumnStages = 500
	minBoilingK     = 100.0
	maxBoilingK     = 1000.0
)

func (c *collector) distillation(r *rawDistil, s *Scenario, root *yaml.Node, echo func(string, Text, string)) *Distillation {
	const sec = "distillation"
	n := len(c.list)
	c.unknown(r.Extra, sec, rawDistil{})
	line := keyLine(root, sec)
	d := &Distillation{}

	// Product and key impurity.
	prodOK := c.compound(r.Product, &d.Product, sec+".product", keyLine(root, sec, "product"), line, true, s, echo)
	impOK := c.compound(r.Impurity, &d.Impurity, sec+".impurity", keyLine(root, sec, "impurity"), line, false, s, echo)
	if prodOK && impOK {
		if d.Product.Solvent != "" && d.Product.Solvent == d.Impurity.Solvent {
			c.add(d.Impurity.Line, sec+".impurity", "is the same solvent as the product (%s); name the impurity the product is to be separated from", d.Product.Solvent)
		} else if tp, ti := d.Product.Data.BoilingPoint.V, d.Impurity.Data.BoilingPoint.V; math.Abs(tp-ti) < 0.05 {
			bpLine := d.Impurity.Line
			if r.Impurity.BoilingPoint.Set {
				bpLine = r.Impurity.BoilingPoint.Line
			}
			c.add(bpLine, sec+".impurity.boiling_point", "boils at the same temperature as the product (%.1f °C): equal boiling points give a relative volatility near 1 and distillation cannot separate them; check the values, or purify by another method", tp-273.15)
		}
		if d.Impurity.MolarMass == 0 && d.Product.MolarMass > 0 {
			s.Inputs = append(s.Inputs, Input{Field: sec + ".impurity.molar_mass", Written: "(not given)",
				Meaning: fmt.Sprintf("taken equal to the product's, %.4g g/mol (mole fractions then equal mass fractions)", d.Product.MolarMass*1000)})
		}
	}

	// Feed composition.
	if r.FeedPurity.Set {
		if v, ok := c.fraction(r.FeedPurity, sec+".feed_purity", 0, 1, `the mass fraction of product in the still charge, above 0 and below 1, e.g. 0.82 or "82 %"`); ok {
			if v <= 0 || v >= 1 {
				c.add(r.FeedPurity.Line, sec+".feed_purity", "%s leaves nothing to separate or no product; write a fraction above 0 and below 1", r.FeedPurity.Value)
			} else {
				d.FeedPurity = v
				echo(sec+".feed_purity", r.FeedPurity, fmt.Sprintf("%.4g %% product by mass in the charge; the rest, %.4g %%, is taken as the key impurity", v*100, (1-v)*100))
			}
		}
	} else if s.Purity > 0 && s.Purity < 1 {
		d.FeedPurity = s.Purity
		d.FeedFromCrude = true
		s.Inputs = append(s.Inputs, Input{Field: sec + ".feed_purity", Written: "(not given)",
			Meaning: fmt.Sprintf("crude.purity, %.4g %% product; the rest of the crude, %.4g %%, is all taken as the key impurity (the cautious case)", s.Purity*100, (1-s.Purity)*100)})
	}

	// Target purity.
	if c.required(r.TargetPurity, line, sec+".target_purity", `the wanted mass fraction of product after distillation, above the feed purity and below 1, e.g. "99 %"`) {
		if v, ok := c.fraction(r.TargetPurity, sec+".target_purity", 0, 1, `a mass fraction above the feed purity and below 1, e.g. 0.99 or "99 %"`); ok {
			switch {
			case v >= 1:
				c.add(r.TargetPurity.Line, sec+".target_purity", "%s: a purity of 100 %% cannot be reached by distillation (Fenske's equation needs infinitely many stages); write a fraction below 1, e.g. 0.99", r.TargetPurity.Value)
			case d.FeedPurity > 0 && v <= d.FeedPurity:
				c.add(r.TargetPurity.Line, sec+".target_purity", "%s is not above the feed purity (%.4g %%): there is nothing to purify; write a fraction above %.4g and below 1", r.TargetPurity.Value, d.FeedPurity*100, d.FeedPurity)
			default:
				d.TargetPurity = v
				echo(sec+".target_purity", r.TargetPurity, fmt.Sprintf("%.4g %% product by mass wanted", v*100))
			}
		}
	}

	// Stability limit and vacuum.
	if c.required(r.MaxPotTemp, line, sec+".max_pot_temperature", `the highest temperature the compound may reach in the pot, from a thermal-stability test (DSC or ARC), e.g. "150 C"`) {
		if v, ok := c.quantity(r.MaxPotTemp, sec+".max_pot_temperature", units.Temperature); ok {
			if v <= 273.15-50 || v > maxPotLimitK {
				c.add(r.MaxPotTemp.Line, sec+".max_pot_temperature", "%q is outside −50 °C to 500 °C; write the pot temperature limit, e.g. \"150 C\"", r.MaxPotTemp.Value)
			} else {
				d.MaxPotK = v
				echo(sec+".max_pot_temperature", r.MaxPotTemp, fmt.Sprintf("the pot stays at or below %.1f °C", v-273.15))
			}
		}
	}
	if c.required(r.BestVacuum, line, sec+".best_vacuum", `the lowest pressure the site's vacuum pump holds at the still head, e.g. "1 mbar" (oil pump), "10 mbar" (diaphragm pump), or "1 atm" for no vacuum`) {
		if v, ok := c.quantity(r.BestVacuum, sec+".best_vacuum", units.Pressure); ok {
			if !(v > 0) || v > solvent.StandardPressure*(1+1e-9) {
				c.add(r.BestVacuum.Line, sec+".best_vacuum", "%q: a pressure must be above 0 and at most 1 atm (101.325 kPa); write e.g. \"1 mbar\", \"15 Torr\" or \"1 atm\"", r.BestVacuum.Value)
			} else {
				d.BestVacuumPa = math.Min(v, solvent.StandardPressure)
				echo(sec+".best_vacuum", r.BestVacuum, fmt.Sprintf("%.4g mbar at the still head", v/100))
			}
		}
	}

	c.distillationEquipment(r, d, s, root, echo)
	if len(c.list) > n {
		return nil
	}
	return d
}

// distillationEquipment reads the column, reflux, azeotrope, stills and
// rinse solvent of a distillation section into d.
func (c *collector) distillationEquipment(r *rawDistil, d *Distillation, s *Scenario, root *yaml.Node, echo func(string, Text, string)) {
	const sec = "distillation"
	// Column and reflux.
	if r.ColumnStages.Set {
		v, err := strconv.ParseFloat(r.ColumnStages.Value, 64)
		switch {
		case err != nil || math.IsNaN(v) || math.IsInf(v, 0):
			c.add(r.ColumnStages.Line, sec+".column_stages", "%q is not a number; write the column's theoretical stages (plates) above the pot, e.g. 5, or 0 for a simple distillation", r.ColumnStages.Value)
		case v < 0 || v > maxColumnStages:
			c.add(r.ColumnStages.Line, sec+".column_stages", "%s is outside 0 to %d; write the column's theoretical stages above the pot, or 0 for a simple distillation", r.ColumnStages.Value, maxColumnStages)
		default:
			d.ColumnStages = v
			if v == 0 {
				echo(sec+".column_stages", r.ColumnStages, "no column: a simple (one-stage) distillation")
			} else {
				echo(sec+".column_stages", r.ColumnStages, fmt.Sprintf("%.4g theoretical stages above the pot", v))
			}
		}
	} else {
		s.Inputs = append(s.Inputs, Input{Field: sec + ".column_stages", Written: "(not given)", Meaning: "no column: a simple (one-stage) distillation"})
	}
	if r.RefluxMultiple.Set {
		v, err := strconv.ParseFloat(r.RefluxMultiple.Value, 64)
		switch {
		case err != nil || math.IsNaN(v) || math.IsInf(v, 0):
			c.add(r.RefluxMultiple.Line, sec+".reflux_multiple", "%q is not a number; write the reflux ratio as a multiple of the minimum, at least 1, e.g. 1.5", r.RefluxMultiple.Value)
		case v < 1 || v > 100:
			c.add(r.RefluxMultiple.Line, sec+".reflux_multiple", "%s: the reflux ratio cannot be below the minimum (Underwood); write a multiple of the minimum from 1 to 100, e.g. 1.5", r.RefluxMultiple.Value)
		default:
			d.RefluxMultiple = v
			echo(sec+".reflux_multiple", r.RefluxMultiple, fmt.Sprintf("reflux ratio %.4g × the minimum", v))
		}
	}

	// Azeotrope.
	if a := r.Azeotrope; a != nil {
		field := sec + ".azeotrope"
		c.unknown(a.Extra, field, rawAzeotrope{})
		az := &Azeotrope{}
		if c.required(a.ProductFraction, keyLine(root, sec, "azeotrope"), field+".product_fraction", `the mass fraction of product in the azeotrope, above 0 and below 1, e.g. "70 %"`) {
			if v, ok := c.fraction(a.ProductFraction, field+".product_fraction", 0, 1, `a mass fraction above 0 and below 1, e.g. 0.7 or "70 %"`); ok {
				if v <= 0 || v >= 1 {
					c.add(a.ProductFraction.Line, field+".product_fraction", "%s: an azeotrope lies strictly between the pure compounds; write a fraction above 0 and below 1", a.ProductFraction.Value)
				} else {
					az.ProductFraction = v
					echo(field+".product_fraction", a.ProductFraction, fmt.Sprintf("azeotrope at %.4g %% product by mass", v*100))
				}
			}
		}
		if a.BoilingPoint.Set {
			if v, ok := c.quantity(a.BoilingPoint, field+".boiling_point", units.Temperature); ok {
				if v < minBoilingK || v > maxBoilingK {
					c.add(a.BoilingPoint.Line, field+".boiling_point", "%q is outside −173 °C to 727 °C; write the azeotrope's normal boiling point, e.g. \"78.2 C\"", a.BoilingPoint.Value)
				} else {
					az.BoilingPointK = v
					echo(field+".boiling_point", a.BoilingPoint, fmt.Sprintf("the azeotrope boils at %.1f °C at 1 atm", v-273.15))
				}
			}
		}
		d.Azeotrope = az
	}

	// Stills.
	for i, t := range r.StillSizes {
		field := fmt.Sprintf("%s.still_sizes[%d]", sec, i)
		if v, ok := c.quantity(t, field, units.Volume); ok {
			if !(v > 0) || v > 10 {
				c.add(t.Line, field, "%q: write a still (flask) volume above 0 and at most 10 m³, e.g. \"2 L\"", t.Value)
				continue
			}
			d.StillsM3 = append(d.StillsM3, v)
		}
	}
	sort.Float64s(d.StillsM3)
	if len(d.StillsM3) > 0 {
		var parts []string
		for _, v := range d.StillsM3 {
			parts = append(parts, units.FormatVolume(v))
		}
		s.Inputs = append(s.Inputs, Input{Field: sec + ".still_sizes", Written: strings.Join(parts, ", "), Meaning: "still (flask) volumes available"})
	}
	if r.FillLimit.Set {
		if v, ok := c.fraction(r.FillLimit, sec+".fill_limit", 0, 1, `the highest fill of a still, above 0 and at most 1, e.g. "60 %"`); ok {
			if v <= 0 {
				c.add(r.FillLimit.Line, sec+".fill_limit", "%s: a still must hold something; write a fill above 0 and at most 1, e.g. \"60 %%\"", r.FillLimit.Value)
			} else {
				d.FillLimit = v
				echo(sec+".fill_limit", r.FillLimit, fmt.Sprintf("stills filled to at most %.4g %%", v*100))
			}
		}
	}

	// Rinse solvent.
	d.RinseSolvent = DefaultRinseSolvent
	if r.RinseSolvent.Set {
		if sv, ok := s.Solvents.Find(r.RinseSolvent.Value); ok {
			d.RinseSolvent = sv.ID
			echo(sec+".rinse_solvent", r.RinseSolvent, sv.ID+" rinses the still and column")
		} else {
			c.add(r.RinseSolvent.Line, sec+".rinse_solvent", "unknown solvent %q; %s", r.RinseSolvent.Value, knownSolvents(s.Solvents))
		}
	} else {
		s.Inputs = append(s.Inputs, Input{Field: sec + ".rinse_solvent", Written: "(not given)", Meaning: DefaultRinseSolvent + " rinses the still and column"})
	}
}

// compound reads the product or the key impurity into out. It reports
// whether the compound was read without problems.
func (c *collector) compound(r *rawCompound, out *Compound, field string, line, secLine int, isProduct bool, s *Scenario, echo func(string, Text, string)) bool {
	n := len(c.list)
	what := "product"
	if !isProduct {
		what = "key impurity"
	}
	if r == nil {
		c.add(secLine, field, "missing; describe the %s by a known solvent (solvent: toluene) or by its properties (boiling_point: \"185 C\", molar_mass: \"150 g/mol\", ...)", what)
		return false
	}
	c.unknown(r.Extra, field, rawCompound{})
	out.Line = line
	out.Name = what
	if r.Name.Set && r.Name.Value != "" {
		out.Name = r.Name.Value
	}
	described := r.BoilingPoint.Set || r.Antoine != nil || r.HVap.Set || r.MolarMass.Set || r.Cp.Set || r.Density.Set || r.Halogenated.Set || r.Peroxide.Set

	if r.Solvent.Set {
		if described {
			c.add(r.Solvent.Line, field, "gives both a solvent (%s) and properties; write either solvent: for a known solvent, or the properties of a compound, not both", r.Solvent.Value)
			return false
		}
		sv, ok := s.Solvents.Find(r.Solvent.Value)
		if !ok {
			c.add(r.Solvent.Line, field+".solvent", "unknown compound %q; %s; or describe the compound by boiling_point, molar_mass and the other properties", r.Solvent.Value, knownSolvents(s.Solvents))
			return false
		}
		out.Solvent = sv.ID
		out.Data = sv
		out.MolarMass = sv.MolarMass()
		out.HVapGiven = true
		if !r.Name.Set {
			out.Name = sv.ID
		}
		echo(field+".solvent", r.Solvent, fmt.Sprintf("%s, boiling at %.1f °C", sv.ID, sv.BoilingPoint.V-273.15))
		return true
	}

	if !r.BoilingPoint.Set && r.Antoine == nil {
		c.add(line, field, "missing data; write solvent: for a known solvent, or the %s's normal boiling point (boiling_point: \"185 C\") or its Antoine constants (antoine: {a, b, c, t_min, t_max})", what)
		return false
	}
	src := r.Source.Value
	if src == "" {
		src = "given in the scenario, no source stated"
	}
	prop := func(v float64) solvent.Prop { return solvent.Prop{V: v, Source: src, Mark: source.Override} }
	sv := solvent.Solvent{ID: strings.ToLower(out.Name)}
	positive := func(t Text, name string, dim units.Dim, lo, hi float64, example string) float64 {
		v, ok := c.quantity(t, field+"."+name, dim)
		if !ok {
			return 0
		}
		if !(v > lo) || v > hi {
			c.add(t.Line, field+"."+name, "%q is outside the plausible range; write %s", t.Value, example)
			return 0
		}
		return v
	}

	// Antoine constants, checked as package solvent would check them.
	if a := r.Antoine; a != nil {
		sv.Antoine = []solvent.Antoine{c.antoine(a, field+".antoine", line, src)}
	}

	// Normal boiling point: given, or from the Antoine constants.
	if r.BoilingPoint.Set {
		sv.BoilingPoint = prop(c.boilingPoint(r, field, isProduct, s))
	}
	if len(c.list) > n {
		return false
	}
	if len(sv.Antoine) == 1 {
		a := sv.Antoine[0]
		tb := a.Temperature(solvent.StandardPressure)
		if !r.BoilingPoint.Set {
			if math.IsNaN(tb) || tb < minBoilingK || tb > maxBoilingK {
				c.add(line, field+".antoine", "the constants give no normal boiling point between −173 °C and 727 °C; check them, or give boiling_point")
				return false
			}
			sv.BoilingPoint = solvent.Prop{V: tb, Source: "from the Antoine constants at 101.325 kPa (" + src + ")", Mark: source.Derived}
		} else if !math.IsNaN(tb) && tb > a.Tmin-20 && tb < a.Tmax+20 && math.Abs(tb-sv.BoilingPoint.V) > 5 {
			// Only where the constants reach near 1 atm: a fit far below it
			// may extrapolate poorly, which is not an input error.
			c.add(r.BoilingPoint.Line, field+".boiling_point", "%s disagrees with the Antoine constants, which give %.1f °C at 1 atm; the two must agree within 5 K: check both", r.BoilingPoint.Value, tb-273.15)
			return false
		}
	}
	if r.HVap.Set {
		sv.HVap = prop(positive(r.HVap, "enthalpy_of_vaporization", units.MolarEnergy, 1000, 300e3, `the enthalpy of vaporization at the normal boiling point, e.g. "45 kJ/mol"`))
		out.HVapGiven = true
	}
	if r.MolarMass.Set {
		out.MolarMass = positive(r.MolarMass, "molar_mass", units.MolarMass, 1e-3, 5, `the molar mass, e.g. "150.2 g/mol"`)
	} else if isProduct {
		c.add(line, field+".molar_mass", "missing; write the product's molar mass, e.g. \"150.2 g/mol\" (needed for mole fractions and heat of vaporization)")
	}
	if r.Cp.Set {
		sv.Cp = prop(positive(r.Cp, "heat_capacity", units.MolarHeatCapacity, 0, 5000, `the liquid molar heat capacity, e.g. "250 J/(mol K)"`))
	}
	if r.Density.Set {
		sv.Density = prop(positive(r.Density, "density", units.Density, 100, 5000, `the liquid density, e.g. "1.05 g/mL"`))
	}
	sv.Halogenated = c.boolean(r.Halogenated, field+".halogenated")
	sv.PeroxideFormer = c.boolean(r.Peroxide, field+".peroxide_former")
	out.Data = sv
	if len(c.list) > n {
		return false
	}
	how := fmt.Sprintf("boils at %.1f °C at 1 atm", sv.BoilingPoint.V-273.15)
	if len(sv.Antoine) == 1 {
		how += fmt.Sprintf("; Antoine constants valid %.1f–%.1f °C", sv.Antoine[0].Tmin-273.15, sv.Antoine[0].Tmax-273.15)
	}
	if r.BoilingPoint.Set {
		echo(field+".boiling_point", r.BoilingPoint, how)
	} else {
		s.Inputs = append(s.Inputs, Input{Field: field + ".antoine", Written: fmt.Sprintf("A %g, B %g, C %g", sv.Antoine[0].A, sv.Antoine[0].B, sv.Antoine[0].C), Meaning: how})
	}
	if !out.HVapGiven {
		basis := "Trouton's rule (88 J/(mol K) × the normal boiling point)"
		if len(sv.Antoine) == 1 {
			basis = "the slope of the Antoine equation at the normal boiling point (Clapeyron)"
		}
		s.Inputs = append(s.Inputs, Input{Field: field + ".enthalpy_of_vaporization", Written: "(not given)", Meaning: "estimated from " + basis})
	}
	if !r.Halogenated.Set {
		s.Inputs = append(s.Inputs, Input{Field: field + ".halogenated", Written: "(not given)", Meaning: "taken as non-halogenated (waste class)"})
	}
	return true
}

// antoine reads a compound's Antoine constants at field af, checked as
// package solvent would check them; line is the compound's line for
// missing fields and src their source.
func (c *collector) antoine(a *rawAntoine, af string, line int, src string) solvent.Antoine {
	c.unknown(a.Extra, af, rawAntoine{})
	num := func(t Text, name string) float64 {
		if !c.required(t, line, af+"."+name, "the Antoine constant as a plain number (log10(P/bar) = A − B/(T/K + C))") {
			return math.NaN()
		}
		v, err := strconv.ParseFloat(t.Value, 64)
		if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
			c.add(t.Line, af+"."+name, "%q: write the Antoine constant as a plain number (log10(P/bar) = A − B/(T/K + C), T in K)", t.Value)
			return math.NaN()
		}
		return v
	}
	ant := solvent.Antoine{A: num(a.A, "a"), B: num(a.B, "b"), C: num(a.C, "c"), Source: src, Mark: source.Override}
	okT := c.required(a.Tmin, line, af+".t_min", `the lowest temperature of the constants' valid range, e.g. "50 C"`)
	okT = c.required(a.Tmax, line, af+".t_max", `the highest temperature of the constants' valid range, e.g. "180 C"`) && okT
	if okT {
		var ok1, ok2 bool
		ant.Tmin, ok1 = c.quantity(a.Tmin, af+".t_min", units.Temperature)
		ant.Tmax, ok2 = c.quantity(a.Tmax, af+".t_max", units.Temperature)
		if ok1 && ok2 && !(ant.Tmin > 0 && ant.Tmin < ant.Tmax) {
			c.add(a.Tmax.Line, af+".t_max", "the valid range %s to %s is empty; write t_min below t_max", a.Tmin.Value, a.Tmax.Value)
		}
	}
	if !math.IsNaN(ant.B) && ant.B <= 0 {
		c.add(a.B.Line, af+".b", "B = %g; want B > 0 (the vapour pressure rises with temperature only for B > 0)", ant.B)
	}
	if !math.IsNaN(ant.C) && ant.Tmin > 0 && ant.Tmin+ant.C <= 0 {
		c.add(a.C.Line, af+".c", "C = %g K puts the pole of the equation (T = −C) at or above t_min; want t_min + C > 0 with T in K (constants for T in °C must be converted: C(K) = C(°C) − 273.15)", ant.C)
	}
	return ant
}
