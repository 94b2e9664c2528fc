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
// 1368 (binary mixture, believed to treat this case); the binary form is as
// given in the project's reference notes, derived and checked there against
// a plate-model simulation, not seen printed (from memory).
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

// EfficiencyFactor scales the ideal touching load for a finite plate number:
//
//	E = 1 − 1/Rs0²   (0 when Rs0 ≤ 1)
//
// It follows from adding the kinetic band width (2σ1 + 2σ2, the gap the
// bands need at vanishing load) and the thermodynamic (overload) width in
// quadrature, after Knox, J. H.; Pyper, H. M. J. Chromatogr. 1986, 363, 1
// (abstract: plate height stays meaningful under overload), and taking the
// overload width as growing with √Lf, as the ideal-model band width
// t0·k0·(2√Lf − Lf) does at small Lf. The quadrature rule is this project's
// assumption; the Sources sheet says so.
func EfficiencyFactor(rs0 float64) float64 {
	if rs0 <= 1 {
		return 0
	}
	return 1 - 1/(rs0*rs0)
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
// product and the impurity just separate:
//
//	m_crude / m_silica = q_s · Lf(α, r) · E(N)
//
// q_s is the effective saturation capacity (kg sample per kg silica) and N
// the plate number, both calibrated to Still et al. 1978 (see Calibrate).
// It returns 0 when the spots cannot be resolved at N.
func LoadPerSilica(s Separation, qs, plates float64) float64 {
	return qs * TouchingLoad(s.Alpha(), s.AmountRatio()) * EfficiencyFactor(AnalyticalResolution(s.ProductRf, s.ImpurityRf, plates))
}

// BandCV is the width of the product's band in column volumes at a loading
// factor lf of the product: the ideal-model overload width k·(2√Lf − Lf)
// (Golshan-Shirazi and Guiochon 1988) plus ±2σ of kinetic spreading.
func BandCV(rf, lf, plates float64) float64 {
	k := RetentionFactor(rf)
	if lf > 1 {
		lf = 1
	}
	return k*(2*math.Sqrt(lf)-lf) + 4*ElutionCV(rf)/math.Sqrt(plates)
}
