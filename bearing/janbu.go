package bearing

import (
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Janbu is Janbu's (1976) method for the tip of a friction pile,
// identifier "janbu":
//
//	qp  = c′·Nc* + q′·Nq*
//	Nq* = (tanφ′ + √(1 + tan²φ′))² · exp(2·η′·tanφ′)
//	Nc* = (Nq* − 1)·cotφ′                  (→ 2 + 2·η′ as φ′ → 0)
//
// Eta is the angle η′ of the plastic zone (radians, 60 to 105 deg); Janbu
// suggests about 60-70 deg in soft soils up to 105 deg in dense sand. The
// zero value means 90 deg, which gives the Prandtl-Reissner Nq. Reads Phi
// (0 to 50 deg), Q and C. No limit is applied. Source: Janbu (1976), as
// presented by Das (2019) and Bowles (1996), Table 16-2.
type Janbu struct {
	Eta units.Angle // η′; 0 means 90 deg
}

// ID returns "janbu".
func (Janbu) ID() string { return "janbu" }

// Equation returns the rule on one line.
func (Janbu) Equation() string {
	return "qp = c′·Nc* + q′·Nq*, Nq* = (tanφ′ + √(1+tan²φ′))²·exp(2η′·tanφ′), Nc* = (Nq*−1)·cotφ′"
}

// Refs returns Janbu (1976) and Das's presentation.
func (Janbu) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Janbu1976}, {Source: cite.Das2019, Where: "Janbu's method for pile tips"}}
}

// Range returns the inputs Janbu accepts.
func (Janbu) Range() string { return "φ′ 0 to 50 deg; η′ 60 to 105 deg; q′, c′ ≥ 0" }

func (j Janbu) eta() (units.Angle, error) {
	if j.Eta == 0 {
		return 90 * units.Degree, nil
	}
	d := j.Eta.Degrees()
	if !finite(d) || d < 60-degEps || d > 105+degEps {
		return 0, rangeErr(j.ID(), "eta", d, 60, 105, "deg", "60 to 105 deg (0 for 90 deg)")
	}
	return j.Eta, nil
}

// Factors returns Janbu's Nq* and Nc* at φ′ (0 to 50 deg).
func (j Janbu) Factors(phi units.Angle) (nq, nc float64, err error) {
	eta, err := j.eta()
	if err != nil {
		return 0, 0, err
	}
	if err := checkPhi(j.ID(), phi, 0, 50); err != nil {
		return 0, 0, err
	}
	t := phi.Tan()
	a := t + math.Sqrt(1+t*t)
	nq = a * a * math.Exp(2*float64(eta)*t)
	return nq, cohesionTerm(nq, phi, 2+2*float64(eta)), nil
}

// Tip returns Janbu's unit tip resistance.
func (j Janbu) Tip(in Input) (Result, error) {
	nq, nc, err := j.Factors(in.Phi)
	if err != nil {
		return Result{}, err
	}
	if err := checkStress(j.ID(), "q", in.Q); err != nil {
		return Result{}, err
	}
	if err := checkStress(j.ID(), "c", in.C); err != nil {
		return Result{}, err
	}
	r := Result{Nq: nq, Sigma: in.Q, C: in.C}
	if in.C > 0 {
		r.Nc = nc
	}
	r.Unlimited = units.Stress(r.Nc*float64(in.C) + nq*float64(in.Q))
	return finish(r), nil
}
