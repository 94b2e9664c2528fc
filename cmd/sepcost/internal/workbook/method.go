package workbook

import (
	"fmt"
	"strings"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/ledger"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale"
)

// Method sheet columns: four fixed columns, then a block of two columns per
// batch mass.
const (
	colTitle     = 1 // figure, item, activity or stream
	colLabel     = 2 // key, ledger label or waste class
	colUnit      = 3
	colUnitPrice = 4
	firstBlock   = 5
)

// blockCol is the first column of batch mass i's block.
func blockCol(i int) int { return firstBlock + 2*i }

// numCell is a number on a method sheet that the Summary refers to; ref is
// "" when the value is not on the sheet and is written as a plain number.
type numCell struct {
	ref string
	v   float64
	ok  bool // false: not available ("n/a")
}

// massCells are the cells of one method at one batch mass that the Summary uses.
type massCells struct {
	feasible          bool
	reason            string
	totalRef          string
	total             decimal.Decimal
	oneTimeRef        string // the "Subtotal: one-time" cell; "" when the ledger has no one-time line
	perGram, recovery numCell
	elapsed, attended numCell
	wasteKg, solventL numCell
	hasSolvent        bool
}

// methodOut is what the Summary needs from one method sheet.
type methodOut struct {
	sheet string
	mass  []massCells
}

// rowKey identifies a row shared by several batch masses; n counts repeats
// of the same name within one result so that no line is lost.
type rowKey struct {
	a, b string
	n    int
}

// keyer numbers repeated keys within one result.
type keyer map[[2]string]int

func (k keyer) key(a, b string) rowKey {
	id := [2]string{a, b}
	n := k[id]
	k[id] = n + 1
	return rowKey{a, b, n}
}

// union keeps keys in first-seen order.
type union struct {
	order []rowKey
	seen  map[rowKey]bool
}

func (u *union) add(k rowKey) bool {
	if u.seen == nil {
		u.seen = map[rowKey]bool{}
	}
	if u.seen[k] {
		return false
	}
	u.seen[k] = true
	u.order = append(u.order, k)
	return true
}

// methodSheet builds one method's sheet.
type methodSheet struct {
	g    *grid
	st   *styles
	r    *scale.Report
	m    money
	j    int
	name string
	lay  *layout
	res  []scale.Result
	out  []massCells
	row  int
	outG []int // per mass, the row of "Purified product recovered" (g)
}

func buildMethod(g *grid, st *styles, r *scale.Report, m money, j int, lay *layout) (methodOut, error) {
	ms := &methodSheet{g: g, st: st, r: r, m: m, j: j, name: g.name, lay: lay}
	err := r.Each(func(_ int, results []scale.Result) error {
		res := results[j]
		ms.res = append(ms.res, res)
		ms.out = append(ms.out, massCells{feasible: res.Usage.Feasible, reason: res.Usage.Reason})
		return nil
	})
	if err != nil {
		return methodOut{}, err
	}
	ms.head()
	if notDescribed(ms.r, ms.j) {
		// The scenario does not describe the method: a line saying so
		// rather than empty tables.
		ms.g.set(ms.row, colTitle, cell{value: "Not assessed at any batch mass: " + costing.Detail(ms.res[0].Usage.Reason) + ". Describe the method in the scenario to cost it.", style: ms.st.note, spill: true})
		return methodOut{sheet: g.name, mass: ms.out}, nil
	}
	if err := ms.figures(); err != nil {
		return methodOut{}, err
	}
	if err := ms.ledger(); err != nil {
		return methodOut{}, err
	}
	ms.time()
	ms.waste()
	ms.tables()
	ms.notes()
	return methodOut{sheet: g.name, mass: ms.out}, nil
}

func (ms *methodSheet) feasible(i int) bool { return ms.res[i].Usage.Feasible }

func (ms *methodSheet) where(i int) string {
	return fmt.Sprintf("workbook: %s at %s", ms.r.Methods[ms.j], units.FormatMass(ms.r.MassesKg[i]))
}

