package scale

import (
	"sepcost/costing"
	"sepcost/costing/equipment"
	"sepcost/costing/prices"
	"sepcost/costing/source"
	"sepcost/costing/usage"
)

// Input is one scenario field as the user wrote it and what the tool took it to mean.
type Input struct {
	Field   string // dotted path, e.g. "chromatography.product_rf"
	Written string // as written in the file
	Meaning string // as understood, e.g. "0.35 (column volumes to elute: 2.86)"
}

// Result is one method at one batch mass: physical usage and its ledger.
type Result = costing.Result

// Report is everything a writer needs: inputs, prices, results by mass and
// method, coefficients with their sources, and cautions.
type Report struct {
	Title        string  // scenario name
	ScenarioFile string  // path as given, or "built-in demo"
	PricesFile   string  // path as given, or "built-in example prices"
	Inputs       []Input // scenario echo for the Inputs sheet
	Prices       *prices.Table
	MassesKg     []float64 // crude masses, ascending
	Methods      []string  // method names in column order
	// Results holds every full result, Results[i][j] (mass i, method j),
	// when the report has at most Options.Hold masses (HeldMasses by
	// default); a longer sweep leaves it nil and keeps a compact Row per
	// mass and method instead. Writers read results through At, Walk,
	// Each, Rows, RowAt and CheapestAt, which serve both.
	Results      [][]Result
	Coefficients []source.Coefficient
	Cautions     []string     // safety cautions that apply to this scenario
	Notes        []usage.Note // scenario-wide notes and warnings
	Warnings     []Warning    // every warning and caution of the models, by method and text, with the masses
	TargetKg     float64      // the batch mass the decision is made at
	TargetWhy    string       // where TargetKg comes from, e.g. "--target", "the largest mass given with --mass"
	Decision     *Decision    // the recommendation at TargetKg
	Crossovers   []Crossover  // masses where the cheapest feasible method changes (sweeps only)
	Pairwise     []Crossover  // masses where two methods change places, cheapest or not (sweeps only; secondary)
	IsSweep      bool         // the masses are a log-spaced curve
	Uncertainty  *Uncertainty // Monte Carlo bands at TargetKg (nil when not sampled)
	Assumptions  []Assumption // defaults the user did not set that move a method's cost at TargetKg by more than AssumptionSwing
	Waste        []WasteRow   // every stream of every feasible result, classified
	Greenness    []SolventGreenness
	WasteSector  string           // the EU List of Waste chapter used for the codes
	Campaign     *CampaignReport  // the scenario's campaign (nil when it describes none)
	Budget       *Budget          // the request for the campaign's chosen method (nil without a campaign)
	Equipment    *equipment.Table // the site equipment table the models chose from

	rows []Row         // every mass and method, mass-major, when Results is nil
	plan *costing.Plan // recomputes the results not held (At, Walk)
}
