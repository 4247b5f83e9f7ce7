package main

// Sources: none needed; the cautions are our own text (calc.CautionText,
// calc.CautionLine). The test checks that every output an engineer may
// act on carries them.

import (
	"encoding/json"
	"html"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/qultgeo/qult/calc"
)

// squash joins every run of white space into one space, so that text
// wrapped to the page width still matches.
func squash(s string) string { return strings.Join(strings.Fields(s), " ") }

// TestCautionsEveryOutput: every verb and format carries the cautions:
// the full text in the calc verbs' reports (text, Markdown, HTML, PDF) and
// in every JSON, one short line in CSV and in the tools' tables; each says
// that the governing code and licensed practice prevail.
func TestCautionsEveryOutput(t *testing.T) {
	ex := examplePath("pump-station-bored")
	type run struct {
		args []string
		kind string // full, line, json, jsonl, pdf
	}
	var runs []run
	for _, verb := range []string{"check", "capacity", "length", "report", "settle"} {
		file := ex
		if verb == "settle" {
			file = examplePath("warehouse-driven-settle")
		}
		for _, f := range []string{"text", "md", "html"} {
			runs = append(runs, run{[]string{verb, "--format", f, file}, "full"})
		}
		runs = append(runs, run{[]string{verb, "--format", "csv", file}, "line"},
			run{[]string{verb, "--format", "json", file}, "json"},
			run{[]string{verb, "--format", "pdf", file}, "pdf"})
	}
	for _, f := range []string{"text", "md", "csv"} {
		runs = append(runs, run{[]string{"phase", "--gs", "2.7", "--e", "0.6", "--s", "1", "--format", f}, "line"},
			run{[]string{"factors", "--phi", "34", "--q", "180", "--l", "20", "--d", "0.6", "--format", f}, "line"})
	}
	runs = append(runs, run{[]string{"phase", "--gs", "2.7", "--e", "0.6", "--s", "1", "--format", "json"}, "json"},
		run{[]string{"factors", "--phi", "34", "--q", "180", "--format", "json"}, "json"})
	full := calc.CautionText()
	if !strings.Contains(strings.Join(full, " "), "licensed practice") || !strings.Contains(calc.CautionLine, "licensed practice prevail") {
		t.Fatal("the cautions do not say that the governing code and licensed practice prevail")
	}
	for _, r := range runs {
		t.Run(strings.Join(r.args[:3], " "), func(t *testing.T) {
			o := runQ(t, slow, "", r.args...)
			if o.code != 0 && o.code != 1 {
				t.Fatalf("exit %d: %s", o.code, o.stderr)
			}
			out := o.stdout
			switch r.kind {
			case "full":
				s := squash(html.UnescapeString(out))
				s = strings.NewReplacer(`\.`, ".", `\_`, "_").Replace(s)
				for _, c := range full {
					if !strings.Contains(s, c) {
						t.Errorf("lacks the caution %q", c)
					}
				}
			case "line":
				if !strings.Contains(squash(out), calc.CautionLine) {
					t.Errorf("lacks the caution line")
				}
			case "json":
				var v struct{ Cautions []string }
				if err := json.Unmarshal([]byte(out), &v); err != nil {
					t.Fatal(err)
				}
				if strings.Join(v.Cautions, "\n") != strings.Join(full, "\n") {
					t.Errorf("cautions %q", v.Cautions)
				}
			case "pdf":
				_, s := pdfStructure(t, []byte(out))
				s = squash(s)
				for _, c := range full {
					// A sentence may break across lines of the page: check
					// its words in order.
					if !strings.Contains(s, c[:40]) {
						t.Errorf("lacks the caution %q", c)
					}
				}
				if !strings.Contains(s, calc.CautionLine) {
					t.Error("lacks the caution line in the footer")
				}
			}
		})
	}
	// batch: every answer line (its golden output) carries them.
	data, err := os.ReadFile(filepath.Join("testdata", "golden", "batch", "examples.jsonl"))
	if err != nil {
		t.Fatal(err)
	}
	for i, line := range strings.Split(strings.TrimSpace(string(data)), "\n") {
		var v struct {
			Cautions []string
			Error    string
		}
		if err := json.Unmarshal([]byte(line), &v); err != nil {
			t.Fatal(err)
		}
		if v.Error == "" && strings.Join(v.Cautions, "\n") != strings.Join(full, "\n") {
			t.Errorf("batch line %d: cautions %q", i+1, v.Cautions)
		}
	}
}
