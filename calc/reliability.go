package calc

import (
	"errors"
	"fmt"
	"math"
	"slices"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/reliability"
	"github.com/qultgeo/qult/units"
)

// Reliability asks for the probabilistic capacity of the pile: Monte
// Carlo simulation and FOSM over the uncertain parameters listed (package
// reliability). The ground, pile and methods are those of the file; the
// tip is the pile's own; resistances are characteristic (no design case).
type Reliability struct {
	Samples     Value `yaml:"samples,omitempty" json:"samples,omitempty" q:"integer,1,10000000" doc:"Number of Monte Carlo samples (default 10000)."`
	Seed        Value `yaml:"seed,omitempty" json:"seed,omitempty" q:"integer,0,9007199254740992" doc:"Seed of the random numbers (default 1): the same seed gives the same result whatever the number of workers."`
	Workers     Value `yaml:"workers,omitempty" json:"workers,omitempty" q:"integer,0,1024" doc:"Goroutines sharing the samples; 0 or absent: all cores. The result does not depend on it."`
	Load        Value `yaml:"load,omitempty" json:"load,omitempty" q:"force,0," doc:"Compression load for the probability of falling below it and the reliability index; absent: loads.compression (permanent + variable, unfactored)."`
	TensionLoad Value `yaml:"tension_load,omitempty" json:"tension_load,omitempty" q:"force,0," doc:"Tension load for the same in tension; absent: loads.tension (permanent + variable, unfactored)."`
	// Parameters are the uncertain values; Correlations the coefficients
	// of correlation between pairs of them (0 for every pair not listed).
	Parameters   []Uncertain   `yaml:"parameters" json:"parameters" doc:"The uncertain parameters, each with its distribution."`
	Correlations []Correlation `yaml:"correlations,omitempty" json:"correlations,omitempty" doc:"Coefficients of correlation between pairs of parameters (of their normal scores, a Gaussian copula); pairs not listed are independent."`
}

// Uncertain is one uncertain parameter. Layer names the layer (by its
// name, or its index from 0 as in ground.layers[i]) for the keys of a
// layer; the keys water_depth, tip_model_factor and shaft_model_factor
// take no layer. Mean, SD, Lower and Upper carry the key's unit (an angle
// for friction_angle and delta, a stress for undrained_strength, a unit
// weight, a length for water_depth, a plain number otherwise).
type Uncertain struct {
	Name         string `yaml:"name,omitempty" json:"name,omitempty" doc:"Name of the parameter in the output and in correlations; default the layer's name and the key (\"dense sand.friction_angle\")."`
	Layer        string `yaml:"layer,omitempty" json:"layer,omitempty" doc:"The layer: its name, or its index from 0."`
	Key          string `yaml:"key" json:"key" doc:"The value the parameter sets (see the reliability package)."`
	Distribution string `yaml:"distribution" json:"distribution" doc:"normal, lognormal, truncated-normal or uniform."`
	Mean         Value  `yaml:"mean,omitempty" json:"mean,omitempty" doc:"Mean (of the parent normal for truncated-normal); default the value of the calculation."`
	SD           Value  `yaml:"sd,omitempty" json:"sd,omitempty" doc:"Standard deviation, in the key's unit (or give cov)."`
	CoV          Value  `yaml:"cov,omitempty" json:"cov,omitempty" q:"number,0,1" doc:"Coefficient of variation σ/|μ|, 0 to 1 (or give sd)."`
	Lower        Value  `yaml:"lower,omitempty" json:"lower,omitempty" doc:"Lower bound (truncated-normal, uniform)."`
	Upper        Value  `yaml:"upper,omitempty" json:"upper,omitempty" doc:"Upper bound (truncated-normal, uniform)."`
}

// Correlation is the coefficient of correlation between two parameters.
type Correlation struct {
	Between []string `yaml:"between" json:"between" doc:"The names of the two parameters."`
	Rho     Value    `yaml:"rho" json:"rho" q:"number,-1,1" doc:"Coefficient of correlation ρ, −1 to 1."`
}

