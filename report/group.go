package report

import (
	"fmt"
	"image/color"
	"strings"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/group"
	"github.com/qultgeo/qult/units"
)

// headGroup is the heading of the pile group's section (the HTML and PDF
// writers add the plan of the group to it).
const headGroup = "Pile group"

// secGroup is the pile group: layout, efficiency, block, uplift, the
// design check of the group and its settlement.
func secGroup(r *calc.Result, c conv) section {
	g := r.Group
	if g == nil {
		return section{}
	}
	geo := g.Geometry
	layout := fmt.Sprintf("%d piles at the positions given", g.N)
	if l := g.Layout; l.IsGrid() {
		layout = fmt.Sprintf("%d rows × %d columns, spacing %s (x) and %s (y)", l.Rows, l.Cols, c.ls(l.Sx), c.ls(l.Sy))
	}
	it := []item{
		{"Layout", txt(layout), ""},
		{"Number of piles n", num(float64(g.N)), ""},
		{"Pile width D", txt(c.ls(g.Width)), ""},
		{"Block Bg × Lg (outer faces of the piles)", txt(c.ls(geo.Bg) + " × " + c.ls(geo.Lg)), ""},
		{"Cap (edge " + c.ls(geo.CapEdge) + " outside the piles' faces)", txt(c.ls(geo.CapMaxX-geo.CapMinX) + " × " + c.ls(geo.CapMaxY-geo.CapMinY)), ""},
	}
	if g.N > 1 {
		it = append(it, item{"Least spacing", txt(fmt.Sprintf("%s = %s D (minimum %s, AASHTO LRFD 10.7.1.2/10.8.1.2)", c.ls(geo.MinSpacing),
			fmtNum(float64(geo.MinSpacing/g.Width), 3), c.ls(group.MinSpacingRule(g.Width, isBored(r))))), ""})
	}
	it = append(it, item{"Loads on the cap", txt(fmt.Sprintf("compression G %s + Q %s; tension G %s + Q %s (%s)",
		c.fs(g.Loads.Compression.Permanent), c.fs(g.Loads.Compression.Variable), c.fs(g.Loads.Tension.Permanent), c.fs(g.Loads.Tension.Variable), g.LoadsFrom)), ""})
	e := g.Efficiency
	blocks := []block{{items: it},
		{para: fmt.Sprintf("Group efficiency by %s: %s. η = %s%s.", e.Rule, e.Equation, fmtNum(e.Value, 3), capped(e))}}

	k := &table{cols: []column{{"Compression (characteristic)", ""}, {"Value", c.uF()}}}
	k.rows = append(k.rows,
		[]cell{txt("Single pile Rc"), num(c.F(g.Single.Compression))},
		[]cell{txt(fmt.Sprintf("Sum of single piles n·Rc (n = %d)", g.N)), num(c.F(g.SumSingles))},
		[]cell{txt("Piles η·n·Rc"), num(c.F(g.Reduced))})
	if b := g.Block; b != nil {
		k.rows = append(k.rows,
			[]cell{txt("Block base qb·Bg·Lg"), num(c.F(b.Base))},
			[]cell{txt("Block side 2(Bg + Lg)·Σ τ·ΔL"), num(c.F(b.Side))},
			[]cell{txt("Block Qblock"), num(c.F(b.Capacity))})
	}
	k.rows = append(k.rows, []cell{txt("Group Qg = the lesser (" + g.Governs + " govern)"), num(c.F(g.Capacity))})
	blocks = append(blocks, block{tbl: k})
	if b := g.Block; b != nil {
		base := fmt.Sprintf("Block base in %q: qb = %s (the single pile's unit tip resistance in a drained layer)", b.BaseLayer, c.ss(b.UnitBase))
		if b.BaseUndrained {
			how := "Skempton (1951), Nc = 5(1 + 0.2·Df/Bg)(1 + 0.2·Bg/Lg), Df/Bg ≤ 2.5"
			if b.NcGiven {
				how = "given"
			}
			base = fmt.Sprintf("Block base in %q: qb = Nc·su = %s × %s = %s (Nc %s)", b.BaseLayer, fmtNum(b.Nc, sig), c.ss(b.Su), c.ss(b.UnitBase), how)
		}
		blocks = append(blocks, block{eqs: []string{"Qblock = qb·Bg·Lg + 2(Bg + Lg)·Σ τ·ΔL (Terzaghi & Peck 1967); τ = su in undrained layers, c′ + K0·σ′v·tanφ′ with K0 = 1 − sinφ′ in drained ones"}},
			block{para: base + "."})
		bt := &table{cols: []column{{"Top", c.uL()}, {"Bottom", c.uL()}, {"Layer", ""}, {"τ mean", c.uS()}, {"K0", ""}, {"Side force", c.uF()}}}
		for _, row := range b.Rows {
			k0 := txt("")
			if !row.Undrained {
				k0 = num(row.K0)
			}
			bt.rows = append(bt.rows, []cell{num(c.L(row.Top)), num(c.L(row.Bottom)), txt(row.Layer), num(c.S(row.Tau)), k0, num(c.F(row.Force))})
		}
		blocks = append(blocks, block{tbl: bt})
	}
	t := &table{cols: []column{{"Tension (characteristic)", ""}, {"Value", c.uF()}}}
	t.rows = append(t.rows, []cell{txt("Single pile Rt"), num(c.F(g.Single.Tension))}, []cell{txt("Piles n·Rt"), num(c.F(g.SumTension))})
	if b := g.Block; b != nil {
		t.rows = append(t.rows, []cell{txt("Block effective weight W′"), num(c.F(b.Weight))}, []cell{txt("Block W′ + side shear"), num(c.F(g.BlockUplift))})
	}
	t.rows = append(t.rows, []cell{txt("Group uplift Tg = the lesser (" + g.UpliftGoverns + " govern)"), num(c.F(g.Uplift))})
	blocks = append(blocks, block{tbl: t})
	if d := g.Design; d != nil {
		dt := &table{cols: []column{{"Case", ""}, {"Rd/Rk", ""}, {"η·n·Rd", c.uF()}, {"Block Rd", c.uF()}, {"Rd", c.uF()}, {"Ed", c.uF()}, {"Ed/Rd", ""},
			{"Rt,d", c.uF()}, {"Et,d", c.uF()}, {"Et,d/Rt,d", ""}, {"Check", ""}}}
		for _, cs := range d.Cases {
			blockRd := txt("")
			if g.Block != nil {
				blockRd = num(c.F(cs.BlockRd))
			}
			dt.rows = append(dt.rows, []cell{txt(cs.Case), num(cs.Ratio), num(c.F(cs.PilesRd)), blockRd, num(c.F(cs.Rd)), num(c.F(cs.Ed)), useCell(cs.Use),
				num(c.F(cs.TensionRd)), num(c.F(cs.TensionEd)), useCell(cs.TensionUse), txt(passText(cs.Pass))})
		}
		blocks = append(blocks, block{para: fmt.Sprintf("Design check of the group (%s): each case's design resistance of the single pile Rd gives η·n·Rd; the block takes the case's overall multiplier Rd/Rk of the single pile; the lesser governs. Ed factors the loads on the cap as the case factors a pile's loads. Verdict: %s.", d.Basis, passText(d.Pass))},
			block{tbl: dt})
	}
	var st []item
	if v := g.Vesic; v != nil {
		st = append(st, item{"Vesic (1969), sg = s·√(Bg/D)", txt(fmt.Sprintf("%s × √(%s/%s) = %s", c.sms(v.Single), fmtNum(c.L(geo.Bg), sig), fmtNum(c.L(g.Width), sig), c.sms(v.Group))), ""})
	}
	if rf := g.Raft; rf != nil {
		if rf.Method == group.RaftTomlinson {
			where := "elastic stress (Boussinesq, Newmark) below its centre"
			switch rf.Stress {
			case group.StressAverage:
				where = "elastic stress (Boussinesq, Newmark) averaged over its plan"
			case group.StressSpread:
				where = "stress spread 2:1 below it"
			}
			st = append(st, item{"Equivalent raft (Tomlinson & Woodward)", txt(fmt.Sprintf("the group's %s × %s widened 1 in 4 from %s to the raft at %s depth: %s × %s under %s (%s); %s, counted to %s",
				c.ls(rf.GroupBg), c.ls(rf.GroupLg), c.ls(rf.SpreadTop), c.ls(rf.Depth), c.ls(rf.Bg), c.ls(rf.Lg), c.fs(rf.Load), c.ss(rf.Pressure), where, c.ls(rf.Bottom))), ""})
		} else {
			st = append(st, item{"Equivalent raft", txt(fmt.Sprintf("%s × %s at %s depth under %s (%s), spread 2:1, counted to %s",
				c.ls(rf.Bg), c.ls(rf.Lg), c.ls(rf.Depth), c.fs(rf.Load), c.ss(rf.Pressure), c.ls(rf.Bottom))), ""})
		}
		st = append(st, item{"Raft settlement", txt(fmt.Sprintf("elastic %s + consolidation %s × μd %s × μg %s = %s",
			c.sms(rf.Elastic), c.sms(rf.Oedometer), fmtNum(rf.DepthFactor, 3), fmtNum(rf.GeologicalFactor, 3), c.sms(rf.Total))), ""})
	}
	switch {
	case g.HasAllowable && g.Raft == nil && g.Vesic == nil:
		st = append(st, item{"Allowable settlement", txt(c.sms(g.Allowable) + ": not checked (no settlement computed: no load on the cap and no settlement section)"), ""})
	case g.HasAllowable:
		st = append(st, item{"Allowable settlement", txt(fmt.Sprintf("%s: %s", c.sms(g.Allowable), passText(g.SettlementPass))), ""})
	}
	if len(st) > 0 {
		blocks = append(blocks, block{para: "Settlement of the group:"}, block{items: st})
	}
	if rf := g.Raft; rf != nil && len(rf.Layers) > 0 {
		rt := &table{cols: []column{{"Layer", ""}, {"Top", c.uL()}, {"Bottom", c.uL()}, {"How", ""}, {"Settlement", c.uSm()}}}
		for _, l := range rf.Layers {
			rt.rows = append(rt.rows, []cell{txt(l.Layer), num(c.L(l.Top)), num(c.L(l.Bottom)), txt(l.Kind), num(c.sm(l.Settlement))})
		}
		eq := "Δσ(z) = Q/((Bg + z′)(Lg + z′)), z′ below the raft; elastic: s = ∫ Δσ/E dz; consolidation: the layer's compressibility, times μd·μg"
		if rf.Method == group.RaftTomlinson && rf.Stress == group.StressSpread {
			eq = "Br = Bg + (zr − zs)/2, Lr = Lg + (zr − zs)/2; Δσ(z) = Q/((Br + z′)(Lr + z′)), z′ below the raft; elastic: s = ∫ Δσ/E dz; consolidation: the layer's compressibility (before μd·μg)"
		} else if rf.Method == group.RaftTomlinson {
			eq = "Br = Bg + (zr − zs)/2, Lr = Lg + (zr − zs)/2; Δσ(z) = q·4·I(Br/2, Lr/2, z′) at the centre, or q·(4/(Br·Lr))∬I dx dy averaged, I = Newmark's corner factor; elastic: s = ∫ Δσ/E dz; consolidation: the layer's compressibility (before μd·μg)"
		}
		blocks = append(blocks, block{eqs: []string{eq}}, block{tbl: rt})
	}
	return section{heading: headGroup, blocks: blocks}
}

