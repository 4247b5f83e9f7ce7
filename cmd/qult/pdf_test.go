package main

// Sources: none needed. The PDF is read here with a small reader of our
// own, independent of the writer: PDF 1.7 (ISO 32000-1:2008) §7.3.4.2
// literal strings, §7.3.8 Flate streams, §7.7.3.3 pages and MediaBox;
// fpdf writes the text of a Unicode font as UTF-16BE.

import (
	"bytes"
	"compress/zlib"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"unicode/utf16"
)

var (
	pdfPageRe   = regexp.MustCompile(`/Type /Page\b[^s]`)
	pdfBoxRe    = regexp.MustCompile(`/MediaBox \[0 0 ([0-9.]+) ([0-9.]+)\]`)
	pdfStreamRe = regexp.MustCompile(`(?s)<<([^>]*)>>\s*stream\r?\n`)
)

// pdfStructure describes a PDF as text: its page count, page size and the
// text shown on each page, in order. It fails the test when data is not a
// PDF.
func pdfStructure(t *testing.T, data []byte) (pages int, out string) {
	t.Helper()
	if !bytes.HasPrefix(data, []byte("%PDF-1.")) || !bytes.Contains(data[max(0, len(data)-64):], []byte("%%EOF")) {
		t.Fatalf("not a PDF: starts %q", data[:min(len(data), 16)])
	}
	var b strings.Builder
	pages = len(pdfPageRe.FindAll(data, -1))
	fmt.Fprintf(&b, "pages: %d\n", pages)
	sizes := map[string]bool{}
	for _, m := range pdfBoxRe.FindAllSubmatch(data, -1) {
		sizes[string(m[1])+" x "+string(m[2])+" pt"] = true
	}
	for s := range sizes {
		fmt.Fprintf(&b, "page size: %s\n", s)
	}
	fmt.Fprintf(&b, "images: %d\n", bytes.Count(data, []byte("/Subtype /Image")))
	n := 0
	for _, loc := range pdfStreamRe.FindAllSubmatchIndex(data, -1) {
		dict := string(data[loc[2]:loc[3]])
		end := bytes.Index(data[loc[1]:], []byte("endstream"))
		if end < 0 {
			t.Fatal("a stream without endstream")
		}
		raw := data[loc[1] : loc[1]+end]
		if strings.Contains(dict, "/FlateDecode") {
			zr, err := zlib.NewReader(bytes.NewReader(raw))
			if err != nil {
				continue
			}
			if raw, _ = io.ReadAll(zr); len(raw) == 0 {
				continue
			}
		}
		if !bytes.Contains(raw, []byte("BT ")) || !bytes.Contains(raw, []byte(" Tj")) {
			continue
		}
		n++
		fmt.Fprintf(&b, "--- page %d ---\n", n)
		for i := 0; i < len(raw); i++ {
			if raw[i] != '(' {
				continue
			}
			var lit []byte
			j := i + 1
			for ; j < len(raw) && raw[j] != ')'; j++ {
				if raw[j] == '\\' && j+1 < len(raw) {
					j++
					switch raw[j] {
					case 'n':
						lit = append(lit, '\n')
					case 'r':
						lit = append(lit, '\r')
					default:
						lit = append(lit, raw[j])
					}
					continue
				}
				lit = append(lit, raw[j])
			}
			if bytes.HasPrefix(bytes.TrimLeft(raw[j+1:], " "), []byte("Tj")) && len(lit)%2 == 0 {
				u := make([]uint16, len(lit)/2)
				for k := range u {
					u[k] = uint16(lit[2*k])<<8 | uint16(lit[2*k+1])
				}
				b.WriteString(string(utf16.Decode(u)) + "\n")
			}
			i = j
		}
	}
	if n != pages {
		t.Errorf("%d pages but %d content streams with text", pages, n)
	}
	return pages, b.String()
}

// TestGoldenPDF runs every calc verb with --format pdf on every example
// and keeps the structure of the PDF (pages, size, images, the text of
// each page) as a golden file.
func TestGoldenPDF(t *testing.T) {
	for _, verb := range []string{"check", "capacity", "length", "report", "settle"} {
		exs := examples
		if verb == "settle" {
			exs = []string{"warehouse-driven-settle"}
		}
		for _, ex := range exs {
			t.Run(verb+"/"+ex, func(t *testing.T) {
				r := runQ(t, slow, "", verb, "--format", "pdf", examplePath(ex))
				if r.code != 0 {
					t.Fatalf("exit %d; stderr:\n%s", r.code, r.stderr)
				}
				pages, s := pdfStructure(t, []byte(r.stdout))
				if pages < 1 {
					t.Fatal("no pages")
				}
				for i := 1; i <= pages; i++ {
					if !strings.Contains(s, fmt.Sprintf("page %d of %d", i, pages)) {
						t.Errorf("no footer 'page %d of %d'", i, pages)
					}
				}
				if !strings.Contains(s, "Cautions") || !strings.Contains(s, "they prevail") {
					t.Error("no cautions")
				}
				golden(t, "pdf/"+verb+"/"+ex+".pdftext", []byte(s))
			})
		}
	}
}

// TestOutputPDF: -o x.pdf writes a PDF (never text under a .pdf name);
// --paper chooses the page size.
func TestOutputPDF(t *testing.T) {
	dir := t.TempDir()
	out := filepath.Join(dir, "pump.pdf")
	r := runQ(t, slow, "", "report", "-o", out, examplePath("pump-station-bored"))
	if r.code != 0 || r.stdout != "" {
		t.Fatalf("report -o x.pdf: exit %d, stdout %q, stderr %s", r.code, r.stdout, r.stderr)
	}
	data, err := os.ReadFile(out)
	if err != nil {
		t.Fatal(err)
	}
	if _, s := pdfStructure(t, data); !strings.Contains(s, "page size: 595.28 x 841.89 pt") {
		t.Errorf("report -o x.pdf of an SI file: not A4:\n%.200s", s)
	}
	// Other extensions choose their formats too.
	for ext, want := range map[string]string{".json": `"schema": "qult.result/1"`, ".csv": "# For qualified engineers", ".md": "# Pump station"} {
		out := filepath.Join(dir, "pump"+ext)
		if r := runQ(t, slow, "", "check", "-o", out, examplePath("pump-station-bored")); r.code != 0 {
			t.Fatalf("check -o x%s: exit %d, %s", ext, r.code, r.stderr)
		}
		data, err := os.ReadFile(out)
		if err != nil || !strings.Contains(string(data), want) {
			t.Errorf("check -o x%s: output lacks %q", ext, want)
		}
	}
	r = runQ(t, slow, "", "check", "--format", "pdf", "--paper", "letter", examplePath("pump-station-bored"))
	if _, s := pdfStructure(t, []byte(r.stdout)); r.code != 0 || !strings.Contains(s, "page size: 612.00 x 792.00 pt") {
		t.Errorf("--paper letter: exit %d, not Letter", r.code)
	}
	r = runQ(t, slow, "", "check", "--format", "pdf", "--paper", "a3", examplePath("pump-station-bored"))
	if r.code != 2 || !strings.Contains(r.stderr, "--paper") {
		t.Errorf("--paper a3: exit %d, stderr %q", r.code, r.stderr)
	}
}
