package ledger

import "testing"

// sameItemKey answers as comparing itemKey (strings.ToLower of the
// trimmed name) does, on names that differ by case, spaces, non-breaking
// spaces and letters whose lower case is not ASCII or changes length
// (Turkish dotted capital I, sharp s, the Kelvin sign: Unicode's case
// mappings, as Go's strings.ToLower applies them).
func TestSameItemKeyIsItemKey(t *testing.T) {
	t.Parallel()
	names := []string{"n-heptane", "N-Heptane", " n-heptane ", "n-heptane\u00a0", "n-heptanes", "n-hexane", "",
		"ethanol", "ETHANOL", "İ-solvent", "i̇-solvent", "i-solvent", "straße", "STRASSE", "strasse",
		"\u212aelvin", "kelvin", "KELVIN", "é", "É", "e"}
	for _, item := range names {
		key := itemKey(item)
		for _, name := range names {
			if got, want := sameItemKey(name, item, key), itemKey(name) == key; got != want {
				t.Errorf("sameItemKey(%q, %q) = %v, itemKey gives %v", name, item, got, want)
			}
		}
	}
}
