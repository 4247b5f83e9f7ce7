package calc

import (
	"errors"
	"fmt"
	"math"
	"slices"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/settle"
	"github.com/qultgeo/qult/units"
)

// Downdrag says which loads come after the pile is installed (a fill, a
// surcharge, a lowered water table) and asks for the neutral plane, the
// drag load and the largest axial force by the unified method (package
// settle, Downdrag). Everything in ground: is in place before the pile is
// installed; what this section lists is placed after it, so the layers it
// makes settle drag the pile down and give no resistance above the
// neutral plane.
//
// Choices where the sources leave it open:
//   - The fill and the surcharge act as a uniform surcharge on the ground
//     surface (a wide fill); the fill around the pile above the original
//     ground is not part of the pile's length (model a fill the pile
//     passes through as a layer of ground: with its own settlement given
//     in ground_settlement it drags the pile like any other layer).
//   - The unit shaft resistance, positive or negative, is the pile
//     analysis' own (the layer's method, defaults and limits) in the
//     ground after the loads: the β methods at the long-term σ′v (the
//     fill, the surcharge and the lowered water table included), the
//     α methods with su as given (a total-stress method does not see the
//     change).
//   - The sustained load is load, or else the permanent part of
//     loads.compression; transient loads do not add to the drag load
//     (Fellenius 2004).
//   - The mobilised tip resistance is found by settlement compatibility on
//     the q-z curve (settlement.q_z, or the API curve) unless tip_force
//     gives it.
type Downdrag struct {
	Load             Value                   `yaml:"load,omitempty" json:"load,omitempty" q:"force,0," doc:"Sustained (permanent) load on the head for the neutral plane; absent: the permanent part of loads.compression."`
	Fill             *Fill                   `yaml:"fill,omitempty" json:"fill,omitempty" doc:"A fill placed over the ground after the pile is installed, acting as a uniform surcharge thickness × unit weight."`
	Surcharge        Value                   `yaml:"surcharge,omitempty" json:"surcharge,omitempty" q:"stress,0," doc:"A uniform surcharge placed on the ground after the pile is installed."`
	WaterDepthAfter  Value                   `yaml:"water_depth_after,omitempty" json:"water_depth_after,omitempty" q:"length,0," doc:"Depth of the water table after a lowering that follows installation; at or below ground.water_depth."`
	GroundSettlement []GroundSettlementPoint `yaml:"ground_settlement,omitempty" json:"ground_settlement,omitempty" doc:"Long-term ground settlement with depth, as points with depths increasing (linear between them, constant beyond the ends): give a point of zero settlement at the bottom of the compressible layers."`
	TipForce         Value                   `yaml:"tip_force,omitempty" json:"tip_force,omitempty" q:"force,0," doc:"Mobilised tip resistance Rt,mob, given; absent: found so that the pile settles with the ground at the neutral plane (q-z curve of settlement.q_z, or the API curve)."`
	DragLoadFactor   Value                   `yaml:"drag_load_factor,omitempty" json:"drag_load_factor,omitempty" q:"number,0,10" doc:"Load factor on the drag load in the design check; absent: lrfd 1.4 for driven piles (1.05 where the negative skin friction is by the λ method alone), 1.25 for bored piles (AASHTO LRFD Table 3.4.1-2, DD maximum, from memory), en1997 and safety-factor the factor on permanent actions."`
}

// Fill is a fill placed after installation.
type Fill struct {
	Thickness  Value `yaml:"thickness" json:"thickness" q:"length,0," doc:"Thickness of the fill."`
	UnitWeight Value `yaml:"unit_weight" json:"unit_weight" q:"unitweight,0," doc:"Unit weight of the fill."`
}

// GroundSettlementPoint is the long-term settlement of the ground at a
// depth.
type GroundSettlementPoint struct {
	Depth      Value `yaml:"depth" json:"depth" q:"length,0," doc:"Depth below ground level."`
	Settlement Value `yaml:"settlement" json:"settlement" q:"length,0," doc:"Long-term settlement of the ground at that depth."`
}

