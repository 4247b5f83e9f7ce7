package settle

import (
	"errors"
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// ShaftRow is a length of shaft with one perimeter, its ultimate unit
// shaft resistance linear from FsTop at Top to FsBottom at Bottom. In the
// unified method the same unit value acts downward (negative skin
// friction) above the neutral plane and upward below it.
type ShaftRow struct {
	Top, Bottom     units.Length
	Perimeter       units.Length
	FsTop, FsBottom units.Stress
}

// force returns p·∫fs from the row's top to depth z (Top ≤ z ≤ Bottom).
func (r ShaftRow) force(z float64) float64 {
	h := float64(r.Bottom - r.Top)
	s := z - float64(r.Top)
	if h <= 0 || s <= 0 {
		return 0
	}
	s = min(s, h)
	f0, f1 := float64(r.FsTop), float64(r.FsBottom)
	return float64(r.Perimeter) * (f0*s + (f1-f0)*s*s/(2*h))
}

// Total returns the row's force p·∫fs over its length.
func (r ShaftRow) Total() units.Force { return units.Force(r.force(float64(r.Bottom))) }

// SettlementPoint is the settlement of the ground at a depth, after the
// loads placed after installation have done their work (long term).
type SettlementPoint struct {
	Depth      units.Length
	Settlement units.Length
}

// Downdrag is a single pile in settling ground, for the unified method
// (Fellenius 2004): the axial force from the head down is the sustained
// load plus the negative skin friction, Qd + ∫p·fs dz; from the tip up it
// is the mobilised tip resistance plus the positive shaft resistance
// below, Rt + ∫p·fs dz; the neutral plane is where the two meet.
//
// Rows run contiguously from the head to the tip. Ground is the ground
// settlement with depth, linear between its points and constant beyond
// the first and the last (give a point of zero settlement at the bottom
// of the compressible layers); none, or settlement zero everywhere, means
// the ground does not settle and no negative skin friction acts.
//
// The mobilised tip resistance is TipForce when TipGiven; otherwise it is
// found so that the pile's settlement at the neutral plane (toe movement
// on the q-z curve Tip plus the pile's shortening between the neutral
// plane and the tip) equals the ground's there. EA is the pile's axial
// stiffness; Diameter scales a q-z curve given per diameter. The tip force
// is found by bisection to 1e-12 of the tip capacity. Over a length of
// shaft without friction the neutral plane is indeterminate (the forces
// are the same anywhere in it) and is taken at the top of that length;
// compatibility then holds only to the Mismatch reported.
//
// Choices: the change from negative to positive friction is taken as
// sharp at the neutral plane (no transition zone), which gives the
// largest drag load and axial force; the pile's own weight is left out;
// the sustained load is the permanent load (transient loads do not add
// to the drag load, Fellenius 2004).
type Downdrag struct {
	Rows     []ShaftRow
	Load     units.Force // Qd, the sustained load on the head, ≥ 0
	EA       units.Force // E·A of the section, N, > 0
	Diameter units.Length
	Tip      TipSpring // area, ultimate unit tip resistance and q-z curve
	Ground   []SettlementPoint
	TipGiven bool
	TipForce units.Force // Rt,mob when TipGiven: 0 to Qp·Ab
}

// ForcePoint is the axial force in the pile at a depth: Down from the head
// (Qd + negative skin friction above), Up from the tip (Rt + positive
// shaft resistance below), Force the one that acts (Down above the neutral
// plane, Up below), and the settlement of the ground and of the pile.
type ForcePoint struct {
	Depth            units.Length
	Down, Up         units.Force
	Force            units.Force
	Ground, Pile     units.Length
	NegativeFriction bool
}

// DowndragResult is the unified method's answer. Forces in newtons,
// lengths in metres, depths below ground level.
type DowndragResult struct {
	// NeutralPlane is the depth where the force from the head meets the
	// force from the tip; the head when the ground does not settle.
	NeutralPlane units.Length
	// DragLoad is the negative skin friction integrated from the head to
	// the neutral plane; MaxForce = Load + DragLoad, the largest axial
	// force in the pile, at the neutral plane.
	DragLoad units.Force
	MaxForce units.Force
	Load     units.Force
	// TipForce is the mobilised tip resistance Rt,mob; TipCapacity = Qp·Ab.
	TipForce    units.Force
	TipCapacity units.Force
	// ShaftBelow is the positive shaft resistance from the neutral plane
	// to the tip (all of it is mobilised); ShaftTotal the whole shaft's.
	ShaftBelow units.Force
	ShaftTotal units.Force
	// GroundAtNP is the ground settlement at the neutral plane, which the
	// pile shares there (the pile settlement at the neutral plane).
	GroundAtNP units.Length
	// TipMovement is the toe movement the q-z curve gives for TipForce;
	// ShorteningBelow is ∫Q/EA dz from the neutral plane to the tip, and
	// ShorteningAbove from the head to the neutral plane.
	TipMovement                      units.Length
	ShorteningBelow, ShorteningAbove units.Length
	// PileAtNP = TipMovement + ShorteningBelow, the pile's own account of
	// its settlement at the neutral plane; Mismatch = PileAtNP − GroundAtNP
	// (zero when the tip force is found by compatibility, unless the tip
	// is fully mobilised, carries nothing, or the neutral plane is at the
	// tip: the ground then settles more than the pile along all of it).
	PileAtNP units.Length
	Mismatch units.Length
	// HeadSettlement = PileAtNP + ShorteningAbove.
	HeadSettlement units.Length
	// Dragged reports that the ground settles (negative skin friction
	// acts); TipFull that the tip is fully mobilised (the ground drags the
	// pile further than the q-z curve's full mobilisation); AllToTip that
	// the tip carries all the force arriving at it (Qd + the whole drag),
	// the neutral plane being the deepest point where friction acts;
	// NoEquilibrium
	// that the sustained load exceeds the shaft and full tip resistance
	// (no neutral plane: the pile plunges).
	Dragged, TipFull, AllToTip, NoEquilibrium bool
	// Points are the forces and settlements at the row ends and the
	// neutral plane, from the head to the tip, for tables and figures.
	Points []ForcePoint
}

// Carries reports the geotechnical check of the unified method without
// factors: the sustained load and the drag load are carried by the
// positive shaft resistance below the neutral plane and the full tip
// resistance, Qd + Qn ≤ Rs(below NP) + Rt. With no ground settlement it is
// the ordinary check Qd ≤ Rs + Rt.
func (r DowndragResult) Carries() bool {
	return r.Load+r.DragLoad <= r.ShaftBelow+r.TipCapacity
}

// Equation returns the unified method's equations in one line.
func (Downdrag) Equation() string {
	return "Qd + ∫₀ᶻ p·fn dz = Rt,mob + ∫ᶻᴸ p·fs dz at the neutral plane z = NP; drag load = ∫₀ᴺᴾ p·fn dz; settlement at NP = ground settlement at NP"
}

// Refs returns the sources of the method.
func (Downdrag) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Fellenius2004, Where: "the unified design method: neutral plane by force equilibrium, settlement at the neutral plane"}}
}

