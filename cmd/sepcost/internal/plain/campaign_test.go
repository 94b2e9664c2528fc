package plain

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"strings"
	"testing"

	"sepcost/costing/costingtest"
	"sepcost/costing/units"
	"sepcost/scale"
	"sepcost/templates"
)

// JSON and CSV carry the budget's figures as the report holds them (one
// source of truth; the Budget sheet's formulas reproduce the same).
func TestBudgetJSONAndCSV(t *testing.T) {
	t.Parallel()
	p, pt := costingtest.Plan(t, templates.Scenario, "demo.yaml")
	r, err := scale.EstimateWith(p, pt, []float64{p.Scenario.TargetKg}, scale.Options{Draws: 20, Seed: 1})
	if err != nil {
		t.Fatal(err)
	}
	b := r.Budget
	var js bytes.Buffer
	if err := JSON(&js, r); err != nil {
		t.Fatal(err)
	}
	var out struct {
		Budget   map[string]any `json:"budget"`
		Campaign struct {
			Winner string `json:"method"`
		} `json:"campaign"`
	}
	if err := json.Unmarshal(js.Bytes(), &out); err != nil {
		t.Fatal(err)
	}
	want := map[string]string{"capital": b.Capital.StringFixed(2), "consumables": b.Consumables.StringFixed(2), "labour": b.Labour.StringFixed(2), "equipment": b.Equipment.StringFixed(2),
		"disposal": b.Disposal.StringFixed(2), "product_lost": b.ProductLost.StringFixed(2), "one_time": b.OneTime.StringFixed(2),
		"subtotal": b.Subtotal.StringFixed(2), "contingency": b.Contingency.StringFixed(2), "total": b.Total.StringFixed(2)}
	for k, v := range want {
		if out.Budget[k] != v {
			t.Errorf("JSON budget %s = %v, want %s", k, out.Budget[k], v)
		}
	}
	if out.Campaign.Winner != b.Method {
		t.Errorf("JSON campaign method %q, budget %q", out.Campaign.Winner, b.Method)
	}
	var cs bytes.Buffer
	if err := CSV(&cs, r); err != nil {
		t.Fatal(err)
	}
	rows, err := csv.NewReader(&cs).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	got := map[string]string{}
	for _, row := range rows {
		if row[2] == "budget" {
			got[row[3]] = row[8]
		}
	}
	csvName := map[string]string{"product_lost": "product lost", "one_time": "one-time"}
	for k, v := range want {
		name := k
		if n, ok := csvName[k]; ok {
			name = n
		}
		if got[name] != v {
			t.Errorf("CSV budget %s = %q, want %s", name, got[name], v)
		}
	}
}

// The text's campaign and budget blocks write money as the rest of the
// text does: to the minor unit with thousands separators (the demo's
// campaign runs to thousands of euros).
func TestCampaignTextGroupsMoney(t *testing.T) {
	t.Parallel()
	p, pt := costingtest.Plan(t, templates.Scenario, "demo.yaml")
	r, err := scale.EstimateWith(p, pt, []float64{p.Scenario.TargetKg}, scale.Options{Draws: 20, Seed: 1})
	if err != nil {
		t.Fatal(err)
	}
	var out bytes.Buffer
	if err := Text(&out, r); err != nil {
		t.Fatal(err)
	}
	total := units.Group(r.Budget.Total.StringFixed(r.Budget.Places))
	if !strings.Contains(total, ",") {
		t.Fatalf("the demo's budget total %s is below a thousand: pick a larger case", total)
	}
	if !strings.Contains(out.String(), "total request") || !strings.Contains(out.String(), total) {
		t.Errorf("text lacks the grouped budget total %s:\n%s", total, out.String())
	}
	for _, k := range r.Campaign.Costs {
		want := units.Group(k.Total.StringFixed(k.Ledger.Places)) + " " + k.Ledger.Currency
		if !strings.Contains(out.String(), "= "+want) {
			t.Errorf("campaign line of %s lacks %q", k.Method, want)
		}
	}
}
