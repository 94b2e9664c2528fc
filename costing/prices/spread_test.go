package prices

import (
	"strings"
	"testing"
)

// The optional spread column: written as a percentage or a share; empty or
// absent gives DefaultSpread; a table without the column reads as before;
// a share of 100 % or more, or a range, is refused with line and field.
// (Prices invented for the test.)
func TestSpreadColumn(t *testing.T) {
	t.Parallel()
	in := "item,unit,price,currency,category,source,date,spread\n" +
		"silica gel,kg,48.60,EUR,consumable,quote,2025-01-15,5 %\n" +
		"ethanol,L,8.00,EUR,solvent,quote,2025-01-15,0.3\n" +
		"chemist time,h,80,EUR,labour,,,\n"
	tb, err := Read(strings.NewReader(in), "p.csv")
	if err != nil {
		t.Fatal(err)
	}
	for i, want := range []float64{0.05, 0.3, DefaultSpread} {
		if got := tb.Items[i].PriceSpread(); got != want {
			t.Errorf("%s: spread %g, want %g", tb.Items[i].Name, got, want)
		}
	}
	old, err := Read(strings.NewReader(header+"silica gel,kg,48.60,EUR,consumable,quote,2025-01-15\n"), "p.csv")
	if err != nil || old.Items[0].PriceSpread() != DefaultSpread {
		t.Errorf("a table without the column: %v", err)
	}
	for _, bad := range []string{"100 %", "-0.1", "10–20 %", "a lot"} {
		_, err := Read(strings.NewReader("item,unit,price,currency,category,source,date,spread\nsilica gel,kg,48.60,EUR,,,,"+bad+"\n"), "p.csv")
		if err == nil || !strings.Contains(err.Error(), "p.csv:2") || !strings.Contains(err.Error(), "spread") {
			t.Errorf("%q: %v", bad, err)
		}
	}
}