func (d *Downdrag) check() error {
	if len(d.Rows) == 0 {
		return errors.New("rows: none; give the shaft from the head to the tip")
	}
	for i, r := range d.Rows {
		top, bot := float64(r.Top), float64(r.Bottom)
		if math.IsNaN(top) || math.IsInf(top, 0) {
			return fmt.Errorf("rows[%d].top: %v m is not a finite depth", i, top)
		}
		if !(bot > top) || math.IsInf(bot, 0) {
			return fmt.Errorf("rows[%d].bottom: %v m is outside (%v, ∞) m (below its top)", i, bot, top)
		}
		if i > 0 {
			prev := float64(d.Rows[i-1].Bottom)
			if math.Abs(top-prev) > 1e-9*max(1, math.Abs(prev)) {
				return fmt.Errorf("rows[%d].top: %v m is not the bottom of rows[%d], %v m (rows must be contiguous)", i, top, i-1, prev)
			}
		}
		if !(r.Perimeter >= 0) || math.IsInf(float64(r.Perimeter), 0) {
			return fmt.Errorf("rows[%d].perimeter: %v m is outside 0 to ∞ m", i, float64(r.Perimeter))
		}
		for _, f := range []struct {
			name string
			v    units.Stress
		}{{"fs_top", r.FsTop}, {"fs_bottom", r.FsBottom}} {
			if !(f.v >= 0) || math.IsInf(float64(f.v), 0) {
				return fmt.Errorf("rows[%d].%s: %v kPa is outside 0 to ∞ kPa", i, f.name, f.v.KPa())
			}
		}
	}
	if !(d.Load >= 0) || math.IsInf(float64(d.Load), 0) {
		return fmt.Errorf("load: %v kN is outside 0 to ∞ kN", d.Load.KN())
	}
	if !(d.EA > 0) || math.IsInf(float64(d.EA), 0) {
		return fmt.Errorf("ea: %v kN is outside (0, ∞) kN", d.EA.KN())
	}
	if !(d.Tip.Area >= 0) || math.IsInf(float64(d.Tip.Area), 0) {
		return fmt.Errorf("tip.area: %v m2 is outside 0 to ∞ m2", float64(d.Tip.Area))
	}
	if !(d.Tip.Qp >= 0) || math.IsInf(float64(d.Tip.Qp), 0) {
		return fmt.Errorf("tip.qp: %v kPa is outside 0 to ∞ kPa", d.Tip.Qp.KPa())
	}
	tipCap := float64(d.Tip.Qp) * float64(d.Tip.Area)
	if math.IsInf(tipCap, 0) {
		return errors.New("tip: Qp·Ab is not finite")
	}
	if d.TipGiven {
		if !(d.TipForce >= 0) || float64(d.TipForce) > tipCap*(1+1e-12) {
			return fmt.Errorf("tip_force: %v kN is outside 0 to %v kN (Qp·Ab)", d.TipForce.KN(), tipCap/1e3)
		}
	} else if tipCap > 0 && !d.Tip.Curve.Valid() {
		return errors.New("tip.curve: missing; give a q-z curve (api-tip or points), or the mobilised tip force")
	}
	if d.Tip.Curve.Valid() && d.Tip.Curve.perDiameter {
		if err := posLen("diameter", d.Diameter); err != nil {
			return err
		}
	}
	return CheckSettlementProfile(d.Ground)
}

