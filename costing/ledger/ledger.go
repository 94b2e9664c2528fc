// Package ledger turns physical usage into money: each demand times its
// unit price from the price table, rounded to the currency's minor unit.
// It is the only place where floating-point quantities become decimals.
package ledger

import (
	"github.com/shopspring/decimal"

	"sepcost/costing/usage"
)

// Line is one priced demand.
type Line struct {
	Demand    usage.Demand
	PriceRow  int             // index of the price item in prices.Table.Items
	Qty       decimal.Decimal // quantity in the price item's unit, rounded to QtyPlaces
	Unit      string          // the price item's unit, e.g. "kg", "L", "h"
	UnitPrice decimal.Decimal // price per Unit
	Amount    decimal.Decimal // round(Qty × UnitPrice, minor unit), half away from zero
	Band      string          // the price band used, "" when the item has one price line
}

// Ledger is the priced bill of one method at one batch mass.
type Ledger struct {
	Currency string
	Places   int32 // minor-unit decimal places of the currency (2 for EUR, USD; 0 for JPY)
	Lines    []Line
	Total    decimal.Decimal // sum of the rounded line amounts
}
