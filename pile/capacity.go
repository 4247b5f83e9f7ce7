package pile

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// Capacity is the axial capacity of the pile with its tip at one depth.
type Capacity struct {
	TipDepth units.Length // depth of the tip below ground
	UnitTip  units.Stress // qp after limits, the embedment ramp, the layered and the weak-layer rules (net of σ′v with WeightNet)
	Tip      units.Force  // Qp on the area of the governing plug mode
	Shaft    units.Force  // Qs in compression, on the perimeter(s) of that mode
	Weight   units.Force  // W′, the pile's effective weight (buoyant below water)
	// Compression is Rc = Qp + Qs, less W′ with WeightGross.
	Compression units.Force
	// TensionShaft is the shaft resistance in tension (outer perimeter,
	// and the inner one when Pile.Plug is Unplugged) times the tension
	// factor; Tension is Rt = TensionShaft + W′.
	TensionShaft units.Force
	Tension      units.Force
	// DesignCompression and DesignTension apply the multipliers of the
	// analysis' design case (equal to Compression and Tension without one).
	DesignCompression units.Force
	DesignTension     units.Force
	Plugged           bool // the plugged mode governs (always true for solid sections)
	Flags             Flags
}

// sums are the running integrals along the shaft from the head.
type sums struct {
	outer   float64 // ∫ fs dz, N/m, over layers not using λ
	design  float64 // ∫ fShaft·fs dz
	tension float64 // ∫ fTension·t·fs dz, t the layer's tension factor
	uplift  float64 // ∫ t·fs dz
	// λ layers: ∫σ′v dz, ∫su dz and their length.
	lamSig, lamSu, lamLen float64
	lamF, lamFt           float64 // design multipliers of the λ method
	lamVal                float64 // a λ given instead of the table, 0 for none
	weight                float64 // W′ of the pile down to here, N
	flags                 Flags
	k                     int // index of the interval reached, a hint for the next call
}

// Capacity returns the capacity of the pile with its tip at the pile's
// own tip depth. It allocates nothing.
func (a *Analysis) Capacity() (Capacity, error) {
	return a.CapacityAt(a.pile.Tip())
}

// CapacityAt returns the capacity with the tip at depth tip (the head stays
// where the pile puts it). It allocates nothing.
func (a *Analysis) CapacityAt(tip units.Length) (Capacity, error) {
	head := float64(a.pile.HeadDepth)
	t := float64(tip)
	if !(t > head) || t > float64(a.prof.Depth()) {
		return Capacity{}, fmt.Errorf("pile: tip depth %v: want below the head (%v) and within the profile (to %v)", tip, a.pile.HeadDepth, a.prof.Depth())
	}
	var s sums
	if err := a.addShaft(&s, head, t, nil, nil); err != nil {
		return Capacity{}, err
	}
	var c Capacity
	err := a.finish(&s, t, &c)
	return c, err
}

// segRecord is one segment of a shaft sum: interval k from top to bot, and
// what segment added to a sum that was zero.
type segRecord struct {
	k, layer int
	top, bot float64
	s        sums
}

// reuse is what addShaft may take from another analysis' pass: its
// segments, and which layers have the same methods in both analyses.
type reuse struct {
	segs []segRecord
	same []bool
	cur  int
}

// find returns the recorded segment of layer li from top to bot, if there
// is one; the calls come in depth order.
func (r *reuse) find(li int, top, bot float64) (*sums, bool) {
	if r == nil || li >= len(r.same) || !r.same[li] {
		return nil, false
	}
	for r.cur < len(r.segs) && r.segs[r.cur].top < top {
		r.cur++
	}
	if r.cur < len(r.segs) {
		g := &r.segs[r.cur]
		if g.layer == li && g.top == top && g.bot == bot {
			return &g.s, true
		}
	}
	return nil, false
}

