package workbook

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"github.com/xuri/excelize/v2"

	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/scale"
)

// gridChart is a chart anchored at a cell of the Uncertainty sheet; logX
// makes its X axis (crude mass) logarithmic, as logXAxes does.
type gridChart struct {
	cell  string
	chart *excelize.Chart
	logX  bool
}

// The Uncertainty sheet's charts stand one above the other at the top
// right, beside the bands at the target mass, so that no page break of the
// printed sheet cuts through one.
const (
	chartCol  = uLast + 2 // column of their left edge
	chartRow  = 3         // row of the first's top edge
	chartRows = 16        // rows between their top edges (a chart is suChartH px, 15 rows of 20 px)
)

// chartsOn adds the charts to the grid's sheet once its StreamWriter
// exists and before its rows (the grid's extra hook).
func chartsOn(g *grid, charts []gridChart) {
	if len(charts) == 0 {
		return
	}
	g.extra = func(f *excelize.File, _ map[int]float64) error {
		var parts []string
		for _, c := range charts {
			part, err := addChartTo(f, g.name, c.cell, c.chart)
			if err != nil {
				return fmt.Errorf("workbook: sheet %s: chart: %w", g.name, err)
			}
			if c.logX {
				parts = append(parts, part)
			}
		}
		return logXAxes(f, parts)
	}
}

// maxRanked is how many inputs the value-of-information and sensitivity
// tables list; the inputs table below them lists every one.
const maxRanked = 15

// header writes a row of column headers, the first left-aligned.
func header(g *grid, st *styles, row int, heads ...string) {
	for c, h := range heads {
		style := st.headerRight
		if c == 0 {
			style = st.header
		}
		g.set(row, c+1, cell{value: h, style: style, wrap: true})
	}
}

// uncertaintyWorth writes the value of perfect information of each input
// (scale.Uncertainty.Worth, estimated as in scale's voi.go), largest first,
// with the sentence a chemist acts on.
func uncertaintyWorth(g *grid, st *styles, u *scale.Uncertainty, row int) int {
	g.set(row, 1, cell{value: "What to measure next: the value of perfect information", style: st.heading, spill: true})
	row++
	for _, text := range u.AdviceLines(0) {
		wrapped(g, st, row, text, uLast)
		row++
	}
	if len(u.Worth) == 0 {
		return row
	}
	header(g, st, row, "Input", "Worth knowing\nbefore choosing", "Share of the\nwhole value")
	g.set(row, 4, cell{value: "What to do", style: st.headerIndent, wrap: true})
	for c := 5; c <= uLast; c++ {
		g.blank(row, c, st.header)
	}
	g.merge(row, 4, uLast)
	row++
	for k, w := range u.Worth {
		if k == maxRanked {
			break
		}
		g.set(row, 1, cell{value: u.Inputs[w.Input].Name, style: st.wrap, wrap: true})
		g.num(row, 2, w.Value, st.money)
		g.num(row, 3, w.Value/u.EVPI, st.percent)
		mergedCell(g, row, 4, uLast, cell{value: capitalize(u.Advice(w)), style: st.wrapIndent, wrap: true})
		row++
	}
	wrapped(g, st, row, fmt.Sprintf("How to read it: the figure beside an input is what the decision at %s of crude would gain, on average "+
		"over the draws, if that input alone were known exactly before choosing the method (its partial expected value of "+
		"perfect information, in %s for one batch: cost per gram × %s g of product). It is a ceiling: a real measurement "+
		"leaves some doubt and is worth less, so spend less than this on it. Inputs worth nothing would not change the choice "+
		"whatever their value. Estimated from the same draws by ordering them on the input and averaging within bins "+
		"(Strong and Oakley, Med. Decis. Making 2013, 33, 755); the whole value is E[max] − max E over the methods "+
		"(Raiffa and Schlaifer, Applied Statistical Decision Theory, 1961). A method that fails in a draw is costed as the "+
		"cheapest one that works there, so the values are lower bounds.", units.FormatMass(u.TargetKg), u.Currency, scale.Money(u.ProductG)), uLast)
	return row + 1
}

