package pile

import (
	"math"
	"slices"

	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// depthPlan is what capacity with depth decides once per interval: how
// its shaft is summed, and which rules of the tip zone can apply to a tip
// inside it.
type depthPlan struct {
	// closed: the shaft integral of the interval has a closed form that
	// holds from any depth in it to any other (β and α with a constant
	// factor, the API α with su constant) and the method accepts the
	// stresses along the whole interval: the running sum is carried from
	// the depth where the pile enters the interval, not built step by step.
	closed bool
	// The API α's antiderivative in σ′v: su, su^0.75 and su^0.5.
	su, su75, su5 float64
	// quickTip: the layer's tip reduces to factors (tipModel) and gives a
	// finite value at both ends of the interval, so at every depth in it.
	quickTip bool
	// The tip-zone rules of the layer (see baseRules and weakRule): the top
	// of the bearing stratum, the embedment (in m) below it within which
	// the embedment ramp or the layered rule can apply (−1: neither can),
	// and the top of the next layer (+Inf: none).
	zoneTop, zoneLen, nextTop float64
	// run: a depth inside the interval needs nothing but the closed form,
	// the tip model and the rules' checks (closed, quickTip, no drilled
	// zones); withDepth then takes it in its tight loop.
	run bool
	// The layer's rules of the tip zone, read by the tight loop: ramp (the
	// embedment ramp can apply) or layered (the layered rule can); for
	// the layered rule, the upper layer's value at its bottom and whether
	// it failed; zoneLen is then Lcr or 10·D.
	ramp, layered bool
	upBase        float64
	upErr         bool
	// For the weak-layer rule with one candidate (the next layer): its
	// value at its top after its rules and whether it failed, and the top
	// of the layer after it (+Inf: none).
	nextEff  float64
	nextErr  bool
	next2Top float64
	// Constants of the tight loop: the flags of every segment of the
	// interval, the tip model's own, the tension factor of the layer.
	shaftFlags, tipFlags Flags
	tension              float64
	// fast: a run interval that spanFast takes: a section that cannot
	// plug, and rules of the tip zone that need no other layer than the
	// next one (nor an error of the layer above) at any depth in it.
	fast bool
	// The next layer's own tip resistance at its top and whether it
	// failed (for the check of a weaker layer below).
	nextQpTop  float64
	nextErrTop bool
}

// prepareDepth fills the depth plan of every interval.
func (a *Analysis) prepareDepth() {
	if cap(a.dp) >= len(a.iv) {
		a.dp = a.dp[:len(a.iv)] // CapacityWithTips prepares one copy again and again
		clear(a.dp)
	} else {
		a.dp = make([]depthPlan, len(a.iv))
	}
	zd := float64(a.prof.DesignGround())
	d := a.size
	for k := range a.iv {
		iv := &a.iv[k]
		lp := &a.plans[iv.layer]
		p := &a.dp[k]
		li := iv.layer
		p.zoneTop = max(float64(lp.layer.Top), zd)
		first := li == 0 || float64(a.plans[li-1].layer.Bottom) <= zd
		p.zoneLen = -1
		switch {
		case first && lp.layer.Drainage == profile.Drained && !lp.spt:
			p.zoneLen = a.embedN * d
			p.ramp = true
		case !first:
			p.zoneLen = 10 * d
			p.layered = true
			p.upBase, p.upErr = a.plans[li-1].baseBot, a.plans[li-1].errBot != nil
		}
		p.nextTop, p.next2Top = math.Inf(1), math.Inf(1)
		if li+1 < len(a.plans) {
			p.nextTop = float64(a.plans[li+1].layer.Top)
			p.nextEff, p.nextErr = a.plans[li+1].effTop, a.plans[li+1].errEff != nil
		}
		if li+2 < len(a.plans) {
			p.next2Top = float64(a.plans[li+2].layer.Top)
		}
		if lp.tm.ok && !(a.useCase && lp.fTip == 0) {
			ok := true
			for _, z := range [2]float64{iv.top, iv.bot} {
				var su float64
				if lp.tm.useSu && lp.layer.HasSu {
					su = float64(lp.suAt(min(max(units.Length(z), lp.layer.Top), lp.layer.Bottom)))
				}
				_, qp, _ := lp.tm.eval(iv.effective(z), su)
				ok = ok && !math.IsNaN(qp) && !math.IsInf(qp, 0)
			}
			p.quickTip = ok
		}
		if lp.lambda || lp.noShaft || iv.noShaft || iv.check || (a.useCase && (lp.fShaft == 0 || lp.fTension == 0)) {
			continue
		}
		if lp.drilledOff {
			p.shaftFlags |= DrilledZonesOff
		}
		if iv.drilledTop {
			p.shaftFlags |= DrilledZones
		}
		if iv.held {
			p.shaftFlags |= CriticalDepthApplied
		}
		if lp.kind == kindBeta || lp.kind == kindAlpha {
			p.shaftFlags |= shaftFlags(lp.flags)
		}
		p.tipFlags = tipFlags(lp.tm.flags)
		p.tension = a.tension.For(lp.layer.Drainage)
		switch lp.kind {
		case kindBeta, kindAlpha:
			p.closed = true
		case kindAlphaAPI:
			// The closed form over the whole interval must be accepted, and
			// σ′v must change along it (else the method's own rule for a
			// constant σ′v applies, piece by piece).
			s0, s1 := iv.sigma(iv.top), iv.sigma(iv.bot)
			_, _, err := shaft.AlphaAPI{}.Integral(lp.su0, units.Stress(s0), units.Stress(s1), units.Length(iv.bot-iv.top))
			if err == nil && math.Abs(s1-s0) > 1e-6*max(s0, s1) {
				p.closed = true
				u := float64(lp.su0)
				p.su, p.su5 = u, math.Sqrt(u)
				p.su75 = p.su5 * math.Sqrt(p.su5)
			}
		}
		p.run = p.closed && p.quickTip && !a.drilled
		if li+1 < len(a.plans) {
			p.nextQpTop, p.nextErrTop = a.plans[li+1].qpTop, a.plans[li+1].errTop != nil
		}
		// lim = z + c grows with z, so a test at the bottom of the
		// interval holds for every depth inside it.
		weakOne := !(p.nextTop < iv.bot+WeakZoneRatio*d) || !p.nextErr && !(p.next2Top < iv.bot+WeakZoneRatio*d)
		p.fast = p.run && !a.pile.Section.CanPlug() && weakOne && !(p.next2Top < iv.bot+a.weakBelow*d) &&
			!(p.layered && a.methods.LayeredTip && p.upErr)
	}
}

// alphaAPIF is the antiderivative in σ′v of the API α's unit friction with
// su constant (see shaft.AlphaAPI.Integral), with s^1.25 = s·√√s and
// s^1.5 = s·√s:
//
//	F(σ) = 0.4·su^0.75·σ^1.25                         σ ≤ su
//	F(σ) = 0.4·su² + (1/3)·su^0.5·(σ^1.5 − su^1.5)     su ≤ σ ≤ 4su
//	F(σ) = (41/15)·su² + su·(σ − 4su)                  σ ≥ 4su
func (p *depthPlan) alphaAPIF(s float64) float64 {
	u := p.su
	switch {
	case s <= u:
		return 0.4 * p.su75 * s * math.Sqrt(math.Sqrt(s))
	case s <= 4*u:
		return 0.4*u*u + p.su5*(s*math.Sqrt(s)-u*p.su5)/3
	default:
		return 41.0/15*u*u + u*(s-4*u)
	}
}

// closedPart adds to s the shaft of closed interval k from z0 to z1
// (z0 < z1, both in it): the integral, its factored forms and the flags,
// as segment does. The pile's weight is the caller's: it is summed step by
// step, as Capacity sums it, so that it is the same to the last bit.
func (a *Analysis) closedPart(s *sums, k int, z0, z1 float64) {
	iv := &a.iv[k]
	lp := &a.plans[iv.layer]
	p := &a.dp[k]
	q, fl := a.closedIntegral(k, z0, z1)
	s.flags |= fl
	t := p.tension
	s.outer += q
	s.design += lp.fShaft * q
	s.tension += lp.fTension * t * q
	s.uplift += t * q
}

// closedIntegral returns the shaft integral of closed interval k from z0
// to z1 and the flags of the segment.
func (a *Analysis) closedIntegral(k int, z0, z1 float64) (float64, Flags) {
	iv := &a.iv[k]
	lp := &a.plans[iv.layer]
	p := &a.dp[k]
	fl := p.shaftFlags
	s0, s1 := iv.sigma(z0), iv.sigma(z1)
	var q float64
	switch lp.kind {
	case kindBeta:
		v, capped := linearIntegral(lp.coef, s0, s1, float64(lp.cap), z1-z0)
		q = v
		if capped {
			fl |= ShaftLimit
		}
	case kindAlpha:
		v, capped := linearIntegral(lp.coef, float64(lp.suAt(units.Length(z0))), float64(lp.suAt(units.Length(z1))), float64(lp.cap), z1-z0)
		q = v
		if capped {
			fl |= ShaftLimit
		}
	case kindAlphaAPI:
		q = (p.alphaAPIF(s1) - p.alphaAPIF(s0)) / iv.ds
		if max(s0, s1) > 4*p.su {
			fl |= BoundApplied
		}
	}
	return q, fl
}

// withDepth is WithDepth after its checks: one pass down the pile. The
// shaft of a closed interval (see depthPlan) is carried as one closed-form
// integral from where the pile enters it, committed to the running sums
// when the pile leaves it; every other interval is summed segment by
// segment as Capacity sums it. The tip takes the quick path of tipQuick.
func (a *Analysis) withDepth(from, step, to float64, n int, dst []Capacity) ([]Capacity, error) {
	head := float64(a.pile.HeadDepth)
	// At most n+1 rows: one allocation, not a doubling per row.
	dst = slices.Grow(dst, n+1)
	var s sums // committed: everything above prev, except the open interval
	open, openFrom := -1, 0.0
	prev := head
	k := a.intervalFrom(head, 0)
	for i := 0; i <= n; i++ {
		z := from + float64(i)*step
		if i == n {
			if to-prev <= 1e-9*step {
				break
			}
			z = to
		}
		z = min(z, to)
		// The tight loop: z inside the open interval, which is a run
		// interval, with no λ layer above.
		if open >= 0 && i < n && z > prev && z < a.iv[open].bot && a.dp[open].run && s.lamLen == 0 {
			var err error
			if a.dp[open].fast {
				i, prev, dst = a.spanFast(&s, open, openFrom, prev, from, step, to, i, n, dst)
			} else {
				i, prev, dst, err = a.runSpan(&s, open, openFrom, prev, from, step, to, i, n, dst)
			}
			if err != nil {
				return dst, err
			}
			i-- // the loop's increment brings i back to the first depth not taken
			continue
		}
		// Intervals between prev and z.
		handover := false
		for ; k < len(a.iv) && a.iv[k].top < z; k++ {
			iv := &a.iv[k]
			top, bot := iv.top, iv.bot
			if prev > top {
				top = prev
			}
			if z < bot {
				bot = z
			}
			if !(bot > top) {
				if iv.bot > z {
					break
				}
				continue
			}
			if a.dp[k].closed {
				if open != k {
					open, openFrom = k, top
				}
				if bot < iv.bot && a.dp[k].fast && s.lamLen == 0 && i < n {
					// z lies inside a fast interval the pile has just
					// entered: the tight loop takes it from its top, the
					// pile's weight too (the same product as pileWeight).
					handover, prev = true, top
					break
				}
				s.weight += a.pileWeight(top, bot)
				if bot < iv.bot {
					break // z lies inside: the interval stays open
				}
				a.closedPart(&s, k, openFrom, iv.bot)
				open = -1
				continue
			}
			s.k = k
			if err := a.segment(&s, iv, top, bot); err != nil {
				return dst, err
			}
			if bot < iv.bot {
				break
			}
		}
		if k >= len(a.iv) {
			k = len(a.iv) - 1
		}
		s.k = k
		if handover {
			i, prev, dst = a.spanFast(&s, open, openFrom, prev, from, step, to, i, n, dst)
			i--
			continue
		}
		prev = z
		dst = append(dst, Capacity{})
		c := &dst[len(dst)-1]
		var err error
		if open >= 0 {
			t := s
			a.closedPart(&t, open, openFrom, z)
			err = a.finish(&t, z, c)
		} else {
			err = a.finish(&s, z, c)
		}
		if err != nil {
			return dst[:len(dst)-1], err
		}
	}
	return dst, nil
}

// tipQuick is tipAt for a caller that needs no detail, with the cases
// decided per interval in advance (depthPlan): for a layer whose tip
// reduces to factors, it calls the rules of the tip zone only where they
// can apply and checks finiteness once per interval. It gives what tipAt
// gives; elsewhere it calls tipAt.
func (a *Analysis) tipQuick(z float64, out *tipResult, hint int) error {
	if !(z > float64(a.prof.DesignGround())) || !(z <= float64(a.prof.Depth())) {
		return a.tipAt(z, out, nil, hint)
	}
	k := a.tipInterval(z, hint)
	p := &a.dp[k]
	if !p.quickTip {
		return a.tipAt(z, out, nil, hint)
	}
	ivk := &a.iv[k]
	li := ivk.layer
	lp := &a.plans[li]
	sv := ivk.effective(z)
	var su float64
	if lp.tm.useSu && lp.layer.HasSu {
		su = float64(lp.suAt(min(max(units.Length(z), lp.layer.Top), lp.layer.Bottom)))
	}
	_, qp, limited := lp.tm.eval(sv, su)
	out.layer, out.qp, out.sigma, out.f, out.upper = li, qp, sv, lp.fTip, 0
	out.flags = tipFlags(lp.tm.flags)
	if limited {
		out.flags |= TipLimit
	}
	d := a.size
	out.own = out.qp
	out.embed = 1
	if z-p.zoneTop < p.zoneLen {
		q, upper, embed, err := a.baseRules(li, z, out.qp, &out.flags)
		if err != nil {
			return err
		}
		out.qp, out.upper, out.embed = q, upper, embed
	}
	out.weak = weakInfo{} // not filled: only the breakdown reads it, through tipAt
	if p.nextTop < z+WeakZoneRatio*d {
		q, err := a.weakRule(li, z, out.qp, &out.flags, nil)
		if err != nil {
			return err
		}
		out.qp = q
	}
	top := float64(lp.layer.Top)
	if z-top < d && li > 0 || float64(lp.layer.Bottom)-z < d && li < len(a.plans)-1 {
		out.flags |= TipNearBoundary
	}
	for k := li + 1; k < len(a.plans) && float64(a.plans[k].layer.Top) < z+a.weakBelow*d; k++ {
		if a.plans[k].errTop != nil || a.plans[k].qpTop < out.qp {
			out.flags |= WeakBelow
			break
		}
	}
	return nil
}
