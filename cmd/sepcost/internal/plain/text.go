// Package plain writes a report as a terminal summary, JSON or CSV. Like
// every writer it lays out what the report holds and computes nothing.
package plain

import (
	"fmt"
	"io"
	"text/tabwriter"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/scale"
)

// hoursPerDay turns elapsed hours into working days of one 8-hour shift
// (common practice, no source).
const hoursPerDay = 8.0

// Text writes a terminal summary in the order of the workbook's Summary:
// the recommendation at the target mass first (method, cost per gram with
// its P10–P90, batch cost, time, runner-up, margin, methods left out), its
// explanation and cost drivers, the warnings at the target mass, the
// crossovers of a sweep; then per batch mass and method the key figures
// and costs (a sweep: one table); then the cautions.
func Text(w io.Writer, r *scale.Report) error {
	ew := &errWriter{w: w}
	ew.printf("%s\n", r.Title)
	ew.printf("scenario: %s   prices: %s (%s)\n", r.ScenarioFile, r.PricesFile, r.Prices.Currency)
	textDecision(ew, r)
	textWarnings(ew, r)
	assumptions(ew, r)
	campaignText(ew, r)
	if r.IsSweep {
		crossovers(ew, r)
		ew.printf("\nBy batch mass and method:\n")
		if err := sweepTable(ew, r); err != nil {
			return err
		}
	} else if err := textDetails(ew, r); err != nil {
		return err
	}
	if len(r.Cautions) > 0 {
		ew.printf("\nCautions:\n")
		for _, c := range r.Cautions {
			ew.printf("  - %s\n", c)
		}
	}
	return ew.err
}

// money writes an amount with the currency's places and thousands
// separators: "1,813.00 EUR".
func money(d decimal.Decimal, places int32, currency string) string {
	return units.Group(d.StringFixed(places)) + " " + currency
}

// perGram writes a cost per gram to three significant figures, trailing
// zeros kept as money is written: 5.80, not 5.8.
func perGram(v float64, currency string) string {
	s, _ := units.Sig3Range(v, v)
	return s + " " + currency + "/g"
}

// textDecision writes the recommendation at the target mass.
func textDecision(ew *errWriter, r *scale.Report) {
	d := r.Decision
	if d == nil {
		return
	}
	cur := r.Prices.Currency
	why := ""
	if r.TargetWhy != "" {
		why = " (" + r.TargetWhy + ")"
	}
	ew.printf("\nRecommendation at %s of crude%s:\n", units.FormatMass(d.TargetKg), why)
	tw := tabwriter.NewWriter(ew, 0, 0, 2, ' ', 0)
	if d.Winner == "" {
		fmt.Fprintf(tw, "  recommended\tnone: no method is feasible at this mass\n")
	} else {
		line := fmt.Sprintf("%s, %s of purified product", d.Winner, perGram(d.WinnerPerG, cur))
		one := ""
		if d.OnCampaign {
			line += " over the campaign"
			one = " for one batch"
		}
		if b, ok := band(r, d.Winner); ok {
			lo, hi := units.Sig3Range(b.P10, b.P90)
			line += fmt.Sprintf(" (P10–P90%s %s to %s over %d draws)", one, lo, hi, r.Uncertainty.Draws)
		}
		fmt.Fprintf(tw, "  recommended\t%s\n", line)
		if w := winner(r, d); w != nil {
			el := w.HoursElapsed
			fmt.Fprintf(tw, "  batch cost\t%s; %s elapsed, %s working days of 8 h\n", money(w.Total, w.Places, cur),
				units.Readable(el, "h"), units.Sig3(el/hoursPerDay))
		}
	}
	if d.RunnerUp != "" {
		fmt.Fprintf(tw, "  runner-up\t%s, %s\n", d.RunnerUp, perGram(d.RunnerPerG, cur))
		margin := fmt.Sprintf("%s cheaper per gram", units.Readable(d.Margin*100, "%"))
		if d.Tie {
			margin += fmt.Sprintf(": a tie, within %.0f %% of each other, inside the models' uncertainty", scale.TieMargin*100)
		}
		fmt.Fprintf(tw, "  margin\t%s\n", margin)
	}
	if d.Confidence > 0 {
		fmt.Fprintf(tw, "  confidence\tcheapest in %s of the draws\n", units.Readable(d.Confidence*100, "%"))
	}
	for _, meth := range sortedReasons(d.Infeasible) {
		reason := d.Infeasible[meth]
		fmt.Fprintf(tw, "  %s\t%s: %s\n", costing.StatusOf(false, reason).Words(), meth, costing.Detail(reason))
	}
	tw.Flush()
	for _, line := range d.Explanation {
		ew.printf("  %s\n", line)
	}
	for _, dr := range d.Drivers {
		ew.printf("  cost driver: %s, %s is %.0f %% of its cost\n", dr.Method, dr.Item, dr.Share*100)
	}
}

// band is a method's band of the uncertainty draws, if it has one.
func band(r *scale.Report, method string) (scale.Band, bool) {
	if r.Uncertainty == nil {
		return scale.Band{}, false
	}
	for _, b := range r.Uncertainty.Bands {
		if b.Method == method && b.Feasible > 0 {
			return b, true
		}
	}
	return scale.Band{}, false
}

