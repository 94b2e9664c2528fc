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
	s := set()
	orig := s.Clone()
	q, _, _ := units.Parse("12 cm")
	if err := s.Override("x.bed_height", q, "12 cm"); err != nil {
		t.Fatal(err)
	}
	c := s["x.bed_height"]
	if math.Abs(c.SI-0.12) > 1e-12 || c.Mark != Override || !strings.Contains(c.Source, "default was bed height = 15 cm") {
		t.Errorf("override: %+v", c)
	}
	if orig["x.bed_height"].SI != 0.15 {
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
	defer func() {
		if recover() == nil {
			t.Error("duplicate keys must be a programming error")
		}
	}()
	c := Coefficient{Key: "a"}
	NewSet([]Coefficient{c}, []Coefficient{c})
}
