package workbook

import (
	"bytes"
	"context"
	"fmt"
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

	"sepcost/costing"
	"sepcost/costing/equipment"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/costing/usage"
	"sepcost/scale"
	"sepcost/templates"
)

// The demo's Budget sheet records every formula money cell, so the cached,
// CalcCellValue and LibreOffice tests compare each with the budget.
func TestBudgetCellsRecorded(t *testing.T) {
	t.Parallel()
	r := demoReport(t)
	if r.Budget == nil {
		t.Fatal("the demo has no budget")
	}
	_, lay := render(t, r, Options{})
	kinds := map[string]int{}
	for _, c := range lay.money {
		if c.sheet == sheetBudget {
			kinds[c.kind]++
		}
	}
	lines := len(r.Budget.Cost.Ledger.Lines)
	// Per line: a unit price and two amounts; six SUMIF headings; subtotal,
	// contingency and total.
	if kinds["unit price"] != lines || kinds["line"] != 2*lines || kinds["subtotal"] != 6 || kinds["total"] != 3 {
		t.Errorf("Budget money cells %v for %d ledger lines", kinds, lines)
	}
}

// TestBudgetFollowsEdits is what a manager does: change a price on the
// Prices sheet and the number of batches on the Budget sheet, let the
// spreadsheet recalculate, and read the request. Expected: the ledger's
// rule on the new inputs, line by line (ROUND(q × p, 2) per batch, × N for
// recurring lines, × 1 for one-time lines; SUMIF by heading; contingency
// ROUND(subtotal × (P90/P50 − 1), 2)).
func TestBudgetFollowsEdits(t *testing.T) {
	soffice, err := exec.LookPath("soffice")
	if err != nil {
		if os.Getenv("CI") != "" {
			t.Fatal("soffice (Debian package libreoffice-calc-nogui) is not on PATH; CI needs it")
		}
		t.Skip("soffice not on PATH")
	}
	r := demoReport(t)
	b := r.Budget
	bare, _ := render(t, r, Options{OmitCachedValues: true})
	f := open(t, bare)
	// Ethanol from 8.00 to 16.00 EUR/L, and six batches instead of four.
	row, ok := r.Prices.Find("ethanol")
	if !ok {
		t.Fatal("no ethanol price")
	}
	newPrice := decimal.RequireFromString("16.00")
	if err := f.SetCellValue(sheetPrices, cellName(priceCol, row+2), 16.0); err != nil {
		t.Fatal(err)
	}
	if err := f.SetCellValue(sheetBudget, cellName(2, bBatchesRow), 6); err != nil {
		t.Fatal(err)
	}
	lo := recalculate(t, soffice, f)

	six := decimal.NewFromInt(6)
	heads := map[string]decimal.Decimal{}
	sub := b.Capital
	for _, l := range b.Cost.Ledger.Lines {
		amount := l.Amount
		if l.PriceRow == row {
			amount = l.Qty.Mul(newPrice).Round(2)
		}
		if l.Demand.Group != usage.OneTime {
			amount = amount.Mul(six)
		}
		heads[headingOf(l.Demand.Group)] = heads[headingOf(l.Demand.Group)].Add(amount)
		sub = sub.Add(amount)
	}
	cont := decimal.NewFromFloat(sub.InexactFloat64() * b.ContingencyShare).Round(2)
	for k, h := range budgetHeadings {
		if h.key == "" {
			continue
		}
		check(t, lo, cellName(2, bHeadRow+k), heads[h.key], h.label)
	}
	n := bHeadRow + len(budgetHeadings)
	check(t, lo, cellName(2, n), sub, "subtotal")
	check(t, lo, cellName(2, n+2), sub.Add(cont), "total request")
	// The edit moved the request: ethanol's lines cost twice as much and
	// every recurring line runs six times.
	if !sub.GreaterThan(b.Subtotal) {
		t.Errorf("subtotal %s after the edits, not above %s", sub, b.Subtotal)
	}
}

// recalculate saves f, lets LibreOffice calculate and save it, and opens
// the result.
func recalculate(t *testing.T, soffice string, f *excelize.File) *excelize.File {
	t.Helper()
	dir := t.TempDir()
	in := filepath.Join(dir, "edited.xlsx")
	if err := f.SaveAs(in); err != nil {
		t.Fatal(err)
	}
	ctx, cancel := context.WithTimeout(context.Background(), 2*time.Minute)
	defer cancel()
	cmd := exec.CommandContext(ctx, soffice, "-env:UserInstallation=file://"+filepath.ToSlash(filepath.Join(dir, "profile")),
		"--headless", "--convert-to", "xlsx", "--outdir", filepath.Join(dir, "out"), in)
	if msg, err := cmd.CombinedOutput(); err != nil {
		t.Fatalf("soffice: %v\n%s", err, msg)
	}
	conv, err := os.ReadFile(filepath.Join(dir, "out", "edited.xlsx"))
	if err != nil {
		t.Fatal(err)
	}
	return open(t, conv)
}

