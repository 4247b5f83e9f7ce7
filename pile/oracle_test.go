package pile

// This file keeps the implementation of capacity with depth as it was
// before its speed work (one pass with running sums, every depth through
// the general tip and finishing code), as the oracle of
// TestWithDepthMatchesOracle. It is test code only: change it never, except
// to follow a change of behaviour made on purpose in both.

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// WithDepth returns the capacity for tip depths from `from` to `to` in steps
// of step (the last depth is `to` if the steps do not land on it), in one
// pass with running sums along the shaft. Rows are appended to dst.
func (a *Analysis) oracleWithDepth(from, to, step units.Length, dst []Capacity) ([]Capacity, error) {
	head := a.pile.HeadDepth
	if !(from > head) || to > a.prof.Depth() || !(to >= from) {
		return dst, fmt.Errorf("pile: depth range %v to %v: want below the head (%v) and within the profile (to %v)", from, to, head, a.prof.Depth())
	}
	if !(step > 0) || math.IsInf(float64(step), 0) {
		return dst, fmt.Errorf("pile: step %v is outside (0, ∞) m", step)
	}
	n := int(math.Floor(float64((to-from)/step)+1e-9)) + 1
	if n > 1e6 {
		return dst, fmt.Errorf("pile: %d depths asked for; at most 1e6", n)
	}
	var s sums
	prev := float64(head)
	for i := 0; i <= n; i++ {
		z := float64(from) + float64(i)*float64(step)
		if i == n {
			if float64(to)-prev <= 1e-9*float64(step) {
				break
			}
			z = float64(to)
		}
		z = min(z, float64(to))
		if err := a.oracleAddShaft(&s, prev, z); err != nil {
			return dst, err
		}
		prev = z
		dst = append(dst, Capacity{})
		if err := a.oracleFinish(&s, z, &dst[len(dst)-1]); err != nil {
			return dst[:len(dst)-1], err
		}
	}
	return dst, nil
}

// addShaft adds the shaft from z0 to z1 (z0 < z1) to s, interval by
// interval.
func (a *Analysis) oracleAddShaft(s *sums, z0, z1 float64) error {
	for k := a.oracleIntervalFrom(z0, s.k); k < len(a.iv) && a.iv[k].top < z1; k++ {
		s.k = k
		iv := &a.iv[k]
		top, bot := iv.top, iv.bot // plain comparisons: min and max handle NaN and cost more here
		if z0 > top {
			top = z0
		}
		if z1 < bot {
			bot = z1
		}
		if bot > top {
			if err := a.oracleSegment(s, iv, top, bot); err != nil {
				return err
			}
		}
	}
	return nil
}

// intervalFrom returns the index of the interval holding z0: the hint if
// it holds it, else by binary search.
func (a *Analysis) oracleIntervalFrom(z0 float64, hint int) int {
	lo, hi := 0, len(a.iv)-1
	if k := hint; k >= 0 && k < len(a.iv) && a.iv[k].top <= z0 && z0 < a.iv[k].bot {
		return k
	}
	for lo < hi {
		m := int(uint(lo+hi+1) >> 1)
		if a.iv[m].top <= z0 {
			lo = m
		} else {
			hi = m - 1
		}
	}
	return lo
}

// drilledBottom returns the shaft integrals (plain, design, tension, uplift)
// over [z0, z1] in layers with the drilled-shaft zones in force: the part
// of the bottom diameter that carries no side resistance.
func (a *Analysis) oracleDrilledBottom(z0, z1 float64, hint int) (out sums, err error) {
	if !(z1 > z0) {
		return out, nil
	}
	for k := a.oracleIntervalFrom(z0, hint); k < len(a.iv) && a.iv[k].top < z1; k++ {
		iv := &a.iv[k]
		if !a.plans[iv.layer].drilled || iv.noShaft {
			continue
		}
		top, bot := max(z0, iv.top), min(z1, iv.bot)
		if !(bot > top) {
			continue
		}
		var t sums
		if err := a.oracleSegment(&t, iv, top, bot); err != nil {
			return sums{}, err
		}
		out.outer += t.outer
		out.design += t.design
		out.tension += t.tension
		out.uplift += t.uplift
	}
	return out, nil
}

