package pile

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// TestSectionGeometry checks areas and perimeters against closed forms,
// and an H-section against the AISC Manual's HP12x74 (from memory: A =
// 21.8 in², d = 12.13 in, bf = 12.22 in, tw = 0.605 in, tf = 0.610 in;
// the rolled fillets, which this section leaves out, account for about
// 1.5 %, so the area is checked within 2 %).
func TestSectionGeometry(t *testing.T) {
	pipe := Section{Shape: OpenPipe, Diameter: 0.508 * m, Wall: 0.0254 * m}
	// Closed forms: π/4·(D² − (D − 2t)²), πD, π(D − 2t).
	near(t, "pipe annulus", pipe.MaterialArea().SquareMetres(), math.Pi/4*(0.508*0.508-0.4572*0.4572), 1e-12)
	near(t, "pipe outer perimeter", pipe.OuterPerimeter().Metres(), math.Pi*0.508, 1e-12)
	near(t, "pipe inner perimeter", pipe.InnerPerimeter().Metres(), math.Pi*0.4572, 1e-12)
	sq := Section{Shape: Square, Width: 0.4 * m}
	near(t, "square area", sq.GrossArea().SquareMetres(), 0.16, 1e-12)
	near(t, "square perimeter", sq.OuterPerimeter().Metres(), 1.6, 1e-12)
	hp := Section{Shape: HSection, Depth: 12.13 * in, Width: 12.22 * in, Web: 0.605 * in, Flange: 0.610 * in}
	near(t, "HP12x74 steel area", hp.MaterialArea().SquareInches(), 21.8, 0.02)
	near(t, "HP12x74 box area", hp.GrossArea().SquareInches(), 12.13*12.22, 1e-12)
	near(t, "HP12x74 box perimeter", hp.OuterPerimeter().Inches(), 2*(12.13+12.22), 1e-12)
	// Steel perimeter 2d + 4bf − 2tw (closed form).
	near(t, "HP12x74 steel perimeter", (hp.OuterPerimeter() + hp.InnerPerimeter()).Inches(), 2*12.13+4*12.22-2*0.605, 1e-12)
	if !hp.CanPlug() || sq.CanPlug() {
		t.Error("CanPlug wrong")
	}
}

// uniformClay is a scenario of our own: a dry uniform clay, su = 50 kPa,
// γ = 18 kN/m³, 60 m deep.
func uniformClay(t *testing.T) *profile.Profile {
	return mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "clay", Thickness: 60 * m, Drainage: profile.Undrained, Su: 50 * kPa, UnitWeight: 18 * kNm},
	}})
}

// TestRequiredLengthClosedForm: in a uniform clay with α = 0.6 and
// Nc = 9, Rc(L) = 9·su·A + α·su·πD·L (closed form); with a factor of
// safety of 2.5 on 1000 kN the pile needs L ≥ (2500 − 9·50·A)/(0.6·50·π·0.5)
// = 51.18 m, so on a 0.5 m grid the first passing length is 51.5 m.
func TestRequiredLengthClosedForm(t *testing.T) {
	prof := uniformClay(t)
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Installation: Bored}
	ms := Methods{ShaftUndrained: shaft.AlphaGiven{Alpha: 0.6}}
	area := math.Pi / 4 * 0.25
	lmin := (2500 - 9*50*area) / (0.6 * 50 * math.Pi * 0.5)
	l, err := RequiredLength(prof, p, ms, SafetyFactor{Global: 2.5}, Loads{Compression: Action{Permanent: 1000 * kN}}, Search{Step: 0.5 * m, MaxTip: 59 * m})
	if err != nil {
		t.Fatal(err)
	}
	want := math.Ceil(lmin/0.5) * 0.5
	if !l.Found || math.Abs(l.Length.Metres()-want) > 1e-9 {
		t.Errorf("required length %+v, want %.2f m (exact %.3f m)", l, want, lmin)
	}
	if !strings.Contains(l.Governs, "compression") {
		t.Errorf("governs %q, want compression", l.Governs)
	}
	// Too short a search range finds nothing.
	l, err = RequiredLength(prof, p, ms, SafetyFactor{Global: 2.5}, Loads{Compression: Action{Permanent: 1000 * kN}}, Search{Step: 0.5 * m, MaxTip: 30 * m})
	if err != nil || l.Found {
		t.Errorf("search to 30 m: %+v, %v; want not found", l, err)
	}
}

