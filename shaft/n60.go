package shaft

import (
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// DrivenN60 is Meyerhof's (1976) unit shaft resistance of a driven pile
// in sand from the SPT blow count, identifier "driven-n60-shaft":
//
//	fs = 0.02·pa·N60   displacement piles (closed pipe, precast concrete, timber)
//	fs = 0.01·pa·N60   small-displacement piles (H-sections, open pipe)
//
// with N60 the layer's blow count corrected to 60 % energy and pa the
// atmospheric pressure (Point.Pa; 100 kPa when zero). Meyerhof wrote the
// rule with the mean N̄ along the shaft (fs = N̄/50 tsf and N̄/100 tsf,
// pa = 1 tsf); evaluated layer by layer with each layer's N60, the shaft
// resistance is 0.02·pa·N̄60·p·L with N̄60 the length-weighted mean, the
// same. The form with pa is Das's presentation (Principles of Foundation
// Engineering, chapter on pile foundations, from memory); the factors were
// checked against a printed solved problem (see the tests).
//
// Reads N60 (above 0, at most 100) and Pa. The rule has no limit of its
// own here; a limit given in the calc file caps it (Capped). It is for
// driven piles in cohesionless soil only: bored piles mobilise less
// (Meyerhof 1976) and are refused by the catalogue's constructor.
type DrivenN60 struct {
	// Low selects the small-displacement factor 0.01 (H-sections, open
	// pipe); false is the displacement factor 0.02.
	Low bool
}

// drivenN60Factor returns the factor on pa·N60: 0.02 for a displacement
// pile, 0.01 for a small-displacement one.
func drivenN60Factor(low bool) float64 {
	if low {
		return 0.01
	}
	return 0.02
}

func (DrivenN60) ID() string { return "driven-n60-shaft" }

// Equation returns the rule as built: the small-displacement factor alone
// when Low is set; otherwise the displacement factor, with the other named.
func (m DrivenN60) Equation() string {
	if m.Low {
		return "fs = 0.01·pa·N60 (small-displacement pile)"
	}
	return "fs = 0.02·pa·N60 (displacement pile; 0.01·pa·N60 for a small-displacement one)"
}
func (DrivenN60) Valid() string { return "0 < N60 ≤ 100, pa 80 to 120 kPa; driven piles in sand" }
func (DrivenN60) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Meyerhof1976, Where: "skin friction of driven piles from the SPT"},
		{Source: cite.Das2019, Where: "frictional resistance from N60 (as presented)"}}
}

// Unit returns fs.
func (m DrivenN60) Unit(p Point) (Result, error) {
	id := m.ID()
	if err := checkN60(id, p.N60); err != nil {
		return Result{}, err
	}
	if err := checkPa(id, p); err != nil {
		return Result{}, err
	}
	fs := units.Stress(drivenN60Factor(m.Low)*p.N60) * p.pa()
	return Result{Fs: fs, Unlimited: fs}, nil
}
