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
//	Δ   = 0.005·(1 − (φ′ − 25°)/20°)·q′/pa       (when Δ is not given and Volume is VolumeCorrelated)
//
// Ir is Input.Ir, or G/(c′ + q′·tanφ′) from Input.G (Vesic's definition;
// G = Es/(2(1 + μs)), see ShearModulus). Δ is Input.Delta when given
// (above 0); otherwise Volume decides: VolumeCorrelated takes VesicDelta
// (φ′ 25 to 45 deg, pa from Input.Pa, default 100 kPa), VolumeIgnored
// (the zero value) takes Δ = 0, Irr = Ir, and flags the result
// VolumeChangeIgnored, because the correlation gives a lower tip in every
// sand it covers. The Result records Ir, Δ, how Δ was obtained (DeltaBy)
// and Irr, so that a report can print the equation that was used.
//
// Reads Phi (0 to 50 deg), Q, C, K0 (0 means 1 − sinφ′; else 0.1 to 4),
// Ir or G, Delta (0 to 0.5), Pa and Clamp (φ′ outside 25 to 45 deg in the
// Δ correlation is read at the edge and flagged Clamped). Irr must lie
// from 1 to 1e5. No limit is applied. Source: Vesic (1977), as presented
// by Das (2019); the Δ correlation as printed in a worked example
// reproducing Das's presentation (see VesicDelta).
//
// The reviewer's choice is Vesic{Volume: VolumeCorrelated}. With it, Nσ*
// depends on q′ through Δ, so a caller that reduces the method to
// depth-independent factors must not do so.
type Vesic struct {
	Volume VolumeChange // how Δ is obtained when Input.Delta is 0
}

// VolumeChange says how Vesic's drained methods obtain Δ when the caller
// gives none.
type VolumeChange uint8

const (
	// VolumeIgnored takes Δ = 0 (Irr = Ir) and flags the result
	// VolumeChangeIgnored.
	VolumeIgnored VolumeChange = iota
	// VolumeCorrelated takes Δ from VesicDelta(φ′, q′, pa).
	VolumeCorrelated
)

// DeltaBasis says how the Δ in a Result was obtained.
type DeltaBasis uint8

const (
	DeltaNone        DeltaBasis = iota // not a Vesic method, or Δ = 0 because volume change was ignored
	DeltaGiven                         // Input.Delta, given by the caller
	DeltaCorrelation                   // VesicDelta(φ′, q′, pa)
	DeltaUndrained                     // 0: no volume change in undrained shear
)

var deltaBasisNames = [...]string{"not used", "given", "Vesic's correlation with φ′ and q′/pa", "zero (undrained)"}

// String names the basis, such as "given".
func (b DeltaBasis) String() string {
	if int(b) < len(deltaBasisNames) {
		return deltaBasisNames[b]
	}
	return "unknown"
}

// ID returns "vesic".
func (Vesic) ID() string { return "vesic" }

// Equation returns the rule on one line. Result.DeltaBy says how the Δ of
// a result was obtained (given, correlated, or 0 when volume change is
// ignored).
func (v Vesic) Equation() string {
	if v.Volume == VolumeCorrelated {
		return "qp = c′·Nc* + (1+2K0)/3·q′·Nσ*, Nσ*(φ′, Irr), Irr = Ir/(1+Ir·Δ), Δ = 0.005·(1 − (φ′−25°)/20°)·q′/pa unless given"
	}
	return "qp = c′·Nc* + (1+2K0)/3·q′·Nσ*, Nσ*(φ′, Irr), Irr = Ir/(1+Ir·Δ)"
}

// Refs returns Vesic (1977) and Das's presentation.
func (Vesic) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Vesic1977}, {Source: cite.Das2019, Where: "Vesic's method for pile tips; Δ correlation"}}
}

// Range returns the inputs Vesic accepts.
func (v Vesic) Range() string {
	if v.Volume == VolumeCorrelated {
		return "φ′ 0 to 50 deg (25 to 45 deg when Δ is correlated); q′, c′ ≥ 0; K0 0.1 to 4; Ir 1 to 1e5; Δ 0 to 0.5; pa 50 to 150 kPa"
	}
	return "φ′ 0 to 50 deg; q′, c′ ≥ 0; K0 0.1 to 4; Ir 1 to 1e5; Δ 0 to 0.5"
}