// CheckSettlementProfile checks that a ground settlement profile is a
// function of depth: depths finite, not negative and strictly increasing
// (no depth repeated), settlements finite and not negative. Errors name
// the point: "ground_settlement[2].depth: 4 m is not below 4 m".
func CheckSettlementProfile(pts []SettlementPoint) error {
	for i, p := range pts {
		z, s := float64(p.Depth), float64(p.Settlement)
		if !(z >= 0) || math.IsInf(z, 0) {
			return fmt.Errorf("ground_settlement[%d].depth: %v m is outside 0 to ∞ m", i, z)
		}
		if i > 0 && !(z > float64(pts[i-1].Depth)) {
			return fmt.Errorf("ground_settlement[%d].depth: %v m is not below %v m (depths must increase: a settlement profile is a function of depth)", i, z, float64(pts[i-1].Depth))
		}
		if !(s >= 0) || math.IsInf(s, 0) {
			return fmt.Errorf("ground_settlement[%d].settlement: %v m is outside 0 to ∞ m", i, s)
		}
	}
	return nil
}

// groundAt returns the ground settlement at depth z: linear between the
// points, constant beyond the ends, 0 without points.
func groundAt(pts []SettlementPoint, z float64) float64 {
	n := len(pts)
	switch {
	case n == 0:
		return 0
	case z <= float64(pts[0].Depth):
		return float64(pts[0].Settlement)
	case z >= float64(pts[n-1].Depth):
		return float64(pts[n-1].Settlement)
	}
	i := 1
	for z > float64(pts[i].Depth) {
		i++
	}
	z0, z1 := float64(pts[i-1].Depth), float64(pts[i].Depth)
	s0, s1 := float64(pts[i-1].Settlement), float64(pts[i].Settlement)
	return s0 + (s1-s0)*(z-z0)/(z1-z0)
}

// cumulative returns p·∫fs from the head to z.
func (d *Downdrag) cumulative(z float64) float64 {
	var c float64
	for _, r := range d.Rows {
		if z <= float64(r.Top) {
			break
		}
		c += r.force(z)
	}
	return c
}

// depthOf returns the shallowest depth where the cumulative shaft force
// from the head reaches c (0 ≤ c ≤ total).
func (d *Downdrag) depthOf(c float64) float64 {
	head := float64(d.Rows[0].Top)
	if c <= 0 {
		return head
	}
	var acc float64
	for _, r := range d.Rows {
		t := r.force(float64(r.Bottom))
		if acc+t < c {
			acc += t
			continue
		}
		// Solve p(f0 s + (f1 − f0)s²/(2h)) = c − acc for s in [0, h].
		need := (c - acc) / float64(r.Perimeter)
		h := float64(r.Bottom - r.Top)
		f0, f1 := float64(r.FsTop), float64(r.FsBottom)
		a := (f1 - f0) / (2 * h)
		var s float64
		if math.Abs(a)*h < 1e-12*max(f0, f1) {
			s = need / ((f0 + f1) / 2)
		} else {
			// Stable root of a s² + f0 s − need = 0.
			disc := math.Sqrt(max(0, f0*f0+4*a*need))
			s = 2 * need / (f0 + disc)
		}
		return float64(r.Top) + min(max(s, 0), h)
	}
	return float64(d.Rows[len(d.Rows)-1].Bottom)
}

