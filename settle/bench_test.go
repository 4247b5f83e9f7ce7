package settle

// Sources: none; the benchmark runs an invented scenario.

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

// benchModel is our own scenario: a 0.6 m bored pile 24 m long through
// 9 m of clay into sand, API curves, 20 MPa·π·0.3² ... as plain data.
func benchModel(tb testing.TB) Model {
	tb.Helper()
	clay, err := APIClay(0)
	if err != nil {
		tb.Fatal(err)
	}
	d := 0.6
	p := units.Length(math.Pi * d)
	return Model{Diameter: units.Length(d), EA: units.Force(30e9 * math.Pi / 4 * d * d),
		Segments: []Segment{
			{Top: 0, Bottom: 9, Perimeter: p, FsTop: 10e3, FsBottom: 30e3, Curve: clay},
			{Top: 9, Bottom: 24, Perimeter: p, FsTop: 40e3, FsBottom: 90e3, Curve: APISand()},
		},
		Tip: TipSpring{Area: units.Circle(units.Length(d)), Qp: 4 * units.Megapascal, Curve: APITip()}}
}

// TestSolveAllocatesNothing: the inner solves allocate nothing.
func TestSolveAllocatesNothing(t *testing.T) {
	s, err := NewSolver(benchModel(t), nil)
	if err != nil {
		t.Fatal(err)
	}
	sh, tp := s.Capacity()
	p := 0.6 * (sh + tp)
	if n := testing.AllocsPerRun(20, func() {
		if _, err := s.SettlementAt(p); err != nil {
			t.Fatal(err)
		}
	}); n != 0 {
		t.Errorf("SettlementAt allocates %v times per call", n)
	}
	if n := testing.AllocsPerRun(20, func() {
		if _, err := s.HeadLoadAt(0.01); err != nil {
			t.Fatal(err)
		}
	}); n != 0 {
		t.Errorf("HeadLoadAt allocates %v times per call", n)
	}
}

// BenchmarkLoadTransfer: 100 elements, 50 load steps to 95 % of the
// capacity, with the load-settlement curve and the state along the pile at
// every step.
func BenchmarkLoadTransfer(b *testing.B) {
	s, err := NewSolver(benchModel(b), &Options{Elements: 100})
	if err != nil {
		b.Fatal(err)
	}
	sh, tp := s.Capacity()
	loads := make([]units.Force, 50)
	for i := range loads {
		loads[i] = 0.95 * (sh + tp) * units.Force(i+1) / 50
	}
	b.ReportAllocs()
	for b.Loop() {
		r, err := s.Run(loads)
		if err != nil || len(r.Steps) != 50 {
			b.Fatal(err, r.Plunged)
		}
	}
}
