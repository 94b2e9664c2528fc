// Package workbook writes a scale.Report as a spreadsheet workbook with live
// formulas (DESIGN §4): Summary, Inputs, Prices, one sheet per method, Waste
// and Sources. It lays out what the report holds and computes no model or
// price; the only arithmetic it writes is spreadsheet formulas (ledger line
// amounts, subtotals and totals, cost per gram, recovery) whose cached
// values come from the report, so that viewers that do not recalculate
// still show the ledger's numbers.
//
// Money cells are formulas that reference the Prices sheet: a line costs
//
//	ROUND(Qty × Prices!$C$n, places)
//
// where Qty is the ledger quantity in the price item's unit, Prices!$C$n is
// the unit price of price-table row n − 2 and places is the currency's
// minor unit. This is the ledger's own rule (DESIGN §5.4); ROUND, like
// decimal's Round, rounds half away from zero (DESIGN §9), so the sheet
// reconciles with the ledger to the cent.
//
// Only this package imports excelize. Formula cells are written with the
// StreamWriter because excelize's SetCellValue family drops a cell's
// formula (DESIGN §9).
package workbook

import (
	"fmt"
	"io"
	"regexp"
	"strings"

	"github.com/shopspring/decimal"
	"github.com/xuri/excelize/v2"

	"sepcost/costing/usage"
	"sepcost/scale"
)

// Options change how the workbook is written.
type Options struct {
	// OmitCachedValues writes formulas without their cached results, so
	// that a spreadsheet program must calculate them. LibreOffice keeps a
	// cached value as written (DESIGN §9); the recalculation test needs
	// this variant.
	OmitCachedValues bool
}

// Sheet names that are not method sheets, in workbook order around them.
const (
	sheetSummary = "Summary"
	sheetInputs  = "Inputs"
	sheetPrices  = "Prices"
	sheetWaste   = "Waste"
	sheetSources = "Sources"
)

// Fixed document properties, so the same report gives the same content.
const (
	docCreator = "sepcost"
	docTime    = "2000-01-01T00:00:00Z"
)

// Write writes the report as an .xlsx workbook to w.
func Write(w io.Writer, r *scale.Report, opt Options) error {
	f, _, err := build(r, opt)
	if err != nil {
		return err
	}
	defer f.Close()
	if err := f.Write(w); err != nil {
		return fmt.Errorf("workbook: writing the file: %w", err)
	}
	return nil
}

// checkCell is a money cell and the ledger value it must show; tests use
// the list to compare cached and recalculated values with the ledger.
type checkCell struct {
	sheet, ref string
	want       decimal.Decimal
	kind       string // "unit price", "line", "subtotal", "total", "summary total", "disposal"
}

// layout records where the writer put the money cells.
type layout struct {
	money []checkCell
}

func (l *layout) add(sheet, ref string, want decimal.Decimal, kind string) {
	l.money = append(l.money, checkCell{sheet, ref, want, kind})
}

