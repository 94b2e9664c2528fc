package workbook

import (
	"bytes"
	"fmt"
	"strings"
)

// Write a report and read back, from the dump, the Summary's total cost per
// batch mass: each is a formula on the method sheet's TOTAL with the
// ledger's total cached (hand computation in fixture_test.go).
func ExampleWrite() {
	var buf bytes.Buffer
	if err := Write(&buf, fixtureReport(), Options{}); err != nil {
		fmt.Println(err)
		return
	}
	d, err := dumpWorkbook(bytes.NewReader(buf.Bytes()), int64(buf.Len()))
	if err != nil {
		fmt.Println(err)
		return
	}
	summary := strings.Split(d, "\nsheet 2")[0]
	for _, line := range strings.Split(summary, "\n") {
		if strings.Contains(line, `formula "Chromatography!`) && strings.Contains(line, `41"`) {
			fmt.Println(strings.TrimSpace(line))
		}
	}
	// Output:
	// D10 num 119.71 formula "Chromatography!F41" format "#,##0.00 \"EUR\""
	// D11 num 758.57 formula "Chromatography!H41" format "#,##0.00 \"EUR\""
	// D12 num 51080.61 formula "Chromatography!J41" format "#,##0.00 \"EUR\""
}
