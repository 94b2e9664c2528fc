package workbook

import (
	"fmt"

	"sepcost/costing/units"
	"sepcost/scale"
)

// writeDecision writes, after a blank row, the decision at the target
// mass (scale.Decision) in words (the figures are on the Summary), each
// method's largest cost drivers with their share of its total, and
// the break-even prices at which the decision would flip with how far each
// is from today's price (break-even ÷ price now, a formula). The price now
// is a reference to the Prices sheet, so it follows an edit; the other
// figures were worked out with the prices as read, and a note says so.
// row is the next free row; it returns the next free row.
func writeDecision(g *grid, st *styles, r *scale.Report, m money, row, lastCol int, lay *layout) int {
	d := r.Decision
	if d == nil {
		return row
	}
	target := d.TargetKg
	if !(target > 0) || !finite(target) {
		target = r.TargetKg
	}
	row++
	heading := "Decision at " + units.FormatMass(target) + " of crude"
	if r.TargetWhy != "" {
		heading += " (" + r.TargetWhy + ")"
	}
	g.set(row, 1, cell{value: heading, style: st.heading, spill: true})
	row++
	for _, line := range d.Explanation {
		wrapped(g, st, row, line, lastCol)
		row++
	}
	if len(d.Explanation) == 0 {
		g.set(row, 1, cell{value: "No explanation recorded.", style: st.note, spill: true})
		row++
	}
	g.set(row, 1, cell{value: "The explanation, cost drivers and break-even prices were worked out with the prices as read; " +
		"unlike the totals and the recommendation on the Summary, they do not follow an edit on the Prices sheet.", style: st.note, spill: true})
	row++

	row++
	g.set(row, 1, cell{value: "Largest cost drivers at " + units.FormatMass(target), style: st.heading, spill: true})
	row++
	if len(d.Drivers) == 0 {
		g.set(row, 1, cell{value: "No feasible method, so no cost drivers.", style: st.note, spill: true})
		row++
	} else {
		for c, h := range []string{"Method", "Item", "Cost", "Share of total"} {
			style := st.header
			if c >= 2 { // numbers: headers right-aligned over them
				style = st.headerRight
			}
			g.text(row, c+1, h, style)
		}
		row++
		for _, dr := range d.Drivers {
			g.text(row, 1, capitalize(dr.Method), st.text)
			g.text(row, 2, dr.Item, st.text)
			g.num(row, 3, dr.Amount.InexactFloat64(), st.money)
			g.num(row, 4, dr.Share, st.percent)
			row++
		}
	}

	row++
	title := "Break-even prices at " + units.FormatMass(target)
	if len(d.Flips) > 0 {
		title += ": the decision flips to " + d.RunnerUp
	}
	g.set(row, 1, cell{value: title, style: st.heading, spill: true})
	row++
	switch {
	case len(d.Flips) > 0:
		head := []string{"Item", "Unit", "Price now", "Break-even price", "Ratio to now", "If the price"}
		for c, h := range head {
			style := st.header
			switch {
			case c >= 2 && c <= 4: // numbers: headers right-aligned over them
				style = st.headerRight
			case c == 5: // words after a number, set off from it
				style = st.headerIndent
			}
			g.text(row, c+1, h, style)
		}
		row++
		for _, fl := range d.Flips {
			g.text(row, 1, fl.Item, st.text)
			g.text(row, 2, fl.Unit, st.text)
			style := st.priceStyle(fl.Price)
			if k, ok := r.Prices.Find(fl.Item); ok && r.Prices.Items[k].Price.Equal(fl.Price) {
				g.formula(row, 3, priceRef(k), fl.Price.InexactFloat64(), style)
				lay.add(sheetDecision, cellName(3, row), fl.Price, "unit price")
			} else {
				g.num(row, 3, fl.Price.InexactFloat64(), style)
			}
			g.num(row, 4, fl.BreakEven.InexactFloat64(), st.priceStyle(fl.BreakEven))
			// How far the price must move, a formula so that it follows an
			// edit of the price: break-even / price now.
			if ratio := fl.BreakEven.InexactFloat64() / fl.Price.InexactFloat64(); fl.Price.IsPositive() && finite(ratio) {
				g.formula(row, 5, cellName(4, row)+"/"+cellName(3, row), ratio, st.factor)
			}
			dir := "rises above the break-even price"
			if !fl.Rising {
				dir = "falls below the break-even price"
			}
			g.set(row, 6, cell{value: dir, style: st.textIndent, spill: true})
			row++
		}
	case d.RunnerUp == "":
		g.set(row, 1, cell{value: "With at most one feasible method no price change makes another method cheaper.", style: st.note, spill: true})
		row++
	default:
		g.set(row, 1, cell{value: "No price of the largest cost drivers, on its own and above zero, would change the decision.", style: st.note, spill: true})
		row++
	}
	return row
}

