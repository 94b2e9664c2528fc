package scale

import (
	"fmt"
	"math"
	"sync"

	"sepcost/costing"
	"sepcost/costing/parallel"
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
	kg   float64 // the crude mass it was run at
	perG float64 // cost per gram of purified product; NaN when infeasible
	// bound: the reported cost per gram lies within perG ± bound (0: perG
	// is the reported one).
	bound     float64
	id        string // the equipment's identity (usage.Usage.EquipmentID)
	equipment string // the equipment in words
	reason    string // why it is not feasible (worded only when !lean)
	lean      bool   // from the lean path: perG within bound, reason not worded
}

// evalFunc runs method j at crude mass m (kg).
type evalFunc func(j int, m float64) (point, error)

// planEval builds an evalFunc on the model itself: the point a report
// holds (Plan.RunOne), words and decimal ledger.
func planEval(p *costing.Plan, t *prices.Table) evalFunc {
	return func(j int, m float64) (point, error) {
		r, err := p.RunOne(j, m, t)
		if err != nil {
			return point{}, err
		}
		return pointOf(r, m), nil
	}
}

// leanEval builds the search's evalFunc: a quiet plan (Plan.Quiet, no
// notes) priced with float rates (Plan.PerGramBound), the same kept plan
// as planEval's with its cost per gram within a bound of the reported one.
func leanEval(p *costing.Plan, t *prices.Table) (evalFunc, error) {
	st, err := p.SitePrices(t)
	if err != nil {
		return nil, err
	}
	q := p.Quiet(p.Scenario, p.Coef)
	return func(j int, m float64) (point, error) {
		u, perG, bound, err := q.PerGramBound(j, m, st)
		if err != nil {
			return point{}, err
		}
		return point{kg: m, perG: perG, bound: bound, id: u.EquipmentID, equipment: u.Equipment, lean: true}, nil
	}, nil
}

func pointOf(r costing.Result, kg float64) point {
	u := r.Usage
	return point{kg: kg, perG: r.PerGram(), id: u.EquipmentID, equipment: u.Equipment, reason: u.Reason}
}

func perGrams(ps []point) []float64 {
	out := make([]float64, len(ps))
	for j, p := range ps {
		out[j] = p.perG
	}
	return out
}

// evals runs the models for a search over masses: each method at each
// mass at most once on each path (masses are keyed by their bits: the
// search computes a mass the same way each time it comes back to it),
// the lean path first, the full one where a choice or a word needs it.
// Safe for concurrent use: the searches of separate grid intervals share
// it (eachInterval).
type evals struct {
	lean, full evalFunc // lean may be nil: full alone
	mu         sync.Mutex
	cache      map[evalKey]point
	runs       int // model runs, both paths
	fullRuns   int // of which full
}

type evalKey struct {
	j  int
	kg uint64
}

func newEvals(full, lean evalFunc) *evals {
	return &evals{full: full, lean: lean, cache: map[evalKey]point{}}
}

// planEvals is the search's evals on a plan: lean, full where needed.
func planEvals(p *costing.Plan, t *prices.Table) (*evals, error) {
	lean, err := leanEval(p, t)
	if err != nil {
		return nil, err
	}
	return newEvals(planEval(p, t), lean), nil
}

// point is method j at m, lean when the search has a lean path.
func (e *evals) point(j int, m float64) (point, error) {
	k := evalKey{j, math.Float64bits(m)}
	if p, ok := e.cached(k); ok {
		return p, nil
	}
	run := e.lean
	if run == nil {
		run = e.full
	}
	p, err := run(j, m)
	if err != nil {
		return point{}, err
	}
	e.store(k, p)
	return p, nil
}

func (e *evals) cached(k evalKey) (point, bool) {
	e.mu.Lock()
	defer e.mu.Unlock()
	p, ok := e.cache[k]
	return p, ok
}

// store keeps a point just run, and counts the run.
func (e *evals) store(k evalKey, p point) {
	e.mu.Lock()
	defer e.mu.Unlock()
	e.runs++
	if !p.lean {
		e.fullRuns++
	}
	e.cache[k] = p
}

