package units

import (
	"errors"
	"math"
	"testing"
)

// The trade's ways of writing a measured value with its spread read to
// the same limits: "12–18 g/L", "12-18 g/L", "12 to 18 g/L" and
// "15 ± 3 g/L" all mean 12 to 18 g/L (15 ± 3 kg/m³ in SI); a temperature
// range shifts its nominal value but not its half-width.
func TestParseRange(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		in         string
		nom, half  float64
		form       Form
		wantUnitTx string
	}{
		{"12–18 g/L", 15, 3, Interval, "g/L"},
		{"12-18 g/L", 15, 3, Interval, "g/L"},
		{"12 - 18 g/L", 15, 3, Interval, "g/L"},
		{"12 to 18 g/L", 15, 3, Interval, "g/L"},
		{"15 ± 3 g/L", 15, 3, PlusMinus, "g/L"},
		{"15+/-3 g/L", 15, 3, PlusMinus, "g/L"},
		{"15 g/L", 15, 0, Exact, "g/L"},
		{"78 ± 2 C", 351.15, 2, PlusMinus, "C"},
		{"-10–-5 C", 265.65, 2.5, Interval, "C"},
		{"1.5e-3 ± 2e-4 kg", 1.5e-3, 2e-4, PlusMinus, "kg"},
	} {
		r, u, err := ParseRange(c.in)
		if err != nil {
			t.Errorf("%q: %v", c.in, err)
			continue
		}
		if math.Abs(r.Nominal-c.nom) > 1e-9 || math.Abs(r.Half-c.half) > 1e-9 || r.Form != c.form || u.Text != c.wantUnitTx {
			t.Errorf("%q: %+v %q, want %g ± %g %v %q", c.in, r, u.Text, c.nom, c.half, c.form, c.wantUnitTx)
		}
	}
}

// Plain numbers and percentages: an Rf "0.30 ± 0.03" is 0.27 to 0.33; a
// purity "85 ± 3 %" is 0.82 to 0.88.
func TestParsePlainRange(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		in        string
		nom, half float64
	}{{"0.30 ± 0.03", 0.30, 0.03}, {"0.27–0.33", 0.30, 0.03}, {"85 ± 3 %", 0.85, 0.03}, {"82-88 %", 0.85, 0.03}, {"0.3", 0.3, 0}, {".5", 0.5, 0}} {
		r, err := ParsePlainRange(c.in)
		if err != nil || math.Abs(r.Nominal-c.nom) > 1e-12 || math.Abs(r.Half-c.half) > 1e-12 {
			t.Errorf("%q: %+v %v, want %g ± %g", c.in, r, err, c.nom, c.half)
		}
	}
	// Standard uncertainty of a rectangular distribution, a/√3
	// (JCGM 100:2008 §4.3.7): ± 0.03 gives 0.01732.
	if u := (Range{Half: 0.03}).StdUncertainty(); math.Abs(u-0.0173205) > 1e-6 {
		t.Errorf("u = %g", u)
	}
}

// Ranges that cannot be meant are refused with the reason and an example.
func TestParseRangeRefuses(t *testing.T) {
	t.Parallel()
	for _, in := range []string{"18–12 g/L", "15 ± 0 g/L", "15 ± -3 g/L", "15 ± g/L", "12–18", "± 3 g/L", "12–18 parsecs"} {
		if _, _, err := ParseRange(in); err == nil || !errors.Is(err, ErrUnit) {
			t.Errorf("%q: %v", in, err)
		}
	}
	for _, in := range []string{"0.3 ± 0.03 g", "0.33–0.27", "abc"} {
		if _, err := ParsePlainRange(in); err == nil {
			t.Errorf("%q accepted", in)
		}
	}
	if _, err := ParseRangeAs("12–18 g", Density); err == nil {
		t.Errorf("wrong dimension accepted")
	}
}

// Whatever is written, a range reads without a panic, and a range read has
// finite limits in order.
func FuzzParseRange(f *testing.F) {
	for _, s := range []string{"12–18 g/L", "0.30 ± 0.03", "15+/-3 g/L", "-10–-5 C", "1e-3 to 2e-3 kg", "±", "–", "1e309 ± 1 g", "5 - g", "-1.7e308–1.7e308 g"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		for _, read := range []func(string) (Range, error){
			func(s string) (Range, error) { r, _, err := ParseRange(s); return r, err },
			ParsePlainRange,
		} {
			r, err := read(s)
			if err != nil {
				continue
			}
			if math.IsNaN(r.Nominal) || math.IsInf(r.Nominal, 0) || !(r.Half >= 0) || math.IsInf(r.Half, 0) || r.Lo() > r.Hi() {
				t.Errorf("%q read as %+v", s, r)
			}
		}
	})
}
