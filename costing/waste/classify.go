package waste

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"sepcost/costing/solvent"
	"sepcost/costing/usage"
)

// Classification is the set of codes suggested for one stream, with the
// rules applied in plain words.
type Classification struct {
	Codes    []Code   // EU entry first, then US codes in the order F, D001, D0xx
	Rules    []string // which rule was applied and why, one sentence or two each
	Caution  string   // always Caution
	Problems []string // inputs that could not be used, each naming the stream and the component
}

// Has reports whether a code (e.g. "F002", "07 05 03*") was suggested.
func (c Classification) Has(code string) bool {
	for _, k := range c.Codes {
		if k.Code == code {
			return true
		}
	}
	return false
}

// CodeList is the codes joined with ", " in order, e.g. "07 05 03*, F002".
func (c Classification) CodeList() string {
	s := make([]string, len(c.Codes))
	for i, k := range c.Codes {
		s[i] = k.Code
	}
	return strings.Join(s, ", ")
}

// SchemeCodes is the codes of one scheme ("EU LoW" or "US EPA") joined with spaces.
func (c Classification) SchemeCodes(scheme string) string {
	var s []string
	for _, k := range c.Codes {
		if k.Scheme == scheme {
			s = append(s, k.Code)
		}
	}
	return strings.Join(s, " ")
}

// Blend is a solvent blend as made up before use: a premixed eluent, one
// step of a gradient, a neat flush or rinse, a recrystallization solvent.
type Blend struct {
	Name  string             // plain words, e.g. "step 2: 20 % dichloromethane in heptane"
	Parts map[string]float64 // solvent ID or alias → volume, or volume fraction (normalised here)
}

// Classify suggests codes for a stream, taking the stream's own solvent
// volume fractions as the before-use composition (see the package
// documentation for when that is exact and when it is not).
//
// EU (List of Waste, chapter 07 05 or 07 07 by sector):
//
//	liquid, water ≥ 50 % of the stream's mass         → xx 01* aqueous washing liquids and mother liquors
//	liquid, any halogenated solvent present            → xx 03* organic halogenated solvents, washing liquids and mother liquors
//	liquid, otherwise                                  → xx 04* other organic solvents, washing liquids and mother liquors
//	solvent-wet solids, any halogenated solvent        → xx 09* halogenated filter cakes and spent absorbents
//	solvent-wet solids, otherwise                      → xx 10* other filter cakes and spent absorbents
//
// The List of Waste sets no halogen threshold; any halogenated solvent
// makes a stream halogenated here, as in usage.WasteClass (common practice,
// no source: disposal contractors price halogenated waste separately).
//
// US: F002, F004, F005 when a blend holds a solvent of that listing and,
// before use, a total of 10 % or more by volume of F001, F002, F004 and F005
// solvents; F003 when a blend holds F003 solvents and nothing else, or F003
// solvents with 10 % or more of F001, F002, F004 and F005 solvents (40 CFR
// 261.31(a)); F001 is not applied (degreasing only). D001 for a liquid with
// a solvent whose closed-cup flash point is below 60 °C, unless it is an
// aqueous solution (≥ 50 % water by weight) whose flammable solvents are all
// alcohols at less than 24 % by volume (40 CFR 261.21(a)(1)). D0xx of the
// toxicity characteristic when a liquid's concentration of a Table 1
// solvent reaches the regulatory level (a liquid with less than 0.5 %
// filterable solids is its own extract, 261.24(a)), or for solids when the
// total concentration divided by 20 reaches it (the TCLP screening rule).
func Classify(s usage.Stream, book *solvent.Book, sector Sector) Classification {
	return ClassifyBlends(s, book, sector, nil)
}

