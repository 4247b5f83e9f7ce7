package pile

import (
	"math"
	"strings"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// Values used below and where they come from:
//
//   - Nq* = 231 at φ′ = 38° and Nq* = 346 at 40°: Das, Principles of
//     Foundation Engineering, table of interpolated Nq* after Meyerhof
//     (1976) (read, as reproduced in a published summary of the table).
//   - The limit ql = 0.5·pa·Nq*·tanφ′ with pa = 100 kPa: Das, same
//     chapter, eq. for the limiting point resistance (read).
//   - Nc = 9 for the undrained tip: Skempton (1951), the package default.
//   - Meyerhof's (1976) weak-layer rule, qp = ql + (q0 − ql)·H/(10·B) ≤ q0
//     for a pile in a strong layer at a height H above a weak one: from
//     memory (the paper could not be reached); the linear form and the
//     10·B zone are as Tomlinson & Woodward present Meyerhof's rule
//     (from memory).
//   - The growth of qp with embedment up to the critical embedment ratio:
//     Das, same chapter, section on Meyerhof's method in sand, figure of
//     the variation of qp with L/D in a homogeneous sand (read: qp grows
//     with the embedment Lb and is constant beyond (Lb/D)cr). The ratio 10
//     is that of Meyerhof's (1976) SPT rule qp = 0.4·pa·N60·L/D ≤ 4·pa·N60
//     (from memory).

// sandOverClay is a dense dry sand (φ′ 38°, γ 19 kN/m³)
// 10 m thick over soft clay (su 15 kPa), a scenario of our own.
func sandOverClay(t *testing.T) *profile.Profile {
	return mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "dense sand", Thickness: 10 * m, Drainage: profile.Drained, Phi: 38 * deg, UnitWeight: 19 * kNm},
		{Name: "soft clay", Thickness: 20 * m, Drainage: profile.Undrained, Su: 15 * kPa, UnitWeight: 16 * kNm},
	}})
}

func closedPipe(d units.Length) Pile {
	return Pile{Section: Section{Shape: ClosedPipe, Diameter: d, Wall: 12 * mm}, Installation: DrivenHigh}
}

// TestWeakLayerBelow: a 0.5 m closed pipe with its tip 0.1 m above the
// clay. q_strong is Meyerhof's limit (σ′v·Nq* = 188·231 kPa exceeds it),
// q_weak = 9·15 kPa, H = 0.1 m, 10·D = 5 m:
//
//	qp = 135 + (ql − 135)·0.1/5 ≈ 312 kPa   (about 300 kPa)
//
// against about 9,000 kPa without the rule.
func TestWeakLayerBelow(t *testing.T) {
	prof := sandOverClay(t)
	p := closedPipe(0.5 * m)
	p.Length = 9.9 * m
	ql := 0.5 * 100 * 231 * math.Tan(38*math.Pi/180) // kPa, Das
	qw := 9 * 15.0                                   // kPa, Skempton
	want := qw + (ql-qw)*0.1/5
	a, err := NewAnalysis(prof, p, DefaultMethods(), nil)
	if err != nil {
		t.Fatal(err)
	}
	c, err := a.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	near(t, "qp 0.1 m above the clay (Meyerhof 1976 weak-layer rule)", c.UnitTip.KPa(), want, 0.01)
	if c.UnitTip.KPa() > 350 || c.Flags&WeakLayerReduced == 0 {
		t.Errorf("qp = %v, flags %v: want about 300 kPa with WeakLayerReduced", c.UnitTip, c.Flags)
	}
	b, err := a.Breakdown()
	if err != nil {
		t.Fatal(err)
	}
	tb := b.Tip
	if tb.WeakLayer != 1 {
		t.Fatalf("tip block weak layer %d, want 1", tb.WeakLayer)
	}
	near(t, "tip block q_strong", tb.Strong.KPa(), ql, 0.01)
	near(t, "tip block q_weak", tb.Weak.KPa(), qw, 1e-9)
	near(t, "tip block H", tb.H.Metres(), 0.1, 1e-9)
	near(t, "tip block 10D", tb.WeakZone.Metres(), 5, 1e-12)
	// The block's numbers give its result (the equation it shows).
	near(t, "tip block equation", tb.Qp.KPa(), tb.Weak.KPa()+(tb.Strong.KPa()-tb.Weak.KPa())*tb.H.Metres()/tb.WeakZone.Metres(), 1e-9)

	// Switched off: the full limit, and a warning.
	ms := DefaultMethods()
	ms.NoWeakLayer = true
	c = mustCapacity(t, prof, p, ms)
	near(t, "qp with the rule off (Meyerhof's limit)", c.UnitTip.KPa(), ql, 0.01)
	if c.Flags&WeakLayerOff == 0 || c.Flags&WeakLayerReduced != 0 {
		t.Errorf("flags %v: want WeakLayerOff only", c.Flags)
	}
	if !strings.Contains(c.Flags.String(), "switched off") {
		t.Errorf("messages %q do not say the rule is off", c.Flags.String())
	}
	// More than 10 D above the clay the rule does not apply (at 4.9 m the
	// embedment ramp still takes 4.9/5 of the limit).
	p.Length = 4.9 * m
	c = mustCapacity(t, prof, p, DefaultMethods())
	near(t, "qp 5.1 m above the clay", c.UnitTip.KPa(), ql*4.9/5, 0.01)
	if c.Flags&(WeakLayerReduced|WeakLayerOff) != 0 {
		t.Errorf("flags %v: the rule should not apply 10.2 D above the clay", c.Flags)
	}
}

