package main

// Sources: the example's scenario is our own (invented numbers); the
// goldens record the output for review, not published values.

import (
	"strings"
	"testing"
)

// TestGoldenGroupRaft: check and report on the group example whose
// settlement is Tomlinson & Woodward's equivalent raft, in text, Markdown
// and JSON; the check passes (exit 0) and names the raft's method.
func TestGoldenGroupRaft(t *testing.T) {
	for _, c := range []struct{ verb, format, name string }{
		{"check", "text", "group/check.txt"},
		{"report", "md", "group/report.md"},
		{"check", "json", "group/result.json"},
	} {
		r := runQ(t, slow, "", c.verb, "--format", c.format, examplePath("grain-silo-group"))
		if r.code != 0 {
			t.Fatalf("%s %s: exit %d, want 0; stderr:\n%s", c.verb, c.format, r.code, r.stderr)
		}
		if c.format == "text" && !strings.Contains(r.stdout, "Equivalent raft (Tomlinson & Woodward)") {
			t.Errorf("check text does not name the raft's method")
		}
		golden(t, c.name, []byte(r.stdout))
	}
	// A depth factor above 1 is bad input: exit 2, naming the key.
	src := strings.Replace(readExample(t, "grain-silo-group"), "raft_depth_factor: 0.85", "raft_depth_factor: 1.4", 1)
	if r := runQ(t, slow, src, "check", "-"); r.code != 2 || !strings.Contains(r.stderr, "group.raft_depth_factor") {
		t.Errorf("μd = 1.4: exit %d, stderr %q; want 2 naming group.raft_depth_factor", r.code, r.stderr)
	}
}
