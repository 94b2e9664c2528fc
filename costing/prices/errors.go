package prices

import (
	"errors"
	"fmt"
	"strings"
)

// ErrInvalid is the sentinel that every problem found in a price table
// unwraps to: errors.Is(err, prices.ErrInvalid) reports whether Read
// refused the table's content (as opposed to failing to read the bytes).
var ErrInvalid = errors.New("invalid price table")

// Error is one problem in a price table, located by file, line and field.
type Error struct {
	File  string // file name as given to Read
	Line  int    // 1-based line in the file; 0 for a problem of the whole table
	Field string // column name ("item", "unit", "price", ...), "header", or ""
	Msg   string // what is wrong and what would be valid
}

// Error formats the problem as "file:line: field: message", leaving out
// the line when it is 0 and the field when it is empty, e.g.
//
//	prices.csv:12: price: "12,5" is not a number; write a decimal such as 12.50
func (e *Error) Error() string {
	var b strings.Builder
	b.WriteString(e.File)
	if e.Line > 0 {
		fmt.Fprintf(&b, ":%d", e.Line)
	}
	b.WriteString(": ")
	if e.Field != "" {
		b.WriteString(e.Field)
		b.WriteString(": ")
	}
	b.WriteString(e.Msg)
	return b.String()
}

// Unwrap returns ErrInvalid.
func (e *Error) Unwrap() error { return ErrInvalid }

// Errors is every problem found in one price table, in file order, so a
// user can fix them all in one pass.
type Errors []*Error

// Error prints one problem per line.
func (es Errors) Error() string {
	lines := make([]string, len(es))
	for i, e := range es {
		lines[i] = e.Error()
	}
	return strings.Join(lines, "\n")
}

// Unwrap returns the individual problems, so that errors.Is(err,
// ErrInvalid) and errors.As(err, **Error) look inside.
func (es Errors) Unwrap() []error {
	out := make([]error, len(es))
	for i, e := range es {
		out[i] = e
	}
	return out
}
