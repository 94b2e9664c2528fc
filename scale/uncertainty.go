package scale

import (
	"math"
	"math/rand/v2"
	"runtime"
	"slices"
	"sort"
	"sync"

	"sepcost/costing"
	"sepcost/costing/ledger"
	"sepcost/costing/prices"
)

// Band is one method's cost per gram at one mass across the draws.
type Band struct {
	Method        string
	P10, P50, P90 float64 // cost per gram of purified product
	Feasible      float64 // share of draws in which the method was feasible
	Cheapest      float64 // share of draws in which it was the cheapest feasible method
}

// MassBand is every method's band at one batch mass.
type MassBand struct {
	Kg    float64
	Bands []Band // in method order
}

// CrossBand is where two methods change places, across the draws: the
// crossover mass as an interval.
type CrossBand struct {
	A, B          string  // the cheaper below, the cheaper above, in most draws
	P10, P50, P90 float64 // crossover mass, kg, over the draws in which they cross
	Share         float64 // share of draws in which they cross inside the masses swept
}

// Sensitivity is one input's rank correlation with cost per gram at the
// target mass.
type Sensitivity struct {
	Input    int       // index in Uncertainty.Inputs
	Rho      []float64 // per method (NaN when not feasible enough)
	Decision float64   // with the difference in cost per gram of the two leading methods; NaN for one method
}

// Worth is the expected value of perfect information of one input, money.
type Worth struct {
	Input int
	Value float64
}

// Uncertainty is the result of the Monte Carlo draws.
type Uncertainty struct {
	TargetKg    float64
	Draws       int
	Seed        uint64
	Bands       []Band     // at TargetKg
	Across      []MassBand // at each report mass, ascending
	Crossings   []CrossBand
	Inputs      []Uncertain
	Sensitivity []Sensitivity // ranked, strongest first
	Worth       []Worth       // ranked, largest first; inputs worth nothing left out
	EVPI        float64       // every input known at once, money
	Currency    string
	ProductG    float64 // grams of product in one crude batch at TargetKg: the money figures are for this batch
	Leading     [2]int  // the two methods cheapest at the nominal values (−1 when absent)
}

// MaxBandMasses bounds the masses the bands are drawn at: a sweep of 200
// masses gets its bands at 50 of them, evenly spread, which a chart on a
// logarithmic axis cannot tell from all 200 and which keeps the draws to
// a second or two (common practice, no source).
const MaxBandMasses = 50

// Thin keeps at most n of the ascending masses, the first and the last
// among them, evenly spaced by position.
func Thin(masses []float64, n int) []float64 {
	if len(masses) <= n || n < 2 {
		return masses
	}
	out := make([]float64, n)
	for k := range out {
		out[k] = masses[k*(len(masses)-1)/(n-1)]
	}
	return out
}

// minCrossMasses is the fewest masses the crossover intervals are found
// on: between three masses of an estimate, a hundredfold apart, an
// interpolated crossing would say more than the masses do (common
// practice, no source).
const minCrossMasses = 8

// Sample draws at the target mass only (see SampleAcross).
func Sample(p *costing.Plan, t *prices.Table, targetKg float64, draws int, seed uint64, progress func(done int)) (*Uncertainty, error) {
	return SampleAcross(p, t, targetKg, nil, draws, seed, progress)
}