// ddState is the pile for one mobilised tip force: the neutral plane,
// the whole shaft's resistance and the tip force.
type ddState struct {
	np, total, tip float64
	cnp            float64 // C(NP), the shaft force from the head to NP
	all            bool    // the tip carries all that arrives
}

func (d *Downdrag) neutral(rt float64) ddState {
	total := d.cumulative(float64(d.Rows[len(d.Rows)-1].Bottom))
	// The tip carries at most what arrives at it: the neutral plane is
	// then at the tip.
	if rt >= float64(d.Load)+total {
		return ddState{np: d.depthOf(total), total: total, tip: float64(d.Load) + total, cnp: total, all: true}
	}
	// Qd + C(z) = Rt + (total − C(z))  ⇒  C(z) = (Rt + total − Qd)/2.
	target := min(max((rt+total-float64(d.Load))/2, 0), total)
	return ddState{np: d.depthOf(target), total: total, tip: rt, cnp: target}
}

// force returns the axial force at z for state s: down from the head,
// Qd + C(z), and up, the force below the neutral plane when the shaft
// resistance there is mobilised from the neutral plane down,
//
//	Q(z) = max(Qd + 2·C(NP) − C(z), 0)
//
// which is Rt + Rs,total − C(z) when the neutral plane is the force
// equilibrium with tip force Rt.
func (d *Downdrag) force(s ddState, z float64) (down, up float64) {
	c := d.cumulative(z)
	return float64(d.Load) + c, max(float64(d.Load)+2*s.cnp-c, 0)
}

// shortening returns ∫Q/EA dz from a to b (a ≤ b), Q being the force that
// acts (Down above the neutral plane, Up below). Q is quadratic in z
// within a row, so Simpson's rule on each piece is exact.
func (d *Downdrag) shortening(s ddState, a, b float64) float64 {
	if b <= a {
		return 0
	}
	cuts := []float64{a}
	for _, r := range d.Rows {
		for _, z := range []float64{float64(r.Top), float64(r.Bottom)} {
			if z > a && z < b && z != cuts[len(cuts)-1] {
				cuts = append(cuts, z)
			}
		}
	}
	insert := func(z float64) {
		if !(z > a && z < b) {
			return
		}
		k := len(cuts) // keep the cuts sorted
		for k > 0 && cuts[k-1] > z {
			k--
		}
		if cuts[k-1] != z {
			cuts = append(cuts[:k], append([]float64{z}, cuts[k:]...)...)
		}
	}
	insert(s.np)
	// Where the force below the neutral plane falls to zero it has a kink.
	if zero := float64(d.Load) + 2*s.cnp; zero < s.total {
		insert(d.depthOf(zero))
	}
	cuts = append(cuts, b)
	var sum float64
	for i := 1; i < len(cuts); i++ {
		z0, z1 := cuts[i-1], cuts[i]
		if z1 <= z0 {
			continue
		}
		// Evaluate just inside the piece so that the side of the neutral
		// plane is the piece's own.
		mid := (z0 + z1) / 2
		side := func(z float64) float64 {
			down, up := d.force(s, z)
			if mid <= s.np {
				return down
			}
			return up
		}
		sum += (z1 - z0) / 6 * (side(z0) + 4*side(mid) + side(z1))
	}
	return sum / float64(d.EA)
}

// tipMovement returns the toe movement at which the q-z curve mobilises
// rt (the smallest such movement).
func (d *Downdrag) tipMovement(rt float64) float64 {
	capacity := float64(d.Tip.Qp) * float64(d.Tip.Area)
	if rt <= 0 || capacity <= 0 || !d.Tip.Curve.Valid() {
		return 0
	}
	sc := d.Tip.Curve.scale(float64(d.Diameter))
	ratio := min(rt/capacity, 1)
	for i := 1; i < len(sc.z); i++ {
		if sc.r[i] >= ratio {
			if sc.r[i] == sc.r[i-1] {
				return sc.z[i-1]
			}
			return sc.z[i-1] + (ratio-sc.r[i-1])*(sc.z[i]-sc.z[i-1])/(sc.r[i]-sc.r[i-1])
		}
	}
	return sc.z[len(sc.z)-1]
}

