package main

import (
	"encoding/csv"
	"path/filepath"
	"strings"
	"testing"
)

// Bad sweep input is a usage error (exit 2) with a clear message.
func TestSweepBadInput(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	if _, _, err := runCLI(t, "init", dir); err != nil {
		t.Fatal(err)
	}
	sc := filepath.Join(dir, "scenario.yaml")
	cases := []struct {
		args []string
		want string
	}{
		{[]string{"--from", "10kg", "--to", "1kg"}, "must be below"},
		{[]string{"--from", "1kg", "--to", "1kg"}, "must be below"},
		{[]string{"--points", "1"}, "at least 2"},
		{[]string{"--points", "20000"}, "at most 10000"},
		{[]string{"--from", "100"}, "has no unit"},
		{[]string{"--to", "5 L"}, "is volume, not mass"},
		{[]string{"--draws", "-1"}, "--draws"},
	}
	for _, c := range cases {
		_, _, err := runCLI(t, append([]string{"sweep", sc}, c.args...)...)
		if err == nil || exitCode(err) != 2 || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%v: %v (exit %d), want %q", c.args, err, exitCode(err), c.want)
		}
	}
}

// The sweep CSV has one row per mass and method.
func TestSweepCSV(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	if _, _, err := runCLI(t, "init", dir); err != nil {
		t.Fatal(err)
	}
	out, _, err := runCLI(t, "sweep", filepath.Join(dir, "scenario.yaml"), "--points", "5", "--draws", "0", "--format", "csv")
	if err != nil {
		t.Fatal(err)
	}
	recs, err := csv.NewReader(strings.NewReader(out)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if len(recs) != 1+5*3 || recs[0][0] != "crude_kg" || recs[0][6] != "cost_per_g_product" {
		t.Errorf("sweep csv: %d rows, header %v", len(recs), recs[0])
	}
}
