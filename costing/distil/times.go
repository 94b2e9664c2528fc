package distil

import "math"

// Activity names, in the order they are reported.
const (
	ActSetup       = "set up still, column and vacuum; leak test"
	ActCharge      = "charge the still; drain cuts and residue"
	ActHeat        = "heat the charge to boiling"
	ActEquilibrate = "equilibrate the column at total reflux"
	ActDistil      = "distil and take the cuts"
	ActCool        = "cool the pot before venting"
	ActAnalyse     = "analyse the cuts (GC or NMR)"
	ActClean       = "dismantle and clean the still"
)

// TransferTime is the time to move a volume V (m³) at a rate Q (m³/s), s:
// t = V/Q.
func TransferTime(V, Q float64) float64 { return V / Q }

// WallArea is the wall area of a still of nominal volume V (m³) taken as a
// sphere, m²: A = (36π)^(1/3)·V^(2/3) (derived: a sphere of volume πD³/6
// has area πD²).
func WallArea(V float64) float64 { return math.Cbrt(36*math.Pi) * math.Pow(V, 2.0/3) }

// CleaningTime is the time to dismantle and clean a still of wall area A
// (m²), s: t = t₀ + k·A, t₀ the fixed part and k the time per area
// (common practice, no source): minutes for a flask, hours for a 100 L
// still.
func CleaningTime(t0, k, A float64) float64 { return t0 + k*A }
