package workbook

import (
	"fmt"
	"strings"

	"sepcost/costing"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale"
)

// Summary columns: the per-mass table's, which the decision block above it
// shares (labels in A, values in B and C, words spilling right from D).
const (
	smMass     = iota + 1 // batch mass
	smMethod              // method (sheet name)
	smStatus              // feasible, not feasible, not assessed
	smTotal               // total cost
	smPerGram             // cost per gram of purified product
	smElapsed             // hours elapsed
	smAttended            // hours hands-on
	smSolvent             // solvent, L (only when some method uses solvent; else the columns shift left)
	smWaste               // waste, kg
	smRecovery            // recovery
	smCheapest            // the cheapest mark
)

// hoursPerDay turns elapsed hours into working days: one shift of 8 h
// (common practice, no source).
const hoursPerDay = 8.0

// summaryTable records where the per-mass table put the rows of the target
// mass, for the decision formulas above it.
type summaryTable struct {
	first, last int               // rows of the target mass, one per method; 0 when the target is not a costed mass
	col         map[int]int       // smXxx → column actually used
	perGram     map[[2]int]string // (mass, method) → cell of the cost per gram, for the chart data
}

// buildSummary writes the one-page Summary, decision first: the title and
// files; the recommendation at the target mass (method, cost per gram with
// its P10–P90, batch cost, time, runner-up, margin), whose cells are
// formulas on the cost-per-gram cells of the table below so that an edit on
// the Prices sheet moves them; the methods not feasible or not assessed;
// then the table by batch mass and method; the chart of cost per gram
// against mass (added by summaryChart); the warnings; the cautions. The
// explanation in words, cost drivers, break-even prices, crossovers and
// notes are on the Decision sheet. Without detail sheets (a sweep of many
// masses) the table gives way to a pointer to the Scale-up sheet and the
// decision cells hold the values as worked out.
//
// It returns the chart's data block and anchor for summaryChart.
func buildSummary(g *grid, st *styles, r *scale.Report, m money, methods []methodOut, details bool, lay *layout) chartPlan {
	title := r.Title
	if title == "" {
		title = "Purification cost estimate"
	}
	g.set(1, 1, cell{value: title, style: st.title, spill: true})
	g.set(2, 1, cell{value: fmt.Sprintf("Scenario: %s · Prices: %s · Currency: %s", r.ScenarioFile, r.PricesFile, m.currency), style: st.note, spill: true})

	cols, head := summaryColumns(st, methods, len(r.Methods) > 1)
	lastCol := len(head)
	for c := 1; c <= lastCol; c++ {
		g.minWidths[c] = 11
	}
	row := 4
	rows := decisionRows(r)
	tableTop := row + 1 + rows + 2
	var tab summaryTable
	end := tableTop
	if details {
		tab, end = writeSummaryTable(g, st, r, methods, cols, head, tableTop, lay)
	} else {
		end = summaryOmitted(g, st, r, tableTop, lastCol)
	}
	writeRecommendation(g, st, r, m, row, tab, lastCol, lay)
	plan := chartPlan{top: end + 1, rows: summaryChartRows, lastCol: lastCol}
	row = end + 1 + summaryChartRows + 1
	row = writeAssumptions(g, st, r, row, lastCol)
	row = summaryWarnings(g, st, r, row, lastCol)
	row = summaryCautions(g, st, r, row, lastCol)
	plan.data = chartData(g, st, r, tab, lastCol+2)
	g.onePage, g.printCols, g.printRows = true, lastCol, row-1
	return plan
}

// summaryColumn is one numeric column of the per-mass table.
type summaryColumn struct {
	id   int
	head string
	get  func(massCells) numCell
	st   int
}

// summaryColumns lists the table's numeric columns and all headers.
func summaryColumns(st *styles, methods []methodOut, cheapest bool) ([]summaryColumn, []string) {
	solvent := false
	for _, mo := range methods {
		for _, mc := range mo.mass {
			solvent = solvent || mc.hasSolvent
		}
	}
	cols := []summaryColumn{
		{smPerGram, "Cost per gram", func(c massCells) numCell { return c.perGram }, st.perGram},
		{smElapsed, "Elapsed h", func(c massCells) numCell { return c.elapsed }, st.hours},
		{smAttended, "Hands-on h", func(c massCells) numCell { return c.attended }, st.hours},
	}
	if solvent {
		cols = append(cols, summaryColumn{smSolvent, "Solvent L", func(c massCells) numCell { return c.solventL }, st.litres})
	}
	cols = append(cols,
		summaryColumn{smWaste, "Waste kg", func(c massCells) numCell { return c.wasteKg }, st.kg},
		summaryColumn{smRecovery, "Recovery", func(c massCells) numCell { return c.recovery }, st.percent})
	head := []string{"Batch mass", "Method", "Status", "Total cost"}
	for _, c := range cols {
		head = append(head, c.head)
	}
	if cheapest {
		head = append(head, "Cheapest per gram")
	}
	return cols, head
}

