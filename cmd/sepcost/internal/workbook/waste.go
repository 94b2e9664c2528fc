package workbook

import (
	"fmt"
	"math"
	"slices"
	"sort"
	"strconv"
	"strings"

	"github.com/shopspring/decimal"

	"sepcost/costing/ledger"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/costing/waste"
	"sepcost/scale"
)

// Waste sheet columns: the stream table, and the suggested codes with the
// numbers of the rules applied when the report carries classifications.
const (
	wMass = iota + 1
	wMethod
	wStream
	wClass
	wKg
	wLitres
	wComposition
	wDisposal
	wEU
	wUS
	wRules
)

// wTextEnd is the last column of the paragraphs and of the tables below
// the stream table: columns A to G fit a laptop screen (about 165
// character widths), so that a rule or a definition reads without
// scrolling sideways.
const wTextEnd = wComposition

// Waste sheet widths, in character widths of the default font: the widest
// the stream and composition columns grow, and the narrowest the code
// columns get, so that the sheet reads on screen and on a landscape page
// (common practice, no source). Longer names and compositions wrap.
const (
	wStreamWidth      = 34.0
	wCompositionWidth = 48.0
	wCodeWidth        = 12.0
	wRulesWidth       = 14.0
)

// wasteCostingOnly opens the caution under the stream table (DEVELOPERS.md, "Cautions").
const wasteCostingOnly = "Caution: the waste classes here serve costing only."

// wasteCautionPlain is the rest of the caution when the report suggests no codes.
const wasteCautionPlain = "Waste codes and the classification of each stream are for the site EHS office to decide " +
	"under local rules and the site's licensed disposal practice."

