package distil

import "math"

// Batch describes one still charge for BatchRun, in moles per mole of
// charge and light-component mole fractions.
type Batch struct {
	X0           float64 // light mole fraction of the charge, (0, 1)
	AlphaEq      float64 // equivalent relative volatility of column and pot, > 1
	ProductLight bool    // the product is the more volatile component (distilled over)
	// Target is, when ProductLight, the light mole fraction the heart cut
	// must average; otherwise the highest light mole fraction allowed in
	// the pot (the product stays in the pot).
	Target     float64
	Forerun    float64 // share of the charge taken first as a fore-run (ProductLight only)
	Holdup     float64 // share of the charge held up in the column and still head
	MinResidue float64 // share of the charge that must stay in the pot: never to dryness
}

// Cut is an amount (moles per mole of charge) with its light moles.
type Cut struct{ N, Light float64 }

// X is the cut's light mole fraction (0 for an empty cut).
func (c Cut) X() float64 {
	if c.N <= 0 {
		return 0
	}
	return c.Light / c.N
}

// BatchResult is the outcome of one batch, per mole of charge.
type BatchResult struct {
	Reachable bool    // the target can be met at all
	FirstDrop float64 // light mole fraction of the first distillate, y(x0) at α_eq
	Forerun   Cut     // ProductLight: the fore-run; otherwise the whole distillate (the impurity cut)
	Heart     Cut     // ProductLight: the product cut; otherwise empty
	Pot       Cut     // what is left in the pot: residue and tails, or the purified product
	Holdup    Cut     // held in the column and still head, drained at the end
	// Limited is true when the minimum residue, not the purity, ended the
	// product cut (ProductLight) or made the target unreachable (otherwise).
	Limited bool
}

// BatchRun follows one batch by the Rayleigh equation at α_eq.
//
// The hold-up is first taken from the charge at the first distillate's
// composition (the column fills with vapour-rich liquid). Then:
//
//   - product distilled over (ProductLight): a fore-run of the given share
//     is taken, then the heart cut until its average light fraction falls
//     to Target or the pot reaches MinResidue of the charge, whichever comes
//     first. Unreachable when the first distillate after the fore-run is
//     already below Target.
//   - product left in the pot: the light impurity is distilled off until the
//     pot's light fraction is down to Target. Unreachable when that would
//     leave less than MinResidue of the charge.
//
// Mass balances close exactly: Forerun + Heart + Pot + Holdup = 1 mole, and
// the same for the light moles.
func BatchRun(b Batch) BatchResult {
	a := b.AlphaEq
	r := BatchResult{FirstDrop: EquilibriumVapour(b.X0, a)}
	yh := r.FirstDrop
	r.Holdup = Cut{N: b.Holdup, Light: b.Holdup * yh}
	w0 := 1 - b.Holdup
	x0 := (b.X0 - r.Holdup.Light) / w0
	if !(w0 > 0 && x0 > 0 && x0 < 1) {
		// The hold-up would take the whole light component: nothing to run.
		r.Pot = Cut{N: w0, Light: b.X0 - r.Holdup.Light}
		return r
	}
	minLeft := b.MinResidue / w0 // as a share of the pot after hold-up

	if !b.ProductLight {
		if x0 <= b.Target {
			r.Reachable = true
			r.Pot = Cut{N: w0, Light: w0 * x0}
			return r
		}
		f := RayleighRatio(x0, b.Target, a)
		if !(f >= minLeft) {
			r.Limited = true
			f = math.Max(minLeft, 0)
			x := RayleighComposition(x0, math.Min(f, 1), a)
			r.Pot = Cut{N: w0 * f, Light: w0 * f * x}
			r.Forerun = Cut{N: w0 - r.Pot.N, Light: w0*x0 - r.Pot.Light}
			return r
		}
		r.Reachable = true
		r.Pot = Cut{N: w0 * f, Light: w0 * f * b.Target}
		r.Forerun = Cut{N: w0 - r.Pot.N, Light: w0*x0 - r.Pot.Light}
		return r
	}

	// Product distilled over: fore-run first.
	f1 := 1 - b.Forerun/w0
	if f1 < minLeft {
		f1 = minLeft
	}
	x1 := RayleighComposition(x0, f1, a)
	r.Forerun = Cut{N: w0 * (1 - f1), Light: w0 * (x0 - f1*x1)}
	w1 := w0 * f1
	if EquilibriumVapour(x1, a) <= b.Target || w1 <= b.MinResidue {
		r.Pot = Cut{N: w1, Light: w1 * x1}
		return r
	}
	r.Reachable = true
	// Heart cut: the average light fraction of the cut from x1 down to x
	// falls monotonically as x falls; find where it meets the target.
	avg := func(x float64) (float64, float64) {
		f := RayleighRatio(x1, x, a)
		return CutComposition(x1, x, f), f
	}
	lo, hi := math.Log(1e-300), math.Log(x1)
	for i := 0; i < 100 && hi-lo > bisectTol; i++ {
		mid := (lo + hi) / 2
		if v, _ := avg(math.Exp(mid)); v > b.Target {
			hi = mid
		} else {
			lo = mid
		}
	}
	x := math.Exp(hi)
	_, f := avg(x)
	if w1*f < b.MinResidue {
		r.Limited = true
		f = b.MinResidue / w1
		x = RayleighComposition(x1, f, a)
	}
	r.Pot = Cut{N: w1 * f, Light: w1 * f * x}
	r.Heart = Cut{N: w1 - r.Pot.N, Light: w1*x1 - r.Pot.Light}
	return r
}
