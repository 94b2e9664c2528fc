package scenario

import (
	"math"
	"strings"
	"testing"

	"sepcost/costing/solubility"
)

const crystGood = `name: cryst case
masses: ["250 mg", "2 kg"]
crude:
  purity: 0.85
crystallization:
  solvent: ethanol
  product:
    solubility: {"0 C": "15 g/L", "75 C": "160 g/L"}
    molar_mass: "241.3 g/mol"
  impurity:
    solubility: {"0 C": "25 g/L", "75 C": "120 g/L"}
    fraction: 0.10
  dissolve_at: "75 C"
  isolate_at: "0 C"
  target_purity: 0.99
  excess_solvent: "10 %"
  wash_cake_volumes: 2
  second_crop: {concentrate_to: "30 %", purity: 0.97}
  screening_time: "8 h"
  screening_material: "2 g"
  vessels:
    flasks: ["1 L", "250 mL"]
    reactors: ["20 L"]
    fill_limit: 0.7
`

func TestLoadCrystallization(t *testing.T) {
	t.Parallel()
	s, err := Load(strings.NewReader(crystGood), "good.yaml")
	if err != nil {
		t.Fatal(err)
	}
	c := s.Crystallization
	if c == nil {
		t.Fatal("no crystallization")
	}
	if len(c.Mix) != 1 || c.Mix[0].Solvent != "ethanol" || c.AntiSolvent != "" {
		t.Errorf("mix %v", c.Mix)
	}
	// Ethanol boils at 78.5 °C (National Academies of Sciences, "Chemical
	// Laboratory Safety and Security", 2016, Appendix D); the built-in
	// value is used as is.
	eth, _ := s.Solvents.Find("ethanol")
	if c.BoilingK != eth.BoilingPoint.V || math.Abs(c.BoilingK-351.65) > 0.5 {
		t.Errorf("boiling point %.2f K", c.BoilingK)
	}
	// The fitted curve passes through both points (two points: exact).
	for _, p := range []solubility.Point{{T: 273.15, S: 15}, {T: 348.15, S: 160}} {
		if got := c.Product.Curve.At(p.T); math.Abs(got/p.S-1) > 1e-12 {
			t.Errorf("product S(%.2f K) = %v, input %v", p.T, got, p.S)
		}
	}
	if !c.Product.Curve.Measured() || c.ImpurityByPurge || math.Abs(c.ImpurityFraction-0.10) > 1e-12 {
		t.Errorf("product/impurity: %+v", c)
	}
	if math.Abs(c.Product.MolarMass-0.2413) > 1e-12 || c.DissolveK != 348.15 || c.IsolateK != 273.15 || c.TargetPurity != 0.99 {
		t.Errorf("values: M %v, T %v %v, target %v", c.Product.MolarMass, c.DissolveK, c.IsolateK, c.TargetPurity)
	}
	if *c.Excess != 0.10 || *c.WashCakeVolumes != 2 || c.WashFraction != nil || c.WashLoss != nil {
		t.Errorf("excess/wash: %v %v %v %v", *c.Excess, *c.WashCakeVolumes, c.WashFraction, c.WashLoss)
	}
	if c.SecondCrop == nil || math.Abs(c.SecondCrop.ConcentrateTo-0.3) > 1e-12 || c.SecondCrop.Purity != 0.97 {
		t.Errorf("second crop %+v", c.SecondCrop)
	}
	if *c.ScreeningS != 8*3600 || math.Abs(*c.ScreeningKg-0.002) > 1e-15 {
		t.Errorf("screening %v s, %v kg", *c.ScreeningS, *c.ScreeningKg)
	}
	if len(c.FlasksM3) != 2 || c.FlasksM3[0] != 250e-6 || c.FlasksM3[1] != 1e-3 || len(c.ReactorsM3) != 1 || *c.FillLimit != 0.7 {
		t.Errorf("vessels %v %v %v", c.FlasksM3, c.ReactorsM3, c.FillLimit)
	}
	if got := c.Solvents(); len(got) != 1 || got[0] != "ethanol" {
		t.Errorf("Solvents() = %v", got)
	}
	// Every field is echoed for the Inputs sheet.
	seen := map[string]bool{}
	for _, in := range s.Inputs {
		seen[in.Field] = true
	}
	for _, f := range []string{"crystallization.solvent", "crystallization.dissolve_at", "crystallization.product.solubility[0 C]", "crystallization.impurity.fraction", "crystallization.second_crop", "crystallization.vessels.fill_limit", "crystallization.screening_time"} {
		if !seen[f] {
			t.Errorf("input %s not echoed", f)
		}
	}
}

