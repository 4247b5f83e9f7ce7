package pile

// Sources: none needed; the properties are closed form consequences of the
// rules, drawn on invented soils.

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// The properties below hold by construction of the rules (closed-form
// reasoning), not by any published number.

// drawLayers draws a profile of 2 to 4 layers of our own, drained or
// undrained in turn at random, with a water table, and returns it with its
// layer boundaries.
func drawLayers(r *rapid.T) (*profile.Profile, []float64) {
	n := rapid.IntRange(2, 4).Draw(r, "layers")
	var ls []profile.LayerSpec
	var bounds []float64
	z := 0.0
	for i := 0; i < n; i++ {
		th := rapid.Float64Range(0.5, 12).Draw(r, "thickness")
		if i == n-1 {
			th = 40
		}
		g := rapid.Float64Range(16, 20).Draw(r, "gamma")
		l := profile.LayerSpec{Name: "layer", Thickness: units.Length(th), UnitWeight: units.UnitWeight(g) * kNm,
			SaturatedUnitWeight: units.UnitWeight(g+1.5) * kNm}
		if rapid.Bool().Draw(r, "drained") {
			l.Drainage = profile.Drained
			l.Phi = units.Angle(rapid.Float64Range(25, 42).Draw(r, "phi")) * deg
		} else {
			l.Drainage = profile.Undrained
			l.SuTop = units.Stress(rapid.Float64Range(10, 150).Draw(r, "suTop")) * kPa
			l.SuBottom = units.Stress(rapid.Float64Range(10, 150).Draw(r, "suBottom")) * kPa
		}
		ls = append(ls, l)
		z += th
		if i < n-1 {
			bounds = append(bounds, z)
		}
	}
	zw := rapid.Float64Range(0.5, 15).Draw(r, "water")
	prof, err := profile.New(profile.Spec{WaterDepth: units.Length(zw), Layers: ls})
	if err != nil {
		r.Fatal(err)
	}
	return prof, bounds
}

// TestPropTipContinuous: with the default rules (embedment ramp, layered
// rule, weak-layer rule), the unit tip resistance is continuous in depth:
// at every layer boundary, at the edge of every 10 D zone above a weaker
// layer, at the end of every 10 D transition into a stronger layer, and at
// the critical embedment depth. Just above and at each such depth, qp
// differs by no more than its slope over 1 µm allows.
func TestPropTipContinuous(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		prof, bounds := drawLayers(r)
		d := rapid.Float64Range(0.3, 1.2).Draw(r, "d")
		p := closedPipe(units.Length(d))
		p.Length = prof.Depth()
		ms := DefaultMethods()
		a, err := NewAnalysis(prof, p, ms, nil)
		if err != nil {
			r.Fatal(err)
		}
		var at []float64
		at = append(at, DefaultEmbedmentRatio*d)
		for _, b := range bounds {
			at = append(at, b, b-WeakZoneRatio*d, b+10*d)
		}
		at = append(at, rapid.Float64Range(0.01, 60).Draw(r, "anywhere"))
		const eps = 1e-6
		for _, z := range at {
			if !(z-eps > 0) || z >= float64(prof.Depth()) {
				continue
			}
			c0, err := a.CapacityAt(units.Length(z - eps))
			if err != nil {
				r.Fatal(err)
			}
			c1, err := a.CapacityAt(units.Length(z))
			if err != nil {
				r.Fatal(err)
			}
			q0, q1 := float64(c0.UnitTip), float64(c1.UnitTip)
			// The steepest slope here is below γ′·Nq*(45°) ≈ 21 kN/m³ × 930
			// ≈ 20 MPa/m, so 1 µm moves qp by less than 20 Pa.
			if math.Abs(q0-q1) > 1e-6*math.Max(q0, q1)+50 {
				r.Fatalf("qp jumps at %.6g m: %.6g Pa just above, %.6g Pa at it (flags %v / %v)", z, q0, q1, c0.Flags, c1.Flags)
			}
		}
	})
}

// TestPropWithDepthMatchesSingleRunsRules: with every rule of the tip and
// the drilled-shaft zones in force (driven or bored at random), the
// one-pass capacity with depth equals a separate run at each depth.
func TestPropWithDepthMatchesSingleRunsRules(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		prof, _ := drawLayers(r)
		d := rapid.Float64Range(0.3, 1.2).Draw(r, "d")
		inst := rapid.SampledFrom([]Installation{DrivenHigh, Bored, Augered}).Draw(r, "installation")
		p := Pile{Section: Section{Shape: Circle, Diameter: units.Length(d)}, Installation: inst, UnitWeight: 24 * kNm}
		if inst == DrivenHigh && rapid.Bool().Draw(r, "open") {
			p.Section = Section{Shape: OpenPipe, Diameter: units.Length(d), Wall: 20 * mm}
		}
		p.Length = prof.Depth()
		ms := DefaultMethods()
		ms.CriticalDepth = rapid.SampledFrom([]float64{0, 15}).Draw(r, "critical")
		a, err := NewAnalysis(prof, p, ms, nil)
		if err != nil {
			r.Fatal(err)
		}
		step := rapid.Float64Range(0.1, 1).Draw(r, "step")
		rows, err := a.WithDepth(DepthGrid{From: units.Length(step), To: 30 * m, Step: units.Length(step)}, nil)
		if err != nil {
			r.Fatal(err)
		}
		for _, row := range rows {
			s, err := a.CapacityAt(row.TipDepth)
			if err != nil {
				r.Fatal(err)
			}
			if !relClose(float64(row.Compression), float64(s.Compression), 1e-6) ||
				!relClose(float64(row.Tension), float64(s.Tension), 1e-6) ||
				!relClose(float64(row.UnitTip), float64(s.UnitTip), 1e-12) || row.Flags != s.Flags {
				r.Fatalf("at %v: with depth %v / %v / %v (%v), single %v / %v / %v (%v)", row.TipDepth,
					row.Compression, row.Tension, row.UnitTip, row.Flags, s.Compression, s.Tension, s.UnitTip, s.Flags)
			}
		}
	})
}
