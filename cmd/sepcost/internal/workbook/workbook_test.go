package workbook

import (
	"bytes"
	"context"
	"flag"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/shopspring/decimal"
	"github.com/xuri/excelize/v2"

	"sepcost/scale"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata/golden")

// goldenDir is the repository's testdata/golden seen from this package.
var goldenDir = filepath.Join("..", "..", "..", "..", "testdata", "golden")

// render builds and writes a report, returning the file and where the money cells are.
func render(t *testing.T, r *scale.Report, opt Options) ([]byte, *layout) {
	t.Helper()
	f, lay, err := build(r, opt, true)
	if err != nil {
		t.Fatalf("build: %v", err)
	}
	defer f.Close()
	var buf bytes.Buffer
	if err := f.Write(&buf); err != nil {
		t.Fatalf("write: %v", err)
	}
	// Write must give the same bytes' content as build + Write.
	var direct bytes.Buffer
	if err := Write(&direct, r, opt); err != nil {
		t.Fatalf("Write: %v", err)
	}
	if dump(t, direct.Bytes()) != dump(t, buf.Bytes()) {
		t.Fatal("Write and build give different workbooks")
	}
	return buf.Bytes(), lay
}

func dump(t *testing.T, b []byte) string {
	t.Helper()
	s, err := dumpWorkbook(bytes.NewReader(b), int64(len(b)))
	if err != nil {
		t.Fatalf("Dump: %v", err)
	}
	return s
}

func open(t *testing.T, b []byte) *excelize.File {
	t.Helper()
	f, err := excelize.OpenReader(bytes.NewReader(b))
	if err != nil {
		t.Fatalf("reopen: %v", err)
	}
	t.Cleanup(func() { f.Close() })
	return f
}

// sameToTheCent compares a spreadsheet number with a ledger decimal: equal
// after rounding to the currency's places, and within 1e-9 relative of it.
// The tolerance covers binary floating point only: a double holds 15 to 17
// significant decimal digits, so a result like 1.43 may be stored as
// 1.4299999999999999.
func sameToTheCent(got string, want decimal.Decimal, places int32) bool {
	d, err := decimal.NewFromString(got)
	if err != nil {
		return false
	}
	tol := decimal.NewFromFloat(1e-9).Mul(decimal.Max(decimal.NewFromInt(1), want.Abs()))
	return d.Round(places).Equal(want) && d.Sub(want).Abs().LessThanOrEqual(tol)
}

func TestGolden(t *testing.T) {
	for _, tc := range []struct {
		file   string
		r      *scale.Report
		sheets []string // only these sheets, and the workbook head; all when nil
	}{
		{"workbook-fixture.txt", fixtureReport(), nil},
		{"workbook-two-methods.txt", twoMethodReport(), nil},
		// The demos are checked by properties (money cells equal the
		// ledger, recalculation, pages per sheet); their goldens hold one
		// sheet each, so that a model change shows as a small diff.
		{"workbook-demo.txt", demoReport(t), []string{sheetSummary}},
		{"workbook-demo-liquid.txt", liquidDemoReport(t), []string{"Distillation"}},
		// A sweep with detail sheets: Scale-up totals refer to them.
		{"workbook-sweep.txt", sweepReport(), nil},
		// A sweep of more masses than get detail sheets: the Scale-up
		// sheet carries the ledger quantities and ROUND formulas.
		{"workbook-sweep-many.txt", syntheticSweep(MaxDetailMasses+2, 2), []string{sheetSummary, sheetScaleUp, sheetWaste}},
	} {
		t.Run(tc.file, func(t *testing.T) {
			b, _ := render(t, tc.r, Options{})
			got := onlySheets(dump(t, b), tc.sheets)
			path := filepath.Join(goldenDir, tc.file)
			if *update {
				if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			want, err := os.ReadFile(path)
			if err != nil {
				t.Fatalf("%v (run `go test -run TestGolden -update` to create it)", err)
			}
			if string(want) != got {
				if err := os.WriteFile(path+".got", []byte(got), 0o644); err != nil {
					t.Fatal(err)
				}
				t.Fatalf("dump differs from %s; see %s.got (rerun with -update if the change is intended)", path, path)
			}
			os.Remove(path + ".got")
		})
	}
}

// onlySheets keeps the head of a dump and the named sheets' sections.
func onlySheets(d string, names []string) string {
	if names == nil {
		return d
	}
	parts := strings.Split(d, "\nsheet ")
	out := []string{parts[0]}
	for _, p := range parts[1:] {
		for _, n := range names {
			if strings.Contains(strings.SplitN(p, "\n", 2)[0], strconv.Quote(n)) {
				out = append(out, p)
			}
		}
	}
	return strings.Join(out, "\nsheet ")
}

// TestFixtureIsHandComputed checks the fixture's hand computation against
// the rule it follows (DEVELOPERS.md, "Money"): amount = qty × unit price rounded half
// away from zero to the cent, total = sum of the rounded amounts.
func TestFixtureIsHandComputed(t *testing.T) {
	t.Parallel()
	r := twoMethodReport()
	// Source: hand computation in fixture_test.go, EUR.
	wantTotals := map[string]string{
		"chromatography at 250 mg": "119.71", "chromatography at 20 g": "758.57", "chromatography at 2 kg": "51080.61",
		"crystallization at 20 g": "820.59", "crystallization at 2 kg": "5208.00",
	}
	for i := range r.Results {
		for j, res := range r.Results[i] {
			name := describe(r, i, j)
			if !res.Usage.Feasible {
				continue
			}
			sum := decimal.Zero
			for _, l := range res.Ledger.Lines {
				if want := l.Qty.Mul(l.UnitPrice).Round(2); !l.Amount.Equal(want) {
					t.Errorf("%s, %s: hand amount %s, rule gives %s", name, l.Demand.Label, l.Amount, want)
				}
				sum = sum.Add(l.Amount)
			}
			want := decimal.RequireFromString(wantTotals[name])
			if !sum.Equal(want) || !res.Ledger.Total.Equal(want) {
				t.Errorf("%s: lines sum to %s, ledger total %s, hand total %s", name, sum, res.Ledger.Total, want)
			}
		}
	}
}

// moneyFormula reports whether a cell's style is a currency amount (not a price per gram).
func moneyFormat(f *excelize.File, sheet, ref string) bool {
	id, err := f.GetCellStyle(sheet, ref)
	if err != nil {
		return false
	}
	st, err := f.GetStyle(id)
	if err != nil || st.CustomNumFmt == nil {
		return false
	}
	return strings.HasSuffix(*st.CustomNumFmt, `"EUR"`)
}

// formulaCells lists every formula cell of a workbook as sheet → refs.
func formulaCells(t *testing.T, b []byte, f *excelize.File) map[string][]string {
	t.Helper()
	refs, err := cellRefs(bytes.NewReader(b), int64(len(b)))
	if err != nil {
		t.Fatal(err)
	}
	out := map[string][]string{}
	for sheet, list := range refs {
		for _, p := range list {
			ref := cellName(p.col, p.row)
			if fo, _ := f.GetCellFormula(sheet, ref); fo != "" {
				out[sheet] = append(out[sheet], ref)
			}
		}
	}
	return out
}

// TestCachedValuesEqualLedger reopens the file and compares every cached
// money value with the ledger, exactly, as decimal strings; and checks that
// no money formula escapes the comparison.
func TestCachedValuesEqualLedger(t *testing.T) {
	t.Parallel()
	for name, r := range map[string]*scale.Report{"fixture": fixtureReport(), "two methods": twoMethodReport(),
		"sweep": sweepReport(), "sweep of many masses": syntheticSweep(MaxDetailMasses+8, 2)} {
		t.Run(name, func(t *testing.T) {
			b, lay := render(t, r, Options{})
			f := open(t, b)
			checked := map[string]bool{}
			kinds := map[string]int{}
			for _, c := range lay.money {
				got, err := f.GetCellValue(c.sheet, c.ref, excelize.Options{RawCellValue: true})
				if err != nil {
					t.Fatal(err)
				}
				d, err := decimal.NewFromString(got)
				if err != nil || !d.Equal(c.want) {
					t.Errorf("%s!%s (%s): cached %q, ledger %s", c.sheet, c.ref, c.kind, got, c.want)
				}
				if fo, _ := f.GetCellFormula(c.sheet, c.ref); fo == "" {
					t.Errorf("%s!%s (%s): no formula", c.sheet, c.ref, c.kind)
				}
				checked[c.sheet+"!"+c.ref] = true
				kinds[c.kind]++
			}
			for sheet, refs := range formulaCells(t, b, f) {
				for _, ref := range refs {
					if moneyFormat(f, sheet, ref) && !checked[sheet+"!"+ref] {
						t.Errorf("%s!%s holds money but was not compared with the ledger", sheet, ref)
					}
				}
			}
			// Every disposal line of the fixture bills exactly one stream, so
			// the Waste sheet has one disposal formula per disposal line
			// (without detail sheets, per line at the one mass it lists).
			details := detailSheets(r)
			near := nearestMass(r.MassesKg, r.TargetKg)
			want := map[string]int{}
			for i := range r.Results {
				for _, res := range r.Results[i] {
					if !res.Usage.Feasible {
						continue
					}
					if r.IsSweep {
						want["scale-up total"]++
					}
					for _, l := range res.Ledger.Lines {
						if l.Demand.Group == "disposal" && (details || i == near) {
							want["disposal"]++
						}
						if details {
							want["line"]++
						}
					}
					if details {
						want["total"]++
						want["summary total"]++
					}
				}
			}
			for _, k := range []string{"line", "total", "summary total", "disposal", "scale-up total"} {
				if kinds[k] != want[k] {
					t.Errorf("%d money cells of kind %q, want %d (all kinds %v)", kinds[k], k, want[k], kinds)
				}
			}
		})
	}
}

// TestTotalsFoundByLabel finds the TOTAL row by its label, without the
// writer's own list of cells, and compares it with the hand totals.
func TestTotalsFoundByLabel(t *testing.T) {
	t.Parallel()
	b, _ := render(t, twoMethodReport(), Options{})
	f := open(t, b)
	// Source: hand computation in fixture_test.go, EUR.
	want := map[string][]string{
		"Chromatography":  {"119.71", "758.57", "51080.61"},
		"Crystallization": {"not feasible", "820.59", "5208.00"},
	}
	for sheet, totals := range want {
		rows, err := f.GetRows(sheet, excelize.Options{RawCellValue: true})
		if err != nil {
			t.Fatal(err)
		}
		found := false
		for _, row := range rows {
			if len(row) == 0 || row[0] != "TOTAL" {
				continue
			}
			found = true
			// Each mass has a Qty and a Cost column after the four fixed
			// ones; the total sits under Cost.
			for i, w := range totals {
				col := 4 + 2*i + 1
				if col >= len(row) {
					t.Fatalf("%s: TOTAL row too short: %q", sheet, row)
				}
				got := row[col]
				if d, err := decimal.NewFromString(w); err == nil {
					if g, err := decimal.NewFromString(got); err != nil || !g.Equal(d) {
						t.Errorf("%s TOTAL, mass %d: %q, want %s", sheet, i+1, got, w)
					}
				} else if got != w {
					t.Errorf("%s TOTAL, mass %d: %q, want %q", sheet, i+1, got, w)
				}
			}
		}
		if !found {
			t.Errorf("%s: no TOTAL row", sheet)
		}
	}
}

// TestCalcCellValue recalculates every money cell with excelize's own
// formula engine, a second oracle beside LibreOffice (DEVELOPERS.md, "Library notes").
func TestCalcCellValue(t *testing.T) {
	t.Parallel()
	r := twoMethodReport()
	b, lay := render(t, r, Options{})
	f := open(t, b)
	for _, c := range lay.money {
		got, err := f.CalcCellValue(c.sheet, c.ref, excelize.Options{RawCellValue: true})
		if err != nil {
			t.Fatalf("%s!%s: %v", c.sheet, c.ref, err)
		}
		places := int32(2) // Source: EUR has two decimal places (ISO 4217)
		if c.kind == "unit price" {
			places = 3 // the fixture's electricity price, 0.185 EUR/kWh, has three places
		}
		if !sameToTheCent(got, c.want, places) {
			t.Errorf("%s!%s (%s): CalcCellValue %q, ledger %s", c.sheet, c.ref, c.kind, got, c.want)
		}
	}
}

// TestLibreOfficeRecalculation writes the workbooks without cached values,
// lets LibreOffice calculate and save them, and compares: every money cell
// with the ledger to the cent, and every other formula with the value the
// writer caches. LibreOffice keeps cached values as written (DEVELOPERS.md, "Library notes"),
// hence the variant without them.
func TestLibreOfficeRecalculation(t *testing.T) {
	if testing.Short() {
		t.Skip("-short: LibreOffice recalculation skipped")
	}
	soffice, err := exec.LookPath("soffice")
	if err != nil {
		if os.Getenv("CI") != "" {
			t.Fatal("soffice (Debian package libreoffice-calc-nogui) is not on PATH; CI needs it")
		}
		t.Skip("soffice not on PATH")
	}
	dir := t.TempDir()
	out := filepath.Join(dir, "out")
	reports := map[string]*scale.Report{"fixture": fixtureReport(), "two-methods": twoMethodReport(), "demo": demoReport(t), "demo-liquid": liquidDemoReport(t),
		// Sweeps: Scale-up totals that refer to the method sheets, and
		// (many masses) totals that are sums of ROUND terms on the prices.
		"sweep": sweepReport(), "sweep-many": syntheticSweep(40, 2),
		// A sweep of the demo across price bands.
		"demo-sweep": demoSweepReport(t),
		// A campaign priced at other bands than one batch: a ledger of
		// it on the Budget sheet.
		"demo-campaign-bands": bandsDemoReport(t)}
	type written struct {
		cached []byte
		lay    *layout
	}
	ws := map[string]written{}
	var files []string
	for name, r := range reports {
		cached, lay := render(t, r, Options{})
		bare, _ := render(t, r, Options{OmitCachedValues: true})
		// The bare file must really lack the cached values.
		fb := open(t, bare)
		for _, c := range lay.money {
			if v, _ := fb.GetCellValue(c.sheet, c.ref, excelize.Options{RawCellValue: true}); v != "" {
				t.Fatalf("%s: %s!%s has cached value %q with OmitCachedValues", name, c.sheet, c.ref, v)
			}
		}
		p := filepath.Join(dir, name+".xlsx")
		if err := os.WriteFile(p, bare, 0o644); err != nil {
			t.Fatal(err)
		}
		files = append(files, p)
		ws[name] = written{cached, lay}
	}
	ctx, cancel := context.WithTimeout(context.Background(), 4*time.Minute)
	defer cancel()
	args := append([]string{"-env:UserInstallation=file://" + filepath.ToSlash(filepath.Join(dir, "profile")),
		"--headless", "--convert-to", "xlsx", "--outdir", out}, files...)
	cmd := exec.CommandContext(ctx, soffice, args...)
	if msg, err := cmd.CombinedOutput(); err != nil {
		t.Fatalf("soffice: %v\n%s", err, msg)
	}
	for name, w := range ws {
		conv, err := os.ReadFile(filepath.Join(out, name+".xlsx"))
		if err != nil {
			t.Fatalf("%s: LibreOffice wrote no file: %v", name, err)
		}
		lo := open(t, conv)
		for _, c := range w.lay.money {
			got, err := lo.GetCellValue(c.sheet, c.ref, excelize.Options{RawCellValue: true})
			if err != nil {
				t.Fatal(err)
			}
			places := int32(2)
			if c.kind == "unit price" {
				places = 3
			}
			if !sameToTheCent(got, c.want, places) {
				t.Errorf("%s: %s!%s (%s): LibreOffice %q, ledger %s", name, c.sheet, c.ref, c.kind, got, c.want)
			}
		}
		// Every other formula: LibreOffice's value against the cached one;
		// relative 1e-12 allows for a different order of float operations.
		fc := open(t, w.cached)
		n := 0
		for sheet, refs := range formulaCells(t, w.cached, fc) {
			for _, ref := range refs {
				want, _ := fc.GetCellValue(sheet, ref, excelize.Options{RawCellValue: true})
				got, _ := lo.GetCellValue(sheet, ref, excelize.Options{RawCellValue: true})
				n++
				wd, err1 := decimal.NewFromString(want)
				gd, err2 := decimal.NewFromString(got)
				if err1 != nil || err2 != nil {
					if want != got {
						t.Errorf("%s: %s!%s: LibreOffice %q, cached %q", name, sheet, ref, got, want)
					}
					continue
				}
				tol := decimal.NewFromFloat(1e-12).Mul(decimal.Max(decimal.NewFromInt(1), wd.Abs()))
				if gd.Sub(wd).Abs().GreaterThan(tol) {
					t.Errorf("%s: %s!%s: LibreOffice %s, cached %s", name, sheet, ref, got, want)
				}
			}
		}
		if n < len(w.lay.money) {
			t.Errorf("%s: only %d formula cells compared", name, n)
		}
	}
}

func TestDeterministic(t *testing.T) {
	t.Parallel()
	a, _ := render(t, twoMethodReport(), Options{})
	b, _ := render(t, twoMethodReport(), Options{})
	if dump(t, a) != dump(t, b) {
		t.Fatal("two writes of the same report give different dumps")
	}
	d := dump(t, a)
	for _, want := range []string{`creator "sepcost", created "2000-01-01T00:00:00Z", modified "2000-01-01T00:00:00Z"`,
		"full calculation on load: true"} {
		if !strings.Contains(d, want) {
			t.Errorf("dump lacks %q", want)
		}
	}
}

var sumRange = regexp.MustCompile(`([A-Z]+)(\d+):([A-Z]+)(\d+)`)

// TestNoNaN: a report with NaN and infinite values writes "n/a", never NaN
// or Inf, and no SUM runs over an "n/a" cell (DEVELOPERS.md, "Library notes").
func TestNoNaN(t *testing.T) {
	t.Parallel()
	r := fixtureReport()
	u := &r.Results[1][0].Usage
	u.Figures[0].SI = math.NaN()
	u.Activities[2].Elapsed = math.Inf(1)
	u.Waste[0].Components[0].Kg = math.NaN()
	r.Coefficients[0].SI = math.NaN()
	b, _ := render(t, r, Options{})
	d := dump(t, b)
	for _, bad := range []string{"NaN", "Inf"} {
		if strings.Contains(d, bad) {
			t.Errorf("dump contains %q", bad)
		}
	}
	if !strings.Contains(d, `"n/a"`) {
		t.Error(`no "n/a" cell written for the bad values`)
	}
	f := open(t, b)
	for sheet, refs := range formulaCells(t, b, f) {
		for _, ref := range refs {
			fo, _ := f.GetCellFormula(sheet, ref)
			for _, m := range sumRange.FindAllStringSubmatch(fo, -1) {
				c1, r1, _ := excelize.CellNameToCoordinates(m[1] + m[2])
				c2, r2, _ := excelize.CellNameToCoordinates(m[3] + m[4])
				for row := r1; row <= r2; row++ {
					for col := c1; col <= c2; col++ {
						if v, _ := f.GetCellValue(sheet, cellName(col, row)); v == "n/a" {
							t.Errorf("%s!%s: %s sums over n/a in %s", sheet, ref, fo, cellName(col, row))
						}
					}
				}
			}
		}
	}
}

func TestSheetsAndMarks(t *testing.T) {
	t.Parallel()
	r := twoMethodReport()
	b, _ := render(t, r, Options{})
	f := open(t, b)
	want := []string{"Summary", "Decision", "Inputs", "Prices", "Chromatography", "Crystallization", "Waste", "Sources"}
	if got := f.GetSheetList(); strings.Join(got, ",") != strings.Join(want, ",") {
		t.Fatalf("sheets %v, want %v", got, want)
	}
	for _, s := range want[2:] { // Summary and Decision open at the top, unfrozen
		p, err := f.GetPanes(s)
		if err != nil || !p.Freeze {
			t.Errorf("%s: no frozen panes (%v)", s, err)
		}
	}
	rows, err := f.GetRows("Summary")
	if err != nil {
		t.Fatal(err)
	}
	// Source: hand computation in fixture_test.go. Cheapest by the hand
	// totals: 0.25 g chromatography (the only feasible
	// method), 20 g chromatography (758.57 < 820.59), 2 kg crystallization
	// (5,208.00 < 51,080.61).
	marks := map[string]string{}
	for _, row := range rows {
		if len(row) >= 10 && row[len(row)-1] == "cheapest" {
			marks[row[0]] = row[1]
		}
		if len(row) >= 4 && row[0] == "250 mg" && row[1] == "Crystallization" && (row[2] != "not feasible" || !strings.HasPrefix(row[3], "below 1 g")) {
			t.Errorf("infeasible row shows %q, %q, not the status and the reason", row[2], row[3])
		}
	}
	wantMarks := map[string]string{"250 mg": "Chromatography", "20 g": "Chromatography", "2 kg": "Crystallization"}
	for m, meth := range wantMarks {
		if marks[m] != meth {
			t.Errorf("cheapest at %s: %q, want %q (all marks %v)", m, marks[m], meth, marks)
		}
	}
	// The infeasible block of the Crystallization sheet holds no number.
	cr, err := f.GetRows("Crystallization", excelize.Options{RawCellValue: true})
	if err != nil {
		t.Fatal(err)
	}
	for k, row := range cr {
		for _, col := range []int{4, 5} { // columns E and F: the 250 mg block
			if col < len(row) && row[col] != "" {
				if _, err := decimal.NewFromString(row[col]); err == nil {
					t.Errorf("Crystallization %s: number %q in the infeasible block", cellName(col+1, k+1), row[col])
				}
			}
		}
	}
	// Unit prices refer to the Prices row of their own item.
	pr, _ := f.GetRows("Prices")
	ch, _ := f.GetRows("Chromatography")
	ref := regexp.MustCompile(`^Prices!\$C\$(\d+)$`)
	n := 0
	for k, row := range ch {
		fo, _ := f.GetCellFormula("Chromatography", cellName(colUnitPrice, k+1))
		if fo == "" {
			continue
		}
		m := ref.FindStringSubmatch(fo)
		if m == nil {
			t.Errorf("unit price formula %q is not an absolute Prices reference", fo)
			continue
		}
		var pRow int
		for _, c := range m[1] {
			pRow = pRow*10 + int(c-'0')
		}
		if pr[pRow-1][0] != row[0] {
			t.Errorf("row %d item %q prices from Prices row %d, item %q", k+1, row[0], pRow, pr[pRow-1][0])
		}
		n++
	}
	// Source: the fixture's chromatography ledgers, counted by hand: silica
	// gel, sand, ethyl acetate, n-heptane, TLC plate, chemist, electricity,
	// two disposal items, product.
	if n != 10 {
		t.Errorf("%d unit price rows, want 10", n)
	}
}

func TestBadReports(t *testing.T) {
	t.Parallel()
	for _, tc := range []struct {
		name   string
		edit   func(r *scale.Report) *scale.Report
		phrase string
	}{
		{"nil report", func(*scale.Report) *scale.Report { return nil }, "no report"},
		{"no prices", func(r *scale.Report) *scale.Report { r.Prices = nil; return r }, "no price table"},
		{"currency", func(r *scale.Report) *scale.Report { r.Prices.Currency = "euro"; return r }, `currency "euro"`},
		{"mass count", func(r *scale.Report) *scale.Report { r.MassesKg = r.MassesKg[:2]; return r }, "3 batch masses but lists 2"},
		{"method count", func(r *scale.Report) *scale.Report { r.Methods = append(r.Methods, "distillation"); return r }, "1 results for 2 methods"},
		{"sheet name", func(r *scale.Report) *scale.Report { r.Methods[0] = "flash/column"; return r }, "cannot name a sheet"},
		{"sheet clash", func(r *scale.Report) *scale.Report { r.Methods[0] = "prices"; return r }, "already used"},
		{"sheet clash with Uncertainty", func(r *scale.Report) *scale.Report { r.Methods[0] = "uncertainty"; return r }, `gives the sheet name "Uncertainty", which is already used`},
		{"unit price", func(r *scale.Report) *scale.Report {
			r.Results[0][0].Ledger.Lines[0].UnitPrice = decimal.RequireFromString("90")
			return r
		}, "unit price 90 differs from the price table's 95"},
		{"amount", func(r *scale.Report) *scale.Report {
			r.Results[1][0].Ledger.Lines[2].Amount = decimal.RequireFromString("39.53")
			return r
		}, "chromatography at 20 g: ledger line 3 (ethyl acetate"},
		{"total", func(r *scale.Report) *scale.Report {
			r.Results[2][0].Ledger.Total = decimal.RequireFromString("51080.60")
			return r
		}, "is not the sum of its lines, 51080.61"},
		{"price row", func(r *scale.Report) *scale.Report { r.Results[0][0].Ledger.Lines[1].PriceRow = 40; return r }, "price row 40 is outside"},
		{"ledger currency", func(r *scale.Report) *scale.Report { r.Results[0][0].Ledger.Currency = "USD"; return r }, `ledger is in "USD"`},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var buf bytes.Buffer
			err := Write(&buf, tc.edit(fixtureReport()), Options{})
			if err == nil || !strings.Contains(err.Error(), tc.phrase) {
				t.Fatalf("error %v, want one containing %q", err, tc.phrase)
			}
			if buf.Len() != 0 {
				t.Error("bytes written despite the error")
			}
		})
	}
}
