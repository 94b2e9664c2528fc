package scale

import (
	"strconv"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/chrom"
	"sepcost/costing/green"
	"sepcost/costing/scenario"
	"sepcost/costing/usage"
	"sepcost/costing/waste"
)

// WasteRow is one waste stream of one method at one mass, with its
// suggested codes and its disposal cost from the ledger.
type WasteRow struct {
	CrudeKg        float64
	Method         string
	Mass, Col      int // Results[Mass][Col]
	Stream         usage.Stream
	Kg, Litres     float64
	Classification waste.Classification
	Disposal       decimal.Decimal // the ledger's disposal line for this stream (zero when none)
	HasDisposal    bool
}

// SolventGreenness is a solvent the scenario uses, with its class in a
// published selection guide and the substitutions published guidance suggests.
type SolventGreenness struct {
	Solvent     string
	Class       green.GuideClass // "" when the guide does not rank it
	Suggestions []green.Suggestion
}

// wasteRows classifies every stream of every feasible result. For
// chromatography the eluents as made up before use (gradient steps and the
// TLC eluent) are the blends the mixture rules judge.
func wasteRows(p *costing.Plan, masses []float64, methods []string, results [][]Result) []WasteRow {
	return wasteRowsMemo(p, masses, methods, results, map[string]waste.Classification{})
}

// wasteRowsMemo is wasteRows with the classifications of the plan's
// streams already made (by classKey), added to as it goes. The codes
// depend on the stream's class and solvent make-up, which barely move
// with mass; each distinct make-up is classified once.
func wasteRowsMemo(p *costing.Plan, masses []float64, methods []string, results [][]Result, memo map[string]waste.Classification) []WasteRow {
	sc := p.Scenario
	var out []WasteRow
	for i, m := range masses {
		for j, name := range methods {
			res := results[i][j]
			if !res.Usage.Feasible {
				continue
			}
			for k, s := range res.Usage.Waste {
				row := WasteRow{CrudeKg: m, Method: name, Mass: i, Col: j, Stream: s, Kg: s.Kg(), Litres: s.VolumeM3 * 1000}
				key := classKey(name, s)
				c, ok := memo[key]
				if !ok {
					if blends := eluentBlends(sc, name, s); blends != nil {
						c = waste.ClassifyBlends(s, sc.Solvents, p.WasteSector, blends)
					} else {
						c = waste.Classify(s, sc.Solvents, p.WasteSector)
					}
					memo[key] = c
				}
				row.Classification = c
				for _, l := range res.Ledger.Lines {
					if l.Demand.Group == usage.Disposal && l.Demand.Stream == k+1 {
						row.Disposal = row.Disposal.Add(l.Amount)
						row.HasDisposal = true
					}
				}
				out = append(out, row)
			}
		}
	}
	return out
}

// classKey identifies a stream's make-up for classification: method,
// stream, class, the names of its non-solvent components, and each
// solvent's share of the solvent mass to three decimals. The codes turn on
// solvent shares at whole per cents (10 % of listed solvents, 24 % of
// alcohol), so streams that agree to 0.1 % share one classification; the
// rules' wording may then quote a share a tenth of a per cent off.
func classKey(method string, s usage.Stream) string {
	solventKg := 0.0
	for _, c := range s.Components {
		if c.Solvent {
			solventKg += c.Kg
		}
	}
	b := make([]byte, 0, 128)
	b = append(b, method...)
	b = append(b, '|')
	b = append(b, s.Name...)
	b = append(b, '|')
	b = append(b, s.Class...)
	for _, c := range s.Components {
		b = append(b, '|')
		b = append(b, c.Name...)
		if c.Solvent && solventKg > 0 {
			b = append(b, '=')
			b = strconv.AppendFloat(b, c.Kg/solventKg, 'f', 3, 64)
		}
	}
	return string(b)
}

// eluentBlends returns the chromatography eluents as made up before use
// that went into the stream (a blend counts when one of its solvents is in
// the stream: the dry-load solvent, evaporated before the column and
// collected on its own, is not a blend of the spent eluent), or nil for
// other methods.
func eluentBlends(sc *scenario.Scenario, method string, s usage.Stream) []waste.Blend {
	ch := sc.Chromatography
	if method != chrom.Method || ch == nil {
		return nil
	}
	mix := func(name string, m scenario.Mix) waste.Blend {
		b := waste.Blend{Name: name, Parts: map[string]float64{}}
		for _, p := range m {
			b.Parts[p.Solvent] += p.Fraction
		}
		return b
	}
	var out []waste.Blend
	for _, st := range ch.Gradient {
		out = append(out, mix("gradient step "+st.Eluent.String(), st.Eluent))
	}
	out = append(out, mix("eluent "+ch.TLCEluent.String(), ch.TLCEluent))
	if ch.LoadingSolvent != "" {
		out = append(out, mix("loading solvent "+ch.LoadingSolvent, scenario.Mix{{Solvent: ch.LoadingSolvent, Fraction: 1}}))
	}
	in := map[string]bool{}
	for _, c := range s.Components {
		if c.Solvent && c.Kg > 0 {
			in[c.Name] = true
		}
	}
	kept := out[:0]
	for _, b := range out {
		for id := range b.Parts {
			if in[id] {
				kept = append(kept, b)
				break
			}
		}
	}
	if len(kept) == 0 {
		return nil
	}
	return kept
}

// greenness lists the scenario's solvents with their guide class and the
// substitutions suggested for the methods that use them.
func greenness(p *costing.Plan) []SolventGreenness {
	var out []SolventGreenness
	for _, id := range p.SolventsUsed() {
		g := SolventGreenness{Solvent: id}
		g.Class, _ = green.Class(id)
		seen := map[string]bool{}
		for _, m := range p.Methods {
			if !p.Uses(m.Name, id) {
				continue
			}
			for _, s := range green.Substitutes(id, m.Use) {
				if !seen[s.Text] {
					seen[s.Text] = true
					g.Suggestions = append(g.Suggestions, s)
				}
			}
		}
		out = append(out, g)
	}
	return out
}
