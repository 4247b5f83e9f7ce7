package phase

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"github.com/qultgeo/qult/units"
)

// Unit weight of water and the defaults of Solve.
const (
	// WaterUnitWeight is γw for SI work, 9.81 kN/m³ (ρw = 1000 kg/m³ times
	// g = 9.81 m/s², common practice).
	WaterUnitWeight units.UnitWeight = 9.81 * units.KilonewtonPerCubicMetre
	// WaterUnitWeightUS is γw for US customary work, 62.4 pcf (common
	// practice; Das & Sobhan 2014 use it throughout).
	WaterUnitWeightUS units.UnitWeight = 62.4 * units.PCF
	// DefaultTolerance is the relative tolerance to which over-determined
	// given values must agree: 0.5 %.
	DefaultTolerance = 0.005
	// MinGs and MaxGs bound the specific gravity of soil solids accepted as
	// physically plausible (common practice; see the package doc).
	MinGs = 1.3
	MaxGs = 3.5
)

// Quantity names one quantity of the three-phase state.
type Quantity uint8

// The quantities of a State, in the order used in messages.
const (
	Gs       Quantity = iota // specific gravity of solids
	E                        // void ratio e
	N                        // porosity n
	W                        // water content w
	S                        // degree of saturation S
	Gamma                    // moist (bulk) unit weight γ
	GammaD                   // dry unit weight γd
	GammaSat                 // saturated unit weight γsat
	GammaSub                 // submerged (buoyant) unit weight γ′
	Dr                       // relative density Dr
	nQuantities
)

var quantityNames = [nQuantities]string{"Gs", "e", "n", "w", "S", "γ", "γd", "γsat", "γ′", "Dr"}

// String returns the symbol of q, such as "γsat".
func (q Quantity) String() string {
	if q < nQuantities {
		return quantityNames[q]
	}
	return fmt.Sprintf("Quantity(%d)", uint8(q))
}

func (q Quantity) isWeight() bool { return q >= Gamma && q <= GammaSub }

// Set is a set of quantities, one bit per Quantity.
type Set uint16

// Of returns the set holding qs.
func Of(qs ...Quantity) Set {
	var s Set
	for _, q := range qs {
		s |= 1 << q
	}
	return s
}

// Has reports whether q is in s.
func (s Set) Has(q Quantity) bool { return s&(1<<q) != 0 }

// String lists the quantities of s, such as "{w, S}".
func (s Set) String() string {
	var parts []string
	for q := range nQuantities {
		if s.Has(q) {
			parts = append(parts, q.String())
		}
	}
	return "{" + strings.Join(parts, ", ") + "}"
}

// Input is what is known about one soil element. A zero field is not given,
// unless its bit is set in Zero. Ratios are fractions (w = 0.18 for 18 %).
type Input struct {
	Gs       float64          // specific gravity of solids, [MinGs, MaxGs]
	E        float64          // void ratio, > 0
	N        float64          // porosity, (0, 1)
	W        float64          // water content, ≥ 0
	S        float64          // degree of saturation, [0, 1]
	Gamma    units.UnitWeight // moist (bulk) unit weight γ, > 0
	GammaD   units.UnitWeight // dry unit weight γd, > 0
	GammaSat units.UnitWeight // saturated unit weight γsat, > γw
	GammaSub units.UnitWeight // submerged unit weight γ′ = γsat − γw, > 0
	EMax     float64          // maximum void ratio, for Dr; > EMin
	EMin     float64          // minimum void ratio, for Dr; > 0
	Dr       float64          // relative density, [0, 1]; needs EMax and EMin

	// GammaW is the unit weight of water; zero means WaterUnitWeight.
	GammaW units.UnitWeight
	// Zero marks quantities given as exactly zero (S, W or Dr).
	Zero Set
	// Tol is the relative tolerance for over-determined values; zero means
	// DefaultTolerance. It must lie in [0, 0.2].
	Tol float64
}

// State is a fully solved soil element.
type State struct {
	Gs       float64
	E        float64
	N        float64
	W        float64
	S        float64
	Gamma    units.UnitWeight
	GammaD   units.UnitWeight
	GammaSat units.UnitWeight
	GammaSub units.UnitWeight
	// Dr is the relative density; meaningful only when HasDr is true (EMax
	// and EMin were given).
	Dr    float64
	HasDr bool
	// GammaW is the unit weight of water the state was solved with.
	GammaW units.UnitWeight
}

