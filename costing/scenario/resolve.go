package scenario

import (
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"go.yaml.in/yaml/v3"

	"sepcost/costing/solvent"
	"sepcost/costing/units"
)

// mixTolerance is how far volume fractions may sum from 1 (rounding in a
// hand-written file such as 1/3 + 2/3 written as 0.33 + 0.67 passes).
const mixTolerance = 0.005

func resolve(c *collector, raw *rawScenario, root *yaml.Node) *Scenario {
	s := &Scenario{File: c.file, Solvents: solvent.Builtin()}
	c.unknown(raw.Extra, "", rawScenario{})
	echo := func(field string, t Text, meaning string) {
		s.Inputs = append(s.Inputs, Input{Field: field, Written: t.Value, Meaning: meaning})
	}

	if c.required(raw.Name, 1, "name", `a short title, e.g. "Amide 12, route B"`) {
		s.Name = raw.Name.Value
		echo("name", raw.Name, raw.Name.Value)
	}
	s.Product = raw.Product.Value
	s.Notes = raw.Notes.Value
	if raw.WasteSector.Set {
		// Resolved against the waste codes by costing.Prepare: the reader
		// does not depend on the classifier.
		s.WasteSector = Written{Text: raw.WasteSector.Value, Line: raw.WasteSector.Line}
		echo("waste_sector", raw.WasteSector, "the List of Waste chapter for the waste codes")
	}

	// Solvents first: the eluents may name them.
	for i, rs := range raw.Solvents {
		field := fmt.Sprintf("solvents[%d]", i)
		if sv, ok := c.solvent(rs, field, keyLine(root, "solvents")); ok {
			if err := s.Solvents.Add(sv); err != nil {
				c.add(rs.Name.Line, field, "%v", err)
			} else {
				echo(field, rs.Name, "user solvent "+sv.ID)
			}
		}
	}

	// Masses.
	if len(raw.Masses) == 0 {
		c.add(keyLine(root, "masses"), "masses", `missing; write a list of crude batch masses, e.g. ["250 mg", "20 g", "2 kg"]`)
	}
	if len(raw.Masses) > MaxMasses {
		c.add(keyLine(root, "masses"), "masses", "%d masses listed; at most %d are costed in one run", len(raw.Masses), MaxMasses)
		raw.Masses = nil
	}
	for i, t := range raw.Masses {
		field := fmt.Sprintf("masses[%d]", i)
		if v, ok := c.quantity(t, field, units.Mass); ok {
			if v <= 0 {
				c.add(t.Line, field, "%q must be above zero", t.Value)
				continue
			}
			if err := CheckBatchMass(v); err != nil {
				c.add(t.Line, field, "%q: %v", t.Value, err)
				continue
			}
			s.MassesKg = append(s.MassesKg, v)
			echo(field, t, units.FormatMass(v)+" of crude")
		}
	}
	sort.Float64s(s.MassesKg)
	if raw.TargetMass.Set {
		if v, ok := c.quantity(raw.TargetMass, "target_mass", units.Mass); ok {
			if v <= 0 {
				c.add(raw.TargetMass.Line, "target_mass", "%q must be above zero", raw.TargetMass.Value)
			} else if err := CheckBatchMass(v); err != nil {
				c.add(raw.TargetMass.Line, "target_mass", "%q: %v", raw.TargetMass.Value, err)
			}
			s.TargetKg = v
			echo("target_mass", raw.TargetMass, units.FormatMass(v)+" of crude")
		}
	} else if len(s.MassesKg) > 0 {
		s.TargetKg = s.MassesKg[len(s.MassesKg)-1]
		s.Inputs = append(s.Inputs, Input{Field: "target_mass", Written: "(not given)", Meaning: "the largest batch mass, " + units.FormatMass(s.TargetKg)})
	}

	// Crude.
	c.unknown(raw.Crude.Extra, "crude", rawCrude{})
	crudeLine := keyLine(root, "crude")
	if c.required(raw.Crude.Purity, crudeLine, "crude.purity", `the mass fraction of product in the crude, e.g. 0.85 or "85 %"`) {
		if r, ok := c.fractionRange(raw.Crude.Purity, "crude.purity", 0, 1, `a mass fraction above 0 and below 1, e.g. 0.85 or "85 %"`); ok {
			v := r.Nominal
			if r.Lo() <= 0 || r.Hi() >= 1 {
				c.add(raw.Crude.Purity.Line, "crude.purity", "%s leaves nothing to separate or no product; write a fraction above 0 and below 1", raw.Crude.Purity.Value)
			}
			s.Purity = v
			s.measure("crude.purity", raw.Crude.Purity, "purity of the crude", "", KindPurity, r, 0, 1, setPurity)
			echo("crude.purity", raw.Crude.Purity, fmt.Sprintf("%.3g %% product by mass", v*100))
		}
	}
	if raw.Crude.NearestImpurity.Set {
		if r, ok := c.fractionRange(raw.Crude.NearestImpurity, "crude.nearest_impurity", 0, 1, `a mass fraction of the crude, above 0 and at most 1 − purity`); ok {
			v := r.Nominal
			if r.Lo() <= 0 || (s.Purity > 0 && v > 1-s.Purity+1e-9) {
				c.add(raw.Crude.NearestImpurity.Line, "crude.nearest_impurity", "%s must be above 0 and at most 1 − purity (%.3g)", raw.Crude.NearestImpurity.Value, 1-s.Purity)
			}
			s.NearestImpurity, s.NearestGiven = v, true
			if r.Half > 0 { // no default spread: a share of the crude written exactly follows the purity's draw
				s.measure("crude.nearest_impurity", raw.Crude.NearestImpurity, "share of the crude running next to the product", "", KindPurity, r, 0, 1,
					func(s *Scenario, v float64) { s.NearestImpurity = v })
			}
			echo("crude.nearest_impurity", raw.Crude.NearestImpurity, fmt.Sprintf("%.3g %% of the crude runs next to the product", v*100))
		}
	} else if s.Purity > 0 {
		s.NearestImpurity = 1 - s.Purity
		s.Inputs = append(s.Inputs, Input{Field: "crude.nearest_impurity", Written: "(not given)", Meaning: fmt.Sprintf("all impurities (%.3g %%) taken to run next to the product: the cautious case", (1-s.Purity)*100)})
	}

	if raw.Chromatography != nil {
		s.Chromatography = c.chromatography(raw.Chromatography, s, root, echo)
	}
	if raw.Crystallization != nil {
		s.Crystallization = c.crystallization(raw.Crystallization, s, root, echo)
	}
	if raw.Distillation != nil {
		s.Distillation = c.distillation(raw.Distillation, s, root, echo)
	}

	if raw.Campaign != nil {
		s.Campaign = c.campaign(raw.Campaign, s, root, echo)
	}

	// Settings: checked against the models' coefficient tables later (costing.Prepare).
	keys := make([]string, 0, len(raw.Settings))
	for k := range raw.Settings {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	for _, k := range keys {
		t := raw.Settings[k]
		field := "settings." + k
		q, r, err := settingValue(t)
		if err != nil {
			c.add(t.Line, field, "%v", err)
			continue
		}
		s.Settings = append(s.Settings, Setting{Key: k, Value: q, Range: r, Written: t.Value, Line: t.Line})
		echo(field, t, "overrides the model default")
	}
	s.describeMeasured()
	return s
}

// settingValue reads a setting: a quantity with its unit, or a plain number
// for dimensionless settings (a count of column volumes, a fraction);
// either may carry a range ("12 ± 2 cm", "0.2–0.3").
func settingValue(t Text) (units.Quantity, units.Range, error) {
	if v, err := strconv.ParseFloat(t.Value, 64); err == nil {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return units.Quantity{}, units.Range{}, fmt.Errorf("%q is not a finite number", t.Value)
		}
		return units.Quantity{SI: v, Dim: units.None}, units.Range{Nominal: v}, nil
	}
	if r, err := units.ParsePlainRange(t.Value); err == nil {
		return units.Quantity{SI: r.Nominal, Dim: units.None}, r, nil
	}
	r, u, err := units.ParseRange(t.Value)
	if err != nil {
		return units.Quantity{}, units.Range{}, fmt.Errorf(`%v; write a number with its unit, e.g. "15 cm", a plain number for counts and fractions, or either with a range, e.g. "12–18 cm"`, err)
	}
	return units.Quantity{SI: r.Nominal, Dim: u.Dim}, r, nil
}

