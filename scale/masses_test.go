package scale

import (
	"math"
	"strings"
	"testing"
)

func TestLogSpace(t *testing.T) {
	t.Parallel()
	m, err := LogSpace(1e-4, 10, 6)
	if err != nil {
		t.Fatal(err)
	}
	// 1e-4 to 10 kg in 6 points is one decade a step (hand computation).
	for i, want := range []float64{1e-4, 1e-3, 1e-2, 1e-1, 1, 10} {
		if math.Abs(m[i]/want-1) > 1e-12 {
			t.Errorf("m[%d] = %g, want %g", i, m[i], want)
		}
	}
	for _, c := range []struct {
		from, to float64
		n        int
		want     string
	}{
		{1, 1, 5, "must be below"},
		{2, 1, 5, "must be below"},
		{0, 1, 5, "above zero"},
		{1e-3, 1, 1, "at least 2"},
		{1e-3, 1, 10001, "at most 10000"},
	} {
		if _, err := LogSpace(c.from, c.to, c.n); err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("LogSpace(%g, %g, %d) error %v, want %q", c.from, c.to, c.n, err, c.want)
		}
	}
}

// synthetic turns cost curves (NaN: not feasible) into an evalFunc and its
// grid on masses.
func synthetic(curves []func(m float64) float64, masses []float64) (evalFunc, [][]point) {
	eval := func(j int, m float64) (point, error) {
		v := curves[j](m)
		if math.IsNaN(v) {
			return point{perG: v, reason: "too small"}, nil
		}
		return point{perG: v}, nil
	}
	grid := make([][]point, len(masses))
	for i, m := range masses {
		for j := range curves {
			p, _ := eval(j, m)
			grid[i] = append(grid[i], p)
		}
	}
	return eval, grid
}

// Pairwise crossovers found by bisection agree with a brute-force scan on a fine
// grid. Two synthetic cost curves with a known crossing: a = 50 + 5/m and
// b = 20 + 40/m cross where 30 = 35/m, m = 7/6 kg (hand computation); and a
// step curve c that jumps from 10 to 100 at m = 0.3 kg against a flat 50.
func TestCrossoverAgainstBruteForce(t *testing.T) {
	t.Parallel()
	curves := []func(m float64) float64{
		func(m float64) float64 { return 50 + 5/m },
		func(m float64) float64 { return 20 + 40/m },
		func(m float64) float64 {
			if m < 0.3 {
				return 10
			}
			return 100
		},
		func(m float64) float64 { return 50 },
	}
	names := []string{"a", "b", "c", "d"}
	masses, _ := LogSpace(1e-2, 100, 9)
	eval, grid := synthetic(curves, masses)
	got, err := findPairwise(names, masses, grid, newEvals(eval, nil))
	if err != nil {
		t.Fatal(err)
	}
	// Brute force: scan 200,000 log-spaced masses for sign changes.
	fine := make([]float64, 200000)
	for i := range fine {
		fine[i] = 1e-2 * math.Pow(1e4, float64(i)/float64(len(fine)-1))
	}
	type key struct{ a, b int }
	brute := map[key][]float64{}
	for a := range curves {
		for b := a + 1; b < len(curves); b++ {
			for k := 0; k+1 < len(fine); k++ {
				d0 := curves[a](fine[k]) - curves[b](fine[k])
				d1 := curves[a](fine[k+1]) - curves[b](fine[k+1])
				if d0 != 0 && (d0 > 0) != (d1 > 0) {
					brute[key{a, b}] = append(brute[key{a, b}], math.Sqrt(fine[k]*fine[k+1]))
				}
			}
		}
	}
	n := 0
	for _, v := range brute {
		n += len(v)
	}
	if len(got) != n {
		t.Fatalf("bisection found %d crossovers, brute force %d: %+v vs %v", len(got), n, got, brute)
	}
	for _, c := range got {
		a, b := indexOf(names, c.A), indexOf(names, c.B)
		found := false
		for _, m := range brute[key{a, b}] {
			if math.Abs(math.Log(c.MassKg/m)) < 1e-3 {
				found = true
			}
		}
		if !found {
			t.Errorf("crossover %+v not in brute force %v", c, brute[key{a, b}])
		}
	}
	// The smooth a/b crossing at 7/6 kg; b cheaper below it.
	for _, c := range got {
		if c.A == "a" && c.B == "b" {
			if math.Abs(c.MassKg/(7.0/6)-1) > 2*CrossoverPrecision || c.Step || c.CheaperBelow != "a" {
				t.Errorf("a/b crossover %+v, want smooth at 1.1667 kg with a cheaper below", c)
			}
		}
		if c.A == "c" && c.B == "d" && (!c.Step || math.Abs(c.MassKg/0.3-1) > 2*CrossoverPrecision) {
			t.Errorf("c/d crossover %+v, want a step at 0.3 kg", c)
		}
	}
}