func capped(e group.Efficiency) string {
	if e.Raw > e.Value {
		return fmt.Sprintf(" (the formula gives %s; taken as 1)", fmtNum(e.Raw, 3))
	}
	return ""
}

func isBored(r *calc.Result) bool {
	s := r.Pile.Installation.String()
	return s == "bored" || s == "augered"
}

// groupFigures adds the plan of the group to its section.
func groupFigures(s *section, r *calc.Result, c conv) error {
	if s.heading != headGroup || r.Group == nil {
		return nil
	}
	f, err := groupFigure(r, c)
	if err != nil {
		return err
	}
	s.blocks = append(s.blocks, figBlock(f, "Plan of the group drawn to scale: the cap (solid), the block Bg × Lg enclosing the piles' outer faces (dashed), the piles numbered in the order of the calc file."))
	return nil
}

// groupFigure draws the plan of the group to scale: the cap, the block's
// outline and each pile at its width, numbered, with the block's
// dimensions.
func groupFigure(r *calc.Result, c conv) (figure, error) {
	g := r.Group
	geo := g.Geometry
	const (
		w, h   = vg.Length(460), vg.Length(320)
		mx, my = vg.Length(84), vg.Length(36)
	)
	spanX := float64(geo.CapMaxX - geo.CapMinX)
	spanY := float64(geo.CapMaxY - geo.CapMinY)
	scale := min(float64(w-2*mx)/spanX, float64(h-2*my)/spanY)
	ox := float64(w)/2 - scale*float64(geo.CapMinX+geo.CapMaxX)/2
	oy := float64(h)/2 + scale*float64(geo.CapMinY+geo.CapMaxY)/2 // y upwards in plan, downwards on the page
	X := func(x units.Length) vg.Length { return vg.Length(ox + scale*float64(x)) }
	Y := func(y units.Length) vg.Length { return vg.Length(oy - scale*float64(y)) }
	d := g.Width
	round := r.Pile.Section.Shape.String() == "circle" || strings.Contains(r.Pile.Section.Shape.String(), "pipe")
	pts := g.Layout.Points
	label := fmt.Sprintf("Plan of a group of %d piles", g.N)
	return newFigure(label, w, h, func(dc draw.Canvas) {
		p := painter{dc: dc, h: h}
		p.rect(0, 0, w, h, color.White, nil, 0)
		capFill := color.RGBA{0xee, 0xee, 0xee, 255}
		p.rect(X(geo.CapMinX), Y(geo.CapMaxY), vg.Length(scale*spanX), vg.Length(scale*spanY), capFill, color.Black, 1)
		bx0, by0 := geo.MinX-d/2, geo.MaxY+d/2
		dash := []vg.Length{4, 3}
		x0, y0, x1, y1 := X(bx0), Y(by0), X(bx0+geo.Bg), Y(by0-geo.Lg)
		p.line(x0, y0, x1, y0, grey, 1, dash)
		p.line(x1, y0, x1, y1, grey, 1, dash)
		p.line(x1, y1, x0, y1, grey, 1, dash)
		p.line(x0, y1, x0, y0, grey, 1, dash)
		small := sans(8, false)
		for i, pt := range pts {
			cx, cy := X(pt.X), Y(pt.Y)
			rad := vg.Length(scale * float64(d) / 2)
			if round {
				var path vg.Path
				path.Move(p.pt(cx+rad, cy))
				path.Arc(p.pt(cx, cy), rad, 0, 2*3.141592653589793)
				path.Close()
				p.dc.SetColor(color.RGBA{0x88, 0x88, 0x88, 255})
				p.dc.Fill(path)
			} else {
				p.rect(cx-rad, cy-rad, 2*rad, 2*rad, color.RGBA{0x88, 0x88, 0x88, 255}, nil, 0)
			}
			if g.N <= 60 {
				p.text(small, cx, cy-rad-6, fmt.Sprint(i+1), 'c', color.Black)
			}
		}
		f := sans(9, false)
		p.text(f, (x0+x1)/2, Y(geo.CapMinY)+12, "block Bg = "+c.ls(geo.Bg), 'c', grey)
		p.text(f, X(geo.CapMaxX)+6, (y0+y1)/2, "Lg = "+c.ls(geo.Lg), 'l', grey)
		p.text(f, X(geo.CapMinX), Y(geo.CapMaxY)-10, "cap "+c.ls(geo.CapMaxX-geo.CapMinX)+" × "+c.ls(geo.CapMaxY-geo.CapMinY)+"; x to the right, y up", 'l', color.Black)
	})
}

