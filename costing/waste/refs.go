package waste

import "sepcost/costing/source"

// Citations. Marks: "confirmed" where the regulation text (or a faithful
// reproduction of it) was read; "from memory" otherwise.
const (
	// srcLoW is the EU List of Waste. The entries and titles of chapters
	// 07 05 and 07 07 are from memory: check the consolidated text on
	// EUR-Lex before relying on them.
	srcLoW = "Commission Decision 2000/532/EC (List of Waste), Annex as replaced by Commission Decision 2014/955/EU"

	// src26131 is the spent-solvent listing; the F001, F002 and F003 rows
	// were read in reproductions of 40 CFR 261.31(a) (ecfr.io; compliancecosmos.org).
	src26131 = "40 CFR 261.31(a), hazardous wastes from non-specific sources"

	// src26121 is the ignitability characteristic, read in the 2004 CFR
	// edition (GPO) and, with the clarified alcohol exclusion ("less than 24
	// percent alcohol by volume and at least 50 percent water by weight"),
	// in Ohio Adm. Code 3745-51-21(A)(1), which mirrors the federal rule; the
	// current federal wording of the exclusion is from memory.
	src26121 = "40 CFR 261.21(a), characteristic of ignitability (D001)"

	// src26124 is the toxicity characteristic; Table 1 was read in a
	// reproduction of 40 CFR 261.24 and in Cal. Code Regs. tit. 22 § 66261.24.
	src26124 = "40 CFR 261.24, toxicity characteristic, Table 1 (maximum concentration of contaminants)"

	// src2613 is the mixture rule: (iii) for mixtures with wastes listed
	// solely for a characteristic, (iv) for other listed wastes. The
	// paragraph wording is from memory (an EPA letter of 4 Nov 1992 to
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
	// extract cannot exceed the total concentration divided by 20 (20:1
	// liquid-to-solid extraction).
	srcRule20 = "EPA SW-846 Test Method 1311 (TCLP), section 1.2, 20:1 extraction: total concentration/20 bounds the extract"
)

const (
	conf = source.Confirmed
	mem  = source.FromMemory
)
