package prices

import (
	"strings"
	"testing"
)

func TestFind(t *testing.T) {
	t.Parallel()
	// Items invented for the test (common practice, no source).
	tb, err := Read(strings.NewReader(header+
		"silica gel,kg,48.60,EUR,,,\n"+
		"ethyl acetate,L,12.40,EUR,,,\n"+
		"Straße salt,kg,1,EUR,,,\n"), "prices.csv")
	if err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		name string
		idx  int
		ok   bool
	}{
		{"silica gel", 0, true},
		{"Silica Gel", 0, true},
		{"  SILICA GEL\t", 0, true},
		{"ethyl acetate", 1, true},
		{"STRASSE SALT", 0, false}, // simple case folding does not turn ß into ss; that is a full folding (Unicode CaseFolding.txt, status F; from memory)
		{"straße SALT", 2, true},
		{"silica", 0, false},
		{"", 0, false},
		{"   ", 0, false},
	}
	for _, tc := range tests {
		idx, ok := tb.Find(tc.name)
		if ok != tc.ok || (ok && idx != tc.idx) {
			t.Errorf("Find(%q) = %d, %v; want %d, %v", tc.name, idx, ok, tc.idx, tc.ok)
		}
	}
	var none *Table
	if _, ok := none.Find("silica gel"); ok {
		t.Errorf("Find on a nil table found something")
	}
}

// nameKey must agree with strings.EqualFold, which Find uses, so that Read
// refuses exactly the duplicates Find could confuse.
func TestNameKeyAgreesWithEqualFold(t *testing.T) {
	t.Parallel()
	pairs := [][2]string{
		{"silica gel", "SILICA GEL"},
		{"Kelvin", "\u212Aelvin"}, // KELVIN SIGN folds to k (Unicode CaseFolding.txt; from memory)
		{"σ", "Σ"}, {"ς", "Σ"},    // final and medial sigma share a folding orbit (from memory)
		{"straße", "STRASSE"},
		{"a", "b"},
		{"\xff", "\xfe"},
	}
	for _, p := range pairs {
		a, b := p[0], p[1]
		if (nameKey(a) == nameKey(b)) != strings.EqualFold(a, b) {
			t.Errorf("nameKey and EqualFold disagree on %q, %q", a, b)
		}
	}
}

// sameName's quick rejection agrees with strings.EqualFold on trimmed
// names, including the letters whose case folding leaves ASCII (the
// Kelvin sign folds with k, the long s with s: Unicode CaseFolding.txt)
// and Unicode white space that TrimSpace removes (U+00A0, U+0085).
func TestSameNameAgreesWithEqualFold(t *testing.T) {
	names := []string{"", " ", "silica gel", "Silica Gel ", "\tsilica gel", "\u00a0silica gel", "\u0085Silica gel",
		"kieselguhr", "\u212aieselguhr", "sand", "\u017fand", "Sand", "1 kg", "ethyl acetate", "éthanol", "Éthanol"}
	for _, a := range names {
		for _, b := range names {
			want := strings.EqualFold(strings.TrimSpace(a), strings.TrimSpace(b))
			if got := sameName(a, b); got != want {
				t.Errorf("sameName(%q, %q) = %v, strings.EqualFold says %v", a, b, got, want)
			}
		}
	}
}
