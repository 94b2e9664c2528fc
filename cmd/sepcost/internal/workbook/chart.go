package workbook

import (
	"bytes"
	"encoding/xml"
	"fmt"
	"regexp"
	"sort"
	"strings"

	"github.com/xuri/excelize/v2"

	"sepcost/scale"
)

// chartSpec is one chart of the Scale-up sheet: a figure against crude
// batch mass, one series per method.
type chartSpec struct {
	title, yTitle string
	col           int // Scale-up column plotted on the Y axis
}

// chart builds a scatter chart with straight lines and markers, one
// series for each method listed. X is the crude mass in g of the method's
// block of rows, Y the column col of the same rows, the series name a
// reference to the method's name on its first row. The Y axis is logarithmic when there are points and all are
// positive, as a logarithm needs; the X axis (crude mass, always positive)
// is made logarithmic afterwards by logXAxes. Empty cells are gaps
// (DispBlanksAs "gap").
func (sp chartSpec) chart(r *scale.Report, block func(j int) (int, int), methods []int, points int, positive bool) *excelize.Chart {
	var series []excelize.ChartSeries
	for _, j := range methods {
		first, last := block(j)
		series = append(series, excelize.ChartSeries{
			Name:       sheetRef(sheetScaleUp, absName(suMethod, first)),
			Categories: sheetRef(sheetScaleUp, absName(suMass, first)+":"+absName(suMass, last)),
			Values:     sheetRef(sheetScaleUp, absName(sp.col, first)+":"+absName(sp.col, last)),
			Line:       excelize.LineOptions{Type: excelize.LineSolid, Width: 1.5},
			Marker:     excelize.ChartMarker{Symbol: "circle", Size: 5},
		})
	}
	yTitle := sp.yTitle + " (log scale)"
	logBase := 10.0
	switch {
	case points == 0:
		yTitle, logBase = sp.yTitle+" (no values to plot)", 0
	case !positive:
		yTitle, logBase = sp.yTitle+" (linear scale: not every value is above zero)", 0
	}
	run := func(s string) excelize.ChartTitle {
		return excelize.ChartTitle{Paragraph: []excelize.RichTextRun{{Text: s}}}
	}
	return &excelize.Chart{
		Type:   excelize.Scatter,
		Series: series,
		Title:  run(sp.title),
		XAxis: excelize.ChartAxis{MajorGridLines: true, Title: run("Crude batch mass, g (log scale)"), Font: axisFont,
			// excelize ignores LogBase on a scatter chart's X axis; logXAxes adds it.
			LogBase: 10},
		YAxis:        excelize.ChartAxis{MajorGridLines: true, LogBase: logBase, Title: run(yTitle), Font: axisFont},
		Legend:       excelize.ChartLegend{Position: "bottom"},
		ShowBlanksAs: "gap",
		Dimension:    excelize.ChartDimension{Width: suChartW, Height: suChartH},
		Format:       excelize.GraphicOptions{AltText: sp.title + " against crude batch mass"},
	}
}

// axisFont shows tick labels in dark grey; excelize's default is a light
// grey that is hard to read on paper.
var axisFont = excelize.Font{Color: "404040"}

// addChart adds a chart anchored at cell of the Scale-up sheet and returns
// the name of the chart part that excelize created for it.
func addChart(f *excelize.File, cell string, ch *excelize.Chart) (string, error) {
	return addChartTo(f, sheetScaleUp, cell, ch)
}

// addChartTo adds a chart anchored at cell of a sheet and returns the name
// of the chart part that excelize created for it, found as the one part
// that was not there before.
func addChartTo(f *excelize.File, sheet, cell string, ch *excelize.Chart) (string, error) {
	before := chartParts(f)
	if err := f.AddChart(sheet, cell, ch); err != nil {
		return "", err
	}
	var added []string
	for p := range chartParts(f) {
		if !before[p] {
			added = append(added, p)
		}
	}
	if len(added) != 1 {
		return "", fmt.Errorf("excelize added %d chart parts (%v) for one chart", len(added), added)
	}
	return added[0], nil
}

// chartParts lists the chart parts of the package.
func chartParts(f *excelize.File) map[string]bool {
	out := map[string]bool{}
	f.Pkg.Range(func(k, _ any) bool {
		if s, ok := k.(string); ok && strings.HasPrefix(s, "xl/charts/chart") && strings.HasSuffix(s, ".xml") {
			out[s] = true
		}
		return true
	})
	return out
}

