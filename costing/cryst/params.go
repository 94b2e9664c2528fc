package cryst

import (
	"fmt"
	"math"
	"sort"

	"sepcost/costing/source"
)

// params are the model's coefficients, read from the set once and checked
// there (New), in SI.
type params struct {
	excess, washCakeVolumes, washSaturation    float64
	crystalDensity, porosity, saturation       float64
	inclusion, inclusionRate, distribution     float64
	maxPasses                                  int
	extrapolation, dilution, solidCp, roomT    float64
	heatApproach, coolApproach, maxCoolingRate float64
	uFlask, uReactor, areaFlask, areaReactor   float64
	flaskFill, reactorFill                     float64
	setupTime, transferRate, solidChargeRate   float64
	crew                                       float64
	hotHold, aging, heatAttended, coolAttended float64
	filterSetup, cakeDepth, minFilterArea      float64
	filterAttended, viscosity, cakeResistance  float64
	mediumResistance, vacuumDrop, pressureDrop float64
	filterAreaFactor                           float64
	checkTime, cleanTime, cleanPerArea         float64
	cleanAttended                              float64
	lodTarget, dryingFlux, trayDepth, drySetup float64
	dryAttended, dryWarmup, dischargeRate      float64
	heaterEff, chillerCOP, evapAttended        float64
	cropTime, cropAttended                     float64
	screeningTime, screeningMass               float64
	flasks, reactors                           []float64
}

// readParams reads the coefficients and returns why one makes the model
// meaningless (possibly set by the user under settings:), or "".
func readParams(coef source.Set) (params, string) {
	g := coef.Get
	p := params{
		excess: g(KeyExcess), washCakeVolumes: g(KeyWashCakeVolumes), washSaturation: g(KeyWashSaturation),
		crystalDensity: g(KeyCrystalDensity), porosity: g(KeyCakePorosity), saturation: g(KeyCakeSaturation),
		inclusion: g(KeyInclusion), inclusionRate: g(KeyInclusionRate), distribution: g(KeyDistribution),
		maxPasses:     int(math.Max(1, math.Round(g(KeyMaxPasses)))),
		extrapolation: g(KeyExtrapolation), dilution: g(KeyDilution), solidCp: g(KeySolidCp), roomT: g(KeyRoomT),
		heatApproach: g(KeyHeatApproach), coolApproach: g(KeyCoolApproach), maxCoolingRate: g(KeyMaxCoolingRate),
		uFlask: g(KeyUFlask), uReactor: g(KeyUReactor), areaFlask: g(KeyAreaFlask), areaReactor: g(KeyAreaReactor),
		flaskFill: g(KeyFlaskFill), reactorFill: g(KeyReactorFill),
		setupTime: g(KeySetupTime), transferRate: g(KeyTransferRate), solidChargeRate: g(KeySolidChargeRate), crew: g(KeyCrew),
		hotHold: g(KeyHotHold), aging: g(KeyAging), heatAttended: g(KeyHeatAttended), coolAttended: g(KeyCoolAttended),
		filterSetup: g(KeyFilterSetup), cakeDepth: g(KeyCakeDepth), minFilterArea: g(KeyMinFilterArea),
		filterAttended: g(KeyFilterAttended), viscosity: g(KeyViscosity), cakeResistance: g(KeyCakeResistance),
		mediumResistance: g(KeyMediumResistance), vacuumDrop: g(KeyVacuumDrop), pressureDrop: g(KeyPressureDrop),
		filterAreaFactor: g(KeyFilterAreaFactor),
		checkTime:        g(KeyCheckTime), cleanTime: g(KeyCleanTime), cleanPerArea: g(KeyCleanPerArea), cleanAttended: g(KeyCleanAttended),
		lodTarget: g(KeyLODTarget), dryingFlux: g(KeyDryingFlux), trayDepth: g(KeyTrayDepth), drySetup: g(KeyDrySetup),
		dryAttended: g(KeyDryAttended), dryWarmup: g(KeyDryWarmup), dischargeRate: g(KeyDischargeRate),
		heaterEff: g(KeyHeaterEff), chillerCOP: g(KeyChillerCOP), evapAttended: g(KeyEvapAttended),
		cropTime: g(KeyCropTime), cropAttended: g(KeyCropAttended),
		screeningTime: g(KeyScreeningTime), screeningMass: g(KeyScreeningMass),
		flasks: seriesFrom(coef, KeyFlask), reactors: seriesFrom(coef, KeyReactor),
	}
	return p, checkCoefficients(coef)
}

// checkCoefficients returns why a coefficient (possibly set by the user
// under settings:) makes the model meaningless, or "".
func checkCoefficients(coef source.Set) string {
	positive := []string{KeyCrystalDensity, KeySolidCp, KeyHeatApproach, KeyCoolApproach, KeyMaxCoolingRate,
		KeyUFlask, KeyUReactor, KeyAreaFlask, KeyAreaReactor, KeyFlaskFill, KeyReactorFill,
		KeyCakeDepth, KeyMinFilterArea, KeyHeaterEff, KeyChillerCOP, KeyMaxPasses,
		KeyInclusionRate, KeyTransferRate, KeySolidChargeRate, KeyCrew, KeyViscosity, KeyCakeResistance,
		KeyVacuumDrop, KeyPressureDrop, KeyFilterAreaFactor, KeyDryingFlux, KeyTrayDepth, KeyDischargeRate}
	for _, k := range positive {
		if v := coef.Get(k); !(v > 0) || math.IsInf(v, 0) {
			return fmt.Sprintf("setting %s = %s must be above zero", k, coef.Of(k).String())
		}
	}
	unit := []string{KeyCakeSaturation, KeyWashSaturation, KeyFlaskFill, KeyReactorFill, KeyHeaterEff, KeyHeatAttended, KeyCoolAttended,
		KeyFilterAttended, KeyDryAttended, KeyEvapAttended, KeyCropAttended, KeyDistribution, KeyCleanAttended}
	for _, k := range unit {
		if v := coef.Get(k); !(v >= 0 && v <= 1) {
			return fmt.Sprintf("setting %s = %s must lie between 0 and 1", k, coef.Of(k).String())
		}
	}
	if v := coef.Get(KeyCakePorosity); !(v > 0 && v < 1) {
		return fmt.Sprintf("setting %s = %s must lie above 0 and below 1", KeyCakePorosity, coef.Of(KeyCakePorosity).String())
	}
	nonNeg := []string{KeyExcess, KeyWashCakeVolumes, KeyInclusion, KeyExtrapolation, KeyDilution, KeySetupTime, KeyHotHold,
		KeyAging, KeyFilterSetup, KeyCheckTime, KeyCleanTime, KeyDryWarmup, KeyCropTime, KeyScreeningTime, KeyScreeningMass,
		KeyMediumResistance, KeyLODTarget, KeyDrySetup, KeyCleanPerArea}
	for _, k := range nonNeg {
		if v := coef.Get(k); !(v >= 0) || math.IsInf(v, 0) {
			return fmt.Sprintf("setting %s = %s must be zero or more", k, coef.Of(k).String())
		}
	}
	return ""
}

// seriesFrom reads a vessel series from numbered coefficients (KeyFlask or
// KeyReactor) until one is missing, ascending.
func seriesFrom(coef source.Set, key func(int) string) []float64 {
	var out []float64
	for i := 1; ; i++ {
		c, ok := coef.Lookup(key(i))
		if !ok {
			break
		}
		if c.SI > 0 {
			out = append(out, c.SI)
		}
	}
	sort.Float64s(out)
	return out
}
