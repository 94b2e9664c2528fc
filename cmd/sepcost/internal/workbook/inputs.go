package workbook

import "sepcost/scale"

// buildInputs echoes the scenario: each field as written and as understood.
func buildInputs(g *grid, st *styles, r *scale.Report) {
	for c, h := range []string{"Field", "As written", "Understood as"} {
		g.text(1, c+1, h, st.header)
	}
	g.freeze(1, 0)
	for i, in := range r.Inputs {
		row := i + 2
		g.text(row, 1, in.Field, st.text)
		g.set(row, 2, cell{value: in.Written, style: st.wrap, wrap: true})
		g.set(row, 3, cell{value: in.Meaning, style: st.wrap, wrap: true})
	}
}
