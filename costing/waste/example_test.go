package waste_test

import (
	"fmt"

	"sepcost/costing/solvent"
	"sepcost/costing/usage"
	"sepcost/costing/waste"
)

// Classify the spent eluent of a column run with 5 % methanol in
// dichloromethane (950 mL + 50 mL), as the EHS forecast would.
func ExampleClassify() {
	book := solvent.Builtin()
	dcm, _ := book.Find("DCM")
	meoh, _ := book.Find("MeOH")
	s := usage.Stream{Name: "spent eluent", Class: usage.Halogenated, VolumeM3: 1e-3,
		Components: []usage.Component{
			{Name: dcm.ID, Kg: 950e-6 * dcm.Density.V, Solvent: true},
			{Name: meoh.ID, Kg: 50e-6 * meoh.Density.V, Solvent: true},
			{Name: "impurities", Kg: 0.002},
		}}
	c := waste.Classify(s, book, waste.Pharmaceuticals)
	for _, k := range c.Codes {
		fmt.Printf("%-8s %-6s %s (%s)\n", k.Scheme, k.Code, k.Title, k.Mark)
	}
	// Output:
	// EU LoW   07 05 03* organic halogenated solvents, washing liquids and mother liquors (confirmed)
	// US EPA   F002   spent halogenated solvents (confirmed)
	// US EPA   F003   spent non-halogenated solvents (listed for ignitability only) (confirmed)
	// US EPA   D001   ignitable: liquid with a closed-cup flash point below 60 °C (confirmed)
}
