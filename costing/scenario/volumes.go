package scenario

import "sort"

// Volumes accumulates solvent volumes (m³) by solvent id, as the models add
// up eluents, washes and rinses made from mixtures.
type Volumes map[string]float64

// Add adds vol of a mixture, split by its volume fractions.
func (v Volumes) Add(m Mix, vol float64) {
	for _, p := range m {
		v[p.Solvent] += p.Fraction * vol
	}
}

// IDs lists the solvent ids in order.
func (v Volumes) IDs() []string {
	ids := make([]string, 0, len(v))
	for id := range v {
		ids = append(ids, id)
	}
	sort.Strings(ids)
	return ids
}

// Total is the sum of the volumes, added in the order of their ids
// (IDs), so that a total of three or more is the same to the last bit on
// every run (a map's order changes from run to run, and floating-point
// addition of three terms depends on their order; of two it does not).
func (v Volumes) Total() float64 {
	t := 0.0
	if len(v) <= 2 {
		for _, x := range v {
			t += x
		}
		return t
	}
	for _, id := range v.IDs() {
		t += v[id]
	}
	return t
}
