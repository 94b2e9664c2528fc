package workbook

import (
	"archive/zip"
	"bytes"
	"html"
	"io"
	"math"
	"path"
	"regexp"
	"sort"
	"strconv"
	"strings"
	"testing"

	"github.com/xuri/excelize/v2"

	"sepcost/scale"
)

// zipParts reads every part of an .xlsx into memory.
func zipParts(t *testing.T, b []byte) map[string]string {
	t.Helper()
	zr, err := zip.NewReader(bytes.NewReader(b), int64(len(b)))
	if err != nil {
		t.Fatal(err)
	}
	out := map[string]string{}
	for _, zf := range zr.File {
		rc, err := zf.Open()
		if err != nil {
			t.Fatal(err)
		}
		data, err := io.ReadAll(rc)
		rc.Close()
		if err != nil {
			t.Fatal(err)
		}
		out[zf.Name] = string(data)
	}
	return out
}

var (
	relRe    = regexp.MustCompile(`<Relationship [^>]*>`)
	attrRe   = regexp.MustCompile(`(\w+)="([^"]*)"`)
	sheetRe  = regexp.MustCompile(`<sheet [^>]*name="([^"]*)"[^>]*r:id="([^"]*)"|<sheet [^>]*r:id="([^"]*)"[^>]*name="([^"]*)"`)
	valAxRe  = regexp.MustCompile(`(?s)<(?:\w+:)?valAx>(.*?)</(?:\w+:)?valAx>`)
	axPosRe  = regexp.MustCompile(`<(?:\w+:)?axPos val="(\w)"`)
	logRe    = regexp.MustCompile(`<(?:\w+:)?scaling><(?:\w+:)?logBase val="10"\s*/?>`)
	serRe    = regexp.MustCompile(`(?s)<(?:\w+:)?ser>(.*?)</(?:\w+:)?ser>`)
	fRe      = regexp.MustCompile(`<(?:\w+:)?f>([^<]*)</(?:\w+:)?f>`)
	xValRe   = regexp.MustCompile(`(?s)<(?:\w+:)?xVal><(?:\w+:)?(numRef|strRef)>`)
	catOnlyR = regexp.MustCompile(`<(?:\w+:)?(auto|lblAlgn|lblOffset|noMultiLvlLbl)\b`)
)

// rels reads a relationships part: id → (target resolved against base's folder, type).
func rels(parts map[string]string, base string) map[string][2]string {
	out := map[string][2]string{}
	for _, m := range relRe.FindAllString(parts[path.Join(path.Dir(base), "_rels", path.Base(base)+".rels")], -1) {
		a := map[string]string{}
		for _, kv := range attrRe.FindAllStringSubmatch(m, -1) {
			a[kv[1]] = kv[2]
		}
		out[a["Id"]] = [2]string{path.Join(path.Dir(base), a["Target"]), a["Type"]}
	}
	return out
}

// scaleUpCharts returns the chart parts drawn on the Scale-up sheet, read
// from the package's relationships without the writer's own code.
func scaleUpCharts(t *testing.T, parts map[string]string) []string {
	t.Helper()
	var part string
	wb := rels(parts, "xl/workbook.xml")
	for _, m := range sheetRe.FindAllStringSubmatch(parts["xl/workbook.xml"], -1) {
		name, id := m[1], m[2]
		if name == "" {
			name, id = m[4], m[3]
		}
		if name == sheetScaleUp {
			part = wb[id][0]
		}
	}
	if part == "" {
		t.Fatal("no Scale-up sheet in the workbook")
	}
	var charts []string
	for _, d := range rels(parts, part) {
		if !strings.HasSuffix(d[1], "/drawing") {
			continue
		}
		for _, c := range rels(parts, d[0]) {
			if strings.HasSuffix(c[1], "/chart") {
				charts = append(charts, c[0])
			}
		}
	}
	sort.Strings(charts)
	return charts
}

