package profile

import (
	"errors"
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// GATE 2016 Civil Engineering (Indian Institute of Science / IITs, Graduate
// Aptitude Test in Engineering), a question on one-dimensional
// consolidation, as reproduced with its worked solution at
// interviewmania.com ("Soil mechanics miscellaneous", question 91174): a
// normally consolidated saturated silty clay 1 m thick, Gs = 2.7,
// w = 45 % (so e0 = w·Gs = 1.215), Cc = 0.45, Cr = 0.05, σ′0 = 100 kPa,
// Δσ′ = 20 kPa; the printed answer is 16 mm "rounded off to the nearest
// mm", so the reading tolerance is ±0.5 mm.
func TestConsolidationStrainGATE2016(t *testing.T) {
	l := Layer{Cc: 0.45, Cr: 0.05, E0: 0.45 * 2.7}
	eps, err := l.ConsolidationStrain(100*kPa, 20*kPa)
	if err != nil {
		t.Fatal(err)
	}
	got := eps * 1000 // mm over 1 m
	if math.Abs(got-16) > 0.5 {
		t.Errorf("settlement %.3f mm, want 16 mm ± 0.5 (printed, rounded to the mm)", got)
	}
}

// The three branches of the index form against the equations written out
// here (Das, Principles of Geotechnical Engineering, section on the
// calculation of primary consolidation settlement: Sc = Cc·H/(1+e0)·
// log10(σ′f/σ′0) for a normally consolidated clay, Cs (our Cr) below σ′p and
// the two-part sum across it). Closed form, tight tolerance.
func TestConsolidationStrainBranches(t *testing.T) {
	l := Layer{Cc: 0.6, Cr: 0.08, E0: 1.4, Pc: 150 * kPa}
	e := 2.4
	cases := []struct {
		name   string
		s0, ds units.Stress
		want   float64
	}{
		{"below σ′p", 80 * kPa, 50 * kPa, 0.08 / e * math.Log10(130.0/80)},
		{"across σ′p", 80 * kPa, 120 * kPa, 0.08/e*math.Log10(150.0/80) + 0.6/e*math.Log10(200.0/150)},
		{"normally consolidated", 160 * kPa, 40 * kPa, 0.6 / e * math.Log10(200.0/160)},
		{"unloading swells along Cr", 100 * kPa, -30 * kPa, 0.08 / e * math.Log10(70.0/100)},
	}
	for _, c := range cases {
		got, err := l.ConsolidationStrain(c.s0, c.ds)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		if math.Abs(got-c.want) > 1e-14 {
			t.Errorf("%s: ε = %.15g, want %.15g", c.name, got, c.want)
		}
	}
	lm := Layer{M: 4 * units.Megapascal}
	if got, _ := lm.ConsolidationStrain(50*kPa, 20*kPa); math.Abs(got-0.005) > 1e-15 {
		t.Errorf("modulus form: ε = %g, want Δσ′/M = 0.005", got)
	}
}

func TestConsolidationStrainNeedsCr(t *testing.T) {
	l := Layer{Cc: 0.5, E0: 1.1, Pc: 200 * kPa}
	_, err := l.ConsolidationStrain(100*kPa, 50*kPa)
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Path != "recompression_index" {
		t.Fatalf("err = %v, want a FieldError on recompression_index", err)
	}
}

// ∫ log10(1 + a/u) du = [u·log10(1 + a/u) + a·log10(u + a)] (differentiate
// to check), for σ′0 = γ′·u linear in depth and a uniform Δσ′ = q, a = q/γ′.
func intLog(a, u1, u2 float64) float64 {
	F := func(u float64) float64 { return u*math.Log10(1+a/u) + a*math.Log10(u+a) }
	return F(u2) - F(u1)
}

// A sand crust (incompressible) over a normally consolidated clay below the
// water table, under a wide fill q: the clay's settlement against the
// closed-form integral of its strain.
func TestConsolidationClosedForm(t *testing.T) {
	const (
		gSand, gClay, gw = 18.0, 16.0, 9.81
		hSand, hClay     = 2.0, 6.0
		q                = 60.0
		cc, e0           = 0.7, 1.6
	)
	p, err := New(Spec{WaterDepth: 2 * m, WaterUnitWeight: units.UnitWeight(gw) * kNm3, Layers: []LayerSpec{
		{Thickness: hSand * m, Drainage: Drained, Phi: 32 * units.Degree, UnitWeight: units.UnitWeight(gSand) * kNm3, SaturatedUnitWeight: 20 * kNm3},
		{Thickness: hClay * m, Drainage: Undrained, Su: 20 * kPa, SaturatedUnitWeight: units.UnitWeight(gClay) * kNm3, Cc: cc, E0: e0},
	}})
	if err != nil {
		t.Fatal(err)
	}
	fill := func(units.Length) units.Stress { return q * kPa }
	s, parts, err := p.Consolidation(0, p.Depth(), fill)
	if err != nil {
		t.Fatal(err)
	}
	// σ′0 = γsand·hSand + γ′clay·(z − hSand) = γ′·u with u = z − z0.
	gp := gClay - gw
	u1 := gSand * hSand / gp
	want := cc / (1 + e0) * intLog(q/gp, u1, u1+hClay)
	if math.Abs(float64(s)-want) > 1e-9*want {
		t.Errorf("settlement %.12g m, want %.12g m (closed form)", float64(s), want)
	}
	if len(parts) != 2 || parts[0].Model != Incompressible || parts[0].Settlement != 0 || parts[1].Model != ByIndex {
		t.Errorf("parts = %+v", parts)
	}
	// The settlement at the top of the clay is the whole; at its middle,
	// the lower half's closed form.
	zs := []units.Length{0, hSand * m, (hSand + hClay/2) * m}
	got, err := p.GroundSettlement(zs, fill, nil)
	if err != nil {
		t.Fatal(err)
	}
	half := cc / (1 + e0) * intLog(q/gp, u1+hClay/2, u1+hClay)
	for i, w := range []float64{want, want, half} {
		if math.Abs(float64(got[i])-w) > 1e-9*w {
			t.Errorf("ground settlement at %v = %.12g, want %.12g", zs[i], float64(got[i]), w)
		}
	}
}

// An overconsolidated layer with a constant σ′p crossed inside the layer:
// the integral splits at the crossing; both halves in closed form.
func TestConsolidationAcrossPc(t *testing.T) {
	const (
		g, h   = 18.0, 10.0 // dry clay, so σ′0 = γ·z
		q      = 40.0
		pc     = 100.0 // crossed at z where γz = pc − q … and at z = pc/γ
		cc, cr = 0.5, 0.06
		e0     = 1.2
	)
	p, err := New(Spec{NoWater: true, Layers: []LayerSpec{
		{Thickness: h * m, Drainage: Undrained, Su: 40 * kPa, UnitWeight: units.UnitWeight(g) * kNm3, Cc: cc, Cr: cr, E0: e0, Pc: pc * kPa},
	}})
	if err != nil {
		t.Fatal(err)
	}
	s, _, err := p.Consolidation(1*m, p.Depth(), func(units.Length) units.Stress { return q * kPa })
	if err != nil {
		t.Fatal(err)
	}
	// Zones by σ′0 = g·z: σ′f ≤ σ′p while g·z ≤ pc − q; across σ′p while
	// g·z < pc; normally consolidated below.
	za, zb := (pc-q)/g, pc/g
	e := 1 + e0
	// ∫ log10((gz+q)/(gz)) dz over [1, za] with u = z: a = q/g.
	part1 := cr / e * intLog(q/g, 1, za)
	// ∫ [Cr·log10(pc/(gz)) + Cc·log10((gz+q)/pc)] dz over [za, zb].
	iLog := func(c, z1, z2 float64) float64 { // ∫ log10(c·z) dz
		F := func(z float64) float64 { return (z*math.Log(c*z) - z) / math.Ln10 }
		return F(z2) - F(z1)
	}
	iLogLin := func(a, b, z1, z2 float64) float64 { // ∫ log10(a·z + b) dz
		F := func(z float64) float64 { w := a*z + b; return (w*math.Log(w) - w) / a / math.Ln10 }
		return F(z2) - F(z1)
	}
	part2 := cr/e*(math.Log10(pc)*(zb-za)-iLog(g, za, zb)) + cc/e*(iLogLin(g, q, za, zb)-math.Log10(pc)*(zb-za))
	part3 := cc / e * intLog(q/g, zb, h)
	want := part1 + part2 + part3
	if math.Abs(float64(s)-want) > 1e-9*want {
		t.Errorf("settlement %.12g m, want %.12g m (closed form)", float64(s), want)
	}
}

func TestConsolidationValidation(t *testing.T) {
	base := LayerSpec{Thickness: 5 * m, Drainage: Undrained, Su: 30 * kPa, UnitWeight: 17 * kNm3}
	cases := []struct {
		name string
		mod  func(*LayerSpec)
		path string
	}{
		{"Cc without e0", func(l *LayerSpec) { l.Cc = 0.4 }, "layers[0].initial_void_ratio"},
		{"Cr above Cc", func(l *LayerSpec) { l.Cc, l.Cr, l.E0 = 0.2, 0.3, 1 }, "layers[0].recompression_index"},
		{"indices and modulus", func(l *LayerSpec) { l.Cc, l.E0, l.M = 0.2, 1, 3*units.Megapascal }, "layers[0].constrained_modulus"},
		{"Cc too large", func(l *LayerSpec) { l.Cc, l.E0 = 12, 1 }, "layers[0].compression_index"},
		{"σ′p alone", func(l *LayerSpec) { l.Pc = 100 * kPa }, "layers[0].preconsolidation_stress"},
		{"σ′p with OCR", func(l *LayerSpec) { l.Cc, l.Cr, l.E0, l.Pc, l.OCR = 0.4, 0.05, 1, 100*kPa, 2 }, "layers[0].preconsolidation_stress"},
		{"negative modulus", func(l *LayerSpec) { l.M = -1 }, "layers[0].constrained_modulus"},
	}
	for _, c := range cases {
		ls := base
		c.mod(&ls)
		_, err := New(Spec{NoWater: true, Layers: []LayerSpec{ls}})
		var fe *FieldError
		if !errors.As(err, &fe) {
			t.Errorf("%s: err = %v, want a FieldError", c.name, err)
			continue
		}
		found := false
		for _, e := range err.(interface{ Unwrap() []error }).Unwrap() {
			if errors.As(e, &fe) && fe.Path == c.path {
				found = true
			}
		}
		if !found {
			t.Errorf("%s: err = %v, want one on %s", c.name, err, c.path)
		}
	}
}

func TestGroundSettlementDepthsMustIncrease(t *testing.T) {
	p, err := New(Spec{NoWater: true, Layers: []LayerSpec{{Thickness: 5 * m, Drainage: Undrained, Su: 30 * kPa, UnitWeight: 17 * kNm3, M: 5 * units.Megapascal}}})
	if err != nil {
		t.Fatal(err)
	}
	if _, err := p.GroundSettlement([]units.Length{2, 1}, func(units.Length) units.Stress { return 10 * kPa }, nil); err == nil {
		t.Error("decreasing depths accepted")
	}
}

// With the constrained modulus and a load linear in depth the integral is
// exact; the ground settlement never increases with depth and is zero at
// the bottom (closed form: s(z) = ∫_z^H Δσ′/M dz).
func TestPropGroundSettlement(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		h := rapid.Float64Range(1, 30).Draw(t, "h")
		mod := rapid.Float64Range(1e6, 50e6).Draw(t, "M")
		q0 := rapid.Float64Range(0, 200e3).Draw(t, "q0")
		k := rapid.Float64Range(-q0/h, 5e3).Draw(t, "k")
		p, err := New(Spec{WaterDepth: units.Length(rapid.Float64Range(0, h).Draw(t, "w")), Layers: []LayerSpec{{
			Thickness: units.Length(h), Drainage: Undrained, Su: 30 * kPa, UnitWeight: 17 * kNm3, SaturatedUnitWeight: 19 * kNm3, M: units.Stress(mod)}}})
		if err != nil {
			t.Fatal(err)
		}
		ds := func(z units.Length) units.Stress { return units.Stress(q0 + k*float64(z)) }
		n := rapid.IntRange(1, 8).Draw(t, "n")
		zs := make([]units.Length, n)
		for i := range zs {
			zs[i] = units.Length(h * float64(i) / float64(n))
		}
		got, err := p.GroundSettlement(zs, ds, nil)
		if err != nil {
			t.Fatal(err)
		}
		for i, z := range zs {
			zf := float64(z)
			want := (q0*(h-zf) + k*(h*h-zf*zf)/2) / mod
			if math.Abs(float64(got[i])-want) > 1e-9*math.Max(want, 1e-9) {
				t.Fatalf("s(%g) = %g, want %g", zf, float64(got[i]), want)
			}
			if i > 0 && got[i] > got[i-1]*(1+1e-12) {
				t.Fatalf("settlement rises with depth: %g then %g", float64(got[i-1]), float64(got[i]))
			}
		}
	})
}
