package scenario

import (
	"fmt"
)

// Batch masses are bounded so that every count the models derive from them
// (columns, runs, fractions, vessels) stays far inside the integer range
// and every cost per gram stays finite: from 1 mg, below which no method
// here is a real procedure, to 10 t, beyond which the laboratory and
// kilo-lab equipment the models assume does not exist (common practice,
// no source).
const (
	MinBatchKg = 1e-6
	MaxBatchKg = 1e4
	// MaxMasses bounds the masses listed in one scenario.
	MaxMasses = 200
)

// BatchRange names the accepted batch masses, for messages.
const BatchRange = "from 1 mg to 10 t (10000 kg)"

// CheckBatchMass reports whether kg is an accepted batch mass, with what is
// valid in the message.
func CheckBatchMass(kg float64) error {
	if kg != kg || kg < MinBatchKg || kg > MaxBatchKg {
		return fmt.Errorf("a batch mass must lie %s", BatchRange)
	}
	return nil
}
