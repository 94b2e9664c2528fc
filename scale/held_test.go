package scale

import (
	"fmt"
	"reflect"
	"testing"

	"sepcost/templates"
)

// A long sweep that holds only rows gives the same report as one that
// holds every result: the results recomputed for the writers are those
// first computed (the models, ledger and metrics are pure functions of
// the mass), and everything gathered chunk by chunk (rows, warnings, waste
// rows, unused prices, crossovers) is what gathering all at once gives.
// 300 masses make three chunks of walkChunk.
func TestRecomputedResultsAreTheHeld(t *testing.T) {
	t.Parallel()
	for _, yaml := range [][]byte{templates.Scenario, templates.Liquid} {
		p, pt := plan(t, yaml)
		masses, err := LogSpace(1e-4, 20, 300)
		if err != nil {
			t.Fatal(err)
		}
		held, err := SweepWith(p, pt, masses, Options{Hold: len(masses)})
		if err != nil {
			t.Fatal(err)
		}
		rows, err := SweepWith(p, pt, masses, Options{Hold: 1})
		if err != nil {
			t.Fatal(err)
		}
		if held.Results == nil || rows.Results != nil {
			t.Fatalf("held report holds %d masses, the other %d: want %d and none", len(held.Results), len(rows.Results), len(masses))
		}
		// Printed, since NaN (no solvent, not feasible) is not equal to itself.
		if a, b := fmt.Sprintf("%+v", held.Rows()), fmt.Sprintf("%+v", rows.Rows()); a != b || len(rows.Rows()) != 3*len(masses) {
			t.Errorf("the rows differ:\n%.300s\n%.300s", a, b)
		}
		for i := range masses {
			a, err := rows.At(i)
			if err != nil {
				t.Fatal(err)
			}
			if !reflect.DeepEqual(a, held.Results[i]) {
				t.Fatalf("%g kg: the recomputed results differ from the held", masses[i])
			}
			if held.CheapestAt(i) != rows.CheapestAt(i) {
				t.Errorf("%g kg: cheapest %d held, %d from rows", masses[i], held.CheapestAt(i), rows.CheapestAt(i))
			}
		}
		n := 0
		if err := rows.Each(func(i int, res []Result) error {
			if i != n || !reflect.DeepEqual(res, held.Results[i]) {
				t.Fatalf("Each at %d (mass %d): results differ from the held", n, i)
			}
			n++
			return nil
		}); err != nil || n != len(masses) {
			t.Fatalf("Each walked %d masses of %d: %v", n, len(masses), err)
		}
		for _, f := range []struct {
			name string
			a, b any
		}{{"warnings", held.Warnings, rows.Warnings}, {"waste rows", held.Waste, rows.Waste}, {"notes", held.Notes, rows.Notes},
			{"crossovers", held.Crossovers, rows.Crossovers}, {"pairwise", held.Pairwise, rows.Pairwise}} {
			if !reflect.DeepEqual(f.a, f.b) {
				t.Errorf("%s differ between the held report and the one with rows", f.name)
			}
		}
		if len(held.Warnings) == 0 || len(held.Waste) == 0 {
			t.Errorf("%d warnings, %d waste rows: the comparison compared nothing", len(held.Warnings), len(held.Waste))
		}
	}
}

// A report holding neither results nor a plan says so rather than
// panicking.
func TestReportWithoutResults(t *testing.T) {
	t.Parallel()
	r := &Report{MassesKg: []float64{1}, Methods: []string{"chromatography"}}
	if _, err := r.At(0); err == nil {
		t.Error("At: no error from a report with no results and no plan")
	}
	if err := r.Each(func(int, []Result) error { return nil }); err == nil {
		t.Error("Each: no error from a report with no results and no plan")
	}
	if _, err := r.At(1); err == nil {
		t.Error("At(1): no error for a mass outside the report")
	}
}
