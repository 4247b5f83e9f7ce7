package pile

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// Verification is one design case checked against the loads.
type Verification struct {
	Case string
	// Compression: design action Ed, design resistance Rd, and Ed/Rd.
	CompressionEd, CompressionRd units.Force
	CompressionUse               float64
	// Tension, where a tension load is given.
	TensionEd, TensionRd units.Force
	TensionUse           float64
	Pass                 bool
}

// utilisation returns ed/rd, with 0/0 = 0 and x/0 = +Inf reported as a
// very large number so that results stay finite.
func utilisation(ed, rd units.Force) float64 {
	switch {
	case ed <= 0:
		return 0
	case rd <= 0:
		return math.MaxFloat64
	}
	return float64(ed / rd)
}

// Verify checks capacity c, computed by an analysis built with case cs,
// against loads l:
//
//	Ed = Permanent·G + Variable·Q,  pass when Ed ≤ Rd in compression and tension.
func Verify(c Capacity, cs Case, l Loads) Verification {
	v := Verification{Case: cs.Name}
	v.CompressionEd = units.Force(cs.Permanent)*l.Compression.Permanent + units.Force(cs.Variable)*l.Compression.Variable
	v.CompressionRd = c.DesignCompression
	v.CompressionUse = utilisation(v.CompressionEd, v.CompressionRd)
	v.TensionEd = units.Force(cs.Permanent)*l.Tension.Permanent + units.Force(cs.Variable)*l.Tension.Variable
	v.TensionRd = c.DesignTension
	v.TensionUse = utilisation(v.TensionEd, v.TensionRd)
	v.Pass = v.CompressionUse <= 1 && v.TensionUse <= 1
	return v
}

// Design is the result of applying a design basis to a pile.
type Design struct {
	Basis          string
	Cases          []Verification
	Characteristic Capacity // without design multipliers (and soil factors)
	// Governing is the index in Cases of the highest utilisation.
	Governing int
	Pass      bool
}

// MaxUse returns the highest utilisation over all cases and both
// directions.
func (d Design) MaxUse() float64 {
	m := 0.0
	for _, v := range d.Cases {
		m = max(m, v.CompressionUse, v.TensionUse)
	}
	return m
}

// Check analyses pile p in profile prof with methods m and applies design
// basis b to loads l: one analysis for the characteristic capacity and one
// per design case (each with its own soil factors).
func Check(prof *profile.Profile, p Pile, m Methods, b Basis, l Loads) (Design, error) {
	if b == nil {
		return Design{}, errors.New("design: no design basis given")
	}
	if err := l.Validate("loads"); err != nil {
		return Design{}, err
	}
	cases, err := b.Cases(p.Installation)
	if err != nil {
		return Design{}, err
	}
	a, err := NewAnalysis(prof, p, m, nil)
	if err != nil {
		return Design{}, err
	}
	return a.check(cases, b, l)
}

// Check is Check(prof, p, m, b, l) for a's profile prof, pile p and
// methods m, taking a as the analysis of the characteristic capacity
// instead of building it again. a must have been built without a design
// case (Options.Case); Check panics otherwise.
func (a *Analysis) Check(b Basis, l Loads) (Design, error) {
	if a.useCase {
		panic("pile: Analysis.Check on an analysis with a design case")
	}
	if b == nil {
		return Design{}, errors.New("design: no design basis given")
	}
	if err := l.Validate("loads"); err != nil {
		return Design{}, err
	}
	cases, err := b.Cases(a.pile.Installation)
	if err != nil {
		return Design{}, err
	}
	return a.check(cases, b, l)
}

// check is Check's work from the characteristic analysis a on.
func (a *Analysis) check(cases []Case, b Basis, l Loads) (Design, error) {
	prof, p, m := a.prof, a.pile, a.methods
	char, err := a.Capacity()
	if err != nil {
		return Design{}, err
	}
	d := Design{Basis: b.ID(), Characteristic: char, Pass: true}
	worst := -1.0
	for i := range cases {
		cs := cases[i]
		ad, err := newAnalysis(prof, p, m, &Options{Case: &cs}, tipsFor(a, &cs))
		if err != nil {
			return Design{}, fmt.Errorf("design case %s: %w", cs.Name, err)
		}
		c, err := ad.Capacity()
		if err != nil {
			return Design{}, fmt.Errorf("design case %s: %w", cs.Name, err)
		}
		v := Verify(c, cs, l)
		d.Cases = append(d.Cases, v)
		if u := max(v.CompressionUse, v.TensionUse); u > worst {
			worst, d.Governing = u, i
		}
		d.Pass = d.Pass && v.Pass
	}
	return d, nil
}

