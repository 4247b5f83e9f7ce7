package verify

// The function-to-case map lists package insitu beside bearing and shaft
// (floor 2), with the reasons for its functions that no catalogue case
// names.
func init() {
	for i, p := range coveragePackages {
		if p == "shaft" {
			coveragePackages = append(coveragePackages[:i+1], append([]string{"insitu"}, coveragePackages[i+1:]...)...)
			break
		}
	}
	for k, v := range insituReasons {
		reasons[k] = v
	}
}

var insituReasons = map[string]string{
	"insitu.Sounding.Qt":               "qt = qc + u2(1 − a) (Robertson 2009, eq. 1; the equation number from memory); checked through insitu.InterpretCPT's AGS 4.1.1 cases, whose example values are consistent with it",
	"insitu.DensityQtn.Dr":             "Dr = √(Qtn/350), equation and K range from memory of Robertson & Cabal (2015); checked in closed form; no printed copy reached",
	"insitu.PhiN60Stress.Phi":          "φ′ = arctan[(N60/(12.2 + 20.3σ′v/pa))^0.34], Kulhawy & Mayne (1990), equation from memory; checked in closed form; no printed value reached",
	"insitu.PhiQcRatio.Phi":            "tan φ′ = [log(qc/σ′v) + 0.29]/2.68, Robertson & Campanella (1983), equation from memory; checked in closed form; no printed value reached",
	"insitu.MeanOver":                  "a depth-weighted mean by the trapezoidal rule; checked against means worked by hand",
	"insitu.MeansPerLayer":             "insitu.MeanOver for each layer; checked against means worked by hand",
	"insitu.MeanSPT":                   "an arithmetic mean of the tests in a range; checked against a mean worked by hand",
	"insitu.TipZone":                   "insitu.MeanOver over a zone the engineer gives; checked against a mean worked by hand",
	"insitu.SuggestLayers":             "groups readings by zone: no published value; checked on a sounding of our own whose layering is known",
	"insitu.ReadAGS":                   "a reader: checked against files written to the AGS 4.1.1 dictionary (the same sounding as from GEF and CSV) and a table of malformed files",
	"insitu.ReadGEF":                   "a reader: checked against a file written to the GEF-CPT-Report definition (the same sounding as from AGS4 and CSV) and a table of malformed files",
	"insitu.ReadCPTCSV":                "a reader of our own form: checked by round trip through WriteCPTCSV and a table of malformed files",
	"insitu.ZoneBoundaries":            "the constants insitu.ZoneOf compares with, whose zones the catalogue checks against a printed Ic zone table; a test checks that ZoneOf changes zone at each",
	"insitu.ReadSPTCSV":                "a reader of our own form: checked by round trip through WriteSPTCSV and a table of malformed files",
	"insitu.SchmertmannSandShaft.Unit": "fs = K·w·fs,cone at one depth, Schmertmann (1978) from memory; checked in closed form; no printed value reached (its integral has a case)",
	"insitu.SchmertmannClayShaft.Unit": "fs = α′·fs,cone at one depth, Schmertmann (1978) from memory; checked in closed form; no printed value reached (its integral has a case)",
	"insitu.Cone.Top":                  "the depth of the first reading, as read",
	"insitu.Cone.Bottom":               "the depth of the last reading, as read",
	"insitu.NewCone":                   "prepares the readings (qE = qt − u2, running integrals by the trapezoidal rule); checked through the direct methods' cases and a table of bad soundings",
	"insitu.DirectMethods":             "the catalogue of the direct methods: checked by the catalogue's own tests (every entry builds its method)",
	"insitu.LookupDirect":              "a catalogue look-up: checked by the catalogue's own tests",
	"insitu.LCPCShaft.Unit":            "fs = qc/α ≤ fs,max at one depth, Bustamante & Gianeselli (1982) from memory; checked in closed form; no printed value reached (its integral has a case)",
	"insitu.EslamiFelleniusShaft.Unit": "fs = Cs·qE at one depth, Eslami & Fellenius (1997) from memory; checked in closed form; no printed value reached (its integral has a case)",
}
