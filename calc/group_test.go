package calc

// Sources: examples/footbridge-pier-group.yaml is a scenario of our own
// (invented numbers); the expected values here are worked by hand from the
// file's inputs and the equations of package group.

import (
	"errors"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/qultgeo/qult/units"
)

func readGroupExample(t *testing.T) []byte {
	t.Helper()
	b, err := os.ReadFile(filepath.Join("..", "examples", "footbridge-pier-group.yaml"))
	if err != nil {
		t.Fatal(err)
	}
	return b
}

// TestGroupExample: the shipped group runs; the layout, the efficiency and
// the loads on the cap follow the file by hand.
func TestGroupExample(t *testing.T) {
	r, err := Parse(readGroupExample(t))
	if err != nil {
		t.Fatal(err)
	}
	g := r.Group
	if g == nil {
		t.Fatal("no group result")
	}
	// 3 rows × 4 columns at 1.6 m (x) and 1.4 m (y), 400 mm piles:
	// Bg = 3·1.6 + 0.4 = 5.2 m, Lg = 2·1.4 + 0.4 = 3.2 m.
	if g.N != 12 || math.Abs(float64(g.Geometry.Bg)-5.2) > 1e-12 || math.Abs(float64(g.Geometry.Lg)-3.2) > 1e-12 {
		t.Errorf("n %d, Bg %v, Lg %v", g.N, g.Geometry.Bg, g.Geometry.Lg)
	}
	// Undrained ground, cap not in contact, s = 1.4/0.4 = 3.5 D:
	// η = 0.65 + 0.35·(3.5 − 2.5)/3.5 = 0.75.
	if math.Abs(g.Efficiency.Value-0.75) > 1e-12 {
		t.Errorf("η = %g, want 0.75", g.Efficiency.Value)
	}
	// Loads on the cap: 12 × (320 + 110) kN.
	if got := g.Loads.Compression.Total().KN(); math.Abs(got-12*430) > 1e-9 {
		t.Errorf("cap load %g kN, want 5160", got)
	}
	if rc := r.Breakdown.Capacity.Compression; math.Abs(float64(g.SumSingles-12*rc)) > 1e-6 {
		t.Errorf("Σ singles %v, want 12 × %v", g.SumSingles, rc)
	}
	if g.Design == nil || len(g.Design.Cases) != 1 || !g.Pass {
		t.Errorf("design %+v, pass %v", g.Design, g.Pass)
	}
	// The raft at two-thirds of 22 m: 14.667 m.
	if g.Raft == nil || math.Abs(float64(g.Raft.Depth)-22.0*2/3) > 1e-9 {
		t.Errorf("raft %+v", g.Raft)
	}
}

// TestGroupLoadsGiven: loads on the cap given in the group section replace
// the file's loads × n, and a failing group fails the result.
func TestGroupLoadsGiven(t *testing.T) {
	src := string(readGroupExample(t)) + "  loads:\n    compression: {permanent: 9000 kN, variable: 2000 kN}\n"
	r, err := Parse([]byte(src))
	if err != nil {
		t.Fatal(err)
	}
	if got := r.Group.Loads.Compression.Total(); got != 11000*units.Kilonewton || r.Group.LoadsFrom != "group.loads" {
		t.Errorf("loads %v from %q", got, r.Group.LoadsFrom)
	}
	if r.Group.Pass {
		t.Error("11 000 kN on a group good for about 5800 kN passes")
	}
}

// TestGroupProblems: bad group keys are problems naming the key.
func TestGroupProblems(t *testing.T) {
	base := string(readGroupExample(t))
	for _, c := range []struct{ from, to, path string }{
		{"spacing_x: 1.6 m", "spacing_x: 0.3 m", "group.spacing_x"},
		{"efficiency: practice", "efficiency: feld\n  efficiency_value: 0.5", "group.efficiency_value"},
		{"cap_edge: 350 mm", "cap_edge: 0 mm", "group.cap_edge"},
		{"allowable: 50 mm", "allowable: -5 mm", "group.allowable"},
	} {
		_, err := Parse([]byte(strings.Replace(base, c.from, c.to, 1)))
		var ps Problems
		if !errors.As(err, &ps) || len(ps) == 0 || ps[0].Path != c.path || ps[0].Line == 0 {
			t.Errorf("%s: %v, want a problem at %s with its line", c.to, err, c.path)
		}
	}
}

