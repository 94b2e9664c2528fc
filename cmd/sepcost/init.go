package main

import (
	"context"
	"fmt"
	"io"
	"os"
	"path/filepath"

	"github.com/spf13/cobra"

	"sepcost/templates"
)

type initOptions struct {
	dir   string
	force bool
}

func newInitCommand() *cobra.Command {
	opts := &initOptions{}
	cmd := &cobra.Command{
		Use:   "init [DIR]",
		Short: "Write a starter scenario.yaml, prices.csv and equipment.csv to edit",
		Long: `Writes a commented starter scenario (scenario.yaml), a price table with
example prices (prices.csv) and a site equipment table with example sizes,
rates and prices (equipment.csv) into DIR (default: the current folder),
creating DIR if needed. Existing files are left alone unless --force.`,
		Args: usageArgs(cobra.MaximumNArgs(1)),
		RunE: func(cmd *cobra.Command, args []string) error {
			opts.dir = "."
			if len(args) == 1 {
				opts.dir = args[0]
			}
			return runInit(cmd.Context(), opts, cmd.OutOrStdout())
		},
	}
	cmd.Flags().BoolVar(&opts.force, "force", false, "replace existing files")
	return cmd
}

func runInit(_ context.Context, opts *initOptions, stdout io.Writer) error {
	if err := os.MkdirAll(opts.dir, 0o755); err != nil {
		return fmt.Errorf("cannot create %s: %w", opts.dir, err)
	}
	files := []struct {
		name string
		data []byte
	}{{templates.ScenarioName, templates.Scenario}, {templates.PricesName, templates.Prices}, {templates.EquipmentName, templates.Equipment}}
	// Check both first so that a refusal writes neither.
	if !opts.force {
		for _, f := range files {
			p := filepath.Join(opts.dir, f.name)
			if _, err := os.Stat(p); err == nil {
				return fmt.Errorf("%s: %w; add --force to replace it", p, ErrExists)
			}
		}
	}
	for _, f := range files {
		p := filepath.Join(opts.dir, f.name)
		if err := writeFile(p, f.data, opts.force); err != nil {
			return err
		}
		fmt.Fprintf(stdout, "wrote %s\n", p)
	}
	fmt.Fprintf(stdout, "next: edit the files (equipment.csv lists what your site owns), then `sepcost check %s --prices %s`\n",
		filepath.Join(opts.dir, templates.ScenarioName), filepath.Join(opts.dir, templates.PricesName))
	return nil
}
