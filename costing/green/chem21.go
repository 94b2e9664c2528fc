package green

import (
	"fmt"
	"strings"

	"sepcost/costing/solvent"
	"sepcost/costing/source"
	"sepcost/costing/units"
)

// GuideClass is a CHEM21 solvent-guide ranking.
type GuideClass string

// CHEM21 rankings, best first.
const (
	Recommended     GuideClass = "recommended"
	Problematic     GuideClass = "problematic"
	Hazardous       GuideClass = "hazardous"
	HighlyHazardous GuideClass = "highly hazardous"
)

// Rank orders the classes: 1 recommended … 4 highly hazardous; 0 for an
// unknown class.
func (g GuideClass) Rank() int {
	switch g {
	case Recommended:
		return 1
	case Problematic:
		return 2
	case Hazardous:
		return 3
	case HighlyHazardous:
		return 4
	}
	return 0
}

// srcCHEM21 cites the guide and the reproduction of its table that was read.
const srcCHEM21 = "Prat, D. et al., \"CHEM21 selection guide of classical- and less classical-solvents\", Green Chem. 2016, 18, 288-296, solvent table (safety, health, environment scores; ranking by default and after discussion), as reproduced in the AI4Green open-source electronic lab notebook (file Webapp/sources/solvent_guide/CHEM21_full.csv)"

// Entry is one solvent of the CHEM21 guide.
type Entry struct {
	ID      string     // this project's solvent ID where there is one
	Names   []string   // other names matched by Lookup, lower case
	CAS     []string   // CAS Registry Numbers
	S, H, E int        // safety, health and environment scores, 1 (best) to 10
	Default GuideClass // ranking by default, from the scores ("" when not seen)
	Class   GuideClass // ranking after discussion: the guide's advice
	Source  string
	Mark    source.Mark
}

// row builds a confirmed entry: scores and both rankings read in the table.
func row(id string, cas []string, names []string, s, h, e int, def, class GuideClass) Entry {
	return Entry{ID: id, Names: names, CAS: cas, S: s, H: h, E: e, Default: def, Class: class,
		Source: srcCHEM21, Mark: source.Confirmed}
}

