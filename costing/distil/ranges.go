package distil

// ranges bound the values a scenario may set, in SI, inclusive. They are
// physical limits, wider than the plausible range (common practice, no
// source, unless noted): a share lies in [0, 1] or, where shares of one
// charge add up (fore-run, residue, hold-ups, cold trap), lower, so that
// together they never take more than the charge; a rate, density, heat
// capacity or efficiency that a model divides by is above zero; a time is
// not negative. A reflux multiple must exceed 1 and a relative volatility
// floor must exceed 1, or the Underwood minimum reflux and the Fenske
// minimum stages have no finite value.
var ranges = map[string][2]float64{
	KeyRefluxMultiple:  {1.01, 10},       // × R_min
	KeyDesignRecovery:  {0.5, 0.999},     // share of the product
	KeyMinAlpha:        {1.001, 10},      // relative volatility
	KeyFillLimit:       {0.05, 1},        // share of the still
	KeyPressureDrop:    {0, 5000},        // Pa per stage: up to 50 mbar
	KeyDeltaZ:          {0.5, 1},         // Z(vapour) − Z(liquid)
	KeyDefaultDensity:  {500, 3000},      // kg/m³
	KeyDefaultCp:       {500, 5000},      // J/(kg K)
	KeyForerun:         {0, 0.2},         // share of the charge
	KeyMinResidue:      {0, 0.2},         // share of the charge
	KeyHoldupHead:      {0, 0.05},        // share of the still volume
	KeyHoldupStage:     {0, 0.005},       // share of the still volume per stage
	KeyMaxHoldup:       {0.01, 0.5},      // share of the charge
	KeyColdTrap:        {0, 0.1},         // share of the distillate
	KeyBoilup:          {1e-9, 1e-4},     // m³/s for 1 L: 3.6 mL/h to 360 L/h; never zero
	KeyHeaterEff:       {0.01, 1},        // share; never zero
	KeyChillerCOP:      {0.5, 10},        // small chillers 2–3
	KeyPumpPower:       {0, 20000},       // W
	KeyRoomTemperature: {273.15, 313.15}, // K: 0–40 °C
	KeyCoolant:         {193.15, 313.15}, // K: −80 to 40 °C
	KeyCondenserMargin: {0, 100},         // K
	KeySetupTime:       {0, 172800},      // s: up to two days
	KeyEquilibration:   {0, 172800},      // s
	KeyCooldown:        {0, 172800},      // s
	KeyCleanup:         {0, 172800},      // s
	KeyAnalysisPerCut:  {0, 86400},       // s
	KeyAttended:        {0, 1},           // share
	KeyRinse:           {0, 2},           // share of the still volume
}

// rangeOf returns the range of a key (zero when it has none).
func rangeOf(key string) (lo, hi float64) { return ranges[key][0], ranges[key][1] }
