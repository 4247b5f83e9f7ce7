package settle

// Sources: none needed; the properties hold by construction (closed form
// reasoning about monotonic springs), drawn on invented inputs.

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// The properties below hold by construction of the model (closed-form
// reasoning), not by any published number.

// drawModel draws a pile of 1 to 4 segments on curves that never soften,
// with a tip spring.
func drawModel(r *rapid.T) Model {
	d := rapid.Float64Range(0.2, 1.5).Draw(r, "d")
	L := rapid.Float64Range(3, 60).Draw(r, "L")
	head := rapid.Float64Range(0, 3).Draw(r, "head")
	ns := rapid.IntRange(1, 4).Draw(r, "segments")
	clay, err := APIClay(1)
	if err != nil {
		r.Fatal(err)
	}
	pts, err := Points([]float64{0, 0.002, 0.006, 0.02}, []float64{0, 0.4, 0.8, 1}, false)
	if err != nil {
		r.Fatal(err)
	}
	curves := []Curve{APISand(), clay, pts}
	m := Model{Diameter: units.Length(d), EA: units.Force(rapid.Float64Range(0.5e9, 40e9).Draw(r, "E")) * units.Force(math.Pi/4*d*d)}
	z := head
	for i := 0; i < ns; i++ {
		h := L / float64(ns)
		m.Segments = append(m.Segments, Segment{Top: units.Length(z), Bottom: units.Length(z + h),
			Perimeter: units.Length(math.Pi * d),
			FsTop:     units.Stress(rapid.Float64Range(0, 200e3).Draw(r, "fs0")),
			FsBottom:  units.Stress(rapid.Float64Range(0, 200e3).Draw(r, "fs1")),
			Curve:     curves[rapid.IntRange(0, 2).Draw(r, "curve")]})
		z += h
	}
	m.Segments[len(m.Segments)-1].Bottom = units.Length(head + L)
	m.Tip = TipSpring{Area: units.Circle(units.Length(d)), Qp: units.Stress(rapid.Float64Range(0.1e6, 10e6).Draw(r, "qp")), Curve: APITip()}
	return m
}

// TestPropSettlementRisesWithLoad: under rising head loads the head
// settles more, and the head load is carried (shaft + tip = head).
func TestPropSettlementRisesWithLoad(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		m := drawModel(r)
		s, err := NewSolver(m, &Options{Elements: rapid.IntRange(5, 120).Draw(r, "n")})
		if err != nil {
			r.Fatal(err)
		}
		sh, tp := s.Capacity()
		qc := float64(sh + tp)
		nsteps := rapid.IntRange(2, 12).Draw(r, "steps")
		loads := make([]units.Force, nsteps)
		for i := range loads {
			loads[i] = units.Force(0.97 * qc * float64(i+1) / float64(nsteps))
		}
		res, err := s.Run(loads)
		if err != nil {
			r.Fatal(err)
		}
		if res.Plunged || len(res.Steps) != nsteps {
			r.Fatalf("plunged below capacity: %+v", res.PlungeLoad)
		}
		prev := 0.0
		for i, st := range res.Steps {
			w := float64(st.Settlement)
			if !(w > prev) || math.IsNaN(w) {
				r.Fatalf("step %d: settlement %g after %g", i, w, prev)
			}
			prev = w
			if math.Abs(float64(st.Head-loads[i])) > 1e-6*qc || math.Abs(float64(st.Shaft+st.Tip-st.Head)) > 1e-6*qc {
				r.Fatalf("step %d: head %v, target %v, shaft+tip %v", i, st.Head, loads[i], st.Shaft+st.Tip)
			}
		}
	})
}

// TestPropFullMobilisation: far beyond the tails of every curve the head
// load equals Σ shaft + tip, the capacity.
func TestPropFullMobilisation(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		m := drawModel(r)
		s, err := NewSolver(m, nil)
		if err != nil {
			r.Fatal(err)
		}
		sh, tp := s.Capacity()
		qc := float64(sh + tp)
		// Every curve ends by 0.1·D or 20 mm; the pile shortens by at most
		// Qc·L/EA: the head beyond both is fully mobilised.
		L := float64(m.Segments[len(m.Segments)-1].Bottom - m.Segments[0].Top)
		w := 0.1*float64(m.Diameter) + 0.02 + qc*L/float64(m.EA) + 0.01
		p, err := s.HeadLoadAt(units.Length(w))
		if err != nil {
			r.Fatal(err)
		}
		if math.Abs(float64(p)-qc) > 1e-6*qc {
			r.Fatalf("head %v at %g m, capacity %v", p, w, qc)
		}
	})
}

