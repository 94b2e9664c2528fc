package workbook

import (
	"bytes"
	"math"
	"strings"
	"testing"

	"sepcost/costing"
	"sepcost/costing/costingtest"
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

// demoSweepReport sweeps the demo from 1 g to 5 kg of crude (16 masses,
// more than get sheets of their own, so the Scale-up sheet prices each
// ledger line in quantity columns),
// across the example prices' bands for heptane (a 25 L can from 25 L, a
// 200 L drum from 200 L): the same ledger line is priced from a different
// price row at different masses, each band a quantity column of its own.
func demoSweepReport(t *testing.T) *scale.Report {
	t.Helper()
	plan, pt := costingtest.Plan(t, templates.Scenario, "built-in demo scenario")
	masses := make([]float64, 16)
	for i := range masses {
		masses[i] = 0.001 * math.Pow(5000, float64(i)/15)
	}
	r, err := scale.Sweep(plan, pt, masses)
	if err != nil {
		t.Fatal(err)
	}
	return r
}

// A sweep whose masses buy heptane in different bands writes each band as
// a quantity column of its own, named by the band, each priced from its
// own row (the workbook used to refuse it).
func TestSweepAcrossPriceBands(t *testing.T) {
	r := demoSweepReport(t)
	b, _ := render(t, r, Options{})
	f := open(t, b)
	rows, err := f.GetRows(sheetScaleUp)
	if err != nil {
		t.Fatal(err)
	}
	bands := 0
	for _, row := range rows {
		for _, c := range row {
			if strings.Contains(c, "n-heptane") && strings.Contains(c, "(price from ") {
				bands++
			}
		}
	}
	if bands == 0 {
		t.Error("no heptane column names a price band, though the sweep's purchases span the 25 L and 200 L bands")
	}
}
