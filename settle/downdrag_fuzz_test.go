// Source of the numbers in this file: fuzz inputs only; the checks are the
// unified method's own identities (largest force = Qd + drag load, neutral
// plane on the pile) and no NaN or Inf, so no published value is involved.

package settle

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

// FuzzDowndrag: the unified method never panics or hangs, and never
// returns NaN or Inf without an error; the largest force is Qd plus the
// drag load, and the neutral plane lies on the pile.
func FuzzDowndrag(f *testing.F) {
	f.Add(0.4, 20.0, 30e9, 20e3, 60e3, 5e6, 800e3, 0.2, 15.0, false, 0.0)
	f.Add(0.3, 5.0, 1e6, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, true, 0.0)
	f.Add(1e-3, 1e3, 1e15, 1e9, 0.0, 1e9, 1e12, 10.0, 1e-3, false, 1.0)
	f.Add(0.5, 1e12, 1e10, 1e3, 1e3, 1e6, 1e5, 0.1, 1e12, true, 0.5)
	f.Fuzz(func(t *testing.T, d, L, e, fs0, fs1, qp, load, s0, zg float64, given bool, share float64) {
		dd := Downdrag{Diameter: units.Length(d), EA: units.Force(e * math.Pi / 4 * d * d), Load: units.Force(load),
			Rows: []ShaftRow{{Top: 0, Bottom: units.Length(L / 2), Perimeter: units.Length(math.Pi * d), FsTop: units.Stress(fs0), FsBottom: units.Stress(fs1)},
				{Top: units.Length(L / 2), Bottom: units.Length(L), Perimeter: units.Length(math.Pi * d), FsTop: units.Stress(fs1), FsBottom: units.Stress(fs0)}},
			Tip:    TipSpring{Area: units.Circle(units.Length(d)), Qp: units.Stress(qp), Curve: APITip()},
			Ground: []SettlementPoint{{0, units.Length(s0)}, {units.Length(zg), 0}}}
		if given {
			dd.TipGiven, dd.TipForce = true, units.Force(share*qp*math.Pi/4*d*d)
		}
		r, err := dd.Solve()
		if err != nil {
			return
		}
		if !finite(float64(r.NeutralPlane), float64(r.DragLoad), float64(r.MaxForce), float64(r.TipForce),
			float64(r.GroundAtNP), float64(r.PileAtNP), float64(r.HeadSettlement), float64(r.Mismatch)) {
			t.Fatalf("not finite: %+v", r)
		}
		if r.NeutralPlane < 0 || r.NeutralPlane > units.Length(L) {
			t.Fatalf("neutral plane %v outside the pile 0 to %v", r.NeutralPlane, L)
		}
		if math.Abs(float64(r.MaxForce-r.Load-r.DragLoad)) > 1e-9*math.Max(1, float64(r.MaxForce)) {
			t.Fatalf("largest force %v ≠ Qd %v + drag %v", r.MaxForce, r.Load, r.DragLoad)
		}
		for _, p := range r.Points {
			if !finite(float64(p.Depth), float64(p.Down), float64(p.Up), float64(p.Force), float64(p.Ground), float64(p.Pile)) {
				t.Fatalf("point not finite: %+v", p)
			}
		}
	})
}
