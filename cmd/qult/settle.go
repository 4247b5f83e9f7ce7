package main

import (
	"flag"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/report"
)

var viewSettle = report.ViewSettle

// runSettle is the settle verb: the settlement at the serviceability load
// and the load test of a calc file.
func runSettle(c *cmd, args []string) int { return c.calcVerb(args, viewSettle) }

// settleCode returns the exit code of the settle verb for a result, or
// a usage error when the file has nothing to settle: exit 1 when the
// serviceability check fails (a settlement above the allowable, or a pile
// that cannot carry the serviceability load).
func (c *cmd) settleCode(name string, res *calc.Result) (int, bool) {
	if res.Settlement == nil && res.LoadTest == nil {
		c.errorf("%s: settlement: not given; settle needs a settlement section (method, allowable) or a load_test section", displayName(name))
		return exitUsage, false
	}
	if !res.ServiceabilityPass() {
		return exitFail, true
	}
	return exitOK, true
}

func settleHelp() help {
	return help{
		usage: "settle [--format F] [--units SI|US] [-o FILE] FILE",
		about: `Runs the calc file and prints the settlement of the pile head at the
serviceability load (settlement.load, or the characteristic compression
of loads) by the method of its settlement section (load-transfer, vesic
or randolph-wroth), against the allowable settlement; the predicted
load-settlement curve; the axial load with depth; and, with a load_test
section, the measured curve read by Davisson's offset limit, 10 % of
the diameter, Chin-Kondner and Brinch Hansen's 80 % criterion. Exit code
1 when the settlement exceeds the allowable or the pile plunges under
the serviceability load.`,
		example: `qult settle examples/warehouse-driven-settle.yaml
  qult settle --format html -o settlement.html examples/warehouse-driven-settle.yaml`,
		flags: func() *flag.FlagSet { return calcFlags("settle", calcFormats, &calcOpts{}) },
	}
}
