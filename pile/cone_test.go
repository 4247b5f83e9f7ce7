package pile

// Where the numbers come from: closed forms in a uniform sounding (an
// invented scenario), where each direct method's average is the reading
// itself; and the general capacity path as an oracle for capacity with
// depth.

import (
	"errors"
	"math"
	"testing"

	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// uniformCone is a sounding of our own: qc 10 MPa, fs 60 kPa, u2 0.2 MPa,
// a = 1 (qt = qc, qE = 9.8 MPa), every 0.05 m from 0 to 40 m.
func uniformCone(t testing.TB) *insitu.Cone {
	s := &insitu.Sounding{ID: "U", AreaRatio: 1, HasU2: true}
	for i := 0; i <= 800; i++ {
		s.Rows = append(s.Rows, insitu.Row{Depth: units.Length(float64(i) * 0.05), Qc: 10 * units.Megapascal, Fs: 60 * kPa, U2: 0.2 * units.Megapascal})
	}
	c, err := insitu.NewCone(s)
	if err != nil {
		t.Fatal(err)
	}
	return c
}

// coneProfile: a dry sand over a clay (a scenario of our own), 40 m.
func coneProfile(t *testing.T) *profile.Profile {
	return mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "sand", Thickness: 8 * m, Drainage: profile.Drained, Phi: 33 * units.Degree, UnitWeight: 18 * kNm},
		{Name: "clay", Thickness: 32 * m, Drainage: profile.Undrained, Su: 80 * kPa, UnitWeight: 19 * kNm},
	}})
}

