package costing

import (
	"fmt"
	"sort"
	"strings"
)

// Cautions lists the safety cautions that apply to the plan's methods and
// solvents (DEVELOPERS.md, "Cautions"). They are the usual cautions of laboratory practice
// (e.g. National Research Council, "Prudent Practices in the Laboratory",
// 2011, chapters 4 and 6 — from memory) and always defer to local codes.
func (p *Plan) Cautions() []string {
	var out []string
	var flammable, peroxide, halogenated []string
	for _, id := range p.SolventsUsed() {
		s, ok := p.Scenario.Solvents.Find(id)
		if !ok {
			continue
		}
		if s.HasFlashPoint && s.Flammable() {
			flammable = append(flammable, fmt.Sprintf("%s (flash point %.0f °C)", id, s.FlashPoint.V-273.15))
		}
		if s.PeroxideFormer {
			peroxide = append(peroxide, id)
		}
		if s.Halogenated {
			halogenated = append(halogenated, id)
		}
	}
	sort.Strings(flammable)
	if len(flammable) > 0 {
		out = append(out, "Flammable solvents: "+strings.Join(flammable, ", ")+". Work in a fume hood, keep ignition sources (hot plates, heat guns, non-rated electrics, static) away, ground large containers when pouring, and store and move bulk solvent as your site's fire code requires.")
	}
	if len(peroxide) > 0 {
		out = append(out, "Peroxide-forming solvents (ethers, secondary alcohols and others): "+strings.Join(peroxide, ", ")+". Date containers on opening, test for peroxides before concentrating or distilling, and never evaporate them to dryness.")
	}
	if len(halogenated) > 0 {
		out = append(out, "Halogenated solvents: "+strings.Join(halogenated, ", ")+". Toxic by inhalation; handle in a fume hood with suitable gloves (dichloromethane passes through nitrile quickly) and collect separately from non-halogenated waste.")
	}
	for _, e := range Registry {
		out = append(out, e.Cautions(p.Scenario)...)
	}
	out = append(out, "Waste classification, waste codes, exposure limits and disposal follow local regulations and your site's licensed environmental-health-and-safety practice; the figures here are estimates to plan with, not a permit.")
	return out
}
