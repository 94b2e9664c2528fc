package plain

import (
	"bufio"
	"bytes"
	"encoding/json"
	"errors"
	"io"
	"math"
	"sort"

	"sepcost/costing"
	"sepcost/costing/ledger"
	"sepcost/costing/usage"
	"sepcost/scale"
)

// JSONVersion is the version of the JSON contract below; it rises when a
// key is renamed or removed or its meaning changes (adding a key does not
// raise it).
const JSONVersion = 2

// The JSON contract, for scripts:
//
//   - keys are snake_case throughout;
//   - money is a string with the currency's fixed places ("1813.00"), so
//     that scripts read exact amounts; unit prices are strings as written;
//   - physical figures are numbers in the unit their key or "unit" names;
//   - cost per gram of purified product (currency per g) is a number, or
//     null where the method has no cost;
//   - every method at every mass, and in the decision and the uncertainty,
//     carries a status: "feasible", "not_feasible" or "not_assessed" (the
//     scenario does not describe the method), with the reason in "reason"
//     for the last two;
//   - P10, P50 and P90 of the cost per gram across the uncertainty draws
//     are numbers (null when the method was never feasible in a draw).
type jsonReport struct {
	Version     int              `json:"version"`
	Title       string           `json:"title"`
	Scenario    string           `json:"scenario_file"`
	Prices      string           `json:"prices_file"`
	Currency    string           `json:"currency"`
	TargetKg    float64          `json:"target_kg"`
	Decision    *jsonDecision    `json:"decision,omitempty"`
	Uncertainty *jsonUncertainty `json:"uncertainty,omitempty"`
	Batches     []jsonBatch      `json:"batches"`
	Crossovers  []jsonCrossover  `json:"crossovers"`
	Pairwise    []jsonCrossover  `json:"pairwise_crossings"`
	Warnings    []jsonWarning    `json:"warnings"`
	Assumed     []jsonAssumed    `json:"assumptions"`
	Notes       []jsonNote       `json:"notes"`
	Campaign    *jsonCampaign    `json:"campaign,omitempty"`
	Budget      *jsonBudget      `json:"budget,omitempty"`
	Cautions    []string         `json:"cautions"`
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
	TargetKg    float64        `json:"target_kg"`
	TargetFrom  string         `json:"target_from"`
	Winner      string         `json:"method"`
	WinnerPerG  *float64       `json:"cost_per_g"`
	RunnerUp    string         `json:"runner_up"`
	RunnerPerG  *float64       `json:"runner_up_cost_per_g"`
	Margin      *float64       `json:"margin"`
	Tie         bool           `json:"tie"`
	Confidence  *float64       `json:"confidence"`
	Excluded    []jsonExcluded `json:"excluded"`
	Explanation []string       `json:"explanation"`
	Drivers     []jsonDriver   `json:"cost_drivers"`
	Flips       []jsonFlip     `json:"break_even_prices"`
}

type jsonExcluded struct {
	Method string         `json:"method"`
	Status costing.Status `json:"status"`
	Reason string         `json:"reason"`
}

type jsonDriver struct {
	Method string  `json:"method"`
	Item   string  `json:"item"`
	Amount string  `json:"amount"`
	Share  float64 `json:"share"`
}

type jsonFlip struct {
	Item      string `json:"item"`
	Unit      string `json:"unit"`
	Price     string `json:"price"`
	BreakEven string `json:"break_even"`
	Rising    bool   `json:"flips_when_rising"`
}

type jsonUncertainty struct {
	TargetKg float64    `json:"target_kg"`
	Draws    int        `json:"draws"`
	Seed     uint64     `json:"seed"`
	Methods  []jsonBand `json:"methods"`
	jsonUncertaintyDetail
}

type jsonBand struct {
	Method   string         `json:"method"`
	Status   costing.Status `json:"status"`
	P10      *float64       `json:"p10_cost_per_g"`
	P50      *float64       `json:"p50_cost_per_g"`
	P90      *float64       `json:"p90_cost_per_g"`
	Feasible float64        `json:"feasible_share"`
	Cheapest float64        `json:"cheapest_share"`
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
	Cheapest string       `json:"cheapest"` // per gram of purified product, among the feasible methods; "" when none
	Methods  []jsonMethod `json:"methods"`
}

