package plain

import (
	"encoding/csv"
	"fmt"
	"io"
	"math"
	"strconv"
	"text/tabwriter"

	"sepcost/costing"
	"sepcost/costing/units"
	"sepcost/scale"
)

// SweepCSV writes the scale-up curve: one row per mass and method.
func SweepCSV(w io.Writer, r *scale.Report) error {
	cw := csv.NewWriter(w)
	header := []string{"crude_kg", "method", "feasible", "reason", "total_cost", "currency", "cost_per_g_product", "product_kg", "solvent_l", "waste_kg",
		"hours_elapsed", "hours_hands_on", "e_factor", "pmi", "equipment"}
	if err := cw.Write(header); err != nil {
		return err
	}
	f := func(v float64) string {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return ""
		}
		return strconv.FormatFloat(v, 'g', 8, 64)
	}
	for _, row := range r.Rows() {
		rec := []string{kgText(row.CrudeKg), Safe(row.Method), strconv.FormatBool(row.Feasible), Safe(row.Reason),
			row.Total.StringFixed(row.Places), Safe(r.Prices.Currency), f(row.PerGram), f(row.ProductKg), f(row.SolventL), f(row.WasteKg),
			f(row.HoursElapsed), f(row.HoursAttended), f(row.EFactor), f(row.PMI), Safe(row.Equipment)}
		if err := cw.Write(rec); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}

// sweepTable prints the curve compactly: one line per mass and method.
func sweepTable(ew *errWriter, r *scale.Report) error {
	tw := tabwriter.NewWriter(ew, 0, 0, 2, ' ', tabwriter.AlignRight)
	fmt.Fprintf(tw, "crude\tmethod\tcost/g %s\ttotal %s\tsolvent L\twaste kg\thours\tE-factor\tequipment\t\n", r.Prices.Currency, r.Prices.Currency)
	notAssessed := map[string]string{}
	for _, row := range r.Rows() {
		if costing.StatusOf(row.Feasible, row.Reason) == costing.StatusNotAssessed {
			notAssessed[row.Method] = row.Reason
			continue
		}
		if !row.Feasible {
			fmt.Fprintf(tw, "%s\t%s\t—\t—\t\t\t\t\t%s\t\n", units.FormatMass(row.CrudeKg), row.Method, shorten(row.Reason, 50))
			continue
		}
		method := row.Method
		if r.CheapestAt(row.Mass) == row.Col {
			method += " *"
		}
		fmt.Fprintf(tw, "%s\t%s\t%.2f\t%s\t%s\t%s\t%.1f\t%s\t%s\t\n", units.FormatMass(row.CrudeKg), method, row.PerGram,
			row.Total.StringFixed(2), num(row.SolventL), num(row.WasteKg), row.HoursElapsed, num(row.EFactor), row.Equipment)
	}
	if err := tw.Flush(); err != nil {
		return err
	}
	ew.printf("* cheapest at that mass: the lowest cost per gram of purified product among the feasible methods\n")
	for _, name := range r.Methods {
		if why, ok := notAssessed[name]; ok {
			ew.printf("%s: %s\n", name, why)
		}
	}
	return nil
}

func shorten(s string, n int) string {
	r := []rune(s)
	if len(r) <= n {
		return s
	}
	return string(r[:n-1]) + "…"
}
