package waste

import (
	"fmt"
	"strings"

	"sepcost/costing/source"
	"sepcost/costing/units"
)

// Schemes of Code.Scheme.
const (
	SchemeEU = "EU LoW"
	SchemeUS = "US EPA"
)

// Code is one suggested waste code with the text it comes from.
type Code struct {
	Scheme string      // SchemeEU or SchemeUS
	Code   string      // "07 05 04*", "F003", "D001"
	Title  string      // the entry's title in the regulation, in short
	Source string      // regulation, paragraph or entry
	Mark   source.Mark // confirmed or from memory
}

// Caution is carried by every Classification.
const Caution = "Suggested codes only, for planning: waste classification is decided by the site's environmental-health-and-safety (EHS) office under the rules that apply locally (the national transposition of the EU List of Waste; US federal and state hazardous-waste programmes). These suggestions are not a waste determination."

// Sector selects the chapter of the EU List of Waste.
type Sector int

// Sectors. The zero value is Pharmaceuticals.
const (
	// Pharmaceuticals is chapter 07 05, wastes from the manufacture,
	// formulation, supply and use of pharmaceuticals.
	Pharmaceuticals Sector = iota
	// FineChemicals is chapter 07 07, wastes from the manufacture,
	// formulation, supply and use of fine chemicals and chemical products
	// not otherwise specified.
	FineChemicals
)

// Chapter is "07 05" or "07 07".
func (s Sector) Chapter() string {
	if s == FineChemicals {
		return "07 07"
	}
	return "07 05"
}

// String names the sector in plain words.
func (s Sector) String() string {
	if s == FineChemicals {
		return "fine chemicals (LoW 07 07)"
	}
	return "pharmaceuticals (LoW 07 05)"
}

// ParseSector reads a sector as written in a scenario: "pharmaceuticals",
// "fine chemicals", "07 05" or "07 07" (case and spaces ignored). The error
// names what was given and what is valid.
func ParseSector(text string) (Sector, error) {
	k := strings.ToLower(strings.Join(strings.Fields(text), ""))
	switch k {
	case "pharmaceuticals", "pharmaceutical", "pharma", "0705":
		return Pharmaceuticals, nil
	case "finechemicals", "finechemical", "0707":
		return FineChemicals, nil
	}
	return Pharmaceuticals, fmt.Errorf("waste sector %q is not known; valid: \"pharmaceuticals\" (List of Waste chapter 07 05) or \"fine chemicals\" (chapter 07 07)", text)
}

// euEntry is one entry of a List of Waste chapter, by its last two digits.
type euEntry struct {
	suffix string // "01", "03", ...
	title  string
}

// EU List of Waste entries used here; the same numbering and titles occur in
// sub-chapters 07 05 and 07 07. All five are absolute hazardous entries
// (marked *), without a non-hazardous mirror entry. Confirmed: read in a
// reproduction of the Annex's list (see srcLoW).
var (
	euAqueous       = euEntry{"01", "aqueous washing liquids and mother liquors"}
	euHalogenated   = euEntry{"03", "organic halogenated solvents, washing liquids and mother liquors"}
	euOtherOrganic  = euEntry{"04", "other organic solvents, washing liquids and mother liquors"}
	euHalogenatedAb = euEntry{"09", "halogenated filter cakes and spent absorbents"}
	euOtherAb       = euEntry{"10", "other filter cakes and spent absorbents"}
	euEntries       = []euEntry{euAqueous, euHalogenated, euOtherOrganic, euHalogenatedAb, euOtherAb}
)

func (e euEntry) code(s Sector) Code {
	chapter := "wastes from the manufacture, formulation, supply and use (MFSU) of pharmaceuticals"
	if s == FineChemicals {
		chapter = "wastes from the MFSU of fine chemicals and chemical products not otherwise specified"
	}
	c := s.Chapter() + " " + e.suffix + "*"
	return Code{Scheme: SchemeEU, Code: c, Title: e.title,
		Source: fmt.Sprintf("%s, chapter 07, sub-chapter %s (%s), entry %s (hazardous: marked with an asterisk, no mirror entry)", srcLoW, s.Chapter(), chapter, c), Mark: conf}
}

