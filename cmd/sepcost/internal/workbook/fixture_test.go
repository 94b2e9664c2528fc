package workbook

import (
	"fmt"

	"github.com/shopspring/decimal"

	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale"
)

// The fixtures are built by hand, independent of the models and of the
// ledger pricing: the physical quantities are shaped after Still, W. C.;
// Kahn, M.; Mitra, A. "Rapid chromatographic technique for preparative
// separations with moderate resolution", J. Org. Chem. 1978, 43, 2923,
// Table 1 (20 mm column, 200 mL eluent and 10 mL fractions for a few
// hundred mg at ΔRf ≥ 0.2; loads scale with d²), with silica : sample
// ≈ 60 : 1 (derived from the same table for a 15 cm bed packed at
// 0.5 g/mL), and every
// ledger amount and total is a hand computation, written out beside it:
// amount = qty × unit price rounded half away from zero to the cent
// (DEVELOPERS.md, "Money").

// Solvent densities at 20 °C used to turn eluent volumes into waste masses:
// ethyl acetate 0.902 g/mL, n-heptane 0.684 g/mL (CRC Handbook of Chemistry
// and Physics, "Physical Constants of Organic Compounds"; from memory).
// Solvent held in the spent silica: 0.75 mL per g of silica, the pore
// volume of flash silica, 40–63 µm (from memory).

// fixturePrices is an example price table in EUR, invented for this test
// (not quotes). Item i sits on Prices row i + 2.
func fixturePrices() *prices.Table {
	rows := []struct{ name, unit, price, cat string }{
		{"silica gel", "kg", "95.00", "consumable"},                     // row 2
		{"sand", "kg", "4.20", "consumable"},                            // row 3
		{"ethyl acetate", "L", "12.35", "solvent"},                      // row 4
		{"n-heptane", "L", "18.90", "solvent"},                          // row 5
		{"dichloromethane", "L", "14.20", "solvent"},                    // row 6 (unused: a table lists more than one run needs)
		{"TLC plate", "each", "1.85", "consumable"},                     // row 7
		{"chemist", "h", "68.00", "labour"},                             // row 8
		{"electricity", "kWh", "0.185", "energy"},                       // row 9
		{"disposal: non-halogenated solvent", "kg", "0.95", "disposal"}, // row 10
		{"disposal: halogenated solvent", "kg", "2.40", "disposal"},     // row 11
		{"disposal: solvent-wet solids", "kg", "1.60", "disposal"},      // row 12
		{"product", "g", "12.50", "product value"},                      // row 13
	}
	t := &prices.Table{File: "testdata/prices-eur.csv", Currency: "EUR"}
	for i, r := range rows {
		per, err := units.ParseUnit(r.unit)
		if err != nil {
			panic(err)
		}
		t.Items = append(t.Items, prices.Item{
			Name: r.name, Unit: r.unit, Per: per, Price: decimal.RequireFromString(r.price),
			Currency: "EUR", Category: r.cat, Source: "example price invented for this test; replace with a quote",
			Date: "2025-01-15", Line: i + 2,
		})
	}
	return t
}

// ln is one hand-priced ledger line: qty in the price item's unit and the
// amount worked out by hand.
type ln struct {
	group       usage.Group
	item, label string
	qty, amount string
}

// buildLedger turns hand-priced lines into a ledger. It trusts the amounts
// as written; TestFixtureIsHandComputed checks them, and Write refuses a
// ledger whose amounts do not follow its rounding rule.
func buildLedger(t *prices.Table, total string, lines ...ln) ledger.Ledger {
	l := ledger.Ledger{Currency: "EUR", Places: 2, Total: decimal.RequireFromString(total)}
	for _, x := range lines {
		row := -1
		for i, it := range t.Items {
			if it.Name == x.item {
				row = i
			}
		}
		if row < 0 {
			panic("fixture: no price for " + x.item)
		}
		it := t.Items[row]
		q := decimal.RequireFromString(x.qty)
		l.Lines = append(l.Lines, ledger.Line{
			Demand: usage.Demand{Item: x.item, Label: x.label, Group: x.group,
				Qty: units.MustFrom(q.InexactFloat64(), it.Unit), Dim: it.Per.Dim},
			PriceRow: row, Qty: q, Unit: it.Unit, UnitPrice: it.Price,
			Amount: decimal.RequireFromString(x.amount),
		})
	}
	return l
}

