package main

// Sources: none; the calc files are the invented scenarios of examples/.
// The goldens hold the command's own output and check only that it stays
// the same; the records' values are checked against the JSON result in
// package report.

import (
	"encoding/json"
	"strings"
	"testing"
)

// TestGoldenRecords: the records formats of every example, in the file's
// units and the other system; every calc verb writes the same records
// (all the tables), and the cautions are in both forms.
func TestGoldenRecords(t *testing.T) {
	for _, ex := range examples {
		for _, c := range []struct{ format, ext string }{{"records", "json"}, {"records-csv", "csv"}} {
			r := runQ(t, slow, "", "capacity", "--format", c.format, examplePath(ex))
			if r.code != 0 {
				t.Fatalf("%s %s: exit %d\n%s", ex, c.format, r.code, r.stderr)
			}
			golden(t, "records/"+ex+"."+c.ext, []byte(r.stdout))
			for _, verb := range []string{"check", "length", "report"} {
				if o := runQ(t, slow, "", verb, "--format", c.format, examplePath(ex)); o.stdout != r.stdout {
					t.Errorf("%s %s --format %s differs from capacity's", verb, ex, c.format)
				}
			}
			if c.format == "records" {
				var doc struct{ Cautions []string }
				if err := json.Unmarshal([]byte(r.stdout), &doc); err != nil || len(doc.Cautions) == 0 {
					t.Errorf("%s: records without cautions (%v)", ex, err)
				}
			} else if !strings.Contains(r.stdout, "\n# For qualified engineers only") {
				t.Errorf("%s: records-csv without the cautions line", ex)
			}
		}
	}
	r := runQ(t, slow, "", "capacity", "--format", "records-csv", "--units", "US", examplePath("pump-station-bored"))
	if r.code != 0 {
		t.Fatalf("exit %d\n%s", r.code, r.stderr)
	}
	golden(t, "records/pump-station-bored-us.csv", []byte(r.stdout))
}
