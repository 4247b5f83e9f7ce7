package structural

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/units"
)

// Member is a pile section with its material. A concrete section (circle,
// square, given) reads Concrete and, if reinforced, Rebar and RebarYield;
// a steel section (closed-pipe, open-pipe, h-section) reads SteelYield.
type Member struct {
	Section      pile.Section
	Installation pile.Installation
	// Concrete is the concrete's specified strength: f′c for the AASHTO
	// and allowable-stress rules, the characteristic cylinder strength fck
	// for EN 1992-1-1. 5 to 120 MPa.
	Concrete units.Stress
	// SteelYield is the yield strength of a steel section (Fy, fyk or
	// fy), 150 to 1000 MPa.
	SteelYield units.Stress
	// Rebar is the area of the longitudinal bars of a concrete section,
	// at most 8 % of the gross area; RebarYield their yield strength
	// (fy or fyk), 150 to 1000 MPa, given with Rebar.
	Rebar      units.Area
	RebarYield units.Stress
	// Cased says that a bored or augered pile is cast in a permanent
	// casing: EN 1992-1-1's reduced design diameter (2.3.4.2(2)) and
	// increased γc (2.4.2.5(2)) then do not apply.
	Cased bool
	// Column is the unbraced length of a steel pile above the ground or
	// in water; the zero value is a fully embedded pile. A concrete
	// section with a free length is refused (its column check is not
	// made here).
	Column Column
}

// Limits of the inputs. 8 % of the gross area is the upper limit of
// longitudinal reinforcement in AASHTO 5.6.4.2 (from memory; EN 1992-1-1
// 9.5.2(3) recommends 4 % outside laps); the strength ranges cover the
// materials in use, wider than any code's own limits (common practice).
const (
	minConcrete, maxConcrete = 5 * units.Megapascal, 120 * units.Megapascal
	minYield, maxYield       = 150 * units.Megapascal, 1000 * units.Megapascal
	maxRebarRatio            = 0.08
)

// IsSteel reports whether the member is a steel section (pipe or H).
func (m Member) IsSteel() bool {
	switch m.Section.Shape {
	case pile.ClosedPipe, pile.OpenPipe, pile.HSection:
		return true
	}
	return false
}

// FieldError is an input outside its accepted range: the field path and
// why.
type FieldError struct {
	Field string
	Msg   string
}

func (e *FieldError) Error() string { return e.Field + ": " + e.Msg }

func fieldErrorf(field, format string, args ...any) error {
	return &FieldError{Field: field, Msg: fmt.Sprintf(format, args...)}
}

func inRange(field string, v, lo, hi units.Stress) error {
	if !(v >= lo && v <= hi) {
		return fieldErrorf(field, "%.4g MPa is outside %.4g to %.4g MPa", v.MPa(), lo.MPa(), hi.MPa())
	}
	return nil
}

// Validate checks the section (pile.Section.Validate) and that the
// material fits it: a concrete section needs Concrete and may have bars
// (Rebar with RebarYield, at most 8 % of the gross area); a steel section
// needs Steel and takes no concrete or bars (fill and bars in a pipe are
// not counted: refused rather than ignored). Field names are prefixed with
// path ("material.concrete").
func (m Member) Validate(path string) error {
	if err := m.Section.Validate(path + ".section"); err != nil {
		return err
	}
	p := func(f string) string { return path + ".material." + f }
	if !m.IsSteel() && m.Column.Length != 0 {
		return fieldErrorf(path+".free_length", "a column check of a %s (concrete) section is not made here; give the free length only for steel pipes and H-sections, and check a concrete pile above the ground as a column separately", m.Section.Shape)
	}
	if m.IsSteel() {
		if m.SteelYield == 0 {
			return fieldErrorf(p("steel_yield"), "not given; a %s section needs the yield strength of its steel", m.Section.Shape)
		}
		if m.Concrete != 0 {
			return fieldErrorf(p("concrete_strength"), "a %s section is taken as steel alone; a concrete fill is not counted, so leave it out", m.Section.Shape)
		}
		if m.Rebar != 0 || m.RebarYield != 0 {
			return fieldErrorf(p("reinforcement"), "a %s section takes no reinforcing bars", m.Section.Shape)
		}
		return inRange(p("steel_yield"), m.SteelYield, minYield, maxYield)
	}
	if m.Concrete == 0 {
		return fieldErrorf(p("concrete_strength"), "not given; a %s section needs the strength of its concrete", m.Section.Shape)
	}
	if m.SteelYield != 0 {
		return fieldErrorf(p("steel_yield"), "a %s section is concrete; give bars as reinforcement, not steel_yield", m.Section.Shape)
	}
	if err := inRange(p("concrete_strength"), m.Concrete, minConcrete, maxConcrete); err != nil {
		return err
	}
	if (m.Rebar == 0) != (m.RebarYield == 0) {
		if m.Rebar == 0 {
			return fieldErrorf(p("reinforcement"), "not given, but reinforcement_yield is; give both or neither")
		}
		return fieldErrorf(p("reinforcement_yield"), "not given; bars need their yield strength")
	}
	if m.Rebar != 0 {
		ag := m.Section.GrossArea()
		if !(m.Rebar > 0 && float64(m.Rebar/ag) <= maxRebarRatio) {
			return fieldErrorf(p("reinforcement"), "%.4g mm² is outside 0 to %.4g mm² (8 %% of the gross area)",
				float64(m.Rebar/units.SquareMillimetre), float64(units.Area(maxRebarRatio)*ag/units.SquareMillimetre))
		}
		return inRange(p("reinforcement_yield"), m.RebarYield, minYield, maxYield)
	}
	return nil
}

