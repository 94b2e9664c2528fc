package ledger_test

import (
	"errors"
	"math"
	"math/big"
	"strings"
	"testing"

	"github.com/shopspring/decimal"

	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Prices in these tests are invented (common practice, no source); the
// expected amounts are hand computations shown beside each case. Unit
// factors: 1 L = 10⁻³ m³, 1 mL = 10⁻⁶ m³, 1 g = 10⁻³ kg, 1 min = 60 s,
// 1 h = 3600 s, 1 MJ = 10⁶ J (Source: SI Brochure, 9th ed., 2019, the SI
// prefixes and the non-SI units accepted for use with the SI, Tables 7–8;
// exact by definition; table numbers from memory); 1 kWh = 10³ W × 3600 s
// = 3.6 MJ exactly (derived from the same tables).

// table reads a price table for a test.
func table(t *testing.T, currency string, rows ...string) *prices.Table {
	t.Helper()
	csv := "item,unit,price,currency,category,source,date\n"
	for _, r := range rows {
		csv += strings.ReplaceAll(r, "CUR", currency) + "\n"
	}
	tb, err := prices.Read(strings.NewReader(csv), "prices.csv")
	if err != nil {
		t.Fatalf("price table: %v", err)
	}
	return tb
}

// eurTable is the table most tests use; comments give each item's line.
func eurTable(t *testing.T) *prices.Table {
	return table(t, "EUR",
		"ethyl acetate,L,12.40,CUR,solvent,,",  // line 2
		"silica gel,kg,48.60,CUR,consumable,,", // line 3
		"chemist time,h,55.00,CUR,labour,,",    // line 4
		"electricity,kWh,0.24,CUR,energy,,",    // line 5
		"TLC plate,each,0.85,CUR,consumable,,", // line 6
		"glass wool,g,0.01,CUR,consumable,,",   // line 7
		"sand,kg,0.10,CUR,consumable,,",        // line 8
		"cent item,kg,0.01,CUR,consumable,,",   // line 9
		"acetone,L,0.10,CUR,solvent,,",         // line 10
		"waste solvent,kg,0.65,CUR,disposal,,", // line 11
		"NMR solvent,L,50.00,CUR,solvent,,",    // line 12
	)
}

func dec(s string) decimal.Decimal { return decimal.RequireFromString(s) }

func demand(item string, g usage.Group, qty float64, unit string) usage.Demand {
	u, err := units.ParseUnit(unit)
	if err != nil {
		panic(err)
	}
	return usage.Demand{Item: item, Label: "for " + item, Group: g, Qty: units.MustFrom(qty, unit), Dim: u.Dim}
}

// TestPriceLines: one demand per case, priced against eurTable.
func TestPriceLines(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	tests := []struct {
		name   string
		d      usage.Demand
		qty    string // in the price unit, rounded to QtyPlaces
		amount string // EUR, rounded to the cent
	}{
		// Source: hand computation: 125 mL = 0.125 L; 0.125 × 12.40 = 1.55
		{"mL priced per L", demand("ethyl acetate", usage.Materials, 125, "mL"), "0.125", "1.55"},
		// Source: hand computation: 350 g = 0.35 kg; 0.35 × 48.60 = 17.01
		{"g priced per kg", demand("silica gel", usage.Materials, 350, "g"), "0.35", "17.01"},
		// Source: hand computation: 45 min = 0.75 h; 0.75 × 55.00 = 41.25
		{"minutes priced per h", demand("chemist time", usage.Labour, 45, "min"), "0.75", "41.25"},
		// Source: hand computation: 9 MJ / 3.6 MJ per kWh = 2.5 kWh; 2.5 × 0.24 = 0.60
		{"MJ priced per kWh", demand("electricity", usage.Energy, 9, "MJ"), "2.5", "0.60"},
		// Source: hand computation: 12 × 0.85 = 10.20
		{"count priced each", demand("TLC plate", usage.Materials, 12, "each"), "12", "10.20"},
		// Source: hand computation: 2.5 kg = 2500 g; 2500 × 0.01 = 25.00
		{"kg priced per g", demand("glass wool", usage.Materials, 2.5, "kg"), "2500", "25.00"},
		// Source: hand computation: 1.234567 L × 12.40 = 15.3086308 → 15.31
		{"six-place quantity", demand("ethyl acetate", usage.Materials, 1.234567, "L"), "1.234567", "15.31"},
		// Source: hand computation: 1.2345674 L rounds to 1.234567 L (QtyPlaces = 6), then as above
		{"quantity rounded to six places first", demand("ethyl acetate", usage.Materials, 1.2345674, "L"), "1.234567", "15.31"},
		// Source: hand computation: 0 × 48.60 = 0.00
		{"zero quantity", demand("silica gel", usage.Materials, 0, "kg"), "0", "0.00"},
		// Source: hand computation: −0.8 L × 12.40 = −9.92 (a credit for solvent recovered)
		{"negative credit", demand("ethyl acetate", usage.Credit, -0.8, "L"), "-0.8", "-9.92"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			l, err := ledger.Price(usage.Usage{Method: "test", Demands: []usage.Demand{tc.d}}, tb)
			if err != nil {
				t.Fatal(err)
			}
			if len(l.Lines) != 1 {
				t.Fatalf("%d lines", len(l.Lines))
			}
			ln := l.Lines[0]
			if !ln.Qty.Equal(dec(tc.qty)) {
				t.Errorf("Qty = %s, want %s", ln.Qty, tc.qty)
			}
			if !ln.Amount.Equal(dec(tc.amount)) {
				t.Errorf("Amount = %s, want %s", ln.Amount, tc.amount)
			}
			if !l.Total.Equal(dec(tc.amount)) {
				t.Errorf("Total = %s, want %s", l.Total, tc.amount)
			}
			it := tb.Items[ln.PriceRow]
			if !strings.EqualFold(it.Name, tc.d.Item) || ln.Unit != it.Unit || !ln.UnitPrice.Equal(it.Price) {
				t.Errorf("line points at %q %s %s", it.Name, ln.Unit, ln.UnitPrice)
			}
			if ln.Demand != tc.d {
				t.Errorf("line lost its demand")
			}
			// Identity: the stored amount is the spreadsheet formula
			// ROUND(qty*price, 2) on the printed quantity.
			if want := sheetRound(ln.Qty, ln.UnitPrice, 2); !ln.Amount.Equal(want) {
				t.Errorf("Amount %s differs from ROUND(qty*price, 2) = %s", ln.Amount, want)
			}
		})
	}
}

