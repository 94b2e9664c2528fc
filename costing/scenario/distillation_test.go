package scenario

import (
	"math"
	"strings"
	"testing"
)

const goodDistil = `name: distil test
masses: ["20 g", "2 kg"]
crude:
  purity: 0.85
distillation:
  product:
    name: ester 9
    boiling_point: "205 C"
    molar_mass: "178 g/mol"
  impurity:
    solvent: toluene
  target_purity: "98 %"
  max_pot_temperature: "150 C"
  best_vacuum: "1 mbar"
  column_stages: 8
  reflux_multiple: 1.5
  still_sizes: ["1 L", "250 mL", "5 L"]
  fill_limit: "50 %"
`

func TestDistillationGood(t *testing.T) {
	t.Parallel()
	s, err := Load(strings.NewReader(goodDistil), "d.yaml")
	if err != nil {
		t.Fatal(err)
	}
	d := s.Distillation
	if d == nil {
		t.Fatal("no distillation section")
	}
	// Unit conversions: SI Brochure (2019) 0 °C = 273.15 K; 1 mbar = 100 Pa.
	checks := []struct {
		name      string
		got, want float64
	}{
		{"product bp", d.Product.Data.BoilingPoint.V, 478.15},
		{"product molar mass", d.Product.MolarMass, 0.178},
		{"feed purity from crude", d.FeedPurity, 0.85},
		{"target", d.TargetPurity, 0.98},
		{"pot limit", d.MaxPotK, 423.15},
		{"vacuum", d.BestVacuumPa, 100},
		{"stages", d.ColumnStages, 8},
		{"reflux multiple", d.RefluxMultiple, 1.5},
		{"fill", d.FillLimit, 0.5},
		{"smallest still", d.StillsM3[0], 250e-6},
		{"largest still", d.StillsM3[2], 5e-3},
	}
	for _, c := range checks {
		if math.Abs(c.got-c.want) > 1e-9*math.Abs(c.want) {
			t.Errorf("%s = %v, want %v", c.name, c.got, c.want)
		}
	}
	if !d.FeedFromCrude || d.Impurity.Solvent != "toluene" || d.Impurity.Data.BoilingPoint.V == 0 || d.Product.HVapGiven || !d.Impurity.HVapGiven {
		t.Errorf("compounds: %+v / %+v", d.Product, d.Impurity)
	}
	if got := strings.Join(d.Solvents(), ","); got != "acetone,toluene" {
		t.Errorf("Solvents() = %q, want acetone (rinse) and toluene", got)
	}
	var said bool
	for _, in := range s.Inputs {
		if in.Field == "distillation.feed_purity" && strings.Contains(in.Meaning, "key impurity") {
			said = true
		}
	}
	if !said {
		t.Error("the Inputs must say that the rest of the crude is taken as the key impurity")
	}
	// An Antoine-described compound without a boiling point gets one from
	// the constants: toluene's NIST set (A 4.07827, B 1343.943, C −53.773;
	// NIST Chemistry WebBook, from memory) gives 110.6 °C (CRC, from memory), 0.5 K.
	y := strings.Replace(goodDistil, "    solvent: toluene\n", "    antoine: {a: 4.07827, b: 1343.943, c: -53.773, t_min: \"308.52 K\", t_max: \"384.66 K\"}\n", 1)
	s, err = Load(strings.NewReader(y), "d.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if tb := s.Distillation.Impurity.Data.BoilingPoint.V - 273.15; math.Abs(tb-110.6) > 0.5 {
		t.Errorf("boiling point from Antoine = %.2f °C, want 110.6", tb)
	}
	if s.Distillation.Impurity.MolarMass != 0 {
		t.Error("the impurity's molar mass stays unset for the model to default")
	}
}