func h(hours float64) float64 { return hours * 3600 }

func activities(list ...[3]any) []usage.Activity {
	out := make([]usage.Activity, len(list))
	for i, a := range list {
		out[i] = usage.Activity{Name: a[0].(string), Elapsed: h(a[1].(float64)), Attended: h(a[2].(float64))}
	}
	return out
}

// eluentWaste is the spent eluent and the solvent-wet silica of a column
// run with ea and hep litres of ethyl acetate and n-heptane (1 : 4 by
// volume), silicaKg of silica and sandKg of sand. The silica keeps
// 0.75 mL/g of eluent of the same composition.
func eluentWaste(ea, hep, silicaKg, sandKg float64) []usage.Stream {
	held := silicaKg * 0.75 // L of eluent held: 0.75 mL/g = 0.75 L/kg
	heldEA, heldHep := held/5, held*4/5
	const rhoEA, rhoHep = 0.902, 0.684 // kg/L
	return []usage.Stream{
		{Name: "spent eluent", Class: usage.NonHalogenated, VolumeM3: (ea + hep - held) / 1000,
			Components: []usage.Component{
				{Name: "ethyl acetate", Kg: (ea - heldEA) * rhoEA, Solvent: true},
				{Name: "n-heptane", Kg: (hep - heldHep) * rhoHep, Solvent: true},
			}},
		{Name: "solvent-wet silica", Class: usage.WetSolids,
			Components: []usage.Component{
				{Name: "silica gel", Kg: silicaKg},
				{Name: "sand", Kg: sandKg},
				{Name: "ethyl acetate", Kg: heldEA * rhoEA, Solvent: true},
				{Name: "n-heptane", Kg: heldHep * rhoHep, Solvent: true},
			}},
	}
}

func figures(silicaKg, diamM float64, runs, fractions, plates float64, solventL float64) []usage.Figure {
	return []usage.Figure{
		{Key: "silica_mass", Label: "Silica gel", SI: silicaKg, Unit: "g"},
		{Key: "column_diameter", Label: "Column diameter", SI: diamM, Unit: "mm"},
		{Key: "bed_height", Label: "Bed height", SI: 0.15, Unit: "cm"},
		{Key: "runs", Label: "Number of runs", SI: runs},
		{Key: solventFigure, Label: "Eluent, all solvents", SI: solventL / 1000, Unit: "L"},
		{Key: "fractions", Label: "Fractions collected", SI: fractions},
		{Key: "tlc_plates", Label: "TLC plates", SI: plates},
	}
}