// downdragInputs is the downdrag section resolved (SI).
type downdragInputs struct {
	load, tipForce      units.Force
	hasLoad, hasTip     bool
	fillT               units.Length
	fillW               units.UnitWeight
	surcharge           units.Stress
	waterAfter          units.Length
	hasWater            bool
	ground              []settle.SettlementPoint
	factor              float64
	hasFactor           bool
	loadLine, waterLine int
	// solve runs the unified method and the design cases for another pile
	// of axial stiffness ea in the same ground after the loads (set by
	// runDowndrag; the candidates use it). It only reads what it shares,
	// so candidates may call it at once.
	solve func(p pile.Pile, ea units.Force, r *DowndragResult) error
}

// The AASHTO LRFD load factors on downdrag DD (Table 3.4.1-2, maximum
// values, from memory: the table was not read here): 1.4 for piles by the
// α (Tomlinson) method, 1.05 for piles by the λ method, 1.25 for drilled
// shafts (O'Neill & Reese 1999). qult takes 1.25 for bored piles, 1.05
// for driven piles whose negative skin friction comes from the λ method
// alone, and 1.4 (the largest) for every other driven pile.
const (
	aashtoDDDriven  = 1.4
	aashtoDDLambda  = 1.05
	aashtoDDDrilled = 1.25
)

// lambdaAbove reports whether every shaft row with friction above the
// neutral plane uses the λ method (and there is at least one).
func lambdaAbove(out *DowndragResult) bool {
	n := 0
	for _, r := range out.Rows {
		if r.Top >= out.NeutralPlane || r.Force == 0 {
			continue
		}
		if r.Method != "lambda" {
			return false
		}
		n++
	}
	return n > 0
}

func (r *resolver) downdrag(f *File, in *Inputs) {
	d := f.Downdrag
	if d == nil {
		return
	}
	const pre = "downdrag"
	di := &downdragInputs{}
	if d.Load.IsSet() {
		di.load, di.hasLoad, di.loadLine = r.force(d.Load, pre+".load"), true, d.Load.Line
		if di.load < 0 || di.load > maxLoad {
			r.add(pre+".load", d.Load.Line, "%q is outside 0 to %v", d.Load.Raw, maxLoad)
		}
	}
	if fl := d.Fill; fl != nil {
		if !fl.Thickness.IsSet() || !fl.UnitWeight.IsSet() {
			r.add(pre+".fill", 0, "give both thickness and unit_weight of the fill")
		}
		di.fillT = r.length(fl.Thickness, pre+".fill.thickness")
		if di.fillT < 0 || di.fillT > 100*units.Metre {
			r.add(pre+".fill.thickness", fl.Thickness.Line, "%q is outside 0 to 100 m", fl.Thickness.Raw)
		}
		di.fillW = r.weight(fl.UnitWeight, pre+".fill.unit_weight")
		if di.fillW < 0 || di.fillW > 30e3 {
			r.add(pre+".fill.unit_weight", fl.UnitWeight.Line, "%q is outside 0 to 30 kN/m3", fl.UnitWeight.Raw)
		}
	}
	di.surcharge = r.stress(d.Surcharge, pre+".surcharge")
	if di.surcharge < 0 || di.surcharge > 10e6 {
		r.add(pre+".surcharge", d.Surcharge.Line, "%q is outside 0 to 10 MPa", d.Surcharge.Raw)
	}
	if d.WaterDepthAfter.IsSet() {
		di.waterAfter, di.hasWater, di.waterLine = r.length(d.WaterDepthAfter, pre+".water_depth_after"), true, d.WaterDepthAfter.Line
		if di.waterAfter < 0 {
			r.add(pre+".water_depth_after", d.WaterDepthAfter.Line, "%q: want a depth at or below ground level (0 or more)", d.WaterDepthAfter.Raw)
		}
	}
	for i, p := range d.GroundSettlement {
		path := fmt.Sprintf("%s.ground_settlement[%d]", pre, i)
		if !p.Depth.IsSet() || !p.Settlement.IsSet() {
			r.add(path, 0, "give both depth and settlement")
			continue
		}
		di.ground = append(di.ground, settle.SettlementPoint{Depth: r.length(p.Depth, path+".depth"), Settlement: r.length(p.Settlement, path+".settlement")})
	}
	if err := settle.CheckSettlementProfile(di.ground); err != nil {
		path, msg := splitPath(err.Error())
		r.add(pre+"."+path, 0, "%s", msg)
	}
	if d.TipForce.IsSet() {
		di.tipForce, di.hasTip = r.force(d.TipForce, pre+".tip_force"), true
		if di.tipForce < 0 || di.tipForce > maxLoad {
			r.add(pre+".tip_force", d.TipForce.Line, "%q is outside 0 to %v", d.TipForce.Raw, maxLoad)
		}
	}
	if d.DragLoadFactor.IsSet() {
		di.factor, di.hasFactor = r.num(d.DragLoadFactor, pre+".drag_load_factor", 0, 10), true
	}
	if di.fillT == 0 && di.surcharge == 0 && !di.hasWater && len(di.ground) == 0 {
		r.add(pre, 0, "nothing placed after installation: give a fill, a surcharge, water_depth_after or ground_settlement")
	}
	in.downdrag = di
}

