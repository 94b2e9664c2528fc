package main

import (
	"bytes"
	"context"
	"encoding/json"
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func runCLI(t *testing.T, args ...string) (string, string, error) {
	t.Helper()
	var out, errOut bytes.Buffer
	err := run(context.Background(), args, &out, &errOut)
	return out.String(), errOut.String(), err
}

// Every command answers --help with its usage and exit code 0.
func TestHelpEveryCommand(t *testing.T) {
	t.Parallel()
	root := newRootCommand()
	names := []string{""}
	for _, c := range root.Commands() {
		names = append(names, c.Name())
	}
	for _, n := range names {
		args := []string{"--help"}
		if n != "" {
			args = []string{n, "--help"}
		}
		out, _, err := runCLI(t, args...)
		if err != nil || !strings.Contains(out, "Usage:") {
			t.Errorf("%s --help: err %v, output %q", n, err, out)
		}
	}
}

// Exit codes: 0 ok, 1 failure, 2 a mistake in the command line (the
// usual convention of command-line tools, e.g. GNU grep's manual, "Exit
// Status" — common practice).
func TestUsageErrorsExit2(t *testing.T) {
	t.Parallel()
	for _, args := range [][]string{
		{"estimate"},
		{"nosuchcommand"},
		{"estimate", "x.yaml", "--mass", "20"},
		{"estimate", "x.yaml", "--format", "pdf"},
		{"demo", "--bogus"},
		{"demo", "extra"},
		{"solvents", "extra"},
		{"init", "a", "b"},
	} {
		_, _, err := runCLI(t, args...)
		if exitCode(err) != 2 {
			t.Errorf("%v: exit %d (%v), want 2", args, exitCode(err), err)
		}
	}
}

// init writes both files, estimate reads them; outputs are never
// overwritten without --force, and a refused file is left untouched.
func TestInitEstimateAndOverwrite(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	out, _, err := runCLI(t, "init", filepath.Join(dir, "case"))
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(out, "scenario.yaml") {
		t.Errorf("init output %q", out)
	}
	if _, _, err := runCLI(t, "init", filepath.Join(dir, "case")); !errors.Is(err, ErrExists) {
		t.Errorf("second init: %v, want refusal", err)
	}
	sc := filepath.Join(dir, "case", "scenario.yaml")
	pr := filepath.Join(dir, "case", "prices.csv")

	out, _, err = runCLI(t, "estimate", sc, "--prices", pr, "--mass", "0.25g,20g,2kg", "--format", "json")
	if err != nil {
		t.Fatal(err)
	}
	var doc struct {
		Currency string
		Batches  []struct {
			CrudeKg float64 `json:"crude_kg"`
			Methods []struct {
				Method string
				Total  string
			}
		}
	}
	if err := json.Unmarshal([]byte(out), &doc); err != nil {
		t.Fatalf("json: %v\n%s", err, out)
	}
	if doc.Currency != "EUR" || len(doc.Batches) != 3 || doc.Batches[2].CrudeKg != 2 || doc.Batches[0].Methods[0].Method != "chromatography" {
		t.Errorf("json = %+v", doc)
	}

	target := filepath.Join(dir, "plan.json")
	if err := os.WriteFile(target, []byte("keep me"), 0o644); err != nil {
		t.Fatal(err)
	}
	_, _, err = runCLI(t, "estimate", sc, "--prices", pr, "-o", target)
	if !errors.Is(err, ErrExists) || exitCode(err) != 1 {
		t.Errorf("existing output: %v", err)
	}
	if b, _ := os.ReadFile(target); string(b) != "keep me" {
		t.Errorf("refused output was changed: %q", b)
	}
	if _, _, err := runCLI(t, "estimate", sc, "--prices", pr, "-o", target, "--force"); err != nil {
		t.Fatal(err)
	}
	if b, _ := os.ReadFile(target); !bytes.HasPrefix(b, []byte("{")) {
		t.Errorf("--force did not replace the file")
	}
	// No temporary files left behind.
	entries, _ := os.ReadDir(dir)
	for _, e := range entries {
		if strings.HasSuffix(e.Name(), ".tmp") {
			t.Errorf("left %s", e.Name())
		}
	}

	csvOut, _, err := runCLI(t, "estimate", sc, "--prices", pr, "--format", "csv")
	if err != nil || !strings.HasPrefix(csvOut, "crude_kg,method,group,item") {
		t.Errorf("csv: %v %q", err, csvOut[:min(80, len(csvOut))])
	}
	text, _, err := runCLI(t, "estimate", sc, "--prices", pr)
	if err != nil || !strings.Contains(text, "TOTAL") || !strings.Contains(text, "Cautions") {
		t.Errorf("text: %v", err)
	}
}

func TestCheck(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	if _, _, err := runCLI(t, "init", dir); err != nil {
		t.Fatal(err)
	}
	sc := filepath.Join(dir, "scenario.yaml")
	pr := filepath.Join(dir, "prices.csv")
	out, _, err := runCLI(t, "check", sc, "--prices", pr)
	if err != nil || !strings.Contains(out, "reads cleanly") {
		t.Fatalf("check good: %v\n%s", err, out)
	}
	// The starter scenario describes chromatography and crystallization,
	// not distillation: said once, not at every mass.
	if !strings.Contains(out, "methods described: chromatography, crystallization; not described: distillation") || strings.Contains(out, "not assessed") {
		t.Errorf("check names the described methods once:\n%s", out)
	}

	// Break both files: several problems, all listed, exit 1.
	y, _ := os.ReadFile(sc)
	y = bytes.Replace(y, []byte("product_rf: 0.30"), []byte("product_rf: 1.30"), 1)
	y = bytes.Replace(y, []byte(`masses: ["250 mg"`), []byte(`masses: [250`), 1)
	os.WriteFile(sc, y, 0o644)
	p, _ := os.ReadFile(pr)
	p = bytes.Replace(p, []byte("tlc plate,each,1.50,EUR"), []byte("tlc plate,each,1.50,USD"), 1)
	os.WriteFile(pr, p, 0o644)
	out, _, err = runCLI(t, "check", sc, "--prices", pr)
	if exitCode(err) != 1 {
		t.Fatalf("check bad: exit %d", exitCode(err))
	}
	for _, w := range []string{"chromatography.product_rf", "masses[0]", "has no unit", "currency", "USD"} {
		if !strings.Contains(out, w) {
			t.Errorf("check output lacks %q:\n%s", w, out)
		}
	}
}

// Missing prices are listed together, each with a line to add.
func TestMissingPrices(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	if _, _, err := runCLI(t, "init", dir); err != nil {
		t.Fatal(err)
	}
	pr := filepath.Join(dir, "prices.csv")
	p, _ := os.ReadFile(pr)
	var keep []string
	for _, line := range strings.Split(string(p), "\n") {
		if strings.HasPrefix(line, "silica gel,") || strings.HasPrefix(line, "chemist time,") {
			continue
		}
		keep = append(keep, line)
	}
	os.WriteFile(pr, []byte(strings.Join(keep, "\n")), 0o644)
	_, _, err := runCLI(t, "estimate", filepath.Join(dir, "scenario.yaml"), "--prices", pr)
	if err == nil || !strings.Contains(err.Error(), "silica gel") || !strings.Contains(err.Error(), "chemist time") {
		t.Errorf("missing prices error: %v", err)
	}
}

func TestMissingFiles(t *testing.T) {
	t.Parallel()
	_, _, err := runCLI(t, "estimate", "no/such/scenario.yaml", "--prices", "x.csv")
	if err == nil || !strings.Contains(err.Error(), "no/such/scenario.yaml") {
		t.Errorf("missing scenario: %v", err)
	}
}

func TestSolventsCommand(t *testing.T) {
	t.Parallel()
	out, _, err := runCLI(t, "solvents")
	if err != nil {
		t.Fatal(err)
	}
	for _, w := range []string{"ethyl acetate", "dichloromethane", "Sources", "from memory"} {
		if !strings.Contains(out, w) {
			t.Errorf("solvents output lacks %q", w)
		}
	}
}

// --format and the -o extension agree: a contradiction is a usage error,
// and the demo's default file name takes the format's extension, so JSON
// never lands in an .xlsx name.
func TestFormatAndExtensionAgree(t *testing.T) {
	for _, args := range [][]string{
		{"demo", "--format", "json", "-o", "x.xlsx"},
		{"estimate", "x.yaml", "--format", "xlsx", "-o", "x.json"},
		{"estimate", "x.yaml", "--format", "text", "-o", "x.csv"},
	} {
		if _, _, err := runCLI(t, args...); exitCode(err) != 2 || !strings.Contains(err.Error(), "agree") {
			t.Errorf("%v: exit %d (%v), want 2 naming the disagreement", args, exitCode(err), err)
		}
	}
	dir := t.TempDir()
	wd, _ := os.Getwd()
	if err := os.Chdir(dir); err != nil {
		t.Fatal(err)
	}
	defer os.Chdir(wd)
	if _, _, err := runCLI(t, "demo", "--format", "json"); err != nil {
		t.Fatal(err)
	}
	b, err := os.ReadFile(filepath.Join(dir, "sepcost-demo.json"))
	if err != nil || !json.Valid(b) {
		t.Fatalf("demo --format json: sepcost-demo.json %v (valid JSON: %v)", err, json.Valid(b))
	}
	if _, err := os.Stat(filepath.Join(dir, "sepcost-demo.xlsx")); err == nil {
		t.Error("demo --format json wrote sepcost-demo.xlsx")
	}
	out, _, err := runCLI(t, "demo", "--format", "text")
	if err != nil || !strings.Contains(out, "Recommendation at") {
		t.Errorf("demo --format text: %v; output starts %.80q", err, out)
	}
	if _, err := os.Stat(filepath.Join(dir, "sepcost-demo.xlsx")); err == nil {
		t.Error("demo --format text wrote sepcost-demo.xlsx")
	}
}

// --prices-sheet names a sheet of an .xlsx price table; given with a CSV
// table it is a usage error rather than silently ignored.
func TestPricesSheetNeedsWorkbook(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	if _, _, err := runCLI(t, "init", filepath.Join(dir, "case")); err != nil {
		t.Fatal(err)
	}
	sc := filepath.Join(dir, "case", "scenario.yaml")
	_, _, err := runCLI(t, "check", sc, "--prices-sheet", "Prices")
	if exitCode(err) != 2 || !strings.Contains(err.Error(), ".xlsx") {
		t.Errorf("exit %d (%v), want 2 saying the sheet needs an .xlsx table", exitCode(err), err)
	}
}
