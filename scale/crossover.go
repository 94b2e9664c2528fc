package scale

import (
	"fmt"
	"math"

	"sepcost/costing"
	"sepcost/costing/prices"
)

// CrossoverPrecision is the relative width in mass to which a crossover is
// bracketed by bisection.
const CrossoverPrecision = 1e-4

// StepJump is the relative jump in a method's cost per gram across a
// bracket CrossoverPrecision wide above which the change is called an
// equipment step rather than a smooth crossing. A smooth cost curve moves
// by about the bracket's width (1e-4) across it; a change of column,
// vessel or still, or one more run, moves it by per cents (derived from
// CrossoverPrecision, with a hundredfold margin).
const StepJump = 0.01

// Kinds of change at a crossover.
const (
	Smooth     = "smooth crossing"      // both methods' costs continuous; their curves cross
	Step       = "equipment step"       // a method's cost jumps (another column, vessel or still, one more run)
	Feasible   = "becomes feasible"     // the method cheaper above cannot do the job below
	Infeasible = "becomes not feasible" // the method cheaper below cannot do the job above
)

// Crossover is a batch mass at which the cheaper method per gram of
// purified product changes.
//
// In Report.Crossovers it is a change of the decision: the cheapest
// feasible method of all (the one definition in cheapest.go) differs just
// below and just above MassKg; one side may have no feasible method, and
// the change may come from a method becoming feasible or not feasible. In
// Report.Pairwise it is where two methods change places, whichever is
// cheapest overall (a secondary table).
type Crossover struct {
	A, B         string  // the two methods (decision: below, above)
	MassKg       float64 // crude batch mass of the change, to CrossoverPrecision
	LoKg, HiKg   float64 // the bracket the change lies in
	CheaperBelow string  // the cheaper method just below the mass ("" when none is feasible)
	CheaperAbove string  // the cheaper method just above the mass ("" when none is feasible)
	Step         bool    // the change happens at an equipment step (a jump), not a smooth crossing
	Kind         string  // Smooth, Step, Feasible or Infeasible
	Detail       string  // what changes, in words (the equipment either side, the reason a method is not feasible)
}

// point is one method at one mass as the crossover search needs it.
type point struct {
	perG      float64 // cost per gram of purified product; NaN when infeasible
	equipment string
	reason    string // why it is not feasible
}

// evalFunc runs method j at crude mass m (kg).
type evalFunc func(j int, m float64) (point, error)

// planEval builds an evalFunc on the model itself.
func planEval(p *costing.Plan, t *prices.Table) evalFunc {
	return func(j int, m float64) (point, error) {
		r, err := p.RunOne(j, m, t)
		if err != nil {
			return point{}, err
		}
		return pointOf(r), nil
	}
}

func pointOf(r costing.Result) point {
	return point{perG: r.PerGram(), equipment: r.Usage.Equipment, reason: r.Usage.Reason}
}

func perGrams(ps []point) []float64 {
	out := make([]float64, len(ps))
	for j, p := range ps {
		out[j] = p.perG
	}
	return out
}

// decisionSearch brackets the changes of the cheapest feasible method.
type decisionSearch struct {
	names []string
	eval  evalFunc
	out   []Crossover
}

// at runs every method at exp(lnm).
func (s *decisionSearch) at(lnm float64) ([]point, error) {
	ps := make([]point, len(s.names))
	for j := range s.names {
		p, err := s.eval(j, math.Exp(lnm))
		if err != nil {
			return nil, err
		}
		ps[j] = p
	}
	return ps, nil
}

// atWith is at with method j's point already known.
func (s *decisionSearch) atWith(lnm float64, j int, pj point) ([]point, error) {
	ps := make([]point, len(s.names))
	for k := range s.names {
		if k == j {
			ps[k] = pj
			continue
		}
		p, err := s.eval(k, math.Exp(lnm))
		if err != nil {
			return nil, err
		}
		ps[k] = p
	}
	return ps, nil
}