// TestScaleUpChartsLogAxes opens the written package and checks each chart
// of the Scale-up sheet: a scatter chart whose X axis (crude mass) and Y
// axis are both base-10 logarithmic, X values referred to as numbers,
// one series per method named by a reference to the cell that holds the
// method's name, X cells positive masses and Y cells empty where the
// method is not feasible. Every plotted figure of these fixtures is
// positive, so every Y axis must be logarithmic.
func TestScaleUpChartsLogAxes(t *testing.T) {
	t.Parallel()
	for name, r := range map[string]*scale.Report{"with detail sheets": sweepReport(), "without": syntheticSweep(40, 2)} {
		t.Run(name, func(t *testing.T) {
			b, _ := render(t, r, Options{})
			parts := zipParts(t, b)
			charts := scaleUpCharts(t, parts)
			// Source: DEVELOPERS.md, "The workbook's layout": the Scale-up sheet's charts.
			if len(charts) != 3 {
				t.Fatalf("%d charts on the Scale-up sheet, want 3 (cost per gram, waste per gram, hours)", len(charts))
			}
			f := open(t, b)
			for _, c := range charts {
				x := parts[c]
				if !strings.Contains(x, "scatterChart>") {
					t.Errorf("%s: not a scatter chart", c)
				}
				if err := checkLogChart([]byte(x)); err != nil {
					t.Errorf("%s: %v", c, err)
				}
				axes := valAxRe.FindAllStringSubmatch(x, -1)
				if len(axes) != 2 {
					t.Fatalf("%s: %d value axes, want 2", c, len(axes))
				}
				for _, ax := range axes {
					pos := axPosRe.FindStringSubmatch(ax[1])
					if pos == nil {
						t.Fatalf("%s: an axis without a position", c)
					}
					if !logRe.MatchString(ax[1]) {
						t.Errorf("%s: axis %s is not logarithmic (base 10)", c, pos[1])
					}
					if pos[1] == "b" && catOnlyR.MatchString(ax[1]) {
						t.Errorf("%s: the X value axis keeps category-axis elements: %v", c, catOnlyR.FindAllString(ax[1], -1))
					}
				}
				sers := serRe.FindAllStringSubmatch(x, -1)
				if len(sers) != len(r.Methods) {
					t.Fatalf("%s: %d series for %d methods", c, len(sers), len(r.Methods))
				}
				for j, s := range sers {
					if m := xValRe.FindStringSubmatch(s[1]); m == nil || m[1] != "numRef" {
						t.Errorf("%s series %d: X values not a number reference", c, j+1)
					}
					refs := fRe.FindAllStringSubmatch(html.UnescapeString(s[1]), -1)
					if len(refs) != 3 {
						t.Fatalf("%s series %d: %d references, want name, X and Y", c, j+1, len(refs))
					}
					nameSheet, nameCell := splitRef(t, refs[0][1])
					if got, _ := f.GetCellValue(nameSheet, nameCell); got != capitalize(r.Methods[j]) {
						t.Errorf("%s series %d: name cell %s holds %q, want %q", c, j+1, refs[0][1], got, capitalize(r.Methods[j]))
					}
					xs, ys := rangeCells(t, refs[1][1]), rangeCells(t, refs[2][1])
					if len(xs) != len(r.MassesKg) || len(ys) != len(xs) {
						t.Fatalf("%s series %d: %d X and %d Y cells for %d masses", c, j+1, len(xs), len(ys), len(r.MassesKg))
					}
					for i := range xs {
						v, _ := f.GetCellValue(sheetScaleUp, xs[i], excelize.Options{RawCellValue: true})
						if g, err := strconv.ParseFloat(v, 64); err != nil || !(g > 0) {
							t.Errorf("%s: X cell %s = %q, not a positive mass", c, xs[i], v)
						} else if want := r.MassesKg[i] * 1000; math.Abs(g-want) > 1e-12*want {
							// Source: the report's mass in kg × 1000 g/kg; 1e-12 relative
							// covers the 15 digits a cell keeps.
							t.Errorf("%s: X cell %s = %v g, want %v", c, xs[i], g, want)
						}
						y, _ := f.GetCellValue(sheetScaleUp, ys[i], excelize.Options{RawCellValue: true})
						if !r.Results[i][j].Usage.Feasible && y != "" {
							t.Errorf("%s: Y cell %s = %q where %s is not feasible; want a gap", c, ys[i], y, r.Methods[j])
						}
						if r.Results[i][j].Usage.Feasible && y == "" {
							t.Errorf("%s: Y cell %s is empty where %s is feasible", c, ys[i], r.Methods[j])
						}
					}
				}
			}
		})
	}
}

