package prices

import (
	"bytes"
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"math"
	"sort"
	"strconv"
	"strings"
	"time"
	"unicode/utf8"

	"github.com/shopspring/decimal"

	"sepcost/costing/quote"
	"sepcost/costing/units"
)

// Columns are the price table's columns in the order the starter table
// writes them. A file may put them in any order and any letter case; all
// seven must be named in the header row.
var Columns = []string{"item", "unit", "price", "currency", "category", "source", "date"}

// Optional are columns a table may add; tables without them read as
// before. from is the purchase from which a line's price applies (price
// bands). spread is the share either way the price may move before it is
// paid ("15 %" or 0.15), read as the half-width of a rectangular
// distribution like a range in a scenario; empty or absent means
// DefaultSpread.
var Optional = []string{"from", "spread"}

// DefaultSpread is the half-width, as a share of the price, given to a
// price without a spread: catalogue prices and quotes move by some tenths
// within a budget year (common practice, no source).
const DefaultSpread = 0.15

// required are the columns that may not be left empty on any row;
// category, source and date may be.
var required = map[string]bool{"item": true, "unit": true, "price": true, "currency": true}

// PriceDims are the dimensions a price may be quoted per.
var PriceDims = []units.Dim{units.Mass, units.Volume, units.Count, units.Time, units.Energy}

// validUnits names the usual price units, for error messages.
const validUnits = "kg, g, L, mL, each, h, min, kWh, MJ"

// Limits of a price table: its size in bytes, its items and the problems
// listed at once. A site's table has tens to hundreds of items.
const (
	MaxFileSize = 4 << 20
	MaxItems    = 10000
	MaxProblems = 200
)

// dateLayout is the only date form accepted: ISO 8601 calendar date.
const dateLayout = "2006-01-02"