// logXAxes makes the X axis of each named scatter chart part logarithmic
// (base 10) and its X values numbers, rewriting the part in the package
// before it is written: excelize v2.11.1 drops ChartAxis.LogBase for a
// scatter chart's X axis and refers to the X values as text (DEVELOPERS.md, "Library notes").
func logXAxes(f *excelize.File, parts []string) error {
	sort.Strings(parts)
	for _, p := range parts {
		v, ok := f.Pkg.Load(p)
		if !ok {
			return fmt.Errorf("chart part %s is missing", p)
		}
		b, ok := v.([]byte)
		if !ok {
			return fmt.Errorf("chart part %s is not held as bytes", p)
		}
		out, err := logXAxis(b)
		if err != nil {
			return fmt.Errorf("chart part %s: %w", p, err)
		}
		f.Pkg.Store(p, out)
	}
	return nil
}

// nsChart is the DrawingML chart namespace (ECMA-376 Part 1, §21.2).
const nsChart = "http://schemas.openxmlformats.org/drawingml/2006/chart"

// catOnlyRe matches the category-axis elements that excelize writes into
// a scatter chart's X value axis, with the chart namespace prefix p.
func catOnlyRe(p string) *regexp.Regexp {
	q := regexp.QuoteMeta(p)
	return regexp.MustCompile(`<` + q + `(auto|lblAlgn|lblOffset|noMultiLvlLbl)\b[^>]*?(/>|>\s*</` + q + `(auto|lblAlgn|lblOffset|noMultiLvlLbl)>)`)
}

// catOnlyDefault is catOnlyRe for the default namespace, as excelize writes.
var catOnlyDefault = catOnlyRe("")

var nsPrefix = regexp.MustCompile(`xmlns(?::([A-Za-z_][\w.-]*))?="` + regexp.QuoteMeta(nsChart) + `"`)

// logXAxis rewrites one scatter chart part. In the chart's value axis at
// the bottom (axPos "b": the X axis of a scatter chart) it adds
//
//	<c:logBase val="10"/>
//
// as the first child of <c:scaling>, where the schema puts it (CT_Scaling:
// logBase, orientation, max, min), and removes the category-axis elements
// excelize writes there (auto, lblAlgn, lblOffset, noMultiLvlLbl), which
// CT_ValAx does not allow. Each series' X values become a number reference
// (<c:xVal><c:numRef>) instead of a text reference, and the chart's
// scatter style becomes "lineMarker" (straight lines with markers, as each
// series' smooth="0" already says) instead of excelize's "smoothMarker". The chart namespace
// may be the default one (as excelize writes it) or carry any prefix. A
// part without exactly one such axis, or whose X axis has no scaling
// element, is refused, so that a change in excelize's output fails here
// rather than giving a linear axis; checkLogChart, run by the tests on
// the result, parses it again.
func logXAxis(b []byte) ([]byte, error) {
	m := nsPrefix.FindSubmatch(b)
	if m == nil {
		return nil, fmt.Errorf("no chart namespace declared")
	}
	p := ""
	if len(m[1]) > 0 {
		p = string(m[1]) + ":"
	}
	open, end := []byte("<"+p+"valAx>"), []byte("</"+p+"valAx>")
	catOnly := catOnlyDefault
	if p != "" {
		catOnly = catOnlyRe(p)
	}
	var out bytes.Buffer
	rest := b
	xAxes := 0
	for {
		k := bytes.Index(rest, open)
		if k < 0 {
			out.Write(rest)
			break
		}
		e := bytes.Index(rest[k:], end)
		if e < 0 {
			return nil, fmt.Errorf("unterminated %s", open)
		}
		e += k + len(end)
		out.Write(rest[:k])
		ax := rest[k:e]
		if bytes.Contains(ax, []byte("<"+p+`axPos val="b"`)) {
			xAxes++
			if !bytes.Contains(ax, []byte("<"+p+"logBase")) {
				scaling := []byte("<" + p + "scaling>")
				if !bytes.Contains(ax, scaling) {
					return nil, fmt.Errorf("the X axis has no <%sscaling> element to take the logarithmic base", p)
				}
				ax = bytes.Replace(ax, scaling, []byte("<"+p+"scaling><"+p+`logBase val="10"/>`), 1)
			}
			ax = catOnly.ReplaceAll(ax, nil)
		}
		out.Write(ax)
		rest = rest[e:]
	}
	if xAxes != 1 {
		return nil, fmt.Errorf("%d value axes at the bottom; a scatter chart has one X axis", xAxes)
	}
	res := out.Bytes()
	if bytes.Contains(res, []byte("<"+p+"strCache")) {
		return nil, fmt.Errorf("text cache in a series; the X values cannot be made numeric")
	}
	res = bytes.ReplaceAll(res, []byte("<"+p+"xVal><"+p+"strRef>"), []byte("<"+p+"xVal><"+p+"numRef>"))
	res = bytes.ReplaceAll(res, []byte("</"+p+"strRef></"+p+"xVal>"), []byte("</"+p+"numRef></"+p+"xVal>"))
	res = bytes.ReplaceAll(res, []byte("<"+p+`scatterStyle val="smoothMarker"`), []byte("<"+p+`scatterStyle val="lineMarker"`))
	return uprightTitles(res, p), nil
}

