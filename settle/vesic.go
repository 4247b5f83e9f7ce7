package settle

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/units"
)

// Distribution factors ξ for the elastic shortening of Vesic's method: the
// mean axial force in the pile is Qwp + ξ·Qws. With unit shaft resistance
// uniform along the shaft the force falls linearly from the head and
// ξ = 1/2; with unit shaft resistance rising linearly from zero at the head
// (a triangle) ξ = 2/3 (Das 0.67). Both follow from integrating the axial
// force over the length (closed form).
const (
	XiUniform    = 0.5
	XiTriangular = 2.0 / 3
)

// DefaultIwp is the influence factor of the tip settlement in Vesic's
// elastic form, 0.85, as presented by Das (2019).
const DefaultIwp = 0.85

// TipForm selects how Vesic's method gives the settlement caused by the
// load at the tip and along the shaft.
type TipForm int

const (
	// Elastic is the influence-factor form: se2 from qwp, D, Es, νs and Iwp;
	// se3 from Qws/(p·L), D, Es, νs and Iws.
	Elastic TipForm = iota
	// Empirical is the coefficient form: se2 = Qwp·Cp/(D·qp) and
	// se3 = Qws·Cs/(L·qp) with Cs = (0.93 + 0.16·√(L/D))·Cp.
	Empirical
)

// String returns the form's identifier: "elastic" or "empirical".
func (f TipForm) String() string {
	switch f {
	case Elastic:
		return "elastic"
	case Empirical:
		return "empirical"
	}
	return fmt.Sprintf("TipForm(%d)", int(f))
}

// Vesic holds the inputs of Vesic's (1977) three-component settlement of a
// single pile at working load, as presented by Das (2019). Lengths in
// metres, forces in newtons, stresses in pascals (the units types).
type Vesic struct {
	Length    units.Length // L, embedded length
	Diameter  units.Length // D, diameter or width
	Area      units.Area   // Ap, area of the cross-section (and of the tip)
	Perimeter units.Length // p, perimeter of the shaft
	Modulus   units.Stress // Ep, Young's modulus of the pile material

	TipLoad   units.Force // Qwp, load carried at the tip under the working load
	ShaftLoad units.Force // Qws, load carried by the shaft under the working load
	Xi        float64     // ξ, 0 to 1 (XiUniform, XiTriangular)

	Form TipForm

	// Elastic form: Es and νs of the soil (at and below the tip for se2,
	// along the shaft for se3: one modulus here, as in the source), and
	// Iwp (0 means DefaultIwp).
	SoilModulus units.Stress
	Poisson     float64
	Iwp         float64

	// Empirical form: the ultimate unit tip resistance qp and the
	// coefficient Cp (see CpRange).
	UnitTip units.Stress
	Cp      float64
}

// VesicResult is the settlement and its three components.
type VesicResult struct {
	Shortening units.Length // se1, elastic shortening of the pile
	Tip        units.Length // se2, from the load at the tip
	Shaft      units.Length // se3, from the load along the shaft
	Total      units.Length // se1 + se2 + se3
	Iwp        float64      // the tip influence factor used (elastic form)
	Iws        float64      // 2 + 0.35·√(L/D) (elastic form)
	Cs         float64      // (0.93 + 0.16·√(L/D))·Cp (empirical form)
}

// Equation returns the method on one line.
func (v Vesic) Equation() string {
	if v.Form == Empirical {
		return "s = (Qwp + ξ·Qws)·L/(Ap·Ep) + Qwp·Cp/(D·qp) + Qws·Cs/(L·qp), Cs = (0.93 + 0.16·√(L/D))·Cp"
	}
	return "s = (Qwp + ξ·Qws)·L/(Ap·Ep) + (qwp·D/Es)(1 − νs²)·Iwp + (Qws/(p·L))·(D/Es)(1 − νs²)·Iws, Iws = 2 + 0.35·√(L/D)"
}

// Refs returns the sources of the method.
func (Vesic) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Vesic1977, Where: "settlement of single piles"},
		{Source: cite.Das2019, Where: "elastic settlement of piles (Vesic's three components; Cp by soil and installation)"}}
}

// Iws returns Vesic's shaft influence factor 2 + 0.35·√(L/D).
func Iws(l, d units.Length) float64 { return 2 + 0.35*math.Sqrt(float64(l)/float64(d)) }

// Cs returns the empirical shaft coefficient (0.93 + 0.16·√(L/D))·Cp.
func Cs(l, d units.Length, cp float64) float64 {
	return (0.93 + 0.16*math.Sqrt(float64(l)/float64(d))) * cp
}

func posLen(name string, v units.Length) error {
	if !(v > 0) || math.IsInf(float64(v), 0) {
		return fmt.Errorf("%s: %v m is outside (0, ∞) m", name, float64(v))
	}
	return nil
}

func posStress(name string, v units.Stress) error {
	if !(v > 0) || math.IsInf(float64(v), 0) {
		return fmt.Errorf("%s: %v kPa is outside (0, ∞) kPa", name, v.KPa())
	}
	return nil
}

func nonNegForce(name string, v units.Force) error {
	if !(v >= 0) || math.IsInf(float64(v), 0) {
		return fmt.Errorf("%s: %v kN is outside 0 to ∞ kN", name, v.KN())
	}
	return nil
}

