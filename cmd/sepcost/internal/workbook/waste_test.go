package workbook

import (
	"math"
	"strconv"
	"strings"
	"testing"

	"github.com/xuri/excelize/v2"

	"sepcost/costing/green"
	"sepcost/costing/ledger"
	"sepcost/costing/solvent"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale"
)

// sheetRows reads a sheet's rows with raw values (numbers unformatted).
func sheetRows(t *testing.T, f *excelize.File, sheet string) [][]string {
	t.Helper()
	rows, err := f.GetRows(sheet, excelize.Options{RawCellValue: true})
	if err != nil {
		t.Fatalf("%s: %v", sheet, err)
	}
	return rows
}

// at is a row's cell in 1-based column c, "" when the row is shorter.
func at(row []string, c int) string {
	if c-1 < len(row) {
		return row[c-1]
	}
	return ""
}

// rowAfter is the index of the first row after `from` whose first cell is
// text, or -1.
func rowAfter(rows [][]string, from int, text string) int {
	for k := from + 1; k < len(rows); k++ {
		if at(rows[k], 1) == text {
			return k
		}
	}
	return -1
}

// number reads a cell written as a number.
func number(t *testing.T, where, s string) float64 {
	t.Helper()
	v, err := strconv.ParseFloat(s, 64)
	if err != nil {
		t.Fatalf("%s: %q is not a number", where, s)
	}
	return v
}

// near compares with a tolerance relative to the expected value.
func near(got, want, rel float64) bool {
	return math.Abs(got-want) <= rel*math.Abs(want)
}

// parseNumbers reads a rule list such as "1, 2, 5–7".
func parseNumbers(t *testing.T, s string) []int {
	t.Helper()
	var out []int
	for _, part := range strings.Split(s, ", ") {
		lo, hi, isRange := strings.Cut(part, "–")
		a, err := strconv.Atoi(lo)
		if err != nil {
			t.Fatalf("rule list %q: %q", s, part)
		}
		b := a
		if isRange {
			if b, err = strconv.Atoi(hi); err != nil {
				t.Fatalf("rule list %q: %q", s, part)
			}
		}
		for n := a; n <= b; n++ {
			out = append(out, n)
		}
	}
	return out
}

// TestNumberList: footnote numbers ascending, runs of three or more as a
// range (common practice, no source: how footnotes are cited in print).
func TestNumberList(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		in   []int
		want string
	}{
		{[]int{1}, "1"},                     // common practice: a single note
		{[]int{2, 1}, "1, 2"},               // common practice: two in a row are listed
		{[]int{7, 5, 6, 1, 2}, "1, 2, 5–7"}, // common practice: three or more in a row are a range
		{[]int{3, 3, 4, 5, 9}, "3–5, 9"},    // common practice: a repeat counts once
		{nil, ""},
	} {
		if got := numberList(c.in); got != c.want {
			t.Errorf("numberList(%v) = %q, want %q", c.in, got, c.want)
		}
	}
}

