package chrom

import "math"

// Band is one component's zone as it leaves the column, in column volumes,
// taken as a normal profile with the mean and variance of the real one.
type Band struct {
	Mean, Sigma float64 // column volumes
	Kg          float64 // mass in the band
}

// OverloadWidth is the ideal-model width of a band overloaded on a
// Langmuir isotherm, in column volumes:
//
//	w = k · (2√Lf − Lf)
//
// k the retention factor, Lf the loading factor (amount over the column's
// saturation capacity, capped at 1). The profile is a right triangle: a
// shock front at 1 + k − w and a diffuse rear ending at 1 + k.
// Source: Golshan-Shirazi, S.; Guiochon, G. Anal. Chem. 1988, 60, 2364
// (from memory).
func OverloadWidth(k, lf float64) float64 {
	lf = math.Min(math.Max(lf, 0), 1)
	return k * (2*math.Sqrt(lf) - lf)
}

// ComponentBand is a component's band at loading factor lf on a bed of N
// plates: the overload triangle (mean 1 + k − 2w/3, variance w²/18) widened
// by the plate model's kinetic spreading σ = (1 + k)/√N, the two variances
// added (Knox, J. H.; Pyper, H. M. J. Chromatogr. 1986, 363, 1: plate height
// keeps its meaning under overload; adding the variances is this project's
// simplification). Competition between the two components (displacement,
// tag-along) is left out.
func ComponentBand(rf, lf, plates, kg float64) Band {
	k := RetentionFactor(rf)
	w := OverloadWidth(k, lf)
	kin := ElutionCV(rf) / math.Sqrt(plates)
	return Band{Mean: ElutionCV(rf) - 2*w/3, Sigma: math.Sqrt(kin*kin + w*w/18), Kg: kg}
}

// share is the part of a band eluted before x (column volumes).
func (b Band) share(x float64) float64 {
	return 0.5 * math.Erfc(-(x-b.Mean)/(b.Sigma*math.Sqrt2))
}

// Cut is where the product fractions are cut and what they hold.
type Cut struct {
	Recovery float64 // share of the product eluted in the pure cut
	Purity   float64 // product / (product + nearest impurity) in the pure cut
	Mixed    float64 // share of the product in mixed fractions (eluted outside the pure cut)
	OK       bool    // the cut reaches the target purity with some product in it
}

// CutFor places the cut point that keeps the most product while the pooled
// fractions reach the target purity (product over product plus the nearest
// impurity). first says whether the product elutes first (then the pure
// cut runs from the start of the product band to the cut point; otherwise
// from the cut point to its end). The cut point is found on a grid of 400
// points over ±6σ of the product band, refined by bisection.
func CutFor(p, imp Band, first bool, target float64) Cut {
	if !first { // mirror: the product elutes last
		p.Mean, imp.Mean = -p.Mean, -imp.Mean
	}
	purity := func(x float64) (float64, float64) {
		pr := p.Kg * p.share(x)
		im := imp.Kg * imp.share(x)
		if pr+im <= 0 {
			return 1, 0
		}
		return pr / (pr + im), p.share(x)
	}
	lo, hi := p.Mean-6*p.Sigma, p.Mean+6*p.Sigma
	const n = 400
	best := math.NaN()
	for i := n; i >= 0; i-- {
		x := lo + (hi-lo)*float64(i)/n
		if pu, _ := purity(x); pu >= target {
			best = x
			break
		}
	}
	if math.IsNaN(best) {
		return Cut{}
	}
	if best < hi {
		a, b := best, best+(hi-lo)/n
		for i := 0; i < 40; i++ {
			m := (a + b) / 2
			if pu, _ := purity(m); pu >= target {
				a = m
			} else {
				b = m
			}
		}
		best = a
	}
	pu, rec := purity(best)
	return Cut{Recovery: rec, Purity: pu, Mixed: 1 - rec, OK: rec > 0}
}
