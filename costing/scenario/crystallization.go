package scenario

import (
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"go.yaml.in/yaml/v3"

	"sepcost/costing/solubility"
	"sepcost/costing/solvent"
	"sepcost/costing/units"
)

// The crystallization: section of a scenario (see templates/scenario.yaml).
//
//	crystallization:
//	  solvent: ethanol
//	  anti_solvent: water              # optional, with anti_solvent_fraction
//	  anti_solvent_fraction: 0.3       # volume fraction of the liquid
//	  product:
//	    solubility: {"0 C": "15 g/L", "75 C": "160 g/L"}
//	    # or, when none was measured:
//	    # melting_point: "142 C"
//	    # enthalpy_of_fusion: "27 kJ/mol"
//	    # molar_mass: "241.3 g/mol"
//	    # activity_factor: 1.5
//	  impurity:
//	    solubility: {"0 C": "8 g/L", "75 C": "60 g/L"}   # same forms as product
//	    # or purge_factor: 0.8
//	    distribution_coefficient: 0.05 # measured uptake by the crystals, 0–1
//	    fraction: 0.10                 # of the crude; default crude.nearest_impurity, else all impurities
//	  dissolve_at: "75 C"
//	  isolate_at: "0 C"
//	  target_purity: 0.995
//	  excess_solvent: "10 %"
//	  wash_cake_volumes: 2             # or wash_fraction: "15 %"
//	  wash_loss: "2 %"                 # optional: stated loss instead of a saturated wash
//	  second_crop: {concentrate_to: "30 %", purity: 0.97}
//	  screening_time: "8 h"
//	  screening_material: "2 g"
//	  vessels:
//	    flasks: ["250 mL", "1 L", "5 L"]
//	    reactors: ["20 L", "100 L"]
//	    fill_limit: 0.7

type rawCryst struct {
	Solvent           Text              `yaml:"solvent"`
	AntiSolvent       Text              `yaml:"anti_solvent"`
	AntiFraction      Text              `yaml:"anti_solvent_fraction"`
	Product           *rawCrystSolute   `yaml:"product"`
	Impurity          *rawCrystSolute   `yaml:"impurity"`
	DissolveAt        Text              `yaml:"dissolve_at"`
	IsolateAt         Text              `yaml:"isolate_at"`
	TargetPurity      Text              `yaml:"target_purity"`
	Excess            Text              `yaml:"excess_solvent"`
	WashCakeVolumes   Text              `yaml:"wash_cake_volumes"`
	WashFraction      Text              `yaml:"wash_fraction"`
	WashLoss          Text              `yaml:"wash_loss"`
	SecondCrop        *rawCrystCrop     `yaml:"second_crop"`
	ScreeningTime     Text              `yaml:"screening_time"`
	ScreeningMaterial Text              `yaml:"screening_material"`
	Vessels           *rawCrystVessels  `yaml:"vessels"`
	Extra             map[string]rawAny `yaml:",inline"`
}

type rawCrystSolute struct {
	Solubility       map[string]Text   `yaml:"solubility"`
	MeltingPoint     Text              `yaml:"melting_point"`
	EnthalpyOfFusion Text              `yaml:"enthalpy_of_fusion"`
	MolarMass        Text              `yaml:"molar_mass"`
	ActivityFactor   Text              `yaml:"activity_factor"`
	Fraction         Text              `yaml:"fraction"`
	PurgeFactor      Text              `yaml:"purge_factor"`
	Distribution     Text              `yaml:"distribution_coefficient"`
	Extra            map[string]rawAny `yaml:",inline"`
}

type rawCrystCrop struct {
	ConcentrateTo Text              `yaml:"concentrate_to"`
	Purity        Text              `yaml:"purity"`
	Extra         map[string]rawAny `yaml:",inline"`
}

type rawCrystVessels struct {
	Flasks    []Text            `yaml:"flasks"`
	Reactors  []Text            `yaml:"reactors"`
	FillLimit Text              `yaml:"fill_limit"`
	Extra     map[string]rawAny `yaml:",inline"`
}