// TestWasteCodes reads the suggested codes of the demo's streams from the
// Waste sheet and checks them against the regulations, and that every row
// refers to rules printed below the table.
func TestWasteCodes(t *testing.T) {
	t.Parallel()
	r := demoReport(t)
	b, _ := render(t, r, Options{})
	f := open(t, b)
	rows := sheetRows(t, f, sheetWaste)
	head := rows[0]
	col := func(prefix string) int {
		for k, h := range head {
			if strings.HasPrefix(h, prefix) {
				return k + 1
			}
		}
		t.Fatalf("no %q column in %q", prefix, head)
		return 0
	}
	eu, us, ruleCol := col("EU List of Waste"), col("US EPA"), col("Rules applied")
	if eu != wEU || us != wUS || ruleCol != wRules || at(head, wDisposal) != "Disposal cost" || at(head, wKg) != "kg" {
		t.Fatalf("columns moved: %q", head)
	}

	// The numbered rules below the table.
	ruleHead := rowAfter(rows, 0, "Rule")
	if ruleHead < 0 {
		t.Fatal("no numbered list of rules")
	}
	rules := map[int]string{}
	for k := ruleHead + 1; k < len(rows) && at(rows[k], 1) != ""; k++ {
		rules[int(number(t, "rule number", at(rows[k], 1)))] = at(rows[k], 2)
	}

	type want struct {
		eu     string
		us     []string // codes that must be there
		usNone bool     // no US code at all
	}
	wants := map[[2]string]want{
		// Source: Commission Decision 2014/955/EU (List of Waste), chapter
		// 07 05, entry 07 05 04* "other organic solvents, washing liquids
		// and mother liquors" (the demo's sector is pharmaceuticals). Source:
		// 40 CFR 261.21(a)(1): a liquid with a closed-cup flash point below
		// 60 °C is ignitable, D001; ethyl acetate and n-heptane flash at
		// about -4 °C (suppliers' safety data sheets, from memory).
		{"Chromatography", "spent eluent and mixed fractions"}: {eu: "07 05 04*", us: []string{"D001"}},
		// Source: 2014/955/EU, entry 07 05 10* "other filter cakes and spent
		// absorbents"; 40 CFR 261.21(a)(1) is a test for liquids, and the
		// eluent blends hold less than 10 % of F001/F002/F004/F005 solvents
		// (40 CFR 261.31(a)), so no US code is suggested for the wet silica.
		{"Chromatography", "solvent-wet silica, sand and TLC plates"}: {eu: "07 05 10*", usNone: true},
		// Source: 2014/955/EU, 07 05 04* (ethanol with about 28 % water is not
		// an aqueous liquor); 40 CFR 261.21(a)(1): ethanol flashes at 13 °C
		// (suppliers' safety data sheets, from memory), and the exclusion for
		// aqueous alcohol needs at least 50 % water and less than 24 %
		// alcohol, so D001.
		{"Crystallization", "mother liquor"}: {eu: "07 05 04*", us: []string{"D001"}},
		{"Crystallization", "washings"}:      {eu: "07 05 04*", us: []string{"D001"}},
	}
	seen := map[[2]string]int{}
	for k := 1; k < len(rows); k++ {
		row := rows[k]
		if at(row, wEU) == "" {
			if strings.HasPrefix(at(row, 1), "Caution") {
				break
			}
			continue
		}
		key := [2]string{at(row, wMethod), at(row, wStream)}
		where := at(row, wMass) + " " + key[0] + " " + key[1]
		ns := parseNumbers(t, at(row, wRules))
		euRule := false
		for _, n := range ns {
			text, ok := rules[n]
			if !ok {
				t.Errorf("%s: rule %d is not in the list below the table", where, n)
			}
			euRule = euRule || (strings.HasPrefix(text, "EU:") && strings.Contains(text, at(row, wEU)))
		}
		if !euRule {
			t.Errorf("%s: no rule among %v gives the EU code %q", where, ns, at(row, wEU))
		}
		w, ok := wants[key]
		if !ok {
			continue
		}
		seen[key]++
		if at(row, wEU) != w.eu {
			t.Errorf("%s: EU %q, want %q", where, at(row, wEU), w.eu)
		}
		codes := strings.Fields(at(row, wUS))
		if w.usNone && at(row, wUS) != "none" {
			t.Errorf("%s: US %q, want none", where, at(row, wUS))
		}
		for _, c := range w.us {
			if !contains(codes, c) {
				t.Errorf("%s: US %q lacks %s", where, at(row, wUS), c)
			}
		}
	}
	for key := range wants {
		// Source: the demo scenario runs both methods at its three masses
		// (templates/scenario.yaml).
		if seen[key] != 3 {
			t.Errorf("%v: %d rows, want one per mass (3)", key, seen[key])
		}
	}

	// The caution: classification is the site EHS office's decision
	// (DEVELOPERS.md, "Cautions").
	found := false
	for _, row := range rows {
		if c := at(row, 1); strings.HasPrefix(c, "Caution") {
			found = strings.Contains(c, "EHS") && strings.Contains(c, "not a waste determination") && strings.Contains(c, "rules that apply locally")
		}
	}
	if !found {
		t.Error("no caution that the EHS office decides the classification under local rules")
	}
}