// writeCrossovers writes, after a blank row, the batch masses at which the
// decision changes: the cheapest feasible method per gram of purified
// product differs just below and just above (scale.Crossover: bracketed by
// bisection on the models to scale.CrossoverPrecision in mass), with the
// method on each side and the kind of change (smooth crossing, equipment
// step, a method becoming feasible or not) in words. A secondary table
// lists where any two methods change places. A sweep without changes says
// so; an estimate at chosen masses has no such section. row is the next
// free row; it returns the next free row.
func writeCrossovers(g *grid, st *styles, r *scale.Report, row, lastCol int) int {
	if !r.IsSweep && len(r.Crossovers) == 0 {
		return row
	}
	row++
	g.set(row, 1, cell{value: "Where the cheapest method changes", style: st.heading, spill: true})
	row++
	if len(r.Crossovers) == 0 {
		n := len(r.MassesKg)
		text := fmt.Sprintf("From %s to %s the same method is cheapest per gram of purified product throughout.",
			units.FormatMass(r.MassesKg[0]), units.FormatMass(r.MassesKg[n-1]))
		if len(r.Methods) < 2 {
			text = "Only one method was costed, so no method overtakes another."
		}
		wrapped(g, st, row, text, lastCol)
		row++
	} else {
		row = crossoverTable(g, st, r.Crossovers, row)
		g.set(row, 1, cell{value: fmt.Sprintf("Cost per gram of purified product, the cheapest feasible method of all; each mass is bracketed by bisection on the models to %g %% in mass.",
			scale.CrossoverPrecision*100), style: st.note, spill: true})
		row++
	}
	if len(r.Pairwise) > 0 {
		row++
		g.set(row, 1, cell{value: "Where two methods change places (secondary: either may be dearer than a third)", style: st.bold, spill: true})
		row++
		row = crossoverTable(g, st, r.Pairwise, row)
	}
	return row
}

// crossoverTable writes one table of changes; it returns the next free row.
func crossoverTable(g *grid, st *styles, cs []scale.Crossover, row int) int {
	for c, h := range []string{"Crude mass", "Cheaper below", "Cheaper above", "Change"} {
		g.text(row, c+1, h, st.header)
	}
	row++
	orNone := func(s string) string {
		if s == "" {
			return "no feasible method"
		}
		return capitalize(s)
	}
	for _, c := range cs {
		g.text(row, 1, units.FormatMass(c.MassKg), st.text)
		g.text(row, 2, orNone(c.CheaperBelow), st.text)
		g.text(row, 3, orNone(c.CheaperAbove), st.text)
		kind := c.Kind
		if c.Detail != "" {
			kind += ": " + c.Detail
		}
		g.set(row, 4, cell{value: kind, style: st.text, spill: true})
		row++
	}
	return row
}

// sheetDecision explains the decision the Summary shows.
const sheetDecision = "Decision"

// decisionCols is the width of the Decision sheet in columns: the
// break-even table's.
const decisionCols = 6

// buildDecisionSheet writes the Decision sheet: the decision in words, the
// cost drivers and break-even prices (writeDecision), the crossover masses
// (writeCrossovers) and the report's notes of every level.
func buildDecisionSheet(g *grid, st *styles, r *scale.Report, m money, lay *layout) {
	title := "Decision"
	if r.Title != "" {
		title += ": " + r.Title
	}
	g.set(1, 1, cell{value: title, style: st.title, spill: true})
	row := writeDecision(g, st, r, m, 1, decisionCols, lay)
	row = writeCrossovers(g, st, r, row, decisionCols)
	row++
	g.set(row, 1, cell{value: "Notes", style: st.heading, spill: true})
	row++
	if len(r.Notes) == 0 {
		g.set(row, 1, cell{value: "No notes.", style: st.note, spill: true})
	}
	for _, n := range r.Notes {
		g.text(row, 1, string(n.Level), st.text)
		g.set(row, 2, cell{value: n.Text, style: st.wrap, wrap: true})
		for k := 3; k <= decisionCols; k++ {
			g.blank(row, k, st.wrap)
		}
		g.merge(row, 2, decisionCols)
		row++
	}
}