// TestEmbedmentRamp: a 0.5 m closed pipe driven 1 m (2 D) into dense dry
// sand from the surface: σ′v·Nq* = 19·231 kPa is below the limit, and the
// ramp takes 2/10 of it; at 6 m (12 D) no ramp applies and the limit
// governs.
func TestEmbedmentRamp(t *testing.T) {
	prof := mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "dense sand", Thickness: 30 * m, Drainage: profile.Drained, Phi: 38 * deg, UnitWeight: 19 * kNm}}})
	p := closedPipe(0.5 * m)
	p.Length = 1 * m
	full := 19 * 1 * 231.0 // kPa
	c := mustCapacity(t, prof, p, DefaultMethods())
	near(t, "qp at 2 D (embedment ramp)", c.UnitTip.KPa(), full*2/10, 0.01)
	if c.Flags&EmbedmentRamp == 0 {
		t.Errorf("flags %v: want EmbedmentRamp", c.Flags)
	}
	ms := DefaultMethods()
	ms.NoEmbedment = true
	c = mustCapacity(t, prof, p, ms)
	near(t, "qp at 2 D, ramp off", c.UnitTip.KPa(), full, 0.01)
	if c.Flags&EmbedmentOff == 0 {
		t.Errorf("flags %v: want EmbedmentOff", c.Flags)
	}
	ms = DefaultMethods()
	ms.EmbedmentRatio = 4
	c = mustCapacity(t, prof, p, ms)
	near(t, "qp at 2 D with (Lb/D)cr = 4", c.UnitTip.KPa(), full*2/4, 0.01)

	p.Length = 6 * m
	c = mustCapacity(t, prof, p, DefaultMethods())
	ql := 0.5 * 100 * 231 * math.Tan(38*math.Pi/180)
	near(t, "qp at 12 D", c.UnitTip.KPa(), ql, 0.01)
	if c.Flags&EmbedmentRamp != 0 {
		t.Errorf("flags %v: no ramp beyond the critical ratio", c.Flags)
	}
	// The breakdown shows the ramp's numbers.
	p.Length = 1 * m
	a, err := NewAnalysis(prof, p, DefaultMethods(), nil)
	if err != nil {
		t.Fatal(err)
	}
	b, err := a.Breakdown()
	if err != nil {
		t.Fatal(err)
	}
	near(t, "tip block Lb", b.Tip.Lb.Metres(), 1, 1e-12)
	near(t, "tip block Lcr", b.Tip.EmbedLength.Metres(), 5, 1e-12)
	near(t, "tip block factor", b.Tip.EmbedFactor, 0.2, 1e-12)
	near(t, "tip block own qp", b.Tip.Own.KPa(), full, 0.01)

	if _, err := NewAnalysis(prof, p, Methods{EmbedmentRatio: 0.5}, nil); err == nil || !strings.Contains(err.Error(), "methods.embedment_ratio") {
		t.Errorf("embedment ratio 0.5: error %v, want one naming methods.embedment_ratio", err)
	}
}

