package ledger

import (
	"errors"
	"math"
	"math/bits"
	"strconv"

	"github.com/shopspring/decimal"

	"sepcost/costing/prices"
	"sepcost/costing/usage"
)

// Pricer is a price table made ready to price many usages: Pricer.Price(u)
// is Price(u, t), line for line and digit for digit, but each item's row
// is looked up by name once per table rather than by a scan of the table
// per line, each row's band is named once, and a line is priced in
// integer minor units where the integers hold it (decimal arithmetic
// otherwise). The table must not change while the Pricer is in use.
type Pricer struct {
	t      *prices.Table
	places int32
	byName map[string]int // an item name exactly as the table writes it → its row, for items with one line
	band   []string       // per row: band(t, row)
	mant   []int64        // per row: the price's decimal coefficient, when it fits (fits)
	exp    []int32        // per row: the price's decimal exponent
	fits   []bool
}

// NewPricer prepares a table (nil gives a Pricer whose Price fails as
// Price does on no table).
func NewPricer(t *prices.Table) *Pricer {
	pr := &Pricer{t: t}
	if t == nil {
		return pr
	}
	n := len(t.Items)
	pr.places = prices.MinorUnits(t.Currency)
	pr.byName = make(map[string]int, n)
	pr.band, pr.mant, pr.exp, pr.fits = make([]string, n), make([]int64, n), make([]int32, n), make([]bool, n)
	for i, it := range t.Items {
		pr.band[i] = band(t, i)
		if _, seen := pr.byName[it.Name]; !seen && pr.band[i] == "" {
			if j, ok := t.FindFor(it.Name, 0); ok && j == i {
				pr.byName[it.Name] = i
			}
		}
		if c := it.Price.Coefficient(); c.IsInt64() {
			pr.mant[i], pr.exp[i], pr.fits[i] = c.Int64(), it.Price.Exponent(), true
		}
	}
	return pr
}

// Price is Price(u, t) on the prepared table.
func (pr *Pricer) Price(u usage.Usage) (Ledger, error) {
	return pr.PriceCampaign(u, 1)
}

// PriceCampaign is PriceCampaign(u, t, batches) on the prepared table:
// the same lines, at the bands of the campaign's purchases, and total.
func (pr *Pricer) PriceCampaign(u usage.Usage, batches int) (Ledger, error) {
	if pr.t == nil {
		return Ledger{}, errors.New("ledger: no price table")
	}
	var miss missingSet
	l, errs := priceWith(u, pr.t, &miss, nil, pr, batches)
	if e := miss.err(pr.t.File, pr.t.Currency); e != nil {
		errs = append(errs, e)
	}
	if err := joinErrors(errs); err != nil {
		return Ledger{}, err
	}
	return l, nil
}

// row is the table row that prices demand d of u, as FindFor gives it for
// the item's purchase in u over a campaign of batches (Purchases,
// computed once per usage and only for an item with price bands or a
// name written otherwise than in the table).
func (pr *Pricer) row(u usage.Usage, d usage.Demand, purchase *map[string]float64, batches int) (int, bool) {
	if i, ok := pr.byName[d.Item]; ok {
		return i, true
	}
	if *purchase == nil {
		*purchase = Purchases(u, batches)
	}
	return pr.t.FindFor(d.Item, (*purchase)[itemKey(d.Item)])
}

// amount prices q units of row i as price does — qty = round(q, QtyPlaces),
// amount = round(qty × price, places), both half away from zero — in
// integers: qty in millionths, the price as coefficient × 10^exponent,
// the amount in minor units. ok is false when a number would not fit in
// 63 bits (the caller then prices the line in decimal).
func (pr *Pricer) amount(q float64, i int) (qtyMicro, minor int64, ok bool) {
	if !pr.fits[i] {
		return 0, 0, false
	}
	qtyMicro, ok = microUnits(q)
	if !ok {
		return 0, 0, false
	}
	neg := (qtyMicro < 0) != (pr.mant[i] < 0)
	hi, lo := bits.Mul64(absU(qtyMicro), absU(pr.mant[i]))
	if hi != 0 || lo > math.MaxInt64 {
		return 0, 0, false
	}
	// The product is in units of 10^(exponent − QtyPlaces); the amount in
	// 10^−places.
	shift := int(pr.exp[i]) - QtyPlaces + int(pr.places)
	m, ok := scaleHalfAway(lo, shift)
	if !ok {
		return 0, 0, false
	}
	if neg {
		return qtyMicro, -int64(m), true
	}
	return qtyMicro, int64(m), true
}

// microUnits is decimal.NewFromFloat(q).Round(QtyPlaces) in millionths:
// the shortest decimal that reads back as q (strconv's, as NewFromFloat
// takes it), rounded half away from zero to six places.
func microUnits(q float64) (int64, bool) {
	var buf [32]byte
	s := strconv.AppendFloat(buf[:0], q, 'e', -1, 64) // [-]d[.ddd]e±dd
	neg := s[0] == '-'
	if neg {
		s = s[1:]
	}
	var digits uint64
	nd, k := 0, 0
	for ; k < len(s) && s[k] != 'e'; k++ {
		if s[k] != '.' {
			digits = digits*10 + uint64(s[k]-'0')
			nd++
		}
	}
	e, err := strconv.Atoi(string(s[k+1:]))
	if err != nil || nd > 18 {
		return 0, false
	}
	// q = digits × 10^(e − nd + 1); in millionths, × 10^6.
	m, ok := scaleHalfAway(digits, e-nd+1+QtyPlaces)
	if !ok {
		return 0, false
	}
	if neg {
		return -int64(m), true
	}
	return int64(m), true
}

// scaleHalfAway is v × 10^shift, rounded half away from zero when shift
// is negative; ok is false when the result or a power of ten used would
// pass 63 bits.
func scaleHalfAway(v uint64, shift int) (uint64, bool) {
	if shift >= 0 {
		if shift > 18 {
			return 0, v == 0
		}
		hi, lo := bits.Mul64(v, pow10[shift])
		return lo, hi == 0 && lo <= math.MaxInt64
	}
	if -shift > 18 {
		return 0, v < pow10[18] // below 10^18 it rounds to zero at 10^19 and beyond
	}
	p := pow10[-shift]
	q, r := v/p, v%p
	if r >= p-r { // r ≥ p/2 without overflow: half away from zero
		q++
	}
	return q, q <= math.MaxInt64
}

// pow10 are the powers of ten that fit in 63 bits.
var pow10 = func() [19]uint64 {
	var p [19]uint64
	p[0] = 1
	for i := 1; i < len(p); i++ {
		p[i] = p[i-1] * 10
	}
	return p
}()

// absU is |v| as an unsigned number.
func absU(v int64) uint64 {
	if v < 0 {
		return uint64(-v)
	}
	return uint64(v)
}

// decimalsOf are the Line's Qty and Amount for integer millionths and
// minor units (the exponents Round gives: −QtyPlaces and −places).
func (pr *Pricer) decimalsOf(qtyMicro, minor int64) (qty, amount decimal.Decimal) {
	return decimal.New(qtyMicro, -QtyPlaces), decimal.New(minor, -pr.places)
}
