package main

import (
	"bytes"
	"context"
	"fmt"
	"io"
	"strings"

	"github.com/spf13/cobra"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/scale"
	"sepcost/templates"
)

type demoOptions struct {
	liquid bool
	out    string
	format string
	force  bool
}

func newDemoCommand() *cobra.Command {
	opts := &demoOptions{}
	cmd := &cobra.Command{
		Use:   "demo",
		Short: "Run the built-in demo scenario with example prices",
		Long: `Runs the built-in demo scenario (an invented solid compound: chromatography
against recrystallization) with the example price table and writes a
workbook, sepcost-demo.xlsx unless -o says otherwise, then prints a summary.
With --liquid it runs a second demo, a liquid product (chromatography against
distillation). Needs no files. ` + "`sepcost init`" + ` writes the same scenario
and prices to edit.`,
		Args: usageArgs(cobra.NoArgs),
		RunE: func(cmd *cobra.Command, args []string) error {
			return runDemo(cmd.Context(), opts, cmd.OutOrStdout(), cmd.ErrOrStderr())
		},
	}
	addOutputFlags(cmd, &opts.out, &opts.format, &opts.force)
	cmd.Flags().BoolVar(&opts.liquid, "liquid", false, "run the second demo, a liquid product that can also be distilled (default -o sepcost-demo-liquid.xlsx)")
	cmd.Flags().Lookup("output").DefValue = "sepcost-demo.xlsx"
	return cmd
}

func runDemo(_ context.Context, opts *demoOptions, stdout, stderr io.Writer) error {
	data, name := templates.Scenario, "built-in demo scenario"
	if opts.liquid {
		data, name = templates.Liquid, "built-in liquid demo scenario"
	}
	out := opts.out
	if out == "" {
		// The default name takes the extension of the format asked for:
		// --format json writes sepcost-demo.json, never JSON into an .xlsx
		// name; --format text prints to the terminal only.
		f := opts.format
		if f == "" {
			f = "xlsx"
		}
		base := "sepcost-demo"
		if opts.liquid {
			base = "sepcost-demo-liquid"
		}
		out = defaultOut(base, format(strings.ToLower(f)))
	}
	format, err := formatFor(opts.format, out)
	if err != nil {
		return err
	}
	sc, err := scenario.Load(bytes.NewReader(data), name)
	if err != nil {
		return fmt.Errorf("the built-in demo scenario is broken: %w", err)
	}
	t, err := prices.Read(bytes.NewReader(templates.Prices), "built-in example prices")
	if err != nil {
		return fmt.Errorf("the built-in example prices are broken: %w", err)
	}
	r, err := buildReport(sc, t, sc.MassesKg)
	if err != nil {
		return err
	}
	buf, err := render(r, format)
	if err != nil {
		return err
	}
	if err := emit(buf, out, opts.force, stdout); err != nil {
		return err
	}
	if format != formatText && out != "" && out != "-" {
		text, err := render(r, formatText)
		if err != nil {
			return err
		}
		if _, err := stdout.Write(text.Bytes()); err != nil {
			return err
		}
		if format == formatXLSX {
			fmt.Fprintf(stderr, "\nwrote %s (open it in a spreadsheet program; every cost cell is a live formula on the Prices sheet)\n", out)
		} else {
			fmt.Fprintf(stderr, "\nwrote %s\n", out)
		}
	}
	return nil
}

// buildReport prepares the plan and runs it at the masses.
func buildReport(sc *scenario.Scenario, t *prices.Table, masses []float64) (*scale.Report, error) {
	plan, err := costing.Prepare(sc)
	if err != nil {
		return nil, err
	}
	if t, err = plan.Prices(t); err != nil {
		return nil, err
	}
	return scale.Estimate(plan, t, masses)
}
