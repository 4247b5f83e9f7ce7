package reliability

import (
	"fmt"
	"math"
	"slices"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// Keys of the values a parameter of a PileModel can set. Layer keys:
//
//	friction_angle          φ′, rad
//	undrained_strength      su, Pa: a constant su, or the su at mid-layer of a
//	                        linear one, whose top and bottom values are then
//	                        scaled by the sample over the layer's own mid-layer su
//	unit_weight             γ above the water table, N/m³ (given directly)
//	saturated_unit_weight   γsat below it, N/m³ (given directly)
//	k, k_over_k0, k_over_kp K, K/K0 or K/Kp of the layer's β shaft method
//	delta, delta_over_phi   δ (rad) or δ/φ′ of the layer's β shaft method
//	beta                    β of the layer's given-β shaft method
//	alpha                   α of the layer's given-α shaft method
//	nq                      Nq of the layer's given-Nq tip method
//	nc                      Nc of the layer's given-Nq or given-Nc tip method
//
// Keys of the whole calculation (Target.Layer −1):
//
//	water_depth             depth of the water table, m (negative above ground)
//	tip_model_factor        factor on the tip resistance Qp, ≥ 0 (mean 1 for none)
//	shaft_model_factor      factor on the shaft resistance Qs (compression and tension), ≥ 0
//
// A key that needs a method reads only where the layer's own method (a
// LayerMethods entry) is one that reads it.
const (
	KeyFrictionAngle       = "friction_angle"
	KeyUndrainedStrength   = "undrained_strength"
	KeyUnitWeight          = "unit_weight"
	KeySaturatedUnitWeight = "saturated_unit_weight"
	KeyK                   = "k"
	KeyKOverK0             = "k_over_k0"
	KeyKOverKp             = "k_over_kp"
	KeyDelta               = "delta"
	KeyDeltaOverPhi        = "delta_over_phi"
	KeyBeta                = "beta"
	KeyAlpha               = "alpha"
	KeyNq                  = "nq"
	KeyNc                  = "nc"
	KeyWaterDepth          = "water_depth"
	KeyTipFactor           = "tip_model_factor"
	KeyShaftFactor         = "shaft_model_factor"
)

// LayerKeys and GlobalKeys list the keys, in the order above.
var (
	LayerKeys = []string{KeyFrictionAngle, KeyUndrainedStrength, KeyUnitWeight, KeySaturatedUnitWeight,
		KeyK, KeyKOverK0, KeyKOverKp, KeyDelta, KeyDeltaOverPhi, KeyBeta, KeyAlpha, KeyNq, KeyNc}
	GlobalKeys = []string{KeyWaterDepth, KeyTipFactor, KeyShaftFactor}
)

// Target is the value a parameter sets: Key in layer Layer (0 from the
// top), or, with Layer −1, a key of the whole calculation.
type Target struct {
	Layer int
	Key   string
}

// PileModel is the capacity of one pile in a layered profile with some of
// its inputs uncertain: the ground, the pile and the methods as for
// pile.NewAnalysis, the tip at the pile's own tip, characteristic
// resistances (no design case). Each parameter of the Problem sets the
// value its Target names.
//
// Every sample is computed by the same routines as a deterministic
// calculation (profile.New, pile.NewAnalysis, CapacityAt), with these
// exceptions made for speed where the result is the same: when every
// layer along the pile uses a shaft method with a factor constant in the
// layer (given β, β with given K and given δ or δ/φ′, given α), the tip
// layer a given-Nq or given-Nc tip, the water hydrostatic and the ground
// uncut, and the tip lies far enough from the layer boundaries that no
// rule of the tip zone applies (the embedment ramp, the layered and the
// weak-layer rules), the capacity is computed in closed form with no
// allocation (Fast reports it). NewPileModel checks that closed form
// against the full computation at the parameters' given values.
type PileModel struct {
	ground  profile.Spec
	pile    pile.Pile
	methods pile.Methods
	targets []Target
	fast    *fastModel
}

// NewPileModel prepares the model. The targets are checked against the
// inputs (a layer that exists, a key its method reads); the error names
// the target by its index ("targets[2].key"). The closed form, where it
// applies, is checked against the full computation at the inputs' own
// values (Base).
func NewPileModel(ground profile.Spec, p pile.Pile, m pile.Methods, targets []Target) (*PileModel, error) {
	pm := &PileModel{ground: ground, pile: p, methods: m, targets: slices.Clone(targets)}
	pm.ground.Layers = slices.Clone(ground.Layers)
	pm.methods.Layers = slices.Clone(m.Layers)
	if len(pm.methods.Layers) < len(ground.Layers) {
		pm.methods.Layers = append(pm.methods.Layers, make([]pile.LayerMethods, len(ground.Layers)-len(pm.methods.Layers))...)
	}
	seen := map[Target]int{}
	for i, t := range targets {
		path := fmt.Sprintf("targets[%d]", i)
		if j, ok := seen[t]; ok {
			return nil, &FieldError{Path: path, Msg: fmt.Sprintf("sets the same value as targets[%d]", j)}
		}
		seen[t] = i
		if err := pm.checkTarget(t); err != nil {
			err.Path = path
			return nil, err
		}
	}
	base := pm.Base()
	g, err := pm.NewEvaluator()
	if err != nil {
		return nil, err
	}
	want, err := g.Capacity(base)
	if err != nil {
		return nil, fmt.Errorf("reliability: at the base values: %w", err)
	}
	if f, ok := pm.newFast(); ok {
		got, err := f.capacity(base)
		close := func(a, b float64) bool { return math.Abs(a-b) <= 1e-9*max(math.Abs(a), math.Abs(b), 1) }
		if err == nil && close(got.Compression, want.Compression) && close(got.Tension, want.Tension) {
			pm.fast = f
		}
	}
	return pm, nil
}

// Base returns the value of each target in the inputs as given (the
// deterministic calculation): for undrained_strength the su at mid-layer,
// for a model factor 1.
func (pm *PileModel) Base() []float64 {
	out := make([]float64, len(pm.targets))
	for i, t := range pm.targets {
		if t.Layer < 0 {
			out[i] = 1
			if t.Key == KeyWaterDepth {
				out[i] = float64(pm.ground.WaterDepth)
			}
			continue
		}
		ls, lm := &pm.ground.Layers[t.Layer], &pm.methods.Layers[t.Layer]
		var v float64
		switch t.Key {
		case KeyFrictionAngle:
			v = float64(ls.Phi)
		case KeyUndrainedStrength:
			v = float64(ls.Su)
			if v == 0 {
				v = float64(ls.SuTop+ls.SuBottom) / 2
			}
		case KeyUnitWeight:
			v = float64(ls.UnitWeight)
		case KeySaturatedUnitWeight:
			v = float64(ls.SaturatedUnitWeight)
		case KeyK, KeyKOverK0, KeyKOverKp, KeyDelta, KeyDeltaOverPhi:
			b := unwrap(lm.Shaft).(shaft.Beta)
			switch r := b.K.(type) {
			case shaft.KGiven:
				if t.Key == KeyK {
					v = r.K
				}
			case shaft.KOverK0:
				if t.Key == KeyKOverK0 {
					v = r.Ratio
				}
			case shaft.KOverKp:
				if t.Key == KeyKOverKp {
					v = r.Ratio
				}
			}
			switch r := b.Delta.(type) {
			case shaft.DeltaGiven:
				if t.Key == KeyDelta {
					v = float64(r.Delta)
				}
			case shaft.DeltaOverPhi:
				if t.Key == KeyDeltaOverPhi {
					v = r.Ratio
				}
			}
		case KeyBeta:
			v = unwrap(lm.Shaft).(shaft.BetaGiven).Beta
		case KeyAlpha:
			v = unwrap(lm.Shaft).(shaft.AlphaGiven).Alpha
		case KeyNq:
			v = lm.Tip.(bearing.GivenNq).Nq
		case KeyNc:
			switch tp := lm.Tip.(type) {
			case bearing.GivenNq:
				v = tp.Nc
			case bearing.GivenNc:
				v = tp.Nc
			}
		}
		out[i] = v
	}
	return out
}

// Fast reports whether the model computes in closed form (see PileModel).
func (pm *PileModel) Fast() bool { return pm.fast != nil }

func (pm *PileModel) checkTarget(t Target) *FieldError {
	if t.Layer == -1 {
		if slices.Contains(GlobalKeys, t.Key) {
			if t.Key == KeyWaterDepth && pm.ground.NoWater {
				return &FieldError{Field: "key", Msg: "water_depth: the site is dry; give ground.water_depth"}
			}
			if t.Key == KeyWaterDepth && len(pm.ground.PorePressures) > 0 {
				return &FieldError{Field: "key", Msg: "water_depth: the pore pressures are given point by point"}
			}
			return nil
		}
		if slices.Contains(LayerKeys, t.Key) {
			return &FieldError{Field: "layer", Msg: fmt.Sprintf("%s is a key of a layer: name the layer", t.Key)}
		}
		return &FieldError{Field: "key", Msg: fmt.Sprintf("%q: want one of %v or, for a layer, %v", t.Key, GlobalKeys, LayerKeys)}
	}
	if t.Layer < 0 || t.Layer >= len(pm.ground.Layers) {
		return &FieldError{Field: "layer", Msg: fmt.Sprintf("%d is outside 0 to %d", t.Layer, len(pm.ground.Layers)-1)}
	}
	if slices.Contains(GlobalKeys, t.Key) {
		return &FieldError{Field: "key", Msg: fmt.Sprintf("%s is a key of the whole calculation, not of a layer", t.Key)}
	}
	ls := &pm.ground.Layers[t.Layer]
	lm := &pm.methods.Layers[t.Layer]
	need := func(what string) *FieldError {
		return &FieldError{Field: "key", Msg: fmt.Sprintf("%s needs the layer's %s", t.Key, what)}
	}
	switch t.Key {
	case KeyFrictionAngle:
		if ls.Drainage != profile.Drained {
			return need("drainage drained")
		}
	case KeyUndrainedStrength:
		if ls.Su == 0 && ls.SuTop == 0 && ls.SuBottom == 0 {
			return need("undrained strength")
		}
	case KeyUnitWeight:
		if ls.UnitWeight == 0 {
			return need("unit_weight given directly (not from phase relations)")
		}
	case KeySaturatedUnitWeight:
		if ls.SaturatedUnitWeight == 0 {
			return need("saturated_unit_weight given directly (not from phase relations)")
		}
	case KeyK, KeyKOverK0, KeyKOverKp, KeyDelta, KeyDeltaOverPhi:
		b, ok := unwrap(lm.Shaft).(shaft.Beta)
		if !ok {
			return need("shaft method beta with " + t.Key + " given")
		}
		var has bool
		switch t.Key {
		case KeyK:
			_, has = b.K.(shaft.KGiven)
		case KeyKOverK0:
			_, has = b.K.(shaft.KOverK0)
		case KeyKOverKp:
			_, has = b.K.(shaft.KOverKp)
		case KeyDelta:
			_, has = b.Delta.(shaft.DeltaGiven)
		case KeyDeltaOverPhi:
			_, has = b.Delta.(shaft.DeltaOverPhi)
		}
		if !has {
			return need("shaft method beta with " + t.Key + " given")
		}
	case KeyBeta:
		if _, ok := unwrap(lm.Shaft).(shaft.BetaGiven); !ok {
			return need("shaft method beta-given")
		}
	case KeyAlpha:
		if _, ok := unwrap(lm.Shaft).(shaft.AlphaGiven); !ok {
			return need("shaft method alpha-given")
		}
	case KeyNq:
		if _, ok := lm.Tip.(bearing.GivenNq); !ok {
			return need("tip method given-nq")
		}
	case KeyNc:
		switch lm.Tip.(type) {
		case bearing.GivenNq, bearing.GivenNc:
		default:
			return need("tip method given-nq or given-nc")
		}
	default:
		return &FieldError{Field: "key", Msg: fmt.Sprintf("%q: want one of %v or, for the whole calculation (no layer), %v", t.Key, LayerKeys, GlobalKeys)}
	}
	return nil
}

// unwrap returns the method inside a shaft.Capped.
func unwrap(m shaft.Unit) shaft.Unit {
	if c, ok := m.(shaft.Capped); ok {
		return c.Method
	}
	return m
}

// rewrap puts m back where the original method was capped.
func rewrap(orig, m shaft.Unit) shaft.Unit {
	if c, ok := orig.(shaft.Capped); ok {
		c.Method = m
		return c
	}
	return m
}

// NewEvaluator returns an evaluator for one worker.
func (pm *PileModel) NewEvaluator() (Evaluator, error) {
	if pm.fast != nil {
		return pm.fast, nil
	}
	g := &general{pm: pm}
	g.layers = make([]profile.LayerSpec, len(pm.ground.Layers))
	g.lm = make([]pile.LayerMethods, len(pm.methods.Layers))
	return g, nil
}

// general computes a sample through profile.New and pile.NewAnalysis.
type general struct {
	pm     *PileModel
	layers []profile.LayerSpec
	lm     []pile.LayerMethods
}

func (g *general) Capacity(x []float64) (Outcome, error) {
	pm := g.pm
	copy(g.layers, pm.ground.Layers)
	copy(g.lm, pm.methods.Layers)
	spec := pm.ground
	spec.Layers = g.layers
	m := pm.methods
	m.Layers = g.lm
	ft, fs := 1.0, 1.0
	for i, t := range pm.targets {
		v := x[i]
		if t.Layer < 0 {
			switch t.Key {
			case KeyWaterDepth:
				spec.WaterDepth = units.Length(v)
			case KeyTipFactor:
				ft = v
			case KeyShaftFactor:
				fs = v
			}
			continue
		}
		ls, lm := &g.layers[t.Layer], &g.lm[t.Layer]
		switch t.Key {
		case KeyFrictionAngle:
			ls.Phi = units.Angle(v)
		case KeyUndrainedStrength:
			if ls.Su != 0 {
				ls.Su = units.Stress(v)
			} else {
				mid := (ls.SuTop + ls.SuBottom) / 2
				ls.SuTop *= units.Stress(v) / mid
				ls.SuBottom *= units.Stress(v) / mid
			}
		case KeyUnitWeight, KeySaturatedUnitWeight:
			// profile.New reads 0 as "not given": a sampled 0 is refused
			// here, as any value out of range is.
			if !(v > 0) {
				return Outcome{}, &FieldError{Path: fmt.Sprintf("layers[%d].%s", t.Layer, t.Key), Msg: fmt.Sprintf("%.6g kN/m3 is outside (0, 35]", v/1e3)}
			}
			if t.Key == KeyUnitWeight {
				ls.UnitWeight = units.UnitWeight(v)
			} else {
				ls.SaturatedUnitWeight = units.UnitWeight(v)
			}
		case KeyK, KeyKOverK0, KeyKOverKp, KeyDelta, KeyDeltaOverPhi:
			b := unwrap(lm.Shaft).(shaft.Beta)
			switch t.Key {
			case KeyK:
				b.K = shaft.KGiven{K: v}
			case KeyKOverK0:
				b.K = shaft.KOverK0{Ratio: v}
			case KeyKOverKp:
				b.K = shaft.KOverKp{Ratio: v}
			case KeyDelta:
				b.Delta = shaft.DeltaGiven{Delta: units.Angle(v)}
			case KeyDeltaOverPhi:
				b.Delta = shaft.DeltaOverPhi{Ratio: v}
			}
			lm.Shaft = rewrap(lm.Shaft, b)
		case KeyBeta:
			lm.Shaft = rewrap(lm.Shaft, shaft.BetaGiven{Beta: v})
		case KeyAlpha:
			lm.Shaft = rewrap(lm.Shaft, shaft.AlphaGiven{Alpha: v})
		case KeyNq:
			tp := lm.Tip.(bearing.GivenNq)
			tp.Nq = v
			lm.Tip = tp
		case KeyNc:
			switch tp := lm.Tip.(type) {
			case bearing.GivenNq:
				tp.Nc = v
				lm.Tip = tp
			case bearing.GivenNc:
				tp.Nc = v
				lm.Tip = tp
			}
		}
	}
	if err := checkFactors(ft, fs); err != nil {
		return Outcome{}, err
	}
	prof, err := profile.New(spec)
	if err != nil {
		return Outcome{}, err
	}
	a, err := pile.NewAnalysis(prof, pm.pile, m, nil)
	if err != nil {
		return Outcome{}, err
	}
	c, err := a.CapacityAt(pm.pile.Tip())
	if err != nil {
		return Outcome{}, err
	}
	rest := float64(c.Compression - c.Tip - c.Shaft) // −W′ with gross self-weight
	return Outcome{
		Compression: ft*float64(c.Tip) + fs*float64(c.Shaft) + rest,
		Tension:     fs*float64(c.TensionShaft) + float64(c.Weight),
	}, nil
}

func checkFactors(ft, fs float64) error {
	if !(ft >= 0) || !finite(ft) {
		return &FieldError{Path: KeyTipFactor, Msg: fmt.Sprintf("%.6g is outside 0 to ∞", ft)}
	}
	if !(fs >= 0) || !finite(fs) {
		return &FieldError{Path: KeyShaftFactor, Msg: fmt.Sprintf("%.6g is outside 0 to ∞", fs)}
	}
	return nil
}
