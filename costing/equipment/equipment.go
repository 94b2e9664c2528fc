// Package equipment reads the site's equipment table: what the site owns or
// would buy — columns, prepacked cartridges, evaporators, flasks, jacketed
// reactors, stills, filters and dryers — with each item's size, throughput,
// hourly occupancy rate and, for items to buy, price and service life.
//
// Every method reads the same table (chromatography picks its columns,
// cartridges and evaporators from it; budgets read prices and service
// lives). The package holds physical sizes in SI and money as exact
// decimals; it imports no model. A built-in default (Default) stands in
// when the user gives no table; `sepcost init` writes it as a starter.
package equipment

import (
	"sort"

	"github.com/shopspring/decimal"

	"sepcost/costing/units"
)

// Kind is what an item is.
type Kind string

// Kinds, with what their size and throughput mean.
const (
	Column     Kind = "column"     // glass or steel column packed by hand; size: inner diameter; throughput: optional flow
	Cartridge  Kind = "cartridge"  // prepacked silica cartridge, used once; size: silica mass; throughput: flow; max_load: crude per run; price: per cartridge
	Evaporator Kind = "evaporator" // rotary or falling-film evaporator; size: flask or vessel volume (optional); throughput: distillation rate
	Flask      Kind = "flask"      // round-bottom flask; size: volume
	Reactor    Kind = "reactor"    // jacketed reactor; size: volume
	Still      Kind = "still"      // distillation still pot; size: volume
	Filter     Kind = "filter"     // filter or filter-dryer; size: filter area
	Dryer      Kind = "dryer"      // vacuum oven or dryer; size: volume
)

// Kinds lists every kind in the order the starter table uses.
var Kinds = []Kind{Column, Cartridge, Evaporator, Flask, Reactor, Still, Filter, Dryer}

// SizeDim is the dimension of each kind's size.
var SizeDim = map[Kind]units.Dim{
	Column: units.Length, Cartridge: units.Mass, Evaporator: units.Volume, Flask: units.Volume,
	Reactor: units.Volume, Still: units.Volume, Filter: units.Area, Dryer: units.Volume,
}

// Item is one row of the equipment table. Sizes are SI.
type Item struct {
	Name       string          // e.g. "600 mm steel column"; ledger items are named after it
	Kind       Kind            //
	Size       float64         // SI in SizeDim[Kind]: m (column), kg silica (cartridge), m³, m²
	Throughput float64         // m³/s: evaporation rate (evaporator), flow (cartridge, column); 0 if not given
	MaxLoad    float64         // kg of crude per run (cartridge); 0 if not given
	Rate       decimal.Decimal // money per hour the item is occupied; zero if not charged
	Owned      bool            // owned by the site; else to buy
	Price      decimal.Decimal // purchase price (to buy), or price per cartridge
	Currency   string          // ISO 4217 code when any money is given
	Life       float64         // service life of an item to buy: hours of use (s) or uses (count); 0 if none
	LifeDim    units.Dim       // units.Time or units.Count
	Source     string          // where the figures come from
	Line       int             // line in the file, 1-based
}

// Consumable reports whether the item is used up in one run (a cartridge).
func (it Item) Consumable() bool { return it.Kind == Cartridge }

// Table is the site's equipment.
type Table struct {
	File  string
	Items []Item
}

// OfKind lists the items of one kind, smallest first: by size, then
// throughput; evaporators by throughput (their size is optional).
func (t *Table) OfKind(k Kind) []Item {
	if t == nil {
		return nil
	}
	var out []Item
	for _, it := range t.Items {
		if it.Kind == k {
			out = append(out, it)
		}
	}
	sort.SliceStable(out, func(i, j int) bool {
		if k == Evaporator {
			return out[i].Throughput < out[j].Throughput
		}
		if out[i].Size != out[j].Size {
			return out[i].Size < out[j].Size
		}
		return out[i].Throughput < out[j].Throughput
	})
	return out
}

// Currency is the table's one currency, or "" when it names no money.
func (t *Table) Currency() string {
	if t == nil {
		return ""
	}
	for _, it := range t.Items {
		if it.Currency != "" {
			return it.Currency
		}
	}
	return ""
}