// Crystallization describes a cooling recrystallization of the product from
// a solvent or a solvent/anti-solvent pair. Quantities are SI; optional
// settings are nil when the scenario leaves them to the model's defaults
// (the crystallization.* coefficients).
type Crystallization struct {
	Mix          Mix     // the crystallization liquid by volume fraction
	Solvent      string  // solvent id
	AntiSolvent  string  // anti-solvent id; "" for none
	AntiFraction float64 // anti-solvent volume fraction of the liquid; 0 for none

	// Properties of the liquid, from the solvent data.
	BoilingK      float64 // boiling point at 101.325 kPa, K (ideal-solution bubble point for a pair)
	NSolvent      float64 // amount of solvent per volume of solvent, mol/m³ (solubility.MolarDensity)
	LiquidDensity float64 // kg/m³, volume-weighted (ideal mixing)

	Product          CrystSolute
	Impurity         CrystSolute // Curve undefined when ImpurityByPurge
	ImpurityByPurge  bool        // the impurity is described by PurgeFactor, not by its solubility
	PurgeFactor      float64     // fraction of the impurity removed per pass, 0–1
	ImpurityFraction float64     // mass fraction of the crude that is this impurity
	Distribution     *float64    // measured logarithmic distribution coefficient λ of the impurity, 0–1; nil for the default

	DissolveK    float64 // dissolution temperature, K
	IsolateK     float64 // isolation (filtration) temperature, K
	TargetPurity float64 // wanted mass fraction of product in the dried crystals, ≤ 1

	Excess          *float64 // solvent above the saturation volume at DissolveK, fraction
	WashCakeVolumes *float64 // wash volume in cake volumes
	WashFraction    *float64 // wash volume as a fraction of the crystallization solvent
	WashLoss        *float64 // stated fraction of the crystals dissolved by the washes
	SecondCrop      *CrystSecondCrop
	ScreeningS      *float64 // one-time screening and development time, s
	ScreeningKg     *float64 // one-time crude used in screening, kg

	FlasksM3   []float64 // available flask volumes, m³, ascending; nil for the defaults
	ReactorsM3 []float64 // available jacketed reactor volumes, m³, ascending
	FillLimit  *float64  // largest share of a vessel's volume the batch may fill

	impurityFollows bool // impurity.fraction was not written: it follows crude.nearest_impurity or 1 − purity
}

// CrystSolute is the product or the impurity in the crystallization liquid.
type CrystSolute struct {
	Curve     solubility.Curve
	MolarMass float64 // kg/mol; 0 when not given
	MeltingK  float64 // K; 0 when not given
}

// CrystSecondCrop is a second crop taken from the mother liquor of the
// last pass by evaporating it down and cooling again.
type CrystSecondCrop struct {
	ConcentrateTo float64 // share of the mother-liquor volume left after evaporation, 0–1 exclusive
	Purity        float64 // mass fraction of product in the second crop
}

// Solvents lists the ids of the solvents the crystallization uses, sorted.
func (c *Crystallization) Solvents() []string {
	if c == nil {
		return nil
	}
	ids := make([]string, 0, len(c.Mix))
	for _, p := range c.Mix {
		ids = append(ids, p.Solvent)
	}
	sort.Strings(ids)
	return ids
}

// boilingTolerance is how far (K) a dissolution temperature may lie above
// the boiling point before it is refused: a solution at reflux is written
// at the boiling point, rounded ("100 C" for water, which boils at
// 99.97 °C by IAPWS-IF97).
const boilingTolerance = 0.5

// crystRead is the reading of one crystallization section: the collector
// of problems, the raw section, the scenario read so far and what is built.
type crystRead struct {
	c    *collector
	r    *rawCryst
	s    *Scenario
	root *yaml.Node
	echo func(string, Text, string)
	line int
	cr   *Crystallization
}

const crystSec = "crystallization"

func (c *collector) crystallization(r *rawCryst, s *Scenario, root *yaml.Node, echo func(string, Text, string)) *Crystallization {
	c.unknown(r.Extra, crystSec, rawCryst{})
	x := &crystRead{c: c, r: r, s: s, root: root, echo: echo, line: keyLine(root, crystSec), cr: &Crystallization{}}
	x.liquid()
	x.temperatures()
	x.product()
	x.impurity()
	x.targetPurity()
	x.options()
	x.vessels()
	return x.cr
}

// notGiven records a field left to the model's default.
func (x *crystRead) notGiven(name, meaning string) {
	x.s.Inputs = append(x.s.Inputs, Input{Field: crystSec + "." + name, Written: "(not given)", Meaning: meaning})
}