// TestRoundingTies: exact ties round half away from zero, as the
// spreadsheet ROUND function does (OpenOffice.org Calc Guide 3.2, ROUND,
// "symmetric arithmetic rounding", confirmed; OASIS OpenFormula 1.2 ROUND,
// from memory), not half to even (IEEE 754 roundTiesToEven, which would
// give 0.02 for 0.025 and 2 for 2.5).
func TestRoundingTies(t *testing.T) {
	t.Parallel()
	eur := eurTable(t)
	jpy := table(t, "JPY",
		"ethyl acetate,L,1850,CUR,solvent,,",
		"cent item,kg,5,CUR,consumable,,",
	)
	bhd := table(t, "BHD",
		"ethyl acetate,L,1.234,CUR,solvent,,",
		"cent item,kg,0.001,CUR,consumable,,",
	)
	tests := []struct {
		name   string
		tb     *prices.Table
		d      usage.Demand
		places int32
		amount string
	}{
		// Source: hand computation: 0.5 kg × 0.01 = 0.005 → 0.01
		{"0.005 up", eur, demand("cent item", usage.Materials, 0.5, "kg"), 2, "0.01"},
		// Source: hand computation: −0.5 kg × 0.01 = −0.005 → −0.01
		{"-0.005 down", eur, demand("cent item", usage.Credit, -0.5, "kg"), 2, "-0.01"},
		// Source: hand computation: 0.25 kg × 0.10 = 0.025 → 0.03 (half to even: 0.02)
		{"0.025 away from zero", eur, demand("sand", usage.Materials, 0.25, "kg"), 2, "0.03"},
		// Source: hand computation: −0.25 kg × 0.10 = −0.025 → −0.03
		{"-0.025 away from zero", eur, demand("sand", usage.Credit, -0.25, "kg"), 2, "-0.03"},
		// Source: hand computation: 0.249999 kg × 0.10 = 0.0249999 → 0.02 (below the tie)
		{"just below a tie", eur, demand("sand", usage.Materials, 0.249999, "kg"), 2, "0.02"},
		// Source: hand computation: 0.1 mL = 0.0001 L; 0.0001 × 50.00 = 0.005 → 0.01.
		// In float64 the conversion gives 9.999999999999999e-05 L, which
		// would round to 0.00; rounding the quantity to QtyPlaces first
		// keeps the tie.
		{"tie through a unit conversion", eur, demand("NMR solvent", usage.Materials, 0.1, "mL"), 2, "0.01"},
		// Source: hand computation: 2.3 mL = 0.0023 L; 0.0023 × 50.00 = 0.115 → 0.12
		// (float64 gives 0.0022999999999999995 L, which would round to 0.11)
		{"tie through a unit conversion 2", eur, demand("NMR solvent", usage.Materials, 2.3, "mL"), 2, "0.12"},
		// Source: hand computation: 0.125 L × 1850 JPY = 231.25 → 231 (yen: 0 places, ISO 4217)
		{"yen", jpy, demand("ethyl acetate", usage.Materials, 125, "mL"), 0, "231"},
		// Source: hand computation: 0.5 kg × 5 JPY = 2.5 → 3 (half to even: 2)
		{"yen tie", jpy, demand("cent item", usage.Materials, 0.5, "kg"), 0, "3"},
		// Source: hand computation: −0.5 kg × 5 JPY = −2.5 → −3
		{"yen negative tie", jpy, demand("cent item", usage.Credit, -0.5, "kg"), 0, "-3"},
		// Source: hand computation: 0.125 L × 1.234 BHD = 0.15425 → 0.154 (dinar: 3 places, ISO 4217)
		{"three-place dinar", bhd, demand("ethyl acetate", usage.Materials, 0.125, "L"), 3, "0.154"},
		// Source: hand computation: 0.5 kg × 0.001 BHD = 0.0005 → 0.001
		{"three-place tie", bhd, demand("cent item", usage.Materials, 0.5, "kg"), 3, "0.001"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			l, err := ledger.Price(usage.Usage{Demands: []usage.Demand{tc.d}}, tc.tb)
			if err != nil {
				t.Fatal(err)
			}
			if l.Places != tc.places || l.Currency != tc.tb.Currency {
				t.Errorf("ledger in %s with %d places, want %s with %d", l.Currency, l.Places, tc.tb.Currency, tc.places)
			}
			if got := l.Lines[0].Amount; !got.Equal(dec(tc.amount)) {
				t.Errorf("Amount = %s, want %s", got, tc.amount)
			}
			if got := l.Lines[0].Amount.StringFixed(tc.places); got != dec(tc.amount).StringFixed(tc.places) {
				t.Errorf("printed %s", got)
			}
		})
	}
}