// TestCriticalDepthBetaOnly: in a dry uniform clay with the API α (α
// depends on su/σ′v), a critical depth changes nothing; in a dry uniform
// sand with β given, it holds σ′v below zc = n·D (closed form):
//
//	Qs = p·β·γ·(zc²/2 + zc·(L − zc))
func TestCriticalDepthBetaOnly(t *testing.T) {
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Length: 20 * m, Installation: DrivenHigh}
	clay := mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "clay", Thickness: 60 * m, Drainage: profile.Undrained, Su: 50 * kPa, Phi: 25 * deg, UnitWeight: 18 * kNm}}})
	for _, ms := range []Methods{{ShaftUndrained: shaft.AlphaAPI{}}, {UndrainedLambda: true}, {ShaftUndrained: shaft.Burland{}}} {
		free := mustCapacity(t, clay, p, ms)
		ms.CriticalDepth = 10
		held := mustCapacity(t, clay, p, ms)
		if !relClose(float64(free.Shaft), float64(held.Shaft), 1e-9) || held.Flags&CriticalDepthApplied != 0 {
			t.Errorf("%+v: shaft %v without and %v with a critical depth (flags %v); want equal", ms, free.Shaft, held.Shaft, held.Flags)
		}
	}
	sand := mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "sand", Thickness: 40 * m, Drainage: profile.Drained, Phi: 32 * deg, UnitWeight: 18 * kNm}}})
	ms := Methods{ShaftDrained: shaft.BetaGiven{Beta: 0.4}, CriticalDepth: 15}
	c := mustCapacity(t, sand, p, ms)
	zc, L, g := 7.5, 20.0, 18.0
	want := math.Pi * 0.5 * 0.4 * g * (zc*zc/2 + zc*(L-zc))
	near(t, "β shaft held below zc", c.Shaft.KN(), want, 1e-9)
}

// TestDrilledZones: a bored pile, D = 0.6 m, 20 m in a uniform clay with
// su = 50 kPa (su/pa = 0.5, so α = 0.55 by the drilled-shaft α): with the
// top 1.5 m and the bottom diameter carrying no side resistance (O'Neill &
// Reese 1999, as given in FHWA GEC 10; the zones from memory),
//
//	Qs = 0.55·50·π·0.6·(20 − 1.5 − 0.6)
func TestDrilledZones(t *testing.T) {
	clay := uniformClay(t)
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.6 * m}, Length: 20 * m, Installation: Bored}
	a, err := NewAnalysis(clay, p, DefaultMethods(), nil)
	if err != nil {
		t.Fatal(err)
	}
	c, err := a.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	perim := math.Pi * 0.6
	near(t, "Qs with the drilled-shaft zones", c.Shaft.KN(), 0.55*50*perim*(20-1.5-0.6), 1e-9)
	if c.Flags&DrilledZones == 0 {
		t.Errorf("flags %v: want DrilledZones", c.Flags)
	}
	b, err := a.Breakdown()
	if err != nil {
		t.Fatal(err)
	}
	var sum float64
	var none float64
	for _, r := range b.Rows {
		sum += float64(r.Force)
		if r.Method == "none" {
			none += float64(r.Bottom - r.Top)
		}
	}
	near(t, "rows sum to Qs", sum, float64(c.Shaft), 1e-9)
	near(t, "length without friction in the rows", none, 2.1, 1e-9)
	// WithDepth agrees with single runs (the bottom zone moves with the tip).
	rows, err := a.WithDepth(DepthGrid{From: 1 * m, To: 20 * m, Step: 0.5 * m}, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range rows {
		s, err := a.CapacityAt(r.TipDepth)
		if err != nil {
			t.Fatal(err)
		}
		if !relClose(float64(r.Shaft), float64(s.Shaft), 1e-9) {
			t.Errorf("at %v: with depth %v, single %v", r.TipDepth, r.Shaft, s.Shaft)
		}
		L := r.TipDepth.Metres()
		want := 0.55 * 50 * perim * max(0, L-1.5-0.6) // friction from 1.5 m to L − D
		near(t, "Qs with depth", r.Shaft.KN()+1e-12, want+1e-12, 1e-9)
	}
	ms := DefaultMethods()
	ms.NoDrilledZones = true
	c = mustCapacity(t, clay, p, ms)
	near(t, "Qs with the zones off", c.Shaft.KN(), 0.55*50*perim*20, 1e-9)
	if c.Flags&DrilledZonesOff == 0 || c.Flags&DrilledZones != 0 {
		t.Errorf("flags %v: want DrilledZonesOff only", c.Flags)
	}
	// A driven pile with the drilled α given: no zones (the rule is for
	// bored and augered piles).
	p.Installation = DrivenHigh
	c = mustCapacity(t, clay, p, Methods{ShaftUndrained: shaft.AlphaDrilled{}})
	near(t, "driven pile, drilled α", c.Shaft.KN(), 0.55*50*perim*20, 1e-9)
}

