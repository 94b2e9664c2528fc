package workbook

import (
	"bytes"
	"testing"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/scale"
	"sepcost/templates"
)

// demoReport runs the built-in demo scenario with the example prices
// through the real models and ledger, as `sepcost demo` does.
func demoReport(t *testing.T) *scale.Report {
	return demoReportOf(t, templates.Scenario, "built-in demo scenario")
}

// liquidDemoReport runs the second demo, a liquid product with a distillation.
func liquidDemoReport(t *testing.T) *scale.Report {
	return demoReportOf(t, templates.Liquid, "built-in liquid demo scenario")
}

func demoReportOf(t testing.TB, yaml []byte, name string) *scale.Report {
	t.Helper()
	return demoReportEdited(t, yaml, name, func(*scenario.Scenario) {})
}

// batchDemoReport is the demo without its campaign: the decision is made
// on one batch at the target mass, so the Summary's recommendation is made
// of formulas on the batch table.
func batchDemoReport(t *testing.T) *scale.Report {
	return demoReportEdited(t, templates.Scenario, "built-in demo scenario", func(sc *scenario.Scenario) { sc.Campaign = nil })
}

// demoReportEdited runs a demo scenario after edit has changed it.
func demoReportEdited(t testing.TB, yaml []byte, name string, edit func(*scenario.Scenario)) *scale.Report {
	t.Helper()
	sc, err := scenario.Load(bytes.NewReader(yaml), name)
	if err != nil {
		t.Fatal(err)
	}
	edit(sc)
	pt, err := prices.Read(bytes.NewReader(templates.Prices), "built-in example prices")
	if err != nil {
		t.Fatal(err)
	}
	plan, err := costing.Prepare(sc)
	if err != nil {
		t.Fatal(err)
	}
	r, err := scale.Estimate(plan, pt, sc.MassesKg)
	if err != nil {
		t.Fatal(err)
	}
	return r
}
