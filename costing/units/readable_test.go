package units

import (
	"math"
	"testing"
)

// Expected strings follow the SI Brochure's prefixes (9th ed., 2019,
// Table 7: 1 kg = 1000 g, 1 L = 1000 mL, 1 m³ = 1000 L, 1 kWh = 1000 Wh)
// and rounding to three significant figures (common practice).
func TestReadable(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		v    float64
		unit string
		want string
	}{
		{517146.747, "g", "517 kg"},
		{0.25, "g", "250 mg"},
		{0.00025, "kg", "250 mg"},
		{6.911e-05, "kWh", "0.0691 Wh"},
		{0.4373, "L", "437 mL"},
		{3339.749, "L", "3.34 m³"},
		{99999.999999969, "", "100,000"},
		{1.384, "h", "1.38 h"},
		{0.05, "h", "3 min"},
		{99.98, "%", "99.98 %"},
		{99.999, "%", "> 99.99 %"},
		{88.88, "%", "88.9 %"},
		{150, "°C", "150 °C"},
		{25, "mm", "25 mm"},
		{0, "g", "0 g"},
		{200, "W/(m^2·K)", "200 W/(m²·K)"},
	} {
		if got := Readable(c.v, c.unit); got != c.want {
			t.Errorf("Readable(%v, %q) = %q, want %q", c.v, c.unit, got, c.want)
		}
	}
}

// The two ends of a range carry the same decimals, as a range is written
// in a report (common practice, no source): 1.42 to 2.00, not 1.42 to 2.
func TestSig3Range(t *testing.T) {
	for _, c := range []struct {
		lo, hi         float64
		wantLo, wantHi string
	}{
		{1.42, 2, "1.42", "2.00"},
		{2.59, 3.71, "2.59", "3.71"},
		{0.0042, 0.0061, "0.00420", "0.00610"},
		{950, 1234, "950", "1,234"},
		{99.96, 120, "100", "120"},
		{0, 2.5, "0", "2.50"},
		{math.NaN(), 2.5, "NaN", "2.50"},
	} {
		lo, hi := Sig3Range(c.lo, c.hi)
		if lo != c.wantLo || hi != c.wantHi {
			t.Errorf("Sig3Range(%g, %g) = %q, %q; want %q, %q", c.lo, c.hi, lo, hi, c.wantLo, c.wantHi)
		}
	}
}
