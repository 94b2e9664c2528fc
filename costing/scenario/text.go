package scenario

import (
	"strconv"
	"strings"

	"go.yaml.in/yaml/v3"

	"sepcost/costing/units"
)

// Text is one scalar from the YAML file, kept as written with its line so
// that it can be checked, with the field's name, after the whole file is read.
type Text struct {
	Value string
	Line  int
	Tag   string // YAML tag: "!!str", "!!int", "!!float", "!!bool", ...
	Set   bool   // present in the file
}

// UnmarshalYAML keeps the scalar as written.
func (t *Text) UnmarshalYAML(n *yaml.Node) error {
	if n.Kind != yaml.ScalarNode {
		return &yaml.TypeError{Errors: []string{"line " + strconv.Itoa(n.Line) + ": expected a single value here, not a list or a map"}}
	}
	*t = Text{Value: strings.TrimSpace(n.Value), Line: n.Line, Tag: n.ShortTag(), Set: true}
	return nil
}

// quantity reads a quantity of the given dimension; a bare number is refused
// with the list of accepted units.
func (c *collector) quantity(t Text, field string, dim units.Dim) (float64, bool) {
	if !t.Set {
		return 0, false
	}
	if t.Tag == "!!int" || t.Tag == "!!float" {
		c.add(t.Line, field, "%q has no unit; write %s", t.Value, units.Accepted(dim))
		return 0, false
	}
	v, err := units.ParseAs(t.Value, dim)
	if err != nil {
		c.add(t.Line, field, "%v%s", err, rangeHint(t.Value))
		return 0, false
	}
	return v, true
}

// fraction reads a plain number or a percentage in [lo, hi].
func (c *collector) fraction(t Text, field string, lo, hi float64, what string) (float64, bool) {
	if !t.Set {
		return 0, false
	}
	var v float64
	var err error
	if strings.HasSuffix(t.Value, "%") {
		v, err = units.ParseAs(t.Value, units.None)
	} else {
		v, err = strconv.ParseFloat(t.Value, 64)
	}
	if err != nil {
		c.add(t.Line, field, "%q is not a number; write %s%s", t.Value, what, rangeHint(t.Value))
		return 0, false
	}
	if !(v >= lo && v <= hi) {
		c.add(t.Line, field, "%s is outside the valid range; write %s", t.Value, what)
		return 0, false
	}
	return v, true
}

// required records a problem when a field is missing.
func (c *collector) required(t Text, line int, field, what string) bool {
	if t.Set && t.Value != "" {
		return true
	}
	c.add(line, field, "missing; write %s", what)
	return false
}
