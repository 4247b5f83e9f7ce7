package report

import (
	"bufio"
	"fmt"
	"html"
	"strings"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
)

// The section headings the HTML writer adds figures to.
const (
	headGround    = "Ground profile"
	headStress    = "Vertical stress"
	headWithDepth = "Capacity with depth"
)

const css = `
body{font-family:Georgia,"Times New Roman",serif;color:#111;background:#fff;max-width:62rem;margin:1.5rem auto;padding:0 1rem;line-height:1.4}
h1{font-size:1.6rem;margin:0 0 .4rem}
h2{font-size:1.15rem;border-bottom:1px solid #888;margin:1.8rem 0 .6rem;padding-bottom:.15rem}
table{border-collapse:collapse;margin:.5rem 0;font-size:.88rem}
th,td{border:1px solid #aaa;padding:.2rem .45rem;vertical-align:top}
th{background:#eee;font-weight:600;text-align:left}
td.n{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}
table.kv th{background:#f6f6f6;font-weight:normal}
.titleblock{border:2px solid #222;padding:.6rem .9rem;margin-bottom:1rem}
.titleblock table{margin:0}
.eq{font-family:"DejaVu Sans Mono",Consolas,monospace;font-size:.86rem;margin:.15rem 0 .15rem 1rem}
pre{background:#f7f7f7;border:1px solid #ccc;padding:.6rem;overflow-x:auto;font-size:.8rem}
figure{margin:.6rem 0}
figcaption{font-size:.85rem;color:#333}
figure svg{max-width:100%;height:auto;display:block}
figure svg text{font-family:"Liberation Sans",Arial,Helvetica,sans-serif !important}
.warn li{margin:.2rem 0}
.caution{border:1px solid #555;padding:.3rem .9rem;background:#fafafa}
.fail{color:#a00;font-weight:bold}
.cont{font-size:.8rem;color:#444;margin:.2rem 0 0}
pre{white-space:pre-wrap;overflow-wrap:anywhere}
td{overflow-wrap:anywhere}
@media print{body{max-width:none;margin:0;padding:0;font-size:9pt;line-height:1.3}h1{font-size:14pt}h2{font-size:11pt;margin:.9rem 0 .35rem;break-after:avoid}table{font-size:7.5pt;margin:.3rem 0}.eq{font-size:7.5pt}pre{font-size:7pt}figure{break-inside:avoid;margin:.3rem 0}figure svg{max-height:125mm;width:auto}tr{break-inside:avoid}}
`

// printCSS is the page box of a printed HTML package: A4 or Letter as the
// PDF, with the same header (title, project, revision) and footer (qult
// version, the calc file's SHA-256 prefix, page x of y, the cautions in one
// line) in the page margins.
func printCSS(r *calc.Result, o Options, title string) string {
	size := "A4"
	if o.Paper == PaperLetter || (o.Paper == PaperAuto && o.sys == units.US) {
		size = "letter"
	}
	var right []string
	if r.Project != "" {
		right = append(right, "Project: "+r.Project)
	}
	if r.Revision != "" {
		right = append(right, "Revision: "+r.Revision)
	}
	left := "qult " + r.Version
	if h := SourceHash(r); h != "" {
		left += "   calc file SHA-256 " + h[:12]
	}
	if dt := date(r, o); dt != "" {
		left += "   " + dt
	}
	return "\n@page{size:" + size + " portrait;margin:18mm 14mm 20mm 14mm;" +
		"@top-left{content:" + cssString(title) + ";font:8pt Helvetica,Arial,sans-serif;color:#444}" +
		"@top-right{content:" + cssString(strings.Join(right, "   ")) + ";font:8pt Helvetica,Arial,sans-serif;color:#444}" +
		"@bottom-left{content:" + cssString(left) + ";font:8pt Helvetica,Arial,sans-serif;color:#444}" +
		"@bottom-right{content:\"page \" counter(page) \" of \" counter(pages);font:8pt Helvetica,Arial,sans-serif;color:#444}" +
		"@bottom-center{content:" + cssString(calc.CautionLine) + ";font:6pt Helvetica,Arial,sans-serif;color:#444;vertical-align:bottom;white-space:normal}}\n"
}

// cssString quotes s as a CSS string: quotes and backslashes escaped, and
// every character outside printable ASCII (and <, >, &) written as a hex
// escape, so that nothing in it can end the string or the style element.
func cssString(s string) string {
	var b strings.Builder
	b.WriteByte('"')
	for _, r := range clean(s) {
		if r < 0x20 || r > 0x7e || r == '"' || r == '\\' || r == '<' || r == '>' || r == '&' {
			fmt.Fprintf(&b, "\\%x ", r)
			continue
		}
		b.WriteRune(r)
	}
	b.WriteByte('"')
	return b.String()
}

