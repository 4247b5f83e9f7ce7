// Source of the numbers in this file: the sounding and ground are a scenario
// of our own; the expected values are the same interpretation run through
// package insitu directly, and the capacity with and without the sounding,
// so no published value is involved.

package calc

import (
	"errors"
	"fmt"
	"io/fs"
	"math"
	"strings"
	"testing"

	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// soundingCalc is a calc file of our own: soft clay over dense sand, with
// a sounding named in the ground.
func soundingCalc(sounding string) string {
	return `qult: 1
title: Sounding beside a driven pile
units: SI
ground:
  water_depth: 1 m
  layers:
    - name: soft clay
      thickness: 4 m
      drainage: undrained
      unit_weight: 17 kN/m3
      saturated_unit_weight: 17 kN/m3
      undrained_strength: 25 kPa
    - name: dense sand
      thickness: 8 m
      drainage: drained
      saturated_unit_weight: 20 kN/m3
      friction_angle: 36 deg
` + sounding + `
pile:
  section: {shape: circle, diameter: 400 mm}
  length: 9 m
  installation: driven-high
`
}

// soundingCSV: readings every 0.5 m from 0.5 to 14 m (the ground model
// ends at 12 m): soft clay to 4 m, sand below.
func soundingCSV() string {
	var b strings.Builder
	b.WriteString("# id: S-1\n# area_ratio: 0.8\ndepth_m,qc_MPa,fs_kPa,u2_kPa\n")
	for i := 1; i <= 28; i++ {
		z := 0.5 * float64(i)
		if z <= 4 {
			fmt.Fprintf(&b, "%g,%g,%g,%g\n", z, 0.3+0.05*z, 8+z, 20+30*z)
		} else {
			fmt.Fprintf(&b, "%g,%g,%g,%g\n", z, 8+0.8*z, 50+3*z, 9.81*(z-1))
		}
	}
	return b.String()
}

func files(m map[string]string) ReadFileFunc {
	return func(name string) ([]byte, error) {
		s, ok := m[name]
		if !ok {
			return nil, fmt.Errorf("open %s: %w", name, fs.ErrNotExist)
		}
		return []byte(s), nil
	}
}

func TestSoundingInterpreted(t *testing.T) {
	text := soundingCalc("  sounding: {file: s1.csv, nkt: 14}")
	res, err := ParseWith([]byte(text), ParseOptions{ReadFile: files(map[string]string{"s1.csv": soundingCSV()})})
	if err != nil {
		t.Fatal(err)
	}
	sr := res.Sounding
	if sr == nil {
		t.Fatal("no sounding result")
	}
	if sr.ID != "S-1" || sr.Format != "csv" || sr.Readings != 24 || sr.Below != 4 || sr.AreaRatio != 0.8 {
		t.Errorf("sounding %+v", sr)
	}
	// The oracle: the same sounding interpreted with the profile's stresses
	// through package insitu directly, averaged over each layer.
	in, err := Resolve(res.Input)
	if err != nil {
		t.Fatal(err)
	}
	prof, err := profile.New(in.Ground)
	if err != nil {
		t.Fatal(err)
	}
	s, err := insitu.ReadCPTCSV(strings.NewReader(soundingCSV()), "s1.csv")
	if err != nil {
		t.Fatal(err)
	}
	s.Rows = s.Rows[:24]
	pts, err := insitu.InterpretCPT(s, func(z units.Length) (units.Stress, units.Stress) {
		st, _ := prof.StressesAt(z)
		return st.Total, st.Pore
	}, nil)
	if err != nil {
		t.Fatal(err)
	}
	ms, err := insitu.MeansPerLayer(pts, []units.Length{0, 4, 12}, func(p *insitu.Point) float64 { return p.Ic })
	if err != nil {
		t.Fatal(err)
	}
	qn, _ := insitu.MeanOver(pts, 0, 4, func(p *insitu.Point) float64 { return float64(p.Qnet) })
	if len(sr.Layers) != 2 {
		t.Fatalf("layers %+v", sr.Layers)
	}
	clay, sand := sr.Layers[0], sr.Layers[1]
	if clay.Ic != ms[0].Value || sand.Ic != ms[1].Value || clay.Zone != insitu.ZoneOf(ms[0].Value) {
		t.Errorf("Ic: clay %g sand %g; want %g %g", clay.Ic, sand.Ic, ms[0].Value, ms[1].Value)
	}
	if clay.Ic <= 2.6 || sand.Ic > 2.6 {
		t.Fatalf("the sounding of our own should read clay-like over sand-like: %g, %g", clay.Ic, sand.Ic)
	}
	if math.Abs(float64(clay.Su)-qn.Value/14) > 1e-9 || clay.Phi != 0 {
		t.Errorf("clay su %v φ′ %v; want %v and none", clay.Su, clay.Phi, qn.Value/14)
	}
	if sand.Su != 0 || !(sand.Phi > 30*units.Degree && sand.Phi < 50*units.Degree) {
		t.Errorf("sand su %v φ′ %v°", sand.Su, sand.Phi.Degrees())
	}
	if len(sr.Suggested) != 2 || math.Abs(float64(sr.Suggested[0].Bottom)-4.25) > 1e-12 {
		t.Errorf("suggested %+v; want a break midway between 4.0 and 4.5 m", sr.Suggested)
	}
	// The capacity is that of the same file without the sounding.
	plain, err := Parse([]byte(soundingCalc("")))
	if err != nil {
		t.Fatal(err)
	}
	if plain.Breakdown.Capacity != res.Breakdown.Capacity {
		t.Errorf("the sounding changed the capacity: %+v, %+v", plain.Breakdown.Capacity, res.Breakdown.Capacity)
	}
}

func TestSoundingProblems(t *testing.T) {
	read := files(map[string]string{"s1.csv": soundingCSV(), "bad.gef": "#GEFID= 1\n#COLUMN= 3\n#EOH=\n", "two.txt": soundingCSV()})
	tests := []struct {
		name, section, path, msg string
		read                     ReadFileFunc
	}{
		{"no reader", "  sounding: {file: s1.csv}", "ground.sounding.file", "cannot be read here", nil},
		{"missing file", "  sounding: {file: none.csv}", "ground.sounding.file", "not exist", read},
		{"format", "  sounding: {file: two.txt}", "ground.sounding.format", "want csv, ags or gef", read},
		{"nkt", "  sounding: {file: s1.csv, nkt: 40}", "ground.sounding.nkt", "outside 6 to 30", read},
		{"malformed", "  sounding: {file: bad.gef}", "ground.sounding.file", "bad.gef:3: #COLUMNINFO", read},
		{"no file", "  sounding: {nkt: 14}", "ground.sounding.file", "missing", read},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := ParseWith([]byte(soundingCalc(tt.section)), ParseOptions{ReadFile: tt.read})
			var ps Problems
			if !errors.As(err, &ps) || len(ps) != 1 {
				t.Fatalf("error %v", err)
			}
			if ps[0].Path != tt.path || !strings.Contains(ps[0].Msg, tt.msg) || ps[0].Line != 18 {
				t.Errorf("problem %+v; want %s at line 18 with %q", ps[0], tt.path, tt.msg)
			}
		})
	}
}