// TestMissingN60: a method that reads N60 in a layer without it is an
// error naming layers[i].n60.
func TestMissingN60(t *testing.T) {
	sand := mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "fill", Thickness: 3 * m, Drainage: profile.Drained, Phi: 30 * deg, UnitWeight: 18 * kNm, N60: 12},
		{Name: "sand", Thickness: 40 * m, Drainage: profile.Drained, Phi: 32 * deg, UnitWeight: 18 * kNm}}})
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.9 * m}, Length: 15 * m, Installation: Bored}
	for _, ms := range []Methods{{TipDrained: bearing.ShaftSand{}}, {ShaftDrained: shaft.DrilledSand{}}} {
		_, err := NewAnalysis(sand, p, ms, nil)
		if err == nil || !strings.Contains(err.Error(), "layers[1].n60") {
			t.Errorf("%+v: error %v, want one naming layers[1].n60", ms, err)
		}
	}
}

// TestDefaultSurface: new steel is smooth in Kulhawy's (1984) δ/φ′ table.
func TestDefaultSurface(t *testing.T) {
	for _, c := range []struct {
		sec  Shape
		inst Installation
		want shaft.Surface
	}{
		{OpenPipe, DrivenHigh, shaft.SmoothSteel},
		{ClosedPipe, DrivenHigh, shaft.SmoothSteel},
		{HSection, DrivenLow, shaft.SmoothSteel},
		{Circle, Bored, shaft.RoughConcrete},
		{Square, DrivenHigh, shaft.SmoothConcrete},
	} {
		if got := DefaultSurface(Section{Shape: c.sec}, c.inst); got != c.want {
			t.Errorf("%v %v: %v, want %v", c.sec, c.inst, got, c.want)
		}
	}
}

// TestRequiredLengthLens: su = 50 kPa throughout, α = 0.5 given, D = 0.5 m;
// a 1 m lens (10 to 11 m) has a given Nc of 60, the rest 9 (the rules that
// would blend them are switched off so that the capacity is a closed form):
//
//	Rc(L) = Nc·50·A + 0.5·50·π·0.5·L
//
// With FS = 2 on 500 kN, only L = 10.5 m passes in the lens and every L ≥
// 23.26 m passes below it, so on a 0.5 m grid the answer is 23.5 m.
func TestRequiredLengthLens(t *testing.T) {
	lay := func(name string, th units.Length) profile.LayerSpec {
		return profile.LayerSpec{Name: name, Thickness: th, Drainage: profile.Undrained, Su: 50 * kPa, UnitWeight: 18 * kNm}
	}
	prof := mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{lay("clay", 10*m), lay("lens", 1*m), lay("clay below", 30*m)}})
	ms := Methods{NoWeakLayer: true, ShaftUndrained: shaft.AlphaGiven{Alpha: 0.5},
		Layers: []LayerMethods{{}, {Tip: bearing.GivenNc{Nc: 60}}}}
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Installation: DrivenHigh}
	loads := Loads{Compression: Action{Permanent: 500 * kN}}
	l, err := RequiredLength(prof, p, ms, SafetyFactor{Global: 2}, loads, Search{Step: 0.5 * m, MaxTip: 30 * m})
	if err != nil {
		t.Fatal(err)
	}
	area := math.Pi / 4 * 0.25
	lmin := (1000 - 9*50*area) / (0.5 * 50 * math.Pi * 0.5)
	want := math.Ceil(lmin/0.5) * 0.5
	if !l.Found || math.Abs(l.TipDepth.Metres()-want) > 1e-9 {
		t.Fatalf("required length %+v, want %.2f m", l, want)
	}
	if len(l.Passing) != 2 || l.Passing[0].From != 10.5*m || l.Passing[0].To != 10.5*m ||
		math.Abs(l.Passing[1].From.Metres()-want) > 1e-9 || l.Passing[1].To != 30*m {
		t.Errorf("passing ranges %+v, want 10.5 to 10.5 m and %.2f to 30 m", l.Passing, want)
	}
	if len(l.Warnings) != 1 || !strings.Contains(l.Warnings[0], "not one range") {
		t.Errorf("warnings %q", l.Warnings)
	}
	// Searching only to 20 m finds nothing and says how near it came: the
	// best is the lens, Ed/Rd = 500/((60·50·A + 0.5·50·π·0.5·10.5)/2).
	l, err = RequiredLength(prof, p, ms, SafetyFactor{Global: 2}, loads, Search{Step: 0.5 * m, MaxTip: 20 * m})
	if err != nil {
		t.Fatal(err)
	}
	bestUse := 500 / ((60*50*area + 0.5*50*math.Pi*0.5*10.5) / 2)
	if l.Found || l.BestTipDepth != 10.5*m || math.Abs(l.BestUse-bestUse) > 1e-9 {
		t.Errorf("search to 20 m: %+v; want not found, best %.4f at 10.5 m", l, bestUse)
	}
	msg := l.NotFound()
	for _, s := range []string{"20 m", "0.5 m", "10.5 m", "compression"} {
		if !strings.Contains(msg, s) {
			t.Errorf("not-found message %q lacks %q", msg, s)
		}
	}
}