// ClassifyBlends is Classify with the blends as made up before use. The
// stream carries the F002, F004 and F005 listing of every blend in it (the
// mixture rule for listed wastes, 40 CFR 261.3(a)(2)(iv)), and the F003
// listing of a blend only while the stream is ignitable (F003 is listed for
// ignitability alone; 261.3(a)(2)(iii)). With no blends it is Classify.
func ClassifyBlends(s usage.Stream, book *solvent.Book, sector Sector, blends []Blend) Classification {
	c := Classification{Caution: Caution}
	a := analyse(s, book, &c)
	solid := s.Class == usage.WetSolids

	// EU List of Waste.
	c.Codes = append(c.Codes, a.euCode(s, sector, solid, &c))

	// US spent-solvent listings.
	c.Rules = append(c.Rules, "US spent-solvent listings F001-F005 apply to solvents used for their solvent properties (to dissolve or mobilise other constituents) and spent; ("+srcSpent+", read); eluents, washes and recrystallization mother liquors are taken here as such uses.")
	bs := a.blends(s, book, blends, &c)
	listed := map[string]bool{}
	f003 := false
	for _, b := range bs {
		codes, rules := b.listings()
		c.Rules = append(c.Rules, rules...)
		for _, k := range codes {
			if k == "F003" {
				f003 = true
				continue
			}
			listed[k] = true
		}
	}

	// D001.
	ignitable := false
	if solid {
		c.Rules = append(c.Rules, "D001: a solvent-wet solid is not a liquid under 40 CFR 261.21(a)(1) when no free liquid separates (paint-filter liquids test, SW-846 Method 9095, from memory); a non-liquid is ignitable under 261.21(a)(2) only if it can cause fire through friction, absorption of moisture or spontaneous chemical change and then burns vigorously and persistently. That judgement is not made here: D001 is not suggested; the EHS office decides.")
	} else {
		ignitable = a.d001(&c)
	}

	// F003 into the stream.
	switch {
	case !f003:
	case solid:
		c.Rules = append(c.Rules, "F003 is listed for ignitability only; a solid mixed with F003 spent solvent is a listed waste only while the mixture is ignitable ("+src2613+", from memory). Ignitability of the wet solid is not assessed here, so F003 is not suggested; the EHS office decides.")
	case len(bs) == 1 && bs[0].proxy:
		listed["F003"] = true
	case ignitable:
		listed["F003"] = true
		c.Rules = append(c.Rules, "F003: a blend in this container is F003, and F003 is listed for ignitability only; the mixed stream stays ignitable (D001), so it remains F003 by the mixture rule ("+src2613+", wording from memory).")
	default:
		c.Rules = append(c.Rules, "F003: a blend in this container is F003, but F003 is listed for ignitability only and the mixture is not shown to be ignitable; by the mixture rule it is then not a listed waste ("+src2613+", wording from memory).")
	}
	if solid {
		var ks []string
		for k := range listed {
			ks = append(ks, k)
		}
		if len(ks) > 0 {
			sort.Strings(ks)
			c.Rules = append(c.Rules, fmt.Sprintf("%s on a solid: silica or other solids wet with a listed spent solvent are treated as carrying the listing, by the mixture rule (40 CFR 261.3(a)(2)(iv)) or the derived-from rule (261.3(c)(2)(i)) (both from memory). Whether the listing attaches, and whether the solid may be managed otherwise, is for the EHS office to decide.", strings.Join(ks, ", ")))
		}
	}
	for _, l := range listings {
		if listed[l.code] {
			c.Codes = append(c.Codes, l.codeFor())
		}
	}
	if ignitable {
		c.Codes = append(c.Codes, d001Code())
	}

	// Toxicity characteristic.
	c.Codes = append(c.Codes, a.toxicity(s, solid, &c)...)
	return c
}

// part is one solvent component of the stream, resolved in the book.
type part struct {
	s  solvent.Solvent
	kg float64
	m3 float64 // kg / density, volumes taken as additive
}

type analysis struct {
	stream   string
	parts    []part
	totalKg  float64 // every component
	waterKg  float64
	solvM3   float64 // sum of solvent volumes
	halogens []string
}

