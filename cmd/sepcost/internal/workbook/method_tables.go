package workbook

import "sepcost/costing/usage"

// tables writes the small tables a model shows (e.g. chromatography's
// loading against recovery), once per table key, from the first mass that
// has it; the tables of the models are the same at every mass.
func (ms *methodSheet) tables() {
	seen := map[string]bool{}
	for _, res := range ms.res {
		for _, t := range res.Usage.Tables {
			if seen[t.Key] {
				continue
			}
			seen[t.Key] = true
			ms.table(t)
		}
	}
}

// table writes one table: a heading, a header row (right-aligned over
// the numbers) and the rows.
func (ms *methodSheet) table(t usage.Table) {
	g, st := ms.g, ms.st
	g.set(ms.row, 1, cell{value: t.Title, style: st.heading, spill: true})
	ms.row++
	for c, h := range t.Columns {
		g.text(ms.row, c+1, h, st.headerRight) // every column holds numbers
	}
	ms.row++
	for _, r := range t.Rows {
		for c, v := range r {
			g.num(ms.row, c+1, v, st.figure)
		}
		ms.row++
	}
	ms.row++
}