// TestTotalIsSumOfRoundedLines: three lines of 0.125 L acetone at
// 0.10 EUR/L. Hand computation: each line 0.0125 → 0.01; the printed lines
// add up to 0.03. Rounding the unrounded sum instead, 3 × 0.0125 = 0.0375
// → 0.04, would leave a budget a cent away from its own lines.
func TestTotalIsSumOfRoundedLines(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	var ds []usage.Demand
	for _, label := range []string{"column 1", "column 2", "column 3"} {
		d := demand("acetone", usage.Materials, 125, "mL")
		d.Label = label
		ds = append(ds, d)
	}
	l, err := ledger.Price(usage.Usage{Demands: ds}, tb)
	if err != nil {
		t.Fatal(err)
	}
	sumLines, sumRaw := decimal.Zero, decimal.Zero
	for _, ln := range l.Lines {
		sumLines = sumLines.Add(ln.Amount)
		sumRaw = sumRaw.Add(ln.Qty.Mul(ln.UnitPrice))
	}
	if !l.Total.Equal(dec("0.03")) || !l.Total.Equal(sumLines) {
		t.Errorf("Total = %s, want 0.03 = the sum of the printed lines %s", l.Total, sumLines)
	}
	if r := sumRaw.Round(2); !r.Equal(dec("0.04")) || r.Equal(l.Total) {
		t.Errorf("rounded raw sum %s; the case should show 0.04 ≠ 0.03", r)
	}
}

