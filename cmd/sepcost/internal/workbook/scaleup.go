package workbook

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"github.com/shopspring/decimal"
	"github.com/xuri/excelize/v2"

	"sepcost/costing/ledger"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale"
)

// Scale-up sheet columns. Rows run method by method and, within a method,
// mass by mass, so that each method's curve is one contiguous range a
// chart series can refer to.
const (
	suMass      = iota + 1 // crude mass, g
	suMethod               // method name; the charts' series names refer to it
	suFeasible             // "feasible" or "not feasible: reason"
	suTotal                // total cost, currency
	suPerGram              // cost per gram of purified product
	suProduct              // purified product, g
	suSolvent              // solvent, L
	suWaste                // waste, kg
	suEFactor              // waste per product, kg/kg
	suPMI                  // process mass intensity, kg/kg
	suElapsed              // hours elapsed
	suAttended             // hours hands-on
	suEquipment            // equipment in words
	suFirstQty             // first ledger quantity column (without detail sheets)
)

// Scale-up sheet rows and chart geometry.
const (
	suTitleRow  = 1
	suChartRow  = 5   // charts' top row
	suChartW    = 560 // chart width, px
	suChartH    = 340 // chart height, px: 17 rows of the default 20 px
	suChartGap  = 16  // px between charts
	suNoteRow   = 24  // above the header: what the quantity columns are
	suHeaderRow = 25
	suFirstRow  = suHeaderRow + 1
	suHeaderMax = 16.0 // header cells wrap beyond this many characters
	pxPerChar   = 8.0  // excelize's column width to pixels (convertColWidthToPixels)
)

// qtyCol is one ledger line shared by the results of the sweep, shown as
// the quantity billed in its price's unit.
type qtyCol struct {
	item     string
	label    string
	unit     string
	priceRow int
	col      int
	name     string // column letters
	tail     string // "*Prices!$C$n,places)": the part of its ROUND term after the quantity cell
}

