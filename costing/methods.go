package costing

import (
	"strings"

	"sepcost/costing/chrom"
	"sepcost/costing/cryst"
	"sepcost/costing/distil"
	"sepcost/costing/equipment"
	"sepcost/costing/green"
	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/usage"
)

// Entry is one purification method as the plan knows it. A new method is
// its own package under costing/ and one line in Registry.
type Entry struct {
	Name    string    // the model's name, also the key of its scenario section
	Package string    // the model's package, relative to the module (for the layering test)
	Use     green.Use // what its solvents do, for the published substitutions
	// Defaults lists the model's coefficients with their sources.
	Defaults func() []source.Coefficient
	// Calibrate, when set, adds coefficients fitted to the others; the
	// settings that name one of Calibrated apply after it.
	Calibrate  func(source.Set)
	Calibrated []string
	// Described reports whether the scenario has the method's section.
	Described func(*scenario.Scenario) bool
	// Build reads and checks the coefficients once and returns the model's
	// run at a crude mass, kg; choices, when not nil, lists the candidate
	// plans at a mass that only money can settle (the plan prices them and
	// keeps the cheapest per gram). Called only when Described. quiet asks
	// for usages made only to be costed (usage.Usage.Quiet): the same
	// quantities, without the words a model may leave out. lean, when
	// not nil, is choices made to be ranked by cost (Method.Lean).
	Build func(sc *scenario.Scenario, coef source.Set, eq *equipment.Table, quiet bool) (run func(float64) usage.Usage, choices func(float64) []usage.Usage, lean LeanChoices)
	// Solvents lists the solvent ids the method's section names.
	Solvents func(*scenario.Scenario) []string
	// Cautions lists the method's safety cautions for the scenario.
	Cautions func(*scenario.Scenario) []string
}

// Registry lists the methods in the order every report shows them.
var Registry = []Entry{
	{Name: chrom.Method, Package: "costing/chrom", Use: green.Chromatography,
		Defaults: chrom.Defaults, Calibrate: chrom.AddCalibration, Calibrated: []string{chrom.KeyQs},
		Described: func(sc *scenario.Scenario) bool { return sc.Chromatography != nil },
		Build:     chromMethod,
		Solvents:  func(sc *scenario.Scenario) []string { return sc.Chromatography.Solvents() },
		Cautions:  chrom.Cautions},
	{Name: cryst.Method, Package: "costing/cryst", Use: green.Crystallization,
		Defaults:  cryst.Defaults,
		Described: func(sc *scenario.Scenario) bool { return sc.Crystallization != nil },
		Build: func(sc *scenario.Scenario, coef source.Set, _ *equipment.Table, quiet bool) (func(float64) usage.Usage, func(float64) []usage.Usage, LeanChoices) {
			m := cryst.New(sc, coef)
			m.Quiet = quiet
			return m.Run, nil, nil
		},
		Solvents: func(sc *scenario.Scenario) []string { return sc.Crystallization.Solvents() },
		Cautions: cryst.Cautions},
	{Name: distil.Method, Package: "costing/distil", Use: green.Distillation,
		Defaults:  distil.Defaults,
		Described: func(sc *scenario.Scenario) bool { return sc.Distillation != nil },
		Build: func(sc *scenario.Scenario, coef source.Set, _ *equipment.Table, quiet bool) (func(float64) usage.Usage, func(float64) []usage.Usage, LeanChoices) {
			m := distil.New(sc, coef)
			m.Quiet = quiet
			return m.Run, nil, nil
		},
		Solvents: func(sc *scenario.Scenario) []string { return sc.Distillation.Solvents() },
		Cautions: distil.Cautions},
}

// EntryOf is the registry entry of the named method.
func EntryOf(name string) (Entry, bool) {
	for _, e := range Registry {
		if e.Name == name {
			return e, true
		}
	}
	return Entry{}, false
}

// sectionList words the registry's sections for a message:
// "a chromatography:, crystallization: or distillation: section".
func sectionList() string {
	words := make([]string, len(Registry))
	for i, e := range Registry {
		words[i] = e.Name + ":"
	}
	if len(words) == 1 {
		return "a " + words[0] + " section"
	}
	return "a " + strings.Join(words[:len(words)-1], ", ") + " or " + words[len(words)-1] + " section"
}
