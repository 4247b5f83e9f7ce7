package pile

import (
	"fmt"
	"maps"
	"math"
	"slices"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Action is a characteristic load in one direction, split into its
// permanent (dead) and variable (live, wind, …) parts. Both are magnitudes
// in the direction of the check, zero or positive.
type Action struct {
	Permanent units.Force
	Variable  units.Force
}

// Total returns Permanent + Variable, the unfactored load.
func (a Action) Total() units.Force { return a.Permanent + a.Variable }

// Loads are the characteristic actions on the pile head.
type Loads struct {
	Compression Action
	Tension     Action
}

// Validate checks that every load is finite and not negative.
func (l Loads) Validate(path string) error {
	for _, f := range []struct {
		name string
		v    units.Force
	}{
		{"compression.permanent", l.Compression.Permanent}, {"compression.variable", l.Compression.Variable},
		{"tension.permanent", l.Tension.Permanent}, {"tension.variable", l.Tension.Variable},
	} {
		if !(f.v >= 0) || math.IsInf(float64(f.v), 0) {
			return fmt.Errorf("%s.%s: %v is outside 0 to ∞ kN", path, f.name, f.v)
		}
	}
	return nil
}

// Case is one verification a design basis asks for: multipliers on the
// characteristic resistances, partial factors on the actions, and the
// factors on soil strength the resistance is computed with.
//
//	Rd = Tip(method)·Rb + Σ Shaft(method)·Rs,i        (compression)
//	Rd = Σ Tension(method)·Rs,i + weight term           (tension)
//	Ed = Permanent·G + Variable·Q
type Case struct {
	Name string // such as "DA1-1" or "FS"

	// Resistance multipliers (1/γ for partial and global factors, φ for
	// LRFD), by method identifier; the entry "" is the default.
	Tip     map[string]float64
	Shaft   map[string]float64
	Tension map[string]float64

	// Partial factors on the characteristic actions.
	Permanent, Variable float64

	// Soil factors: tanφ′ and su are divided by these before the
	// resistance is computed (EN 1997-1 set M2); 1 means unfactored.
	TanPhi, Su float64
}

// factor returns m[id], or m[""] when id has no entry, or 0 when neither.
func factor(m map[string]float64, id string) float64 {
	if v, ok := m[id]; ok {
		return v
	}
	return m[""]
}

// Basis is a design basis: it turns a pile's characteristic resistance and
// loads into one or more verifications.
type Basis interface {
	// ID returns the identifier used in calc files.
	ID() string
	cite.Cited
	// Cases returns the verifications for a pile installed by inst.
	Cases(inst Installation) ([]Case, error)
}

// SafetyFactor is the allowable-stress basis: resistance divided by a
// global factor of safety, or by separate factors on tip and shaft,
//
//	Rd = Rb/Ftip + Rs/Fshaft,  Ed = G + Q (unfactored).
//
// Set Global, or both Tip and Shaft. Tension divides the tension
// resistance; 0 means Global, or Shaft when Global is 0.
type SafetyFactor struct {
	Global  float64
	Tip     float64
	Shaft   float64
	Tension float64
}

// ID returns "safety-factor".
func (SafetyFactor) ID() string { return "safety-factor" }

// Refs: the global factor of safety is common practice; 2.5 to 3 is usual
// for static analyses without load tests (Das 2019, §12.11; Tomlinson &
// Woodward 2008, §4.1).
func (SafetyFactor) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Das2019, Where: "factor of safety on static capacity"}}
}

func checkFactor(field string, v float64) error {
	if !(v >= 1) || math.IsInf(v, 0) {
		return fmt.Errorf("%s: %g is outside 1 to ∞", field, v)
	}
	return nil
}

// Cases returns the single verification "FS".
func (s SafetyFactor) Cases(Installation) ([]Case, error) {
	tip, shaft, ten := s.Tip, s.Shaft, s.Tension
	tipName, shaftName, tenName := "design.tip_factor", "design.shaft_factor", "design.tension_factor"
	if s.Global != 0 {
		if tip != 0 || shaft != 0 {
			return nil, fmt.Errorf("design.factor: give either a global factor or factors on tip and shaft, not both")
		}
		tip, shaft = s.Global, s.Global
		tipName, shaftName = "design.factor", "design.factor"
	}
	if ten == 0 {
		ten, tenName = shaft, shaftName
	}
	for _, f := range []struct {
		n string
		v float64
	}{{tipName, tip}, {shaftName, shaft}, {tenName, ten}} {
		if err := checkFactor(f.n, f.v); err != nil {
			return nil, err
		}
	}
	return []Case{{
		Name: "FS", Tip: map[string]float64{"": 1 / tip}, Shaft: map[string]float64{"": 1 / shaft},
		Tension: map[string]float64{"": 1 / ten}, Permanent: 1, Variable: 1, TanPhi: 1, Su: 1,
	}}, nil
}

