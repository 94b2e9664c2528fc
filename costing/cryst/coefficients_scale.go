package cryst

import (
	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Coefficient keys of the impurity's uptake by the crystals and of the
// times that scale with the equipment and the batch.
const (
	KeyDistribution     = "crystallization.impurity_distribution"
	KeyInclusionRate    = "crystallization.inclusion_reference_rate"
	KeyTransferRate     = "crystallization.transfer_rate"
	KeySolidChargeRate  = "crystallization.solid_charge_rate"
	KeyCrew             = "crystallization.plant_crew"
	KeyViscosity        = "crystallization.liquor_viscosity"
	KeyCakeResistance   = "crystallization.specific_cake_resistance"
	KeyMediumResistance = "crystallization.filter_medium_resistance"
	KeyVacuumDrop       = "crystallization.vacuum_filter_pressure"
	KeyPressureDrop     = "crystallization.pressure_filter_pressure"
	KeyFilterAreaFactor = "crystallization.filter_area_factor"
	KeyLODTarget        = "crystallization.loss_on_drying_target"
	KeyDryingFlux       = "crystallization.drying_flux"
	KeyTrayDepth        = "crystallization.tray_depth"
	KeyDrySetup         = "crystallization.drying_setup_time"
	KeyCleanPerArea     = "crystallization.cleaning_time_per_area"
	KeyCleanAttended    = "crystallization.cleaning_attended_share"
	KeyDischargeRate    = "crystallization.discharge_rate"
)

// Dimensions of the filtration and drying coefficients.
var (
	Viscosity        = units.Dim{M: 1, L: -1, T: -1} // Pa·s
	CakeResistance   = units.Dim{L: 1, M: -1}        // m/kg
	MediumResistance = units.Dim{L: -1}              // 1/m
	MassFlux         = units.Dim{M: 1, L: -2, T: -1} // kg/(m²·s)
	MassFlow         = units.Dim{M: 1, T: -1}        // kg/s
	TimePerArea      = units.Dim{T: 1, L: -2}        // s/m²
)

// scaleDefaults are the coefficients of the impurity uptake and of the
// scaling times, each with its source, mark and physical range (SI).
func scaleDefaults() []source.Coefficient {
	c := func(key, label string, si float64, dim units.Dim, unit, src string, mark source.Mark, lo, hi float64) source.Coefficient {
		return source.Coefficient{Key: key, Method: Method, Label: label, SI: si, Dim: dim, Unit: unit, Source: src, Mark: mark, Lo: lo, Hi: hi}
	}
	h, minute := 3600.0, 60.0
	return []source.Coefficient{
		c(KeyDistribution, "logarithmic distribution coefficient λ of the impurity between crystals and liquor (0: rejected, 1: no separation)", 0.01, units.None, "",
			"the Doerner–Hoskins law, ln(I₀/I) = λ·ln(P₀/P) (IUPAC Gold Book, \"laws of distribution in precipitation\", doi:10.1351/goldbook.L03487, confirmed; Doerner, H. A.; Hoskins, W. M. J. Am. Chem. Soc. 1925, 47, 662, from memory). "+
				"The default is an assumption with no source: a small uptake, as for an impurity unlike the product in shape; a structurally related impurity can reach 0.1–1. Measure it: impurity in the crystals and in the liquor after one pass", source.CommonPractice, 0, 1),
		c(KeyInclusionRate, "cooling rate at which the occluded liquor equals crystallization.inclusion_factor (it scales in proportion to the rate)", 30.0/h, CoolingRate, "K/h",
			"inclusions grow with the growth rate, so with the cooling rate (Mullin, J. W. Crystallization, 4th ed., Butterworth-Heinemann, 2001, ch. 6, from memory); proportionality is an assumption, stated at the fastest controlled ramp", source.CommonPractice, 1.0/h, 600.0/h),
		c(KeyTransferRate, "rate of charging liquid into a vessel or transferring a slurry to the filter", 10e-3/minute, units.VolumeFlow, "L/min",
			"pouring in the laboratory, a drum pump or vacuum transfer in a pilot plant: about 5–50 L/min", source.CommonPractice, 0.1e-3/minute, 500e-3/minute),
		c(KeySolidChargeRate, "rate of charging solid crude into a reactor (scooped from drums through a charging port)", 200.0/h, MassFlow, "kg/h",
			"manual solids charging with dust control, about 100–500 kg/h", source.CommonPractice, 10.0/h, 5000.0/h),
		c(KeyCrew, "operators attending a jacketed-reactor operation (flasks: one chemist)", 2, units.None, "",
			"charging, sampling and filtration in a pilot plant are done in pairs (two-person rule for flammable solvents and solids charging)", source.CommonPractice, 1, 6),
		c(KeyViscosity, "viscosity of the cold mother liquor", 1.5e-3, Viscosity, "Pa s",
			"ethanol 1.07 and water 1.00 mPa·s at 20 °C, higher when cold (water 1.79 mPa·s at 0 °C; CRC Handbook of Chemistry and Physics, from memory)", source.FromMemory, 0.2e-3, 100e-3),
		c(KeyCakeResistance, "specific cake resistance α of the crystal cake", 1e10, CakeResistance, "m/kg",
			"crystalline cakes filter easily at 10⁹–10¹⁰ m/kg, moderately at 10¹⁰–10¹¹ and with difficulty above 10¹² (Wakeman, R. J.; Tarleton, E. S. Solid/Liquid Separation: Principles of Industrial Filtration, Elsevier, 2005, from memory); measure it with a leaf or funnel test", source.FromMemory, 1e8, 1e14),
		c(KeyMediumResistance, "resistance of the filter medium R_m (paper, cloth or frit)", 1e10, MediumResistance, "1/m",
			"filter papers and cloths about 10⁹–10¹¹ m⁻¹ (Wakeman and Tarleton 2005, from memory)", source.FromMemory, 1e8, 1e13),
		c(KeyVacuumDrop, "pressure difference across a vacuum funnel (flask scale)", 0.6e5, units.Pressure, "bar",
			"a diaphragm pump or water aspirator pulls 0.6–0.9 bar below atmospheric", source.CommonPractice, 0.1e5, 1e5),
		c(KeyPressureDrop, "pressure difference across a pressure filter or filter-dryer (reactor scale)", 2e5, units.Pressure, "bar",
			"nitrogen at 1–3 bar gauge on an enclosed filter", source.CommonPractice, 0.1e5, 6e5),
		c(KeyFilterAreaFactor, "filter area of a reactor's filter or filter-dryer over the reactor volume^(2/3)", 1.0, units.None, "m^2/m^2",
			"a filter-dryer of about 1 m² serves a 1 m³ reactor, 0.2 m² a 100 L one; geometric similarity, A ∝ V^(2/3)", source.CommonPractice, 0.1, 10),
		c(KeyLODTarget, "loss on drying the dried crystals are taken to (solvent left per mass of dry solid)", 0.005, units.None, "%",
			"a usual release limit of 0.5 % loss on drying", source.CommonPractice, 0, 0.2),
		c(KeyDryingFlux, "mean solvent removed per area of cake while drying to the target, vacuum oven tray or filter-dryer", 1.0/h, MassFlux, "kg/(m^2 h)",
			"vacuum drying of solvent-wet organic cakes, about 0.5–5 kg/(m²·h) over the constant- and falling-rate periods", source.CommonPractice, 0.05/h, 50.0/h),
		c(KeyTrayDepth, "depth of the cake spread on oven trays (flask scale)", 0.01, units.Length, "cm",
			"cakes are spread 0.5–2 cm deep on vacuum-oven trays", source.CommonPractice, 0.002, 0.1),
		c(KeyDrySetup, "time to load the dryer, pull vacuum and test the loss on drying", 45*minute, units.Time, "min",
			"", source.CommonPractice, 0, 8*h),
		c(KeyCleanPerArea, "cleaning time per m² of wetted vessel wall (boil-out, rinse, dry), beyond crystallization.cleaning_time", 1*h, TimePerArea, "h/m^2",
			"a 1 m³ glass-lined reactor (about 4.6 m² wetted) takes half a shift to clean and dry between products", source.CommonPractice, 0, 10*h),
		c(KeyCleanAttended, "share of cleaning time a person attends", 0.5, units.None, "",
			"", source.CommonPractice, 0, 1),
		c(KeyDischargeRate, "rate of discharging and packing the dried product", 100.0/h, MassFlow, "kg/h",
			"scooping or valve discharge into lined drums with sampling, about 50–300 kg/h", source.CommonPractice, 1.0/h, 2000.0/h),
	}
}
