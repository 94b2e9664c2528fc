package main

import (
	"fmt"
	"sort"
	"strings"

	"github.com/spf13/cobra"

	"sepcost/costing/quote"
	"sepcost/costing/scenario"
	"sepcost/costing/units"
)

// massList is a pflag.Value for "--mass 250mg,20g,2kg": masses with units.
type massList struct {
	kg  []float64
	set bool
}

func (m *massList) String() string {
	parts := make([]string, len(m.kg))
	for i, v := range m.kg {
		parts[i] = fmt.Sprintf("%g kg", v)
	}
	return strings.Join(parts, ",")
}

func (m *massList) Set(s string) error {
	m.kg = nil
	for _, part := range strings.Split(s, ",") {
		part = strings.TrimSpace(part)
		if part == "" {
			continue
		}
		v, err := units.ParseAs(part, units.Mass)
		if err != nil {
			return fmt.Errorf("--mass %s: %v", quote.Excerpt(part), err)
		}
		if v <= 0 {
			return fmt.Errorf("--mass %s: a batch mass must be above zero; it must lie %s", quote.Excerpt(part), scenario.BatchRange)
		}
		if err := scenario.CheckBatchMass(v); err != nil {
			return fmt.Errorf("--mass %s: %v", quote.Excerpt(part), err)
		}
		if len(m.kg) == scenario.MaxMasses {
			return fmt.Errorf("--mass: more than %d masses; give at most %d", scenario.MaxMasses, scenario.MaxMasses)
		}
		m.kg = append(m.kg, v)
	}
	if len(m.kg) == 0 {
		return fmt.Errorf(`--mass: give at least one mass with its unit, e.g. "250mg,20g,2kg"`)
	}
	sort.Float64s(m.kg)
	m.set = true
	return nil
}

func (m *massList) Type() string { return "masses" }

// addTargetFlag adds --target: the crude mass the decision is made at.
func addTargetFlag(cmd *cobra.Command, target *string) {
	cmd.Flags().StringVar(target, "target", "", `crude mass to decide at, with its unit, e.g. "2kg" (default: the largest mass asked for on the command line, else the scenario's target_mass, else its largest mass)`)
}

// targetMass settles the decision's mass: --target when given, else the
// largest of the masses asked for on the command line (largest, with the
// flag that gave it), else 0 (the scenario's). It returns the mass in kg
// and where it comes from, in words.
func targetMass(target string, largest float64, from string) (float64, string, error) {
	if target != "" {
		v, err := units.ParseAs(target, units.Mass)
		if err != nil {
			return 0, "", usageError{fmt.Errorf("--target %s: %v", quote.Excerpt(target), err)}
		}
		if err := scenario.CheckBatchMass(v); err != nil {
			return 0, "", usageError{fmt.Errorf("--target %s: %v", quote.Excerpt(target), err)}
		}
		return v, "--target", nil
	}
	if largest > 0 {
		return largest, "the largest mass given with " + from, nil
	}
	return 0, "", nil
}