// TestSearchZeroValues: the zero Search searches every 0.5 m down to the
// bottom of the profile, and the zero DepthGrid gives every 0.5 m from one
// step below the head to the bottom: the same answers as the values spelled
// out (the closed form above gives 51.5 m in the 60 m clay). A search that
// finds nothing is not an error and says how near it came.
func TestSearchZeroValues(t *testing.T) {
	prof := uniformClay(t)
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Installation: Bored}
	ms := Methods{ShaftUndrained: shaft.AlphaGiven{Alpha: 0.6}}
	loads := Loads{Compression: Action{Permanent: 1000 * kN}}
	zero, err := RequiredLength(prof, p, ms, SafetyFactor{Global: 2.5}, loads, Search{})
	if err != nil {
		t.Fatal(err)
	}
	spelled, err := RequiredLength(prof, p, ms, SafetyFactor{Global: 2.5}, loads, Search{Step: 0.5 * m, MaxTip: 60 * m})
	if err != nil {
		t.Fatal(err)
	}
	if !zero.Found || zero.Length != spelled.Length || zero.Step != 0.5*m || zero.MaxTip != 60*m {
		t.Errorf("zero Search: %+v; spelled out: %+v", zero, spelled)
	}
	if math.Abs(zero.Length.Metres()-51.5) > 1e-9 {
		t.Errorf("zero Search: length %v, want 51.5 m", zero.Length)
	}
	none, err := RequiredLength(prof, p, ms, SafetyFactor{Global: 2.5}, Loads{Compression: Action{Permanent: 1e5 * kN}}, Search{})
	if err != nil {
		t.Fatalf("a search that finds nothing: error %v, want none", err)
	}
	if none.Found || none.BestTipDepth != 60*m || !strings.Contains(none.NotFound(), "60 m") || !(none.BestUse > 1) {
		t.Errorf("not found: %+v, %q", none, none.NotFound())
	}
	if _, err := RequiredLength(prof, p, ms, SafetyFactor{Global: 2.5}, loads, Search{Step: -1 * m}); err == nil {
		t.Error("a negative step: no error")
	}
	a, err := NewAnalysis(prof, Pile{Section: p.Section, Installation: Bored, Length: 60 * m}, ms, nil)
	if err != nil {
		t.Fatal(err)
	}
	rows, err := a.WithDepth(DepthGrid{}, nil)
	if err != nil {
		t.Fatal(err)
	}
	if len(rows) != 120 || rows[0].TipDepth != 0.5*m || rows[119].TipDepth != 60*m {
		t.Errorf("zero DepthGrid: %d rows from %v to %v, want 120 from 0.5 m to 60 m", len(rows), rows[0].TipDepth, rows[len(rows)-1].TipDepth)
	}
}

