package green

import (
	"strings"
	"testing"

	"sepcost/costing/solvent"
	"sepcost/costing/source"
)

func replaces(ss []Suggestion, ids ...string) bool {
	for _, s := range ss {
		all := true
		for _, id := range ids {
			found := false
			for _, r := range s.Replace {
				if r == id {
					found = true
				}
			}
			all = all && found
		}
		if all {
			return true
		}
	}
	return false
}

// TestSubstitutes checks suggestions against their sources.
func TestSubstitutes(t *testing.T) {
	t.Parallel()
	// Source: CHEM21 table, substitution column: hexane → heptane (confirmed).
	if !replaces(Substitutes("n-hexane", Chromatography), "n-heptane") {
		t.Errorf("hexane: heptane not suggested")
	}
	// Source: CHEM21 table: diethyl ether → methyl-THF, MTBE (confirmed).
	if !replaces(Substitutes("diethyl ether", Crystallization), "2-methyltetrahydrofuran", "tert-butyl methyl ether") {
		t.Errorf("diethyl ether: 2-MeTHF and MTBE not suggested")
	}
	// Source: CHEM21 table: chloroform → dichloromethane (confirmed).
	if !replaces(Substitutes("chloroform", Distillation), "dichloromethane") {
		t.Errorf("chloroform: dichloromethane not suggested")
	}
	// Source: Taygerly et al., Green Chem. 2012, 14, 3020: 3:1 ethyl
	// acetate/ethanol in heptane for methanol/dichloromethane (from memory).
	dcm := Substitutes("dichloromethane", Chromatography)
	if !replaces(dcm, "n-heptane", "ethyl acetate", "ethanol") || !strings.Contains(dcm[0].Text, "3:1") {
		t.Errorf("dichloromethane in chromatography: %v", dcm)
	}
	// The chromatography blend is not offered for crystallization.
	for _, s := range Substitutes("dichloromethane", Crystallization) {
		if strings.Contains(s.Text, "3:1") {
			t.Errorf("chromatography suggestion offered for crystallization: %s", s.Text)
		}
	}
	// Recommended solvents need none; unknown solvents get none.
	if s := Substitutes("ethanol", Chromatography); len(s) != 0 {
		t.Errorf("ethanol: %v", s)
	}
	if s := Substitutes("unobtainium", Chromatography); s != nil {
		t.Errorf("unknown solvent: %v", s)
	}
}

// TestSubstitutesAreBetter guards that every suggestion names built-in
// solvents, carries a source and a mark, and replaces a solvent by ones no
// worse in the CHEM21 ranking, at least one of them better.
func TestSubstitutesAreBetter(t *testing.T) {
	t.Parallel()
	book := solvent.Builtin()
	for from, rules := range substitutions {
		orig, ok := Class(from)
		if !ok {
			t.Errorf("substitution for %q, which has no CHEM21 class", from)
			continue
		}
		for _, r := range rules {
			s := r.s
			if s.Text == "" || s.Source == "" {
				t.Errorf("%s: suggestion without text or source", from)
			}
			switch s.Mark {
			case source.Confirmed, source.FromMemory, source.CommonPractice:
			default:
				t.Errorf("%s: mark %q", from, s.Mark)
			}
			better := false
			for _, id := range s.Replace {
				if _, ok := book.Find(id); !ok {
					t.Errorf("%s: replacement %q is not a built-in solvent", from, id)
				}
				c, ok := Class(id)
				if !ok || c.Rank() > orig.Rank() {
					t.Errorf("%s (%s): replacement %s is %q", from, orig, id, c)
				}
				if c.Rank() < orig.Rank() {
					better = true
				}
			}
			if !better {
				t.Errorf("%s (%s): no replacement ranks better in %q", from, orig, s.Text)
			}
		}
	}
}

func TestParseUse(t *testing.T) {
	t.Parallel()
	for in, want := range map[string]Use{"Chromatography": Chromatography, "recrystallization": Crystallization, " distillation ": Distillation} {
		if got, err := ParseUse(in); err != nil || got != want {
			t.Errorf("ParseUse(%q) = %v, %v", in, got, err)
		}
	}
	if _, err := ParseUse("sublimation"); err == nil || !strings.Contains(err.Error(), "chromatography") {
		t.Errorf("ParseUse(\"sublimation\") error %v", err)
	}
}