// handGreenReport is a recrystallization of 1 kg of crude from 10 L of
// ethanol that recovers 0.8 kg, the mother liquor being the only waste
// (the case of green.ExampleCompute), with its metrics computed by the
// costing package.
func handGreenReport(t *testing.T) *scale.Report {
	t.Helper()
	book := solvent.Builtin()
	etoh, ok := book.Find("ethanol")
	if !ok {
		t.Fatal("no ethanol in the built-in solvent book")
	}
	u := usage.Usage{Method: "crystallization", CrudeKg: 1, ProductInKg: 0.95, ProductOutKg: 0.8, Feasible: true,
		Demands: []usage.Demand{{Item: "ethanol", Label: "solvent", Group: usage.Materials, Qty: 10e-3, Dim: units.Volume}},
		Waste: []usage.Stream{{Name: "mother liquor", Class: usage.NonHalogenated, VolumeM3: 10e-3, Components: []usage.Component{
			{Name: "ethanol", Kg: 10e-3 * etoh.Density.V, Solvent: true},
			{Name: "impurities and lost product", Kg: 0.2},
		}}}}
	m, err := green.Compute(u, book)
	if err != nil {
		t.Fatal(err)
	}
	p := fixturePrices()
	return &scale.Report{Title: "Hand case", ScenarioFile: "hand", PricesFile: p.File, Prices: p,
		MassesKg: []float64{1}, Methods: []string{"crystallization"},
		Results: [][]scale.Result{{{Usage: u, Ledger: ledger.Ledger{}, Metrics: &m}}}}
}

// greenRow finds the green metrics row of a mass and method.
func greenRow(t *testing.T, rows [][]string, mass, method string) []string {
	t.Helper()
	start := rowAfter(rows, 0, "Green metrics")
	if start < 0 {
		t.Fatal("no Green metrics section")
	}
	for k := start + 2; k < len(rows); k++ {
		if at(rows[k], 1) == mass && at(rows[k], 2) == method {
			return rows[k]
		}
	}
	t.Fatalf("no green metrics row for %s %s", mass, method)
	return nil
}

// TestGreenMetricsByHand checks the Waste sheet's green metrics of a case
// worked by hand from handbook data.
func TestGreenMetricsByHand(t *testing.T) {
	t.Parallel()
	b, _ := render(t, handGreenReport(t), Options{})
	f := open(t, b)
	rows := sheetRows(t, f, sheetWaste)
	row := greenRow(t, rows, "1 kg", "Crystallization")
	// Hand computation with ethanol at 0.789 g/mL, 20 °C (CRC Handbook of
	// Chemistry and Physics, from memory; 0.7893 in other editions, hence
	// the relative tolerance of 0.1 %): 10 L of ethanol = 7.89 kg.
	//   waste   = 7.89 + 0.2 = 8.09 kg
	//   input   = 1 + 7.89 = 8.89 kg
	//   E       = 8.09 / 0.8 = 10.1125 (Sheldon, Green Chem. 2007, 9, 1273)
	//   PMI     = 8.89 / 0.8 = 11.1125 (Jiménez-González et al., OPRD 2011, 15, 912)
	//   SI      = 7.89 / 0.8 = 9.8625
	// No water, so the variants without water are the same; no halogenated
	// solvent, so the halogenated share is 0.
	//   gap     = 8.89 − 0.8 − 8.09 = 0 (every input leaves as product or waste)
	for k, want := range []float64{10.1125, 10.1125, 11.1125, 11.1125, 9.8625, 0, 8.09, 8.89, 0.8, 0} {
		c := 3 + k
		got := number(t, greenMetrics[k].name, at(row, c))
		if !near(got, want, 1e-3) && !(want == 0 && got == 0) {
			t.Errorf("%s (column %s): %g, want %g", greenMetrics[k].name, colName(c), got, want)
		}
	}
	// Each metric is defined in words with its source beside it.
	def := rowAfter(rows, 0, "Metric")
	if def < 0 {
		t.Fatal("no definitions of the green metrics")
	}
	for k, gm := range greenMetrics {
		row := rows[def+1+k]
		if at(row, 1) != gm.name || at(row, 3) == "" || at(row, 6) == "" {
			t.Errorf("definition row %d: %q", k, row)
		}
	}
	d := dump(t, b)
	for _, cite := range []string{"Sheldon, R. A.", "Green Chem. 2007, 9, 1273", "Chem. Ind. (London) 1992",
		"Jiménez-González, C.", "Org. Process Res. Dev. 2011, 15, 912"} {
		if !strings.Contains(d, cite) {
			t.Errorf("the Waste sheet does not cite %q", cite)
		}
	}
}

