package report

// Sources: none needed. These tests read the structure of the PDF the
// writer makes (pages, page size, the text on each page) with a small
// reader kept here, independent of the writer: PDF 1.7 (ISO 32000-1:2008)
// §7.3.4.2 literal strings and their escapes, §7.3.8 streams with
// FlateDecode, §7.7.3.3 page objects and MediaBox; fpdf writes the text of
// a Unicode font as UTF-16BE. Page sizes: A4 is 210 × 297 mm (ISO 216),
// 595.28 × 841.89 pt; US Letter 8.5 × 11 in, 612 × 792 pt (1 in = 72 pt).

import (
	"bytes"
	"compress/zlib"
	"fmt"
	"io"
	"regexp"
	"strings"
	"testing"
	"unicode/utf16"
)

// pdfDoc is what the tests read from a PDF: its page count, media boxes
// and, per content stream, the text shown.
type pdfDoc struct {
	pages    int
	boxes    []string
	contents []string
}

var (
	pageRe   = regexp.MustCompile(`/Type /Page\b[^s]`)
	boxRe    = regexp.MustCompile(`/MediaBox \[0 0 ([0-9.]+) ([0-9.]+)\]`)
	streamRe = regexp.MustCompile(`(?s)<<([^>]*)>>\s*stream\r?\n`)
)

// readPDF splits a PDF into its pages and the text of its content
// streams, inflating Flate streams.
func readPDF(t *testing.T, data []byte) pdfDoc {
	t.Helper()
	if !bytes.HasPrefix(data, []byte("%PDF-1.")) || !bytes.Contains(data[max(0, len(data)-64):], []byte("%%EOF")) {
		t.Fatalf("not a PDF: starts %q", data[:min(len(data), 16)])
	}
	var d pdfDoc
	d.pages = len(pageRe.FindAll(data, -1))
	for _, m := range boxRe.FindAllSubmatch(data, -1) {
		d.boxes = append(d.boxes, string(m[1])+" x "+string(m[2]))
	}
	for _, loc := range streamRe.FindAllSubmatchIndex(data, -1) {
		dict := string(data[loc[2]:loc[3]])
		start := loc[1]
		end := bytes.Index(data[start:], []byte("endstream"))
		if end < 0 {
			t.Fatal("a stream without endstream")
		}
		raw := data[start : start+end]
		if strings.Contains(dict, "/FlateDecode") {
			zr, err := zlib.NewReader(bytes.NewReader(raw))
			if err != nil {
				continue // an image's or font's data: not ours to read
			}
			inflated, err := io.ReadAll(zr)
			if err != nil && len(inflated) == 0 {
				continue
			}
			raw = inflated
		}
		if bytes.Contains(raw, []byte("BT ")) && bytes.Contains(raw, []byte(" Tj")) {
			d.contents = append(d.contents, showText(raw))
		}
	}
	return d
}

// showText returns the strings of a content stream's Tj operators,
// decoded from UTF-16BE, one per line.
func showText(s []byte) string {
	var out strings.Builder
	for i := 0; i < len(s); i++ {
		if s[i] != '(' {
			continue
		}
		var lit []byte
		j := i + 1
		for ; j < len(s) && s[j] != ')'; j++ {
			if s[j] == '\\' && j+1 < len(s) {
				j++
				switch s[j] {
				case 'n':
					lit = append(lit, '\n')
				case 'r':
					lit = append(lit, '\r')
				case 't':
					lit = append(lit, '\t')
				default:
					lit = append(lit, s[j])
				}
				continue
			}
			lit = append(lit, s[j])
		}
		if bytes.HasPrefix(bytes.TrimLeft(s[j+1:], " "), []byte("Tj")) && len(lit)%2 == 0 {
			u := make([]uint16, len(lit)/2)
			for k := range u {
				u[k] = uint16(lit[2*k])<<8 | uint16(lit[2*k+1])
			}
			out.WriteString(string(utf16.Decode(u)))
			out.WriteString("\n")
		}
		i = j
	}
	return out.String()
}

