package pile

import (
	"fmt"
	"reflect"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// TestPropCapacityWithTipsMatchesNewAnalysis: CapacityWithTips gives, for
// every set of tip methods, exactly what the general path gives (an
// analysis built whole by NewAnalysis with those tip methods, then
// Capacity): every field to the bit, and the same error. The expected
// values come from that general path, not from a published source; the
// scenarios are drawAnalysis's (our own).
func TestPropCapacityWithTipsMatchesNewAnalysis(t *testing.T) {
	var drained, undrained []bearing.Tip
	for _, d := range bearing.Methods() {
		req := false
		for _, p := range d.Params {
			req = req || p.Required
		}
		if req {
			continue
		}
		m, err := d.New(nil)
		if err != nil {
			t.Fatal(err)
		}
		if d.Drainage == bearing.DrainedLayers {
			drained = append(drained, m)
		} else {
			undrained = append(undrained, m)
		}
	}
	rapid.Check(t, func(rt *rapid.T) {
		a, _ := drawAnalysis(rt)
		nsets := rapid.IntRange(1, 4).Draw(rt, "sets")
		sets := make([][]bearing.Tip, nsets)
		for j := range sets {
			n := rapid.IntRange(0, a.prof.NumLayers()).Draw(rt, fmt.Sprintf("set %d length", j))
			for i := range n {
				var m bearing.Tip
				pool := undrained
				if a.prof.Layer(i).Drainage == profile.Drained {
					pool = drained
				}
				if k := rapid.IntRange(-1, len(pool)-1).Draw(rt, fmt.Sprintf("set %d layer %d", j, i)); k >= 0 {
					m = pool[k]
				}
				sets[j] = append(sets[j], m)
			}
		}
		got, gerrs := a.CapacityWithTips(sets)
		for j, set := range sets {
			m := a.methods
			m.Layers = make([]LayerMethods, max(len(a.methods.Layers), len(set)))
			copy(m.Layers, a.methods.Layers)
			for i, tp := range set {
				if tp != nil {
					m.Layers[i].Tip = tp
				}
			}
			var opt *Options
			if a.useCase {
				cs := a.cs
				opt = &Options{Case: &cs}
			}
			var want Capacity
			b, werr := NewAnalysis(a.prof, a.pile, m, opt)
			if werr == nil {
				want, werr = b.Capacity()
			}
			if (werr == nil) != (gerrs[j] == nil) || (werr != nil && werr.Error() != gerrs[j].Error()) {
				rt.Fatalf("set %d: error %v, whole analysis %v", j, gerrs[j], werr)
			}
			if got[j] != want {
				rt.Fatalf("set %d: got %+v, whole analysis %+v", j, got[j], want)
			}
		}
	})
}

// TestPropBreakdownSharingMatchesBreakdown: the breakdown of an analysis
// that takes the segments it shares from another analysis' shaft pass is
// exactly its own breakdown (every row, the tip block, the sources and
// warnings), for analyses that differ in the shaft methods of some
// layers. The expected values come from Breakdown itself, not from a
// published source; the scenarios are drawAnalysis's (our own). (It
// leaves out the sources and warnings, which Breakdown's own tests check.)
func TestPropBreakdownSharingMatchesBreakdown(t *testing.T) {
	drained := []func() LayerMethods{
		func() LayerMethods { return LayerMethods{Shaft: shaft.BetaGiven{Beta: 0.4}} },
		func() LayerMethods { return LayerMethods{Shaft: shaft.Burland{}} },
		func() LayerMethods { return LayerMethods{Shaft: shaft.DrilledSandK0{}} },
		func() LayerMethods { return LayerMethods{NoShaft: true} },
	}
	undrained := []func() LayerMethods{
		func() LayerMethods { return LayerMethods{Shaft: shaft.AlphaGiven{Alpha: 0.5}} },
		func() LayerMethods { return LayerMethods{Shaft: shaft.AlphaAPI{}} },
		func() LayerMethods { return LayerMethods{Shaft: shaft.AlphaChart{}} },
		func() LayerMethods { return LayerMethods{Shaft: shaft.AlphaDrilled{}} },
		func() LayerMethods { return LayerMethods{Lambda: true} },
	}
	rapid.Check(t, func(rt *rapid.T) {
		a, _ := drawAnalysis(rt)
		pass, err := a.ShaftPass()
		if err != nil {
			rt.Skip(err)
		}
		m := a.methods
		n := a.prof.NumLayers()
		m.Layers = make([]LayerMethods, n)
		copy(m.Layers, a.methods.Layers)
		same := make([]bool, n)
		for i := range n {
			if same[i] = rapid.Bool().Draw(rt, fmt.Sprintf("same %d", i)); same[i] {
				continue
			}
			pool := undrained
			if a.prof.Layer(i).Drainage == profile.Drained {
				pool = drained
			}
			lm := pool[rapid.IntRange(0, len(pool)-1).Draw(rt, fmt.Sprintf("method %d", i))]()
			lm.Tip = m.Layers[i].Tip
			m.Layers[i] = lm
		}
		var opt *Options
		if a.useCase {
			cs := a.cs
			opt = &Options{Case: &cs}
		}
		b, err := NewAnalysis(a.prof, a.pile, m, opt)
		if err != nil {
			rt.Skip(err)
		}
		want, werr := b.Breakdown()
		want.Sources, want.Warnings = nil, nil // BreakdownSharing leaves them out
		got, gerr := b.BreakdownSharing(pass, same)
		if (werr == nil) != (gerr == nil) || (werr != nil && werr.Error() != gerr.Error()) {
			rt.Fatalf("error %v, Breakdown %v", gerr, werr)
		}
		if !reflect.DeepEqual(got, want) {
			rt.Fatalf("got %+v\nwant %+v", got, want)
		}
	})
}

// TestPropWithShaftsMatchesNewAnalysis: an analysis made by WithShafts
// (the layers' shaft methods changed) gives, to the bit, the breakdown, the capacity and the capacity with
// depth (every field at every depth) of the analysis NewAnalysis builds
// whole with the same methods, and the same errors. The oracle is
// NewAnalysis itself.
func TestPropWithShaftsMatchesNewAnalysis(t *testing.T) {
	drained := []func() LayerMethods{
		func() LayerMethods { return LayerMethods{Shaft: shaft.BetaGiven{Beta: 0.4}} },
		func() LayerMethods { return LayerMethods{Shaft: shaft.Burland{}} },
		func() LayerMethods { return LayerMethods{Shaft: shaft.DrilledSandK0{}} },
		func() LayerMethods { return LayerMethods{} }, // the layer's default
	}
	undrained := []func() LayerMethods{
		func() LayerMethods { return LayerMethods{Shaft: shaft.AlphaGiven{Alpha: 0.5}} },
		func() LayerMethods { return LayerMethods{Shaft: shaft.AlphaAPI{}} },
		func() LayerMethods { return LayerMethods{Shaft: shaft.AlphaChart{}} },
		func() LayerMethods { return LayerMethods{Shaft: shaft.AlphaDrilled{}} },
		func() LayerMethods { return LayerMethods{Lambda: true} },
		func() LayerMethods { return LayerMethods{Lambda: true, LambdaValue: 0.3} },
		func() LayerMethods { return LayerMethods{Shaft: shaft.AlphaGiven{Alpha: 0.3}, Lambda: true} }, // both: as NewAnalysis reads them
	}
	rapid.Check(t, func(rt *rapid.T) {
		a, _ := drawAnalysis(rt)
		m := a.methods
		n := a.prof.NumLayers()
		m.Layers = make([]LayerMethods, n)
		copy(m.Layers, a.methods.Layers)
		set := make([]ShaftChoice, rapid.IntRange(0, n).Draw(rt, "set"))
		for i := range set {
			if rapid.Bool().Draw(rt, fmt.Sprintf("same %d", i)) {
				continue
			}
			pool := undrained
			if a.prof.Layer(i).Drainage == profile.Drained {
				pool = drained
			}
			lm := pool[rapid.IntRange(0, len(pool)-1).Draw(rt, fmt.Sprintf("method %d", i))]()
			if rapid.Bool().Draw(rt, fmt.Sprintf("own %d", i)) {
				// The method the layer has (for HasShafts).
				lp := &a.plans[i]
				lm = LayerMethods{Shaft: lp.shaft, Lambda: lp.lambda, LambdaValue: lp.lamVal}
			}
			set[i] = ShaftChoice{Set: true, Shaft: lm.Shaft, Lambda: lm.Lambda, LambdaValue: lm.LambdaValue}
			m.Layers[i].Shaft, m.Layers[i].Lambda, m.Layers[i].LambdaValue = lm.Shaft, lm.Lambda, lm.LambdaValue
		}
		var opt *Options
		if a.useCase {
			cs := a.cs
			opt = &Options{Case: &cs}
		}
		want, werr := NewAnalysis(a.prof, a.pile, m, opt)
		got, gerr := a.WithShafts(set)
		sameErr := func(what string, g, w error) {
			if (w == nil) != (g == nil) || (w != nil && w.Error() != g.Error()) {
				rt.Fatalf("%s: error %v, NewAnalysis %v", what, g, w)
			}
		}
		sameErr("WithShafts", gerr, werr)
		if werr != nil {
			return
		}
		bw, ew := want.Breakdown()
		bg, eg := got.Breakdown()
		sameErr("Breakdown", eg, ew)
		if !reflect.DeepEqual(bg, bw) {
			rt.Fatalf("breakdown\n got %+v\nwant %+v", bg, bw)
		}
		if a.HasShafts(set) {
			ba, ea := a.Breakdown()
			sameErr("HasShafts: Breakdown of a", ea, ew)
			if !reflect.DeepEqual(ba, bw) {
				rt.Fatalf("HasShafts, but the breakdown differs\n   a %+v\nwant %+v", ba, bw)
			}
		}
		cw, ew := want.Capacity()
		cg, eg := got.Capacity()
		sameErr("Capacity", eg, ew)
		if cg != cw {
			rt.Fatalf("capacity\n got %+v\nwant %+v", cg, cw)
		}
		g := DepthGrid{Step: units.Length(rapid.Float64Range(0.1, 1).Draw(rt, "step"))}
		rw, ew := want.WithDepth(g, nil)
		rg, eg := got.WithDepth(g, nil)
		sameErr("WithDepth", eg, ew)
		if !reflect.DeepEqual(rg, rw) {
			rt.Fatalf("capacity with depth differs")
		}
	})
}

// TestPropAnalysisCheckMatchesCheck: Analysis.Check on the analysis of the
// characteristic capacity gives what Check, which builds that analysis
// itself, gives: the same design to the bit and the same error. The
// oracle is Check; scenarios are drawAnalysis's (our own).
func TestPropAnalysisCheckMatchesCheck(t *testing.T) {
	bases := []Basis{SafetyFactor{Global: 2.5}, Eurocode7{Approach: DA1, Profiles: 1}, Eurocode7{Approach: DA2, Profiles: 1}}
	rapid.Check(t, func(rt *rapid.T) {
		a, _ := drawAnalysis(rt)
		if a.useCase { // the characteristic analysis has none
			var err error
			if a, err = NewAnalysis(a.prof, a.pile, a.methods, nil); err != nil {
				rt.Skip(err)
			}
		}
		b := bases[rapid.IntRange(0, len(bases)-1).Draw(rt, "basis")]
		l := Loads{Compression: Action{Permanent: units.Force(rapid.Float64Range(1e4, 5e6).Draw(rt, "G"))},
			Tension: Action{Variable: units.Force(rapid.Float64Range(0, 1e6).Draw(rt, "Q"))}}
		want, werr := Check(a.prof, a.pile, a.methods, b, l)
		got, gerr := a.Check(b, l)
		if (werr == nil) != (gerr == nil) || (werr != nil && werr.Error() != gerr.Error()) {
			rt.Fatalf("error %v, Check %v", gerr, werr)
		}
		if !reflect.DeepEqual(got, want) {
			rt.Fatalf("got %+v\nwant %+v", got, want)
		}
	})
}

// TestPropCaseTipsMatchNewAnalysis: an analysis with a design case that
// takes its tip preparation from another analysis of the same profile,
// pile and methods with the same soil factors (tipsFor, as Check and the
// search for the length do) gives, to the bit, the breakdown, capacity and
// capacity with depth of the analysis NewAnalysis builds whole with that
// case, and the same errors. The oracle is NewAnalysis itself; the
// factors are drawn (not a published set).
func TestPropCaseTipsMatchNewAnalysis(t *testing.T) {
	drawCase := func(rt *rapid.T, name string) Case {
		f := func(k string) float64 { return rapid.Float64Range(0.4, 1).Draw(rt, name+" "+k) }
		soil := func(k string) float64 { return rapid.SampledFrom([]float64{1, 1.25}).Draw(rt, name+" "+k) }
		return Case{Name: name, Tip: map[string]float64{"": f("tip")}, Shaft: map[string]float64{"": f("shaft")},
			Tension: map[string]float64{"": f("tension")}, Permanent: 1, Variable: 1, Weight: 1,
			TanPhi: soil("tanφ"), Su: soil("su")}
	}
	rapid.Check(t, func(rt *rapid.T) {
		a, _ := drawAnalysis(rt)
		var src *Analysis
		if rapid.Bool().Draw(rt, "source with a case") {
			c1 := drawCase(rt, "c1")
			b, err := NewAnalysis(a.prof, a.pile, a.methods, &Options{Case: &c1})
			if err != nil {
				rt.Skip(err)
			}
			src = b
		} else {
			b, err := NewAnalysis(a.prof, a.pile, a.methods, nil)
			if err != nil {
				rt.Skip(err)
			}
			src = b
		}
		c2 := drawCase(rt, "c2")
		want, werr := NewAnalysis(a.prof, a.pile, a.methods, &Options{Case: &c2})
		got, gerr := newAnalysis(a.prof, a.pile, a.methods, &Options{Case: &c2}, tipsFor(src, &c2))
		sameErr := func(what string, g, w error) {
			if (w == nil) != (g == nil) || (w != nil && w.Error() != g.Error()) {
				rt.Fatalf("%s: error %v, NewAnalysis %v", what, g, w)
			}
		}
		sameErr("newAnalysis", gerr, werr)
		if werr != nil {
			return
		}
		bw, ew := want.Breakdown()
		bg, eg := got.Breakdown()
		sameErr("Breakdown", eg, ew)
		if !reflect.DeepEqual(bg, bw) {
			rt.Fatalf("breakdown\n got %+v\nwant %+v", bg, bw)
		}
		cw, ew := want.Capacity()
		cg, eg := got.Capacity()
		sameErr("Capacity", eg, ew)
		if cg != cw {
			rt.Fatalf("capacity\n got %+v\nwant %+v", cg, cw)
		}
		g := DepthGrid{Step: units.Length(rapid.Float64Range(0.1, 1).Draw(rt, "step"))}
		rw, ew := want.WithDepth(g, nil)
		rg, eg := got.WithDepth(g, nil)
		sameErr("WithDepth", eg, ew)
		if !reflect.DeepEqual(rg, rw) {
			rt.Fatalf("capacity with depth differs")
		}
	})
}