func indexOf(list []string, s string) int {
	for i, v := range list {
		if v == s {
			return i
		}
	}
	return -1
}

// The decision's crossovers on synthetic curves whose changes are known by
// hand: a = 50 + 5/m and b = 20 + 40/m cross at 7/6 kg (30 = 35/m, smooth);
// c is not feasible below 2 kg, costs 10 from 2 kg (cheaper than b ≥ 20:
// c becomes feasible and wins at 2 kg) and 30 from 20 kg, where b
// (20 + 40/20 = 22) is cheaper again (an equipment step). On a coarse grid
// (1, 10 kg) the cheapest goes a → c, with b cheapest in between: the
// search must find both changes.
func TestDecisionCrossovers(t *testing.T) {
	t.Parallel()
	curves := []func(m float64) float64{
		func(m float64) float64 { return 50 + 5/m },
		func(m float64) float64 { return 20 + 40/m },
		func(m float64) float64 {
			switch {
			case m < 2:
				return math.NaN()
			case m < 20:
				return 10
			}
			return 30
		},
	}
	names := []string{"a", "b", "c"}
	masses, _ := LogSpace(1e-2, 100, 5)
	eval, grid := synthetic(curves, masses)
	got, err := findDecisionCrossovers(names, masses, grid, newEvals(eval, nil))
	if err != nil {
		t.Fatal(err)
	}
	want := []struct {
		kg          float64
		below, kind string
		above       string
	}{{7.0 / 6, "a", Smooth, "b"}, {2, "b", Feasible, "c"}, {20, "c", Step, "b"}}
	if len(got) != len(want) {
		t.Fatalf("got %d changes, want %d: %+v", len(got), len(want), got)
	}
	for i, w := range want {
		c := got[i]
		if math.Abs(math.Log(c.MassKg/w.kg)) > CrossoverPrecision || c.CheaperBelow != w.below || c.CheaperAbove != w.above || c.Kind != w.kind {
			t.Errorf("change %d: %+v, want %s → %s (%s) at %g kg", i, c, w.below, w.above, w.kind, w.kg)
		}
		// Derived: the bracket really holds the change.
		at := func(m float64) string {
			ps := make([]float64, len(curves))
			for j, f := range curves {
				ps[j] = f(m)
			}
			return names[cheapest(ps)]
		}
		if at(c.LoKg) != c.CheaperBelow || at(c.HiKg) != c.CheaperAbove || math.Log(c.HiKg/c.LoKg) > CrossoverPrecision {
			t.Errorf("change %d: bracket %g–%g kg does not hold %s → %s", i, c.LoKg, c.HiKg, c.CheaperBelow, c.CheaperAbove)
		}
	}
	if got[1].Detail == "" || !strings.Contains(got[1].Detail, "not feasible: too small") {
		t.Errorf("feasibility change should give the reason below: %q", got[1].Detail)
	}
}
