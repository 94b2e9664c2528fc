package scale

import "testing"

// Money as a planning figure: thousands separated by commas as
// English-language accounts write them (common practice, no source), whole
// units from 100 up, three significant figures below (hand-rounded cases).
func TestMoney(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		v    float64
		want string
	}{{1900, "1,900"}, {1234567.4, "1,234,567"}, {999.5, "1,000"}, {23.64, "23.6"}, {0.1034, "0.103"}, {-2500, "-2,500"}, {100, "100"}} {
		if got := Money(c.v); got != c.want {
			t.Errorf("Money(%g) = %q, want %q", c.v, got, c.want)
		}
	}
}

// The sentences a chemist acts on name the input, where it is written and
// the money; a crossover interval is given in masses a chemist reads.
func TestAdviceWords(t *testing.T) {
	t.Parallel()
	u := &Uncertainty{Currency: "EUR", EVPI: 2500, ProductG: 1640, TargetKg: 2,
		Inputs: []Uncertain{{Name: "solubility of the impurity at 0 °C", Field: "crystallization.impurity.solubility[0 C]", Kind: KindMeasured},
			{Name: "price of silica gel", Field: "price: silica gel", Kind: KindPrice}},
		Worth: []Worth{{Input: 0, Value: 1900}, {Input: 1, Value: 12}}}
	lines := u.AdviceLines(3)
	want := []string{
		"What to measure next, for one batch of 2 kg of crude (1,640 g of product): knowing every uncertain input before choosing is worth up to 2,500 EUR on average.",
		"Measure the solubility of the impurity at 0 °C again (crystallization.impurity.solubility[0 C]): worth up to 1,900 EUR in this decision.",
		"Get a firm quote for silica gel (price: silica gel): worth up to 12 EUR in this decision.",
	}
	if len(lines) != len(want) {
		t.Fatalf("%d lines: %q", len(lines), lines)
	}
	for i := range want {
		if lines[i] != want[i] {
			t.Errorf("line %d:\n got %q\nwant %q", i, lines[i], want[i])
		}
	}
	c := CrossBand{A: "chromatography", B: "crystallization", P10: 0.0118, P50: 0.0283, P90: 0.0486, Share: 1}
	if got := c.Words(); got != "chromatography and crystallization change places in 100 % of the draws: chromatography is cheaper below; the crossover lies between 11.8 g and 48.6 g of crude in eight draws of ten (P10–P90; median 28.3 g)" {
		t.Errorf("crossing words: %q", got)
	}
}

// A choice that only several inputs together could change: the whole value
// is given, and no single measurement is advised.
func TestAdviceNoSingleInput(t *testing.T) {
	t.Parallel()
	u := &Uncertainty{Currency: "EUR", EVPI: 23.6, ProductG: 16.4, TargetKg: 0.02}
	lines := u.AdviceLines(3)
	if len(lines) != 2 || lines[1] != "No single input known alone would change the choice: only several moving together would, so no one measurement is worth making for it." {
		t.Errorf("%q", lines)
	}
	u.EVPI = 0
	if lines := u.AdviceLines(3); len(lines) != 1 {
		t.Errorf("%q", lines)
	}
}