// upgrade replaces p, method j's point, when lean, by the full point at
// the same mass. exactOnly leaves a lean point whose cost is already
// exact (bound 0).
func (e *evals) upgrade(p *point, j int, exactOnly bool) error {
	if !p.lean || exactOnly && p.bound == 0 {
		return nil
	}
	k := evalKey{j, math.Float64bits(p.kg)}
	if q, ok := e.cached(k); ok && !q.lean {
		*p = q
		return nil
	}
	q, err := e.full(j, p.kg)
	if err != nil {
		return err
	}
	e.store(k, q)
	*p = q
	return nil
}

// cheapest is the cheapest feasible method of one mass's points (−1:
// none), the one the reported costs per gram give (cheapest.go): the
// lowest perG decides when it lies below every other feasible point by
// more than their bounds; otherwise the points with a bound are replaced
// by full ones (exact) and the exact costs decide.
func (e *evals) cheapest(ps []point) (int, error) {
	w := cheapest(perGrams(ps))
	if w < 0 {
		return w, nil
	}
	hi := ps[w].perG + ps[w].bound
	for j, p := range ps {
		if j != w && !math.IsNaN(p.perG) && !(p.perG-p.bound > hi) {
			for k := range ps {
				if err := e.upgrade(&ps[k], k, true); err != nil {
					return 0, err
				}
			}
			return cheapest(perGrams(ps)), nil
		}
	}
	return w, nil
}

// decisionSearch brackets the changes of the cheapest feasible method.
type decisionSearch struct {
	names []string
	e     *evals
	out   []Crossover
}

// at runs every method at exp(lnm).
func (s *decisionSearch) at(lnm float64) ([]point, error) {
	return s.atWith(lnm, -1, point{})
}

