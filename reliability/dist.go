package reliability

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// Kind is the family of a parameter's distribution.
type Kind int

const (
	// Normal: mean μ, standard deviation σ.
	Normal Kind = iota + 1
	// LogNormal: ln x normal; Mean and SD are those of x itself (μ > 0),
	// so that σln² = ln(1 + (σ/μ)²) and μln = ln μ − σln²/2.
	LogNormal
	// TruncatedNormal: a normal of mean μ and standard deviation σ (the
	// parent's) cut to [Lower, Upper]; an infinite bound is no cut.
	TruncatedNormal
	// Uniform on [Lower, Upper].
	Uniform
)

var kindIDs = [...]string{Normal: "normal", LogNormal: "lognormal", TruncatedNormal: "truncated-normal", Uniform: "uniform"}

// String returns the identifier of the kind, as the calc file writes it.
func (k Kind) String() string {
	if k >= Normal && k <= Uniform {
		return kindIDs[k]
	}
	return fmt.Sprintf("Kind(%d)", int(k))
}

// ParseKind reads a kind from its identifier.
func ParseKind(s string) (Kind, error) {
	for k := Normal; k <= Uniform; k++ {
		if kindIDs[k] == s {
			return k, nil
		}
	}
	return 0, fmt.Errorf("reliability: distribution %q: want one of normal, lognormal, truncated-normal, uniform", s)
}

// MaxCoV is the largest coefficient of variation σ/|μ| accepted for a
// normal, lognormal or truncated normal: 1. Soil parameters rarely exceed
// 0.7 (Phoon & Kulhawy 1999, Characterization of geotechnical variability,
// Can. Geotech. J. 36, table 8, from memory); beyond 1 a normal model of a
// positive quantity is meaningless.
const MaxCoV = 1.0

// Distribution is the marginal distribution of one parameter, in the
// parameter's SI unit (rad, Pa, N/m³, m, or a plain number).
type Distribution struct {
	Kind Kind
	// Mean and SD: of the variable for Normal and LogNormal; of the parent
	// normal for TruncatedNormal; unused for Uniform.
	Mean, SD float64
	// Lower and Upper bound TruncatedNormal (±Inf: no bound) and Uniform.
	Lower, Upper float64
}

