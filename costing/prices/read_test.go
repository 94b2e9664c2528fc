package prices

import (
	"errors"
	"strings"
	"testing"

	"github.com/shopspring/decimal"

	"sepcost/costing/units"
)

// Source for the expected values in these tests: the file format's own
// rules, which follow published conventions: CSV as RFC 4180 (Shafranovich,
// 2005) and encoding/csv read it; calendar dates as ISO 8601 (YYYY-MM-DD,
// Gregorian calendar); currency codes as ISO 4217:2015 (three capital
// letters, from memory); unit factors as the SI Brochure, 9th ed., 2019
// (exact by definition). Prices and items in the inputs are invented for
// the tests (common practice, no source); an expected price is the decimal
// written in the input, read without loss.

const header = "item,unit,price,currency,category,source,date\n"

func TestReadGood(t *testing.T) {
	t.Parallel()
	type want struct {
		name, unit, price, cur string
		dim                    units.Dim
		factor                 float64 // SI per unit; Source: SI Brochure, 9th ed., 2019 (exact by definition)
		line                   int
	}
	tests := []struct {
		name string
		in   string
		want []want
	}{
		{
			name: "plain table with comments and a blank line",
			in: "# site prices, invented for this test\n" +
				header +
				"silica gel,kg,48.60,EUR,consumable,supplier quote,2025-01-15\n" +
				"\n" +
				"ethyl acetate,L,12.40,EUR,solvent,,\n" +
				"# labour\n" +
				"chemist time,h,55,EUR,labour,,\n" +
				"electricity,kWh,0.24,EUR,energy,,\n" +
				"TLC plate,each,.85,EUR,consumable,,\n",
			want: []want{
				{"silica gel", "kg", "48.60", "EUR", units.Mass, 1, 3},
				{"ethyl acetate", "L", "12.40", "EUR", units.Volume, 1e-3, 5},
				{"chemist time", "h", "55", "EUR", units.Time, 3600, 7},
				// Source: 1 kWh = 3.6 MJ, derived from 1 h = 3600 s (SI Brochure, 9th ed., 2019, Table 8; table number from memory)
				{"electricity", "kWh", "0.24", "EUR", units.Energy, 3.6e6, 8},
				{"TLC plate", "each", "0.85", "EUR", units.Count, 1, 9},
			},
		},
		{
			name: "columns in any order and case, spaces, byte-order mark, quoted comma",
			in: "\uFEFFPrice , ITEM,Currency,unit,Date,Source,category\n" +
				` 3.10 , "sand, washed", USD , g ,2024-02-29, "catalogue, p. 12",` + "\n" +
				"+0.5,acetone,USD,mL,,,\n",
			want: []want{
				// Source: Gregorian calendar: 2024 is a leap year, so 2024-02-29 is a date
				{"sand, washed", "g", "3.10", "USD", units.Mass, 1e-3, 2},
				{"acetone", "mL", "0.5", "USD", units.Volume, 1e-6, 3},
			},
		},
		{
			name: "minutes, megajoules, grams and a zero price",
			in: header +
				"column time,min,1.20,JPY,,,\n" +
				"steam,MJ,0,JPY,,,\n",
			want: []want{
				{"column time", "min", "1.20", "JPY", units.Time, 60, 2},
				{"steam", "MJ", "0", "JPY", units.Energy, 1e6, 3},
			},
		},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			tb, err := Read(strings.NewReader(tc.in), "prices.csv")
			if err != nil {
				t.Fatalf("Read: %v", err)
			}
			if tb.File != "prices.csv" {
				t.Errorf("File = %q", tb.File)
			}
			if len(tb.Items) != len(tc.want) {
				t.Fatalf("%d items, want %d", len(tb.Items), len(tc.want))
			}
			for i, w := range tc.want {
				it := tb.Items[i]
				if it.Name != w.name || it.Unit != w.unit || it.Currency != w.cur || it.Line != w.line {
					t.Errorf("item %d = %q %q %q line %d, want %q %q %q line %d",
						i, it.Name, it.Unit, it.Currency, it.Line, w.name, w.unit, w.cur, w.line)
				}
				if !it.Price.Equal(decimal.RequireFromString(w.price)) {
					t.Errorf("%s: price %s, want %s (the decimal written in the file)", w.name, it.Price, w.price)
				}
				if it.Per.Dim != w.dim {
					t.Errorf("%s: dimension %s, want %s", w.name, it.Per.Dim.Name(), w.dim.Name())
				}
				// Factors are exact by definition; the relative tolerance only
				// absorbs the binary representation of decimal fractions.
				if rel := (it.Per.Factor - w.factor) / w.factor; rel > 1e-15 || rel < -1e-15 {
					t.Errorf("%s: factor %g, want %g", w.name, it.Per.Factor, w.factor)
				}
				if tb.Currency != w.cur {
					t.Errorf("table currency %q, want %q", tb.Currency, w.cur)
				}
			}
		})
	}
}

