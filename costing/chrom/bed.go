package chrom

import "math"

// ColumnVolumePerMass is the mobile-phase volume of a packed bed per mass
// of silica, the interstitial volume plus the pore volume:
//
//	V0/m = εe/ρb + vp = 1/ρb − 1/ρs
//	εe   = 1 − ρb·(1/ρs + vp)
//
// ρb packed bed density, ρs skeletal density, vp pore volume (per mass),
// εe the interparticle porosity. With ρb = 0.5 g/mL and ρs = 2.2 g/mL this
// is 1.55 mL per g (derived from typical data of flash silica, 40–63 µm, 6 nm pores; from memory).
func ColumnVolumePerMass(bedDensity, skeletalDensity float64) float64 {
	return 1/bedDensity - 1/skeletalDensity
}

// InterparticlePorosity is εe = 1 − ρb·(1/ρs + vp); packed beds of
// irregular particles lie near 0.35–0.45 (common practice, no source).
func InterparticlePorosity(bedDensity, skeletalDensity, poreVolume float64) float64 {
	return 1 - bedDensity*(1/skeletalDensity+poreVolume)
}

// BedSilica is the silica that fills a column of inner diameter d to bed
// height h at packed density ρb: m = ρb · π d²/4 · h.
func BedSilica(d, h, bedDensity float64) float64 {
	return bedDensity * math.Pi * d * d / 4 * h
}

// Column is the chosen equipment for one batch.
type Column struct {
	Diameter  float64 // m
	BedHeight float64 // m
	Runs      int     // how many times the column is packed and run
	Silica    float64 // kg of silica per run
}
