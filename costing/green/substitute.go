package green

import (
	"fmt"
	"strings"

	"sepcost/costing/source"
)

// Use is what a solvent does in the purification.
type Use int

// Uses.
const (
	Chromatography Use = iota + 1
	Crystallization
	Distillation
)

// String names the use.
func (u Use) String() string {
	switch u {
	case Chromatography:
		return "chromatography"
	case Crystallization:
		return "crystallization"
	case Distillation:
		return "distillation"
	}
	return fmt.Sprintf("use(%d)", int(u))
}

// ParseUse reads "chromatography", "crystallization" (or
// "recrystallization") or "distillation"; the error names the valid words.
func ParseUse(text string) (Use, error) {
	switch norm(text) {
	case "chromatography", "flash chromatography", "column":
		return Chromatography, nil
	case "crystallization", "crystallisation", "recrystallization", "recrystallisation":
		return Crystallization, nil
	case "distillation":
		return Distillation, nil
	}
	return 0, fmt.Errorf("solvent use %q is not known; valid: \"chromatography\", \"crystallization\" or \"distillation\"", text)
}

// Suggestion is one published or customary replacement for a solvent.
type Suggestion struct {
	Text    string   // what to do, in plain words
	Replace []string // solvent IDs of the replacement (all components of a blend)
	Source  string
	Mark    source.Mark
}

const (
	srcTaygerly = "Taygerly, J. P.; Miller, L. M.; Yee, A.; Peterson, E. A. \"A convenient guide to help select replacement solvents for dichloromethane in chromatography\", Green Chem. 2012, 14, 3020-3025 (from memory)"
	// srcCHEM21Sub: the "possible substitution(s)" column of the guide's
	// table, as reproduced by AI4Green (read).
	srcCHEM21Sub = srcCHEM21 + ", column \"possible substitution\""
)

// rule is a suggestion for some uses (nil: every use).
type rule struct {
	uses []Use
	s    Suggestion
}

