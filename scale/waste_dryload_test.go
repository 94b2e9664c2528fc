package scale

import (
	"bytes"
	"strings"
	"testing"

	"sepcost/templates"
)

// Dry loading from dichloromethane at 5 kg: the dichloromethane is
// evaporated before the column and collected on its own, so only that
// stream is halogenated (EU List of Waste 07 05 03*, US F002: 40 CFR
// 261.31(a), spent halogenated solvent); the spent heptane/ethyl acetate
// eluent is 07 05 04* without F002, and the silica cake, which never held
// dichloromethane, carries no F002 either. Mixing and code rules apply
// only to streams that are really combined.
func TestDryLoadDichloromethaneIsItsOwnStream(t *testing.T) {
	t.Parallel()
	y := bytes.Replace(templates.Scenario, []byte("loading_solvent: ethyl acetate"), []byte("loading_solvent: dichloromethane"), 1)
	if bytes.Equal(y, templates.Scenario) {
		t.Fatal("the demo scenario no longer names its loading solvent")
	}
	p, pt := plan(t, y)
	r, err := EstimateWith(p, pt, []float64{5}, Options{})
	if err != nil {
		t.Fatal(err)
	}
	seen := 0
	for _, w := range r.Waste {
		if w.Method != "chromatography" {
			continue
		}
		c := w.Classification
		switch name := w.Stream.Name; {
		case strings.HasPrefix(name, "dry-load"):
			seen++
			if !c.Has("07 05 03*") || !c.Has("F002") {
				t.Errorf("%s: codes %v, want 07 05 03* and F002", name, c.Codes)
			}
		case strings.HasPrefix(name, "spent eluent"):
			seen++
			if c.Has("07 05 03*") || c.Has("F002") || !c.Has("07 05 04*") {
				t.Errorf("%s: codes %v, want 07 05 04* without F002", name, c.Codes)
			}
		case strings.HasPrefix(name, "solvent-wet"):
			seen++
			if c.Has("F002") {
				t.Errorf("%s: codes %v, want no F002", name, c.Codes)
			}
		}
	}
	if seen != 3 {
		t.Errorf("found %d of the three chromatography streams", seen)
	}
}
