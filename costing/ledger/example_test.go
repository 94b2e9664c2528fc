package ledger_test

import (
	"fmt"
	"strings"

	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Prices invented for the example. Source for the amounts: hand
// computation, shown beside each demand.
func ExamplePrice() {
	t, err := prices.Read(strings.NewReader(`item,unit,price,currency,category,source,date
silica gel,kg,48.60,EUR,consumable,example,
ethyl acetate,L,12.40,EUR,solvent,example,
chemist time,h,55.00,EUR,labour,example,
`), "prices.csv")
	if err != nil {
		fmt.Println(err)
		return
	}
	u := usage.Usage{Method: "flash chromatography", Demands: []usage.Demand{
		{Item: "silica gel", Label: "stationary phase", Group: usage.Materials,
			Qty: units.MustFrom(350, "g"), Dim: units.Mass}, // 0.35 kg × 48.60 = 17.01
		{Item: "ethyl acetate", Label: "eluent", Group: usage.Materials,
			Qty: units.MustFrom(125, "mL"), Dim: units.Volume}, // 0.125 L × 12.40 = 1.55
		{Item: "chemist time", Label: "running the column", Group: usage.Labour,
			Qty: units.MustFrom(45, "min"), Dim: units.Time}, // 0.75 h × 55.00 = 41.25
		{Item: "ethyl acetate", Label: "solvent recovered", Group: usage.Credit,
			Qty: units.MustFrom(-0.1, "L"), Dim: units.Volume}, // −0.1 L × 12.40 = −1.24
	}}
	l, err := ledger.Price(u, t)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, ln := range l.Lines {
		fmt.Printf("%-20s %8s %-2s × %6s = %7s\n", ln.Demand.Label, ln.Qty, ln.Unit, ln.UnitPrice.StringFixed(l.Places), ln.Amount.StringFixed(l.Places))
	}
	fmt.Printf("%-20s %39s %s\n", "materials", l.Subtotal(usage.Materials).StringFixed(l.Places), l.Currency)
	fmt.Printf("%-20s %39s %s\n", "total", l.Total.StringFixed(l.Places), l.Currency)
	// Output:
	// stationary phase         0.35 kg ×  48.60 =   17.01
	// eluent                  0.125 L  ×  12.40 =    1.55
	// running the column       0.75 h  ×  55.00 =   41.25
	// solvent recovered        -0.1 L  ×  12.40 =   -1.24
	// materials                                              18.56 EUR
	// total                                                  58.57 EUR
}

// A demand whose item is not in the table is reported with its use and a
// line to add to the table.
func ExampleMissingPrices() {
	t, _ := prices.Read(strings.NewReader("item,unit,price,currency,category,source,date\nsilica gel,kg,48.60,EUR,,,\n"), "prices.csv")
	u := usage.Usage{Method: "recrystallization", Demands: []usage.Demand{
		{Item: "heptane", Label: "antisolvent", Group: usage.Materials, Qty: 2e-3, Dim: units.Volume},
	}}
	_, err := ledger.Price(u, t)
	fmt.Println(err)
	// Output:
	// prices.csv: 1 item has no price; add a line for it (fill in price, source and date):
	//   "heptane", a volume, used for "antisolvent" (materials) in recrystallization
	//     heptane,L,<price>,EUR,consumable,<source>,<date>
}
