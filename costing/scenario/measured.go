package scenario

import (
	"fmt"
	"math"

	"sepcost/costing/solubility"
	"sepcost/costing/units"
)

// Measured is a value the chemist measured (or guessed) that the answer
// depends on, with the limits it may lie between. Written with a range
// ("0.30 ± 0.03", "12–18 g/L") the limits are the chemist's; written as one
// number it gets the default spread of its kind of measurement (Spreads).
// Either way the value is drawn from a rectangular distribution between
// the limits (units.Range, JCGM 100:2008 §4.3.7); the models see only the
// nominal value, or one drawn value per Monte Carlo draw (Scenario.With).
type Measured struct {
	Field   string      // e.g. "chromatography.product_rf"
	Line    int         // line in the scenario file
	Label   string      // plain words, e.g. "Rf of the product"
	Written string      // as written
	Range   units.Range // SI; Half > 0
	Unit    string      // display unit; "" for plain numbers
	Kind    Kind        // the kind of measurement
	Default bool        // the spread is Spreads[Kind], not written
	set     func(s *Scenario, v float64)
}

// Display converts an SI value of the measured quantity to its display unit.
func (m Measured) Display(si float64) float64 {
	if m.Unit == "" {
		return si
	}
	return units.MustTo(si, m.Unit)
}

// Kind is a kind of measurement, which sets the default spread of a value
// written without one.
type Kind string

// Kinds of measurement with a default spread.
const (
	KindRf         Kind = "Rf read from one TLC plate"
	KindPurity     Kind = "purity from one chromatogram"
	KindSolubility Kind = "one gravimetric solubility point"
	KindEstimate   Kind = "a time or amount estimated before the work"
	KindBoiling    Kind = "a normal boiling point measured once or taken from a reduced-pressure reading"
)

// Spread is the default half-width of a kind of measurement.
type Spread struct {
	Half     float64 // half-width of the rectangular distribution
	Relative bool    // Half is a share of the value, not an absolute amount
	Source   string
	Mark     string // how sure, in the words of source.Mark
}

// Spreads are the default half-widths given to values written without a
// range. They are this project's reading of bench practice; the
// Uncertainty sheet lists them.
var Spreads = map[Kind]Spread{
	// Rf values from one plate shift by a few hundredths with chamber
	// saturation, layer activity and spot loading (common practice, no source).
	KindRf: {Half: 0.03, Source: "Rf read by eye from one plate: chamber saturation, plate activity and spot size move it by a few hundredths", Mark: "common practice"},
	// HPLC or GC area per cent is not mass per cent until response factors
	// are known (common practice, no source).
	KindPurity: {Half: 0.03, Source: "area per cent from one chromatogram, response factors unknown: a few percentage points either way", Mark: "common practice"},
	// One gravimetric point: equilibration time, temperature control and
	// drying of the residue (common practice, no source).
	KindSolubility: {Half: 0.25, Relative: true, Source: "one gravimetric point, not repeated: equilibration, temperature and drying of the residue, ±25 %", Mark: "common practice"},
	// A boiling point read once at the still head, or corrected to 1 atm from
	// a reduced-pressure reading with a nomograph (common practice, no
	// source).
	KindBoiling: {Half: 3, Source: "one reading at the still head, or corrected to 1 atm from a reduced-pressure reading: a few kelvin either way", Mark: "common practice"},
	// Development time guessed before the work (common practice, no source).
	KindEstimate: {Half: 0.5, Relative: true, Source: "an estimate made before the work: ±50 %", Mark: "common practice"},
}