// The JSON form of the pile group (see JSON.md).
type jGroup struct {
	N          int          `json:"n"`
	Rows       int          `json:"rows,omitempty"`
	Columns    int          `json:"columns,omitempty"`
	SpacingX   *qty         `json:"spacing_x,omitempty"`
	SpacingY   *qty         `json:"spacing_y,omitempty"`
	Positions  [][2]qty     `json:"positions"`
	Width      qty          `json:"pile_width"`
	Bg         qty          `json:"block_width"`
	Lg         qty          `json:"block_length"`
	MinSpacing qty          `json:"least_spacing"`
	Cap        [4]qty       `json:"cap"` // min x, min y, max x, max y
	Efficiency jGroupEff    `json:"efficiency"`
	Single     qty          `json:"single_compression"`
	SumSingles qty          `json:"sum_of_singles"`
	Reduced    qty          `json:"piles_compression"`
	Block      *jGroupBlock `json:"block"`
	Capacity   qty          `json:"compression"`
	Governs    string       `json:"compression_governed_by"`
	Tension    jGroupUplift `json:"uplift"`
	Loads      jLoads       `json:"loads_on_cap"`
	LoadsFrom  string       `json:"loads_from"`
	Design     *jGroupDes   `json:"design"`
	Vesic      *qty         `json:"settlement_vesic"`
	Raft       *jGroupRaft  `json:"equivalent_raft"`
	Allowable  *qty         `json:"allowable_settlement"`
	SettlePass bool         `json:"settlement_pass"`
	Pass       bool         `json:"pass"`
	Warnings   []string     `json:"warnings"`
}

