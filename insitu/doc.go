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
// # Direct methods of pile capacity
//
// The direct CPT methods give a pile's unit tip and shaft resistance from
// the cone readings themselves, without strength parameters. NewCone
// prepares a sounding for them (qE = qt − u2, running integrals; the
// readings vary linearly between one another and are never extrapolated
// beyond the first and the last). Each method is a value with our own
// identifier, used as a layer's tip or shaft method in a calc file:
//
//	part   identifier        value                       rule
//	tip    lcpc              LCPCTip{Kc, Limit}          qp = kc·qca, qca the mean of qc over tip ± 1.5B clipped to 0.7…1.3 × its mean
//	tip    schmertmann       SchmertmannTip{Limit}       qp = (qc1 + qc2)/2 ≤ limit, minimum path over 0.7B to 4B below and 8B above
//	tip    eslami-fellenius  EslamiFelleniusTip{Ct}      qp = Ct·qEg, geometric mean of qt − u2 over 8B (or 2B) above to 4B below, the lesser
//	shaft  lcpc              LCPCShaft{Alpha, Limit}     fs = min(qc/α, fs,max)
//	shaft  schmertmann-sand  SchmertmannSandShaft{K, Limit}  fs = K·w·fs,cone ≤ limit, w = z/(8B) over the top 8B, 1 below
//	shaft  schmertmann-clay  SchmertmannClayShaft{Alpha, Limit}  fs = α′·fs,cone ≤ limit
//	shaft  eslami-fellenius  EslamiFelleniusShaft{Cs}    fs = Cs·(qt − u2)
//
// DirectMethods returns them as a catalogue (DirectDescriptor: part,
// identifier, scope, the keys read beside method:, the method, and a
// constructor); LookupDirect finds an entry. The keys:
//
//	tip lcpc               kc     0.05 to 1 (required); limit  ≥ 0 kPa (default none)
//	tip schmertmann        limit  1 to 100000 kPa (required)
//	tip eslami-fellenius   ct     0.1 to 1 (default 1)
//	shaft lcpc             alpha  10 to 300 (required); limit  0.001 to 1000 kPa (required)
//	shaft schmertmann-sand k      0.1 to 3 (required); limit  ≥ 0 kPa (default none)
//	shaft schmertmann-clay alpha  0.1 to 1.5 (required); limit  ≥ 0 kPa (default none)
//	shaft eslami-fellenius cs     0.001 to 0.1 (required)
//
// The factors of the methods' tables and charts (kc and α with fs,max by
// soil and pile category, Cs by soil type, Schmertmann's K by embedment
// ratio and α′ by sleeve friction, and his limits) are given by the
// engineer: qult holds no copy of those tables, which could not be read
// for this release, and no default that could pass unnoticed. A zone or
// a length of shaft the sounding does not cover is an error (ZoneError),
// never an extrapolation. Package pile evaluates these methods layer by
// layer (pile.ConeTip, pile.ConeShaft), the shaft integral exactly over
// the readings.
//
// The schmertmann tip rule's minimum-path averaging is checked against
// the Dutch method as printed in ENV 1997-3 Annex B.4(3) and Tomlinson &
// Woodward (2008, Eq. 4.19); see SchmertmannTip for what was recalled and
// for a caution where qc drops sharply below the tip.
//
// Schmertmann's sand rule weights the sleeve friction over the top 8B
// below the ground surface by z/(8B) (depth below the ground, wherever the
// pile's head is). Not provided: the CPT methods for driven piles in sand
// of API RP 2GEO (UWA-05, Fugro-05, ICP-05, NGI-05), whose published text
// could not be read. Schneider, Xu & Lehane (2008, J. Geotech. Geoenviron.
// Eng. 134(9), abstract p. 1227) say the four are presented in the
// commentary of the 22nd edition of the API recommendations; their
// equations are not restated here from memory.
//
// Correlations are empirical: results are for qualified engineers, to be
// checked against local codes, laboratory testing, site-specific
// experience and load tests; the governing code and licensed practice
// prevail.
package insitu
