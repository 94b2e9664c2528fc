package distil

import (
	"math"

	"sepcost/costing/solvent"
	"sepcost/costing/usage"
)

// stage is how far the physics of a run got before it succeeded or failed.
type stage int

// Stages of a run, in order.
const (
	stNone       stage = iota - 1 // nothing found yet
	stCompounds                   // compounds read, the more volatile known
	stPressure                    // operating pressure and temperatures found
	stVolatility                  // relative volatility found
	stDesign                      // shortcut design done
	stStill                       // still and hold-up chosen
	stDone                        // the batch, energy, time and waste
)

// outcome is what the physics of one run found, in SI; report turns it
// into figures, demands, waste and notes. fail is why the run stopped
// ("" when it did not); reached is the last stage completed.
type outcome struct {
	crudeKg, productIn float64
	fail               string
	reached            stage

	P, I, light, heavy species
	productLight       bool
	wF, wT             float64

	psatH, tPot, tHead float64
	pr                 Pressures
	inPot, inHead      bool

	aTop, aBot, alpha      float64
	inLT, inHT, inLB, inHB bool

	xF, xTarget, xD, xB           float64
	nMin, rMin, mult, nAvail      float64
	nReq, rAvail, R, nEq, alphaEq float64

	st                      Still
	batches, mBatch, nBatch float64
	rhoMix, fill, vHold     float64
	holdShare               float64
	br                      BatchResult
	trap                    float64
	forerun, heart, trapCut Cut
	productOut, impurityOut float64
	lossFore, lossTails     float64
	lossHold, lossTrap      float64
	purity, firstDrop       float64

	boil, power, tBoil, tHeat, tEq float64
	heatIn, condenser, electric    float64
	crew                           float64
	acts                           []usage.Activity
	rinse                          float64
	rinseSolvent                   solvent.Solvent
}

// separation runs the stages that do not depend on the batch mass, up to
// the shortcut design (stDesign) or the one that fails; New keeps it.
func (m *Model) separation() outcome {
	d := m.d
	o := outcome{wF: d.FeedPurity, wT: d.TargetPurity, reached: stNone}
	o.P = newSpecies(d.Product, 0, m.coef)
	o.I = newSpecies(d.Impurity, o.P.M, m.coef)
	for i, step := range [...]func(*outcome) bool{m.volatile, m.pressure, m.volatility, m.design} {
		if !step(&o) {
			return o
		}
		o.reached = stage(i)
	}
	return o
}

// compute runs the physics of one batch mass, stage by stage, from the
// stages New found (separation).
func (m *Model) compute(crudeKg float64) outcome {
	o := m.sep
	o.crudeKg, o.productIn = crudeKg, crudeKg*m.d.FeedPurity
	if o.reached != stDesign {
		return o
	}
	if !m.still(&o) {
		return o
	}
	o.reached = stStill
	if !m.batch(&o) {
		return o
	}
	o.reached = stDone
	m.energy(&o)
	m.times(&o)
	m.rinse(&o)
	return o
}

// volatile finds which compound is the more volatile, at the pot limit.
func (m *Model) volatile(o *outcome) bool {
	pP, _ := o.P.pressure(m.d.MaxPotK)
	pI, _ := o.I.pressure(m.d.MaxPotK)
	if !(pP > 0) || !(pI > 0) {
		o.fail = failNoPressure(m.d.MaxPotK, pP, pI)
		return false
	}
	o.productLight = pP > pI
	o.light, o.heavy = o.P, o.I
	if !o.productLight {
		o.light, o.heavy = o.I, o.P
	}
	return true
}

// pressure finds the operating pressures and temperatures.
func (m *Model) pressure(o *outcome) bool {
	d, p := m.d, m.p
	o.psatH, _ = o.heavy.pressure(d.MaxPotK)
	o.pr = OperatingPressures(o.psatH, d.ColumnStages, p.pressureDrop)
	if !(o.pr.Head >= d.BestVacuumPa) {
		o.fail = m.failVacuum(o)
		return false
	}
	o.tPot, o.inPot = o.heavy.boilingAt(o.pr.Pot)
	o.tHead, o.inHead = o.light.boilingAt(o.pr.Head)
	if math.IsNaN(o.tPot) || math.IsNaN(o.tHead) {
		o.fail = failBoiling(o.pr)
		return false
	}
	return true
}

// volatility is the relative volatility at head and pot and its mean.
func (m *Model) volatility(o *outcome) bool {
	plTop, inLT := o.light.pressure(o.tHead)
	phTop, inHT := o.heavy.pressure(o.tHead)
	plBot, inLB := o.light.pressure(o.tPot)
	phBot, inHB := o.heavy.pressure(o.tPot)
	o.inLT, o.inHT, o.inLB, o.inHB = inLT, inHT, inLB, inHB
	o.aTop, o.aBot = RelativeVolatility(plTop, phTop), RelativeVolatility(plBot, phBot)
	if !(o.aTop > 1) || !(o.aBot > 1) {
		o.fail = failCrossing(o.aTop, o.aBot)
		return false
	}
	o.alpha = MeanVolatility(o.aTop, o.aBot)
	if o.alpha < m.p.minAlpha {
		o.fail = failAlpha(o.alpha, m.p.minAlpha)
		return false
	}
	return true
}

