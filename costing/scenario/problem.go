package scenario

import (
	"errors"
	"fmt"

	"go.yaml.in/yaml/v3"

	"sepcost/costing/problem"
	"sepcost/costing/quote"
)

// ErrInvalid is the sentinel that every scenario input error unwraps to.
var ErrInvalid = errors.New("invalid scenario")

// Problem is one thing wrong with a scenario file: where, which field, what
// is wrong and what would be valid; it unwraps to ErrInvalid.
type Problem = problem.Problem

// Problems is every problem found in one file, reported together.
type Problems = problem.List

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
	c.list = append(c.list, &Problem{Of: ErrInvalid, File: c.file, Line: line, Field: field, Msg: fmt.Sprintf(format, args...)})
}

func (c *collector) err() error {
	if len(c.list) == 0 {
		return nil
	}
	return c.list
}
