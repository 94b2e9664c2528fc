package workbook

import (
	"bytes"
	"context"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"sort"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/shopspring/decimal"
	"github.com/xuri/excelize/v2"

	"sepcost/costing/ledger"
	"sepcost/costing/usage"
	"sepcost/scale"
	"sepcost/scale/campaign"
)

// tool finds a program the print test needs; CI must have it.
func tool(t *testing.T, name, pkg string) string {
	t.Helper()
	p, err := exec.LookPath(name)
	if err != nil {
		if os.Getenv("CI") != "" {
			t.Fatalf("%s (Debian package %s) is not on PATH; CI needs it", name, pkg)
		}
		t.Skipf("%s not on PATH", name)
	}
	return p
}

// printedPages prints each report to PDF with LibreOffice and counts the
// pages of each sheet, read from the sheet name that heads every page
// (pageSetup's header). It returns report → sheet → pages.
func printedPages(t *testing.T, reports map[string]*scale.Report) map[string]map[string]int {
	t.Helper()
	soffice := tool(t, "soffice", "libreoffice-calc-nogui")
	pdftotext := tool(t, "pdftotext", "poppler-utils")
	dir := t.TempDir()
	var files []string
	sheets := map[string][]string{}
	for name, r := range reports {
		b, _ := render(t, r, Options{})
		p := filepath.Join(dir, name+".xlsx")
		if err := os.WriteFile(p, b, 0o644); err != nil {
			t.Fatal(err)
		}
		files = append(files, p)
		sheets[name] = open(t, b).GetSheetList()
	}
	ctx, cancel := context.WithTimeout(context.Background(), 4*time.Minute)
	defer cancel()
	args := append([]string{"-env:UserInstallation=file://" + filepath.ToSlash(filepath.Join(dir, "profile")),
		"--headless", "--convert-to", "pdf", "--outdir", dir}, files...)
	if msg, err := exec.CommandContext(ctx, soffice, args...).CombinedOutput(); err != nil {
		t.Fatalf("soffice: %v\n%s", err, msg)
	}
	out := map[string]map[string]int{}
	for name := range reports {
		txt, err := exec.CommandContext(ctx, pdftotext, "-layout", filepath.Join(dir, name+".pdf"), "-").Output()
		if err != nil {
			t.Fatalf("%s: pdftotext: %v", name, err)
		}
		// Longest names first, so that "Scale-up" is not taken for a
		// shorter name it begins with.
		names := append([]string(nil), sheets[name]...)
		sort.Slice(names, func(i, j int) bool { return len(names[i]) > len(names[j]) })
		out[name] = map[string]int{}
		for k, page := range strings.Split(strings.TrimRight(string(txt), "\f"), "\f") {
			head := strings.TrimSpace(page)
			found := false
			for _, s := range names {
				if strings.HasPrefix(head, s) {
					out[name][s]++
					found = true
					break
				}
			}
			if !found {
				t.Errorf("%s: page %d is headed by no sheet name: %.60q", name, k+1, head)
			}
		}
	}
	return out
}

// TestPrintedPages prints the demos and a sweep to PDF and checks that
// each sheet prints on few enough pages to hand in: the Summary on one
// page, no sheet on more than a handful. The limits are this project's
// choice of what a reader will page through (common practice, no source).
func TestPrintedPages(t *testing.T) {
	if testing.Short() {
		t.Skip("-short: printing to PDF skipped")
	}
	pages := printedPages(t, map[string]*scale.Report{"demo": demoReport(t), "demo-liquid": liquidDemoReport(t), "sweep": sweepReport()})
	limit := map[string]int{sheetSummary: 1, sheetSources: 12}
	for name, per := range pages {
		total := 0
		for sheet, n := range per {
			total += n
			max, ok := limit[sheet]
			if !ok {
				max = 4
			}
			if n > max {
				t.Errorf("%s: sheet %s prints on %d pages; at most %d", name, sheet, n, max)
			}
		}
		t.Logf("%s: %d pages: %v", name, total, per)
	}
}

