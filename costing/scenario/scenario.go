// Package scenario reads and checks a scenario file: what the separation
// looks like (TLC Rf values and eluent, crude purity), the batch masses, the
// model settings the user overrides and any solvents the user adds. It
// turns every quantity into SI and reports every problem it finds at once,
// each with the file, line, field and what would be valid.
package scenario

import (
	"sepcost/costing/solvent"
	"sepcost/costing/units"
)

// Part is one solvent of a mixture with its volume fraction.
type Part struct {
	Solvent  string  // canonical solvent id
	Fraction float64 // volume fraction, parts sum to 1
}

// Mix is a solvent mixture by volume, e.g. 30 % ethyl acetate in n-heptane.
type Mix []Part

// Step is one step of a step gradient: an eluent run for a number of column volumes.
type Step struct {
	Eluent        Mix
	ColumnVolumes float64
}

// Loading is how the crude goes onto the column.
type Loading string

// Loading modes.
const (
	LiquidLoading Loading = "liquid" // dissolved in a little solvent and pipetted on
	DryLoading    Loading = "dry"    // adsorbed on silica from solution, evaporated, poured on
)

// Rule names which silica-loading route sizes the column.
type Rule string

// Loading rules.
const (
	RuleTheory Rule = "theory"      // preparative elution theory, calibrated to Still et al. 1978
	RuleTable  Rule = "still-table" // the empirical sample-size table of Still et al. 1978
)

// Chromatography is the flash-chromatography description.
type Chromatography struct {
	TLCEluent      Mix     // eluent the Rf values were measured in; the column runs in it after any gradient steps
	ProductRf      float64 // Rf of the product in TLCEluent
	ImpurityRf     float64 // Rf of the nearest-running impurity in TLCEluent
	Gradient       []Step  // optional steps run before the TLC eluent
	Loading        Loading
	LoadingSolvent string    // solvent id used to dissolve the crude for loading
	RecoverSolvent float64   // fraction of the spent eluent recovered for reuse, 0–1
	LoadingRule    Rule      // which route sizes the silica
	ColumnsM       []float64 // available column inner diameters, m, ascending
	TargetPurity   float64   // purity asked of the pooled product fractions; 0: the model's default
	RerunMixed     bool      // mixed fractions are pooled and run once more (else set aside)
}

// Solvents lists the ids of the solvents the section names, in order:
// the TLC eluent's, the gradient steps', the loading solvent.
func (ch *Chromatography) Solvents() []string {
	if ch == nil {
		return nil
	}
	var ids []string
	for _, part := range ch.TLCEluent {
		ids = append(ids, part.Solvent)
	}
	for _, st := range ch.Gradient {
		for _, part := range st.Eluent {
			ids = append(ids, part.Solvent)
		}
	}
	if ch.LoadingSolvent != "" {
		ids = append(ids, ch.LoadingSolvent)
	}
	return ids
}

// Written is a value as the user wrote it, with its line, for a later
// layer to resolve and to name in a problem.
type Written struct {
	Text string
	Line int
}

// Setting is one model default the user overrides.
type Setting struct {
	Key     string
	Value   units.Quantity // the nominal value (the midpoint of a written range)
	Range   units.Range    // Half > 0 when written with a range ("12 ± 2 cm"), SI
	Written string
	Line    int
}

// Scenario is a checked scenario with every quantity in SI.
type Scenario struct {
	File            string
	Name            string
	Product         string
	MassesKg        []float64 // crude batch masses, ascending
	TargetKg        float64   // the batch mass the decision is made at
	Purity          float64   // mass fraction of product in the crude
	NearestImpurity float64   // mass fraction of the crude that is the nearest-running impurity
	NearestGiven    bool      // crude.nearest_impurity was written (else NearestImpurity is 1 − Purity)
	Chromatography  *Chromatography
	Crystallization *Crystallization // nil when the scenario has no crystallization section
	Distillation    *Distillation    // nil when the scenario has no distillation section
	Campaign        *Campaign        // nil when the scenario has no campaign section
	Settings        []Setting
	Solvents        *solvent.Book
	Notes           string
	WasteSector     Written    // the EU List of Waste chapter for the waste codes, as written (empty: the default)
	Inputs          []Input    // every field as written and as understood
	Measured        []Measured // measured values with the limits they may lie between
}

// Input is one field as written and as understood, for the Inputs sheet.
type Input struct {
	Field   string
	Written string
	Meaning string
}
