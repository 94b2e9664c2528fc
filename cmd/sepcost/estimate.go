package main

import (
	"context"
	"fmt"
	"io"

	"github.com/spf13/cobra"

	"sepcost/scale"
)

type estimateOptions struct {
	scenario  string
	prices    string
	sheet     string
	masses    massList
	target    string
	out       string
	format    string
	force     bool
	draws     int
	seed      uint64
	equipment string
}

func newEstimateCommand() *cobra.Command {
	opts := &estimateOptions{}
	cmd := &cobra.Command{
		Use:   "estimate SCENARIO",
		Short: "Cost every applicable method at the given batch masses",
		Long: `Runs every method the scenario describes at each batch mass and prices it with
the price table. Without -o a summary is printed; with -o the format follows
the file's extension (.xlsx, .json, .csv) unless --format says otherwise.
The decision is made at --target; without it at the largest --mass, else
at the scenario's target_mass (else its largest mass).`,
		Example: `  sepcost estimate mycase/scenario.yaml --prices mycase/prices.csv --mass 0.25g,20g,2kg -o plan.xlsx
  sepcost estimate mycase/scenario.yaml --mass 85g,2kg --target 85g
  sepcost estimate mycase/scenario.yaml --format json`,
		Args: oneFile("scenario file", "mycase/scenario.yaml --prices mycase/prices.csv"),
		RunE: func(cmd *cobra.Command, args []string) error {
			opts.scenario = args[0]
			return runEstimate(cmd.Context(), opts, cmd.OutOrStdout(), cmd.ErrOrStderr())
		},
	}
	f := cmd.Flags()
	f.StringVar(&opts.prices, "prices", "", "price table, CSV or .xlsx (default: prices.csv beside the scenario)")
	addPricesSheetFlag(cmd, &opts.sheet)
	f.StringVar(&opts.equipment, "equipment", "", "site equipment table CSV (default: equipment.csv beside the scenario if there is one, else the built-in table)")
	f.Var(&opts.masses, "mass", `crude batch masses with units, e.g. "250mg,20g,2kg" (default: the scenario's masses)`)
	addTargetFlag(cmd, &opts.target)
	addOutputFlags(cmd, &opts.out, &opts.format, &opts.force)
	addDrawFlags(cmd, &opts.draws, &opts.seed)
	return cmd
}

// maxDraws caps the Monte Carlo draws: a million draws take minutes and
// add nothing to the bands.
const maxDraws = 1_000_000

func addDrawFlags(cmd *cobra.Command, draws *int, seed *uint64) {
	cmd.Flags().IntVar(draws, "draws", scale.DefaultOptions.Draws, "Monte Carlo draws of the uncertain inputs: bands at every mass, what to measure at the target mass (0 to skip)")
	cmd.Flags().Uint64Var(seed, "seed", scale.DefaultOptions.Seed, "seed of the draws; the same seed gives the same bands")
}

func addOutputFlags(cmd *cobra.Command, out, format *string, force *bool) {
	cmd.Flags().StringVarP(out, "output", "o", "", "write to this file instead of the terminal")
	cmd.Flags().StringVar(format, "format", "", "xlsx, json, csv or text (default: from the -o extension, else text)")
	cmd.Flags().BoolVar(force, "force", false, "replace an existing output file")
}

func runEstimate(_ context.Context, opts *estimateOptions, stdout, stderr io.Writer) error {
	if opts.draws < 0 || opts.draws > maxDraws {
		return usageError{fmt.Errorf("--draws %d: write 0 to skip, or up to %d", opts.draws, maxDraws)}
	}
	format, err := formatFor(opts.format, opts.out)
	if err != nil {
		return err
	}
	largest := 0.0
	if opts.masses.set {
		largest = opts.masses.kg[len(opts.masses.kg)-1]
	}
	target, why, err := targetMass(opts.target, largest, "--mass")
	if err != nil {
		return err
	}
	plan, t, err := loadPlan(opts.scenario, opts.prices, opts.sheet, opts.equipment)
	if err != nil {
		return err
	}
	masses := massesOr(opts.masses, plan.Scenario)
	defer boundMemory(len(masses))()
	r, err := scale.EstimateWith(plan, t, masses, scale.Options{Draws: opts.draws, Seed: opts.seed, Progress: newProgress(stderr, opts.draws), TargetKg: target, TargetWhy: why})
	if err != nil {
		return err
	}
	return deliver(r, format, opts.out, opts.force, stdout, stderr)
}
