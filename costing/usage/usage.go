// Package usage describes what one purification at one batch mass
// physically consumes and produces: priced demands (materials, labour,
// energy, disposal, product lost), waste streams, activities with their
// hours, physical figures and notes. Models fill it; the ledger prices it.
// It holds quantities in SI and imports no money type.
package usage

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"sepcost/costing/units"
)

// Group sorts demands into the ledger's sections.
type Group string

// Ledger sections, in the order they are printed.
const (
	Materials Group = "materials"
	Labour    Group = "labour"
	Energy    Group = "energy"
	// EquipmentUse is the site's charge for the hours (and uses) of its
	// equipment, from the equipment table's rates.
	EquipmentUse Group = "equipment"
	Disposal     Group = "disposal"
	ProductLoss  Group = "product lost"
	Credit       Group = "credit"
	OneTime      Group = "one-time"
)

// Groups lists the sections in print order.
var Groups = []Group{Materials, Labour, Energy, EquipmentUse, Disposal, ProductLoss, Credit, OneTime}

// Price-table items every method asks for (solvents are priced by their id,
// disposal by WasteClass.DisposalItem).
const (
	ItemLabour      = "chemist time"
	ItemElectricity = "electricity"
	ItemProduct     = "product" // value of the purified compound, per mass
)

// Demand is one quantity to be priced by a price-table item.
type Demand struct {
	Item  string    // price-table item name, e.g. "silica gel", "ethyl acetate"
	Label string    // what it is for, e.g. "eluent: ethyl acetate"
	Group Group     // ledger section
	Qty   float64   // SI units of Dim; negative for a credit
	Dim   units.Dim // mass, volume, count, time or energy
	// Kg is the mass of a material bought by count (TLC plates,
	// prepacked cartridges), so that it enters the mass balance; 0 if
	// unknown or not material.
	Kg float64
	// Stream is, for a disposal demand, 1 + the index in Usage.Waste of
	// the stream it pays for (AddDisposals); 0 for any other demand.
	Stream int
}

// WasteClass is a disposal class, priced per kilogram.
type WasteClass string

// Waste classes, for costing only; classification is the site EHS
// office's call (DEVELOPERS.md, "Cautions").
const (
	NonHalogenated WasteClass = "non-halogenated solvent"
	Halogenated    WasteClass = "halogenated solvent"
	WetSolids      WasteClass = "solvent-wet solids"
	Aqueous        WasteClass = "aqueous"
)

// WasteClasses lists the classes in print order.
var WasteClasses = []WasteClass{NonHalogenated, Halogenated, WetSolids, Aqueous}

// DisposalItem is the price-table item for disposing of a class:
// "disposal: " and the class (the classes' items are constants, so that
// naming one allocates nothing).
func (c WasteClass) DisposalItem() string {
	switch c {
	case NonHalogenated:
		return disposalPrefix + string(NonHalogenated)
	case Halogenated:
		return disposalPrefix + string(Halogenated)
	case WetSolids:
		return disposalPrefix + string(WetSolids)
	case Aqueous:
		return disposalPrefix + string(Aqueous)
	}
	return disposalPrefix + string(c)
}

// disposalPrefix begins a disposal item's name and a disposal demand's label.
const disposalPrefix = "disposal: "

// DisposalLabel is the ledger label of the demand that pays for disposing
// of a stream; reports use it to find the stream's disposal line.
func (s Stream) DisposalLabel() string { return disposalPrefix + s.Name }

// Composition is the stream's make-up by mass, largest first:
// "n-heptane 72.1 %; ethyl acetate 20.3 %; ...".
func (s Stream) Composition() string {
	total := s.Kg()
	comps := append([]Component(nil), s.Components...)
	sort.SliceStable(comps, func(i, j int) bool { return comps[i].Kg > comps[j].Kg })
	var parts []string
	for _, c := range comps {
		if c.Kg > 0 && total > 0 {
			parts = append(parts, fmt.Sprintf("%s %.3g %%", c.Name, c.Kg/total*100))
		}
	}
	return strings.Join(parts, "; ")
}

// Component is one substance in a waste stream.
type Component struct {
	Name    string  // solvent id, "silica gel", "sand", "product", ...
	Kg      float64 // mass
	Solvent bool    // true for a solvent (counted in solvent totals)
}

