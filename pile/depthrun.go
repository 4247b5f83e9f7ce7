package pile

import (
	"math"
	"slices"
	"sort"

	"github.com/qultgeo/qult/units"
)

// runSpan is the tight loop of capacity with depth: the depths i, i+1, …
// (below n) that lie inside run interval k (see depthPlan), which the pile
// entered at openFrom, with the committed sums s (the pile's weight to
// prev). Everything that does not change from one depth to the next in
// the interval (the interval's and layer's constants, the closed form's
// value at openFrom, the design multipliers, the tip model, the pile's
// weight per metre, the cross-section) is read once; each depth then
// costs the closed form at z, the tip model, the checks of the tip-zone
// rules and the assembly. It gives what closedPart, finish and tipQuick
// give, operation for operation (so the same bits), and returns the first
// depth it did not take, prev, dst and any error of the rules (the rows
// before it kept).
func (a *Analysis) runSpan(s *sums, k int, openFrom, prev, from, step, to float64, i, n int, dst []Capacity) (int, float64, []Capacity, error) {
	iv := &a.iv[k]
	p := &a.dp[k]
	lp := &a.plans[iv.layer]
	li := iv.layer
	d := a.size
	ivTop, ivBot := iv.top, iv.bot
	sS0, sDs := iv.s0, iv.ds // σ′v for the shaft
	eE0, eDe := iv.e0, iv.de // σ′v itself
	// The closed form's lower end.
	s0 := iv.sigma(openFrom)
	kind := lp.kind
	coef, capv := lp.coef, float64(lp.cap)
	var g0, f0, apiF0, su4 float64
	suVaries := lp.su0 != lp.su1 && lp.layer.Bottom > lp.layer.Top
	switch kind {
	case kindBeta:
		g0 = s0
	case kindAlpha:
		g0 = float64(lp.suAt(units.Length(openFrom)))
	case kindAlphaAPI:
		apiF0 = p.alphaAPIF(s0)
		su4 = 4 * p.su
	}
	f0 = coef * g0
	// Sums and multipliers.
	t := p.tension
	fShaft, fTen := lp.fShaft, lp.fTension*t
	fTip := lp.fTip
	outer0, design0, tension0, uplift0 := s.outer, s.design, s.tension, s.uplift
	flags0 := s.flags | p.shaftFlags | p.tipFlags
	weight := s.weight
	// The pile's weight per metre above and below the water table (see
	// pileWeight: the same products, so the same bits).
	var wDry, wWet, zw float64
	weighted := a.pile.UnitWeight != 0
	if weighted {
		g := float64(a.pile.UnitWeight)
		gw := float64(a.prof.WaterUnitWeight())
		z, wet := a.prof.WaterDepth()
		zw = math.Inf(1)
		if wet {
			zw = float64(z)
		}
		wDry, wWet = g*a.mat, (g-gw)*a.mat
	}
	// The tip model.
	tm := &lp.tm
	tmSu := tm.useSu && lp.layer.HasSu
	lTop, lBot := lp.layer.Top, lp.layer.Bottom
	// The rules of the tip zone.
	zoneTop, zoneLen := p.zoneTop, p.zoneLen
	nextTop, next2Top, nextEff := p.nextTop, p.next2Top, p.nextEff
	oneWeak := !p.nextErr
	weakZone := WeakZoneRatio * d
	weakBelow := a.weakBelow * d
	noEmbed, layeredOn, noWeak := a.methods.NoEmbedment, a.methods.LayeredTip, a.methods.NoWeakLayer
	nearTop := li > 0
	nearBot := li < len(a.plans)-1
	layerTop, layerBot := float64(lTop), float64(lBot)
	// The assembly (see assemble); a section that can plug takes assemble.
	solid := !a.pile.Section.CanPlug()
	net, gross := a.methods.SelfWeight == WeightNet, a.methods.SelfWeight == WeightGross
	aGross, aOuter := a.gross, a.outer
	upW := a.upliftWeight()
	if cap(dst)-len(dst) < n-i {
		dst = slices.Grow(dst, n-i)
	}
	for ; i < n; i++ {
		z := min(from+float64(i)*step, to)
		if !(z > prev && z < ivBot) {
			break
		}
		if weighted {
			switch {
			case zw >= z:
				weight += wDry * (z - prev)
			case zw <= prev:
				weight += wWet * (z - prev)
			default:
				weight += a.pileWeight(prev, z)
			}
		}
		prev = z
		// The shaft, as closedIntegral.
		s1 := sS0 + sDs*(z-ivTop)
		h := z - openFrom
		var q float64
		fl := flags0
		switch kind {
		case kindBeta, kindAlpha:
			g1 := s1
			if kind == kindAlpha {
				g1 = float64(lp.su0)
				if suVaries {
					g1 = float64(lp.suAt(units.Length(z)))
				}
			}
			f1 := coef * g1
			if capv <= 0 || (f0 <= capv && f1 <= capv) {
				q = (f0 + f1) / 2 * h
			} else {
				q, _ = linearIntegral(coef, g0, g1, capv, h)
				fl |= ShaftLimit
			}
		case kindAlphaAPI:
			q = (p.alphaAPIF(s1) - apiF0) / sDs
			if max(s0, s1) > su4 {
				fl |= BoundApplied
			}
		}
		// The tip, as tipQuick.
		sv := eE0 + eDe*(z-ivTop)
		var su float64
		if tmSu {
			su = float64(lp.suAt(min(max(units.Length(z), lTop), lBot)))
		}
		_, qp, limited := tm.eval(sv, su)
		if limited {
			fl |= TipLimit
		}
		// baseRules, decided in advance (see there for the rules).
		if lb := z - zoneTop; lb < zoneLen {
			switch {
			case p.ramp && qp > 0:
				if noEmbed {
					fl |= EmbedmentOff
				} else {
					qp *= lb / zoneLen
					fl |= EmbedmentRamp
				}
			case p.layered:
				switch {
				case !layeredOn:
					if p.upErr || p.upBase < qp {
						fl |= LayeredTipOff
					}
				case p.upErr:
					var tf Flags
					_, _, _, err := a.baseRules(li, z, qp, &tf) // the error, worded there
					return i, prev, dst, err
				case p.upBase < qp:
					qp = p.upBase + (qp-p.upBase)*lb/(10*d)
					fl |= LayeredTip
				}
			}
		}
		if lim := z + weakZone; nextTop < lim {
			if !(next2Top < lim) && oneWeak {
				// weakRule with its one candidate, the next layer.
				if nextEff < qp {
					if noWeak {
						fl |= WeakLayerOff
					} else if v := nextEff + (qp-nextEff)*(nextTop-z)/weakZone; v < qp {
						qp = v
						fl |= WeakLayerReduced
					}
				}
			} else {
				var tf Flags
				v, err := a.weakRule(li, z, qp, &tf, nil)
				if err != nil {
					return i, prev, dst, err
				}
				qp = v
				fl |= tf
			}
		}
		if z-layerTop < d && nearTop || layerBot-z < d && nearBot {
			fl |= TipNearBoundary
		}
		if nextTop < z+weakBelow {
			for j := li + 1; j < len(a.plans) && float64(a.plans[j].layer.Top) < z+weakBelow; j++ {
				if a.plans[j].errTop != nil || a.plans[j].qpTop < qp {
					fl |= WeakBelow
					break
				}
			}
		}
		outer, design, tension, uplift := outer0+q, design0+fShaft*q, tension0+fTen*q, uplift0+t*q
		if !solid {
			dst = append(dst, Capacity{TipDepth: units.Length(z)})
			a.assemble(&dst[len(dst)-1], qp, sv, fTip, outer, design, tension, uplift, weight, fl)
			continue
		}
		// assemble for a section that cannot plug.
		if net {
			qp = max(0, qp-sv)
		}
		tip, shf := units.Force(qp*aGross), units.Force(outer*aOuter)
		desC := fTip*qp*aGross + design*aOuter
		comp := tip + shf
		w := units.Force(weight)
		if gross {
			comp -= w
			desC -= weight
			if comp < 0 {
				fl |= WeightExceedsResistance
			}
		}
		tenShaft := units.Force(uplift * aOuter)
		// Stored field by field into the row (a composite literal would be
		// built on the stack and copied, a store-forwarding stall).
		dst = dst[:len(dst)+1]
		c := &dst[len(dst)-1]
		c.TipDepth, c.UnitTip, c.Tip, c.Shaft, c.Weight = units.Length(z), units.Stress(qp), tip, shf, w
		c.Compression, c.TensionShaft, c.Tension = comp, tenShaft, tenShaft+w
		c.DesignCompression, c.DesignTension = units.Force(desC), units.Force(tension*aOuter+upW*weight)
		c.Plugged, c.Flags = true, fl
	}
	s.weight = weight
	return i, prev, dst, nil
}