// splitRef splits 'Scale-up'!$B$24 into the sheet and the cell.
func splitRef(t *testing.T, ref string) (string, string) {
	t.Helper()
	k := strings.LastIndex(ref, "!")
	if k < 0 {
		t.Fatalf("reference %q has no sheet", ref)
	}
	sheet := strings.ReplaceAll(strings.Trim(ref[:k], "'"), "''", "'")
	return sheet, strings.ReplaceAll(ref[k+1:], "$", "")
}

// rangeCells lists the cells of a one-column range such as 'Scale-up'!$A$24:$A$53.
func rangeCells(t *testing.T, ref string) []string {
	t.Helper()
	sheet, cells := splitRef(t, ref)
	if sheet != sheetScaleUp {
		t.Fatalf("range %q is not on the Scale-up sheet", ref)
	}
	a, b, ok := strings.Cut(cells, ":")
	if !ok {
		t.Fatalf("%q is not a range", ref)
	}
	c1, r1, err1 := excelize.CellNameToCoordinates(a)
	c2, r2, err2 := excelize.CellNameToCoordinates(b)
	if err1 != nil || err2 != nil || c1 != c2 || r2 < r1 {
		t.Fatalf("%q is not a one-column range", ref)
	}
	var out []string
	for r := r1; r <= r2; r++ {
		out = append(out, cellName(c1, r))
	}
	return out
}

// excelizeChart is the chart part excelize itself writes for a small
// scatter chart with the X and Y axes asked to be logarithmic.
func excelizeChart(t *testing.T) []byte {
	t.Helper()
	f := excelize.NewFile()
	defer f.Close()
	for k, row := range [][]any{{1.0, 2.0}, {10.0, 3.0}, {100.0, 5.0}} {
		if err := f.SetSheetRow("Sheet1", cellName(1, k+1), &row); err != nil {
			t.Fatal(err)
		}
	}
	part, err := func() (string, error) {
		before := chartParts(f)
		err := f.AddChart("Sheet1", "D1", &excelize.Chart{Type: excelize.Scatter,
			Series: []excelize.ChartSeries{{Name: "Sheet1!$A$1", Categories: "Sheet1!$A$1:$A$3", Values: "Sheet1!$B$1:$B$3"}},
			XAxis:  excelize.ChartAxis{LogBase: 10}, YAxis: excelize.ChartAxis{LogBase: 10}})
		for p := range chartParts(f) {
			if !before[p] {
				return p, err
			}
		}
		return "", err
	}()
	if err != nil || part == "" {
		t.Fatalf("excelize AddChart: %v (part %q)", err, part)
	}
	v, _ := f.Pkg.Load(part)
	return v.([]byte)
}

// prefixed is a scatter chart part written with the chart namespace under
// the prefix c:, as spreadsheet programs write it (ECMA-376 Part 1,
// §21.2; shape as in the standard's examples, trimmed).
const prefixed = `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<c:chartSpace xmlns:c="http://schemas.openxmlformats.org/drawingml/2006/chart"><c:chart><c:plotArea>` +
	`<c:scatterChart><c:scatterStyle val="lineMarker"/><c:ser><c:idx val="0"/><c:order val="0"/>` +
	`<c:tx><c:strRef><c:f>Sheet1!$B$1</c:f></c:strRef></c:tx>` +
	`<c:xVal><c:numRef><c:f>Sheet1!$A$2:$A$4</c:f></c:numRef></c:xVal><c:yVal><c:numRef><c:f>Sheet1!$B$2:$B$4</c:f></c:numRef></c:yVal>` +
	`</c:ser><c:axId val="1"/><c:axId val="2"/></c:scatterChart>` +
	`<c:valAx><c:axId val="1"/><c:scaling><c:orientation val="minMax"/></c:scaling><c:delete val="0"/><c:axPos val="b"/><c:crossAx val="2"/></c:valAx>` +
	`<c:valAx><c:axId val="2"/><c:scaling><c:orientation val="minMax"/></c:scaling><c:delete val="0"/><c:axPos val="l"/><c:crossAx val="1"/></c:valAx>` +
	`</c:plotArea></c:chart></c:chartSpace>`