// TestLedgerMixed: a small bill with every group, including a credit.
func TestLedgerMixed(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	u := usage.Usage{Method: "flash chromatography", Demands: []usage.Demand{
		demand("silica gel", usage.Materials, 350, "g"),      // 17.01 (above)
		demand("ethyl acetate", usage.Materials, 1250, "mL"), // 1.25 × 12.40 = 15.50
		demand("chemist time", usage.Labour, 90, "min"),      // 1.5 × 55.00 = 82.50
		demand("electricity", usage.Energy, 1.8, "MJ"),       // 0.5 kWh × 0.24 = 0.12
		demand("waste solvent", usage.Disposal, 2.2, "kg"),   // 2.2 × 0.65 = 1.43
		demand("ethyl acetate", usage.Credit, -1000, "mL"),   // −1 × 12.40 = −12.40
		demand("TLC plate", usage.Materials, 4, "each"),      // 4 × 0.85 = 3.40
	}}
	l, err := ledger.Price(u, tb)
	if err != nil {
		t.Fatal(err)
	}
	// Source: hand computation: 17.01 + 15.50 + 82.50 + 0.12 + 1.43 − 12.40 + 3.40 = 107.56
	if !l.Total.Equal(dec("107.56")) {
		t.Errorf("Total = %s, want 107.56", l.Total)
	}
	for i, ln := range l.Lines {
		if ln.Demand != u.Demands[i] {
			t.Errorf("line %d is out of order", i)
		}
	}
	want := map[usage.Group]string{
		usage.Materials: "35.91", // Source: hand computation: 17.01 + 15.50 + 3.40
		usage.Labour:    "82.50",
		usage.Energy:    "0.12",
		usage.Disposal:  "1.43",
		usage.Credit:    "-12.40",
	}
	by := l.ByGroup()
	if len(by) != len(want) {
		t.Errorf("ByGroup has %d groups, want %d", len(by), len(want))
	}
	sum := decimal.Zero
	for _, g := range usage.Groups {
		w, ok := want[g]
		if !ok {
			w = "0"
			if _, has := by[g]; has {
				t.Errorf("ByGroup lists %s, which has no lines", g)
			}
		}
		if got := l.Subtotal(g); !got.Equal(dec(w)) {
			t.Errorf("Subtotal(%s) = %s, want %s", g, got, w)
		}
		if ok && !by[g].Equal(dec(w)) {
			t.Errorf("ByGroup[%s] = %s, want %s", g, by[g], w)
		}
		sum = sum.Add(l.Subtotal(g))
	}
	// Identity: the subtotals reconcile with the total to the cent.
	if !sum.Equal(l.Total) {
		t.Errorf("subtotals add to %s, total %s", sum, l.Total)
	}
}

func TestDimensionMismatch(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	d := demand("silica gel", usage.Materials, 500, "mL")
	d.Label = "stationary phase"
	_, err := ledger.Price(usage.Usage{Demands: []usage.Demand{d}}, tb)
	if !errors.Is(err, ledger.ErrDimension) {
		t.Fatalf("err = %v", err)
	}
	var de *ledger.DimensionError
	if !errors.As(err, &de) {
		t.Fatalf("err is %T", err)
	}
	if de.Line != 3 || de.Priced != units.Mass || de.Used != units.Volume {
		t.Errorf("DimensionError %+v", de)
	}
	for _, part := range []string{`prices.csv:3: unit: "silica gel" is priced per kg (mass)`, `"stationary phase" (materials) uses a volume`, "L or mL"} {
		if !strings.Contains(err.Error(), part) {
			t.Errorf("%q lacks %q", err, part)
		}
	}
}

func TestBadQuantities(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	tests := []struct {
		name string
		d    usage.Demand
		part string
	}{
		{"NaN", usage.Demand{Item: "sand", Label: "filter aid", Qty: math.NaN(), Dim: units.Mass}, "quantity is NaN"},
		{"+Inf", usage.Demand{Item: "sand", Label: "filter aid", Qty: math.Inf(1), Dim: units.Mass}, "quantity is +Inf"},
		{"-Inf", usage.Demand{Item: "sand", Label: "filter aid", Qty: math.Inf(-1), Dim: units.Mass}, "quantity is -Inf"},
		// 1e308 kg is 1e311 g, beyond float64 (max ≈ 1.8e308, IEEE 754 binary64)
		{"overflow in conversion", usage.Demand{Item: "glass wool", Label: "plug", Qty: 1e308, Dim: units.Mass}, "+Inf g after conversion"},
		{"no item", usage.Demand{Label: "mystery", Qty: 1, Dim: units.Mass}, "names no price item"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			l, err := ledger.Price(usage.Usage{Method: "m", Demands: []usage.Demand{tc.d}}, tb)
			if !errors.Is(err, ledger.ErrQuantity) || !strings.Contains(err.Error(), tc.part) {
				t.Fatalf("err = %v, want ErrQuantity with %q", err, tc.part)
			}
			if l.Lines != nil || !l.Total.IsZero() {
				t.Errorf("a ledger came back with the error")
			}
		})
	}
}

