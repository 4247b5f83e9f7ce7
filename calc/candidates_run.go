package calc

import (
	"cmp"
	"errors"
	"fmt"
	"runtime"
	"slices"
	"strings"
	"sync"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/structural"
	"github.com/qultgeo/qult/units"
)

// SteelDensity is the density of steel used for the mass of steel,
// 7850 kg/m³ (EN 1991-1-1 Table A.4 gives 77.0 to 78.5 kN/m³ for steel;
// from memory; common practice).
const SteelDensity = 7850.0 // kg/m³

// CandidatesResult compares the candidate piles of a calc file.
//
// Choices where the task of choosing a pile is silent: each candidate's
// length is the shortest on the search grid (search.step, search.max_tip)
// that passes every geotechnical case of the basis in compression and
// tension with every longer length passing too (pile.RequiredLength); when
// the file gives an allowable settlement, the shortest length from there
// down whose settlement at the serviceability load is within it (found by
// doubling the step and then halving, on the assumption that settlement
// does not grow with length); and the section's structural resistance
// must carry the largest axial force, which does not depend on the length.
// Candidates are ranked by cost when every candidate has costs, otherwise
// by length × gross area; the first candidate that passes is recommended.
type CandidatesResult struct {
	Currency string
	// SortedBy is "cost" or "length × area".
	SortedBy string
	// Rule is the structural rule of the basis (aashto, en, allowable);
	// Ed the largest axial force every section is checked against.
	Rule string
	Ed   units.Force
	// Step and MaxTip are the search grid.
	Step, MaxTip units.Length
	// Settlement says whether the serviceability check takes part.
	Settlement bool
	// Rows are the candidates, ranked; Recommended is the index of the
	// recommended one in Rows, -1 when none passes.
	Rows        []CandidateResult
	Recommended int
	Notes       []string
}

// CandidateResult is one candidate's answer.
type CandidateResult struct {
	Name         string
	Path         string // its key in the calc file
	Section      pile.Section
	Installation pile.Installation
	// Pass: a length passes every check within the search.
	Pass bool
	// Length and TipDepth of the shortest passing pile (Pass only).
	Length, TipDepth units.Length
	// Governs names the check that sets the length ("DA1-2 compression",
	// "settlement"), or, for a candidate that fails, the check that fails
	// ("structure", or the geotechnical case that comes nearest).
	Governs string
	// Use is the highest utilisation at the length (Pass): the largest of
	// GeoUse, the structural Ed/Rd and SettlementUse; otherwise the
	// nearest the candidate came (the least over the search) or, for a
	// section too weak, its Ed/Rd.
	Use float64
	// GeoUse is the geotechnical utilisation at the shortest length that
	// passes the geotechnical cases (the length itself unless settlement
	// lengthens it); Geotechnical the search for it.
	GeoUse       float64
	Geotechnical pile.LengthResult
	// Structural is the section's check; it fails at every length when
	// it fails.
	Structural structural.Check
	// Settlement at the serviceability load at the length (HasSettlement),
	// and settlement/allowable.
	HasSettlement bool
	Settlement    units.Length
	SettlementUse float64
	// With a downdrag section (HasDowndrag): the neutral plane and the drag
	// load of the candidate at its length, and the largest design axial
	// force with the drag load, γG·Qd + γDD·Qn over the basis's cases,
	// which the section's check then reads (Structural.Ed).
	HasDowndrag  bool
	NeutralPlane units.Length
	DragLoad     units.Force
	DowndragEd   units.Force
	// Why says why a candidate that does not pass fails, and how close it
	// came.
	Why string
	// Quantities at the length: concrete volume and steel mass (kg).
	Concrete  units.Volume
	SteelMass float64
	// Cost at the length in the section's currency (HasCost).
	HasCost bool
	Cost    float64
	// Envelope is length × gross area, the ranking without costs.
	Envelope units.Volume
}

