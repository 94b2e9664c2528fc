package workbook

import (
	"fmt"
	"sort"
	"strings"

	"github.com/shopspring/decimal"
	"github.com/xuri/excelize/v2"

	"sepcost/costing/equipment"
	"sepcost/costing/usage"
	"sepcost/scale"
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
func buildBudget(g *grid, st *styles, r *scale.Report, m money, lay *layout) {
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
	g.text(bP50Row, 1, "P50 cost per gram of a batch (Monte Carlo draws at the batch mass)", st.text)
	g.num(bP50Row, 2, b.P50, st.perGram)
	g.text(bP90Row, 1, "P90 cost per gram of a batch", st.text)
	g.num(bP90Row, 2, b.P90, st.perGram)
	g.set(bP90Row+1, 1, cell{value: "The contingency is the cost above the median that one draw in ten exceeds (P90 − P50), a common way to size it (common practice). Price bands are those of the campaign's purchases; editing the number of batches does not move a line to another band.", style: st.note, spill: true})
	budgetLedger(g, st, r, m, lay)
	first, last, methods := budgetCampaigns(g, st, r, bLedgerHead+len(lines)+3)
	if len(methods) > 0 {
		g.extra = func(f *excelize.File, _ map[int]float64) error {
			part, err := addChartTo(f, sheetBudget, cellName(len(methods)+3, first-2), paybackChart(first, last, methods))
			if err != nil {
				return err
			}
			return logXAxes(f, []string{part})
		}
	}
}

// capitalRow writes the capital heading: the sum of the purchase prices of
// the equipment to buy on the Equipment sheet, or zero with a note.
func capitalRow(g *grid, st *styles, r *scale.Report, row int) {
	b := r.Budget
	if len(b.CapitalItems) == 0 || r.Equipment == nil {
		g.num(row, 2, 0, st.money)
		g.set(row, 3, cell{value: "no equipment to buy: the campaign uses what the equipment table lists as owned", style: st.note, spill: true})
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
// charges an item bought for the campaign: its hourly rate on the
// Equipment sheet, or nothing per use; ok is false for other lines.
func capitalRate(r *scale.Report, item string) (string, bool) {
	if r.Equipment == nil {
		return "", false
	}
	for _, c := range r.Budget.CapitalItems {
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

// budgetLedger writes one batch's ledger lines with their campaign amounts.
func budgetLedger(g *grid, st *styles, r *scale.Report, m money, lay *layout) {
	b := r.Budget
	for c, h := range []string{"Item", "Line", "Heading", "Quantity per batch", "Unit", "Unit price", "Per batch", "Times", "Campaign", "Price band"} {
		style := st.header
		if c+1 >= bQty && c+1 != bUnit && c+1 != bBand {
			style = st.headerRight
		}
		g.text(bLedgerHead, c+1, h, style)
	}
	n := decimal.NewFromInt(int64(b.Batches))
	for k, l := range b.Cost.Ledger.Lines {
		row := bLedgerHead + 1 + k
		times, timesF := n, fmt.Sprintf("$B$%d", bBatchesRow)
		if l.Demand.Group == usage.OneTime {
			times, timesF = decimal.NewFromInt(1), "1"
		}
		g.text(row, bItem, l.Demand.Item, st.text)
		g.set(row, bLabel, cell{value: l.Demand.Label, style: st.wrap, wrap: true})
		g.text(row, bHeading, headingOf(l.Demand.Group), st.text)
		g.num(row, bQty, l.Qty.InexactFloat64(), st.figure)
		g.text(row, bUnit, l.Unit, st.text)
		ref := priceRef(l.PriceRow)
		if f, ok := capitalRate(r, l.Demand.Item); ok {
			ref = f
		}
		g.formula(row, bPrice, ref, l.UnitPrice.InexactFloat64(), st.priceStyle(l.UnitPrice))
		lay.add(sheetBudget, cellName(bPrice, row), l.UnitPrice, "unit price")
		g.formula(row, bPerBatch, fmt.Sprintf("ROUND(%s*%s,%d)", cellName(bQty, row), cellName(bPrice, row), m.places), l.Amount.InexactFloat64(), st.money)
		lay.add(sheetBudget, cellName(bPerBatch, row), l.Amount, "line")
		g.formula(row, bTimes, timesF, times.InexactFloat64(), st.general)
		campaign := l.Amount.Mul(times)
		g.formula(row, bCampaign, fmt.Sprintf("%s*%s", cellName(bPerBatch, row), cellName(bTimes, row)), campaign.InexactFloat64(), st.money)
		lay.add(sheetBudget, cellName(bCampaign, row), campaign, "line")
		if l.Band != "" {
			g.text(row, bBand, l.Band, st.text)
		}
	}
}

// budgetCampaigns writes, below the ledger, every method's campaign, the
// paybacks and the map of the cheapest method over batch mass and number
// of batches; it returns the rows of the payback table for the chart.
func budgetCampaigns(g *grid, st *styles, r *scale.Report, row int) (first, last int, methods []string) {
	c := r.Campaign
	g.set(row, 1, cell{value: "The campaign by each method", style: st.heading, spill: true})
	row++
	for k, h := range []string{"Method", "Batches", "Per batch", "One-time", "Campaign", "Per gram", "Working days", "Person-days", "Equipment hours"} {
		style := st.headerRight
		if k == 0 {
			style = st.header
		}
		g.text(row, k+1, h, style)
	}
	for _, k := range c.Costs {
		row++
		g.text(row, 1, capitalize(k.Method), st.text)
		g.num(row, 2, float64(k.Batches), st.general)
		g.num(row, 3, k.PerBatch.InexactFloat64(), st.money)
		g.num(row, 4, k.OneTime.InexactFloat64(), st.money)
		g.num(row, 5, k.Total.InexactFloat64(), st.money)
		g.num(row, 6, k.PerGram, st.perGram)
		g.num(row, 7, k.WorkingDays, st.hours)
		g.num(row, 8, k.PersonDays, st.hours)
		g.num(row, 9, k.OccupiedH, st.hours)
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
		mergedCell(g, row, 2, 9, cell{value: notFeasible(why), style: st.wrap, wrap: true})
	}
	mp := c.Map
	row += 2
	g.set(row, 1, cell{value: "Cheapest method per gram over a campaign: crude per batch (rows) × number of batches (columns)", style: st.heading, spill: true})
	row++
	g.text(row, 1, "Crude per batch, g", st.header)
	for k, n := range mp.Batches {
		label := fmt.Sprintf("%d batches", n)
		if n == 1 {
			label = "1 batch"
		}
		g.text(row, k+2, label, st.headerRight)
	}
	for i, kg := range mp.MassesKg {
		row++
		g.num(row, 1, kg*1000, st.figure)
		for k := range mp.Batches {
			w := mp.Winner[i][k]
			if w == "" {
				w = "none feasible"
			}
			g.text(row, k+2, w, st.text)
		}
	}
	for name := range mp.Payback {
		methods = append(methods, name)
	}
	sort.Strings(methods)
	if len(methods) == 0 {
		return 0, 0, nil
	}
	row += 2
	g.set(row, 1, cell{value: "Batches after which developing the method pays back against chromatography", style: st.heading, spill: true})
	row++
	g.text(row, 1, "Crude per batch, g", st.header)
	for k, name := range methods {
		g.text(row, k+2, capitalize(name), st.headerRight)
	}
	first = row + 1
	for i, kg := range mp.MassesKg {
		row++
		g.num(row, 1, kg*1000, st.figure)
		for k, name := range methods {
			if n := mp.Payback[name][i]; n > 0 {
				g.num(row, k+2, float64(n), st.general)
			}
		}
	}
	g.set(row+1, 1, cell{value: "Above the curve (more batches than shown at that batch mass) the developed method is cheaper per gram over the campaign; below it, columns are. An empty cell: it never pays back at that batch mass (or cannot run there).", style: st.note, spill: true})
	return first, row, methods
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
