package group

import (
	"errors"
	"fmt"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// Options are the choices of a group analysis; the zero value is the
// default.
type Options struct {
	// Efficiency: the rule (default practice), a value for rule given,
	// and whether the cap bears firmly on the ground (default false, the
	// lower efficiency).
	Rule       string
	Value      float64
	CapContact bool
	// CapEdge is the clear distance from the outer piles' faces to the
	// cap's edge (default DefaultCapEdge).
	CapEdge units.Length
	// BlockNc replaces Skempton's Nc of an undrained block base (0: none).
	BlockNc float64
	// RaftDepth places the equivalent raft (0: two-thirds of the embedded
	// length below the top of the embedded pile); RaftBottom is the
	// deepest level counted (0: the profile's bottom).
	RaftDepth, RaftBottom units.Length
	// RaftMethod is RaftTwoToOne (default) or RaftTomlinson; RaftStress,
	// RaftSpreadTop (0: the top of the embedded pile), RaftDepthFactor and
	// RaftGeologicalFactor are as in RaftInput.
	RaftMethod, RaftStress                string
	RaftSpreadTop                         units.Length
	RaftDepthFactor, RaftGeologicalFactor float64
	// ServiceLoad is the load on the cap for settlement (0: the
	// characteristic compression of Loads, permanent + variable).
	ServiceLoad units.Force
	// SingleSettlement is the settlement of one pile at the group's load
	// per pile, for Vesic's ratio; ignored unless HasSingleSettlement.
	SingleSettlement    units.Length
	HasSingleSettlement bool
	// NoRaft leaves the equivalent raft uncomputed.
	NoRaft bool
}

// DefaultCapEdge is the clear distance from the outer piles' faces to the
// cap's edge when none is given: 300 mm (common practice; above AASHTO's
// minimum of 9 in, 229 mm).
const DefaultCapEdge = 0.3 * units.Metre

// Input is a group of identical piles: the ground, the pile and its
// methods, the design basis (nil for none), the characteristic loads on
// the cap, and the layout.
type Input struct {
	Profile *profile.Profile
	Pile    pile.Pile
	Methods pile.Methods
	Basis   pile.Basis
	Loads   pile.Loads // on the whole cap
	Layout  Layout
	Options Options
	// Single is the single pile's design check under Basis when the
	// caller has it (such as one over several ground profiles, EN 1997-1
	// eq. 7.8); nil: Analyse checks the pile in Profile. Only its design
	// resistances are read.
	Single *pile.Design
}

// CaseCheck is the group's verification in one design case. The single
// pile's design resistance Rd and its characteristic resistance Rk in the
// profile give the case's overall multiplier Rd/Rk, which the block's
// resistance takes too:
//
//	Rd,group = min(η·n·Rd,single, (Rd/Rk)·Qblock)
//	Rt,d,group = min(n·Rt,d,single, (Rt,d/Rt,k)·Tblock)
//	Ed = γG·G + γQ·Q of the loads on the cap
type CaseCheck struct {
	Case                           string
	Ratio, TensionRatio            float64
	PilesRd, BlockRd, Rd, Ed       units.Force
	Use                            float64
	PilesTensionRd, BlockTensionRd units.Force
	TensionRd, TensionEd           units.Force
	TensionUse                     float64
	Pass                           bool
}

// Design is the group's design check under a basis.
type Design struct {
	Basis     string
	Cases     []CaseCheck
	Governing int // index of the highest utilisation
	Pass      bool
}

// VesicResult is the group settlement by Vesic's ratio.
type VesicResult struct {
	Single, Group units.Length
	Ref           cite.Ref
}

// Result is a group analysis: the characteristic capacities in
// compression and tension, the design check, and the settlements.
type Result struct {
	N          int
	Layout     Layout       // as given
	Width      units.Length // the pile's width D
	Geometry   Geometry
	Efficiency Efficiency
	Single     pile.Capacity // the single pile, characteristic
	// Compression: n·Rc, η·n·Rc, the block, and the lesser.
	SumSingles units.Force
	Reduced    units.Force
	Block      *Block // nil for a single pile
	Capacity   units.Force
	Governs    string // "piles" or "block"
	// Tension: n·Rt, the block's W′ + side shear, and the lesser.
	SumTension    units.Force
	BlockUplift   units.Force
	Uplift        units.Force
	UpliftGoverns string
	Design        *Design
	Vesic         *VesicResult
	Raft          *Raft
	Warnings      []string
	Refs          []cite.Ref
}

// Analyse analyses the group.
func Analyse(in Input) (*Result, error) {
	if in.Profile == nil {
		return nil, errors.New("group: no ground profile")
	}
	p := in.Pile
	if err := p.Validate(); err != nil {
		return nil, err
	}
	if err := in.Loads.Validate("loads"); err != nil {
		return nil, err
	}
	o := in.Options
	capEdge := o.CapEdge
	if capEdge == 0 {
		capEdge = DefaultCapEdge
	}
	d := p.Section.Size()
	bored := p.Installation == pile.Bored || p.Installation == pile.Augered
	geo, warn, err := in.Layout.Measure(d, capEdge, bored)
	if err != nil {
		return nil, err
	}
	res := &Result{N: geo.N, Layout: in.Layout, Width: d, Geometry: geo, Warnings: warn, Refs: SpacingRefs()}
	top := max(p.HeadDepth, in.Profile.DesignGround())
	undrained, err := anyUndrained(in.Profile, top, p.Tip())
	if err != nil {
		return nil, err
	}
	res.Efficiency, err = GroupEfficiency(in.Layout, EfficiencyInput{Rule: o.Rule, Width: d, Undrained: undrained,
		CapContact: o.CapContact, Bored: bored, Value: o.Value})
	if err != nil {
		return nil, err
	}
	res.Warnings = append(res.Warnings, res.Efficiency.Warnings...)
	res.Refs = append(res.Refs, res.Efficiency.Refs...)

	a, err := pile.NewAnalysis(in.Profile, p, in.Methods, nil)
	if err != nil {
		return nil, err
	}
	res.Single, err = a.Capacity()
	if err != nil {
		return nil, err
	}
	n := units.Force(geo.N)
	res.SumSingles = n * res.Single.Compression
	res.Reduced = units.Force(res.Efficiency.Value) * res.SumSingles
	res.Capacity, res.Governs = res.Reduced, "piles"
	res.SumTension = n * res.Single.Tension
	res.Uplift, res.UpliftGoverns = res.SumTension, "piles"
	if geo.N > 1 {
		b, err := BlockCapacity(in.Profile, BlockInput{Top: top, Tip: p.Tip(), Bg: geo.Bg, Lg: geo.Lg, Nc: o.BlockNc, DrainedBase: res.Single.UnitTip})
		if err != nil {
			return nil, err
		}
		res.Block = &b
		res.Refs = append(res.Refs, b.Refs...)
		if b.Capacity < res.Capacity {
			res.Capacity, res.Governs = b.Capacity, "block"
		}
		res.BlockUplift = b.Weight + b.Side
		if res.BlockUplift < res.Uplift {
			res.Uplift, res.UpliftGoverns = res.BlockUplift, "block"
		}
		res.Refs = append(res.Refs, cite.Ref{Source: cite.AASHTO2020, Where: "10.7.3.11, group uplift: the lesser of the piles and the block (from memory)"})
	}
	if in.Basis != nil {
		if res.Design, err = design(in, res); err != nil {
			return nil, err
		}
		res.Refs = append(res.Refs, in.Basis.Refs()...)
	}
	if o.HasSingleSettlement {
		if !(o.SingleSettlement >= 0) {
			return nil, &FieldError{"single settlement", fmt.Sprintf("%v: want 0 or more", o.SingleSettlement)}
		}
		res.Vesic = &VesicResult{Single: o.SingleSettlement, Group: VesicSettlement(o.SingleSettlement, geo.Bg, d), Ref: VesicRef}
		res.Refs = append(res.Refs, VesicRef)
	}
	if !o.NoRaft {
		if err := equivalentRaft(in, res, top); err != nil {
			return nil, err
		}
	}
	res.Refs = uniqueRefs(res.Refs)
	return res, nil
}

// equivalentRaft adds the settlement of the equivalent raft under the
// service load to res; without a load, a warning instead.
func equivalentRaft(in Input, res *Result, top units.Length) error {
	o := in.Options
	load := o.ServiceLoad
	if load == 0 {
		load = in.Loads.Compression.Total()
	}
	if load == 0 {
		res.Warnings = append(res.Warnings, "no compression load on the cap: the equivalent raft's settlement is not computed")
		return nil
	}
	depth := o.RaftDepth
	if depth == 0 {
		depth = top + units.Length(RaftDepthRatio)*(in.Pile.Tip()-top)
	}
	spreadTop := o.RaftSpreadTop
	if spreadTop == 0 {
		spreadTop = min(top, depth)
	}
	r, err := RaftSettlement(in.Profile, RaftInput{Load: load, Bg: res.Geometry.Bg, Lg: res.Geometry.Lg, Depth: depth, Bottom: o.RaftBottom,
		Method: o.RaftMethod, SpreadTop: spreadTop, Stress: o.RaftStress, DepthFactor: o.RaftDepthFactor, GeologicalFactor: o.RaftGeologicalFactor})
	if err != nil {
		return err
	}
	res.Raft = &r
	res.Warnings = append(res.Warnings, r.Warnings...)
	res.Refs = append(res.Refs, r.Refs...)
	return nil
}

// uniqueRefs drops repeated references, keeping the first of each.
func uniqueRefs(rs []cite.Ref) []cite.Ref {
	seen := map[cite.Ref]bool{}
	out := rs[:0]
	for _, r := range rs {
		if !seen[r] {
			seen[r] = true
			out = append(out, r)
		}
	}
	return out
}

// design applies the basis to the group (see CaseCheck).
func design(in Input, res *Result) (*Design, error) {
	cases, err := in.Basis.Cases(in.Pile.Installation)
	if err != nil {
		return nil, err
	}
	sd := in.Single
	if sd == nil {
		d, err := pile.Check(in.Profile, in.Pile, in.Methods, in.Basis, pile.Loads{})
		if err != nil {
			return nil, err
		}
		sd = &d
	}
	if len(sd.Cases) != len(cases) {
		return nil, fmt.Errorf("group: %d design cases, %d verifications", len(cases), len(sd.Cases))
	}
	n := units.Force(res.N)
	eta := units.Force(res.Efficiency.Value)
	d := &Design{Basis: sd.Basis, Pass: true}
	worst := -1.0
	for i, cs := range cases {
		v := sd.Cases[i]
		c := CaseCheck{Case: cs.Name}
		c.Ratio = ratio(v.CompressionRd, res.Single.Compression)
		c.TensionRatio = ratio(v.TensionRd, res.Single.Tension)
		c.PilesRd = eta * n * v.CompressionRd
		c.Rd = c.PilesRd
		c.PilesTensionRd = n * v.TensionRd
		c.TensionRd = c.PilesTensionRd
		if res.Block != nil {
			c.BlockRd = units.Force(c.Ratio) * res.Block.Capacity
			c.Rd = min(c.Rd, c.BlockRd)
			c.BlockTensionRd = units.Force(c.TensionRatio) * res.BlockUplift
			c.TensionRd = min(c.TensionRd, c.BlockTensionRd)
		}
		c.Ed = units.Force(cs.Permanent)*in.Loads.Compression.Permanent + units.Force(cs.Variable)*in.Loads.Compression.Variable
		c.TensionEd = units.Force(cs.Permanent)*in.Loads.Tension.Permanent + units.Force(cs.Variable)*in.Loads.Tension.Variable
		c.Use = use(c.Ed, c.Rd)
		c.TensionUse = use(c.TensionEd, c.TensionRd)
		c.Pass = c.Use <= 1 && c.TensionUse <= 1
		d.Pass = d.Pass && c.Pass
		if u := max(c.Use, c.TensionUse); u > worst {
			worst, d.Governing = u, i
		}
		d.Cases = append(d.Cases, c)
	}
	return d, nil
}

// MaxUse returns the highest utilisation over all cases and both
// directions.
func (d *Design) MaxUse() float64 {
	m := 0.0
	for _, c := range d.Cases {
		m = max(m, c.Use, c.TensionUse)
	}
	return m
}

func ratio(rd, rk units.Force) float64 {
	if !(rk > 0) {
		return 0
	}
	return float64(rd / rk)
}

// use returns ed/rd, 0 for no load and a very large finite number when
// there is a load and no resistance (results stay finite).
func use(ed, rd units.Force) float64 {
	switch {
	case ed <= 0:
		return 0
	case rd <= 0:
		return 1e300
	}
	return float64(ed / rd)
}

// anyUndrained reports whether a layer from top to tip, or the layer at
// the tip, is undrained.
func anyUndrained(prof *profile.Profile, top, tip units.Length) (bool, error) {
	for i := range prof.NumLayers() {
		l := prof.Layer(i)
		if l.Bottom > top && l.Top <= tip && l.Drainage == profile.Undrained {
			return true, nil
		}
	}
	if tip > prof.Depth() {
		return false, fmt.Errorf("group: tip %v below the profile (to %v)", tip, prof.Depth())
	}
	return false, nil
}
