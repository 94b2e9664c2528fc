package plain

import "testing"

// Cells that begin with =, +, -, @, tab or carriage return are prefixed with
// an apostrophe so a spreadsheet shows them as text. Source: OWASP, "CSV
// Injection" (from memory).
func TestSafe(t *testing.T) {
	t.Parallel()
	cases := map[string]string{
		"=HYPERLINK(\"x\")": "'=HYPERLINK(\"x\")",
		"+1":                "'+1",
		"-2":                "'-2",
		"@SUM(A1)":          "'@SUM(A1)",
		"\tx":               "'\tx",
		"ethyl acetate":     "ethyl acetate",
		"":                  "",
	}
	for in, want := range cases {
		if got := Safe(in); got != want {
			t.Errorf("Safe(%q) = %q, want %q", in, got, want)
		}
	}
}

// A batch mass is written as the chemist wrote it, not with the binary
// noise of its conversion to kg: 100 mg → 100 × 10⁻⁶ kg is
// 9.999999999999999e-05 in float64 (IEEE 754 rounding of the product),
// written 0.0001; masses a sweep spaces apart stay distinct.
func TestKgTextHidesConversionNoise(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		kg   float64
		want string
	}{
		{100 * 1e-6, "0.0001"}, {250 * 1e-6, "0.00025"}, {20 * 1e-3, "0.02"}, {2, "2"}, {1e-6, "1e-06"}, {10000, "10000"},
	} {
		if got := kgText(c.kg); got != c.want {
			t.Errorf("kgText(%v) = %q, want %q", c.kg, got, c.want)
		}
	}
	a, b := 1.4873521072935119e-4, 1.4873521072935120e-4*1.0000001
	if kgText(a) == kgText(b) {
		t.Errorf("masses 1e-7 apart in ratio written alike: %q", kgText(a))
	}
}
