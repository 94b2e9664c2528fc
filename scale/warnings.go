package scale

import (
	"fmt"
	"regexp"

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
	type key struct {
		method int
		text   string
	}
	at := map[key]int{}
	var out []Warning
	for j, name := range methods {
		for i, m := range masses {
			for _, n := range res[i][j].Usage.Notes {
				if n.Level == usage.Info {
					continue
				}
				k := key{j, figures.ReplaceAllString(n.Text, "#")}
				if w, ok := at[k]; ok {
					out[w].MassesKg = append(out[w].MassesKg, m)
					continue
				}
				at[k] = len(out)
				out = append(out, Warning{Method: name, Level: n.Level, Text: n.Text, MassesKg: []float64{m}})
			}
		}
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
