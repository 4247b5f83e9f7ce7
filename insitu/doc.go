// Package insitu reads and interprets the in-situ test records a
// foundation engineer receives from site: cone penetration soundings (CPT,
// CPTu) and standard penetration tests (SPT).
//
// # Records
//
// A Sounding holds one CPT: the cone area ratio a and rows of depth, cone
// resistance (qc, or qt when the file already holds the corrected value),
// sleeve friction fs and shoulder pore pressure u2. SPT holds one standard
// penetration test: depth, blow count N, hammer energy ratio, rod length,
// borehole diameter and sampler. Everything is SI inside (package units).
//
// # Readers
//
// ReadCPTCSV and ReadSPTCSV read comma-separated files with our own header
// names, each carrying its unit (depth_m, qc_MPa, fs_kPa, u2_kPa, …); the
// writers WriteCPTCSV and WriteSPTCSV write the same form, so a file
// round-trips. ReadAGS reads the AGS4 data-transfer format (groups LOCA,
// GEOL, ISPT, SCPG and SCPT of the AGS 4.1 dictionary); ReadGEF reads a
// GEF-CPT-Report file. WriteAGS and WriteGEF write soundings that these
// readers read back. A malformed file gives a *ParseError naming the file,
// the line and the field; no reader panics.
//
// # Interpretation
//
// InterpretCPT turns a sounding and the vertical stresses at depth (given
// as a function, so that this package need not know the ground model) into
// points: qt = qc + u2(1 − a), the net resistance, Robertson's (2009)
// normalised Qtn with the stress exponent n iterated, Fr, the soil
// behaviour type index Ic and its zone. Correlations for su, φ′ and Dr are
// values with their sources; the engineer picks one. CorrectSPT gives N60
// and (N1)60 with Skempton's (1986) corrections and the Liao & Whitman
// (1986) overburden factor. MeanOver and TipZone average a profile over a
// layer or a zone about a pile tip; SuggestLayers proposes a layering from
// breaks in Ic, which is returned as a suggestion and never used silently.
//
// Correlations are empirical: results are for qualified engineers, to be
// checked against local codes, laboratory testing, site-specific
// experience and load tests; the governing code and licensed practice
// prevail.
package insitu
