package chrom

import "math"

// TouchingLoad is the loading factor at which the bands of two components
// just touch in the ideal model of preparative chromatography with a
// competitive Langmuir isotherm and equal saturation capacities:
//
//	Lf,2 = (α − 1)² / (α (α + r))
//	Lf   = (1 + r) · Lf,2
//
// where α ≥ 1 is the separation factor, r the amount ratio of the first-
// to the second-eluting component, Lf,2 the second component's amount over
// the column's saturation capacity and Lf the same for both together.
// As r → 0 it tends to ((α − 1)/α)².
//
// Source: Golshan-Shirazi, S.; Guiochon, G. Anal. Chem. 1988, 60, 2364
// (single-component ideal-model band profile) and Anal. Chem. 1989, 61,
// 1368 (binary mixture, believed to treat this case); the binary form is
// not seen printed here (from memory). Its limits are checked in the tests:
// ((α − 1)/α)² as r → 0, and 0 at α = 1.
func TouchingLoad(alpha, r float64) float64 {
	if alpha <= 1 || r < 0 {
		return 0
	}
	return (1 + r) * (alpha - 1) * (alpha - 1) / (alpha * (alpha + r))
}

// AnalyticalResolution is the resolution of two spots at vanishing load on
// a column of N theoretical plates:
//
//	Rs0 = (V2 − V1) / (2σ1 + 2σ2),   σi = Vi/√N,   Vi = 1 + ki  (column volumes)
//
// (the plate model's band width; Rs = 1 leaves a gap of 2σ on each side).
func AnalyticalResolution(rfA, rfB, plates float64) float64 {
	lo, hi := order(rfA, rfB)
	v2, v1 := ElutionCV(lo), ElutionCV(hi)
	return math.Sqrt(plates) * (v2 - v1) / (2 * (v1 + v2))
}

// Separation describes the product and its nearest-running impurity.
type Separation struct {
	ProductRf, ImpurityRf float64
	Product, Impurity     float64 // mass fractions in the crude
}

// FirstIsProduct reports whether the product elutes before the impurity
// (higher Rf: less polar, elutes first from silica).
func (s Separation) FirstIsProduct() bool { return s.ProductRf > s.ImpurityRf }

// AmountRatio is r = amount of the first-eluting over the second-eluting component.
func (s Separation) AmountRatio() float64 {
	if s.FirstIsProduct() {
		return s.Product / s.Impurity
	}
	return s.Impurity / s.Product
}

// Alpha is the separation factor α.
func (s Separation) Alpha() float64 { return Selectivity(s.ProductRf, s.ImpurityRf) }

// LoadPerSilica is the crude mass one mass of silica can take so that the
// product and the impurity bands just touch in the ideal model:
//
//	m_crude / m_silica = q_s · min(Lf(α, r), 1)
//
// q_s is the effective saturation capacity (kg sample per kg silica,
// calibrated to Still et al. 1978; see Calibrate); a loading factor above 1
// would put more sample on the bed than it can hold, so it is capped there.
// Finite efficiency does not enter here: the band model (CutFor) turns the
// plate count into overlap, recovery and purity at the cut.
func LoadPerSilica(s Separation, qs float64) float64 {
	return qs * math.Min(TouchingLoad(s.Alpha(), s.AmountRatio()), 1)
}
