package insitu

// Where the numbers of this file come from. No printed worked example of
// the direct CPT methods could be reached (the papers, FHWA-TS-78-209 and
// the texts that reproduce their worked examples were not readable here),
// and neither could the methods' tables of kc, α, fs,max or Cs: those are
// given by the engineer. The checks below are therefore of two kinds:
//   - closed form: a sounding built so that the averaging rule has an
//     answer worked by hand in the comment beside each case (uniform
//     soundings, steps, linear runs);
//   - properties (rapid): homogeneity in qc and monotonicity.
// The readings are invented scenarios.

import (
	"errors"
	"math"
	"slices"
	"strings"
	"testing"

	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

const mpa = float64(units.Megapascal)

// soundingOf builds a piezocone sounding with readings at the depths zs,
// qc in MPa, and u2 in MPa (area ratio a; u2 nil for u2 = 0 throughout).
func soundingOf(zs, qc, u2 []float64, a float64) *Sounding {
	s := &Sounding{ID: "T", AreaRatio: a, HasU2: true}
	for i, z := range zs {
		r := Row{Depth: units.Length(z), Qc: units.Stress(qc[i] * mpa)}
		if u2 != nil {
			r.U2 = units.Stress(u2[i] * mpa)
		}
		s.Rows = append(s.Rows, r)
	}
	return s
}

// steps builds readings every h from z0 to z1 with qc given by f (MPa).
func steps(z0, z1, h float64, f func(z float64) float64) ([]float64, []float64) {
	var zs, qs []float64
	n := int(math.Round((z1 - z0) / h))
	for i := 0; i <= n; i++ {
		z := z0 + float64(i)*h
		zs, qs = append(zs, z), append(qs, f(z))
	}
	return zs, qs
}

func cone(t testing.TB, s *Sounding) *Cone {
	t.Helper()
	c, err := NewCone(s)
	if err != nil {
		t.Fatal(err)
	}
	return c
}

// TestDirectUniform: in a uniform sounding every average is the reading
// itself, so qp = factor·qc and ∫fs dz = fs·L (closed form).
func TestDirectUniform(t *testing.T) {
	// qc 12 MPa, u2 0.3 MPa, a = 0.8: qt = 12 + 0.3 × 0.2 = 12.06 MPa,
	// qE = qt − u2 = 11.76 MPa.
	zs, qs := steps(0, 30, 0.02, func(float64) float64 { return 12 })
	u := make([]float64, len(zs))
	for i := range u {
		u[i] = 0.3
	}
	c := cone(t, soundingOf(zs, qs, u, 0.8))
	b := 0.5 * units.Metre
	tip := 15 * units.Metre
	cases := []struct {
		m    DirectTip
		want float64 // kPa
	}{
		{LCPCTip{Kc: 0.4}, 0.4 * 12000},                       // kc·qc
		{LCPCTip{Kc: 0.4, Limit: 4 * units.Megapascal}, 4000}, // limit governs
		{SchmertmannTip{Limit: 15 * units.Megapascal}, 12000}, // (qc1 + qc2)/2 = qc
		{SchmertmannTip{Limit: 10 * units.Megapascal}, 10000}, // limit governs
		{EslamiFelleniusTip{}, 11760},                         // Ct = 1: qEg = qE
		{EslamiFelleniusTip{Ct: 0.5}, 5880},                   // Ct·qE
	}
	for _, tc := range cases {
		r, err := tc.m.Tip(c, tip, b)
		if err != nil || math.Abs(r.Qp.KPa()-tc.want) > 1e-9*tc.want {
			t.Errorf("%s %+v: qp = %.9g kPa, %v; want %g", tc.m.ID(), tc.m, r.Qp.KPa(), err, tc.want)
		}
	}
	shafts := []struct {
		m    DirectShaft
		want float64 // kPa
	}{
		{LCPCShaft{Alpha: 150, Limit: 120 * units.Kilopascal}, 80}, // 12000/150
		{LCPCShaft{Alpha: 60, Limit: 120 * units.Kilopascal}, 120}, // 200 capped
		{EslamiFelleniusShaft{Cs: 0.01}, 117.6},                    // 0.01 × 11760
	}
	for _, tc := range shafts {
		f, _, err := tc.m.Unit(c, 3.3*units.Metre, 0.4*units.Metre)
		if err != nil || math.Abs(f.KPa()-tc.want) > 1e-9*tc.want {
			t.Errorf("%s: fs = %.9g kPa, %v; want %g", tc.m.ID(), f.KPa(), err, tc.want)
		}
		q, _, err := tc.m.Integral(c, 2*units.Metre, 9.5*units.Metre, 0.4*units.Metre)
		if want := tc.want * 1e3 * 7.5; err != nil || math.Abs(q-want) > 1e-9*want {
			t.Errorf("%s: ∫fs dz = %.9g N/m, %v; want %g", tc.m.ID(), q, err, want)
		}
	}
}

// TestLCPCClipping: a step in qc inside the zone tip ± 1.5B. B = 0.6 m,
// tip 10 m: zone 9.1 to 10.9 m (1.8 m). qc 5 MPa down to 9.7 m (a third
// of the zone), 20 MPa below. Raw mean (0.6×5 + 1.2×20)/1.8 = 15 MPa;
// clipped to 10.5…19.5 MPa: (0.6×10.5 + 1.2×19.5)/1.8 = 16.5 MPa;
// qp = 0.4 × 16.5 = 6.6 MPa (closed form).
func TestLCPCClipping(t *testing.T) {
	zs := []float64{8, 9.7, 9.700001, 12}
	qs := []float64{5, 5, 20, 20}
	c := cone(t, soundingOf(zs, qs, nil, 1))
	r, err := LCPCTip{Kc: 0.4}.Tip(c, 10*units.Metre, 0.6*units.Metre)
	if err != nil {
		t.Fatal(err)
	}
	// the 1 µm ramp moves the means by less than 1e-5 MPa
	if math.Abs(r.Cone.KPa()-16500) > 0.02 || math.Abs(r.Qp.KPa()-6600) > 0.01 || math.Abs(r.Raw.KPa()-15000) > 0.02 {
		t.Errorf("qca = %.6f kPa (mean %.6f), qp = %.6f kPa; want 16500 (15000) and 6600", r.Cone.KPa(), r.Raw.KPa(), r.Qp.KPa())
	}
	if math.Abs(r.Top.Metres()-9.1) > 1e-12 || math.Abs(r.Bottom.Metres()-10.9) > 1e-12 {
		t.Errorf("zone %v to %v; want 9.1 to 10.9 m", r.Top, r.Bottom)
	}
}

// TestLCPCClippedLinear: qc linear from 4 to 16 MPa across the zone (tip
// 10 m, B = 0.4 m, zone 9.4 to 10.6 m) has its mean 10 MPa at the tip;
// clipped to 7…13 MPa the lowest quarter is held at 7, the highest at 13,
// the middle half averages 10: mean 0.25×7 + 0.5×10 + 0.25×13 = 10 MPa.
// The shaft with α = 100 and fs,max = 0.1 MPa (qc held at 10 MPa) over
// 9.4 to 10.6 m: the line passes 10 MPa at 10 m; below, its mean is
// 7 MPa, above it is held at 10: (0.6×7 + 0.6×10)/100 = 0.102 MPa·m
// (closed form).
func TestLCPCClippedLinear(t *testing.T) {
	zs, qs := steps(9.3, 10.7, 0.1, func(z float64) float64 { return 10 + (z-10)*10 })
	c := cone(t, soundingOf(zs, qs, nil, 1))
	r, err := LCPCTip{Kc: 1}.Tip(c, 10*units.Metre, 0.4*units.Metre)
	if err != nil || math.Abs(r.Qp.KPa()-10000) > 1e-6 {
		t.Errorf("qp = %.9g kPa, %v; want 10000", r.Qp.KPa(), err)
	}
	q, lim, err := LCPCShaft{Alpha: 100, Limit: 100 * units.Kilopascal}.Integral(c, 9.4*units.Metre, 10.6*units.Metre, 0.4*units.Metre)
	if err != nil || !lim || math.Abs(q-0.102*mpa) > 1e-6 {
		t.Errorf("∫fs dz = %.9g N/m, limited %v, %v; want %g", q, lim, err, 0.102*mpa)
	}
}

// TestSchmertmannMinimumPath: tip 10 m, B = 0.5 m. qc 10 MPa above the
// tip, 12 MPa from 10 to 10.6 m, 6 MPa below (a weaker layer within 4B).
// For a depth d below the tip beyond 0.6 m the path below is
// qcI = (12×0.6 + 6×(d − 0.6))/d and qcII = 6 (the least below), and the
// path above is held at 6: qp = ((qcI + 6)/2 + 6)/2, least at d = 4B = 2 m:
// qcI = 7.8, qc1 = 6.9, qc2 = 6, qp = 6.45 MPa. Shallower d (≤ 0.6 m):
// qc1 = 12, qc2 = 10, qp = 11 (not the least). Closed form.
func TestSchmertmannMinimumPath(t *testing.T) {
	zs := []float64{5, 9.999999, 10, 10.6, 10.600001, 13}
	qs := []float64{10, 10, 12, 12, 6, 6}
	c := cone(t, soundingOf(zs, qs, nil, 1))
	r, err := SchmertmannTip{Limit: 15 * units.Megapascal}.Tip(c, 10*units.Metre, 0.5*units.Metre)
	if err != nil {
		t.Fatal(err)
	}
	for _, v := range []struct {
		name      string
		got, want float64
	}{{"qp", r.Qp.KPa(), 6450}, {"qc1", r.Qc1.KPa(), 6900}, {"qc2", r.Qc2.KPa(), 6000}} {
		if math.Abs(v.got-v.want) > 0.01 {
			t.Errorf("%s = %.6f kPa; want %g", v.name, v.got, v.want)
		}
	}
}

// TestEslamiFelleniusGeometric: qE 4 MPa from 8B to 2B above the tip and
// 16 MPa from 2B above to 4B below (tip 10 m, B = 0.25 m). Over 8B to 4B
// (3 m): ln mean = (1.5 ln 4 + 1.5 ln 16)/3 = ln 8, qEg = 8 MPa; over 2B
// to 4B it is 16 MPa. The lesser, 8 MPa, gives qp = Ct·qEg = 8 MPa with
// Ct = 1 (closed form). Without u2 and a = 1, qE = qc.
func TestEslamiFelleniusGeometric(t *testing.T) {
	zs := []float64{7, 9.5, 9.500001, 12}
	qs := []float64{4, 4, 16, 16}
	c := cone(t, soundingOf(zs, qs, nil, 1))
	r, err := EslamiFelleniusTip{}.Tip(c, 10*units.Metre, 0.25*units.Metre)
	if err != nil || math.Abs(r.Qp.KPa()-8000) > 0.05 || r.Factor != 1 {
		t.Errorf("qp = %.6f kPa (factor %g), %v; want 8000", r.Qp.KPa(), r.Factor, err)
	}
	if math.Abs(r.Top.Metres()-8) > 1e-12 {
		t.Errorf("zone top %v; want 8 m (8B above)", r.Top)
	}
	// Entering a weaker layer: 16 MPa above 9.5 m, 4 below. Over 8B to 4B:
	// (1.5 ln 16 + 1.5 ln 4)/3 = ln 8; over 2B to 4B (1.5 m): (0 + 1.5 ln 4)/1.5
	// = ln 4. The lesser: 4 MPa.
	c = cone(t, soundingOf(zs, []float64{16, 16, 4, 4}, nil, 1))
	r, err = EslamiFelleniusTip{}.Tip(c, 10*units.Metre, 0.25*units.Metre)
	if err != nil || math.Abs(r.Qp.KPa()-4000) > 0.05 || math.Abs(r.Top.Metres()-9.5) > 1e-12 {
		t.Errorf("qp = %.6f kPa from %v, %v; want 4000 from 9.5 m", r.Qp.KPa(), r.Top, err)
	}
}

// TestEslamiFelleniusEffective: qE = qt − u2 with qt = qc + u2(1 − a):
// qc 2 MPa, u2 0.5 MPa, a = 0.75: qt = 2.125, qE = 1.625 MPa; Cs = 0.05
// gives fs = 81.25 kPa (closed form).
func TestEslamiFelleniusEffective(t *testing.T) {
	c := cone(t, soundingOf([]float64{1, 2}, []float64{2, 2}, []float64{0.5, 0.5}, 0.75))
	f, _, err := EslamiFelleniusShaft{Cs: 0.05}.Unit(c, 1.5*units.Metre, 0.4*units.Metre)
	if err != nil || math.Abs(f.KPa()-81.25) > 1e-9 {
		t.Errorf("fs = %.12g kPa, %v; want 81.25", f.KPa(), err)
	}
}

// TestLCPCShaftLimitLinear: qc = 1 MPa per metre of depth from 1 to 10 m,
// α = 100, fs,max = 50 kPa: fs = 10 kPa/m·z up to 5 m, 50 kPa below.
// ∫ from 1 to 10 m = (10 + 50)/2 × 4 + 50 × 5 = 370 kPa·m (closed form).
func TestLCPCShaftLimitLinear(t *testing.T) {
	zs, qs := steps(1, 10, 0.25, func(z float64) float64 { return z })
	c := cone(t, soundingOf(zs, qs, nil, 1))
	q, lim, err := LCPCShaft{Alpha: 100, Limit: 50 * units.Kilopascal}.Integral(c, 1*units.Metre, 10*units.Metre, 0.4*units.Metre)
	if err != nil || !lim || math.Abs(q-370e3) > 1e-6 {
		t.Errorf("∫fs dz = %.9g N/m, limited %v, %v; want 370000", q, lim, err)
	}
	// from 2.1 to 3.3 m, below the limit: (21 + 33)/2 × 1.2 = 32.4 kPa·m
	q, lim, err = LCPCShaft{Alpha: 100, Limit: 50 * units.Kilopascal}.Integral(c, 2.1*units.Metre, 3.3*units.Metre, 0.4*units.Metre)
	if err != nil || lim || math.Abs(q-32.4e3) > 1e-6 {
		t.Errorf("∫fs dz = %.9g N/m, limited %v, %v; want 32400", q, lim, err)
	}
}

// TestDirectErrors: a zone the sounding does not cover, no readings, and
// values outside the methods' ranges are errors naming what is wrong.
func TestDirectErrors(t *testing.T) {
	zs, qs := steps(1, 12, 0.05, func(float64) float64 { return 8 })
	c := cone(t, soundingOf(zs, qs, nil, 1))
	b := 0.5 * units.Metre
	var ze *ZoneError
	for _, m := range []DirectTip{LCPCTip{Kc: 0.4}, SchmertmannTip{Limit: units.Megapascal}, EslamiFelleniusTip{}} {
		// 4B below the tip at 11 m is 13 m, beyond the last reading at 12 m
		// (LCPC reaches 11.75 m: its tip at 11.8 m).
		tip := 11 * units.Metre
		if m.ID() == "lcpc" {
			tip = 11.8 * units.Metre
		}
		if _, err := m.Tip(c, tip, b); !errors.As(err, &ze) || ze.Method != m.ID() || !(ze.Bottom > 12) {
			t.Errorf("%s below the sounding: %v; want a ZoneError", m.ID(), err)
		}
		if _, err := m.Tip(c, 1.2*units.Metre, b); !errors.As(err, &ze) {
			t.Errorf("%s above the first reading: %v; want a ZoneError", m.ID(), err)
		}
		if _, err := m.Tip(&Cone{}, 5*units.Metre, b); !errors.As(err, &ze) {
			t.Errorf("%s with no reading: %v; want a ZoneError", m.ID(), err)
		}
		if _, err := m.Tip(c, 5*units.Metre, 0); err == nil {
			t.Errorf("%s with B = 0: no error", m.ID())
		}
	}
	for _, m := range []DirectShaft{LCPCShaft{Alpha: 100, Limit: 100 * units.Kilopascal}, EslamiFelleniusShaft{Cs: 0.01}} {
		if _, _, err := m.Integral(c, 0, 5*units.Metre, 0.4*units.Metre); !errors.As(err, &ze) {
			t.Errorf("%s from the surface, sounding from 1 m: %v; want a ZoneError", m.ID(), err)
		}
	}
	bad := []error{
		func() error { _, err := (LCPCTip{Kc: 1.5}).Tip(c, 5*units.Metre, b); return err }(),
		func() error { _, err := (SchmertmannTip{}).Tip(c, 5*units.Metre, b); return err }(),
		func() error { _, err := (EslamiFelleniusTip{Ct: 2}).Tip(c, 5*units.Metre, b); return err }(),
		func() error {
			_, _, err := (LCPCShaft{Alpha: 5, Limit: 1}).Unit(c, 5*units.Metre, 0.4*units.Metre)
			return err
		}(),
		func() error { _, _, err := (LCPCShaft{Alpha: 50}).Unit(c, 5*units.Metre, 0.4*units.Metre); return err }(),
		func() error {
			_, _, err := (EslamiFelleniusShaft{}).Unit(c, 5*units.Metre, 0.4*units.Metre)
			return err
		}(),
	}
	for i, err := range bad {
		if err == nil {
			t.Errorf("bad value %d: no error", i)
		}
	}
	noU2 := soundingOf(zs, qs, nil, 1)
	noU2.HasU2 = false
	cu := cone(t, noU2)
	if _, err := (EslamiFelleniusTip{}).Tip(cu, 5*units.Metre, b); err == nil || !strings.Contains(err.Error(), "no u2") {
		t.Errorf("eslami-fellenius tip without u2: %v; want an error", err)
	}
	if _, _, err := (EslamiFelleniusShaft{Cs: 0.01}).Integral(cu, 2*units.Metre, 5*units.Metre, 0.4*units.Metre); err == nil {
		t.Error("eslami-fellenius shaft without u2: no error")
	}
	if _, err := (LCPCTip{Kc: 0.4}).Tip(cu, 5*units.Metre, b); err != nil {
		t.Errorf("lcpc without u2: %v; it reads qc only", err)
	}
	for _, s := range []*Sounding{
		soundingOf([]float64{1, 1}, []float64{1, 1}, nil, 1),             // depth not increasing
		soundingOf([]float64{1, 2}, []float64{1, 0}, nil, 1),             // qc 0
		soundingOf([]float64{1, 2}, []float64{1, 1}, []float64{0, 2}, 1), // qE = 1 − 2 < 0
		soundingOf([]float64{1, math.NaN()}, []float64{1, 1}, nil, 1),    // NaN depth
		{},
	} {
		if _, err := NewCone(s); err == nil {
			t.Errorf("NewCone(%+v): no error", s.Rows)
		}
	}
}

// drawCone draws a sounding of 20 to 200 readings from 0.5 m down with qc
// from 0.2 to 40 MPa.
func drawCone(r *rapid.T) (zs, qs []float64) {
	n := rapid.IntRange(20, 200).Draw(r, "n")
	h := rapid.Float64Range(0.01, 0.1).Draw(r, "h")
	for i := range n {
		zs = append(zs, 0.5+float64(i)*h)
		qs = append(qs, rapid.Float64Range(0.2, 40).Draw(r, "qc"))
	}
	return zs, qs
}

// TestPropDirectHomogeneousMonotone: every averaging rule is homogeneous
// of degree one in qc (scaling the sounding by k scales qp and ∫fs dz by
// k, without limits) and never falls when one reading rises (properties
// of the rules).
func TestPropDirectHomogeneousMonotone(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		zs, qs := drawCone(r)
		b := rapid.Float64Range(0.005, (zs[len(zs)-1]-zs[0])/13).Draw(r, "b")
		lo, hi := zs[0]+8*b+1e-9, zs[len(zs)-1]-4*b-1e-9 // inside the zone by more than rounding
		tip := units.Length(rapid.Float64Range(lo, hi).Draw(r, "tip"))
		// k·qc stays at or below 80 MPa, under the minimum path's 100 MPa
		// limit below which the rule is homogeneous.
		k := rapid.Float64Range(0.5, 2).Draw(r, "k")
		j := rapid.IntRange(0, len(qs)-1).Draw(r, "j")
		rise := rapid.Float64Range(0, 20).Draw(r, "rise")
		scaled := make([]float64, len(qs))
		raised := append([]float64(nil), qs...)
		raised[j] += rise
		for i := range qs {
			scaled[i] = k * qs[i]
		}
		c0, _ := NewCone(soundingOf(zs, qs, nil, 1))
		ck, _ := NewCone(soundingOf(zs, scaled, nil, 1))
		cr, _ := NewCone(soundingOf(zs, raised, nil, 1))
		bl := units.Length(b)
		for _, m := range []DirectTip{LCPCTip{Kc: 0.45}, SchmertmannTip{Limit: 100 * units.Megapascal}, EslamiFelleniusTip{}} {
			q0, err0 := m.Tip(c0, tip, bl)
			qk, errk := m.Tip(ck, tip, bl)
			qr, errr := m.Tip(cr, tip, bl)
			if err0 != nil || errk != nil || errr != nil {
				r.Fatalf("%s: %v %v %v", m.ID(), err0, errk, errr)
			}
			if math.Abs(float64(qk.Qp)-k*float64(q0.Qp)) > 1e-9*k*float64(q0.Qp) {
				r.Fatalf("%s: qp(k·qc) = %g, k·qp(qc) = %g", m.ID(), float64(qk.Qp), k*float64(q0.Qp))
			}
			if float64(qr.Qp) < float64(q0.Qp)*(1-1e-12) {
				r.Fatalf("%s: raising reading %d by %g MPa lowers qp from %g to %g", m.ID(), j, rise, float64(q0.Qp), float64(qr.Qp))
			}
			if math.IsNaN(float64(q0.Qp)) || q0.Qp <= 0 {
				r.Fatalf("%s: qp = %g", m.ID(), float64(q0.Qp))
			}
		}
		z0 := units.Length(zs[0])
		z1 := units.Length(rapid.Float64Range(zs[0], zs[len(zs)-1]).Draw(r, "z1"))
		for _, m := range []DirectShaft{LCPCShaft{Alpha: 300, Limit: units.Megapascal}, EslamiFelleniusShaft{Cs: 0.01}} {
			f0, _, _ := m.Integral(c0, z0, z1, 0.4*units.Metre)
			fk, _, _ := m.Integral(ck, z0, z1, 0.4*units.Metre)
			fr, _, _ := m.Integral(cr, z0, z1, 0.4*units.Metre)
			if math.Abs(fk-k*f0) > 1e-9*k*f0+1e-9 || fr < f0*(1-1e-12) {
				r.Fatalf("%s: ∫ %g, scaled %g (k %g), raised %g", m.ID(), f0, fk, k, fr)
			}
		}
	})
}