// splitPath splits "a[1].b: message" into its path and message.
func splitPath(s string) (string, string) {
	for i := 0; i+1 < len(s); i++ {
		if s[i] == ':' && s[i+1] == ' ' {
			return s[:i], s[i+2:]
		}
	}
	return "", s
}

// DowndragResult is the unified method's answer for the pile of the calc
// file in the ground after the loads placed after installation, with the
// design check where the file has a design basis.
type DowndragResult struct {
	settle.DowndragResult
	// LoadFrom names where the sustained load came from.
	LoadFrom string
	// Surcharge is the stress the fill and the surcharge add on the
	// ground; FillThickness, FillUnitWeight and SurchargeAfter its parts
	// as given; WaterDepthAfter the water table after (HasWater).
	Surcharge       units.Stress
	FillThickness   units.Length
	FillUnitWeight  units.UnitWeight
	SurchargeAfter  units.Stress
	WaterDepthAfter units.Length
	HasWater        bool
	// GroundFrom says how the ground settlement was found: "points" (given)
	// or "consolidation" (the layers' one-dimensional consolidation under
	// the change of σ′v from the ground before the loads to the ground
	// after them); Compression is then each layer's share of the surface
	// settlement, and GroundSurface the surface settlement.
	GroundFrom    string
	Compression   []profile.LayerCompression
	GroundSurface units.Length
	// TipFrom: "given" or "compatibility" (q-z curve TipCurve).
	TipFrom  string
	TipCurve string
	// Rows are the long-term shaft rows (the pile analysis in the ground
	// after the loads), whose fs acts down above the neutral plane.
	Rows []pile.Row
	// Cases is the design check with downdrag, one per case of the basis;
	// empty without a design basis. Pass is true without one.
	Cases []DowndragCase
	Pass  bool
	Refs  []cite.Ref
	// LengthFound, Length and TipDepth: the shortest pile, on the grid of
	// the required-length search from the ordinary required length down,
	// that passes the downdrag check too (with a design basis and loads).
	LengthFound      bool
	Length, TipDepth units.Length
}

// DowndragCase is one design case with the drag load: the design action
//
//	Ed = γG·G + γQ·Q + γDD·Qn
//
// against the design resistance of the shaft below the neutral plane and
// the tip, Rd (the shaft above the neutral plane not counted), and the
// structural design force at the neutral plane γG·Qd + γDD·Qn.
type DowndragCase struct {
	Case           string
	DragFactor     float64
	Ed, Rd         units.Force
	Use            float64
	StructuralEd   units.Force
	Pass           bool
	DragFactorFrom string
}

