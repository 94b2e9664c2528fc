package solvent_test

import (
	"fmt"

	"sepcost/costing/solvent"
	"sepcost/costing/units"
)

// Look a solvent up by its abbreviation, then ask for its vapour pressure
// on a rotary evaporator bath and its boiling point under vacuum.
func Example() {
	book := solvent.Builtin()
	s, ok := book.Find("EtOAc")
	if !ok {
		fmt.Println("not found")
		return
	}
	p, in := s.VaporPressure(units.MustFrom(40, "C"))
	T, _ := s.BoilingPointAt(units.MustFrom(200, "mbar"))
	fmt.Printf("%s (%s): M = %.2f g/mol, bp %.1f °C, flammable: %v\n",
		s.ID, s.Formula, s.MolarMass()*1000, units.MustTo(s.BoilingPoint.V, "C"), s.Flammable())
	fmt.Printf("vapour pressure at 40 °C: %.1f kPa (inside a fitted range: %v)\n", p/1000, in)
	fmt.Printf("boils at 200 mbar: %.1f °C\n", units.MustTo(T, "C"))
	fmt.Printf("heat to evaporate 1 kg: %.0f kJ\n", s.SpecificHVap()/1000)
	// Output:
	// ethyl acetate (C4H8O2): M = 88.11 g/mol, bp 77.1 °C, flammable: true
	// vapour pressure at 40 °C: 25.1 kPa (inside a fitted range: true)
	// boils at 200 mbar: 34.9 °C
	// heat to evaporate 1 kg: 363 kJ
}
