package pile

import (
	"fmt"
	"maps"
	"math"
	"slices"
	"strings"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
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
			return &FieldError{Field: path + "." + f.name, Value: f.v.KN(), Unit: "kN", Range: "0 to ∞"}
		}
	}
	return nil
}

// FieldError is a design input outside its accepted range: the field path
// (as in a calc file), the value and the range.
type FieldError struct {
	Field string  // such as `design.tip["nc9"]`
	Value float64 // the value given, in Unit
	Unit  string  // "" for a ratio
	Range string  // the accepted range, such as "(0, 1]"
	Note  string  // an optional explanation
}

func (e *FieldError) Error() string {
	s := fmt.Sprintf("%s: %g", e.Field, e.Value)
	if e.Unit != "" {
		s += " " + e.Unit
	}
	s += " is outside " + e.Range
	if e.Note != "" {
		s += " (" + e.Note + ")"
	}
	return s
}

// Resistance names the part of a pile's resistance a factor multiplies.
type Resistance uint8

// The parts of the resistance.
const (
	TipResistance     Resistance = iota + 1 // tip (base) in compression
	ShaftResistance                         // shaft in compression
	TensionResistance                       // shaft in tension (uplift)
)

var resistanceIDs = [...]string{TipResistance: "tip", ShaftResistance: "shaft", TensionResistance: "tension"}

// String returns "tip", "shaft" or "tension".
func (r Resistance) String() string {
	if r > 0 && int(r) < len(resistanceIDs) {
		return resistanceIDs[r]
	}
	return fmt.Sprintf("Resistance(%d)", int(r))
}

// key returns the calc-file map that holds factors of this kind.
func (r Resistance) key() string {
	if r == TensionResistance {
		return "design.uplift"
	}
	return "design." + r.String()
}

// FactorRow is one row of a published resistance factor table: the factor
// on one part of the resistance when it is computed by one method,
// optionally only with a given shaft method (for a tip method calibrated
// together with a shaft method) and only in one drainage class.
type FactorRow struct {
	Kind   Resistance
	Method string           // method identifier ("lambda" for the λ method)
	With   string           // tip rows: the shaft method of the bearing layer it was calibrated with; "" for any
	Class  profile.Drainage // DrainageUnset for either class
	Value  float64          // the multiplier, (0, 1]
	Where  string           // the table and its row, for the report
}

// matches reports whether row r applies to a method of kind k in a layer
// of class cls whose shaft method is with.
func (r FactorRow) matches(k Resistance, method, with string, cls profile.Drainage) bool {
	return r.Kind == k && r.Method == method && (r.With == "" || r.With == with) &&
		(r.Class == profile.DrainageUnset || r.Class == cls)
}

// Case is one verification a design basis asks for: multipliers on the
// characteristic resistances, partial factors on the actions, and the
// factors on soil strength the resistance is computed with.
//
//	Rd = f_tip·Rb + Σ f_shaft,i·Rs,i                 (compression)
//	Rd = Σ f_tension,i·Rs,t,i + Weight·W′            (tension)
//	Ed = Permanent·G + Variable·Q
//
// A layer's multiplier is found in this order: the map entry for its
// method's identifier; else the most specific matching row of Rows (a row
// naming the paired shaft method before one that does not, a row limited
// to the layer's drainage class before one that is not); else the map
// entry "" (a default for any method); else there is none, and an
// analysis that needs it returns a *MissingFactorError.
type Case struct {
	Name string // such as "DA1-1" or "FS"

	// Resistance multipliers (1/γ for partial and global factors, φ for
	// LRFD) given by method identifier; the entry "" is the default.
	Tip     map[string]float64
	Shaft   map[string]float64
	Tension map[string]float64
	// Rows are a published table's factors (see FactorRow).
	Rows []FactorRow

	// Partial factors on the characteristic actions.
	Permanent, Variable float64

	// Weight multiplies the pile's effective weight W′ where it adds to the
	// design resistance in tension: the basis's factor on a favourable
	// permanent action (AASHTO γp,min for DC 0.90; EN 1997-1 γG,fav 1.0),
	// 1/F with a factor of safety. 0 leaves the weight out.
	Weight float64

	// Soil factors: tanφ′ and su are divided by these before the
	// resistance is computed (EN 1997-1 set M2); 1 means unfactored.
	TanPhi, Su float64
}

