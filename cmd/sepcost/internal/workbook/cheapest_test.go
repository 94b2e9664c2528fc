package workbook

import (
	"strings"
	"testing"

	"github.com/xuri/excelize/v2"

	"sepcost/costing/units"
	"sepcost/scale"
)

// The Summary's "cheapest" mark compares cost per gram of purified
// product, as the decision does, never batch totals: a method that costs
// less for the batch but recovers less product is dearer per gram. The
// case is built so the two orders disagree (the shape of a user case at
// 85 g: chromatography 1,747.27 for the batch and 24.59 per gram against
// crystallization 1,717.63 and 26.31 per gram: the per-gram order is the
// one that counts).
func TestSummaryCheapestPerGram(t *testing.T) {
	t.Parallel()
	r := twoMethodReport()
	disagree := -1
	for i := range r.MassesKg {
		a, b := &r.Results[i][0], &r.Results[i][1]
		if !a.Usage.Feasible || !b.Usage.Feasible {
			continue
		}
		// Make the dearer batch recover enough more product to be cheaper
		// per gram.
		hi, lo := a, b
		if a.Ledger.Total.LessThan(b.Ledger.Total) {
			hi, lo = b, a
		}
		ratio := hi.Ledger.Total.InexactFloat64() / lo.Ledger.Total.InexactFloat64()
		hi.Usage.ProductOutKg = lo.Usage.ProductOutKg * ratio * 1.2
		hi.Usage.ProductInKg = hi.Usage.ProductOutKg
		disagree = i
		break
	}
	if disagree < 0 {
		t.Fatal("fixture has no mass with two feasible methods")
	}
	b, _ := render(t, r, Options{})
	f := open(t, b)
	rows, _ := f.GetRows(sheetSummary)
	var head []string
	for _, row := range rows {
		if len(row) > 0 && row[0] == "Batch mass" {
			head = row
		}
	}
	col := -1
	for c, h := range head {
		if h == "Cheapest per gram" {
			col = c
		}
	}
	if col < 0 {
		t.Fatal("no Cheapest column on the Summary")
	}
	marked := 0
	for k, row := range rows {
		if len(row) <= col || row[col] != "cheapest" {
			continue
		}
		marked++
		ref, _ := excelize.CoordinatesToCellName(col+1, k+1)
		fo, _ := f.GetCellFormula(sheetSummary, ref)
		if !strings.HasPrefix(fo, "IF(E") {
			t.Errorf("%s: the mark compares %q, not the cost-per-gram column E", ref, fo)
		}
		i := indexMass(r, row[0])
		j := indexMethod(r, row[1])
		if i < 0 || j < 0 {
			t.Fatalf("row %v names no known mass and method", row)
		}
		if want := r.CheapestAt(i); j != want {
			t.Errorf("%s marked cheapest, but per gram %s is", describe(r, i, j), r.Methods[want])
		}
	}
	if marked == 0 {
		t.Error("no method marked cheapest")
	}
	// At the mass built to disagree, the mark is on the dearer batch.
	i := disagree
	w := scale.Cheapest(r.Results[i])
	if r.Results[i][w].Ledger.Total.LessThan(r.Results[i][1-w].Ledger.Total) {
		t.Fatalf("the fixture does not make totals and cost per gram disagree at %s", units.FormatMass(r.MassesKg[i]))
	}
}

func indexMass(r *scale.Report, label string) int {
	for i, m := range r.MassesKg {
		if units.FormatMass(m) == label {
			return i
		}
	}
	return -1
}

func indexMethod(r *scale.Report, sheet string) int {
	for j, m := range r.Methods {
		if strings.EqualFold(m, sheet) || capitalize(m) == sheet {
			return j
		}
	}
	return -1
}

// Every warning of the models reaches the Summary: the liquid demo at
// 2 kg needs 30 runs of the largest column (a warning from
// usage.ManyRepeats runs on), and its distillation carries the caution on
// the pot's stability limit; "No notes." is not written over them.
func TestSummaryShowsEveryWarning(t *testing.T) {
	t.Parallel()
	r := liquidDemoReport(t)
	if len(r.Warnings) == 0 {
		t.Fatal("the liquid demo raises no warnings; the test needs one")
	}
	b, _ := render(t, r, Options{})
	d := dump(t, b)
	summary := onlySheets(d, []string{sheetSummary})
	for _, w := range r.Warnings {
		if !strings.Contains(summary, capitalize(w.Line())) {
			t.Errorf("the Summary lacks the warning %q", w.Line())
		}
	}
	if strings.Contains(summary, "No notes.") {
		t.Error(`the Summary says "No notes." though the models raised warnings`)
	}
}
