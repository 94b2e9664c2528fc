package chrom

import (
	"fmt"
	"math"

	"sepcost/costing/scenario"
	"sepcost/costing/solvent"
	"sepcost/costing/source"
	"sepcost/costing/usage"
)

// analysis is what the TLC, the loading rules and the band model say about
// one separation, before any equipment is chosen.
type analysis struct {
	sc          *scenario.Scenario
	sep         Separation
	dRf         float64
	first       bool    // the product elutes first
	target      float64 // purity asked of the pure cut
	qs          float64 // kg/kg
	ratioTheory float64 // silica : crude where the ideal bands just touch (capacity-bounded)
	ratioTable  float64 // silica : crude by Still's table
	ratioCeil   float64 // silica : crude at the practical ceiling
	ratioRule   float64 // what the chosen rule gives, bounded by the ceiling
	why         string  // which rule and why
	plates      float64 // plates of a bed of the reference height
	trade       []tradeRow
	// solvents are each solvent's words and properties, found and worded
	// once for every candidate (solventOf).
	solvents map[string]solventInfo
}

// solventInfo is what a candidate needs of one solvent: its figure key and
// label, the labels of its purchase and of its recovery, and the
// properties the waste and the evaporation read.
type solventInfo struct {
	key                    usage.FigureKey
	label, used, recovered string
	density                float64 // kg/m³
	cp, hvap               float64 // J/(kg·K), J/kg
	halogenated            bool
}

// solventOf is solvent id's words and properties: found in analyse, or
// here for a solvent the section does not name.
func (a analysis) solventOf(id string) solventInfo {
	if si, ok := a.solvents[id]; ok {
		return si
	}
	return newSolventInfo(a.sc.Solvents, id)
}

// newSolventInfo words one solvent and reads its properties from the
// scenario's book.
func newSolventInfo(b *solvent.Book, id string) solventInfo {
	s := mustSolvent(b, id)
	return solventInfo{key: usage.SolventFigure(id), label: "solvent: " + id, used: "solvent: " + id, recovered: "recovered for reuse: " + id,
		density: s.Density.V, cp: s.SpecificCp(), hvap: s.SpecificHVap(), halogenated: s.Halogenated}
}

// tradeRow is one loading of the trade-off table.
type tradeRow struct {
	ratio float64 // silica : crude
	cut   Cut
}

// tradeSteps multiply the rule's silica : crude to give the loadings tried,
// from twice the touching load (overlapping bands, a smaller pure cut) to
// an eighth of it: the plan keeps the one with the lowest cost per gram.
// Loadings above the ceiling are not tried.
var tradeSteps = []float64{0.5, 0.7, 1, 1.5, 2.25, 3.5, 5, 8}

// analyse runs the TLC relations, both loading rules, the ceiling and the
// band model over the loadings tried.
func analyse(sc *scenario.Scenario, coef source.Set) analysis {
	return analyseRows(sc, coef, false)
}

// analyseRows is analyse; candidatesOnly stops the trade-off table at the
// row where Model.options stops (a usable loading after one that keeps
// all but 0.1 % of the eluted product), for a model that never shows the
// table (quiet): the rows after it would be computed for nothing.
func analyseRows(sc *scenario.Scenario, coef source.Set, candidatesOnly bool) analysis {
	ch := sc.Chromatography
	get := coef.Get
	a := analysis{sc: sc, sep: Separation{ProductRf: ch.ProductRf, ImpurityRf: ch.ImpurityRf, Product: sc.Purity, Impurity: sc.NearestImpurity}}
	a.solvents = map[string]solventInfo{}
	for _, id := range ch.Solvents() {
		a.solvents[id] = newSolventInfo(sc.Solvents, id)
	}
	// Rounded to 1e-9 so that Rf values written to two places (0.35 − 0.25)
	// compare as the chemist wrote them, not as 0.0999999….
	a.dRf = math.Round(math.Abs(ch.ProductRf-ch.ImpurityRf)*1e9) / 1e9
	a.first = a.sep.FirstIsProduct()
	a.target = get(KeyTargetPurity)
	if ch.TargetPurity > 0 {
		a.target = ch.TargetPurity
	}
	a.qs = get(KeyQs)
	a.ratioTable = StillRatio(a.dRf, get(KeyRefBed), get(KeyBedDensity))
	if l := LoadPerSilica(a.sep, a.qs); l > 0 {
		a.ratioTheory = 1 / l
	} else {
		a.ratioTheory = math.Inf(1)
	}
	a.ratioCeil = 1 / get(KeyCeiling)
	if ch.LoadingRule == scenario.RuleTable {
		a.ratioRule, a.why = a.ratioTable, "Still's table (loading_rule: still-table)"
	} else {
		a.ratioRule, a.why = a.ratioTheory, "elution theory (touching bands, capacity-bounded)"
	}
	if a.ratioRule < a.ratioCeil {
		a.why = fmt.Sprintf("the practical ceiling of %.0f : 1 (the rule, %s, asks only %.1f : 1)", a.ratioCeil, a.why, a.ratioRule)
		a.ratioRule = a.ratioCeil
	}
	a.plates = platesFor(coef, get(KeyRefBed))
	steps := tradeSteps
	if ch.LoadingRule == scenario.RuleTable {
		steps = []float64{1}
	}
	for _, f := range steps {
		ratio := a.ratioRule * f
		if ratio < a.ratioCeil*(1-1e-9) {
			continue
		}
		if ratio > get(KeyMaxRatio) || math.IsInf(ratio, 0) {
			break
		}
		a.trade = append(a.trade, tradeRow{ratio, a.cutAt(1/ratio, a.plates)})
		if candidatesOnly && a.lastCandidateRow(len(a.trade)-1, coef) {
			break
		}
	}
	return a
}