// With a jacketed reactor to buy, the capital heading is the sum of the
// purchase prices on the Equipment sheet: every Budget cell recalculates
// to the budget, and raising the reactor's price there by 2000.00 raises
// the capital and the subtotal by exactly that.
func TestBudgetCapitalFollowsEquipment(t *testing.T) {
	soffice, err := exec.LookPath("soffice")
	if err != nil {
		if os.Getenv("CI") != "" {
			t.Fatal("soffice (Debian package libreoffice-calc-nogui) is not on PATH; CI needs it")
		}
		t.Skip("soffice not on PATH")
	}
	eqCSV := strings.Replace(string(templates.Equipment), "jacketed reactor 20 L,reactor,20 L,,,20.00,owned,,EUR,,",
		"jacketed reactor 20 L,reactor,20 L,,,20.00,to buy,18000.00,EUR,20000 h,", 1)
	eq, err := equipment.Read(strings.NewReader(eqCSV), "eq.csv")
	if err != nil {
		t.Fatal(err)
	}
	sc, err := scenario.Load(bytes.NewReader(templates.Scenario), "demo.yaml")
	if err != nil {
		t.Fatal(err)
	}
	pt, err := prices.Read(bytes.NewReader(templates.Prices), "prices.csv")
	if err != nil {
		t.Fatal(err)
	}
	p, err := costing.PrepareWith(sc, costing.Options{Equipment: eq})
	if err != nil {
		t.Fatal(err)
	}
	r, err := scale.EstimateWith(p, pt, []float64{sc.TargetKg}, scale.Options{Draws: 20, Seed: 1})
	if err != nil {
		t.Fatal(err)
	}
	b := r.Budget
	if len(b.CapitalItems) != 1 || b.Capital.StringFixed(2) != "18000.00" {
		t.Fatalf("capital %s %+v; want the 20 L reactor at 18000.00", b.Capital, b.CapitalItems)
	}
	bare, lay := render(t, r, Options{OmitCachedValues: true})
	lo := recalculate(t, soffice, open(t, bare))
	for _, c := range lay.money {
		if c.sheet == sheetBudget {
			places := int32(2)
			if c.kind == "unit price" {
				places = 4
			}
			got, _ := lo.GetCellValue(c.sheet, c.ref, excelize.Options{RawCellValue: true})
			if !sameToTheCent(got, c.want, places) {
				t.Errorf("Budget!%s (%s): LibreOffice %q, budget %s", c.ref, c.kind, got, c.want)
			}
		}
	}
	f := open(t, bare)
	if err := f.SetCellValue(sheetEquipment, cellName(eqPrice, b.CapitalItems[0].Row+2), 20000.0); err != nil {
		t.Fatal(err)
	}
	lo = recalculate(t, soffice, f)
	check(t, lo, cellName(2, bHeadRow), decimal.RequireFromString("20000.00"), "capital")
	check(t, lo, cellName(2, bHeadRow+len(budgetHeadings)), b.Subtotal.Add(decimal.RequireFromString("2000.00")), "subtotal")
}

func check(t *testing.T, f *excelize.File, ref string, want decimal.Decimal, what string) {
	t.Helper()
	got, err := f.GetCellValue(sheetBudget, ref, excelize.Options{RawCellValue: true})
	if err != nil {
		t.Fatal(err)
	}
	if !sameToTheCent(strings.TrimSpace(got), want, 2) {
		t.Errorf("Budget!%s (%s): LibreOffice %q, want %s", ref, what, got, want.StringFixed(2))
	}
}

// bandsDemoReport is the demo costed at 20 g with a campaign of 20
// batches: chromatography's campaign buys about 20 × 13 L of n-heptane,
// which the example prices put in the 200 L drum band, while one batch
// buys it at the small-purchase price; so its campaign ledger is not the
// one on its method sheet.
func bandsDemoReport(t *testing.T) *scale.Report {
	return demoReportEdited(t, templates.Scenario, "built-in demo scenario", func(sc *scenario.Scenario) {
		sc.TargetKg = 0.02
		sc.Campaign.Batches, sc.Campaign.ProductKg = 20, 0
	})
}

