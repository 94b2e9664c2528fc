package workbook

import (
	"fmt"
	"sort"
	"strings"

	"github.com/shopspring/decimal"
	"github.com/xuri/excelize/v2"

	"sepcost/costing/equipment"
	"sepcost/costing/ledger"
	"sepcost/costing/usage"
	"sepcost/scale"
	"sepcost/scale/campaign"
)

// sheetBudget follows the Summary: the request a manager reads first.
const sheetBudget = "Budget"

// Budget sheet layout: the campaign's facts, the request by heading, then
// the chosen method's batch ledger that the headings sum.
const (
	bBatchesRow = 5  // the number of batches, a value a reader may edit
	bHeadRow    = 13 // first heading (capital)
	bP50Row     = 24 // P50 cost per gram at the target mass
	bP90Row     = 25
	bLedgerHead = 28 // header of the ledger table
	bItem       = 1
	bLabel      = 2
	bHeading    = 3
	bQty        = 4
	bUnit       = 5
	bPrice      = 6
	bPerBatch   = 7
	bTimes      = 8
	bCampaign   = 9
	bBand       = 10
)

// budgetHeadings are the request's headings in order, each with the ledger
// heading its SUMIF gathers ("" for capital, which no ledger line holds).
var budgetHeadings = []struct{ label, key string }{
	{"Capital: equipment to buy", ""},
	{"Consumables and energy", "consumables"},
	{"Labour", "labour"},
	{"Equipment occupancy", "equipment"},
	{"Waste disposal", "disposal"},
	{"Product lost (its value; not a purchase)", "product lost"},
	{"One-time development", "one-time"},
}

// headingOf is the budget heading of a ledger group (scale.BudgetGroups).
func headingOf(g usage.Group) string {
	for h, gs := range scale.BudgetGroups {
		for _, x := range gs {
			if x == g {
				return h
			}
		}
	}
	return ""
}

