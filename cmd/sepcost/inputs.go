package main

import (
	"bytes"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"

	"github.com/spf13/cobra"

	"sepcost/cmd/sepcost/internal/workbook"
	"sepcost/costing"
	"sepcost/costing/equipment"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/scale"
)

func loadScenario(path string) (*scenario.Scenario, error) {
	data, err := readInput(path, "scenario", scenario.MaxFileSize)
	if err != nil {
		return nil, err
	}
	return scenario.Load(bytes.NewReader(data), path)
}

// loadPrices reads --prices, or else prices.csv beside the scenario (the
// layout `sepcost init` writes); the report names the file used. A file
// named .xlsx is read from its sheet named by --prices-sheet (default: the
// first sheet), with the same checks as a CSV table.
func loadPrices(path, sheet, scenarioPath string) (*prices.Table, error) {
	if path == "" {
		guess := filepath.Join(filepath.Dir(scenarioPath), "prices.csv")
		if _, err := os.Stat(guess); err != nil {
			return nil, usageError{fmt.Errorf("no price table: give --prices FILE (`sepcost init` writes an example), or put prices.csv beside %s", scenarioPath)}
		}
		path = guess
	}
	xlsx := strings.EqualFold(filepath.Ext(path), ".xlsx")
	if sheet != "" && !xlsx {
		return nil, usageError{fmt.Errorf("--prices-sheet %q: only a price table in an .xlsx workbook has sheets, and %s is not one", sheet, path)}
	}
	if xlsx {
		data, err := readInput(path, "price workbook", workbook.MaxPriceBookBytes)
		if err != nil {
			return nil, err
		}
		return workbook.ReadPrices(bytes.NewReader(data), path, sheet)
	}
	data, err := readInput(path, "price table", prices.MaxFileSize)
	if err != nil {
		return nil, err
	}
	return prices.Read(bytes.NewReader(data), path)
}

// render lays a report out in the chosen format.
func render(r *scale.Report, f format) (*bytes.Buffer, error) {
	var buf bytes.Buffer
	err := renderTo(&buf, r, f)
	return &buf, err
}

// renderTo writes the report in a format to w.
func renderTo(w io.Writer, r *scale.Report, f format) error {
	return reportRenderers[f](w, r)
}

// deliver renders a report and writes it to the -o file (saying so on
// stderr) or to stdout.
func deliver(r *scale.Report, format format, out string, force bool, stdout, stderr io.Writer) error {
	if out == "" || out == "-" {
		buf, err := render(r, format)
		if err != nil {
			return err
		}
		return writeOut(buf, out, force, stdout, stderr)
	}
	// To a file: rendered straight into it (a sweep of thousands of masses
	// is never held whole in memory), placed only when rendering succeeds.
	if err := writeFileFrom(out, force, func(w io.Writer) error { return renderTo(w, r, format) }); err != nil {
		return err
	}
	fmt.Fprintf(stderr, "wrote %s\n", out)
	return nil
}

// loadEquipment reads --equipment, or else equipment.csv beside the
// scenario (the layout `sepcost init` writes), or else returns nil for the
// built-in table.
func loadEquipment(path, scenarioPath string) (*equipment.Table, error) {
	if path == "" {
		guess := filepath.Join(filepath.Dir(scenarioPath), "equipment.csv")
		if _, err := os.Stat(guess); err != nil {
			return nil, nil
		}
		path = guess
	}
	data, err := readInput(path, "equipment table", equipment.MaxFileSize)
	if err != nil {
		return nil, err
	}
	return equipment.Read(bytes.NewReader(data), path)
}

// preparePlan prepares a scenario's plan with the site's equipment table.
func preparePlan(sc *scenario.Scenario, equipmentPath, scenarioPath string) (*costing.Plan, error) {
	eq, err := loadEquipment(equipmentPath, scenarioPath)
	if err != nil {
		return nil, err
	}
	return costing.PrepareWith(sc, costing.Options{Equipment: eq})
}

// loadPlan reads a scenario, its price table (from the sheet pricesSheet of
// an .xlsx workbook, or a CSV) and the site's equipment table and prepares
// the plan.
func loadPlan(scenarioPath, pricesPath, pricesSheet, equipmentPath string) (*costing.Plan, *prices.Table, error) {
	sc, err := loadScenario(scenarioPath)
	if err != nil {
		return nil, nil, err
	}
	t, err := loadPrices(pricesPath, pricesSheet, scenarioPath)
	if err != nil {
		return nil, nil, err
	}
	plan, err := preparePlan(sc, equipmentPath, scenarioPath)
	if err != nil {
		return nil, nil, err
	}
	if t, err = plan.Prices(t); err != nil {
		return nil, nil, err
	}
	return plan, t, nil
}

// massesOr is the --mass list when given, else the scenario's masses.
func massesOr(m massList, sc *scenario.Scenario) []float64 {
	if m.set {
		return m.kg
	}
	return sc.MassesKg
}

// writeOut writes rendered output to the -o file (saying so on stderr) or
// to stdout.
func writeOut(buf *bytes.Buffer, out string, force bool, stdout, stderr io.Writer) error {
	if err := emit(buf, out, force, stdout); err != nil {
		return err
	}
	if out != "" && out != "-" {
		fmt.Fprintf(stderr, "wrote %s\n", out)
	}
	return nil
}

// addPricesSheetFlag adds --prices-sheet, the sheet of an .xlsx price table.
func addPricesSheetFlag(cmd *cobra.Command, sheet *string) {
	cmd.Flags().StringVar(sheet, "prices-sheet", "", "the sheet that holds the price table when --prices is an .xlsx workbook (default: its first sheet)")
}
