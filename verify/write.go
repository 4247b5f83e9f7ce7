package verify

import (
	"bytes"
	"encoding/json"
	"fmt"
	"html/template"
	"io"
	"math"
	"strconv"
	"strings"
	"unicode/utf8"

	"github.com/qultgeo/qult/calc"
)

// Schema names the version of the record's JSON form.
const Schema = "qult.verify/1"

// Formats are the formats Write accepts.
var Formats = []string{"text", "md", "json", "html"}

// Cautions are printed under every record.
func Cautions() []string {
	return append([]string{
		"The verification record checks qult's arithmetic and method choices against published examples and tables; it does not validate a design.",
	}, calc.CautionText()...)
}

// Write prints the record in format: text, md, json or html.
func (r Record) Write(w io.Writer, format string) error {
	var b bytes.Buffer
	switch format {
	case "text", "":
		r.text(&b)
	case "md":
		r.markdown(&b)
	case "json":
		if err := r.json(&b); err != nil {
			return err
		}
	case "html":
		if err := r.html(&b); err != nil {
			return err
		}
	default:
		return fmt.Errorf("verify: format %q: want one of %s", format, strings.Join(Formats, ", "))
	}
	_, err := w.Write(b.Bytes())
	return err
}

// fmtNum prints a computed value to six significant digits, so that the
// printed record is the same on every machine.
func fmtNum(x float64) string {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return "—"
	}
	return strconv.FormatFloat(x, 'g', 6, 64)
}

// fmtExpected prints an expected value as the catalogue writes it.
func fmtExpected(x float64) string { return strconv.FormatFloat(x, 'g', -1, 64) }

// deviation prints the outcome's deviation: a percentage for a relative
// tolerance, a value in the case's unit for an absolute one.
func (o Outcome) deviation() string {
	if math.IsNaN(o.Deviation) {
		return "—"
	}
	d := o.Deviation
	// Deviations at the level of floating-point rounding print as 0, so
	// that the record reads the same on every machine.
	if math.Abs(d) < 1e-9*max(1, math.Abs(o.Expected)) {
		d = 0
	}
	if o.Tolerance.Relative > 0 {
		return strconv.FormatFloat(100*d, 'g', 3, 64) + " %"
	}
	u := ""
	if o.Unit != "-" {
		u = " " + o.Unit
	}
	return strconv.FormatFloat(d, 'g', 3, 64) + u
}

func (o Outcome) result() string {
	if o.Pass {
		return "pass"
	}
	return "FAIL"
}

// sourceLine is the case's source with its place and status.
func (o Outcome) sourceLine() string {
	return o.Reference() + " [" + o.Status + "]"
}

func (r Record) summary() string {
	return fmt.Sprintf("%d reference cases: %d pass, %d fail", r.Cases, r.Passed, r.Failed)
}

func (r Record) text(b *bytes.Buffer) {
	b.WriteString("qult verification record: reference cases from published sources\n")
	header := []string{"case", "quantity", "expected", "computed", "unit", "deviation", "tolerance", "result"}
	rows := [][]string{}
	for _, o := range r.Outcomes {
		rows = append(rows, []string{o.ID, o.Quantity, fmtExpected(o.Expected), fmtNum(o.Computed), o.Unit,
			o.deviation(), o.Tolerance.String(o.Unit), o.result()})
	}
	w := make([]int, len(header))
	for _, row := range append([][]string{header}, rows...) {
		for i, c := range row {
			w[i] = max(w[i], utf8.RuneCountInString(c))
		}
	}
	right := []bool{false, false, true, true, false, true, true, false}
	line := func(row []string) {
		var s strings.Builder
		for i, c := range row {
			if i > 0 {
				s.WriteString("  ")
			}
			pad := strings.Repeat(" ", w[i]-utf8.RuneCountInString(c))
			if right[i] {
				s.WriteString(pad + c)
			} else {
				s.WriteString(c + pad)
			}
		}
		b.WriteString(strings.TrimRight(s.String(), " "))
		b.WriteByte('\n')
	}
	topic := ""
	for i, o := range r.Outcomes {
		if o.Topic != topic {
			topic = o.Topic
			fmt.Fprintf(b, "\n%s\n", topic)
			line(header)
		}
		line(rows[i])
		fmt.Fprintf(b, "    %s: %s\n", o.Function, o.sourceLine())
		if o.Err != nil {
			fmt.Fprintf(b, "    error: %v\n", o.Err)
		}
	}
	fmt.Fprintf(b, "\nsummary: %s\n", r.summary())
	b.WriteString("\ncautions:\n")
	for _, c := range Cautions() {
		fmt.Fprintf(b, "  - %s\n", c)
	}
}

// mdCell escapes a Markdown table cell.
func mdCell(s string) string {
	s = strings.ReplaceAll(s, "|", "\\|")
	return strings.ReplaceAll(s, "\n", " ")
}

func (r Record) markdown(b *bytes.Buffer) {
	b.WriteString("# qult verification record\n\n")
	fmt.Fprintf(b, "%s.\n", r.summary())
	topic := ""
	for _, o := range r.Outcomes {
		if o.Topic != topic {
			topic = o.Topic
			fmt.Fprintf(b, "\n## %s\n\n", mdCell(topic))
			b.WriteString("| case | function | quantity | expected | computed | unit | deviation | tolerance | result | source |\n")
			b.WriteString("|---|---|---|--:|--:|---|--:|--:|---|---|\n")
		}
		src := o.sourceLine()
		if o.Err != nil {
			src += "; error: " + o.Err.Error()
		}
		fmt.Fprintf(b, "| %s | %s | %s | %s | %s | %s | %s | %s | %s | %s |\n", mdCell(o.ID), mdCell(o.Function),
			mdCell(o.Quantity), fmtExpected(o.Expected), fmtNum(o.Computed), mdCell(o.Unit), o.deviation(),
			mdCell(o.Tolerance.String(o.Unit)), o.result(), mdCell(src))
	}
	b.WriteString("\n## Cautions\n\n")
	for _, c := range Cautions() {
		fmt.Fprintf(b, "- %s\n", c)
	}
}