// TestPriceEditMovesDecision edits a price in the demo workbook (written
// without cached values), lets LibreOffice recalculate, and reads the
// recommendation: its cells are formulas on the costs per gram, so making
// the crystallization solvent a thousand times dearer must hand the
// decision at 2 kg to chromatography. Source of the expectation: the
// demo's own figures: crystallization at 2 kg uses about 16 L of ethanol
// (Summary table), at 1,000 × the example price the solvent alone costs
// far more than chromatography's 42.59 EUR/g × about 1,560 g.
//
// With the demo's campaign the decision is made per gram over the
// campaign, on the Budget sheet's campaign rows: see
// priceEditMovesCampaignDecision.
func TestPriceEditMovesDecision(t *testing.T) {
	if testing.Short() {
		t.Skip("-short: LibreOffice recalculation skipped")
	}
	soffice := tool(t, "soffice", "libreoffice-calc-nogui")
	t.Run("one batch", func(t *testing.T) { priceEditMovesBatchDecision(t, soffice) })
	t.Run("campaign", func(t *testing.T) { priceEditMovesCampaignDecision(t, soffice) })
}

// priceEditMovesBatchDecision is the demo without its campaign, ethanol
// a thousand times dearer.
func priceEditMovesBatchDecision(t *testing.T, soffice string) {
	b, _ := render(t, batchDemoReport(t), Options{OmitCachedValues: true})
	f := open(t, b)
	rows, err := f.GetRows(sheetPrices)
	if err != nil {
		t.Fatal(err)
	}
	edited := false
	for k, row := range rows {
		if len(row) > priceCol && row[0] == "ethanol" {
			old, _ := f.GetCellValue(sheetPrices, cellName(priceCol, k+1), excelize.Options{RawCellValue: true})
			p, _ := strconv.ParseFloat(old, 64)
			if err := f.SetCellFloat(sheetPrices, cellName(priceCol, k+1), p*1000, -1, 64); err != nil {
				t.Fatal(err)
			}
			edited = true
		}
	}
	if !edited {
		t.Fatal("no ethanol price on the Prices sheet")
	}
	dir := t.TempDir()
	in := filepath.Join(dir, "edited.xlsx")
	if err := f.SaveAs(in); err != nil {
		t.Fatal(err)
	}
	out := filepath.Join(dir, "out")
	ctx, cancel := context.WithTimeout(context.Background(), 2*time.Minute)
	defer cancel()
	cmd := exec.CommandContext(ctx, soffice, "-env:UserInstallation=file://"+filepath.ToSlash(filepath.Join(dir, "profile")),
		"--headless", "--convert-to", "xlsx", "--outdir", out, in)
	if msg, err := cmd.CombinedOutput(); err != nil {
		t.Fatalf("soffice: %v\n%s", err, msg)
	}
	conv, err := os.ReadFile(filepath.Join(out, "edited.xlsx"))
	if err != nil {
		t.Fatal(err)
	}
	lo := open(t, conv)
	summary, _ := lo.GetRows(sheetSummary)
	got := map[string][]string{}
	for _, row := range summary {
		if len(row) > 1 {
			got[row[0]] = row
		}
	}
	if rec := got["Recommended"]; len(rec) < 2 || rec[1] != "Chromatography" {
		t.Errorf("after the edit the recommendation is %q, want Chromatography", rec)
	}
	if ru := got["Runner-up"]; len(ru) < 2 || ru[1] != "Crystallization" {
		t.Errorf("after the edit the runner-up is %q, want Crystallization", ru)
	}
}

