package profile

import (
	"testing"

	"github.com/qultgeo/qult/units"
)

// benchProfile builds an invented profile (source: our own scenario, no
// published values) of n layers 1.5 m thick with the
// water table at 2.3 m.
func benchProfile(n int) *Profile {
	spec := Spec{WaterDepth: 2.3 * m}
	for i := range n {
		l := LayerSpec{Thickness: 1.5 * m, Drainage: Drained, Phi: 32 * units.Degree}
		if i%2 == 0 {
			l.DryUnitWeight, l.VoidRatio = units.UnitWeight(15.5+0.1*float64(i))*kNm3, 0.6
		} else {
			l.Drainage, l.Su, l.WaterContent, l.Gs = Undrained, 40*kPa, 0.3, 2.7
		}
		spec.Layers = append(spec.Layers, l)
	}
	p, err := New(spec)
	if err != nil {
		panic(err)
	}
	return p
}

func BenchmarkEffectiveStress(b *testing.B) {
	p := benchProfile(20)
	const n = 1000
	depths := make([]units.Length, n)
	for i := range depths {
		depths[i] = p.Depth() * units.Length(i) / (n - 1)
	}
	b.ReportAllocs()
	var sink units.Stress
	for b.Loop() {
		for _, z := range depths {
			s, _ := p.EffectiveStress(z)
			sink += s
		}
	}
	_ = sink
}
