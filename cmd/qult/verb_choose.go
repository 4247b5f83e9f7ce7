package main

import (
	"flag"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/report"
)

var viewChoose = report.ViewChoose

// runChoose is the choose verb: the candidate piles of a calc file
// compared, each with its shortest passing length, and the recommended
// one.
func runChoose(c *cmd, args []string) int { return c.calcVerb(args, viewChoose) }

// chooseCode refuses a file without a candidates section, and returns
// exit 1 when no candidate passes.
func (c *cmd) chooseCode(name string, res *calc.Result) (int, bool) {
	if res.Candidates == nil {
		c.errorf("%s: candidates: not given; choose needs a candidates section (piles with their section, installation and material) with design and loads", displayName(name))
		return exitUsage, false
	}
	if res.Candidates.Recommended < 0 {
		return exitFail, true
	}
	return exitOK, true
}

// Package initialisation runs flags.go's init (which builds helps) before
// this file's (files initialise in name order).
func init() {
	helps["choose"] = help{
		usage: "choose [--format F] [--units SI|US] [-o FILE] FILE",
		about: `Runs the calc file and compares the pile types of its candidates section
(sections and installations, each with its material and, optionally,
unit costs): for each, the shortest length that passes every check in
force (the geotechnical cases of the design basis in compression and
tension, the settlement at the serviceability load when an allowable is
given, and the section's own axial resistance by the rule of the basis:
AASHTO LRFD, EN 1992-1-1 / EN 1993-1-1, or allowable stresses against
the largest axial force), what governs it, the utilisations, the
quantities of concrete and steel and the cost. The candidates are ranked
by cost (or by length × area without costs) and the first that passes
is recommended; a candidate that fails says why and how near it came.
The html and pdf formats draw the required length against the diameter.
Sections are taken as fully embedded (no buckling). Exit code 1 when no
candidate passes. The governing code and licensed practice prevail.`,
		example: `qult choose examples/logistics-hall-candidates.yaml
  qult choose --format html -o choice.html examples/logistics-hall-candidates.yaml`,
		flags: func() *flag.FlagSet { return calcFlags("choose", calcFormats, &calcOpts{}) },
	}
}
