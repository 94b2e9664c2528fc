package workbook

import (
	"fmt"
	"io"
	"math"
	"unicode/utf8"

	"github.com/shopspring/decimal"
	"github.com/xuri/excelize/v2"
)

// Cell is one cell of a plain table sheet: text, a number, or money; a
// formula may stand with its cached value.
type Cell struct {
	Text    string
	Num     float64
	IsNum   bool
	Money   bool   // a currency amount (Num holds it)
	Formula string // e.g. "SUM(F2:F9)"; the cached value is Num
	Bold    bool
}

// Text, Num and Money build cells.
func Text(s string) Cell { return Cell{Text: s} }

// Num is a plain number cell; NaN and ±Inf become "n/a" (never a NaN cell).
func Num(v float64) Cell {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return Cell{Text: "n/a"}
	}
	return Cell{Num: v, IsNum: true}
}

// Money is a currency cell holding an exact decimal amount.
func Money(d decimal.Decimal) Cell { return Cell{Num: d.InexactFloat64(), IsNum: true, Money: true} }

// Table is one plain sheet: a title, a header row and rows, then notes,
// with an optional bar chart beside it.
type Table struct {
	Name   string
	Title  string
	Header []string
	Rows   [][]Cell
	Notes  []string
	Chart  *TableChart
}

// TableChart is a bar chart of one numeric column of a table against the
// labels of another, over the first N rows (a total row below them is
// left out).
type TableChart struct {
	Title          string
	LabelCol, Col  int // 1-based columns of the labels and of the values
	N              int // data rows charted
	ValueAxisTitle string
}

// tableWrap is the widest column of a plain table sheet, in characters;
// longer text wraps.
const tableWrap = 36

// WriteTables writes plain table sheets (for the waste export and the
// year's plan) with currency formats, fitted column widths and a frozen
// header, and fixed document properties.
func WriteTables(w io.Writer, currency string, places int32, tables []Table) error {
	f := excelize.NewFile()
	defer f.Close()
	if err := f.SetDocProps(&excelize.DocProperties{Creator: docCreator, Created: docTime, Modified: docTime, LastModifiedBy: docCreator}); err != nil {
		return err
	}
	moneyFmt := currencyFormat(currency, places, "")
	top := &excelize.Alignment{Vertical: "top"}
	styles := map[string]int{}
	for name, s := range map[string]*excelize.Style{
		"title":  {Font: &excelize.Font{Bold: true, Size: 14}},
		"header": {Font: &excelize.Font{Bold: true}, Border: []excelize.Border{{Type: "bottom", Color: "000000", Style: 1}}, Alignment: &excelize.Alignment{WrapText: true, Vertical: "bottom"}},
		"num":    {CustomNumFmt: &[]string{sig3}[0], Alignment: top},
		"money":  {CustomNumFmt: &moneyFmt, Alignment: top},
		"bold":   {Font: &excelize.Font{Bold: true}, Alignment: top},
		"text":   {Alignment: top},
		"moneyB": {CustomNumFmt: &moneyFmt, Font: &excelize.Font{Bold: true}, Alignment: top},
		"wrap":   {Alignment: &excelize.Alignment{WrapText: true, Vertical: "top"}},
	} {
		id, err := f.NewStyle(s)
		if err != nil {
			return err
		}
		styles[name] = id
	}
	for k, t := range tables {
		if k == 0 {
			if err := f.SetSheetName("Sheet1", t.Name); err != nil {
				return err
			}
		} else if _, err := f.NewSheet(t.Name); err != nil {
			return err
		}
		if err := pageSetup(f, t.Name, t.Title, false); err != nil {
			return err
		}
		if err := printTitles(f, t.Name, 2); err != nil {
			return err
		}
		sw, err := f.NewStreamWriter(t.Name)
		if err != nil {
			return err
		}
		if err := tableChart(f, t); err != nil {
			return err
		}
		widths := make([]int, len(t.Header))
		for i, h := range t.Header {
			widths[i] = utf8.RuneCountInString(h)
		}
		for _, row := range t.Rows {
			for i, c := range row {
				if i < len(widths) {
					n := utf8.RuneCountInString(c.Text)
					if c.IsNum {
						n = 14
					}
					widths[i] = max(widths[i], min(n, tableWrap))
				}
			}
		}
		for i, wd := range widths {
			if err := sw.SetColWidth(i+1, i+1, float64(wd+2)); err != nil {
				return err
			}
		}
		if err := sw.SetPanes(&excelize.Panes{Freeze: true, YSplit: 2, TopLeftCell: "A3", ActivePane: "bottomLeft"}); err != nil {
			return err
		}
		if err := sw.SetRow("A1", []any{excelize.Cell{Value: t.Title, StyleID: styles["title"]}}); err != nil {
			return err
		}
		head := make([]any, len(t.Header))
		for i, h := range t.Header {
			head[i] = excelize.Cell{Value: h, StyleID: styles["header"]}
		}
		if err := sw.SetRow("A2", head); err != nil {
			return err
		}
		r := 3
		for _, row := range t.Rows {
			cells := make([]any, len(row))
			lines := 1
			for i, c := range row {
				x := tableCell(c, styles)
				if !c.IsNum && i < len(widths) && utf8.RuneCountInString(c.Text) > widths[i] {
					// Long text wraps in its column, so that the sheet
					// prints one page wide at a readable scale.
					x.StyleID = styles["wrap"]
					lines = max(lines, wrappedLines(c.Text, float64(widths[i]+2)))
				}
				cells[i] = x
			}
			ref, _ := excelize.CoordinatesToCellName(1, r)
			var opts []excelize.RowOpts
			if lines > 1 {
				opts = append(opts, excelize.RowOpts{Height: math.Min(lineHeight*float64(lines), excelize.MaxRowHeight)})
			}
			if err := sw.SetRow(ref, cells, opts...); err != nil {
				return err
			}
			r++
		}
		r++
		total := 0.0
		for _, wd := range widths {
			total += float64(wd + 2)
		}
		for _, n := range t.Notes {
			// A note spans the table's width, wrapped, its row as tall as
			// its lines.
			ref, _ := excelize.CoordinatesToCellName(1, r)
			h := math.Min(lineHeight*float64(wrappedLines(n, total)), excelize.MaxRowHeight)
			if err := sw.SetRow(ref, []any{excelize.Cell{Value: n, StyleID: styles["wrap"]}}, excelize.RowOpts{Height: h}); err != nil {
				return err
			}
			if len(widths) > 1 {
				last, _ := excelize.CoordinatesToCellName(len(widths), r)
				if err := sw.MergeCell(ref, last); err != nil {
					return err
				}
			}
			r++
		}
		if err := sw.Flush(); err != nil {
			return fmt.Errorf("workbook: %s: %w", t.Name, err)
		}
	}
	f.SetActiveSheet(0)
	if err := f.SetCalcProps(&excelize.CalcPropsOptions{FullCalcOnLoad: &[]bool{true}[0]}); err != nil {
		return err
	}
	return writePackage(f, w)
}

