package plain

import (
	"encoding/csv"
	"io"
	"strconv"
	"strings"

	"sepcost/scale"
)

// CSV writes one row per ledger line (for a sweep, SweepCSV's one row per
// mass and method): batch mass, method, group, item,
// label, quantity, unit, unit price, amount, currency. Text cells that a
// spreadsheet would read as a formula are written with a leading
// apostrophe (OWASP, "CSV Injection", guidance: prefix cells that begin
// with =, +, -, @, tab or carriage return).
func CSV(w io.Writer, r *scale.Report) error {
	if r.IsSweep {
		return SweepCSV(w, r)
	}
	cw := csv.NewWriter(w)
	header := []string{"crude_kg", "method", "group", "item", "label", "quantity", "unit", "unit_price", "amount", "currency"}
	if err := cw.Write(header); err != nil {
		return err
	}
	err := r.Each(func(i int, results []scale.Result) error {
		m := r.MassesKg[i]
		for j, name := range r.Methods {
			res := results[j]
			mass := kgText(m)
			for _, l := range res.Ledger.Lines {
				row := []string{mass, Safe(name), Safe(string(l.Demand.Group)), Safe(l.Demand.Item), Safe(l.Demand.Label),
					l.Qty.String(), Safe(l.Unit), l.UnitPrice.String(), l.Amount.StringFixed(res.Ledger.Places), Safe(res.Ledger.Currency)}
				if err := cw.Write(row); err != nil {
					return err
				}
			}
			row := []string{mass, Safe(name), "total", "", "", "", "", "", res.Ledger.Total.StringFixed(res.Ledger.Places), Safe(res.Ledger.Currency)}
			if err := cw.Write(row); err != nil {
				return err
			}
		}
		return nil
	})
	if err != nil {
		return err
	}
	for _, row := range budgetCSV(r) {
		if err := cw.Write(row); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}

// Safe guards a text cell against being read as a formula.
func Safe(s string) string {
	if s != "" && strings.ContainsRune("=+-@\t\r", rune(s[0])) {
		return "'" + s
	}
	return s
}

// kgText writes a batch mass in kg for a CSV cell to twelve significant
// digits, so that the float noise of a unit conversion does not show:
// "100 mg" is 0.0001, not 9.999999999999999e-05 (100 × 10⁻⁶ in binary).
// Twelve digits keep every mass a sweep spaces apart distinct and far
// below any weighing's resolution.
func kgText(kg float64) string { return strconv.FormatFloat(kg, 'g', 12, 64) }
