package scale

import (
	"fmt"
	"math"
	"sort"

	"sepcost/costing"
	"sepcost/costing/chrom"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale/campaign"
)

// Payback is after how many batches a method with start-up costs (its
// one-time development and capital) is at most as dear per gram as
// staying with the method it would replace.
type Payback struct {
	Method, Against string
	Batches         int  // batches from which Method is at most as dear per gram
	Never           bool // Method's recurring cost per gram is not lower: it never pays back
}

// CampaignReport is every method run as the scenario's campaign, the
// decision made on the campaign, the paybacks and the map of winners over
// batch mass and number of batches.
type CampaignReport struct {
	Spec        scenario.Campaign
	Shifts      campaign.Shifts
	Costs       []campaign.Cost          // feasible methods, in plan order
	Infeasible  map[string]string        // method → reason
	Capital     map[string][]CapitalItem // method → the equipment to buy its campaign uses
	Winner      string                   // cheapest per gram over the campaign; "" when none is feasible
	RunnerUp    string
	Margin      float64 // (runner − winner) / runner, per gram over the campaign
	Tie         bool    // Margin below TieMargin
	Paybacks    []Payback
	Map         *CampaignMap
	Explanation []string
}

// Cost returns the campaign of a method.
func (c *CampaignReport) Cost(method string) (campaign.Cost, bool) {
	for _, k := range c.Costs {
		if k.Method == method {
			return k, true
		}
	}
	return campaign.Cost{}, false
}

// CampaignMap says which method is cheapest per gram over a campaign of
// Batches[k] batches of MassesKg[i] of crude.
type CampaignMap struct {
	MassesKg []float64
	Batches  []int
	Winner   [][]string // [mass][batches]; "" when no method is feasible
	PerGram  [][]float64
	// Payback gives, for each method with start-up costs, the batches
	// after which it pays back against chromatography at each mass (one
	// batch's price bands); 0 when it never does or cannot run there.
	Payback map[string][]int
}

// MapBatches are the campaign sizes the map shows (common practice, no
// source: from a one-off to a long-running product).
var MapBatches = []int{1, 2, 5, 10, 20, 50, 100}

// MapPoints is the number of batch masses the map shows.
const MapPoints = 13

// shiftsOf turns the scenario's campaign hours into campaign.Shifts.
func shiftsOf(sp *scenario.Campaign) campaign.Shifts {
	return campaign.Shifts{ShiftH: sp.ShiftS / 3600, PerDay: sp.ShiftsPerDay}
}

// RunCampaign runs every method of the plan as the campaign sp: each
// method at sp.BatchKg of crude per batch, sp.Batches times or as many
// times as sp.ProductKg needs with that method's recovery; one-time costs
// once; the decision on cost per gram over the campaign; the payback of
// each method with start-up costs against staying with chromatography;
// and the map of winners over batch mass (the scenario's masses and a
// decade either side of the batch mass) and MapBatches.
func RunCampaign(p *costing.Plan, t *prices.Table, sp *scenario.Campaign) (*CampaignReport, error) {
	cr := &CampaignReport{Spec: *sp, Shifts: shiftsOf(sp), Infeasible: map[string]string{}, Capital: map[string][]CapitalItem{}}
	// The site's table (prices with the equipment's charges) prices every
	// ledger, as the plan's own runs do.
	t, err := p.SitePrices(t)
	if err != nil {
		return nil, err
	}
	var notes []string
	for j, name := range p.MethodNames() {
		u, err := chosen(p, j, sp.BatchKg, t)
		if err != nil {
			return nil, err
		}
		if !u.Feasible || u.ProductOutKg <= 0 {
			cr.Infeasible[name] = u.Reason
			continue
		}
		n := sp.Batches
		if n == 0 {
			if n, err = campaign.BatchesFor(sp.ProductKg, u.ProductOutKg); err != nil {
				cr.Infeasible[name] = err.Error()
				continue
			}
		}
		c, items, missing, err := campaignCost(p, u, t, n, cr.Shifts)
		if err != nil {
			return nil, err
		}
		cr.Costs = append(cr.Costs, c)
		if len(items) > 0 {
			cr.Capital[name] = items
		}
		if missing != "" {
			notes = append(notes, missing)
		}
	}
	cr.decide(t.Currency)
	cr.paybacks()
	cr.Explanation = append(cr.Explanation, notes...)
	lo, hi := sp.BatchKg/10, sp.BatchKg*10
	if ms := p.Scenario.MassesKg; len(ms) > 0 {
		lo, hi = math.Min(lo, ms[0]), math.Max(hi, ms[len(ms)-1])
	}
	masses, err := LogSpace(lo, hi, MapPoints)
	if err != nil {
		return nil, err
	}
	if cr.Map, err = campaignMap(p, t, masses, MapBatches, cr.Shifts); err != nil {
		return nil, err
	}
	return cr, nil
}

