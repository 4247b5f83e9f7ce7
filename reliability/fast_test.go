// Source of the numbers in this file: random profiles, piles and values
// of our own (rapid); the oracles are the full computation (profile.New,
// pile.NewAnalysis) for the closed form, check for valid, and the closed
// form one sample at a time for a chunk. No published value is involved.

package reliability

import (
	"fmt"
	"math"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// drawFastCase draws a random profile, pile and methods the closed form
// takes, with targets on values of every layer and of the whole
// calculation (with some, only a random subset of them), and returns the
// model and the targets' base values.
func drawFastCase(rt *rapid.T, some bool) (*PileModel, []float64) {
	nl := rapid.IntRange(1, 4).Draw(rt, "layers")
	var spec profile.Spec
	var lms []pile.LayerMethods
	var targets []Target
	var base []float64
	z := 0.0
	// The bearing layer, 30 m thick, holds the tip 15 m into it: no
	// rule of the tip zone; layers below it are checked, not summed.
	tl := rapid.IntRange(0, nl-1).Draw(rt, "bearing layer")
	tip := 0.0
	spec.WaterDepth = units.Length(rapid.Float64Range(-3, 20).Draw(rt, "water"))
	for i := range nl {
		h := rapid.Float64Range(2, 15).Draw(rt, "thickness")
		if i == tl {
			h, tip = 30, z+15
		}
		drained := rapid.Bool().Draw(rt, "drained")
		ls := profile.LayerSpec{Thickness: units.Length(h), UnitWeight: units.UnitWeight(rapid.Float64Range(15e3, 19e3).Draw(rt, "gamma"))}
		ls.SaturatedUnitWeight = ls.UnitWeight + units.UnitWeight(rapid.Float64Range(0, 3e3).Draw(rt, "dgamma"))
		var lm pile.LayerMethods
		if drained {
			ls.Drainage, ls.Phi = profile.Drained, units.Angle(rapid.Float64Range(25, 40).Draw(rt, "phi"))*deg
			switch rapid.IntRange(0, 2).Draw(rt, "shaft") {
			case 0:
				lm.Shaft = shaft.BetaGiven{Beta: rapid.Float64Range(0.1, 1).Draw(rt, "beta")}
				targets, base = append(targets, Target{i, KeyBeta}), append(base, 0.4)
			case 1:
				lm.Shaft = shaft.Beta{K: shaft.KGiven{K: 1}, Delta: shaft.DeltaGiven{Delta: 25 * deg}}
				targets, base = append(targets, Target{i, KeyK}, Target{i, KeyDelta}), append(base, 1.1, float64(24*deg))
			default:
				lm.Shaft = shaft.Beta{K: shaft.KGiven{K: 1}, Delta: shaft.DeltaOverPhi{Ratio: 0.8}}
				targets, base = append(targets, Target{i, KeyDeltaOverPhi}), append(base, 0.75)
			}
			lm.Tip = bearing.GivenNq{Nq: 30, Nc: rapid.Float64Range(0, 10).Draw(rt, "nc")}
			ls.Cohesion = units.Stress(rapid.Float64Range(0, 5e3).Draw(rt, "c"))
			targets, base = append(targets, Target{i, KeyFrictionAngle}, Target{i, KeyNq}, Target{i, KeyNc}), append(base, float64(32*deg), 35, 5)
		} else {
			ls.Drainage = profile.Undrained
			if rapid.Bool().Draw(rt, "linear su") {
				ls.SuTop, ls.SuBottom = units.Stress(rapid.Float64Range(20e3, 60e3).Draw(rt, "su top")), units.Stress(rapid.Float64Range(20e3, 120e3).Draw(rt, "su bottom"))
			} else {
				ls.Su = units.Stress(rapid.Float64Range(20e3, 100e3).Draw(rt, "su"))
			}
			lm.Shaft = shaft.AlphaGiven{Alpha: 0.8}
			lm.Tip = bearing.GivenNc{Nc: 9}
			lm.NoShaft = rapid.IntRange(0, 5).Draw(rt, "no shaft") == 0
			targets, base = append(targets, Target{i, KeyAlpha}, Target{i, KeyUndrainedStrength}, Target{i, KeyNc}), append(base, 0.7, 50e3, 9)
		}
		if some {
			switch rapid.IntRange(0, 2).Draw(rt, "weights given") {
			case 0:
				ls.UnitWeight = 0 // γsat alone: γ is 0 below the water table, γsat above
			case 1:
				if z+h <= float64(spec.WaterDepth) {
					ls.SaturatedUnitWeight = 0 // γ alone: the layer lies above the water table
				}
			}
		}
		if ls.UnitWeight != 0 {
			targets, base = append(targets, Target{i, KeyUnitWeight}), append(base, float64(ls.UnitWeight))
		}
		if ls.SaturatedUnitWeight != 0 {
			targets, base = append(targets, Target{i, KeySaturatedUnitWeight}), append(base, float64(ls.SaturatedUnitWeight))
		}
		spec.Layers, lms = append(spec.Layers, ls), append(lms, lm)
		z += h
	}
	targets = append(targets, Target{-1, KeyWaterDepth}, Target{-1, KeyTipFactor}, Target{-1, KeyShaftFactor})
	base = append(base, float64(spec.WaterDepth), 1, 1)
	if some {
		var t2 []Target
		var b2 []float64
		for i, t := range targets {
			if rapid.Bool().Draw(rt, fmt.Sprintf("keep%d", i)) {
				t2, b2 = append(t2, t), append(b2, base[i])
			}
		}
		if len(t2) == 0 {
			t2, b2 = targets[len(targets)-3:len(targets)-2], base[len(base)-3:len(base)-2]
		}
		targets, base = t2, b2
	}
	d := rapid.Float64Range(0.3, 0.9).Draw(rt, "d")
	p := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: units.Length(d)}, Length: units.Length(tip), Installation: pile.DrivenHigh,
		UnitWeight: units.UnitWeight(rapid.SampledFrom([]float64{0, 24e3}).Draw(rt, "gp")),
		HeadDepth:  units.Length(rapid.Float64Range(0, 1).Draw(rt, "head"))}
	p.Length -= p.HeadDepth
	if rapid.Bool().Draw(rt, "pipe") {
		p.Section = pile.Section{Shape: pile.OpenPipe, Diameter: units.Length(d), Wall: units.Length(d / 40)}
		p.Plug = rapid.SampledFrom([]pile.Plug{pile.PlugLesser, pile.Unplugged}).Draw(rt, "plug")
	}
	meth := pile.Methods{LayeredTip: true, Layers: lms, SelfWeight: rapid.SampledFrom([]pile.SelfWeight{pile.WeightIgnored, pile.WeightNet, pile.WeightGross}).Draw(rt, "self weight")}
	pm, err := NewPileModel(spec, p, meth, targets)
	if err != nil {
		if some {
			rt.Skip(err) // the draw left no target profile.New accepts at the base values
		}
		rt.Fatal(err)
	}
	if !pm.Fast() {
		nl := len(spec.Layers)
		f, ok := pm.newFast()
		var got, want Outcome
		if ok {
			got, _ = f.capacity(base)
			want, _ = (&general{pm: pm, layers: make([]profile.LayerSpec, nl), lm: make([]pile.LayerMethods, nl)}).Capacity(base)
		}
		rt.Fatalf("eligible for the closed form, but it was not taken (eligible %v: %+v against %+v)", ok, got, want)
	}
	return pm, base
}