// findDecisionCrossovers scans the grid (grid[k][j]: method j at masses[k])
// for neighbouring masses whose cheapest feasible method differs, and
// bisects each interval on the model in ln m to CrossoverPrecision. Where
// a third method wins inside an interval, both changes are bracketed.
// Where both ends have the same cheapest method but a method's equipment
// changes in between, its cost jumps there, so another method may win
// just before or after the step (a change and its reversal inside one
// interval): steps looks on both sides of the step for that.
func findDecisionCrossovers(names []string, masses []float64, grid [][]point, eval evalFunc) ([]Crossover, error) {
	s := &decisionSearch{names: names, eval: eval}
	for k := 0; k+1 < len(masses); k++ {
		if cheapest(perGrams(grid[k])) == cheapest(perGrams(grid[k+1])) {
			if err := s.steps(math.Log(masses[k]), math.Log(masses[k+1]), grid[k], grid[k+1]); err != nil {
				return nil, err
			}
			continue
		}
		if err := s.bracket(math.Log(masses[k]), math.Log(masses[k+1]), grid[k], grid[k+1]); err != nil {
			return nil, err
		}
	}
	return s.out, nil
}

// bracket narrows [lo, hi] (ln kg), whose cheapest methods differ, to
// CrossoverPrecision and records the change.
func (s *decisionSearch) bracket(lo, hi float64, plo, phi []point) error {
	wlo, whi := cheapest(perGrams(plo)), cheapest(perGrams(phi))
	for hi-lo > CrossoverPrecision {
		mid := (lo + hi) / 2
		pm, err := s.at(mid)
		if err != nil {
			return err
		}
		switch wm := cheapest(perGrams(pm)); wm {
		case wlo:
			lo, plo = mid, pm
		case whi:
			hi, phi = mid, pm
		default:
			// A third method is cheapest in between: two changes.
			if err := s.bracket(lo, mid, plo, pm); err != nil {
				return err
			}
			return s.bracket(mid, hi, pm, phi)
		}
	}
	s.out = append(s.out, s.describe(lo, hi, plo, phi, wlo, whi))
	return nil
}

// steps looks inside [lo, hi] (ln kg), whose ends have the same cheapest
// method, for an equipment step of any method (its equipment differs at
// the two ends): it bisects to the step and, where another method is
// cheapest just below or just above it, brackets the change into that
// window and the change out of it.
func (s *decisionSearch) steps(lo, hi float64, plo, phi []point) error {
	w := cheapest(perGrams(plo))
	for j := range s.names {
		if plo[j].equipment == phi[j].equipment {
			continue
		}
		// The bisection follows method j alone; the other methods are run
		// only at the two masses it ends on (the models are pure functions
		// of the mass, so the points are those a full run would give).
		a, b := lo, hi
		eqA := plo[j].equipment
		pa, pb := plo, phi
		var ja, jb point // method j where a or b was last moved to
		for b-a > CrossoverPrecision {
			mid := (a + b) / 2
			pj, err := s.eval(j, math.Exp(mid))
			if err != nil {
				return err
			}
			if pj.equipment == eqA {
				a, pa, ja = mid, nil, pj
			} else {
				b, pb, jb = mid, nil, pj
			}
		}
		for _, side := range []struct {
			m  float64
			p  []point
			pj point
		}{{a, pa, ja}, {b, pb, jb}} {
			if side.p == nil {
				var err error
				if side.p, err = s.atWith(side.m, j, side.pj); err != nil {
					return err
				}
			}
			if cheapest(perGrams(side.p)) == w {
				continue
			}
			if err := s.bracket(lo, side.m, plo, side.p); err != nil {
				return err
			}
			return s.bracket(side.m, hi, side.p, phi)
		}
	}
	return nil
}