// LRFD is a load and resistance factor basis:
//
//	Rd = φtip·Rb + Σ φshaft,i·Rs,i,  Ed = γG·G + γQ·Q.
//
// Resistance factors are keyed by method identifier ("" is the default
// for any method not listed). Every factor the check needs must be there:
// a method with no factor and no default is an error.
type LRFD struct {
	Name      string             // identifier; "lrfd" when empty
	Tip       map[string]float64 // φ on tip resistance, by tip method
	Shaft     map[string]float64 // φ on shaft resistance, by shaft method
	Tension   map[string]float64 // φ on uplift (shaft) resistance, by shaft method
	Permanent float64            // γ on permanent loads, such as 1.25 (DC)
	Variable  float64            // γ on variable loads, such as 1.75 (LL)
	Sources   []cite.Ref
}

// ID returns the basis name.
func (l LRFD) ID() string {
	if l.Name == "" {
		return "lrfd"
	}
	return l.Name
}

// Refs returns the sources of the factors.
func (l LRFD) Refs() []cite.Ref { return l.Sources }

// Cases returns the single verification.
func (l LRFD) Cases(Installation) ([]Case, error) {
	for _, m := range []struct {
		n string
		m map[string]float64
	}{{"design.tip", l.Tip}, {"design.shaft", l.Shaft}, {"design.tension", l.Tension}} {
		for _, k := range slices.Sorted(maps.Keys(m.m)) { // sorted: the first bad key is the same on every run
			if v := m.m[k]; !(v > 0 && v <= 1) {
				return nil, fmt.Errorf("%s[%q]: resistance factor %g is outside (0, 1]", m.n, k, v)
			}
		}
	}
	if !(l.Permanent >= 1) || math.IsInf(l.Permanent, 0) {
		return nil, fmt.Errorf("design.permanent: load factor %g is outside 1 to ∞", l.Permanent)
	}
	if !(l.Variable >= 1) || math.IsInf(l.Variable, 0) {
		return nil, fmt.Errorf("design.variable: load factor %g is outside 1 to ∞", l.Variable)
	}
	return []Case{{Name: l.ID(), Tip: l.Tip, Shaft: l.Shaft, Tension: l.Tension,
		Permanent: l.Permanent, Variable: l.Variable, TanPhi: 1, Su: 1}}, nil
}

// Approach is an EN 1997-1 design approach.
type Approach int

// The design approaches of EN 1997-1 §2.4.7.3.4.
const (
	DA1 Approach = iota + 1 // combination 1: A1+M1+R1; combination 2: A2+M1+R4
	DA2                     // A1+M1+R2
	DA3                     // A1 (structural actions, as a column load on a pile is) + M2 + R3
)

var approachIDs = [...]string{DA1: "DA1", DA2: "DA2", DA3: "DA3"}

// String returns "DA1", "DA2" or "DA3".
func (a Approach) String() string {
	if a > 0 && int(a) < len(approachIDs) {
		return approachIDs[a]
	}
	return fmt.Sprintf("Approach(%d)", int(a))
}

// ParseApproach reads "DA1", "DA2" or "DA3".
func ParseApproach(s string) (Approach, error) {
	for a := DA1; a <= DA3; a++ {
		if approachIDs[a] == s {
			return a, nil
		}
	}
	return 0, fmt.Errorf("approach %q: want DA1, DA2 or DA3", s)
}

// Eurocode7 is the EN 1997-1 partial factor basis for axially loaded piles
// whose resistance is calculated from ground test results (§7.6.2.3):
//
//	Rb,k = Rb,cal/(ξ·γRd),  Rs,k = Rs,cal/(ξ·γRd)
//	Rc,d = Rb,k/γb + Rs,k/γs,  Rt,d = Rs,k/γs,t
//	Fd = γG·Gk + γQ·Qk
//
// ξ is ξ3 for Profiles ground profiles (Table A.10): one calculated
// resistance is both the mean and the minimum, so ξ3 ≥ ξ4 governs.
// Profiles 0 means the "alternative procedure" of §7.6.2.3(8), with ξ = 1
// and the model factor γRd alone (the UK National Annex sets γRd = 1.4).
// Installation chooses the table: A.6 driven, A.7 bored, A.8 CFA.
type Eurocode7 struct {
	Approach Approach
	// Total divides the total resistance by γt instead of tip and shaft
	// by γb and γs (EN 1997-1 eq. 7.6 against 7.7; both are allowed).
	Total       bool
	Profiles    int     // number of ground test profiles n, 0 to use the model factor alone
	ModelFactor float64 // γRd; 0 means 1.0
}

