package scenario

import "go.yaml.in/yaml/v3"

// Placeholder until the crystallization section is written: the section is
// refused with a clear message.

type rawCryst struct {
	Extra map[string]rawAny `yaml:",inline"`
}

// Crystallization describes a recrystallization of the product.
type Crystallization struct{}

func (c *collector) crystallization(r *rawCryst, s *Scenario, root *yaml.Node, echo func(string, Text, string)) *Crystallization {
	c.add(keyLine(root, "crystallization"), "crystallization", "this version of sepcost does not model crystallization yet")
	return nil
}
