package scale

import (
	"fmt"
	"strings"

	"sepcost/costing/equipment"
	"sepcost/costing/prices"
	"sepcost/costing/usage"
)

// UnusedPrices is a note listing the price-table lines that no ledger of
// the report uses, or nil when every line is used. A line priced for an
// item under a name no model demands (a misspelling, or a solvent's name
// the solvent table does not know) shows here instead of going unnoticed.
func UnusedPrices(t *prices.Table, res [][]Result) *usage.Note {
	used := make([]bool, len(t.Items))
	markUsed(used, res)
	return unusedNote(t, used)
}

// markUsed marks the price rows the ledgers of res use.
func markUsed(used []bool, res [][]Result) {
	for _, row := range res {
		for _, r := range row {
			for _, l := range r.Ledger.Lines {
				if l.PriceRow >= 0 && l.PriceRow < len(used) {
					used[l.PriceRow] = true
				}
			}
		}
	}
}

// unusedNote is UnusedPrices's note on the price rows marked used.
func unusedNote(t *prices.Table, used []bool) *usage.Note {
	// A price band of an item counts as used when any band of it is: the
	// campaign's purchase picks one band, the others are not mistakes.
	usedName := map[string]bool{}
	for k, it := range t.Items {
		if used[k] {
			usedName[strings.ToLower(it.Name)] = true
		}
	}
	var names []string
	for k, it := range t.Items {
		// Items the site equipment table adds to the prices are not lines of
		// the price file; the equipment table lists them.
		if fromEquipment(it.Name) {
			continue
		}
		if !used[k] && !usedName[strings.ToLower(it.Name)] {
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

// fromEquipment reports whether a price item was added from the site
// equipment table (an hour or a use of an item of equipment).
func fromEquipment(name string) bool {
	return strings.HasPrefix(name, equipment.HourItem("")) || strings.HasPrefix(name, equipment.UseItem(""))
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
