package solubility_test

import (
	"fmt"

	"sepcost/costing/solubility"
)

// A van 't Hoff line through two handbook points: benzoic acid in water,
// 3.4 g/L at 25 °C and 68.0 g/L at 95 °C (The Merck Index; the first
// confirmed at second hand, the second from memory).
func ExampleFit() {
	v, err := solubility.Fit([]solubility.Point{{T: 298.15, S: 3.4}, {T: 368.15, S: 68.0}})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("S(25 °C) = %.1f g/L, S(95 °C) = %.1f g/L\n", v.At(298.15), v.At(368.15))
	fmt.Printf("apparent enthalpy of solution %.1f kJ/mol\n", v.Enthalpy()/1000)
	// Output:
	// S(25 °C) = 3.4 g/L, S(95 °C) = 68.0 g/L
	// apparent enthalpy of solution 39.1 kJ/mol
}

// The ideal solubility of naphthalene at 25 °C from its melting point
// (353.3 K) and enthalpy of fusion (18.979 kJ/mol), next to the measured
// 0.2946 in benzene (IUPAC-NIST Solubility Database; all confirmed).
func ExampleIdealMoleFraction() {
	x := solubility.IdealMoleFraction(298.15, 353.3, 18979)
	fmt.Printf("x = %.3f\n", x)
	// Output: x = 0.303
}
