package chrom

import (
	"fmt"
	"math"

	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Calibration is the fitted saturation capacity of the loading route.
type Calibration struct {
	Qs       float64 // effective saturation capacity, kg sample per kg silica
	MaxError float64 // largest |relative error| of the fitted loads against Still's table
	RMSLog   float64 // root-mean-square error of ln(load)
}

// Reference crude for the calibration: the paper's product Rf of 0.35
// (confirmed) with the nearest impurity ΔRf above it, in equal amounts
// (Still's table gives no composition; equal amounts is the neutral choice,
// an assumption stated on the Sources sheet).
const (
	calProductShare  = 0.5
	calImpurityShare = 0.5
)

// Calibrate fits q_s, the one free parameter Still et al. 1978 Table 1 can
// determine, so that LoadPerSilica reproduces the table's sample loads for
// both ΔRf classes and every column diameter with the given reference bed
// height (m) and packed density (kg/m³). It minimises the squared error of
// ln(load), for which the best q_s is closed-form: the geometric mean of
// load / (silica · Lf). The plate count is not fitted: it comes from the
// plate height (KnoxPlateHeight), since the table's two ΔRf classes cannot
// separate a kinetic penalty from the capacity.
func Calibrate(bedHeight, bedDensity float64) Calibration {
	type point struct{ shape, load float64 }
	var pts []point
	for _, row := range StillTable {
		silica := BedSilica(row.DiameterM, bedHeight, bedDensity)
		for _, c := range []struct{ d, load float64 }{{StillEasyDeltaRf, row.LoadEasyKg}, {StillHardDeltaRf, row.LoadHardKg}} {
			sep := Separation{StillTargetRf, StillTargetRf + c.d, calProductShare, calImpurityShare}
			pts = append(pts, point{LoadPerSilica(sep, 1) * silica, c.load})
		}
	}
	lnQs := 0.0
	for _, p := range pts {
		lnQs += math.Log(p.load / p.shape)
	}
	lnQs /= float64(len(pts))
	cal := Calibration{Qs: math.Exp(lnQs)}
	sse := 0.0
	for _, p := range pts {
		r := math.Log(p.load/p.shape) - lnQs
		sse += r * r
		if e := math.Abs(cal.Qs*p.shape/p.load - 1); e > cal.MaxError {
			cal.MaxError = e
		}
	}
	cal.RMSLog = math.Sqrt(sse / float64(len(pts)))
	return cal
}

// AddCalibration fits the loading route to Still's table with the set's
// reference bed height and density and records the fitted saturation
// capacity, with the quality of the fit, as a coefficient.
func AddCalibration(coef source.Set) {
	cal := Calibrate(coef.Get(KeyRefBed), coef.Get(KeyBedDensity))
	fit := fmt.Sprintf("fitted here so that the touching-band loading of elution theory reproduces the sample loads of Still, Kahn and Mitra 1978 Table 1 (both ΔRf classes, all five diameters; reference crude: product Rf 0.35, impurity ΔRf above it, equal amounts); largest deviation %.0f %%, rms %.0f %% in ln(load)", cal.MaxError*100, cal.RMSLog*100)
	coef.Put(source.Coefficient{Key: KeyQs, Method: Method, Label: "effective saturation capacity of silica", SI: cal.Qs, Dim: units.None, Unit: "", Source: fit, Mark: source.Calibrated, Lo: 1e-4, Hi: 0.5})
}