// TestGreenMetricsAgreeWithStreams checks, on the demo, that each method's
// E-factor times its product is the waste it shows, and that this waste is
// the sum of its streams in the table above (E = m_waste / m_product,
// Sheldon, Green Chem. 2007, 9, 1273): the streams and the metrics come to
// the sheet by separate paths.
func TestGreenMetricsAgreeWithStreams(t *testing.T) {
	t.Parallel()
	r := demoReport(t)
	b, _ := render(t, r, Options{})
	f := open(t, b)
	rows := sheetRows(t, f, sheetWaste)
	streams := map[[2]string]float64{}
	count := map[[2]string]int{}
	for k := 1; k < len(rows) && !strings.HasPrefix(at(rows[k], 1), "Caution"); k++ {
		if v, err := strconv.ParseFloat(at(rows[k], wKg), 64); err == nil {
			key := [2]string{at(rows[k], wMass), at(rows[k], wMethod)}
			streams[key] += v
			count[key]++
		}
	}
	checked := 0
	for i, kg := range r.MassesKg {
		for j, meth := range r.Methods {
			if r.Results[i][j].Metrics == nil {
				continue
			}
			row := greenRow(t, rows, units.FormatMass(kg), capitalize(meth))
			e := number(t, "E-factor", at(row, 3))
			wasteKg := number(t, "waste", at(row, 9))
			product := number(t, "product", at(row, 11))
			// Identity, so only floating point separates the two: 1e-9.
			if !near(e*product, wasteKg, 1e-9) {
				t.Errorf("%s %s: E × product = %g, waste %g", units.FormatMass(kg), meth, e*product, wasteKg)
			}
			// Streams billed for disposal show the ledger's quantity, rounded
			// to the gram: allow half a gram a stream.
			key := [2]string{units.FormatMass(kg), capitalize(meth)}
			if math.Abs(streams[key]-wasteKg) > 0.0005*float64(count[key])+1e-9*wasteKg {
				t.Errorf("%s %s: streams sum to %g kg, metrics say %g kg", units.FormatMass(kg), meth, streams[key], wasteKg)
			}
			checked++
		}
	}
	if checked == 0 {
		t.Fatal("no green metrics on the demo's Waste sheet")
	}
}

