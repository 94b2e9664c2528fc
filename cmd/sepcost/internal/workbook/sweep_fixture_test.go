package workbook

import (
	"fmt"
	"math"

	"github.com/shopspring/decimal"

	"sepcost/costing/green"
	"sepcost/costing/ledger"
	"sepcost/costing/prices"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale"
)

// sweepReport is the two-method fixture (fixture_test.go: hand-computed
// ledgers at 0.25 g, 20 g and 2 kg) read as a three-point sweep, with a
// decision at 20 g and one crossover. Source: hand computation from the
// fixture's totals (EUR) and products (g) with the rules of scale.Decide
// and scale.Crossover:
//
//	chromatography at 20 g:  758.57 / 14.72 = 51.5333 EUR/g
//	crystallization at 20 g: 820.59 / 13.60 = 60.3375 EUR/g
//	margin = (60.3375 − 51.5333) / 60.3375 = 0.14592 < 0.15: a tie
//
// Drivers (item totals over the item's lines, share of the total):
// chromatography chemist 323.00 (0.42580), n-heptane 241.92 (0.31892),
// silica gel 114.00 (0.15028); crystallization chemist 238.00 + 544.00 =
// 782.00 (0.95297), product 30.00 (0.036559), n-heptane 6.05 (0.0073727).
//
// Break-even unit price p* = p0 − Δ / (Qw/Gw − Qr/Gr), with
// Δ = 51.5333 − 60.3375 = −8.80421 EUR/g, Gw = 14.72 g, Gr = 13.6 g:
//
//	chemist:    Qw 4.75 h,  Qr 11.5 h: slope −0.522898, p* = 68 − 16.8373 = 51.1627 (falls below)
//	n-heptane:  Qw 12.8 L,  Qr 0.32 L: slope  0.846036, p* = 18.90 + 10.4064 = 29.3064 (rises above)
//	silica gel: Qw 1.2 kg,  Qr 0:      slope  0.0815217, p* = 95 + 107.998 = 202.9983 (rises above)
//	product:    Qw 1.28 g,  Qr 2.4 g:  p* = −85.86, below zero: no flip
//
// Crossover: the difference chromatography − crystallization in EUR/g is
// −8.80421 at 20 g and 34.70150 − 3.82941 = +30.87209 at 2 kg; linear in
// ln m it is zero at 20 g × 100^0.221901 = 55.569 g, a smooth crossing
// with chromatography cheaper below. (The real sweep bisects on the
// models; three fixture points allow only this interpolation.)
func sweepReport() *scale.Report {
	r := twoMethodReport()
	r.Title = "Compound A-17, scale-up"
	r.IsSweep = true
	r.TargetKg = 0.020
	r.Decision = &scale.Decision{
		TargetKg: 0.020, Winner: "chromatography", RunnerUp: "crystallization",
		WinnerPerG: 758.57 / 14.72, RunnerPerG: 820.59 / 13.6, Margin: (820.59/13.6 - 758.57/14.72) / (820.59 / 13.6), Tie: true,
		Drivers: []scale.Driver{
			{Method: "chromatography", Item: "chemist", Amount: decimal.RequireFromString("323.00"), Share: 323.00 / 758.57},
			{Method: "chromatography", Item: "n-heptane", Amount: decimal.RequireFromString("241.92"), Share: 241.92 / 758.57},
			{Method: "chromatography", Item: "silica gel", Amount: decimal.RequireFromString("114.00"), Share: 114.00 / 758.57},
			{Method: "crystallization", Item: "chemist", Amount: decimal.RequireFromString("782.00"), Share: 782.00 / 820.59},
			{Method: "crystallization", Item: "product", Amount: decimal.RequireFromString("30.00"), Share: 30.00 / 820.59},
			{Method: "crystallization", Item: "n-heptane", Amount: decimal.RequireFromString("6.05"), Share: 6.05 / 820.59},
		},
		Flips: []scale.Flip{
			{Item: "chemist", Unit: "h", Price: decimal.RequireFromString("68.00"), BreakEven: decimal.RequireFromString("51.1627"), Rising: false},
			{Item: "n-heptane", Unit: "L", Price: decimal.RequireFromString("18.90"), BreakEven: decimal.RequireFromString("29.3064"), Rising: true},
			{Item: "silica gel", Unit: "kg", Price: decimal.RequireFromString("95.00"), BreakEven: decimal.RequireFromString("202.9983"), Rising: true},
		},
		Infeasible: map[string]string{},
		Explanation: []string{
			"At 20 g of crude, chromatography (51.53 EUR/g) and crystallization (60.34 EUR/g) are within 15 % of each other: a tie within the models' uncertainty; choose on other grounds (development time, equipment, risk).",
			"The answer would flip to crystallization if the price of chemist fell below 51.16 EUR per h (now 68.00).",
			"The answer would flip to crystallization if the price of n-heptane rose above 29.31 EUR per L (now 18.90).",
			"The answer would flip to crystallization if the price of silica gel rose above 203.00 EUR per kg (now 95.00).",
		},
	}
	r.Crossovers = []scale.Crossover{{A: "chromatography", B: "crystallization", MassKg: 0.055569,
		CheaperBelow: "chromatography", CheaperAbove: "crystallization", Kind: scale.Smooth}}
	for i := range r.Results {
		for j := range r.Results[i] {
			u := &r.Results[i][j].Usage
			if !u.Feasible {
				continue
			}
			r.Results[i][j].Metrics = fixtureMetrics(*u)
			if d, ok := u.Figure("column_diameter"); ok {
				runs, _ := u.Figure("runs")
				u.Equipment = fmt.Sprintf("%.0f mm column × %.0f runs", d.SI*1000, runs.SI)
			} else if v, ok := u.Figure("vessel_volume"); ok {
				u.Equipment = fmt.Sprintf("%.0f L vessel", v.SI*1000)
			}
		}
	}
	return r
}

