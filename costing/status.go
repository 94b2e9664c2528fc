package costing

import "strings"

// Status is what became of a method at a batch mass: costed, tried and
// found not feasible, or not assessed because the scenario does not
// describe it. Writers show and key on it rather than on reason words.
type Status string

// The three statuses; the values are the words the JSON contract carries.
const (
	StatusFeasible    Status = "feasible"
	StatusNotFeasible Status = "not_feasible"
	StatusNotAssessed Status = "not_assessed"
)

// StatusOf is the status of a result with the given feasibility and
// reason: a reason that begins with NotAssessed marks a method the
// scenario does not describe.
func StatusOf(feasible bool, reason string) Status {
	switch {
	case feasible:
		return StatusFeasible
	case strings.HasPrefix(reason, NotAssessed):
		return StatusNotAssessed
	default:
		return StatusNotFeasible
	}
}

// Status is the result's status.
func (r Result) Status() Status { return StatusOf(r.Usage.Feasible, r.Usage.Reason) }

// Words is the status in a sentence's words: "feasible", "not feasible",
// "not assessed".
func (s Status) Words() string { return strings.ReplaceAll(string(s), "_", " ") }

// Detail is a reason without the "not assessed: " prefix that StatusOf
// reads, for a writer that shows the status in its own column.
func Detail(reason string) string {
	return strings.TrimPrefix(strings.TrimPrefix(reason, NotAssessed), ": ")
}
