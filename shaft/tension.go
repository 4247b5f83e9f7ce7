package shaft

import (
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// TensionInput holds what a rule for the ratio of tension to compression
// shaft capacity reads. A rule reads only the fields it needs.
type TensionInput struct {
	Slenderness       float64     // L/D, embedded length over diameter, 5 to 100
	PilePoisson       float64     // νp, Poisson's ratio of the pile, 0.1 to 0.5
	ShearModulusRatio float64     // Gav/Ep, mean soil shear modulus over pile Young's modulus, 0 to 0.1; 0 means not known
	Delta             units.Angle // δ, interface friction angle, 0° to 50°
}

// TensionResult is a ratio of tension to compression shaft capacity with
// the terms that made it. Terms a rule does not use are zero.
type TensionResult struct {
	Ratio           float64 // Qs,tension/Qs,compression, applied to the drained shaft resistance
	Eta             float64 // η, the pile compressibility term
	SlendernessTerm float64 // 1 − 0.2·log10(100/(L/D))
	Compressibility float64 // 1 − 8η + 25η²
	Flags           Flags
}

// TensionRule gives the ratio of shaft capacity in tension to that in
// compression for a pile in drained (cohesionless) soil.
type TensionRule interface {
	Method
	Tension(in TensionInput) (TensionResult, error)
}

// TensionPoisson is the ratio of tension to compression shaft capacity of
// piles in sand of De Nicola & Randolph (1993), who trace the lower
// capacity in tension chiefly to the Poisson's ratio effect of the pile
// (its radius grows under compression and shrinks under tension) and
// express it through the slenderness and the relative compressibility:
//
//	Qt/Qc = [1 − 0.2·log10(100/(L/D))]·(1 − 8η + 25η²)
//	η = νp·(L/D)·(Gav/Ep)·tan δ
//
// The form is recalled (as presented in Fleming et al. 2009, Piling
// Engineering), not read; the cause and the dependence on slenderness and
// relative compressibility are read in the paper's abstract. Accepted
// range, ours: 5 ≤ L/D ≤ 100 (the slenderness term reaches 1 at L/D = 100),
// 0.1 ≤ νp ≤ 0.5, 0 ≤ Gav/Ep ≤ 0.1, 0° ≤ δ ≤ 50°, and η ≤ 0.16, where the
// compressibility term has its minimum 0.36 (beyond it the quadratic would
// rise again). Gav/Ep = 0 means the moduli are not known: η is then 0 (a
// rigid pile, the ratio's upper bound for the slenderness) and
// NoCompressibility is set.
//
// For undrained shaft resistance in clay no reduction is made: the paper
// states that in most soils the shaft capacity is generally taken as the
// same in tension and compression, the difference being found in sand.
type TensionPoisson struct{}

func (TensionPoisson) ID() string { return "tension-poisson" }
func (TensionPoisson) Equation() string {
	return "Qt/Qc = [1 − 0.2·log10(100/(L/D))]·(1 − 8η + 25η²), η = νp·(L/D)·(Gav/Ep)·tan δ"
}
func (TensionPoisson) Valid() string {
	return "5 ≤ L/D ≤ 100, 0.1 ≤ νp ≤ 0.5, 0 ≤ Gav/Ep ≤ 0.1, 0° ≤ δ ≤ 50°, η ≤ 0.16"
}
func (TensionPoisson) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.DeNicolaRandolph1993, Where: "ratio of tensile to compressive shaft capacity in sand"},
		{Source: cite.Fleming2009, Where: "tension loading of piles in sand"}}
}

// Tension returns the ratio. It allocates nothing.
func (m TensionPoisson) Tension(in TensionInput) (TensionResult, error) {
	id := m.ID()
	if err := check(id, "slenderness", in.Slenderness, 5, 100, "", false); err != nil {
		return TensionResult{}, err
	}
	if err := check(id, "pile_poisson", in.PilePoisson, 0.1, 0.5, "", false); err != nil {
		return TensionResult{}, err
	}
	if err := check(id, "g_over_ep", in.ShearModulusRatio, 0, 0.1, "", false); err != nil {
		return TensionResult{}, err
	}
	if err := check(id, "delta", in.Delta.Degrees(), 0, maxPhiDeg, "deg", false); err != nil {
		return TensionResult{}, err
	}
	var fl Flags
	if in.ShearModulusRatio == 0 {
		fl = NoCompressibility
	}
	eta := in.PilePoisson * in.Slenderness * in.ShearModulusRatio * in.Delta.Tan()
	if err := check(id, "eta", eta, 0, 0.16, "", false); err != nil {
		return TensionResult{}, err
	}
	s := 1 - 0.2*math.Log10(100/in.Slenderness)
	c := 1 - 8*eta + 25*eta*eta
	return TensionResult{Ratio: s * c, Eta: eta, SlendernessTerm: s, Compressibility: c, Flags: fl}, nil
}

// TensionGiven is a ratio of tension to compression shaft capacity the
// engineer gives, above 0 and at most 1.
type TensionGiven struct{ Ratio float64 }

func (TensionGiven) ID() string       { return "tension-given" }
func (TensionGiven) Equation() string { return "Qt/Qc given" }
func (TensionGiven) Valid() string    { return "0 < Qt/Qc ≤ 1" }
func (TensionGiven) Refs() []cite.Ref { return nil }

// Tension returns the given ratio. It allocates nothing.
func (g TensionGiven) Tension(TensionInput) (TensionResult, error) {
	if err := check(g.ID(), "ratio", g.Ratio, 0, 1, "", true); err != nil {
		return TensionResult{}, err
	}
	return TensionResult{Ratio: g.Ratio}, nil
}
