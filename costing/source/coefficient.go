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

// Set is a table of coefficients by key. It is stored flat: the
// descriptions (key, label, unit, source, mark, range) in one slice, the SI
// values in a parallel slice of floats, and the key index shared between
// copies until a copy adds a key. Copies made for Monte Carlo draws
// (WithValues) therefore cost one slice of floats, with no map to clone and
// no key to sort. A Set shares its storage like a map does: Put on one
// value is seen by every holder of it; Clone makes an independent one.
type Set struct{ t *table }

type table struct {
	index    map[string]int // key → position; with meta, shared with copies made by WithValues until ownIndex
	ownIndex bool
	meta     []Coefficient // SI fields are not read: vals holds the values
	vals     []float64
	keys     []string // sorted keys, built on demand, shared while the index is
}

// NewSet builds a Set from a list; duplicate keys are a programming error.
func NewSet(list ...[]Coefficient) Set {
	s := Set{&table{index: map[string]int{}, ownIndex: true}}
	for _, l := range list {
		for _, c := range l {
			if _, dup := s.t.index[c.Key]; dup {
				panic("duplicate coefficient key " + c.Key)
			}
			s.Put(c)
		}
	}
	return s
}

// Len is the number of coefficients.
func (s Set) Len() int {
	if s.t == nil {
		return 0
	}
	return len(s.t.meta)
}

// Get returns the SI value of a coefficient; an unknown key is a programming error.
func (s Set) Get(key string) float64 {
	i, ok := s.pos(key)
	if !ok {
		panic("unknown coefficient " + key)
	}
	return s.t.vals[i]
}

// Lookup returns a coefficient and whether the set has it.
func (s Set) Lookup(key string) (Coefficient, bool) {
	i, ok := s.pos(key)
	if !ok {
		return Coefficient{}, false
	}
	return s.At(i), true
}

// Of returns a coefficient; an unknown key is a programming error.
func (s Set) Of(key string) Coefficient {
	c, ok := s.Lookup(key)
	if !ok {
		panic("unknown coefficient " + key)
	}
	return c
}

// At returns the coefficient at a position, 0 ≤ i < Len (positions follow
// the order of insertion and do not change).
func (s Set) At(i int) Coefficient {
	c := s.t.meta[i]
	c.SI = s.t.vals[i]
	return c
}

// Values copies the SI values in position order.
func (s Set) Values() []float64 { return append([]float64(nil), s.t.vals...) }

// WithValues is a copy of the set whose SI values are vals, in position
// order (len(vals) == Len(); the slice is kept, not copied). Descriptions
// and the key index are shared, so it costs no allocation beyond vals; the
// set s must not gain keys while such copies are in use (it may from many
// goroutines be read and copied).
func (s Set) WithValues(vals []float64) Set {
	if len(vals) != len(s.t.vals) {
		panic("source: WithValues needs one value per coefficient")
	}
	return Set{&table{index: s.t.index, meta: s.t.meta[:len(s.t.meta):len(s.t.meta)], vals: vals}}
}

func (s Set) pos(key string) (int, bool) {
	if s.t == nil {
		return 0, false
	}
	i, ok := s.t.index[key]
	if !ok || i >= len(s.t.meta) {
		return 0, false
	}
	return i, true
}

// Put adds or replaces a coefficient (used for derived and calibrated values).
func (s Set) Put(c Coefficient) {
	if i, ok := s.pos(c.Key); ok {
		s.t.own()
		s.t.meta[i] = c
		s.t.vals[i] = c.SI
		return
	}
	if s.t == nil {
		panic("source: Put on a Set not made by NewSet")
	}
	s.t.own()
	s.t.index[c.Key] = len(s.t.meta)
	s.t.meta = append(s.t.meta, c)
	s.t.vals = append(s.t.vals, c.SI)
	s.t.keys = nil
}

// own gives a table made by WithValues its own index and descriptions
// before it is changed.
func (t *table) own() {
	if t.ownIndex {
		return
	}
	idx := make(map[string]int, len(t.index)+1)
	for k, v := range t.index {
		idx[k] = v
	}
	t.index, t.ownIndex = idx, true
	t.meta = append([]Coefficient(nil), t.meta...)
}

// Override replaces the value of a known coefficient with the user's.
// It returns an error naming the nearest key and the valid keys of the
// same method when the key is unknown (suggest), and an
// error naming the wanted dimension when the quantity has another one.
func (s Set) Override(key string, q units.Quantity, raw string) error {
	c, ok := s.Lookup(key)
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
	s.Put(c)
	return nil
}

// Clone copies a Set so that overrides for one scenario do not leak.
func (s Set) Clone() Set {
	if s.t == nil {
		return NewSet()
	}
	idx := make(map[string]int, len(s.t.index))
	for k, v := range s.t.index {
		idx[k] = v
	}
	return Set{&table{index: idx, ownIndex: true,
		meta: append([]Coefficient(nil), s.t.meta...),
		vals: append([]float64(nil), s.t.vals...), keys: append([]string(nil), s.t.keys...)}}
}

// Keys lists the keys in order.
func (s Set) Keys() []string {
	if s.t == nil {
		return nil
	}
	if s.t.keys == nil {
		keys := make([]string, 0, len(s.t.meta))
		for _, c := range s.t.meta {
			keys = append(keys, c.Key)
		}
		sort.Strings(keys)
		s.t.keys = keys
	}
	return append([]string(nil), s.t.keys...)
}

// Sorted lists the coefficients ordered by method then key.
func (s Set) Sorted() []Coefficient {
	out := make([]Coefficient, 0, s.Len())
	for _, k := range s.Keys() {
		out = append(out, s.Of(k))
	}
	sort.SliceStable(out, func(i, j int) bool { return out[i].Method < out[j].Method })
	return out
}

// fmtDisplay prints an SI value of c in c's display unit.
func fmtDisplay(c Coefficient, si float64) string {
	c.SI = si
	return fmt.Sprintf("%.4g", c.Display())
}