// listing is one of the F001–F005 spent-solvent listings.
type listing struct {
	code   string
	title  string
	mark   source.Mark
	forI   bool // listed for ignitability only (hazard code (I)); F003
	consts []constituent
}

// constituent is a named chemical of a listing or of Table 1 of 261.24,
// matched to a solvent by CAS Registry Number or by name.
type constituent struct {
	name  string
	cas   []string
	names []string // other names, compared lower case
}

var (
	pce  = constituent{"tetrachloroethylene", []string{"127-18-4"}, []string{"perchloroethylene", "tetrachloroethene"}}
	tce  = constituent{"trichloroethylene", []string{"79-01-6"}, []string{"trichloroethene"}}
	dcm  = constituent{"methylene chloride", []string{"75-09-2"}, []string{"dichloromethane"}}
	tca  = constituent{"1,1,1-trichloroethane", []string{"71-55-6"}, []string{"methyl chloroform"}}
	ctc  = constituent{"carbon tetrachloride", []string{"56-23-5"}, []string{"tetrachloromethane"}}
	cbz  = constituent{"chlorobenzene", []string{"108-90-7"}, nil}
	cfc  = constituent{"1,1,2-trichloro-1,2,2-trifluoroethane", []string{"76-13-1"}, []string{"cfc-113"}}
	odcb = constituent{"ortho-dichlorobenzene", []string{"95-50-1"}, []string{"o-dichlorobenzene", "1,2-dichlorobenzene"}}
	cfcl = constituent{"trichlorofluoromethane", []string{"75-69-4"}, []string{"cfc-11"}}
	tca2 = constituent{"1,1,2-trichloroethane", []string{"79-00-5"}, nil}

	xyl  = constituent{"xylene", []string{"1330-20-7", "95-47-6", "108-38-3", "106-42-3"}, []string{"xylenes", "o-xylene", "m-xylene", "p-xylene", "mixed xylenes"}}
	ace  = constituent{"acetone", []string{"67-64-1"}, nil}
	etac = constituent{"ethyl acetate", []string{"141-78-6"}, nil}
	etbz = constituent{"ethyl benzene", []string{"100-41-4"}, []string{"ethylbenzene"}}
	eth  = constituent{"ethyl ether", []string{"60-29-7"}, []string{"diethyl ether"}}
	mibk = constituent{"methyl isobutyl ketone", []string{"108-10-1"}, []string{"mibk", "4-methyl-2-pentanone"}}
	buoh = constituent{"n-butyl alcohol", []string{"71-36-3"}, []string{"1-butanol", "n-butanol"}}
	chx  = constituent{"cyclohexanone", []string{"108-94-1"}, nil}
	meoh = constituent{"methanol", []string{"67-56-1"}, nil}

	cres = constituent{"cresols and cresylic acid", []string{"1319-77-3", "95-48-7", "108-39-4", "106-44-5"}, []string{"cresol", "cresols", "cresylic acid", "o-cresol", "m-cresol", "p-cresol"}}
	nbz  = constituent{"nitrobenzene", []string{"98-95-3"}, nil}

	tol  = constituent{"toluene", []string{"108-88-3"}, nil}
	mek  = constituent{"methyl ethyl ketone", []string{"78-93-3"}, []string{"2-butanone", "butanone", "mek"}}
	cs2  = constituent{"carbon disulfide", []string{"75-15-0"}, nil}
	ibu  = constituent{"isobutanol", []string{"78-83-1"}, []string{"isobutyl alcohol", "2-methyl-1-propanol"}}
	pyr  = constituent{"pyridine", []string{"110-86-1"}, nil}
	bz   = constituent{"benzene", []string{"71-43-2"}, nil}
	eeth = constituent{"2-ethoxyethanol", []string{"110-80-5"}, nil}
	nitp = constituent{"2-nitropropane", []string{"79-46-9"}, nil}
)

