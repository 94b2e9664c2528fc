package solvent

import (
	"errors"
	"strings"
	"testing"

	"sepcost/costing/source"
)

func TestFind(t *testing.T) {
	t.Parallel()
	book := Builtin()
	// Abbreviations as used in the laboratory (common practice, no source).
	cases := map[string]string{
		"EtOAc":              "ethyl acetate",
		"etoac":              "ethyl acetate",
		"  ETHYL   ACETATE ": "ethyl acetate",
		"DCM":                "dichloromethane",
		"methylene chloride": "dichloromethane",
		"MTBE":               "tert-butyl methyl ether",
		"tbme":               "tert-butyl methyl ether",
		"THF":                "tetrahydrofuran",
		"2-MeTHF":            "2-methyltetrahydrofuran",
		"IPA":                "isopropanol",
		"2-propanol":         "isopropanol",
		"MeCN":               "acetonitrile",
		"hexanes":            "n-hexane",
		"Hexane":             "n-hexane",
		"Et2O":               "diethyl ether",
		"IPAc":               "isopropyl acetate",
		"MeOH":               "methanol",
		"EtOH":               "ethanol",
		"chcl3":              "chloroform",
		"n-BuOH":             "1-butanol",
		"Water":              "water",
	}
	for name, want := range cases {
		s, ok := book.Find(name)
		if !ok || s.ID != want {
			t.Errorf("Find(%q) = %q, %v; want %q", name, s.ID, ok, want)
		}
	}
	for _, name := range []string{"", "benzene", "ethyl", "EtOAc2"} {
		if s, ok := book.Find(name); ok {
			t.Errorf("Find(%q) found %q", name, s.ID)
		}
	}
	var empty Book
	if _, ok := empty.Find("water"); ok {
		t.Error("empty Book found water")
	}
}

// custom is a valid user-defined solvent to start the error cases from.
// Values: 2-butanone (MEK), CRC Handbook (from memory) — only its validity
// matters here.
func custom() Solvent {
	return Solvent{
		ID: "2-butanone", Aliases: []string{"MEK"}, Formula: "C4H8O", CAS: "78-93-3",
		Density:      Prop{V: 805, Source: "CRC Handbook (from memory)", Mark: source.FromMemory},
		BoilingPoint: Prop{V: 352.7, Source: "CRC Handbook (from memory)", Mark: source.FromMemory},
		HVap:         Prop{V: 31300, Source: "CRC Handbook (from memory)", Mark: source.FromMemory},
		Cp:           Prop{V: 158.7, Source: "CRC Handbook (from memory)", Mark: source.FromMemory},
		FlashPoint:   Prop{V: 264.15, Source: "SDS (from memory)", Mark: source.FromMemory}, HasFlashPoint: true,
		Antoine: []Antoine{{A: 9.1386 - 5, B: 1232.63, C: -54.46, Tmin: 265.62, Tmax: 375.66,
			Source: "Poling et al. 5th ed. App. A via chemicals (from memory)", Mark: source.FromMemory}},
	}
}

