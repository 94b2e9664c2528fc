package workbook

import (
	"fmt"

	"sepcost/costing/units"
	"sepcost/scale"
)

// buildSources lists every model coefficient with its value in its display
// unit, its mark and its source.
func buildSources(g *grid, st *styles, r *scale.Report) error {
	for c, h := range []string{"Method", "Key", "Label", "Value", "Unit", "Mark", "Source"} {
		g.text(1, c+1, h, st.header)
	}
	g.freeze(1, 2)
	g.widths[7] = maxWidth + 20
	for i, c := range r.Coefficients {
		row := i + 2
		v := c.SI
		if c.Unit != "" {
			var err error
			if v, err = units.To(c.SI, c.Unit); err != nil {
				return fmt.Errorf("workbook: coefficient %q (%s): display unit: %w", c.Key, c.Method, err)
			}
		}
		g.text(row, 1, c.Method, st.text)
		g.text(row, 2, c.Key, st.text)
		g.set(row, 3, cell{value: c.Label, style: st.wrap, wrap: true})
		g.num(row, 4, v, st.general)
		g.text(row, 5, c.Unit, st.text)
		g.text(row, 6, string(c.Mark), st.text)
		g.set(row, 7, cell{value: c.Source, style: st.wrap, wrap: true})
	}
	return nil
}
