package main

import (
	"bytes"
	"io"

	"sepcost/cmd/sepcost/internal/plain"
	"sepcost/cmd/sepcost/internal/workbook"
	"sepcost/scale"
)

// format is an output format a command can write.
type format string

// The output formats.
const (
	formatXLSX format = "xlsx"
	formatJSON format = "json"
	formatCSV  format = "csv"
	formatText format = "text"
)

// formats lists every output format with the extension of its files, in
// the order help and messages name them.
var formats = []struct {
	f   format
	ext string
}{{formatXLSX, ".xlsx"}, {formatJSON, ".json"}, {formatCSV, ".csv"}, {formatText, ".txt"}}

// ext is the extension a file of the format takes ("" for none).
func (f format) ext() string {
	for _, e := range formats {
		if e.f == f {
			return e.ext
		}
	}
	return ""
}

// formatOfExt is the format a file's extension says it holds.
func formatOfExt(ext string) (format, bool) {
	for _, e := range formats {
		if e.ext == ext {
			return e.f, true
		}
	}
	return "", false
}

// renderers maps every format to the writer of one kind of output.
type renderers[T any] map[format]func(io.Writer, T) error

// render writes v in format f into a buffer.
func (rs renderers[T]) render(f format, v T) (*bytes.Buffer, error) {
	var buf bytes.Buffer
	return &buf, rs[f](&buf, v)
}

// The renderers of each kind of output: a report (estimate, sweep, demo),
// a waste forecast, a year's plan.
var (
	reportRenderers = renderers[*scale.Report]{
		formatXLSX: func(w io.Writer, r *scale.Report) error { return workbook.Write(w, r, workbook.Options{}) },
		formatJSON: plain.JSON, formatCSV: plain.CSV, formatText: plain.Text,
	}
	wasteRenderers = renderers[*scale.Report]{
		formatXLSX: workbook.WriteWaste, formatJSON: plain.WasteJSON, formatCSV: plain.WasteCSV, formatText: plain.WasteText,
	}
	portfolioRenderers = renderers[*scale.Portfolio]{
		formatXLSX: workbook.WritePortfolio, formatJSON: plain.PortfolioJSON, formatCSV: plain.PortfolioCSV, formatText: plain.PortfolioText,
	}
)
