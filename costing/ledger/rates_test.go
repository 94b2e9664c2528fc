package ledger_test

import (
	"errors"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/usage"
)

// The float path for draws gives the decimal ledger's total, to the cent,
// on hand-checked lines and on random usages: 1.25 L of ethyl acetate at
// 12.40 EUR/L is 15.50; 0.333 kg of silica at 48.60 is 16.1838 → 16.18;
// 2.5 h at 55.00 is 137.50; total 169.18 (hand computation).
func TestRatesMatchLedger(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	r := ledger.NewRates(tb)
	u := usage.Usage{Method: "m", Demands: []usage.Demand{
		demand("ethyl acetate", usage.Materials, 1.25, "L"),
		demand("silica gel", usage.Materials, 0.333, "kg"),
		demand("chemist time", usage.Labour, 2.5, "h"),
	}}
	got, err := r.Total(u)
	if err != nil || math.Abs(got-169.18) > 1e-9 {
		t.Fatalf("total %v %v, want 169.18", got, err)
	}
	rng := rand.New(rand.NewPCG(1, 2))
	items := []struct{ item, unit string }{{"ethyl acetate", "mL"}, {"silica gel", "g"}, {"chemist time", "min"}, {"electricity", "MJ"}, {"TLC plate", "each"}}
	for k := 0; k < 500; k++ {
		var ds []usage.Demand
		for _, it := range items {
			ds = append(ds, demand(it.item, usage.Materials, math.Round(rng.Float64()*1e5)/10, it.unit))
		}
		u := usage.Usage{Method: "m", Demands: ds}
		l, err := ledger.Price(u, tb)
		if err != nil {
			t.Fatal(err)
		}
		f, err := r.Total(u)
		if err != nil || math.Abs(f-l.Total.InexactFloat64()) > 0.0100001*float64(len(ds)) {
			t.Fatalf("float %v, decimal %v (%v)", f, l.Total, err)
		}
	}
	// Scaled multiplies each row's price: at double prices 2 × 15.50 = 31.00,
	// 0.333 × 97.20 = 32.3676 → 32.37, 2.5 × 110.00 = 275.00; total 338.37
	// (hand computation; not twice 169.18, as each line is rounded).
	f := make([]float64, len(tb.Items))
	for i := range f {
		f[i] = 2
	}
	if got2, _ := r.Scaled(f).Total(u); math.Abs(got2-338.37) > 1e-9 {
		t.Errorf("scaled total %v, want 338.37", got2)
	}
	if _, err := r.Total(usage.Usage{Demands: []usage.Demand{demand("unobtainium", usage.Materials, 1, "kg")}}); !errors.Is(err, ledger.ErrMissingPrice) {
		t.Errorf("missing item: %v", err)
	}
}

// Price bands: the float path takes the band the usage's purchase falls
// in, as the decimal ledger does. 100 L of ethanol at 10.00 EUR/L is
// 1000.00; 250 L falls in the band from 200 L at 6.00, 1500.00 (hand
// computation; prices invented for the test).
func TestRatesBands(t *testing.T) {
	t.Parallel()
	csv := "item,unit,price,currency,category,source,date,from\n" +
		"ethanol,L,10.00,EUR,solvent,,,\n" +
		"ethanol,L,6.00,EUR,solvent,,,200 L\n"
	tb, err := prices.Read(strings.NewReader(csv), "bands.csv")
	if err != nil {
		t.Fatal(err)
	}
	r := ledger.NewRates(tb)
	for _, c := range []struct{ litres, want float64 }{{100, 1000}, {250, 1500}} {
		u := usage.Usage{Method: "m", Demands: []usage.Demand{demand("ethanol", usage.Materials, c.litres, "L")}}
		got, err := r.Total(u)
		l, lerr := ledger.Price(u, tb)
		if err != nil || lerr != nil || math.Abs(got-c.want) > 1e-9 || l.Total.InexactFloat64() != c.want {
			t.Errorf("%g L: float %v (%v), decimal %v (%v), want %g", c.litres, got, err, l.Total, lerr, c.want)
		}
	}
}