// syntheticSweep is an invented sweep of n log-spaced masses from 0.1 g to
// 10 kg with one method (a flash column) or two (and a crystallization,
// not feasible below 1 g of crude), for the layout of a sweep without
// detail sheets and for benchmarks. The usage is scaled from the 20 g
// fixture (fixture_test.go: silica : crude 60 : 1 after Still, Kahn and
// Mitra 1978, Table 1; 800 L of 1 : 4 ethyl acetate / n-heptane per kg of
// crude; 8 % of the product lost), with hours growing as m^0.6 and m^0.3
// (fixture choices, no source). The quantities are rounded as the ledger
// rounds them and every amount follows the ledger's rule, qty × unit
// price rounded half away from zero to the cent (DEVELOPERS.md, "Money"), which
// Write checks; the workbook's formulas are checked against these amounts
// by LibreOffice and by excelize's calculator.
func syntheticSweep(n, methods int) *scale.Report {
	t := fixturePrices()
	masses, err := scale.LogSpace(1e-4, 10, n)
	if err != nil {
		panic(err)
	}
	r := &scale.Report{
		Title: "Invented sweep for layout and speed", ScenarioFile: "synthetic", PricesFile: t.File, Prices: t,
		MassesKg: masses, Methods: []string{"chromatography", "crystallization"}[:methods],
		Cautions: []string{"Ethyl acetate and n-heptane are highly flammable: keep ignition sources away."},
		IsSweep:  true, TargetKg: 2,
	}
	for _, m := range masses {
		row := []scale.Result{syntheticColumn(t, m)}
		if methods > 1 {
			row = append(row, syntheticCrystallization(t, m))
		}
		r.Results = append(r.Results, row)
	}
	// Crossovers: where the cheaper method per gram changes between two
	// neighbouring masses, placed at their geometric mean (a fixture
	// choice; the real search bisects on the models).
	for i := 0; methods > 1 && i+1 < n; i++ {
		a, b := r.Results[i], r.Results[i+1]
		d0, d1 := a[0].PerGram()-a[1].PerGram(), b[0].PerGram()-b[1].PerGram()
		if math.IsNaN(d0) || math.IsNaN(d1) || (d0 > 0) == (d1 > 0) {
			continue
		}
		c := scale.Crossover{A: "chromatography", B: "crystallization", MassKg: math.Sqrt(masses[i] * masses[i+1]),
			CheaperBelow: "chromatography", CheaperAbove: "crystallization", Kind: scale.Smooth}
		if d0 > 0 {
			c.CheaperBelow, c.CheaperAbove = c.CheaperAbove, c.CheaperBelow
		}
		r.Crossovers = append(r.Crossovers, c)
	}
	return r
}