// Every method's campaign row on the Budget sheet holds formulas whose
// cached values are the campaign report's figures, and excelize's own
// formula engine gives the same figures to the cent. A row refers to a
// method sheet only where that sheet's ledger at the campaign's batch mass
// is the campaign's, line for line; else to a ledger on the Budget sheet.
func TestCampaignRowsAreFormulas(t *testing.T) {
	t.Parallel()
	// At 20 g × 5 batches chromatography is the budget's method and
	// crystallization's row refers to its method sheet, one-time subtotal
	// included.
	five := demoReportEdited(t, templates.Scenario, "built-in demo scenario", func(sc *scenario.Scenario) {
		sc.TargetKg = 0.02
		sc.Campaign.Batches, sc.Campaign.ProductKg = 5, 0
	})
	if five.Budget.Method != "chromatography" {
		t.Fatalf("at 20 g × 5 batches the budget is for %s; the case wants chromatography", five.Budget.Method)
	}
	for name, r := range map[string]*scale.Report{"demo": demoReport(t), "demo at 20 g, 20 batches": bandsDemoReport(t), "demo at 20 g, 5 batches": five} {
		t.Run(name, func(t *testing.T) {
			b, _ := render(t, r, Options{})
			f := open(t, b)
			first, _ := campaignRows(r)
			for k, c := range r.Campaign.Costs {
				row := first + k
				one := batchLedger(t, r, c.Method)
				sheetLedger := samePriced(&one, &c.Ledger) && len(r.Campaign.Capital[c.Method]) == 0 && c.Method != r.Budget.Method
				for _, x := range []struct {
					col  int
					want decimal.Decimal
				}{{cPerBatch, c.PerBatch}, {cOneTime, c.OneTime}, {cTotal, c.Total}} {
					ref := cellName(x.col, row)
					cached, _ := f.GetCellValue(sheetBudget, ref, excelize.Options{RawCellValue: true})
					if d, err := decimal.NewFromString(cached); err != nil || !d.Equal(x.want) {
						t.Errorf("%s Budget!%s: cached %q, campaign %s", c.Method, ref, cached, x.want)
					}
					fo, _ := f.GetCellFormula(sheetBudget, ref)
					if fo == "" {
						if x.col == cOneTime && c.OneTime.IsZero() {
							continue // no one-time line: a plain zero
						}
						t.Errorf("%s Budget!%s: no formula", c.Method, ref)
						continue
					}
					calc, err := f.CalcCellValue(sheetBudget, ref, excelize.Options{RawCellValue: true})
					if err != nil || !sameToTheCent(calc, x.want, 2) { // Source: EUR has two decimal places (ISO 4217)
						t.Errorf("%s Budget!%s = %s: CalcCellValue %q (%v), campaign %s", c.Method, ref, fo, calc, err, x.want)
					}
					if x.col == cPerBatch && strings.Contains(fo, capitalize(c.Method)+"!") != sheetLedger {
						t.Errorf("%s Budget!%s = %s: refers to the method sheet %v, want %v", c.Method, ref, fo, !sheetLedger, sheetLedger)
					}
				}
				calc, err := f.CalcCellValue(sheetBudget, cellName(cPerGram, row), excelize.Options{RawCellValue: true})
				if v, perr := strconv.ParseFloat(calc, 64); err != nil || perr != nil || math.Abs(v/c.PerGram-1) > 1e-12 {
					t.Errorf("%s per gram: CalcCellValue %q (%v), campaign %v", c.Method, calc, err, c.PerGram)
				}
			}
		})
	}
	// The case the second report is for.
	r := bandsDemoReport(t)
	c, _ := r.Campaign.Cost("chromatography")
	if one := batchLedger(t, r, "chromatography"); c.Method == r.Budget.Method || samePriced(&one, &c.Ledger) {
		t.Errorf("at 20 g × 20 batches chromatography's campaign ledger is its method sheet's, or the budget's: the Budget sheet's own ledger of it is not exercised")
	}
}

// The Budget sheet prints the campaign map and the payback table with its
// chart on a page of their own: a manual row break stands just above the
// map's heading (a break's id is the last row of the page before it, as
// excelize v2.11.1's InsertPageBreak writes it: read in its source).
func TestBudgetMapStartsAPage(t *testing.T) {
	t.Parallel()
	b, _ := render(t, demoReport(t), Options{})
	f := open(t, b)
	idx, err := f.GetSheetIndex(sheetBudget)
	if err != nil || idx < 0 {
		t.Fatalf("no %s sheet: %v", sheetBudget, err)
	}
	part := packageParts(t, b)[fmt.Sprintf("xl/worksheets/sheet%d.xml", idx+1)]
	m := regexp.MustCompile(`<brk id="(\d+)"`).FindAllSubmatch(part, -1)
	if len(m) != 1 {
		t.Fatalf("%s: %d row breaks, want 1", sheetBudget, len(m))
	}
	last, _ := strconv.Atoi(string(m[0][1]))
	v, _ := f.GetCellValue(sheetBudget, cellName(1, last+1))
	if !strings.HasPrefix(v, "Cheapest method per gram over a campaign") {
		t.Errorf("the page break stands above %q, want the campaign map's heading", v)
	}
}
