// Source of the numbers in this file: randomly drawn soundings; the expected
// values are the written numbers read back (a round trip), so no published
// value is involved.

package insitu

import (
	"bytes"
	"fmt"
	"testing"

	"github.com/google/go-cmp/cmp"
	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// drawSounding draws a sounding whose values lie on the writers' grids
// (1 mm, 1 kPa for qc, 0.1 kPa for fs and u2).
func drawSounding(t *rapid.T, id string) Sounding {
	n := rapid.IntRange(1, 40).Draw(t, "rows")
	s := Sounding{ID: id, AreaRatio: float64(rapid.IntRange(500, 1000).Draw(t, "a_permille")) / 1000, HasU2: rapid.Bool().Draw(t, "u2")}
	z := 0
	for range n {
		z += rapid.IntRange(1, 500).Draw(t, "dz_mm")
		r := Row{Depth: units.Length(z) * units.Millimetre,
			Qc: units.Stress(rapid.IntRange(0, 80000).Draw(t, "qc_kPa")) * units.Kilopascal,
			Fs: units.Stress(rapid.IntRange(0, 20000).Draw(t, "fs_dkPa")) * 100}
		if s.HasU2 {
			r.U2 = units.Stress(rapid.IntRange(-1000, 30000).Draw(t, "u2_dkPa")) * 100
		}
		s.Rows = append(s.Rows, r)
	}
	return s
}

// TestPropAGSAndGEFWritersAgree: soundings written as AGS4 and as GEF read
// back equal to each other exactly (the same decimal text), and to what was
// written to within rounding of the last bit.
func TestPropAGSAndGEFWritersAgree(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		k := rapid.IntRange(1, 3).Draw(t, "soundings")
		var ss []Sounding
		for i := range k {
			ss = append(ss, drawSounding(t, fmt.Sprintf("CPT-%d", i+1)))
		}
		var ab bytes.Buffer
		if err := WriteAGS(&ab, "P-1", ss); err != nil {
			t.Fatal(err)
		}
		ags, err := ReadAGS(&ab, "w.ags")
		if err != nil {
			t.Fatalf("%v\n%s", err, ab.String())
		}
		if len(ags.Soundings) != k {
			t.Fatalf("read %d soundings, wrote %d", len(ags.Soundings), k)
		}
		for i := range ss {
			var gb bytes.Buffer
			if err := WriteGEF(&gb, &ss[i]); err != nil {
				t.Fatal(err)
			}
			gef, err := ReadGEF(&gb, "w.gef")
			if err != nil {
				t.Fatalf("%v\n%s", err, gb.String())
			}
			if d := cmp.Diff(ags.Soundings[i], *gef); d != "" {
				t.Fatalf("AGS and GEF differ (-ags +gef):\n%s", d)
			}
			if d := cmp.Diff(ss[i], *gef, closeRel); d != "" {
				t.Fatalf("read back differs (-written +read):\n%s", d)
			}
		}
	})
}

func TestWritersRefuse(t *testing.T) {
	var b bytes.Buffer
	qt := Sounding{ID: "A", AreaRatio: 1, TipCorrected: true, Rows: []Row{{Depth: 1, Qc: 1e6, Fs: 1e4}}}
	if err := WriteGEF(&b, &qt); err == nil {
		t.Error("GEF of a qt sounding: no error")
	}
	s := Sounding{AreaRatio: 1, Rows: []Row{{Depth: 1, Qc: 1e6, Fs: 1e4}}}
	if err := WriteAGS(&b, "P", []Sounding{s}); err == nil {
		t.Error("AGS of a sounding without ID: no error")
	}
	s.ID = "A"
	if err := WriteAGS(&b, "P", []Sounding{s, s}); err == nil {
		t.Error("AGS of two soundings with one ID: no error")
	}
}