func isWater(s solvent.Solvent) bool { return s.ID == "water" || s.CAS == "7732-18-5" }

// analyse resolves the stream's components and records what cannot be used.
func analyse(s usage.Stream, book *solvent.Book, c *Classification) analysis {
	a := analysis{stream: s.Name}
	if len(s.Components) == 0 {
		c.Problems = append(c.Problems, fmt.Sprintf("stream %q has no components; nothing to classify", s.Name))
	}
	switch s.Class {
	case usage.NonHalogenated, usage.Halogenated, usage.WetSolids, usage.Aqueous:
	default:
		c.Problems = append(c.Problems, fmt.Sprintf("stream %q has waste class %q; valid classes: %q, %q, %q, %q (treated here as a liquid)",
			s.Name, s.Class, usage.NonHalogenated, usage.Halogenated, usage.WetSolids, usage.Aqueous))
	}
	seen := map[string]int{}
	for _, comp := range s.Components {
		if math.IsNaN(comp.Kg) || math.IsInf(comp.Kg, 0) || comp.Kg < 0 {
			c.Problems = append(c.Problems, fmt.Sprintf("stream %q, component %q: mass %g kg; want a finite mass of 0 kg or more (component left out)", s.Name, comp.Name, comp.Kg))
			continue
		}
		a.totalKg += comp.Kg
		if !comp.Solvent || comp.Kg == 0 {
			continue
		}
		sv, ok := book.View(comp.Name)
		if !ok {
			c.Problems = append(c.Problems, fmt.Sprintf("stream %q, component %q is marked as a solvent but is not in the solvent book; its halogen content, flash point and listings are unknown, so codes may be missing (add the solvent to the scenario)", s.Name, comp.Name))
			continue
		}
		v := comp.Kg / sv.Density.V
		if i, dup := seen[sv.ID]; dup {
			a.parts[i].kg += comp.Kg
			a.parts[i].m3 += v
		} else {
			seen[sv.ID] = len(a.parts)
			a.parts = append(a.parts, part{s: sv, kg: comp.Kg, m3: v})
		}
		a.solvM3 += v
		if isWater(sv) {
			a.waterKg += comp.Kg
		}
	}
	for _, p := range a.parts {
		if p.s.Halogenated {
			a.halogens = append(a.halogens, p.s.ID)
		}
	}
	return a
}

func (a analysis) waterFraction() float64 {
	if a.totalKg <= 0 {
		return 0
	}
	return a.waterKg / a.totalKg
}

// below reports x < limit, treating values within a relative 1e-9 of the
// limit as equal to it: fractions rebuilt from masses and densities carry
// rounding errors of order 1e-16, and a fraction written as exactly the
// limit must meet it.
func below(x, limit float64) bool { return x < limit*(1-1e-9) }

func pct(f float64) string { return fmt.Sprintf("%.1f %%", 100*f) }

