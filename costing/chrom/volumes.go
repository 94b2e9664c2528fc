package chrom

import "sepcost/costing/scenario"

// vols are solvent volumes by solvent id (m³), kept in id order: a
// candidate's few solvents in two short slices rather than a map, so that
// a total is summed, and the solvents listed, in the same order on every
// run (a map's order changes from one run to the next, and a sum of three
// or more volumes with it, in the last bit).
type vols struct {
	ids []string
	v   []float64
}

// solventsRoom is the room newVols makes: the eluent's two solvents, a
// gradient's and the loading solvent.
const solventsRoom = 4

// newVols is an empty set of volumes.
func newVols() vols {
	return vols{ids: make([]string, 0, solventsRoom), v: make([]float64, 0, solventsRoom)}
}

// slot is the index of id, added with volume 0 in id order when absent.
func (x *vols) slot(id string) int {
	i := 0
	for i < len(x.ids) && x.ids[i] < id {
		i++
	}
	if i < len(x.ids) && x.ids[i] == id {
		return i
	}
	x.ids = append(x.ids, "")
	x.v = append(x.v, 0)
	copy(x.ids[i+1:], x.ids[i:])
	copy(x.v[i+1:], x.v[i:])
	x.ids[i], x.v[i] = id, 0
	return i
}

// add adds v to solvent id.
func (x *vols) add(id string, v float64) {
	i := x.slot(id)
	x.v[i] += v
}

// set sets solvent id's volume.
func (x *vols) set(id string, v float64) { x.v[x.slot(id)] = v }

// addMix adds vol of a mixture, each solvent by its volume fraction.
func (x *vols) addMix(m scenario.Mix, vol float64) {
	for _, p := range m {
		x.add(p.Solvent, p.Fraction*vol)
	}
}

// get is solvent id's volume, 0 when it has none.
func (x vols) get(id string) float64 {
	for i, s := range x.ids {
		if s == id {
			return x.v[i]
		}
	}
	return 0
}

// total is the sum of the volumes, in id order.
func (x vols) total() float64 {
	t := 0.0
	for _, v := range x.v {
		t += v
	}
	return t
}

// times is a copy with every volume multiplied by f.
func (x vols) times(f float64) vols {
	out := vols{ids: append(make([]string, 0, len(x.ids)+1), x.ids...), v: make([]float64, len(x.v), len(x.v)+1)}
	for i, v := range x.v {
		out.v[i] = v * f
	}
	return out
}