// spanFast is runSpan for a fast interval (depthPlan.fast): one pass over
// the rows, with every choice that does not change from one depth to the
// next made before it. It counts the depths that lie inside the interval
// (spanLen), cuts them into stretches over which no test of the tip-zone
// rules that depends on the depth alone changes its answer (spanCuts),
// and hands each stretch to spanRows, whose loop then holds only the
// arithmetic of the shaft, the tip and the assembly and the tests that
// depend on the values (qp against the neighbouring layers' values). The
// constants of the interval are read once (spanSetup). Values are computed
// by the same operations as in runSpan, except the API α's closed form and
// the rules of the tip zone, which multiply by reciprocals worked out once
// (see alphaAPIConst and spanConst), and the forces of the common case,
// assembled from products worked out once (see spanQuick): a few units in
// the last place. It returns the first depth it did not take, prev and
// dst.
func (a *Analysis) spanFast(s *sums, k int, openFrom, prev, from, step, to float64, i, n int, dst []Capacity) (int, float64, []Capacity) {
	if cap(dst)-len(dst) < n-i {
		dst = slices.Grow(dst, n-i)
	}
	m := spanLen(from, step, to, prev, a.iv[k].bot, i, n)
	if m == 0 {
		return i, prev, dst
	}
	base := len(dst)
	rows := dst[base : base+m]
	var c spanConst
	a.spanSetup(&c, s, k, openFrom, from, step, to)
	at, seg := c.spanCuts(i, m)
	weight := s.weight
	for q := range seg {
		if j0, j1 := at[q], at[q+1]; j0 < j1 {
			weight, prev = c.spanRows(rows[j0:j1], i+j0, weight, prev, seg[q])
		}
	}
	s.weight = weight
	return i + m, prev, dst[:base+m]
}

