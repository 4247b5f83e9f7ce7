// Sources of the numbers in this file:
//   - A printed solved problem, "Single-Pile-09: The friction of a concrete
//     pile in granular soils" (a collection of solved geotechnical problems,
//     page 502, as stored at scribd.com/document/377492500), read: a 14 in
//     square pile in sand with N = 25 and pa = 2 ksf (printed "2 ksi", the
//     arithmetic is in ksf) takes the tip as 4·pa·N·Ap = 4(2)(25)(1.36) =
//     272 kips, that is qp = 200 ksf = 9576 kPa at the limit. The problem
//     does not apply the L/D rule (its 6 ft pile is only about 5 widths
//     long); only the limiting unit value is checked against it.
//   - Closed forms of qp = 0.4·pa·N60·Lb/D ≤ 4·pa·N60 (the rule as the
//     method documents it) for the Lb/D part and the limit's change point.

package bearing

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

func TestDrivenN60Printed(t *testing.T) {
	ksf := units.KSF
	r, err := DrivenN60{}.Tip(Input{N60: 25, Pa: 2 * ksf})
	if err != nil {
		t.Fatal(err)
	}
	// Printed: 4(2)(25) = 200 ksf; the tip force 272 kips on Ap = 1.36 ft².
	if got := r.Qp / ksf; math.Abs(float64(got)-200) > 1e-9*200 {
		t.Errorf("qp = %g ksf, want 200 ksf (Single-Pile-09, p. 502)", got)
	}
	ap := units.Rectangle(units.Foot, 1.36*units.Foot)
	if q := units.ForceOn(r.Qp, ap); math.Abs(q.Kips()-272)/272 > 0.01 {
		t.Errorf("Qp = %g kips, want 272 kips within 1 %% (Single-Pile-09, p. 502)", q.Kips())
	}
}

func TestDrivenN60ClosedForm(t *testing.T) {
	kPa := units.Kilopascal
	cases := []struct {
		n60   float64
		lb, d units.Length
		pa    units.Stress
		want  units.Stress
	}{
		{30, 4, 0.4, 0, 0.4 * 100 * 30 * 10 * kPa},              // Lb/D = 10: the rule meets its limit, 12 000 kPa
		{30, 2, 0.4, 0, 0.4 * 100 * 30 * 5 * kPa},               // Lb/D = 5: half the limit
		{30, 8, 0.4, 0, 4 * 100 * 30 * kPa},                     // Lb/D = 20: the limit governs
		{12, 1.5, 0.5, 95.76 * kPa, 0.4 * 95.76 * 12 * 3 * kPa}, // pa = 1 tsf, Lb/D = 3
	}
	for _, c := range cases {
		got, err := DrivenN60Tip(c.n60, c.lb, c.d, c.pa)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(float64(got-c.want)) > 1e-9*float64(c.want) {
			t.Errorf("N60 %g Lb %g D %g: qp %g kPa, want %g", c.n60, c.lb, c.d, got.KPa(), c.want.KPa())
		}
	}
	for _, in := range []Input{{N60: 0}, {N60: -3}, {N60: 201}, {N60: math.NaN()}, {N60: 10, Pa: 200 * kPa}} {
		if _, err := (DrivenN60{}).Tip(in); err == nil {
			t.Errorf("%+v: want an error", in)
		}
	}
	if _, err := DrivenN60Tip(10, 0, 0.4, 0); err == nil {
		t.Error("Lb = 0: want an error")
	}
}