// TestZonesAndWeight: a zone without shaft friction removes α·su·p over
// its length; the pile's effective weight is γp·A above water and
// (γp − γw)·A below (closed forms).
func TestZonesAndWeight(t *testing.T) {
	gw := 9.81 * kNm
	prof := mustProfile(t, profile.Spec{WaterDepth: 4 * m, WaterUnitWeight: gw, Layers: []profile.LayerSpec{
		{Name: "clay", Thickness: 30 * m, Drainage: profile.Undrained, Su: 50 * kPa, UnitWeight: 18 * kNm, SaturatedUnitWeight: 19 * kNm},
	}})
	d := 0.6
	area := math.Pi / 4 * d * d
	p := Pile{Section: Section{Shape: Circle, Diameter: units.Length(d)}, Length: 10 * m, Installation: Bored, UnitWeight: 24 * kNm}
	ms := Methods{ShaftUndrained: shaft.AlphaGiven{Alpha: 0.5}, NoShaft: []Zone{{Top: 0, Bottom: 3 * m}}}
	c := mustCapacity(t, prof, p, ms)
	near(t, "shaft below the zone", c.Shaft.KN(), 0.5*50*math.Pi*d*7, 1e-12)
	w := 24*area*4 + (24-9.81)*area*6
	near(t, "effective weight", c.Weight.KN(), w, 1e-12)
	near(t, "tension", c.Tension.KN(), c.TensionShaft.KN()+w, 1e-12)
	ms.SelfWeight = WeightGross
	c2 := mustCapacity(t, prof, p, ms)
	near(t, "gross compression", c2.Compression.KN(), c.Tip.KN()+c.Shaft.KN()-w, 1e-12)
	ms.SelfWeight = WeightNet
	c3 := mustCapacity(t, prof, p, ms)
	sv, _ := prof.EffectiveStress(10 * m)
	near(t, "net tip", c3.Tip.KN(), (9*50-sv.KPa())*area, 1e-12)
}

// TestLayeredTip: 2 m into a sand below a clay with D = 0.5 m, Meyerhof's
// (1976) rule (as presented by Das; from memory) gives
// qp = q_clay + (q_sand − q_clay)·2/(10·0.5), with q_clay = 9·su at the
// interface and q_sand the sand's own value at the tip, both evaluated
// here independently through package bearing.
func TestLayeredTip(t *testing.T) {
	prof := mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "clay", Thickness: 8 * m, Drainage: profile.Undrained, Su: 40 * kPa, UnitWeight: 18 * kNm},
		{Name: "sand", Thickness: 20 * m, Drainage: profile.Drained, Phi: 35 * deg, UnitWeight: 19 * kNm},
	}})
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Length: 10 * m, Installation: DrivenHigh}
	c := mustCapacity(t, prof, p, DefaultMethods())
	q := units.Stress(8*18+2*19) * kPa
	phi := 35 * deg
	r, err := bearing.Meyerhof{}.Tip(bearing.Input{Phi: phi, Q: q})
	if err != nil {
		t.Fatal(err)
	}
	want := 360 + (r.Qp.KPa()-360)*2/5
	near(t, "layered tip", c.UnitTip.KPa(), want, 1e-12)
	if c.Flags&LayeredTip == 0 {
		t.Errorf("LayeredTip flag not set: %v", c.Flags)
	}
	// Twelve diameters in, the rule no longer applies.
	p.Length = 14 * m
	c = mustCapacity(t, prof, p, DefaultMethods())
	if c.Flags&LayeredTip != 0 {
		t.Errorf("rule applied 6 m (12 D) into the sand")
	}
	// A soft layer 1 m below the tip raises the weak-layer warning.
	prof2 := mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "sand", Thickness: 11 * m, Drainage: profile.Drained, Phi: 35 * deg, UnitWeight: 19 * kNm},
		{Name: "soft clay", Thickness: 10 * m, Drainage: profile.Undrained, Su: 15 * kPa, UnitWeight: 16 * kNm},
	}})
	p.Length = 10 * m
	c = mustCapacity(t, prof2, p, DefaultMethods())
	if c.Flags&WeakBelow == 0 {
		t.Errorf("no WeakBelow warning with soft clay 1 m below the tip: %v", c.Flags)
	}
}