// winner is the winner's row at the target mass, nil when the target
// mass is not among the report's masses.
func winner(r *scale.Report, d *scale.Decision) *scale.Row {
	for i, kg := range r.MassesKg {
		if diff := kg - d.TargetKg; diff > 1e-9*kg || diff < -1e-9*kg {
			continue
		}
		for j, m := range r.Methods {
			if row := r.RowAt(i, j); m == d.Winner && row.Feasible {
				return &row
			}
		}
	}
	return nil
}

// textWarnings writes every warning and caution of the models, once per
// method and wording, with the masses it was raised at, then the report's
// notes.
func textWarnings(ew *errWriter, r *scale.Report) {
	if len(r.Warnings)+len(r.Notes) == 0 {
		return
	}
	ew.printf("\nWarnings and notes:\n")
	for _, w := range r.Warnings {
		ew.printf("  %s: %s\n", w.Level, w.Line())
	}
	// The report's own notes: the scenario's, and price lines no method used.
	for _, n := range r.Notes {
		ew.printf("  %s: %s\n", n.Level, n.Text)
	}
}

// assumptions prints the defaults the user did not set that move a
// method's cost at the target mass by more than scale.AssumptionSwing.
func assumptions(ew *errWriter, r *scale.Report) {
	if len(r.Assumptions) == 0 {
		return
	}
	ew.printf("\nAssumptions: defaults not set in the scenario that move a cost per gram at %s by more than %.0f %% (set them under settings: when you know better):\n",
		units.FormatMass(r.TargetKg), scale.AssumptionSwing*100)
	for _, a := range r.Assumptions {
		ew.printf("  - %s\n", a.Words())
	}
}

// crossovers prints where the decision changes, then, as a secondary
// list, where any two methods change places.
func crossovers(ew *errWriter, r *scale.Report) {
	from, to := units.FormatMass(r.MassesKg[0]), units.FormatMass(r.MassesKg[len(r.MassesKg)-1])
	ew.printf("\nWhere the cheapest method changes (cost per gram of purified product):\n")
	if len(r.Crossovers) == 0 {
		ew.printf("  nowhere in %s to %s: the same method is cheapest throughout\n", from, to)
	}
	orNone := func(s string) string {
		if s == "" {
			return "no feasible method"
		}
		return s
	}
	for _, c := range r.Crossovers {
		ew.printf("  %s: %s below, %s above (%s", units.FormatMass(c.MassKg), orNone(c.CheaperBelow), orNone(c.CheaperAbove), c.Kind)
		if c.Detail != "" {
			ew.printf("; %s", c.Detail)
		}
		ew.printf(")\n")
	}
	if u := r.Uncertainty; u != nil {
		for _, c := range u.Crossings {
			ew.printf("  Across the Monte Carlo draws, %s.\n", c.Words())
		}
	}
	if len(r.Pairwise) == 0 {
		return
	}
	ew.printf("\nWhere two methods change places, cheapest overall or not (secondary):\n")
	for _, c := range r.Pairwise {
		ew.printf("  %s: %s cheaper below, %s cheaper above (%s)\n", units.FormatMass(c.MassKg), c.CheaperBelow, c.CheaperAbove, c.Kind)
	}
}

// textDetails writes, per batch mass and method, the key figures, time,
// waste, costs by group and the warnings.
func textDetails(ew *errWriter, r *scale.Report) error {
	cur := r.Prices.Currency
	return r.Each(func(i int, results []scale.Result) error {
		m := r.MassesKg[i]
		for j, name := range r.Methods {
			res := results[j]
			u := res.Usage
			ew.printf("\n== %s of crude by %s ==\n", units.FormatMass(m), name)
			if !u.Feasible {
				ew.printf("%s: %s\n", res.Status().Words(), costing.Detail(u.Reason))
				continue
			}
			tw := tabwriter.NewWriter(ew, 0, 0, 2, ' ', 0)
			for _, f := range u.Figures {
				if f.Detail {
					continue
				}
				fmt.Fprintf(tw, "  %s\t%s\n", f.Label, units.Readable(f.Display(), f.Unit))
			}
			el, at := u.Hours()
			fmt.Fprintf(tw, "  time, elapsed / hands-on\t%s / %s\n", units.Readable(el, "h"), units.Readable(at, "h"))
			fmt.Fprintf(tw, "  waste\t%s\n", units.Readable(u.WasteKg(), "kg"))
			for _, g := range usage.Groups {
				if s := res.Ledger.Subtotal(g); !s.IsZero() {
					fmt.Fprintf(tw, "  cost: %s\t%s\n", g, money(s, res.Ledger.Places, cur))
				}
			}
			fmt.Fprintf(tw, "  TOTAL\t%s\n", money(res.Ledger.Total, res.Ledger.Places, cur))
			if u.ProductOutKg > 0 {
				fmt.Fprintf(tw, "  per gram of purified product\t%s\n", perGram(res.PerGram(), cur))
			}
			if err := tw.Flush(); err != nil {
				return err
			}
			// Warnings at every mass; the models' notes on what they
			// assumed at the decision's mass.
			for _, n := range u.Notes {
				if n.Level != usage.Info || m == r.TargetKg {
					ew.printf("  %s: %s\n", n.Level, n.Text)
				}
			}
		}
		return nil
	})
}

// num prints a figure to three significant figures.
func num(v float64) string { return units.Sig3(v) }

type errWriter struct {
	w   io.Writer
	err error
}

func (e *errWriter) Write(p []byte) (int, error) {
	if e.err != nil {
		return 0, e.err
	}
	n, err := e.w.Write(p)
	e.err = err
	return n, err
}

func (e *errWriter) printf(format string, a ...any) { fmt.Fprintf(e, format, a...) }