// DefaultReliabilitySamples is the number of samples when the file gives
// none: 10,000, enough for the 5 and 95 % percentiles to about ±1 % of
// σ·√(p(1 − p)/n)/φ(z) = 0.022 σ, and quick with any method set.
const DefaultReliabilitySamples = 10_000

// reliabilityInputs is the reliability section resolved.
type reliabilityInputs struct {
	samples, workers int
	seed             uint64
	load, tension    units.Force
	params           []relParam
	corr             [][]float64
}

type relParam struct {
	name, layerName       string
	target                reliability.Target
	dim                   units.Dimension // 0: a plain number
	dist                  reliability.Distribution
	hasMean, hasSD, isCoV bool
	cov                   float64
	line                  int
}

// keyDims gives each key's dimension (0 for a plain number).
var keyDims = map[string]units.Dimension{
	reliability.KeyFrictionAngle: units.DimAngle, reliability.KeyDelta: units.DimAngle,
	reliability.KeyUndrainedStrength: units.DimStress, reliability.KeyUnitWeight: units.DimUnitWeight,
	reliability.KeySaturatedUnitWeight: units.DimUnitWeight, reliability.KeyWaterDepth: units.DimLength,
}

func (r *resolver) reliabilitySection(f *File, in *Inputs) {
	s := f.Reliability
	if s == nil {
		return
	}
	ri := &reliabilityInputs{samples: DefaultReliabilitySamples, seed: 1}
	whole := func(v Value, path string, lo, hi float64) (int, bool) {
		x := r.num(v, path, lo, hi)
		if v.IsSet() && x != math.Trunc(x) {
			r.add(path, v.Line, "%q: want a whole number", v.Raw)
			return 0, false
		}
		return int(x), v.IsSet()
	}
	if n, ok := whole(s.Samples, "reliability.samples", 1, reliability.MaxSamples); ok {
		ri.samples = n
	}
	if n, ok := whole(s.Seed, "reliability.seed", 0, 1<<53); ok {
		ri.seed = uint64(n)
	}
	ri.workers, _ = whole(s.Workers, "reliability.workers", 0, 1024)
	ri.load = in.Loads.Compression.Total()
	if s.Load.IsSet() {
		ri.load = r.force(s.Load, "reliability.load")
	}
	ri.tension = in.Loads.Tension.Total()
	if s.TensionLoad.IsSet() {
		ri.tension = r.force(s.TensionLoad, "reliability.tension_load")
	}
	for _, c := range []struct {
		path string
		f    units.Force
	}{{"reliability.load", ri.load}, {"reliability.tension_load", ri.tension}} {
		if c.f < 0 || c.f > maxLoad {
			r.add(c.path, 0, "%v is outside 0 to %v", c.f, maxLoad)
		}
	}
	if len(s.Parameters) == 0 {
		r.add("reliability.parameters", 0, "no uncertain parameter: give at least one (layer, key, distribution and its spread)")
	}
	names := map[string]int{}
	for i, u := range s.Parameters {
		path := fmt.Sprintf("reliability.parameters[%d]", i)
		p, ok := r.uncertain(f, u, path)
		if !ok {
			continue
		}
		if j, dup := names[p.name]; dup {
			r.add(path+".name", 0, "%q is the name of parameters[%d] too; give each parameter its own name", p.name, j)
			continue
		}
		for _, q := range ri.params {
			if q.target == p.target {
				r.add(path+".key", 0, "%s sets the same value as %q", p.target.Key, q.name)
				ok = false
			}
		}
		if !ok {
			continue
		}
		names[p.name] = len(ri.params)
		ri.params = append(ri.params, p)
	}
	if len(s.Correlations) > 0 && len(r.probs) == 0 {
		n := len(ri.params)
		ri.corr = make([][]float64, n)
		for i := range ri.corr {
			ri.corr[i] = make([]float64, n)
			ri.corr[i][i] = 1
		}
		for i, c := range s.Correlations {
			path := fmt.Sprintf("reliability.correlations[%d]", i)
			if len(c.Between) != 2 {
				r.add(path+".between", 0, "%d names: want the names of two parameters", len(c.Between))
				continue
			}
			a, okA := names[strings.TrimSpace(c.Between[0])]
			b, okB := names[strings.TrimSpace(c.Between[1])]
			if !okA || !okB {
				r.add(path+".between", 0, "%q: want names of parameters (%s)", c.Between, strings.Join(sortedKeys(names), ", "))
				continue
			}
			if a == b {
				r.add(path+".between", 0, "%q: a parameter with itself; want two parameters", c.Between)
				continue
			}
			if !c.Rho.IsSet() {
				r.add(path+".rho", 0, "not given; want a coefficient from −1 to 1")
				continue
			}
			rho := r.num(c.Rho, path+".rho", -1, 1)
			if ri.corr[a][b] != 0 {
				r.add(path+".between", 0, "%q: this pair is given twice", c.Between)
				continue
			}
			ri.corr[a][b], ri.corr[b][a] = rho, rho
		}
	}
	in.reliability = ri
}

