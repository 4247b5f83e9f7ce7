package group

import (
	"fmt"
	"math"
	"slices"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// The identifiers of the efficiency rules (calc file: group.efficiency).
const (
	Practice        = "practice"
	ConverseLabarre = "converse-labarre"
	LosAngeles      = "los-angeles"
	SeilerKeeney    = "seiler-keeney"
	Feld            = "feld"
	Given           = "given"
)

// Rule describes one efficiency rule: its identifier, its equation in one
// line and its sources.
type Rule struct {
	ID       string
	Equation string
	Refs     []cite.Ref
	// Grid is true when the rule needs rows and columns.
	Grid bool
}

var dasGroup = cite.Ref{Source: cite.Das2019, Where: "section on group efficiency of piles (equations written from memory of that section)"}

var rules = []Rule{
	{ID: Practice, Equation: "undrained ground, cap not in firm contact: η = 0.65 at s = 2.5D to 1 at 6D; cap in contact: 1; drained: 1 (driven), 0.67 at 2.5D to 1 at 4D (bored)",
		Refs: []cite.Ref{{Source: cite.AASHTO2020, Where: "10.7.3.9 and 10.8.3.6, group resistance (from memory)"},
			{Source: cite.Hannigan2016, Where: "group capacity of driven piles: efficiency 1 in cohesionless soil, the block check in cohesive soil (from memory)"}}},
	{ID: ConverseLabarre, Grid: true, Equation: "η = 1 − θ·[(n1 − 1)·n2 + (n2 − 1)·n1]/(90·n1·n2), θ = atan(D/s) in degrees", Refs: []cite.Ref{dasGroup}},
	{ID: LosAngeles, Grid: true, Equation: "η = 1 − D/(π·s·n1·n2)·[n1(n2 − 1) + n2(n1 − 1) + √2·(n1 − 1)(n2 − 1)]", Refs: []cite.Ref{dasGroup}},
	{ID: SeilerKeeney, Grid: true, Equation: "η = 1 − [11s/(7(s² − 1))]·[(n1 + n2 − 2)/(n1 + n2 − 1)] + 0.3/(n1 + n2), s in ft", Refs: []cite.Ref{dasGroup}},
	{ID: Feld, Grid: true, Equation: "η = 1 − (number of neighbours in rows, columns and diagonals, summed over the piles)/(16·n)", Refs: []cite.Ref{dasGroup}},
	{ID: Given, Equation: "η given by the engineer, 0 < η ≤ 1"},
}

// Rules returns the efficiency rules, the default (practice) first.
func Rules() []Rule {
	out := slices.Clone(rules)
	for i := range out {
		out[i].Refs = slices.Clone(out[i].Refs)
	}
	return out
}

// RuleIDs returns the identifiers of the efficiency rules.
func RuleIDs() []string {
	ids := make([]string, len(rules))
	for i, r := range rules {
		ids[i] = r.ID
	}
	return ids
}

// LookupRule returns the rule with identifier id.
func LookupRule(id string) (Rule, bool) {
	for _, r := range rules {
		if r.ID == id {
			return r, true
		}
	}
	return Rule{}, false
}

// ConverseLabarreEfficiency returns the Converse-Labarre efficiency of n1
// rows × n2 columns of piles of width d at spacing s (Das & Sivakugan 2019):
//
//	η = 1 − θ·[(n1 − 1)·n2 + (n2 − 1)·n1]/(90·n1·n2),  θ = atan(d/s) in degrees
//
// It panics unless n1, n2 ≥ 1 and d, s > 0 (callers check their inputs).
func ConverseLabarreEfficiency(n1, n2 int, d, s units.Length) float64 {
	checkGrid(n1, n2, d, s)
	theta := units.Atan(float64(d / s)).Degrees()
	a, b := float64(n1), float64(n2)
	return 1 - theta*((a-1)*b+(b-1)*a)/(90*a*b)
}

// LosAngelesEfficiency returns the Los Angeles Group-Action efficiency
// (Das & Sivakugan 2019):
//
//	η = 1 − d/(π·s·n1·n2)·[n1(n2 − 1) + n2(n1 − 1) + √2·(n1 − 1)(n2 − 1)]
func LosAngelesEfficiency(n1, n2 int, d, s units.Length) float64 {
	checkGrid(n1, n2, d, s)
	a, b := float64(n1), float64(n2)
	return 1 - float64(d/s)/(math.Pi*a*b)*(a*(b-1)+b*(a-1)+math.Sqrt2*(a-1)*(b-1))
}

// SeilerKeeneyEfficiency returns the Seiler & Keeney (1944) efficiency
// (Das & Sivakugan 2019), with s the spacing in feet:
//
//	η = 1 − [11s/(7(s² − 1))]·[(n1 + n2 − 2)/(n1 + n2 − 1)] + 0.3/(n1 + n2)
//
// It is defined for s above 1 ft and can exceed 1 (callers cap it).
func SeilerKeeneyEfficiency(n1, n2 int, s units.Length) float64 {
	checkGrid(n1, n2, 1, s)
	sf := s.Feet()
	a, b := float64(n1), float64(n2)
	return 1 - 11*sf/(7*(sf*sf-1))*(a+b-2)/(a+b-1) + 0.3/(a+b)
}

// FeldEfficiency returns the efficiency of Feld's rule (Das & Sivakugan
// 2019) for n1 rows × n2 columns: each pile loses 1/16 of its capacity for
// each neighbour in its row, its column and its diagonals,
//
//	η = 1 − 2·[n1(n2 − 1) + n2(n1 − 1) + 2(n1 − 1)(n2 − 1)]/(16·n1·n2)
func FeldEfficiency(n1, n2 int) float64 {
	checkGrid(n1, n2, 1, 1)
	a, b := float64(n1), float64(n2)
	return 1 - 2*(a*(b-1)+b*(a-1)+2*(a-1)*(b-1))/(16*a*b)
}

// PracticeEfficiency returns AASHTO's group efficiency for a centre-to-
// centre spacing of sOverD pile widths: in ground with an undrained layer
// and a cap not in firm contact with the ground, 0.65 at 2.5 rising
// linearly to 1 at 6 (10.7.3.9); with the cap in firm contact, 1; in
// drained ground 1 for driven piles and, for bored piles, 0.67 at 2.5
// rising to 1 at 4 (10.8.3.6.3). Values from memory of AASHTO LRFD. Below
// 2.5 widths it returns the value at 2.5 and below = true (the caller
// warns: the spacing is under the code's minimum).
func PracticeEfficiency(sOverD float64, undrained, capContact, bored bool) (eta float64, below bool) {
	ramp := func(lo, at, hi float64) float64 {
		switch {
		case sOverD <= 2.5:
			return lo
		case sOverD >= at:
			return hi
		}
		return lo + (hi-lo)*(sOverD-2.5)/(at-2.5)
	}
	switch {
	case undrained && !capContact:
		return ramp(0.65, 6, 1), sOverD < 2.5
	case undrained:
		return 1, false
	case bored:
		return ramp(0.67, 4, 1), sOverD < 2.5
	}
	return 1, false
}

func checkGrid(n1, n2 int, d, s units.Length) {
	if n1 < 1 || n2 < 1 || !(d > 0) || !(s > 0) {
		panic(fmt.Sprintf("group: efficiency of %d × %d piles of width %v at spacing %v", n1, n2, d, s))
	}
}

// EfficiencyInput is what the rules read besides the layout.
type EfficiencyInput struct {
	Rule  string       // identifier; "" means Practice
	Width units.Length // the pile's width or diameter D
	// Undrained is true when a layer along the pile or at its tip is
	// undrained (the cohesive case of the practice rule).
	Undrained bool
	// CapContact is true when the cap bears firmly on the ground.
	CapContact bool
	Bored      bool    // bored or augered piles
	Value      float64 // the efficiency of rule given
}

// Efficiency is the group efficiency found by one rule.
type Efficiency struct {
	Rule     string
	Value    float64      // η used, 0 < η ≤ 1
	Raw      float64      // the formula's value before the cap at 1
	Spacing  units.Length // the spacing the formula read (0 for given and feld)
	Equation string
	Refs     []cite.Ref
	Warnings []string
}

// GroupEfficiency applies rule in.Rule to layout l. A formula that needs
// rows and columns refuses a layout given by positions; an efficiency above
// 1 is taken as 1 with a warning; one at or below 0 is an error.
func GroupEfficiency(l Layout, in EfficiencyInput) (Efficiency, error) {
	id := in.Rule
	if id == "" {
		id = Practice
	}
	r, ok := LookupRule(id)
	if !ok {
		return Efficiency{}, &FieldError{"efficiency", fmt.Sprintf("%q: want one of %v", id, RuleIDs())}
	}
	if r.Grid && !l.IsGrid() {
		return Efficiency{}, &FieldError{"efficiency", fmt.Sprintf("%q needs rows and columns; a layout given by positions takes practice or given", id)}
	}
	if !(in.Width > 0) {
		return Efficiency{}, &FieldError{"pile width", fmt.Sprintf("%v: want more than 0", in.Width)}
	}
	e := Efficiency{Rule: id, Equation: r.Equation, Refs: slices.Clone(r.Refs)}
	s := l.gridSpacing()
	n := len(l.Points)
	switch id {
	case Given:
		if !(in.Value > 0 && in.Value <= 1) {
			return Efficiency{}, &FieldError{"efficiency_value", fmt.Sprintf("%g: want more than 0 and at most 1", in.Value)}
		}
		e.Raw = in.Value
	case Practice:
		if n == 1 {
			e.Raw = 1
			break
		}
		g, _, err := l.Measure(in.Width, MinCapEdge, in.Bored)
		if err != nil {
			return Efficiency{}, err
		}
		var below bool
		e.Spacing = g.MinSpacing
		e.Raw, below = PracticeEfficiency(float64(g.MinSpacing/in.Width), in.Undrained, in.CapContact, in.Bored)
		if below {
			e.Warnings = append(e.Warnings, fmt.Sprintf("spacing %.2f D is under the 2.5 D at which AASHTO's efficiency begins: the value at 2.5 D (%.2f) is used", float64(g.MinSpacing/in.Width), e.Raw))
		}
	case ConverseLabarre, LosAngeles, SeilerKeeney:
		if n > 1 && !(s > in.Width) {
			return Efficiency{}, &FieldError{"spacing", fmt.Sprintf("%v: %s needs a spacing greater than the pile width %v", s, id, in.Width)}
		}
		if n == 1 {
			s = 2 * in.Width // any spacing: a single pile has no neighbour
		}
		e.Spacing = s
		switch id {
		case ConverseLabarre:
			e.Raw = ConverseLabarreEfficiency(l.Rows, l.Cols, in.Width, s)
		case LosAngeles:
			e.Raw = LosAngelesEfficiency(l.Rows, l.Cols, in.Width, s)
		default:
			if n > 1 && !(s.Feet() > 1) {
				return Efficiency{}, &FieldError{"spacing", fmt.Sprintf("%v: seiler-keeney needs a spacing above 1 ft", s)}
			}
			if n == 1 {
				e.Raw = 1
			} else {
				e.Raw = SeilerKeeneyEfficiency(l.Rows, l.Cols, s)
			}
		}
	case Feld:
		e.Raw = FeldEfficiency(l.Rows, l.Cols)
	}
	e.Value = e.Raw
	if e.Raw > 1 {
		e.Value = 1
		e.Warnings = append(e.Warnings, fmt.Sprintf("%s gives η = %.3f, above 1: η = 1 is used", id, e.Raw))
	}
	if !(e.Value > 0) {
		return Efficiency{}, &FieldError{"efficiency", fmt.Sprintf("%s gives η = %.3f for this layout: want more than 0 (spacing too close for the formula)", id, e.Raw)}
	}
	return e, nil
}

// gridSpacing is the spacing the formulas read: the smaller of sx and sy
// where both apply (the lower efficiency), else the one that does.
func (l Layout) gridSpacing() units.Length {
	switch {
	case l.Rows > 1 && l.Cols > 1:
		return min(l.Sx, l.Sy)
	case l.Cols > 1:
		return l.Sx
	case l.Rows > 1:
		return l.Sy
	}
	return 0
}