// segment integrates the part [z0, z1] of interval iv.
func (a *Analysis) oracleSegment(s *sums, iv *interval, z0, z1 float64) error {
	lp := &a.plans[iv.layer]
	h := z1 - z0
	s0, s1 := iv.sigma(z0), iv.sigma(z1)
	s.weight += a.oraclePileWeight(z0, z1)
	if lp.drilledOff {
		s.flags |= DrilledZonesOff
	}
	if iv.drilledTop {
		s.flags |= DrilledZones
	}
	if lp.noShaft || iv.noShaft {
		return nil
	}
	if a.useCase && (lp.fShaft == 0 || lp.fTension == 0) {
		return a.missingFactor(iv.layer, ShaftResistance)
	}
	if iv.held {
		s.flags |= CriticalDepthApplied
	}
	if lp.lambda {
		s.lamSig += (s0 + s1) / 2 * h
		s.lamSu += float64(lp.suAt(units.Length(z0))+lp.suAt(units.Length(z1))) / 2 * h
		s.lamLen += h
		s.lamF, s.lamFt, s.lamVal = lp.fShaft, lp.fTension, lp.lamVal
		return nil
	}
	if iv.check && lp.kind != kindGeneral {
		for _, z := range endPoints(z0, z1) {
			if _, err := lp.shaft.Unit(a.point(lp, units.Length(z), units.Stress(iv.sigma(z)))); err != nil {
				return pathErrorf(fmt.Sprintf("layers[%d].shaft", iv.layer), "layer %q at %.4g m: %w", lp.layer.Name, z, err)
			}
		}
	}
	var q float64
	switch lp.kind {
	case kindBeta:
		v, capped := linearIntegral(lp.coef, s0, s1, float64(lp.cap), h)
		q = v
		if capped {
			s.flags |= ShaftLimit
		}
		s.flags |= shaftFlags(lp.flags)
	case kindAlpha:
		v, capped := linearIntegral(lp.coef, float64(lp.suAt(units.Length(z0))), float64(lp.suAt(units.Length(z1))), float64(lp.cap), h)
		q = v
		if capped {
			s.flags |= ShaftLimit
		}
		s.flags |= shaftFlags(lp.flags)
	case kindAlphaAPI:
		v, fl, err := shaft.AlphaAPI{}.Integral(lp.su0, units.Stress(s0), units.Stress(s1), units.Length(h))
		if err != nil {
			return pathErrorf(fmt.Sprintf("layers[%d].shaft", iv.layer), "layer %q at %.4g to %.4g m: %w", lp.layer.Name, z0, z1, err)
		}
		q = float64(v)
		s.flags |= shaftFlags(fl)
	default:
		v, fl, err := a.quad(lp, z0, z1, s0, s1, 0)
		if err != nil {
			return pathErrorf(fmt.Sprintf("layers[%d].shaft", iv.layer), "layer %q at %.4g to %.4g m: %w", lp.layer.Name, z0, z1, err)
		}
		q = v
		s.flags |= fl
	}
	t := a.tension.For(lp.layer.Drainage)
	s.outer += q
	s.design += lp.fShaft * q
	s.tension += lp.fTension * t * q
	s.uplift += t * q
	return nil
}

// pileWeight returns the effective weight of the pile between depths z0
// and z1: γp·A above the water table and (γp − γw)·A below it, with A the
// material area.
func (a *Analysis) oraclePileWeight(z0, z1 float64) float64 {
	if a.pile.UnitWeight == 0 {
		return 0
	}
	g := float64(a.pile.UnitWeight)
	gw := float64(a.prof.WaterUnitWeight())
	zw, wet := a.prof.WaterDepth()
	if !wet || float64(zw) >= z1 {
		return g * a.mat * (z1 - z0)
	}
	if float64(zw) <= z0 {
		return (g - gw) * a.mat * (z1 - z0)
	}
	return g*a.mat*(float64(zw)-z0) + (g-gw)*a.mat*(z1-float64(zw))
}

