package ledger

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"github.com/shopspring/decimal"

	"sepcost/costing/prices"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// QtyPlaces is the number of decimal places to which a line's quantity, in
// the price item's unit, is rounded before it is multiplied by the price:
// a millionth of a kilogram, litre, hour or kWh. It removes the binary
// noise of float64 (0.125 L arriving as 0.12500000000000003) so that the
// quantity printed on a line and in a workbook is the one priced.
const QtyPlaces = 6

// Price turns one usage into a ledger: each demand, in the order of
// u.Demands, becomes a line priced by the table item that Find returns for
// the demand's Item.
//
// Rounding rule: round half away from zero to the currency's minor unit,
// line by line; totals are sums of rounded lines.
//
//	q      = Q / f                        quantity in the price unit
//	q      = Q · ρ / f                    a volume of a liquid priced per mass (ρ: Item.Density)
//	qty    = round(q, QtyPlaces)
//	amount = round(qty × p, m)            half away from zero
//	Total  = Σ amount
//
// where Q is the demand's quantity in SI units (kg, m³, s, J, each), f the
// price unit's factor to SI (units.Unit.Factor: 1e-3 for L, 3600 for h,
// 3.6e6 for kWh), p the unit price (exact decimal from the table) and m =
// prices.MinorUnits(currency) (2 for EUR, 0 for JPY, 3 for KWD; ISO 4217).
// decimal.Round rounds half away from zero (shopspring/decimal v1.6.0,
// read in its source), as the spreadsheet ROUND function does (OASIS
// OpenDocument 1.2 Part 2, OpenFormula, ROUND, from memory; OpenOffice.org
// Calc Guide 3.2, "symmetric arithmetic rounding", confirmed), so a
// workbook cell =ROUND(qty*price, m) reproduces each line to the cent and
// the total reconciles with the printed lines exactly. A negative quantity
// (a credit) gives a negative amount, rounded symmetrically.
//
// Valid range: any finite quantity of either sign. A quantity smaller than
// 5×10⁻⁷ of the price unit (under 0.5 mg of an item priced per kg) prices
// as zero.
//
// Errors: every item the table lacks is listed in one *MissingPrices
// (ErrMissingPrice); a demand whose dimension differs from its item's unit
// gives a *DimensionError (ErrDimension); a NaN or infinite quantity, or a
// demand that names no item, gives a *QuantityError (ErrQuantity). All
// problems are returned together (errors.Join when there are several
// kinds), and no ledger is returned with them.
func Price(u usage.Usage, t *prices.Table) (Ledger, error) {
	return PriceCampaign(u, t, 1)
}

// PriceCampaign is Price for one batch of a campaign of batches: each line
// is priced at the price band its item's campaign purchase falls in
// (prices.Table.FindFor), the purchase being
//
//	P = batches × Σ q_recurring + Σ q_one-time      (SI units of the item)
//
// summed over the item's positive demands (credits do not lower it). The
// lines and Total are still those of one batch; the campaign's cost is
// batches × the recurring lines plus the one-time lines once. An item with
// a single price line is priced as Price prices it. batches below 1 count
// as 1.
func PriceCampaign(u usage.Usage, t *prices.Table, batches int) (Ledger, error) {
	if t == nil {
		return Ledger{}, errors.New("ledger: no price table")
	}
	var miss missingSet
	l, errs := price(u, t, &miss, Purchases(u, batches))
	if e := miss.err(t.File, t.Currency); e != nil {
		errs = append(errs, e)
	}
	if err := joinErrors(errs); err != nil {
		return Ledger{}, err
	}
	return l, nil
}

// PriceAll prices many usages (methods and batch masses) against one
// table. Missing prices from all of them come back as one *MissingPrices
// naming each item once with all its uses; other problems are returned
// alongside, each distinct problem once. On error no ledgers are returned.
func PriceAll(us []usage.Usage, t *prices.Table) ([]Ledger, error) {
	if t == nil {
		return nil, errors.New("ledger: no price table")
	}
	var miss missingSet
	var errs []error
	seen := map[string]bool{}
	out := make([]Ledger, len(us))
	for i, u := range us {
		l, es := price(u, t, &miss, Purchases(u, 1))
		for _, e := range es {
			// The same model fault repeats at every batch mass; say it once.
			if s := e.Error(); !seen[s] {
				seen[s] = true
				errs = append(errs, e)
			}
		}
		out[i] = l
	}
	if e := miss.err(t.File, t.Currency); e != nil {
		errs = append(errs, e)
	}
	if err := joinErrors(errs); err != nil {
		return nil, err
	}
	return out, nil
}

// price builds the ledger of one usage, adding missing items to miss and
// returning the other problems.
func price(u usage.Usage, t *prices.Table, miss *missingSet, purchase map[string]float64) (Ledger, []error) {
	return priceWith(u, t, miss, purchase, nil, 1)
}

