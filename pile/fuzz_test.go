package pile

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// FuzzCapacity (no published source: it checks robustness, not values) builds a two-layer profile and a pile from fuzzed numbers
// and checks that nothing panics and that a capacity returned without an
// error is finite. No published values are involved.
func FuzzCapacity(f *testing.F) {
	f.Add(5.0, 30.0, 18.0, 40.0, 2.0, 0.6, 12.0, uint8(0), uint8(0), 15.0)
	f.Add(0.1, 45.0, 35.0, 0.001, -5.0, 3.0, 0.5, uint8(3), uint8(2), 0.0)
	f.Add(1e6, 0.0, 0.0, -1.0, math.NaN(), 0.0, -1.0, uint8(5), uint8(9), 60.0)
	f.Fuzz(func(t *testing.T, th, phi, gamma, su, zw, d, l float64, shape, inst uint8, zc float64) {
		prof, err := profile.New(profile.Spec{WaterDepth: units.Length(zw), Layers: []profile.LayerSpec{
			{Name: "a", Thickness: units.Length(th), Drainage: profile.Drained, Phi: units.Angle(phi) * units.Degree,
				UnitWeight: units.UnitWeight(gamma) * kNm, SaturatedUnitWeight: units.UnitWeight(gamma+2) * kNm, Ir: 50},
			{Name: "b", Thickness: 40 * m, Drainage: profile.Undrained, SuTop: units.Stress(su) * kPa, SuBottom: units.Stress(2*su) * kPa,
				UnitWeight: 17 * kNm, SaturatedUnitWeight: 18 * kNm},
		}})
		if err != nil {
			return
		}
		sec := Section{Shape: Shape(shape%6 + 1), Diameter: units.Length(d), Width: units.Length(d), Wall: units.Length(d / 20),
			Depth: units.Length(d), Web: units.Length(d / 20), Flange: units.Length(d / 20), Area: units.Area(d * d), Perimeter: units.Length(4 * d)}
		p := Pile{Section: sec, Length: units.Length(l), Installation: Installation(inst%5 + 1), UnitWeight: 24 * kNm}
		for _, ms := range []Methods{DefaultMethods(), {UndrainedLambda: true, CriticalDepth: zc}} {
			a, err := NewAnalysis(prof, p, ms, nil)
			if err != nil {
				continue
			}
			c, err := a.Capacity()
			if err != nil {
				continue
			}
			for _, v := range []units.Force{c.Tip, c.Shaft, c.Compression, c.Tension, c.Weight} {
				if math.IsNaN(float64(v)) || math.IsInf(float64(v), 0) {
					t.Fatalf("non-finite capacity %+v", c)
				}
			}
			if _, err := a.Breakdown(); err != nil {
				t.Fatalf("Capacity succeeded but Breakdown failed: %v", err)
			}
		}
	})
}
