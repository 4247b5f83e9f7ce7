// Source of the numbers in this file: the borehole and ground are a
// scenario of our own; the expected values are closed forms worked here by
// hand from the equations insitu documents (Skempton 1986 corrections with
// the factors of ISRN Civil Engineering 2012 Table 1, Liao & Whitman 1986,
// Hatanaka & Uchida 1996, Stroud 1974), not qult's output.

package calc

import (
	"errors"
	"io/fs"
	"math"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"github.com/qultgeo/qult/insitu"
)

// sptCalc is a calc file of our own: 4 m of clay over sand, water at 1 m,
// with the SPT key given.
func sptCalc(spt string) string {
	return `qult: 1
title: SPT beside a driven pile
units: SI
ground:
  water_depth: 1 m
  layers:
    - name: clay
      thickness: 4 m
      drainage: undrained
      unit_weight: 18 kN/m3
      saturated_unit_weight: 18 kN/m3
      undrained_strength: 30 kPa
    - name: sand
      thickness: 8 m
      drainage: drained
      saturated_unit_weight: 20 kN/m3
      friction_angle: 34 deg
      n60: 20
` + spt + `
pile:
  section: {shape: square, width: 400 mm}
  length: 10 m
  installation: driven-high
`
}

// sptCSV: two boreholes; B1 has one test without an energy ratio and
// one without a rod length.
const sptCSV = `location,depth_m,n,energy_ratio_pct,rod_length_m,borehole_mm,sampler
B1,2,5,75,3.5,100,no-liner
B1,6,20,,7.5,100,no-liner
B1,9,40,75,,200,liner-dense
B2,3,8,60,4.5,100,no-liner
`

func sptFiles(name string) ([]byte, error) {
	if name == "b.csv" {
		return []byte(sptCSV), nil
	}
	return nil, fs.ErrNotExist
}

func TestSPTCorrected(t *testing.T) {
	src := sptCalc("  spt: {file: b.csv, hole: B1, energy_ratio: 60, phi: hatanaka-uchida, f1: 5 kPa}")
	r, err := ParseWith([]byte(src), ParseOptions{ReadFile: sptFiles})
	if err != nil {
		t.Fatal(err)
	}
	s := r.SPT
	if s == nil || len(s.Tests) != 3 {
		t.Fatalf("SPT result %+v, want 3 tests of B1", s)
	}
	// σ′v by hand: 18·z above 1 m; (18 − 9.81) in the clay below; (20 − 9.81) in the sand.
	sv := func(z float64) float64 {
		if z <= 4 {
			return 18 + (18-9.81)*(z-1)
		}
		return 18 + (18-9.81)*3 + (20-9.81)*(z-4)
	}
	pa := 100.0
	cases := []struct {
		i             int
		n60, cn       float64
		phiDeg, suKPa float64
		by            string
	}{
		// 2 m in clay: CE = 75/60, CR(3.5 m) = 0.75, CB = CS = 1.
		{0, 5 * 75.0 / 60 * 0.75, math.Min(1.7, math.Sqrt(pa/sv(2))), 0, 5 * 5 * 75.0 / 60 * 0.75, "su-stroud"},
		// 6 m in sand: ER default 60, CR(7.5 m) = 0.95.
		{1, 20 * 0.95, math.Sqrt(pa / sv(6)), 0, 0, "hatanaka-uchida"},
		// 9 m in sand: CE = 1.25, CB(200 mm) = 1.15, CS(liner, dense) = 0.8, rod 9 + 1 m = 10 m: CR = 1;
		// (N1)60 = 46·CN ≈ 47.6, so N1 = (N1)60·60/78 ≈ 36.6 at the Japanese hammer's energy
		// is above the correlation's 30: no φ′, with a note.
		{2, 40 * 1.25 * 1.15 * 0.8, math.Sqrt(pa / sv(9)), 0, 0, ""},
	}
	for _, c := range cases {
		tt := s.Tests[c.i]
		if math.Abs(tt.N60-c.n60) > 1e-9*c.n60 || math.Abs(tt.CN-c.cn) > 1e-9 {
			t.Errorf("test %d: N60 %g CN %g, want %g %g", c.i, tt.N60, tt.CN, c.n60, c.cn)
		}
		if tt.By != c.by {
			t.Errorf("test %d: by %q, want %q", c.i, tt.By, c.by)
		}
		if c.by == "hatanaka-uchida" {
			// Hatanaka & Uchida's N1 is at their hammer's energy, 78 % unless given.
			want := math.Sqrt(20*c.cn*c.n60*60/78) + 20
			if math.Abs(tt.Phi.Degrees()-want) > 1e-9 {
				t.Errorf("test %d: φ′ %g, want %g", c.i, tt.Phi.Degrees(), want)
			}
		}
		if c.suKPa > 0 && math.Abs(tt.Su.KPa()-c.suKPa) > 1e-9 {
			t.Errorf("test %d: su %g kPa, want %g", c.i, tt.Su.KPa(), c.suKPa)
		}
	}
	if s.Tests[2].Note == "" || s.Tests[2].Phi != 0 {
		t.Errorf("test 2: note %q φ′ %v, want a note and no φ′", s.Tests[2].Note, s.Tests[2].Phi)
	}
	if s.Tests[1].Flags == 0 || s.Tests[2].Flags == 0 {
		t.Errorf("flags %v %v: the assumed energy ratio and rod length must be flagged", s.Tests[1].Flags, s.Tests[2].Flags)
	}
	if l := s.Layers[1]; l.Tests != 2 || math.Abs(l.N60-(cases[1].n60+cases[2].n60)/2) > 1e-9 || l.N60Given != 20 {
		t.Errorf("sand layer %+v", l)
	}
	// The sand's n60 (20) is below the mean N60 of its tests, (19 + 46)/2
	// = 32.5: no warning; at 35 it is above: warned.
	above := func(ws []string) bool {
		return slices.ContainsFunc(ws, func(w string) bool { return strings.Contains(w, `layer "sand": n60 = 35 is above the mean N60 = 32.5`) })
	}
	if slices.ContainsFunc(r.Warnings, func(w string) bool { return strings.Contains(w, "is above the mean N60") }) {
		t.Errorf("warnings %q: n60 20 is below the tests' mean", r.Warnings)
	}
	high, err := ParseWith([]byte(strings.Replace(src, "n60: 20", "n60: 35", 1)), ParseOptions{ReadFile: sptFiles})
	if err != nil || !above(high.Warnings) {
		t.Errorf("n60 35: err %v, warnings %q lack the n60 above the tests' mean", err, high.Warnings)
	}
	// Never used in the capacity: the same file without the key gives the same capacity.
	plain, err := ParseWith([]byte(sptCalc("")), ParseOptions{})
	if err != nil {
		t.Fatal(err)
	}
	if plain.Breakdown.Capacity != r.Breakdown.Capacity {
		t.Errorf("capacity %v with SPT, %v without", r.Breakdown.Capacity, plain.Breakdown.Capacity)
	}
}