// addShaft adds the shaft from z0 to z1 (z0 < z1) to s, interval by
// interval. With rec not nil, each segment is also appended to *rec, so
// that Breakdown can show it as a row without integrating it again: it is
// then integrated from a zero sum and added to s field by field, which
// gives s the same bits (x + (0 + q) = x + q).
//
// With from not nil, a segment of a layer that from marks the same, with
// the same ends as one from recorded, is taken from it: the same
// operations on the same values (see ShaftPass), so the same bits.
func (a *Analysis) addShaft(s *sums, z0, z1 float64, rec *[]segRecord, from *reuse) error {
	for k := a.intervalFrom(z0, s.k); k < len(a.iv) && a.iv[k].top < z1; k++ {
		s.k = k
		iv := &a.iv[k]
		top, bot := iv.top, iv.bot // plain comparisons: min and max handle NaN and cost more here
		if z0 > top {
			top = z0
		}
		if z1 < bot {
			bot = z1
		}
		if !(bot > top) {
			continue
		}
		if rec == nil {
			if err := a.segment(s, iv, top, bot); err != nil {
				return err
			}
			continue
		}
		var t sums
		if g, ok := from.find(iv.layer, top, bot); ok {
			t = *g
		} else if err := a.segment(&t, iv, top, bot); err != nil {
			return err
		}
		*rec = append(*rec, segRecord{k: k, layer: iv.layer, top: top, bot: bot, s: t})
		s.add(&t)
	}
	return nil
}

// add adds to s the sums t of one segment, as segment adds them.
func (s *sums) add(t *sums) {
	s.weight += t.weight
	s.flags |= t.flags
	s.outer += t.outer
	s.design += t.design
	s.tension += t.tension
	s.uplift += t.uplift
	if t.lamLen != 0 {
		s.lamSig += t.lamSig
		s.lamSu += t.lamSu
		s.lamLen += t.lamLen
		s.lamF, s.lamFt, s.lamVal = t.lamF, t.lamFt, t.lamVal
	}
}