// LengthResult is the result of a search for the shortest pile
// (RequiredLength). When Found is false, TipDepth and Length are zero and
// NotFound, BestTipDepth, BestUse and BestGoverns say how near the search
// came and where it stopped.
type LengthResult struct {
	Found bool
	// TipDepth is the shallowest candidate tip depth from which every
	// longer candidate, down to the search limit, passes every case;
	// Length = TipDepth − head depth.
	TipDepth units.Length
	Length   units.Length
	// Governs names what governs at the found depth: the case and the
	// direction ("DA1-2 compression").
	Governs string
	Use     float64 // the highest utilisation there
	// The search: candidate tip depths from the head + Step down to
	// MaxTip in steps of Step.
	Step, MaxTip units.Length
	// Passing lists the ranges of candidate tip depths that pass, shallow
	// to deep (each range From to To, both candidates that pass). More
	// than one range means a shorter pile passes where a longer one fails:
	// Warnings then says so, and TipDepth is the top of the last range,
	// and only if that range reaches MaxTip.
	Passing []DepthRange
	// Best is the candidate with the lowest utilisation and what governs
	// there, so that a search that finds nothing says how near it came.
	BestTipDepth units.Length
	BestUse      float64
	BestGoverns  string
	// Warnings are sentences about the search (not-found, several passing
	// ranges).
	Warnings []string
}

// DepthRange is a range of tip depths, From ≤ To.
type DepthRange struct{ From, To units.Length }

// NotFound returns the sentence that explains a search that found no
// length: the search limit, the step and the best utilisation reached; ""
// when a length was found.
func (l LengthResult) NotFound() string {
	if l.Found {
		return ""
	}
	return fmt.Sprintf("no pile length passes: the search ran to a tip depth of %.4g m in steps of %.4g m; the best utilisation reached was %.3g (%s) with the tip at %.4g m",
		l.MaxTip.Metres(), l.Step.Metres(), l.BestUse, l.BestGoverns, l.BestTipDepth.Metres())
}

// Search is the grid of candidate tip depths that RequiredLength tries:
// from the pile head + Step down to MaxTip in steps of Step. The zero value
// searches in steps of 0.5 m down to the bottom of the profile.
type Search struct {
	// Step is the distance between candidate tip depths, > 0 m; zero means
	// 0.5 m.
	Step units.Length
	// MaxTip is the deepest candidate tip depth: below the head and
	// within the profile. Zero means the bottom of the profile.
	MaxTip units.Length
}

// DefaultSearchStep is the step of a Search whose Step is zero.
const DefaultSearchStep = 0.5 * units.Metre

// RequiredLength finds the shallowest tip depth, on the grid of s, from
// which every candidate down to s.MaxTip passes every case of basis b: a
// length passes only if every longer one up to the search limit passes
// too, since a pile driven a little deeper than designed must not fail (a
// dense lens over a soft layer can pass a short pile and fail longer ones).
// Where the passing candidates form more than one range, the ranges are
// returned in Passing with a warning. Each case is one pass down the pile
// with running sums, not one analysis per depth. p.Length is ignored.
//
// A search that finds nothing is not an error: the result has Found false
// and says, in NotFound and the Best fields, how near it came. An error
// means the inputs are wrong (a *PathError names the field).
func RequiredLength(prof *profile.Profile, p Pile, m Methods, b Basis, l Loads, s Search) (LengthResult, error) {
	out, _, err := RequiredLengthWithDepth(prof, p, m, b, l, s)
	return out, err
}

