// Package source holds model coefficients together with their provenance:
// every number a model uses carries its value, unit and where it came from,
// and the workbook's Sources sheet prints this table.
package source

import (
	"fmt"
	"sort"

	"sepcost/costing/units"
)

// Mark says how sure a value is.
type Mark string

// Marks, from most to least sure.
const (
	Confirmed      Mark = "confirmed"       // seen in a published table or regulation
	Derived        Mark = "derived"         // computed here from published equations or data
	FromMemory     Mark = "from memory"     // widely quoted, not re-checked against the original
	CommonPractice Mark = "common practice" // a habit of the trade, no published source
	Calibrated     Mark = "calibrated"      // fitted here so that one model reproduces a published table
	Override       Mark = "scenario"        // set by the user in the scenario file
	Example        Mark = "example"         // invented for the demo; replace with your own
)

// Coefficient is one model parameter with its provenance.
type Coefficient struct {
	Key    string    // stable identifier, also the override key in scenario files
	Method string    // "chromatography", "crystallization", "distillation", "general"
	Label  string    // plain words
	SI     float64   // value in SI units
	Dim    units.Dim // dimension of SI
	Unit   string    // display unit, e.g. "cm", "g/mL"; "" for plain numbers
	Source string    // authors, title, year, table or page; or a plain explanation
	Mark   Mark
	// Lo and Hi bound the values a scenario may set, in SI (inclusive): the
	// physically meaningful range, not the plausible one. Both zero means the
	// coefficient has not been given a range yet.
	Lo, Hi float64
}

// Bounded reports whether the coefficient has a range.
func (c Coefficient) Bounded() bool { return c.Lo != 0 || c.Hi != 0 }

// InRange reports whether v lies in the coefficient's range (always true for
// an unbounded coefficient; never for NaN).
func (c Coefficient) InRange(v float64) bool {
	if v != v {
		return false
	}
	return !c.Bounded() || (v >= c.Lo && v <= c.Hi)
}

// Display is the value converted to the display unit.
func (c Coefficient) Display() float64 {
	if c.Unit == "" {
		return c.SI
	}
	return units.MustTo(c.SI, c.Unit)
}

// String is "label = value unit".
func (c Coefficient) String() string {
	return fmt.Sprintf("%s = %.4g %s", c.Label, c.Display(), c.Unit)
}

// Set is a table of coefficients by key.
type Set map[string]Coefficient

// NewSet builds a Set from a list; duplicate keys are a programming error.
func NewSet(list ...[]Coefficient) Set {
	s := Set{}
	for _, l := range list {
		for _, c := range l {
			if _, dup := s[c.Key]; dup {
				panic("duplicate coefficient key " + c.Key)
			}
			s[c.Key] = c
		}
	}
	return s
}

// Get returns the SI value of a coefficient; an unknown key is a programming error.
func (s Set) Get(key string) float64 {
	c, ok := s[key]
	if !ok {
		panic("unknown coefficient " + key)
	}
	return c.SI
}

// Put adds or replaces a coefficient (used for derived and calibrated values).
func (s Set) Put(c Coefficient) { s[c.Key] = c }

// Override replaces the value of a known coefficient with the user's.
// It returns an error naming the nearest key and the valid keys of the
// same method when the key is unknown (suggest), and an
// error naming the wanted dimension when the quantity has another one.
func (s Set) Override(key string, q units.Quantity, raw string) error {
	c, ok := s[key]
	if !ok {
		return fmt.Errorf("unknown model setting %q; %s", key, s.suggest(key))
	}
	if q.Dim != c.Dim {
		return fmt.Errorf("%q is %s but %s needs %s", raw, q.Dim.Name(), key, units.Accepted(c.Dim))
	}
	if !c.InRange(q.SI) {
		return fmt.Errorf("%q is outside the range %s accepts: %s to %s %s", raw, key,
			fmtDisplay(c, c.Lo), fmtDisplay(c, c.Hi), c.Unit)
	}
	c.Source = "set in the scenario (default was " + c.String() + "; " + c.Source + ")"
	c.SI = q.SI
	c.Mark = Override
	s[key] = c
	return nil
}

// Clone copies a Set so that overrides for one scenario do not leak.
func (s Set) Clone() Set {
	out := make(Set, len(s))
	for k, v := range s {
		out[k] = v
	}
	return out
}

// Keys lists the keys in order.
func (s Set) Keys() []string {
	keys := make([]string, 0, len(s))
	for k := range s {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	return keys
}

// Sorted lists the coefficients ordered by method then key.
func (s Set) Sorted() []Coefficient {
	out := make([]Coefficient, 0, len(s))
	for _, k := range s.Keys() {
		out = append(out, s[k])
	}
	sort.SliceStable(out, func(i, j int) bool { return out[i].Method < out[j].Method })
	return out
}

// fmtDisplay prints an SI value of c in c's display unit.
func fmtDisplay(c Coefficient, si float64) string {
	c.SI = si
	return fmt.Sprintf("%.4g", c.Display())
}
