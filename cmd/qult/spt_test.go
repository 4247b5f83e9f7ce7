// Sources: the malformed calc files and SPT records under testdata/bad
// (600 to 609) are our own; the messages are the ones calc documents.

package main

import (
	"path/filepath"
	"strings"
	"testing"
)

// TestSPTBadMessages runs the bad SPT files that name a records file from
// their folder (standard input cannot read it, so TestBadInput checks only
// the key there) and checks the whole message.
func TestSPTBadMessages(t *testing.T) {
	cases := []struct{ file, want string }{
		{"600-spt-missing-file", "ground.spt.file (line 17): stat"},
		{"603-spt-wrong-hole", `ground.spt.hole (line 17): "BH-Z" is not a borehole of 603-spt.csv (BH-A, BH-B)`},
		{"604-spt-which-hole", "ground.spt.hole (line 17): 603-spt.csv holds the tests of 2 boreholes (BH-A, BH-B): name one"},
		{"605-spt-below-ground", "ground.spt.file (line 17): 605-spt.csv: the test at 24 m lies below the ground model (0 to 20 m)"},
		{"606-spt-energy-ratio-not-recorded", "ground.spt.energy_ratio (line 17)"},
		{"607-spt-record-energy-out-of-range", "ground.spt.file (line 17): 607-spt.csv:3: energy_ratio_pct"},
	}
	for _, c := range cases {
		r := runQ(t, badTimeout, "", "capacity", filepath.Join("testdata", "bad", c.file+".yaml"))
		if r.code != 2 || !strings.Contains(r.stderr, c.want) {
			t.Errorf("%s: exit %d, stderr %q; want 2 and %q", c.file, r.code, r.stderr, c.want)
		}
	}
}

// TestSPTExample: the shipped example names its borehole's records beside
// it, read relative to the calc file's folder; its report, Markdown and
// JSON are kept as goldens, and the PDF's structure.
func TestSPTExample(t *testing.T) {
	path := filepath.Join("..", "..", "examples", "spt-borehole", "pump-station-spt.yaml")
	for _, c := range []struct{ golden, verb, format string }{
		{"spt/report.txt", "report", "text"},
		{"spt/report.md", "report", "md"},
		{"spt/capacity.json", "capacity", "json"},
	} {
		r := runQ(t, badTimeout, "", c.verb, "--format", c.format, path)
		if r.code != 0 || !strings.Contains(r.stdout, "BH-R2") {
			t.Fatalf("%s: exit %d, stderr %q, output lacks the borehole", c.golden, r.code, r.stderr)
		}
		golden(t, c.golden, []byte(r.stdout))
	}
	// The PDF's structure (pages, images, the text of each page), with the
	// SPT plot's caption.
	r := runQ(t, slow, "", "report", "--format", "pdf", path)
	if r.code != 0 {
		t.Fatalf("pdf: exit %d, stderr %q", r.code, r.stderr)
	}
	_, s := pdfStructure(t, []byte(r.stdout))
	if !strings.Contains(s, "Standard penetration tests with depth") {
		t.Error("the PDF lacks the SPT plot")
	}
	golden(t, "spt/report.pdftext", []byte(s))
}
