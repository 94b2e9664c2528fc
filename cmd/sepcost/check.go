package main

import (
	"context"
	"errors"
	"fmt"
	"io"
	"strings"

	"github.com/spf13/cobra"

	"sepcost/costing"
	"sepcost/costing/problem"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale"
)

type checkOptions struct {
	scenario  string
	prices    string
	sheet     string
	equipment string
}

func newCheckCommand() *cobra.Command {
	opts := &checkOptions{}
	cmd := &cobra.Command{
		Use:   "check SCENARIO",
		Short: "Check a scenario and price table and explain every problem found",
		Long: `Reads the scenario and the price table, checks every field, runs the models at
the scenario's batch masses and prices them. Every problem is listed with its
file, line and field and what would be valid; model warnings are listed too.
The exit code is 1 when anything must be fixed.`,
		Args: oneFile("scenario file", "mycase/scenario.yaml --prices mycase/prices.csv"),
		RunE: func(cmd *cobra.Command, args []string) error {
			opts.scenario = args[0]
			return runCheck(cmd.Context(), opts, cmd.OutOrStdout())
		},
	}
	cmd.Flags().StringVar(&opts.prices, "prices", "", "price table, CSV or .xlsx (default: prices.csv beside the scenario)")
	addPricesSheetFlag(cmd, &opts.sheet)
	cmd.Flags().StringVar(&opts.equipment, "equipment", "", "site equipment table CSV (default: equipment.csv beside the scenario if there is one, else the built-in table)")
	return cmd
}

// errCheckFailed is returned after the problems have been printed.
var errCheckFailed = errors.New("check found problems (listed above)")

func runCheck(_ context.Context, opts *checkOptions, stdout io.Writer) error {
	var problems []error
	sc, err := loadScenario(opts.scenario)
	if err != nil {
		problems = append(problems, err)
	}
	t, err := loadPrices(opts.prices, opts.sheet, opts.scenario)
	var ue usageError
	if errors.As(err, &ue) {
		return err
	}
	if err != nil {
		problems = append(problems, err)
	}
	var plan *costing.Plan
	if sc != nil {
		plan, err = preparePlan(sc, opts.equipment, opts.scenario)
		if err != nil {
			problems = append(problems, err)
		}
	}
	if plan != nil && t != nil {
		if t, err = plan.Prices(t); err != nil {
			problems = append(problems, err)
		}
	}
	var results [][]costing.Result
	if plan != nil && t != nil {
		results, err = plan.Run(sc.MassesKg, t)
		if err != nil {
			problems = append(problems, err)
		}
	}
	n := 0
	for _, p := range problems {
		n += printProblems(stdout, p)
	}
	if n > 0 {
		fmt.Fprintf(stdout, "\n%s to fix.\n", plural(n, "problem", "problems"))
		return errCheckFailed
	}
	fmt.Fprintf(stdout, "%s: scenario %q reads cleanly (%s; %s)\n", opts.scenario, sc.Name, plural(len(sc.MassesKg), "batch mass", "batch masses"), describedWords(plan))
	fmt.Fprintf(stdout, "%s: %d prices in %s; every item the models need is priced\n", t.File, len(t.Items), t.Currency)
	warned := 0
	for i, m := range sc.MassesKg {
		for j, name := range plan.MethodNames() {
			u := results[i][j].Usage
			switch {
			case !u.Feasible && strings.HasPrefix(u.Reason, costing.NotAssessed):
				// Said once above (describedWords), not at every mass.
			case !u.Feasible:
				fmt.Fprintf(stdout, "%s, %s: not feasible: %s\n", units.FormatMass(m), name, u.Reason)
				warned++
			}
			for _, note := range u.Notes {
				if note.Level == usage.Warning {
					fmt.Fprintf(stdout, "%s, %s: warning: %s\n", units.FormatMass(m), name, note.Text)
					warned++
				}
			}
		}
	}
	if n := scale.UnusedPrices(t, results); n != nil {
		fmt.Fprintf(stdout, "note: %s\n", n.Text)
	}
	if warned == 0 {
		fmt.Fprintln(stdout, "no model warnings")
	}
	return nil
}

// printProblems prints each problem of an error on its own line: the
// input problems of any file (problem.List: scenario, prices, equipment,
// plan) and the ledger's joined errors.
func printProblems(w io.Writer, err error) int {
	var list problem.List
	if errors.As(err, &list) {
		for _, p := range list {
			fmt.Fprintln(w, p.Error())
		}
		return len(list)
	}
	if j, ok := err.(interface{ Unwrap() []error }); ok {
		// errors.Join of several problems (the ledger's): count each.
		n := 0
		for _, e := range j.Unwrap() {
			n += printProblems(w, e)
		}
		return n
	}
	fmt.Fprintln(w, err.Error())
	return 1
}

// plural writes a count with the noun in the right number: "1 problem",
// "6 problems".
func plural(n int, one, many string) string {
	if n == 1 {
		return "1 " + one
	}
	return fmt.Sprintf("%d %s", n, many)
}

// describedWords names the methods the scenario describes and those it
// does not ("methods described: chromatography, crystallization; not
// described: distillation").
func describedWords(plan *costing.Plan) string {
	var yes, no []string
	for j, m := range plan.Methods {
		if !costing.Registry[j].Described(plan.Scenario) {
			no = append(no, m.Name)
		} else {
			yes = append(yes, m.Name)
		}
	}
	out := "methods described: " + strings.Join(yes, ", ")
	if len(yes) == 0 {
		out = "no method described"
	}
	if len(no) > 0 {
		out += "; not described: " + strings.Join(no, ", ")
	}
	return out
}