// assessed lists the methods feasible in some draw at some mass: a method
// never feasible (or not assessed) would fill its columns with n/a.
func assessed(u *scale.Uncertainty) []int {
	var out []int
	for j := range u.Bands {
		ok := u.Bands[j].Feasible > 0
		for _, mb := range u.Across {
			ok = ok || mb.Bands[j].Feasible > 0
		}
		if ok {
			out = append(out, j)
		}
	}
	return out
}

// uncertaintySensitivity writes the rank correlation of each input with
// cost per gram at the target mass, strongest first.
func uncertaintySensitivity(g *grid, st *styles, r *scale.Report, row int, charts *[]gridChart) int {
	u := r.Uncertainty
	g.set(row, 1, cell{value: "What moves the cost per gram: rank correlation with each input", style: st.heading, spill: true})
	row++
	shown := assessed(u)
	heads := []string{"Input"}
	for _, j := range shown {
		heads = append(heads, capitalize(u.Bands[j].Method))
	}
	diff := u.Leading[1] >= 0
	if diff {
		heads = append(heads, fmt.Sprintf("%s minus\n%s", capitalize(r.Methods[u.Leading[0]]), r.Methods[u.Leading[1]]))
	}
	header(g, st, row, heads...)
	row++
	first := row
	for k, s := range u.Sensitivity {
		if k == maxRanked {
			break
		}
		g.set(row, 1, cell{value: u.Inputs[s.Input].Name, style: st.wrap, wrap: true})
		for c, j := range shown {
			g.num(row, 2+c, s.Rho[j], st.ratio)
		}
		if diff {
			g.num(row, 2+len(shown), s.Decision, st.ratio)
		}
		row++
	}
	if row > first {
		col := len(heads) // the column the chart plots: the decision's (the last), else the first method's
		if !diff {
			col = 2
		}
		*charts = append(*charts, gridChart{cell: cellName(chartCol, chartRow+chartRows), chart: sensitivityChart(heads[col-1], first, row-1, col)})
	}
	wrapped(g, st, row, "Spearman's rank correlation (Spearman, Am. J. Psychol. 1904, 15, 72) between the drawn input and the cost per gram "+
		"at the target mass over the draws: +1 when the cost rises with the input in every draw, −1 when it falls, near 0 when "+
		"the input does not move it. The last column correlates the input with the difference in cost per gram between the two "+
		"methods cheapest at the nominal values, which is what decides between them. n/a: the method was not feasible in "+
		"enough draws.", uLast)
	return row + 1
}

// sensitivityChart is a bar chart of the rank correlations in column col
// of rows first..last, the inputs' names on the axis, strongest on top.
func sensitivityChart(what string, first, last, col int) *excelize.Chart {
	run := func(s string) excelize.ChartTitle {
		return excelize.ChartTitle{Paragraph: []excelize.RichTextRun{{Text: s}}}
	}
	top, bottom := 1.0, -1.0
	return &excelize.Chart{
		Type: excelize.Bar,
		Series: []excelize.ChartSeries{{
			Name:       sheetRef(sheetUncertainty, absName(col, first-1)),
			Categories: sheetRef(sheetUncertainty, absName(1, first)+":"+absName(1, last)),
			Values:     sheetRef(sheetUncertainty, absName(col, first)+":"+absName(col, last)),
		}},
		Title:     run("Rank correlation with cost per gram: " + strings.ReplaceAll(what, "\n", " ")),
		XAxis:     excelize.ChartAxis{ReverseOrder: true, Font: axisFont},
		YAxis:     excelize.ChartAxis{MajorGridLines: true, Maximum: &top, Minimum: &bottom, Font: axisFont},
		Legend:    excelize.ChartLegend{Position: "none"},
		Dimension: excelize.ChartDimension{Width: suChartW, Height: suChartH},
		Format:    excelize.GraphicOptions{AltText: "Rank correlation of each uncertain input with cost per gram at the target mass"},
	}
}

