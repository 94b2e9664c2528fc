package equipment

import (
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"strings"
	"unicode/utf8"

	"github.com/shopspring/decimal"

	"sepcost/costing/problem"
	"sepcost/costing/units"
)

// Columns are the equipment table's columns in the order the starter
// writes them; a file may order them freely (any letter case), naming all.
var Columns = []string{"item", "kind", "size", "throughput", "max_load", "hourly_rate", "ownership", "price", "currency", "service_life", "source"}

// Ownership values.
const (
	OwnedWord = "owned"
	BuyWord   = "to buy"
)

// ErrInvalid is what every problem in an equipment table unwraps to.
var ErrInvalid = errors.New("invalid equipment table")

// Error is one problem, located by file, line and column; it unwraps to
// ErrInvalid.
type Error = problem.Problem

// Errors is every problem found in one table, in file order.
type Errors = problem.List

// MaxFileSize caps an equipment table: a site lists tens of items, so 1 MiB
// is far beyond any real table and keeps a wrong file from filling memory.
const MaxFileSize = 1 << 20

// Read reads an equipment table written as CSV from r; file names it in
// messages. Lines starting with '#' are comments. The header names the
// Columns. Each row is one item:
//
//	item,kind,size,throughput,max_load,hourly_rate,ownership,price,currency,service_life,source
//	450 mm column,column,450 mm,,,,owned,,,,site inventory
//	rotary evaporator 20 L,evaporator,20 L,10 L/h,,8.00,owned,,EUR,,site rate
//
// item, kind and ownership are required; size is required for every kind
// but evaporators, with the dimension SizeDim gives; throughput is a
// volume flow (required for evaporators and cartridges); max_load is a mass
// (required for cartridges); hourly_rate and price are plain decimals not
// below zero, with a currency (ISO 4217, one per table) when either is
// given; an item "to buy" needs a price and, unless it is a cartridge
// (priced per unit, used once), a service_life in hours of use ("20000 h")
// or uses ("500 each"). Every problem is reported, as Errors.
func Read(r io.Reader, file string) (*Table, error) {
	cr := csv.NewReader(r)
	cr.Comment = '#'
	cr.TrimLeadingSpace = true
	var errs Errors
	add := func(line int, field, format string, a ...any) {
		errs = append(errs, &Error{Of: ErrInvalid, File: file, Line: line, Field: field, Msg: fmt.Sprintf(format, a...)})
	}
	header, err := cr.Read()
	if err == io.EOF {
		add(0, "header", "no header row; the first line must name the columns %s", strings.Join(Columns, ","))
		return nil, errs
	}
	if err != nil {
		return nil, csvProblem(file, err)
	}
	col := map[string]int{}
	for i, h := range header {
		h = strings.ToLower(strings.TrimSpace(strings.TrimPrefix(h, "\uFEFF")))
		if !known(h) {
			add(1, "header", "unknown column %q (column %d); the columns are %s", h, i+1, strings.Join(Columns, ", "))
			continue
		}
		if _, dup := col[h]; dup {
			add(1, "header", "column %q is named twice; name each of %s once", h, strings.Join(Columns, ", "))
		}
		col[h] = i
	}
	for _, c := range Columns {
		if _, ok := col[c]; !ok {
			add(1, "header", "missing column %q; the columns are %s", c, strings.Join(Columns, ", "))
		}
	}
	if len(errs) > 0 {
		return nil, errs
	}
	cr.FieldsPerRecord = len(header)
	t := &Table{File: file}
	seen := map[string]int{}
	currency, currencyLine := "", 0
	for {
		rec, err := cr.Read()
		if err == io.EOF {
			break
		}
		if err != nil {
			var pe *csv.ParseError
			if !errors.As(err, &pe) {
				return nil, fmt.Errorf("%s: %w", file, err)
			}
			add(pe.StartLine, "", "%s; check for a missing or extra comma (a value with a comma goes in double quotes)", pe.Err)
			continue
		}
		line, _ := cr.FieldPos(0)
		get := func(name string) string { return strings.TrimSpace(rec[col[name]]) }
		if allEmpty(rec) {
			continue
		}
		before := len(errs)
		it := readRow(get, line, add)
		if len(errs) > before {
			continue
		}
		key := strings.ToLower(it.Name)
		if first, dup := seen[key]; dup {
			add(line, "item", "%q is already listed on line %d; keep one line per item", it.Name, first)
			continue
		}
		seen[key] = line
		if it.Currency != "" {
			if currency == "" {
				currency, currencyLine = it.Currency, line
			} else if it.Currency != currency {
				add(line, "currency", "%s here but %s on line %d; one currency per table", it.Currency, currency, currencyLine)
				continue
			}
		}
		t.Items = append(t.Items, it)
	}
	if len(errs) == 0 && len(t.Items) == 0 {
		add(0, "", "the table lists no equipment; add one line per item under the header")
	}
	if len(errs) > 0 {
		return nil, errs
	}
	return t, nil
}

