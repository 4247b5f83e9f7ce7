package reliability

import (
	"math"

	"github.com/qultgeo/qult/pile"
)

// chunk is the number of samples MonteCarlo draws, maps and computes
// together within a block (BlockSize is a multiple of it). A chunk's
// draws are taken in the order of one sample after another, each
// parameter's map is that of transform and each sample's arithmetic that
// of fastModel.capacity, in the same order of operations: chunks change no
// bit of a run. They only change the order of the loops, so that a loop
// runs over the samples of one layer with its values hoisted out of it.
const chunk = 256

// chunkLayer is one layer of the closed form as fastChunk computes it.
// Each value the sums read is a column of chunk samples: a column of the
// parameter values, one derived from them, or the base value repeated.
type chunkLayer struct {
	L                 *fastLayer
	gamma, gsat       []float64
	k, tanDelta, beta []float64
	alpha, su0, su1   []float64
	phi, delta        []float64    // read by tan δ where one of them is sampled
	xSu               []float64    // the sampled su (mid-layer), or nil
	scaleSu           bool         // su linear in the layer: su0 and su1 scaled from xSu
	tanFrom           int          // 0: tanDelta fixed; tanRatio: tan(δ/φ′·φ′); tanDirect: tan δ
	param             [nFields]int // the parameter of each sampled value, −1: not sampled
	check             bool         // the layer is checked in every sample
	fixedOK           [2][2]bool   // the clauses on values not sampled, by γ needed above and γsat below the water table
	fixedAlways       bool         // every entry of fixedOK is true
	sampledLayer      bool         // a target of the layer (the scalar path then checks it in every sample)
	nqCol, ncCol      []float64    // tip layer: Nq, Nc
	nqParam, ncParam  int          // their parameters, −1: not sampled
}

// The values of a layer a target can set.
const (
	fdPhi = iota
	fdSu
	fdGamma
	fdGsat
	fdK
	fdDelta
	fdBeta
	fdAlpha
	nFields
)

const (
	tanRatio = iota + 1
	tanDirect
)

// fieldClauses are the clauses of fastModel.clauses that read each value.
var fieldClauses = [nFields]uint16{
	fdPhi: clPhi, fdSu: clSu, fdGamma: clGamma | clGammaGsat, fdGsat: clGsat | clGsatWater | clGammaGsat,
	fdK: clK, fdDelta: clDelta, fdBeta: clBeta, fdAlpha: clAlpha,
}

// fastChunk computes chunks of samples of a fastModel for one worker.
type fastChunk struct {
	f                *fastModel
	lay              []chunkLayer
	zw, ft, fs       []float64
	zwSampled        bool
	sv, out, tens    []float64
	svTip, qp        []float64
	zmin, zmax       float64 // bounds on the chunk's water depths
	zExact           bool    // zmin and zmax are the least and greatest
	x                []float64
	ftParam, fsParam int // the parameters of the model factors, −1: not sampled
	zwParam          int // of the water depth
	// lo and hi bound each parameter's values in the chunk (nil: not
	// known; then the values themselves are read).
	lo, hi []float64
	// usable is false where a value not sampled fails a check (every
	// sample would be refused): then no chunk is computed here.
	usable bool
}

