package cryst

// Stop says why the passes ended.
type Stop int

// Reasons the passes end.
const (
	Reached       Stop = iota // the target purity was reached
	NoCrystals                // the product stays in solution at the isolation temperature
	Stalled                   // a pass no longer raises the purity
	TooManyPasses             // the target needs more passes than allowed
)

// Outcome is the result of repeated passes.
type Outcome struct {
	Passes []PassResult
	Stop   Stop
	Purity float64 // purity of the last pass's crystals (the crude's if none ran)
}

// Purify runs passes on the crystals of the one before until the product
// mass fraction reaches target, at most maxPasses times. Each pass starts
// from the wet cake of the previous one; its retained liquid's solutes come
// along (PassResult.Out). The purity path does not depend on the batch
// mass: every quantity in a pass scales with the feed.
//
// A pass that does not raise the purity stops the series (Stalled): when
// the impurity's share exceeds the ratio of the two cold solubilities it
// co-crystallises in step with the product and further passes cannot purge
// it. A pass with no crystals stops it too (NoCrystals).
func Purify(p Pass, in Feed, target float64, maxPasses int) Outcome {
	return PurifyWith(func(Feed) Pass { return p }, in, target, maxPasses)
}

// PurifyWith is Purify with the conditions of each pass set from its feed
// (the vessel, and with it the cooling rate and the occluded liquor,
// depend on the amount charged).
func PurifyWith(setup func(Feed) Pass, in Feed, target float64, maxPasses int) Outcome {
	out := Outcome{Purity: in.Purity()}
	feed := in
	for k := 0; k < maxPasses; k++ {
		r := setup(feed).Run(feed)
		if r.Crystallised <= 0 {
			out.Stop = NoCrystals
			return out
		}
		out.Passes = append(out.Passes, r)
		pur := r.Out.Purity()
		if pur >= target {
			out.Purity, out.Stop = pur, Reached
			return out
		}
		if pur <= out.Purity*(1+1e-12) {
			out.Purity, out.Stop = pur, Stalled
			return out
		}
		out.Purity = pur
		feed = r.Out
	}
	out.Stop = TooManyPasses
	return out
}

// Yield is the product recovered over all passes per product charged.
func (o Outcome) Yield() float64 {
	if len(o.Passes) == 0 || o.Passes[0].In.Product <= 0 {
		return 0
	}
	return o.Passes[len(o.Passes)-1].Out.Product / o.Passes[0].In.Product
}
