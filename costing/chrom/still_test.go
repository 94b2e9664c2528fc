package chrom

import (
	"math"
	"testing"
)

// Bed properties used to read Still's table. Source: a 15 cm
// bed (Still et al. 1978, about 5–6 in, from memory) and 0.5 g/mL packed
// density (flash silica, 40–63 µm, 0.45–0.55 g/mL, from memory).
const (
	testBedHeight  = 0.15
	testBedDensity = 500.0
)

// The silica-to-sample ratios implied by Still, Kahn and Mitra 1978
// Table 1 with a 15 cm bed at 0.5 g/mL. Derived here from the table:
// silica : sample ≈ 60 : 1 (ΔRf ≥ 0.2) and ≈ 150 : 1 (ΔRf ≥ 0.1). Tolerance 5 %: the table's rows do not scale exactly with
// d² (the 40 mm row lists 600 mg, not 640 mg).
func TestStillImpliedRatios(t *testing.T) {
	t.Parallel()
	easy, hard := StillSilicaRatios(testBedHeight, testBedDensity)
	if math.Abs(easy/60-1) > 0.05 {
		t.Errorf("ΔRf ≥ 0.2: silica : sample = %.1f, want about 60", easy)
	}
	if math.Abs(hard/150-1) > 0.05 {
		t.Errorf("ΔRf ≥ 0.1: silica : sample = %.1f, want about 150", hard)
	}
	if got := StillRatio(0.3, testBedHeight, testBedDensity); got != easy {
		t.Errorf("ΔRf above 0.2 takes the easy class: %g vs %g", got, easy)
	}
	mid := StillRatio(0.15, testBedHeight, testBedDensity)
	if !(mid < hard && mid > easy) {
		t.Errorf("ΔRf 0.15 must fall between the classes: %g", mid)
	}
}

// Still's Table 1 reproduced row by row: the model's sample load (both
// routes), eluent volume and fraction size for each column diameter.
// Source: Still, W. C.; Kahn, M.; Mitra, A. J. Org. Chem. 1978, 43, 2923,
// Table 1 (confirmed).
//
// Tolerances and why:
//   - Fraction size: the model interpolates the table, so each row must
//     come back within 1 %.
//   - Sample load by the empirical route: the table's loads scale with d²
//     to within 7 % (40 mm row), and the route uses one ratio per class: 10 %.
//   - Sample load by the physical route: calibrated to the whole table with
//     one parameter (q_s); ideal touching-band theory falls a little more
//     steeply with ΔRf than the table, so the fit leaves about ±12 % per
//     class: 15 %.
//   - Eluent volume: Still lists "typical volume to pack and elute",
//     rounded to 100–1000 mL; for the 20–50 mm rows the model's column
//     volumes (equilibration + elution to the product's trailing edge) must
//     come within 35 %. The 10 mm row (100 mL, 11 CV) carries a fixed
//     hand-packing overhead the model does not have, so it is only checked
//     to lie below the table value and above a third of it.
func TestStillTableReproduced(t *testing.T) {
	t.Parallel()
	coef := testCoefficients()
	cal := Calibrate(testBedHeight, testBedDensity)
	for _, row := range StillTable {
		silica := BedSilica(row.DiameterM, testBedHeight, testBedDensity)
		for _, c := range []struct {
			dRf, load float64
		}{{StillEasyDeltaRf, row.LoadEasyKg}, {StillHardDeltaRf, row.LoadHardKg}} {
			emp := silica / StillRatio(c.dRf, testBedHeight, testBedDensity)
			if e := math.Abs(emp/c.load - 1); e > 0.10 {
				t.Errorf("d = %.0f mm, ΔRf %.1f: empirical load %.0f mg vs table %.0f mg (%.0f %%)", row.DiameterM*1000, c.dRf, emp*1e6, c.load*1e6, e*100)
			}
			sep := Separation{StillTargetRf, StillTargetRf + c.dRf, 0.5, 0.5}
			phys := LoadPerSilica(sep, cal.Qs) * silica
			if e := math.Abs(phys/c.load - 1); e > 0.15 {
				t.Errorf("d = %.0f mm, ΔRf %.1f: physical load %.0f mg vs table %.0f mg (%.0f %%)", row.DiameterM*1000, c.dRf, phys*1e6, c.load*1e6, e*100)
			}
		}
		if f := StillFraction(row.DiameterM); math.Abs(f/row.FractionM3-1) > 0.01 {
			t.Errorf("d = %.0f mm: fraction %.1f mL vs table %.0f mL", row.DiameterM*1000, f*1e6, row.FractionM3*1e6)
		}
		// Eluent: equilibration + elution of a product at Rf 0.35 to the
		// trailing edge of its band at the table's easy load.
		v0 := silica * ColumnVolumePerMass(testBedDensity, coef.Get(KeySkeletalDensity))
		lf := row.LoadEasyKg * 0.5 / (cal.Qs * silica)
		b := ComponentBand(StillTargetRf, lf, platesFor(coef, testBedHeight), 1)
		cv := coef.Get(KeyEquilibrationCV) + b.End + 2*b.Kinetic + coef.Get(KeyTailCV)
		vol := cv * v0
		if row.DiameterM < 0.015 {
			if !(vol < row.EluentM3 && vol > row.EluentM3/3) {
				t.Errorf("d = 10 mm: eluent %.0f mL, want between 33 and 100 mL", vol*1e6)
			}
			continue
		}
		if e := math.Abs(vol/row.EluentM3 - 1); e > 0.35 {
			t.Errorf("d = %.0f mm: eluent %.0f mL vs table %.0f mL (%.0f %%)", row.DiameterM*1000, vol*1e6, row.EluentM3*1e6, e*100)
		}
	}
}