// Stream is one waste stream.
type Stream struct {
	Name       string // e.g. "spent eluent", "solvent-wet silica"
	Class      WasteClass
	Components []Component
	VolumeM3   float64 // liquid volume; 0 for solids
}

// Kg is the stream's total mass.
func (s Stream) Kg() float64 {
	t := 0.0
	for _, c := range s.Components {
		t += c.Kg
	}
	return t
}

// Activity is one step of the work with its elapsed and attended time.
type Activity struct {
	Name     string
	Elapsed  float64 // seconds of clock time
	Attended float64 // seconds a person is at the bench
}

// Figure is a physical result worth showing (silica mass, column diameter...).
type Figure struct {
	Key FigureKey // stable identifier for writers and tests (figures.go)
	// Detail marks a figure for the method sheet and JSON only, left out
	// of the terminal summary.
	Detail bool
	Label  string  // plain words
	SI     float64 // value in SI
	Unit   string  // display unit, "" for plain numbers
}

// Level grades a note.
type Level string

// Note levels.
const (
	Info    Level = "info"
	Warning Level = "warning"
	Caution Level = "caution"
)

// ManyRepeats is the number of runs or batches of one purification from
// which the plan is impractical as a single batch (a campaign of repeated
// columns or vessel loads, with the handling errors and time that brings):
// a model reports it as a warning, not as information (common practice,
// no source: a chemist schedules a handful of repeats, not dozens).
const ManyRepeats = 10

// RepeatLevel is the level of a note about n runs or batches: Warning from
// ManyRepeats, Info below.
func RepeatLevel(n int) Level {
	if n >= ManyRepeats {
		return Warning
	}
	return Info
}

// Note is an assumption used, a warning about the inputs, or a safety caution.
type Note struct {
	Level Level
	Text  string
}

// Usage is the physical result of one method at one batch mass.
type Usage struct {
	Method       string
	CrudeKg      float64 // crude mass to purify
	ProductInKg  float64 // product contained in the crude
	ProductOutKg float64 // purified product recovered
	// ImpurityOutKg is the matter other than the product isolated with it:
	// the impurity left in the crystals, in the heart cut or in the pooled
	// fractions, kg. The isolated mass is ProductOutKg + ImpurityOutKg
	// (IsolatedKg); a model whose balance closes accounts for every input
	// as isolated mass or waste.
	ImpurityOutKg float64
	Feasible      bool
	Reason        string // why not feasible
	Equipment     string // the equipment used, in words, e.g. "300 mm column × 51 runs"
	Figures       []Figure
	Demands       []Demand
	Waste         []Stream
	Activities    []Activity
	Notes         []Note
	Tables        []Table // small tables a model shows beside its figures (e.g. a trade-off)
	// Quiet, when set, drops notes as they are added (Notef writes
	// nothing): a usage made only to be costed, as a Monte Carlo draw is,
	// is never read for its words, and wording them is a good part of
	// its cost. Figures, demands and waste are the same either way.
	Quiet bool `json:"-"`
	// CostOnly, when set, also drops figures as they are added
	// (AddFigure records nothing): a usage of a quiet plan (a Monte Carlo
	// draw, a search over masses, a trial of a setting) is read only for
	// its demands, product, feasibility and equipment, never shown.
	CostOnly bool `json:"-"`
	// EquipmentID names the pieces of equipment the plan uses and how many
	// runs or batches, without what changes continuously with the mass
	// (a bed height): e.g. "300 mm column × 51 runs; rotary evaporator
	// 20 L". Two plans of one method with the same EquipmentID use the
	// same equipment as often, so their costs join smoothly in the mass;
	// a change of it is an equipment step (the crossover search bisects
	// it). The model sets it beside Equipment, from the same choices.
	EquipmentID string
}

// Table is a small table of numbers a model shows on its method sheet.
type Table struct {
	Key     string
	Title   string
	Columns []string
	Rows    [][]float64
}

// New starts the usage of a method at a crude mass, feasible until a model
// says otherwise.
func New(method string, crudeKg, productInKg float64) Usage {
	return NewWithRoom(method, crudeKg, productInKg, 64, 16)
}

