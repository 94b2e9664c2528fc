package scale

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// TieMargin is the relative difference in cost per gram below which two
// methods are called a tie: the models' inputs (Rf values, solubilities,
// prices) are rarely known better than about ±15 % (common practice, no
// source).
const TieMargin = 0.15

// Driver is one of a method's largest cost items at the target mass.
type Driver struct {
	Method string
	Item   string
	Amount decimal.Decimal // total over the item's ledger lines
	Share  float64         // of the method's total
}

// Flip is the price of one item at which the decision would change.
type Flip struct {
	Item      string
	Unit      string
	Price     decimal.Decimal // current unit price
	BreakEven decimal.Decimal // unit price at which winner and runner-up cost the same per gram
	Rising    bool            // the decision flips when the price rises above BreakEven
}

// Decision is the recommendation at the target mass.
type Decision struct {
	TargetKg    float64
	Winner      string // "" when no method is feasible
	RunnerUp    string // "" when only one method is feasible
	WinnerPerG  float64
	RunnerPerG  float64
	Margin      float64 // (runner − winner) / runner
	Tie         bool
	Confidence  float64 // share of Monte Carlo draws in which Winner is cheapest (0 when not sampled)
	Drivers     []Driver
	Flips       []Flip
	Infeasible  map[string]string // method → reason
	Explanation []string          // the decision in words a budget request can quote
	// OnCampaign is true when the scenario's campaign decided: WinnerPerG,
	// RunnerPerG and Margin are then per gram over the whole campaign, not
	// of one batch.
	OnCampaign bool
}

// Decide runs every method at the target mass and names the cheapest
// feasible one per gram of purified product, the margin, the three largest
// cost drivers of each, and the price of each driver at which the answer
// would flip.
func Decide(p *costing.Plan, t *prices.Table, targetKg float64) (*Decision, error) {
	d := &Decision{TargetKg: targetKg, Infeasible: map[string]string{}}
	// The ledgers' price rows point into the site table (prices with the
	// equipment's charges); break-even prices are read from it.
	t, err := p.SitePrices(t)
	if err != nil {
		return nil, err
	}
	type cand struct {
		name string
		res  costing.Result
		perG float64
	}
	names := p.MethodNames()
	all := make([]cand, len(names))
	perG := make([]float64, len(names))
	for j, name := range names {
		r, err := p.RunOne(j, targetKg, t)
		if err != nil {
			return nil, err
		}
		all[j], perG[j] = cand{name, r, r.PerGram()}, r.PerGram()
		if math.IsNaN(perG[j]) {
			d.Infeasible[name] = r.Usage.Reason
			continue
		}
		d.Drivers = append(d.Drivers, topDrivers(name, r, 3)...)
	}
	mass := units.FormatMass(targetKg)
	cur := t.Currency
	// The one definition of cheapest (cheapest.go): per gram of purified product.
	var cands []cand
	for _, j := range rank(perG) {
		cands = append(cands, all[j])
	}
	if len(cands) == 0 {
		d.Explanation = append(d.Explanation, fmt.Sprintf("At %s of crude no method is feasible.", mass))
		return d, nil
	}
	w := cands[0]
	d.Winner, d.WinnerPerG = w.name, w.perG
	if len(cands) == 1 {
		d.Explanation = append(d.Explanation, fmt.Sprintf("At %s of crude, %s is the only feasible method: %.2f %s per gram of purified product (%s %s for the batch).", mass, w.name, w.perG, cur, units.Group(w.res.Ledger.Total.StringFixed(w.res.Ledger.Places)), cur))
		return d, nil
	}
	r := cands[1]
	d.RunnerUp, d.RunnerPerG = r.name, r.perG
	d.Margin = (r.perG - w.perG) / r.perG
	d.Tie = d.Margin < TieMargin
	if d.Tie {
		d.Explanation = append(d.Explanation, fmt.Sprintf("At %s of crude, %s (%.2f %s/g) and %s (%.2f %s/g) are within %.0f %% of each other: a tie within the models' uncertainty; choose on other grounds (development time, equipment, risk).", mass, w.name, w.perG, cur, r.name, r.perG, cur, TieMargin*100))
	} else {
		d.Explanation = append(d.Explanation, fmt.Sprintf("At %s of crude, choose %s: %.2f %s per gram of purified product against %.2f %s/g by %s, %.0f %% cheaper (%s against %s %s for the batch).", mass, w.name, w.perG, cur, r.perG, cur, r.name, d.Margin*100, units.Group(w.res.Ledger.Total.StringFixed(w.res.Ledger.Places)), units.Group(r.res.Ledger.Total.StringFixed(r.res.Ledger.Places)), cur))
	}
	// Break-even prices for the drivers of the two leading methods.
	seen := map[string]bool{}
	for _, dr := range d.Drivers {
		if (dr.Method != w.name && dr.Method != r.name) || seen[dr.Item] {
			continue
		}
		seen[dr.Item] = true
		f, ok := breakEven(dr.Item, t, w.res, r.res)
		if !ok {
			continue
		}
		d.Flips = append(d.Flips, f)
		dir := "rose above"
		if !f.Rising {
			dir = "fell below"
		}
		far := ""
		if !plausible(f) {
			far = fmt.Sprintf(": more than a %g-fold change, beyond what a budget plans for", FlipRange)
		}
		d.Explanation = append(d.Explanation, fmt.Sprintf("The answer would flip to %s only if the price of %s %s %s %s per %s (now %s)%s.", r.name, dr.Item, dir, units.Group(f.BreakEven.StringFixed(2)), cur, f.Unit, units.Group(f.Price.StringFixed(2)), far))
	}
	plausibleFlips := 0
	for _, f := range d.Flips {
		if plausible(f) {
			plausibleFlips++
		}
	}
	if plausibleFlips == 0 && !d.Tie {
		d.Explanation = append(d.Explanation, fmt.Sprintf("No price of the largest cost items within a factor of %g of today's would change the answer.", FlipRange))
	}
	return d, nil
}

