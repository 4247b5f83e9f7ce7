package group

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/integrate/quad"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// VesicSettlement returns the settlement of a group of width bg from the
// settlement s of a single pile of width d at the same load per pile
// (Vesic 1969):
//
//	sg = s·√(Bg/D)
//
// It panics unless bg, d > 0 and s ≥ 0.
func VesicSettlement(s, bg, d units.Length) units.Length {
	if !(bg > 0) || !(d > 0) || !(s >= 0) {
		panic(fmt.Sprintf("group: VesicSettlement(%v, %v, %v)", s, bg, d))
	}
	return units.Length(float64(s) * math.Sqrt(float64(bg/d)))
}

// VesicRef is the source of VesicSettlement.
var VesicRef = cite.Ref{Source: cite.Vesic1969, Where: "group settlement ratio sg/s = √(Bg/D), as Das & Sivakugan (2019) give it"}

// RaftDepthRatio is the share of the embedded length below the head at
// which the equivalent raft sits: two-thirds (Tomlinson & Woodward 2008).
const RaftDepthRatio = 2.0 / 3

// SpreadStress returns the increase of vertical stress at z′ below a raft
// B × L carrying q, spread at 2 vertical to 1 horizontal:
//
//	Δσ = Q/((B + z′)(L + z′))
func SpreadStress(q units.Force, b, l, zp units.Length) units.Stress {
	return units.Stress(float64(q) / (float64(b+zp) * float64(l+zp)))
}

// spreadIntegral returns ∫ dz′/((B + z′)(L + z′)) from z′ = a to c:
//
//	B ≠ L: [ln((B + z′)/(L + z′))]/(L − B);  B = L: [−1/(B + z′)]
func spreadIntegral(b, l, a, c float64) float64 {
	if math.Abs(l-b) <= 1e-12*max(b, l) {
		return 1/(b+a) - 1/(b+c)
	}
	return (math.Log((b+c)/(l+c)) - math.Log((b+a)/(l+a))) / (l - b)
}

// Ways of spreading the equivalent raft's load into the ground below it
// (RaftInput.Method).
const (
	// RaftTwoToOne (the default) takes the group's plan Bg × Lg at the
	// raft and the stress Q/((Bg + z′)(Lg + z′)) below it: the load
	// spread 2 vertical to 1 horizontal, the mean over the spread area.
	RaftTwoToOne = "two-to-one"
	// RaftTomlinson is Tomlinson & Woodward's procedure: the raft's plan
	// widened from the group's by a spread of 1 horizontal in 4 vertical
	// from SpreadTop down to the raft, and the stress below it from
	// elastic theory (Boussinesq, Newmark's closed form) under the raft's
	// centre or averaged over its plan (RaftInput.Stress).
	RaftTomlinson = "tomlinson"
)

// Where the elastic stress below a Tomlinson raft is taken
// (RaftInput.Stress).
const (
	// StressCentre (the default) is the stress below the raft's centre,
	// the largest on any vertical below it: the conservative choice.
	StressCentre = "centre"
	// StressAverage is the stress averaged over the raft's plan, the
	// stress whose oedometer sum gives the settlement of a stiff raft;
	// it reproduces the stress factors printed in Tomlinson & Woodward's
	// Example 5.1 (p. 294).
	StressAverage = "average"
	// StressSpread is the 2:1 spread below the widened raft,
	// Q/((Br + z′)(Lr + z′)), the mean over the spread area, as some
	// teaching texts combine the 1:4 raft with the 2:1 spread (NPTEL
	// course 105101083, module 5, lecture 25, "Pile groups").
	StressSpread = "two-to-one"
)

// MaxGeologicalFactor is the largest geological factor μg accepted: 1.2,
// the value for very sensitive soft clays (Skempton & Bjerrum's range as
// Tomlinson & Woodward give it, from memory).
const MaxGeologicalFactor = 1.2