// largestAxialForce returns the largest axial force in the pile, the force
// its section must carry: the largest design compression load at the head
// over the basis's cases, max(γG·G + γQ·Q) (G + Q with a factor of safety;
// under EN 1997-1 DA1 the A1 set of DA1-1, the set of the STR
// verification). For a fully embedded pile without downdrag the head
// carries the most: below it the shaft sheds load faster than the pile's
// weight adds to it.
//
// With downdrag the largest force is at the neutral plane: the head load
// plus the drag load. runCandidate then takes the larger of this and the
// downdrag cases' structural force γG·Qd + γDD·Qn of the candidate at its
// length (see DowndragCase.StructuralEd).
func largestAxialForce(cases []pile.Case, l pile.Loads) units.Force {
	var ed units.Force
	for _, cs := range cases {
		ed = max(ed, units.Force(cs.Permanent)*l.Compression.Permanent+units.Force(cs.Variable)*l.Compression.Variable)
	}
	return ed
}

// runCandidates checks every candidate of the file, in parallel (one
// goroutine per processor; each result in its own slot, so the answer does
// not depend on the number of workers).
func runCandidates(f *File, in *Inputs, prof *profile.Profile, res *Result, step, maxTip units.Length) error {
	ci := in.candidates
	if ci == nil || in.Basis == nil {
		return nil
	}
	out, probs := chooseCandidates(f, in, prof, step, maxTip, runtime.GOMAXPROCS(0))
	if len(probs) > 0 {
		return probs
	}
	res.Candidates = out
	return nil
}

// chooseCandidates runs the candidates on workers goroutines.
func chooseCandidates(f *File, in *Inputs, prof *profile.Profile, step, maxTip units.Length, workers int) (*CandidatesResult, Problems) {
	ci := in.candidates
	n := len(ci.list)
	rows := make([]CandidateResult, n)
	errs := make([]Problems, n)
	workers = max(1, min(workers, n))
	next := make(chan int)
	var wg sync.WaitGroup
	for range workers {
		wg.Go(func() {
			for i := range next {
				rows[i], errs[i] = runCandidate(f, in, prof, &ci.list[i], step, maxTip)
			}
		})
	}
	for i := range n {
		next <- i
	}
	close(next)
	wg.Wait()
	var probs Problems
	for _, e := range errs {
		probs = append(probs, e...)
	}
	if len(probs) > 0 {
		return nil, probs
	}
	out := &CandidatesResult{Currency: ci.currency, Step: step, MaxTip: maxTip, Recommended: -1,
		Settlement: in.Settle != nil && in.Settle.HasAllowable}
	if r := structural.ForBasis(in.Basis); r != nil {
		out.Rule = r.ID()
	}
	if cases, err := in.Basis.Cases(in.Pile.Installation); err == nil {
		out.Ed = largestAxialForce(cases, in.Loads)
	}
	allCost := n > 0
	for i := range ci.list {
		allCost = allCost && ci.list[i].costs.given
	}
	out.SortedBy = "length × area"
	key := func(r *CandidateResult) float64 { return float64(r.Envelope) }
	if allCost {
		out.SortedBy = "cost"
		key = func(r *CandidateResult) float64 { return r.Cost }
	} else if ci.currency != "" {
		out.Notes = append(out.Notes, "costs are not given for every candidate: the candidates are ranked by length × gross area")
	}
	idx := make([]int, n)
	for i := range idx {
		idx[i] = i
	}
	slices.SortStableFunc(idx, func(a, b int) int {
		ra, rb := &rows[a], &rows[b]
		switch {
		case ra.Pass != rb.Pass:
			if ra.Pass {
				return -1
			}
			return 1
		case ra.Pass:
			if c := cmp.Compare(key(ra), key(rb)); c != 0 {
				return c
			}
		default:
			if c := cmp.Compare(ra.Use, rb.Use); c != 0 {
				return c
			}
		}
		return cmp.Compare(a, b)
	})
	for _, i := range idx {
		out.Rows = append(out.Rows, rows[i])
	}
	if n > 0 && out.Rows[0].Pass {
		out.Recommended = 0
	}
	if len(in.OtherProfiles) > 0 {
		out.Notes = append(out.Notes, "the candidates are checked in the file's own ground only, not in design.other_profiles (as the required length is)")
	}
	if !out.Settlement && in.Settle != nil {
		out.Notes = append(out.Notes, "the settlement section gives no allowable settlement: the candidates are not checked for settlement")
	}
	embedded := true
	for i := range ci.list {
		embedded = embedded && ci.list[i].member.Column.Length == 0
	}
	if embedded {
		out.Notes = append(out.Notes, "each section is taken as fully embedded: no buckling; a free length above the ground or in water needs a column check (free_length, steel sections)")
	} else {
		out.Notes = append(out.Notes, "steel sections with a free_length are checked as columns over it; the others are taken as fully embedded (no buckling); bending at the head is not checked")
	}
	return out, nil
}

