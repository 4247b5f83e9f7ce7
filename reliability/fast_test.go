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

// The closed form agrees with the full computation (profile.New,
// pile.NewAnalysis, CapacityAt), the oracle here, to 1e-9 relative on
// random profiles, pile sections and sampled values, and refuses exactly
// the samples the full computation refuses.
func TestPropFastMatchesFull(t *testing.T) {
	rapid.Check(t, func(rt *rapid.T) {
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
				targets, base = append(targets, Target{i, KeyFrictionAngle}, Target{i, KeyNq}), append(base, float64(32*deg), 35)
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
			targets, base = append(targets, Target{i, KeyUnitWeight}, Target{i, KeySaturatedUnitWeight}), append(base, float64(ls.UnitWeight), float64(ls.SaturatedUnitWeight))
			spec.Layers, lms = append(spec.Layers, ls), append(lms, lm)
			z += h
		}
		spec.WaterDepth = units.Length(rapid.Float64Range(-3, 20).Draw(rt, "water"))
		targets = append(targets, Target{-1, KeyWaterDepth}, Target{-1, KeyTipFactor}, Target{-1, KeyShaftFactor})
		base = append(base, float64(spec.WaterDepth), 1, 1)
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
			rt.Fatal(err)
		}
		if !pm.Fast() {
			f, ok := pm.newFast()
			var got, want Outcome
			if ok {
				got, _ = f.capacity(base)
				want, _ = (&general{pm: pm, layers: make([]profile.LayerSpec, nl), lm: make([]pile.LayerMethods, nl)}).Capacity(base)
			}
			rt.Fatalf("eligible for the closed form, but it was not taken (eligible %v: %+v against %+v)", ok, got, want)
		}
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