// uncertaintyAcross writes the bands and cheapest shares at every mass
// with a chart of the shares, and the crossover masses as intervals.
func uncertaintyAcross(g *grid, st *styles, r *scale.Report, row int, charts *[]gridChart) (int, *bandRefs) {
	u := r.Uncertainty
	if len(u.Across) == 0 {
		return row, nil
	}
	g.set(row, 1, cell{value: "Across the batch masses", style: st.heading, spill: true})
	row++
	shown := assessed(u)
	nJ := len(shown)
	heads := []string{"Crude batch mass, g"}
	for _, j := range shown {
		m := capitalize(r.Methods[j])
		heads = append(heads, m+"\nP10", m+"\nP50", m+"\nP90") // the Scale-up chart names the band by these
	}
	for _, j := range shown {
		heads = append(heads, capitalize(r.Methods[j])+"\ncheapest in")
	}
	header(g, st, row, heads...)
	first := row + 1
	for _, mb := range u.Across {
		row++
		g.num(row, 1, mb.Kg*1000, st.figure)
		for c, j := range shown {
			b := mb.Bands[j]
			for k, v := range []float64{b.P10, b.P50, b.P90} {
				if finite(v) {
					g.num(row, 2+3*c+k, v, st.perGram)
				} else {
					g.blank(row, 2+3*c+k, st.perGram) // a gap in the charts, not a zero
				}
			}
			g.num(row, 2+3*nJ+c, b.Cheapest, st.percent)
		}
	}
	last := row
	*charts = append(*charts, gridChart{cell: cellName(chartCol, chartRow), chart: shareChart(r, shown, first, last), logX: true})
	refs := &bandRefs{first: first, last: last}
	for c, j := range shown {
		refs.cols = append(refs.cols, bandCol{method: r.Methods[j], p10: 2 + 3*c, p90: 4 + 3*c})
	}
	row++
	wrapped(g, st, row, "P10, P50 and P90 of cost per gram of purified product at each mass over the same draws (one draw of every input "+
		"serves every mass and method), and the share of draws in which each method is cheapest; the chart beside the table "+
		"plots the shares. A cell is empty where the method was feasible in no draw. The Scale-up chart of cost per gram draws the P10 and P90 as dashed lines around each method's curve.", uLast)
	row++
	for _, c := range u.Crossings {
		wrapped(g, st, row, capitalize(c.Words())+".", uLast)
		row++
	}
	return row, refs
}

// bandRefs says where the Uncertainty sheet holds the bands across the
// masses, for the Scale-up chart of cost per gram.
type bandRefs struct {
	first, last int // rows of the masses
	cols        []bandCol
}

type bandCol struct {
	method   string
	p10, p90 int // columns
}

// series are the P10 and P90 of each method as dashed lines, to draw the
// band around the cost per gram on the Scale-up chart (nil refs: none).
func (b *bandRefs) series() []excelize.ChartSeries {
	if b == nil {
		return nil
	}
	var out []excelize.ChartSeries
	for _, c := range b.cols {
		for _, q := range []struct{ col int }{{c.p10}, {c.p90}} {
			out = append(out, excelize.ChartSeries{
				Name:       sheetRef(sheetUncertainty, absName(q.col, b.first-1)),
				Categories: sheetRef(sheetUncertainty, absName(1, b.first)+":"+absName(1, b.last)),
				Values:     sheetRef(sheetUncertainty, absName(q.col, b.first)+":"+absName(q.col, b.last)),
				Line:       excelize.LineOptions{Type: excelize.LineSolid, Dash: excelize.LineDashDash, Width: 1},
				Marker:     excelize.ChartMarker{Symbol: "none"},
			})
		}
	}
	return out
}

