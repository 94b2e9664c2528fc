// Package plain writes a report as a terminal summary, JSON or CSV. Like
// every writer it lays out what the report holds and computes nothing.
package plain

import (
	"fmt"
	"io"
	"strings"
	"text/tabwriter"

	"sepcost/costing"
	"sepcost/costing/scenario"
	"sepcost/costing/usage"
	"sepcost/scale"
)

// Text writes a terminal summary: per batch mass and method the key
// figures, the cost and the warnings; then the cautions.
func Text(w io.Writer, r *scale.Report) error {
	ew := &errWriter{w: w}
	ew.printf("%s\n", r.Title)
	ew.printf("scenario: %s   prices: %s (%s)\n", r.ScenarioFile, r.PricesFile, r.Prices.Currency)
	if r.IsSweep {
		ew.printf("\n")
		if err := sweepTable(ew, r); err != nil {
			return err
		}
	}
	for i, m := range r.MassesKg {
		if r.IsSweep {
			break
		}
		for j, name := range r.Methods {
			res := r.Results[i][j]
			u := res.Usage
			ew.printf("\n== %s of crude by %s ==\n", scenario.FormatMass(m), name)
			if !u.Feasible {
				if strings.HasPrefix(u.Reason, costing.NotAssessed) {
					ew.printf("%s\n", u.Reason)
				} else {
					ew.printf("not feasible: %s\n", u.Reason)
				}
				continue
			}
			tw := tabwriter.NewWriter(ew, 0, 0, 2, ' ', 0)
			for _, f := range u.Figures {
				if strings.HasPrefix(f.Key, "solvent:") || f.Key == "k_product" || f.Key == "band_cv" {
					continue
				}
				fmt.Fprintf(tw, "  %s\t%s %s\n", f.Label, num(f.Display()), f.Unit)
			}
			el, at := u.Hours()
			fmt.Fprintf(tw, "  time, elapsed / hands-on\t%s h / %s h\n", num(el), num(at))
			fmt.Fprintf(tw, "  waste\t%s kg\n", num(u.WasteKg()))
			for _, g := range usage.Groups {
				if s := res.Ledger.Subtotal(g); !s.IsZero() {
					fmt.Fprintf(tw, "  cost: %s\t%s %s\n", g, s.StringFixed(res.Ledger.Places), res.Ledger.Currency)
				}
			}
			fmt.Fprintf(tw, "  TOTAL\t%s %s\n", res.Ledger.Total.StringFixed(res.Ledger.Places), res.Ledger.Currency)
			if u.ProductOutKg > 0 {
				fmt.Fprintf(tw, "  per gram of purified product\t%.2f %s/g\n", res.PerGram(), res.Ledger.Currency)
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
	}
	if d := r.Decision; d != nil {
		why := ""
		if r.TargetWhy != "" {
			why = " (" + r.TargetWhy + ")"
		}
		ew.printf("\nDecision at %s of crude%s:\n", scenario.FormatMass(d.TargetKg), why)
		for _, line := range d.Explanation {
			ew.printf("  %s\n", line)
		}
		for _, dr := range d.Drivers {
			ew.printf("  %s: %s is %.0f %% of the cost\n", dr.Method, dr.Item, dr.Share*100)
		}
	}
	assumptions(ew, r)
	campaignText(ew, r)
	if r.IsSweep {
		crossovers(ew, r)
		if len(r.Warnings) > 0 {
			ew.printf("\nWarnings:\n")
		}
		for _, w := range r.Warnings {
			ew.printf("  %s: %s\n", w.Level, w.Line())
		}
	}
	if len(r.Cautions) > 0 {
		ew.printf("\nCautions:\n")
		for _, c := range r.Cautions {
			ew.printf("  - %s\n", c)
		}
	}
	return ew.err
}

// assumptions prints the defaults the user did not set that move a
// method's cost at the target mass by more than scale.AssumptionSwing.
func assumptions(ew *errWriter, r *scale.Report) {
	if len(r.Assumptions) == 0 {
		return
	}
	ew.printf("\nAssumptions: defaults not set in the scenario that move a cost per gram at %s by more than %.0f %% (set them under settings: when you know better):\n",
		scenario.FormatMass(r.TargetKg), scale.AssumptionSwing*100)
	for _, a := range r.Assumptions {
		ew.printf("  - %s\n", a.Words())
	}
}

// crossovers prints where the decision changes, then, as a secondary
// list, where any two methods change places.
func crossovers(ew *errWriter, r *scale.Report) {
	from, to := scenario.FormatMass(r.MassesKg[0]), scenario.FormatMass(r.MassesKg[len(r.MassesKg)-1])
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
		ew.printf("  %s: %s below, %s above (%s", scenario.FormatMass(c.MassKg), orNone(c.CheaperBelow), orNone(c.CheaperAbove), c.Kind)
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
		ew.printf("  %s: %s cheaper below, %s cheaper above (%s)\n", scenario.FormatMass(c.MassKg), c.CheaperBelow, c.CheaperAbove, c.Kind)
	}
}

// num prints a figure with about four significant digits.
func num(v float64) string {
	switch {
	case v == 0:
		return "0"
	case v >= 1000 || v <= -1000:
		return fmt.Sprintf("%.0f", v)
	default:
		return strings.TrimSuffix(strings.TrimRight(fmt.Sprintf("%.4g", v), "."), ".")
	}
}

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
