package cryst

import "math"

// Feed is solid matter going into, or coming out of, a pass, kg.
type Feed struct {
	Product  float64 // the product
	Impurity float64 // the impurity the scenario describes
	Other    float64 // other impurities, taken to stay in solution
}

// Total is the sum of the parts.
func (f Feed) Total() float64 { return f.Product + f.Impurity + f.Other }

// Purity is the mass fraction of product; 0 for an empty feed.
func (f Feed) Purity() float64 {
	t := f.Total()
	if t <= 0 {
		return 0
	}
	return f.Product / t
}

// Pass holds the conditions of one recrystallization pass, in SI. All
// solubilities are mass of solute per volume of solvent (kg/m³).
type Pass struct {
	SHot, SCold float64 // product solubility at the dissolution and isolation temperatures
	Excess      float64 // solvent above the saturation volume, fraction

	// The impurity: either by its solubility (ImpHot, ImpCold) or, when
	// ByPurge, by the fraction Purge of it removed per pass.
	ByPurge         bool
	Purge           float64
	ImpHot, ImpCold float64

	LiquidDensity  float64 // kg/m³ of the crystallization liquid
	CrystalDensity float64 // kg/m³ of the crystals
	Porosity       float64 // void fraction of the filter cake
	Saturation     float64 // share of the cake's pores holding liquid after suction
	Inclusion      float64 // kg of mother liquor occluded per kg of crystals
	Distribution   float64 // logarithmic distribution coefficient λ of the dissolved impurity (0 rejected, 1 no separation)

	WashCakeVolumes float64 // wash volume in cake volumes (used when WashFraction is 0)
	WashFraction    float64 // wash volume as a fraction of the solvent volume (used when > 0)
	WashSaturation  float64 // share of SCold the wash liquid reaches
	WashLoss        float64 // stated fraction of the crystals dissolved by the wash (used when WashLossGiven)
	WashLossGiven   bool
}

// PassResult is the mass balance of one pass. Volumes in m³, masses in kg.
type PassResult struct {
	In  Feed // solid charged
	Out Feed // dried (or redissolved) crystals with what the retained liquid leaves on them

	Solvent      float64 // liquid charged
	Crystallised float64 // product crystallised at the isolation temperature, before washing
	CakeVolume   float64 // wet cake (crystals and pores)
	Retained     float64 // liquid left in the cake after suction and washing
	Wash         float64 // wash liquid
	Remaining    float64 // share of the retained mother liquor still in the cake after washing, r_w

	LiquorVolume float64 // filtrate (mother liquor) volume
	Liquor       Feed    // dissolved in the filtrate
	Washings     Feed    // dissolved in the wash filtrate (volume = Wash)

	CoCrystallised float64 // impurity above its solubility at the isolation temperature, in the cake
	Undissolved    float64 // impurity above its solubility at the dissolution temperature
	Included       float64 // impurity carried into the crystals by occluded liquor
	Incorporated   float64 // impurity built into the crystals by the distribution law
	Held           float64 // all impurity inside the crystals (not purged, co-crystallised, taken up or occluded), other impurities included
	WashDissolved  float64 // product dissolved by the wash
}