// head writes the title, the batch masses and each mass's status.
func (ms *methodSheet) head() {
	g, st := ms.g, ms.st
	title := ms.name
	if ms.r.Title != "" {
		title += ": " + ms.r.Title
	}
	g.set(1, 1, cell{value: title, style: st.title, spill: true})
	g.text(2, colTitle, "Batch mass (crude)", st.bold)
	g.text(3, colTitle, "Status", st.bold)
	for i, kg := range ms.r.MassesKg {
		c := blockCol(i)
		g.text(2, c, units.FormatMass(kg), st.massHeader)
		g.blank(2, c+1, st.massHeader)
		g.merge(2, c, c+1)
		status := "feasible"
		if !ms.feasible(i) {
			status = notFeasible(ms.res[i].Usage.Reason)
		}
		g.set(3, c, cell{value: status, style: st.wrap, wrap: true})
		g.merge(3, c, c+1)
	}
	g.freeze(2, 1)
	ms.row = 5
}

// section writes a bold section heading and a header row; the last
// numeric of the fixed columns hold numbers, as every block column does,
// and their headers are right-aligned over them.
func (ms *methodSheet) section(title string, fixed []string, numeric int, block [2]string) {
	g, st := ms.g, ms.st
	g.set(ms.row, 1, cell{value: title, style: st.heading, spill: true})
	ms.row++
	for c, h := range fixed {
		style := st.header
		if c >= len(fixed)-numeric {
			style = st.headerRight
		}
		g.text(ms.row, c+1, h, style)
	}
	for c := len(fixed) + 1; c < firstBlock; c++ {
		g.blank(ms.row, c, st.header)
	}
	for i := range ms.r.MassesKg { // numbers below: headers right-aligned over them
		g.text(ms.row, blockCol(i), block[0], st.headerRight)
		if block[1] == "" {
			g.blank(ms.row, blockCol(i)+1, st.header)
		} else {
			g.text(ms.row, blockCol(i)+1, block[1], st.headerRight)
		}
	}
	ms.row++
}

// figures writes the physical figures: crude, product in and out, the
// recovery as a formula
//
//	recovery = m_out / m_in
//
// (m_out purified product recovered, m_in product in the crude, both in g;
// cached from usage.Usage), then the union of the models' figures by key in
// first-seen order, each in the display unit of its first occurrence.
func (ms *methodSheet) figures() error {
	g, st := ms.g, ms.st
	ms.section("Physical figures", []string{"Figure", "Key", "Unit"}, 0, [2]string{"Value", ""})
	gram := func(kg float64) float64 { return units.MustTo(kg, "g") }
	crudeRow, inRow, outRow := ms.row, ms.row+1, ms.row+2
	recRow := ms.row + 3
	for k, label := range []string{"Crude mass", "Product in the crude", "Purified product recovered", "Recovery"} {
		g.text(ms.row+k, colTitle, label, st.text)
	}
	g.text(crudeRow, colUnit, "g", st.text)
	g.text(inRow, colUnit, "g", st.text)
	g.text(outRow, colUnit, "g", st.text)
	g.text(recRow, colUnit, "%", st.text)
	ms.outG = make([]int, len(ms.res))
	for i := range ms.res {
		if !ms.feasible(i) {
			continue
		}
		u, c := ms.res[i].Usage, blockCol(i)
		g.num(crudeRow, c, gram(u.CrudeKg), st.figure)
		g.num(inRow, c, gram(u.ProductInKg), st.figure)
		g.num(outRow, c, gram(u.ProductOutKg), st.figure)
		ms.outG[i] = outRow
		rec := u.ProductOutKg / u.ProductInKg
		if u.ProductInKg > 0 && finite(rec) && finite(u.ProductOutKg) {
			g.formula(recRow, c, cellName(c, outRow)+"/"+cellName(c, inRow), rec, st.percent)
			ms.out[i].recovery = numCell{cellName(c, recRow), rec, true}
		} else {
			g.text(recRow, c, "n/a", st.text)
		}
	}
	ms.row = recRow + 1

	var rows union
	first := map[string]usage.Figure{}
	for i, res := range ms.res {
		if !ms.feasible(i) {
			continue
		}
		for _, f := range res.Usage.Figures {
			if rows.add(rowKey{a: string(f.Key)}) {
				first[string(f.Key)] = f
			}
		}
	}
	for _, k := range rows.order {
		f0 := first[k.a]
		// Wrapped: a long label would otherwise run under the key beside it.
		g.set(ms.row, colTitle, cell{value: f0.Label, style: st.wrap, wrap: true})
		g.text(ms.row, colLabel, string(f0.Key), st.text)
		g.text(ms.row, colUnit, unitLabel(f0.Unit), st.text)
		for i, res := range ms.res {
			if !ms.feasible(i) {
				continue
			}
			f, ok := res.Usage.Figure(usage.FigureKey(k.a))
			if !ok {
				continue
			}
			v := f.SI
			if f0.Unit != "" {
				var err error
				if v, err = units.To(f.SI, f0.Unit); err != nil {
					return fmt.Errorf("%s: figure %q: display unit: %w", ms.where(i), f.Key, err)
				}
			}
			c := blockCol(i)
			g.num(ms.row, c, v, st.figure)
			if usage.FigureKey(k.a) == solventFigure {
				ms.out[i].hasSolvent = true
				if l, err := units.To(f.SI, "L"); err == nil && finite(l) && finite(v) {
					ref := ""
					if f0.Unit == "L" {
						ref = cellName(c, ms.row)
					}
					ms.out[i].solventL = numCell{ref, l, true}
				}
			}
		}
		ms.row++
	}
	ms.row++
	return nil
}

