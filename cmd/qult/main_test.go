package main

// Sources of the numbers in this file: the calc files are the scenarios of
// our own in examples/ (invented numbers, no published source); golden
// files hold the command's own output and check only that it stays the
// same (refresh them with go test ./cmd/qult -update after a deliberate
// change, and review the diff). Checks of computed values name their
// closed form beside them.

import (
	"bytes"
	"flag"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
	"time"
	"unicode/utf8"
)

var update = flag.Bool("update", false, "rewrite the golden files under testdata/golden")

func TestMain(m *testing.M) {
	version = "test" // fixed, so that goldens match on every machine
	os.Exit(m.Run())
}

// examples are the calc files of examples/ the goldens run on.
var examples = []string{"pump-station-bored", "river-jetty-pipe", "abutment-hpile-us"}

func examplePath(name string) string {
	return filepath.Join("..", "..", "examples", name+".yaml")
}

// outcome is one run of the command.
type outcome struct {
	code           int
	stdout, stderr string
}

// runQ runs the command in-process with stdin as standard input. It fails
// the test when the command takes longer than timeout (a hang) or reports
// an internal error (a recovered panic).
func runQ(t *testing.T, timeout time.Duration, stdinText string, args ...string) outcome {
	t.Helper()
	stdin = strings.NewReader(stdinText)
	defer func() { stdin = os.Stdin }()
	var o, e bytes.Buffer
	done := make(chan int, 1)
	go func() { done <- run(&o, &e, args) }()
	var code int
	select {
	case code = <-done:
	case <-time.After(timeout):
		t.Fatalf("qult %s: no answer within %v (a hang)", strings.Join(args, " "), timeout)
	}
	if strings.Contains(e.String(), "internal error") {
		t.Errorf("qult %s: panicked:\n%s", strings.Join(args, " "), e.String())
	}
	return outcome{code, o.String(), e.String()}
}

var extOf = map[string]string{"text": "txt", "json": "json", "csv": "csv", "md": "md", "html": "html"}

// golden compares got with the golden file, or rewrites it with -update.
func golden(t *testing.T, name string, got []byte) {
	t.Helper()
	path := filepath.Join("testdata", "golden", name)
	if *update {
		if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(path, got, 0o644); err != nil {
			t.Fatal(err)
		}
		return
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test ./cmd/qult -update to create it)", err)
	}
	if !bytes.Equal(got, want) {
		t.Errorf("%s differs from the golden file (run with -update after checking the change):\n%s", path, firstDiff(want, got))
	}
}

// firstDiff shows the first differing line.
func firstDiff(want, got []byte) string {
	wl, gl := strings.Split(string(want), "\n"), strings.Split(string(got), "\n")
	for i := 0; i < max(len(wl), len(gl)); i++ {
		var w, g string
		if i < len(wl) {
			w = wl[i]
		}
		if i < len(gl) {
			g = gl[i]
		}
		if w != g {
			return "line " + strconv.Itoa(i+1) + ":\n  want: " + w + "\n  got:  " + g
		}
	}
	return "(same lines; different line endings?)"
}

const slow = 30 * time.Second

// TestGoldenCalcVerbs runs every calc verb in every format on every
// example.
func TestGoldenCalcVerbs(t *testing.T) {
	for _, verb := range []string{"check", "capacity", "length", "report"} {
		for _, ex := range examples {
			for _, format := range []string{"text", "json", "csv", "md", "html"} {
				t.Run(verb+"/"+ex+"/"+format, func(t *testing.T) {
					r := runQ(t, slow, "", verb, "--format", format, examplePath(ex))
					if r.code != 0 {
						t.Fatalf("exit code %d, want 0; stderr:\n%s", r.code, r.stderr)
					}
					if r.stdout == "" {
						t.Fatal("no output")
					}
					name := verb + "/" + ex + "." + extOf[format]
					if format == "json" {
						// The JSON form is the whole result document
						// whatever the verb: one golden file for all.
						name = "json/" + ex + ".json"
					}
					golden(t, name, []byte(r.stdout))
				})
			}
		}
	}
}

// TestGoldenUnits checks --units against the file's own system.
func TestGoldenUnits(t *testing.T) {
	for _, c := range []struct{ ex, sys string }{{"pump-station-bored", "US"}, {"abutment-hpile-us", "SI"}} {
		r := runQ(t, slow, "", "capacity", "--units", c.sys, examplePath(c.ex))
		if r.code != 0 {
			t.Fatalf("%s --units %s: exit %d\n%s", c.ex, c.sys, r.code, r.stderr)
		}
		golden(t, "units/"+c.ex+"-"+strings.ToLower(c.sys)+".txt", []byte(r.stdout))
	}
}