type jGroupEff struct {
	Rule     string `json:"rule"`
	Value    jnum   `json:"eta"`
	Formula  jnum   `json:"formula_eta"`
	Equation string `json:"equation"`
}

type jGroupBlock struct {
	Top       qty            `json:"top"`
	Tip       qty            `json:"tip"`
	Perimeter qty            `json:"perimeter"`
	BaseLayer string         `json:"base_layer"`
	Nc        *jnum          `json:"nc"`
	UnitBase  qty            `json:"unit_base"`
	Base      qty            `json:"base"`
	Side      qty            `json:"side_force"`
	Capacity  qty            `json:"capacity"`
	Weight    qty            `json:"effective_weight"`
	Rows      []jGroupSideRw `json:"side_rows"`
}

type jGroupSideRw struct {
	Top    qty    `json:"top"`
	Bottom qty    `json:"bottom"`
	Layer  string `json:"layer"`
	Tau    qty    `json:"tau"`
	K0     *jnum  `json:"k0"`
	Force  qty    `json:"force"`
}

type jGroupUplift struct {
	Single  qty    `json:"single_tension"`
	Piles   qty    `json:"piles_tension"`
	Block   *qty   `json:"block"`
	Uplift  qty    `json:"uplift"`
	Governs string `json:"governed_by"`
}