// writeSummaryTable writes the table of cost, time and waste by batch mass
// and method from row top; numbers are references to the method sheets
// (with their cached values). Where several methods are feasible at a
// mass, a formula marks the cheapest per gram of purified product:
//
//	IF(E9=MIN(E8:E10),"cheapest","")
//
// It returns where the target mass's rows are and the next free row.
func writeSummaryTable(g *grid, st *styles, r *scale.Report, methods []methodOut, cols []summaryColumn, head []string, top int, lay *layout) (summaryTable, int) {
	tab := summaryTable{col: map[int]int{smMass: 1, smMethod: 2, smStatus: 3, smTotal: 4}, perGram: map[[2]int]string{}}
	for k, c := range cols {
		tab.col[c.id] = 5 + k
	}
	lastCol := len(head)
	cheapest := len(r.Methods) > 1
	g.set(top, 1, cell{value: "Cost, time and waste by batch mass and method", style: st.heading, spill: true})
	for c, h := range head {
		style := st.headerRight
		switch {
		case c < 3:
			style = st.header
		case cheapest && c+1 == lastCol: // the cheapest mark: a word after the numbers
			style = st.headerIndent
		}
		g.text(top+1, c+1, h, style)
	}
	g.titleRows = 0
	row := top + 2
	pgCol := tab.col[smPerGram]
	for i, kg := range r.MassesKg {
		first := row
		var feasible []int
		for j := range r.Methods {
			mc := methods[j].mass[i]
			g.text(row, smMass, units.FormatMass(kg), st.text)
			g.text(row, smMethod, methods[j].sheet, st.text)
			status := costing.StatusOf(mc.feasible, mc.reason)
			g.text(row, smStatus, status.Words(), st.text)
			if !mc.feasible {
				// The reason across the figures' columns, wrapped, so that
				// a long one neither runs off the printed page nor widens it.
				g.set(row, smTotal, cell{value: costing.Detail(mc.reason), style: st.wrapNote, wrap: true})
				for c := smTotal + 1; c <= lastCol; c++ {
					g.blank(row, c, st.wrapNote)
				}
				g.merge(row, smTotal, lastCol)
				row++
				continue
			}
			g.formula(row, smTotal, sheetRef(methods[j].sheet, mc.totalRef), mc.total.InexactFloat64(), st.money)
			lay.add(sheetSummary, cellName(smTotal, row), mc.total, "summary total")
			for _, c := range cols {
				nc := c.get(mc)
				col := tab.col[c.id]
				switch {
				case !nc.ok:
					g.text(row, col, "n/a", st.text)
				case nc.ref == "":
					g.num(row, col, nc.v, c.st)
				default:
					g.formula(row, col, sheetRef(methods[j].sheet, nc.ref), nc.v, c.st)
				}
				if c.id == smPerGram && nc.ok {
					tab.perGram[[2]int{i, j}] = cellName(col, row)
				}
			}
			if mc.perGram.ok {
				feasible = append(feasible, j)
			}
			row++
		}
		if sameMass(kg, r.TargetKg) {
			tab.first, tab.last = first, row-1
		}
		if cheapest && len(feasible) > 0 {
			rng := cellName(pgCol, first) + ":" + cellName(pgCol, row-1)
			// Cheapest per gram of purified product, the one definition
			// every output uses (scale.Cheapest).
			best := r.CheapestAt(i)
			for _, j := range feasible {
				mark := ""
				if j == best {
					mark = "cheapest"
				}
				at := first + j
				g.formula(at, lastCol, "IF("+cellName(pgCol, at)+"=MIN("+rng+"),\"cheapest\",\"\")", mark, st.boldIndent)
			}
		}
	}
	g.set(row, 1, cell{value: "Cost per gram of purified product. Totals and costs per gram refer to the method sheets; an edit on the Prices sheet moves them, the cheapest mark and the recommendation above.",
		style: st.note, spill: true})
	return tab, row + 1
}

