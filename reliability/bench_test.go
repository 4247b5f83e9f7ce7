package reliability

// The profile, pile and distributions here are a scenario of our own for
// timing; nothing is checked against a published source.

import (
	"fmt"
	"math/rand/v2"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// benchProblem is a 10-layer profile (sand and clay in turn, 6 m each,
// the last sand 20 m; water at 1.5 m) with β by K and δ given in the sands,
// α given in the clays and Nq given at the tip, a 0.6 m pile with its tip
// at 64 m; 31 uncertain parameters: per sand K (lognormal), δ (truncated
// normal), per clay su (lognormal), α (uniform), for each layer γsat
// (truncated normal, not below γ) and the water depth (uniform).
func benchProblem(tb testing.TB) Problem {
	var spec profile.Spec
	var lms []pile.LayerMethods
	var ps []Param
	var targets []Target
	var base []float64
	add := func(layer int, key string, d Distribution) {
		targets = append(targets, Target{layer, key})
		ps = append(ps, Param{Name: fmt.Sprintf("layers[%d].%s", layer, key), Dist: d})
		base = append(base, d.Mean)
	}
	for i := range 10 {
		h := 6 * m
		if i == 9 {
			h = 20 * m
		}
		if i%2 == 0 {
			spec.Layers = append(spec.Layers, profile.LayerSpec{Thickness: h, Drainage: profile.Drained, Phi: units.Angle(30+i) * deg,
				UnitWeight: 18 * kNm, SaturatedUnitWeight: 20 * kNm})
			lms = append(lms, pile.LayerMethods{Shaft: shaft.Beta{K: shaft.KGiven{K: 1}, Delta: shaft.DeltaGiven{Delta: 25 * deg}}, Tip: bearing.GivenNq{Nq: 40}})
			add(i, KeyK, Distribution{Kind: LogNormal, Mean: 1, SD: 0.2})
			add(i, KeyDelta, Distribution{Kind: TruncatedNormal, Mean: float64(25 * deg), SD: float64(2 * deg), Lower: float64(18 * deg), Upper: float64(32 * deg)})
		} else {
			spec.Layers = append(spec.Layers, profile.LayerSpec{Thickness: h, Drainage: profile.Undrained, Su: units.Stress(30+10*i) * kPa,
				UnitWeight: 17 * kNm, SaturatedUnitWeight: 18 * kNm})
			lms = append(lms, pile.LayerMethods{Shaft: shaft.AlphaGiven{Alpha: 0.7}, Tip: bearing.GivenNc{Nc: 9}})
			add(i, KeyUndrainedStrength, Distribution{Kind: LogNormal, Mean: float64(30+10*i) * 1e3, SD: float64(30+10*i) * 300})
			add(i, KeyAlpha, Distribution{Kind: Uniform, Lower: 0.55, Upper: 0.85})
		}
		g := float64(spec.Layers[i].SaturatedUnitWeight)
		add(i, KeySaturatedUnitWeight, Distribution{Kind: TruncatedNormal, Mean: g, SD: 500, Lower: float64(spec.Layers[i].UnitWeight), Upper: g + 2000})
	}
	spec.WaterDepth = 1.5 * m
	add(-1, KeyWaterDepth, Distribution{Kind: Uniform, Lower: 0.5, Upper: 2.5})
	for k, t := range targets {
		if t.Key == KeyAlpha || t.Key == KeyWaterDepth {
			base[k] = (ps[k].Dist.Lower + ps[k].Dist.Upper) / 2
		}
	}
	p := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: 0.6 * m}, Length: 64 * m, Installation: pile.DrivenHigh}
	pm, err := NewPileModel(spec, p, pile.Methods{LayeredTip: true, Layers: lms}, targets)
	if err != nil {
		tb.Fatal(err)
	}
	if !pm.Fast() {
		tb.Fatal("the bench problem should take the closed form")
	}
	return Problem{Params: ps, Model: pm}
}

// BenchmarkMonteCarlo: 1,000,000 samples of the 10-layer problem on all
// cores; under 1 s on 2 cores is the aim.
func BenchmarkMonteCarlo(b *testing.B) {
	p := benchProblem(b)
	const n = 1_000_000
	b.ReportAllocs()
	for b.Loop() {
		if _, err := MonteCarlo(p, Options{Samples: n, Seed: 1, Load: 5e6}); err != nil {
			b.Fatal(err)
		}
	}
	b.ReportMetric(float64(n)*float64(b.N)/b.Elapsed().Seconds(), "samples/s")
}

// BenchmarkSample: one sample of the same problem (draw, transform,
// capacity), allocation-free.
func BenchmarkSample(b *testing.B) {
	p := benchProblem(b)
	pp, err := p.prepare()
	if err != nil {
		b.Fatal(err)
	}
	ev, _ := p.Model.NewEvaluator()
	u, x := make([]float64, pp.n), make([]float64, pp.n)
	for i := range u {
		u[i] = 0.3
	}
	b.ReportAllocs()
	for b.Loop() {
		pp.transform(u, x)
		if _, err := ev.Capacity(x); err != nil {
			b.Fatal(err)
		}
	}
}

