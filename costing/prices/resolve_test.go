package prices

import (
	"strings"
	"testing"
)

// solventNames knows two solvents: n-heptane (alias heptane), density
// 0.684 g/mL at 20 °C (CRC Handbook of Chemistry and Physics, from memory),
// and ethyl acetate (alias EtOAc), 0.902 g/mL (same, from memory).
func solventNames(name string) (string, float64, bool) {
	switch strings.ToLower(strings.TrimSpace(name)) {
	case "heptane", "n-heptane":
		return "n-heptane", 684, true
	case "etoac", "ethyl acetate":
		return "ethyl acetate", 902, true
	}
	return "", 0, false
}

func TestResolveAliasesAndDensity(t *testing.T) {
	t.Parallel()
	csv := "item,unit,price,currency,category,source,date\n" +
		"heptane,L,12.00,EUR,solvent,,\n" +
		"EtOAc,kg,11.00,EUR,solvent,,\n" +
		"silica gel,kg,30,EUR,consumable,,\n"
	tab, err := Read(strings.NewReader(csv), "p.csv")
	if err != nil {
		t.Fatal(err)
	}
	r, err := tab.Resolve(solventNames)
	if err != nil {
		t.Fatal(err)
	}
	if k, ok := r.Find("n-heptane"); !ok || r.Items[k].Label() != "heptane (read as n-heptane)" {
		t.Errorf("n-heptane not found under its alias: %v %+v", ok, r.Items)
	}
	if k, ok := r.Find("ethyl acetate"); !ok || r.Items[k].Density != 902 {
		t.Errorf("ethyl acetate priced per kg should carry its density 902 kg/m³: %v %+v", ok, r.Items)
	}
	if k, _ := r.Find("silica gel"); r.Items[k].Written != "" || r.Items[k].Density != 0 {
		t.Errorf("silica gel changed: %+v", r.Items[k])
	}
	if tab.Items[0].Name != "heptane" {
		t.Error("Resolve changed the table it was given")
	}
}

// Two lines for one solvent under two of its names are refused with both lines named.
func TestResolveTwoNamesOneSolvent(t *testing.T) {
	t.Parallel()
	csv := "item,unit,price,currency,category,source,date\n" +
		"heptane,L,12.00,EUR,solvent,,\n" +
		"n-heptane,L,13.00,EUR,solvent,,\n"
	tab, err := Read(strings.NewReader(csv), "p.csv")
	if err != nil {
		t.Fatal(err)
	}
	_, err = tab.Resolve(solventNames)
	if err == nil || !strings.Contains(err.Error(), "p.csv:2: item:") || !strings.Contains(err.Error(), "line 3") {
		t.Errorf("want an error naming lines 2 and 3, got %v", err)
	}
}
