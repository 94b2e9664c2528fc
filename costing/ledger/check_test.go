package ledger_test

import (
	"strings"
	"testing"

	"sepcost/costing/ledger"
	"sepcost/costing/usage"
)

// A ledger priced by Price passes its own check, and each kind of
// departure is caught. Hand case (prices invented, eurTable): 2.5 L of
// ethyl acetate at 12.40 = 31.00; 0.125 kg of cent item at 0.01 = 0.00125,
// which rounds half away from zero to 0.00 (shopspring/decimal v1.6.0,
// Round: "rounds half away from zero"; ISO 4217 gives EUR two places).
func TestCheckerHoldsLedgerToItsRule(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	u := usage.Usage{Method: "m", Feasible: true, Demands: []usage.Demand{
		demand("ethyl acetate", usage.Materials, 2.5, "L"),
		demand("cent item", usage.Materials, 0.125, "kg"),
	}}
	l, err := ledger.Price(u, tb)
	if err != nil {
		t.Fatal(err)
	}
	c := ledger.NewChecker(tb)
	if err := c.Check(&l); err != nil {
		t.Fatalf("a priced ledger fails its check: %v", err)
	}
	if !l.Lines[0].Amount.Equal(dec("31.00")) || !l.Total.Equal(dec("31.00")) {
		t.Errorf("amounts %v, total %v; hand: 31.00 and 0.00", l.Lines[0].Amount, l.Total)
	}
	for _, c2 := range []struct {
		name string
		edit func(l *ledger.Ledger)
		want string
	}{
		{"amount", func(l *ledger.Ledger) { l.Lines[0].Amount = dec("31.01"); l.Total = dec("31.01") }, "is not 2.5 × 12.4 rounded to 2 places (31)"},
		{"total", func(l *ledger.Ledger) { l.Total = dec("31.02") }, "is not the sum of its lines, 31"},
		{"price", func(l *ledger.Ledger) { l.Lines[0].UnitPrice = dec("12.00") }, "differs from the price table's 12.4"},
		{"row", func(l *ledger.Ledger) { l.Lines[1].PriceRow = 99 }, "price row 99 is outside"},
		{"group", func(l *ledger.Ledger) { l.Lines[1].Demand.Group = "misc" }, `group "misc" is not one of`},
	} {
		bad := l
		bad.Lines = append([]ledger.Line(nil), l.Lines...)
		c2.edit(&bad)
		if err := c.Check(&bad); err == nil || !strings.Contains(err.Error(), c2.want) {
			t.Errorf("%s: err = %v, want one saying %q", c2.name, err, c2.want)
		}
	}
}

// The check's int64 path and decimal's Mul and Round agree on ties and
// signs: 0.125 → 0.13, −0.125 → −0.13, 0.135 → 0.14 (half away from zero,
// as above), 1.005 at 0 places → 1. Each hand amount passes the check and
// one minor unit more fails it.
func TestLineAmountTies(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		q, p, want string
		places     int32
	}{{"0.125", "1", "0.13", 2}, {"-0.125", "1", "-0.13", 2}, {"0.0135", "10", "0.14", 2}, {"1.005", "1", "1", 0}} {
		if got := ledger.LineAmount(dec(c.q), dec(c.p), c.places); !got.Equal(dec(c.want)) {
			t.Errorf("%s × %s to %d places = %s, want %s", c.q, c.p, c.places, got, c.want)
		}
		tb := table(t, "EUR", "x,kg,"+c.p+",CUR,consumable,,")
		ck := ledger.NewChecker(tb)
		for _, off := range []string{"0", "1"} {
			amount := dec(c.want).Add(dec(off).Shift(-c.places))
			l := ledger.Ledger{Currency: "EUR", Places: c.places, Total: amount, Lines: []ledger.Line{{
				Demand: usage.Demand{Item: "x", Group: usage.Materials}, Qty: dec(c.q), Unit: "kg",
				UnitPrice: tb.Items[0].Price, Amount: amount}}}
			if err := ck.Check(&l); (err == nil) != (off == "0") {
				t.Errorf("%s × %s, amount %s: check says %v", c.q, c.p, amount, err)
			}
		}
	}
}
