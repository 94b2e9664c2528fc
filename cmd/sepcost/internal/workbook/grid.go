package workbook

import (
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"github.com/xuri/excelize/v2"
)

// Layout constants for every sheet.
const (
	lineHeight = 15.0 // points per text line in the default 11 pt font (excelize's default row height)
	minWidth   = 8.0  // narrowest fitted column, in character widths
	maxWidth   = 60.0 // widest fitted column; longer text wraps or spills
)

// cell is one cell to be written: a plain value, or a formula with the
// value it is expected to show.
type cell struct {
	value   any    // string or float64; the cached result for a formula
	formula string // without the leading "="; "" for a plain value
	style   int
	wrap    bool // wrapped text: sets the row height, counts at most maxWidth for the column
	spill   bool // text that may run over empty neighbours: not used to fit widths
	small   bool // wrapped text in the 9 pt font (wrapSmall): more characters to a line
	used    bool // set by grid.set: the cell is written
}

type merge struct{ row, first, last int }

// grid is one sheet held in memory so that column widths and row heights
// can be fitted to the content before the StreamWriter writes it.
type grid struct {
	name       string
	cells      [][]cell // [row−1][column−1]; a row as long as its last cell set
	maxRow     int
	maxCol     int // the last column set in any row: the room a new row is given
	merges     []merge
	byRow      [][]merge // merges filed by row (indexMerges), for the rows up to maxRow
	indexed    int       // how many merges byRow holds
	freezeRows int
	freezeCols int
	widths     map[int]float64 // widths fixed by the sheet's builder
	minWidths  map[int]float64 // widths the content may widen but not narrow
	maxWidths  map[int]float64 // widths the content may narrow but not widen (wrapped text)
	titleRows  int             // rows repeated atop every printed page; 0: the frozen rows
	onePage    bool            // print on one page, wide and tall
	printCols  int             // columns printed (the print area), 0 for all
	printRows  int             // rows printed, with printCols
	pageBreaks []int           // rows a printed page starts with
	// extra runs once the sheet's StreamWriter exists and the column
	// widths are known, before any row is written (charts are added here).
	extra func(f *excelize.File, widths map[int]float64) error
}

func newGrid(name string) *grid {
	return &grid{name: name, widths: map[int]float64{}, minWidths: map[int]float64{}, maxWidths: map[int]float64{}}
}

func (g *grid) set(row, col int, c cell) {
	for len(g.cells) < row {
		g.cells = append(g.cells, nil)
	}
	r := g.cells[row-1]
	if len(r) < col {
		r = g.widen(r, col)
		g.cells[row-1] = r
	}
	c.used = true
	r[col-1] = c
	g.maxRow = max(g.maxRow, row)
	g.maxCol = max(g.maxCol, col)
}

// reserve makes room in a row for cells up to column cols, setting none:
// for a block filled column by column, so that each row is allocated once.
func (g *grid) reserve(row, cols int) {
	for len(g.cells) < row {
		g.cells = append(g.cells, nil)
	}
	if r := g.cells[row-1]; cap(r) < cols {
		n := make([]cell, len(r), cols)
		copy(n, r)
		g.cells[row-1] = n
	}
}

// widen lengthens a row to col cells. A row that must grow is given room
// for as many columns as the widest row so far (rows of a sheet are
// mostly alike), so that a row is allocated about once rather than
// doubled cell by cell.
func (g *grid) widen(r []cell, col int) []cell {
	if col <= cap(r) {
		return r[:col] // the cells past len were never set: zero
	}
	n := make([]cell, col, max(col, g.maxCol, 2*cap(r)))
	copy(n, r)
	return n
}

// text writes a string.
func (g *grid) text(row, col int, s string, style int) {
	g.set(row, col, cell{value: s, style: style})
}

// num writes a number, or the text "n/a" when v is NaN or infinite: such a
// value must never reach a cell (DEVELOPERS.md, "Library notes").
func (g *grid) num(row, col int, v float64, style int) {
	if !finite(v) {
		g.set(row, col, cell{value: "n/a", style: style})
		return
	}
	g.set(row, col, cell{value: v, style: style})
}

