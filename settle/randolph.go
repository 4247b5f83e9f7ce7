package settle

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// RandolphWroth holds the inputs of Randolph & Wroth's (1978) closed-form
// head stiffness of a single compressible pile in elastic soil whose shear
// modulus varies linearly with depth (a Gibson soil), the pile resting on
// a stratum that may be stiffer.
type RandolphWroth struct {
	Length     units.Length // L, embedded length
	Radius     units.Length // r0, shaft radius
	BaseRadius units.Length // rb, base radius; 0 means r0 (η = 1)
	// Modulus is Ep of an equivalent solid pile: EA/(π·r0²).
	Modulus units.Stress
	// ShearTop and ShearTip are G of the soil at the head and at depth L
	// along the shaft (GL); linear between. ShearBase is Gb below the base;
	// 0 means GL (ξ = 1, no stiffer stratum).
	ShearTop, ShearTip, ShearBase units.Stress
	Poisson                       float64 // ν of the soil
}

// RandolphWrothResult holds the dimensionless groups and the head
// stiffness.
type RandolphWrothResult struct {
	Eta    float64      // η = rb/r0
	Xi     float64      // ξ = GL/Gb
	Rho    float64      // ρ = G(L/2)/GL
	Lambda float64      // λ = Ep/GL
	Rm     units.Length // rm = {0.25 + ξ[2.5ρ(1 − ν) − 0.25]}·L
	Zeta   float64      // ζ = ln(rm/r0)
	MuL    float64      // μL = √(2/(ζλ))·(L/r0)
	// Ratio is Pt/(GL·r0·wt), the dimensionless head stiffness; Rigid is
	// its limit for an incompressible pile (λ → ∞).
	Ratio, Rigid float64
	// Stiffness is Pt/wt (N/m); RigidStiffness its rigid-pile limit.
	Stiffness, RigidStiffness float64
	// TipShare is Pb/Pt, the share of the head load that reaches the base;
	// BaseRatio is wb/wt = 1/cosh(μL).
	TipShare, BaseRatio float64
}

// Equation returns the method on one line.
func (RandolphWroth) Equation() string {
	return "Pt/(GL·r0·wt) = [4η/((1 − ν)ξ) + (2πρ/ζ)·(tanh μL/μL)·(L/r0)] / [1 + (1/(πλ))·(4η/((1 − ν)ξ))·(tanh μL/μL)·(L/r0)]"
}

// Refs returns the sources of the method.
func (RandolphWroth) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.RandolphWroth1978, Where: "compressible pile in soil with G linear in depth"},
		{Source: cite.Fleming2009, Where: "ch. 3, load-settlement ratio of a single pile"}}
}

// ShearModulus returns G = E/(2(1 + ν)) of an isotropic elastic soil.
func ShearModulus(e units.Stress, nu float64) units.Stress {
	return units.Stress(float64(e) / (2 * (1 + nu)))
}

