package workbook

import (
	"strings"

	"sepcost/costing/green"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/scale"
)

// Citations of the green metrics, as the costing/green package gives them.
const (
	srcEFactor = "Sheldon, R. A. \"Organic synthesis — past, present and future\", Chem. Ind. (London) 1992, 903-906; " +
		"\"The E Factor: fifteen years on\", Green Chem. 2007, 9, 1273-1283."
	srcPMI = "Jiménez-González, C.; Ponder, C. S.; Broxterman, Q. B.; Manley, J. B. \"Using the right green yardstick: " +
		"why process mass intensity is used in the pharmaceutical industry to drive more sustainable processes\", " +
		"Org. Process Res. Dev. 2011, 15, 912-917."
	srcSolventIntensity = "The GSK metric of Constable et al., Green Chem. 2002, 4, 521 (from memory)."
)

// greenMetric is one column of the green metrics table: its header, its
// value in green.Metrics, how it is shown, and its definition and source.
type greenMetric struct {
	head       string
	name       string
	get        func(*green.Metrics) float64
	style      func(*styles) int
	definition string
	source     string
}

// greenMetrics are the columns of the green metrics table, from column C.
// The definitions are those of green.Metrics and green.Compute.
var greenMetrics = []greenMetric{
	{"E-factor\n(kg/kg)", "E-factor", func(m *green.Metrics) float64 { return m.EFactor }, func(st *styles) int { return st.ratio },
		"kg of waste per kg of product, water counted:\n    E = m(waste) / m(product)\nwith m(waste) the mass of all waste streams and m(product) the product as isolated, with the impurity it still holds.",
		srcEFactor},
	{"E-factor,\nwater left out", "E-factor without water", func(m *green.Metrics) float64 { return m.EFactorNoWater }, func(st *styles) int { return st.ratio },
		"The E-factor with water left out of the waste.",
		srcEFactor},
	{"PMI\n(kg/kg)", "Process mass intensity (PMI)", func(m *green.Metrics) float64 { return m.PMI }, func(st *styles) int { return st.ratio },
		"kg of net input per kg of product as isolated, water counted, here for the purification step alone:\n" +
			"    PMI = (m(crude) + Σ m(material) − m(recycled)) / m(product)\n" +
			"Materials are the mass and volume demands of the materials group (volumes times the solvent's density); labour, energy, " +
			"disposal and one-time items are not inputs, and recovered solvent credited is subtracted. When every input is counted and " +
			"every output other than the product is waste, mass closes and PMI = E + 1.",
		srcPMI},
	{"PMI,\nwater left out", "PMI without water", func(m *green.Metrics) float64 { return m.PMINoWater }, func(st *styles) int { return st.ratio },
		"The PMI with water left out of the input.",
		srcPMI},
	{"Solvent intensity\n(kg/kg)", "Solvent intensity", func(m *green.Metrics) float64 { return m.SolventIntensity }, func(st *styles) int { return st.ratio },
		"kg of organic solvent (net of recycling, water excluded) per kg of product as isolated:\n    SI = (m(solvent) − m(solvent, recycled)) / m(product)",
		srcSolventIntensity},
	{"Halogenated\nshare", "Halogenated share", func(m *green.Metrics) float64 { return m.HalogenatedShare }, func(st *styles) int { return st.percent },
		"Halogenated fraction of the organic solvent mass used (0 when none is used).",
		"common practice, no source"},
	{"Waste\n(kg)", "Waste", func(m *green.Metrics) float64 { return m.WasteKg }, func(st *styles) int { return st.kgFine },
		"All waste streams, kg: the sum of the streams in the table above.",
		"the method models' waste streams"},
	{"Input\n(kg)", "Input", func(m *green.Metrics) float64 { return m.InputKg }, func(st *styles) int { return st.kgFine },
		"Crude + materials − recycled, water counted, kg: the numerator of the PMI.",
		srcPMI},
	{"Product\n(kg)", "Product", func(m *green.Metrics) float64 { return m.IsolatedKg }, func(st *styles) int { return st.kgFine },
		"Product as isolated, kg, counted with the impurity it still contains (in the crystals, the heart cut or the pooled fractions): the denominator of every ratio here.",
		"the method models"},
	{"Balance gap\n(kg)", "Mass balance gap", func(m *green.Metrics) float64 { return m.BalanceGapKg }, func(st *styles) int { return st.kgFine },
		"Input − product − waste, kg: zero when every input leaves as product or waste, and then PMI = E + 1. Inputs listed as not counted below are outside it.",
		srcPMI},
}

