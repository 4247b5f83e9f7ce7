package main

import (
	"flag"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/report"
)

var viewReliability = report.ViewReliability

// runReliability is the reliability verb: the probabilistic capacity of
// the pile of a calc file (Monte Carlo, FOSM and the sensitivity ranking).
func runReliability(c *cmd, args []string) int { return c.calcVerb(args, viewReliability) }

// reliabilityCode refuses a file without a reliability section.
func (c *cmd) reliabilityCode(name string, res *calc.Result) (int, bool) {
	if res.Reliability == nil {
		c.errorf("%s: reliability: not given; reliability needs a reliability section (parameters with their distributions)", displayName(name))
		return exitUsage, false
	}
	return exitOK, true
}

// Package initialisation runs flags.go's init (which builds helps) before
// this file's (files initialise in name order).
func init() {
	helps["reliability"] = help{
		usage: "reliability [--format F] [--units SI|US] [-o FILE] FILE",
		about: `Runs the calc file and prints the probabilistic capacity of the pile from
its reliability section: Monte Carlo simulation over the uncertain
parameters (φ′, su, unit weights, K, δ, β, α, Nq, Nc, the water depth,
model factors; normal, lognormal, truncated-normal or uniform, correlated
through a Gaussian copula) and the first-order second-moment estimate
beside it: mean, standard deviation, coefficient of variation, the 5, 50
and 95 % percentiles, the probability of falling below the load, the
reliability index and the sensitivity ranking, for compression and
tension. The same seed gives the same result whatever the number of
workers. A sample outside a method's range stops the run (nothing is
clamped). The html format draws the histogram, the distribution function
and the sensitivity chart. The distributions are the engineer's
judgement; the governing code and licensed practice prevail.`,
		example: `qult reliability examples/quay-wall-reliability.yaml
  qult reliability --format html -o quay-reliability.html examples/quay-wall-reliability.yaml`,
		flags: func() *flag.FlagSet { return calcFlags("reliability", calcFormats, &calcOpts{}) },
	}
}