// TestBadInput: each bad input gives an error that names the field.
func TestBadInput(t *testing.T) {
	prof := uniformClay(t)
	good := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Length: 10 * m, Installation: Bored}
	cases := []struct {
		name  string
		edit  func(p *Pile, ms *Methods)
		field string
	}{
		{"tip below profile", func(p *Pile, ms *Methods) { p.Length = 70 * m }, "pile.length"},
		{"negative length", func(p *Pile, ms *Methods) { p.Length = -1 }, "pile.length"},
		{"NaN diameter", func(p *Pile, ms *Methods) { p.Section.Diameter = units.Length(math.NaN()) }, "pile.section.diameter"},
		{"wall too thick", func(p *Pile, ms *Methods) { p.Section = Section{Shape: OpenPipe, Diameter: 0.5, Wall: 0.3} }, "pile.section.wall"},
		{"no installation", func(p *Pile, ms *Methods) { p.Installation = 0 }, "pile.installation"},
		{"negative head", func(p *Pile, ms *Methods) { p.HeadDepth = -2 }, "pile.head_depth"},
		{"bad critical depth", func(p *Pile, ms *Methods) { ms.CriticalDepth = 2 }, "methods.critical_depth"},
		{"too many layer overrides", func(p *Pile, ms *Methods) { ms.Layers = make([]LayerMethods, 3) }, "methods.layers"},
		{"λ in a drained layer", func(p *Pile, ms *Methods) { ms.Layers = []LayerMethods{{Lambda: true}}; p.Section.Diameter = 0.5 }, ""},
		{"bad zone", func(p *Pile, ms *Methods) { ms.NoShaft = []Zone{{Top: 3, Bottom: 1}} }, "methods.no_shaft[0]"},
		{"bad tension factor", func(p *Pile, ms *Methods) { ms.Tension = TensionFactor{Name: "given", Value: 1.5} }, "methods.tension_shaft_ratio"},
	}
	for _, c := range cases {
		p, ms := good, Methods{}
		c.edit(&p, &ms)
		_, err := NewAnalysis(prof, p, ms, nil)
		if c.name == "λ in a drained layer" {
			// the clay is undrained, so λ is accepted there
			if err != nil {
				t.Errorf("%s: %v", c.name, err)
			}
			continue
		}
		if err == nil || !strings.Contains(err.Error(), c.field) {
			t.Errorf("%s: error %v, want one naming %q", c.name, err, c.field)
		}
	}
	// A method that cannot evaluate names the layer.
	a, err := NewAnalysis(prof, good, Methods{ShaftUndrained: shaft.Beta{K: shaft.KJaky{}, Delta: shaft.DeltaOverPhi{Ratio: 1}}}, nil)
	if err == nil {
		_, err = a.Capacity()
	}
	var pe *PathError
	if !errors.As(err, &pe) || pe.Path != "layers[0].shaft" || !strings.Contains(err.Error(), `layer "clay"`) {
		t.Errorf("β in a clay without φ′: %v, want a *PathError at layers[0].shaft naming the clay", err)
	}
}

// TestBreakdownSums: the rows of a breakdown add up to the capacity.
func TestBreakdownSums(t *testing.T) {
	prof := mustProfile(t, layeredSpec(siUnits, false))
	for _, pm := range propertyMethods {
		a, err := NewAnalysis(prof, layeredPile(siUnits), pm.m, nil)
		if err != nil {
			t.Fatal(err)
		}
		b, err := a.Breakdown()
		if err != nil {
			t.Fatal(err)
		}
		sum := 0.0
		for _, r := range b.Rows {
			sum += float64(r.Force)
		}
		if !relClose(sum, float64(b.Shaft), 1e-12) {
			t.Errorf("%s: rows sum to %g N, shaft %g N", pm.name, sum, float64(b.Shaft))
		}
		if !relClose(float64(b.Tip.Force), float64(b.Capacity.Tip), 1e-12) {
			t.Errorf("%s: tip block %v, capacity %v", pm.name, b.Tip.Force, b.Capacity.Tip)
		}
		if len(b.Sources) == 0 {
			t.Errorf("%s: no sources listed", pm.name)
		}
	}
}

