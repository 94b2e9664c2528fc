package main

import (
	"context"
	"errors"
	"fmt"
	"io"
	"strings"

	"github.com/spf13/cobra"
)

// usageError marks a mistake in the command line itself (exit code 2).
type usageError struct{ err error }

func (e usageError) Error() string { return e.err.Error() }
func (e usageError) Unwrap() error { return e.err }

// exitCode maps an error to the process exit code: 0 ok, 1 failure, 2 usage.
func exitCode(err error) int {
	if err == nil {
		return 0
	}
	var u usageError
	if errors.As(err, &u) {
		return 2
	}
	return 1
}

// newRootCommand builds the command tree. Commands are built fresh each
// call so that flag values never leak between runs (tests run many).
func newRootCommand() *cobra.Command {
	root := &cobra.Command{
		Use:   "sepcost",
		Short: "Cost the purification of a compound from milligrams to kilograms",
		Long: `sepcost reads a scenario (TLC Rf values and eluent, solubility data, boiling
points, crude purity, batch masses) and a price table, models flash
chromatography, recrystallization and distillation at each batch mass, finds
where the cheapest method changes, and writes the plan: materials, time,
waste with suggested codes, cost, the decision, uncertainty and cautions.

Start with ` + "`sepcost demo`" + `, then ` + "`sepcost init mycase`" + ` to get files to edit.`,
		SilenceUsage:  true,
		SilenceErrors: true,
	}
	root.SetFlagErrorFunc(func(c *cobra.Command, err error) error { return usageError{err} })
	root.AddCommand(newDemoCommand(), newInitCommand(), newEstimateCommand(), newSweepCommand(), newWasteCommand(), newPortfolioCommand(), newCheckCommand(), newSolventsCommand())
	return root
}

// run executes the command line with injected streams.
func run(ctx context.Context, args []string, stdout, stderr io.Writer) error {
	root := newRootCommand()
	out := &safeWriter{w: stdout}
	root.SetArgs(args)
	root.SetOut(out)
	root.SetErr(stderr)
	root.SetContext(ctx)
	cmd, err := root.ExecuteC()
	var u usageError
	if err != nil && cmd == root && !errors.As(err, &u) {
		// The root runs nothing: an error there is cobra's own about the
		// command line (an unknown command).
		return usageError{err}
	}
	if out.err != nil {
		werr := fmt.Errorf("writing to standard output: %w; the report is incomplete", out.err)
		if err == nil || errors.Is(err, out.err) {
			return werr
		}
		return errors.Join(err, werr)
	}
	return err
}

// oneFile is a cobra argument check for commands that take one file: a
// missing or extra argument is a usage error that says what to give.
func oneFile(what, example string) cobra.PositionalArgs {
	return func(cmd *cobra.Command, args []string) error {
		switch {
		case len(args) == 0:
			return usageError{fmt.Errorf("%s needs the %s: sepcost %s %s", cmd.Name(), what, cmd.Name(), example)}
		case len(args) > 1:
			return usageError{fmt.Errorf("%s takes one %s, but %d arguments were given (%s); options start with --", cmd.Name(), what, len(args), strings.Join(args, " "))}
		}
		return nil
	}
}

// usageArgs makes a cobra argument check's error a usage error (exit 2).
func usageArgs(check cobra.PositionalArgs) cobra.PositionalArgs {
	return func(cmd *cobra.Command, args []string) error {
		if err := check(cmd, args); err != nil {
			return usageError{err}
		}
		return nil
	}
}