// liquid reads the solvent or solvent/anti-solvent pair and the liquid's properties.
func (x *crystRead) liquid() {
	const sec = crystSec
	c, r, s, echo, line, cr := x.c, x.r, x.s, x.echo, x.line, x.cr
	var liquid []solvent.Solvent
	if c.required(r.Solvent, line, sec+".solvent", "the crystallization solvent, e.g. ethanol (`sepcost solvents` lists them)") {
		if sv, ok := s.Solvents.Find(r.Solvent.Value); ok {
			cr.Solvent = sv.ID
			liquid = append(liquid, sv)
		} else {
			c.add(r.Solvent.Line, sec+".solvent", "unknown solvent %q; %s", r.Solvent.Value, knownSolvents(s.Solvents))
		}
	}
	if r.AntiSolvent.Set {
		if sv, ok := s.Solvents.Find(r.AntiSolvent.Value); !ok {
			c.add(r.AntiSolvent.Line, sec+".anti_solvent", "unknown solvent %q; %s", r.AntiSolvent.Value, knownSolvents(s.Solvents))
		} else if sv.ID == cr.Solvent {
			c.add(r.AntiSolvent.Line, sec+".anti_solvent", "%q is the solvent itself; name a different anti-solvent or leave anti_solvent out", r.AntiSolvent.Value)
		} else {
			cr.AntiSolvent = sv.ID
			liquid = append(liquid, sv)
		}
		const what = `the anti-solvent's volume fraction of the crystallization liquid, above 0 and below 1, e.g. 0.3 or "30 %"`
		if c.required(r.AntiFraction, r.AntiSolvent.Line, sec+".anti_solvent_fraction", what) {
			if v, ok := c.fraction(r.AntiFraction, sec+".anti_solvent_fraction", 0, 1, what); ok {
				if v <= 0 || v >= 1 {
					c.add(r.AntiFraction.Line, sec+".anti_solvent_fraction", "%s is outside 0–1 (exclusive): at 0 there is no anti-solvent and at 1 no solvent; write %s", r.AntiFraction.Value, what)
				} else {
					cr.AntiFraction = v
				}
			}
		}
	} else if r.AntiFraction.Set {
		c.add(r.AntiFraction.Line, sec+".anti_solvent_fraction", "given without anti_solvent; name the anti-solvent too, or leave the fraction out")
	}
	liquidOK := len(liquid) == 1 && !r.AntiSolvent.Set || len(liquid) == 2 && cr.AntiFraction > 0
	if liquidOK {
		fr := []float64{1}
		cr.Mix = Mix{{Solvent: liquid[0].ID, Fraction: 1}}
		if len(liquid) == 2 {
			fr = []float64{1 - cr.AntiFraction, cr.AntiFraction}
			cr.Mix = Mix{{Solvent: liquid[0].ID, Fraction: fr[0]}, {Solvent: liquid[1].ID, Fraction: fr[1]}}
		}
		rho := make([]float64, len(liquid))
		mm := make([]float64, len(liquid))
		for i, sv := range liquid {
			rho[i], mm[i] = sv.Density.V, sv.MolarMass()
			cr.LiquidDensity += fr[i] * rho[i]
		}
		cr.NSolvent = solubility.MolarDensity(fr, rho, mm)
		cr.BoilingK = bubblePoint(liquid, fr)
		echo(sec+".solvent", r.Solvent, fmt.Sprintf("%s; the liquid boils at about %.1f °C", cr.Mix, cr.BoilingK-273.15))
	}

}

// temperatures reads the dissolution and isolation temperatures.
func (x *crystRead) temperatures() {
	const sec = crystSec
	c, r, echo, line, cr := x.c, x.r, x.echo, x.line, x.cr
	temp := func(t Text, name, what string) float64 {
		field := sec + "." + name
		if !c.required(t, line, field, what) {
			return 0
		}
		v, ok := c.quantity(t, field, units.Temperature)
		if !ok {
			return 0
		}
		if v <= 0 {
			c.add(t.Line, field, "%q is at or below absolute zero; write %s", t.Value, what)
			return 0
		}
		return v
	}
	cr.DissolveK = temp(r.DissolveAt, "dissolve_at", `the temperature the crude is dissolved at, e.g. "75 C" (at most the solvent's boiling point)`)
	cr.IsolateK = temp(r.IsolateAt, "isolate_at", `the temperature the crystals are filtered at, e.g. "0 C"`)
	if cr.DissolveK > 0 && cr.IsolateK > 0 && cr.IsolateK >= cr.DissolveK {
		c.add(r.IsolateAt.Line, sec+".isolate_at", "%s is not below dissolve_at (%s); a cooling crystallization isolates below the dissolution temperature", r.IsolateAt.Value, r.DissolveAt.Value)
	}
	if cr.DissolveK > 0 && cr.BoilingK > 0 && cr.DissolveK > cr.BoilingK+boilingTolerance {
		c.add(r.DissolveAt.Line, sec+".dissolve_at", "%s is above the boiling point of %s (about %.1f °C at 1 atm); write a temperature at or below it (dissolution at reflux at most), or choose a higher-boiling solvent", r.DissolveAt.Value, cr.Mix, cr.BoilingK-273.15)
	} else if cr.DissolveK > 0 {
		echo(sec+".dissolve_at", r.DissolveAt, fmt.Sprintf("%.2f K, dissolve at %.1f °C", cr.DissolveK, cr.DissolveK-273.15))
	}
	if cr.IsolateK > 0 {
		echo(sec+".isolate_at", r.IsolateAt, fmt.Sprintf("%.2f K, filter at %.1f °C", cr.IsolateK, cr.IsolateK-273.15))
	}

}