// TestPropStifferShortensLess: at the same head load a stiffer pile
// settles less and shortens less.
func TestPropStifferShortensLess(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		m := drawModel(r)
		f := rapid.Float64Range(1.1, 10).Draw(r, "factor")
		s1, err := NewSolver(m, nil)
		if err != nil {
			r.Fatal(err)
		}
		m2 := m
		m2.EA *= units.Force(f)
		s2, err := NewSolver(m2, nil)
		if err != nil {
			r.Fatal(err)
		}
		sh, tp := s1.Capacity()
		p := units.Force(rapid.Float64Range(0.05, 0.95).Draw(r, "load") * float64(sh+tp))
		r1, err1 := s1.Run([]units.Force{p})
		r2, err2 := s2.Run([]units.Force{p})
		if err1 != nil || err2 != nil {
			r.Fatal(err1, err2)
		}
		a, b := r1.Steps[0], r2.Steps[0]
		tol := 1e-9 * float64(a.Settlement)
		if !(float64(b.Settlement) <= float64(a.Settlement)+tol) || !(float64(b.Settlement-b.TipMove) <= float64(a.Settlement-a.TipMove)+tol) {
			r.Fatalf("EA ×%g: settlement %v → %v, shortening %v → %v", f, a.Settlement, b.Settlement, a.Settlement-a.TipMove, b.Settlement-b.TipMove)
		}
	})
}

// TestPropStepsDoNotMatter: the settlement at a load does not depend on
// how many load steps led there, beyond the solver's tolerance (the
// springs are nonlinear elastic and never soften here).
func TestPropStepsDoNotMatter(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		m := drawModel(r)
		s, err := NewSolver(m, nil)
		if err != nil {
			r.Fatal(err)
		}
		sh, tp := s.Capacity()
		p := rapid.Float64Range(0.05, 0.97).Draw(r, "load") * float64(sh+tp)
		k := rapid.IntRange(2, 50).Draw(r, "steps")
		loads := make([]units.Force, k)
		for i := range loads {
			loads[i] = units.Force(p * float64(i+1) / float64(k))
		}
		one, err := s.Run([]units.Force{units.Force(p)})
		if err != nil {
			r.Fatal(err)
		}
		many, err := s.Run(loads)
		if err != nil {
			r.Fatal(err)
		}
		a, b := one.Steps[0], many.Steps[k-1]
		// A head load within 1e-9·Qc of the target: the settlements agree to
		// that force over the tangent stiffness; 1e-6 relative is ample.
		if math.Abs(float64(a.Settlement-b.Settlement)) > 1e-6*float64(a.Settlement)+1e-12 {
			r.Fatalf("one step %v m, %d steps %v m", a.Settlement, k, b.Settlement)
		}
	})
}

// TestPropBreakdownCapacity: a model built from a pile analysis carries,
// at full mobilisation, exactly the analysis' Qs + Qp.
func TestPropBreakdownCapacity(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		d := rapid.Float64Range(0.3, 1.2).Draw(r, "d")
		clayT := rapid.Float64Range(1, 12).Draw(r, "clay")
		su0 := rapid.Float64Range(10, 60).Draw(r, "su0")
		su1 := su0 + rapid.Float64Range(0, 80).Draw(r, "dsu")
		phi := rapid.Float64Range(28, 40).Draw(r, "phi")
		L := clayT + rapid.Float64Range(2, 20).Draw(r, "embed")
		prof, err := profile.New(profile.Spec{WaterDepth: 1 * units.Metre, Layers: []profile.LayerSpec{
			{Name: "clay", Thickness: units.Length(clayT), Drainage: profile.Undrained, SaturatedUnitWeight: 17 * units.KilonewtonPerCubicMetre,
				UnitWeight: 17 * units.KilonewtonPerCubicMetre, SuTop: units.Stress(su0) * units.Kilopascal, SuBottom: units.Stress(su1) * units.Kilopascal},
			{Name: "sand", Thickness: 40, Drainage: profile.Drained, Phi: units.Angle(phi) * units.Degree,
				UnitWeight: 18 * units.KilonewtonPerCubicMetre, SaturatedUnitWeight: 20 * units.KilonewtonPerCubicMetre}}})
		if err != nil {
			r.Fatal(err)
		}
		inst := []pile.Installation{pile.DrivenHigh, pile.Bored}[rapid.IntRange(0, 1).Draw(r, "inst")]
		a, err := pile.NewAnalysis(prof, pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: units.Length(d)},
			Length: units.Length(L), Installation: inst}, pile.DefaultMethods(), nil)
		if err != nil {
			r.Fatal(err)
		}
		b, err := a.Breakdown()
		if err != nil {
			r.Fatal(err)
		}
		choose, err := APICurves(1)
		if err != nil {
			r.Fatal(err)
		}
		ea := units.Force(30e9 * math.Pi / 4 * d * d)
		m, err := FromBreakdown(b, units.Length(d), ea, choose, APITip())
		if err != nil {
			r.Fatal(err)
		}
		s, err := NewSolver(m, nil)
		if err != nil {
			r.Fatal(err)
		}
		sh, tp := s.Capacity()
		if math.Abs(float64(sh-b.Shaft)) > 1e-9*float64(b.Shaft) || math.Abs(float64(tp-b.Tip.Force)) > 1e-9*float64(b.Tip.Force) {
			r.Fatalf("model shaft %v tip %v; analysis Qs %v Qp %v", sh, tp, b.Shaft, b.Tip.Force)
		}
		qc := float64(b.Shaft + b.Tip.Force)
		p, err := s.HeadLoadAt(units.Length(0.1*d + 0.01 + 2*qc*L/float64(ea)))
		if err != nil {
			r.Fatal(err)
		}
		if math.Abs(float64(p)-qc) > 1e-6*qc {
			r.Fatalf("head at full mobilisation %v, analysis Qs + Qp %v", p, qc)
		}
	})
}
