// Source of the numbers in this file: randomly drawn grids and grounds; the
// properties (efficiency rises with spacing and stays at most 1; a 1 × 1
// group is the single pile; the elastic stress below a loaded rectangle
// lies between 0 and the load, is largest below the centre and falls with
// depth) are closed-form facts of the formulas, no published value.

package group_test

import (
	"math"
	"testing"

	"pgregory.net/rapid"

	"github.com/qultgeo/qult/group"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// TestPropConverseLabarreRisesWithSpacing: for any grid, the
// Converse-Labarre efficiency rises (never falls) as the spacing grows, and
// never exceeds 1.
func TestPropConverseLabarreRisesWithSpacing(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		n1 := rapid.IntRange(1, 30).Draw(t, "rows")
		n2 := rapid.IntRange(1, 30).Draw(t, "cols")
		d := units.Length(rapid.Float64Range(0.1, 3).Draw(t, "d"))
		s1 := d * units.Length(rapid.Float64Range(1.0001, 20).Draw(t, "s1/d"))
		s2 := s1 * units.Length(rapid.Float64Range(1, 5).Draw(t, "s2/s1"))
		e1 := group.ConverseLabarreEfficiency(n1, n2, d, s1)
		e2 := group.ConverseLabarreEfficiency(n1, n2, d, s2)
		if e2 < e1-1e-12 {
			t.Fatalf("η fell from %g at s = %v to %g at s = %v", e1, s1, e2, s2)
		}
		if e1 > 1 || e2 > 1 || math.IsNaN(e1) || math.IsNaN(e2) {
			t.Fatalf("η = %g, %g: want at most 1", e1, e2)
		}
	})
}

// TestPropEfficiencyRulesBounded: every rule, on any grid it accepts,
// gives 0 < η ≤ 1.
func TestPropEfficiencyRulesBounded(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		n1 := rapid.IntRange(1, 12).Draw(t, "rows")
		n2 := rapid.IntRange(1, 12).Draw(t, "cols")
		d := units.Length(rapid.Float64Range(0.2, 2).Draw(t, "d"))
		s := d * units.Length(rapid.Float64Range(1.01, 10).Draw(t, "s/d"))
		l, err := group.Grid(n1, n2, s, s)
		if err != nil {
			t.Fatal(err)
		}
		rule := rapid.SampledFrom(group.RuleIDs()).Draw(t, "rule")
		e, err := group.GroupEfficiency(l, group.EfficiencyInput{Rule: rule, Width: d, Value: 0.8,
			Undrained: rapid.Bool().Draw(t, "undrained"), Bored: rapid.Bool().Draw(t, "bored")})
		if err != nil {
			return // a formula refusing a layout (η ≤ 0) is an error, not a value
		}
		if !(e.Value > 0 && e.Value <= 1) {
			t.Fatalf("%s: η = %g", rule, e.Value)
		}
	})
}

// TestPropSinglePileGroup: a 1 × 1 group is the single pile: the same
// compression and tension, by every rule, and the same design resistance.
func TestPropSinglePileGroup(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		su := units.Stress(rapid.Float64Range(10, 200).Draw(t, "su kPa")) * units.Kilopascal
		phi := units.Angle(rapid.Float64Range(25, 40).Draw(t, "phi deg")) * units.Degree
		top := units.Length(rapid.Float64Range(1, 10).Draw(t, "clay m"))
		prof, err := profile.New(profile.Spec{WaterDepth: 1, Layers: []profile.LayerSpec{
			{Name: "clay", Thickness: top, Drainage: profile.Undrained, Su: su, UnitWeight: 18 * kNm, SaturatedUnitWeight: 18 * kNm},
			{Name: "sand", Thickness: 40, Drainage: profile.Drained, Phi: phi, SaturatedUnitWeight: 20 * kNm},
		}})
		if err != nil {
			t.Fatal(err)
		}
		p := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: units.Length(rapid.Float64Range(0.3, 1.2).Draw(t, "d"))},
			Length: units.Length(rapid.Float64Range(2, 35).Draw(t, "L")), Installation: pile.DrivenHigh}
		var l group.Layout
		if rapid.Bool().Draw(t, "grid") {
			l, err = group.Grid(1, 1, 0, 0)
		} else {
			l, err = group.Positions([]group.Point{{X: 3, Y: -2}})
		}
		if err != nil {
			t.Fatal(err)
		}
		rule := rapid.SampledFrom([]string{group.Practice, group.ConverseLabarre, group.LosAngeles, group.SeilerKeeney, group.Feld}).Draw(t, "rule")
		if !l.IsGrid() && rule != group.Practice {
			rule = group.Practice
		}
		basis := pile.SafetyFactor{Global: 2.5}
		r, err := group.Analyse(group.Input{Profile: prof, Pile: p, Methods: pile.DefaultMethods(), Basis: basis, Layout: l,
			Options: group.Options{Rule: rule, NoRaft: true}})
		if err != nil {
			t.Fatal(err)
		}
		a, err := pile.NewAnalysis(prof, p, pile.DefaultMethods(), nil)
		if err != nil {
			t.Fatal(err)
		}
		c, err := a.Capacity()
		if err != nil {
			t.Fatal(err)
		}
		if r.Capacity != c.Compression || r.Uplift != c.Tension || r.Efficiency.Value != 1 || r.Block != nil {
			t.Fatalf("1 × 1 group: compression %v tension %v η %g, single %v %v", r.Capacity, r.Uplift, r.Efficiency.Value, c.Compression, c.Tension)
		}
		d, err := pile.Check(prof, p, pile.DefaultMethods(), basis, pile.Loads{})
		if err != nil {
			t.Fatal(err)
		}
		if got, want := r.Design.Cases[0].Rd, d.Cases[0].CompressionRd; got != want {
			t.Fatalf("design Rd %v, single %v", got, want)
		}
		if got, want := r.Design.Cases[0].TensionRd, d.Cases[0].TensionRd; got != want {
			t.Fatalf("design tension Rd %v, single %v", got, want)
		}
	})
}

