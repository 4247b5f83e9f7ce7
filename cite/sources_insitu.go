package cite

// Sources of in-situ test records, their corrections and the correlations
// drawn from them (package insitu).
var (
	Robertson2009 = Source{Key: "robertson2009", Authors: "Robertson, P.K.", Year: 2009,
		Title: "Interpretation of cone penetration tests: a unified approach", Publication: "Can. Geotech. J. 46(11), 1337-1355"}
	Robertson2010 = Source{Key: "robertson2010", Authors: "Robertson, P.K.", Year: 2010,
		Title: "Soil behaviour type from the CPT: an update", Publication: "Proc. 2nd Int. Symp. on Cone Penetration Testing (CPT'10), Huntington Beach, CA, Vol. 2, 575-583"}
	Robertson1990 = Source{Key: "robertson1990", Authors: "Robertson, P.K.", Year: 1990,
		Title: "Soil classification using the cone penetration test", Publication: "Can. Geotech. J. 27(1), 151-158"}
	RobertsonCabal2015 = Source{Key: "robertson-cabal2015", Authors: "Robertson, P.K., Cabal, K.L.", Year: 2015,
		Title: "Guide to Cone Penetration Testing for Geotechnical Engineering", Publication: "6th ed., Gregg Drilling & Testing, Signal Hill, CA"}
	RobertsonCampanella1983 = Source{Key: "robertson-campanella1983", Authors: "Robertson, P.K., Campanella, R.G.", Year: 1983,
		Title: "Interpretation of cone penetration tests. Part I: Sand", Publication: "Can. Geotech. J. 20(4), 718-733"}
	KulhawyMayne1990 = Source{Key: "kulhawy-mayne1990", Authors: "Kulhawy, F.H., Mayne, P.W.", Year: 1990,
		Title: "Manual on Estimating Soil Properties for Foundation Design", Publication: "Report EL-6800, Electric Power Research Institute, Palo Alto, CA"}
	Skempton1986 = Source{Key: "skempton1986", Authors: "Skempton, A.W.", Year: 1986,
		Title: "Standard penetration test procedures and the effects in sands of overburden pressure, relative density, particle size, ageing and overconsolidation", Publication: "Géotechnique 36(3), 425-447"}
	LiaoWhitman1986 = Source{Key: "liao-whitman1986", Authors: "Liao, S.S.C., Whitman, R.V.", Year: 1986,
		Title: "Overburden correction factors for SPT in sand", Publication: "J. Geotech. Eng. ASCE 112(3), 373-377"}
	// HatanakaUchida1996: its abstract (p. 1) was read, the body not.
	HatanakaUchida1996 = Source{Key: "hatanaka-uchida1996", Authors: "Hatanaka, M., Uchida, A.", Year: 1996,
		Title: "Empirical correlation between penetration resistance and internal friction angle of sandy soils", Publication: "Soils and Foundations 36(4), 1-9"}
	Stroud1974 = Source{Key: "stroud1974", Authors: "Stroud, M.A.", Year: 1974,
		Title: "The standard penetration test in insensitive clays and soft rocks", Publication: "Proc. European Symp. on Penetration Testing (ESOPT), Stockholm, Vol. 2.2, 367-375"}
	FHWAGEC5 = Source{Key: "fhwa-gec5-2017", Authors: "Loehr, J.E., Lutenegger, A., Rosenblad, B., Boeckmann, A.", Year: 2017,
		Title: "Geotechnical Site Characterization, Geotechnical Engineering Circular No. 5", Publication: "FHWA-NHI-16-072, Federal Highway Administration, Washington, DC"}
	// ISRNCE2012 is the article whose Table 1 lists the SPT corrections
	// read for package insitu; its authors and title were not reached.
	ISRNCE2012 = Source{Key: "isrn-ce-2012-346439", Authors: "ISRN Civil Engineering (authors not read)", Year: 2012,
		Title: "Article 346439, Table 1: SPT correction factors", Publication: "ISRN Civil Engineering, Hindawi, article ID 346439"}
	WhiteEtAl2019 = Source{Key: "white-etal2019", Authors: "White, F., Ingram, P., Nicholson, D., Stroud, M., Betru, M.", Year: 2019,
		Title: "An update of the SPT-cu relationship proposed by M. Stroud in 1974", Publication: "Proc. XVII European Conf. on Soil Mechanics and Geotechnical Engineering (ECSMGE-2019), ISBN 978-9935-9436-1-3, doi:10.32075/17ECSMGE-2019-0500"}
	MaynePeuchen2018 = Source{Key: "mayne-peuchen2018", Authors: "Mayne, P.W., Peuchen, J.", Year: 2018,
		Title: "Evaluation of CPTU Nkt cone factor for undrained strength of clays", Publication: "Cone Penetration Testing 2018, CRC Press (Taylor & Francis), chapter 58, 7 pp."}
	ENV1997Part3 = Source{Key: "env1997-3", Authors: "CEN", Year: 1999,
		Title: "ENV 1997-3, Eurocode 7: Geotechnical design, Part 3: Design assisted by field testing", Publication: "European prestandard, CEN, Brussels"}
	AGS4 = Source{Key: "ags4", Authors: "Association of Geotechnical and Geoenvironmental Specialists", Year: 2023,
		Title: "AGS4 Data Format, edition 4.1.1, standard dictionary", Publication: "AGS, Bromley, UK"}
	GEFCPT = Source{Key: "gef-cpt-report", Authors: "CUR", Year: 2006,
		Title: "Geotechnical Exchange Format for CPT-data (GEF-CPT-Report), version 1.1.2", Publication: "CUR, Gouda, The Netherlands"}
)