// decide names the cheapest method per gram over the campaign.
func (cr *CampaignReport) decide(cur string) {
	order := append([]campaign.Cost(nil), cr.Costs...)
	sort.SliceStable(order, func(a, b int) bool { return order[a].PerGram < order[b].PerGram })
	what := plural(cr.Spec.Batches, "batch", "batches") + " of " + units.FormatMass(cr.Spec.BatchKg)
	if cr.Spec.ProductKg > 0 {
		what = fmt.Sprintf("%s of purified product from batches of %s", units.FormatMass(cr.Spec.ProductKg), units.FormatMass(cr.Spec.BatchKg))
	}
	if len(order) == 0 {
		cr.Explanation = append(cr.Explanation, "For the campaign ("+what+") no method is feasible.")
		return
	}
	w := order[0]
	cr.Winner = w.Method
	line := fmt.Sprintf("For the campaign (%s), %s costs %s %s in %s (%.2f %s per gram, one-time costs %s and capital %s charged once; at least %.1f working days, %.1f person-days)",
		what, w.Method, units.Group(w.Total.StringFixed(w.Ledger.Places)), cur, plural(w.Batches, "batch", "batches"), w.PerGram, cur, units.Group(w.OneTime.StringFixed(w.Ledger.Places)), units.Group(w.Capital.StringFixed(w.Ledger.Places)), w.WorkingDays, w.PersonDays)
	if len(order) > 1 {
		r := order[1]
		cr.RunnerUp = r.Method
		cr.Margin = (r.PerGram - w.PerGram) / r.PerGram
		cr.Tie = cr.Margin < TieMargin
		line += fmt.Sprintf(" against %s %s by %s (%.2f %s per gram, %d batches)", units.Group(r.Total.StringFixed(r.Ledger.Places)), cur, r.Method, r.PerGram, cur, r.Batches)
		if cr.Tie {
			line += fmt.Sprintf(": within %.0f %%, a tie; choose on other grounds", TieMargin*100)
		}
	}
	cr.Explanation = append(cr.Explanation, line+".")
}

// paybacks compares each method with start-up costs against staying with
// chromatography, at the campaign's batch mass and bands.
func (cr *CampaignReport) paybacks() {
	stay, ok := cr.Cost(chrom.Method)
	if !ok {
		return
	}
	for _, c := range cr.Costs {
		if c.Method == stay.Method || !c.OneTime.Add(c.Capital).IsPositive() {
			continue
		}
		n, ok := campaign.Payback(c, stay)
		pb := Payback{Method: c.Method, Against: stay.Method, Batches: n, Never: !ok}
		cr.Paybacks = append(cr.Paybacks, pb)
		if ok {
			cr.Explanation = append(cr.Explanation, fmt.Sprintf("Developing %s pays for itself from %s of %s on: from then on it is at most as dear per gram as staying with %s.", c.Method, plural(n, "batch", "batches"), units.FormatMass(c.BatchKg), stay.Method))
		} else {
			cr.Explanation = append(cr.Explanation, fmt.Sprintf("Developing %s never pays for itself at %s per batch: each batch costs more per gram than staying with %s.", c.Method, units.FormatMass(c.BatchKg), stay.Method))
		}
	}
}

// campaignMap runs each method once at each mass and prices it as
// campaigns of each number of batches; the winner is the cheapest per gram
// over the campaign.
func campaignMap(p *costing.Plan, t *prices.Table, masses []float64, batches []int, sh campaign.Shifts) (*CampaignMap, error) {
	m := &CampaignMap{MassesKg: masses, Batches: batches, Payback: map[string][]int{}}
	for i, mass := range masses {
		us := make([]usage.Usage, 0, len(p.Methods))
		for j := range p.Methods {
			u, err := chosen(p, j, mass, t)
			if err != nil {
				return nil, err
			}
			if u.Feasible && u.ProductOutKg > 0 {
				us = append(us, u)
			}
		}
		ws := make([]string, len(batches))
		pgs := make([]float64, len(batches))
		for k, n := range batches {
			pgs[k] = math.NaN()
			for _, u := range us {
				c, _, _, err := campaignCost(p, u, t, n, sh)
				if err != nil {
					return nil, err
				}
				if ws[k] == "" || c.PerGram < pgs[k] {
					ws[k], pgs[k] = u.Method, c.PerGram
				}
			}
		}
		m.Winner = append(m.Winner, ws)
		m.PerGram = append(m.PerGram, pgs)
		if err := m.paybackAt(p, i, us, t, sh); err != nil {
			return nil, err
		}
	}
	return m, nil
}