func TestAddValidation(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name  string
		edit  func(*Solvent)
		field string
		want  []string
	}{
		{"negative density", func(s *Solvent) { s.Density.V = -805 }, "density",
			[]string{`solvent "2-butanone": density:`, "-0.805 g/mL", "want a positive density"}},
		{"zero boiling point", func(s *Solvent) { s.BoilingPoint.V = 0 }, "boiling point",
			[]string{"boiling point", "want a positive boiling point"}},
		{"no enthalpy", func(s *Solvent) { s.HVap.V = 0 }, "enthalpy of vaporization",
			[]string{"want a positive enthalpy of vaporization", "kJ/mol"}},
		{"Tmin >= Tmax", func(s *Solvent) { s.Antoine[0].Tmin, s.Antoine[0].Tmax = 380, 300 }, "antoine[1].tmin",
			[]string{"antoine[1].tmin", "380 K to 300 K", "want 0 < Tmin < Tmax"}},
		{"pole inside range", func(s *Solvent) { s.Antoine[0].C = -270 }, "antoine[1].c",
			[]string{"antoine[1].c", "want Tmin + C > 0"}},
		{"negative B", func(s *Solvent) { s.Antoine[0].B = -5 }, "antoine[1].b",
			[]string{"want B > 0"}},
		{"bad formula", func(s *Solvent) { s.Formula = "C4H8Q" }, "formula",
			[]string{"formula", `unknown element "Q"`, `e.g. "C4H8O2"`}},
		{"empty formula", func(s *Solvent) { s.Formula = "" }, "formula",
			[]string{"empty formula"}},
		{"halogen flag", func(s *Solvent) { s.Halogenated = true }, "halogenated",
			[]string{"halogenated", "contains no F, Cl, Br or I", "set it to false"}},
		{"bad CAS", func(s *Solvent) { s.CAS = "78-93-4" }, "cas",
			[]string{`"78-93-4" is not a CAS Registry Number`}},
		{"upper-case id", func(s *Solvent) { s.ID = "MEK" }, "id",
			[]string{"must be lower case", `write "mek"`}},
		{"empty alias", func(s *Solvent) { s.Aliases = []string{" "} }, "aliases[1]",
			[]string{"aliases[1]", "empty"}},
		{"flash point missing", func(s *Solvent) { s.FlashPoint.V = 0 }, "flash point",
			[]string{"want a positive flash point", "no flash point"}},
		{"alias clash", func(s *Solvent) { s.Aliases = []string{"MEK", "DCM"} }, "aliases[2]",
			[]string{`"DCM" is already a name of "dichloromethane"`}},
		{"id is another's alias", func(s *Solvent) { s.ID = "thf"; s.Aliases = nil }, "id",
			[]string{`"thf" is already a name of "tetrahydrofuran"`}},
	}
	for _, c := range cases {
		book := Builtin()
		before := book.Len()
		s := custom()
		c.edit(&s)
		err := book.Add(s)
		if err == nil {
			t.Errorf("%s: Add accepted it", c.name)
			continue
		}
		if !errors.Is(err, ErrInvalid) {
			t.Errorf("%s: %v does not unwrap to ErrInvalid", c.name, err)
		}
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Field != c.field {
			t.Errorf("%s: error %v is not a FieldError for %q", c.name, err, c.field)
		}
		for _, w := range c.want {
			if !strings.Contains(err.Error(), w) {
				t.Errorf("%s: error %q lacks %q", c.name, err, w)
			}
		}
		if book.Len() != before {
			t.Errorf("%s: the book changed on error", c.name)
		}
	}

	// All problems are reported at once.
	s := custom()
	s.Density.V, s.Formula = -1, "Qq"
	err := s.Validate()
	if err == nil || !strings.Contains(err.Error(), "density") || !strings.Contains(err.Error(), "formula") {
		t.Errorf("two problems, error %v", err)
	}

	// A reader can add where the solvent was written.
	var fe *FieldError
	if errors.As(err, &fe) {
		fe.File, fe.Line = "scenario.yaml", 12
		if !strings.HasPrefix(fe.Error(), "scenario.yaml:12: solvent") {
			t.Errorf("with file and line: %q", fe.Error())
		}
	}
}

func TestAddAndReplace(t *testing.T) {
	t.Parallel()
	book := Builtin()
	n := book.Len()
	if err := book.Add(custom()); err != nil {
		t.Fatal(err)
	}
	if book.Len() != n+1 {
		t.Errorf("Len = %d after Add, want %d", book.Len(), n+1)
	}
	if s, ok := book.Find("mek"); !ok || s.ID != "2-butanone" {
		t.Errorf("Find(mek) = %q, %v", s.ID, ok)
	}
	// Replace: same ID, new alias; the old alias no longer finds it.
	s := custom()
	s.Aliases = []string{"methyl ethyl ketone"}
	s.Density.V = 806
	if err := book.Add(s); err != nil {
		t.Fatal(err)
	}
	if book.Len() != n+1 {
		t.Errorf("Len = %d after replace, want %d", book.Len(), n+1)
	}
	if _, ok := book.Find("MEK"); ok {
		t.Error("old alias still finds the replaced solvent")
	}
	if got, _ := book.Find("Methyl Ethyl Ketone"); got.Density.V != 806 {
		t.Errorf("replaced density = %v", got.Density.V)
	}
	// A built-in may be replaced by its own ID (a site's better data).
	eth, _ := book.Find("ethanol")
	eth.Density.V = 789.3
	if err := book.Add(eth); err != nil {
		t.Fatalf("replacing ethanol: %v", err)
	}
	// The zero Book is usable.
	var empty Book
	if err := empty.Add(custom()); err != nil || empty.Len() != 1 {
		t.Errorf("zero Book: %v, Len %d", err, empty.Len())
	}
}

// Builtin gives independent copies; values handed out cannot change a Book.
func TestBuiltinIsolation(t *testing.T) {
	t.Parallel()
	a, b := Builtin(), Builtin()
	if err := a.Add(custom()); err != nil {
		t.Fatal(err)
	}
	if _, ok := b.Find("MEK"); ok {
		t.Error("Add to one Builtin() is visible in another")
	}
	s, _ := a.Find("water")
	s.Aliases[0] = "changed"
	s.Antoine[0].A = 0
	again, _ := a.Find("water")
	if again.Aliases[0] != "H2O" || again.Antoine[0].A == 0 {
		t.Error("changing a found solvent changed the Book")
	}
	all := a.All()
	for i := 1; i < len(all); i++ {
		if all[i-1].ID >= all[i].ID {
			t.Errorf("All not sorted: %q before %q", all[i-1].ID, all[i].ID)
		}
	}
}
