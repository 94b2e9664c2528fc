package units

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"
	"unicode"
)

// ErrUnit is the sentinel that every unit error unwraps to.
var ErrUnit = errors.New("bad quantity")

// Quantity is a value in SI units with its dimension.
type Quantity struct {
	SI  float64
	Dim Dim
}

// Unit is a parsed unit expression such as "g", "mL/g" or "J/(mol K)".
type Unit struct {
	Text   string
	Dim    Dim
	Factor float64
	Offset float64
}

// ParseUnit reads a unit expression: names from the table joined by "/",
// "*", "·" or a space, with optional integer powers ("m^2", "m2" is not
// accepted) and one level of parentheses after "/".
func ParseUnit(s string) (Unit, error) {
	text := strings.TrimSpace(s)
	if text == "" {
		return Unit{}, fmt.Errorf("%w: no unit", ErrUnit)
	}
	if u, ok := table[text]; ok {
		return Unit{Text: text, Dim: u.dim, Factor: u.factor, Offset: u.offset}, nil
	}
	if len(text) > MaxUnitLen {
		return Unit{}, fmt.Errorf("%w: unit of %d characters; a unit is at most %d", ErrUnit, len(text), MaxUnitLen)
	}
	out := Unit{Text: text, Factor: 1}
	var exp [6]int // exponents, summed in int so that they cannot wrap
	sign := 1
	rest := text
	for rest != "" {
		rest = strings.TrimLeft(rest, " *·")
		if rest == "" {
			break
		}
		if rest[0] == '/' {
			sign = -1
			rest = rest[1:]
			continue
		}
		if rest[0] == '(' {
			end := strings.IndexByte(rest, ')')
			if end < 0 {
				return Unit{}, fmt.Errorf("%w: unbalanced parenthesis in unit %q", ErrUnit, text)
			}
			inner, err := ParseUnit(rest[1:end])
			if err != nil {
				return Unit{}, err
			}
			if inner.Offset != 0 {
				return Unit{}, fmt.Errorf("%w: %q: Celsius cannot be combined with other units; use K", ErrUnit, text)
			}
			addExp(&exp, inner.Dim, 1, sign)
			out.Factor *= math.Pow(inner.Factor, float64(sign))
			rest = rest[end+1:]
			continue
		}
		n := strings.IndexAny(rest, " */·()")
		if n < 0 {
			n = len(rest)
		}
		tok := rest[:n]
		rest = rest[n:]
		p := 1
		if i := strings.IndexByte(tok, '^'); i >= 0 {
			v, err := strconv.Atoi(tok[i+1:])
			if err != nil || v == 0 || v > 4 || v < -4 {
				return Unit{}, fmt.Errorf("%w: bad power in unit %q; powers from -4 to 4 are accepted", ErrUnit, text)
			}
			p = v
			tok = tok[:i]
		}
		u, ok := table[tok]
		if !ok {
			return Unit{}, fmt.Errorf("%w: unknown unit %q", ErrUnit, tok)
		}
		if u.offset != 0 {
			return Unit{}, fmt.Errorf("%w: %q: Celsius cannot be combined with other units; use K", ErrUnit, text)
		}
		addExp(&exp, u.dim, p, sign)
		out.Factor *= math.Pow(u.factor, float64(p*sign))
	}
	for _, e := range exp {
		if e > MaxExponent || e < -MaxExponent {
			return Unit{}, fmt.Errorf("%w: unit %q raises a base unit to the power %d; powers from -%d to %d are accepted", ErrUnit, text, e, MaxExponent, MaxExponent)
		}
	}
	if !(out.Factor > 0) || math.IsInf(out.Factor, 0) {
		return Unit{}, fmt.Errorf("%w: unit %q has no finite size", ErrUnit, text)
	}
	out.Dim = Dim{int8(exp[0]), int8(exp[1]), int8(exp[2]), int8(exp[3]), int8(exp[4]), int8(exp[5])}
	return out, nil
}

// MaxExponent bounds the power of each base unit in a unit expression
// (kg^4 is accepted, kg^9 is not): no physical quantity the models take
// needs more, and the bound keeps the exponents from overflowing.
const MaxExponent = 8

// MaxQuantityLen bounds the length of a quantity as written, in bytes.
const MaxQuantityLen = 100

// MaxUnitLen bounds the length of a unit expression, in bytes.
const MaxUnitLen = 64

// addExp adds p × sign times the exponents of d to exp.
func addExp(exp *[6]int, d Dim, p, sign int) {
	for i, e := range [6]int8{d.M, d.L, d.T, d.K, d.N, d.Each} {
		exp[i] += int(e) * p * sign
	}
}

