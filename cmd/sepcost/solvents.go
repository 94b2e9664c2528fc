package main

import (
	"github.com/spf13/cobra"

	"sepcost/cmd/sepcost/internal/plain"
	"sepcost/costing/solvent"
)

func newSolventsCommand() *cobra.Command {
	var sources bool
	cmd := &cobra.Command{
		Use:   "solvents",
		Short: "List the built-in solvent data with sources",
		Long: `Lists the built-in solvents: density at 20 °C, normal boiling point, enthalpy
of vaporization, liquid heat capacity, flash point, halogenated and
peroxide-forming flags, and the range of the Antoine constants; with
--sources, the source and certainty of every value. A scenario can add
solvents or replace these under solvents:.`,
		Args: usageArgs(cobra.NoArgs),
		RunE: func(cmd *cobra.Command, args []string) error {
			return plain.Solvents(cmd.OutOrStdout(), solvent.Builtin().All(), sources)
		},
	}
	cmd.Flags().BoolVar(&sources, "sources", true, "print the source of every value")
	return cmd
}