type jsonMethod struct {
	Method        string         `json:"method"`
	Status        costing.Status `json:"status"`
	Reason        string         `json:"reason,omitempty"`
	CostPerG      *float64       `json:"cost_per_g"`
	Total         string         `json:"total"`
	ProductInKg   float64        `json:"product_in_kg"`
	ProductOutKg  float64        `json:"product_out_kg"`
	HoursElapsed  float64        `json:"hours_elapsed"`
	HoursAttended float64        `json:"hours_hands_on"`
	WasteKg       float64        `json:"waste_kg"`
	Figures       []jsonFigure   `json:"figures"`
	Lines         []jsonLine     `json:"ledger"`
	Activities    []jsonActivity `json:"activities"`
	Waste         []jsonStream   `json:"waste"`
	Notes         []jsonNote     `json:"notes"`
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

type jsonNote struct {
	Level string `json:"level"`
	Text  string `json:"text"`
}

// number is v, or nil (JSON null) when it is not a finite number.
func number(v float64) *float64 {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return nil
	}
	return &v
}

// notes turns usage notes into their JSON form; never nil, so that the
// key holds [] rather than null.
func notes(ns []usage.Note) []jsonNote {
	out := make([]jsonNote, 0, len(ns))
	for _, n := range ns {
		out = append(out, jsonNote{string(n.Level), n.Text})
	}
	return out
}

// JSON writes the report as indented JSON (the contract above).
func JSON(w io.Writer, r *scale.Report) error {
	out := jsonReport{Version: JSONVersion, Title: r.Title, Scenario: r.ScenarioFile, Prices: r.PricesFile, Currency: r.Prices.Currency,
		TargetKg: r.TargetKg, Cautions: r.Cautions, Notes: notes(r.Notes), Crossovers: []jsonCrossover{}, Pairwise: []jsonCrossover{},
		Warnings: []jsonWarning{}, Assumed: []jsonAssumed{}}
	if out.Cautions == nil {
		out.Cautions = []string{}
	}
	out.Decision = decisionJSON(r.Decision)
	if out.Decision != nil {
		out.Decision.TargetFrom = r.TargetWhy
	}
	out.Uncertainty = uncertaintyJSON(r)
	for _, c := range r.Crossovers {
		out.Crossovers = append(out.Crossovers, jsonCrossover{c.MassKg, c.CheaperBelow, c.CheaperAbove, c.Step, c.Kind, c.Detail, c.LoKg, c.HiKg})
	}
	for _, c := range r.Pairwise {
		out.Pairwise = append(out.Pairwise, jsonCrossover{c.MassKg, c.CheaperBelow, c.CheaperAbove, c.Step, c.Kind, c.Detail, c.LoKg, c.HiKg})
	}
	for _, a := range r.Assumptions {
		out.Assumed = append(out.Assumed, jsonAssumed{a.Method, a.Key, a.Label, a.Unit, a.Default, a.Low, a.High,
			number(a.PerGram), number(a.PerGramLo), number(a.PerGramHi), a.Flips, string(a.Mark), a.Source})
	}
	for _, w := range r.Warnings {
		out.Warnings = append(out.Warnings, jsonWarning{w.Method, string(w.Level), w.Text, w.MassesKg})
	}
	out.Campaign, out.Budget = campaignJSON(r)
	walk := r.Walk()
	return streamJSON(w, out, len(r.MassesKg), func(i int) (jsonBatch, error) { return batchJSON(r, walk, i) })
}

// batchJSON is the report's batch i, its results read by walk (in
// ascending order, so that those a long sweep does not hold are
// recomputed once each).
func batchJSON(r *scale.Report, walk *scale.Walker, i int) (jsonBatch, error) {
	b := jsonBatch{CrudeKg: r.MassesKg[i]}
	if k := r.CheapestAt(i); k >= 0 {
		b.Cheapest = r.Methods[k]
	}
	results, err := walk.At(i)
	if err != nil {
		return b, err
	}
	for j, name := range r.Methods {
		b.Methods = append(b.Methods, jsonResult(name, results[j]))
	}
	return b, nil
}

// batchesKey is where the batches go in the indented report: a line of
// its own at the top level (a newline inside a JSON string is escaped, so
// this text can only be the top-level key).
const batchesKey = "\n  \"batches\": [],\n"

// streamJSON writes out as json.Encoder with a two-space indent would,
// byte for byte, with its n batches made one at a time by batch and
// written as they are made, so that a sweep of thousands of masses is never
// held whole as JSON.
func streamJSON(w io.Writer, out jsonReport, n int, batch func(int) (jsonBatch, error)) error {
	out.Batches = []jsonBatch{}
	frame, err := json.MarshalIndent(out, "", "  ")
	if err != nil {
		return err
	}
	at := bytes.Index(frame, []byte(batchesKey))
	if at < 0 {
		return errors.New("json: the report has no batches key")
	}
	bw := bufio.NewWriterSize(w, 64<<10)
	bw.Write(frame[:at])
	if n == 0 {
		bw.WriteString("\n  \"batches\": null,\n") // a nil slice, as the report without masses encodes
	} else {
		bw.WriteString("\n  \"batches\": [")
		for i := range n {
			b, err := batch(i)
			if err != nil {
				return err
			}
			data, err := json.MarshalIndent(b, "    ", "  ")
			if err != nil {
				return err
			}
			if i > 0 {
				bw.WriteByte(',')
			}
			bw.WriteString("\n    ")
			bw.Write(data)
		}
		bw.WriteString("\n  ],\n")
	}
	bw.Write(frame[at+len(batchesKey):])
	bw.WriteByte('\n')
	return bw.Flush()
}

