package solvent

import (
	"fmt"

	"sepcost/costing/source"
)

// Unit helpers for the table: values are written in the units the sources
// use and stored in SI.
func gPerML(v float64) float64 { return v * 1000 }   // g/mL → kg/m³
func degC(v float64) float64   { return v + 273.15 } // °C → K
func kJ(v float64) float64     { return v * 1000 }   // kJ/mol → J/mol

const (
	conf = source.Confirmed
	mem  = source.FromMemory
	der  = source.Derived
)

func prop(v float64, src string, m source.Mark) Prop { return Prop{V: v, Source: src, Mark: m} }

// noFlash is the flash-point entry of a solvent that has none.
func noFlash(why string) Prop { return Prop{V: 0, Source: "no flash point: " + why, Mark: mem} }

// notPeroxide is the basis for solvents that are not peroxide formers.
var notPeroxide = Basis{Source: "not listed as a peroxide former in " + srcKelly, Mark: mem}

// Antoine sets used in more than one place.
var (
	// 2-MeTHF: the only set found; also the base of its derived ΔHvap.
	meTHFPoling = Antoine{A: 8.95009 - 5, B: 1175.51, C: -55.348, Tmin: 263.44, Tmax: 377.49,
		Source: srcPoling("2-methyltetrahydrofuran"), Mark: mem}
)

// Derived estimates, with the working shown.
var (
	// deltaZnbp is Z(vapour) − Z(liquid) at the normal boiling point of an
	// organic liquid (about 0.95–0.97; Poling, Prausnitz & O'Connell, 5th
	// ed., 2001, ch. 7, from memory). With it ClapeyronHVap reproduces the
	// tabulated ΔHvap of toluene, diethyl ether and THF within 2 % (tested).
	deltaZnbp = 0.96

	// CH₂ increment of liquid Cp near 25 °C, from n-hexane → n-heptane in
	// this table (224.7 − 195.6 J/(mol·K), CRC, from memory).
	cpCH2 = 224.7 - 195.6
)