// TestLogXAxis checks the rewrite of a chart part on excelize's own output
// (default namespace; X axis logarithm dropped: the defect it works around)
// and on a part with the c: prefix: the X axis gains one logBase as the
// first child of its scaling, the Y axis is left alone, the rewrite is
// idempotent, and parts it cannot handle are refused with a reason.
func TestLogXAxis(t *testing.T) {
	t.Parallel()
	raw := excelizeChart(t)
	for _, ax := range valAxRe.FindAllStringSubmatch(string(raw), -1) {
		pos := axPosRe.FindStringSubmatch(ax[1])[1]
		if pos == "b" && logRe.MatchString(ax[1]) {
			t.Log("excelize now writes the X axis logarithm itself; logXAxis keeps it and adds none")
		}
		if pos == "l" && !logRe.MatchString(ax[1]) {
			t.Error("excelize wrote no logBase on the Y axis; DEVELOPERS.md, Library notes, says YAxis.LogBase works")
		}
	}
	for name, in := range map[string][]byte{"excelize": raw, "prefixed": []byte(prefixed)} {
		t.Run(name, func(t *testing.T) {
			out, err := logXAxis(in)
			if err != nil {
				t.Fatal(err)
			}
			if err := checkLogChart(out); err != nil {
				t.Errorf("the rewritten part fails the parse check: %v", err)
			}
			for _, ax := range valAxRe.FindAllStringSubmatch(string(out), -1) {
				pos := axPosRe.FindStringSubmatch(ax[1])[1]
				n := strings.Count(ax[1], `logBase val="10"`)
				was := strings.Count(findAxis(string(in), pos), `logBase val="10"`)
				switch {
				case pos == "b" && (n != 1 || !logRe.MatchString(ax[1])):
					t.Errorf("X axis has %d logBase elements (first in scaling: %v), want one", n, logRe.MatchString(ax[1]))
				case pos == "l" && n != was:
					t.Errorf("Y axis changed: %d logBase elements, was %d", n, was)
				}
			}
			if strings.Contains(string(out), "strRef></xVal>") || strings.Contains(string(out), "strRef></c:xVal>") {
				t.Error("X values still a text reference")
			}
			again, err := logXAxis(out)
			if err != nil || !bytes.Equal(again, out) {
				t.Errorf("a second rewrite changed the part (err %v)", err)
			}
		})
	}
	if err := checkLogChart(raw); err == nil {
		t.Error("the parse check passes excelize's own part, whose X axis is linear")
	}
	for name, tc := range map[string]struct{ in, phrase string }{
		"no namespace": {`<chartSpace><chart/></chartSpace>`, "no chart namespace"},
		"no scaling": {strings.Replace(prefixed, `<c:scaling><c:orientation val="minMax"/></c:scaling><c:delete val="0"/><c:axPos val="b"/>`,
			`<c:delete val="0"/><c:axPos val="b"/>`, 1), "no <c:scaling>"},
		"no X axis": {strings.Replace(prefixed, `<c:axPos val="b"/>`, `<c:axPos val="t"/>`, 1), "0 value axes at the bottom"},
	} {
		t.Run(name, func(t *testing.T) {
			if _, err := logXAxis([]byte(tc.in)); err == nil || !strings.Contains(err.Error(), tc.phrase) {
				t.Errorf("error %v, want one containing %q", err, tc.phrase)
			}
		})
	}
}

func findAxis(x, pos string) string {
	for _, ax := range valAxRe.FindAllStringSubmatch(x, -1) {
		if p := axPosRe.FindStringSubmatch(ax[1]); p != nil && p[1] == pos {
			return ax[1]
		}
	}
	return ""
}

// TestDetailSheetsLimit: a sweep of at most MaxDetailMasses masses gets
// the method sheets; one more mass, and they give way to the Scale-up
// table and a note on the Summary. An estimate always gets them.
func TestDetailSheetsLimit(t *testing.T) {
	t.Parallel()
	for _, tc := range []struct {
		n     int
		sweep bool
		want  string
	}{
		// Source: DEVELOPERS.md, "The workbook's layout": the sheet order; the detail limit is this
		// package's choice (MaxDetailMasses).
		{MaxDetailMasses, true, "Summary,Decision,Inputs,Prices,Chromatography,Crystallization,Scale-up,Waste,Sources"},
		{MaxDetailMasses + 1, true, "Summary,Decision,Inputs,Prices,Scale-up,Waste,Sources"},
		{MaxDetailMasses + 1, false, "Summary,Decision,Inputs,Prices,Chromatography,Crystallization,Waste,Sources"},
	} {
		r := syntheticSweep(tc.n, 2)
		r.IsSweep = tc.sweep
		b, _ := render(t, r, Options{})
		f := open(t, b)
		if got := strings.Join(f.GetSheetList(), ","); got != tc.want {
			t.Errorf("%d masses, sweep %v: sheets %s, want %s", tc.n, tc.sweep, got, tc.want)
		}
		rows, _ := f.GetRows(sheetSummary)
		note := false
		for _, row := range rows {
			note = note || (len(row) > 0 && strings.Contains(row[0], "sepcost estimate SCENARIO --mass 2kg"))
		}
		if omitted := tc.sweep && tc.n > MaxDetailMasses; note != omitted {
			t.Errorf("%d masses, sweep %v: Summary pointer to `sepcost estimate` present %v, want %v", tc.n, tc.sweep, note, omitted)
		}
	}
}

