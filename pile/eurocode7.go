package pile

import (
	"fmt"
	"math"
	"slices"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

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

// RSet holds the partial resistance factors of one installation for the
// sets R1 to R4 (index 0 to 3): γb on the base, γs on the shaft in
// compression, γt on the total, γs;t on the shaft in tension.
type RSet struct {
	Base, Shaft, Total, Tension [4]float64
}

// ActionSet holds the partial factors on actions of one set (A1 or A2):
// γG on unfavourable and γG,fav on favourable permanent actions, γQ on
// unfavourable variable actions.
type ActionSet struct {
	G, GFav, Q float64
}

// EN7Factors are the partial and correlation factors of an EN 1997-1
// verification of piles by calculation: Annex A's recommended values
// (EN1997Recommended) or a national annex's (UKAnnex), or values given
// field by field starting from either.
type EN7Factors struct {
	Name string // such as "en1997-annex-a" or "uk-na"
	Refs []cite.Ref
	// Tables A.6 (driven), A.7 (bored), A.8 (CFA).
	Driven, Bored, CFA RSet
	// Table A.3: sets A1 and A2.
	A1, A2 ActionSet
	// Table A.4, set M2: γφ′ on tanφ′ (and on c′) and γcu on su.
	M2TanPhi, M2Su float64
	// Table A.10: ξ3 and ξ4 for XiN ground test profiles, XiN increasing
	// from 1.
	XiN      []int
	Xi3, Xi4 []float64
	// ModelFactor is γRd for the resistance calculated from ground test
	// results (§7.6.2.3(8)), ≥ 1.
	ModelFactor float64
	// Approaches the annex allows; empty for all three.
	Approaches []Approach
}

// EN1997Recommended returns the recommended values of EN 1997-1:2004
// Annex A, read in reproductions of the standard:
//
//   - Table A.3 (read in the reproduction of EN 1997-1 at
//     geotechnicaldesign.info, §A.3.1): A1 γG = 1.35, γG,fav = 1.0,
//     γQ = 1.5; A2 γG = 1.0, γG,fav = 1.0, γQ = 1.3.
//   - Table A.4 (same reproduction, §A.3.2): M2 γφ′ = γc′ = 1.25, γcu = 1.4.
//   - Tables A.6–A.8 (read in Tomlinson & Woodward 2008, Tables 4.3–4.5,
//     and Smith 2014, Table 10.3A): driven γb = γs = γt = 1.0/1.1/1.0/1.3;
//     bored γb 1.25/1.1/1.0/1.6, γs 1.0/1.1/1.0/1.3, γt 1.15/1.1/1.0/1.5;
//     CFA γb 1.1/1.1/1.0/1.45, γs 1.0/1.1/1.0/1.3, γt 1.1/1.1/1.0/1.4;
//     γs;t 1.25/1.15/1.1/1.6 for all three.
//   - Table A.10 (read at geotechnicaldesign.info, §A.3.3.3): ξ3 =
//     1.40/1.35/1.33/1.31/1.29/1.27/1.25 and ξ4 =
//     1.40/1.27/1.23/1.20/1.15/1.12/1.08 for n = 1/2/3/4/5/7/10.
//
// Bored γt in R4: Tomlinson & Woodward (2008, Table 4.4) print 1.6, Smith
// (2014, Table 10.3A) prints 1.5, and Bond & Harris (2008, ch. 13) divide
// by 1.5 in their worked example of a bored pile under DA1-2 (Rc,d =
// 4271/1.5 = 2847 kN). Two independent reproductions agree, so 1.5 it is.
func EN1997Recommended() EN7Factors {
	return EN7Factors{
		Name: "en1997-annex-a",
		Refs: []cite.Ref{{Source: cite.EN1997, Where: "Annex A, Tables A.3, A.4, A.6-A.8, A.10"},
			{Source: cite.TomlinsonWoodward2008, Where: "Tables 4.1-4.6"},
			{Source: cite.Smith2014, Where: "Table 10.3A"},
			{Source: cite.BondHarris2008, Where: "ch. 13"}},
		Driven: RSet{Base: [4]float64{1.0, 1.1, 1.0, 1.3}, Shaft: [4]float64{1.0, 1.1, 1.0, 1.3},
			Total: [4]float64{1.0, 1.1, 1.0, 1.3}, Tension: [4]float64{1.25, 1.15, 1.1, 1.6}},
		Bored: RSet{Base: [4]float64{1.25, 1.1, 1.0, 1.6}, Shaft: [4]float64{1.0, 1.1, 1.0, 1.3},
			Total: [4]float64{1.15, 1.1, 1.0, 1.5}, Tension: [4]float64{1.25, 1.15, 1.1, 1.6}},
		CFA: RSet{Base: [4]float64{1.1, 1.1, 1.0, 1.45}, Shaft: [4]float64{1.0, 1.1, 1.0, 1.3},
			Total: [4]float64{1.1, 1.1, 1.0, 1.4}, Tension: [4]float64{1.25, 1.15, 1.1, 1.6}},
		A1:       ActionSet{G: 1.35, GFav: 1.0, Q: 1.5},
		A2:       ActionSet{G: 1.0, GFav: 1.0, Q: 1.3},
		M2TanPhi: 1.25, M2Su: 1.4,
		XiN:         []int{1, 2, 3, 4, 5, 7, 10},
		Xi3:         []float64{1.40, 1.35, 1.33, 1.31, 1.29, 1.27, 1.25},
		Xi4:         []float64{1.40, 1.27, 1.23, 1.20, 1.15, 1.12, 1.08},
		ModelFactor: 1.0,
	}
}

// UKAnnex returns the factors of the UK National Annex to BS EN 1997-1
// (NA to BS EN 1997-1:2004) for piles. slsVerified selects the lower R4
// factors the annex allows where serviceability is verified explicitly
// (by load tests on more than 1 % of the piles, or where settlement is of
// no concern); false gives the higher ones.
//
// Read in Smith (2014), Table 10.3B, reproducing Tables A.NA.6–A.NA.8
// (no SLS check / SLS verified): R1 γb = γs = γt = 1.0; R4 driven γb
// 1.7/1.5, γs 1.5/1.3, γt 1.7/1.5; bored and CFA γb 2.0/1.7, γs 1.6/1.4,
// γt 2.0/1.7. Bond & Harris (2008, §13.11.1) state that the annex sets
// every factor of R1 to 1.0 (so γs;t in R1 too), and Smith (2014, §10.6.1)
// that its other GEO factors (A1, A2, M2) are those of EN 1997-1; Tomlinson
// & Woodward (2008, §4.1) that the UK uses DA1 for piles, the only approach
// this preset allows. From memory, not read: γs;t in R4 = 2.0 (taken with
// and without the SLS check, the conservative reading), ξ3 =
// 1.55/1.47/1.42/1.38/1.36/1.33/1.30 and ξ4 = 1.55/1.39/1.33/1.29/1.26/
// 1.20/1.15 for n = 1/2/3/4/5/7/10 (Table A.NA.10), and the model factor
// γRd = 1.4, which the annex lets fall to 1.2 where the resistance is
// verified by a maintained load test taken to the calculated unfactored
// ultimate resistance (give Eurocode7.ModelFactor). R2 and R3, unused
// under DA1, keep the EN values.
func UKAnnex(slsVerified bool) EN7Factors {
	f := EN1997Recommended()
	f.Name = "uk-na"
	if slsVerified {
		f.Name = "uk-na-sls"
	}
	f.Refs = []cite.Ref{{Source: cite.UKNA1997, Where: "Tables A.NA.6-A.NA.8, A.NA.10; A.3.3.2 (model factor)"},
		{Source: cite.Smith2014, Where: "Table 10.3B, §10.6.1"},
		{Source: cite.BondHarris2008, Where: "§13.11"},
		{Source: cite.EN1997, Where: "Annex A, Tables A.3, A.4"}}
	pick := func(noSLS, sls float64) float64 {
		if slsVerified {
			return sls
		}
		return noSLS
	}
	for _, r := range []*RSet{&f.Driven, &f.Bored, &f.CFA} {
		r.Base[0], r.Shaft[0], r.Total[0], r.Tension[0] = 1, 1, 1, 1
		r.Tension[3] = 2.0
	}
	f.Driven.Base[3], f.Driven.Shaft[3], f.Driven.Total[3] = pick(1.7, 1.5), pick(1.5, 1.3), pick(1.7, 1.5)
	for _, r := range []*RSet{&f.Bored, &f.CFA} {
		r.Base[3], r.Shaft[3], r.Total[3] = pick(2.0, 1.7), pick(1.6, 1.4), pick(2.0, 1.7)
	}
	f.Xi3 = []float64{1.55, 1.47, 1.42, 1.38, 1.36, 1.33, 1.30}
	f.Xi4 = []float64{1.55, 1.39, 1.33, 1.29, 1.26, 1.20, 1.15}
	f.ModelFactor = 1.4
	f.Approaches = []Approach{DA1}
	return f
}

// set returns the resistance factors of installation inst.
func (f *EN7Factors) set(inst Installation) (RSet, string, error) {
	switch inst {
	case DrivenHigh, DrivenLow, Jetted:
		return f.Driven, "driven", nil
	case Bored:
		return f.Bored, "bored", nil
	case Augered:
		return f.CFA, "cfa", nil
	}
	return RSet{}, "", pathErrorf("pile.installation", "%v has no EN 1997-1 resistance table", inst)
}

// Validate checks every factor: resistance, model and soil factors and γG,
// γQ at least 1, γG,fav 0 to 1, the ξ table well formed.
func (f *EN7Factors) Validate(path string) error {
	ge1 := func(field string, v float64) error {
		if !(v >= 1) || math.IsInf(v, 0) {
			return &FieldError{Field: path + "." + field, Value: v, Range: "1 to ∞"}
		}
		return nil
	}
	for _, s := range []struct {
		name string
		r    *RSet
	}{{"driven", &f.Driven}, {"bored", &f.Bored}, {"cfa", &f.CFA}} {
		for _, g := range []struct {
			name string
			v    *[4]float64
		}{{"gamma_b", &s.r.Base}, {"gamma_s", &s.r.Shaft}, {"gamma_t", &s.r.Total}, {"gamma_st", &s.r.Tension}} {
			for i, v := range g.v {
				if !(v >= 1) || math.IsInf(v, 0) { // ge1's test: the name is built only for the error
					return ge1(fmt.Sprintf("%s.%s.R%d", s.name, g.name, i+1), v)
				}
			}
		}
	}
	for _, a := range []struct {
		name string
		s    ActionSet
	}{{"A1", f.A1}, {"A2", f.A2}} {
		if err := ge1(a.name+".gamma_g", a.s.G); err != nil {
			return err
		}
		if err := ge1(a.name+".gamma_q", a.s.Q); err != nil {
			return err
		}
		if !(a.s.GFav >= 0 && a.s.GFav <= 1) {
			return &FieldError{Field: path + "." + a.name + ".gamma_g_fav", Value: a.s.GFav, Range: "0 to 1"}
		}
	}
	for _, g := range []struct {
		n string
		v float64
	}{{"M2.gamma_phi", f.M2TanPhi}, {"M2.gamma_cu", f.M2Su}, {"model_factor", f.ModelFactor}} {
		if err := ge1(g.n, g.v); err != nil {
			return err
		}
	}
	if len(f.XiN) == 0 || len(f.Xi3) != len(f.XiN) || len(f.Xi4) != len(f.XiN) || f.XiN[0] != 1 {
		return &FieldError{Field: path + ".xi", Value: float64(len(f.XiN)), Range: "a table from n = 1 with ξ3 and ξ4 for each n"}
	}
	for i := range f.XiN {
		if i > 0 && f.XiN[i] <= f.XiN[i-1] {
			return &FieldError{Field: fmt.Sprintf("%s.xi.n[%d]", path, i), Value: float64(f.XiN[i]), Range: fmt.Sprintf("above %d", f.XiN[i-1])}
		}
		if err := ge1(fmt.Sprintf("xi3[%d]", i), f.Xi3[i]); err != nil {
			return err
		}
		if err := ge1(fmt.Sprintf("xi4[%d]", i), f.Xi4[i]); err != nil {
			return err
		}
	}
	return nil
}

// Xi returns ξ3 and ξ4 for n ground test profiles from the table: between
// tabulated n the factors of the next smaller tabulated n (the safe side,
// as ξ falls with n); above the table, its last row.
func (f *EN7Factors) Xi(n int) (xi3v, xi4v float64, err error) {
	if n < 1 {
		return 0, 0, &FieldError{Field: "design.profiles", Value: float64(n), Range: "1 to ∞"}
	}
	if len(f.XiN) == 0 || len(f.Xi3) != len(f.XiN) || len(f.Xi4) != len(f.XiN) {
		return 0, 0, &FieldError{Field: "design.xi", Value: float64(len(f.XiN)), Range: "a table with ξ3 and ξ4 for each n"}
	}
	i := 0
	for j, m := range f.XiN {
		if n >= m {
			i = j
		}
	}
	return f.Xi3[i], f.Xi4[i], nil
}

// Characteristic returns the characteristic resistance from resistances
// calculated at n = len(cal) ground test profiles with this table's ξ
// (EN 1997-1 eq. 7.8; see CharacteristicXi).
func (f *EN7Factors) Characteristic(cal []units.Force) (units.Force, error) {
	if len(cal) == 0 {
		return 0, &FieldError{Field: "design.profiles", Value: 0, Range: "1 to ∞", Note: "no calculated resistances given"}
	}
	x3, x4, err := f.Xi(len(cal))
	if err != nil {
		return 0, err
	}
	return CharacteristicXi(cal, x3, x4)
}

// Xi returns the correlation factors ξ3 and ξ4 of EN 1997-1 Table A.10 for
// n ground profiles. Between tabulated n the factor of the next smaller
// tabulated n is taken (the safe side); n above 10 takes n = 10.
func Xi(n int) (xi3v, xi4v float64, err error) {
	f := EN1997Recommended()
	return f.Xi(n)
}

// Characteristic returns the characteristic resistance from resistances
// calculated on n = len(cal) ground profiles with the ξ of EN 1997-1
// Table A.10 (eq. 7.8):
//
//	Rk = min(mean(Rcal)/ξ3, min(Rcal)/ξ4)
func Characteristic(cal []units.Force) (units.Force, error) {
	f := EN1997Recommended()
	return f.Characteristic(cal)
}

// CharacteristicXi returns the characteristic resistance from resistances
// calculated at several ground test profiles with given correlation
// factors (a national annex's), EN 1997-1 eq. 7.8:
//
//	Rk = min(mean(Rcal)/ξ3, min(Rcal)/ξ4),  ξ3, ξ4 ≥ 1
func CharacteristicXi(cal []units.Force, xi3, xi4 float64) (units.Force, error) {
	if len(cal) == 0 {
		return 0, &FieldError{Field: "design.profiles", Value: 0, Range: "1 to ∞", Note: "no calculated resistances given"}
	}
	for _, x := range []struct {
		n string
		v float64
	}{{"design.xi3", xi3}, {"design.xi4", xi4}} {
		if err := checkFactor(x.n, x.v); err != nil {
			return 0, err
		}
	}
	sum, lo := 0.0, math.Inf(1)
	for i, r := range cal {
		if !(r >= 0) || math.IsInf(float64(r), 0) {
			return 0, &FieldError{Field: fmt.Sprintf("design.profiles[%d]", i), Value: r.KN(), Unit: "kN", Range: "0 to ∞"}
		}
		sum += float64(r)
		lo = min(lo, float64(r))
	}
	mean := sum / float64(len(cal))
	return units.Force(min(mean/xi3, lo/xi4)), nil
}

// Eurocode7 is the EN 1997-1 partial factor basis for axially loaded piles
// whose resistance is calculated from ground test results (§7.6.2.3):
//
//	Rb,k = Rb,cal/(ξ·γRd),  Rs,k = Rs,cal/(ξ·γRd)
//	Rc,d = Rb,k/γb + Rs,k/γs,  Rt,d = Rs,t,k/γs,t + γG,fav·W′
//	Fd = γG·Gk + γQ·Qk
//
// The factors are Annex A's recommended values unless Factors gives others
// (a national annex, UKAnnex, or values edited field by field).
// ξ is max(ξ3, ξ4) for Profiles ground profiles (one calculated resistance
// is both the mean and the minimum), or max(Xi3, Xi4) where given.
// Profiles 0 without Xi3/Xi4 is the "alternative procedure" of
// §7.6.2.3(8): ξ = 1 and the model factor γRd alone. Installation chooses
// the table: A.6 driven, A.7 bored, A.8 CFA. The pile's weight in uplift
// is a favourable permanent action: γG,fav of the combination's set (1.0 in
// A1 and A2). Bond & Harris (2008, §13.4) write it as a reduction of the
// design tension action; adding it to the resistance, as here, gives the
// same verdict at the limit (Ed ≤ Rd). These are GEO verifications of the
// pile's pull-out (§7.6.3). Where the tension comes from buoyancy of the
// structure, EN 1997-1 also asks for the UPL limit state (§2.4.7.4, Annex
// A.5), with γG,stb = 0.9 on stabilising permanent actions, γG,dst = 1.0,
// γQ,dst = 1.5 and γs;t = 1.4 on tensile pile resistance (read in Tomlinson
// & Woodward 2008, Tables 6.1 and 6.2, p. 312); qult does not build a UPL
// case: check it separately.
type Eurocode7 struct {
	Approach Approach
	// Total divides the total resistance by γt instead of tip and shaft
	// by γb and γs (EN 1997-1 eq. 7.6 against 7.7; both are allowed).
	Total       bool
	Profiles    int     // number of ground test profiles n, 0 to use the model factor alone
	ModelFactor float64 // γRd; 0 takes Factors.ModelFactor (1.0 in Annex A)
	// Xi3 and Xi4, if given (both, at least 1), replace the table's values
	// for Profiles.
	Xi3, Xi4 float64
	// Factors are the partial and correlation factors; nil means
	// EN1997Recommended.
	Factors *EN7Factors
}

// ID returns "en1997".
func (Eurocode7) ID() string { return "en1997" }

// Refs returns EN 1997-1 Annex A and §7.6.2.3, or the national annex's
// sources.
func (e Eurocode7) Refs() []cite.Ref {
	refs := []cite.Ref{{Source: cite.EN1997, Where: "§2.4.7.3.4, §7.6.2.3, §7.6.3"}}
	f := e.factors()
	return append(refs, f.Refs...)
}

func (e Eurocode7) factors() EN7Factors {
	if e.Factors != nil {
		return *e.Factors
	}
	return EN1997Recommended()
}

// resolve checks the basis and returns its factors, γRd and ξ for a
// single calculated profile.
func (e Eurocode7) resolve(inst Installation) (EN7Factors, RSet, float64, error) {
	f := e.factors()
	if err := f.Validate("design.factors"); err != nil {
		return f, RSet{}, 0, err
	}
	if len(f.Approaches) > 0 && !slices.Contains(f.Approaches, e.Approach) {
		return f, RSet{}, 0, pathErrorf("design.approach", "%v: the %s factors are for %v only", e.Approach, f.Name, f.Approaches)
	}
	if e.Approach < DA1 || e.Approach > DA3 {
		return f, RSet{}, 0, pathErrorf("design.approach", "%v: want DA1, DA2 or DA3", e.Approach)
	}
	rs, _, err := f.set(inst)
	if err != nil {
		return f, RSet{}, 0, err
	}
	gRd := e.ModelFactor
	if gRd == 0 {
		gRd = f.ModelFactor
	}
	if err := checkFactor("design.model_factor", gRd); err != nil {
		return f, RSet{}, 0, err
	}
	if (e.Xi3 == 0) != (e.Xi4 == 0) {
		return f, RSet{}, 0, &FieldError{Field: "design.xi3", Value: e.Xi3, Range: "given together with design.xi4", Note: fmt.Sprintf("xi4 is %g", e.Xi4)}
	}
	return f, rs, gRd, nil
}

// xi returns ξ for one calculated profile (see Eurocode7).
func (e Eurocode7) xi(f *EN7Factors) (float64, error) {
	if e.Xi3 != 0 {
		for _, x := range []struct {
			n string
			v float64
		}{{"design.xi3", e.Xi3}, {"design.xi4", e.Xi4}} {
			if err := checkFactor(x.n, x.v); err != nil {
				return 0, err
			}
		}
		return max(e.Xi3, e.Xi4), nil
	}
	if e.Profiles == 0 {
		return 1, nil
	}
	x3, x4, err := f.Xi(e.Profiles)
	if err != nil {
		return 0, err
	}
	return max(x3, x4), nil
}

// combination is one EN 1997-1 combination of factor sets.
type combination struct {
	name       string
	r          int // 0 to 3 for R1 to R4
	a          ActionSet
	tanPhi, su float64
}

func (e Eurocode7) combinations(f *EN7Factors) []combination {
	switch e.Approach {
	case DA1:
		return []combination{{"DA1-1", 0, f.A1, 1, 1}, {"DA1-2", 3, f.A2, 1, 1}}
	case DA2:
		return []combination{{"DA2", 1, f.A1, 1, 1}}
	}
	// The load on a pile head is a structural action, so A1 applies
	// (§2.4.7.3.4.4, note on structural actions); M2 factors tanφ′ and su.
	return []combination{{"DA3", 2, f.A1, f.M2TanPhi, f.M2Su}}
}

// Cases returns DA1-1 and DA1-2 for DA1, and one case otherwise.
func (e Eurocode7) Cases(inst Installation) ([]Case, error) {
	f, rs, gRd, err := e.resolve(inst)
	if err != nil {
		return nil, err
	}
	xi, err := e.xi(&f)
	if err != nil {
		return nil, err
	}
	var out []Case
	for _, c := range e.combinations(&f) {
		k := xi * gRd
		gb, gs := rs.Base[c.r], rs.Shaft[c.r]
		if e.Total {
			gb, gs = rs.Total[c.r], rs.Total[c.r]
		}
		out = append(out, Case{Name: c.name,
			Tip:       map[string]float64{"": 1 / (k * gb)},
			Shaft:     map[string]float64{"": 1 / (k * gs)},
			Tension:   map[string]float64{"": 1 / (k * rs.Tension[c.r])},
			Permanent: c.a.G, Variable: c.a.Q, Weight: c.a.GFav, TanPhi: c.tanPhi, Su: c.su})
	}
	return out, nil
}

// ProfileResistance is the resistance of the pile calculated at one ground
// test profile (a CPT or borehole), characteristic soil values, no factors.
type ProfileResistance struct {
	Base, Shaft units.Force // Rb,cal and Rs,cal in compression
	Tension     units.Force // Rs,t,cal: the shaft in tension
}

// VerifyProfiles checks loads l against the resistance calculated at
// n = len(cal) ground test profiles (EN 1997-1 §7.6.2.3(3)–(7) and
// §7.6.3.2), weight being the pile's effective weight W′:
//
//	Rc,k = min(mean(Rc,cal)/ξ3, min(Rc,cal)/ξ4)/γRd,  Rc,cal = Rb,cal + Rs,cal
//
// with Rb,k and Rs,k taken from the same governing term (the means, or the
// profile of the least Rc,cal), and Rs,t,k likewise from Rs,t,cal. ξ3, ξ4
// are Xi3, Xi4 where given, else the table's for n. DA3 factors soil
// strength, which given resistances cannot show: it is refused.
func (e Eurocode7) VerifyProfiles(inst Installation, cal []ProfileResistance, weight units.Force, l Loads) (Design, error) {
	f, rs, gRd, err := e.resolve(inst)
	if err != nil {
		return Design{}, err
	}
	if e.Approach == DA3 {
		return Design{}, pathErrorf("design.approach", "DA3 factors the soil strength (set M2); compute each profile with it, or use DA1 or DA2")
	}
	if err := l.Validate("loads"); err != nil {
		return Design{}, err
	}
	n := len(cal)
	if n == 0 {
		return Design{}, &FieldError{Field: "design.profiles", Value: 0, Range: "1 to ∞", Note: "no calculated resistances given"}
	}
	if e.Profiles != 0 && e.Profiles != n {
		return Design{}, &FieldError{Field: "design.profiles", Value: float64(e.Profiles), Range: fmt.Sprintf("%d (the number of resistances given) or 0", n)}
	}
	if !(weight >= 0) || math.IsInf(float64(weight), 0) {
		return Design{}, &FieldError{Field: "pile.weight", Value: weight.KN(), Unit: "kN", Range: "0 to ∞"}
	}
	x3, x4 := e.Xi3, e.Xi4
	if x3 == 0 {
		if x3, x4, err = f.Xi(n); err != nil {
			return Design{}, err
		}
	}
	var mb, ms, mt float64
	lo, loT := 0, 0
	for i, p := range cal {
		for _, v := range []struct {
			n string
			f units.Force
		}{{"base", p.Base}, {"shaft", p.Shaft}, {"tension", p.Tension}} {
			if !(v.f >= 0) || math.IsInf(float64(v.f), 0) {
				return Design{}, &FieldError{Field: fmt.Sprintf("design.profiles[%d].%s", i, v.n), Value: v.f.KN(), Unit: "kN", Range: "0 to ∞"}
			}
		}
		mb += float64(p.Base) / float64(n)
		ms += float64(p.Shaft) / float64(n)
		mt += float64(p.Tension) / float64(n)
		if p.Base+p.Shaft < cal[lo].Base+cal[lo].Shaft {
			lo = i
		}
		if p.Tension < cal[loT].Tension {
			loT = i
		}
	}
	if err := checkFactor("design.xi3", x3); err != nil {
		return Design{}, err
	}
	if err := checkFactor("design.xi4", x4); err != nil {
		return Design{}, err
	}
	rb, rsh := mb/x3, ms/x3
	if m := float64(cal[lo].Base+cal[lo].Shaft) / x4; m < rb+rsh {
		rb, rsh = float64(cal[lo].Base)/x4, float64(cal[lo].Shaft)/x4
	}
	rt := min(mt/x3, float64(cal[loT].Tension)/x4)
	rb, rsh, rt = rb/gRd, rsh/gRd, rt/gRd
	d := Design{Basis: e.ID(), Pass: true, Characteristic: Capacity{Tip: units.Force(rb), Shaft: units.Force(rsh),
		Compression: units.Force(rb + rsh), TensionShaft: units.Force(rt), Weight: weight, Tension: units.Force(rt) + weight}}
	d.Characteristic.DesignCompression, d.Characteristic.DesignTension = d.Characteristic.Compression, d.Characteristic.Tension
	worst := -1.0
	for i, c := range e.combinations(&f) {
		gb, gs := rs.Base[c.r], rs.Shaft[c.r]
		if e.Total {
			gb, gs = rs.Total[c.r], rs.Total[c.r]
		}
		cs := Case{Name: c.name, Permanent: c.a.G, Variable: c.a.Q, Weight: c.a.GFav, TanPhi: 1, Su: 1}
		cp := Capacity{DesignCompression: units.Force(rb/gb + rsh/gs),
			DesignTension: units.Force(rt/rs.Tension[c.r]) + units.Force(c.a.GFav)*weight}
		v := Verify(cp, cs, l)
		d.Cases = append(d.Cases, v)
		if u := max(v.CompressionUse, v.TensionUse); u > worst {
			worst, d.Governing = u, i
		}
		d.Pass = d.Pass && v.Pass
	}
	return d, nil
}
