package workbook

import (
	"fmt"
	"math"
	"sort"

	"github.com/xuri/excelize/v2"

	"sepcost/costing/units"
	"sepcost/scale"
)

// summaryChartRows is the height of the Summary's chart in rows of the
// default 20 px.
const summaryChartRows = 16

var nan = math.NaN()

// chartPlan is where the Summary's chart goes and the data it plots.
type chartPlan struct {
	top, rows, lastCol int // anchor row, height in rows, last printed column
	data               chartBlock
}

// chartBlock is the chart's data on the Summary, right of the printed
// area: crude mass in g in column massCol, one column of cost per gram per
// method (formulas on the table's cells where there is a table), rows
// first to last; then two-point blocks for the vertical marks (target
// mass, crossovers), each a column of X and one of Y.
type chartBlock struct {
	massCol, first, last int
	series               []chartSeries // one per method with a point
	marks                []chartMark
}

type chartSeries struct {
	name string
	col  int
}

type chartMark struct {
	name       string
	xCol, yCol int
	row        int // first of its two rows
	dash       excelize.LineDashType
}

// chartData writes the chart's data from column col: a heading, the crude
// mass in g and each method's cost per gram at each batch mass (a
// reference to the Summary's table, or else to the Scale-up sheet, so that
// the chart follows a price edit; empty where the method is not feasible),
// then the target mass and each crossover as a vertical line from the
// lowest to the highest cost per gram plotted.
func chartData(g *grid, st *styles, r *scale.Report, tab summaryTable, col int) chartBlock {
	b := chartBlock{massCol: col, first: 3, last: 2 + len(r.MassesKg)}
	g.set(1, col, cell{value: "Chart data (not printed)", style: st.bold, spill: true})
	g.text(2, col, "Crude mass, g", st.header)
	lo, hi := math.Inf(1), math.Inf(-1)
	for i, kg := range r.MassesKg {
		g.reserve(b.first+i, col+len(r.Methods)) // filled column by column below
		g.num(b.first+i, col, kg*1000, st.figure)
	}
	for j, meth := range r.Methods {
		c := col + 1 + len(b.series)
		points := 0
		for i := range r.MassesKg {
			pg := r.PerGramAt(i, j)
			if !finite(pg) || pg <= 0 {
				continue
			}
			points++
			lo, hi = math.Min(lo, pg), math.Max(hi, pg)
			switch ref, ok := tab.perGram[[2]int{i, j}]; {
			case ok:
				g.formula(b.first+i, c, ref, pg, st.perGram)
			case r.IsSweep:
				// The Scale-up sheet's cost per gram: row i of method j's block.
				g.formula(b.first+i, c, sheetRef(sheetScaleUp, absName(suPerGram, suFirstRow+j*len(r.MassesKg)+i)), pg, st.perGram)
			default:
				g.num(b.first+i, c, pg, st.perGram)
			}
		}
		if points == 0 {
			continue
		}
		g.text(2, c, capitalize(meth), st.header)
		b.series = append(b.series, chartSeries{capitalize(meth), c})
	}
	if len(b.series) == 0 {
		return b
	}
	row := b.last + 2
	mark := func(name string, kg float64, dash excelize.LineDashType) {
		if !(kg > 0) || !finite(kg) {
			return
		}
		g.text(row, col, name, st.bold)
		for k, y := range []float64{lo, hi} {
			g.num(row+1+k, col, kg*1000, st.figure)
			g.num(row+1+k, col+1, y, st.perGram)
		}
		b.marks = append(b.marks, chartMark{name: name, xCol: col, yCol: col + 1, row: row + 1, dash: dash})
		row += 4
	}
	mark("Target mass, "+units.FormatMass(r.TargetKg), r.TargetKg, excelize.LineDashDash)
	cross := append([]scale.Crossover(nil), r.Crossovers...)
	sort.Slice(cross, func(a, b int) bool { return cross[a].MassKg < cross[b].MassKg })
	for _, c := range cross {
		mark(fmt.Sprintf("%s overtakes %s, %s", capitalize(c.CheaperAbove), c.CheaperBelow, units.FormatMass(c.MassKg)), c.MassKg, excelize.LineDashSysDot)
	}
	return b
}

// summaryChart adds the chart of cost per gram of purified product
// against crude batch mass, both on logarithmic axes, to the Summary at
// plan.top, as wide as the printed columns: a line per method, the target
// mass as a dashed vertical line and each crossover as a dotted one.
func summaryChart(f *excelize.File, plan chartPlan, widths map[int]float64, currency string) error {
	b := plan.data
	if len(b.series) == 0 {
		return nil
	}
	ref := func(col, first, last int) string {
		return sheetRef(sheetSummary, absName(col, first)+":"+absName(col, last))
	}
	var series []excelize.ChartSeries
	for _, s := range b.series {
		series = append(series, excelize.ChartSeries{
			Name:       sheetRef(sheetSummary, absName(s.col, 2)),
			Categories: ref(b.massCol, b.first, b.last),
			Values:     ref(s.col, b.first, b.last),
			Line:       excelize.LineOptions{Type: excelize.LineSolid, Width: 2},
			Marker:     excelize.ChartMarker{Symbol: "circle", Size: 6},
		})
	}
	for _, m := range b.marks {
		series = append(series, excelize.ChartSeries{
			Name:       sheetRef(sheetSummary, absName(m.xCol, m.row-1)),
			Categories: ref(m.xCol, m.row, m.row+1),
			Values:     ref(m.yCol, m.row, m.row+1),
			Line:       excelize.LineOptions{Type: excelize.LineSolid, Dash: m.dash, Width: 1.5},
			Marker:     excelize.ChartMarker{Symbol: "none"},
		})
	}
	width := 0
	for c := 1; c <= plan.lastCol; c++ {
		width += colPixels(widths, c)
	}
	run := func(s string) excelize.ChartTitle {
		return excelize.ChartTitle{Paragraph: []excelize.RichTextRun{{Text: s, Font: &excelize.Font{Size: 10, Color: "262626"}}}}
	}
	ch := &excelize.Chart{
		Type:   excelize.Scatter,
		Series: series,
		Title:  run("Cost per gram of purified product against crude batch mass"),
		XAxis: excelize.ChartAxis{MajorGridLines: true, Title: run("Crude batch mass, g (log scale)"), Font: axisFont,
			LogBase: 10},
		YAxis:        excelize.ChartAxis{MajorGridLines: true, LogBase: 10, Title: run(currency + " per g (log scale)"), Font: axisFont},
		Legend:       excelize.ChartLegend{Position: "right"},
		ShowBlanksAs: "gap",
		Dimension:    excelize.ChartDimension{Width: uint(width), Height: uint(plan.rows * 16)},
		Format:       excelize.GraphicOptions{AltText: "Cost per gram of purified product against crude batch mass, one line per method, with the target mass and the crossovers marked"},
	}
	part, err := addChartTo(f, sheetSummary, cellName(1, plan.top), ch)
	if err != nil {
		return fmt.Errorf("workbook: sheet %s: chart: %w", sheetSummary, err)
	}
	return logXAxes(f, []string{part})
}

// sortedKeys lists a map's keys in order: a map has no order, and the
// workbook must not change between runs.
func sortedKeys(m map[string]string) []string {
	out := make([]string, 0, len(m))
	for k := range m {
		out = append(out, k)
	}
	sort.Strings(out)
	return out
}
