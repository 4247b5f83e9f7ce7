package pile

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// How a layer's unit shaft resistance varies within a segment, decided
// once per layer so that the common cases integrate in closed form.
const (
	// kindGeneral: fs is a nonlinear function of depth; integrated by
	// adaptive Gauss–Kronrod quadrature.
	kindGeneral = iota
	// kindBeta: fs = min(c·σ′v, cap), with c = β constant in the layer.
	kindBeta
	// kindAlpha: fs = min(c·su, cap), with c = α constant in the layer.
	kindAlpha
	// kindAlphaAPI: the API α with su constant in the layer, integrated
	// in closed form by shaft.AlphaAPI.Integral.
	kindAlphaAPI
	// kindCone: a direct CPT shaft method (ConeShaft), integrated exactly
	// over the sounding's readings.
	kindCone
)

// classify decides the layer's kind from the method's type. Only methods
// whose factor provably does not change with depth inside a layer are
// treated in closed form; every other method goes to quadrature. The
// factor c is read from one evaluation of the method.
func (a *Analysis) classify(i int, lp *layerPlan) error {
	if lp.lambda || lp.noShaft {
		return nil
	}
	m := lp.shaft
	var capv units.Stress
	if c, ok := m.(shaft.Capped); ok && c.Method != nil && c.Limit != nil {
		v, err := c.Limit.Max()
		if err != nil {
			return pathErrorf(fmt.Sprintf("layers[%d].shaft", i), "layer %q: %w", lp.layer.Name, err)
		}
		capv, m = v, c.Method
	}
	if _, ok := coneShaftOf(lp.shaft); ok {
		lp.kind = kindCone
		return nil
	}
	if _, ok := lp.shaft.(shaft.AlphaAPI); ok && lp.su0 == lp.su1 {
		lp.kind = kindAlphaAPI
		return nil
	}
	kind := kindGeneral
	switch m.(type) {
	case shaft.Beta, shaft.BetaGiven, shaft.Burland:
		kind = kindBeta
	case shaft.APIBeta:
		// β constant with the class's limit.
		kind = kindBeta
	case shaft.AlphaGiven:
		kind = kindAlpha
	case shaft.AlphaChart, shaft.AlphaDrilled:
		// α depends on su alone: constant where su is.
		if lp.su0 == lp.su1 {
			kind = kindAlpha
		}
	}
	if kind == kindGeneral {
		return nil
	}
	// One evaluation at mid-layer gives the factor.
	zm := (lp.layer.Top + lp.layer.Bottom) / 2
	sv, err := a.prof.EffectiveStress(zm)
	if err != nil {
		return err
	}
	if sv <= 0 {
		sv = units.Kilopascal // the factor does not depend on σ′v; any positive value serves
	}
	r, err := m.Unit(a.point(lp, zm, sv))
	if err != nil {
		return pathErrorf(fmt.Sprintf("layers[%d].shaft", i), "layer %q: %w", lp.layer.Name, err)
	}
	switch kind {
	case kindBeta:
		lp.coef = r.Beta
		if ab, ok := m.(shaft.APIBeta); ok {
			_, fl, err := ab.Class.API()
			if err != nil {
				return pathErrorf(fmt.Sprintf("layers[%d].shaft", i), "layer %q: %w", lp.layer.Name, err)
			}
			if capv == 0 || fl < capv {
				capv = fl
			}
		}
	case kindAlpha:
		lp.coef = r.Alpha
	}
	lp.flags = r.Flags
	lp.kind = kind
	lp.cap = capv
	return nil
}

// point returns the shaft input at depth z with effective stress sv (after
// any critical-depth hold).
func (a *Analysis) point(lp *layerPlan, z units.Length, sv units.Stress) shaft.Point {
	return shaft.Point{
		SigmaV:   sv,
		Depth:    z,
		Phi:      lp.phi,
		OCR:      lp.layer.OCR,
		Su:       lp.suAt(z),
		Diameter: units.Length(a.size),
		N60:      lp.layer.N60,
		Pa:       a.methods.Pa,
	}
}

// suAt returns the factored undrained strength at z in the layer.
func (lp *layerPlan) suAt(z units.Length) units.Stress {
	t, b := lp.layer.Top, lp.layer.Bottom
	if lp.su0 == lp.su1 || b <= t {
		return lp.su0
	}
	return lp.su0 + (lp.su1-lp.su0)*units.Stress((z-t)/(b-t))
}

// linearIntegral returns ∫ min(c·g(z), cap) dz over a segment of length h
// where g is linear from g0 to g1 (cap 0 means none), exactly, and whether
// the cap governed anywhere.
func linearIntegral(c, g0, g1, capv, h float64) (float64, bool) {
	f0, f1 := c*g0, c*g1
	if capv <= 0 || (f0 <= capv && f1 <= capv) {
		return (f0 + f1) / 2 * h, false
	}
	if f0 >= capv && f1 >= capv {
		return capv * h, true
	}
	// The line crosses the cap at fraction t of the segment.
	t := (capv - f0) / (f1 - f0)
	if f0 < capv {
		return (f0+capv)/2*t*h + capv*(1-t)*h, true
	}
	return capv*t*h + (capv+f1)/2*(1-t)*h, true
}

