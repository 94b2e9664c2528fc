package workbook

import (
	"fmt"
	"strings"

	"sepcost/scale"
)

// buildSummary writes the title and files, a table per batch mass and
// method whose numbers are references to the method sheets (with their
// cached values), the cheapest method per mass where there are several,
// the decision at the target mass with its cost drivers and break-even
// prices, the crossover masses, then the report's notes and cautions.
// Without detail sheets (a sweep of many masses) the per-mass table gives
// way to a pointer to the Scale-up sheet.
func buildSummary(g *grid, st *styles, r *scale.Report, m money, methods []methodOut, details bool, lay *layout) {
	title := r.Title
	if title == "" {
		title = "Purification cost estimate"
	}
	g.set(1, 1, cell{value: title, style: st.title, spill: true})
	for k, kv := range [][2]string{{"Scenario file", r.ScenarioFile}, {"Prices file", r.PricesFile}, {"Currency", m.currency}} {
		g.text(2+k, 1, kv[0], st.bold)
		g.set(2+k, 2, cell{value: kv[1], style: st.text, spill: true})
	}

	solvent := false
	for _, mo := range methods {
		for _, mc := range mo.mass {
			solvent = solvent || mc.hasSolvent
		}
	}
	cheapest := len(r.Methods) > 1
	const perGramCol = 4 // "Cost per gram", the first of cols after the total
	type column struct {
		head string
		get  func(massCells) numCell
		st   int
	}
	cols := []column{
		{"Cost per gram", func(c massCells) numCell { return c.perGram }, st.perGram},
		{"Elapsed h", func(c massCells) numCell { return c.elapsed }, st.hours},
		{"Hands-on h", func(c massCells) numCell { return c.attended }, st.hours},
	}
	if solvent {
		cols = append(cols, column{"Solvent L", func(c massCells) numCell { return c.solventL }, st.litres})
	}
	cols = append(cols,
		column{"Waste kg", func(c massCells) numCell { return c.wasteKg }, st.kg},
		column{"Recovery", func(c massCells) numCell { return c.recovery }, st.percent})

	head := []string{"Batch mass", "Method", "Total cost"}
	for _, c := range cols {
		head = append(head, c.head)
	}
	if cheapest {
		head = append(head, "Cheapest")
	}
	lastCol := len(head)
	if !details {
		row := summaryOmitted(g, st, r, lastCol)
		row = writeDecision(g, st, r, m, row, lastCol, lay)
		row = writeAssumptions(g, st, r, row, lastCol)
		row = writeCrossovers(g, st, r, row, lastCol)
		summaryNotes(g, st, r, row, lastCol)
		return
	}
	g.set(6, 1, cell{value: "Cost, time and waste by batch mass and method", style: st.heading, spill: true})
	for c, h := range head {
		g.text(7, c+1, h, st.header)
	}
	g.freeze(7, 0)

	row := 8
	for i, kg := range r.MassesKg {
		var feasibleRows [][2]int // summary row, method index
		for j := range r.Methods {
			mc := methods[j].mass[i]
			g.text(row, 1, massLabel(kg), st.text)
			g.text(row, 2, methods[j].sheet, st.text)
			if !mc.feasible {
				g.set(row, 3, cell{value: notFeasible(mc.reason), style: st.text, spill: true})
				row++
				continue
			}
			ref := sheetRef(methods[j].sheet, mc.totalRef)
			g.formula(row, 3, ref, mc.total.InexactFloat64(), st.money)
			lay.add(sheetSummary, cellName(3, row), mc.total, "summary total")
			for k, c := range cols {
				nc := c.get(mc)
				switch {
				case !nc.ok:
					g.text(row, 4+k, "n/a", st.text)
				case nc.ref == "":
					g.num(row, 4+k, nc.v, c.st)
				default:
					g.formula(row, 4+k, sheetRef(methods[j].sheet, nc.ref), nc.v, c.st)
				}
			}
			if mc.perGram.ok {
				feasibleRows = append(feasibleRows, [2]int{row, j})
			}
			row++
		}
		if cheapest && len(feasibleRows) > 0 {
			// Cheapest per gram of purified product, the one definition
			// every output uses (scale.Cheapest), as a formula on the
			// cost-per-gram cells so that the mark moves when a price is
			// edited: IF(D8=MIN(D8,D9,...),"cheapest","").
			refs := make([]string, len(feasibleRows))
			for k, fr := range feasibleRows {
				refs[k] = cellName(perGramCol, fr[0])
			}
			best := r.CheapestAt(i)
			for _, fr := range feasibleRows {
				mark := ""
				if fr[1] == best {
					mark = "cheapest"
				}
				f := "IF(" + cellName(perGramCol, fr[0]) + "=MIN(" + strings.Join(refs, ",") + "),\"cheapest\",\"\")"
				g.formula(fr[0], lastCol, f, mark, st.bold)
			}
		}
	}

	if r.IsSweep {
		g.set(row, 1, cell{value: "The Scale-up sheet has these figures as a table with charts against batch mass.", style: st.note, spill: true})
		row++
	}
	row = writeDecision(g, st, r, m, row, lastCol, lay)
	row = writeAssumptions(g, st, r, row, lastCol)
	row = writeCrossovers(g, st, r, row, lastCol)
	summaryNotes(g, st, r, row, lastCol)
}

