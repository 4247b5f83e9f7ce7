// Package qult is a module of reference-checked routines for the axial
// design of single piles and drilled shafts.
//
// A foundation engineer starts from a borehole log (layers, groundwater,
// strength and stiffness) and a column load, and must end with a pile type,
// diameter and length that survive review: tip and shaft resistance layer by
// layer under effective stress, several accepted methods compared, a design
// basis applied, and every number traceable to an input, an equation and a
// published source. The packages, from the lowest floor up (an import only
// points down):
//
//	units        typed quantities in SI base units; SI and US customary parsing and display
//	cite         published sources as data
//	phase        three-phase relations of one soil element
//	bearing      tip resistance: bearing-capacity factors and unit tip resistance
//	shaft        unit shaft resistance: β, α and λ methods, with limits
//	insitu       CPT and SPT records: readers (CSV, AGS4, GEF), corrections, Ic, cited correlations
//	profile      the ground: layers, groundwater, excavation and scour, total and effective vertical stress
//	pile         capacity of a pile in the ground, design bases, required length
//	settle       single-pile settlement and static load-test interpretation
//	group        pile groups: efficiency, block failure, uplift, group settlement
//	reliability  probabilistic capacity: Monte Carlo, FOSM and sensitivities
//	structural   axial resistance of a pile's own section (AASHTO LRFD, EN 1992-1-1/1993-1-1, allowable stresses)
//	calc         the calc file: decoding, validation, the run and its result; batch
//	report       text, CSV, JSON, records, Markdown, HTML and PDF calculation packages
//	verify       the verification record: reference cases from published sources
//
// The command-line tool is cmd/qult.
//
// # Units
//
// Every quantity is a typed float64 in an SI base unit (m, m², m³, Pa, N,
// N/m, N/m³, rad). Conversion happens only at the edges: build quantities
// by multiplying a number by a unit constant (600*units.Millimetre), read
// them with accessors (q.KPa(), l.Feet()), and parse text with units.Parse.
//
// # Cautions
//
// qult is for qualified engineers. Its results must be checked against the
// local codes of practice, the site investigation and load tests; the
// methods it implements carry the limitations stated in their sources. It is
// not a substitute for the judgement of a licensed professional engineer.
package qult
