package verify

// The pile group's package in the function-to-case map, and the reasons
// its computing functions without a case have none.
func init() {
	coveragePackages = append(coveragePackages, "group")
	for k, v := range map[string]string{
		"group.LosAngelesEfficiency":   "the Los Angeles Group-Action equation as Das & Sivakugan (2019) give it, from memory; checked in closed form by hand (group tests)",
		"group.SeilerKeeneyEfficiency": "Seiler & Keeney's equation as Das & Sivakugan (2019) give it, from memory; checked in closed form by hand (group tests)",
		"group.FeldEfficiency":         "Feld's rule of 1/16 per neighbour, from memory; checked by counting neighbours by hand (group tests)",
		"group.GroupEfficiency":        "dispatches to the efficiency equations, each checked on its own",
		"group.MinSpacingRule":         "AASHTO LRFD minimum spacing, from memory; a rule, not a computation",
		"group.Analyse":                "combines the single pile (package pile), the efficiency, the block and the raft, each checked on its own; property: a 1 × 1 group is the single pile",
		"group.Layout.Measure":         "geometry of the layout (outer faces, least spacing); checked by hand in the group tests",
		"group.Grid":                   "builds a layout of rows × columns; its positions checked by hand in the group tests",
		"group.Positions":              "builds a layout from positions given; checked in the group tests",
		"group.Design.MaxUse":          "the largest of the utilisations",
	} {
		reasons[k] = v
	}
}
