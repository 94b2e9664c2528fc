package chrom

import "sepcost/costing/source"

func testCoefficients() source.Set {
	s := source.NewSet(Defaults())
	AddCalibration(s)
	return s
}

// testSite is a site like the built-in equipment table's: glass columns of
// 10–300 mm, steel columns of 450, 600 and 1000 mm, evaporators of 2, 10, 25
// and 150 L/h, no cartridges (those are tested on their own).
func testSite() Site {
	var s Site
	for _, d := range append(append([]float64{}, DefaultColumnsM...), 0.45, 0.60, 1.0) {
		s.Columns = append(s.Columns, SiteColumn{Name: "column", Diameter: d})
	}
	for _, r := range []float64{2, 10, 25, 150} {
		s.Evaporators = append(s.Evaporators, SiteEvaporator{Name: "evaporator", Rate: r * 1e-3 / 3600})
	}
	return s
}
