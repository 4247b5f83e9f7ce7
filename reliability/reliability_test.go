package reliability

import (
	"errors"
	"math"
	"math/rand/v2"
	"reflect"
	"slices"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

const (
	m   = units.Metre
	kPa = units.Kilopascal
	kNm = units.KilonewtonPerCubicMetre
	deg = units.Degree
)

// clayCase is a scenario of our own: one undrained clay layer, 30 m, with
// α given (0.6) on the shaft and Nc given (9) at the tip of a 0.5 m
// circular pile 20 m long, weightless. The capacity is linear in su:
//
//	R = su·(α·L·P + Nc·A),  P = π·0.5 = 1.570796 m,  A = π·0.5²/4 = 0.1963495 m²
//	  = su·(0.6·20·1.570796 + 9·0.1963495) = su·(18.849556 + 1.767146) = su·20.616702 m²
//
// and the tension capacity T = su·α·L·P = su·18.849556 m² (undrained
// tension factor 1). With su normal, μ = 60 kPa, σ = 9 kPa:
//
//	μR = 60e3·20.616702 = 1 237 002 N,  σR = 9e3·20.616702 = 185 550 N
//	μT = 60e3·18.849556 = 1 130 973 N,  σT = 9e3·18.849556 = 169 646 N
//
// No rule of the tip zone applies: the tip is 20 m into the layer (the
// embedment ramp is for drained layers) and 10 m above its bottom (10 D =
// 5 m).
func clayCase(t testing.TB, sd float64) Problem {
	t.Helper()
	spec := profile.Spec{WaterDepth: 2 * m, Layers: []profile.LayerSpec{{Name: "clay", Thickness: 30 * m, Drainage: profile.Undrained,
		Su: 60 * kPa, UnitWeight: 18 * kNm, SaturatedUnitWeight: 19 * kNm}}}
	p := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: 0.5 * m}, Length: 20 * m, Installation: pile.DrivenHigh}
	meth := pile.Methods{LayeredTip: true, Layers: []pile.LayerMethods{{Shaft: shaft.AlphaGiven{Alpha: 0.6}, Tip: bearing.GivenNc{Nc: 9}}}}
	targets := []Target{{Layer: 0, Key: KeyUndrainedStrength}}
	pm, err := NewPileModel(spec, p, meth, targets)
	if err != nil {
		t.Fatal(err)
	}
	if !pm.Fast() {
		t.Fatal("the clay case should take the closed form")
	}
	return Problem{Params: []Param{{Name: "layers[0].undrained_strength", Dist: Distribution{Kind: Normal, Mean: 60e3, SD: sd}}}, Model: pm}
}

const kClay = 0.6*20*math.Pi*0.5 + 9*math.Pi*0.25/4 // m², see clayCase
const kClayT = 0.6 * 20 * math.Pi * 0.5

