package solubility

import (
	"errors"
	"fmt"
	"math"
	"sort"
)

// Point is one measured solubility: S at T.
type Point struct {
	T float64 // temperature, K
	S float64 // solubility, kg of solute per m³ of solvent (= g/L), > 0
}

// VantHoff is a van 't Hoff line through measured solubilities:
//
//	ln S = A + B/T
//
// S in kg/m³ of solvent, T in K, B in K (B < 0 when solubility rises with
// temperature). For a dilute solution ln x and ln S differ by a constant,
// so B = −ΔH_sol/R with ΔH_sol the apparent enthalpy of solution (van 't
// Hoff, J. H. "Études de dynamique chimique", 1884; the ln x versus 1/T
// form is the one the IUPAC-NIST Solubility Data Series uses in its
// critical evaluations, e.g. W. E. Acree, Jr., naphthalene in benzene,
// IUPAC-NIST Solubility Database, NIST Standard Reference Database 106 —
// confirmed). Valid inside the measured range; ln S is curved in 1/T when
// the heat capacity of solution is large (water, alcohols), so
// extrapolation beyond a few kelvin is a guess.
type VantHoff struct {
	A, B       float64 // ln(S / (kg/m³)) = A + B/(T/K)
	Tmin, Tmax float64 // measured range, K
	N          int     // number of points
	RMS        float64 // root-mean-square residual of ln S
}

// ErrFit is returned when points cannot define a van 't Hoff line.
var ErrFit = errors.New("cannot fit a van 't Hoff line")

// Fit is the least-squares line of ln S against 1/T:
//
//	u_i = 1/T_i, y_i = ln S_i
//	B = Σ(u_i − ū)(y_i − ȳ) / Σ(u_i − ū)²
//	A = ȳ − B·ū
//
// It needs at least two points at different temperatures, every T > 0 and
// every S > 0. With two points the line passes through both exactly.
func Fit(points []Point) (VantHoff, error) {
	if len(points) < 2 {
		return VantHoff{}, fmt.Errorf("%w: %d point(s); need two or more at different temperatures", ErrFit, len(points))
	}
	ps := append([]Point(nil), points...)
	sort.Slice(ps, func(i, j int) bool { return ps[i].T < ps[j].T })
	for _, p := range ps {
		if !(p.T > 0) || !(p.S > 0) || math.IsInf(p.T, 0) || math.IsInf(p.S, 0) {
			return VantHoff{}, fmt.Errorf("%w: point (%g K, %g kg/m³) needs a temperature and a solubility above zero", ErrFit, p.T, p.S)
		}
	}
	if ps[0].T == ps[len(ps)-1].T {
		return VantHoff{}, fmt.Errorf("%w: all points are at %g K; need two or more different temperatures", ErrFit, ps[0].T)
	}
	n := float64(len(ps))
	var ubar, ybar float64
	for _, p := range ps {
		ubar += 1 / p.T
		ybar += math.Log(p.S)
	}
	ubar /= n
	ybar /= n
	var suu, suy float64
	for _, p := range ps {
		du := 1/p.T - ubar
		suu += du * du
		suy += du * (math.Log(p.S) - ybar)
	}
	v := VantHoff{B: suy / suu, Tmin: ps[0].T, Tmax: ps[len(ps)-1].T, N: len(ps)}
	v.A = ybar - v.B*ubar
	var ss float64
	for _, p := range ps {
		r := math.Log(p.S) - (v.A + v.B/p.T)
		ss += r * r
	}
	v.RMS = math.Sqrt(ss / n)
	return v, nil
}

// At is the fitted solubility at T (K), kg/m³: S = exp(A + B/T).
func (v VantHoff) At(T float64) float64 { return math.Exp(v.A + v.B/T) }

// Enthalpy is the apparent enthalpy of solution, J/mol:
//
//	ΔH_sol = −R·B
//
// It equals the enthalpy of fusion for an ideal solution and is the heat
// taken up on dissolving (released on crystallizing) per mole of solute.
func (v VantHoff) Enthalpy() float64 { return -R * v.B }
