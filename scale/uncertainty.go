package scale

import (
	"math"
	"math/rand/v2"
	"runtime"
	"sort"
	"sync"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Spread is the relative uncertainty (σ of the natural log of a
// multiplicative factor) given to a coefficient by how sure its value is,
// and to every price. A value seen in a published table is known to a few
// per cent; one from memory to some 15 %; a habit of the trade to a
// quarter (common practice, no source: these are this project's choices
// and are printed on the Uncertainty sheet).
var Spread = map[source.Mark]float64{
	source.Confirmed:      0.05,
	source.Derived:        0.10,
	source.Calibrated:     0.10,
	source.FromMemory:     0.15,
	source.Override:       0.10,
	source.CommonPractice: 0.25,
	source.Example:        0.25,
}

// PriceSpread is the σ of ln(price) for every price-table item: quotes and
// catalogue prices drift by about a tenth within a budget year (common
// practice, no source).
const PriceSpread = 0.10

// Band is one method's cost per gram at the target mass across the draws.
type Band struct {
	Method        string
	P10, P50, P90 float64 // cost per gram of purified product
	Feasible      float64 // share of draws in which the method was feasible
	Cheapest      float64 // share of draws in which it was the cheapest feasible method
}

// Uncertainty is the result of the Monte Carlo draws at one mass.
type Uncertainty struct {
	TargetKg float64
	Draws    int
	Seed     uint64
	Bands    []Band
}

// Sample draws every coefficient (but temperatures, which are not scale
// quantities) and every price from log-normal factors around its value,
// with σ by its Mark (Spread) and PriceSpread, runs every method at the
// target mass for each draw, and reports P10/P50/P90 of cost per gram and
// the share of draws in which each method is cheapest. Each draw has its
// own generator seeded from (seed, draw), so results do not depend on how
// the draws are spread over the workers. Plain numbers below 1 (shares,
// fractions, efficiencies) are drawn on their odds so they stay in (0, 1).
func Sample(p *costing.Plan, t *prices.Table, targetKg float64, draws int, seed uint64, progress func(done int)) (*Uncertainty, error) {
	names := p.MethodNames()
	perG := make([][]float64, draws) // [draw][method]
	errs := make([]error, draws)
	workers := runtime.GOMAXPROCS(0)
	var wg sync.WaitGroup
	var mu sync.Mutex
	done := 0
	next := make(chan int)
	for w := 0; w < workers; w++ {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for d := range next {
				rng := rand.New(rand.NewPCG(seed, uint64(d)))
				q := p.WithCoefficients(drawCoefficients(p.Coef, rng))
				tb := drawPrices(t, rng)
				row := make([]float64, len(names))
				for j := range names {
					r, err := q.RunOne(j, targetKg, tb)
					if err != nil {
						errs[d] = err
						break
					}
					row[j] = r.PerGram()
				}
				perG[d] = row
				if progress != nil {
					mu.Lock()
					done++
					progress(done)
					mu.Unlock()
				}
			}
		}()
	}
	for d := 0; d < draws; d++ {
		next <- d
	}
	close(next)
	wg.Wait()
	for _, err := range errs {
		if err != nil {
			return nil, err
		}
	}
	u := &Uncertainty{TargetKg: targetKg, Draws: draws, Seed: seed}
	wins := make([]int, len(names))
	for _, row := range perG {
		if best := cheapest(row); best >= 0 {
			wins[best]++
		}
	}
	for j, name := range names {
		var vals []float64
		for _, row := range perG {
			if !math.IsNaN(row[j]) {
				vals = append(vals, row[j])
			}
		}
		b := Band{Method: name, P10: math.NaN(), P50: math.NaN(), P90: math.NaN(), Feasible: float64(len(vals)) / float64(draws), Cheapest: float64(wins[j]) / float64(draws)}
		if len(vals) > 0 {
			sort.Float64s(vals)
			b.P10, b.P50, b.P90 = quantile(vals, 0.1), quantile(vals, 0.5), quantile(vals, 0.9)
		}
		u.Bands = append(u.Bands, b)
	}
	return u, nil
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

// drawCoefficients copies a set with each scale coefficient multiplied by
// a log-normal factor.
func drawCoefficients(c source.Set, rng *rand.Rand) source.Set {
	out := c.Clone()
	for _, k := range c.Keys() {
		if !perturbable(c[k]) {
			continue
		}
		out[k], _ = perturb(c[k], rng.NormFloat64())
	}
	return out
}

// perturbable reports whether a coefficient is drawn at all: it has a
// spread for its mark, is not a temperature and not zero.
func perturbable(co source.Coefficient) bool {
	_, ok := Spread[co.Mark]
	return ok && co.Dim != units.Temperature && co.SI != 0
}

// perturb moves a coefficient z standard deviations (σ = Spread of its
// mark) on the log scale: a plain share or fraction below 1 on its odds,
// so that it stays in (0, 1), anything else by the factor exp(z σ).
// Temperatures (not scale quantities), zeros, whole shares and marks
// without a spread are left alone (ok false).
func perturb(co source.Coefficient, z float64) (source.Coefficient, bool) {
	if !perturbable(co) {
		return co, false
	}
	sigma := Spread[co.Mark]
	switch {
	case co.Dim == units.None && co.SI == 1:
		return co, false // a whole share (e.g. fully attended) stays whole
	case co.Dim == units.None && co.SI < 1:
		odds := co.SI / (1 - co.SI) * math.Exp(sigma*z)
		co.SI = odds / (1 + odds)
	default:
		co.SI *= math.Exp(sigma * z)
	}
	return co, true
}

// drawPrices copies a price table with each price multiplied by a
// log-normal factor, kept to four decimal places.
func drawPrices(t *prices.Table, rng *rand.Rand) *prices.Table {
	c := *t
	c.Items = append([]prices.Item(nil), t.Items...)
	for i := range c.Items {
		f := math.Exp(PriceSpread * rng.NormFloat64())
		c.Items[i].Price = c.Items[i].Price.Mul(decimal.NewFromFloat(f)).Round(4)
	}
	return &c
}