// blank writes an empty cell that carries a style (a border under a header).
func (g *grid) blank(row, col, style int) {
	g.set(row, col, cell{style: style})
}

// formula writes a formula with its cached result.
func (g *grid) formula(row, col int, f string, cached any, style int) {
	g.set(row, col, cell{formula: f, value: cached, style: style})
}

func (g *grid) merge(row, first, last int) {
	g.merges = append(g.merges, merge{row, first, last})
}

func (g *grid) freeze(rows, cols int) { g.freezeRows, g.freezeCols = rows, cols }

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// round15 rounds v to 15 significant digits, the precision a spreadsheet
// keeps. excelize cuts longer numbers off instead of rounding them, so
// 0.9199999999999999 would be written as 0.919999999999999; rounded first
// it is written as 0.92. The change is below 5 parts in 10^16.
//
// With k = 14 − ⌊log10 |v|⌋ ≥ 0, the rounding is
//
//	r = round(|v| · 10^k) / 10^k
//
// in floating point where 10^k is exact (k ≤ 22) and |v| · 10^k is below
// 2^53. The product is taken with its exact error (x + δ = |v|·10^k, δ
// from a fused multiply-add), so the integer it rounds to is the one the
// exact product rounds to; that integer is held exactly and the division
// is correctly rounded, so r is the double nearest the 15-digit decimal,
// as formatting and parsing it would give, ties going to even as strconv
// rounds them. Elsewhere it formats and parses the decimal.
func round15(v float64) float64 {
	if v == 0 || !finite(v) {
		return v
	}
	a := math.Abs(v)
	// k from the binary exponent (a = f·2^b, ½ ≤ f < 1), then corrected so
	// that 10^14 ≤ a·10^k < 10^15: the 15 digits sit left of the point.
	_, b := math.Frexp(a)
	k := 14 - int(math.Floor(float64(b-1)*math.Log10E*math.Ln2))
	for range 3 {
		if k < 0 || k > 22 {
			break
		}
		p := pow10[k]
		x := a * p
		switch {
		case x >= 1e15:
			k--
			continue
		case x < 1e14:
			k++
			continue
		}
		d := math.FMA(a, p, -x) // a·p − x, exactly; |d| ≤ ulp(x)/2
		fl := math.Floor(x)
		// The exact fraction is (x − fl) + d; x − fl is exact and a
		// multiple of ulp(x), so d decides only when x − fl is ½.
		f := x - fl
		if f > 0.5 || (f == 0.5 && (d > 0 || (d == 0 && math.Mod(fl, 2) == 1))) {
			fl++ // ties to even, as strconv formats
		}
		return math.Copysign(fl/p, v)
	}
	r, err := strconv.ParseFloat(strconv.FormatFloat(v, 'g', 15, 64), 64)
	if err != nil {
		return v
	}
	return r
}

// pow10 holds the powers of ten that a double represents exactly.
var pow10 = func() [23]float64 {
	var p [23]float64
	p[0] = 1
	for i := 1; i < len(p); i++ {
		p[i] = p[i-1] * 10
	}
	return p
}()

// merged reports whether (row, col) lies in a merged range, and its width in columns.
func (g *grid) merged(row, col int) (merge, bool) {
	if len(g.merges) == 0 {
		return merge{}, false
	}
	if len(g.byRow) != g.maxRow+1 || g.indexed != len(g.merges) {
		g.indexMerges()
	}
	if row < len(g.byRow) {
		for _, m := range g.byRow[row] {
			if m.first <= col && col <= m.last {
				return m, true
			}
		}
	}
	return merge{}, false
}

// indexMerges files the merged ranges by row, so that looking a cell up
// reads its own row's ranges only.
func (g *grid) indexMerges() {
	g.byRow = make([][]merge, g.maxRow+1)
	for _, m := range g.merges {
		if m.row >= 0 && m.row < len(g.byRow) {
			g.byRow[m.row] = append(g.byRow[m.row], m)
		}
	}
	g.indexed = len(g.merges)
}

