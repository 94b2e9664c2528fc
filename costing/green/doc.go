// Package green gives the green-chemistry view of a purification: the
// CHEM21 solvent-guide class of each solvent, published substitutions for
// the worse ones, and the mass metrics E-factor, process mass intensity and
// solvent intensity computed from a usage.Usage.
//
// References:
//
//   - Prat, D.; Wells, A.; Hayler, J.; Sneddon, H.; McElroy, C. R.;
//     Abou-Shehada, S.; Dunn, P. J. "CHEM21 selection guide of classical-
//     and less classical-solvents", Green Chem. 2016, 18, 288-296.
//   - Sheldon, R. A. "Organic synthesis — past, present and future", Chem.
//     Ind. (London) 1992, 903-906; "The E Factor: fifteen years on", Green
//     Chem. 2007, 9, 1273-1283.
//   - Jiménez-González, C.; Ponder, C. S.; Broxterman, Q. B.; Manley, J. B.
//     "Using the right green yardstick: why process mass intensity is used
//     in the pharmaceutical industry to drive more sustainable processes",
//     Org. Process Res. Dev. 2011, 15, 912-917.
//   - Taygerly, J. P.; Miller, L. M.; Yee, A.; Peterson, E. A. "A convenient
//     guide to help select replacement solvents for dichloromethane in
//     chromatography", Green Chem. 2012, 14, 3020-3025 (title and findings
//     from memory).
package green