// lookup returns the multiplier of case c on resistance k by method, for a
// layer of class cls whose shaft method is with (see Case).
func (c *Case) lookup(k Resistance, method, with string, cls profile.Drainage) (float64, bool) {
	m := c.Tip
	switch k {
	case ShaftResistance:
		m = c.Shaft
	case TensionResistance:
		m = c.Tension
	}
	if v, ok := m[method]; ok {
		return v, true
	}
	best, score := 0.0, -1
	for _, r := range c.Rows {
		if !r.matches(k, method, with, cls) {
			continue
		}
		s := 0
		if r.With != "" {
			s += 2
		}
		if r.Class != profile.DrainageUnset {
			s++
		}
		if s > score {
			best, score = r.Value, s
		}
	}
	if score >= 0 {
		return best, true
	}
	v, ok := m[""]
	return v, ok
}

// shaftID returns the identifier under which a layer's shaft method finds
// its factor: "lambda" for the λ method.
func (lp *layerPlan) shaftID() string {
	if lp.lambda || lp.shaft == nil {
		return lambdaID
	}
	return lp.shaft.ID()
}

// baseID returns the identifier of the method inside a capped shaft
// method ("beta-api" for "beta-api+limit-api"), or id itself.
func baseID(id string) string {
	if i := strings.IndexByte(id, '+'); i > 0 {
		return id[:i]
	}
	return id
}

// resolveFactors sets every layer's design multipliers from the analysis'
// design case (see Case for the order of look-up). A layer left with 0
// has no factor: using it is an error (see MissingFactorError).
func (a *Analysis) resolveFactors() {
	if !a.useCase {
		return
	}
	for i := range a.plans {
		lp := &a.plans[i]
		cls := lp.layer.Drainage
		sid := lp.shaftID()
		get := func(k Resistance, id, with string) float64 {
			if v, ok := a.cs.lookup(k, id, with, cls); ok {
				return v
			}
			if b := baseID(id); b != id {
				v, _ := a.cs.lookup(k, b, with, cls)
				return v
			}
			return 0
		}
		if lp.tip != nil {
			lp.fTip = get(TipResistance, lp.tip.ID(), baseID(sid))
		}
		lp.fShaft = get(ShaftResistance, sid, "")
		lp.fTension = get(TensionResistance, sid, "")
	}
}

// MissingFactorError says that a design case has no resistance factor for
// a method an analysis uses: the calc file must give one under Key().
type MissingFactorError struct {
	Case      string     // the design case, such as "aashto-driven"
	Kind      Resistance // tip, shaft or tension
	Method    string     // the method's identifier
	With      string     // for a tip: the shaft method of the bearing layer
	Class     profile.Drainage
	Layer     int // layer index
	LayerName string
}

// Key returns the calc-file key under which the factor can be given, such
// as "design.tip.meyerhof" or "design.uplift.beta".
func (e *MissingFactorError) Key() string { return e.Kind.key() + "." + e.Method }

func (e *MissingFactorError) Error() string {
	with := ""
	if e.Kind == TipResistance && e.With != "" {
		with = fmt.Sprintf(" (with shaft method %q)", e.With)
	}
	return fmt.Sprintf("layers[%d] (%s): design case %s has no resistance factor for %s method %q in a %s layer%s; give one as %s",
		e.Layer, e.LayerName, e.Case, e.Kind, e.Method, e.Class, with, e.Key())
}

