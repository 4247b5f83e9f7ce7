package pile

// Scenarios of our own (invented numbers, no published source): capacity
// with depth is checked against the implementation kept in oracle_test.go
// (the oracle), every field at every depth to 1e-12 relative (see
// sameCapacity), on cases of the tight loop that the random profiles of
// TestPropWithDepthMatchesOracle seldom or never draw.

import (
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// withDepthAgainstOracle compares WithDepth with the oracle from `from` to
// `to` by `step`.
func withDepthAgainstOracle(t *testing.T, a *Analysis, from, to, step units.Length) {
	t.Helper()
	want, werr := a.oracleWithDepth(from, to, step, nil)
	got, gerr := a.WithDepth(DepthGrid{From: from, To: to, Step: step}, nil)
	if (werr == nil) != (gerr == nil) {
		t.Fatalf("error %v, oracle %v", gerr, werr)
	}
	if len(got) != len(want) {
		t.Fatalf("%d rows, oracle %d", len(got), len(want))
	}
	for i := range got {
		if d := sameCapacity(got[i], want[i]); d != "" {
			t.Fatalf("depth %.17g m (row %d): %s", float64(want[i].TipDepth), i, d)
		}
	}
}

// twoSandsOverClay is two sands over a clay, water at 2 m.
func twoSandsOverClay(t *testing.T) *profile.Profile {
	t.Helper()
	p, err := profile.New(profile.Spec{WaterDepth: 2 * m, Layers: []profile.LayerSpec{
		{Thickness: 8 * m, Drainage: profile.Drained, Phi: 32 * deg, UnitWeight: 18 * kNm, SaturatedUnitWeight: 20 * kNm, N60: 25},
		{Thickness: 6 * m, Drainage: profile.Drained, Phi: 36 * deg, UnitWeight: 19 * kNm, SaturatedUnitWeight: 21 * kNm, N60: 40},
		{Thickness: 10 * m, Drainage: profile.Undrained, Su: 60 * kPa, UnitWeight: 17 * kNm, SaturatedUnitWeight: 18 * kNm},
	}})
	if err != nil {
		t.Fatal(err)
	}
	return p
}

// TestWithDepthFixedTipMatchesOracle: a tip method whose value does not
// change with depth (qp from N60) on a driven pile with weight, with every
// rule of the tip zone on and with each switched off.
func TestWithDepthFixedTipMatchesOracle(t *testing.T) {
	prof := twoSandsOverClay(t)
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Length: 24 * m, Installation: DrivenHigh, UnitWeight: 24 * kNm}
	for _, meth := range []Methods{
		{TipDrained: bearing.ShaftSand{}, ShaftDrained: shaft.BetaGiven{Beta: 0.5}, LayeredTip: true},
		{TipDrained: bearing.ShaftSand{}, ShaftDrained: shaft.BetaGiven{Beta: 0.5}, NoEmbedment: true, NoWeakLayer: true},
	} {
		a, err := NewAnalysis(prof, p, meth, nil)
		if err != nil {
			t.Fatal(err)
		}
		withDepthAgainstOracle(t, a, 0.05*m, 24*m, 0.05*m)
	}
}

// TestWithDepthTinyStepMatchesOracle: a step of a few units in the last
// place of the depth, where consecutive depths of the grid can be equal
// and the tight loop walks them one by one.
func TestWithDepthTinyStepMatchesOracle(t *testing.T) {
	prof := twoSandsOverClay(t)
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Length: 24 * m, Installation: DrivenHigh}
	a, err := NewAnalysis(prof, p, Methods{TipDrained: bearing.GivenNq{Nq: 40}, ShaftDrained: shaft.BetaGiven{Beta: 0.5}}, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, step := range []units.Length{1e-9, 4e-15, 1e-15} {
		withDepthAgainstOracle(t, a, 10*m, 10*m+200*step, step)
	}
}

// TestWithDepthFlagsOnlyMatchesOracle: the rules of the tip zone switched
// off, so that they only add flags, some of which change along a layer (the
// lower sand's qp passes the upper one's; the clay below is weaker), and a
// shaft whose cap is reached inside a layer; weightless and with weight.
func TestWithDepthFlagsOnlyMatchesOracle(t *testing.T) {
	prof := twoSandsOverClay(t)
	capped := shaft.Capped{Method: shaft.BetaGiven{Beta: 0.8}, Limit: shaft.LimitGiven{Fs: 40 * kPa}}
	for _, gp := range []units.UnitWeight{0, 24 * kNm} {
		p := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Length: 24 * m, Installation: DrivenHigh, UnitWeight: gp}
		for _, meth := range []Methods{
			{TipDrained: bearing.GivenNq{Nq: 40}, ShaftDrained: shaft.BetaGiven{Beta: 0.5}, NoEmbedment: true, NoWeakLayer: true},
			{TipDrained: bearing.GivenNq{Nq: 40}, ShaftDrained: capped, NoEmbedment: true, NoWeakLayer: true},
			{TipDrained: bearing.GivenNq{Nq: 40}, ShaftDrained: capped, LayeredTip: true},
			// The lower sand's qp passes the upper one's near 11 m, inside
			// the zone of the layered rule (switched off: a flag only).
			{Layers: []LayerMethods{{Tip: bearing.GivenNq{Nq: 60}, Shaft: shaft.BetaGiven{Beta: 0.5}},
				{Tip: bearing.GivenNq{Nq: 45}, Shaft: shaft.BetaGiven{Beta: 0.6}}, {}}, NoEmbedment: true, NoWeakLayer: true},
		} {
			a, err := NewAnalysis(prof, p, meth, nil)
			if err != nil {
				t.Fatal(err)
			}
			withDepthAgainstOracle(t, a, 0.05*m, 24*m, 0.05*m)
		}
	}
}
