package plain

import (
	"fmt"
	"math"

	"github.com/shopspring/decimal"

	"sepcost/costing/units"
	"sepcost/scale"
)

// jsonCampaign is the campaign of each method and the decision on it.
type jsonCampaign struct {
	ProductKg    float64              `json:"product_kg,omitempty"`
	Batches      int                  `json:"batches,omitempty"`
	BatchKg      float64              `json:"crude_per_batch_kg"`
	ShiftHours   float64              `json:"shift_hours"`
	ShiftsPerDay int                  `json:"shifts_per_day"`
	Methods      []jsonCampaignMethod `json:"methods"`
	Infeasible   map[string]string    `json:"infeasible,omitempty"`
	Winner       string               `json:"method"`
	RunnerUp     string               `json:"runner_up,omitempty"`
	Tie          bool                 `json:"tie"`
	Paybacks     []jsonPayback        `json:"paybacks,omitempty"`
	Map          jsonCampaignMap      `json:"map"`
	Explanation  []string             `json:"explanation"`
}

type jsonCampaignMethod struct {
	Method      string  `json:"method"`
	Batches     int     `json:"batches"`
	ProductKg   float64 `json:"product_kg"`
	PerBatch    string  `json:"cost_per_batch"`
	OneTime     string  `json:"one_time"`
	Capital     string  `json:"capital"`
	Total       string  `json:"total"`
	Spread      string  `json:"cost_per_batch_one_time_spread"`
	PerGram     float64 `json:"cost_per_g"`
	WorkingDays float64 `json:"working_days_at_least"`
	PersonDays  float64 `json:"person_days"`
	OccupiedH   float64 `json:"equipment_hours"`
}

type jsonPayback struct {
	Method  string `json:"method"`
	Against string `json:"against"`
	Batches int    `json:"batches,omitempty"`
	Never   bool   `json:"never"`
}

type jsonCampaignMap struct {
	MassesKg []float64        `json:"crude_per_batch_kg"`
	Batches  []int            `json:"batches"`
	Winner   [][]string       `json:"cheapest"`
	Payback  map[string][]int `json:"payback_batches"`
}

// jsonBudget is the request for the chosen method's campaign.
type jsonBudget struct {
	Method      string  `json:"method"`
	Batches     int     `json:"batches"`
	Capital     string  `json:"capital"`
	Consumables string  `json:"consumables"`
	Labour      string  `json:"labour"`
	Equipment   string  `json:"equipment"`
	Disposal    string  `json:"disposal"`
	ProductLost string  `json:"product_lost"`
	OneTime     string  `json:"one_time"`
	Subtotal    string  `json:"subtotal"`
	Share       float64 `json:"contingency_share"`
	Contingency string  `json:"contingency"`
	Total       string  `json:"total"`
}

// campaignJSON gives the campaign and budget parts of the JSON report, nil
// without a campaign.
func campaignJSON(r *scale.Report) (*jsonCampaign, *jsonBudget) {
	c := r.Campaign
	if c == nil {
		return nil, nil
	}
	jc := &jsonCampaign{ProductKg: c.Spec.ProductKg, Batches: c.Spec.Batches, BatchKg: c.Spec.BatchKg, ShiftHours: c.Shifts.ShiftH, ShiftsPerDay: c.Shifts.PerDay,
		Infeasible: c.Infeasible, Winner: c.Winner, RunnerUp: c.RunnerUp, Tie: c.Tie, Explanation: c.Explanation}
	for _, k := range c.Costs {
		p := k.Ledger.Places
		jc.Methods = append(jc.Methods, jsonCampaignMethod{k.Method, k.Batches, k.ProductKg, k.PerBatch.StringFixed(p), k.OneTime.StringFixed(p), k.Capital.StringFixed(p),
			k.Total.StringFixed(p), k.PerBatchSpread.StringFixed(p), k.PerGram, k.WorkingDays, k.PersonDays, k.OccupiedH})
	}
	for _, pb := range c.Paybacks {
		jc.Paybacks = append(jc.Paybacks, jsonPayback{pb.Method, pb.Against, pb.Batches, pb.Never})
	}
	if m := c.Map; m != nil {
		jc.Map = jsonCampaignMap{m.MassesKg, m.Batches, m.Winner, m.Payback}
	}
	b := r.Budget
	if b == nil {
		return jc, nil
	}
	f := func(d interface{ StringFixed(int32) string }) string { return d.StringFixed(b.Places) }
	return jc, &jsonBudget{b.Method, b.Batches, f(b.Capital), f(b.Consumables), f(b.Labour), f(b.Equipment), f(b.Disposal), f(b.ProductLost), f(b.OneTime), f(b.Subtotal),
		b.ContingencyShare, f(b.Contingency), f(b.Total)}
}

