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

// text writes the table aligned in columns, two spaces apart, with a rule
// under the header.
func (t *table) text(b *bytes.Buffer) {
	w := make([]int, len(t.header))
	for _, r := range append([][]string{t.header}, t.rows...) {
		for i, c := range r {
			w[i] = max(w[i], utf8.RuneCountInString(c))
		}
	}
	line := func(r []string) {
		var s strings.Builder
		for i, c := range r {
			if i > 0 {
				s.WriteString("  ")
			}
			pad := strings.Repeat(" ", w[i]-utf8.RuneCountInString(c))
			if i < len(t.right) && t.right[i] {
				s.WriteString(pad + c)
			} else {
				s.WriteString(c + pad)
			}
		}
		b.WriteString(strings.TrimRight(s.String(), " "))
		b.WriteByte('\n')
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
