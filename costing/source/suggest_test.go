package source

import (
	"strings"
	"testing"
)

// Textbook values of the Levenshtein distance (from memory): kitten →
// sitting is 3 (two substitutions and an insertion), flaw → lawn is 2,
// a string to itself 0, to the empty string its length.
func TestEditDistance(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		a, b string
		want int
	}{{"kitten", "sitting", 3}, {"flaw", "lawn", 2}, {"same", "same", 0}, {"abc", "", 3}, {"", "", 0}} {
		if d := editDistance(c.a, c.b); d != c.want {
			t.Errorf("editDistance(%q, %q) = %d, want %d", c.a, c.b, d, c.want)
		}
	}
}

// A misspelt key gets the nearest key and its method's keys, not every key.
func TestSuggest(t *testing.T) {
	t.Parallel()
	s := set()
	msg := s.suggest("x.bed_hieght")
	if !strings.Contains(msg, `did you mean "x.bed_height"?`) || !strings.Contains(msg, "valid settings of x:") {
		t.Errorf("suggest: %s", msg)
	}
	if msg := s.suggest("zzz.qqqqqqqqqq"); strings.Contains(msg, "did you mean") || !strings.Contains(msg, "valid settings begin with x.") {
		t.Errorf("no near key: %s", msg)
	}
}
