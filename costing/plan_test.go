package costing

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"testing"

	"sepcost/costing/chrom"
	"sepcost/costing/scenario"
	"sepcost/costing/waste"
)

const base = `name: t
masses: ["1 g"]
crude: {purity: 0.8}
chromatography:
  tlc_eluent: {diethyl ether: 0.2, n-pentane: 0.8}
  product_rf: 0.3
  impurity_rf: 0.45
`

func load(t *testing.T, y string) *scenario.Scenario {
	t.Helper()
	sc, err := scenario.Load(strings.NewReader(y), "s.yaml")
	if err != nil {
		t.Fatal(err)
	}
	return sc
}

// Settings override the defaults and are recorded as such; unknown keys
// and wrong dimensions are refused with file, line and the valid choices.
func TestSettings(t *testing.T) {
	t.Parallel()
	p, err := Prepare(load(t, base+"settings:\n  chromatography.bed_density: \"0.45 g/mL\"\n"))
	if err != nil {
		t.Fatal(err)
	}
	if c := p.Coef.Of(chrom.KeyBedDensity); c.SI != 450 || c.Mark != "scenario" {
		t.Errorf("bed density = %+v", c)
	}
	_, err = Prepare(load(t, base+"settings:\n  chromatography.bed_hieght_max: \"12 cm\"\n  chromatography.bed_density: \"12 cm\"\n"))
	var ps scenario.Problems
	if !errors.As(err, &ps) || len(ps) != 2 {
		t.Fatalf("want 2 problems, got %v", err)
	}
	msg := err.Error()
	for _, w := range []string{"s.yaml:9: settings.chromatography.bed_hieght_max", `did you mean "chromatography.bed_height_max"?`, "valid settings of chromatography:", "s.yaml:10:", "is length", "density"} {
		if !strings.Contains(msg, w) {
			t.Errorf("error lacks %q:\n%s", w, msg)
		}
	}
}

// A scenario without any method section is refused.
func TestNoMethod(t *testing.T) {
	t.Parallel()
	_, err := Prepare(load(t, "name: t\nmasses: [\"1 g\"]\ncrude: {purity: 0.8}\n"))
	// The message lists every section a scenario may have.
	if err == nil || !strings.Contains(err.Error(), "add a chromatography:, crystallization: or distillation: section") {
		t.Errorf("err = %v", err)
	}
}

// Cautions follow the solvents: diethyl ether is flammable (flash point
// −45 °C, National Academies 2016, Appendix D, confirmed) and forms
// peroxides; every scenario gets the EHS deferral.
func TestCautions(t *testing.T) {
	t.Parallel()
	p, err := Prepare(load(t, base))
	if err != nil {
		t.Fatal(err)
	}
	all := strings.Join(p.Cautions(), "\n")
	for _, w := range []string{"diethyl ether (flash point -45 °C)", "Peroxide-forming solvents (ethers, secondary alcohols and others): diethyl ether", "Silica gel dust", "licensed environmental-health-and-safety"} {
		if !strings.Contains(all, w) {
			t.Errorf("cautions lack %q:\n%s", w, all)
		}
	}
	if strings.Contains(all, "Halogenated") {
		t.Errorf("no halogenated solvent here")
	}
}

// A setting written with a range takes its midpoint (each limit is checked
// against the coefficient's physical range as a single value would be); a
// range reaching below zero is refused (no negative mass, time or share).
func TestSettingRange(t *testing.T) {
	t.Parallel()
	p, err := Prepare(load(t, base+"settings:\n  chromatography.bed_density: \"0.40–0.50 g/mL\"\n"))
	if err != nil {
		t.Fatal(err)
	}
	if c := p.Coef.Of(chrom.KeyBedDensity); math.Abs(c.SI-450) > 1e-9 {
		t.Errorf("bed density = %g kg/m³, want the midpoint 450", c.SI)
	}
	// silica_retention_loss accepts 0 to 0.5 (its physical range): 0.4 ± 0.2
	// reaches 0.6.
	_, err = Prepare(load(t, base+"settings:\n  chromatography.silica_retention_loss: \"0.4 ± 0.2\"\n"))
	if err == nil || !strings.Contains(err.Error(), "reaches outside the range") || !strings.Contains(err.Error(), "0 to 0.5") {
		t.Errorf("err = %v", err)
	}
	_, err = Prepare(load(t, base+"settings:\n  chromatography.silica_retention_loss: \"0.03 ± 0.05\"\n"))
	if err == nil || !strings.Contains(err.Error(), "reaches below zero") || !strings.Contains(err.Error(), "settings.chromatography.silica_retention_loss") {
		t.Errorf("err = %v", err)
	}
}

// The waste sector is read as written and resolved here: an unknown one is
// a problem naming the file, the line and the field, with the valid words
// (EU List of Waste, Commission Decision 2000/532/EC, chapters 07 05 and
// 07 07).
func TestWasteSector(t *testing.T) {
	t.Parallel()
	const yaml = "name: t\nmasses: [\"1 g\"]\ncrude: {purity: 0.8}\nwaste_sector: %s\ncrystallization:\n  solvent: ethanol\n  product:\n    solubility: {\"0 C\": \"15 g/L\", \"75 C\": \"160 g/L\"}\n  impurity: {purge_factor: 0.9}\n  dissolve_at: \"75 C\"\n  isolate_at: \"0 C\"\n  target_purity: 0.99\n"
	p, err := Prepare(load(t, fmt.Sprintf(yaml, "fine chemicals")))
	if err != nil {
		t.Fatal(err)
	}
	if p.WasteSector != waste.FineChemicals || p.WithCoefficients(p.Coef).WasteSector != waste.FineChemicals {
		t.Errorf("sector %v, want fine chemicals (07 07)", p.WasteSector)
	}
	_, err = Prepare(load(t, fmt.Sprintf(yaml, "dyes")))
	var pr *scenario.Problem
	if !errors.As(err, &pr) || pr.Line != 4 || pr.Field != "waste_sector" || !strings.Contains(pr.Msg, "fine chemicals") {
		t.Errorf("err = %v", err)
	}
}