// Read reads a price table written as CSV (RFC 4180, as encoding/csv reads
// it) from r. file names the source in error messages.
//
// The first line that is not a comment is the header; it names the seven
// Columns in any order and letter case. Each further line is one item:
//
//	item,unit,price,currency,category,source,date
//	silica gel,kg,<price>,EUR,consumable,<source>,2025-01-15
//
// Lines starting with '#' are comments and blank lines are skipped; spaces
// around values are ignored. item, unit, price and currency may not be
// empty; category, source and date may be. The price is a plain decimal
// (digits with an optional decimal point, no exponent, no thousands
// separators, not negative) per one unit; the unit is one of mass, volume,
// count, time or energy (kg, g, L, mL, each, h, min, kWh, MJ...); the
// currency is an ISO 4217 code and the same on every line (one currency per
// run); a date is written YYYY-MM-DD. No two items may have the same name
// ignoring letter case.
//
// Read reports every problem it finds, not just the first, as Errors (each
// an *Error naming file, line and field, unwrapping to ErrInvalid). A
// failure to read r is returned wrapped, naming the file.
//
// A table may have at most MaxFileSize bytes and MaxItems items; at most
// MaxProblems problems are listed.
func Read(r io.Reader, file string) (*Table, error) {
	cr, err := boundedCSV(r, file)
	if err != nil {
		return nil, err
	}
	var errs Errors
	add := func(line int, field, format string, args ...any) {
		quote.Args(format, args) // the user's text, cut to a short excerpt
		errs = append(errs, &Error{Of: ErrInvalid, File: file, Line: line, Field: quote.Field(field), Msg: fmt.Sprintf(format, args...)})
	}

	// Header.
	header, err := cr.Read()
	if err == io.EOF {
		add(0, "header", "no header row (the file is empty or holds only comments); the first line must name the columns %s", strings.Join(Columns, ","))
		return nil, errs
	}
	if err != nil {
		if pe := (*csv.ParseError)(nil); errors.As(err, &pe) {
			return nil, Errors{parseProblem(file, pe, 0)}
		}
		return nil, fmt.Errorf("%s: %w", file, err)
	}
	headerLine, _ := cr.FieldPos(0)
	col, ok := readHeader(header, headerLine, add)
	if !ok {
		return nil, errs
	}
	cr.FieldsPerRecord = len(header)

	t := &Table{File: file}
	firstName := map[string]string{} // item name key → name as first written
	firstLine := map[string]int{}    // item name key → line first written
	currencyLines := map[string][]int{}
	var currencies []string // in order of first appearance
	rows := 0

	for {
		rec, err := cr.Read()
		if err == io.EOF {
			break
		}
		if tooMany(cr, err, rows, len(errs), add) {
			break
		}
		if err != nil {
			pe := (*csv.ParseError)(nil)
			if !errors.As(err, &pe) {
				return nil, fmt.Errorf("%s: %w", file, err)
			}
			rows++
			errs = append(errs, parseProblem(file, pe, len(header)))
			continue
		}
		line, _ := cr.FieldPos(0)
		blank := true
		for i := range rec {
			rec[i] = strings.TrimSpace(rec[i])
			if rec[i] != "" {
				blank = false
			}
		}
		if blank {
			continue // a row of empty cells, as spreadsheets export
		}
		rows++
		nBefore := len(errs)
		get := func(name string) string {
			if i, ok := col[name]; ok {
				return rec[i]
			}
			return ""
		}
		if c := get("currency"); validCode(c) {
			if _, ok := currencyLines[c]; !ok {
				currencies = append(currencies, c)
			}
			currencyLines[c] = append(currencyLines[c], line)
		}
		for _, name := range Columns {
			if _, ok := col[name]; !ok {
				continue
			}
			v := get(name)
			if !utf8.ValidString(v) {
				add(line, name, "not valid UTF-8 text; save the file with UTF-8 encoding")
				continue
			}
			if v == "" && required[name] {
				add(line, name, "empty; %s", emptyHint[name])
			}
		}
		if len(errs) > nBefore {
			// Unreadable or missing values: the checks below would only
			// repeat the same problem in other words.
			checkRest(rec, col, line, add)
			continue
		}

		it := Item{
			Name:     get("item"),
			Unit:     get("unit"),
			Currency: get("currency"),
			Category: get("category"),
			Source:   get("source"),
			Date:     get("date"),
			Line:     line, Spread: readSpread(get("spread"), line, add),
		}
		if _, ok := col["unit"]; ok {
			it.Per, _ = checkUnit(it.Unit, line, add)
		}
		if _, ok := col["price"]; ok {
			it.Price, _ = checkPrice(get("price"), line, add)
		}
		if _, ok := col["currency"]; ok {
			checkCurrency(it.Currency, line, add)
		}
		if it.Date != "" {
			checkDate(it.Date, line, add)
		}
		it.From = get("from")
		if it.From != "" && it.Per.Dim != (units.Dim{}) {
			it.FromSI, _ = checkFrom(it.From, it.Per, line, add)
		}
		if _, ok := col["item"]; ok && !firstOf(it, firstName, firstLine, add) {
			continue
		}
		if len(errs) == nBefore {
			t.Items = append(t.Items, it)
		}
	}

	checkBands(t.Items, add)
	oneCurrency(currencies, currencyLines, add)
	if rows == 0 {
		add(0, "", "the table has no items; add one line per item under the header, e.g. silica gel,kg,<price>,EUR,consumable,<source>,<date>")
	}
	if len(errs) > 0 {
		sortProblems(errs)
		return nil, errs
	}
	t.Currency = currencies[0]
	return t, nil
}

// oneCurrency records a problem when the table has more than one currency.
func oneCurrency(currencies []string, lines map[string][]int, add func(int, string, string, ...any)) {
	if len(currencies) <= 1 {
		return
	}
	parts := make([]string, len(currencies))
	for i, c := range currencies {
		parts[i] = fmt.Sprintf("%s (%s)", c, lineList(lines[c]))
	}
	add(0, "currency", "one currency per run, but the table has %s; convert every price to one currency", joinAnd(parts))
}

// boundedCSV reads at most MaxFileSize bytes of a table and returns a CSV
// reader over them.
func boundedCSV(r io.Reader, file string) (*csv.Reader, error) {
	data, err := io.ReadAll(io.LimitReader(r, MaxFileSize+1))
	if err != nil {
		return nil, fmt.Errorf("%s: %w", file, err)
	}
	if len(data) > MaxFileSize {
		return nil, Errors{{Of: ErrInvalid, File: file, Msg: fmt.Sprintf("larger than %d bytes (4 MiB); a price table lists at most %d items", MaxFileSize, MaxItems)}}
	}
	cr := csv.NewReader(bytes.NewReader(data))
	cr.Comment = '#'
	cr.TrimLeadingSpace = true
	return cr, nil
}

