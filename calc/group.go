package calc

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"github.com/qultgeo/qult/group"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// Group is a group of identical piles (the file's pile) under a rigid
// cap: rows × columns at spacings, or a list of positions. The file's
// ground, methods and design basis apply; the loads are on the cap.
type Group struct {
	Rows      Value     `yaml:"rows,omitempty" json:"rows,omitempty" q:"integer,1,10000" doc:"Number of rows (along y); with columns and the spacings, or give positions."`
	Columns   Value     `yaml:"columns,omitempty" json:"columns,omitempty" q:"integer,1,10000" doc:"Number of columns (along x)."`
	SpacingX  Value     `yaml:"spacing_x,omitempty" json:"spacing_x,omitempty" q:"length,0," doc:"Centre-to-centre spacing between columns (along x)."`
	SpacingY  Value     `yaml:"spacing_y,omitempty" json:"spacing_y,omitempty" q:"length,0," doc:"Centre-to-centre spacing between rows (along y)."`
	Positions [][]Value `yaml:"positions,omitempty" json:"positions,omitempty" doc:"[x, y] centres of the piles in plan (lengths), instead of rows and columns."`
	CapEdge   Value     `yaml:"cap_edge,omitempty" json:"cap_edge,omitempty" q:"length,0," doc:"Clear distance from the outer piles' faces to the cap's edge (default 300 mm; AASHTO's minimum 9 in, 229 mm)."`
	// CapContact: the cap bears firmly on the ground (AASHTO's efficiency
	// of 1 in clay); default false.
	CapContact      bool   `yaml:"cap_contact,omitempty" json:"cap_contact,omitempty" doc:"The cap bears firmly on the ground (practice efficiency 1 in clay); default false."`
	Efficiency      string `yaml:"efficiency,omitempty" json:"efficiency,omitempty" doc:"Group efficiency rule: practice (default, AASHTO), converse-labarre, los-angeles, seiler-keeney, feld or given."`
	EfficiencyValue Value  `yaml:"efficiency_value,omitempty" json:"efficiency_value,omitempty" q:"number,0,1" doc:"The efficiency of rule given, more than 0 and at most 1."`
	BlockNc         Value  `yaml:"block_nc,omitempty" json:"block_nc,omitempty" q:"number,1,20" doc:"Bearing factor Nc of the block's base in clay, replacing Skempton's."`
	Loads           *Loads `yaml:"loads,omitempty" json:"loads,omitempty" doc:"Characteristic loads on the cap; absent: the file's loads times the number of piles."`
	ServiceLoad     Value  `yaml:"service_load,omitempty" json:"service_load,omitempty" q:"force,0," doc:"Load on the cap for the group's settlement; absent: the cap's characteristic compression (permanent + variable)."`
	RaftDepth       Value  `yaml:"raft_depth,omitempty" json:"raft_depth,omitempty" q:"length,0," doc:"Depth of the equivalent raft below ground; absent: two-thirds of the embedded length below the top of the embedded pile."`
	RaftBottom      Value  `yaml:"raft_bottom,omitempty" json:"raft_bottom,omitempty" q:"length,0," doc:"Deepest level counted below the equivalent raft; absent: the bottom of the ground profile."`
	RaftMethod      string `yaml:"raft_method,omitempty" json:"raft_method,omitempty" doc:"Equivalent raft: two-to-one (default; the group's plan at the raft, load spread 2 vertical to 1 horizontal) or tomlinson (Tomlinson & Woodward: plan widened 1 in 4 from the pile heads, elastic stress below it)."`
	RaftStress      string `yaml:"raft_stress,omitempty" json:"raft_stress,omitempty" doc:"Tomlinson raft only: the elastic stress below the raft's centre (centre, default, conservative), averaged over its plan (average, as Tomlinson & Woodward's Example 5.1), or the 2:1 spread below the widened raft (two-to-one)."`
	RaftSpreadTop   Value  `yaml:"raft_spread_top,omitempty" json:"raft_spread_top,omitempty" q:"length,0," doc:"Tomlinson raft only: depth where the 1 in 4 spread starts (the top of the bearing stratum); absent: the top of the embedded pile."`
	RaftDepthFactor Value  `yaml:"raft_depth_factor,omitempty" json:"raft_depth_factor,omitempty" q:"number,0,1" doc:"Depth factor μd (Fox) on the raft's consolidation settlement, more than 0 and at most 1; absent: 1, no reduction."`
	// RaftGeologicalFactor μg multiplies the raft's consolidation settlement.
	RaftGeologicalFactor Value `yaml:"raft_geological_factor,omitempty" json:"raft_geological_factor,omitempty" q:"number,0,1.2" doc:"Geological factor μg (Skempton & Bjerrum) on the raft's consolidation settlement, more than 0 and at most 1.2; absent: 1, no reduction."`
	Allowable            Value `yaml:"allowable,omitempty" json:"allowable,omitempty" q:"length,0," doc:"Allowable settlement of the group; absent: no serviceability check of the group."`
}

