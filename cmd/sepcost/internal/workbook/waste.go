package workbook

import (
	"fmt"
	"strings"

	"github.com/shopspring/decimal"

	"sepcost/costing/ledger"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale"
)

// wasteCaution closes the Waste sheet (DESIGN §5.6, §7).
const wasteCaution = "Caution: the waste classes here serve costing only. Waste codes and the classification of each " +
	"stream are for the site EHS office to decide under local rules and the site's licensed disposal practice."

// buildWaste writes one row per batch mass, method and waste stream. The
// disposal cost is a formula
//
//	ROUND(kg × Prices!$C$n, places)
//
// on the price row of the class's disposal item, written only where a
// disposal line of the ledger bills this stream: its quantity (kg) is then
// the mass shown and its amount the cached value. Other streams show their
// mass only.
func buildWaste(g *grid, st *styles, r *scale.Report, m money, lay *layout) {
	head := []string{"Batch mass", "Method", "Stream", "Class", "kg", "L", "Composition", "Disposal cost"}
	for c, h := range head {
		g.text(1, c+1, h, st.header)
	}
	g.freeze(1, 2)
	row := 2
	for i, kg := range r.MassesKg {
		for j, meth := range r.Methods {
			res := r.Results[i][j]
			if !res.Usage.Feasible {
				g.text(row, 1, massLabel(kg), st.text)
				g.text(row, 2, capitalize(meth), st.text)
				g.set(row, 3, cell{value: "not feasible: " + res.Usage.Reason, style: st.text, spill: true})
				row++
				continue
			}
			claimed := map[int]bool{}
			for _, s := range res.Usage.Waste {
				g.text(row, 1, massLabel(kg), st.text)
				g.text(row, 2, capitalize(meth), st.text)
				g.text(row, 3, s.Name, st.text)
				g.text(row, 4, string(s.Class), st.text)
				if s.VolumeM3 != 0 {
					g.num(row, 6, units.MustTo(s.VolumeM3, "L"), st.litres)
				}
				g.set(row, 7, cell{value: composition(s), style: st.wrap, wrap: true})
				line, k := disposalLine(r, res.Ledger, s, claimed)
				if k < 0 {
					g.num(row, 5, s.Kg(), st.kg)
					row++
					continue
				}
				claimed[k] = true
				g.num(row, 5, line.Qty.InexactFloat64(), st.kg)
				f := fmt.Sprintf("ROUND(%s*%s,%d)", cellName(5, row), priceRef(line.PriceRow), m.places)
				g.formula(row, 8, f, line.Amount.InexactFloat64(), st.money)
				lay.add(sheetWaste, cellName(8, row), line.Amount, "disposal")
				row++
			}
		}
	}
	row++
	g.set(row, 1, cell{value: wasteCaution, style: st.wrap, wrap: true})
	for k := 2; k <= len(head); k++ {
		g.blank(row, k, st.wrap)
	}
	g.merge(row, 1, len(head))
}

// disposalLine finds the unclaimed disposal line of the ledger that bills
// stream s: priced by the class's disposal item per kilogram, with a
// quantity equal to the stream's mass rounded to the quantity's places. It
// returns -1 when there is none.
func disposalLine(r *scale.Report, l ledger.Ledger, s usage.Stream, claimed map[int]bool) (ledger.Line, int) {
	item := s.Class.DisposalItem()
	for k, line := range l.Lines {
		if claimed[k] || line.Demand.Group != usage.Disposal || line.Demand.Item != item {
			continue
		}
		it := r.Prices.Items[line.PriceRow]
		perKg := it.Unit == "kg" || (it.Per.Dim == units.Mass && it.Per.Factor == 1 && it.Per.Offset == 0)
		if !perKg || !finite(s.Kg()) {
			continue
		}
		places := -line.Qty.Exponent()
		if places < 0 {
			places = 0
		}
		if decimal.NewFromFloat(s.Kg()).Round(places).Equal(line.Qty) {
			return line, k
		}
	}
	return ledger.Line{}, -1
}

// composition lists a stream's components: "ethyl acetate 34.05 g; n-heptane 103.3 g".
func composition(s usage.Stream) string {
	parts := make([]string, len(s.Components))
	for k, c := range s.Components {
		parts[k] = c.Name + " " + massLabel(c.Kg)
	}
	return strings.Join(parts, "; ")
}
