package main

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// init writes the starter equipment table; estimate reads it from beside
// the scenario or from --equipment, refuses a bad one with file, line and
// column, and refuses rates in another currency than the prices.
func TestEquipmentTable(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	if _, _, err := runCLI(t, "init", dir); err != nil {
		t.Fatal(err)
	}
	sc, pr := filepath.Join(dir, "scenario.yaml"), filepath.Join(dir, "prices.csv")
	if _, err := os.Stat(filepath.Join(dir, "equipment.csv")); err != nil {
		t.Fatalf("init wrote no equipment.csv: %v", err)
	}
	bad := filepath.Join(dir, "bad.csv")
	os.WriteFile(bad, []byte("item,kind,size,throughput,max_load,hourly_rate,ownership,price,currency,service_life,source\nx,column,12 kg,,,,owned,,,,\n"), 0o644)
	_, _, err := runCLI(t, "estimate", sc, "--prices", pr, "--equipment", bad, "--draws", "0")
	if err == nil || !strings.Contains(err.Error(), "bad.csv:2: size:") {
		t.Errorf("bad equipment table: %v", err)
	}
	usd := filepath.Join(dir, "usd.csv")
	os.WriteFile(usd, []byte("item,kind,size,throughput,max_load,hourly_rate,ownership,price,currency,service_life,source\nc,column,40 mm,,,10,owned,,USD,,\ne,evaporator,,2 L/h,,,owned,,,,\n"), 0o644)
	_, _, err = runCLI(t, "estimate", sc, "--prices", pr, "--equipment", usd, "--draws", "0")
	if err == nil || !strings.Contains(err.Error(), "usd.csv:2: currency") {
		t.Errorf("currency mismatch: %v", err)
	}
	// A site with one 20 mm column: 2 kg needs many runs on it.
	small := filepath.Join(dir, "small.csv")
	os.WriteFile(small, []byte("item,kind,size,throughput,max_load,hourly_rate,ownership,price,currency,service_life,source\nonly column,column,20 mm,,,,owned,,,,\nbench evaporator,evaporator,,2 L/h,,,owned,,,,\n"), 0o644)
	out, _, err := runCLI(t, "estimate", sc, "--prices", pr, "--equipment", small, "--mass", "2kg", "--draws", "0", "--format", "json")
	if err != nil {
		t.Fatal(err)
	}
	var doc struct {
		Batches []struct {
			Methods []struct {
				Method  string
				Figures []struct {
					Key   string
					Value float64
				}
			}
		}
	}
	if err := json.Unmarshal([]byte(out), &doc); err != nil {
		t.Fatal(err)
	}
	fig := map[string]float64{}
	for _, f := range doc.Batches[0].Methods[0].Figures {
		fig[f.Key] = f.Value
	}
	// The 20 mm column holds at most 0.5 g/mL · π (2 cm)²/4 · 20 cm = 31 g
	// of silica: 2 kg at 20 : 1 or more takes over a thousand runs.
	if fig["column_diameter"] != 20 || fig["runs"] < 1000 {
		t.Errorf("2 kg on the one 20 mm column: %v mm, %v runs", fig["column_diameter"], fig["runs"])
	}
}
