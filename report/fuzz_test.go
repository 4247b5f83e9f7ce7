package report

import (
	"bytes"
	"strings"
	"testing"
	"unicode/utf8"
)

// FuzzText feeds arbitrary text into every place a calc file's text
// reaches a report (title, project, layer names, the file as entered) and
// checks that the HTML stays well-formed with the text escaped, that
// Markdown carries no raw markup, and that no writer fails (the PDF
// writer included: text outside the fonts' range). The seed
// corpus is hostile markup, invalid UTF-8 and control characters (inputs
// of our own; no numbers are checked here).
func FuzzText(f *testing.F) {
	for _, s := range []string{"", hostile, "a & b", "]]><!--", "\x00\x01\x7f", "\xff\xfe", "| # * _ ` [x](y)", "</pre></svg></section>", "&amp;&#0;", "pile 😀 \U0010FFFF \uFFFF ﬁ", "(\\) \\( )"} {
		f.Add(s)
	}
	base := load(f, example, nil)
	f.Fuzz(func(t *testing.T, s string) {
		r := *base
		r.Title, r.Project, r.Engineer = s, s, s
		r.Source = []byte(s)
		r.Layers = append(r.Layers[:0:0], base.Layers...)
		r.Layers[0].Name = s
		r.Breakdown.Rows = append(r.Breakdown.Rows[:0:0], base.Breakdown.Rows...)
		r.Breakdown.Rows[0].LayerName = s
		r.Warnings = []string{s}
		// The report view holds every place the text reaches (title block,
		// inputs as entered, tables, the drawing, warnings).
		var b bytes.Buffer
		if err := Write(&b, &r, HTML, Options{View: ViewReport}); err != nil {
			t.Fatal(err)
		}
		h := b.String()
		if err := balanced(h); err != nil {
			t.Fatal(err)
		}
		if strings.Contains(h, "<script") {
			t.Fatal("raw <script")
		}
		if !utf8.ValidString(h) {
			t.Fatal("invalid UTF-8")
		}
		for _, f := range []Format{Text, Markdown, CSV, JSON, PDF} {
			b.Reset()
			if err := Write(&b, &r, f, Options{View: ViewReport}); err != nil {
				t.Fatalf("%v: %v", f, err)
			}
			if f == Markdown && strings.ContainsAny(b.String(), "<>") {
				t.Fatal("Markdown: raw < or >")
			}
		}
	})
}
