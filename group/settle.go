package group

import (
	"fmt"
	"math"

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

// RaftInput is an equivalent raft: the load, the raft's plan and depth,
// and the depth to which the ground below is counted.
type RaftInput struct {
	Load   units.Force  // the group's service load
	Bg, Lg units.Length // plan of the raft
	Depth  units.Length // depth of the raft below ground
	Bottom units.Length // the deepest level counted (0: the profile's bottom)
}

// RaftLayer is one layer's share of the equivalent raft's settlement.
type RaftLayer struct {
	Layer       string
	Top, Bottom units.Length
	// Kind is "elastic" (∫Δσ/E dz), "consolidation" (the profile's
	// compressibility), or "none" (no stiffness given: nothing counted).
	Kind       string
	E          units.Stress // for elastic layers
	Settlement units.Length
}

// Raft is the settlement of the equivalent raft.
type Raft struct {
	Depth, Bottom units.Length
	Bg, Lg        units.Length
	Load          units.Force
	Pressure      units.Stress // Load/(Bg·Lg) at the raft
	Layers        []RaftLayer
	Elastic       units.Length
	Consolidation units.Length
	Total         units.Length
	Warnings      []string
	Refs          []cite.Ref
}

// RaftSettlement returns the settlement of an equivalent raft in profile
// prof: the load spread 2:1 below the raft (SpreadStress), the elastic
// compression ∫Δσ/E dz of layers with a Young's modulus E, in closed form,
// and the consolidation of compressible layers. A layer with neither gives
// nothing and a warning.
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
	r := Raft{Depth: in.Depth, Bottom: bottom, Bg: in.Bg, Lg: in.Lg, Load: in.Load,
		Pressure: units.StressOf(in.Load, units.Rectangle(in.Bg, in.Lg)),
		Refs:     []cite.Ref{{Source: cite.TomlinsonWoodward2008, Where: "§5.4, equivalent raft at two-thirds of the embedded length"}, {Source: cite.Das2019, Where: "2:1 spread of the load below a pile group"}}}
	b, l := float64(in.Bg), float64(in.Lg)
	ds := func(z units.Length) units.Stress {
		if z < in.Depth {
			return 0
		}
		return SpreadStress(in.Load, in.Bg, in.Lg, z-in.Depth)
	}
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
		r.Consolidation += p.Settlement
	}
	for i := range prof.NumLayers() {
		lay := prof.Layer(i)
		top, bot := max(lay.Top, in.Depth, prof.DesignGround()), min(lay.Bottom, bottom)
		if !(bot > top) || consolidated[i] {
			continue
		}
		row := RaftLayer{Layer: lay.Name, Top: top, Bottom: bot, Kind: "none"}
		if lay.E > 0 {
			row.Kind, row.E = "elastic", lay.E
			row.Settlement = units.Length(float64(in.Load) / float64(lay.E) * spreadIntegral(b, l, float64(top-in.Depth), float64(bot-in.Depth)))
			r.Elastic += row.Settlement
		} else {
			r.Warnings = append(r.Warnings, fmt.Sprintf("layer %q below the equivalent raft has no Young's modulus and no compressibility: it adds nothing to the settlement", lay.Name))
		}
		r.Layers = append(r.Layers, row)
	}
	sortRaftLayers(r.Layers)
	r.Total = r.Elastic + r.Consolidation
	return r, nil
}

func sortRaftLayers(ls []RaftLayer) {
	for i := 1; i < len(ls); i++ {
		for j := i; j > 0 && ls[j].Top < ls[j-1].Top; j-- {
			ls[j], ls[j-1] = ls[j-1], ls[j]
		}
	}
}
