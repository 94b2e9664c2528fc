package main

import (
	"encoding/json"
	"path/filepath"
	"testing"
)

// The decision is made at --target; without it at the largest mass asked
// for on the command line (--mass for estimate, --to for sweep), else at
// the scenario's target_mass. The starter scenario's target_mass is 2 kg
// (templates/scenario.yaml).
func TestTargetMass(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	if _, _, err := runCLI(t, "init", filepath.Join(dir, "case")); err != nil {
		t.Fatal(err)
	}
	sc := filepath.Join(dir, "case", "scenario.yaml")
	for _, c := range []struct {
		args []string
		kg   float64
		from string
	}{
		{[]string{"estimate", sc, "--mass", "85g,2kg", "--target", "85g"}, 0.085, "--target"},
		{[]string{"estimate", sc, "--mass", "85g,500g"}, 0.5, "the largest mass given with --mass"},
		{[]string{"estimate", sc}, 2, "target_mass in the scenario"},
		{[]string{"sweep", sc, "--from", "1g", "--to", "300g", "--points", "3"}, 0.3, "the largest mass given with --to"},
		{[]string{"sweep", sc, "--points", "3", "--target", "40 g"}, 0.04, "--target"},
		{[]string{"sweep", sc, "--points", "3"}, 2, "target_mass in the scenario"},
	} {
		args := append(c.args, "--format", "json", "--draws", "0")
		out, _, err := runCLI(t, args...)
		if err != nil {
			t.Fatalf("%v: %v", c.args, err)
		}
		var got struct {
			Decision struct {
				TargetKg float64 `json:"target_kg"`
				From     string  `json:"target_from"`
			} `json:"decision"`
		}
		if err := json.Unmarshal([]byte(out), &got); err != nil {
			t.Fatalf("%v: %v", c.args, err)
		}
		if d := got.Decision; d.TargetKg != c.kg || d.From != c.from {
			t.Errorf("%v: decision at %g kg (%s), want %g kg (%s)", c.args, d.TargetKg, d.From, c.kg, c.from)
		}
	}
	for _, bad := range []string{"0 g", "5 L", "lots"} {
		_, _, err := runCLI(t, "estimate", sc, "--target", bad)
		if exitCode(err) != 2 {
			t.Errorf("--target %q: exit %d (%v), want 2", bad, exitCode(err), err)
		}
	}
}
