package main

import (
	"context"
	"io"

	"github.com/spf13/cobra"

	"sepcost/scale"
)

type wasteOptions struct {
	scenario  string
	prices    string
	sheet     string
	masses    massList
	out       string
	format    string
	force     bool
	equipment string
}

func newWasteCommand() *cobra.Command {
	opts := &wasteOptions{}
	cmd := &cobra.Command{
		Use:   "waste SCENARIO",
		Short: "The waste forecast alone: one row per stream, with suggested codes",
		Long: `Writes every waste stream of every feasible method at each batch mass: class,
mass, volume, composition, disposal cost, and suggested waste codes from the
EU List of Waste and the US EPA spent-solvent and characteristic codes, with
the rule applied. Classification is decided by your site's EHS office under
local rules; the codes are suggestions to start from.`,
		Example: `  sepcost waste scenario.yaml --prices prices.csv --mass 2kg --format csv > waste.csv
  sepcost waste scenario.yaml --mass 20g,2kg -o waste.xlsx`,
		Args: oneFile("scenario file", "mycase/scenario.yaml --prices mycase/prices.csv"),
		RunE: func(cmd *cobra.Command, args []string) error {
			opts.scenario = args[0]
			return runWaste(cmd.Context(), opts, cmd.OutOrStdout(), cmd.ErrOrStderr())
		},
	}
	cmd.Flags().StringVar(&opts.prices, "prices", "", "price table, CSV or .xlsx (default: prices.csv beside the scenario)")
	addPricesSheetFlag(cmd, &opts.sheet)
	cmd.Flags().StringVar(&opts.equipment, "equipment", "", "site equipment table CSV (default: equipment.csv beside the scenario if there is one, else the built-in table)")
	cmd.Flags().Var(&opts.masses, "mass", `crude batch masses with units, e.g. "2kg" (default: the scenario's masses)`)
	addOutputFlags(cmd, &opts.out, &opts.format, &opts.force)
	return cmd
}

func runWaste(_ context.Context, opts *wasteOptions, stdout, stderr io.Writer) error {
	format, err := formatFor(opts.format, opts.out)
	if err != nil {
		return err
	}
	plan, t, err := loadPlan(opts.scenario, opts.prices, opts.sheet, opts.equipment)
	if err != nil {
		return err
	}
	masses := massesOr(opts.masses, plan.Scenario)
	r, err := scale.Estimate(plan, t, masses)
	if err != nil {
		return err
	}
	buf, err := wasteRenderers.render(format, r)
	if err != nil {
		return err
	}
	return writeOut(buf, opts.out, opts.force, stdout, stderr)
}