// TestPropConeIntegralAdds: the exact integral over [a, c] is the sum over
// [a, b] and [b, c], and the mean of a constant is the constant (exact
// arithmetic of the trapezoidal rule).
func TestPropConeIntegralAdds(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		zs, qs := drawCone(r)
		c, _ := NewCone(soundingOf(zs, qs, nil, 1))
		x := []float64{
			rapid.Float64Range(zs[0], zs[len(zs)-1]).Draw(r, "a"),
			rapid.Float64Range(zs[0], zs[len(zs)-1]).Draw(r, "b"),
			rapid.Float64Range(zs[0], zs[len(zs)-1]).Draw(r, "c"),
		}
		// Sorted, not the middle one as a sum less the least and the
		// greatest, which rounding can take out of the readings.
		slices.Sort(x)
		a, b, cc := x[0], x[1], x[2]
		whole := c.integral(c.qc, c.cqc, a, cc)
		parts := c.integral(c.qc, c.cqc, a, b) + c.integral(c.qc, c.cqc, b, cc)
		if math.Abs(whole-parts) > 1e-9*math.Abs(whole)+1e-6 {
			r.Fatalf("∫ over [%g, %g] = %g; parts %g", a, cc, whole, parts)
		}
		// clipping with bounds outside the values changes nothing
		if cc > a {
			m := c.mean(c.qc, c.cqc, a, cc)
			cm := c.clippedMean(c.qc, a, cc, 0, 1e12)
			if math.Abs(m-cm) > 1e-9*m {
				r.Fatalf("mean %g, clipped with wide bounds %g", m, cm)
			}
		}
	})
}

