package workbook

import (
	"fmt"

	"sepcost/costing/units"
)

// time writes the activities with elapsed and attended hours per mass and
// their totals. A total is a SUM formula whose cached value is
// usage.Usage.Hours; where any hour is not a finite number the total is
// "n/a" rather than a SUM over a text cell.
func (ms *methodSheet) time() {
	g, st := ms.g, ms.st
	ms.section("Time", []string{"Activity"}, 0, [2]string{"Elapsed h", "Hands-on h"})
	var rows union
	vals := make([]map[rowKey][2]float64, len(ms.res))
	for i, res := range ms.res {
		if !ms.feasible(i) {
			continue
		}
		vals[i] = map[rowKey][2]float64{}
		k := keyer{}
		for _, a := range res.Usage.Activities {
			key := k.key(a.Name, "")
			rows.add(key)
			vals[i][key] = [2]float64{units.MustTo(a.Elapsed, "h"), units.MustTo(a.Attended, "h")}
		}
	}
	first := ms.row
	bad := make([]bool, len(ms.res))
	for _, key := range rows.order {
		label := key.a
		if key.n > 0 {
			label = fmt.Sprintf("%s (%d)", key.a, key.n+1)
		}
		g.text(ms.row, colTitle, label, st.text)
		for i := range ms.res {
			v, ok := vals[i][key]
			if !ok {
				continue
			}
			for k := 0; k < 2; k++ {
				g.num(ms.row, blockCol(i)+k, v[k], st.hours)
				if !finite(v[k]) {
					bad[i] = true
				}
			}
		}
		ms.row++
	}
	last := ms.row - 1
	g.text(ms.row, colTitle, "Total hours", st.bold)
	for i, res := range ms.res {
		if !ms.feasible(i) {
			continue
		}
		el, at := res.Usage.Hours()
		for k, v := range []float64{el, at} {
			c := blockCol(i) + k
			nc := numCell{ok: false}
			switch {
			case bad[i] || !finite(v):
				g.text(ms.row, c, "n/a", st.bold)
			case len(rows.order) == 0:
				g.num(ms.row, c, v, st.hoursBold)
				nc = numCell{cellName(c, ms.row), v, true}
			default:
				g.formula(ms.row, c, fmt.Sprintf("SUM(%s:%s)", cellName(c, first), cellName(c, last)), v, st.hoursBold)
				nc = numCell{cellName(c, ms.row), v, true}
			}
			if k == 0 {
				ms.out[i].elapsed = nc
			} else {
				ms.out[i].attended = nc
			}
		}
	}
	ms.row += 2
}
