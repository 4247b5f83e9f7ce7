package pile

import (
	"errors"
	"fmt"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// ErrNoCone is returned by a direct CPT method of a layer when the
// analysis has no cone sounding to read.
var ErrNoCone = errors.New("the method reads a cone sounding and none is given (ground.sounding)")

// ConeTip is a direct CPT tip method (package insitu) bound to a cone
// sounding, so that it serves as a layer's tip method: the tip depth is
// Input.L and the pile's diameter or width Input.D. The sounding's
// depths are read as the profile's. Cone is shared: the caller may fill
// it after building the methods, before the analysis is made. The pile's
// tip rules of Meyerhof (1976), the embedment ramp, the layered rule and
// the weak-layer reduction, do not apply to it: the averaging over the
// method's zone about the tip already reads the layers there.
type ConeTip struct {
	Method insitu.DirectTip
	Cone   *insitu.Cone
}

// ID returns the method's identifier.
func (t ConeTip) ID() string { return t.Method.ID() }

// Equation returns the method's equation.
func (t ConeTip) Equation() string { return t.Method.Equation() }

// Range returns the method's accepted inputs.
func (t ConeTip) Range() string { return t.Method.Range() }

// Refs returns the method's sources.
func (t ConeTip) Refs() []cite.Ref { return t.Method.Refs() }

// Tip returns the unit tip resistance with the tip at depth in.L.
func (t ConeTip) Tip(in bearing.Input) (bearing.Result, error) {
	if t.Cone == nil || t.Cone.Readings() == 0 {
		return bearing.Result{}, ErrNoCone
	}
	r, err := t.Method.Tip(t.Cone, in.L, in.D)
	if err != nil {
		return bearing.Result{}, err
	}
	out := bearing.Result{Unlimited: r.Unlimited, Limit: r.Limit, Qp: r.Qp, Rule: t.Cone.Label(),
		Cone: bearing.ConeAverage{Q: r.Cone, Factor: r.Factor, Top: r.Top, Bottom: r.Bottom, Below: r.Qc1, Above: r.Qc2, Raw: r.Raw}}
	if r.Limited {
		out.Flags |= bearing.LimitGoverns
	}
	return out, nil
}

// ConeShaft is a direct CPT shaft method (package insitu) bound to a
// cone sounding, so that it serves as a layer's shaft method: fs at
// Point.Depth for a pile of size Point.Diameter. Package pile integrates it exactly over the readings
// (Integral) rather than by quadrature.
type ConeShaft struct {
	Method insitu.DirectShaft
	Cone   *insitu.Cone
}

// ID returns the method's identifier.
func (s ConeShaft) ID() string { return s.Method.ID() }

// Equation returns the method's equation.
func (s ConeShaft) Equation() string { return s.Method.Equation() }

// Valid returns the method's accepted inputs.
func (s ConeShaft) Valid() string { return s.Method.Range() }

// Refs returns the method's sources.
func (s ConeShaft) Refs() []cite.Ref { return s.Method.Refs() }

// Unit returns the unit shaft resistance at p.Depth.
func (s ConeShaft) Unit(p shaft.Point) (shaft.Result, error) {
	if s.Cone == nil || s.Cone.Readings() == 0 {
		return shaft.Result{}, ErrNoCone
	}
	fs, unl, err := s.Method.Unit(s.Cone, p.Depth, p.Diameter)
	if err != nil {
		return shaft.Result{}, err
	}
	r := shaft.Result{Fs: fs, Unlimited: unl}
	if fs < unl {
		r.Flags |= shaft.LimitGoverns
	}
	return r, nil
}

// integral returns ∫fs dz over [z0, z1] for a pile of size b and whether
// a limit governed.
func (s ConeShaft) integral(z0, z1, b float64) (float64, bool, error) {
	if s.Cone == nil || s.Cone.Readings() == 0 {
		return 0, false, ErrNoCone
	}
	return s.Method.Integral(s.Cone, units.Length(z0), units.Length(z1), units.Length(b))
}

// coneShaftOf returns the layer's shaft as a ConeShaft, if it is one.
func coneShaftOf(m shaft.Unit) (ConeShaft, bool) {
	c, ok := m.(ConeShaft)
	return c, ok
}

// coneError wraps a direct method's error with the layer's field.
func coneError(i int, part, name string, err error) error {
	return pathErrorf(fmt.Sprintf("layers[%d].%s", i, part), "layer %q: %w", name, err)
}
