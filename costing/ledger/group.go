package ledger

import (
	"github.com/shopspring/decimal"

	"sepcost/costing/usage"
)

// Subtotal is the sum of the rounded amounts of the lines in group g, zero
// when the group has no lines. The subtotals of all groups add up to
// l.Total exactly.
func (l Ledger) Subtotal(g usage.Group) decimal.Decimal {
	s := decimal.Zero
	for _, ln := range l.Lines {
		if ln.Demand.Group == g {
			s = s.Add(ln.Amount)
		}
	}
	return s
}

// ByGroup is the subtotal of every group that has at least one line; print
// it in the order of usage.Groups. Its values add up to l.Total exactly.
func (l Ledger) ByGroup() map[usage.Group]decimal.Decimal {
	m := map[usage.Group]decimal.Decimal{}
	for _, ln := range l.Lines {
		s, ok := m[ln.Demand.Group]
		if !ok {
			s = decimal.Zero
		}
		m[ln.Demand.Group] = s.Add(ln.Amount)
	}
	return m
}
