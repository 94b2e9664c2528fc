package costing

import "sepcost/costing/prices"

// PriceNames resolves price-table item names against the scenario's
// solvents (built in and added), so that one solvent has one name across
// scenario and prices: a line written "heptane" prices the n-heptane the
// models demand, and a solvent priced per kg carries its density (kg/m³
// at 20 °C, from the solvent table) for the ledger to price a volume.
func (p *Plan) PriceNames() prices.Names {
	book := p.Scenario.Solvents
	return func(name string) (string, float64, bool) {
		s, ok := book.View(name)
		if !ok {
			return "", 0, false
		}
		return s.ID, s.Density.V, true
	}
}

// Prices is the table resolved with PriceNames (prices.Table.Resolve).
func (p *Plan) Prices(t *prices.Table) (*prices.Table, error) {
	return t.Resolve(p.PriceNames())
}