// writeScaleUp streams the Scale-up sheet of a sweep: a title, the charts,
// then one row per method and batch mass with the figures of scale.Row.
//
// Total cost is live wherever it can be. With detail sheets it refers to
// the method sheet's TOTAL; without them the row carries the quantity of
// every ledger line in the price's unit and the total is the ledger's own
// rule written as a formula,
//
//	total = Σ_k ROUND(q_k × Prices!$C$n_k, places)
//
// (q_k the quantity of line k, Prices!$C$n_k its unit price, places the
// currency's minor unit), so an edit on the Prices sheet moves every
// total, cost per gram and chart point. Both carry the ledger total as
// their cached value. Cost per gram is the formula
//
//	c = total / m_out
//
// with m_out the purified product in g. A figure that is not a finite
// number is "n/a", or an empty cell in the columns the charts plot, which
// also stay empty where a method is not feasible so that its curve has a
// gap there. No formula here sums a range.
//
// The sheet is written straight to excelize's StreamWriter in two passes
// over the rows, the first for the column widths, so that the memory used
// does not grow with the number of masses beyond the report itself.
func writeScaleUp(f *excelize.File, st *styles, r *scale.Report, m money, methods []methodOut, details bool, bands *bandRefs, lay *layout, omit bool) error {
	rows := r.Rows()
	nm := len(r.Methods)
	if len(rows) != len(r.MassesKg)*nm {
		return fmt.Errorf("workbook: %s: the report gives %d rows for %d masses and %d methods", sheetScaleUp, len(rows), len(r.MassesKg), nm)
	}
	at := func(i, j int) *scale.Row { return &rows[i*nm+j] }

	var qty []*qtyCol
	var lineCols [][]int    // per result (i·nm + j), the quantity column of each ledger line
	var lineQty [][]qtyCell // per result, the quantity of each ledger line as written
	if !details {
		var err error
		if qty, lineCols, lineQty, err = quantityColumns(r, m); err != nil {
			return err
		}
	}
	lastCol := suEquipment + len(qty)

	// Pass 1: column widths, and whether each plotted figure is positive
	// throughout, which a logarithmic axis needs.
	head := scaleUpHeader(m, qty)
	p1 := scaleUpPass1(st, r, methods, rows, qty, head, lastCol)
	widths, totals, positive, points, plotted := p1.widths, p1.totals, p1.positive, p1.points, p1.plotted

	// Printed landscape, one page wide: the three charts side by side.
	// The sheet properties are written when the stream starts, so they
	// come first.
	if err := pageSetup(f, sheetScaleUp, r.Title, false); err != nil {
		return err
	}
	sw, err := f.NewStreamWriter(sheetScaleUp)
	if err != nil {
		return fmt.Errorf("workbook: sheet %s: %w", sheetScaleUp, err)
	}
	if err := setWidths(sw, sheetScaleUp, widths); err != nil {
		return err
	}

	// Charts before the rows and before Flush (DEVELOPERS.md, "Library notes").
	n := len(r.MassesKg)
	block := func(j int) (first, last int) { first = suFirstRow + j*n; return first, first + n - 1 }
	if err := addScaleUpCharts(f, r, m, widths, block, plotted, points, positive, bands); err != nil {
		return err
	}

	// Pass 2: the rows.
	if err := scaleUpHead(sw, st, r, m, details, len(qty) > 0, head, widths, lastCol); err != nil {
		return err
	}

	rw := newRowWriter(st, omit, lastCol)
	totalCol, productCol := colName(suTotal), colName(suProduct)
	for j := range r.Methods {
		first, _ := block(j)
		name := any(methods[j].sheet) // boxed once for all its rows
		var reason, equipment boxedText
		for i := range r.MassesKg {
			row := at(i, j)
			k := first + i
			rw.reset(k)
			rw.num(suMass, row.CrudeKg*1000, st.figure, false)
			rw.put(suMethod, excelize.Cell{StyleID: st.textIndent, Value: name}) // set off from the mass on its left
			if !row.Feasible {
				rw.put(suFeasible, excelize.Cell{StyleID: st.text, Value: reason.of(row.Reason, notFeasible)})
				if err := rw.write(sw); err != nil {
					return err
				}
				continue
			}
			rw.put(suFeasible, excelize.Cell{StyleID: st.text, Value: "feasible"}) // a constant: no box allocated
			total := totals[i*nm+j]
			switch {
			case details && methods[j].mass[i].totalRef != "":
				rw.formula(suTotal, sheetRef(methods[j].sheet, methods[j].mass[i].totalRef), total, st.money)
				if lay != nil {
					lay.add(sheetScaleUp, cellName(suTotal, k), row.Total, "scale-up total")
				}
			case !details && len(lineCols[i*nm+j]) > 0:
				cols := lineCols[i*nm+j]
				rw.formula(suTotal, roundSum(&rw.buf, k, cols, qty), total, st.money)
				if lay != nil {
					lay.add(sheetScaleUp, cellName(suTotal, k), row.Total, "scale-up total")
				}
				for n, q := range lineQty[i*nm+j] {
					rw.qty(cols[n], q, st.general)
				}
			default:
				rw.num(suTotal, total, st.money, true)
			}
			if pg := perGramValue(row); finite(pg) {
				rw.buf = append(rw.buf[:0], totalCol...)
				rw.buf = strconv.AppendInt(rw.buf, int64(k), 10)
				rw.buf = append(rw.buf, '/')
				rw.buf = append(rw.buf, productCol...)
				rw.buf = strconv.AppendInt(rw.buf, int64(k), 10)
				rw.formula(suPerGram, string(rw.buf), pg, st.perGram)
			}
			rw.num(suProduct, row.ProductKg*1000, st.figure, true)
			rw.num(suSolvent, row.SolventL, st.litres, true)
			rw.num(suWaste, row.WasteKg, st.kg, true)
			rw.num(suEFactor, row.EFactor, st.figure, false)
			rw.num(suPMI, row.PMI, st.figure, true)
			rw.num(suElapsed, row.HoursElapsed, st.hours, false)
			rw.num(suAttended, row.HoursAttended, st.hours, true)
			if row.Equipment != "" {
				rw.put(suEquipment, excelize.Cell{StyleID: st.textIndent, Value: equipment.of(row.Equipment, nil)}) // set off from the hours on its left
			}
			if err := rw.write(sw); err != nil {
				return err
			}
		}
	}
	if err := sw.Flush(); err != nil {
		return fmt.Errorf("workbook: sheet %s: %w", sheetScaleUp, err)
	}
	// Print the charts and the table up to Equipment, the header row on
	// every page; the quantity columns serve the formulas.
	lastRow := suFirstRow + nm*n - 1
	for _, dn := range []excelize.DefinedName{
		{Name: "_xlnm.Print_Area", RefersTo: sheetRef(sheetScaleUp, absName(1, 1)+":"+absName(suEquipment, lastRow)), Scope: sheetScaleUp},
		{Name: "_xlnm.Print_Titles", RefersTo: sheetRef(sheetScaleUp, fmt.Sprintf("$%d:$%d", suHeaderRow, suHeaderRow)), Scope: sheetScaleUp},
	} {
		if err := f.SetDefinedName(&dn); err != nil {
			return fmt.Errorf("workbook: sheet %s: %s: %w", sheetScaleUp, dn.Name, err)
		}
	}
	return nil
}

