package ledger

import (
	"fmt"
	"strings"

	"github.com/shopspring/decimal"

	"sepcost/costing/prices"
	"sepcost/costing/usage"
)

// LineAmount is the ledger's rule for one line: quantity × unit price,
// rounded half away from zero to the currency's places (decimal's Round,
// as the spreadsheet ROUND function rounds). Price applies it; Checker
// holds a ledger to it.
func LineAmount(qty, price decimal.Decimal, places int32) decimal.Decimal {
	return qty.Mul(price).Round(places)
}

// Checker checks ledgers against the price table they were priced with, so
// that a writer that turns them into formulas gets their amounts back. It
// holds the table's prices in a compact form: a sweep checks every line of
// every ledger, and the common case allocates nothing.
type Checker struct {
	t      *prices.Table
	prices []small
}

// NewChecker is a Checker for ledgers priced against t.
func NewChecker(t *prices.Table) *Checker {
	c := &Checker{t: t, prices: make([]small, len(t.Items))}
	for k, it := range t.Items {
		c.prices[k] = smallOf(it.Price)
	}
	return c
}

// Check reports the first way the ledger departs from its table or its
// rule: a group not in usage.Groups, a price row outside the table or for
// another item, a unit price or unit that differs from the table's, an
// amount that is not LineAmount, a total that is not the sum of the lines.
func (c *Checker) Check(l *Ledger) error {
	sum := exactSum{}
	for k := range l.Lines {
		line := &l.Lines[k]
		at := func(format string, a ...any) error {
			return fmt.Errorf("ledger line %d (%s, %q): %s", k+1, line.Demand.Item, line.Demand.Label, fmt.Sprintf(format, a...))
		}
		if !knownGroup(line.Demand.Group) {
			return at("group %q is not one of %v", line.Demand.Group, usage.Groups)
		}
		if line.PriceRow < 0 || line.PriceRow >= len(c.t.Items) {
			return at("price row %d is outside the price table's %d items", line.PriceRow, len(c.t.Items))
		}
		it := &c.t.Items[line.PriceRow]
		if !strings.EqualFold(strings.TrimSpace(it.Name), strings.TrimSpace(line.Demand.Item)) { // as prices.Find matches
			return at("price row %d is %q, not the item demanded", line.PriceRow, it.Name)
		}
		price := smallOf(line.UnitPrice)
		if !price.equal(c.prices[line.PriceRow], line.UnitPrice, it.Price) {
			return at("unit price %s differs from the price table's %s", line.UnitPrice, it.Price)
		}
		if line.Unit != it.Unit {
			return at("unit %q differs from the price table's %q", line.Unit, it.Unit)
		}
		amount := smallOf(line.Amount)
		if !followsRule(smallOf(line.Qty), price, amount, line.Qty, line.UnitPrice, line.Amount, l.Places) {
			return at("amount %s is not %s × %s rounded to %d places (%s)", line.Amount, line.Qty, line.UnitPrice, l.Places, LineAmount(line.Qty, line.UnitPrice, l.Places))
		}
		sum.add(amount, line.Amount)
	}
	if !sum.equals(l.Total) {
		return fmt.Errorf("the ledger total %s is not the sum of its lines, %s", l.Total, sum.value())
	}
	return nil
}

// knownGroup reports whether g is one of usage.Groups.
func knownGroup(g usage.Group) bool {
	for _, k := range usage.Groups {
		if g == k {
			return true
		}
	}
	return false
}

// followsRule reports whether amount = LineAmount(qty, price, places).
// Where the coefficients are small, as a ledger's are, it works in int64
// (q·p exact, then one rounding half away from zero), which is what
// decimal's Mul and Round do; otherwise it calls LineAmount on the
// decimals qd, pd and ad.
func followsRule(q, p, a small, qd, pd, ad decimal.Decimal, places int32) bool {
	exp := q.e + p.e       // q·p = qc·pc × 10^exp
	shift := -exp - places // decimal digits to drop
	// Below 10^9 each: |qc·pc| < 10^18, inside int64.
	const lim = 1_000_000_000
	if !q.ok || !p.ok || q.c <= -lim || q.c >= lim || p.c <= -lim || p.c >= lim || shift < 0 || shift > 18 {
		return ad.Equal(LineAmount(qd, pd, places))
	}
	v := q.c * p.c
	div := int64(1)
	for range shift {
		div *= 10
	}
	r, rem := v/div, v%div
	if rem < 0 {
		rem = -rem
	}
	if 2*rem >= div { // half away from zero
		if v < 0 {
			r--
		} else {
			r++
		}
	}
	if a.ok && a.e == -places {
		return a.c == r
	}
	return ad.Equal(decimal.New(r, -places))
}

// small is a decimal c × 10^e whose coefficient has at most 18 digits,
// held in an int64 (ok false when it has more).
type small struct {
	c  int64
	e  int32
	ok bool
}

func smallOf(d decimal.Decimal) small {
	if d.NumDigits() > 18 {
		return small{}
	}
	return small{d.CoefficientInt64(), d.Exponent(), true}
}

// equal compares two decimals, a and b, given in small form where they fit.
func (x small) equal(y small, a, b decimal.Decimal) bool {
	if x.ok && y.ok && x.e == y.e {
		return x.c == y.c
	}
	return a.Equal(b)
}

// exactSum adds amounts exactly: in int64 units of the first amount's
// exponent while every amount has that exponent and the sum stays far
// from overflow (the common case: every line rounded to the minor unit),
// in decimal otherwise.
type exactSum struct {
	n     int64
	exp   int32
	set   bool
	big   bool
	exact decimal.Decimal
}

func (s *exactSum) add(a small, d decimal.Decimal) {
	if !s.big && a.ok && (!s.set || a.e == s.exp) && a.c > -1<<60 && a.c < 1<<60 && s.n > -1<<60 && s.n < 1<<60 {
		s.n += a.c
		s.exp, s.set = a.e, true
		return
	}
	if !s.big {
		s.exact, s.big = s.value(), true
	}
	s.exact = s.exact.Add(d)
}

// equals reports whether the sum is d.
func (s *exactSum) equals(d decimal.Decimal) bool {
	if !s.big {
		if t := smallOf(d); t.ok && (t.e == s.exp || !s.set) {
			return t.c == s.n
		}
	}
	return d.Equal(s.value())
}

func (s *exactSum) value() decimal.Decimal {
	if s.big {
		return s.exact
	}
	return decimal.New(s.n, s.exp)
}