// fitWidths sets every column's width from its longest content.
func (g *grid) fitWidths(st *styles) map[int]float64 {
	need := make([]int, g.maxCol+1)
	for i, cols := range g.cells {
		row := i + 1
		for k := range cols {
			c := &cols[k]
			if !c.used || c.spill {
				continue
			}
			col := k + 1
			if _, ok := g.merged(row, col); ok {
				continue
			}
			n := st.displayWidth(c)
			if c.wrap && n > int(maxWidth) {
				n = int(maxWidth)
			}
			need[col] = max(need[col], n)
		}
	}
	out := make(map[int]float64, g.maxCol)
	for col := 1; col <= g.maxCol; col++ {
		if w, ok := g.widths[col]; ok {
			out[col] = w
			continue
		}
		w := float64(need[col] + 2)
		if m, ok := g.maxWidths[col]; ok {
			w = math.Min(w, m)
		}
		out[col] = math.Min(math.Max(math.Max(w, minWidth), g.minWidths[col]), maxWidth)
	}
	return out
}

// flush writes the grid to its sheet with a StreamWriter: widths and panes
// first, rows in ascending order, merges, then one Flush (DEVELOPERS.md, "Library notes").
// With omit set, formulas are written without their cached values.
func (g *grid) flush(f *excelize.File, st *styles, omit bool, title string) error {
	// Before the StreamWriter: it copies the sheet's page setup and
	// properties as they stand when it is made.
	if err := pageSetup(f, g.name, title, g.onePage); err != nil {
		return err
	}
	titles := g.titleRows
	if titles == 0 {
		titles = g.freezeRows
	}
	if err := printTitles(f, g.name, titles); err != nil {
		return err
	}
	for _, row := range g.pageBreaks {
		if err := f.InsertPageBreak(g.name, cellName(1, row)); err != nil {
			return fmt.Errorf("workbook: sheet %s: page break: %w", g.name, err)
		}
	}
	sw, err := f.NewStreamWriter(g.name)
	if err != nil {
		return fmt.Errorf("workbook: sheet %s: %w", g.name, err)
	}
	widths := g.fitWidths(st)
	if err := setWidths(sw, g.name, widths); err != nil {
		return err
	}
	if g.extra != nil {
		if err := g.extra(f, widths); err != nil {
			return err
		}
	}
	if g.freezeRows > 0 || g.freezeCols > 0 {
		if err := sw.SetPanes(g.panes()); err != nil {
			return fmt.Errorf("workbook: sheet %s: panes: %w", g.name, err)
		}
	}
	if err := g.writeRows(sw, widths, omit); err != nil {
		return err
	}
	for _, m := range g.merges {
		if err := sw.MergeCell(cellName(m.first, m.row), cellName(m.last, m.row)); err != nil {
			return fmt.Errorf("workbook: sheet %s: merge: %w", g.name, err)
		}
	}
	if err := sw.Flush(); err != nil {
		return fmt.Errorf("workbook: sheet %s: %w", g.name, err)
	}
	if g.printCols > 0 {
		dn := excelize.DefinedName{Name: "_xlnm.Print_Area", RefersTo: sheetRef(g.name, absName(1, 1)+":"+absName(g.printCols, g.printRows)), Scope: g.name}
		if err := f.SetDefinedName(&dn); err != nil {
			return fmt.Errorf("workbook: sheet %s: print area: %w", g.name, err)
		}
	}
	return nil
}