// DecisionCoefficients lists the decision's own thresholds for the Sources
// sheet.
func DecisionCoefficients() []source.Coefficient {
	c := func(key, label string, v float64, src string) source.Coefficient {
		return source.Coefficient{Key: key, Method: "decision", Label: label, SI: v, Dim: units.None, Source: src, Mark: source.CommonPractice}
	}
	return []source.Coefficient{
		c("decision.tie_margin", "relative difference in cost per gram below which methods tie", TieMargin, "inputs such as Rf values, solubilities and prices are rarely known better than about ±15 %"),
		c("decision.flip_range", "largest price change (factor) reported as a plausible flip", FlipRange, "a tenfold move is beyond what a budget plans for"),
		c("decision.confident_share", "share of Monte Carlo draws the winner must be cheapest in", ConfidentShare, "four draws in five"),
		c("uncertainty.price_spread", "share either way a price without a spread may move in the Monte Carlo draws", prices.DefaultSpread, "quotes and catalogue prices move by some tenths within a budget year"),
	}
}

// FlipRange bounds the break-even prices worth reporting: a price would have
// to move by less than this factor either way (a tenfold move is already
// beyond what a budget plans for; common practice, no source).
const FlipRange = 10.0

// plausible reports whether a break-even price lies within FlipRange of today's.
func plausible(f Flip) bool {
	p, b := f.Price.InexactFloat64(), f.BreakEven.InexactFloat64()
	if p <= 0 {
		return true
	}
	return b/p <= FlipRange && b/p >= 1/FlipRange
}

// ConfidentShare is the share of Monte Carlo draws in which the winner must
// be cheapest for the decision to stand; below it the methods tie within
// the models' uncertainty (common practice, no source: four draws in five).
const ConfidentShare = 0.8

