package report

import (
	"bufio"
	"strings"
	"unicode/utf8"
)

// textWidth is the most columns (runes) a line of text output takes,
// unless Options.Wide asks for tables at their natural width.
const textWidth = 100

// preLines splits preformatted text into lines of at most n runes: a
// longer line is cut, and its continuation starts with "↪ ". Tabs become
// two spaces.
func preLines(s string, n int) []string {
	var out []string
	for _, l := range strings.Split(strings.TrimRight(s, "\n"), "\n") {
		r := []rune(strings.ReplaceAll(strings.TrimRight(l, "\r"), "\t", "  "))
		first := true
		for first || len(r) > 0 {
			m := n
			if !first {
				m = n - 2
			}
			k := min(m, len(r))
			if first {
				out = append(out, string(r[:k]))
			} else {
				out = append(out, "↪ "+string(r[:k]))
			}
			r = r[k:]
			first = false
		}
	}
	return out
}

func width(s string) int { return utf8.RuneCountInString(s) }

func pad(b *bufio.Writer, s string, w int, right bool) {
	n := w - width(s)
	if right {
		b.WriteString(strings.Repeat(" ", max(0, n)))
		b.WriteString(s)
	} else {
		b.WriteString(s)
		b.WriteString(strings.Repeat(" ", max(0, n)))
	}
}

// wrap breaks s into lines of at most n runes at spaces.
func wrap(s string, n int) []string {
	var out []string
	line := ""
	for _, w := range strings.Fields(s) {
		if line != "" && width(line)+1+width(w) > n {
			out = append(out, line)
			line = ""
		}
		if line != "" {
			line += " "
		}
		line += w
	}
	if line != "" {
		out = append(out, line)
	}
	return out
}

func writeText(b *bufio.Writer, d *doc) error {
	b.WriteString(d.title)
	b.WriteString("\n")
	b.WriteString(strings.Repeat("=", width(d.title)))
	b.WriteString("\n")
	for _, s := range d.sections {
		if s.heading != "" {
			b.WriteString("\n")
			b.WriteString(s.heading)
			b.WriteString("\n")
			b.WriteString(strings.Repeat("-", width(s.heading)))
			b.WriteString("\n")
		}
		for i, bl := range s.blocks {
			if i > 0 && bl.svg == "" && bl.pre == "" {
				b.WriteString("\n")
			}
			textBlock(b, bl)
		}
	}
	return nil
}

func textBlock(b *bufio.Writer, bl block) {
	switch {
	case bl.pre != "":
		for _, l := range preLines(bl.pre, textWidth-2) {
			b.WriteString("  ")
			b.WriteString(l)
			b.WriteString("\n")
		}
	case bl.para != "":
		for _, l := range wrap(bl.para, 78) {
			b.WriteString(l)
			b.WriteString("\n")
		}
	case len(bl.items) > 0:
		lw, vw := 0, 0
		for _, it := range bl.items {
			lw = max(lw, width(it.label))
			if it.val.num {
				vw = max(vw, width(it.val.str(sig)))
			}
		}
		for _, it := range bl.items {
			b.WriteString("  ")
			pad(b, it.label, lw, false)
			b.WriteString("  ")
			v := it.val.str(sig)
			if it.val.num {
				pad(b, v, vw, true)
			} else {
				b.WriteString(v)
			}
			if it.unit != "" {
				b.WriteString(" ")
				b.WriteString(it.unit)
			}
			b.WriteString("\n")
		}
	case bl.tbl != nil && bl.tbl.listInText:
		textBlock(b, block{list: tableList(bl.tbl)})
	case bl.tbl != nil:
		textTable(b, bl.tbl)
	case len(bl.eqs) > 0:
		for _, e := range bl.eqs {
			b.WriteString("  ")
			b.WriteString(e)
			b.WriteString("\n")
		}
	case len(bl.list) > 0:
		for _, l := range bl.list {
			for i, w := range wrap(l, textWidth-4) {
				if i == 0 {
					b.WriteString("  - ")
				} else {
					b.WriteString("    ")
				}
				b.WriteString(w)
				b.WriteString("\n")
			}
		}
	}
}

func textTable(b *bufio.Writer, t *table) {
	w := make([]int, len(t.cols))
	right := make([]bool, len(t.cols))
	heads := make([]string, len(t.cols))
	for j, c := range t.cols {
		heads[j] = c.header()
		w[j] = width(heads[j])
		right[j] = true
	}
	cells := make([][]string, len(t.rows))
	for i, row := range t.rows {
		cells[i] = make([]string, len(row))
		for j, c := range row {
			cells[i][j] = c.str(sig)
			w[j] = max(w[j], width(cells[i][j]))
			if !c.num && c.s != "-" {
				right[j] = false
			}
		}
	}
	line := func(vals []string) {
		b.WriteString("  ")
		for j, v := range vals {
			if j > 0 {
				b.WriteString("  ")
			}
			if j == len(vals)-1 && !right[j] {
				b.WriteString(v)
			} else {
				pad(b, v, w[j], right[j])
			}
		}
		b.WriteString("\n")
	}
	line(heads)
	rule := make([]string, len(w))
	for j := range w {
		rule[j] = strings.Repeat("-", w[j])
	}
	line(rule)
	for _, r := range cells {
		line(r)
	}
}

// tableList turns each row into one line: the first cell, then each other
// column as "name: value".
func tableList(t *table) []string {
	var out []string
	for _, row := range t.rows {
		var parts []string
		for j, c := range row {
			v := c.str(sig)
			if j == 0 {
				parts = append(parts, v+".")
				continue
			}
			if v == "-" || v == "" {
				continue
			}
			parts = append(parts, t.cols[j].header()+": "+v+".")
		}
		out = append(out, strings.Join(parts, " "))
	}
	return out
}
