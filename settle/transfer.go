package settle

import (
	"errors"
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Segment is a length of shaft with one perimeter and one t-z curve, its
// ultimate unit shaft resistance linear from FsTop at Top to FsBottom at
// Bottom. Depths are measured down from ground level (the head need not be
// at zero).
type Segment struct {
	Top, Bottom     units.Length
	Perimeter       units.Length
	FsTop, FsBottom units.Stress
	Curve           Curve
}

// TipSpring is the base: its area, the ultimate unit tip resistance and
// its q-z curve.
type TipSpring struct {
	Area  units.Area
	Qp    units.Stress
	Curve Curve
}

// Model is a pile for load transfer: a column of constant axial stiffness
// EA over contiguous shaft segments from the head (the top of the first
// segment) to the tip (the bottom of the last), with a spring at the tip.
// Diameter scales the curves given per diameter.
type Model struct {
	Diameter units.Length
	EA       units.Force // E·A of the section (N)
	Segments []Segment
	Tip      TipSpring
}

// Defaults of Options.
const (
	DefaultElements      = 100
	DefaultTolerance     = 1e-9
	DefaultMaxIterations = 100
)

// Options tune the load-transfer solution; nil or zero fields mean the
// defaults.
type Options struct {
	// Elements is the target number of pile elements (default 100, at
	// most 100000); every segment gets at least one and element ends
	// fall on segment boundaries.
	Elements int
	// Tolerance is the relative tolerance on forces: a solution is accepted
	// when every out-of-balance nodal force, and the difference between the
	// head load and its target, is at most Tolerance times the capacity
	// (default 1e-9, accepted 1e-14 to 1e-3).
	Tolerance float64
	// MaxIterations bounds each Newton solve and each search for the head
	// displacement of a target load (default 100, accepted 1 to 10000).
	MaxIterations int
}

// Solver solves one model for head loads or head displacements. Build it
// with NewSolver; it holds its working arrays, so a solve allocates
// nothing. A Solver is not safe for concurrent use.
type Solver struct {
	n                          int
	depth                      []float64 // node depths, n+1
	kcol                       []float64 // EA/h per element, n
	hcap                       []float64 // 2n half springs: force at full mobilisation, N
	hcur                       []int     // curve index of each half spring
	curves                     []scaled
	tipCap                     float64
	tip                        scaled
	shaftCap, capacity, tolF   float64
	wLimit                     float64 // a head displacement beyond which every spring is on its tail
	maxIt                      int
	kmax                       float64 // the largest EA/h
	softening                  bool
	w, r, diag, rhs, cp, dp, v []float64
	wtrial                     []float64
	iters                      int
	refs                       []cite.Ref
}

// NewSolver checks the model and builds the mesh. Errors name the field
// and its accepted range.
func NewSolver(m Model, opt *Options) (*Solver, error) {
	o := Options{Elements: DefaultElements, Tolerance: DefaultTolerance, MaxIterations: DefaultMaxIterations}
	if opt != nil {
		if opt.Elements != 0 {
			o.Elements = opt.Elements
		}
		if opt.Tolerance != 0 {
			o.Tolerance = opt.Tolerance
		}
		if opt.MaxIterations != 0 {
			o.MaxIterations = opt.MaxIterations
		}
	}
	if o.Elements < 1 || o.Elements > 100000 {
		return nil, fmt.Errorf("elements: %d is outside 1 to 100000", o.Elements)
	}
	if !(o.Tolerance >= 1e-14 && o.Tolerance <= 1e-3) {
		return nil, fmt.Errorf("tolerance: %v is outside 1e-14 to 1e-3", o.Tolerance)
	}
	if o.MaxIterations < 1 || o.MaxIterations > 10000 {
		return nil, fmt.Errorf("max_iterations: %d is outside 1 to 10000", o.MaxIterations)
	}
	if err := posLen("diameter", m.Diameter); err != nil {
		return nil, err
	}
	if !(m.EA > 0) || math.IsInf(float64(m.EA), 0) {
		return nil, fmt.Errorf("ea: %v kN is outside (0, ∞) kN", m.EA.KN())
	}
	if len(m.Segments) == 0 {
		return nil, errors.New("segments: none; give at least one shaft segment from the head to the tip")
	}
	var total float64
	for i, sg := range m.Segments {
		top, bot := float64(sg.Top), float64(sg.Bottom)
		if math.IsNaN(top) || math.IsInf(top, 0) {
			return nil, fmt.Errorf("segments[%d].top: %v m is not a finite depth", i, top)
		}
		if !(bot > top) || math.IsInf(bot, 0) {
			return nil, fmt.Errorf("segments[%d].bottom: %v m is outside (%v, ∞) m (below its top)", i, bot, top)
		}
		if i > 0 {
			prev := float64(m.Segments[i-1].Bottom)
			if math.Abs(top-prev) > 1e-9*max(1, math.Abs(prev)) {
				return nil, fmt.Errorf("segments[%d].top: %v m is not the bottom of segments[%d], %v m (segments must be contiguous)", i, top, i-1, prev)
			}
		}
		if !(sg.Perimeter >= 0) || math.IsInf(float64(sg.Perimeter), 0) {
			return nil, fmt.Errorf("segments[%d].perimeter: %v m is outside 0 to ∞ m", i, float64(sg.Perimeter))
		}
		for _, f := range []struct {
			name string
			v    units.Stress
		}{{"fs_top", sg.FsTop}, {"fs_bottom", sg.FsBottom}} {
			if !(f.v >= 0) || math.IsInf(float64(f.v), 0) {
				return nil, fmt.Errorf("segments[%d].%s: %v kPa is outside 0 to ∞ kPa", i, f.name, f.v.KPa())
			}
		}
		if !sg.Curve.Valid() {
			return nil, fmt.Errorf("segments[%d].curve: missing; give a t-z curve (api-clay, api-sand or points)", i)
		}
		total += float64(sg.Perimeter) * (bot - top) * float64(sg.FsTop+sg.FsBottom) / 2
	}
	if !(m.Tip.Area >= 0) || math.IsInf(float64(m.Tip.Area), 0) {
		return nil, fmt.Errorf("tip.area: %v m2 is outside 0 to ∞ m2", float64(m.Tip.Area))
	}
	if !(m.Tip.Qp >= 0) || math.IsInf(float64(m.Tip.Qp), 0) {
		return nil, fmt.Errorf("tip.qp: %v kPa is outside 0 to ∞ kPa", m.Tip.Qp.KPa())
	}
	if !m.Tip.Curve.Valid() {
		return nil, errors.New("tip.curve: missing; give a q-z curve (api-tip or points)")
	}
	tipCap := float64(m.Tip.Qp) * float64(m.Tip.Area)
	if !(total+tipCap > 0) || math.IsInf(total+tipCap, 0) {
		return nil, fmt.Errorf("segments: shaft %v kN and tip %v kN give no finite positive capacity", total/1e3, tipCap/1e3)
	}

	s := &Solver{maxIt: o.MaxIterations}
	d := float64(m.Diameter)
	head, tipDepth := float64(m.Segments[0].Top), float64(m.Segments[len(m.Segments)-1].Bottom)
	L := tipDepth - head
	// Elements per segment, at least one each.
	counts := make([]int, len(m.Segments))
	for i, sg := range m.Segments {
		counts[i] = max(1, int(math.Round(float64(o.Elements)*float64(sg.Bottom-sg.Top)/L)))
		s.n += counts[i]
	}
	n := s.n
	s.depth = make([]float64, n+1)
	s.kcol = make([]float64, n)
	s.hcap = make([]float64, 2*n)
	s.hcur = make([]int, 2*n)
	curveIndex := map[string]int{}
	add := func(c Curve) int {
		key := fmt.Sprintf("%s|%v|%v|%v", c.id, c.perDiameter, c.z, c.r)
		if k, ok := curveIndex[key]; ok {
			return k
		}
		s.curves = append(s.curves, c.scale(d))
		s.softening = s.softening || c.softening
		s.refs = append(s.refs, c.refs...)
		curveIndex[key] = len(s.curves) - 1
		return len(s.curves) - 1
	}
	e := 0
	s.depth[0] = head
	for i, sg := range m.Segments {
		top, bot := float64(sg.Top), float64(sg.Bottom)
		if i == len(m.Segments)-1 {
			bot = tipDepth
		}
		ci := add(sg.Curve)
		p := float64(sg.Perimeter)
		fs := func(z float64) float64 {
			return float64(sg.FsTop) + float64(sg.FsBottom-sg.FsTop)*(z-top)/(bot-top)
		}
		for j := 0; j < counts[i]; j++ {
			za := top + (bot-top)*float64(j)/float64(counts[i])
			zb := top + (bot-top)*float64(j+1)/float64(counts[i])
			if j == counts[i]-1 {
				zb = bot
			}
			h := zb - za
			s.depth[e+1] = zb
			s.kcol[e] = float64(m.EA) / h
			s.kmax = max(s.kmax, s.kcol[e])
			s.hcap[2*e] = p * h / 2 * fs(za)
			s.hcap[2*e+1] = p * h / 2 * fs(zb)
			s.hcur[2*e], s.hcur[2*e+1] = ci, ci
			s.shaftCap += s.hcap[2*e] + s.hcap[2*e+1]
			e++
		}
	}
	s.tip = m.Tip.Curve.scale(d)
	s.softening = s.softening || m.Tip.Curve.softening
	s.refs = append(s.refs, m.Tip.Curve.refs...)
	s.tipCap = tipCap
	s.capacity = s.shaftCap + s.tipCap
	s.tolF = o.Tolerance * s.capacity
	zmax := s.tip.z[len(s.tip.z)-1]
	for i := range s.curves {
		zmax = max(zmax, s.curves[i].z[len(s.curves[i].z)-1])
	}
	s.wLimit = 2 * (zmax + s.capacity*L/float64(m.EA))
	s.w = make([]float64, n+1)
	s.wtrial = make([]float64, n+1)
	s.r = make([]float64, n+1)
	s.diag = make([]float64, n+1)
	s.rhs = make([]float64, n+1)
	s.cp = make([]float64, n+1)
	s.dp = make([]float64, n+1)
	s.v = make([]float64, n+1)
	return s, nil
}

// Elements returns the number of pile elements of the mesh.
func (s *Solver) Elements() int { return s.n }

// Capacity returns the shaft and tip resistance at full mobilisation
// (Σ p·∫fs dz by the trapezoid rule, exact for fs linear in a segment, and
// Qp·Ab).
func (s *Solver) Capacity() (shaft, tip units.Force) {
	return units.Force(s.shaftCap), units.Force(s.tipCap)
}

// Refs returns the sources of the curves and of the method.
func (s *Solver) Refs() []cite.Ref {
	return append([]cite.Ref{{Source: cite.Fleming2009, Where: "load transfer: the pile as a column of elements on t-z and q-z springs"}}, s.refs...)
}

// soil returns the soil force at node i and its slope for displacement w.
func (s *Solver) soil(i int, w float64) (f, k float64) {
	if i > 0 {
		c := &s.curves[s.hcur[2*(i-1)+1]]
		r, sl := c.eval(w)
		f += s.hcap[2*(i-1)+1] * r
		k += s.hcap[2*(i-1)+1] * sl
	}
	if i < s.n {
		c := &s.curves[s.hcur[2*i]]
		r, sl := c.eval(w)
		f += s.hcap[2*i] * r
		k += s.hcap[2*i] * sl
	} else {
		r, sl := s.tip.eval(w)
		if w < 0 { // the base carries no tension
			r, sl = 0, 0
		}
		f += s.tipCap * r
		k += s.tipCap * sl
	}
	return f, k
}

// residual fills s.r for the displacements w (nodes 1..n) and returns the
// largest out-of-balance force.
func (s *Solver) residual(w []float64) float64 {
	worst := 0.0
	for i := 1; i <= s.n; i++ {
		f, _ := s.soil(i, w[i])
		ri := f + s.kcol[i-1]*(w[i]-w[i-1])
		if i < s.n {
			ri += s.kcol[i] * (w[i] - w[i+1])
		}
		s.r[i] = ri
		worst = max(worst, math.Abs(ri))
	}
	return worst
}

// tangent fills the diagonal of the tangent matrix of nodes 1..n; soil
// slopes below zero (softening) are taken as zero, so the matrix stays
// positive definite.
func (s *Solver) tangent(w []float64) {
	for i := 1; i <= s.n; i++ {
		_, k := s.soil(i, w[i])
		dg := s.kcol[i-1] + max(k, 0)
		if i < s.n {
			dg += s.kcol[i]
		}
		s.diag[i] = dg
	}
}

// thomas solves the tridiagonal system of nodes 1..n (diagonal s.diag,
// off-diagonals −kcol) for the right side s.rhs, into x.
func (s *Solver) thomas(x []float64) {
	n := s.n
	// The off-diagonal between node i and node i+1 is −kcol[i].
	for i := 1; i <= n; i++ {
		m := s.diag[i]
		d := s.rhs[i]
		if i > 1 {
			a := -s.kcol[i-1]
			m -= a * s.cp[i-1]
			d -= a * s.dp[i-1]
		}
		if i < n {
			s.cp[i] = -s.kcol[i] / m
		}
		s.dp[i] = d / m
	}
	x[n] = s.dp[n]
	for i := n - 1; i >= 1; i-- {
		x[i] = s.dp[i] - s.cp[i]*x[i+1]
	}
}

const epsilon = 0x1p-52

// errNoConvergence is returned when a Newton solve exceeds its limit.
type convergenceError struct {
	what  string
	limit int
	value float64
}

func (e *convergenceError) Error() string {
	return fmt.Sprintf("settle: %s did not converge in %d iterations (at %.6g)", e.what, e.limit, e.value)
}

// solveHead solves for the displacements of nodes 1..n with the head held
// at w0, starting from the displacements in s.w (shifted with the head),
// and returns the head load. It allocates nothing.
func (s *Solver) solveHead(w0 float64) (float64, error) {
	shift := w0 - s.w[0]
	for i := range s.w {
		s.w[i] += shift
	}
	s.w[0] = w0
	// The tolerance, or the floating-point floor of the column forces at
	// this displacement when that is larger.
	tol := max(s.tolF, 64*epsilon*s.kmax*math.Abs(w0))
	worst := s.residual(s.w)
	it := 0
	for worst > tol {
		if it >= s.maxIt {
			return 0, &convergenceError{what: "equilibrium for a head displacement", limit: s.maxIt, value: w0}
		}
		it++
		s.iters++
		s.tangent(s.w)
		for i := 1; i <= s.n; i++ {
			s.rhs[i] = -s.r[i]
		}
		s.thomas(s.v)
		// Backtrack while the largest out-of-balance force does not fall.
		step := 1.0
		for k := 0; k < 30; k++ {
			s.wtrial[0] = w0
			for i := 1; i <= s.n; i++ {
				s.wtrial[i] = s.w[i] + step*s.v[i]
			}
			trial := s.residual(s.wtrial)
			if trial < worst || k == 29 {
				worst = trial
				break
			}
			step /= 2
		}
		copy(s.w, s.wtrial)
	}
	f0, _ := s.soil(0, w0)
	return f0 + s.kcol[0]*(w0-s.w[1]), nil
}

// headStiffness returns dP/dw0 at the current solution (soil slopes below
// zero taken as zero).
func (s *Solver) headStiffness() float64 {
	s.tangent(s.w)
	for i := range s.rhs {
		s.rhs[i] = 0
	}
	s.rhs[1] = s.kcol[0]
	s.thomas(s.v)
	_, k0 := s.soil(0, s.w[0])
	return s.kcol[0] + max(k0, 0) - s.kcol[0]*s.v[1]
}

// PlungeError reports a head load larger than the pile can carry: the
// pile plunges at Load, the largest head load found on the load path.
type PlungeError struct {
	Target units.Force // the head load asked for
	Load   units.Force // the largest head load the pile carries
}

func (e *PlungeError) Error() string {
	return fmt.Sprintf("settle: the pile plunges at %.6g kN; a head load of %.6g kN cannot be carried", e.Load.KN(), e.Target.KN())
}

// solveLoad finds the head displacement that carries the head load p,
// starting from the current state, and returns the head load reached. A
// load the pile cannot carry returns a *PlungeError. It allocates nothing
// unless the pile plunges.
func (s *Solver) solveLoad(p float64) error {
	if p == 0 {
		for i := range s.w {
			s.w[i] = 0
		}
		return nil
	}
	if p > s.capacity+s.tolF && !s.softening {
		return &PlungeError{Target: units.Force(p), Load: units.Force(s.capacity)}
	}
	// Bracket: lo carries at most p; hi (when found) more than p.
	w0 := s.w[0]
	P, err := s.solveHead(w0)
	if err != nil {
		return err
	}
	if math.Abs(P-p) <= s.tolF {
		return nil
	}
	lo, plo := 0.0, 0.0 // no head displacement, no head load
	hi, phi := math.Inf(1), 0.0
	best := P
	if P < p {
		if w0 > lo {
			lo, plo = w0, P
		}
	} else {
		hi, phi = w0, P
	}
	for it := 0; it < 4*s.maxIt; it++ {
		kh := s.headStiffness()
		next := w0 + (p-P)/kh
		if !(kh > 0) || math.IsNaN(next) || math.IsInf(next, 0) {
			next = math.Inf(1)
		}
		// Keep the guess inside the bracket; bisect or expand otherwise.
		if math.IsInf(hi, 1) {
			// Expand by at most a doubling, so that the head never runs far
			// beyond the tails of the curves.
			next = min(next, max(2*lo, lo+s.wLimit/64))
		}
		switch {
		case next <= lo || next >= hi:
			if !math.IsInf(hi, 1) {
				next = lo + (hi-lo)*(p-plo)/(phi-plo) // regula falsi
				if next <= lo || next >= hi || math.IsNaN(next) {
					next = (lo + hi) / 2
				}
			} else {
				next = max(2*lo, lo+s.wLimit/64)
			}
		}
		if lo > s.wLimit && math.IsInf(hi, 1) {
			return &PlungeError{Target: units.Force(p), Load: units.Force(s.plungeLoad(best))}
		}
		w0 = next
		P, err = s.solveHead(w0)
		if err != nil {
			return err
		}
		best = max(best, P)
		if math.Abs(P-p) <= s.tolF {
			return nil
		}
		if P < p {
			lo, plo = w0, P
		} else {
			hi, phi = w0, P
		}
		if !math.IsInf(hi, 1) && hi-lo <= 1e-15*max(1, hi) {
			return nil // the bracket is as narrow as floating point allows
		}
	}
	return &convergenceError{what: "search for the head displacement of a load", limit: 4 * s.maxIt, value: p / 1e3}
}

// plungeLoad returns the largest head load on the path: the capacity
// when no curve softens; otherwise the peak of the head load against head
// displacement, found by a scan and a golden-section refinement.
func (s *Solver) plungeLoad(best float64) float64 {
	if !s.softening {
		return s.capacity
	}
	for i := range s.w {
		s.w[i] = 0
	}
	const scan = 64
	bw, bp := 0.0, 0.0
	for k := 1; k <= scan; k++ {
		w := s.wLimit * float64(k) / scan
		P, err := s.solveHead(w)
		if err != nil {
			break
		}
		if P > bp {
			bw, bp = w, P
		}
	}
	a, b := max(0, bw-s.wLimit/scan), bw+s.wLimit/scan
	g := (math.Sqrt(5) - 1) / 2
	for k := 0; k < 40; k++ {
		c := b - g*(b-a)
		d := a + g*(b-a)
		pc, err1 := s.solveHead(c)
		pd, err2 := s.solveHead(d)
		if err1 != nil || err2 != nil {
			break
		}
		bp = max(bp, pc, pd)
		if pc > pd {
			b = d
		} else {
			a = c
		}
	}
	return max(bp, best)
}

// Step is the state of the pile under one head load.
type Step struct {
	Head       units.Force  // head load
	Settlement units.Length // head displacement
	TipMove    units.Length // displacement of the tip
	Shaft, Tip units.Force  // mobilised shaft and tip resistance (Shaft + Tip = Head within the tolerance)
	// ShaftShare and TipShare are Shaft/Head and Tip/Head; ShaftMobilised
	// and TipMobilised the fractions of the shaft and tip capacity in use.
	ShaftShare, TipShare         float64
	ShaftMobilised, TipMobilised float64
	// Load and Move are the axial force (compression positive) and the
	// displacement at each node of Result.Depth, head first. The force at
	// an inner node is the mean of the two elements that meet there; at the
	// tip it is the force on the base.
	Load []units.Force
	Move []units.Length
}

// Result is a load-settlement curve with the state of the pile at every
// step.
type Result struct {
	Depth                []units.Length // node depths, head to tip
	Steps                []Step
	ShaftCapacity        units.Force // Σ p·∫fs dz
	TipCapacity          units.Force // Qp·Ab
	Capacity             units.Force // ShaftCapacity + TipCapacity
	Elements, Iterations int
	Plunged              bool        // a head load could not be carried; Steps stop before it
	PlungeLoad           units.Force // the largest head load the pile carries, when Plunged
	PlungeTarget         units.Force // the first head load that could not be carried
}

func (s *Solver) reset() {
	for i := range s.w {
		s.w[i] = 0
	}
	s.iters = 0
}

func (s *Solver) result() Result {
	r := Result{Depth: make([]units.Length, s.n+1), ShaftCapacity: units.Force(s.shaftCap),
		TipCapacity: units.Force(s.tipCap), Capacity: units.Force(s.capacity), Elements: s.n}
	for i, z := range s.depth {
		r.Depth[i] = units.Length(z)
	}
	return r
}

// record appends the current state as a step, the node arrays cut from
// the blocks given.
func (s *Solver) record(r *Result, loads []units.Force, moves []units.Length) {
	n := s.n
	st := Step{Load: loads[: n+1 : n+1], Move: moves[: n+1 : n+1]}
	var shaft float64
	for i := 0; i <= n; i++ {
		st.Move[i] = units.Length(s.w[i])
		if i > 0 {
			c := &s.curves[s.hcur[2*(i-1)+1]]
			rr, _ := c.eval(s.w[i])
			shaft += s.hcap[2*(i-1)+1] * rr
		}
		if i < n {
			c := &s.curves[s.hcur[2*i]]
			rr, _ := c.eval(s.w[i])
			shaft += s.hcap[2*i] * rr
		}
	}
	tr, _ := s.tip.eval(s.w[n])
	if s.w[n] < 0 {
		tr = 0
	}
	tip := s.tipCap * tr
	f0, _ := s.soil(0, s.w[0])
	head := f0 + s.kcol[0]*(s.w[0]-s.w[1])
	st.Head, st.Settlement, st.TipMove = units.Force(head), units.Length(s.w[0]), units.Length(s.w[n])
	st.Shaft, st.Tip = units.Force(shaft), units.Force(tip)
	if head > 0 {
		st.ShaftShare, st.TipShare = shaft/head, tip/head
	}
	if s.shaftCap > 0 {
		st.ShaftMobilised = shaft / s.shaftCap
	}
	if s.tipCap > 0 {
		st.TipMobilised = tip / s.tipCap
	}
	st.Load[0] = st.Head
	for i := 1; i < n; i++ {
		st.Load[i] = units.Force((s.kcol[i-1]*(s.w[i-1]-s.w[i]) + s.kcol[i]*(s.w[i]-s.w[i+1])) / 2)
	}
	if n > 0 {
		st.Load[n] = units.Force(tip)
	}
	r.Steps = append(r.Steps, st)
}

// Run solves for a sequence of head loads, from the unloaded pile, in
// order. Loads must be finite, at least 0 and never falling (monotonic
// loading: the springs are nonlinear elastic and have no unloading
// branch). A load the pile cannot carry ends the curve: Result.Plunged is
// set with the plunging load, and the steps before it are kept.
func (s *Solver) Run(loads []units.Force) (Result, error) {
	for i, p := range loads {
		if !(p >= 0) || math.IsInf(float64(p), 0) {
			return Result{}, fmt.Errorf("loads[%d]: %v kN is outside 0 to ∞ kN", i, p.KN())
		}
		if i > 0 && p < loads[i-1] {
			return Result{}, fmt.Errorf("loads[%d]: %v kN is less than loads[%d], %v kN (loads must not fall)", i, p.KN(), i-1, loads[i-1].KN())
		}
	}
	s.reset()
	r := s.result()
	r.Steps = make([]Step, 0, len(loads))
	fb := make([]units.Force, (s.n+1)*len(loads))
	mb := make([]units.Length, (s.n+1)*len(loads))
	for k, p := range loads {
		if err := s.solveLoad(float64(p)); err != nil {
			var pe *PlungeError
			if errors.As(err, &pe) {
				r.Plunged, r.PlungeLoad, r.PlungeTarget = true, pe.Load, pe.Target
				break
			}
			return Result{}, err
		}
		s.record(&r, fb[k*(s.n+1):], mb[k*(s.n+1):])
	}
	r.Iterations = s.iters
	return r, nil
}

// RunDisplacements solves for a sequence of head displacements (metres,
// finite, at least 0, never falling) from the unloaded pile. Past the peak
// of softening curves the head load falls; nothing plunges under
// displacement control.
func (s *Solver) RunDisplacements(ws []units.Length) (Result, error) {
	for i, w := range ws {
		if !(w >= 0) || math.IsInf(float64(w), 0) {
			return Result{}, fmt.Errorf("displacements[%d]: %v m is outside 0 to ∞ m", i, float64(w))
		}
		if i > 0 && w < ws[i-1] {
			return Result{}, fmt.Errorf("displacements[%d]: %v m is less than displacements[%d], %v m (displacements must not fall)", i, float64(w), i-1, float64(ws[i-1]))
		}
	}
	s.reset()
	r := s.result()
	r.Steps = make([]Step, 0, len(ws))
	fb := make([]units.Force, (s.n+1)*len(ws))
	mb := make([]units.Length, (s.n+1)*len(ws))
	for k, w := range ws {
		if _, err := s.solveHead(float64(w)); err != nil {
			return Result{}, err
		}
		s.record(&r, fb[k*(s.n+1):], mb[k*(s.n+1):])
	}
	r.Iterations = s.iters
	return r, nil
}

// SettlementAt returns the head settlement under the head load p, solved
// in one step from the unloaded pile; a load the pile cannot carry returns
// a *PlungeError naming the plunging load. It allocates nothing unless the
// pile plunges. With softening curves, prefer Run with load steps.
func (s *Solver) SettlementAt(p units.Force) (units.Length, error) {
	if !(p >= 0) || math.IsInf(float64(p), 0) {
		return 0, fmt.Errorf("load: %v kN is outside 0 to ∞ kN", p.KN())
	}
	s.reset()
	if err := s.solveLoad(float64(p)); err != nil {
		return 0, err
	}
	return units.Length(s.w[0]), nil
}

// HeadLoadAt returns the head load that holds the head at displacement w
// (metres, 0 to ∞), solved in one step from the unloaded pile. It
// allocates nothing.
func (s *Solver) HeadLoadAt(w units.Length) (units.Force, error) {
	if !(w >= 0) || math.IsInf(float64(w), 0) {
		return 0, fmt.Errorf("displacement: %v m is outside 0 to ∞ m", float64(w))
	}
	s.reset()
	p, err := s.solveHead(float64(w))
	return units.Force(p), err
}
