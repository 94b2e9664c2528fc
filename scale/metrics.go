package scale

// metrics fills the green metrics of a row.
func metrics(row *Row, res Result) {
	u := res.Usage
	if u.Feasible && u.ProductOutKg > 0 {
		row.EFactor = u.WasteKg() / u.ProductOutKg
	}
}
