package bearing

import (
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Vesic is Vesic's (1977) cavity-expansion method for the tip in drained
// soil, identifier "vesic":
//
//	qp  = c′·Nc* + σ′o·Nσ*
//	σ′o = (1 + 2·K0)/3 · q′                      (mean effective stress)
//	Nσ* = 3/(3 − sinφ′) · exp[(π/2 − φ′)·tanφ′] · tan²(45° + φ′/2) · Irr^[4·sinφ′/(3·(1 + sinφ′))]
//	Nc* = (Nσ* − 1)·cotφ′                        (→ (4/3)(ln Irr + 1) + π/2 + 1 as φ′ → 0)
//	Ir  = G/(c′ + q′·tanφ′),  Irr = Ir/(1 + Ir·Δ)
//
// Reads Phi (0 to 50 deg), Q, C, K0 (0 means 1 − sinφ′; else 0.1 to 4),
// Ir or G, and Delta (0 to 0.5). Irr must lie from 1 to 1e5. No limit is
// applied. Source: Vesic (1977), as presented by Das (2019).
type Vesic struct{}

// ID returns "vesic".
func (Vesic) ID() string { return "vesic" }

// Equation returns the rule on one line.
func (Vesic) Equation() string {
	return "qp = c′·Nc* + (1+2K0)/3·q′·Nσ*, Nσ*(φ′, Irr), Irr = Ir/(1+Ir·Δ)"
}

// Refs returns Vesic (1977) and Das's presentation.
func (Vesic) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Vesic1977}, {Source: cite.Das2019, Where: "Vesic's method for pile tips"}}
}

// Range returns the inputs Vesic accepts.
func (Vesic) Range() string {
	return "φ′ 0 to 50 deg; q′, c′ ≥ 0; K0 0.1 to 4; Ir 1 to 1e5; Δ 0 to 0.5"
}

// VesicNsigma returns Vesic's Nσ* for φ′ from 0 to 50 deg and Irr ≥ 1 (see
// Vesic for the formula). It is 1 at φ′ = 0.
func VesicNsigma(phi units.Angle, irr float64) (float64, error) {
	if err := checkPhi("vesic", phi, 0, 50); err != nil {
		return 0, err
	}
	if err := checkIrr("vesic", irr); err != nil {
		return 0, err
	}
	return vesicNsigma(phi, irr), nil
}

// VesicNc returns Vesic's drained Nc* = (Nσ* − 1)·cotφ′ for φ′ from 0 to
// 50 deg and Irr ≥ 1; at φ′ = 0 it is the undrained value
// (4/3)(ln Irr + 1) + π/2 + 1.
func VesicNc(phi units.Angle, irr float64) (float64, error) {
	if err := checkPhi("vesic", phi, 0, 50); err != nil {
		return 0, err
	}
	if err := checkIrr("vesic", irr); err != nil {
		return 0, err
	}
	return cohesionTerm(vesicNsigma(phi, irr), phi, vesicUndrainedNc(irr)), nil
}

func vesicNsigma(phi units.Angle, irr float64) float64 {
	s := phi.Sin()
	t := math.Tan(math.Pi/4 + float64(phi)/2)
	return 3 / (3 - s) * math.Exp((math.Pi/2-float64(phi))*phi.Tan()) * t * t *
		math.Pow(irr, 4*s/(3*(1+s)))
}

func vesicUndrainedNc(irr float64) float64 {
	return 4.0/3.0*(math.Log(irr)+1) + math.Pi/2 + 1
}

func checkIrr(id string, irr float64) error {
	if !finite(irr) || irr < 1 || irr > 1e5 {
		return rangeErr(id, "irr", irr, 1, 1e5, "", "1 to 1e+05")
	}
	return nil
}

