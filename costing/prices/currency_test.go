package prices

import "testing"

func TestMinorUnits(t *testing.T) {
	t.Parallel()
	// Source for every row: ISO 4217:2015 list one, minor-unit column,
	// confirmed against a public reproduction of list one
	// (moneyphp/iso-currencies, resources/current.php).
	tests := []struct {
		code string
		want int32
	}{
		{"EUR", 2}, // euro: cent = 1/100
		{"USD", 2}, // US dollar: cent
		{"GBP", 2}, // pound sterling: penny
		{"CHF", 2}, // Swiss franc: centime
		{"JPY", 0}, // yen: no minor unit in use
		{"KRW", 0}, // won
		{"ISK", 0}, // Iceland krona
		{"CLP", 0}, // Chilean peso
		{"VND", 0}, // dong
		{"XOF", 0}, // CFA franc BCEAO
		{"BHD", 3}, // Bahraini dinar: 1000 fils
		{"KWD", 3}, // Kuwaiti dinar: 1000 fils
		{"OMR", 3}, // rial Omani: 1000 baisa
		{"JOD", 3}, // Jordanian dinar
		{"TND", 3}, // Tunisian dinar: 1000 millimes
		{"IQD", 3}, // Iraqi dinar
		{"LYD", 3}, // Libyan dinar
		{"CLF", 4}, // Unidad de Fomento (unit of account)
		{"HUF", 2}, // forint: ISO keeps 2 although fillér coins are gone
		{"IDR", 2}, // rupiah: likewise 2 in ISO 4217
		// Letter case and spaces are ignored (common practice, no source).
		{" jpy ", 0},
		// A code not in list one falls back to 2 (documented behaviour).
		{"ZZZ", 2},
	}
	for _, tc := range tests {
		if got := MinorUnits(tc.code); got != tc.want {
			t.Errorf("MinorUnits(%q) = %d, want %d", tc.code, got, tc.want)
		}
	}
}

func TestValidCode(t *testing.T) {
	t.Parallel()
	// ISO 4217 alphabetic codes are three upper-case letters (ISO
	// 4217:2015, from memory).
	for _, s := range []string{"EUR", "USD", "JPY", "XTS"} {
		if !validCode(s) {
			t.Errorf("validCode(%q) = false", s)
		}
	}
	for _, s := range []string{"", "EU", "EURO", "eur", "E1R", "€", "ÉUR"} {
		if validCode(s) {
			t.Errorf("validCode(%q) = true", s)
		}
	}
}
