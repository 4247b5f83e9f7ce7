package settle

// Where the numbers come from: a worked example of negative skin friction
// on a pile group in a cohesive fill, printed with its solution on
// holooly.com ("Question 15.28": a square group like the textbook's
// Fig. 15.27, a fill Ln = 3 m deep, piles of 30 cm at 90 cm centres,
// qu = 60 kN/m², γ = 15 kN/m³; solution by the textbook's Eqs 15.82 and
// 15.83, the book not named on the page, whose numbering matches Murthy's
// Geotechnical Engineering, chapter 15, from memory). Read: cu = 60/2 =
// 30 kN/m², (a) Fng = n·Fn = 9 × 3.14 × 0.3 × 3 × 30 = 763 kN; (b) the
// block, 30 × 3 × 12 + 15 × 3 × 9 = 1485 kN, governs the group (not a
// single-pile quantity; not compared here).

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

// TestDowndragCohesiveFillGroup: the drag load on one pile in a cohesive
// fill, Fn = p·Ln·cu (adhesion equal to cu, the source's convention),
// found by the unified method with the source's conditions: negative skin
// friction fs = cu over the fill, which settles past the pile all the way
// down (the ground settling from the head to the base of the fill), and
// the pile bearing below the fill (the tip force at the base of the fill
// taking all that arrives, so the neutral plane is the base of the fill).
// Nine piles: the printed 763 kN (π as 3.14 gives 763.0, π itself
// 763.4): ±0.5 kN, the printed rounding.
func TestDowndragCohesiveFillGroup(t *testing.T) {
	const ln, d, cu = 3.0, 0.3, 30e3
	p := math.Pi * d
	dd := Downdrag{Rows: []ShaftRow{{Top: 0, Bottom: ln, Perimeter: units.Length(p), FsTop: cu, FsBottom: cu}},
		EA: 1e12, Tip: TipSpring{Area: 1, Qp: 1e12}, TipGiven: true, TipForce: 1e8,
		Ground: []SettlementPoint{{Depth: 0, Settlement: 0.05}, {Depth: ln, Settlement: 0}}}
	res, err := dd.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(float64(res.NeutralPlane)-ln) > 1e-9 {
		t.Errorf("neutral plane %.4f m, want the base of the fill, %.1f m", float64(res.NeutralPlane), ln)
	}
	if got := 9 * res.DragLoad.KN(); math.Abs(got-763) > 0.5 {
		t.Errorf("n·Fn = %.2f kN, printed 763 kN", got)
	}
}