// build lays out the whole workbook.
func build(r *scale.Report, opt Options) (*excelize.File, *layout, error) {
	m, err := validate(r)
	if err != nil {
		return nil, nil, err
	}
	names := make([]string, len(r.Methods))
	for j, meth := range r.Methods {
		names[j] = capitalize(meth)
	}
	f := excelize.NewFile()
	ok := false
	defer func() {
		if !ok {
			f.Close()
		}
	}()
	if err := f.SetDocProps(&excelize.DocProperties{
		Creator: docCreator, LastModifiedBy: docCreator, Created: docTime, Modified: docTime,
		Title: r.Title, Description: "Purification cost estimate written by sepcost",
	}); err != nil {
		return nil, nil, fmt.Errorf("workbook: document properties: %w", err)
	}
	full := true
	if err := f.SetCalcProps(&excelize.CalcPropsOptions{FullCalcOnLoad: &full}); err != nil {
		return nil, nil, fmt.Errorf("workbook: calculation properties: %w", err)
	}
	st, err := newStyles(f, m)
	if err != nil {
		return nil, nil, err
	}
	lay := &layout{}

	order := append(append([]string{sheetSummary, sheetInputs, sheetPrices}, names...), sheetWaste, sheetSources)
	if err := f.SetSheetName("Sheet1", order[0]); err != nil {
		return nil, nil, fmt.Errorf("workbook: sheet %s: %w", order[0], err)
	}
	for _, name := range order[1:] {
		if _, err := f.NewSheet(name); err != nil {
			return nil, nil, fmt.Errorf("workbook: sheet %s: %w", name, err)
		}
	}

	var grids []*grid
	methods := make([]methodOut, len(r.Methods))
	for j := range r.Methods {
		g := newGrid(names[j])
		if methods[j], err = buildMethod(g, st, r, m, j, lay); err != nil {
			return nil, nil, err
		}
		grids = append(grids, g)
	}
	summary := newGrid(sheetSummary)
	buildSummary(summary, st, r, m, methods, lay)
	inputs := newGrid(sheetInputs)
	buildInputs(inputs, st, r)
	prices := newGrid(sheetPrices)
	buildPrices(prices, st, r)
	waste := newGrid(sheetWaste)
	buildWaste(waste, st, r, m, lay)
	sources := newGrid(sheetSources)
	if err := buildSources(sources, st, r); err != nil {
		return nil, nil, err
	}
	grids = append(grids, summary, inputs, prices, waste, sources)
	for _, g := range grids {
		if err := g.flush(f, st, opt.OmitCachedValues); err != nil {
			return nil, nil, err
		}
	}
	f.SetActiveSheet(0)
	ok = true
	return f, lay, nil
}

var (
	currencyCode  = regexp.MustCompile(`^[A-Z]{3}$`)
	badSheetChars = `:\/?*[]`
)

// validate checks that the report is complete and self-consistent, so that
// every formula written reproduces the ledger, and returns how money is
// shown. Errors name the mass, method and ledger line.
func validate(r *scale.Report) (money, error) {
	var m money
	if r == nil {
		return m, fmt.Errorf("workbook: no report")
	}
	if r.Prices == nil {
		return m, fmt.Errorf("workbook: the report has no price table")
	}
	if !currencyCode.MatchString(r.Prices.Currency) {
		return m, fmt.Errorf("workbook: price table %s: currency %q is not a three-letter ISO 4217 code such as EUR or USD",
			r.Prices.File, r.Prices.Currency)
	}
	m.currency = r.Prices.Currency
	if len(r.Results) != len(r.MassesKg) {
		return m, fmt.Errorf("workbook: the report has results for %d batch masses but lists %d masses", len(r.Results), len(r.MassesKg))
	}
	for i, kg := range r.MassesKg {
		if !finite(kg) || kg <= 0 {
			return m, fmt.Errorf("workbook: batch mass %d is %v kg; it must be a positive number", i+1, kg)
		}
		if len(r.Results[i]) != len(r.Methods) {
			return m, fmt.Errorf("workbook: at %s the report has %d results for %d methods", massLabel(kg), len(r.Results[i]), len(r.Methods))
		}
	}
	seen := map[string]bool{}
	for _, name := range []string{sheetSummary, sheetInputs, sheetPrices, sheetWaste, sheetSources} {
		seen[strings.ToLower(name)] = true
	}
	for _, meth := range r.Methods {
		name := capitalize(meth)
		switch {
		case name == "" || len([]rune(name)) > 31:
			return m, fmt.Errorf("workbook: method name %q must have 1 to 31 characters to name a sheet", meth)
		case strings.ContainsAny(name, badSheetChars) || strings.HasPrefix(name, "'") || strings.HasSuffix(name, "'"):
			return m, fmt.Errorf("workbook: method name %q cannot name a sheet: it may not contain any of %s or start or end with an apostrophe", meth, badSheetChars)
		case seen[strings.ToLower(name)]:
			return m, fmt.Errorf("workbook: method name %q gives the sheet name %q, which is already used", meth, name)
		}
		seen[strings.ToLower(name)] = true
	}

	// Money places come from the ledger (the currency's minor unit); every
	// priced ledger must agree.
	placesSet := false
	for i := range r.Results {
		for j := range r.Results[i] {
			res := r.Results[i][j]
			if !res.Usage.Feasible {
				continue
			}
			where := fmt.Sprintf("workbook: %s at %s", r.Methods[j], massLabel(r.MassesKg[i]))
			l := res.Ledger
			if len(l.Lines) == 0 && l.Currency == "" {
				if !l.Total.IsZero() {
					return m, fmt.Errorf("%s: the ledger has no lines but a total of %s", where, l.Total)
				}
				continue
			}
			if l.Currency != r.Prices.Currency {
				return m, fmt.Errorf("%s: the ledger is in %q but the price table is in %q", where, l.Currency, r.Prices.Currency)
			}
			if l.Places < 0 || l.Places > 6 {
				return m, fmt.Errorf("%s: the ledger rounds to %d places; 0 to 6 are valid", where, l.Places)
			}
			if placesSet && l.Places != m.places {
				return m, fmt.Errorf("%s: the ledger rounds to %d places but another rounds to %d", where, l.Places, m.places)
			}
			m.places, placesSet = l.Places, true
			if err := validateLedger(where, r, res); err != nil {
				return m, err
			}
		}
	}
	if !placesSet {
		// No priced result: money appears only as prices. Two places is the
		// minor unit of most currencies (ISO 4217); it only formats display.
		m.places = 2
	}
	m.pricePlaces = m.places
	for _, it := range r.Prices.Items {
		if p := -it.Price.Exponent(); p > m.pricePlaces {
			m.pricePlaces = p
		}
	}
	if m.pricePlaces > 6 {
		m.pricePlaces = 6
	}
	return m, nil
}