func sortedKeys(m map[string]int) []string {
	var out []string
	for k := range m {
		out = append(out, fmt.Sprintf("%q", k))
	}
	slices.Sort(out)
	return out
}

// uncertain resolves one parameter; the mean may be left for Run.
func (r *resolver) uncertain(f *File, u Uncertain, path string) (relParam, bool) {
	p := relParam{target: reliability.Target{Layer: -1, Key: strings.TrimSpace(u.Key)}, line: lineOf(f, path)}
	n0 := len(r.probs)
	key := p.target.Key
	global := slices.Contains(reliability.GlobalKeys, key)
	switch {
	case key == "":
		r.add(path+".key", 0, "not given; want one of %s, or for a layer %s", strings.Join(reliability.GlobalKeys, ", "), strings.Join(reliability.LayerKeys, ", "))
	case !global && !slices.Contains(reliability.LayerKeys, key):
		r.add(path+".key", 0, "%q: want one of %s, or for a layer %s", key, strings.Join(reliability.GlobalKeys, ", "), strings.Join(reliability.LayerKeys, ", "))
	case global && u.Layer != "":
		r.add(path+".layer", 0, "%s is a key of the whole calculation: leave layer out", key)
	case !global:
		li, err := findLayer(f, u.Layer)
		if err != nil {
			r.add(path+".layer", 0, "%v", err)
		} else {
			p.target.Layer = li
			p.layerName = f.Ground.Layers[li].Name
			if p.layerName == "" {
				p.layerName = fmt.Sprintf("layer %d", li+1)
			}
		}
	}
	p.name = strings.TrimSpace(u.Name)
	if p.name == "" {
		p.name = key
		if p.layerName != "" {
			p.name = p.layerName + "." + key
		}
	}
	kind, err := reliability.ParseKind(strings.TrimSpace(u.Distribution))
	if err != nil {
		r.add(path+".distribution", 0, "%q: want one of normal, lognormal, truncated-normal, uniform", u.Distribution)
	}
	p.dist.Kind = kind
	p.dim = keyDims[key]
	val := func(v Value, field string) float64 {
		if p.dim == 0 {
			return r.num(v, path+"."+field, math.Inf(-1), math.Inf(1))
		}
		return r.q(v, path+"."+field, p.dim)
	}
	p.hasMean, p.hasSD, p.isCoV = u.Mean.IsSet(), u.SD.IsSet(), u.CoV.IsSet()
	p.dist.Mean = val(u.Mean, "mean")
	p.dist.SD = val(u.SD, "sd")
	p.cov = r.num(u.CoV, path+".cov", 0, reliability.MaxCoV)
	p.dist.Lower, p.dist.Upper = math.Inf(-1), math.Inf(1)
	if u.Lower.IsSet() {
		p.dist.Lower = val(u.Lower, "lower")
	}
	if u.Upper.IsSet() {
		p.dist.Upper = val(u.Upper, "upper")
	}
	if u.Lower.IsSet() && u.Upper.IsSet() && len(r.probs) == n0 && !(p.dist.Lower < p.dist.Upper) {
		r.add(path+".lower", 0, "%q is not below upper %q", u.Lower.Raw, u.Upper.Raw)
	}
	switch kind {
	case reliability.Normal, reliability.LogNormal, reliability.TruncatedNormal:
		switch {
		case p.hasSD && p.isCoV:
			r.add(path+".cov", 0, "given with sd; give one of them")
		case !p.hasSD && !p.isCoV:
			r.add(path+".sd", 0, "not given; a %s needs sd or cov", kind)
		}
		if p.hasSD && p.dist.SD < 0 {
			r.add(path+".sd", 0, "%q is outside 0 to ∞", u.SD.Raw)
		}
		if kind == reliability.TruncatedNormal && !u.Lower.IsSet() && !u.Upper.IsSet() {
			r.add(path+".lower", 0, "not given; a truncated-normal needs lower, upper or both")
		}
		if kind != reliability.TruncatedNormal && (u.Lower.IsSet() || u.Upper.IsSet()) {
			r.add(path+".lower", 0, "a %s takes no bounds; use truncated-normal", kind)
		}
	case reliability.Uniform:
		if !u.Lower.IsSet() || !u.Upper.IsSet() {
			r.add(path+".lower", 0, "a uniform needs lower and upper")
		}
		if u.Mean.IsSet() || u.SD.IsSet() || u.CoV.IsSet() {
			r.add(path+".mean", 0, "a uniform takes only lower and upper")
		}
	}
	return p, len(r.probs) == n0
}

