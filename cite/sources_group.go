package cite

// Sources of pile-group efficiency, block failure, group uplift and group
// settlement (package group).
var (
	TerzaghiPeck1967 = Source{Key: "terzaghi-peck1967", Authors: "Terzaghi, K., Peck, R.B.", Year: 1967,
		Title: "Soil Mechanics in Engineering Practice", Publication: "2nd ed., John Wiley & Sons, New York"}
	Vesic1969 = Source{Key: "vesic1969", Authors: "Vesic, A.S.", Year: 1969,
		Title: "Experiments with instrumented pile groups in sand", Publication: "Performance of Deep Foundations, ASTM STP 444, American Society for Testing and Materials, Philadelphia, 177-222"}
	GATE2023CE = Source{Key: "gate-ce-2023", Authors: "Indian Institute of Technology Kanpur", Year: 2023,
		Title: "GATE 2023 Civil Engineering (CE), official question paper, shift 1", Publication: "Graduate Aptitude Test in Engineering; question on nine friction piles of 300 mm at 60 % group efficiency, worked solution by the Converse-Labarre formula published by testbook.com"}
	Murthy2002 = Source{Key: "murthy2002", Authors: "Murthy, V.N.S.", Year: 2002,
		Title: "Geotechnical Engineering: Principles and Practices of Soil Mechanics and Foundation Engineering", Publication: "Marcel Dekker, New York (the section on the settlement of pile groups in clay, Fig. 15.31, read in a web reproduction; the book's details from memory)"}
	Newmark1935 = Source{Key: "newmark1935", Authors: "Newmark, N.M.", Year: 1935,
		Title: "Simplified computation of vertical pressures in elastic foundations", Publication: "University of Illinois Engineering Experiment Station, Circular 24, Urbana (from memory); the closed form read in a page reproduction of a soil mechanics textbook (issuhub.com, book 4772, p. 371, Eq. 10.45) and checked against the printed table of a textbook problem (transtutors.com, Table P20.27)"}
	NPTEL105101083 = Source{Key: "nptel-105101083", Authors: "NPTEL (National Programme on Technology Enhanced Learning)", Year: 2009,
		Title: "Foundation design course 105101083, module 5: design of deep foundations, lecture 25: pile groups", Publication: "course slides, archive.nptel.ac.in (the slides read give no year; 2009 is our estimate)"}
)