// buildWaste writes the Waste sheet: one row per batch mass, method and
// waste stream with its suggested codes; the caution; the rules applied
// and the codes used; then the green metrics per mass and method and the
// solvents with their guide class and suggested substitutions.
//
// The disposal cost is a formula
//
//	ROUND(kg × Prices!$C$n, places)
//
// on the price row of the class's disposal item, written only where a
// disposal line of the ledger bills this stream: its quantity (kg) is then
// the mass shown and its amount the cached value. Other streams show their
// mass only.
//
// The codes of a stream come from the report's classified rows
// (scale.WasteRow), matched by batch mass, method, stream name and class.
// A rule is often the same for many streams and may run to several
// hundred characters, more than a row can show (a row is at most 409
// points high); the rows therefore carry the numbers of their rules, and
// the rules are written once each, numbered, below the table.
//
// With the detail sheets omitted (a sweep of many masses) the streams and
// the green metrics are listed at one mass only, the mass of the sweep
// nearest the target mass in ln m, and a note says so: the sheet is for the
// EHS office, which plans for the batch that will be run, not for every
// point of a curve.
func buildWaste(g *grid, st *styles, r *scale.Report, m money, details bool, lay *layout) error {
	codes := len(r.Waste) > 0
	head := []string{"Batch mass", "Method", "Stream", "Class", "kg", "L", "Composition", "Disposal cost"}
	if codes {
		head = append(head, "EU List of Waste\n(suggested)", "US EPA\n(suggested)", "Rules applied\n(numbered below)")
	}
	for c, h := range head {
		style := st.header
		switch c + 1 {
		case wKg, wLitres, wDisposal:
			style = st.headerRight
		case wComposition, wEU:
			style = st.headerIndent
		}
		g.set(1, c+1, cell{value: h, style: style, wrap: true})
	}
	g.freeze(1, 2)
	g.maxWidths[wStream] = wStreamWidth
	g.maxWidths[wComposition] = wCompositionWidth
	if codes {
		g.minWidths[wEU] = wCodeWidth
		g.minWidths[wUS] = wCodeWidth
		g.minWidths[wRules] = wRulesWidth
	}
	row := 2
	masses := make([]int, len(r.MassesKg))
	for i := range masses {
		masses[i] = i
	}
	note := ""
	if !details {
		k := nearestMass(r.MassesKg, r.TargetKg)
		masses = []int{k}
		note = fmt.Sprintf("This sweep has %d batch masses; the waste streams and green metrics are listed at %s only", len(r.MassesKg), units.FormatMass(r.MassesKg[k]))
		if r.TargetKg > 0 && finite(r.TargetKg) {
			note += fmt.Sprintf(", the mass of the sweep nearest the target mass of %s. For the streams at the target mass itself, "+
				"or at other masses, run `sepcost estimate SCENARIO --mass %s` (several masses separated by commas).", units.FormatMass(r.TargetKg), massFlag(r.TargetKg))
		} else {
			note += ", the largest. For the streams at other masses run `sepcost estimate SCENARIO --mass MASS`."
		}
		note += " The Scale-up sheet gives the total waste, E-factor and PMI at every mass."
	}
	shown := make([][]scale.Result, len(masses)) // the full results at the masses listed
	walk := r.Walk()
	for k, i := range masses {
		var err error
		if shown[k], err = walk.At(i); err != nil {
			return err
		}
	}
	cls := newClassified(r.Waste)
	var rules numbered
	var cautions []string
	var used []waste.Code
	seenCode := map[string]bool{}
	skip := notDescribedMethods(r)
	for k, i := range masses {
		kg := r.MassesKg[i]
		for j, meth := range r.Methods {
			res := shown[k][j]
			if skip[j] {
				continue // one line under the table says so
			}
			if !res.Usage.Feasible {
				g.text(row, wMass, units.FormatMass(kg), st.text)
				g.text(row, wMethod, capitalize(meth), st.text)
				g.set(row, wStream, cell{value: notFeasible(res.Usage.Reason), style: st.text, spill: true})
				row++
				continue
			}
			claimed := map[int]bool{}
			for _, s := range res.Usage.Waste {
				g.text(row, wMass, units.FormatMass(kg), st.text)
				g.text(row, wMethod, capitalize(meth), st.text)
				g.set(row, wStream, cell{value: s.Name, style: st.wrap, wrap: true})
				g.text(row, wClass, string(s.Class), st.text)
				if s.VolumeM3 != 0 {
					g.num(row, wLitres, units.MustTo(s.VolumeM3, "L"), st.litres)
				}
				g.set(row, wComposition, cell{value: composition(s), style: st.wrapIndent, wrap: true})
				if codes {
					if c, ok := cls.take(kg, meth, s); ok {
						g.set(row, wEU, cell{value: orNone(c.SchemeCodes(waste.SchemeEU)), style: st.wrapIndent, wrap: true})
						g.set(row, wUS, cell{value: orNone(c.SchemeCodes(waste.SchemeUS)), style: st.wrap, wrap: true})
						var ns []int
						for _, text := range c.Rules {
							ns = append(ns, rules.number(text))
						}
						for _, p := range c.Problems {
							ns = append(ns, rules.number("Input problem: "+p))
						}
						g.set(row, wRules, cell{value: numberList(ns), style: st.wrap, wrap: true})
						if c.Caution != "" && !contains(cautions, c.Caution) {
							cautions = append(cautions, c.Caution)
						}
						for _, k := range c.Codes {
							if id := k.Scheme + " " + k.Code; !seenCode[id] {
								seenCode[id] = true
								used = append(used, k)
							}
						}
					} else {
						g.set(row, wEU, cell{value: "not classified", style: st.wrapIndent, spill: true})
					}
				}
				line, k := disposalLine(r, res.Ledger, s, claimed)
				if k < 0 {
					g.num(row, wKg, s.Kg(), st.kg)
					row++
					continue
				}
				claimed[k] = true
				g.num(row, wKg, line.Qty.InexactFloat64(), st.kg)
				f := fmt.Sprintf("ROUND(%s*%s,%d)", cellName(wKg, row), priceRef(line.PriceRow), m.places)
				g.formula(row, wDisposal, f, line.Amount.InexactFloat64(), st.money)
				lay.add(sheetWaste, cellName(wDisposal, row), line.Amount, "disposal")
				row++
			}
		}
	}
	if line := notDescribedLine(r, skip); line != "" {
		g.set(row, 1, cell{value: line, style: st.note, spill: true})
		row++
	}
	row++
	caution := wasteCostingOnly + " " + wasteCautionPlain
	if len(cautions) > 0 {
		caution = wasteCostingOnly + " " + strings.Join(cautions, " ")
	}
	wrapped(g, st, row, caution, wTextEnd)
	row += 2
	if note != "" {
		wrapped(g, st, row, note, wTextEnd)
		row += 2
	}
	if codes {
		row = writeRules(g, st, r, rules, row)
		row = writeCodes(g, st, used, row)
	}
	row = writeGreenMetrics(g, st, r, masses, shown, row)
	writeSolvents(g, st, r, row)
	return nil
}

