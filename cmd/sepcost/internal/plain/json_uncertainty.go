package plain

import (
	"strconv"

	"sepcost/costing/prices"
	"sepcost/scale"
)

// jsonUncertainty is the Monte Carlo result: bands at the target mass and
// across the masses, crossover intervals, what each input is worth knowing
// (money as a fixed-decimal string, like the ledger) and every input drawn.
// Quantiles that are not numbers (a method feasible in no draw) are null.
type jsonUncertainty struct {
	Draws       int             `json:"draws"`
	Seed        uint64          `json:"seed"`
	TargetKg    float64         `json:"target_kg"`
	ProductG    float64         `json:"product_g"` // product in one crude batch at the target: the value of information is for it
	EVPI        string          `json:"value_of_perfect_information"`
	Worth       []jsonWorth     `json:"worth_knowing"`
	AtTarget    []jsonBand      `json:"at_target"`
	Across      []jsonMassBand  `json:"across_masses"`
	Crossings   []jsonCrossBand `json:"crossover_intervals"`
	Sensitivity []jsonSensitive `json:"rank_correlations"`
	Inputs      []jsonInput     `json:"inputs"`
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

type jsonWorth struct {
	Field  string `json:"input"`
	Value  string `json:"value"`
	Advice string `json:"advice"`
}

type jsonBand struct {
	Method   string   `json:"method"`
	P10      *float64 `json:"p10_cost_per_g"`
	P50      *float64 `json:"p50_cost_per_g"`
	P90      *float64 `json:"p90_cost_per_g"`
	Feasible float64  `json:"feasible_share"`
	Cheapest float64  `json:"cheapest_share"`
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

// uncertaintyJSON converts the Monte Carlo result; nil when none was drawn.
func uncertaintyJSON(u *scale.Uncertainty) *jsonUncertainty {
	if u == nil {
		return nil
	}
	places := int(prices.MinorUnits(u.Currency))
	money := func(v float64) string { return strconv.FormatFloat(v, 'f', places, 64) }
	bands := func(bs []scale.Band) []jsonBand {
		out := make([]jsonBand, 0, len(bs))
		for _, b := range bs {
			out = append(out, jsonBand{b.Method, finiteOrNil(b.P10), finiteOrNil(b.P50), finiteOrNil(b.P90), b.Feasible, b.Cheapest})
		}
		return out
	}
	j := &jsonUncertainty{Draws: u.Draws, Seed: u.Seed, TargetKg: u.TargetKg, ProductG: u.ProductG, EVPI: money(u.EVPI),
		Worth: []jsonWorth{}, AtTarget: bands(u.Bands), Across: []jsonMassBand{}, Crossings: []jsonCrossBand{}, Inputs: []jsonInput{}}
	for _, in := range u.Inputs {
		j.Inputs = append(j.Inputs, jsonInput{in.Name, in.Field, string(in.Kind), in.Unit, in.Nominal, in.Lo, in.Hi, in.Dist, in.Basis, in.Keys})
	}
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
		js := jsonSensitive{Field: u.Inputs[s.Input].Field, ByMethod: map[string]*float64{}, Decision: finiteOrNil(s.Decision)}
		for k, rho := range s.Rho {
			js.ByMethod[u.Bands[k].Method] = finiteOrNil(rho)
		}
		j.Sensitivity = append(j.Sensitivity, js)
	}
	return j
}
