package workbook

import (
	"archive/zip"
	"encoding/xml"
	"fmt"
	"io"
	"path"
	"sort"
	"strconv"
	"strings"

	"github.com/xuri/excelize/v2"
)

// dumpWorkbook is a stable text dump of a workbook for golden tests: document
// properties and calculation setting, sheet names in order, then per sheet
// its frozen panes, column widths, row heights other than the default,
// merged ranges, every non-empty cell with its type, value, formula,
// number format and the bold and wrap flags, and its charts (anchor,
// title, series references, axes and their scales). It compares content,
// not zip bytes.
func dumpWorkbook(r io.ReaderAt, size int64) (string, error) {
	refs, err := cellRefs(r, size)
	if err != nil {
		return "", err
	}
	charts, err := sheetCharts(r, size)
	if err != nil {
		return "", err
	}
	f, err := excelize.OpenReader(io.NewSectionReader(r, 0, size))
	if err != nil {
		return "", fmt.Errorf("workbook: dump: %w", err)
	}
	defer f.Close()
	var b strings.Builder
	fmt.Fprintln(&b, "workbook")
	if p, err := f.GetDocProps(); err == nil {
		fmt.Fprintf(&b, "  creator %q, created %q, modified %q\n", p.Creator, p.Created, p.Modified)
	}
	if c, err := f.GetCalcProps(); err == nil {
		fmt.Fprintf(&b, "  full calculation on load: %v\n", c.FullCalcOnLoad != nil && *c.FullCalcOnLoad)
	}
	sheets := f.GetSheetList()
	q := make([]string, len(sheets))
	for i, s := range sheets {
		q[i] = strconv.Quote(s)
	}
	fmt.Fprintf(&b, "  sheets %s\n", strings.Join(q, ", "))
	styleText := map[int]string{}
	for i, sheet := range sheets {
		fmt.Fprintf(&b, "\nsheet %d %q\n", i+1, sheet)
		if err := dumpSheet(&b, f, sheet, refs[sheet], styleText); err != nil {
			return "", err
		}
		for _, line := range charts[sheet] {
			fmt.Fprintln(&b, line)
		}
	}
	return b.String(), nil
}

func dumpSheet(b *strings.Builder, f *excelize.File, sheet string, refs []cellPos, styleText map[int]string) error {
	wrap := func(err error) error { return fmt.Errorf("workbook: dump: sheet %s: %w", sheet, err) }
	p, err := f.GetPanes(sheet)
	if err != nil {
		return wrap(err)
	}
	if p.Freeze {
		fmt.Fprintf(b, "  frozen: %d rows, %d columns, top left %s\n", p.YSplit, p.XSplit, p.TopLeftCell)
	}
	if line, err := pageLine(f, sheet); err != nil {
		return wrap(err)
	} else if line != "" {
		fmt.Fprintln(b, line)
	}
	maxCol, maxRow := 0, 0
	for _, c := range refs {
		maxCol, maxRow = max(maxCol, c.col), max(maxRow, c.row)
	}
	var widths []string
	for col := 1; col <= maxCol; col++ {
		w, err := f.GetColWidth(sheet, colName(col))
		if err != nil {
			return wrap(err)
		}
		widths = append(widths, fmt.Sprintf("%s=%g", colName(col), w))
	}
	if len(widths) > 0 {
		fmt.Fprintf(b, "  widths %s\n", strings.Join(widths, " "))
	}
	var heights []string
	for row := 1; row <= maxRow; row++ {
		h, err := f.GetRowHeight(sheet, row)
		if err != nil {
			return wrap(err)
		}
		if h != lineHeight {
			heights = append(heights, fmt.Sprintf("%d=%g", row, h))
		}
	}
	if len(heights) > 0 {
		fmt.Fprintf(b, "  heights %s\n", strings.Join(heights, " "))
	}
	merges, err := f.GetMergeCells(sheet, true)
	if err != nil {
		return wrap(err)
	}
	var ms []string
	hidden := map[cellPos]bool{} // cells under a merge other than its top left
	for _, m := range merges {
		ms = append(ms, m.GetStartAxis()+":"+m.GetEndAxis())
		c1, r1, err1 := excelize.CellNameToCoordinates(m.GetStartAxis())
		c2, r2, err2 := excelize.CellNameToCoordinates(m.GetEndAxis())
		if err1 != nil || err2 != nil {
			continue
		}
		for r := r1; r <= r2; r++ {
			for c := c1; c <= c2; c++ {
				if r != r1 || c != c1 {
					hidden[cellPos{r, c}] = true
				}
			}
		}
	}
	sort.Strings(ms)
	if len(ms) > 0 {
		fmt.Fprintf(b, "  merged %s\n", strings.Join(ms, " "))
	}
	for _, c := range refs {
		if hidden[c] {
			// excelize reports the merged value for every cell of a merge.
			continue
		}
		ref := cellName(c.col, c.row)
		v, err := f.GetCellValue(sheet, ref, excelize.Options{RawCellValue: true})
		if err != nil {
			return wrap(err)
		}
		fo, err := f.GetCellFormula(sheet, ref)
		if err != nil {
			return wrap(err)
		}
		if v == "" && fo == "" {
			continue
		}
		t, err := f.GetCellType(sheet, ref)
		if err != nil {
			return wrap(err)
		}
		line := "  " + ref + " "
		switch t {
		case excelize.CellTypeUnset, excelize.CellTypeNumber:
			if v == "" {
				line += "empty"
			} else {
				line += "num " + v
			}
		case excelize.CellTypeBool:
			line += "bool " + v
		case excelize.CellTypeError:
			line += "error " + v
		case excelize.CellTypeDate:
			line += "date " + v
		default:
			line += "str " + strconv.Quote(v)
		}
		if fo != "" {
			line += " formula " + strconv.Quote(fo)
		}
		id, err := f.GetCellStyle(sheet, ref)
		if err != nil {
			return wrap(err)
		}
		s, ok := styleText[id]
		if !ok {
			if s, err = describeStyle(f, id); err != nil {
				return wrap(err)
			}
			styleText[id] = s
		}
		fmt.Fprintln(b, line+s)
	}
	return nil
}

