package workbook

import (
	"fmt"
	"strconv"

	"sepcost/costing/units"
	"sepcost/scale"
)

// Sources columns.
const (
	srcKey   = iota + 1 // the coefficient's key, as a scenario's settings: name it
	srcLabel            // what it is
	srcValue            // value in its display unit
	srcUnit
	srcMark   // confirmed, derived, from memory, ...
	srcSource // its source, numbered at first use
)

// Widths that keep the Sources sheet one landscape page wide at a
// readable scale: labels and sources wrap beyond them.
const (
	srcLabelWidth  = 44
	srcSourceWidth = 64
)

// buildSources lists every model coefficient with its value in its display
// unit, its mark and its source, grouped by method under a heading row.
// Many coefficients share one source (a handbook table, a solvent guide):
// a source is written in full, numbered, at its first use, and later uses
// point to that number ("see [3]"), so that the sheet prints on a few
// pages rather than repeating long citations on every row.
func buildSources(g *grid, st *styles, r *scale.Report) error {
	heads := []string{"Key (settings: name)", "Coefficient", "Value", "Unit", "Mark", "Source"}
	for c, h := range heads {
		g.text(1, c+1, h, st.header)
	}
	g.freeze(1, 0)
	g.maxWidths[srcLabel] = srcLabelWidth
	g.maxWidths[srcSource] = srcSourceWidth
	number := map[string]int{}
	row := 2
	method := ""
	for _, c := range r.Coefficients {
		if c.Method != method || row == 2 {
			method = c.Method
			g.set(row, srcKey, cell{value: capitalize(method), style: st.heading, spill: true})
			row++
		}
		v := c.SI
		if c.Unit != "" {
			var err error
			if v, err = units.To(c.SI, c.Unit); err != nil {
				return fmt.Errorf("workbook: coefficient %q (%s): display unit: %w", c.Key, c.Method, err)
			}
		}
		src := c.Source
		if src == "" {
			src = "no source recorded"
		}
		if n, seen := number[src]; seen {
			src = "see [" + strconv.Itoa(n) + "]"
		} else {
			number[src] = len(number) + 1
			src = "[" + strconv.Itoa(len(number)) + "] " + src
		}
		g.text(row, srcKey, c.Key, st.text)
		g.set(row, srcLabel, cell{value: c.Label, style: st.wrapSmall, wrap: true, small: true})
		g.num(row, srcValue, v, st.general)
		g.text(row, srcUnit, unitLabel(c.Unit), st.text)
		g.text(row, srcMark, string(c.Mark), st.text)
		g.set(row, srcSource, cell{value: src, style: st.wrapSmall, wrap: true, small: true})
		row++
	}
	return nil
}
