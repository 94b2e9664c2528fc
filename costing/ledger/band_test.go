package ledger_test

import (
	"strings"
	"testing"

	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// bandTable is n-heptane as a site buys it: 2.5 L bottles, 25 L cans and
// 200 L drums (the prices are invented for the test, common practice, no
// source; a drum costing several times less per litre than a bottle is the
// usual shape of a solvent price list, common practice). The from column
// mixes a plain number in the line's unit and a quantity with a unit.
func bandTable(t *testing.T) *prices.Table {
	t.Helper()
	csv := "item,unit,price,currency,category,source,date,from\n" +
		"n-heptane,L,12.00,EUR,solvent,bottle,,\n" + // line 2
		"n-heptane,L,7.50,EUR,solvent,can,,25\n" + // line 3
		"n-heptane,L,4.10,EUR,solvent,drum,,200 L\n" + // line 4
		"chemist time,h,75.00,EUR,labour,,,\n" // line 5
	tb, err := prices.Read(strings.NewReader(csv), "prices.csv")
	if err != nil {
		t.Fatal(err)
	}
	return tb
}

// The ledger prices each line at the band its campaign purchase falls in.
// Expected amounts are hand computations: quantity × the band's price,
// rounded to the cent.
func TestPriceBands(t *testing.T) {
	t.Parallel()
	tb := bandTable(t)
	u := usage.Usage{Method: "m", Demands: []usage.Demand{
		{Item: "n-heptane", Label: "eluent", Group: usage.Materials, Qty: 0.0803, Dim: units.Volume}, // 80.3 L
		{Item: "n-heptane", Label: "loading", Group: usage.OneTime, Qty: 0.0102, Dim: units.Volume},  // 10.2 L, once
		{Item: "chemist time", Label: "work", Group: usage.Labour, Qty: 3600 * 2.5, Dim: units.Time},
	}}
	cases := []struct {
		batches int
		row     int    // price row expected (index in Items)
		eluent  string // amount of the 80.3 L line
		once    string // amount of the 10.2 L line
		band    string
	}{
		// One batch: 80.3 + 10.2 = 90.5 L → can band (25 L up), 7.50 €/L:
		// 80.3 × 7.50 = 602.25; 10.2 × 7.50 = 76.50.
		{1, 1, "602.25", "76.50", "from 25"},
		// Two batches: 2 × 80.3 + 10.2 = 170.8 L, still the can band.
		{2, 1, "602.25", "76.50", "from 25"},
		// Three batches: 3 × 80.3 + 10.2 = 251.1 L ≥ 200 L → drum, 4.10 €/L:
		// 80.3 × 4.10 = 329.23; 10.2 × 4.10 = 41.82.
		{3, 2, "329.23", "41.82", "from 200 L"},
	}
	for _, c := range cases {
		l, err := ledger.PriceCampaign(u, tb, c.batches)
		if err != nil {
			t.Fatal(err)
		}
		if l.Lines[0].PriceRow != c.row || l.Lines[0].Amount.StringFixed(2) != c.eluent || l.Lines[1].Amount.StringFixed(2) != c.once {
			t.Errorf("%d batches: row %d, %s and %s; want row %d, %s and %s", c.batches, l.Lines[0].PriceRow, l.Lines[0].Amount.StringFixed(2), l.Lines[1].Amount.StringFixed(2), c.row, c.eluent, c.once)
		}
		if l.Lines[0].Band != c.band || l.Lines[2].Band != "" {
			t.Errorf("%d batches: bands %q, %q; want %q and none for a single-line item", c.batches, l.Lines[0].Band, l.Lines[2].Band, c.band)
		}
		// 2.5 h × 75.00 = 187.50 at every campaign size.
		if got := l.Lines[2].Amount.StringFixed(2); got != "187.50" {
			t.Errorf("%d batches: labour %s, want 187.50", c.batches, got)
		}
	}
	// A small purchase (a 10 mL demand) is priced at the bottle, the band
	// the first band: 0.01 L × 12.00 = 0.12.
	small := usage.Usage{Method: "m", Demands: []usage.Demand{{Item: "n-heptane", Group: usage.Materials, Qty: 1e-5, Dim: units.Volume}}}
	l, err := ledger.Price(small, tb)
	if err != nil {
		t.Fatal(err)
	}
	if l.Lines[0].PriceRow != 0 || l.Total.StringFixed(2) != "0.12" || l.Lines[0].Band != "from 0 L" {
		t.Errorf("small purchase: row %d, total %s, band %q; want row 0, 0.12, the first band", l.Lines[0].PriceRow, l.Total.StringFixed(2), l.Lines[0].Band)
	}
}

// Old tables (no from column) price exactly as before: Purchases does not
// change a single-line item's price.
func TestPriceBandsOldTable(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	u := usage.Usage{Method: "m", Demands: []usage.Demand{demand("ethyl acetate", usage.Materials, 1000, "L")}}
	for _, n := range []int{1, 1000} {
		l, err := ledger.PriceCampaign(u, tb, n)
		if err != nil {
			t.Fatal(err)
		}
		// 1000 L × 12.40 = 12400.00 (hand computation).
		if l.Total.StringFixed(2) != "12400.00" || l.Lines[0].Band != "" {
			t.Errorf("%d batches: %s %q", n, l.Total.StringFixed(2), l.Lines[0].Band)
		}
	}
}
