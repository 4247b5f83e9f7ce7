package main

import (
	"path/filepath"
	"strings"
	"testing"
)

// TestSoundingExample: the shipped example names a GEF sounding beside it,
// read relative to the calc file's folder.
func TestSoundingExample(t *testing.T) {
	path := filepath.Join("..", "..", "examples", "cpt-sounding", "wharf-shed-sounding.yaml")
	r := runQ(t, badTimeout, "", "report", path)
	if r.code != 0 || !strings.Contains(r.stdout, "Cone sounding") || !strings.Contains(r.stdout, "CPT-W3") {
		t.Errorf("exit %d, stderr %q, output lacks the sounding", r.code, r.stderr)
	}
	r = runQ(t, badTimeout, "", "capacity", "--format", "json", path)
	if r.code != 0 || !strings.Contains(r.stdout, `"sounding"`) {
		t.Errorf("json: exit %d, stderr %q", r.code, r.stderr)
	}
}

// TestSoundingFileMessages: from a file, a problem in the sounding names the
// sounding file, its line and its field.
func TestSoundingFileMessages(t *testing.T) {
	for _, c := range []struct{ file, want string }{
		{"550-sounding-missing-file", "550-no-such-sounding.csv: no such file"},
		{"553-sounding-malformed-gef", "553-sounding.gef:9: column 2 (quantity 2): not a number: \"n/a\""},
		{"554-sounding-ags-which-location", "holds 2 soundings (C1, C2): name one"},
		{"555-sounding-csv-depth-order", "555-sounding.csv:5: depth_m: depth does not increase: 1.5 after 1.5"},
	} {
		path := filepath.Join("testdata", "bad", c.file+".yaml")
		r := runQ(t, badTimeout, "", "capacity", path)
		if r.code != 2 || !strings.Contains(r.stderr, c.want) {
			t.Errorf("%s: exit %d, stderr %q; want %q", c.file, r.code, r.stderr, c.want)
		}
	}
	// From standard input there is no folder to read a sounding from.
	r := runQ(t, badTimeout, "title: x\nground:\n  sounding: {file: s.gef}\n  water_depth: 1 m\n  layers: [{name: a, thickness: 5 m, drainage: drained, unit_weight: 18 kN/m3, saturated_unit_weight: 19 kN/m3, friction_angle: 30 deg}]\npile: {section: {shape: circle, diameter: 300 mm}, length: 4 m, installation: bored}\n", "capacity", "-")
	if r.code != 2 || !strings.Contains(r.stderr, "cannot be read here") {
		t.Errorf("stdin: exit %d, stderr %q", r.code, r.stderr)
	}
}
