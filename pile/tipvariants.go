package pile

import (
	"errors"
	"fmt"
	"reflect"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/shaft"
)

// CapacityWithTips returns, for each set of tip methods, the capacity with
// the tip at the pile's own tip depth when layer i's tip method is set[i]
// (where set[i] is not nil; a set shorter than the profile leaves the
// layers after it as they are), and the error, for each set: what
// NewAnalysis with Methods.Layers[i].Tip = set[i] followed by Capacity
// returns, to the bit. The tip methods change neither the shaft nor its
// split, so the shaft is integrated once for all sets and only the tip
// models and the rules of the tip zone are prepared again per set. It is
// the fast path of a comparison of tip methods.
func (a *Analysis) CapacityWithTips(sets [][]bearing.Tip) ([]Capacity, []error) {
	out := make([]Capacity, len(sets))
	errs := make([]error, len(sets))
	if a.useCase {
		// The design multipliers follow the tip methods' identifiers:
		// build each analysis whole.
		for j, set := range sets {
			m := a.methods
			m.Layers = make([]LayerMethods, max(len(a.methods.Layers), len(set)))
			copy(m.Layers, a.methods.Layers)
			for i, t := range set {
				if t != nil {
					m.Layers[i].Tip = t
				}
			}
			cs := a.cs
			b, err := NewAnalysis(a.prof, a.pile, m, &Options{Case: &cs})
			if err == nil {
				out[j], err = b.Capacity()
			}
			errs[j] = err
		}
		return out, errs
	}
	head, t := float64(a.pile.HeadDepth), float64(a.pile.Tip())
	var s sums
	shaftErr := a.addShaft(&s, head, t, nil, nil)
	// One copy of a serves every set in turn.
	b := *a
	b.plans, b.dp = make([]layerPlan, len(a.plans)), nil
	for j, set := range sets {
		err := b.withTips(a, set)
		if err == nil {
			err = shaftErr
		}
		if err == nil {
			ss := s
			err = b.finish(&ss, t, &out[j]) // on an error, the row as Capacity leaves it
		}
		errs[j] = err
	}
	return out, errs
}

// withTips makes b, a copy of a (without a design case) with plans and
// depth plans of its own, the analysis whose layer i takes tip method
// set[i] where that is not nil, prepared as NewAnalysis prepares it: the
// layer plans' tip fields as plan sets them (with its check of N60), the
// tip models, the tips at the layers' ends and the rules of the tip zone.
// Everything else is shared with a, read only.
func (b *Analysis) withTips(a *Analysis, set []bearing.Tip) error {
	copy(b.plans, a.plans)
	var errs []error
	for i, t := range set {
		if t == nil || i >= len(b.plans) {
			continue
		}
		lp := &b.plans[i]
		l := lp.layer
		lp.tip = t
		lp.spt = false
		switch t.(type) {
		case bearing.ShaftSand:
			lp.spt = true
		case bearing.BoredSand:
			lp.spt = l.N60 > 0
		}
		if l.N60 == 0 && needsN60Tip(t) {
			errs = append(errs, pathErrorf(fmt.Sprintf("layers[%d].n60", i), "layer %q has no N60 and its tip method %q needs it; give n60 (above 0, at most 300) or choose another tip method", l.Name, t.ID()))
			continue
		}
		lp.tm = b.buildTipModel(lp)
		lp.qpTop, lp.errTop = b.directTip(lp, float64(l.Top))
		lp.qpBot, lp.errBot = b.directTip(lp, float64(l.Bottom))
	}
	if err := errors.Join(errs...); err != nil {
		return err
	}
	b.prepareTipRules()
	return nil
}

// ShaftChoice is a layer's shaft method as LayerMethods gives it (Shaft,
// Lambda, LambdaValue), for WithShafts; Set false leaves the layer's own.
type ShaftChoice struct {
	Set         bool
	Shaft       shaft.Unit
	Lambda      bool
	LambdaValue float64
}

// WithShafts returns what NewAnalysis returns for a's profile, pile and
// design case with a's methods in which layer i takes the shaft method
// set[i] (where set[i].Set; a longer set than the profile is an error of
// NewAnalysis as a longer Methods.Layers is), to the bit. Without a design
// case the new analysis takes the tip models, the tips at the layers' ends
// and the rules of the tip zone from a: they read the layers' tip methods
// and parameters, the section and the tip options, never the shaft
// methods. It is the fast path of a comparison of shaft methods.
func (a *Analysis) WithShafts(set []ShaftChoice) (*Analysis, error) {
	m := a.methods
	m.Layers = make([]LayerMethods, max(len(a.methods.Layers), len(set)))
	copy(m.Layers, a.methods.Layers)
	for i, c := range set {
		if c.Set {
			lm := &m.Layers[i]
			lm.Shaft, lm.Lambda, lm.LambdaValue = c.Shaft, c.Lambda, c.LambdaValue
		}
	}
	if a.useCase {
		cs := a.cs
		return NewAnalysis(a.prof, a.pile, m, &Options{Case: &cs})
	}
	return newAnalysis(a.prof, a.pile, m, nil, a)
}

// HasShafts reports whether every layer that set changes (set[i].Set)
// already has that shaft method in a: the λ method with the same value, or
// an equal unit method (and no λ). Then WithShafts(set) builds an analysis
// equal to a, whose breakdown is a's. A false answer may be conservative
// (a layer's default method given by name).
func (a *Analysis) HasShafts(set []ShaftChoice) bool {
	if len(set) > len(a.plans) {
		return false
	}
	for i, c := range set {
		if !c.Set {
			continue
		}
		lp := &a.plans[i]
		if c.Lambda != lp.lambda || c.LambdaValue != lp.lamVal {
			return false
		}
		if c.Lambda && c.Shaft == nil {
			continue
		}
		if c.Shaft == nil || lp.shaft == nil {
			return false
		}
		if reflect.TypeOf(c.Shaft) != reflect.TypeOf(lp.shaft) || !reflect.DeepEqual(c.Shaft, lp.shaft) {
			return false
		}
	}
	return true
}
