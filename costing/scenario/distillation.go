package scenario

import "go.yaml.in/yaml/v3"

// Placeholder until the distillation section is written: the section is
// refused with a clear message.

type rawDistil struct {
	Extra map[string]rawAny `yaml:",inline"`
}

// Distillation describes a redistillation of the product.
type Distillation struct{}

func (c *collector) distillation(r *rawDistil, s *Scenario, root *yaml.Node, echo func(string, Text, string)) *Distillation {
	c.add(keyLine(root, "distillation"), "distillation", "this version of sepcost does not model distillation yet")
	return nil
}