// writeGreenMetrics writes, after the codes, the green metrics of each
// method at the masses listed (green.Metrics: computed by the costing
// package, shown here; shown[k] holds the results at masses[k]), then what each metric means and its source, and
// the material inputs that have no mass and so are not counted. row is
// the next free row; it returns the next free row.
func writeGreenMetrics(g *grid, st *styles, r *scale.Report, masses []int, shown [][]scale.Result, row int) int {
	g.set(row, 1, cell{value: "Green metrics", style: st.heading, spill: true})
	row++
	some := false
	for k := range masses {
		for j := range r.Methods {
			some = some || (shown[k][j].Usage.Feasible && shown[k][j].Metrics != nil)
		}
	}
	if !some {
		g.set(row, 1, cell{value: "No green metrics were computed for this report.", style: st.note, spill: true})
		return row + 2
	}
	g.text(row, 1, "Batch mass", st.header)
	g.text(row, 2, "Method", st.header)
	for k, gm := range greenMetrics {
		g.set(row, 3+k, cell{value: gm.head, style: st.headerRight, wrap: true})
	}
	row++
	var notCounted []string
	skip := notDescribedMethods(r)
	for k, i := range masses {
		for j, meth := range r.Methods {
			if skip[j] {
				continue // one line under the table says so
			}
			res := shown[k][j]
			g.text(row, 1, units.FormatMass(r.MassesKg[i]), st.text)
			g.text(row, 2, capitalize(meth), st.text)
			switch {
			case !res.Usage.Feasible:
				g.set(row, 3, cell{value: notFeasible(res.Usage.Reason), style: st.text, spill: true})
			case res.Metrics == nil:
				g.set(row, 3, cell{value: "n/a: no green metrics for this result (no product recovered)", style: st.text, spill: true})
			default:
				for k, gm := range greenMetrics {
					g.num(row, 3+k, gm.get(res.Metrics), gm.style(st))
				}
				for _, n := range res.Metrics.NotCounted {
					if !contains(notCounted, n) {
						notCounted = append(notCounted, n)
					}
				}
			}
			row++
		}
	}
	if line := notDescribedLine(r, skip); line != "" {
		g.set(row, 1, cell{value: line, style: st.note, spill: true})
		row++
	}
	if len(notCounted) > 0 {
		wrapped(g, st, row, "Not counted among the inputs (material demands with no mass, such as items counted by number): "+
			strings.Join(notCounted, "; ")+". Where these end up in a waste stream, PMI falls short of E + 1 by their mass per kg of product.", wTextEnd)
		row++
	}
	row++
	g.set(row, 1, cell{value: "What the green metrics mean", style: st.heading, spill: true})
	row++
	mergedCell(g, row, 1, 2, cell{value: "Metric", style: st.header})
	mergedCell(g, row, 3, 5, cell{value: "Definition", style: st.header})
	mergedCell(g, row, 6, wTextEnd, cell{value: "Source", style: st.header})
	row++
	for _, gm := range greenMetrics {
		mergedCell(g, row, 1, 2, cell{value: gm.name, style: st.wrap, wrap: true})
		mergedCell(g, row, 3, 5, cell{value: gm.definition, style: st.wrap, wrap: true})
		mergedCell(g, row, 6, wTextEnd, cell{value: gm.source, style: st.wrap, wrap: true})
		row++
	}
	return row + 1
}

// writeSolvents writes the solvents the scenario uses with their CHEM21
// class and the substitutions published guidance suggests (scale.
// SolventGreenness), as suggestions: the workbook's costs stay those of the
// solvents the scenario names. row is the next free row.
func writeSolvents(g *grid, st *styles, r *scale.Report, row int) {
	g.set(row, 1, cell{value: "Solvents: CHEM21 class and suggested substitutions", style: st.heading, spill: true})
	row++
	if len(r.Greenness) == 0 {
		g.set(row, 1, cell{value: "No solvents were assessed for this report.", style: st.note, spill: true})
		return
	}
	mergedCell(g, row, 1, 2, cell{value: "Solvent", style: st.header})
	g.text(row, 3, "CHEM21 class", st.header)
	mergedCell(g, row, 4, 6, cell{value: "Suggested substitution", style: st.header})
	g.text(row, wTextEnd, "Source of the suggestion", st.header)
	row++
	var classSources []string
	for _, s := range r.Greenness {
		class := "not ranked by the guide"
		if s.Class != "" {
			class = string(s.Class)
			if e, ok := green.Lookup(s.Solvent); ok {
				if e.Mark != source.Confirmed {
					class += " (" + string(e.Mark) + ")"
				}
				if !contains(classSources, e.Source) {
					classSources = append(classSources, e.Source)
				}
			}
		}
		sugg := s.Suggestions
		if len(sugg) == 0 {
			sugg = []green.Suggestion{{Text: "none suggested for the way this scenario uses it"}}
		}
		for _, sg := range sugg {
			mergedCell(g, row, 1, 2, cell{value: s.Solvent, style: st.wrap, wrap: true})
			g.set(row, 3, cell{value: class, style: st.wrap, wrap: true})
			mergedCell(g, row, 4, 6, cell{value: sg.Text, style: st.wrap, wrap: true})
			src := sg.Source
			if sg.Mark != "" && !strings.Contains(src, string(sg.Mark)) {
				src += " (" + string(sg.Mark) + ")"
			}
			g.set(row, wTextEnd, cell{value: src, style: st.wrap, wrap: true})
			row++
		}
	}
	row++
	wrapped(g, st, row, "These are suggestions, not rewrites: the costs, waste and codes in this workbook are for the solvents "+
		"the scenario names. A substitute changes Rf values, solubility and the separation; try it at the bench (TLC, solubility) "+
		"and cost it as a scenario of its own before adopting it.", wTextEnd)
	row++
	for _, src := range classSources {
		wrapped(g, st, row, "CHEM21 class: the guide's ranking after discussion (recommended, problematic, hazardous, highly hazardous), from "+src+".", wTextEnd)
		row++
	}
}