// spanAt is the depth of row i of the grid, as withDepth makes it.
func spanAt(from, step, to float64, i int) float64 {
	z := from + float64(i)*step
	if z > to { // min(z, to): z is never NaN
		z = to
	}
	return z
}

// spanLen returns how many of the depths i, i+1, … (below n) follow one
// another inside the interval: each below ivBot and above the one before
// (prev for the first), where runSpan stops at the first that is not.
// When the step is more than a few units in the last place of the depths,
// the depths of the grid increase strictly (only the last, i = n−1, can be
// clamped to `to`, and it still lies above the one before), so only the
// test against ivBot can end the stretch, and it is monotone: a binary
// search finds the end. Otherwise the depths are walked one by one.
func spanLen(from, step, to, prev, ivBot float64, i, n int) int {
	m := n - i
	if m <= 0 {
		return 0
	}
	if z := spanAt(from, step, to, i); !(z > prev && z < ivBot) {
		return 0
	}
	if step > 1e-9*max(math.Abs(from), math.Abs(to)) {
		return sort.Search(m, func(j int) bool { return !(spanAt(from, step, to, i+j) < ivBot) })
	}
	j := 1
	for ; j < m; j++ {
		z, zp := spanAt(from, step, to, i+j), spanAt(from, step, to, i+j-1)
		if !(z > zp && z < ivBot) {
			break
		}
	}
	return j
}

// spanSeg is what spanRows holds fixed over a stretch of rows: which tests
// of the tip-zone rules that depend on the depth alone are true there.
type spanSeg struct {
	early bool  // z − zoneTop < zoneLen: the embedment ramp or the layered rule can apply
	weak  bool  // nextTop < z + 10·D: the weak-layer rule's one candidate lies within reach
	below bool  // nextTop < z + weakBelow·D: the check of a weaker layer below applies
	near  Flags // TipNearBoundary where the tip lies within D of a boundary of its layer
}

// spanCuts cuts the rows i to i+m−1 into stretches: rows at[q] to at[q+1]
// (counted from the span's first) share seg[q]; some may be empty. Five
// tests each change their answer at most once along the span, so there are
// at most six stretches. Each test is the one
// that spanRows would make at every row, and each is monotone in the depth
// (the depths increase; z − c, c − z and z + c are monotone in z when
// rounded), so it is true over a prefix of the rows or over a suffix; the
// row where it changes is found by binary search on the rows' own depths,
// after a look at both ends (most tests hold or fail over the whole span).
func (c *spanConst) spanCuts(i, m int) (at [7]int, seg [6]spanSeg) {
	z := func(j int) float64 { return spanAt(c.from, c.step, c.to, i+j) }
	// firstTrue is the first row where f holds, f false then true.
	firstTrue := func(f func(z float64) bool) int {
		switch {
		case f(z(0)):
			return 0
		case !f(z(m - 1)):
			return m
		}
		return sort.Search(m, func(j int) bool { return f(z(j)) })
	}
	zoneTop, zoneLen := c.zoneTop, c.zoneLen
	layerTop, layerBot, d := c.layerTop, c.layerBot, c.d
	nearTop, nearBot := c.nearTop, c.nearBot
	nextTop, weakZone, weakBelow := c.nextTop, c.weakZone, c.weakBelow
	// Prefixes: the tip zone of the rules and the top of the layer.
	eEnd := firstTrue(func(z float64) bool { return !(z-zoneTop < zoneLen) })
	tEnd := firstTrue(func(z float64) bool { return !(z-layerTop < d && nearTop) })
	// Suffixes: the bottom of the layer, the weak-layer rule, the check below.
	bStart := firstTrue(func(z float64) bool { return layerBot-z < d && nearBot })
	wStart := firstTrue(func(z float64) bool { return nextTop < z+weakZone })
	lStart := firstTrue(func(z float64) bool { return nextTop < z+weakBelow })
	at = [7]int{0, eEnd, tEnd, bStart, wStart, lStart, m}
	slices.Sort(at[1:6])
	for q := range seg {
		j := at[q]
		sg := &seg[q]
		sg.early, sg.weak, sg.below = j < eEnd, j >= wStart, j >= lStart
		sg.near = 0
		if j < tEnd || j >= bStart {
			sg.near = TipNearBoundary
		}
	}
	return at, seg
}

