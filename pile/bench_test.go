package pile

// The profile and pile here are a scenario of our own for timing; no
// published source is involved and nothing is checked against one.

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// benchProfile is a 10-layer profile of our own: sand and clay in turn,
// 6.5 m each, water table at 1.5 m; sands carry Ir for Vesic's tip.
func benchProfile(b *testing.B) *profile.Profile { return benchProfileT(b) }

// benchProfileT is benchProfile for tests.
func benchProfileT(b testing.TB) *profile.Profile {
	var ls []profile.LayerSpec
	for i := 0; i < 10; i++ {
		if i%2 == 0 {
			ls = append(ls, profile.LayerSpec{Name: "sand", Thickness: 6.5 * m, Drainage: profile.Drained,
				Phi: units.Angle(30+i) * deg, UnitWeight: 18 * kNm, SaturatedUnitWeight: 20 * kNm, Ir: 60})
		} else {
			ls = append(ls, profile.LayerSpec{Name: "clay", Thickness: 6.5 * m, Drainage: profile.Undrained,
				Su: units.Stress(30+10*i) * kPa, UnitWeight: 17 * kNm, SaturatedUnitWeight: 17.5 * kNm})
		}
	}
	p, err := profile.New(profile.Spec{WaterDepth: 1.5 * m, Layers: ls})
	if err != nil {
		b.Fatal(err)
	}
	return p
}

var benchAlphas = []struct {
	name string
	m    shaft.Unit
}{
	{"alpha-api", shaft.AlphaAPI{}},
	{"alpha-chart", shaft.AlphaChart{}},
}

// BenchmarkCapacity: 10 layers, β in sand, α in clay, Vesic tip; the
// capacity-only path.
func BenchmarkCapacity(b *testing.B) {
	prof := benchProfile(b)
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.6 * m}, Length: 60 * m, Installation: DrivenHigh}
	for _, al := range benchAlphas {
		b.Run(al.name, func(b *testing.B) {
			a, err := NewAnalysis(prof, p, Methods{TipDrained: bearing.Vesic{}, ShaftUndrained: al.m, LayeredTip: true}, nil)
			if err != nil {
				b.Fatal(err)
			}
			b.ReportAllocs()
			for b.Loop() {
				if _, err := a.Capacity(); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// BenchmarkCapacityWithDepth: the same profile, tip depths every 0.1 m to
// 60 m (600 depths) and every 0.01 m (6,000 depths), in one pass.
func BenchmarkCapacityWithDepth(b *testing.B) {
	prof := benchProfile(b)
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.6 * m}, Length: 60 * m, Installation: DrivenHigh}
	for _, al := range benchAlphas {
		for _, st := range []struct {
			name string
			step units.Length
		}{{"600", 0.1 * m}, {"6000", 0.01 * m}} {
			b.Run(al.name+"/"+st.name, func(b *testing.B) {
				a, err := NewAnalysis(prof, p, Methods{TipDrained: bearing.Vesic{}, ShaftUndrained: al.m, LayeredTip: true}, nil)
				if err != nil {
					b.Fatal(err)
				}
				rows := make([]Capacity, 0, 6100)
				b.ReportAllocs()
				for b.Loop() {
					var err error
					rows, err = a.WithDepth(DepthGrid{From: st.step, To: 60 * m, Step: st.step}, rows[:0])
					if err != nil {
						b.Fatal(err)
					}
				}
				b.ReportMetric(float64(len(rows))*float64(b.N)/b.Elapsed().Seconds(), "depths/s")
			})
		}
	}
}

// TestCapacityAllocatesNothing guards the zero-allocation path.
func TestCapacityAllocatesNothing(t *testing.T) {
	prof := mustProfile(t, layeredSpec(siUnits, false))
	a, err := NewAnalysis(prof, layeredPile(siUnits), Methods{TipDrained: bearing.Vesic{}, ShaftUndrained: shaft.AlphaAPI{}, LayeredTip: true}, nil)
	if err != nil {
		t.Fatal(err)
	}
	if n := testing.AllocsPerRun(100, func() { _, _ = a.Capacity() }); n != 0 {
		t.Errorf("Capacity allocates %v times per run", n)
	}
}

// BenchmarkWithDepthCone: capacity with depth at 60 tip depths (0.5 m
// apart) of a 0.4 m pile whose lower layer takes the LCPC shaft and the
// minimum-path tip from a 2000-row sounding (20 mm readings, invented).
func BenchmarkWithDepthCone(b *testing.B) {
	s := &insitu.Sounding{ID: "B", AreaRatio: 0.8, HasU2: true}
	for i := 1; i <= 2000; i++ {
		z := 0.02 * float64(i)
		s.Rows = append(s.Rows, insitu.Row{Depth: units.Length(z), Qc: units.Stress(4e6 + 4e5*z + 1e6*math.Sin(z*3)), U2: units.Stress(9.81e3 * z)})
	}
	c, err := insitu.NewCone(s)
	if err != nil {
		b.Fatal(err)
	}
	prof, err := profile.New(profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "clay", Thickness: 5 * m, Drainage: profile.Undrained, Su: 40 * kPa, UnitWeight: 18 * kNm},
		{Name: "sand", Thickness: 40 * m, Drainage: profile.Drained, Phi: 34 * units.Degree, UnitWeight: 19 * kNm},
	}})
	if err != nil {
		b.Fatal(err)
	}
	ms := DefaultMethods()
	ms.Layers = []LayerMethods{{}, {Shaft: ConeShaft{Method: insitu.LCPCShaft{Alpha: 150, Limit: 120 * kPa}, Cone: c},
		Tip: ConeTip{Method: insitu.SchmertmannTip{Limit: 15 * units.Megapascal}, Cone: c}}}
	p := Pile{Section: Section{Shape: Square, Width: 0.4 * m}, Length: 30 * m, Installation: DrivenHigh}
	a, err := NewAnalysis(prof, p, ms, nil)
	if err != nil {
		b.Fatal(err)
	}
	dst := make([]Capacity, 0, 64)
	b.ReportAllocs()
	for b.Loop() {
		if dst, err = a.WithDepth(DepthGrid{From: 5.5 * m, To: 35 * m, Step: 0.5 * m}, dst[:0]); err != nil {
			b.Fatal(err)
		}
	}
}