func runDowndrag(f *File, in *Inputs, prof *profile.Profile, res *Result) ([]cite.Ref, error) {
	di := in.downdrag
	if di == nil {
		return nil, nil
	}
	const pre = "downdrag"
	prob := func(path, format string, args ...any) error {
		return Problems{{Path: path, Line: lineOf(f, path), Msg: fmt.Sprintf(format, args...)}}
	}
	out := &DowndragResult{Surcharge: units.Stress(float64(di.fillT)*float64(di.fillW)) + di.surcharge, Pass: true,
		FillThickness: di.fillT, FillUnitWeight: di.fillW, SurchargeAfter: di.surcharge}
	// The ground after the loads.
	spec := in.Ground
	spec.Surcharge += out.Surcharge
	if di.hasWater {
		zw, wet := prof.WaterDepth()
		switch {
		case len(spec.PorePressures) > 0:
			return nil, prob(pre+".water_depth_after", "the ground gives pore_pressures; give the long-term pore pressures there instead of a lowered water table")
		case !wet:
			return nil, prob(pre+".water_depth_after", "the site is dry (ground.water_depth none); there is no water table to lower")
		case di.waterAfter < zw:
			return nil, prob(pre+".water_depth_after", "%v is above the water table %v; a rise of the water table causes no consolidation (give the lowered depth)", di.waterAfter, zw)
		}
		spec.WaterDepth = di.waterAfter
		out.WaterDepthAfter, out.HasWater = di.waterAfter, true
	}
	after, err := profile.New(spec)
	if err != nil {
		var fe *profile.FieldError
		if errors.As(err, &fe) && fe.Path == "surcharge" {
			return nil, prob(pre, "%s (the fill and the surcharge act as a surcharge on the ground)", fe.Msg)
		}
		return nil, translate(f, err)
	}
	// The sustained load.
	qd, from := di.load, pre+".load"
	if !di.hasLoad {
		qd, from = in.Loads.Compression.Permanent, "loads.compression.permanent"
		if !(qd > 0) {
			return nil, prob(pre+".load", "not given, and loads.compression gives no permanent part; give the sustained load")
		}
	}
	out.LoadFrom = from
	ea, pr := pileEA(f, in.Pile, "the neutral plane (downdrag)")
	if pr != nil {
		return nil, Problems{*pr}
	}
	ground := di.ground
	out.GroundFrom = "points"
	if len(ground) == 0 {
		var err error
		ground, err = consolidate(prof, after, out)
		if err != nil {
			return nil, prob(pre+".ground_settlement", "%v", err)
		}
		out.GroundFrom = "consolidation"
	}
	tip := settle.APITip()
	if in.Settle != nil && in.Settle.QZ != nil {
		tip = *in.Settle.QZ
	}
	out.TipFrom, out.TipCurve = "compatibility", tip.ID()
	if di.hasTip {
		out.TipFrom, out.TipCurve = "given", ""
	}
	// solve runs the unified method and the design cases for pile p.
	solveEA := func(p pile.Pile, ea units.Force, r *DowndragResult) error {
		a, err := pile.NewAnalysis(after, p, in.Methods, nil)
		if err != nil {
			return translate(f, err)
		}
		b, err := a.Breakdown()
		if err != nil {
			return translate(f, err)
		}
		r.Rows = b.Rows
		rows, err := settle.RowsFromBreakdown(b)
		if err != nil {
			return prob(pre, "%v", err)
		}
		dd := settle.Downdrag{Rows: rows, Load: qd, EA: ea, Diameter: p.Section.Size(),
			Tip: settle.TipSpring{Area: b.Tip.Area, Qp: b.Tip.Qp, Curve: tip}, Ground: ground,
			TipGiven: di.hasTip, TipForce: di.tipForce}
		if di.hasTip {
			if c := float64(b.Tip.Qp) * float64(b.Tip.Area); float64(di.tipForce) > c {
				return prob(pre+".tip_force", "%.1f kN is above the tip resistance Qp·Ab = %.1f kN", di.tipForce.KN(), c/1e3)
			}
		}
		r.DowndragResult, err = dd.Solve()
		if err != nil {
			path, msg := splitPath(err.Error())
			return prob(pre+"."+path, "%s", msg)
		}
		r.Refs = append(dd.Refs(), cite.Ref{Source: cite.DasNSF, Where: "Eq. 11.125: fn = K′σ′o tan δ′"})
		r.Pass = !r.NoEquilibrium
		if in.Basis != nil {
			cs, err := downdragCases(f, in, after, p, r, di)
			if err != nil {
				return err
			}
			r.Cases = cs
			r.Refs = append(r.Refs, cite.Ref{Source: cite.TanFellenius2016, Where: "the code treatment: the drag force as a load, no shaft resistance above the neutral plane"})
			switch id := in.Basis.ID(); {
			case id == "en1997":
				r.Refs = append(r.Refs, cite.Ref{Source: cite.EN1997, Where: "7.3.2.2: downdrag as a permanent action"})
			case id != "safety-factor" && !di.hasFactor:
				r.Refs = append(r.Refs, cite.Ref{Source: cite.AASHTO2020, Where: "Table 3.4.1-2: load factor on downdrag DD (from memory)"})
			}
			for _, c := range cs {
				r.Pass = r.Pass && c.Pass
			}
		}
		return nil
	}
	di.solve = solveEA
	solve := func(p pile.Pile, r *DowndragResult) error { return solveEA(p, ea, r) }
	if err := solve(in.Pile, out); err != nil {
		return nil, err
	}
	res.Downdrag = out
	// The shortest pile that passes the ordinary check and the downdrag
	// check: from the ordinary required length down the same grid.
	if l := res.Length; l != nil && l.Found && in.Basis != nil && l.Step > 0 {
		for tipZ := l.TipDepth; tipZ <= l.MaxTip+1e-9; tipZ += l.Step {
			p := in.Pile
			p.Length = tipZ - p.HeadDepth
			var r DowndragResult
			if err := solve(p, &r); err != nil {
				res.Warnings = append(res.Warnings, fmt.Sprintf("the required length with downdrag was not found: at a tip of %v: %v", tipZ, err))
				break
			}
			if r.Pass {
				out.LengthFound, out.Length, out.TipDepth = true, p.Length, tipZ
				break
			}
		}
		if !out.LengthFound {
			res.Warnings = append(res.Warnings, "no pile within the search passes the downdrag check: the required length of the ordinary check does not hold with the drag load")
		} else if out.Length > l.Length {
			res.Warnings = append(res.Warnings, fmt.Sprintf("with the drag load the pile must be %v long (tip at %v), longer than the %v of the ordinary check", out.Length, out.TipDepth, l.Length))
		}
	}
	return out.Refs, nil
}

