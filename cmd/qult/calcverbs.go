package main

import (
	"bytes"
	"errors"
	"flag"
	"path/filepath"
	"strings"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/report"
	"github.com/qultgeo/qult/units"
)

// calcFormats are the output formats of the verbs that read a calc file.
const calcFormats = "text, json, csv, md, html, pdf, records (JSON records of every table), records-csv"

// calcOpts are the flags of check, capacity, length and report.
type calcOpts struct {
	format string
	units  string
	out    string
	wide   bool
	paper  string
}

func calcFlags(name, formats string, o *calcOpts) *flag.FlagSet {
	fs := newFlagSet(name)
	def := "by -o's extension (.html, .pdf, .json, .csv, .md), else text"
	fs.StringVar(&o.format, "format", "", "output `format`: "+formats+" (default "+def+")")
	fs.StringVar(&o.units, "units", "", "display `system` SI or US (default: the file's units)")
	fs.StringVar(&o.out, "o", "", "write the output to `FILE` instead of standard output")
	fs.StringVar(&o.paper, "paper", "auto", "pdf: page `size` a4, letter, or auto (A4 for SI units, Letter for US)")
	fs.BoolVar(&o.wide, "wide", false, "text: tables at their natural width, one line per row, instead of fitting 100 columns")
	return fs
}

func setCalcVersion(v string) { calc.SetVersion(v) }

func runCheck(c *cmd, args []string) int    { return c.calcVerb(args, viewCheck) }
func runCapacity(c *cmd, args []string) int { return c.calcVerb(args, viewCapacity) }
func runLength(c *cmd, args []string) int   { return c.calcVerb(args, viewLength) }
func runReport(c *cmd, args []string) int   { return c.calcVerb(args, viewReport) }

// calcVerb is check, capacity, length, report and settle: read, run, render.
func (c *cmd) calcVerb(args []string, view report.View) int {
	var o calcOpts
	fs := calcFlags(c.verb, calcFormats, &o)
	pos, code, ok := c.parseFlags(fs, args)
	if !ok {
		return code
	}
	switch len(pos) {
	case 0:
		return c.usageErr("%s: no calc file given (use - for standard input)", c.verb)
	case 1:
	default:
		return c.usageErr("%s: one calc file at a time, got %d (%s); use batch for many", c.verb, len(pos), strings.Join(pos, " "))
	}
	format := strings.ToLower(o.format)
	if format == "" {
		// The output file's extension chooses the format: a .pdf file gets
		// a PDF, never text under a .pdf name.
		format = "text"
		switch strings.ToLower(filepath.Ext(o.out)) {
		case ".html", ".htm":
			format = "html"
		case ".pdf":
			format = "pdf"
		case ".json":
			format = "json"
		case ".csv":
			format = "csv"
		case ".md":
			format = "md"
		}
	}
	if err := oneOf("format", format, "text", "json", "csv", "md", "html", "pdf", "records", "records-csv"); err != nil {
		return c.usageErr("%s: %v", c.verb, err)
	}
	paper, err := report.ParsePaper(o.paper)
	if err != nil {
		return c.usageErr("%s: --paper %q: want a4, letter or auto", c.verb, o.paper)
	}
	sys, hasSys := units.SI, false
	if o.units != "" {
		s, err := units.ParseSystem(o.units)
		if err != nil {
			return c.usageErr("%s: --units %q: want SI or US", c.verb, o.units)
		}
		sys, hasSys = s, true
	}
	name := pos[0]
	if !c.checkOut(o.out, name) {
		return exitUsage
	}
	data, err := readInput(name, calc.MaxFileSize)
	if err != nil {
		c.errorf("%v", err)
		return exitUsage
	}
	res, err := calc.ParseWith(data, calc.ParseOptions{ReadFile: filesBeside(name)})
	if err != nil {
		c.problems(displayName(name), err)
		return exitUsage
	}
	if hasSys {
		res.Display = sys
	}
	code = exitOK
	switch view {
	case viewCheck, viewLength:
		if res.Design == nil {
			c.errorf("%s: design: not given; %s needs a design section (basis safety-factor, lrfd or en1997)", displayName(name), c.verb)
			return exitUsage
		}
		if res.Input == nil || res.Input.Loads == nil {
			c.errorf("%s: loads: not given; %s needs the characteristic loads (compression, tension)", displayName(name), c.verb)
			return exitUsage
		}
		if view == viewCheck && (!res.Design.Pass || !res.ServiceabilityPass() || !res.DowndragPass() || res.Group != nil && !res.Group.Pass) {
			code = exitFail
		}
		if view == viewLength && (res.Length == nil || !res.Length.Found || res.Downdrag != nil && len(res.Downdrag.Cases) > 0 && !res.Downdrag.LengthFound) {
			code = exitFail
		}
	case viewSettle:
		var ok bool
		if code, ok = c.settleCode(name, res); !ok {
			return code
		}
	case viewReliability:
		var ok bool
		if code, ok = c.reliabilityCode(name, res); !ok {
			return code
		}
	case viewChoose:
		var ok bool
		if code, ok = c.chooseCode(name, res); !ok {
			return code
		}
	}
	var buf bytes.Buffer
	if err := render(&buf, res, format, view, res.Display, o.wide, paper); err != nil {
		c.errorf("%s: %v", c.verb, err)
		return exitUsage
	}
	if w := c.output(o.out, &buf); w != exitOK {
		return w
	}
	return code
}

func displayName(name string) string {
	if name == "-" {
		return "<stdin>"
	}
	return name
}

// problems prints every problem of a bad calc file on its own line:
//
//	qult: ground.layers[1].thickness (line 12): "12 kPa": ...
//
// A problem without a field path is named by the file.
func (c *cmd) problems(file string, err error) {
	var ps calc.Problems
	if !errors.As(err, &ps) {
		c.errorf("%s: %v", file, err)
		return
	}
	lines := make([]string, len(ps))
	for i, p := range ps {
		if p.Path == "" {
			p.Path = file
		}
		lines[i] = report.CleanText("qult: " + p.Error())
	}
	cappedLines(c.stderr, lines)
	if len(ps) == 0 {
		c.errorf("%s: %v", file, err)
	}
}