// validateLedger checks one ledger against the price table and its own
// rounding rule, so that the formulas written for it give its amounts.
func validateLedger(where string, r *scale.Report, res scale.Result) error {
	known := map[usage.Group]bool{}
	for _, g := range usage.Groups {
		known[g] = true
	}
	l := res.Ledger
	sum := decimal.Zero
	for k, line := range l.Lines {
		at := fmt.Sprintf("%s, ledger line %d (%s, %q)", where, k+1, line.Demand.Item, line.Demand.Label)
		if !known[line.Demand.Group] {
			return fmt.Errorf("%s: group %q is not one of %v", at, line.Demand.Group, usage.Groups)
		}
		if line.PriceRow < 0 || line.PriceRow >= len(r.Prices.Items) {
			return fmt.Errorf("%s: price row %d is outside the price table's %d items", at, line.PriceRow, len(r.Prices.Items))
		}
		it := r.Prices.Items[line.PriceRow]
		if it.Name != line.Demand.Item {
			return fmt.Errorf("%s: price row %d is %q, not the item demanded", at, line.PriceRow, it.Name)
		}
		if !line.UnitPrice.Equal(it.Price) {
			return fmt.Errorf("%s: unit price %s differs from the price table's %s", at, line.UnitPrice, it.Price)
		}
		if line.Unit != it.Unit {
			return fmt.Errorf("%s: unit %q differs from the price table's %q", at, line.Unit, it.Unit)
		}
		if want := line.Qty.Mul(line.UnitPrice).Round(l.Places); !line.Amount.Equal(want) {
			return fmt.Errorf("%s: amount %s is not %s × %s rounded to %d places (%s)", at, line.Amount, line.Qty, line.UnitPrice, l.Places, want)
		}
		sum = sum.Add(line.Amount)
	}
	if !l.Total.Equal(sum) {
		return fmt.Errorf("%s: the ledger total %s is not the sum of its lines, %s", where, l.Total, sum)
	}
	return nil
}

// priceRef is the absolute reference to the unit price of price-table item i.
func priceRef(i int) string { return sheetRef(sheetPrices, absName(priceCol, i+2)) }