// TestSolventSuggestions: a solvent's CHEM21 class and suggested
// substitutions are printed as suggestions, with their sources.
func TestSolventSuggestions(t *testing.T) {
	t.Parallel()
	r := twoMethodReport()
	dcm, _ := green.Class("dichloromethane")
	r.Greenness = []scale.SolventGreenness{
		{Solvent: "dichloromethane", Class: dcm, Suggestions: green.Substitutes("dichloromethane", green.Chromatography)},
		{Solvent: "n-heptane", Class: green.Problematic},
	}
	b, _ := render(t, r, Options{})
	f := open(t, b)
	rows := sheetRows(t, f, sheetWaste)
	start := rowAfter(rows, 0, "Solvent")
	if start < 0 {
		t.Fatal("no solvents table")
	}
	classes := map[string]string{}
	var dcmSources []string
	for k := start + 1; k < len(rows) && at(rows[k], 1) != ""; k++ {
		classes[at(rows[k], 1)] = at(rows[k], 3)
		if at(rows[k], 1) == "dichloromethane" {
			dcmSources = append(dcmSources, at(rows[k], wTextEnd))
		}
	}
	// Source: Prat, D. et al., Green Chem. 2016, 18, 288 (CHEM21 guide),
	// solvent table: dichloromethane S/H/E 1/7/7, hazardous; n-heptane
	// 6/2/7, problematic (confirmed in the guide's table as reproduced by
	// AI4Green).
	if classes["dichloromethane"] != "hazardous" || classes["n-heptane"] != "problematic" {
		t.Errorf("classes %v", classes)
	}
	// Source: Taygerly, J. P. et al., Green Chem. 2012, 14, 3020 (from
	// memory): replacements for dichloromethane in chromatography.
	if len(dcmSources) != 2 || !strings.Contains(dcmSources[0], "Taygerly") {
		t.Errorf("dichloromethane suggestions' sources %q", dcmSources)
	}
	d := dump(t, b)
	for _, s := range []string{"These are suggestions, not rewrites", "none suggested for the way this scenario uses it",
		"Green Chem. 2016, 18, 288"} {
		if !strings.Contains(d, s) {
			t.Errorf("the Waste sheet lacks %q", s)
		}
	}
}

// handUncertainty is an invented Monte Carlo result at 20 g in which no
// method is cheapest in four draws of five.
func handUncertainty() *scale.Uncertainty {
	return &scale.Uncertainty{TargetKg: 0.020, Draws: 400, Seed: 7, Bands: []scale.Band{
		{Method: "chromatography", P10: 45, P50: 51.5, P90: 60, Feasible: 1, Cheapest: 0.62},
		{Method: "crystallization", P10: 55, P50: 60, P90: 66, Feasible: 0.97, Cheapest: 0.38},
	}}
}