// chromatography is the flash-column result at the three fixture masses.
// Crude is 80 % product; 92 % of it is recovered (fixture choices).
func chromatography(t *prices.Table) []scale.Result {
	m, l, e, d, p := usage.Materials, usage.Labour, usage.Energy, usage.Disposal, usage.ProductLoss
	small := scale.Result{
		Usage: usage.Usage{
			Method: "chromatography", CrudeKg: 0.00025, ProductInKg: 0.0002, ProductOutKg: 0.000184, Feasible: true,
			// Still 1978 Table 1: 20 mm column for up to 400 mg at ΔRf ≥ 0.2, 200 mL eluent, 10 mL fractions.
			Figures: figures(0.015, 0.020, 1, 20, 3, 0.2),
			Waste:   eluentWaste(0.040, 0.160, 0.015, 0.002),
			Activities: activities(
				[3]any{"pack the column", 0.25, 0.25}, [3]any{"load the sample", 0.1, 0.1},
				[3]any{"elute and collect", 0.25, 0.25}, [3]any{"TLC of fractions", 0.5, 0.5},
				[3]any{"evaporate", 0.75, 0.25}, [3]any{"clean up", 0.25, 0.25}),
			Notes: []usage.Note{{Level: usage.Info, Text: "Column 20 mm from Still, Kahn and Mitra 1978, Table 1 (ΔRf ≥ 0.2)."}},
		},
		// hand computation, EUR:
		Ledger: buildLedger(t, "119.71", // 1.43+0.01+0.49+3.02+5.55+108.80+0.04+0.13+0.04+0.20
			ln{m, "silica gel", "stationary phase", "0.015", "1.43"},                     // 0.015 × 95.00 = 1.425 → 1.43 (half a cent, away from zero)
			ln{m, "sand", "sand layers", "0.002", "0.01"},                                // 0.002 × 4.20 = 0.0084 → 0.01
			ln{m, "ethyl acetate", "eluent: ethyl acetate", "0.040", "0.49"},             // 0.040 × 12.35 = 0.494 → 0.49
			ln{m, "n-heptane", "eluent: n-heptane", "0.160", "3.02"},                     // 0.160 × 18.90 = 3.024 → 3.02
			ln{m, "TLC plate", "fraction analysis", "3", "5.55"},                         // 3 × 1.85 = 5.55
			ln{l, "chemist", "attended work", "1.600", "108.80"},                         // 1.6 h (sum of attended hours) × 68.00 = 108.80
			ln{e, "electricity", "rotary evaporator", "0.225", "0.04"},                   // 0.225 kWh × 0.185 = 0.041625 → 0.04
			ln{d, "disposal: non-halogenated solvent", "spent eluent", "0.137", "0.13"},  // 0.1373345 kg → 0.137 × 0.95 = 0.13015 → 0.13
			ln{d, "disposal: solvent-wet solids", "solvent-wet silica", "0.025", "0.04"}, // 0.0251855 kg → 0.025 × 1.60 = 0.04
			ln{p, "product", "lost in mixed fractions", "0.016", "0.20"},                 // 0.016 g × 12.50 = 0.20
		),
	}
	mid := scale.Result{
		Usage: usage.Usage{
			Method: "chromatography", CrudeKg: 0.020, ProductInKg: 0.016, ProductOutKg: 0.01472, Feasible: true,
			// Load ∝ d²: 20 g needs 100 mg × (d/10 mm)² → d ≈ 141 mm; the next column held is 150 mm.
			Figures: figures(1.2, 0.150, 1, 40, 5, 16),
			Waste:   eluentWaste(3.2, 12.8, 1.2, 0.1),
			Activities: activities(
				[3]any{"pack the column", 1.0, 1.0}, [3]any{"load the sample", 0.5, 0.5},
				[3]any{"elute and collect", 0.5, 0.5}, [3]any{"TLC of fractions", 1.0, 1.0},
				[3]any{"evaporate", 4.0, 1.0}, [3]any{"clean up", 0.75, 0.75}),
			Notes: []usage.Note{{Level: usage.Info, Text: "Column 150 mm: the next size held above the 141 mm that Still's table scaled by d² asks for."}},
		},
		// hand computation, EUR:
		Ledger: buildLedger(t, "758.57", // 114.00+0.42+39.52+241.92+9.25+323.00+0.89+10.44+3.13+16.00
			ln{m, "silica gel", "stationary phase", "1.200", "114.00"},                    // 1.2 × 95.00
			ln{m, "sand", "sand layers", "0.100", "0.42"},                                 // 0.1 × 4.20
			ln{m, "ethyl acetate", "eluent: ethyl acetate", "3.200", "39.52"},             // 3.2 × 12.35
			ln{m, "n-heptane", "eluent: n-heptane", "12.800", "241.92"},                   // 12.8 × 18.90
			ln{m, "TLC plate", "fraction analysis", "5", "9.25"},                          // 5 × 1.85
			ln{l, "chemist", "attended work", "4.750", "323.00"},                          // 4.75 h × 68.00
			ln{e, "electricity", "rotary evaporator", "4.800", "0.89"},                    // 4.8 kWh × 0.185 = 0.888 → 0.89
			ln{d, "disposal: non-halogenated solvent", "spent eluent", "10.987", "10.44"}, // 10.98676 kg → 10.987 × 0.95 = 10.43765 → 10.44
			ln{d, "disposal: solvent-wet solids", "solvent-wet silica", "1.955", "3.13"},  // 1.95484 kg → 1.955 × 1.60 = 3.128 → 3.13
			ln{p, "product", "lost in mixed fractions", "1.280", "16.00"},                 // 1.28 g × 12.50
		),
	}
	large := scale.Result{
		Usage: usage.Usage{
			Method: "chromatography", CrudeKg: 2, ProductInKg: 1.6, ProductOutKg: 1.472, Feasible: true,
			// Largest column 300 mm: 100 mg × 30² = 90 g a run → 23 runs of about 5.3 kg silica.
			Figures: figures(120, 0.300, 23, 920, 138, 1600),
			Waste:   eluentWaste(320, 1280, 120, 10),
			Activities: activities(
				[3]any{"pack the column", 23.0, 23.0}, [3]any{"load the sample", 11.5, 11.5},
				[3]any{"elute and collect", 23.0, 11.5}, [3]any{"TLC of fractions", 23.0, 23.0},
				[3]any{"evaporate", 160.0, 40.0}, [3]any{"clean up", 11.5, 11.5}),
			Notes: []usage.Note{
				{Level: usage.Warning, Text: "Above the largest column held (300 mm): 23 runs."},
				{Level: usage.Caution, Text: "About 1,600 L of flammable solvent: plan storage, grounding and ventilation."},
			},
		},
		// hand computation, EUR:
		Ledger: buildLedger(t, "51080.61", // 11400+42+3952+24192+255.30+8194+88.80+1043.74+312.77+1600
			ln{m, "silica gel", "stationary phase", "120.000", "11400.00"},                    // 120 × 95.00
			ln{m, "sand", "sand layers", "10.000", "42.00"},                                   // 10 × 4.20
			ln{m, "ethyl acetate", "eluent: ethyl acetate", "320.000", "3952.00"},             // 320 × 12.35
			ln{m, "n-heptane", "eluent: n-heptane", "1280.000", "24192.00"},                   // 1280 × 18.90
			ln{m, "TLC plate", "fraction analysis", "138", "255.30"},                          // 138 × 1.85
			ln{l, "chemist", "attended work", "120.500", "8194.00"},                           // 120.5 h × 68.00
			ln{e, "electricity", "rotary evaporator", "480.000", "88.80"},                     // 480 kWh × 0.185
			ln{d, "disposal: non-halogenated solvent", "spent eluent", "1098.676", "1043.74"}, // 1098.676 × 0.95 = 1043.7422 → 1043.74
			ln{d, "disposal: solvent-wet solids", "solvent-wet silica", "195.484", "312.77"},  // 195.484 × 1.60 = 312.7744 → 312.77
			ln{p, "product", "lost in mixed fractions", "128.000", "1600.00"},                 // 128 g × 12.50
		),
	}
	return []scale.Result{small, mid, large}
}

