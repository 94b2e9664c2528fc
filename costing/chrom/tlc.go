// Package chrom models flash column chromatography on silica gel: from TLC
// Rf values to the silica, column, solvent, time, fractions, losses and
// waste of one purification at one batch mass.
//
// The model computes physical quantities only (SI inside); pricing is the
// ledger's job. Every coefficient is in coefficients.go with its source.
package chrom

// RetentionFactor is the retention factor k of a spot from its TLC Rf:
//
//	k = (1 − Rf) / Rf
//
// Rf is dimensionless in (0, 1). On a column packed with the same
// silica and run in the same eluent, k is taken equal to the TLC value
// (the usual TLC-to-column transfer; Fair, J. D.; Kormos, C. M. "Flash
// column chromatograms estimated from thin-layer chromatography data",
// J. Chromatogr. A 2008, 1211, 49–54, abstract).
func RetentionFactor(rf float64) float64 { return (1 - rf) / rf }

// ElutionCV is the number of column volumes at which a spot's band centre
// leaves the column:
//
//	CV = 1 + k = 1 / Rf
//
// (same source as RetentionFactor).
func ElutionCV(rf float64) float64 { return 1 / rf }

// DeltaCV is the difference in elution volume of two spots, in column
// volumes:
//
//	ΔV/V0 = 1/Rf(lower spot) − 1/Rf(upper spot)
func DeltaCV(rfA, rfB float64) float64 {
	lo, hi := order(rfA, rfB)
	return 1/lo - 1/hi
}

// Selectivity is the separation factor of two spots:
//
//	α = k(lower spot) / k(upper spot) ≥ 1
//
// The upper spot (higher Rf, less polar on silica) elutes first.
func Selectivity(rfA, rfB float64) float64 {
	lo, hi := order(rfA, rfB)
	return RetentionFactor(lo) / RetentionFactor(hi)
}

// order returns the lower and the upper Rf.
func order(a, b float64) (lower, upper float64) {
	if a < b {
		return a, b
	}
	return b, a
}
