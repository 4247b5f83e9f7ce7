package reliability

import (
	"fmt"
	"math"
	"math/rand/v2"

	"gonum.org/v1/gonum/mat"
)

// Param is one uncertain parameter: a name for the output (a calc-file
// path such as "layers[2].friction_angle") and its distribution.
type Param struct {
	Name string
	Dist Distribution
}

// Outcome is the capacity for one set of parameter values, N.
type Outcome struct {
	Compression, Tension float64
}

// Evaluator computes the capacity for one vector of parameter values (in
// the order of Problem.Params). An Evaluator is used by one goroutine at a
// time; it should not allocate.
type Evaluator interface {
	Capacity(x []float64) (Outcome, error)
}

// Model makes Evaluators, one for each worker.
type Model interface {
	NewEvaluator() (Evaluator, error)
}

// Problem is a probabilistic capacity problem.
type Problem struct {
	Params []Param
	// Correlation is the matrix of correlation coefficients between the
	// parameters (in the Gaussian copula: between their normal scores),
	// len(Params) × len(Params), symmetric, with a unit diagonal and
	// entries in [−1, 1]; nil means independent parameters. It must be
	// positive definite.
	Correlation [][]float64
	Model       Model
}

// prepared is a validated problem: its marginals and the Cholesky factor
// of its correlation matrix (nil for independent parameters).
type prepared struct {
	m     []marginal
	chol  []float64 // lower triangle, row-major n×n; nil: identity
	n     int
	probs int // the parameters drawn as a probability (marginal.drawsProb)
}

func (p *Problem) prepare() (*prepared, error) {
	if p.Model == nil {
		return nil, fmt.Errorf("reliability: no model")
	}
	n := len(p.Params)
	if n == 0 {
		return nil, &FieldError{Path: "params", Msg: "no uncertain parameter given"}
	}
	out := &prepared{n: n}
	seen := map[string]int{}
	for i, pr := range p.Params {
		if err := pr.Dist.Validate(); err != nil {
			fe := err.(*FieldError)
			fe.Path = fmt.Sprintf("params[%d]", i)
			if pr.Name != "" {
				fe.Path = pr.Name
			}
			return nil, fe
		}
		if pr.Name != "" {
			if j, ok := seen[pr.Name]; ok {
				return nil, &FieldError{Path: fmt.Sprintf("params[%d]", i), Msg: fmt.Sprintf("%q is given twice (also params[%d])", pr.Name, j)}
			}
			seen[pr.Name] = i
		}
		out.m = append(out.m, newMarginal(pr.Dist))
	}
	if p.Correlation == nil {
		// Independent parameters: a uniform or truncated normal one is
		// drawn as its probability (directUniform).
		for i := range out.m {
			m := &out.m[i]
			switch {
			case m.degenerate:
			case m.kind == Uniform:
				m.direct = directUniform
			case m.kind == TruncatedNormal:
				m.direct = directTruncated
			}
			if m.drawsProb() {
				out.probs++
			}
		}
		return out, nil
	}
	c := p.Correlation
	if len(c) != n {
		return nil, &FieldError{Path: "correlation", Msg: fmt.Sprintf("%d rows for %d parameters", len(c), n)}
	}
	sym := mat.NewSymDense(n, nil)
	for i := range n {
		if len(c[i]) != n {
			return nil, &FieldError{Path: fmt.Sprintf("correlation[%d]", i), Msg: fmt.Sprintf("%d entries for %d parameters", len(c[i]), n)}
		}
		for j := range n {
			v := c[i][j]
			if !(v >= -1 && v <= 1) {
				return nil, &FieldError{Path: fmt.Sprintf("correlation[%d][%d]", i, j), Msg: fmt.Sprintf("%g is outside −1 to 1", v)}
			}
			if i == j && v != 1 {
				return nil, &FieldError{Path: fmt.Sprintf("correlation[%d][%d]", i, j), Msg: fmt.Sprintf("%g: the diagonal must be 1", v)}
			}
			if v != c[j][i] {
				return nil, &FieldError{Path: fmt.Sprintf("correlation[%d][%d]", i, j), Msg: fmt.Sprintf("%g differs from correlation[%d][%d] = %g: want a symmetric matrix", v, j, i, c[j][i])}
			}
			if j >= i {
				sym.SetSym(i, j, v)
			}
		}
	}
	var ch mat.Cholesky
	if ok := ch.Factorize(sym); !ok {
		return nil, &FieldError{Path: "correlation", Msg: "the matrix of correlation coefficients is not positive definite: some coefficients contradict each other (a ρ of ±1, or three pairs that cannot hold together); lower their magnitudes"}
	}
	var l mat.TriDense
	ch.LTo(&l)
	out.chol = make([]float64, n*n)
	for i := range n {
		for j := 0; j <= i; j++ {
			out.chol[i*n+j] = l.At(i, j)
		}
	}
	return out, nil
}

