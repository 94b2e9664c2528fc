package workbook

import (
	"sepcost/costing/equipment"
	"sepcost/costing/units"
	"sepcost/scale"
)

// sheetEquipment lists the site equipment table the models chose from;
// the Budget sheet's capital and occupancy rates refer to its cells.
const sheetEquipment = "Equipment"

// Equipment sheet columns; item k of the table sits in row k + 2.
const (
	eqRate  = 5 // hourly rate
	eqPrice = 7 // purchase price
)

// sizeUnit is the unit each kind's size is shown in.
var sizeUnit = map[equipment.Kind]string{
	equipment.Column: "mm", equipment.Cartridge: "g", equipment.Evaporator: "L", equipment.Flask: "L",
	equipment.Reactor: "L", equipment.Still: "L", equipment.Filter: "m^2", equipment.Dryer: "L",
}

// eqRef is the absolute reference of column col of equipment item k.
func eqRef(col, k int) string { return sheetRef(sheetEquipment, absName(col, k+2)) }

// buildEquipment writes the equipment table, one row per item in file
// order.
func buildEquipment(g *grid, st *styles, r *scale.Report) {
	for c, h := range []string{"Item", "Kind", "Size", "Throughput, L/h", "Hourly rate", "Ownership", "Price", "Currency", "Service life", "Source"} {
		style := st.header
		switch c + 1 {
		case 4, eqRate, eqPrice: // numbers: their headers right-aligned over them
			style = st.headerRight
		case 6, 8: // words after a number, set off from it
			style = st.headerIndent
		}
		g.text(1, c+1, h, style)
	}
	g.freeze(1, 1)
	g.minWidths[6] = 14 // "Ownership" on one line (the indented header wraps)
	for k, it := range r.Equipment.Items {
		row := k + 2
		g.text(row, 1, it.Name, st.text)
		g.text(row, 2, string(it.Kind), st.text)
		if u := sizeUnit[it.Kind]; it.Size > 0 && u != "" {
			g.text(row, 3, units.SigFigs(units.MustTo(it.Size, u), 4)+" "+u, st.text)
		}
		if it.Throughput > 0 {
			g.num(row, 4, it.Throughput*1000*3600, st.figure)
		}
		g.num(row, eqRate, it.Rate.InexactFloat64(), st.priceStyle(it.Rate))
		own := equipment.BuyWord
		if it.Owned {
			own = equipment.OwnedWord
		}
		g.text(row, 6, own, st.textIndent)
		if !it.Owned {
			g.num(row, eqPrice, it.Price.InexactFloat64(), st.priceStyle(it.Price))
		}
		g.text(row, 8, it.Currency, st.textIndent)
		switch {
		case it.Life > 0 && it.LifeDim == units.Time:
			g.text(row, 9, units.SigFigs(it.Life/3600, 6)+" h", st.text)
		case it.Life > 0:
			g.text(row, 9, units.SigFigs(it.Life, 6)+" uses", st.text)
		}
		g.set(row, 10, cell{value: it.Source, style: st.wrap, wrap: true})
	}
	g.set(len(r.Equipment.Items)+3, 1, cell{value: "Equipment read from " + r.Equipment.File + ". The Budget sheet's capital and occupancy rates follow edits here.", style: st.note, spill: true})
}