// perGramValue is the cost per gram the sheet shows: the report's value
// where the purified product is a positive finite mass, NaN otherwise.
func perGramValue(row *scale.Row) float64 {
	if !(row.ProductKg > 0) || !finite(row.ProductKg*1000) {
		return math.NaN()
	}
	return row.PerGram
}

// scaleUpHeader is the header row.
func scaleUpHeader(m money, qty []*qtyCol) []string {
	head := []string{
		"Crude mass (g)", "Method", "Feasible", "Total cost (" + m.currency + ")",
		"Cost per gram of purified product (" + m.currency + "/g)", "Purified product (g)", "Solvent (L)",
		"Waste (kg)", "Waste per product, E-factor (kg/kg)", "Process mass intensity, PMI (kg/kg)",
		"Elapsed (h)", "Hands-on (h)", "Equipment",
	}
	for _, q := range qty {
		head = append(head, q.item+" ("+q.unit+"): "+q.label)
	}
	return head
}

// lineID identifies a ledger line across results; rep counts earlier
// lines of the same ledger with the same group, item and label, so that a
// ledger billing an item twice for one purpose keeps both lines.
type lineID struct {
	group       usage.Group
	item, label string
	rep         int
	priceRow    int // a price band of its own is a column of its own
}

// quantityColumns gathers the ledger lines of every feasible result, in
// usage.Groups order and first-seen order within a group, as quantity
// columns, each with the tail of its ROUND term, and gives for each result
// (index i·methods + j) the column and the quantity of each of its ledger
// lines: the rows are written from these numbers, so that a long sweep's
// results are read once (scale.Report.Each) and not held.
func quantityColumns(r *scale.Report, m money) ([]*qtyCol, [][]int, [][]qtyCell, error) {
	nm := len(r.Methods)
	cols := map[lineID]*qtyCol{}
	byGroup := map[usage.Group][]*qtyCol{}
	var order []*qtyCol // first-seen order: a column's provisional index
	idx := make([][]int, len(r.MassesKg)*nm)
	vals := make([][]qtyCell, len(r.MassesKg)*nm)
	prev := make([]ledger.Ledger, nm) // each method's last ledger, to share its list
	err := r.Each(func(i int, results []scale.Result) error {
		for j := range results {
			res := &results[j]
			if !res.Usage.Feasible {
				continue
			}
			vals[i*nm+j] = qtyCells(&res.Ledger)
			// A method's ledgers mostly bill the same lines at every mass:
			// the same list of columns then serves them all.
			if k := (i-1)*nm + j; i > 0 && idx[k] != nil && sameLines(&prev[j], &res.Ledger) {
				idx[i*nm+j] = idx[k]
				prev[j] = res.Ledger
				continue
			}
			list := make([]int, len(res.Ledger.Lines))
			for n := range res.Ledger.Lines {
				l := &res.Ledger.Lines[n]
				id := lineID{l.Demand.Group, l.Demand.Item, l.Demand.Label, 0, l.PriceRow}
				for _, e := range res.Ledger.Lines[:n] {
					if e.Demand.Group == id.group && e.Demand.Item == id.item && e.Demand.Label == id.label {
						id.rep++
					}
				}
				q := cols[id]
				if q == nil {
					label := l.Demand.Label
					if id.rep > 0 {
						label = fmt.Sprintf("%s (%d)", label, id.rep+1)
					}
					if band := bandOf(r, l.PriceRow); band != "" {
						label += " (price from " + band + ")"
					}
					q = &qtyCol{item: l.Demand.Item, label: label, unit: l.Unit, priceRow: l.PriceRow, col: len(order)}
					cols[id] = q
					order = append(order, q)
					byGroup[l.Demand.Group] = append(byGroup[l.Demand.Group], q)
				}
				if q.unit != l.Unit || q.priceRow != l.PriceRow {
					return fmt.Errorf("workbook: %s at %s: ledger line %q (%s) is priced per %q from price row %d, but elsewhere per %q from row %d",
						r.Methods[j], units.FormatMass(r.MassesKg[i]), l.Demand.Label, l.Demand.Item, l.Unit, l.PriceRow, q.unit, q.priceRow)
				}
				list[n] = q.col
			}
			idx[i*nm+j] = list
			prev[j] = res.Ledger
		}
		return nil
	})
	if err != nil {
		return nil, nil, nil, err
	}
	// Columns in usage.Groups order, then first-seen order in a group.
	var out []*qtyCol
	for _, g := range usage.Groups {
		out = append(out, byGroup[g]...)
	}
	final := make([]int, len(order))
	for k, q := range out {
		final[q.col] = suFirstQty + k
	}
	for _, q := range out {
		q.col = final[q.col]
		q.name = colName(q.col)
		q.tail = "*" + priceRef(q.priceRow) + "," + strconv.Itoa(int(m.places)) + ")"
	}
	done := map[*int]bool{} // lists shared by several results are renumbered once
	for _, list := range idx {
		if len(list) == 0 || done[&list[0]] {
			continue
		}
		done[&list[0]] = true
		for n, c := range list {
			list[n] = final[c]
		}
	}
	return out, idx, vals, nil
}

