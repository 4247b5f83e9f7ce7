package main

// Sources: the calc file is examples/quay-wall-reliability.yaml (a
// scenario of our own, invented numbers); goldens hold the command's own
// output and check only that it stays the same (refresh with -update
// after a deliberate change and review the diff). The numbers themselves
// are checked in package reliability against closed forms.

import (
	"os"
	"regexp"
	"strings"
	"testing"
)

const reliabilityFile = "quay-wall-reliability"

// TestGoldenReliability runs reliability in every format on its example.
func TestGoldenReliability(t *testing.T) {
	for _, format := range []string{"text", "json", "csv", "md", "html"} {
		r := runQ(t, slow, "", "reliability", "--format", format, examplePath(reliabilityFile))
		if r.code != 0 {
			t.Fatalf("reliability --format %s: exit %d; stderr:\n%s", format, r.code, r.stderr)
		}
		if !strings.Contains(r.stdout, "qualified") && !strings.Contains(r.stdout, "For qualified engineers") {
			t.Errorf("reliability --format %s: no cautions", format)
		}
		golden(t, "reliability/"+reliabilityFile+"."+extOf[format], []byte(r.stdout))
	}
}

// TestReliabilityWorkers: the same seed gives the same output with one
// worker and with eight; a file without a reliability section is a usage
// error.
func TestReliabilityWorkers(t *testing.T) {
	one := runQ(t, slow, "", "reliability", "--format", "json", examplePath(reliabilityFile))
	data, err := os.ReadFile(examplePath(reliabilityFile))
	if err != nil {
		t.Fatal(err)
	}
	src := string(data)
	for _, w := range []string{"1", "8"} {
		in := strings.Replace(src, "  seed: 2026", "  seed: 2026\n  workers: "+w, 1)
		r := runQ(t, slow, in, "reliability", "--format", "json", "-")
		if r.code != 0 {
			t.Fatalf("workers %s: exit %d: %s", w, r.code, r.stderr)
		}
		workers := regexp.MustCompile(`"workers": [0-9]+,`)
		got := workers.ReplaceAllString(r.stdout, "")
		want := workers.ReplaceAllString(one.stdout, "")
		if strings.Contains(got, `"source"`) {
			// The source as entered differs by the workers line.
			got = got[strings.Index(got, `"pile"`):]
			want = want[strings.Index(want, `"pile"`):]
		}
		if got != want {
			t.Errorf("workers %s: the output differs from the default run", w)
		}
	}
	r := runQ(t, slow, "", "reliability", examplePath("pump-station-bored"))
	if r.code != 2 || !strings.Contains(r.stderr, "reliability: not given") {
		t.Errorf("reliability without a reliability section: exit %d, stderr %q", r.code, r.stderr)
	}
}
