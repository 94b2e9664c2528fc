package costing

import (
	"bytes"
	"testing"

	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/templates"
)

func demoPlan(b testing.TB) (*Plan, *prices.Table) {
	sc, err := scenario.Load(bytes.NewReader(templates.Scenario), "demo")
	if err != nil {
		b.Fatal(err)
	}
	t, err := prices.Read(bytes.NewReader(templates.Prices), "prices")
	if err != nil {
		b.Fatal(err)
	}
	p, err := Prepare(sc)
	if err != nil {
		b.Fatal(err)
	}
	return p, t
}

// BenchmarkModelAndLedger: one scenario at one mass through the
// chromatography model and the ledger.
func BenchmarkModelAndLedger(b *testing.B) {
	p, t := demoPlan(b)
	b.ReportAllocs()
	for b.Loop() {
		if _, err := p.RunOne(0, 0.02, t); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkPrepare includes the calibration fit against Still's table.
func BenchmarkPrepare(b *testing.B) {
	sc, err := scenario.Load(bytes.NewReader(templates.Scenario), "demo")
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Prepare(sc); err != nil {
			b.Fatal(err)
		}
	}
}