// sameMass reports whether two batch masses are the same to a part in 10^9.
func sameMass(a, b float64) bool {
	d := a - b
	return d < 1e-9*a && d > -1e-9*a
}

// decisionRows is the number of rows writeRecommendation writes below its
// heading, so that the table's place is known before it is written.
func decisionRows(r *scale.Report) int {
	d := r.Decision
	if d == nil {
		return 1
	}
	n := 7 // recommended, cost per gram, batch cost, elapsed, runner-up, margin, formula note
	if d.Confidence > 0 && finite(d.Confidence) {
		n++
	}
	if campaignShown(r) {
		n++ // campaign cost
	}
	return n + len(d.Infeasible)
}

// writeRecommendation writes the decision at the target mass from row:
// the cheapest method per gram of purified product, its cost per gram
// (with the P10–P90 of the draws), batch cost and elapsed time, the
// runner-up and the margin
//
//	margin = (c_runner − c_winner) / c_runner
//
// as formulas on the cost-per-gram cells of the target mass in the table
// (MIN, SMALL, INDEX/MATCH), so that an edit on the Prices sheet moves
// them; where the target mass has no rows in the table the values are the
// ones scale.Decide worked out. Then each method that is not feasible or
// not assessed, with its reason.
func writeRecommendation(g *grid, st *styles, r *scale.Report, m money, row int, tab summaryTable, lastCol int, lay *layout) {
	d := r.Decision
	target := r.TargetKg
	if d != nil && d.TargetKg > 0 && finite(d.TargetKg) {
		target = d.TargetKg
	}
	heading := "Recommendation"
	if target > 0 && finite(target) {
		heading += " at " + units.FormatMass(target) + " of crude"
	}
	if r.TargetWhy != "" {
		heading += " (" + r.TargetWhy + ")"
	}
	g.set(row, 1, cell{value: heading, style: st.heading, spill: true})
	row++
	if d == nil {
		g.set(row, 1, cell{value: "No decision was made for this report.", style: st.note, spill: true})
		return
	}
	f := newDecisionFormulas(r, tab)
	label := func(row int, s string) { g.text(row, 1, s, st.bold) }
	words := func(row, col int, s string) { g.set(row, col, cell{value: s, style: st.textIndent, spill: true}) }

	label(row, "Recommended")
	winner := d.Winner
	if winner == "" {
		winner = "none feasible"
	}
	recommended := "B" + fmt.Sprint(row)
	f.put(g, row, 2, f.pick(f.names, 1, "none feasible"), capitalize(winner), st.bold)
	words(row, 3, "cheapest per gram of purified product at this mass")
	row++

	if d.OnCampaign {
		label(row, "Cost per gram over the campaign")
	} else {
		label(row, "Cost per gram")
	}
	f.put(g, row, 2, f.nth(1), d.WinnerPerG, st.perGram)
	if u := r.Uncertainty; u != nil && d.Winner != "" {
		for _, b := range u.Bands {
			if b.Method == d.Winner && b.Feasible > 0 && finite(b.P10) && finite(b.P90) {
				one := ""
				if d.OnCampaign {
					one = " of one batch"
				}
				lo, hi := units.Sig3Range(b.P10, b.P90)
				words(row, 3, fmt.Sprintf("P10–P90%s %s to %s %s/g over %d draws of the uncertain inputs (Uncertainty sheet)",
					one, lo, hi, m.currency, u.Draws))
			}
		}
	}
	row++

	label(row, "Batch cost")
	total, hours := nan, nan
	batchCost := f.batch(f.total, recommended)
	if w := winnerResult(r, d); w != nil {
		total = w.Total.InexactFloat64()
		hours = w.HoursElapsed
		if batchCost != "" { // a formula, checked by the recalculation tests
			lay.add(sheetSummary, cellName(2, row), w.Total, "batch cost")
		}
	}
	f.put(g, row, 2, batchCost, total, st.money)
	if w := winnerResult(r, d); w == nil && tab.first == 0 && d.Winner != "" {
		// A sweep whose masses miss the target: the decision was costed
		// there, but its batch figures are not among the rows.
		words(row, 3, units.FormatMass(target)+" is not among the masses costed here; the Decision sheet explains the choice")
	} else {
		words(row, 3, "for "+units.FormatMass(target)+" of crude, materials, labour and disposal")
	}
	row++

	if campaignShown(r) {
		row = writeCampaignCost(g, st, r, f, row, lay)
	}

	label(row, "Elapsed time")
	f.put(g, row, 2, f.batch(f.elapsed, recommended), hours, st.hoursUnit)
	if tab.first > 0 {
		g.formula(row, 3, "IF(ISNUMBER(B"+fmt.Sprint(row)+"),B"+fmt.Sprint(row)+"/"+fmt.Sprint(hoursPerDay)+",\"\")", hours/hoursPerDay, st.days)
	} else if finite(hours) {
		g.num(row, 3, hours/hoursPerDay, st.days)
	}
	row++

	label(row, "Runner-up")
	runner := d.RunnerUp
	if runner == "" {
		runner = "none"
	}
	f.put(g, row, 2, f.pick(f.names, 2, "none"), capitalize(runner), st.text)
	f.put(g, row, 3, f.nth(2), d.RunnerPerG, st.perGram)
	row++

	label(row, "Margin")
	f.put(g, row, 2, f.margin(), d.Margin, st.percent)
	tieWords := fmt.Sprintf("a tie: within %.0f %% of each other, inside the models' uncertainty; choose on other grounds", scale.TieMargin*100)
	tie := "cheaper per gram than the runner-up"
	if d.Tie {
		tie = tieWords
	}
	if f.pg != "" {
		ref := "B" + fmt.Sprint(row)
		g.set(row, 3, cell{formula: fmt.Sprintf("IF(ISNUMBER(%s),IF(%s<%g,%q,\"cheaper per gram than the runner-up\"),\"\")",
			ref, ref, scale.TieMargin, tieWords), value: tie, style: st.textIndent, spill: true})
	} else if d.RunnerUp != "" {
		words(row, 3, tie)
	}
	row++

	if d.Confidence > 0 && finite(d.Confidence) {
		label(row, "Confidence")
		g.num(row, 2, d.Confidence, st.percent)
		words(row, 3, "of the draws of the uncertain inputs in which "+d.Winner+" is cheapest")
		row++
	}
	for _, meth := range sortedKeys(d.Infeasible) {
		reason := d.Infeasible[meth]
		label(row, capitalize(costing.StatusOf(false, reason).Words()))
		g.text(row, 2, capitalize(meth), st.text)
		g.set(row, 3, cell{value: costing.Detail(reason), style: st.textIndent, spill: true})
		row++
	}
	note := "The cells above are formulas on the cost per gram in the table below: an edit on the Prices sheet moves them. " +
		"The explanation, cost drivers and break-even prices (Decision sheet) were worked out with the prices as read."
	if tab.first == 0 {
		note = "Worked out by the models at the target mass with the prices as read; the Decision sheet explains it."
	}
	switch {
	case d.OnCampaign && f.pg != "":
		note = "Decided per gram over the whole campaign, one-time costs and capital charged once: the cells above are formulas on the campaign's costs per gram (Budget sheet) " +
			"and on the table below, which is for one batch, so an edit on the Prices sheet moves them. The explanation (Decision sheet) was worked out with the prices as read."
	case d.OnCampaign:
		note = "Decided per gram over the whole campaign, one-time costs and capital charged once (Budget sheet), with the prices as read; the table below is for one batch."
	}
	wrapped(g, st, row, note, lastCol)
}

