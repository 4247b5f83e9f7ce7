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

// TestDesignGroundLine: a profile cut down to a design ground line by
// excavation or scour gives no shaft resistance and no tip above the line,
// and below it σ′v counts from the line down. Closed forms on invented
// soils (no published values): β given, α given, Nq and Nc given.
func TestDesignGroundLine(t *testing.T) {
	const gw = 9.81
	// Sand under 3 m of river water, γsat 20 kN/m³, scoured 1.5 m general
	// and 2 m local: zd = 3.5 m. A 0.5 m square pile from the bed (head 0)
	// to 15 m; β = 0.4, Nq = 40.
	sand, err := profile.New(profile.Spec{WaterDepth: -3 * m, Scour: profile.Scour{General: 1.5 * m, Local: 2 * m},
		Layers: []profile.LayerSpec{{Name: "sand", Thickness: 30 * m, Drainage: profile.Drained,
			Phi: 34 * units.Degree, SaturatedUnitWeight: 20 * kNm}}})
	if err != nil {
		t.Fatal(err)
	}
	sq := Section{Shape: Square, Width: 0.5 * m}
	ms := Methods{ShaftDrained: shaft.BetaGiven{Beta: 0.4}, TipDrained: bearing.GivenNq{Nq: 40}}
	a, err := NewAnalysis(sand, Pile{Section: sq, Length: 15 * m, Installation: DrivenHigh}, ms, nil)
	if err != nil {
		t.Fatal(err)
	}
	c, err := a.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	g := 20 - gw // γ′, kN/m³
	// Qs = β·P·γ′·(L − zd)²/2; qp = Nq·γ′·(L − zd).
	near(t, "β shaft below the scour line", c.Shaft.KN(), 0.4*2*g*11.5*11.5/2, 1e-9)
	near(t, "tip σ′v from the scour line", c.UnitTip.KPa(), 40*g*11.5, 1e-9)

	// Clay, dry site, excavated 4 m: α·su acts only below the floor.
	clay, err := profile.New(profile.Spec{NoWater: true, ExcavationDepth: 4 * m,
		Layers: []profile.LayerSpec{{Name: "clay", Thickness: 30 * m, Drainage: profile.Undrained,
			Su: 60 * kPa, UnitWeight: 18 * kNm}}})
	if err != nil {
		t.Fatal(err)
	}
	mc := Methods{ShaftUndrained: shaft.AlphaGiven{Alpha: 0.7}, TipUndrained: bearing.GivenNc{Nc: 9}}
	b, err := NewAnalysis(clay, Pile{Section: sq, Length: 12 * m, Installation: DrivenHigh}, mc, nil)
	if err != nil {
		t.Fatal(err)
	}
	cb, err := b.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	// Qs = α·su·P·(L − zd) = 0.7·60·2·8.
	near(t, "α shaft below the excavation", cb.Shaft.KN(), 0.7*60*2*8, 1e-9)
	// With depth: a tip above the design ground line holds nothing.
	rows, err := b.WithDepth(DepthGrid{From: 1 * m, To: 12 * m, Step: 1 * m}, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range rows {
		z := r.TipDepth.Metres()
		wantQs := 0.7 * 60 * 2 * math.Max(0, z-4)
		wantQp := 9.0 * 60 * 0.25
		if z <= 4 {
			wantQp = 0
		}
		if math.Abs(r.Shaft.KN()-wantQs) > 1e-9*math.Max(1, wantQs) || math.Abs(r.Tip.KN()-wantQp) > 1e-9*math.Max(1, wantQp) {
			t.Errorf("tip at %g m: Qs %v, Qp %v; want %g, %g kN", z, r.Shaft, r.Tip, wantQs, wantQp)
		}
	}
	// A pile whose tip does not reach below the line is refused.
	if _, err := NewAnalysis(clay, Pile{Section: sq, Length: 4 * m, Installation: DrivenHigh}, mc, nil); err == nil ||
		!strings.Contains(err.Error(), "design ground line at 4 m") {
		t.Errorf("tip on the design ground line: err = %v", err)
	}
}

// TestDesignGroundShaftShifted: with the default methods, the shaft
// resistance of a pile in a scoured profile equals that of the same pile in
// the profile built from the design ground line down (layers shifted up,
// the river deeper by the scour), the pile's head on that line. Invented
// soils; the check is the identity, not a published value.
func TestDesignGroundShaftShifted(t *testing.T) {
	layers := func(top units.Length) []profile.LayerSpec {
		return []profile.LayerSpec{
			{Name: "soft clay", Thickness: 6*m - top, Drainage: profile.Undrained, SuTop: 15 * kPa, SuBottom: 30 * kPa, SaturatedUnitWeight: 17 * kNm},
			{Name: "dense sand", Thickness: 20 * m, Drainage: profile.Drained, Phi: 36 * units.Degree, SaturatedUnitWeight: 20 * kNm},
		}
	}
	scoured, err := profile.New(profile.Spec{WaterDepth: -5 * m, Scour: profile.Scour{General: 1 * m, Local: 1.5 * m}, Layers: layers(0)})
	if err != nil {
		t.Fatal(err)
	}
	ls := layers(2.5 * m)
	// su at the new top: 15 + 15·2.5/6.
	ls[0].SuTop = units.Stress(15+15*2.5/6) * kPa
	shifted, err := profile.New(profile.Spec{WaterDepth: -7.5 * m, Layers: ls})
	if err != nil {
		t.Fatal(err)
	}
	sec := Section{Shape: ClosedPipe, Diameter: 0.6 * m, Wall: 12 * mm}
	a, err := NewAnalysis(scoured, Pile{Section: sec, Length: 18 * m, Installation: DrivenHigh}, DefaultMethods(), nil)
	if err != nil {
		t.Fatal(err)
	}
	b, err := NewAnalysis(shifted, Pile{Section: sec, Length: 15.5 * m, Installation: DrivenHigh}, DefaultMethods(), nil)
	if err != nil {
		t.Fatal(err)
	}
	ca, err1 := a.Capacity()
	cb, err2 := b.Capacity()
	if err1 != nil || err2 != nil {
		t.Fatal(err1, err2)
	}
	near(t, "shaft, scoured vs shifted", ca.Shaft.KN(), cb.Shaft.KN(), 1e-6)
}

// TestEmbedmentFromDesignGround: below an excavation the embedment ramp
// counts the embedment from the design ground line (closed form: with
// (Lb/D)cr = 10 and Lb = 5·D the ramp halves the unit tip resistance), and
// the layered rule does not reach into a layer wholly removed.
func TestEmbedmentFromDesignGround(t *testing.T) {
	// 4 m of soft clay excavated away over sand; tip 2.5 m into the sand.
	prof, err := profile.New(profile.Spec{WaterDepth: 0, ExcavationDepth: 4 * m,
		Layers: []profile.LayerSpec{
			{Name: "clay", Thickness: 4 * m, Drainage: profile.Undrained, Su: 15 * units.Kilopascal, SaturatedUnitWeight: 17 * kNm},
			{Name: "sand", Thickness: 30 * m, Drainage: profile.Drained, Phi: 34 * units.Degree, SaturatedUnitWeight: 20 * kNm}}})
	if err != nil {
		t.Fatal(err)
	}
	p := Pile{Section: Section{Shape: Square, Width: 0.5 * m}, Length: 6.5 * m, Installation: DrivenHigh}
	ms := DefaultMethods()
	ms.TipDrained = bearing.GivenNq{Nq: 40}
	on, err := NewAnalysis(prof, p, ms, nil)
	if err != nil {
		t.Fatal(err)
	}
	ms.NoEmbedment = true
	off, err := NewAnalysis(prof, p, ms, nil)
	if err != nil {
		t.Fatal(err)
	}
	c1, err := on.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	c2, err := off.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	if r := float64(c1.UnitTip / c2.UnitTip); math.Abs(r-0.5) > 1e-12 {
		t.Errorf("ramp factor %v, want 0.5 (Lb = 2.5 m from the design ground line, Lcr = 5 m)", r)
	}
	if c1.Flags&LayeredTip != 0 {
		t.Errorf("layered rule applied from the excavated clay: flags %v", c1.Flags)
	}
}

// TestEmbedmentLbInBreakdown: the tip block reports the embedment the ramp
// used, counted from the design ground line (closed form: Lb = 2.5 m).
func TestEmbedmentLbInBreakdown(t *testing.T) {
	prof, err := profile.New(profile.Spec{WaterDepth: 0, ExcavationDepth: 4 * m,
		Layers: []profile.LayerSpec{{Name: "sand", Thickness: 30 * m, Drainage: profile.Drained, Phi: 34 * units.Degree, SaturatedUnitWeight: 20 * kNm}}})
	if err != nil {
		t.Fatal(err)
	}
	ms := DefaultMethods()
	ms.TipDrained = bearing.GivenNq{Nq: 40}
	a, err := NewAnalysis(prof, Pile{Section: Section{Shape: Square, Width: 0.5 * m}, Length: 6.5 * m, Installation: DrivenHigh}, ms, nil)
	if err != nil {
		t.Fatal(err)
	}
	b, err := a.Breakdown()
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(float64(b.Tip.Lb)-2.5) > 1e-12 || math.Abs(b.Tip.EmbedFactor-0.5) > 1e-12 {
		t.Errorf("Lb %v, factor %v; want 2.5 m and 0.5", b.Tip.Lb, b.Tip.EmbedFactor)
	}
}

// TestLayeredTipOffWarns: with Meyerhof's transition switched off, a tip
// less than 10 D into a stronger layer carries the LayeredTipOff warning
// (and the full value of the bearing layer); with it on, LayeredTip.
func TestLayeredTipOffWarns(t *testing.T) {
	prof, err := profile.New(profile.Spec{WaterDepth: 0, Layers: []profile.LayerSpec{
		{Name: "clay", Thickness: 4 * m, Drainage: profile.Undrained, Su: 15 * units.Kilopascal, SaturatedUnitWeight: 17 * kNm},
		{Name: "sand", Thickness: 30 * m, Drainage: profile.Drained, Phi: 34 * units.Degree, SaturatedUnitWeight: 20 * kNm}}})
	if err != nil {
		t.Fatal(err)
	}
	p := Pile{Section: Section{Shape: Square, Width: 0.5 * m}, Length: 6.5 * m, Installation: DrivenHigh}
	for _, on := range []bool{true, false} {
		ms := DefaultMethods()
		ms.LayeredTip = on
		a, err := NewAnalysis(prof, p, ms, nil)
		if err != nil {
			t.Fatal(err)
		}
		c, err := a.Capacity()
		if err != nil {
			t.Fatal(err)
		}
		if on && (c.Flags&LayeredTip == 0 || c.Flags&LayeredTipOff != 0) {
			t.Errorf("on: flags %v", c.Flags)
		}
		if !on && (c.Flags&LayeredTipOff == 0 || c.Flags&LayeredTip != 0) {
			t.Errorf("off: flags %v", c.Flags)
		}
	}
}

// TestGrossWeightWarns: with the gross self-weight option a heavy pile in
// very soft clay has Rc = Qp + Qs − W′ below zero, and says so (closed
// form: W′ = 24 kN/m³ × π/4 × 1.5² m² × 20 m ≈ 848 kN on a dry site,
// against Qp + Qs of a few hundred kN).
func TestGrossWeightWarns(t *testing.T) {
	prof, err := profile.New(profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "very soft clay", Thickness: 30 * m, Drainage: profile.Undrained, Su: 5 * units.Kilopascal, UnitWeight: 15 * kNm}}})
	if err != nil {
		t.Fatal(err)
	}
	ms := DefaultMethods()
	ms.SelfWeight = WeightGross
	a, err := NewAnalysis(prof, Pile{Section: Section{Shape: Circle, Diameter: 1.5 * m}, Length: 20 * m,
		Installation: Bored, UnitWeight: 24 * kNm}, ms, nil)
	if err != nil {
		t.Fatal(err)
	}
	c, err := a.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	if !(c.Compression < 0) || c.Flags&WeightExceedsResistance == 0 {
		t.Errorf("Rc = %v with flags %v; want a negative Rc flagged", c.Compression, c.Flags)
	}
}
