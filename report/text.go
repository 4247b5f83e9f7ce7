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
// longer line is cut, and its continuation starts with "» ". Tabs become
// two spaces.
func preLines(s string, n int) []string {
	n = max(n, 8) // room for the continuation mark and some text
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
				out = append(out, "» "+string(r[:k]))
			}
			r = r[k:]
			first = false
		}
	}
	return out
}

func width(s string) int { return utf8.RuneCountInString(s) }

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

func writeText(b *bufio.Writer, d *doc, wide bool) error {
	for _, l := range wrap(d.title, textWidth) {
		b.WriteString(l)
		b.WriteString("\n")
	}
	b.WriteString(strings.Repeat("=", min(textWidth, width(d.title))))
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
			if i > 0 && bl.svg == "" {
				b.WriteString("\n")
			}
			textBlock(b, bl, wide)
		}
	}
	return nil
}

// writeLines writes each line with a newline, trailing spaces removed.
func writeLines(b *bufio.Writer, lines []string) {
	for _, l := range lines {
		b.WriteString(strings.TrimRight(l, " "))
		b.WriteString("\n")
	}
}

// hang wraps s to n runes, the first line after first and the others
// after rest (of the same width as first).
func hang(first, rest, s string, n int) []string {
	var out []string
	for i, l := range wrap(s, max(20, n-width(first))) {
		if i == 0 {
			out = append(out, first+l)
		} else {
			out = append(out, rest+l)
		}
	}
	if len(out) == 0 {
		out = []string{first}
	}
	return out
}

func textBlock(b *bufio.Writer, bl block, wide bool) {
	switch {
	case bl.pre != "":
		for _, l := range preLines(bl.pre, textWidth-2) {
			b.WriteString("  ")
			b.WriteString(l)
			b.WriteString("\n")
		}
	case bl.para != "":
		writeLines(b, wrap(bl.para, 78))
	case len(bl.items) > 0:
		lw, vw := 0, 0
		for _, it := range bl.items {
			lw = max(lw, width(it.label))
			if it.val.num {
				vw = max(vw, width(it.val.str(sig)))
			}
		}
		for _, it := range bl.items {
			head := "  " + it.label + strings.Repeat(" ", lw-width(it.label)) + "  "
			v := it.val.str(sig)
			if it.val.num {
				v = strings.Repeat(" ", max(0, vw-width(v))) + v
			}
			if it.unit != "" {
				v += " " + it.unit
			}
			if it.val.num || wide {
				writeLines(b, []string{head + v})
				continue
			}
			writeLines(b, hang(head, strings.Repeat(" ", width(head)), v, textWidth))
		}
	case bl.tbl != nil && bl.tbl.listInText:
		textBlock(b, block{list: tableList(bl.tbl)}, wide)
	case bl.tbl != nil:
		textTable(b, bl.tbl, wide)
	case len(bl.eqs) > 0:
		for _, e := range bl.eqs {
			if wide {
				writeLines(b, []string{"  " + e})
				continue
			}
			writeLines(b, hang("  ", "      ", e, textWidth))
		}
	case len(bl.list) > 0:
		for _, l := range bl.list {
			writeLines(b, hang("  - ", "    ", l, textWidth))
		}
	}
}

// textTable writes t in aligned columns. Unless wide, a table wider than
// textWidth is split into parts of whole columns, each repeating the first
// column (the row's key) and headed "(continued)"; a text column that
// alone is too wide is wrapped within its cell.
func textTable(b *bufio.Writer, t *table, wide bool) {
	n := len(t.cols)
	w := make([]int, n)
	right := make([]bool, n)
	heads := make([]string, n)
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
	// Parts: the key column, then as many further columns as fit.
	var parts [][]int
	if wide || n < 2 {
		all := make([]int, n)
		for j := range all {
			all[j] = j
		}
		parts = [][]int{all}
	} else {
		key := min(max(1, t.key), n-1)
		var keys []int
		keyW := 0
		for j := range key {
			keys = append(keys, j)
			keyW += w[j] + 2
		}
		cur := append([]int(nil), keys...)
		used := keyW
		for j := key; j < n; j++ {
			if len(cur) > key && used+2+w[j] > textWidth {
				parts = append(parts, cur)
				cur = append([]int(nil), keys...)
				used = keyW
			}
			cur = append(cur, j)
			used += 2 + w[j]
		}
		parts = append(parts, cur)
	}
	for pi, cols := range parts {
		if pi > 0 {
			b.WriteString("\n  (continued)\n")
		}
		// Widths within this part; a text column too wide for what is
		// left is wrapped.
		pw := make([]int, len(cols))
		used := 0
		for k, j := range cols {
			pw[k] = w[j]
			used += w[j] + 2
		}
		if !wide && used > textWidth {
			// Narrow the widest text column to what is left.
			wk := -1
			for k, j := range cols {
				if !right[j] && (wk < 0 || w[j] > pw[wk]) {
					wk = k
				}
			}
			if wk >= 0 {
				pw[wk] = max(12, pw[wk]-(used-textWidth))
			}
		}
		line := func(vals []string) {
			// Each cell wrapped to its width; the row takes as many lines
			// as its tallest cell.
			parts := make([][]string, len(cols))
			h := 1
			for k, j := range cols {
				v := vals[j]
				if width(v) > pw[k] && !right[j] {
					parts[k] = wrap(v, pw[k])
				} else {
					parts[k] = []string{v}
				}
				h = max(h, len(parts[k]))
			}
			for li := 0; li < h; li++ {
				var s strings.Builder
				s.WriteString("  ")
				for k, j := range cols {
					if k > 0 {
						s.WriteString("  ")
					}
					v := ""
					if li < len(parts[k]) {
						v = parts[k][li]
					}
					gap := strings.Repeat(" ", max(0, pw[k]-width(v)))
					if right[j] {
						s.WriteString(gap + v)
					} else {
						s.WriteString(v + gap)
					}
				}
				b.WriteString(strings.TrimRight(s.String(), " "))
				b.WriteString("\n")
			}
		}
		line(heads)
		rule := make([]string, n)
		for k, j := range cols {
			rule[j] = strings.Repeat("-", pw[k])
		}
		line(rule)
		for _, r := range cells {
			line(r)
		}
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
