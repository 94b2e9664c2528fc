package distil

import (
	"fmt"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// finite checks that no NaN or infinity reached a figure or a demand, and
// that no demand is negative.
func finite(t *testing.T, u usage.Usage) {
	t.Helper()
	for _, f := range u.Figures {
		if math.IsNaN(f.SI) || math.IsInf(f.SI, 0) {
			t.Errorf("figure %s = %v", f.Key, f.SI)
		}
	}
	for _, d := range u.Demands {
		if math.IsNaN(d.Qty) || math.IsInf(d.Qty, 0) || d.Qty < 0 {
			t.Errorf("demand %s = %v", d.Item, d.Qty)
		}
	}
}

// One feasible run: the figures the method promises are there, the product
// balance closes (in = recovered + fore-run + tails + hold-up + cold trap)
// and so does the mass balance (crude = product cut + every waste stream
// but the rinse). These are identities, checked to 1e-9.
func TestRunBalances(t *testing.T) {
	t.Parallel()
	sc := load(t, heavyImpurity)
	for _, m := range []float64{0.02, 2, 200} {
		u := Run(sc, coefficients(), m)
		if !u.Feasible {
			t.Fatalf("%g kg: infeasible: %s", m, u.Reason)
		}
		finite(t, u)
		for _, k := range []usage.FigureKey{"head_pressure", "pot_pressure", "pot_temperature", "head_temperature", "alpha", "alpha_top", "alpha_bottom",
			"n_min", "r_min", "reflux_used", "stages_needed", "stages_available", "stages_equivalent", "recovery", "product_purity",
			"loss_forerun", "loss_tails", "loss_holdup", "loss_cold_trap", "boilup_rate", "boilup_time", "heat_input", "condenser_duty", "energy",
			"solvent_total_l", "still_volume", "batches"} {
			figure(t, u, k)
		}
		losses := 0.0
		for _, k := range []usage.FigureKey{"loss_forerun", "loss_tails", "loss_holdup", "loss_cold_trap"} {
			losses += figure(t, u, k)
		}
		if e := math.Abs(u.ProductOutKg + losses - u.ProductInKg); e > 1e-9*u.ProductInKg {
			t.Errorf("%g kg: product balance off by %g kg", m, e)
		}
		rinse := 0.0
		for _, w := range u.Waste {
			if w.Name == "still and column rinse" {
				rinse = w.Kg()
			}
		}
		cut := u.ProductOutKg / figure(t, u, "product_purity")
		if e := math.Abs(cut + u.WasteKg() - rinse - m); e > 1e-9*m {
			t.Errorf("%g kg: mass balance off by %g kg", m, e)
		}
		if p := figure(t, u, "product_purity"); p < 0.98-1e-9 {
			t.Errorf("%g kg: purity %.4f below the 98 %% target", m, p)
		}
		if math.Abs(figure(t, u, "pot_temperature")-(150+273.15)) > 0.01 {
			t.Errorf("%g kg: the pot runs at its limit under vacuum, got %.2f °C", m, figure(t, u, "pot_temperature")-273.15)
		}
		for _, d := range u.Demands {
			if d.Item == ItemProduct && math.Abs(d.Qty-(u.ProductInKg-u.ProductOutKg)) > 1e-12 {
				t.Errorf("product-loss demand %g, want %g", d.Qty, u.ProductInKg-u.ProductOutKg)
			}
		}
	}
	// Above the largest still (100 L at 60 %), several batches: 200 kg of a
	// charge of density 1/(0.85/1050 + 0.15/1000) kg/m³ is 0.1928 m³, so
	// ceil(0.1928/0.06) = 4 batches.
	u := Run(sc, coefficients(), 200)
	if b := figure(t, u, "batches"); b != 4 {
		t.Errorf("200 kg: %v batches, want 4", b)
	}
}

// As the purity target rises, recovery falls and the energy per kilogram of
// product recovered rises — for a product distilled over through a column
// and for a product left in the pot by a simple distillation (properties of
// any distillation; no source needed beyond the equations).
func TestPurityTargetProperties(t *testing.T) {
	t.Parallel()
	stripped := strings.NewReplacer(`boiling_point: "235 C"`, `boiling_point: "150 C"`, "column_stages: 8", "column_stages: 0").Replace(heavyImpurity)
	distilled := strings.Replace(heavyImpurity, "column_stages: 8", "column_stages: 15", 1)
	for name, y := range map[string]string{"product distilled over": distilled, "impurity stripped off": stripped} {
		prevRec, prevE := math.Inf(1), 0.0
		for _, target := range []string{"96 %", "97 %", "98 %", "99 %", "99.5 %"} {
			sc := load(t, strings.Replace(y, "98 %", target, 1))
			u := Run(sc, coefficients(), 2)
			if !u.Feasible {
				t.Fatalf("%s at %s: infeasible: %s", name, target, u.Reason)
			}
			rec := figure(t, u, "recovery")
			e := figure(t, u, "energy") / u.ProductOutKg
			if !(rec < prevRec) || !(e > prevE) {
				t.Errorf("%s at %s: recovery %.4f (before %.4f), energy %.4g J/kg (before %.4g)", name, target, rec, prevRec, e, prevE)
			}
			prevRec, prevE = rec, e
		}
	}
}

// Each way the method can fail gives Feasible = false with its reason.
func TestInfeasible(t *testing.T) {
	t.Parallel()
	rep := func(pairs ...string) string { return strings.NewReplacer(pairs...).Replace(heavyImpurity) }
	cases := []struct {
		name, yaml string
		kg         float64
		want       string
	}{
		{"pot above the limit at the best vacuum", rep(`best_vacuum: "1 mbar"`, `best_vacuum: "200 mbar"`), 2, "pot temperature above the limit even at the best vacuum"},
		{"α too close to 1", rep(`"235 C"`, `"206 C"`), 2, "too close to 1"},
		{"more stages than the column has", rep("reflux_multiple: 3", "reflux_multiple: 1.5"), 2, "the column has 8 above the pot"},
		{"minimum reflux", rep("reflux_multiple: 3", "reflux_multiple: 1"), 2, "infinitely many stages"},
		{"simple distillation short of the target", rep("column_stages: 8", "column_stages: 0"), 2, "simple distillation cannot reach"},
		{"azeotrope between feed and target", rep("reflux_multiple: 3", "reflux_multiple: 3\n  azeotrope: {product_fraction: 0.9}"), 2, "cannot cross an azeotrope"},
		{"hold-up swallows a tiny charge", heavyImpurity, 0.00025, "too small a batch"},
		{"impurity stripped to dryness", rep(`"235 C"`, `"150 C"`, "column_stages: 8", "column_stages: 0", "purity: 0.85", "purity: 0.05", "98 %", "99.9 %"), 2, "never distil to dryness"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			u := Run(load(t, c.yaml), coefficients(), c.kg)
			if u.Feasible {
				t.Fatalf("feasible; want a reason with %q", c.want)
			}
			if !strings.Contains(u.Reason, c.want) {
				t.Errorf("reason %q lacks %q", u.Reason, c.want)
			}
			finite(t, u)
		})
	}
}

