package distil

import "math"

// DefaultStillsM3 are the still (flask) volumes a site is assumed to have
// unless the scenario lists its own: round-bottom flasks from 10 mL to 20 L
// and jacketed glass stills of 50 and 100 L (common practice, no source;
// the usual catalogue sizes of laboratory glassware).
var DefaultStillsM3 = []float64{10e-6, 25e-6, 50e-6, 100e-6, 250e-6, 500e-6, 1e-3, 2e-3, 5e-3, 10e-3, 20e-3, 50e-3, 100e-3}

// Still is the chosen still for a batch.
type Still struct {
	Volume  float64 // nominal volume, m³
	Batches int     // how many times it is charged and run
	Charge  float64 // liquid volume of one charge, m³
}

// ChooseStill picks the smallest still whose fill limit holds the charge:
//
//	V_still ≥ V_charge / fill
//
// Above the largest still the batch is split into the fewest equal charges
// that fit it. stills must be ascending and non-empty; fill in (0, 1].
func ChooseStill(chargeM3, fill float64, stills []float64) Still {
	largest := stills[len(stills)-1]
	batches := int(math.Ceil(chargeM3/(fill*largest) - 1e-9))
	if batches < 1 {
		batches = 1
	}
	per := chargeM3 / float64(batches)
	v := largest
	for _, s := range stills {
		if s*fill >= per*(1-1e-9) {
			v = s
			break
		}
	}
	return Still{Volume: v, Batches: batches, Charge: per}
}

// HoldupVolume is the liquid held in the still head, condenser and column
// while the still runs:
//
//	V_hold = (h_head + n · h_stage) · V_still
//
// h_head and h_stage are shares of the still volume (for the head and per
// theoretical stage of the column), n the column's theoretical stages.
// Glassware and columns are sized with the still, so hold-up scales with
// its volume, not with the charge: a small charge in its smallest still
// loses a larger share.
func HoldupVolume(still, stages, hHead, hStage float64) float64 {
	return (hHead + stages*hStage) * still
}

// HeatedAreaScale is how a still's boil-up rate scales with its volume:
// heat enters through the wetted wall, whose area grows as V^(2/3) for
// geometrically similar vessels,
//
//	B(V) = B_ref · (V / V_ref)^(2/3)
//
// (geometric similarity; the same scaling the project uses for jacketed
// cooling, REFERENCES: standard heat transfer, from memory).
func HeatedAreaScale(v, vRef float64) float64 { return math.Pow(v/vRef, 2.0/3.0) }
