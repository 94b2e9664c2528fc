package workbook

import (
	"bytes"
	"encoding/csv"
	"fmt"
	"io"
	"strconv"
	"strings"

	"github.com/xuri/excelize/v2"

	"sepcost/costing/prices"
)

// Limits of a price workbook: a price list is a few hundred lines, so a
// file or a sheet far larger than these is not one (or is a workbook with
// much else in it) and is refused before it fills the memory.
const (
	MaxPriceBookBytes = 20 << 20  // the .xlsx file as stored
	maxPriceUnzipped  = 200 << 20 // all its parts unzipped
	maxPriceSheetXML  = 64 << 20  // one worksheet's XML
	MaxPriceRows      = 10_000    // rows of the price sheet, header and blank rows included
)

// ReadPrices reads a price table from one sheet of a site's .xlsx
// workbook, with the same columns, checks and messages as the CSV table
// (prices.Read): the sheet is turned into CSV records row by row and read
// by prices.Read, so every problem names the file and sheet, the row (as
// the line) and the column, as in "prices.xlsx!Solvents:12: price: ...".
//
// sheet names the sheet; "" takes the first. Cells are read as stored,
// without their number format: a formula is read as its cached result
// (the value the spreadsheet program last calculated; a formula never
// calculated reads as empty), a price as the number stored (rounded to the
// 15 significant digits a spreadsheet keeps), a date cell as its calendar
// date. A line break inside a cell becomes a space, so rows stay lines.
func ReadPrices(r io.Reader, file, sheet string) (*prices.Table, error) {
	b, err := io.ReadAll(io.LimitReader(r, MaxPriceBookBytes+1))
	if err != nil {
		return nil, fmt.Errorf("%s: %w", file, err)
	}
	if len(b) > MaxPriceBookBytes {
		return nil, fmt.Errorf("%s: larger than %d MiB; a price workbook is far smaller: save the price list on its own, or as CSV", file, MaxPriceBookBytes>>20)
	}
	f, err := excelize.OpenReader(bytes.NewReader(b), excelize.Options{UnzipSizeLimit: maxPriceUnzipped, UnzipXMLSizeLimit: maxPriceSheetXML})
	if err != nil {
		return nil, fmt.Errorf("%s: not a readable .xlsx workbook (%v); save it from the spreadsheet program as .xlsx, or the price sheet as CSV", file, err)
	}
	defer f.Close()
	sheets := f.GetSheetList()
	if sheet == "" && len(sheets) > 0 {
		sheet = sheets[0]
	}
	found := false
	for _, s := range sheets {
		found = found || s == sheet
	}
	if !found {
		return nil, fmt.Errorf("%s: no sheet %q; the sheets are %s (name one with --prices-sheet)", file, sheet, quoteAll(sheets))
	}
	recs, err := sheetRecords(f, file, sheet)
	if err != nil {
		return nil, err
	}
	var buf bytes.Buffer
	w := csv.NewWriter(&buf)
	if err := w.WriteAll(recs); err != nil {
		return nil, fmt.Errorf("%s!%s: %w", file, sheet, err)
	}
	return prices.Read(&buf, file+"!"+sheet)
}

// sheetRecords reads the rows of the sheet as CSV records, one per row
// from row 1, padded to the widest row, with the price and date columns
// (found in the header, the first row whose first cell is not empty and
// not a comment) in the forms prices.Read reads.
func sheetRecords(f *excelize.File, file, sheet string) ([][]string, error) {
	rows, err := f.Rows(sheet)
	if err != nil {
		return nil, fmt.Errorf("%s!%s: %w", file, sheet, err)
	}
	defer rows.Close()
	var recs [][]string
	width := 0
	for rows.Next() {
		if len(recs) == MaxPriceRows {
			return nil, fmt.Errorf("%s!%s: more than %d rows; a price list is far shorter: put it on a sheet of its own", file, sheet, MaxPriceRows)
		}
		cols, err := rows.Columns(excelize.Options{RawCellValue: true})
		if err != nil {
			return nil, fmt.Errorf("%s!%s: row %d: %w", file, sheet, len(recs)+1, err)
		}
		for k := range cols {
			cols[k] = strings.Join(strings.Fields(cols[k]), " ")
		}
		width = max(width, len(cols))
		recs = append(recs, cols)
	}
	if err := rows.Error(); err != nil {
		return nil, fmt.Errorf("%s!%s: %w", file, sheet, err)
	}
	for k := range recs {
		for len(recs[k]) < width {
			recs[k] = append(recs[k], "")
		}
	}
	head := -1
	for k, rec := range recs {
		if len(rec) > 0 && rec[0] != "" && !strings.HasPrefix(rec[0], "#") {
			head = k
			break
		}
	}
	if head < 0 {
		return recs, nil
	}
	date1904 := false
	if p, err := f.GetWorkbookProps(); err == nil && p.Date1904 != nil {
		date1904 = *p.Date1904
	}
	for c, h := range recs[head] {
		switch strings.ToLower(strings.TrimSpace(h)) {
		case "price":
			for _, rec := range recs[head+1:] {
				rec[c] = plainNumber(rec[c])
			}
		case "date":
			for _, rec := range recs[head+1:] {
				rec[c] = calendarDate(rec[c], date1904)
			}
		}
	}
	return recs, nil
}

// plainNumber writes a stored number as a plain decimal ("1E-3" as
// "0.001", 12.300000000000001 as "12.3"); other text is left as it is for
// prices.Read to judge.
func plainNumber(s string) string {
	v, err := strconv.ParseFloat(s, 64)
	if err != nil || !finite(v) {
		return s
	}
	return strconv.FormatFloat(round15(v), 'f', -1, 64)
}

// calendarDate writes a date stored as a spreadsheet serial day number as
// YYYY-MM-DD; other text is left as it is.
func calendarDate(s string, date1904 bool) string {
	v, err := strconv.ParseFloat(s, 64)
	if err != nil || !finite(v) || v < 1 {
		return s
	}
	t, err := excelize.ExcelDateToTime(v, date1904)
	if err != nil {
		return s
	}
	return t.Format("2006-01-02")
}

// quoteAll writes names quoted and separated by commas.
func quoteAll(names []string) string {
	q := make([]string, len(names))
	for k, n := range names {
		q[k] = strconv.Quote(n)
	}
	return strings.Join(q, ", ")
}