// pageLine describes a page setup other than the default (portrait, at
// 100 %): the orientation and the pages it is fitted to.
func pageLine(f *excelize.File, sheet string) (string, error) {
	pl, err := f.GetPageLayout(sheet)
	if err != nil {
		return "", err
	}
	pr, err := f.GetSheetProps(sheet)
	if err != nil {
		return "", err
	}
	orient := "portrait"
	if pl.Orientation != nil {
		orient = *pl.Orientation
	}
	fit := pr.FitToPage != nil && *pr.FitToPage
	if orient == "portrait" && !fit {
		return "", nil
	}
	line := "  page: " + orient
	if fit {
		w, h := 1, 1
		if pl.FitToWidth != nil {
			w = *pl.FitToWidth
		}
		if pl.FitToHeight != nil {
			h = *pl.FitToHeight
		}
		line += fmt.Sprintf(", fitted to a width of %d page(s) and a height of %d (0: as many pages as needed)", w, h)
	}
	return line, nil
}

// describeStyle is the part of a cell style the dump shows.
func describeStyle(f *excelize.File, id int) (string, error) {
	st, err := f.GetStyle(id)
	if err != nil {
		return "", err
	}
	s := ""
	switch {
	case st.CustomNumFmt != nil:
		s += " format " + strconv.Quote(*st.CustomNumFmt)
	case st.NumFmt != 0:
		s += " format #" + strconv.Itoa(st.NumFmt)
	}
	if st.Font != nil && st.Font.Bold {
		s += " bold"
	}
	if st.Alignment != nil && st.Alignment.WrapText {
		s += " wrap"
	}
	return s, nil
}

type cellPos struct{ row, col int }

// cellRefs lists, per sheet name, the positions of all cells present in the
// sheet's XML, in row and column order. excelize reads values and formulas
// but does not list the cells of a sheet; a formula cell without a cached
// value would be missed by GetRows.
func cellRefs(r io.ReaderAt, size int64) (map[string][]cellPos, error) {
	files, sheets, err := packageSheets(r, size)
	if err != nil {
		return nil, err
	}
	out := map[string][]cellPos{}
	for _, s := range sheets {
		zf := files[s.part]
		if zf == nil {
			return nil, fmt.Errorf("workbook: dump: sheet %q has no part %q", s.name, s.part)
		}
		pos, err := sheetCells(zf)
		if err != nil {
			return nil, fmt.Errorf("workbook: dump: sheet %q: %w", s.name, err)
		}
		out[s.name] = pos
	}
	return out, nil
}

type sheetPart struct{ name, part string }