// writeRules writes the rules applied, numbered as the stream rows give
// them, one paragraph each; row is the next free row and it returns the
// next free row.
func writeRules(g *grid, st *styles, r *scale.Report, rules numbered, row int) int {
	g.set(row, 1, cell{value: "Rules applied in suggesting the codes", style: st.heading, spill: true})
	row++
	if r.WasteSector != "" {
		wrapped(g, st, row, "EU codes from the List of Waste chapter for "+r.WasteSector+
			"; US codes from 40 CFR 261 (spent-solvent listings F001–F005, ignitability D001, toxicity characteristic D0xx).", wTextEnd)
		row++
	}
	g.text(row, 1, "Rule", st.header)
	mergedCell(g, row, 2, wTextEnd, cell{value: "What was applied, and why", style: st.header})
	row++
	for n, text := range rules.texts {
		g.num(row, 1, float64(n+1), st.ruleNumber)
		mergedCell(g, row, 2, wTextEnd, cell{value: text, style: st.wrap, wrap: true})
		row++
	}
	return row + 1
}

// writeCodes lists each code suggested on the sheet with its title in the
// regulation and where the text comes from.
func writeCodes(g *grid, st *styles, used []waste.Code, row int) int {
	if len(used) == 0 {
		return row
	}
	g.set(row, 1, cell{value: "Codes suggested above", style: st.heading, spill: true})
	row++
	g.text(row, 1, "Code", st.header)
	g.text(row, 2, "Scheme", st.header)
	mergedCell(g, row, 3, 4, cell{value: "Title in the regulation", style: st.header})
	mergedCell(g, row, 5, wTextEnd, cell{value: "Source", style: st.header})
	row++
	for _, c := range used {
		g.text(row, 1, c.Code, st.text)
		g.text(row, 2, c.Scheme, st.text)
		mergedCell(g, row, 3, 4, cell{value: c.Title, style: st.wrap, wrap: true})
		mergedCell(g, row, 5, wTextEnd, cell{value: c.Source + " (" + string(c.Mark) + ")", style: st.wrap, wrap: true})
		row++
	}
	return row + 1
}

// mergedCell writes c across columns first to last of a row (merged when
// they are more than one), the others blank in the same style.
func mergedCell(g *grid, row, first, last int, c cell) {
	g.set(row, first, c)
	for k := first + 1; k <= last; k++ {
		g.blank(row, k, c.style)
	}
	if last > first {
		g.merge(row, first, last)
	}
}

// classified finds the classification of a stream among the report's
// classified rows, by crude mass, method, stream name and class; each row
// is used once, so that two streams of the same name keep their own.
type classified struct {
	rows  []scale.WasteRow
	taken []bool
}

func newClassified(rows []scale.WasteRow) *classified {
	return &classified{rows: rows, taken: make([]bool, len(rows))}
}

func (c *classified) take(kg float64, method string, s usage.Stream) (waste.Classification, bool) {
	for k := range c.rows {
		w := &c.rows[k]
		if c.taken[k] || w.CrudeKg != kg || w.Method != method || w.Stream.Name != s.Name || w.Stream.Class != s.Class {
			continue
		}
		c.taken[k] = true
		return w.Classification, true
	}
	return waste.Classification{}, false
}

// numbered gives each distinct text a number, 1, 2, ... in first-seen order.
type numbered struct {
	texts []string
	index map[string]int
}

func (n *numbered) number(text string) int {
	if n.index == nil {
		n.index = map[string]int{}
	}
	if k, ok := n.index[text]; ok {
		return k
	}
	n.texts = append(n.texts, text)
	n.index[text] = len(n.texts)
	return len(n.texts)
}

// numberList writes rule numbers in ascending order, runs of three or more
// as a range: "1, 2, 5–7".
func numberList(ns []int) string {
	if len(ns) == 0 {
		return ""
	}
	s := append([]int(nil), ns...)
	sort.Ints(s)
	s = slices.Compact(s)
	var parts []string
	for k := 0; k < len(s); {
		first := s[k]
		end := k
		for end+1 < len(s) && s[end+1] == s[end]+1 {
			end++
		}
		lastN := s[end]
		switch {
		case lastN-first >= 2:
			parts = append(parts, strconv.Itoa(first)+"–"+strconv.Itoa(lastN))
		case lastN > first:
			parts = append(parts, strconv.Itoa(first), strconv.Itoa(lastN))
		default:
			parts = append(parts, strconv.Itoa(first))
		}
		k = end + 1
	}
	return strings.Join(parts, ", ")
}

func orNone(s string) string {
	if s == "" {
		return "none"
	}
	return s
}

func contains(list []string, s string) bool {
	for _, x := range list {
		if x == s {
			return true
		}
	}
	return false
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
		parts[k] = c.Name + " " + units.FormatMass(c.Kg)
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
	return strings.ReplaceAll(units.FormatMass(kg), " ", "")
}
