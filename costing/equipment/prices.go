package equipment

import (
	"fmt"

	"github.com/shopspring/decimal"

	"sepcost/costing/prices"
	"sepcost/costing/units"
)

// HourItem is the price-table item that charges an hour of an item's use:
// its hourly rate plus, for an item to buy with a life in hours, its price
// spread over that life (straight-line wear, common practice).
func HourItem(name string) string { return "equipment hour: " + name }

// UseItem is the price-table item charged per use: a cartridge's price, or
// the price over the service life of an item to buy whose life is counted
// in uses.
func UseItem(name string) string { return "equipment use: " + name }

// Charges reports which items an item is charged by.
func (it Item) Charges() (perHour, perUse bool) {
	wear := !it.Owned && it.Kind != Cartridge
	perHour = !it.Rate.IsZero() || (wear && it.LifeDim == units.Time && it.Life > 0)
	perUse = it.Kind == Cartridge || (wear && it.LifeDim == units.Count && it.Life > 0)
	return perHour, perUse
}

// WithPrices returns the price table with one row per charge of the
// equipment (HourItem, UseItem) appended, so that the ledger prices
// equipment like any other item and the workbook shows the rows. t is
// returned unchanged when it already holds them or the table charges
// nothing. The currencies must agree.
func (e *Table) WithPrices(t *prices.Table) (*prices.Table, error) {
	if e == nil || t == nil {
		return t, nil
	}
	var add []prices.Item
	for _, it := range e.Items {
		perHour, perUse := it.Charges()
		if !perHour && !perUse {
			continue
		}
		if it.Currency != t.Currency {
			return nil, &Error{Of: ErrInvalid, File: e.File, Line: it.Line, Field: "currency", Msg: fmt.Sprintf("%q: the price table %s is in %s; write the equipment's rates and prices in the same currency", it.Currency, t.File, t.Currency)}
		}
		if perHour {
			add = append(add, e.row(HourItem(it.Name), "h", hourPrice(it), it))
		}
		if perUse {
			add = append(add, e.row(UseItem(it.Name), "each", usePrice(it), it))
		}
	}
	if len(add) == 0 {
		return t, nil
	}
	if _, ok := t.Find(add[0].Name); ok {
		return t, nil
	}
	out := &prices.Table{File: t.File, Currency: t.Currency, Items: make([]prices.Item, 0, len(t.Items)+len(add))}
	out.Items = append(append(out.Items, t.Items...), add...)
	return out, nil
}

func (e *Table) row(name, unit string, price decimal.Decimal, it Item) prices.Item {
	per, _ := units.ParseUnit(unit)
	return prices.Item{Name: name, Unit: unit, Per: per, Price: price, Currency: it.Currency, Category: "equipment",
		Source: fmt.Sprintf("%s line %d (%s)", e.File, it.Line, it.Source), Line: it.Line}
}

// hourPrice is rate + price / life-hours (an item to buy, life in hours).
func hourPrice(it Item) decimal.Decimal {
	p := it.Rate
	if !it.Owned && it.Kind != Cartridge && it.LifeDim == units.Time && it.Life > 0 {
		p = p.Add(it.Price.Div(decimal.NewFromFloat(it.Life / 3600)).Round(4))
	}
	return p
}

// usePrice is a cartridge's price, or price / uses for an item to buy.
func usePrice(it Item) decimal.Decimal {
	if it.Kind == Cartridge {
		return it.Price
	}
	return it.Price.Div(decimal.NewFromFloat(it.Life)).Round(4)
}