func TestMissingPricesOneUsage(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	u := usage.Usage{Method: "flash chromatography", Demands: []usage.Demand{
		{Item: "celite", Label: "filter pad", Group: usage.Materials, Qty: 0.01, Dim: units.Mass},
		demand("silica gel", usage.Materials, 1, "kg"),
		{Item: "sand, washed", Label: "top layer", Group: usage.Materials, Qty: 0.02, Dim: units.Mass},
		{Item: "Celite", Label: "filter pad", Group: usage.Materials, Qty: 0.01, Dim: units.Mass},
		{Item: "technician time", Label: "packing", Group: usage.Labour, Qty: 1800, Dim: units.Time},
	}}
	_, err := ledger.Price(u, tb)
	if !errors.Is(err, ledger.ErrMissingPrice) {
		t.Fatalf("err = %v", err)
	}
	var mp *ledger.MissingPrices
	if !errors.As(err, &mp) {
		t.Fatalf("err is %T", err)
	}
	if len(mp.Items) != 3 || mp.Items[0].Item != "celite" || mp.Items[1].Item != "sand, washed" || mp.Items[2].Item != "technician time" {
		t.Fatalf("missing items %+v", mp.Items)
	}
	if len(mp.Items[0].Uses) != 1 {
		t.Errorf("celite's one use is listed %d times", len(mp.Items[0].Uses))
	}
	for _, part := range []string{
		"prices.csv: 3 items have no price",
		`"celite", a mass, used for "filter pad" (materials) in flash chromatography`,
		"celite,kg,<price>,EUR,consumable,<source>,<date>",
		`"sand, washed",kg,<price>,EUR,consumable,<source>,<date>`,
		`"technician time", a time, used for "packing" (labour)`,
		"technician time,h,<price>,EUR,labour,<source>,<date>",
	} {
		if !strings.Contains(err.Error(), part) {
			t.Errorf("message lacks %q:\n%s", part, err)
		}
	}
}