// sameLines reports whether two ledgers bill the same lines (group, item,
// label and price row: a price band) in the same order. The unit follows
// from the price row, which validate has checked against the price table.
func sameLines(a, b *ledger.Ledger) bool {
	if len(a.Lines) != len(b.Lines) {
		return false
	}
	for n := range a.Lines {
		x, y := &a.Lines[n].Demand, &b.Lines[n].Demand
		if x.Item != y.Item || x.Label != y.Label || x.Group != y.Group || a.Lines[n].PriceRow != b.Lines[n].PriceRow {
			return false
		}
	}
	return true
}

// maxFormula is the longest formula a spreadsheet cell holds (Excel's
// limit, 8,192 characters; Microsoft, "Excel specifications and limits";
// from memory).
const maxFormula = 8192

// roundSum builds the total of row k from its ledger's lines, whose
// quantities sit in columns cols (one a line):
// ROUND(N23*Prices!$C$2,2)+ROUND(O23*Prices!$C$5,2)+...
func roundSum(buf *[]byte, k int, cols []int, qty []*qtyCol) string {
	b := (*buf)[:0]
	for n := range cols {
		q := qty[cols[n]-suFirstQty]
		if n > 0 {
			b = append(b, '+')
		}
		b = append(b, "ROUND("...)
		b = append(b, q.name...)
		b = strconv.AppendInt(b, int64(k), 10)
		b = append(b, q.tail...)
	}
	*buf = b
	return string(b)
}