// TestSchmertmannShafts: sleeve friction 50 kPa from the surface to 12 m
// (every 0.1 m; invented). Sand, K = 1.2, B = 0.5 m (8B = 4 m): over 0 to
// 10 m, ∫ = K·fs·(4/2 + 6) = 1.2 × 50 × 8 = 480 kPa·m; at 2 m, fs = 1.2 ×
// 0.5 × 50 = 30 kPa. With a limit of 40 kPa, K·w·fs = 15 kPa/m·z reaches
// it at 8/3 m: ∫ = 0.5 × 8/3 × 40 + 40 × (10 − 8/3) = 346.67 kPa·m (the
// piece holding the kink is taken by Simpson's rule: within 0.01 %).
// Clay, α′ = 0.8: 40 kPa, ∫ over 2 to 7 m = 200 kPa·m; limited to 30 kPa:
// 150 kPa·m (closed forms).
func TestSchmertmannShafts(t *testing.T) {
	s := &Sounding{ID: "S", AreaRatio: 1}
	for i := 0; i <= 120; i++ {
		s.Rows = append(s.Rows, Row{Depth: units.Length(float64(i) / 10), Qc: 5 * units.Megapascal, Fs: 50 * units.Kilopascal})
	}
	c := cone(t, s)
	b := 0.5 * units.Metre
	q, lim, err := SchmertmannSandShaft{K: 1.2}.Integral(c, 0, 10*units.Metre, b)
	if err != nil || lim || math.Abs(q-480e3) > 1e-6 {
		t.Errorf("sand ∫ = %.9g N/m, %v, %v; want 480000", q, lim, err)
	}
	f, _, err := SchmertmannSandShaft{K: 1.2}.Unit(c, 2*units.Metre, b)
	if err != nil || math.Abs(f.KPa()-30) > 1e-9 {
		t.Errorf("sand fs at 2 m = %.12g kPa, %v; want 30", f.KPa(), err)
	}
	q, lim, err = SchmertmannSandShaft{K: 1.2, Limit: 40 * units.Kilopascal}.Integral(c, 0, 10*units.Metre, b)
	if want := 0.5*8.0/3*40e3 + 40e3*(10-8.0/3); err != nil || !lim || math.Abs(q-want) > 1e-4*want {
		t.Errorf("sand ∫ with limit = %.9g N/m, %v, %v; want %g", q, lim, err, want)
	}
	// below 8B the taper no longer acts: ∫ over 5 to 9 m = 1.2 × 50 × 4
	q, _, err = SchmertmannSandShaft{K: 1.2}.Integral(c, 5*units.Metre, 9*units.Metre, b)
	if err != nil || math.Abs(q-240e3) > 1e-6 {
		t.Errorf("sand ∫ below 8B = %.9g N/m, %v; want 240000", q, err)
	}
	q, lim, err = SchmertmannClayShaft{Alpha: 0.8}.Integral(c, 2*units.Metre, 7*units.Metre, b)
	if err != nil || lim || math.Abs(q-200e3) > 1e-6 {
		t.Errorf("clay ∫ = %.9g N/m, %v, %v; want 200000", q, lim, err)
	}
	q, lim, err = SchmertmannClayShaft{Alpha: 0.8, Limit: 30 * units.Kilopascal}.Integral(c, 2*units.Metre, 7*units.Metre, b)
	if err != nil || !lim || math.Abs(q-150e3) > 1e-6 {
		t.Errorf("clay ∫ with limit = %.9g N/m, %v, %v; want 150000", q, lim, err)
	}
	for _, err := range []error{
		func() error { _, _, err := (SchmertmannSandShaft{K: 5}).Integral(c, 0, units.Metre, b); return err }(),
		func() error { _, _, err := (SchmertmannSandShaft{K: 1}).Integral(c, 0, units.Metre, 0); return err }(),
		func() error { _, _, err := (SchmertmannClayShaft{Alpha: 2}).Integral(c, 0, units.Metre, b); return err }(),
		func() error {
			_, _, err := (SchmertmannClayShaft{Alpha: 1}).Integral(c, 0, 13*units.Metre, b)
			return err
		}(),
	} {
		if err == nil {
			t.Error("bad input: no error")
		}
	}
}