// Gauss–Kronrod (3, 7) nodes on [-1, 1] and weights: the 3-point
// Gauss–Legendre rule embedded in its 7-point Kronrod extension, which
// integrates polynomials of degree 11 exactly (Kronrod 1965; the constants
// are the standard ones, checked in the tests against exact integrals of
// monomials).
var (
	gkNodes = [7]float64{-0.9604912687080202, -0.7745966692414834, -0.4342437493468026, 0,
		0.4342437493468026, 0.7745966692414834, 0.9604912687080202}
	gkK = [7]float64{0.1046562260264673, 0.2684880898683334, 0.4013974147759622, 0.4509165386584741,
		0.4013974147759622, 0.2684880898683334, 0.1046562260264673}
	gkG = [7]float64{0, 5.0 / 9, 0, 8.0 / 9, 0, 5.0 / 9, 0}
)

// QuadratureTolerance is the relative tolerance to which a shaft segment
// whose unit friction varies nonlinearly with depth (α with ψ = su/σ′v
// varying, a depth-dependent β) is integrated: adaptive Gauss–Kronrod
// (3, 7) bisection stops when |K7 − G3| ≤ QuadratureTolerance·|K7| (or
// 1e-9 N/m absolute) on every piece.
const QuadratureTolerance = 1e-7

const maxQuadDepth = 30

// quad integrates the unit shaft friction of a general layer over [z0, z1],
// where σ′v is linear from s0 to s1 (already held below the critical
// depth). It returns the integral (N/m), the flags of the evaluations, and
// the first error a method returned.
func (a *Analysis) quad(lp *layerPlan, z0, z1, s0, s1 float64, depth int) (float64, Flags, error) {
	if depth == 0 {
		// The method's range is checked at the ends of the segment too
		// (just inside them, where σ′v = 0 at the surface is a limit).
		for _, z := range endPoints(z0, z1) {
			s := s0 + (s1-s0)*(z-z0)/(z1-z0)
			if _, err := lp.shaft.Unit(a.point(lp, units.Length(z), units.Stress(s))); err != nil {
				return 0, 0, err
			}
		}
	}
	h := (z1 - z0) / 2
	mid := (z0 + z1) / 2
	var k7, g3 float64
	var fl Flags
	_, api := lp.shaft.(shaft.AlphaAPI)
	for i, x := range gkNodes {
		z := mid + h*x
		s := s0 + (s1-s0)*(z-z0)/(z1-z0)
		var fs float64
		if su := float64(lp.suAt(units.Length(z))); api && su > 0 && su <= 4.9e6 && s > 0 && s <= 19e6 {
			// shaft.AlphaAPI.Unit's arithmetic, written out: no interface
			// call, no Point, no range check (su and σ′v are well inside
			// its ranges here; elsewhere the method itself decides).
			psi := su / s
			var al float64
			if psi <= 1 {
				al = 0.5 / math.Sqrt(psi)
			} else {
				al = 0.5 / math.Sqrt(math.Sqrt(psi))
			}
			if al > 1 {
				al, fl = 1, fl|BoundApplied
			}
			fs = al * su
		} else {
			r, err := lp.shaft.Unit(a.point(lp, units.Length(z), units.Stress(s)))
			if err != nil {
				return 0, 0, err
			}
			fl |= shaftFlags(r.Flags)
			fs = float64(r.Fs)
		}
		k7 += gkK[i] * fs
		g3 += gkG[i] * fs
	}
	k7 *= h
	g3 *= h
	if math.Abs(k7-g3) <= QuadratureTolerance*math.Abs(k7) || math.Abs(k7-g3) <= 1e-9 || depth >= maxQuadDepth {
		return k7, fl, nil
	}
	sm := (s0 + s1) / 2
	left, fl1, err := a.quad(lp, z0, mid, s0, sm, depth+1)
	if err != nil {
		return 0, 0, err
	}
	right, fl2, err := a.quad(lp, mid, z1, sm, s1, depth+1)
	if err != nil {
		return 0, 0, err
	}
	return left + right, fl | fl1 | fl2, nil
}

// shaftFlags maps the shaft package's warnings onto ours.
func shaftFlags(f shaft.Flags) Flags {
	var out Flags
	if f&shaft.LimitGoverns != 0 {
		out |= ShaftLimit
	}
	if f&shaft.CriticalDepthGoverns != 0 {
		out |= CriticalDepthApplied
	}
	if f&shaft.BoundApplied != 0 {
		out |= BoundApplied
	}
	if f&shaft.ChartEdge != 0 {
		out |= ChartEdge
	}
	if f&shaft.LambdaCapped != 0 {
		out |= LambdaCapped
	}
	if f&shaft.LambdaCapOff != 0 {
		out |= LambdaCapOff
	}
	return out
}

// endPoints returns the depths just inside a segment's ends (a billionth
// of its length in) at which a method is evaluated for its range and for a
// breakdown row.
func endPoints(z0, z1 float64) [2]float64 {
	e := 1e-9 * (z1 - z0)
	return [2]float64{z0 + e, z1 - e}
}
