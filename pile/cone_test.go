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
)

// uniformCone is a sounding of our own: qc 10 MPa, u2 0.2 MPa, a = 1
// (qt = qc, qE = 9.8 MPa), every 0.05 m from 0 to 40 m.
func uniformCone(t testing.TB) *insitu.Cone {
	s := &insitu.Sounding{ID: "U", AreaRatio: 1, HasU2: true}
	for i := 0; i <= 800; i++ {
		s.Rows = append(s.Rows, insitu.Row{Depth: units.Length(float64(i) * 0.05), Qc: 10 * units.Megapascal, U2: 0.2 * units.Megapascal})
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
	if b.Tip.Result.Cone == nil || b.Tip.Result.Cone.Factor != 0.45 || b.Tip.Method != "lcpc" {
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
