package chrom

import (
	"math"
	"testing"
)

// Volumes are kept in solvent-id order whatever order they are added in,
// so a total of three or more is the same to the last bit on every run:
// 0.1 + 0.2 + 0.3 in that order is 0.6000000000000001, in another 0.6
// (IEEE 754 double rounding, hand-checked); adding to a solvent already
// present keeps one entry, and a solvent never added reads 0.
func TestVolumesInOneOrder(t *testing.T) {
	t.Parallel()
	ids := []string{"n-heptane", "ethyl acetate", "dichloromethane"}
	vs := []float64{0.3, 0.2, 0.1}
	var want uint64
	for k, order := range [][]int{{0, 1, 2}, {2, 1, 0}, {1, 2, 0}, {1, 0, 2}} {
		x := newVols()
		for _, i := range order {
			x.add(ids[i], vs[i])
		}
		if len(x.ids) != 3 || x.ids[0] != "dichloromethane" || x.ids[2] != "n-heptane" {
			t.Fatalf("order %v: ids %v, want them sorted", order, x.ids)
		}
		if k == 0 {
			want = math.Float64bits(x.total())
		} else if got := math.Float64bits(x.total()); got != want {
			t.Errorf("order %v: total %v, first order %v", order, math.Float64frombits(got), math.Float64frombits(want))
		}
	}
	x := newVols()
	x.add("a", 1)
	x.add("a", 2)
	if len(x.ids) != 1 || x.get("a") != 3 || x.get("b") != 0 {
		t.Errorf("ids %v, a %g, b %g; want one entry of 3 and 0 for b", x.ids, x.get("a"), x.get("b"))
	}
	y := x.times(2)
	y.add("0", 1)
	if len(x.ids) != 1 || x.ids[0] != "a" {
		t.Errorf("a copy shares its ids with the original: %v", x.ids)
	}
}