// esc escapes text for HTML element content and attribute values. Invalid
// UTF-8 and control characters other than tab, newline and carriage
// return (which no HTML or XML parser accepts as text) become U+FFFD.
func esc(s string) string { return html.EscapeString(clean(s)) }

// clean replaces invalid UTF-8 and control characters with U+FFFD.
func clean(s string) string {
	s = strings.ToValidUTF8(s, "\uFFFD")
	return strings.Map(func(r rune) rune {
		if r < 0x20 && r != '\t' && r != '\n' && r != '\r' || r >= 0x7f && r < 0xa0 || r == 0xFFFE || r == 0xFFFF {
			return '\uFFFD'
		}
		return r
	}, s)
}

// addFigures puts the figures of the HTML calculation package into d.
func addFigures(d *doc, r *calc.Result, o Options) error {
	c := conv{o.sys}
	for i := range d.sections {
		s := &d.sections[i]
		switch s.heading {
		case headGround:
			g, err := groundFigure(r, c)
			if err != nil {
				return err
			}
			if g.svg != "" {
				caption := "Ground profile drawn to scale (depths and pile width at the same scale; the width of the ground column is arbitrary; the fill shows drainage, not soil type)."
				if hasSoil(r) {
					caption = "Ground profile drawn to scale (depths and pile width at the same scale; the width of the ground column is arbitrary; the shading shows drainage, the pattern the soil the log names)."
				}
				s.blocks = append(s.blocks, figBlock(g, caption))
			}
		case headCompared:
			g, err := compareFigure(r, c)
			if err != nil {
				return err
			}
			if g.svg != "" {
				s.blocks = append(s.blocks, figBlock(g, "Shaft and tip resistance of the same pile by each applicable method; the file's choice dark and marked *."))
			}
		case headStress:
			if len(r.Stresses) >= 2 {
				g, err := stressSVG(r, c)
				if err != nil {
					return err
				}
				s.blocks = append(s.blocks, figBlock(g, "Total stress, pore pressure and effective vertical stress with depth."))
			}
		case headWithDepth:
			if len(r.WithDepth) >= 2 {
				g, err := capacitySVG(r, c)
				if err != nil {
					return err
				}
				s.blocks = append(s.blocks, figBlock(g, "Characteristic compression and tension resistance and design compression resistance against tip depth."))
			}
		}
		if err := settleFigures(s, r, c); err != nil {
			return err
		}
		if err := reliabilityFigures(s, r, c); err != nil {
			return err
		}
		if err := groupFigures(s, r, c); err != nil {
			return err
		}
		if err := candidatesFigures(s, r, c); err != nil {
			return err
		}
		if err := downdragFigures(s, r, c); err != nil {
			return err
		}
		if err := insituFigures(s, r, c); err != nil {
			return err
		}
	}
	return nil
}

func writeHTML(b *bufio.Writer, r *calc.Result, o Options) error {
	d := build(r, o)
	if err := addFigures(d, r, o); err != nil {
		return err
	}
	b.WriteString("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\"/>\n<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n<title>")
	b.WriteString(esc(d.title))
	b.WriteString("</title>\n<style>")
	b.WriteString(css)
	b.WriteString(printCSS(r, o, d.title))
	b.WriteString("</style>\n</head>\n<body>\n")
	for i, s := range d.sections {
		if i == 0 && s.heading == "" {
			b.WriteString("<header class=\"titleblock\">\n<h1>")
			b.WriteString(esc(d.title))
			b.WriteString("</h1>\n")
			for _, bl := range s.blocks {
				htmlBlock(b, bl, "")
			}
			b.WriteString("</header>\n<main>\n")
			continue
		}
		if i == 0 {
			b.WriteString("<main>\n")
		}
		b.WriteString("<section>\n<h2>")
		b.WriteString(esc(s.heading))
		b.WriteString("</h2>\n")
		for _, bl := range s.blocks {
			htmlBlock(b, bl, s.heading)
		}
		b.WriteString("</section>\n")
	}
	if len(d.sections) == 0 {
		b.WriteString("<main>\n")
	}
	b.WriteString("</main>\n<footer><p>Written by qult ")
	b.WriteString(esc(r.Version))
	b.WriteString(".</p></footer>\n</body>\n</html>\n")
	return nil
}

func htmlCell(b *bufio.Writer, c cell) {
	v := c.str(sig)
	switch {
	case c.num || v == "-":
		b.WriteString("<td class=\"n\">")
	case v == "FAIL":
		b.WriteString("<td class=\"fail\">")
	default:
		b.WriteString("<td>")
	}
	b.WriteString(esc(v))
	b.WriteString("</td>")
}

