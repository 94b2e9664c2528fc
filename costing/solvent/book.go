package solvent

import (
	"fmt"
	"sort"
	"strings"
)

// Book is a set of solvents looked up by ID or alias: the built-in table
// plus any a user adds. The zero value is an empty, usable Book.
type Book struct {
	byID   map[string]Solvent // key: ID
	byName map[string]string  // key: normalised ID or alias; value: ID
}

// Builtin returns a fresh Book holding the built-in solvents; each call
// builds a new one, so a caller may Add to it without affecting others.
// The built-in table is validated by the package tests; a failure here is a
// programming error and panics.
func Builtin() *Book {
	b := &Book{}
	for _, s := range builtinTable() {
		if err := b.Add(s); err != nil {
			panic("solvent: built-in table: " + err.Error())
		}
	}
	return b
}

// normName is the form in which names are compared: trimmed, inner runs of
// white space collapsed to one space, lower case.
func normName(name string) string {
	if plainName(name) {
		return name // already in normal form: no allocation in hot lookups
	}
	return strings.ToLower(strings.Join(strings.Fields(name), " "))
}

// plainName reports whether a name is already lower case ASCII with single
// inner spaces and none at the ends.
func plainName(name string) bool {
	if name == "" || name[0] == ' ' || name[len(name)-1] == ' ' {
		return false
	}
	for i := 0; i < len(name); i++ {
		c := name[i]
		switch {
		case c >= 'A' && c <= 'Z', c >= 0x80, c == '\t', c == '\n', c == '\r', c == '\v', c == '\f':
			return false
		case c == ' ' && name[i-1] == ' ':
			return false
		}
	}
	return true
}

// Find looks a solvent up by ID or alias, ignoring case and outer spaces
// ("EtOAc", " etoac ", "Ethyl Acetate" all find ethyl acetate). The result
// is a copy.
func (b *Book) Find(name string) (Solvent, bool) {
	if b == nil || b.byName == nil {
		return Solvent{}, false
	}
	id, ok := b.byName[normName(name)]
	if !ok {
		return Solvent{}, false
	}
	return b.byID[id].clone(), true
}

// View is Find without the copy, for models that look solvents up in
// inner loops: the returned solvent shares its Aliases and Antoine slices
// with the Book, and callers must treat them as read-only.
func (b *Book) View(name string) (Solvent, bool) {
	if b == nil || b.byName == nil {
		return Solvent{}, false
	}
	id, ok := b.byName[normName(name)]
	if !ok {
		return Solvent{}, false
	}
	return b.byID[id], true
}

// Add adds a solvent, or replaces the one with the same ID. It runs
// Validate first; a name (ID or alias) that is already a name of another
// solvent is an error that names both solvents. On error the Book is
// unchanged.
func (b *Book) Add(s Solvent) error {
	if err := s.Validate(); err != nil {
		return err
	}
	if b.byID == nil {
		b.byID = map[string]Solvent{}
		b.byName = map[string]string{}
	}
	for i, name := range s.Names() {
		if owner, taken := b.byName[normName(name)]; taken && owner != s.ID {
			field := "id"
			if i > 0 {
				field = fmt.Sprintf("aliases[%d]", i)
			}
			return &FieldError{Solvent: s.ID, Field: field,
				Problem: fmt.Sprintf("%q is already a name of %q; choose another name or replace %q itself", name, owner, owner)}
		}
	}
	if old, ok := b.byID[s.ID]; ok {
		for _, name := range old.Names() {
			delete(b.byName, normName(name))
		}
	}
	s = s.clone()
	b.byID[s.ID] = s
	for _, name := range s.Names() {
		b.byName[normName(name)] = s.ID
	}
	return nil
}

// All lists the solvents sorted by ID (copies).
func (b *Book) All() []Solvent {
	if b == nil {
		return nil
	}
	out := make([]Solvent, 0, len(b.byID))
	for _, s := range b.byID {
		out = append(out, s.clone())
	}
	sort.Slice(out, func(i, j int) bool { return out[i].ID < out[j].ID })
	return out
}

// Len is the number of solvents.
func (b *Book) Len() int {
	if b == nil {
		return 0
	}
	return len(b.byID)
}