// measure records a measured field. r is the value as written; a value
// written without a range gets the default spread of its kind, narrowed
// so that both limits stay inside (lo, hi), the physically valid open
// interval.
func (s *Scenario) measure(field string, t Text, label, unit string, kind Kind, r units.Range, lo, hi float64, set func(*Scenario, float64)) {
	m := Measured{Field: field, Line: t.Line, Label: label, Written: t.Value, Range: r, Unit: unit, Kind: kind, set: set}
	if r.Half == 0 {
		sp := Spreads[kind]
		h := sp.Half
		if sp.Relative {
			h *= math.Abs(r.Nominal)
		}
		// Keep both limits inside the valid interval: at most 90 % of the
		// way from the nominal value to either bound.
		h = math.Min(h, 0.9*(r.Nominal-lo))
		h = math.Min(h, 0.9*(hi-r.Nominal))
		if !(h > 0) {
			return
		}
		m.Range.Half, m.Default = h, true
	}
	s.Measured = append(s.Measured, m)
}

// describeMeasured adds to each measured field's entry on the Inputs list
// how its uncertainty is read: the limits drawn between and whether they
// were written or are the default of the kind of measurement.
func (s *Scenario) describeMeasured() {
	for _, m := range s.Measured {
		unit := ""
		if m.Unit != "" {
			unit = " " + m.Unit
		}
		lo, hi := m.Display(m.Range.Lo()), m.Display(m.Range.Hi())
		how := fmt.Sprintf("; the models use %.4g%s, the uncertainty draws anywhere from %.4g to %.4g%s (as written)",
			m.Display(m.Range.Nominal), unit, lo, hi, unit)
		if m.Default {
			how = fmt.Sprintf("; the uncertainty draws anywhere from %.4g to %.4g%s, the usual spread of %s", lo, hi, unit, m.Kind)
		}
		for i := range s.Inputs {
			if s.Inputs[i].Field == m.Field {
				s.Inputs[i].Meaning += how
			}
		}
	}
}

// With is a copy of the scenario with the measured values replaced by vals
// (one per Measured, in order, SI). Sections the values live in are copied;
// everything else is shared with s, which is left unchanged.
func (s *Scenario) With(vals []float64) *Scenario {
	c := *s
	if s.Chromatography != nil {
		ch := *s.Chromatography
		c.Chromatography = &ch
	}
	if s.Crystallization != nil {
		cr := *s.Crystallization
		c.Crystallization = &cr
	}
	if s.Distillation != nil {
		d := *s.Distillation
		c.Distillation = &d
	}
	for i, m := range s.Measured {
		m.set(&c, vals[i])
	}
	c.follow()
	return &c
}

// follow sets the fractions that follow the crude's purity or its nearest
// impurity where the scenario did not write them (as resolve set them), and
// keeps every impurity share within 1 − purity.
func (s *Scenario) follow() {
	if !s.NearestGiven {
		s.NearestImpurity = 1 - s.Purity
	}
	s.NearestImpurity = math.Min(s.NearestImpurity, 1-s.Purity)
	if cr := s.Crystallization; cr != nil {
		if cr.impurityFollows {
			cr.ImpurityFraction = 1 - s.Purity
			if s.NearestGiven {
				cr.ImpurityFraction = s.NearestImpurity
			}
		}
		cr.ImpurityFraction = math.Min(cr.ImpurityFraction, 1-s.Purity)
	}
	if d := s.Distillation; d != nil && d.FeedFromCrude {
		d.FeedPurity = s.Purity
	}
}

// Nominal lists the measured values as read, SI, in order.
func (s *Scenario) Nominal() []float64 {
	out := make([]float64, len(s.Measured))
	for i, m := range s.Measured {
		out[i] = m.Range.Nominal
	}
	return out
}

// setPurity sets the crude's purity (Scenario.follow moves what follows it).
func setPurity(s *Scenario, v float64) { s.Purity = v }

// setSolubility returns a setter for measured point i of a crystallization
// solute's curve (the product when product is true): the point is changed
// and the van 't Hoff line fitted again.
func setSolubility(product bool, i int) func(*Scenario, float64) {
	return func(s *Scenario, v float64) {
		cr := s.Crystallization
		sol := &cr.Impurity
		if product {
			sol = &cr.Product
		}
		pts := append([]solubility.Point(nil), sol.Curve.Points...)
		pts[i].S = v
		fit, err := solubility.Fit(pts)
		if err != nil {
			return // cannot happen for S > 0 at the measured, distinct temperatures
		}
		sol.Curve.Points, sol.Curve.Fit = pts, &fit
	}
}

