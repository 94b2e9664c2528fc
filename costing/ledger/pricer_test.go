package ledger_test

import (
	"bytes"
	"math"
	"math/rand/v2"
	"reflect"
	"testing"

	"github.com/shopspring/decimal"

	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/usage"
	"sepcost/templates"
)

// A Pricer prices as Price does, digit for digit and exponent for
// exponent: every line's row, band, quantity and amount and the total, on
// the hand-checked ties of TestRoundingTies' tables (EUR, JPY, BHD), the
// band table, the example price table, and 20,000 random lines whose
// quantities span 10⁻¹² to 10¹² of the price unit, both signs, with
// quantities placed on and beside the half-way points of both roundings
// (property check: Price, in decimal, is the reference). Missing items
// and bad quantities give the same errors.
func TestPricerIsPrice(t *testing.T) {
	t.Parallel()
	ex, err := prices.Read(bytes.NewReader(templates.Prices), "prices.csv")
	if err != nil {
		t.Fatal(err)
	}
	tables := []*prices.Table{eurTable(t), ex, bandTable(t),
		table(t, "JPY", "ethyl acetate,L,1850,CUR,solvent,,", "cent item,kg,5,CUR,consumable,,"),
		table(t, "BHD", "ethyl acetate,L,1.234,CUR,solvent,,", "cent item,kg,0.001,CUR,consumable,,"),
		table(t, "EUR", "big,kg,92233720368547758.07,CUR,x,,", "tiny,kg,0.0000001,CUR,x,,")}
	rng := rand.New(rand.NewPCG(3, 4))
	for _, tb := range tables {
		pr := ledger.NewPricer(tb)
		for k := 0; k < 4000; k++ {
			var u usage.Usage
			u.Method = "m"
			for n := 0; n < 1+rng.IntN(6); n++ {
				it := tb.Items[rng.IntN(len(tb.Items))]
				u.Demands = append(u.Demands, usage.Demand{Item: it.Name, Label: "l", Group: usage.Materials, Dim: it.Per.Dim,
					Qty: randomQty(rng) * it.Per.Factor})
			}
			if k%50 == 0 {
				u.Demands = append(u.Demands, usage.Demand{Item: "no such item", Label: "x", Dim: tb.Items[0].Per.Dim, Qty: 1})
			}
			if k%70 == 0 {
				u.Demands = append(u.Demands, usage.Demand{Item: tb.Items[0].Name, Label: "y", Dim: tb.Items[0].Per.Dim, Qty: math.NaN()})
			}
			if k%30 == 0 && len(u.Demands) > 0 {
				u.Demands[0].Item = " " + u.Demands[0].Item + " " // written otherwise than in the table
			}
			want, errW := ledger.Price(u, tb)
			got, errG := pr.Price(u)
			if (errW == nil) != (errG == nil) || errW != nil && errW.Error() != errG.Error() {
				t.Fatalf("%s: errors %v, Price gives %v", tb.Currency, errG, errW)
			}
			sameLedger(t, got, want)
		}
	}
}

// randomQty is a quantity in the price unit: a random magnitude, or one
// on or beside a half-way point of the six-place or the cent rounding.
func randomQty(rng *rand.Rand) float64 {
	s := 1.0
	if rng.IntN(4) == 0 {
		s = -1
	}
	switch rng.IntN(4) {
	case 0:
		return s * math.Pow(10, -12+24*rng.Float64())
	case 1:
		return s * (float64(rng.IntN(1e9)) + 0.5) / 1e6 // on a tie of the quantity's rounding
	case 2:
		return s * float64(rng.IntN(1e7)) / 1e6 // six places exactly: the amount may tie
	}
	return s * math.Nextafter((float64(rng.IntN(1e6))+0.5)/1e6, math.Inf(1))
}

// sameLedger fails unless two ledgers hold the same lines and total, to
// the digit and the exponent.
func sameLedger(t *testing.T, got, want ledger.Ledger) {
	t.Helper()
	same := func(a, b decimal.Decimal) bool { return a.String() == b.String() && a.Exponent() == b.Exponent() }
	if len(got.Lines) != len(want.Lines) || !same(got.Total, want.Total) || got.Places != want.Places || got.Currency != want.Currency {
		t.Fatalf("total %s (exp %d, %d lines), Price gives %s (exp %d, %d lines)", got.Total, got.Total.Exponent(), len(got.Lines), want.Total, want.Total.Exponent(), len(want.Lines))
	}
	for i, w := range want.Lines {
		g := got.Lines[i]
		if !same(g.Qty, w.Qty) || !same(g.Amount, w.Amount) || !same(g.UnitPrice, w.UnitPrice) || g.Band != w.Band || g.PriceRow != w.PriceRow || g.Unit != w.Unit || !reflect.DeepEqual(g.Demand, w.Demand) {
			t.Fatalf("line %d: %s × %s = %s (row %d, %q); Price gives %s × %s = %s (row %d, %q)", i, g.Qty, g.UnitPrice, g.Amount, g.PriceRow, g.Band, w.Qty, w.UnitPrice, w.Amount, w.PriceRow, w.Band)
		}
	}
}

// A Pricer prices a campaign's batch as PriceCampaign does: on the band
// table, whose n-heptane lines change band at 25 L and 200 L of purchase
// over the campaign (hand-set test prices, bandTable), with recurring and
// one-time demands, at 1 to 200 batches and with the item's name written
// otherwise than in the table (PriceCampaign, in decimal, is the
// reference).
func TestPricerPricesCampaigns(t *testing.T) {
	t.Parallel()
	tb := bandTable(t)
	pr := ledger.NewPricer(tb)
	rng := rand.New(rand.NewPCG(5, 6))
	for k := 0; k < 2000; k++ {
		u := usage.Usage{Method: "m"}
		for n := 0; n < 1+rng.IntN(4); n++ {
			it := tb.Items[rng.IntN(len(tb.Items))]
			g := usage.Materials
			if rng.IntN(3) == 0 {
				g = usage.OneTime
			}
			name := it.Name
			if rng.IntN(5) == 0 {
				name = " " + name + " "
			}
			u.Demands = append(u.Demands, usage.Demand{Item: name, Label: "l", Group: g, Dim: it.Per.Dim,
				Qty: it.Per.Factor * math.Pow(10, -1+3*rng.Float64())})
		}
		batches := 1 + rng.IntN(200)
		want, errW := ledger.PriceCampaign(u, tb, batches)
		got, errG := pr.PriceCampaign(u, batches)
		if (errW == nil) != (errG == nil) || errW != nil && errW.Error() != errG.Error() {
			t.Fatalf("%d batches: errors %v, PriceCampaign gives %v", batches, errG, errW)
		}
		sameLedger(t, got, want)
	}
}
