package plain

import (
	"encoding/csv"
	"encoding/json"
	"io"
	"sort"
	"strconv"
	"text/tabwriter"

	"sepcost/costing/units"
	"sepcost/scale"
)

// PortfolioText writes a year's plan for the terminal.
func PortfolioText(w io.Writer, pf *scale.Portfolio) error {
	ew := &errWriter{w: w}
	cur := pf.Currency
	ew.printf("Plan %s: %s %s in all (one-time development %s %s, charged once), %.1f h elapsed, %.1f h hands-on\n\n", pf.File, pf.Total.StringFixed(pf.Places), cur, pf.OneTime.StringFixed(pf.Places), cur, pf.HoursElapsed, pf.HoursAttended)
	tw := tabwriter.NewWriter(ew, 0, 0, 2, ' ', 0)
	tw.Write([]byte("line\tscenario\tbatch\truns\tmethod\tper batch\tone-time\ttotal\n"))
	for _, l := range pf.Lines {
		m := l.Method
		if l.Forced {
			m += " (forced)"
		}
		tw.Write([]byte(strconv.Itoa(l.Line) + "\t" + l.Title + "\t" + units.FormatMass(l.MassKg) + "\t" + strconv.Itoa(l.Runs) + "\t" + m + "\t" +
			l.PerBatch.StringFixed(pf.Places) + " " + cur + "\t" + l.OneTime.StringFixed(pf.Places) + " " + cur + "\t" + l.Total.StringFixed(pf.Places) + " " + cur + "\n"))
	}
	if err := tw.Flush(); err != nil {
		return err
	}
	if len(pf.Quarters) > 1 || (len(pf.Quarters) == 1 && pf.Quarters[0].Quarter != "") {
		ew.printf("\nBy quarter:\n")
		for _, q := range pf.Quarters {
			name := q.Quarter
			if name == "" {
				name = "(no date)"
			}
			ew.printf("  %s: %s %s\n", name, q.Total.StringFixed(pf.Places), cur)
		}
	}
	ew.printf("\nBy method:\n")
	for _, m := range sortedKeys(pf) {
		ew.printf("  %s: %s %s\n", m, pf.ByMethod[m].StringFixed(pf.Places), cur)
	}
	ew.printf("\nWaste by class:\n")
	for _, c := range pf.Classes {
		ew.printf("  %s: %.4g kg, disposal %s %s\n", c.Class, c.Kg, c.Disposal.StringFixed(pf.Places), cur)
	}
	ew.printf("\nWaste by suggested code (a stream counts under each of its codes):\n")
	for _, c := range pf.Codes {
		ew.printf("  %s %s: %.4g kg (%s)\n", c.Scheme, c.Code, c.Kg, c.Title)
	}
	ew.printf("\nSolvent purchases:\n")
	for _, s := range pf.Solvents {
		ew.printf("  %s: %.4g L, %s %s", s.Solvent, s.Litres, s.Cost.StringFixed(pf.Places), cur)
		if s.RecoveredL > 0 {
			ew.printf(" (recovered %.4g L, credit %s %s)", s.RecoveredL, s.RecoveredCr.StringFixed(pf.Places), cur)
		}
		ew.printf("\n")
	}
	if len(pf.Cautions) > 0 {
		ew.printf("\nCautions:\n")
		for _, c := range pf.Cautions {
			ew.printf("  - %s\n", c)
		}
	}
	return ew.err
}

func sortedKeys(pf *scale.Portfolio) []string {
	var ks []string
	for k := range pf.ByMethod {
		ks = append(ks, k)
	}
	sort.Strings(ks)
	return ks
}

