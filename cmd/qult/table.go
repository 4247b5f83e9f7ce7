package main

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"math"
	"strconv"
	"strings"
	"unicode/utf8"
)

// sig writes x to n significant digits in fixed notation (exponent
// notation only for very large or very small magnitudes), so that outputs
// match on every machine.
func sig(x float64, n int) string {
	switch {
	case math.IsNaN(x) || math.IsInf(x, 0):
		return "—" // never in a result; shown rather than hidden
	case x == 0:
		return "0"
	}
	e := int(math.Floor(math.Log10(math.Abs(x))))
	if e < -4 || e >= 12 {
		return strconv.FormatFloat(x, 'e', n-1, 64)
	}
	d := n - 1 - e
	if d < 0 {
		// round to n significant digits, then print without decimals
		p := math.Pow(10, float64(-d))
		return strconv.FormatFloat(math.Round(x/p)*p, 'f', 0, 64)
	}
	return strconv.FormatFloat(x, 'f', d, 64)
}

// jsonNum is x rounded to 6 significant digits as a JSON number, so that
// JSON outputs match on every machine.
func jsonNum(x float64) json.Number {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return json.Number("null")
	}
	return json.Number(strconv.FormatFloat(x, 'g', 6, 64))
}

// table is a small table for the quick tools' outputs.
type table struct {
	header []string
	rows   [][]string
	right  []bool // right-align column i
}

func (t *table) add(cells ...string) { t.rows = append(t.rows, cells) }

// textWidth is the most columns (runes) a line of text output takes,
// unless --wide asks for the natural width.
const textWidth = 100

// wrapWords breaks s into lines of at most n runes at spaces (a word
// longer than n stays whole).
func wrapWords(s string, n int) []string {
	var out []string
	line := ""
	for _, w := range strings.Fields(s) {
		if line != "" && utf8.RuneCountInString(line)+1+utf8.RuneCountInString(w) > n {
			out = append(out, line)
			line = ""
		}
		if line != "" {
			line += " "
		}
		line += w
	}
	if line != "" || len(out) == 0 {
		out = append(out, line)
	}
	return out
}

// hanging writes s wrapped to textWidth, continuation lines indented by
// indent; wide writes it on one line.
func hanging(b *bytes.Buffer, s, indent string, wide bool) {
	if wide {
		b.WriteString(s + "\n")
		return
	}
	for i, l := range wrapWords(s, textWidth-utf8.RuneCountInString(indent)) {
		if i > 0 {
			b.WriteString(indent)
		}
		b.WriteString(l + "\n")
	}
}

// text writes the table aligned in columns, two spaces apart, with a rule
// under the header. Unless wide, a last text column that would take a line
// past textWidth is wrapped within its cell.
func (t *table) text(b *bytes.Buffer, wide bool) {
	w := make([]int, len(t.header))
	for _, r := range append([][]string{t.header}, t.rows...) {
		for i, c := range r {
			w[i] = max(w[i], utf8.RuneCountInString(c))
		}
	}
	last := len(w) - 1
	wrapLast, notesBelow := false, false
	if !wide && last > 0 && !(last < len(t.right) && t.right[last]) {
		used := 0
		for i := range last {
			used += w[i] + 2
		}
		switch {
		case used+w[last] <= textWidth:
		case textWidth-used >= 20:
			w[last] = textWidth - used
			wrapLast = true
		default:
			// No room for the last column: its cells are listed below
			// the table, each after its row's first cell.
			notesBelow = true
		}
	}
	line := func(r []string) {
		cells := make([][]string, len(r))
		h := 1
		for i, c := range r {
			cells[i] = []string{c}
			if i == last && wrapLast {
				cells[i] = wrapWords(c, w[i])
			}
			h = max(h, len(cells[i]))
		}
		for k := range h {
			var s strings.Builder
			for i := range r {
				c := ""
				if k < len(cells[i]) {
					c = cells[i][k]
				}
				if i > 0 {
					s.WriteString("  ")
				}
				pad := strings.Repeat(" ", max(0, w[i]-utf8.RuneCountInString(c)))
				if i < len(t.right) && t.right[i] {
					s.WriteString(pad + c)
				} else {
					s.WriteString(c + pad)
				}
			}
			b.WriteString(strings.TrimRight(s.String(), " "))
			b.WriteByte('\n')
		}
	}
	if notesBelow {
		cut := func(r []string) []string { return r[:last] }
		line(cut(t.header))
		rule := make([]string, last)
		for i := range rule {
			rule[i] = strings.Repeat("-", w[i])
		}
		line(rule)
		for _, r := range t.rows {
			line(cut(r))
		}
		b.WriteString("\n")
		for _, r := range t.rows {
			if r[last] != "" {
				hanging(b, r[0]+" ("+t.header[last]+"): "+r[last], "    ", false)
			}
		}
		return
	}
	line(t.header)
	rule := make([]string, len(w))
	for i := range w {
		rule[i] = strings.Repeat("-", w[i])
	}
	line(rule)
	for _, r := range t.rows {
		line(r)
	}
}

func (t *table) csv(b *bytes.Buffer) {
	cw := csv.NewWriter(b)
	cw.Write(t.header)
	cw.WriteAll(t.rows)
}

func (t *table) md(b *bytes.Buffer) {
	esc := func(s string) string { return strings.ReplaceAll(s, "|", `\|`) }
	row := func(r []string) {
		b.WriteString("|")
		for _, c := range r {
			b.WriteString(" " + esc(c) + " |")
		}
		b.WriteByte('\n')
	}
	row(t.header)
	b.WriteString("|")
	for i := range t.header {
		if i < len(t.right) && t.right[i] {
			b.WriteString("---:|")
		} else {
			b.WriteString("---|")
		}
	}
	b.WriteByte('\n')
	for _, r := range t.rows {
		row(r)
	}
}
