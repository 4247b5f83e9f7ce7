package shaft

import (
	"testing"

	"github.com/qultgeo/qult/units"
)

// benchPoint is an invented point for timing (no published source needed): a clay-over-sand setting with
// every field any method reads.
var benchPoint = Point{SigmaV: 120 * kPa, Depth: 12 * units.Metre, Phi: d(33), OCR: 2,
	Su: 60 * kPa, Diameter: 600 * units.Millimetre, N60: 12}

// benchPieces and benchTension are invented inputs for timing (no
// published source needed): two clay pieces under a sand layer, and a
// concrete pile 30 diameters long.
var (
	benchPieces = [...]LambdaPiece{
		{Thickness: 8 * units.Metre, SigmaTop: 90 * kPa, SigmaBottom: 160 * kPa, SuTop: 40 * kPa, SuBottom: 55 * kPa},
		{Thickness: 12 * units.Metre, SigmaTop: 160 * kPa, SigmaBottom: 270 * kPa, SuTop: 60 * kPa, SuBottom: 90 * kPa},
	}
	benchTension = TensionInput{Slenderness: 30, PilePoisson: 0.2, ShearModulusRatio: 0.002, Delta: d(30)}
)

func benchMethods() []Unit {
	kb, _ := KOverK0For(DrivenHigh)
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
		DrivenN60{},
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
	b.Run("lambda-layered", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			if _, err := (Lambda{}).Layered(30*units.Metre, benchPieces[:]); err != nil {
				b.Fatal(err)
			}
		}
	})
	b.Run("tension-poisson", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			if _, err := (TensionPoisson{}).Tension(benchTension); err != nil {
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
	others := []struct {
		name string
		f    func() error
	}{
		{"lambda-layered", func() error { _, err := (Lambda{}).Layered(30*units.Metre, benchPieces[:]); return err }},
		{"lambda-given", func() error {
			_, err := (LambdaGiven{Lambda: 0.2}).Average(24*units.Metre, 110*kPa, 55*kPa)
			return err
		}},
		{"tension-poisson", func() error { _, err := (TensionPoisson{}).Tension(benchTension); return err }},
		{"no-side", func() error {
			_, _, _, err := (AlphaDrilled{}).NoSide().Span(0, 12*units.Metre, units.Metre)
			return err
		}},
	}
	for _, o := range others {
		n := testing.AllocsPerRun(100, func() {
			if err := o.f(); err != nil {
				t.Fatal(err)
			}
		})
		if n != 0 {
			t.Errorf("%s: %v allocations per call", o.name, n)
		}
	}
}