// Solve returns the head stiffness and the share of load reaching the
// base:
//
//	η = rb/r0, ξ = GL/Gb, ρ = G(L/2)/GL, λ = Ep/GL
//	rm = {0.25 + ξ[2.5ρ(1 − ν) − 0.25]}·L   (2.5·L·ρ·(1 − ν) when ξ = 1)
//	ζ = ln(rm/r0), μL = √(2/(ζλ))·(L/r0)
//	Pt/(GL·r0·wt) = [4η/((1 − ν)ξ) + (2πρ/ζ)(tanh μL/μL)(L/r0)]
//	              / [1 + (1/(πλ))(4η/((1 − ν)ξ))(tanh μL/μL)(L/r0)]
//	Pb/Pt = [4η/((1 − ν)ξ)]·[1/cosh μL] / [numerator above]
//	rigid pile: Pt/(GL·r0·wt) = 4η/((1 − ν)ξ) + 2πρL/(ζ·r0)
//
// Valid range: L, r0 > 0 with L/r0 ≥ 2 (rm > r0); rb ≥ 0; Ep > 0;
// 0 ≤ G at the head ≤ GL, GL > 0, Gb ≥ 0; ν 0 to 0.5. Source: Randolph &
// Wroth (1978); Fleming et al. (2009), ch. 3. The rm for a stiffer base
// stratum (ξ < 1) is recalled from those sources (from memory); it
// reproduces the published worked values checked in the tests.
func (rw RandolphWroth) Solve() (RandolphWrothResult, error) {
	if err := posLen("length", rw.Length); err != nil {
		return RandolphWrothResult{}, err
	}
	if err := posLen("radius", rw.Radius); err != nil {
		return RandolphWrothResult{}, err
	}
	if !(rw.BaseRadius >= 0) || math.IsInf(float64(rw.BaseRadius), 0) {
		return RandolphWrothResult{}, fmt.Errorf("base_radius: %v m is outside 0 to ∞ m", float64(rw.BaseRadius))
	}
	if err := posStress("youngs_modulus", rw.Modulus); err != nil {
		return RandolphWrothResult{}, err
	}
	if err := posStress("shear_tip", rw.ShearTip); err != nil {
		return RandolphWrothResult{}, err
	}
	if !(rw.ShearTop >= 0 && rw.ShearTop <= rw.ShearTip) {
		return RandolphWrothResult{}, fmt.Errorf("shear_top: %v kPa is outside 0 to %v kPa (G at the tip)", rw.ShearTop.KPa(), rw.ShearTip.KPa())
	}
	if !(rw.ShearBase >= 0) || math.IsInf(float64(rw.ShearBase), 0) {
		return RandolphWrothResult{}, fmt.Errorf("shear_base: %v kPa is outside 0 to ∞ kPa", rw.ShearBase.KPa())
	}
	if err := inRange("poisson", rw.Poisson, 0, 0.5); err != nil {
		return RandolphWrothResult{}, err
	}
	L, r0 := float64(rw.Length), float64(rw.Radius)
	if L/r0 < 2 {
		return RandolphWrothResult{}, fmt.Errorf("length: L/r0 = %.4g is outside 2 to ∞", L/r0)
	}
	rb := float64(rw.BaseRadius)
	if rb == 0 {
		rb = r0
	}
	gl, gb := float64(rw.ShearTip), float64(rw.ShearBase)
	if gb == 0 {
		gb = gl
	}
	nu := rw.Poisson
	var r RandolphWrothResult
	r.Eta = rb / r0
	r.Xi = gl / gb
	r.Rho = (float64(rw.ShearTop) + gl) / 2 / gl
	r.Lambda = float64(rw.Modulus) / gl
	rm := (0.25 + r.Xi*(2.5*r.Rho*(1-nu)-0.25)) * L
	if !(rm > r0) {
		return RandolphWrothResult{}, fmt.Errorf("length: rm = %.4g m is not greater than r0 = %.4g m (the pile is too short for the method)", rm, r0)
	}
	r.Rm = units.Length(rm)
	r.Zeta = math.Log(rm / r0)
	r.MuL = math.Sqrt(2/(r.Zeta*r.Lambda)) * L / r0
	base := 4 * r.Eta / ((1 - nu) * r.Xi)
	th := math.Tanh(r.MuL) / r.MuL
	num := base + 2*math.Pi*r.Rho/r.Zeta*th*L/r0
	den := 1 + 1/(math.Pi*r.Lambda)*base*th*L/r0
	r.Ratio = num / den
	r.Rigid = base + 2*math.Pi*r.Rho*L/(r.Zeta*r0)
	r.Stiffness = r.Ratio * gl * r0
	r.RigidStiffness = r.Rigid * gl * r0
	r.BaseRatio = 1 / math.Cosh(r.MuL)
	r.TipShare = base * r.BaseRatio / num
	return r, nil
}

// Settlement returns the head settlement wt = Pt/stiffness under the head
// load p (elastic: proportional to p).
func (r RandolphWrothResult) Settlement(p units.Force) units.Length {
	if r.Stiffness == 0 {
		return 0
	}
	return units.Length(float64(p) / r.Stiffness)
}
