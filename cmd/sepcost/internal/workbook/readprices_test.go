package workbook

import (
	"bytes"
	"encoding/csv"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/xuri/excelize/v2"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/scale"
	"sepcost/templates"
)

// priceBook writes the example price CSV as a sheet of an .xlsx workbook,
// as a site would keep it: prices as numbers, one of them a formula with
// its cached result, dates as date cells, a blank row, and another sheet
// first so that the sheet must be named.
func priceBook(t *testing.T, csvText []byte, sheet string) []byte {
	t.Helper()
	recs, err := csv.NewReader(bytes.NewReader(stripComments(csvText))).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	f := excelize.NewFile()
	defer f.Close()
	if _, err := f.NewSheet(sheet); err != nil {
		t.Fatal(err)
	}
	dateStyle, _ := f.NewStyle(&excelize.Style{NumFmt: 14})
	row := 1
	for k, rec := range recs {
		if k == 3 {
			row++ // a blank row
		}
		for c, v := range rec {
			ref, _ := excelize.CoordinatesToCellName(c+1, row)
			switch {
			case k > 0 && c == 2:
				p, _ := strconv.ParseFloat(v, 64)
				if k == 1 {
					// =p*2/2: a formula; its cached value is the price.
					if err := f.SetCellFormula(sheet, ref, v+"*2/2"); err != nil {
						t.Fatal(err)
					}
				}
				if err := f.SetCellFloat(sheet, ref, p, -1, 64); err != nil {
					t.Fatal(err)
				}
			case k > 0 && c == 6 && v != "":
				d, _ := time.Parse("2006-01-02", v)
				f.SetCellValue(sheet, ref, d)
				f.SetCellStyle(sheet, ref, ref, dateStyle)
			default:
				f.SetCellStr(sheet, ref, v)
			}
		}
		row++
	}
	var buf bytes.Buffer
	if err := f.Write(&buf); err != nil {
		t.Fatal(err)
	}
	return buf.Bytes()
}

// stripComments drops the CSV's comment lines, which a sheet would not hold.
func stripComments(b []byte) []byte {
	var out []string
	for _, l := range strings.Split(string(b), "\n") {
		if !strings.HasPrefix(l, "#") {
			out = append(out, l)
		}
	}
	return []byte(strings.Join(out, "\n"))
}

// The .xlsx twin of the example price table reads as the same items and
// gives the same estimate of the demo, to the cent.
func TestPriceWorkbookTwin(t *testing.T) {
	t.Parallel()
	book := priceBook(t, templates.Prices, "Solvents and more")
	fromX, err := ReadPrices(bytes.NewReader(book), "site.xlsx", "Solvents and more")
	if err != nil {
		t.Fatal(err)
	}
	fromC, err := prices.Read(bytes.NewReader(templates.Prices), "prices.csv")
	if err != nil {
		t.Fatal(err)
	}
	if len(fromX.Items) != len(fromC.Items) || fromX.Currency != fromC.Currency {
		t.Fatalf("xlsx: %d items in %s, csv: %d in %s", len(fromX.Items), fromX.Currency, len(fromC.Items), fromC.Currency)
	}
	for k := range fromC.Items {
		x, c := fromX.Items[k], fromC.Items[k]
		if x.Name != c.Name || x.Unit != c.Unit || !x.Price.Equal(c.Price) || x.Date != c.Date || x.Source != c.Source {
			t.Errorf("item %d: xlsx %+v, csv %+v", k, x, c)
		}
	}
	sc, err := scenario.Load(bytes.NewReader(templates.Scenario), "demo")
	if err != nil {
		t.Fatal(err)
	}
	plan, err := costing.Prepare(sc)
	if err != nil {
		t.Fatal(err)
	}
	opt := scale.Options{}
	rx, err := scale.EstimateWith(plan, fromX, sc.MassesKg, opt)
	if err != nil {
		t.Fatal(err)
	}
	rc, err := scale.EstimateWith(plan, fromC, sc.MassesKg, opt)
	if err != nil {
		t.Fatal(err)
	}
	for i := range rc.Results {
		for j := range rc.Results[i] {
			if a, b := rx.Results[i][j].Ledger.Total, rc.Results[i][j].Ledger.Total; !a.Equal(b) {
				t.Errorf("mass %d method %d: xlsx total %s, csv total %s", i, j, a, b)
			}
		}
	}
}

// The sheet must exist; a problem in a cell is reported as the CSV's
// would be, with the sheet and row as file and line; sizes are bounded.
func TestPriceWorkbookProblems(t *testing.T) {
	t.Parallel()
	book := priceBook(t, templates.Prices, "Prices")
	if _, err := ReadPrices(bytes.NewReader(book), "site.xlsx", "Solvent"); err == nil || !strings.Contains(err.Error(), `no sheet "Solvent"`) || !strings.Contains(err.Error(), `"Prices"`) {
		t.Errorf("missing sheet: %v", err)
	}
	bad := []byte("item,unit,price,currency,category,source,date\nsilica gel,kg,abc,EUR,consumable,,\n")
	f := excelize.NewFile()
	recs, _ := csv.NewReader(bytes.NewReader(bad)).ReadAll()
	for r, rec := range recs {
		for c, v := range rec {
			ref, _ := excelize.CoordinatesToCellName(c+1, r+1)
			f.SetCellStr("Sheet1", ref, v)
		}
	}
	var buf bytes.Buffer
	f.Write(&buf)
	f.Close()
	_, err := ReadPrices(bytes.NewReader(buf.Bytes()), "site.xlsx", "")
	if err == nil || !strings.Contains(err.Error(), `site.xlsx!Sheet1:2: price: "abc" is not a number`) {
		t.Errorf("bad price: %v", err)
	}
	big := bytes.Repeat([]byte("x"), MaxPriceBookBytes+1)
	if _, err := ReadPrices(bytes.NewReader(big), "big.xlsx", ""); err == nil || !strings.Contains(err.Error(), "larger than") {
		t.Errorf("oversized file: %v", err)
	}
	if _, err := ReadPrices(strings.NewReader("item,unit\n"), "plain.xlsx", ""); err == nil || !strings.Contains(err.Error(), "not a readable .xlsx") {
		t.Errorf("not a workbook: %v", err)
	}
}

// A sheet of more rows than a price list has is refused with the limit
// named, before its rows are checked.
func TestPriceWorkbookRowLimit(t *testing.T) {
	t.Parallel()
	f := excelize.NewFile()
	sw, err := f.NewStreamWriter("Sheet1")
	if err != nil {
		t.Fatal(err)
	}
	if err := sw.SetRow("A1", []any{"item", "unit", "price", "currency", "category", "source", "date"}); err != nil {
		t.Fatal(err)
	}
	for r := 2; r <= MaxPriceRows+1; r++ {
		ref, _ := excelize.CoordinatesToCellName(1, r)
		if err := sw.SetRow(ref, []any{"item " + strconv.Itoa(r), "kg", 1, "EUR", "", "", ""}); err != nil {
			t.Fatal(err)
		}
	}
	if err := sw.Flush(); err != nil {
		t.Fatal(err)
	}
	var buf bytes.Buffer
	if err := f.Write(&buf); err != nil {
		t.Fatal(err)
	}
	f.Close()
	_, err = ReadPrices(bytes.NewReader(buf.Bytes()), "big.xlsx", "")
	if err == nil || !strings.Contains(err.Error(), "more than 10000 rows") {
		t.Errorf("row limit: %v", err)
	}
}
