package cite

// Sources of the structural axial resistance of pile sections (package
// structural) and of the published examples its tests are checked
// against.
var (
	EN1992 = Source{Key: "en1992-1-1-2004", Authors: "CEN", Year: 2004,
		Title: "Eurocode 2: Design of concrete structures, Part 1-1: General rules and rules for buildings", Publication: "EN 1992-1-1:2004, European Committee for Standardization, Brussels"}
	EN1993 = Source{Key: "en1993-1-1-2005", Authors: "CEN", Year: 2005,
		Title: "Eurocode 3: Design of steel structures, Part 1-1: General rules and rules for buildings", Publication: "EN 1993-1-1:2005, European Committee for Standardization, Brussels"}
	IBC2018 = Source{Key: "icc-ibc-2018", Authors: "International Code Council", Year: 2018,
		Title: "International Building Code", Publication: "2018 ed., International Code Council, Country Club Hills, Illinois"}
	NAVFAC1986 = Source{Key: "navfac-dm2-08-1986", Authors: "Naval Facilities Engineering Command", Year: 1986,
		Title: "Blast Resistant Structures", Publication: "Design Manual 2.08, NAVFAC, Alexandria, Virginia"}
	PilingEC2Slides = Source{Key: "piling-ec2-slides", Authors: "Anonymous", Year: 2017,
		Title: "Piling requirement to EC2 (slide notes on the structural capacity of bored piles to EN 1992-1-1 with the Singapore national annex)", Publication: "Scribd document 347996634"}
)
