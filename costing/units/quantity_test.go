package units

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// Conversions checked against their definitions. Source: SI Brochure, 9th
// ed. (BIPM 2019) for SI prefixes and the kelvin–Celsius offset of 273.15;
// NIST SP 811 (2008) Appendix B.8 for 1 in = 0.0254 m, 1 atm = 101 325 Pa,
// 1 Torr = 101 325/760 Pa, 1 mmHg = 133.322 387 415 Pa, 1 kWh = 3.6 MJ,
// 1 cal (thermochemical) = 4.184 J.
func TestParse(t *testing.T) {
	t.Parallel()
	cases := []struct {
		in  string
		si  float64
		dim Dim
	}{
		{"20 g", 0.020, Mass},
		{"1.5kg", 1.5, Mass},
		{"250 mg", 250e-6, Mass},
		{"500 mL", 500e-6, Volume},
		{"2.5 L", 2.5e-3, Volume},
		{"15 cm", 0.15, Length},
		{"6 in", 0.1524, Length},
		{"78 C", 351.15, Temperature},
		{"25 °C", 298.15, Temperature},
		{"300 K", 300, Temperature},
		{"30 min", 1800, Time},
		{"1 kWh", 3.6e6, Energy},
		{"1 kcal", 4184, Energy},
		{"760 Torr", 101325, Pressure},
		{"1 atm", 101325, Pressure},
		{"20 mbar", 2000, Pressure},
		{"1 mmHg", 133.322387415, Pressure},
		{"5 cm/min", 0.05 / 60, Velocity},
		{"0.5 g/mL", 500, Density},
		{"0.75 mL/g", 0.75e-3, SpecificVolume},
		{"38.56 kJ/mol", 38560, MolarEnergy},
		{"112 J/(mol K)", 112, MolarHeatCapacity},
		{"112 J/mol/K", 112, MolarHeatCapacity},
		{"2 L/h", 2e-3 / 3600, VolumeFlow},
		{"85 %", 0.85, None},
		{"1e3 g", 1, Mass},
		{"8 each", 8, Count},
	}
	for _, c := range cases {
		q, _, err := Parse(c.in)
		if err != nil {
			t.Errorf("Parse(%q): %v", c.in, err)
			continue
		}
		if q.Dim != c.dim || math.Abs(q.SI-c.si) > 1e-9*math.Abs(c.si) {
			t.Errorf("Parse(%q) = %g %v, want %g %v", c.in, q.SI, q.Dim, c.si, c.dim)
		}
	}
}

func TestParseErrors(t *testing.T) {
	t.Parallel()
	cases := []struct{ in, want string }{
		{"20", "has no unit"},
		{"g", "does not start with a number"},
		{"20 furlongs", "unknown unit"},
		{"1..2 g", "not a number"},
		{"5 C/min", "Celsius cannot be combined"},
		{"3 (g", "unbalanced"},
	}
	for _, c := range cases {
		_, _, err := Parse(c.in)
		if err == nil || !strings.Contains(err.Error(), c.want) || !errors.Is(err, ErrUnit) {
			t.Errorf("Parse(%q) error = %v, want %q", c.in, err, c.want)
		}
	}
	// ParseAs names the expected dimension and accepted units.
	_, err := ParseAs("20 mL", Mass)
	if err == nil || !strings.Contains(err.Error(), "is volume, not mass") || !strings.Contains(err.Error(), `"20 g"`) {
		t.Errorf("ParseAs dimension error = %v", err)
	}
}

// Round trip: To(From(v)) = v for every unit in the table.
func TestRoundTrip(t *testing.T) {
	t.Parallel()
	for name := range table {
		si, err := From(12.5, name)
		if err != nil {
			t.Fatal(err)
		}
		back, err := To(si, name)
		if err != nil || math.Abs(back-12.5) > 1e-9 {
			t.Errorf("%s: round trip gave %g", name, back)
		}
	}
}
