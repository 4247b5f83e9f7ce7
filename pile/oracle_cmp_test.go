package pile

import (
	"fmt"
	"math"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// The expected values in this file come from the oracle (the former
// implementation of capacity with depth, kept in oracle_test.go), not from
// a published source: these tests check that the faster pass computes the
// same numbers.
//
// drawAnalysis draws a random profile, pile and methods (scenarios of our
// own, no published numbers): 1 to 6 layers of drained and undrained soil
// with constant or linear su, the shaft and tip methods of each class
// (closed-form, quadrature and λ layers), a critical depth, zones without
// shaft friction, an excavation, bored piles with the drilled-shaft zones,
// open pipes with both plug modes, the three self-weight rules and, now
// and then, a design case.
func drawAnalysis(rt *rapid.T) (*Analysis, float64) {
	nl := rapid.IntRange(1, 6).Draw(rt, "layers")
	var spec profile.Spec
	var lms []LayerMethods
	depth := 0.0
	for i := range nl {
		h := rapid.Float64Range(0.5, 15).Draw(rt, fmt.Sprintf("h%d", i))
		depth += h
		ls := profile.LayerSpec{Thickness: units.Length(h), UnitWeight: units.UnitWeight(rapid.Float64Range(15e3, 19e3).Draw(rt, "gamma"))}
		ls.SaturatedUnitWeight = ls.UnitWeight + units.UnitWeight(rapid.Float64Range(0, 3e3).Draw(rt, "dgamma"))
		var lm LayerMethods
		if rapid.Bool().Draw(rt, "drained") {
			ls.Drainage = profile.Drained
			ls.Phi = units.Angle(rapid.Float64Range(22, 42).Draw(rt, "phi")) * deg
			if rapid.Bool().Draw(rt, "ir") {
				ls.Ir = rapid.Float64Range(10, 300).Draw(rt, "Ir")
			}
			switch rapid.IntRange(0, 4).Draw(rt, "dshaft") {
			case 1:
				lm.Shaft = shaft.BetaGiven{Beta: rapid.Float64Range(0.1, 1.2).Draw(rt, "beta")}
			case 2:
				lm.Shaft = shaft.Beta{K: shaft.KGiven{K: rapid.Float64Range(0.3, 2).Draw(rt, "K")}, Delta: shaft.DeltaOverPhi{Ratio: 0.8}}
			case 3:
				lm.Shaft = shaft.Capped{Method: shaft.BetaGiven{Beta: 0.8}, Limit: shaft.LimitGiven{Fs: units.Stress(rapid.Float64Range(20e3, 120e3).Draw(rt, "flim"))}}
			case 4:
				lm.Shaft = shaft.Burland{}
			}
			switch rapid.IntRange(0, 3).Draw(rt, "dtip") {
			case 1:
				lm.Tip = bearing.GivenNq{Nq: rapid.Float64Range(10, 80).Draw(rt, "nq"), Limit: units.Stress(rapid.SampledFrom([]float64{0, 5e6}).Draw(rt, "qlim"))}
			case 2:
				if ls.Ir > 0 {
					lm.Tip = bearing.Vesic{}
				}
			case 3:
				lm.Tip = bearing.Janbu{}
			}
		} else {
			ls.Drainage = profile.Undrained
			if rapid.Bool().Draw(rt, "linear su") {
				ls.SuTop = units.Stress(rapid.Float64Range(5e3, 80e3).Draw(rt, "su top"))
				ls.SuBottom = units.Stress(rapid.Float64Range(5e3, 150e3).Draw(rt, "su bottom"))
			} else {
				ls.Su = units.Stress(rapid.Float64Range(5e3, 150e3).Draw(rt, "su"))
			}
			switch rapid.IntRange(0, 4).Draw(rt, "ushaft") {
			case 1:
				lm.Shaft = shaft.AlphaGiven{Alpha: rapid.Float64Range(0.3, 1).Draw(rt, "alpha")}
			case 2:
				lm.Shaft = shaft.AlphaChart{}
			case 3:
				lm.Lambda = true
			case 4:
				lm.Shaft = shaft.AlphaAPI{}
			}
			if rapid.Bool().Draw(rt, "given nc") {
				lm.Tip = bearing.GivenNc{Nc: rapid.Float64Range(6, 12).Draw(rt, "nc")}
			}
		}
		lm.NoShaft = rapid.IntRange(0, 9).Draw(rt, "no shaft layer") == 0
		spec.Layers, lms = append(spec.Layers, ls), append(lms, lm)
	}
	spec.WaterDepth = units.Length(rapid.Float64Range(-2, depth+2).Draw(rt, "water"))
	if rapid.IntRange(0, 5).Draw(rt, "cut") == 0 {
		spec.ExcavationDepth = units.Length(rapid.Float64Range(0.1, 0.3*depth).Draw(rt, "excavation"))
	}
	prof, err := profile.New(spec)
	if err != nil {
		rt.Skip(err)
	}
	d := rapid.Float64Range(0.2, 1.2).Draw(rt, "d")
	p := Pile{Section: Section{Shape: Circle, Diameter: units.Length(d)},
		Installation: rapid.SampledFrom([]Installation{DrivenHigh, DrivenLow, Bored, Augered, Jetted}).Draw(rt, "installation"),
		UnitWeight:   units.UnitWeight(rapid.SampledFrom([]float64{0, 24e3, 77e3}).Draw(rt, "gp"))}
	if rapid.IntRange(0, 3).Draw(rt, "pipe") == 0 {
		p.Section = Section{Shape: OpenPipe, Diameter: units.Length(d), Wall: units.Length(d / 50)}
		p.Plug = rapid.SampledFrom([]Plug{PlugLesser, Plugged, Unplugged}).Draw(rt, "plug")
	}
	p.HeadDepth = units.Length(rapid.SampledFrom([]float64{0, 0, 0.7}).Draw(rt, "head"))
	p.Length = units.Length(depth) - p.HeadDepth
	m := Methods{Layers: lms, LayeredTip: rapid.IntRange(0, 4).Draw(rt, "layered") > 0,
		SelfWeight:  rapid.SampledFrom([]SelfWeight{WeightIgnored, WeightNet, WeightGross}).Draw(rt, "self weight"),
		NoWeakLayer: rapid.IntRange(0, 5).Draw(rt, "no weak") == 0, NoEmbedment: rapid.IntRange(0, 5).Draw(rt, "no ramp") == 0,
		Clamp: true}
	if rapid.Bool().Draw(rt, "critical depth") {
		m.CriticalDepth = rapid.Float64Range(5, 50).Draw(rt, "zc/D")
	}
	if rapid.IntRange(0, 3).Draw(rt, "zone") == 0 {
		top := rapid.Float64Range(0, depth*0.8).Draw(rt, "zone top")
		m.NoShaft = []Zone{{Top: units.Length(top), Bottom: units.Length(top + rapid.Float64Range(0.2, 5).Draw(rt, "zone h"))}}
	}
	var opt *Options
	if rapid.IntRange(0, 4).Draw(rt, "case") == 0 {
		opt = &Options{Case: &Case{Name: "test", Tip: map[string]float64{"": 0.5}, Shaft: map[string]float64{"": 0.6},
			Tension: map[string]float64{"": 0.4}, Permanent: 1, Variable: 1, Weight: 0.9, TanPhi: 1, Su: 1}}
	}
	a, err := NewAnalysis(prof, p, m, opt)
	if err != nil {
		rt.Skip(err)
	}
	return a, depth
}

// sameCapacity reports the first field in which got and want differ by
// more than 1e-12 relative: for the unit tip resistance, relative to
// itself; for a force, relative to the largest force of the row, since a
// difference of terms (Qp + Qs − W′) can be far smaller than the terms
// and carries their rounding (a floor of 1e-9 where all are near zero).
// Flags and mode must agree exactly.
func sameCapacity(got, want Capacity) string {
	scale := max(math.Abs(float64(want.Tip)), math.Abs(float64(want.Shaft)), math.Abs(float64(want.Weight)),
		math.Abs(float64(want.TensionShaft)), math.Abs(float64(want.DesignCompression)), math.Abs(float64(want.DesignTension)))
	if got.TipDepth != want.TipDepth || got.Flags != want.Flags || got.Plugged != want.Plugged {
		return fmt.Sprintf("tip depth, flags or mode: got %v %v %v, want %v %v %v", got.TipDepth, got.Flags, got.Plugged, want.TipDepth, want.Flags, want.Plugged)
	}
	for _, f := range []struct {
		name string
		g, w float64
	}{
		{"UnitTip", float64(got.UnitTip), float64(want.UnitTip)}, {"Tip", float64(got.Tip), float64(want.Tip)},
		{"Shaft", float64(got.Shaft), float64(want.Shaft)}, {"Weight", float64(got.Weight), float64(want.Weight)},
		{"Compression", float64(got.Compression), float64(want.Compression)},
		{"TensionShaft", float64(got.TensionShaft), float64(want.TensionShaft)}, {"Tension", float64(got.Tension), float64(want.Tension)},
		{"DesignCompression", float64(got.DesignCompression), float64(want.DesignCompression)},
		{"DesignTension", float64(got.DesignTension), float64(want.DesignTension)},
	} {
		sc := scale
		if f.name == "UnitTip" {
			sc = 0
		}
		if math.Abs(f.g-f.w) > 1e-12*max(math.Abs(f.g), math.Abs(f.w), sc)+1e-9 {
			return fmt.Sprintf("%s: got %.17g, want %.17g (relative %.3g)", f.name, f.g, f.w, math.Abs(f.g-f.w)/math.Abs(f.w))
		}
	}
	return ""
}

// TestPropWithDepthMatchesOracle: capacity with depth agrees at every depth
// with the implementation kept in oracle_test.go, to 1e-12 relative, and
// fails where it fails, with the same message.
func TestPropWithDepthMatchesOracle(t *testing.T) {
	rapid.Check(t, func(rt *rapid.T) {
		a, depth := drawAnalysis(rt)
		head := float64(a.pile.HeadDepth)
		step := rapid.SampledFrom([]float64{0.01, 0.1, 0.25, 0.3, 1, 2.5}).Draw(rt, "step")
		from := head + rapid.Float64Range(0.001, 1).Draw(rt, "from")*(depth-head)/2
		to := rapid.Float64Range(from, depth).Draw(rt, "to")
		want, werr := a.oracleWithDepth(units.Length(from), units.Length(to), units.Length(step), nil)
		got, gerr := a.WithDepth(DepthGrid{From: units.Length(from), To: units.Length(to), Step: units.Length(step)}, nil)
		if (werr == nil) != (gerr == nil) || (werr != nil && werr.Error() != gerr.Error()) {
			rt.Fatalf("error %v, oracle %v", gerr, werr)
		}
		if len(got) != len(want) {
			rt.Fatalf("%d rows, oracle %d", len(got), len(want))
		}
		for i := range got {
			if d := sameCapacity(got[i], want[i]); d != "" {
				rt.Fatalf("depth %g m (row %d): %s", float64(want[i].TipDepth), i, d)
			}
		}
	})
}

// TestWithDepthMatchesOracleBench: the benchmark's profile, both α
// methods, at every depth of the benchmark (and of a step ten times finer).
func TestWithDepthMatchesOracleBench(t *testing.T) {
	prof := benchProfileT(t)
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.6 * m}, Length: 60 * m, Installation: DrivenHigh}
	for _, al := range benchAlphas {
		a, err := NewAnalysis(prof, p, Methods{TipDrained: bearing.Vesic{}, ShaftUndrained: al.m, LayeredTip: true}, nil)
		if err != nil {
			t.Fatal(err)
		}
		for _, step := range []units.Length{0.1 * m, 0.01 * m} {
			want, err := a.oracleWithDepth(step, 60*m, step, nil)
			if err != nil {
				t.Fatal(err)
			}
			got, err := a.WithDepth(DepthGrid{From: step, To: 60 * m, Step: step}, nil)
			if err != nil {
				t.Fatal(err)
			}
			if len(got) != len(want) {
				t.Fatalf("%s: %d rows, oracle %d", al.name, len(got), len(want))
			}
			for i := range got {
				if d := sameCapacity(got[i], want[i]); d != "" {
					t.Fatalf("%s, step %v, depth %v: %s", al.name, step, want[i].TipDepth, d)
				}
			}
		}
	}
}

// BenchmarkCapacityWithDepthOracle times the implementation kept in
// oracle_test.go on BenchmarkCapacityWithDepth's cases, so that before and
// after can be measured side by side under the same load.
func BenchmarkCapacityWithDepthOracle(b *testing.B) {
	prof := benchProfileT(b)
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
					rows, err = a.oracleWithDepth(st.step, 60*m, st.step, rows[:0])
					if err != nil {
						b.Fatal(err)
					}
				}
			})
		}
	}
}