// TestPriceAllMergesMissing: a sweep of two methods at two masses; each
// missing item is named once with each of its uses once.
func TestPriceAllMergesMissing(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	chrom := func(kg float64) usage.Usage {
		return usage.Usage{Method: "flash chromatography", CrudeKg: kg, Demands: []usage.Demand{
			demand("silica gel", usage.Materials, 60*kg, "kg"),
			{Item: "celite", Label: "dry load", Group: usage.Materials, Qty: kg, Dim: units.Mass},
		}}
	}
	cryst := func(kg float64) usage.Usage {
		return usage.Usage{Method: "recrystallization", CrudeKg: kg, Demands: []usage.Demand{
			{Item: "heptane", Label: "antisolvent", Group: usage.Materials, Qty: 8e-3 * kg, Dim: units.Volume},
			{Item: "CELITE", Label: "hot filtration", Group: usage.Materials, Qty: 0.1 * kg, Dim: units.Mass},
			demand("chemist time", usage.Labour, 2, "h"),
		}}
	}
	us := []usage.Usage{chrom(0.001), cryst(0.001), chrom(0.01), cryst(0.01)}
	ls, err := ledger.PriceAll(us, tb)
	if ls != nil {
		t.Errorf("ledgers came back with the error")
	}
	var mp *ledger.MissingPrices
	if !errors.As(err, &mp) || !errors.Is(err, ledger.ErrMissingPrice) {
		t.Fatalf("err = %v", err)
	}
	if len(mp.Items) != 2 || mp.Items[0].Item != "celite" || mp.Items[1].Item != "heptane" {
		t.Fatalf("items %+v", mp.Items)
	}
	if got := len(mp.Items[0].Uses); got != 2 {
		t.Errorf("celite has %d uses, want 2 (dry load, hot filtration)", got)
	}
	msg := err.Error()
	if strings.Count(msg, "celite,kg,<price>") != 1 || strings.Count(msg, "heptane,L,<price>,EUR") != 1 {
		t.Errorf("each item should be suggested once:\n%s", msg)
	}
	if !strings.Contains(msg, `"dry load" (materials) in flash chromatography; "hot filtration" (materials) in recrystallization`) {
		t.Errorf("uses not listed:\n%s", msg)
	}

	// With the prices added, the same sweep prices; one ledger per usage,
	// in order.
	tb2 := table(t, "EUR",
		"silica gel,kg,48.60,CUR,,,",
		"celite,kg,20.00,CUR,,,",
		"heptane,L,9.80,CUR,,,",
		"chemist time,h,55.00,CUR,,,",
	)
	ls, err = ledger.PriceAll(us, tb2)
	if err != nil {
		t.Fatal(err)
	}
	// Source: hand computation: 0.06 kg × 48.60 = 2.916 → 2.92; 0.001 kg × 20.00 = 0.02; total 2.94
	// Source: hand computation: 0.008 L × 9.80 = 0.0784 → 0.08; 0.0001 kg × 20.00 = 0.002 → 0.00; 2 h × 55 = 110.00; total 110.08
	// Source: hand computation: 0.6 kg × 48.60 = 29.16; 0.01 kg × 20.00 = 0.20; total 29.36
	// Source: hand computation: 0.08 L × 9.80 = 0.784 → 0.78; 0.001 kg × 20.00 = 0.02; 110.00; total 110.80
	want := []string{"2.94", "110.08", "29.36", "110.80"}
	if len(ls) != len(want) {
		t.Fatalf("%d ledgers", len(ls))
	}
	for i, w := range want {
		if !ls[i].Total.Equal(dec(w)) {
			t.Errorf("ledger %d total %s, want %s", i, ls[i].Total, w)
		}
	}
}

// TestPriceAllOtherErrors: a dimension mismatch repeated at every mass is
// reported once, together with the missing prices.
func TestPriceAllOtherErrors(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	mk := func(kg float64) usage.Usage {
		return usage.Usage{Method: "distillation", CrudeKg: kg, Demands: []usage.Demand{
			{Item: "electricity", Label: "heating", Group: usage.Energy, Qty: 3.6e6 * kg, Dim: units.Energy},
			{Item: "chemist time", Label: "attended", Group: usage.Labour, Qty: kg, Dim: units.Mass},
			{Item: "boiling chips", Label: "anti-bumping", Group: usage.Materials, Qty: 3, Dim: units.Count},
		}}
	}
	_, err := ledger.PriceAll([]usage.Usage{mk(1), mk(2), mk(5)}, tb)
	var de *ledger.DimensionError
	var mp *ledger.MissingPrices
	if !errors.As(err, &de) || !errors.As(err, &mp) {
		t.Fatalf("err = %v", err)
	}
	if n := strings.Count(err.Error(), "prices.csv:4: unit:"); n != 1 {
		t.Errorf("mismatch reported %d times:\n%s", n, err)
	}
	if !strings.Contains(err.Error(), "boiling chips,each,<price>,EUR,consumable,<source>,<date>") {
		t.Errorf("missing suggestion:\n%s", err)
	}
}

func TestNoTable(t *testing.T) {
	t.Parallel()
	if _, err := ledger.Price(usage.Usage{}, nil); err == nil {
		t.Errorf("Price with no table")
	}
	if _, err := ledger.PriceAll(nil, nil); err == nil {
		t.Errorf("PriceAll with no table")
	}
}

func TestEmptyUsage(t *testing.T) {
	t.Parallel()
	l, err := ledger.Price(usage.Usage{Method: "none"}, eurTable(t))
	if err != nil || len(l.Lines) != 0 || !l.Total.IsZero() || l.Currency != "EUR" || l.Places != 2 {
		t.Errorf("empty usage: %+v, %v", l, err)
	}
}

