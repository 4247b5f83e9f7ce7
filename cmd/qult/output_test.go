package main

// Sources: none needed; these tests check the command line's handling of
// files and terminals with calc files of our own (invented numbers).

import (
	"fmt"
	"os"
	"path/filepath"
	"runtime/debug"
	"strings"
	"testing"
)

// TestOutputNeverNamesInput: -o naming the input (as given, by another
// spelling, or through a link) is a usage error that leaves the input as
// it was, for every verb that reads a file and for batch.
func TestOutputNeverNamesInput(t *testing.T) {
	src, err := os.ReadFile(examplePath("pump-station-bored"))
	if err != nil {
		t.Fatal(err)
	}
	dir := t.TempDir()
	in := filepath.Join(dir, "pile.yaml")
	if err := os.WriteFile(in, src, 0o644); err != nil {
		t.Fatal(err)
	}
	link := filepath.Join(dir, "alias.yaml")
	if err := os.Symlink(in, link); err != nil {
		t.Fatal(err)
	}
	other := filepath.Join(dir, ".", "sub", "..", "pile.yaml")
	for _, verb := range []string{"check", "capacity", "length", "report", "batch"} {
		for _, out := range []string{in, link, other} {
			r := runQ(t, slow, "", verb, "-o", out, in)
			if r.code != 2 || !strings.Contains(r.stderr, "names the input file") {
				t.Errorf("%s -o %s: exit %d, stderr %q", verb, out, r.code, r.stderr)
			}
			if got, _ := os.ReadFile(in); string(got) != string(src) {
				t.Fatalf("%s -o %s changed the input file", verb, out)
			}
		}
	}
}

// TestOutputAtomic: a failing write leaves no file and no temporary file
// behind, and a successful one replaces the destination whole.
func TestOutputAtomic(t *testing.T) {
	dir := t.TempDir()
	dest := filepath.Join(dir, "out.txt")
	if err := os.WriteFile(dest, []byte("previous report\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	r := runQ(t, slow, "", "capacity", "-o", dest, examplePath("pump-station-bored"))
	if r.code != 0 {
		t.Fatalf("capacity -o: exit %d, %s", r.code, r.stderr)
	}
	got, _ := os.ReadFile(dest)
	if strings.Contains(string(got), "previous report") || !strings.Contains(string(got), "Pump station") {
		t.Errorf("destination not replaced whole: %.80q", got)
	}
	// A folder that does not exist: an error, and nothing written.
	missing := filepath.Join(dir, "no-such-folder", "out.txt")
	r = runQ(t, slow, "", "capacity", "-o", missing, examplePath("pump-station-bored"))
	if r.code != 2 || !strings.Contains(r.stderr, "no-such-folder") {
		t.Errorf("missing folder: exit %d, stderr %q", r.code, r.stderr)
	}
	entries, _ := os.ReadDir(dir)
	for _, e := range entries {
		if strings.HasSuffix(e.Name(), ".tmp") {
			t.Errorf("temporary file left behind: %s", e.Name())
		}
	}
}

// TestTerminalSafe: control characters and bidirectional overrides in
// names reach neither standard output (text, CSV, Markdown) nor the error
// messages.
func TestTerminalSafe(t *testing.T) {
	src, err := os.ReadFile(examplePath("pump-station-bored"))
	if err != nil {
		t.Fatal(err)
	}
	evil := strings.Replace(string(src), "name: dense grey sand", "name: \"dense \\e[2J\\u202Egrey sand\"", 1)
	evil = strings.Replace(evil, "title: Pump station, pile type B", "title: \"Pump \\a\\u2066station\"", 1)
	if evil == string(src) {
		t.Fatal("example changed: the test no longer injects anything")
	}
	for _, format := range []string{"text", "csv", "md"} {
		for _, verb := range []string{"capacity", "report"} {
			r := runQ(t, slow, evil, verb, "--format", format, "-")
			if r.code > 1 {
				t.Fatalf("%s %s: exit %d, %s", verb, format, r.code, r.stderr)
			}
			if i := strings.IndexFunc(r.stdout, unsafeForTest); i >= 0 {
				t.Errorf("%s --format %s: unsafe character %q in output near %q", verb, format, r.stdout[i:i+4], r.stdout[max(0, i-20):i])
			}
		}
	}
	// An error message quoting a layer name.
	bad := strings.Replace(evil, "thickness: 20 m", "thickness: -20 m", 1)
	r := runQ(t, slow, bad, "capacity", "-")
	if r.code != 2 || strings.IndexFunc(r.stderr, unsafeForTest) >= 0 {
		t.Errorf("error output: exit %d, %q", r.code, r.stderr)
	}
}

func unsafeForTest(r rune) bool {
	return r == 0x1b || r == 0x07 || r == 0x202E || r == 0x2066
}

// TestErrorsCapped: a file with thousands of problems prints at most
// maxMessages of them and a count of the rest.
func TestErrorsCapped(t *testing.T) {
	var b strings.Builder
	b.WriteString("title: many\nunits: SI\nground:\n  water_depth: none\n  layers:\n")
	const n = 500
	for i := range n {
		fmt.Fprintf(&b, "    - {name: l%d, thickness: -1 m, drainage: drained, unit_weight: 18, friction_angle: 30}\n", i)
	}
	b.WriteString("pile: {section: {shape: circle, diameter: 0.5 m}, length: 5 m, installation: bored}\n")
	r := runQ(t, slow, b.String(), "capacity", "-")
	if r.code != 2 {
		t.Fatalf("exit %d", r.code)
	}
	lines := strings.Count(r.stderr, "\n")
	if lines > maxMessages+1 || !strings.Contains(r.stderr, "more problems not shown") {
		t.Errorf("%d lines of errors; last: %q", lines, r.stderr[max(0, len(r.stderr)-200):])
	}
}

// TestBatchBOM: a byte-order mark at the start of batch input is accepted,
// as it is for a single calc file.
func TestBatchBOM(t *testing.T) {
	in, _ := batchInput(t)
	first := lines0(in, 0)
	r := runQ(t, slow, "\ufeff"+first+"\n", "batch")
	if r.code > 1 || strings.Contains(r.stdout, `"error"`) {
		t.Errorf("batch with a BOM: exit %d, %.300s %s", r.code, r.stdout, r.stderr)
	}
}

// TestVersionOf: the version comes from the build information: the module
// version when installed at a version, else the commit (closed form).
func TestVersionOf(t *testing.T) {
	cases := []struct {
		bi   *debug.BuildInfo
		want string
	}{
		{nil, "dev"},
		{&debug.BuildInfo{Main: debug.Module{Version: "v0.1.0"}}, "v0.1.0"},
		{&debug.BuildInfo{Main: debug.Module{Version: "(devel)"}}, "dev"},
		{&debug.BuildInfo{Main: debug.Module{Version: "(devel)"}, Settings: []debug.BuildSetting{
			{Key: "vcs.revision", Value: "4f3c2a1b9e0d77aa"}, {Key: "vcs.time", Value: "2026-12-02T07:12:04Z"},
			{Key: "vcs.modified", Value: "true"}}}, "dev+4f3c2a1b9e0d+dirty 2026-12-02T07:12:04Z"},
	}
	for _, c := range cases {
		if got := versionOf(c.bi); got != c.want {
			t.Errorf("versionOf = %q, want %q", got, c.want)
		}
	}
}