// priceEditMovesCampaignDecision edits the ethanol price in the demo
// workbook with its campaign. Over the campaign the demo recommends
// crystallization (about 1.5 EUR/g against 13.8 by chromatography).
// Ethanol is a price only crystallization pays (chromatography's eluent
// is n-heptane and ethyl acetate; the test takes the lines from the
// campaign ledgers), so the price p* at which the two costs per gram over
// the campaign meet follows from the campaign's own figures:
//
//	(T_c + b_c·(p* − p0)) / G_c = (T_h + b_h·(p* − p0)) / G_h
//
// T a method's campaign total, b the litres of ethanol it buys over the
// campaign (recurring lines × batches, one-time lines once), G its grams
// of product over the campaign, p0 the example price. At half of p*
// crystallization must stay recommended, at twice p* chromatography must
// take over; either way the recalculated cells must be the ledger's rule
// on the new price (ROUND(q × p, 2) a line, × batches, + one-time). p*,
// near 190 times the example price, is an exercise of the formulas, like
// the Decision sheet's break-even prices, not a market forecast.
func priceEditMovesCampaignDecision(t *testing.T, soffice string) {
	r := demoReport(t)
	if r.Decision == nil || !r.Decision.OnCampaign || r.Decision.Winner != "crystallization" || r.Decision.RunnerUp != "chromatography" {
		t.Fatalf("the demo's decision %+v is not crystallization over chromatography on the campaign", r.Decision)
	}
	row, ok := r.Prices.Find("ethanol")
	if !ok {
		t.Fatal("no ethanol price")
	}
	p0 := r.Prices.Items[row].Price
	cryst, _ := r.Campaign.Cost("crystallization")
	chrom, _ := r.Campaign.Cost("chromatography")
	perGram := func(c campaign.Cost, p decimal.Decimal) float64 {
		return repriced(c.Ledger, row, p, c.Batches).Add(c.Capital).InexactFloat64() / (c.ProductKg * 1000)
	}
	litres := func(c campaign.Cost) float64 {
		return repriced(c.Ledger, row, p0.Add(decimal.NewFromInt(1)), c.Batches).Sub(c.Total.Sub(c.Capital)).InexactFloat64()
	}
	gc, gh := cryst.ProductKg*1000, chrom.ProductKg*1000
	slope := litres(cryst)/gc - litres(chrom)/gh
	if !(slope > 0) {
		t.Fatalf("ethanol does not make crystallization dearer per gram than chromatography (slope %g)", slope)
	}
	breakEven := p0.InexactFloat64() + (chrom.PerGram-cryst.PerGram)/slope
	for _, tc := range []struct {
		factor         float64
		winner, runner campaign.Cost
	}{{0.5, cryst, chrom}, {2, chrom, cryst}} {
		p := decimal.NewFromFloat(breakEven * tc.factor).Round(2)
		bare, _ := render(t, r, Options{OmitCachedValues: true})
		f := open(t, bare)
		if err := f.SetCellValue(sheetPrices, cellName(priceCol, row+2), p.InexactFloat64()); err != nil {
			t.Fatal(err)
		}
		lo := recalculate(t, soffice, f)
		rows, err := lo.GetRows(sheetSummary, excelize.Options{RawCellValue: true})
		if err != nil {
			t.Fatal(err)
		}
		got := map[string][]string{}
		for _, row := range rows {
			if len(row) > 1 {
				got[row[0]] = row
			}
		}
		cell := func(label string, k int) string {
			if row := got[label]; len(row) > k {
				return row[k]
			}
			return ""
		}
		name := func(c campaign.Cost) string { return capitalize(c.Method) }
		if w := cell("Recommended", 1); w != name(tc.winner) {
			t.Errorf("ethanol at %s EUR/L (break-even %.2f): recommended %q, want %s", p, breakEven, w, name(tc.winner))
		}
		if ru := cell("Runner-up", 1); ru != name(tc.runner) {
			t.Errorf("ethanol at %s EUR/L: runner-up %q, want %s", p, ru, name(tc.runner))
		}
		nearCell(t, cell("Cost per gram over the campaign", 1), perGram(tc.winner, p), "winner's cost per gram over the campaign at "+p.String())
		nearCell(t, cell("Runner-up", 2), perGram(tc.runner, p), "runner-up's cost per gram at "+p.String())
		wg, rg := perGram(tc.winner, p), perGram(tc.runner, p)
		nearCell(t, cell("Margin", 1), (rg-wg)/rg, "margin at "+p.String())
		// The batch cost is the winner's one batch at the target mass (the
		// table below the recommendation), one-time lines included.
		nearCell(t, cell("Batch cost", 1), repriced(batchLedger(t, r, tc.winner.Method), row, p, 1).InexactFloat64(), "batch cost at "+p.String())
	}
}