// builtinTable is the built-in solvent data. Antoine sets are in order of
// preference (see Solvent.VaporPressure). Every set was checked to give the
// tabulated normal boiling point within 0.5 K (package tests); a set that
// did not was left out, and the entry says so.
func builtinTable() []Solvent {
	chemsep := func(file string) string { return fmt.Sprintf(srcChemSep, file) }
	return []Solvent{
		{
			ID: "water", Aliases: []string{"H2O"}, Formula: "H2O", CAS: "7732-18-5",
			Density:       prop(998.2, "Tanaka, M. et al., \"Recommended table for the density of water between 0 °C and 40 °C based on recent experimental reports\", Metrologia 2001, 38, 301-309: 998.207 kg/m³ at 20 °C", mem),
			BoilingPoint:  prop(373.124, "IAPWS R7-97(2012), IAPWS-IF97 saturation temperature at 101.325 kPa (region 4, eq. 31), computed here (99.974 °C)", der),
			HVap:          prop(kJ(40.65), "steam tables: latent heat 2256.4 kJ/kg at 100 °C (IAPWS-IF97) times 18.015 g/mol", mem),
			Cp:            prop(75.3, srcCRC+": 75.3 J/(mol·K) at 25 °C", mem),
			FlashPoint:    noFlash("water does not burn"),
			PeroxideBasis: Basis{Source: "water cannot form organic peroxides (common practice, no source)", Mark: source.CommonPractice},
			Antoine: []Antoine{
				{A: 5.40221, B: 1838.675, C: -31.737, Tmin: 273, Tmax: 303, Source: srcNISTAntoine("water", "Bridgeman and Aldrich, 1964"), Mark: mem},
				{A: 5.20389, B: 1733.926, C: -39.485, Tmin: 304, Tmax: 333, Source: srcNISTAntoine("water", "Bridgeman and Aldrich, 1964"), Mark: mem},
				{A: 5.0768, B: 1659.793, C: -45.854, Tmin: 334, Tmax: 363, Source: srcNISTAntoine("water", "Bridgeman and Aldrich, 1964"), Mark: mem},
				{A: 5.08354, B: 1663.125, C: -45.622, Tmin: 344, Tmax: 373, Source: srcNISTAntoine("water", "Bridgeman and Aldrich, 1964"), Mark: mem},
				// Wider but coarser (within 0.5 % of IAPWS-IF97 from 273 to 473 K,
				// checked here): used above 373 K.
				{A: 10.11564 - 5, B: 1687.537, C: -42.98, Tmin: 273.2, Tmax: 473.2, Source: srcPoling("water"), Mark: mem},
				// Not used: NIST's Stull (1947) set 255.9-373 K gives a normal
				// boiling point 0.48 K high and errs by several per cent near
				// 273 K; NIST's Liu and Lindsay (1970) set 379-573 K gives
				// 101.3 kPa at 379 K, 6 K above the true boiling point.
			},
		},
		{
			ID: "methanol", Aliases: []string{"MeOH", "methyl alcohol"}, Formula: "CH4O", CAS: "67-56-1",
			Density:      prop(gPerML(0.791), srcCRC+": 0.791 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(64.7), srcCRC+": 64.7 °C", mem),
			HVap:         prop(kJ(35.21), srcCRC+": 35.21 kJ/mol at the normal boiling point", mem),
			Cp:           prop(81.1, srcCRC+": 81.1 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(11), srcFlash+": 11 °C", mem), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				{A: 5.20409, B: 1581.341, C: -33.50, Tmin: 288.10, Tmax: 356.83, Source: srcNISTAntoine("methanol", "Ambrose and Sprake, 1970"), Mark: mem},
				{A: 10.20277 - 5, B: 1580.08, C: -33.65, Tmin: 262.59, Tmax: 356, Source: srcPoling("methanol"), Mark: mem},
			},
		},
		{
			ID: "ethanol", Aliases: []string{"EtOH", "ethyl alcohol"}, Formula: "C2H6O", CAS: "64-17-5",
			Density:      prop(gPerML(0.789), srcNAS+": 0.789 g/mL", conf),
			BoilingPoint: prop(degC(78.5), srcNAS+": 78.5 °C (the CRC Handbook gives 78.29 °C and "+srcSVN+" 78.2 °C)", conf),
			HVap:         prop(kJ(38.56), srcSVN+": 38.56 kJ/mol", conf),
			Cp:           prop(112.3, srcCRC+": 112.3 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(13), srcNAS+": 13 °C", conf), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				{A: 5.24677, B: 1598.673, C: -46.424, Tmin: 292.77, Tmax: 366.63, Source: srcNISTAntoine("ethanol", "Ambrose and Sprake, 1970"), Mark: mem},
				{A: 10.33675 - 5, B: 1648.22, C: -42.232, Tmin: 276.5, Tmax: 369.54, Source: srcPoling("ethanol"), Mark: mem},
			},
		},
		{
			ID: "isopropanol", Aliases: []string{"IPA", "2-propanol", "propan-2-ol", "isopropyl alcohol", "iPrOH"}, Formula: "C3H8O", CAS: "67-63-0",
			Density:      prop(gPerML(0.785), srcCRC+": 0.785 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(82.3), srcCRC+": 82.3 °C", mem),
			HVap:         prop(kJ(39.85), srcCRC+": 39.85 kJ/mol at the normal boiling point", mem),
			Cp:           prop(156.5, srcCRC+": 156.5 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(12), srcFlash+": 12 °C", mem), HasFlashPoint: true,
			PeroxideFormer: true,
			PeroxideBasis:  Basis{Source: srcKelly + ": 2-propanol is in class B, peroxide hazard on concentration (distillation, evaporation); flagged so that distillation to a small residue carries the caution", Mark: mem},
			Antoine: []Antoine{
				{A: 4.8610, B: 1357.427, C: -75.814, Tmin: 329.92, Tmax: 362.41, Source: srcNISTAntoine("2-propanol", "Stull, Ind. Eng. Chem. 1947, 39, 517"), Mark: mem},
				{A: 10.24268 - 5, B: 1580.92, C: -53.54, Tmin: 281.28, Tmax: 373.46, Source: srcPoling("2-propanol"), Mark: mem},
			},
		},
		{
			ID: "acetone", Aliases: []string{"propanone", "2-propanone", "dimethyl ketone"}, Formula: "C3H6O", CAS: "67-64-1",
			Density:      prop(gPerML(0.786), srcNAS+": 0.786 g/mL", conf),
			BoilingPoint: prop(degC(56.2), srcNAS+": 56.2 °C", conf),
			HVap:         prop(kJ(29.10), srcSVN+": 29.10 kJ/mol", conf),
			Cp:           prop(126.3, srcCRC+": 126.3 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(-20), srcNAS+": -20 °C", conf), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				{A: 4.42448, B: 1312.253, C: -32.445, Tmin: 259.16, Tmax: 507.6, Source: srcNISTAntoine("acetone", "Ambrose, Sprake and Townsend, 1974"), Mark: mem},
			},
		},
		{
			ID: "acetonitrile", Aliases: []string{"MeCN", "ACN", "CH3CN", "methyl cyanide"}, Formula: "C2H3N", CAS: "75-05-8",
			Density:      prop(gPerML(0.786), srcNAS+": 0.786 g/mL", conf),
			BoilingPoint: prop(degC(81.6), srcNAS+": 81.6 °C", conf),
			HVap:         prop(kJ(30.19), srcSVN+": 30.19 kJ/mol (a value of 29.75 kJ/mol is also quoted, from memory)", conf),
			Cp:           prop(91.4, srcCRC+": 91.4 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(6), srcNAS+": 6 °C", conf), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				// One public quotation gives the upper limit as 362.3 K; the
				// narrower range is kept.
				{A: 4.27873, B: 1355.374, C: -37.853, Tmin: 288.3, Tmax: 355.6, Source: srcNISTAntoine("acetonitrile", ""), Mark: mem},
			},
		},
		{
			ID: "ethyl acetate", Aliases: []string{"EtOAc", "AcOEt", "ethyl ethanoate"}, Formula: "C4H8O2", CAS: "141-78-6",
			Density:      prop(gPerML(0.900), srcCRC+": 0.900 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(77.1), srcCRC+": 77.1 °C", mem),
			HVap:         prop(kJ(31.94), "NIST Chemistry WebBook (SRD 69), ethyl acetate: 31.94 kJ/mol at 350.3 K, Majer and Svoboda 1985, as quoted in a public data file (not re-checked)", mem),
			Cp:           prop(168.94, "NIST Chemistry WebBook (SRD 69), ethyl acetate: liquid Cp 168.94 J/(mol·K) at 298.15 K, Pintos, Bravo et al. 1988, as quoted in a public data file (not re-checked); the CRC Handbook gives about 170", mem),
			FlashPoint:   prop(degC(-4), srcFlash+": -4 °C", mem), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				{A: 4.22809, B: 1245.702, C: -55.189, Tmin: 288.73, Tmax: 348.98, Source: srcNISTAntoine("ethyl acetate", "Polak and Mertl, 1965"), Mark: mem},
				{A: 9.13361 - 5, B: 1195.13, C: -60.68, Tmin: 265.5, Tmax: 372.51, Source: srcPoling("ethyl acetate"), Mark: mem},
			},
		},
		{
			ID: "isopropyl acetate", Aliases: []string{"IPAc", "iPrOAc", "isopropyl ethanoate"}, Formula: "C5H10O2", CAS: "108-21-4",
			Density:      prop(gPerML(0.872), srcCRC+": 0.872 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(88.6), srcCRC+": 88.6 °C (ChemSep gives 361.65 K, 88.5 °C)", mem),
			// ChemSep DIPPR eq. 106, ΔH = A(1−Tr)^(B + C·Tr + D·Tr² + E·Tr³), with
			// A = 4.852874e7 J/kmol, B = 0.139799, C = 0.87492, D = −1.379465,
			// E = 0.721356, Tc = 516.15 K, evaluated at Tb = 361.65 K.
			HVap: prop(kJ(32.84), fmt.Sprintf("%s, DIPPR eq. 106 heat of vaporization evaluated here at Tb = 361.65 K: 32.84 kJ/mol", chemsep("Isopropylacetate.mo")), der),
			// ChemSep DIPPR eq. 16, Cp = A + exp(B/T + C + D·T + E·T²), with
			// A = 131390, B = −46.486, C = 8.1047, D = 0.013597, E = −1.0999e-5
			// (J/(kmol·K)), evaluated at 298.15 K.
			Cp:         prop(192.8, fmt.Sprintf("%s, DIPPR eq. 16 liquid heat capacity evaluated here at 298.15 K: 192.8 J/(mol·K)", chemsep("Isopropylacetate.mo")), der),
			FlashPoint: prop(degC(2), srcFlash+": 2 °C", mem), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				// ln(P/Pa) = 21.02105916702333 − 2848.8273546050236/(T − 61.71).
				{A: 4.12933, B: 1237.23, C: -61.71, Tmin: 294, Tmax: 385, Source: srcLandolt("isopropyl acetate (isopropyl ethanoate)"), Mark: mem},
			},
		},
		{
			// "hexanes" (the commercial isomer mixture, mostly n-hexane) is an
			// alias here: its boiling range and vapour pressure are close to
			// n-hexane's, which is a simplification for costing.
			ID: "n-hexane", Aliases: []string{"hexane", "hexanes", "Hex"}, Formula: "C6H14", CAS: "110-54-3",
			Density:      prop(gPerML(0.659), srcCRC+": 0.659 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(68.7), srcCRC+": 68.7 °C", mem),
			HVap:         prop(kJ(28.85), srcCRC+": 28.85 kJ/mol at the normal boiling point", mem),
			Cp:           prop(195.6, srcCRC+": 195.6 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(-22), srcFlash+": -22 °C", mem), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				{A: 4.00266, B: 1171.53, C: -48.784, Tmin: 286.18, Tmax: 342.69, Source: srcNISTAntoine("hexane", "Willingham, Taylor, et al., 1945"), Mark: mem},
				{A: 9.00139 - 5, B: 1170.875, C: -48.833, Tmin: 254.24, Tmax: 365.25, Source: srcPoling("hexane"), Mark: mem},
			},
		},
		{
			ID: "n-heptane", Aliases: []string{"heptane", "heptanes"}, Formula: "C7H16", CAS: "142-82-5",
			Density:      prop(gPerML(0.684), srcCRC+": 0.684 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(98.4), srcCRC+": 98.4 °C", mem),
			HVap:         prop(kJ(31.77), srcCRC+": 31.77 kJ/mol at the normal boiling point", mem),
			Cp:           prop(224.7, srcCRC+": 224.7 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(-4), srcFlash+": -4 °C", mem), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				{A: 4.02832, B: 1268.636, C: -56.199, Tmin: 299.07, Tmax: 372.43, Source: srcNISTAntoine("heptane", "Willingham, Taylor, et al., 1945"), Mark: mem},
				{A: 9.02023 - 5, B: 1263.909, C: -56.718, Tmin: 277.71, Tmax: 396.53, Source: srcPoling("heptane"), Mark: mem},
			},
		},
		{
			ID: "cyclohexane", Aliases: []string{"hexahydrobenzene"}, Formula: "C6H12", CAS: "110-82-7",
			Density:      prop(gPerML(0.778), srcCRC+": 0.778 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(80.7), srcSVN+": 80.7 °C", conf),
			HVap:         prop(kJ(29.97), srcSVN+": 29.97 kJ/mol", conf),
			Cp:           prop(156.0, srcCRC+": 156.0 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(-20), srcFlash+": -20 °C", mem), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				{A: 3.96988, B: 1203.526, C: -50.287, Tmin: 293.06, Tmax: 354.73, Source: srcNISTAntoine("cyclohexane", "Willingham, Taylor, et al., 1945"), Mark: mem},
				{A: 8.93002 - 5, B: 1182.774, C: -52.532, Tmin: 282.11, Tmax: 378.46, Source: srcPoling("cyclohexane"), Mark: mem},
			},
		},
		{
			ID: "toluene", Aliases: []string{"PhMe", "methylbenzene", "toluol"}, Formula: "C7H8", CAS: "108-88-3",
			Density:      prop(gPerML(0.867), srcCRC+": 0.867 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(110.6), srcCRC+": 110.6 °C", mem),
			HVap:         prop(kJ(33.18), srcCRC+": 33.18 kJ/mol at the normal boiling point", mem),
			Cp:           prop(157.3, srcCRC+": 157.3 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(4), srcFlash+": 4 °C", mem), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				{A: 4.07827, B: 1343.943, C: -53.773, Tmin: 308.52, Tmax: 384.66, Source: srcNISTAntoine("toluene", "Willingham, Taylor, et al., 1945"), Mark: mem},
				{A: 9.05043 - 5, B: 1327.62, C: -55.525, Tmin: 286.44, Tmax: 409.61, Source: srcPoling("toluene"), Mark: mem},
			},
		},
		{
			ID: "dichloromethane", Aliases: []string{"DCM", "methylene chloride", "methylene dichloride", "CH2Cl2"}, Formula: "CH2Cl2", CAS: "75-09-2",
			Density:       prop(gPerML(1.326), srcCRC+": 1.326 g/mL at 20 °C", mem),
			BoilingPoint:  prop(degC(39.7), srcSVN+": 39.7 °C (the CRC Handbook gives 39.6 °C)", conf),
			HVap:          prop(kJ(28.06), srcSVN+": 28.06 kJ/mol", conf),
			Cp:            prop(101.2, srcCRC+": 101.2 J/(mol·K) at 25 °C", mem),
			FlashPoint:    noFlash("none in standard closed-cup tests; " + srcFlash),
			Halogenated:   true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				// Not used: the NIST set 4.53691, 1327.016, −20.474 (233-313 K)
				// gives a normal boiling point of 40.19 °C, 0.5 K above the table.
				{A: 9.07622 - 5, B: 1070.07, C: -49.91, Tmin: 235.2, Tmax: 333.36, Source: srcPoling("dichloromethane"), Mark: mem},
			},
		},
		{
			ID: "chloroform", Aliases: []string{"CHCl3", "trichloromethane"}, Formula: "CHCl3", CAS: "67-66-3",
			Density:       prop(gPerML(1.498), srcNAS+": 1.498 g/mL (the CRC Handbook gives about 1.48-1.49 g/mL at 20-25 °C, from memory; a difference of about 1 %)", conf),
			BoilingPoint:  prop(degC(61.2), srcNAS+": 61.2 °C", conf),
			HVap:          prop(kJ(29.24), srcSVN+": 29.24 kJ/mol", conf),
			Cp:            prop(114.2, srcCRC+": 114.2 J/(mol·K) at 25 °C", mem),
			FlashPoint:    noFlash("none in standard closed-cup tests; " + srcFlash),
			Halogenated:   true,
			PeroxideBasis: Basis{Source: "not a peroxide former; chloroform does decompose in light and air to phosgene, which is why it is sold stabilised with ethanol or amylene (common practice, no source)", Mark: source.CommonPractice},
			Antoine: []Antoine{
				{A: 8.96288 - 5, B: 1106.904, C: -54.598, Tmin: 250.1, Tmax: 356.89, Source: srcPoling("trichloromethane"), Mark: mem},
				{A: 4.20772, B: 1233.129, C: -40.953, Tmin: 215, Tmax: 334, Source: srcNISTAntoine("chloroform", ""), Mark: mem},
			},
		},
		{
			ID: "diethyl ether", Aliases: []string{"Et2O", "ether", "ethyl ether", "diethylether"}, Formula: "C4H10O", CAS: "60-29-7",
			Density:      prop(gPerML(0.713), srcNAS+": 0.713 g/mL", conf),
			BoilingPoint: prop(degC(34.5), srcNAS+": 34.5 °C", conf),
			HVap:         prop(kJ(26.52), srcSVN+": 26.52 kJ/mol", conf),
			Cp:           prop(172.5, srcCRC+": 172.5 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(-45), srcNAS+": -45 °C", conf), HasFlashPoint: true,
			PeroxideFormer: true,
			PeroxideBasis:  Basis{Source: srcKelly + ": diethyl ether is in class B, peroxide hazard on concentration; date, test and discard as the site requires", Mark: mem},
			Antoine: []Antoine{
				{A: 9.10962 - 5, B: 1090.64, C: -41.95, Tmin: 229.71, Tmax: 328.31, Source: srcPoling("diethyl ether"), Mark: mem},
			},
		},
		{
			ID: "tert-butyl methyl ether", Aliases: []string{"MTBE", "TBME", "methyl tert-butyl ether", "tBuOMe"}, Formula: "C5H12O", CAS: "1634-04-4",
			Density:      prop(gPerML(0.740), srcCRC+": 0.740 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(55.2), srcCRC+": 55.2 °C (ChemSep gives 328.35 K, 55.2 °C)", mem),
			HVap:         prop(kJ(27.94), srcCRC+": 27.94 kJ/mol at the normal boiling point (ChemSep DIPPR eq. 106 gives 28.3 kJ/mol)", mem),
			Cp:           prop(187.5, srcCRC+": 187.5 J/(mol·K) at 25 °C (ChemSep DIPPR eq. 16 gives 187.5 at 298.15 K)", mem),
			FlashPoint:   prop(degC(-28), srcFlash+": -28 °C", mem), HasFlashPoint: true,
			// Decision: not flagged. The tert-butyl side has no α-C–H and the
			// methyl side autoxidises slowly, so MTBE is much slower to form
			// peroxides than diethyl ether or THF, and it is not in Kelly's
			// classes. Some institutional lists include it as a precaution;
			// a site that follows such a list can add its own entry.
			PeroxideBasis: Basis{Source: "not listed in " + srcKelly + "; no α-C-H on the tert-butyl side, so peroxide formation is slow (decision: not flagged; some institutional lists include it as a precaution)", Mark: mem},
			Antoine: []Antoine{
				// Fitted here (least squares in log10 P, 60 points) to the
				// ChemSep DIPPR eq. 101 correlation ln(P/Pa) = 63.31041 −
				// 5322.676/T − 6.212745·ln T + 3.951136e-6·T² over 263-373 K;
				// largest deviation 0.16 %. The Landolt-Börnstein set (287-326
				// K) gives a normal boiling point 0.4 K low and was not used.
				{A: 4.08380, B: 1158.95, C: -44.10, Tmin: 263.15, Tmax: 373.15,
					Source: fmt.Sprintf("Antoine form fitted here to the DIPPR eq. 101 vapour pressure of %s (max deviation 0.16 %% over 263-373 K)", chemsep("Methyltertbutylether.mo")), Mark: der},
			},
		},
		{
			ID: "tetrahydrofuran", Aliases: []string{"THF", "oxolane"}, Formula: "C4H8O", CAS: "109-99-9",
			Density:      prop(gPerML(0.889), srcCRC+": 0.889 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(66), srcCRC+": 66 °C", mem),
			HVap:         prop(kJ(29.81), srcCRC+": 29.81 kJ/mol at the normal boiling point", mem),
			Cp:           prop(124.0, srcCRC+": 124.0 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(-14), srcFlash+": -14 °C", mem), HasFlashPoint: true,
			PeroxideFormer: true,
			PeroxideBasis:  Basis{Source: srcKelly + ": tetrahydrofuran is in class B, peroxide hazard on concentration", Mark: mem},
			Antoine: []Antoine{
				{A: 4.12118, B: 1202.942, C: -46.818, Tmin: 296.29, Tmax: 372.8, Source: srcNISTAntoine("tetrahydrofuran", ""), Mark: mem},
				{A: 9.12142 - 5, B: 1203.11, C: -46.795, Tmin: 253.5, Tmax: 361.71, Source: srcPoling("tetrahydrofuran"), Mark: mem},
			},
		},
		{
			ID: "2-methyltetrahydrofuran", Aliases: []string{"2-MeTHF", "MeTHF", "2-methyloxolane"}, Formula: "C5H10O", CAS: "96-47-9",
			Density:      prop(gPerML(0.854), srcCRC+": 0.854 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(80.2), srcCRC+": 80.2 °C", mem),
			HVap: prop(ClapeyronHVap(meTHFPoling, degC(80.2), deltaZnbp),
				fmt.Sprintf("Clapeyron equation applied here to the slope of the Antoine set (%s) at 80.2 °C with ΔZ = %.2f; the same method reproduces toluene, diethyl ether and THF within 2 %%. Values of 32-34 kJ/mol are also quoted (from memory)", srcPoling("2-methyltetrahydrofuran"), deltaZnbp), der),
			Cp: prop(124.0+cpCH2,
				fmt.Sprintf("group additivity: tetrahydrofuran 124.0 J/(mol·K) plus one CH2 increment of %.1f J/(mol·K) (n-hexane to n-heptane, CRC values); estimate, about ±5 %%", cpCH2), der),
			FlashPoint: prop(degC(-11), srcFlash+": -11 °C", mem), HasFlashPoint: true,
			PeroxideFormer: true,
			PeroxideBasis:  Basis{Source: "cyclic ether with α-C-H like tetrahydrofuran, sold stabilised with BHT; Aycock, D. F., Org. Process Res. Dev. 2007, 11, 156-159", Mark: mem},
			Antoine:        []Antoine{meTHFPoling},
		},
		{
			ID: "n-pentane", Aliases: []string{"pentane", "pentanes"}, Formula: "C5H12", CAS: "109-66-0",
			Density:      prop(gPerML(0.626), srcCRC+": 0.626 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(36.1), srcCRC+": 36.1 °C", mem),
			HVap:         prop(kJ(25.79), srcCRC+": 25.79 kJ/mol at the normal boiling point", mem),
			Cp:           prop(167.2, srcCRC+": 167.2 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(-49), srcFlash+": -49 °C", mem), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				{A: 8.97786 - 5, B: 1064.84, C: -41.136, Tmin: 228.71, Tmax: 330.75, Source: srcPoling("pentane"), Mark: mem},
			},
		},
		{
			ID: "1-butanol", Aliases: []string{"n-butanol", "butan-1-ol", "BuOH", "n-BuOH"}, Formula: "C4H10O", CAS: "71-36-3",
			Density:      prop(gPerML(0.810), srcCRC+": 0.810 g/mL at 20 °C", mem),
			BoilingPoint: prop(degC(117.6), srcSVN+": 117.6 °C (the CRC Handbook gives 117.7 °C)", conf),
			HVap:         prop(kJ(43.29), srcSVN+": 43.29 kJ/mol", conf),
			Cp:           prop(177.2, srcCRC+": 177.2 J/(mol·K) at 25 °C", mem),
			FlashPoint:   prop(degC(37), srcFlash+": 37 °C (some sheets give 35 °C)", mem), HasFlashPoint: true,
			PeroxideBasis: notPeroxide,
			Antoine: []Antoine{
				{A: 9.6493 - 5, B: 1395.14, C: -90.411, Tmin: 310.18, Tmax: 411.26, Source: srcPoling("1-butanol"), Mark: mem},
			},
		},
	}
}
