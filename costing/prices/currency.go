package prices

import "strings"

// MinorUnits is the number of decimal places of a currency's minor unit,
// the "exponent" column of ISO 4217: a price in that currency is rounded
// to 10^(−digits) of the major unit.
//
//	amount = round(x, MinorUnits(code))   e.g. 2 places for EUR (cents), 0 for JPY
//
// code is an ISO 4217 alphabetic code (letter case and surrounding space
// are ignored). The table holds the codes whose exponent is not 2; every
// other code, including unknown ones and the codes ISO lists with no minor
// unit ("N.A.": gold XAU, the SDR XDR, the test code XTS...), gives 2.
//
// Source: ISO 4217:2015, "Codes for the representation of currencies",
// list one (current currency and funds code list, kept up to date by the
// ISO 4217 maintenance agency; its numbering as Table A.1 is from memory).
// The exponents below are confirmed against a public machine-readable
// reproduction of list one (moneyphp/iso-currencies, resources/current.php);
// codes added to list one since then are from memory and all have exponent
// 2 (e.g. SLE, VED, ZWG, XCG).
func MinorUnits(code string) int32 {
	if d, ok := minorUnits[strings.ToUpper(strings.TrimSpace(code))]; ok {
		return d
	}
	return 2
}

// minorUnits holds the ISO 4217 list-one codes whose minor unit is not 2
// (source and mark: see MinorUnits).
var minorUnits = map[string]int32{
	// exponent 0
	"BIF": 0, // Burundi franc
	"CLP": 0, // Chilean peso
	"DJF": 0, // Djibouti franc
	"GNF": 0, // Guinean franc
	"ISK": 0, // Iceland krona
	"JPY": 0, // yen
	"KMF": 0, // Comorian franc
	"KRW": 0, // won
	"PYG": 0, // guarani
	"RWF": 0, // Rwanda franc
	"UGX": 0, // Uganda shilling
	"UYI": 0, // Uruguay peso en unidades indexadas (fund)
	"VND": 0, // dong
	"VUV": 0, // vatu
	"XAF": 0, // CFA franc BEAC
	"XOF": 0, // CFA franc BCEAO
	"XPF": 0, // CFP franc
	// exponent 3
	"BHD": 3, // Bahraini dinar
	"IQD": 3, // Iraqi dinar
	"JOD": 3, // Jordanian dinar
	"KWD": 3, // Kuwaiti dinar
	"LYD": 3, // Libyan dinar
	"OMR": 3, // rial Omani
	"TND": 3, // Tunisian dinar
	// exponent 4 (units of account, listed for completeness)
	"CLF": 4, // Unidad de Fomento (fund)
	"UYW": 4, // Unidad Previsional (fund)
}

// validCode reports whether s has the form of an ISO 4217 alphabetic
// code: exactly three upper-case Latin letters (ISO 4217:2015; from
// memory).
func validCode(s string) bool {
	if len(s) != 3 {
		return false
	}
	for i := 0; i < 3; i++ {
		if s[i] < 'A' || s[i] > 'Z' {
			return false
		}
	}
	return true
}
