package main

import (
	"io"
	"strings"
	"sync"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/report"
	"github.com/qultgeo/qult/units"
	"github.com/qultgeo/qult/verify"
)

// The views of a result, one per verb.
var (
	viewCheck    = report.ViewCheck
	viewCapacity = report.ViewCapacity
	viewLength   = report.ViewLength
	viewReport   = report.ViewReport
)

// render writes res in format for view, in display system sys, through
// package report. The date is left to the calc file (none is made up), so
// that the same file gives the same output.
func render(w io.Writer, res *calc.Result, format string, view report.View, sys units.System, wide bool, paper report.Paper) error {
	switch format {
	case "records":
		return report.WriteRecords(w, res, report.Options{Units: report.UnitsOf(sys), View: view})
	case "records-csv":
		return report.WriteRecordsCSV(w, res, report.Options{Units: report.UnitsOf(sys), View: view})
	}
	f, err := report.ParseFormat(format)
	if err != nil {
		return err
	}
	o := report.Options{Units: report.UnitsOf(sys), View: view, Wide: wide, Paper: paper}
	if view == report.ViewReport || f == report.JSON || f == report.PDF { // the package's title block, and the whole result in JSON
		o.Verification = verificationLine()
	}
	return report.Write(w, res, f, o)
}

// verificationLine runs the verification record once per process (about
// 50 ms) and returns its one-line summary for the calculation package's
// title block.
var verificationLine = sync.OnceValue(func() string {
	return strings.TrimPrefix(verify.SummaryText(), "verification: ")
})
