package distil

import (
	"fmt"
	"sort"
	"strings"

	"sepcost/costing/scenario"
	"sepcost/costing/solvent"
)

// Cautions lists the safety cautions that apply to a scenario's
// distillation (none without a distillation section). They are the usual
// cautions of laboratory practice (e.g. National Research Council, Prudent
// Practices in the Laboratory, 2011, ch. 6 — from memory) and always defer
// to the site's own rules.
func Cautions(sc *scenario.Scenario) []string {
	d := sc.Distillation
	if d == nil {
		return nil
	}
	var out []string
	if d.BestVacuumPa < solvent.StandardPressure {
		out = append(out,
			"Vacuum glassware can implode: inspect every flask, column and trap for cracks, scratches and star fractures before use; use only round-bottomed vessels rated for vacuum (never flat-bottomed flasks); work behind a safety shield or a lowered sash; tape or net large flasks and Dewar vessels; let the pot cool before venting, and vent slowly.",
			"Cold traps: use dry ice or a cryocooler, or liquid nitrogen only on a closed, evacuated system — liquid nitrogen on a trap open to air condenses liquid oxygen, which can explode with organic condensate.")
	}
	out = append(out,
		"Bumping: stir the pot throughout (a magnetic stirrer, or a fine capillary air or nitrogen bleed). Boiling chips do not work under vacuum, and a chip added to a hot liquid can set off violent boiling. Heat with a controlled mantle or bath, never an open flame.",
		"Never distil to dryness: stop with residue left in the pot (the model keeps at least a few per cent of the charge). Overheated residues can decompose violently, and peroxides and other unstable by-products concentrate in them.",
		fmt.Sprintf("Thermal stability: before heating the compound, measure its decomposition onset and energy (DSC screening; ARC or other adiabatic calorimetry before larger batches) and set max_pot_temperature (now %.0f °C) with your site's safety margin below the onset. The still runs the pot up to that limit, and hold time at temperature grows with batch size.", d.MaxPotK-273.15))
	var perox []string
	for _, c := range []scenario.Compound{d.Product, d.Impurity} {
		if c.Data.PeroxideFormer {
			perox = append(perox, c.Name)
		}
	}
	if rs, ok := sc.Solvents.Find(d.RinseSolvent); ok && rs.PeroxideFormer {
		perox = append(perox, rs.ID)
	}
	if len(perox) > 0 {
		sort.Strings(perox)
		out = append(out, "Peroxide-forming compounds (ethers, secondary alcohols and others): "+strings.Join(perox, ", ")+". Test for peroxides before distilling and remove them first; distillation concentrates peroxides in the pot, so never take it to a small residue.")
	}
	return out
}
