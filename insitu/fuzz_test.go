// Source of the numbers in this file: fuzz inputs only; the checks are that
// no reader panics and no NaN or Inf is returned, so no published value is
// involved.

package insitu

import (
	"bytes"
	"errors"
	"math"
	"os"
	"testing"

	"github.com/qultgeo/qult/units"
)

func seedFile(f *testing.F, name string) {
	b, err := os.ReadFile("testdata/" + name)
	if err != nil {
		f.Fatal(err)
	}
	f.Add(b)
}

// checkSounding: a reader's result holds no NaN or Inf and depths increase.
func checkSounding(t *testing.T, s *Sounding) {
	prev := math.Inf(-1)
	for _, r := range s.Rows {
		for _, v := range []float64{float64(r.Depth), float64(r.Qc), float64(r.Fs), float64(r.U2)} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				t.Fatalf("row %+v holds NaN or Inf", r)
			}
		}
		if !(float64(r.Depth) > prev) {
			t.Fatalf("depth %v after %v", r.Depth, prev)
		}
		prev = float64(r.Depth)
	}
	if !(s.AreaRatio > 0 && s.AreaRatio <= 1) {
		t.Fatalf("area ratio %v", s.AreaRatio)
	}
}

func checkErr(t *testing.T, err error) {
	var pe *ParseError
	if err != nil && !errors.As(err, &pe) {
		t.Fatalf("error %v is not a *ParseError", err)
	}
}

func FuzzReadCPTCSV(f *testing.F) {
	seedFile(f, "cpt-north.csv")
	f.Add([]byte("depth_m,qt_kPa,fs_MPa\n1,2,3\n"))
	f.Fuzz(func(t *testing.T, b []byte) {
		s, err := ReadCPTCSV(bytes.NewReader(b), "fuzz")
		checkErr(t, err)
		if err == nil {
			checkSounding(t, s)
			var w bytes.Buffer
			if err := WriteCPTCSV(&w, s); err != nil {
				t.Fatal(err)
			}
			s2, err := ReadCPTCSV(&w, "again")
			if err != nil {
				t.Fatalf("written file does not read back: %v\n%s", err, w.String())
			}
			if len(s2.Rows) != len(s.Rows) {
				t.Fatalf("rows %d then %d", len(s.Rows), len(s2.Rows))
			}
		}
	})
}

func FuzzReadSPTCSV(f *testing.F) {
	f.Add([]byte("location,depth_m,n,energy_ratio_pct,rod_length_m,borehole_mm,sampler\nB,1.5,3,72,2.7,150,no-liner\n"))
	f.Fuzz(func(t *testing.T, b []byte) {
		s, err := ReadSPTCSV(bytes.NewReader(b), "fuzz")
		checkErr(t, err)
		if err == nil {
			var w bytes.Buffer
			if err := WriteSPTCSV(&w, s); err != nil {
				t.Fatal(err)
			}
			if _, err := ReadSPTCSV(&w, "again"); err != nil {
				t.Fatalf("written file does not read back: %v", err)
			}
		}
	})
}

func FuzzReadAGS(f *testing.F) {
	seedFile(f, "cpt-north.ags")
	f.Fuzz(func(t *testing.T, b []byte) {
		d, err := ReadAGS(bytes.NewReader(b), "fuzz")
		checkErr(t, err)
		if err == nil {
			for i := range d.Soundings {
				checkSounding(t, &d.Soundings[i])
			}
		}
	})
}

func FuzzReadGEF(f *testing.F) {
	seedFile(f, "cpt-north.gef")
	f.Fuzz(func(t *testing.T, b []byte) {
		s, err := ReadGEF(bytes.NewReader(b), "fuzz")
		checkErr(t, err)
		if err == nil {
			checkSounding(t, s)
		}
	})
}

// FuzzDirect builds a sounding from the input's bytes (depth steps, qc and
// u2 from pairs of bytes) and runs every direct method on it: no panic, and
// no NaN or Inf without an error.
func FuzzDirect(f *testing.F) {
	f.Add([]byte{10, 50, 3, 10, 60, 4, 10, 200, 5, 10, 180, 6, 10, 90, 2, 10, 70, 1, 10, 255, 0, 10, 40, 9}, uint8(20), uint8(3))
	f.Add([]byte{1, 1, 0, 255, 255, 255, 1, 0, 0}, uint8(1), uint8(1))
	f.Fuzz(func(t *testing.T, b []byte, tipByte, bByte uint8) {
		s := &Sounding{ID: "fuzz", AreaRatio: 0.8, HasU2: true}
		z := 0.0
		for i := 0; i+2 < len(b); i += 3 {
			z += float64(b[i]) / 100
			s.Rows = append(s.Rows, Row{Depth: units.Length(z), Qc: units.Stress(float64(b[i+1]) * 1e5), U2: units.Stress(float64(b[i+2]) * 1e4),
				Fs: units.Stress(float64(b[i+1]) * 1e3)})
		}
		c, err := NewCone(s)
		if err != nil {
			return
		}
		tip, bb := units.Length(float64(tipByte)/10), units.Length(float64(bByte)/100)
		for _, m := range []DirectTip{LCPCTip{Kc: 0.4, Limit: 5 * units.Megapascal}, SchmertmannTip{Limit: 15 * units.Megapascal}, EslamiFelleniusTip{}} {
			r, err := m.Tip(c, tip, bb)
			if err == nil && (math.IsNaN(float64(r.Qp)) || math.IsInf(float64(r.Qp), 0) || r.Qp < 0) {
				t.Fatalf("%s: qp %v", m.ID(), r.Qp)
			}
		}
		for _, m := range []DirectShaft{LCPCShaft{Alpha: 100, Limit: 100e3}, EslamiFelleniusShaft{Cs: 0.01}, SchmertmannSandShaft{K: 1, Limit: 100e3}, SchmertmannClayShaft{Alpha: 0.8}} {
			q, _, err := m.Integral(c, c.Top(), tip, bb)
			if err == nil && (math.IsNaN(q) || math.IsInf(q, 0) || q < 0) {
				t.Fatalf("%s: ∫ %v", m.ID(), q)
			}
			fs, _, err := m.Unit(c, tip, bb)
			if err == nil && (math.IsNaN(float64(fs)) || fs < 0) {
				t.Fatalf("%s: fs %v", m.ID(), fs)
			}
		}
	})
}
