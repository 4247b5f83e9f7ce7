package bearing

import (
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// APISand is the tip of a driven pile in siliceous sand by the tabulated
// factors of API RP 2GEO (2011), identifiers by class as the shaft side's sand_class spells them
// ("api-medium-dense-sand-silt" to "api-very-dense-sand"; formerly
// api-sand-1 to api-sand-4):
//
//	qp = min(q′·Nq, q_L)
//
// with Nq and q_L by sand class (our numbering of the API table's rows):
//
//	class  description                                  Nq   q_L
//	1      medium dense sand-silt                       12    3 MPa
//	2      medium dense sand; dense sand-silt           20    5 MPa
//	3      dense sand; very dense sand-silt             40   10 MPa
//	4      very dense sand                              50   12 MPa
//
// API gives no values for looser or siltier soils. The values are recalled
// (from memory), not yet checked against the printed table. Reads Q.
type APISand struct {
	Class int // 1 to 4, as above
}

var apiSand = [4]struct {
	id  string
	nq  float64
	lim units.Stress
}{
	{"api-medium-dense-sand-silt", 12, 3 * units.Megapascal},
	{"api-medium-dense-sand", 20, 5 * units.Megapascal},
	{"api-dense-sand", 40, 10 * units.Megapascal},
	{"api-very-dense-sand", 50, 12 * units.Megapascal},
}

// ID returns the class's identifier, the spelling of the API sand
// classes on the shaft side too (api-medium-dense-sand-silt,
// api-medium-dense-sand, api-dense-sand, api-very-dense-sand), or "api-sand"
// for a bad class.
func (a APISand) ID() string {
	if a.Class < 1 || a.Class > 4 {
		return "api-sand"
	}
	return apiSand[a.Class-1].id
}

// Equation returns the rule on one line.
func (a APISand) Equation() string { return "qp = min(q′·Nq, q_L), Nq and q_L by sand class" }

// Refs returns API RP 2GEO (2011).
func (APISand) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.API2011, Where: "design parameters for cohesionless siliceous soil"}}
}

// Range returns the inputs APISand accepts.
func (APISand) Range() string { return "class 1 to 4; q′ ≥ 0" }

// Tip returns the API unit tip resistance.
func (a APISand) Tip(in Input) (Result, error) {
	if a.Class < 1 || a.Class > 4 {
		return Result{}, rangeErr("api-sand", "class", float64(a.Class), 1, 4, "", "1 to 4")
	}
	c := apiSand[a.Class-1]
	if err := checkStress(c.id, "q", in.Q); err != nil {
		return Result{}, err
	}
	return finish(Result{Nq: c.nq, Sigma: in.Q, Limit: c.lim, Unlimited: units.Stress(c.nq * float64(in.Q))}), nil
}

// ShaftSand is the tip of a drilled shaft in sand from the SPT, after
// O'Neill & Reese (1999) as carried into FHWA GEC 10 (Brown et al. 2010),
// identifier "drilled-n60-sand":
//
//	qp = 0.6·N60 tsf ≤ 30 tsf     (= 57.46·N60 kPa ≤ 2.873 MPa; 1.2·N60 ksf ≤ 60 ksf)
//
// so the limit governs above N60 = 50. The rule is written in tons per
// square foot (1 tsf = 2000 psf = 95.76 kPa, exact from NIST SP 811's psf)
// as published; it does not use pa. Settlement basis: the unit base
// resistance at a base settlement of 5 % of the base diameter, as
// O'Neill & Reese and GEC 10 define the nominal base resistance of a
// drilled shaft (SettlementBasis5Percent). The coefficient 0.6, the cap
// and the 5 % definition are from memory, not yet read in either manual.
//
// Reads N60 (above 0 to 200): a zero N60 means the blow count was not
// given and is an error naming n60. No reduction for base diameters
// above 1.27 m is applied here; wrap the method in LargeBase (as
// BoredSand does) to apply it.
type ShaftSand struct{}

// ID returns "drilled-n60-sand".
func (ShaftSand) ID() string { return "drilled-n60-sand" }

// Equation returns the rule on one line.
func (ShaftSand) Equation() string {
	return "qp = 0.6·N60 tsf ≤ 30 tsf (57.5·N60 kPa ≤ 2.87 MPa)"
}

// Refs returns O'Neill & Reese (1999) and GEC 10.
func (ShaftSand) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.ONeillReese1999, Where: "base resistance in cohesionless soil"},
		{Source: cite.Brown2010, Where: "base resistance in cohesionless soil"}}
}

// Range returns the inputs ShaftSand accepts.
// (N60 = 0 means "not given" and is refused.)
func (ShaftSand) Range() string { return "N60 0 to 200 (limit governs above 50)" }

// SettlementBasis returns the settlement at which the rule's qp is defined.
func (ShaftSand) SettlementBasis() string { return SettlementBasis5Percent }