// buildBudget writes the Budget sheet: every amount a formula, the ledger
// lines on the Prices sheet's unit prices and the headings SUMIFs of the
// lines, so that editing a price or the number of batches moves the
// request:
//
//	line (per batch) = ROUND(q × Prices!$C$n, places)
//	line (campaign)  = line × N      (one-time lines × 1)
//	heading          = SUMIF(headings, heading, campaign amounts)
//	contingency      = ROUND(subtotal × max(P90/P50 − 1, 0), places)
//
// The cached values are the budget's own (scale.Budget).
func buildBudget(g *grid, st *styles, r *scale.Report, m money, outs []methodOut, lay *layout) {
	b, c := r.Budget, r.Campaign
	g.widths[bItem] = 40
	g.maxWidths[bLabel] = 32 // ledger labels wrap, so the amounts above stay near their headings
	// Printed landscape, one page wide, like every sheet (pageSetup).
	g.set(1, 1, cell{value: "Budget request: " + r.Title, style: st.title, spill: true})
	mergedCell(g, 2, 1, bBand, cell{value: strings.Join(c.Explanation, " "), style: st.wrap, wrap: true})
	facts := []struct {
		label string
		v     float64
		style int
	}{
		{"Batches (edit to see the request move)", float64(b.Batches), st.general},
		{"Crude per batch, kg", b.BatchKg, st.kgFine},
		{"Purified product over the campaign, kg", b.ProductKg, st.kgFine},
		{"Working days, at least", b.Cost.WorkingDays, st.hours},
		{"Labour, person-days", b.Cost.PersonDays, st.hours},
		{"Equipment occupied, hours", b.Cost.OccupiedH, st.hours},
	}
	g.text(4, 1, "Method", st.bold)
	g.text(4, 2, capitalize(b.Method), st.text)
	for k, f := range facts {
		g.text(bBatchesRow+k, 1, f.label, st.bold)
		g.num(bBatchesRow+k, 2, f.v, f.style)
	}
	lines := b.Cost.Ledger.Lines
	first, last := bLedgerHead+1, bLedgerHead+len(lines)
	g.text(bHeadRow-1, 1, "Heading", st.header)
	g.text(bHeadRow-1, 2, "Amount", st.headerRight)
	amounts := []decimal.Decimal{b.Capital, b.Consumables, b.Labour, b.Equipment, b.Disposal, b.ProductLost, b.OneTime}
	for k, h := range budgetHeadings {
		row := bHeadRow + k
		g.text(row, 1, h.label, st.text)
		if h.key == "" {
			capitalRow(g, st, r, row)
			if len(b.CapitalItems) > 0 {
				lay.add(sheetBudget, cellName(2, row), amounts[k], "subtotal")
			}
			continue
		} else {
			f := fmt.Sprintf(`SUMIF(%s:%s,"%s",%s:%s)`, absName(bHeading, first), absName(bHeading, max(last, first)), h.key, absName(bCampaign, first), absName(bCampaign, max(last, first)))
			g.formula(row, 2, f, amounts[k].InexactFloat64(), st.money)
		}
		lay.add(sheetBudget, cellName(2, row), amounts[k], "subtotal")
	}
	sub, cont, tot := bHeadRow+len(budgetHeadings), bHeadRow+len(budgetHeadings)+1, bHeadRow+len(budgetHeadings)+2
	g.text(sub, 1, "Subtotal: the campaign's cost", st.bold)
	g.formula(sub, 2, fmt.Sprintf("SUM(B%d:B%d)", bHeadRow, sub-1), b.Subtotal.InexactFloat64(), st.moneyBold)
	lay.add(sheetBudget, cellName(2, sub), b.Subtotal, "total")
	g.text(cont, 1, "Contingency: subtotal × (P90 − P50) / P50", st.text)
	g.formula(cont, 2, fmt.Sprintf("ROUND(B%d*IF(B%d>0,MAX(B%d/B%d-1,0),0),%d)", sub, bP50Row, bP90Row, bP50Row, m.places), b.Contingency.InexactFloat64(), st.money)
	lay.add(sheetBudget, cellName(2, cont), b.Contingency, "total")
	g.text(tot, 1, "Total request", st.bold)
	g.formula(tot, 2, fmt.Sprintf("B%d+B%d", sub, cont), b.Total.InexactFloat64(), st.moneyBold)
	lay.add(sheetBudget, cellName(2, tot), b.Total, "total")
	g.text(bP50Row, 1, "P50 cost per gram of a batch", st.text)
	g.num(bP50Row, 2, b.P50, st.perGram)
	g.text(bP90Row, 1, "P90 cost per gram of a batch", st.text)
	g.num(bP90Row, 2, b.P90, st.perGram)
	g.set(bP90Row+1, 1, cell{value: "The contingency is the cost above the median of the Monte Carlo draws at the batch mass that one draw in ten exceeds (P90 − P50; common practice). Price bands are those of the campaign's purchases; editing the batches does not move a line to another band.", style: st.note, spill: true})
	ledgerBlock(g, st, r, m, lay, bLedgerHead, lines, b.CapitalItems, fmt.Sprintf("$B$%d", bBatchesRow), b.Batches)
	end := campaignTable(g, st, r)
	first, last, methods, end := campaignMapAndPayback(g, st, r, end+1)
	if len(methods) > 0 {
		g.extra = func(f *excelize.File, _ map[int]float64) error {
			part, err := addChartTo(f, sheetBudget, cellName(len(methods)+3, first-1), paybackChart(first, last, methods))
			if err != nil {
				return err
			}
			return logXAxes(f, []string{part})
		}
		// Below the chart, which is suChartH px tall from first-1
		// (beside the table, below the note that spills over the
		// columns it stands in).
		end = max(end, first-1+suChartH/20+1)
	}
	campaignMoney(g, st, r, m, outs, lay, end+2)
}

// capitalRow writes the capital heading: the sum of the purchase prices of
// the equipment to buy on the Equipment sheet, or zero with a note.
func capitalRow(g *grid, st *styles, r *scale.Report, row int) {
	b := r.Budget
	if len(b.CapitalItems) == 0 || r.Equipment == nil {
		g.num(row, 2, 0, st.money)
		g.set(row, 3, cell{value: "no equipment to buy: the campaign uses what the equipment table lists as owned", style: st.textIndent, spill: true})
		return
	}
	refs := make([]string, len(b.CapitalItems))
	names := make([]string, len(b.CapitalItems))
	for i, c := range b.CapitalItems {
		refs[i] = eqRef(eqPrice, c.Row)
		names[i] = c.Name
	}
	g.formula(row, 2, "SUM("+strings.Join(refs, ",")+")", b.Capital.InexactFloat64(), st.money)
	g.set(row, 3, cell{value: "to buy: " + strings.Join(names, ", ") + " (purchase price on the Equipment sheet; its wear is not charged again per batch)", style: st.note, spill: true})
}