// design is the shortcut design for the charge as a continuous feed
// (saturated liquid): Fenske, Underwood, Gilliland, and the equivalent
// stages of the batch.
func (m *Model) design(o *outcome) bool {
	d, p := m.d, m.p
	xProd := func(w float64) float64 { return MoleFraction(w, o.P.M, o.I.M) }
	if o.productLight {
		o.xF, o.xTarget = xProd(o.wF), xProd(o.wT)
	} else {
		o.xF, o.xTarget = 1-xProd(o.wF), 1-xProd(o.wT)
	}
	if az := d.Azeotrope; az != nil && o.wF < az.ProductFraction && o.wT >= az.ProductFraction {
		o.fail = failAzeotrope(az.ProductFraction, o.wF, o.wT)
		return false
	}
	rd := p.designRecovery
	if o.productLight {
		o.xD = o.xTarget
		D := rd * o.xF / o.xD
		o.xB = o.xF * (1 - rd) / (1 - D)
	} else {
		o.xB = o.xTarget
		B := rd * (1 - o.xF) / (1 - o.xB)
		o.xD = (o.xF - B*o.xB) / (1 - B)
	}
	o.nMin = Fenske(o.xD, o.xB, o.alpha)
	o.rMin = UnderwoodMinReflux(o.xF, o.xD, o.alpha)
	o.mult = d.RefluxMultiple
	if o.mult == 0 {
		o.mult = p.refluxMultiple
	}
	stages := d.ColumnStages
	o.nAvail = stages + 1
	o.nEq = 1
	switch {
	case o.rMin <= 0:
		o.nReq = math.Max(o.nMin, 1)
	case stages == 0:
		o.nReq = GillilandStages(o.nMin, o.mult*o.rMin, o.rMin)
	default:
		o.R = o.mult * o.rMin
		o.nReq = GillilandStages(o.nMin, o.R, o.rMin)
		o.rAvail = GillilandReflux(o.nMin, o.nAvail, o.rMin)
		if !(o.nReq <= o.nAvail) {
			o.fail = failStages(o, stages)
			return false
		}
		o.nEq = EquivalentStages(o.nAvail, o.R, o.rMin)
	}
	o.alphaEq = math.Min(math.Pow(o.alpha, o.nEq), maxAlphaEq)
	return true
}

// still chooses the still and the batches, and checks the hold-up.
func (m *Model) still(o *outcome) bool {
	d, p := m.d, m.p
	mMean := 1 / (o.wF/o.P.M + (1-o.wF)/o.I.M) // kg/mol of the charge
	o.rhoMix = 1 / (o.wF/o.P.rho + (1-o.wF)/o.I.rho)
	o.fill = d.FillLimit
	if o.fill == 0 {
		o.fill = p.fillLimit
	}
	stills := d.StillsM3
	if len(stills) == 0 {
		stills = DefaultStillsM3
	}
	o.st = ChooseStill(o.crudeKg/o.rhoMix, o.fill, stills)
	o.batches = float64(o.st.Batches)
	o.mBatch = o.crudeKg / o.batches
	o.nBatch = o.mBatch / mMean
	o.vHold = HoldupVolume(o.st.Volume, d.ColumnStages, p.holdupHead, p.holdupStage)
	o.holdShare = o.vHold / o.st.Charge
	if o.holdShare > p.maxHoldup {
		o.fail = failHoldup(o)
		return false
	}
	return true
}

