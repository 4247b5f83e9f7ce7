package bearing

import (
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// DrivenN60 is Meyerhof's (1976) unit tip resistance of a driven pile in
// sand from the SPT blow count, identifier "driven-n60-sand":
//
//	qp = 0.4·pa·N60·Lb/D ≤ 4·pa·N60
//
// with N60 the blow count near the tip (the layer's n60), Lb the
// embedment in the bearing stratum, D the pile diameter or width and pa
// the atmospheric pressure (Input.Pa; 100 kPa when zero, the round value
// Das uses; Meyerhof wrote the rule in tsf, pa = 1 tsf = 95.76 kPa).
// Meyerhof wrote it as 0.4·N·Db/B ≤ 4·N tsf; the form with pa is Das's
// presentation (Principles of Foundation Engineering, chapter on pile
// foundations, from memory).
//
// Tip returns the limit 4·pa·N60, the value at Lb/D ≥ 10, as both
// Unlimited and Qp: the growth with Lb/D below 10 is Meyerhof's own rule
// for the bearing stratum, which package pile applies to every tip method
// built on the stratum's value (its embedment ramp from the ground surface,
// and his layered rule below a weaker layer, both over (Lb/D)cr = 10
// diameters by default). So in a pile, with the default ratio, qp is
// exactly the rule above with Lb measured in the bearing layer, and
// DrivenN60Tip gives it for one stratum directly. Meyerhof limits it to
// 3·pa·N60 in non-plastic silt (from memory); this method is for sand and
// gravel only.
//
// Reads N60 (above 0, at most 200) and Pa.
type DrivenN60 struct{}

// ID returns "driven-n60-sand".
func (DrivenN60) ID() string { return "driven-n60-sand" }

// Equation returns the rule on one line.
func (DrivenN60) Equation() string {
	return "qp = 0.4·pa·N60·Lb/D ≤ 4·pa·N60 (Lb/D by the embedment and layered rules)"
}

// Refs returns Meyerhof (1976) and Das's presentation.
func (DrivenN60) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Meyerhof1976, Where: "point resistance of driven piles from the SPT"},
		{Source: cite.Das2019, Where: "point bearing from N60 (as presented)"}}
}

// Range returns the inputs DrivenN60 accepts.
func (DrivenN60) Range() string {
	return "N60 above 0 to 200; pa 50 to 150 kPa; driven piles in sand and gravel"
}

// Tip returns 4·pa·N60, the unit tip resistance at Lb/D ≥ 10.
func (m DrivenN60) Tip(in Input) (Result, error) {
	if !finite(in.N60) || in.N60 <= 0 || in.N60 > 200 {
		return Result{}, rangeErr(m.ID(), "n60", in.N60, 0, 200, "blows/0.3 m", "above 0 to 200 blows/0.3 m (give the SPT N60 near the tip)")
	}
	pa, err := atmosphere(m.ID(), in.Pa)
	if err != nil {
		return Result{}, err
	}
	return finish(Result{Unlimited: units.Stress(4*in.N60) * pa}), nil
}

// DrivenN60Tip returns Meyerhof's (1976) unit tip resistance for a tip
// lb into one bearing stratum of a pile of diameter or width d:
//
//	qp = 0.4·pa·N60·lb/d ≤ 4·pa·N60
//
// with pa = 100 kPa when zero. It is the closed form of what package pile
// gives with DrivenN60 in a single drained stratum from the ground surface.
// n60, lb, d and pa must be positive (pa 0 for the default); otherwise it
// returns an error.
func DrivenN60Tip(n60 float64, lb, d units.Length, pa units.Stress) (units.Stress, error) {
	r, err := DrivenN60{}.Tip(Input{N60: n60, Pa: pa})
	if err != nil {
		return 0, err
	}
	if !(lb > 0) || !(d > 0) || !finite(float64(lb)) || !finite(float64(d)) {
		return 0, rangeErr(DrivenN60{}.ID(), "lb/d", float64(lb/d), 0, 1e6, "", "Lb and D above 0")
	}
	if q := units.Stress(0.1*float64(lb/d)) * r.Qp; q < r.Qp {
		return q, nil
	}
	return r.Qp, nil
}
