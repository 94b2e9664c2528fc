package workbook

import (
	"fmt"
	"math"
	"strconv"

	"sepcost/costing"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/scale"
)

// sheetUncertainty follows Waste: the sheet order is Scale-up, Waste,
// Uncertainty, Sources.
const sheetUncertainty = "Uncertainty"

// markMeanings are the marks of costing/source in words, in the order the
// Uncertainty sheet lists their spreads (most to least sure).
var markMeanings = []struct {
	mark    source.Mark
	meaning string
}{
	{source.Confirmed, "seen in a published table or regulation"},
	{source.Derived, "computed here from published equations or data"},
	{source.Calibrated, "fitted here so that one model reproduces a published table"},
	{source.FromMemory, "widely quoted, not re-checked against the original"},
	{source.Override, "set by the user in the scenario file"},
	{source.CommonPractice, "a habit of the trade, no published source"},
	{source.Example, "invented for the demo"},
}

// Uncertainty sheet columns: a label, then numbers.
const (
	uLabel = iota + 1
	uP10
	uP50
	uP90
	uFeasible
	uCheapest
	uLast = uCheapest
)

// buildUncertainty writes the Monte Carlo result (scale.Uncertainty, from
// scale.SampleAcross): the target mass, the number of draws and the seed;
// per method the P10, P50 and P90 of the cost per gram of purified product
// and the shares of draws in which it was feasible and cheapest; how to
// read them, with the rule that a win in fewer than scale.ConfidentShare
// of the draws is a tie; what each input is worth knowing before choosing
// and how strongly it moves the cost; the bands and cheapest shares at
// every mass (with a chart) and the crossover masses as intervals; every
// input drawn with its limits, distribution and basis; and the spreads
// (uncertaintySpreads).
func buildUncertainty(g *grid, st *styles, r *scale.Report) *bandRefs {
	u := r.Uncertainty
	g.widths[uLabel] = 46
	g.maxWidths[6], g.maxWidths[7] = 24, 48 // the inputs table's wrapped text
	for c := uP10; c <= uLast; c++ {
		g.minWidths[c] = 13
	}
	g.set(1, 1, cell{value: "Uncertainty at the target mass", style: st.title, spill: true})
	g.text(3, 1, "Target mass", st.bold)
	g.set(3, 2, cell{value: units.FormatMass(u.TargetKg) + " of crude", style: st.text, spill: true})
	g.text(4, 1, "Draws", st.bold)
	g.num(4, 2, float64(u.Draws), st.ruleNumber)
	g.text(5, 1, "Seed", st.bold)
	g.text(5, 2, strconv.FormatUint(u.Seed, 10), st.text)
	g.set(6, 1, cell{value: "The same seed and number of draws give the same bands (--draws and --seed of sepcost estimate and sweep).",
		style: st.note, spill: true})

	row := 8
	g.set(row, 1, cell{value: "Cost per gram of purified product across the draws", style: st.heading, spill: true})
	row++
	for c, h := range []string{"Method", "P10", "P50\n(median)", "P90", "Feasible in\n(share of draws)", "Cheapest in\n(share of draws)"} {
		style := st.headerRight
		if c == 0 {
			style = st.header
		}
		g.set(row, c+1, cell{value: h, style: style, wrap: true})
	}
	row++
	best := -1
	for k, b := range u.Bands {
		g.text(row, uLabel, capitalize(b.Method), st.text)
		if b.Feasible > 0 {
			// g.num writes "n/a" for a quantile that is not a number.
			g.num(row, uP10, b.P10, st.perGram)
			g.num(row, uP50, b.P50, st.perGram)
			g.num(row, uP90, b.P90, st.perGram)
		} else {
			// No cost in any draw: words in place of the three quantiles,
			// with the reason where the decision records one. A method the
			// scenario does not describe was never drawn: its shares are
			// not 0 % but not applicable.
			text := "not feasible in any draw"
			reason := ""
			if d := r.Decision; d != nil {
				reason = d.Infeasible[b.Method]
			}
			if reason != "" {
				text = notFeasible(reason)
			}
			if costing.StatusOf(false, reason) == costing.StatusNotAssessed {
				mergedCell(g, row, uP10, uCheapest, cell{value: text, style: st.wrap, wrap: true})
				row++
				continue
			}
			mergedCell(g, row, uP10, uP90, cell{value: text, style: st.wrap, wrap: true})
		}
		g.num(row, uFeasible, b.Feasible, st.percent)
		g.num(row, uCheapest, b.Cheapest, st.percent)
		if finite(b.Cheapest) && (best < 0 || b.Cheapest > u.Bands[best].Cheapest) {
			best = k
		}
		row++
	}
	row++
	confident := scale.ConfidentShare * 100
	for _, text := range []string{
		"P10, P50 and P90: the cost per gram of purified product below which 10 %, 50 % and 90 % of the draws fall, among the draws " +
			"in which the method was feasible (linear-interpolation sample quantiles: Hyndman and Fan 1996, definition 7, the " +
			"spreadsheet PERCENTILE rule). Feasible in: the share of draws in which the method was feasible at this mass. Cheapest in: " +
			"the share of draws in which it was the cheapest feasible method.",
		fmt.Sprintf("How to read it: a method that is cheapest in fewer than %s %% of the draws has not won clearly; treat the methods as "+
			"tied within the models' uncertainty and choose on other grounds (time, waste, equipment at hand). The %s %% threshold "+
			"is this project's choice (common practice, no source).", units.SigFigs(confident, 3), units.SigFigs(confident, 3)),
		verdict(u, best),
	} {
		wrapped(g, st, row, text, uLast)
		row++
	}

	row = uncertaintyWorth(g, st, u, row+1)
	var charts []gridChart
	row = uncertaintySensitivity(g, st, r, row+1, &charts)
	row, refs := uncertaintyAcross(g, st, r, row+1, &charts)
	chartsOn(g, charts)
	row = uncertaintyInputs(g, st, u, row+1)
	uncertaintySpreads(g, st, row+1)
	return refs
}

// verdict says what the shares mean at this mass: a clear win when the
// method cheapest most often is cheapest in at least scale.ConfidentShare
// of the draws, else a tie.
func verdict(u *scale.Uncertainty, best int) string {
	if best < 0 || !(u.Bands[best].Cheapest > 0) {
		return "Here no method was feasible in any draw, so none is cheapest."
	}
	b := u.Bands[best]
	pct := func(v float64) string { return units.SigFigs(v*100, 3) + " %" }
	// The share is itself a sample estimate: its binomial standard error
	// is √(p(1 − p)/N) (common practice, no source: the standard error of a
	// proportion).
	se := ""
	if u.Draws > 0 && b.Cheapest < 1 {
		se = fmt.Sprintf(" That share is known to about ±%s with %d draws (standard error √(p(1 − p)/N)); more draws (--draws) narrow it.",
			pct(math.Sqrt(b.Cheapest*(1-b.Cheapest)/float64(u.Draws))), u.Draws)
	}
	if b.Cheapest >= scale.ConfidentShare {
		return fmt.Sprintf("Here %s is cheapest in %s of the draws: a clear win at %s.", b.Method, pct(b.Cheapest), units.FormatMass(u.TargetKg)) + se
	}
	return fmt.Sprintf("Here no method is cheapest in %s of the draws (%s comes closest, with %s): at %s the methods are tied within the models' uncertainty.",
		pct(scale.ConfidentShare), b.Method, pct(b.Cheapest), units.FormatMass(u.TargetKg)) + se
}
