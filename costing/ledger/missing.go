package ledger

import (
	"encoding/csv"
	"fmt"
	"strings"

	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// MissingPrices lists every item that demands name and the price table
// lacks, each once, with what it is used for and a line to add to the
// table. Price and PriceAll return it (alone, or joined with other errors)
// instead of stopping at the first missing price, so that a user can
// complete the table in one pass.
type MissingPrices struct {
	File     string        // price table file
	Currency string        // the table's currency, used in the suggested lines
	Items    []MissingItem // in the order the demands first name them
}

// MissingItem is one item without a price.
type MissingItem struct {
	Item string      // item name as the first demand writes it
	Dims []units.Dim // dimensions the demands use it in (normally one)
	Uses []Use       // what it is used for, each use once
}

// Use is one purpose of a missing item.
type Use struct {
	Method string      // usage.Usage.Method
	Label  string      // usage.Demand.Label
	Group  usage.Group // usage.Demand.Group
}

// Error lists each missing item with its uses and a suggested CSV line,
// e.g.
//
//	prices.csv: 1 item has no price; add a line for it (fill in price, source and date):
//	  "silica gel", a mass, used for "stationary phase" (materials) in flash chromatography
//	    silica gel,kg,<price>,EUR,consumable,<source>,<date>
func (m *MissingPrices) Error() string {
	var b strings.Builder
	n := len(m.Items)
	if n == 1 {
		fmt.Fprintf(&b, "%s: 1 item has no price; add a line for it (fill in price, source and date):", m.File)
	} else {
		fmt.Fprintf(&b, "%s: %d items have no price; add a line for each (fill in price, source and date):", m.File, n)
	}
	for _, it := range m.Items {
		dims := make([]string, len(it.Dims))
		for i, d := range it.Dims {
			dims[i] = article(d)
		}
		fmt.Fprintf(&b, "\n  %q, %s, used for ", it.Item, strings.Join(dims, " and "))
		uses := make([]string, len(it.Uses))
		for i, u := range it.Uses {
			uses[i] = fmt.Sprintf("%q (%s)", u.Label, u.Group)
			if u.Method != "" {
				uses[i] += " in " + u.Method
			}
		}
		b.WriteString(strings.Join(uses, "; "))
		if len(it.Dims) > 1 {
			b.WriteString("; one price line serves one dimension, so give the uses different item names")
		}
		b.WriteString("\n    ")
		b.WriteString(m.Suggest(it))
	}
	return b.String()
}

// Unwrap returns ErrMissingPrice.
func (m *MissingPrices) Unwrap() error { return ErrMissingPrice }

// Suggest is a price-table line for a missing item, in the column order
// item,unit,price,currency,category,source,date, with placeholders where
// the user must supply the facts, e.g.
//
//	silica gel,kg,<price>,EUR,consumable,<source>,<date>
func (m *MissingPrices) Suggest(it MissingItem) string {
	unit, category, cur := "<unit>", "<category>", m.Currency
	if len(it.Dims) > 0 {
		if u, ok := suggestUnit[it.Dims[0]]; ok {
			unit = u
		}
	}
	if len(it.Uses) > 0 {
		if c, ok := suggestCategory[it.Uses[0].Group]; ok {
			category = c
		}
	}
	if cur == "" {
		cur = "<currency>"
	}
	var b strings.Builder
	w := csv.NewWriter(&b) // quotes names holding commas or quotes
	_ = w.Write([]string{it.Item, unit, "<price>", cur, category, "<source>", "<date>"})
	w.Flush()
	return strings.TrimSuffix(b.String(), "\n")
}

// suggestUnit is the usual price unit for each dimension (common practice
// of supplier catalogues, no source).
var suggestUnit = map[units.Dim]string{
	units.Mass:   "kg",
	units.Volume: "L",
	units.Count:  "each",
	units.Time:   "h",
	units.Energy: "kWh",
}

// suggestCategory is a category word for each ledger section.
var suggestCategory = map[usage.Group]string{
	usage.Materials:   "consumable",
	usage.Labour:      "labour",
	usage.Energy:      "energy",
	usage.Disposal:    "disposal",
	usage.ProductLoss: "product",
	usage.Credit:      "credit",
	usage.OneTime:     "equipment",
}

// missingSet gathers missing items across usages, each item once (names
// compared ignoring letter case and surrounding space) and each use once.
type missingSet struct {
	items []MissingItem
	index map[string]int // folded name → index in items
}

func (s *missingSet) add(method string, d usage.Demand) {
	if s.index == nil {
		s.index = map[string]int{}
	}
	key := strings.ToLower(strings.TrimSpace(d.Item))
	i, ok := s.index[key]
	if !ok {
		i = len(s.items)
		s.index[key] = i
		s.items = append(s.items, MissingItem{Item: strings.TrimSpace(d.Item)})
	}
	it := &s.items[i]
	hasDim := false
	for _, x := range it.Dims {
		hasDim = hasDim || x == d.Dim
	}
	if !hasDim {
		it.Dims = append(it.Dims, d.Dim)
	}
	u := Use{Method: method, Label: d.Label, Group: d.Group}
	for _, x := range it.Uses {
		if x == u {
			return
		}
	}
	it.Uses = append(it.Uses, u)
}

// err is the set as a *MissingPrices, or nil when nothing is missing.
func (s *missingSet) err(file, currency string) error {
	if len(s.items) == 0 {
		return nil
	}
	return &MissingPrices{File: file, Currency: currency, Items: s.items}
}
