package chrom

import "math"

// Site is the equipment the model may choose from: the physical view of the
// site's equipment table (costing builds it; this package imports no money).
// Items are sorted smallest first.
type Site struct {
	Columns     []SiteColumn
	Cartridges  []SiteCartridge
	Evaporators []SiteEvaporator
}

// SiteColumn is a column packed by hand with loose silica.
type SiteColumn struct {
	Name     string
	Diameter float64 // m, inner
	HourItem string  // price item charged per hour of use; "" if not charged
}

// SiteCartridge is a prepacked cartridge, used once.
type SiteCartridge struct {
	Name     string
	Silica   float64 // kg of silica inside
	MaxLoad  float64 // kg of crude per run
	Flow     float64 // m³/s
	UseItem  string  // price item charged per cartridge
	HourItem string
}

// SiteEvaporator is a rotary (or larger) evaporator.
type SiteEvaporator struct {
	Name     string
	Rate     float64 // m³/s of solvent distilled
	HourItem string
}

// equip is the equipment of one candidate plan.
type equip struct {
	name       string // in words, for the report
	cartridge  *SiteCartridge
	column     *SiteColumn
	diameter   float64 // m (a cartridge's: of a bed of the reference height)
	bedHeight  float64 // m
	runs       int
	silicaRun  float64 // kg of silica per run
	silicaBuy  float64 // kg of loose silica bought per run (0 for cartridges)
	packedByMe bool
}

// ChooseColumn picks the narrowest column whose bed, no taller than hMax,
// holds the silica needed per run, and packs exactly that silica (a bed
// shorter than hMin is raised to hMin). Above the largest column the batch
// is split into the fewest equal runs that fit. columns must be ascending.
// Keeping the bed near the 15 cm of Still et al. 1978 rather than at one
// fixed height avoids packing up to four times the silica needed when the
// next diameter up is much wider.
func ChooseColumn(silicaNeeded, hMin, hMax, bedDensity float64, columns []SiteColumn) (Column, int) {
	last := len(columns) - 1
	runs := int(math.Ceil(silicaNeeded/BedSilica(columns[last].Diameter, hMax, bedDensity) - 1e-9))
	if runs < 1 {
		runs = 1
	}
	perRun := silicaNeeded / float64(runs)
	j := last
	for i, c := range columns {
		if BedSilica(c.Diameter, hMax, bedDensity) >= perRun*(1-1e-9) {
			j = i
			break
		}
	}
	d := columns[j].Diameter
	h := math.Max(perRun/BedSilica(d, 1, bedDensity), hMin)
	return Column{Diameter: d, BedHeight: h, Runs: runs, Silica: BedSilica(d, h, bedDensity)}, j
}

// ChooseCartridge picks the smallest cartridge that holds the silica needed
// per run and takes the crude of a run; when none does, the largest in as
// few runs as its silica and load limit allow.
func ChooseCartridge(silicaNeeded, crudeKg float64, carts []SiteCartridge) (idx, runs int) {
	for i, c := range carts {
		if c.Silica >= silicaNeeded*(1-1e-9) && c.MaxLoad >= crudeKg*(1-1e-9) {
			return i, 1
		}
	}
	last := len(carts) - 1
	c := carts[last]
	n := math.Max(silicaNeeded/c.Silica, crudeKg/c.MaxLoad)
	return last, int(math.Ceil(n - 1e-9))
}

// ChooseEvaporator picks the smallest evaporator that distils one run's
// product fractions within the time given (s), or else the fastest.
func ChooseEvaporator(volumeRun, workingDay float64, evs []SiteEvaporator) int {
	best := 0
	for i, e := range evs {
		if volumeRun/e.Rate <= workingDay {
			return i
		}
		if e.Rate > evs[best].Rate {
			best = i
		}
	}
	return best
}

// DefaultColumnsM are the diameters of the columns of the built-in equipment
// table up to 300 mm, used in tests.
var DefaultColumnsM = []float64{0.010, 0.015, 0.020, 0.025, 0.030, 0.040, 0.050, 0.060, 0.080, 0.100, 0.150, 0.200, 0.300}
