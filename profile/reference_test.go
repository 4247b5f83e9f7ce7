package profile

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

const (
	kPa  = units.Kilopascal
	kNm3 = units.KilonewtonPerCubicMetre
	m    = units.Metre
)

type stressCheck struct {
	z                  float64 // m
	sigma, u, sigmaEff float64 // kPa
}

func checkStresses(t *testing.T, name string, p *Profile, cases []stressCheck, tol float64) {
	t.Helper()
	for _, c := range cases {
		s, err := p.StressesAt(units.Length(c.z))
		if err != nil {
			t.Errorf("%s: z = %g m: %v", name, c.z, err)
			continue
		}
		for _, v := range []struct {
			what      string
			got, want float64
		}{{"σv", s.Total.KPa(), c.sigma}, {"u", s.Pore.KPa(), c.u}, {"σ′v", s.Effective.KPa(), c.sigmaEff}} {
			if math.Abs(v.got-v.want) > tol {
				t.Errorf("%s: z = %g m: %s = %.3f kPa, want %.3f ± %.3f", name, c.z, v.what, v.got, v.want, tol)
			}
		}
	}
}

// TestCraigExample31 checks Knappett & Craig (2012), Craig's Soil
// Mechanics, 8th ed., Example 3.1 (from memory): sand 5 m over saturated
// clay 4 m, water table 3 m down; sand 17 kN/m³ above water and 20 kN/m³
// saturated, clay 19 kN/m³ saturated, γw = 9.81 kN/m³. Published answers
// (kPa, to 0.1): z 3 m: σ 51.0, u 0, σ′ 51.0; z 5 m: 91.0, 19.6, 71.4;
// z 9 m: 167.0, 58.9, 108.1. The second part of the example saturates the
// sand by capillarity for 1 m above the water table (20 kN/m³ there, u
// falling to −9.8 kPa at 2 m): z 2 m: σ 34.0, u −9.8, σ′ 43.8; z 3 m: 54.0,
// 0, 54.0; z 5 m: 94.0, 19.6, 74.4; z 9 m: 170.0, 58.9, 111.1.
func TestCraigExample31(t *testing.T) {
	p, err := New(Spec{
		WaterDepth: 3 * m,
		Layers: []LayerSpec{
			{Name: "sand", Thickness: 5 * m, Drainage: Drained, Phi: 33 * units.Degree,
				UnitWeight: 17 * kNm3, SaturatedUnitWeight: 20 * kNm3},
			{Name: "clay", Thickness: 4 * m, Drainage: Undrained, Su: 40 * kPa, SaturatedUnitWeight: 19 * kNm3},
		},
	})
	if err != nil {
		t.Fatal(err)
	}
	// Published to 0.1 kPa: tolerance 0.05 kPa.
	checkStresses(t, "Craig 3.1", p, []stressCheck{
		{0, 0, 0, 0},
		{3, 51.0, 0, 51.0},
		{5, 91.0, 19.6, 71.4},
		{9, 167.0, 58.9, 108.1},
	}, 0.05)

	capillary, err := New(Spec{
		WaterDepth:    3 * m,
		PorePressures: []PorePoint{{2 * m, -9.81 * kPa}, {3 * m, 0}},
		Layers: []LayerSpec{
			{Name: "sand", Thickness: 2 * m, Drainage: Drained, Phi: 33 * units.Degree,
				UnitWeight: 17 * kNm3, SaturatedUnitWeight: 20 * kNm3},
			{Name: "sand, capillary zone", Thickness: 3 * m, Drainage: Drained, Phi: 33 * units.Degree,
				UnitWeight: 20 * kNm3, SaturatedUnitWeight: 20 * kNm3},
			{Name: "clay", Thickness: 4 * m, Drainage: Undrained, Su: 40 * kPa, SaturatedUnitWeight: 19 * kNm3},
		},
	})
	if err != nil {
		t.Fatal(err)
	}
	checkStresses(t, "Craig 3.1 capillary", capillary, []stressCheck{
		{2, 34.0, -9.8, 43.8},
		{3, 54.0, 0, 54.0},
		{5, 94.0, 19.6, 74.4},
		{9, 170.0, 58.9, 111.1},
	}, 0.05)
	// Just above the capillary zone u is zero (package rule): σ′ = σ = 17·1.999.
	if s, _ := capillary.StressesAt(1.999 * m); math.Abs(s.Pore.KPa()) > 1e-9 {
		t.Errorf("u above the capillary zone = %v, want 0 (package rule)", s.Pore)
	}
}