// packageSheets opens the zip and lists the sheets in workbook order with
// the names of their parts.
func packageSheets(r io.ReaderAt, size int64) (map[string]*zip.File, []sheetPart, error) {
	zr, err := zip.NewReader(r, size)
	if err != nil {
		return nil, nil, fmt.Errorf("workbook: dump: not an .xlsx (zip) file: %w", err)
	}
	files := map[string]*zip.File{}
	for _, zf := range zr.File {
		files[zf.Name] = zf
	}
	var wb struct {
		Sheets []struct {
			Name string `xml:"name,attr"`
			RID  string `xml:"http://schemas.openxmlformats.org/officeDocument/2006/relationships id,attr"`
		} `xml:"sheets>sheet"`
	}
	if err := decodeXML(files, "xl/workbook.xml", &wb); err != nil {
		return nil, nil, err
	}
	target, err := relTargets(files, "xl/workbook.xml")
	if err != nil {
		return nil, nil, err
	}
	var out []sheetPart
	for _, s := range wb.Sheets {
		out = append(out, sheetPart{s.Name, target[s.RID].target})
	}
	return files, out, nil
}

type relTarget struct{ target, typ string }

// relTargets reads the relationships of a part: id → target part (resolved
// against the part's folder) and type. A part without relationships has none.
func relTargets(files map[string]*zip.File, part string) (map[string]relTarget, error) {
	relsPath := path.Join(path.Dir(part), "_rels", path.Base(part)+".rels")
	out := map[string]relTarget{}
	if files[relsPath] == nil {
		return out, nil
	}
	var rels struct {
		Rels []struct {
			ID     string `xml:"Id,attr"`
			Target string `xml:"Target,attr"`
			Type   string `xml:"Type,attr"`
		} `xml:"Relationship"`
	}
	if err := decodeXML(files, relsPath, &rels); err != nil {
		return nil, err
	}
	for _, rel := range rels.Rels {
		t := rel.Target
		if strings.HasPrefix(t, "/") {
			t = strings.TrimPrefix(t, "/")
		} else {
			t = path.Join(path.Dir(part), t)
		}
		out[rel.ID] = relTarget{t, rel.Type}
	}
	return out, nil
}

// sheetCharts describes, per sheet name, the charts drawn on the sheet:
// anchor cells, title, chart type and style, how blanks show, each axis's
// position, title and logarithmic base, and each series' name, X and Y
// references and whether the X values are a number reference.
func sheetCharts(r io.ReaderAt, size int64) (map[string][]string, error) {
	files, sheets, err := packageSheets(r, size)
	if err != nil {
		return nil, err
	}
	out := map[string][]string{}
	for _, s := range sheets {
		rels, err := relTargets(files, s.part)
		if err != nil {
			return nil, err
		}
		ids := make([]string, 0, len(rels))
		for id := range rels {
			ids = append(ids, id)
		}
		sort.Strings(ids)
		for _, id := range ids {
			if !strings.HasSuffix(rels[id].typ, "/drawing") {
				continue
			}
			lines, err := drawingCharts(files, rels[id].target)
			if err != nil {
				return nil, fmt.Errorf("workbook: dump: sheet %q: %w", s.name, err)
			}
			out[s.name] = append(out[s.name], lines...)
		}
	}
	return out, nil
}

// drawingCharts describes the charts of one drawing part in anchor order.
func drawingCharts(files map[string]*zip.File, part string) ([]string, error) {
	type marker struct {
		Col int `xml:"col"`
		Row int `xml:"row"`
	}
	var dr struct {
		Anchors []struct {
			From  marker `xml:"from"`
			To    marker `xml:"to"`
			Chart struct {
				ID string `xml:"http://schemas.openxmlformats.org/officeDocument/2006/relationships id,attr"`
			} `xml:"graphicFrame>graphic>graphicData>chart"`
		} `xml:"twoCellAnchor"`
	}
	if err := decodeXML(files, part, &dr); err != nil {
		return nil, err
	}
	rels, err := relTargets(files, part)
	if err != nil {
		return nil, err
	}
	var out []string
	for _, a := range dr.Anchors {
		if a.Chart.ID == "" {
			continue
		}
		var c chartDump
		if err := decodeXML(files, rels[a.Chart.ID].target, &c); err != nil {
			return nil, err
		}
		out = append(out, fmt.Sprintf("  chart %s:%s %q", cellName(a.From.Col+1, a.From.Row+1), cellName(a.To.Col+1, a.To.Row+1), c.text(c.Chart.Title)))
		for _, sc := range c.Chart.PlotArea.Scatter {
			out = append(out, fmt.Sprintf("    scatter, style %s, blanks as %s", sc.Style.Val, c.Chart.Blanks.Val))
			for _, ser := range sc.Ser {
				x := ser.XVal.NumRef.F + " (numbers)"
				if ser.XVal.NumRef.F == "" {
					x = ser.XVal.StrRef.F + " (text)"
				}
				line := "no line"
				if ser.SpPr.Ln.NoFill == nil {
					line = "line"
				}
				out = append(out, fmt.Sprintf("    series name %s x %s y %s, %s, smooth %s", ser.Tx.F, x, ser.YVal.NumRef.F, line, ser.Smooth.Val))
			}
		}
		for _, ax := range c.Chart.PlotArea.ValAx {
			scale := "linear"
			if ax.Scaling.LogBase != nil {
				scale = "log base " + ax.Scaling.LogBase.Val
			}
			out = append(out, fmt.Sprintf("    value axis %s, %s, %q", ax.AxPos.Val, scale, c.text(ax.Title)))
		}
	}
	return out, nil
}

