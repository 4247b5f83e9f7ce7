package cite

// Sources of negative skin friction, drag load and the neutral plane
// (package settle, Downdrag).
var (
	// Fellenius2004 is the unified design method: force equilibrium at the
	// neutral plane and settlement compatibility there.
	Fellenius2004 = Source{Key: "fellenius2004", Authors: "Fellenius, B.H.", Year: 2004,
		Title:       "Unified design of piled foundations with emphasis on settlement analysis",
		Publication: "Current Practice and Future Trends in Deep Foundations, ASCE Geotechnical Special Publication 125, 253-275"}
	// DasNSF is Das's section on negative skin friction, read in a stored
	// excerpt of the chapter on pile foundations: §11.23, p. 651-652,
	// Eq. 11.125 (fn = K′σ′o tan δ′, K′ = 1 − sin φ′, δ′ ≈ 0.5 to 0.7 φ′).
	// The edition is the one whose §11.23 begins on p. 651.
	DasNSF = Source{Key: "das-pfe-nsf", Authors: "Das, B.M.", Year: 2007,
		Title: "Principles of Foundation Engineering, §11.23 Negative skin friction", Publication: "6th ed., Thomson, Toronto (edition from memory; the stored excerpt shows §11.23 on p. 651-652)"}
	// TanFellenius2016 compares the code treatment of the drag force (a
	// load factored up, no shaft resistance above the neutral plane, the
	// positive shaft resistance below factored down: Singapore CP4, BS 8004,
	// EN 1997-1) with the unified method (abstract read).
	TanFellenius2016 = Source{Key: "tan-fellenius2016", Authors: "Tan, S.A., Fellenius, B.H.", Year: 2016,
		Title: "Negative skin friction pile concepts with soil-structure interaction", Publication: "Geotechnical Research 3(4), 137-147"}
	// Bowles1982 is the neutral depth of a friction pile under a granular
	// fill over consolidating clay, as quoted with Das's equations in
	// course notes (QUT ENB371, week 12 practice questions, Appendix A).
	Bowles1982 = Source{Key: "bowles1982", Authors: "Bowles, J.E.", Year: 1982,
		Title: "Foundation Analysis and Design", Publication: "3rd ed., McGraw-Hill, New York"}
)