// The closed form agrees with the full computation (profile.New,
// pile.NewAnalysis, CapacityAt), the oracle here, to 1e-9 relative on
// random profiles, pile sections and sampled values, and refuses exactly
// the samples the full computation refuses.
func TestPropFastMatchesFull(t *testing.T) {
	rapid.Check(t, func(rt *rapid.T) {
		pm, base := drawFastCase(rt, rapid.Bool().Draw(rt, "some"))
		nl := len(pm.ground.Layers)
		g := &general{pm: pm, layers: make([]profile.LayerSpec, nl), lm: make([]pile.LayerMethods, nl)}
		x := make([]float64, len(base))
		for i := range x {
			// Near the base value, now and then far outside any range.
			x[i] = base[i] * rapid.Float64Range(0.7, 1.3).Draw(rt, fmt.Sprintf("x%d", i))
			if rapid.IntRange(0, 30).Draw(rt, fmt.Sprintf("wild%d", i)) == 0 {
				x[i] = rapid.Float64Range(-2*math.Abs(base[i])-1, 3*math.Abs(base[i])+1).Draw(rt, fmt.Sprintf("wild x%d", i))
			}
		}
		want, werr := g.Capacity(x)
		got, gerr := pm.fast.capacity(x)
		if (werr == nil) != (gerr == nil) {
			rt.Fatalf("full: %v; closed form: %v", werr, gerr)
		}
		if werr != nil {
			return
		}
		for _, c := range [][2]float64{{got.Compression, want.Compression}, {got.Tension, want.Tension}} {
			if math.Abs(c[0]-c[1]) > 1e-9*max(math.Abs(c[1]), 1) {
				rt.Fatalf("closed form %+v, full %+v", got, want)
			}
		}
	})
}

