package shaft

import (
	"errors"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// KValue is a lateral earth pressure coefficient on the shaft and what it
// was made from. Fields a rule does not use are zero.
type KValue struct {
	K     float64 // coefficient used
	K0    float64 // at-rest coefficient, where K is a ratio of it
	Kp    float64 // passive coefficient, where K is a ratio of it
	Ratio float64 // K/K0 or K/Kp
}

// KRule gives K, the coefficient of lateral earth pressure on the shaft, for
// the β method.
type KRule interface {
	Method
	KOf(p Point) (KValue, error)
}

// DeltaRule gives δ, the friction angle between soil and shaft, for the β
// method. The ratio δ/φ′ is returned where the rule uses one, else 0.
type DeltaRule interface {
	Method
	DeltaOf(p Point) (delta units.Angle, ratio float64, err error)
}

// KGiven is a K the engineer gives, 0 to 10.
type KGiven struct{ K float64 }

func (KGiven) ID() string       { return "k-given" }
func (KGiven) Equation() string { return "K given" }
func (KGiven) Valid() string    { return "0 ≤ K ≤ 10" }
func (KGiven) Refs() []cite.Ref { return nil }
func (g KGiven) KOf(Point) (KValue, error) {
	if err := check(g.ID(), "k", g.K, 0, 10, "", false); err != nil {
		return KValue{}, err
	}
	return KValue{K: g.K}, nil
}

// KJaky is the at-rest coefficient of normally consolidated soil
// (Jaky 1944, simplified form), used as K:
//
//	K = K0 = 1 − sin φ′
//
// It reads φ′ (above 0°, at most 50°).
type KJaky struct{}

func (KJaky) ID() string       { return "k0-jaky" }
func (KJaky) Equation() string { return "K = K0 = 1 − sin φ′" }
func (KJaky) Valid() string    { return "0° < φ′ ≤ 50°" }
func (KJaky) Refs() []cite.Ref { return []cite.Ref{{Source: cite.Jaky1944}} }
func (j KJaky) KOf(p Point) (KValue, error) {
	if err := checkPhi(j.ID(), p.Phi); err != nil {
		return KValue{}, err
	}
	k0 := 1 - p.Phi.Sin()
	return KValue{K: k0, K0: k0}, nil
}

// KMayneKulhawy is the at-rest coefficient of overconsolidated soil in
// unloading (Mayne & Kulhawy 1982), used as K:
//
//	K = K0 = (1 − sin φ′)·OCR^(sin φ′)
//
// It reads φ′ (above 0°, at most 50°) and OCR (1 to 100; 0 reads as 1, when
// it is Jaky's K0). With OCR = σ′p/σ′v and δ = φ′ this is the β of Brown et
// al. (2010, GEC 10) for drilled shafts in cohesionless soil.
type KMayneKulhawy struct{}

func (KMayneKulhawy) ID() string       { return "k0-ocr" }
func (KMayneKulhawy) Equation() string { return "K = K0 = (1 − sin φ′)·OCR^(sin φ′)" }
func (KMayneKulhawy) Valid() string    { return "0° < φ′ ≤ 50°, 1 ≤ OCR ≤ 100" }
func (KMayneKulhawy) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.MayneKulhawy1982}, {Source: cite.Jaky1944}}
}
func (m KMayneKulhawy) KOf(p Point) (KValue, error) {
	k0, err := k0OCR(m.ID(), p)
	if err != nil {
		return KValue{}, err
	}
	return KValue{K: k0, K0: k0}, nil
}

func k0OCR(id string, p Point) (float64, error) {
	if err := checkPhi(id, p.Phi); err != nil {
		return 0, err
	}
	if err := checkOCR(id, p); err != nil {
		return 0, err
	}
	s := p.Phi.Sin()
	return (1 - s) * math.Pow(p.ocr(), s), nil
}

// KOverK0 is K as a ratio of the at-rest coefficient, the form of Kulhawy
// (1984):
//
//	K = (K/K0)·(1 − sin φ′)·OCR^(sin φ′)
//
// Ratio is K/K0, above 0 and at most 3; Installation.KOverK0 gives the
// published range by installation and KOverK0For a default within it. It
// reads φ′ (above 0°, at most 50°) and OCR (1 to 100; 0 reads as 1).
type KOverK0 struct{ Ratio float64 }

