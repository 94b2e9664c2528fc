package scenario

import (
	"fmt"
	"math"
	"strconv"

	"go.yaml.in/yaml/v3"

	"sepcost/costing/units"
)

// Campaign is what a budget request asks for: either an amount of purified
// product or a number of batches, each of BatchKg of crude, worked under the
// site's shifts. Exactly one of ProductKg and Batches is set.
type Campaign struct {
	ProductKg    float64 // purified product to make, kg (0 when Batches is given)
	Batches      int     // batches to run (0 when ProductKg is given)
	BatchKg      float64 // crude per batch, kg (default: the target mass)
	BatchGiven   bool    // batch_mass was written; else BatchKg follows the mass the decision is made at
	ShiftS       float64 // length of one shift, s (default 8 h)
	ShiftsPerDay int     // shifts worked per working day (default 1)
	Line         int     // line of the campaign section
}

// Campaign defaults: one shift of eight hours a working day (common
// practice, no source: a normal laboratory day).
const (
	DefaultShiftS       = 8 * 3600.0
	DefaultShiftsPerDay = 1
	// MaxBatches bounds a campaign: a million batches is beyond any plan.
	MaxBatches = 1000000
)

type rawCampaign struct {
	Product      Text              `yaml:"product"`
	Batches      Text              `yaml:"batches"`
	BatchMass    Text              `yaml:"batch_mass"`
	ShiftLength  Text              `yaml:"shift_length"`
	ShiftsPerDay Text              `yaml:"shifts_per_day"`
	Extra        map[string]rawAny `yaml:",inline"`
}

// campaign checks the campaign section.
func (c *collector) campaign(r *rawCampaign, s *Scenario, root *yaml.Node, echo func(string, Text, string)) *Campaign {
	const sec = "campaign"
	c.unknown(r.Extra, sec, rawCampaign{})
	line := keyLine(root, sec)
	cp := &Campaign{BatchKg: s.TargetKg, ShiftS: DefaultShiftS, ShiftsPerDay: DefaultShiftsPerDay, Line: line}
	ok := true
	switch {
	case r.Product.Set && r.Batches.Set:
		c.add(r.Batches.Line, sec+".batches", "give either product (the purified product to make) or batches (how many batches to run), not both")
		ok = false
	case r.Product.Set:
		if v, good := c.quantity(r.Product, sec+".product", units.Mass); good {
			if !(v > 0) {
				c.add(r.Product.Line, sec+".product", "%q must be above zero", r.Product.Value)
				ok = false
			}
			cp.ProductKg = v
			echo(sec+".product", r.Product, units.FormatMass(v)+" of purified product to make")
		} else {
			ok = false
		}
	case r.Batches.Set:
		n, err := strconv.Atoi(r.Batches.Value)
		if err != nil || n < 1 || n > MaxBatches {
			c.add(r.Batches.Line, sec+".batches", "%q: write how many batches to run, a whole number from 1 to %d", r.Batches.Value, MaxBatches)
			ok = false
		} else {
			cp.Batches = n
			echo(sec+".batches", r.Batches, fmt.Sprintf("%d batches", n))
		}
	default:
		c.add(line, sec, `write product (the purified product to make, e.g. "5 kg") or batches (how many batches, e.g. 10)`)
		ok = false
	}
	if r.BatchMass.Set {
		if v, good := c.quantity(r.BatchMass, sec+".batch_mass", units.Mass); good && v > 0 {
			cp.BatchKg, cp.BatchGiven = v, true
			echo(sec+".batch_mass", r.BatchMass, units.FormatMass(v)+" of crude per batch")
		} else {
			if good {
				c.add(r.BatchMass.Line, sec+".batch_mass", "%q must be above zero", r.BatchMass.Value)
			}
			ok = false
		}
	} else if s.TargetKg > 0 {
		s.Inputs = append(s.Inputs, Input{Field: sec + ".batch_mass", Written: "(not given)", Meaning: "the mass the decision is made at (target_mass, " + units.FormatMass(s.TargetKg) + ", unless --target says otherwise) of crude per batch"})
	}
	if r.ShiftLength.Set {
		if v, good := c.quantity(r.ShiftLength, sec+".shift_length", units.Time); good && v > 0 && v <= 24*3600 {
			cp.ShiftS = v
			echo(sec+".shift_length", r.ShiftLength, fmt.Sprintf("%.3g h per shift", v/3600))
		} else {
			if good {
				c.add(r.ShiftLength.Line, sec+".shift_length", `%q: write the length of one shift, above zero and at most 24 h, e.g. "8 h"`, r.ShiftLength.Value)
			}
			ok = false
		}
	}
	if r.ShiftsPerDay.Set {
		n, err := strconv.Atoi(r.ShiftsPerDay.Value)
		if err != nil || n < 1 || n > 3 {
			c.add(r.ShiftsPerDay.Line, sec+".shifts_per_day", "%q: write 1, 2 or 3 shifts a working day", r.ShiftsPerDay.Value)
			ok = false
		} else {
			cp.ShiftsPerDay = n
			echo(sec+".shifts_per_day", r.ShiftsPerDay, fmt.Sprintf("%d shifts a working day", n))
		}
	}
	if cp.ShiftS*float64(cp.ShiftsPerDay) > 24*3600*(1+1e-9) {
		c.add(line, sec, "%d shifts of %.3g h exceed 24 h a day; shorten the shifts or work fewer", cp.ShiftsPerDay, cp.ShiftS/3600)
		ok = false
	}
	if !ok || math.IsNaN(cp.BatchKg) {
		return nil
	}
	return cp
}