// euCode picks the List of Waste entry.
func (a analysis) euCode(s usage.Stream, sector Sector, solid bool, c *Classification) Code {
	ch := sector.Chapter()
	w := a.waterFraction()
	var e euEntry
	switch {
	case solid && len(a.halogens) > 0:
		e = euHalogenatedAb
		c.Rules = append(c.Rules, fmt.Sprintf("EU: solvent-wet solids (silica and other absorbents) holding halogenated solvent (%s): %s %s* %s.", strings.Join(a.halogens, ", "), ch, e.suffix, e.title))
	case solid:
		e = euOtherAb
		c.Rules = append(c.Rules, fmt.Sprintf("EU: solvent-wet solids (silica and other absorbents) with no halogenated solvent: %s %s* %s.", ch, e.suffix, e.title))
	case !below(w, AqueousWaterMin):
		e = euAqueous
		c.Rules = append(c.Rules, fmt.Sprintf("EU: liquid with %s water by mass (taken as aqueous from 50 %%, common practice, no source): %s %s* %s.", pct(w), ch, e.suffix, e.title))
	case len(a.halogens) > 0:
		e = euHalogenated
		c.Rules = append(c.Rules, fmt.Sprintf("EU: organic liquid holding halogenated solvent (%s; the List of Waste sets no halogen threshold, so any halogenated solvent counts): %s %s* %s.", strings.Join(a.halogens, ", "), ch, e.suffix, e.title))
	default:
		e = euOtherOrganic
		c.Rules = append(c.Rules, fmt.Sprintf("EU: organic liquid with no halogenated solvent: %s %s* %s.", ch, e.suffix, e.title))
	}
	if solid && len(a.parts) == 0 {
		c.Rules = append(c.Rules, "No solvent is recorded on these solids; the absorbent entry assumes they hold hazardous substances (spent eluent, product, impurities). Solids shown to hold none may fall under another entry; the EHS office decides.")
	}
	if !solid && len(a.parts) == 0 {
		c.Problems = append(c.Problems, fmt.Sprintf("stream %q is a liquid but has no solvent component that could be resolved; the EU entry is a guess", s.Name))
	}
	switch {
	case s.Class == usage.Aqueous && e != euAqueous:
		c.Rules = append(c.Rules, fmt.Sprintf("The stream is declared %q, but water is only %s of its mass; it is classified by composition.", s.Class, pct(w)))
	case s.Class == usage.Halogenated && len(a.halogens) == 0:
		c.Rules = append(c.Rules, fmt.Sprintf("The stream is declared %q, but no halogenated solvent was found in it; it is classified by composition.", s.Class))
	case s.Class == usage.NonHalogenated && len(a.halogens) > 0:
		c.Rules = append(c.Rules, fmt.Sprintf("The stream is declared %q, but holds halogenated solvent (%s); it is classified by composition.", s.Class, strings.Join(a.halogens, ", ")))
	}
	return e.code(sector)
}

// blend is a resolved Blend: volume fractions by solvent.
type blend struct {
	name  string
	proxy bool // the stream's own after-use composition
	frac  []bpart
}

type bpart struct {
	s solvent.Solvent
	f float64
}

// blends resolves the given blends, or makes the proxy blend from the stream.
func (a analysis) blends(s usage.Stream, book *solvent.Book, given []Blend, c *Classification) []blend {
	if len(given) == 0 {
		if a.solvM3 <= 0 {
			return nil
		}
		b := blend{name: "the stream itself", proxy: true}
		for _, p := range a.parts {
			b.frac = append(b.frac, bpart{p.s, p.m3 / a.solvM3})
		}
		c.Rules = append(c.Rules, "Before-use composition: none was given, so the stream's own solvent volume fractions (masses over densities, volumes additive) are taken as the blend before use. This is right for one premixed eluent or one recrystallization solvent; if blends of different strength or a neat flush or rinse went into this container, give the blends, since each blend is judged on its own before-use composition.")
		return []blend{b}
	}
	var out []blend
	inBlend := map[string]bool{}
	for i, g := range given {
		name := g.Name
		if name == "" {
			name = fmt.Sprintf("blend %d", i+1)
		}
		b := blend{name: name}
		total := 0.0
		keys := make([]string, 0, len(g.Parts))
		for k := range g.Parts {
			keys = append(keys, k)
		}
		sort.Strings(keys)
		for _, k := range keys {
			v := g.Parts[k]
			if math.IsNaN(v) || math.IsInf(v, 0) || v < 0 {
				c.Problems = append(c.Problems, fmt.Sprintf("stream %q, blend %q, part %q: %g; want a finite volume or volume fraction of 0 or more (part left out)", s.Name, name, k, v))
				continue
			}
			sv, ok := book.View(k)
			if !ok {
				c.Problems = append(c.Problems, fmt.Sprintf("stream %q, blend %q, part %q is not in the solvent book; its listing is unknown (part left out)", s.Name, name, k))
				continue
			}
			if v == 0 {
				continue
			}
			b.frac = append(b.frac, bpart{sv, v})
			total += v
			inBlend[sv.ID] = true
		}
		if total <= 0 {
			c.Problems = append(c.Problems, fmt.Sprintf("stream %q, blend %q has no usable parts; it is left out", s.Name, name))
			continue
		}
		for j := range b.frac {
			b.frac[j].f /= total
		}
		out = append(out, b)
	}
	for _, p := range a.parts {
		if !inBlend[p.s.ID] {
			c.Problems = append(c.Problems, fmt.Sprintf("stream %q holds %s, which is in none of the blends given; its before-use share is unknown and it is not judged for F001-F005", s.Name, p.s.ID))
		}
	}
	return out
}

