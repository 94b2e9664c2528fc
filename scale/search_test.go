package scale

import (
	"os"
	"reflect"
	"testing"

	"sepcost/templates"
)

// The crossover search on the lean path (bounded float costs, cached by
// mass, full runs only where a choice or a word needs them) finds the
// crossovers the full runs find, to the last bit and word: both demos and
// the two three-method fixtures, on a coarse and a finer grid. At most a
// quarter of the lean search's model runs are full ones (what it is for:
// a full run words notes and prices every line in decimal).
func TestLeanSearchFindsWhatFullRunsFind(t *testing.T) {
	t.Parallel()
	three, err := os.ReadFile("testdata/solid-with-distillation.yaml")
	if err != nil {
		t.Fatal(err)
	}
	stills, err := os.ReadFile("testdata/liquid-small-stills.yaml")
	if err != nil {
		t.Fatal(err)
	}
	for name, yaml := range map[string][]byte{"solid": templates.Scenario, "liquid": templates.Liquid, "three": three, "stills": stills} {
		p, pt := plan(t, yaml)
		for _, n := range []int{23, 61} {
			masses, _ := LogSpace(1e-4, 10, n)
			r, err := EstimateWith(p, pt, masses, Options{})
			if err != nil {
				t.Fatal(err)
			}
			grid := gridOf(r)
			lean, err := planEvals(p, pt)
			if err != nil {
				t.Fatal(err)
			}
			full := newEvals(planEval(p, pt), nil)
			var got, want [2][]Crossover
			for i, e := range []*evals{lean, full} {
				out := &got
				if i == 1 {
					out = &want
				}
				if out[0], err = findDecisionCrossovers(r.Methods, masses, grid, e); err != nil {
					t.Fatal(err)
				}
				if out[1], err = findPairwise(r.Methods, masses, grid, e); err != nil {
					t.Fatal(err)
				}
			}
			if !reflect.DeepEqual(got, want) {
				t.Errorf("%s, %d masses: lean search %+v, full %+v", name, n, got, want)
			}
			if len(want[0])+len(want[1]) == 0 {
				t.Errorf("%s, %d masses: no crossover to compare", name, n)
			}
			if 4*lean.fullRuns > lean.runs {
				t.Errorf("%s, %d masses: %d of the lean search's %d model runs are full", name, n, lean.fullRuns, lean.runs)
			}
		}
	}
}
