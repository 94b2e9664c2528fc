package main

import (
	"bytes"
	"encoding/csv"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/xuri/excelize/v2"
)

// The waste export writes one row per stream; a scenario name that begins
// with "=" is written as text, not as a formula (OWASP "CSV Injection"
// guidance, from memory).
func TestWasteCSV(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	if _, _, err := runCLI(t, "init", dir); err != nil {
		t.Fatal(err)
	}
	sc := filepath.Join(dir, "scenario.yaml")
	y, _ := os.ReadFile(sc)
	y = bytes.Replace(y, []byte(`name: "Demo: aryl amide 12 (invented example)"`), []byte(`name: '=HYPERLINK("http://x")'`), 1)
	os.WriteFile(sc, y, 0o644)
	out, _, err := runCLI(t, "waste", sc, "--mass", "2kg", "--format", "csv")
	if err != nil {
		t.Fatal(err)
	}
	recs, err := csv.NewReader(strings.NewReader(out)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if len(recs) < 4 || recs[0][0] != "scenario" {
		t.Fatalf("waste csv: %v", recs)
	}
	for _, r := range recs[1:] {
		if !strings.HasPrefix(r[0], "'=") {
			t.Errorf("scenario cell %q is not guarded", r[0])
		}
		if r[1] != "2" {
			t.Errorf("mass %q", r[1])
		}
	}
	// xlsx and json variants are written and reopen.
	xl := filepath.Join(dir, "waste.xlsx")
	if _, _, err := runCLI(t, "waste", sc, "--mass", "2kg", "-o", xl); err != nil {
		t.Fatal(err)
	}
	f, err := excelize.OpenFile(xl)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	if v, _ := f.GetCellValue("Waste forecast", "I3"); !strings.Contains(v, "07 05") {
		t.Errorf("EU code cell = %q", v)
	}
	if js, _, err := runCLI(t, "waste", sc, "--format", "json"); err != nil || !strings.Contains(js, `"codes"`) {
		t.Errorf("json: %v", err)
	}
}

func TestPortfolioCommand(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	if _, _, err := runCLI(t, "init", dir); err != nil {
		t.Fatal(err)
	}
	plan := filepath.Join(dir, "plan.csv")
	os.WriteFile(plan, []byte("scenario,mass,runs,method\nscenario.yaml,20 g,3,\nscenario.yaml,2 kg,2,crystallization\n"), 0o644)
	out, _, err := runCLI(t, "portfolio", plan)
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(out, "crystallization (forced)") || !strings.Contains(out, "Waste by class") {
		t.Errorf("portfolio text:\n%s", out)
	}
	xl := filepath.Join(dir, "year.xlsx")
	if _, _, err := runCLI(t, "portfolio", plan, "-o", xl); err != nil {
		t.Fatal(err)
	}
	f, err := excelize.OpenFile(xl)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	if got := f.GetSheetList(); strings.Join(got, ",") != "Plan,By method,Waste,Solvents,Cautions" {
		t.Errorf("sheets %v", got)
	}
	if fm, _ := f.GetCellFormula("Plan", "H5"); fm != "SUM(H3:H4)" {
		t.Errorf("total formula %q", fm)
	}
	// Bad plans: missing file names the row; negative runs.
	os.WriteFile(plan, []byte("scenario,mass,runs\nscenario.yaml,20 g,3\nnope.yaml,1 g,1\n"), 0o644)
	if _, _, err := runCLI(t, "portfolio", plan); err == nil || !strings.Contains(err.Error(), "plan.csv:3: scenario") {
		t.Errorf("missing scenario: %v", err)
	}
	os.WriteFile(plan, []byte("scenario,mass,runs\nscenario.yaml,20 g,-3\n"), 0o644)
	if _, _, err := runCLI(t, "portfolio", plan); err == nil || !strings.Contains(err.Error(), "runs") {
		t.Errorf("negative runs: %v", err)
	}
}
