// Package costingtest holds what tests in several packages share to set up
// a real plan: a scenario read from YAML, the example price table and the
// prepared plan. It is imported by tests only.
package costingtest

import (
	"bytes"
	"testing"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/templates"
)

// Plan reads a scenario from yaml (named name in messages), the built-in
// example prices, and prepares the plan; any error fails the test.
func Plan(t testing.TB, yaml []byte, name string) (*costing.Plan, *prices.Table) {
	t.Helper()
	sc, err := scenario.Load(bytes.NewReader(yaml), name)
	if err != nil {
		t.Fatal(err)
	}
	pt, err := prices.Read(bytes.NewReader(templates.Prices), "prices.csv")
	if err != nil {
		t.Fatal(err)
	}
	p, err := costing.Prepare(sc)
	if err != nil {
		t.Fatal(err)
	}
	return p, pt
}