// RaftInput is an equivalent raft: the load, the group's plan, the raft's
// depth, the depth to which the ground below is counted, and the method.
type RaftInput struct {
	Load   units.Force  // the group's service load
	Bg, Lg units.Length // plan of the group (the raft's plan with the two-to-one method)
	Depth  units.Length // depth of the raft below ground
	Bottom units.Length // the deepest level counted (0: the profile's bottom)

	// Method is RaftTwoToOne ("" too) or RaftTomlinson.
	Method string
	// SpreadTop is where the 1:4 spread of a Tomlinson raft starts (the
	// pile heads, or the top of the stratum the piles bear in); it must
	// not be below Depth. Ignored by the two-to-one method.
	SpreadTop units.Length
	// Stress is StressCentre ("" too), StressAverage or StressSpread
	// (Tomlinson only).
	Stress string
	// DepthFactor μd (the correction for the raft's depth, Fox's) and
	// GeologicalFactor μg multiply the consolidation (oedometer)
	// settlement; 0 means 1, no reduction (the conservative default).
	// μd is in (0, 1], μg in (0, MaxGeologicalFactor].
	DepthFactor, GeologicalFactor float64
}

// RaftLayer is one layer's share of the equivalent raft's settlement.
type RaftLayer struct {
	Layer       string
	Top, Bottom units.Length
	// Kind is "elastic" (∫Δσ/E dz), "consolidation" (the profile's
	// compressibility), or "none" (no stiffness given: nothing counted).
	Kind string
	E    units.Stress // for elastic layers
	// Settlement is the layer's share; for consolidation, before the
	// depth and geological factors.
	Settlement units.Length
}

// Raft is the settlement of the equivalent raft.
type Raft struct {
	Method string // RaftTwoToOne or RaftTomlinson
	Stress string // StressCentre, StressAverage or StressSpread (Tomlinson); "" for two-to-one
	Depth  units.Length
	Bottom units.Length
	// GroupBg × GroupLg is the group's plan; Bg × Lg the raft's, widened
	// by the 1:4 spread from SpreadTop for a Tomlinson raft.
	GroupBg, GroupLg units.Length
	SpreadTop        units.Length
	Bg, Lg           units.Length
	Load             units.Force
	Pressure         units.Stress // Load/(Bg·Lg) at the raft
	Layers           []RaftLayer
	Elastic          units.Length
	// Oedometer is the sum of the consolidation layers; Consolidation is
	// Oedometer·DepthFactor·GeologicalFactor.
	Oedometer                     units.Length
	DepthFactor, GeologicalFactor float64
	Consolidation                 units.Length
	Total                         units.Length
	Warnings                      []string
	Refs                          []cite.Ref
}

// Sources of the equivalent raft.
var (
	raftDepthRef  = cite.Ref{Source: cite.TomlinsonWoodward2008, Where: "Fig. 5.4 (p. 243): equivalent raft at two-thirds of the embedded length"}
	raftTwoToOne  = cite.Ref{Source: cite.Murthy2002, Where: "settlement of pile groups in clay, Fig. 15.31: load at 2/3 L on the group's area, spread 2 vertical : 1 horizontal (common practice)"}
	raftTomlinson = cite.Ref{Source: cite.TomlinsonWoodward2008, Where: "Fig. 5.4 (p. 243) and Example 5.1 (pp. 292-294): 1:4 spread from the pile heads, elastic stress below the raft, ρc = μd·μg·Σ mv·Δσ·H"}
	raftNewmark   = cite.Ref{Source: cite.Newmark1935, Where: "vertical stress below a corner of a uniformly loaded rectangle (Boussinesq)"}
	raftSpreadRef = cite.Ref{Source: cite.NPTEL105101083, Where: "lecture 25, section 25.4: the mat widened 1H:4V, the 2:1 spread below it"}
)