func TestClosedFormMonteCarlo(t *testing.T) {
	p := clayCase(t, 9e3)
	const n = 40000
	const load = 700e3
	r, err := MonteCarlo(p, Options{Samples: n, Seed: 7, Load: load, TensionLoad: 500e3})
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name   string
		s      Summary
		mu, sd float64
		load   float64
	}{
		{"compression", r.Compression, 60e3 * kClay, 9e3 * kClay, load},
		{"tension", r.Tension, 60e3 * kClayT, 9e3 * kClayT, 500e3},
	} {
		// Sampling errors of the mean and of the standard deviation of a
		// normal sample: σ/√n and σ/√(2(n − 1)); the bound is 4 of them.
		seM, seS := c.sd/math.Sqrt(n), c.sd/math.Sqrt(2*(n-1))
		if d := math.Abs(c.s.Mean - c.mu); d > 4*seM {
			t.Errorf("%s: mean %.1f N, exact %.1f N: off by %.2f standard errors", c.name, c.s.Mean, c.mu, d/seM)
		}
		if d := math.Abs(c.s.SD - c.sd); d > 4*seS {
			t.Errorf("%s: sd %.1f N, exact %.1f N: off by %.2f standard errors", c.name, c.s.SD, c.sd, d/seS)
		}
		// β = (μ − Q)/σ; to first order its sampling error is
		// √(1/n + β²/(2n)).
		beta := (c.mu - c.load) / c.sd
		seB := math.Sqrt(1/float64(n) + beta*beta/(2*float64(n)))
		if !c.s.BetaDefined || math.Abs(c.s.Beta-beta) > 4*seB {
			t.Errorf("%s: β %.4f, exact %.4f (± %.4f)", c.name, c.s.Beta, beta, 4*seB)
		}
		// The probability of falling below the load: Φ(−β) for a normal R.
		pf := phi(-beta)
		if se := math.Sqrt(pf * (1 - pf) / n); math.Abs(c.s.PBelow-pf) > 4*se+1/float64(n) {
			t.Errorf("%s: P(R < Q) %.5f, exact %.5f", c.name, c.s.PBelow, pf)
		}
		// Percentiles of a normal: μ + z·σ, z(0.05) = −1.644854 (standard
		// normal table); sampling error of a quantile √(p(1−p)/n)/f(x).
		for _, q := range []struct{ p, z, got float64 }{{0.05, -1.6448536, c.s.P5}, {0.5, 0, c.s.P50}, {0.95, 1.6448536, c.s.P95}} {
			want := c.mu + q.z*c.sd
			dens := math.Exp(-q.z*q.z/2) / math.Sqrt(2*math.Pi) / c.sd
			se := math.Sqrt(q.p*(1-q.p)/n) / dens
			if math.Abs(q.got-want) > 4*se {
				t.Errorf("%s: P%g %.1f N, exact %.1f N (± %.1f)", c.name, 100*q.p, q.got, want, 4*se)
			}
		}
	}
}

func TestClosedFormFOSM(t *testing.T) {
	p := clayCase(t, 9e3)
	r, err := FOSM(p, Options{Load: 700e3})
	if err != nil {
		t.Fatal(err)
	}
	mu, sd := 60e3*kClay, 9e3*kClay
	rel := func(a, b float64) float64 { return math.Abs(a-b) / math.Abs(b) }
	if rel(r.Compression.Mean, mu) > 1e-9 || rel(r.Compression.SD, sd) > 1e-9 {
		t.Errorf("FOSM mean %.6f, sd %.6f; exact %.6f, %.6f", r.Compression.Mean, r.Compression.SD, mu, sd)
	}
	if beta := (mu - 700e3) / sd; rel(r.Compression.Beta, beta) > 1e-9 {
		t.Errorf("FOSM β %.12f, exact %.12f", r.Compression.Beta, beta)
	}
	if rel(r.Tension.SD, 9e3*kClayT) > 1e-9 {
		t.Errorf("FOSM tension sd %.6f, exact %.6f", r.Tension.SD, 9e3*kClayT)
	}
	if len(r.Compression.Ranking) != 1 || r.Compression.Ranking[0].Share != 1 {
		t.Errorf("ranking %+v: want one parameter with the whole variance", r.Compression.Ranking)
	}
}

// linear is a model of our own, R = Σ a_i·x_i, T = R/2, for checks of the
// sampling machinery against exact moments.
type linear []float64

func (l linear) NewEvaluator() (Evaluator, error) { return l, nil }
func (l linear) Capacity(x []float64) (Outcome, error) {
	var r float64
	for i, a := range l {
		r += a * x[i]
	}
	return Outcome{Compression: r, Tension: r / 2}, nil
}

