package workbook

import (
	"fmt"
	"strings"

	"github.com/shopspring/decimal"
	"github.com/xuri/excelize/v2"
)

// fmtMeta describes how a style shows numbers, for fitting column widths.
type fmtMeta struct {
	places   int  // decimal places shown; -1 for the General format
	grouping bool // thousands separators
	suffix   int  // characters after the number, e.g. 4 for ` EUR`
}

// styles holds the style IDs of the workbook. They are created in a fixed
// order so that the same report gives the same styles.
type styles struct {
	title, heading, header, massHeader int
	text, bold, wrap, note             int
	general, generalBold               int
	figure                             int // physical figures: thousands separators, up to 3 decimals
	money, moneyBold, perGram          int
	price                              map[int32]int // by decimal places shown
	hours, hoursBold                   int
	kg, kgBold, litres                 int
	percent                            int
	factor                             int // a ratio shown as "12.3×"
	ratio                              int // a mass ratio (E-factor, PMI), two decimals
	ruleNumber                         int // a number heading a paragraph: left and top aligned
	headerRight                        int // the header of a column of numbers, aligned with them
	headerIndent, wrapIndent           int // header and wrapped text set off from numbers on their left
	kgFine                             int // kg with up to six decimals, for batches of milligrams
	days                               int // working days, "2.5 working days of 8 h"
	hoursUnit                          int // hours with their unit, "11.03 h", where no header names it
	boldIndent                         int // a bold word set off from a number on its left
	textIndent                         int // words beside a figure, set off from it
	wrapSmall                          int // wrapped text in a smaller font (cautions)
	wrapNote                           int // wrapped italic text (a reason in a table)
	minPlaces, maxPlaces               int32
	meta                               map[int]fmtMeta
}

// money describes how money is shown: the currency code and the number of
// decimal places of its minor unit (from the ledger), and the places needed
// to show every price as written.
type money struct {
	currency    string
	places      int32
	pricePlaces int32
}

// currencyFormat is a number format such as `#,##0.00 "EUR"`.
func currencyFormat(code string, places int32, per string) string {
	n := "#,##0"
	if places > 0 {
		n += "." + strings.Repeat("0", int(places))
	}
	return n + ` "` + code + per + `"`
}

// sig3 shows a mass or volume to about three significant figures:
// "2,732", "14.03", "0.363", "0.002".
const sig3 = "[>=100]#,##0;[>=1]#,##0.0#;0.00##"