// TestTipModelMatchesMethods: the reduced tip model gives what the method
// itself gives, at every depth of every layer, for every reducible method.
func TestTipModelMatchesMethods(t *testing.T) {
	tips := []bearing.Tip{bearing.Meyerhof{}, bearing.Vesic{}, bearing.Janbu{}, bearing.GivenNq{Nq: 40, Limit: 4 * units.Megapascal},
		bearing.APISand{Class: 2}}
	prof := mustProfile(t, layeredSpec(siUnits, false))
	for _, tip := range tips {
		ms := Methods{TipDrained: tip, TipUndrained: bearing.Skempton{}}
		a, err := NewAnalysis(prof, Pile{Section: Section{Shape: Circle, Diameter: 0.6 * m}, Length: 30 * m, Installation: DrivenHigh}, ms, nil)
		if err != nil {
			t.Fatal(err)
		}
		for z := 0.25; z < 31; z += 0.37 {
			var fast, slow tipResult
			var td tipDetail
			e1 := a.tipAt(z, &fast, nil, -1)
			e2 := a.tipAt(z, &slow, &td, -1)
			if (e1 == nil) != (e2 == nil) {
				t.Fatalf("%s at %g: errors differ: %v / %v", tip.ID(), z, e1, e2)
			}
			if e1 == nil && (!relClose(fast.qp, slow.qp, 1e-12) || fast.flags != slow.flags) {
				t.Errorf("%s at %g m: model %g (%v), method %g (%v)", tip.ID(), z, fast.qp, fast.flags, slow.qp, slow.flags)
			}
		}
	}
}

// TestAlphaAPIClosedFormMatchesQuadrature: the API α with constant su
// integrates in closed form; forcing the quadrature path (through a cap
// that never governs) gives the same shaft within the quadrature tolerance.
func TestAlphaAPIClosedFormMatchesQuadrature(t *testing.T) {
	prof := mustProfile(t, profile.Spec{WaterDepth: 2 * m, Layers: []profile.LayerSpec{
		{Name: "clay", Thickness: 40 * m, Drainage: profile.Undrained, Su: 60 * kPa, UnitWeight: 17 * kNm, SaturatedUnitWeight: 18 * kNm},
	}})
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.6 * m}, Length: 35 * m, Installation: DrivenHigh}
	c1 := mustCapacity(t, prof, p, Methods{ShaftUndrained: shaft.AlphaAPI{}})
	c2 := mustCapacity(t, prof, p, Methods{ShaftUndrained: shaft.Capped{Method: shaft.AlphaAPI{}, Limit: shaft.LimitGiven{Fs: 4 * units.Megapascal}}})
	if !relClose(float64(c1.Shaft), float64(c2.Shaft), 1e-6) {
		t.Errorf("closed form %v, quadrature %v", c1.Shaft, c2.Shaft)
	}
}

// TestQuadratureRule: the Gauss-Kronrod (3, 7) constants integrate x^k
// on [-1, 1] exactly for k ≤ 11 (K7) and k ≤ 5 (G3): closed form
// ∫x^k = 2/(k+1) for even k, 0 for odd k.
func TestQuadratureRule(t *testing.T) {
	for k := 0; k <= 11; k++ {
		exact := 0.0
		if k%2 == 0 {
			exact = 2 / float64(k+1)
		}
		var kr, g float64
		for i, x := range gkNodes {
			kr += gkK[i] * math.Pow(x, float64(k))
			g += gkG[i] * math.Pow(x, float64(k))
		}
		if math.Abs(kr-exact) > 1e-14 {
			t.Errorf("K7 x^%d: %.16g, want %.16g", k, kr, exact)
		}
		if k <= 5 && math.Abs(g-exact) > 1e-14 {
			t.Errorf("G3 x^%d: %.16g, want %.16g", k, g, exact)
		}
	}
}