// Two correlated normals: σR² = a1²σ1² + a2²σ2² + 2·a1·a2·ρ·σ1·σ2.
func TestCorrelatedLinear(t *testing.T) {
	a := linear{2, -3}
	p := Problem{Params: []Param{{"x1", Distribution{Kind: Normal, Mean: 10, SD: 2}}, {"x2", Distribution{Kind: Normal, Mean: 5, SD: 1}}},
		Correlation: [][]float64{{1, 0.6}, {0.6, 1}}, Model: a}
	// σR² = 4·4 + 9·1 + 2·2·(−3)·0.6·2·1 = 16 + 9 − 14.4 = 10.6; μR = 20 − 15 = 5.
	mu, sd := 5.0, math.Sqrt(10.6)
	const n = 50000
	r, err := MonteCarlo(p, Options{Samples: n, Seed: 3, Load: 1})
	if err != nil {
		t.Fatal(err)
	}
	if d := math.Abs(r.Compression.Mean - mu); d > 4*sd/math.Sqrt(n) {
		t.Errorf("mean %g, exact %g", r.Compression.Mean, mu)
	}
	if d := math.Abs(r.Compression.SD - sd); d > 4*sd/math.Sqrt(2*(n-1)) {
		t.Errorf("sd %g, exact %g", r.Compression.SD, sd)
	}
	f, err := FOSM(p, Options{Load: 1})
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(f.Compression.SD-sd) > 1e-9*sd || math.Abs(f.Compression.Mean-mu) > 1e-12 {
		t.Errorf("FOSM %g ± %g, exact %g ± %g", f.Compression.Mean, f.Compression.SD, mu, sd)
	}
	// Shares: x1: 2·2·(2·2 + 0.6·(−3)·1)/10.6 = 4·2.2/10.6; x2: −3·(0.6·4 − 3)/10.6 = 1.8/10.6.
	var s1, s2 float64
	for _, s := range f.Compression.Ranking {
		switch s.Param {
		case "x1":
			s1 = s.Share
		case "x2":
			s2 = s.Share
		}
	}
	if math.Abs(s1-8.8/10.6) > 1e-9 || math.Abs(s2-1.8/10.6) > 1e-9 {
		t.Errorf("shares %g, %g; want %g, %g", s1, s2, 8.8/10.6, 1.8/10.6)
	}
	if f.Compression.Ranking[0].Param != "x1" {
		t.Errorf("ranking %+v: x1 (|PerSD| 4) before x2 (3)", f.Compression.Ranking)
	}
}

// The sampled moments of each kind match its exact moments.
func TestMarginalMoments(t *testing.T) {
	cases := []struct {
		d        Distribution
		mean, sd float64
	}{
		{Distribution{Kind: Normal, Mean: 30, SD: 3}, 30, 3},
		{Distribution{Kind: LogNormal, Mean: 50, SD: 15}, 50, 15},
		// Uniform on [a, b]: mean (a + b)/2, sd (b − a)/√12.
		{Distribution{Kind: Uniform, Lower: 1, Upper: 4}, 2.5, 3 / math.Sqrt(12)},
		// Truncated at ±1σ about the mean: mean μ, variance σ²·(1 −
		// 2φ(1)/(Φ(1) − Φ(−1))) = σ²·(1 − 2·0.2419707/0.6826895) = 0.291121·σ² (φ(1), Φ(1) − Φ(−1) from a normal table).
		{Distribution{Kind: TruncatedNormal, Mean: 10, SD: 2, Lower: 8, Upper: 12}, 10, 2 * math.Sqrt(0.291121)},
	}
	const n = 40000
	for _, c := range cases {
		gm, gs := c.d.Moments()
		if math.Abs(gm-c.mean) > 1e-5*c.sd || math.Abs(gs-c.sd) > 1e-5*c.sd {
			t.Errorf("%v: Moments %g, %g; want %g, %g", c.d.Kind, gm, gs, c.mean, c.sd)
		}
		r, err := MonteCarlo(Problem{Params: []Param{{"x", c.d}}, Model: linear{1}}, Options{Samples: n, Seed: 11})
		if err != nil {
			t.Fatal(err)
		}
		if d := math.Abs(r.Compression.Mean - c.mean); d > 4*c.sd/math.Sqrt(n) {
			t.Errorf("%v: sampled mean %g, exact %g", c.d.Kind, r.Compression.Mean, c.mean)
		}
		if c.d.Kind != LogNormal { // the sd's sampling error is wider for a skewed variable
			if d := math.Abs(r.Compression.SD - c.sd); d > 4*c.sd/math.Sqrt(2*n) {
				t.Errorf("%v: sampled sd %g, exact %g", c.d.Kind, r.Compression.SD, c.sd)
			}
		}
		if c.d.Kind == TruncatedNormal || c.d.Kind == Uniform {
			if r.Compression.Min < c.d.Lower || r.Compression.Max > c.d.Upper {
				t.Errorf("%v: samples from %g to %g outside the bounds", c.d.Kind, r.Compression.Min, r.Compression.Max)
			}
		}
	}
}