// priceWith is price; with a Pricer (pr not nil) rows are found by its
// index and lines priced in integer minor units where they fit, and
// purchase is filled only when needed, as Purchases(u, batches). The
// lines and total are the same.
func priceWith(u usage.Usage, t *prices.Table, miss *missingSet, purchase map[string]float64, pr *Pricer, batches int) (Ledger, []error) {
	places := prices.MinorUnits(t.Currency)
	l := Ledger{Currency: t.Currency, Places: places, Total: decimal.Zero, Lines: make([]Line, 0, len(u.Demands))}
	var errs []error
	var minor int64 // the total of the lines priced in integers, minor units
	intLines := 0
	for _, d := range u.Demands {
		if strings.TrimSpace(d.Item) == "" {
			errs = append(errs, &QuantityError{Method: u.Method, Label: d.Label, Qty: d.Qty,
				Msg: "the demand names no price item"})
			continue
		}
		if math.IsNaN(d.Qty) || math.IsInf(d.Qty, 0) {
			errs = append(errs, &QuantityError{Method: u.Method, Item: d.Item, Label: d.Label, Qty: d.Qty,
				Msg: fmt.Sprintf("quantity is %v; the model produced no usable number", d.Qty)})
			continue
		}
		var idx int
		var ok bool
		if pr != nil {
			idx, ok = pr.row(u, d, &purchase, batches)
		} else {
			idx, ok = t.FindFor(d.Item, purchase[itemKey(d.Item)])
		}
		if !ok {
			miss.add(u.Method, d)
			continue
		}
		it := t.Items[idx]
		qSI := d.Qty
		switch {
		case it.Per.Dim == d.Dim:
		case it.Per.Dim == units.Mass && d.Dim == units.Volume && it.Density > 0:
			// A liquid priced per mass: its volume times its density
			// (prices.Table.Resolve records the density).
			qSI = d.Qty * it.Density
		default:
			errs = append(errs, &DimensionError{Item: d.Item, Label: d.Label, Group: d.Group,
				File: t.File, Line: it.Line, Unit: it.Unit, Priced: it.Per.Dim, Used: d.Dim})
			continue
		}
		q := qSI / it.Per.Factor
		if math.IsNaN(q) || math.IsInf(q, 0) {
			errs = append(errs, &QuantityError{Method: u.Method, Item: d.Item, Label: d.Label, Qty: q, Unit: it.Unit,
				Msg: fmt.Sprintf("quantity is %v %s after conversion to the price unit; the model produced no usable number", q, it.Unit)})
			continue
		}
		line := Line{Demand: d, PriceRow: idx, Unit: it.Unit, UnitPrice: it.Price}
		if pr == nil {
			line.Band = band(t, idx)
		} else {
			line.Band = pr.band[idx]
			if qm, mn, ok := pr.amount(q, idx); ok && !addOverflows(minor, mn) {
				line.Qty, line.Amount = pr.decimalsOf(qm, mn)
				minor += mn
				intLines++
				l.Lines = append(l.Lines, line)
				continue
			}
		}
		line.Qty = decimal.NewFromFloat(q).Round(QtyPlaces)
		line.Amount = line.Qty.Mul(it.Price).Round(places)
		l.Lines = append(l.Lines, line)
		l.Total = l.Total.Add(line.Amount)
	}
	if intLines > 0 {
		l.Total = l.Total.Add(decimal.New(minor, -places))
	}
	return l, errs
}

// addOverflows reports whether a + b passes the range of int64.
func addOverflows(a, b int64) bool {
	return (b > 0 && a > math.MaxInt64-b) || (b < 0 && a < math.MinInt64-b)
}

// Purchases is each item's purchase over a campaign of batches (SI units,
// keyed by the item name trimmed and lower-cased): batches × its recurring
// positive demands plus its one-time demands once.
func Purchases(u usage.Usage, batches int) map[string]float64 {
	if batches < 1 {
		batches = 1
	}
	out := make(map[string]float64, len(u.Demands))
	for _, d := range u.Demands {
		if !(d.Qty > 0) || math.IsInf(d.Qty, 0) {
			continue
		}
		n := float64(batches)
		if d.Group == usage.OneTime {
			n = 1
		}
		out[itemKey(d.Item)] += d.Qty * n
	}
	return out
}

// itemKey is the form in which Purchases keys item names.
func itemKey(s string) string { return strings.ToLower(strings.TrimSpace(s)) }

// band describes the price band of line idx, "" when its item has one line:
// "from " and the band's lower limit as the table writes it ("from 25",
// "from 200 L"), "from 0 L" for the first band.
func band(t *prices.Table, idx int) string {
	it := t.Items[idx]
	if !t.Banded(it.Name) {
		return ""
	}
	if it.FromSI == 0 {
		return "from 0 " + it.Unit
	}
	return "from " + it.From
}

// joinErrors is nil for none, the error itself for one, else errors.Join.
func joinErrors(errs []error) error {
	switch len(errs) {
	case 0:
		return nil
	case 1:
		return errs[0]
	}
	return errors.Join(errs...)
}