// lastCandidateRow reports whether Model.options stops at trade row k: it
// is usable and the row before keeps all but 0.1 % of the eluted product
// (past it, more silica buys nothing).
func (a analysis) lastCandidateRow(k int, coef source.Set) bool {
	return k > 0 && usable(a.trade[k].cut, coef) && a.trade[k-1].cut.Recovery >= 0.999 && usable(a.trade[k-1].cut, coef)
}

// platesFor is the plate count of a bed of height h at the model's flow
// (KnoxPlateHeight at the chromatographic velocity of the falling solvent
// level).
func platesFor(coef source.Set, h float64) float64 {
	get := coef.Get
	u := ChromatographicVelocity(get(KeyFrontVelocity), get(KeyBedDensity), ColumnVolumePerMass(get(KeyBedDensity), get(KeySkeletalDensity)))
	nu := ReducedVelocity(u, get(KeyParticle), get(KeyDiffusivity))
	return PlateNumber(h, KnoxPlateHeight(nu, get(KeyKnoxA), get(KeyKnoxB), get(KeyKnoxC)), get(KeyParticle))
}

// cutAt is the cut at a crude load per silica on a bed of N plates.
//
// The first-eluting component's band is its own overloaded triangle
// (loading factor: its share of the load over q_s). The second-eluting
// component's shock front is placed as in the competitive ideal model, so
// that the two bands just touch at the touching load L_t = q_s·Lf(α, r)
// (TouchingLoad): its effective loading factor is
//
//	Lf2 = (1 − 1/√α)² · L / L_t
//
// since a single-component front at 1 + k2·(1 − √Lf2)² meets the first
// band's rear at 1 + k1 exactly when (1 − √Lf2)² = k1/k2 = 1/α. Below the
// touching load the ideal bands leave a gap; above it they overlap; the
// kinetic blur of the plate count adds overlap at every load.
func (a analysis) cutAt(loadPerSilica, plates float64) Cut {
	s := a.sep
	alpha := s.Alpha()
	lt := a.qs * TouchingLoad(alpha, s.AmountRatio())
	second := math.Pow(1-1/math.Sqrt(alpha), 2) * loadPerSilica / lt
	lfP, lfI := loadPerSilica*s.Product/a.qs, second
	if !a.first {
		lfP, lfI = second, loadPerSilica*s.Impurity/a.qs
	}
	if lt <= 0 {
		return Cut{}
	}
	p := ComponentBand(s.ProductRf, lfP, plates, s.Product)
	i := ComponentBand(s.ImpurityRf, lfI, plates, s.Impurity)
	return CutFor(p, i, a.first, a.target)
}

// usable reports whether a cut is one to run.
func usable(c Cut, coef source.Set) bool {
	return c.OK && c.Recovery >= coef.Get(KeyMinRecovery)
}

// deltaRfNeeded is the ΔRf (the impurity moved away from the product) at
// which the pure cut reaches the target purity with the least recovery at
// the largest silica : crude allowed, by bisection; NaN if even the widest
// ΔRf the product's Rf leaves room for (at most 0.5) fails.
func (a analysis) deltaRfNeeded(coef source.Set) float64 {
	// The whole analysis is rerun with the impurity moved, so that the
	// loading rule (which may ask more silica than allowed) and the band
	// model both decide, as they do for the scenario itself.
	ok := func(d float64) bool {
		ch := *a.sc.Chromatography
		if a.first {
			ch.ImpurityRf = ch.ProductRf - d
		} else {
			ch.ImpurityRf = ch.ProductRf + d
		}
		if ch.ImpurityRf <= 0.01 || ch.ImpurityRf >= 0.99 {
			return false
		}
		sc := *a.sc
		sc.Chromatography = &ch
		for _, r := range analyse(&sc, coef).trade {
			if usable(r.cut, coef) {
				return true
			}
		}
		return false
	}
	lo, hi := a.dRf, 0.5
	if a.first {
		hi = math.Min(hi, a.sep.ProductRf-0.02)
	} else {
		hi = math.Min(hi, 0.98-a.sep.ProductRf)
	}
	if !ok(hi) {
		return math.NaN()
	}
	for i := 0; i < 50; i++ {
		m := (lo + hi) / 2
		if ok(m) {
			hi = m
		} else {
			lo = m
		}
	}
	return hi
}