// TestFailingDesign: check and length exit 1 when the design fails, and
// still print their answer; capacity and report exit 0.
func TestFailingDesign(t *testing.T) {
	file := filepath.Join("testdata", "overloaded.yaml")
	for _, c := range []struct {
		verb string
		code int
	}{{"check", 1}, {"length", 1}, {"capacity", 0}, {"report", 0}} {
		r := runQ(t, slow, "", c.verb, file)
		if r.code != c.code {
			t.Errorf("%s: exit code %d, want %d; stderr:\n%s", c.verb, r.code, c.code, r.stderr)
		}
		if r.stdout == "" {
			t.Errorf("%s: no output", c.verb)
		}
		if c.verb == "check" || c.verb == "length" {
			golden(t, "fail/"+c.verb+".txt", []byte(r.stdout))
		}
	}
}

// TestStdinAndOutputFile: "-" reads standard input and gives the same
// answer as the file; -o writes the file and, for report, picks HTML by
// the extension.
func TestStdinAndOutputFile(t *testing.T) {
	path := examplePath("pump-station-bored")
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	fromFile := runQ(t, slow, "", "capacity", "--format", "json", path)
	fromStdin := runQ(t, slow, string(data), "capacity", "--format", "json", "-")
	if fromFile.code != 0 || fromStdin.code != 0 || fromFile.stdout != fromStdin.stdout {
		t.Errorf("capacity of - differs from that of the file (exit %d and %d)", fromStdin.code, fromFile.code)
	}
	dir := t.TempDir()
	out := filepath.Join(dir, "pump.html")
	r := runQ(t, slow, "", "report", "-o", out, path)
	if r.code != 0 || r.stdout != "" {
		t.Fatalf("report -o: exit %d, stdout %q, stderr %s", r.code, r.stdout, r.stderr)
	}
	html, err := os.ReadFile(out)
	if err != nil {
		t.Fatal(err)
	}
	want := runQ(t, slow, "", "report", "--format", "html", path)
	if string(html) != want.stdout {
		t.Errorf("report -o x.html differs from report --format html")
	}
	// flags after the file name are read too
	after := runQ(t, slow, "", "capacity", path, "--format", "json")
	if after.stdout != fromFile.stdout {
		t.Errorf("flags after the file name were not applied")
	}
	// -o into a directory that does not exist: exit 2, no partial file
	bad := runQ(t, slow, "", "capacity", "-o", filepath.Join(dir, "no", "such", "dir.txt"), path)
	if bad.code != 2 || !strings.Contains(bad.stderr, "qult: ") {
		t.Errorf("-o into a missing directory: exit %d, stderr %q", bad.code, bad.stderr)
	}
}

func TestGoldenVersionAndHelp(t *testing.T) {
	r := runQ(t, slow, "", "version")
	if r.code != 0 {
		t.Fatalf("version: exit %d", r.code)
	}
	golden(t, "version.txt", []byte(r.stdout))
	r = runQ(t, slow, "", "help")
	if r.code != 0 {
		t.Fatalf("help: exit %d", r.code)
	}
	golden(t, "help/qult.txt", []byte(r.stdout))
	// help knows itself.
	r = runQ(t, slow, "", "help", "help")
	if r.code != 0 || !strings.Contains(r.stdout, "usage: qult help [VERB]") {
		t.Errorf("help help: exit %d, output:\n%s%s", r.code, r.stdout, r.stderr)
	}
	golden(t, "help/help.txt", []byte(r.stdout))
	for _, v := range verbs {
		for _, args := range [][]string{{"help", v.name}, {v.name, "--help"}, {v.name, "-h"}} {
			r := runQ(t, slow, "", args...)
			if r.code != 0 {
				t.Errorf("%v: exit %d, want 0", args, r.code)
			}
			if !strings.Contains(r.stdout, "example:\n  qult "+v.name) {
				t.Errorf("%v: help has no example of qult %s", args, v.name)
			}
			golden(t, "help/"+v.name+".txt", []byte(r.stdout))
		}
	}
}

// TestTextFits100 checks that every line of every text golden (the text
// output of every verb, help included) takes at most 100 columns, counted
// in runes. verify.txt is left out: package verify lays out its own table.
func TestTextFits100(t *testing.T) {
	files, err := filepath.Glob(filepath.Join("testdata", "golden", "*", "*.txt"))
	if err != nil {
		t.Fatal(err)
	}
	top, _ := filepath.Glob(filepath.Join("testdata", "golden", "*.txt"))
	files = append(files, top...)
	if len(files) < 30 {
		t.Fatalf("found %d text goldens, want the whole set", len(files))
	}
	for _, f := range files {
		if filepath.Base(f) == "verify.txt" {
			continue
		}
		data, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		for i, l := range strings.Split(string(data), "\n") {
			if n := utf8.RuneCountInString(l); n > 100 {
				t.Errorf("%s:%d: %d columns: %q", f, i+1, n, l)
			}
		}
	}
	// --wide keeps the old layout: one line per table row.
	r := runQ(t, slow, "", "capacity", "--wide", examplePath("abutment-hpile-us"))
	widest := 0
	for _, l := range strings.Split(r.stdout, "\n") {
		widest = max(widest, utf8.RuneCountInString(l))
	}
	if r.code != 0 || widest <= 100 {
		t.Errorf("capacity --wide: exit %d, widest line %d columns, want more than 100", r.code, widest)
	}
}