// readRow checks one row's values and builds its Item.
func readRow(get func(string) string, line int, add func(int, string, string, ...any)) Item {
	it := Item{Name: get("item"), Kind: Kind(strings.ToLower(get("kind"))), Currency: get("currency"), Source: get("source"), Line: line}
	for _, name := range Columns {
		if !utf8.ValidString(get(name)) {
			add(line, name, "not valid UTF-8 text; save the file as UTF-8")
			return it
		}
	}
	if it.Name == "" {
		add(line, "item", "empty; name the item, e.g. \"450 mm column\"")
	}
	dim, ok := SizeDim[it.Kind]
	if !ok {
		add(line, "kind", "%q is not a kind; write one of %s", get("kind"), kindList())
		return it
	}
	it.Size = quantity(get("size"), dim, it.Kind != Evaporator, line, "size", add)
	it.Throughput = quantity(get("throughput"), units.VolumeFlow, it.Kind == Evaporator || it.Kind == Cartridge, line, "throughput", add)
	it.MaxLoad = quantity(get("max_load"), units.Mass, it.Kind == Cartridge, line, "max_load", add)
	checkLimits(&it, get, line, add)
	switch strings.ToLower(get("ownership")) {
	case OwnedWord:
		it.Owned = true
	case BuyWord:
	default:
		add(line, "ownership", "%q: write %q or %q", get("ownership"), OwnedWord, BuyWord)
	}
	it.Rate = money(get("hourly_rate"), false, line, "hourly_rate", add)
	it.Price = money(get("price"), !it.Owned || it.Kind == Cartridge, line, "price", add)
	if (!it.Rate.IsZero() || !it.Price.IsZero()) && !validCode(it.Currency) {
		add(line, "currency", "%q: an item with a rate or price needs an ISO 4217 code such as EUR, USD or GBP", it.Currency)
	}
	if s := get("service_life"); s != "" || (!it.Owned && it.Kind != Cartridge) {
		it.Life, it.LifeDim = serviceLife(s, line, add)
	}
	return it
}

// Physical limits of what a site lists (inclusive), in SI: beyond them a
// value is a slip of the unit, not equipment (common practice, no source:
// the largest process columns are about 2 m wide, plant vessels tens of m³).
var sizeMax = map[Kind]float64{
	Column: 2, Cartridge: 1000, Evaporator: 100, Flask: 0.1, Reactor: 100, Still: 100, Filter: 1000, Dryer: 100,
}

const (
	throughputMax = 100.0 / 3600 // m³/s: 100 m³/h
	moneyMax      = 1e9          // per hour or per item
)

