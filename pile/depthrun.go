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

// spanFast is runSpan for a fast interval (depthPlan.fast), in three
// passes over the rows, each with few values live so that they stay in
// registers and no pass calls a function: spanShaft takes the depths
// inside the interval and stores with each its depth, the pile's weight
// and the shaft's closed form from openFrom (kept in the row's Shaft field
// until the last pass); spanTip adds the unit tip resistance (the tip
// model and the rules of the tip zone, whose choices depthPlan made once;
// kept in UnitTip); spanAssemble assembles the row as assemble does.
// Values are computed by the same operations as in runSpan, except the API
// α's closed form and the rules of the tip zone, which multiply by
// reciprocals worked out once (see alphaAPIConst and spanTip): a few units
// in the last place. It returns the first depth it did not take, prev and
// dst.
func (a *Analysis) spanFast(s *sums, k int, openFrom, prev, from, step, to float64, i, n int, dst []Capacity) (int, float64, []Capacity) {
	if cap(dst)-len(dst) < n-i {
		dst = slices.Grow(dst, n-i)
	}
	base := len(dst)
	rows := dst[base : base+n-i]
	m, weight := a.spanShaft(k, openFrom, prev, from, step, to, i, s.weight, rows)
	rows = rows[:m]
	if m > 0 {
		prev = float64(rows[m-1].TipDepth)
	}
	s.weight = weight
	a.spanTip(s, k, rows)
	return i + m, prev, dst[:base+m]
}

