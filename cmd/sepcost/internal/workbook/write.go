// Package workbook writes a scale.Report as a spreadsheet workbook with live
// formulas: Summary, Inputs, Prices, one sheet per method,
// Scale-up (sweeps only: the table and native charts against batch mass on
// logarithmic axes), Waste (streams with their suggested codes, green
// metrics, solvents), Uncertainty (when the report was sampled) and
// Sources. It lays out what the report holds and computes no model or
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
// minor unit. This is the ledger's own rule (ledger.LineAmount; the writer
// checks every ledger with ledger.Checker before writing); ROUND, like
// decimal's Round, rounds half away from zero (DEVELOPERS.md, "Library notes"), so the sheet
// reconciles with the ledger to the cent.
//
// Only this package imports excelize. Formula cells are written with the
// StreamWriter because excelize's SetCellValue family drops a cell's
// formula (DEVELOPERS.md, "Library notes").
package workbook

import (
	"archive/zip"
	"bytes"
	"errors"
	"fmt"
	"io"
	"regexp"
	"strings"

	"github.com/shopspring/decimal"
	"github.com/xuri/excelize/v2"

	"sepcost/costing"
	"sepcost/costing/ledger"
	"sepcost/costing/units"
	"sepcost/scale"
)

// Options change how the workbook is written.
type Options struct {
	// OmitCachedValues writes formulas without their cached results, so
	// that a spreadsheet program must calculate them. LibreOffice keeps a
	// cached value as written (DEVELOPERS.md, "Library notes"); the recalculation test needs
	// this variant.
	OmitCachedValues bool
}

// Sheet names that are not method sheets, in workbook order around them.
const (
	sheetSummary = "Summary"
	sheetInputs  = "Inputs"
	sheetPrices  = "Prices"
	sheetScaleUp = "Scale-up"
	sheetWaste   = "Waste"
	sheetSources = "Sources"
)

// MaxDetailMasses is the largest number of batch masses of a sweep for
// which the per-mass detail sheets (one sheet per method with a block per
// mass) are written. A sweep of up to 10,000 masses would make those
// sheets tens of thousands of columns wide; above this number the
// Scale-up sheet carries every mass in one row each and the Summary
// points to `sepcost estimate --mass` for chosen masses. An estimate at
// masses a user names always gets its detail sheets.
const MaxDetailMasses = 12

// detailSheets reports whether the per-mass method sheets are written.
func detailSheets(r *scale.Report) bool {
	return !r.IsSweep || len(r.MassesKg) <= MaxDetailMasses
}

// Fixed document properties, so the same report gives the same content.
const (
	docCreator = "sepcost"
	docTime    = "2000-01-01T00:00:00Z"
)

// Write writes the report as an .xlsx workbook to w.
func Write(w io.Writer, r *scale.Report, opt Options) error {
	f, _, err := build(r, opt, false)
	if err != nil {
		return err
	}
	defer f.Close()
	if err := writePackage(f, w); err != nil {
		return fmt.Errorf("workbook: writing the file: %w", err)
	}
	return nil
}

// writePackage writes the workbook's zip package straight to w. excelize's
// File.Write assembles the whole package in a bytes.Buffer and then copies
// it to w; its zip writer hook (File.SetZipWriter) is handed that buffer,
// and the hook here writes to w instead, so the buffer stays empty and
// the package is compressed into w part by part. The parts are those of
// the buffered path, byte for byte; they are deflated by pooledDeflate
// rather than the standard library's compressor. What
// the buffered path adds is a rewrite of the local headers of parts of
// more than 4 GiB (zip64); no part of these workbooks comes near that.
// A failed write to w is reported even where excelize would not pass it
// on.
func writePackage(f *excelize.File, w io.Writer) error {
	ew := &errWriter{w: w}
	hooked := false
	f.SetZipWriter(func(io.Writer) excelize.ZipWriter {
		hooked = true
		zw := zip.NewWriter(ew)
		zw.RegisterCompressor(zip.Deflate, pooledDeflate)
		return zw
	})
	var rest bytes.Buffer // what excelize copies out of its own buffer: nothing when hooked
	err := f.Write(&rest)
	switch {
	case err != nil || rest.Len() == 0:
	case hooked:
		err = fmt.Errorf("excelize wrote %d bytes beside its zip writer", rest.Len())
	default: // a library that no longer calls the hook: its buffer is the package
		_, err = ew.Write(rest.Bytes())
	}
	return errors.Join(err, ew.err)
}