// weigh adds the Monte Carlo result to the decision: the share of draws in
// which the winner is cheapest, and a tie when that share is below
// ConfidentShare.
func (d *Decision) weigh(u *Uncertainty) {
	if d.Winner == "" || d.RunnerUp == "" {
		return
	}
	for _, b := range u.Bands {
		if b.Method != d.Winner {
			continue
		}
		d.Confidence = b.Cheapest
		lo, hi := units.Sig3Range(b.P10, b.P90)
		line := fmt.Sprintf("In %d draws of the measured values, the models' coefficients and the prices within their stated uncertainty, %s is cheapest in %.0f %% (P10–P90 %s–%s per gram).", u.Draws, d.Winner, b.Cheapest*100, lo, hi)
		if b.Cheapest < ConfidentShare && !d.Tie {
			d.Tie = true
			line += " That is not a clear win: treat the methods as tied and choose on other grounds."
		}
		d.Explanation = append(d.Explanation, line)
	}
}

// minDriverShare is the least share of a method's total an item must
// have to be named a cost driver: one that would print as "0 %" is not
// one (a presentational threshold, no source).
const minDriverShare = 0.005

// topDrivers returns a method's n largest cost items, each at least
// minDriverShare of its total.
func topDrivers(method string, r costing.Result, n int) []Driver {
	byItem := map[string]decimal.Decimal{}
	var order []string
	for _, l := range r.Ledger.Lines {
		if l.Demand.Group == usage.Credit {
			continue
		}
		if _, ok := byItem[l.Demand.Item]; !ok {
			order = append(order, l.Demand.Item)
		}
		byItem[l.Demand.Item] = byItem[l.Demand.Item].Add(l.Amount)
	}
	sort.SliceStable(order, func(a, b int) bool { return byItem[order[a]].GreaterThan(byItem[order[b]]) })
	var out []Driver
	total := r.Ledger.Total.InexactFloat64()
	for _, it := range order {
		if len(out) == n || !byItem[it].IsPositive() {
			break
		}
		share := 0.0
		if total > 0 {
			share = byItem[it].InexactFloat64() / total
		}
		if share < minDriverShare {
			break
		}
		out = append(out, Driver{Method: method, Item: it, Amount: byItem[it], Share: share})
	}
	return out
}

// bandUsed is the price row of the first ledger line of item in w, else r.
func bandUsed(item string, w, r costing.Result) (int, bool) {
	for _, res := range []costing.Result{w, r} {
		for _, l := range res.Ledger.Lines {
			if strings.EqualFold(strings.TrimSpace(l.Demand.Item), strings.TrimSpace(item)) {
				return l.PriceRow, true
			}
		}
	}
	return 0, false
}

// breakEven solves, for one item's unit price p, the equality of cost per
// gram of the winner w and the runner-up r. Ledger totals are linear in p
// (up to the rounding of each line to the minor unit):
//
//	C(p) = C0 + Q·(p − p0),   Δ(p) = Cw(p)/Gw − Cr(p)/Gr
//	p*   = p0 − Δ(p0) / (Qw/Gw − Qr/Gr)
//
// with Q the item's quantity in its price unit and G grams of product.
// An item with price bands is solved for the band the winner's (else the
// runner-up's) lines are priced at; lines at other bands stay as they are.
func breakEven(item string, t *prices.Table, w, r costing.Result) (Flip, bool) {
	idx, ok := bandUsed(item, w, r)
	if !ok {
		if idx, ok = t.Find(item); !ok {
			return Flip{}, false
		}
	}
	p0 := t.Items[idx].Price.InexactFloat64()
	qty := func(res costing.Result) float64 {
		q := 0.0
		for _, l := range res.Ledger.Lines {
			if l.PriceRow == idx {
				q += l.Qty.InexactFloat64()
			}
		}
		return q
	}
	gw, gr := w.Usage.ProductOutKg*1000, r.Usage.ProductOutKg*1000
	slope := qty(w)/gw - qty(r)/gr
	if slope == 0 {
		return Flip{}, false
	}
	delta := w.Ledger.Total.InexactFloat64()/gw - r.Ledger.Total.InexactFloat64()/gr
	p := p0 - delta/slope
	if !(p > 0) || math.IsInf(p, 0) {
		return Flip{}, false
	}
	return Flip{Item: t.Items[idx].Name, Unit: t.Items[idx].Unit, Price: t.Items[idx].Price, BreakEven: decimal.NewFromFloat(p).Round(4), Rising: slope > 0}, true
}
