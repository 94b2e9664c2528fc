package chrom

import (
	"fmt"
	"math"

	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/usage"
)

// Sentences a user reads about the separation; the physics is in
// analyse.go, the report in model.go, build.go and waste.go.

// separationNotes words the separation: which band elutes first, a ΔRf or
// Rf outside the range the loading models hold for, and how the two
// loading rules compare.
func (a analysis) separationNotes(u *usage.Usage, ch *scenario.Chromatography, coef source.Set) {
	note := u.Notef
	if a.first {
		note(usage.Info, "The product runs above the nearest impurity (Rf %.2f vs %.2f) and elutes first.", ch.ProductRf, ch.ImpurityRf)
	} else {
		note(usage.Info, "The product runs below the nearest impurity (Rf %.2f vs %.2f) and elutes after it.", ch.ProductRf, ch.ImpurityRf)
	}
	if a.dRf < 0.05 {
		note(usage.Warning, "ΔRf %.3f is below 0.05: one flash pass is unlikely to separate; look for a better eluent first.", a.dRf)
	} else if a.dRf < StillHardDeltaRf {
		note(usage.Warning, "ΔRf %.3f is below the 0.1 of Still's table: the table's loading is extrapolated.", a.dRf)
	}
	if ch.ProductRf < 0.15 || ch.ProductRf > 0.45 {
		note(usage.Warning, "Product Rf %.2f is outside about 0.15–0.45, the range the loading models are calibrated for (Still et al. 1978 aim at 0.35).", ch.ProductRf)
	}
	theory := math.Max(a.ratioTheory, a.ratioCeil)
	if f := theory / a.ratioTable; f > coef.Get(KeyRouteTolerance) || f < 1/coef.Get(KeyRouteTolerance) {
		note(usage.Warning, "The two loading rules differ by a factor %.1f: elution theory (bounded by the ceiling) %.0f : 1, Still's table %.0f : 1; the silica is sized by %s.", math.Max(f, 1/f), theory, a.ratioTable, a.why)
	} else {
		note(usage.Info, "Silica sized by %s; elution theory %.0f : 1, Still's table %.0f : 1.", a.why, theory, a.ratioTable)
	}
}

// infeasible says why no loading reaches the purity, and what ΔRf would.
func (a analysis) infeasible(coef source.Set) string {
	need := a.deltaRfNeeded(coef)
	why := fmt.Sprintf("no loading up to %.0f : 1 silica : crude gives a cut of %.4g %% purity holding at least %.0f %% of the product: ΔRf %.3f on a bed of about %.0f theoretical plates",
		coef.Get(KeyMaxRatio), a.target*100, coef.Get(KeyMinRecovery)*100, a.dRf, a.plates)
	if math.IsNaN(need) {
		return why + "; no eluent that keeps the product's Rf would do at this purity"
	}
	return why + fmt.Sprintf("; an eluent giving ΔRf ≥ %.3f would", need)
}