// newChunk prepares the columns of a worker: x holds the parameter
// values of a chunk, parameter j in x[j*chunk:(j+1)*chunk].
func (f *fastModel) newChunk(x []float64) *fastChunk {
	fc := &fastChunk{f: f, usable: true, x: x, ftParam: -1, fsParam: -1, zwParam: -1}
	col := func(j int) []float64 { return x[j*chunk : (j+1)*chunk : (j+1)*chunk] }
	konst := func(v float64) []float64 {
		c := make([]float64, chunk)
		for i := range c {
			c[i] = v
		}
		return c
	}
	scratch := func() []float64 { return make([]float64, chunk) }
	fc.sv, fc.out, fc.tens, fc.svTip, fc.qp = scratch(), scratch(), scratch(), scratch(), scratch()
	fc.zw, fc.ft, fc.fs = konst(f.zw), konst(1), konst(1)
	for _, i := range f.global {
		switch f.codes[i] {
		case cWaterDepth:
			fc.zw, fc.zwSampled, fc.zwParam = col(i), true, i
		case cTipFactor:
			fc.ft, fc.ftParam = col(i), i
		case cShaftFactor:
			fc.fs, fc.fsParam = col(i), i
		}
	}
	if !fc.zwSampled && (!(f.zw >= -12e3) || !finite(f.zw)) {
		fc.usable = false
	}
	fc.lay = make([]chunkLayer, len(f.lay))
	for li := range f.lay {
		L := &f.lay[li]
		cl := &fc.lay[li]
		cl.L = L
		cl.sampledLayer = len(f.byLayer[li]) > 0
		cl.check = cl.sampledLayer || fc.zwSampled
		var xs [nFields][]float64
		var nq, nc []float64
		cl.param = [nFields]int{-1, -1, -1, -1, -1, -1, -1, -1}
		cl.nqParam, cl.ncParam = -1, -1
		set := func(fd, i int) { xs[fd], cl.param[fd] = col(i), i }
		for _, i := range f.byLayer[li] {
			switch f.codes[i] {
			case cFrictionAngle:
				set(fdPhi, i)
			case cUndrainedStrength:
				set(fdSu, i)
			case cUnitWeight:
				set(fdGamma, i)
			case cSaturatedUnitWeight:
				set(fdGsat, i)
			case cK:
				set(fdK, i)
			case cDelta, cDeltaOverPhi:
				set(fdDelta, i)
			case cBeta:
				set(fdBeta, i)
			case cAlpha:
				set(fdAlpha, i)
			case cNq:
				nq, cl.nqParam = col(i), i
			case cNc:
				nc, cl.ncParam = col(i), i
			}
		}
		or := func(c []float64, v float64) []float64 {
			if c != nil {
				return c
			}
			return konst(v)
		}
		var sampledClauses uint16
		for fd, c := range xs {
			if c != nil {
				sampledClauses |= fieldClauses[fd]
			}
		}
		cl.gamma, cl.gsat = or(xs[fdGamma], L.gamma), or(xs[fdGsat], L.gsat)
		if L.gammaFromGsat {
			// γ is γsat, sampled or not (no target sets γ itself).
			cl.gamma = cl.gsat
			if xs[fdGsat] != nil {
				sampledClauses |= clGamma
			}
		}
		cl.k, cl.beta, cl.alpha = or(xs[fdK], L.k), or(xs[fdBeta], L.beta), or(xs[fdAlpha], L.alpha)
		cl.phi, cl.delta = or(xs[fdPhi], L.phi), or(xs[fdDelta], L.delta)
		cl.xSu = xs[fdSu]
		switch {
		case cl.xSu == nil:
			cl.su0, cl.su1 = konst(L.su0), konst(L.su1)
		case L.su0 == L.su1:
			cl.su0, cl.su1 = cl.xSu, cl.xSu
		default:
			cl.su0, cl.su1, cl.scaleSu = scratch(), scratch(), true
		}
		cl.tanDelta = konst(L.tanDelta)
		switch {
		case L.deltaRatio && (xs[fdPhi] != nil || xs[fdDelta] != nil):
			cl.tanDelta, cl.tanFrom = scratch(), tanRatio
		case !L.deltaRatio && xs[fdDelta] != nil:
			cl.tanDelta, cl.tanFrom = scratch(), tanDirect
		}
		cl.fixedAlways = true
		for na := range 2 {
			for nb := range 2 {
				ok := f.clauses(L, na == 1, nb == 1)&^sampledClauses == 0
				cl.fixedOK[na][nb] = ok
				cl.fixedAlways = cl.fixedAlways && ok
			}
		}
		if cl.check && !fc.zwSampled && !cl.fixedOK[b2i(f.dry || L.top < f.zw)][b2i(!f.dry && L.bot > f.zw)] {
			fc.usable = false
		}
		if li == f.tipLayer {
			cl.nqCol, cl.ncCol = or(nq, f.tipNq), or(nc, f.tipNc)
			if f.checkTip(li, f.tipNq, f.tipNc) != nil && (nq == nil || nc == nil) {
				// A fixed factor may be out of range: leave it to the
				// scalar path, which says which.
				fc.usable = false
			}
		}
	}
	return fc
}

