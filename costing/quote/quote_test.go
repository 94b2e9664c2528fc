package quote

import (
	"fmt"
	"strings"
	"testing"
)

// Messages quote at most Max characters of a user's text, escaped.
func TestExcerpt(t *testing.T) {
	t.Parallel()
	cases := []struct{ in, want string }{
		{"silica gel", `"silica gel"`},
		{"\x1b[2J", `"\x1b[2J"`},
		{strings.Repeat("é", 50), `"` + strings.Repeat("é", 40) + `"…`},
	}
	for _, c := range cases {
		if got := Excerpt(c.in); got != c.want {
			t.Errorf("Excerpt(%q) = %s, want %s", c.in, got, c.want)
		}
	}
	if Field("chromatography.speed") != "chromatography.speed" || Field("a\x1bb") != `"a\x1bb"` {
		t.Errorf("Field: %s, %s", Field("chromatography.speed"), Field("a\x1bb"))
	}
}

func TestArgs(t *testing.T) {
	t.Parallel()
	long := strings.Repeat("x", 100)
	args := []any{long, 5, long, long}
	Args("%s has %d%% and %q, %q", args)
	msg := fmt.Sprintf("%s %d %q %q", args...)
	if args[0] != long || args[2] != strings.Repeat("x", 40)+"…" || args[3] != strings.Repeat("x", 40)+"…" {
		t.Errorf("args %v; message %s", args, msg)
	}
}