// TestUncertaintySheet checks the sheet's place (Scale-up,
// Waste, Uncertainty, Sources), its bands, the reading of a tie and the
// spreads drawn with their statement of provenance.
func TestUncertaintySheet(t *testing.T) {
	t.Parallel()
	r := twoMethodReport()
	r.Uncertainty = handUncertainty()
	b, _ := render(t, r, Options{})
	f := open(t, b)
	want := "Summary,Decision,Inputs,Prices,Chromatography,Crystallization,Waste,Uncertainty,Sources"
	if got := strings.Join(f.GetSheetList(), ","); got != want {
		t.Fatalf("sheets %s, want %s", got, want)
	}
	rows := sheetRows(t, f, sheetUncertainty)
	if at(rows[rowAfter(rows, 0, "Draws")], 2) != "400" || at(rows[rowAfter(rows, 0, "Seed")], 2) != "7" {
		t.Error("draws or seed not shown")
	}
	if !strings.HasPrefix(at(rows[rowAfter(rows, 0, "Target mass")], 2), "20 g") {
		t.Error("target mass not shown")
	}
	for _, bd := range r.Uncertainty.Bands {
		k := rowAfter(rows, 0, capitalize(bd.Method))
		if k < 0 {
			t.Fatalf("no row for %s", bd.Method)
		}
		for c, w := range []float64{bd.P10, bd.P50, bd.P90, bd.Feasible, bd.Cheapest} {
			if got := number(t, bd.Method, at(rows[k], 2+c)); got != w {
				t.Errorf("%s column %s: %g, want %g", bd.Method, colName(2+c), got, w)
			}
		}
	}
	d := dump(t, b)
	// Source: scale.ConfidentShare, four draws in five (common practice, no
	// source): 62 % is not a clear win.
	// The share's binomial standard error: √(0.62 · 0.38 / 400) = 0.02427,
	// 2.43 % (hand computation).
	for _, s := range []string{"fewer than 80 % of the draws", "tied within the models' uncertainty", "known to about ±2.43 % with 400 draws",
		"this project's choices (common practice, no source)", "Hyndman and Fan 1996"} {
		if !strings.Contains(d, s) {
			t.Errorf("the Uncertainty sheet lacks %q", s)
		}
	}
	// The spreads: σ by mark and for prices as scale sets them (this
	// project's choices: common practice, no source), and the factors at
	// ±1σ, exp(∓σ): e^0.05 = 1.05127, e^-0.05 = 0.951229 (mathematical
	// tables; relative 1e-12 for floating point).
	sigma := map[string]float64{}
	for k := rowAfter(rows, 0, "Values drawn") + 1; k < len(rows) && at(rows[k], 1) != ""; k++ {
		s := number(t, at(rows[k], 1), at(rows[k], 2))
		sigma[at(rows[k], 1)] = s
		if !near(number(t, "−1σ", at(rows[k], 3)), math.Exp(-s), 1e-12) || !near(number(t, "+1σ", at(rows[k], 4)), math.Exp(s), 1e-12) {
			t.Errorf("%s: factors %s, %s for σ %g", at(rows[k], 1), at(rows[k], 3), at(rows[k], 4), s)
		}
	}
	for mark, s := range scale.Spread {
		ok := false
		for label, got := range sigma {
			if strings.HasPrefix(label, "Coefficients marked "+string(mark)+" (") || label == "Coefficients marked "+string(mark) {
				ok = got == s
			}
		}
		if !ok {
			t.Errorf("no spread row for mark %q with σ %g", mark, s)
		}
	}
	// The default half-width of a price without a spread, as costing/prices
	// sets it (common practice, no source).
	if k := rowAfter(rows, 0, "A price without a spread"); k < 0 || at(rows[k], 2) != "15 % of the price" {
		t.Errorf("price spread row missing or wrong")
	}
	if got, ok := sigma["Coefficients marked confirmed (seen in a published table or regulation)"]; !ok || !near(math.Exp(got), 1.05127, 1e-5) {
		t.Errorf("confirmed σ %g", got)
	}
}

// TestUncertaintyWins: a method cheapest in at least four draws of five
// is a clear win; a method never feasible shows words, not numbers.
func TestUncertaintyWins(t *testing.T) {
	t.Parallel()
	r := sweepReport()
	r.Uncertainty = &scale.Uncertainty{TargetKg: 0.020, Draws: 50, Seed: 1, Bands: []scale.Band{
		{Method: "chromatography", P10: 45, P50: 51.5, P90: 60, Feasible: 1, Cheapest: 1},
		{Method: "crystallization", P10: math.NaN(), P50: math.NaN(), P90: math.NaN(), Feasible: 0, Cheapest: 0},
	}}
	b, _ := render(t, r, Options{})
	f := open(t, b)
	want := "Summary,Decision,Inputs,Prices,Chromatography,Crystallization,Scale-up,Waste,Uncertainty,Sources"
	if got := strings.Join(f.GetSheetList(), ","); got != want {
		t.Fatalf("sheets %s, want %s", got, want)
	}
	d := dump(t, b)
	// Source: scale.ConfidentShare, four draws in five (common practice, no
	// source): 100 % is a clear win.
	for _, s := range []string{"chromatography is cheapest in 100 % of the draws: a clear win", "not feasible in any draw"} {
		if !strings.Contains(d, s) {
			t.Errorf("the Uncertainty sheet lacks %q", s)
		}
	}
	if strings.Contains(d, "NaN") {
		t.Error("NaN written to a cell")
	}
}