// product reads the product's solubility and checks it across the two temperatures.
func (x *crystRead) product() {
	const sec = crystSec
	c, r, s, root, echo, line, cr := x.c, x.r, x.s, x.root, x.echo, x.line, x.cr
	if r.Product == nil {
		c.add(line, sec+".product", `missing; give the product's solubility at two or more temperatures, e.g. solubility: {"0 C": "15 g/L", "75 C": "160 g/L"}, or its melting_point, enthalpy_of_fusion and molar_mass`)
	} else {
		field := sec + ".product"
		pl := keyLine(root, sec, "product")
		if r.Product.Fraction.Set {
			c.add(r.Product.Fraction.Line, field+".fraction", "only the impurity takes a fraction; the product's share of the crude is crude.purity")
		}
		if r.Product.Distribution.Set {
			c.add(r.Product.Distribution.Line, field+".distribution_coefficient", "only the impurity takes a distribution_coefficient (its uptake by the product's crystals)")
		}
		if r.Product.PurgeFactor.Set {
			c.add(r.Product.PurgeFactor.Line, field+".purge_factor", "only the impurity takes a purge_factor; describe the product by its solubility or melting data")
		}
		var sl int
		cr.Product, sl = c.crystSolute(r.Product, field, pl, cr.NSolvent, s, echo)
		if !cr.Product.Curve.Defined() && sl == 0 {
			c.add(pl, field+".solubility", `missing; give the product's solubility at two or more temperatures, e.g. {"0 C": "15 g/L", "75 C": "160 g/L"}, or its melting_point, enthalpy_of_fusion and molar_mass for an ideal-solubility estimate`)
		}
		if p := cr.Product; p.Curve.Defined() && cr.DissolveK > 0 && cr.IsolateK > 0 {
			if p.Curve.Ideal != nil && cr.DissolveK >= p.MeltingK {
				c.add(r.DissolveAt.Line, sec+".dissolve_at", "%s is at or above the product's melting point (%.1f °C): it would melt and oil out rather than dissolve; dissolve below the melting point", r.DissolveAt.Value, p.MeltingK-273.15)
			} else {
				hot, cold := p.Curve.At(cr.DissolveK), p.Curve.At(cr.IsolateK)
				if math.IsInf(hot, 0) || !(cold > 0) {
					c.add(sl, field+".solubility", "the solubility comes out as %.4g g/L at dissolve_at (%s) and %.4g g/L at isolate_at (%s), outside any usable range; check the values and temperatures", hot, r.DissolveAt.Value, cold, r.IsolateAt.Value)
				} else if !(hot > cold) {
					c.add(sl, field+".solubility", "the solubility at dissolve_at (%s: %.4g g/L) is not above that at isolate_at (%s: %.4g g/L); a cooling crystallization needs a solubility that rises with temperature: check the values and temperatures", r.DissolveAt.Value, hot, r.IsolateAt.Value, cold)
				} else {
					s.Inputs = append(s.Inputs, Input{Field: field + ".solubility", Written: "(at the two temperatures)", Meaning: fmt.Sprintf("%.4g g/L at %s, %.4g g/L at %s", hot, r.DissolveAt.Value, cold, r.IsolateAt.Value)})
				}
			}
		}
	}
}