// tooMany reports (and records) when the table has more problems or items
// than are read.
func tooMany(cr *csv.Reader, err error, rows, problems int, add func(int, string, string, ...any)) bool {
	if problems >= MaxProblems {
		add(0, "", "more than %d problems; fix these and check again", MaxProblems)
		return true
	}
	if rows >= MaxItems && err == nil {
		line, _ := cr.FieldPos(0)
		add(line, "", "more than %d items; a price table lists at most %d (one sheet of a workbook holds them all)", MaxItems, MaxItems)
		return true
	}
	return false
}

// emptyHint says what to write in a required column left empty.
var emptyHint = map[string]string{
	"item":     `name the item as the models refer to it, e.g. "silica gel" or "ethyl acetate"`,
	"unit":     "write the unit the price is per: one of " + validUnits,
	"price":    "write the price per unit as a decimal such as 12.50",
	"currency": "write an ISO 4217 code such as EUR, USD or GBP",
}

// readHeader maps column names to their index. It reports unknown,
// unnamed, repeated and missing columns; ok is false when the line does
// not look like a header at all (then the rows cannot be read).
func readHeader(header []string, line int, add func(int, string, string, ...any)) (col map[string]int, ok bool) {
	valid := strings.Join(Columns, ", ")
	known := map[string]bool{}
	for _, c := range append(append([]string(nil), Columns...), Optional...) {
		known[c] = true
	}
	names := make([]string, len(header))
	anyKnown := false
	for i, h := range header {
		h = strings.TrimSpace(h)
		if i == 0 {
			h = strings.TrimPrefix(h, "\uFEFF") // byte-order mark written by some spreadsheets
			h = strings.TrimSpace(h)
		}
		names[i] = h
		if known[strings.ToLower(h)] {
			anyKnown = true
		}
	}
	if !anyKnown {
		add(line, "header", "the first line must name the columns (%s, in any order), but it is %q", valid, strings.Join(names, ","))
		return nil, false
	}
	col = map[string]int{}
	for i, h := range names {
		low := strings.ToLower(h)
		switch {
		case h == "":
			add(line, "header", "column %d has no name; the columns are %s", i+1, valid)
		case !known[low]:
			add(line, "header", "unknown column %q; the columns are %s, and optionally %s", h, valid, strings.Join(Optional, ", "))
		default:
			if j, dup := col[low]; dup {
				add(line, "header", "column %q is named twice (columns %d and %d); name each of %s once", h, j+1, i+1, valid)
				continue
			}
			col[low] = i
		}
	}
	for _, c := range Columns {
		if _, ok := col[c]; !ok {
			add(line, "header", "missing column %q; the columns are %s", c, valid)
		}
	}
	return col, true
}

// checkRest runs the checks of the non-empty, readable values of a row
// that already has a problem, so the row's other problems are reported in
// the same pass.
func checkRest(rec []string, col map[string]int, line int, add func(int, string, string, ...any)) {
	get := func(name string) (string, bool) {
		i, ok := col[name]
		if !ok || rec[i] == "" || !utf8.ValidString(rec[i]) {
			return "", false
		}
		return rec[i], true
	}
	if v, ok := get("unit"); ok {
		checkUnit(v, line, add)
	}
	if v, ok := get("price"); ok {
		checkPrice(v, line, add)
	}
	if v, ok := get("currency"); ok {
		checkCurrency(v, line, add)
	}
	if v, ok := get("date"); ok {
		checkDate(v, line, add)
	}
	if v, ok := get("spread"); ok {
		checkSpread(v, line, add)
	}
}

// readSpread reads an optional spread cell; nil for an empty one.
func readSpread(s string, line int, add func(int, string, string, ...any)) *float64 {
	if s == "" {
		return nil
	}
	v, _ := checkSpread(s, line, add)
	return &v
}

