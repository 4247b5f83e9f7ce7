package cite

// Sources of the ground profile: how bridge hydraulics divides the design
// scour that lowers the ground at a pier or abutment.
var (
	// Richardson2001 is the 4th edition of FHWA HEC-18; its chapter 2
	// divides total scour into long-term aggradation or degradation,
	// contraction (general) scour and local scour, which add.
	Richardson2001 = Source{Key: "fhwa-hec18-2001", Authors: "Richardson, E.V., Davis, S.R.", Year: 2001,
		Title: "Evaluating Scour at Bridges", Publication: "4th ed., FHWA NHI 01-001, Hydraulic Engineering Circular No. 18, Federal Highway Administration, Washington DC"}
	// Arneson2012 is the 5th edition of FHWA HEC-18, the current one; its
	// title page was read, its chapter on total scour was not reached.
	Arneson2012 = Source{Key: "fhwa-hec18-2012", Authors: "Arneson, L.A., Zevenbergen, L.W., Lagasse, P.F., Clopper, P.E.", Year: 2012,
		Title: "Evaluating Scour at Bridges", Publication: "5th ed., FHWA-HIF-12-003, Hydraulic Engineering Circular No. 18, Federal Highway Administration, Washington DC"}
)
