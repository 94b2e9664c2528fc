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

// Total is the sum of the volumes.
func (v Volumes) Total() float64 {
	t := 0.0
	for _, x := range v {
		t += x
	}
	return t
}
