package scale

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// Advice says in plain words what knowing one input is worth, e.g.
// "measure the Rf of the product again (chromatography.product_rf): worth
// up to 1,900 EUR in this decision".
func (u *Uncertainty) Advice(w Worth) string {
	in := u.Inputs[w.Input]
	var act string
	switch in.Kind {
	case KindMeasured:
		act = "measure the " + in.Name + " again"
	case KindSetting, KindCoefficient:
		act = "pin down the " + strings.TrimSuffix(in.Name, " (one draw for every method)")
	case KindPrice:
		act = "get a firm quote for " + strings.TrimPrefix(in.Name, "price of ")
	case KindModelForm:
		act = "settle by a trial column which route sizes the silica"
	}
	if in.Act != "" {
		act = in.Act
	}
	return fmt.Sprintf("%s (%s): worth up to %s %s in this decision", act, in.Field, Money(w.Value), u.Currency)
}

// AdviceLines are the n inputs most worth knowing, as sentences for the
// decision's explanation, with what knowing everything is worth.
func (u *Uncertainty) AdviceLines(n int) []string {
	if u.EVPI <= 0 {
		return []string{fmt.Sprintf("Knowing every uncertain input exactly would not change the choice at %s of crude: no measurement is worth making for this decision.", massWords(u.TargetKg))}
	}
	out := []string{fmt.Sprintf("What to measure next, for one batch of %s of crude (%s g of product): knowing every uncertain input before choosing is worth up to %s %s on average.",
		massWords(u.TargetKg), Money(u.ProductG), Money(u.EVPI), u.Currency)}
	if len(u.Worth) == 0 {
		return append(out, "No single input known alone would change the choice: only several moving together would, so no one measurement is worth making for it.")
	}
	for k, w := range u.Worth {
		if k == n {
			break
		}
		out = append(out, capitalizeFirst(u.Advice(w))+".")
	}
	return out
}

// Words says where two methods change places across the draws, e.g.
// "chromatography and crystallization change places in 100 % of the draws:
// chromatography is cheaper below; the crossover lies between 11.8 g and
// 48.6 g of crude in eight draws of ten (P10–P90; median 28.3 g)".
func (c CrossBand) Words() string {
	return fmt.Sprintf("%s and %s change places in %s %% of the draws: %s is cheaper below; the crossover lies between %s and %s of crude "+
		"in eight draws of ten (P10–P90; median %s)", c.A, c.B, strconv.FormatFloat(math.Round(c.Share*1000)/10, 'f', -1, 64), c.A,
		massWords(c.P10), massWords(c.P90), massWords(c.P50))
}

// Money writes an amount with thousands separators and no more precision
// than a planning figure needs: whole units from 100 up, else three
// significant figures.
func Money(v float64) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return "n/a"
	}
	if math.Abs(v) < 100 {
		return strconv.FormatFloat(v, 'g', 3, 64)
	}
	s := strconv.FormatFloat(math.Round(math.Abs(v)), 'f', 0, 64)
	var b strings.Builder
	if v < 0 {
		b.WriteByte('-')
	}
	for i, c := range s {
		if i > 0 && (len(s)-i)%3 == 0 {
			b.WriteByte(',')
		}
		b.WriteRune(c)
	}
	return b.String()
}

func massWords(kg float64) string {
	switch {
	case kg >= 1:
		return strconv.FormatFloat(kg, 'g', 4, 64) + " kg"
	case kg >= 1e-3:
		return strconv.FormatFloat(kg*1e3, 'g', 4, 64) + " g"
	}
	return strconv.FormatFloat(kg*1e6, 'g', 4, 64) + " mg"
}

func capitalizeFirst(s string) string {
	if s == "" {
		return s
	}
	return strings.ToUpper(s[:1]) + s[1:]
}
