// Source of the numbers in this file: a benchmark on a sounding of our own;
// it asserts no value.

package insitu

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

// benchSounding is a sounding of our own: n readings 20 mm apart through
// alternating soft clay and dense sand.
func benchSounding(n int) *Sounding {
	s := &Sounding{ID: "bench", AreaRatio: 0.8, HasU2: true, Rows: make([]Row, n)}
	for i := range s.Rows {
		z := 0.02 * float64(i+1)
		layer := math.Sin(z / 3)
		qc, fs, u2 := 0.6e6+0.02e6*z, 18e3+0.5e3*z, 9.81e3*z*1.8
		if layer > 0 {
			qc, fs, u2 = 8e6+0.4e6*z, 60e3+2e3*z, 9.81e3*z
		}
		s.Rows[i] = Row{Depth: units.Length(z), Qc: units.Stress(qc), Fs: units.Stress(fs), U2: units.Stress(u2)}
	}
	return s
}

func benchStresses(z units.Length) (units.Stress, units.Stress) {
	sv := 18.5e3 * float64(z)
	u0 := 9.81e3 * math.Max(0, float64(z)-1.2)
	return units.Stress(sv), units.Stress(u0)
}

// BenchmarkInterpretCPT interprets a 10 000-row sounding (target: under
// 5 ms, no allocation).
func BenchmarkInterpretCPT(b *testing.B) {
	s := benchSounding(10000)
	dst := make([]Point, 0, len(s.Rows))
	b.ReportAllocs()
	for b.Loop() {
		var err error
		if dst, err = InterpretCPT(s, benchStresses, dst); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkSuggestLayers(b *testing.B) {
	s := benchSounding(10000)
	pts, err := InterpretCPT(s, benchStresses, nil)
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := SuggestLayers(pts, 0.5); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkDirectTip evaluates each direct tip method at one depth in a
// 10 000-row sounding (0.5 m pile): a point evaluation must not allocate.
func BenchmarkDirectTip(b *testing.B) {
	c, err := NewCone(benchSounding(10000))
	if err != nil {
		b.Fatal(err)
	}
	for _, m := range []DirectTip{LCPCTip{Kc: 0.4}, SchmertmannTip{Limit: 15 * units.Megapascal}, EslamiFelleniusTip{}} {
		b.Run(m.ID(), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := m.Tip(c, 100*units.Metre, 0.5*units.Metre); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// BenchmarkDirectShaft integrates each direct shaft method over 20 m of a
// 10 000-row sounding (1000 readings): no allocation.
func BenchmarkDirectShaft(b *testing.B) {
	c, err := NewCone(benchSounding(10000))
	if err != nil {
		b.Fatal(err)
	}
	for _, m := range []DirectShaft{LCPCShaft{Alpha: 120, Limit: 80 * units.Kilopascal}, EslamiFelleniusShaft{Cs: 0.01}} {
		b.Run(m.ID(), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, _, err := m.Integral(c, 40*units.Metre, 60*units.Metre, 0.4*units.Metre); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
