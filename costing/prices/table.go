// Package prices reads the site's price table: what each item costs, per
// which unit, in which currency, from which source and date.
package prices

import (
	"github.com/shopspring/decimal"

	"sepcost/costing/units"
)

// Item is one row of the price table.
type Item struct {
	Name     string          // item name that usage demands refer to, e.g. "silica gel"
	Unit     string          // unit as written, e.g. "kg", "L", "each", "h", "kWh"
	Per      units.Unit      // parsed unit
	Price    decimal.Decimal // price per Unit
	Currency string          // ISO 4217 code, e.g. "EUR"
	Category string          // free text: "consumable", "solvent", "labour", "disposal", ...
	Source   string          // supplier, quote or catalogue reference
	Date     string          // date of the price, as written (YYYY-MM-DD)
	Line     int             // line number in the file, 1-based
	// Spread is the share either way the price may move (the half-width of
	// a rectangular distribution) as written; nil for DefaultSpread.
	Spread *float64
	// From is the purchase from which this line's price applies, as written
	// ("200 L"); empty for the first band (from zero). FromSI is the same in
	// SI units of Per.Dim. An item may have several lines, one per band.
	From   string
	FromSI float64

	// Set by Resolve, not read from the file:
	Written string  // the name as written when Resolve renamed it to a solvent's canonical name ("heptane" for n-heptane)
	Density float64 // kg/m³ of the solvent an item priced per mass names, so that a volume of it can be priced; 0 otherwise
}

// PriceSpread is the item's spread, written or DefaultSpread.
func (it Item) PriceSpread() float64 {
	if it.Spread != nil {
		return *it.Spread
	}
	return DefaultSpread
}

// Banded reports whether the item has more than one price line.
func (t *Table) Banded(name string) bool {
	n := 0
	for i := range t.Items {
		if sameName(t.Items[i].Name, name) {
			n++
		}
	}
	return n > 1
}

// Table is a price table with a single currency.
type Table struct {
	File     string // file name used in error messages
	Currency string
	Items    []Item
}