// winnerResult is the winner's row at the target mass, nil where the
// target mass is not among the report's masses or nothing is feasible.
func winnerResult(r *scale.Report, d *scale.Decision) *scale.Row {
	for i, kg := range r.MassesKg {
		if !sameMass(kg, d.TargetKg) {
			continue
		}
		for j, meth := range r.Methods {
			if row := r.RowAt(i, j); meth == d.Winner && row.Feasible {
				return &row
			}
		}
	}
	return nil
}

// campaignShown says whether the recommendation shows the campaign's
// cost: the decision is made on a campaign whose costs the Budget sheet
// lists.
func campaignShown(r *scale.Report) bool {
	d := r.Decision
	return d != nil && d.OnCampaign && r.Campaign != nil && r.Budget != nil && d.Winner != ""
}

// writeCampaignCost writes the recommended method's campaign cost (the
// Budget sheet's campaign column in the row of the cheapest per gram, a
// formula like the rest of the block) and returns the next row.
func writeCampaignCost(g *grid, st *styles, r *scale.Report, f decisionFormulas, row int, lay *layout) int {
	g.text(row, 1, "Campaign cost", st.bold)
	total, words := nan, ""
	if k, ok := r.Campaign.Cost(r.Decision.Winner); ok {
		total = k.Total.InexactFloat64()
		noun := "batches"
		if k.Batches == 1 {
			noun = "batch"
		}
		words = fmt.Sprintf("%d %s of %s of crude, one-time costs and capital charged once (Budget sheet)", k.Batches, noun, units.FormatMass(k.BatchKg))
		if first, last := campaignRows(r); last >= first && f.pg != "" {
			lay.add(sheetSummary, cellName(2, row), k.Total, "campaign cost")
		}
	}
	formula := ""
	if first, last := campaignRows(r); last >= first {
		formula = f.pick(sheetRef(sheetBudget, absName(cTotal, first)+":"+absName(cTotal, last)), 1, "")
	}
	f.put(g, row, 2, formula, total, st.money)
	if words != "" {
		g.set(row, 3, cell{value: words, style: st.textIndent, spill: true})
	}
	return row + 1
}

