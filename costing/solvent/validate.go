package solvent

import (
	"errors"
	"fmt"
	"strings"

	"sepcost/costing/units"
)

// ErrInvalid is the sentinel that every solvent data error unwraps to.
var ErrInvalid = errors.New("invalid solvent data")

// FieldError is one problem with one field of a solvent. File and Line are
// empty until a reader that knows where the solvent was written fills them
// in (errors.As, then set them).
type FieldError struct {
	File    string
	Line    int
	Solvent string // the solvent's ID as written
	Field   string // e.g. "density", "antoine[2].tmin"
	Problem string // what is wrong and what would be valid
}

func (e *FieldError) Error() string {
	var b strings.Builder
	if e.File != "" {
		b.WriteString(e.File)
		if e.Line > 0 {
			fmt.Fprintf(&b, ":%d", e.Line)
		}
		b.WriteString(": ")
	}
	fmt.Fprintf(&b, "solvent %q: %s: %s", e.Solvent, e.Field, e.Problem)
	return b.String()
}

// Unwrap makes errors.Is(err, ErrInvalid) true.
func (e *FieldError) Unwrap() error { return ErrInvalid }

// Validate checks the solvent and returns every problem found, joined
// (errors.Join), each a *FieldError; nil when the data are usable. It checks:
// a lower-case ID without outer spaces; a formula that parses; a halogenated
// flag that agrees with the formula; a CAS number with a valid check digit
// when given; finite, positive density, boiling point, enthalpy of
// vaporization and heat capacity; a finite, positive flash point when
// HasFlashPoint; names that are not empty or repeated; and for each Antoine
// set finite constants, B > 0, 0 < Tmin < Tmax and Tmin + C > 0 (the range
// must lie above the equation's pole at T = −C).
func (s Solvent) Validate() error {
	var errs []error
	bad := func(field, format string, a ...any) {
		errs = append(errs, &FieldError{Solvent: s.ID, Field: field, Problem: fmt.Sprintf(format, a...)})
	}

	switch {
	case strings.TrimSpace(s.ID) == "":
		bad("id", "empty; give the solvent a lower-case name, e.g. \"ethyl acetate\"")
	case s.ID != strings.TrimSpace(s.ID):
		bad("id", "has leading or trailing spaces; write %q", strings.TrimSpace(s.ID))
	case s.ID != strings.ToLower(s.ID):
		bad("id", "must be lower case; write %q and keep %q as an alias", strings.ToLower(s.ID), s.ID)
	}

	comp, err := ParseFormula(s.Formula)
	if err != nil {
		bad("formula", "%v", err)
	} else if comp.Halogenated() != s.Halogenated {
		bad("halogenated", "is %v but formula %s %s; set it to %v",
			s.Halogenated, s.Formula, map[bool]string{true: "contains F, Cl, Br or I", false: "contains no F, Cl, Br or I"}[comp.Halogenated()],
			comp.Halogenated())
	}

	if s.CAS != "" && !validCAS(s.CAS) {
		bad("cas", "%q is not a CAS Registry Number (digits-digits-check digit, e.g. \"141-78-6\", with a correct check digit); leave it empty if unknown", s.CAS)
	}

	positive := func(field string, p Prop, unit, example string) {
		if !finite(p.V) || p.V <= 0 {
			bad(field, "%s; want a positive %s, e.g. %s", show(p.V, unit), field, example)
		}
	}
	positive("density", s.Density, "g/mL", `"0.90 g/mL" (900 kg/m³)`)
	positive("boiling point", s.BoilingPoint, "C", `"77.1 C" (350.25 K)`)
	positive("enthalpy of vaporization", s.HVap, "kJ/mol", `"31.9 kJ/mol"`)
	positive("heat capacity", s.Cp, "J/(mol K)", `"170 J/(mol K)"`)
	if s.HasFlashPoint {
		positive("flash point", s.FlashPoint, "C", `"-4 C" (269.15 K); or mark the solvent as having no flash point`)
	}

	seen := map[string]string{strings.ToLower(strings.TrimSpace(s.ID)): "id"}
	for i, al := range s.Aliases {
		field := fmt.Sprintf("aliases[%d]", i+1)
		n := normName(al)
		if n == "" {
			bad(field, "empty; remove it or write a name")
			continue
		}
		if prev, dup := seen[n]; dup {
			bad(field, "%q repeats the %s; names are compared without regard to case", al, prev)
			continue
		}
		seen[n] = field
	}

	for i, a := range s.Antoine {
		f := fmt.Sprintf("antoine[%d]", i+1)
		if !finite(a.A) || !finite(a.B) || !finite(a.C) {
			bad(f, "A, B and C must be finite numbers (A = %g, B = %g, C = %g)", a.A, a.B, a.C)
			continue
		}
		if a.B <= 0 {
			bad(f+".b", "B = %g K; want B > 0 (log10(P/bar) = A - B/(T/K + C) rises with T only for B > 0)", a.B)
		}
		if !finite(a.Tmin) || !finite(a.Tmax) || a.Tmin <= 0 || a.Tmin >= a.Tmax {
			bad(f+".tmin", "valid range %g K to %g K; want 0 < Tmin < Tmax, in kelvin", a.Tmin, a.Tmax)
			continue
		}
		if a.Tmin+a.C <= 0 {
			bad(f+".c", "C = %g K puts the pole T = -C = %g K at or above Tmin = %g K; want Tmin + C > 0", a.C, -a.C, a.Tmin)
		}
	}
	return errors.Join(errs...)
}

// show formats an SI value in a display unit for an error message.
func show(si float64, unit string) string {
	if !finite(si) {
		return fmt.Sprintf("%v", si)
	}
	v, err := units.To(si, unit)
	if err != nil {
		return fmt.Sprintf("%g (SI)", si)
	}
	return fmt.Sprintf("%.4g %s", v, unit)
}

// validCAS checks the form NNNNNNN-NN-N and the check digit: the last digit
// equals Σ i·dᵢ mod 10 over the other digits dᵢ numbered 1, 2, … from the
// right (CAS, "CAS Registry Number" format description, from memory).
func validCAS(cas string) bool {
	parts := strings.Split(cas, "-")
	if len(parts) != 3 || len(parts[0]) < 2 || len(parts[0]) > 7 || len(parts[1]) != 2 || len(parts[2]) != 1 {
		return false
	}
	digits := parts[0] + parts[1]
	for _, r := range digits + parts[2] {
		if r < '0' || r > '9' {
			return false
		}
	}
	sum := 0
	for i := 0; i < len(digits); i++ {
		sum += (len(digits) - i) * int(digits[i]-'0')
	}
	return sum%10 == int(parts[2][0]-'0')
}
