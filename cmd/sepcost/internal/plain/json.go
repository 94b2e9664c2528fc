package plain

import (
	"encoding/json"
	"io"
	"math"

	"sepcost/costing/usage"
	"sepcost/scale"
)

// The JSON shape: money as strings with the currency's fixed places, so
// that scripts read exact amounts; physical figures as numbers in their
// display units.
type jsonReport struct {
	Title      string           `json:"title"`
	Scenario   string           `json:"scenario"`
	Prices     string           `json:"prices"`
	Currency   string           `json:"currency"`
	Batches    []jsonBatch      `json:"batches"`
	Decision   *jsonDecision    `json:"decision,omitempty"`
	Crossovers []jsonCrossover  `json:"crossovers,omitempty"`
	Pairwise   []jsonCrossover  `json:"pairwise_crossings,omitempty"`
	Warnings   []jsonWarning    `json:"warnings"`
	Assumed    []jsonAssumed    `json:"assumptions"`
	Campaign   *jsonCampaign    `json:"campaign,omitempty"`
	Budget     *jsonBudget      `json:"budget,omitempty"`
	Cautions   []string         `json:"cautions"`
	Uncertain  *jsonUncertainty `json:"uncertainty,omitempty"`
}

// jsonAssumed is a default the user did not set that moves a method's cost
// per gram at the target mass by more than scale.AssumptionSwing between
// its low and high plausible values (null cost: not feasible there).
type jsonAssumed struct {
	Method    string   `json:"method"`
	Key       string   `json:"setting"`
	Label     string   `json:"label"`
	Unit      string   `json:"unit"`
	Default   float64  `json:"default"`
	Low       float64  `json:"plausible_low"`
	High      float64  `json:"plausible_high"`
	PerGram   *float64 `json:"cost_per_g_default"`
	PerGramLo *float64 `json:"cost_per_g_low"`
	PerGramHi *float64 `json:"cost_per_g_high"`
	Flips     bool     `json:"changes_decision"`
	Mark      string   `json:"mark"`
	Source    string   `json:"source"`
}

// jsonWarning is one warning of the models with the masses it was raised
// at (the text is its wording at the first).
type jsonWarning struct {
	Method   string    `json:"method"`
	Level    string    `json:"level"`
	Text     string    `json:"text"`
	MassesKg []float64 `json:"crude_kg"`
}

type jsonDecision struct {
	TargetKg    float64           `json:"target_kg"`
	TargetFrom  string            `json:"target_from,omitempty"`
	Winner      string            `json:"method"`
	RunnerUp    string            `json:"runner_up,omitempty"`
	WinnerPerG  float64           `json:"cost_per_g"`
	RunnerPerG  float64           `json:"runner_up_cost_per_g,omitempty"`
	Margin      float64           `json:"margin"`
	Tie         bool              `json:"tie"`
	Infeasible  map[string]string `json:"infeasible,omitempty"`
	Explanation []string          `json:"explanation"`
	Flips       []jsonFlip        `json:"break_even_prices,omitempty"`
}

type jsonFlip struct {
	Item      string `json:"item"`
	Unit      string `json:"unit"`
	Price     string `json:"price"`
	BreakEven string `json:"break_even"`
	Rising    bool   `json:"flips_when_rising"`
}

type jsonCrossover struct {
	MassKg       float64 `json:"crude_kg"`
	CheaperBelow string  `json:"cheaper_below"`
	CheaperAbove string  `json:"cheaper_above"`
	Step         bool    `json:"at_equipment_step"`
	Kind         string  `json:"kind"`
	Detail       string  `json:"detail,omitempty"`
	LoKg         float64 `json:"bracket_lo_kg"`
	HiKg         float64 `json:"bracket_hi_kg"`
}

type jsonBatch struct {
	CrudeKg  float64      `json:"crude_kg"`
	Cheapest string       `json:"cheapest,omitempty"` // per gram of purified product, among the feasible methods
	Methods  []jsonMethod `json:"methods"`
}

type jsonMethod struct {
	Method        string         `json:"method"`
	Feasible      bool           `json:"feasible"`
	Reason        string         `json:"reason,omitempty"`
	ProductInKg   float64        `json:"product_in_kg"`
	ProductOutKg  float64        `json:"product_out_kg"`
	HoursElapsed  float64        `json:"hours_elapsed"`
	HoursAttended float64        `json:"hours_hands_on"`
	WasteKg       float64        `json:"waste_kg"`
	Figures       []jsonFigure   `json:"figures"`
	Lines         []jsonLine     `json:"ledger"`
	Total         string         `json:"total"`
	PerGram       *float64       `json:"cost_per_g,omitempty"` // absent when not feasible
	Activities    []jsonActivity `json:"activities"`
	Waste         []jsonStream   `json:"waste"`
	Notes         []usage.Note   `json:"notes"`
}

type jsonFigure struct {
	Key   string  `json:"key"`
	Label string  `json:"label"`
	Value float64 `json:"value"`
	Unit  string  `json:"unit"`
}