// The closed form's key codes follow LayerKeys and GlobalKeys.
func TestKeyCodes(t *testing.T) {
	want := map[int]string{cFrictionAngle: KeyFrictionAngle, cUndrainedStrength: KeyUndrainedStrength, cUnitWeight: KeyUnitWeight,
		cSaturatedUnitWeight: KeySaturatedUnitWeight, cK: KeyK, cKOverK0: KeyKOverK0, cKOverKp: KeyKOverKp, cDelta: KeyDelta,
		cDeltaOverPhi: KeyDeltaOverPhi, cBeta: KeyBeta, cAlpha: KeyAlpha, cNq: KeyNq, cNc: KeyNc, cWaterDepth: KeyWaterDepth,
		cTipFactor: KeyTipFactor, cShaftFactor: KeyShaftFactor}
	for c, k := range want {
		if got := keyCode(k); got != c {
			t.Errorf("keyCode(%q) = %d, want %d", k, got, c)
		}
	}
	if len(want) != len(LayerKeys)+len(GlobalKeys) {
		t.Errorf("%d codes for %d keys", len(want), len(LayerKeys)+len(GlobalKeys))
	}
}

// valid agrees with check on random layers, in and out of range.
func TestPropValidMatchesCheck(t *testing.T) {
	rapid.Check(t, func(rt *rapid.T) {
		f := &fastModel{gw: 9.81e3, dry: rapid.Bool().Draw(rt, "dry")}
		val := func(name string, lo, hi float64) float64 {
			if rapid.IntRange(0, 6).Draw(rt, name+" zero") == 0 {
				return 0
			}
			return rapid.Float64Range(lo, hi).Draw(rt, name)
		}
		L := &fastLayer{top: 2, bot: 8, drained: rapid.Bool().Draw(rt, "drained"),
			phi: val("phi", -0.1, 1), su0: val("su0", -1e3, 6e6), gamma: val("gamma", -1e3, 40e3), gsat: val("gsat", -1e3, 40e3),
			kind: rapid.IntRange(0, fNone).Draw(rt, "kind"), beta: val("beta", -0.5, 3.5), k: val("k", -1, 11),
			delta: val("delta", -0.1, 1.2), deltaRatio: rapid.Bool().Draw(rt, "ratio"), alpha: val("alpha", -0.2, 1.7)}
		L.su1 = L.su0
		if rapid.Bool().Draw(rt, "linear") {
			L.su1 = val("su1", -1e3, 6e6)
		}
		zw := rapid.Float64Range(-3, 12).Draw(rt, "zw")
		if v, err := f.valid(L, zw), f.check(0, L, zw); v != (err == nil) {
			rt.Fatalf("valid %v, check %v", v, err)
		}
	})
}