func (KOverK0) ID() string       { return "k-over-k0" }
func (KOverK0) Equation() string { return "K = (K/K0)·(1 − sin φ′)·OCR^(sin φ′)" }
func (KOverK0) Valid() string    { return "0 < K/K0 ≤ 3, 0° < φ′ ≤ 50°, 1 ≤ OCR ≤ 100" }
func (KOverK0) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Kulhawy1984, Where: "K/K0 by installation"}, {Source: cite.MayneKulhawy1982}}
}
func (r KOverK0) KOf(p Point) (KValue, error) {
	if err := check(r.ID(), "k_over_k0", r.Ratio, 0, 3, "", true); err != nil {
		return KValue{}, err
	}
	k0, err := k0OCR(r.ID(), p)
	if err != nil {
		return KValue{}, err
	}
	return KValue{K: r.Ratio * k0, K0: k0, Ratio: r.Ratio}, nil
}

// KOverK0For returns the K/K0 rule with the middle of the published range
// for the installation (Kulhawy 1984; ranges recalled, see Installation).
func KOverK0For(i Installation) (KOverK0, error) {
	r, err := i.KOverK0()
	if err != nil {
		return KOverK0{}, err
	}
	return KOverK0{Ratio: r.Mid()}, nil
}

// KOverKp is K as a ratio of Rankine's passive coefficient:
//
//	K = (K/Kp)·tan²(45° + φ′/2)
//
// Ratio is K/Kp, above 0 and at most 1. It reads φ′ (above 0°, at most 50°).
type KOverKp struct{ Ratio float64 }

func (KOverKp) ID() string       { return "k-over-kp" }
func (KOverKp) Equation() string { return "K = (K/Kp)·tan²(45° + φ′/2)" }
func (KOverKp) Valid() string    { return "0 < K/Kp ≤ 1, 0° < φ′ ≤ 50°" }
func (KOverKp) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Craig2012, Where: "Rankine passive coefficient"}}
}
func (r KOverKp) KOf(p Point) (KValue, error) {
	if err := check(r.ID(), "k_over_kp", r.Ratio, 0, 1, "", true); err != nil {
		return KValue{}, err
	}
	if err := checkPhi(r.ID(), p.Phi); err != nil {
		return KValue{}, err
	}
	t := math.Tan(math.Pi/4 + float64(p.Phi)/2)
	kp := t * t
	return KValue{K: r.Ratio * kp, Kp: kp, Ratio: r.Ratio}, nil
}

// DeltaGiven is a δ the engineer gives, 0° to 50°.
type DeltaGiven struct{ Delta units.Angle }

func (DeltaGiven) ID() string       { return "delta-given" }
func (DeltaGiven) Equation() string { return "δ given" }
func (DeltaGiven) Valid() string    { return "0° ≤ δ ≤ 50°" }
func (DeltaGiven) Refs() []cite.Ref { return nil }
func (g DeltaGiven) DeltaOf(Point) (units.Angle, float64, error) {
	if err := check(g.ID(), "delta", g.Delta.Degrees(), 0, maxPhiDeg, "deg", false); err != nil {
		return 0, 0, err
	}
	return g.Delta, 0, nil
}

// DeltaOverPhi is δ as a ratio of φ′, the form of Kulhawy (1984):
//
//	δ = (δ/φ′)·φ′
//
// Ratio is δ/φ′, above 0 and at most 1; Surface.DeltaOverPhi gives the
// published range by shaft surface and DeltaOverPhiFor a default within it.
// It reads φ′ (above 0°, at most 50°).
type DeltaOverPhi struct{ Ratio float64 }

func (DeltaOverPhi) ID() string       { return "delta-over-phi" }
func (DeltaOverPhi) Equation() string { return "δ = (δ/φ′)·φ′" }
func (DeltaOverPhi) Valid() string    { return "0 < δ/φ′ ≤ 1, 0° < φ′ ≤ 50°" }
func (DeltaOverPhi) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Kulhawy1984, Where: "δ/φ′ by interface"}}
}
func (r DeltaOverPhi) DeltaOf(p Point) (units.Angle, float64, error) {
	if err := check(r.ID(), "delta_over_phi", r.Ratio, 0, 1, "", true); err != nil {
		return 0, 0, err
	}
	if err := checkPhi(r.ID(), p.Phi); err != nil {
		return 0, 0, err
	}
	return units.Angle(r.Ratio) * p.Phi, r.Ratio, nil
}

// DeltaOverPhiFor returns the δ/φ′ rule with the middle of the published
// range for the surface (Kulhawy 1984; ranges recalled, see Surface).
func DeltaOverPhiFor(s Surface) (DeltaOverPhi, error) {
	r, err := s.DeltaOverPhi()
	if err != nil {
		return DeltaOverPhi{}, err
	}
	return DeltaOverPhi{Ratio: r.Mid()}, nil
}