// jsonResult is one method at one mass.
func jsonResult(name string, res costing.Result) jsonMethod {
	u := res.Usage
	el, at := u.Hours()
	jm := jsonMethod{Method: name, Status: res.Status(), CostPerG: number(res.PerGram()),
		Total: res.Ledger.Total.StringFixed(res.Ledger.Places), ProductInKg: u.ProductInKg, ProductOutKg: u.ProductOutKg,
		HoursElapsed: el, HoursAttended: at, WasteKg: u.WasteKg(), Notes: notes(u.Notes),
		Figures: []jsonFigure{}, Lines: []jsonLine{}, Activities: []jsonActivity{}, Waste: []jsonStream{}}
	if !u.Feasible {
		jm.Reason = costing.Detail(u.Reason)
	}
	for _, f := range u.Figures {
		if v := f.Display(); !math.IsNaN(v) && !math.IsInf(v, 0) {
			jm.Figures = append(jm.Figures, jsonFigure{string(f.Key), f.Label, v, f.Unit})
		}
	}
	for _, l := range res.Ledger.Lines {
		jm.Lines = append(jm.Lines, lineJSON(l, res.Ledger.Places))
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
	return jm
}

func lineJSON(l ledger.Line, places int32) jsonLine {
	return jsonLine{string(l.Demand.Group), l.Demand.Item, l.Demand.Label, l.Qty.String(), l.Unit, l.UnitPrice.String(), l.Amount.StringFixed(places)}
}

// decisionJSON is the decision at the target mass, nil without one.
func decisionJSON(d *scale.Decision) *jsonDecision {
	if d == nil {
		return nil
	}
	jd := &jsonDecision{TargetKg: d.TargetKg, Winner: d.Winner, RunnerUp: d.RunnerUp, Tie: d.Tie, Explanation: d.Explanation,
		Excluded: []jsonExcluded{}, Drivers: []jsonDriver{}, Flips: []jsonFlip{}}
	if d.Winner != "" {
		jd.WinnerPerG = number(d.WinnerPerG)
	}
	if d.RunnerUp != "" {
		jd.RunnerPerG = number(d.RunnerPerG)
		jd.Margin = number(d.Margin)
	}
	if d.Confidence > 0 {
		jd.Confidence = number(d.Confidence)
	}
	if jd.Explanation == nil {
		jd.Explanation = []string{}
	}
	for _, meth := range sortedReasons(d.Infeasible) {
		reason := d.Infeasible[meth]
		jd.Excluded = append(jd.Excluded, jsonExcluded{meth, costing.StatusOf(false, reason), costing.Detail(reason)})
	}
	for _, dr := range d.Drivers {
		jd.Drivers = append(jd.Drivers, jsonDriver{dr.Method, dr.Item, dr.Amount.String(), dr.Share})
	}
	for _, f := range d.Flips {
		jd.Flips = append(jd.Flips, jsonFlip{f.Item, f.Unit, f.Price.String(), f.BreakEven.String(), f.Rising})
	}
	return jd
}

// uncertaintyJSON is the bands at the target mass, nil when not sampled.
// A method the decision records as not assessed has that status; one
// never feasible in a draw is not feasible.
func uncertaintyJSON(r *scale.Report) *jsonUncertainty {
	u := r.Uncertainty
	if u == nil {
		return nil
	}
	ju := &jsonUncertainty{TargetKg: u.TargetKg, Draws: u.Draws, Seed: u.Seed, Methods: []jsonBand{}}
	for _, b := range u.Bands {
		jb := jsonBand{Method: b.Method, Status: costing.StatusFeasible, Feasible: b.Feasible, Cheapest: b.Cheapest}
		if b.Feasible > 0 {
			jb.P10, jb.P50, jb.P90 = number(b.P10), number(b.P50), number(b.P90)
		} else {
			reason := ""
			if r.Decision != nil {
				reason = r.Decision.Infeasible[b.Method]
			}
			jb.Status = costing.StatusOf(false, reason)
		}
		ju.Methods = append(ju.Methods, jb)
	}
	ju.jsonUncertaintyDetail = uncertaintyDetail(r)
	return ju
}

// sortedReasons lists a map's keys in order, so that the output does not
// change between runs.
func sortedReasons(m map[string]string) []string {
	out := make([]string, 0, len(m))
	for k := range m {
		out = append(out, k)
	}
	sort.Strings(out)
	return out
}
