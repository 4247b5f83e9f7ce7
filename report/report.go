package report

import (
	"bufio"
	"bytes"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
)

// Format is an output format.
type Format int

// The output formats.
const (
	// Text is aligned plain-text tables with units in the headers.
	Text Format = iota
	// CSV is one table per view, with a header row naming units.
	CSV
	// JSON is the versioned result document (schema calc.ResultSchema).
	JSON
	// Markdown is headings and pipe tables with the content of Text.
	Markdown
	// HTML is a self-contained calculation package (inline CSS and SVG).
	HTML
	// PDF is the calculation package on numbered pages (A4 or US Letter),
	// with a header and footer on every page.
	PDF
)

var formatNames = [...]string{Text: "text", CSV: "csv", JSON: "json", Markdown: "md", HTML: "html", PDF: "pdf"}

// String returns the format's name as ParseFormat reads it.
func (f Format) String() string {
	if f >= 0 && int(f) < len(formatNames) {
		return formatNames[f]
	}
	return "Format(" + strconv.Itoa(int(f)) + ")"
}

// ParseFormat reads a format name: text, json, csv, md (or markdown), html
// or pdf, in any case.
func ParseFormat(s string) (Format, error) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "text", "txt":
		return Text, nil
	case "csv":
		return CSV, nil
	case "json":
		return JSON, nil
	case "md", "markdown":
		return Markdown, nil
	case "html":
		return HTML, nil
	case "pdf":
		return PDF, nil
	}
	return 0, fmt.Errorf("report: format %q: want text, json, csv, md, html or pdf", s)
}

// View says how much of a result to render.
type View int

// The views.
const (
	// ViewReport, the zero value, is the whole calculation package.
	ViewReport View = iota
	// ViewCheck is the design verification summary: loads, capacity
	// totals, each design case with Ed, Rd and utilisation, and warnings.
	ViewCheck
	// ViewCapacity is the full capacity breakdown: the per-segment shaft
	// table, the tip block, the worked equations and the totals.
	ViewCapacity
	// ViewLength is the required length and the capacity with depth.
	ViewLength
	// ViewSettle is the settlement at the serviceability load, the
	// predicted load-settlement curve, the axial load with depth and the
	// load test read by its criteria.
	ViewSettle
	// ViewReliability is the probabilistic capacity: the uncertain
	// parameters, Monte Carlo and FOSM estimates, the sensitivity ranking.
	ViewReliability
	// ViewChoose is the comparison of the candidate piles: the ranking,
	// the recommended one, the figure of length against size.
	ViewChoose
)

var viewNames = [...]string{ViewCheck: "check", ViewCapacity: "capacity", ViewLength: "length", ViewReport: "report", ViewSettle: "settle", ViewReliability: "reliability", ViewChoose: "choose"}

// String returns "check", "capacity", "length", "report", "settle",
// "reliability" or "choose".
func (v View) String() string {
	if v >= 0 && int(v) < len(viewNames) {
		return viewNames[v]
	}
	return "View(" + strconv.Itoa(int(v)) + ")"
}

// ParseView reads a view name as String writes it.
func ParseView(s string) (View, error) {
	for i, n := range viewNames {
		if strings.EqualFold(strings.TrimSpace(s), n) {
			return View(i), nil
		}
	}
	return 0, fmt.Errorf("report: view %q: want check, capacity, length, report, settle, reliability or choose", s)
}

// Units chooses the display system of a report.
type Units int

// The display systems of a report.
const (
	// FileUnits, the zero value, shows the system the calc file declared
	// (calc.Result.Display).
	FileUnits Units = iota
	// SIUnits shows m, kPa, kN, kN/m³.
	SIUnits
	// USUnits shows ft, ksf, kip, pcf.
	USUnits
)

// UnitsOf returns the report's Units for a display system of package units.
func UnitsOf(s units.System) Units {
	if s == units.US {
		return USUnits
	}
	return SIUnits
}

// resolve returns the display system u stands for in result r.
func (u Units) resolve(r *calc.Result) (units.System, error) {
	switch u {
	case FileUnits:
		return r.Display, nil
	case SIUnits:
		return units.SI, nil
	case USUnits:
		return units.US, nil
	}
	return 0, fmt.Errorf("report: unit system %v: want file, SI or US", u)
}

// String returns "file", "SI" or "US".
func (u Units) String() string {
	switch u {
	case FileUnits:
		return "file"
	case SIUnits:
		return "SI"
	case USUnits:
		return "US"
	}
	return "Units(" + strconv.Itoa(int(u)) + ")"
}

// Options set how a result is rendered. The zero value renders the whole
// calculation package (ViewReport) in the units the calc file declared,
// with the calc file's own date.
type Options struct {
	// Units is the display system; the zero value (FileUnits) shows the
	// system the calc file declared.
	Units Units
	// View is what to render.
	View View
	// Date is written in the title block; empty means the calc file's own
	// date, and if that is empty too the date is left out.
	Date string
	// Verification is a one-line summary of the verification record run
	// by the program that writes the report (such as "verification: 259
	// reference cases, all pass"), shown in the title block; empty leaves
	// it out.
	Verification string
	// Wide lays text out as wide as its tables are (one line per row, an
	// item or equation on one line); the default fits every line in 100
	// columns, splitting a wide table into parts that repeat its first
	// column and wrapping long text.
	Wide bool
	// Paper is the page size of PDF output; the zero value, PaperAuto,
	// is A4 for SI display units and US Letter for US units.
	Paper Paper

	sys units.System // the display system, resolved by Write
}