// paybackAt fills the payback of each method with start-up costs against
// chromatography at mass i from the methods' usages there.
func (m *CampaignMap) paybackAt(p *costing.Plan, i int, us []usage.Usage, t *prices.Table, sh campaign.Shifts) error {
	costs := make([]campaign.Cost, len(us))
	var stay *campaign.Cost
	for k, u := range us {
		c, _, _, err := campaignCost(p, u, t, 1, sh)
		if err != nil {
			return err
		}
		costs[k] = c
		if u.Method == chrom.Method {
			stay = &costs[k]
		}
	}
	for _, c := range costs {
		if c.Method == chrom.Method || !c.OneTime.Add(c.Capital).IsPositive() {
			continue
		}
		if m.Payback[c.Method] == nil {
			m.Payback[c.Method] = make([]int, len(m.MassesKg))
		}
		if stay != nil {
			if n, ok := campaign.Payback(c, *stay); ok {
				m.Payback[c.Method][i] = n
			}
		}
	}
	return nil
}

// onCampaign makes the decision on the campaign when its batches are of
// the target mass: the winner is the method cheapest per gram over the
// whole campaign, one-time costs and capital charged once, rather than
// over one batch bearing them all. The break-even prices and
// the Monte Carlo shares stay those of one batch at the target mass, and
// the explanation says so when the campaign changes the answer.
func (d *Decision) onCampaign(cr *CampaignReport) {
	lines := append([]string(nil), cr.Explanation...)
	if cr.Winner == "" {
		d.Explanation = append(lines, d.Explanation...)
		return
	}
	if math.Abs(cr.Spec.BatchKg/d.TargetKg-1) > 1e-9 {
		// Another batch mass: the campaign informs, the decision stays at
		// the target mass.
		lines = append(lines, fmt.Sprintf("The campaign's batches (%s) are not the target mass (%s): the decision below is for one batch at the target mass.",
			units.FormatMass(cr.Spec.BatchKg), units.FormatMass(d.TargetKg)))
		d.Explanation = append(lines, d.Explanation...)
		return
	}
	changed := cr.Winner != d.Winner
	w, _ := cr.Cost(cr.Winner)
	d.Winner, d.WinnerPerG, d.OnCampaign = cr.Winner, w.PerGram, true
	// A tie found by the Monte Carlo draws stands when the winner is the same.
	d.RunnerUp, d.RunnerPerG, d.Margin, d.Tie = "", 0, 0, cr.Tie || (d.Tie && !changed)
	if r, ok := cr.Cost(cr.RunnerUp); ok {
		d.RunnerUp, d.RunnerPerG, d.Margin = r.Method, r.PerGram, cr.Margin
	}
	if changed {
		d.Confidence = 0
		lines = append(lines, "The campaign changes the answer for one batch bearing all one-time costs; the lines below are for one batch.")
	}
	d.Explanation = append(lines, d.Explanation...)
}

// plural writes "1 batch", "4 batches".
func plural(n int, one, many string) string {
	if n == 1 {
		return "1 " + one
	}
	return fmt.Sprintf("%d %s", n, many)
}

// chosen is the usage of method j at a mass as the plan runs it: for a
// method with several candidate plans (equipment, loading), the one the
// plan chooses as cheapest per gram for one batch.
func chosen(p *costing.Plan, j int, kg float64, t *prices.Table) (usage.Usage, error) {
	r, err := p.RunOne(j, kg, t)
	return r.Usage, err
}

// campaignCost prices one method's batch as a campaign of n batches: the
// equipment to buy that it uses is capital, charged once, and its wear is
// dropped from the running cost (capitalPrices).
func campaignCost(p *costing.Plan, u usage.Usage, t *prices.Table, n int, sh campaign.Shifts) (campaign.Cost, []CapitalItem, string, error) {
	items, missing := capitalOf(p.Equipment, u)
	c, err := campaign.Run(u, capitalPrices(p.Equipment, t, items), n, capitalSum(items), sh)
	return c, items, missing, err
}