// TestPlugModeOnDesignResistance: an open pipe (0.6 m, wall 20 mm), 10 m
// in clay with su = 50 kPa, α = 0.5 given, Nc = 9. Characteristic:
// plugged Rc = 9·50·Agross + 25·Pout·10 is less than unplugged
// 9·50·Asteel + 25·(Pout + Pin)·10. With a tip multiplier of 1 and a shaft
// multiplier of 0.1 the design values reverse, and the design resistance
// is the lesser design value (closed forms).
func TestPlugModeOnDesignResistance(t *testing.T) {
	clay := uniformClay(t)
	p := Pile{Section: Section{Shape: OpenPipe, Diameter: 0.6 * m, Wall: 20 * mm}, Length: 10 * m, Installation: DrivenHigh}
	ms := Methods{ShaftUndrained: shaft.AlphaGiven{Alpha: 0.5}}
	ag := math.Pi / 4 * 0.36
	as := math.Pi / 4 * (0.36 - 0.56*0.56)
	po, pi := math.Pi*0.6, math.Pi*0.56
	plug := 450*ag + 25*po*10
	unplug := 450*as + 25*(po+pi)*10
	if !(plug < unplug) {
		t.Fatal("scenario: plugged should be the lesser characteristic mode")
	}
	c := mustCapacity(t, clay, p, ms)
	near(t, "characteristic Rc (plugged)", c.Compression.KN(), plug, 1e-9)
	cs := Case{Name: "test", Tip: map[string]float64{"": 1}, Shaft: map[string]float64{"": 0.1}, Tension: map[string]float64{"": 0.1},
		Permanent: 1, Variable: 1, TanPhi: 1, Su: 1}
	a, err := NewAnalysis(clay, p, ms, &Options{Case: &cs})
	if err != nil {
		t.Fatal(err)
	}
	d, err := a.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	plugDes := 450*ag + 0.1*25*po*10
	unDes := 450*as + 0.1*25*(po+pi)*10
	if !(unDes < plugDes) {
		t.Fatal("scenario: unplugged should be the lesser design mode")
	}
	near(t, "design Rc (unplugged governs on design values)", d.DesignCompression.KN(), unDes, 1e-9)
	if d.Plugged || d.Flags&UnpluggedGoverns == 0 {
		t.Errorf("plugged %v, flags %v: want the unplugged mode", d.Plugged, d.Flags)
	}
}

// TestRulesAllocateNothing: the tip rules and the drilled-shaft zones keep
// Capacity, CapacityAt and WithDepth free of allocations.
func TestRulesAllocateNothing(t *testing.T) {
	prof := mustProfile(t, layeredSpec(siUnits, false))
	p := layeredPile(siUnits) // bored: the drilled-shaft α with its zones in the clay
	p.Length = 11.5 * m       // 0.5 m into the dense sand: layered rule; 0.1 m of clay in the bottom zone
	a, err := NewAnalysis(prof, p, DefaultMethods(), nil)
	if err != nil {
		t.Fatal(err)
	}
	if c, err := a.Capacity(); err != nil || c.Flags&(LayeredTip|DrilledZones) != LayeredTip|DrilledZones {
		t.Fatalf("scenario: %v, flags %v", err, c.Flags)
	}
	if n := testing.AllocsPerRun(100, func() { _, _ = a.Capacity() }); n != 0 {
		t.Errorf("Capacity allocates %v times per run", n)
	}
	if n := testing.AllocsPerRun(100, func() { _, _ = a.CapacityAt(7.9 * m) }); n != 0 {
		t.Errorf("CapacityAt allocates %v times per run", n)
	}
	rows := make([]Capacity, 0, 200)
	if n := testing.AllocsPerRun(20, func() { rows, _ = a.WithDepth(DepthGrid{From: 0.5 * m, To: 11.5 * m, Step: 0.1 * m}, rows[:0]) }); n != 0 {
		t.Errorf("WithDepth allocates %v times per run", n)
	}
}