// substitutions by the CHEM21 entry ID of the solvent replaced.
var substitutions = map[string][]rule{
	"dichloromethane": {
		{[]Use{Chromatography}, Suggestion{
			Text:    "For methanol/dichloromethane eluents on silica, use heptane with a 3:1 (v/v) ethyl acetate–ethanol mixture as the polar part, re-optimised on TLC.",
			Replace: []string{"n-heptane", "ethyl acetate", "ethanol"}, Source: srcTaygerly, Mark: source.FromMemory}},
		{[]Use{Chromatography}, Suggestion{
			Text:    "For less polar dichloromethane eluents, ethyl acetate in heptane often gives a similar separation; check ΔRf on TLC.",
			Replace: []string{"ethyl acetate", "n-heptane"}, Source: srcTaygerly, Mark: source.FromMemory}},
		{[]Use{Crystallization, Distillation}, Suggestion{
			Text:    "Dissolve or extract with 2-methyltetrahydrofuran or ethyl acetate instead (both form a layer separate from water, as dichloromethane does), with heptane as antisolvent where one is needed; confirm solubility first.",
			Replace: []string{"2-methyltetrahydrofuran", "ethyl acetate"}, Source: "common practice, no source; classes from " + srcCHEM21, Mark: source.CommonPractice}},
	},
	"chloroform": {
		{nil, Suggestion{
			Text:    "Dichloromethane is the guide's replacement; it is itself hazardous, so consider the dichloromethane replacements as well.",
			Replace: []string{"dichloromethane"}, Source: srcCHEM21Sub, Mark: source.Confirmed}},
		{[]Use{Chromatography}, Suggestion{
			Text:    "For chloroform/methanol eluents, the dichloromethane replacement of heptane with 3:1 ethyl acetate–ethanol covers a similar polarity range (an inference: chloroform was not studied there).",
			Replace: []string{"n-heptane", "ethyl acetate", "ethanol"}, Source: srcTaygerly, Mark: source.FromMemory}},
	},
	"n-hexane": {
		{nil, Suggestion{
			Text:    "Use heptane, the guide's replacement; it elutes much like hexane on silica and boils higher (98 °C against 69 °C), so evaporation takes longer.",
			Replace: []string{"n-heptane"}, Source: srcCHEM21Sub, Mark: source.Confirmed}},
	},
	"n-pentane": {
		{nil, Suggestion{
			Text:    "Use heptane (flash point -4 °C against -40 °C for pentane); keep pentane only where a very volatile solvent is essential.",
			Replace: []string{"n-heptane"}, Source: srcCHEM21Sub, Mark: source.Confirmed}},
	},
	"diethyl ether": {
		{nil, Suggestion{
			Text:    "Use 2-methyltetrahydrofuran or tert-butyl methyl ether (the latter is itself ranked hazardous; 2-MeTHF is preferred).",
			Replace: []string{"2-methyltetrahydrofuran", "tert-butyl methyl ether"}, Source: srcCHEM21Sub, Mark: source.Confirmed}},
	},
	"tert-butyl methyl ether": {
		{nil, Suggestion{
			Text:    "Use 2-methyltetrahydrofuran (an ether) or isopropyl acetate (an ester of similar polarity); confirm solubility and, for chromatography, the Rf.",
			Replace: []string{"2-methyltetrahydrofuran", "isopropyl acetate"}, Source: "common practice, no source; classes from " + srcCHEM21, Mark: source.CommonPractice}},
	},
	"benzene":                {{nil, Suggestion{Text: "Use toluene.", Replace: []string{"toluene"}, Source: srcCHEM21Sub, Mark: source.Confirmed}}},
	"1,2-dichloroethane":     {{nil, Suggestion{Text: "Use dichloromethane (itself hazardous).", Replace: []string{"dichloromethane"}, Source: srcCHEM21Sub, Mark: source.Confirmed}}},
	"carbon tetrachloride":   {{nil, Suggestion{Text: "Use dichloromethane (itself hazardous).", Replace: []string{"dichloromethane"}, Source: srcCHEM21Sub, Mark: source.Confirmed}}},
	"1,2-dimethoxyethane":    {{nil, Suggestion{Text: "Use 2-methyltetrahydrofuran or tert-butyl methyl ether.", Replace: []string{"2-methyltetrahydrofuran", "tert-butyl methyl ether"}, Source: srcCHEM21Sub, Mark: source.Confirmed}}},
	"diisopropyl ether":      {{nil, Suggestion{Text: "Use 2-methyltetrahydrofuran or tert-butyl methyl ether.", Replace: []string{"2-methyltetrahydrofuran", "tert-butyl methyl ether"}, Source: srcCHEM21Sub, Mark: source.Confirmed}}},
	"1,4-dioxane":            {{nil, Suggestion{Text: "Use 2-methyltetrahydrofuran or tert-butyl methyl ether.", Replace: []string{"2-methyltetrahydrofuran", "tert-butyl methyl ether"}, Source: srcCHEM21Sub, Mark: source.Confirmed}}},
	"n-methyl-2-pyrrolidone": {{nil, Suggestion{Text: "Use acetonitrile where a dipolar aprotic solvent is needed.", Replace: []string{"acetonitrile"}, Source: srcCHEM21Sub, Mark: source.Confirmed}}},
}

// Substitutes lists replacements for a solvent in a use, best documented
// first; nil when the solvent is unknown to the guide or none is given
// (solvents ranked recommended or problematic mostly have none). The
// solvent is found as Lookup finds it.
func Substitutes(id string, use Use) []Suggestion {
	e, ok := Lookup(id)
	if !ok {
		return nil
	}
	var out []Suggestion
	for _, r := range substitutions[e.ID] {
		if r.uses == nil || containsUse(r.uses, use) {
			s := r.s
			s.Replace = append([]string(nil), s.Replace...)
			out = append(out, s)
		}
	}
	return out
}

func containsUse(us []Use, u Use) bool {
	for _, x := range us {
		if x == u {
			return true
		}
	}
	return false
}

// String is the suggestion with its source, for a note.
func (s Suggestion) String() string {
	return fmt.Sprintf("%s (replacements: %s; %s; %s)", s.Text, strings.Join(s.Replace, ", "), s.Source, s.Mark)
}
