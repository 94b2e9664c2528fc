package chrom

import (
	"fmt"
	"math"
	"strconv"

	"sepcost/costing/scenario"
	"sepcost/costing/solvent"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Price-table items the model asks for (besides one item per solvent id and
// the site's equipment items).
const (
	ItemSilica      = "silica gel"
	ItemSand        = "sea sand"
	ItemTLCPlate    = "tlc plate"
	ItemLabour      = usage.ItemLabour
	ItemElectricity = usage.ItemElectricity
	ItemProduct     = usage.ItemProduct
)

// Run models one flash-chromatography purification of crudeKg of crude at
// the rule's loading (bounded by the ceiling) on a column packed by hand,
// or, if that cut is not usable, the first usable of the Candidates. coef must hold Defaults() plus the calibrated saturation capacity
// (AddCalibration).
func Run(sc *scenario.Scenario, coef source.Set, site Site, crudeKg float64) usage.Usage {
	return NewModel(sc, coef, site).Run(crudeKg)
}

// Model is the chromatography of one scenario with its coefficients and
// site, with the analysis that does not depend on the batch mass (the
// loading rules and the trade-off table) done once.
type Model struct {
	sc   *scenario.Scenario
	coef source.Set
	site Site
	a    analysis
	// head is the header every candidate starts from (the separation's
	// figures, notes and trade-off table, which do not depend on the
	// mass), built once; start copies it for each candidate.
	head usage.Usage
	// quiet makes usages that are only costed (usage.Usage.Quiet): no
	// notes, no trade-off table, a short reason when nothing is feasible.
	quiet bool
}

// NewModel analyses the separation once; coef must hold the calibration.
func NewModel(sc *scenario.Scenario, coef source.Set, site Site) *Model {
	return NewModelWith(sc, coef, site, false)
}

// NewModelWith is NewModel; quiet makes usages that are only costed
// (usage.Usage.Quiet): their figures, demands, waste and cost are those
// NewModel gives, without notes, the trade-off table or the worded
// reason (and the ΔRf search behind it) when no loading is feasible.
func NewModelWith(sc *scenario.Scenario, coef source.Set, site Site, quiet bool) *Model {
	md := &Model{sc: sc, coef: coef, site: site, a: analyseRows(sc, coef, quiet), quiet: quiet}
	if sc.Chromatography != nil {
		md.head = md.a.header(sc, coef, quiet)
	}
	return md
}

// start is a candidate's usage at crudeKg: the header's figures, and
// unless quiet its notes and tables, copied so that the candidate can add
// to them.
func (md *Model) start(crudeKg float64, quiet bool) usage.Usage {
	// A candidate adds 31 figures of its own, one per solvent and two
	// for a re-run; 13 demands, one per solvent and the recovery's.
	room := len(md.head.Figures) + 33 + len(md.a.solvents)
	if md.quiet {
		room = 0 // a quiet model's usages are only costed: no figures (usage.Usage.CostOnly)
	}
	u := usage.NewWithRoom(Method, crudeKg, crudeKg*md.sc.Purity, room, 13+2*len(md.a.solvents))
	u.Quiet, u.CostOnly = quiet, md.quiet
	u.Figures = append(u.Figures, md.head.Figures...)
	u.Activities = make([]usage.Activity, 0, activities)
	if !quiet {
		u.Notes = append([]usage.Note(nil), md.head.Notes...)
		u.Tables = append([]usage.Table(nil), md.head.Tables...)
	}
	return u
}

// activities is the room start makes for a candidate's activities: pack
// or mount, load, elute, TLC, combine, clean, dry load, evaporate.
const activities = 8

// Run is the package-level Run on a prepared model.
func (md *Model) Run(crudeKg float64) usage.Usage {
	cs := md.Candidates(crudeKg)
	for _, u := range cs {
		if r, ok := u.Figure(usage.FigRatioUsed); ok && u.Feasible {
			if rule, _ := u.Figure(usage.FigRatioRule); r.SI >= rule.SI*(1-1e-9) {
				return u
			}
		}
	}
	return cs[0]
}

// Candidates models the purification on every loading of the trade-off
// table that reaches the target purity, each on a column packed by hand and
// on prepacked cartridges when the site lists them. The caller prices them
// and keeps the cheapest per gram; each candidate carries the same
// separation figures and trade-off table. When no loading reaches the
// purity, the one candidate is not feasible, with the reason and the ΔRf
// that would be needed.
func Candidates(sc *scenario.Scenario, coef source.Set, site Site, crudeKg float64) []usage.Usage {
	return NewModel(sc, coef, site).Candidates(crudeKg)
}

// Candidates is the package-level Candidates on a prepared model.
func (md *Model) Candidates(crudeKg float64) []usage.Usage {
	opts, why := md.options(crudeKg)
	if why != "" {
		return []usage.Usage{md.none(crudeKg, why, md.quiet)}
	}
	out := make([]usage.Usage, len(opts))
	for i := range opts {
		out[i] = md.start(crudeKg, md.quiet)
		build(&out[i], md.a, md.sc, md.coef, md.site, opts[i].e, opts[i].ratio, nil)
	}
	return out
}

// Lean is Candidates made to be ranked by cost: the same candidates in
// the same order, each built quiet (usage.Usage.Quiet: the same
// quantities, demands and equipment, no notes or tables), and full(i),
// the i-th as Candidates gives it, for the few a report words. full
// builds again on the same code with the cut the lean build found, so
// the two share every quantity (TestLeanCandidatesAreTheFullOnes).
func (md *Model) Lean(crudeKg float64) (lean []usage.Usage, full func(i int) usage.Usage) {
	opts, why := md.options(crudeKg)
	if why != "" {
		return []usage.Usage{md.none(crudeKg, why, true)}, func(int) usage.Usage { return md.none(crudeKg, why, md.quiet) }
	}
	lean = make([]usage.Usage, len(opts))
	cuts := make([]bedCut, len(opts))
	for i := range opts {
		lean[i] = md.start(crudeKg, true)
		cuts[i] = build(&lean[i], md.a, md.sc, md.coef, md.site, opts[i].e, opts[i].ratio, nil)
	}
	return lean, func(i int) usage.Usage {
		u := md.start(crudeKg, md.quiet)
		build(&u, md.a, md.sc, md.coef, md.site, opts[i].e, opts[i].ratio, &cuts[i])
		return u
	}
}

// option is one candidate plan: equipment at a loading (silica : crude).
type option struct {
	e     equip
	ratio float64
}

// Reasons options gives when there is no candidate to build.
const (
	noSite     = "the site lists no column or cartridge, or no evaporator"
	noLoading  = "no loading"
	optionsCap = 24 // room for the usual 8 loadings × column and cartridge
)

// options lists the candidate plans at crudeKg: every usable loading of
// the trade-off table up to the first that keeps all but 0.1 % of the
// eluted product, each on the column and the cartridge the site offers,
// a plan repeated (the same equipment, runs and silica per run) listed
// once. why is noSite or noLoading when there is none.
func (md *Model) options(crudeKg float64) (opts []option, why string) {
	a, coef, site := md.a, md.coef, md.site
	if len(site.Evaporators) == 0 || len(site.Columns)+len(site.Cartridges) == 0 {
		return nil, noSite
	}
	opts = make([]option, 0, optionsCap)
	var seen []planKey // a cartridge holds what it holds: several loadings may give the same plan
	for k, row := range a.trade {
		if !usable(row.cut, coef) {
			continue
		}
		// Past the first loading that keeps all but 0.1 % of the eluted
		// product, more silica buys nothing: stop (a quiet model's
		// trade-off table ends here, analyseRows).
		if a.lastCandidateRow(k, coef) {
			break
		}
		for _, e := range equipmentFor(a, coef, site, crudeKg*row.ratio, crudeKg) {
			key := keyOf(e)
			if key.in(seen) {
				continue
			}
			seen = append(seen, key)
			opts = append(opts, option{e: e, ratio: row.ratio})
		}
	}
	if len(opts) == 0 {
		return nil, noLoading
	}
	return opts, ""
}

// planKey tells plans apart: equipment name, runs, and the silica per
// run to nine significant digits.
type planKey struct {
	name   string
	runs   int
	silica [32]byte
	n      int
}

// keyOf is the key of a plan.
func keyOf(e equip) planKey {
	k := planKey{name: e.name, runs: e.runs}
	k.n = len(strconv.AppendFloat(k.silica[:0], e.silicaRun, 'g', 9, 64))
	return k
}

// in reports whether the key is among seen.
func (k planKey) in(seen []planKey) bool {
	for _, s := range seen {
		if s == k {
			return true
		}
	}
	return false
}

// none is the one candidate, not feasible, when options found none: why
// noSite, or noLoading worded (the ΔRf that would do) unless quiet.
func (md *Model) none(crudeKg float64, why string, quiet bool) usage.Usage {
	if why == noSite {
		u := usage.New(Method, crudeKg, crudeKg*md.sc.Purity)
		u.Feasible = false
		u.Reason = why
		return u
	}
	u := md.start(crudeKg, quiet)
	u.Feasible = false
	u.Reason = quietInfeasible
	if !quiet {
		u.Reason = md.a.infeasible(md.coef)
	}
	return u
}

// quietInfeasible is the reason a quiet model gives when no loading is
// feasible (the worded one, with the ΔRf that would do, is NewModel's).
const quietInfeasible = "no loading reaches the purity asked"

// header starts a usage with the separation's figures, notes and the
// trade-off table, the same for every candidate; quiet leaves out the
// notes and the table.
func (a analysis) header(sc *scenario.Scenario, coef source.Set, quiet bool) usage.Usage {
	ch := sc.Chromatography
	u := usage.New(Method, 0, 0)
	u.Quiet, u.CostOnly = quiet, quiet
	fig := u.AddFigure
	fig("k_product", "retention factor k of the product", RetentionFactor(ch.ProductRf), "")
	u.MarkDetail("k_product") // the method sheet and JSON only
	fig("cv_product", "product elutes at (column volumes)", ElutionCV(ch.ProductRf), "")
	fig("elution_volume_difference_cv", "difference in elution volume from the nearest impurity (column volumes)", DeltaCV(ch.ProductRf, ch.ImpurityRf), "")
	fig("alpha", "separation factor α", a.sep.Alpha(), "")
	fig("plates_reference", fmt.Sprintf("theoretical plates of a %.0f cm bed (Knox plate height at the flow used)", coef.Get(KeyRefBed)*100), a.plates, "")
	fig("target_purity", "purity asked of the product fractions", a.target, "%")
	fig("ratio_theory", "silica : crude by elution theory (touching bands)", a.ratioTheory, "")
	fig("ratio_table", "silica : crude by Still's table", a.ratioTable, "")
	fig("ratio_ceiling", "silica : crude at the practical ceiling", a.ratioCeil, "")
	fig("ratio_rule", "silica : crude the rule gives, bounded by the ceiling", a.ratioRule, "")
	a.separationNotes(&u, ch, coef)
	if quiet {
		return u
	}
	t := usage.Table{Key: "loading_tradeoff", Title: fmt.Sprintf("Loading against recovery at the purity asked (%.0f cm bed, %.0f plates)", coef.Get(KeyRefBed)*100, a.plates),
		Columns: []string{"silica : crude", "crude per silica (%)", "product in the pure cut (%)", "product in mixed fractions (%)", "purity of the cut (%)", "usable (1 = yes)"}}
	for _, r := range a.trade {
		ok := 0.0
		if usable(r.cut, coef) {
			ok = 1
		}
		t.Rows = append(t.Rows, []float64{r.ratio, 100 / r.ratio, r.cut.Recovery * 100, r.cut.Mixed * 100, r.cut.Purity * 100, ok})
	}
	u.Tables = append(u.Tables, t)
	return u
}

// equipmentFor lists the equipment options for one loading: the columns
// packed by hand and, if the site lists any, a prepacked cartridge.
func equipmentFor(a analysis, coef source.Set, site Site, silicaKg, crudeKg float64) []equip {
	var out []equip
	if len(site.Columns) > 0 {
		col, j := ChooseColumn(silicaKg, coef.Get(KeyBedMin), coef.Get(KeyBedMax), coef.Get(KeyBedDensity), site.Columns)
		c := site.Columns[j]
		out = append(out, equip{name: c.Name, column: &c, diameter: col.Diameter, bedHeight: col.BedHeight,
			runs: col.Runs, silicaRun: col.Silica, silicaBuy: col.Silica, packedByMe: true})
	}
	if len(site.Cartridges) > 0 {
		i, runs := ChooseCartridge(silicaKg, crudeKg, site.Cartridges)
		c := site.Cartridges[i]
		h := coef.Get(KeyRefBed)
		d := math.Sqrt(c.Silica / (coef.Get(KeyBedDensity) * math.Pi / 4 * h))
		out = append(out, equip{name: c.Name, cartridge: &c, diameter: d, bedHeight: h, runs: runs, silicaRun: c.Silica})
	}
	return out
}

// mustSolvent returns a solvent the scenario has already checked exists.
func mustSolvent(b *solvent.Book, id string) solvent.Solvent {
	s, ok := b.View(id)
	if !ok {
		panic("chrom: solvent " + id + " was not checked by the scenario reader")
	}
	return s
}

// heatToEvaporate is the heat to warm and vaporise the volumes (J).
func (a analysis) heatToEvaporate(v vols, warmup float64) float64 {
	heat := 0.0
	for i, id := range v.ids {
		s := a.solventOf(id)
		heat += v.v[i] * s.density * (s.cp*warmup + s.hvap)
	}
	return heat
}

// addDemandsOfEquipment charges the equipment's hours and uses.
func addDemandsOfEquipment(u *usage.Usage, e equip, ev SiteEvaporator, colHours, evapHours float64) {
	d := u.AddDemand
	if e.cartridge != nil {
		// Counted by the silica inside (the housing is not weighed here).
		u.AddCountedDemand(e.cartridge.UseItem, "prepacked cartridges: "+e.cartridge.Name, usage.Materials, float64(e.runs), e.silicaRun*float64(e.runs))
		if e.cartridge.HourItem != "" {
			d(e.cartridge.HourItem, "cartridge station time", usage.EquipmentUse, colHours, units.Time)
		}
	} else if e.column != nil && e.column.HourItem != "" {
		d(e.column.HourItem, "column time: "+e.column.Name, usage.EquipmentUse, colHours, units.Time)
	}
	if ev.HourItem != "" {
		d(ev.HourItem, "evaporator time: "+ev.Name, usage.EquipmentUse, evapHours, units.Time)
	}
}