type chartVal struct {
	Val string `xml:"val,attr"`
}

type chartTitle struct {
	Runs []string `xml:"tx>rich>p>r>t"`
}

// chartDump is the part of a chart part that the dump shows.
type chartDump struct {
	Chart struct {
		Title    chartTitle `xml:"title"`
		Blanks   chartVal   `xml:"dispBlanksAs"`
		PlotArea struct {
			Scatter []struct {
				Style chartVal `xml:"scatterStyle"`
				Ser   []struct {
					Tx struct {
						F string `xml:"strRef>f"`
					} `xml:"tx"`
					SpPr struct {
						Ln struct {
							NoFill *struct{} `xml:"noFill"`
						} `xml:"ln"`
					} `xml:"spPr"`
					XVal struct {
						NumRef struct {
							F string `xml:"f"`
						} `xml:"numRef"`
						StrRef struct {
							F string `xml:"f"`
						} `xml:"strRef"`
					} `xml:"xVal"`
					YVal struct {
						NumRef struct {
							F string `xml:"f"`
						} `xml:"numRef"`
					} `xml:"yVal"`
					Smooth chartVal `xml:"smooth"`
				} `xml:"ser"`
			} `xml:"scatterChart"`
			ValAx []struct {
				AxPos   chartVal `xml:"axPos"`
				Scaling struct {
					LogBase *chartVal `xml:"logBase"`
				} `xml:"scaling"`
				Title chartTitle `xml:"title"`
			} `xml:"valAx"`
		} `xml:"plotArea"`
	} `xml:"chart"`
}

func (chartDump) text(t chartTitle) string { return strings.Join(t.Runs, "") }

func decodeXML(files map[string]*zip.File, name string, v any) error {
	zf := files[name]
	if zf == nil {
		return fmt.Errorf("workbook: dump: no %s in the file", name)
	}
	rc, err := zf.Open()
	if err != nil {
		return fmt.Errorf("workbook: dump: %s: %w", name, err)
	}
	defer rc.Close()
	if err := xml.NewDecoder(rc).Decode(v); err != nil {
		return fmt.Errorf("workbook: dump: %s: %w", name, err)
	}
	return nil
}

// sheetCells reads the row and column of every <c> element of a worksheet.
// Rows and cells without an r attribute follow the previous one.
func sheetCells(zf *zip.File) ([]cellPos, error) {
	rc, err := zf.Open()
	if err != nil {
		return nil, err
	}
	defer rc.Close()
	dec := xml.NewDecoder(rc)
	var out []cellPos
	row, col := 0, 0
	for {
		tok, err := dec.Token()
		if err == io.EOF {
			break
		}
		if err != nil {
			return nil, err
		}
		se, ok := tok.(xml.StartElement)
		if !ok {
			continue
		}
		switch se.Name.Local {
		case "row":
			row, col = row+1, 0
			for _, a := range se.Attr {
				if a.Name.Local == "r" {
					if n, err := strconv.Atoi(a.Value); err == nil {
						row = n
					}
				}
			}
		case "c":
			col++
			for _, a := range se.Attr {
				if a.Name.Local == "r" {
					c, r, err := excelize.CellNameToCoordinates(a.Value)
					if err != nil {
						return nil, err
					}
					col, row = c, r
				}
			}
			out = append(out, cellPos{row, col})
		}
	}
	sort.Slice(out, func(i, j int) bool {
		if out[i].row != out[j].row {
			return out[i].row < out[j].row
		}
		return out[i].col < out[j].col
	})
	return out, nil
}