func b2i(b bool) int {
	if b {
		return 1
	}
	return 0
}

// capacity computes the first c samples of the chunk in x into comp and
// tens; lo and hi, if not nil, bound each parameter's values. It returns
// false, having written nothing that counts, where a sample may be
// refused or give no finite capacity: the caller then computes the chunk
// one sample at a time, which finds the refusal.
func (fc *fastChunk) capacity(c int, comp, tens, lo, hi []float64) bool {
	if !fc.usable {
		return false
	}
	f := fc.f
	fc.lo, fc.hi = lo, hi
	factor := func(lo, hi float64) bool { return lo >= 0 && hi <= math.MaxFloat64 }
	if fc.ftParam >= 0 && !fc.within(fc.ftParam, c, factor) || fc.fsParam >= 0 && !fc.within(fc.fsParam, c, factor) {
		return false
	}
	fc.zmin, fc.zmax, fc.zExact = f.zw, f.zw, true
	if fc.zwParam >= 0 {
		if lo != nil {
			fc.zmin, fc.zmax, fc.zExact = lo[fc.zwParam], hi[fc.zwParam], false
		} else {
			fc.exactZ(c)
		}
		if !(fc.zmin >= -12e3 && fc.zmax <= math.MaxFloat64) && (fc.zExact || !fc.exactZ(c) || !(fc.zmin >= -12e3 && fc.zmax <= math.MaxFloat64)) {
			return false
		}
	}
	sv, out, tn, svTip, qp := fc.sv[:c], fc.out[:c], fc.tens[:c], fc.svTip[:c], fc.qp[:c]
	clear(sv)
	clear(out)
	clear(tn)
	clear(svTip)
	clear(qp)
	for li := range fc.lay {
		cl := &fc.lay[li]
		L := cl.L
		if cl.scaleSu {
			su0, su1, xs := cl.su0[:c], cl.su1[:c], cl.xSu[:c]
			mid := (L.su0 + L.su1) / 2
			for s, v := range xs {
				su0[s], su1[s] = L.su0*(v/mid), L.su1*(v/mid)
			}
		}
		switch cl.tanFrom {
		case tanRatio:
			t, d, p := cl.tanDelta[:c], cl.delta[:c], cl.phi[:c]
			for s := range t {
				t[s] = math.Tan(d[s] * p[s])
			}
		case tanDirect:
			t, d := cl.tanDelta[:c], cl.delta[:c]
			for s := range t {
				t[s] = math.Tan(d[s])
			}
		}
		if cl.check && !fc.checkLayer(cl, c) {
			return false
		}
		if li > f.tipLayer {
			continue
		}
		fc.layer(cl, li == f.tipLayer, c)
		if li == f.tipLayer && !fc.tip(cl, c) {
			return false
		}
	}
	fc.finish(c, comp, tens)
	return allFinite(comp[:c]) && allFinite(tens[:c])
}

// exactZ sets zmin and zmax to the least and greatest water depth of the
// chunk; it reports whether they were only bounds before.
func (fc *fastChunk) exactZ(c int) bool {
	was := fc.zExact
	fc.zmin, fc.zmax = span(fc.zw[:c])
	fc.zExact = true
	return !was
}

