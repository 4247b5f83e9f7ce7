package cite

// Sources of the pile design bases: national annexes, their
// reproductions, and the ratio of shaft resistance in tension to
// compression.
var (
	// Smith2014 reproduces, in its Tables 10.2B and 10.3A/B, EN 1997-1
	// Tables A.6–A.8 and the UK National Annex Tables A.NA.6–A.NA.9.
	Smith2014 = Source{Key: "smith-2014", Authors: "Smith, I.", Year: 2014,
		Title: "Smith's Elements of Soil Mechanics", Publication: "9th ed., Wiley Blackwell, Chichester"}
	// UKNA1997 is the UK National Annex to EN 1997-1 (first edition, with
	// Corrigendum No. 1).
	UKNA1997 = Source{Key: "bsi-na-en1997-1-2007", Authors: "BSI", Year: 2007,
		Title: "UK National Annex to Eurocode 7: Geotechnical design, Part 1: General rules", Publication: "NA to BS EN 1997-1:2004, British Standards Institution, London"}
	// DeNicolaRandolph1993 compares the shaft capacity of piles in sand
	// in tension and in compression. The journal, volume and pages are
	// from memory (the paper itself was not read).
	DeNicolaRandolph1993 = Source{Key: "de-nicola-randolph1993", Authors: "De Nicola, A., Randolph, M.F.", Year: 1993,
		Title: "Tensile and compressive shaft capacity of piles in sand", Publication: "J. Geotech. Eng. ASCE 119(12), 1952-1973"}
)