// intervalFrom returns the index of the interval holding z0: the hint if
// it holds it, else by binary search.
func (a *Analysis) intervalFrom(z0 float64, hint int) int {
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
func (a *Analysis) drilledBottom(z0, z1 float64, hint int) (out sums, err error) {
	if !(z1 > z0) {
		return out, nil
	}
	for k := a.intervalFrom(z0, hint); k < len(a.iv) && a.iv[k].top < z1; k++ {
		iv := &a.iv[k]
		if !a.plans[iv.layer].drilled || iv.noShaft {
			continue
		}
		top, bot := max(z0, iv.top), min(z1, iv.bot)
		if !(bot > top) {
			continue
		}
		var t sums
		if err := a.segment(&t, iv, top, bot); err != nil {
			return sums{}, err
		}
		out.outer += t.outer
		out.design += t.design
		out.tension += t.tension
		out.uplift += t.uplift
	}
	return out, nil
}

// inZone reports whether depth z lies in a zone without shaft friction.
func (a *Analysis) inZone(z float64) bool {
	for _, zn := range a.methods.NoShaft {
		if z > float64(zn.Top) && z < float64(zn.Bottom) {
			return true
		}
	}
	return false
}

// segment integrates the part [z0, z1] of interval iv.
func (a *Analysis) segment(s *sums, iv *interval, z0, z1 float64) error {
	lp := &a.plans[iv.layer]
	h := z1 - z0
	s0, s1 := iv.sigma(z0), iv.sigma(z1)
	s.weight += a.pileWeight(z0, z1)
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
	case kindCone:
		cs, _ := coneShaftOf(lp.shaft)
		v, limited, err := cs.integral(z0, z1, a.size)
		if err != nil {
			return coneError(iv.layer, "shaft", lp.layer.Name, err)
		}
		q = v
		if limited {
			s.flags |= ShaftLimit
		}
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
func (a *Analysis) pileWeight(z0, z1 float64) float64 {
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

// lambdaAverage returns the λ method's mean unit friction over the λ
// layers: with λ read from the table, or given (lamVal > 0); either way
// capped at s̄u unless Methods.NoLambdaCap.
func (a *Analysis) lambdaAverage(lamVal float64, L units.Length, sig, su units.Stress) (shaft.LambdaResult, error) {
	if lamVal > 0 {
		return shaft.LambdaGiven{Lambda: lamVal, NoCap: a.methods.NoLambdaCap}.Average(L, sig, su)
	}
	return a.lambda.Average(L, sig, su)
}

// finish adds the λ part and the tip, and assembles the capacity.
func (a *Analysis) finish(s *sums, t float64, c *Capacity) error {
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
		z, err := a.drilledBottom(max(t-a.size, float64(a.pile.HeadDepth)), t, s.k)
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
	if err := a.tipQuick(t, &tr, s.k); err != nil {
		return err
	}
	a.assemble(c, tr.qp, tr.sigma, tr.f, outer, design, tension, uplift, s.weight, s.flags|lamFlags|zoneFlags|tr.flags)
	return nil
}

// assemble sets c from the unit tip resistance qp (after the rules), σ′v
// at the tip and the tip's design multiplier f, the shaft integrals
// (outer, design, tension and uplift, N/m), the pile's weight W′ and the
// flags of shaft and tip: the plug modes, self-weight, compression and
// tension.
func (a *Analysis) assemble(c *Capacity, qp, sigma, f, outer, design, tension, uplift, weight float64, flags Flags) {
	if a.methods.SelfWeight == WeightNet {
		qp = max(0, qp-sigma)
	}
	c.UnitTip = units.Stress(qp)
	c.Flags = flags
	c.Weight = units.Force(weight)
	// Modes: plugged (gross area, outer perimeter) and unplugged (material
	// area, outer plus inner perimeter).
	plTip, plShaft := qp*a.gross, outer*a.outer
	plDes := f*qp*a.gross + design*a.outer
	c.Plugged = true
	c.Tip, c.Shaft = units.Force(plTip), units.Force(plShaft)
	desC := plDes
	tenShaft, tenDes := uplift*a.outer, tension*a.outer
	if a.pile.Section.CanPlug() {
		unTip, unShaft := qp*a.mat, outer*(a.outer+a.inner)
		unDes := f*qp*a.mat + design*(a.outer+a.inner)
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
		desC -= weight
		if c.Compression < 0 {
			c.Flags |= WeightExceedsResistance
		}
	}
	c.TensionShaft = units.Force(tenShaft)
	c.Tension = c.TensionShaft + c.Weight
	c.DesignCompression = units.Force(desC)
	c.DesignTension = units.Force(tenDes + a.upliftWeight()*weight)
}

// tipResult is the unit tip resistance at a depth with what made it.
type tipResult struct {
	layer int
	qp    float64 // after limits and the layered rule
	sigma float64 // σ′v at the tip
	f     float64 // design multiplier of the tip method
	upper float64 // the upper layer's qp where the layered rule applied
	own   float64 // the bearing layer's own method at the tip, before the rules
	embed float64 // the embedment factor (1 where the ramp does not apply)
	weak  weakInfo
	flags Flags
}

// tipInput returns the tip input for layer plan lp at depth z.
func (a *Analysis) tipInput(lp *layerPlan, z float64) (bearing.Input, error) {
	sv, err := a.prof.EffectiveStress(units.Length(z))
	if err != nil {
		return bearing.Input{}, err
	}
	in := bearing.Input{
		Phi: lp.phi, C: lp.c, Q: sv, K0: lp.k0, Ir: lp.layer.Ir, G: lp.layer.G,
		L: units.Length(z), D: units.Length(a.size), N60: lp.layer.N60, Clamp: a.methods.Clamp,
		Pa: a.methods.Pa, Delta: lp.layer.Delta,
	}
	if lp.layer.HasSu {
		zz := min(max(units.Length(z), lp.layer.Top), lp.layer.Bottom)
		in.Su = lp.suAt(zz)
	}
	return in, nil
}

// tipDetail is what the breakdown shows of the tip method's evaluation.
type tipDetail struct {
	in  bearing.Input
	res bearing.Result
}

// tipAt sets out to the unit tip resistance with the tip at depth z. With
// detail nil, a layer whose tip method reduces to factors (tipModel) is
// evaluated from them; otherwise the method is called and its input and
// result are stored in detail (for the breakdown).
func (a *Analysis) tipAt(z float64, out *tipResult, detail *tipDetail, hint int) error {
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
	ivk := &a.iv[a.tipInterval(z, hint)]
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
		_, qp, limited := lp.tm.eval(sv, su)
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

// tipFlags maps the bearing package's warnings onto ours.
func tipFlags(f bearing.Flags) Flags {
	var out Flags
	if f&bearing.LimitGoverns != 0 {
		out |= TipLimit
	}
	if f&bearing.Clamped != 0 {
		out |= ChartEdge
	}
	if f&bearing.VolumeChangeIgnored != 0 {
		out |= VolumeChangeIgnored
	}
	if f&bearing.ReductionOff != 0 {
		out |= TipReductionOff
	}
	if f&bearing.CapGoverns != 0 {
		out |= TipCapGoverns
	}
	return out
}
