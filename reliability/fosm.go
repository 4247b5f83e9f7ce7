package reliability

import (
	"cmp"
	"fmt"
	"math"
	"slices"
)

// FOSMStep is the step of the central differences of FOSM, in standard
// deviations of each parameter: h = FOSMStep·σ, and
//
//	∂R/∂x ≈ (R(μ + h) − R(μ − h))/(2h)
//
// exact (to rounding) for a capacity linear in the parameter; for a
// smooth nonlinear one the error is of order h²·R‴/6.
const FOSMStep = 0.01

// Sensitivity is one parameter's part in the FOSM estimate of one
// capacity.
type Sensitivity struct {
	Param string
	// Derivative is ∂R/∂x at the means (N per SI unit of the parameter).
	Derivative float64
	// PerSD is ∂R/∂x·σ: the change of R for one standard deviation, N.
	PerSD float64
	// Share is the parameter's share of σR²: PerSD·Σj ρij·PerSDj / σR²
	// (0 where σR = 0); the shares sum to 1.
	Share float64
}

// FOSMEstimate is the first-order second-moment estimate of one capacity.
type FOSMEstimate struct {
	Mean, SD, CoV float64 // N; CoV 0 where Mean is 0
	HasLoad       bool
	Load          float64
	Beta          float64 // (Mean − Load)/SD
	BetaDefined   bool    // false where SD = 0 (or no load)
	// Ranking lists the parameters by |PerSD|, largest first (ties in
	// parameter order).
	Ranking []Sensitivity
}

// FOSMResult is the FOSM estimate of compression and tension capacity.
type FOSMResult struct {
	Step                 float64 // FOSMStep
	Compression, Tension FOSMEstimate
}

// FOSM estimates the mean and standard deviation of the capacities by the
// first-order second-moment method (see the package documentation), with
// the loads of opt (Samples, Seed and Workers are not used). The means
// and standard deviations of truncated normals are those of the truncated
// variable (Distribution.Moments).
func FOSM(p Problem, opt Options) (*FOSMResult, error) {
	pp, err := p.prepare()
	if err != nil {
		return nil, err
	}
	ev, err := p.Model.NewEvaluator()
	if err != nil {
		return nil, err
	}
	n := pp.n
	mu := pp.means()
	at := func(x []float64) (Outcome, error) {
		o, err := ev.Capacity(x)
		if err == nil && (!finite(o.Compression) || !finite(o.Tension)) {
			err = fmt.Errorf("the model gave no finite capacity")
		}
		return o, err
	}
	r0, err := at(mu)
	if err != nil {
		return nil, fmt.Errorf("reliability: FOSM at the means: %w", err)
	}
	gc := make([]float64, n) // ∂Rc/∂x·σ
	gt := make([]float64, n)
	dc := make([]float64, n)
	dt := make([]float64, n)
	x := slices.Clone(mu)
	for i := range n {
		sd := pp.m[i].sd
		if sd == 0 {
			continue
		}
		h := FOSMStep * sd
		x[i] = mu[i] + h
		up, err := at(x)
		if err != nil {
			return nil, fmt.Errorf("reliability: FOSM at %s + %g: %w", p.name(i), h, err)
		}
		x[i] = mu[i] - h
		dn, err := at(x)
		if err != nil {
			return nil, fmt.Errorf("reliability: FOSM at %s − %g: %w", p.name(i), h, err)
		}
		x[i] = mu[i]
		dc[i] = (up.Compression - dn.Compression) / (2 * h)
		dt[i] = (up.Tension - dn.Tension) / (2 * h)
		gc[i], gt[i] = dc[i]*sd, dt[i]*sd
	}
	res := &FOSMResult{Step: FOSMStep}
	res.Compression = p.estimate(r0.Compression, dc, gc, opt.Load)
	res.Tension = p.estimate(r0.Tension, dt, gt, opt.TensionLoad)
	return res, nil
}

func (p *Problem) name(i int) string {
	if p.Params[i].Name != "" {
		return p.Params[i].Name
	}
	return fmt.Sprintf("params[%d]", i)
}

// rho returns the correlation coefficient between parameters i and j.
func (p *Problem) rho(i, j int) float64 {
	if i == j {
		return 1
	}
	if p.Correlation == nil {
		return 0
	}
	return p.Correlation[i][j]
}

func (p *Problem) estimate(mean float64, d, g []float64, load float64) FOSMEstimate {
	n := len(g)
	// ρ·g, then σR² = gᵀ·ρ·g.
	rg := make([]float64, n)
	var v float64
	for i := range n {
		for j := range n {
			rg[i] += p.rho(i, j) * g[j]
		}
		v += g[i] * rg[i]
	}
	sd := math.Sqrt(max(v, 0))
	e := FOSMEstimate{Mean: mean, SD: sd}
	if mean != 0 {
		e.CoV = sd / mean
	}
	if load > 0 {
		e.HasLoad, e.Load = true, load
		if sd > 0 {
			e.Beta, e.BetaDefined = (mean-load)/sd, true
		}
	}
	for i := range n {
		s := Sensitivity{Param: p.name(i), Derivative: d[i], PerSD: g[i]}
		if v > 0 {
			s.Share = g[i] * rg[i] / v
		}
		e.Ranking = append(e.Ranking, s)
	}
	slices.SortStableFunc(e.Ranking, func(a, b Sensitivity) int { return cmp.Compare(math.Abs(b.PerSD), math.Abs(a.PerSD)) })
	return e
}