// solventFigure is the usage figure with the total solvent volume, if a model provides it.
const solventFigure = usage.FigSolventTotal

// ledgerRow is one row of the bill: the same item and label at every mass.
type ledgerRow struct {
	key      rowKey
	group    usage.Group
	unit     string
	priceRow int
	band     string // the price band, "" when the item has one price line
}

// ledger writes the bill of materials and costs, grouped in usage.Groups
// order: one row per (group, item, label) in first-seen order across the
// masses, a subtotal per group, the TOTAL as the SUM of the line costs
// (cached: ledger.Ledger.Total) and the cost per gram
//
//	c = TOTAL / m_out
//
// with c in currency per g, TOTAL in currency and m_out the purified
// product recovered in g (the "Purified product recovered" cell); "n/a"
// where m_out is not positive.
func (ms *methodSheet) ledger() error {
	g, st := ms.g, ms.st
	ms.section("Bill of materials and costs", []string{"Item", "Label", "Unit", "Unit price"}, 1, [2]string{"Qty", "Cost"})

	byGroup := map[usage.Group][]*ledgerRow{}
	rows := map[[3]any]*ledgerRow{}
	lines := make([]map[*ledgerRow]ledger.Line, len(ms.res))
	for i, res := range ms.res {
		if !ms.feasible(i) {
			continue
		}
		lines[i] = map[*ledgerRow]ledger.Line{}
		kr := map[usage.Group]keyer{}
		for _, line := range res.Ledger.Lines {
			d := line.Demand
			if kr[d.Group] == nil {
				kr[d.Group] = keyer{}
			}
			k := kr[d.Group].key(d.Item, d.Label)
			// A price band is a price row of its own: a line priced from
			// another band at another mass gets its own row.
			id := [3]any{d.Group, k, line.PriceRow}
			lr := rows[id]
			if lr == nil {
				lr = &ledgerRow{key: k, group: d.Group, unit: line.Unit, priceRow: line.PriceRow, band: line.Band}
				rows[id] = lr
				byGroup[d.Group] = append(byGroup[d.Group], lr)
			}
			if lr.unit != line.Unit || lr.priceRow != line.PriceRow {
				return fmt.Errorf("%s: ledger line %q (%s) is priced per %q from price row %d, but at another mass per %q from row %d",
					ms.where(i), d.Label, d.Item, line.Unit, line.PriceRow, lr.unit, lr.priceRow)
			}
			lines[i][lr] = line
		}
	}

	places := ms.m.places
	var ranges [][2]int
	for _, grp := range usage.Groups {
		list := byGroup[grp]
		if len(list) == 0 {
			continue
		}
		g.text(ms.row, colTitle, capitalize(string(grp)), st.bold)
		ms.row++
		first := ms.row
		sums := make([]decimal.Decimal, len(ms.res))
		for _, lr := range list {
			row := ms.row
			g.text(row, colTitle, lr.key.a, st.text)
			label := lr.key.b
			if lr.band != "" {
				label += " (price band " + lr.band + ")"
			}
			g.text(row, colLabel, label, st.text)
			g.text(row, colUnit, lr.unit, st.text)
			price := ms.r.Prices.Items[lr.priceRow].Price
			g.formula(row, colUnitPrice, priceRef(lr.priceRow), price.InexactFloat64(), st.priceStyle(price))
			ms.lay.add(ms.name, cellName(colUnitPrice, row), price, "unit price")
			for i := range ms.res {
				line, ok := lines[i][lr]
				if !ok {
					continue
				}
				q, c := blockCol(i), blockCol(i)+1
				g.num(row, q, line.Qty.InexactFloat64(), st.figure) // the cell keeps every priced digit; the format shows about three significant figures
				f := fmt.Sprintf("ROUND(%s*%s,%d)", cellName(q, row), absName(colUnitPrice, row), places)
				g.formula(row, c, f, line.Amount.InexactFloat64(), st.money)
				ms.lay.add(ms.name, cellName(c, row), line.Amount, "line")
				sums[i] = sums[i].Add(line.Amount)
			}
			ms.row++
		}
		last := ms.row - 1
		g.text(ms.row, colTitle, "Subtotal: "+string(grp), st.bold)
		for i := range ms.res {
			if !ms.feasible(i) {
				continue
			}
			c := blockCol(i) + 1
			g.formula(ms.row, c, fmt.Sprintf("SUM(%s:%s)", cellName(c, first), cellName(c, last)), sums[i].InexactFloat64(), st.money)
			ms.lay.add(ms.name, cellName(c, ms.row), sums[i], "subtotal")
			if grp == usage.OneTime {
				ms.out[i].oneTimeRef = cellName(c, ms.row)
			}
		}
		ranges = append(ranges, [2]int{first, last})
		ms.row++
	}

	totalRow := ms.row
	g.text(totalRow, colTitle, "TOTAL", st.bold)
	g.text(totalRow, colUnit, ms.m.currency, st.bold)
	perRow := totalRow + 1
	g.text(perRow, colTitle, "Cost per gram of purified product", st.bold)
	g.text(perRow, colUnit, ms.m.currency+"/g", st.text)
	for i, res := range ms.res {
		c := blockCol(i) + 1
		if !ms.feasible(i) {
			g.text(totalRow, c, res.Status().Words(), st.bold)
			continue
		}
		total := res.Ledger.Total
		ref := cellName(c, totalRow)
		if len(ranges) == 0 {
			g.num(totalRow, c, total.InexactFloat64(), st.moneyBold)
		} else {
			parts := make([]string, len(ranges))
			for k, rg := range ranges {
				parts[k] = cellName(c, rg[0]) + ":" + cellName(c, rg[1])
			}
			g.formula(totalRow, c, "SUM("+strings.Join(parts, ",")+")", total.InexactFloat64(), st.moneyBold)
		}
		ms.lay.add(ms.name, ref, total, "total")
		ms.out[i].totalRef, ms.out[i].total = ref, total

		outG := units.MustTo(res.Usage.ProductOutKg, "g")
		per := total.InexactFloat64() / outG
		if outG > 0 && finite(per) {
			g.formula(perRow, c, ref+"/"+cellName(blockCol(i), ms.outG[i]), per, st.perGram)
			ms.out[i].perGram = numCell{cellName(c, perRow), per, true}
		} else {
			g.text(perRow, c, "n/a", st.text)
		}
	}
	ms.row = perRow + 2
	return nil
}

