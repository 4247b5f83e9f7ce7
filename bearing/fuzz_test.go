package bearing

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

// FuzzTip runs every method on arbitrary input: no panic, and no NaN or
// Inf in a result returned without an error (DESIGN.md, principle 5).
// The seeds are typical soils of our own invention plus edge cases; no
// published source is checked here.
func FuzzTip(f *testing.F) {
	// phi deg, c kPa, su kPa, q kPa, k0, ir, g MPa, delta, l m, d m, n60, pa kPa, clamp, eta deg, class, nq, nc
	f.Add(32.0, 0.0, 0.0, 150.0, 0.0, 80.0, 0.0, 0.0, 18.0, 0.6, 25.0, 0.0, false, 90.0, 2, 40.0, 0.0)
	f.Add(0.0, 0.0, 60.0, 120.0, 0.0, 0.0, 9.0, 0.0, 12.0, 0.45, 0.0, 0.0, false, 0.0, 1, 9.0, 9.0)
	f.Add(47.0, 5.0, 0.0, 400.0, 1.2, 0.0, 40.0, 0.01, 3.0, 1.0, 90.0, 101.3, true, 105.0, 4, 200.0, 50.0)
	f.Add(math.NaN(), math.Inf(1), -1.0, -5.0, -0.5, -3.0, math.Inf(-1), 2.0, -1.0, 0.0, -7.0, 1e300, true, 200.0, 9, -1.0, math.NaN())
	f.Add(1e-12, 1e-9, 1e-9, 1e-300, 4.0, 1e5, 1e6, 0.5, 1e4, 1e-4, 200.0, 50.0, false, 60.0, 3, 1e4, 1e4)
	f.Fuzz(func(t *testing.T, phi, c, su, q, k0, ir, g, delta, l, d, n60, pa float64, clamp bool, eta float64, class int, nq, nc float64) {
		in := Input{
			Phi: deg(phi), C: units.Stress(c) * units.Kilopascal, Su: units.Stress(su) * units.Kilopascal,
			Q: units.Stress(q) * units.Kilopascal, K0: k0, Ir: ir, G: units.Stress(g) * units.Megapascal,
			Delta: delta, L: units.Length(l), D: units.Length(d), N60: n60, Pa: units.Stress(pa) * units.Kilopascal,
			Clamp: clamp,
		}
		methods := append(append(Drained(), Undrained()...),
			Janbu{Eta: deg(eta)}, APISand{Class: class}, GivenNq{Nq: nq, Nc: nc, Limit: units.Stress(su) * units.Kilopascal}, GivenNc{Nc: nc},
			Vesic{Volume: VolumeCorrelated}, VesicGiven{Nsigma: nq, Nc: nc}, BoredPhi{}, BoredPhi{NoCap: clamp},
			BoredSand{}, BoredSand{NoCap: clamp, NoLargeBase: !clamp}, LargeBase{Of: ShaftSand{}, Off: clamp}, LargeBase{})
		for _, m := range methods {
			r, err := m.Tip(in)
			if err != nil {
				if err.Error() == "" {
					t.Errorf("%s: empty error", m.ID())
				}
				continue
			}
			for _, v := range []float64{r.Nq, r.Nc, r.Ir, r.Delta, r.Irr, r.Reduction, float64(r.Sigma), float64(r.C),
				float64(r.Unlimited), float64(r.Limit), float64(r.Cap), float64(r.Qp)} {
				if math.IsNaN(v) || math.IsInf(v, 0) || v < 0 {
					t.Fatalf("%s: bad result %+v for %+v", m.ID(), r, in)
				}
			}
			if r.Qp > r.Unlimited || (r.Cap > 0 && r.Qp > r.Cap) || r.Reduction > 1 || r.Irr > r.Ir {
				t.Fatalf("%s: qp %v above unlimited %v or cap %v, or reduction %g above 1, or Irr %g above Ir %g", m.ID(), r.Qp, r.Unlimited, r.Cap, r.Reduction, r.Irr, r.Ir)
			}
		}
		for _, row := range Compare(in) {
			if row.Err == nil && (math.IsNaN(row.Factor) || math.IsInf(row.Factor, 0)) {
				t.Fatalf("compare %s: factor %g", row.ID, row.Factor)
			}
		}
	})
}