// consolidationStep is the spacing of the depths at which the ground
// settlement is computed by consolidation (besides the profile's breaks).
const consolidationStep = 0.25 * units.Metre

// consolidate computes the ground settlement with depth by the layers'
// one-dimensional consolidation under Δσ′v(z) = σ′v,after(z) − σ′v,before(z),
// at the profile's breaks and every consolidationStep.
func consolidate(before, after *profile.Profile, out *DowndragResult) ([]settle.SettlementPoint, error) {
	some := false
	for _, l := range before.Layers() {
		if l.Compressibility() != profile.Incompressible {
			some = true
		}
	}
	if !some {
		return nil, errors.New("not given, and no layer gives its compressibility (compression_index with initial_void_ratio or void_ratio, or the constrained modulus); give the ground settlement as points or the layers' compressibility")
	}
	ds := func(z units.Length) units.Stress {
		s1, err1 := after.EffectiveStress(z)
		s0, err0 := before.EffectiveStress(z)
		if err1 != nil || err0 != nil {
			return 0
		}
		return s1 - s0
	}
	bottom := before.Depth()
	zs := slices.Clone(before.Breaks())
	for z := units.Length(0); z < bottom; z += consolidationStep {
		zs = append(zs, z)
	}
	zs = append(zs, bottom)
	slices.Sort(zs)
	zs = slices.Compact(zs)
	s, err := before.GroundSettlement(zs, ds, nil)
	if err != nil {
		return nil, err
	}
	total, parts, err := before.Consolidation(0, bottom, ds)
	if err != nil {
		return nil, err
	}
	out.Compression, out.GroundSurface = parts, total
	pts := make([]settle.SettlementPoint, len(zs))
	for i := range zs {
		pts[i] = settle.SettlementPoint{Depth: zs[i], Settlement: s[i]}
	}
	return pts, nil
}