// capitalRate is the formula of the unit price of a ledger line that
// charges an item bought for the campaign (one of items): its hourly rate
// on the Equipment sheet, or nothing per use; ok is false for other lines.
func capitalRate(r *scale.Report, items []scale.CapitalItem, item string) (string, bool) {
	if r.Equipment == nil {
		return "", false
	}
	for _, c := range items {
		name := r.Equipment.Items[c.Row].Name
		switch item {
		case equipment.HourItem(name):
			return eqRef(eqRate, c.Row), true
		case equipment.UseItem(name):
			return "0", true
		}
	}
	return "", false
}

// ledgerBlock writes, header at row head, one batch's ledger priced for
// a campaign (the campaign's price bands, items bought for it charged at
// their hourly rate): per line the unit price (Prices or Equipment sheet),
// the amount per batch ROUND(q × p, places), the times it is paid (timesF,
// the cell of the number of batches; 1 for a one-time line) and the
// campaign's amount. items are the equipment the campaign buys.
func ledgerBlock(g *grid, st *styles, r *scale.Report, m money, lay *layout, head int, lines []ledger.Line, items []scale.CapitalItem, timesF string, batches int) {
	for c, h := range []string{"Item", "Line", "Heading", "Quantity per batch", "Unit", "Unit price", "Per batch", "Times", "Campaign", "Price band"} {
		style := st.header
		switch {
		case c+1 == bBand || c+1 == bUnit:
			style = st.headerIndent
		case c+1 >= bQty && c+1 != bUnit:
			style = st.headerRight
		}
		g.text(head, c+1, h, style)
	}
	for k, l := range lines {
		row := head + 1 + k
		times, tf := l.Demand.Group != usage.OneTime, "1"
		if times {
			tf = timesF
		}
		g.text(row, bItem, l.Demand.Item, st.text)
		g.set(row, bLabel, cell{value: l.Demand.Label, style: st.wrap, wrap: true})
		g.text(row, bHeading, headingOf(l.Demand.Group), st.text)
		g.num(row, bQty, l.Qty.InexactFloat64(), st.figure)
		g.text(row, bUnit, l.Unit, st.textIndent)
		ref := priceRef(l.PriceRow)
		if f, ok := capitalRate(r, items, l.Demand.Item); ok {
			ref = f
		}
		g.formula(row, bPrice, ref, l.UnitPrice.InexactFloat64(), st.priceStyle(l.UnitPrice))
		lay.add(sheetBudget, cellName(bPrice, row), l.UnitPrice, "unit price")
		g.formula(row, bPerBatch, fmt.Sprintf("ROUND(%s*%s,%d)", cellName(bQty, row), cellName(bPrice, row), m.places), l.Amount.InexactFloat64(), st.money)
		lay.add(sheetBudget, cellName(bPerBatch, row), l.Amount, "line")
		n := 1
		if times {
			n = batches
		}
		g.formula(row, bTimes, tf, float64(n), st.general)
		campaign := l.Amount.Mul(decimal.NewFromInt(int64(n)))
		g.formula(row, bCampaign, fmt.Sprintf("%s*%s", cellName(bPerBatch, row), cellName(bTimes, row)), campaign.InexactFloat64(), st.money)
		lay.add(sheetBudget, cellName(bCampaign, row), campaign, "line")
		if l.Band != "" {
			g.text(row, bBand, l.Band, st.textIndent)
		}
	}
}

// Columns of the table of every method's campaign (campaignTable).
const (
	cMethod     = 1
	cBatches    = 2
	cProduct    = 3 // purified product of one batch, kg
	cPerBatch   = 4
	cOneTime    = 5
	cTotal      = 6
	cPerGram    = 7
	cDays       = 8
	cPersonDays = 9
	cHours      = 10
)