// TestRowHeightLimit: a text too long for one row is cut at the largest
// row height a spreadsheet allows, not refused. Source: 409 points,
// excelize.MaxRowHeight and Excel's limit (Microsoft, "Excel
// specifications and limits", from memory).
func TestRowHeightLimit(t *testing.T) {
	t.Parallel()
	r := fixtureReport()
	r.Coefficients[0].Source = strings.Repeat("a long explanation ", 2000)
	b, _ := render(t, r, Options{})
	f := open(t, b)
	rows, _ := f.GetRows(sheetSources)
	at := 0
	for k, row := range rows {
		if len(row) > 5 && strings.Contains(row[5], "a long explanation") {
			at = k + 1
		}
	}
	if at == 0 {
		t.Fatal("the long source is not on the Sources sheet")
	}
	h, err := f.GetRowHeight(sheetSources, at)
	if err != nil {
		t.Fatal(err)
	}
	if h != 409 {
		t.Errorf("row height %g, want the limit, 409", h)
	}
}

// TestNoNaNInNewSheets: NaN and infinite green metrics and quantiles are
// written as "n/a" (DEVELOPERS.md, "Library notes").
func TestNoNaNInNewSheets(t *testing.T) {
	t.Parallel()
	r := twoMethodReport()
	r.Results[1][0].Metrics = &green.Metrics{EFactor: math.NaN(), PMI: math.Inf(1), ProductKg: 0.01472, IsolatedKg: 0.01472}
	r.Uncertainty = &scale.Uncertainty{TargetKg: 0.020, Draws: 10, Seed: 1, Bands: []scale.Band{
		{Method: "chromatography", P10: math.NaN(), P50: 3, P90: math.Inf(1), Feasible: 0.5, Cheapest: 0.5},
		{Method: "crystallization", P10: 1, P50: 2, P90: 3, Feasible: 0.5, Cheapest: 0.5},
	}}
	r.Greenness = []scale.SolventGreenness{{Solvent: "unobtainium"}}
	b, _ := render(t, r, Options{})
	d := dump(t, b)
	for _, bad := range []string{"NaN", "Inf"} {
		if strings.Contains(d, bad) {
			t.Errorf("dump contains %q", bad)
		}
	}
	f := open(t, b)
	row := greenRow(t, sheetRows(t, f, sheetWaste), "20 g", "Chromatography")
	if at(row, 3) != "n/a" || at(row, 5) != "n/a" {
		t.Errorf("green metrics row %q: want n/a for E and PMI", row)
	}
	u := sheetRows(t, f, sheetUncertainty)
	k := rowAfter(u, 0, "Chromatography")
	if at(u[k], 2) != "n/a" || at(u[k], 4) != "n/a" {
		t.Errorf("band row %q: want n/a for P10 and P90", u[k])
	}
	if !strings.Contains(d, "not ranked by the guide") {
		t.Error("a solvent the guide does not rank is not said to be unranked")
	}
}

// The marks the Uncertainty sheet describes are those scale.Spread sets:
// a mark added there without words here would be listed by its bare name.
func TestMarkMeaningsCoverSpread(t *testing.T) {
	t.Parallel()
	described := map[source.Mark]bool{}
	for _, m := range markMeanings {
		described[m.mark] = true
	}
	for mark := range scale.Spread {
		if !described[mark] {
			t.Errorf("mark %q has a spread but no meaning on the Uncertainty sheet", mark)
		}
	}
}

// The demo's scenario has no distillation section: the Waste sheet lists
// no distillation rows and says once, under the table, that the method was
// not assessed (the Summary says why as well).
func TestWasteLeavesOutMethodsNotDescribed(t *testing.T) {
	t.Parallel()
	b, _ := render(t, demoReport(t), Options{})
	f := open(t, b)
	rows, err := f.GetRows(sheetWaste)
	if err != nil {
		t.Fatal(err)
	}
	lines := 0
	for _, row := range rows {
		if len(row) > wMethod-1 && row[wMethod-1] == "Distillation" {
			t.Errorf("a distillation row on the Waste sheet: %q", row)
		}
		for _, c := range row {
			if strings.HasPrefix(c, "Not assessed, so not in the table: distillation") {
				lines++
			}
		}
	}
	if lines != 2 { // the streams and the green metrics
		t.Errorf("%d lines say distillation was not assessed, want 2 (streams, green metrics)", lines)
	}
}
