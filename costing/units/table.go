package units

// unit is one named unit: its dimension, its factor to SI and, for
// temperatures, an offset (SI value = factor × value + offset).
type unit struct {
	dim    Dim
	factor float64
	offset float64
}

// Conversion factors are exact by definition (SI Brochure, 9th ed., 2019,
// and NIST SP 811, 2008, Appendix B) unless marked.
var table = map[string]unit{
	// mass
	"ug": {Mass, 1e-9, 0}, "µg": {Mass, 1e-9, 0}, "mg": {Mass, 1e-6, 0}, "g": {Mass, 1e-3, 0},
	"kg": {Mass, 1, 0}, "t": {Mass, 1000, 0},
	// length
	"um": {Length, 1e-6, 0}, "µm": {Length, 1e-6, 0}, "mm": {Length, 1e-3, 0}, "cm": {Length, 1e-2, 0},
	"m": {Length, 1, 0}, "in": {Length, 0.0254, 0},
	// volume
	"uL": {Volume, 1e-9, 0}, "µL": {Volume, 1e-9, 0}, "mL": {Volume, 1e-6, 0}, "L": {Volume, 1e-3, 0},
	"l": {Volume, 1e-3, 0}, "ml": {Volume, 1e-6, 0}, "m3": {Volume, 1, 0}, "gal": {Volume, 3.785411784e-3, 0},
	// time
	"s": {Time, 1, 0}, "min": {Time, 60, 0}, "h": {Time, 3600, 0}, "d": {Time, 86400, 0},
	// temperature (absolute scales; "C" and "°C" are Celsius)
	"K": {Temperature, 1, 0}, "C": {Temperature, 1, 273.15}, "°C": {Temperature, 1, 273.15},
	"degC": {Temperature, 1, 273.15},
	// amount
	"mol": {Amount, 1, 0}, "mmol": {Amount, 1e-3, 0}, "kmol": {Amount, 1e3, 0},
	// count
	"each": {Count, 1, 0}, "ea": {Count, 1, 0}, "pcs": {Count, 1, 0},
	// energy
	"J": {Energy, 1, 0}, "kJ": {Energy, 1e3, 0}, "MJ": {Energy, 1e6, 0}, "Wh": {Energy, 3600, 0},
	"kWh": {Energy, 3.6e6, 0}, "cal": {Energy, 4.184, 0}, "kcal": {Energy, 4184, 0},
	// power
	"W": {Power, 1, 0}, "kW": {Power, 1e3, 0},
	// pressure
	"Pa": {Pressure, 1, 0}, "kPa": {Pressure, 1e3, 0}, "MPa": {Pressure, 1e6, 0}, "bar": {Pressure, 1e5, 0},
	"mbar": {Pressure, 100, 0}, "atm": {Pressure, 101325, 0}, "Torr": {Pressure, 101325.0 / 760, 0},
	"torr": {Pressure, 101325.0 / 760, 0},
	// mmHg: 133.322387415 Pa (NIST SP 811, 2008, B.8); differs from the torr by < 1 ppm
	"mmHg": {Pressure, 133.322387415, 0},
	// plain numbers
	"%": {None, 0.01, 0}, "1": {None, 1, 0},
}