func TestSPTBadInput(t *testing.T) {
	cases := []struct{ spt, path, want string }{
		{"  spt: {file: none.csv}", "ground.spt.file", "not exist"},
		{"  spt: {file: b.csv}", "ground.spt.hole", "2 boreholes"},
		{"  spt: {file: b.csv, hole: B9}", "ground.spt.hole", `"B9" is not a borehole`},
		{"  spt: {file: b.csv, hole: B1}", "ground.spt.energy_ratio", "not recorded"},
		{"  spt: {file: b.csv, hole: B1, energy_ratio: 120}", "ground.spt.energy_ratio", "outside 30 to 100"},
		{"  spt: {file: b.txt}", "ground.spt.format", "want csv or ags"},
		{"  spt: {file: b.csv, hole: B1, energy_ratio: 60, phi: guess}", "ground.spt.phi", "guess"},
		{"  spt: {file: b.csv, hole: B1, energy_ratio: 60, f1: 9 kPa}", "ground.spt.f1", "outside 3.5 to 6.5 kPa"},
	}
	for _, c := range cases {
		_, err := ParseWith([]byte(sptCalc(c.spt)), ParseOptions{ReadFile: sptFiles})
		var ps Problems
		if !errors.As(err, &ps) || len(ps) == 0 {
			t.Errorf("%s: err %v, want Problems", c.spt, err)
			continue
		}
		if ps[0].Path != c.path || ps[0].Line == 0 || !strings.Contains(ps[0].Msg, c.want) {
			t.Errorf("%s: problem %+v, want %s containing %q with a line", c.spt, ps[0], c.path, c.want)
		}
	}
	// Below the ground model (12 m): an error naming the file key.
	deep := strings.Replace(sptCSV, "B2,3,", "B2,13,", 1)
	read := func(string) ([]byte, error) { return []byte(deep), nil }
	_, err := ParseWith([]byte(sptCalc("  spt: {file: b.csv, hole: B2}")), ParseOptions{ReadFile: read})
	if err == nil || !strings.Contains(err.Error(), "below the ground model") {
		t.Errorf("test below the ground: err %v", err)
	}
	// From standard input: no folder to read from.
	if _, err := ParseWith([]byte(sptCalc("  spt: {file: b.csv, hole: B1}")), ParseOptions{}); err == nil {
		t.Error("no ReadFile: want an error")
	}
}

// TestSPTFromAGS reads the ISPT group of the AGS4 file in insitu's
// testdata (records of our own): the rod length, borehole and sampler are
// not in ISPT, so each test is flagged for them.
func TestSPTFromAGS(t *testing.T) {
	read := func(name string) ([]byte, error) { return os.ReadFile(filepath.Join("..", "insitu", "testdata", name)) }
	r, err := ParseWith([]byte(sptCalc("  spt: {file: cpt-north.ags, energy_ratio: 60}")), ParseOptions{ReadFile: read})
	if err != nil {
		t.Fatal(err)
	}
	if r.SPT == nil || r.SPT.Format != "ags" || r.SPT.Hole != "BH-2" || len(r.SPT.Tests) == 0 {
		t.Fatalf("SPT %+v", r.SPT)
	}
	for _, tt := range r.SPT.Tests {
		if tt.Flags&insitu.FlagRodFromDepth == 0 || tt.Flags&insitu.FlagBoreholeAssumed == 0 {
			t.Errorf("test at %v: flags %v, want rod and borehole assumed", tt.Test.Depth, tt.Flags)
		}
	}
	if _, err := ParseWith([]byte(sptCalc("  spt: {file: cpt-north.ags, hole: CPT-N1, energy_ratio: 60}")), ParseOptions{ReadFile: read}); err == nil {
		t.Error("a hole without tests: want an error")
	}
}