// spanConst is what spanRows reads of the analysis for one fast interval,
// gathered once by spanSetup.
type spanConst struct {
	from, step, to float64
	// The shaft's closed form from openFrom (see closedIntegral): σ′v for
	// the shaft along the interval, the integrand's factor and cap and its
	// value at openFrom; su along the layer for α; the API α's
	// antiderivative with its value at openFrom.
	kind                int
	ivTop, openFrom     float64
	sS0, sDs            float64
	coef, capv, f0      float64
	su0, dsu, lTop, lH  float64
	suVaries            bool
	api                 alphaAPIConst
	apiF0, invDs, su4   float64
	bound0              bool
	weighted            bool
	wDry, wWet, zw      float64
	eE0, eDe            float64 // σ′v itself
	fixed, nc, kq, nq   float64 // the tip model (see tipModel.eval)
	cc, limit           float64
	limFric, useSu      bool
	tmSu                bool
	lTopL, lBotL        units.Length
	zoneTop, zoneLen    float64 // the rules of the tip zone (see depthPlan)
	ramp, layered       bool
	upBase              float64
	upErr               bool
	nextTop, nextEff    float64
	weakZone, weakBelow float64
	// The rules' divisions as products: a few ulps from baseRules and
	// weakRule (the oracle comparison holds them to 1e-12).
	invZone, inv10d, invWeak   float64
	nextWeaker                 bool
	nextQp                     float64
	noEmbed, layeredOn, noWeak bool
	nearTop, nearBot           bool
	layerTop, layerBot, d      float64
	// The assembly (see assemble, for a section that cannot plug).
	flags0                             Flags
	t, fShaft, fTen, fTip              float64
	outer0, design0, tension0, uplift0 float64
	net, gross                         bool
	aGross, aOuter, upW                float64
	// spanQuick's (see quickSetup): whether it takes the interval; its
	// products aOuter·uplift0, aOuter·t, aOuter·design0, fTip·aGross,
	// aOuter·fShaft, aOuter·tension0, aOuter·fTen; its shaft's g0, dg and
	// cap (+Inf for none); its tip model's nc·cv, k, Nq and flag.
	quick                      bool
	t0, tq, d0, dp, dq, e0, eq float64
	g0, dg, capQ               float64
	ncv, kqQ, nqQ              float64
	tipFlag                    Flags
}

// spanSetup fills c for fast interval k, entered at openFrom, with the
// committed sums s.
func (a *Analysis) spanSetup(c *spanConst, s *sums, k int, openFrom, from, step, to float64) {
	iv := &a.iv[k]
	p := &a.dp[k]
	lp := &a.plans[iv.layer]
	li := iv.layer
	d := a.size
	c.from, c.step, c.to = from, step, to
	c.kind = lp.kind
	c.ivTop, c.openFrom = iv.top, openFrom
	c.sS0, c.sDs = iv.s0, iv.ds
	s0 := iv.sigma(openFrom)
	c.coef, c.capv = lp.coef, float64(lp.cap)
	// su in the layer, as suAt: su0 + (su1 − su0)·((z − top)/(bottom − top)).
	c.su0, c.dsu = float64(lp.su0), float64(lp.su1-lp.su0)
	c.lTop, c.lH = float64(lp.layer.Top), float64(lp.layer.Bottom-lp.layer.Top)
	c.suVaries = lp.su0 != lp.su1 && lp.layer.Bottom > lp.layer.Top
	var g0 float64
	switch lp.kind {
	case kindBeta:
		g0 = s0
	case kindAlpha:
		g0 = float64(lp.suAt(units.Length(openFrom)))
	case kindAlphaAPI:
		c.api = p.alphaAPIFast()
		c.apiF0 = c.api.f(s0)
		c.su4 = 4 * p.su
		c.invDs = 1 / iv.ds
	}
	c.bound0 = s0 > c.su4
	c.f0 = c.coef * g0
	// The pile's weight per metre dry and wet, as pileWeight.
	c.zw = math.Inf(1)
	c.weighted = a.pile.UnitWeight != 0
	if c.weighted {
		g := float64(a.pile.UnitWeight)
		gw := float64(a.prof.WaterUnitWeight())
		if z, wet := a.prof.WaterDepth(); wet {
			c.zw = float64(z)
		}
		c.wDry, c.wWet = g*a.mat, (g-gw)*a.mat
	}
	c.eE0, c.eDe = iv.e0, iv.de
	tm := &lp.tm
	c.fixed, c.nc, c.kq, c.nq, c.cc, c.limit, c.limFric = tm.fixed, tm.nc, tm.k, tm.nq, tm.c, tm.limit, tm.limFric
	c.useSu, c.tmSu = tm.useSu, tm.useSu && lp.layer.HasSu
	c.lTopL, c.lBotL = lp.layer.Top, lp.layer.Bottom
	c.zoneTop, c.zoneLen = p.zoneTop, p.zoneLen
	c.ramp, c.layered, c.upBase, c.upErr = p.ramp, p.layered, p.upBase, p.upErr
	c.nextTop, c.nextEff = p.nextTop, p.nextEff
	c.weakZone, c.weakBelow = WeakZoneRatio*d, a.weakBelow*d
	c.invZone, c.inv10d, c.invWeak = 1/p.zoneLen, 1/(10*d), 1/c.weakZone
	c.nextWeaker, c.nextQp = p.nextErrTop, p.nextQpTop
	c.noEmbed, c.layeredOn, c.noWeak = a.methods.NoEmbedment, a.methods.LayeredTip, a.methods.NoWeakLayer
	c.nearTop, c.nearBot = li > 0, li < len(a.plans)-1
	c.layerTop, c.layerBot, c.d = float64(lp.layer.Top), float64(lp.layer.Bottom), d
	c.flags0 = s.flags | p.shaftFlags | p.tipFlags
	c.t = p.tension
	c.fShaft, c.fTen, c.fTip = lp.fShaft, lp.fTension*c.t, lp.fTip
	c.outer0, c.design0, c.tension0, c.uplift0 = s.outer, s.design, s.tension, s.uplift
	c.net, c.gross = a.methods.SelfWeight == WeightNet, a.methods.SelfWeight == WeightGross
	c.aGross, c.aOuter = a.gross, a.outer
	c.upW = a.upliftWeight()
	c.quickSetup()
}

