package scale

import (
	"math"

	"github.com/shopspring/decimal"

	"sepcost/costing/scenario"
	"sepcost/costing/source"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale/campaign"
)

// Budget is the request for the campaign of the chosen method, by what
// the money is for. Capital + Consumables + Labour + Disposal +
// ProductLost + OneTime = Subtotal, the campaign's cost exactly; the
// contingency is added on top.
type Budget struct {
	Method    string
	Batches   int
	BatchKg   float64
	ProductKg float64
	Currency  string
	Places    int32
	Cost      campaign.Cost // the campaign priced: one batch's ledger, batches, one-time costs

	Capital      decimal.Decimal // equipment bought for the campaign: the sum of CapitalItems' prices
	CapitalItems []CapitalItem
	Consumables  decimal.Decimal // materials, energy and credits for recovered solvent, × batches
	Labour       decimal.Decimal // hands-on time × batches
	Equipment    decimal.Decimal // occupancy charges of the site's equipment × batches (hourly rates; wear of items not bought here)
	Disposal     decimal.Decimal // waste disposal × batches
	ProductLost  decimal.Decimal // value of the product not recovered × batches (not a purchase)
	OneTime      decimal.Decimal // development, once
	Subtotal     decimal.Decimal
	// ContingencyShare is (P90 − P50) / P50 of the method's cost per gram
	// of one batch at the campaign's batch mass in the Monte Carlo draws (0
	// when not sampled);
	// Contingency = round(Subtotal × ContingencyShare).
	ContingencyShare float64
	P50, P90         float64
	Contingency      decimal.Decimal
	Total            decimal.Decimal // Subtotal + Contingency
}

// BudgetGroups says which ledger groups each budget heading gathers; every
// group of usage.Groups is under exactly one heading.
var BudgetGroups = map[string][]usage.Group{
	"consumables":  {usage.Materials, usage.Energy, usage.Credit},
	"labour":       {usage.Labour},
	"equipment":    {usage.EquipmentUse},
	"disposal":     {usage.Disposal},
	"product lost": {usage.ProductLoss},
	"one-time":     {usage.OneTime},
}

// NewBudget builds the budget of a campaign. u, when not nil, gives the
// contingency from the method's band, sampled at the campaign's batch mass: the cost above
// the median that one draw in ten exceeds, a common way of sizing a
// contingency from a cost distribution (P90 − P50; common practice, no
// source).
func NewBudget(c campaign.Cost, u *Uncertainty) *Budget {
	l := c.Ledger
	n := decimal.NewFromInt(int64(c.Batches))
	sum := func(head string) decimal.Decimal {
		s := decimal.Zero
		for _, g := range BudgetGroups[head] {
			s = s.Add(l.Subtotal(g))
		}
		return s
	}
	b := &Budget{Method: c.Method, Batches: c.Batches, BatchKg: c.BatchKg, ProductKg: c.ProductKg, Currency: l.Currency, Places: l.Places, Cost: c,
		Capital: c.Capital, Consumables: sum("consumables").Mul(n), Labour: sum("labour").Mul(n), Equipment: sum("equipment").Mul(n), Disposal: sum("disposal").Mul(n),
		ProductLost: sum("product lost").Mul(n), OneTime: sum("one-time")}
	b.Subtotal = b.Capital.Add(b.Consumables).Add(b.Labour).Add(b.Equipment).Add(b.Disposal).Add(b.ProductLost).Add(b.OneTime)
	if u != nil {
		for _, band := range u.Bands {
			if band.Method == c.Method && band.P50 > 0 && !math.IsNaN(band.P90) {
				b.P50, b.P90 = band.P50, band.P90
				b.ContingencyShare = math.Max(band.P90/band.P50-1, 0)
			}
		}
	}
	// The same float product a spreadsheet forms, rounded as ROUND does.
	b.Contingency = decimal.NewFromFloat(b.Subtotal.InexactFloat64() * b.ContingencyShare).Round(b.Places)
	b.Total = b.Subtotal.Add(b.Contingency)
	return b
}

// CampaignCoefficients lists the campaign's and budget's own defaults for
// the Sources sheet, each with its physical range.
func CampaignCoefficients() []source.Coefficient {
	return []source.Coefficient{
		{Key: "campaign.shift_length", Method: "campaign", Label: "length of a shift when the scenario gives none", SI: scenario.DefaultShiftS, Dim: units.Time, Unit: "h",
			Source: "a normal laboratory working day of eight hours, one shift a day", Mark: source.CommonPractice, Lo: 3600, Hi: 24 * 3600},
		{Key: "budget.contingency_quantile", Method: "campaign", Label: "quantile of the Monte Carlo cost whose excess over the median is the contingency", SI: 0.9, Dim: units.None,
			Source: "sizing a contingency as P90 − P50 of a cost distribution", Mark: source.CommonPractice, Lo: 0.5, Hi: 1},
		{Key: "campaign.map_batches_max", Method: "campaign", Label: "largest number of batches on the map of the cheapest method", SI: float64(MapBatches[len(MapBatches)-1]), Dim: units.None,
			Source: "from a one-off batch to a long-running product", Mark: source.CommonPractice, Lo: 1, Hi: campaign.MaxBatches},
	}
}