// impurity reads the impurity: its solubility or purge factor, its uptake by the crystals and its share of the crude.
func (x *crystRead) impurity() {
	const sec = crystSec
	c, r, s, root, echo, line, cr := x.c, x.r, x.s, x.root, x.echo, x.line, x.cr
	if r.Impurity == nil {
		c.add(line, sec+".impurity", `missing; give the impurity's solubility (same forms as the product) or a purge_factor, the fraction of it removed per pass, e.g. purge_factor: 0.8`)
	} else {
		field := sec + ".impurity"
		il := keyLine(root, sec, "impurity")
		var sl int
		cr.Impurity, sl = c.crystSolute(r.Impurity, field, il, cr.NSolvent, s, echo)
		defined := cr.Impurity.Curve.Defined() || sl != 0
		if r.Impurity.PurgeFactor.Set {
			if defined {
				c.add(r.Impurity.PurgeFactor.Line, field+".purge_factor", "give either the impurity's solubility (or melting data) or a purge_factor, not both")
			}
			const what = `the fraction of the impurity removed per pass, from 0 to 1, e.g. 0.8 or "80 %"`
			if v, ok := c.fraction(r.Impurity.PurgeFactor, field+".purge_factor", 0, 1, what); ok {
				cr.PurgeFactor, cr.ImpurityByPurge = v, true
				echo(field+".purge_factor", r.Impurity.PurgeFactor, fmt.Sprintf("%.3g %% of the impurity removed per pass", v*100))
			}
		} else if !defined {
			c.add(il, field, `give the impurity's solubility (same forms as the product) or a purge_factor, the fraction of it removed per pass, e.g. purge_factor: 0.8`)
		}
		if t := r.Impurity.Distribution; t.Set {
			const what = `the impurity's logarithmic distribution coefficient between crystals and liquor, from 0 (rejected) to 1 (no separation), e.g. 0.05`
			if r.Impurity.PurgeFactor.Set {
				c.add(t.Line, field+".distribution_coefficient", "a purge_factor already says how much of the impurity stays; give one or the other")
			} else if v, ok := c.fraction(t, field+".distribution_coefficient", 0, 1, what); ok {
				cr.Distribution = &v
				echo(field+".distribution_coefficient", t, fmt.Sprintf("λ = %.3g: ln(I₀/I) = λ·ln(P₀/P) in the liquor", v))
			}
		} else if !r.Impurity.PurgeFactor.Set {
			s.Inputs = append(s.Inputs, Input{Field: field + ".distribution_coefficient", Written: "(not given)", Meaning: "the model default (crystallization.impurity_distribution), an assumption"})
		}
		rest := 1 - s.Purity
		if r.Impurity.Fraction.Set {
			what := fmt.Sprintf("the mass fraction of the crude that is this impurity, above 0 and at most 1 − purity (%.3g)", rest)
			if v, ok := c.fraction(r.Impurity.Fraction, field+".fraction", 0, 1, what); ok {
				if v <= 0 || (s.Purity > 0 && v > rest+1e-9) {
					c.add(r.Impurity.Fraction.Line, field+".fraction", "%s is outside the valid range; write %s", r.Impurity.Fraction.Value, what)
				} else {
					cr.ImpurityFraction = v
					echo(field+".fraction", r.Impurity.Fraction, fmt.Sprintf("%.3g %% of the crude; other impurities stay in the mother liquor", v*100))
				}
			}
		} else if s.NearestGiven {
			cr.ImpurityFraction, cr.impurityFollows = s.NearestImpurity, true
			s.Inputs = append(s.Inputs, Input{Field: field + ".fraction", Written: "(not given)", Meaning: fmt.Sprintf("crude.nearest_impurity, %.3g %% of the crude; other impurities stay in the mother liquor", s.NearestImpurity*100)})
		} else if s.Purity > 0 {
			cr.ImpurityFraction, cr.impurityFollows = rest, true
			s.Inputs = append(s.Inputs, Input{Field: field + ".fraction", Written: "(not given)", Meaning: fmt.Sprintf("all impurities (%.3g %%) behave like this one: the cautious case (crude.nearest_impurity not given either)", rest*100)})
		}
	}

}

// targetPurity reads the wanted purity.
func (x *crystRead) targetPurity() {
	const sec = crystSec
	c, r, s, echo, line, cr := x.c, x.r, x.s, x.echo, x.line, x.cr
	const purityWhat = `the wanted mass fraction of product in the dried crystals, above the crude's purity and at most 1, e.g. 0.995 or "99.5 %"`
	if c.required(r.TargetPurity, line, sec+".target_purity", purityWhat) {
		if v, ok := c.fraction(r.TargetPurity, sec+".target_purity", 0, 1, purityWhat); ok {
			if s.Purity > 0 && v <= s.Purity {
				c.add(r.TargetPurity.Line, sec+".target_purity", "%s is not above the crude's purity (%.4g): there is nothing to purify; write %s", r.TargetPurity.Value, s.Purity, purityWhat)
			} else {
				cr.TargetPurity = v
				echo(sec+".target_purity", r.TargetPurity, fmt.Sprintf("%.4g %% product", v*100))
			}
		}
	}

}