// The model's operating pressure for water as the less volatile component
// against the steam tables: a pot limit of 60 °C gives 19.946 kPa and of
// 80 °C 47.414 kPa (Source: IAPWS-IF97 saturation tables, from memory;
// IF97 eq. 30 gives 19.9458 and 47.4147). Tolerance 0.3 % (Antoine fit).
func TestOperatingPressureWater(t *testing.T) {
	t.Parallel()
	y := `name: t
masses: ["1 kg"]
crude: {purity: 0.9}
distillation:
  product: {solvent: water}
  impurity: {solvent: acetone}
  target_purity: "99 %"
  max_pot_temperature: "60 C"
  best_vacuum: "10 mbar"
`
	for _, c := range []struct {
		limit string
		kPa   float64
	}{{"60 C", 19.946}, {"80 C", 47.414}} {
		u := Run(load(t, strings.Replace(y, "60 C", c.limit, 1)), coefficients(), 1)
		if p := figure(t, u, "pot_pressure"); relErr(p/1000, c.kPa) > 0.003 {
			t.Errorf("pot limit %s: pot pressure %.4f kPa, steam tables %v kPa", c.limit, p/1000, c.kPa)
		}
		if math.Abs(figure(t, u, "pot_temperature")-units.MustFrom(mustNum(c.limit), "C")) > 0.05 {
			t.Errorf("pot limit %s: pot at %.2f °C", c.limit, figure(t, u, "pot_temperature")-273.15)
		}
	}
}

func mustNum(s string) float64 {
	q, _, err := units.Parse(s)
	if err != nil {
		panic(err)
	}
	return q.SI - 273.15
}

// A user's setting overrides a default: without rinse solvent there is no
// solvent demand and no rinse waste.
func TestSettingOverride(t *testing.T) {
	t.Parallel()
	coef := coefficients()
	if err := coef.Override(KeyRinse, units.Quantity{SI: 0, Dim: units.None}, "0"); err != nil {
		t.Fatal(err)
	}
	u := Run(load(t, heavyImpurity), coef, 2)
	if figure(t, u, "solvent_total_l") != 0 {
		t.Errorf("rinse set to 0 but solvent_total_l = %v", figure(t, u, "solvent_total_l"))
	}
	for _, d := range u.Demands {
		if d.Item == "acetone" {
			t.Errorf("acetone demanded with no rinse")
		}
	}
	// Every default carries a source and a mark (the Sources sheet prints them).
	for _, c := range Defaults() {
		if c.Source == "" || c.Mark == "" || c.Method != Method || !strings.HasPrefix(c.Key, Method+".") {
			t.Errorf("coefficient %s lacks provenance: %+v", c.Key, c)
		}
		if c.Unit != "" {
			if _, err := units.To(c.SI, c.Unit); err != nil {
				t.Errorf("coefficient %s: display unit %q: %v", c.Key, c.Unit, err)
			}
		}
	}
}