// downdragCases checks each design case of the basis with the drag load:
// the design resistance is that of the pile with no shaft resistance
// above the neutral plane (the case's own multipliers and soil factors),
// the action the factored head load plus the factored drag load.
func downdragCases(f *File, in *Inputs, after *profile.Profile, p pile.Pile, out *DowndragResult, di *downdragInputs) ([]DowndragCase, error) {
	cases, err := in.Basis.Cases(p.Installation)
	if err != nil {
		return nil, translate(f, err)
	}
	m := in.Methods
	head := p.HeadDepth
	if out.NeutralPlane > head {
		m.NoShaft = append(slices.Clone(m.NoShaft), pile.Zone{Top: head, Bottom: out.NeutralPlane})
	}
	var cs []DowndragCase
	for _, c := range cases {
		a, err := pile.NewAnalysis(after, p, m, &pile.Options{Case: &c})
		if err != nil {
			return nil, translate(f, err)
		}
		capa, err := a.Capacity()
		if err != nil {
			return nil, translate(f, err)
		}
		dc := DowndragCase{Case: c.Name, Rd: capa.DesignCompression}
		switch {
		case di.hasFactor:
			dc.DragFactor, dc.DragFactorFrom = di.factor, "downdrag.drag_load_factor"
		case in.Basis.ID() == "safety-factor" || in.Basis.ID() == "en1997":
			dc.DragFactor, dc.DragFactorFrom = c.Permanent, "the factor on permanent actions (the drag load is a permanent action, EN 1997-1 7.3.2.2)"
		case !p.Installation.Driven():
			dc.DragFactor, dc.DragFactorFrom = aashtoDDDrilled, "AASHTO LRFD Table 3.4.1-2, DD maximum for drilled shafts (from memory)"
		case lambdaAbove(out):
			dc.DragFactor, dc.DragFactorFrom = aashtoDDLambda, "AASHTO LRFD Table 3.4.1-2, DD maximum for piles, λ method (from memory)"
		default:
			dc.DragFactor, dc.DragFactorFrom = aashtoDDDriven, "AASHTO LRFD Table 3.4.1-2, DD maximum for piles, α method (from memory)"
		}
		l := in.Loads.Compression
		dc.Ed = units.Force(c.Permanent*float64(l.Permanent)+c.Variable*float64(l.Variable)) + units.Force(dc.DragFactor*float64(out.DragLoad))
		dc.StructuralEd = units.Force(c.Permanent*float64(out.Load) + dc.DragFactor*float64(out.DragLoad))
		dc.Use = utilisationOf(dc.Ed, dc.Rd)
		dc.Pass = dc.Use <= 1
		cs = append(cs, dc)
	}
	return cs, nil
}

func utilisationOf(ed, rd units.Force) float64 {
	switch {
	case ed <= 0:
		return 0
	case rd <= 0:
		return math.MaxFloat64
	}
	return float64(ed / rd)
}

// downdragWarnings: a ground surcharge with no word on when it is placed.
func downdragWarnings(f *File, in *Inputs) []string {
	if in.Ground.Surcharge > 0 && f.Downdrag == nil {
		return []string{"ground.surcharge is counted as in place before the pile is installed: it raises σ′v and the shaft resistance. If it is placed after installation, give it as downdrag.surcharge (or downdrag.fill): the layers it makes settle then drag the pile down and give no resistance above the neutral plane"}
	}
	return nil
}

// DowndragPass reports whether the downdrag check passes: true without a
// downdrag section. `qult check` and batch count a failure as a failed
// design.
func (r *Result) DowndragPass() bool { return r.Downdrag == nil || r.Downdrag.Pass }