type jsonLine struct {
	Group     string `json:"group"`
	Item      string `json:"item"`
	Label     string `json:"label"`
	Qty       string `json:"quantity"`
	Unit      string `json:"unit"`
	UnitPrice string `json:"unit_price"`
	Amount    string `json:"amount"`
}

type jsonActivity struct {
	Name     string  `json:"name"`
	Elapsed  float64 `json:"hours_elapsed"`
	Attended float64 `json:"hours_hands_on"`
}

type jsonStream struct {
	Name       string             `json:"name"`
	Class      string             `json:"class"`
	Kg         float64            `json:"kg"`
	Litres     float64            `json:"litres"`
	Components map[string]float64 `json:"components_kg"`
}

// JSON writes the report as indented JSON.
func JSON(w io.Writer, r *scale.Report) error {
	out := jsonReport{Title: r.Title, Scenario: r.ScenarioFile, Prices: r.PricesFile, Currency: r.Prices.Currency, Cautions: r.Cautions}
	for i, m := range r.MassesKg {
		b := jsonBatch{CrudeKg: m}
		if k := r.CheapestAt(i); k >= 0 {
			b.Cheapest = r.Methods[k]
		}
		for j, name := range r.Methods {
			res := r.Results[i][j]
			u := res.Usage
			el, at := u.Hours()
			jm := jsonMethod{Method: name, Feasible: u.Feasible, Reason: u.Reason, ProductInKg: u.ProductInKg, ProductOutKg: u.ProductOutKg,
				HoursElapsed: el, HoursAttended: at, WasteKg: u.WasteKg(), Total: res.Ledger.Total.StringFixed(res.Ledger.Places), Notes: u.Notes}
			if pg := res.PerGram(); !math.IsNaN(pg) {
				jm.PerGram = &pg
			}
			for _, f := range u.Figures {
				if v := f.Display(); !math.IsNaN(v) && !math.IsInf(v, 0) {
					jm.Figures = append(jm.Figures, jsonFigure{f.Key, f.Label, v, f.Unit})
				}
			}
			for _, l := range res.Ledger.Lines {
				jm.Lines = append(jm.Lines, jsonLine{string(l.Demand.Group), l.Demand.Item, l.Demand.Label, l.Qty.String(), l.Unit, l.UnitPrice.String(), l.Amount.StringFixed(res.Ledger.Places)})
			}
			for _, a := range u.Activities {
				jm.Activities = append(jm.Activities, jsonActivity{a.Name, a.Elapsed / 3600, a.Attended / 3600})
			}
			for _, s := range u.Waste {
				js := jsonStream{Name: s.Name, Class: string(s.Class), Kg: s.Kg(), Litres: s.VolumeM3 * 1000, Components: map[string]float64{}}
				for _, c := range s.Components {
					js.Components[c.Name] += c.Kg
				}
				jm.Waste = append(jm.Waste, js)
			}
			b.Methods = append(b.Methods, jm)
		}
		out.Batches = append(out.Batches, b)
	}
	if d := r.Decision; d != nil {
		jd := &jsonDecision{TargetKg: d.TargetKg, TargetFrom: r.TargetWhy, Winner: d.Winner, RunnerUp: d.RunnerUp, Margin: d.Margin, Tie: d.Tie, Infeasible: d.Infeasible, Explanation: d.Explanation}
		if !math.IsNaN(d.WinnerPerG) {
			jd.WinnerPerG = d.WinnerPerG
		}
		if d.RunnerUp != "" {
			jd.RunnerPerG = d.RunnerPerG
		}
		for _, f := range d.Flips {
			jd.Flips = append(jd.Flips, jsonFlip{f.Item, f.Unit, f.Price.String(), f.BreakEven.String(), f.Rising})
		}
		out.Decision = jd
	}
	for _, c := range r.Crossovers {
		out.Crossovers = append(out.Crossovers, jsonCrossover{c.MassKg, c.CheaperBelow, c.CheaperAbove, c.Step, c.Kind, c.Detail, c.LoKg, c.HiKg})
	}
	for _, c := range r.Pairwise {
		out.Pairwise = append(out.Pairwise, jsonCrossover{c.MassKg, c.CheaperBelow, c.CheaperAbove, c.Step, c.Kind, c.Detail, c.LoKg, c.HiKg})
	}
	out.Assumed = []jsonAssumed{}
	for _, a := range r.Assumptions {
		out.Assumed = append(out.Assumed, jsonAssumed{a.Method, a.Key, a.Label, a.Unit, a.Default, a.Low, a.High,
			finiteOrNil(a.PerGram), finiteOrNil(a.PerGramLo), finiteOrNil(a.PerGramHi), a.Flips, string(a.Mark), a.Source})
	}
	out.Warnings = []jsonWarning{}
	for _, w := range r.Warnings {
		out.Warnings = append(out.Warnings, jsonWarning{w.Method, string(w.Level), w.Text, w.MassesKg})
	}
	out.Campaign, out.Budget = campaignJSON(r)
	out.Uncertain = uncertaintyJSON(r.Uncertainty)
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(out)
}

// finiteOrNil is nil for NaN and infinities (JSON has no NaN).
func finiteOrNil(v float64) *float64 {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return nil
	}
	return &v
}
