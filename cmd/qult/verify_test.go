package main

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"
)

// TestVerifyGolden: the verification record's text output, and its exit
// code 0 when every case passes.
func TestVerifyGolden(t *testing.T) {
	o := runQ(t, 2*time.Minute, "", "verify")
	if o.code != exitOK {
		t.Fatalf("exit %d, stderr:\n%s", o.code, o.stdout+o.stderr)
	}
	golden(t, "verify.txt", []byte(o.stdout))
	if !strings.Contains(o.stdout, "summary: ") || !strings.Contains(o.stdout, "qualified") {
		t.Error("no summary or cautions")
	}
}

// TestVerifyFormats: each format runs; JSON parses with at least 100
// cases, all passing and each with a source.
func TestVerifyFormats(t *testing.T) {
	for _, f := range []string{"md", "json", "html", "JSON"} {
		o := runQ(t, 2*time.Minute, "", "verify", "--format", f)
		if o.code != exitOK || o.stdout == "" {
			t.Fatalf("--format %s: exit %d, stderr %s", f, o.code, o.stderr)
		}
		if strings.EqualFold(f, "json") {
			var j struct {
				Cases, Passed, Failed int
				Outcomes              []struct {
					ID     string
					Pass   bool
					Source struct{ Author, Year, Title string }
					Where  string
					Status string
				}
			}
			if err := json.Unmarshal([]byte(o.stdout), &j); err != nil {
				t.Fatal(err)
			}
			if j.Cases < 100 || j.Failed != 0 || len(j.Outcomes) != j.Cases {
				t.Errorf("json: %d cases, %d failed, %d outcomes", j.Cases, j.Failed, len(j.Outcomes))
			}
			for _, c := range j.Outcomes {
				if !c.Pass || c.Source.Author == "" || c.Where == "" || (c.Status != "read" && c.Status != "from memory") {
					t.Errorf("%s: pass %v, source %+v, where %q, status %q", c.ID, c.Pass, c.Source, c.Where, c.Status)
				}
			}
		}
	}
}

// TestVerifyOutputFile: -o writes the record to a file and nothing to
// standard output.
func TestVerifyOutputFile(t *testing.T) {
	out := filepath.Join(t.TempDir(), "record.html")
	o := runQ(t, 2*time.Minute, "", "verify", "--format", "html", "-o", out)
	if o.code != exitOK || o.stdout != "" {
		t.Fatalf("exit %d, stdout %q, stderr %s", o.code, o.stdout, o.stderr)
	}
	b, err := os.ReadFile(out)
	if err != nil || !strings.Contains(string(b), "<table>") {
		t.Errorf("output file: %v, %d bytes", err, len(b))
	}
}

// TestVerifyUsage: bad flags and a file argument are usage errors (exit
// 2); help names the verb.
func TestVerifyUsage(t *testing.T) {
	for _, args := range [][]string{
		{"verify", "--format", "pdf"},
		{"verify", "examples/pump-station-bored.yaml"},
		{"verify", "--nonsense"},
	} {
		o := runQ(t, time.Minute, "", args...)
		if o.code != exitUsage || !strings.Contains(o.stderr, "verify") {
			t.Errorf("%v: exit %d, stderr %q; want 2 naming the verb", args, o.code, o.stderr)
		}
	}
}

// TestVerifyHelp: the verb is listed and its help is registered (the
// registration in verify.go relies on flags.go's init running first).
func TestVerifyHelp(t *testing.T) {
	o := runQ(t, time.Minute, "", "help", "verify")
	if o.code != exitOK || !strings.Contains(o.stdout, "usage: qult verify") || !strings.Contains(o.stdout, "--format") {
		t.Errorf("help verify: exit %d, %q", o.code, o.stdout)
	}
	o = runQ(t, time.Minute, "", "help")
	if !strings.Contains(o.stdout, "verify") {
		t.Errorf("usage does not list verify:\n%s", o.stdout)
	}
}