type jGroupDes struct {
	Basis     string        `json:"basis"`
	Pass      bool          `json:"pass"`
	Governing string        `json:"governing_case"`
	Cases     []jGroupCheck `json:"cases"`
}

type jGroupCheck struct {
	Case         string `json:"case"`
	Ratio        jnum   `json:"rd_over_rk"`
	PilesRd      qty    `json:"piles_rd"`
	BlockRd      *qty   `json:"block_rd"`
	Rd           qty    `json:"rd"`
	Ed           qty    `json:"ed"`
	Use          jnum   `json:"utilisation"`
	TensionRd    qty    `json:"tension_rd"`
	TensionEd    qty    `json:"tension_ed"`
	TensionUse   jnum   `json:"tension_utilisation"`
	Pass         bool   `json:"pass"`
	TensionRatio jnum   `json:"tension_rd_over_rk"`
}

type jGroupRaft struct {
	Method           string        `json:"method"`
	Stress           *string       `json:"stress"`
	Depth            qty           `json:"depth"`
	Bottom           qty           `json:"bottom"`
	GroupWidth       qty           `json:"group_width"`
	GroupLength      qty           `json:"group_length"`
	SpreadTop        *qty          `json:"spread_top"`
	Width            qty           `json:"width"`
	Length           qty           `json:"length"`
	Load             qty           `json:"load"`
	Pressure         qty           `json:"pressure"`
	Elastic          qty           `json:"elastic"`
	Oedometer        qty           `json:"oedometer"`
	DepthFactor      jnum          `json:"depth_factor"`
	GeologicalFactor jnum          `json:"geological_factor"`
	Consolidation    qty           `json:"consolidation"`
	Total            qty           `json:"total"`
	Layers           []jGroupRaftL `json:"layers"`
}