// With zero variance every percentile is the deterministic capacity, for
// the closed form and for the full computation.
func TestZeroVariance(t *testing.T) {
	// The closed form: the clay case with σ = 0.
	p := clayCase(t, 0)
	want := 60e3 * kClay
	check := func(name string, s Summary, want float64) {
		t.Helper()
		for _, v := range []float64{s.P5, s.P50, s.P95, s.Min, s.Max, s.Mean} {
			if math.Abs(v-want) > 1e-9*want {
				t.Errorf("%s: %v, want every value %v", name, s, want)
				return
			}
		}
		if s.SD != 0 || s.BetaDefined {
			t.Errorf("%s: sd %v, β defined %v; want 0, false", name, s.SD, s.BetaDefined)
		}
	}
	r, err := MonteCarlo(p, Options{Samples: 5000, Seed: 1, Load: 1e5})
	if err != nil {
		t.Fatal(err)
	}
	check("closed form", r.Compression, want)
	// The full computation, with the default methods (Meyerhof's tip in
	// sand, β by Kulhawy's K and δ, the API α): every percentile is the
	// capacity pile.NewAnalysis gives.
	spec := twoLayers()
	pl := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: 0.6 * m}, Length: 18 * m, Installation: pile.DrivenHigh}
	meth := pile.DefaultMethods()
	prof, err := profile.New(spec)
	if err != nil {
		t.Fatal(err)
	}
	a, err := pile.NewAnalysis(prof, pl, meth, nil)
	if err != nil {
		t.Fatal(err)
	}
	c, err := a.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	targets := []Target{{0, KeyUndrainedStrength}, {1, KeyFrictionAngle}, {1, KeySaturatedUnitWeight}, {-1, KeyWaterDepth}}
	base := []float64{40e3, float64(34 * deg), 20e3, 2}
	pm, err := NewPileModel(spec, pl, meth, targets)
	if err != nil {
		t.Fatal(err)
	}
	if pm.Fast() {
		t.Fatal("default methods must take the full computation")
	}
	var ps []Param
	for i, b := range base {
		ps = append(ps, Param{Name: targets[i].Key, Dist: Distribution{Kind: Normal, Mean: b}})
	}
	r, err = MonteCarlo(Problem{Params: ps, Model: pm}, Options{Samples: 50, Seed: 1})
	if err != nil {
		t.Fatal(err)
	}
	check("full", r.Compression, float64(c.Compression))
	check("full tension", r.Tension, float64(c.Tension))
}

// twoLayers is a scenario of our own: soft clay over dense sand.
func twoLayers() profile.Spec {
	return profile.Spec{WaterDepth: 2 * m, Layers: []profile.LayerSpec{
		{Name: "clay", Thickness: 8 * m, Drainage: profile.Undrained, Su: 40 * kPa, UnitWeight: 17 * kNm, SaturatedUnitWeight: 18 * kNm},
		{Name: "sand", Thickness: 30 * m, Drainage: profile.Drained, Phi: 34 * deg, UnitWeight: 18 * kNm, SaturatedUnitWeight: 20 * kNm},
	}}
}