func newStyles(f *excelize.File, m money) (*styles, error) {
	st := &styles{meta: map[int]fmtMeta{}}
	bottom := []excelize.Border{{Type: "bottom", Color: "000000", Style: 1}}
	top := []excelize.Border{{Type: "top", Color: "000000", Style: 1}}
	str := func(s string) *string { return &s }
	moneyFmt := currencyFormat(m.currency, m.places, "")
	// Cost per gram to about three significant figures: whole units from
	// 100, the minor unit from 1, four places below (a rate, not an amount
	// paid, so not held to the minor unit).
	perGramFmt := fmt.Sprintf(`[>=100]#,##0" %[1]s/g";[>=1]#,##0.00" %[1]s/g";0.0000" %[1]s/g"`, m.currency)
	suffix := len(m.currency) + 1
	defs := []struct {
		id   *int
		s    excelize.Style
		meta fmtMeta
	}{
		{&st.title, excelize.Style{Font: &excelize.Font{Bold: true, Size: 14}}, fmtMeta{places: -1}},
		{&st.heading, excelize.Style{Font: &excelize.Font{Bold: true, Size: 12}}, fmtMeta{places: -1}},
		{&st.header, excelize.Style{Font: &excelize.Font{Bold: true}, Border: bottom,
			Alignment: &excelize.Alignment{WrapText: true, Vertical: "bottom"}}, fmtMeta{places: -1}},
		{&st.massHeader, excelize.Style{Font: &excelize.Font{Bold: true}, Border: bottom,
			Alignment: &excelize.Alignment{Horizontal: "center"}}, fmtMeta{places: -1}},
		{&st.text, excelize.Style{Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{places: -1}},
		{&st.bold, excelize.Style{Font: &excelize.Font{Bold: true}, Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{places: -1}},
		{&st.wrap, excelize.Style{Alignment: &excelize.Alignment{WrapText: true, Vertical: "top"}}, fmtMeta{places: -1}},
		{&st.note, excelize.Style{Font: &excelize.Font{Italic: true}}, fmtMeta{places: -1}},
		{&st.general, excelize.Style{Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{places: -1}},
		// Physical figures to about three significant figures: whole
		// numbers from 100, up to three decimals from 1, up to six below
		// ("517,147", "42.6", "0.000691"); never "99999.999999969".
		{&st.figure, excelize.Style{CustomNumFmt: str("[>=100]#,##0;[>=1]#,##0.0##;0.000###"), Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{3, true, 0}},
		{&st.generalBold, excelize.Style{Font: &excelize.Font{Bold: true}, Border: top}, fmtMeta{places: -1}},
		{&st.money, excelize.Style{CustomNumFmt: str(moneyFmt), Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{int(m.places), true, suffix}},
		{&st.moneyBold, excelize.Style{CustomNumFmt: str(moneyFmt), Font: &excelize.Font{Bold: true}, Border: top},
			fmtMeta{int(m.places), true, suffix}},
		{&st.perGram, excelize.Style{CustomNumFmt: str(perGramFmt), Alignment: &excelize.Alignment{Vertical: "top"}},
			fmtMeta{2, true, suffix + 2}},
		{&st.hours, excelize.Style{CustomNumFmt: str("[>=100]#,##0;0.00"), Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{places: 2}},
		{&st.hoursBold, excelize.Style{CustomNumFmt: str("[>=100]#,##0;0.00"), Font: &excelize.Font{Bold: true}, Border: top}, fmtMeta{places: 2}},
		{&st.kg, excelize.Style{CustomNumFmt: str(sig3), Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{3, true, 0}},
		{&st.kgBold, excelize.Style{CustomNumFmt: str("#,##0.000"), Font: &excelize.Font{Bold: true}, Border: top}, fmtMeta{3, true, 0}},
		{&st.litres, excelize.Style{CustomNumFmt: str(sig3), Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{3, true, 0}},
		{&st.percent, excelize.Style{CustomNumFmt: str("0.0%"), Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{1, false, 1}},
		{&st.factor, excelize.Style{CustomNumFmt: str(`#,##0.00"×"`), Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{2, true, 1}},
		{&st.ratio, excelize.Style{CustomNumFmt: str("#,##0.00"), Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{2, true, 0}},
		{&st.headerRight, excelize.Style{Font: &excelize.Font{Bold: true}, Border: bottom,
			Alignment: &excelize.Alignment{WrapText: true, Vertical: "bottom", Horizontal: "right"}}, fmtMeta{places: -1}},
		{&st.headerIndent, excelize.Style{Font: &excelize.Font{Bold: true}, Border: bottom,
			Alignment: &excelize.Alignment{WrapText: true, Vertical: "bottom", Horizontal: "left", Indent: 1}}, fmtMeta{places: -1}},
		{&st.wrapIndent, excelize.Style{Alignment: &excelize.Alignment{WrapText: true, Vertical: "top", Horizontal: "left", Indent: 1}}, fmtMeta{places: -1}},
		{&st.kgFine, excelize.Style{CustomNumFmt: str("[<1]0.000###;#,##0.000"), Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{6, true, 0}},
		{&st.days, excelize.Style{CustomNumFmt: str(`0.0" working days of 8 h"`), Alignment: &excelize.Alignment{Vertical: "top", Horizontal: "left", Indent: 1}}, fmtMeta{1, false, 22}},
		{&st.textIndent, excelize.Style{Alignment: &excelize.Alignment{Vertical: "top", Horizontal: "left", Indent: 1}}, fmtMeta{places: -1}},
		{&st.wrapNote, excelize.Style{Font: &excelize.Font{Italic: true}, Alignment: &excelize.Alignment{WrapText: true, Vertical: "top"}}, fmtMeta{places: -1}},
		{&st.wrapSmall, excelize.Style{Font: &excelize.Font{Size: 9}, Alignment: &excelize.Alignment{WrapText: true, Vertical: "top"}}, fmtMeta{places: -1}},
		{&st.ruleNumber, excelize.Style{Alignment: &excelize.Alignment{Horizontal: "left", Vertical: "top"}}, fmtMeta{places: -1}},
		{&st.hoursUnit, excelize.Style{CustomNumFmt: str(`[>=100]#,##0" h";0.00" h"`), Alignment: &excelize.Alignment{Vertical: "top"}}, fmtMeta{2, true, 2}},
		{&st.boldIndent, excelize.Style{Font: &excelize.Font{Bold: true}, Alignment: &excelize.Alignment{Vertical: "top", Horizontal: "left", Indent: 1}}, fmtMeta{places: -1}},
	}
	for _, d := range defs {
		s := d.s
		id, err := f.NewStyle(&s)
		if err != nil {
			return nil, fmt.Errorf("workbook: style: %w", err)
		}
		*d.id = id
		st.meta[id] = d.meta
	}
	// Prices keep the places they were written with, from the currency's
	// minor unit up to pricePlaces (e.g. 95.00 EUR and 0.185 EUR).
	st.price = map[int32]int{}
	for p := m.places; p <= m.pricePlaces; p++ {
		id, err := f.NewStyle(&excelize.Style{CustomNumFmt: str(currencyFormat(m.currency, p, "")), Alignment: &excelize.Alignment{Vertical: "top"}})
		if err != nil {
			return nil, fmt.Errorf("workbook: style: %w", err)
		}
		st.price[p] = id
		st.meta[id] = fmtMeta{int(p), true, suffix}
	}
	st.minPlaces, st.maxPlaces = m.places, m.pricePlaces
	return st, nil
}

// priceStyle shows a price with the places it was written with, at least
// the currency's minor unit and at most six.
func (st *styles) priceStyle(p decimal.Decimal) int {
	places := -p.Exponent()
	if places < st.minPlaces {
		places = st.minPlaces
	}
	if places > st.maxPlaces {
		places = st.maxPlaces
	}
	return st.price[places]
}