// A solvent/anti-solvent pair, an ideal-solubility estimate for the
// product and a purge factor for the impurity.
func TestLoadCrystallizationIdealAntiSolvent(t *testing.T) {
	t.Parallel()
	y := strings.NewReplacer(
		"  solvent: ethanol\n", "  solvent: ethanol\n  anti_solvent: water\n  anti_solvent_fraction: \"30 %\"\n",
		`    solubility: {"0 C": "15 g/L", "75 C": "160 g/L"}
    molar_mass: "241.3 g/mol"`, `    melting_point: "165 C"
    enthalpy_of_fusion: "28 kJ/mol"
    molar_mass: "241.3 g/mol"
    activity_factor: 2`,
		`    solubility: {"0 C": "25 g/L", "75 C": "120 g/L"}`, `    purge_factor: "85 %"`,
	).Replace(crystGood)
	s, err := Load(strings.NewReader(y), "ideal.yaml")
	if err != nil {
		t.Fatal(err)
	}
	c := s.Crystallization
	if got := c.Solvents(); len(got) != 2 || got[0] != "ethanol" || got[1] != "water" {
		t.Errorf("Solvents() = %v", got)
	}
	if c.Mix[0].Fraction != 0.7 || c.Mix[1].Fraction != 0.3 {
		t.Errorf("mix %v", c.Mix)
	}
	if !c.ImpurityByPurge || c.PurgeFactor != 0.85 || c.Impurity.Curve.Defined() {
		t.Errorf("impurity: purge %v %v", c.ImpurityByPurge, c.PurgeFactor)
	}
	// Ideal estimate: x = x_ideal/γ converted with the pair's molar density
	// n = Σ φ ρ/M (derived, solubility package).
	eth, _ := s.Solvents.Find("ethanol")
	wat, _ := s.Solvents.Find("water")
	n := 0.7*eth.Density.V/eth.MolarMass() + 0.3*wat.Density.V/wat.MolarMass()
	x := solubility.IdealMoleFraction(348.15, 438.15, 28000) / 2
	if want := x / (1 - x) * n * 0.2413; math.Abs(c.Product.Curve.At(348.15)/want-1) > 1e-12 {
		t.Errorf("ideal S = %v, want %v", c.Product.Curve.At(348.15), want)
	}
	// The pair boils between its components, at its ideal bubble point:
	// Σ x_i p_i(T) = 1 atm (Raoult's law; derived).
	if !(c.BoilingK > eth.BoilingPoint.V && c.BoilingK < wat.BoilingPoint.V) {
		t.Errorf("bubble point %.2f K outside %.2f–%.2f", c.BoilingK, eth.BoilingPoint.V, wat.BoilingPoint.V)
	}
	xe := 0.7 * eth.Density.V / eth.MolarMass() / n
	pe, _ := eth.VaporPressure(c.BoilingK)
	pw, _ := wat.VaporPressure(c.BoilingK)
	if p := xe*pe + (1-xe)*pw; math.Abs(p/101325-1) > 1e-6 {
		t.Errorf("Σ x p = %.1f Pa at the bubble point", p)
	}
}

