package solubility

import "math"

// Curve is a solute's solubility in the crystallization solvent: measured
// points with their van 't Hoff line, or an ideal-solubility estimate.
// Exactly one of Fit and Ideal is set.
type Curve struct {
	Points []Point   // as measured, for reports; empty for an estimate
	Fit    *VantHoff // set when measured
	Ideal  *Ideal    // set when estimated from melting data
}

// Measured reports whether the curve comes from measured points.
func (c Curve) Measured() bool { return c.Fit != nil }

// Defined reports whether the curve has either form.
func (c Curve) Defined() bool { return c.Fit != nil || c.Ideal != nil }

// At is the solubility at T (K), kg/m³ of solvent; NaN for an undefined curve.
func (c Curve) At(T float64) float64 {
	switch {
	case c.Fit != nil:
		return c.Fit.At(T)
	case c.Ideal != nil:
		return c.Ideal.At(T)
	}
	return math.NaN()
}

// Enthalpy is the enthalpy of solution, J/mol: the apparent van 't Hoff
// value for measured points (VantHoff.Enthalpy), the enthalpy of fusion for
// an ideal estimate (an ideal solution mixes without heat).
func (c Curve) Enthalpy() float64 {
	switch {
	case c.Fit != nil:
		return c.Fit.Enthalpy()
	case c.Ideal != nil:
		return c.Ideal.Hfus
	}
	return math.NaN()
}

// Outside is how far T lies outside the measured range, K (0 inside the
// range or for an estimate).
func (c Curve) Outside(T float64) float64 {
	if c.Fit == nil {
		return 0
	}
	switch {
	case T < c.Fit.Tmin:
		return c.Fit.Tmin - T
	case T > c.Fit.Tmax:
		return T - c.Fit.Tmax
	}
	return 0
}