// The physical route agrees with the empirical one across the table's
// range: within 15 % at both ΔRf classes (see above), and between the
// classes (ΔRf 0.1–0.2) the two routes stay within the route-agreement
// factor of 1.5 (common practice, no source) for an equal-amounts and a
// 10 %-impurity crude. Above ΔRf 0.2 the table gives no further credit (its
// column is "ΔRf ≥ 0.2"), so only theory may go below it there.
func TestRoutesAgreeAcrossRange(t *testing.T) {
	t.Parallel()
	cal := Calibrate(testBedHeight, testBedDensity)
	t.Logf("calibration: q_s = %.4f g/g, max error %.1f %%, rms %.1f %%", cal.Qs, cal.MaxError*100, cal.RMSLog*100)
	if cal.MaxError > 0.15 {
		t.Errorf("calibrated theory misses Still's table by up to %.0f %%", cal.MaxError*100)
	}
	for dRf := 0.1; dRf <= 0.2001; dRf += 0.0125 {
		for _, share := range []float64{0.5, 0.1} {
			sep := Separation{StillTargetRf, StillTargetRf + dRf, 1 - share, share}
			theory := 1 / LoadPerSilica(sep, cal.Qs)
			table := StillRatio(dRf, testBedHeight, testBedDensity)
			if f := theory / table; f > 1.5 || f < 1/1.5 {
				t.Errorf("ΔRf %.3f, impurity share %.1f: theory %.0f : 1 vs table %.0f : 1", dRf, share, theory, table)
			}
		}
	}
	for dRf := 0.2; dRf <= 0.45; dRf += 0.05 {
		sep := Separation{StillTargetRf - 0.1, StillTargetRf - 0.1 + dRf, 0.5, 0.5}
		if theory, table := 1/LoadPerSilica(sep, cal.Qs), StillRatio(dRf, testBedHeight, testBedDensity); theory > table*1.5 {
			t.Errorf("ΔRf %.2f: theory %.0f : 1 far above the table's bound %.0f : 1", dRf, theory, table)
		}
	}
}

// Touching-band loading limits. Source: Golshan-Shirazi and
// Guiochon (from memory): as r → 0 the total tends to ((α − 1)/α)², and it
// vanishes as α → 1; with equal amounts at α = 2, hand computation:
// (1 + 1)·1/(2·3) = 1/3.
func TestTouchingLoad(t *testing.T) {
	t.Parallel()
	if got := TouchingLoad(2, 1); math.Abs(got-1.0/3) > 1e-12 {
		t.Errorf("Lf(α=2, r=1) = %g, want 1/3", got)
	}
	for _, a := range []float64{1.2, 1.5, 3} {
		want := math.Pow((a-1)/a, 2)
		if got := TouchingLoad(a, 1e-9); math.Abs(got/want-1) > 1e-6 {
			t.Errorf("Lf(α=%g, r→0) = %g, want %g", a, got, want)
		}
	}
	if TouchingLoad(1, 1) != 0 {
		t.Errorf("α = 1 cannot be separated")
	}
	// Monotone: more selective pairs take more load.
	prev := 0.0
	for a := 1.05; a < 4; a += 0.05 {
		l := TouchingLoad(a, 0.2)
		if l <= prev {
			t.Fatalf("Lf not increasing at α = %g", a)
		}
		prev = l
	}
}

// Column volume per gram of silica from the bed properties. Derived: at
// 0.5 g/mL packed density and 2.2 g/mL skeletal density the total porosity
// is 1 − 0.5/2.2 ≈ 0.77, so one column volume ≈ 1.55 mL per g silica
// (flash practice quotes about 1.5 mL per g of 60 Å silica; from memory). With a pore volume of 0.75 mL/g the
// interparticle porosity is 1 − 0.5·(1/2.2 + 0.75) = 0.398, within the
// 0.35–0.45 usual for packed beds (common practice, no source).
func TestColumnVolumePerGram(t *testing.T) {
	t.Parallel()
	got := ColumnVolumePerMass(500, 2200) * 1000 // mL/g
	if math.Abs(got-1.5455) > 0.001 {
		t.Errorf("V0 = %.4f mL/g, want 1.5455", got)
	}
	eps := InterparticlePorosity(500, 2200, 0.75e-3)
	if math.Abs(eps-0.398) > 0.001 {
		t.Errorf("εe = %.4f, want 0.398", eps)
	}
	// Identity: interstitial plus pore volume equals the total.
	if sum := eps/500 + 0.75e-3; math.Abs(sum-ColumnVolumePerMass(500, 2200)) > 1e-12 {
		t.Errorf("εe/ρb + vp = %g ≠ V0/m", sum)
	}
}

// ChooseColumn rounds up to an available diameter and splits into runs
// above the largest; the silica packed never falls short of what is needed
// and the bed stays between the shortest and tallest allowed.
func TestChooseColumn(t *testing.T) {
	t.Parallel()
	ds := []SiteColumn{{Diameter: 0.02}, {Diameter: 0.04}, {Diameter: 0.1}}
	for _, need := range []float64{0.001, 0.02, 0.5, 0.6, 5, 50} {
		c, _ := ChooseColumn(need, 0.10, 0.20, testBedDensity, ds)
		if c.Silica*float64(c.Runs) < need*(1-1e-9) {
			t.Errorf("need %g kg: packed %g × %d", need, c.Silica, c.Runs)
		}
		if c.BedHeight < 0.10-1e-12 || c.BedHeight > 0.20+1e-12 {
			t.Errorf("need %g kg: bed %g m outside 10–20 cm", need, c.BedHeight)
		}
		if c.Runs > 1 && c.Diameter != 0.1 {
			t.Errorf("need %g kg: several runs must use the largest column", need)
		}
	}
}