func htmlBlock(b *bufio.Writer, bl block, heading string) {
	switch {
	case bl.para != "":
		b.WriteString("<p>")
		b.WriteString(esc(bl.para))
		b.WriteString("</p>\n")
	case len(bl.items) > 0:
		b.WriteString("<table class=\"kv\">\n")
		withUnits := hasUnits(bl.items)
		for _, it := range bl.items {
			b.WriteString("<tr><th>")
			b.WriteString(esc(it.label))
			b.WriteString("</th>")
			htmlCell(b, it.val)
			if withUnits {
				b.WriteString("<td>")
				b.WriteString(esc(it.unit))
				b.WriteString("</td>")
			}
			b.WriteString("</tr>\n")
		}
		b.WriteString("</table>\n")
	case bl.tbl != nil:
		for pi, cols := range htmlParts(bl.tbl) {
			if pi > 0 {
				b.WriteString("<p class=\"cont\">(continued)</p>\n")
			}
			b.WriteString("<table>\n<thead><tr>")
			for _, j := range cols {
				b.WriteString("<th>")
				b.WriteString(esc(bl.tbl.cols[j].header()))
				b.WriteString("</th>")
			}
			b.WriteString("</tr></thead>\n<tbody>\n")
			for _, row := range bl.tbl.rows {
				b.WriteString("<tr>")
				for _, j := range cols {
					htmlCell(b, row[j])
				}
				b.WriteString("</tr>\n")
			}
			b.WriteString("</tbody>\n</table>\n")
		}
	case len(bl.eqs) > 0:
		for _, e := range bl.eqs {
			b.WriteString("<p class=\"eq\">")
			b.WriteString(esc(e))
			b.WriteString("</p>\n")
		}
	case len(bl.list) > 0:
		tag, class := "ul", ""
		switch heading {
		case "Sources cited":
			tag = "ol"
		case "Warnings":
			class = " class=\"warn\""
		case "Cautions":
			class = " class=\"caution\""
		}
		b.WriteString("<" + tag + class + ">\n")
		for _, l := range bl.list {
			b.WriteString("<li>")
			b.WriteString(esc(l))
			b.WriteString("</li>\n")
		}
		b.WriteString("</" + tag + ">\n")
	case bl.svg != "":
		b.WriteString("<figure>\n")
		b.WriteString(bl.svg)
		b.WriteString("\n<figcaption>")
		b.WriteString(esc(bl.fig))
		b.WriteString("</figcaption>\n</figure>\n")
	case bl.pre != "":
		b.WriteString("<pre>")
		b.WriteString(esc(strings.TrimRight(bl.pre, "\n")))
		b.WriteString("</pre>\n")
	}
}

// htmlBudget is the width, in characters of the table font, a table may
// take before it is split: the text of an A4 page (182 mm) holds about 100
// characters of it, and each cell's padding and border take about two.
const htmlBudget = 96

// htmlParts splits a table too wide for the page into parts of whole
// columns that repeat its key columns, as Text does: a column takes its
// longest number or header word (headers and text wrap), text cells at
// most 24 characters before they wrap.
func htmlParts(t *table) [][]int {
	n := len(t.cols)
	w := make([]int, n)
	for j, c := range t.cols {
		for _, word := range strings.Fields(c.header()) {
			w[j] = max(w[j], width(word))
		}
	}
	for _, row := range t.rows {
		for j, c := range row {
			v := width(c.str(sig))
			if !c.num {
				v = min(v, 24)
			}
			w[j] = max(w[j], v)
		}
	}
	all := make([]int, n)
	total := 0
	for j := range all {
		all[j] = j
		total += w[j] + 2
	}
	if total <= htmlBudget || n < 2 {
		return [][]int{all}
	}
	key := min(max(1, t.key), n-1)
	keyW := 0
	var keys []int
	for j := range key {
		keys = append(keys, j)
		keyW += w[j] + 2
	}
	var parts [][]int
	cur := append([]int(nil), keys...)
	used := keyW
	for j := key; j < n; j++ {
		if len(cur) > key && used+w[j]+2 > htmlBudget {
			parts = append(parts, cur)
			cur = append([]int(nil), keys...)
			used = keyW
		}
		cur = append(cur, j)
		used += w[j] + 2
	}
	return append(parts, cur)
}

// hasUnits reports whether any item has a unit.
func hasUnits(items []item) bool {
	for _, it := range items {
		if it.unit != "" {
			return true
		}
	}
	return false
}
