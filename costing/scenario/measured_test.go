package scenario

import (
	"math"
	"strings"
	"testing"
)

const rangedYAML = `name: ranged
masses: ["1 g", "1 kg"]
crude:
  purity: "85 ± 3 %"
chromatography:
  tlc_eluent: {n-heptane: 0.7, ethyl acetate: 0.3}
  product_rf: "0.27–0.33"
  impurity_rf: 0.45
crystallization:
  solvent: ethanol
  product:
    solubility: {"0 C": "12-18 g/L", "75 C": "160 g/L"}
  impurity:
    purge_factor: 0.8
  dissolve_at: "75 C"
  isolate_at: "0 C"
  target_purity: 0.99
  screening_time: "6 to 10 h"
settings:
  chromatography.bed_height: "12 ± 2 cm"
`

// Values written with a range keep the chemist's limits; values written
// alone get the default spread of their kind; the nominal value is what
// the models see.
func TestMeasuredRanges(t *testing.T) {
	t.Parallel()
	s, err := Load(strings.NewReader(rangedYAML), "r.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if s.Purity != 0.85 || math.Abs(s.Chromatography.ProductRf-0.30) > 1e-12 || s.Chromatography.ImpurityRf != 0.45 {
		t.Errorf("nominal values: %g %g %g", s.Purity, s.Chromatography.ProductRf, s.Chromatography.ImpurityRf)
	}
	got := map[string]Measured{}
	for _, m := range s.Measured {
		got[m.Field] = m
	}
	for _, c := range []struct {
		field     string
		nom, half float64
		def       bool
	}{
		{"crude.purity", 0.85, 0.03, false},
		{"chromatography.product_rf", 0.30, 0.03, false},
		// Written alone: Spreads[KindRf], 0.03.
		{"chromatography.impurity_rf", 0.45, 0.03, true},
		// 12–18 g/L is 15 ± 3 kg/m³.
		{"crystallization.product.solubility[0 C]", 15, 3, false},
		// Written alone: ±25 % of 160 g/L.
		{"crystallization.product.solubility[75 C]", 160, 40, true},
		// 6 to 10 h is 8 ± 2 h.
		{"crystallization.screening_time", 8 * 3600, 2 * 3600, false},
	} {
		m, ok := got[c.field]
		if !ok {
			t.Errorf("%s not recorded as measured: %v", c.field, s.Measured)
			continue
		}
		if math.Abs(m.Range.Nominal-c.nom) > 1e-9 || math.Abs(m.Range.Half-c.half) > 1e-9 || m.Default != c.def {
			t.Errorf("%s: %+v, want %g ± %g default %v", c.field, m.Range, c.nom, c.half, c.def)
		}
	}
	if len(s.Settings) != 1 || math.Abs(s.Settings[0].Range.Half-0.02) > 1e-12 || math.Abs(s.Settings[0].Value.SI-0.12) > 1e-12 {
		t.Errorf("setting range: %+v", s.Settings)
	}
}

// A drawn copy changes only the copy: the purity's followers move with it,
// a solubility point refits the van 't Hoff line, the original is intact.
func TestScenarioWith(t *testing.T) {
	t.Parallel()
	s, err := Load(strings.NewReader(rangedYAML), "r.yaml")
	if err != nil {
		t.Fatal(err)
	}
	vals := s.Nominal()
	for i, m := range s.Measured {
		switch m.Field {
		case "crude.purity":
			vals[i] = 0.80
		case "chromatography.product_rf":
			vals[i] = 0.25
		case "crystallization.product.solubility[0 C]":
			vals[i] = 12
		}
	}
	d := s.With(vals)
	if d.Purity != 0.80 || math.Abs(d.NearestImpurity-0.20) > 1e-12 || d.Chromatography.ProductRf != 0.25 ||
		math.Abs(d.Crystallization.ImpurityFraction-0.20) > 1e-12 {
		t.Errorf("drawn: purity %g nearest %g Rf %g impurity %g", d.Purity, d.NearestImpurity, d.Chromatography.ProductRf, d.Crystallization.ImpurityFraction)
	}
	// ln S through (273.15 K, 12) and (348.15 K, 160): at 273.15 K the line
	// returns 12 g/L exactly (two points, exact fit).
	if got := math.Exp(d.Crystallization.Product.Curve.Fit.A + d.Crystallization.Product.Curve.Fit.B/273.15); math.Abs(got-12) > 1e-9 {
		t.Errorf("refit gives %g at 0 °C", got)
	}
	if s.Purity != 0.85 || math.Abs(s.Chromatography.ProductRf-0.30) > 1e-12 || math.Abs(s.NearestImpurity-0.15) > 1e-12 {
		t.Errorf("original changed: %g %g %g", s.Purity, s.Chromatography.ProductRf, s.NearestImpurity)
	}
	if got := math.Exp(s.Crystallization.Product.Curve.Fit.A + s.Crystallization.Product.Curve.Fit.B/273.15); math.Abs(got-15) > 1e-9 {
		t.Errorf("original curve changed: %g at 0 °C", got)
	}
}

