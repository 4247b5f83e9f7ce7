package profile

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// The property tests compare the package with itself under transformations
// that must not change any stress (closed-form invariants of σv = Σγ·Δz):
// no published values are involved (source: the closed form above; drawn
// ranges are our own).

type genLayer struct {
	t, gAbove, gSat float64 // m, kN/m³
}

func drawSpec(t *rapid.T) (Spec, []genLayer) {
	n := rapid.IntRange(1, 6).Draw(t, "layers")
	gl := make([]genLayer, n)
	var depth float64
	for i := range gl {
		gl[i].t = rapid.Float64Range(0.1, 10).Draw(t, "t")
		gl[i].gSat = rapid.Float64Range(15, 23).Draw(t, "γsat")
		gl[i].gAbove = rapid.Float64Range(12, gl[i].gSat).Draw(t, "γ")
		depth += gl[i].t
	}
	spec := Spec{
		WaterDepth: units.Length(rapid.Float64Range(-5, depth+2).Draw(t, "water")) * m,
		Surcharge:  units.Stress(rapid.Float64Range(0, 100).Draw(t, "q")) * kPa,
	}
	spec.Layers = layersOf(gl)
	return spec, gl
}

func layersOf(gl []genLayer) []LayerSpec {
	out := make([]LayerSpec, len(gl))
	for i, g := range gl {
		out[i] = LayerSpec{Thickness: units.Length(g.t) * m, Drainage: Drained, Phi: 30 * units.Degree,
			UnitWeight: units.UnitWeight(g.gAbove) * kNm3, SaturatedUnitWeight: units.UnitWeight(g.gSat) * kNm3}
	}
	return out
}

func closeRel(a, b, rel, abs float64) bool {
	return math.Abs(a-b) <= math.Max(rel*math.Max(math.Abs(a), math.Abs(b)), abs)
}

func TestPropSplitLayer(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		spec, gl := drawSpec(t)
		k := rapid.IntRange(0, len(gl)-1).Draw(t, "split")
		half := gl[k]
		half.t /= 2
		split := append(append(append([]genLayer{}, gl[:k]...), half, half), gl[k+1:]...)
		spec2 := spec
		spec2.Layers = layersOf(split)
		a, err := New(spec)
		if err != nil {
			t.Fatal(err)
		}
		b, err := New(spec2)
		if err != nil {
			t.Fatal(err)
		}
		if !closeRel(float64(a.Depth()), float64(b.Depth()), 1e-12, 0) {
			t.Fatalf("depth %v vs %v", a.Depth(), b.Depth())
		}
		for range 20 {
			z := units.Length(rapid.Float64Range(0, float64(a.Depth())).Draw(t, "z"))
			if z > b.Depth() {
				z = b.Depth()
			}
			sa, _ := a.StressesAt(z)
			sb, err := b.StressesAt(z)
			if err != nil {
				t.Fatal(err)
			}
			if !closeRel(float64(sa.Total), float64(sb.Total), 1e-9, 1e-6) ||
				!closeRel(float64(sa.Pore), float64(sb.Pore), 1e-9, 1e-6) ||
				!closeRel(float64(sa.Effective), float64(sb.Effective), 1e-9, 1e-6) {
				t.Fatalf("z %v: %+v unsplit, %+v split", z, sa, sb)
			}
		}
	})
}

func TestPropEffectiveStressMonotone(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		spec, _ := drawSpec(t)
		p, err := New(spec)
		if err != nil {
			t.Fatal(err)
		}
		d := float64(p.Depth())
		prev := math.Inf(-1)
		steps := rapid.IntRange(2, 200).Draw(t, "steps")
		for i := range steps + 1 {
			z := min(units.Length(d*float64(i)/float64(steps)), p.Depth())
			s, err := p.EffectiveStress(z)
			if err != nil {
				t.Fatal(err)
			}
			if float64(s) < prev-1e-9*math.Abs(prev) {
				t.Fatalf("σ′v fell from %v to %v at %v", prev, float64(s), z)
			}
			prev = float64(s)
		}
		// At any break too (both sides meet there).
		for _, z := range p.Breaks() {
			if s, err := p.EffectiveStress(z); err != nil || s < 0 {
				t.Fatalf("σ′v(%v) = %v, %v", z, s, err)
			}
		}
	})
}

// TestPropUSUnits enters the same profile in feet, pcf and psf (γw too)
// and compares stresses, read in psf, with the SI profile's within 1e-9.
func TestPropUSUnits(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		spec, gl := drawSpec(t)
		si, err := New(spec)
		if err != nil {
			t.Fatal(err)
		}
		ft := func(l units.Length) units.Length { return units.Length(l.Feet()) * units.Foot }
		pcf := func(g units.UnitWeight) units.UnitWeight { return units.UnitWeight(g.PCF()) * units.PCF }
		us := Spec{
			WaterDepth:      ft(spec.WaterDepth),
			Surcharge:       units.Stress(spec.Surcharge.PSF()) * units.PSF,
			WaterUnitWeight: pcf(9.81 * kNm3),
		}
		for _, l := range layersOf(gl) {
			l.Thickness = ft(l.Thickness)
			l.UnitWeight, l.SaturatedUnitWeight = pcf(l.UnitWeight), pcf(l.SaturatedUnitWeight)
			us.Layers = append(us.Layers, l)
		}
		usp, err := New(us)
		if err != nil {
			t.Fatal(err)
		}
		for range 20 {
			zFt := rapid.Float64Range(0, si.Depth().Feet()).Draw(t, "z ft")
			a, err1 := si.StressesAt(min(units.Length(zFt)*units.Foot, si.Depth()))
			b, err2 := usp.StressesAt(min(units.Length(zFt)*units.Foot, usp.Depth()))
			if err1 != nil || err2 != nil {
				t.Fatal(err1, err2)
			}
			for _, p := range [][2]units.Stress{{a.Total, b.Total}, {a.Pore, b.Pore}, {a.Effective, b.Effective}} {
				if !closeRel(p[0].PSF(), p[1].PSF(), 1e-9, 1e-9) {
					t.Fatalf("z %.6g ft: SI %v psf, US %v psf", zFt, p[0].PSF(), p[1].PSF())
				}
			}
		}
	})
}

