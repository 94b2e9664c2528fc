package prices_test

import (
	"fmt"
	"strings"

	"sepcost/costing/prices"
)

// The prices below are invented for the example.
func ExampleRead() {
	const csv = `# example prices (invented)
item,unit,price,currency,category,source,date
silica gel,kg,48.60,EUR,consumable,supplier quote,2025-01-15
ethyl acetate,L,12.40,EUR,solvent,catalogue,2025-01-15
chemist time,h,55.00,EUR,labour,site rate,
`
	t, err := prices.Read(strings.NewReader(csv), "prices.csv")
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, it := range t.Items {
		fmt.Printf("line %d: %s at %s %s per %s\n", it.Line, it.Name, it.Price.StringFixed(2), it.Currency, it.Unit)
	}
	i, ok := t.Find("Ethyl Acetate")
	fmt.Println(i, ok, prices.MinorUnits(t.Currency))
	// Output:
	// line 3: silica gel at 48.60 EUR per kg
	// line 4: ethyl acetate at 12.40 EUR per L
	// line 5: chemist time at 55.00 EUR per h
	// 1 true 2
}

// Every problem in the table is reported at once, each with its file, line
// and field.
func ExampleRead_errors() {
	const csv = `item,unit,price,currency,category,source,date
silica gel,kg,"48,60",EUR,consumable,,
ethyl acetate,litre,12.40,EUR,solvent,,
heptane,L,9.80,USD,solvent,,15.01.2025
`
	_, err := prices.Read(strings.NewReader(csv), "prices.csv")
	fmt.Println(err)
	// Output:
	// prices.csv:2: price: "48,60" is not a number; write a decimal such as 12.50
	// prices.csv:3: unit: "litre" is not a unit; write one of kg, g, L, mL, each, h, min, kWh, MJ
	// prices.csv:4: date: "15.01.2025" is not a date written YYYY-MM-DD, e.g. 2025-03-31; leave it empty if unknown
	// prices.csv: currency: one currency per run, but the table has EUR (lines 2, 3) and USD (line 4); convert every price to one currency
}