// RaftSettlement returns the settlement of an equivalent raft in profile
// prof: the load spread below the raft (2:1, SpreadStress; or Tomlinson's
// 1:4 raft with the elastic stress, CentreStress or AverageStress), the
// elastic compression ∫Δσ/E dz of layers with a Young's modulus E, and the
// consolidation of compressible layers times μd·μg. A layer with neither
// gives nothing and a warning.
func RaftSettlement(prof *profile.Profile, in RaftInput) (Raft, error) {
	bottom := in.Bottom
	if bottom == 0 {
		bottom = prof.Depth()
	}
	if !(in.Bg > 0) || !(in.Lg > 0) || !(in.Load >= 0) || math.IsInf(float64(in.Load), 0) {
		return Raft{}, fmt.Errorf("group: raft %v × %v under %v: want positive dimensions and a load ≥ 0", in.Bg, in.Lg, in.Load)
	}
	if !(in.Depth >= 0) || !(in.Depth < prof.Depth()) {
		return Raft{}, &FieldError{"raft_depth", fmt.Sprintf("%v: want 0 or more and above the bottom of the ground profile (%v)", in.Depth, prof.Depth())}
	}
	if !(bottom > in.Depth) || bottom > prof.Depth() {
		return Raft{}, &FieldError{"raft_bottom", fmt.Sprintf("%v: want below the raft (%v) and within the ground profile (to %v)", bottom, in.Depth, prof.Depth())}
	}
	mu := func(x float64) float64 {
		if x == 0 {
			return 1
		}
		return x
	}
	md, mg := mu(in.DepthFactor), mu(in.GeologicalFactor)
	if !(md > 0 && md <= 1) {
		return Raft{}, &FieldError{"raft_depth_factor", fmt.Sprintf("%g: want more than 0 and at most 1", in.DepthFactor)}
	}
	if !(mg > 0 && mg <= MaxGeologicalFactor) {
		return Raft{}, &FieldError{"raft_geological_factor", fmt.Sprintf("%g: want more than 0 and at most %g", in.GeologicalFactor, MaxGeologicalFactor)}
	}
	r := Raft{Method: RaftTwoToOne, Depth: in.Depth, Bottom: bottom, GroupBg: in.Bg, GroupLg: in.Lg, Bg: in.Bg, Lg: in.Lg, Load: in.Load,
		DepthFactor: md, GeologicalFactor: mg, Refs: []cite.Ref{raftDepthRef}}
	var ds func(z units.Length) units.Stress
	switch in.Method {
	case "", RaftTwoToOne:
		if in.Stress != "" {
			return Raft{}, &FieldError{"raft_stress", fmt.Sprintf("%q: only a %s raft reads it", in.Stress, RaftTomlinson)}
		}
		r.Refs = append(r.Refs, raftTwoToOne)
		ds = func(z units.Length) units.Stress {
			if z < in.Depth {
				return 0
			}
			return SpreadStress(in.Load, in.Bg, in.Lg, z-in.Depth)
		}
	case RaftTomlinson:
		if !(in.SpreadTop >= 0) || in.SpreadTop > in.Depth {
			return Raft{}, &FieldError{"raft_spread_top", fmt.Sprintf("%v: want 0 or more and not below the raft (%v)", in.SpreadTop, in.Depth)}
		}
		r.Method, r.SpreadTop = RaftTomlinson, in.SpreadTop
		w := (in.Depth - in.SpreadTop) / 2 // 2 × (depth/4): both sides
		r.Bg, r.Lg = in.Bg+w, in.Lg+w
		q := units.StressOf(in.Load, units.Rectangle(r.Bg, r.Lg))
		var at func(units.Stress, units.Length, units.Length, units.Length) units.Stress
		switch in.Stress {
		case "", StressCentre:
			r.Stress, at = StressCentre, CentreStress
		case StressAverage:
			r.Stress, at = StressAverage, AverageStress
		case StressSpread:
			r.Stress = StressSpread
			at = func(q units.Stress, b, l, zp units.Length) units.Stress {
				return units.Stress(float64(q) * float64(b) * float64(l) / (float64(b+zp) * float64(l+zp)))
			}
		default:
			return Raft{}, &FieldError{"raft_stress", fmt.Sprintf("%q: want %s, %s or %s", in.Stress, StressCentre, StressAverage, StressSpread)}
		}
		r.Refs = append(r.Refs, raftTomlinson)
		if r.Stress == StressSpread {
			r.Refs = append(r.Refs, raftSpreadRef)
		} else {
			r.Refs = append(r.Refs, raftNewmark)
		}
		ds = func(z units.Length) units.Stress {
			if z < in.Depth {
				return 0
			}
			return at(q, r.Bg, r.Lg, z-in.Depth)
		}
	default:
		return Raft{}, &FieldError{"raft_method", fmt.Sprintf("%q: want %s or %s", in.Method, RaftTwoToOne, RaftTomlinson)}
	}
	r.Pressure = units.StressOf(in.Load, units.Rectangle(r.Bg, r.Lg))
	consolidated := map[int]bool{}
	_, parts, err := prof.Consolidation(in.Depth, bottom, ds)
	if err != nil {
		return Raft{}, err
	}
	for _, p := range parts {
		if p.Model == profile.Incompressible {
			continue
		}
		consolidated[p.Layer] = true
		r.Layers = append(r.Layers, RaftLayer{Layer: prof.Layer(p.Layer).Name, Top: p.Top, Bottom: p.Bottom, Kind: "consolidation", Settlement: p.Settlement})
		r.Oedometer += p.Settlement
	}
	b, l := float64(r.Bg), float64(r.Lg) // the raft's plan (the group's for two-to-one)
	for i := range prof.NumLayers() {
		lay := prof.Layer(i)
		top, bot := max(lay.Top, in.Depth, prof.DesignGround()), min(lay.Bottom, bottom)
		if !(bot > top) || consolidated[i] {
			continue
		}
		row := RaftLayer{Layer: lay.Name, Top: top, Bottom: bot, Kind: "none"}
		if lay.E > 0 {
			row.Kind, row.E = "elastic", lay.E
			if r.Method == RaftTwoToOne || r.Stress == StressSpread {
				row.Settlement = units.Length(float64(in.Load) / float64(lay.E) * spreadIntegral(b, l, float64(top-in.Depth), float64(bot-in.Depth)))
			} else {
				row.Settlement = units.Length(integrateStress(ds, float64(top), float64(bot)) / float64(lay.E))
			}
			r.Elastic += row.Settlement
		} else {
			r.Warnings = append(r.Warnings, fmt.Sprintf("layer %q below the equivalent raft has no Young's modulus and no compressibility: it adds nothing to the settlement", lay.Name))
		}
		r.Layers = append(r.Layers, row)
	}
	sortRaftLayers(r.Layers)
	r.Consolidation = units.Length(float64(r.Oedometer) * md * mg)
	if md*mg < 1 && r.Oedometer > 0 {
		r.Warnings = append(r.Warnings, fmt.Sprintf("the equivalent raft's consolidation settlement is reduced by the factors given, μd = %g and μg = %g (%.3g of the oedometer value): check them for the site", md, mg, md*mg))
	}
	r.Total = r.Elastic + r.Consolidation
	return r, nil
}

// integrateStress returns ∫ ds dz from a to b by 12-point Gauss–Legendre
// on pieces of at most 1 m, as profile.Profile.Consolidation integrates.
func integrateStress(ds func(units.Length) units.Stress, a, b float64) float64 {
	n := max(1, int(math.Ceil(b-a-1e-9)))
	h := (b - a) / float64(n)
	var s float64
	for k := range n {
		s += quad.Fixed(func(z float64) float64 { return float64(ds(units.Length(z))) }, a+float64(k)*h, a+float64(k+1)*h, 12, quad.Legendre{}, 0)
	}
	return s
}

func sortRaftLayers(ls []RaftLayer) {
	for i := 1; i < len(ls); i++ {
		for j := i; j > 0 && ls[j].Top < ls[j-1].Top; j-- {
			ls[j], ls[j-1] = ls[j-1], ls[j]
		}
	}
}