// writeAssumptions lists, after a blank row, the defaults the user did not
// set that move a method's cost per gram at the target mass by more than
// scale.AssumptionSwing between their low and high plausible values; row
// is the next free row; it returns the next free row.
func writeAssumptions(g *grid, st *styles, r *scale.Report, row, lastCol int) int {
	if len(r.Assumptions) == 0 {
		return row
	}
	row++
	g.set(row, 1, cell{value: "Assumptions the cost rests on", style: st.heading, spill: true})
	row++
	wrapped(g, st, row, fmt.Sprintf("Defaults not set in the scenario that move a method's cost per gram at %s by more than %.0f %% between their "+
		"low and high plausible values (P10 and P90 of the spread their source is given, as on the Uncertainty sheet), each changed alone. "+
		"Measure them or set them under settings: in the scenario.", massLabel(r.TargetKg), scale.AssumptionSwing*100), lastCol)
	row++
	for _, a := range r.Assumptions {
		wrapped(g, st, row, capitalize(a.Words()), lastCol)
		row++
	}
	return row
}

// summaryOmitted writes, in place of the per-mass table of a sweep of many
// masses, where the figures are and how to get the details; it returns the
// next free row.
func summaryOmitted(g *grid, st *styles, r *scale.Report, lastCol int) int {
	n := len(r.MassesKg)
	g.set(6, 1, cell{value: "Cost, time and waste by batch mass and method", style: st.heading, spill: true})
	text := fmt.Sprintf("The cost, time and waste of each method at the %d batch masses from %s to %s are on the Scale-up sheet, "+
		"one row per mass and method, with charts. Per-mass detail sheets (bill of materials, time, waste streams) are written "+
		"for sweeps of at most %d masses; for the details at the masses you choose run "+
		"`sepcost estimate SCENARIO --mass %s` (several masses separated by commas).",
		n, massLabel(r.MassesKg[0]), massLabel(r.MassesKg[n-1]), MaxDetailMasses, massFlag(exampleMass(r)))
	wrapped(g, st, 7, text, lastCol)
	// Without the table the columns would shrink to their narrowest and
	// the paragraphs merged across them would run to many lines.
	for c := 2; c <= lastCol; c++ {
		g.minWidths[c] = 12
	}
	return 8
}

// exampleMass is the mass named in the pointer to `sepcost estimate`: the
// target mass, or the largest of the sweep.
func exampleMass(r *scale.Report) float64 {
	if r.TargetKg > 0 && finite(r.TargetKg) {
		return r.TargetKg
	}
	return r.MassesKg[len(r.MassesKg)-1]
}

// wrapped writes a paragraph of text merged across columns 1 to lastCol.
func wrapped(g *grid, st *styles, row int, text string, lastCol int) {
	g.set(row, 1, cell{value: text, style: st.wrap, wrap: true})
	for k := 2; k <= lastCol; k++ {
		g.blank(row, k, st.wrap)
	}
	g.merge(row, 1, lastCol)
}

// summaryNotes writes the report's notes and cautions after a blank row;
// row is the next free row.
func summaryNotes(g *grid, st *styles, r *scale.Report, row, lastCol int) {
	row++
	g.set(row, 1, cell{value: "Notes", style: st.heading, spill: true})
	row++
	if len(r.Notes) == 0 && len(r.Warnings) == 0 {
		g.set(row, 1, cell{value: "No notes.", style: st.note, spill: true})
		row++
	}
	for _, n := range r.Notes {
		g.text(row, 1, string(n.Level), st.text)
		g.set(row, 2, cell{value: n.Text, style: st.text, spill: true})
		row++
	}
	// Every warning of the models, once per method and wording, with
	// the masses it was raised at.
	for _, w := range r.Warnings {
		g.text(row, 1, string(w.Level), st.text)
		g.set(row, 2, cell{value: capitalize(w.Line()), style: st.text, spill: true})
		row++
	}

	row++
	g.set(row, 1, cell{value: "Cautions", style: st.heading, spill: true})
	row++
	if len(r.Cautions) == 0 {
		g.set(row, 1, cell{value: "No cautions recorded for this scenario.", style: st.note, spill: true})
	}
	for _, c := range r.Cautions {
		wrapped(g, st, row, c, lastCol)
		row++
	}
}
