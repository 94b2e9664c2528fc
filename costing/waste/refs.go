package waste

import "sepcost/costing/source"

// Citations. Marks: "confirmed" where the regulation text (or a faithful
// reproduction of it) was read; "from memory" otherwise.
const (
	// srcLoW is the EU List of Waste. The codes, titles and asterisks of
	// entries 01, 03, 04, 09 and 10 of sub-chapters 07 05 and 07 07 (and the
	// sub-chapter titles) were read in a reproduction of the Annex's list
	// (the Scottish Government's open-data EWC coding table,
	// data-commons-scotland/dcs-easier-open-data, ewc-coding.csv): all five
	// carry the asterisk, and the only entries of those sub-chapters without
	// one are the mirrors of 11* and 13* (12, 14) and 99. The consolidated
	// text as amended by 2014/955/EU (in force 1 June 2015) was seen only in
	// its heading (2000D0532, 01.06.2015); that an asterisk makes a waste
	// hazardous under Directive 2008/98/EC is from the amending Decision's
	// summaries, not its text.
	srcLoW = "Commission Decision 2000/532/EC (List of Waste), Annex as replaced by Commission Decision 2014/955/EU"

	// src26131 is the spent-solvent listing; the F001, F002 and F003 rows
	// (constituents, the "ten percent or more (by volume)" clauses and the
	// hazard codes (T), (T), (I)*) were read in reproductions of 40 CFR
	// 261.31(a) (ecfr.io; compliancecosmos.org). The F004 and F005 rows were
	// not found in the text searched and stay from memory.
	src26131 = "40 CFR 261.31(a), hazardous wastes from non-specific sources"

	// src26121 is the ignitability characteristic, read in the 2004 CFR
	// edition (GPO, CFR-2004-title40-vol24-sec261-21: paragraph (a)(1),
	// "less than 24 percent alcohol by volume", "flash point less than 60 °C
	// (140 °F)"; paragraph (b), D001) and, with the clarified alcohol exclusion ("less than 24
	// percent alcohol by volume and at least 50 percent water by weight"),
	// in Ohio Adm. Code 3745-51-21(A)(1), which mirrors the federal rule; the
	// current federal wording of the exclusion is from memory.
	src26121 = "40 CFR 261.21(a), characteristic of ignitability (D001)"

	// src26124 is the toxicity characteristic; Table 1 was read in a
	// reproduction of 40 CFR 261.24 and in Cal. Code Regs. tit. 22 § 66261.24.
	src26124 = "40 CFR 261.24, toxicity characteristic, Table 1 (maximum concentration of contaminants)"

	// src2613 is the mixture rule: (iii) for mixtures with wastes listed
	// solely for a characteristic, (iv) for other listed wastes. Its effect
	// was read only in secondary summaries (Texas Commission on
	// Environmental Quality, "Waste Designation Decision Matrix - Waste
	// Mixtures": "The mixture rule does not apply to wastes that are listed
	// solely for a characteristic"); the paragraph wording is from memory (an EPA letter of 4 Nov 1992 to
	// J. V. Noles on F003 spills was seen to discuss (a)(2)(iii), but its
	// answer on that point was not read).
	src2613 = "40 CFR 261.3(a)(2)(iii)-(iv), mixture rule"

	// src1985 summarises the before-use mixture clauses (50 FR 53315, 31
	// Dec 1985) in EPA's own words, read in the EPA SWIM summary of
	// document 9444.15(85).
	src1985 = "EPA, 50 FR 53315 (31 Dec 1985), summarised in EPA RCRA document 9444.15(85): \"Solvent mixtures are now regulated if they contain 10% or more of F001, F002, F004, or F005. Mixtures containing F003 solvents are regulated if they contain only F003 solvents, or 10% of F001, F002, F004, or F005 and one or more of the F003 solvents.\""

	// srcLetter1987 is an EPA interpretation letter with a worked example
	// (read at paintcenter.org): paint thinner of 80 % xylene, 9 % toluene
	// and 11 % glycol ethers before use is not F003 or F005 but D001.
	srcLetter1987 = "EPA letter to J. Charley, New United Motor Manufacturing, 21 Jul 1987 (RCRA Online)"

	// srcSpent: a solvent is "used as a solvent" when used for its solvent
	// properties, "to solubilize (dissolve) or mobilize other constituents"
	// (read in the EPA FAQ, which cites 50 FR 53315, 53316); that eluents and
	// mother liquors are such uses is this package's reading.
	srcSpent = "EPA, 50 FR 53315, 53316 (31 Dec 1985), as quoted in EPA RCRA FAQ \"Do the spent solvent listings in §261.31 apply to solvent constituents used as ingredients…\" (RO 14109)"

	// srcRule20 is the screening rule of SW-846 Method 1311: the TCLP
	// extract cannot exceed the total concentration divided by 20. Read in
	// the method: section 1.2 (a total analysis that shows the regulatory
	// level could not be exceeded makes the TCLP unnecessary) and section
	// 2.2 ("extraction fluid equal to 20 times the weight of the solid
	// phase"); dividing by 20 is this package's reading of the two.
	srcRule20 = "EPA SW-846 Test Method 1311 (TCLP), sections 1.2 and 2.2 (extraction fluid 20 times the weight of the solid): total concentration/20 bounds the extract"
)

const (
	conf = source.Confirmed
	mem  = source.FromMemory
)