// writeRows streams the rows, each with the height its wrapped text needs.
// One row's cells are assembled in slices reused from row to row, handed
// to the StreamWriter as pointers (SetRow takes *excelize.Cell as it takes
// excelize.Cell), so that no cell is boxed per row; a number keeps the
// interface value it was set with unless round15 changes it.
func (g *grid) writeRows(sw *excelize.StreamWriter, widths map[int]float64, omit bool) error {
	cells := make([]excelize.Cell, g.maxCol)
	vals := make([]any, g.maxCol)
	var height [1]excelize.RowOpts
	for row := 1; row <= g.maxRow && row <= len(g.cells); row++ {
		cols := g.cells[row-1]
		if len(cols) == 0 {
			continue
		}
		vals := vals[:len(cols)]
		clear(vals)
		lines := 1
		for k := range cols {
			c := &cols[k]
			if !c.used {
				continue
			}
			col := k + 1
			x := &cells[k]
			*x = excelize.Cell{StyleID: c.style, Formula: c.formula, Value: c.value}
			if v, ok := c.value.(float64); ok {
				if !finite(v) {
					return fmt.Errorf("workbook: sheet %s: cell %s would hold %v; this is a bug in the writer", g.name, cellName(col, row), v)
				}
				if r := round15(v); r != v {
					x.Value = r
				}
			}
			if c.formula != "" && omit {
				x.Value = nil
			}
			vals[k] = x
			if s, ok := c.value.(string); ok && c.wrap {
				lines = max(lines, g.wrapLines(s, row, col, c.small, widths))
			}
		}
		opts := height[:0]
		if lines > 1 {
			// A spreadsheet row is at most 409 points high (excelize's
			// MaxRowHeight, Excel's limit); a longer text is cut there.
			height[0] = excelize.RowOpts{Height: math.Min(lineHeight*float64(lines), excelize.MaxRowHeight)}
			opts = height[:]
		}
		if err := sw.SetRow(cellName(1, row), vals, opts...); err != nil {
			return fmt.Errorf("workbook: sheet %s: row %d: %w", g.name, row, err)
		}
	}
	return nil
}

// wrapLines is the lines wrapped text s takes in its cell (row, col): the
// column's width, or the merged range's, scaled for the small font.
func (g *grid) wrapLines(s string, row, col int, small bool, widths map[int]float64) int {
	w := widths[col]
	if m, ok := g.merged(row, col); ok {
		w = 0
		for k := m.first; k <= m.last; k++ {
			w += widths[k]
		}
	}
	if small {
		w *= 11.0 / 9 // characters scale with the font size
	}
	return wrappedLines(s, w)
}

// pageSetup sets a sheet to print in landscape on A4, scaled to fit one
// page wide and as many pages down as it needs (one page with onePage), so that a wide table
// prints whole rather than split into column strips on separate pages;
// every page is headed by the sheet's name and the report's title and
// numbered "page n of m" (the &A, &P and &N fields of the header and
// footer syntax, ECMA-376 Part 1, §18.3.1.46, from memory). Call it before
// the sheet's StreamWriter is made: the writer copies the page setup as it
// stands then.
func pageSetup(f *excelize.File, sheet, title string, onePage bool) error {
	landscape, one, down, fit, a4 := "landscape", 1, 0, true, 9
	if onePage {
		down = 1
	}
	if err := f.SetPageLayout(sheet, &excelize.PageLayoutOptions{Orientation: &landscape, FitToWidth: &one, FitToHeight: &down, Size: &a4}); err != nil {
		return fmt.Errorf("workbook: sheet %s: page layout: %w", sheet, err)
	}
	if err := f.SetSheetProps(sheet, &excelize.SheetPropsOptions{FitToPage: &fit}); err != nil {
		return fmt.Errorf("workbook: sheet %s: page layout: %w", sheet, err)
	}
	narrow, edge := 0.5, 0.3 // inches: room for the header and footer lines
	if err := f.SetPageMargins(sheet, &excelize.PageLayoutMarginsOptions{Left: &narrow, Right: &narrow, Top: &narrow, Bottom: &narrow, Header: &edge, Footer: &edge}); err != nil {
		return fmt.Errorf("workbook: sheet %s: page margins: %w", sheet, err)
	}
	hf := &excelize.HeaderFooterOptions{
		OddHeader: "&L&\"-,Bold\"&A&R" + headerText(title),
		OddFooter: "&RPage &P of &N",
	}
	if err := f.SetHeaderFooter(sheet, hf); err != nil {
		return fmt.Errorf("workbook: sheet %s: header and footer: %w", sheet, err)
	}
	return nil
}