// chem21 is the guide's table for the built-in solvents and other common
// ones (scores S/H/E and rankings as read in the reproduction; see srcCHEM21).
var chem21 = []Entry{
	row("water", []string{"7732-18-5"}, nil, 1, 1, 1, Recommended, Recommended),
	row("methanol", []string{"67-56-1"}, nil, 4, 7, 5, Problematic, Recommended),
	row("ethanol", []string{"64-17-5"}, nil, 4, 3, 3, Recommended, Recommended),
	row("isopropanol", []string{"67-63-0"}, []string{"isopropyl alcohol", "2-propanol"}, 4, 3, 3, Recommended, Recommended),
	row("1-butanol", []string{"71-36-3"}, []string{"n-butanol"}, 3, 4, 3, Recommended, Recommended),
	row("tert-butanol", []string{"75-65-0"}, []string{"t-butanol"}, 4, 3, 3, Recommended, Recommended),
	row("ethylene glycol", []string{"107-21-1"}, nil, 1, 2, 5, Recommended, Recommended),
	row("benzyl alcohol", []string{"100-51-6"}, nil, 1, 2, 7, Problematic, Problematic),
	row("acetone", []string{"67-64-1"}, nil, 5, 3, 5, Problematic, Recommended),
	row("methyl ethyl ketone", []string{"78-93-3"}, []string{"mek", "2-butanone"}, 5, 3, 3, Recommended, Recommended),
	row("cyclohexanone", []string{"108-94-1"}, nil, 3, 2, 5, Recommended, Problematic),
	row("ethyl acetate", []string{"141-78-6"}, nil, 5, 3, 3, Recommended, Recommended),
	row("isopropyl acetate", []string{"108-21-4"}, nil, 4, 2, 3, Recommended, Recommended),
	row("n-butyl acetate", []string{"123-86-4"}, []string{"butyl acetate"}, 4, 2, 3, Recommended, Recommended),
	row("methyl acetate", []string{"79-20-9"}, nil, 5, 3, 5, Problematic, Problematic),
	row("acetonitrile", []string{"75-05-8"}, nil, 4, 3, 3, Recommended, Problematic),
	row("dimethyl sulfoxide", []string{"67-68-5"}, []string{"dmso"}, 1, 1, 5, Recommended, Problematic),
	row("sulfolane", []string{"126-33-0"}, nil, 1, 9, 7, Hazardous, Hazardous),
	row("n-methyl-2-pyrrolidone", []string{"872-50-4"}, []string{"nmp", "n-methyl-2-pyrrolidinone"}, 1, 9, 7, Hazardous, Hazardous),
	row("dmpu", []string{"7226-23-5"}, nil, 1, 6, 7, Problematic, Problematic),
	row("hexamethylphosphoramide", []string{"680-31-9"}, []string{"hmpa"}, 1, 9, 7, Hazardous, HighlyHazardous),
	row("nitromethane", []string{"75-52-5"}, nil, 10, 2, 3, Hazardous, HighlyHazardous),
	row("n-heptane", []string{"142-82-5"}, []string{"heptane"}, 6, 2, 7, Problematic, Problematic),
	row("n-hexane", []string{"110-54-3"}, []string{"hexane"}, 8, 7, 7, Hazardous, Hazardous),
	row("n-pentane", []string{"109-66-0"}, []string{"pentane"}, 8, 3, 7, Hazardous, Hazardous),
	row("cyclohexane", []string{"110-82-7"}, nil, 6, 3, 7, Problematic, Problematic),
	row("methylcyclohexane", []string{"108-87-2"}, nil, 6, 2, 7, Problematic, Problematic),
	row("toluene", []string{"108-88-3"}, nil, 5, 6, 3, Problematic, Problematic),
	row("xylenes", []string{"1330-20-7"}, []string{"xylene"}, 4, 2, 5, Problematic, Problematic),
	row("benzene", []string{"71-43-2"}, nil, 6, 10, 3, Hazardous, HighlyHazardous),
	row("dichloromethane", []string{"75-09-2"}, nil, 1, 7, 7, Hazardous, Hazardous),
	row("chloroform", []string{"67-66-3"}, nil, 2, 7, 5, Problematic, HighlyHazardous),
	row("carbon tetrachloride", []string{"56-23-5"}, nil, 2, 7, 10, Hazardous, HighlyHazardous),
	row("1,2-dichloroethane", []string{"107-06-2"}, nil, 4, 10, 3, Hazardous, HighlyHazardous),
	row("chlorobenzene", []string{"108-90-7"}, nil, 3, 2, 7, Problematic, Problematic),
	row("diethyl ether", []string{"60-29-7"}, nil, 10, 3, 7, Hazardous, HighlyHazardous),
	row("diisopropyl ether", []string{"108-20-3"}, nil, 9, 3, 5, Hazardous, Hazardous),
	row("tert-butyl methyl ether", []string{"1634-04-4"}, []string{"methyl tert-butyl ether"}, 8, 3, 5, Hazardous, Hazardous),
	row("2-methyltetrahydrofuran", []string{"96-47-9", "25265-68-3"}, []string{"methyl tetrahydrofuran"}, 6, 5, 3, Problematic, Problematic),
	// Tetrahydrofuran: the scores 6/7/5 were read in the table, the row's
	// rankings were not; the rule of DefaultRanking gives "problematic" and
	// the ranking after discussion is from memory.
	{ID: "tetrahydrofuran", CAS: []string{"109-99-9"}, S: 6, H: 7, E: 5, Default: Problematic, Class: Problematic,
		Source: srcCHEM21 + "; scores read, ranking by default derived with DefaultRanking, ranking after discussion from memory", Mark: source.FromMemory},
	row("1,4-dioxane", []string{"123-91-1"}, []string{"dioxane"}, 7, 6, 3, Problematic, Hazardous),
	row("1,2-dimethoxyethane", []string{"110-71-4"}, []string{"dme"}, 7, 10, 3, Hazardous, Hazardous),
	row("anisole", []string{"100-66-3"}, nil, 4, 1, 5, Problematic, Recommended),
	row("acetic acid", []string{"64-19-7"}, nil, 3, 7, 3, Problematic, Problematic),
	row("acetic anhydride", []string{"108-24-7"}, nil, 3, 7, 3, Problematic, Problematic),
	row("formic acid", []string{"64-18-6"}, nil, 3, 7, 3, Problematic, Problematic),
	row("pyridine", []string{"110-86-1"}, nil, 4, 2, 3, Recommended, Hazardous),
	row("2-methoxyethanol", []string{"109-86-4"}, nil, 3, 9, 3, Hazardous, Hazardous),
	row("carbon disulfide", []string{"75-15-0"}, nil, 9, 7, 7, Hazardous, HighlyHazardous),
}

