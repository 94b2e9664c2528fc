package scale

import (
	"math"
	"slices"
)

// Value of information and sensitivity, computed from one set of Monte
// Carlo draws (no further model runs).
//
// The decision chooses one of J methods; NB[d][j] is the net benefit of
// method j in draw d (here the negative cost of purifying one batch at the
// target mass, money). The expected value of perfect information (Raiffa,
// H.; Schlaifer, R. Applied Statistical Decision Theory, Harvard, 1961) is
// what knowing every input before choosing is worth on average:
//
//	EVPI = E_θ[max_j NB_j(θ)] − max_j E_θ[NB_j(θ)]
//
// The partial EVPI of one input X_i is what knowing X_i alone is worth:
//
//	EVPPI_i = E_Xi[max_j E(NB_j | X_i)] − max_j E[NB_j]
//
// estimated in one level from the same draws by ordering them on X_i and
// averaging NB within K bins of equal count, E(NB_j | X_i in bin b) ≈ the
// bin mean (Strong, M.; Oakley, J. E. "An efficient method for computing
// single-parameter partial expected value of perfect information", Med.
// Decis. Making 2013, 33, 755–766). Too few bins bias the estimate down,
// too many up (ibid.); K = √N here, this project's choice. A non-parametric
// regression of NB on X_i (Strong, Oakley and Brennan, Med. Decis. Making
// 2014, 34, 311) would do the same with less noise; the binning is the
// simpler of the two and is enough for ranking what to measure.

// evpi is E[max_j NB] − max_j E[NB] over the draws (rows of nb).
func evpi(nb [][]float64) float64 {
	if len(nb) == 0 {
		return 0
	}
	J := len(nb[0])
	mean := make([]float64, J)
	perfect := 0.0
	for _, row := range nb {
		best := math.Inf(-1)
		for j, v := range row {
			mean[j] += v
			best = math.Max(best, v)
		}
		perfect += best
	}
	n := float64(len(nb))
	return math.Max(0, perfect/n-maxOf(mean)/n)
}

// evppi is the single-input partial EVPI by ordering and binning (Strong
// and Oakley 2013). A discrete input (few distinct values) is binned by
// value.
func evppi(x []float64, nb [][]float64) float64 {
	n := len(nb)
	if n == 0 || len(x) != n {
		return 0
	}
	return evppiOrdered(x, nb, argsort(x))
}

// evppiOrdered is evppi with the draws' order on x given (argsort).
func evppiOrdered(x []float64, nb [][]float64, idx []int) float64 {
	n := len(nb)
	J := len(nb[0])
	bins := binEdges(x, idx)
	total := make([]float64, J)
	sumMax := 0.0
	mean := make([]float64, J)
	for b := 0; b+1 < len(bins); b++ {
		clear(mean)
		for _, d := range idx[bins[b]:bins[b+1]] {
			for j, v := range nb[d] {
				mean[j] += v
				total[j] += v
			}
		}
		sumMax += maxOf(mean) // Σ over the bin; n_b·max of the bin means
	}
	return math.Max(0, (sumMax-maxOf(total))/float64(n))
}

// binEdges splits the ordered draws into bins: one per distinct value when
// there are few, else K = round(√N) bins of (nearly) equal count.
func binEdges(x []float64, idx []int) []int {
	n := len(idx)
	edges := []int{0}
	distinct := 1
	for k := 1; k < n; k++ {
		if x[idx[k]] != x[idx[k-1]] {
			distinct++
			if distinct > 20 {
				break
			}
		}
	}
	if distinct <= 20 {
		for k := 1; k < n; k++ {
			if x[idx[k]] != x[idx[k-1]] {
				edges = append(edges, k)
			}
		}
		return append(edges, n)
	}
	K := int(math.Round(math.Sqrt(float64(n))))
	for b := 1; b < K; b++ {
		edges = append(edges, b*n/K)
	}
	return append(edges, n)
}

func maxOf(v []float64) float64 {
	m := math.Inf(-1)
	for _, x := range v {
		m = math.Max(m, x)
	}
	return m
}

// spearman is the rank correlation of x and y over the pairs where both
// are numbers (Spearman, C. "The proof and measurement of association
// between two things", Am. J. Psychol. 1904, 15, 72): the Pearson
// correlation of the ranks, ties given their mean rank. NaN when fewer than
// three pairs or either is constant.
func spearman(x, y []float64) float64 {
	var xs, ys []float64
	for i := range x {
		if !math.IsNaN(x[i]) && !math.IsNaN(y[i]) {
			xs, ys = append(xs, x[i]), append(ys, y[i])
		}
	}
	if len(xs) < 3 {
		return math.NaN()
	}
	return pearson(ranks(xs), ranks(ys))
}

// argsort is the order of the indices of v by value, ties by index (v
// holds no NaN).
func argsort(v []float64) []int {
	type iv struct {
		v float64
		i int
	}
	ps := make([]iv, len(v))
	for i, x := range v {
		ps[i] = iv{x, i}
	}
	slices.SortFunc(ps, func(a, b iv) int {
		switch {
		case a.v < b.v:
			return -1
		case a.v > b.v:
			return 1
		}
		return a.i - b.i
	})
	idx := make([]int, len(v))
	for k, p := range ps {
		idx[k] = p.i
	}
	return idx
}

// ranks gives 1-based ranks, ties their mean rank.
func ranks(v []float64) []float64 { return ranksOrdered(v, argsort(v)) }

// ranksOrdered is ranks with the order of v given (argsort).
func ranksOrdered(v []float64, idx []int) []float64 {
	r := make([]float64, len(v))
	for i := 0; i < len(idx); {
		j := i
		for j+1 < len(idx) && v[idx[j+1]] == v[idx[i]] {
			j++
		}
		mean := float64(i+j)/2 + 1
		for k := i; k <= j; k++ {
			r[idx[k]] = mean
		}
		i = j + 1
	}
	return r
}

func pearson(x, y []float64) float64 {
	n := float64(len(x))
	var mx, my float64
	for i := range x {
		mx += x[i]
		my += y[i]
	}
	mx /= n
	my /= n
	var sxy, sxx, syy float64
	for i := range x {
		dx, dy := x[i]-mx, y[i]-my
		sxy += dx * dy
		sxx += dx * dx
		syy += dy * dy
	}
	if sxx == 0 || syy == 0 {
		return math.NaN()
	}
	return sxy / math.Sqrt(sxx*syy)
}