// boxedText keeps the last text a column showed as a cell value, so that
// rows in a run with the same words (a method's equipment, its reason for
// not being feasible) share one value rather than each wording and boxing
// its own.
type boxedText struct {
	key string
	val any
}

// of is the cell value for key: word(key), or key itself when word is nil.
func (b *boxedText) of(key string, word func(string) string) any {
	if b.val == nil || key != b.key {
		b.key = key
		if word != nil {
			b.val = word(key)
		} else {
			b.val = key
		}
	}
	return b.val
}

// rowWriter assembles one streamed row in reused slices: vals holds
// pointers into cells, so that no cell is allocated per row.
type rowWriter struct {
	st    *styles
	omit  bool
	cells []excelize.Cell
	vals  []any
	buf   []byte
	row   int
	err   error
}

func newRowWriter(st *styles, omit bool, cols int) *rowWriter {
	return &rowWriter{st: st, omit: omit, cells: make([]excelize.Cell, cols), vals: make([]any, cols)}
}

func (rw *rowWriter) reset(row int) {
	rw.row = row
	clear(rw.vals)
}

func (rw *rowWriter) put(col int, c excelize.Cell) {
	rw.cells[col-1] = c
	rw.vals[col-1] = &rw.cells[col-1]
}

// num writes v, or, where v is not a finite number, "n/a" when na is set
// and nothing otherwise (a column a chart plots: an empty cell is a gap).
func (rw *rowWriter) num(col int, v float64, style int, na bool) {
	switch {
	case finite(v):
		rw.put(col, excelize.Cell{StyleID: style, Value: round15(v)})
	case na:
		rw.put(col, excelize.Cell{StyleID: rw.st.text, Value: "n/a"})
	}
}

// dec writes a ledger decimal that fits in 15 significant digits, as
// quantities and amounts do: its nearest double already shows those
// digits, so round15 is skipped.
func (rw *rowWriter) dec(col int, d decimal.Decimal, style int) {
	rw.qty(col, qtyCellOf(d), style)
}

// qtyCell is a ledger decimal as dec writes it: v, exact to its 15
// significant digits, or (long) a value num writes.
type qtyCell struct {
	v    float64
	long bool
}

// qtyCellOf is d as dec writes it.
func qtyCellOf(d decimal.Decimal) qtyCell {
	x := smallOf(d)
	if !x.ok || x.c <= -1e15 || x.c >= 1e15 {
		return qtyCell{d.InexactFloat64(), true}
	}
	return qtyCell{x.float(d), false}
}

// qtyCells are the quantities of a ledger's lines as dec writes them.
func qtyCells(l *ledger.Ledger) []qtyCell {
	out := make([]qtyCell, len(l.Lines))
	for n := range l.Lines {
		out[n] = qtyCellOf(l.Lines[n].Qty)
	}
	return out
}

// qty writes a quantity made by qtyCellOf.
func (rw *rowWriter) qty(col int, q qtyCell, style int) {
	if q.long {
		rw.num(col, q.v, style, true)
		return
	}
	rw.put(col, excelize.Cell{StyleID: style, Value: q.v})
}

func (rw *rowWriter) formula(col int, f string, cached float64, style int) {
	if len(f) > maxFormula {
		rw.err = fmt.Errorf("workbook: sheet %s: the formula of %s has %d characters; a cell holds at most %d",
			sheetScaleUp, cellName(col, rw.row), len(f), maxFormula)
		return
	}
	c := excelize.Cell{StyleID: style, Formula: f, Value: round15(cached)}
	if rw.omit {
		c.Value = nil
	}
	rw.put(col, c)
}

