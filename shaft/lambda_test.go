package shaft

import (
	"errors"
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// dasLambdaPieces are the three clay layers of Das's worked example of the
// α, λ and β methods (Principles of Foundation Engineering, 5th/6th ed.
// Example 11.4, with the data of package pile's test of the same example):
// a 406 mm pipe pile 30 m long; clay 0-5 m,
// γ = 18 kN/m³, cu = 30 kPa; water table at 5 m; clay 5-10 m, γsat =
// 18 kN/m³, cu = 30 kPa; clay 10-30 m, γsat = 19.6 kN/m³, cu = 100 kPa;
// γw = 9.81 kN/m³. σ′v by hand: 18·5 = 90 kPa at 5 m, 90 + (18 − 9.81)·5 =
// 130.95 kPa at 10 m, 130.95 + (19.6 − 9.81)·20 = 326.75 kPa at 30 m.
var dasLambdaPieces = []LambdaPiece{
	{Thickness: 5 * units.Metre, SigmaTop: 0, SigmaBottom: 90 * kPa, SuTop: 30 * kPa, SuBottom: 30 * kPa},
	{Thickness: 5 * units.Metre, SigmaTop: 90 * kPa, SigmaBottom: 130.95 * kPa, SuTop: 30 * kPa, SuBottom: 30 * kPa},
	{Thickness: 20 * units.Metre, SigmaTop: 130.95 * kPa, SigmaBottom: 326.75 * kPa, SuTop: 100 * kPa, SuBottom: 100 * kPa},
}

// TestLambdaDasLayered runs Das's λ example through LambdaMeans and
// Layered. Das forms σ̄′v = (A1 + A2 + A3)/L from the areas of the σ′v
// diagram and c̄u = Σ cu,i·Li/L (λ method, Fig. 12.25 of the 9th ed., read
// in a published reproduction of the section). By hand from the data
// above: A1 = 225, A2 = 552.375, A3 = 4577 kN/m, so σ̄′v = 5354.375/30 =
// 178.479 kPa and c̄u = (150 + 150 + 2000)/30 = 76.667 kPa; Das prints
// A2 = 552.38 (seen in a published summary of the example) and σ̄′v =
// 178.48 kPa (from memory). λ = 0.136 at 30 m (Das's value, the table node,
// from memory); fav = 0.136·(178.479 + 2·76.667) = 45.127 kPa, below c̄u,
// so the limit does not govern; Qs = π·0.406·30·fav = 1727 kN, as Das
// prints (the pile package's test of the same example, 1 %).
func TestLambdaDasLayered(t *testing.T) {
	L, sv, su, err := LambdaMeans(dasLambdaPieces)
	if err != nil {
		t.Fatal(err)
	}
	if rel(L.Metres(), 30) > 1e-15 || rel(sv.KPa(), 5354.375/30) > 1e-12 || rel(su.KPa(), 2300.0/30) > 1e-12 {
		t.Errorf("means: L = %g m, σ̄′v = %.4f kPa, s̄u = %.4f kPa; want 30, 178.479, 76.667", L.Metres(), sv.KPa(), su.KPa())
	}
	if math.Abs(sv.KPa()-178.48) > 0.005 {
		t.Errorf("σ̄′v = %.4f kPa, Das prints 178.48", sv.KPa())
	}
	r, err := Lambda{}.Layered(30*units.Metre, dasLambdaPieces)
	if err != nil {
		t.Fatal(err)
	}
	fav := 0.136 * (5354.375/30 + 2*2300.0/30)
	if rel(r.Fav.KPa(), fav) > 1e-12 || r.Flags != 0 || r.Lambda != 0.136 {
		t.Errorf("fav = %.4f kPa, λ = %g, flags %v; want %.4f, 0.136, none", r.Fav.KPa(), r.Lambda, r.Flags, fav)
	}
	if rel(r.Pieces.Metres(), 30) > 1e-15 || rel(float64(r.Integral)/1e3, 30*fav) > 1e-12 {
		t.Errorf("pieces %g m, integral %g kN/m; want 30, %g", r.Pieces.Metres(), float64(r.Integral)/1e3, 30*fav)
	}
	qs := math.Pi * 0.406 * float64(r.Integral) / 1e3
	if rel(qs, 1727) > 1e-3 {
		t.Errorf("Qs = %.1f kN, Das prints 1727 kN", qs)
	}
	// The same with λ given as Das reads it.
	g, err := LambdaGiven{Lambda: 0.136}.Average(L, sv, su)
	if err != nil || g.Fav != r.Fav {
		t.Errorf("λ given 0.136: %+v, %v; want fav %v", g, err, r.Fav)
	}
}

// TestLambdaUnderSand: clay under sand, the case the limit is for. A sand
// layer 0-8 m (γ = 18 kN/m³, dry) over clay 8-20 m (γsat = 19 kN/m³, water
// table at 8 m, γw = 9.81 kN/m³, su = 40 kPa); invented numbers, checked
// by hand arithmetic. Only the clay piece is passed (the sand's shaft is
// another method's): σ′v = 144 kPa at 8 m and 144 + 9.19·12 = 254.28 kPa at
// 20 m, so σ̄′v = 199.14 kPa over the clay; λ at the whole embedded 20 m is
// 0.173 (table node, from memory); λ·(σ̄′v + 2·s̄u) = 0.173·279.14 =
// 48.291 kPa > s̄u = 40 kPa, so fav = 40 kPa (α = 1) and LambdaCapped is
// set; α before the limit 48.291/40 = 1.2073.
func TestLambdaUnderSand(t *testing.T) {
	clay := []LambdaPiece{{Thickness: 12 * units.Metre, SigmaTop: 144 * kPa, SigmaBottom: 254.28 * kPa, SuTop: 40 * kPa, SuBottom: 40 * kPa}}
	raw := 0.173 * ((144+254.28)/2 + 80)
	r, err := Lambda{}.Layered(20*units.Metre, clay)
	if err != nil {
		t.Fatal(err)
	}
	if rel(r.Unlimited.KPa(), raw) > 1e-12 || rel(r.Fav.KPa(), 40) > 1e-12 || r.Flags != LambdaCapped ||
		rel(r.Alpha, raw/40) > 1e-12 || rel(float64(r.Integral)/1e3, 40*12) > 1e-12 {
		t.Errorf("capped: %+v; want fav 40 kPa from %.3f, α %.4f, integral 480 kN/m", r, raw, raw/40)
	}
	off, err := Lambda{NoCap: true}.Layered(20*units.Metre, clay)
	if err != nil || rel(off.Fav.KPa(), raw) > 1e-12 || off.Flags != LambdaCapOff {
		t.Errorf("limit off: %+v, %v; want fav %.3f kPa and LambdaCapOff", off, err, raw)
	}
	// The limit off is shown even where it would not have governed.
	if r, _ := (Lambda{NoCap: true}).Average(30*units.Metre, 10*kPa, 50*kPa); r.Flags != LambdaCapOff {
		t.Errorf("limit off, not governing: flags %v", r.Flags)
	}
	if g, err := (LambdaGiven{Lambda: 0.173}).Average(20*units.Metre, r.SigmaV, r.Su); err != nil || g.Fav != r.Fav || g.Flags != LambdaCapped {
		t.Errorf("λ given: %+v, %v", g, err)
	}
}

func TestLambdaErrors(t *testing.T) {
	one := []LambdaPiece{{Thickness: units.Metre, SigmaBottom: 10 * kPa, SuTop: 20 * kPa, SuBottom: 20 * kPa}}
	cases := []struct {
		name  string
		run   func() error
		field string
	}{
		{"no pieces", func() error { _, _, _, err := LambdaMeans(nil); return err }, "pieces"},
		{"zero thickness", func() error {
			_, _, _, err := LambdaMeans([]LambdaPiece{{SuTop: kPa, SuBottom: kPa}})
			return err
		}, "pieces.thickness"},
		{"negative σ′v", func() error {
			_, _, _, err := LambdaMeans([]LambdaPiece{{Thickness: units.Metre, SigmaTop: -kPa}})
			return err
		}, "sigma_v"},
		{"NaN su", func() error {
			_, _, _, err := LambdaMeans([]LambdaPiece{{Thickness: units.Metre, SuBottom: units.Stress(math.NaN())}})
			return err
		}, "su"},
		{"pieces longer than pile", func() error { _, err := Lambda{}.Layered(0.5*units.Metre, one); return err }, "pieces"},
		{"no embedded length", func() error { _, err := Lambda{}.Layered(0, one); return err }, "length"},
		{"λ given zero", func() error { _, err := LambdaGiven{}.Average(units.Metre, kPa, kPa); return err }, "lambda"},
		{"λ given above 1", func() error { _, err := LambdaGiven{Lambda: 1.2}.Average(units.Metre, kPa, kPa); return err }, "lambda"},
	}
	for _, c := range cases {
		var re *RangeError
		if err := c.run(); !errors.As(err, &re) || re.Field != c.field {
			t.Errorf("%s: error %v, want a RangeError on %s", c.name, err, c.field)
		}
	}
}

// TestPropLambdaMeansSplit: cutting a piece anywhere (σ′v and su
// interpolated linearly at the cut) leaves the means unchanged, since the
// areas of the σ′v and su diagrams are additive (Das's A1 + A2 + …).
func TestPropLambdaMeansSplit(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		h := rapid.Float64Range(0.01, 50).Draw(t, "h")
		s0 := rapid.Float64Range(0, 500).Draw(t, "s0")
		s1 := rapid.Float64Range(0, 500).Draw(t, "s1")
		u0 := rapid.Float64Range(0, 300).Draw(t, "u0")
		u1 := rapid.Float64Range(0, 300).Draw(t, "u1")
		f := rapid.Float64Range(0.001, 0.999).Draw(t, "f")
		whole := []LambdaPiece{{Thickness: units.Length(h), SigmaTop: units.Stress(s0) * kPa, SigmaBottom: units.Stress(s1) * kPa,
			SuTop: units.Stress(u0) * kPa, SuBottom: units.Stress(u1) * kPa}}
		sm, um := s0+f*(s1-s0), u0+f*(u1-u0)
		split := []LambdaPiece{
			{Thickness: units.Length(f * h), SigmaTop: units.Stress(s0) * kPa, SigmaBottom: units.Stress(sm) * kPa, SuTop: units.Stress(u0) * kPa, SuBottom: units.Stress(um) * kPa},
			{Thickness: units.Length((1 - f) * h), SigmaTop: units.Stress(sm) * kPa, SigmaBottom: units.Stress(s1) * kPa, SuTop: units.Stress(um) * kPa, SuBottom: units.Stress(u1) * kPa},
		}
		L1, a1, b1, err1 := LambdaMeans(whole)
		L2, a2, b2, err2 := LambdaMeans(split)
		if err1 != nil || err2 != nil {
			t.Fatal(err1, err2)
		}
		// Absolute tolerance in kPa: the stresses are at most 500 kPa.
		if rel(L2.Metres(), L1.Metres()) > 1e-12 || math.Abs(a2.KPa()-a1.KPa()) > 1e-9 || math.Abs(b2.KPa()-b1.KPa()) > 1e-9 {
			t.Fatalf("split at %g: (%g, %g, %g) vs whole (%g, %g, %g)", f, L2, a2.KPa(), b2.KPa(), L1, a1.KPa(), b1.KPa())
		}
	})
}

// TestPropLambdaLimit: with the limit on, fav = min(λ·(σ̄′v + 2·s̄u), s̄u)
// and LambdaCapped is set exactly when the limit governs; with it off, fav
// is the rule's value and LambdaCapOff is set.
func TestPropLambdaLimit(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		L := units.Length(rapid.Float64Range(0.01, 90).Draw(t, "L"))
		sv := units.Stress(rapid.Float64Range(0, 2000).Draw(t, "sv")) * kPa
		su := units.Stress(rapid.Float64Range(0, 500).Draw(t, "su")) * kPa
		r, err := Lambda{}.Average(L, sv, su)
		if err != nil {
			t.Fatal(err)
		}
		raw := units.Stress(r.Lambda) * (sv + 2*su)
		if r.Unlimited != raw || r.Fav != min(raw, su) || (r.Flags&LambdaCapped != 0) != (raw > su) || r.Fav > su {
			t.Fatalf("fav %v from %v with s̄u %v, flags %v", r.Fav, raw, su, r.Flags)
		}
		off, err := Lambda{NoCap: true}.Average(L, sv, su)
		if err != nil || off.Fav != raw || off.Flags != LambdaCapOff {
			t.Fatalf("limit off: %+v, %v", off, err)
		}
	})
}