// uprightTitles turns the Y axis title upright (read from bottom to top)
// in a chart part whose chart namespace prefix is p. excelize rotates the
// title's rich text by −90° (bodyPr rot="-5400000") but follows it with a
// text-properties element whose bodyPr says rot="0", which LibreOffice
// obeys: the title then lies across the chart and squeezes the plot. The
// second bodyPr is given the same rotation.
//
// Each title is the text from an opening <title> to the first closing
// </title> after it, as the pattern (?s)<title>.*?</title> finds them,
// found with plain searches.
func uprightTitles(b []byte, p string) []byte {
	open, end := []byte("<"+p+"title>"), []byte("</"+p+"title>")
	flat := []byte("<" + p + `txPr><a:bodyPr anchorCtr="false" rot="0"`)
	upright := []byte("<" + p + `txPr><a:bodyPr anchorCtr="false" rot="-5400000" vert="horz"`)
	out := make([]byte, 0, len(b)+64)
	rest := b
	for {
		k := bytes.Index(rest, open)
		if k < 0 {
			break
		}
		e := bytes.Index(rest[k+len(open):], end)
		if e < 0 {
			break
		}
		e += k + len(open) + len(end)
		t := rest[k:e]
		out = append(out, rest[:k]...)
		if bytes.Contains(t, []byte(`rot="-5400000"`)) {
			if i := bytes.Index(t, flat); i >= 0 {
				out = append(append(append(out, t[:i]...), upright...), t[i+len(flat):]...)
				rest = rest[e:]
				continue
			}
		}
		out = append(out, t...)
		rest = rest[e:]
	}
	return append(out, rest...)
}

// chartXML is the part of a chart part that checkLogChart reads; element
// names match in any namespace prefix.
type chartXML struct {
	PlotArea struct {
		Scatter []struct {
			Ser []struct {
				XVal struct {
					NumRef *struct {
						F string `xml:"f"`
					} `xml:"numRef"`
				} `xml:"xVal"`
			} `xml:"ser"`
		} `xml:"scatterChart"`
		ValAx []struct {
			AxPos struct {
				Val string `xml:"val,attr"`
			} `xml:"axPos"`
			Scaling struct {
				LogBase *struct {
					Val string `xml:"val,attr"`
				} `xml:"logBase"`
			} `xml:"scaling"`
		} `xml:"valAx"`
	} `xml:"chart>plotArea"`
}

// checkLogChart parses a scatter chart part and checks that its X axis has
// base-10 logarithmic scaling and that every series' X values are a number
// reference.
func checkLogChart(b []byte) error {
	var c chartXML
	if err := xml.Unmarshal(b, &c); err != nil {
		return fmt.Errorf("the rewritten chart does not parse: %w", err)
	}
	if len(c.PlotArea.Scatter) == 0 {
		return fmt.Errorf("not a scatter chart")
	}
	for _, sc := range c.PlotArea.Scatter {
		for k, s := range sc.Ser {
			if s.XVal.NumRef == nil || s.XVal.NumRef.F == "" {
				return fmt.Errorf("series %d: the X values are not a number reference", k+1)
			}
		}
	}
	for _, ax := range c.PlotArea.ValAx {
		if ax.AxPos.Val == "b" {
			if ax.Scaling.LogBase == nil || ax.Scaling.LogBase.Val != "10" {
				return fmt.Errorf("the X axis is not logarithmic after the rewrite")
			}
			return nil
		}
	}
	return fmt.Errorf("no X axis (a value axis at the bottom)")
}
