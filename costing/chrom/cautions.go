package chrom

import "sepcost/costing/scenario"

// Cautions lists the safety cautions of a scenario's flash chromatography
// (none without a chromatography section). They are the usual cautions of
// laboratory practice (National Research Council, "Prudent Practices in
// the Laboratory", 2011, chapters 4 and 6 — from memory) and defer to the
// site's own rules.
func Cautions(sc *scenario.Scenario) []string {
	if sc.Chromatography == nil {
		return nil
	}
	return []string{
		"Silica gel dust: weigh and pour dry silica in a fume hood or ventilated enclosure and wear respiratory protection as your site requires; slurry packing keeps dust down.",
		"Pressurised glass columns: use only columns and adaptors rated for the pressure, keep pressure low (flash columns run at a few tenths of a bar), fit a relief or use a regulated supply, and shield large glass columns.",
		"Rotary evaporation works glass under vacuum: inspect flasks for cracks and stars, use a shield or netting on large flasks, and vent slowly.",
	}
}
