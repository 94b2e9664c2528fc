package distil

import (
	"math"
	"testing"
)

// Hours that scale with the still: at 200 kg the charge runs in the
// 100 L plant still, attended by two operators, and the operator hours
// land at tens per campaign (one to three shifts of two operators, common
// practice, no source); at 20 g one chemist's few hours. Cleaning grows
// with the wall area: the 100 L still's sphere of 1.042 m² takes 20 min +
// 1.042 h (hand computation with the defaults, derived).
func TestHoursScaleWithStill(t *testing.T) {
	t.Parallel()
	sc := load(t, heavyImpurity)
	coef := coefficients()
	small, big := Run(sc, coef, 0.02), Run(sc, coef, 200)
	if !small.Feasible || !big.Feasible {
		t.Fatalf("20 g: %s; 200 kg: %s", small.Reason, big.Reason)
	}
	_, hs := small.Hours()
	_, hb := big.Hours()
	if figure(t, big, "still_volume") != 100e-3 || figure(t, big, "operators") != 2 || figure(t, small, "operators") != 1 {
		t.Fatalf("200 kg: %g m³ still, %g operators; 20 g: %g operators", figure(t, big, "still_volume"), figure(t, big, "operators"), figure(t, small, "operators"))
	}
	if !(hs > 1 && hs < 6) || !(hb >= 10 && hb < 100) {
		t.Errorf("hands-on %.2f h at 20 g (want a few), %.1f h at 200 kg (want tens)", hs, hb)
	}
	var clean float64
	for _, a := range big.Activities {
		if a.Name == ActClean {
			clean = a.Elapsed / 3600
		}
	}
	if want := 1.0/3 + math.Cbrt(36*math.Pi)*math.Pow(0.1, 2.0/3); math.Abs(clean-want) > 1e-9 || math.Abs(want-(1.0/3+1.042)) > 0.001 {
		t.Errorf("cleaning the 100 L still %.4f h, want %.4f h", clean, want)
	}
}
