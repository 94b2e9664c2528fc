package chrom

import "math"

// Band is one component's zone as it leaves the column, in column
// volumes: the ideal overloaded profile, a right triangle with its shock
// front at Front and its diffuse rear ending at End, blurred by kinetic
// spreading of standard deviation Kinetic.
type Band struct {
	Front, End float64 // column volumes
	Kinetic    float64 // column volumes
	Kg         float64 // mass in the band
	mirrored   bool    // the triangle's shock front is at End (see mirror)
}

// Mean is the band's centre of mass, Front + (End − Front)/3.
func (b Band) Mean() float64 { return b.Front + (b.End-b.Front)/3 }

// Sigma is the band's standard deviation, √(σk² + w²/18), w = End − Front
// (the variance of a right triangle of base w is w²/18).
func (b Band) Sigma() float64 {
	w := b.End - b.Front
	return math.Sqrt(b.Kinetic*b.Kinetic + w*w/18)
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
// plates: the overload triangle from 1 + k − w to 1 + k, blurred by the
// plate model's kinetic spreading σ = (1 + k)/√N (Knox, J. H.; Pyper, H. M.
// J. Chromatogr. 1986, 363, 1: plate height keeps its meaning under
// overload; blurring the ideal profile by it is this project's
// simplification). Competition between the two components (displacement,
// tag-along) is left out.
func ComponentBand(rf, lf, plates, kg float64) Band {
	v := ElutionCV(rf)
	w := OverloadWidth(RetentionFactor(rf), lf)
	return Band{Front: v - w, End: v, Kinetic: v / math.Sqrt(plates), Kg: kg}
}

// share is the part of a band eluted before x (column volumes): the
// triangle density f(y) = 2(b − y)/w² on [a, b] convolved with the normal
// kinetic spreading, in closed form with t = (x − y)/σ:
//
//	F(x) = (2σ/w²) · [ (b − x)·G1(t) + σ·G2(t) ] from t = (x − b)/σ to (x − a)/σ
//	G1 = tΦ + φ,   G2 = ((t² − 1)Φ + tφ)/2
//
// (Φ, φ the standard normal distribution and density; G1 and G2 are the
// antiderivatives of Φ and tΦ). A band narrower than 10⁻⁶ σ is normal.
// A cut search asks for many shares of one band: it prepares the band
// once (b.cdf) and calls cdf.at.
func (b Band) share(x float64) float64 {
	c := b.cdf()
	return c.at(x)
}

// cdf is a band prepared for share: a mirrored band's reflection and the
// constants of the closed form (w, 2σ/w²), computed once with the same
// operations, so that cdf.at(x) is share(x) to the last bit.
type cdf struct {
	front, end float64 // the unmirrored triangle, column volumes
	s          float64 // σ, column volumes
	k          float64 // 2σ/w²
	normal     bool    // w ≤ 10⁻⁶ σ: a normal band
	mirrored   bool    // at(x) = 1 − F(−x)
}

// cdf prepares the band for share.
func (b Band) cdf() cdf {
	c := cdf{front: b.Front, end: b.End, s: b.Kinetic, mirrored: b.mirrored}
	if b.mirrored {
		c.front, c.end = -b.End, -b.Front
	}
	w := c.end - c.front
	c.normal = w <= 1e-6*c.s
	c.k = 2 * c.s / (w * w)
	return c
}

// at is the band's share eluted before x (Band.share).
func (c *cdf) at(x float64) float64 {
	if c.mirrored {
		return 1 - c.unmirrored(-x)
	}
	return c.unmirrored(x)
}

// unmirrored is F(x) of the triangle from front to end (share's formula).
func (c *cdf) unmirrored(x float64) float64 {
	s := c.s
	if c.normal {
		return phi(((x - c.end) / s))
	}
	r := c.end - x
	f := c.k * (antiderivative(r, s, (x-c.front)/s) - antiderivative(r, s, (x-c.end)/s))
	return math.Min(math.Max(f, 0), 1)
}

// antiderivative is (b − x)·G1(t) + σ·G2(t) of share, r = b − x.
func antiderivative(r, s, t float64) float64 {
	P, d := tails(t)
	return r*(t*P+d) + s*((t*t-1)*P+t*d)/2
}

// tails is Φ(t) and φ(t), the standard normal distribution and density.
// Far in either tail they are the values math.Erfc and math.Exp return
// there, without calling them: beyond |t| = 40 the density e^(−t²/2)
// underflows to 0 (t²/2 > 745, the exponent below which math.Exp returns
// 0), and Φ is 0 below t = −40 (math.Erfc returns 0 from x = 28 on, here
// x = −t/√2 > 28.28) and 1 above t = 8.5 (math.Erfc returns 2 − 10⁻³⁰⁰,
// which is 2, below x = −6). The values are those of the full calls to
// the last bit (TestTailsAreTheCalls); a band far from the cut point,
// the common case in the cut search, costs no special function.
func tails(t float64) (P, d float64) {
	switch {
	case t < -40:
		return 0, 0
	case t > 40:
		return 1, 0
	case t > 8.5:
		return 1, math.Exp(-t*t/2) / sqrt2Pi
	}
	return phi(t), math.Exp(-t*t/2) / sqrt2Pi
}

// sqrt2Pi is √(2π), the normal density's divisor.
var sqrt2Pi = math.Sqrt(2 * math.Pi)

// phi is the standard normal distribution function.
func phi(t float64) float64 { return 0.5 * math.Erfc(-t/math.Sqrt2) }

// Cut is where the product fractions are cut and what they hold.
type Cut struct {
	Recovery float64 // share of the product eluted in the pure cut
	Purity   float64 // product / (product + nearest impurity) in the pure cut
	Mixed    float64 // share of the product in mixed fractions (eluted outside the pure cut)
	// MixedImpurity is the share of the impurity eluted in the mixed
	// fractions: from the cut point to 6σ past the product band's far end.
	MixedImpurity float64
	OK            bool // the cut reaches the target purity with some product in it
}

// CutFor places the cut point that keeps the most product while the pooled
// fractions reach the target purity (product over product plus the nearest
// impurity). first says whether the product elutes first (then the pure
// cut runs from the start of the product band to the cut point; otherwise
// from the cut point to its end). The cut point is found on a grid of 48
// points from 6σ before the band's front to 6σ after its end, refined by
// bisection.
//
// Each band is prepared once (Band.cdf), and the shares at the cut point
// found and at the grid's end are those the search computed, not
// computed again: the cut is the plain search's to the last bit
// (TestCutForIsThePlainSearch).
func CutFor(p, imp Band, first bool, target float64) Cut {
	if !first { // mirror: the product elutes last
		p, imp = p.mirror(), imp.mirror()
	}
	cs := cutSearch{p: p.cdf(), imp: imp.cdf(), pKg: p.Kg, impKg: imp.Kg, target: target}
	lo, hi := p.Front-6*p.Kinetic, p.End+6*p.Kinetic
	const n = 48
	best := math.NaN()
	impHi := math.NaN() // the impurity's share at hi, if the grid computed it
	for i := n; i >= 0; i-- {
		x := lo + (hi-lo)*float64(i)/n
		ok := cs.reaches(x)
		if i == n && x == hi {
			impHi = cs.impShare
		}
		if ok {
			best = x
			break
		}
	}
	if math.IsNaN(best) {
		return Cut{}
	}
	if best < hi {
		a, b := best, best+(hi-lo)/n
		for i := 0; i < 30; i++ {
			m := (a + b) / 2
			if cs.reaches(m) {
				a = m
			} else {
				b = m
			}
		}
		best = a
	}
	// best is the last point that reached the target: its shares are kept.
	pu, rec := cs.at.purity, cs.at.product
	if math.IsNaN(impHi) {
		impHi = cs.imp.at(hi)
	}
	mixedImp := math.Max(impHi-cs.at.impurity, 0)
	return Cut{Recovery: rec, Purity: pu, Mixed: 1 - rec, MixedImpurity: mixedImp, OK: rec > 0}
}

// cutSearch is CutFor's state: the two bands prepared, and the shares at
// the last cut point that reached the target.
type cutSearch struct {
	p, imp     cdf
	pKg, impKg float64
	target     float64
	impShare   float64 // the impurity's share at the last point asked
	at         struct{ purity, product, impurity float64 }
}

// reaches says whether the cut at x reaches the target: purity(x) ≥
// target. When the impurity eluted before x is so much that even all of
// the product could not dilute it to the target, the answer is no without
// the product's share: purity = pr/(pr + im) ≤ P/(P + im), P the
// product's mass, and the margin of 10⁻⁹ is far above the rounding of
// either side, so the answer is the one purity gives. A point that
// reaches it has its purity and shares kept in cs.at.
func (cs *cutSearch) reaches(x float64) bool {
	is := cs.imp.at(x)
	cs.impShare = is
	im := cs.impKg * is
	if im > 0 && cs.pKg/(cs.pKg+im) < cs.target-1e-9 {
		return false
	}
	pu, ps := purityWith(&cs.p, cs.pKg, x, im)
	if pu < cs.target {
		return false
	}
	cs.at.purity, cs.at.product, cs.at.impurity = pu, ps, is
	return true
}

// purityWith is the purity of the product eluted before x with im kg of
// impurity, and the product's share eluted.
func purityWith(p *cdf, kg, x, im float64) (float64, float64) {
	ps := p.at(x)
	pr := kg * ps
	if pr+im <= 0 {
		return 1, 0
	}
	return pr / (pr + im), ps
}

// mirror reflects a band about zero (its elution volume negated), so that
// a product eluting last is cut as one eluting first.
func (b Band) mirror() Band {
	return Band{Front: -b.End, End: -b.Front, Kinetic: b.Kinetic, Kg: b.Kg, mirrored: !b.mirrored}
}
