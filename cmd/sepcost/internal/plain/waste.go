package plain

import (
	"encoding/csv"
	"encoding/json"
	"io"
	"strconv"
	"strings"

	"sepcost/costing/units"
	"sepcost/costing/waste"
	"sepcost/scale"
)

// wasteHeader is the shape of the waste forecast: one row per stream.
var wasteHeader = []string{"scenario", "crude_kg", "method", "recommended", "stream", "class", "kg", "litres", "composition_by_mass",
	"eu_list_of_waste", "us_epa", "rules_applied", "disposal_cost", "currency", "caution"}

func recommended(r *scale.Report, row scale.WasteRow) string {
	if d := r.Decision; d != nil && d.TargetKg == row.CrudeKg && d.Winner == row.Method {
		return "yes"
	}
	return ""
}

// WasteCSV writes the waste forecast, one row per stream, for an EHS office
// to paste into its forecast. Text cells are guarded against formula injection.
func WasteCSV(w io.Writer, r *scale.Report) error {
	cw := csv.NewWriter(w)
	if err := cw.Write(wasteHeader); err != nil {
		return err
	}
	cur := r.Prices.Currency
	for _, row := range r.Waste {
		cost := ""
		if row.HasDisposal {
			cost = row.Disposal.StringFixed(r.RowAt(row.Mass, row.Col).Places)
		}
		rec := []string{Safe(r.Title), kgText(row.CrudeKg), Safe(row.Method), recommended(r, row), Safe(row.Stream.Name),
			Safe(string(row.Stream.Class)), strconv.FormatFloat(row.Kg, 'f', 4, 64), strconv.FormatFloat(row.Litres, 'f', 4, 64),
			Safe(row.Stream.Composition()), Safe(row.Classification.SchemeCodes("EU LoW")), Safe(row.Classification.SchemeCodes("US EPA")),
			Safe(strings.Join(row.Classification.Rules, " | ")), cost, Safe(cur), Safe(row.Classification.Caution)}
		if err := cw.Write(rec); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}

type jsonWasteRow struct {
	CrudeKg     float64            `json:"crude_kg"`
	Method      string             `json:"method"`
	Recommended bool               `json:"recommended"`
	Stream      string             `json:"stream"`
	Class       string             `json:"class"`
	Kg          float64            `json:"kg"`
	Litres      float64            `json:"litres"`
	Components  map[string]float64 `json:"components_kg"`
	Codes       []waste.Code       `json:"codes"`
	Rules       []string           `json:"rules_applied"`
	Disposal    string             `json:"disposal_cost,omitempty"`
}

type jsonWaste struct {
	Scenario string         `json:"scenario"`
	Currency string         `json:"currency"`
	Sector   string         `json:"sector"`
	Streams  []jsonWasteRow `json:"streams"`
	Caution  string         `json:"caution"`
}

// WasteJSON writes the waste forecast as JSON.
func WasteJSON(w io.Writer, r *scale.Report) error {
	out := jsonWaste{Scenario: r.Title, Currency: r.Prices.Currency, Sector: r.WasteSector, Caution: waste.Caution}
	for _, row := range r.Waste {
		jr := jsonWasteRow{CrudeKg: row.CrudeKg, Method: row.Method, Recommended: recommended(r, row) == "yes", Stream: row.Stream.Name,
			Class: string(row.Stream.Class), Kg: row.Kg, Litres: row.Litres, Components: map[string]float64{}, Codes: row.Classification.Codes, Rules: row.Classification.Rules}
		for _, c := range row.Stream.Components {
			jr.Components[c.Name] += c.Kg
		}
		if row.HasDisposal {
			jr.Disposal = row.Disposal.StringFixed(r.RowAt(row.Mass, row.Col).Places)
		}
		out.Streams = append(out.Streams, jr)
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(out)
}

// WasteText writes the waste forecast for the terminal.
func WasteText(w io.Writer, r *scale.Report) error {
	ew := &errWriter{w: w}
	ew.printf("Waste forecast: %s (codes from %s)\n", r.Title, r.WasteSector)
	for _, row := range r.Waste {
		ew.printf("\n%s, %s%s: %s (%s)\n", units.FormatMass(row.CrudeKg), row.Method, map[string]string{"yes": " (recommended)"}[recommended(r, row)], row.Stream.Name, row.Stream.Class)
		ew.printf("  %.4g kg, %.4g L: %s\n", row.Kg, row.Litres, row.Stream.Composition())
		ew.printf("  suggested codes: EU %s; US %s\n", orNone(row.Classification.SchemeCodes("EU LoW")), orNone(row.Classification.SchemeCodes("US EPA")))
		for _, rule := range row.Classification.Rules {
			ew.printf("    - %s\n", rule)
		}
		if row.HasDisposal {
			ew.printf("  disposal: %s %s\n", row.Disposal.StringFixed(r.RowAt(row.Mass, row.Col).Places), r.Prices.Currency)
		}
	}
	ew.printf("\n%s\n", waste.Caution)
	return ew.err
}

func orNone(s string) string {
	if s == "" {
		return "none"
	}
	return s
}
