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
			for _, n := range u.Notes {
				if n.Level != usage.Info {
					ew.printf("  %s: %s\n", n.Level, n.Text)
				}
			}
		}
	}
	if d := r.Decision; d != nil {
		ew.printf("\nDecision at %s of crude:\n", scenario.FormatMass(d.TargetKg))
		for _, line := range d.Explanation {
			ew.printf("  %s\n", line)
		}
		for _, dr := range d.Drivers {
			ew.printf("  %s: %s is %.0f %% of the cost\n", dr.Method, dr.Item, dr.Share*100)
		}
	}
	campaignText(ew, r)
	if r.IsSweep {
		ew.printf("\nCrossovers (cost per gram of purified product):\n")
		if len(r.Crossovers) == 0 {
			ew.printf("  none in %s to %s: the cost order of the methods does not change\n", scenario.FormatMass(r.MassesKg[0]), scenario.FormatMass(r.MassesKg[len(r.MassesKg)-1]))
		}
		for _, c := range r.Crossovers {
			kind := "smooth crossing"
			if c.Step {
				kind = "at an equipment step"
			}
			ew.printf("  %s: %s cheaper below, %s cheaper above (%s)\n", scenario.FormatMass(c.MassKg), c.CheaperBelow, c.CheaperAbove, kind)
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