// errWriter passes writes to w and keeps the first error.
type errWriter struct {
	w   io.Writer
	err error
}

func (e *errWriter) Write(p []byte) (int, error) {
	if e.err != nil {
		return 0, e.err
	}
	n, err := e.w.Write(p)
	if err != nil {
		e.err = err
	}
	return n, err
}

// checkCell is a money cell and the ledger value it must show; tests use
// the list to compare cached and recalculated values with the ledger.
type checkCell struct {
	sheet, ref string
	want       decimal.Decimal
	kind       string // "unit price", "line", "subtotal", "total", "summary total", "batch cost", "disposal", "scale-up total"
}

// layout records where the writer put the money cells.
type layout struct {
	money []checkCell
}

// add records a money cell; a nil layout records nothing.
func (l *layout) add(sheet, ref string, want decimal.Decimal, kind string) {
	if l == nil {
		return
	}
	l.money = append(l.money, checkCell{sheet, ref, want, kind})
}

// build lays out the whole workbook; with record set it also returns
// where the money cells are (for tests), else a nil layout.
func build(r *scale.Report, opt Options, record bool) (*excelize.File, *layout, error) {
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
	var lay *layout
	if record {
		lay = &layout{}
	}
	details := detailSheets(r)

	order := []string{sheetSummary, sheetDecision}
	if r.Budget != nil && r.Campaign != nil {
		order = append(order, sheetBudget)
	}
	order = append(order, sheetInputs, sheetPrices)
	if r.Budget != nil && r.Campaign != nil && r.Equipment != nil {
		order = append(order, sheetEquipment)
	}
	if details {
		order = append(order, names...)
	}
	if r.IsSweep {
		order = append(order, sheetScaleUp)
	}
	order = append(order, sheetWaste)
	if r.Uncertainty != nil {
		order = append(order, sheetUncertainty)
	}
	order = append(order, sheetSources)
	if err := f.SetSheetName("Sheet1", order[0]); err != nil {
		return nil, nil, fmt.Errorf("workbook: sheet %s: %w", order[0], err)
	}
	for _, name := range order[1:] {
		if _, err := f.NewSheet(name); err != nil {
			return nil, nil, fmt.Errorf("workbook: sheet %s: %w", name, err)
		}
	}
	// While the sheets are empty: SetActiveSheet reads every worksheet, and
	// after a StreamWriter's Flush that means parsing the streamed XML
	// back into memory and marshalling it again on Write.
	f.SetActiveSheet(0)

	var grids []*grid
	methods := make([]methodOut, len(r.Methods))
	for j := range r.Methods {
		methods[j].sheet = names[j]
		if !details {
			continue
		}
		g := newGrid(names[j])
		if methods[j], err = buildMethod(g, st, r, m, j, lay); err != nil {
			return nil, nil, err
		}
		grids = append(grids, g)
	}
	summary := newGrid(sheetSummary)
	plan := buildSummary(summary, st, r, m, methods, details, lay)
	summary.extra = func(f *excelize.File, widths map[int]float64) error {
		return summaryChart(f, plan, widths, m.currency)
	}
	decision := newGrid(sheetDecision)
	buildDecisionSheet(decision, st, r, m, lay)
	inputs := newGrid(sheetInputs)
	buildInputs(inputs, st, r)
	prices := newGrid(sheetPrices)
	buildPrices(prices, st, r)
	waste := newGrid(sheetWaste)
	if err := buildWaste(waste, st, r, m, details, lay); err != nil {
		return nil, nil, err
	}
	grids = append(grids, summary, decision, inputs, prices, waste)
	if r.Budget != nil && r.Campaign != nil {
		budget := newGrid(sheetBudget)
		buildBudget(budget, st, r, m, methods, lay)
		grids = append(grids, budget)
		if r.Equipment != nil {
			eq := newGrid(sheetEquipment)
			buildEquipment(eq, st, r)
			grids = append(grids, eq)
		}
	}
	var bands *bandRefs
	if r.Uncertainty != nil {
		unc := newGrid(sheetUncertainty)
		bands = buildUncertainty(unc, st, r)
		grids = append(grids, unc)
	}
	sources := newGrid(sheetSources)
	if err := buildSources(sources, st, r); err != nil {
		return nil, nil, err
	}
	grids = append(grids, sources)
	for _, g := range grids {
		if err := g.flush(f, st, opt.OmitCachedValues, r.Title); err != nil {
			return nil, nil, err
		}
	}
	if r.IsSweep {
		if err := writeScaleUp(f, st, r, m, methods, details, bands, lay, opt.OmitCachedValues); err != nil {
			return nil, nil, err
		}
	}
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
	// Results is nil when a long sweep holds Rows instead (scale.Report).
	if r.Results != nil && len(r.Results) != len(r.MassesKg) {
		return m, fmt.Errorf("workbook: the report has results for %d batch masses but lists %d masses", len(r.Results), len(r.MassesKg))
	}
	for i, kg := range r.MassesKg {
		if !finite(kg) || kg <= 0 {
			return m, fmt.Errorf("workbook: batch mass %d is %v kg; it must be a positive number", i+1, kg)
		}
		if r.Results != nil && len(r.Results[i]) != len(r.Methods) {
			return m, fmt.Errorf("workbook: at %s the report has %d results for %d methods", units.FormatMass(kg), len(r.Results[i]), len(r.Methods))
		}
	}
	seen := map[string]bool{}
	for _, name := range []string{sheetSummary, sheetDecision, sheetBudget, sheetInputs, sheetPrices, sheetEquipment, sheetScaleUp, sheetWaste, sheetUncertainty, sheetSources} {
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
	checker := ledger.NewChecker(r.Prices)
	err := r.Each(func(i int, results []scale.Result) error {
		if len(results) != len(r.Methods) {
			return fmt.Errorf("workbook: at %s the report has %d results for %d methods", units.FormatMass(r.MassesKg[i]), len(results), len(r.Methods))
		}
		for j := range results {
			res := &results[j]
			if !res.Usage.Feasible {
				continue
			}
			where := resultWhere{r.Methods[j], r.MassesKg[i]}
			l := &res.Ledger
			if len(l.Lines) == 0 && l.Currency == "" {
				if !l.Total.IsZero() {
					return fmt.Errorf("%s: the ledger has no lines but a total of %s", where, l.Total)
				}
				continue
			}
			if l.Currency != r.Prices.Currency {
				return fmt.Errorf("%s: the ledger is in %q but the price table is in %q", where, l.Currency, r.Prices.Currency)
			}
			if l.Places < 0 || l.Places > 6 {
				return fmt.Errorf("%s: the ledger rounds to %d places; 0 to 6 are valid", where, l.Places)
			}
			if placesSet && l.Places != m.places {
				return fmt.Errorf("%s: the ledger rounds to %d places but another rounds to %d", where, l.Places, m.places)
			}
			m.places, placesSet = l.Places, true
			if err := validateLedger(where, checker, &res.Ledger); err != nil {
				return err
			}
		}
		return nil
	})
	if err != nil {
		return m, err
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
// rounding rule (ledger.Checker), so that the formulas written for it give
// its amounts.
func validateLedger(where resultWhere, c *ledger.Checker, l *ledger.Ledger) error {
	if err := c.Check(l); err != nil {
		return fmt.Errorf("%s: %w", where, err)
	}
	return nil
}

// small is a decimal c × 10^e whose coefficient has at most 18 digits,
// held in an int64 (ok false when it has more), to turn ledger decimals
// into cell values without allocating.
type small struct {
	c  int64
	e  int32
	ok bool
}

func smallOf(d decimal.Decimal) small {
	if d.NumDigits() > 18 {
		return small{}
	}
	return small{d.CoefficientInt64(), d.Exponent(), true}
}

// float is the decimal as the nearest double, as decimal's InexactFloat64
// gives it: where the coefficient is below 2^53 and the exponent between
// −22 and 0 both operands of c / 10^−e are exact and the division is
// correctly rounded.
func (x small) float(d decimal.Decimal) float64 {
	if x.ok && x.e <= 0 && x.e >= -22 && x.c > -1<<53 && x.c < 1<<53 {
		return float64(x.c) / pow10[-x.e]
	}
	return d.InexactFloat64()
}

// resultWhere names a result in an error, "workbook: chromatography at
// 20 g"; it is formatted only when an error is, as validation runs over
// every result of a sweep.
type resultWhere struct {
	method string
	kg     float64
}

func (w resultWhere) String() string {
	return "workbook: " + w.method + " at " + units.FormatMass(w.kg)
}

// priceRef is the absolute reference to the unit price of price-table item i.
func priceRef(i int) string { return sheetRef(sheetPrices, absName(priceCol, i+2)) }

// notFeasible words a method's reason for having no numbers: "not
// assessed: ..." stands as it is, any other reason reads "not feasible: ...".
func notFeasible(reason string) string {
	return costing.StatusOf(false, reason).Words() + ": " + costing.Detail(reason)
}
