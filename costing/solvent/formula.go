package solvent

import (
	"errors"
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"
)

// ErrFormula is the sentinel that every formula parse error unwraps to.
var ErrFormula = errors.New("bad molecular formula")

// Limits that keep the parser's arithmetic far from overflow on hostile
// input; real solvent formulas are orders of magnitude smaller.
const (
	maxAtoms = 100000 // largest total number of atoms, and largest count written
	maxDepth = 8      // deepest nesting of parentheses
)

// atomicWeights are the abridged standard atomic weights in g/mol.
//
// Source: IUPAC Commission on Isotopic Abundances and Atomic Weights
// (CIAAW), abridged standard atomic weights, as tabulated in Prohaska, T.
// et al., "Standard atomic weights of the elements 2021 (IUPAC Technical
// Report)", Pure Appl. Chem. 2022, 94, 573–600 (from memory). Elements with
// an interval (H, Li, B, C, N, O, Si, S, Cl, Br) carry the conventional
// abridged value. Only elements that occur in laboratory solvents and their
// common salts are listed; an unknown symbol is an error, never a guess.
var atomicWeights = map[string]float64{
	"H": 1.0080, "Li": 6.94, "B": 10.81, "C": 12.011, "N": 14.007, "O": 15.999,
	"F": 18.998, "Na": 22.990, "Si": 28.085, "P": 30.974, "S": 32.06,
	"Cl": 35.45, "K": 39.098, "Br": 79.904, "I": 126.90,
}

// halogens are the elements whose presence makes a solvent "halogenated"
// for waste purposes (US EPA F001/F002 halogenated solvents; EU List of
// Waste 07 05 03*).
var halogens = []string{"F", "Cl", "Br", "I"}

// Composition counts the atoms of each element in a formula.
type Composition map[string]int

// ParseFormula reads a molecular formula such as "C4H8O2", "CH2Cl2",
// "C2H6O" or a condensed one such as "CH3(CH2)4CH3" (parenthesised groups
// with a multiplier, nested up to 8 deep). Element symbols are one capital
// letter and at most one small letter; a count of 1 may be omitted; a count
// of 0 is refused, and counts and the total number of atoms are limited to
// 100000. The error names the formula, the position (1-based) and
// what is valid.
func ParseFormula(formula string) (Composition, error) {
	s := strings.TrimSpace(formula)
	if s == "" {
		return nil, fmt.Errorf("%w: empty formula; write element symbols with counts, e.g. \"C4H8O2\"", ErrFormula)
	}
	p := &formulaParser{src: s}
	comp, err := p.group(0)
	if err != nil {
		return nil, err
	}
	if p.pos < len(p.src) {
		return nil, p.errorf("unexpected %q", p.src[p.pos])
	}
	if len(comp) == 0 {
		return nil, p.errorf("no element symbols")
	}
	return comp, nil
}

type formulaParser struct {
	src string
	pos int
}

func (p *formulaParser) errorf(format string, a ...any) error {
	return fmt.Errorf("%w: formula %q, position %d: %s; write element symbols with counts, e.g. \"C4H8O2\" or \"CH3(CH2)4CH3\"",
		ErrFormula, p.src, p.pos+1, fmt.Sprintf(format, a...))
}

