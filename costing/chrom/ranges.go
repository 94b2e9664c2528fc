package chrom

// ranges bound the values a scenario may set, in SI, inclusive. They are
// physical limits, wider than the plausible range (common practice, no
// source, unless noted): a share lies in [0, 1]; a rate, density, size or
// efficiency that a model divides by is above zero; a time is not
// negative; a length or volume stays within what a laboratory or kilo-lab
// column can have. The two product losses are each at most a half, so that
// together they never exceed the product.
var ranges = map[string][2]float64{
	KeyBedMin:           {0.01, 2},      // m
	KeyBedMax:           {0.01, 2},      // m
	KeyBedDensity:       {100, 1400},    // kg/m³: below the least skeletal density, so that V0 = 1/ρb − 1/ρs > 0
	KeyPoreVolume:       {0.1e-3, 3e-3}, // m³/kg: porous silicas hold about 0.3–2 mL/g
	KeySkeletalDensity:  {1500, 3000},   // kg/m³: amorphous to crystalline silica
	KeyFrontVelocity:    {1e-5, 1e-2},   // m/s: 0.06–60 cm/min
	KeyEquilibrationCV:  {0, 20},        // column volumes
	KeyTailCV:           {0, 20},        // column volumes
	KeyFlushCV:          {0, 20},        // column volumes
	KeyTLCEvery:         {1, 100},       // fractions
	KeyLanes:            {1, 50},        // lanes on a plate
	KeyTLCSolvent:       {1e-6, 1e-3},   // m³: 1 mL to 1 L per plate
	KeyTLCTime:          {30, 7200},     // s: 30 s to 2 h
	KeyPackBase:         {0, 86400},     // s: up to a day
	KeyPackPerKg:        {0, 36000},     // s/kg: up to 10 h per kg
	KeyLoadTime:         {0, 86400},     // s
	KeyCleanTime:        {0, 86400},     // s
	KeyCombinePerFrac:   {0, 3600},      // s
	KeyEvapAttended:     {0, 1},         // share
	KeyHeaterEff:        {0.01, 1},      // share; never zero
	KeyChillerCOP:       {0.5, 10},      // small chillers 2–3; above 10 is beyond a real machine
	KeyBathDelta:        {0, 200},       // K
	KeyRetainedLoss:     {0, 0.5},       // share of the product
	KeyLoadSolventPerKg: {0, 0.1},       // m³/kg: up to 100 mL per g
	KeyDrySorbent:       {0.5, 20},      // kg silica per kg crude
	KeyDrySolventPerKg:  {0, 0.2},       // m³/kg: up to 200 mL per g
	KeySandHeight:       {0, 0.2},       // m
	KeySandDensity:      {1000, 2700},   // kg/m³: up to the density of quartz
	KeyPlateMass:        {1e-4, 0.1},    // kg per plate
	KeyRouteTolerance:   {1, 100},       // factor
	KeyQs:               {1e-4, 1},      // kg sample per kg silica: below the silica's own mass
}

// rangeOf returns the range of a key (zero when it has none).
func rangeOf(key string) (lo, hi float64) { return ranges[key][0], ranges[key][1] }