// The same seed gives the same result, bit for bit, with 1, 2 and 8
// workers (the sample count is not a multiple of the block size).
func TestWorkersDeterministic(t *testing.T) {
	p := clayCase(t, 9e3)
	var first *MCResult
	for _, w := range []int{1, 2, 8} {
		r, err := MonteCarlo(p, Options{Samples: 3*BlockSize + 17, Seed: 42, Workers: w, Load: 8e5})
		if err != nil {
			t.Fatal(err)
		}
		r.Workers = 0
		if first == nil {
			first = r
			continue
		}
		if !reflect.DeepEqual(first, r) {
			t.Errorf("%d workers: the result differs from 1 worker", w)
		}
	}
	// Another seed gives another result.
	r, _ := MonteCarlo(p, Options{Samples: 3*BlockSize + 17, Seed: 43, Load: 8e5})
	if r.Compression.Mean == first.Compression.Mean {
		t.Error("seeds 42 and 43 give the same mean")
	}
}

func TestBadInput(t *testing.T) {
	lin := linear{1, 1}
	norm := func(mu, sd float64) Distribution { return Distribution{Kind: Normal, Mean: mu, SD: sd} }
	cases := []struct {
		name string
		p    Problem
		opt  Options
		path string
	}{
		{"negative sd", Problem{Params: []Param{{"a", norm(1, -1)}, {"b", norm(1, 0)}}, Model: lin}, Options{}, "a.sd"},
		{"NaN sd", Problem{Params: []Param{{"a", norm(1, math.NaN())}, {"b", norm(1, 0)}}, Model: lin}, Options{}, "a.sd"},
		{"cov above 1", Problem{Params: []Param{{"a", norm(1, 1.5)}, {"b", norm(1, 0)}}, Model: lin}, Options{}, "a.sd"},
		{"lognormal mean 0", Problem{Params: []Param{{"a", Distribution{Kind: LogNormal}}, {"b", norm(1, 0)}}, Model: lin}, Options{}, "a.mean"},
		{"bounds upside down", Problem{Params: []Param{{"a", Distribution{Kind: TruncatedNormal, Mean: 1, SD: 0.1, Lower: 2, Upper: 1}}, {"b", norm(1, 0)}}, Model: lin}, Options{}, "a.lower"},
		{"bounds far in the tail", Problem{Params: []Param{{"a", Distribution{Kind: TruncatedNormal, Mean: 1, SD: 0.1, Lower: 5, Upper: 6}}, {"b", norm(1, 0)}}, Model: lin}, Options{}, "a.lower"},
		{"uniform without bounds", Problem{Params: []Param{{"a", Distribution{Kind: Uniform}}, {"b", norm(1, 0)}}, Model: lin}, Options{}, "a.lower"},
		{"unknown kind", Problem{Params: []Param{{"a", Distribution{Kind: 9}}, {"b", norm(1, 0)}}, Model: lin}, Options{}, "a.distribution"},
		{"not positive definite", Problem{Params: []Param{{"a", norm(1, 0.1)}, {"b", norm(1, 0.1)}}, Correlation: [][]float64{{1, 1}, {1, 1}}, Model: lin}, Options{}, "correlation"},
		{"three pairs that cannot hold", Problem{Params: []Param{{"a", norm(1, 0.1)}, {"b", norm(1, 0.1)}, {"c", norm(1, 0.1)}},
			Correlation: [][]float64{{1, 0.9, -0.9}, {0.9, 1, 0.9}, {-0.9, 0.9, 1}}, Model: linear{1, 1, 1}}, Options{}, "correlation"},
		{"rho above 1", Problem{Params: []Param{{"a", norm(1, 0.1)}, {"b", norm(1, 0.1)}}, Correlation: [][]float64{{1, 1.2}, {1.2, 1}}, Model: lin}, Options{}, "correlation[0][1]"},
		{"asymmetric", Problem{Params: []Param{{"a", norm(1, 0.1)}, {"b", norm(1, 0.1)}}, Correlation: [][]float64{{1, 0.2}, {0.3, 1}}, Model: lin}, Options{}, "correlation[0][1]"},
		{"samples", Problem{Params: []Param{{"a", norm(1, 0.1)}}, Model: linear{1}}, Options{Samples: -1}, "samples"},
		{"workers", Problem{Params: []Param{{"a", norm(1, 0.1)}}, Model: linear{1}}, Options{Workers: -2}, "workers"},
		{"load", Problem{Params: []Param{{"a", norm(1, 0.1)}}, Model: linear{1}}, Options{Load: math.Inf(1)}, "load"},
	}
	for _, c := range cases {
		_, err := MonteCarlo(c.p, c.opt)
		var fe *FieldError
		if !errors.As(err, &fe) {
			t.Errorf("%s: error %v, want a FieldError", c.name, err)
			continue
		}
		got := fe.Path
		if fe.Field != "" {
			got += "." + fe.Field
		}
		if got != c.path {
			t.Errorf("%s: error at %q (%v), want %q", c.name, got, err, c.path)
		}
	}
}