// missingFactor returns the error for layer i, whose factor of kind k is
// missing (for the shaft: whichever of compression and tension is 0).
func (a *Analysis) missingFactor(i int, k Resistance) error {
	lp := &a.plans[i]
	e := &MissingFactorError{Case: a.cs.Name, Kind: k, Class: lp.layer.Drainage, Layer: i, LayerName: lp.layer.Name}
	if k == TipResistance {
		e.Method, e.With = lp.tip.ID(), lp.shaftID()
		return e
	}
	if lp.fShaft != 0 {
		e.Kind = TensionResistance
	}
	e.Method = lp.shaftID()
	return e
}

// upliftWeight returns the multiplier on W′ in the design tension
// resistance: 1 for characteristic values, the case's Weight otherwise.
func (a *Analysis) upliftWeight() float64 {
	if !a.useCase {
		return 1
	}
	return a.cs.Weight
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
//	Rd = Rb/Ftip + Rs/Fshaft,  Ed = G + Q (unfactored)
//	Rt,d = Rs,t/Ft + W′/Ft     (WeightUnfactored: + W′)
//
// Set Global, or both Tip and Shaft. Tension divides the tension
// resistance; 0 means Global, or Shaft when Global is 0.
//
// The pile's weight W′ is divided by the tension factor by default. Practice
// often counts it unfactored or leaves it out; leaving it out is the
// conservative habit Bond & Harris (2008, §13.4, tension piles) note, and
// dividing by the factor is our default between the two. WeightUnfactored
// counts W′ at its full value (a choice the output should show).
//
// In a calc file these are the keys of design (basis: safety-factor):
// Global is factor, Tip is tip_factor, Shaft is shaft_factor, Tension is
// tension_safety_factor and WeightUnfactored is weight_unfactored.
type SafetyFactor struct {
	Global           float64 // the global factor of safety (calc file: factor)
	Tip              float64 // the factor on the tip (tip_factor)
	Shaft            float64 // the factor on the shaft (shaft_factor)
	Tension          float64 // the factor in tension (tension_safety_factor)
	WeightUnfactored bool    // count W′ unfactored in uplift (weight_unfactored)
}

// ID returns "safety-factor".
func (SafetyFactor) ID() string { return "safety-factor" }

// Refs: the global factor of safety is common practice; 2.5 to 3 is usual
// for static analyses without load tests (Das 2019, §12.11; Tomlinson &
// Woodward 2008, §4.1).
func (SafetyFactor) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Das2019, Where: "factor of safety on static capacity"},
		{Source: cite.BondHarris2008, Where: "§13.4, pile self-weight in tension"}}
}

func checkFactor(field string, v float64) error {
	if !(v >= 1) || math.IsInf(v, 0) {
		return &FieldError{Field: field, Value: v, Range: "1 to ∞"}
	}
	return nil
}

// Cases returns the single verification "FS".
func (s SafetyFactor) Cases(Installation) ([]Case, error) {
	tip, sh, ten := s.Tip, s.Shaft, s.Tension
	tipName, shaftName, tenName := "design.tip_factor", "design.shaft_factor", "design.tension_safety_factor"
	if s.Global != 0 {
		if tip != 0 || sh != 0 {
			return nil, &FieldError{Field: "design.factor", Value: s.Global, Range: "0 when tip and shaft factors are given",
				Note: "give either a global factor or factors on tip and shaft, not both"}
		}
		tip, sh = s.Global, s.Global
		tipName, shaftName = "design.factor", "design.factor"
	}
	if ten == 0 {
		ten, tenName = sh, shaftName
	}
	for _, f := range []struct {
		n string
		v float64
	}{{tipName, tip}, {shaftName, sh}, {tenName, ten}} {
		if err := checkFactor(f.n, f.v); err != nil {
			return nil, err
		}
	}
	w := 1 / ten
	if s.WeightUnfactored {
		w = 1
	}
	return []Case{{
		Name: "FS", Tip: map[string]float64{"": 1 / tip}, Shaft: map[string]float64{"": 1 / sh},
		Tension: map[string]float64{"": 1 / ten}, Permanent: 1, Variable: 1, Weight: w, TanPhi: 1, Su: 1,
	}}, nil
}

