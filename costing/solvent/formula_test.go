package solvent

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// Molar masses from formulas against published molecular weights. The
// tolerance is 2e-4 relative: the abridged atomic weights (e.g. Cl 35.45
// rather than 35.453, H 1.0080 rather than 1.00794) shift molar masses by
// up to about 1e-4 relative from the values printed in older handbooks.
func TestMolarMassFromFormula(t *testing.T) {
	t.Parallel()
	cases := []struct {
		formula string
		want    float64 // g/mol
		source  string
	}{
		// Source: ethyl acetate, CRC Handbook 88.105 g/mol (from memory); 88.106 with the 2021 abridged weights.
		{"C4H8O2", 88.106, "ethyl acetate, CRC Handbook 88.105 g/mol (from memory)"},
		// Source: CRC Handbook, dichloromethane 84.93 g/mol (from memory).
		{"CH2Cl2", 84.93, "dichloromethane, CRC Handbook (from memory)"},
		// Source: IAPWS-95 molar mass of water 18.015268 g/mol (Wagner & Pruss, J. Phys. Chem. Ref. Data 2002, 31, 387; from memory).
		{"H2O", 18.015268, "water, IAPWS-95 (from memory)"},
		// Source: CRC Handbook, ethanol 46.068 g/mol (from memory).
		{"C2H6O", 46.068, "ethanol, CRC Handbook (from memory)"},
		// Source: CRC Handbook, toluene 92.138 g/mol (from memory).
		{"C7H8", 92.138, "toluene, CRC Handbook (from memory)"},
		// Source: CRC Handbook, chloroform 119.378 g/mol (from memory).
		{"CHCl3", 119.378, "chloroform, CRC Handbook (from memory)"},
		// Source: CRC Handbook, n-hexane 86.175 g/mol (from memory); condensed formula CH3(CH2)4CH3.
		{"CH3(CH2)4CH3", 86.175, "n-hexane written condensed, CRC Handbook (from memory)"},
		// Source: CRC Handbook, tert-butyl methyl ether 88.148 g/mol (from memory); condensed (CH3)3COCH3.
		{"(CH3)3COCH3", 88.148, "MTBE written condensed, CRC Handbook (from memory)"},
		// Source: CRC Handbook, acetonitrile 41.052 g/mol (from memory).
		{"C2H3N", 41.052, "acetonitrile, CRC Handbook (from memory)"},
		// Source: CRC Handbook, sodium chloride 58.44 g/mol (from memory); a formula without carbon.
		{"NaCl", 58.44, "sodium chloride, CRC Handbook (from memory)"},
	}
	for _, c := range cases {
		comp, err := ParseFormula(c.formula)
		if err != nil {
			t.Errorf("%s: %v", c.formula, err)
			continue
		}
		got := comp.MolarMass() * 1000
		if rel := math.Abs(got/c.want - 1); rel > 2e-4 {
			t.Errorf("%s: M = %.4f g/mol, want %.4f (%s), off by %.2g relative", c.formula, got, c.want, c.source, rel)
		}
	}
}

// Elemental composition of toluene, C 91.25 %, H 8.75 % by mass.
// Source: percent composition of C7H8 as printed in elemental-analysis
// tables (from memory); tolerance 0.01 percentage points, the rounding of
// the printed value.
func TestMassFraction(t *testing.T) {
	t.Parallel()
	comp, err := ParseFormula("C7H8")
	if err != nil {
		t.Fatal(err)
	}
	if got := comp.MassFraction("C") * 100; math.Abs(got-91.25) > 0.01 {
		t.Errorf("carbon in toluene = %.3f %%, want 91.25 %%", got)
	}
	if got := comp.MassFraction("H") * 100; math.Abs(got-8.75) > 0.01 {
		t.Errorf("hydrogen in toluene = %.3f %%, want 8.75 %%", got)
	}
	// Identity: the mass fractions of all elements add up to one.
	if s := comp.MassFraction("C") + comp.MassFraction("H"); math.Abs(s-1) > 1e-12 {
		t.Errorf("mass fractions add to %v, want 1", s)
	}
}

func TestParseFormulaErrors(t *testing.T) {
	t.Parallel()
	cases := []struct {
		in   string
		want []string // substrings of the message
	}{
		{"", []string{"empty formula", `e.g. "C4H8O2"`}},
		{"   ", []string{"empty formula"}},
		{"C4H8Q2", []string{`unknown element "Q"`, "position 5", "known:"}},
		{"c4h8o2", []string{`unexpected 'c'`, "position 1"}},
		{"C0H4", []string{"count 0", "position 2"}},
		{"CH3(CH2", []string{"'(' without a matching ')'"}},
		{"CH3)2", []string{"')' without a matching '('"}},
		{"C4 H8", []string{"unexpected ' '"}},
		{"C999999", []string{"larger than 100000"}},
		{"C99999999999999999999999", []string{"larger than 100000"}},
		{"((((((((((C))))))))))", []string{"nested deeper"}},
		{"(C9999)9999(H)", []string{"more than 100000 atoms"}},
		{"()", []string{"no element symbols"}},
	}
	for _, c := range cases {
		_, err := ParseFormula(c.in)
		if err == nil {
			t.Errorf("ParseFormula(%q): no error", c.in)
			continue
		}
		if !errors.Is(err, ErrFormula) {
			t.Errorf("ParseFormula(%q): error %v does not unwrap to ErrFormula", c.in, err)
		}
		for _, w := range c.want {
			if !strings.Contains(err.Error(), w) {
				t.Errorf("ParseFormula(%q): error %q lacks %q", c.in, err, w)
			}
		}
	}
}

// Hill order: C, H, then the rest alphabetically (Hill, E. A. J. Am. Chem.
// Soc. 1900, 22, 478; from memory).
func TestHill(t *testing.T) {
	t.Parallel()
	cases := map[string]string{
		"CH3(CH2)4CH3": "C6H14",
		"ClCH2Cl":      "CH2Cl2",
		"OH2":          "H2O",
		"ClNa":         "ClNa",
		"(CH3)3COCH3":  "C5H12O",
	}
	for in, want := range cases {
		c, err := ParseFormula(in)
		if err != nil {
			t.Fatalf("%s: %v", in, err)
		}
		if got := c.Hill(); got != want {
			t.Errorf("Hill(%s) = %s, want %s", in, got, want)
		}
	}
}

// FuzzParseFormula: the parser never panics; whatever it accepts has a
// finite positive molar mass and survives a round trip through Hill.
func FuzzParseFormula(f *testing.F) {
	for _, s := range []string{"C4H8O2", "CH2Cl2", "H2O", "CH3(CH2)4CH3", "((CH3)3C)2O", "Na", "C", ")(", "C0", "Xx9", "C999999", "((B10))1000", "(((((((((C)))))))))"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		c, err := ParseFormula(s)
		if err != nil {
			if !errors.Is(err, ErrFormula) {
				t.Fatalf("%q: error %v does not unwrap to ErrFormula", s, err)
			}
			return
		}
		m := c.MolarMass()
		if !(m > 0) || math.IsInf(m, 0) {
			t.Fatalf("%q: molar mass %v", s, m)
		}
		again, err := ParseFormula(c.Hill())
		if err != nil {
			t.Fatalf("%q: Hill form %q does not parse: %v", s, c.Hill(), err)
		}
		if again.Hill() != c.Hill() || math.Abs(again.MolarMass()-m) > 1e-12*m {
			t.Fatalf("%q: round trip %q → %q", s, c.Hill(), again.Hill())
		}
	})
}