// groupInputs is the group section resolved.
type groupInputs struct {
	layout       group.Layout
	opts         group.Options
	loads        pile.Loads
	loadsFrom    string
	allowable    units.Length
	hasAllowable bool
}

// GroupResult is the group analysis of a calc file.
type GroupResult struct {
	*group.Result
	// Loads are the characteristic loads on the cap and LoadsFrom the key
	// they came from (group.loads, or loads × n).
	Loads     pile.Loads
	LoadsFrom string
	// Allowable is the allowable settlement (HasAllowable false: none);
	// SettlementPass is true when the larger of the group settlements
	// found is within it.
	Allowable      units.Length
	HasAllowable   bool
	SettlementPass bool
	// Pass is the group's design check and settlement check together.
	Pass bool
}

func (r *resolver) groupSection(f *File, in *Inputs) {
	g := f.Group
	if g == nil {
		return
	}
	gi := &groupInputs{}
	whole := func(v Value, path string) int {
		x := r.num(v, path, 1, group.MaxPiles)
		if v.IsSet() && x != math.Trunc(x) {
			r.add(path, v.Line, "%q: want a whole number", v.Raw)
			return 0
		}
		return int(x)
	}
	grid := g.Rows.IsSet() || g.Columns.IsSet() || g.SpacingX.IsSet() || g.SpacingY.IsSet()
	switch {
	case grid && len(g.Positions) > 0:
		r.add("group.positions", 0, "give either rows and columns with their spacings, or positions, not both")
	case grid:
		n0 := len(r.probs)
		rows, cols := whole(g.Rows, "group.rows"), whole(g.Columns, "group.columns")
		if !g.Rows.IsSet() || !g.Columns.IsSet() {
			r.add("group", 0, "rows and columns: give both (1 or more each), or give positions")
			break
		}
		sx, sy := r.length(g.SpacingX, "group.spacing_x"), r.length(g.SpacingY, "group.spacing_y")
		if cols > 1 && !g.SpacingX.IsSet() {
			r.add("group.spacing_x", lineOf(f, "group.columns"), "not given: %d columns need a spacing between them", cols)
		}
		if rows > 1 && !g.SpacingY.IsSet() {
			r.add("group.spacing_y", lineOf(f, "group.rows"), "not given: %d rows need a spacing between them", rows)
		}
		if rows < 1 || cols < 1 || len(r.probs) > n0 {
			break
		}
		l, err := group.Grid(rows, cols, sx, sy)
		if err != nil {
			r.groupErr(err)
			break
		}
		gi.layout = l
	case len(g.Positions) > 0:
		pts := make([]group.Point, len(g.Positions))
		n0 := len(r.probs)
		ok := true
		for i, pv := range g.Positions {
			path := fmt.Sprintf("group.positions[%d]", i)
			if len(pv) != 2 {
				r.add(path, 0, "%d values: want [x, y], two lengths", len(pv))
				ok = false
				continue
			}
			pts[i] = group.Point{X: r.length(pv[0], path+"[0]"), Y: r.length(pv[1], path+"[1]")}
		}
		if !ok || len(r.probs) > n0 {
			break
		}
		l, err := group.Positions(pts)
		if err != nil {
			r.groupErr(err)
			break
		}
		gi.layout = l
	default:
		r.add("group", 0, "no piles: give rows, columns, spacing_x and spacing_y, or positions")
	}
	o := &gi.opts
	o.CapEdge = r.length(g.CapEdge, "group.cap_edge")
	if g.CapEdge.IsSet() && zeroValue(g.CapEdge) {
		r.add("group.cap_edge", 0, "%q: want more than 0 (the cap covers the piles' heads)", g.CapEdge.Raw)
	}
	o.CapContact = g.CapContact
	o.Rule = strings.TrimSpace(g.Efficiency)
	if o.Rule != "" {
		if _, ok := group.LookupRule(o.Rule); !ok {
			r.add("group.efficiency", 0, "%q: want one of %s", o.Rule, strings.Join(group.RuleIDs(), ", "))
		}
	}
	o.Value = r.num(g.EfficiencyValue, "group.efficiency_value", 0, 1)
	switch {
	case o.Rule == group.Given && !g.EfficiencyValue.IsSet():
		r.add("group.efficiency_value", lineOf(f, "group.efficiency"), "not given: efficiency given needs a value more than 0 and at most 1")
	case o.Rule == group.Given && g.EfficiencyValue.IsSet() && zeroValue(g.EfficiencyValue):
		r.add("group.efficiency_value", g.EfficiencyValue.Line, "%q: want more than 0 and at most 1", g.EfficiencyValue.Raw)
	case o.Rule != group.Given && g.EfficiencyValue.IsSet():
		r.add("group.efficiency_value", g.EfficiencyValue.Line, "efficiency %s does not read a value; write efficiency: given", orDefault(o.Rule, group.Practice))
	}
	o.BlockNc = r.num(g.BlockNc, "group.block_nc", 1, 20)
	o.ServiceLoad = r.force(g.ServiceLoad, "group.service_load")
	o.RaftDepth = r.length(g.RaftDepth, "group.raft_depth")
	o.RaftBottom = r.length(g.RaftBottom, "group.raft_bottom")
	for _, c := range []struct {
		path string
		v    Value
		x    float64
	}{{"group.service_load", g.ServiceLoad, float64(o.ServiceLoad)}, {"group.raft_depth", g.RaftDepth, float64(o.RaftDepth)},
		{"group.raft_bottom", g.RaftBottom, float64(o.RaftBottom)}} {
		if c.v.IsSet() && !(c.x > 0) {
			r.add(c.path, c.v.Line, "%q: want more than 0", c.v.Raw)
		}
	}
	o.RaftMethod = strings.TrimSpace(g.RaftMethod)
	o.RaftStress = strings.TrimSpace(g.RaftStress)
	switch o.RaftMethod {
	case "", group.RaftTwoToOne, group.RaftTomlinson:
	default:
		r.add("group.raft_method", 0, "%q: want %s or %s", o.RaftMethod, group.RaftTwoToOne, group.RaftTomlinson)
	}
	tomlinson := o.RaftMethod == group.RaftTomlinson
	switch {
	case o.RaftStress != "" && !tomlinson:
		r.add("group.raft_stress", 0, "%q: only raft_method: %s reads it (the two-to-one spread has its own stress)", o.RaftStress, group.RaftTomlinson)
	case o.RaftStress != "" && o.RaftStress != group.StressCentre && o.RaftStress != group.StressAverage && o.RaftStress != group.StressSpread:
		r.add("group.raft_stress", 0, "%q: want %s, %s or %s", o.RaftStress, group.StressCentre, group.StressAverage, group.StressSpread)
	}
	o.RaftSpreadTop = r.length(g.RaftSpreadTop, "group.raft_spread_top")
	if g.RaftSpreadTop.IsSet() && !tomlinson {
		r.add("group.raft_spread_top", g.RaftSpreadTop.Line, "only raft_method: %s reads it", group.RaftTomlinson)
	}
	o.RaftDepthFactor = r.num(g.RaftDepthFactor, "group.raft_depth_factor", 0, 1)
	o.RaftGeologicalFactor = r.num(g.RaftGeologicalFactor, "group.raft_geological_factor", 0, group.MaxGeologicalFactor)
	for _, c := range []struct {
		path string
		v    Value
		hi   float64
	}{{"group.raft_depth_factor", g.RaftDepthFactor, 1}, {"group.raft_geological_factor", g.RaftGeologicalFactor, group.MaxGeologicalFactor}} {
		if c.v.IsSet() && zeroValue(c.v) {
			r.add(c.path, c.v.Line, "%q: want more than 0 and at most %g", c.v.Raw, c.hi)
		}
	}
	if g.Allowable.IsSet() {
		gi.allowable, gi.hasAllowable = r.length(g.Allowable, "group.allowable"), true
		if !(gi.allowable > 0) {
			r.add("group.allowable", g.Allowable.Line, "%q: want more than 0", g.Allowable.Raw)
		}
	}
	if g.Loads != nil {
		gi.loads = pile.Loads{Compression: r.load(g.Loads.Compression, "group.loads.compression"), Tension: r.load(g.Loads.Tension, "group.loads.tension")}
		gi.loadsFrom = "group.loads"
	} else {
		n := units.Force(gi.layout.N())
		gi.loads = pile.Loads{Compression: pile.Action{Permanent: n * in.Loads.Compression.Permanent, Variable: n * in.Loads.Compression.Variable},
			Tension: pile.Action{Permanent: n * in.Loads.Tension.Permanent, Variable: n * in.Loads.Tension.Variable}}
		gi.loadsFrom = fmt.Sprintf("loads × %d piles", gi.layout.N())
	}
	in.group = gi
}