// runCandidate checks one candidate.
func runCandidate(f *File, in *Inputs, prof *profile.Profile, c *candidateInput, step, maxTip units.Length) (CandidateResult, Problems) {
	out := CandidateResult{Name: c.name, Path: c.path, Section: c.pile.Section, Installation: c.pile.Installation}
	prob := func(path string, err error) (CandidateResult, Problems) {
		ps := Problems{{Path: path, Line: lineOf(f, path), Msg: err.Error(), Err: err}}
		return out, ps
	}
	cases, err := in.Basis.Cases(c.pile.Installation)
	if err != nil {
		var pe *pile.PathError
		if errors.As(err, &pe) {
			err = errors.New(pe.Msg)
		}
		return prob(c.path+".installation", err)
	}
	ed := largestAxialForce(cases, in.Loads)
	r, err := c.rule.Compression(c.member)
	if err != nil {
		path := c.path + ".material"
		var fe *structural.FieldError
		if errors.As(err, &fe) {
			path = c.path + strings.TrimPrefix(fe.Field, "candidate")
			err = errors.New(fe.Msg)
		}
		return prob(path, err)
	}
	out.Structural = structural.Verify(r, ed)
	geo, err := pile.RequiredLength(prof, c.pile, in.Methods, in.Basis, in.Loads, pile.Search{Step: step, MaxTip: maxTip})
	if err != nil {
		// The inputs of the analysis (a missing resistance factor, a
		// method out of its range) belong to their own keys; the message
		// names the candidate.
		var ps Problems
		if !errors.As(translate(f, err), &ps) || len(ps) == 0 {
			return prob(c.path, err)
		}
		for i := range ps {
			ps[i].Msg = c.name + " (" + c.path + "): " + ps[i].Msg
		}
		return out, ps
	}
	out.Geotechnical = geo
	settleOn := in.Settle != nil && in.Settle.HasAllowable
	switch {
	case !out.Structural.Pass:
		out.Governs, out.Use = "structure", out.Structural.Use
		out.Why = fmt.Sprintf("the section fails structurally at every length: the largest axial force %.4g kN exceeds its resistance %.4g kN (utilisation %.3g, %s rule)",
			ed.KN(), r.Design.KN(), out.Structural.Use, r.Rule)
		return out, nil
	case !geo.Found:
		out.Governs, out.Use = geo.BestGoverns, geo.BestUse
		out.Why = geo.NotFound()
		return out, nil
	}
	tip, use, governs := geo.TipDepth, max(geo.Use, out.Structural.Use), geo.Governs
	out.GeoUse = geo.Use
	if settleOn {
		st, s, su, ok, ps := settlementSearch(f, in, prof, c.pile, geo.TipDepth, step, maxTip)
		if len(ps) > 0 {
			for i := range ps {
				ps[i].Msg = c.name + ": " + ps[i].Msg
			}
			return out, ps
		}
		out.HasSettlement, out.Settlement, out.SettlementUse = true, s, su
		if !ok {
			out.Governs, out.Use = "settlement", su
			out.Why = fmt.Sprintf("no length passes the settlement check: the least settlement reached was %.3g mm (%.3g × the allowable) with the tip at %.4g m, the search limit being %.4g m",
				s.Millimetres(), su, st.Metres(), maxTip.Metres())
			return out, nil
		}
		if st > tip {
			tip, governs = st, "settlement"
			// The geotechnical utilisation at the longer pile is at most
			// the one at the shorter (every longer length passes).
		}
		use = max(use, su)
	}
	if di := in.downdrag; di != nil && di.solve != nil {
		ok, ps := candidateDowndrag(f, di, c, r, ed, &out, &tip, &use, &governs, step, maxTip)
		if len(ps) > 0 || !ok {
			return out, ps
		}
	}
	out.Pass, out.TipDepth, out.Length, out.Governs, out.Use = true, tip, tip-c.pile.HeadDepth, governs, use
	out.Concrete = units.Volume(float64(c.member.ConcreteArea()) * float64(out.Length))
	out.SteelMass = float64(c.member.SteelArea()) * float64(out.Length) * SteelDensity
	out.Envelope = units.Volume(float64(c.pile.Section.GrossArea()) * float64(out.Length))
	if k := c.costs; k.given {
		out.HasCost = true
		out.Cost = k.perMetre*out.Length.Metres() + k.perM3*out.Concrete.CubicMetres() + k.perKg*out.SteelMass + k.perPile
	}
	return out, nil
}