// matches reports whether a solvent is the constituent, by CAS number or name.
func (k constituent) matches(s solvent.Solvent) bool {
	if s.CAS != "" {
		for _, cas := range k.cas {
			if cas == s.CAS {
				return true
			}
		}
	}
	if k.matchesName(s.ID) {
		return true
	}
	for _, a := range s.Aliases {
		if k.matchesName(a) {
			return true
		}
	}
	return false
}

// matchesName compares a name with the constituent's, ignoring case and
// runs of white space (k.name and k.names are already in that form).
func (k constituent) matchesName(n string) bool {
	if strings.Contains(n, "  ") || strings.TrimSpace(n) != n || strings.ContainsAny(n, "\t\n") {
		n = strings.Join(strings.Fields(n), " ")
	}
	if strings.EqualFold(n, k.name) {
		return true
	}
	for _, m := range k.names {
		if strings.EqualFold(n, m) {
			return true
		}
	}
	return false
}

func (l listing) has(s solvent.Solvent) bool {
	for _, k := range l.consts {
		if k.matches(s) {
			return true
		}
	}
	return false
}

// in1245 reports whether a solvent counts towards the 10 % total of F001,
// F002, F004 and F005 solvents.
func in1245(s solvent.Solvent) bool {
	return f001.has(s) || f002.has(s) || f004.has(s) || f005.has(s)
}

