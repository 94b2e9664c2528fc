package chrom

import (
	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Keys of the loading bounds, plate height, cut, throughput and eluent
// recovery.
const (
	KeyCeiling       = "chromatography.max_crude_per_silica"
	KeyMaxRatio      = "chromatography.max_silica_per_crude"
	KeyParticle      = "chromatography.particle_diameter"
	KeyDiffusivity   = "chromatography.solute_diffusivity"
	KeyKnoxA         = "chromatography.knox_a"
	KeyKnoxB         = "chromatography.knox_b"
	KeyKnoxC         = "chromatography.knox_c"
	KeyTargetPurity  = "chromatography.target_purity"
	KeyMinRecovery   = "chromatography.min_recovery"
	KeyWorkingDay    = "chromatography.working_day"
	KeyWorkingWeek   = "chromatography.working_week"
	KeyRecoveryYield = "chromatography.eluent_distillation_yield"
	KeyReuseShare    = "chromatography.recovered_eluent_max_share"
	KeyPackMax       = "chromatography.packing_time_max"
)

// DiffusivityDim is m²/s.
var DiffusivityDim = units.Dim{L: 2, T: -1}

type coefFn func(key, label string, si float64, dim units.Dim, unit, src string, mark source.Mark) source.Coefficient

// scaleDefaults are the coefficients of the bounded loading, the plate
// count, the cut and the throughput, each with its source and range.
func scaleDefaults(c coefFn) []source.Coefficient {
	knox := "Kennedy, G. J.; Knox, J. H. J. Chromatogr. Sci. 1972, 10, 549 (the Knox equation)"
	return []source.Coefficient{
		r(c(KeyCeiling, "most crude one mass of silica takes, however easy the separation", 0.05, units.None, "", "flash practice loads at most about 1 g of crude per 20 g of silica (about 5 %), even for easy separations; the capacity of the bed's surface sets it", source.CommonPractice), 1e-4, 0.5),
		r(c(KeyMaxRatio, "most silica per crude before a separation is called not feasible", 1000, units.None, "", "beyond about 1000 : 1 flash is no longer a preparative method; change the eluent", source.CommonPractice), 20, 1e5),
		r(c(KeyParticle, "mean particle diameter of flash silica (40–63 µm)", 51e-6, units.Length, "µm", "the middle of the 40–63 µm sieve fraction of flash silica gel used by Still et al. 1978", source.Derived), 5e-6, 500e-6),
		r(c(KeyDiffusivity, "diffusion coefficient of a small organic solute in the eluent", 1e-9, DiffusivityDim, "m^2/s", "small molecules in low-viscosity organic solvents, about 1–3 × 10⁻⁹ m²/s (Wilke–Chang estimates)", source.FromMemory), 1e-11, 1e-7),
		r(c(KeyKnoxA, "Knox A (flow inhomogeneity of the packing)", 1, units.None, "", knox+"; about 1 for a good packing, more for a poor one", source.FromMemory), 0.1, 10),
		r(c(KeyKnoxB, "Knox B (axial diffusion)", 2, units.None, "", knox+"; about 2", source.FromMemory), 0, 10),
		r(c(KeyKnoxC, "Knox C (mass transfer)", 0.05, units.None, "", knox+"; about 0.05 for porous particles", source.FromMemory), 0.001, 1),
		r(c(KeyTargetPurity, "purity asked of the product fractions (product over product and nearest impurity), unless the scenario sets chromatography.target_purity", 0.98, units.None, "", "a usual purity asked of an intermediate", source.CommonPractice), 0.5, 0.99999),
		r(c(KeyMinRecovery, "least share of the product the pure cut must hold", 0.5, units.None, "", "a cut keeping less than half the product is not a purification one would run; another eluent is needed", source.CommonPractice), 0.01, 1),
		r(c(KeyWorkingDay, "working day", 8*3600, units.Time, "h", "one shift", source.CommonPractice), 3600, 24*3600),
		r(c(KeyWorkingWeek, "hands-on hours in one chemist's working week", 40*3600, units.Time, "h", "five days of eight hours", source.CommonPractice), 3600, 168*3600),
		r(c(KeyPackMax, "longest time to pack one column (large columns are slurry-packed with a pump)", 4*3600, units.Time, "h", "a process column of tens of kilograms of silica is packed in a few hours", source.CommonPractice), 600, 48*3600),
		r(c(KeyRecoveryYield, "share of the spent eluent a distillation for reuse recovers", 0.85, units.None, "", "losses to hold-up, the forerun and the residue", source.CommonPractice), 0.1, 1),
		r(c(KeyReuseShare, "largest share of recovered eluent in the eluent of a later run", 0.8, units.None, "", "recovered eluent drifts in composition and carries traces; it is topped up with fresh solvent and checked by TLC", source.CommonPractice), 0, 1),
	}
}
