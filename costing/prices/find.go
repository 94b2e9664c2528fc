package prices

import (
	"strings"
	"unicode"
)

// Find returns the index in t.Items of the item called name, comparing
// names with surrounding space removed and without regard to letter case
// ("Silica gel " finds "silica gel"). When the item has price bands, Find
// returns its first band (the one that applies from zero). Read refuses
// tables in which two lines of one name would apply from the same quantity.
func (t *Table) Find(name string) (int, bool) {
	return t.FindFor(name, 0)
}

// FindFor returns the price line of item name that applies to a purchase
// of qtySI (SI units of the item's dimension): of the item's lines, the
// one with the largest From not above qtySI. A purchase is the whole
// amount bought at once, e.g. a campaign's solvent. An item with one line
// always gives that line.
func (t *Table) FindFor(name string, qtySI float64) (int, bool) {
	if t == nil {
		return 0, false
	}
	name = strings.TrimSpace(name)
	if name == "" {
		return 0, false
	}
	best, lowest := -1, -1
	for i := range t.Items {
		it := &t.Items[i]
		if !sameName(it.Name, name) {
			continue
		}
		if lowest < 0 || it.FromSI < t.Items[lowest].FromSI {
			lowest = i
		}
		if it.FromSI <= qtySI && (best < 0 || it.FromSI > t.Items[best].FromSI) {
			best = i
		}
	}
	if best < 0 {
		// Read gives every banded item a band from zero; a table built
		// otherwise falls back on its lowest band.
		best = lowest
	}
	return best, best >= 0
}

// sameName compares item names as Find does.
func sameName(a, b string) bool {
	// Quick rejection on the first character when both are ASCII (after
	// the ASCII spaces TrimSpace would remove): two ASCII letters fold
	// together only as upper and lower case of one letter. Everything else
	// goes the full way.
	ca, cb := firstASCII(a), firstASCII(b)
	if ca >= 0 && cb >= 0 && lowerASCII(byte(ca)) != lowerASCII(byte(cb)) {
		return false
	}
	return strings.EqualFold(strings.TrimSpace(a), strings.TrimSpace(b))
}

// firstASCII is the first byte of s after ASCII white space when it is an
// ASCII character other than white space, else -1 (empty, or a byte that
// may start a multi-byte character, which may be Unicode white space).
func firstASCII(s string) int {
	for i := 0; i < len(s); i++ {
		switch c := s[i]; c {
		case ' ', '\t', '\n', '\v', '\f', '\r':
			continue
		default:
			if c < 0x80 {
				return int(c)
			}
			return -1
		}
	}
	return -1
}

// lowerASCII is c in lower case when it is an ASCII capital letter.
func lowerASCII(c byte) byte {
	if 'A' <= c && c <= 'Z' {
		return c + 'a' - 'A'
	}
	return c
}

// nameKey is the form in which Read compares item names for duplicates:
// trimmed, with each letter replaced by the smallest member of its Unicode
// simple case-folding orbit, so that two names have the same key exactly
// when Find would take one for the other (strings.EqualFold).
func nameKey(s string) string {
	s = strings.TrimSpace(s)
	return strings.Map(func(r rune) rune {
		min := r
		for f := unicode.SimpleFold(r); f != r; f = unicode.SimpleFold(f) {
			if f < min {
				min = f
			}
		}
		return min
	}, s)
}
