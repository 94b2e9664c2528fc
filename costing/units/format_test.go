package units

import (
	"math"
	"testing"
)

// Batch masses and volumes as a chemist writes them: mg below a gram, g
// below a kilogram (common practice, no source); SI prefixes per the SI
// Brochure, 9th ed., 2019, Table 7 (1 mg = 1e-6 kg, 1 mL = 1e-6 m³).
func TestMassAndVolume(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		kg   float64
		want string
	}{
		{0.00025, "250 mg"}, {0.000999999999, "1 g"}, {0.02, "20 g"}, {0.25, "250 g"},
		{1.5, "1.5 kg"}, {12345, "12350 kg"}, {math.NaN(), "n/a"}, {0.1234567, "123.5 g"},
	} {
		if got := FormatMass(c.kg); got != c.want {
			t.Errorf("FormatMass(%v) = %q, want %q", c.kg, got, c.want)
		}
	}
	for _, c := range []struct {
		m3   float64
		want string
	}{
		{250e-6, "250 mL"}, {0.002, "2 L"}, {1.2, "1200 L"}, {math.Inf(1), "n/a"}, {0.1e-6, "0.1 mL"},
	} {
		if got := FormatVolume(c.m3); got != c.want {
			t.Errorf("FormatVolume(%v) = %q, want %q", c.m3, got, c.want)
		}
	}
}
