package scale

// metrics copies the green metrics of a feasible result into a row.
func metrics(row *Row, res Result) {
	if m := res.Metrics; m != nil {
		row.EFactor = m.EFactor
		row.PMI = m.PMI
	}
}
