package cryst

import "sepcost/costing/scenario"

// Cautions lists the safety cautions of a scenario's recrystallization
// (none without a crystallization section). They are the usual cautions of
// laboratory practice (National Research Council, "Prudent Practices in
// the Laboratory", 2011, chapters 4 and 6 — from memory) and defer to the
// site's own rules.
func Cautions(sc *scenario.Scenario) []string {
	if sc.Crystallization == nil {
		return nil
	}
	return []string{
		"Hot recrystallization: heat flammable solvents only in a bath or heating mantle, never over an open flame, to reflux only with a condenser fitted, and never in a closed vessel: a sealed flask or a reactor without a vent or rated pressure relief can burst as the solvent's vapour pressure rises.",
		"Jacketed reactors: keep within the vessel's rated pressure and temperature, check the relief device and the jacket fluid's limits, and cool under control; a crash-cool of a supersaturated solution can foul the jacket or entrain solids.",
		"Vacuum filtration: use heavy-walled, clamped filter flasks with a trap; vent slowly. Dry solvent-wet solids only in an oven or dryer rated for solvent vapour.",
	}
}