// Run is the mass balance of one pass.
//
// Solvent (per volume of solvent, to which the solubilities refer):
//
//	V = P_in / S_hot · (1 + excess)
//
// Product: at the isolation temperature the liquor holds V·S_cold; the rest
// crystallises, P_c = P_in − V·S_cold.
//
// Cake: crystals of volume (P_c + I_solid)/ρ_c form a cake of porosity ε,
// V_cake = V_crystals/(1 − ε), whose pores V_p = ε·V_cake keep a share s of
// liquid after suction, V_ret = s·V_p (at most V).
//
// Wash: W = n·V_cake (cake volumes) or W = f·V (fraction of the solvent).
// The wash displaces the retained mother liquor as a well-mixed dilution,
//
//	r_w = exp(−W / V_p)
//
// of it stays in the cake (cautious next to plug-flow displacement, which
// would remove it all with one pore volume). The wash dissolves product up
// to c_w = wash_saturation · S_cold, D = c_w·W, or a stated share of the
// crystals, D = wash_loss · P_c.
//
// Impurity by solubility: I_liq = min(I_in, V·S_imp,cold) stays dissolved;
// the rest, I_solid, co-crystallises (independent solubilities, simple
// eutectic behaviour: no solid solution and no mutual effect on
// solubility). Of the dissolved impurity, the crystals take up
//
//	I_ss = I_liq · (1 − f^λ),  f = V·S_cold / P_in
//
// by the logarithmic distribution law of Doerner and Hoskins, ln(I₀/I) =
// λ·ln(P₀/P) (IUPAC Gold Book, "laws of distribution in precipitation",
// doi:10.1351/goldbook.L03487, confirmed): f is the share of the product
// left in solution, λ = 0 rejects the impurity and λ = 1 leaves its ratio
// to the product unchanged. Occluded liquor then brings I_inc = φ·P_c·I_liq/(V·ρ_L) into the
// crystals (φ the inclusion factor). The remaining dissolved impurity is
// split by volume between filtrate (V − V_ret), wash filtrate
// ((1 − r_w)·V_ret) and cake (r_w·V_ret). Other impurities follow the same
// liquid fate without a solubility limit. Impurity by purge factor: a share
// Purge of it leaves with the filtrate and the rest stays with the crystals.
//
// Product out:
//
//	P_out = P_c − D + V_ret·(r_w·S_cold + (1 − r_w)·c_w)
//
// (the retained liquid's solute is left on the crystals when they dry or
// are redissolved). The balance closes: P_in = P_out + liquor + washings,
// and likewise for each impurity (MassBalanceError).
func (p Pass) Run(in Feed) PassResult {
	r := PassResult{In: in}
	V := in.Product / p.SHot * (1 + p.Excess)
	r.Solvent = V
	pc := in.Product - V*p.SCold
	if pc <= 0 {
		// Nothing crystallises: everything stays in the liquor.
		r.Crystallised = pc
		r.LiquorVolume = V
		r.Liquor = in
		return r
	}
	r.Crystallised = pc

	// Impurity partition at the isolation temperature.
	var iLiq, iSolid, purged float64
	if p.ByPurge {
		purged = p.Purge * in.Impurity
		iSolid = in.Impurity - purged
	} else {
		iLiq = math.Min(in.Impurity, V*p.ImpCold)
		iSolid = in.Impurity - iLiq
		r.CoCrystallised = iSolid
		r.Undissolved = math.Max(0, in.Impurity-V*p.ImpHot)
	}

	// Uptake by the distribution law, then inclusion: occluded mother
	// liquor, φ·P_c kg, at the liquor's impurity mass fraction.
	if p.Distribution > 0 && iLiq > 0 {
		f := V * p.SCold / in.Product
		r.Incorporated = iLiq * (1 - math.Pow(f, p.Distribution))
		iSolid += r.Incorporated
		iLiq -= r.Incorporated
	}
	liquorMass := V * p.LiquidDensity
	iInc := math.Min(iLiq, p.Inclusion*pc*iLiq/liquorMass)
	oInc := math.Min(in.Other, p.Inclusion*pc*in.Other/liquorMass)
	r.Included = iInc

	// Cake and retained liquid.
	crystals := (pc + iSolid) / p.CrystalDensity
	r.CakeVolume = crystals / (1 - p.Porosity)
	pores := p.Porosity * r.CakeVolume
	ret := math.Min(p.Saturation*pores, V)
	r.Retained = ret

	// Wash.
	W := p.WashCakeVolumes * r.CakeVolume
	if p.WashFraction > 0 {
		W = p.WashFraction * V
	}
	r.Wash = W
	rw := 1.0
	if pores > 0 {
		rw = math.Exp(-W / pores)
	}
	r.Remaining = rw
	var cw, dis float64
	if W > 0 {
		if p.WashLossGiven {
			dis = p.WashLoss * pc
		} else {
			dis = p.WashSaturation * p.SCold * W
		}
		dis = math.Min(dis, pc)
		cw = dis / W
	}
	r.WashDissolved = dis

	// Dissolved concentrations after inclusion.
	ci := (iLiq - iInc) / V
	co := (in.Other - oInc) / V
	r.LiquorVolume = V - ret
	r.Liquor = Feed{Product: (V - ret) * p.SCold, Impurity: (V-ret)*ci + purged, Other: (V - ret) * co}
	disp := (1 - rw) * ret
	r.Washings = Feed{Product: disp*p.SCold + (W-disp)*cw, Impurity: disp * ci, Other: disp * co}
	r.Held = iSolid + iInc + oInc
	r.Out = Feed{
		Product:  pc - dis + ret*(rw*p.SCold+(1-rw)*cw),
		Impurity: iSolid + iInc + rw*ret*ci,
		Other:    oInc + rw*ret*co,
	}
	return r
}

// MassBalanceError is the largest relative imbalance of product, impurity
// and other impurities over the pass: |in − out − liquor − washings| / in.
func (r PassResult) MassBalanceError() float64 {
	e := 0.0
	check := func(in, out, liq, wash float64) {
		if in > 0 {
			e = math.Max(e, math.Abs(in-out-liq-wash)/in)
		}
	}
	check(r.In.Product, r.Out.Product, r.Liquor.Product, r.Washings.Product)
	check(r.In.Impurity, r.Out.Impurity, r.Liquor.Impurity, r.Washings.Impurity)
	check(r.In.Other, r.Out.Other, r.Liquor.Other, r.Washings.Other)
	return e
}

// Ceiling is the purity of the pass's crystals if the wash left no
// liquor on them: product against the impurity co-crystallised, taken up
// by the distribution law and occluded. No wash can do better, so a target
// above it needs another pass (or cannot be reached when passes stall).
func (r PassResult) Ceiling() float64 {
	pc := r.Crystallised
	if pc <= 0 {
		return 0
	}
	return pc / (pc + r.Held)
}

// Yield is the share of the product charged that comes out in the crystals.
func (r PassResult) Yield() float64 {
	if r.In.Product <= 0 {
		return 0
	}
	return r.Out.Product / r.In.Product
}