// spanShaft is spanFast's first pass: from depth i, while the depth lies
// inside interval k, it stores in rows the depth, the pile's weight (w0 to
// prev before), the shaft integral from openFrom in Shaft and the flag of
// the closed form in Flags. It returns the number of rows and the weight.
func (a *Analysis) spanShaft(k int, openFrom, prev, from, step, to float64, i int, w0 float64, rows []Capacity) (int, float64) {
	iv := &a.iv[k]
	p := &a.dp[k]
	lp := &a.plans[iv.layer]
	ivTop, ivBot := iv.top, iv.bot
	sS0, sDs := iv.s0, iv.ds
	s0 := iv.sigma(openFrom)
	kind := lp.kind
	coef, capv := lp.coef, float64(lp.cap)
	// su in the layer, as suAt: su0 + (su1 − su0)·((z − top)/(bottom − top)).
	su0, dsu := float64(lp.su0), float64(lp.su1-lp.su0)
	lTop, lH := float64(lp.layer.Top), float64(lp.layer.Bottom-lp.layer.Top)
	suVaries := lp.su0 != lp.su1 && lp.layer.Bottom > lp.layer.Top
	var g0, apiF0, su4, invDs float64
	var api alphaAPIConst
	switch kind {
	case kindBeta:
		g0 = s0
	case kindAlpha:
		g0 = float64(lp.suAt(units.Length(openFrom)))
	case kindAlphaAPI:
		api = p.alphaAPIFast()
		apiF0 = api.f(s0)
		su4 = 4 * p.su
		invDs = 1 / sDs
	}
	bound0 := s0 > su4
	f0 := coef * g0
	// The pile's weight per metre dry and wet, as pileWeight.
	var wDry, wWet float64
	zw := math.Inf(1)
	weighted := a.pile.UnitWeight != 0
	if weighted {
		g := float64(a.pile.UnitWeight)
		gw := float64(a.prof.WaterUnitWeight())
		if z, wet := a.prof.WaterDepth(); wet {
			zw = float64(z)
		}
		wDry, wWet = g*a.mat, (g-gw)*a.mat
	}
	weight := w0
	j := 0
	// One loop per kind, so that each holds only its own values.
	switch kind {
	case kindBeta, kindAlpha:
		for ; j < len(rows); j++ {
			z := from + float64(i+j)*step
			if z > to { // min(z, to): z is never NaN
				z = to
			}
			if !(z > prev && z < ivBot) {
				break
			}
			if weighted {
				weight = addWeight(weight, wDry, wWet, zw, prev, z)
			}
			prev = z
			g1 := sS0 + sDs*(z-ivTop)
			if kind == kindAlpha {
				g1 = su0
				if suVaries {
					g1 = su0 + dsu*((z-lTop)/lH)
				}
			}
			f1 := coef * g1
			h := z - openFrom
			var q float64
			var fl Flags
			if capv <= 0 || (f0 <= capv && f1 <= capv) {
				q = (f0 + f1) / 2 * h
			} else {
				q = cappedIntegral(f0, f1, capv, h)
				fl = ShaftLimit
			}
			c := &rows[j]
			c.TipDepth, c.Weight, c.Shaft, c.Flags = units.Length(z), units.Force(weight), units.Force(q), fl
		}
	case kindAlphaAPI:
		for ; j < len(rows); j++ {
			z := from + float64(i+j)*step
			if z > to {
				z = to
			}
			if !(z > prev && z < ivBot) {
				break
			}
			if weighted {
				weight = addWeight(weight, wDry, wWet, zw, prev, z)
			}
			prev = z
			s1 := sS0 + sDs*(z-ivTop)
			q := (api.f(s1) - apiF0) * invDs
			var fl Flags
			if bound0 || s1 > su4 { // max(s0, s1) > su4
				fl = BoundApplied
			}
			c := &rows[j]
			c.TipDepth, c.Weight, c.Shaft, c.Flags = units.Length(z), units.Force(weight), units.Force(q), fl
		}
	}
	return j, weight
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

// spanTip is spanFast's second pass: the unit tip resistance at each
// row's depth, as runSpan computes it (the rules' divisions as products
// by reciprocals), left in UnitTip with the row's flags; then it calls
// spanAssemble with the committed sums s.
func (a *Analysis) spanTip(s *sums, k int, rows []Capacity) {
	iv := &a.iv[k]
	p := &a.dp[k]
	lp := &a.plans[iv.layer]
	li := iv.layer
	d := a.size
	ivTop := iv.top
	eE0, eDe := iv.e0, iv.de
	// The tip model (see tipModel.eval).
	tm := &lp.tm
	fixed, nc, kq, nq, cc, limit, limFric := tm.fixed, tm.nc, tm.k, tm.nq, tm.c, tm.limit, tm.limFric
	tmSu := tm.useSu && lp.layer.HasSu
	useSu := tm.useSu
	lTopL, lBotL := lp.layer.Top, lp.layer.Bottom
	su0, dsu := float64(lp.su0), float64(lp.su1-lp.su0)
	lTop, lH := float64(lp.layer.Top), float64(lp.layer.Bottom-lp.layer.Top)
	suVaries := lp.su0 != lp.su1 && lp.layer.Bottom > lp.layer.Top
	// The rules of the tip zone.
	zoneTop, zoneLen := p.zoneTop, p.zoneLen
	ramp, layered, upBase, upErr := p.ramp, p.layered, p.upBase, p.upErr
	nextTop, nextEff := p.nextTop, p.nextEff
	weakZone := WeakZoneRatio * d
	// The rules' divisions as products: a few ulps from baseRules and
	// weakRule (the oracle comparison holds them to 1e-12).
	invZone, inv10d, invWeak := 1/zoneLen, 1/(10*d), 1/weakZone
	weakBelow := a.weakBelow * d
	nextWeaker, nextQp := p.nextErrTop, p.nextQpTop
	noEmbed, layeredOn, noWeak := a.methods.NoEmbedment, a.methods.LayeredTip, a.methods.NoWeakLayer
	nearTop, nearBot := li > 0, li < len(a.plans)-1
	layerTop, layerBot := float64(lp.layer.Top), float64(lp.layer.Bottom)
	flags0 := s.flags | p.shaftFlags | p.tipFlags
	full := func(j0, j1 int) {
		for j := j0; j < j1; j++ {
			c := &rows[j]
			z := float64(c.TipDepth)
			fl := flags0 | c.Flags
			// The tip model.
			sv := eE0 + eDe*(z-ivTop)
			var qp float64
			if fixed != 0 {
				qp = fixed
				if limit > 0 && qp > limit {
					qp = limit
					fl |= TipLimit
				}
			} else {
				cv := cc
				if useSu {
					cv = 0
					if tmSu {
						// The clamp of tipQuick, with plain comparisons
						// (z is a depth, never NaN).
						zz := units.Length(z)
						if zz < lTopL {
							zz = lTopL
						}
						if zz > lBotL {
							zz = lBotL
						}
						cv = su0
						if suVaries {
							cv = su0 + dsu*((float64(zz)-lTop)/lH)
						}
					}
				}
				fric := kq * sv * nq
				qp = nc*cv + fric
				if limit > 0 {
					if limFric {
						if fric > limit {
							qp = nc*cv + limit
							fl |= TipLimit
						}
					} else if qp > limit {
						qp = limit
						fl |= TipLimit
					}
				}
			}
			// baseRules, decided in advance.
			if lb := z - zoneTop; lb < zoneLen {
				switch {
				case ramp && qp > 0:
					if noEmbed {
						fl |= EmbedmentOff
					} else {
						qp *= lb * invZone
						fl |= EmbedmentRamp
					}
				case layered:
					switch {
					case !layeredOn:
						if upErr || upBase < qp {
							fl |= LayeredTipOff
						}
					case upBase < qp: // upErr with the rule on is not fast
						qp = upBase + (qp-upBase)*lb*inv10d
						fl |= LayeredTip
					}
				}
			}
			// weakRule with its one candidate, the next layer.
			if nextTop < z+weakZone && nextEff < qp {
				if noWeak {
					fl |= WeakLayerOff
				} else if v := nextEff + (qp-nextEff)*(nextTop-z)*invWeak; v < qp {
					qp = v
					fl |= WeakLayerReduced
				}
			}
			if z-layerTop < d && nearTop || layerBot-z < d && nearBot {
				fl |= TipNearBoundary
			}
			if nextTop < z+weakBelow && (nextWeaker || nextQp < qp) {
				fl |= WeakBelow
			}
			c.UnitTip, c.Flags = units.Stress(qp), fl
		}
	}
	// The rows from lo to hi lie where no rule of the tip zone and no
	// flag that depends on the depth alone applies: there the tip model
	// alone acts (the same operations). Each test is the loop's own and
	// monotone in z, and the rows' depths increase (spanShaft keeps
	// z > prev), so a binary search finds lo and hi exactly.
	early := func(z float64) bool { return z-zoneTop < zoneLen || z-layerTop < d && nearTop }
	late := func(z float64) bool {
		return nextTop < z+weakZone || layerBot-z < d && nearBot || nextTop < z+weakBelow
	}
	lo := sort.Search(len(rows), func(j int) bool { return !early(float64(rows[j].TipDepth)) })
	hi := lo + sort.Search(len(rows)-lo, func(j int) bool { return late(float64(rows[lo+j].TipDepth)) })
	full(0, lo)
	for j := lo; j < hi; j++ {
		c := &rows[j]
		z := float64(c.TipDepth)
		fl := flags0 | c.Flags
		// The tip model.
		sv := eE0 + eDe*(z-ivTop)
		var qp float64
		if fixed != 0 {
			qp = fixed
			if limit > 0 && qp > limit {
				qp = limit
				fl |= TipLimit
			}
		} else {
			cv := cc
			if useSu {
				cv = 0
				if tmSu {
					// The clamp of tipQuick, with plain comparisons
					// (z is a depth, never NaN).
					zz := units.Length(z)
					if zz < lTopL {
						zz = lTopL
					}
					if zz > lBotL {
						zz = lBotL
					}
					cv = su0
					if suVaries {
						cv = su0 + dsu*((float64(zz)-lTop)/lH)
					}
				}
			}
			fric := kq * sv * nq
			qp = nc*cv + fric
			if limit > 0 {
				if limFric {
					if fric > limit {
						qp = nc*cv + limit
						fl |= TipLimit
					}
				} else if qp > limit {
					qp = limit
					fl |= TipLimit
				}
			}
		}
		c.UnitTip, c.Flags = units.Stress(qp), fl
	}
	full(hi, len(rows))
	a.spanAssemble(s, k, rows)
}

// spanAssemble is spanFast's third pass: each row assembled as assemble
// does for a section that cannot plug, from the committed sums s, the
// shaft integral that spanShaft left in Shaft and the unit tip resistance
// that spanTip left in UnitTip.
func (a *Analysis) spanAssemble(s *sums, k int, rows []Capacity) {
	iv := &a.iv[k]
	p := &a.dp[k]
	lp := &a.plans[iv.layer]
	ivTop := iv.top
	eE0, eDe := iv.e0, iv.de
	t := p.tension
	fShaft, fTen, fTip := lp.fShaft, lp.fTension*t, lp.fTip
	outer0, design0, tension0, uplift0 := s.outer, s.design, s.tension, s.uplift
	net, gross := a.methods.SelfWeight == WeightNet, a.methods.SelfWeight == WeightGross
	aGross, aOuter := a.gross, a.outer
	upW := a.upliftWeight()
	for j := range rows {
		c := &rows[j]
		q, qp, weight, fl := float64(c.Shaft), float64(c.UnitTip), float64(c.Weight), c.Flags
		outer, design, tension, uplift := outer0+q, design0+fShaft*q, tension0+fTen*q, uplift0+t*q
		if net {
			sv := eE0 + eDe*(float64(c.TipDepth)-ivTop)
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
		c.UnitTip, c.Tip, c.Shaft = units.Stress(qp), tip, shf
		c.Compression, c.TensionShaft, c.Tension = comp, tenShaft, tenShaft+w
		c.DesignCompression, c.DesignTension = units.Force(desC), units.Force(tension*aOuter+upW*weight)
		c.Plugged, c.Flags = true, fl
	}
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
