package main

// Sources: the calc file is examples/cpt-direct/grain-silo-direct.yaml and
// its sounding cpt-g2.csv (a scenario of our own, invented numbers); the
// goldens were reviewed by hand against the direct methods' equations, not
// copied as a check of any published value.

import (
	"path/filepath"
	"strings"
	"testing"
)

// TestDirectExample: the shipped example designs a pile from its sounding
// by the direct CPT methods: the report shows each method, its equation
// and the cone zone the tip averaged; the JSON holds the tip's cone block.
func TestDirectExample(t *testing.T) {
	path := filepath.Join("..", "..", "examples", "cpt-direct", "grain-silo-direct.yaml")
	r := runQ(t, badTimeout, "", "report", path)
	if r.code != 0 {
		t.Fatalf("report: exit %d, stderr %q", r.code, r.stderr)
	}
	for _, want := range []string{"eslami-fellenius", "fs = Cs·qE, qE = qt − u2", "lcpc", "qp = kc·qca",
		"Cone zone averaged, top", "Bustamante, M., Gianeselli, L. (1982)", "Eslami, A., Fellenius, B.H. (1997)"} {
		if !strings.Contains(r.stdout, want) {
			t.Errorf("report lacks %q", want)
		}
	}
	golden(t, "direct/report.txt", []byte(r.stdout))
	r = runQ(t, badTimeout, "", "capacity", "--format", "json", path)
	if r.code != 0 || !strings.Contains(r.stdout, `"cone"`) || !strings.Contains(r.stdout, `"zone_top"`) {
		t.Fatalf("json: exit %d, stderr %q", r.code, r.stderr)
	}
	golden(t, "direct/capacity.json", []byte(r.stdout))
}

// TestDirectFileMessages: from a file, a direct method whose tip zone the
// sounding does not reach, or whose shaft starts above its first reading,
// names the layer's field and the depths; a sounding with qt − u2 ≤ 0
// names the file.
func TestDirectFileMessages(t *testing.T) {
	for _, c := range []struct{ file, want string }{
		{"622-direct-tip-zone-below-sounding", "is not covered by the cone sounding (readings from 0.5 to 12 m)"},
		{"626-direct-sounding-negative-qe", "qE = qt − u2"},
		{"627-direct-shaft-above-first-reading", "ground.layers[0].shaft"},
	} {
		path := filepath.Join("testdata", "bad", c.file+".yaml")
		r := runQ(t, badTimeout, "", "capacity", path)
		if r.code != 2 || !strings.Contains(r.stderr, c.want) {
			t.Errorf("%s: exit %d, stderr %q; want %q", c.file, r.code, r.stderr, c.want)
		}
	}
}
