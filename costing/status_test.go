package costing

import "testing"

// A method the scenario does not describe is "not assessed", one tried and
// refused is "not feasible" (the plan's own wording, plan.go).
func TestStatusOf(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		feasible bool
		reason   string
		want     Status
		words    string
	}{
		{true, "", StatusFeasible, "feasible"},
		{false, NotAssessed + ": the scenario has no distillation section", StatusNotAssessed, "not assessed"},
		{false, "the product and impurity co-elute", StatusNotFeasible, "not feasible"},
	} {
		got := StatusOf(c.feasible, c.reason)
		if got != c.want || got.Words() != c.words {
			t.Errorf("StatusOf(%v, %q) = %q (%q), want %q (%q)", c.feasible, c.reason, got, got.Words(), c.want, c.words)
		}
	}
	if d := Detail(NotAssessed + ": the scenario has no distillation section"); d != "the scenario has no distillation section" {
		t.Errorf("Detail = %q", d)
	}
}
