package cryst

import (
	"fmt"

	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Method is the method name used in reports and coefficient tables.
const Method = "crystallization"

// Coefficient keys (also the keys users write under settings:).
const (
	KeyExcess          = "crystallization.excess_solvent"
	KeyWashCakeVolumes = "crystallization.wash_cake_volumes"
	KeyWashSaturation  = "crystallization.wash_saturation"
	KeyCrystalDensity  = "crystallization.crystal_density"
	KeyCakePorosity    = "crystallization.cake_porosity"
	KeyCakeSaturation  = "crystallization.cake_liquid_saturation"
	KeyInclusion       = "crystallization.inclusion_factor"
	KeyMaxPasses       = "crystallization.max_passes"
	KeyExtrapolation   = "crystallization.extrapolation_margin"
	KeyDilution        = "crystallization.dilution_warning"
	KeySolidCp         = "crystallization.solid_heat_capacity"
	KeyRoomT           = "crystallization.room_temperature"
	KeyHeatApproach    = "crystallization.heating_approach"
	KeyCoolApproach    = "crystallization.cooling_approach"
	KeyMaxCoolingRate  = "crystallization.max_cooling_rate"
	KeyUFlask          = "crystallization.u_flask"
	KeyUReactor        = "crystallization.u_reactor"
	KeyAreaFlask       = "crystallization.area_factor_flask"
	KeyAreaReactor     = "crystallization.area_factor_reactor"
	KeyFlaskFill       = "crystallization.flask_fill_limit"
	KeyReactorFill     = "crystallization.reactor_fill_limit"
	KeySetupTime       = "crystallization.charge_time"
	KeyHotHold         = "crystallization.hot_hold_time"
	KeyAging           = "crystallization.aging_time"
	KeyHeatAttended    = "crystallization.heating_attended_share"
	KeyCoolAttended    = "crystallization.cooling_attended_share"
	KeyFilterSetup     = "crystallization.filtration_setup_time"
	KeyCakeDepth       = "crystallization.cake_depth"
	KeyMinFilterArea   = "crystallization.min_filter_area"
	KeyFilterAttended  = "crystallization.filtration_attended_share"
	KeyCheckTime       = "crystallization.purity_check_time"
	KeyCleanTime       = "crystallization.cleaning_time"
	KeyDryAttended     = "crystallization.drying_attended_share"
	KeyDryWarmup       = "crystallization.drying_warmup"
	KeyHeaterEff       = "crystallization.heater_efficiency"
	KeyChillerCOP      = "crystallization.chiller_cop"
	KeyEvapAttended    = "crystallization.evaporation_attended_share"
	KeyCropTime        = "crystallization.second_crop_time"
	KeyCropAttended    = "crystallization.second_crop_attended_share"
	KeyScreeningTime   = "crystallization.screening_time"
	KeyScreeningMass   = "crystallization.screening_material"
)

// SpecificHeatCapacity is the dimension of a heat capacity per mass, J/(kg·K).
var SpecificHeatCapacity = units.Dim{L: 2, T: -2, K: -1}

// HeatTransferCoefficient is the dimension of U, W/(m²·K).
var HeatTransferCoefficient = units.Dim{M: 1, T: -3, K: -1}

// CoolingRate is the dimension of a temperature ramp, K/s.
var CoolingRate = units.Dim{K: 1, T: -1}

// DefaultFlasksM3 are the flask volumes a site is assumed to have unless
// the scenario lists its own: round-bottom flasks from 25 mL to 5 L
// (common practice, no source).
var DefaultFlasksM3 = []float64{25e-6, 50e-6, 100e-6, 250e-6, 500e-6, 1e-3, 2e-3, 5e-3}

// DefaultReactorsM3 are the jacketed reactor volumes assumed unless the
// scenario lists its own: kilo-lab glass reactors of 10–100 L and pilot
// vessels of 250–1000 L (common practice, no source).
var DefaultReactorsM3 = []float64{10e-3, 20e-3, 50e-3, 100e-3, 250e-3, 630e-3, 1}

// KeyFlask is the coefficient key of the i-th default flask (from 1).
func KeyFlask(i int) string { return fmt.Sprintf("crystallization.flask_%02d", i) }

// KeyReactor is the coefficient key of the i-th default reactor (from 1).
func KeyReactor(i int) string { return fmt.Sprintf("crystallization.reactor_%02d", i) }

// Defaults returns the model's coefficients with their sources.
func Defaults() []source.Coefficient {
	c := func(key, label string, si float64, dim units.Dim, unit, src string, mark source.Mark) source.Coefficient {
		lo, hi := rangeOf(key)
		return source.Coefficient{Key: key, Method: Method, Label: label, SI: si, Dim: dim, Unit: unit, Source: src, Mark: mark, Lo: lo, Hi: hi}
	}
	minute, h := 60.0, 3600.0
	out := []source.Coefficient{
		c(KeyExcess, "solvent above the saturation volume at the dissolution temperature", 0.10, units.None, "", "5–20 % over the saturation volume, so that the solution does not crystallise in a hot filtration", source.CommonPractice),
		c(KeyWashCakeVolumes, "cold wash, in cake volumes", 2, units.None, "", "one to three cake volumes of cold solvent", source.CommonPractice),
		c(KeyWashSaturation, "share of the product's cold solubility the wash liquid reaches", 1, units.None, "", "the wash taken to leave saturated at the isolation temperature: an upper bound on the wash loss", source.CommonPractice),
		c(KeyCrystalDensity, "density of the organic crystals", 1300, units.Density, "g/mL", "organic crystals about 1.1–1.5 g/mL (benzoic acid 1.27 g/mL, CRC Handbook)", source.FromMemory),
		c(KeyCakePorosity, "porosity of the filter cake", 0.4, units.None, "", "filter cakes of crystalline solids about 0.3–0.5", source.FromMemory),
		c(KeyCakeSaturation, "share of the cake's pores still holding liquid after suction", 0.5, units.None, "", "wet cakes after suction typically hold 10–30 % solvent by mass", source.CommonPractice),
		c(KeyInclusion, "mother liquor occluded in the crystals, per mass of crystals, at the reference cooling rate", 0.005, units.None, "", "well-grown crystals occlude roughly 0.1–1 % of their mass as mother liquor", source.CommonPractice),
		c(KeyMaxPasses, "most recrystallizations run on one batch", 4, units.None, "", "more than three or four passes are rarely worth running; another method or a better solvent pays", source.CommonPractice),
		c(KeyExtrapolation, "distance outside the measured solubility range that draws a warning", 10, units.Temperature, "K", "ln S curves in 1/T (large heat capacity of solution), so a van 't Hoff line is a guess beyond a few kelvin", source.CommonPractice),
		c(KeyDilution, "solvent per product above which the crystallization is called dilute", 50e-3, units.SpecificVolume, "mL/g", "beyond about 50 volumes (mL per g) a crystallization is impractically dilute", source.CommonPractice),
		c(KeySolidCp, "heat capacity of the organic solid", 1293, SpecificHeatCapacity, "J/(g K)", "naphthalene, 39.601 cal/(mol·K) at 298.15 K (McCullough et al. 1957, in the NIST Chemistry WebBook) ÷ 128.17 g/mol; organic solids lie at about 1.0–1.5 J/(g·K)", source.Derived),
		c(KeyRoomT, "room temperature (start of heating, cooling-water limit)", 293.15, units.Temperature, "°C", "", source.CommonPractice),
		c(KeyHeatApproach, "jacket or bath above the dissolution temperature while heating", 20, units.Temperature, "K", "", source.CommonPractice),
		c(KeyCoolApproach, "jacket or bath below the isolation temperature while cooling", 10, units.Temperature, "K", "", source.CommonPractice),
		c(KeyMaxCoolingRate, "fastest controlled cooling ramp", 30.0/h, CoolingRate, "K/h", "0.1–1 K/min, to grow filterable crystals rather than crash them out", source.CommonPractice),
		c(KeyUFlask, "overall heat-transfer coefficient, stirred flask in a bath", 150, HeatTransferCoefficient, "W/(m^2 K)", "stirred glass flasks in a liquid bath, about 100–300 W/(m²·K)", source.FromMemory),
		c(KeyUReactor, "overall heat-transfer coefficient, jacketed glass reactor", 200, HeatTransferCoefficient, "W/(m^2 K)", "jacketed glass reactors about 100–300 W/(m²·K), limited by the glass wall", source.FromMemory),
		c(KeyAreaFlask, "wetted area over volume^(2/3), flask", AreaFactorSphere, units.None, "", "a sphere: A = (36π)^(1/3)·V^(2/3)", source.Derived),
		c(KeyAreaReactor, "wetted area over volume^(2/3), reactor", AreaFactorCylinder, units.None, "", "a cylinder with height equal to diameter, wall and bottom: A = (5π/4)(4/π)^(2/3)·V^(2/3)", source.Derived),
		c(KeyFlaskFill, "largest share of a flask's volume a batch fills", 0.5, units.None, "", "a heated round-bottom flask no more than half full", source.CommonPractice),
		c(KeyReactorFill, "largest share of a reactor's volume a batch fills", 0.8, units.None, "", "working volume about 80 % of the nominal volume", source.CommonPractice),
		c(KeySetupTime, "time to set up a vessel before charging (the charge itself is by volume and mass)", 15*minute, units.Time, "min", "", source.CommonPractice),
		c(KeyHotHold, "hold at the dissolution temperature", 15*minute, units.Time, "min", "until all solid has dissolved", source.CommonPractice),
		c(KeyAging, "hold (ageing) at the isolation temperature", 60*minute, units.Time, "min", "one to two hours to let the crystals grow out", source.CommonPractice),
		c(KeyHeatAttended, "share of heating time a person attends", 0.25, units.None, "", "", source.CommonPractice),
		c(KeyCoolAttended, "share of cooling and ageing time a person attends", 0.1, units.None, "", "", source.CommonPractice),
		c(KeyFilterSetup, "time to set up a filter and transfer the slurry", 10*minute, units.Time, "min", "", source.CommonPractice),
		c(KeyCakeDepth, "filter cake depth a funnel is chosen for (flask scale)", 0.03, units.Length, "cm", "a few centimetres on a Büchner funnel", source.CommonPractice),
		c(KeyMinFilterArea, "smallest filter used", 20e-4, units.Area, "cm^2", "a 5 cm Büchner or Hirsch funnel", source.CommonPractice),
		c(KeyFilterAttended, "share of filtration and washing time a person attends", 0.75, units.None, "", "", source.CommonPractice),
		c(KeyCheckTime, "purity check after each pass (HPLC or melting point)", 30*minute, units.Time, "min", "", source.CommonPractice),
		c(KeyCleanTime, "time to empty and clean a vessel, beside the part that grows with its wall area", 20*minute, units.Time, "min", "", source.CommonPractice),
		c(KeyDryAttended, "share of drying time a person attends", 0.05, units.None, "", "", source.CommonPractice),
		c(KeyDryWarmup, "warm-up of the evaporated solvent from room temperature in the dryer", 20, units.Temperature, "K", "a 40 °C oven from 20 °C", source.CommonPractice),
		c(KeyHeaterEff, "share of heater electricity that reaches the batch", 0.7, units.None, "", "jacket, bath and mantle losses", source.CommonPractice),
		c(KeyChillerCOP, "coefficient of performance of the chiller", 2.5, units.None, "", "small recirculating chillers, about 2–3", source.CommonPractice),
		c(KeyEvapAttended, "share of evaporation time a person attends", 0.25, units.None, "", "", source.CommonPractice),
		c(KeyCropTime, "time to cool, age and filter a second crop", 1.5*h, units.Time, "h", "", source.CommonPractice),
		c(KeyCropAttended, "share of second-crop time a person attends", 0.5, units.None, "", "", source.CommonPractice),
		c(KeyScreeningTime, "one-time development of the crystallization", 40*h, units.Time, "h", "developing a crystallization to run at kilogram scale (solvent screen, solubility curve, seeding, filtration and drying trials, polymorph check) commonly takes one to several weeks of a chemist's time; one working week is taken, the short end (a bench-only trial is about a day: set 8 h)", source.CommonPractice),
		c(KeyScreeningMass, "one-time crude used in development", 20e-3, units.Mass, "g", "a dozen screening tubes of 50–100 mg, a solubility curve and a few trial crystallizations of 2–5 g", source.CommonPractice),
	}
	out = append(out, scaleDefaults()...)
	for i, v := range DefaultFlasksM3 {
		out = append(out, c(KeyFlask(i+1), fmt.Sprintf("flask size %d of %d", i+1, len(DefaultFlasksM3)), v, units.Volume, "mL", "round-bottom flasks from 25 mL to 5 L", source.CommonPractice))
	}
	for i, v := range DefaultReactorsM3 {
		out = append(out, c(KeyReactor(i+1), fmt.Sprintf("jacketed reactor size %d of %d", i+1, len(DefaultReactorsM3)), v, units.Volume, "L", "kilo-lab glass reactors of 10–100 L, pilot vessels of 250–1000 L", source.CommonPractice))
	}
	return out
}