// NewWithRoom is New with room for the number of figures and demands a
// model knows it will add (a model that makes many usages, most of them
// only costed, should not reserve more).
func NewWithRoom(method string, crudeKg, productInKg float64, figures, demands int) Usage {
	return Usage{Method: method, CrudeKg: crudeKg, ProductInKg: productInKg, Feasible: true,
		Figures: make([]Figure, 0, figures), Demands: make([]Demand, 0, demands)}
}

// Compact gives the usage's figures and demands slices of their own
// length: New reserves room for a model to add to, which a usage kept in
// a report (thousands in a sweep) should not hold on to.
func (u *Usage) Compact() {
	if cap(u.Figures) > len(u.Figures) {
		u.Figures = append([]Figure(nil), u.Figures...)
	}
	if cap(u.Demands) > len(u.Demands) {
		u.Demands = append([]Demand(nil), u.Demands...)
	}
}

// Notef adds a note.
func (u *Usage) Notef(l Level, format string, a ...any) {
	if u.Quiet {
		return
	}
	u.Notes = append(u.Notes, Note{Level: l, Text: fmt.Sprintf(format, a...)})
}

// AddFigure adds a figure; a NaN or infinite value is left out (never
// shown). One solvent's volume (SolventFigure) is a detail figure.
func (u *Usage) AddFigure(key FigureKey, label string, si float64, unit string) {
	if math.IsNaN(si) || math.IsInf(si, 0) || u.CostOnly {
		return
	}
	u.Figures = append(u.Figures, Figure{Key: key, Label: label, SI: si, Unit: unit, Detail: key.PerSolvent()})
}

// AddCountedDemand adds a material priced by count whose mass is known
// (kg in all), so that the mass balance counts it.
func (u *Usage) AddCountedDemand(item, label string, g Group, count, kg float64) {
	u.Demands = append(u.Demands, Demand{Item: item, Label: label, Group: g, Qty: count, Dim: units.Count, Kg: kg})
}

// AddDemand adds a quantity to be priced. A NaN or infinite quantity is
// kept, so that the ledger refuses it loudly rather than a cost going missing.
func (u *Usage) AddDemand(item, label string, g Group, qty float64, dim units.Dim) {
	u.Demands = append(u.Demands, Demand{Item: item, Label: label, Group: g, Qty: qty, Dim: dim})
}

// AddDisposals adds one disposal demand per waste stream, in stream order:
// the stream's mass priced by its class's disposal item, linked to the
// stream by Demand.Stream.
func (u *Usage) AddDisposals() {
	for i, s := range u.Waste {
		u.Demands = append(u.Demands, Demand{Item: s.Class.DisposalItem(), Label: s.DisposalLabel(), Group: Disposal,
			Qty: s.Kg(), Dim: units.Mass, Stream: i + 1})
	}
}

// IsolatedKg is the mass isolated as product, with the impurity it
// contains: ProductOutKg + ImpurityOutKg.
func (u Usage) IsolatedKg() float64 { return u.ProductOutKg + u.ImpurityOutKg }

// Hours returns total elapsed and attended hours.
func (u Usage) Hours() (elapsed, attended float64) {
	for _, a := range u.Activities {
		elapsed += a.Elapsed
		attended += a.Attended
	}
	return elapsed / 3600, attended / 3600
}

// WasteKg is the total mass of all waste streams.
func (u Usage) WasteKg() float64 {
	t := 0.0
	for _, s := range u.Waste {
		t += s.Kg()
	}
	return t
}

// Figure returns a figure by key.
func (u Usage) Figure(key FigureKey) (Figure, bool) {
	for _, f := range u.Figures {
		if f.Key == key {
			return f, true
		}
	}
	return Figure{}, false
}

// MarkDetail marks figures already added as details: shown on the method
// sheet and in JSON, left out of the terminal summary.
func (u *Usage) MarkDetail(keys ...FigureKey) {
	for i := range u.Figures {
		for _, k := range keys {
			if u.Figures[i].Key == k {
				u.Figures[i].Detail = true
			}
		}
	}
}

// Display is a figure's value in its display unit.
func (f Figure) Display() float64 {
	if f.Unit == "" {
		return f.SI
	}
	return units.MustTo(f.SI, f.Unit)
}
