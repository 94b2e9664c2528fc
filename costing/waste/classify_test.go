package waste

import (
	"strings"
	"testing"

	"sepcost/costing/solvent"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// testBook is the built-in table plus solvents the regulation examples
// need. Their data serve only to place them in the rules (flash point,
// CAS number, halogen content); values from suppliers' safety data sheets
// and the CRC Handbook, from memory.
func testBook(t *testing.T) *solvent.Book {
	t.Helper()
	b := solvent.Builtin()
	p := func(v float64) solvent.Prop {
		return solvent.Prop{V: v, Source: "test data, from memory", Mark: source.FromMemory}
	}
	add := func(s solvent.Solvent) {
		s.PeroxideBasis = solvent.Basis{Source: "test data", Mark: source.FromMemory}
		if err := b.Add(s); err != nil {
			t.Fatalf("test solvent %s: %v", s.ID, err)
		}
	}
	// Mixed xylenes: flash point 27 °C (CHEM21 table as reproduced by
	// AI4Green, CHEM21_full.csv, confirmed); F003 "xylene".
	add(solvent.Solvent{ID: "xylenes", Aliases: []string{"xylene"}, Formula: "C8H10", CAS: "1330-20-7",
		Density: p(864), BoilingPoint: p(412.15), HVap: p(36000), Cp: p(185),
		FlashPoint: p(degC(27)), HasFlashPoint: true})
	// 2-Butoxyethanol, a glycol ether not named in F001-F005: flash point
	// about 62-67 °C (safety data sheets, from memory).
	add(solvent.Solvent{ID: "2-butoxyethanol", Formula: "C6H14O2", CAS: "111-76-2",
		Density: p(900), BoilingPoint: p(444.15), HVap: p(45000), Cp: p(281),
		FlashPoint: p(degC(67)), HasFlashPoint: true})
	// N,N-Dimethylformamide: closed-cup flash point 58 °C (safety data
	// sheets, from memory) — just below the D001 limit.
	add(solvent.Solvent{ID: "n,n-dimethylformamide", Aliases: []string{"DMF"}, Formula: "C3H7NO", CAS: "68-12-2",
		Density: p(944), BoilingPoint: p(426.15), HVap: p(46900), Cp: p(146),
		FlashPoint: p(degC(58)), HasFlashPoint: true})
	// Dimethyl sulfoxide: closed-cup flash point 87-95 °C (safety data
	// sheets give 87-89 °C; the CHEM21 table 95 °C; from memory and
	// confirmed respectively) — above the limit.
	add(solvent.Solvent{ID: "dimethyl sulfoxide", Aliases: []string{"DMSO"}, Formula: "C2H6OS", CAS: "67-68-5",
		Density: p(1100), BoilingPoint: p(462.15), HVap: p(43100), Cp: p(153),
		FlashPoint: p(degC(89)), HasFlashPoint: true})
	return b
}

func degC(c float64) float64 { return units.MustFrom(c, "C") }

// liquid builds a liquid stream from solvent volumes in mL, with masses
// from the book's densities, so that the stream's volume fractions are
// exactly the blend's.
func liquid(t *testing.T, b *solvent.Book, class usage.WasteClass, mL map[string]float64) usage.Stream {
	t.Helper()
	s := usage.Stream{Name: "test liquid", Class: class}
	for id, v := range mL {
		sv, ok := b.Find(id)
		if !ok {
			t.Fatalf("no solvent %q", id)
		}
		m3 := v * 1e-6
		s.Components = append(s.Components, usage.Component{Name: sv.ID, Kg: m3 * sv.Density.V, Solvent: true})
		s.VolumeM3 += m3
	}
	return s
}

// wet builds solvent-wet silica: silica kg plus solvent volumes in mL.
func wet(t *testing.T, b *solvent.Book, silicaKg float64, mL map[string]float64) usage.Stream {
	t.Helper()
	s := liquid(t, b, usage.WetSolids, mL)
	s.Name, s.VolumeM3 = "test wet silica", 0
	s.Components = append(s.Components, usage.Component{Name: "silica gel", Kg: silicaKg})
	return s
}

// TestCodes checks suggested codes against the regulation texts. Each case
// says which entry or paragraph gives each expected code. EU entries: the
// List of Waste, Commission Decision 2000/532/EC as amended by 2014/955/EU,
// chapter 07 05 (from memory). US: 40 CFR 261.31(a) (F001-F003 rows read
// in the regulation text, F004/F005 from memory), 261.21(a)(1) and 261.24
// Table 1 (read).
func TestCodes(t *testing.T) {
	t.Parallel()
	b := testBook(t)
	cases := []struct {
		name   string
		stream usage.Stream
		sector Sector
		want   string
	}{
		// 261.31(a) F002 names "methylene chloride"; dichloromethane has no
		// closed-cup flash point, so no D001; LoW 07 05 03* halogenated solvents.
		{"neat dichloromethane", liquid(t, b, usage.Halogenated, map[string]float64{"dichloromethane": 1000}), Pharmaceuticals,
			"07 05 03*, F002"},
		// 261.31(a) F005 names toluene (from memory); flash point 4 °C < 60 °C: D001.
		{"neat toluene", liquid(t, b, usage.NonHalogenated, map[string]float64{"toluene": 1000}), Pharmaceuticals,
			"07 05 04*, F005, D001"},
		// Same, in LoW chapter 07 07 (fine chemicals).
		{"neat toluene, fine chemicals", liquid(t, b, usage.NonHalogenated, map[string]float64{"toluene": 1000}), FineChemicals,
			"07 07 04*, F005, D001"},
		// F003 names "ethyl ether"; flash point -45 °C.
		{"neat diethyl ether", liquid(t, b, usage.NonHalogenated, map[string]float64{"diethyl ether": 500}), Pharmaceuticals,
			"07 05 04*, F003, D001"},
		// F003 names "n-butyl alcohol"; flash point 37 °C.
		{"neat 1-butanol", liquid(t, b, usage.NonHalogenated, map[string]float64{"1-butanol": 500}), Pharmaceuticals,
			"07 05 04*, F003, D001"},
		// Ethyl acetate is F003 but heptane is not listed: not "only" F003
		// solvents and no F001/2/4/5 solvent, so no F003; both flash below 60 °C.
		{"heptane/ethyl acetate 4:1", liquid(t, b, usage.NonHalogenated, map[string]float64{"n-heptane": 800, "ethyl acetate": 200}), Pharmaceuticals,
			"07 05 04*, D001"},
		// Hexane and acetone: acetone is F003, hexane is not listed.
		{"hexane/acetone 7:3", liquid(t, b, usage.NonHalogenated, map[string]float64{"n-hexane": 700, "acetone": 300}), Pharmaceuticals,
			"07 05 04*, D001"},
		// Ethyl acetate and methanol are both F003: "containing, before use,
		// only the above spent non-halogenated solvents".
		{"ethyl acetate/methanol 9:1", liquid(t, b, usage.NonHalogenated, map[string]float64{"ethyl acetate": 900, "methanol": 100}), Pharmaceuticals,
			"07 05 04*, F003, D001"},
		// 95 % methylene chloride (F002, ≥ 10 %) with methanol: F002; F003 by
		// its second clause (F003 solvent with ≥ 10 % F001/2/4/5 solvents);
		// methanol flashes at 11 °C: D001.
		{"dichloromethane/methanol 95:5", liquid(t, b, usage.Halogenated, map[string]float64{"dichloromethane": 950, "methanol": 50}), Pharmaceuticals,
			"07 05 03*, F002, F003, D001"},
		// 5 % methylene chloride: below the 10 % total, so not F002; still
		// halogenated for the EU entry.
		{"5 % dichloromethane in heptane/ethyl acetate", liquid(t, b, usage.Halogenated, map[string]float64{"dichloromethane": 50, "n-heptane": 760, "ethyl acetate": 190}), Pharmaceuticals,
			"07 05 03*, D001"},
		// EPA letter to J. Charley, 21 Jul 1987 (read): paint thinner of 80 %
		// xylene, 9 % toluene, 11 % glycol ethers before use "would be
		// correctly classified as a D001 hazardous waste", not F003 or F005.
		{"EPA 1987: xylene 80, toluene 9, glycol ether 11", liquid(t, b, usage.NonHalogenated, map[string]float64{"xylenes": 800, "toluene": 90, "2-butoxyethanol": 110}), Pharmaceuticals,
			"07 05 04*, D001"},
		// The same blend at 10 % toluene reaches the threshold the letter
		// names: F005 (toluene), F003 by its second clause (xylene with
		// ≥ 10 % F005 solvent), and D001.
		{"EPA 1987 variant: toluene 10 %", liquid(t, b, usage.NonHalogenated, map[string]float64{"xylenes": 790, "toluene": 100, "2-butoxyethanol": 110}), Pharmaceuticals,
			"07 05 04*, F003, F005, D001"},
		// Chloroform is in neither F001 nor F002 (read); it is D022 in 261.24
		// Table 1 at 6.0 mg/L (read), far exceeded by the neat liquid; no
		// closed-cup flash point.
		{"neat chloroform", liquid(t, b, usage.Halogenated, map[string]float64{"chloroform": 200}), Pharmaceuticals,
			"07 05 03*, D022"},
		// 20 % ethanol by volume in water: the aqueous-alcohol exclusion of
		// 261.21(a)(1) (< 24 % alcohol, ≥ 50 % water by weight); ethanol is
		// not F-listed; LoW 07 05 01* aqueous mother liquors.
		{"20 % ethanol in water", liquid(t, b, usage.Aqueous, map[string]float64{"ethanol": 200, "water": 800}), Pharmaceuticals,
			"07 05 01*"},
		// 30 % ethanol is above the 24 % of the exclusion: D001.
		{"30 % ethanol in water", liquid(t, b, usage.Aqueous, map[string]float64{"ethanol": 300, "water": 700}), Pharmaceuticals,
			"07 05 01*, D001"},
		// 10 % methanol in water: excluded from D001 (< 24 % alcohol); not
		// F003 on a literal reading of "only the above … solvents" (water is
		// not one of them; EPA's reading for water not checked).
		{"10 % methanol in water", liquid(t, b, usage.Aqueous, map[string]float64{"methanol": 100, "water": 900}), Pharmaceuticals,
			"07 05 01*"},
		// Silica wet with methylene chloride: LoW 07 05 09* halogenated spent
		// absorbents; F002 carried by the mixture/derived-from rule (from memory).
		{"silica wet with dichloromethane", wet(t, b, 1.0, map[string]float64{"dichloromethane": 750}), Pharmaceuticals,
			"07 05 09*, F002"},
		// Silica wet with heptane/ethyl acetate: 07 05 10* other spent
		// absorbents; no listing, D001 for solids not assessed.
		{"silica wet with heptane/ethyl acetate", wet(t, b, 1.0, map[string]float64{"n-heptane": 600, "ethyl acetate": 150}), Pharmaceuticals,
			"07 05 10*"},
		// Silica wet with chloroform: 0.75 L × 1.498 kg/L = 1.12 kg in 2.12 kg,
		// 5.3e5 mg/kg, /20 = 2.6e4 mg/L ≥ 6.0 mg/L: D022 possible (rule of 20,
		// SW-846 Method 1311, from memory).
		{"silica wet with chloroform", wet(t, b, 1.0, map[string]float64{"chloroform": 750}), Pharmaceuticals,
			"07 05 09*, D022"},
		// A trace: 0.05 mL chloroform (75 mg) on 1 kg silica is 75 mg/kg, /20
		// = 3.7 mg/L < 6.0 mg/L: cannot fail the TCLP, no D022.
		{"silica with a trace of chloroform", wet(t, b, 1.0, map[string]float64{"chloroform": 0.05}), Pharmaceuticals,
			"07 05 09*"},
	}
	for _, c := range cases {
		got := Classify(c.stream, b, c.sector)
		if got.CodeList() != c.want {
			t.Errorf("%s: codes %q, want %q\nrules:\n  %s\nproblems: %v", c.name, got.CodeList(), c.want, strings.Join(got.Rules, "\n  "), got.Problems)
		}
		if len(got.Problems) > 0 {
			t.Errorf("%s: unexpected problems %v", c.name, got.Problems)
		}
		checkClassification(t, c.name, got)
	}
}

// checkClassification guards what every classification must hold: the EHS
// caution, and for every code a source and a mark.
func checkClassification(t *testing.T, name string, c Classification) {
	t.Helper()
	if c.Caution != Caution || !strings.Contains(c.Caution, "EHS") {
		t.Errorf("%s: caution %q, want the EHS caution", name, c.Caution)
	}
	if len(c.Rules) == 0 {
		t.Errorf("%s: no rules recorded", name)
	}
	for _, k := range c.Codes {
		if k.Source == "" || k.Title == "" {
			t.Errorf("%s: code %s without title or source", name, k.Code)
		}
		if k.Mark != source.Confirmed && k.Mark != source.FromMemory {
			t.Errorf("%s: code %s mark %q", name, k.Code, k.Mark)
		}
		if k.Scheme != SchemeEU && k.Scheme != SchemeUS {
			t.Errorf("%s: code %s scheme %q", name, k.Code, k.Scheme)
		}
	}
}

// TestD001FlashLimit checks the flash-point threshold of 40 CFR
// 261.21(a)(1), "flash point less than 60 °C (140 °F)" (read): a liquid at
// exactly 60 °C is not ignitable, one at 59.9 °C is. The boundary solvents
// are copies of 1-butanol with the flash point set (test data); DMF (58 °C)
// and DMSO (89 °C; safety data sheets, from memory) fall either side.
func TestD001FlashLimit(t *testing.T) {
	t.Parallel()
	b := testBook(t)
	base, _ := b.Find("1-butanol")
	for _, c := range []struct {
		id    string
		flash float64 // °C
		want  bool
	}{
		{"test solvent at 60.0 c", 60.0, false},
		{"test solvent at 59.9 c", 59.9, true},
	} {
		s := base
		s.ID, s.Aliases, s.CAS = c.id, nil, ""
		s.FlashPoint.V = degC(c.flash)
		if err := b.Add(s); err != nil {
			t.Fatal(err)
		}
	}
	for _, c := range []struct {
		id   string
		want bool
	}{
		{"test solvent at 60.0 c", false},
		{"test solvent at 59.9 c", true},
		{"DMF", true},
		{"DMSO", false},
	} {
		got := Classify(liquid(t, b, usage.NonHalogenated, map[string]float64{c.id: 100}), b, Pharmaceuticals)
		if got.Has("D001") != c.want {
			t.Errorf("%s: D001 = %v, want %v (40 CFR 261.21(a)(1): below 60 °C)", c.id, got.Has("D001"), c.want)
		}
	}
}

// TestAlcoholExclusion checks the boundary of 40 CFR 261.21(a)(1): an
// aqueous solution with "less than 24 percent alcohol by volume" is
// excluded (read); 24.0 % is not less than 24 %.
func TestAlcoholExclusion(t *testing.T) {
	t.Parallel()
	b := testBook(t)
	for _, c := range []struct {
		ethanolML float64
		want      bool
	}{{239, false}, {240, true}} {
		got := Classify(liquid(t, b, usage.Aqueous, map[string]float64{"ethanol": c.ethanolML, "water": 1000 - c.ethanolML}), b, Pharmaceuticals)
		if got.Has("D001") != c.want {
			t.Errorf("%.1f %% ethanol by volume in water: D001 = %v, want %v", c.ethanolML/10, got.Has("D001"), c.want)
		}
	}
	// Ethyl acetate is no alcohol: 5 % in water is not excluded (read as
	// "alcohol" only; taken as ignitable pending a closed-cup test).
	got := Classify(liquid(t, b, usage.Aqueous, map[string]float64{"ethyl acetate": 50, "water": 950}), b, Pharmaceuticals)
	if !got.Has("D001") {
		t.Errorf("5 %% ethyl acetate in water: D001 not suggested; the alcohol exclusion covers alcohols only")
	}
}

// TestMixtureThreshold checks the "ten percent or more (by volume)" of 40
// CFR 261.31(a) F002 (read) at the boundary.
func TestMixtureThreshold(t *testing.T) {
	t.Parallel()
	b := testBook(t)
	for _, c := range []struct {
		dcmML float64
		want  bool
	}{{99.9, false}, {100, true}} {
		got := Classify(liquid(t, b, usage.Halogenated, map[string]float64{"dichloromethane": c.dcmML, "n-heptane": 1000 - c.dcmML}), b, Pharmaceuticals)
		if got.Has("F002") != c.want {
			t.Errorf("%.2f %% dichloromethane by volume: F002 = %v, want %v", c.dcmML/10, got.Has("F002"), c.want)
		}
	}
}

// TestBlends checks that each blend is judged on its before-use
// composition (40 CFR 261.31(a): "containing, before use") and the stream
// then by the mixture rule (261.3(a)(2), from memory).
func TestBlends(t *testing.T) {
	t.Parallel()
	b := testBook(t)
	// A neat heptane flush (500 mL) and a step of 20 % dichloromethane in
	// heptane (400 mL) in one container: 80 mL in 900 mL is 8.9 % after use,
	// below 10 %, but the second blend held 20 % before use: F002.
	s := liquid(t, b, usage.Halogenated, map[string]float64{"n-heptane": 820, "dichloromethane": 80})
	if got := Classify(s, b, Pharmaceuticals); got.Has("F002") {
		t.Errorf("combined stream at 8.9 %% dichloromethane: F002 suggested without blends: %s", got.CodeList())
	}
	blends := []Blend{
		{Name: "flush: heptane", Parts: map[string]float64{"heptane": 500}},
		{Name: "step 2: 20 % DCM in heptane", Parts: map[string]float64{"DCM": 0.2, "heptane": 0.8}},
	}
	got := ClassifyBlends(s, b, Pharmaceuticals, blends)
	if got.CodeList() != "07 05 03*, F002, D001" {
		t.Errorf("with blends: %s, want 07 05 03*, F002, D001\n  %s", got.CodeList(), strings.Join(got.Rules, "\n  "))
	}
	// A neat ethyl acetate rinse (F003: only F003 solvent) mixed with
	// heptane/ethyl acetate eluent (not F003): the container stays
	// ignitable, so it is F003 by the mixture rule for wastes listed for
	// ignitability only (261.3(a)(2)(iii), as applied in the EPA letter of
	// 4 Nov 1992).
	s = liquid(t, b, usage.NonHalogenated, map[string]float64{"n-heptane": 800, "ethyl acetate": 300})
	got = ClassifyBlends(s, b, Pharmaceuticals, []Blend{
		{Name: "eluent", Parts: map[string]float64{"n-heptane": 800, "ethyl acetate": 200}},
		{Name: "rinse", Parts: map[string]float64{"ethyl acetate": 100}},
	})
	if got.CodeList() != "07 05 04*, F003, D001" {
		t.Errorf("eluent plus neat rinse: %s, want 07 05 04*, F003, D001", got.CodeList())
	}
	// A solvent in the stream but in no blend is reported.
	got = ClassifyBlends(s, b, Pharmaceuticals, []Blend{{Name: "eluent", Parts: map[string]float64{"n-heptane": 1}}})
	if len(got.Problems) == 0 || !strings.Contains(strings.Join(got.Problems, " "), "ethyl acetate") {
		t.Errorf("ethyl acetate in no blend: problems %v", got.Problems)
	}
}

// TestProblems checks that inputs that cannot be used are reported by name,
// never silently dropped.
func TestProblems(t *testing.T) {
	t.Parallel()
	b := testBook(t)
	s := usage.Stream{Name: "spent eluent", Class: usage.NonHalogenated, Components: []usage.Component{
		{Name: "ethyl acetate", Kg: 0.9, Solvent: true},
		{Name: "mystery solvent", Kg: 0.1, Solvent: true},
		{Name: "impurities", Kg: -1},
	}}
	got := Classify(s, b, Pharmaceuticals)
	all := strings.Join(got.Problems, "\n")
	for _, want := range []string{"mystery solvent", "impurities", "spent eluent"} {
		if !strings.Contains(all, want) {
			t.Errorf("problems do not name %q:\n%s", want, all)
		}
	}
	checkClassification(t, "problem stream", got)
	// No book at all: every solvent is unknown, the caution still holds.
	got = Classify(s, nil, Pharmaceuticals)
	if len(got.Problems) == 0 {
		t.Errorf("nil book: no problems reported")
	}
	checkClassification(t, "nil book", got)
	// An empty stream.
	got = Classify(usage.Stream{Name: "empty", Class: usage.Aqueous}, b, Pharmaceuticals)
	if len(got.Problems) == 0 {
		t.Errorf("empty stream: no problems reported")
	}
}

func TestParseSector(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		in   string
		want Sector
	}{{"pharmaceuticals", Pharmaceuticals}, {"07 05", Pharmaceuticals}, {"Fine Chemicals", FineChemicals}, {"0707", FineChemicals}} {
		got, err := ParseSector(c.in)
		if err != nil || got != c.want {
			t.Errorf("ParseSector(%q) = %v, %v; want %v", c.in, got, err, c.want)
		}
	}
	if _, err := ParseSector("dyes"); err == nil || !strings.Contains(err.Error(), "07 05") {
		t.Errorf("ParseSector(\"dyes\") error %v; want one naming the valid sectors", err)
	}
}

