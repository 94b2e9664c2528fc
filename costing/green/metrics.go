package green

import (
	"errors"
	"fmt"
	"math"

	"sepcost/costing/solvent"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Metrics are the mass metrics of one purification at one batch mass.
type Metrics struct {
	EFactor          float64 // kg waste per kg product, water counted
	EFactorNoWater   float64 // the same with water left out of the waste
	PMI              float64 // kg of net input per kg product, water counted
	PMINoWater       float64 // the same with water left out of the input
	SolventIntensity float64 // kg organic solvent (net of recycling, water excluded) per kg product
	HalogenatedShare float64 // halogenated fraction of the organic solvent mass used (0 when none is used)
	WasteKg          float64 // all waste streams
	InputKg          float64 // crude + materials − recycled, water counted

	ProductKg    float64  // purified product recovered
	IsolatedKg   float64  // isolated mass: the product with the impurity it contains (the denominator of E, PMI and SI)
	ImpurityKg   float64  // impurity isolated with the product (IsolatedKg − ProductKg)
	RecycledKg   float64  // credited recovered material (solvent) subtracted from the inputs
	WaterInKg    float64  // water among the net inputs
	WaterWasteKg float64  // water among the waste streams
	SolventKg    float64  // organic solvent used, gross (before recycling)
	NotCounted   []string // inputs left out: material demands not in mass or volume (items by count) and one-time material
	BalanceGapKg float64  // InputKg − IsolatedKg − WasteKg: zero when mass closes
}

// ErrMetrics is the sentinel every Compute error unwraps to.
var ErrMetrics = errors.New("green metrics")

// MetricsError says which demand or figure of which method could not be used.
type MetricsError struct {
	Method string // usage.Usage.Method
	Field  string // e.g. "product recovered", "demand \"xylene\" (materials)"
	Reason string // what is wrong and what would be valid
}

func (e *MetricsError) Error() string {
	return fmt.Sprintf("%s: method %q, %s: %s", ErrMetrics, e.Method, e.Field, e.Reason)
}

// Unwrap makes errors.Is(err, ErrMetrics) true.
func (e *MetricsError) Unwrap() error { return ErrMetrics }

// Compute gives the purification's mass metrics.
//
// E-factor (Sheldon, Chem. Ind. 1992; Green Chem. 2007, 9, 1273):
//
//	E = m_waste / m_isolated
//
// Process mass intensity (Jiménez-González et al., Org. Process Res. Dev.
// 2011, 15, 912), here for the purification step alone:
//
//	PMI = (m_crude + Σ m_material − m_recycled) / m_isolated
//
// Solvent intensity (organic solvent, water excluded; the GSK metric of
// Constable et al., Green Chem. 2002, 4, 521, from memory):
//
//	SI = (m_solvent − m_solvent,recycled) / m_isolated
//
// with m_isolated = u.IsolatedKg() (kg): the product as isolated, counted
// with the impurity it contains (u.ImpurityOutKg), so that the impurity
// left in the crystals or the heart cut is neither lost from the balance
// nor called waste. m_waste = the mass of u.Waste (kg),
// m_crude = u.CrudeKg (kg). Σ m_material sums the demands of the
// "materials" group: mass demands as they are, volume demands times the
// solvent density from the book (the item must be a solvent in the book).
// Labour, energy, disposal, product-lost and one-time demands are not
// material inputs and are left out; count demands count by their mass
// (usage.Demand.Kg, e.g. TLC plates) and, without one, are listed in
// NotCounted, as is one-time material (crude used once in screening: not
// part of a batch). Recovered solvent credited in the
// "credit" group is the recycled mass: the convention here is that it is
// subtracted from the inputs (it leaves as reusable material, neither
// product nor waste), whatever the regulations say about recycled solvent.
//
// The "no water" variants leave water (solvent ID "water") out of the waste
// and out of the inputs respectively.
//
// Identity: when every input, water included, is counted and every
// non-product output is waste (no loss to air, no recycle other than the
// credited one), mass closes,
//
//	m_crude + Σ m_material − m_recycled = m_isolated + m_waste,
//
// and then PMI = E + 1 (and, water in equal to water out, PMI_no water =
// E_no water + 1). BalanceGapKg shows how far a usage is from closing
// (solvent evaporated to air, count items without mass).
//
// Errors: a product mass that is not positive and finite, a quantity that is
// not finite, a negative material demand or positive credit, a volume demand
// whose item is not a solvent in the book, a nil book with a volume demand.
// Each names the method and the demand.
func Compute(u usage.Usage, book *solvent.Book) (Metrics, error) {
	var m Metrics
	fail := func(field, format string, a ...any) (Metrics, error) {
		return Metrics{}, &MetricsError{Method: u.Method, Field: field, Reason: fmt.Sprintf(format, a...)}
	}
	if !(u.ProductOutKg > 0) || math.IsInf(u.ProductOutKg, 0) {
		return fail("product recovered", "%g kg; E-factor and PMI need a positive, finite product mass (is the method infeasible?)", u.ProductOutKg)
	}
	if !(u.CrudeKg >= 0) || math.IsInf(u.CrudeKg, 0) {
		return fail("crude mass", "%g kg; want a finite mass of 0 kg or more", u.CrudeKg)
	}
	if !(u.ImpurityOutKg >= 0) || math.IsInf(u.ImpurityOutKg, 0) {
		return fail("impurity isolated with the product", "%g kg; want a finite mass of 0 kg or more", u.ImpurityOutKg)
	}
	m.ProductKg = u.ProductOutKg
	m.ImpurityKg = u.ImpurityOutKg
	m.IsolatedKg = u.IsolatedKg()
	in := u.CrudeKg
	var halKg, orgKg, solventRec float64

	// mass of a demand, and the solvent it is when it is one.
	massOf := func(d usage.Demand) (kg float64, s solvent.Solvent, isSolvent bool, counted bool, err error) {
		field := fmt.Sprintf("demand %q (%s)", d.Item, d.Group)
		if math.IsNaN(d.Qty) || math.IsInf(d.Qty, 0) {
			_, err = fail(field, "quantity %g; want a finite number", d.Qty)
			return
		}
		s, isSolvent = book.View(d.Item)
		switch d.Dim {
		case units.Mass:
			return d.Qty, s, isSolvent, true, nil
		case units.Volume:
			if !isSolvent {
				_, err = fail(field, "a volume (%g m³) of an item that is not a solvent in the solvent book, so its mass is unknown; give it as a mass, or add the solvent (with its density) to the scenario", d.Qty)
				return
			}
			return d.Qty * s.Density.V, s, true, true, nil
		case units.Count:
			if d.Kg > 0 && !math.IsInf(d.Kg, 0) {
				return d.Kg, s, isSolvent, true, nil // bought by count, mass known
			}
		}
		return 0, s, isSolvent, false, nil
	}

	for _, d := range u.Demands {
		switch d.Group {
		case usage.Materials:
			kg, s, isSolvent, counted, err := massOf(d)
			if err != nil {
				return Metrics{}, err
			}
			if !counted {
				m.NotCounted = append(m.NotCounted, fmt.Sprintf("%s (%s, %s)", d.Item, d.Label, d.Dim.Name()))
				continue
			}
			if kg < 0 {
				return fail(fmt.Sprintf("demand %q (materials)", d.Item), "%g kg; a material demand cannot be negative (credits belong in the credit group)", kg)
			}
			in += kg
			if isSolvent {
				if isWater(s) {
					m.WaterInKg += kg
				} else {
					orgKg += kg
					if s.Halogenated {
						halKg += kg
					}
				}
			}
		case usage.OneTime:
			if d.Dim == units.Mass && d.Qty > 0 {
				m.NotCounted = append(m.NotCounted, fmt.Sprintf("%s (%s, once per campaign, not per batch)", d.Item, d.Label))
			}
		case usage.Credit:
			kg, s, isSolvent, counted, err := massOf(d)
			if err != nil {
				return Metrics{}, err
			}
			if !counted {
				continue // a money credit without mass
			}
			if kg > 0 {
				return fail(fmt.Sprintf("demand %q (credit)", d.Item), "+%g kg; a credit is written as a negative quantity", kg)
			}
			rec := -kg
			m.RecycledKg += rec
			if isSolvent {
				if isWater(s) {
					m.WaterInKg -= rec
				} else {
					solventRec += rec
				}
			}
		}
	}
	m.InputKg = in - m.RecycledKg
	m.SolventKg = orgKg

	for _, st := range u.Waste {
		for _, c := range st.Components {
			if math.IsNaN(c.Kg) || math.IsInf(c.Kg, 0) || c.Kg < 0 {
				return fail(fmt.Sprintf("waste stream %q, component %q", st.Name, c.Name), "%g kg; want a finite mass of 0 kg or more", c.Kg)
			}
			m.WasteKg += c.Kg
			if s, ok := book.View(c.Name); ok && isWater(s) {
				m.WaterWasteKg += c.Kg
			}
		}
	}

	p := m.IsolatedKg
	m.EFactor = m.WasteKg / p
	m.EFactorNoWater = (m.WasteKg - m.WaterWasteKg) / p
	m.PMI = m.InputKg / p
	m.PMINoWater = (m.InputKg - m.WaterInKg) / p
	m.SolventIntensity = (orgKg - solventRec) / p
	if orgKg > 0 {
		m.HalogenatedShare = halKg / orgKg
	}
	m.BalanceGapKg = m.InputKg - m.IsolatedKg - m.WasteKg
	return m, nil
}

func isWater(s solvent.Solvent) bool { return s.ID == "water" || s.CAS == "7732-18-5" }
