package units

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// Form says how a value was written.
type Form int

// Forms of a written value.
const (
	Exact     Form = iota // "0.30", "15 g/L": one value, no range written
	PlusMinus             // "0.30 ± 0.03", "0.30 +/- 0.03"
	Interval              // "12–18 g/L", "12-18 g/L", "12 to 18 g/L"
)

// Range is a value written with the limits it may lie between, in SI.
//
// How the limits are read (JCGM 100:2008, Evaluation of measurement data —
// Guide to the expression of uncertainty in measurement, §4.3.7): when
// only the limits of a quantity are known, with no other information, it
// is taken to lie anywhere between them with equal probability — a
// rectangular distribution of half-width a and standard uncertainty
// u = a/√3. "x ± a" is read the same way, as limits written by the chemist
// (x − a to x + a), not as a standard uncertainty and not as an expanded
// uncertainty with a coverage factor: a bench chemist's "±" on an Rf or a
// solubility is the spread they would not be surprised by.
type Range struct {
	Nominal float64 // SI; the midpoint of an interval
	Half    float64 // half-width a, SI (0 for Exact)
	Form    Form
}

// Lo and Hi are the limits.
func (r Range) Lo() float64 { return r.Nominal - r.Half }

// Hi is the upper limit.
func (r Range) Hi() float64 { return r.Nominal + r.Half }

// StdUncertainty is a/√3, the standard uncertainty of the rectangular
// distribution (JCGM 100:2008 §4.3.7, eq. 7).
func (r Range) StdUncertainty() float64 { return r.Half / math.Sqrt(3) }

// ParseRange reads a quantity that may carry a range: "15 g/L",
// "12–18 g/L", "12-18 g/L", "12 to 18 g/L", "15 ± 3 g/L", "15 +/- 3 g/L".
// The unit follows the numbers and applies to both. A bare number is
// refused as Parse refuses it.
func ParseRange(s string) (Range, Unit, error) {
	a, b, form, rest, err := splitRange(s)
	if err != nil {
		return Range{}, Unit{}, err
	}
	if strings.TrimSpace(rest) == "" {
		return Range{}, Unit{}, fmt.Errorf("%w: %q has no unit", ErrUnit, strings.TrimSpace(s))
	}
	u, err := ParseUnit(rest)
	if err != nil {
		return Range{}, Unit{}, err
	}
	r := toRange(a, b, form)
	return Range{Nominal: r.Nominal*u.Factor + u.Offset, Half: r.Half * u.Factor, Form: form}, u, nil
}

// ParseRangeAs is ParseRange with the wanted dimension checked; the error
// lists example units for that dimension.
func ParseRangeAs(s string, want Dim) (Range, error) {
	r, u, err := ParseRange(s)
	if err != nil && strings.Contains(err.Error(), rangeExample) {
		return Range{}, err // the range itself is wrong, and the message shows how to write one
	}
	if err != nil {
		return Range{}, fmt.Errorf("%w; write %s, or a range such as %s", err, Accepted(want), rangeExample)
	}
	if u.Dim != want {
		return Range{}, fmt.Errorf("%w: %q is %s, not %s; write %s", ErrUnit, s, u.Dim.Name(), want.Name(), Accepted(want))
	}
	return r, nil
}

// ParsePlainRange reads a plain number or percentage that may carry a
// range: "0.30", "0.30 ± 0.03", "0.27–0.33", "85 %", "85 ± 3 %",
// "82–88 %".
func ParsePlainRange(s string) (Range, error) {
	a, b, form, rest, err := splitRange(s)
	if err != nil {
		return Range{}, err
	}
	f := 1.0
	switch strings.TrimSpace(rest) {
	case "":
	case "%":
		f = 0.01
	default:
		return Range{}, fmt.Errorf("%w: %q: a plain number takes no unit but %%", ErrUnit, s)
	}
	r := toRange(a, b, form)
	return Range{Nominal: r.Nominal * f, Half: r.Half * f, Form: form}, nil
}

const rangeExample = `"12–18 g/L" or "15 ± 3 g/L"`

// toRange turns the two written numbers into a nominal value and a half-width.
func toRange(a, b float64, form Form) Range {
	switch form {
	case PlusMinus:
		return Range{Nominal: a, Half: b, Form: form}
	case Interval:
		return Range{Nominal: a/2 + b/2, Half: b/2 - a/2, Form: form} // halves first: no overflow
	}
	return Range{Nominal: a, Form: form}
}

// splitRange reads "a", "a ± b", "a +/- b", "a–b", "a-b" or "a to b"
// followed by the rest (the unit).
func splitRange(s string) (a, b float64, form Form, rest string, err error) {
	s = strings.TrimSpace(s) // messages quote the value as trimmed
	t := s
	num, t := scanNumber(t)
	if num == "" {
		return 0, 0, Exact, "", fmt.Errorf("%w: %q does not start with a number", ErrUnit, s)
	}
	if a, err = parseNumber(num); err != nil {
		return 0, 0, Exact, "", err
	}
	t = strings.TrimLeft(t, " ")
	switch {
	case strings.HasPrefix(t, "±"):
		form, t = PlusMinus, t[len("±"):]
	case strings.HasPrefix(t, "+/-"):
		form, t = PlusMinus, t[3:]
	case strings.HasPrefix(t, "–"): // en dash
		form, t = Interval, t[len("–"):]
	case strings.HasPrefix(t, "-"):
		form, t = Interval, t[1:]
	case strings.HasPrefix(t, "to "):
		form, t = Interval, t[3:]
	default:
		return a, 0, Exact, t, nil
	}
	num, t = scanNumber(strings.TrimLeft(t, " "))
	if num == "" {
		return 0, 0, Exact, "", fmt.Errorf("%w: %q: a number must follow the range sign; write e.g. %s", ErrUnit, s, rangeExample)
	}
	if b, err = parseNumber(num); err != nil {
		return 0, 0, Exact, "", err
	}
	switch {
	case form == PlusMinus && !(b > 0):
		return 0, 0, Exact, "", fmt.Errorf("%w: %q: the ± part must be above zero (write the value alone when it is exact)", ErrUnit, s)
	case form == Interval && !(b > a):
		return 0, 0, Exact, "", fmt.Errorf("%w: %q: write the lower limit first, e.g. %s", ErrUnit, s, rangeExample)
	}
	return a, b, form, t, nil
}

// scanNumber takes a decimal number (optional sign, digits, point,
// exponent) from the front of t.
func scanNumber(t string) (num, rest string) {
	i := 0
	if i < len(t) && (t[i] == '+' || t[i] == '-') {
		i++
	}
	digits := false
	for i < len(t) && (t[i] >= '0' && t[i] <= '9' || t[i] == '.') {
		digits = digits || t[i] != '.'
		i++
	}
	if !digits {
		return "", t
	}
	if i+1 < len(t) && (t[i] == 'e' || t[i] == 'E') {
		j := i + 1
		if t[j] == '+' || t[j] == '-' {
			j++
		}
		if j < len(t) && t[j] >= '0' && t[j] <= '9' {
			for j < len(t) && t[j] >= '0' && t[j] <= '9' {
				j++
			}
			i = j
		}
	}
	return t[:i], t[i:]
}

func parseNumber(num string) (float64, error) {
	v, err := strconv.ParseFloat(num, 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, fmt.Errorf("%w: %q is not a number", ErrUnit, num)
	}
	return v, nil
}
