package pile

import (
	"fmt"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// DefaultEmbedmentRatio is the critical embedment ratio (Lb/D)cr used by
// the embedment ramp when Methods.EmbedmentRatio is zero: 10, the ratio at
// which Meyerhof's (1976) SPT rule for driven piles in sand,
// qp = 0.4·pa·N60·L/D ≤ 4·pa·N60, reaches its limit (as presented by Das,
// chapter on pile foundations), and the ratio of his rule for a tip in a
// stronger layer below a weaker one.
const DefaultEmbedmentRatio = 10

// WeakZoneRatio is the depth of the zone above a weaker layer, in
// diameters, within which Meyerhof's (1976) rule reduces the unit tip
// resistance: 10.
const WeakZoneRatio = 10

// DrilledTopZone is the length below the pile head that carries no side
// resistance in layers using the drilled-shaft α (shaft.AlphaDrilled) for
// bored and augered piles: 1.5 m (5 ft), after O'Neill & Reese (1999) as
// given in FHWA GEC 10 (Brown et al. 2010). The bottom zone is one
// diameter above the tip.
const DrilledTopZone = 1.5 * units.Metre

// needsN60Tip reports whether a tip method reads N60 and has no meaning
// without it.
func needsN60Tip(t bearing.Tip) bool { return bearing.NeedsN60(t) }

// unwrapShaft returns the method inside a capped one.
func unwrapShaft(m shaft.Unit) shaft.Unit {
	if c, ok := m.(shaft.Capped); ok && c.Method != nil {
		return c.Method
	}
	return m
}

// needsN60Shaft reports whether a shaft method reads N60 and has no
// meaning without it.
func needsN60Shaft(m shaft.Unit) bool {
	switch unwrapShaft(m).(type) {
	case shaft.DrilledSand, shaft.DrivenN60:
		return true
	}
	return false
}

// betaFamily reports whether a shaft method is of the β family (fs
// proportional to σ′v), the methods to which a critical depth applies.
func betaFamily(m shaft.Unit) bool {
	switch unwrapShaft(m).(type) {
	case shaft.Beta, shaft.BetaGiven, shaft.Burland, shaft.APIBeta, shaft.DrilledSand, shaft.DrilledSandK0:
		return true
	}
	return false
}

// drilledAlpha reports whether a shaft method is the drilled-shaft α.
func drilledAlpha(m shaft.Unit) bool {
	_, ok := unwrapShaft(m).(shaft.AlphaDrilled)
	return ok
}

// weakInfo is what Meyerhof's weak-layer rule used at one tip depth.
type weakInfo struct {
	ok     bool
	layer  int     // the governing weaker layer
	strong float64 // q_strong: the bearing layer's qp before the rule
	weak   float64 // q_weak: the weaker layer's qp at its top
	h      float64 // H: distance from the tip down to the weaker layer
}

// baseRules applies to q, the unit tip resistance of layer li's own method
// at depth z, the embedment ramp and the layered rule (in that order), and
// returns the result, the upper layer's value where the layered rule
// applied, and the embedment factor (1 where the ramp does not apply).
//
// Embedment ramp (Meyerhof 1976; Das, chapter on pile foundations: qp
// grows with the embedment Lb in the bearing stratum up to the critical
// embedment ratio): in a drained top layer, with Lcr = (Lb/D)cr·D, for the
// tip methods built on bearing factors and Meyerhof's driven-pile SPT rule
// (not the drilled and bored SPT rules, whose correlation already covers
// embedment),
//
//	qp = q·Lb/Lcr   (Lb < Lcr)
//
// Layered rule (Meyerhof 1976), less than 10 D into a stronger layer:
//
//	qp = q_upper + (q − q_upper)·Lb/(10·D)
//
// with q_upper the upper layer's value at the interface after these same
// rules, so that qp is continuous in depth.
func (a *Analysis) baseRules(li int, z, q float64, fl *Flags) (qp, upper, embed float64, err error) {
	lp := &a.plans[li]
	if lp.cone {
		return q, 0, 1, nil
	}
	d := a.size
	// Below an excavation or scour the bearing stratum starts at the
	// design ground line, and a layer wholly above it is gone.
	zd := float64(a.prof.DesignGround())
	top := max(float64(lp.layer.Top), zd)
	first := li == 0 || float64(a.plans[li-1].layer.Bottom) <= zd
	embed = 1
	if first && lp.layer.Drainage == profile.Drained && !lp.spt {
		if lcr := a.embedN * d; z-top < lcr && q > 0 {
			if a.methods.NoEmbedment {
				*fl |= EmbedmentOff
			} else {
				embed = (z - top) / lcr
				q *= embed
				*fl |= EmbedmentRamp
			}
		}
	}
	if !first && z-top < 10*d {
		up := &a.plans[li-1]
		switch {
		case !a.methods.LayeredTip:
			if up.errBot != nil || up.baseBot < q {
				*fl |= LayeredTipOff
			}
		case up.errBot != nil:
			return 0, 0, 0, pathErrorf(fmt.Sprintf("layers[%d].tip", li-1), "layer %q, needed for the layered-tip rule at %.4g m: %w", up.layer.Name, top, up.errBot)
		case up.baseBot < q:
			upper = up.baseBot
			q = upper + (q-upper)*(z-top)/(10*d)
			*fl |= LayeredTip
		}
	}
	return q, upper, embed, nil
}

// weakRule applies Meyerhof's (1976) rule for a tip at depth z in layer li
// within WeakZoneRatio diameters above a weaker layer k:
//
//	qp = q_weak + (q_strong − q_weak)·H/(10·D) ≤ q_strong
//
// with q_strong = q (the bearing layer's value after baseRules), q_weak the
// weaker layer's unit tip resistance at its top (after its own rules) and
// H the distance from the tip down to it; with several weaker layers the
// least result governs. A layer whose tip resistance cannot be evaluated is
// an error here, since the rule cannot be checked without it.
func (a *Analysis) weakRule(li int, z, q float64, fl *Flags, w *weakInfo) (float64, error) {
	if a.plans[li].cone {
		return q, nil
	}
	d := a.size
	lim := z + WeakZoneRatio*d
	best := q
	for k := li + 1; k < len(a.plans) && float64(a.plans[k].layer.Top) < lim; k++ {
		pk := &a.plans[k]
		if pk.errEff != nil {
			if a.methods.NoWeakLayer {
				*fl |= WeakLayerOff
				continue
			}
			return 0, pathErrorf(fmt.Sprintf("layers[%d].tip", k), "layer %q, needed for the weak-layer rule with the tip at %.4g m: %w", pk.layer.Name, z, pk.errEff)
		}
		if !(pk.effTop < q) {
			continue
		}
		if a.methods.NoWeakLayer {
			*fl |= WeakLayerOff
			continue
		}
		h := float64(pk.layer.Top) - z
		v := pk.effTop + (q-pk.effTop)*h/(WeakZoneRatio*d)
		if v < best {
			best = v
			if w != nil {
				*w = weakInfo{ok: true, layer: k, strong: q, weak: pk.effTop, h: h}
			}
		}
	}
	if best < q {
		*fl |= WeakLayerReduced
	}
	return best, nil
}

// prepareTipRules evaluates, once, each layer's tip after the rules at its
// top and bottom: top-down for the embedment ramp and the layered rule
// (which read the layer above), then bottom-up for the weak-layer rule
// (which reads the layers below).
func (a *Analysis) prepareTipRules() {
	for i := range a.plans {
		lp := &a.plans[i]
		var fl Flags
		if lp.errTop == nil {
			lp.baseTop, _, _, lp.errTop = a.baseRules(i, float64(lp.layer.Top), lp.qpTop, &fl)
		}
		if lp.errBot == nil {
			lp.baseBot, _, _, lp.errBot = a.baseRules(i, float64(lp.layer.Bottom), lp.qpBot, &fl)
		}
	}
	for i := len(a.plans) - 1; i >= 0; i-- {
		lp := &a.plans[i]
		lp.effTop, lp.errEff = lp.baseTop, lp.errTop
		if lp.errEff == nil {
			var fl Flags
			lp.effTop, lp.errEff = a.weakRule(i, float64(lp.layer.Top), lp.baseTop, &fl, nil)
		}
	}
	a.prepareDepth()
}