// group parses items until the end of the input or a closing parenthesis.
func (p *formulaParser) group(depth int) (Composition, error) {
	if depth > maxDepth {
		return nil, p.errorf("parentheses nested deeper than %d", maxDepth)
	}
	out := Composition{}
	for p.pos < len(p.src) {
		c := p.src[p.pos]
		switch {
		case c == ')':
			if depth == 0 {
				return nil, p.errorf("')' without a matching '('")
			}
			return out, nil
		case c == '(':
			p.pos++
			inner, err := p.group(depth + 1)
			if err != nil {
				return nil, err
			}
			if p.pos >= len(p.src) || p.src[p.pos] != ')' {
				return nil, p.errorf("'(' without a matching ')'")
			}
			p.pos++
			n, err := p.count()
			if err != nil {
				return nil, err
			}
			for el, k := range inner {
				if err := out.add(el, k*n, p); err != nil {
					return nil, err
				}
			}
		case c >= 'A' && c <= 'Z':
			start := p.pos
			p.pos++
			if p.pos < len(p.src) && p.src[p.pos] >= 'a' && p.src[p.pos] <= 'z' {
				p.pos++
			}
			sym := p.src[start:p.pos]
			if _, ok := atomicWeights[sym]; !ok {
				p.pos = start
				return nil, p.errorf("unknown element %q (known: %s)", sym, strings.Join(knownElements(), " "))
			}
			n, err := p.count()
			if err != nil {
				return nil, err
			}
			if err := out.add(sym, n, p); err != nil {
				return nil, err
			}
		default:
			return nil, p.errorf("unexpected %q", c)
		}
	}
	return out, nil
}

// count reads an optional count after a symbol or group; absent means 1.
func (p *formulaParser) count() (int, error) {
	start := p.pos
	for p.pos < len(p.src) && p.src[p.pos] >= '0' && p.src[p.pos] <= '9' {
		p.pos++
	}
	if start == p.pos {
		return 1, nil
	}
	digits := p.src[start:p.pos]
	n, err := strconv.Atoi(digits)
	if err != nil || n > maxAtoms {
		p.pos = start
		return 0, p.errorf("count %s is larger than %d", digits, maxAtoms)
	}
	if n == 0 {
		p.pos = start
		return 0, p.errorf("count 0 is not allowed; leave the element out")
	}
	return n, nil
}

func (c Composition) add(el string, n int, p *formulaParser) error {
	c[el] += n
	if c.atoms() > maxAtoms {
		return p.errorf("more than %d atoms", maxAtoms)
	}
	return nil
}

func (c Composition) atoms() int {
	t := 0
	for _, n := range c {
		t += n
	}
	return t
}

// MolarMass is the molar mass in kg/mol from the abridged standard atomic
// weights:
//
//	M = Σ nᵢ·Aᵣ,ᵢ · 10⁻³ kg/g
//
// with nᵢ the count and Aᵣ,ᵢ the standard atomic weight (g/mol) of element i.
func (c Composition) MolarMass() float64 {
	m := 0.0
	for el, n := range c {
		m += float64(n) * atomicWeights[el]
	}
	return m / 1000
}

// MassFraction is the mass fraction of one element (0 when absent).
func (c Composition) MassFraction(el string) float64 {
	m := c.MolarMass()
	if m == 0 {
		return 0
	}
	return float64(c[el]) * atomicWeights[el] / 1000 / m
}

// Halogenated reports whether the formula contains F, Cl, Br or I.
func (c Composition) Halogenated() bool {
	for _, h := range halogens {
		if c[h] > 0 {
			return true
		}
	}
	return false
}

// Hill writes the composition in Hill order: C first, then H, then the
// other elements alphabetically; without carbon, all alphabetically.
// Counts of 1 are omitted. ParseFormula(c.Hill()) returns c again.
func (c Composition) Hill() string {
	els := make([]string, 0, len(c))
	for el, n := range c {
		if n > 0 {
			els = append(els, el)
		}
	}
	rank := func(el string) int {
		if c["C"] > 0 {
			switch el {
			case "C":
				return 0
			case "H":
				return 1
			}
		}
		return 2
	}
	sort.Slice(els, func(i, j int) bool {
		ri, rj := rank(els[i]), rank(els[j])
		if ri != rj {
			return ri < rj
		}
		return els[i] < els[j]
	})
	var b strings.Builder
	for _, el := range els {
		b.WriteString(el)
		if c[el] != 1 {
			b.WriteString(strconv.Itoa(c[el]))
		}
	}
	return b.String()
}

func knownElements() []string {
	out := make([]string, 0, len(atomicWeights))
	for el := range atomicWeights {
		out = append(out, el)
	}
	sort.Strings(out)
	return out
}

// finite reports whether v is neither NaN nor infinite.
func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
