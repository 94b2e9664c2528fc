// Package campaign turns one batch into a campaign of batches: how many
// batches a target amount of product needs, the campaign's cost with the
// one-time costs charged once and the recurring ones once per batch, cost
// per gram over the campaign, working days under the site's shifts,
// labour in person-days, and the payback of a method that costs more to
// start but less per batch.
//
// It works on a priced batch (usage and ledger); it runs no model.
package campaign

import (
	"errors"
	"fmt"
	"math"

	"github.com/shopspring/decimal"

	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/usage"
)

// Shifts are the site's working hours: ShiftH hours per shift, PerDay
// shifts per working day.
type Shifts struct {
	ShiftH float64
	PerDay int
}

// DefaultShifts is one shift of eight hours a working day (common
// practice, no source: a normal laboratory day).
var DefaultShifts = Shifts{ShiftH: 8, PerDay: 1}

// MaxBatches bounds a campaign: beyond a million batches no plan is meant.
const MaxBatches = 1000000

// Cost is one method run as a campaign of equal batches.
type Cost struct {
	Method    string
	Batches   int
	BatchKg   float64 // crude per batch
	ProductKg float64 // purified product over the campaign
	// Ledger is one batch priced at the price bands of the campaign's
	// purchases (ledger.PriceCampaign); its one-time lines are the
	// campaign's, charged once.
	Ledger   ledger.Ledger
	PerBatch decimal.Decimal // recurring cost of one batch: Ledger.Total less its one-time lines
	OneTime  decimal.Decimal // one-time lines, charged once per campaign
	Capital  decimal.Decimal // equipment bought for the campaign (0 when none)
	Total    decimal.Decimal // Batches × PerBatch + OneTime + Capital
	// PerBatchSpread is Total / Batches: a batch's share of the campaign,
	// one-time costs spread, rounded to the currency's minor unit.
	PerBatchSpread decimal.Decimal
	PerGram        float64 // Total / grams of product; NaN when the product is nil
	ElapsedH       float64 // clock hours of one batch
	AttendedH      float64 // hands-on hours of one batch
	OccupiedH      float64 // equipment clock hours over the campaign: Batches × ElapsedH
	WorkingDays    float64 // at least this many working days, see Days
	PersonDays     float64 // Batches × AttendedH / ShiftH
}

// ErrCampaign is the sentinel of campaign errors.
var ErrCampaign = errors.New("invalid campaign")

// BatchesFor is how many batches make productKg of purified product when
// each batch gives perBatchKg:
//
//	N = ⌈M / m⌉
//
// An error (ErrCampaign) when a batch gives no product or N exceeds
// MaxBatches.
func BatchesFor(productKg, perBatchKg float64) (int, error) {
	if !(productKg > 0) || math.IsInf(productKg, 0) {
		return 0, fmt.Errorf("%w: the product to make must be above zero", ErrCampaign)
	}
	if !(perBatchKg > 0) {
		return 0, fmt.Errorf("%w: a batch recovers no product", ErrCampaign)
	}
	n := math.Ceil(productKg/perBatchKg - 1e-9) // a target met exactly needs no extra batch
	if n > MaxBatches {
		return 0, fmt.Errorf("%w: %.4g kg at %.4g kg per batch needs more than %d batches", ErrCampaign, productKg, perBatchKg, MaxBatches)
	}
	return int(math.Max(n, 1)), nil
}

// Days is the working time of a campaign of n batches run one after
// another on one set of equipment:
//
//	days = max( n·a / (s·k),  n·e / 24 )
//
// a hands-on hours and e clock hours of one batch, s the shift length in
// hours and k shifts per day. The first term is the hands-on work fitted
// into the shifts; the second the equipment's clock time, unattended steps
// (drying, ageing) running overnight. It is a lower bound: it assumes no
// waiting between steps. Person-days are n·a / s (one person-day is one
// shift).
func Days(n int, elapsedH, attendedH float64, sh Shifts) (workingDays, personDays float64) {
	N := float64(n)
	workingDays = math.Max(N*attendedH/(sh.ShiftH*float64(sh.PerDay)), N*elapsedH/24)
	return workingDays, N * attendedH / sh.ShiftH
}

// Run prices one batch's usage u for a campaign of n batches and adds it
// up: the recurring lines n times, the one-time lines (usage.OneTime) and
// capital once. The batch is priced at the bands of the campaign's
// purchases. A usage that is not feasible is an error.
func Run(u usage.Usage, t *prices.Table, n int, capital decimal.Decimal, sh Shifts) (Cost, error) {
	return run(u, n, capital, sh, func() (ledger.Ledger, error) { return ledger.PriceCampaign(u, t, n) })
}