// draw fills u with the draws of len(u)/n samples, sample after sample,
// parameter after parameter: a standard normal score, or, for a parameter
// drawn as a probability (marginal.drawsProb), a value uniform on [0, 1).
func (p *prepared) draw(rng *rand.Rand, u []float64) {
	if p.probs == 0 {
		for k := range u {
			u[k] = rng.NormFloat64()
		}
		return
	}
	for k := range u {
		if p.m[k%p.n].drawsProb() {
			u[k] = rng.Float64()
		} else {
			u[k] = rng.NormFloat64()
		}
	}
}

// transform maps independent standard normals u into the parameter
// values x: z = L·u (correlated normal scores), x = F⁻¹(Φ(z)); where no
// correlation is given, u[i] of a parameter drawn as a probability
// (marginal.drawsProb) is that probability v, and x = F⁻¹(v). It does not
// allocate.
func (p *prepared) transform(u, x []float64) {
	n := p.n
	if p.chol == nil {
		// Independent parameters: the normal and the lognormal written
		// out here as fromNormal computes them (no call per parameter).
		for i, z := range u[:n] {
			m := &p.m[i]
			switch m.direct {
			case directNormal:
				x[i] = m.mu + m.sigma*z
			case directLogNormal:
				x[i] = math.Exp(m.mu + m.sigma*z)
			case directUniform, directTruncated:
				x[i] = m.fromProb(z)
			default:
				x[i] = m.fromNormal(z)
			}
		}
		return
	}
	for i := range n {
		z := u[i]
		if p.chol != nil {
			z = 0
			row := p.chol[i*n : i*n+i+1]
			for j, l := range row {
				z += l * u[j]
			}
		}
		x[i] = p.m[i].fromNormal(z)
	}
}

// transformChunk is transform for the first c samples of a chunk: u holds
// the draws of sample s at u[s*n:(s+1)*n] (in the order they are drawn:
// normal scores, or probabilities as transform says), x parameter j of sample s at x[j*chunk+s]. Each value gets the
// bits transform gives it (the same operations in the same order). If lo
// is not nil, lo[j] and hi[j] are set to bounds on parameter j's values (a
// NaN in u, which NormFloat64 never gives, makes them NaN, which fails
// every check).
func (p *prepared) transformChunk(u, x []float64, c int, lo, hi []float64) {
	n := p.n
	if p.chol == nil {
		for i := range n {
			m := &p.m[i]
			xs := x[i*chunk : i*chunk+c]
			us := u[i:] // u[s*n+i], sample s
			// The greatest |z|, tracked where the bounds depend on it: on
			// the bits of |z|, whose order as integers is that of the
			// values (and a maximum of integers needs no branch).
			var zbits uint64 = 0x7ff << 52 // +Inf: no bound
			switch m.direct {
			case directNormal:
				mu, sigma := m.mu, m.sigma
				zbits = 0
				for s := range xs {
					z := us[s*n]
					xs[s] = mu + sigma*z
					zbits = max(zbits, math.Float64bits(z)&^(1<<63))
				}
			case directLogNormal:
				mu, sigma := m.mu, m.sigma
				zbits = 0
				for s := range xs {
					z := us[s*n]
					xs[s] = math.Exp(mu + sigma*z)
					zbits = max(zbits, math.Float64bits(z)&^(1<<63))
				}
			case directUniform, directTruncated:
				for s := range xs {
					xs[s] = m.fromProb(us[s*n])
				}
			default:
				for s := range xs {
					xs[s] = m.fromNormal(us[s*n])
				}
			}
			zm := math.Float64frombits(zbits)
			if lo != nil {
				lo[i], hi[i] = m.bounds(-zm, zm)
			}
		}
		return
	}
	for i := range n {
		row := p.chol[i*n : i*n+i+1]
		xs := x[i*chunk : i*chunk+c]
		for s := range xs {
			z := 0.0
			us := u[s*n : s*n+n]
			for j, l := range row {
				z += l * us[j]
			}
			xs[s] = p.m[i].fromNormal(z)
		}
	}
	if lo == nil {
		return
	}
	// Each score is a sum over the independent normals: bounded by the
	// greatest |u| times the sum of |l| (widened for the rounding of the
	// sums).
	um := 0.0
	for _, v := range u[:n*c] {
		um = max(um, math.Abs(v))
	}
	for i := range n {
		s := 0.0
		for _, l := range p.chol[i*n : i*n+i+1] {
			s += math.Abs(l)
		}
		zm := um * s * (1 + 1e-12)
		lo[i], hi[i] = p.m[i].bounds(-zm, zm)
	}
}

// means returns the parameters' means.
func (p *prepared) means() []float64 {
	x := make([]float64, p.n)
	for i := range p.m {
		x[i] = p.m[i].mean
	}
	return x
}

// finite reports whether v is neither NaN nor infinite.
func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