func (c *collector) chromatography(r *rawChrom, s *Scenario, root *yaml.Node, echo func(string, Text, string)) *Chromatography {
	ch := &Chromatography{Loading: LiquidLoading, LoadingRule: RuleTheory}
	c.unknown(r.Extra, "chromatography", rawChrom{})
	line := keyLine(root, "chromatography")
	if len(r.TLCEluent) == 0 {
		c.add(line, "chromatography.tlc_eluent", `missing; write the TLC eluent by volume fraction, e.g. {n-heptane: 0.7, ethyl acetate: 0.3}`)
	} else {
		ch.TLCEluent = c.mix(r.TLCEluent, "chromatography.tlc_eluent", keyLine(root, "chromatography", "tlc_eluent"), s.Solvents)
		s.Inputs = append(s.Inputs, Input{Field: "chromatography.tlc_eluent", Written: ch.TLCEluent.String(), Meaning: "volume fractions"})
	}
	rf := func(t Text, field, label string, set func(*Scenario, float64)) float64 {
		if !c.required(t, line, field, "an Rf value between 0 and 1, e.g. 0.30") {
			return 0
		}
		r, ok := c.fractionRange(t, field, 0, 1, "an Rf value above 0 and below 1, e.g. 0.30")
		v := r.Nominal
		if ok && (r.Lo() <= 0 || r.Hi() >= 1) {
			c.add(t.Line, field, "Rf %s is outside (0, 1): a spot at the baseline or the solvent front cannot be sized for a column; write a value above 0 and below 1", t.Value)
			return 0
		}
		if ok {
			echo(field, t, fmt.Sprintf("elutes at about %.2f column volumes (1/Rf)", 1/v))
			s.measure(field, t, label, "", KindRf, r, 0, 1, set)
		}
		return v
	}
	ch.ProductRf = rf(r.ProductRf, "chromatography.product_rf", "Rf of the product", func(s *Scenario, v float64) { s.Chromatography.ProductRf = v })
	ch.ImpurityRf = rf(r.ImpurityRf, "chromatography.impurity_rf", "Rf of the nearest impurity", func(s *Scenario, v float64) { s.Chromatography.ImpurityRf = v })
	if ch.ProductRf > 0 && ch.ProductRf == ch.ImpurityRf {
		c.add(r.ImpurityRf.Line, "chromatography.impurity_rf", "equals product_rf (%s): the spots do not separate in this eluent; find an eluent that separates them on TLC first", r.ImpurityRf.Value)
	}
	for i, st := range r.Gradient {
		field := fmt.Sprintf("chromatography.gradient[%d]", i)
		c.unknown(st.Extra, field, rawStep{})
		step := Step{}
		if len(st.Eluent) == 0 {
			c.add(st.ColumnVolumes.Line, field+".eluent", "missing; write the step's eluent by volume fraction")
		} else {
			step.Eluent = c.mix(st.Eluent, field+".eluent", st.ColumnVolumes.Line, s.Solvents)
		}
		if c.required(st.ColumnVolumes, st.ColumnVolumes.Line, field+".column_volumes", "how many column volumes of this eluent run before the next step, e.g. 2") {
			v, err := strconv.ParseFloat(st.ColumnVolumes.Value, 64)
			if err != nil || !(v > 0 && v <= 100) {
				c.add(st.ColumnVolumes.Line, field+".column_volumes", "%q: write a number of column volumes above 0 and at most 100", st.ColumnVolumes.Value)
			}
			step.ColumnVolumes = v
		}
		ch.Gradient = append(ch.Gradient, step)
		s.Inputs = append(s.Inputs, Input{Field: field, Written: fmt.Sprintf("%s for %s CV", step.Eluent, st.ColumnVolumes.Value), Meaning: "step before the TLC eluent"})
	}
	if r.Loading.Set {
		switch Loading(strings.ToLower(r.Loading.Value)) {
		case LiquidLoading, DryLoading:
			ch.Loading = Loading(strings.ToLower(r.Loading.Value))
			echo("chromatography.loading", r.Loading, string(ch.Loading)+" loading")
		default:
			c.add(r.Loading.Line, "chromatography.loading", "%q is not a loading mode; write liquid or dry", r.Loading.Value)
		}
	} else {
		s.Inputs = append(s.Inputs, Input{Field: "chromatography.loading", Written: "(not given)", Meaning: "liquid loading"})
	}
	if r.LoadingSolvent.Set {
		if sv, ok := s.Solvents.Find(r.LoadingSolvent.Value); ok {
			ch.LoadingSolvent = sv.ID
			echo("chromatography.loading_solvent", r.LoadingSolvent, sv.ID)
		} else {
			c.add(r.LoadingSolvent.Line, "chromatography.loading_solvent", "unknown solvent %q; %s", r.LoadingSolvent.Value, knownSolvents(s.Solvents))
		}
	}
	if r.RecoverSolvent.Set {
		v, ok := c.fraction(r.RecoverSolvent, "chromatography.recover_solvent", 0, 0.99, `the fraction of spent eluent recovered for reuse, from 0 to 0.99, e.g. 0 or "60 %"`)
		if ok {
			ch.RecoverSolvent = v
			echo("chromatography.recover_solvent", r.RecoverSolvent, fmt.Sprintf("%.3g %% of the spent eluent recovered", v*100))
		}
	}
	if r.TargetPurity.Set {
		if v, ok := c.fraction(r.TargetPurity, "chromatography.target_purity", 0.5, 0.99999, `the purity asked of the pooled product fractions (product over product and nearest impurity), from 0.5 to 0.99999, e.g. "98 %"`); ok {
			ch.TargetPurity = v
			echo("chromatography.target_purity", r.TargetPurity, fmt.Sprintf("%.4g %% purity asked of the product fractions", v*100))
		}
	}
	if r.MixedFractions.Set {
		switch strings.ToLower(strings.TrimSpace(r.MixedFractions.Value)) {
		case "set aside":
		case "rerun":
			ch.RerunMixed = true
		default:
			c.add(r.MixedFractions.Line, "chromatography.mixed_fractions", "%q: write \"set aside\" (the product in them is lost) or rerun (pooled and run once more)", r.MixedFractions.Value)
		}
		echo("chromatography.mixed_fractions", r.MixedFractions, map[bool]string{true: "mixed fractions pooled and run once more", false: "mixed fractions set aside"}[ch.RerunMixed])
	}
	if r.LoadingRule.Set {
		switch Rule(strings.ToLower(r.LoadingRule.Value)) {
		case RuleTheory, RuleTable:
			ch.LoadingRule = Rule(strings.ToLower(r.LoadingRule.Value))
			echo("chromatography.loading_rule", r.LoadingRule, "silica sized by "+string(ch.LoadingRule))
		default:
			c.add(r.LoadingRule.Line, "chromatography.loading_rule", "%q: write theory or still-table", r.LoadingRule.Value)
		}
	}
	for i, t := range r.Columns {
		field := fmt.Sprintf("chromatography.column_diameters[%d]", i)
		if v, ok := c.quantity(t, field, units.Length); ok {
			if v <= 0 || v > 2 {
				c.add(t.Line, field, "%q: write an inner diameter above 0 and at most 2 m", t.Value)
				continue
			}
			ch.ColumnsM = append(ch.ColumnsM, v)
		}
	}
	sort.Float64s(ch.ColumnsM)
	return ch
}