// drawCut draws an excavation and scour for a profile depth deep, leaving
// at least 5 % of it; with cut false the surcharge is cleared, as a cut
// requires.
func drawCut(t *rapid.T, spec *Spec, depth float64) {
	d := rapid.Float64Range(0, 0.95).Draw(t, "cut fraction") * depth
	e := d * rapid.Float64Range(0, 1).Draw(t, "excavation share")
	g := (d - e) * rapid.Float64Range(0, 1).Draw(t, "general share")
	spec.ExcavationDepth = units.Length(e)
	spec.Scour = Scour{General: units.Length(g), Local: units.Length(max(0, d-e-g))}
	spec.Surcharge = 0
}

// TestPropCutEqualsShifted: a profile cut down to the design ground line
// zd has, at depth z ≥ zd, the stresses of the same ground built from zd
// down (layers shifted up by zd, what lies above zd left out, the water
// level kept where it is), at depth z − zd.
func TestPropCutEqualsShifted(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		spec, gl := drawSpec(t)
		var depth float64
		for _, g := range gl {
			depth += g.t
		}
		drawCut(t, &spec, depth)
		cut, err := New(spec)
		if err != nil {
			t.Fatal(err)
		}
		zd := float64(cut.DesignGround())
		var kept []genLayer
		top := 0.0
		for _, g := range gl {
			bot := top + g.t
			if bot-zd > 1e-9 {
				h := g
				h.t = bot - max(top, zd)
				kept = append(kept, h)
			}
			top = bot
		}
		shifted := Spec{WaterDepth: spec.WaterDepth - units.Length(zd), Layers: layersOf(kept)}
		ref, err := New(shifted)
		if err != nil {
			t.Fatal(err)
		}
		for range 20 {
			z := rapid.Float64Range(zd, float64(cut.Depth())).Draw(t, "z")
			a, err1 := cut.StressesAt(units.Length(z))
			b, err2 := ref.StressesAt(min(units.Length(z-zd), ref.Depth()))
			if err1 != nil || err2 != nil {
				t.Fatal(err1, err2)
			}
			for _, p := range [][2]units.Stress{{a.Total, b.Total}, {a.Pore, b.Pore}, {a.Effective, b.Effective}} {
				if !closeRel(float64(p[0]), float64(p[1]), 1e-9, 1e-4) {
					t.Fatalf("z %v (zd %v): cut %+v, shifted %+v", z, zd, a, b)
				}
			}
		}
	})
}

// TestPropCutStresses: with a cut, σ′v is zero above the design ground
// line, never negative, never falling with depth, and σv, u and σ′v are
// continuous across every break (hydrostatic water: closed form).
func TestPropCutStresses(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		spec, gl := drawSpec(t)
		var depth float64
		for _, g := range gl {
			depth += g.t
		}
		drawCut(t, &spec, depth)
		p, err := New(spec)
		if err != nil {
			t.Fatal(err)
		}
		zd := p.DesignGround()
		prev := 0.0
		steps := rapid.IntRange(2, 200).Draw(t, "steps")
		for i := range steps + 1 {
			z := min(p.Depth()*units.Length(i)/units.Length(steps), p.Depth())
			s, err := p.StressesAt(z)
			if err != nil {
				t.Fatal(err)
			}
			if s.Effective < 0 || (z < zd && s.Effective != 0) {
				t.Fatalf("σ′v(%v) = %v with the design ground line at %v", z, s.Effective, zd)
			}
			if float64(s.Effective) < prev-1e-9*prev {
				t.Fatalf("σ′v fell from %v to %v at %v", prev, float64(s.Effective), z)
			}
			prev = float64(s.Effective)
		}
		// Continuity: just above each break against the break itself; the
		// steepest gradient is that of γsat ≤ 23 kN/m³.
		const eps = 1e-6
		for _, b := range p.Breaks()[1:] {
			if b < 2*eps {
				continue // no room above it
			}
			a, err1 := p.StressesAt(b - eps)
			c, err2 := p.StressesAt(b)
			if err1 != nil || err2 != nil {
				t.Fatal(err1, err2)
			}
			for _, d := range [][2]units.Stress{{a.Total, c.Total}, {a.Pore, c.Pore}, {a.Effective, c.Effective}} {
				if math.Abs(float64(d[1]-d[0])) > 23e3*eps+1e-9*math.Abs(float64(d[1]))+1e-6 {
					t.Fatalf("jump at %v (zd %v): %+v above, %+v at", b, zd, a, c)
				}
			}
		}
	})
}
