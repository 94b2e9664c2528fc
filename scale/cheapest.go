package scale

import (
	"math"
	"sort"
)

// The one definition of "cheapest" used by every output (the decision, the
// sweep and its crossovers, the portfolio, the Monte Carlo shares, JSON,
// text and the workbook's Summary flag): the feasible method with the lowest
// cost per gram of purified product at the required purity
// (costing.Result.PerGram: ledger total ÷ grams recovered at the method's
// target purity). A batch total is never compared across methods: two
// methods that recover different amounts of product are compared per gram.
// Exact ties go to the method listed first.

// rank returns the indexes of the feasible entries of perG (cost per gram,
// NaN when infeasible), cheapest first; equal costs keep their order.
func rank(perG []float64) []int {
	var idx []int
	for j, v := range perG {
		if !math.IsNaN(v) {
			idx = append(idx, j)
		}
	}
	sort.SliceStable(idx, func(a, b int) bool { return perG[idx[a]] < perG[idx[b]] })
	return idx
}

// cheapest returns the index of the cheapest feasible entry of perG, or −1
// when none is feasible.
func cheapest(perG []float64) int {
	best := -1
	for j, v := range perG {
		if !math.IsNaN(v) && (best < 0 || v < perG[best]) {
			best = j
		}
	}
	return best
}

// Cheapest returns the column of the cheapest feasible method per gram of
// purified product among one mass's results, or −1 when none is feasible.
func Cheapest(results []Result) int {
	perG := make([]float64, len(results))
	for j, r := range results {
		perG[j] = r.PerGram()
	}
	return cheapest(perG)
}

// CheapestAt returns the method column that is cheapest per gram at mass
// index i of the report, or −1 when no method is feasible there.
func (r *Report) CheapestAt(i int) int {
	if r.Results != nil {
		return Cheapest(r.Results[i])
	}
	perG := make([]float64, len(r.Methods))
	for j := range perG {
		perG[j] = r.RowAt(i, j).PerGram
	}
	return cheapest(perG)
}