// wantProblem is one expected *Error: its line and field, and a part of its
// message.
type wantProblem struct {
	line  int
	field string
	part  string
}

func TestReadBad(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name string
		in   string
		want []wantProblem
	}{
		{"comma as decimal separator",
			header + "silica gel,kg,48.60,EUR,,,\nsand,kg,\"12,5\",EUR,,,\n",
			[]wantProblem{{3, "price", `prices.csv:3: price: "12,5" is not a number; write a decimal such as 12.50`}}},
		{"exponent form is refused",
			header + "sand,kg,1e3,EUR,,,\n",
			[]wantProblem{{2, "price", `"1e3" is not a number`}}},
		{"currency symbol in the price",
			header + "sand,kg,€12.50,EUR,,,\n",
			[]wantProblem{{2, "price", `"€12.50" is not a number`}}},
		{"negative price",
			header + "sand,kg,-2.00,EUR,,,\n",
			[]wantProblem{{2, "price", `"-2.00" is negative`}}},
		{"empty item",
			header + "silica gel,kg,1,EUR,,,\n ,kg,2,EUR,,,\n",
			[]wantProblem{{3, "item", "empty; name the item"}}},
		{"empty price, unit and currency on one line",
			header + "sand,,,,,,\n",
			[]wantProblem{{2, "unit", "empty; write the unit"}, {2, "price", "empty; write the price"}, {2, "currency", "empty; write an ISO 4217 code"}}},
		{"duplicate item ignoring case names both lines",
			header + "silica gel,kg,48.60,EUR,,,\nsand,kg,1,EUR,,,\nSilica Gel ,kg,50,EUR,,,\n",
			[]wantProblem{{4, "item", `"Silica Gel" is listed twice, on line 2 as "silica gel" and on line 4`}}},
		{"exact duplicate",
			header + "sand,kg,1,EUR,,,\nsand,kg,1,EUR,,,\n",
			[]wantProblem{{3, "item", `"sand" is listed twice, on lines 2 and 3`}}},
		{"unknown unit lists the valid ones",
			header + "vial,bottle,1,EUR,,,\n",
			[]wantProblem{{2, "unit", `"bottle" is not a unit; write one of kg, g, L, mL, each, h, min, kWh, MJ`}}},
		{"temperature is no price unit",
			header + "heating,C,1,EUR,,,\n",
			[]wantProblem{{2, "unit", `"C" is a unit of temperature; a price is per unit of mass, volume, count, time or energy`}}},
		{"rate is no price unit",
			header + "pump,L/h,1,EUR,,,\n",
			[]wantProblem{{2, "unit", `"L/h" is a unit of volume flow`}}},
		{"lower-case currency",
			header + "sand,kg,1,eur,,,\n",
			[]wantProblem{{2, "currency", `"eur": write ISO 4217 codes in capitals, here EUR`}}},
		{"currency symbol",
			header + "sand,kg,1,€,,,\n",
			[]wantProblem{{2, "currency", `"€" is not an ISO 4217 currency code`}}},
		{"four letters",
			header + "sand,kg,1,EURO,,,\n",
			[]wantProblem{{2, "currency", `"EURO" is not an ISO 4217 currency code`}}},
		{"two currencies name the lines of each",
			header + "a,kg,1,EUR,,,\nb,kg,1,USD,,,\nc,kg,1,EUR,,,\n",
			[]wantProblem{{0, "currency", "prices.csv: currency: one currency per run, but the table has EUR (lines 2, 4) and USD (line 3)"}}},
		{"day-first date",
			header + "sand,kg,1,EUR,,,15/01/2025\n",
			[]wantProblem{{2, "date", `"15/01/2025" is not a date written YYYY-MM-DD`}}},
		{"date that does not exist",
			// Source: Gregorian calendar: February 2025 has 28 days (2025 is not a leap year)
			header + "sand,kg,1,EUR,,,2025-02-29\n",
			[]wantProblem{{2, "date", `"2025-02-29" is not a date`}}},
		{"header only",
			"# nothing yet\n" + header,
			[]wantProblem{{0, "", "prices.csv: the table has no items"}}},
		{"empty file",
			"",
			[]wantProblem{{0, "header", "no header row (the file is empty or holds only comments); the first line must name the columns item,unit,price,currency,category,source,date"}}},
		{"comments only",
			"# prices to come\n# none yet\n",
			[]wantProblem{{0, "header", "no header row (the file is empty or holds only comments)"}}},
		{"missing column",
			"item,unit,price,category,source,date\nsand,kg,1,,,\n",
			[]wantProblem{{1, "header", `missing column "currency"; the columns are item, unit, price, currency, category, source, date`}}},
		{"unknown column",
			"item,unit,price,currency,category,source,date,notes\nsand,kg,1,EUR,,,,fine\n",
			[]wantProblem{{1, "header", `unknown column "notes"; the columns are item, unit, price, currency, category, source, date`}}},
		{"column named twice",
			"item,unit,price,currency,category,source,date,Price\nsand,kg,1,EUR,,,,2\n",
			[]wantProblem{{1, "header", `column "Price" is named twice (columns 3 and 8)`}}},
		{"no header row",
			"silica gel,kg,48.60,EUR,consumable,quote,2025-01-15\n",
			[]wantProblem{{1, "header", `the first line must name the columns (item, unit, price, currency, category, source, date, in any order), but it is "silica gel,kg`}}},
		{"wrong number of values",
			header + "sand, washed,kg,1,EUR,,,\n",
			[]wantProblem{{2, "", "a different number of values from the header's 7"}}},
		{"stray quote",
			header + "sand,kg,1\"2,EUR,,,\n",
			[]wantProblem{{2, "", `a double quote (") inside an unquoted value at column 10`}}},
		{"Latin-1 text",
			header + "\xb5 beads,kg,1,EUR,,,\n",
			[]wantProblem{{2, "item", "not valid UTF-8 text"}}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			tb, err := Read(strings.NewReader(tc.in), "prices.csv")
			if err == nil {
				t.Fatalf("no error; table %+v", tb)
			}
			if tb != nil {
				t.Errorf("a table came back with the error")
			}
			checkProblems(t, err, tc.want)
		})
	}
}