// TestSampleAllocatesNothing guards the hot loop.
func TestSampleAllocatesNothing(t *testing.T) {
	p := benchProblem(t)
	pp, err := p.prepare()
	if err != nil {
		t.Fatal(err)
	}
	ev, _ := p.Model.NewEvaluator()
	u, x := make([]float64, pp.n), make([]float64, pp.n)
	if n := testing.AllocsPerRun(100, func() { pp.transform(u, x); _, _ = ev.Capacity(x) }); n != 0 {
		t.Errorf("a sample allocates %v times", n)
	}
}

// benchCompareProblem is the Monte Carlo of scripts/compare (the scenario
// of compare-python.sh): the profile of benchProblem without the tip-zone
// rules, K normal (CoV 0.15) in the sands, su lognormal (CoV 0.3) in the
// clays, γsat normal (σ 0.5 kN/m³) below the first layer and the water
// depth uniform on 0.5 to 2.5 m: 20 parameters.
func benchCompareProblem(tb testing.TB) Problem {
	spec := profile.Spec{WaterDepth: 1.5 * m}
	var lms []pile.LayerMethods
	var ps []Param
	var targets []Target
	for i := range 10 {
		h := 6 * m
		if i == 9 {
			h = 20 * m
		}
		ls := profile.LayerSpec{Thickness: h, SaturatedUnitWeight: 20 * kNm}
		var lm pile.LayerMethods
		if i%2 == 0 {
			k := 0.8 + 0.05*float64(i)
			ls.Drainage, ls.Phi = profile.Drained, 34*deg
			lm = pile.LayerMethods{Shaft: shaft.Beta{K: shaft.KGiven{K: k}, Delta: shaft.DeltaGiven{Delta: units.Angle(24+i) * deg}}, Tip: bearing.GivenNq{Nq: 30 + 2*float64(i)}}
			targets = append(targets, Target{i, KeyK})
			ps = append(ps, Param{Name: fmt.Sprintf("k%d", i), Dist: Distribution{Kind: Normal, Mean: k, SD: 0.15 * k}})
		} else {
			su := float64(30+10*i) * 1e3
			ls.SaturatedUnitWeight = 18 * kNm
			ls.Drainage, ls.Su = profile.Undrained, units.Stress(su)
			lm = pile.LayerMethods{Shaft: shaft.AlphaGiven{Alpha: 0.7}, Tip: bearing.GivenNc{Nc: 9}}
			targets = append(targets, Target{i, KeyUndrainedStrength})
			ps = append(ps, Param{Name: fmt.Sprintf("su%d", i), Dist: Distribution{Kind: LogNormal, Mean: su, SD: 0.3 * su}})
		}
		if i == 0 {
			ls.UnitWeight = 18 * kNm
		} else {
			targets = append(targets, Target{i, KeySaturatedUnitWeight})
			ps = append(ps, Param{Name: fmt.Sprintf("gsat%d", i), Dist: Distribution{Kind: Normal, Mean: float64(ls.SaturatedUnitWeight), SD: 500}})
		}
		spec.Layers, lms = append(spec.Layers, ls), append(lms, lm)
	}
	targets = append(targets, Target{-1, KeyWaterDepth})
	ps = append(ps, Param{Name: "water", Dist: Distribution{Kind: Uniform, Lower: 0.5, Upper: 2.5}})
	p := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: 0.6 * m}, Length: 64 * m, Installation: pile.DrivenHigh}
	pm, err := NewPileModel(spec, p, pile.Methods{Layers: lms, NoWeakLayer: true, NoEmbedment: true}, targets)
	if err != nil {
		tb.Fatal(err)
	}
	if !pm.Fast() {
		tb.Fatal("the compare problem should take the closed form")
	}
	return Problem{Params: ps, Model: pm}
}

// BenchmarkMonteCarloCompare: 1,000,000 samples of the problem of
// scripts/compare on all cores.
func BenchmarkMonteCarloCompare(b *testing.B) {
	p := benchCompareProblem(b)
	const n = 1_000_000
	b.ReportAllocs()
	for b.Loop() {
		if _, err := MonteCarlo(p, Options{Samples: n, Seed: 1}); err != nil {
			b.Fatal(err)
		}
	}
	b.ReportMetric(float64(n)*float64(b.N)/b.Elapsed().Seconds(), "samples/s")
}

// TestChunkAllocatesNothing guards the chunked hot loop: drawing a chunk,
// mapping it and computing it in closed form allocate nothing.
func TestChunkAllocatesNothing(t *testing.T) {
	for _, p := range []Problem{benchProblem(t), benchCompareProblem(t)} {
		pp, err := p.prepare()
		if err != nil {
			t.Fatal(err)
		}
		ev, _ := p.Model.NewEvaluator()
		u, x := make([]float64, pp.n*chunk), make([]float64, pp.n*chunk)
		lo, hi := make([]float64, pp.n), make([]float64, pp.n)
		comp, tens := make([]float64, chunk), make([]float64, chunk)
		fc := ev.(*fastModel).newChunk(x)
		rng := rand.New(rand.NewPCG(1, 2))
		if n := testing.AllocsPerRun(20, func() {
			pp.draw(rng, u)
			pp.transformChunk(u, x, chunk, lo, hi)
			if !fc.capacity(chunk, comp, tens, lo, hi) {
				t.Fatal("the chunk was refused")
			}
		}); n != 0 {
			t.Errorf("a chunk allocates %v times", n)
		}
	}
}