// TestConeMethodsClosedForm: a 0.4 m square driven pile 20 m long with
// the LCPC shaft (α = 100, limit 80 kPa: fs = min(10000/100, 80) = 80 kPa)
// in the sand and the Eslami–Fellenius shaft (Cs = 0.005: fs = 49 kPa) in
// the clay, tip by LCPC (kc = 0.45: qp = 4500 kPa):
// Qs = 1.6 × (80 × 8 + 49 × 12) = 1964.8 kN, Qp = 4500 × 0.16 = 720 kN
// (closed form). Capacity with depth agrees with the capacity at each tip.
func TestConeMethodsClosedForm(t *testing.T) {
	prof := coneProfile(t)
	c := uniformCone(t)
	p := Pile{Section: Section{Shape: Square, Width: 0.4 * m}, Length: 20 * m, Installation: DrivenHigh}
	ms := DefaultMethods()
	ms.Layers = []LayerMethods{
		{Shaft: ConeShaft{Method: insitu.LCPCShaft{Alpha: 100, Limit: 80 * kPa}, Cone: c}},
		{Shaft: ConeShaft{Method: insitu.EslamiFelleniusShaft{Cs: 0.005}, Cone: c},
			Tip: ConeTip{Method: insitu.LCPCTip{Kc: 0.45}, Cone: c}},
	}
	a, err := NewAnalysis(prof, p, ms, nil)
	if err != nil {
		t.Fatal(err)
	}
	got, err := a.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	near(t, "Qs", got.Shaft.KN(), 1.6*(80*8+49*12), 1e-12)
	near(t, "Qp", got.Tip.KN(), 720, 1e-12)
	b, err := a.Breakdown()
	if err != nil {
		t.Fatal(err)
	}
	if b.Tip.Result.Cone.Q == 0 || b.Tip.Result.Cone.Factor != 0.45 || b.Tip.Method != "lcpc" {
		t.Errorf("tip block %+v", b.Tip)
	}
	if b.Tip.Flags&(EmbedmentRamp|LayeredTip|WeakLayerReduced) != 0 {
		t.Errorf("a cone tip took Meyerhof's tip rules: %v", b.Tip.Flags)
	}
	rows, err := a.WithDepth(DepthGrid{From: 9 * m, To: 30 * m, Step: 0.5 * m}, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range rows {
		at, err := a.CapacityAt(r.TipDepth)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(float64(at.Compression-r.Compression)) > 1e-9*float64(at.Compression) {
			t.Errorf("tip %v: with depth %v, at the depth %v", r.TipDepth, r.Compression, at.Compression)
		}
		// Qs = 1.6 × (640 + 49 × (z − 8)) kN (closed form)
		near(t, "Qs with depth", r.Shaft.KN(), 1.6*(640+49*(r.TipDepth.Metres()-8)), 1e-12)
	}
}

// TestConeSleeveTaper: Schmertmann's sand rule with K = 1 in the sand
// (0 to 8 m) of a 0.4 m square pile, 8B = 3.2 m: ∫ = 60 × (3.2/2 + 4.8)
// = 384 kPa·m, Qs = 1.6 × 384 = 614.4 kN, the pile's width read from the
// section (closed form).
func TestConeSleeveTaper(t *testing.T) {
	prof := coneProfile(t)
	c := uniformCone(t)
	p := Pile{Section: Section{Shape: Square, Width: 0.4 * m}, Length: 8 * m, Installation: DrivenHigh}
	ms := DefaultMethods()
	ms.Layers = []LayerMethods{{Shaft: ConeShaft{Method: insitu.SchmertmannSandShaft{K: 1}, Cone: c}}}
	a, err := NewAnalysis(prof, p, ms, nil)
	if err != nil {
		t.Fatal(err)
	}
	got, err := a.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	near(t, "Qs", got.Shaft.KN(), 1.6*384, 1e-12)
}

// TestConeMissing: a direct method without a sounding, or with a tip zone
// below its last reading, is an error naming the layer's field.
func TestConeMissing(t *testing.T) {
	prof := coneProfile(t)
	p := Pile{Section: Section{Shape: Square, Width: 0.4 * m}, Length: 20 * m, Installation: DrivenHigh}
	ms := DefaultMethods()
	ms.Layers = []LayerMethods{{}, {Tip: ConeTip{Method: insitu.LCPCTip{Kc: 0.45}}}}
	a, err := NewAnalysis(prof, p, ms, nil)
	if err == nil {
		_, err = a.Capacity()
	}
	var pe *PathError
	if !errors.Is(err, ErrNoCone) || !errors.As(err, &pe) || pe.Path != "layers[1].tip" {
		t.Errorf("no sounding: %v; want ErrNoCone at layers[1].tip", err)
	}
	s := &insitu.Sounding{ID: "short", AreaRatio: 1}
	for i := 0; i <= 200; i++ {
		s.Rows = append(s.Rows, insitu.Row{Depth: units.Length(float64(i) * 0.1), Qc: 5 * units.Megapascal})
	}
	c, _ := insitu.NewCone(s) // to 20 m: the zone reaches 20.6 m
	ms.Layers[1].Tip = ConeTip{Method: insitu.LCPCTip{Kc: 0.45}, Cone: c}
	a, err = NewAnalysis(prof, p, ms, nil)
	if err == nil {
		_, err = a.Capacity()
	}
	var ze *insitu.ZoneError
	if !errors.As(err, &ze) || !errors.As(err, &pe) || pe.Path != "layers[1].tip" {
		t.Errorf("short sounding: %v; want a ZoneError at layers[1].tip", err)
	}
}

// TestPropConeDepthAndScale: on random soundings (invented), capacity with
// depth equals the capacity at each tip, and scaling every qc by k scales
// the tip and the shaft of the cone layers by k (the methods are
// homogeneous in qc; no limit is reached here).
func TestPropConeDepthAndScale(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		n := rapid.IntRange(150, 400).Draw(r, "n")
		h := rapid.Float64Range(0.05, 0.2).Draw(r, "h")
		k := rapid.Float64Range(0.5, 2).Draw(r, "k")
		s := &insitu.Sounding{ID: "R", AreaRatio: 1, HasU2: true} // u2 measured, zero
		s2 := &insitu.Sounding{ID: "R2", AreaRatio: 1, HasU2: true}
		for i := range n {
			q := units.Stress(rapid.Float64Range(0.5, 30).Draw(r, "qc")) * units.Megapascal
			z := units.Length(float64(i) * h)
			s.Rows = append(s.Rows, insitu.Row{Depth: z, Qc: q})
			s2.Rows = append(s2.Rows, insitu.Row{Depth: z, Qc: units.Stress(k) * q})
		}
		c, err := insitu.NewCone(s)
		if err != nil {
			r.Fatal(err)
		}
		c2, _ := insitu.NewCone(s2)
		bottom := float64(n-1) * h
		d := rapid.Float64Range(0.2, 0.5).Draw(r, "d")
		top := rapid.Float64Range(0.2*bottom, 0.5*bottom).Draw(r, "layer")
		prof := mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
			{Name: "upper", Thickness: units.Length(top), Drainage: profile.Drained, Phi: 32 * units.Degree, UnitWeight: 18 * kNm},
			{Name: "lower", Thickness: units.Length(bottom - top + 10), Drainage: profile.Drained, Phi: 35 * units.Degree, UnitWeight: 19 * kNm},
		}})
		tipMethod := []insitu.DirectTip{insitu.LCPCTip{Kc: 0.4}, insitu.SchmertmannTip{Limit: 100 * units.Megapascal}, insitu.EslamiFelleniusTip{}}[rapid.IntRange(0, 2).Draw(r, "tip")]
		shaftMethod := []insitu.DirectShaft{insitu.LCPCShaft{Alpha: 300, Limit: units.Megapascal}, insitu.EslamiFelleniusShaft{Cs: 0.005}}[rapid.IntRange(0, 1).Draw(r, "shaft")]
		methods := func(c *insitu.Cone) Methods {
			ms := DefaultMethods()
			ms.Layers = []LayerMethods{{NoShaft: true}, {Shaft: ConeShaft{Method: shaftMethod, Cone: c}, Tip: ConeTip{Method: tipMethod, Cone: c}}}
			return ms
		}
		// deepest tip whose zone (8B above, 4B below) the readings cover
		zmax := bottom - 4*d - 1e-6
		p := Pile{Section: Section{Shape: Circle, Diameter: units.Length(d)}, Length: units.Length(zmax), Installation: DrivenHigh}
		a, err := NewAnalysis(prof, p, methods(c), nil)
		if err != nil {
			r.Fatal(err)
		}
		a2, err := NewAnalysis(prof, p, methods(c2), nil)
		if err != nil {
			r.Fatal(err)
		}
		from := top + 8*d + 0.01
		if from >= zmax {
			r.Skip("no depth with the whole zone in the lower layer")
		}
		rows, err := a.WithDepth(DepthGrid{From: units.Length(from), To: units.Length(zmax), Step: units.Length((zmax - from) / 7)}, nil)
		if err != nil {
			r.Fatal(err)
		}
		for _, w := range rows {
			at, err := a.CapacityAt(w.TipDepth)
			if err != nil {
				r.Fatal(err)
			}
			if math.Abs(float64(at.Compression-w.Compression)) > 1e-9*float64(at.Compression) {
				r.Fatalf("tip %v: with depth %v, at the tip %v", w.TipDepth, w.Compression, at.Compression)
			}
			at2, err := a2.CapacityAt(w.TipDepth)
			if err != nil {
				r.Fatal(err)
			}
			if math.Abs(float64(at2.Tip)-k*float64(at.Tip)) > 1e-9*k*float64(at.Tip) ||
				math.Abs(float64(at2.Shaft)-k*float64(at.Shaft)) > 1e-9*k*float64(at.Shaft)+1e-6 {
				r.Fatalf("tip %v: k = %g: Qp %v → %v, Qs %v → %v", w.TipDepth, k, at.Tip, at2.Tip, at.Shaft, at2.Shaft)
			}
		}
	})
}