// RequiredLengthWithDepth is RequiredLength that also returns the rows it
// searched: for each case of b.Cases(p.Installation), in order, the
// capacity with depth on the search grid, as Analysis.WithDepth gives it
// for the pile extended to s.MaxTip analysed with Options{Case: &case}
// (same values to the bit). The rows are nil when err is not.
func RequiredLengthWithDepth(prof *profile.Profile, p Pile, m Methods, b Basis, l Loads, s Search) (LengthResult, [][]Capacity, error) {
	out, rows, err := requiredLength(prof, p, m, b, l, s)
	if err != nil {
		return out, nil, err
	}
	return out, rows, nil
}

func requiredLength(prof *profile.Profile, p Pile, m Methods, b Basis, l Loads, s Search) (LengthResult, [][]Capacity, error) {
	if prof == nil {
		return LengthResult{}, nil, errors.New("design: no ground profile given")
	}
	step, maxTip := s.Step, s.MaxTip
	if step == 0 {
		step = DefaultSearchStep
	}
	if maxTip == 0 {
		maxTip = prof.Depth()
	}
	if b == nil {
		return LengthResult{}, nil, errors.New("design: no design basis given")
	}
	if err := l.Validate("loads"); err != nil {
		return LengthResult{}, nil, err
	}
	if !(step > 0) || math.IsInf(float64(step), 0) {
		return LengthResult{}, nil, pathErrorf("search.step", "%v is outside (0, ∞) m", step)
	}
	if maxTip > prof.Depth() || maxTip <= p.HeadDepth {
		return LengthResult{}, nil, pathErrorf("search.max_tip", "%v: want below the head (%v) and within the profile (to %v)", maxTip, p.HeadDepth, prof.Depth())
	}
	if n := float64((maxTip - p.HeadDepth) / step); n > 1e6 {
		return LengthResult{}, nil, pathErrorf("search.step", "%v gives %.3g candidate depths; at most 1e6", step, n)
	}
	if p.HeadDepth+step > maxTip {
		return LengthResult{}, nil, pathErrorf("search.step", "%v is longer than the search range from the head (%v) to max_tip (%v)", step, p.HeadDepth, maxTip)
	}
	cases, err := b.Cases(p.Installation)
	if err != nil {
		return LengthResult{}, nil, err
	}
	q := p
	q.Length = maxTip - p.HeadDepth
	var rows [][]Capacity
	var first *Analysis // the first case's analysis, which lends its tip preparation (tipsFor)
	for i := range cases {
		cs := cases[i]
		var src *Analysis
		if first != nil {
			src = tipsFor(first, &cs)
		}
		a, err := newAnalysis(prof, q, m, &Options{Case: &cs}, src)
		if err != nil {
			return LengthResult{}, nil, fmt.Errorf("design case %s: %w", cs.Name, err)
		}
		if first == nil {
			first = a
		}
		r, err := a.checkedWithDepth(p.HeadDepth+step, maxTip, step, nil)
		if err != nil {
			return LengthResult{}, nil, fmt.Errorf("design case %s: %w", cs.Name, err)
		}
		rows = append(rows, r)
	}
	out := LengthResult{Step: step, MaxTip: maxTip, BestUse: math.MaxFloat64}
	n := len(rows[0])
	pass := make([]bool, n)
	use := make([]float64, n)
	// What governs at each depth: the case's index, 2·i for its
	// compression and 2·i+1 for its tension (named by governs).
	gov := make([]int, n)
	governs := func(g int) string {
		if g < 0 {
			return ""
		}
		if g%2 == 0 {
			return cases[g/2].Name + " compression"
		}
		return cases[g/2].Name + " tension"
	}
	best := -1
	for j := 0; j < n; j++ {
		ok, worst, g := true, 0.0, -1
		for i, cs := range cases {
			v := Verify(rows[i][j], cs, l)
			if v.CompressionUse > worst || g < 0 {
				worst, g = v.CompressionUse, 2*i
			}
			if v.TensionUse > worst {
				worst, g = v.TensionUse, 2*i+1
			}
			ok = ok && v.Pass
		}
		pass[j], use[j], gov[j] = ok, worst, g
		if worst < out.BestUse {
			out.BestUse, out.BestTipDepth, best = worst, rows[0][j].TipDepth, g
		}
	}
	out.BestGoverns = governs(best)
	for j := 0; j < n; j++ {
		if !pass[j] {
			continue
		}
		if k := len(out.Passing); k > 0 && j > 0 && pass[j-1] {
			out.Passing[k-1].To = rows[0][j].TipDepth
		} else {
			out.Passing = append(out.Passing, DepthRange{From: rows[0][j].TipDepth, To: rows[0][j].TipDepth})
		}
	}
	if pass[n-1] {
		j := n - 1
		for j > 0 && pass[j-1] {
			j--
		}
		t := rows[0][j].TipDepth
		out.Found, out.TipDepth, out.Length, out.Governs, out.Use = true, t, t-p.HeadDepth, governs(gov[j]), use[j]
	}
	if len(out.Passing) > 1 {
		var sb strings.Builder
		for i, r := range out.Passing {
			if i > 0 {
				sb.WriteString(", ")
			}
			fmt.Fprintf(&sb, "%.4g to %.4g m", r.From.Metres(), r.To.Metres())
		}
		msg := "WARNING: the passing tip depths are not one range (" + sb.String() + "): a shorter pile passes where a longer one fails"
		if out.Found {
			msg += fmt.Sprintf("; the answer is the top of the deepest range, %.4g m", out.TipDepth.Metres())
		}
		out.Warnings = append(out.Warnings, msg)
	}
	if !out.Found {
		out.Warnings = append(out.Warnings, out.NotFound())
	}
	return out, rows, nil
}

