package reliability

import (
	"fmt"
	"math"
	"slices"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
)

// Shaft kinds of the closed form.
const (
	fBetaGiven  = iota + 1 // fs = β·σ′v
	fBetaKD                // fs = K·tan δ·σ′v, K given, δ given or δ/φ′·φ′
	fAlphaGiven            // fs = α·su
	fNone                  // no shaft friction in the layer
)

// fastLayer is one layer's values of the closed form (SI).
type fastLayer struct {
	top, bot       float64
	drained        bool
	gamma, gsat    float64
	phi, c         float64
	su0, su1       float64 // su at top and bottom
	kind           int
	beta, k, delta float64 // δ itself, or δ/φ′ with deltaRatio
	deltaRatio     bool
	tanDelta       float64 // tan δ of the values as given; recomputed when δ or φ′ is sampled
	alpha          float64
	tension        float64 // the layer's tension factor
	// gammaFromGsat: the layer gives γsat and neither γ nor phase data, so
	// that above the water table γ is γsat (profile.New's rule), sampled
	// or not.
	gammaFromGsat bool
}

// fastModel is the closed form of PileModel (see there for when it
// applies). It is read only while evaluating: workers share it.
type fastModel struct {
	lay                 []fastLayer
	targets             []Target
	head, tip           float64
	gw                  float64
	zw                  float64
	dry                 bool
	tipLayer            int
	tipNq, tipNc, limit float64 // given-Nq: Nq, Nc, limit; given-Nc: Nc
	tipUndrained        bool
	outer, inner        float64
	gross, mat          float64
	canPlug             bool
	plug                pile.Plug
	selfWeight          pile.SelfWeight
	gp                  float64 // pile unit weight
	codes               []int   // each target's key as an index into keyCodes (a string switch costs)
	byLayer             [][]int // indices of the targets of each layer
	global              []int   // indices of the targets of the whole calculation
}