// headerText makes text safe in a header or footer, where "&" starts a
// field code ("&&" is a literal ampersand), and short enough for the
// 255-character limit of the header string.
func headerText(s string) string {
	r := []rune(s)
	if len(r) > 100 {
		s = string(r[:99]) + "…"
	}
	return strings.ReplaceAll(s, "&", "&&")
}

// printTitles repeats rows 1 to rows at the top of every printed page.
func printTitles(f *excelize.File, sheet string, rows int) error {
	if rows <= 0 {
		return nil
	}
	dn := excelize.DefinedName{Name: "_xlnm.Print_Titles", RefersTo: sheetRef(sheet, fmt.Sprintf("$1:$%d", rows)), Scope: sheet}
	if err := f.SetDefinedName(&dn); err != nil {
		return fmt.Errorf("workbook: sheet %s: print titles: %w", sheet, err)
	}
	return nil
}

// setWidths sets the column widths, one range per run of adjacent columns
// of equal width: excelize's StreamWriter looks a cell's column up among
// these ranges for every cell it writes.
func setWidths(sw *excelize.StreamWriter, sheet string, widths map[int]float64) error {
	cols := make([]int, 0, len(widths))
	for c := range widths {
		cols = append(cols, c)
	}
	sort.Ints(cols)
	for k := 0; k < len(cols); {
		first, w := cols[k], widths[cols[k]]
		last := first
		for k++; k < len(cols) && cols[k] == last+1 && widths[cols[k]] == w; k++ {
			last = cols[k]
		}
		if err := sw.SetColWidth(first, last, w); err != nil {
			return fmt.Errorf("workbook: sheet %s: column %s width: %w", sheet, colName(first), err)
		}
	}
	return nil
}

// panes freezes the first freezeRows rows and freezeCols columns.
func (g *grid) panes() *excelize.Panes {
	top := cellName(g.freezeCols+1, g.freezeRows+1)
	pane := "bottomRight"
	switch {
	case g.freezeCols == 0:
		pane = "bottomLeft"
	case g.freezeRows == 0:
		pane = "topRight"
	}
	return &excelize.Panes{
		Freeze: true, XSplit: g.freezeCols, YSplit: g.freezeRows, TopLeftCell: top, ActivePane: pane,
		Selection: []excelize.Selection{{SQRef: top, ActiveCell: top, Pane: pane}},
	}
}

// displayWidth estimates how many characters a cell shows: a text's
// longest line; a number as its style shows it (the places, thousands
// separators and suffix of fmtMeta), formatted into a buffer on the stack.
func (st *styles) displayWidth(c *cell) int {
	switch v := c.value.(type) {
	case string:
		return textWidth(v)
	case float64:
		m := st.meta[c.style]
		var buf [40]byte
		var n int
		if m.places < 0 {
			n = len(strconv.AppendFloat(buf[:0], v, 'g', 10, 64))
		} else {
			n = len(strconv.AppendFloat(buf[:0], v, 'f', m.places, 64))
		}
		if m.grouping {
			n += (intDigits(math.Abs(math.Trunc(v))) - 1) / 3
		}
		return n + m.suffix
	}
	return 0
}

// intDigits is the number of decimal digits of a whole number x ≥ 0 as
// strconv writes it in full ('f', no decimals): the smallest k with
// x < 10^k, compared with the exactly held powers of ten up to 10^22, and
// counted on the written digits above them.
func intDigits(x float64) int {
	for k := 1; k < len(pow10); k++ {
		if x < pow10[k] {
			return k
		}
	}
	var buf [400]byte
	return len(strconv.AppendFloat(buf[:0], x, 'f', 0, 64))
}