// spanRows fills rows, the depths i, i+1, … of one stretch (see spanCuts),
// with the pile's weight w to prev before the first; it returns the weight
// and prev after the last. For each depth: the pile's weight, the shaft's
// closed form from openFrom, the tip model, the rules of the tip zone that
// sg says can apply, and the assembly, as runSpan computes them. The
// common case goes to spanQuick's leaner loop; this one takes the others
// (the API α, su varying in the layer, a tip limit that depends on the
// depth, the pile's weight in compression).
func (c *spanConst) spanRows(rows []Capacity, i int, weight, prev float64, sg spanSeg) (float64, float64) {
	if w, z, ok := c.spanQuick(rows, i, weight, prev, sg); ok {
		return w, z
	}
	from, step, to := c.from, c.step, c.to
	ivTop, openFrom := c.ivTop, c.openFrom
	flags0 := c.flags0 | sg.near
	for j := range rows {
		z := from + float64(i+j)*step
		if z > to {
			z = to
		}
		if c.weighted {
			weight = addWeight(weight, c.wDry, c.wWet, c.zw, prev, z)
		}
		prev = z
		dz := z - ivTop
		h := z - openFrom
		// The shaft, as closedIntegral.
		var q float64
		fl := flags0
		switch c.kind {
		case kindBeta, kindAlpha:
			g1 := c.sS0 + c.sDs*dz
			if c.kind == kindAlpha {
				g1 = c.su0
				if c.suVaries {
					g1 = c.su0 + c.dsu*((z-c.lTop)/c.lH)
				}
			}
			f1 := c.coef * g1
			if capv := c.capv; capv <= 0 || (c.f0 <= capv && f1 <= capv) {
				q = (c.f0 + f1) / 2 * h
			} else {
				q = cappedIntegral(c.f0, f1, capv, h)
				fl |= ShaftLimit
			}
		case kindAlphaAPI:
			s1 := c.sS0 + c.sDs*dz
			q = (c.api.f(s1) - c.apiF0) * c.invDs
			if c.bound0 || s1 > c.su4 { // max(s0, s1) > su4
				fl |= BoundApplied
			}
		}
		// The tip model (see tipModel.eval).
		sv := c.eE0 + c.eDe*dz
		var qp float64
		if c.fixed != 0 {
			qp = c.fixed
			if c.limit > 0 && qp > c.limit {
				qp = c.limit
				fl |= TipLimit
			}
		} else {
			cv := c.cc
			if c.useSu {
				cv = 0
				if c.tmSu {
					// The clamp of tipQuick, with plain comparisons (z is
					// a depth, never NaN).
					zz := units.Length(z)
					if zz < c.lTopL {
						zz = c.lTopL
					}
					if zz > c.lBotL {
						zz = c.lBotL
					}
					cv = c.su0
					if c.suVaries {
						cv = c.su0 + c.dsu*((float64(zz)-c.lTop)/c.lH)
					}
				}
			}
			fric := c.kq * sv * c.nq
			qp = c.nc*cv + fric
			if limit := c.limit; limit > 0 {
				if c.limFric {
					if fric > limit {
						qp = c.nc*cv + limit
						fl |= TipLimit
					}
				} else if qp > limit {
					qp = limit
					fl |= TipLimit
				}
			}
		}
		// baseRules, decided in advance.
		if sg.early {
			lb := z - c.zoneTop
			switch {
			case c.ramp && qp > 0:
				if c.noEmbed {
					fl |= EmbedmentOff
				} else {
					qp *= lb * c.invZone
					fl |= EmbedmentRamp
				}
			case c.layered:
				switch {
				case !c.layeredOn:
					if c.upErr || c.upBase < qp {
						fl |= LayeredTipOff
					}
				case c.upBase < qp: // upErr with the rule on is not fast
					qp = c.upBase + (qp-c.upBase)*lb*c.inv10d
					fl |= LayeredTip
				}
			}
		}
		// weakRule with its one candidate, the next layer.
		if sg.weak && c.nextEff < qp {
			if c.noWeak {
				fl |= WeakLayerOff
			} else if v := c.nextEff + (qp-c.nextEff)*(c.nextTop-z)*c.invWeak; v < qp {
				qp = v
				fl |= WeakLayerReduced
			}
		}
		if sg.below && (c.nextWeaker || c.nextQp < qp) {
			fl |= WeakBelow
		}
		// The assembly, as assemble for a section that cannot plug.
		outer, design, tension, uplift := c.outer0+q, c.design0+c.fShaft*q, c.tension0+c.fTen*q, c.uplift0+c.t*q
		if c.net {
			qp = max(0, qp-sv)
		}
		tip, shf := units.Force(qp*c.aGross), units.Force(outer*c.aOuter)
		desC := c.fTip*qp*c.aGross + design*c.aOuter
		comp := tip + shf
		w := units.Force(weight)
		if c.gross {
			comp -= w
			desC -= weight
			if comp < 0 {
				fl |= WeightExceedsResistance
			}
		}
		tenShaft := units.Force(uplift * c.aOuter)
		r := &rows[j]
		r.TipDepth, r.UnitTip, r.Tip, r.Shaft, r.Weight = units.Length(z), units.Stress(qp), tip, shf, w
		r.Compression, r.TensionShaft, r.Tension = comp, tenShaft, tenShaft+w
		r.DesignCompression, r.DesignTension = units.Force(desC), units.Force(tension*c.aOuter+c.upW*weight)
		r.Plugged, r.Flags = true, fl
	}
	return weight, prev
}