// Bad input: each case must name the file, the line, the field and what
// is valid.
func TestLoadCrystallizationBad(t *testing.T) {
	t.Parallel()
	replace := func(old, new string) string {
		if !strings.Contains(crystGood, old) {
			t.Fatalf("fixture lacks %q", old)
		}
		return strings.Replace(crystGood, old, new, 1)
	}
	prodSol := `    solubility: {"0 C": "15 g/L", "75 C": "160 g/L"}`
	cases := []struct {
		name, yaml string
		want       []string
	}{
		{"hot not above cold", replace(prodSol, `    solubility: {"0 C": "160 g/L", "75 C": "15 g/L"}`),
			[]string{"bad.yaml:8:", "crystallization.product.solubility", "is not above that at isolate_at", "rises with temperature"}},
		{"equal solubilities", replace(prodSol, `    solubility: {"0 C": "15 g/L", "75 C": "15 g/L"}`),
			[]string{"bad.yaml:8:", "is not above"}},
		{"dissolve above boiling point", replace(`dissolve_at: "75 C"`, `dissolve_at: "90 C"`),
			[]string{"bad.yaml:13:", "crystallization.dissolve_at", "above the boiling point of 100 % ethanol (about 78.", "at or below it"}},
		{"purity above 1", replace("target_purity: 0.99", "target_purity: 1.2"),
			[]string{"bad.yaml:15:", "crystallization.target_purity", "outside the valid range", "at most 1"}},
		{"purity not above crude", replace("target_purity: 0.99", "target_purity: 0.8"),
			[]string{"bad.yaml:15:", "not above the crude's purity"}},
		{"anti-solvent fraction above 1", replace("  solvent: ethanol\n", "  solvent: ethanol\n  anti_solvent: water\n  anti_solvent_fraction: 1.5\n"),
			[]string{"bad.yaml:8:", "crystallization.anti_solvent_fraction", "outside the valid range", "above 0 and below 1"}},
		{"anti-solvent fraction zero", replace("  solvent: ethanol\n", "  solvent: ethanol\n  anti_solvent: water\n  anti_solvent_fraction: 0\n"),
			[]string{"bad.yaml:8:", "anti_solvent_fraction", "outside 0–1"}},
		{"anti-solvent fraction alone", replace("  solvent: ethanol\n", "  solvent: ethanol\n  anti_solvent_fraction: 0.2\n"),
			[]string{"bad.yaml:7:", "anti_solvent_fraction", "without anti_solvent"}},
		{"anti-solvent missing fraction", replace("  solvent: ethanol\n", "  solvent: ethanol\n  anti_solvent: water\n"),
			[]string{"bad.yaml:7:", "anti_solvent_fraction", "missing"}},
		{"negative screening hours", replace(`screening_time: "8 h"`, `screening_time: "-3 h"`),
			[]string{"bad.yaml:19:", "crystallization.screening_time", "negative", "zero or more"}},
		{"negative screening mass", replace(`screening_material: "2 g"`, `screening_material: "-2 g"`),
			[]string{"bad.yaml:20:", "crystallization.screening_material", "negative"}},
		{"bare number temperature", replace(`dissolve_at: "75 C"`, `dissolve_at: 75`),
			[]string{"bad.yaml:13:", "crystallization.dissolve_at", "has no unit", `"25 C"`}},
		{"bare number solubility", replace(prodSol, `    solubility: {"0 C": 15, "75 C": "160 g/L"}`),
			[]string{"bad.yaml:8:", "crystallization.product.solubility[0 C]", "has no unit", "g/mL"}},
		{"bare number solubility temperature", replace(prodSol, `    solubility: {0: "15 g/L", "75 C": "160 g/L"}`),
			[]string{"bad.yaml:8:", "crystallization.product.solubility[0]", "has no unit", "temperature"}},
		{"bare number screening time", replace(`screening_time: "8 h"`, `screening_time: 8`),
			[]string{"bad.yaml:19:", "screening_time", "has no unit", `"2 h"`}},
		{"solubility as mass", replace(prodSol, `    solubility: {"0 C": "15 g", "75 C": "160 g/L"}`),
			[]string{"bad.yaml:8:", "solubility[0 C]", "is mass, not density"}},
		{"one point", replace(prodSol, `    solubility: {"0 C": "15 g/L"}`),
			[]string{"bad.yaml:8:", "crystallization.product.solubility", "two or more"}},
		{"points and melting data", replace(prodSol, prodSol+"\n    melting_point: \"150 C\""),
			[]string{"bad.yaml:9:", "crystallization.product", "not both"}},
		{"ideal without molar mass", replace(prodSol+"\n    molar_mass: \"241.3 g/mol\"", "    melting_point: \"150 C\"\n    enthalpy_of_fusion: \"25 kJ/mol\""),
			[]string{"bad.yaml:7:", "crystallization.product.molar_mass", "missing"}},
		{"dissolve above melting point", replace(prodSol, "    melting_point: \"70 C\"\n    enthalpy_of_fusion: \"25 kJ/mol\""),
			[]string{"bad.yaml:14:", "crystallization.dissolve_at", "melting point", "oil out"}},
		{"bad activity factor", replace(prodSol, "    melting_point: \"150 C\"\n    enthalpy_of_fusion: \"25 kJ/mol\"\n    activity_factor: -1"),
			[]string{"bad.yaml:10:", "activity_factor", "above 0"}},
		{"missing product", replace(prodSol+"\n    molar_mass: \"241.3 g/mol\"\n", "    molar_mass: \"241.3 g/mol\"\n"),
			[]string{"bad.yaml:7:", "crystallization.product.solubility", "missing"}},
		{"purge and solubility", replace("    fraction: 0.10", "    fraction: 0.10\n    purge_factor: 0.8"),
			[]string{"bad.yaml:13:", "crystallization.impurity.purge_factor", "not both"}},
		{"purge factor above 1", replace(`    solubility: {"0 C": "25 g/L", "75 C": "120 g/L"}`, "    purge_factor: 1.5"),
			[]string{"bad.yaml:11:", "purge_factor", "from 0 to 1"}},
		{"impurity fraction too large", replace("fraction: 0.10", "fraction: 0.3"),
			[]string{"bad.yaml:12:", "crystallization.impurity.fraction", "at most 1 − purity"}},
		{"product fraction", replace("    molar_mass: \"241.3 g/mol\"", "    molar_mass: \"241.3 g/mol\"\n    fraction: 0.2"),
			[]string{"bad.yaml:10:", "crystallization.product.fraction", "only the impurity"}},
		{"isolate not below dissolve", replace(`isolate_at: "0 C"`, `isolate_at: "80 C"`),
			[]string{"bad.yaml:14:", "crystallization.isolate_at", "not below dissolve_at"}},
		{"wash both ways", replace("wash_cake_volumes: 2", "wash_cake_volumes: 2\n  wash_fraction: 0.2"),
			[]string{"bad.yaml:18:", "crystallization.wash_fraction", "not both"}},
		{"unknown solvent", replace("solvent: ethanol", "solvent: unobtainium"),
			[]string{"bad.yaml:6:", "crystallization.solvent", "unknown solvent", "known solvents:"}},
		{"unknown field", replace("  solvent: ethanol\n", "  solvent: ethanol\n  colour: blue\n"),
			[]string{"bad.yaml:7:", "crystallization.colour", "not a known field", "dissolve_at"}},
		{"second crop without purity", replace(`{concentrate_to: "30 %", purity: 0.97}`, `{concentrate_to: "30 %"}`),
			[]string{"bad.yaml:18:", "crystallization.second_crop.purity", "missing"}},
		{"fill limit zero", replace("fill_limit: 0.7", "fill_limit: 0"),
			[]string{"bad.yaml:24:", "crystallization.vessels.fill_limit", "above 0"}},
		{"missing target", replace("  target_purity: 0.99\n", ""),
			[]string{"bad.yaml:5:", "crystallization.target_purity", "missing"}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			expectProblems(t, c.yaml, "bad.yaml", c.want)
		})
	}
}