// settlementSearch returns the shallowest tip depth on the grid at or
// below from whose settlement at the serviceability load is within the
// allowable: the settlement is computed at from, then at from + step,
// + 2·step, + 4·step, … until one passes, then the grid between the last
// that failed and the first that passed is halved. ok is false when no
// tip down to maxTip passes; the depth, settlement and ratio then are
// those of the least ratio reached.
func settlementSearch(f *File, in *Inputs, prof *profile.Profile, p pile.Pile, from, step, maxTip units.Length) (tip, s units.Length, use float64, ok bool, probs Problems) {
	type sres struct {
		s   units.Length
		use float64
		ok  bool
	}
	memo := map[int]sres{}
	n := int((maxTip-from)/step + 1e-9)
	at := func(k int) (sres, Problems) {
		if r, ok := memo[k]; ok {
			return r, nil
		}
		q := p
		q.Length = from + units.Length(k)*step - p.HeadDepth
		if k == n {
			q.Length = maxTip - p.HeadDepth
		}
		a, err := pile.NewAnalysis(prof, q, in.Methods, nil)
		if err != nil {
			return sres{}, translate(f, err).(Problems)
		}
		b, err := a.Breakdown()
		if err != nil {
			return sres{}, translate(f, err).(Problems)
		}
		qin := *in
		qin.Pile = q
		sr, _, ps := settlement(f, &qin, in.Settle, prof, &Result{Breakdown: b})
		if len(ps) > 0 {
			return sres{}, ps
		}
		r := sres{s: sr.Settlement, use: float64(sr.Settlement / in.Settle.Allowable), ok: sr.Pass}
		if sr.Plunged {
			r.use = maxUse
		}
		memo[k] = r
		return r, nil
	}
	depth := func(k int) units.Length {
		if k >= n {
			return maxTip
		}
		return from + units.Length(k)*step
	}
	best := sres{use: maxUse}
	bestK := 0
	lo, hi := -1, -1 // last failing, first passing
	for k, d := 0, 1; ; {
		r, ps := at(k)
		if len(ps) > 0 {
			return 0, 0, 0, false, ps
		}
		if r.use < best.use {
			best, bestK = r, k
		}
		if r.ok {
			hi = k
			break
		}
		lo = k
		if k >= n {
			break
		}
		k = min(k+d, n)
		d *= 2
	}
	if hi < 0 {
		return depth(bestK), best.s, best.use, false, nil
	}
	for hi-lo > 1 && lo >= 0 {
		mid := (lo + hi) / 2
		r, ps := at(mid)
		if len(ps) > 0 {
			return 0, 0, 0, false, ps
		}
		if r.ok {
			hi = mid
		} else {
			lo = mid
		}
	}
	r := memo[hi]
	return depth(hi), r.s, r.use, true, nil
}