// options reads the optional procedure: excess solvent, wash, second crop and development effort.
func (x *crystRead) options() {
	const sec = crystSec
	c, r, s, root, echo, cr := x.c, x.r, x.s, x.root, x.echo, x.cr
	opt := func(t Text, name string, lo, hi float64, what, meaning string) *float64 {
		field := sec + "." + name
		if !t.Set {
			return nil
		}
		v, ok := c.fraction(t, field, lo, hi, what)
		if !ok {
			return nil
		}
		echo(field, t, fmt.Sprintf(meaning, v*100))
		return &v
	}
	notGiven := x.notGiven
	cr.Excess = opt(r.Excess, "excess_solvent", 0, 3, `the solvent above the saturation volume at dissolve_at, a fraction from 0 to 3, e.g. 0.1 or "10 %"`, "%.3g %% solvent above the saturation volume")
	if cr.Excess == nil && !r.Excess.Set {
		notGiven("excess_solvent", "the model default (crystallization.excess_solvent)")
	}
	if r.WashCakeVolumes.Set && r.WashFraction.Set {
		c.add(r.WashFraction.Line, sec+".wash_fraction", "give the wash either in cake volumes (wash_cake_volumes) or as a fraction of the solvent (wash_fraction), not both")
	}
	if t := r.WashCakeVolumes; t.Set {
		v, err := strconv.ParseFloat(t.Value, 64)
		if err != nil || !(v >= 0 && v <= 20) {
			c.add(t.Line, sec+".wash_cake_volumes", "%q: write the wash volume in cake volumes, a plain number from 0 to 20, e.g. 2", t.Value)
		} else {
			cr.WashCakeVolumes = &v
			echo(sec+".wash_cake_volumes", t, fmt.Sprintf("%.3g cake volumes of cold liquid", v))
		}
	}
	cr.WashFraction = opt(r.WashFraction, "wash_fraction", 0, 2, `the wash volume as a fraction of the crystallization solvent, from 0 to 2, e.g. 0.15 or "15 %"`, "wash %.3g %% of the solvent volume")
	if !r.WashCakeVolumes.Set && !r.WashFraction.Set {
		notGiven("wash_cake_volumes", "the model default (crystallization.wash_cake_volumes)")
	}
	cr.WashLoss = opt(r.WashLoss, "wash_loss", 0, 0.5, `the fraction of the crystals the washes dissolve, from 0 to 0.5, e.g. 0.02 or "2 %"`, "%.3g %% of the crystals dissolved by the washes")
	if r.SecondCrop != nil {
		field := sec + ".second_crop"
		c.unknown(r.SecondCrop.Extra, field, rawCrystCrop{})
		cl := keyLine(root, sec, "second_crop")
		crop := &CrystSecondCrop{}
		ok := true
		const concWhat = `the share of the mother-liquor volume left after evaporation, above 0 and below 1, e.g. "30 %"`
		if c.required(r.SecondCrop.ConcentrateTo, cl, field+".concentrate_to", concWhat) {
			v, good := c.fraction(r.SecondCrop.ConcentrateTo, field+".concentrate_to", 0, 1, concWhat)
			if good && (v <= 0 || v >= 1) {
				c.add(r.SecondCrop.ConcentrateTo.Line, field+".concentrate_to", "%s is outside the valid range; write %s", r.SecondCrop.ConcentrateTo.Value, concWhat)
				good = false
			}
			crop.ConcentrateTo, ok = v, ok && good
		} else {
			ok = false
		}
		const cropWhat = `the mass fraction of product in the second crop, above 0 and at most 1, e.g. 0.97`
		if c.required(r.SecondCrop.Purity, cl, field+".purity", cropWhat) {
			v, good := c.fraction(r.SecondCrop.Purity, field+".purity", 0, 1, cropWhat)
			if good && v <= 0 {
				c.add(r.SecondCrop.Purity.Line, field+".purity", "%s is outside the valid range; write %s", r.SecondCrop.Purity.Value, cropWhat)
				good = false
			}
			crop.Purity, ok = v, ok && good
		} else {
			ok = false
		}
		if ok {
			cr.SecondCrop = crop
			s.Inputs = append(s.Inputs, Input{Field: field, Written: r.SecondCrop.ConcentrateTo.Value + ", purity " + r.SecondCrop.Purity.Value,
				Meaning: fmt.Sprintf("mother liquor evaporated to %.3g %% of its volume; second crop %.4g %% product", crop.ConcentrateTo*100, crop.Purity*100)})
		}
	}
	nonNeg := func(t Text, name string, dim units.Dim, what string, show func(float64) string) *float64 {
		field := sec + "." + name
		if !t.Set {
			notGiven(name, "the model default (crystallization."+name+")")
			return nil
		}
		r, ok := c.quantityRange(t, field, dim)
		if !ok {
			return nil
		}
		v := r.Nominal
		if name == "screening_time" && r.Lo() >= 0 {
			s.measure(field, t, "screening and development time", "h", KindEstimate, r, 0, math.Inf(1),
				func(s *Scenario, v float64) { s.Crystallization.ScreeningS = &v })
		} else if r.Half > 0 {
			c.add(t.Line, field, "%q: a range is read here only for screening_time; write one value", t.Value)
			return nil
		}
		if r.Lo() < 0 {
			c.add(t.Line, field, "%q is negative; write %s, zero or more", t.Value, what)
			return nil
		}
		echo(field, t, show(v))
		return &v
	}
	cr.ScreeningS = nonNeg(r.ScreeningTime, "screening_time", units.Time, `the one-time chemist time to find and develop the crystallization, e.g. "8 h"`,
		func(v float64) string { return fmt.Sprintf("%.3g h of development, once", v/3600) })
	cr.ScreeningKg = nonNeg(r.ScreeningMaterial, "screening_material", units.Mass, `the crude used once in screening, e.g. "2 g"`,
		func(v float64) string { return units.FormatMass(v) + " of crude used in screening, once" })

}

