// Package waste suggests waste codes for the streams a purification
// produces: entries of the EU List of Waste and US EPA hazardous-waste
// numbers (spent-solvent listings F001–F005, the ignitability
// characteristic D001 and the toxicity characteristic D0xx for solvents).
//
// Every suggestion names the regulation text it rests on, the rule that was
// applied in plain words, and how sure the text is (confirmed where the
// regulation text was seen, else from memory). Every Classification carries
// the caution that waste classification is decided by the site's
// environmental-health-and-safety office under local rules: the codes here
// are a forecast to plan with, not a waste determination.
//
// Regulations used:
//
//   - EU: Commission Decision 2000/532/EC establishing the List of Waste, as
//     replaced in its Annex by Commission Decision 2014/955/EU; chapter 07 05
//     (manufacture, formulation, supply and use of pharmaceuticals) or 07 07
//     (fine chemicals and chemical products not otherwise specified).
//   - US: 40 CFR 261.31(a) (F001–F005 spent solvents), 261.21(a) (D001),
//     261.24 (toxicity characteristic, Table 1), and the mixture rule
//     261.3(a)(2).
//
// Before-use fractions. The F001–F005 mixture clauses speak of a solvent
// blend's composition before use, while a Stream records what is in the
// container after use. Classify takes the stream's own solvent volume
// fractions (masses over densities, volumes assumed additive) as the
// before-use composition: this is exact when one premixed eluent or one
// recrystallization solvent was used and nothing evaporated selectively,
// and wrong when blends of different strength (a step gradient, a neat
// flush or rinse) end up in one container. ClassifyBlends takes the blends
// as actually made up, and the stream is then classified by the mixture
// rule: it carries the listing of every blend in it.
package waste
