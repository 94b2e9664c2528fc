package usage

import "strings"

// FigureKey names a physical figure. The key is part of the output
// contract (the JSON "key", the Key column of a method sheet) and keeps its
// spelling. A unit suffix in a key (_l, _kg, _h) names the figure's
// display unit, Figure.Unit; Figure.SI always holds the value in SI (a
// volume in m³ under a key ending in _l). TestFigureKeySuffixes checks
// that every suffix agrees with the display unit.
type FigureKey string

// Figure keys read outside the model that writes them.
const (
	// FigSolventTotal is all the solvent a run uses: SI m³, shown in L.
	FigSolventTotal FigureKey = "solvent_total_l"
	// FigRatioUsed and FigRatioRule are chromatography's silica-to-crude
	// mass ratio used and the one its loading rule asks for.
	FigRatioUsed FigureKey = "ratio_used"
	FigRatioRule FigureKey = "ratio_rule"
	// FigImpurityInProduct is the nearest impurity isolated with the
	// product, kg (shown in g).
	FigImpurityInProduct FigureKey = "impurity_in_product"
	// FigJacketedReactor is 1 when a crystallization runs in a jacketed
	// reactor, 0 in a flask; FigVesselVolume that vessel's volume, m³.
	FigJacketedReactor FigureKey = "jacketed_reactor"
	FigVesselVolume    FigureKey = "vessel_volume"
)

// solventPrefix begins the key of one solvent's volume.
const solventPrefix = "solvent:"

// SolventFigure is the key of the volume of one solvent a run uses (SI m³,
// shown in L): "solvent:" and the solvent id.
func SolventFigure(id string) FigureKey { return FigureKey(solventPrefix + id) }

// PerSolvent reports whether the key is one solvent's volume.
func (k FigureKey) PerSolvent() bool { return strings.HasPrefix(string(k), solventPrefix) }