// A chunk of samples computed by fastChunk gives each sample the bits
// fastModel.capacity gives it (the oracle), on random profiles, piles,
// targets and sampled values, and is refused where any of its samples is.
func TestPropChunkMatchesScalar(t *testing.T) {
	rapid.Check(t, func(rt *rapid.T) {
		pm, base := drawFastCase(rt, rapid.Bool().Draw(rt, "some"))
		f, n := pm.fast, len(base)
		c := rapid.IntRange(1, chunk).Draw(rt, "samples")
		x := make([]float64, n*chunk)
		fc := f.newChunk(x)
		// Near the base value; in one sample in two chunks, one value far
		// outside, or on the edge of, any range.
		for s := range c {
			for j := range n {
				v := base[j] * rapid.Float64Range(0.7, 1.3).Draw(rt, "x")
				if rapid.IntRange(0, 20).Draw(rt, "base") == 0 {
					v = base[j] // a water table at its base depth exempts the layers without a target
				}
				x[j*chunk+s] = v
			}
		}
		if rapid.Bool().Draw(rt, "wild") {
			s, j := rapid.IntRange(0, c-1).Draw(rt, "wild sample"), rapid.IntRange(0, n-1).Draw(rt, "wild param")
			b := base[j]
			edges := []float64{0, -b, b * 1e3, b * 1e5, math.Inf(1), math.NaN(), f.gw, f.gw * (1 + 1e-15), 1e4, 10, 3, 1.5, 1, 5e6, 35e3, 50 * float64(deg)}
			for _, L := range f.lay {
				edges = append(edges, L.top, L.bot, L.gamma, L.gsat)
			}
			v := rapid.Float64Range(-2*math.Abs(b)-1, 3*math.Abs(b)+1).Draw(rt, "wild x")
			if rapid.Bool().Draw(rt, "edge") {
				v = rapid.SampledFrom(edges).Draw(rt, "edge x")
				v = rapid.SampledFrom([]float64{v, math.Nextafter(v, math.Inf(1)), math.Nextafter(v, math.Inf(-1))}).Draw(rt, "ulp")
			}
			x[j*chunk+s] = v
			if rapid.Bool().Draw(rt, "all") {
				for s := range c {
					x[j*chunk+s] = v // every sample, so that the chunk's range of water depths is the edge itself
				}
			}
		}
		// Now and then bounds on each parameter's values, loose ones: the
		// chunk reads the values themselves where the bounds fail a check.
		var lo, hi []float64
		if rapid.Bool().Draw(rt, "bounds") {
			lo, hi = make([]float64, n), make([]float64, n)
			for j := range n {
				a, b := span(x[j*chunk : j*chunk+c])
				slack := []float64{0, 1e-9 * max(math.Abs(a), math.Abs(b)), 0.1 * max(math.Abs(a), math.Abs(b)), math.Inf(1)}
				lo[j] = a - rapid.SampledFrom(slack).Draw(rt, "slack lo")
				hi[j] = b + rapid.SampledFrom(slack).Draw(rt, "slack hi")
			}
		}
		comp, tens := make([]float64, c), make([]float64, c)
		ok := fc.capacity(c, comp, tens, lo, hi)
		row := make([]float64, n)
		refused := -1
		for s := range c {
			for j := range row {
				row[j] = x[j*chunk+s]
			}
			o, err := f.capacity(row)
			if err == nil && (!finite(o.Compression) || !finite(o.Tension)) {
				err = fmt.Errorf("no finite capacity")
			}
			if err != nil {
				if refused < 0 {
					refused = s
				}
				continue
			}
			if ok && (math.Float64bits(o.Compression) != math.Float64bits(comp[s]) || math.Float64bits(o.Tension) != math.Float64bits(tens[s])) {
				rt.Fatalf("sample %d: chunk %v %v, scalar %+v", s, comp[s], tens[s], o)
			}
		}
		if ok && refused >= 0 {
			rt.Fatalf("the chunk was taken, but the scalar path refuses sample %d", refused)
		}
		if !ok && refused < 0 {
			rt.Fatalf("the chunk was refused, but the scalar path takes every sample")
		}
	})
}

// A layer that gives γsat alone weighs γsat above the water table in the
// closed form as in the full computation (profile.New's rule), whether
// γsat is sampled (the layer above the water table) or the water table is
// sampled below the layer's top. Invented scenario; the full computation
// is the oracle.
func TestGammaFromSaturated(t *testing.T) {
	spec := profile.Spec{WaterDepth: 8 * m, Layers: []profile.LayerSpec{
		{Thickness: 6 * m, Drainage: profile.Drained, Phi: 32 * deg, SaturatedUnitWeight: 20 * kNm},
		{Thickness: 30 * m, Drainage: profile.Drained, Phi: 34 * deg, SaturatedUnitWeight: 20 * kNm},
	}}
	lm := pile.LayerMethods{Shaft: shaft.BetaGiven{Beta: 0.3}, Tip: bearing.GivenNq{Nq: 40}}
	p := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: 0.6 * m}, Length: 21 * m, Installation: pile.DrivenHigh}
	targets := []Target{{0, KeySaturatedUnitWeight}, {1, KeySaturatedUnitWeight}, {-1, KeyWaterDepth}}
	pm, err := NewPileModel(spec, p, pile.Methods{Layers: []pile.LayerMethods{lm, lm}}, targets)
	if err != nil {
		t.Fatal(err)
	}
	if !pm.Fast() {
		t.Fatal("the closed form was not taken")
	}
	g := &general{pm: pm, layers: make([]profile.LayerSpec, 2), lm: make([]pile.LayerMethods, 2)}
	for _, x := range [][]float64{{22e3, 20e3, 8}, {20e3, 21e3, 12}, {19e3, 21e3, 3}} {
		want, werr := g.Capacity(x)
		got, gerr := pm.fast.capacity(x)
		if werr != nil || gerr != nil {
			t.Fatalf("%v: full %v, closed form %v", x, werr, gerr)
		}
		if math.Abs(got.Compression-want.Compression) > 1e-9*want.Compression || math.Abs(got.Tension-want.Tension) > 1e-9*want.Tension {
			t.Errorf("%v: closed form %+v, full %+v", x, got, want)
		}
	}
}
