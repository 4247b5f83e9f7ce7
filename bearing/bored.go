package bearing

import (
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Settlement bases: the settlement at which a method's unit tip resistance
// is defined, as text a report can print beside the value.
const (
	// SettlementBasis5Percent is the drilled-shaft definition of the
	// nominal base resistance (O'Neill & Reese 1999; Brown et al. 2010).
	SettlementBasis5Percent = "unit base resistance at a base settlement of 5 % of the base diameter"
	// SettlementBasisUltimate is the basis of the classical bearing-capacity
	// methods: the ultimate (failure) unit tip resistance.
	SettlementBasisUltimate = "ultimate (failure) unit tip resistance, as the method's source defines it"
	// SettlementBasisLower is the basis of a rule that takes the lesser of
	// an ultimate value and a value at 5 % base settlement.
	SettlementBasisLower = "lesser of the ultimate unit tip resistance and the unit base resistance at a base settlement of 5 % of the base diameter"
)

// SettlementBasis returns the settlement basis of m's unit tip resistance:
// the method's own statement when it has one (a SettlementBasis method),
// otherwise SettlementBasisUltimate.
func SettlementBasis(m Method) string {
	if b, ok := m.(interface{ SettlementBasis() string }); ok {
		return b.SettlementBasis()
	}
	return SettlementBasisUltimate
}

// LargeBaseDiameter is the base diameter, 1.27 m (50 in), above which
// O'Neill & Reese (1999) reduce the base resistance of a drilled shaft in
// cohesionless soil.
const LargeBaseDiameter = 1.27 * units.Metre

// LargeBaseFactor returns O'Neill & Reese's (1999) reduction of the unit
// base resistance of a drilled shaft in cohesionless soil for a base
// diameter B (the form GEC 10 carries):
//
//	f = 1            for B ≤ 1.27 m
//	f = 1.27 m / B   for B > 1.27 m        (50 in / B in US units)
//
// so that q_reduced = f·qp, which keeps the base load at 5 % settlement
// from growing faster than B. B must lie above 0 to 100 m. The threshold
// and the form are from memory, not yet read in O'Neill & Reese or GEC 10.
func LargeBaseFactor(b units.Length) (float64, error) {
	m := b.Metres()
	if !finite(m) || m <= 0 || m > 100 {
		return 0, rangeErr("large-base", "d", m, 0, 100, "m", "above 0 to 100 m (the base diameter)")
	}
	if b <= LargeBaseDiameter {
		return 1, nil
	}
	return float64(LargeBaseDiameter) / float64(b), nil
}

// LargeBase applies O'Neill & Reese's large-base reduction (see
// LargeBaseFactor) to the unit tip resistance of another method, reading
// the base diameter from Input.D; its identifier is the other method's
// followed by "+large-base":
//
//	qp = f(B)·qp(Of),  f = min(1, 1.27 m/B)
//
// The factor multiplies Qp after the method's limit and is recorded in
// Result.Reduction (times any reduction the method applied). Off keeps the
// method's qp unchanged and flags the result ReductionOff whenever B is
// above 1.27 m. Settlement basis: that of Of.
type LargeBase struct {
	Of  Tip  // the method whose qp is reduced; must not be nil
	Off bool // skip the reduction (flagged when it would apply)
}

// ID returns the wrapped method's identifier followed by "+large-base".
func (l LargeBase) ID() string {
	if l.Of == nil {
		return "large-base"
	}
	return l.Of.ID() + "+large-base"
}

// Equation returns the rule on one line.
func (l LargeBase) Equation() string {
	if l.Of == nil {
		return "qp × 1.27 m/B for B > 1.27 m"
	}
	return l.Of.Equation() + "; × 1.27 m/B for B > 1.27 m"
}

// Refs returns the wrapped method's sources and O'Neill & Reese (1999).
func (l LargeBase) Refs() []cite.Ref {
	var refs []cite.Ref
	if l.Of != nil {
		refs = append(refs, l.Of.Refs()...)
	}
	return append(refs, cite.Ref{Source: cite.ONeillReese1999, Where: "reduction of base resistance for base diameters over 1.27 m"})
}

// Range returns the inputs LargeBase accepts.
func (l LargeBase) Range() string {
	if l.Of == nil {
		return "B (d) above 0 to 100 m"
	}
	return l.Of.Range() + "; B (d) above 0 to 100 m"
}

// SettlementBasis returns the wrapped method's basis.
func (l LargeBase) SettlementBasis() string {
	if l.Of == nil {
		return SettlementBasis5Percent
	}
	return SettlementBasis(l.Of)
}

// Tip returns the wrapped method's unit tip resistance, reduced for a
// large base.
func (l LargeBase) Tip(in Input) (Result, error) {
	if l.Of == nil {
		return Result{}, &RangeError{Method: "large-base", Field: "of", Value: "nil", Range: "a tip method"}
	}
	f, err := LargeBaseFactor(in.D)
	if err != nil {
		if re, ok := err.(*RangeError); ok {
			re.Method = l.Of.ID()
		}
		return Result{}, err
	}
	r, err := l.Of.Tip(in)
	if err != nil {
		return Result{}, err
	}
	return largeBase(r, f, l.Off), nil
}

// largeBase applies the factor f (≤ 1) to r, or flags it when off.
func largeBase(r Result, f float64, off bool) Result {
	if f >= 1 {
		return r
	}
	if off {
		r.Flags |= ReductionOff
		return r
	}
	r.Qp = units.Stress(f * float64(r.Qp))
	if r.Reduction == 0 {
		r.Reduction = f
	} else {
		r.Reduction *= f
	}
	return r
}

// BoredPhiFactor is the ratio of the unit tip resistance of a bored pile
// to that of a driven pile in the same sand used by BoredPhi: one third,
// after Meyerhof (1976) (from memory, not yet read in the paper).
const BoredPhiFactor = 1.0 / 3.0

// BoredPhi is a tip for bored piles and drilled shafts in sand when only
// φ′ is known, identifier "bored-phi":
//
//	qp = min(1/3 · qp,driven, 30 tsf)
//	qp,driven = c′·Nc* + min(q′·Nq*, 0.5·pa·Nq*·tanφ′)     (Meyerhof, as the method Meyerhof)
//
// Meyerhof (1976) found the unit point resistance of bored piles in sand
// to be about one third of that of driven piles, because boring loosens
// the sand below the base (the ratio from memory, not yet read in the
// paper). The cap is the drilled-shaft cap of O'Neill & Reese (1999), 30
// tsf (2.873 MPa), the most practice credits a base in cohesionless soil
// at 5 % base settlement; it is on by default, and NoCap removes it with
// the ReductionOff flag whenever it would govern. pa is Input.Pa (default
// 100 kPa). Settlement basis: SettlementBasisLower.
//
// The rule was chosen over a reduced φ′ (such as Kishida's φ′ − 3° used
// with bored piles) because it reduces both Nq* and Meyerhof's limit, so
// that it stays below the driven value at every φ′ and q′, and because
// it needs no site-specific loosening estimate; a reviewer who prefers
// another bored-pile rule gives it with GivenNq.
//
// Reads Phi (20 to 45 deg, Meyerhof's chart), Q, C, Pa and Clamp.
type BoredPhi struct {
	NoCap bool // drop the 30 tsf cap (flagged when it would govern)
}

// ID returns "bored-phi".
func (BoredPhi) ID() string { return "bored-phi" }

// Equation returns the rule on one line.
func (BoredPhi) Equation() string {
	return "qp = min(1/3·[c′·Nc* + min(q′·Nq*, 0.5·pa·Nq*·tanφ′)], 30 tsf), Nq* Meyerhof's"
}

// Refs returns Meyerhof (1976), Das's tabulation and O'Neill & Reese (1999).
func (BoredPhi) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Meyerhof1976, Where: "point resistance of bored piles relative to driven piles"},
		{Source: cite.Das2019, Where: "table of interpolated Nq* (pile foundations)"},
		{Source: cite.ONeillReese1999, Where: "cap on base resistance in cohesionless soil"}}
}

