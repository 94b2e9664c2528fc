package cryst

import (
	"math"
	"strings"
	"testing"

	"sepcost/costing/source"
)

// The integrated constant-pressure filtration equation against a direct
// integration of Darcy's law for a growing cake, dV/dt = A·Δp / (μ·(α·c·V/A
// + R_m)) (Ruth, Ind. Eng. Chem. 1935, 27, 708, from memory; the
// linearised form t/V = μαc/(2A²Δp)·V + μR_m/(AΔp) confirmed in a published
// calculation guide). Hand case: 0.5 m³ of filtrate, A = 1 m², Δp = 2 bar,
// μ = 1.5 mPa·s, α = 1e10 m/kg, c = 125 kg/m³, R_m = 1e10 1/m:
// t = 1.5e-3·1e10·125·0.25/(2·2e5) + 1.5e-3·1e10·0.5/2e5
// = 1171.875 + 37.5 = 1209.375 s (derived).
func TestCakeFiltrationAgainstDarcy(t *testing.T) {
	t.Parallel()
	V, A, dp, mu, alpha, c, Rm := 0.5, 1.0, 2e5, 1.5e-3, 1e10, 125.0, 1e10
	got := CakeFiltrationTime(V, A, dp, mu, alpha, c, Rm)
	if math.Abs(got-1209.375) > 1e-6 {
		t.Errorf("t = %.6f s, hand 1209.375 s", got)
	}
	// dt/dV = μ(αcV/A + R_m)/(AΔp), integrated by Simpson's rule.
	f := func(v float64) float64 { return mu * (alpha*c*v/A + Rm) / (A * dp) }
	n, sum := 1000, 0.0
	h := V / float64(n)
	for i := 0; i <= n; i++ {
		w := 2.0
		if i == 0 || i == n {
			w = 1
		} else if i%2 == 1 {
			w = 4
		}
		sum += w * f(float64(i)*h)
	}
	if num := sum * h / 3; relErr(got, num) > 1e-9 {
		t.Errorf("integrated form %g s, numerical %g s", got, num)
	}
	// With the medium negligible the time goes as V² at fixed area and as
	// 1/A² at fixed volume (derived from the same equation).
	if r := CakeFiltrationTime(2*V, A, dp, mu, alpha, c, 0) / CakeFiltrationTime(V, A, dp, mu, alpha, c, 0); relErr(r, 4) > 1e-12 {
		t.Errorf("doubling the filtrate multiplies the time by %g, want 4", r)
	}
	// The wash at the final rate: W·dt/dV at V.
	if w := CakeWashTime(0.2, V, A, dp, mu, alpha, c, Rm); relErr(w, 0.2*f(V)) > 1e-12 {
		t.Errorf("wash %g s, want %g s", w, 0.2*f(V))
	}
	// The default specific cake resistance lies in the published range
	// for crystalline cakes, 1e9–1e12 m/kg (Wakeman and Tarleton 2005,
	// from memory).
	if a := source.NewSet(Defaults()).Get(KeyCakeResistance); a < 1e9 || a > 1e12 {
		t.Errorf("default α = %g m/kg", a)
	}
}

// Drying to a loss on drying: 18 kg of ethanol on 80 kg of crystals,
// dried to 0.5 % LOD (0.4 kg left) at 1 kg/(m²·h) over 1 m² takes
// 17.6 h (hand computation); a cake already drier takes no time.
func TestDryingTime(t *testing.T) {
	t.Parallel()
	if got := DryingTime(18, 80, 0.005, 1.0/3600, 1) / 3600; math.Abs(got-17.6) > 1e-9 {
		t.Errorf("%g h, hand 17.6 h", got)
	}
	if got := DryingTime(0.1, 80, 0.005, 1.0/3600, 1); got != 0 {
		t.Errorf("a cake below the target dries in %g s", got)
	}
}

