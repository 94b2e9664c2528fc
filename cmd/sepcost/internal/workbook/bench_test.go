package workbook

import (
	"archive/zip"
	"bytes"
	"fmt"
	"io"
	"testing"
	"time"

	"github.com/xuri/excelize/v2"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/scale"
	"sepcost/templates"
)

// benchMasses are the sweep sizes of the benchmarks.
var benchMasses = []int{250, 1000, 4000}

// BenchmarkSweepWorkbook writes the workbook of an invented sweep of one
// method (syntheticSweep: ledger lines, usage figures, green metrics) at
// each size: more masses than get detail sheets, so the Scale-up sheet
// carries every mass with its ledger quantities, ROUND formulas and three
// charts.
func BenchmarkSweepWorkbook(b *testing.B) {
	for _, n := range benchMasses {
		b.Run(fmt.Sprintf("masses=%d", n), func(b *testing.B) {
			r := syntheticSweep(n, 1)
			b.ReportAllocs()
			cpu := cpuTime()
			for b.Loop() {
				if err := Write(io.Discard, r, Options{}); err != nil {
					b.Fatal(err)
				}
			}
			reportCPU(b, cpu)
		})
	}
}

// reportCPU reports the processor time per operation since start (all
// threads: the clock time of a benchmark varies with the other work on
// the machine, the processor time much less).
func reportCPU(b *testing.B, start time.Duration) {
	if b.N > 0 && start > 0 {
		b.ReportMetric(float64(cpuTime()-start)/float64(b.N), "cpu-ns/op")
	}
}

// baselineCells is a workbook read back as the cells excelize's
// StreamWriter would be given: per sheet, per row, the values (numbers,
// text, formulas with cached values) and style ids.
type baselineSheet struct {
	name string
	rows map[int][]any
	last int
}

// readCells reads every cell of a written workbook, so that the baseline
// writes exactly the same cells.
func readCells(b testing.TB, data []byte) ([]baselineSheet, int, int) {
	refs, err := cellRefs(bytes.NewReader(data), int64(len(data)))
	if err != nil {
		b.Fatal(err)
	}
	f, err := excelize.OpenReader(bytes.NewReader(data))
	if err != nil {
		b.Fatal(err)
	}
	defer f.Close()
	var out []baselineSheet
	cells, maxStyle := 0, 0
	for _, name := range f.GetSheetList() {
		s := baselineSheet{name: name, rows: map[int][]any{}}
		// excelize reports a merged range's value in every cell of it;
		// the file holds it in the top-left cell only.
		hidden := map[string]bool{}
		merges, _ := f.GetMergeCells(name, true)
		for _, m := range merges {
			c1, r1, _ := excelize.CellNameToCoordinates(m.GetStartAxis())
			c2, r2, _ := excelize.CellNameToCoordinates(m.GetEndAxis())
			for r := r1; r <= r2; r++ {
				for c := c1; c <= c2; c++ {
					if r != r1 || c != c1 {
						hidden[cellName(c, r)] = true
					}
				}
			}
		}
		for _, p := range refs[name] {
			ref := cellName(p.col, p.row)
			v, _ := f.GetCellValue(name, ref, excelize.Options{RawCellValue: true})
			if hidden[ref] {
				v = ""
			}
			fo, _ := f.GetCellFormula(name, ref)
			typ, _ := f.GetCellType(name, ref)
			style, _ := f.GetCellStyle(name, ref)
			maxStyle = max(maxStyle, style)
			c := excelize.Cell{StyleID: style, Formula: fo}
			if typ == excelize.CellTypeNumber || typ == excelize.CellTypeUnset {
				var x float64
				if _, err := fmt.Sscan(v, &x); err == nil {
					c.Value = x
				} else if v != "" {
					c.Value = v
				}
			} else if v != "" {
				c.Value = v
			}
			row := s.rows[p.row]
			for len(row) < p.col {
				row = append(row, nil)
			}
			row[p.col-1] = c
			s.rows[p.row] = row
			s.last = max(s.last, p.row)
			cells++
		}
		out = append(out, s)
	}
	return out, cells, maxStyle
}

