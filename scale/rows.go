package scale

import (
	"math"

	"github.com/shopspring/decimal"

	"sepcost/costing/usage"
)

// Row is one method at one mass with the figures a scale-up table shows.
type Row struct {
	CrudeKg       float64
	Method        string
	Mass, Col     int // indexes into Report.MassesKg and Report.Methods (Results[Mass][Col])
	Feasible      bool
	Reason        string
	Total         decimal.Decimal // ledger total
	PerGram       float64         // cost per gram of purified product; NaN when infeasible
	ProductKg     float64         // purified product recovered
	SolventL      float64         // solvent used, litres (NaN when the model gives none)
	WasteKg       float64
	HoursElapsed  float64
	HoursAttended float64
	EFactor       float64 // kg waste per kg product (Sheldon)
	PMI           float64 // kg of all inputs per kg product, water counted
	Equipment     string
}

// Rows flattens the results, mass by mass, method by method.
func (r *Report) Rows() []Row {
	var out []Row
	for i, m := range r.MassesKg {
		for j, name := range r.Methods {
			res := r.Results[i][j]
			u := res.Usage
			el, at := u.Hours()
			row := Row{CrudeKg: m, Method: name, Mass: i, Col: j, Feasible: u.Feasible, Reason: u.Reason,
				Total: res.Ledger.Total, PerGram: res.PerGram(), ProductKg: u.ProductOutKg,
				WasteKg: u.WasteKg(), HoursElapsed: el, HoursAttended: at, Equipment: u.Equipment,
				SolventL: math.NaN(), EFactor: math.NaN(), PMI: math.NaN()}
			if f, ok := u.Figure(usage.FigSolventTotal); ok {
				row.SolventL = f.SI * 1000
			}
			metrics(&row, res)
			out = append(out, row)
		}
	}
	return out
}