// Tip returns the unit tip resistance from N60.
func (s ShaftSand) Tip(in Input) (Result, error) {
	if !finite(in.N60) || in.N60 <= 0 || in.N60 > 200 {
		return Result{}, rangeErr(s.ID(), "n60", in.N60, 0, 200, "blows/0.3 m", "above 0 to 200 blows/0.3 m (give the SPT N60 at the base)")
	}
	return finish(Result{Limit: shaftSandCap, Unlimited: units.Stress(0.6 * in.N60 * float64(units.TSF))}), nil
}

// shaftSandCap is the 30 tsf cap of ShaftSand.
const shaftSandCap = 30 * units.TSF

// Skempton is the undrained tip with Skempton's (1951) Nc = 9 for a deep
// circular or square base, identifier "nc9":
//
//	qp = 9·su
//
// Reads Su.
type Skempton struct{}

// ID returns "nc9".
func (Skempton) ID() string { return "nc9" }

// Equation returns the rule on one line.
func (Skempton) Equation() string { return "qp = 9·su" }

// Refs returns Skempton (1951).
func (Skempton) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Skempton1951, Where: "Nc for deep circular and square bases"}}
}

// Range returns the inputs Skempton accepts.
func (Skempton) Range() string { return "su > 0" }

// Tip returns 9·su.
func (s Skempton) Tip(in Input) (Result, error) {
	if err := checkSu(s.ID(), in.Su); err != nil {
		return Result{}, err
	}
	return finish(Result{Nc: 9, C: in.Su, Unlimited: units.Stress(9 * float64(in.Su))}), nil
}

// GivenNq is a drained tip with factors the engineer gives, for example
// from a geotechnical report, identifier "given-nq":
//
//	qp = min(c′·Nc + q′·Nq, Limit)
//
// Nq must lie from 1 to 1e4, Nc from 0 to 1e4 (0 drops the c′ term) and
// Limit is 0 (none) or above 0. Reads Q and C.
type GivenNq struct {
	Nq    float64
	Nc    float64
	Limit units.Stress
}

// ID returns "given-nq".
func (GivenNq) ID() string { return "given-nq" }

// Equation returns the rule on one line.
func (GivenNq) Equation() string { return "qp = min(c′·Nc + q′·Nq, limit), factors given" }

// Refs returns no published source: the values are the engineer's.
func (GivenNq) Refs() []cite.Ref { return nil }

// Range returns the inputs GivenNq accepts.
func (GivenNq) Range() string {
	return "Nq 1 to 1e4; Nc 0 to 1e4; limit ≥ 0 (0 none); q′, c′ ≥ 0"
}

// Tip returns the unit tip resistance from the given factors.
func (g GivenNq) Tip(in Input) (Result, error) {
	id := g.ID()
	if !finite(g.Nq) || g.Nq < 1 || g.Nq > 1e4 {
		return Result{}, rangeErr(id, "nq", g.Nq, 1, 1e4, "", "1 to 1e+04")
	}
	if !finite(g.Nc) || g.Nc < 0 || g.Nc > 1e4 {
		return Result{}, rangeErr(id, "nc", g.Nc, 0, 1e4, "", "0 to 1e+04")
	}
	if err := checkStress(id, "limit", g.Limit); err != nil {
		return Result{}, err
	}
	if err := checkStress(id, "q", in.Q); err != nil {
		return Result{}, err
	}
	if err := checkStress(id, "c", in.C); err != nil {
		return Result{}, err
	}
	r := Result{Nq: g.Nq, Nc: g.Nc, Sigma: in.Q, C: in.C, Limit: g.Limit}
	r.Unlimited = units.Stress(g.Nc*float64(in.C) + g.Nq*float64(in.Q))
	return finish(r), nil
}

// GivenNc is an undrained tip with an Nc the engineer gives, identifier
// "given-nc":
//
//	qp = Nc·su
//
// Nc must lie from 1 to 100. Reads Su.
type GivenNc struct {
	Nc float64
}

// ID returns "given-nc".
func (GivenNc) ID() string { return "given-nc" }

// Equation returns the rule on one line.
func (GivenNc) Equation() string { return "qp = Nc·su, Nc given" }

// Refs returns no published source: the value is the engineer's.
func (GivenNc) Refs() []cite.Ref { return nil }

// Range returns the inputs GivenNc accepts.
func (GivenNc) Range() string { return "Nc 1 to 100; su > 0" }

// Tip returns Nc·su.
func (g GivenNc) Tip(in Input) (Result, error) {
	if !finite(g.Nc) || g.Nc < 1 || g.Nc > 100 {
		return Result{}, rangeErr(g.ID(), "nc", g.Nc, 1, 100, "", "1 to 100")
	}
	if err := checkSu(g.ID(), in.Su); err != nil {
		return Result{}, err
	}
	return finish(Result{Nc: g.Nc, C: in.Su, Unlimited: units.Stress(g.Nc * float64(in.Su))}), nil
}