// campaignRows are the rows of the table of every method's campaign that
// hold the feasible methods, in the order of scale.CampaignReport.Costs;
// the Summary's recommendation refers to them. last < first when no
// method is feasible.
func campaignRows(r *scale.Report) (first, last int) {
	first = bLedgerHead + len(r.Budget.Cost.Ledger.Lines) + 5 // two blank rows, the heading, the header
	return first, first + len(r.Campaign.Costs) - 1
}

// campaignTable writes, below the ledger, the table of every method's
// campaign: its figures that are not money (batches, product, days,
// hours) and the methods not feasible; campaignMoney writes the money
// columns. It returns the last row written.
func campaignTable(g *grid, st *styles, r *scale.Report) int {
	c := r.Campaign
	first, _ := campaignRows(r)
	g.set(first-2, 1, cell{value: "The campaign by each method", style: st.heading, spill: true})
	for k, h := range []string{"Method", "Batches", "Product per batch, kg", "Per batch", "One-time", "Campaign", "Per gram", "Working days", "Person-days", "Equipment hours"} {
		style := st.headerRight
		if k == 0 {
			style = st.header
		}
		g.text(first-1, k+1, h, style)
	}
	row := first - 1
	for _, k := range c.Costs {
		row++
		g.text(row, cMethod, capitalize(k.Method), st.text)
		if k.Method == r.Budget.Method || c.Spec.Batches > 0 {
			// The budget's number of batches, which a reader may edit.
			g.formula(row, cBatches, fmt.Sprintf("$B$%d", bBatchesRow), float64(k.Batches), st.general)
		} else {
			g.num(row, cBatches, float64(k.Batches), st.general)
		}
		g.num(row, cProduct, k.ProductKg/float64(k.Batches), st.kgFine)
		g.num(row, cDays, k.WorkingDays, st.hours)
		g.num(row, cPersonDays, k.PersonDays, st.hours)
		g.num(row, cHours, k.OccupiedH, st.hours)
	}
	var infeasible []string
	for name := range c.Infeasible {
		infeasible = append(infeasible, name)
	}
	sort.Strings(infeasible)
	for _, name := range infeasible {
		why := c.Infeasible[name]
		row++
		g.text(row, 1, capitalize(name), st.text)
		mergedCell(g, row, 2, cHours, cell{value: notFeasible(why), style: st.wrap, wrap: true})
	}
	return row
}

// campaignMoney writes the money columns of the table of every method's
// campaign as formulas on the ledger lines the campaign is priced from,
// cached at the campaign's figures (scale.CampaignReport):
//
//	per batch = the batch's lines less its one-time lines
//	campaign  = batches × per batch + one-time + capital
//	per gram  = campaign / (batches × product per batch in g)
//
// The lines are the Budget ledger's for the budget's method; a method
// sheet's ledger where it is the campaign's line for line (same prices,
// price bands and amounts, no equipment bought); else a ledger of the
// campaign written from row top. One-time lines and capital are charged
// once.
func campaignMoney(g *grid, st *styles, r *scale.Report, m money, outs []methodOut, lay *layout, top int) {
	c := r.Campaign
	first, _ := campaignRows(r)
	for k, cost := range c.Costs {
		row := first + k
		src, capital := campaignSource{}, ""
		switch {
		case cost.Method == r.Budget.Method:
			src = blockSource(bLedgerHead, len(cost.Ledger.Lines))
			capital = absName(2, bHeadRow)
		default:
			var ok bool
			if src, ok = sheetSource(r, outs, cost); !ok {
				g.set(top, 1, cell{value: "Ledger of one batch of " + cost.Method + " at the campaign's price bands", style: st.heading, spill: true})
				items := c.Capital[cost.Method]
				ledgerBlock(g, st, r, m, lay, top+1, cost.Ledger.Lines, items, absName(cBatches, row), cost.Batches)
				src = blockSource(top+1, len(cost.Ledger.Lines))
				top += len(cost.Ledger.Lines) + 3
			}
			capital = capitalSum(r, c.Capital[cost.Method])
		}
		src.write(g, st, lay, row, cost, capital)
	}
}

// campaignSource holds the formulas of one method's campaign row: its
// recurring cost of one batch and its one-time cost ("" when the ledger
// has no one-time line).
type campaignSource struct {
	perBatch, oneTime string
}