// A φ′ sample outside the range of profile.New stops the run, naming the
// sample, for the closed form and the full computation alike.
func TestSampleOutsideRange(t *testing.T) {
	spec := twoLayers()
	pl := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: 0.6 * m}, Length: 18 * m, Installation: pile.DrivenHigh}
	for _, meth := range []pile.Methods{pile.DefaultMethods(), fastMethods()} {
		pm, err := NewPileModel(spec, pl, meth, []Target{{1, KeyFrictionAngle}})
		if err != nil {
			t.Fatal(err)
		}
		// A normal φ′ of mean 45° and σ 4°: above 50° in 11 % of samples.
		p := Problem{Params: []Param{{"layers[1].friction_angle", Distribution{Kind: Normal, Mean: float64(45 * deg), SD: float64(4 * deg)}}}, Model: pm}
		_, err = MonteCarlo(p, Options{Samples: 2000, Seed: 5})
		var se *SampleError
		if !errors.As(err, &se) {
			t.Fatalf("fast %v: error %v, want a SampleError", pm.Fast(), err)
		}
		// The same sample is named whatever the number of workers.
		_, err1 := MonteCarlo(p, Options{Samples: 2000, Seed: 5, Workers: 1})
		if err1 == nil || err1.Error() != err.Error() {
			t.Errorf("fast %v: 1 worker: %v; all: %v", pm.Fast(), err1, err)
		}
	}
}

// fastMethods: β with K and δ given in the sand, α given in the clay,
// Nq given at the tip in the sand.
func fastMethods() pile.Methods {
	return pile.Methods{LayeredTip: true, Layers: []pile.LayerMethods{
		{Shaft: shaft.AlphaGiven{Alpha: 0.7}, Tip: bearing.GivenNc{Nc: 9}},
		{Shaft: shaft.Beta{K: shaft.KGiven{K: 1.2}, Delta: shaft.DeltaOverPhi{Ratio: 0.8}}, Tip: bearing.GivenNq{Nq: 40}},
	}}
}

// sortFloats sorts as slices.Sort does (an oracle kept here), on random
// values of both signs with repeats, infinities excepted.
func TestSortFloats(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 2))
	for _, n := range []int{0, 1, 5, 4095, 4096, 10000, 100003} {
		a := make([]float64, n)
		for i := range a {
			switch rng.IntN(4) {
			case 0:
				a[i] = float64(rng.IntN(7) - 3)
			case 1:
				a[i] = rng.NormFloat64() * 1e6
			case 2:
				a[i] = -rng.ExpFloat64() * 1e-300
			default:
				a[i] = rng.NormFloat64()
			}
		}
		b := slices.Clone(a)
		sortFloats(a)
		slices.Sort(b)
		for i := range a {
			if a[i] != b[i] && !(a[i] == 0 && b[i] == 0) {
				t.Fatalf("n %d: element %d is %g, want %g", n, i, a[i], b[i])
			}
		}
	}
}
