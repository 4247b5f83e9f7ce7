package pile

// Sources: none needed; capacity with depth must equal single runs by
// construction (the same integrals, summed in one pass), on an invented
// layered profile.

import (
	"math"
	"testing"

	"github.com/google/go-cmp/cmp"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// approx compares the quantities of a result to a relative tolerance (or a
// tiny absolute one near zero); flags and modes exactly.
func approx(rel float64) cmp.Options {
	near := func(a, b float64) bool {
		return math.Abs(a-b) <= rel*math.Max(math.Abs(a), math.Abs(b))+1e-9
	}
	return cmp.Options{
		cmp.Comparer(func(a, b units.Force) bool { return near(float64(a), float64(b)) }),
		cmp.Comparer(func(a, b units.Stress) bool { return near(float64(a), float64(b)) }),
		cmp.Comparer(func(a, b units.Length) bool { return near(float64(a), float64(b)) }),
	}
}

// TestWithDepthEqualsSingleRunsCmp: every row of capacity with depth, the
// whole Capacity structure, equals CapacityAt at that depth (go-cmp with
// a 1e-9 relative tolerance), through a sand-clay-sand profile with the
// tip rules acting.
func TestWithDepthEqualsSingleRunsCmp(t *testing.T) {
	prof, err := profile.New(layeredSpec(siUnits, false))
	if err != nil {
		t.Fatal(err)
	}
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.6 * m}, Length: prof.Depth() - 1*m, Installation: DrivenHigh, UnitWeight: 24 * kNm}
	a, err := NewAnalysis(prof, p, DefaultMethods(), nil)
	if err != nil {
		t.Fatal(err)
	}
	rows, err := a.WithDepth(DepthGrid{From: 0.25 * m, To: p.Length, Step: 0.25 * m}, nil)
	if err != nil {
		t.Fatal(err)
	}
	if len(rows) < 10 {
		t.Fatalf("%d rows", len(rows))
	}
	for _, row := range rows {
		single, err := a.CapacityAt(row.TipDepth)
		if err != nil {
			t.Fatal(err)
		}
		if d := cmp.Diff(single, row, approx(1e-9)); d != "" {
			t.Fatalf("at %v m, single run (−) against capacity with depth (+):\n%s", row.TipDepth, d)
		}
	}
}
