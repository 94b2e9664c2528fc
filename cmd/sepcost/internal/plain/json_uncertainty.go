package plain

import (
	"strconv"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/scale"
)

// jsonUncertaintyDetail is what the Monte Carlo draws say beyond the bands
// at the target mass: what each input is worth knowing (money as a
// fixed-decimal string, like the ledger), the bands across the masses,
// the crossover masses as intervals, the rank correlations and every input
// drawn. Absent when the draws had no inputs (a report built by hand).
type jsonUncertaintyDetail struct {
	ProductG    float64         `json:"product_g,omitempty"` // product in one crude batch at the target: the value of information is for it
	EVPI        string          `json:"value_of_perfect_information,omitempty"`
	Worth       []jsonWorth     `json:"worth_knowing,omitempty"`
	Across      []jsonMassBand  `json:"across_masses,omitempty"`
	Crossings   []jsonCrossBand `json:"crossover_intervals,omitempty"`
	Sensitivity []jsonSensitive `json:"rank_correlations,omitempty"`
	Inputs      []jsonInput     `json:"inputs,omitempty"`
}

type jsonWorth struct {
	Field  string `json:"input"`
	Value  string `json:"value"`
	Advice string `json:"advice"`
}

type jsonMassBand struct {
	CrudeKg float64    `json:"crude_kg"`
	Bands   []jsonBand `json:"methods"`
}

type jsonCrossBand struct {
	CheaperBelow string  `json:"cheaper_below"`
	CheaperAbove string  `json:"cheaper_above"`
	P10Kg        float64 `json:"p10_crude_kg"`
	P50Kg        float64 `json:"p50_crude_kg"`
	P90Kg        float64 `json:"p90_crude_kg"`
	Share        float64 `json:"share_of_draws"`
}

type jsonSensitive struct {
	Field    string              `json:"input"`
	ByMethod map[string]*float64 `json:"by_method"`
	Decision *float64            `json:"decision,omitempty"` // with the difference of the two methods cheapest at the nominal values
}

// jsonInput is one input drawn: its limits (rectangular) or its P10 and
// P90 (log-normal) in its display unit, and where its spread comes from.
type jsonInput struct {
	Name    string   `json:"name"`
	Field   string   `json:"input"`
	Kind    string   `json:"kind"`
	Unit    string   `json:"unit"`
	Nominal float64  `json:"as_used"`
	Lo      float64  `json:"low"`
	Hi      float64  `json:"high"`
	Dist    string   `json:"distribution"`
	Basis   string   `json:"basis"`
	Keys    []string `json:"settings,omitempty"`
}

// uncertaintyDetail converts the rest of the Monte Carlo result.
func uncertaintyDetail(r *scale.Report) jsonUncertaintyDetail {
	u := r.Uncertainty
	var j jsonUncertaintyDetail
	if u == nil || len(u.Inputs) == 0 {
		return j
	}
	places := int(prices.MinorUnits(u.Currency))
	money := func(v float64) string { return strconv.FormatFloat(v, 'f', places, 64) }
	bands := func(bs []scale.Band) []jsonBand {
		out := make([]jsonBand, 0, len(bs))
		for _, b := range bs {
			out = append(out, jsonBand{Method: b.Method, Status: statusOf(r, b), P10: number(b.P10), P50: number(b.P50), P90: number(b.P90),
				Feasible: b.Feasible, Cheapest: b.Cheapest})
		}
		return out
	}
	j = jsonUncertaintyDetail{ProductG: u.ProductG, EVPI: money(u.EVPI)}
	for _, w := range u.Worth {
		j.Worth = append(j.Worth, jsonWorth{u.Inputs[w.Input].Field, money(w.Value), u.Advice(w)})
	}
	for _, mb := range u.Across {
		j.Across = append(j.Across, jsonMassBand{mb.Kg, bands(mb.Bands)})
	}
	for _, c := range u.Crossings {
		j.Crossings = append(j.Crossings, jsonCrossBand{c.A, c.B, c.P10, c.P50, c.P90, c.Share})
	}
	for _, s := range u.Sensitivity {
		js := jsonSensitive{Field: u.Inputs[s.Input].Field, ByMethod: map[string]*float64{}, Decision: number(s.Decision)}
		for k, rho := range s.Rho {
			js.ByMethod[u.Bands[k].Method] = number(rho)
		}
		j.Sensitivity = append(j.Sensitivity, js)
	}
	for _, in := range u.Inputs {
		j.Inputs = append(j.Inputs, jsonInput{in.Name, in.Field, string(in.Kind), in.Unit, in.Nominal, in.Lo, in.Hi, in.Dist, in.Basis, in.Keys})
	}
	return j
}

// statusOf is a band's status as uncertaintyJSON gives it: feasible in some
// draw, else the decision's reason (not assessed, not feasible).
func statusOf(r *scale.Report, b scale.Band) costing.Status {
	if b.Feasible > 0 {
		return costing.StatusFeasible
	}
	reason := ""
	if r.Decision != nil {
		reason = r.Decision.Infeasible[b.Method]
	}
	return costing.StatusOf(false, reason)
}