// RunWith is Run with the batch priced on a prepared table
// (ledger.Pricer.PriceCampaign, the same ledger, found faster when many
// campaigns are priced on one table).
func RunWith(u usage.Usage, pr *ledger.Pricer, n int, capital decimal.Decimal, sh Shifts) (Cost, error) {
	return run(u, n, capital, sh, func() (ledger.Ledger, error) { return pr.PriceCampaign(u, n) })
}

// run is Run with the batch's ledger from price, asked for once the
// campaign is known to be valid.
func run(u usage.Usage, n int, capital decimal.Decimal, sh Shifts, price func() (ledger.Ledger, error)) (Cost, error) {
	if n < 1 || n > MaxBatches {
		return Cost{}, fmt.Errorf("%w: %d batches; a campaign has 1 to %d", ErrCampaign, n, MaxBatches)
	}
	if !(sh.ShiftH > 0) || sh.ShiftH > 24 || sh.PerDay < 1 || sh.ShiftH*float64(sh.PerDay) > 24 {
		return Cost{}, fmt.Errorf("%w: %d shifts of %g h a day", ErrCampaign, sh.PerDay, sh.ShiftH)
	}
	if !u.Feasible {
		return Cost{}, fmt.Errorf("%w: %s is not feasible: %s", ErrCampaign, u.Method, u.Reason)
	}
	if capital.IsNegative() {
		return Cost{}, fmt.Errorf("%w: negative capital %s", ErrCampaign, capital)
	}
	l, err := price()
	if err != nil {
		return Cost{}, err
	}
	c := Cost{Method: u.Method, Batches: n, BatchKg: u.CrudeKg, ProductKg: u.ProductOutKg * float64(n), Ledger: l, Capital: capital}
	c.OneTime = l.Subtotal(usage.OneTime)
	c.PerBatch = l.Total.Sub(c.OneTime)
	c.Total = c.PerBatch.Mul(decimal.NewFromInt(int64(n))).Add(c.OneTime).Add(capital)
	c.PerBatchSpread = c.Total.Div(decimal.NewFromInt(int64(n))).Round(l.Places)
	c.PerGram = math.NaN()
	if c.ProductKg > 0 {
		c.PerGram = c.Total.InexactFloat64() / (c.ProductKg * 1000)
	}
	c.ElapsedH, c.AttendedH = u.Hours()
	c.OccupiedH = float64(n) * c.ElapsedH
	c.WorkingDays, c.PersonDays = Days(n, c.ElapsedH, c.AttendedH, sh)
	return c, nil
}

// Payback is the smallest number of batches n ≥ 1 from which a method
// that costs more to start (develop: one-time development and capital) is
// at most as dear per gram of product as the method it replaces (stay),
// both run n times at their batch costs:
//
//	(n·R_d + K_d) / (n·g_d)  ≤  (n·R_s + K_s) / (n·g_s)
//	⇔  n·(g_s·R_d − g_d·R_s)  ≤  g_d·K_s − g_s·K_d
//
// with R the recurring cost of one batch, K its one-time costs plus
// capital and g its grams of product per batch. ok is false when develop
// never catches up (its recurring cost per gram is not lower). The
// comparison is made exactly in decimals (grams to the microgram).
func Payback(develop, stay Cost) (n int, ok bool) {
	gd := decimal.NewFromFloat(develop.ProductKg * 1000 / float64(develop.Batches)).Round(6)
	gs := decimal.NewFromFloat(stay.ProductKg * 1000 / float64(stay.Batches)).Round(6)
	if !gd.IsPositive() || !gs.IsPositive() {
		return 0, false
	}
	kd := develop.OneTime.Add(develop.Capital)
	ks := stay.OneTime.Add(stay.Capital)
	a := gs.Mul(develop.PerBatch).Sub(gd.Mul(stay.PerBatch))
	b := gd.Mul(ks).Sub(gs.Mul(kd))
	holds := func(n int64) bool { return decimal.NewFromInt(n).Mul(a).LessThanOrEqual(b) }
	if !a.IsNegative() {
		if a.IsZero() && !b.IsNegative() {
			return 1, true
		}
		return 0, false
	}
	// a < 0: n ≥ b/a.
	guess := math.Ceil(b.InexactFloat64() / a.InexactFloat64())
	if guess > MaxBatches {
		return 0, false
	}
	k := int64(math.Max(guess, 1))
	for !holds(k) {
		k++
	}
	for k > 1 && holds(k-1) {
		k--
	}
	return int(k), true
}
