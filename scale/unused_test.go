package scale

import (
	"strings"
	"testing"

	"github.com/shopspring/decimal"

	"sepcost/costing/ledger"
	"sepcost/costing/prices"
)

// A price line no ledger refers to is listed by name and file line; a
// table whose every line is used gives no note.
func TestUnusedPrices(t *testing.T) {
	t.Parallel()
	tab := &prices.Table{File: "p.csv", Currency: "EUR", Items: []prices.Item{
		{Name: "silica gel", Line: 2, Price: decimal.NewFromInt(30)},
		{Name: "n-hexane", Written: "hexanes", Line: 3, Price: decimal.NewFromInt(9)},
	}}
	res := [][]Result{{{Ledger: ledger.Ledger{Lines: []ledger.Line{{PriceRow: 0}}}}}}
	n := UnusedPrices(tab, res)
	if n == nil || !strings.Contains(n.Text, "1 line of p.csv is") || !strings.Contains(n.Text, "hexanes (read as n-hexane) (line 3)") {
		t.Errorf("note %+v", n)
	}
	res[0][0].Ledger.Lines = append(res[0][0].Ledger.Lines, ledger.Line{PriceRow: 1})
	if n := UnusedPrices(tab, res); n != nil {
		t.Errorf("every line used, but a note: %+v", n)
	}
}
