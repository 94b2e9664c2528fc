package costing

import (
	"bytes"
	"math"
	"os"
	"reflect"
	"strings"
	"testing"

	"sepcost/costing/scenario"
	"sepcost/templates"
)

// leanCases are the demos, the fixtures and variants of the demo that
// take the other branches of the chromatography (mixed fractions re-run,
// solvent recovered, liquid loading, the scenario's own columns, the
// Still's-table rule, no loading that cuts).
func leanCases(t *testing.T) map[string][]byte {
	t.Helper()
	cases := map[string][]byte{"demo": templates.Scenario, "liquid demo": templates.Liquid}
	for _, f := range []string{"../scale/testdata/solid-with-distillation.yaml", "../scale/testdata/liquid-small-stills.yaml"} {
		b, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		cases[f] = b
	}
	demo := string(templates.Scenario)
	for name, r := range map[string][2]string{
		"rerun":       {"mixed_fractions: set aside", "mixed_fractions: rerun"},
		"recovered":   {"recover_solvent: 0\n", "recover_solvent: 0.8\n"},
		"liquid load": {"loading: dry", "loading: liquid"},
		"own columns": {"# column_diameters: [", "column_diameters: ["},
		"still-table": {"loading_rule: theory", "loading_rule: still-table"},
	} {
		if !strings.Contains(demo, r[0]) {
			t.Fatalf("the demo no longer holds %q", r[0])
		}
		cases[name] = []byte(strings.Replace(demo, r[0], r[1], 1))
	}
	both := strings.Replace(string(cases["rerun"]), "recover_solvent: 0\n", "recover_solvent: 0.5\n", 1)
	cases["rerun, recovered"] = []byte(both)
	return cases
}

// The lean candidates the plan ranks are the candidates it reports, to
// the last bit: for every candidate at masses from 0.1 mg to 50 kg of
// the demos, the fixtures and variants, full(i) is Choices' i-th, notes
// and all, and the lean i-th has the same quantities, demands, waste,
// activities, figures and equipment, only without notes and tables
// (property check: one model, two ways of asking).
func TestLeanCandidatesAreTheFullOnes(t *testing.T) {
	t.Parallel()
	for name, y := range leanCases(t) {
		sc, err := scenario.Load(bytes.NewReader(y), name)
		if err != nil {
			t.Fatal(err)
		}
		p, err := Prepare(sc)
		if err != nil {
			t.Fatal(err)
		}
		for _, plan := range []*Plan{p, p.Quiet(p.Scenario, p.Coef)} {
			for _, kg := range []float64{1e-7, 1e-4, 0.003, 0.2, 2, 50} {
				for _, m := range plan.Methods {
					if m.Lean == nil {
						continue
					}
					want := m.Choices(kg)
					lean, full := m.Lean(kg)
					if len(lean) != len(want) {
						t.Fatalf("%s at %g kg: %d lean candidates, %d full", name, kg, len(lean), len(want))
					}
					for i := range want {
						f := full(i)
						if !sameBits(reflect.ValueOf(f), reflect.ValueOf(want[i])) {
							t.Errorf("%s at %g kg, candidate %d: full(i) is not Choices' i-th", name, kg, i)
						}
						if len(lean[i].Notes)+len(lean[i].Tables) > 0 || !lean[i].Quiet {
							t.Errorf("%s at %g kg, candidate %d: the lean candidate is worded", name, kg, i)
						}
						l := lean[i]
						l.Notes, l.Tables, l.Quiet, f.Notes, f.Tables = nil, nil, f.Quiet, nil, nil
						if !f.Feasible {
							l.Reason = f.Reason
						}
						if !sameBits(reflect.ValueOf(l), reflect.ValueOf(f)) {
							t.Errorf("%s at %g kg, candidate %d: lean quantities differ from the full build", name, kg, i)
						}
					}
				}
			}
		}
	}
}

// sameBits is reflect.DeepEqual with every float64 compared by its bits
// (so 0 and −0 differ, and NaN equals itself).
func sameBits(a, b reflect.Value) bool {
	if a.Kind() != b.Kind() {
		return false
	}
	switch a.Kind() {
	case reflect.Float64:
		return math.Float64bits(a.Float()) == math.Float64bits(b.Float())
	case reflect.Slice:
		if a.Len() != b.Len() || a.IsNil() != b.IsNil() {
			return false
		}
		for i := 0; i < a.Len(); i++ {
			if !sameBits(a.Index(i), b.Index(i)) {
				return false
			}
		}
		return true
	case reflect.Struct:
		for i := 0; i < a.NumField(); i++ {
			if !sameBits(a.Field(i), b.Field(i)) {
				return false
			}
		}
		return true
	case reflect.Map:
		if a.Len() != b.Len() {
			return false
		}
		for _, k := range a.MapKeys() {
			if !sameBits(a.MapIndex(k), b.MapIndex(k)) {
				return false
			}
		}
		return true
	case reflect.String:
		return a.String() == b.String()
	case reflect.Bool:
		return a.Bool() == b.Bool()
	case reflect.Int, reflect.Int64, reflect.Int32, reflect.Int16, reflect.Int8:
		return a.Int() == b.Int()
	case reflect.Uint, reflect.Uint64, reflect.Uint32, reflect.Uint16, reflect.Uint8:
		return a.Uint() == b.Uint()
	}
	panic("sameBits: no comparison for " + a.Kind().String())
}
