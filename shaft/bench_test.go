package shaft

import (
	"testing"

	"github.com/qultgeo/qult/units"
)

// benchPoint is an invented point for timing (no published source needed): a clay-over-sand setting with
// every field any method reads.
var benchPoint = Point{SigmaV: 120 * kPa, Depth: 12 * units.Metre, Phi: d(33), OCR: 2,
	Su: 60 * kPa, Diameter: 600 * units.Millimetre, N60: 12}

func benchMethods() []Unit {
	kb, _ := KOverK0For(DrivenHighDisplacement)
	dr, _ := DeltaOverPhiFor(RoughSteel)
	return []Unit{
		Beta{K: KGiven{K: 1}, Delta: DeltaGiven{Delta: d(25)}},
		Beta{K: KJaky{}, Delta: dr},
		Beta{K: KMayneKulhawy{}, Delta: dr},
		Beta{K: kb, Delta: dr},
		Beta{K: KOverKp{Ratio: 0.3}, Delta: dr},
		BetaGiven{Beta: 0.3},
		Burland{},
		DrilledSand{},
		DrilledSandK0{},
		APIBeta{Class: DenseSand},
		AlphaAPI{},
		AlphaChart{},
		AlphaDrilled{},
		AlphaGiven{Alpha: 0.6},
		Capped{Method: AlphaAPI{}, Limit: LimitGiven{Fs: 40 * kPa}},
	}
}

func BenchmarkUnitShaft(b *testing.B) {
	for _, m := range benchMethods() {
		name := m.ID()
		if bm, ok := m.(Beta); ok {
			name += "/" + bm.K.ID()
		}
		b.Run(name, func(b *testing.B) {
			b.ReportAllocs()
			var sink Result
			for b.Loop() {
				r, err := m.Unit(benchPoint)
				if err != nil {
					b.Fatal(err)
				}
				sink = r
			}
			_ = sink
		})
	}
	b.Run("lambda", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			if _, err := (Lambda{}).Average(24*units.Metre, 110*kPa, 55*kPa); err != nil {
				b.Fatal(err)
			}
		}
	})
	b.Run("critical-depth", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			zc, err := CriticalDepth{Ratio: 15}.Depth(benchPoint.Diameter)
			if err != nil {
				b.Fatal(err)
			}
			Hold(benchPoint, zc, 100*kPa)
		}
	})
}

// TestNoAllocs: every method, evaluated through its interface as the pile
// package will, allocates nothing when it succeeds.
func TestNoAllocs(t *testing.T) {
	for _, m := range benchMethods() {
		n := testing.AllocsPerRun(100, func() {
			if _, err := m.Unit(benchPoint); err != nil {
				t.Fatal(err)
			}
		})
		if n != 0 {
			t.Errorf("%s: %v allocations per call", m.ID(), n)
		}
	}
	n := testing.AllocsPerRun(100, func() {
		if _, err := (Lambda{}).Average(24*units.Metre, 110*kPa, 55*kPa); err != nil {
			t.Fatal(err)
		}
	})
	if n != 0 {
		t.Errorf("lambda: %v allocations per call", n)
	}
}