// quickSetup decides whether spanQuick can take the interval (c.quick)
// and works out its constants: the common case, where one loop suffices
// and the assembly can be multiplied out, is β, or α with su constant in
// the layer (g = g0 + dg·(z − ivTop), with or without a cap); a tip model
// with a fixed value or with factors and nc·cv the same at every depth,
// and no limit that depends on the depth; the pile's weight ignored in
// compression (Methods.SelfWeight).
func (c *spanConst) quickSetup() {
	c.quick = false
	if c.net || c.gross || c.kind == kindAlphaAPI || c.kind == kindAlpha && c.suVaries {
		return
	}
	// The tip model: qp = ncv + k·σ′v·Nq, or ncv with k = Nq = 0 for a
	// fixed value (ncv + 0 is ncv itself), with its limit applied once.
	c.ncv, c.kqQ, c.nqQ, c.tipFlag = 0, c.kq, c.nq, 0
	switch {
	case c.fixed != 0:
		c.ncv, c.kqQ, c.nqQ = c.fixed, 0, 0
		if c.limit > 0 && c.ncv > c.limit {
			c.ncv, c.tipFlag = c.limit, TipLimit
		}
	case c.limit <= 0 && !(c.useSu && c.tmSu && c.suVaries):
		cv := c.cc
		if c.useSu {
			cv = 0
			if c.tmSu {
				cv = c.su0
			}
		}
		c.ncv = c.nc * cv
	default:
		return
	}
	c.quick = true
	// The shaft: g, the integrand's variable (σ′v for β, su for α), is
	// g0 + dg·(z − ivTop); for α with su constant in the layer, dg is 0 and
	// g0 + 0 is su itself. Without a cap, capQ is +Inf: f ≤ capQ holds.
	c.g0, c.dg, c.capQ = c.sS0, c.sDs, c.capv
	if c.kind == kindAlpha {
		c.g0, c.dg = c.su0, 0
	}
	if c.capQ <= 0 {
		c.capQ = math.Inf(1)
	}
	// The assembly, multiplied out: with S = q (the shaft integral from
	// openFrom) and qp,
	//	Shaft             = (outer0 + S)·aOuter
	//	TensionShaft      = aOuter·uplift0 + aOuter·t·S
	//	DesignCompression = aOuter·design0 + fTip·aGross·qp + aOuter·fShaft·S
	//	DesignTension     = aOuter·tension0 + aOuter·fTen·S + upW·W′
	c.t0, c.tq = c.aOuter*c.uplift0, c.aOuter*c.t
	c.d0, c.dp, c.dq = c.aOuter*c.design0, c.fTip*c.aGross, c.aOuter*c.fShaft
	c.e0, c.eq = c.aOuter*c.tension0, c.aOuter*c.fTen
}

// spanQuick is spanRows for the common case (c.quick, see quickSetup). The
// depth, the shaft integral, the unit tip resistance and every flag are
// computed by the same operations as in spanRows, so they are the same to
// the bit; the forces are assembled from products worked out once per
// interval (aOuter·uplift0, aOuter·t, …), which moves them by a few units
// in the last place from assemble's order (the oracle comparison holds
// every field to 1e-12). The loop reads the interval's constants through
// c rather than copying them into locals: with fewer values live, Go
// spills less (measured: a few per cent to 10 % faster). ok is false, and
// nothing done, where the case is not the common one.
func (c *spanConst) spanQuick(rows []Capacity, i int, weight, prev float64, sg spanSeg) (w, zPrev float64, ok bool) {
	switch {
	case !c.quick:
		return weight, prev, false
	case !(sg.early || sg.weak || sg.below):
		w, zPrev = c.quickRows(rows, i, weight, prev, sg, 0, false)
	case c.flagsOnly(sg):
		w, zPrev = c.quickFlagged(rows, i, weight, prev, sg)
	default:
		w, zPrev = c.quickRows(rows, i, weight, prev, sg, 0, true)
	}
	return w, zPrev, true
}