// listings applies 40 CFR 261.31(a) F002-F005 to one blend.
func (b blend) listings() (codes []string, rules []string) {
	tot := 0.0
	var toxic []string
	for _, p := range b.frac {
		if in1245(p.s) {
			tot += p.f
			toxic = append(toxic, fmt.Sprintf("%s %s", p.s.ID, pct(p.f)))
		}
	}
	over := !below(tot, MixtureThreshold)
	for _, l := range []listing{f002, f004, f005} {
		var mine []string
		for _, p := range b.frac {
			if l.has(p.s) {
				mine = append(mine, p.s.ID)
			}
		}
		if len(mine) == 0 {
			continue
		}
		if over {
			codes = append(codes, l.code)
			rules = append(rules, fmt.Sprintf("%s: %s holds, before use, %s by volume of F001/F002/F004/F005 solvents in total (%s), at least 10 %%, including %s solvent %s. 40 CFR 261.31(a) %s lists \"all spent solvent mixtures/blends containing, before use, a total of ten percent or more (by volume)\" of these solvents; the code is applied for each listing whose own solvents are present (EPA's reading in RCRA guidance, from memory).",
				l.code, b.name, pct(tot), strings.Join(toxic, ", "), l.code, strings.Join(mine, ", "), l.code))
		} else {
			rules = append(rules, fmt.Sprintf("%s not suggested: %s holds %s solvent %s, but F001/F002/F004/F005 solvents total only %s by volume before use, below the 10 %% of 40 CFR 261.31(a) (compare %s: 9 %% toluene before use, not F005).",
				l.code, b.name, l.code, strings.Join(mine, ", "), pct(tot), srcLetter1987))
		}
	}
	var f3, other []string
	water := ""
	for _, p := range b.frac {
		switch {
		case f003.has(p.s):
			f3 = append(f3, p.s.ID)
		default:
			other = append(other, fmt.Sprintf("%s %s", p.s.ID, pct(p.f)))
			if isWater(p.s) {
				water = "; water counts as another constituent, a literal reading of \"only the above\""
			}
		}
	}
	switch {
	case len(f3) == 0:
	case len(other) == 0:
		codes = append(codes, "F003")
		rules = append(rules, fmt.Sprintf("F003: %s is made, before use, only of F003 solvents (%s); 40 CFR 261.31(a) F003 lists \"all spent solvent mixtures/blends containing, before use, only the above spent non-halogenated solvents\".", b.name, strings.Join(f3, ", ")))
	case over:
		codes = append(codes, "F003")
		rules = append(rules, fmt.Sprintf("F003: %s holds F003 solvents (%s) and, before use, %s of F001/F002/F004/F005 solvents, at least 10 %%; 40 CFR 261.31(a) F003 lists blends \"containing, before use, one or more of the above non-halogenated solvents, and, a total of ten percent or more (by volume) of one or more of those solvents listed in F001, F002, F004, and F005\".", b.name, strings.Join(f3, ", "), pct(tot)))
	default:
		rules = append(rules, fmt.Sprintf("F003 not suggested: %s holds F003 solvents (%s) but also other constituents (%s%s) and less than 10 %% of F001/F002/F004/F005 solvents before use, so it is neither of the F003 blend clauses of 40 CFR 261.31(a) (as in %s: xylene with 9 %% toluene and 11 %% glycol ethers is D001, not F003). If an F003 solvent was used neat (a flush, rinse or loading solvent) and went into this container, the container is F003 while it stays ignitable; give the blends to judge that.",
			b.name, strings.Join(f3, ", "), strings.Join(other, ", "), water, srcLetter1987))
	}
	for _, p := range b.frac {
		if f001.has(p.s) && !f002.has(p.s) {
			rules = append(rules, fmt.Sprintf("F001 not suggested: %s is an F001 solvent, but F001 covers spent solvents used in degreasing only (40 CFR 261.31(a) F001).", p.s.ID))
		}
	}
	return codes, rules
}

// alcohols are treated as "alcohol" in the D001 exclusion (any alcohol; the
// exclusion's scope is from memory).
var alcohols = []constituent{
	meoh,
	{"ethanol", []string{"64-17-5"}, []string{"ethyl alcohol"}},
	{"1-propanol", []string{"71-23-8"}, []string{"n-propanol", "propan-1-ol"}},
	{"isopropanol", []string{"67-63-0"}, []string{"2-propanol", "isopropyl alcohol"}},
	buoh,
	{"2-butanol", []string{"78-92-2"}, []string{"sec-butanol"}},
	ibu,
	{"tert-butanol", []string{"75-65-0"}, []string{"t-butanol", "tert-butyl alcohol"}},
}

func isAlcohol(s solvent.Solvent) bool {
	for _, k := range alcohols {
		if k.matches(s) {
			return true
		}
	}
	return false
}