// TestGroupVesic: with a settlement section the group settles by Vesic's
// ratio sg = s·√(Bg/D) from the single pile's settlement (5.2 m block of
// 0.4 m piles: √13), and the larger of that and the raft meets the
// allowable.
func TestGroupVesic(t *testing.T) {
	src := strings.Replace(string(readGroupExample(t)), "group:\n", "settlement:\n  method: load-transfer\ngroup:\n", 1)
	r, err := Parse([]byte(src))
	if err != nil {
		t.Fatal(err)
	}
	g := r.Group
	if g.Vesic == nil || r.Settlement == nil {
		t.Fatal("no Vesic settlement")
	}
	want := float64(r.Settlement.Settlement) * math.Sqrt(13)
	if math.Abs(float64(g.Vesic.Group)-want) > 1e-12*want {
		t.Errorf("sg %v, want %v", g.Vesic.Group, want)
	}
	worst := max(g.Vesic.Group, g.Raft.Total)
	if g.SettlementPass != (worst <= g.Allowable) {
		t.Errorf("settlement pass %v with %v against %v", g.SettlementPass, worst, g.Allowable)
	}
}

// TestGroupTomlinsonRaft: raft_method tomlinson widens the raft 1 in 4
// from the top of the embedded pile (the cap at the ground, 0 m) to the
// raft at 14.667 m: 5.2 + 14.667/2 by 3.2 + 14.667/2; the depth and
// geological factors multiply the consolidation and nothing else; the
// two-to-one raft of the same file is untouched by the new keys' absence.
func TestGroupTomlinsonRaft(t *testing.T) {
	base := string(readGroupExample(t))
	plain, err := Parse([]byte(base))
	if err != nil {
		t.Fatal(err)
	}
	src := strings.Replace(base, "  allowable: 50 mm\n", "  allowable: 50 mm\n  raft_method: tomlinson\n  raft_stress: average\n  raft_depth_factor: 0.8\n  raft_geological_factor: 0.7\n", 1)
	r, err := Parse([]byte(src))
	if err != nil {
		t.Fatal(err)
	}
	rf := r.Group.Raft
	d := 22.0 * 2 / 3
	if rf.Method != "tomlinson" || rf.Stress != "average" || math.Abs(float64(rf.Bg)-(5.2+d/2)) > 1e-9 || math.Abs(float64(rf.Lg)-(3.2+d/2)) > 1e-9 {
		t.Errorf("raft %s/%s %v × %v, want tomlinson/average %.4f × %.4f", rf.Method, rf.Stress, rf.Bg, rf.Lg, 5.2+d/2, 3.2+d/2)
	}
	if math.Abs(float64(rf.Consolidation)-0.56*float64(rf.Oedometer)) > 1e-15 || rf.Total != rf.Elastic+rf.Consolidation {
		t.Errorf("consolidation %v, oedometer %v, elastic %v, total %v", rf.Consolidation, rf.Oedometer, rf.Elastic, rf.Total)
	}
	p := plain.Group.Raft
	if p.Method != "two-to-one" || p.DepthFactor != 1 || p.GeologicalFactor != 1 || p.Consolidation != p.Oedometer || p.Bg != plain.Group.Geometry.Bg {
		t.Errorf("two-to-one raft %+v", p)
	}
}

// TestGroupRaftKeysRefused: the raft's new keys out of range or on the
// wrong method are problems naming the key and its line.
func TestGroupRaftKeysRefused(t *testing.T) {
	base := string(readGroupExample(t))
	for _, c := range []struct{ add, path string }{
		{"  raft_method: one-in-three\n", "group.raft_method"},
		{"  raft_stress: average\n", "group.raft_stress"},
		{"  raft_method: tomlinson\n  raft_stress: edge\n", "group.raft_stress"},
		{"  raft_spread_top: 2 m\n", "group.raft_spread_top"},
		{"  raft_depth_factor: 0\n", "group.raft_depth_factor"},
		{"  raft_depth_factor: 1.1\n", "group.raft_depth_factor"},
		{"  raft_geological_factor: 1.3\n", "group.raft_geological_factor"},
		{"  raft_geological_factor: 0\n", "group.raft_geological_factor"},
		{"  raft_method: tomlinson\n  raft_spread_top: 20 m\n", "group.raft_spread_top"},
	} {
		_, err := Parse([]byte(strings.Replace(base, "  allowable: 50 mm\n", "  allowable: 50 mm\n"+c.add, 1)))
		var ps Problems
		if !errors.As(err, &ps) || len(ps) == 0 || ps[0].Path != c.path || ps[0].Line == 0 {
			t.Errorf("%q: %v, want a problem at %s with its line", c.add, err, c.path)
		}
	}
}
