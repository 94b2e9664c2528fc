package units

import (
	"math"
	"strconv"
	"strings"
)

// ladders are the units a readable quantity may be shown in, smallest
// first, per dimension and family: a mass in mg, g or kg; a volume in mL,
// L or m3; an energy in Wh or kWh (or kJ, MJ); a time in min or h. A unit
// outside these is shown as it is.
var ladders = [][]string{
	{"mg", "g", "kg"},
	{"mL", "L", "m3"},
	{"Wh", "kWh"},
	{"kJ", "MJ"},
	{"min", "h"},
}

// Readable writes a quantity given in unit to three significant figures
// in the unit of its family (ladders) that puts it between 1 and 1000
// where one does ("0.25 g" rather than "0.00025 kg", "517 kg" rather than
// "517146.747 g", "69.1 Wh" rather than "6.911e-05 kWh"), with thousands
// separators and no exponent. Percentages are shown to 0.1 %, or to
// 0.01 % above 99 %, and never rounded up to 100 % unless they are 100 %.
func Readable(v float64, unit string) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return "n/a"
	}
	if unit == "%" {
		return percent(v) + " %"
	}
	v, unit = scaleUnit(v, unit)
	s := Sig3(v)
	if unit == "" {
		return s
	}
	return s + " " + display(unit)
}

// display is the spelling of a unit in text, powers as superscripts: m³
// for m3, W/(m²·K) for W/(m^2·K).
func display(unit string) string { return powers.Replace(unit) }

var powers = strings.NewReplacer("^2", "²", "^3", "³", "m3", "m³", "m2", "m²")

// scaleUnit moves v along its unit's ladder until it lies in [1, 1000), or
// to the ladder's end.
func scaleUnit(v float64, unit string) (float64, string) {
	for _, l := range ladders {
		k := -1
		for i, u := range l {
			if u == unit {
				k = i
			}
		}
		if k < 0 || v == 0 {
			continue
		}
		f := func(u string) float64 { return table[u].factor }
		for math.Abs(v) >= 1000 && k+1 < len(l) {
			v, k = v*f(l[k])/f(l[k+1]), k+1
		}
		for math.Abs(v) < 1 && k > 0 {
			v, k = v*f(l[k])/f(l[k-1]), k-1
		}
		return v, l[k]
	}
	return v, unit
}

// Sig3 writes v to three significant figures, with thousands separators,
// without an exponent and without trailing zeros: 0.000691, 1.38, 42.6,
// 517, 99,900, 25.
func Sig3(v float64) string {
	if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		return strconv.FormatFloat(v, 'f', -1, 64)
	}
	r, places := sig3Places(v)
	s := strconv.FormatFloat(r, 'f', places, 64)
	if strings.Contains(s, ".") {
		s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
	}
	return Group(s)
}

// Group puts thousands separators into the integer part of a decimal
// written as digits: "1813.00" becomes "1,813.00".
func Group(s string) string {
	neg := strings.HasPrefix(s, "-")
	s = strings.TrimPrefix(s, "-")
	intPart, frac, hasFrac := strings.Cut(s, ".")
	var b strings.Builder
	for i, c := range intPart {
		if i > 0 && (len(intPart)-i)%3 == 0 {
			b.WriteByte(',')
		}
		b.WriteRune(c)
	}
	out := b.String()
	if hasFrac {
		out += "." + frac
	}
	if neg {
		out = "-" + out
	}
	return out
}

// percent writes a percentage to 0.1, or 0.01 above 99, keeping a value
// below 100 below 100 when written ("> 99.99").
func percent(v float64) string {
	places := 1
	if v > 99 && v < 100 {
		places = 2
	}
	s := strconv.FormatFloat(v, 'f', places, 64)
	if v < 100 && (s == "100.00" || s == "100.0") {
		return "> 99.99"
	}
	return s
}

// Sig3Range writes the two ends of a range (a P10–P90 band, say) with the
// same number of decimals: those Sig3 gives the end nearer zero, trailing
// zeros kept, thousands separated: (1.42, 2) → "1.42", "2.00"; (0.0042,
// 0.0061) → "0.00420", "0.00610"; (950, 1234) → "950", "1,234". Ends that
// are zero or not finite are written as Sig3 writes them.
func Sig3Range(lo, hi float64) (string, string) {
	places := -1
	for _, v := range []float64{lo, hi} {
		if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
			continue
		}
		_, p := sig3Places(v)
		places = max(places, p)
	}
	if places < 0 {
		return Sig3(lo), Sig3(hi)
	}
	end := func(v float64) string {
		if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
			return Sig3(v)
		}
		return Group(strconv.FormatFloat(v, 'f', places, 64))
	}
	return end(lo), end(hi)
}

// sig3Places is v rounded to three significant figures and the decimals
// that shows them (none from 100 on): rounding first, so that 999.6
// becomes 1,000 and is written with no decimals. v is finite and not 0.
func sig3Places(v float64) (float64, int) {
	r, _ := strconv.ParseFloat(strconv.FormatFloat(v, 'e', 2, 64), 64)
	return r, max(2-int(math.Floor(math.Log10(math.Abs(r)))), 0)
}