func (rw *rowWriter) write(sw *excelize.StreamWriter) error {
	if rw.err != nil {
		return rw.err
	}
	if err := sw.SetRow(cellName(1, rw.row), rw.vals); err != nil {
		return fmt.Errorf("workbook: sheet %s: row %d: %w", sheetScaleUp, rw.row, err)
	}
	return nil
}

// widths fits column widths from the content, in character widths.
type widths struct {
	st     *styles
	need   []int
	maxAbs []float64
	neg    []bool
	style  []int
}

func newWidths(st *styles, cols int) *widths {
	return &widths{st: st, need: make([]int, cols+1), maxAbs: make([]float64, cols+1), neg: make([]bool, cols+1), style: make([]int, cols+1)}
}

func (w *widths) text(col, n int) { w.need[col] = max(w.need[col], n) }

// num records a number. Its shown width grows with its magnitude, so the
// width of a column is worked out once, from its largest magnitude.
func (w *widths) num(col int, v float64, style int) {
	if !finite(v) {
		w.text(col, 3) // "n/a"
		return
	}
	w.style[col] = style
	w.maxAbs[col] = math.Max(w.maxAbs[col], math.Abs(v))
	w.neg[col] = w.neg[col] || v < 0
}

// equipmentMaxWidth is the Scale-up sheet's widest Equipment column: the
// last printed column, whose words ("1000 mm steel process column, 19 cm
// bed × 9 runs; falling-film evaporator") would otherwise be cut at the
// page's edge.
const equipmentMaxWidth = 80.0

// fit gives each column its widest content plus two characters, between
// minWidth and maxWidth (equipmentMaxWidth for Equipment).
func (w *widths) fit() map[int]float64 {
	out := map[int]float64{}
	for col := 1; col < len(w.need); col++ {
		n := w.need[col]
		if w.style[col] != 0 {
			d := w.st.displayWidth(&cell{value: w.maxAbs[col], style: w.style[col]})
			if w.neg[col] {
				d++
			}
			n = max(n, d)
		}
		most := maxWidth
		if col == suEquipment {
			most = equipmentMaxWidth
		}
		out[col] = math.Min(math.Max(float64(n+2), minWidth), most)
	}
	return out
}

// colPixels is column col's width in excelize's pixel measure (width × 8
// px, truncated; its convertColWidthToPixels), which places the charts.
func colPixels(widths map[int]float64, col int) int {
	w, ok := widths[col]
	if !ok {
		return 64 // excelize's default column width in pixels (defaultColWidthPixels)
	}
	return int(w*pxPerChar + 0.5)
}

// longestWord is the length of the longest word of s.
func longestWord(s string) int {
	n := 0
	for _, w := range strings.Fields(s) {
		n = max(n, textWidth(w))
	}
	return n
}