// Cautions follow the scenario: vacuum glassware only under vacuum;
// bumping, dryness and thermal stability always; peroxide formers by name.
func TestCautions(t *testing.T) {
	t.Parallel()
	all := strings.Join(Cautions(load(t, heavyImpurity)), "\n")
	for _, w := range []string{"implode", "Bumping", "Boiling chips do not work under vacuum", "Never distil to dryness", "DSC", "150 °C"} {
		if !strings.Contains(all, w) {
			t.Errorf("cautions lack %q", w)
		}
	}
	if strings.Contains(all, "Peroxide") {
		t.Error("no peroxide former in this scenario")
	}
	y := strings.NewReplacer(`best_vacuum: "1 mbar"`, `best_vacuum: "1 atm"`, "  impurity:\n    name: dimer\n    boiling_point: \"235 C\"\n    molar_mass: \"356 g/mol\"", "  impurity: {solvent: THF}").Replace(heavyImpurity)
	sc := load(t, y)
	all = strings.Join(Cautions(sc), "\n")
	if strings.Contains(all, "implode") {
		t.Error("no vacuum: no implosion caution")
	}
	if !strings.Contains(all, "Peroxide") || !strings.Contains(all, "tetrahydrofuran") {
		t.Errorf("THF is a peroxide former: %s", all)
	}
	if got := sc.Distillation.Solvents(); strings.Join(got, ",") != "acetone,tetrahydrofuran" {
		t.Errorf("Solvents() = %v", got)
	}
}

// Robustness: across many generated inputs (boiling points 40–300 °C, any
// order, feed and target purities, pot limits, vacuum, column, reflux,
// masses) the model never panics and never lets NaN or infinity into a
// figure or a demand; a feasible run meets its purity target and closes
// its product balance. Common practice, no source: these are properties.
func TestGeneratedInputs(t *testing.T) {
	t.Parallel()
	rng := rand.New(rand.NewPCG(1, 2))
	n, feasible := 0, 0
	for i := 0; i < 400; i++ {
		bpP := 40 + 260*rng.Float64()
		bpI := 40 + 260*rng.Float64()
		if math.Abs(bpP-bpI) < 0.5 {
			continue
		}
		feed := 0.3 + 0.65*rng.Float64()
		target := feed + (1-feed)*(0.2+0.79*rng.Float64())
		y := fmt.Sprintf(`name: g
masses: ["1 g"]
crude: {purity: %.6f}
distillation:
  product: {name: p, boiling_point: "%.3f C", molar_mass: "%.1f g/mol"}
  impurity: {name: i, boiling_point: "%.3f C", molar_mass: "%.1f g/mol", halogenated: %v}
  target_purity: %.6f
  max_pot_temperature: "%.1f C"
  best_vacuum: "%.3g mbar"
  column_stages: %d
  reflux_multiple: %.3f
`, feed, bpP, 80+200*rng.Float64(), bpI, 80+200*rng.Float64(), rng.IntN(2) == 0, target,
			20+250*rng.Float64(), math.Pow(10, -1+4*rng.Float64()), rng.IntN(25), 1+4*rng.Float64())
		sc := load(t, y)
		m := math.Pow(10, -4+6*rng.Float64())
		u := Run(sc, coefficients(), m)
		n++
		finite(t, u)
		if !u.Feasible {
			if u.Reason == "" {
				t.Errorf("infeasible without a reason:\n%s", y)
			}
			continue
		}
		feasible++
		if p := figure(t, u, "product_purity"); p < target-1e-6 {
			t.Errorf("purity %.6f below target %.6f:\n%s", p, target, y)
		}
		losses := 0.0
		for _, k := range []usage.FigureKey{"loss_forerun", "loss_tails", "loss_holdup", "loss_cold_trap"} {
			losses += figure(t, u, k)
		}
		if e := math.Abs(u.ProductOutKg + losses - u.ProductInKg); e > 1e-9*u.ProductInKg {
			t.Errorf("product balance off by %g:\n%s", e, y)
		}
	}
	if feasible < n/10 {
		t.Errorf("only %d of %d generated cases feasible; the generator no longer exercises the model", feasible, n)
	}
	t.Logf("%d cases, %d feasible", n, feasible)
}
