package costing

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// Every registry entry is complete, its package exists, and its
// coefficients carry its name as their key prefix (the project's
// convention: "<method>.<name>").
func TestRegistry(t *testing.T) {
	t.Parallel()
	seen := map[string]bool{}
	for _, e := range Registry {
		if e.Name == "" || seen[e.Name] || e.Defaults == nil || e.Described == nil || e.Build == nil || e.Solvents == nil || e.Cautions == nil || e.Use == 0 {
			t.Errorf("registry entry %q is incomplete or repeated", e.Name)
		}
		seen[e.Name] = true
		if _, err := os.Stat(filepath.Join("..", filepath.FromSlash(e.Package))); err != nil {
			t.Errorf("%s: package %s: %v", e.Name, e.Package, err)
		}
		for _, c := range e.Defaults() {
			if !strings.HasPrefix(c.Key, e.Name+".") && !strings.HasPrefix(c.Key, "general.") {
				t.Errorf("%s: coefficient %q is not keyed %s.<name>", e.Name, c.Key, e.Name)
			}
		}
	}
}

// The demo describes chromatography and crystallization, not distillation:
// the plan keeps all three in registry order, the third not assessed.
func TestPlanFollowsRegistry(t *testing.T) {
	t.Parallel()
	p, prices := demoPlan(t)
	if len(p.Methods) != len(Registry) {
		t.Fatalf("%d methods, registry has %d", len(p.Methods), len(Registry))
	}
	for j, m := range p.Methods {
		if m.Name != Registry[j].Name || m.Use != Registry[j].Use {
			t.Errorf("method %d is %s, registry says %s", j, m.Name, Registry[j].Name)
		}
	}
	r, err := p.RunOne(2, 0.01, prices)
	if err != nil {
		t.Fatal(err)
	}
	if r.Status() != StatusNotAssessed {
		t.Errorf("distillation in the solid demo: %s, want not assessed", r.Status())
	}
}
