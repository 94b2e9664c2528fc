package scale

import (
	"fmt"

	"github.com/shopspring/decimal"

	"sepcost/costing/cryst"
	"sepcost/costing/equipment"
	"sepcost/costing/prices"
	"sepcost/costing/usage"
)

// CapitalItem is an item of the site's equipment table marked "to buy"
// that a campaign uses: its purchase is capital, asked for once.
type CapitalItem struct {
	Name  string
	Kind  equipment.Kind
	Row   int             // index in the equipment table
	Price decimal.Decimal // purchase price
	Why   string          // what the campaign uses it for
}

// capitalOf lists the equipment to buy that one batch of a method uses:
// every item whose hourly or per-use charge is in the batch's demands
// (cartridges excepted: they are consumables), and for a crystallization
// run in a jacketed reactor the smallest reactor of the table that holds
// the batch's vessel volume. An item is listed once. A reactor the table
// lacks is reported in missing.
func capitalOf(eq *equipment.Table, u usage.Usage) (items []CapitalItem, missing string) {
	if eq == nil {
		return nil, ""
	}
	seen := map[int]bool{}
	add := func(k int, why string) {
		it := eq.Items[k]
		if it.Owned || it.Kind == equipment.Cartridge || seen[k] {
			return
		}
		seen[k] = true
		items = append(items, CapitalItem{Name: it.Name, Kind: it.Kind, Row: k, Price: it.Price, Why: why})
	}
	for _, d := range u.Demands {
		for k, it := range eq.Items {
			if d.Item == equipment.HourItem(it.Name) || d.Item == equipment.UseItem(it.Name) {
				add(k, d.Label)
			}
		}
	}
	if r, ok := u.Figure(usage.FigJacketedReactor); ok && u.Method == cryst.Method && r.SI == 1 {
		if f, ok := u.Figure(usage.FigVesselVolume); ok {
			k := -1
			for i, it := range eq.Items {
				if it.Kind == equipment.Reactor && it.Size >= f.SI*(1-1e-9) && (k < 0 || it.Size < eq.Items[k].Size) {
					k = i
				}
			}
			if k < 0 {
				missing = fmt.Sprintf("The equipment table %s has no jacketed reactor of %.4g L or more for the %s; add one (owned, or to buy with its price) to see its capital.", eq.File, f.SI*1000, u.Equipment)
			} else {
				add(k, "jacketed reactor for "+u.Equipment)
			}
		}
	}
	return items, missing
}

// capitalPrices is the site price table with the hourly and per-use charges
// of the items bought cut to their hourly rate (per use: nothing): their
// wear, the price spread over the service life, is the purchase itself,
// asked for as capital and not again in the running cost.
func capitalPrices(eq *equipment.Table, t *prices.Table, items []CapitalItem) *prices.Table {
	if len(items) == 0 {
		return t
	}
	out := &prices.Table{File: t.File, Currency: t.Currency, Items: append([]prices.Item(nil), t.Items...)}
	for _, c := range items {
		it := eq.Items[c.Row]
		for i := range out.Items {
			switch out.Items[i].Name {
			case equipment.HourItem(it.Name):
				out.Items[i].Price = it.Rate
			case equipment.UseItem(it.Name):
				out.Items[i].Price = decimal.Zero
			}
		}
	}
	return out
}

// capitalSum is the purchase price of the items.
func capitalSum(items []CapitalItem) decimal.Decimal {
	s := decimal.Zero
	for _, c := range items {
		s = s.Add(c.Price)
	}
	return s
}
