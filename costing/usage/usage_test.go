package usage

import (
	"math"
	"testing"

	"sepcost/costing/units"
)

// Totals are sums (identities); NaN figures are never kept; composition
// lists the largest component first, as shares of the stream's mass.
func TestUsageHelpers(t *testing.T) {
	t.Parallel()
	u := New("m", 1, 0.8)
	u.AddFigure("ok", "ok", 2, "")
	u.AddFigure("nan", "nan", math.NaN(), "")
	u.AddFigure("inf", "inf", math.Inf(1), "")
	if len(u.Figures) != 1 {
		t.Errorf("figures %v", u.Figures)
	}
	u.AddDemand("silica gel", "silica", Materials, 0.5, units.Mass)
	u.Activities = []Activity{{"a", 3600, 1800}, {"b", 7200, 0}}
	el, at := u.Hours()
	if el != 3 || at != 0.5 {
		t.Errorf("hours %g %g", el, at)
	}
	s := Stream{Name: "spent eluent", Class: NonHalogenated, Components: []Component{{"ethyl acetate", 1, true}, {"n-heptane", 3, true}}}
	u.Waste = []Stream{s, {Name: "silica", Class: WetSolids, Components: []Component{{"silica gel", 2, false}}}}
	if u.WasteKg() != 6 || s.Kg() != 4 {
		t.Errorf("waste %g", u.WasteKg())
	}
	if got := s.Composition(); got != "n-heptane 75 %; ethyl acetate 25 %" {
		t.Errorf("composition %q", got)
	}
	if s.DisposalLabel() != "disposal: spent eluent" || NonHalogenated.DisposalItem() != "disposal: non-halogenated solvent" {
		t.Errorf("labels")
	}
}

// A handful of repeats is information; from usage.ManyRepeats (10, common
// practice, no source) runs or batches the plan is impractical: a warning.
func TestRepeatLevel(t *testing.T) {
	t.Parallel()
	for n, want := range map[int]Level{1: Info, 9: Info, 10: Warning, 148: Warning} {
		if got := RepeatLevel(n); got != want {
			t.Errorf("RepeatLevel(%d) = %s, want %s", n, got, want)
		}
	}
}

// Compact keeps every figure and demand, in order, in slices of their own
// length, so that appending to the compacted usage cannot write into
// memory another copy shares.
func TestCompact(t *testing.T) {
	u := New("m", 1, 0.8)
	u.AddFigure("a", "first", 1, "")
	u.AddFigure("b", "second", 2, "")
	u.Demands = append(u.Demands, Demand{Item: "silica gel", Qty: 0.1})
	before := u
	u.Compact()
	if len(u.Figures) != 2 || cap(u.Figures) != 2 || u.Figures[1].Key != "b" || len(u.Demands) != 1 || cap(u.Demands) != 1 || u.Demands[0].Item != "silica gel" {
		t.Fatalf("compacted usage %+v", u)
	}
	u.AddFigure("c", "third", 3, "")
	if len(before.Figures) != 2 || before.Figures[:3][2].Key == "c" {
		t.Errorf("appending after Compact wrote into the uncompacted slice")
	}
}