// BenchmarkStreamBaseline is excelize alone writing the same cells as
// BenchmarkSweepWorkbook at each size, read back from that workbook: the
// same sheets, rows, values, formulas and style ids, with the
// StreamWriter, and the file written. The sweep workbook should take at
// most 1.3 times as long.
func BenchmarkStreamBaseline(b *testing.B) {
	for _, n := range benchMasses {
		b.Run(fmt.Sprintf("masses=%d", n), func(b *testing.B) {
			var buf bytes.Buffer
			if err := Write(&buf, syntheticSweep(n, 1), Options{}); err != nil {
				b.Fatal(err)
			}
			sheets, cells, maxStyle := readCells(b, buf.Bytes())
			b.ReportAllocs()
			cpu := cpuTime()
			for b.Loop() {
				rawWrite(b, sheets, maxStyle)
			}
			reportCPU(b, cpu)
			b.ReportMetric(float64(cells), "cells") // after the loop: b.Loop's timer reset drops metrics reported before it
		})
	}
}

// rawWrite is excelize alone writing the cells readCells read back: as
// many number styles as the workbook has style ids, the sheets, each row
// through the StreamWriter, and the file to io.Discard, its parts
// deflated by the standard library as excelize does.
func rawWrite(b testing.TB, sheets []baselineSheet, maxStyle int) {
	rawWriteWith(b, sheets, maxStyle, false)
}

// rawWriteWith is rawWrite; sameDeflate deflates the parts with the
// writer's own compressor (pooledDeflate) instead.
func rawWriteWith(b testing.TB, sheets []baselineSheet, maxStyle int, sameDeflate bool) {
	f := excelize.NewFile()
	defer f.Close()
	for k := 0; k < maxStyle; k++ {
		fmtCode := fmt.Sprintf("0.%0*d", k%6+1, 0)
		if _, err := f.NewStyle(&excelize.Style{CustomNumFmt: &fmtCode}); err != nil {
			b.Fatal(err)
		}
	}
	for k, s := range sheets {
		if k == 0 {
			if err := f.SetSheetName("Sheet1", s.name); err != nil {
				b.Fatal(err)
			}
		} else if _, err := f.NewSheet(s.name); err != nil {
			b.Fatal(err)
		}
	}
	for _, s := range sheets {
		sw, err := f.NewStreamWriter(s.name)
		if err != nil {
			b.Fatal(err)
		}
		for row := 1; row <= s.last; row++ {
			if vals, ok := s.rows[row]; ok {
				if err := sw.SetRow(cellName(1, row), vals); err != nil {
					b.Fatal(err)
				}
			}
		}
		if err := sw.Flush(); err != nil {
			b.Fatal(err)
		}
	}
	if sameDeflate {
		f.SetZipWriter(func(w io.Writer) excelize.ZipWriter {
			zw := zip.NewWriter(w)
			zw.RegisterCompressor(zip.Deflate, pooledDeflate)
			return zw
		})
	}
	if err := f.Write(io.Discard); err != nil {
		b.Fatal(err)
	}
}

