package prices

import (
	"strings"
	"unicode"
)

// Find returns the index in t.Items of the item called name, comparing
// names with surrounding space removed and without regard to letter case
// ("Silica gel " finds "silica gel"). Read refuses tables in which two
// items would match the same name.
func (t *Table) Find(name string) (int, bool) {
	if t == nil {
		return 0, false
	}
	name = strings.TrimSpace(name)
	if name == "" {
		return 0, false
	}
	for i := range t.Items {
		if strings.EqualFold(strings.TrimSpace(t.Items[i].Name), name) {
			return i, true
		}
	}
	return 0, false
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
