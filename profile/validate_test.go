package profile

import (
	"errors"
	"math"
	"strconv"
	"strings"
	"testing"

	"github.com/qultgeo/qult/units"
)

func contains(s, sub string) bool { return strings.Contains(s, sub) }

// Invented layers for the validation tests (no published values involved).
func sand(t units.Length) LayerSpec {
	return LayerSpec{Name: "sand", Thickness: t, Drainage: Drained, Phi: 32 * units.Degree,
		UnitWeight: 18 * kNm3, SaturatedUnitWeight: 20 * kNm3}
}

func TestValidation(t *testing.T) {
	nan := math.NaN()
	cases := []struct {
		name string
		spec Spec
		want []string
	}{
		{"no layers", Spec{}, []string{"layers: none given"}},
		{"negative thickness", Spec{Layers: []LayerSpec{sand(2 * m), sand(-1 * m)}},
			[]string{"layers[1].thickness: -1 m is outside (0, ∞)"}},
		{"all problems", Spec{Surcharge: -5 * kPa, Layers: []LayerSpec{
			{Thickness: 2 * m, Drainage: Drained, Phi: 62 * units.Degree, UnitWeight: 18 * kNm3, SaturatedUnitWeight: 20 * kNm3},
			{Thickness: 2 * m, UnitWeight: 18 * kNm3, SaturatedUnitWeight: 20 * kNm3},
			{Thickness: 2 * m, Drainage: Undrained, SaturatedUnitWeight: 20 * kNm3, OCR: 0.5},
		}}, []string{"surcharge", "layers[0].phi: 62° is outside", "layers[1].drainage", "layers[2].su", "layers[2].ocr"}},
		{"gap", Spec{Layers: []LayerSpec{
			{Top: 0, Bottom: 3 * m, Drainage: Drained, Phi: 30 * units.Degree, UnitWeight: 18 * kNm3, SaturatedUnitWeight: 20 * kNm3},
			{Top: 4 * m, Bottom: 6 * m, Drainage: Drained, Phi: 30 * units.Degree, UnitWeight: 18 * kNm3, SaturatedUnitWeight: 20 * kNm3},
		}}, []string{"layers[1].top: 4 m leaves a gap below layers[0], which ends at 3 m"}},
		{"overlap", Spec{Layers: []LayerSpec{
			{Top: 0, Bottom: 3 * m, Drainage: Drained, Phi: 30 * units.Degree, UnitWeight: 18 * kNm3, SaturatedUnitWeight: 20 * kNm3},
			{Top: 2 * m, Bottom: 6 * m, Drainage: Drained, Phi: 30 * units.Degree, UnitWeight: 18 * kNm3, SaturatedUnitWeight: 20 * kNm3},
		}}, []string{"layers[1].top: 2 m overlaps layers[0]"}},
		{"NaN thickness", Spec{Layers: []LayerSpec{sand(units.Length(nan))}}, []string{"layers[0].thickness"}},
		{"Inf water depth", Spec{WaterDepth: units.Length(math.Inf(1)), Layers: []LayerSpec{sand(2 * m)}}, []string{"water_depth"}},
		{"missing saturated weight", Spec{WaterDepth: 1 * m, Layers: []LayerSpec{
			{Thickness: 3 * m, Drainage: Drained, Phi: 30 * units.Degree, UnitWeight: 18 * kNm3}}},
			[]string{"layers[0].saturated_unit_weight: not given", "1 m"}},
		{"γsat below γw", Spec{Layers: []LayerSpec{
			{Thickness: 3 * m, Drainage: Drained, Phi: 30 * units.Degree, SaturatedUnitWeight: 9 * kNm3}}},
			[]string{"layers[0].saturated_unit_weight", "not more than γw"}},
		{"phase conflict", Spec{Layers: []LayerSpec{
			{Thickness: 3 * m, Drainage: Drained, Phi: 30 * units.Degree, DryUnitWeight: 15.2 * kNm3, VoidRatio: 0.6, Gs: 2.7}}},
			[]string{"layers[0]", "γd", "15.2"}},
		{"phase insufficient", Spec{Layers: []LayerSpec{
			{Thickness: 3 * m, Drainage: Drained, Phi: 30 * units.Degree, VoidRatio: 0.6}}},
			[]string{"layers[0]", "give also", "gs"}},
		{"bad points", Spec{PorePressures: []PorePoint{{2 * m, 0}, {1 * m, 5 * kPa}}, Layers: []LayerSpec{sand(3 * m)}},
			[]string{"pore_pressures[1].depth"}},
		{"water with no_water", Spec{NoWater: true, WaterDepth: 2 * m, Layers: []LayerSpec{sand(3 * m)}},
			[]string{"water_depth"}},
		{"γw in pcf mistaken", Spec{WaterUnitWeight: 62.4, Layers: []LayerSpec{sand(3 * m)}},
			[]string{"water_unit_weight"}},
		{"su both ways", Spec{Layers: []LayerSpec{{Thickness: 3 * m, Drainage: Undrained, Su: 20 * kPa, SuTop: 10 * kPa,
			SuBottom: 30 * kPa, SaturatedUnitWeight: 18 * kNm3}}}, []string{"layers[0].su"}},
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
}

func TestQueries(t *testing.T) {
	p, err := New(Spec{WaterDepth: 2.5 * m, Layers: []LayerSpec{
		sand(3 * m),
		{Name: "clay", Thickness: 5 * m, Drainage: Undrained, SuTop: 20 * kPa, SuBottom: 45 * kPa, SaturatedUnitWeight: 18 * kNm3},
	}})
	if err != nil {
		t.Fatal(err)
	}
	if d := p.Depth(); d != 8*m {
		t.Errorf("Depth = %v, want 8 m", d)
	}
	want := []units.Length{0, 2.5 * m, 3 * m, 8 * m}
	got := p.Breaks()
	if len(got) != len(want) {
		t.Fatalf("Breaks = %v, want %v", got, want)
	}
	for i := range want {
		if got[i] != want[i] {
			t.Errorf("Breaks = %v, want %v", got, want)
		}
	}
	for _, c := range []struct {
		z         units.Length
		at, above int
	}{{0, 0, 0}, {1 * m, 0, 0}, {3 * m, 1, 0}, {5 * m, 1, 1}, {8 * m, 1, 1}} {
		a, err1 := p.LayerAt(c.z)
		b, err2 := p.LayerAbove(c.z)
		if err1 != nil || err2 != nil || a != c.at || b != c.above {
			t.Errorf("z %v: LayerAt %d (%v), LayerAbove %d (%v); want %d, %d", c.z, a, err1, b, err2, c.at, c.above)
		}
	}
	if i, err := p.LayerOf(2*m, 3*m); err != nil || i != 0 {
		t.Errorf("LayerOf(2, 3) = %d, %v; want 0", i, err)
	}
	if i, err := p.LayerOf(3*m, 4*m); err != nil || i != 1 {
		t.Errorf("LayerOf(3, 4) = %d, %v; want 1", i, err)
	}
	if _, err := p.LayerOf(2*m, 4*m); err == nil || !contains(err.Error(), "crosses") {
		t.Errorf("LayerOf(2, 4): err = %v, want crossing", err)
	}
	// su linear: 20 + 25·(5.5−3)/5 = 32.5 kPa (closed form).
	if su, err := p.Layer(1).SuAt(5.5 * m); err != nil || math.Abs(su.KPa()-32.5) > 1e-9 {
		t.Errorf("SuAt(5.5) = %v, %v; want 32.5 kPa (closed form)", su, err)
	}
	if _, err := p.Layer(0).SuAt(1 * m); err == nil {
		t.Error("SuAt on a layer without su: want an error")
	}
	for _, z := range []units.Length{-1 * m, 9 * m, units.Length(math.NaN()), units.Length(math.Inf(1))} {
		if _, err := p.EffectiveStress(z); err == nil {
			t.Errorf("EffectiveStress(%v): want an error", z)
		}
	}
	if _, err := p.TotalStress(9 * m); err == nil || !contains(err.Error(), "goes down to 8 m") {
		t.Errorf("past the bottom: err = %v, want it to say how deep the profile goes", err)
	}
}

// TestDerivedWeights: closed forms for the phase-derived unit weights and
// the flags New records.
func TestDerivedWeights(t *testing.T) {
	p, err := New(Spec{WaterDepth: 1 * m, Layers: []LayerSpec{
		{Name: "fill", Thickness: 2 * m, Drainage: Drained, Phi: 30 * units.Degree, DryUnitWeight: 16 * kNm3, VoidRatio: 0.6},
		{Name: "clay", Thickness: 3 * m, Drainage: Undrained, Su: 25 * kPa, WaterContent: 0.4, Gs: 2.7},
		{Name: "silt", Thickness: 3 * m, Drainage: Undrained, Su: 25 * kPa, UnitWeight: 18 * kNm3, SaturatedUnitWeight: 19 * kNm3},
	}})
	if err != nil {
		t.Fatal(err)
	}
	gw := 9.81
	fill, clay, silt := p.Layer(0), p.Layer(1), p.Layer(2)
	cases := []struct {
		name      string
		got, want float64
	}{
		{"fill γ (dry)", fill.UnitWeight.KNPerCubicMetre(), 16},
		{"fill γsat = γd + e/(1+e)·γw", fill.SaturatedUnitWeight.KNPerCubicMetre(), 16 + 0.6/1.6*gw},
		{"clay γsat = (Gs+wGs)γw/(1+wGs)", clay.SaturatedUnitWeight.KNPerCubicMetre(), (2.7 + 0.4*2.7) * gw / (1 + 0.4*2.7)},
		{"clay γ′", clay.SubmergedUnitWeight.KNPerCubicMetre(), (2.7+0.4*2.7)*gw/(1+0.4*2.7) - gw},
		{"silt γ′", silt.SubmergedUnitWeight.KNPerCubicMetre(), 19 - gw},
	}
	for _, c := range cases {
		if math.Abs(c.got-c.want) > 1e-9 {
			t.Errorf("%s = %.9f, want %.9f (closed form)", c.name, c.got, c.want)
		}
	}
	if fill.Basis != BasisPhase|AssumedDry || clay.Basis != BasisPhase|AssumedSaturated || silt.Basis != 0 {
		t.Errorf("bases %v, %v, %v; want phase+assumed-dry, phase+assumed-saturated, given", fill.Basis, clay.Basis, silt.Basis)
	}
}

func TestQueryAllocs(t *testing.T) {
	p := benchProfile(20)
	z := 0.37 * p.Depth()
	if n := testing.AllocsPerRun(100, func() { _, _ = p.EffectiveStress(z); _, _ = p.LayerAt(z); _, _ = p.StressesAt(z) }); n != 0 {
		t.Errorf("queries allocate %v times, want 0", n)
	}
}

// TestDecimalThicknessesMeetWater: layer thicknesses written as decimals
// that add up to the water depth only to within rounding (0.01 + 0.05
// against 0.06) give a valid profile with finite stresses (closed form:
// σ′v(5 m) = γ·zw + (γsat − γw)·(5 m − zw)).
func TestDecimalThicknessesMeetWater(t *testing.T) {
	for _, c := range [][3]string{{"0.01", "0.05", "0.06"}, {"0.01", "0.17", "0.18"}, {"0.1", "0.2", "0.3"}, {"0.7", "0.1", "0.8"}} {
		num := func(s string) units.Length {
			x, err := strconv.ParseFloat(s, 64)
			if err != nil {
				t.Fatal(err)
			}
			return units.Length(x)
		}
		a, b, w := num(c[0]), num(c[1]), num(c[2])
		kNm := units.KilonewtonPerCubicMetre
		p, err := New(Spec{WaterDepth: w, Layers: []LayerSpec{
			{Name: "a", Thickness: a, Drainage: Drained, Phi: 30 * units.Degree, UnitWeight: 18 * kNm, SaturatedUnitWeight: 20 * kNm},
			{Name: "b", Thickness: b, Drainage: Drained, Phi: 30 * units.Degree, UnitWeight: 18 * kNm, SaturatedUnitWeight: 20 * kNm},
			{Name: "c", Thickness: 10, Drainage: Drained, Phi: 30 * units.Degree, UnitWeight: 18 * kNm, SaturatedUnitWeight: 20 * kNm}}})
		if err != nil {
			t.Errorf("%v: %v", c, err)
			continue
		}
		s, err := p.EffectiveStress(5 * units.Metre)
		want := 18e3*float64(w) + (20e3-9810)*(5-float64(w))
		if err != nil || math.Abs(float64(s)-want) > 1e-6*want {
			t.Errorf("%v: σ′v(5 m) = %v (%v), want %g Pa", c, s, err, want)
		}
	}
}
