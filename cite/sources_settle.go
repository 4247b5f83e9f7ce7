package cite

// Sources of single-pile settlement, load transfer and static load-test
// interpretation (package settle).
var (
	RandolphWroth1978 = Source{Key: "randolph-wroth1978", Authors: "Randolph, M.F., Wroth, C.P.", Year: 1978,
		Title: "Analysis of deformation of vertically loaded piles", Publication: "J. Geotech. Eng. Div. ASCE 104(GT12), 1465-1488"}
	Davisson1972 = Source{Key: "davisson1972", Authors: "Davisson, M.T.", Year: 1972,
		Title: "High capacity piles", Publication: "Proc. Lecture Series on Innovations in Foundation Construction, ASCE Illinois Section, Chicago, 81-112"}
	Chin1970 = Source{Key: "chin1970", Authors: "Chin, F.K.", Year: 1970,
		Title: "Estimation of the ultimate load of piles not carried to failure", Publication: "Proc. 2nd Southeast Asian Conf. Soil Eng., Singapore, 81-90"}
	Kondner1963 = Source{Key: "kondner1963", Authors: "Kondner, R.L.", Year: 1963,
		Title: "Hyperbolic stress-strain response: cohesive soils", Publication: "J. Soil Mech. Found. Div. ASCE 89(SM1), 115-143"}
	BrinchHansen1963 = Source{Key: "brinch-hansen1963", Authors: "Brinch Hansen, J.", Year: 1963,
		Title: "Discussion on hyperbolic stress-strain response: cohesive soils", Publication: "J. Soil Mech. Found. Div. ASCE 89(SM4), 241-242"}
	ENISO22477 = Source{Key: "en-iso22477-1-2018", Authors: "CEN", Year: 2018,
		Title: "Geotechnical investigation and testing: Testing of geotechnical structures, Part 1: Testing of piles: static compression load testing", Publication: "EN ISO 22477-1:2018, European Committee for Standardization, Brussels"}
	FelleniusBasics = Source{Key: "fellenius-basics", Authors: "Fellenius, B.H.", Year: 2023,
		Title: "Basics of Foundation Design", Publication: "Electronic edition, www.fellenius.net"}
)
