package solvent

import "fmt"

// Citations used by the built-in table. Each value in builtin.go carries
// one of these (or its own text) together with a mark saying how sure it is.
//
// Mark policy: "confirmed" means the value was seen in a reproduction of the
// cited published table; "from memory" covers both values recalled from the
// cited handbook and values read from a public secondary copy of a
// published table without re-checking the original; "derived" means
// computed here from published equations or data, with the computation
// stated.
const (
	// srcCRC: the usual handbook for densities, boiling points, heat
	// capacities and enthalpies of vaporization.
	srcCRC = "CRC Handbook of Chemistry and Physics, physical constants of organic compounds and related tables (edition not checked)"

	// srcNAS: densities, boiling points and flash points seen in this table.
	srcNAS = "National Academies of Sciences, Engineering, and Medicine, Chemical Laboratory Safety and Security, 2016, Appendix D (solvent property table)"

	// srcSVN: ΔHn and tn seen in a reproduction of this table.
	srcSVN = "Smith, J. M.; Van Ness, H. C.; Abbott, M. M., Introduction to Chemical Engineering Thermodynamics, App. B, Table B.2, latent heat at the normal boiling point and normal boiling point (edition not identified; seen in a reproduction of p. 653)"

	// srcFlash: closed-cup flash points not seen in srcNAS.
	srcFlash = "closed-cup flash point as listed in suppliers' safety data sheets and the CRC Handbook (edition not checked)"

	// srcKelly: the usual classification of peroxide-forming chemicals.
	srcKelly = "Kelly, R. J., \"Review of safety guidelines for peroxidizable organic chemicals\", Chem. Health Saf. 1996, 3(5), 28-36"

	// srcChemSep: ChemSep pure-component data as distributed in an open
	// process simulator; DIPPR equation numbers as in the files.
	srcChemSep = "ChemSep pure-component library (Kooijman & Taylor), as distributed in FOSSEE/OMChemSim, Simulator/Files/ChemsepDatabase/%s"
)

// srcNISTAntoine cites a NIST WebBook Antoine set seen quoted in public
// data files. fit names the original fit where the quotations named it.
func srcNISTAntoine(compound, fit string) string {
	s := "NIST Chemistry WebBook (SRD 69), " + compound + ", Antoine equation parameters"
	if fit != "" {
		s += ", fit attributed to " + fit
	}
	return s + "; constants as quoted, citing NIST, in public data files (not re-checked against the WebBook)"
}

// srcPoling cites the Antoine table of Poling, Prausnitz & O'Connell as
// tabulated in a public data file (log10 P/Pa, T in K).
func srcPoling(compound string) string {
	return fmt.Sprintf("Poling, B. E.; Prausnitz, J. M.; O'Connell, J. P., The Properties of Gases and Liquids, 5th ed., McGraw-Hill, 2001, App. A, Antoine constants for %s, as tabulated in the file \"Antoine Collection Poling.tsv\" of the open-source chemicals package (C. Bell) in log10(P/Pa) form; A lowered here by 5 for bar; not re-checked against the book", compound)
}

// srcLandolt cites a Landolt-Börnstein Antoine set as tabulated (ln P/Pa)
// in a public data file.
func srcLandolt(compound string) string {
	return fmt.Sprintf("Dykyj, J.; Svoboda, J.; Wilhoit, R. C.; Frenkel, M.; Hall, K. R., Vapor Pressure of Chemicals, Landolt-Börnstein New Series IV/20, Antoine constants for %s, as tabulated in the file \"Landolt_antoine_V20.tsv\" of the open-source chemicals package (C. Bell) in ln(P/Pa) form; converted here to log10(P/bar) (A/ln10 - 5, B/ln10); not re-checked against the book", compound)
}
