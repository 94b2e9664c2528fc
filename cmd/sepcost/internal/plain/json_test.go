package plain

import (
	"bytes"
	"encoding/json"
	"flag"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"sepcost/costing"
	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale"
	"sepcost/templates"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata/golden")

// jsonFixture is a small report built by hand, independent of the models:
// one batch of 20 g of crude, chromatography costed and distillation not
// assessed. Prices are invented for the test (common practice, no source).
// Hand computation: silica 0.05 kg × 30.00 = 1.50; chemist 2 h × 60.00 =
// 120.00; total 121.50 EUR for 18 g of purified product, 6.75 EUR/g.
func jsonFixture(t *testing.T) *scale.Report {
	t.Helper()
	tab, err := prices.Read(strings.NewReader("item,unit,price,currency,category,source,date\n"+
		"silica gel,kg,30.00,EUR,consumable,invented for the test,2025-01-15\n"+
		"chemist,h,60.00,EUR,labour,invented for the test,2025-01-15\n"), "prices.csv")
	if err != nil {
		t.Fatal(err)
	}
	u := usage.Usage{Method: "chromatography", Feasible: true, ProductInKg: 0.0185, ProductOutKg: 0.018,
		Demands: []usage.Demand{
			{Item: "silica gel", Label: "silica", Group: usage.Materials, Qty: 0.05, Dim: units.Mass},
			{Item: "chemist", Label: "chemist time", Group: usage.Labour, Qty: 7200, Dim: units.Time}},
		Figures:    []usage.Figure{{Key: "silica_kg", Label: "silica used", SI: 0.05, Unit: "g"}},
		Activities: []usage.Activity{{Name: "run the column", Elapsed: 7200, Attended: 5400}},
		Waste:      []usage.Stream{{Name: "spent eluent", Class: usage.NonHalogenated, VolumeM3: 0.001, Components: []usage.Component{{Name: "n-heptane", Kg: 0.684, Solvent: true}}}},
		Notes:      []usage.Note{{Level: usage.Warning, Text: "invented warning"}},
	}
	l, err := ledger.Price(u, tab)
	if err != nil {
		t.Fatal(err)
	}
	notAssessed := costing.NotAssessed + ": the scenario has no distillation section"
	na := usage.Usage{Method: "distillation", Reason: notAssessed}
	return &scale.Report{
		Title: "JSON fixture", ScenarioFile: "s.yaml", PricesFile: "prices.csv", Prices: tab,
		MassesKg: []float64{0.02}, Methods: []string{"chromatography", "distillation"}, TargetKg: 0.02,
		Results: [][]scale.Result{{{Usage: u, Ledger: l}, {Usage: na}}},
		Decision: &scale.Decision{TargetKg: 0.02, Winner: "chromatography", WinnerPerG: 6.75,
			Infeasible: map[string]string{"distillation": notAssessed}, Explanation: []string{"Chromatography is the only feasible method."}},
		Uncertainty: &scale.Uncertainty{TargetKg: 0.02, Draws: 10, Seed: 1, Bands: []scale.Band{
			{Method: "chromatography", P10: 6.1, P50: 6.75, P90: 7.6, Feasible: 1, Cheapest: 1},
			{Method: "distillation"}}},
		Cautions: []string{"invented caution"},
	}
}

// The JSON of the fixture against its golden file, and the contract's
// promises read back: numbers where numbers are promised, typed status.
func TestJSONContract(t *testing.T) {
	var buf bytes.Buffer
	if err := JSON(&buf, jsonFixture(t)); err != nil {
		t.Fatal(err)
	}
	path := filepath.Join("..", "..", "..", "..", "testdata", "golden", "json-fixture.json")
	if *update {
		if err := os.WriteFile(path, buf.Bytes(), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run with -update to create it)", err)
	}
	if !bytes.Equal(want, buf.Bytes()) {
		os.WriteFile(path+".got", buf.Bytes(), 0o644)
		t.Fatalf("JSON differs from %s; see %s.got", path, path)
	}
	var doc struct {
		Version  int `json:"version"`
		Decision struct {
			Method   string   `json:"method"`
			CostPerG *float64 `json:"cost_per_g"`
			Excluded []struct {
				Method, Status, Reason string
			} `json:"excluded"`
		} `json:"decision"`
		Uncertainty struct {
			Methods []struct {
				Method string   `json:"method"`
				Status string   `json:"status"`
				P10    *float64 `json:"p10_cost_per_g"`
				P90    *float64 `json:"p90_cost_per_g"`
			} `json:"methods"`
		} `json:"uncertainty"`
		Batches []struct {
			Methods []struct {
				Method   string   `json:"method"`
				Status   string   `json:"status"`
				CostPerG *float64 `json:"cost_per_g"`
				Total    string   `json:"total"`
				Notes    []struct{ Level, Text string }
			} `json:"methods"`
		} `json:"batches"`
	}
	if err := json.Unmarshal(buf.Bytes(), &doc); err != nil {
		t.Fatal(err)
	}
	m := doc.Batches[0].Methods
	// Source: the hand computation above.
	if m[0].Status != "feasible" || m[0].CostPerG == nil || *m[0].CostPerG != 6.75 || m[0].Total != "121.50" {
		t.Errorf("chromatography: %+v", m[0])
	}
	if m[1].Status != "not_assessed" || m[1].CostPerG != nil {
		t.Errorf("distillation: %+v", m[1])
	}
	if ex := doc.Decision.Excluded; len(ex) != 1 || ex[0].Status != "not_assessed" || ex[0].Reason != "the scenario has no distillation section" {
		t.Errorf("excluded: %+v", ex)
	}
	if b := doc.Uncertainty.Methods; b[0].P10 == nil || *b[0].P10 != 6.1 || b[1].Status != "not_assessed" || b[1].P90 != nil {
		t.Errorf("bands: %+v", b)
	}
	if doc.Version != JSONVersion || m[0].Notes[0].Level != "warning" {
		t.Errorf("version %d, notes %+v", doc.Version, m[0].Notes)
	}
	// snake_case throughout: no key has a capital letter.
	var tree map[string]any
	json.Unmarshal(buf.Bytes(), &tree)
	var walk func(v any)
	walk = func(v any) {
		switch x := v.(type) {
		case map[string]any:
			for k, e := range x {
				if strings.ToLower(k) != k || strings.Contains(k, " ") {
					t.Errorf("key %q is not snake_case", k)
				}
				if k != "components_kg" { // keyed by substance name
					walk(e)
				}
			}
		case []any:
			for _, e := range x {
				walk(e)
			}
		}
	}
	walk(tree)
}

// The streamed JSON is byte for byte what encoding/json's Encoder with a
// two-space indent writes for the whole report at once, for a sweep of
// many masses with crossovers and for a report of no batches.
func TestJSONStreamsAsEncoderWrites(t *testing.T) {
	r := sweepReportOf(t, 40)
	var got bytes.Buffer
	if err := JSON(&got, r); err != nil {
		t.Fatal(err)
	}
	whole := func(out jsonReport) []byte {
		var want bytes.Buffer
		enc := json.NewEncoder(&want)
		enc.SetIndent("", "  ")
		if err := enc.Encode(out); err != nil {
			t.Fatal(err)
		}
		return want.Bytes()
	}
	var out jsonReport
	if err := json.Unmarshal(got.Bytes(), &out); err != nil {
		t.Fatal(err)
	}
	if len(out.Batches) != 40 {
		t.Fatalf("%d batches, want 40", len(out.Batches))
	}
	if want := whole(out); !bytes.Equal(got.Bytes(), want) {
		t.Errorf("streamed JSON differs from the whole encoding (%d bytes against %d)", got.Len(), len(want))
	}
	out.Batches = nil
	var none bytes.Buffer
	if err := streamJSON(&none, out, 0, nil); err != nil {
		t.Fatal(err)
	}
	if want := whole(out); !bytes.Equal(none.Bytes(), want) {
		t.Errorf("no batches: streamed\n%s\nwant\n%s", none.Bytes(), want)
	}
}

// sweepReportOf is the solid demo swept over n masses from 100 mg to 10 kg.
func sweepReportOf(t *testing.T, n int) *scale.Report {
	t.Helper()
	p, pt := demoPlan(t, templates.Scenario)
	masses, err := scale.LogSpace(1e-4, 10, n)
	if err != nil {
		t.Fatal(err)
	}
	r, err := scale.SweepWith(p, pt, masses, scale.Options{})
	if err != nil {
		t.Fatal(err)
	}
	return r
}