// vessels reads the site's vessels.
func (x *crystRead) vessels() {
	const sec = crystSec
	c, r, s, echo, cr := x.c, x.r, x.s, x.echo, x.cr
	if v := r.Vessels; v != nil {
		field := sec + ".vessels"
		c.unknown(v.Extra, field, rawCrystVessels{})
		list := func(ts []Text, name string) []float64 {
			var out []float64
			for i, t := range ts {
				f := fmt.Sprintf("%s.%s[%d]", field, name, i)
				if x, ok := c.quantity(t, f, units.Volume); ok {
					if x <= 0 {
						c.add(t.Line, f, "%q: write a vessel volume above zero, e.g. \"500 mL\" or \"20 L\"", t.Value)
						continue
					}
					out = append(out, x)
				}
			}
			sort.Float64s(out)
			return out
		}
		cr.FlasksM3 = list(v.Flasks, "flasks")
		cr.ReactorsM3 = list(v.Reactors, "reactors")
		if len(v.Flasks)+len(v.Reactors) > 0 {
			s.Inputs = append(s.Inputs, Input{Field: field, Written: fmt.Sprintf("%d flasks, %d reactors", len(cr.FlasksM3), len(cr.ReactorsM3)), Meaning: "the site's vessel sizes"})
		}
		const fillWhat = `the largest share of a vessel's volume a batch may fill, above 0 and at most 1, e.g. 0.7 or "70 %"`
		if v.FillLimit.Set {
			if x, ok := c.fraction(v.FillLimit, field+".fill_limit", 0, 1, fillWhat); ok {
				if x <= 0 {
					c.add(v.FillLimit.Line, field+".fill_limit", "%s is outside the valid range; write %s", v.FillLimit.Value, fillWhat)
				} else {
					cr.FillLimit = &x
					echo(field+".fill_limit", v.FillLimit, fmt.Sprintf("batches fill at most %.3g %% of a vessel", x*100))
				}
			}
		}
	} else {
		x.notGiven("vessels", "the model's default flasks and jacketed reactors (crystallization.flask_* and reactor_*)")
	}
}

// crystSolute reads a product or impurity description. It returns the
// solute and the line of its solubility description (0 when neither
// points nor melting data were given).
func (c *collector) crystSolute(r *rawCrystSolute, field string, line int, nSolvent float64, s *Scenario, echo func(string, Text, string)) (CrystSolute, int) {
	var out CrystSolute
	c.unknown(r.Extra, field, rawCrystSolute{})
	if r.MolarMass.Set {
		if v, ok := c.quantity(r.MolarMass, field+".molar_mass", units.MolarMass); ok {
			if v <= 0 {
				c.add(r.MolarMass.Line, field+".molar_mass", "%q: write a molar mass above zero, e.g. \"241.3 g/mol\"", r.MolarMass.Value)
			} else {
				out.MolarMass = v
				echo(field+".molar_mass", r.MolarMass, fmt.Sprintf("%.5g g/mol", v*1000))
			}
		}
	}
	melt := r.MeltingPoint.Set || r.EnthalpyOfFusion.Set || r.ActivityFactor.Set
	descLine := 0
	if len(r.Solubility) > 0 {
		keys := make([]string, 0, len(r.Solubility))
		for k := range r.Solubility {
			keys = append(keys, k)
		}
		sort.Strings(keys)
		var pts []solubility.Point
		var spread []measuredPoint
		ok := true
		for _, k := range keys {
			t := r.Solubility[k]
			f := fmt.Sprintf("%s.solubility[%s]", field, k)
			if descLine == 0 || t.Line < descLine {
				descLine = t.Line
			}
			T, err := units.ParseAs(k, units.Temperature)
			if err != nil {
				c.add(t.Line, f, "the temperature %q: %v", k, err)
				ok = false
				continue
			}
			const sWhat = `the solubility as mass of solute per volume of solvent, e.g. "45 g/L" or "45 mg/mL"`
			if t.Tag == "!!int" || t.Tag == "!!float" {
				c.add(t.Line, f, "%q has no unit; write %s", t.Value, sWhat)
				ok = false
				continue
			}
			rS, err := units.ParseRangeAs(t.Value, units.Density)
			if err != nil {
				c.add(t.Line, f, "%v (for %s)", err, sWhat)
				ok = false
				continue
			}
			S := rS.Nominal
			if !(T > 0) || !(rS.Lo() > 0) {
				c.add(t.Line, f, "%s at %s: write a solubility above zero at a temperature above absolute zero, as mass per volume of solvent, e.g. \"45 g/L\" or \"45 mg/mL\"", t.Value, k)
				ok = false
				continue
			}
			pts = append(pts, solubility.Point{T: T, S: S})
			spread = append(spread, measuredPoint{f, t, rS, fmt.Sprintf("solubility of the %s at %.4g °C", strings.TrimPrefix(field, "crystallization."), T-273.15)})
			echo(f, t, fmt.Sprintf("%.4g g per L of solvent at %.1f °C", S, T-273.15))
		}
		if melt {
			l := r.MeltingPoint.Line
			if l == 0 {
				l = r.EnthalpyOfFusion.Line
			}
			if l == 0 {
				l = r.ActivityFactor.Line
			}
			c.add(l, field, "give either measured solubility points or melting data (melting_point, enthalpy_of_fusion, activity_factor) for an ideal estimate, not both")
			ok = false
		}
		if ok {
			fit, err := solubility.Fit(pts)
			if err != nil {
				c.add(descLine, field+".solubility", "%v; write it as {\"0 C\": \"15 g/L\", \"75 C\": \"160 g/L\"}", err)
			} else {
				out.Curve = solubility.Curve{Points: pts, Fit: &fit}
				// The points are in the order measured here; Fit sorts its own copy.
				for i, m := range spread {
					s.measure(m.field, m.t, m.label, "g/L", KindSolubility, m.r, 0, math.Inf(1), setSolubility(field == "crystallization.product", i))
				}
			}
		}
		return out, descLine
	}
	if !melt {
		return out, 0
	}
	descLine = line
	ideal := solubility.Ideal{Gamma: 1}
	ok := true
	const mpWhat = `the melting point, e.g. "142 C"`
	if c.required(r.MeltingPoint, line, field+".melting_point", mpWhat+" (with enthalpy_of_fusion and molar_mass for an ideal-solubility estimate)") {
		descLine = r.MeltingPoint.Line
		if v, good := c.quantity(r.MeltingPoint, field+".melting_point", units.Temperature); good && v > 0 {
			ideal.Tm, out.MeltingK = v, v
			echo(field+".melting_point", r.MeltingPoint, fmt.Sprintf("%.2f K", v))
		} else {
			if good {
				c.add(r.MeltingPoint.Line, field+".melting_point", "%q: write %s", r.MeltingPoint.Value, mpWhat)
			}
			ok = false
		}
	} else {
		ok = false
	}
	const hWhat = `the enthalpy of fusion, above zero, e.g. "27 kJ/mol"`
	if c.required(r.EnthalpyOfFusion, line, field+".enthalpy_of_fusion", hWhat) {
		if v, good := c.quantity(r.EnthalpyOfFusion, field+".enthalpy_of_fusion", units.MolarEnergy); good && v > 0 {
			ideal.Hfus = v
			echo(field+".enthalpy_of_fusion", r.EnthalpyOfFusion, fmt.Sprintf("%.4g kJ/mol", v/1000))
		} else {
			if good {
				c.add(r.EnthalpyOfFusion.Line, field+".enthalpy_of_fusion", "%q: write %s", r.EnthalpyOfFusion.Value, hWhat)
			}
			ok = false
		}
	} else {
		ok = false
	}
	if out.MolarMass > 0 {
		ideal.M = out.MolarMass
	} else {
		if !r.MolarMass.Set {
			c.add(line, field+".molar_mass", `missing; the ideal-solubility estimate needs the molar mass, e.g. "241.3 g/mol"`)
		}
		ok = false
	}
	const gWhat = `the activity factor γ that divides the ideal mole-fraction solubility, a plain number above 0 (1 = ideal, 2 = half as soluble), e.g. 1.5`
	if t := r.ActivityFactor; t.Set {
		v, err := strconv.ParseFloat(t.Value, 64)
		if err != nil || !(v > 0) || math.IsInf(v, 0) {
			c.add(t.Line, field+".activity_factor", "%q: write %s", t.Value, gWhat)
			ok = false
		} else {
			ideal.Gamma = v
			echo(field+".activity_factor", t, fmt.Sprintf("x = x_ideal / %.3g", v))
		}
	} else {
		s.Inputs = append(s.Inputs, Input{Field: field + ".activity_factor", Written: "(not given)", Meaning: "1: ideal solution"})
	}
	if ok && nSolvent > 0 {
		ideal.NSolvent = nSolvent
		out.Curve = solubility.Curve{Ideal: &ideal}
	}
	return out, descLine
}

