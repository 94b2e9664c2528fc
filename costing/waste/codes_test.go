package waste

import (
	"testing"

	"sepcost/costing/source"
)

// The EU entries used, as published. Source: Commission Decision
// 2000/532/EC, Annex (as replaced by 2014/955/EU), chapter 07,
// sub-chapters 07 05 ("wastes from the MFSU of pharmaceuticals") and 07 07
// ("wastes from the MFSU of fine chemicals and chemical products not
// otherwise specified"), entries 01*, 03*, 04*, 09* and 10*: read in the
// Scottish Government's open-data reproduction of the list (ewc-coding
// table). Every one is marked with an asterisk (hazardous) and confirmed.
func TestEUEntriesAsPublished(t *testing.T) {
	t.Parallel()
	want := map[string]string{
		"01": "aqueous washing liquids and mother liquors",
		"03": "organic halogenated solvents, washing liquids and mother liquors",
		"04": "other organic solvents, washing liquids and mother liquors",
		"09": "halogenated filter cakes and spent absorbents",
		"10": "other filter cakes and spent absorbents",
	}
	if len(euEntries) != len(want) {
		t.Fatalf("%d EU entries, want %d", len(euEntries), len(want))
	}
	for _, s := range []Sector{Pharmaceuticals, FineChemicals} {
		for _, e := range euEntries {
			c := e.code(s)
			if c.Title != want[e.suffix] {
				t.Errorf("%s: title %q, published %q", c.Code, c.Title, want[e.suffix])
			}
			if c.Code != s.Chapter()+" "+e.suffix+"*" || c.Mark != source.Confirmed {
				t.Errorf("%s (%s): want %s %s*, confirmed", c.Code, c.Mark, s.Chapter(), e.suffix)
			}
		}
	}
}

// The US listings read in the regulation are confirmed; the ones not read
// stay from memory. Source: 40 CFR 261.31(a), F001–F003 rows read in
// reproductions (ecfr.io, compliancecosmos.org); F004 and F005 not found.
// F003 is listed for ignitability only (hazard code (I)*).
func TestUSListingMarks(t *testing.T) {
	t.Parallel()
	for code, want := range map[string]source.Mark{"F001": source.Confirmed, "F002": source.Confirmed, "F003": source.Confirmed,
		"F004": source.FromMemory, "F005": source.FromMemory} {
		for _, l := range listings {
			if l.code == code && (l.mark != want || l.codeFor().Mark != want) {
				t.Errorf("%s marked %s, want %s", code, l.mark, want)
			}
		}
	}
	if !f003.forI || f002.forI {
		t.Error("F003 (and only F003) is listed for ignitability only")
	}
	// The TCLP ratio: SW-846 Method 1311 section 2.2, fluid 20 times the
	// weight of the solid phase.
	if TCLPRatio != 20 {
		t.Errorf("TCLP ratio %g, Method 1311 says 20", TCLPRatio)
	}
}