// fixtureMetrics gives a fixture result its green metrics by their
// definitions: E-factor (Sheldon, Green Chem. 2007, 9, 1273)
//
//	E = m_waste / m_product
//
// and process mass intensity (Jiménez-González et al., Org. Process Res.
// Dev. 2011, 15, 912)
//
//	PMI = (m_crude + Σ m_material) / m_product
//
// In the fixtures every material (silica, sand, solvents) ends up in a
// waste stream, so Σ m_material = m_waste, and the solvent used is the
// solvent in the waste; they hold no water, so the metrics without water
// are the same, and no halogenated solvent.
func fixtureMetrics(u usage.Usage) *green.Metrics {
	w := u.WasteKg()
	solventKg := 0.0
	for _, s := range u.Waste {
		for _, c := range s.Components {
			if c.Solvent {
				solventKg += c.Kg
			}
		}
	}
	p := u.ProductOutKg
	return &green.Metrics{EFactor: w / p, EFactorNoWater: w / p, PMI: (u.CrudeKg + w) / p, PMINoWater: (u.CrudeKg + w) / p,
		SolventIntensity: solventKg / p, WasteKg: w, InputKg: u.CrudeKg + w, ProductKg: p, IsolatedKg: p, SolventKg: solventKg,
		BalanceGapKg: u.CrudeKg - p} // the crude not recovered is in no stream of the fixtures
}

// priced turns quantities into a ledger by the ledger's rule.
type priced struct {
	t     *prices.Table
	lines []ledger.Line
	total decimal.Decimal
}

func (p *priced) add(g usage.Group, item, label string, qty decimal.Decimal) {
	k, ok := p.t.Find(item)
	if !ok {
		panic("synthetic: no price for " + item)
	}
	it := p.t.Items[k]
	amount := qty.Mul(it.Price).Round(2)
	p.lines = append(p.lines, ledger.Line{
		Demand:   usage.Demand{Item: item, Label: label, Group: g, Qty: units.MustFrom(qty.InexactFloat64(), it.Unit), Dim: it.Per.Dim},
		PriceRow: k, Qty: qty, Unit: it.Unit, UnitPrice: it.Price, Amount: amount,
	})
	p.total = p.total.Add(amount)
}

func (p *priced) ledger() ledger.Ledger {
	return ledger.Ledger{Currency: "EUR", Places: 2, Lines: p.lines, Total: p.total}
}

func q3(v float64) decimal.Decimal { return decimal.NewFromFloat(v).Round(3) }

