package ledger

import (
	"errors"
	"fmt"
	"strings"

	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Sentinels that the ledger's errors unwrap to.
var (
	// ErrMissingPrice: a demand names an item the price table lacks
	// (*MissingPrices).
	ErrMissingPrice = errors.New("missing price")
	// ErrDimension: a demand and its price item disagree on what is
	// measured, e.g. litres of an item priced per kilogram (*DimensionError).
	ErrDimension = errors.New("demand and price unit measure different things")
	// ErrQuantity: a demand's quantity is not a finite number, or it names
	// no item (*QuantityError); a fault of the model that made it.
	ErrQuantity = errors.New("unusable quantity")
)

// DimensionError is a demand whose dimension differs from its price
// item's unit, e.g. a volume of eluent priced per kilogram.
type DimensionError struct {
	Item   string      // item name as the demand writes it
	Label  string      // what the demand is for
	Group  usage.Group // ledger section of the demand
	File   string      // price table file
	Line   int         // line of the price item in the file
	Unit   string      // the price item's unit as written
	Priced units.Dim   // dimension of the price unit
	Used   units.Dim   // dimension of the demand
}

// Error names the price-table line, the item and both dimensions, e.g.
//
//	prices.csv:4: unit: "ethyl acetate" is priced per kg (mass), but "eluent: ethyl acetate" (materials) uses a volume of it; price it per a volume unit such as L or mL
func (e *DimensionError) Error() string {
	return fmt.Sprintf("%s:%d: unit: %q is priced per %s (%s), but %q (%s) uses %s of it; price it per %s",
		e.File, e.Line, e.Item, e.Unit, e.Priced.Name(), e.Label, e.Group, article(e.Used), unitAdvice(e.Used))
}

// Unwrap returns ErrDimension.
func (e *DimensionError) Unwrap() error { return ErrDimension }

// QuantityError is a demand that cannot be priced because its quantity is
// NaN or infinite (in SI or in the price unit), or because it names no
// price item. Models must not produce these; the ledger refuses them so
// that no NaN reaches a total or a workbook cell.
type QuantityError struct {
	Method string  // usage.Usage.Method
	Item   string  // price item named by the demand
	Label  string  // what the demand is for
	Qty    float64 // the quantity: in SI, or in the price unit when Unit is set
	Unit   string  // price unit of Qty, "" for SI
	Msg    string  // what is wrong
}

// Error names the method, the demand and the quantity.
func (e *QuantityError) Error() string {
	return fmt.Sprintf("%s: %q (item %q): %s", e.Method, e.Label, e.Item, e.Msg)
}

// Unwrap returns ErrQuantity.
func (e *QuantityError) Unwrap() error { return ErrQuantity }

// article is "a mass", "a volume", "an energy", ... for messages.
func article(d units.Dim) string {
	n := d.Name()
	if strings.HasPrefix(n, "a ") || n == "" {
		return n // "a plain number"
	}
	switch n[0] {
	case 'a', 'e', 'i', 'o', 'u':
		return "an " + n
	}
	return "a " + n
}

// unitAdvice names units of the given dimension suitable for a price.
func unitAdvice(d units.Dim) string {
	switch d {
	case units.Mass:
		return "a mass unit such as kg or g"
	case units.Volume:
		return "a volume unit such as L or mL"
	case units.Count:
		return `"each"`
	case units.Time:
		return "a time unit such as h or min"
	case units.Energy:
		return "an energy unit such as kWh or MJ"
	}
	return "a unit of " + d.Name()
}