// blockSource sums a ledger block on the Budget sheet (header at head, n
// lines) by heading.
func blockSource(head, n int) campaignSource {
	h := absName(bHeading, head+1) + ":" + absName(bHeading, head+max(n, 1))
	a := absName(bPerBatch, head+1) + ":" + absName(bPerBatch, head+max(n, 1))
	return campaignSource{
		perBatch: fmt.Sprintf(`SUMIF(%s,"<>%s",%s)`, h, onetimeHeading, a),
		oneTime:  fmt.Sprintf(`SUMIF(%s,"%s",%s)`, h, onetimeHeading, a),
	}
}

// onetimeHeading is the budget heading of one-time lines.
var onetimeHeading = headingOf(usage.OneTime)

// sheetSource refers to the method sheet's TOTAL and one-time subtotal at
// the campaign's batch mass when that ledger is the campaign's, line for
// line; ok is false otherwise (or without method sheets).
func sheetSource(r *scale.Report, outs []methodOut, cost campaign.Cost) (campaignSource, bool) {
	if len(r.Campaign.Capital[cost.Method]) > 0 {
		return campaignSource{}, false // items bought are charged at their hourly rate only
	}
	for j, meth := range r.Methods {
		if meth != cost.Method || j >= len(outs) {
			continue
		}
		for i, kg := range r.MassesKg {
			if !sameMass(kg, cost.BatchKg) || i >= len(outs[j].mass) || outs[j].mass[i].totalRef == "" {
				continue
			}
			// Method sheets exist only for short sweeps, whose results the
			// report holds; At recomputes them otherwise.
			res, err := r.At(i)
			if err != nil || !samePriced(&res[j].Ledger, &cost.Ledger) {
				continue
			}
			mc := outs[j].mass[i]
			src := campaignSource{perBatch: sheetRef(outs[j].sheet, mc.totalRef)}
			if mc.oneTimeRef != "" {
				src.oneTime = sheetRef(outs[j].sheet, mc.oneTimeRef)
				src.perBatch += "-" + src.oneTime
			}
			return src, true
		}
	}
	return campaignSource{}, false
}

// samePriced reports whether two ledgers have the same lines (sameLines)
// at the same quantities, unit prices and amounts.
func samePriced(a, b *ledger.Ledger) bool {
	if !sameLines(a, b) || !a.Total.Equal(b.Total) {
		return false
	}
	for k := range a.Lines {
		x, y := &a.Lines[k], &b.Lines[k]
		if !x.Qty.Equal(y.Qty) || !x.UnitPrice.Equal(y.UnitPrice) || !x.Amount.Equal(y.Amount) {
			return false
		}
	}
	return true
}

// capitalSum is the formula of the purchase prices of the equipment a
// campaign buys, on the Equipment sheet; "" when it buys none.
func capitalSum(r *scale.Report, items []scale.CapitalItem) string {
	if len(items) == 0 || r.Equipment == nil {
		return ""
	}
	refs := make([]string, len(items))
	for i, c := range items {
		refs[i] = eqRef(eqPrice, c.Row)
	}
	return "SUM(" + strings.Join(refs, ",") + ")"
}

// write writes the money cells of a method's campaign row, capital the
// formula of its capital ("" for none).
func (src campaignSource) write(g *grid, st *styles, lay *layout, row int, cost campaign.Cost, capital string) {
	g.formula(row, cPerBatch, src.perBatch, cost.PerBatch.InexactFloat64(), st.money)
	lay.add(sheetBudget, cellName(cPerBatch, row), cost.PerBatch, "campaign")
	if src.oneTime == "" {
		g.num(row, cOneTime, 0, st.money) // no one-time line
	} else {
		g.formula(row, cOneTime, src.oneTime, cost.OneTime.InexactFloat64(), st.money)
		lay.add(sheetBudget, cellName(cOneTime, row), cost.OneTime, "campaign")
	}
	total := fmt.Sprintf("%s*%s+%s", cellName(cBatches, row), cellName(cPerBatch, row), cellName(cOneTime, row))
	if capital != "" {
		total += "+" + capital
	}
	g.formula(row, cTotal, total, cost.Total.InexactFloat64(), st.money)
	lay.add(sheetBudget, cellName(cTotal, row), cost.Total, "campaign")
	pg := fmt.Sprintf("%s/(%s*%s*1000)", cellName(cTotal, row), cellName(cBatches, row), cellName(cProduct, row))
	g.formula(row, cPerGram, pg, cost.PerGram, st.perGram)
}