// Ranges that cannot hold are refused with file, line and field; a range
// on a field that is not a measured value says which fields take one.
func TestMeasuredRangesRefused(t *testing.T) {
	t.Parallel()
	for _, c := range []struct{ from, to, want string }{
		{`purity: "85 ± 3 %"`, `purity: "0.9–1.1"`, "crude.purity"},
		{`product_rf: "0.27–0.33"`, `product_rf: "0.3 ± 0.4"`, "chromatography.product_rf"},
		{`"12-18 g/L"`, `"18-12 g/L"`, "lower limit first"},
		{`target_purity: 0.99`, `target_purity: "0.98–0.99"`, "ranges are read only for measured values"},
	} {
		y := strings.Replace(rangedYAML, c.from, c.to, 1)
		_, err := Load(strings.NewReader(y), "r.yaml")
		if err == nil || !strings.Contains(err.Error(), c.want) || !strings.Contains(err.Error(), "r.yaml:") {
			t.Errorf("%s: %v", c.to, err)
		}
	}
}

const distilYAML = `name: liquid
masses: ["1 g", "1 kg"]
crude:
  purity: 0.88
distillation:
  product:
    name: ester 4
    boiling_point: "225–231 C"
    molar_mass: "186.3 g/mol"
  impurity:
    name: diester
    boiling_point: "262 C"
    molar_mass: "230.3 g/mol"
  target_purity: "98 %"
  max_pot_temperature: "150 C"
  best_vacuum: "2 mbar"
`

// A distillation compound's boiling point, given without Antoine
// constants, is a measured value: "225–231 C" is 228 ± 3 °C (501.15 K,
// 0 °C = 273.15 K, ITS-90 convention); "262 C" alone gets the default ±3 K;
// a drawn copy carries the drawn boiling point.
func TestBoilingPointRange(t *testing.T) {
	t.Parallel()
	s, err := Load(strings.NewReader(distilYAML), "d.yaml")
	if err != nil {
		t.Fatal(err)
	}
	got := map[string]Measured{}
	for _, m := range s.Measured {
		got[m.Field] = m
	}
	p, i := got["distillation.product.boiling_point"], got["distillation.impurity.boiling_point"]
	if math.Abs(p.Range.Nominal-501.15) > 1e-9 || math.Abs(p.Range.Half-3) > 1e-9 || p.Default {
		t.Errorf("product: %+v", p)
	}
	if math.Abs(i.Range.Nominal-535.15) > 1e-9 || i.Range.Half != Spreads[KindBoiling].Half || !i.Default {
		t.Errorf("impurity: %+v", i)
	}
	if s.Distillation.Product.Data.BoilingPoint.V != p.Range.Nominal {
		t.Errorf("the model sees %g K", s.Distillation.Product.Data.BoilingPoint.V)
	}
	vals := s.Nominal()
	for k, m := range s.Measured {
		if m.Field == "distillation.product.boiling_point" {
			vals[k] = 500
		}
	}
	d := s.With(vals)
	if d.Distillation.Product.Data.BoilingPoint.V != 500 || s.Distillation.Product.Data.BoilingPoint.V != p.Range.Nominal {
		t.Errorf("drawn %g, original %g", d.Distillation.Product.Data.BoilingPoint.V, s.Distillation.Product.Data.BoilingPoint.V)
	}
	bad := strings.Replace(distilYAML, `boiling_point: "225–231 C"`, `boiling_point: "225–231 C"
    antoine: {a: 4.2, b: 1800, c: -80, t_min: "150 C", t_max: "250 C"}`, 1)
	if _, err := Load(strings.NewReader(bad), "d.yaml"); err == nil || !strings.Contains(err.Error(), "only when no Antoine constants are given") {
		t.Errorf("a range beside Antoine constants: %v", err)
	}
}

// The Inputs list says how each measured value's uncertainty is read:
// "0.27–0.33" is used as 0.3 and drawn from 0.27 to 0.33; 0.45 written
// alone is drawn over the default ±0.03 (Spreads).
func TestMeasuredOnInputs(t *testing.T) {
	t.Parallel()
	s, err := Load(strings.NewReader(rangedYAML), "r.yaml")
	if err != nil {
		t.Fatal(err)
	}
	want := map[string]string{
		"chromatography.product_rf":  "the models use 0.3, the uncertainty draws anywhere from 0.27 to 0.33 (as written)",
		"chromatography.impurity_rf": "the uncertainty draws anywhere from 0.42 to 0.48, the usual spread of Rf read from one TLC plate",
	}
	for _, in := range s.Inputs {
		if w, ok := want[in.Field]; ok {
			if !strings.HasSuffix(in.Meaning, w) {
				t.Errorf("%s: %q", in.Field, in.Meaning)
			}
			delete(want, in.Field)
		}
	}
	if len(want) > 0 {
		t.Errorf("not on the Inputs list: %v", want)
	}
}