// checkSpread reads a price spread: a share from 0 to below 1, as a plain
// number or a percentage.
func checkSpread(s string, line int, add func(int, string, string, ...any)) (float64, bool) {
	const hint = `write the share either way the price may move, from 0 to below 100 %, e.g. "15 %" or 0.15`
	r, err := units.ParsePlainRange(s)
	if err != nil || r.Half != 0 {
		add(line, "spread", "%q is not a share; %s", s, hint)
		return 0, false
	}
	if !(r.Nominal >= 0 && r.Nominal < 1) {
		add(line, "spread", "%q is outside the valid range; %s", s, hint)
		return 0, false
	}
	return r.Nominal, true
}

// checkUnit parses a price unit and checks that it is per mass, volume,
// count, time or energy.
func checkUnit(s string, line int, add func(int, string, string, ...any)) (units.Unit, bool) {
	u, err := units.ParseUnit(s)
	if err != nil {
		add(line, "unit", "%q is not a unit; write one of %s", s, validUnits)
		return units.Unit{}, false
	}
	for _, d := range PriceDims {
		if u.Dim == d {
			return u, true
		}
	}
	add(line, "unit", "%q is a unit of %s; a price is per unit of mass, volume, count, time or energy: write one of %s", s, u.Dim.Name(), validUnits)
	return units.Unit{}, false
}

// firstOf records an item's line under its name and band, or reports that
// the same name and band was listed before and returns false.
func firstOf(it Item, firstName map[string]string, firstLine map[string]int, add func(int, string, string, ...any)) bool {
	key := nameKey(it.Name) + "\x00" + strconv.FormatFloat(it.FromSI, 'g', -1, 64)
	first, dup := firstLine[key]
	if !dup {
		firstLine[key], firstName[key] = it.Line, it.Name
		return true
	}
	again := "keep one line per item, or give each line its own from (the purchase from which its price applies)"
	if firstName[key] == it.Name {
		add(it.Line, "item", "%q is listed twice, on lines %d and %d, from the same purchase; %s", it.Name, first, it.Line, again)
	} else {
		add(it.Line, "item", "%q is listed twice, on line %d as %q and on line %d (names are compared without regard to letter case), from the same purchase; %s", it.Name, first, firstName[key], it.Line, again)
	}
	return false
}

// checkFrom reads the purchase from which a price band applies: a
// quantity with a unit of the line's dimension ("200 L", "25 kg"), or a
// plain number in the line's own unit. It is zero or more.
func checkFrom(s string, per units.Unit, line int, add func(int, string, string, ...any)) (float64, bool) {
	var si float64
	if plainDecimal(s) {
		v, err := strconv.ParseFloat(s, 64)
		if err != nil {
			add(line, "from", "%q is not a number", s)
			return 0, false
		}
		si = v * per.Factor
	} else {
		v, err := units.ParseAs(s, per.Dim)
		if err != nil {
			add(line, "from", "%q: write the purchase from which this price applies, in the line's unit or with a unit of %s, e.g. \"200 L\"; leave it empty for the first band", s, per.Dim.Name())
			return 0, false
		}
		si = v
	}
	if !(si >= 0) || math.IsInf(si, 0) {
		add(line, "from", "%q: the purchase from which a price applies is zero or more", s)
		return 0, false
	}
	return si, true
}

// checkBands checks the items with several price lines: their units are of
// one dimension, and one line applies from zero, so that every purchase
// has a price.
func checkBands(items []Item, add func(int, string, string, ...any)) {
	byName := map[string][]int{}
	var order []string
	for i, it := range items {
		k := nameKey(it.Name)
		if _, ok := byName[k]; !ok {
			order = append(order, k)
		}
		byName[k] = append(byName[k], i)
	}
	for _, k := range order {
		idx := byName[k]
		if len(idx) < 2 {
			continue
		}
		zero := false
		for _, i := range idx {
			if items[i].Per.Dim != items[idx[0]].Per.Dim {
				add(items[i].Line, "unit", "%q: the price bands of %q must all be per unit of %s, as on line %d", items[i].Unit, items[i].Name, items[idx[0]].Per.Dim.Name(), items[idx[0]].Line)
			}
			zero = zero || items[i].FromSI == 0
		}
		if !zero {
			add(items[idx[0]].Line, "from", "%q has price bands but none from zero; leave from empty on the line that applies to small purchases", items[idx[0]].Name)
		}
	}
}