// atWith is at with method j's point already known (j < 0: none).
func (s *decisionSearch) atWith(lnm float64, j int, pj point) ([]point, error) {
	ps := make([]point, len(s.names))
	for k := range s.names {
		if k == j {
			ps[k] = pj
			continue
		}
		p, err := s.e.point(k, math.Exp(lnm))
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
// changes in between (usage.Usage.EquipmentID: another column, cartridge,
// evaporator, vessel or still, or another count of runs or batches, not a
// bed height), its cost jumps there, so another method may win just before
// or after the step (a change and its reversal inside one interval): steps
// looks on both sides of the step for that. Every choice of the cheapest
// is the one the reported costs make (evals.cheapest).
func findDecisionCrossovers(names []string, masses []float64, grid [][]point, e *evals) ([]Crossover, error) {
	return eachInterval(len(masses)-1, func(k int) ([]Crossover, error) {
		s := &decisionSearch{names: names, e: e}
		w0, err := e.cheapest(grid[k])
		if err != nil {
			return nil, err
		}
		w1, err := e.cheapest(grid[k+1])
		if err != nil {
			return nil, err
		}
		if w0 == w1 {
			err = s.steps(math.Log(masses[k]), math.Log(masses[k+1]), grid[k], grid[k+1])
		} else {
			err = s.bracket(math.Log(masses[k]), math.Log(masses[k+1]), grid[k], grid[k+1])
		}
		return s.out, err
	})
}

// eachInterval runs search(k) for the grid intervals k = 0 … n−1 on all
// cores and joins their crossovers in the order of k; the first error in
// that order is returned. Each interval's search is a pure function of
// the models at masses inside it (the grid's points are only read), so the
// result is the same on any number of cores.
func eachInterval(n int, search func(k int) ([]Crossover, error)) ([]Crossover, error) {
	outs := make([][]Crossover, max(n, 0))
	errs := make([]error, len(outs))
	parallel.For(len(outs), func(k int) { outs[k], errs[k] = search(k) })
	var all []Crossover
	for k, out := range outs {
		if errs[k] != nil {
			return nil, errs[k]
		}
		all = append(all, out...)
	}
	return all, nil
}

// bracket narrows [lo, hi] (ln kg), whose cheapest methods differ, to
// CrossoverPrecision and records the change.
func (s *decisionSearch) bracket(lo, hi float64, plo, phi []point) error {
	wlo, err := s.e.cheapest(plo)
	if err != nil {
		return err
	}
	whi, err := s.e.cheapest(phi)
	if err != nil {
		return err
	}
	for hi-lo > CrossoverPrecision {
		mid := (lo + hi) / 2
		pm, err := s.at(mid)
		if err != nil {
			return err
		}
		wm, err := s.e.cheapest(pm)
		if err != nil {
			return err
		}
		switch wm {
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
	c, err := s.describe(lo, hi, plo, phi, wlo, whi)
	s.out = append(s.out, c)
	return err
}

// steps looks inside [lo, hi] (ln kg), whose ends have the same cheapest
// method, for an equipment step of any method (its equipment identity
// differs at the two ends): it bisects to the step and, where another
// method is cheapest just below or just above it, brackets the change
// into that window and the change out of it.
func (s *decisionSearch) steps(lo, hi float64, plo, phi []point) error {
	w, err := s.e.cheapest(plo)
	if err != nil {
		return err
	}
	for j := range s.names {
		if plo[j].id == phi[j].id {
			continue
		}
		// The bisection follows method j alone; the other methods are run
		// only at the two masses it ends on (the models are pure functions
		// of the mass, so the points are those a full run would give).
		a, b := lo, hi
		idA := plo[j].id
		pa, pb := plo, phi
		var ja, jb point // method j where a or b was last moved to
		for b-a > CrossoverPrecision {
			mid := (a + b) / 2
			pj, err := s.e.point(j, math.Exp(mid))
			if err != nil {
				return err
			}
			if pj.id == idA {
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
				if side.p, err = s.atWith(side.m, j, side.pj); err != nil {
					return err
				}
			}
			ws, err := s.e.cheapest(side.p)
			if err != nil {
				return err
			}
			if ws == w {
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
// smooth crossing. The two methods' points either side are the full ones
// (the reported costs, the reasons in words).
func (s *decisionSearch) describe(lo, hi float64, plo, phi []point, wlo, whi int) (Crossover, error) {
	for _, j := range []int{wlo, whi} {
		for _, ps := range [][]point{plo, phi} {
			if j < 0 {
				continue
			}
			if err := s.e.upgrade(&ps[j], j, false); err != nil {
				return Crossover{}, err
			}
		}
	}
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
	return c, nil
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
func findPairwise(names []string, masses []float64, grid [][]point, e *evals) ([]Crossover, error) {
	var out []Crossover
	for a := 0; a < len(names); a++ {
		for b := a + 1; b < len(names); b++ {
			found, err := eachInterval(len(masses)-1, func(k int) ([]Crossover, error) {
				d0 := grid[k][a].perG - grid[k][b].perG
				d1 := grid[k+1][a].perG - grid[k+1][b].perG
				if math.IsNaN(d0) || math.IsNaN(d1) || d0 == 0 || (d0 > 0) == (d1 > 0) {
					return nil, nil
				}
				c, err := bisectPair(names, a, b, masses[k], masses[k+1], grid[k], grid[k+1], e)
				return []Crossover{c}, err
			})
			if err != nil {
				return nil, err
			}
			out = append(out, found...)
		}
	}
	return out, nil
}

// bisectPair narrows a sign change of cost(a) − cost(b) between m0 and m1
// (grid points: the reported costs). Each sign is the reported costs'
// (pairAt); the bracket's ends are described on full points.
func bisectPair(names []string, a, b int, m0, m1 float64, p0, p1 []point, e *evals) (Crossover, error) {
	lo, hi := math.Log(m0), math.Log(m1)
	la, lb, ha, hb := p0[a], p0[b], p1[a], p1[b]
	for hi-lo > CrossoverPrecision {
		mid := (lo + hi) / 2
		pa, pb, err := e.pairAt(a, b, math.Exp(mid))
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
	for _, end := range []struct {
		p *point
		j int
	}{{&la, a}, {&lb, b}, {&ha, a}, {&hb, b}} {
		if err := e.upgrade(end.p, end.j, false); err != nil {
			return Crossover{}, err
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

// pairAt is methods a and b at m with the sign of cost(a) − cost(b) the
// reported costs give: when the lean costs lie closer than their bounds,
// the full points.
func (e *evals) pairAt(a, b int, m float64) (point, point, error) {
	pa, err := e.point(a, m)
	if err != nil {
		return point{}, point{}, err
	}
	pb, err := e.point(b, m)
	if err != nil {
		return point{}, point{}, err
	}
	if d := pa.perG - pb.perG; !(math.Abs(d) > pa.bound+pb.bound) && !math.IsNaN(d) {
		if err := e.upgrade(&pa, a, true); err != nil {
			return point{}, point{}, err
		}
		if err := e.upgrade(&pb, b, true); err != nil {
			return point{}, point{}, err
		}
	}
	return pa, pb, nil
}