func (pm *PileModel) newFast() (*fastModel, bool) {
	g, m, p := &pm.ground, &pm.methods, &pm.pile
	if len(g.PorePressures) > 0 || g.Surcharge != 0 || g.ExcavationDepth != 0 || g.Scour != (profile.Scour{}) ||
		m.CriticalDepth != 0 || len(m.NoShaft) > 0 || m.UndrainedLambda {
		return nil, false
	}
	prof, err := profile.New(*g)
	if err != nil {
		return nil, false
	}
	f := &fastModel{targets: pm.targets, head: float64(p.HeadDepth), tip: float64(p.Tip()),
		gw: float64(prof.WaterUnitWeight()), outer: float64(p.Section.OuterPerimeter()), inner: float64(p.Section.InnerPerimeter()),
		gross: float64(p.Section.GrossArea()), mat: float64(p.Section.MaterialArea()), canPlug: p.Section.CanPlug(),
		plug: p.Plug, selfWeight: m.SelfWeight, gp: float64(p.UnitWeight)}
	zw, wet := prof.WaterDepth()
	f.zw, f.dry = float64(zw), !wet
	tf := m.Tension
	if tf.Name == "" && tf.Value == 0 && tf.Drained == 0 && tf.Undrained == 0 {
		tf = pile.DefaultTension()
	}
	d := float64(p.Section.Size())
	f.tipLayer = -1
	for i, l := range prof.Layers() {
		fl := fastLayer{top: float64(l.Top), bot: float64(l.Bottom), drained: l.Drainage == profile.Drained,
			gamma: float64(l.UnitWeight), gsat: float64(l.SaturatedUnitWeight), phi: float64(l.Phi), c: float64(l.Cohesion),
			su0: float64(l.SuTop), su1: float64(l.SuBottom), tension: tf.For(l.Drainage)}
		ls := &g.Layers[i]
		phaseGiven := ls.DryUnitWeight != 0 || ls.VoidRatio != 0 || ls.WaterContent != 0 || ls.Gs != 0 || ls.Saturation != 0
		if phaseGiven && slices.ContainsFunc(pm.targets, func(t Target) bool {
			return t.Layer == i && (t.Key == KeyUnitWeight || t.Key == KeySaturatedUnitWeight)
		}) {
			return nil, false // the phase relations tie the weights together
		}
		if !phaseGiven && ls.UnitWeight == 0 && ls.SaturatedUnitWeight != 0 {
			fl.gamma, fl.gammaFromGsat = fl.gsat, true
		}
		lm := m.Layers[i]
		// The layer's shaft factor. NewAnalysis checks every layer's method,
		// on the pile or not: a layer with a sampled value must have one
		// the closed form knows, so that its check matches.
		onPile := fl.top < f.tip && fl.bot > f.head
		sampled := slices.ContainsFunc(pm.targets, func(t Target) bool { return t.Layer == i })
		known := true
		switch s := lm.Shaft.(type) {
		case shaft.BetaGiven:
			fl.kind, fl.beta = fBetaGiven, s.Beta
		case shaft.Beta:
			kg, ok1 := s.K.(shaft.KGiven)
			fl.k = kg.K
			switch dr := s.Delta.(type) {
			case shaft.DeltaGiven:
				fl.delta = float64(dr.Delta)
			case shaft.DeltaOverPhi:
				fl.delta, fl.deltaRatio = dr.Ratio, true
			default:
				ok1 = false
			}
			fl.kind = fBetaKD
			known = ok1
			dl := fl.delta
			if fl.deltaRatio {
				dl *= fl.phi
			}
			fl.tanDelta = math.Tan(dl)
		case shaft.AlphaGiven:
			fl.kind, fl.alpha = fAlphaGiven, s.Alpha
		default:
			known = false
		}
		switch {
		case lm.NoShaft:
			fl.kind = fNone // not checked by NewAnalysis either
		case lm.Lambda || !known:
			if onPile || sampled {
				return nil, false
			}
			fl.kind = fNone
		}
		// The tip: in the layer below where it is a boundary.
		if fl.top <= f.tip && (f.tip < fl.bot || i == prof.NumLayers()-1) && f.tipLayer < 0 {
			f.tipLayer = i
			switch t := lm.Tip.(type) {
			case bearing.GivenNq:
				f.tipNq, f.tipNc, f.limit = t.Nq, t.Nc, float64(t.Limit)
			case bearing.GivenNc:
				f.tipNc, f.tipUndrained = t.Nc, true
			default:
				return nil, false
			}
			// No rule of the tip zone may apply: the embedment ramp and the
			// layered rule within max(10, (Lb/D)cr)·D below the layer's top,
			// the weak-layer rule within WeakZoneRatio·D above the next.
			en := m.EmbedmentRatio
			if en == 0 {
				en = pile.DefaultEmbedmentRatio
			}
			if f.tip-fl.top < max(10, en)*d || (i < prof.NumLayers()-1 && fl.bot < f.tip+pile.WeakZoneRatio*d) {
				return nil, false
			}
		}
		f.lay = append(f.lay, fl)
	}
	if f.tipLayer < 0 {
		return nil, false
	}
	for _, t := range f.targets {
		f.codes = append(f.codes, keyCode(t.Key))
	}
	f.byLayer = make([][]int, len(f.lay))
	for i, t := range f.targets {
		if t.Layer < 0 {
			f.global = append(f.global, i)
		} else {
			f.byLayer[t.Layer] = append(f.byLayer[t.Layer], i)
		}
	}
	return f, true
}

// Capacity computes one sample in closed form; it allocates nothing.
func (f *fastModel) Capacity(x []float64) (Outcome, error) { return f.capacity(x) }

