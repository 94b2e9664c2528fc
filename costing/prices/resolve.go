package prices

import "fmt"

// Names resolves an item name: the canonical name of the solvent it
// names (by name or alias) and the solvent's density in kg/m³, ok false
// when it names no solvent.
type Names func(name string) (canonical string, densityKgM3 float64, ok bool)

// Resolve returns a copy of the table in which every item that names a
// solvent under another of its names ("heptane", "EtOAc") carries the
// solvent's canonical name (the one the models demand, "n-heptane",
// "ethyl acetate") and remembers the name as written, and every solvent
// priced per unit of mass carries the solvent's density, so that the
// ledger can price a volume of it:
//
//	q = V · ρ / f
//
// (V the volume demanded in m³, ρ the density in kg/m³, f the price unit's
// factor to kg). Two lines that name the same solvent are an error naming
// both lines, as two lines with the same name are when the table is read.
// The table given is not changed.
func (t *Table) Resolve(names Names) (*Table, error) {
	out := *t
	out.Items = make([]Item, len(t.Items))
	copy(out.Items, t.Items)
	var errs Errors
	seen := map[string]int{} // name key → index in out.Items
	for i := range out.Items {
		seen[nameKey(out.Items[i].Name)] = i
	}
	for i := range out.Items {
		it := &out.Items[i]
		id, rho, ok := names(it.Name)
		if !ok {
			continue
		}
		if key := nameKey(id); key != nameKey(it.Name) {
			if j, dup := seen[key]; dup && j != i {
				other := out.Items[j]
				errs = append(errs, &Error{Of: ErrInvalid, File: t.File, Line: it.Line, Field: "item",
					Msg: fmt.Sprintf("%q and %q (line %d) are the same solvent, %s; keep one line for it", it.Name, other.Name, other.Line, id)})
				continue
			}
			delete(seen, nameKey(it.Name))
			seen[key] = i
			it.Written, it.Name = it.Name, id
		}
		if rho > 0 {
			it.Density = rho
		}
	}
	if len(errs) > 0 {
		return nil, errs
	}
	return &out, nil
}

// Label is the item's name as the price table shows it: the name as
// written, with the canonical name it was read as when they differ
// ("heptane (read as n-heptane)").
func (it Item) Label() string {
	if it.Written == "" {
		return it.Name
	}
	return it.Written + " (read as " + it.Name + ")"
}