// finish adds the λ part and the tip, and assembles the capacity.
func (a *Analysis) oracleFinish(s *sums, t float64, c *Capacity) error {
	*c = Capacity{TipDepth: units.Length(t)}
	outer, design, tension, uplift := s.outer, s.design, s.tension, s.uplift
	var lamFlags Flags
	if s.lamLen > 0 {
		L := t - float64(a.pile.HeadDepth)
		r, err := a.lambdaAverage(s.lamVal, units.Length(L), units.Stress(s.lamSig/s.lamLen), units.Stress(s.lamSu/s.lamLen))
		if err != nil {
			return fmt.Errorf("shaft (λ method): %w", err)
		}
		fav := float64(r.Fav)
		lamFlags = shaftFlags(r.Flags)
		q := fav * s.lamLen
		tu := a.tension.For(profile.Undrained) // λ layers are undrained
		outer += q
		design += s.lamF * q
		tension += s.lamFt * tu * q
		uplift += tu * q
	}
	var zoneFlags Flags
	if a.drilled {
		// No side resistance in the bottom diameter of drilled-shaft α layers.
		z, err := a.oracleDrilledBottom(max(t-a.size, float64(a.pile.HeadDepth)), t, s.k)
		if err != nil {
			return err
		}
		if z.outer != 0 {
			outer -= z.outer
			design -= z.design
			tension -= z.tension
			uplift -= z.uplift
			zoneFlags = DrilledZones
		}
	}
	var tr tipResult
	if err := a.oracleTipAt(t, &tr, nil, s.k); err != nil {
		return err
	}
	qp := tr.qp
	if a.methods.SelfWeight == WeightNet {
		qp = max(0, qp-tr.sigma)
	}
	c.UnitTip = units.Stress(qp)
	c.Flags = s.flags | tr.flags | lamFlags | zoneFlags
	c.Weight = units.Force(s.weight)
	// Modes: plugged (gross area, outer perimeter) and unplugged (material
	// area, outer plus inner perimeter).
	plTip, plShaft := qp*a.gross, outer*a.outer
	plDes := tr.f*qp*a.gross + design*a.outer
	c.Plugged = true
	c.Tip, c.Shaft = units.Force(plTip), units.Force(plShaft)
	desC := plDes
	tenShaft, tenDes := uplift*a.outer, tension*a.outer
	if a.pile.Section.CanPlug() {
		unTip, unShaft := qp*a.mat, outer*(a.outer+a.inner)
		unDes := tr.f*qp*a.mat + design*(a.outer+a.inner)
		// The lesser mode: on the design resistance in a design case (the
		// factors on tip and shaft differ), else on the characteristic one.
		lesserUn := unTip+unShaft < plTip+plShaft
		if a.useCase {
			lesserUn = unDes < plDes
		}
		useUn := a.pile.Plug == Unplugged || (a.pile.Plug == PlugLesser && lesserUn)
		if useUn {
			c.Plugged = false
			c.Tip, c.Shaft = units.Force(unTip), units.Force(unShaft)
			desC = unDes
			if a.pile.Plug == PlugLesser {
				c.Flags |= UnpluggedGoverns
			}
		}
		if a.pile.Plug == Unplugged {
			tenShaft, tenDes = uplift*(a.outer+a.inner), tension*(a.outer+a.inner)
		}
	}
	c.Compression = c.Tip + c.Shaft
	if a.methods.SelfWeight == WeightGross {
		c.Compression -= c.Weight
		desC -= s.weight
		if c.Compression < 0 {
			c.Flags |= WeightExceedsResistance
		}
	}
	c.TensionShaft = units.Force(tenShaft)
	c.Tension = c.TensionShaft + c.Weight
	c.DesignCompression = units.Force(desC)
	c.DesignTension = units.Force(tenDes + a.upliftWeight()*s.weight)
	return nil
}

