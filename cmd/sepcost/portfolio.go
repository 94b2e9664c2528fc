package main

import (
	"bytes"
	"context"
	"io"
	"path/filepath"

	"github.com/spf13/cobra"

	"sepcost/costing"
	"sepcost/scale"
)

type portfolioOptions struct {
	plan      string
	prices    string
	sheet     string
	out       string
	format    string
	force     bool
	equipment string
}

func newPortfolioCommand() *cobra.Command {
	opts := &portfolioOptions{}
	cmd := &cobra.Command{
		Use:   "portfolio PLAN.csv",
		Short: "Cost a year's plan of batches and roll up cost, waste, solvent and hours",
		Long: `Reads a plan CSV with the header scenario,mass,runs and the optional
columns method, date and development: a scenario file (relative to the
plan), a batch mass with its unit, how many times that batch is run,
optionally the method to force, the planned date (YYYY-MM-DD, rolled up by
quarter) and where one-time development costs are charged (scenario: once
per scenario and method in the plan, the default; row: on this row; done:
already developed). Each row is costed as a campaign of its runs and takes
the method cheapest per gram over that campaign unless forced. The roll-up
gives cost per method and quarter, waste by class and by suggested code,
solvent purchases by solvent and hours; totals reconcile to the cent.`,
		Example: `  sepcost portfolio plan.csv --prices prices.csv -o year.xlsx`,
		Args:    oneFile("plan file (CSV)", "plan.csv --prices prices.csv"),
		RunE: func(cmd *cobra.Command, args []string) error {
			opts.plan = args[0]
			return runPortfolio(cmd.Context(), opts, cmd.OutOrStdout(), cmd.ErrOrStderr())
		},
	}
	cmd.Flags().StringVar(&opts.prices, "prices", "", "price table, CSV or .xlsx (default: prices.csv beside the plan)")
	addPricesSheetFlag(cmd, &opts.sheet)
	cmd.Flags().StringVar(&opts.equipment, "equipment", "", "site equipment table CSV (default: equipment.csv beside the plan if there is one, else the built-in table)")
	addOutputFlags(cmd, &opts.out, &opts.format, &opts.force)
	return cmd
}

func runPortfolio(_ context.Context, opts *portfolioOptions, stdout, stderr io.Writer) error {
	format, err := formatFor(opts.format, opts.out)
	if err != nil {
		return err
	}
	data, err := readInput(opts.plan, "plan", scale.MaxPlanSize)
	if err != nil {
		return err
	}
	rows, err := scale.ReadPlan(bytes.NewReader(data), opts.plan)
	if err != nil {
		return err
	}
	t, err := loadPrices(opts.prices, opts.sheet, opts.plan)
	if err != nil {
		return err
	}
	dir := filepath.Dir(opts.plan)
	load := func(path string) (*costing.Plan, error) {
		if !filepath.IsAbs(path) {
			path = filepath.Join(dir, path)
		}
		sc, err := loadScenario(path)
		if err != nil {
			return nil, err
		}
		return preparePlan(sc, opts.equipment, opts.plan)
	}
	pf, err := scale.BuildPortfolio(opts.plan, rows, load, t)
	if err != nil {
		return err
	}
	buf, err := portfolioRenderers.render(format, pf)
	if err != nil {
		return err
	}
	return writeOut(buf, opts.out, opts.force, stdout, stderr)
}