// Solve finds the neutral plane, the drag load, the largest axial force
// and the settlements. Errors name the field and its accepted range.
func (d Downdrag) Solve() (DowndragResult, error) {
	if err := d.check(); err != nil {
		return DowndragResult{}, err
	}
	head, tipZ := float64(d.Rows[0].Top), float64(d.Rows[len(d.Rows)-1].Bottom)
	capacity := float64(d.Tip.Qp) * float64(d.Tip.Area)
	res := DowndragResult{Load: d.Load, TipCapacity: units.Force(capacity)}
	for _, p := range d.Ground {
		if p.Settlement > 0 {
			res.Dragged = true
		}
	}
	total := d.cumulative(tipZ)
	res.ShaftTotal = units.Force(total)
	if float64(d.Load) > total+capacity*(1+1e-12) {
		res.NoEquilibrium = true
	}
	var st ddState
	switch {
	case !res.Dragged:
		// No negative skin friction: the head load goes down the pile,
		// shed by positive shaft resistance from the head, and the tip
		// carries what arrives (as much as it can).
		rt := min(max(float64(d.Load)-total, 0), capacity)
		if d.TipGiven {
			rt = float64(d.TipForce)
		}
		st = ddState{np: head, total: total, tip: rt}
	case d.TipGiven:
		st = d.neutral(float64(d.TipForce))
	default:
		st = d.compatible(capacity)
	}
	res.TipForce = units.Force(st.tip)
	res.NeutralPlane = units.Length(st.np)
	c := d.cumulative(st.np)
	if res.Dragged {
		res.DragLoad = units.Force(c)
	}
	res.MaxForce = d.Load + res.DragLoad
	res.ShaftBelow = units.Force(total - c)
	res.GroundAtNP = units.Length(groundAt(d.Ground, st.np))
	res.TipMovement = units.Length(d.tipMovement(st.tip))
	if res.Dragged {
		res.ShorteningBelow = units.Length(d.shortening(st, st.np, tipZ))
		res.ShorteningAbove = units.Length(d.shortening(st, head, st.np))
	} else {
		// The force falls from Qd at the head as positive shaft
		// resistance is mobilised from the head down (all of it when the
		// load exceeds the shaft resistance).
		res.ShorteningAbove = units.Length(d.undraggedShortening(head, tipZ))
	}
	res.PileAtNP = res.TipMovement + res.ShorteningBelow
	res.Mismatch = res.PileAtNP - res.GroundAtNP
	res.HeadSettlement = res.PileAtNP + res.ShorteningAbove
	if !res.Dragged {
		res.Mismatch = 0
	}
	res.TipFull = capacity > 0 && st.tip >= capacity*(1-1e-12)
	res.AllToTip = res.Dragged && st.all
	res.Points = d.points(st, res)
	return res, nil
}

// undraggedShortening returns ∫Q/EA from a to b without negative skin
// friction: Q falls from Qd at the head by the shaft resistance mobilised
// from the head down, to max(Qd − Rs, 0) at the tip (all the shaft
// resistance above a depth taken as mobilised: the upper bound of the
// shortening for the head load). It is the shortening with the neutral
// plane at the head.
func (d *Downdrag) undraggedShortening(a, b float64) float64 {
	total := d.cumulative(float64(d.Rows[len(d.Rows)-1].Bottom))
	return d.shortening(ddState{np: float64(d.Rows[0].Top), total: total}, a, b)
}