func TestPDFStructure(t *testing.T) {
	r := load(t, example, nil)
	pdf := []byte(render(t, r, PDF, Options{View: ViewReport, Units: SIUnits, Date: "2026-12-02"}))
	d := readPDF(t, pdf)
	if d.pages < 2 {
		t.Fatalf("%d pages, want the package on several", d.pages)
	}
	for _, b := range d.boxes {
		if b != "595.28 x 841.89" {
			t.Errorf("page size %s pt, want A4 595.28 x 841.89", b)
		}
	}
	all := strings.Join(d.contents, "\n")
	hash := SourceHash(r)[:12]
	// Header and footer on every page: one content stream per page, each
	// with its page number, the calc file's hash, the project and revision.
	if len(d.contents) != d.pages {
		t.Fatalf("%d content streams with text for %d pages", len(d.contents), d.pages)
	}
	for i, c := range d.contents {
		for _, want := range []string{fmt.Sprintf("page %d of %d", i+1, d.pages), "calc file SHA-256 " + hash,
			"Project: " + r.Project, "Revision: " + r.Revision, "licensed practice prevail"} {
			if !strings.Contains(c, want) {
				t.Errorf("page %d lacks %q", i+1, want)
			}
		}
	}
	for _, want := range []string{r.Title, "Summary", "Verdict", "Governing case", "Methods compared", "Shaft resistance",
		"Tip resistance", "Design check", "Capacity with depth", "Sources cited", "Cautions", headAppendix,
		"they prevail", "σ′v", "2026-12-02"} {
		if !strings.Contains(all, want) {
			t.Errorf("PDF lacks %q", want)
		}
	}
	// The order a reviewer reads: summary before the ground, the
	// appendix last.
	if i, j, k := strings.Index(all, "Summary"), strings.Index(all, "Ground profile"), strings.Index(all, headAppendix); !(i < j && j < k) {
		t.Errorf("sections out of order: Summary at %d, Ground profile at %d, appendix at %d", i, j, k)
	}
	// Figures are images.
	if n := bytes.Count(pdf, []byte("/Subtype /Image")); n < 2 {
		t.Errorf("%d images, want the figures", n)
	}
	// The same result gives the same bytes.
	if again := render(t, r, PDF, Options{View: ViewReport, Units: SIUnits, Date: "2026-12-02"}); again != string(pdf) {
		t.Error("two renderings of one result differ")
	}
}

func TestPDFPaper(t *testing.T) {
	r := load(t, example, nil)
	for _, c := range []struct {
		o    Options
		want string
	}{
		{Options{View: ViewCheck, Units: SIUnits}, "595.28 x 841.89"},
		{Options{View: ViewCheck, Units: USUnits}, "612.00 x 792.00"},
		{Options{View: ViewCheck, Units: SIUnits, Paper: PaperLetter}, "612.00 x 792.00"},
		{Options{View: ViewCheck, Units: USUnits, Paper: PaperA4}, "595.28 x 841.89"},
	} {
		d := readPDF(t, []byte(render(t, r, PDF, c.o)))
		if d.pages < 1 || len(d.boxes) == 0 {
			t.Fatalf("%+v: %d pages", c.o, d.pages)
		}
		for _, b := range d.boxes {
			if b != c.want {
				t.Errorf("%v units, paper %v: page %s pt, want %s", c.o.Units, c.o.Paper, b, c.want)
			}
		}
		if !strings.Contains(strings.Join(d.contents, ""), "Cautions") {
			t.Errorf("%+v: no cautions", c.o)
		}
	}
	if _, err := ParsePaper("a3"); err == nil {
		t.Error("ParsePaper(a3): no error")
	}
	var b bytes.Buffer
	if err := Write(&b, r, PDF, Options{Paper: Paper(7)}); err == nil {
		t.Error("Write with Paper(7): no error")
	}
}

// TestPDFEveryView: every view is a PDF with pages and the cautions.
func TestPDFEveryView(t *testing.T) {
	r := load(t, example, nil)
	for _, v := range allViews {
		d := readPDF(t, []byte(render(t, r, PDF, Options{View: v})))
		all := strings.Join(d.contents, "\n")
		if d.pages < 1 || !strings.Contains(all, "Cautions") || !strings.Contains(all, "they prevail") {
			t.Errorf("%v: %d pages, cautions present: %v", v, d.pages, strings.Contains(all, "Cautions"))
		}
	}
}

// TestSuPaLabel: the drilled-shaft α prints its strength ratio as su/pa,
// not as ψ (the API α's su/σ′v). The example's clay has su = 45 kPa at the
// bottom of its first α segment and pa = 100 kPa, so su/pa = 0.45.
func TestSuPaLabel(t *testing.T) {
	r := load(t, example, nil)
	txt := render(t, r, Text, Options{View: ViewCapacity, Wide: true})
	if !strings.Contains(txt, "(su/pa = 0.45)") || strings.Contains(txt, "ψ = 0.45") {
		t.Errorf("alpha-drilled's ratio not labelled su/pa:\n%s", txt[strings.Index(txt, "alpha-drilled ("):][:200])
	}
}