// crystallization is a second method for the two-method fixture: not
// feasible at 0.25 g, 85 % recovery above (fixture choices).
func crystallization(t *prices.Table) []scale.Result {
	m, l, e, d, p, o := usage.Materials, usage.Labour, usage.Energy, usage.Disposal, usage.ProductLoss, usage.OneTime
	liquor := func(ea, hep float64) []usage.Stream {
		return []usage.Stream{{Name: "mother liquor and washes", Class: usage.NonHalogenated, VolumeM3: (ea + hep) / 1000,
			Components: []usage.Component{
				{Name: "ethyl acetate", Kg: ea * 0.902, Solvent: true},
				{Name: "n-heptane", Kg: hep * 0.684, Solvent: true},
			}}}
	}
	figs := func(vesselL, solventL float64) []usage.Figure {
		return []usage.Figure{
			{Key: "vessel_volume", Label: "Vessel", SI: vesselL / 1000, Unit: "L"},
			{Key: "batches", Label: "Batches", SI: 1},
			{Key: solventFigure, Label: "Solvent, all", SI: solventL / 1000, Unit: "L"},
		}
	}
	small := scale.Result{Usage: usage.Usage{Method: "crystallization", CrudeKg: 0.00025, ProductInKg: 0.0002,
		Reason: "below 1 g of crude the mother-liquor loss exceeds the product recovered (fixture rule)",
		Notes:  []usage.Note{{Level: usage.Info, Text: "Not feasible at this mass."}}}}
	mid := scale.Result{
		Usage: usage.Usage{
			Method: "crystallization", CrudeKg: 0.020, ProductInKg: 0.016, ProductOutKg: 0.0136, Feasible: true,
			Figures: figs(1, 0.48), Waste: liquor(0.160, 0.320),
			Activities: activities([3]any{"dissolve hot", 1.0, 1.0}, [3]any{"cool and crystallize", 3.0, 0.5},
				[3]any{"filter and wash", 1.5, 1.5}, [3]any{"dry", 12.0, 0.5}),
		},
		// hand computation, EUR:
		Ledger: buildLedger(t, "820.59", // 1.98+6.05+238.00+0.22+0.34+30.00+544.00
			ln{m, "ethyl acetate", "solvent: ethyl acetate", "0.160", "1.98"},                       // 0.16 × 12.35 = 1.976 → 1.98
			ln{m, "n-heptane", "antisolvent: n-heptane", "0.320", "6.05"},                           // 0.32 × 18.90 = 6.048 → 6.05
			ln{l, "chemist", "attended work", "3.500", "238.00"},                                    // 3.5 h × 68.00
			ln{e, "electricity", "heating and cooling", "1.200", "0.22"},                            // 1.2 kWh × 0.185 = 0.222 → 0.22
			ln{d, "disposal: non-halogenated solvent", "mother liquor and washes", "0.363", "0.34"}, // 0.3632 kg → 0.363 × 0.95 = 0.34485 → 0.34
			ln{p, "product", "lost to mother liquor", "2.400", "30.00"},                             // 2.4 g × 12.50
			ln{o, "chemist", "solvent screening", "8.000", "544.00"},                                // 8 h × 68.00
		),
	}
	large := scale.Result{
		Usage: usage.Usage{
			Method: "crystallization", CrudeKg: 2, ProductInKg: 1.6, ProductOutKg: 1.36, Feasible: true,
			Figures: figs(50, 48), Waste: liquor(16, 32),
			Activities: activities([3]any{"dissolve hot", 3.0, 3.0}, [3]any{"cool and crystallize", 8.0, 2.0},
				[3]any{"filter and wash", 5.0, 5.0}, [3]any{"dry", 24.0, 2.0}),
		},
		// hand computation, EUR:
		Ledger: buildLedger(t, "5208.00", // 197.60+604.80+816.00+11.10+34.50+3000.00+544.00
			ln{m, "ethyl acetate", "solvent: ethyl acetate", "16.000", "197.60"},                      // 16 × 12.35
			ln{m, "n-heptane", "antisolvent: n-heptane", "32.000", "604.80"},                          // 32 × 18.90
			ln{l, "chemist", "attended work", "12.000", "816.00"},                                     // 12 h × 68.00
			ln{e, "electricity", "heating and cooling", "60.000", "11.10"},                            // 60 kWh × 0.185
			ln{d, "disposal: non-halogenated solvent", "mother liquor and washes", "36.320", "34.50"}, // 36.32 × 0.95 = 34.504 → 34.50
			ln{p, "product", "lost to mother liquor", "240.000", "3000.00"},                           // 240 g × 12.50
			ln{o, "chemist", "solvent screening", "8.000", "544.00"},                                  // 8 h × 68.00
		),
	}
	return []scale.Result{small, mid, large}
}

