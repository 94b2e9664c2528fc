package distil

import (
	"math"
	"strings"
	"testing"

	"sepcost/costing/scenario"
	"sepcost/costing/solvent"
	"sepcost/costing/source"
	"sepcost/costing/usage"
)

func relErr(got, want float64) float64 { return math.Abs(got/want - 1) }

func builtin(t *testing.T, id string) solvent.Solvent {
	t.Helper()
	s, ok := solvent.Builtin().Find(id)
	if !ok {
		t.Fatalf("built-in solvent %q not found", id)
	}
	return s
}

// load reads a scenario from YAML text; the test fails on any problem.
func load(t *testing.T, y string) *scenario.Scenario {
	t.Helper()
	sc, err := scenario.Load(strings.NewReader(y), "test.yaml")
	if err != nil {
		t.Fatalf("scenario: %v", err)
	}
	return sc
}

func coefficients() source.Set { return source.NewSet(Defaults()) }

func figure(t *testing.T, u usage.Usage, key usage.FigureKey) float64 {
	t.Helper()
	f, ok := u.Figure(key)
	if !ok {
		t.Fatalf("figure %q missing (feasible %v: %s)", key, u.Feasible, u.Reason)
	}
	return f.SI
}

// A scenario with an invented product (boiling point 205 °C) and a heavier
// key impurity (235 °C), a pot limit of 150 °C and an 8-stage column. The
// compound data are invented for the tests (no source); the checks that use
// it are properties, not published values.
const heavyImpurity = `name: test
masses: ["20 g", "2 kg"]
crude:
  purity: 0.85
distillation:
  product:
    name: ester 9
    boiling_point: "205 C"
    molar_mass: "178 g/mol"
    density: "1.05 g/mL"
  impurity:
    name: dimer
    boiling_point: "235 C"
    molar_mass: "356 g/mol"
  target_purity: "98 %"
  max_pot_temperature: "150 C"
  best_vacuum: "1 mbar"
  column_stages: 8
  reflux_multiple: 3
`
