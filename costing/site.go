package costing

import (
	"fmt"
	"sync"

	"sepcost/costing/chrom"
	"sepcost/costing/equipment"
	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/usage"
)

// chromMethod is the chromatography on the site's equipment: run gives the
// rule's loading on a column (no prices needed), choices every candidate
// the plan prices. A site that lacks what a column needs makes every run
// not feasible, with the reason.
func chromMethod(sc *scenario.Scenario, coef source.Set, eq *equipment.Table, quiet bool) (run func(float64) usage.Usage, choices func(float64) []usage.Usage, lean LeanChoices) {
	site := chromSite(sc, eq)
	if why := siteProblem(site, eq); why != "" {
		run = func(m float64) usage.Usage {
			return usage.Usage{Method: chrom.Method, CrudeKg: m, ProductInKg: m * sc.Purity, Reason: why}
		}
		return run, func(m float64) []usage.Usage { return []usage.Usage{run(m)} }, nil
	}
	model := chrom.NewModelWith(sc, coef, site, quiet)
	return model.Run, model.Candidates, model.Lean
}

// chromSite is the chromatography model's view of the site's equipment:
// the columns (or the scenario's own column_diameters, which replace the
// table's columns), cartridges and evaporators, each with the price items
// its use is charged by. The table's part is made once per table
// (tableSite): a Monte Carlo draw makes a plan, and a site, per draw.
func chromSite(sc *scenario.Scenario, eq *equipment.Table) chrom.Site {
	s := tableSite(eq)
	if ch := sc.Chromatography; ch != nil && len(ch.ColumnsM) > 0 {
		s.Columns = nil
		for _, d := range ch.ColumnsM {
			s.Columns = append(s.Columns, chrom.SiteColumn{Name: fmt.Sprintf("%.0f mm column", d*1000), Diameter: d})
		}
	}
	return s
}

// siteOfTable holds tableSite's answer per equipment table. Tables are
// not changed once read (the plan's price caches assume the same), and
// a process reads a handful.
var siteOfTable sync.Map // *equipment.Table → chrom.Site

// tableSite is the site the equipment table gives: its columns,
// cartridges and evaporators. The models read it and never change it.
func tableSite(eq *equipment.Table) chrom.Site {
	if v, ok := siteOfTable.Load(eq); ok {
		return v.(chrom.Site)
	}
	var s chrom.Site
	hour := func(it equipment.Item) string {
		if perHour, _ := it.Charges(); perHour {
			return equipment.HourItem(it.Name)
		}
		return ""
	}
	for _, it := range eq.OfKind(equipment.Column) {
		s.Columns = append(s.Columns, chrom.SiteColumn{Name: it.Name, Diameter: it.Size, HourItem: hour(it)})
	}
	for _, it := range eq.OfKind(equipment.Cartridge) {
		s.Cartridges = append(s.Cartridges, chrom.SiteCartridge{Name: it.Name, Silica: it.Size, MaxLoad: it.MaxLoad, Flow: it.Throughput,
			UseItem: equipment.UseItem(it.Name), HourItem: hour(it)})
	}
	for _, it := range eq.OfKind(equipment.Evaporator) {
		s.Evaporators = append(s.Evaporators, chrom.SiteEvaporator{Name: it.Name, Rate: it.Throughput, HourItem: hour(it)})
	}
	if eq != nil {
		siteOfTable.Store(eq, s)
	}
	return s
}

// siteProblem says what the chromatography needs from a site table that
// lacks it, or "" when the table will do.
func siteProblem(s chrom.Site, eq *equipment.Table) string {
	switch {
	case len(s.Columns) == 0 && len(s.Cartridges) == 0:
		return eq.File + " lists no column and no cartridge; add a line of kind column or cartridge"
	case len(s.Evaporators) == 0:
		return eq.File + " lists no evaporator to take the product fractions down; add a line of kind evaporator"
	}
	return ""
}