// within reports whether ok holds for the least and greatest value of
// parameter j in the chunk: first for the bounds given with the chunk,
// then, where they do not tell, for the values themselves.
func (fc *fastChunk) within(j, c int, ok func(lo, hi float64) bool) bool {
	if fc.lo != nil && ok(fc.lo[j], fc.hi[j]) {
		return true
	}
	lo, hi := span(fc.x[j*chunk : j*chunk+c])
	return ok(lo, hi)
}

// allFinite reports whether no value is infinite or NaN.
func allFinite(v []float64) bool {
	const exp = 0x7ff << 52
	var special uint64
	for _, x := range v {
		special |= math.Float64bits(x)&exp + 1<<52 // bit 63: exponent all ones
	}
	return special>>63 == 0
}

// checkLayer reports whether no sample of the chunk fails the layer's
// checks (fastModel.clauses and the refusal of a unit weight ≤ 0).
func (fc *fastChunk) checkLayer(cl *chunkLayer, c int) bool {
	const deg = math.Pi / 180
	const maxGamma = 35e3
	f, L := fc.f, cl.L
	// The clauses on the values not sampled depend on the sample through
	// the water table only: by whether γ is needed (the water table below
	// the layer's top) and γsat (above its bottom). Where one the chunk
	// may reach fails, the chunk goes one sample at a time (the scalar
	// path checks a layer without a target only where the water table
	// differs from its base depth, and says which sample fails).
	if fc.zwSampled && !cl.fixedAlways && !fc.fixedHold(cl) && (fc.zExact || !fc.exactZ(c) || !fc.fixedHold(cl)) {
		return false
	}
	// The sampled values, each checked by its least and greatest value
	// in the chunk (a NaN fails every check). A sampled unit weight is
	// above 0 (the explicit refusal), so that the clause on it holds
	// whether or not the weight is needed.
	gammaS, gsatS := cl.param[fdGamma] >= 0, cl.param[fdGsat] >= 0
	if gammaS && !fc.within(cl.param[fdGamma], c, func(lo, hi float64) bool {
		return lo > 0 && hi <= maxGamma && (gsatS || L.gsat == 0 || hi <= L.gsat)
	}) {
		return false
	}
	if gsatS && !fc.within(cl.param[fdGsat], c, func(lo, hi float64) bool {
		return lo > 0 && hi <= maxGamma && lo > f.gw && (gammaS || L.gammaFromGsat || L.gamma == 0 || lo >= L.gamma)
	}) {
		return false
	}
	if gammaS && gsatS {
		g, gs := cl.gamma[:c], cl.gsat[:c]
		for s := range g {
			if g[s] != 0 && gs[s] != 0 && g[s] > gs[s] {
				return false
			}
		}
	}
	if j := cl.param[fdPhi]; j >= 0 && L.drained && !fc.within(j, c, func(lo, hi float64) bool { return lo > 0 && hi <= 50*deg }) {
		return false
	}
	if j := cl.param[fdSu]; j >= 0 {
		su := func(lo, hi float64) bool {
			return lo > 0 && hi <= math.MaxFloat64 && (L.kind != fAlphaGiven || hi <= 5e6)
		}
		ok := false
		if cl.scaleSu {
			lo0, hi0 := span(cl.su0[:c])
			lo1, hi1 := span(cl.su1[:c])
			ok = su(min(lo0, lo1), max(hi0, hi1))
		} else {
			ok = fc.within(j, c, su)
		}
		if !ok && !fc.checkSu(cl, c) {
			return false
		}
	}
	var j int
	var lo, hi float64
	switch {
	case L.kind == fBetaGiven:
		j, lo, hi = cl.param[fdBeta], 0, 3
	case L.kind == fAlphaGiven:
		j, lo, hi = cl.param[fdAlpha], 0, 1.5
	case L.kind == fBetaKD:
		j, lo, hi = cl.param[fdK], 0, 10
	default:
		j = -1
	}
	if j >= 0 && !fc.within(j, c, func(a, b float64) bool { return a >= lo && b <= hi }) {
		return false
	}
	if j := cl.param[fdDelta]; j >= 0 && L.kind == fBetaKD && !fc.within(j, c, func(a, b float64) bool {
		return L.deltaRatio && a > 0 && b <= 1 || !L.deltaRatio && a >= 0 && b <= 50*deg
	}) {
		return false
	}
	return true
}