// TestQues10Sand checks a worked answer published at ques10.com
// (Geotechnical Engineering 1, "Effective Stress Principle": a sand layer
// 8 m thick, water table 1 m down, 17 kN/m³ above and 20 kN/m³ below,
// γw = 9.81): at 8 m σ = 157 and u = 68.67 kPa. The page prints σ′ = 81.33
// kPa, an arithmetic slip: 157 − 68.67 = 88.33 kPa (closed form), which is
// what is checked here.
func TestQues10Sand(t *testing.T) {
	p, err := New(Spec{WaterDepth: 1 * m, Layers: []LayerSpec{{Thickness: 8 * m, Drainage: Drained,
		Phi: 30 * units.Degree, UnitWeight: 17 * kNm3, SaturatedUnitWeight: 20 * kNm3}}})
	if err != nil {
		t.Fatal(err)
	}
	checkStresses(t, "ques10", p, []stressCheck{{1, 17, 0, 17}, {8, 157, 68.67, 157 - 68.67}}, 0.005)
}

// TestNPTELWaterAtSurface checks Example 1 of the NPTEL course 105103097,
// ch. 5 (archive.nptel.ac.in), in t/m²: water table at the surface, 4 m of
// 1.92 t/m³ over 7 m of 2.1 t/m³ with γw = 1 t/m³; σ′ = 3.68 at 4 m and
// 11.38 at 11 m. The example is entered with every unit weight scaled by
// 9.81 (γw = 9.81 kN/m³), so the answers scale by 9.81 as well (stresses
// are linear in the unit weights: closed form).
func TestNPTELWaterAtSurface(t *testing.T) {
	const g = 9.81
	p, err := New(Spec{WaterDepth: 0, Layers: []LayerSpec{
		{Thickness: 4 * m, Drainage: Undrained, Su: 20 * kPa, SaturatedUnitWeight: 1.92 * g * kNm3},
		{Thickness: 7 * m, Drainage: Undrained, Su: 30 * kPa, SaturatedUnitWeight: 2.1 * g * kNm3},
	}})
	if err != nil {
		t.Fatal(err)
	}
	checkStresses(t, "NPTEL", p, []stressCheck{
		{4, 7.68 * g, 4 * g, 3.68 * g},
		{11, 22.38 * g, 11 * g, 11.38 * g},
	}, 1e-9)
}

// TestFreeWaterAndSurcharge: closed forms. Free water hw = 4 m over a
// 10 m layer of γsat 19 kN/m³: σv(z) = 9.81·4 + 19·z, u = 9.81·(4+z),
// σ′v = 9.19·z; a 25 kPa surcharge adds 25 to σv and σ′v only.
func TestFreeWaterAndSurcharge(t *testing.T) {
	p, err := New(Spec{WaterDepth: -4 * m, Surcharge: 25 * kPa, Layers: []LayerSpec{
		{Thickness: 10 * m, Drainage: Undrained, Su: 15 * kPa, SaturatedUnitWeight: 19 * kNm3}}})
	if err != nil {
		t.Fatal(err)
	}
	var cases []stressCheck
	for _, z := range []float64{0, 2.5, 10} {
		cases = append(cases, stressCheck{z, 25 + 9.81*4 + 19*z, 9.81 * (4 + z), 25 + 9.19*z})
	}
	checkStresses(t, "free water", p, cases, 1e-9)
}

// TestArtesian: closed form. Hydrostatic water table at 1 m in 6 m of clay
// (γsat 18) over sand (γsat 20) with a head 3 m above ground at 6 m:
// points (1 m, 0) and (6 m, 9.81·9). Between them u is linear; below,
// hydrostatic from the last point.
func TestArtesian(t *testing.T) {
	p, err := New(Spec{WaterDepth: 1 * m,
		PorePressures: []PorePoint{{1 * m, 0}, {6 * m, 9.81 * 9 * kPa}},
		Layers: []LayerSpec{
			{Name: "clay", Thickness: 6 * m, Drainage: Undrained, Su: 30 * kPa, SaturatedUnitWeight: 18 * kNm3},
			{Name: "sand", Thickness: 6 * m, Drainage: Drained, Phi: 35 * units.Degree, SaturatedUnitWeight: 20 * kNm3},
		}})
	if err != nil {
		t.Fatal(err)
	}
	u := func(z float64) float64 { // closed form
		if z <= 1 {
			return 0
		}
		if z <= 6 {
			return 9.81 * 9 * (z - 1) / 5
		}
		return 9.81*9 + 9.81*(z-6)
	}
	sig := func(z float64) float64 {
		if z <= 6 {
			return 18 * z
		}
		return 18*6 + 20*(z-6)
	}
	var cases []stressCheck
	for _, z := range []float64{0.5, 1, 3.5, 6, 9, 12} {
		cases = append(cases, stressCheck{z, sig(z), u(z), sig(z) - u(z)})
	}
	checkStresses(t, "artesian", p, cases, 1e-9)
	// A higher head lifts the clay: the error names the depth.
	_, err = New(Spec{WaterDepth: 1 * m, PorePressures: []PorePoint{{1 * m, 0}, {6 * m, 9.81 * 12 * kPa}},
		Layers: []LayerSpec{{Thickness: 6 * m, Drainage: Undrained, Su: 30 * kPa, SaturatedUnitWeight: 18 * kNm3}}})
	if err == nil || !contains(err.Error(), "6 m depth is negative") {
		t.Errorf("uplift: err = %v, want negative effective stress at 6 m", err)
	}
}