// maxUse is the utilisation reported where a check cannot be met at all
// (a pile that cannot carry the serviceability load).
const maxUse = 1e9

// candidateRefs are the sources of the structural rule in force.
func candidateRefs(in *Inputs) []cite.Ref {
	if in.candidates == nil || in.Basis == nil {
		return nil
	}
	if r := structural.ForBasis(in.Basis); r != nil {
		return r.Refs()
	}
	return nil
}

// candidateDowndrag walks the candidate down the search grid from tip
// until a length passes the downdrag check (the design cases with the drag
// load and no shaft resistance above the neutral plane) and the section
// carries the largest axial force with the drag load. It updates the tip,
// the utilisation and what governs, and records the neutral plane and the
// drag load at that length. ok is false when no length within the search
// passes; out then says why.
func candidateDowndrag(f *File, di *downdragInputs, c *candidateInput, rs structural.Resistance, ed units.Force,
	out *CandidateResult, tip *units.Length, use *float64, governs *string, step, maxTip units.Length) (bool, Problems) {
	ea, pr := pileEA(f, c.pile, "the neutral plane (downdrag) of "+c.name)
	if pr != nil {
		return false, Problems{*pr}
	}
	out.HasDowndrag = true
	var last DowndragResult
	var lastEd units.Force
	for t := *tip; t <= maxTip+1e-9; t += step {
		p := c.pile
		p.Length = t - p.HeadDepth
		var r DowndragResult
		if err := di.solve(p, ea, &r); err != nil {
			var ps Problems
			if errors.As(err, &ps) {
				for i := range ps {
					ps[i].Msg = c.name + " (" + c.path + "): " + ps[i].Msg
				}
				return false, ps
			}
			return false, Problems{{Path: c.path, Line: lineOf(f, c.path), Msg: c.name + ": " + err.Error(), Err: err}}
		}
		edDD := ed
		for _, cs := range r.Cases {
			edDD = max(edDD, cs.StructuralEd)
		}
		last, lastEd = r, edDD
		st := structural.Verify(rs, edDD)
		if !r.Pass || !st.Pass {
			continue
		}
		out.NeutralPlane, out.DragLoad, out.DowndragEd, out.Structural = r.NeutralPlane, r.DragLoad, edDD, st
		var geo float64
		for _, cs := range r.Cases {
			geo = max(geo, cs.Use)
		}
		if t > *tip {
			*tip, *governs = t, "downdrag"
		}
		*use = max(*use, geo, st.Use)
		return true, nil
	}
	out.NeutralPlane, out.DragLoad, out.DowndragEd = last.NeutralPlane, last.DragLoad, lastEd
	out.Structural = structural.Verify(rs, lastEd)
	out.Governs, out.Use = "downdrag", out.Structural.Use
	switch {
	case !out.Structural.Pass && last.Pass:
		out.Governs = "structure"
		out.Why = fmt.Sprintf("no length within the search carries the drag load: at the tip of %.4g m the largest axial force with the drag load, %.4g kN, exceeds the section's resistance %.4g kN",
			maxTip.Metres(), lastEd.KN(), rs.Design.KN())
	default:
		var u float64
		for _, cs := range last.Cases {
			u = max(u, cs.Use)
		}
		out.Use = u
		out.Why = fmt.Sprintf("no length within the search passes the downdrag check (the drag load as a load, no shaft resistance above the neutral plane): the utilisation at the tip of %.4g m is %.3g",
			maxTip.Metres(), u)
	}
	return false, nil
}
