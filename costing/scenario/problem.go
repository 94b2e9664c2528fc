package scenario

import (
	"errors"
	"fmt"
	"strings"

	"go.yaml.in/yaml/v3"

	"sepcost/costing/quote"
)

// ErrInvalid is the sentinel that every scenario input error unwraps to.
var ErrInvalid = errors.New("invalid scenario")

// Problem is one thing wrong with a scenario file: where, which field, what
// is wrong and what would be valid.
type Problem struct {
	File  string
	Line  int // 1-based; 0 when unknown
	Field string
	Msg   string
}

func (p *Problem) Error() string {
	loc := p.File
	if p.Line > 0 {
		loc = fmt.Sprintf("%s:%d", p.File, p.Line)
	}
	if p.Field == "" {
		return loc + ": " + p.Msg
	}
	return loc + ": " + p.Field + ": " + p.Msg
}

// Unwrap returns ErrInvalid.
func (p *Problem) Unwrap() error { return ErrInvalid }

// Problems is every problem found in one file, reported together.
type Problems []*Problem

func (ps Problems) Error() string {
	lines := make([]string, len(ps))
	for i, p := range ps {
		lines[i] = p.Error()
	}
	return strings.Join(lines, "\n")
}

// Unwrap returns each problem, so errors.Is(err, ErrInvalid) holds.
func (ps Problems) Unwrap() []error {
	out := make([]error, len(ps))
	for i, p := range ps {
		out[i] = p
	}
	return out
}

// collector gathers problems while a file is resolved.
type collector struct {
	file string
	root *yaml.Node // the document, to find the line of a field
	list Problems
}

// add records a problem. A string quoted with %q is the user's text: it is
// cut to a short excerpt (quote.Args), so that no message repeats a file.
func (c *collector) add(line int, field, format string, args ...any) {
	quote.Args(format, args)
	c.list = append(c.list, &Problem{File: c.file, Line: line, Field: field, Msg: fmt.Sprintf(format, args...)})
}

func (c *collector) err() error {
	if len(c.list) == 0 {
		return nil
	}
	return c.list
}