// TestAgainstSpreadsheetRule recomputes many lines with an independent
// implementation of ROUND(qty*price, places) in exact rational arithmetic
// (math/big), half away from zero as spreadsheets do (see
// TestRoundingTies for the sources).
func TestAgainstSpreadsheetRule(t *testing.T) {
	t.Parallel()
	tb := eurTable(t)
	jpy := table(t, "JPY", "acetone,L,137,CUR,,,", "sand,kg,3,CUR,,,")
	var n, ties int
	for _, tt := range []*prices.Table{tb, jpy} {
		// Steps of 5 mL put many products exactly on a tie (e.g. 0.05 L ×
		// 0.10 EUR/L = 0.005; 0.5 L × 137 JPY/L = 68.5); steps of 10.005 mL
		// land beside them.
		for _, step := range []float64{5, 10.005} {
			for k := -300; k <= 300; k++ {
				d := demand("acetone", usage.Materials, float64(k)*step, "mL")
				l, err := ledger.Price(usage.Usage{Demands: []usage.Demand{d}}, tt)
				if err != nil {
					t.Fatal(err)
				}
				ln := l.Lines[0]
				if want := sheetRound(ln.Qty, ln.UnitPrice, l.Places); !ln.Amount.Equal(want) {
					t.Errorf("%s × %s: ledger %s, spreadsheet rule %s", ln.Qty, ln.UnitPrice, ln.Amount, want)
				}
				if isTie(ln.Qty.Mul(ln.UnitPrice), l.Places) {
					ties++
				}
				n++
			}
		}
	}
	if n != 4*601 || ties < 20 {
		t.Errorf("checked %d lines with %d ties", n, ties)
	}
}

// isTie reports whether x lies exactly halfway between two multiples of
// 10^−places.
func isTie(x decimal.Decimal, places int32) bool {
	s := x.Shift(places).Abs()
	return s.Sub(s.Floor()).Equal(decimal.RequireFromString("0.5"))
}

// sheetRound is ROUND(qty*price, places), half away from zero, computed
// with big.Rat: sign(x)·⌊|x|·10^places + ½⌋ / 10^places.
func sheetRound(qty, price decimal.Decimal, places int32) decimal.Decimal {
	x := new(big.Rat).Mul(qty.Rat(), price.Rat())
	neg := x.Sign() < 0
	x.Abs(x)
	scale := new(big.Int).Exp(big.NewInt(10), big.NewInt(int64(places)), nil)
	x.Mul(x, new(big.Rat).SetInt(scale))
	x.Add(x, big.NewRat(1, 2))
	q := new(big.Int).Quo(x.Num(), x.Denom()) // floor for positive x
	if neg {
		q.Neg(q)
	}
	return decimal.NewFromBigInt(q, -places)
}

// A liquid priced per kg is priced by volume × density once the table has
// been resolved against the solvents: 2 L of ethyl acetate at 0.902 g/mL
// (density at 20 °C: CRC Handbook of Chemistry and Physics, from memory)
// is 1.804 kg; at 11.00 per kg that is 19.844, rounded 19.84.
func TestLiquidPricedPerMass(t *testing.T) {
	t.Parallel()
	tb := table(t, "EUR", "EtOAc,kg,11.00,CUR,solvent,,")
	names := func(n string) (string, float64, bool) {
		if strings.EqualFold(n, "etoac") || n == "ethyl acetate" {
			return "ethyl acetate", 902, true
		}
		return "", 0, false
	}
	u := usage.Usage{Method: "chromatography", Feasible: true, Demands: []usage.Demand{
		{Item: "ethyl acetate", Label: "solvent: ethyl acetate", Group: usage.Materials, Qty: 2e-3, Dim: units.Volume}}}
	if _, err := ledger.Price(u, tb); !errors.Is(err, ledger.ErrMissingPrice) {
		t.Errorf("before Resolve the alias names no item the model demands: %v", err)
	}
	if _, err := ledger.Price(u, table(t, "EUR", "ethyl acetate,kg,11.00,CUR,solvent,,")); !errors.Is(err, ledger.ErrDimension) {
		t.Errorf("without the density a volume cannot be priced per kg: %v", err)
	}
	rt, err := tb.Resolve(names)
	if err != nil {
		t.Fatal(err)
	}
	l, err := ledger.Price(u, rt)
	if err != nil {
		t.Fatal(err)
	}
	if len(l.Lines) != 1 || l.Lines[0].Qty.String() != "1.804" || l.Lines[0].Unit != "kg" || l.Total.StringFixed(2) != "19.84" {
		t.Errorf("got %+v", l)
	}
}