// bubblePoint is the boiling temperature (K) at 101.325 kPa of a liquid
// made up by volume fractions fr of the solvents ss. One solvent boils at
// its tabulated normal boiling point; a pair at its ideal-solution
// (Raoult's law) bubble point,
//
//	Σ x_i · p_i(T) = 101 325 Pa,  x_i = (φ_i ρ_i / M_i) / Σ_j (φ_j ρ_j / M_j)
//
// solved by solvent.BubblePoint; where that finds no root, the lower
// boiling point is taken (the cautious choice). Real pairs
// deviate (ethanol–water forms an azeotrope boiling at 78.2 °C, from
// memory); the check it serves allows for that by refusing only
// temperatures above the bubble point.
func bubblePoint(ss []solvent.Solvent, fr []float64) float64 {
	if len(ss) == 1 {
		return ss[0].BoilingPoint.V
	}
	x := make([]float64, len(ss))
	lowest := math.Inf(1)
	for i, s := range ss {
		x[i] = fr[i] * s.Density.V / s.MolarMass()
		lowest = math.Min(lowest, s.BoilingPoint.V)
	}
	if t := solvent.BubblePoint(ss, x, solvent.StandardPressure); !math.IsNaN(t) {
		return t
	}
	return lowest // cautious: the lower boiling point
}

// measuredPoint is one solubility point as read, recorded as measured once
// the curve through all the points is known to fit.
type measuredPoint struct {
	field string
	t     Text
	r     units.Range
	label string
}