func (f *fastModel) capacity(x []float64) (Outcome, error) {
	// The sampled layers: a copy of the layer values is not needed, only
	// the few that change, kept in w as overrides applied below.
	zw := f.zw
	ft, fs := 1.0, 1.0
	for _, i := range f.global {
		{
			switch f.codes[i] {
			case cWaterDepth:
				zw = x[i]
			case cTipFactor:
				ft = x[i]
			case cShaftFactor:
				fs = x[i]
			}
		}
	}
	if err := checkFactors(ft, fs); err != nil {
		return Outcome{}, err
	}
	if !(zw >= -12e3) || !finite(zw) {
		return Outcome{}, &FieldError{Path: "water_depth", Msg: fmt.Sprintf("%.6g m is outside −12 km to ∞", zw)}
	}
	var out, tens, sv float64
	var qp, svTip float64
	nq, nc := f.tipNq, f.tipNc
	zt := f.tip
	zwSampled := zw != f.zw
	var own fastLayer
	for li := range f.lay {
		L := &f.lay[li]
		if len(f.byLayer[li]) > 0 {
			own = *L // a copy: the sample's values replace the base ones
			L = &own
		}
		for _, i := range f.byLayer[li] {
			v := x[i]
			switch f.codes[i] {
			case cFrictionAngle:
				L.phi = v
				if L.deltaRatio {
					L.tanDelta = math.Tan(L.delta * v)
				}
			case cUndrainedStrength:
				if L.su0 == L.su1 {
					L.su0, L.su1 = v, v
				} else {
					mid := (L.su0 + L.su1) / 2
					L.su0, L.su1 = L.su0*(v/mid), L.su1*(v/mid)
				}
			case cUnitWeight, cSaturatedUnitWeight:
				if !(v > 0) { // as the full computation refuses it
					return Outcome{}, &FieldError{Path: fmt.Sprintf("layers[%d].%s", li, f.targets[i].Key), Msg: fmt.Sprintf("%.6g kN/m3 is outside (0, 35]", v/1e3)}
				}
				if f.codes[i] == cUnitWeight {
					L.gamma = v
				} else {
					L.gsat = v
					if L.gammaFromGsat {
						L.gamma = v
					}
				}
			case cK:
				L.k = v
			case cDelta, cDeltaOverPhi:
				L.delta = v
				if L.deltaRatio {
					L.tanDelta = math.Tan(v * L.phi)
				} else {
					L.tanDelta = math.Tan(v)
				}
			case cBeta:
				L.beta = v
			case cAlpha:
				L.alpha = v
			case cNq:
				if li == f.tipLayer {
					nq = v
				}
			case cNc:
				if li == f.tipLayer {
					nc = v
				}
			}
		}
		// The base values passed at construction: only a layer with a
		// sampled value, or any layer when the water table moves, can fail.
		if (len(f.byLayer[li]) > 0 || zwSampled) && !f.valid(L, zw) {
			if err := f.check(li, L, zw); err != nil {
				return Outcome{}, err
			}
		}
		if li > f.tipLayer {
			continue // below the tip: checked only, as profile.New checks every layer
		}
		// σ′v through the layer: γ above the water table, γsat − γw below,
		// in at most two parts (plain comparisons: no NaN can occur here).
		for part := 0; part < 2; part++ {
			var a, b, g float64
			switch {
			case f.dry:
				if part == 1 {
					continue
				}
				a, b, g = L.top, L.bot, L.gamma
			case part == 0:
				if !(zw > L.top) {
					continue
				}
				a, b, g = L.top, L.bot, L.gamma
				if zw < b {
					b = zw
				}
			default:
				if !(L.bot > zw) {
					continue
				}
				a, b, g = L.top, L.bot, L.gsat-f.gw
				if zw > a {
					a = zw
				}
			}
			s0 := sv
			// The shaft over [max(a, head), min(b, tip)]; plain comparisons
			// (the builtins handle NaN, which cannot occur here, and cost more).
			za, zb := a, b
			if f.head > za {
				za = f.head
			}
			if zt < zb {
				zb = zt
			}
			if zb > za && L.kind != fNone {
				sa, sb := s0+g*(za-a), s0+g*(zb-a)
				var q float64
				switch L.kind {
				case fBetaGiven:
					q = L.beta * (sa + sb) / 2 * (zb - za)
				case fBetaKD:
					q = L.k * L.tanDelta * (sa + sb) / 2 * (zb - za)
				case fAlphaGiven:
					if L.su0 == L.su1 {
						q = L.alpha * L.su0 * (zb - za)
						break
					}
					h := L.bot - L.top
					sua := L.su0 + (L.su1-L.su0)*(za-L.top)/h
					sub := L.su0 + (L.su1-L.su0)*(zb-L.top)/h
					q = L.alpha * (sua + sub) / 2 * (zb - za)
				}
				out += q
				tens += L.tension * q
			}
			if li == f.tipLayer && zt >= a && zt <= b {
				svTip = s0 + g*(zt-a)
			}
			sv = s0 + g*(b-a)
		}
		if li == f.tipLayer {
			if err := f.checkTip(li, nq, nc); err != nil {
				return Outcome{}, err
			}
			if f.tipUndrained {
				su := L.su0 + (L.su1-L.su0)*(zt-L.top)/(L.bot-L.top)
				qp = nc * su
			} else {
				qp = nc*L.c + nq*svTip
				if f.limit > 0 && qp > f.limit {
					qp = f.limit
				}
			}
		}
	}
	if f.selfWeight == pile.WeightNet {
		qp = max(0, qp-svTip)
	}
	// W′ of the pile from the head to the tip.
	var wt float64
	if f.gp != 0 {
		h0, h1 := f.head, zt
		switch {
		case f.dry || zw >= h1:
			wt = f.gp * f.mat * (h1 - h0)
		case zw <= h0:
			wt = (f.gp - f.gw) * f.mat * (h1 - h0)
		default:
			wt = f.gp*f.mat*(zw-h0) + (f.gp-f.gw)*f.mat*(h1-zw)
		}
	}
	tip, sh := qp*f.gross, out*f.outer
	tenShaft := tens * f.outer
	if f.canPlug {
		unTip, unShaft := qp*f.mat, out*(f.outer+f.inner)
		if f.plug == pile.Unplugged || (f.plug == pile.PlugLesser && unTip+unShaft < tip+sh) {
			tip, sh = unTip, unShaft
		}
		if f.plug == pile.Unplugged {
			tenShaft = tens * (f.outer + f.inner)
		}
	}
	comp := ft*tip + fs*sh
	if f.selfWeight == pile.WeightGross {
		comp -= wt
	}
	return Outcome{Compression: comp, Tension: fs*tenShaft + wt}, nil
}