// checkPrice parses a price as an exact decimal (never through float64).
func checkPrice(s string, line int, add func(int, string, string, ...any)) (decimal.Decimal, bool) {
	const hint = "write a decimal such as 12.50"
	if !plainDecimal(s) {
		add(line, "price", "%q is not a number; %s", s, hint)
		return decimal.Decimal{}, false
	}
	d, err := decimal.NewFromString(s)
	if err != nil {
		add(line, "price", "%q is not a number; %s", s, hint)
		return decimal.Decimal{}, false
	}
	if d.Sign() < 0 {
		add(line, "price", "%q is negative; a price is zero or more (credits come from the usage, e.g. solvent recovered, not from negative prices)", s)
		return decimal.Decimal{}, false
	}
	return d, true
}

// plainDecimal reports whether s is an optional sign, digits and at most
// one decimal point, with at least one digit: "12.50", "0.5", ".5", "7".
func plainDecimal(s string) bool {
	i := 0
	if i < len(s) && (s[i] == '+' || s[i] == '-') {
		i++
	}
	digits, dot := 0, false
	for ; i < len(s); i++ {
		switch c := s[i]; {
		case c >= '0' && c <= '9':
			digits++
		case c == '.' && !dot:
			dot = true
		default:
			return false
		}
	}
	return digits > 0
}

// checkCurrency checks the form of an ISO 4217 code.
func checkCurrency(s string, line int, add func(int, string, string, ...any)) {
	switch up := strings.ToUpper(s); {
	case validCode(s):
	case validCode(up):
		add(line, "currency", "%q: write ISO 4217 codes in capitals, here %s", s, up)
	default:
		add(line, "currency", "%q is not an ISO 4217 currency code; write three capital letters such as EUR, USD or GBP", s)
	}
}

// checkDate checks a YYYY-MM-DD calendar date (ISO 8601).
func checkDate(s string, line int, add func(int, string, string, ...any)) {
	if _, err := time.Parse(dateLayout, s); err != nil {
		add(line, "date", "%q is not a date written YYYY-MM-DD, e.g. 2025-03-31; leave it empty if unknown", s)
	}
}

// parseProblem turns an encoding/csv error into an *Error with advice.
func parseProblem(file string, pe *csv.ParseError, fields int) *Error {
	e := &Error{Of: ErrInvalid, File: file, Line: pe.StartLine}
	switch {
	case errors.Is(pe.Err, csv.ErrFieldCount):
		e.Msg = fmt.Sprintf("this line has a different number of values from the header's %d; check for a missing or extra comma (a value that contains a comma must be in double quotes)", fields)
	case errors.Is(pe.Err, csv.ErrBareQuote):
		e.Line = pe.Line
		e.Msg = fmt.Sprintf(`a double quote (") inside an unquoted value at column %d; put the whole value in double quotes and write each quote inside it as ""`, pe.Column)
	case errors.Is(pe.Err, csv.ErrQuote):
		e.Msg = fmt.Sprintf(`a quoted value is not closed properly (near line %d, column %d); end it with a double quote right before the next comma, and write each quote inside it as ""`, pe.Line, pe.Column)
	default:
		e.Msg = pe.Err.Error()
	}
	return e
}

// lineList writes "line 4" or "lines 2, 3, 5", shortening long lists.
func lineList(lines []int) string {
	const show = 8
	if len(lines) == 1 {
		return "line " + strconv.Itoa(lines[0])
	}
	parts := make([]string, 0, show+1)
	for i, l := range lines {
		if i == show {
			parts = append(parts, fmt.Sprintf("and %d more", len(lines)-show))
			break
		}
		parts = append(parts, strconv.Itoa(l))
	}
	return "lines " + strings.Join(parts, ", ")
}

// joinAnd joins "a", "a and b", "a, b and c".
func joinAnd(parts []string) string {
	if len(parts) <= 1 {
		return strings.Join(parts, "")
	}
	return strings.Join(parts[:len(parts)-1], ", ") + " and " + parts[len(parts)-1]
}

// sortProblems orders problems by line, whole-table problems last, keeping
// the order of problems on the same line.
func sortProblems(errs Errors) {
	sort.SliceStable(errs, func(i, j int) bool {
		li, lj := errs[i].Line, errs[j].Line
		if li == 0 || lj == 0 {
			return lj == 0 && li != 0
		}
		return li < lj
	})
}
