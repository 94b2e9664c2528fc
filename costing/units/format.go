package units

import (
	"math"
	"strconv"
)

// FormatMass writes a mass given in kg the way a chemist says a batch: four
// significant figures, in mg below 1 g, in g below 1 kg, in kg above
// ("250 mg", "20 g", "1.5 kg"), no exponent; "n/a" for NaN or ±Inf. Every
// writer and message names a batch mass through it. (Readable, three
// figures on the unit's whole ladder, is for computed quantities.)
func FormatMass(kg float64) string {
	const tol = 1 - 1e-9 // 0.000999999… kg from a log-spaced sweep is 1 g
	switch a := math.Abs(kg); {
	case math.IsNaN(kg) || math.IsInf(kg, 0):
		return "n/a"
	case a < 1e-3*tol:
		return SigFigs(kg*1e6, 4) + " mg"
	case a < 1*tol:
		return SigFigs(kg*1e3, 4) + " g"
	default:
		return SigFigs(kg, 4) + " kg"
	}
}

// FormatVolume writes a volume given in m³ with four significant figures, in mL
// below 1 L and in L above ("250 mL", "2 L", "1200 L"); "n/a" for NaN or
// ±Inf.
func FormatVolume(m3 float64) string {
	const tol = 1 - 1e-9
	switch {
	case math.IsNaN(m3) || math.IsInf(m3, 0):
		return "n/a"
	case math.Abs(m3) < 1e-3*tol:
		return SigFigs(m3*1e6, 4) + " mL"
	default:
		return SigFigs(m3*1e3, 4) + " L"
	}
}

// SigFigs writes v rounded to n significant figures without an exponent
// and without trailing zeros: SigFigs(0.30000000000000004, 4) = "0.3",
// SigFigs(12345, 4) = "12350".
func SigFigs(v float64, n int) string {
	if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		return strconv.FormatFloat(v, 'f', -1, 64)
	}
	p := float64(n - 1 - int(math.Floor(math.Log10(math.Abs(v)))))
	r := math.Round(v*math.Pow(10, p)) / math.Pow(10, p)
	s := strconv.FormatFloat(r, 'f', -1, 64)
	// Rounding in binary can leave a tail such as 0.30000000000000004.
	if len(s) > 17 {
		s = strconv.FormatFloat(r, 'g', n, 64)
	}
	return s
}