// The spent-solvent listings of 40 CFR 261.31(a). F001 covers only solvents
// used in degreasing; it is kept for the 10 % totals of the other listings.
var (
	f001 = listing{"F001", "spent halogenated solvents used in degreasing", conf, false,
		[]constituent{pce, tce, dcm, tca, ctc}}
	f002 = listing{"F002", "spent halogenated solvents", conf, false,
		[]constituent{pce, dcm, tce, tca, cbz, cfc, odcb, cfcl, tca2}}
	f003 = listing{"F003", "spent non-halogenated solvents (listed for ignitability only)", conf, true,
		[]constituent{xyl, ace, etac, etbz, eth, mibk, buoh, chx, meoh}}
	f004 = listing{"F004", "spent non-halogenated solvents: cresols and cresylic acid, nitrobenzene", mem, false,
		[]constituent{cres, nbz}}
	f005 = listing{"F005", "spent non-halogenated solvents", mem, false,
		[]constituent{tol, mek, cs2, ibu, pyr, bz, eeth, nitp}}
	listings = []listing{f001, f002, f003, f004, f005}
)

func (l listing) codeFor() Code {
	text := "the listing text of " + l.code + " was read in the regulation"
	if l.mark != conf {
		text = "the listing text of " + l.code + " is from memory"
	}
	return Code{Scheme: SchemeUS, Code: l.code, Title: l.title,
		Source: fmt.Sprintf("%s, %s (%s)", src26131, l.code, text), Mark: l.mark}
}

// tcEntry is one solvent-like contaminant of Table 1 of 40 CFR 261.24.
type tcEntry struct {
	code  string
	c     constituent
	level float64 // regulatory level, mg/L
}

// Solvents and solvent-like contaminants of 40 CFR 261.24 Table 1 with their
// regulatory levels in mg/L (confirmed in reproductions of the table).
var tcTable = []tcEntry{
	{"D018", bz, 0.5},
	{"D019", ctc, 0.5},
	{"D021", cbz, 100.0},
	{"D022", constituent{"chloroform", []string{"67-66-3"}, []string{"trichloromethane"}}, 6.0},
	{"D027", constituent{"1,4-dichlorobenzene", []string{"106-46-7"}, nil}, 7.5},
	{"D028", constituent{"1,2-dichloroethane", []string{"107-06-2"}, nil}, 0.5},
	{"D029", constituent{"1,1-dichloroethylene", []string{"75-35-4"}, nil}, 0.7},
	{"D035", mek, 200.0},
	{"D036", nbz, 2.0},
	{"D038", pyr, 5.0},
	{"D039", pce, 0.7},
	{"D040", tce, 0.5},
}

func (e tcEntry) codeFor() Code {
	return Code{Scheme: SchemeUS, Code: e.code,
		Title:  fmt.Sprintf("toxicity characteristic: %s (regulatory level %g mg/L in the TCLP extract)", e.c.name, e.level),
		Source: src26124 + ", " + e.code, Mark: conf}
}

// Thresholds of the US rules.
const (
	// FlashLimit is the flash point below which a liquid is ignitable, K
	// (60 °C, 140 °F; 40 CFR 261.21(a)(1), confirmed).
	FlashLimit = 333.15
	// MixtureThreshold is the before-use volume fraction of F001, F002, F004
	// and F005 solvents, in total, at which a spent blend is listed (40 CFR
	// 261.31(a) F001-F005, "a total of ten percent or more (by volume)",
	// confirmed for F001-F003).
	MixtureThreshold = 0.10
	// AlcoholLimit is the alcohol volume fraction below which an aqueous
	// solution is excluded from D001 (40 CFR 261.21(a)(1), "less than 24
	// percent alcohol by volume", confirmed).
	AlcoholLimit = 0.24
	// AqueousWaterMin is the water mass fraction that makes a solution
	// "aqueous" for the alcohol exclusion ("at least 50 percent water by
	// weight": Ohio Adm. Code 3745-51-21(A)(1), confirmed; the federal text
	// to the same effect from memory).
	AqueousWaterMin = 0.50
	// TCLPRatio is the liquid-to-solid ratio of the TCLP extraction, L/kg
	// (SW-846 Method 1311, section 2.2: "an amount of extraction fluid equal
	// to 20 times the weight of the solid phase", confirmed; taken as L/kg
	// for an extraction fluid of about 1 kg/L).
	TCLPRatio = 20.0
)