// shareChart plots the share of draws in which each method is cheapest
// against crude mass (log scale).
func shareChart(r *scale.Report, shown []int, first, last int) *excelize.Chart {
	nJ := len(shown)
	var series []excelize.ChartSeries
	for c, j := range shown {
		series = append(series, excelize.ChartSeries{
			Name:       capitalize(r.Methods[j]),
			Categories: sheetRef(sheetUncertainty, absName(1, first)+":"+absName(1, last)),
			Values:     sheetRef(sheetUncertainty, absName(2+3*nJ+c, first)+":"+absName(2+3*nJ+c, last)),
			Line:       excelize.LineOptions{Type: excelize.LineSolid, Width: 1.5},
			Marker:     excelize.ChartMarker{Symbol: "circle", Size: 4},
		})
	}
	run := func(s string) excelize.ChartTitle {
		return excelize.ChartTitle{Paragraph: []excelize.RichTextRun{{Text: s}}}
	}
	top, bottom := 1.0, 0.0
	return &excelize.Chart{
		Type:   excelize.Scatter,
		Series: series,
		Title:  run("Share of draws in which each method is cheapest"),
		XAxis:  excelize.ChartAxis{MajorGridLines: true, Title: run("Crude batch mass, g (log scale)"), Font: axisFont, LogBase: 10},
		YAxis: excelize.ChartAxis{MajorGridLines: true, Title: run("share of draws"), Font: axisFont, Maximum: &top, Minimum: &bottom,
			NumFmt: excelize.ChartNumFmt{CustomNumFmt: "0%"}},
		Legend:       excelize.ChartLegend{Position: "bottom"},
		ShowBlanksAs: "gap",
		Dimension:    excelize.ChartDimension{Width: suChartW, Height: suChartH},
		Format:       excelize.GraphicOptions{AltText: "Share of draws in which each method is cheapest, against crude batch mass"},
	}
}

// uncertaintyInputs lists every input drawn: where it is written, its
// nominal value and limits, the distribution and where the spread comes
// from.
func uncertaintyInputs(g *grid, st *styles, u *scale.Uncertainty, row int) int {
	g.set(row, 1, cell{value: "The inputs drawn", style: st.heading, spill: true})
	row++
	shown, quiet := listedInputs(u)
	header(g, st, row, "Input", "As used", "Low", "High", "Unit")
	g.set(row, 6, cell{value: "Drawn from", style: st.headerIndent, wrap: true})
	g.set(row, 7, cell{value: "Where it is written; where the spread comes from", style: st.headerIndent, wrap: true})
	row++
	for _, i := range shown {
		in := u.Inputs[i]
		g.set(row, 1, cell{value: in.Name, style: st.wrap, wrap: true})
		// Four significant figures: limits of a spread, not quantities to add.
		g.num(row, 2, sig(in.Nominal, 4), st.general)
		g.num(row, 3, sig(in.Lo, 4), st.general)
		g.num(row, 4, sig(in.Hi, 4), st.general)
		g.text(row, 5, in.Unit, st.text)
		g.set(row, 6, cell{value: in.Dist, style: st.wrapIndent, wrap: true})
		g.set(row, 7, cell{value: in.Field + "; " + in.Basis, style: st.wrapIndent, wrap: true})
		row++
	}
	if quiet > 0 {
		wrapped(g, st, row, fmt.Sprintf("Also drawn: %d further model defaults, each by how sure its source is (the spreads below; "+
			"each default with its mark on the Sources sheet). None moves the cost per gram at the target mass with a rank "+
			"correlation of %s or more, nor is worth knowing before choosing; the JSON output lists every input.", quiet, units.SigFigs(quietRho, 2)), uLast)
		row++
	}
	wrapped(g, st, row, "Low and High: the limits of a rectangular distribution (a value written with a range, \"0.30 ± 0.03\" or "+
		"\"12–18 g/L\", is taken to lie anywhere between its limits with equal chance: JCGM 100:2008, Guide to the expression of "+
		"uncertainty in measurement, §4.3.7, standard uncertainty = half-width/√3), or the 10th and 90th percentiles of a "+
		"log-normal one. Not drawn: temperatures, the site's own equipment (flask, reactor, still and column sizes, fill limits) and "+
		"thresholds that decide when to warn. One draw serves every method that shares a physical quantity (the chiller, the heater).", uLast)
	return row + 1
}

// sig rounds v to n significant figures (v itself when 0 or not finite).
func sig(v float64, n int) float64 {
	if v == 0 || !finite(v) {
		return v
	}
	p := math.Pow(10, float64(n-1)-math.Floor(math.Log10(math.Abs(v))))
	return math.Round(v*p) / p
}

// quietRho is the rank correlation below which a model default that is
// worth nothing to know is left off the inputs table (common practice, no
// source: a correlation under 0.1 is commonly read as negligible).
const quietRho = 0.1