// VesicDelta returns the average volumetric strain in the plastic zone
// below a pile tip in sand by the correlation Das presents with Vesic's
// method:
//
//	Δ = 0.005·(1 − (φ′ − 25°)/20°)·q′/pa
//
// for φ′ from 25 to 45 deg (Δ falls to 0 at 45 deg; the range is that of
// the correlation's form and of Das's text, the latter from memory), q′
// ≥ 0 and pa from 50 to 150 kPa (0 means DefaultPa). The form was read
// in a worked example of Vesic's method (a pile tip at φ′ = 42 deg, q′ =
// 210 kPa) in a published textbook that follows Das's presentation. It
// is an error outside the range.
func VesicDelta(phi units.Angle, q, pa units.Stress) (float64, error) {
	if err := checkPhi("vesic", phi, 25, 45); err != nil {
		if re, ok := err.(*RangeError); ok {
			re.Range = "25 to 45 deg (Vesic's Δ correlation); give the volumetric strain Δ, or ask for clamping at the edge"
		}
		return 0, err
	}
	if err := checkStress("vesic", "q", q); err != nil {
		return 0, err
	}
	pa, err := atmosphere("vesic", pa)
	if err != nil {
		return 0, err
	}
	return vesicDelta(phi.Degrees(), q, pa), nil
}

func vesicDelta(phiDeg float64, q, pa units.Stress) float64 {
	d := 0.005 * (1 - (phiDeg-25)/20) * float64(q) / float64(pa)
	return math.Max(d, 0) // exactly 0 at 45 deg, never −0
}

// ShearModulus returns G = E/(2·(1 + ν)) for a Young's modulus E and a
// Poisson's ratio ν from 0 to 0.5, the shear modulus in Vesic's rigidity
// index Ir = G/(c′ + q′·tanφ′) = E/[2(1 + ν)(c′ + q′·tanφ′)] (Vesic 1977,
// as Das presents it).
func ShearModulus(e units.Stress, nu float64) (units.Stress, error) {
	if err := checkStress("vesic", "e", e); err != nil {
		return 0, err
	}
	if !finite(nu) || nu < 0 || nu > 0.5 {
		return 0, rangeErr("vesic", "nu", nu, 0, 0.5, "", "0 to 0.5")
	}
	return units.Stress(float64(e) / (2 * (1 + nu))), nil
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

// rigidity returns Ir (Input.Ir, or G/den when Ir is 0).
func rigidity(id string, in Input, den units.Stress) (float64, error) {
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
	return ir, nil
}

// reduce returns Irr = Ir/(1 + Ir·Δ), checked.
func reduce(id string, ir, delta float64) (float64, error) {
	irr := ir / (1 + ir*delta)
	if irr < 1 {
		return 0, rangeErr(id, "irr", irr, 1, 1e5, "", "1 to 1e+05 (Irr = Ir/(1 + Ir·Δ): reduce delta or raise ir)")
	}
	return irr, nil
}

func checkDelta(id string, d float64) error {
	if !finite(d) || d < 0 || d > 0.5 {
		return rangeErr(id, "delta", d, 0, 0.5, "", "0 to 0.5")
	}
	return nil
}

// vesicMean returns σ′o = (1 + 2K0)/3·q′ with K0 = 1 − sinφ′ when k0 is 0.
func vesicMean(id string, phi units.Angle, q units.Stress, k0 float64) (units.Stress, error) {
	if k0 == 0 {
		k0 = 1 - phi.Sin()
	} else if !finite(k0) || k0 < 0.1 || k0 > 4 {
		return 0, rangeErr(id, "k0", k0, 0.1, 4, "", "0.1 to 4 (0 for 1 − sinφ′)")
	}
	return units.Stress((1 + 2*k0) / 3 * float64(q)), nil
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
	sigma, err := vesicMean(id, in.Phi, in.Q, in.K0)
	if err != nil {
		return Result{}, err
	}
	ir, err := rigidity(id, in, in.C+units.Stress(float64(in.Q)*in.Phi.Tan()))
	if err != nil {
		return Result{}, err
	}
	if err := checkDelta(id, in.Delta); err != nil {
		return Result{}, err
	}
	r := Result{Sigma: sigma, C: in.C, Ir: ir}
	switch {
	case in.Delta > 0:
		r.Delta, r.DeltaBy = in.Delta, DeltaGiven
	case v.Volume == VolumeCorrelated:
		d := in.Phi.Degrees()
		if d < 25-degEps || d > 45+degEps {
			if !in.Clamp {
				return Result{}, rangeErr(id, "phi", d, 25, 45, "deg", "25 to 45 deg (Vesic's Δ correlation); give the volumetric strain Δ, or ask for clamping at the edge")
			}
			d = math.Min(math.Max(d, 25), 45)
			r.Flags |= Clamped
		}
		pa, err := atmosphere(id, in.Pa)
		if err != nil {
			return Result{}, err
		}
		r.Delta, r.DeltaBy = vesicDelta(d, in.Q, pa), DeltaCorrelation
	default:
		if in.Phi > 0 && in.Q > 0 {
			r.Flags |= VolumeChangeIgnored
		}
	}
	if r.Irr, err = reduce(id, ir, r.Delta); err != nil {
		return Result{}, err
	}
	ns := vesicNsigma(in.Phi, r.Irr)
	r.Nq = ns
	if in.C > 0 {
		r.Nc = cohesionTerm(ns, in.Phi, vesicUndrainedNc(r.Irr))
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
// Reads Su (> 0), Ir or G, and Delta (0 to 0.5; 0, the usual undrained
// value, records DeltaUndrained). Source: Vesic (1977), as presented by
// Das (2019).
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
	ir, err := rigidity(id, in, in.Su)
	if err != nil {
		return Result{}, err
	}
	if err := checkDelta(id, in.Delta); err != nil {
		return Result{}, err
	}
	by := DeltaUndrained
	if in.Delta > 0 {
		by = DeltaGiven
	}
	irr, err := reduce(id, ir, in.Delta)
	if err != nil {
		return Result{}, err
	}
	nc := vesicUndrainedNc(irr)
	return finish(Result{Nc: nc, Ir: ir, Delta: in.Delta, DeltaBy: by, Irr: irr, C: in.Su, Unlimited: units.Stress(nc * float64(in.Su))}), nil
}

func checkSu(id string, su units.Stress) error {
	k := su.KPa()
	if !finite(k) || k <= 0 || k > 1e5 {
		return rangeErr(id, "su", k, 0, 1e5, "kPa", "above 0 to 1e+05 kPa")
	}
	return nil
}

// VesicGiven is Vesic's (1977) drained tip with the factors the engineer
// gives, for example read from Vesic's tables for an Irr of the site's
// own assessment, identifier "vesic-given":
//
//	qp  = c′·Nc* + σ′o·Nσ*
//	σ′o = (1 + 2·K0)/3 · q′
//
// Nsigma (Nσ*) must lie from 1 to 1e4, Nc (Nc*) from 0 to 1e4 (0 drops the
// c′ term). Reads Q, C, K0 (0 means Jaky's 1 − sinφ′, which reads Phi; else
// 0.1 to 4) and Phi (0 to 50 deg). No limit is applied. Source: Vesic
// (1977), as presented by Das (2019).
type VesicGiven struct {
	Nsigma float64 // Nσ*
	Nc     float64 // Nc*; 0 drops the c′ term
}

// ID returns "vesic-given".
func (VesicGiven) ID() string { return "vesic-given" }

// Equation returns the rule on one line.
func (VesicGiven) Equation() string {
	return "qp = c′·Nc* + (1+2K0)/3·q′·Nσ*, Nσ* and Nc* given"
}

// Refs returns Vesic (1977) and Das's presentation.
func (VesicGiven) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Vesic1977}, {Source: cite.Das2019, Where: "Vesic's method for pile tips (σ′o)"}}
}

