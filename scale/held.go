package scale

import (
	"fmt"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/waste"
)

// HeldMasses is the most batch masses whose full results a report holds
// (Report.Results). A full result (usage with figures, notes and tables,
// decimal ledger, green metrics) takes about 20 KB a mass for the demos;
// a longer sweep keeps a compact Row per mass and method (a few hundred
// bytes) and recomputes a mass's full result when a writer asks for it,
// so that its memory stays flat in the number of masses. The models,
// ledger and metrics are pure functions of the plan, the prices and the
// mass, so the result recomputed is the one first computed
// (TestRecomputedResultsAreTheHeld). 1,000 keeps every estimate and the
// sweeps people draw (a few dozen to a thousand masses) whole, at a peak
// heap under 100 MB (BenchmarkSweepMemory), and spares them the
// recomputation, which costs a long sweep's workbook two more passes of
// the models (common practice, no source).
const HeldMasses = 1000

// walkChunk is how many masses a sweep runs, and a Walker recomputes, at
// once: enough to keep every core busy, few enough to hold a few MB (common
// practice, no source).
const walkChunk = 128

// collected is what Estimate keeps of the results at every mass.
type collected struct {
	results [][]Result // every result, when held
	rows    []Row      // every result as a Row, when not held
	waste   []WasteRow
	warn    warningSet
	used    []bool // price rows some ledger uses
}

// collect runs every method of the plan at every mass, in chunks of
// walkChunk masses when there are more than hold, folding each chunk into
// the waste rows, warnings and prices used, and keeping either the full
// results (at most hold masses) or their Rows. An error is the one
// running all masses at once gives, which names every missing price.
func collect(p *costing.Plan, t *prices.Table, masses []float64, methods []string, hold int) (*collected, error) {
	c := &collected{used: make([]bool, len(t.Items))}
	held := len(masses) <= hold
	step := walkChunk
	if held {
		step = max(len(masses), 1)
	}
	memo := map[string]waste.Classification{}
	for lo := 0; lo < len(masses); lo += step {
		chunk := masses[lo:min(lo+step, len(masses))]
		res, err := p.Run(chunk, t)
		if err != nil {
			if !held {
				if _, whole := p.Run(masses, t); whole != nil {
					return nil, whole
				}
			}
			return nil, err
		}
		rows := wasteRowsMemo(p, chunk, methods, res, memo)
		for k := range rows {
			rows[k].Mass += lo
		}
		c.waste = append(c.waste, rows...)
		c.warn.add(methods, chunk, res)
		markUsed(c.used, res)
		if held {
			c.results = res
			continue
		}
		for i, m := range chunk {
			for j, name := range methods {
				c.rows = append(c.rows, rowOf(m, name, lo+i, j, &res[i][j]))
			}
		}
	}
	if held && c.results == nil {
		c.results = [][]Result{}
	}
	return c, nil
}

// At is every method's full result at mass i: the held one, or the one
// recomputed. Reading many masses in order, Walk is faster.
func (r *Report) At(i int) ([]Result, error) {
	if err := r.checkIndex(i); err != nil {
		return nil, err
	}
	if r.Results != nil {
		return r.Results[i], nil
	}
	res, err := r.rerun(r.MassesKg[i : i+1])
	if err != nil {
		return nil, err
	}
	return res[0], nil
}

// Each calls fn with every mass's full results in ascending order of the
// masses, recomputing in chunks those the report does not hold (Walk).
// It stops at fn's first error and returns it.
func (r *Report) Each(fn func(i int, res []Result) error) error {
	w := r.Walk()
	for i := range r.MassesKg {
		res, err := w.At(i)
		if err != nil {
			return err
		}
		if err := fn(i, res); err != nil {
			return err
		}
	}
	return nil
}

// Walker reads a report's full results mass by mass, holding at most
// walkChunk masses of recomputed results at a time.
type Walker struct {
	r     *Report
	lo    int        // the mass index of chunk[0]
	chunk [][]Result // recomputed results of masses lo, lo+1, …
}

// Walk starts a Walker on the report.
func (r *Report) Walk() *Walker { return &Walker{r: r} }

// At is every method's full result at mass i; the results of masses i to
// i + walkChunk − 1 are recomputed together when i is outside the chunk
// held, so reading in ascending order recomputes each mass once.
func (w *Walker) At(i int) ([]Result, error) {
	r := w.r
	if err := r.checkIndex(i); err != nil {
		return nil, err
	}
	if r.Results != nil {
		return r.Results[i], nil
	}
	if i < w.lo || i >= w.lo+len(w.chunk) {
		w.chunk = nil // let the old chunk go before the new one is made
		res, err := r.rerun(r.MassesKg[i:min(i+walkChunk, len(r.MassesKg))])
		if err != nil {
			return nil, err
		}
		w.lo, w.chunk = i, res
	}
	return w.chunk[i-w.lo], nil
}

// checkIndex reports a mass index outside the report.
func (r *Report) checkIndex(i int) error {
	if i < 0 || i >= len(r.MassesKg) {
		return fmt.Errorf("scale: batch mass %d asked of a report of %d masses", i+1, len(r.MassesKg))
	}
	if r.Results != nil && len(r.Results) != len(r.MassesKg) {
		return fmt.Errorf("scale: the report holds results for %d batch masses but lists %d masses", len(r.Results), len(r.MassesKg))
	}
	return nil
}

// rerun recomputes the full results at masses, priced against the
// report's own price table, as Estimate first computed them.
func (r *Report) rerun(masses []float64) ([][]Result, error) {
	if r.plan == nil {
		return nil, fmt.Errorf("scale: the report holds no results for its %d batch masses and no plan to compute them", len(r.MassesKg))
	}
	return r.plan.Run(masses, r.Prices)
}