// findLayer finds a layer by name or by its index from 0.
func findLayer(f *File, s string) (int, error) {
	s = strings.TrimSpace(s)
	n := len(f.Ground.Layers)
	if s == "" {
		return 0, fmt.Errorf("not given; this key belongs to a layer: give its name or index (0 to %d)", n-1)
	}
	found := -1
	for i, l := range f.Ground.Layers {
		if strings.TrimSpace(l.Name) == s {
			if found >= 0 {
				return 0, fmt.Errorf("%q names layers %d and %d; give the index instead", s, found, i)
			}
			found = i
		}
	}
	if found >= 0 {
		return found, nil
	}
	if i, err := strconv.Atoi(s); err == nil {
		if i < 0 || i >= n {
			return 0, fmt.Errorf("%d is outside 0 to %d", i, n-1)
		}
		return i, nil
	}
	return 0, fmt.Errorf("%q is not the name of a layer", s)
}

// ReliabilityResult is the probabilistic capacity of the pile.
type ReliabilityResult struct {
	Samples, Workers int
	Seed             uint64
	// ClosedForm: every sample was computed in closed form (see
	// reliability.PileModel); otherwise by the full analysis.
	ClosedForm   bool
	Params       []ReliabilityParam
	Correlations []ReliabilityCorrelation
	// Deterministic is the capacity at the values of the calculation.
	Deterministic reliability.Outcome
	MonteCarlo    *reliability.MCResult
	FOSM          *reliability.FOSMResult
}

// ReliabilityParam is one uncertain parameter as used, SI.
type ReliabilityParam struct {
	Name, Layer, Key, Distribution string
	Dim                            units.Dimension // 0: a plain number
	Mean, SD                       float64         // as given (of the parent normal for a truncated one; the moments of a uniform)
	Lower, Upper                   float64         // bounds; ±Inf: none
	Base                           float64         // the value of the deterministic calculation
}

// ReliabilityCorrelation is one coefficient of correlation given.
type ReliabilityCorrelation struct {
	A, B string
	Rho  float64
}

