package scale

import (
	"fmt"
	"strings"

	"sepcost/costing/prices"
	"sepcost/costing/usage"
)

// UnusedPrices is a note listing the price-table lines that no ledger of
// the report uses, or nil when every line is used. A line priced for an
// item under a name no model demands (a misspelling, or a solvent's name
// the solvent table does not know) shows here instead of going unnoticed.
func UnusedPrices(t *prices.Table, res [][]Result) *usage.Note {
	used := make([]bool, len(t.Items))
	for _, row := range res {
		for _, r := range row {
			for _, l := range r.Ledger.Lines {
				if l.PriceRow >= 0 && l.PriceRow < len(used) {
					used[l.PriceRow] = true
				}
			}
		}
	}
	var names []string
	for k, it := range t.Items {
		if !used[k] {
			names = append(names, fmt.Sprintf("%s (line %d)", it.Label(), it.Line))
		}
	}
	if len(names) == 0 {
		return nil
	}
	return &usage.Note{Level: usage.Info, Text: fmt.Sprintf("%s of %s used by no method at these masses: %s. "+
		"Lines for methods the scenario does not describe are expected here; a line meant for an item of this scenario has a name no model asks for.",
		count(len(names), "line", "lines"), t.File+" "+count2(len(names)), strings.Join(names, ", "))}
}

// count2 is the verb for a count: "is" for one, "are" for more.
func count2(n int) string {
	if n == 1 {
		return "is"
	}
	return "are"
}

// count writes a count with its noun in the right number: "1 line", "3
// lines".
func count(n int, one, many string) string {
	if n == 1 {
		return "1 " + one
	}
	return fmt.Sprintf("%d %s", n, many)
}