// valid reports whether check passes, without building its message.
func (f *fastModel) valid(L *fastLayer, zw float64) bool {
	return f.clauses(L, f.dry || L.top < zw, !f.dry && L.bot > zw) == 0
}

// The clauses of valid, each a bit of what clauses returns, and the
// values each reads: φ′; su; γ (and whether it is needed above the water
// table); γsat (and whether it is needed below); γsat against γw; γ
// against γsat; β; K; δ or δ/φ′; α.
const (
	clPhi = 1 << iota
	clSu
	clGamma
	clGsat
	clGsatWater
	clGammaGsat
	clBeta
	clK
	clDelta
	clAlpha
)

// clauses returns the clauses of check that L fails, with γ needed above
// the water table (needAbove) and γsat below it (needBelow).
func (f *fastModel) clauses(L *fastLayer, needAbove, needBelow bool) uint16 {
	const deg = math.Pi / 180
	const maxGamma = 35e3
	var bad uint16
	if L.drained && !(L.phi > 0 && L.phi <= 50*deg) {
		bad |= clPhi
	}
	if L.su0 != 0 || L.su1 != 0 || !L.drained {
		if !(L.su0 > 0) || !(L.su1 > 0) || !finite(L.su0) || !finite(L.su1) ||
			L.kind == fAlphaGiven && (L.su0 > 5e6 || L.su1 > 5e6) {
			bad |= clSu
		}
	}
	if (L.gamma != 0 || needAbove) && !(L.gamma > 0 && L.gamma <= maxGamma) {
		bad |= clGamma
	}
	if (L.gsat != 0 || needBelow) && !(L.gsat > 0 && L.gsat <= maxGamma) {
		bad |= clGsat
	}
	if L.gsat != 0 && L.gsat <= f.gw {
		bad |= clGsatWater
	}
	if L.gamma != 0 && L.gsat != 0 && L.gamma > L.gsat {
		bad |= clGammaGsat
	}
	switch L.kind {
	case fBetaGiven:
		if !(L.beta >= 0 && L.beta <= 3) {
			bad |= clBeta
		}
	case fBetaKD:
		if !(L.k >= 0 && L.k <= 10) {
			bad |= clK
		}
		if L.deltaRatio && !(L.delta > 0 && L.delta <= 1) || !L.deltaRatio && !(L.delta >= 0 && L.delta <= 50*deg) {
			bad |= clDelta
		}
	case fAlphaGiven:
		if !(L.alpha >= 0 && L.alpha <= 1.5) {
			bad |= clAlpha
		}
	}
	return bad
}