// fixedHold reports whether the clauses on the layer's values not
// sampled hold at every water depth from zmin to zmax.
func (fc *fastChunk) fixedHold(cl *chunkLayer) bool {
	L, lo, hi := cl.L, fc.zmin, fc.zmax
	if fc.f.dry {
		return cl.fixedOK[1][0]
	}
	return (lo > L.top || cl.fixedOK[0][1]) && (lo >= L.bot || hi <= L.top || cl.fixedOK[1][1]) && (hi < L.bot || cl.fixedOK[1][0])
}

// checkSu is the check of a sampled su sample by sample (an su of 0 in a
// drained layer is not checked).
func (fc *fastChunk) checkSu(cl *chunkLayer, c int) bool {
	L := cl.L
	su0, su1 := cl.su0[:c], cl.su1[:c]
	for s := range su0 {
		a, b := su0[s], su1[s]
		if (a != 0 || b != 0 || !L.drained) &&
			(!(a > 0) || !(b > 0) || !finite(a) || !finite(b) || L.kind == fAlphaGiven && (a > 5e6 || b > 5e6)) {
			return false
		}
	}
	return true
}

// span returns the least and greatest of the values, or NaN for both
// where one is NaN or infinite (every check refuses both).
func span(v []float64) (lo, hi float64) {
	const exp = 0x7ff << 52
	lo, hi = math.Inf(1), math.Inf(-1)
	var special uint64
	for _, x := range v {
		if x < lo {
			lo = x
		}
		if x > hi {
			hi = x
		}
		// Bit 63 of special is set where the exponent of x is all ones:
		// an infinity or a NaN.
		special |= math.Float64bits(x)&exp + 1<<52
	}
	if special>>63 != 0 {
		return math.NaN(), math.NaN()
	}
	return lo, hi
}

// layer adds the layer's shaft resistance and effective stress to the
// chunk's sums: fastModel.capacity's loop over the parts of a layer above
// and below the water table, for every sample.
func (fc *fastChunk) layer(cl *chunkLayer, isTip bool, c int) {
	f, L := fc.f, cl.L
	zt, head, gw := f.tip, f.head, f.gw
	top, bot := L.top, L.bot
	kind, tension := L.kind, L.tension
	zwc := fc.zw[:c]
	sv, out, tn, svTip := fc.sv[:c], fc.out[:c], fc.tens[:c], fc.svTip[:c]
	gam, gsat := cl.gamma[:c], cl.gsat[:c]
	kc, tanD, beta := cl.k[:c], cl.tanDelta[:c], cl.beta[:c]
	alpha, su0c, su1c := cl.alpha[:c], cl.su0[:c], cl.su1[:c]
	// Where every sample of the chunk has the water table below the
	// layer (or the site is dry), or every one above it, the layer is one
	// part with the same ends in every sample.
	switch {
	case f.dry || fc.zmin >= bot:
		fc.wholeLayer(cl, isTip, c, gam, 0)
		return
	case fc.zmax <= top:
		fc.wholeLayer(cl, isTip, c, gsat, gw)
		return
	}
	dry := f.dry
	for s := range sv {
		zw := zwc[s]
		for part := 0; part < 2; part++ {
			var a, b, g float64
			switch {
			case dry:
				if part == 1 {
					continue
				}
				a, b, g = top, bot, gam[s]
			case part == 0:
				if !(zw > top) {
					continue
				}
				a, b, g = top, bot, gam[s]
				if zw < b {
					b = zw
				}
			default:
				if !(bot > zw) {
					continue
				}
				a, b, g = top, bot, gsat[s]-gw
				if zw > a {
					a = zw
				}
			}
			s0 := sv[s]
			za, zb := a, b
			if head > za {
				za = head
			}
			if zt < zb {
				zb = zt
			}
			if zb > za && kind != fNone {
				sa, sb := s0+g*(za-a), s0+g*(zb-a)
				var q float64
				switch kind {
				case fBetaGiven:
					q = beta[s] * (sa + sb) / 2 * (zb - za)
				case fBetaKD:
					q = kc[s] * tanD[s] * (sa + sb) / 2 * (zb - za)
				case fAlphaGiven:
					su0, su1 := su0c[s], su1c[s]
					if su0 == su1 {
						q = alpha[s] * su0 * (zb - za)
						break
					}
					h := bot - top
					sua := su0 + (su1-su0)*(za-top)/h
					sub := su0 + (su1-su0)*(zb-top)/h
					q = alpha[s] * (sua + sub) / 2 * (zb - za)
				}
				out[s] += q
				tn[s] += tension * q
			}
			if isTip && zt >= a && zt <= b {
				svTip[s] = s0 + g*(zt-a)
			}
			sv[s] = s0 + g*(b-a)
		}
	}
}