func TestSolventsNil(t *testing.T) {
	t.Parallel()
	var c *Crystallization
	if c.Solvents() != nil {
		t.Error("nil crystallization lists no solvents")
	}
}

// The crystallization reader never panics, and what it accepts is usable:
// finite temperatures and solubilities that rise from cold to hot.
func FuzzLoadCrystallization(f *testing.F) {
	f.Add(crystGood)
	f.Add(strings.Replace(crystGood, `{"0 C": "15 g/L", "75 C": "160 g/L"}`, `{"1e308 C": "1e308 g/L", "-300 C": "0 g/L"}`, 1))
	f.Add(strings.Replace(crystGood, "  solvent: ethanol\n", "  solvent: ethanol\n  anti_solvent: toluene\n  anti_solvent_fraction: 0.5\n", 1))
	f.Fuzz(func(t *testing.T, s string) {
		sc, err := Load(strings.NewReader(s), "fuzz.yaml")
		if err != nil || sc.Crystallization == nil {
			return
		}
		c := sc.Crystallization
		hot, cold := c.Product.Curve.At(c.DissolveK), c.Product.Curve.At(c.IsolateK)
		if !(hot > cold) || !(cold > 0) || math.IsInf(hot, 0) || !(c.DissolveK > c.IsolateK) {
			t.Fatalf("accepted S(hot) %v, S(cold) %v at %v K / %v K", hot, cold, c.DissolveK, c.IsolateK)
		}
	})
}