func orDefault(s, d string) string {
	if s == "" {
		return d
	}
	return s
}

// groupErr records a library error of the group section under its key.
func (r *resolver) groupErr(err error) {
	var fe *group.FieldError
	if errors.As(err, &fe) {
		r.add("group."+fe.Path, 0, "%s", fe.Msg)
		return
	}
	r.add("group", 0, "%v", err)
}

// runGroup analyses the group of the file's pile.
func runGroup(f *File, in *Inputs, prof *profile.Profile, res *Result) error {
	gi := in.group
	if gi == nil {
		return nil
	}
	o := gi.opts
	if s := res.Settlement; s != nil && !s.Plunged {
		o.SingleSettlement, o.HasSingleSettlement = s.Settlement, true
	}
	gr, err := group.Analyse(group.Input{Profile: prof, Pile: in.Pile, Methods: in.Methods, Basis: in.Basis,
		Loads: gi.loads, Layout: gi.layout, Options: o, Single: res.Design})
	if err != nil {
		var fe *group.FieldError
		if errors.As(err, &fe) {
			path := "group." + fe.Path
			switch fe.Path {
			case "pile width":
				path = "pile.section"
			case "spacing":
				path = "group.spacing_x"
			}
			return Problems{{Path: path, Line: lineOf(f, path), Msg: fe.Msg, Err: err}}
		}
		var pe *profile.FieldError
		if errors.As(err, &pe) {
			return translate(f, err) // a layer's value the group's settlement needs
		}
		return Problems{{Path: "group", Line: lineOf(f, "group"), Msg: err.Error(), Err: err}}
	}
	out := &GroupResult{Result: gr, Loads: gi.loads, LoadsFrom: gi.loadsFrom, Allowable: gi.allowable, HasAllowable: gi.hasAllowable,
		SettlementPass: true, Pass: true}
	if gr.Vesic != nil && gr.Raft != nil && res.Settlement != nil && gr.N > 0 {
		perPile := units.Force(float64(gr.Raft.Load) / float64(gr.N))
		if math.Abs(float64(res.Settlement.Load-perPile)) > 0.01*float64(perPile) {
			gr.Warnings = append(gr.Warnings, fmt.Sprintf("Vesic's group settlement reads the single pile's settlement at %v (settlement section), while the cap's service load gives %v per pile", res.Settlement.Load, perPile))
		}
	}
	if out.HasAllowable {
		worst := units.Length(0)
		if gr.Vesic != nil {
			worst = gr.Vesic.Group
		}
		if gr.Raft != nil {
			worst = max(worst, gr.Raft.Total)
		}
		out.SettlementPass = worst <= out.Allowable
	}
	if gr.Design != nil {
		out.Pass = gr.Design.Pass
	}
	out.Pass = out.Pass && out.SettlementPass
	res.Group = out
	for _, w := range gr.Warnings {
		res.Warnings = append(res.Warnings, "group: "+w)
	}
	if gr.Design != nil && !gr.Design.Pass {
		res.Warnings = append(res.Warnings, "the group's design check fails: utilisation above 1")
	}
	if !out.SettlementPass {
		res.Warnings = append(res.Warnings, "the group's settlement exceeds the allowable")
	}
	return nil
}
