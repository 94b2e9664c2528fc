package workbook

import (
	"fmt"
	"io"
	"sort"
	"strings"

	"sepcost/costing/prices"
	"sepcost/costing/units"
	"sepcost/costing/waste"
	"sepcost/scale"
)

// WriteWaste writes the waste forecast alone: one row per stream, in a
// shape an EHS office can paste into its forecast.
func WriteWaste(w io.Writer, r *scale.Report) error {
	t := Table{Name: "Waste forecast", Title: "Waste forecast: " + r.Title + " (codes from " + r.WasteSector + ")",
		Header: []string{"Crude batch", "Method", "Recommended", "Stream", "Class", "kg", "L", "Composition by mass", "EU List of Waste", "US EPA", "Rules applied (below)", "Disposal cost"}}
	// The same rules apply to many streams: each is written once, numbered,
	// below the table, and a stream's row lists the numbers.
	ruleNo := map[string]int{}
	var rules []string
	for _, row := range r.Waste {
		rec := ""
		if d := r.Decision; d != nil && d.TargetKg == row.CrudeKg && d.Winner == row.Method {
			rec = "yes"
		}
		cost := Text("")
		if row.HasDisposal {
			cost = Money(row.Disposal)
		}
		t.Rows = append(t.Rows, []Cell{Text(units.FormatMass(row.CrudeKg)), Text(row.Method), Text(rec), Text(row.Stream.Name), Text(string(row.Stream.Class)),
			Num(row.Kg), Num(row.Litres), Text(row.Stream.Composition()), Text(row.Classification.SchemeCodes("EU LoW")), Text(row.Classification.SchemeCodes("US EPA")),
			Text(ruleRefs(row.Classification.Rules, ruleNo, &rules)), cost})
	}
	t.Notes = []string{waste.Caution}
	for k, rule := range rules {
		t.Notes = append(t.Notes, fmt.Sprintf("Rule %d: %s", k+1, rule))
	}
	t.Chart = &TableChart{Title: "Waste by stream, kg", LabelCol: 4, Col: 6, N: len(t.Rows), ValueAxisTitle: "kg"}
	places := prices.MinorUnits(r.Prices.Currency)
	return WriteTables(w, r.Prices.Currency, places, []Table{t})
}

// WritePortfolio writes a year's plan: the plan lines, cost by method,
// waste by class and by suggested code, solvent purchases, and cautions.
// Totals are SUM formulas whose cached values are the portfolio's exact sums.
func WritePortfolio(w io.Writer, pf *scale.Portfolio) error {
	var tabs []Table
	plan := Table{Name: "Plan", Title: "Plan " + pf.File + " (" + pf.Currency + ")",
		Header: []string{"Line", "Scenario", "Crude batch", "Runs", "Method", "Forced", "Cost per batch", "One-time", "Cost", "Waste kg", "Hours elapsed", "Hours hands-on", "Quarter"}}
	for _, l := range pf.Lines {
		el, at := l.Result.Usage.Hours()
		runs := float64(l.Runs)
		forced := ""
		if l.Forced {
			forced = "yes"
		}
		plan.Rows = append(plan.Rows, []Cell{Num(float64(l.Line)), Text(l.Title), Text(units.FormatMass(l.MassKg)), Num(runs), Text(l.Method), Text(forced),
			Money(l.PerBatch), Money(l.OneTime), Money(l.Total), Num(l.Result.Usage.WasteKg() * runs), Num(el * runs), Num(at * runs), Text(l.Quarter)})
	}
	n := len(pf.Lines)
	total, once := Money(pf.Total), Money(pf.OneTime)
	total.Formula, total.Bold = fmt.Sprintf("SUM(I3:I%d)", n+2), true
	once.Formula, once.Bold = fmt.Sprintf("SUM(H3:H%d)", n+2), true
	plan.Rows = append(plan.Rows, []Cell{{}, {Text: "Total", Bold: true}, {}, {}, {}, {}, {}, once, total, {}, Num(pf.HoursElapsed), Num(pf.HoursAttended), {}})
	plan.Notes = []string{"Each row is a campaign of its runs: cost per batch (without one-time costs) × runs, plus the one-time costs (development) on the row that bears them: once per scenario and method in the plan unless the development column says row or done."}
	tabs = append(tabs, plan)
	if len(pf.Quarters) > 1 || (len(pf.Quarters) == 1 && pf.Quarters[0].Quarter != "") {
		q := Table{Name: "By quarter", Title: "Cost by calendar quarter of the plan's dates", Header: []string{"Quarter", "Cost"}}
		for _, qt := range pf.Quarters {
			name := qt.Quarter
			if name == "" {
				name = "(no date)"
			}
			q.Rows = append(q.Rows, []Cell{Text(name), Money(qt.Total)})
		}
		tabs = append(tabs, q)
	}

	byMethod := Table{Name: "By method", Title: "Cost by method as chosen", Header: []string{"Method", "Cost"}}
	var ms []string
	for m := range pf.ByMethod {
		ms = append(ms, m)
	}
	sort.Strings(ms)
	for _, m := range ms {
		byMethod.Rows = append(byMethod.Rows, []Cell{Text(m), Money(pf.ByMethod[m])})
	}
	byMethod.Chart = &TableChart{Title: "Cost over the plan by method, " + pf.Currency, LabelCol: 1, Col: 2, N: len(byMethod.Rows), ValueAxisTitle: pf.Currency}
	tabs = append(tabs, byMethod)

	wasteT := Table{Name: "Waste", Title: "Waste over the plan", Header: []string{"Class", "kg", "Disposal cost"}}
	for _, c := range pf.Classes {
		wasteT.Rows = append(wasteT.Rows, []Cell{Text(string(c.Class)), Num(c.Kg), Money(c.Disposal)})
	}
	wasteT.Rows = append(wasteT.Rows, []Cell{}, []Cell{{Text: "Suggested code", Bold: true}, {Text: "kg", Bold: true}, {Text: "Title", Bold: true}})
	for _, c := range pf.Codes {
		wasteT.Rows = append(wasteT.Rows, []Cell{Text(c.Scheme + " " + c.Code), Num(c.Kg), Text(c.Title)})
	}
	wasteT.Notes = []string{"A stream counts under each of its suggested codes.", waste.Caution}
	tabs = append(tabs, wasteT)

	solv := Table{Name: "Solvents", Title: "Solvent purchases over the plan", Header: []string{"Solvent", "Litres bought", "Cost", "Litres recovered", "Credit"}}
	for _, s := range pf.Solvents {
		solv.Rows = append(solv.Rows, []Cell{Text(s.Solvent), Num(s.Litres), Money(s.Cost), Num(s.RecoveredL), Money(s.RecoveredCr)})
	}
	tabs = append(tabs, solv)

	caut := Table{Name: "Cautions", Title: "Cautions", Header: []string{"Caution"}}
	for _, c := range pf.Cautions {
		caut.Rows = append(caut.Rows, []Cell{Text(c)})
	}
	tabs = append(tabs, caut)
	return WriteTables(w, pf.Currency, pf.Places, tabs)
}

// ruleRefs numbers each rule at its first use (appending it to rules) and
// returns a stream's rules as their numbers: "1, 2, 4".
func ruleRefs(list []string, no map[string]int, rules *[]string) string {
	refs := make([]string, 0, len(list))
	for _, rule := range list {
		n, ok := no[rule]
		if !ok {
			*rules = append(*rules, rule)
			n = len(*rules)
			no[rule] = n
		}
		refs = append(refs, fmt.Sprint(n))
	}
	return strings.Join(refs, ", ")
}