func norm(s string) string { return strings.ToLower(strings.Join(strings.Fields(s), " ")) }

// Lookup finds a solvent's CHEM21 entry by this project's solvent ID or
// another name, ignoring case and extra spaces.
func Lookup(id string) (Entry, bool) {
	n := norm(id)
	for _, e := range chem21 {
		if norm(e.ID) == n {
			return e, true
		}
		for _, a := range e.Names {
			if a == n {
				return e, true
			}
		}
	}
	return Entry{}, false
}

// LookupSolvent finds a solvent's entry by CAS Registry Number, then by its
// ID and aliases; this serves solvents a user adds under other names.
func LookupSolvent(s solvent.Solvent) (Entry, bool) {
	if s.CAS != "" {
		for _, e := range chem21 {
			for _, c := range e.CAS {
				if c == s.CAS {
					return e, true
				}
			}
		}
	}
	for _, n := range s.Names() {
		if e, ok := Lookup(n); ok {
			return e, true
		}
	}
	return Entry{}, false
}

// Class is a solvent's CHEM21 ranking after discussion (the guide's advice),
// looked up as Lookup does; false when the guide does not rank it.
func Class(id string) (GuideClass, bool) {
	e, ok := Lookup(id)
	if !ok {
		return "", false
	}
	return e.Class, true
}

// Entries lists the table (copies).
func Entries() []Entry {
	out := make([]Entry, len(chem21))
	for i, e := range chem21 {
		e.Names = append([]string(nil), e.Names...)
		e.CAS = append([]string(nil), e.CAS...)
		out[i] = e
	}
	return out
}

// DefaultRanking is the CHEM21 ranking by default from the three scores
// (each 1-10, 10 worst):
//
//	any score ≥ 8                         → hazardous
//	two or more scores of 7               → hazardous
//	one score of 7                        → problematic
//	two or more scores of 4–6, none ≥ 7   → problematic
//	otherwise                             → recommended
//
// The combination rule is from memory of Prat et al. 2016; it
// reproduces every ranking by default read in the guide's table (tested).
// The guide then revises some rankings after discussion (Entry.Class). It
// returns "" for scores outside 1-10.
func DefaultRanking(s, h, e int) GuideClass {
	red, yellow := 0, 0
	for _, v := range []int{s, h, e} {
		switch {
		case v < 1 || v > 10:
			return ""
		case v >= 8:
			return Hazardous
		case v == 7:
			red++
		case v >= 4:
			yellow++
		}
	}
	switch {
	case red >= 2:
		return Hazardous
	case red == 1:
		return Problematic
	case yellow >= 2:
		return Problematic
	}
	return Recommended
}

// Sources lists the CHEM21 ranking of every solvent in the table for the
// workbook's Sources sheet (keys "green.chem21.<id>", SI the rank 1-4).
func Sources() []source.Coefficient {
	out := make([]source.Coefficient, 0, len(chem21))
	for _, e := range chem21 {
		out = append(out, source.Coefficient{
			Key: "green.chem21." + solvent.KeyID(e.ID), Method: "green",
			Label: fmt.Sprintf("CHEM21 ranking of %s: %s (S/H/E %d/%d/%d; 1 recommended … 4 highly hazardous)", e.ID, e.Class, e.S, e.H, e.E),
			SI:    float64(e.Class.Rank()), Dim: units.None, Unit: "", Source: e.Source, Mark: e.Mark})
	}
	return out
}
