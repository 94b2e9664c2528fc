// Package units parses and formats physical quantities written with their
// units ("20 g", "1.5 kg", "500 mL", "78 C", "5 cm/min") and keeps them in SI
// inside the program.
//
// Quantities in files a user writes always carry a unit; a bare number where
// a unit is needed is an error that lists the units accepted for that field.
package units

import (
	"fmt"
	"strings"
)

// Dim is a physical dimension as integer exponents of the SI base
// quantities the project needs: mass, length, time, temperature, amount of
// substance, and a count of discrete items ("each").
type Dim struct {
	M, L, T, K, N, Each int8
}

// Common dimensions.
var (
	None        = Dim{}
	Mass        = Dim{M: 1}
	Length      = Dim{L: 1}
	Volume      = Dim{L: 3}
	Area        = Dim{L: 2}
	Time        = Dim{T: 1}
	Temperature = Dim{K: 1}
	Amount      = Dim{N: 1}
	Count       = Dim{Each: 1}
	Energy      = Dim{M: 1, L: 2, T: -2}
	Power       = Dim{M: 1, L: 2, T: -3}
	Pressure    = Dim{M: 1, L: -1, T: -2}
	Velocity    = Dim{L: 1, T: -1}
	Density     = Dim{M: 1, L: -3}
	// SpecificVolume is volume per mass, e.g. a pore volume in mL/g.
	SpecificVolume = Dim{M: -1, L: 3}
	// VolumeFlow is volume per time, e.g. an evaporation rate in L/h.
	VolumeFlow = Dim{L: 3, T: -1}
	// MolarEnergy is energy per mole, e.g. an enthalpy of vaporization.
	MolarEnergy = Dim{M: 1, L: 2, T: -2, N: -1}
	// MolarHeatCapacity is energy per mole and kelvin.
	MolarHeatCapacity = Dim{M: 1, L: 2, T: -2, N: -1, K: -1}
	// MolarMass is mass per mole.
	MolarMass = Dim{M: 1, N: -1}
	// TimePerMass is, e.g., hours of work per kilogram handled.
	TimePerMass = Dim{T: 1, M: -1}
	// VolumePerArea is, e.g., litres of solvent per square metre.
	VolumePerArea = Dim{L: 1}
)

func (d Dim) mul(o Dim, sign int8) Dim {
	return Dim{d.M + sign*o.M, d.L + sign*o.L, d.T + sign*o.T, d.K + sign*o.K, d.N + sign*o.N, d.Each + sign*o.Each}
}

func (d Dim) pow(p int8) Dim {
	return Dim{d.M * p, d.L * p, d.T * p, d.K * p, d.N * p, d.Each * p}
}

// Name is a plain word for the common dimensions, else the exponents.
func (d Dim) Name() string {
	for _, n := range dimNames {
		if n.d == d {
			return n.name
		}
	}
	var parts []string
	add := func(sym string, e int8) {
		if e != 0 {
			parts = append(parts, fmt.Sprintf("%s^%d", sym, e))
		}
	}
	add("kg", d.M)
	add("m", d.L)
	add("s", d.T)
	add("K", d.K)
	add("mol", d.N)
	add("each", d.Each)
	return strings.Join(parts, "·")
}

var dimNames = []struct {
	d    Dim
	name string
}{
	{None, "a plain number"}, {Mass, "mass"}, {Length, "length"}, {Volume, "volume"}, {Area, "area"},
	{Time, "time"}, {Temperature, "temperature"}, {Amount, "amount of substance"}, {Count, "count"},
	{Energy, "energy"}, {Power, "power"}, {Pressure, "pressure"}, {Velocity, "velocity"},
	{Density, "density"}, {SpecificVolume, "volume per mass"}, {VolumeFlow, "volume flow"},
	{MolarEnergy, "molar energy"}, {MolarHeatCapacity, "molar heat capacity"}, {MolarMass, "molar mass"},
	{TimePerMass, "time per mass"},
}
