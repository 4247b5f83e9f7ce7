package settle

// Sources: none; fuzz seeds are invented inputs.

import (
	"errors"
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

func finite(v ...float64) bool {
	for _, x := range v {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return false
		}
	}
	return true
}

// FuzzInterpret: the load-test criteria never panic and never return NaN
// or Inf without an error.
func FuzzInterpret(f *testing.F) {
	f.Add(0.0, 0.0, 500.0, 2.0, 1000.0, 4.5, 1500.0, 8.0, 1900.0, 25.0, 0.4, 20.0, 3e9, 0)
	f.Add(0.0, 0.0, 1.0, 1.0, 1.0, 2.0, 1.0, 3.0, 1.0, 4.0, 0.1, 1.0, 1.0, 1)
	f.Add(1e300, 1e-300, 1e300, 1e300, 1e308, 1e308, 1e308, 1e308, 1e308, 1e308, 1e-300, 1e300, 1e-300, 2)
	f.Fuzz(func(t *testing.T, q0, s0, q1, s1, q2, s2, q3, s3, q4, s4, d, l, ea float64, from int) {
		lt := LoadTest{Load: []units.Force{units.Force(q0 * 1e3), units.Force(q1 * 1e3), units.Force(q2 * 1e3), units.Force(q3 * 1e3), units.Force(q4 * 1e3)},
			Settlement: []units.Length{units.Length(s0 * 1e-3), units.Length(s1 * 1e-3), units.Length(s2 * 1e-3), units.Length(s3 * 1e-3), units.Length(s4 * 1e-3)}}
		check := func(name string, l Limit, err error) {
			if err == nil && !finite(float64(l.Load), float64(l.Settlement), l.C1, l.C2, l.R2) {
				t.Fatalf("%s: %+v without an error", name, l)
			}
		}
		lim, err := Davisson(lt, units.Length(l), units.Force(ea), units.Length(d))
		check("davisson", lim, err)
		lim, err = TenPercent(lt, units.Length(d))
		check("ten-percent", lim, err)
		lim, err = ChinKondner(lt, from)
		check("chin", lim, err)
		lim, err = BrinchHansen80(lt, from)
		check("hansen", lim, err)
	})
}

// FuzzLoadTransfer: the solver never panics, never hangs and never returns
// NaN or Inf without an error; a load above the capacity plunges.
func FuzzLoadTransfer(f *testing.F) {
	f.Add(0.6, 20.0, 30e9, 50e3, 80e3, 4e6, 0.5, 0, 100)
	f.Add(0.3, 5.0, 1e6, 0.0, 0.0, 1e6, 2.0, 1, 3)
	f.Add(1e-3, 1e3, 1e15, 1e9, 0.0, 0.0, 0.99, 2, 1)
	f.Fuzz(func(t *testing.T, d, L, e, fs0, fs1, qp, frac float64, curve, n int) {
		if n < 1 || n > 400 {
			n = 1 + (n%400+400)%400
		}
		clay, _ := APIClay(0)
		curves := []Curve{APISand(), clay, APITip()}
		c := curves[(curve%3+3)%3]
		m := Model{Diameter: units.Length(d), EA: units.Force(e * math.Pi / 4 * d * d),
			Segments: []Segment{{Top: 0, Bottom: units.Length(L), Perimeter: units.Length(math.Pi * d),
				FsTop: units.Stress(fs0), FsBottom: units.Stress(fs1), Curve: c}},
			Tip: TipSpring{Area: units.Circle(units.Length(d)), Qp: units.Stress(qp), Curve: APITip()}}
		s, err := NewSolver(m, &Options{Elements: n})
		if err != nil {
			return
		}
		sh, tp := s.Capacity()
		if !finite(float64(sh), float64(tp)) {
			t.Fatalf("capacity %v %v", sh, tp)
		}
		p := units.Force(frac) * (sh + tp)
		w, err := s.SettlementAt(p)
		var pe *PlungeError
		switch {
		case errors.As(err, &pe):
			if !finite(float64(pe.Load)) {
				t.Fatalf("plunge load %v", pe.Load)
			}
		case err == nil:
			if !finite(float64(w)) {
				t.Fatalf("settlement %v without an error", w)
			}
		}
		res, err := s.Run([]units.Force{p / 2, p})
		if err == nil {
			for _, st := range res.Steps {
				if !finite(float64(st.Head), float64(st.Settlement), float64(st.Shaft), float64(st.Tip)) {
					t.Fatalf("step %+v", st)
				}
				for i := range st.Load {
					if !finite(float64(st.Load[i]), float64(st.Move[i])) {
						t.Fatalf("node %d: %v %v", i, st.Load[i], st.Move[i])
					}
				}
			}
		}
	})
}
