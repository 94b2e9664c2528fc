package scale

import (
	"math"

	"sepcost/costing"
	"sepcost/costing/prices"
)

// CrossoverPrecision is the relative width in mass to which a crossover is
// bracketed by bisection.
const CrossoverPrecision = 1e-4

// Crossover is a batch mass at which two methods change places in cost per
// gram of purified product.
type Crossover struct {
	A, B         string  // the two methods
	MassKg       float64 // crude batch mass of the change, to CrossoverPrecision
	CheaperBelow string  // the cheaper method just below the mass
	CheaperAbove string  // the cheaper method just above the mass
	Step         bool    // the change happens at an equipment step (a jump), not a smooth crossing
}

// costFunc returns cost per gram of purified product of method j at m, NaN
// when infeasible.
type costFunc func(j int, m float64) (float64, error)

// planCost builds a costFunc on the model itself.
func planCost(p *costing.Plan, t *prices.Table) costFunc {
	return func(j int, m float64) (float64, error) {
		r, err := p.RunOne(j, m, t)
		if err != nil {
			return 0, err
		}
		return r.PerGram(), nil
	}
}

// findCrossovers scans the grid for sign changes of cost(a) − cost(b)
// between neighbouring masses and bisects each on the model (in ln m) to
// CrossoverPrecision. grid[k][j] holds the cost per gram at masses[k].
func findCrossovers(names []string, masses []float64, grid [][]float64, cost costFunc) ([]Crossover, error) {
	var out []Crossover
	for a := 0; a < len(names); a++ {
		for b := a + 1; b < len(names); b++ {
			for k := 0; k+1 < len(masses); k++ {
				d0 := grid[k][a] - grid[k][b]
				d1 := grid[k+1][a] - grid[k+1][b]
				if math.IsNaN(d0) || math.IsNaN(d1) || d0 == 0 || (d0 > 0) == (d1 > 0) {
					continue
				}
				lo, hi := math.Log(masses[k]), math.Log(masses[k+1])
				dlo, dhi := d0, d1
				for hi-lo > CrossoverPrecision {
					mid := (lo + hi) / 2
					ca, err := cost(a, math.Exp(mid))
					if err != nil {
						return nil, err
					}
					cb, err := cost(b, math.Exp(mid))
					if err != nil {
						return nil, err
					}
					dm := ca - cb
					if math.IsNaN(dm) {
						break
					}
					if (dm > 0) == (dlo > 0) {
						lo, dlo = mid, dm
					} else {
						hi, dhi = mid, dm
					}
				}
				c := Crossover{A: names[a], B: names[b], MassKg: math.Exp((lo + hi) / 2)}
				if dlo < 0 {
					c.CheaperBelow, c.CheaperAbove = names[a], names[b]
				} else {
					c.CheaperBelow, c.CheaperAbove = names[b], names[a]
				}
				// A smooth crossing has a difference that shrinks with the
				// bracket; a step leaves a jump of the order of the costs.
				scale := math.Max(math.Abs(grid[k][a]), math.Abs(grid[k][b]))
				c.Step = math.Abs(dhi-dlo) > 0.01*scale
				out = append(out, c)
			}
		}
	}
	return out, nil
}
