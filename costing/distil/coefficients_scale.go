package distil

import (
	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Coefficient keys of the times that scale with the still and the charge.
const (
	KeyTransferRate = "distillation.transfer_rate"
	KeyCleanPerArea = "distillation.cleanup_time_per_area"
	KeyPlantStill   = "distillation.plant_still_volume"
	KeyCrew         = "distillation.plant_crew"
)

// TimePerArea is the dimension of a time per wall area, s/m².
var TimePerArea = units.Dim{T: 1, L: -2}

// scaleDefaults are the coefficients of the scaling times, each with its
// source, mark and physical range (SI).
func scaleDefaults() []source.Coefficient {
	c := func(key, label string, si float64, dim units.Dim, unit, src string, mark source.Mark, lo, hi float64) source.Coefficient {
		return source.Coefficient{Key: key, Method: Method, Label: label, SI: si, Dim: dim, Unit: unit, Source: src, Mark: mark, Lo: lo, Hi: hi}
	}
	h, minute := 3600.0, 60.0
	return []source.Coefficient{
		c(KeyTransferRate, "rate of charging the still and draining the pot and receivers", 5e-3/minute, units.VolumeFlow, "L/min",
			"pouring or a vacuum transfer line, about 1–20 L/min", source.CommonPractice, 0.1e-3/minute, 200e-3/minute),
		c(KeyCleanPerArea, "cleaning time per m² of still wall, beyond distillation.cleanup_time", 1*h, TimePerArea, "h/m^2",
			"as for a crystallization reactor: boil-out, rinse and dry grow with the wetted wall", source.CommonPractice, 0, 10*h),
		c(KeyPlantStill, "still volume from which it is a jacketed plant still attended by a crew", 50e-3, units.Volume, "L",
			"glass stills up to 20 L are run by one chemist in a fume hood; 50 L and larger stand in a walk-in hood or a plant bay", source.CommonPractice, 1e-3, 10),
		c(KeyCrew, "operators attending a plant still's hands-on steps", 2, units.None, "",
			"two-person working for flammable liquids under vacuum at pilot scale", source.CommonPractice, 1, 6),
	}
}
