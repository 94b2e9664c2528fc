package plain

import "testing"

// Cells that begin with =, +, -, @, tab or carriage return are prefixed with
// an apostrophe so a spreadsheet shows them as text. Source: OWASP, "CSV
// Injection" (from memory).
func TestSafe(t *testing.T) {
	t.Parallel()
	cases := map[string]string{
		"=HYPERLINK(\"x\")": "'=HYPERLINK(\"x\")",
		"+1":                "'+1",
		"-2":                "'-2",
		"@SUM(A1)":          "'@SUM(A1)",
		"\tx":               "'\tx",
		"ethyl acetate":     "ethyl acetate",
		"":                  "",
	}
	for in, want := range cases {
		if got := Safe(in); got != want {
			t.Errorf("Safe(%q) = %q, want %q", in, got, want)
		}
	}
}
