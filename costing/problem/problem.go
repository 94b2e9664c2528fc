// Package problem is the one shape of an input problem: the scenario, the
// price table, the equipment table and a year's plan report what is wrong
// with them as a Problem, located by file, line and field, and every
// problem of one file together as a List, so that a user fixes them all in
// one pass and every command prints them alike.
package problem

import (
	"fmt"
	"strings"
)

// Problem is one thing wrong with an input file: where, which field, what
// is wrong and what would be valid. Of is the reader's sentinel
// (scenario.ErrInvalid, prices.ErrInvalid, …), so that errors.Is tells one
// kind of input from another.
type Problem struct {
	File  string
	Line  int    // 1-based; 0 for a problem of the whole file
	Field string // the field or column, "" when none applies
	Msg   string // what is wrong and what would be valid
	Of    error  // the reader's sentinel, returned by Unwrap
}

// Error formats the problem as "file:line: field: message", leaving out
// the line when it is 0 and the field when it is empty, e.g.
//
//	prices.csv:12: price: "12,5" is not a number; write a decimal such as 12.50
func (p *Problem) Error() string {
	var b strings.Builder
	b.WriteString(p.File)
	if p.Line > 0 {
		fmt.Fprintf(&b, ":%d", p.Line)
	}
	b.WriteString(": ")
	if p.Field != "" {
		b.WriteString(p.Field)
		b.WriteString(": ")
	}
	b.WriteString(p.Msg)
	return b.String()
}

// Unwrap returns the reader's sentinel.
func (p *Problem) Unwrap() error { return p.Of }

// List is every problem found in one file, in file order.
type List []*Problem

// Error prints one problem per line.
func (l List) Error() string {
	lines := make([]string, len(l))
	for i, p := range l {
		lines[i] = p.Error()
	}
	return strings.Join(lines, "\n")
}

// Unwrap returns each problem, so that errors.Is and errors.As look inside.
func (l List) Unwrap() []error {
	out := make([]error, len(l))
	for i, p := range l {
		out[i] = p
	}
	return out
}
