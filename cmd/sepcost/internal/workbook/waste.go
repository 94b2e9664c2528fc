package workbook

import (
	"fmt"
	"math"
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
//
// With the detail sheets omitted (a sweep of many masses) the streams are
// listed at one mass only, the mass of the sweep nearest the target mass
// in ln m, and a note says so: the sheet is for the EHS office, which
// plans for the batch that will be run, not for every point of a curve.
func buildWaste(g *grid, st *styles, r *scale.Report, m money, details bool, lay *layout) {
	head := []string{"Batch mass", "Method", "Stream", "Class", "kg", "L", "Composition", "Disposal cost"}
	for c, h := range head {
		g.text(1, c+1, h, st.header)
	}
	g.freeze(1, 2)
	row := 2
	masses := make([]int, len(r.MassesKg))
	for i := range masses {
		masses[i] = i
	}
	note := ""
	if !details {
		k := nearestMass(r.MassesKg, r.TargetKg)
		masses = []int{k}
		note = fmt.Sprintf("This sweep has %d batch masses; the waste streams are listed at %s only", len(r.MassesKg), massLabel(r.MassesKg[k]))
		if r.TargetKg > 0 && finite(r.TargetKg) {
			note += fmt.Sprintf(", the mass of the sweep nearest the target mass of %s. For the streams at the target mass itself, "+
				"or at other masses, run `sepcost estimate SCENARIO --mass %s` (several masses separated by commas).", massLabel(r.TargetKg), massFlag(r.TargetKg))
		} else {
			note += ", the largest. For the streams at other masses run `sepcost estimate SCENARIO --mass MASS`."
		}
		note += " The Scale-up sheet gives the total waste at every mass."
	}
	for _, i := range masses {
		kg := r.MassesKg[i]
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
	if note != "" {
		g.set(row, 1, cell{value: note, style: st.wrap, wrap: true})
		for k := 2; k <= len(head); k++ {
			g.blank(row, k, st.wrap)
		}
		g.merge(row, 1, len(head))
		row += 2
	}
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

// nearestMass is the index of the mass nearest target in ln m, or of the
// largest mass when target is not a positive number.
func nearestMass(masses []float64, target float64) int {
	best := len(masses) - 1
	if !(target > 0) || !finite(target) {
		return best
	}
	d := math.Inf(1)
	for i, kg := range masses {
		if e := math.Abs(math.Log(kg / target)); e < d {
			best, d = i, e
		}
	}
	return best
}

// massFlag writes a mass as the --mass flag takes it, without a space:
// "20g", "2kg", "250mg".
func massFlag(kg float64) string {
	return strings.ReplaceAll(massLabel(kg), " ", "")
}