// BenchmarkWorkbookOverRaw pairs, in each iteration, the workbook of a
// real report (the demo; the solid demo swept over 200 and 1,000 masses)
// with excelize alone writing the same cells (rawWrite), and reports the
// ratio of their clock times summed over the iterations as "ratio": the
// machine's load falls on both alike. The target is at most 1.2. The two
// take turns going first. "cpu-ratio" is the same ratio of processor time
// (all threads, the garbage collector's included), which other programs
// on a shared machine disturb less; garbage one side leaves may still be
// collected while the other runs. "ratio-same-deflate" pairs the workbook
// with rawWrite deflating its parts as the writer does (pooledDeflate):
// what is left is the writer's own work and the library work the cells
// alone do not ask for (charts, styles, merges, page setup).
func BenchmarkWorkbookOverRaw(b *testing.B) {
	for _, c := range realCases {
		b.Run(c.name, func(b *testing.B) {
			r := c.report(b)
			var buf bytes.Buffer
			if err := Write(&buf, r, Options{}); err != nil {
				b.Fatal(err)
			}
			sheets, cells, maxStyle := readCells(b, buf.Bytes())
			var ours, raw, same, oursCPU, rawCPU, sameCPU time.Duration
			timed := func(clock, cpu *time.Duration, write func()) {
				c0, t0 := cpuTime(), time.Now()
				write()
				*clock += time.Since(t0)
				*cpu += cpuTime() - c0
			}
			writeOurs := func() {
				if err := Write(io.Discard, r, Options{}); err != nil {
					b.Fatal(err)
				}
			}
			writeRaw := func() { rawWrite(b, sheets, maxStyle) }
			writeSame := func() { rawWriteWith(b, sheets, maxStyle, true) }
			b.ReportAllocs()
			for k := 0; b.Loop(); k++ {
				// Each goes first in every other iteration, so that neither
				// is always the one to pay for the garbage the other left.
				if k%2 == 0 {
					timed(&ours, &oursCPU, writeOurs)
					timed(&raw, &rawCPU, writeRaw)
					timed(&same, &sameCPU, writeSame)
				} else {
					timed(&same, &sameCPU, writeSame)
					timed(&raw, &rawCPU, writeRaw)
					timed(&ours, &oursCPU, writeOurs)
				}
			}
			b.ReportMetric(float64(ours)/float64(raw), "ratio")
			if rawCPU > 0 {
				b.ReportMetric(float64(oursCPU)/float64(rawCPU), "cpu-ratio")
			}
			if same > 0 {
				b.ReportMetric(float64(ours)/float64(same), "ratio-same-deflate")
			}
			b.ReportMetric(float64(ours.Microseconds())/float64(b.N)/1000, "workbook-ms/op")
			b.ReportMetric(float64(raw.Microseconds())/float64(b.N)/1000, "raw-ms/op")
			b.ReportMetric(float64(cells), "cells")
		})
	}
}

// realCases are the reports the paired benchmarks write: the demo, and
// the solid demo swept over 200 and 1,000 masses.
var realCases = []struct {
	name   string
	report func(testing.TB) *scale.Report
}{
	{"demo", func(t testing.TB) *scale.Report {
		return demoReportOf(t, templates.Scenario, "built-in demo scenario")
	}},
	{"sweep200", func(t testing.TB) *scale.Report { return demoSweep(t, 200) }},
	{"sweep1000", func(t testing.TB) *scale.Report { return demoSweep(t, 1000) }},
}

// BenchmarkWorkbookWrite is the writer alone on the reports of
// BenchmarkWorkbookOverRaw (whose allocation figures count both sides):
// its time, processor time and allocations per workbook.
func BenchmarkWorkbookWrite(b *testing.B) {
	for _, c := range realCases {
		b.Run(c.name, func(b *testing.B) {
			r := c.report(b)
			b.ReportAllocs()
			cpu := cpuTime()
			for b.Loop() {
				if err := Write(io.Discard, r, Options{}); err != nil {
					b.Fatal(err)
				}
			}
			reportCPU(b, cpu)
		})
	}
}

// demoSweep is the solid demo swept over n log-spaced masses from 100 mg
// to 10 kg, as `sepcost sweep --points n` runs it.
func demoSweep(t testing.TB, n int) *scale.Report {
	sc, err := scenario.Load(bytes.NewReader(templates.Scenario), "demo")
	if err != nil {
		t.Fatal(err)
	}
	pt, err := prices.Read(bytes.NewReader(templates.Prices), "prices")
	if err != nil {
		t.Fatal(err)
	}
	p, err := costing.Prepare(sc)
	if err != nil {
		t.Fatal(err)
	}
	masses, err := scale.LogSpace(1e-4, 10, n)
	if err != nil {
		t.Fatal(err)
	}
	r, err := scale.SweepWith(p, pt, masses, scale.Options{})
	if err != nil {
		t.Fatal(err)
	}
	return r
}
