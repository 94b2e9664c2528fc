package campaign

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/shopspring/decimal"

	"sepcost/costing/prices"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Prices invented for the tests (common practice, no source); every
// expected amount below is a hand computation shown beside it.
func table(t *testing.T) *prices.Table {
	t.Helper()
	tb, err := prices.Read(strings.NewReader("item,unit,price,currency,category,source,date\n"+
		"silica gel,kg,30.00,EUR,,,\n"+
		"chemist time,h,75.00,EUR,,,\n"+
		"product,g,5.00,EUR,,,\n"), "p.csv")
	if err != nil {
		t.Fatal(err)
	}
	return tb
}

// batch is a 100 g batch giving 80 g: 2 kg silica (60.00), 4 h hands-on
// (300.00) of 10 h clock, and a one-time 40 h development (3000.00) with
// 20 g of product spent (100.00).
func batch() usage.Usage {
	u := usage.New("crystallization", 0.1, 0.082)
	u.ProductOutKg = 0.08
	u.AddDemand("silica gel", "silica", usage.Materials, 2, units.Mass)
	u.AddDemand("chemist time", "hands-on", usage.Labour, 4*3600, units.Time)
	u.AddDemand("chemist time", "development (one-time)", usage.OneTime, 40*3600, units.Time)
	u.AddDemand("product", "screening (one-time)", usage.OneTime, 0.02, units.Mass)
	u.Activities = []usage.Activity{{Name: "work", Elapsed: 10 * 3600, Attended: 4 * 3600}}
	return u
}

// One-time costs are charged once however many batches run: ten batches
// cost 10 × 360.00 + 3100.00 = 6700.00, not 10 × 3460.00 = 34600.00.
func TestChargeOnce(t *testing.T) {
	t.Parallel()
	c, err := Run(batch(), table(t), 10, decimal.Zero, DefaultShifts)
	if err != nil {
		t.Fatal(err)
	}
	want := map[string]decimal.Decimal{"per batch": c.PerBatch, "one-time": c.OneTime, "total": c.Total, "spread": c.PerBatchSpread}
	for name, w := range map[string]string{"per batch": "360.00", "one-time": "3100.00", "total": "6700.00", "spread": "670.00"} {
		if got := want[name].StringFixed(2); got != w {
			t.Errorf("%s: %s, want %s", name, got, w)
		}
	}
	// 6700.00 / 800 g = 8.375 per gram.
	if math.Abs(c.PerGram-8.375) > 1e-12 {
		t.Errorf("per gram %v, want 8.375", c.PerGram)
	}
	// Ten batches of 10 h clock and 4 h hands-on, one 8 h shift a day:
	// max(40/8, 100/24) = 5 working days; 40/8 = 5 person-days; 100 h occupied.
	if c.WorkingDays != 5 || c.PersonDays != 5 || c.OccupiedH != 100 {
		t.Errorf("days %v, person-days %v, occupied %v h; want 5, 5, 100", c.WorkingDays, c.PersonDays, c.OccupiedH)
	}
	// Two shifts a day: the clock bound 100/24 = 4.1667 days now governs.
	c2, _ := Run(batch(), table(t), 10, decimal.Zero, Shifts{ShiftH: 8, PerDay: 2})
	if math.Abs(c2.WorkingDays-100.0/24) > 1e-12 {
		t.Errorf("two shifts: %v days, want 100/24", c2.WorkingDays)
	}
	// Capital is charged once, beside the one-time costs: 6700.00 + 1234.56.
	c3, _ := Run(batch(), table(t), 10, decimal.RequireFromString("1234.56"), DefaultShifts)
	if c3.Total.StringFixed(2) != "7934.56" {
		t.Errorf("with capital %s, want 7934.56", c3.Total.StringFixed(2))
	}
}

// ⌈M / m⌉ batches, a target met exactly needing no extra one.
func TestBatchesFor(t *testing.T) {
	t.Parallel()
	cases := []struct {
		m, per float64
		n      int
	}{{1, 0.08, 13}, {0.8, 0.08, 10}, {0.001, 0.08, 1}, {5, 1.64, 4}}
	for _, c := range cases {
		if n, err := BatchesFor(c.m, c.per); err != nil || n != c.n {
			t.Errorf("BatchesFor(%v, %v) = %d, %v; want %d", c.m, c.per, n, err, c.n)
		}
	}
	for _, c := range [][2]float64{{0, 1}, {1, 0}, {math.NaN(), 1}, {1e9, 1e-6}} {
		if _, err := BatchesFor(c[0], c[1]); !errors.Is(err, ErrCampaign) {
			t.Errorf("BatchesFor(%v, %v): %v, want ErrCampaign", c[0], c[1], err)
		}
	}
}

// Payback: columns at 400.00 a batch giving 80 g and nothing to start;
// crystallization at 150.00 a batch giving 75 g after 3000.00 of
// development. Hand computation: n·(80·150 − 75·400) ≤ 75·0 − 80·3000,
// −18000·n ≤ −240000, n ≥ 13.33, so 14 batches. Check: at 14,
// (14·150 + 3000)/(14·75) = 4.857 ≤ 400/80 = 5.000; at 13,
// (13·150 + 3000)/(13·75) = 5.077 > 5.000.
func TestPayback(t *testing.T) {
	t.Parallel()
	d := func(s string) decimal.Decimal { return decimal.RequireFromString(s) }
	stay := Cost{Batches: 1, ProductKg: 0.080, PerBatch: d("400.00")}
	dev := Cost{Batches: 1, ProductKg: 0.075, PerBatch: d("150.00"), OneTime: d("3000.00")}
	if n, ok := Payback(dev, stay); !ok || n != 14 {
		t.Errorf("payback %d, %v; want 14", n, ok)
	}
	// Capital of 1500.00 on top: −18000·n ≤ −80·4500 = −360000, n ≥ 20.
	dev.Capital = d("1500.00")
	if n, ok := Payback(dev, stay); !ok || n != 20 {
		t.Errorf("payback with capital %d, %v; want 20 (exactly on the bound)", n, ok)
	}
	// Dearer per gram every batch: never pays back.
	dev.PerBatch = d("380.00")
	if _, ok := Payback(dev, stay); ok {
		t.Errorf("a method dearer per gram each batch paid back")
	}
	// Nothing to start and cheaper: pays back at once.
	if n, ok := Payback(Cost{Batches: 1, ProductKg: 0.08, PerBatch: d("100")}, stay); !ok || n != 1 {
		t.Errorf("free start: %d, %v; want 1", n, ok)
	}
}

func TestRunErrors(t *testing.T) {
	t.Parallel()
	u := batch()
	for _, c := range []struct {
		n  int
		sh Shifts
		u  func(*usage.Usage)
	}{
		{0, DefaultShifts, nil},
		{1, Shifts{ShiftH: 0, PerDay: 1}, nil},
		{1, Shifts{ShiftH: 12, PerDay: 3}, nil},
		{1, DefaultShifts, func(u *usage.Usage) { u.Feasible = false }},
	} {
		v := u
		if c.u != nil {
			c.u(&v)
		}
		if _, err := Run(v, table(t), c.n, decimal.Zero, c.sh); !errors.Is(err, ErrCampaign) {
			t.Errorf("%d batches, %+v: %v, want ErrCampaign", c.n, c.sh, err)
		}
	}
}
