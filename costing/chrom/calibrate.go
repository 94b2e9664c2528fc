package chrom

import (
	"fmt"
	"math"

	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Calibration holds the fitted free parameters of the physical loading route.
type Calibration struct {
	Qs       float64 // effective saturation capacity, kg sample per kg silica
	Plates   float64 // effective plate number of a 15 cm flash bed
	MaxError float64 // largest |relative error| of the fitted loads against Still's table
	RMSLog   float64 // root-mean-square error of ln(load)
	AtBound  bool    // the plate number ended on the edge of its search range
}

// Reference crude for the calibration: the paper's product Rf of 0.35
// (confirmed) with the nearest impurity ΔRf above it, in equal amounts
// (Still's table gives no composition; equal amounts is the neutral choice,
// an assumption stated on the Sources sheet).
const (
	calProductShare  = 0.5
	calImpurityShare = 0.5
	// Search range for N: 50 plates (a poorly packed short bed) to 10⁵
	// (far beyond flash silica; common practice, no source).
	calMinPlates = 50
	calMaxPlates = 1e5
)

// Calibrate fits q_s and N so that LoadPerSilica reproduces the sample loads
// of Still et al. 1978 Table 1 for both ΔRf classes and every column
// diameter, with the given bed height (m) and packed density (kg/m³). It
// minimises the squared error of ln(load): for a fixed N the best q_s is
// closed-form (a mean of logs); N is found by golden-section search on ln N.
func Calibrate(bedHeight, bedDensity float64) Calibration {
	type point struct {
		sep    Separation
		silica float64 // kg
		load   float64 // kg
	}
	var pts []point
	for _, row := range StillTable {
		silica := bedDensity * math.Pi * row.DiameterM * row.DiameterM / 4 * bedHeight
		for _, c := range []struct{ d, load float64 }{{StillEasyDeltaRf, row.LoadEasyKg}, {StillHardDeltaRf, row.LoadHardKg}} {
			pts = append(pts, point{Separation{StillTargetRf, StillTargetRf + c.d, calProductShare, calImpurityShare}, silica, c.load})
		}
	}
	// fit returns the best ln q_s for N and the sum of squared log errors.
	fit := func(n float64) (lnQs, sse float64) {
		var resid []float64
		for _, p := range pts {
			shape := LoadPerSilica(p.sep, 1, n) * p.silica
			if shape <= 0 {
				return 0, math.Inf(1)
			}
			resid = append(resid, math.Log(p.load)-math.Log(shape))
		}
		for _, r := range resid {
			lnQs += r
		}
		lnQs /= float64(len(resid))
		for _, r := range resid {
			sse += (r - lnQs) * (r - lnQs)
		}
		return lnQs, sse
	}
	lo, hi := math.Log(calMinPlates), math.Log(calMaxPlates)
	g := (math.Sqrt(5) - 1) / 2
	a, b := hi-g*(hi-lo), lo+g*(hi-lo)
	_, fa := fit(math.Exp(a))
	_, fb := fit(math.Exp(b))
	for i := 0; i < 80; i++ {
		if fa < fb {
			hi, b, fb = b, a, fa
			a = hi - g*(hi-lo)
			_, fa = fit(math.Exp(a))
		} else {
			lo, a, fa = a, b, fb
			b = lo + g*(hi-lo)
			_, fb = fit(math.Exp(b))
		}
	}
	n := math.Exp((lo + hi) / 2)
	lnQs, sse := fit(n)
	cal := Calibration{Qs: math.Exp(lnQs), Plates: n, RMSLog: math.Sqrt(sse / float64(len(pts)))}
	cal.AtBound = n > calMaxPlates*0.95 || n < calMinPlates*1.05
	for _, p := range pts {
		pred := LoadPerSilica(p.sep, cal.Qs, n) * p.silica
		if e := math.Abs(pred/p.load - 1); e > cal.MaxError {
			cal.MaxError = e
		}
	}
	return cal
}

// AddCalibration fits the physical loading route to Still's table with the
// set's bed height and density and records the fitted saturation capacity
// and plate number, with the quality of the fit, as coefficients.
func AddCalibration(coef source.Set) {
	cal := Calibrate(coef.Get(KeyBedHeight), coef.Get(KeyBedDensity))
	fit := fmt.Sprintf("fitted here so that the touching-band loading of elution theory reproduces the sample loads of Still, Kahn and Mitra 1978 Table 1 (both ΔRf classes, all five diameters; reference crude: product Rf 0.35, impurity ΔRf above it, equal amounts); largest deviation %.0f %%, rms %.0f %% in ln(load)", cal.MaxError*100, cal.RMSLog*100)
	plates := fit
	if cal.AtBound {
		plates += fmt.Sprintf("; the fit runs to the top of its range (%.0g plates): Still's loads fall with ΔRf less steeply than touching-band theory predicts, so the table shows no kinetic penalty to fit. This is an effective number, not a measured column efficiency", float64(calMaxPlates))
	}
	coef.Put(source.Coefficient{Key: KeyQs, Method: Method, Label: "effective saturation capacity of silica", SI: cal.Qs, Dim: units.None, Unit: "", Source: fit, Mark: source.Calibrated, Lo: ranges[KeyQs][0], Hi: ranges[KeyQs][1]})
	coef.Put(source.Coefficient{Key: KeyPlates, Method: Method, Label: "effective plate number of the bed", SI: cal.Plates, Dim: units.None, Unit: "", Source: plates, Mark: source.Calibrated, Lo: ranges[KeyPlates][0], Hi: ranges[KeyPlates][1]})
}