// TestScaleUpTable reads the Scale-up table of a sweep without detail
// sheets back and compares it with the report, row by row, and
// recalculates every total and cost per gram with excelize's calculator
// (a second oracle beside LibreOffice; DEVELOPERS.md, "Library notes"). Totals must equal the
// ledger to the cent.
func TestScaleUpTable(t *testing.T) {
	t.Parallel()
	r := syntheticSweep(30, 2)
	b, lay := render(t, r, Options{})
	f := open(t, b)
	head, err := f.GetCellValue(sheetScaleUp, cellName(suMass, suHeaderRow))
	if err != nil || head != "Crude mass (g)" {
		t.Fatalf("header %q (%v)", head, err)
	}
	totals := 0
	for _, c := range lay.money {
		if c.sheet == sheetScaleUp {
			totals++
		}
	}
	rows := r.Rows()
	nm, n := len(r.Methods), len(r.MassesKg)
	feasible := 0
	for j := range r.Methods {
		for i := range r.MassesKg {
			row := rows[i*nm+j]
			k := suFirstRow + j*n + i
			get := func(col int) string {
				v, _ := f.GetCellValue(sheetScaleUp, cellName(col, k), excelize.Options{RawCellValue: true})
				return v
			}
			if got := get(suMethod); got != capitalize(row.Method) {
				t.Fatalf("row %d: method %q, want %q", k, got, row.Method)
			}
			if !row.Feasible {
				if got := get(suFeasible); got != "not feasible: "+row.Reason {
					t.Errorf("row %d: %q, want the reason", k, got)
				}
				for _, col := range []int{suTotal, suPerGram, suEFactor, suElapsed} {
					if v := get(col); v != "" {
						t.Errorf("row %d col %s: %q where the method is not feasible", k, colName(col), v)
					}
				}
				continue
			}
			feasible++
			ref := cellName(suTotal, k)
			fo, _ := f.GetCellFormula(sheetScaleUp, ref)
			if !strings.HasPrefix(fo, "ROUND(") {
				t.Errorf("row %d: total formula %q, want the sum of ROUND terms", k, fo)
			}
			got, err := f.CalcCellValue(sheetScaleUp, ref, excelize.Options{RawCellValue: true})
			if err != nil {
				t.Fatalf("%s: %v", ref, err)
			}
			// Source: the report's ledger total (EUR, two places, ISO 4217).
			if !sameToTheCent(got, row.Total, 2) {
				t.Errorf("row %d: total recalculates to %s, ledger %s", k, got, row.Total)
			}
			pg, err := f.CalcCellValue(sheetScaleUp, cellName(suPerGram, k), excelize.Options{RawCellValue: true})
			if err != nil {
				t.Fatal(err)
			}
			// Source: scale.Row.PerGram = total / product; 1e-12 relative
			// covers the product written to 15 significant digits.
			if v, err := strconv.ParseFloat(pg, 64); err != nil || math.Abs(v-row.PerGram) > 1e-12*row.PerGram {
				t.Errorf("row %d: cost per gram %s, report %v", k, pg, row.PerGram)
			}
			for _, c := range []struct {
				col  int
				want float64
			}{{suEFactor, row.EFactor}, {suPMI, row.PMI}, {suElapsed, row.HoursElapsed}, {suWaste, row.WasteKg}} {
				v, err := strconv.ParseFloat(get(c.col), 64)
				if err != nil || math.Abs(v-c.want) > 1e-12*math.Abs(c.want) {
					t.Errorf("row %d col %s: %q, report %v", k, colName(c.col), get(c.col), c.want)
				}
			}
		}
	}
	if totals != feasible {
		t.Errorf("%d Scale-up totals compared with the ledger, %d feasible rows", totals, feasible)
	}
	if v, _ := f.GetCellValue(sheetScaleUp, cellName(suMass, suFirstRow+nm*n)); v != "" {
		t.Errorf("a row after the last method's block: %q", v)
	}
}