func tableCell(c Cell, styles map[string]int) excelize.Cell {
	style := 0
	switch {
	case c.Money && c.Bold:
		style = styles["moneyB"]
	case c.Money:
		style = styles["money"]
	case c.IsNum:
		style = styles["num"]
	case c.Bold:
		style = styles["bold"]
	default:
		style = styles["text"]
	}
	if !c.IsNum {
		return excelize.Cell{Value: c.Text, StyleID: style}
	}
	return excelize.Cell{Value: round15(c.Num), Formula: c.Formula, StyleID: style}
}

// tableChart adds the table's bar chart, if it has one with rows to
// chart, below the table and its notes, so that the sheet prints no wider.
func tableChart(f *excelize.File, t Table) error {
	c := t.Chart
	if c == nil || c.N <= 0 {
		return nil
	}
	rng := func(col int) string { return sheetRef(t.Name, absName(col, 3)+":"+absName(col, 2+c.N)) }
	run := func(s string) excelize.ChartTitle {
		return excelize.ChartTitle{Paragraph: []excelize.RichTextRun{{Text: s, Font: &excelize.Font{Size: 10, Color: "262626"}}}}
	}
	ch := &excelize.Chart{
		Type:      excelize.Bar,
		Series:    []excelize.ChartSeries{{Name: sheetRef(t.Name, absName(c.Col, 2)), Categories: rng(c.LabelCol), Values: rng(c.Col)}},
		Title:     run(c.Title),
		XAxis:     excelize.ChartAxis{Font: axisFont},
		YAxis:     excelize.ChartAxis{MajorGridLines: true, Title: run(c.ValueAxisTitle), Font: axisFont},
		Legend:    excelize.ChartLegend{Position: "none"},
		Dimension: excelize.ChartDimension{Width: 480, Height: uint(max(240, 40+24*c.N))},
		Format:    excelize.GraphicOptions{AltText: c.Title},
	}
	below := 3 + len(t.Rows) + 1 + len(t.Notes) + 1
	if err := f.AddChart(t.Name, cellName(1, below), ch); err != nil {
		return fmt.Errorf("workbook: %s: chart: %w", t.Name, err)
	}
	return nil
}