// flagsOnly reports whether the rules of the tip zone that sg says can
// apply only add flags on the stretch, changing no value: the embedment
// ramp or the layered rule switched off, the weak-layer rule switched off,
// the check of a weaker layer below. Each then adds its flag where the tip
// model's value exceeds a threshold (see ruleFlags).
func (c *spanConst) flagsOnly(sg spanSeg) bool {
	if sg.early && (c.ramp && !c.noEmbed || c.layered && c.layeredOn) {
		return false
	}
	return !sg.weak || c.noWeak
}

// ruleFlags is the flags that the rules of the tip zone add, on a stretch
// where they only add flags (flagsOnly), for the tip model's value qp, as
// quickRows adds them. Each flag is added where qp exceeds a threshold.
func (c *spanConst) ruleFlags(sg spanSeg, qp float64) Flags {
	var fl Flags
	if sg.early {
		switch {
		case c.ramp && qp > 0:
			fl |= EmbedmentOff
		case c.layered && (c.upErr || c.upBase < qp):
			fl |= LayeredTipOff
		}
	}
	if sg.weak && c.nextEff < qp {
		fl |= WeakLayerOff
	}
	if sg.below && (c.nextWeaker || c.nextQp < qp) {
		fl |= WeakBelow
	}
	return fl
}

// quickFlagged is spanQuick on a stretch whose rules only add flags
// (flagsOnly): the stretch is cut where the flags change, and each piece
// goes through quickRows with its flags and no test of the rules. The tip
// model's value is monotone in the depth (each rounded operation of
// ncv + k·(eE0 + eDe·(z − ivTop))·Nq is monotone in its operand, and the
// depths increase), so each flag, added where qp exceeds a threshold,
// changes at most once along the stretch: where the flags at both ends of
// a piece agree, they hold over the whole piece; else the piece is halved.
// qp is computed as quickRows computes it, so the flags are the same.
func (c *spanConst) quickFlagged(rows []Capacity, i int, weight, prev float64, sg spanSeg) (float64, float64) {
	qpAt := func(j int) float64 {
		dz := spanAt(c.from, c.step, c.to, i+j) - c.ivTop
		return c.ncv + c.kqQ*(c.eE0+c.eDe*dz)*c.nqQ
	}
	// Pieces [j0, j1) still to take, the next on top: at most two a level
	// of halving, and len(rows) < 2⁶³.
	var stack [2 * 66]int
	n := 0
	push := func(j0, j1 int) { stack[n], stack[n+1] = j0, j1; n += 2 }
	push(0, len(rows))
	for n > 0 {
		n -= 2
		j0, j1 := stack[n], stack[n+1]
		fa, fb := c.ruleFlags(sg, qpAt(j0)), c.ruleFlags(sg, qpAt(j1-1))
		if fa == fb {
			weight, prev = c.quickRows(rows[j0:j1], i+j0, weight, prev, sg, fa, false)
			continue
		}
		mid := j0 + (j1-j0)/2
		push(mid, j1) // taken after [j0, mid): the rows go in order
		push(j0, mid)
	}
	return weight, prev
}

// quickRows is spanQuick's loop over rows i, i+1, … with the flags extra
// added to every row; rules says whether the rules of the tip zone that sg
// says can apply are tested at each depth. Without them, for a pile
// without weight and a shaft without a cap (the common case of the common
// case), quickLean takes the rows.
func (c *spanConst) quickRows(rows []Capacity, i int, weight, prev float64, sg spanSeg, extra Flags, rules bool) (float64, float64) {
	from, step, to := c.from, c.step, c.to
	ivTop, openFrom := c.ivTop, c.openFrom
	flags0 := c.flags0 | sg.near | c.tipFlag | extra
	if !rules && !c.weighted && math.IsInf(c.capQ, 1) {
		c.quickLean(rows, i, weight, flags0)
		return weight, spanAt(from, step, to, i+len(rows)-1)
	}
	weighted := c.weighted
	for j := range rows {
		z := from + float64(i+j)*step
		if z > to { // min(z, to): z is never NaN
			z = to
		}
		if weighted {
			weight = addWeight(weight, c.wDry, c.wWet, c.zw, prev, z)
		}
		prev = z
		dz := z - ivTop
		fl := flags0
		// The shaft, as closedIntegral.
		var q float64
		if f1 := c.coef * (c.g0 + c.dg*dz); c.f0 <= c.capQ && f1 <= c.capQ {
			q = (c.f0 + f1) / 2 * (z - openFrom)
		} else {
			q = cappedIntegral(c.f0, f1, c.capv, z-openFrom)
			fl |= ShaftLimit
		}
		// The tip model.
		qp := c.ncv + c.kqQ*(c.eE0+c.eDe*dz)*c.nqQ
		if rules {
			// baseRules, decided in advance.
			if sg.early {
				lb := z - c.zoneTop
				switch {
				case c.ramp && qp > 0:
					if c.noEmbed {
						fl |= EmbedmentOff
					} else {
						qp *= lb * c.invZone
						fl |= EmbedmentRamp
					}
				case c.layered:
					switch {
					case !c.layeredOn:
						if c.upErr || c.upBase < qp {
							fl |= LayeredTipOff
						}
					case c.upBase < qp: // upErr with the rule on is not fast
						qp = c.upBase + (qp-c.upBase)*lb*c.inv10d
						fl |= LayeredTip
					}
				}
			}
			// weakRule with its one candidate, the next layer.
			if sg.weak && c.nextEff < qp {
				if c.noWeak {
					fl |= WeakLayerOff
				} else if v := c.nextEff + (qp-c.nextEff)*(c.nextTop-z)*c.invWeak; v < qp {
					qp = v
					fl |= WeakLayerReduced
				}
			}
			if sg.below && (c.nextWeaker || c.nextQp < qp) {
				fl |= WeakBelow
			}
		}
		tip, shf := units.Force(qp*c.aGross), units.Force((c.outer0+q)*c.aOuter)
		tenShaft, w := units.Force(c.t0+c.tq*q), units.Force(weight)
		r := &rows[j]
		r.TipDepth, r.UnitTip, r.Tip, r.Shaft, r.Weight = units.Length(z), units.Stress(qp), tip, shf, w
		r.Compression, r.TensionShaft, r.Tension = tip+shf, tenShaft, tenShaft+w
		r.DesignCompression, r.DesignTension = units.Force(c.d0+c.dp*qp+c.dq*q), units.Force(c.e0+c.eq*q+c.upW*weight)
		r.Plugged, r.Flags = true, fl
	}
	return weight, prev
}