// Bad input: each case names the file, the line, the field and what is valid.
func TestDistillationBad(t *testing.T) {
	t.Parallel()
	rep := func(old, new string) string {
		if !strings.Contains(goodDistil, old) {
			t.Fatalf("fixture lacks %q", old)
		}
		return strings.Replace(goodDistil, old, new, 1)
	}
	cases := []struct {
		name, yaml string
		want       []string
	}{
		{"equal boiling points", rep("    solvent: toluene\n", "    boiling_point: \"205 C\"\n"), []string{"d.yaml:11:", "distillation.impurity.boiling_point", "same temperature"}},
		{"same solvent", rep("    name: ester 9\n    boiling_point: \"205 C\"\n    molar_mass: \"178 g/mol\"\n", "    solvent: PhMe\n"), []string{"distillation.impurity", "same solvent"}},
		{"zero pressure", rep(`"1 mbar"`, `"0 mbar"`), []string{"d.yaml:14:", "distillation.best_vacuum", "above 0 and at most 1 atm"}},
		{"negative pressure", rep(`"1 mbar"`, `"-3 Torr"`), []string{"d.yaml:14:", "distillation.best_vacuum", "above 0"}},
		{"pressure above 1 atm", rep(`"1 mbar"`, `"2 bar"`), []string{"distillation.best_vacuum", "at most 1 atm"}},
		{"pressure without unit", rep(`"1 mbar"`, `1`), []string{"distillation.best_vacuum", "has no unit", "mbar"}},
		{"target 100 %", rep(`"98 %"`, `"100 %"`), []string{"d.yaml:12:", "distillation.target_purity", "below 1"}},
		{"target above 1", rep(`"98 %"`, `1.2`), []string{"d.yaml:12:", "distillation.target_purity", "below 1"}},
		{"target below feed", rep(`"98 %"`, `"80 %"`), []string{"d.yaml:12:", "distillation.target_purity", "not above the feed purity"}},
		{"target equals feed", rep(`"98 %"`, `0.85`), []string{"distillation.target_purity", "not above the feed purity"}},
		{"reflux below minimum", rep("reflux_multiple: 1.5", "reflux_multiple: 0.8"), []string{"d.yaml:16:", "distillation.reflux_multiple", "from 1 to 100"}},
		{"reflux not a number", rep("reflux_multiple: 1.5", "reflux_multiple: lots"), []string{"distillation.reflux_multiple", "not a number"}},
		{"unknown compound", rep("solvent: toluene", "solvent: unobtainium"), []string{"d.yaml:11:", "distillation.impurity.solvent", "unknown compound", "known solvents:", "boiling_point"}},
		{"solvent and properties", rep("    solvent: toluene\n", "    solvent: toluene\n    boiling_point: \"110 C\"\n"), []string{"distillation.impurity", "either"}},
		{"no data", rep("    solvent: toluene\n", "    name: tar\n"), []string{"distillation.impurity", "boiling point", "Antoine"}},
		{"product molar mass missing", rep("    molar_mass: \"178 g/mol\"\n", ""), []string{"distillation.product.molar_mass", "missing"}},
		{"missing impurity", rep("  impurity:\n    solvent: toluene\n", ""), []string{"d.yaml:5:", "distillation.impurity", "missing"}},
		{"missing pot limit", rep("  max_pot_temperature: \"150 C\"\n", ""), []string{"distillation.max_pot_temperature", "missing", "DSC"}},
		{"pot limit without unit", rep(`"150 C"`, `150`), []string{"d.yaml:13:", "distillation.max_pot_temperature", "has no unit"}},
		{"negative stages", rep("column_stages: 8", "column_stages: -2"), []string{"d.yaml:15:", "distillation.column_stages", "0 to"}},
		{"zero fill", rep(`"50 %"`, `0`), []string{"distillation.fill_limit", "above 0"}},
		{"bad still", rep(`"250 mL"`, `"250 g"`), []string{"distillation.still_sizes[1]", "not volume"}},
		{"unknown field", rep("  fill_limit:", "  colour: blue\n  fill_limit:"), []string{"distillation.colour", "not a known field", "target_purity"}},
		{"antoine range empty", rep("    solvent: toluene\n", "    antoine: {a: 4.07827, b: 1343.943, c: -53.773, t_min: \"400 K\", t_max: \"300 K\"}\n"), []string{"distillation.impurity.antoine.t_max", "t_min below t_max"}},
		{"antoine in celsius", rep("    solvent: toluene\n", "    antoine: {a: 4.07827, b: 1343.943, c: -273.773, t_min: \"250 K\", t_max: \"384.66 K\"}\n"), []string{"distillation.impurity.antoine.c", "pole"}},
		{"azeotrope at an end", rep("  fill_limit:", "  azeotrope: {product_fraction: 1}\n  fill_limit:"), []string{"distillation.azeotrope.product_fraction", "strictly between"}},
		{"unknown rinse", rep("  fill_limit:", "  rinse_solvent: mead\n  fill_limit:"), []string{"distillation.rinse_solvent", "unknown solvent"}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			expectProblems(t, c.yaml, "d.yaml", c.want)
		})
	}
}