// Write renders result r in format f to w.
//
// Errors: a nil result, an unknown format, view or unit system, and write
// errors from w.
func Write(w io.Writer, r *calc.Result, f Format, o Options) error {
	if r == nil {
		return fmt.Errorf("report: nil result")
	}
	var err error
	if o.sys, err = o.Units.resolve(r); err != nil {
		return err
	}
	if o.View < 0 || int(o.View) >= len(viewNames) {
		return fmt.Errorf("report: view %v: want check, capacity, length, report, settle, reliability or choose", o.View)
	}
	bw := bufio.NewWriterSize(w, 32<<10)
	switch f {
	case Text, Markdown, CSV:
		// Rendered whole, then cleaned of control and bidirectional
		// characters (CleanText) before it reaches w.
		var buf bytes.Buffer
		tw := bufio.NewWriter(&buf)
		switch f {
		case Text:
			err = writeText(tw, build(r, o), o.Wide)
		case Markdown:
			err = writeMarkdown(tw, build(r, o))
		default:
			err = writeCSV(tw, r, o)
		}
		if err == nil {
			err = tw.Flush()
		}
		if err == nil {
			_, err = bw.WriteString(CleanText(buf.String()))
		}
	case JSON:
		err = writeJSON(bw, r, o)
	case HTML:
		err = writeHTML(bw, r, o)
	case PDF:
		if o.Paper < PaperAuto || o.Paper > PaperLetter {
			return fmt.Errorf("report: paper %v: want auto, a4 or letter", o.Paper)
		}
		err = writePDF(bw, r, o)
	default:
		return fmt.Errorf("report: format %v: want text, json, csv, md, html or pdf", f)
	}
	if err != nil {
		return err
	}
	return bw.Flush()
}

// sig is the number of significant digits in text, Markdown and HTML;
// csvSig and jsonSig those of CSV and JSON.
const (
	sig     = 4
	csvSig  = 6
	jsonSig = 6
)

// tiny is the magnitude, in display units, below which text output shows
// 0: values that small are round-off (such as fs at the ground surface).
const tiny = 5e-7

// fmtNum writes x rounded to n significant digits in fixed notation,
// trailing zeros removed ("24", "78.74", "0.25"). Magnitudes below tiny
// print as 0, and those of 1e15 or more in exponent form. NaN and ±Inf,
// which a result never holds, print as "n/a".
func fmtNum(x float64, n int) string {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return "n/a"
	}
	if math.Abs(x) < tiny {
		return "0"
	}
	e := strconv.FormatFloat(x, 'e', n-1, 64)
	r, _ := strconv.ParseFloat(e, 64)
	exp := int(math.Floor(math.Log10(math.Abs(r))))
	if exp >= 15 || exp < -6 {
		return e
	}
	s := strconv.FormatFloat(r, 'f', max(0, n-1-exp), 64)
	if strings.IndexByte(s, '.') >= 0 {
		s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
	}
	if s == "-0" {
		s = "0"
	}
	return s
}

// roundSig rounds x to n significant digits (for JSON).
func roundSig(x float64, n int) float64 {
	if x == 0 || math.IsNaN(x) || math.IsInf(x, 0) {
		return x
	}
	r, _ := strconv.ParseFloat(strconv.FormatFloat(x, 'e', n-1, 64), 64)
	return r
}

// conv converts SI quantities to the display system.
type conv struct{ sys units.System }

func (c conv) in(v float64, d units.Dimension) float64 {
	x, _ := c.sys.In(v, d)
	return x
}
func (c conv) L(v units.Length) float64         { return c.in(float64(v), units.DimLength) }
func (c conv) S(v units.Stress) float64         { return c.in(float64(v), units.DimStress) }
func (c conv) F(v units.Force) float64          { return c.in(float64(v), units.DimForce) }
func (c conv) G(v units.UnitWeight) float64     { return c.in(float64(v), units.DimUnitWeight) }
func (c conv) A(v units.Area) float64           { return c.in(float64(v), units.DimArea) }
func (c conv) Q(v units.ForcePerLength) float64 { return c.in(float64(v), units.DimForcePerLength) }
func (c conv) u(d units.Dimension) string       { return c.sys.Unit(d) }
func (c conv) uL() string                       { return c.u(units.DimLength) }
func (c conv) uS() string                       { return c.u(units.DimStress) }
func (c conv) uF() string                       { return c.u(units.DimForce) }
func (c conv) uG() string                       { return c.u(units.DimUnitWeight) }
func (c conv) uA() string                       { return c.u(units.DimArea) }
func (c conv) uQ() string                       { return c.u(units.DimForcePerLength) }
func (c conv) ls(v units.Length) string         { return fmtNum(c.L(v), sig) + " " + c.uL() }
func (c conv) ss(v units.Stress) string         { return fmtNum(c.S(v), sig) + " " + c.uS() }
func (c conv) fs(v units.Force) string          { return fmtNum(c.F(v), sig) + " " + c.uF() }
func (c conv) as(v units.Area) string           { return fmtNum(c.A(v), sig) + " " + c.uA() }
func (c conv) qs(v units.ForcePerLength) string { return fmtNum(c.Q(v), sig) + " " + c.uQ() }

// modulus returns a modulus in MPa (SI) or ksi (US), units that suit
// stiffnesses better than kPa and ksf.
func (c conv) modulus(v units.Stress) (float64, string) {
	if c.sys == units.US {
		return v.KSI(), "ksi"
	}
	return v.MPa(), "MPa"
}