// listedInputs are the inputs the sheet lists: every measured value,
// ranged setting, price and model form, and the model defaults that move
// the cost (a rank correlation of quietRho or more) or are worth knowing;
// quiet counts the defaults left off.
func listedInputs(u *scale.Uncertainty) (shown []int, quiet int) {
	loud := map[int]bool{}
	for _, s := range u.Sensitivity {
		for _, r := range append([]float64{s.Decision}, s.Rho...) {
			if math.Abs(r) >= quietRho {
				loud[s.Input] = true
			}
		}
	}
	for _, w := range u.Worth {
		loud[w.Input] = true
	}
	for i, in := range u.Inputs {
		if in.Kind == scale.KindCoefficient && !loud[i] {
			quiet++
			continue
		}
		shown = append(shown, i)
	}
	return shown, quiet
}

// uncertaintySpreads lists the default spreads: of a value written
// without a range, by its kind (scenario.Spreads); of a price without a
// spread (prices.DefaultSpread); of a model coefficient by its mark
// (scale.Spread), with the factors at one standard deviation either side,
//
//	f(−1σ) = exp(−σ),  f(+1σ) = exp(+σ)
//
// σ the standard deviation of the natural log of the factor
// (dimensionless, σ ≥ 0); about two draws in three fall between them.
func uncertaintySpreads(g *grid, st *styles, row int) {
	g.set(row, 1, cell{value: "The spreads drawn", style: st.heading, spill: true})
	row++
	header(g, st, row, "Written without a range", "Half-width")
	g.set(row, 3, cell{value: "Why", style: st.headerIndent, wrap: true})
	row++
	kinds := make([]string, 0, len(scenario.Spreads))
	for k := range scenario.Spreads {
		kinds = append(kinds, string(k))
	}
	sort.Strings(kinds) // a map has no order; the workbook must not change between runs
	for _, k := range kinds {
		sp := scenario.Spreads[scenario.Kind(k)]
		g.set(row, 1, cell{value: capitalize(k), style: st.wrap, wrap: true})
		half := units.SigFigs(sp.Half, 3)
		if sp.Relative {
			half = units.SigFigs(sp.Half*100, 3) + " % of the value"
		}
		g.text(row, 2, half, st.text)
		mergedCell(g, row, 3, uLast, cell{value: sp.Source + " (" + sp.Mark + ")", style: st.wrapIndent, wrap: true})
		row++
	}
	g.set(row, 1, cell{value: "A price without a spread", style: st.wrap, wrap: true})
	g.text(row, 2, units.SigFigs(prices.DefaultSpread*100, 3)+" % of the price", st.text)
	mergedCell(g, row, 3, uLast, cell{value: "catalogue prices and quotes move by some tenths within a budget year (common practice, no source)", style: st.wrapIndent, wrap: true})
	row += 2
	header(g, st, row, "Values drawn", "σ of ln(factor)", "Factor at −1σ", "Factor at +1σ")
	row++
	spread := func(label string, sigma float64) {
		g.set(row, uLabel, cell{value: label, style: st.wrap, wrap: true})
		g.num(row, 2, sigma, st.ratio)
		g.num(row, 3, math.Exp(-sigma), st.figure)
		g.num(row, 4, math.Exp(sigma), st.figure)
		row++
	}
	listed := map[source.Mark]bool{}
	for _, mm := range markMeanings {
		if sigma, ok := scale.Spread[mm.mark]; ok {
			spread(fmt.Sprintf("Coefficients marked %s (%s)", mm.mark, mm.meaning), sigma)
			listed[mm.mark] = true
		}
	}
	var others []string
	for mk := range scale.Spread {
		if !listed[mk] {
			others = append(others, string(mk))
		}
	}
	sort.Strings(others)
	for _, mk := range others {
		spread("Coefficients marked "+mk, scale.Spread[source.Mark(mk)])
	}
	row++
	wrapped(g, st, row, "These spreads are this project's choices (common practice, no source): a value seen in a published table is "+
		"known to a few per cent, one from memory to some 15 %, a habit of the trade to a quarter. Coefficients are drawn as a "+
		"log-normal factor exp(σ·z), z a standard normal number; shares below 1 on their odds, so that they stay between 0 and 1. "+
		"The route that sizes the silica is drawn as one of two alternatives with the weights listed above. Each draw has its own "+
		"generator, seeded from the seed and the draw's number, so the answer does not depend on the number of cores.", uLast)
}