// Parse reads "number unit", e.g. "20 g", "1.5kg", "78 C", "0.75 mL/g".
// A bare number is refused: quantities in user files carry units.
// A quantity longer than MaxQuantityLen bytes is refused without being
// repeated in the message.
func Parse(s string) (Quantity, Unit, error) {
	t := strings.TrimSpace(s)
	if len(t) > MaxQuantityLen {
		return Quantity{}, Unit{}, fmt.Errorf("%w: a quantity of %d characters; a number and its unit take at most %d", ErrUnit, len(t), MaxQuantityLen)
	}
	i := 0
	for i < len(t) {
		c := rune(t[i])
		if unicode.IsDigit(c) || c == '.' || c == '-' || c == '+' || ((c == 'e' || c == 'E') && i > 0 && i+1 < len(t) && (unicode.IsDigit(rune(t[i+1])) || t[i+1] == '-' || t[i+1] == '+')) {
			i++
			continue
		}
		break
	}
	num, rest := t[:i], strings.TrimSpace(t[i:])
	if num == "" {
		return Quantity{}, Unit{}, fmt.Errorf("%w: %q does not start with a number", ErrUnit, t)
	}
	v, err := strconv.ParseFloat(num, 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return Quantity{}, Unit{}, fmt.Errorf("%w: %q is not a number", ErrUnit, num)
	}
	if rest == "" {
		return Quantity{}, Unit{}, fmt.Errorf("%w: %q has no unit", ErrUnit, t)
	}
	u, err := ParseUnit(rest)
	if err != nil {
		return Quantity{}, Unit{}, err
	}
	si := v*u.Factor + u.Offset
	if math.IsInf(si, 0) || math.IsNaN(si) {
		return Quantity{}, Unit{}, fmt.Errorf("%w: %q is too large to represent", ErrUnit, t)
	}
	return Quantity{SI: si, Dim: u.Dim}, u, nil
}

// ParseAs reads a quantity and checks that it has the wanted dimension.
// The error lists example units for that dimension.
func ParseAs(s string, want Dim) (float64, error) {
	q, _, err := Parse(s)
	if err != nil {
		return 0, fmt.Errorf("%w; write %s", err, Accepted(want))
	}
	if q.Dim != want {
		return 0, fmt.Errorf("%w: %q is %s, not %s; write %s", ErrUnit, strings.TrimSpace(s), q.Dim.Name(), want.Name(), Accepted(want))
	}
	return q.SI, nil
}

// From converts a value in the named unit to SI.
func From(v float64, unit string) (float64, error) {
	u, err := ParseUnit(unit)
	if err != nil {
		return 0, err
	}
	return v*u.Factor + u.Offset, nil
}

// To converts an SI value to the named unit.
func To(si float64, unit string) (float64, error) {
	u, err := ParseUnit(unit)
	if err != nil {
		return 0, err
	}
	return (si - u.Offset) / u.Factor, nil
}

// MustTo is To for unit names fixed in the program; it panics on a
// programming error (an unknown unit literal), never on user input.
func MustTo(si float64, unit string) float64 {
	v, err := To(si, unit)
	if err != nil {
		panic(err)
	}
	return v
}

// MustFrom is From for unit names fixed in the program.
func MustFrom(v float64, unit string) float64 {
	si, err := From(v, unit)
	if err != nil {
		panic(err)
	}
	return si
}

// Accepted names example units for a dimension, for error messages.
func Accepted(d Dim) string {
	switch d {
	case Mass:
		return `a mass with its unit, e.g. "250 mg", "20 g", "2 kg"`
	case Volume:
		return `a volume with its unit, e.g. "500 mL", "2.5 L"`
	case Length:
		return `a length with its unit, e.g. "15 cm", "40 mm"`
	case Temperature:
		return `a temperature with its unit, e.g. "25 C", "298.15 K"`
	case Time:
		return `a time with its unit, e.g. "30 min", "2 h"`
	case Energy:
		return `an energy with its unit, e.g. "3 kWh", "10 MJ"`
	case Pressure:
		return `a pressure with its unit, e.g. "20 mbar", "1 atm", "15 Torr"`
	case Velocity:
		return `a velocity with its unit, e.g. "5 cm/min"`
	case Density:
		return `a density with its unit, e.g. "0.5 g/mL"`
	case SpecificVolume:
		return `a volume per mass, e.g. "0.75 mL/g"`
	case VolumeFlow:
		return `a volume flow, e.g. "1.5 L/h"`
	case MolarEnergy:
		return `a molar energy, e.g. "38.6 kJ/mol"`
	case MolarHeatCapacity:
		return `a molar heat capacity, e.g. "112 J/(mol K)"`
	case MolarMass:
		return `a molar mass, e.g. "46.07 g/mol"`
	case Count:
		return `a count, e.g. "8 each"`
	case TimePerMass:
		return `a time per mass, e.g. "0.5 h/kg"`
	case None:
		return `a plain number or a percentage, e.g. "0.85" or "85 %"`
	}
	return "a quantity with units of " + d.Name()
}
