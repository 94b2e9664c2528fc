package solvent

import (
	"math"
	"sort"
	"strings"
	"testing"

	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Built-in properties against handbook values from a source other than the
// one each table entry cites where possible. Tolerances: density 0.5 %
// (handbooks differ by up to 0.3 % between editions and between 20 and
// 25 °C, about 0.1 %/K); boiling point 0.5 K (handbooks round to 0.1-1 K
// and differ by up to 0.3 K); molar mass 2e-4 relative (abridged atomic
// weights).
func TestHandbookProperties(t *testing.T) {
	t.Parallel()
	cases := []struct {
		id      string
		density float64 // g/mL at 20 °C
		bp      float64 // °C
		M       float64 // g/mol
	}{
		// Source: CRC Handbook, physical constants of organic compounds (from memory): 0.7893 g/mL, 78.29 °C, 46.068 g/mol.
		{"ethanol", 0.7893, 78.29, 46.068},
		// Source: CRC Handbook (from memory): 0.7914 g/mL, 64.6 °C, 32.042 g/mol.
		{"methanol", 0.7914, 64.6, 32.042},
		// Source: CRC Handbook (from memory): 0.8669 g/mL, 110.63 °C, 92.138 g/mol.
		{"toluene", 0.8669, 110.63, 92.138},
		// Source: CRC Handbook (from memory): 1.3266 g/mL, 39.6 °C, 84.93 g/mol.
		{"dichloromethane", 1.3266, 39.6, 84.93},
		// Source: CRC Handbook (from memory): 0.7138 g/mL, 34.5 °C, 74.12 g/mol.
		{"diethyl ether", 0.7138, 34.5, 74.12},
		// Source: CRC Handbook (from memory): 0.9003 g/mL, 77.11 °C, 88.105 g/mol.
		{"ethyl acetate", 0.9003, 77.11, 88.105},
		// Source: CRC Handbook (from memory): 0.7857 g/mL, 81.65 °C, 41.052 g/mol.
		{"acetonitrile", 0.7857, 81.65, 41.052},
		// Source: Tanaka et al., Metrologia 2001, 38, 301: 0.99821 g/mL at 20 °C; IAPWS-IF97 Tsat(101.325 kPa) 99.974 °C; IAPWS-95 M = 18.015268 g/mol (all from memory).
		{"water", 0.99821, 99.974, 18.015268},
	}
	book := Builtin()
	for _, c := range cases {
		s, ok := book.Find(c.id)
		if !ok {
			t.Errorf("%s not found", c.id)
			continue
		}
		if e := relErr(units.MustTo(s.Density.V, "g/mL"), c.density); e > 0.005 {
			t.Errorf("%s density %.4f g/mL, handbook %.4f, off by %.2f %%", c.id, units.MustTo(s.Density.V, "g/mL"), c.density, e*100)
		}
		if d := units.MustTo(s.BoilingPoint.V, "C") - c.bp; math.Abs(d) > 0.5 {
			t.Errorf("%s boiling point %.2f °C, handbook %.2f, off by %+.2f K", c.id, units.MustTo(s.BoilingPoint.V, "C"), c.bp, d)
		}
		if e := relErr(s.MolarMass()*1000, c.M); e > 2e-4 {
			t.Errorf("%s molar mass %.4f g/mol, handbook %.4f", c.id, s.MolarMass()*1000, c.M)
		}
	}
}

func TestSpecificQuantities(t *testing.T) {
	t.Parallel()
	w := mustFind(t, "water")
	// Source: IAPWS-IF97 steam tables, latent heat 2256.4 kJ/kg at 100 °C
	// (from memory); tolerance 0.2 % (the molar value is rounded to 4 digits).
	if e := relErr(w.SpecificHVap(), 2256.4e3); e > 0.002 {
		t.Errorf("water Δh = %.1f kJ/kg, steam tables 2256.4, off by %.2f %%", w.SpecificHVap()/1000, e*100)
	}
	// Source: IAPWS-95, cp of liquid water 4.1813 kJ/(kg·K) at 25 °C and
	// 0.1 MPa (from memory); tolerance 0.5 % (Cp is tabulated to 3 digits).
	if e := relErr(w.SpecificCp(), 4181.3); e > 0.005 {
		t.Errorf("water cp = %.1f J/(kg K), IAPWS 4181.3, off by %.2f %%", w.SpecificCp(), e*100)
	}
	// Source: percent composition C 52.14 % of ethanol and C 14.14 % of
	// dichloromethane (elemental-analysis tables, from memory); tolerance
	// 0.01 percentage points. Water has no carbon.
	for _, c := range []struct {
		id   string
		want float64
	}{{"ethanol", 0.5214}, {"dichloromethane", 0.1414}, {"water", 0}} {
		if got := mustFind(t, c.id).CarbonFraction(); math.Abs(got-c.want) > 1e-4 {
			t.Errorf("%s carbon fraction %.4f, want %.4f", c.id, got, c.want)
		}
	}
	// A formula that does not parse gives NaN, never a default.
	bad := w
	bad.Formula = "H2Q"
	if !math.IsNaN(bad.MolarMass()) || !math.IsNaN(bad.CarbonFraction()) {
		t.Error("unparsable formula should give NaN molar mass and carbon fraction")
	}
}

// Hazard flags against outside classifications.
func TestHazardFlags(t *testing.T) {
	t.Parallel()
	book := Builtin()
	// Source: 40 CFR 261.21(a)(1), ignitable below 60 °C flash point
	// (confirmed); water, dichloromethane and chloroform have no flash
	// point in closed-cup tests (suppliers' SDS, from memory); 1-butanol
	// (flash point 35-37 °C) is a GHS category 3 flammable liquid (from
	// memory).
	nonFlammable := map[string]bool{"water": true, "dichloromethane": true, "chloroform": true}
	// Source: Kelly, Chem. Health Saf. 1996, 3(5), 28, class B (diethyl
	// ether, THF, 2-propanol; from memory); 2-MeTHF as a THF analogue sold
	// with BHT (Aycock, Org. Process Res. Dev. 2007, 11, 156; from memory).
	// MTBE is deliberately not flagged (see builtin.go).
	peroxide := map[string]bool{"diethyl ether": true, "tetrahydrofuran": true, "2-methyltetrahydrofuran": true, "isopropanol": true}
	// Source: US EPA 40 CFR 261.31 F002 lists methylene chloride (confirmed);
	// chloroform is a chlorinated solvent (D022; from memory).
	halogenated := map[string]bool{"dichloromethane": true, "chloroform": true}
	for _, s := range book.All() {
		if s.Flammable() == nonFlammable[s.ID] {
			t.Errorf("%s: Flammable() = %v", s.ID, s.Flammable())
		}
		if s.PeroxideFormer != peroxide[s.ID] {
			t.Errorf("%s: PeroxideFormer = %v", s.ID, s.PeroxideFormer)
		}
		if s.Halogenated != halogenated[s.ID] {
			t.Errorf("%s: Halogenated = %v", s.ID, s.Halogenated)
		}
		if s.PeroxideBasis.Source == "" || s.PeroxideBasis.Mark == "" {
			t.Errorf("%s: peroxide flag has no basis", s.ID)
		}
	}
	// The threshold itself: 60 °C is not below 60 °C.
	s := mustFind(t, "1-butanol")
	s.FlashPoint.V = IgnitabilityLimit
	if s.Flammable() {
		t.Error("a flash point of exactly 60 °C is not below the 40 CFR 261.21 threshold")
	}
}

// The built-in table: at least 18 solvents, all valid, the common names
// and abbreviations chemists use, and every value with a source and a known mark.
func TestBuiltinTable(t *testing.T) {
	t.Parallel()
	book := Builtin()
	if book.Len() < 18 {
		t.Fatalf("%d built-in solvents, want at least 18", book.Len())
	}
	for _, name := range []string{"water", "methanol", "ethanol", "isopropanol", "acetone", "acetonitrile",
		"ethyl acetate", "isopropyl acetate", "n-hexane", "n-heptane", "cyclohexane", "toluene",
		"dichloromethane", "chloroform", "diethyl ether", "tert-butyl methyl ether", "tetrahydrofuran",
		"2-methyltetrahydrofuran", "EtOAc", "DCM", "MTBE", "THF", "IPA", "MeCN", "hexanes"} {
		if _, ok := book.Find(name); !ok {
			t.Errorf("%q not found", name)
		}
	}
	marks := map[source.Mark]bool{source.Confirmed: true, source.Derived: true, source.FromMemory: true, source.CommonPractice: true}
	for _, s := range builtinTable() {
		if err := s.Validate(); err != nil {
			t.Errorf("%s: %v", s.ID, err)
		}
		props := map[string]Prop{"density": s.Density, "boiling point": s.BoilingPoint, "hvap": s.HVap, "cp": s.Cp, "flash point": s.FlashPoint}
		for name, p := range props {
			if p.Source == "" || !marks[p.Mark] {
				t.Errorf("%s %s: source %q, mark %q", s.ID, name, p.Source, p.Mark)
			}
		}
		for i, a := range s.Antoine {
			if a.Source == "" || !marks[a.Mark] {
				t.Errorf("%s Antoine set %d: source %q, mark %q", s.ID, i+1, a.Source, a.Mark)
			}
		}
	}
}

// Coefficients: unique keys across the whole table (source.NewSet panics
// on a duplicate), display units of the right dimension, and display values
// that convert back to the SI value.
func TestCoefficients(t *testing.T) {
	t.Parallel()
	var all [][]source.Coefficient
	for _, s := range Builtin().All() {
		cs := s.Coefficients()
		all = append(all, cs)
		want := 7 + 5*len(s.Antoine) // molar mass, density, bp, hvap, cp, 2 flags
		if s.HasFlashPoint {
			want++
		}
		if len(cs) != want {
			t.Errorf("%s: %d coefficients, want %d", s.ID, len(cs), want)
		}
		for _, c := range cs {
			if !strings.HasPrefix(c.Key, "solvent."+KeyID(s.ID)+".") || strings.Contains(c.Key, " ") {
				t.Errorf("%s: key %q", s.ID, c.Key)
			}
			if c.Method != "solvent data" || c.Source == "" || c.Mark == "" {
				t.Errorf("%s: %+v", c.Key, c)
			}
			if c.Unit != "" {
				u, err := units.ParseUnit(c.Unit)
				if err != nil || u.Dim != c.Dim {
					t.Errorf("%s: unit %q does not parse to %s (%v)", c.Key, c.Unit, c.Dim.Name(), err)
					continue
				}
				if back := units.MustFrom(c.Display(), c.Unit); math.Abs(back-c.SI) > 1e-9*math.Max(1, math.Abs(c.SI)) {
					t.Errorf("%s: display %v %s converts back to %v, not %v", c.Key, c.Display(), c.Unit, back, c.SI)
				}
			}
		}
	}
	set := source.NewSet(all...)
	// Spot check against the table's printed units: ethyl acetate density
	// displays in g/mL as written in builtin.go (0.900) and its boiling
	// point in °C (77.1).
	if d := set.Of("solvent.ethyl_acetate.density").Display(); math.Abs(d-0.900) > 1e-12 {
		t.Errorf("ethyl acetate density displays as %v g/mL", d)
	}
	if d := set.Of("solvent.ethyl_acetate.boiling_point").Display(); math.Abs(d-77.1) > 1e-9 {
		t.Errorf("ethyl acetate boiling point displays as %v C", d)
	}
	keys := set.Keys()
	if !sort.StringsAreSorted(keys) || len(keys) < 18*8 {
		t.Errorf("%d coefficient keys", len(keys))
	}
}
