package plain

import (
	"fmt"
	"io"
	"strings"
	"text/tabwriter"

	"sepcost/costing/solvent"
)

// Solvents writes the solvent table and, if asked, every value's source.
func Solvents(w io.Writer, list []solvent.Solvent, sources bool) error {
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintln(tw, "solvent\taliases\tformula\tg/mol\tg/mL\tbp °C\tΔHvap kJ/mol\tCp J/(mol K)\tflash °C\thalogenated\tperoxides\tAntoine range °C")
	for _, s := range list {
		flash := "none"
		if s.HasFlashPoint {
			flash = fmt.Sprintf("%.0f", s.FlashPoint.V-273.15)
		}
		ant := "—"
		if len(s.Antoine) > 0 {
			lo, hi := s.Antoine[0].Tmin, s.Antoine[0].Tmax
			for _, a := range s.Antoine[1:] {
				lo, hi = min(lo, a.Tmin), max(hi, a.Tmax)
			}
			ant = fmt.Sprintf("%.0f to %.0f", lo-273.15, hi-273.15)
		}
		fmt.Fprintf(tw, "%s\t%s\t%s\t%.2f\t%.3f\t%.1f\t%.2f\t%.1f\t%s\t%s\t%s\t%s\n", s.ID, strings.Join(s.Aliases, ", "), s.Formula,
			s.MolarMass()*1000, s.Density.V/1000, s.BoilingPoint.V-273.15, s.HVap.V/1000, s.Cp.V, flash, yesNo(s.Halogenated), yesNo(s.PeroxideFormer), ant)
	}
	if err := tw.Flush(); err != nil {
		return err
	}
	if !sources {
		return nil
	}
	fmt.Fprintln(w, "\nSources (mark in brackets: confirmed, derived, from memory, common practice):")
	for _, s := range list {
		fmt.Fprintf(w, "\n%s\n", s.ID)
		for _, c := range s.Coefficients() {
			fmt.Fprintf(w, "  %s = %.6g %s [%s] %s\n", c.Label, c.Display(), c.Unit, c.Mark, c.Source)
		}
	}
	return nil
}

func yesNo(b bool) string {
	if b {
		return "yes"
	}
	return "no"
}
