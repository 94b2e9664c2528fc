package prices

import (
	"errors"

	"sepcost/costing/problem"
)

// ErrInvalid is the sentinel that every problem found in a price table
// unwraps to: errors.Is(err, prices.ErrInvalid) reports whether Read
// refused the table's content (as opposed to failing to read the bytes).
var ErrInvalid = errors.New("invalid price table")

// Error is one problem in a price table, located by file, line and field
// (the column name, "header", or ""); it unwraps to ErrInvalid.
type Error = problem.Problem

// Errors is every problem found in one price table, in file order, so a
// user can fix them all in one pass.
type Errors = problem.List