// mix reads a solvent mixture by volume fraction.
func (c *collector) mix(m map[string]Text, field string, line int, book *solvent.Book) Mix {
	names := make([]string, 0, len(m))
	for k := range m {
		names = append(names, k)
	}
	sort.Strings(names)
	var out Mix
	sum := 0.0
	for _, name := range names {
		t := m[name]
		f := field + "." + name
		sv, ok := book.Find(name)
		if !ok {
			c.add(t.Line, f, "unknown solvent %q; %s", name, knownSolvents(book))
			continue
		}
		v, ok := c.fraction(t, f, 0, 1, `a volume fraction from 0 to 1, e.g. 0.3 or "30 %"`)
		if !ok {
			continue
		}
		sum += v
		out = append(out, Part{Solvent: sv.ID, Fraction: v})
	}
	if len(out) == len(names) && math.Abs(sum-1) > mixTolerance {
		c.add(line, field, "volume fractions sum to %.4g, not 1; make them add up to 1 (e.g. 0.7 and 0.3)", sum)
	}
	sort.SliceStable(out, func(i, j int) bool { return out[i].Fraction > out[j].Fraction })
	return out
}

func knownSolvents(b *solvent.Book) string {
	var ids []string
	for _, s := range b.All() {
		ids = append(ids, s.ID)
	}
	return "known solvents: " + strings.Join(ids, ", ") + " (add others under solvents:)"
}

// String writes a mix as "70 % n-heptane + 30 % ethyl acetate".
func (m Mix) String() string {
	parts := make([]string, len(m))
	for i, p := range m {
		parts[i] = fmt.Sprintf("%.4g %% %s", p.Fraction*100, p.Solvent)
	}
	return strings.Join(parts, " + ")
}