// Beta is the β (effective stress) method with K and δ chosen separately:
//
//	fs = K·σ′v·tan δ,  β = K·tan δ
//
// It reads σ′v (0 to 20 MPa) and what the K and δ rules read. Both rules
// must be set.
type Beta struct {
	K     KRule
	Delta DeltaRule
}

func (Beta) ID() string       { return "beta" }
func (Beta) Equation() string { return "fs = K·σ′v·tan δ" }
func (b Beta) Valid() string {
	v := "0 ≤ σ′v ≤ 20 MPa"
	if b.K != nil {
		v += "; K: " + b.K.Valid()
	}
	if b.Delta != nil {
		v += "; δ: " + b.Delta.Valid()
	}
	return v
}

// Refs returns the sources of the chosen K and δ rules.
func (b Beta) Refs() []cite.Ref {
	var out []cite.Ref
	if b.K != nil {
		out = append(out, b.K.Refs()...)
	}
	if b.Delta != nil {
		out = append(out, b.Delta.Refs()...)
	}
	return out
}

var errBetaRules = errors.New("shaft: beta: K and delta rules must both be set")

func (b Beta) Unit(p Point) (Result, error) {
	if b.K == nil || b.Delta == nil {
		return Result{}, errBetaRules
	}
	if err := checkSigmaV(b.ID(), p.SigmaV); err != nil {
		return Result{}, err
	}
	kv, err := b.K.KOf(p)
	if err != nil {
		return Result{}, err
	}
	d, dr, err := b.Delta.DeltaOf(p)
	if err != nil {
		return Result{}, err
	}
	beta := kv.K * d.Tan()
	fs := units.Stress(beta) * p.SigmaV
	return Result{Fs: fs, Unlimited: fs, SigmaV: p.SigmaV, K: kv.K, K0: kv.K0, Kp: kv.Kp, KRatio: kv.Ratio,
		Delta: d, DeltaRatio: dr, Beta: beta}, nil
}

// BetaGiven is the β method with β given, 0 to 3:
//
//	fs = β·σ′v
//
// It reads σ′v (0 to 20 MPa).
type BetaGiven struct{ Beta float64 }

func (BetaGiven) ID() string       { return "beta-given" }
func (BetaGiven) Equation() string { return "fs = β·σ′v" }
func (BetaGiven) Valid() string    { return "0 ≤ β ≤ 3, 0 ≤ σ′v ≤ 20 MPa" }
func (BetaGiven) Refs() []cite.Ref { return nil }
func (g BetaGiven) Unit(p Point) (Result, error) {
	if err := check(g.ID(), "beta", g.Beta, 0, 3, "", false); err != nil {
		return Result{}, err
	}
	if err := checkSigmaV(g.ID(), p.SigmaV); err != nil {
		return Result{}, err
	}
	fs := units.Stress(g.Beta) * p.SigmaV
	return Result{Fs: fs, Unlimited: fs, SigmaV: p.SigmaV, Beta: g.Beta}, nil
}

// Burland is Burland's (1973) β for clays in drained loading, with the
// overconsolidation term in the form usually presented with it:
//
//	β = (1 − sin φ′)·tan φ′·OCR^0.5,  fs = β·σ′v
//
// so K = (1 − sin φ′)·OCR^0.5 and δ = φ′. It reads σ′v (0 to 20 MPa), φ′
// (above 0°, at most 50°) and OCR (1 to 100; 0 reads as 1).
type Burland struct{}

func (Burland) ID() string       { return "beta-burland" }
func (Burland) Equation() string { return "fs = (1 − sin φ′)·tan φ′·OCR^0.5·σ′v" }
func (Burland) Valid() string {
	return "0° < φ′ ≤ 50°, 1 ≤ OCR ≤ 100, 0 ≤ σ′v ≤ 20 MPa"
}
func (Burland) Refs() []cite.Ref { return []cite.Ref{{Source: cite.Burland1973}} }
func (m Burland) Unit(p Point) (Result, error) {
	id := m.ID()
	if err := checkSigmaV(id, p.SigmaV); err != nil {
		return Result{}, err
	}
	if err := checkPhi(id, p.Phi); err != nil {
		return Result{}, err
	}
	if err := checkOCR(id, p); err != nil {
		return Result{}, err
	}
	k0 := 1 - p.Phi.Sin()
	k := k0 * math.Sqrt(p.ocr())
	beta := k * p.Phi.Tan()
	fs := units.Stress(beta) * p.SigmaV
	return Result{Fs: fs, Unlimited: fs, SigmaV: p.SigmaV, K: k, K0: k0, Delta: p.Phi, DeltaRatio: 1, Beta: beta}, nil
}