// decisionFormulas writes the recommendation's formulas. pg is the range
// of the costs per gram the decision is made on and names the methods in
// the same rows: the target mass's rows of the table below for a decision
// on one batch, the Budget sheet's campaign rows (campaignRows) for a
// decision on the campaign; "" when the figures are written as values.
// total and elapsed are the table's batch cost and elapsed hours at the
// target mass, in the same rows as pg on one batch; on a campaign they are
// found by the recommended method's name in tabNames, the table's.
type decisionFormulas struct {
	pg, names, total, elapsed string
	tabNames                  string
	onCampaign                bool
}

func newDecisionFormulas(r *scale.Report, tab summaryTable) decisionFormulas {
	f := decisionFormulas{onCampaign: r.Decision != nil && r.Decision.OnCampaign}
	if tab.first > 0 {
		col := func(c int) string { return absName(tab.col[c], tab.first) + ":" + absName(tab.col[c], tab.last) }
		f.pg, f.names, f.total, f.elapsed = col(smPerGram), col(smMethod), col(smTotal), col(smElapsed)
	}
	if !f.onCampaign {
		return f
	}
	f.tabNames, f.pg, f.names = f.names, "", ""
	if r.Budget == nil || r.Campaign == nil {
		return f
	}
	if first, last := campaignRows(r); last >= first {
		f.pg = sheetRef(sheetBudget, absName(cPerGram, first)+":"+absName(cPerGram, last))
		f.names = sheetRef(sheetBudget, absName(cMethod, first)+":"+absName(cMethod, last))
	}
	return f
}

// nth is the k-th lowest cost per gram (k = 1 the cheapest), "" when k
// methods are not feasible: IF(COUNT(pg)>=k,SMALL(pg,k),"").
func (f decisionFormulas) nth(k int) string {
	if f.pg == "" {
		return ""
	}
	return fmt.Sprintf("IF(COUNT(%s)>=%d,SMALL(%s,%d),\"\")", f.pg, k, f.pg, k)
}

// pick is the cell of range rng (rows of pg) in the row of the k-th
// cheapest method, or none:
// IF(COUNT(pg)>=k,INDEX(rng,MATCH(SMALL(pg,k),pg,0)),none).
func (f decisionFormulas) pick(rng string, k int, none string) string {
	if f.pg == "" {
		return ""
	}
	return fmt.Sprintf("IF(COUNT(%s)>=%d,INDEX(%s,MATCH(SMALL(%s,%d),%s,0)),%q)", f.pg, k, rng, f.pg, k, f.pg, none)
}

// batch is the recommended method's cell of rng, a column of the table's
// target-mass rows: on one batch the cheapest's (pick); on a campaign the
// row whose method is named in the cell recommended,
// IF(ISNUMBER(MATCH(rec,names,0)),INDEX(rng,MATCH(rec,names,0)),"").
func (f decisionFormulas) batch(rng, recommended string) string {
	if !f.onCampaign {
		return f.pick(rng, 1, "")
	}
	if f.pg == "" || f.tabNames == "" {
		return ""
	}
	at := fmt.Sprintf("MATCH(%s,%s,0)", recommended, f.tabNames)
	return fmt.Sprintf("IF(ISNUMBER(%s),INDEX(%s,%s),\"\")", at, rng, at)
}

// margin is (second − first) / second of the costs per gram.
func (f decisionFormulas) margin() string {
	if f.pg == "" {
		return ""
	}
	return fmt.Sprintf("IF(COUNT(%s)>=2,(SMALL(%s,2)-SMALL(%s,1))/SMALL(%s,2),\"\")", f.pg, f.pg, f.pg, f.pg)
}