// wholeLayer is layer where the layer is one part, from its top to its
// bottom, in every sample, with the unit weight gcol[s] − sub: the same
// operations on the same values as layer's loop (the ends and lengths
// taken out of it).
func (fc *fastChunk) wholeLayer(cl *chunkLayer, isTip bool, c int, gcol []float64, sub float64) {
	f, L := fc.f, cl.L
	a, b := L.top, L.bot
	za, zb := a, b
	if f.head > za {
		za = f.head
	}
	if f.tip < zb {
		zb = f.tip
	}
	sv, out, tn, svTip := fc.sv[:c], fc.out[:c], fc.tens[:c], fc.svTip[:c]
	gcol = gcol[:c]
	// The effective stress at the tip, where it lies in the layer, and at
	// the layer's bottom, in the loop that sums the shaft.
	tipHere, dt, h := isTip && f.tip >= a && f.tip <= b, f.tip-a, b-a
	kind := L.kind
	if !(zb > za) {
		kind = fNone
	}
	dza, dzb, dz, tension := za-a, zb-a, zb-za, L.tension
	switch kind {
	case fBetaGiven:
		beta := cl.beta[:c]
		for s := range sv {
			s0, g := sv[s], gcol[s]-sub
			sa, sb := s0+g*dza, s0+g*dzb
			q := beta[s] * (sa + sb) / 2 * dz
			out[s] += q
			tn[s] += tension * q
			if tipHere {
				svTip[s] = s0 + g*dt
			}
			sv[s] = s0 + g*h
		}
	case fBetaKD:
		kc, tanD := cl.k[:c], cl.tanDelta[:c]
		for s := range sv {
			s0, g := sv[s], gcol[s]-sub
			sa, sb := s0+g*dza, s0+g*dzb
			q := kc[s] * tanD[s] * (sa + sb) / 2 * dz
			out[s] += q
			tn[s] += tension * q
			if tipHere {
				svTip[s] = s0 + g*dt
			}
			sv[s] = s0 + g*h
		}
	case fAlphaGiven:
		alpha, su0c, su1c := cl.alpha[:c], cl.su0[:c], cl.su1[:c]
		hl := L.bot - L.top
		for s := range sv {
			su0, su1 := su0c[s], su1c[s]
			var q float64
			if su0 == su1 {
				q = alpha[s] * su0 * dz
			} else {
				sua := su0 + (su1-su0)*(za-L.top)/hl
				sub2 := su0 + (su1-su0)*(zb-L.top)/hl
				q = alpha[s] * (sua + sub2) / 2 * dz
			}
			out[s] += q
			tn[s] += tension * q
			s0, g := sv[s], gcol[s]-sub
			if tipHere {
				svTip[s] = s0 + g*dt
			}
			sv[s] = s0 + g*h
		}
	default:
		for s := range sv {
			s0, g := sv[s], gcol[s]-sub
			if tipHere {
				svTip[s] = s0 + g*dt
			}
			sv[s] = s0 + g*h
		}
	}
}

