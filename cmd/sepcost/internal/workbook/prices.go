package workbook

import "sepcost/scale"

// priceCol is the Prices column that holds the unit price; item i of the
// price table sits in row i + 2, so formulas elsewhere can refer to
// Prices!$C$n and follow a user's edit of a price.
const priceCol = 3

// buildPrices lays out the price table, one row per item in file order.
func buildPrices(g *grid, st *styles, r *scale.Report) {
	for c, h := range []string{"Item", "Unit", "Price", "Category", "Source", "Date", "File line"} {
		g.text(1, c+1, h, st.header)
	}
	g.freeze(1, 1)
	banded := false
	for _, it := range r.Prices.Items {
		banded = banded || it.From != ""
	}
	if banded {
		g.text(1, 9, "From (price band)", st.header)
	}
	for i, it := range r.Prices.Items {
		row := i + 2
		g.text(row, 1, it.Label(), st.text)
		g.text(row, 2, it.Unit, st.text)
		g.num(row, priceCol, it.Price.InexactFloat64(), st.priceStyle(it.Price))
		// The price's number format carries the currency code
		// ("22.50 USD"); a column of codes beside it would say it twice.
		g.text(row, 4, it.Category, st.text)
		g.set(row, 5, cell{value: it.Source, style: st.wrap, wrap: true})
		g.text(row, 6, it.Date, st.text)
		if it.Line > 0 {
			g.num(row, 7, float64(it.Line), st.general)
		}
		if it.From != "" {
			g.text(row, 9, it.From, st.text)
		}
	}
	if r.Prices.File != "" {
		row := len(r.Prices.Items) + 3
		g.set(row, 1, cell{value: "Prices read from " + r.Prices.File + ". Edit a price here and every cost that uses it follows.",
			style: st.note, spill: true})
	}
}
