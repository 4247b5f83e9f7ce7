// Command compare is the qult side of scripts/compare-python.sh: it
// computes capacity with depth and a Monte Carlo of the compression
// capacity for one scenario of our own (invented numbers), times them,
// and writes the case, the results and the timings as JSON for the Python
// side to recompute and compare. It is a tool for measuring, not part of
// the library.
//
// The scenario: ten layers, sand and clay in turn (6 m each, the last
// sand 20 m), water at 1.5 m; β = K·tan δ with K and δ given in the sands,
// α given in the clays, qp = Nq·σ′v in the sands and Nc·su in the clays; a
// 0.6 m circular pile, weightless. The rules of the tip zone (embedment
// ramp, layered and weak-layer rules) are switched off so that both sides
// compute the same closed form.
package main

import (
	"encoding/json"
	"flag"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"runtime"
	"slices"
	"time"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/reliability"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// Layer is one layer of the case, SI.
type Layer struct {
	Top, Bottom float64
	Drained     bool
	Gamma, Gsat float64
	K, Delta    float64 // sand: K and δ (rad)
	Alpha, Su   float64 // clay
	Nq, Nc      float64
	KCoV, SuCoV float64 // Monte Carlo: normal K, lognormal su
	GsatSD      float64 // Monte Carlo: normal γsat (0: fixed)
}

// Case is the scenario as both sides read it.
type Case struct {
	Layers                 []Layer
	Water, GammaW          float64
	Diameter               float64
	WaterLo, WaterHi       float64 // Monte Carlo: uniform water depth
	MCTip                  float64
	MCSamples              int
	MCSeed                 uint64
	Steps                  []float64 // capacity with depth: steps from step to 60 m
	To                     float64
	Cores                  int
	WithDepth              map[string][]float64 // compression at each depth, by step
	Depths                 map[string][]float64
	NsPerCall              map[string]float64 // capacity with depth: ns per call, by step (median of runs)
	MCSeconds              float64
	MCMean, MCSD           float64
	MCDeterministic        float64
	MCClosedForm           bool
	MCWorkers              int
	GoVersion, GOOS, GOARC string
}

func main() {
	out := flag.String("out", ".", "folder for case.json")
	flag.Parse()
	if err := run(*out); err != nil {
		fmt.Fprintln(os.Stderr, "compare:", err)
		os.Exit(1)
	}
}

func run(dir string) error {
	const deg = math.Pi / 180
	c := Case{Water: 1.5, GammaW: 9.81e3, Diameter: 0.6, WaterLo: 0.5, WaterHi: 2.5, MCTip: 64, MCSamples: 1_000_000, MCSeed: 1,
		Steps: []float64{0.1, 0.01}, To: 60, Cores: runtime.GOMAXPROCS(0), WithDepth: map[string][]float64{}, Depths: map[string][]float64{},
		NsPerCall: map[string]float64{}, GoVersion: runtime.Version(), GOOS: runtime.GOOS, GOARC: runtime.GOARCH}
	z := 0.0
	for i := range 10 {
		h := 6.0
		if i == 9 {
			h = 20
		}
		l := Layer{Top: z, Bottom: z + h, Drained: i%2 == 0}
		if l.Drained {
			l.Gamma, l.Gsat, l.K, l.Delta, l.Nq = 18e3, 20e3, 0.8+0.05*float64(i), float64(24+i)*deg, 30+2*float64(i)
			l.KCoV, l.GsatSD = 0.15, 500
			if i == 0 {
				l.GsatSD = 0 // above and below the water table: γsat fixed
			}
		} else {
			l.Gamma, l.Gsat, l.Alpha, l.Su, l.Nc = 17e3, 18e3, 0.7, float64(30+10*i)*1e3, 9
			l.SuCoV, l.GsatSD = 0.3, 500
		}
		c.Layers = append(c.Layers, l)
		z += h
	}
	spec := profile.Spec{WaterDepth: units.Length(c.Water), WaterUnitWeight: units.UnitWeight(c.GammaW)}
	var lms []pile.LayerMethods
	var ps []reliability.Param
	var targets []reliability.Target
	for i, l := range c.Layers {
		// Only the top layer reaches above the water table: the others
		// give γsat alone (a sampled γsat can then never fall below γ).
		ls := profile.LayerSpec{Thickness: units.Length(l.Bottom - l.Top), SaturatedUnitWeight: units.UnitWeight(l.Gsat)}
		if i == 0 {
			ls.UnitWeight = units.UnitWeight(l.Gamma)
		}
		var lm pile.LayerMethods
		if l.Drained {
			ls.Drainage, ls.Phi = profile.Drained, 34*units.Degree
			lm.Shaft = shaft.Beta{K: shaft.KGiven{K: l.K}, Delta: shaft.DeltaGiven{Delta: units.Angle(l.Delta)}}
			lm.Tip = bearing.GivenNq{Nq: l.Nq}
			targets = append(targets, reliability.Target{Layer: i, Key: reliability.KeyK})
			ps = append(ps, reliability.Param{Name: fmt.Sprintf("k%d", i), Dist: reliability.Distribution{Kind: reliability.Normal, Mean: l.K, SD: l.KCoV * l.K}})
		} else {
			ls.Drainage, ls.Su = profile.Undrained, units.Stress(l.Su)
			lm.Shaft = shaft.AlphaGiven{Alpha: l.Alpha}
			lm.Tip = bearing.GivenNc{Nc: l.Nc}
			targets = append(targets, reliability.Target{Layer: i, Key: reliability.KeyUndrainedStrength})
			ps = append(ps, reliability.Param{Name: fmt.Sprintf("su%d", i), Dist: reliability.Distribution{Kind: reliability.LogNormal, Mean: l.Su, SD: l.SuCoV * l.Su}})
		}
		if l.GsatSD > 0 {
			targets = append(targets, reliability.Target{Layer: i, Key: reliability.KeySaturatedUnitWeight})
			ps = append(ps, reliability.Param{Name: fmt.Sprintf("gsat%d", i), Dist: reliability.Distribution{Kind: reliability.Normal, Mean: l.Gsat, SD: l.GsatSD}})
		}
		spec.Layers, lms = append(spec.Layers, ls), append(lms, lm)
	}
	targets = append(targets, reliability.Target{Layer: -1, Key: reliability.KeyWaterDepth})
	ps = append(ps, reliability.Param{Name: "water", Dist: reliability.Distribution{Kind: reliability.Uniform, Lower: c.WaterLo, Upper: c.WaterHi}})
	prof, err := profile.New(spec)
	if err != nil {
		return err
	}
	meth := pile.Methods{Layers: lms, LayeredTip: false, NoWeakLayer: true, NoEmbedment: true}
	deep := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: units.Length(c.Diameter)}, Length: units.Length(c.To), Installation: pile.DrivenHigh}
	a, err := pile.NewAnalysis(prof, deep, meth, nil)
	if err != nil {
		return err
	}
	for _, step := range c.Steps {
		key := fmt.Sprint(step)
		rows, err := a.WithDepth(pile.DepthGrid{From: units.Length(step), To: units.Length(c.To), Step: units.Length(step)}, nil)
		if err != nil {
			return err
		}
		for _, r := range rows {
			c.Depths[key] = append(c.Depths[key], float64(r.TipDepth))
			c.WithDepth[key] = append(c.WithDepth[key], float64(r.Compression))
		}
		// Time: the median of 15 runs of as many calls as fill ~50 ms.
		reps := max(1, int(5e6/float64(len(rows))/10))
		var times []float64
		for range 15 {
			t0 := time.Now()
			for range reps {
				rows, _ = a.WithDepth(pile.DepthGrid{From: units.Length(step), To: units.Length(c.To), Step: units.Length(step)}, rows[:0])
			}
			times = append(times, float64(time.Since(t0).Nanoseconds())/float64(reps))
		}
		slices.Sort(times)
		c.NsPerCall[key] = times[len(times)/2]
	}
	p := pile.Pile{Section: deep.Section, Length: units.Length(c.MCTip), Installation: pile.DrivenHigh}
	pm, err := reliability.NewPileModel(spec, p, meth, targets)
	if err != nil {
		return err
	}
	c.MCClosedForm = pm.Fast()
	ev, _ := pm.NewEvaluator()
	det, err := ev.Capacity(pm.Base())
	if err != nil {
		return err
	}
	c.MCDeterministic = det.Compression
	pr := reliability.Problem{Params: ps, Model: pm}
	// The best of three runs.
	c.MCSeconds = math.Inf(1)
	for range 3 {
		t0 := time.Now()
		r, err := reliability.MonteCarlo(pr, reliability.Options{Samples: c.MCSamples, Seed: c.MCSeed})
		if err != nil {
			return err
		}
		c.MCSeconds = min(c.MCSeconds, time.Since(t0).Seconds())
		c.MCMean, c.MCSD, c.MCWorkers = r.Compression.Mean, r.Compression.SD, r.Workers
	}
	b, err := json.Marshal(c)
	if err != nil {
		return err
	}
	return os.WriteFile(filepath.Join(dir, "case.json"), b, 0o644)
}