// ID returns "en1997".
func (Eurocode7) ID() string { return "en1997" }

// Refs returns EN 1997-1 Annex A and §7.6.2.3.
func (Eurocode7) Refs() []cite.Ref {
	return []cite.Ref{
		{Source: cite.EN1997, Where: "§2.4.7.3.4, §7.6.2.3, Annex A Tables A.3, A.4, A.6-A.8, A.10"},
	}
}

// Partial resistance factors of EN 1997-1 Annex A for sets R1 to R4.
type rset struct{ b, s, t, st [4]float64 }

// Tables A.6 (driven), A.7 (bored) and A.8 (CFA): γb, γs, γt, γs,t for
// R1, R2, R3, R4.
var (
	en7Driven = rset{b: [4]float64{1.0, 1.1, 1.0, 1.3}, s: [4]float64{1.0, 1.1, 1.0, 1.3},
		t: [4]float64{1.0, 1.1, 1.0, 1.3}, st: [4]float64{1.25, 1.15, 1.1, 1.6}}
	en7Bored = rset{b: [4]float64{1.25, 1.1, 1.0, 1.6}, s: [4]float64{1.0, 1.1, 1.0, 1.3},
		t: [4]float64{1.15, 1.1, 1.0, 1.5}, st: [4]float64{1.25, 1.15, 1.1, 1.6}}
	en7CFA = rset{b: [4]float64{1.1, 1.1, 1.0, 1.45}, s: [4]float64{1.0, 1.1, 1.0, 1.3},
		t: [4]float64{1.1, 1.1, 1.0, 1.4}, st: [4]float64{1.25, 1.15, 1.1, 1.6}}
)

// Table A.10: ξ3 and ξ4 for n = 1, 2, 3, 4, 5, 7, 10 profiles.
var (
	xiN = [...]int{1, 2, 3, 4, 5, 7, 10}
	xi3 = [...]float64{1.40, 1.35, 1.33, 1.31, 1.29, 1.27, 1.25}
	xi4 = [...]float64{1.40, 1.27, 1.23, 1.20, 1.15, 1.12, 1.08}
)

// Xi returns the correlation factors ξ3 and ξ4 of EN 1997-1 Table A.10 for
// n ground profiles. Between tabulated n the factor of the next smaller
// tabulated n is taken (the safe side); n above 10 takes n = 10.
func Xi(n int) (xi3v, xi4v float64, err error) {
	if n < 1 {
		return 0, 0, fmt.Errorf("design.profiles: %d is outside 1 to ∞", n)
	}
	i := 0
	for j, m := range xiN {
		if n >= m {
			i = j
		}
	}
	return xi3[i], xi4[i], nil
}

// Characteristic returns the characteristic resistance from resistances
// calculated on n = len(cal) ground profiles, EN 1997-1 eq. 7.8:
//
//	Rk = min(mean(Rcal)/ξ3, min(Rcal)/ξ4)
func Characteristic(cal []units.Force) (units.Force, error) {
	if len(cal) == 0 {
		return 0, fmt.Errorf("design.profiles: no calculated resistances given")
	}
	x3, x4, err := Xi(len(cal))
	if err != nil {
		return 0, err
	}
	sum, lo := 0.0, math.Inf(1)
	for i, r := range cal {
		if !(r >= 0) || math.IsInf(float64(r), 0) {
			return 0, fmt.Errorf("design.profiles[%d]: %v is outside 0 to ∞ kN", i, r)
		}
		sum += float64(r)
		lo = min(lo, float64(r))
	}
	mean := sum / float64(len(cal))
	return units.Force(min(mean/x3, lo/x4)), nil
}

