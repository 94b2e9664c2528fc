package workbook

import (
	"fmt"
	"strconv"
	"strings"
	"testing"
)

// The chromatography sheet of the demo shows the loading–recovery trade-off
// the model computed: its title, its header and one row per loading, with
// the values the usage holds (the writer only writes), and the loading
// chosen among the figures.
func TestTradeOffTableOnMethodSheet(t *testing.T) {
	t.Parallel()
	r := demoReport(t)
	u := r.Results[0][0].Usage
	if u.Method != "chromatography" || len(u.Tables) == 0 {
		t.Fatalf("%s: no table to show", u.Method)
	}
	tab := u.Tables[0]
	b, _ := render(t, r, Options{})
	sheet := onlySheets(dump(t, b), []string{"Chromatography"})
	if !strings.Contains(sheet, fmt.Sprintf("str %q bold", tab.Title)) {
		t.Fatalf("no heading %q on the sheet", tab.Title)
	}
	for _, h := range tab.Columns {
		if !strings.Contains(sheet, fmt.Sprintf("str %q", h)) {
			t.Errorf("no column %q", h)
		}
	}
	for _, row := range tab.Rows {
		// The dump writes 15 significant digits: compare the first seven.
		if s := strconv.FormatFloat(row[0], 'g', 15, 64); !strings.Contains(sheet, "num "+s[:8]) {
			t.Errorf("no row for silica : crude %v", row[0])
		}
	}
	if !strings.Contains(sheet, "silica : crude used (the loading chosen)") {
		t.Error("the loading chosen is not among the figures")
	}
}