// compatible finds the mobilised tip force at which the pile settles with
// the ground at the neutral plane, by bisection on
//
//	g(Rt) = δt(Rt) + ∫NP..tip Q/EA dz − sg(NP)
//
// which rises with Rt (a larger tip force moves the neutral plane down,
// where the ground settles less, and needs more toe movement). When even
// with no tip force the pile would settle more than the ground at the
// equilibrium depth (g(0) > 0: the ground there settles less than the
// pile shortens), the neutral plane is where the ground and the pile
// settle alike above that depth, the shaft below it is only partly
// mobilised (from the neutral plane down) and the tip carries what
// arrives, if anything (see partial).
func (d *Downdrag) compatible(capacity float64) ddState {
	tipZ := float64(d.Rows[len(d.Rows)-1].Bottom)
	g := func(rt float64) (float64, ddState) {
		s := d.neutral(rt)
		return d.tipMovement(s.tip) + d.shortening(s, s.np, tipZ) - groundAt(d.Ground, s.np), s
	}
	lo, hi := 0.0, capacity
	glo, slo := g(lo)
	if glo > 0 {
		return d.partial(slo.np)
	}
	if glo == 0 || capacity <= 0 {
		return slo
	}
	ghi, shi := g(hi)
	if ghi <= 0 {
		return shi
	}
	for range 200 {
		mid := (lo + hi) / 2
		gm, _ := g(mid)
		if gm < 0 {
			lo = mid
		} else {
			hi = mid
		}
		if hi-lo <= 1e-12*capacity {
			break
		}
	}
	_, s := g((lo + hi) / 2)
	return s
}

// at returns the state with the neutral plane at z and the shaft below
// mobilised from it down (the tip carrying what arrives).
func (d *Downdrag) at(z, total float64) ddState {
	c := d.cumulative(z)
	return ddState{np: z, total: total, cnp: c, tip: max(float64(d.Load)+2*c-total, 0)}
}

// partial finds, above the equilibrium depth zeq, the depth where the pile
// settles as the ground does, by bisection on
//
//	h(z) = δt + ∫z..tip Q/EA dz − sg(z)
//
// with the force below z falling by the full shaft resistance from z
// down. h(zeq) > 0; where h(head) ≥ 0 too, the ground settles less than
// the pile everywhere and the neutral plane is the head (no drag).
func (d *Downdrag) partial(zeq float64) ddState {
	head, tipZ := float64(d.Rows[0].Top), float64(d.Rows[len(d.Rows)-1].Bottom)
	total := d.cumulative(tipZ)
	h := func(z float64) (float64, ddState) {
		s := d.at(z, total)
		return d.tipMovement(s.tip) + d.shortening(s, z, tipZ) - groundAt(d.Ground, z), s
	}
	if hh, s := h(head); hh >= 0 {
		return s
	}
	lo, hi := head, zeq
	for range 200 {
		mid := (lo + hi) / 2
		hm, _ := h(mid)
		if hm < 0 {
			lo = mid
		} else {
			hi = mid
		}
		if hi-lo <= 1e-12*max(1, tipZ) {
			break
		}
	}
	_, s := h((lo + hi) / 2)
	return s
}

// PointSpacing is the largest spacing of DowndragResult.Points within a
// row: 1 m, but at most maxPointsPerRow points in a row.
const (
	PointSpacing    = 1.0
	maxPointsPerRow = 200
)

// points lists the force and settlement at the row ends, the neutral
// plane and between, at most PointSpacing apart.
func (d *Downdrag) points(s ddState, res DowndragResult) []ForcePoint {
	zs := []float64{float64(d.Rows[0].Top)}
	for _, r := range d.Rows {
		t, b := float64(r.Top), float64(r.Bottom)
		n := int(min(max(1, math.Ceil((b-t)/PointSpacing-1e-9)), maxPointsPerRow))
		for k := 1; k <= n; k++ {
			z := t + (b-t)*float64(k)/float64(n)
			if k == n {
				z = b
			}
			if s.np > zs[len(zs)-1] && s.np < z {
				zs = append(zs, s.np)
			}
			zs = append(zs, z)
		}
	}
	tipZ := zs[len(zs)-1]
	out := make([]ForcePoint, 0, len(zs))
	for _, z := range zs {
		down, up := d.force(s, z)
		p := ForcePoint{Depth: units.Length(z), Down: units.Force(down), Up: units.Force(up),
			Ground: units.Length(groundAt(d.Ground, z)), NegativeFriction: res.Dragged && z < s.np}
		if !res.Dragged {
			p.Down = units.Force(max(float64(d.Load)-d.cumulative(z), 0))
			p.Force = p.Down
			p.Pile = res.HeadSettlement - units.Length(d.undraggedShortening(float64(d.Rows[0].Top), z))
		} else {
			p.Force = units.Force(up)
			if z <= s.np {
				p.Force = units.Force(down)
			}
			p.Pile = res.TipMovement + units.Length(d.shortening(s, z, tipZ))
		}
		out = append(out, p)
	}
	return out
}
