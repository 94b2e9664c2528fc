package cryst

import "regexp"

// ranges bound the values a scenario may set, in SI, inclusive. They are
// physical limits, wider than the plausible range (common practice, no
// source, unless noted): a share lies in [0, 1]; a rate, density, size,
// heat-transfer coefficient or efficiency that a model divides by is above
// zero; a time is not negative; a temperature difference is at most a few
// hundred kelvin.
var ranges = map[string][2]float64{
	KeyExcess:          {0, 5},           // share over the saturation volume
	KeyWashCakeVolumes: {0, 20},          // cake volumes
	KeyWashSaturation:  {0, 1},           // share of saturation
	KeyCrystalDensity:  {500, 5000},      // kg/m³: organic and inorganic crystals
	KeyCakePorosity:    {0.05, 0.95},     // share of the cake volume
	KeyCakeSaturation:  {0, 1},           // share of the pores
	KeyInclusion:       {0, 0.2},         // kg liquor per kg crystals
	KeyMaxPasses:       {1, 20},          // passes
	KeyExtrapolation:   {0, 200},         // K
	KeyDilution:        {1e-3, 1},        // m³/kg: 1 to 1000 mL per g
	KeySolidCp:         {300, 4000},      // J/(kg K): organic solids about 1000–1500
	KeyRoomT:           {273.15, 313.15}, // K: 0–40 °C
	KeyHeatApproach:    {0, 200},         // K
	KeyCoolApproach:    {0, 200},         // K
	KeyMaxCoolingRate:  {1.0 / 36000, 1}, // K/s: 0.1 K/h to 1 K/s; never zero
	KeyUFlask:          {10, 2000},       // W/(m² K)
	KeyUReactor:        {10, 2000},       // W/(m² K)
	KeyAreaFlask:       {1, 20},          // area over volume^(2/3)
	KeyAreaReactor:     {1, 20},          // area over volume^(2/3)
	KeyFlaskFill:       {0.05, 1},        // share of the volume
	KeyReactorFill:     {0.05, 1},        // share of the volume
	KeySetupTime:       {0, 172800},      // s: up to two days
	KeyHotHold:         {0, 172800},      // s
	KeyAging:           {0, 172800},      // s
	KeyHeatAttended:    {0, 1},           // share
	KeyCoolAttended:    {0, 1},           // share
	KeyFilterSetup:     {0, 172800},      // s
	KeyCakeDepth:       {0.002, 1},       // m
	KeyMinFilterArea:   {1e-4, 10},       // m²: 1 cm² to 10 m²
	KeyFilterAttended:  {0, 1},           // share
	KeyCheckTime:       {0, 172800},      // s
	KeyCleanTime:       {0, 172800},      // s
	KeyDryAttended:     {0, 1},           // share
	KeyDryWarmup:       {0, 200},         // K
	KeyHeaterEff:       {0.01, 1},        // share; never zero
	KeyChillerCOP:      {0.5, 10},        // small chillers 2–3
	KeyEvapAttended:    {0, 1},           // share
	KeyCropTime:        {0, 172800},      // s
	KeyCropAttended:    {0, 1},           // share
	KeyScreeningTime:   {0, 7.2e6},       // s: up to 2000 h, a year's work
	KeyScreeningMass:   {0, 10},          // kg
	"flask":            {1e-6, 0.1},      // m³: 1 mL to 100 L
	"reactor":          {1e-3, 100},      // m³: 1 L to 100 m³
}

// rangeOf returns the range of a key (zero when it has none); the numbered
// flask and reactor sizes share one range each.
func rangeOf(key string) (lo, hi float64) {
	if m := vesselKey.FindStringSubmatch(key); m != nil {
		key = m[1]
	}
	return ranges[key][0], ranges[key][1]
}

// vesselKey matches the keys KeyFlask and KeyReactor make.
var vesselKey = regexp.MustCompile(`^crystallization\.(flask|reactor)_\d+$`)