// PresetMethods are the methods, by identifier and drainage class, that a
// preset's factors were calibrated for; "" where the preset names none
// that qult implements. A calc file that does not choose a method can take
// these, so that the preset works with its own methods (see Fill).
type PresetMethods struct {
	TipDrained, TipUndrained     string
	ShaftDrained, ShaftUndrained string
}

// presetMethod returns the method value of a preset's identifier.
func presetTip(id string) (bearing.Tip, bool) {
	switch id {
	case "nc9":
		return bearing.Skempton{}, true
	case "drilled-n60-sand":
		return bearing.ShaftSand{}, true
	}
	return nil, false
}

func presetShaft(id string) (shaft.Unit, bool) {
	switch id {
	case "alpha-api":
		return shaft.AlphaAPI{}, true
	case "alpha-drilled":
		return shaft.AlphaDrilled{}, true
	case "beta-drilled-sand":
		return shaft.DrilledSand{}, true
	case "beta-drilled-k0":
		return shaft.DrilledSandK0{}, true
	}
	return nil, false
}

// Fill returns m with every method m leaves at its default replaced by
// the preset's method for that drainage class, where the preset names one.
// Methods m gives are kept (the preset's factors then decide whether they
// are covered).
func (p PresetMethods) Fill(m Methods) (Methods, error) {
	for _, f := range []struct {
		id  string
		tip *bearing.Tip
		sh  *shaft.Unit
		lam bool
	}{
		{p.TipDrained, &m.TipDrained, nil, false}, {p.TipUndrained, &m.TipUndrained, nil, false},
		{p.ShaftDrained, nil, &m.ShaftDrained, false}, {p.ShaftUndrained, nil, &m.ShaftUndrained, true},
	} {
		switch {
		case f.id == "":
		case f.tip != nil:
			if *f.tip != nil {
				continue
			}
			t, ok := presetTip(f.id)
			if !ok {
				return m, pathErrorf("design.preset", "tip method %q has no implementation", f.id)
			}
			*f.tip = t
		default:
			if *f.sh != nil || (f.lam && m.UndrainedLambda) {
				continue
			}
			if f.lam && f.id == lambdaID {
				m.UndrainedLambda = true
				continue
			}
			s, ok := presetShaft(f.id)
			if !ok {
				return m, pathErrorf("design.preset", "shaft method %q has no implementation", f.id)
			}
			*f.sh = s
		}
	}
	return m, nil
}

