package workbook

import (
	"html"
	"math"
	"strings"
	"testing"

	"github.com/xuri/excelize/v2"

	"sepcost/scale"
)

// handAcross is an invented Monte Carlo result over the sweep fixture's
// masses: chromatography is cheapest at the small masses, crystallization
// at the large, and one input (the impurity's Rf) is worth 30 of a whole
// value of 120 EUR (all numbers invented for the test).
func handAcross(r *scale.Report) *scale.Uncertainty {
	u := &scale.Uncertainty{TargetKg: 0.020, Draws: 400, Seed: 3, Currency: "EUR", ProductG: 17, EVPI: 120, Leading: [2]int{0, 1},
		Bands: []scale.Band{
			{Method: "chromatography", P10: 45, P50: 51.5, P90: 60, Feasible: 1, Cheapest: 0.7},
			{Method: "crystallization", P10: 55, P50: 60, P90: 66, Feasible: 1, Cheapest: 0.3},
		},
		Inputs: []scale.Uncertain{
			{Name: "Rf of the nearest impurity", Field: "chromatography.impurity_rf", Kind: scale.KindMeasured, Nominal: 0.42, Lo: 0.39, Hi: 0.45, Dist: "rectangular", Basis: "as written"},
			{Name: "price of silica gel", Field: "price: silica gel", Kind: scale.KindPrice, Unit: "EUR/kg", Nominal: 95, Lo: 80.75, Hi: 109.25, Dist: "rectangular", Basis: "default"},
		},
		Worth:       []scale.Worth{{Input: 0, Value: 30}},
		Sensitivity: []scale.Sensitivity{{Input: 0, Rho: []float64{-0.6, 0.1}, Decision: -0.65}, {Input: 1, Rho: []float64{0.3, 0}, Decision: 0.3}},
	}
	for i, kg := range r.MassesKg {
		c := float64(i) / float64(len(r.MassesKg)-1)
		u.Across = append(u.Across, scale.MassBand{Kg: kg, Bands: []scale.Band{
			{Method: "chromatography", P10: 40, P50: 50, P90: 60, Feasible: 1, Cheapest: 1 - c},
			{Method: "crystallization", P10: 30, P50: 45, P90: 70, Feasible: 1, Cheapest: c},
		}})
	}
	u.Crossings = []scale.CrossBand{{A: "chromatography", B: "crystallization", P10: 0.01, P50: 0.05, P90: 0.2, Share: 0.9}}
	return u
}

// The value-of-information table lists each input's worth in money with
// its share of the whole (30 / 120 = 25 %, hand computation) and the
// sentence to act on; the sensitivity table keeps the sign of the rank
// correlation; the bands across the masses are written per mass; the
// crossover interval is said in words.
func TestUncertaintyValueOfInformation(t *testing.T) {
	t.Parallel()
	r := sweepReport()
	r.Uncertainty = handAcross(r)
	b, _ := render(t, r, Options{})
	f := open(t, b)
	rows := sheetRows(t, f, sheetUncertainty)
	k := rowAfter(rows, rowAfter(rows, 0, "What to measure next: the value of perfect information"), "Rf of the nearest impurity")
	if k < 0 {
		t.Fatal("no value-of-information row")
	}
	if got := number(t, "worth", at(rows[k], 2)); got != 30 {
		t.Errorf("worth %g, want 30", got)
	}
	if got := number(t, "share", at(rows[k], 3)); math.Abs(got-0.25) > 1e-12 {
		t.Errorf("share %g, want 0.25", got)
	}
	if !strings.Contains(at(rows[k], 4), "Measure the Rf of the nearest impurity again (chromatography.impurity_rf): worth up to 30 EUR in this decision") {
		t.Errorf("advice %q", at(rows[k], 4))
	}
	s := rowAfter(rows, rowAfter(rows, 0, "What moves the cost per gram: rank correlation with each input"), "Rf of the nearest impurity")
	if number(t, "rho", at(rows[s], 2)) != -0.6 || number(t, "rho", at(rows[s], 4)) != -0.65 {
		t.Errorf("sensitivity row %q", rows[s])
	}
	a := rowAfter(rows, 0, "Crude batch mass, g")
	for i, mb := range r.Uncertainty.Across {
		row := rows[a+1+i]
		// Source: the report's mass in kg × 1000 g/kg.
		if got := number(t, "mass", at(row, 1)); math.Abs(got-mb.Kg*1000) > 1e-9*mb.Kg*1000 {
			t.Errorf("row %d mass %g g, want %g", i, got, mb.Kg*1000)
		}
		if number(t, "p50", at(row, 3)) != 50 || number(t, "share", at(row, 9)) != mb.Bands[1].Cheapest {
			t.Errorf("row %d: %q", i, row)
		}
	}
	d := dump(t, b)
	for _, want := range []string{"change places in 90 % of the draws", "between 10 g and 200 g of crude", "JCGM 100:2008", "Strong and Oakley"} {
		if !strings.Contains(d, want) {
			t.Errorf("the Uncertainty sheet lacks %q", want)
		}
	}
}

