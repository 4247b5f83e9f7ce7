package bearing

import (
	"testing"

	"github.com/qultgeo/qult/units"
)

// Input values here are our own invention; no published source is checked.
//
// BenchmarkTipFactors evaluates every method at one input: a sand of our
// own invention at a 20 m tip (no published value is checked here).
func BenchmarkTipFactors(b *testing.B) {
	in := Input{Phi: deg(34), Q: 180 * units.Kilopascal, C: 2 * units.Kilopascal, Su: 60 * units.Kilopascal,
		Ir: 90, L: 20, D: 0.6, N60: 30}
	methods := append(append(append(Drained(), Undrained()...), Janbu{Eta: deg(75)}, GivenNq{Nq: 50}, GivenNc{Nc: 9}), extraTips()...)
	for _, m := range methods {
		name := m.ID()
		if j, ok := m.(Janbu); ok && j.Eta != 0 {
			name += "-eta75"
		}
		if v, ok := m.(Vesic); ok && v.Volume == VolumeCorrelated {
			name += "-correlated"
		}
		b.Run(name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := m.Tip(in); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
	b.Run("compare", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			Compare(in)
		}
	})
}

func TestTipAllocatesNothing(t *testing.T) {
	// Hot-path requirement (DESIGN.md, principle 8; no published value).
	in := Input{Phi: deg(34), Q: 180 * units.Kilopascal, Su: 60 * units.Kilopascal, Ir: 90, L: 20, D: 0.6, N60: 30}
	for _, m := range append(append(Drained(), Undrained()...), append([]Tip{GivenNq{Nq: 50}, GivenNc{Nc: 9}}, extraTips()...)...) {
		if n := testing.AllocsPerRun(100, func() { _, _ = m.Tip(in) }); n != 0 {
			t.Errorf("%s: %g allocations per call, want 0", m.ID(), n)
		}
	}
}

// extraTips are the methods and settings not in Drained or Undrained, with
// the settings that exercise their whole path (Drained has Vesic with Δ by
// its correlation; Vesic{} takes Δ = 0).
func extraTips() []Tip {
	return []Tip{Vesic{}, VesicGiven{Nsigma: 80, Nc: 90}, LargeBase{Of: ShaftSand{}}}
}
