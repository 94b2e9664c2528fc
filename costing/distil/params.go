package distil

import (
	"fmt"

	"sepcost/costing/source"
)

// params are the model's coefficients, read from the set once (New), SI.
type params struct {
	refluxMultiple, designRecovery, minAlpha, fillLimit float64
	pressureDrop, forerun, minResidue                   float64
	holdupHead, holdupStage, maxHoldup, coldTrap        float64
	boilup, heaterEff, chillerCOP, pumpPower            float64
	roomT, coolant, condenserMargin                     float64
	setupTime, equilibration, cooldown, cleanup         float64
	analysisPerCut, attended, rinse                     float64
	transferRate, cleanPerArea, plantStill, crew        float64
}

// readParams reads the coefficients and returns why one makes the model
// meaningless, or "".
func readParams(coef source.Set) (params, string) {
	g := coef.Get
	p := params{
		refluxMultiple: g(KeyRefluxMultiple), designRecovery: g(KeyDesignRecovery), minAlpha: g(KeyMinAlpha), fillLimit: g(KeyFillLimit),
		pressureDrop: g(KeyPressureDrop), forerun: g(KeyForerun), minResidue: g(KeyMinResidue),
		holdupHead: g(KeyHoldupHead), holdupStage: g(KeyHoldupStage), maxHoldup: g(KeyMaxHoldup), coldTrap: g(KeyColdTrap),
		boilup: g(KeyBoilup), heaterEff: g(KeyHeaterEff), chillerCOP: g(KeyChillerCOP), pumpPower: g(KeyPumpPower),
		roomT: g(KeyRoomTemperature), coolant: g(KeyCoolant), condenserMargin: g(KeyCondenserMargin),
		setupTime: g(KeySetupTime), equilibration: g(KeyEquilibration), cooldown: g(KeyCooldown), cleanup: g(KeyCleanup),
		analysisPerCut: g(KeyAnalysisPerCut), attended: g(KeyAttended), rinse: g(KeyRinse),
		transferRate: g(KeyTransferRate), cleanPerArea: g(KeyCleanPerArea), plantStill: g(KeyPlantStill), crew: g(KeyCrew),
	}
	if rd := p.designRecovery; !(rd > 0 && rd < 1) {
		return p, fmt.Sprintf("setting %s = %.4g must lie above 0 and below 1", KeyDesignRecovery, rd)
	}
	for _, k := range []string{KeyTransferRate, KeyPlantStill, KeyCrew} {
		if v := coef.Get(k); !(v > 0) {
			return p, fmt.Sprintf("setting %s = %s must be above zero", k, coef.Of(k).String())
		}
	}
	return p, ""
}
