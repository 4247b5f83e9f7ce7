package profile

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

// FuzzProfile builds two-layer profiles from arbitrary numbers (seeds are
// invented), with or without an excavation and scour, and queries them:
// New and the queries must never panic, a query without error must return
// finite stresses, and σ′v must be zero above the design ground line.
// Source of the seeds: our own invention.
func FuzzProfile(f *testing.F) {
	f.Add(3.0, 5.0, 18.0, 20.0, 19.0, 2.0, 10.0, 4.0, 30.0, 6.5, 0.6, 0.3, 2.7, false, 0.0, 0.0, 0.0)
	f.Add(1.0, 1.0, 0.0, 0.0, 0.0, -3.0, 0.0, 0.0, 0.0, 2.0, 0.7, 0.0, 0.0, true, 0.0, 0.0, 0.0)
	f.Add(2.0, -1.0, 18.0, 9.0, 25.0, 0.0, -4.0, 1.0, -9.81, 0.0, 0.0, 0.45, 2.65, false, 0.0, 0.0, 0.0)
	f.Add(math.NaN(), 2.0, math.Inf(1), 20.0, 19.0, 1.0, 0.0, 1.5, 500.0, 1.0, 0.5, 0.2, 2.7, false, 0.0, 0.0, 0.0)
	f.Add(3.0, 5.0, 18.0, 20.0, 19.0, -2.0, 0.0, 0.0, 0.0, 1.0, 0.6, 0.3, 2.7, false, 0.5, 1.0, 1.5)
	f.Add(3.0, 5.0, 18.0, 20.0, 19.0, 4.0, 0.0, 5.0, 20.0, 2.5, 0.6, 0.3, 2.7, false, 2.0, 0.0, 0.0)
	f.Add(3.0, 5.0, 18.0, 20.0, 19.0, 1.0, 0.0, 0.0, 0.0, 2.5, 0.6, 0.3, 2.7, false, 3.0, 4.0, math.NaN())
	f.Fuzz(func(t *testing.T, t1, t2, g1, gs1, gs2, wd, q, pz, pu, z, e, w, gs float64, noWater bool, exc, gen, loc float64) {
		spec := Spec{
			ExcavationDepth: units.Length(exc), Scour: Scour{General: units.Length(gen), Local: units.Length(loc)},
			WaterDepth: units.Length(wd), NoWater: noWater, Surcharge: units.Stress(q * 1e3),
			Layers: []LayerSpec{
				{Thickness: units.Length(t1), Drainage: Drained, Phi: 30 * units.Degree,
					UnitWeight: units.UnitWeight(g1 * 1e3), SaturatedUnitWeight: units.UnitWeight(gs1 * 1e3)},
				{Thickness: units.Length(t2), Drainage: Undrained, Su: 20 * kPa,
					SaturatedUnitWeight: units.UnitWeight(gs2 * 1e3), VoidRatio: e, WaterContent: w, Gs: gs},
			},
		}
		if pz != 0 {
			spec.PorePressures = []PorePoint{{units.Length(pz), units.Stress(pu * 1e3)}}
		}
		p, err := New(spec)
		if err != nil {
			if p != nil {
				t.Fatalf("New returned a profile with error %v", err)
			}
			return
		}
		for _, zz := range append(p.Breaks(), units.Length(z)) {
			s, err := p.StressesAt(zz)
			if err != nil {
				continue
			}
			for _, v := range []units.Stress{s.Total, s.Pore, s.Effective} {
				if math.IsNaN(float64(v)) || math.IsInf(float64(v), 0) {
					t.Fatalf("z %v: %+v", zz, s)
				}
			}
			if s.Effective < -1e-6*max(1, s.Total) {
				t.Fatalf("z %v: negative effective stress %+v accepted", zz, s)
			}
			if zz < p.DesignGround() && s.Effective != 0 {
				t.Fatalf("z %v: σ′v %v above the design ground line at %v", zz, s.Effective, p.DesignGround())
			}
			if _, err := p.LayerAt(zz); err != nil {
				t.Fatalf("LayerAt(%v): %v for a depth StressesAt accepted", zz, err)
			}
		}
	})
}