// Cases returns DA1-1 and DA1-2 for DA1, and one case otherwise.
func (e Eurocode7) Cases(inst Installation) ([]Case, error) {
	var rs rset
	switch inst {
	case DrivenHigh, DrivenLow, Jetted:
		rs = en7Driven
	case Bored:
		rs = en7Bored
	case Augered:
		rs = en7CFA
	default:
		return nil, fmt.Errorf("pile.installation: %v has no EN 1997-1 resistance table", inst)
	}
	gRd := e.ModelFactor
	if gRd == 0 {
		gRd = 1
	}
	if !(gRd >= 1) || math.IsInf(gRd, 0) {
		return nil, fmt.Errorf("design.model_factor: %g is outside 1 to ∞", gRd)
	}
	xi := 1.0
	if e.Profiles != 0 {
		x3, _, err := Xi(e.Profiles)
		if err != nil {
			return nil, err
		}
		xi = x3
	}
	mk := func(name string, r int, gG, gQ, tanPhi, su float64) Case {
		k := xi * gRd
		gb, gs := rs.b[r], rs.s[r]
		if e.Total {
			gb, gs = rs.t[r], rs.t[r]
		}
		return Case{Name: name,
			Tip:     map[string]float64{"": 1 / (k * gb)},
			Shaft:   map[string]float64{"": 1 / (k * gs)},
			Tension: map[string]float64{"": 1 / (k * rs.st[r])},
			// Table A.3: A1 γG = 1.35, γQ = 1.5; A2 γG = 1.0, γQ = 1.3.
			Permanent: gG, Variable: gQ, TanPhi: tanPhi, Su: su}
	}
	switch e.Approach {
	case DA1:
		return []Case{mk("DA1-1", 0, 1.35, 1.5, 1, 1), mk("DA1-2", 3, 1.0, 1.3, 1, 1)}, nil
	case DA2:
		return []Case{mk("DA2", 1, 1.35, 1.5, 1, 1)}, nil
	case DA3:
		// The load on a pile head is a structural action, so A1 applies
		// (§2.4.7.3.4.4, note on structural actions); Table A.4, M2:
		// γφ′ = 1.25 on tanφ′, γcu = 1.4.
		return []Case{mk("DA3", 2, 1.35, 1.5, 1.25, 1.4)}, nil
	}
	return nil, fmt.Errorf("design.approach: %v: want DA1, DA2 or DA3", e.Approach)
}

// Method families of the AASHTO resistance factor tables, by our method
// identifiers.
var (
	alphaIDs = []string{"alpha-api", "alpha-chart", "alpha-drilled", "alpha-given"}
	betaIDs  = []string{"beta", "beta-given", "beta-burland", "beta-api", "beta-drilled-sand", "beta-drilled-k0"}
)

func family(ids []string, phi float64, into map[string]float64) {
	for _, id := range ids {
		into[id] = phi
	}
}

// AASHTODrivenPiles returns the resistance factors for static analysis of
// driven piles of AASHTO LRFD Bridge Design Specifications Table
// 10.5.5.2.3-1 (as reproduced in FHWA GEC 12, Hannigan et al. 2016,
// Table 7-1): side and tip in clay by the α method 0.35, β method 0.25,
// λ method 0.40; end bearing in clay (Skempton, our "nc9") 0.40; uplift
// α 0.25, β 0.20, λ 0.30. Strength I load factors: permanent (DC) 1.25,
// variable (LL) 1.75. Methods for sand tips outside the table (the table's
// sand method is Nordlund's, which qult does not implement) have no factor:
// give them in Tip.
func AASHTODrivenPiles() LRFD {
	l := LRFD{Name: "aashto-driven", Tip: map[string]float64{"nc9": 0.40}, Shaft: map[string]float64{},
		Tension: map[string]float64{}, Permanent: 1.25, Variable: 1.75,
		Sources: []cite.Ref{{Source: cite.AASHTO2020, Where: "Table 10.5.5.2.3-1; Table 3.4.1-1, -2"},
			{Source: cite.Hannigan2016, Where: "Table 7-1"}}}
	family(alphaIDs, 0.35, l.Shaft)
	family(betaIDs, 0.25, l.Shaft)
	l.Shaft[lambdaID] = 0.40
	family(alphaIDs, 0.25, l.Tension)
	family(betaIDs, 0.20, l.Tension)
	l.Tension[lambdaID] = 0.30
	return l
}

// AASHTODrilledShafts returns the resistance factors for drilled shafts of
// AASHTO LRFD Bridge Design Specifications Table 10.5.5.2.4-1 (as applied
// in FHWA GEC 10, Brown et al. 2018, Appendix A): side in clay (α) 0.45,
// tip in clay 0.40, side in sand (β) 0.55, tip in sand 0.50; uplift in
// clay 0.35, in sand 0.45. Strength I load factors 1.25 and 1.75.
func AASHTODrilledShafts() LRFD {
	l := LRFD{Name: "aashto-drilled", Tip: map[string]float64{"nc9": 0.40, "shaft-n60-sand": 0.50},
		Shaft: map[string]float64{}, Tension: map[string]float64{}, Permanent: 1.25, Variable: 1.75,
		Sources: []cite.Ref{{Source: cite.AASHTO2020, Where: "Table 10.5.5.2.4-1; Table 3.4.1-1, -2"},
			{Source: cite.Brown2018, Where: "Appendix A, resistance factors applied"}}}
	family(alphaIDs, 0.45, l.Shaft)
	family(betaIDs, 0.55, l.Shaft)
	family(alphaIDs, 0.35, l.Tension)
	family(betaIDs, 0.45, l.Tension)
	return l
}