// DepthGrid is the set of tip depths of Analysis.WithDepth: From, From +
// Step, … up to To (To itself is the last depth if the steps do not land
// on it). The zero value gives every 0.5 m from one step below the pile
// head to the bottom of the profile.
type DepthGrid struct {
	// From is the shallowest tip depth, below the head; zero means the
	// head + Step.
	From units.Length
	// To is the deepest tip depth, within the profile; zero means the
	// bottom of the profile.
	To units.Length
	// Step is the distance between depths, > 0 m; zero means 0.5 m.
	Step units.Length
}

// WithDepth returns the capacity for the tip depths of g, in one pass with
// running sums along the shaft. Rows are appended to dst (pass dst[:0] to
// reuse its storage: the call then allocates nothing).
func (a *Analysis) WithDepth(g DepthGrid, dst []Capacity) ([]Capacity, error) {
	step := g.Step
	if step == 0 {
		step = DefaultSearchStep
	}
	from, to := g.From, g.To
	if from == 0 {
		from = a.pile.HeadDepth + step
	}
	if to == 0 {
		to = a.prof.Depth()
	}
	return a.checkedWithDepth(from, to, step, dst)
}

// checkedWithDepth checks the depth range and runs withDepth.
func (a *Analysis) checkedWithDepth(from, to, step units.Length, dst []Capacity) ([]Capacity, error) {
	head := a.pile.HeadDepth
	if !(from > head) || to > a.prof.Depth() || !(to >= from) {
		return dst, fmt.Errorf("pile: depth range %v to %v: want below the head (%v) and within the profile (to %v)", from, to, head, a.prof.Depth())
	}
	if !(step > 0) || math.IsInf(float64(step), 0) {
		return dst, fmt.Errorf("pile: step %v is outside (0, ∞) m", step)
	}
	n := int(math.Floor(float64((to-from)/step)+1e-9)) + 1
	if n > 1e6 {
		return dst, fmt.Errorf("pile: %d depths asked for; at most 1e6", n)
	}
	return a.withDepth(float64(from), float64(step), float64(to), n, dst)
}

// tipsFor returns from when an analysis with design case cs of from's
// profile, pile and methods may take its tip preparation from it (see
// newAnalysis): the tip models, the tips at the layers' ends and the rules
// of the tip zone read of a design case only its soil factors (the
// multipliers are applied after them), so when cs's equal from's, they are
// from's to the bit. Otherwise nil.
func tipsFor(from *Analysis, cs *Case) *Analysis {
	if from.cs.TanPhi == cs.TanPhi && from.cs.Su == cs.Su {
		return from
	}
	return nil
}
