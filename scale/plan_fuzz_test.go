package scale

import (
	"errors"
	"path/filepath"
	"strings"
	"testing"

	"sepcost/costing/scenario"
)

// FuzzReadPlan: ReadPlan never panics; every row it accepts has a .yaml or
// .yml scenario, a batch mass within scenario.BatchRange and runs from 0 to
// MaxRunsPerRow; a refusal unwraps to ErrPlan. Seeds in
// testdata/fuzz/FuzzReadPlan.
func FuzzReadPlan(f *testing.F) {
	for _, s := range []string{
		"scenario,mass,runs\ns.yaml,20 g,3\n",
		"scenario,mass,runs,method\ns.yaml,2 kg,2,crystallization\n",
		"scenario,mass,runs\n\"s.yaml,20 g,3\n",
		"scenario,mass,runs,mass\ns.yaml,20 g,3,1 g\n",
		"scenario,mass,runs\ns.yaml,20 g,9200000000000000000\n",
	} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, in string) {
		rows, err := ReadPlan(strings.NewReader(in), "plan.csv")
		if err != nil {
			if rows != nil {
				t.Fatal("rows and an error together")
			}
			if !errors.Is(err, ErrPlan) {
				t.Fatalf("error does not unwrap to ErrPlan: %v", err)
			}
			return
		}
		if len(rows) == 0 || len(rows) > MaxPlanRows {
			t.Fatalf("%d rows", len(rows))
		}
		for _, r := range rows {
			ext := strings.ToLower(filepath.Ext(r.Scenario))
			if (ext != ".yaml" && ext != ".yml") || scenario.CheckBatchMass(r.MassKg) != nil || r.Runs < 0 || r.Runs > MaxRunsPerRow || r.Line < 2 {
				t.Fatalf("row accepted: %+v", r)
			}
		}
	})
}