// jsonOutcome is one outcome in the JSON form.
type jsonOutcome struct {
	ID        string      `json:"id"`
	Topic     string      `json:"topic"`
	Function  string      `json:"function"`
	Inputs    any         `json:"inputs"`
	Quantity  string      `json:"quantity"`
	Expected  json.Number `json:"expected"`
	Computed  json.Number `json:"computed"`
	Unit      string      `json:"unit"`
	Deviation json.Number `json:"deviation"`
	Tolerance Tolerance   `json:"tolerance"`
	Pass      bool        `json:"pass"`
	Error     string      `json:"error,omitempty"`
	Source    Source      `json:"source"`
	Where     string      `json:"where"`
	Page      string      `json:"page,omitempty"`
	Status    string      `json:"status"`
	Kind      string      `json:"kind"`
	Note      string      `json:"note,omitempty"`
}

func jnum(x float64) json.Number {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return json.Number("null")
	}
	return json.Number(strconv.FormatFloat(x, 'g', 6, 64))
}

func (r Record) json(b *bytes.Buffer) error {
	out := struct {
		Schema   string        `json:"schema"`
		Cases    int           `json:"cases"`
		Passed   int           `json:"passed"`
		Failed   int           `json:"failed"`
		Outcomes []jsonOutcome `json:"outcomes"`
		Cautions []string      `json:"cautions"`
	}{Schema: Schema, Cases: r.Cases, Passed: r.Passed, Failed: r.Failed, Outcomes: []jsonOutcome{}, Cautions: Cautions()}
	for _, o := range r.Outcomes {
		j := jsonOutcome{ID: o.ID, Topic: o.Topic, Function: o.Function, Inputs: o.Inputs, Quantity: o.Quantity,
			Expected: jnum(o.Expected), Computed: jnum(o.Computed), Unit: o.Unit, Deviation: jnum(o.Deviation),
			Tolerance: o.Tolerance, Pass: o.Pass, Source: o.Source, Where: o.Where, Page: o.Page,
			Status: o.Status, Kind: o.Kind, Note: o.Note}
		if o.Err != nil {
			j.Error = o.Err.Error()
		}
		out.Outcomes = append(out.Outcomes, j)
	}
	enc := json.NewEncoder(b)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false)
	return enc.Encode(out)
}

var page = template.Must(template.New("verify").Parse(`<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<title>qult verification record</title>
<style>
body { font-family: sans-serif; margin: 2em; color: #222; }
table { border-collapse: collapse; margin-bottom: 2em; font-size: 0.9em; }
th, td { border: 1px solid #bbb; padding: 0.25em 0.5em; vertical-align: top; }
td.n { text-align: right; font-variant-numeric: tabular-nums; }
tr.fail td { background: #fdd; }
.src { color: #555; font-size: 0.85em; }
</style>
</head>
<body>
<h1>qult verification record</h1>
<p>{{.Summary}}.</p>
{{range .Topics}}<h2>{{.Name}}</h2>
<table>
<tr><th>case</th><th>function</th><th>quantity</th><th>expected</th><th>computed</th><th>unit</th><th>deviation</th><th>tolerance</th><th>result</th><th>source</th></tr>
{{range .Rows}}<tr{{if not .Pass}} class="fail"{{end}}><td>{{.ID}}</td><td>{{.Function}}</td><td>{{.Quantity}}</td><td class="n">{{.Expected}}</td><td class="n">{{.Computed}}</td><td>{{.Unit}}</td><td class="n">{{.Deviation}}</td><td class="n">{{.Tolerance}}</td><td>{{.Result}}</td><td class="src">{{.Source}}{{if .Error}}<br>error: {{.Error}}{{end}}</td></tr>
{{end}}</table>
{{end}}<h2>Cautions</h2>
<ul>
{{range .Cautions}}<li>{{.}}</li>
{{end}}</ul>
</body>
</html>
`))

func (r Record) html(b *bytes.Buffer) error {
	type row struct {
		ID, Function, Quantity, Expected, Computed, Unit, Deviation, Tolerance, Result, Source, Error string
		Pass                                                                                          bool
	}
	type topic struct {
		Name string
		Rows []row
	}
	var ts []topic
	for _, o := range r.Outcomes {
		if len(ts) == 0 || ts[len(ts)-1].Name != o.Topic {
			ts = append(ts, topic{Name: o.Topic})
		}
		rw := row{ID: o.ID, Function: o.Function, Quantity: o.Quantity, Expected: fmtExpected(o.Expected),
			Computed: fmtNum(o.Computed), Unit: o.Unit, Deviation: o.deviation(), Tolerance: o.Tolerance.String(o.Unit),
			Result: o.result(), Source: o.sourceLine(), Pass: o.Pass}
		if o.Err != nil {
			rw.Error = o.Err.Error()
		}
		ts[len(ts)-1].Rows = append(ts[len(ts)-1].Rows, rw)
	}
	return page.Execute(b, struct {
		Summary  string
		Topics   []topic
		Cautions []string
	}{r.summary(), ts, Cautions()})
}