// ConcreteArea returns the nominal area of concrete, the gross area less
// the bars (0 for a steel section): the quantity of concrete per metre.
func (m Member) ConcreteArea() units.Area {
	if m.IsSteel() {
		return 0
	}
	return m.Section.GrossArea() - m.Rebar
}

// SteelArea returns the area of steel: the section's steel of a pipe or
// H-section, or the bars of a concrete section.
func (m Member) SteelArea() units.Area {
	if m.IsSteel() {
		return m.Section.MaterialArea()
	}
	return m.Rebar
}

// castInPlace reports whether the member is cast against the ground
// without a permanent casing (bored or augered, not cased).
func (m Member) castInPlace() bool {
	return (m.Installation == pile.Bored || m.Installation == pile.Augered) && !m.Cased
}

// Resistance is the design axial compression resistance of a section by
// one rule, with what it was computed from.
type Resistance struct {
	// Rule is the rule's identifier: aashto, en, allowable.
	Rule string
	// Material is "concrete" or "steel".
	Material string
	// Nominal is the unfactored resistance of the area used: AASHTO Pn
	// (with k for concrete), EN fck·Ac + σs·As or fy·A (no partial
	// factors), and for the allowable rule the squash load f′c·Ac +
	// fy·As or Fy·As.
	Nominal units.Force
	// Squash is the load at which the whole area yields or crushes, before
	// any factor: AASHTO 5.6.4.4's Po = 0.85·f′c·(Ag − Ast) + fy·Ast for
	// concrete (Nominal is k·Po), and Nominal otherwise.
	Squash units.Force
	// Design is the resistance the largest axial force is checked
	// against: φPn, NRd, or the allowable load.
	Design units.Force
	// Factor is Design/Nominal (φ; 1/γ; the allowable fraction).
	Factor float64
	// ConcreteArea and SteelArea are the areas the resistance uses; for
	// EN 1992-1-1 cast-in-place piles ConcreteArea is on DesignDiameter.
	ConcreteArea, SteelArea units.Area
	// DesignDiameter is the diameter of EN 1992-1-1 2.3.4.2(2); zero where
	// the nominal section is used.
	DesignDiameter units.Length
	// Equation is the rule with the values substituted (SI: kN, mm², MPa).
	Equation string
	// Notes are the assumptions the result rests on.
	Notes []string
	Refs  []cite.Ref
}

// Rule computes the design axial compression resistance of a member.
type Rule interface {
	// ID returns the rule's identifier.
	ID() string
	cite.Cited
	// Compression returns the resistance of m, or an error naming the
	// field when m is outside the rule's scope.
	Compression(m Member) (Resistance, error)
}

// ForBasis returns the rule of a design basis: AASHTO for LRFD bases,
// EN 1992-1-1/EN 1993-1-1 for EN 1997-1, allowable stresses for a factor
// of safety; nil for an unknown basis.
func ForBasis(b pile.Basis) Rule {
	switch b.(type) {
	case pile.LRFD, *pile.LRFD:
		return AASHTO{}
	case pile.Eurocode7, *pile.Eurocode7:
		return Eurocode{}
	case pile.SafetyFactor, *pile.SafetyFactor:
		return Allowable{}
	}
	return nil
}

// Check is the structural verification: the largest axial force Ed
// against the design resistance.
type Check struct {
	Resistance Resistance
	Ed         units.Force
	Use        float64 // Ed/Rd
	Pass       bool
}

// Verify checks the largest axial force ed against r: Use = Ed/Rd, pass
// when Use ≤ 1.
func Verify(r Resistance, ed units.Force) Check {
	c := Check{Resistance: r, Ed: ed}
	switch {
	case ed <= 0:
		c.Use = 0
	case r.Design <= 0:
		c.Use = math.MaxFloat64
	default:
		c.Use = float64(ed / r.Design)
	}
	c.Pass = c.Use <= 1
	return c
}

var fullyEmbedded = "the pile is taken as fully embedded and laterally supported: no buckling (a free length above the ground or in water needs a column check)"

// mm2 and kn write areas and forces for equations.
func mm2(a units.Area) float64   { return float64(a / units.SquareMillimetre) }
func kn(f units.Force) float64   { return f.KN() }
func mpa(s units.Stress) float64 { return s.MPa() }
