package chrom

import (
	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Method is the method name used in reports and coefficient tables.
const Method = "chromatography"

// Coefficient keys (also the keys users write under settings:).
const (
	KeyRefBed           = "chromatography.calibration_bed_height"
	KeyBedMin           = "chromatography.bed_height_min"
	KeyBedMax           = "chromatography.bed_height_max"
	KeyBedDensity       = "chromatography.bed_density"
	KeyPoreVolume       = "chromatography.pore_volume"
	KeySkeletalDensity  = "chromatography.skeletal_density"
	KeyFrontVelocity    = "chromatography.solvent_level_speed"
	KeyEquilibrationCV  = "chromatography.equilibration_cv"
	KeyTailCV           = "chromatography.tail_allowance_cv"
	KeyFlushCV          = "chromatography.flush_cv"
	KeyTLCEvery         = "chromatography.tlc_every_nth_fraction"
	KeyLanes            = "chromatography.tlc_lanes_per_plate"
	KeyTLCSolvent       = "chromatography.tlc_solvent_per_plate"
	KeyTLCTime          = "chromatography.tlc_time_per_plate"
	KeyPackBase         = "chromatography.packing_time"
	KeyPackPerKg        = "chromatography.packing_time_per_kg_silica"
	KeyLoadTime         = "chromatography.loading_time"
	KeyCleanTime        = "chromatography.cleanup_time"
	KeyCombinePerFrac   = "chromatography.combining_time_per_fraction"
	KeyEvapAttended     = "chromatography.evaporation_attended_share"
	KeyHeaterEff        = "chromatography.evaporator_heat_efficiency"
	KeyChillerCOP       = "chromatography.chiller_cop"
	KeyBathDelta        = "chromatography.evaporation_warmup"
	KeyRetainedLoss     = "chromatography.silica_retention_loss"
	KeyLoadSolventPerKg = "chromatography.loading_solvent_per_crude"
	KeyDrySorbent       = "chromatography.dry_load_silica_ratio"
	KeyDrySolventPerKg  = "chromatography.dry_load_solvent_per_crude"
	KeySandHeight       = "chromatography.sand_layer"
	KeySandDensity      = "chromatography.sand_bulk_density"
	KeyPlateMass        = "chromatography.tlc_plate_mass"
	KeyRouteTolerance   = "chromatography.route_agreement"
	KeyQs               = "chromatography.saturation_capacity"
)

// Defaults returns the model's coefficients with their sources. The
// calibrated saturation capacity is added by Prepare (AddCalibration).
func Defaults() []source.Coefficient {
	c := func(key, label string, si float64, dim units.Dim, unit, src string, mark source.Mark) source.Coefficient {
		lo, hi := rangeOf(key)
		return source.Coefficient{Key: key, Method: Method, Label: label, SI: si, Dim: dim, Unit: unit, Source: src, Mark: mark, Lo: lo, Hi: hi}
	}
	still := "Still, W. C.; Kahn, M.; Mitra, A. J. Org. Chem. 1978, 43, 2923"
	return append([]source.Coefficient{
		r(c(KeyRefBed, "bed height of Still's columns (the calibration's reference, not the column packed here)", 0.15, units.Length, "cm", still+`: a bed of about 5–6 in`, source.FromMemory), 0.05, 0.50),
		c(KeyBedMin, "shortest bed packed", 0.10, units.Length, "cm", "beds much below 10 cm resolve poorly", source.CommonPractice),
		c(KeyBedMax, "tallest bed packed before a wider column is taken", 0.20, units.Length, "cm", "flash beds of about 10–20 cm", source.CommonPractice),
		c(KeyBedDensity, "packed bed density of flash silica, 40–63 µm", 500, units.Density, "g/mL", "typical 0.45–0.55 g/mL for flash silica, 40–63 µm", source.FromMemory),
		c(KeyPoreVolume, "pore volume of flash silica, 40–63 µm", 0.75e-3, units.SpecificVolume, "mL/g", "flash silica with 6 nm pores, about 0.75 mL/g", source.FromMemory),
		c(KeySkeletalDensity, "skeletal density of amorphous silica", 2200, units.Density, "g/mL", "about 2.2 g/mL, as in reference works on silica gel", source.Confirmed),
		c(KeyFrontVelocity, "speed of the falling solvent level", 0.05/60, units.Velocity, "cm/min", still+": about 2 in/min; a J. Chem. Educ. 1984, 61, 649 note also runs at 5 cm/min", source.Confirmed),
		c(KeyEquilibrationCV, "column volumes to wet and equilibrate the bed", 1.5, units.None, "", "1–2 column volumes", source.CommonPractice),
		c(KeyTailCV, "column volumes run past the product band's trailing edge", 0.5, units.None, "", "to be sure the product is off the column", source.CommonPractice),
		c(KeyFlushCV, "column volumes of final flush", 0, units.None, "", "none unless the column is reused or a polar impurity must be recovered", source.CommonPractice),
		c(KeyTLCEvery, "TLC every n-th fraction", 2, units.None, "", "spotting every other fraction", source.CommonPractice),
		c(KeyLanes, "TLC lanes per plate", 8, units.None, "", "a 10 cm wide plate holds about 8–10 lanes", source.CommonPractice),
		c(KeyTLCSolvent, "developing solvent per TLC plate", 10e-6, units.Volume, "mL", "a small developing chamber", source.CommonPractice),
		c(KeyTLCTime, "bench time per TLC plate (spot, develop, visualise)", 10*60, units.Time, "min", "", source.CommonPractice),
		c(KeyPackBase, "time to pack a column", 15*60, units.Time, "min", "slurry or dry packing of a bench column", source.CommonPractice),
		c(KeyPackPerKg, "extra packing time per kg of silica", 0.25*3600, units.TimePerMass, "h/kg", "large columns take longer to slurry and settle", source.CommonPractice),
		c(KeyLoadTime, "time to load the sample", 10*60, units.Time, "min", "", source.CommonPractice),
		c(KeyCleanTime, "time to empty and clean a column", 15*60, units.Time, "min", "", source.CommonPractice),
		c(KeyCombinePerFrac, "time to combine one product fraction", 0.5*60, units.Time, "min", "", source.CommonPractice),
		c(KeyEvapAttended, "share of evaporation time a person attends", 0.25, units.None, "", "", source.CommonPractice),
		c(KeyHeaterEff, "share of bath electricity that reaches the solvent", 0.6, units.None, "", "heat losses from an open water bath", source.CommonPractice),
		c(KeyChillerCOP, "coefficient of performance of the condenser chiller", 2.5, units.None, "", "small recirculating chillers, about 2–3", source.CommonPractice),
		c(KeyBathDelta, "warm-up of the evaporated solvent from room temperature", 20, units.Temperature, "K", "a 40 °C bath from 20 °C", source.CommonPractice),
		c(KeyRetainedLoss, "product retained on the silica", 0.02, units.None, "", "irreversible adsorption and hold-up on silica", source.CommonPractice),
		c(KeyLoadSolventPerKg, "solvent to dissolve the crude for liquid loading", 2e-3, units.SpecificVolume, "mL/g", "a minimum volume, about 1–3 mL per g of crude", source.CommonPractice),
		c(KeyDrySorbent, "silica for dry loading per crude", 2, units.None, "", "2–3 g silica per g crude", source.CommonPractice),
		c(KeyDrySolventPerKg, "solvent to adsorb the crude for dry loading", 10e-3, units.SpecificVolume, "mL/g", "enough to dissolve the crude and wet the sorbent, then evaporated", source.CommonPractice),
		c(KeySandHeight, "sand layers (below and above the bed, together)", 0.01, units.Length, "cm", still+": a thin sand layer protects the bed surface", source.CommonPractice),
		c(KeySandDensity, "bulk density of sea sand", 1500, units.Density, "g/mL", "dry quartz sand, about 1.4–1.6 g/mL", source.FromMemory),
		c(KeyPlateMass, "mass of one TLC plate (waste)", 2e-3, units.Mass, "g", "aluminium-backed silica plate, 5 × 10 cm", source.CommonPractice),
		c(KeyRouteTolerance, "factor by which the two loading rules may differ before a warning", 2, units.None, "", "two estimates of the same quantity a factor of two apart are worth a look", source.CommonPractice),
	}, scaleDefaults(c)...)
}

// r gives a coefficient its physical range (SI, inclusive).
func r(c source.Coefficient, lo, hi float64) source.Coefficient {
	c.Lo, c.Hi = lo, hi
	return c
}
