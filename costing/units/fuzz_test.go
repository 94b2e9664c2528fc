package units

import (
	"errors"
	"math"
	"testing"
)

// FuzzParse: Parse never panics; an accepted quantity is finite, its
// exponents lie within ±MaxExponent, and reading it again for its own
// dimension gives the same value; a refusal unwraps to ErrUnit. Seeds in
// testdata/fuzz/FuzzParse.
func FuzzParse(f *testing.F) {
	for _, s := range []string{"20 g", "1.5kg", "78 C", "0.75 mL/g", "112 J/(mol K)", "1e306 t", "1 kg^4 kg^4 kg^4", "5 cm/min", "-0 %", "-3e4 mL", "(", "1 ^"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		q, u, err := Parse(s)
		if err != nil {
			if !errors.Is(err, ErrUnit) {
				t.Fatalf("%q: error %v does not unwrap to ErrUnit", s, err)
			}
			if len(err.Error()) > 4*MaxQuantityLen+300 { // %q shows a byte as at most 4
				t.Fatalf("%q: message of %d bytes", s, len(err.Error()))
			}
			return
		}
		if math.IsNaN(q.SI) || math.IsInf(q.SI, 0) || !(u.Factor > 0) || math.IsInf(u.Factor, 0) {
			t.Fatalf("%q: SI %g, factor %g", s, q.SI, u.Factor)
		}
		for _, e := range []int8{q.Dim.M, q.Dim.L, q.Dim.T, q.Dim.K, q.Dim.N, q.Dim.Each} {
			if e > MaxExponent || e < -MaxExponent {
				t.Fatalf("%q: exponent %d in %+v", s, e, q.Dim)
			}
		}
		v, err := ParseAs(s, q.Dim)
		if err != nil || v != q.SI {
			t.Fatalf("%q: ParseAs gives %g, %v; Parse gave %g", s, v, err, q.SI)
		}
	})
}