// quickLean is quickRows's loop with nothing to test but the depths' own
// clamp: no rule of the tip zone, the pile's weight w the same at every
// depth, no cap on the shaft. Every value is computed as in quickRows.
func (c *spanConst) quickLean(rows []Capacity, i int, w float64, flags Flags) {
	from, step, to := c.from, c.step, c.to
	ivTop, openFrom := c.ivTop, c.openFrom
	for j := range rows {
		z := from + float64(i+j)*step
		if z > to { // min(z, to): z is never NaN
			z = to
		}
		dz := z - ivTop
		q := (c.f0 + c.coef*(c.g0+c.dg*dz)) / 2 * (z - openFrom)
		qp := c.ncv + c.kqQ*(c.eE0+c.eDe*dz)*c.nqQ
		tip, shf := units.Force(qp*c.aGross), units.Force((c.outer0+q)*c.aOuter)
		tenShaft := units.Force(c.t0 + c.tq*q)
		r := &rows[j]
		r.TipDepth, r.UnitTip, r.Tip, r.Shaft, r.Weight = units.Length(z), units.Stress(qp), tip, shf, units.Force(w)
		r.Compression, r.TensionShaft, r.Tension = tip+shf, tenShaft, tenShaft+units.Force(w)
		r.DesignCompression, r.DesignTension = units.Force(c.d0+c.dp*qp+c.dq*q), units.Force(c.e0+c.eq*q+c.upW*w)
		r.Plugged, r.Flags = true, flags
	}
}

// addWeight adds to w the pile's weight from z0 to z1 as pileWeight
// computes it, from the weights per metre dry and wet and the water depth
// zw (+Inf for none).
func addWeight(w, wDry, wWet, zw, z0, z1 float64) float64 {
	switch {
	case zw >= z1:
		return w + wDry*(z1-z0)
	case zw <= z0:
		return w + wWet*(z1-z0)
	default:
		return w + (wDry*(zw-z0) + wWet*(z1-zw))
	}
}

// cappedIntegral is linearIntegral where the cap governs somewhere: the
// integral of min(f, capv) over a segment of length h where f is linear
// from f0 to f1 and one of them exceeds capv > 0.
func cappedIntegral(f0, f1, capv, h float64) float64 {
	if f0 >= capv && f1 >= capv {
		return capv * h
	}
	t := (capv - f0) / (f1 - f0)
	if f0 < capv {
		return (f0+capv)/2*t*h + capv*(1-t)*h
	}
	return capv*t*h + (capv+f1)/2*(1-t)*h
}

// alphaAPIConst is the API α's antiderivative (see alphaAPIF) with its
// constants multiplied out once, so that no division is left in it:
//
//	F(σ) = c1·σ·σ^0.25                 σ ≤ su
//	F(σ) = c2 + k3·(σ·√σ − c3)          su ≤ σ ≤ 4su
//	F(σ) = c4 + su·(σ − 4su)            σ ≥ 4su
//
// with c1 = 0.4·su^0.75, c2 = 0.4·su², k3 = su^0.5/3, c3 = su^1.5 and
// c4 = (41/15)·su². It differs from alphaAPIF by a few units in the last
// place (the oracle comparison holds it to 1e-12).
type alphaAPIConst struct {
	su, su4, c1, c2, k3, c3, c4 float64
}

func (p *depthPlan) alphaAPIFast() alphaAPIConst {
	u := p.su
	return alphaAPIConst{su: u, su4: 4 * u, c1: 0.4 * p.su75, c2: 0.4 * u * u, k3: p.su5 / 3, c3: u * p.su5, c4: 41.0 / 15 * u * u}
}

func (c *alphaAPIConst) f(s float64) float64 {
	switch {
	case s <= c.su:
		return c.c1 * s * math.Sqrt(math.Sqrt(s))
	case s <= c.su4:
		return c.c2 + c.k3*(s*math.Sqrt(s)-c.c3)
	default:
		return c.c4 + c.su*(s-c.su4)
	}
}