// runReliability runs the reliability section, if any.
func runReliability(f *File, in *Inputs, res *Result) error {
	ri := in.reliability
	if ri == nil {
		return nil
	}
	targets := make([]reliability.Target, len(ri.params))
	for i, p := range ri.params {
		targets[i] = p.target
	}
	prob := func(path, msg string, err error) error {
		return Problems{{Path: path, Line: lineOf(f, path), Msg: msg, Err: err}}
	}
	pm, err := reliability.NewPileModel(in.Ground, in.Pile, in.Methods, targets)
	if err != nil {
		var fe *reliability.FieldError
		if errors.As(err, &fe) && strings.HasPrefix(fe.Path, "targets[") {
			path := "reliability.parameters" + strings.TrimPrefix(fe.Path, "targets") + "." + fe.Field
			return prob(path, fe.Msg, err)
		}
		return prob("reliability", err.Error(), err)
	}
	base := pm.Base()
	out := &ReliabilityResult{Samples: ri.samples, Seed: ri.seed, ClosedForm: pm.Fast()}
	var ps []reliability.Param
	for i, p := range ri.params {
		d := p.dist
		if !p.hasMean && d.Kind != reliability.Uniform {
			d.Mean = base[i]
		}
		if p.isCoV {
			d.SD = p.cov * math.Abs(d.Mean)
		}
		path := fmt.Sprintf("reliability.parameters[%d]", i)
		if err := d.Validate(); err != nil {
			var fe *reliability.FieldError
			errors.As(err, &fe)
			return prob(path+"."+fe.Field, fmt.Sprintf("%s (in SI units: %s)", fe.Msg, siUnitOf(p.dim)), err)
		}
		ps = append(ps, reliability.Param{Name: p.name, Dist: d})
		mean, sd := d.Mean, d.SD
		if d.Kind == reliability.Uniform {
			mean, sd = d.Moments()
		}
		out.Params = append(out.Params, ReliabilityParam{Name: p.name, Layer: p.layerName, Key: p.target.Key, Distribution: d.Kind.String(),
			Dim: p.dim, Mean: mean, SD: sd, Lower: d.Lower, Upper: d.Upper, Base: base[i]})
	}
	for i := range ri.corr {
		for j := i + 1; j < len(ri.corr); j++ {
			if ri.corr[i][j] != 0 {
				out.Correlations = append(out.Correlations, ReliabilityCorrelation{A: ri.params[i].name, B: ri.params[j].name, Rho: ri.corr[i][j]})
			}
		}
	}
	pr := reliability.Problem{Params: ps, Correlation: ri.corr, Model: pm}
	opt := reliability.Options{Samples: ri.samples, Seed: ri.seed, Workers: ri.workers, Load: float64(ri.load), TensionLoad: float64(ri.tension)}
	ev, err := pm.NewEvaluator()
	if err == nil {
		out.Deterministic, err = ev.Capacity(base)
	}
	if err == nil {
		out.MonteCarlo, err = reliability.MonteCarlo(pr, opt)
	}
	if err == nil {
		out.FOSM, err = reliability.FOSM(pr, opt)
	}
	if err != nil {
		var fe *reliability.FieldError
		if errors.As(err, &fe) && fe.Path == "correlation" {
			return prob("reliability.correlations", fe.Msg, err)
		}
		return prob("reliability", strings.TrimPrefix(err.Error(), "reliability: "), err)
	}
	out.Workers = out.MonteCarlo.Workers
	res.Reliability = out
	return nil
}

// siUnitOf names the SI unit of a dimension, for messages about values
// shown in SI.
func siUnitOf(d units.Dimension) string {
	switch d {
	case units.DimAngle:
		return "rad"
	case units.DimStress:
		return "Pa"
	case units.DimUnitWeight:
		return "N/m3"
	case units.DimLength:
		return "m"
	}
	return "a plain number"
}
