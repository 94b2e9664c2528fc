package problem

import (
	"errors"
	"testing"
)

// The usual compiler-style location, "file:line: ", as GNU's coding
// standards ask of error messages ("Formatting Error Messages", GNU Coding
// Standards, §4.4 — from memory), then the field and the message.
func TestProblem(t *testing.T) {
	t.Parallel()
	bad := errors.New("invalid table")
	l := List{
		{File: "prices.csv", Line: 12, Field: "price", Msg: `"12,5" is not a number`, Of: bad},
		{File: "prices.csv", Msg: "no rows", Of: bad},
	}
	if got, want := l.Error(), "prices.csv:12: price: \"12,5\" is not a number\nprices.csv: no rows"; got != want {
		t.Errorf("got %q, want %q", got, want)
	}
	var err error = l
	var p *Problem
	if !errors.Is(err, bad) || !errors.As(err, &p) || p.Line != 12 {
		t.Errorf("errors.Is/As do not look inside: %v", p)
	}
}