// TestPropBlockSideAdds: the block's capacity grows with the pile length
// (more perimeter, deeper base) in uniform clay.
func TestPropBlockGrowsWithLength(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		su := units.Stress(rapid.Float64Range(10, 200).Draw(t, "su kPa")) * units.Kilopascal
		prof, err := profile.New(profile.Spec{Layers: []profile.LayerSpec{
			{Name: "clay", Thickness: 60, Drainage: profile.Undrained, Su: su, SaturatedUnitWeight: 18 * kNm}}})
		if err != nil {
			t.Fatal(err)
		}
		bg := units.Length(rapid.Float64Range(1, 20).Draw(t, "Bg"))
		lg := units.Length(rapid.Float64Range(1, 20).Draw(t, "Lg"))
		l1 := units.Length(rapid.Float64Range(1, 30).Draw(t, "L1"))
		l2 := l1 + units.Length(rapid.Float64Range(0.01, 25).Draw(t, "dL"))
		b1, err := group.BlockCapacity(prof, group.BlockInput{Tip: l1, Bg: bg, Lg: lg})
		if err != nil {
			t.Fatal(err)
		}
		b2, err := group.BlockCapacity(prof, group.BlockInput{Tip: l2, Bg: bg, Lg: lg})
		if err != nil {
			t.Fatal(err)
		}
		if b2.Capacity < b1.Capacity {
			t.Fatalf("block fell from %v at %v to %v at %v", b1.Capacity, l1, b2.Capacity, l2)
		}
	})
}

// TestPropGroupNeverAboveSum: whatever the grid and the rule, the group's
// compression never exceeds n·Rc, its uplift never exceeds n·Rt, and the
// governing value is one of the two modes.
func TestPropGroupNeverAboveSum(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		su := units.Stress(rapid.Float64Range(10, 150).Draw(t, "su kPa")) * units.Kilopascal
		prof, err := profile.New(profile.Spec{WaterDepth: 0, Layers: []profile.LayerSpec{
			{Name: "clay", Thickness: 40, Drainage: profile.Undrained, Su: su, SaturatedUnitWeight: 18 * kNm}}})
		if err != nil {
			t.Fatal(err)
		}
		d := units.Length(rapid.Float64Range(0.3, 1).Draw(t, "d"))
		s := d * units.Length(rapid.Float64Range(1.05, 8).Draw(t, "s/d"))
		l, err := group.Grid(rapid.IntRange(1, 8).Draw(t, "rows"), rapid.IntRange(1, 8).Draw(t, "cols"), s, s)
		if err != nil {
			t.Fatal(err)
		}
		r, err := group.Analyse(group.Input{Profile: prof, Pile: pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: d},
			Length: units.Length(rapid.Float64Range(5, 30).Draw(t, "L")), Installation: pile.DrivenHigh}, Methods: pile.DefaultMethods(),
			Layout: l, Options: group.Options{Rule: rapid.SampledFrom([]string{group.Practice, group.ConverseLabarre, group.LosAngeles, group.Feld}).Draw(t, "rule"), NoRaft: true}})
		if err != nil {
			return // a formula refusing a layout
		}
		if r.Capacity > r.SumSingles || r.Uplift > r.SumTension {
			t.Fatalf("group %v above n·Rc %v, or uplift %v above n·Rt %v", r.Capacity, r.SumSingles, r.Uplift, r.SumTension)
		}
		if r.Capacity != r.Reduced && (r.Block == nil || r.Capacity != r.Block.Capacity) {
			t.Fatalf("capacity %v is neither mode", r.Capacity)
		}
	})
}

// TestPropRectangleStress: below any loaded rectangle, 0 < average ≤
// centre ≤ q at any depth, and both fall as the depth grows.
func TestPropRectangleStress(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		b := units.Length(rapid.Float64Range(0.5, 60).Draw(t, "b"))
		l := units.Length(rapid.Float64Range(0.5, 60).Draw(t, "l"))
		z1 := units.Length(rapid.Float64Range(0.01, 100).Draw(t, "z1"))
		z2 := z1 * units.Length(rapid.Float64Range(1.01, 10).Draw(t, "z2/z1"))
		const q = 100e3
		c1, c2 := group.CentreStress(q, b, l, z1), group.CentreStress(q, b, l, z2)
		a1, a2 := group.AverageStress(q, b, l, z1), group.AverageStress(q, b, l, z2)
		for _, v := range []units.Stress{c1, c2, a1, a2} {
			if !(v > 0) || v > q*(1+1e-12) {
				t.Fatalf("stress %v outside (0, q]: centre %v, %v; average %v, %v", v, c1, c2, a1, a2)
			}
		}
		if a1 > c1*(1+1e-9) || a2 > c2*(1+1e-9) {
			t.Fatalf("average above the centre: %v > %v or %v > %v", a1, c1, a2, c2)
		}
		if c2 > c1 || a2 > a1*(1+1e-9) {
			t.Fatalf("stress grew with depth: centre %v → %v, average %v → %v", c1, c2, a1, a2)
		}
	})
}