// budgetCSV gives the budget as CSV rows of the estimate's shape: group
// "budget", the heading as item, the campaign in words as label.
func budgetCSV(r *scale.Report) [][]string {
	b := r.Budget
	if b == nil {
		return nil
	}
	label := fmt.Sprintf("campaign of %d batches of %s", b.Batches, units.FormatMass(b.BatchKg))
	mass := kgText(b.BatchKg)
	var rows [][]string
	for _, h := range []struct {
		item string
		v    interface{ StringFixed(int32) string }
	}{{"capital", b.Capital}, {"consumables", b.Consumables}, {"labour", b.Labour}, {"equipment", b.Equipment}, {"disposal", b.Disposal}, {"product lost", b.ProductLost},
		{"one-time", b.OneTime}, {"subtotal", b.Subtotal}, {"contingency", b.Contingency}, {"total", b.Total}} {
		rows = append(rows, []string{mass, Safe(b.Method), "budget", h.item, Safe(label), "", "", "", h.v.StringFixed(b.Places), Safe(b.Currency)})
	}
	return rows
}

// campaignText writes the campaign of each method and the budget request.
func campaignText(ew *errWriter, r *scale.Report) {
	c := r.Campaign
	if c == nil {
		return
	}
	ew.printf("\nCampaign (one-time costs charged once; working days at least, one batch after another):\n")
	for _, k := range c.Costs {
		p := k.Ledger.Places
		fix := func(d decimal.Decimal) string { return units.Group(d.StringFixed(p)) }
		ew.printf("  %s: %d × %s + one-time %s + capital %s = %s %s, %.2f %s/g; %.1f working days, %.1f person-days, %.0f equipment hours\n",
			k.Method, k.Batches, fix(k.PerBatch), fix(k.OneTime), fix(k.Capital), fix(k.Total), k.Ledger.Currency, k.PerGram, k.Ledger.Currency,
			k.WorkingDays, k.PersonDays, k.OccupiedH)
	}
	b := r.Budget
	if b == nil {
		return
	}
	ew.printf("\nBudget request (%s, %d batches, %s):\n", b.Method, b.Batches, b.Currency)
	for _, h := range []struct {
		name string
		v    interface{ StringFixed(int32) string }
	}{{"capital", b.Capital}, {"consumables and energy", b.Consumables}, {"labour", b.Labour}, {"equipment occupancy", b.Equipment}, {"disposal", b.Disposal},
		{"product lost (value)", b.ProductLost}, {"one-time development", b.OneTime}, {"subtotal", b.Subtotal}} {
		ew.printf("  %-24s %12s\n", h.name, units.Group(h.v.StringFixed(b.Places)))
	}
	share := "not sampled"
	if b.ContingencyShare > 0 && !math.IsNaN(b.ContingencyShare) {
		share = fmt.Sprintf("%.1f %% = P90/P50 − 1", b.ContingencyShare*100)
	}
	ew.printf("  %-24s %12s  (%s)\n", "contingency", units.Group(b.Contingency.StringFixed(b.Places)), share)
	ew.printf("  %-24s %12s\n", "total request", units.Group(b.Total.StringFixed(b.Places)))
}
