package prices

import (
	"errors"
	"strings"
	"testing"
)

// FuzzRead: Read never panics; it returns either a table that keeps the
// documented rules or an error that unwraps to ErrInvalid (a strings.Reader
// cannot fail); and a table it accepts, written back out, reads back the
// same (round trip).
func FuzzRead(f *testing.F) {
	seeds := []string{
		"",
		header,
		header + "silica gel,kg,48.60,EUR,consumable,quote,2025-01-15\n",
		header + "a,kg,1,EUR,,,\nb,L,2,USD,,,\n",
		"# c\n\uFEFFITEM,Unit,price,currency,category,source,date\n\"x, y\",mL,.5,JPY,,,\n",
		header + "sand,kg,\"12,5\",eur,,,2025-02-30\n",
		header + "a,kg/h,1e3,EUR,,,\n\"open\n",
		header + "a,kg,1,EUR\n",
		"item,unit\n",
		header + "a,kg,99999999999999999999999999.000000000000000001,EUR,,,\n",
		header + "a,kWh,-0,EUR,,,\n",
	}
	for _, s := range seeds {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, in string) {
		tb, err := Read(strings.NewReader(in), "fuzz.csv")
		if err != nil {
			if tb != nil {
				t.Fatalf("table and error together")
			}
			if !errors.Is(err, ErrInvalid) {
				t.Fatalf("error does not unwrap to ErrInvalid: %v", err)
			}
			var es Errors
			if !errors.As(err, &es) || len(es) == 0 {
				t.Fatalf("error is not a non-empty Errors: %v", err)
			}
			for _, e := range es {
				if e.File != "fuzz.csv" || e.Msg == "" || e.Line < 0 {
					t.Fatalf("badly formed problem %+v", e)
				}
			}
			return
		}
		checkTable(t, tb)

		// Round trip: every value quoted, so that names starting with '#'
		// or holding commas, quotes or newlines survive.
		var b strings.Builder
		b.WriteString(header)
		for _, it := range tb.Items {
			for i, v := range []string{it.Name, it.Unit, it.Price.String(), it.Currency, it.Category, it.Source, it.Date} {
				if i > 0 {
					b.WriteByte(',')
				}
				b.WriteString(`"` + strings.ReplaceAll(v, `"`, `""`) + `"`)
			}
			b.WriteByte('\n')
		}
		tb2, err := Read(strings.NewReader(b.String()), "again.csv")
		if err != nil {
			t.Fatalf("table written back does not read: %v\n%s", err, b.String())
		}
		if len(tb2.Items) != len(tb.Items) || tb2.Currency != tb.Currency {
			t.Fatalf("round trip changed the table")
		}
		for i, a := range tb.Items {
			c := tb2.Items[i]
			if a.Name != c.Name || a.Unit != c.Unit || !a.Price.Equal(c.Price) || a.Currency != c.Currency ||
				a.Category != c.Category || a.Source != c.Source || a.Date != c.Date || a.Per != c.Per {
				t.Fatalf("round trip changed item %d: %+v → %+v", i, a, c)
			}
		}
	})
}

// checkTable checks the rules Read promises for a table it accepts.
func checkTable(t *testing.T, tb *Table) {
	t.Helper()
	if len(tb.Items) == 0 || !validCode(tb.Currency) {
		t.Fatalf("accepted table without items or currency: %+v", tb)
	}
	for i, it := range tb.Items {
		if it.Currency != tb.Currency {
			t.Fatalf("item %d in %s, table in %s", i, it.Currency, tb.Currency)
		}
		if it.Price.Sign() < 0 {
			t.Fatalf("negative price accepted: %s", it.Price)
		}
		okDim := false
		for _, d := range PriceDims {
			okDim = okDim || it.Per.Dim == d
		}
		if !okDim || !(it.Per.Factor > 0) {
			t.Fatalf("item %q priced per %q (%s)", it.Name, it.Unit, it.Per.Dim.Name())
		}
		if j, ok := tb.Find(it.Name); !ok || j != i {
			t.Fatalf("Find(%q) = %d, %v; want %d", it.Name, j, ok, i)
		}
		if it.Line < 1 {
			t.Fatalf("item %q has line %d", it.Name, it.Line)
		}
	}
}
