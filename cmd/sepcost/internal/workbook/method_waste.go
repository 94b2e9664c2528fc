package workbook

import (
	"fmt"
	"strings"

	"sepcost/costing/units"
)

// waste writes the waste streams (name, class, kg, L) per mass and the
// total mass, a SUM formula whose cached value is usage.Usage.WasteKg.
func (ms *methodSheet) waste() {
	g, st := ms.g, ms.st
	ms.section("Waste streams", []string{"Stream", "Class"}, 0, [2]string{"kg", "L"})
	var rows union
	type kgL struct{ kg, l float64 }
	vals := make([]map[rowKey]kgL, len(ms.res))
	for i, res := range ms.res {
		if !ms.feasible(i) {
			continue
		}
		vals[i] = map[rowKey]kgL{}
		k := keyer{}
		for _, s := range res.Usage.Waste {
			key := k.key(s.Name, string(s.Class))
			rows.add(key)
			vals[i][key] = kgL{s.Kg(), units.MustTo(s.VolumeM3, "L")}
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
		g.text(ms.row, colLabel, key.b, st.text)
		for i := range ms.res {
			v, ok := vals[i][key]
			if !ok {
				continue
			}
			c := blockCol(i)
			g.num(ms.row, c, v.kg, st.kg)
			if !finite(v.kg) {
				bad[i] = true
			}
			if v.l != 0 {
				g.num(ms.row, c+1, v.l, st.litres)
			}
		}
		ms.row++
	}
	last := ms.row - 1
	g.text(ms.row, colTitle, "Total waste", st.bold)
	for i, res := range ms.res {
		if !ms.feasible(i) {
			continue
		}
		c := blockCol(i)
		kg := res.Usage.WasteKg()
		switch {
		case bad[i] || !finite(kg):
			g.text(ms.row, c, "n/a", st.bold)
		case len(rows.order) == 0:
			g.num(ms.row, c, kg, st.kgBold)
			ms.out[i].wasteKg = numCell{cellName(c, ms.row), kg, true}
		default:
			g.formula(ms.row, c, fmt.Sprintf("SUM(%s:%s)", cellName(c, first), cellName(c, last)), kg, st.kgBold)
			ms.out[i].wasteKg = numCell{cellName(c, ms.row), kg, true}
		}
	}
	ms.row += 2
}

// notes writes each mass's notes (assumptions, warnings, cautions) as plain text.
func (ms *methodSheet) notes() {
	g, st := ms.g, ms.st
	g.set(ms.row, 1, cell{value: "Notes", style: st.heading, spill: true})
	ms.row++
	last := max(blockCol(len(ms.res)-1)+1, 4)
	g.text(ms.row, 1, "Batch mass", st.header)
	g.text(ms.row, 2, "Level", st.header)
	g.text(ms.row, 3, "Note", st.header)
	for c := 4; c <= last; c++ {
		g.blank(ms.row, c, st.header)
	}
	ms.row++
	// A note the model makes at several masses in the same words is
	// written once, with those masses.
	type key struct{ level, text string }
	var order []key
	masses := map[key][]string{}
	for i, res := range ms.res {
		for _, n := range res.Usage.Notes {
			k := key{string(n.Level), n.Text}
			if _, ok := masses[k]; !ok {
				order = append(order, k)
			}
			masses[k] = append(masses[k], units.FormatMass(ms.r.MassesKg[i]))
		}
	}
	for _, k := range order {
		g.set(ms.row, 1, cell{value: strings.Join(masses[k], ", "), style: st.wrap, wrap: true})
		g.text(ms.row, 2, k.level, st.text)
		g.set(ms.row, 3, cell{value: k.text, style: st.wrap, wrap: true})
		for c := 4; c <= last; c++ {
			g.blank(ms.row, c, st.wrap)
		}
		g.merge(ms.row, 3, last)
		ms.row++
	}
	if len(order) == 0 {
		g.set(ms.row, 1, cell{value: "No notes.", style: st.note, spill: true})
	}
}