// repriced is a ledger's total for n batches with the lines priced from
// price row at p instead, by the ledger's rule: each line ROUND(q × p, 2)
// (EUR has two decimal places, ISO 4217), recurring lines n times,
// one-time lines once.
func repriced(l ledger.Ledger, row int, p decimal.Decimal, n int) decimal.Decimal {
	sum := decimal.Zero
	for _, line := range l.Lines {
		a := line.Amount
		if line.PriceRow == row {
			a = line.Qty.Mul(p).Round(2)
		}
		if line.Demand.Group != usage.OneTime {
			a = a.Mul(decimal.NewFromInt(int64(n)))
		}
		sum = sum.Add(a)
	}
	return sum
}

// batchLedger is a method's one-batch ledger at the target mass.
func batchLedger(t *testing.T, r *scale.Report, method string) ledger.Ledger {
	t.Helper()
	for i, kg := range r.MassesKg {
		for j, m := range r.Methods {
			if m == method && sameMass(kg, r.TargetKg) {
				return r.Results[i][j].Ledger
			}
		}
	}
	t.Fatalf("no %s at the target mass", method)
	return ledger.Ledger{}
}

// nearCell checks a recalculated number against the expected one to a part in
// 10^9 (binary floating point and a different order of operations).
func nearCell(t *testing.T, got string, want float64, what string) {
	t.Helper()
	v, err := strconv.ParseFloat(got, 64)
	if err != nil || math.Abs(v-want) > 1e-9*math.Max(1, math.Abs(want)) {
		t.Errorf("%s: LibreOffice %q, want %.10g", what, got, want)
	}
}

// chartCount is the number of chart parts in a written workbook.
func chartCount(t *testing.T, b []byte) int {
	t.Helper()
	return len(chartParts(open(t, b)))
}

// Every workbook the tool writes has a chart: the report (cost per gram
// against mass on the Summary, plus Scale-up's for a sweep), the waste
// forecast (waste by stream) and the year's plan (cost by method).
func TestEveryWorkbookHasAChart(t *testing.T) {
	t.Parallel()
	r := demoReport(t)
	b, _ := render(t, r, Options{})
	if n := chartCount(t, b); n < 1 {
		t.Errorf("report workbook: %d charts", n)
	}
	var w bytes.Buffer
	if err := WriteWaste(&w, r); err != nil {
		t.Fatal(err)
	}
	if n := chartCount(t, w.Bytes()); n != 1 {
		t.Errorf("waste workbook: %d charts, want 1", n)
	}
	pf := &scale.Portfolio{File: "plan.csv", Currency: "EUR", Places: 2,
		ByMethod: map[string]decimal.Decimal{"chromatography": decimal.RequireFromString("1200.50"), "crystallization": decimal.RequireFromString("830.00")}}
	w.Reset()
	if err := WritePortfolio(&w, pf); err != nil {
		t.Fatal(err)
	}
	if n := chartCount(t, w.Bytes()); n != 1 {
		t.Errorf("portfolio workbook: %d charts, want 1", n)
	}
	if n := chartCount(t, func() []byte { b, _ := render(t, sweepReport(), Options{}); return b }()); n < 4 {
		t.Errorf("sweep workbook: %d charts, want the Summary's and Scale-up's three", n)
	}
}
