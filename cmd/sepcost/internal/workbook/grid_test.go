package workbook

import (
	"math"
	"math/rand/v2"
	"strconv"
	"strings"
	"testing"
	"unicode"
	"unicode/utf8"
)

// TestRound15 compares round15 with the standard library's decimal
// formatting to 15 significant digits, parsed back (strconv: correctly
// rounded both ways, ties to even), on a spread of magnitudes and signs,
// on exact ties and on the example in its doc comment.
func TestRound15(t *testing.T) {
	t.Parallel()
	oracle := func(v float64) float64 {
		r, err := strconv.ParseFloat(strconv.FormatFloat(v, 'g', 15, 64), 64)
		if err != nil {
			t.Fatal(err)
		}
		return r
	}
	cases := []float64{
		0.9199999999999999,                         // Source: round15's doc comment; 0.92
		2.584991062968125e11, 6.500387187628625e12, // exact ties at the 16th digit (seen in a random search), to even
		1, -1, 1e-300, 1e300, 123456789012345678, 0.1 + 0.2, 1.5e308, math.SmallestNonzeroFloat64,
	}
	rng := rand.New(rand.NewPCG(1, 2))
	for range 200000 {
		cases = append(cases, math.Exp(rng.Float64()*80-40)*float64(1-2*rng.IntN(2)))
	}
	for _, v := range cases {
		if got, want := round15(v), oracle(v); got != want {
			t.Errorf("round15(%v) = %v, strconv gives %v", v, got, want)
		}
	}
	if round15(0.9199999999999999) != 0.92 {
		t.Error("round15(0.9199999999999999) is not 0.92")
	}
	for _, v := range []float64{math.NaN(), math.Inf(1), math.Inf(-1), 0} {
		if got := round15(v); !(got == v || (math.IsNaN(got) && math.IsNaN(v))) {
			t.Errorf("round15(%v) = %v", v, got)
		}
	}
}

// Units on the sheets are written with superscript powers, as in print
// (SI Brochure, 9th ed., 2019, section 5.4: m² for square metre, from
// memory).
func TestUnitLabel(t *testing.T) {
	t.Parallel()
	for in, want := range map[string]string{"W/(m^2·K)": "W/(m²·K)", "m3": "m³", "cm^2": "cm²", "kg": "kg", "mL/g": "mL/g"} {
		if got := unitLabel(in); got != want {
			t.Errorf("unitLabel(%q) = %q, want %q", in, got, want)
		}
	}
}

// wrappedLines and textWidth count as the plain split into lines and
// words does (strings.Split on newlines, strings.Fields on white space,
// runes counted), on texts with several spaces, tabs, no-break spaces,
// accented letters, long words and empty lines.
func TestWrappedLinesAsSplit(t *testing.T) {
	split := func(s string, width float64) int {
		per := max(int(width)-1, 1)
		lines := 0
		for _, para := range strings.Split(s, "\n") {
			n, used := 1, 0
			for _, word := range strings.Fields(para) {
				w := utf8.RuneCountInString(word)
				switch {
				case used == 0:
					used = w
				case used+1+w <= per:
					used += 1 + w
				default:
					n++
					used = w
				}
				for used > per {
					n++
					used -= per
				}
			}
			lines += n
		}
		return lines
	}
	widest := func(s string) int {
		w := 0
		for _, l := range strings.Split(s, "\n") {
			w = max(w, utf8.RuneCountInString(l))
		}
		return w
	}
	texts := []string{"", " ", "\n", "a", "one two  three\tfour", "Ethyl acetate\u00a0(EtOAc) at 3.50 € per litre\n\nsecond paragraph",
		"averyveryveryverylongwordthatdoesnotfit and then some", "  leading and trailing  ", "é è ê ë\nà â\n", "x\ny\n\nz", "broken \xff\xfe bytes\n\xc3", "ends in a newline\n", "± 3 €\u00a0per\u2003kg"}
	for _, s := range texts {
		for _, w := range []float64{0, 1, 2, 5, 8.5, 12, 40, 80} {
			if got, want := wrappedLines(s, w), split(s, w); got != want {
				t.Errorf("wrappedLines(%q, %g) = %d, splitting gives %d", s, w, got, want)
			}
		}
		if got, want := textWidth(s), widest(s); got != want {
			t.Errorf("textWidth(%q) = %d, want %d", s, got, want)
		}
	}
}

// intDigits counts the digits strconv writes for a whole number ('f', no
// decimals), at and around every power of ten a double holds and beyond,
// and for the values that are not numbers.
func TestIntDigitsAsStrconv(t *testing.T) {
	t.Parallel()
	xs := []float64{0, 1, 9, 10, 99, 100, 999999999999999, 1e15, 1e22, 1e23, 1.7976931348623157e308, math.NaN(), math.Inf(1)}
	for k := 0; k <= 308; k++ {
		p := math.Pow(10, float64(k))
		xs = append(xs, p, math.Nextafter(p, 0), math.Nextafter(p, math.Inf(1)), math.Trunc(p*0.999), math.Trunc(p*1.5))
	}
	rng := rand.New(rand.NewPCG(3, 4))
	for range 20000 {
		xs = append(xs, math.Trunc(math.Exp(rng.Float64()*60)))
	}
	for _, x := range xs {
		x = math.Trunc(x) // whole numbers, as displayWidth passes
		if got, want := intDigits(x), len(strconv.FormatFloat(x, 'f', 0, 64)); got != want {
			t.Errorf("intDigits(%v) = %d, strconv writes %d characters", x, got, want)
		}
	}
}

// The ASCII table of white space in paraLines agrees with unicode.IsSpace
// on every ASCII character.
func TestASCIISpaceAsUnicode(t *testing.T) {
	t.Parallel()
	for b := range utf8.RuneSelf {
		if got, want := asciiSpace[b], unicode.IsSpace(rune(b)); got != want {
			t.Errorf("asciiSpace[%q] = %v, unicode.IsSpace says %v", rune(b), got, want)
		}
	}
}
