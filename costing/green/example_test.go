package green_test

import (
	"fmt"

	"sepcost/costing/green"
	"sepcost/costing/solvent"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// Green metrics of a recrystallization of 1 kg crude from 10 L ethanol
// that recovers 0.8 kg; the mother liquor is the only waste.
func ExampleCompute() {
	book := solvent.Builtin()
	etoh, _ := book.Find("ethanol")
	u := usage.Usage{Method: "crystallization", CrudeKg: 1, ProductOutKg: 0.8,
		Demands: []usage.Demand{{Item: "ethanol", Group: usage.Materials, Qty: 10e-3, Dim: units.Volume}},
		Waste: []usage.Stream{{Name: "mother liquor", Class: usage.NonHalogenated, Components: []usage.Component{
			{Name: "ethanol", Kg: 10e-3 * etoh.Density.V, Solvent: true},
			{Name: "impurities and lost product", Kg: 0.2},
		}}}}
	m, err := green.Compute(u, book)
	if err != nil {
		fmt.Println(err)
		return
	}
	c, _ := green.Class("ethanol")
	fmt.Printf("E = %.2f, PMI = %.2f, solvent intensity %.2f kg/kg, ethanol is %s (CHEM21)\n", m.EFactor, m.PMI, m.SolventIntensity, c)
	// Output:
	// E = 10.11, PMI = 11.11, solvent intensity 9.86 kg/kg, ethanol is recommended (CHEM21)
}

// Replacements for dichloromethane in a flash column.
func ExampleSubstitutes() {
	for _, s := range green.Substitutes("dichloromethane", green.Chromatography) {
		fmt.Println(s.Replace, s.Mark)
	}
	// Output:
	// [n-heptane ethyl acetate ethanol] from memory
	// [ethyl acetate n-heptane] from memory
}