// DrilledSand is the depth-dependent β of O'Neill & Reese (1999) for drilled
// shafts in cohesionless soil, as given in FHWA GEC 10 (Brown et al. 2010),
// with its bounds and its reduction for loose sand:
//
//	β = 1.5 − 0.135·(z/ft)^0.5, held to 0.25 ≤ β ≤ 1.2   (N60 ≥ 15)
//	β = (N60/15)·β above                                 (N60 < 15)
//	fs = β·σ′v
//
// The US form is exact; in SI it reads 1.5 − 0.245·(z/m)^0.5. The bounds are
// applied before the reduction, so a loose sand may have β below 0.25
// (recalled, see the package doc). It reads σ′v (0 to 20 MPa), z (0 to
// 300 m) and N60 (above 0, at most 100). BoundApplied is set when a bound
// replaced the raw β.
type DrilledSand struct{}

func (DrilledSand) ID() string { return "beta-drilled-sand" }
func (DrilledSand) Equation() string {
	return "fs = β·σ′v, β = 1.5 − 0.135·√(z/ft) in 0.25..1.2, ×N60/15 if N60 < 15"
}
func (DrilledSand) Valid() string {
	return "0 ≤ z ≤ 300 m, 0 < N60 ≤ 100, 0 ≤ σ′v ≤ 20 MPa"
}
func (DrilledSand) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.ONeillReese1999, Where: "β method for cohesionless soil"},
		{Source: cite.Brown2010, Where: "ch. 13, side resistance in cohesionless soil"}}
}
func (m DrilledSand) Unit(p Point) (Result, error) {
	id := m.ID()
	if err := checkSigmaV(id, p.SigmaV); err != nil {
		return Result{}, err
	}
	if err := checkDepth(id, p.Depth); err != nil {
		return Result{}, err
	}
	if err := checkN60(id, p.N60); err != nil {
		return Result{}, err
	}
	var fl Flags
	beta := 1.5 - 0.135*math.Sqrt(p.Depth.Feet())
	switch {
	case beta > 1.2:
		beta, fl = 1.2, BoundApplied
	case beta < 0.25:
		beta, fl = 0.25, BoundApplied
	}
	if p.N60 < 15 {
		beta *= p.N60 / 15
	}
	fs := units.Stress(beta) * p.SigmaV
	return Result{Fs: fs, Unlimited: fs, SigmaV: p.SigmaV, Beta: beta, Flags: fl}, nil
}

// DrilledSandK0 is the β of Brown et al. (2010, FHWA GEC 10) for drilled
// shafts in cohesionless soil, from the at-rest coefficient of Mayne &
// Kulhawy (1982) with δ = φ′ and K0 held to at most Kp:
//
//	K0 = (1 − sin φ′)·(σ′p/σ′v)^(sin φ′) ≤ tan²(45° + φ′/2)
//	β = K0·tan φ′,  fs = β·σ′v
//
// Point.OCR carries σ′p/σ′v. The Kp cap is recalled, not read (see the
// package doc). It reads σ′v (0 to 20 MPa), φ′ (above 0°, at most 50°) and
// σ′p/σ′v (1 to 100; 0 reads as 1). BoundApplied is set when Kp governs.
type DrilledSandK0 struct{}

func (DrilledSandK0) ID() string { return "beta-drilled-k0" }
func (DrilledSandK0) Equation() string {
	return "fs = K0·tan φ′·σ′v, K0 = (1 − sin φ′)·(σ′p/σ′v)^sin φ′ ≤ Kp"
}
func (DrilledSandK0) Valid() string {
	return "0° < φ′ ≤ 50°, 1 ≤ σ′p/σ′v ≤ 100, 0 ≤ σ′v ≤ 20 MPa"
}
func (DrilledSandK0) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Brown2010, Where: "ch. 13, β method for cohesionless soil"}, {Source: cite.MayneKulhawy1982}}
}
func (m DrilledSandK0) Unit(p Point) (Result, error) {
	if err := checkSigmaV(m.ID(), p.SigmaV); err != nil {
		return Result{}, err
	}
	k0, err := k0OCR(m.ID(), p)
	if err != nil {
		return Result{}, err
	}
	t := math.Tan(math.Pi/4 + float64(p.Phi)/2)
	kp := t * t
	k := k0
	var fl Flags
	if k > kp {
		k, fl = kp, BoundApplied
	}
	beta := k * p.Phi.Tan()
	fs := units.Stress(beta) * p.SigmaV
	return Result{Fs: fs, Unlimited: fs, SigmaV: p.SigmaV, K: k, K0: k0, Kp: kp, Delta: p.Phi, DeltaRatio: 1,
		Beta: beta, Flags: fl}, nil
}