// tip checks the tip layer's factors and sets qp; false where one is out
// of range.
func (fc *fastChunk) tip(cl *chunkLayer, c int) bool {
	f, L := fc.f, cl.L
	nq, nc := cl.nqCol[:c], cl.ncCol[:c]
	if cl.ncParam >= 0 && !fc.within(cl.ncParam, c, func(lo, hi float64) bool {
		return f.tipUndrained && lo >= 1 && hi <= 100 || !f.tipUndrained && lo >= 0 && hi <= 1e4
	}) {
		return false
	}
	if cl.nqParam >= 0 && !f.tipUndrained && !fc.within(cl.nqParam, c, func(lo, hi float64) bool { return lo >= 1 && hi <= 1e4 }) {
		return false
	}
	qp, svTip := fc.qp[:c], fc.svTip[:c]
	zt := f.tip
	if f.tipUndrained {
		su0c, su1c := cl.su0[:c], cl.su1[:c]
		for s := range qp {
			su0, su1 := su0c[s], su1c[s]
			su := su0 + (su1-su0)*(zt-L.top)/(L.bot-L.top)
			qp[s] = nc[s] * su
		}
		return true
	}
	for s := range qp {
		q := nc[s]*L.c + nq[s]*svTip[s]
		if f.limit > 0 && q > f.limit {
			q = f.limit
		}
		qp[s] = q
	}
	return true
}

// finish turns the chunk's sums into the capacities, as the end of
// fastModel.capacity does.
func (fc *fastChunk) finish(c int, comp, tens []float64) {
	f := fc.f
	zwc, ftc, fsc := fc.zw[:c], fc.ft[:c], fc.fs[:c]
	out, tn, svTip, qpc := fc.out[:c], fc.tens[:c], fc.svTip[:c], fc.qp[:c]
	comp, tens = comp[:c], tens[:c]
	// The model's constants out of the loop (the compiler reloads fields
	// through a pointer after every store).
	zt, head, gp, gw, mat, gross := f.tip, f.head, f.gp, f.gw, f.mat, f.gross
	outer, inner, dry, canPlug, plug := f.outer, f.inner, f.dry, f.canPlug, f.plug
	net, gross2 := f.selfWeight == pile.WeightNet, f.selfWeight == pile.WeightGross
	if !net && !gross2 && gp == 0 && !canPlug {
		// No weight and no plug: the common case, the same operations.
		for s := range comp {
			fs := fsc[s]
			comp[s], tens[s] = ftc[s]*(qpc[s]*gross)+fs*(out[s]*outer), fs*(tn[s]*outer)+0
		}
		return
	}
	for s := range comp {
		zw, qp := zwc[s], qpc[s]
		if net {
			qp = max(0, qp-svTip[s])
		}
		var wt float64
		if gp != 0 {
			h0, h1 := head, zt
			switch {
			case dry || zw >= h1:
				wt = gp * mat * (h1 - h0)
			case zw <= h0:
				wt = (gp - gw) * mat * (h1 - h0)
			default:
				wt = gp*mat*(zw-h0) + (gp-gw)*mat*(h1-zw)
			}
		}
		tip, sh := qp*gross, out[s]*outer
		tenShaft := tn[s] * outer
		if canPlug {
			unTip, unShaft := qp*mat, out[s]*(outer+inner)
			if plug == pile.Unplugged || (plug == pile.PlugLesser && unTip+unShaft < tip+sh) {
				tip, sh = unTip, unShaft
			}
			if plug == pile.Unplugged {
				tenShaft = tn[s] * (outer + inner)
			}
		}
		ft, fs := ftc[s], fsc[s]
		cp := ft*tip + fs*sh
		if gross2 {
			cp -= wt
		}
		comp[s], tens[s] = cp, fs*tenShaft+wt
	}
}
