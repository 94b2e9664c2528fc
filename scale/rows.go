package scale

import (
	"math"

	"github.com/shopspring/decimal"

	"sepcost/costing/usage"
)

// Row is one method at one mass with the figures a scale-up table shows.
// It is also the compact form in which a long sweep keeps every mass
// (Report.Results): numbers, not the rendered result.
type Row struct {
	CrudeKg       float64
	Method        string
	Mass, Col     int // indexes into Report.MassesKg and Report.Methods (Results[Mass][Col])
	Feasible      bool
	Reason        string
	Total         decimal.Decimal // ledger total
	Places        int32           // the ledger's places of money (the currency's minor unit; 0 for a result not priced)
	PerGram       float64         // cost per gram of purified product; NaN when infeasible
	ProductKg     float64         // purified product recovered
	SolventL      float64         // solvent used, litres (NaN when the model gives none)
	WasteKg       float64
	HoursElapsed  float64
	HoursAttended float64
	EFactor       float64 // kg waste per kg product (Sheldon)
	PMI           float64 // kg of all inputs per kg product, water counted
	Equipment     string
	EquipmentID   string // usage.Usage.EquipmentID: the equipment without its continuous parts
}

// Rows flattens the results, mass by mass, method by method. The slice
// of a long sweep is the report's own: read it, do not change it.
func (r *Report) Rows() []Row {
	if r.Results == nil {
		return r.rows
	}
	var out []Row
	for i, m := range r.MassesKg {
		for j, name := range r.Methods {
			out = append(out, rowOf(m, name, i, j, &r.Results[i][j]))
		}
	}
	return out
}

// RowAt is method j at mass i as a Row.
func (r *Report) RowAt(i, j int) Row {
	if r.Results == nil {
		return r.rows[i*len(r.Methods)+j]
	}
	return rowOf(r.MassesKg[i], r.Methods[j], i, j, &r.Results[i][j])
}

// rowOf is the Row of result res, method name (column j) at mass m (index i).
func rowOf(m float64, name string, i, j int, res *Result) Row {
	u := &res.Usage
	el, at := u.Hours()
	row := Row{CrudeKg: m, Method: name, Mass: i, Col: j, Feasible: u.Feasible, Reason: u.Reason,
		Total: res.Ledger.Total, Places: res.Ledger.Places, PerGram: res.PerGram(), ProductKg: u.ProductOutKg,
		WasteKg: u.WasteKg(), HoursElapsed: el, HoursAttended: at, Equipment: u.Equipment, EquipmentID: u.EquipmentID,
		SolventL: math.NaN(), EFactor: math.NaN(), PMI: math.NaN()}
	if f, ok := u.Figure(usage.FigSolventTotal); ok {
		row.SolventL = f.SI * 1000
	}
	metrics(&row, *res)
	return row
}

// PerGramAt is method j's cost per gram of purified product at mass i
// (costing.Result.PerGram; NaN when not feasible).
func (r *Report) PerGramAt(i, j int) float64 {
	if r.Results == nil {
		return r.rows[i*len(r.Methods)+j].PerGram
	}
	return r.Results[i][j].PerGram()
}