// checkLimits refuses sizes, flows and money beyond the physical limits and
// a cartridge whose load limit exceeds the silica inside it.
func checkLimits(it *Item, get func(string) string, line int, add func(int, string, string, ...any)) {
	if max := sizeMax[it.Kind]; it.Size > max {
		add(line, "size", "%q is more than any %s (at most %g %s in SI units); check the unit", get("size"), it.Kind, max, SizeDim[it.Kind].Name())
		it.Size = 0
	}
	if it.Throughput > throughputMax {
		add(line, "throughput", "%q is more than 100 m³/h; check the unit", get("throughput"))
		it.Throughput = 0
	}
	if it.Kind == Cartridge && it.MaxLoad > 0 && it.Size > 0 && it.MaxLoad > it.Size {
		add(line, "max_load", "%q is more than the %q of silica in the cartridge; a cartridge takes a fraction of its silica's mass of crude", get("max_load"), get("size"))
	}
	for _, f := range []struct {
		name string
		v    decimal.Decimal
	}{{"hourly_rate", it.Rate}, {"price", it.Price}} {
		if f.v.GreaterThan(decimal.NewFromFloat(moneyMax)) {
			add(line, f.name, "%q is more than %g; check the number", get(f.name), moneyMax)
		}
	}
}

// quantity parses an optional or required quantity of one dimension (> 0).
func quantity(s string, dim units.Dim, required bool, line int, field string, add func(int, string, string, ...any)) float64 {
	if s == "" {
		if required {
			add(line, field, "empty; write %s", units.Accepted(dim))
		}
		return 0
	}
	v, err := units.ParseAs(s, dim)
	if err != nil {
		add(line, field, "%v", err)
		return 0
	}
	if !(v > 0) {
		add(line, field, "%q must be more than zero", s)
		return 0
	}
	return v
}

// money parses a plain decimal not below zero.
func money(s string, required bool, line int, field string, add func(int, string, string, ...any)) decimal.Decimal {
	if s == "" {
		if required {
			add(line, field, "empty; an item to buy, and every cartridge, needs a price such as 1250.00")
		}
		return decimal.Zero
	}
	d, err := decimal.NewFromString(s)
	if err != nil || strings.ContainsAny(s, "eE") {
		add(line, field, "%q is not a plain decimal; write e.g. 12.50", s)
		return decimal.Zero
	}
	if d.Sign() < 0 {
		add(line, field, "%q is negative; write zero or more", s)
		return decimal.Zero
	}
	return d
}

// serviceLife parses hours of use or a number of uses.
func serviceLife(s string, line int, add func(int, string, string, ...any)) (float64, units.Dim) {
	const want = `hours of use ("20000 h") or a number of uses ("500 each")`
	if s == "" {
		add(line, "service_life", "empty; an item to buy needs its service life: %s", want)
		return 0, units.Time
	}
	q, _, err := units.Parse(s)
	if err != nil || (q.Dim != units.Time && q.Dim != units.Count) {
		add(line, "service_life", "%q: write %s", s, want)
		return 0, units.Time
	}
	if !(q.SI > 0) {
		add(line, "service_life", "%q must be more than zero", s)
		return 0, units.Time
	}
	return q.SI, q.Dim
}

func known(h string) bool {
	for _, c := range Columns {
		if c == h {
			return true
		}
	}
	return false
}

func kindList() string {
	s := make([]string, len(Kinds))
	for i, k := range Kinds {
		s[i] = string(k)
	}
	return strings.Join(s, ", ")
}

func allEmpty(rec []string) bool {
	for _, v := range rec {
		if strings.TrimSpace(v) != "" {
			return false
		}
	}
	return true
}

func validCode(s string) bool {
	if len(s) != 3 {
		return false
	}
	for _, c := range s {
		if c < 'A' || c > 'Z' {
			return false
		}
	}
	return true
}

func csvProblem(file string, err error) error {
	var pe *csv.ParseError
	if errors.As(err, &pe) {
		return Errors{{Of: ErrInvalid, File: file, Line: pe.StartLine, Msg: pe.Err.Error()}}
	}
	return fmt.Errorf("%s: %w", file, err)
}