// Validate checks the distribution; the error names the field (sd, cov,
// lower, upper, mean) and the accepted range.
func (d Distribution) Validate() error {
	fin := func(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
	switch d.Kind {
	case Normal, LogNormal, TruncatedNormal:
		if !fin(d.Mean) {
			return &FieldError{Field: "mean", Msg: fmt.Sprintf("%g is not a finite number", d.Mean)}
		}
		if !(d.SD >= 0) || !fin(d.SD) {
			return &FieldError{Field: "sd", Msg: fmt.Sprintf("%g is outside 0 to ∞", d.SD)}
		}
		if d.SD > MaxCoV*math.Abs(d.Mean) {
			return &FieldError{Field: "sd", Msg: fmt.Sprintf("%g gives a coefficient of variation above %g (mean %g)", d.SD, MaxCoV, d.Mean)}
		}
		if d.Kind == LogNormal && !(d.Mean > 0) {
			return &FieldError{Field: "mean", Msg: fmt.Sprintf("%g: a lognormal needs a mean above 0", d.Mean)}
		}
		if d.Kind == TruncatedNormal {
			if math.IsNaN(d.Lower) || math.IsNaN(d.Upper) || !(d.Lower < d.Upper) {
				return &FieldError{Field: "lower", Msg: fmt.Sprintf("%g to %g: want lower < upper", d.Lower, d.Upper)}
			}
			if d.SD == 0 {
				if d.Mean < d.Lower || d.Mean > d.Upper {
					return &FieldError{Field: "mean", Msg: fmt.Sprintf("%g is outside the bounds %g to %g", d.Mean, d.Lower, d.Upper)}
				}
				return nil
			}
			if _, _, z := d.truncMass(); !(z > 1e-12) {
				return &FieldError{Field: "lower", Msg: fmt.Sprintf("%g to %g holds less than 1e-12 of the parent normal (mean %g, sd %g)", d.Lower, d.Upper, d.Mean, d.SD)}
			}
		}
	case Uniform:
		if !fin(d.Lower) || !fin(d.Upper) || !(d.Lower < d.Upper) {
			return &FieldError{Field: "lower", Msg: fmt.Sprintf("%g to %g: want finite lower < upper", d.Lower, d.Upper)}
		}
	default:
		return &FieldError{Field: "distribution", Msg: fmt.Sprintf("%v: want one of normal, lognormal, truncated-normal, uniform", d.Kind)}
	}
	return nil
}

// truncMass returns Φ(α), Φ(β) and Φ(β) − Φ(α) for the truncation
// bounds in standard units of the parent normal.
func (d Distribution) truncMass() (pa, pb, z float64) {
	pa = distuv.UnitNormal.CDF((d.Lower - d.Mean) / d.SD)
	pb = distuv.UnitNormal.CDF((d.Upper - d.Mean) / d.SD)
	return pa, pb, pb - pa
}

// Moments returns the mean and standard deviation of the distribution
// itself (for TruncatedNormal, of the truncated variable:
//
//	mean = μ + σ·(φ(a) − φ(b))/Z
//	var  = σ²·[1 + (a·φ(a) − b·φ(b))/Z − ((φ(a) − φ(b))/Z)²]
//
// with a, b the bounds in standard units and Z = Φ(b) − Φ(a); Johnson,
// Kotz & Balakrishnan 1994, Continuous Univariate Distributions vol. 1,
// 2nd ed., ch. 13, from memory). d must be valid.
func (d Distribution) Moments() (mean, sd float64) {
	switch d.Kind {
	case Normal, LogNormal:
		return d.Mean, d.SD
	case TruncatedNormal:
		if d.SD == 0 {
			return d.Mean, 0
		}
		a, b := (d.Lower-d.Mean)/d.SD, (d.Upper-d.Mean)/d.SD
		_, _, z := d.truncMass()
		pa, pb := distuv.UnitNormal.Prob(a), distuv.UnitNormal.Prob(b)
		xa, xb := a*pa, b*pb
		if math.IsInf(a, 0) {
			xa = 0
		}
		if math.IsInf(b, 0) {
			xb = 0
		}
		m := (pa - pb) / z
		v := 1 + (xa-xb)/z - m*m
		return d.Mean + d.SD*m, d.SD * math.Sqrt(max(v, 0))
	case Uniform:
		u := distuv.Uniform{Min: d.Lower, Max: d.Upper}
		return u.Mean(), u.StdDev()
	}
	return 0, 0
}

// marginal is a distribution prepared for sampling: x from a standard
// normal z by x = F⁻¹(Φ(z)).
type marginal struct {
	kind       Kind
	mu, sigma  float64 // normal: μ, σ; lognormal: μln, σln; truncated: parent μ, σ
	lo, hi     float64 // truncated normal, uniform
	pa, dp     float64 // truncated normal: Φ(a) and Φ(b) − Φ(a)
	mean, sd   float64 // moments of the variable
	degenerate bool    // σ = 0: always mean
	direct     int     // directNormal, directLogNormal: transform maps z itself; directUniform, directTruncated: a probability; 0: through fromNormal
}

// The marginals transform maps without calling fromNormal. Those of
// directUniform and directTruncated (set only where no correlation is
// given, see prepare) are drawn as a probability v, uniform on [0, 1),
// instead of a normal score z, and mapped by fromProb: the same
// distribution as F⁻¹(Φ(z)) without computing Φ, which costs more than
// the rest of the sample's arithmetic for such a parameter.
const (
	directNormal = iota + 1
	directLogNormal
	directUniform
	directTruncated
)

// drawsProb reports whether the marginal's draw is a probability (see
// directUniform) rather than a standard normal score.
func (m *marginal) drawsProb() bool {
	return m.direct == directUniform || m.direct == directTruncated
}

func newMarginal(d Distribution) marginal {
	m := marginal{kind: d.Kind, mu: d.Mean, sigma: d.SD, lo: d.Lower, hi: d.Upper}
	m.mean, m.sd = d.Moments()
	switch d.Kind {
	case LogNormal:
		s2 := math.Log1p((d.SD / d.Mean) * (d.SD / d.Mean))
		m.mu, m.sigma = math.Log(d.Mean)-s2/2, math.Sqrt(s2)
	case TruncatedNormal:
		if d.SD > 0 {
			var pb float64
			m.pa, pb, m.dp = d.truncMass()
			_ = pb
		}
	}
	m.degenerate = d.Kind != Uniform && d.SD == 0
	switch {
	case m.degenerate:
	case d.Kind == Normal:
		m.direct = directNormal
	case d.Kind == LogNormal:
		m.direct = directLogNormal
	}
	return m
}

// phi is the standard normal distribution function.
func phi(z float64) float64 { return 0.5 * math.Erfc(-z/math.Sqrt2) }

// fromNormal maps a standard normal z onto the marginal: the Quantile of
// gonum's distribution at Φ(z), written in closed form for the normal
// (μ + σz) and the lognormal (exp(μln + σln·z)), which is the same map
// without the round trip through Φ.
func (m *marginal) fromNormal(z float64) float64 {
	if m.degenerate {
		return m.mean
	}
	switch m.kind {
	case Normal:
		return m.mu + m.sigma*z
	case LogNormal:
		return math.Exp(m.mu + m.sigma*z)
	case TruncatedNormal:
		u := m.pa + phi(z)*m.dp
		x := distuv.Normal{Mu: m.mu, Sigma: m.sigma}.Quantile(min(max(u, 1e-300), 1-1e-16))
		// Rounding in Φ⁻¹ may step past a bound by an ulp: keep inside.
		return min(max(x, m.lo), m.hi)
	case Uniform:
		return distuv.Uniform{Min: m.lo, Max: m.hi}.Quantile(phi(z))
	}
	panic("reliability: unknown distribution kind")
}

// fromProb maps a probability v in [0, 1) onto a uniform or truncated
// normal marginal: its quantile at v, as fromNormal computes it at v =
// Φ(z). Other kinds are not drawn this way.
func (m *marginal) fromProb(v float64) float64 {
	switch m.kind {
	case TruncatedNormal:
		u := m.pa + v*m.dp
		x := distuv.Normal{Mu: m.mu, Sigma: m.sigma}.Quantile(min(max(u, 1e-300), 1-1e-16))
		return min(max(x, m.lo), m.hi)
	case Uniform:
		return distuv.Uniform{Min: m.lo, Max: m.hi}.Quantile(v)
	}
	panic("reliability: fromProb of a distribution drawn as a normal score")
}

// bounds returns bounds on fromNormal's values (and transform's) for
// normal scores z from zlo to zhi. The map never decreases, so the bounds
// are the images of zlo and zhi: exact for μ + σz, a clamp (truncated
// normal) and the quantile of a uniform (an affine map of Φ(z), which lies
// in [0, 1]); widened by 1e-12 of the value where the map goes through exp,
// whose rounding need not keep the order of neighbouring arguments.
func (m *marginal) bounds(zlo, zhi float64) (lo, hi float64) {
	switch {
	case m.degenerate:
		return m.mean, m.mean
	case m.kind == Normal:
		return m.mu + m.sigma*zlo, m.mu + m.sigma*zhi
	case m.kind == LogNormal:
		return math.Exp(m.mu+m.sigma*zlo) * (1 - 1e-12), math.Exp(m.mu+m.sigma*zhi) * (1 + 1e-12)
	case m.kind == TruncatedNormal:
		return m.lo, m.hi
	case m.kind == Uniform:
		u := distuv.Uniform{Min: m.lo, Max: m.hi}
		return u.Quantile(0), u.Quantile(1)
	}
	return math.Inf(-1), math.Inf(1)
}

// FieldError is a bad input: the field path within the problem
// ("params[2].sd", "correlation") and what is wrong with it.
type FieldError struct {
	Path  string // the parameter or section, set by the caller of Validate
	Field string
	Msg   string
}

func (e *FieldError) Error() string {
	p := e.Path
	if e.Field != "" {
		if p != "" {
			p += "."
		}
		p += e.Field
	}
	return p + ": " + e.Msg
}