// Range returns the inputs VesicGiven accepts.
func (VesicGiven) Range() string {
	return "Nσ* 1 to 1e4; Nc* 0 to 1e4; φ′ 0 to 50 deg; q′, c′ ≥ 0; K0 0.1 to 4"
}

// Tip returns the unit tip resistance from the given factors.
func (g VesicGiven) Tip(in Input) (Result, error) {
	id := g.ID()
	if !finite(g.Nsigma) || g.Nsigma < 1 || g.Nsigma > 1e4 {
		return Result{}, rangeErr(id, "nsigma", g.Nsigma, 1, 1e4, "", "1 to 1e+04")
	}
	if !finite(g.Nc) || g.Nc < 0 || g.Nc > 1e4 {
		return Result{}, rangeErr(id, "nc", g.Nc, 0, 1e4, "", "0 to 1e+04")
	}
	if err := checkPhi(id, in.Phi, 0, 50); err != nil {
		return Result{}, err
	}
	if err := checkStress(id, "q", in.Q); err != nil {
		return Result{}, err
	}
	if err := checkStress(id, "c", in.C); err != nil {
		return Result{}, err
	}
	sigma, err := vesicMean(id, in.Phi, in.Q, in.K0)
	if err != nil {
		return Result{}, err
	}
	r := Result{Nq: g.Nsigma, Nc: g.Nc, Sigma: sigma, C: in.C}
	r.Unlimited = units.Stress(g.Nc*float64(in.C) + g.Nsigma*float64(sigma))
	return finish(r), nil
}