// TestSources checks the Sources sheet lines: unique keys, a source and a
// mark each, and a line for every code Classify can suggest.
func TestSources(t *testing.T) {
	t.Parallel()
	list := Sources()
	keys := map[string]source.Coefficient{}
	for _, c := range list {
		if !strings.HasPrefix(c.Key, "waste.") || c.Source == "" || c.Label == "" || c.Mark == "" {
			t.Errorf("bad source line %+v", c)
		}
		if _, dup := keys[c.Key]; dup {
			t.Errorf("duplicate key %s", c.Key)
		}
		keys[c.Key] = c
	}
	source.NewSet(list) // panics on duplicates
	for _, s := range []Sector{Pharmaceuticals, FineChemicals} {
		for _, e := range euEntries {
			k := "waste.eu." + strings.NewReplacer(" ", "", "*", "").Replace(e.code(s).Code)
			if _, ok := keys[k]; !ok {
				t.Errorf("no source line %s", k)
			}
		}
	}
	for _, k := range []string{"waste.us.f002", "waste.us.f003", "waste.us.f005", "waste.us.d001", "waste.us.d022"} {
		if _, ok := keys[k]; !ok {
			t.Errorf("no source line %s", k)
		}
	}
	// D022 level 6.0 mg/L (40 CFR 261.24 Table 1, read), stored in SI.
	if got := keys["waste.us.d022"].Display(); got != 6.0 {
		t.Errorf("D022 level %g mg/L, want 6.0", got)
	}
	// D001 limit 60 °C (261.21(a)(1), read).
	if got := keys["waste.us.flash_limit"].Display(); got < 59.999 || got > 60.001 {
		t.Errorf("flash limit %g °C, want 60", got)
	}
}
