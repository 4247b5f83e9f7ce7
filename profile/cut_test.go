package profile

import (
	"errors"
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

// TestExcavationClosedForms checks the stresses below a cut against closed
// forms written out by hand (σv = γw·max(0, zd − zw) + Σγ·Δz from the
// design ground line zd, u hydrostatic from the water table zw, σ′v = σv −
// u; above zd only free water). The soils are invented; no published values.
func TestExcavationClosedForms(t *testing.T) {
	const gw = 9.81
	uniform := func(g, gsat float64) []LayerSpec {
		return []LayerSpec{{Name: "sand", Thickness: 10 * m, Drainage: Drained, Phi: 32 * units.Degree,
			UnitWeight: units.UnitWeight(g) * kNm3, SaturatedUnitWeight: units.UnitWeight(gsat) * kNm3}}
	}
	type fn func(z float64) (sig, u float64)
	cases := []struct {
		name string
		spec Spec
		zd   float64
		f    fn
	}{
		{"dry site, excavation 3 m", Spec{NoWater: true, ExcavationDepth: 3 * m, Layers: uniform(18, 20)}, 3,
			func(z float64) (float64, float64) { return 18 * (z - 3), 0 }},
		{"water table 5 m below an excavation floor at 3 m", Spec{WaterDepth: 5 * m, ExcavationDepth: 3 * m, Layers: uniform(18, 20)}, 3,
			func(z float64) (float64, float64) {
				if z <= 5 {
					return 18 * (z - 3), 0
				}
				return 18*2 + 20*(z-5), gw * (z - 5)
			}},
		{"flooded excavation: water table at 1 m, floor at 3 m", Spec{WaterDepth: 1 * m, ExcavationDepth: 3 * m, Layers: uniform(18, 20)}, 3,
			func(z float64) (float64, float64) { return gw*2 + 20*(z-3), gw * (z - 1) }},
		{"river: 4 m of water, general scour 1.5 m, local scour 2 m", Spec{WaterDepth: -4 * m,
			Scour: Scour{General: 1.5 * m, Local: 2 * m}, Layers: uniform(19, 19)}, 3.5,
			func(z float64) (float64, float64) { return gw*(4+3.5) + 19*(z-3.5), gw * (4 + z) }},
		{"excavation and scour together", Spec{WaterDepth: 0, ExcavationDepth: 1 * m,
			Scour: Scour{General: 1 * m, Local: 0.5 * m}, Layers: []LayerSpec{
				{Name: "clay", Thickness: 4 * m, Drainage: Undrained, Su: 30 * kPa, SaturatedUnitWeight: 18 * kNm3},
				{Name: "sand", Thickness: 8 * m, Drainage: Drained, Phi: 34 * units.Degree, SaturatedUnitWeight: 20 * kNm3},
			}}, 2.5,
			func(z float64) (float64, float64) {
				if z <= 4 {
					return gw*2.5 + 18*(z-2.5), gw * z
				}
				return gw*2.5 + 18*1.5 + 20*(z-4), gw * z
			}},
	}
	for _, c := range cases {
		p, err := New(c.spec)
		if err != nil {
			t.Errorf("%s: %v", c.name, err)
			continue
		}
		if got := p.DesignGround(); math.Abs(got.Metres()-c.zd) > 1e-12 {
			t.Errorf("%s: DesignGround = %v, want %g m", c.name, got, c.zd)
		}
		var checks []stressCheck
		for k := 0; k <= 40; k++ {
			z := float64(p.Depth()) * float64(k) / 40
			if z < c.zd {
				// Above the design ground line: free water or air, σ′v = 0.
				var w float64
				if zw, wet := p.WaterDepth(); wet && z > float64(zw) {
					w = gw * (z - float64(zw))
				}
				checks = append(checks, stressCheck{z, w, w, 0})
				continue
			}
			sig, u := c.f(z)
			checks = append(checks, stressCheck{z, sig, u, sig - u})
		}
		checks = append(checks, func() stressCheck { s, u := c.f(c.zd); return stressCheck{c.zd, s, u, s - u} }())
		checkStresses(t, c.name, p, checks, 1e-9)
	}
}

// TestCutMatchesPublishedBelow puts invented soil on top of published
// examples and cuts it away again: the stresses below the design ground
// line must then be the published ones (shifted by the cut), whatever the
// removed soil weighed.
func TestCutMatchesPublishedBelow(t *testing.T) {
	// NPTEL course 105103097, ch. 5, Example 1 (read; see TestNPTELWaterAtSurface):
	// water table at the surface, 4 m of 1.92 t/m³ over 7 m of 2.1 t/m³;
	// σ′ = 3.68 t/m² at 4 m and 11.38 t/m² at 11 m. Here 3 m of invented
	// soil lies over it under water, scoured away (1 m general, 2 m local):
	// the bed is lowered under standing water, as at a river pier.
	const g = 9.81
	p, err := New(Spec{WaterDepth: 0, Scour: Scour{General: 1 * m, Local: 2 * m}, Layers: []LayerSpec{
		{Name: "scoured silt (invented)", Thickness: 3 * m, Drainage: Undrained, Su: 10 * kPa, SaturatedUnitWeight: 17.3 * kNm3},
		{Thickness: 4 * m, Drainage: Undrained, Su: 20 * kPa, SaturatedUnitWeight: 1.92 * g * kNm3},
		{Thickness: 7 * m, Drainage: Undrained, Su: 30 * kPa, SaturatedUnitWeight: 2.1 * g * kNm3},
	}})
	if err != nil {
		t.Fatal(err)
	}
	// σv and u each gain the 3 m of water now standing in the scour (γw·3);
	// σ′ is the published value (scaled by 9.81, as in TestNPTELWaterAtSurface).
	checkStresses(t, "NPTEL Ex. 1 under scour", p, []stressCheck{
		{3 + 4, 7.68*g + 3*g, 4*g + 3*g, 3.68 * g},
		{3 + 11, 22.38*g + 3*g, 11*g + 3*g, 11.38 * g},
	}, 1e-9)

	// Knappett & Craig (2012), Example 3.1 (from memory, as in
	// TestCraigExample31): sand 5 m (17 above, 20 below water) over clay
	// 4 m (19), water table 3 m down; σ′ 51.0 at 3 m, 71.4 at 5 m, 108.1 at
	// 9 m. Here 2.5 m of invented fill lies over it, excavated dry.
	q, err := New(Spec{WaterDepth: 5.5 * m, ExcavationDepth: 2.5 * m, Layers: []LayerSpec{
		{Name: "fill (invented)", Thickness: 2.5 * m, Drainage: Drained, Phi: 28 * units.Degree, UnitWeight: 16.1 * kNm3},
		{Name: "sand", Thickness: 5 * m, Drainage: Drained, Phi: 33 * units.Degree,
			UnitWeight: 17 * kNm3, SaturatedUnitWeight: 20 * kNm3},
		{Name: "clay", Thickness: 4 * m, Drainage: Undrained, Su: 40 * kPa, SaturatedUnitWeight: 19 * kNm3},
	}})
	if err != nil {
		t.Fatal(err)
	}
	// Published to 0.1 kPa: tolerance 0.05 kPa.
	checkStresses(t, "Craig 3.1 below an excavation", q, []stressCheck{
		{2.5, 0, 0, 0},
		{2.5 + 3, 51.0, 0, 51.0},
		{2.5 + 5, 91.0, 19.6, 71.4},
		{2.5 + 9, 167.0, 58.9, 108.1},
	}, 0.05)
}

func TestCutLayersAndLines(t *testing.T) {
	p, err := New(Spec{WaterDepth: -2 * m, ExcavationDepth: 1 * m, Scour: Scour{General: 1.5 * m, Local: 1 * m},
		Layers: []LayerSpec{
			// The first layer is wholly removed: it needs no unit weight.
			{Name: "soft mud", Thickness: 2 * m, Drainage: Undrained, Su: 5 * kPa},
			{Name: "sand", Thickness: 6 * m, Drainage: Drained, Phi: 33 * units.Degree, SaturatedUnitWeight: 20 * kNm3},
		}})
	if err != nil {
		t.Fatal(err)
	}
	want := GroundLines{Original: 0, Excavation: 1 * m, GeneralScour: 2.5 * m, Design: 3.5 * m}
	if got := p.GroundLines(); got != want {
		t.Errorf("GroundLines = %+v, want %+v", got, want)
	}
	if p.OriginalGround() != 0 || p.DesignGround() != 3.5*m {
		t.Errorf("OriginalGround %v, DesignGround %v; want 0, 3.5 m", p.OriginalGround(), p.DesignGround())
	}
	if r0, r1 := p.Layer(0).Removed, p.Layer(1).Removed; r0 != 2*m || r1 != 1.5*m {
		t.Errorf("Removed = %v, %v; want 2 m, 1.5 m", r0, r1)
	}
	// The design ground line is a break; layer boundaries above it stay.
	br := p.Breaks()
	wantBr := []units.Length{0, 2 * m, 3.5 * m, 8 * m}
	if len(br) != len(wantBr) {
		t.Fatalf("Breaks = %v, want %v", br, wantBr)
	}
	for i := range br {
		if br[i] != wantBr[i] {
			t.Errorf("Breaks = %v, want %v", br, wantBr)
		}
	}
	// LayerAt above the cut still names the layer that was there.
	if i, err := p.LayerAt(1 * m); err != nil || i != 0 {
		t.Errorf("LayerAt(1 m) = %d, %v; want 0", i, err)
	}
	// Scour cites HEC-18; an excavation alone cites nothing.
	if r := p.Refs(); len(r) != 1 || r[0].Source.Key != "fhwa-hec18-2001" {
		t.Errorf("Refs with scour = %v", r)
	}
	if e, err := New(Spec{ExcavationDepth: 1 * m, Layers: []LayerSpec{sand(3 * m)}}); err != nil {
		t.Error(err)
	} else if r := e.Refs(); r != nil {
		t.Errorf("excavation only: Refs %v; want none", r)
	}
	// Without a cut: zero lines, nothing removed.
	q, _ := New(Spec{Layers: []LayerSpec{sand(3 * m)}})
	if q.GroundLines() != (GroundLines{}) || q.Layer(0).Removed != 0 {
		t.Errorf("no cut: %+v, removed %v", q.GroundLines(), q.Layer(0).Removed)
	}
}

func TestCutValidation(t *testing.T) {
	nan := units.Length(math.NaN())
	ten := []LayerSpec{sand(4 * m), sand(6 * m)}
	cases := []struct {
		name string
		spec Spec
		want []string
	}{
		{"negative excavation", Spec{ExcavationDepth: -1 * m, Layers: ten}, []string{"excavation_depth: -1 m is outside [0, "}},
		{"NaN general scour", Spec{Scour: Scour{General: nan}, Layers: ten}, []string{"scour.general: ", "is outside [0, "}},
		{"infinite local scour", Spec{Scour: Scour{Local: units.Length(math.Inf(1))}, Layers: ten}, []string{"scour.local: "}},
		{"excavation at the bottom", Spec{ExcavationDepth: 10 * m, Layers: ten},
			[]string{"excavation_depth: 10 m is outside [0, 10 m)", "bottom of the profile at 10 m"}},
		{"general scour past the bottom", Spec{ExcavationDepth: 4 * m, Scour: Scour{General: 7 * m}, Layers: ten},
			[]string{"scour.general: 7 m is outside [0, 6 m)", "excavation floor at 4 m"}},
		{"local scour past the bottom", Spec{Scour: Scour{General: 3 * m, Local: 8 * m}, Layers: ten},
			[]string{"scour.local: 8 m is outside [0, 7 m)", "general scour line at 3 m"}},
		{"surcharge with a cut", Spec{Surcharge: 20 * kPa, ExcavationDepth: 2 * m, Layers: ten},
			[]string{"surcharge: 20 kPa", "cut down to 2 m", "give 0"}},
		{"pore point above the cut", Spec{ExcavationDepth: 3 * m, PorePressures: []PorePoint{{2 * m, 0}, {6 * m, 30 * kPa}}, Layers: ten},
			[]string{"pore_pressures[0].depth: 2 m is above the design ground line at 3 m"}},
		{"remaining layer without weight", Spec{WaterDepth: 1 * m, ExcavationDepth: 2 * m, Layers: []LayerSpec{
			{Thickness: 3 * m, Drainage: Undrained, Su: 20 * kPa, UnitWeight: 18 * kNm3}, sand(4 * m)}},
			[]string{"layers[0].saturated_unit_weight: not given"}},
	}
	for _, c := range cases {
		p, err := New(c.spec)
		if err == nil {
			t.Errorf("%s: New succeeded (%v), want an error", c.name, p.Breaks())
			continue
		}
		var fe *FieldError
		if !errors.As(err, &fe) {
			t.Errorf("%s: %v is not a *FieldError", c.name, err)
		}
		for _, w := range c.want {
			if !contains(err.Error(), w) {
				t.Errorf("%s: %q does not contain %q", c.name, err, w)
			}
		}
	}
	// A point exactly on the design ground line is accepted.
	if _, err := New(Spec{ExcavationDepth: 3 * m, PorePressures: []PorePoint{{3 * m, 0}}, Layers: ten}); err != nil {
		t.Errorf("point on the design ground line: %v", err)
	}
}

func TestCutQueryAllocs(t *testing.T) {
	spec := Spec{WaterDepth: -3 * m, Scour: Scour{General: 2 * m, Local: 1.5 * m}}
	for range 20 {
		spec.Layers = append(spec.Layers, sand(1.5*m))
	}
	p, err := New(spec)
	if err != nil {
		t.Fatal(err)
	}
	for _, z := range []units.Length{1 * m, 0.37 * p.Depth()} {
		if n := testing.AllocsPerRun(100, func() { _, _ = p.EffectiveStress(z); _, _ = p.LayerAt(z); _, _ = p.StressesAt(z) }); n != 0 {
			t.Errorf("z %v: queries allocate %v times, want 0", z, n)
		}
	}
}