// SampleAcross runs the methods for each draw of the uncertain inputs
// (newDesign: measured values, model settings written with a range, model
// coefficients by how sure they are, prices by their spread, the loading
// rule as a discrete alternative) at the target mass and at each of
// masses, with one draw of every input shared by all methods and masses.
// It reports P10/P50/P90 of cost per gram and the share of draws each
// method is cheapest at every mass, the crossover masses as intervals, the
// rank correlation of each input with cost per gram at the target mass and
// the value of perfect information of each input (voi.go). Each draw has
// its own generator seeded from (seed, draw), so results do not depend on
// how the draws are spread over the cores.
func SampleAcross(p *costing.Plan, t *prices.Table, targetKg float64, masses []float64, draws int, seed uint64, progress func(done int)) (*Uncertainty, error) {
	t, err := p.SitePrices(t) // with the equipment's charges, as every ledger of the plan
	if err != nil {
		return nil, err
	}
	nominal := ledger.NewRates(t)
	ms := append(append([]float64(nil), masses...), targetKg)
	d := newDesign(p, t, usedPrices(p, t, ms...))
	nJ, nM := len(p.Methods), len(ms)
	x, perG, err := d.drawAll(p, nominal, ms, draws, seed, progress)
	if err != nil {
		return nil, err
	}
	u := &Uncertainty{TargetKg: targetKg, Draws: draws, Seed: seed, Inputs: d.inputs, Currency: t.Currency,
		ProductG: targetKg * p.Scenario.Purity * 1000}
	names := p.MethodNames()
	at := func(m int) [][]float64 { // [draw][method] at mass m
		out := make([][]float64, draws)
		for k := range out {
			out[k] = perG[(k*nM+m)*nJ : (k*nM+m+1)*nJ]
		}
		return out
	}
	u.Bands = bands(names, at(nM-1))
	for m := range masses {
		u.Across = append(u.Across, MassBand{Kg: masses[m], Bands: bands(names, at(m))})
	}
	if len(masses) >= minCrossMasses {
		u.Crossings = crossings(names, masses, at)
	}
	u.weighInputs(p, nominal, x, at(nM-1))
	return u, nil
}

// drawAll makes the draws: for draw k, the row of inputs x[k·nI : (k+1)·nI]
// and the cost per gram of method j at mass m, perG[(k·nM + m)·nJ + j]
// (NaN when not feasible), nI inputs, nM masses, nJ methods.
func (d *design) drawAll(p *costing.Plan, nominal *ledger.Rates, ms []float64, draws int, seed uint64, progress func(done int)) (x, perG []float64, err error) {
	nJ, nM, nI := len(p.Methods), len(ms), len(d.inputs)
	x = make([]float64, draws*nI)
	perG = make([]float64, draws*nM*nJ)
	err = run(draws, progress, func(k int) error {
		rng := rand.New(rand.NewPCG(seed, uint64(k)))
		xk := x[k*nI : (k+1)*nI]
		d.sample(rng, xk)
		q, r := d.apply(p, nominal, xk)
		for m, kg := range ms {
			for j := range nJ {
				v, err := q.PerGramLean(j, kg, r)
				if err != nil {
					return err
				}
				perG[(k*nM+m)*nJ+j] = v
			}
		}
		return nil
	})
	return x, perG, err
}

// run calls f for each draw on all cores; the first error stops nothing
// but is returned.
func run(draws int, progress func(int), f func(k int) error) error {
	errs := make([]error, draws)
	var wg sync.WaitGroup
	var mu sync.Mutex
	done := 0
	next := make(chan int, 64)
	for range runtime.GOMAXPROCS(0) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for k := range next {
				errs[k] = f(k)
				if progress != nil {
					mu.Lock()
					done++
					progress(done)
					mu.Unlock()
				}
			}
		}()
	}
	for k := range draws {
		next <- k
	}
	close(next)
	wg.Wait()
	for _, err := range errs {
		if err != nil {
			return err
		}
	}
	return nil
}

// bands summarises cost per gram per method over the draws at one mass.
func bands(names []string, perG [][]float64) []Band {
	draws := len(perG)
	wins := make([]int, len(names))
	for _, row := range perG {
		if b := cheapest(row); b >= 0 {
			wins[b]++
		}
	}
	out := make([]Band, len(names))
	vals := make([]float64, 0, draws)
	for j, name := range names {
		vals = vals[:0]
		for _, row := range perG {
			if !math.IsNaN(row[j]) {
				vals = append(vals, row[j])
			}
		}
		b := Band{Method: name, P10: math.NaN(), P50: math.NaN(), P90: math.NaN()}
		if draws > 0 {
			b.Feasible, b.Cheapest = float64(len(vals))/float64(draws), float64(wins[j])/float64(draws)
		}
		if len(vals) > 0 {
			sort.Float64s(vals)
			b.P10, b.P50, b.P90 = quantile(vals, 0.1), quantile(vals, 0.5), quantile(vals, 0.9)
		}
		out[j] = b
	}
	return out
}

