package cryst

import "math"

// Vessel is the equipment chosen for one pass.
type Vessel struct {
	Volume  float64 // nominal volume, m³
	Reactor bool    // a jacketed reactor rather than a flask
	Batches int     // batches run one after another to process the pass
	Fill    float64 // share of the nominal volume each batch fills
}

// ChooseVessel picks the smallest vessel whose working volume (nominal
// volume × fill limit) holds the batch liquid, trying the flasks first and
// then the reactors (each list ascending). Above the largest vessel the
// pass is split into the fewest equal batches that fit the largest one.
// With no vessels at all it returns a zero Vessel.
func ChooseVessel(liquid float64, flasks, reactors []float64, flaskFill, reactorFill float64) Vessel {
	for _, v := range flasks {
		if v*flaskFill >= liquid {
			return Vessel{Volume: v, Batches: 1, Fill: liquid / v}
		}
	}
	for _, v := range reactors {
		if v*reactorFill >= liquid {
			return Vessel{Volume: v, Reactor: true, Batches: 1, Fill: liquid / v}
		}
	}
	var out Vessel
	switch {
	case len(reactors) > 0:
		out = Vessel{Volume: reactors[len(reactors)-1], Reactor: true}
		out.Batches = int(math.Ceil(liquid / (out.Volume * reactorFill) * (1 - 1e-12)))
	case len(flasks) > 0:
		out = Vessel{Volume: flasks[len(flasks)-1]}
		out.Batches = int(math.Ceil(liquid / (out.Volume * flaskFill) * (1 - 1e-12)))
	default:
		return Vessel{}
	}
	if out.Batches < 1 {
		out.Batches = 1
	}
	out.Fill = liquid / float64(out.Batches) / out.Volume
	return out
}