func inRange(name string, v, lo, hi float64) error {
	if !(v >= lo && v <= hi) {
		return fmt.Errorf("%s: %v is outside %v to %v", name, v, lo, hi)
	}
	return nil
}

// Settlement returns the three components and their sum.
//
//	se1 = (Qwp + ξ·Qws)·L/(Ap·Ep)
//	elastic:   se2 = (qwp·D/Es)(1 − νs²)·Iwp, qwp = Qwp/Ap
//	           se3 = (Qws/(p·L))·(D/Es)(1 − νs²)·Iws, Iws = 2 + 0.35·√(L/D)
//	empirical: se2 = Qwp·Cp/(D·qp)
//	           se3 = Qws·Cs/(L·qp), Cs = (0.93 + 0.16·√(L/D))·Cp
//
// Valid range: L, D, Ap, p, Ep > 0; Qwp, Qws ≥ 0; ξ 0 to 1; elastic:
// Es > 0, νs 0 to 0.5, Iwp 0 to 2 (0 means 0.85); empirical: qp > 0,
// Cp 0 to 0.5. Source: Vesic (1977) as presented by Das (2019).
func (v Vesic) Settlement() (VesicResult, error) {
	errs := []error{
		posLen("length", v.Length), posLen("diameter", v.Diameter), posLen("perimeter", v.Perimeter),
		posStress("youngs_modulus", v.Modulus), nonNegForce("tip_load", v.TipLoad), nonNegForce("shaft_load", v.ShaftLoad),
		inRange("xi", v.Xi, 0, 1),
	}
	if !(v.Area > 0) || math.IsInf(float64(v.Area), 0) {
		errs = append(errs, fmt.Errorf("area: %v m2 is outside (0, ∞) m2", float64(v.Area)))
	}
	switch v.Form {
	case Elastic:
		errs = append(errs, posStress("soil_modulus", v.SoilModulus), inRange("poisson", v.Poisson, 0, 0.5),
			inRange("iwp", v.Iwp, 0, 2))
	case Empirical:
		errs = append(errs, posStress("unit_tip", v.UnitTip), inRange("cp", v.Cp, 0, 0.5))
	default:
		errs = append(errs, fmt.Errorf("form: %v is not elastic or empirical", v.Form))
	}
	for _, e := range errs {
		if e != nil {
			return VesicResult{}, e
		}
	}
	L, D, A := float64(v.Length), float64(v.Diameter), float64(v.Area)
	qwp, qws := float64(v.TipLoad), float64(v.ShaftLoad)
	var r VesicResult
	r.Shortening = units.Length((qwp + v.Xi*qws) * L / (A * float64(v.Modulus)))
	switch v.Form {
	case Elastic:
		iwp := v.Iwp
		if iwp == 0 {
			iwp = DefaultIwp
		}
		es, nu2 := float64(v.SoilModulus), 1-v.Poisson*v.Poisson
		r.Iwp, r.Iws = iwp, Iws(v.Length, v.Diameter)
		r.Tip = units.Length(qwp / A * D / es * nu2 * iwp)
		r.Shaft = units.Length(qws / (float64(v.Perimeter) * L) * D / es * nu2 * r.Iws)
	case Empirical:
		qp := float64(v.UnitTip)
		r.Cs = Cs(v.Length, v.Diameter, v.Cp)
		r.Tip = units.Length(qwp * v.Cp / (D * qp))
		r.Shaft = units.Length(qws * r.Cs / (L * qp))
	}
	r.Total = r.Shortening + r.Tip + r.Shaft
	return r, nil
}

// Soil is the soil at the tip for the table of Cp.
type Soil int

const (
	Sand Soil = iota // sand, dense to loose
	Clay             // clay, stiff to soft
	Silt             // silt, dense to loose
)

// String returns "sand", "clay" or "silt".
func (s Soil) String() string {
	switch s {
	case Sand:
		return "sand"
	case Clay:
		return "clay"
	case Silt:
		return "silt"
	}
	return fmt.Sprintf("Soil(%d)", int(s))
}

// CpRange returns Vesic's (1977) typical Cp, from the dense (stiff) end to
// the loose (soft) end, as tabulated by Das (2019) (values from memory: not
// read in the source here):
//
//	soil  driven      bored
//	sand  0.02-0.04   0.09-0.18
//	clay  0.02-0.03   0.03-0.06
//	silt  0.03-0.05   0.09-0.12
//
// The high end gives the larger settlement; a reviewer expects it unless
// the soil is known to be dense or stiff. Driven piles (high or low
// displacement) take the driven column; bored, augered (CFA) and jetted
// piles the bored one, the larger values (our choice: the table has only
// the two columns).
func CpRange(s Soil, i pile.Installation) (lo, hi float64, err error) {
	if i < pile.DrivenHigh || i > pile.Jetted {
		return 0, 0, fmt.Errorf("cp: installation %v: want driven-high, driven-low, bored, augered or jetted", i)
	}
	col := 1
	if i.Driven() {
		col = 0
	}
	tab := map[Soil][2][2]float64{
		Sand: {{0.02, 0.04}, {0.09, 0.18}},
		Clay: {{0.02, 0.03}, {0.03, 0.06}},
		Silt: {{0.03, 0.05}, {0.09, 0.12}},
	}
	v, ok := tab[s]
	if !ok {
		return 0, 0, fmt.Errorf("cp: soil %v: want sand, clay or silt", s)
	}
	return v[col][0], v[col][1], nil
}