func syntheticColumn(t *prices.Table, m float64) scale.Result {
	s := m / 0.020
	silica, sand := 60*m, 5*m
	ea, hep := 160*m, 640*m
	plates := math.Max(1, math.Round(5*math.Sqrt(s)))
	hours := 4.75 * math.Pow(s, 0.6)
	waste := eluentWaste(ea, hep, silica, sand)
	u := usage.Usage{
		Method: "chromatography", CrudeKg: m, ProductInKg: 0.8 * m, ProductOutKg: 0.736 * m, Feasible: true,
		Figures:    figures(silica, 0.15*math.Sqrt(s), math.Ceil(s/100), 40*math.Sqrt(s), plates, ea+hep),
		Waste:      waste,
		Activities: activities([3]any{"run the column", hours * 1.3, hours * 0.7}, [3]any{"evaporate", hours, hours * 0.3}),
		Equipment:  fmt.Sprintf("%.0f mm column × %.0f runs", math.Min(300, 150*math.Sqrt(s)), math.Ceil(s/100)),
	}
	p := &priced{t: t}
	m1, l, e, d, pl := usage.Materials, usage.Labour, usage.Energy, usage.Disposal, usage.ProductLoss
	p.add(m1, "silica gel", "stationary phase", q3(silica))
	p.add(m1, "sand", "sand layers", q3(sand))
	p.add(m1, "ethyl acetate", "eluent: ethyl acetate", q3(ea))
	p.add(m1, "n-heptane", "eluent: n-heptane", q3(hep))
	p.add(m1, "TLC plate", "fraction analysis", decimal.NewFromFloat(plates))
	p.add(l, "chemist", "attended work", q3(hours))
	p.add(e, "electricity", "rotary evaporator", q3(240*m))
	p.add(d, "disposal: non-halogenated solvent", "spent eluent", q3(waste[0].Kg()))
	p.add(d, "disposal: solvent-wet solids", "solvent-wet silica", q3(waste[1].Kg()))
	p.add(pl, "product", "lost in mixed fractions", q3(0.064*m*1000))
	return scale.Result{Usage: u, Ledger: p.ledger(), Metrics: fixtureMetrics(u)}
}

func syntheticCrystallization(t *prices.Table, m float64) scale.Result {
	if m < 0.001 {
		return scale.Result{Usage: usage.Usage{Method: "crystallization", CrudeKg: m, ProductInKg: 0.8 * m,
			Reason: "below 1 g of crude the mother-liquor loss exceeds the product recovered (fixture rule)"}}
	}
	s := m / 0.020
	ea, hep := 8*m, 16*m
	hours := 3.5 * math.Pow(s, 0.3)
	u := usage.Usage{
		Method: "crystallization", CrudeKg: m, ProductInKg: 0.8 * m, ProductOutKg: 0.68 * m, Feasible: true,
		Figures: []usage.Figure{{Key: solventFigure, Label: "Solvent, all", SI: (ea + hep) / 1000, Unit: "L"}},
		Waste: []usage.Stream{{Name: "mother liquor and washes", Class: usage.NonHalogenated, VolumeM3: (ea + hep) / 1000,
			Components: []usage.Component{{Name: "ethyl acetate", Kg: ea * 0.902, Solvent: true}, {Name: "n-heptane", Kg: hep * 0.684, Solvent: true}}}},
		Activities: activities([3]any{"crystallize", hours * 3, hours}, [3]any{"dry", 12.0, 0.5}),
		Equipment:  fmt.Sprintf("%.0f L vessel", math.Max(0.1, 50*m)),
	}
	p := &priced{t: t}
	p.add(usage.Materials, "ethyl acetate", "solvent: ethyl acetate", q3(ea))
	p.add(usage.Materials, "n-heptane", "antisolvent: n-heptane", q3(hep))
	p.add(usage.Labour, "chemist", "attended work", q3(hours+0.5))
	p.add(usage.Energy, "electricity", "heating and cooling", q3(60*m))
	p.add(usage.Disposal, "disposal: non-halogenated solvent", "mother liquor and washes", q3(u.Waste[0].Kg()))
	p.add(usage.ProductLoss, "product", "lost to mother liquor", q3(0.12*m*1000))
	p.add(usage.OneTime, "chemist", "solvent screening", q3(8))
	return scale.Result{Usage: u, Ledger: p.ledger(), Metrics: fixtureMetrics(u)}
}