// Range returns the inputs BoredPhi accepts.
func (BoredPhi) Range() string {
	return "φ′ 20 to 45 deg (Meyerhof chart); q′, c′ ≥ 0; pa 50 to 150 kPa"
}

// SettlementBasis returns SettlementBasisLower.
func (BoredPhi) SettlementBasis() string { return SettlementBasisLower }

// Tip returns the bored-pile unit tip resistance.
func (b BoredPhi) Tip(in Input) (Result, error) {
	r, err := Meyerhof{}.Tip(in)
	if err != nil {
		if re, ok := err.(*RangeError); ok {
			re.Method = b.ID()
		}
		return Result{}, err
	}
	r.Qp = units.Stress(BoredPhiFactor * float64(r.Qp))
	r.Reduction = BoredPhiFactor
	if r.Qp > shaftSandCap {
		if b.NoCap {
			r.Flags |= ReductionOff
		} else {
			r.Qp = shaftSandCap
			r.Flags |= CapGoverns
		}
	}
	if !b.NoCap {
		r.Cap = shaftSandCap
	}
	return r, nil
}

// BoredSand is the default tip for bored and augered piles and drilled
// shafts in drained cohesionless layers, identifier "bored-sand":
//
//	qp = f(B)·qp,rule,  f = min(1, 1.27 m/B)
//	qp,rule = 0.6·N60 tsf ≤ 30 tsf                   when N60 is given (ShaftSand)
//	qp,rule = min(1/3·qp,Meyerhof driven, 30 tsf)    otherwise (BoredPhi)
//
// Result.Rule names the rule used, Result.Reduction the factors applied.
// The large-base reduction reads the base diameter from Input.D (required)
// and is on by default; NoLargeBase skips it and flags ReductionOff when
// B is above 1.27 m. NoCap is passed to BoredPhi. Settlement basis: 5 % of
// the base diameter for the SPT rule, SettlementBasisLower for the φ′
// rule.
//
// Reads N60, or Phi, Q, C, Pa and Clamp; and D.
type BoredSand struct {
	NoCap       bool // passed to BoredPhi
	NoLargeBase bool // skip the large-base reduction (flagged when it would apply)
}