// campaignMapAndPayback writes, from row, the map of the cheapest method
// over batch mass and number of batches and the paybacks; it returns the
// rows of the payback table for the chart, the methods it shows and the
// last row written.
func campaignMapAndPayback(g *grid, st *styles, r *scale.Report, row int) (first, last int, methods []string, end int) {
	mp := r.Campaign.Map
	row++
	g.pageBreaks = append(g.pageBreaks, row) // the map and the payback on a printed page of their own
	g.set(row, 1, cell{value: "Cheapest method per gram over a campaign: crude per batch (rows) × number of batches (columns)", style: st.heading, spill: true})
	row++
	g.text(row, 1, "Crude per batch, g", st.header)
	for k, n := range mp.Batches {
		label := fmt.Sprintf("%d batches", n)
		if n == 1 {
			label = "1 batch"
		}
		g.text(row, k+2, label, st.headerIndent)
	}
	for i, kg := range mp.MassesKg {
		row++
		g.num(row, 1, kg*1000, st.kg)
		for k := range mp.Batches {
			w := mp.Winner[i][k]
			if w == "" {
				w = "none feasible"
			}
			g.text(row, k+2, w, st.textIndent)
		}
	}
	for name := range mp.Payback {
		methods = append(methods, name)
	}
	sort.Strings(methods)
	if len(methods) == 0 {
		return 0, 0, nil, row
	}
	row += 2
	g.set(row, 1, cell{value: "Batches after which developing the method pays back against chromatography", style: st.heading, spill: true})
	row++
	g.set(row, 1, cell{value: "Above the curve (more batches than shown at that batch mass) the developed method is cheaper per gram over the campaign; below it, columns are. An empty cell: it never pays back at that batch mass (or cannot run there).", style: st.note, spill: true})
	row++
	g.text(row, 1, "Crude per batch, g", st.header)
	for k, name := range methods {
		g.text(row, k+2, capitalize(name), st.headerRight)
	}
	first = row + 1
	for i, kg := range mp.MassesKg {
		row++
		g.num(row, 1, kg*1000, st.kg)
		for k, name := range methods {
			if n := mp.Payback[name][i]; n > 0 {
				g.num(row, k+2, float64(n), st.general)
			}
		}
	}
	return first, row, methods, row
}

// paybackChart is the payback table drawn: batches to pay back against
// crude batch mass, both on logarithmic axes.
func paybackChart(first, last int, methods []string) *excelize.Chart {
	run := func(s string) excelize.ChartTitle {
		return excelize.ChartTitle{Paragraph: []excelize.RichTextRun{{Text: s}}}
	}
	var series []excelize.ChartSeries
	for k := range methods {
		series = append(series, excelize.ChartSeries{
			Name:       sheetRef(sheetBudget, absName(k+2, first-1)),
			Categories: sheetRef(sheetBudget, absName(1, first)+":"+absName(1, last)),
			Values:     sheetRef(sheetBudget, absName(k+2, first)+":"+absName(k+2, last)),
			Line:       excelize.LineOptions{Type: excelize.LineSolid, Width: 1.5},
			Marker:     excelize.ChartMarker{Symbol: "circle", Size: 5},
		})
	}
	title := "Batches to pay back the development, against batch mass"
	return &excelize.Chart{
		Type:   excelize.Scatter,
		Series: series,
		Title:  run(title),
		XAxis:  excelize.ChartAxis{MajorGridLines: true, Title: run("Crude batch mass, g (log scale)"), Font: axisFont, LogBase: 10},
		YAxis:  excelize.ChartAxis{MajorGridLines: true, LogBase: 10, Title: run("batches (log scale)"), Font: axisFont},
		Legend: excelize.ChartLegend{Position: "bottom"}, ShowBlanksAs: "gap",
		Dimension: excelize.ChartDimension{Width: suChartW, Height: suChartH},
		Format:    excelize.GraphicOptions{AltText: title},
	}
}