// TestScaleUpNoNaN: figures that are not numbers give "n/a" or a gap on
// the Scale-up sheet, never NaN or Inf, and no formula refers to them.
func TestScaleUpNoNaN(t *testing.T) {
	t.Parallel()
	for _, n := range []int{6, 20} { // with and without detail sheets
		r := syntheticSweep(n, 2)
		res := &r.Results[3][0]
		res.Metrics.EFactor = math.NaN()
		res.Metrics.PMI = math.Inf(1)
		res.Usage.Activities[0].Elapsed = math.Inf(1)
		res.Usage.Figures[4].SI = math.NaN() // solvent_total_l
		res.Usage.Equipment = ""
		b, _ := render(t, r, Options{})
		d := dump(t, b)
		for _, bad := range []string{"NaN", "Inf"} {
			if strings.Contains(d, bad) {
				t.Errorf("%d masses: dump contains %q", n, bad)
			}
		}
		f := open(t, b)
		k := suFirstRow + 3
		// Source: DEVELOPERS.md, "Library notes" (NaN and ±Inf never reach a cell); a column a
		// chart plots is left empty, a gap, the others say "n/a".
		for col, want := range map[int]string{suEFactor: "", suPMI: "n/a", suElapsed: "", suSolvent: "n/a"} {
			if v, _ := f.GetCellValue(sheetScaleUp, cellName(col, k)); v != want {
				t.Errorf("%d masses: %s = %q, want %q", n, cellName(col, k), v, want)
			}
		}
	}
}

// TestSummaryDecision: the Summary lists methods that are not feasible in
// name order whatever the map order; the Decision sheet names the
// break-even price cell of each flip after its own Prices row, and says so
// when a sweep finds no crossover or has a single method.
func TestSummaryDecision(t *testing.T) {
	t.Parallel()
	r := sweepReport()
	r.Decision.Infeasible = map[string]string{"distillation": "no volatile product", "adsorption": "no adsorbent priced", "membrane": "no membrane data"}
	b, _ := render(t, r, Options{})
	f := open(t, b)
	rows, _ := f.GetRows(sheetSummary)
	var order []string
	for _, row := range rows {
		if len(row) > 2 && row[0] == "Not feasible" {
			order = append(order, row[1])
		}
	}
	// Source: the three names in alphabetical order (the map has none).
	if strings.Join(order, ",") != "Adsorption,Distillation,Membrane" {
		t.Errorf("methods not feasible listed as %v", order)
	}
	prices, _ := f.GetRows(sheetPrices)
	rows, _ = f.GetRows(sheetDecision)
	flips := 0
	// Source: sweepReport's hand computation, break-even ÷ price now:
	// 51.1627 / 68 = 0.75239, 29.3064 / 18.90 = 1.55060, 202.9983 / 95 = 2.13682.
	ratios := map[string]float64{"chemist": 0.75239, "n-heptane": 1.55060, "silica gel": 2.13682}
	for k, row := range rows {
		if len(row) < 6 || !strings.HasSuffix(row[5], "the break-even price") {
			continue
		}
		flips++
		got, err := f.CalcCellValue(sheetDecision, cellName(5, k+1), excelize.Options{RawCellValue: true})
		v, perr := strconv.ParseFloat(got, 64)
		// 1e-5 relative: the hand ratios are rounded to five significant digits.
		if want := ratios[row[0]]; err != nil || perr != nil || math.Abs(v-want) > 1e-5*want {
			t.Errorf("row %d: break-even ÷ price now of %s is %q (%v), want %v", k+1, row[0], got, err, want)
		}
		fo, _ := f.GetCellFormula(sheetDecision, cellName(3, k+1))
		m := regexp.MustCompile(`^Prices!\$C\$(\d+)$`).FindStringSubmatch(fo)
		if m == nil {
			t.Errorf("row %d: price now %q is not a Prices reference", k+1, fo)
			continue
		}
		n, _ := strconv.Atoi(m[1])
		if prices[n-1][0] != row[0] {
			t.Errorf("row %d: the price of %q refers to Prices row %d, %q", k+1, row[0], n, prices[n-1][0])
		}
	}
	if flips != len(r.Decision.Flips) {
		t.Errorf("%d break-even rows, want %d", flips, len(r.Decision.Flips))
	}

	for _, tc := range []struct {
		methods int
		phrase  string
	}{
		{2, "From 100 mg to 10 kg the same method is cheapest per gram of purified product throughout"},
		{1, "Only one method was costed"},
	} {
		r := syntheticSweep(8, tc.methods)
		r.Crossovers = nil
		if d := dump(t, func() []byte { b, _ := render(t, r, Options{}); return b }()); !strings.Contains(d, tc.phrase) {
			t.Errorf("%d methods, no crossover: the Summary lacks %q", tc.methods, tc.phrase)
		}
	}
}

