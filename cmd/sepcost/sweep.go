package main

import (
	"context"
	"fmt"
	"io"

	"github.com/spf13/cobra"

	"sepcost/costing/quote"
	"sepcost/costing/scenario"
	"sepcost/costing/units"
	"sepcost/scale"
)

type sweepOptions struct {
	scenario  string
	prices    string
	sheet     string
	from, to  string
	toGiven   bool // --to was given on the command line
	points    int
	target    string
	out       string
	format    string
	force     bool
	draws     int
	seed      uint64
	equipment string
}

func newSweepCommand() *cobra.Command {
	opts := &sweepOptions{}
	cmd := &cobra.Command{
		Use:   "sweep SCENARIO",
		Short: "The scale-up curve: every method across batch masses, crossovers and the decision",
		Long: `Runs every method the scenario describes at log-spaced batch masses, finds the
masses where the cheapest method per gram of purified product changes (by
bisection on the models), and decides at the target mass: the method, the
margin, the largest cost drivers and the prices that would flip it. The
target is --target; without it --to when given, else the scenario's
target_mass (else its largest mass).`,
		Example: `  sepcost sweep scenario.yaml --prices prices.csv --from 100mg --to 10kg --points 40 -o sweep.xlsx
  sepcost sweep scenario.yaml --format csv > curve.csv`,
		Args: oneFile("scenario file", "mycase/scenario.yaml --prices mycase/prices.csv"),
		RunE: func(cmd *cobra.Command, args []string) error {
			opts.scenario = args[0]
			opts.toGiven = cmd.Flags().Changed("to")
			return runSweep(cmd.Context(), opts, cmd.OutOrStdout(), cmd.ErrOrStderr())
		},
	}
	f := cmd.Flags()
	f.StringVar(&opts.prices, "prices", "", "price table, CSV or .xlsx (default: prices.csv beside the scenario)")
	addPricesSheetFlag(cmd, &opts.sheet)
	f.StringVar(&opts.equipment, "equipment", "", "site equipment table CSV (default: equipment.csv beside the scenario if there is one, else the built-in table)")
	f.StringVar(&opts.from, "from", "100mg", "smallest crude batch mass, with its unit")
	f.StringVar(&opts.to, "to", "10kg", "largest crude batch mass, with its unit")
	f.IntVar(&opts.points, "points", 30, "number of log-spaced masses (2 to 10000)")
	addTargetFlag(cmd, &opts.target)
	addOutputFlags(cmd, &opts.out, &opts.format, &opts.force)
	addDrawFlags(cmd, &opts.draws, &opts.seed)
	return cmd
}

func runSweep(_ context.Context, opts *sweepOptions, stdout, stderr io.Writer) error {
	format, err := formatFor(opts.format, opts.out)
	if err != nil {
		return err
	}
	from, err := units.ParseAs(opts.from, units.Mass)
	if err != nil {
		return usageError{fmt.Errorf("--from %s: %v", quote.Excerpt(opts.from), err)}
	}
	to, err := units.ParseAs(opts.to, units.Mass)
	if err != nil {
		return usageError{fmt.Errorf("--to %s: %v", quote.Excerpt(opts.to), err)}
	}
	for _, f := range []struct {
		flag, text string
		kg         float64
	}{{"--from", opts.from, from}, {"--to", opts.to, to}} {
		if err := scenario.CheckBatchMass(f.kg); err != nil {
			return usageError{fmt.Errorf("%s %s: %v", f.flag, quote.Excerpt(f.text), err)}
		}
	}
	if opts.draws < 0 || opts.draws > maxDraws {
		return usageError{fmt.Errorf("--draws %d: write 0 to skip, or up to %d", opts.draws, maxDraws)}
	}
	masses, err := scale.LogSpace(from, to, opts.points)
	if err != nil {
		return usageError{err}
	}
	largest := 0.0
	if opts.toGiven {
		largest = to
	}
	target, why, err := targetMass(opts.target, largest, "--to")
	if err != nil {
		return err
	}
	plan, t, err := loadPlan(opts.scenario, opts.prices, opts.sheet, opts.equipment)
	if err != nil {
		return err
	}
	defer boundMemory(len(masses))()
	r, err := scale.SweepWith(plan, t, masses, scale.Options{Draws: opts.draws, Seed: opts.seed, Progress: newProgress(stderr, opts.draws), TargetKg: target, TargetWhy: why})
	if err != nil {
		return err
	}
	return deliver(r, format, opts.out, opts.force, stdout, stderr)
}