// tipAt sets out to the unit tip resistance with the tip at depth z. With
// detail nil, a layer whose tip method reduces to factors (tipModel) is
// evaluated from them; otherwise the method is called and its input and
// result are stored in detail (for the breakdown).
func (a *Analysis) oracleTipAt(z float64, out *tipResult, detail *tipDetail, hint int) error {
	direct := detail != nil
	if !(z >= 0 && z <= float64(a.prof.Depth())) {
		return fmt.Errorf("pile: tip depth %.4g m is outside the profile (0 to %v)", z, a.prof.Depth())
	}
	if z <= float64(a.prof.DesignGround()) {
		// No soil at or above the design ground line: no tip (a tip
		// there only occurs in capacity with depth).
		*out = tipResult{f: 1}
		return nil
	}
	ivk := &a.iv[a.oracleTipInterval(z, hint)]
	li := ivk.layer
	lp := &a.plans[li]
	if a.useCase && lp.fTip == 0 {
		return a.missingFactor(li, TipResistance)
	}
	if !direct && lp.tm.ok {
		sv := ivk.effective(z)
		var su float64
		if lp.tm.useSu && lp.layer.HasSu {
			su = float64(lp.suAt(min(max(units.Length(z), lp.layer.Top), lp.layer.Bottom)))
		}
		_, qp, limited := lp.tm.oracleEval(sv, su)
		out.layer, out.qp, out.sigma, out.f, out.upper = li, qp, sv, lp.fTip, 0
		out.flags = tipFlags(lp.tm.flags)
		if limited {
			out.flags |= TipLimit
		}
	} else {
		in, err := a.tipInput(lp, z)
		if err != nil {
			return err
		}
		r, err := lp.tip.Tip(in)
		if err != nil {
			return pathErrorf(fmt.Sprintf("layers[%d].tip", li), "layer %q at %.4g m: %w", lp.layer.Name, z, err)
		}
		*out = tipResult{layer: li, qp: float64(r.Qp), sigma: float64(in.Q), f: lp.fTip}
		out.flags = tipFlags(r.Flags)
		if detail != nil {
			detail.in, detail.res = in, r
		}
	}
	d := a.size
	top := float64(lp.layer.Top)
	out.own = out.qp
	q, upper, embed, err := a.baseRules(li, z, out.qp, &out.flags)
	if err != nil {
		return err
	}
	out.upper, out.embed = upper, embed
	out.weak = weakInfo{}
	q, err = a.weakRule(li, z, q, &out.flags, &out.weak)
	if err != nil {
		return err
	}
	out.qp = q
	if z-top < d && li > 0 || float64(lp.layer.Bottom)-z < d && li < len(a.plans)-1 {
		out.flags |= TipNearBoundary
	}
	// A weaker layer within WeakBelow diameters below the tip (a layer
	// whose tip resistance cannot be evaluated counts as weaker).
	for k := li + 1; k < len(a.plans) && float64(a.plans[k].layer.Top) < z+a.weakBelow*d; k++ {
		if a.plans[k].errTop != nil || a.plans[k].qpTop < out.qp {
			out.flags |= WeakBelow
			break
		}
	}
	if math.IsNaN(out.qp) || math.IsInf(out.qp, 0) {
		return pathErrorf(fmt.Sprintf("layers[%d].tip", li), "layer %q: no finite resistance at %.4g m", lp.layer.Name, z)
	}
	return nil
}

// tipInterval returns the index of the interval that holds a tip at depth
// z: the interval below where z is a split (the layer below wins), the
// last one at the bottom of the profile. hint is tried first.
func (a *Analysis) oracleTipInterval(z float64, hint int) int {
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

// eval returns the unlimited and limited unit tip resistance at effective
// stress q and undrained strength su.
func (tm *tipModel) oracleEval(q, su float64) (unl, qp float64, limited bool) {
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