// PortfolioCSV writes one row per plan line.
func PortfolioCSV(w io.Writer, pf *scale.Portfolio) error {
	cw := csv.NewWriter(w)
	if err := cw.Write([]string{"line", "scenario", "crude_kg", "runs", "method", "forced", "cost_per_batch", "one_time", "cost_total", "currency", "waste_kg_total", "hours_elapsed_total", "hours_hands_on_total", "date", "quarter"}); err != nil {
		return err
	}
	for _, l := range pf.Lines {
		el, at := l.Result.Usage.Hours()
		runs := float64(l.Runs)
		rec := []string{strconv.Itoa(l.Line), Safe(l.Title), kgText(l.MassKg), strconv.Itoa(l.Runs), Safe(l.Method), strconv.FormatBool(l.Forced),
			l.PerBatch.StringFixed(pf.Places), l.OneTime.StringFixed(pf.Places), l.Total.StringFixed(pf.Places), Safe(pf.Currency),
			strconv.FormatFloat(l.Result.Usage.WasteKg()*runs, 'f', 4, 64), strconv.FormatFloat(el*runs, 'f', 3, 64), strconv.FormatFloat(at*runs, 'f', 3, 64), Safe(l.Date), l.Quarter}
		if err := cw.Write(rec); err != nil {
			return err
		}
	}
	if err := cw.Write([]string{"", "total", "", "", "", "", "", pf.OneTime.StringFixed(pf.Places), pf.Total.StringFixed(pf.Places), Safe(pf.Currency), "", strconv.FormatFloat(pf.HoursElapsed, 'f', 3, 64), strconv.FormatFloat(pf.HoursAttended, 'f', 3, 64), "", ""}); err != nil {
		return err
	}
	cw.Flush()
	return cw.Error()
}

// PortfolioJSON writes the roll-up as JSON, money as fixed-decimal strings.
func PortfolioJSON(w io.Writer, pf *scale.Portfolio) error {
	type line struct {
		Line     int     `json:"line"`
		Scenario string  `json:"scenario"`
		CrudeKg  float64 `json:"crude_kg"`
		Runs     int     `json:"runs"`
		Method   string  `json:"method"`
		Forced   bool    `json:"forced"`
		PerBatch string  `json:"cost_per_batch"`
		OneTime  string  `json:"one_time"`
		Total    string  `json:"cost_total"`
		Date     string  `json:"date,omitempty"`
		Quarter  string  `json:"quarter,omitempty"`
	}
	type quarter struct {
		Quarter string `json:"quarter"`
		Total   string `json:"total"`
	}
	type class struct {
		Class    string  `json:"class"`
		Kg       float64 `json:"kg"`
		Disposal string  `json:"disposal_cost"`
	}
	type code struct {
		Scheme string  `json:"scheme"`
		Code   string  `json:"code"`
		Title  string  `json:"title"`
		Kg     float64 `json:"kg"`
	}
	type solv struct {
		Solvent    string  `json:"solvent"`
		Litres     float64 `json:"litres"`
		Cost       string  `json:"cost"`
		RecoveredL float64 `json:"recovered_litres"`
	}
	out := struct {
		Currency      string            `json:"currency"`
		Total         string            `json:"total"`
		OneTime       string            `json:"one_time"`
		ByMethod      map[string]string `json:"by_method"`
		ByQuarter     []quarter         `json:"by_quarter,omitempty"`
		HoursElapsed  float64           `json:"hours_elapsed"`
		HoursAttended float64           `json:"hours_hands_on"`
		Lines         []line            `json:"lines"`
		Classes       []class           `json:"waste_by_class"`
		Codes         []code            `json:"waste_by_code"`
		Solvents      []solv            `json:"solvent_purchases"`
		Cautions      []string          `json:"cautions"`
	}{Currency: pf.Currency, Total: pf.Total.StringFixed(pf.Places), OneTime: pf.OneTime.StringFixed(pf.Places), ByMethod: map[string]string{}, HoursElapsed: pf.HoursElapsed, HoursAttended: pf.HoursAttended, Cautions: pf.Cautions}
	for m, v := range pf.ByMethod {
		out.ByMethod[m] = v.StringFixed(pf.Places)
	}
	for _, l := range pf.Lines {
		out.Lines = append(out.Lines, line{l.Line, l.Title, l.MassKg, l.Runs, l.Method, l.Forced, l.PerBatch.StringFixed(pf.Places), l.OneTime.StringFixed(pf.Places), l.Total.StringFixed(pf.Places), l.Date, l.Quarter})
	}
	for _, q := range pf.Quarters {
		if len(pf.Quarters) > 1 || q.Quarter != "" {
			out.ByQuarter = append(out.ByQuarter, quarter{q.Quarter, q.Total.StringFixed(pf.Places)})
		}
	}
	for _, c := range pf.Classes {
		out.Classes = append(out.Classes, class{string(c.Class), c.Kg, c.Disposal.StringFixed(pf.Places)})
	}
	for _, c := range pf.Codes {
		out.Codes = append(out.Codes, code{c.Scheme, c.Code, c.Title, c.Kg})
	}
	for _, s := range pf.Solvents {
		out.Solvents = append(out.Solvents, solv{s.Solvent, s.Litres, s.Cost.StringFixed(pf.Places), s.RecoveredL})
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(out)
}