// quantile is the linear-interpolation sample quantile (Hyndman and Fan
// 1996, definition 7, the spreadsheet PERCENTILE rule) of sorted values.
func quantile(sorted []float64, q float64) float64 {
	h := q * float64(len(sorted)-1)
	lo := math.Floor(h)
	i := int(lo)
	if i+1 >= len(sorted) {
		return sorted[len(sorted)-1]
	}
	return sorted[i] + (h-lo)*(sorted[i+1]-sorted[i])
}

// crossings finds, for every pair of methods, the first mass at which they
// change places in each draw (ln of the cost ratio interpolated linearly
// in ln mass between neighbouring masses, as the sweep's grid does before
// bisection), and reports the interval over the draws in which they cross.
func crossings(names []string, masses []float64, at func(m int) [][]float64) []CrossBand {
	grids := make([][][]float64, len(masses))
	for m := range masses {
		grids[m] = at(m)
	}
	draws := len(grids[0])
	var out []CrossBand
	for a := range names {
		for b := a + 1; b < len(names); b++ {
			var kg []float64
			first := 0 // draws in which a is cheaper before the crossing
			for k := 0; k < draws; k++ {
				for m := 0; m+1 < len(masses); m++ {
					d0 := math.Log(grids[m][k][a] / grids[m][k][b])
					d1 := math.Log(grids[m+1][k][a] / grids[m+1][k][b])
					if math.IsNaN(d0) || math.IsNaN(d1) || (d0 < 0) == (d1 < 0) || d0 == 0 && d1 == 0 {
						continue
					}
					f := d0 / (d0 - d1)
					kg = append(kg, math.Exp(math.Log(masses[m])+f*(math.Log(masses[m+1])-math.Log(masses[m]))))
					if d0 < 0 {
						first++
					}
					break
				}
			}
			if len(kg) == 0 {
				continue
			}
			sort.Float64s(kg)
			cb := CrossBand{A: names[a], B: names[b], P10: quantile(kg, 0.1), P50: quantile(kg, 0.5), P90: quantile(kg, 0.9),
				Share: float64(len(kg)) / float64(draws)}
			if 2*first < len(kg) {
				cb.A, cb.B = cb.B, cb.A
			}
			out = append(out, cb)
		}
	}
	return out
}

// weighInputs ranks the inputs by rank correlation with cost per gram at
// the target mass and by the value of perfect information (voi.go). Each
// input's draws are ordered once, for its ranks and its bins; the inputs
// are weighed on all cores, each into its own slot.
func (u *Uncertainty) weighInputs(p *costing.Plan, r *ledger.Rates, x []float64, perG [][]float64) {
	nI, draws := len(u.Inputs), len(perG)
	u.Leading = leading(p, r, u.TargetKg)
	var ys [][]float64 // cost per gram of each method, then the leading two's difference
	for j := range p.Methods {
		col := make([]float64, draws)
		for k := range col {
			col[k] = perG[k][j]
		}
		ys = append(ys, col)
	}
	if u.Leading[1] >= 0 {
		diff := make([]float64, draws)
		for k := range diff {
			diff[k] = perG[k][u.Leading[0]] - perG[k][u.Leading[1]]
		}
		ys = append(ys, diff)
	}
	groups := rankGroups(ys)
	nb := netBenefit(perG, u.ProductG)
	u.EVPI = evpi(nb.rows)
	sens := make([]Sensitivity, nI)
	worth := make([]float64, nI)
	_ = run(nI, nil, func(i int) error {
		xi := make([]float64, draws)
		for k := range xi {
			xi[k] = x[k*nI+i]
		}
		order := argsort(xi)
		rho := make([]float64, len(ys))
		for c := range rho {
			rho[c] = math.NaN()
		}
		full := ranksOrdered(xi, order)
		for _, g := range groups {
			rx := full
			if g.valid != nil {
				rx = ranks(subset(xi, g.valid))
			}
			for n, c := range g.cols {
				rho[c] = pearson(rx, g.ry[n])
			}
		}
		s := Sensitivity{Input: i, Rho: rho[:len(p.Methods)], Decision: math.NaN()}
		if len(ys) > len(p.Methods) {
			s.Decision = rho[len(p.Methods)]
		}
		sens[i] = s
		if len(nb.draw) == draws {
			worth[i] = evppiOrdered(xi, nb.rows, order)
		} else {
			xk := make([]float64, len(nb.draw))
			for n, k := range nb.draw {
				xk[n] = xi[k]
			}
			worth[i] = evppi(xk, nb.rows)
		}
		return nil
	})
	u.Sensitivity = sens
	for i, v := range worth {
		// Below a ten-thousandth of the whole value is rounding noise.
		if v = math.Min(v, u.EVPI); v > 1e-4*u.EVPI {
			u.Worth = append(u.Worth, Worth{Input: i, Value: v})
		}
	}
	sort.SliceStable(u.Sensitivity, func(a, b int) bool { return strength(u.Sensitivity[a]) > strength(u.Sensitivity[b]) })
	sort.SliceStable(u.Worth, func(a, b int) bool { return u.Worth[a].Value > u.Worth[b].Value })
}

