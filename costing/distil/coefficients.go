package distil

import (
	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Method is the method name used in reports and coefficient tables.
const Method = "distillation"

// Coefficient keys (also the keys users write under settings:).
const (
	KeyRefluxMultiple  = "distillation.reflux_multiple"
	KeyDesignRecovery  = "distillation.design_recovery"
	KeyMinAlpha        = "distillation.min_relative_volatility"
	KeyFillLimit       = "distillation.fill_limit"
	KeyPressureDrop    = "distillation.pressure_drop_per_stage"
	KeyDeltaZ          = "distillation.compressibility_change"
	KeyDefaultDensity  = "distillation.default_density"
	KeyDefaultCp       = "distillation.default_specific_heat"
	KeyForerun         = "distillation.forerun_share"
	KeyMinResidue      = "distillation.min_pot_residue"
	KeyHoldupHead      = "distillation.holdup_head"
	KeyHoldupStage     = "distillation.holdup_per_stage"
	KeyMaxHoldup       = "distillation.max_holdup_share"
	KeyColdTrap        = "distillation.cold_trap_share"
	KeyBoilup          = "distillation.boilup_rate_1l"
	KeyHeaterEff       = "distillation.heater_efficiency"
	KeyChillerCOP      = "distillation.chiller_cop"
	KeyPumpPower       = "distillation.vacuum_pump_power"
	KeyRoomTemperature = "distillation.room_temperature"
	KeyCoolant         = "distillation.coolant_temperature"
	KeyCondenserMargin = "distillation.condenser_margin"
	KeySetupTime       = "distillation.setup_time"
	KeyEquilibration   = "distillation.equilibration_time"
	KeyCooldown        = "distillation.cooldown_time"
	KeyCleanup         = "distillation.cleanup_time"
	KeyAnalysisPerCut  = "distillation.analysis_time_per_cut"
	KeyAttended        = "distillation.attended_share"
	KeyRinse           = "distillation.rinse_share"
)

// ReferenceStillM3 is the still volume at which the boil-up rate
// coefficient is stated (1 L).
const ReferenceStillM3 = 1e-3

// SpecificHeat is the dimension of a heat capacity per mass, J/(kg·K).
var SpecificHeat = units.Dim{L: 2, T: -2, K: -1}

// Defaults returns the model's coefficients with their sources.
func Defaults() []source.Coefficient {
	c := func(key, label string, si float64, dim units.Dim, unit, src string, mark source.Mark) source.Coefficient {
		lo, hi := rangeOf(key)
		return source.Coefficient{Key: key, Method: Method, Label: label, SI: si, Dim: dim, Unit: unit, Source: src, Mark: mark, Lo: lo, Hi: hi}
	}
	shr := "Seader, J. D.; Henley, E. J.; Roper, D. K. Separation Process Principles, 3rd ed., Wiley, 2011"
	out := []source.Coefficient{
		c(KeyRefluxMultiple, "reflux ratio as a multiple of the minimum (when the scenario gives none)", 1.5, units.None, "",
			"the usual design range R/R_min ≈ 1.1–1.5 for continuous columns ("+shr+", ch. 7 and 9); the upper end, as small batch columns are not optimised for energy", source.FromMemory),
		c(KeyDesignRecovery, "share of the product the design cut aims to recover (sets the design bottoms or distillate for Fenske's N_min)", 0.90, units.None, "%",
			"a heart cut of about 90 % of the product is a usual aim", source.CommonPractice),
		c(KeyMinAlpha, "lowest relative volatility treated as separable", 1.05, units.None, "",
			"below about α = 1.05 a distillation needs around 100 stages or more (Fenske) and is rarely chosen", source.CommonPractice),
		c(KeyFillLimit, "highest fill of a still", 0.60, units.None, "%",
			"round-bottom flasks are filled to about half or two-thirds for distillation, leaving room for foaming and bumping", source.CommonPractice),
		c(KeyPressureDrop, "pressure drop per theoretical stage of the column", 50, units.Pressure, "mbar",
			"packed laboratory columns under vacuum, a few tenths of a mbar to about 1 mbar per theoretical stage", source.CommonPractice),
		c(KeyDeltaZ, "compressibility change Z(vapour) − Z(liquid) at the normal boiling point (for ΔHvap from an Antoine slope)", 0.96, units.None, "",
			"about 0.95–0.97 for organic liquids at their normal boiling point (Poling, B. E.; Prausnitz, J. M.; O'Connell, J. P. The Properties of Gases and Liquids, 5th ed., McGraw-Hill, 2001, ch. 7); the same value package solvent uses", source.FromMemory),
		c(KeyDefaultDensity, "liquid density of a compound given without one", 1000, units.Density, "g/mL",
			"organic liquids lie at about 0.7–1.5 g/mL; 1 g/mL is used only to size the still and report volumes", source.CommonPractice),
		c(KeyDefaultCp, "liquid specific heat of a compound given without one", 2000, SpecificHeat, "J/(g K)",
			"organic liquids lie at about 1.7–2.4 J/(g K) near room temperature (e.g. toluene 1.71, ethanol 2.44 J/(g K) from the built-in heat capacities)", source.CommonPractice),
		c(KeyForerun, "fore-run taken before the product cut (share of the charge)", 0.03, units.None, "%",
			"a small first cut clears residual solvent and volatile by-products and wets the column", source.CommonPractice),
		c(KeyMinResidue, "least residue left in the pot (share of the charge)", 0.05, units.None, "%",
			"never distil to dryness: overheated residues decompose and peroxides concentrate", source.CommonPractice),
		c(KeyHoldupHead, "hold-up of still head and condenser (share of the still volume)", 0.01, units.None, "%",
			"a distillation head, condenser and receiver adapter wet about 1 % of the still volume", source.CommonPractice),
		c(KeyHoldupStage, "column hold-up per theoretical stage (share of the still volume)", 0.002, units.None, "%",
			"about 2 mL per theoretical stage for a packed column on a 1 L still", source.CommonPractice),
		c(KeyMaxHoldup, "largest hold-up, as a share of the charge, before the still is judged too large for the batch", 0.25, units.None, "%",
			"above this a bulb-to-bulb short-path apparatus is the better tool", source.CommonPractice),
		c(KeyColdTrap, "share of the distillate lost to the cold trap under vacuum", 0.01, units.None, "%",
			"vapour that passes the condenser and freezes out in the trap", source.CommonPractice),
		c(KeyBoilup, "boil-up rate of a 1 L still (liquid volume evaporated per hour)", 1.0e-3/3600, units.VolumeFlow, "L/h",
			"a 1 L still in a heating mantle of a few hundred watts; scaled with the heated area, ∝ V^(2/3)", source.CommonPractice),
		c(KeyHeaterEff, "share of the heater's electricity that reaches the pot", 0.6, units.None, "",
			"heating mantle or oil bath, heat lost to the surroundings", source.CommonPractice),
		c(KeyChillerCOP, "coefficient of performance of the condenser chiller", 2.5, units.None, "",
			"small recirculating chillers, about 2–3 (as for the chromatography model's evaporator)", source.CommonPractice),
		c(KeyPumpPower, "electric power of the vacuum pump", 300, units.Power, "kW",
			"laboratory rotary-vane and diaphragm pumps draw about 0.1–0.5 kW", source.CommonPractice),
		c(KeyRoomTemperature, "temperature of the charge before heating", 293.15, units.Temperature, "°C",
			"room temperature", source.CommonPractice),
		c(KeyCoolant, "condenser coolant temperature", 283.15, units.Temperature, "°C",
			"a recirculating chiller at about 10 °C", source.CommonPractice),
		c(KeyCondenserMargin, "least margin of the head temperature above the coolant", 10, units.Temperature, "K",
			"a condenser needs some 10 K of driving force to condense the vapour fully", source.CommonPractice),
		c(KeySetupTime, "time to set up the still, column and vacuum and test for leaks", 45*60, units.Time, "min", "assembling greased joints, clamps, thermometers, cold trap and pump, then holding vacuum", source.CommonPractice),
		c(KeyEquilibration, "time at total reflux before take-off (with a column)", 30*60, units.Time, "min",
			"the column is brought to steady state before the first cut", source.CommonPractice),
		c(KeyCooldown, "time to cool the pot before venting", 30*60, units.Time, "min", "the pot is cooled under vacuum before air is let in", source.CommonPractice),
		c(KeyCleanup, "time to dismantle and clean the still, beside the part that grows with its wall area", 20*60, units.Time, "min", "emptying, rinsing and drying the glassware", source.CommonPractice),
		c(KeyAnalysisPerCut, "time to analyse one cut (GC or NMR)", 15*60, units.Time, "min", "sampling, running and reading a GC trace or a proton NMR spectrum", source.CommonPractice),
		c(KeyAttended, "share of the heating and distillation time a person attends", 0.3, units.None, "%",
			"temperatures, vacuum and cut changes are watched but not continuously", source.CommonPractice),
		c(KeyRinse, "rinse solvent for still and column (share of the still volume)", 0.1, units.None, "%",
			"one rinse of about a tenth of the still volume after the campaign", source.CommonPractice),
	}
	return append(out, scaleDefaults()...)
}