// fixtureReport is chromatography at 0.25 g, 20 g and 2 kg.
func fixtureReport() *scale.Report {
	t := fixturePrices()
	chrom := chromatography(t)
	r := &scale.Report{
		Title:        "Compound A-17, flash purification",
		ScenarioFile: "testdata/a17.yaml",
		PricesFile:   t.File,
		Prices:       t,
		MassesKg:     []float64{0.00025, 0.020, 2},
		Methods:      []string{"chromatography"},
		Inputs: []scale.Input{
			{Field: "product.name", Written: "A-17", Meaning: "A-17"},
			{Field: "chromatography.product_rf", Written: "0.35", Meaning: "0.35 (column volumes to elute: 2.86)"},
			{Field: "chromatography.impurity_rf", Written: "0.55", Meaning: "0.55 (ΔRf 0.20 above the product)"},
			{Field: "chromatography.eluent", Written: "ethyl acetate/n-heptane 1:4",
				Meaning: "20 % ethyl acetate in n-heptane by volume, isocratic"},
			{Field: "crude.purity", Written: "80 %", Meaning: "0.8"},
			{Field: "masses", Written: "250 mg, 20 g, 2 kg", Meaning: "250 mg, 20 g, 2 kg"},
		},
		Coefficients: []source.Coefficient{
			{Key: "bed_height", Method: "chromatography", Label: "Silica bed height", SI: 0.15, Dim: units.Length, Unit: "cm",
				Source: "Still, W. C.; Kahn, M.; Mitra, A. J. Org. Chem. 1978, 43, 2923 (5–6 in bed)", Mark: source.FromMemory},
			{Key: "linear_velocity", Method: "chromatography", Label: "Solvent front speed", SI: 0.05 / 60, Dim: units.Velocity,
				Unit: "cm/min", Source: "Still, Kahn and Mitra 1978 (2 in/min); J. Chem. Educ. 1984, 61, 649", Mark: source.FromMemory},
			{Key: "pore_volume", Method: "chromatography", Label: "Pore volume of flash silica, 40–63 µm", SI: 0.75e-6 / 1e-3,
				Dim: units.SpecificVolume, Unit: "mL/g", Source: "typical flash silica, 40–63 µm (from memory)", Mark: source.FromMemory},
			{Key: "silica_ratio_easy", Method: "chromatography", Label: "Silica : sample at ΔRf ≥ 0.2", SI: 60,
				Source: "derived from Still, Kahn and Mitra 1978, Table 1, with a 15 cm bed at 0.5 g/mL", Mark: source.Derived},
			{Key: "tlc_every", Method: "chromatography", Label: "Fractions per TLC lane", SI: 2,
				Source: "spotting every other fraction is common practice", Mark: source.CommonPractice},
		},
		Cautions: []string{
			"Ethyl acetate and n-heptane are highly flammable: keep ignition sources away, ground containers above a few litres and work in a fume hood.",
			"Dry silica gel is a fine dust: weigh and pack columns in a fume hood and wear a dust mask where local rules ask for one.",
			"Waste classification, exposure limits and disposal follow local codes and the site's licensed EHS practice.",
		},
		Notes: []usage.Note{{Level: usage.Info, Text: "Prices are example values invented for this test, not quotes."}},
	}
	for i := range r.MassesKg {
		r.Results = append(r.Results, []scale.Result{chrom[i]})
	}
	return r
}

// twoMethodReport adds crystallization, not feasible at 0.25 g, so that the
// Summary marks the cheapest method per mass.
func twoMethodReport() *scale.Report {
	r := fixtureReport()
	r.Title = "Compound A-17, column or crystallization"
	cr := crystallization(r.Prices)
	r.Methods = append(r.Methods, "crystallization")
	for i := range r.Results {
		r.Results[i] = append(r.Results[i], cr[i])
	}
	return r
}

// describe names a result for test messages.
func describe(r *scale.Report, i, j int) string {
	return fmt.Sprintf("%s at %s", r.Methods[j], units.FormatMass(r.MassesKg[i]))
}