// rankGroup is columns that are numbers in the same draws (valid; nil for
// all draws), with their ranks over those draws: an input's draws are
// ranked once per group, not once per column.
type rankGroup struct {
	valid []int
	cols  []int
	ry    [][]float64
}

// rankGroups groups the columns by the draws in which they are numbers;
// a column that is a number in fewer than three draws is left out (its
// correlations stay NaN).
func rankGroups(ys [][]float64) []rankGroup {
	var gs []rankGroup
	for c, y := range ys {
		var valid []int
		for k, v := range y {
			if !math.IsNaN(v) {
				valid = append(valid, k)
			}
		}
		if len(valid) < 3 {
			continue
		}
		if len(valid) == len(y) {
			valid = nil
		}
		g := -1
		for i := range gs {
			if slices.Equal(gs[i].valid, valid) {
				g = i
			}
		}
		if g < 0 {
			gs = append(gs, rankGroup{valid: valid})
			g = len(gs) - 1
		}
		gs[g].cols = append(gs[g].cols, c)
		gs[g].ry = append(gs[g].ry, ranks(subset(y, valid)))
	}
	return gs
}

// subset is v at the indexes given; v itself for nil.
func subset(v []float64, idx []int) []float64 {
	if idx == nil {
		return v
	}
	out := make([]float64, len(idx))
	for n, k := range idx {
		out[n] = v[k]
	}
	return out
}

// strength is the rank correlation that orders the sensitivity table: with
// the decision when there are two methods, else the largest by method.
func strength(s Sensitivity) float64 {
	if !math.IsNaN(s.Decision) {
		return math.Abs(s.Decision)
	}
	m := 0.0
	for _, r := range s.Rho {
		if !math.IsNaN(r) {
			m = math.Max(m, math.Abs(r))
		}
	}
	return m
}

// leading are the two methods cheapest per gram at the nominal values.
func leading(p *costing.Plan, r *ledger.Rates, kg float64) [2]int {
	out := [2]int{-1, -1}
	var best [2]float64
	for j := range p.Methods {
		v, err := p.PerGramLean(j, kg, r)
		if err != nil || math.IsNaN(v) {
			continue
		}
		switch {
		case out[0] < 0 || v < best[0]:
			out[1], best[1] = out[0], best[0]
			out[0], best[0] = j, v
		case out[1] < 0 || v < best[1]:
			out[1], best[1] = j, v
		}
	}
	return out
}

// benefits are the net benefits of the draws the value of information
// uses, with the draw each row came from.
type benefits struct {
	rows [][]float64 // [row][method]: −cost of one batch's product, money
	draw []int
}

// netBenefit is −(cost per gram × grams of product) per draw and method,
// for the methods feasible in some draw. A method that is not feasible in
// a draw is costed as the cheapest feasible method of that draw (it would
// be found out and replaced), so the value of learning that it fails is
// counted at nothing: the values are lower bounds. Draws in which no method
// is feasible are left out.
func netBenefit(perG [][]float64, grams float64) benefits {
	if len(perG) == 0 {
		return benefits{}
	}
	var cols []int
	for j := range perG[0] {
		for _, row := range perG {
			if !math.IsNaN(row[j]) {
				cols = append(cols, j)
				break
			}
		}
	}
	var b benefits
	for k, row := range perG {
		best := cheapest(row)
		if best < 0 {
			continue
		}
		out := make([]float64, len(cols))
		for n, j := range cols {
			v := row[j]
			if math.IsNaN(v) {
				v = row[best]
			}
			out[n] = -v * grams
		}
		b.rows = append(b.rows, out)
		b.draw = append(b.draw, k)
	}
	return b
}