func d001Code() Code {
	return Code{Scheme: SchemeUS, Code: "D001",
		Title:  "ignitable: liquid with a closed-cup flash point below 60 °C",
		Source: src26121 + ", paragraph (a)(1)", Mark: conf}
}

// Sources lists the regulation entries and thresholds used, for the
// workbook's Sources sheet: one line per code (SI 0, no unit) and one per
// numerical threshold (with its value and unit). Keys begin "waste.".
func Sources() []source.Coefficient {
	var out []source.Coefficient
	add := func(key, label string, si float64, dim units.Dim, unit, src string, m source.Mark) {
		out = append(out, source.Coefficient{Key: key, Method: "waste", Label: label, SI: si,
			Dim: dim, Unit: unit, Source: src, Mark: m})
	}
	for _, s := range []Sector{Pharmaceuticals, FineChemicals} {
		for _, e := range euEntries {
			c := e.code(s)
			add("waste.eu."+strings.NewReplacer(" ", "", "*", "").Replace(c.Code), c.Code+" "+c.Title, 0, units.None, "", c.Source, c.Mark)
		}
	}
	for _, l := range listings {
		c := l.codeFor()
		add("waste.us."+strings.ToLower(l.code), l.code+" "+l.title, 0, units.None, "", c.Source, c.Mark)
	}
	d := d001Code()
	add("waste.us.d001", d.Code+" "+d.Title, 0, units.None, "", d.Source, d.Mark)
	for _, e := range tcTable {
		c := e.codeFor()
		// Level in SI: 1 mg/L = 1e-3 kg/m³.
		add("waste.us."+strings.ToLower(e.code), c.Code+" "+c.Title, e.level*1e-3, units.Density, "mg/L", c.Source, c.Mark)
	}
	add("waste.us.flash_limit", "D001 flash-point limit (a liquid flashing below it is ignitable)", FlashLimit,
		units.Temperature, "°C", src26121+", paragraph (a)(1): \"flash point less than 60 °C (140 °F)\"; paragraph (b): D001", conf)
	add("waste.us.alcohol_limit", "D001 exclusion: aqueous solution with less than this alcohol by volume", AlcoholLimit,
		units.None, "%", src26121+", paragraph (a)(1): \"less than 24 percent alcohol by volume\"", conf)
	add("waste.us.aqueous_water_min", "D001 exclusion: water by weight that makes a solution aqueous", AqueousWaterMin,
		units.None, "%", "Ohio Adm. Code 3745-51-21(A)(1) (\"at least fifty per cent water by weight\"), mirroring the federal clarification of 40 CFR 261.21(a)(1) (federal wording from memory)", conf)
	add("waste.us.mixture_threshold", "F001-F005: before-use total of F001, F002, F004 and F005 solvents that lists a spent blend", MixtureThreshold,
		units.None, "%", src26131+" (\"a total of ten percent or more (by volume)\"); "+src1985, conf)
	// 20 L/kg = 0.02 m³/kg.
	add("waste.us.tclp_ratio", "TCLP extraction fluid per mass of solid (screening: total concentration/20 bounds the extract)", TCLPRatio*1e-3,
		units.SpecificVolume, "L/kg", srcRule20, conf)
	return out
}