// ID returns "bored-sand".
func (BoredSand) ID() string { return "bored-sand" }

// Equation returns the rule on one line.
func (BoredSand) Equation() string {
	return "qp = 0.6·N60 tsf ≤ 30 tsf if N60 given, else min(1/3·qp,Meyerhof, 30 tsf); × 1.27 m/B for B > 1.27 m"
}

// Refs returns the sources of the rules it chooses among.
func (BoredSand) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.ONeillReese1999, Where: "base resistance in cohesionless soil; large-base reduction"},
		{Source: cite.Brown2010, Where: "base resistance in cohesionless soil"},
		{Source: cite.Meyerhof1976, Where: "point resistance of bored piles relative to driven piles"},
		{Source: cite.Das2019, Where: "table of interpolated Nq* (pile foundations)"}}
}

// Range returns the inputs BoredSand accepts.
func (BoredSand) Range() string {
	return "N60 above 0 to 200, or φ′ 20 to 45 deg with q′, c′ ≥ 0; B (d) above 0 to 100 m"
}

// SettlementBasis returns the basis of the lesser-of rule, which covers
// both cases; Result.Rule tells which applied.
func (BoredSand) SettlementBasis() string { return SettlementBasisLower }

// Tip returns the bored-pile unit tip resistance.
func (b BoredSand) Tip(in Input) (Result, error) {
	f, err := LargeBaseFactor(in.D)
	if err != nil {
		if re, ok := err.(*RangeError); ok {
			re.Method = b.ID()
		}
		return Result{}, err
	}
	var r Result
	if in.N60 != 0 {
		r, err = ShaftSand{}.Tip(in)
		r.Rule = ShaftSand{}.ID()
	} else {
		r, err = BoredPhi{NoCap: b.NoCap}.Tip(in)
		r.Rule = BoredPhi{}.ID()
	}
	if err != nil {
		if re, ok := err.(*RangeError); ok {
			re.Method = b.ID()
		}
		return Result{}, err
	}
	return largeBase(r, f, b.NoLargeBase), nil
}
