package chrom

import (
	"math"
	"testing"
)

// TLC-to-column relations. Source: the standard relations k = (1 − Rf)/Rf and
// CV = 1/Rf (Fair, J. D.; Kormos, C. M. J. Chromatogr. A 2008, 1211, 49,
// abstract; common practice); an Rf of 0.35 elutes at 2.857 CV and an Rf of
// 0.5 at 2 CV (hand computation from those relations).
func TestTLCRelations(t *testing.T) {
	t.Parallel()
	cases := []struct {
		rf, k, cv float64
	}{
		{0.5, 1, 2},
		{0.35, 0.65 / 0.35, 1 / 0.35},
		{0.25, 3, 4},
		{0.10, 9, 10},
	}
	for _, c := range cases {
		if got := RetentionFactor(c.rf); math.Abs(got-c.k) > 1e-12*c.k {
			t.Errorf("k(%g) = %g, want %g", c.rf, got, c.k)
		}
		if got := ElutionCV(c.rf); math.Abs(got-c.cv) > 1e-12*c.cv {
			t.Errorf("CV(%g) = %g, want %g", c.rf, got, c.cv)
		}
		// Identity: CV = 1 + k.
		if math.Abs(ElutionCV(c.rf)-(1+RetentionFactor(c.rf))) > 1e-12 {
			t.Errorf("CV ≠ 1 + k at Rf %g", c.rf)
		}
	}
}

// Less polar compounds run higher on silica TLC and elute first: the spot
// with the higher Rf has the smaller k and the smaller CV (common practice,
// no source). Selectivity and the difference in elution volume do not depend on the order of arguments.
func TestElutionOrderAndSelectivity(t *testing.T) {
	t.Parallel()
	upper, lower := 0.45, 0.30
	if !(ElutionCV(upper) < ElutionCV(lower)) {
		t.Fatalf("upper spot must elute first")
	}
	a1, a2 := Selectivity(upper, lower), Selectivity(lower, upper)
	if a1 != a2 || a1 <= 1 {
		t.Fatalf("α = %g / %g, want equal and > 1", a1, a2)
	}
	// Hand computation: k(0.30) = 2.3333, k(0.45) = 1.2222, α = 1.9091;
	// 1/Rf difference = 3.3333 − 2.2222 = 1.1111.
	if math.Abs(a1-1.909090909) > 1e-6 {
		t.Errorf("α = %.7f, want 1.9090909", a1)
	}
	if d := DeltaCV(upper, lower); math.Abs(d-1.111111111) > 1e-6 {
		t.Errorf("difference in elution volume = %.7f, want 1.1111111", d)
	}
	s := Separation{ProductRf: 0.30, ImpurityRf: 0.45, Product: 0.8, Impurity: 0.1}
	if s.FirstIsProduct() {
		t.Errorf("the product at Rf 0.30 elutes after the impurity at 0.45")
	}
	if r := s.AmountRatio(); math.Abs(r-0.125) > 1e-12 {
		t.Errorf("r = first/second = 0.1/0.8 = 0.125, got %g", r)
	}
}
