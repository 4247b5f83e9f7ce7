package main

import (
	"bytes"
	"flag"
	"strings"

	"github.com/qultgeo/qult/verify"
)

// verifyOpts are the flags of the verify verb.
type verifyOpts struct {
	format string
	out    string
}

func verifyFlags(o *verifyOpts) *flag.FlagSet {
	fs := newFlagSet("verify")
	fs.StringVar(&o.format, "format", "text", "output `format`: "+strings.Join(verify.Formats, ", "))
	fs.StringVar(&o.out, "o", "", "write the output to `FILE` instead of standard output")
	return fs
}

// The verb's help joins the others' here, in the file that holds the verb.
// Package initialisation runs flags.go's init (which builds helps) before
// this file's, as the go tool passes files in name order; TestVerifyHelp
// checks it.
func init() {
	helps["verify"] = help{
		usage: "verify [--format text|md|json|html] [-o FILE]",
		about: `Runs the verification record shipped inside qult: reference cases whose
expected values are printed in published sources (handbook worked
examples, tables, agency manuals), each run through the library function
it checks. Prints per case the identifier, the function, the quantity,
the expected and computed values, the deviation, the tolerance, pass or
fail and the source (marked read or from memory), then a summary. Exit
code 1 when any case fails.`,
		example: `qult verify
  qult verify --format html -o verification.html`,
		flags: func() *flag.FlagSet { return verifyFlags(&verifyOpts{}) },
	}
}

func runVerify(c *cmd, args []string) int {
	var o verifyOpts
	fs := verifyFlags(&o)
	pos, code, ok := c.parseFlags(fs, args)
	if !ok {
		return code
	}
	if len(pos) > 0 {
		return c.usageErr("verify takes no file, got %q", strings.Join(pos, " "))
	}
	o.format = strings.ToLower(o.format)
	if err := oneOf("format", o.format, verify.Formats...); err != nil {
		return c.usageErr("verify: %v", err)
	}
	rec, err := verify.Run()
	if err != nil {
		c.errorf("verify: the catalogue cannot be read: %v", err)
		return exitUsage
	}
	var buf bytes.Buffer
	if err := rec.Write(&buf, o.format); err != nil {
		c.errorf("verify: %v", err)
		return exitUsage
	}
	if code := c.output(o.out, &buf); code != exitOK {
		return code
	}
	if rec.Failed > 0 {
		c.errorf("verify: %d of %d reference cases fail", rec.Failed, rec.Cases)
		return exitFail
	}
	return exitOK
}
