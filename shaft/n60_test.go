// Sources of the numbers in this file:
//   - A printed solved problem, "Single-Pile-09: The friction of a concrete
//     pile in granular soils" (a collection of solved geotechnical problems,
//     page 502, as stored at scribd.com/document/377492500), read: with
//     pa = 2 ksf (printed "2 ksi"; the arithmetic is in ksf) and a mean
//     N = 25 along the shaft of a 14 in square displacement pile, the shaft
//     term is 0.02(2)(25)(4.67)L = 4.67L kips (L in ft), that is
//     fs = 0.02·2·25 = 1 ksf, and L = (300 − 272)/4.67 = 6 ft.
//   - Closed forms of fs = 0.02·pa·N60 and 0.01·pa·N60 for the other cases
//     and the property test (the rule as the method documents it).

package shaft

import (
	"math"
	"testing"

	"pgregory.net/rapid"

	"github.com/qultgeo/qult/units"
)

func TestDrivenN60Printed(t *testing.T) {
	r, err := DrivenN60{}.Unit(Point{N60: 25, Pa: 2 * units.KSF})
	if err != nil {
		t.Fatal(err)
	}
	if got := float64(r.Fs / units.KSF); math.Abs(got-1) > 1e-9 {
		t.Errorf("fs = %g ksf, want 1 ksf (Single-Pile-09, p. 502)", got)
	}
	// The printed length: 300 kips less the 272 kip tip, over the shaft
	// force per foot, fs·4·(14 in) = 4.67 kips/ft as printed: 6 ft.
	perFt := units.ForceOn(r.Fs, units.Rectangle(4*14*units.Inch, units.Foot)).Kips()
	if math.Abs(perFt-4.67)/4.67 > 0.01 {
		t.Errorf("shaft force %g kips/ft, want 4.67 within 1 %% (Single-Pile-09, p. 502)", perFt)
	}
	if l := (300 - 272) / perFt; math.Abs(l-6)/6 > 0.01 {
		t.Errorf("L = %g ft, want 6 ft within 1 %% (Single-Pile-09, p. 502)", l)
	}
}

func TestDrivenN60ClosedForm(t *testing.T) {
	cases := []struct {
		m    DrivenN60
		p    Point
		want units.Stress
	}{
		{DrivenN60{}, Point{N60: 20}, 0.02 * 100 * 20 * kPa},                    // 40 kPa
		{DrivenN60{Low: true}, Point{N60: 20}, 0.01 * 100 * 20 * kPa},           // 20 kPa
		{DrivenN60{}, Point{N60: 33, Pa: 101.3 * kPa}, 0.02 * 101.3 * 33 * kPa}, // pa given
	}
	for _, c := range cases {
		r, err := c.m.Unit(c.p)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(float64(r.Fs-c.want)) > 1e-12*float64(c.want) || r.Fs != r.Unlimited {
			t.Errorf("%+v %+v: fs %g kPa, want %g", c.m, c.p, r.Fs.KPa(), c.want.KPa())
		}
	}
	for _, p := range []Point{{}, {N60: -1}, {N60: 101}, {N60: math.Inf(1)}, {N60: 10, Pa: 60 * kPa}} {
		if _, err := (DrivenN60{}).Unit(p); err == nil {
			t.Errorf("%+v: want an error", p)
		}
	}
}

func TestDrivenN60Catalogue(t *testing.T) {
	// The displacement factor by the pile's installation unless given, and
	// a bored pile refused (the method doc; common practice for the split).
	d, _ := Lookup("driven-n60-shaft")
	for _, c := range []struct {
		v    Values
		low  bool
		fail bool
	}{
		{Values{Installation: DrivenHigh}, false, false},
		{Values{Installation: DrivenLow}, true, false},
		{Values{Installation: DrivenHigh, Word: map[string]string{"displacement": "low"}}, true, false},
		{Values{Word: map[string]string{"displacement": "high"}}, false, false},
		{Values{Installation: Bored}, false, true},
		{Values{Installation: Bored, Word: map[string]string{"displacement": "high"}}, false, true},
		{Values{}, false, true},
	} {
		ch, err := d.New(c.v)
		if (err != nil) != c.fail {
			t.Errorf("%+v: err %v, want failure %v", c.v, err, c.fail)
			continue
		}
		if err == nil && ch.Unit.(DrivenN60).Low != c.low {
			t.Errorf("%+v: %+v, want Low %v", c.v, ch.Unit, c.low)
		}
	}
}

// TestPropDrivenN60: fs is proportional to N60 and to pa, and the
// small-displacement value is half the displacement one (the rule's closed
// form), for every accepted input.
func TestPropDrivenN60(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		n := rapid.Float64Range(0.01, 50).Draw(t, "n60")
		pa := units.Stress(rapid.Float64Range(80, 120).Draw(t, "pa")) * kPa
		hi, err1 := DrivenN60{}.Unit(Point{N60: n, Pa: pa})
		hi2, err2 := DrivenN60{}.Unit(Point{N60: 2 * n, Pa: pa})
		lo, err3 := DrivenN60{Low: true}.Unit(Point{N60: n, Pa: pa})
		if err1 != nil || err2 != nil || err3 != nil {
			t.Fatal(err1, err2, err3)
		}
		if rel(float64(hi2.Fs), 2*float64(hi.Fs)) > 1e-12 || rel(float64(lo.Fs), float64(hi.Fs)/2) > 1e-12 ||
			rel(float64(hi.Fs), 0.02*n*float64(pa)) > 1e-12 {
			t.Fatalf("N60 %g pa %g: fs %g, %g at 2·N60, %g small displacement", n, pa, hi.Fs, hi2.Fs, lo.Fs)
		}
	})
}