// check refuses a sampled layer value that profile.New or the layer's
// method would refuse, with the same accepted range.
func (f *fastModel) check(li int, L *fastLayer, zw float64) error {
	bad := func(key, msg string, a ...any) error {
		return &FieldError{Path: fmt.Sprintf("layers[%d].%s", li, key), Msg: fmt.Sprintf(msg, a...)}
	}
	deg := math.Pi / 180
	if L.drained && !(L.phi > 0 && L.phi <= 50*deg) {
		return bad(KeyFrictionAngle, "%.4g° is outside (0°, 50°]", L.phi/deg)
	}
	if L.su0 != 0 || L.su1 != 0 || !L.drained {
		if !(L.su0 > 0) || !(L.su1 > 0) || !finite(L.su0) || !finite(L.su1) {
			return bad(KeyUndrainedStrength, "%.6g kPa is outside (0, ∞)", min(L.su0, L.su1)/1e3)
		}
		if L.kind == fAlphaGiven && max(L.su0, L.su1) > 5e6 {
			return bad(KeyUndrainedStrength, "%.6g kPa is outside (0, 5 MPa]", max(L.su0, L.su1)/1e3)
		}
	}
	const maxGamma = 35e3
	needAbove := f.dry || L.top < zw
	needBelow := !f.dry && L.bot > zw
	if (L.gamma != 0 || needAbove) && !(L.gamma > 0 && L.gamma <= maxGamma) {
		return bad(KeyUnitWeight, "%.6g kN/m3 is outside (0, 35]", L.gamma/1e3)
	}
	if (L.gsat != 0 || needBelow) && !(L.gsat > 0 && L.gsat <= maxGamma) {
		return bad(KeySaturatedUnitWeight, "%.6g kN/m3 is outside (0, 35]", L.gsat/1e3)
	}
	if L.gsat != 0 && L.gsat <= f.gw {
		return bad(KeySaturatedUnitWeight, "%.6g kN/m3 is not more than γw = %.4g kN/m3", L.gsat/1e3, f.gw/1e3)
	}
	if L.gamma != 0 && L.gsat != 0 && L.gamma > L.gsat {
		return bad(KeyUnitWeight, "%.6g kN/m3 above water exceeds the saturated unit weight %.6g kN/m3", L.gamma/1e3, L.gsat/1e3)
	}
	switch L.kind {
	case fBetaGiven:
		if !(L.beta >= 0 && L.beta <= 3) {
			return bad(KeyBeta, "%.6g is outside 0 to 3", L.beta)
		}
	case fBetaKD:
		if !(L.k >= 0 && L.k <= 10) {
			return bad(KeyK, "%.6g is outside 0 to 10", L.k)
		}
		if L.deltaRatio {
			if !(L.delta > 0 && L.delta <= 1) {
				return bad(KeyDeltaOverPhi, "%.6g is outside (0, 1]", L.delta)
			}
		} else if !(L.delta >= 0 && L.delta <= 50*deg) {
			return bad(KeyDelta, "%.4g° is outside 0° to 50°", L.delta/deg)
		}
	case fAlphaGiven:
		if !(L.alpha >= 0 && L.alpha <= 1.5) {
			return bad(KeyAlpha, "%.6g is outside 0 to 1.5", L.alpha)
		}
	}
	return nil
}

// checkTip refuses the tip factors the tip method would refuse.
func (f *fastModel) checkTip(li int, nq, nc float64) error {
	bad := func(key, msg string, a ...any) error {
		return &FieldError{Path: fmt.Sprintf("layers[%d].%s", li, key), Msg: fmt.Sprintf(msg, a...)}
	}
	if f.tipUndrained {
		if !(nc >= 1 && nc <= 100) {
			return bad(KeyNc, "%.6g is outside 1 to 100", nc)
		}
		return nil
	}
	if !(nq >= 1 && nq <= 1e4) {
		return bad(KeyNq, "%.6g is outside 1 to 1e+04", nq)
	}
	if !(nc >= 0 && nc <= 1e4) {
		return bad(KeyNc, "%.6g is outside 0 to 1e+04", nc)
	}
	return nil
}

// Key codes of the closed form's hot loop.
const (
	cFrictionAngle = iota
	cUndrainedStrength
	cUnitWeight
	cSaturatedUnitWeight
	cK
	cKOverK0
	cKOverKp
	cDelta
	cDeltaOverPhi
	cBeta
	cAlpha
	cNq
	cNc
	cWaterDepth
	cTipFactor
	cShaftFactor
)

// keyCode returns the code of a key (LayerKeys then GlobalKeys, in order).
func keyCode(k string) int {
	if i := slices.Index(LayerKeys, k); i >= 0 {
		return i
	}
	if i := slices.Index(GlobalKeys, k); i >= 0 {
		return cWaterDepth + i
	}
	panic("reliability: unknown key " + k)
}