// checkProblems checks that err is Errors holding exactly the wanted
// problems, in order, each unwrapping to ErrInvalid.
func checkProblems(t *testing.T, err error, want []wantProblem) {
	t.Helper()
	if !errors.Is(err, ErrInvalid) {
		t.Errorf("errors.Is(err, ErrInvalid) is false for %v", err)
	}
	var es Errors
	if !errors.As(err, &es) {
		t.Fatalf("error is %T, not Errors: %v", err, err)
	}
	var one *Error
	if !errors.As(err, &one) {
		t.Errorf("errors.As(err, **Error) is false")
	}
	if len(es) != len(want) {
		t.Fatalf("%d problems, want %d:\n%v", len(es), len(want), err)
	}
	for i, w := range want {
		e := es[i]
		if e.File != "prices.csv" || e.Line != w.line || e.Field != w.field {
			t.Errorf("problem %d at %s:%d field %q, want prices.csv:%d field %q", i, e.File, e.Line, e.Field, w.line, w.field)
		}
		if !strings.Contains(e.Error(), w.part) {
			t.Errorf("problem %d = %q\nwant it to contain %q", i, e.Error(), w.part)
		}
	}
}

// TestReadAllProblemsAtOnce: a table with one problem on each of seven
// lines reports all seven in one error, in line order, whole-table
// problems last.
func TestReadAllProblemsAtOnce(t *testing.T) {
	t.Parallel()
	in := header +
		"silica gel,kg,48.60,EUR,consumable,quote,2025-01-15\n" + // line 2: good
		"ethyl acetate,L,\"12,5\",EUR,solvent,,\n" + //              line 3: price
		"heptane,gallon,9.80,EUR,solvent,,\n" + //                   line 4: unit
		"SILICA GEL,kg,50,EUR,,,\n" + //                             line 5: duplicate
		",kg,1,EUR,,,\n" + //                                        line 6: item
		"sand,kg,2,eur,,,\n" + //                                    line 7: currency
		"celite,kg,30,USD,,,2025/01/15\n" //                         line 8: date, and a second currency
	_, err := Read(strings.NewReader(in), "prices.csv")
	checkProblems(t, err, []wantProblem{
		{3, "price", `"12,5" is not a number`},
		{4, "unit", `"gallon" is not a unit`},
		{5, "item", `"SILICA GEL" is listed twice, on line 2 as "silica gel" and on line 5`},
		{6, "item", "empty"},
		{7, "currency", `"eur"`},
		{8, "date", `"2025/01/15"`},
		{0, "currency", "EUR (lines 2, 3, 4, 5, 6) and USD (line 8)"},
	})
	if n := strings.Count(err.Error(), "\n") + 1; n != 7 {
		t.Errorf("Error() has %d lines, want one per problem (7)", n)
	}
}