// reducedRigidity returns Irr from Ir (or G/den when Ir is 0) and Δ.
func reducedRigidity(id string, in Input, den units.Stress) (float64, error) {
	ir := in.Ir
	if ir == 0 {
		if err := checkStress(id, "g", in.G); err != nil {
			return 0, err
		}
		if in.G == 0 {
			return 0, &RangeError{Method: id, Field: "ir", Value: "0", Range: "1 to 1e+05 (give ir, or g > 0)"}
		}
		if !(den > 0) {
			return 0, &RangeError{Method: id, Field: "g", Value: "G with zero strength", Range: "ir needs c′ + q′·tanφ′ > 0 (drained) or su > 0 (undrained)"}
		}
		ir = float64(in.G) / float64(den)
	}
	if !finite(ir) || ir < 1 || ir > 1e5 {
		return 0, rangeErr(id, "ir", ir, 1, 1e5, "", "1 to 1e+05")
	}
	if !finite(in.Delta) || in.Delta < 0 || in.Delta > 0.5 {
		return 0, rangeErr(id, "delta", in.Delta, 0, 0.5, "", "0 to 0.5")
	}
	irr := ir / (1 + ir*in.Delta)
	if irr < 1 {
		return 0, rangeErr(id, "irr", irr, 1, 1e5, "", "1 to 1e+05 (reduce delta)")
	}
	return irr, nil
}

// Tip returns Vesic's drained unit tip resistance.
func (v Vesic) Tip(in Input) (Result, error) {
	id := v.ID()
	if err := checkPhi(id, in.Phi, 0, 50); err != nil {
		return Result{}, err
	}
	if err := checkStress(id, "q", in.Q); err != nil {
		return Result{}, err
	}
	if err := checkStress(id, "c", in.C); err != nil {
		return Result{}, err
	}
	k0 := in.K0
	if k0 == 0 {
		k0 = 1 - in.Phi.Sin()
	} else if !finite(k0) || k0 < 0.1 || k0 > 4 {
		return Result{}, rangeErr(id, "k0", k0, 0.1, 4, "", "0.1 to 4 (0 for 1 − sinφ′)")
	}
	irr, err := reducedRigidity(id, in, in.C+units.Stress(float64(in.Q)*in.Phi.Tan()))
	if err != nil {
		return Result{}, err
	}
	ns := vesicNsigma(in.Phi, irr)
	r := Result{Nq: ns, Irr: irr, Sigma: units.Stress((1 + 2*k0) / 3 * float64(in.Q)), C: in.C}
	if in.C > 0 {
		r.Nc = cohesionTerm(ns, in.Phi, vesicUndrainedNc(irr))
	}
	r.Unlimited = units.Stress(r.Nc*float64(in.C) + ns*float64(r.Sigma))
	return finish(r), nil
}

// VesicUndrained is Vesic's (1977) tip in undrained clay (φ = 0),
// identifier "vesic-undrained":
//
//	qp  = Nc*·su
//	Nc* = (4/3)·(ln Irr + 1) + π/2 + 1
//	Ir  = G/su,  Irr = Ir/(1 + Ir·Δ)
//
// Reads Su (> 0), Ir or G, and Delta (usually 0 undrained). Source: Vesic
// (1977), as presented by Das (2019).
type VesicUndrained struct{}

// ID returns "vesic-undrained".
func (VesicUndrained) ID() string { return "vesic-undrained" }

// Equation returns the rule on one line.
func (VesicUndrained) Equation() string {
	return "qp = [(4/3)(ln Irr + 1) + π/2 + 1]·su, Irr = Ir/(1+Ir·Δ), Ir = G/su"
}

// Refs returns Vesic (1977) and Das's presentation.
func (VesicUndrained) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Vesic1977}, {Source: cite.Das2019, Where: "Vesic's method for pile tips, φ = 0"}}
}

// Range returns the inputs VesicUndrained accepts.
func (VesicUndrained) Range() string { return "su > 0; Ir 1 to 1e5; Δ 0 to 0.5" }

// Tip returns Vesic's undrained unit tip resistance.
func (v VesicUndrained) Tip(in Input) (Result, error) {
	id := v.ID()
	if err := checkSu(id, in.Su); err != nil {
		return Result{}, err
	}
	irr, err := reducedRigidity(id, in, in.Su)
	if err != nil {
		return Result{}, err
	}
	nc := vesicUndrainedNc(irr)
	return finish(Result{Nc: nc, Irr: irr, C: in.Su, Unlimited: units.Stress(nc * float64(in.Su))}), nil
}

func checkSu(id string, su units.Stress) error {
	k := su.KPa()
	if !finite(k) || k <= 0 || k > 1e5 {
		return rangeErr(id, "su", k, 0, 1e5, "kPa", "above 0 to 1e+05 kPa")
	}
	return nil
}
