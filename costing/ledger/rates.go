package ledger

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"sepcost/costing/prices"
	"sepcost/costing/usage"
)

// Rates is a price table in float64 for Monte Carlo draws, where only the
// total matters and thousands of usages are priced: no decimal, no lines.
// Total follows the rounding rule of Price (quantity to QtyPlaces, each
// line half away from zero to the minor unit, the total a sum of rounded
// lines) in binary floating point, so a total may differ from the decimal
// ledger's by a rounding step on a line whose exact product lies on a
// half; the reported ledger is always the decimal one (Price). An item
// with price bands is priced at the band its purchase in the usage falls
// in, as Price does (Purchases of one batch, prices.Table.FindFor).
type Rates struct {
	table  *prices.Table
	index  map[string][]int // item name as itemKey → its rows, by ascending From
	exact  map[string]int   // an item name exactly as the table writes it → its row, for items with one line
	price  []float64        // per row: price per the item's unit
	factor []float64        // per row: the unit's factor to SI
	scale  float64          // 10^minor units
}

// NewRates reads a table into float rates.
func NewRates(t *prices.Table) *Rates {
	r := &Rates{table: t, index: make(map[string][]int, len(t.Items)),
		price: make([]float64, len(t.Items)), factor: make([]float64, len(t.Items)),
		scale: math.Pow(10, float64(prices.MinorUnits(t.Currency)))}
	for i, it := range t.Items {
		k := itemKey(it.Name)
		r.index[k] = append(r.index[k], i)
		r.price[i] = it.Price.InexactFloat64()
		r.factor[i] = it.Per.Factor
	}
	for _, rows := range r.index {
		sort.SliceStable(rows, func(a, b int) bool { return t.Items[rows[a]].FromSI < t.Items[rows[b]].FromSI })
	}
	r.exact = make(map[string]int, len(t.Items))
	for i, it := range t.Items {
		if rows := r.index[itemKey(it.Name)]; len(rows) == 1 && rows[0] == i {
			r.exact[it.Name] = i
		}
	}
	return r
}

// Scaled is a copy whose price of row i is multiplied by f[i] (len(f) is
// the number of table rows).
func (r *Rates) Scaled(f []float64) *Rates {
	c := *r
	c.price = make([]float64, len(r.price))
	for i, p := range r.price {
		c.price[i] = p * f[i]
	}
	return &c
}

// Total prices a usage: Σ round(round(Q/f, QtyPlaces) × p, minor unit), as
// Price does, in float64. An item the table lacks, a demand of another
// dimension than its price or a quantity that is not finite is an error
// (the decimal ledger names them all; this path only stops).
func (r *Rates) Total(u usage.Usage) (float64, error) {
	const qScale = 1e6 // 10^QtyPlaces
	total := 0.0
	for _, d := range u.Demands {
		i, ok := r.row(u, d.Item)
		if !ok {
			return 0, fmt.Errorf("%w: %q", ErrMissingPrice, d.Item)
		}
		if r.table.Items[i].Per.Dim != d.Dim || math.IsNaN(d.Qty) || math.IsInf(d.Qty, 0) {
			return 0, fmt.Errorf("%w: %q (%s) cannot be priced per %s", ErrQuantity, d.Label, d.Item, r.table.Items[i].Unit)
		}
		qty := math.Round(d.Qty/r.factor[i]*qScale) / qScale
		total += math.Round(qty*r.price[i]*r.scale) / r.scale
	}
	return total, nil
}

// TotalBound is Total with a bound on how far it may lie from the
// decimal ledger's Total (Price) of the same usage: per line, one minor
// unit (the line's rounding may go the other way), the unit price times
// one step of QtyPlaces (the quantity's rounding may too), and the float
// arithmetic's own error, far smaller (10⁻⁹ of the line):
//
//	|Total − Price(u).Total| ≤ Σ_lines (10^−m + |p|·10^−QtyPlaces + 10^−9·|amount|)
func (r *Rates) TotalBound(u usage.Usage) (total, bound float64, err error) {
	const qScale = 1e6 // 10^QtyPlaces
	for _, d := range u.Demands {
		i, ok := r.row(u, d.Item)
		if !ok {
			return 0, 0, fmt.Errorf("%w: %q", ErrMissingPrice, d.Item)
		}
		if r.table.Items[i].Per.Dim != d.Dim || math.IsNaN(d.Qty) || math.IsInf(d.Qty, 0) {
			return 0, 0, fmt.Errorf("%w: %q (%s) cannot be priced per %s", ErrQuantity, d.Label, d.Item, r.table.Items[i].Unit)
		}
		qty := math.Round(d.Qty/r.factor[i]*qScale) / qScale
		amount := math.Round(qty*r.price[i]*r.scale) / r.scale
		total += amount
		bound += 1/r.scale + math.Abs(r.price[i])/qScale + 1e-9*math.Abs(amount)
	}
	return total, bound, nil
}

// row is the price row of an item for this usage: its one line, or the
// band its purchase (the usage's positive demands of it) falls in.
func (r *Rates) row(u usage.Usage, item string) (int, bool) {
	if i, ok := r.exact[item]; ok {
		return i, true
	}
	key := itemKey(item)
	rows, ok := r.index[key]
	if !ok {
		return r.table.Find(item)
	}
	if len(rows) == 1 {
		return rows[0], true
	}
	purchase := 0.0
	for _, d := range u.Demands {
		if d.Qty > 0 && !math.IsInf(d.Qty, 0) && sameItemKey(d.Item, item, key) {
			purchase += d.Qty
		}
	}
	i := rows[0]
	for _, k := range rows {
		if r.table.Items[k].FromSI <= purchase {
			i = k
		}
	}
	return i, true
}

// sameItemKey reports whether itemKey(name) == key, key being
// itemKey(item): at once when name is item as written, and without
// allocating when both are ASCII (where strings.ToLower lowers A–Z
// only); else by itemKey itself.
func sameItemKey(name, item, key string) bool {
	if name == item {
		return true
	}
	n := strings.TrimSpace(name)
	if !isASCII(n) || !isASCII(key) {
		return itemKey(name) == key
	}
	if len(n) != len(key) { // ASCII lowering keeps the length
		return false
	}
	for i := 0; i < len(n); i++ {
		c := n[i]
		if 'A' <= c && c <= 'Z' {
			c += 'a' - 'A'
		}
		if c != key[i] {
			return false
		}
	}
	return true
}

// isASCII reports whether s holds only ASCII bytes.
func isASCII(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] >= 0x80 {
			return false
		}
	}
	return true
}