type jGroupRaftL struct {
	Layer      string `json:"layer"`
	Top        qty    `json:"top"`
	Bottom     qty    `json:"bottom"`
	Kind       string `json:"kind"`
	Settlement qty    `json:"settlement"`
}

func groupJSON(r *calc.Result, c jconv) *jGroup {
	g := r.Group
	if g == nil {
		return nil
	}
	geo := g.Geometry
	j := &jGroup{N: g.N, Width: c.L(g.Width), Bg: c.L(geo.Bg), Lg: c.L(geo.Lg), MinSpacing: c.L(geo.MinSpacing),
		Cap:        [4]qty{c.L(geo.CapMinX), c.L(geo.CapMinY), c.L(geo.CapMaxX), c.L(geo.CapMaxY)},
		Efficiency: jGroupEff{g.Efficiency.Rule, jnum(g.Efficiency.Value), jnum(g.Efficiency.Raw), g.Efficiency.Equation},
		Single:     c.F(g.Single.Compression), SumSingles: c.F(g.SumSingles), Reduced: c.F(g.Reduced), Capacity: c.F(g.Capacity), Governs: g.Governs,
		Tension:   jGroupUplift{Single: c.F(g.Single.Tension), Piles: c.F(g.SumTension), Uplift: c.F(g.Uplift), Governs: g.UpliftGoverns},
		Loads:     jLoads{c.F(g.Loads.Compression.Permanent), c.F(g.Loads.Compression.Variable), c.F(g.Loads.Tension.Permanent), c.F(g.Loads.Tension.Variable)},
		LoadsFrom: g.LoadsFrom, SettlePass: g.SettlementPass, Pass: g.Pass, Warnings: nonNil(g.Warnings)}
	if l := g.Layout; l.IsGrid() {
		j.Rows, j.Columns = l.Rows, l.Cols
		sx, sy := c.L(l.Sx), c.L(l.Sy)
		j.SpacingX, j.SpacingY = &sx, &sy
	}
	j.Positions = [][2]qty{}
	for _, p := range g.Layout.Points {
		j.Positions = append(j.Positions, [2]qty{c.L(p.X), c.L(p.Y)})
	}
	if b := g.Block; b != nil {
		jb := &jGroupBlock{Top: c.L(b.Top), Tip: c.L(b.Tip), Perimeter: c.L(b.Perimeter), BaseLayer: b.BaseLayer, UnitBase: c.S(b.UnitBase),
			Base: c.F(b.Base), Side: c.F(b.Side), Capacity: c.F(b.Capacity), Weight: c.F(b.Weight), Rows: []jGroupSideRw{}}
		if b.BaseUndrained {
			jb.Nc = jn(b.Nc)
		}
		for _, row := range b.Rows {
			var k0 *jnum
			if !row.Undrained {
				k0 = jn(row.K0)
			}
			jb.Rows = append(jb.Rows, jGroupSideRw{c.L(row.Top), c.L(row.Bottom), row.Layer, c.S(row.Tau), k0, c.F(row.Force)})
		}
		j.Block = jb
		u := c.F(g.BlockUplift)
		j.Tension.Block = &u
	}
	if d := g.Design; d != nil {
		jd := &jGroupDes{Basis: d.Basis, Pass: d.Pass, Cases: []jGroupCheck{}}
		if d.Governing >= 0 && d.Governing < len(d.Cases) {
			jd.Governing = d.Cases[d.Governing].Case
		}
		for _, cs := range d.Cases {
			jc := jGroupCheck{Case: cs.Case, Ratio: jnum(cs.Ratio), PilesRd: c.F(cs.PilesRd), Rd: c.F(cs.Rd), Ed: c.F(cs.Ed), Use: jnum(min(cs.Use, 1e300)),
				TensionRd: c.F(cs.TensionRd), TensionEd: c.F(cs.TensionEd), TensionUse: jnum(cs.TensionUse), Pass: cs.Pass, TensionRatio: jnum(cs.TensionRatio)}
			if g.Block != nil {
				b := c.F(cs.BlockRd)
				jc.BlockRd = &b
			}
			jd.Cases = append(jd.Cases, jc)
		}
		j.Design = jd
	}
	if v := g.Vesic; v != nil {
		q := c.sm(v.Group)
		j.Vesic = &q
	}
	if rf := g.Raft; rf != nil {
		jr := &jGroupRaft{Method: rf.Method, Depth: c.L(rf.Depth), Bottom: c.L(rf.Bottom), GroupWidth: c.L(rf.GroupBg), GroupLength: c.L(rf.GroupLg),
			Width: c.L(rf.Bg), Length: c.L(rf.Lg), Load: c.F(rf.Load), Pressure: c.S(rf.Pressure), Elastic: c.sm(rf.Elastic),
			Oedometer: c.sm(rf.Oedometer), DepthFactor: jnum(rf.DepthFactor), GeologicalFactor: jnum(rf.GeologicalFactor),
			Consolidation: c.sm(rf.Consolidation), Total: c.sm(rf.Total), Layers: []jGroupRaftL{}}
		if rf.Method == group.RaftTomlinson {
			st, top := rf.Stress, c.L(rf.SpreadTop)
			jr.Stress, jr.SpreadTop = &st, &top
		}
		for _, l := range rf.Layers {
			jr.Layers = append(jr.Layers, jGroupRaftL{l.Layer, c.L(l.Top), c.L(l.Bottom), l.Kind, c.sm(l.Settlement)})
		}
		j.Raft = jr
	}
	if g.HasAllowable {
		q := c.sm(g.Allowable)
		j.Allowable = &q
	}
	return j
}

// groupSummary is the group's line in the summary: its verdict, the
// governing mode and the settlement.
func groupSummary(g *calc.GroupResult, c conv) string {
	s := fmt.Sprintf("%d piles: Qg %s (%s govern), uplift %s", g.N, c.fs(g.Capacity), g.Governs, c.fs(g.Uplift))
	if d := g.Design; d != nil {
		s = passText(g.Pass) + ": " + s + fmt.Sprintf(", highest utilisation %s", fmtNum(d.MaxUse(), 3))
	}
	if g.Raft != nil {
		s += ", equivalent raft settlement " + c.sms(g.Raft.Total)
	}
	return s
}
