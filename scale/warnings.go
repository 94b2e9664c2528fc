package scale

import (
	"fmt"
	"regexp"
	"sort"

	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Warning is one warning or caution a model raised, with every batch mass
// it was raised at. The same warning at several masses, differing only in
// its figures, is one Warning: Text is its wording at the first of them.
type Warning struct {
	Method   string
	Level    usage.Level // usage.Warning or usage.Caution
	Text     string      // as raised at MassesKg[0]
	MassesKg []float64   // ascending
}

// figures matches the numbers (with a mass unit, if any) that make the
// same warning differ from one batch mass to the next.
var figures = regexp.MustCompile(`[0-9][0-9.,]*(e[+-]?[0-9]+)?( ?(mg|kg|g)\b)?`)

// collectWarnings gathers every note above Info from every result, in
// method order, then by first mass, so that no writer has to look inside
// the results to show them.
func collectWarnings(methods []string, masses []float64, res [][]Result) []Warning {
	var s warningSet
	s.add(methods, masses, res)
	return s.list()
}

// warningSet gathers warnings chunk by chunk of masses (add, in ascending
// order of mass), for list to give in collectWarnings's order.
type warningSet struct {
	at  map[warningKey]int
	out []Warning
	col []int // out[k]'s method column
}

type warningKey struct {
	method int
	text   string // with its figures masked
}

// add gathers the notes of the results at masses, which follow every
// mass added before.
func (s *warningSet) add(methods []string, masses []float64, res [][]Result) {
	if s.at == nil {
		s.at = map[warningKey]int{}
	}
	for i, m := range masses {
		for j, name := range methods {
			for _, n := range res[i][j].Usage.Notes {
				if n.Level == usage.Info {
					continue
				}
				k := warningKey{j, figures.ReplaceAllString(n.Text, "#")}
				if w, ok := s.at[k]; ok {
					s.out[w].MassesKg = append(s.out[w].MassesKg, m)
					continue
				}
				s.at[k] = len(s.out)
				s.out = append(s.out, Warning{Method: name, Level: n.Level, Text: n.Text, MassesKg: []float64{m}})
				s.col = append(s.col, j)
			}
		}
	}
}

// list is the warnings in method order, then by first mass and order of
// raising: within a method they were found in that order, so a stable
// sort on the method keeps it.
func (s *warningSet) list() []Warning {
	idx := make([]int, len(s.out))
	for k := range idx {
		idx[k] = k
	}
	sort.SliceStable(idx, func(a, b int) bool { return s.col[idx[a]] < s.col[idx[b]] })
	var out []Warning
	for _, k := range idx {
		out = append(out, s.out[k])
	}
	return out
}

// Where says at which masses a warning was raised, in words: "at 2 kg",
// "at 3 masses, 500 mg to 2 kg".
func (w Warning) Where() string {
	n := len(w.MassesKg)
	switch n {
	case 0:
		return ""
	case 1:
		return "at " + units.FormatMass(w.MassesKg[0])
	}
	return fmt.Sprintf("at %d masses, %s to %s", n, units.FormatMass(w.MassesKg[0]), units.FormatMass(w.MassesKg[n-1]))
}

// Line is the warning in one line: "chromatography at 5 kg: The batch
// needs ..."; for several masses the figures are those of the first.
func (w Warning) Line() string {
	s := w.Method + " " + w.Where() + ": " + w.Text
	if len(w.MassesKg) > 1 {
		s += " (figures at " + units.FormatMass(w.MassesKg[0]) + ")"
	}
	return s
}