// addScaleUpCharts adds the Scale-up sheet's three charts side by side: cost
// per gram, waste per gram (E-factor) and hours elapsed against crude
// mass, one series per method with a point in the chart.
func addScaleUpCharts(f *excelize.File, r *scale.Report, m money, widths map[int]float64, block func(int) (int, int),
	plotted [][suFirstQty]int, points [suFirstQty]int, positive [suFirstQty]bool, bands *bandRefs) error {
	specs := []chartSpec{
		{"Cost per gram of purified product", m.currency + " per g", suPerGram},
		{"Waste per gram of purified product (E-factor)", "kg waste per kg product", suEFactor},
		{"Hours elapsed", "hours", suElapsed},
	}
	var parts []string
	offset := 0 // px from the sheet's left edge to the next chart
	for _, sp := range specs {
		// A method with no point in this chart (never feasible) gets no
		// series, so that the legend names only what is drawn; a chart
		// with no point at all is left out.
		var series []int
		for j := range r.Methods {
			if plotted[j][sp.col] > 0 {
				series = append(series, j)
			}
		}
		if len(series) == 0 {
			continue
		}
		// The anchor is the column holding the offset, in excelize's pixel
		// measure of the widths (which also places the chart's far edge),
		// and the offset within it.
		col, px := 1, 0
		for px+colPixels(widths, col) <= offset {
			px += colPixels(widths, col)
			col++
		}
		ch := sp.chart(r, block, series, points[sp.col], positive[sp.col])
		if sp.col == suPerGram {
			// The P10–P90 band of the Monte Carlo draws (Uncertainty sheet).
			ch.Series = append(ch.Series, bands.series()...)
		}
		ch.Format.OffsetX = offset - px
		part, err := addChart(f, cellName(col, suChartRow), ch)
		if err != nil {
			return fmt.Errorf("workbook: sheet %s: chart %q: %w", sheetScaleUp, sp.title, err)
		}
		parts = append(parts, part)
		offset += suChartW + suChartGap
	}
	if err := logXAxes(f, parts); err != nil {
		return fmt.Errorf("workbook: sheet %s: %w", sheetScaleUp, err)
	}
	return nil
}

// scaleUpFirst is what the first pass over the Scale-up rows finds.
type scaleUpFirst struct {
	widths   map[int]float64
	totals   []float64         // the ledger totals as numbers, converted once
	positive [suFirstQty]bool  // by column: every plotted value above zero
	points   [suFirstQty]int   // by column: number of plotted values
	plotted  [][suFirstQty]int // by method and column: number of plotted values
}

// scaleUpPass1 fits the column widths to the rows and counts, per chart
// column, the values plotted and whether all are positive.
func scaleUpPass1(st *styles, r *scale.Report, methods []methodOut, rows []scale.Row, qty []*qtyCol, head []string, lastCol int) scaleUpFirst {
	nm := len(r.Methods)
	at := func(i, j int) *scale.Row { return &rows[i*nm+j] }
	w := newWidths(st, lastCol)
	for c, h := range head {
		w.text(c+1, longestWord(h))
		w.text(c+1, min(textWidth(h), int(suHeaderMax)))
	}
	for _, q := range qty {
		// Quantities are written as the ledger rounds them, a few digits
		// each; the header sets the width.
		w.text(q.col, 10)
	}
	totals := make([]float64, len(rows))   // the ledger totals as numbers, converted once
	var positive [suFirstQty]bool          // by column: every plotted value above zero
	var points [suFirstQty]int             // by column: number of plotted values
	plotted := make([][suFirstQty]int, nm) // by method and column: number of plotted values
	for _, c := range []int{suPerGram, suEFactor, suElapsed} {
		positive[c] = true
	}
	for j := range r.Methods {
		w.text(suMethod, textWidth(methods[j].sheet))
		measured := "" // the equipment last measured: a run of rows with the same words is measured once
		for i := range r.MassesKg {
			row := at(i, j)
			w.num(suMass, row.CrudeKg*1000, st.figure)
			if !row.Feasible {
				continue
			}
			totals[i*nm+j] = smallOf(row.Total).float(row.Total)
			w.num(suTotal, totals[i*nm+j], st.money)
			w.num(suPerGram, row.PerGram, st.perGram)
			w.num(suProduct, row.ProductKg*1000, st.figure)
			w.num(suSolvent, row.SolventL, st.litres)
			w.num(suWaste, row.WasteKg, st.kg)
			w.num(suEFactor, row.EFactor, st.figure)
			w.num(suPMI, row.PMI, st.figure)
			w.num(suElapsed, row.HoursElapsed, st.hours)
			w.num(suAttended, row.HoursAttended, st.hours)
			if row.Equipment != measured {
				w.text(suEquipment, textWidth(row.Equipment))
				measured = row.Equipment
			}
			plot := func(col int, v float64) {
				if finite(v) {
					points[col]++
					plotted[j][col]++
					positive[col] = positive[col] && v > 0
				}
			}
			plot(suPerGram, perGramValue(row))
			plot(suEFactor, row.EFactor)
			plot(suElapsed, row.HoursElapsed)
		}
	}
	return scaleUpFirst{w.fit(), totals, positive, points, plotted}
}