// TestScaleUpOmitCachedValues: the variant for recalculation has the
// Scale-up formulas without values.
func TestScaleUpOmitCachedValues(t *testing.T) {
	t.Parallel()
	r := syntheticSweep(20, 2)
	b, lay := render(t, r, Options{OmitCachedValues: true})
	f := open(t, b)
	n := 0
	for _, c := range lay.money {
		if c.sheet != sheetScaleUp {
			continue
		}
		n++
		if v, _ := f.GetCellValue(c.sheet, c.ref, excelize.Options{RawCellValue: true}); v != "" {
			t.Errorf("%s!%s: cached %q", c.sheet, c.ref, v)
		}
	}
	if n == 0 {
		t.Error("no Scale-up totals")
	}
}

// TestScaleUpChartsLeaveOutMethodsNeverFeasible: a method not feasible at
// any mass (e.g. one the scenario does not describe) gets no series, so
// the legend names only curves that are drawn.
func TestScaleUpChartsLeaveOutMethodsNeverFeasible(t *testing.T) {
	t.Parallel()
	r := syntheticSweep(20, 2)
	for i := range r.Results {
		r.Results[i][1] = scale.Result{Usage: r.Results[i][1].Usage}
		r.Results[i][1].Usage.Feasible = false
		r.Results[i][1].Usage.Reason = "not assessed: the scenario has no crystallization section"
	}
	b, _ := render(t, r, Options{})
	parts := zipParts(t, b)
	charts := scaleUpCharts(t, parts)
	if len(charts) != 3 {
		t.Fatalf("%d charts, want 3", len(charts))
	}
	for _, c := range charts {
		sers := serRe.FindAllStringSubmatch(parts[c], -1)
		if len(sers) != 1 {
			t.Errorf("%s: %d series, want 1 (chromatography only)", c, len(sers))
			continue
		}
		name := fRe.FindStringSubmatch(html.UnescapeString(sers[0][1]))[1]
		if want := sheetRef(sheetScaleUp, absName(suMethod, suFirstRow)); name != want {
			t.Errorf("%s: series name %s, want %s", c, name, want)
		}
	}
}

// TestScaleUpRepeatedLine: without detail sheets each ledger line has a
// quantity column of its own; a ledger that bills the same item for the
// same label twice keeps both lines, in two columns, and its total still
// recalculates to the ledger's.
func TestScaleUpRepeatedLine(t *testing.T) {
	t.Parallel()
	r := syntheticSweep(MaxDetailMasses+2, 1)
	l := &r.Results[5][0].Ledger
	dup := l.Lines[0]
	l.Lines = append(l.Lines, dup)
	l.Total = l.Total.Add(dup.Amount)
	b, _ := render(t, r, Options{})
	f := open(t, b)
	head, _ := f.GetRows(sheetScaleUp)
	n := 0
	for _, h := range head[suHeaderRow-1] {
		if strings.HasPrefix(h, "silica gel (kg): stationary phase") {
			n++
		}
	}
	if n != 2 {
		t.Errorf("%d silica gel columns, want 2 (the line and its repeat)", n)
	}
	ref := cellName(suTotal, suFirstRow+5)
	got, err := f.CalcCellValue(sheetScaleUp, ref, excelize.Options{RawCellValue: true})
	// Source: the report's ledger total with the repeated line (EUR, two places).
	if err != nil || !sameToTheCent(got, l.Total, 2) {
		t.Errorf("%s recalculates to %q (%v), ledger %s", ref, got, err, l.Total)
	}
}
