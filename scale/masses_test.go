package scale

import (
	"math"
	"strings"
	"testing"
)

func TestLogSpace(t *testing.T) {
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

// Crossovers found by bisection agree with a brute-force scan on a fine
// grid. Two synthetic cost curves with a known crossing: a = 50 + 5/m and
// b = 20 + 40/m cross where 30 = 35/m, m = 7/6 kg (hand computation); and a
// step curve c that jumps from 10 to 100 at m = 0.3 kg against a flat 50.
func TestCrossoverAgainstBruteForce(t *testing.T) {
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
	cost := func(j int, m float64) (float64, error) { return curves[j](m), nil }
	names := []string{"a", "b", "c", "d"}
	masses, _ := LogSpace(1e-2, 100, 9)
	grid := make([][]float64, len(masses))
	for i, m := range masses {
		for j := range curves {
			grid[i] = append(grid[i], curves[j](m))
		}
	}
	got, err := findCrossovers(names, masses, grid, cost)
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
