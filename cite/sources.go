package cite

// The catalogue: sources that more than one package rests on. A package
// may also declare its own Source values; give each a unique Key.
// These are values: copy them, do not change them.
var (
	NIST2008 = Source{Key: "nist-sp811-2008", Authors: "Thompson, A., Taylor, B.N.", Year: 2008,
		Title: "Guide for the Use of the International System of Units (SI)", Publication: "NIST Special Publication 811, National Institute of Standards and Technology, Gaithersburg"}
	Das2019 = Source{Key: "das-pfe-2019", Authors: "Das, B.M., Sivakugan, N.", Year: 2019,
		Title: "Principles of Foundation Engineering", Publication: "9th ed., Cengage Learning, Boston"}
	DasGeo = Source{Key: "das-pge", Authors: "Das, B.M., Sobhan, K.", Year: 2014,
		Title: "Principles of Geotechnical Engineering", Publication: "8th ed., Cengage Learning, Stamford"}
	Craig2012 = Source{Key: "craig-2012", Authors: "Knappett, J.A., Craig, R.F.", Year: 2012,
		Title: "Craig's Soil Mechanics", Publication: "8th ed., Spon Press, Abingdon"}
	Meyerhof1976 = Source{Key: "meyerhof1976", Authors: "Meyerhof, G.G.", Year: 1976,
		Title: "Bearing capacity and settlement of pile foundations", Publication: "J. Geotech. Eng. Div. ASCE 102(GT3), 197-228"}
	Vesic1977 = Source{Key: "vesic1977", Authors: "Vesic, A.S.", Year: 1977,
		Title: "Design of Pile Foundations", Publication: "NCHRP Synthesis of Highway Practice 42, Transportation Research Board, Washington DC"}
	Berezantzev1961 = Source{Key: "berezantzev1961", Authors: "Berezantzev, V.G., Khristoforov, V.S., Golubkov, V.N.", Year: 1961,
		Title: "Load bearing capacity and deformation of piled foundations", Publication: "Proc. 5th Int. Conf. Soil Mech. Found. Eng., Paris, 2, 11-15"}
	Janbu1976 = Source{Key: "janbu1976", Authors: "Janbu, N.", Year: 1976,
		Title: "Static bearing capacity of friction piles", Publication: "Proc. 6th European Conf. Soil Mech. Found. Eng., Vienna, 1.2, 479-488"}
	Skempton1951 = Source{Key: "skempton1951", Authors: "Skempton, A.W.", Year: 1951,
		Title: "The bearing capacity of clays", Publication: "Proc. Building Research Congress, London, 1, 180-189"}
	API2011 = Source{Key: "api-rp2geo-2011", Authors: "American Petroleum Institute", Year: 2011,
		Title: "Geotechnical and Foundation Design Considerations", Publication: "API Recommended Practice 2GEO, 1st ed., Washington DC"}
	ONeillReese1999 = Source{Key: "oneill-reese1999", Authors: "O'Neill, M.W., Reese, L.C.", Year: 1999,
		Title: "Drilled Shafts: Construction Procedures and Design Methods", Publication: "FHWA-IF-99-025, Federal Highway Administration, Washington DC"}
	Brown2010 = Source{Key: "fhwa-gec10-2010", Authors: "Brown, D.A., Turner, J.P., Castelli, R.J.", Year: 2010,
		Title: "Drilled Shafts: Construction Procedures and LRFD Design Methods", Publication: "FHWA-NHI-10-016, Geotechnical Engineering Circular No. 10, Federal Highway Administration, Washington DC"}
	Brown2018 = Source{Key: "fhwa-gec10-2018", Authors: "Brown, D.A., Turner, J.P., Castelli, R.J., Loehr, E.J.", Year: 2018,
		Title: "Drilled Shafts: Construction Procedures and Design Methods", Publication: "FHWA-NHI-18-024, Geotechnical Engineering Circular No. 10, Federal Highway Administration, Washington DC"}
	BondHarris2008 = Source{Key: "bond-harris2008", Authors: "Bond, A.J., Harris, A.J.", Year: 2008,
		Title: "Decoding Eurocode 7", Publication: "Taylor & Francis, Abingdon"}
	Hannigan2016 = Source{Key: "fhwa-gec12-2016", Authors: "Hannigan, P.J., Rausche, F., Likins, G.E., Robinson, B.R., Becker, M.L.", Year: 2016,
		Title: "Design and Construction of Driven Pile Foundations", Publication: "FHWA-NHI-16-009, Geotechnical Engineering Circular No. 12, Federal Highway Administration, Washington DC"}
	Jaky1944 = Source{Key: "jaky1944", Authors: "Jaky, J.", Year: 1944,
		Title: "The coefficient of earth pressure at rest", Publication: "J. Soc. Hungarian Architects and Engineers 78(22), 355-358"}
	MayneKulhawy1982 = Source{Key: "mayne-kulhawy1982", Authors: "Mayne, P.W., Kulhawy, F.H.", Year: 1982,
		Title: "K0-OCR relationships in soil", Publication: "J. Geotech. Eng. Div. ASCE 108(GT6), 851-872"}
	Kulhawy1984 = Source{Key: "kulhawy1984", Authors: "Kulhawy, F.H.", Year: 1984,
		Title: "Limiting tip and side resistance: fact or fallacy?", Publication: "Proc. Symp. Analysis and Design of Pile Foundations, ASCE, San Francisco, 80-98"}
	Burland1973 = Source{Key: "burland1973", Authors: "Burland, J.B.", Year: 1973,
		Title: "Shaft friction of piles in clay: a simple fundamental approach", Publication: "Ground Engineering 6(3), 30-42"}
	Tomlinson1957 = Source{Key: "tomlinson1957", Authors: "Tomlinson, M.J.", Year: 1957,
		Title: "The adhesion of piles driven in clay soils", Publication: "Proc. 4th Int. Conf. Soil Mech. Found. Eng., London, 2, 66-71"}
	VijayvergiyaFocht1972 = Source{Key: "vijayvergiya-focht1972", Authors: "Vijayvergiya, V.N., Focht, J.A.", Year: 1972,
		Title: "A new way to predict capacity of piles in clay", Publication: "Proc. 4th Offshore Technology Conf., Houston, OTC 1718"}
	TomlinsonWoodward2008 = Source{Key: "tomlinson-woodward2008", Authors: "Tomlinson, M.J., Woodward, J.", Year: 2008,
		Title: "Pile Design and Construction Practice", Publication: "5th ed., Taylor & Francis, Abingdon"}
	EN1997 = Source{Key: "en1997-1-2004", Authors: "CEN", Year: 2004,
		Title: "Eurocode 7: Geotechnical design, Part 1: General rules", Publication: "EN 1997-1:2004, European Committee for Standardization, Brussels"}
	AASHTO2020 = Source{Key: "aashto-lrfd-2020", Authors: "AASHTO", Year: 2020,
		Title: "AASHTO LRFD Bridge Design Specifications", Publication: "9th ed., American Association of State Highway and Transportation Officials, Washington DC"}
)
