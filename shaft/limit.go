package shaft

import (
	"errors"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// APIBeta is the β method of API RP 2GEO (2011) for driven open-ended pipe
// piles in siliceous sand, β and the limiting unit friction taken by class
// (see SandClass.API):
//
//	fs = min(β·σ′v, fL)
//
// It reads σ′v (0 to 20 MPa). LimitGoverns is set when fL governs.
type APIBeta struct{ Class SandClass }

func (APIBeta) ID() string       { return "beta-api" }
func (APIBeta) Equation() string { return "fs = min(β·σ′v, fL), β and fL by sand class" }
func (APIBeta) Valid() string {
	return "0 ≤ σ′v ≤ 20 MPa; class one of the API classes with design values"
}
func (APIBeta) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.API2011, Where: "design parameters for cohesionless siliceous soil"}}
}
func (m APIBeta) Unit(p Point) (Result, error) {
	beta, fl, err := m.Class.API()
	if err != nil {
		return Result{}, err
	}
	if err := checkSigmaV(m.ID(), p.SigmaV); err != nil {
		return Result{}, err
	}
	raw := units.Stress(beta) * p.SigmaV
	r := Result{Fs: raw, Unlimited: raw, SigmaV: p.SigmaV, Beta: beta}
	if raw > fl {
		r.Fs, r.Flags = fl, LimitGoverns
	}
	return r, nil
}

// Limit is a limiting unit shaft friction.
type Limit interface {
	Method
	Max() (units.Stress, error)
}

// LimitGiven is a limiting unit shaft friction the engineer gives, above 0
// and at most 5 MPa.
type LimitGiven struct{ Fs units.Stress }

func (LimitGiven) ID() string       { return "limit-given" }
func (LimitGiven) Equation() string { return "fs ≤ fL, fL given" }
func (LimitGiven) Valid() string    { return "0 < fL ≤ 5 MPa" }
func (LimitGiven) Refs() []cite.Ref { return nil }
func (g LimitGiven) Max() (units.Stress, error) {
	if err := check(g.ID(), "fs_limit", g.Fs.KPa(), 0, 5000, "kPa", true); err != nil {
		return 0, err
	}
	return g.Fs, nil
}

// LimitAPI is the limiting unit shaft friction of API RP 2GEO (2011) for a
// sand class (see SandClass.API).
type LimitAPI struct{ Class SandClass }

func (LimitAPI) ID() string       { return "limit-api" }
func (LimitAPI) Equation() string { return "fs ≤ fL, fL by API sand class" }
func (LimitAPI) Valid() string    { return "class one of the API classes with design values" }
func (LimitAPI) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.API2011, Where: "design parameters for cohesionless siliceous soil"}}
}
func (l LimitAPI) Max() (units.Stress, error) {
	_, fl, err := l.Class.API()
	return fl, err
}

// Capped is a unit method with a limiting unit friction:
//
//	fs = min(fs of Method, fL)
//
// Result.Unlimited keeps the value before the cap; LimitGoverns is set when
// the cap governs. Both fields must be set.
type Capped struct {
	Method Unit
	Limit  Limit
}

var errCappedRules = errors.New("shaft: capped: method and limit must both be set")

func (c Capped) ID() string {
	if c.Method == nil || c.Limit == nil {
		return "capped"
	}
	return c.Method.ID() + "+" + c.Limit.ID()
}
func (c Capped) Equation() string {
	if c.Method == nil || c.Limit == nil {
		return "fs = min(fs, fL)"
	}
	return c.Method.Equation() + "; " + c.Limit.Equation()
}
func (c Capped) Valid() string {
	if c.Method == nil || c.Limit == nil {
		return ""
	}
	return c.Method.Valid() + "; " + c.Limit.Valid()
}
func (c Capped) Refs() []cite.Ref {
	var out []cite.Ref
	if c.Method != nil {
		out = append(out, c.Method.Refs()...)
	}
	if c.Limit != nil {
		out = append(out, c.Limit.Refs()...)
	}
	return out
}
func (c Capped) Unit(p Point) (Result, error) {
	if c.Method == nil || c.Limit == nil {
		return Result{}, errCappedRules
	}
	fl, err := c.Limit.Max()
	if err != nil {
		return Result{}, err
	}
	r, err := c.Method.Unit(p)
	if err != nil {
		return Result{}, err
	}
	if r.Fs > fl {
		r.Fs = fl
		r.Flags |= LimitGoverns
	}
	return r, nil
}

// CriticalDepth is the rule that σ′v for shaft friction stops growing below a
// critical depth zc, a multiple of the pile diameter:
//
//	zc = n·D;  σ′v(z) = σ′v(zc) for z > zc
//
// The rule is common in practice after Vesic and Meyerhof (1976), who put
// n between about 10 (loose sand) and 20 (dense sand); Kulhawy (1984) and
// others hold that it is an artefact, so it is optional. Ratio is n, 0 for
// no critical depth, else 5 to 50.
type CriticalDepth struct{ Ratio float64 }

func (CriticalDepth) ID() string       { return "critical-depth" }
func (CriticalDepth) Equation() string { return "zc = n·D; σ′v(z > zc) = σ′v(zc)" }
func (CriticalDepth) Valid() string    { return "n = 0 (none) or 5 ≤ n ≤ 50; 0 < D ≤ 10 m" }
func (CriticalDepth) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Meyerhof1976, Where: "critical depth"}, {Source: cite.Kulhawy1984, Where: "critique of limiting values"}}
}

// Depth returns zc = n·D. With Ratio 0 it returns 0 and no error: there is
// no critical depth.
func (c CriticalDepth) Depth(d units.Length) (units.Length, error) {
	if c.Ratio == 0 {
		return 0, nil
	}
	if err := check(c.ID(), "ratio", c.Ratio, 5, 50, "", false); err != nil {
		return 0, err
	}
	if err := check(c.ID(), "diameter", d.Metres(), 0, maxDiam, "m", true); err != nil {
		return 0, err
	}
	return units.Length(c.Ratio) * d, nil
}

// Hold returns p with σ′v replaced by sigmaVc, the vertical effective stress
// at the critical depth zc (from Depth), when p lies below zc, and
// CriticalDepthGoverns in that case. zc = 0 means no critical depth. Set
// the returned flag on the Result of the method evaluated at the returned
// point. Since σ′v is held constant below zc, a caller that splits the shaft
// at zc integrates β-method friction exactly.
func Hold(p Point, zc units.Length, sigmaVc units.Stress) (Point, Flags) {
	if zc > 0 && p.Depth > zc && p.SigmaV != sigmaVc {
		p.SigmaV = sigmaVc
		return p, CriticalDepthGoverns
	}
	return p, 0
}