// describe labels a bracketed change of the cheapest method from wlo to
// whi: a method that becomes feasible or not feasible, an equipment step
// (a cost that jumps by more than StepJump across the bracket), or a
// smooth crossing.
func (s *decisionSearch) describe(lo, hi float64, plo, phi []point, wlo, whi int) Crossover {
	name := func(j int) string {
		if j < 0 {
			return ""
		}
		return s.names[j]
	}
	c := Crossover{A: name(wlo), B: name(whi), MassKg: math.Exp((lo + hi) / 2), LoKg: math.Exp(lo), HiKg: math.Exp(hi),
		CheaperBelow: name(wlo), CheaperAbove: name(whi), Kind: Smooth}
	switch {
	case whi >= 0 && math.IsNaN(plo[whi].perG):
		c.Kind = Feasible
		c.Detail = fmt.Sprintf("below this mass %s is not feasible: %s", s.names[whi], plo[whi].reason)
	case wlo >= 0 && math.IsNaN(phi[wlo].perG):
		c.Kind = Infeasible
		c.Detail = fmt.Sprintf("above this mass %s is not feasible: %s", s.names[wlo], phi[wlo].reason)
	default:
		for _, j := range []int{wlo, whi} {
			a, b := plo[j], phi[j]
			if math.Abs(b.perG-a.perG) > StepJump*math.Min(a.perG, b.perG) {
				c.Kind, c.Step = Step, true
				c.Detail = jumpDetail(s.names[j], a, b)
				break
			}
		}
	}
	return c
}

// jumpDetail says how a method's cost and equipment change across a step.
func jumpDetail(method string, a, b point) string {
	eq := ""
	if a.equipment != b.equipment {
		eq = fmt.Sprintf(": %s → %s", a.equipment, b.equipment)
	}
	return fmt.Sprintf("%s jumps from %.4g to %.4g per gram%s", method, a.perG, b.perG, eq)
}

// findPairwise scans the grid for sign changes of cost(a) − cost(b)
// between neighbouring masses for every pair of methods feasible at both,
// and bisects each on the model (in ln m) to CrossoverPrecision. These are
// where two methods change places, whether or not either is the cheapest
// of all: a secondary table beside the decision's crossovers.
func findPairwise(names []string, masses []float64, grid [][]point, eval evalFunc) ([]Crossover, error) {
	var out []Crossover
	for a := 0; a < len(names); a++ {
		for b := a + 1; b < len(names); b++ {
			for k := 0; k+1 < len(masses); k++ {
				d0 := grid[k][a].perG - grid[k][b].perG
				d1 := grid[k+1][a].perG - grid[k+1][b].perG
				if math.IsNaN(d0) || math.IsNaN(d1) || d0 == 0 || (d0 > 0) == (d1 > 0) {
					continue
				}
				c, err := bisectPair(names, a, b, masses[k], masses[k+1], grid[k], grid[k+1], eval)
				if err != nil {
					return nil, err
				}
				out = append(out, c)
			}
		}
	}
	return out, nil
}

// bisectPair narrows a sign change of cost(a) − cost(b) between m0 and m1.
func bisectPair(names []string, a, b int, m0, m1 float64, p0, p1 []point, eval evalFunc) (Crossover, error) {
	lo, hi := math.Log(m0), math.Log(m1)
	la, lb, ha, hb := p0[a], p0[b], p1[a], p1[b]
	for hi-lo > CrossoverPrecision {
		mid := (lo + hi) / 2
		pa, err := eval(a, math.Exp(mid))
		if err != nil {
			return Crossover{}, err
		}
		pb, err := eval(b, math.Exp(mid))
		if err != nil {
			return Crossover{}, err
		}
		dm := pa.perG - pb.perG
		if math.IsNaN(dm) {
			break
		}
		if (dm > 0) == (la.perG-lb.perG > 0) {
			lo, la, lb = mid, pa, pb
		} else {
			hi, ha, hb = mid, pa, pb
		}
	}
	c := Crossover{A: names[a], B: names[b], MassKg: math.Exp((lo + hi) / 2), LoKg: math.Exp(lo), HiKg: math.Exp(hi), Kind: Smooth}
	if la.perG < lb.perG {
		c.CheaperBelow, c.CheaperAbove = names[a], names[b]
	} else {
		c.CheaperBelow, c.CheaperAbove = names[b], names[a]
	}
	for _, s := range [][2]point{{la, ha}, {lb, hb}} {
		if math.Abs(s[1].perG-s[0].perG) > StepJump*math.Min(s[0].perG, s[1].perG) {
			c.Kind, c.Step = Step, true
		}
	}
	return c, nil
}