// Cleaning grows with the wall area: a 1 m³ reactor (4.61 m², the
// cylinder factor) takes 20 min + 4.61 h, a 500 mL flask (0.0305 m²)
// 20 min + 1.8 min (hand computation with the defaults).
func TestCleaningScales(t *testing.T) {
	t.Parallel()
	s := source.NewSet(Defaults())
	t0, k := s.Get(KeyCleanTime), s.Get(KeyCleanPerArea)
	big := CleaningTime(t0, k, WettedArea(AreaFactorCylinder, 1)) / 3600
	small := CleaningTime(t0, k, WettedArea(AreaFactorSphere, 500e-6)) / 3600
	if math.Abs(big-(1.0/3+4.613)) > 0.01 || math.Abs(small-(1.0/3+0.0305)) > 0.001 {
		t.Errorf("clean 1 m³ reactor %.3f h, 500 mL flask %.3f h", big, small)
	}
}

// Hours that scale: the demo's crystallization at 100 mg, 10 g and 100 kg.
// At 100 kg it runs in one 1000 L reactor, and the operator hours land at
// tens of hours per batch, as for one crystallization and isolation in a
// pilot plant: one to three shifts of two operators (common practice, no
// source). At the bench one chemist's few hours. Filtration and drying
// grow with the batch (a deeper cake on a filter sized with the reactor).
func TestHoursScale(t *testing.T) {
	t.Parallel()
	sc := load(t, demoLikeYAML)
	coef := source.NewSet(Defaults())
	var hands, filt, dry []float64
	for _, m := range []float64{1e-4, 0.01, 100} {
		u := Run(sc, coef, m)
		if !u.Feasible {
			t.Fatalf("%g kg: %s", m, u.Reason)
		}
		_, h := u.Hours()
		hands = append(hands, h)
		filt = append(filt, figure(t, u, "filtration_time"))
		dry = append(dry, figure(t, u, "drying_time"))
		if m == 100 {
			if v := figure(t, u, "vessel_volume"); v != 1 || figure(t, u, "batches") != 1 {
				t.Fatalf("100 kg: %g m³ × %g batches, want one 1000 L reactor", v, figure(t, u, "batches"))
			}
			if a := figure(t, u, "filter_area"); a != 1 {
				t.Errorf("100 kg: filter %g m², want the 1 m² of a 1 m³ reactor", a)
			}
		}
	}
	if !(hands[0] > 1 && hands[0] < 6) || !(hands[1] < 6) {
		t.Errorf("bench hours %.2f h at 100 mg, %.2f h at 10 g; want a few", hands[0], hands[1])
	}
	if !(hands[2] >= 10 && hands[2] < 100) {
		t.Errorf("100 kg in a 1000 L reactor: %.1f operator hours, want tens", hands[2])
	}
	if !(filt[2] > 3*filt[0] && dry[2] > 3*dry[0]) {
		t.Errorf("filtration %.2f → %.2f h, drying %.2f → %.2f h: they should grow with the batch", filt[0], filt[2], dry[0], dry[2])
	}
}

// demoLikeYAML is the demo's crystallization (invented values, as in the
// demo).
var demoLikeYAML = strings.TrimSpace(`
name: demo-like
masses: ["10 g"]
crude:
  purity: 0.82
  nearest_impurity: 0.10
crystallization:
  solvent: ethanol
  anti_solvent: water
  anti_solvent_fraction: 0.25
  product:
    solubility: {"0 C": "12 g/L", "20 C": "25 g/L", "75 C": "150 g/L"}
    molar_mass: "241.3 g/mol"
  impurity:
    solubility: {"0 C": "30 g/L", "75 C": "140 g/L"}
  dissolve_at: "75 C"
  isolate_at: "0 C"
  target_purity: 0.99
  excess_solvent: "10 %"
  wash_cake_volumes: 2
`) + "\n"

// Every coefficient of the uptake and of the scaling times carries a
// physical range that holds its default.
func TestScaleDefaultsBounded(t *testing.T) {
	t.Parallel()
	for _, c := range scaleDefaults() {
		if !c.Bounded() || !c.InRange(c.SI) || c.Lo > c.Hi {
			t.Errorf("%s: default %g outside [%g, %g]", c.Key, c.SI, c.Lo, c.Hi)
		}
	}
}
