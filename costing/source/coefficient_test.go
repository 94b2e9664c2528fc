package source

import (
	"math"
	"strings"
	"testing"

	"sepcost/costing/units"
)

func set() Set {
	return NewSet([]Coefficient{
		// 15 cm bed, as in Still, Kahn and Mitra, J. Org. Chem. 1978, 43, 2923 (from memory).
		{Key: "x.bed_height", Method: "x", Label: "bed height", SI: 0.15, Dim: units.Length, Unit: "cm", Source: "Still 1978", Mark: FromMemory},
		{Key: "x.share", Method: "x", Label: "share", SI: 0.25, Dim: units.None, Source: "common practice", Mark: CommonPractice},
	})
}

// A user's setting replaces the value, keeps the old one in the source and
// is marked as set in the scenario; a wrong dimension or key is refused
// with what is valid.
func TestOverride(t *testing.T) {
	t.Parallel()
	s := set()
	orig := s.Clone()
	q, _, _ := units.Parse("12 cm")
	if err := s.Override("x.bed_height", q, "12 cm"); err != nil {
		t.Fatal(err)
	}
	c := s.Of("x.bed_height")
	if math.Abs(c.SI-0.12) > 1e-12 || c.Mark != Override || !strings.Contains(c.Source, "default was bed height = 15 cm") {
		t.Errorf("override: %+v", c)
	}
	if orig.Get("x.bed_height") != 0.15 {
		t.Errorf("Clone shares the map")
	}
	if math.Abs(c.Display()-12) > 1e-9 {
		t.Errorf("display %g cm", c.Display())
	}
	m, _, _ := units.Parse("3 g")
	if err := s.Override("x.bed_height", m, "3 g"); err == nil || !strings.Contains(err.Error(), "a length with its unit") {
		t.Errorf("wrong dimension: %v", err)
	}
	if err := s.Override("x.nope", q, "12 cm"); err == nil || !strings.Contains(err.Error(), "x.bed_height, x.share") {
		t.Errorf("unknown key: %v", err)
	}
}

func TestNewSetRefusesDuplicates(t *testing.T) {
	t.Parallel()
	defer func() {
		if recover() == nil {
			t.Error("duplicate keys must be a programming error")
		}
	}()
	c := Coefficient{Key: "a"}
	NewSet([]Coefficient{c}, []Coefficient{c})
}

// A copy made for a draw carries its own values and leaves the original
// alone; a Put on it does not leak back; Clone is independent; Lookup of
// an unknown key reports false.
func TestWithValuesIsIndependent(t *testing.T) {
	t.Parallel()
	s := set()
	vals := s.Values()
	for i := range vals {
		vals[i] *= 2
	}
	d := s.WithValues(vals)
	if d.Get("x.bed_height") != 0.30 || s.Get("x.bed_height") != 0.15 {
		t.Errorf("draw %g, original %g", d.Get("x.bed_height"), s.Get("x.bed_height"))
	}
	c := d.Of("x.share")
	c.Label = "changed"
	c.SI = 0.9
	d.Put(c)
	d.Put(Coefficient{Key: "x.new", SI: 1})
	if s.Of("x.share").Label != "share" || s.Get("x.share") != 0.25 {
		t.Errorf("a Put on a draw leaked: %+v", s.Of("x.share"))
	}
	if _, ok := s.Lookup("x.new"); ok || s.Len() != 2 || d.Len() != 3 {
		t.Errorf("a new key leaked: %d vs %d", s.Len(), d.Len())
	}
	cl := s.Clone()
	cl.Put(Coefficient{Key: "x.other", SI: 2})
	if _, ok := s.Lookup("x.other"); ok {
		t.Errorf("Clone shares its index")
	}
	if got := s.Keys(); len(got) != 2 || got[0] != "x.bed_height" {
		t.Errorf("keys %v", got)
	}
}
