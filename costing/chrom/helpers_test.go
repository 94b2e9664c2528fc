package chrom

import "sepcost/costing/source"

func testCoefficients() source.Set {
	s := source.NewSet(Defaults())
	AddCalibration(s)
	return s
}
