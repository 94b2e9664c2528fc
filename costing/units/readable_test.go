package units

import "testing"

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