// put writes formula with its cached value, or the value alone when there
// is no formula (the target mass is not in the table). A cached value that
// is not a number (no runner-up) is written as an empty string.
func (f decisionFormulas) put(g *grid, row, col int, formula string, v any, style int) {
	if x, ok := v.(float64); ok && !finite(x) {
		v = ""
	}
	if formula == "" {
		if s, ok := v.(string); ok {
			g.text(row, col, s, style)
			return
		}
		g.num(row, col, v.(float64), style)
		return
	}
	g.formula(row, col, formula, v, style)
}

// summaryOmitted writes, in place of the per-mass table of a sweep of many
// masses, where the figures are and how to get the details; it returns the
// next free row.
func summaryOmitted(g *grid, st *styles, r *scale.Report, row, lastCol int) int {
	n := len(r.MassesKg)
	g.set(row, 1, cell{value: "Cost, time and waste by batch mass and method", style: st.heading, spill: true})
	text := fmt.Sprintf("The cost, time and waste of each method at the %d batch masses from %s to %s are on the Scale-up sheet, "+
		"one row per mass and method, with charts. Per-mass detail sheets (bill of materials, time, waste streams) are written "+
		"for sweeps of at most %d masses; for the details at the masses you choose run "+
		"`sepcost estimate SCENARIO --mass %s` (several masses separated by commas).",
		n, units.FormatMass(r.MassesKg[0]), units.FormatMass(r.MassesKg[n-1]), MaxDetailMasses, massFlag(exampleMass(r)))
	wrapped(g, st, row+1, text, lastCol)
	return row + 2
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

// summaryWarnings writes every warning of the models, once per method
// and wording with the masses it was raised at (scale.Warning), and the
// report's own warnings; it returns the next free row.
func summaryWarnings(g *grid, st *styles, r *scale.Report, row, lastCol int) int {
	var list []string
	for _, n := range r.Notes {
		if n.Level == usage.Warning {
			list = append(list, n.Text)
		}
	}
	for _, w := range r.Warnings {
		list = append(list, capitalize(w.Line()))
	}
	g.set(row, 1, cell{value: "Warnings", style: st.heading, spill: true})
	row++
	if len(list) == 0 {
		g.set(row, 1, cell{value: "None. Notes of every kind are on the Decision sheet and the method sheets.", style: st.note, spill: true})
		return row + 2
	}
	for _, s := range list {
		wrapped(g, st, row, s, lastCol)
		row++
	}
	return row + 1
}

// writeAssumptions lists the defaults the user did not set that move a
// method's cost per gram at the target mass by more than
// scale.AssumptionSwing between their low and high plausible values; row
// is the next free row; it returns the next free row.
func writeAssumptions(g *grid, st *styles, r *scale.Report, row, lastCol int) int {
	if len(r.Assumptions) == 0 {
		return row
	}
	g.set(row, 1, cell{value: "Assumptions the cost rests on", style: st.heading, spill: true})
	row++
	wrapped(g, st, row, fmt.Sprintf("Defaults not set in the scenario that move a method's cost per gram at %s by more than %.0f %% between their "+
		"low and high plausible values (P10 and P90 of the spread their source is given, as on the Uncertainty sheet), each changed alone. "+
		"Measure them or set them under settings: in the scenario.", units.FormatMass(r.TargetKg), scale.AssumptionSwing*100), lastCol)
	row++
	for _, a := range r.Assumptions {
		wrapped(g, st, row, capitalize(a.Words()), lastCol)
		row++
	}
	return row + 1
}

// summaryCautions writes the safety cautions, one wrapped paragraph each;
// it returns the next free row.
func summaryCautions(g *grid, st *styles, r *scale.Report, row, lastCol int) int {
	g.set(row, 1, cell{value: "Cautions", style: st.heading, spill: true})
	row++
	if len(r.Cautions) == 0 {
		g.set(row, 1, cell{value: "No cautions recorded for this scenario.", style: st.note, spill: true})
		return row + 1
	}
	for _, c := range r.Cautions {
		g.set(row, 1, cell{value: strings.TrimSpace(c), style: st.wrapSmall, wrap: true, small: true})
		for k := 2; k <= lastCol; k++ {
			g.blank(row, k, st.wrapSmall)
		}
		g.merge(row, 1, lastCol)
		row++
	}
	return row
}
