// Source of the numbers in this file: fuzz inputs only; the checks are that
// no panic occurs and no NaN or Inf is returned, so no published value is
// involved.

package group_test

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/group"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// FuzzGroup: any grid or pair of positions, any rule, in a two-layer
// profile: no panic, and a result holds no NaN or Inf.
func FuzzGroup(f *testing.F) {
	f.Add(3, 4, 1.2, 1.4, 0.4, 18.0, 30.0, 0, 0.0, 0.0)
	f.Add(1, 1, 0.0, 0.0, 0.6, 10.0, 80.0, 1, 0.0, 0.0)
	f.Add(2, 2, 0.5, 0.5, 0.6, 10.0, 20.0, 2, 0.0, 0.0)
	f.Add(0, 0, 0.0, 0.0, 0.4, 12.0, 40.0, 3, 0.3, 0.5)
	f.Add(5, 1, 0.0, 2.0, 1.0, 25.0, 150.0, 4, 0.0, 0.0)
	f.Fuzz(func(t *testing.T, rows, cols int, sx, sy, d, length, su float64, rule int, px, py float64) {
		if rows > 30 || cols > 30 || !(d > 0.05 && d < 3) || !(length > 1 && length < 35) || !(su > 1 && su < 500) {
			return
		}
		prof, err := profile.New(profile.Spec{WaterDepth: 1, Layers: []profile.LayerSpec{
			{Name: "clay", Thickness: 8, Drainage: profile.Undrained, Su: units.Stress(su) * units.Kilopascal, UnitWeight: 18e3, SaturatedUnitWeight: 18e3, M: 10e6},
			{Name: "sand", Thickness: 32, Drainage: profile.Drained, Phi: 34 * units.Degree, SaturatedUnitWeight: 20e3, E: 50e6},
		}})
		if err != nil {
			t.Fatal(err)
		}
		var l group.Layout
		if rows > 0 && cols > 0 {
			l, err = group.Grid(rows, cols, units.Length(sx), units.Length(sy))
		} else {
			l, err = group.Positions([]group.Point{{X: 0, Y: 0}, {X: units.Length(px), Y: units.Length(py)}})
		}
		if err != nil {
			return
		}
		ids := group.RuleIDs()
		r, err := group.Analyse(group.Input{Profile: prof, Pile: pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: units.Length(d)},
			Length: units.Length(length), Installation: pile.DrivenHigh}, Methods: pile.DefaultMethods(), Basis: pile.SafetyFactor{Global: 2.5},
			Loads: pile.Loads{Compression: pile.Action{Permanent: 1e6}}, Layout: l,
			Options: raftOptions(group.Options{Rule: ids[((rule%len(ids))+len(ids))%len(ids)], Value: 0.8}, rule)})
		if err != nil {
			return
		}
		for _, v := range []float64{r.Efficiency.Value, float64(r.Capacity), float64(r.Uplift), float64(r.Raft.Total), r.Design.MaxUse()} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				t.Fatalf("non-finite value in %+v", r)
			}
		}
	})
}

// raftOptions picks the equivalent raft's method and stress from the rule
// drawn (every third a Tomlinson raft, averaged on odd draws).
func raftOptions(o group.Options, rule int) group.Options {
	if rule%3 == 0 {
		o.RaftMethod = group.RaftTomlinson
		if rule%2 != 0 {
			o.RaftStress = group.StressAverage
		}
	}
	return o
}
