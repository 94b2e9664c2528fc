package chrom

import "math"

// StillRow is one row of Table 1 of Still, W. C.; Kahn, M.; Mitra, A.
// "Rapid chromatographic technique for preparative separations with moderate
// resolution", J. Org. Chem. 1978, 43, 2923–2925 (confirmed): a column of about 15 cm of 40–63 µm silica run at a solvent
// level falling about 5 cm/min.
type StillRow struct {
	DiameterM  float64 // column inner diameter, m
	EluentM3   float64 // typical eluent volume to pack and elute, m³
	LoadEasyKg float64 // typical sample for ΔRf ≥ 0.2, kg
	LoadHardKg float64 // typical sample for ΔRf ≥ 0.1, kg
	FractionM3 float64 // typical fraction volume, m³
}

// StillTable is Table 1 of Still, Kahn and Mitra 1978 (confirmed).
var StillTable = []StillRow{
	{0.010, 100e-6, 100e-6, 40e-6, 5e-6},
	{0.020, 200e-6, 400e-6, 160e-6, 10e-6},
	{0.030, 400e-6, 900e-6, 360e-6, 20e-6},
	{0.040, 600e-6, 1600e-6, 600e-6, 30e-6},
	{0.050, 1000e-6, 2500e-6, 1000e-6, 50e-6},
}

// The ΔRf classes of the table's two load columns.
const (
	StillEasyDeltaRf = 0.2
	StillHardDeltaRf = 0.1
	// StillTargetRf is the product Rf the paper recommends, about 0.35 (confirmed).
	StillTargetRf = 0.35
)

// StillSilicaRatios are the silica-to-sample mass ratios the table implies
// for its two ΔRf classes with a bed of height h and packed density ρb:
//
//	ratio = ρb · (π d²/4) · h / load
//
// averaged (geometric mean) over the table's rows.
func StillSilicaRatios(bedHeight, bedDensity float64) (easy, hard float64) {
	le, lh := 0.0, 0.0
	for _, r := range StillTable {
		silica := bedDensity * math.Pi * r.DiameterM * r.DiameterM / 4 * bedHeight
		le += math.Log(silica / r.LoadEasyKg)
		lh += math.Log(silica / r.LoadHardKg)
	}
	n := float64(len(StillTable))
	return math.Exp(le / n), math.Exp(lh / n)
}

// StillRatio is the empirical silica-to-crude mass ratio for a given ΔRf:
// the table's ratio for ΔRf ≥ 0.2 above 0.2; log-linear between the two
// classes; below 0.1 the same log-linear trend extrapolated (outside the
// table: the caller warns).
func StillRatio(deltaRf, bedHeight, bedDensity float64) float64 {
	easy, hard := StillSilicaRatios(bedHeight, bedDensity)
	if deltaRf >= StillEasyDeltaRf {
		return easy
	}
	t := (deltaRf - StillHardDeltaRf) / (StillEasyDeltaRf - StillHardDeltaRf)
	return math.Exp(math.Log(hard) + t*(math.Log(easy)-math.Log(hard)))
}

// StillFraction is the typical fraction volume for a column of inner
// diameter d: interpolated in the table (linear in d²), and beyond its ends
// in proportion to the cross-section (∝ d², as the column volume is).
func StillFraction(d float64) float64 {
	t := StillTable
	if d <= t[0].DiameterM {
		return t[0].FractionM3 * (d * d) / (t[0].DiameterM * t[0].DiameterM)
	}
	last := t[len(t)-1]
	if d >= last.DiameterM {
		return last.FractionM3 * (d * d) / (last.DiameterM * last.DiameterM)
	}
	for i := 1; i < len(t); i++ {
		if d <= t[i].DiameterM {
			a, b := t[i-1], t[i]
			f := (d*d - a.DiameterM*a.DiameterM) / (b.DiameterM*b.DiameterM - a.DiameterM*a.DiameterM)
			return a.FractionM3 + f*(b.FractionM3-a.FractionM3)
		}
	}
	return last.FractionM3
}
