package scenario

import (
	"errors"
	"math"
	"os"
	"strings"
	"testing"
)

const good = `name: test case
masses: ["250 mg", "20 g", "2 kg"]
crude:
  purity: 0.85
  nearest_impurity: "10 %"
chromatography:
  tlc_eluent: {n-heptane: 0.7, EtOAc: 0.3}
  product_rf: 0.30
  impurity_rf: 0.42
  gradient:
    - eluent: {hexanes: 1}
      column_volumes: 2
  loading: dry
settings:
  chromatography.calibration_bed_height: "12 cm"
`

func TestLoadGood(t *testing.T) {
	t.Parallel()
	s, err := Load(strings.NewReader(good), "good.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if len(s.MassesKg) != 3 || s.MassesKg[0] != 250e-6 || s.MassesKg[2] != 2 {
		t.Errorf("masses = %v", s.MassesKg)
	}
	if s.TargetKg != 2 {
		t.Errorf("target defaults to the largest mass, got %g", s.TargetKg)
	}
	if math.Abs(s.NearestImpurity-0.10) > 1e-12 {
		t.Errorf("nearest impurity = %g", s.NearestImpurity)
	}
	ch := s.Chromatography
	// Aliases resolve to canonical ids (EtOAc → ethyl acetate, hexanes → n-hexane).
	if ch.TLCEluent[0].Solvent != "n-heptane" || ch.TLCEluent[1].Solvent != "ethyl acetate" {
		t.Errorf("eluent = %v", ch.TLCEluent)
	}
	if ch.Gradient[0].Eluent[0].Solvent != "n-hexane" || ch.Gradient[0].ColumnVolumes != 2 {
		t.Errorf("gradient = %+v", ch.Gradient)
	}
	if ch.Loading != DryLoading || ch.LoadingRule != RuleTheory {
		t.Errorf("loading %q rule %q", ch.Loading, ch.LoadingRule)
	}
	if len(s.Settings) != 1 || math.Abs(s.Settings[0].Value.SI-0.12) > 1e-12 {
		t.Errorf("settings = %+v", s.Settings)
	}
}

// The starter scenario shipped in templates reads cleanly.
func TestTemplateScenario(t *testing.T) {
	t.Parallel()
	data, err := os.ReadFile("../../templates/scenario.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if _, err := Load(strings.NewReader(string(data)), "scenario.yaml"); err != nil {
		t.Fatal(err)
	}
}