// A reader that fails is reported with the file name, and is not taken
// for a problem in the table's content.
func TestReadIOError(t *testing.T) {
	t.Parallel()
	boom := errors.New("disk unplugged")
	_, err := Read(failingReader{boom}, "prices.csv")
	if !errors.Is(err, boom) || errors.Is(err, ErrInvalid) || !strings.HasPrefix(err.Error(), "prices.csv: ") {
		t.Errorf("err = %v", err)
	}
}

type failingReader struct{ err error }

func (f failingReader) Read([]byte) (int, error) { return 0, f.err }

func TestErrorFormat(t *testing.T) {
	t.Parallel()
	// The format of the example in the package documentation (common
	// practice: file:line: as compilers and grep print it).
	e := &Error{File: "prices.csv", Line: 12, Field: "price", Msg: `"12,5" is not a number; write a decimal such as 12.50`}
	if got, want := e.Error(), `prices.csv:12: price: "12,5" is not a number; write a decimal such as 12.50`; got != want {
		t.Errorf("got  %s\nwant %s", got, want)
	}
	e = &Error{File: "prices.csv", Msg: "the table has no items", Of: ErrInvalid}
	if got, want := e.Error(), "prices.csv: the table has no items"; got != want {
		t.Errorf("got  %s\nwant %s", got, want)
	}
	if !errors.Is(e, ErrInvalid) {
		t.Errorf("*Error does not unwrap to ErrInvalid")
	}
}

// Price bands: several lines of one item, each from a purchase; the checks
// that keep every purchase priced once.
func TestReadBands(t *testing.T) {
	t.Parallel()
	const h = "item,unit,price,currency,category,source,date,from\n"
	tb, err := Read(strings.NewReader(h+
		"n-heptane,L,12.00,EUR,,,,\n"+
		"n-heptane,mL,0.0041,EUR,,,,200 L\n"+
		"silica gel,kg,30,EUR,,,,\n"), "p.csv")
	if err != nil {
		t.Fatal(err)
	}
	// 200 L = 0.2 m³ (SI Brochure, 9th ed., 2019: 1 L = 1 dm³; from memory).
	if tb.Items[1].FromSI != 0.2 || !tb.Banded("N-Heptane") || tb.Banded("silica gel") {
		t.Errorf("bands: %+v", tb.Items)
	}
	for q, want := range map[float64]int{0: 0, 0.1999: 0, 0.2: 1, 5: 1} {
		if i, ok := tb.FindFor("n-heptane", q); !ok || i != want {
			t.Errorf("FindFor(%g m³) = %d, want %d", q, i, want)
		}
	}
	if i, _ := tb.Find("n-heptane"); i != 0 {
		t.Errorf("Find gives band %d, want the band from zero", i)
	}
	bad := []struct{ csv, want string }{
		{h + "a,L,1,EUR,,,,\na,L,2,EUR,,,,\n", "p.csv:3: item: \"a\" is listed twice"},
		{h + "a,L,1,EUR,,,,10\na,L,2,EUR,,,,20\n", "p.csv:2: from: \"a\" has price bands but none from zero"},
		{h + "a,L,1,EUR,,,,\na,kg,2,EUR,,,,20\n", "p.csv:3: unit: \"kg\": the price bands of \"a\" must all be per unit of volume"},
		{h + "a,L,1,EUR,,,,20 kg\n", "p.csv:2: from: \"20 kg\""},
		{h + "a,L,1,EUR,,,,-3\n", "p.csv:2: from: \"-3\": the purchase from which a price applies is zero or more"},
	}
	for _, c := range bad {
		_, err := Read(strings.NewReader(c.csv), "p.csv")
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%q: %v, want %q", c.csv, err, c.want)
		}
	}
}