// InsufficientError reports a set of given values too small to fix the
// state.
type InsufficientError struct {
	Unknown Set // quantities still unknown
	// Closers are the quantities any one of which, given as well, would fix
	// the state. When empty, at least two more values are needed, and Pair
	// names one pair that would do.
	Closers Set
	Pair    Set
}

func (e *InsufficientError) Error() string {
	msg := "phase: not enough values to fix the state: " + e.Unknown.String() + " unknown"
	if e.Closers != 0 {
		return msg + "; give one more of " + e.Closers.String()
	}
	if e.Pair != 0 {
		return msg + "; give at least two more, for example " + e.Pair.String()
	}
	return msg
}

// ConflictError reports given values that disagree beyond the tolerance.
type ConflictError struct {
	Quantity Quantity
	Value    float64 // the value held (given, or derived earlier), in SI
	Derived  float64 // the value the other quantities imply, in SI
	From     Set     // the quantities it was derived from
	Tol      float64 // relative tolerance used
}

func (e *ConflictError) Error() string {
	return fmt.Sprintf("phase: %s = %s disagrees with %s from %s (%.2g %% apart, tolerance %.2g %%)",
		e.Quantity, fmtQ(e.Quantity, e.Value), fmtQ(e.Quantity, e.Derived), e.From,
		100*relDiff(e.Value, e.Derived), 100*e.Tol)
}

// RangeError reports an impossible value, given or derived.
type RangeError struct {
	Quantity Quantity // or nQuantities for EMax, EMin, GammaW, Tol
	Field    string   // field name
	Value    float64
	Range    string // the accepted range
	Derived  bool   // true when the value was derived, not given
	From     Set
}

func (e *RangeError) Error() string {
	how := ""
	if e.Derived {
		how = " (derived from " + e.From.String() + ")"
	}
	val := strings.TrimSpace(fmt.Sprintf("%.4g", e.Value))
	if e.Quantity < nQuantities {
		val = fmtQ(e.Quantity, e.Value)
	}
	return fmt.Sprintf("phase: %s = %s%s is outside %s", e.Field, val, how, e.Range)
}

func fmtQ(q Quantity, v float64) string {
	if q.isWeight() {
		return units.UnitWeight(v).String()
	}
	return fmt.Sprintf("%.4g", v)
}

func relDiff(a, b float64) float64 {
	d := math.Abs(a - b)
	m := math.Max(math.Abs(a), math.Abs(b))
	if m == 0 {
		return 0
	}
	return d / m
}

// Solve returns the full state implied by in. See the package doc for the
// relations, the tolerance and the accepted ranges.
//
// It returns an *InsufficientError when the given values do not fix the
// state, a *ConflictError when given values disagree beyond the tolerance,
// and a *RangeError when a value, given or derived, is impossible (several
// range errors are joined with errors.Join).
func Solve(in Input) (State, error) {
	var s solver
	if err := s.load(in); err != nil {
		return State{}, err
	}
	if err := s.propagate(); err != nil {
		return State{}, err
	}
	core := s.core()
	if s.known&core != core {
		return State{}, s.insufficient(core)
	}
	if err := s.checkAll(); err != nil {
		return State{}, err
	}
	s.reconcile()
	v := s.v
	st := State{
		Gs: v[Gs], E: v[E], N: v[N], W: v[W], S: v[S],
		Gamma: units.UnitWeight(v[Gamma]), GammaD: units.UnitWeight(v[GammaD]),
		GammaSat: units.UnitWeight(v[GammaSat]), GammaSub: units.UnitWeight(v[GammaSub]),
		GammaW: units.UnitWeight(s.gw),
	}
	if s.hasDr {
		st.Dr, st.HasDr = v[Dr], true
	}
	return st, nil
}

type solver struct {
	v          [nQuantities]float64
	known      Set
	from       [nQuantities]Set // 0 when given
	gw         float64
	emax, emin float64
	hasDr      bool
	tol        float64
}