// boilingPoint reads a distillation compound's normal boiling point, K,
// which may carry a range when no Antoine constants are given (they fix the
// boiling point); a compound described by its properties has its boiling
// point recorded as measured. It returns 0 after recording a problem.
func (c *collector) boilingPoint(r *rawCompound, field string, isProduct bool, s *Scenario) float64 {
	t, f := r.BoilingPoint, field+".boiling_point"
	rg, ok := c.quantityRange(t, f, units.Temperature)
	if !ok {
		return 0
	}
	if !(rg.Lo() > minBoilingK) || rg.Hi() > maxBoilingK {
		c.add(t.Line, f, "%q is outside the plausible range; write the normal boiling point (at 1 atm), e.g. \"185 C\" or \"183–187 C\"", t.Value)
		return 0
	}
	if r.Antoine != nil {
		if rg.Half > 0 {
			c.add(t.Line, f, "%q: a range is read here only when no Antoine constants are given (the constants fix the boiling point); write one value", t.Value)
			return 0
		}
		return rg.Nominal
	}
	which, set := "key impurity", func(s *Scenario, v float64) { s.Distillation.Impurity.Data.BoilingPoint.V = v }
	if isProduct {
		which, set = "product", func(s *Scenario, v float64) { s.Distillation.Product.Data.BoilingPoint.V = v }
	}
	s.measure(f, t, "normal boiling point of the "+which, "C", KindBoiling, rg, minBoilingK, maxBoilingK, set)
	return rg.Nominal
}

// fractionRange reads a plain number or percentage that may carry a range;
// both limits must lie in [lo, hi].
func (c *collector) fractionRange(t Text, field string, lo, hi float64, what string) (units.Range, bool) {
	if !t.Set {
		return units.Range{}, false
	}
	r, err := units.ParsePlainRange(t.Value)
	if err != nil {
		c.add(t.Line, field, "%q is not a number or a range; write %s, or a range such as \"0.30 ± 0.03\" or \"0.27–0.33\"", t.Value, what)
		return units.Range{}, false
	}
	if !(r.Lo() >= lo && r.Hi() <= hi) {
		c.add(t.Line, field, "%q is outside the valid range; write %s", t.Value, what)
		return units.Range{}, false
	}
	return r, true
}

// quantityRange reads a quantity of the given dimension that may carry a
// range; a bare number is refused with the list of accepted units.
func (c *collector) quantityRange(t Text, field string, dim units.Dim) (units.Range, bool) {
	if !t.Set {
		return units.Range{}, false
	}
	if t.Tag == "!!int" || t.Tag == "!!float" {
		c.add(t.Line, field, "%q has no unit; write %s", t.Value, units.Accepted(dim))
		return units.Range{}, false
	}
	r, err := units.ParseRangeAs(t.Value, dim)
	if err != nil {
		c.add(t.Line, field, "%v", err)
		return units.Range{}, false
	}
	return r, true
}

// rangeHint is added to the message of a field that does not take a range
// when the value was written as one.
func rangeHint(value string) string {
	if r, err := units.ParsePlainRange(value); err == nil && r.Half > 0 {
		return fmt.Sprintf(" (ranges are read only for measured values: %s, settings)", measuredFields)
	}
	if r, _, err := units.ParseRange(value); err == nil && r.Half > 0 {
		return fmt.Sprintf(" (ranges are read only for measured values: %s, settings)", measuredFields)
	}
	return ""
}

// measuredFields names the fields that take a range.
const measuredFields = "crude.purity, crude.nearest_impurity, chromatography.product_rf, chromatography.impurity_rf, " +
	"crystallization.product.solubility, crystallization.impurity.solubility, crystallization.screening_time, " +
	"distillation.product.boiling_point, distillation.impurity.boiling_point"
