package workbook

import (
	"strings"
	"unicode"
	"unicode/utf8"

	"github.com/xuri/excelize/v2"
)

// cellName is the A1 reference of a cell; col and row are 1-based.
func cellName(col, row int) string {
	s, err := excelize.CoordinatesToCellName(col, row)
	if err != nil {
		// Columns and rows here are small positive numbers computed by this
		// package; an error is a programming error.
		panic(err)
	}
	return s
}

// absName is the absolute reference ($C$7) of a cell.
func absName(col, row int) string {
	s, err := excelize.CoordinatesToCellName(col, row, true)
	if err != nil {
		panic(err)
	}
	return s
}

// colName is the letter name of a column.
func colName(col int) string {
	s, err := excelize.ColumnNumberToName(col)
	if err != nil {
		panic(err)
	}
	return s
}

// sheetRef prefixes a reference with a sheet name, quoted when the name
// holds anything but letters and digits (Excel's rule for sheet names in
// formulas).
func sheetRef(sheet, ref string) string {
	plain := sheet != ""
	for _, r := range sheet {
		if !(r < 128 && (unicode.IsLetter(r) || unicode.IsDigit(r))) {
			plain = false
			break
		}
	}
	if plain {
		return sheet + "!" + ref
	}
	return "'" + strings.ReplaceAll(sheet, "'", "''") + "'!" + ref
}

// capitalize upper-cases the first letter: "chromatography" → "Chromatography".
func capitalize(s string) string {
	r, n := utf8.DecodeRuneInString(s)
	if n == 0 {
		return s
	}
	return string(unicode.ToUpper(r)) + s[n:]
}

// textWidth is the length in characters (runes, as
// utf8.RuneCountInString counts them) of the longest line of s, counted in
// one pass: ASCII a byte at a time, other runes decoded.
func textWidth(s string) int {
	w, n := 0, 0
	for k := 0; k < len(s); {
		b := s[k]
		switch {
		case b == '\n':
			w, n = max(w, n), 0
			k++
			continue
		case b < utf8.RuneSelf:
			k++
		default:
			_, size := utf8.DecodeRuneInString(s[k:])
			k += size
		}
		n++
	}
	return max(w, n)
}

// wrappedLines estimates how many lines s takes when wrapped in a column
// of the given width (in character widths of the default font). Words are
// not split; a word longer than the line takes the lines it needs.
func wrappedLines(s string, width float64) int {
	per := int(width) - 1
	if per < 1 {
		per = 1
	}
	lines := 0
	for {
		para, rest, more := strings.Cut(s, "\n")
		lines += paraLines(para, per)
		if !more {
			return lines
		}
		s = rest
	}
}

// paraLines is the lines one paragraph takes at per characters a line,
// its words separated by white space as strings.Fields separates them,
// counted without cutting the paragraph into words.
func paraLines(para string, per int) int {
	n, used := 1, 0
	w, inWord := 0, false
	word := func() {
		switch {
		case used == 0:
			used = w
		case used+1+w <= per:
			used += 1 + w
		default:
			n++
			used = w
		}
		for used > per {
			n++
			used -= per
		}
	}
	for k := 0; k < len(para); {
		space := false
		if b := para[k]; b < utf8.RuneSelf { // ASCII: one byte, a table look-up
			space = asciiSpace[b]
			k++
		} else {
			r, n := utf8.DecodeRuneInString(para[k:])
			space = unicode.IsSpace(r)
			k += n
		}
		if space {
			if inWord {
				word()
			}
			w, inWord = 0, false
			continue
		}
		w, inWord = w+1, true
	}
	if inWord {
		word()
	}
	return n
}

// asciiSpace marks the ASCII characters unicode.IsSpace counts as white
// space: tab, newline, vertical tab, form feed, carriage return, space.
var asciiSpace = [utf8.RuneSelf]bool{'\t': true, '\n': true, '\v': true, '\f': true, '\r': true, ' ': true}

// unitPowers writes the powers in a unit as a reader writes them: m^2 as
// m², m3 as m³ (the units package spells them for typing).
var unitPowers = strings.NewReplacer("^2", "²", "^3", "³", "m3", "m³", "m2", "m²")

// unitLabel is a unit as a sheet shows it: "W/(m²·K)" for "W/(m^2·K)".
func unitLabel(u string) string { return unitPowers.Replace(u) }
