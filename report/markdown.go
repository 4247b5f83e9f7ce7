package report

import (
	"bufio"
	"strings"
)

// mdEscaper escapes text from the calc file (and our own) for Markdown:
// HTML-significant characters as entities, Markdown punctuation with a
// backslash, so that no input can open a tag, a link or a table cell.
var mdEscaper = strings.NewReplacer(
	"&", "&amp;", "<", "&lt;", ">", "&gt;",
	`\`, `\\`, "`", "\\`", "*", `\*`, "_", `\_`, "[", `\[`, "]", `\]`, "|", `\|`, "#", `\#`,
	"\n", " ", "\r", " ",
)

func mdEsc(s string) string { return mdEscaper.Replace(clean(s)) }

func writeMarkdown(b *bufio.Writer, d *doc) error {
	b.WriteString("# ")
	b.WriteString(mdEsc(d.title))
	b.WriteString("\n")
	for _, s := range d.sections {
		if s.heading != "" {
			b.WriteString("\n## ")
			b.WriteString(mdEsc(s.heading))
			b.WriteString("\n")
		}
		for _, bl := range s.blocks {
			b.WriteString("\n")
			mdBlock(b, bl)
		}
	}
	return nil
}

func mdRow(b *bufio.Writer, vals []string) {
	b.WriteString("|")
	for _, v := range vals {
		b.WriteString(" ")
		b.WriteString(v)
		b.WriteString(" |")
	}
	b.WriteString("\n")
}

func mdBlock(b *bufio.Writer, bl block) {
	switch {
	case bl.pre != "" && strings.ContainsAny(bl.pre, "<>"):
		// Markdown output never holds a raw < or > (some viewers read HTML
		// even inside code), so such a file is not copied here.
		b.WriteString("The calc file holds angle brackets, which some Markdown viewers read as markup; the text, HTML and PDF reports carry it verbatim.\n")
	case bl.pre != "":
		// A fenced block longer than any run of backticks in the text, so
		// that nothing in it can close the fence.
		fence := "```"
		for strings.Contains(bl.pre, fence) {
			fence += "`"
		}
		b.WriteString(fence + "yaml\n")
		b.WriteString(strings.TrimRight(clean(bl.pre), "\n"))
		b.WriteString("\n" + fence + "\n")
	case bl.para != "":
		b.WriteString(mdEsc(bl.para))
		b.WriteString("\n")
	case len(bl.items) > 0:
		if !hasUnits(bl.items) {
			mdRow(b, []string{"Item", "Value"})
			b.WriteString("|---|---|\n")
			for _, it := range bl.items {
				mdRow(b, []string{mdEsc(it.label), mdEsc(it.val.str(sig))})
			}
			break
		}
		mdRow(b, []string{"Item", "Value", "Unit"})
		b.WriteString("|---|--:|---|\n")
		for _, it := range bl.items {
			mdRow(b, []string{mdEsc(it.label), mdEsc(it.val.str(sig)), mdEsc(it.unit)})
		}
	case bl.tbl != nil:
		t := bl.tbl
		h := make([]string, len(t.cols))
		al := make([]string, len(t.cols))
		for j, c := range t.cols {
			h[j] = mdEsc(c.header())
			al[j] = "--:"
			for _, r := range t.rows {
				if !r[j].num && r[j].s != "-" {
					al[j] = "---"
					break
				}
			}
		}
		mdRow(b, h)
		mdRow(b, al)
		for _, r := range t.rows {
			v := make([]string, len(r))
			for j, c := range r {
				v[j] = mdEsc(c.str(sig))
			}
			mdRow(b, v)
		}
	case len(bl.eqs) > 0:
		for _, e := range bl.eqs {
			b.WriteString("- ")
			b.WriteString(mdEsc(e))
			b.WriteString("\n")
		}
	case len(bl.list) > 0:
		for _, l := range bl.list {
			b.WriteString("- ")
			b.WriteString(mdEsc(l))
			b.WriteString("\n")
		}
	}
}