// batch runs one batch by the Rayleigh equation and turns moles per mole
// of charge into kilograms for all batches.
func (m *Model) batch(o *outcome) bool {
	p := m.p
	o.br = BatchRun(Batch{X0: o.xF, AlphaEq: o.alphaEq, ProductLight: o.productLight, Target: o.xTarget,
		Forerun: p.forerun, Holdup: o.holdShare, MinResidue: p.minResidue})
	if o.productLight {
		o.firstDrop = MassFraction(o.br.FirstDrop, o.P.M, o.I.M)
	} else {
		o.firstDrop = MassFraction(1-o.br.FirstDrop, o.P.M, o.I.M)
	}
	if !o.br.Reachable {
		o.fail = m.failUnreachable(o)
		return false
	}
	if o.pr.Vacuum {
		o.trap = p.coldTrap
	}
	br, mL, mH := o.br, o.light.M, o.heavy.M
	prodKg := func(c Cut) float64 {
		if o.productLight {
			return o.nBatch * c.Light * mL
		}
		return o.nBatch * (c.N - c.Light) * mH
	}
	split := func(c Cut, share float64) Cut { return Cut{N: c.N * share, Light: c.Light * share} }
	o.trapCut = Cut{N: o.trap * (br.Forerun.N + br.Heart.N), Light: o.trap * (br.Forerun.Light + br.Heart.Light)}
	o.forerun = split(br.Forerun, 1-o.trap)
	o.heart = split(br.Heart, 1-o.trap)
	var recovered float64
	if o.productLight {
		recovered = prodKg(o.heart)
		o.lossTails = prodKg(br.Pot) * o.batches
		// The impurity isolated with the product: the heavy moles of the
		// heart cut.
		o.impurityOut = o.nBatch * (o.heart.N - o.heart.Light) * mH * o.batches
		o.purity = MassFraction(o.heart.X(), o.P.M, o.I.M)
	} else {
		recovered = prodKg(br.Pot)
		// The light moles left in the pot with the product.
		o.impurityOut = o.nBatch * br.Pot.Light * mL * o.batches
		o.purity = MassFraction(1-br.Pot.X(), o.P.M, o.I.M)
	}
	o.productOut = recovered * o.batches
	o.lossFore = prodKg(o.forerun) * o.batches
	o.lossHold = prodKg(br.Holdup) * o.batches
	o.lossTrap = prodKg(o.trapCut) * o.batches
	return true
}

// energy: (R + 1) × distillate × ΔHvap plus the sensible heat of the
// charge, the total-reflux start, the condenser through a chiller and the
// vacuum pump.
func (m *Model) energy(o *outcome) {
	d, p, br := m.d, m.p, o.br
	mL, mH := o.light.M, o.heavy.M
	R := o.R
	vap := Cut{N: (R+1)*(br.Forerun.N+br.Heart.N) + br.Holdup.N, Light: (R+1)*(br.Forerun.Light+br.Heart.Light) + br.Holdup.Light}
	vapHeavy := vap.N - vap.Light
	qVap := o.nBatch * (vap.Light*o.light.hvap + vapHeavy*o.heavy.hvap)
	vBoil := o.nBatch * (vap.Light*mL/o.light.rho + vapHeavy*mH/o.heavy.rho)
	cpMass := o.wF*o.P.cp/o.P.M + (1-o.wF)*o.I.cp/o.I.M // J/(kg·K)
	qSens := o.mBatch * cpMass * math.Max(0, o.tPot-p.roomT)
	o.boil = p.boilup * HeatedAreaScale(o.st.Volume, ReferenceStillM3)
	o.tBoil = vBoil / o.boil
	o.power = qVap / o.tBoil
	o.tHeat = qSens / o.power
	if d.ColumnStages > 0 && R > 0 {
		o.tEq = p.equilibration
	}
	qEq := o.power * o.tEq
	o.heatIn = (qSens + qVap + qEq) * o.batches
	o.condenser = (qVap + qEq) * o.batches
	pump := 0.0
	if o.pr.Vacuum {
		pump = p.pumpPower * (o.tHeat + o.tEq + o.tBoil + p.cooldown) * o.batches
	}
	o.electric = o.heatIn/p.heaterEff + o.condenser/p.chillerCOP + pump
}

// times lists the activities: set-up, charging and draining by volume,
// heating, equilibration, distillation, cooling, analysis, and cleaning by
// the still's wall area; a plant still's hands-on steps are attended by a
// crew.
func (m *Model) times(o *outcome) {
	p := m.p
	o.crew = 1
	if o.st.Volume >= p.plantStill*(1-1e-9) {
		o.crew = p.crew
	}
	act := func(name string, elapsed, attendedShare float64) {
		if elapsed > 0 {
			o.acts = append(o.acts, usage.Activity{Name: name, Elapsed: elapsed, Attended: elapsed * attendedShare})
		}
	}
	cuts := 3.0
	if !o.productLight {
		cuts = 2
	}
	transfer := 2 * TransferTime(o.st.Charge, p.transferRate) * o.batches // charge in, cuts and residue out
	area := WallArea(o.st.Volume)
	att := p.attended * o.crew
	act(ActSetup, p.setupTime, o.crew)
	act(ActCharge, transfer, o.crew)
	act(ActHeat, o.tHeat*o.batches, att)
	act(ActEquilibrate, o.tEq*o.batches, att)
	act(ActDistil, o.tBoil*o.batches, att)
	act(ActCool, p.cooldown*o.batches, 0)
	act(ActAnalyse, cuts*p.analysisPerCut*o.batches, 1)
	act(ActClean, CleaningTime(p.cleanup, p.cleanPerArea, area), o.crew)
}

// rinse is the solvent that rinses still and column after the campaign.
func (m *Model) rinse(o *outcome) {
	o.rinse = m.p.rinse * o.st.Volume
	if o.rinse <= 0 {
		return
	}
	rs, ok := m.sc.Solvents.Find(m.d.RinseSolvent)
	if !ok {
		o.rinse = 0
		return
	}
	o.rinseSolvent = rs
}
