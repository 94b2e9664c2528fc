package units_test

import (
	"fmt"

	"sepcost/costing/units"
)

func ExampleParseAs() {
	kg, err := units.ParseAs("250 mg", units.Mass)
	fmt.Println(kg, err)
	_, err = units.ParseAs("250", units.Mass)
	fmt.Println(err)
	// Output:
	// 0.00025 <nil>
	// bad quantity: "250" has no unit; write a mass with its unit, e.g. "250 mg", "20 g", "2 kg"
}
