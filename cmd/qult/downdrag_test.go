package main

// Sources: the example's scenario is our own (invented numbers); the
// goldens record the output for review, not published values.

import (
	"os"
	"strings"
	"testing"
)

func readExample(t *testing.T, name string) string {
	t.Helper()
	data, err := os.ReadFile(examplePath(name))
	if err != nil {
		t.Fatal(err)
	}
	return string(data)
}

// TestGoldenDowndrag: check and report on the downdrag example, in text
// and JSON; the check passes (exit 0) and its text shows the neutral plane.
func TestGoldenDowndrag(t *testing.T) {
	for _, c := range []struct{ verb, format, name string }{
		{"check", "text", "downdrag/check.txt"},
		{"report", "md", "downdrag/report.md"},
		{"check", "json", "downdrag/result.json"},
	} {
		r := runQ(t, slow, "", c.verb, "--format", c.format, examplePath("quay-shed-downdrag"))
		if r.code != 0 {
			t.Fatalf("%s %s: exit %d, want 0; stderr:\n%s", c.verb, c.format, r.code, r.stderr)
		}
		if c.format == "text" && !strings.Contains(r.stdout, "Neutral plane (depth)") {
			t.Errorf("check text has no neutral plane")
		}
		golden(t, c.name, []byte(r.stdout))
	}
	// The same pile 30 m long passes the ordinary check but fails the
	// downdrag check: exit 1.
	src := strings.Replace(readExample(t, "quay-shed-downdrag"), "  length: 34 m", "  length: 30 m", 1)
	if r := runQ(t, slow, src, "check", "-"); r.code != 1 {
		t.Errorf("30 m pile: exit %d, want 1 (the downdrag check fails)", r.code)
	}
}
