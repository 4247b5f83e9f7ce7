package settle

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

// elasticHead is the closed form of an elastic pile (EA, length L) on
// linear shaft springs k (per unit area of shaft, N/m³) over perimeter p
// and a linear base spring kb (N/m):
//
//	P/w = EA·μ·(Ω + tanh μL)/(1 + Ω·tanh μL), μ = √(k·p/(EA)), Ω = kb/(EA·μ)
//
// (the differential equation EA·w″ = k·p·w with EA·w′(L) = −kb·w(L);
// closed form).
func elasticHead(ea, k, p, L, kb float64) float64 {
	mu := math.Sqrt(k * p / ea)
	om := kb / (ea * mu)
	th := math.Tanh(mu * L)
	return ea * mu * (om + th) / (1 + om*th)
}

// linearModel is a pile whose springs stay on their first, straight piece
// for small loads: t = (fs/z1)·w, Q = (Qp·Ab/zb)·w.
func linearModel(t testing.TB, L, d, ea, fs, z1, qp, zb float64) Model {
	t.Helper()
	cs, err := Points([]float64{0, z1, 1e3 * z1}, []float64{0, 0.999, 1}, false)
	if err != nil {
		t.Fatal(err)
	}
	cb, err := Points([]float64{0, zb, 1e3 * zb}, []float64{0, 0.999, 1}, false)
	if err != nil {
		t.Fatal(err)
	}
	return Model{Diameter: units.Length(d), EA: units.Force(ea),
		Segments: []Segment{{Top: 0, Bottom: units.Length(L), Perimeter: units.Length(math.Pi * d),
			FsTop: units.Stress(fs), FsBottom: units.Stress(fs), Curve: cs}},
		Tip: TipSpring{Area: units.Circle(units.Length(d)), Qp: units.Stress(qp), Curve: cb}}
}

// TestElasticClosedForm: the solver against the closed form of an elastic
// pile on linear shaft and base springs, within 0.5 % at 100 elements, and
// its error falling as elements are added (the observed order is logged).
func TestElasticClosedForm(t *testing.T) {
	// Our own scenario: a 0.6 m concrete pile 20 m long, EA = 30 GPa × A.
	L, d := 20.0, 0.6
	ea := 30e9 * math.Pi / 4 * d * d
	fs, z1 := 80e3, 0.005 // 80 kPa reached at 5 mm: k = 16 MN/m³ (×0.999)
	qp, zb := 4e6, 0.03
	m := linearModel(t, L, d, ea, fs, z1, qp, zb)
	k := 0.999 * fs / z1
	kb := 0.999 * qp * math.Pi / 4 * d * d / zb
	want := elasticHead(ea, k, math.Pi*d, L, kb)
	w := 0.001 // 1 mm at the head: every spring stays below z1 and zb
	var errs []float64
	ns := []int{25, 50, 100, 200, 400}
	for _, n := range ns {
		s, err := NewSolver(m, &Options{Elements: n, Tolerance: 1e-12})
		if err != nil {
			t.Fatal(err)
		}
		p, err := s.HeadLoadAt(units.Length(w))
		if err != nil {
			t.Fatal(err)
		}
		got := float64(p) / w
		rel := math.Abs(got-want) / want
		errs = append(errs, rel)
		t.Logf("elements %4d: P/w %.8g N/m, closed form %.8g N/m, error %.3e", n, got, want, rel)
		if n == 100 && rel > 0.005 {
			t.Errorf("100 elements: P/w %.6g, closed form %.6g: error %.3g %% > 0.5 %%", got, want, 100*rel)
		}
	}
	for i := 1; i < len(errs); i++ {
		order := math.Log(errs[i-1]/errs[i]) / math.Log(float64(ns[i])/float64(ns[i-1]))
		t.Logf("observed order %d→%d elements: %.3f", ns[i-1], ns[i], order)
		if !(order > 1.8 && order < 2.2) {
			t.Errorf("observed order %.3f between %d and %d elements; the lumped (trapezoid) springs give 2", order, ns[i-1], ns[i])
		}
	}
}