// The Scale-up chart of cost per gram carries the P10 and P90 of each
// method from the Uncertainty sheet's table as four more series, each
// named by its header cell and plotted against the same masses in g.
func TestScaleUpBand(t *testing.T) {
	t.Parallel()
	r := sweepReport()
	r.Uncertainty = handAcross(r)
	b, _ := render(t, r, Options{})
	parts := zipParts(t, b)
	charts := scaleUpCharts(t, parts)
	f := open(t, b)
	found := false
	for _, c := range charts {
		x := parts[c]
		sers := serRe.FindAllStringSubmatch(x, -1)
		if !strings.Contains(x, "Cost per gram") {
			if len(sers) != len(r.Methods) {
				t.Errorf("%s: %d series, want one per method", c, len(sers))
			}
			continue
		}
		found = true
		if len(sers) != 3*len(r.Methods) {
			t.Fatalf("%s: %d series, want %d (each method and its P10 and P90)", c, len(sers), 3*len(r.Methods))
		}
		for _, s := range sers[len(r.Methods):] {
			refs := fRe.FindAllStringSubmatch(html.UnescapeString(s[1]), -1)
			sheet, cellRef := splitRef(t, refs[0][1])
			name, _ := f.GetCellValue(sheet, cellRef)
			if sheet != sheetUncertainty || !(strings.HasSuffix(name, "P10") || strings.HasSuffix(name, "P90")) {
				t.Errorf("band series named by %s %s = %q", sheet, cellRef, name)
			}
			xSheet, xCells := splitRef(t, refs[1][1])
			first, last, _ := strings.Cut(xCells, ":")
			_, r1, _ := excelize.CellNameToCoordinates(first)
			_, r2, _ := excelize.CellNameToCoordinates(last)
			if xSheet != sheetUncertainty || r2-r1+1 != len(r.MassesKg) {
				t.Errorf("band series X %s: want %d masses on the Uncertainty sheet", refs[1][1], len(r.MassesKg))
			}
		}
		if err := checkLogChart([]byte(x)); err != nil {
			t.Errorf("%s: %v", c, err)
		}
	}
	if !found {
		t.Error("no cost-per-gram chart")
	}
	// The Uncertainty sheet adds two charts: the rank correlations (bars)
	// and the cheapest shares against mass (log X).
	var all []string
	for name := range parts {
		if strings.HasPrefix(name, "xl/charts/chart") {
			all = append(all, name)
		}
	}
	bars, shares := 0, 0
	for _, name := range all {
		x := parts[name]
		switch {
		case strings.Contains(x, "barChart>") && strings.Contains(x, "Rank correlation"):
			bars++
		case strings.Contains(x, "Share of draws"):
			shares++
			if err := checkLogChart([]byte(x)); err != nil {
				t.Errorf("share chart: %v", err)
			}
		}
	}
	if bars != 1 || shares != 1 {
		t.Errorf("%d rank-correlation and %d share charts, want one each", bars, shares)
	}
}

// Limits are shown to four significant figures (hand-rounded cases).
func TestSig(t *testing.T) {
	t.Parallel()
	for _, c := range []struct{ v, want float64 }{{0.412557406503199, 0.4126}, {12.3787221, 12.38}, {1234567, 1235000}, {-0.000123456, -0.0001235}, {0, 0}} {
		if got := sig(c.v, 4); math.Abs(got-c.want) > 1e-12*math.Abs(c.want) {
			t.Errorf("sig(%g) = %g, want %g", c.v, got, c.want)
		}
	}
}