// LRFD is a load and resistance factor basis:
//
//	Rd = φtip·Rb + Σ φshaft,i·Rs,i,   Rt,d = Σ φup,i·Rs,t,i + γW·W′
//	Ed = γG·G + γQ·Q
//
// Resistance factors come from a published table (Rows, see FactorRow) and
// from the maps Tip, Shaft and Tension keyed by method identifier ("" is a
// default for any method not covered); a map entry for a method overrides
// the table. Every method the check uses must have a factor: a method
// without one is a *MissingFactorError naming the calc-file key to add.
type LRFD struct {
	Name      string             // identifier; "lrfd" when empty
	Tip       map[string]float64 // φ on tip resistance, by tip method
	Shaft     map[string]float64 // φ on shaft resistance, by shaft method
	Tension   map[string]float64 // φ on uplift (shaft) resistance, by shaft method
	Rows      []FactorRow        // the published table
	Permanent float64            // γ on permanent loads, such as 1.25 (DC)
	Variable  float64            // γ on variable loads, such as 1.75 (LL)
	// Weight is the factor on the pile's weight W′ in design uplift
	// resistance, a favourable permanent action (AASHTO DC minimum 0.90),
	// 0 to 1; 0 leaves the weight out.
	Weight float64
	// Installations the table was calibrated for; empty means any.
	Installations []Installation
	// Calibrated are the methods the table names, by drainage class.
	Calibrated PresetMethods
	Sources    []cite.Ref
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

// knownTips and knownShafts are the method identifiers a factor map may
// name: those of the catalogues of packages bearing and shaft, and the
// direct CPT methods of package insitu (a shaft method capped by a limit,
// "beta-api+limit-given", is found under its method, the part before
// "+"). "none" gives no resistance and takes no factor.
var (
	knownTips   = append(bearing.IDs(), insitu.DirectIDs(insitu.TipPart)...)
	knownShafts = append(shaft.ResistanceIDs(), insitu.DirectIDs(insitu.ShaftPart)...)
)

// checkFactorMap checks a map of resistance factors: every key a known
// method identifier (or "" for the default), every value in (0, 1].
func checkFactorMap(path string, m map[string]float64, known []string) error {
	for _, k := range slices.Sorted(maps.Keys(m)) { // sorted: the first bad key is the same on every run
		if k != "" && !slices.Contains(known, baseID(k)) {
			return &FieldError{Field: fmt.Sprintf("%s[%q]", path, k), Value: m[k], Range: "the keys of known methods",
				Note: fmt.Sprintf("%q is not a method identifier; known: %s", k, strings.Join(known, ", "))}
		}
		if v := m[k]; !(v > 0 && v <= 1) {
			return &FieldError{Field: fmt.Sprintf("%s[%q]", path, k), Value: v, Range: "(0, 1]"}
		}
	}
	return nil
}

// Overridden returns the rows of the table that a map entry replaces (a
// value given for a method the table already covers), so that the output
// can say which published factors were set aside.
func (l LRFD) Overridden() []FactorRow {
	var out []FactorRow
	for _, r := range l.Rows {
		m := l.Tip
		switch r.Kind {
		case ShaftResistance:
			m = l.Shaft
		case TensionResistance:
			m = l.Tension
		}
		if v, ok := m[r.Method]; ok && v != r.Value {
			out = append(out, r)
		}
	}
	return out
}

// Cases returns the single verification.
func (l LRFD) Cases(inst Installation) ([]Case, error) {
	if len(l.Installations) > 0 && !slices.Contains(l.Installations, inst) {
		var ids []string
		for _, i := range l.Installations {
			ids = append(ids, i.String())
		}
		return nil, pathErrorf("pile.installation", "%s: the %s factors were calibrated for %s piles only; want one of those, or another basis",
			inst, l.ID(), strings.Join(ids, ", "))
	}
	for _, m := range []struct {
		n     string
		m     map[string]float64
		known []string
	}{{"design.tip", l.Tip, knownTips}, {"design.shaft", l.Shaft, knownShafts}, {"design.uplift", l.Tension, knownShafts}} {
		if err := checkFactorMap(m.n, m.m, m.known); err != nil {
			return nil, err
		}
	}
	for i, r := range l.Rows {
		if !(r.Value > 0 && r.Value <= 1) || r.Kind < TipResistance || r.Kind > TensionResistance {
			return nil, &FieldError{Field: fmt.Sprintf("design.rows[%d]", i), Value: r.Value, Range: "(0, 1]",
				Note: fmt.Sprintf("%s factor for %q", r.Kind, r.Method)}
		}
	}
	if !(l.Permanent >= 1) || math.IsInf(l.Permanent, 0) {
		return nil, &FieldError{Field: "design.permanent", Value: l.Permanent, Range: "1 to ∞", Note: "load factor"}
	}
	if !(l.Variable >= 1) || math.IsInf(l.Variable, 0) {
		return nil, &FieldError{Field: "design.variable", Value: l.Variable, Range: "1 to ∞", Note: "load factor"}
	}
	if !(l.Weight >= 0 && l.Weight <= 1) {
		return nil, &FieldError{Field: "design.weight", Value: l.Weight, Range: "0 to 1", Note: "factor on the pile's weight in uplift"}
	}
	return []Case{{Name: l.ID(), Tip: l.Tip, Shaft: l.Shaft, Tension: l.Tension, Rows: l.Rows,
		Permanent: l.Permanent, Variable: l.Variable, Weight: l.Weight, TanPhi: 1, Su: 1}}, nil
}

// aashtoDCMin is the minimum load factor on DC (dead load of structural
// components) of AASHTO LRFD Table 3.4.1-2 (from memory), applied to the
// pile's weight where it resists uplift.
const aashtoDCMin = 0.90

// rows adds a row per method of ids.
func rows(dst []FactorRow, k Resistance, ids []string, with string, cls profile.Drainage, v float64, where string) []FactorRow {
	for _, id := range ids {
		dst = append(dst, FactorRow{Kind: k, Method: id, With: with, Class: cls, Value: v, Where: where})
	}
	return dst
}

// AASHTODrivenPiles returns the resistance factors for the nominal
// resistance of single driven piles from static analysis of AASHTO LRFD
// Bridge Design Specifications Table 10.5.5.2.3-1, as reproduced in FHWA
// GEC 12 (Hannigan et al. 2016, ch. 7). The values are from memory: the
// table could not be read here; check them against the table before use.
//
// Skin friction and end bearing in clay and mixed soils, each shaft method
// paired with Skempton's (1951) end bearing (our "nc9"), the tip taking
// the factor of the shaft method of its bearing layer:
//
//	α-method (Tomlinson 1987; Skempton 1951)          0.35   uplift 0.25
//	β-method (Esrig & Kirby 1979; Skempton 1951)      0.25   uplift 0.20
//	λ-method (Vijayvergiya & Focht 1972; Skempton)    0.40   uplift 0.30
//
// The table's α-method is the total-stress α of driven piles; we take
// qult's α rules for driven piles (alpha-api, alpha-chart, alpha-given)
// as that method, not the drilled-shaft α. Its β-method is an effective
// stress β for clay: it covers beta-burland, beta-given and beta (K and δ
// given) in undrained layers only; the table has no β for sand. Its sand
// methods (Nordlund/Thurman 0.45, SPT 0.30, CPT 0.50; uplift 0.35, 0.25,
// 0.40) have no implementation in qult, so a drained layer needs a factor
// given for its methods (a *MissingFactorError names the key).
//
// Strength I load factors (AASHTO Tables 3.4.1-1 and 3.4.1-2): permanent
// (DC) 1.25, variable (LL) 1.75; the pile's weight in uplift takes the DC
// minimum 0.90. The preset covers driven installations only.
func AASHTODrivenPiles() LRFD {
	const where = "AASHTO Table 10.5.5.2.3-1, "
	alpha := []string{"alpha-api", "alpha-chart", "alpha-given"}
	beta := []string{"beta-burland", "beta-given", "beta"}
	u := profile.Undrained
	var r []FactorRow
	r = rows(r, ShaftResistance, alpha, "", u, 0.35, where+"α-method (Tomlinson 1987; Skempton 1951)")
	r = rows(r, ShaftResistance, beta, "", u, 0.25, where+"β-method (Esrig & Kirby 1979; Skempton 1951)")
	r = rows(r, ShaftResistance, []string{lambdaID}, "", u, 0.40, where+"λ-method (Vijayvergiya & Focht 1972; Skempton 1951)")
	for _, a := range alpha {
		r = rows(r, TipResistance, []string{"nc9"}, a, u, 0.35, where+"α-method (Tomlinson 1987; Skempton 1951)")
	}
	for _, b := range beta {
		r = rows(r, TipResistance, []string{"nc9"}, b, u, 0.25, where+"β-method (Esrig & Kirby 1979; Skempton 1951)")
	}
	r = rows(r, TipResistance, []string{"nc9"}, lambdaID, u, 0.40, where+"λ-method (Vijayvergiya & Focht 1972; Skempton 1951)")
	r = rows(r, TensionResistance, alpha, "", u, 0.25, where+"uplift, α-method")
	r = rows(r, TensionResistance, beta, "", u, 0.20, where+"uplift, β-method")
	r = rows(r, TensionResistance, []string{lambdaID}, "", u, 0.30, where+"uplift, λ-method")
	return LRFD{Name: "aashto-driven", Tip: map[string]float64{}, Shaft: map[string]float64{}, Tension: map[string]float64{},
		Rows: r, Permanent: 1.25, Variable: 1.75, Weight: aashtoDCMin,
		Installations: []Installation{DrivenHigh, DrivenLow, Jetted},
		Calibrated:    PresetMethods{TipUndrained: "nc9", ShaftUndrained: "alpha-api"},
		Sources: []cite.Ref{{Source: cite.AASHTO2020, Where: "Table 10.5.5.2.3-1; Tables 3.4.1-1, 3.4.1-2 (from memory)"},
			{Source: cite.Hannigan2016, Where: "ch. 7, resistance factors for static analysis"}}}
}

// AASHTODrilledShafts returns the resistance factors for the nominal
// axial resistance of single drilled shafts of AASHTO LRFD Bridge Design
// Specifications Table 10.5.5.2.4-1, as applied in FHWA GEC 10 (Brown et
// al. 2018, Appendix A, Pier 2: side in sand 0.55, side in clay 0.45, tip
// in sand 0.50, read through the factored resistances of its Table A-4);
// the other values are from memory:
//
//	side, clay: α-method (O'Neill & Reese 1999)        0.45   uplift 0.35
//	tip, clay: total stress (O'Neill & Reese 1999)     0.40
//	side, sand: β-method (O'Neill & Reese 1999)        0.55   uplift 0.45
//	tip, sand: O'Neill & Reese (1999)                  0.50
//
// Methods covered: alpha-drilled in undrained layers, beta-drilled-sand and
// beta-drilled-k0 in drained layers, nc9 (Nc = 9, O'Neill & Reese's Nc for
// a base deeper than 2.5 diameters) and drilled-n60-sand. A given α or β
// (the 2018 α, or K0 computed by hand) is the engineer's to declare: give
// its factor under design.shaft and design.uplift. Rock and IGM rows have
// no method in qult. Strength I load factors 1.25 and 1.75; the shaft's
// weight in uplift takes the DC minimum 0.90. Bored piles only.
func AASHTODrilledShafts() LRFD {
	const where = "AASHTO Table 10.5.5.2.4-1, "
	d, u := profile.Drained, profile.Undrained
	sand := []string{"beta-drilled-sand", "beta-drilled-k0"}
	var r []FactorRow
	r = rows(r, ShaftResistance, []string{"alpha-drilled"}, "", u, 0.45, where+"side resistance in clay, α-method")
	r = rows(r, TipResistance, []string{"nc9"}, "", u, 0.40, where+"tip resistance in clay, total stress")
	r = rows(r, ShaftResistance, sand, "", d, 0.55, where+"side resistance in sand, β-method")
	r = rows(r, TipResistance, []string{"drilled-n60-sand"}, "", d, 0.50, where+"tip resistance in sand")
	r = rows(r, TensionResistance, []string{"alpha-drilled"}, "", u, 0.35, where+"uplift in clay, α-method")
	r = rows(r, TensionResistance, sand, "", d, 0.45, where+"uplift in sand, β-method")
	return LRFD{Name: "aashto-drilled", Tip: map[string]float64{}, Shaft: map[string]float64{}, Tension: map[string]float64{},
		Rows: r, Permanent: 1.25, Variable: 1.75, Weight: aashtoDCMin,
		Installations: []Installation{Bored},
		Calibrated: PresetMethods{TipDrained: "drilled-n60-sand", TipUndrained: "nc9",
			ShaftDrained: "beta-drilled-sand", ShaftUndrained: "alpha-drilled"},
		Sources: []cite.Ref{{Source: cite.AASHTO2020, Where: "Table 10.5.5.2.4-1; Tables 3.4.1-1, 3.4.1-2 (from memory)"},
			{Source: cite.Brown2018, Where: "Appendix A, Pier 2, resistance factors applied (Table A-4)"}}}
}

// factor returns m[id], or m[""] when id has no entry, or 0 when neither:
// a first pass over the maps alone, before resolveFactors applies the
// case's rows.
func factor(m map[string]float64, id string) float64 {
	if v, ok := m[id]; ok {
		return v
	}
	return m[""]
}
