package cite

// Sources of the direct CPT methods of pile capacity (package insitu).
// Their titles and places are cited from memory: the papers themselves
// could not be read here (see insitu's direct methods).
var (
	BustamanteGianeselli1982 = Source{Key: "bustamante-gianeselli1982", Authors: "Bustamante, M., Gianeselli, L.", Year: 1982,
		Title: "Pile bearing capacity prediction by means of static penetrometer CPT", Publication: "Proc. 2nd European Symp. on Penetration Testing (ESOPT II), Amsterdam, Vol. 2, 493-500"}
	Schmertmann1978 = Source{Key: "schmertmann1978", Authors: "Schmertmann, J.H.", Year: 1978,
		Title: "Guidelines for cone penetration test: performance and design", Publication: "Report FHWA-TS-78-209, Federal Highway Administration, Washington, DC"}
	Nottingham1975 = Source{Key: "nottingham1975", Authors: "Nottingham, L.C.", Year: 1975,
		Title: "Use of quasi-static friction cone penetrometer data to predict load capacity of displacement piles", Publication: "PhD thesis, Department of Civil Engineering, University of Florida, Gainesville"}
	EslamiFellenius1997 = Source{Key: "eslami-fellenius1997", Authors: "Eslami, A., Fellenius, B.H.", Year: 1997,
		Title: "Pile capacity by direct CPT and CPTu methods applied to 102 case histories", Publication: "Can. Geotech. J. 34(6), 886-904"}
)