// notDescribedMethods marks the methods the scenario does not describe:
// not assessed at any batch mass (costing.StatusNotAssessed). Tables of
// streams and metrics leave them out and say so in one line
// (notDescribedLine).
func notDescribedMethods(r *scale.Report) []bool {
	skip := make([]bool, len(r.Methods))
	for j := range r.Methods {
		skip[j] = notDescribed(r, j)
	}
	return skip
}

// notDescribed reports whether method j is not assessed at any batch mass
// (costing.StatusNotAssessed: the scenario does not describe it); its
// sheet then holds one line instead of tables.
func notDescribed(r *scale.Report, j int) bool {
	for i := range r.MassesKg {
		if row := r.RowAt(i, j); costing.StatusOf(row.Feasible, row.Reason) != costing.StatusNotAssessed {
			return false
		}
	}
	return len(r.MassesKg) > 0
}

// notDescribedLine is the line under a table that left out the methods
// skip marks, with their reason at the first mass; "" when none.
func notDescribedLine(r *scale.Report, skip []bool) string {
	var parts []string
	for j, m := range r.Methods {
		if skip[j] {
			parts = append(parts, m+" ("+costing.Detail(r.RowAt(0, j).Reason)+")")
		}
	}
	if len(parts) == 0 {
		return ""
	}
	return "Not assessed, so not in the table: " + strings.Join(parts, "; ") + "."
}