// scaleUpHead writes the Scale-up sheet's title, notes and header rows.
func scaleUpHead(sw *excelize.StreamWriter, st *styles, r *scale.Report, m money, details, hasQty bool, head []string, widths map[int]float64, lastCol int) error {
	title := "Scale-up"
	if r.Title != "" {
		title += ": " + r.Title
	}
	if err := sw.SetRow(cellName(1, suTitleRow), []any{excelize.Cell{StyleID: st.title, Value: title}}); err != nil {
		return fmt.Errorf("workbook: sheet %s: %w", sheetScaleUp, err)
	}
	notes := []string{
		"Against crude batch mass on logarithmic axes: cost per gram of purified product, waste per gram of product " +
			"(the E-factor, kg per kg) and hours elapsed. An empty cell means the method is not feasible at that mass " +
			"(or the figure is not a number); the charts leave a gap there.",
		"Total cost refers to the TOTAL on each method sheet; an edit on the Prices sheet moves it, the cost per gram and the charts.",
	}
	if !details {
		notes[1] = fmt.Sprintf("Per-mass detail sheets are omitted for a sweep of %d masses (at most %d get them). "+
			"Total cost is the sum of the rounded ledger lines, ROUND(quantity × unit price, %d), from the quantities "+
			"in the columns right of Equipment and the prices on the Prices sheet, so an edit there moves it, the cost "+
			"per gram and the charts. Run `sepcost estimate SCENARIO --mass %s` for the details at chosen masses.",
			len(r.MassesKg), MaxDetailMasses, m.places, massFlag(exampleMass(r)))
	}
	// Each note wraps across the printed columns (the print area ends at
	// Equipment), so that none is cut at the page's edge.
	width := 0.0
	for c := 1; c <= suEquipment; c++ {
		width += widths[c]
	}
	for k, s := range notes {
		row := suTitleRow + 1 + k
		h := excelize.RowOpts{Height: lineHeight * float64(wrappedLines(s, width))}
		if err := sw.SetRow(cellName(1, row), []any{excelize.Cell{StyleID: st.wrapNote, Value: s}}, h); err != nil {
			return fmt.Errorf("workbook: sheet %s: %w", sheetScaleUp, err)
		}
		if err := sw.MergeCell(cellName(1, row), cellName(suEquipment, row)); err != nil {
			return fmt.Errorf("workbook: sheet %s: merge: %w", sheetScaleUp, err)
		}
	}
	if hasQty {
		vals := make([]any, suFirstQty)
		vals[suFirstQty-1] = excelize.Cell{StyleID: st.bold, Value: "Quantities billed, in the unit of each price"}
		if err := sw.SetRow(cellName(1, suNoteRow), vals); err != nil {
			return fmt.Errorf("workbook: sheet %s: %w", sheetScaleUp, err)
		}
	}
	vals := make([]any, lastCol)
	lines := 1
	for c, h := range head {
		vals[c] = excelize.Cell{StyleID: st.header, Value: h}
		lines = max(lines, wrappedLines(h, widths[c+1]))
	}
	if err := sw.SetRow(cellName(1, suHeaderRow), vals, excelize.RowOpts{Height: lineHeight * float64(lines)}); err != nil {
		return fmt.Errorf("workbook: sheet %s: %w", sheetScaleUp, err)
	}
	return nil
}

// bandOf is the purchase from which price row i applies ("200 L") when the
// row is a band above the first of a banded item, else "".
func bandOf(r *scale.Report, i int) string {
	if r.Prices == nil || i < 0 || i >= len(r.Prices.Items) {
		return ""
	}
	return r.Prices.Items[i].From
}