func (s *solver) core() Set {
	c := Set(1<<Dr - 1)
	if s.hasDr {
		c |= Of(Dr)
	}
	return c
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// rangeOf returns the accepted range of q as text and whether v lies in it.
func (s *solver) inRange(q Quantity, v float64) (string, bool) {
	if !finite(v) {
		return "finite values", false
	}
	switch q {
	case Gs:
		return fmt.Sprintf("[%g, %g]", MinGs, MaxGs), v >= MinGs && v <= MaxGs
	case E:
		return "(0, ∞)", v > 0
	case N:
		return "(0, 1)", v > 0 && v < 1
	case W:
		return "[0, ∞)", v >= 0
	case S:
		return "[0, 1]", v >= -1e-12 && v <= 1+1e-12
	case Gamma, GammaD, GammaSub:
		return "(0, ∞)", v > 0
	case GammaSat:
		return "(γw, ∞) with γw = " + units.UnitWeight(s.gw).String(), v > s.gw
	case Dr:
		return "[0, 1]", v >= -1e-12 && v <= 1+1e-12
	}
	return "", true
}

func (s *solver) load(in Input) error {
	s.gw = float64(in.GammaW)
	if s.gw == 0 {
		s.gw = float64(WaterUnitWeight)
	}
	s.tol = in.Tol
	if s.tol == 0 {
		s.tol = DefaultTolerance
	}
	var errs []error
	if !finite(s.gw) || s.gw <= 0 {
		errs = append(errs, &RangeError{Quantity: nQuantities, Field: "γw", Value: s.gw, Range: "(0, ∞)"})
	}
	if !finite(s.tol) || s.tol < 0 || s.tol > 0.2 {
		errs = append(errs, &RangeError{Quantity: nQuantities, Field: "Tol", Value: s.tol, Range: "[0, 0.2]"})
	}
	given := [nQuantities]float64{in.Gs, in.E, in.N, in.W, in.S, float64(in.Gamma), float64(in.GammaD),
		float64(in.GammaSat), float64(in.GammaSub), in.Dr}
	for q := range nQuantities {
		if given[q] == 0 && !in.Zero.Has(q) {
			continue
		}
		if in.Zero.Has(q) && given[q] != 0 {
			errs = append(errs, fmt.Errorf("phase: %s is marked zero in Zero but given as %s", q, fmtQ(q, given[q])))
			continue
		}
		if rng, ok := s.inRange(q, given[q]); !ok {
			errs = append(errs, &RangeError{Quantity: q, Field: q.String(), Value: given[q], Range: rng})
			continue
		}
		s.v[q] = given[q]
		s.known |= 1 << q
	}
	s.emax, s.emin = in.EMax, in.EMin
	if s.emax != 0 || s.emin != 0 {
		switch {
		case !finite(s.emin) || s.emin <= 0:
			errs = append(errs, &RangeError{Quantity: nQuantities, Field: "emin", Value: s.emin, Range: "(0, emax)"})
		case !finite(s.emax) || s.emax <= s.emin:
			errs = append(errs, &RangeError{Quantity: nQuantities, Field: "emax", Value: s.emax,
				Range: fmt.Sprintf("(emin, ∞) with emin = %.4g", s.emin)})
		default:
			s.hasDr = true
		}
	}
	if s.known.Has(Dr) && !s.hasDr && (s.emax == 0 && s.emin == 0) {
		errs = append(errs, errors.New("phase: Dr is given but emax and emin are not; give both to use Dr"))
	}
	if s.known.Has(GammaD) && s.known.Has(GammaSat) && s.v[GammaD] >= s.v[GammaSat] {
		errs = append(errs, fmt.Errorf("phase: γd = %s is not less than γsat = %s",
			units.UnitWeight(s.v[GammaD]), units.UnitWeight(s.v[GammaSat])))
	}
	if s.known.Has(W) && s.known.Has(S) && (s.v[W] == 0) != (s.v[S] == 0) {
		errs = append(errs, fmt.Errorf("phase: w = %.4g and S = %.4g: one is zero and the other is not", s.v[W], s.v[S]))
	}
	return errors.Join(errs...)
}

// relation is one equation among the quantities vars; solve returns the
// value of target from the others, or false where the equation does not fix
// it (a zero divisor).
type relation struct {
	vars      Set
	canonical Quantity // the quantity checked when all are known
	solve     func(s *solver, target Quantity) (float64, bool)
}

func div(a, b float64) (float64, bool) {
	if b == 0 || !finite(a/b) {
		return 0, false
	}
	return a / b, true
}

var relations = []relation{
	{Of(E, N), N, func(s *solver, t Quantity) (float64, bool) {
		v := &s.v
		if t == N {
			return v[E] / (1 + v[E]), true
		}
		return div(v[N], 1-v[N])
	}},
	{Of(S, E, W, Gs), S, func(s *solver, t Quantity) (float64, bool) {
		v := &s.v
		switch t {
		case S:
			return div(v[W]*v[Gs], v[E])
		case E:
			return div(v[W]*v[Gs], v[S])
		case W:
			return div(v[S]*v[E], v[Gs])
		}
		return div(v[S]*v[E], v[W])
	}},
	{Of(GammaD, Gs, E), GammaD, func(s *solver, t Quantity) (float64, bool) {
		v := &s.v
		switch t {
		case GammaD:
			return v[Gs] * s.gw / (1 + v[E]), true
		case Gs:
			return v[GammaD] * (1 + v[E]) / s.gw, true
		}
		r, ok := div(v[Gs]*s.gw, v[GammaD])
		return r - 1, ok
	}},
	{Of(GammaSat, Gs, E), GammaSat, func(s *solver, t Quantity) (float64, bool) {
		v := &s.v
		switch t {
		case GammaSat:
			return (v[Gs] + v[E]) * s.gw / (1 + v[E]), true
		case Gs:
			return v[GammaSat]*(1+v[E])/s.gw - v[E], true
		}
		return div(v[Gs]*s.gw-v[GammaSat], v[GammaSat]-s.gw)
	}},
	{Of(GammaSub, GammaSat), GammaSub, func(s *solver, t Quantity) (float64, bool) {
		if t == GammaSub {
			return s.v[GammaSat] - s.gw, true
		}
		return s.v[GammaSub] + s.gw, true
	}},
	{Of(Gamma, GammaD, W), Gamma, func(s *solver, t Quantity) (float64, bool) {
		v := &s.v
		switch t {
		case Gamma:
			return v[GammaD] * (1 + v[W]), true
		case GammaD:
			return div(v[Gamma], 1+v[W])
		}
		r, ok := div(v[Gamma], v[GammaD])
		return r - 1, ok
	}},
	{Of(GammaSat, GammaD, N), GammaSat, func(s *solver, t Quantity) (float64, bool) {
		v := &s.v
		switch t {
		case GammaSat:
			return v[GammaD] + v[N]*s.gw, true
		case GammaD:
			return v[GammaSat] - v[N]*s.gw, true
		}
		return (v[GammaSat] - v[GammaD]) / s.gw, true
	}},
	{Of(Gamma, GammaD, S, N), Gamma, func(s *solver, t Quantity) (float64, bool) {
		v := &s.v
		switch t {
		case Gamma:
			return v[GammaD] + v[S]*v[N]*s.gw, true
		case GammaD:
			return v[Gamma] - v[S]*v[N]*s.gw, true
		case S:
			return div(v[Gamma]-v[GammaD], v[N]*s.gw)
		}
		return div(v[Gamma]-v[GammaD], v[S]*s.gw)
	}},
	{Of(GammaD, Gs, S, W), GammaD, func(s *solver, t Quantity) (float64, bool) {
		v := &s.v
		switch t {
		case GammaD:
			return div(v[Gs]*s.gw*v[S], v[S]+v[W]*v[Gs])
		case Gs:
			return div(v[GammaD]*v[S], s.gw*v[S]-v[GammaD]*v[W])
		case S:
			return div(v[W]*v[Gs]*v[GammaD], v[Gs]*s.gw-v[GammaD])
		}
		return div(v[S]*(v[Gs]*s.gw-v[GammaD]), v[GammaD]*v[Gs])
	}},
	{Of(Dr, E), Dr, func(s *solver, t Quantity) (float64, bool) {
		if !s.hasDr {
			return 0, false
		}
		if t == Dr {
			return (s.emax - s.v[E]) / (s.emax - s.emin), true
		}
		return s.emax - s.v[Dr]*(s.emax-s.emin), true
	}},
}

// propagate solves every relation with exactly one unknown until none is
// left, checking each derived value's range.
func (s *solver) propagate() error {
	for changed := true; changed; {
		changed = false
		for _, r := range relations {
			unknown := r.vars &^ s.known
			if unknown == 0 || unknown&(unknown-1) != 0 {
				continue
			}
			t := lowest(unknown)
			val, ok := r.solve(s, t)
			if !ok {
				continue
			}
			from := r.vars &^ Of(t)
			if rng, in := s.inRange(t, val); !in {
				return &RangeError{Quantity: t, Field: t.String(), Value: val, Range: rng, Derived: true, From: from}
			}
			if t == S || t == Dr {
				val = math.Min(math.Max(val, 0), 1) // round-off only: the range check passed
			}
			s.v[t] = val
			s.known |= 1 << t
			s.from[t] = from
			changed = true
		}
	}
	return nil
}

func lowest(s Set) Quantity {
	for q := range nQuantities {
		if s.Has(q) {
			return q
		}
	}
	return nQuantities
}

// checkAll checks every relation in its canonical form.
func (s *solver) checkAll() error {
	for _, r := range relations {
		if r.vars&^s.known != 0 {
			continue
		}
		c := r.canonical
		want, ok := r.solve(s, c)
		if !ok {
			continue
		}
		got := s.v[c]
		floor := 1e-12
		if c == S || c == N || c == Dr {
			floor = s.tol
		}
		if c.isWeight() {
			floor = 1e-9 * s.gw
		}
		if math.Abs(got-want) > s.tol*math.Max(math.Abs(got), math.Abs(want)) && math.Abs(got-want) > floor {
			return &ConflictError{Quantity: c, Value: got, Derived: want, From: r.vars &^ Of(c), Tol: s.tol}
		}
	}
	return nil
}

// reconcile recomputes every other quantity from Gs, e and S once the
// given values have been found to agree within the tolerance, so that the
// state returned satisfies every relation exactly (to round-off): Se = wGs
// and the unit weights agree with each other however the given values were
// rounded. A given value other than Gs, e and S may move by up to the
// tolerance. Gs, e and S are themselves given or derived from the given
// values by the first relations that fixed them.
func (s *solver) reconcile() {
	v := &s.v
	gs, e, sat, gw := v[Gs], v[E], v[S], s.gw
	v[N] = e / (1 + e)
	v[W] = sat * e / gs
	v[GammaD] = gs * gw / (1 + e)
	v[GammaSat] = (gs + e) * gw / (1 + e)
	v[GammaSub] = v[GammaSat] - gw
	v[Gamma] = (gs + sat*e) * gw / (1 + e)
	if s.hasDr {
		v[Dr] = min(max((s.emax-e)/(s.emax-s.emin), 0), 1) // round-off only: the check passed
	}
}

// closure returns the quantities fixed by known, by the structure of the
// relations alone.
func (s *solver) closure(known Set) Set {
	for changed := true; changed; {
		changed = false
		for _, r := range relations {
			if r.canonical == Dr && !s.hasDr {
				continue
			}
			u := r.vars &^ known
			if u != 0 && u&(u-1) == 0 {
				known |= u
				changed = true
			}
		}
	}
	return known
}

func (s *solver) insufficient(core Set) error {
	e := &InsufficientError{Unknown: core &^ s.known}
	for q := range nQuantities {
		if core.Has(q) && !s.known.Has(q) && s.closure(s.known|Of(q))&core == core {
			e.Closers |= Of(q)
		}
	}
	if e.Closers == 0 {
	pairs:
		for a := range nQuantities {
			for b := a + 1; b < nQuantities; b++ {
				if !e.Unknown.Has(a) || !e.Unknown.Has(b) {
					continue
				}
				if s.closure(s.known|Of(a, b))&core == core {
					e.Pair = Of(a, b)
					break pairs
				}
			}
		}
	}
	return e
}