// d001 applies 40 CFR 261.21(a)(1) to a liquid stream.
func (a analysis) d001(c *Classification) bool {
	var flam []part
	for _, p := range a.parts {
		if p.s.Flammable() {
			flam = append(flam, p)
		}
	}
	if len(flam) == 0 {
		c.Rules = append(c.Rules, "D001 not suggested: no solvent in the stream has a closed-cup flash point below 60 °C (40 CFR 261.21(a)(1)).")
		return false
	}
	names := make([]string, len(flam))
	allAlc := true
	alcM3 := 0.0
	for i, p := range flam {
		names[i] = fmt.Sprintf("%s (flash point %.0f °C)", p.s.ID, p.s.FlashPoint.V-273.15)
		if isAlcohol(p.s) {
			alcM3 += p.m3
		} else {
			allAlc = false
		}
	}
	w := a.waterFraction()
	alc := 0.0
	if a.solvM3 > 0 {
		alc = alcM3 / a.solvM3
	}
	aqueous := !below(w, AqueousWaterMin)
	if aqueous && allAlc && below(alc, AlcoholLimit) {
		c.Rules = append(c.Rules, fmt.Sprintf("D001 not suggested: an aqueous solution (%s water by weight, at least 50 %%) whose flammable solvents are alcohols at %s by volume, below 24 %%; 40 CFR 261.21(a)(1) excludes \"an aqueous solution containing less than 24 percent alcohol by volume\" from the flash-point test.", pct(w), pct(alc)))
		return false
	}
	why := ""
	switch {
	case aqueous && allAlc:
		why = fmt.Sprintf(" The alcohol exclusion does not apply: %s alcohol by volume is not below 24 %%.", pct(alc))
	case aqueous:
		why = " The alcohol exclusion does not apply: not all the flammable solvents are alcohols."
	}
	c.Rules = append(c.Rules, fmt.Sprintf("D001: a liquid holding %s, below the 60 °C of 40 CFR 261.21(a)(1).%s The mixture's own flash point is not computed: a liquid holding a solvent that flashes below 60 °C is taken as ignitable unless a closed-cup test (Pensky-Martens or Setaflash, as 261.21(a)(1) names) shows otherwise.", strings.Join(names, ", "), why))
	return true
}

// toxicity applies 40 CFR 261.24 to the Table 1 solvents in the stream.
func (a analysis) toxicity(s usage.Stream, solid bool, c *Classification) []Code {
	var out []Code
	for _, e := range tcTable {
		kg := 0.0
		var ids []string
		for _, p := range a.parts {
			if e.c.matches(p.s) {
				kg += p.kg
				ids = append(ids, p.s.ID)
			}
		}
		if kg <= 0 {
			continue
		}
		if solid {
			if a.totalKg <= 0 {
				continue
			}
			bound := kg / a.totalKg * 1e6 / TCLPRatio // mg/kg ÷ 20 L/kg = mg/L
			if bound >= e.level {
				out = append(out, e.codeFor())
				c.Rules = append(c.Rules, fmt.Sprintf("%s possible: the solid holds %.3g mg/kg of %s; divided by the 20:1 extraction that allows up to %.3g mg/L in the TCLP extract, at or above the %g mg/L of 40 CFR 261.24 Table 1. Only a TCLP test (SW-846 Method 1311) decides; suggested as a precaution.",
					e.code, kg/a.totalKg*1e6, strings.Join(ids, ", "), bound, e.level))
			} else {
				c.Rules = append(c.Rules, fmt.Sprintf("%s not suggested: %s at %.3g mg/kg cannot give more than %.3g mg/L in the 20:1 TCLP extract, below %g mg/L (%s).",
					e.code, strings.Join(ids, ", "), kg/a.totalKg*1e6, bound, e.level, srcRule20))
			}
			continue
		}
		v := s.VolumeM3
		if !(v > 0) {
			v = a.solvM3
		}
		if v <= 0 {
			continue
		}
		conc := kg / v * 1e3 // kg/m³ → mg/L
		if conc >= e.level {
			out = append(out, e.codeFor())
			c.Rules = append(c.Rules, fmt.Sprintf("%s: the liquid holds %.3g mg/L of %s, at or above the %g mg/L of 40 CFR 261.24 Table 1; a waste with less than 0.5 %% filterable solids is its own extract (261.24(a)).",
				e.code, conc, strings.Join(ids, ", "), e.level))
		} else {
			c.Rules = append(c.Rules, fmt.Sprintf("%s not suggested: %s at %.3g mg/L is below the %g mg/L of 40 CFR 261.24 Table 1.", e.code, strings.Join(ids, ", "), conc, e.level))
		}
	}
	return out
}
