package scale

import (
	"fmt"
	"math"
)

// MaxPoints caps a sweep: beyond 10,000 masses the curve shows nothing new
// and the workbook grows to no purpose.
const MaxPoints = 10000

// LogSpace returns n masses spaced evenly in log between from and to (kg),
// both ends included.
func LogSpace(from, to float64, n int) ([]float64, error) {
	switch {
	case !(from > 0) || !(to > 0):
		return nil, fmt.Errorf("masses must be above zero (from %g kg, to %g kg)", from, to)
	case from >= to:
		return nil, fmt.Errorf("--from (%g kg) must be below --to (%g kg)", from, to)
	case n < 2:
		return nil, fmt.Errorf("--points %d: a curve needs at least 2 points", n)
	case n > MaxPoints:
		return nil, fmt.Errorf("--points %d: at most %d points; a few dozen show the curve", n, MaxPoints)
	}
	out := make([]float64, n)
	lf, lt := math.Log(from), math.Log(to)
	for i := range out {
		out[i] = math.Exp(lf + (lt-lf)*float64(i)/float64(n-1))
	}
	out[0], out[n-1] = from, to
	return out, nil
}
