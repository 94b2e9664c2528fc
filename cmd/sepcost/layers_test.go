package main

import (
	"go/parser"
	"go/token"
	"io/fs"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"sepcost/costing"
)

// Imports run one way: cmd → writers → scale → costing (ledger) → models.
// This test reads the import lines of every non-test Go file and fails when
// a lower package starts to depend on a higher one (DEVELOPERS.md, "Architecture and data flow").
func TestLayering(t *testing.T) {
	t.Parallel()
	root := filepath.Join("..", "..")
	const mod = "sepcost/"
	// The method models come from the registry; beside them, the
	// model-level packages they share.
	models := []string{"costing/solubility", "costing/waste", "costing/green"}
	for _, e := range costing.Registry {
		models = append(models, e.Package)
	}
	type rule struct {
		pkg    func(string) bool
		banned func(string) bool
		why    string
	}
	has := func(prefix string) func(string) bool {
		return func(p string) bool { return p == prefix || strings.HasPrefix(p, prefix+"/") }
	}
	isModel := func(p string) bool {
		for _, m := range models {
			if p == m {
				return true
			}
		}
		return false
	}
	any := func(fs ...func(string) bool) func(string) bool {
		return func(p string) bool {
			for _, f := range fs {
				if f(p) {
					return true
				}
			}
			return false
		}
	}
	excelize := has("github.com/xuri/excelize/v2")
	cobra := has("github.com/spf13/cobra")
	decimal := has("github.com/shopspring/decimal")
	rules := []rule{
		{any(has("costing"), has("scale")), any(has(mod+"cmd"), cobra, excelize), "costing and scale never import commands, cobra or excelize"},
		{has("costing"), has(mod + "scale"), "costing never imports scale"},
		{isModel, any(decimal, excelize, cobra, func(p string) bool { return p == "os" }, has(mod+"costing/ledger"), has(mod+"costing/prices")), "models compute physics only: no money, files or prices"},
		{any(has("costing/units"), has("costing/source"), has("costing/usage")), func(p string) bool {
			return strings.HasPrefix(p, mod) && p != mod+"costing/units"
		}, "the base packages import only costing/units"},
		{func(p string) bool { return p != "cmd/sepcost/internal/workbook" }, excelize, "only the workbook writer imports excelize"},
		{has("costing/scenario"), func(p string) bool {
			return strings.HasPrefix(p, mod) && (isModel(strings.TrimPrefix(p, mod)) && p != mod+"costing/solubility" || p == mod+"costing/waste")
		}, "the scenario reader imports no model and not the waste classifier (solubility curves are shared data)"},
	}
	err := filepath.WalkDir(root, func(path string, d fs.DirEntry, err error) error {
		if err != nil {
			return err
		}
		if d.IsDir() && (d.Name() == "testdata" || strings.HasPrefix(d.Name(), ".")) && path != root {
			return filepath.SkipDir
		}
		if d.IsDir() || !strings.HasSuffix(path, ".go") || strings.HasSuffix(path, "_test.go") {
			return nil
		}
		rel, _ := filepath.Rel(root, filepath.Dir(path))
		pkg := filepath.ToSlash(rel)
		f, err := parser.ParseFile(token.NewFileSet(), path, nil, parser.ImportsOnly)
		if err != nil {
			return err
		}
		for _, imp := range f.Imports {
			ip, _ := strconv.Unquote(imp.Path.Value)
			for _, r := range rules {
				if r.pkg(pkg) && r.banned(ip) {
					t.Errorf("%s imports %s: %s", path, ip, r.why)
				}
			}
		}
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
}
