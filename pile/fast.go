package pile

import (
	"math"
	"slices"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// interval is the stretch between two consecutive split depths: one layer,
// σ′v linear (or held constant below the critical depth).
type interval struct {
	top, bot float64
	layer    int
	s0, ds   float64 // σ′v for shaft friction = s0 + ds·(z − top)
	e0, de   float64 // σ′v itself (not held) = e0 + de·(z − top)
	held     bool    // below the critical depth
	noShaft  bool    // in a zone without shaft friction
	// drilledTop: in the top zone of a drilled-shaft α layer that carries
	// no side resistance (O'Neill & Reese 1999)
	drilledTop bool
	// check: the layer's method, integrated in closed form here, refused
	// the stresses at an end of the interval; segments inside it are then
	// checked at their own ends (see markRanges).
	check bool
}

// markRanges evaluates, once, the method of every closed-form interval at
// its two ends, and marks the intervals where it refuses its inputs, so that
// the closed forms never return what the method itself would refuse.
func (a *Analysis) markRanges() {
	for k := range a.iv {
		iv := &a.iv[k]
		lp := &a.plans[iv.layer]
		if lp.lambda || lp.noShaft || iv.noShaft || lp.kind == kindGeneral || lp.kind == kindCone {
			continue // a cone shaft's integral checks its own range
		}
		for _, z := range endPoints(iv.top, iv.bot) {
			if _, err := lp.shaft.Unit(a.point(lp, units.Length(z), units.Stress(iv.sigma(z)))); err != nil {
				iv.check = true
			}
		}
	}
}

// drilledTop is the depth down to which drilled-shaft α layers carry no
// side resistance: DrilledTopZone below the pile head, or below the design
// ground line where that is deeper.
func (a *Analysis) drilledTop() float64 {
	return max(float64(a.pile.HeadDepth), float64(a.prof.DesignGround())) + float64(DrilledTopZone)
}

func (iv *interval) sigma(z float64) float64 { return iv.s0 + iv.ds*(z-iv.top) }

// effective returns σ′v itself at z (not held below the critical depth).
func (iv *interval) effective(z float64) float64 { return iv.e0 + iv.de*(z-iv.top) }

// tipInterval returns the index of the interval that holds a tip at depth
// z: the interval below where z is a split (the layer below wins), the
// last one at the bottom of the profile. hint is tried first.
func (a *Analysis) tipInterval(z float64, hint int) int {
	n := len(a.iv)
	if hint >= 0 && hint < n {
		iv := &a.iv[hint]
		if iv.top <= z && z < iv.bot {
			return hint
		}
		if z == iv.bot && (hint == n-1 || a.iv[hint+1].top == z) {
			if hint == n-1 {
				return hint
			}
			return hint + 1
		}
	}
	lo, hi := 0, n-1
	for lo < hi {
		m := int(uint(lo+hi+1) >> 1)
		if a.iv[m].top <= z {
			lo = m
		} else {
			hi = m - 1
		}
	}
	return lo
}

// buildIntervals fills a.iv from a.splits.
func (a *Analysis) buildIntervals() error {
	a.iv = slices.Grow(a.iv[:0], len(a.splits))
	for k := 0; k+1 < len(a.splits); k++ {
		top, bot := a.splits[k], a.splits[k+1]
		li, err := a.prof.LayerAt(units.Length(top))
		if err != nil {
			return err
		}
		// σ′v from the top and the midpoint, so that a pore-pressure jump at
		// the bottom split is not picked up.
		st, err := a.prof.EffectiveStress(units.Length(top))
		if err != nil {
			return err
		}
		sm, err := a.prof.EffectiveStress(units.Length((top + bot) / 2))
		if err != nil {
			return err
		}
		iv := interval{top: top, bot: bot, layer: li, s0: float64(st), ds: 2 * (float64(sm) - float64(st)) / (bot - top)}
		iv.e0, iv.de = iv.s0, iv.ds
		// Critical depth: only β-family methods in drained layers hold σ′v.
		if a.zc > 0 && top >= a.zc && a.plans[li].held {
			iv.s0, iv.ds, iv.held = a.svc, 0, true
		}
		// No shaft in a zone, above the design ground line (excavation and
		// scour, which the profile makes a split), nor in the top
		// DrilledTopZone of drilled-shaft α layers, measured from where the
		// shaft meets the soil.
		mid := (top + bot) / 2
		iv.drilledTop = a.plans[li].drilled && mid < a.drilledTop()
		iv.noShaft = a.inZone(mid) || mid < float64(a.prof.DesignGround()) || iv.drilledTop
		a.iv = append(a.iv, iv)
	}
	return nil
}

// apiAlpha reports whether a shaft method is the API α (alone or capped),
// whose unit friction has kinks where ψ = su/σ′v equals 1 and 0.25.
func apiAlpha(m shaft.Unit) bool {
	if c, ok := m.(shaft.Capped); ok {
		m = c.Method
	}
	_, ok := m.(shaft.AlphaAPI)
	return ok
}

// kinkSplits returns the depths inside intervals of API-α layers where
// su(z) = c·σ′v(z) for c = 1 (the change of branch) and c = 0.25 (where
// α reaches its cap of 1), so that quadrature never straddles a kink.
func (a *Analysis) kinkSplits() []float64 {
	var out []float64
	for _, iv := range a.iv {
		lp := &a.plans[iv.layer]
		if lp.lambda || lp.noShaft || lp.kind != kindGeneral || !apiAlpha(lp.shaft) {
			continue
		}
		su0 := float64(lp.suAt(units.Length(iv.top)))
		su1 := float64(lp.suAt(units.Length(iv.bot)))
		h := iv.bot - iv.top
		for _, c := range [...]float64{1, 0.25} {
			// g(t) = su(t) − c·σ′v(t), linear in t ∈ [0, 1].
			g0 := su0 - c*iv.s0
			g1 := su1 - c*iv.sigma(iv.bot)
			if g0*g1 < 0 {
				tt := g0 / (g0 - g1)
				out = append(out, iv.top+tt*h)
			}
		}
	}
	return out
}

// tipModel is a layer's tip method reduced to its factors, for methods
// whose factors do not change with depth inside a layer: then
//
//	qp = C·Nc + min(k·q′·Nq, limit)   (limit on the friction term: Meyerhof)
//	qp = min(C·Nc + k·q′·Nq, limit)   (limit on the whole: the others)
//
// with C = c′ (drained) or su(z) (undrained), k = σ/q′ (1, or (1 + 2K0)/3
// for Vesic). The factors come from one evaluation of the method in the
// layer; tests check the model against the method at many depths.
type tipModel struct {
	ok      bool
	nq, nc  float64
	k       float64
	c       float64 // c′, when !useSu
	useSu   bool
	fixed   float64 // a depth-independent unlimited value (SPT method)
	limit   float64 // 0 for none
	limFric bool
	flags   bearing.Flags // flags of the reference evaluation that do not depend on depth (Clamped)
}

// buildTipModel decides whether the layer's tip method can be reduced to
// factors, and reads them.
func (a *Analysis) buildTipModel(lp *layerPlan) tipModel {
	var tm tipModel
	switch lp.tip.(type) {
	case bearing.Meyerhof:
		tm.limFric = true
	case bearing.Janbu, bearing.GivenNq, bearing.APISand:
	case bearing.Vesic:
		v := lp.tip.(bearing.Vesic)
		if lp.layer.Ir <= 0 || (v.Volume == bearing.VolumeCorrelated && lp.layer.Delta == 0) {
			return tm // Ir from G, or Δ from the correlation, depends on q′
		}
	case bearing.Skempton, bearing.GivenNc:
		tm.useSu = true
	case bearing.VesicUndrained:
		if lp.layer.Ir <= 0 {
			return tm
		}
		tm.useSu = true
	case bearing.ShaftSand, bearing.DrivenN60:
		tm.fixed = -1 // set below
	default:
		return tm
	}
	zm := float64(lp.layer.Top+lp.layer.Bottom) / 2
	in, err := a.tipInput(lp, zm)
	if err != nil {
		return tipModel{}
	}
	if in.Q <= 0 {
		in.Q = units.Kilopascal
	}
	r, err := lp.tip.Tip(in)
	if err != nil {
		return tipModel{}
	}
	tm.nq, tm.nc, tm.limit = r.Nq, r.Nc, float64(r.Limit)
	tm.flags = r.Flags & (bearing.Clamped | bearing.VolumeChangeIgnored) // the flags that do not change with depth
	if tm.fixed != 0 {
		tm.fixed = float64(r.Unlimited)
	} else {
		tm.k = float64(r.Sigma) / float64(in.Q)
		if !tm.useSu {
			tm.c = float64(r.C)
		}
	}
	tm.ok = true
	return tm
}

// eval returns the unlimited and limited unit tip resistance at effective
// stress q and undrained strength su.
func (tm *tipModel) eval(q, su float64) (unl, qp float64, limited bool) {
	if tm.fixed != 0 {
		unl = tm.fixed
		if tm.limit > 0 && unl > tm.limit {
			return unl, tm.limit, true
		}
		return unl, unl, false
	}
	c := tm.c
	if tm.useSu {
		c = su
	}
	fric := tm.k * q * tm.nq
	unl = tm.nc*c + fric
	if tm.limit <= 0 {
		return unl, unl, false
	}
	if tm.limFric {
		if fric > tm.limit {
			return unl, tm.nc*c + tm.limit, true
		}
		return unl, unl, false
	}
	if unl > tm.limit {
		return unl, tm.limit, true
	}
	return unl, unl, false
}

var _ = math.Inf