// Bad input: each case must name the file, the line, the field and what is valid.
func TestLoadBad(t *testing.T) {
	t.Parallel()
	replace := func(old, new string) string {
		if !strings.Contains(good, old) {
			t.Fatalf("test fixture lacks %q", old)
		}
		return strings.Replace(good, old, new, 1)
	}
	cases := []struct {
		name, yaml string
		want       []string // substrings of the error
	}{
		{"rf above 1", replace("product_rf: 0.30", "product_rf: 1.2"), []string{"bad.yaml:8:", "chromatography.product_rf", "above 0 and below 1"}},
		{"rf zero", replace("product_rf: 0.30", "product_rf: 0"), []string{"bad.yaml:8:", "outside (0, 1)"}},
		{"equal rf", replace("impurity_rf: 0.42", "impurity_rf: 0.30"), []string{"bad.yaml:9:", "chromatography.impurity_rf", "equals product_rf"}},
		{"zero mass", replace(`"250 mg"`, `"0 g"`), []string{"bad.yaml:2:", "masses[0]", "above zero"}},
		{"negative mass", replace(`"250 mg"`, `"-5 g"`), []string{"masses[0]", "above zero"}},
		{"bare number mass", replace(`"250 mg"`, `250`), []string{"masses[0]", "has no unit", `"20 g"`}},
		{"wrong unit", replace(`"250 mg"`, `"250 mL"`), []string{"masses[0]", "is volume, not mass"}},
		{"unparseable unit", replace(`"20 g"`, `"20 gram"`), []string{"masses[1]", "unknown unit"}},
		{"unknown solvent", replace("n-heptane: 0.7", "unobtainium: 0.7"), []string{"bad.yaml:7:", "tlc_eluent.unobtainium", "unknown solvent", "known solvents:"}},
		{"fractions sum", replace("n-heptane: 0.7", "n-heptane: 0.6"), []string{"chromatography.tlc_eluent", "sum to 0.9", "add up to 1"}},
		{"purity above 1", replace("purity: 0.85", "purity: 1.5"), []string{"crude.purity", "below 1"}},
		{"loading mode", replace("loading: dry", "loading: sideways"), []string{"chromatography.loading", "liquid or dry"}},
		{"mixed fractions", replace("  loading: dry", "  loading: dry\n  mixed_fractions: keep"), []string{"chromatography.mixed_fractions", `"keep"`, "set aside", "rerun"}},
		{"chromatography purity", replace("  loading: dry", "  loading: dry\n  target_purity: 1.5"), []string{"chromatography.target_purity", "0.5 to 0.99999"}},
		{"unknown field", replace("name: test case", "name: test case\ncolour: blue"), []string{"bad.yaml:2:", "colour", "not a known field", "masses"}},
		{"unknown nested field", replace("  loading: dry", "  loading: dry\n  speed: fast"), []string{"chromatography.speed", "not a known field"}},
		{"missing rf", replace("  product_rf: 0.30\n", ""), []string{"chromatography.product_rf", "missing"}},
		{"not yaml", "name: [unclosed", []string{"bad.yaml", "not valid YAML"}},
		{"list for scalar", replace("purity: 0.85", "purity: [1, 2]"), []string{"bad.yaml:4", "single value"}},
		{"gradient cv", replace("column_volumes: 2", "column_volumes: -1"), []string{"gradient[0].column_volumes", "above 0"}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			expectProblems(t, c.yaml, "bad.yaml", c.want)
		})
	}
}

// Every problem is reported at once.
func TestAllProblemsAtOnce(t *testing.T) {
	t.Parallel()
	y := strings.NewReplacer("product_rf: 0.30", "product_rf: 2", `"250 mg"`, `"0 g"`, "purity: 0.85", "purity: 7").Replace(good)
	_, err := Load(strings.NewReader(y), "bad.yaml")
	var ps Problems
	if !errors.As(err, &ps) || len(ps) < 3 {
		t.Fatalf("want at least 3 problems, got %v", err)
	}
}

// FuzzLoad: Load never panics; a refusal unwraps to ErrInvalid and quotes
// no more than a short excerpt of any line; an accepted scenario has its
// batch masses within BatchRange. Seeds in testdata/fuzz/FuzzLoad.
func FuzzLoad(f *testing.F) {
	f.Add(good)
	f.Add("name: x\nmasses: [1 g]\n")
	f.Add(good + "---\nname: y\n")
	f.Add(strings.Replace(good, `"250 mg"`, `"1e30 kg"`, 1))
	f.Fuzz(func(t *testing.T, s string) {
		sc, err := Load(strings.NewReader(s), "fuzz.yaml")
		if err != nil {
			if sc != nil {
				t.Fatal("scenario and error together")
			}
			if !errors.Is(err, ErrInvalid) {
				t.Fatalf("error does not unwrap to ErrInvalid: %v", err)
			}
			return
		}
		if sc == nil {
			t.Fatal("nil scenario without error")
		}
		for _, kg := range sc.MassesKg {
			if CheckBatchMass(kg) != nil {
				t.Fatalf("mass %g kg accepted", kg)
			}
		}
	})
}

// expectProblems loads a bad scenario and checks that the error unwraps to
// ErrInvalid and names everything in want (file, line, field, what is valid).
func expectProblems(t *testing.T, yaml, file string, want []string) {
	t.Helper()
	_, err := Load(strings.NewReader(yaml), file)
	if err == nil {
		t.Fatal("accepted")
	}
	if !errors.Is(err, ErrInvalid) {
		t.Errorf("error does not unwrap to ErrInvalid: %v", err)
	}
	for _, w := range want {
		if !strings.Contains(err.Error(), w) {
			t.Errorf("error %q lacks %q", err, w)
		}
	}
}
