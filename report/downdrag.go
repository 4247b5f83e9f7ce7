package report

import (
	"fmt"

	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
)

// headDowndrag is the heading of the downdrag section (the HTML writer
// adds its figures).
const headDowndrag = "Downdrag and the neutral plane"

// downdragVerdict is the one-line verdict of the downdrag check.
func downdragVerdict(d *calc.DowndragResult, c conv) string {
	switch {
	case d.NoEquilibrium:
		return fmt.Sprintf("FAIL: the sustained load %s exceeds the shaft and tip resistance; there is no neutral plane", c.fs(d.Load))
	case len(d.Cases) == 0:
		return fmt.Sprintf("neutral plane at %s, drag load %s, largest axial force %s (no design basis given)", c.ls(d.NeutralPlane), c.fs(d.DragLoad), c.fs(d.MaxForce))
	case d.Pass:
		return fmt.Sprintf("pass: neutral plane at %s, drag load %s, largest axial force %s", c.ls(d.NeutralPlane), c.fs(d.DragLoad), c.fs(d.MaxForce))
	}
	return fmt.Sprintf("FAIL: with the drag load %s, Ed/Rd > 1 in at least one case (neutral plane at %s)", c.fs(d.DragLoad), c.ls(d.NeutralPlane))
}

// secDowndrag is the downdrag section: what is placed after
// installation, the neutral plane, drag load and largest axial force, the
// settlements at the neutral plane, the forces with depth and the design
// check with the drag load.
func secDowndrag(r *calc.Result, c conv) section {
	d := r.Downdrag
	if d == nil {
		return section{}
	}
	var after []string
	if d.FillThickness > 0 {
		after = append(after, fmt.Sprintf("fill %s of %s %s", c.ls(d.FillThickness), fmtNum(c.G(d.FillUnitWeight), sig), c.uG()))
	}
	if d.SurchargeAfter > 0 {
		after = append(after, fmt.Sprintf("surcharge %s %s", fmtNum(c.S(d.SurchargeAfter), sig), c.uS()))
	}
	if d.HasWater {
		after = append(after, "water table lowered to "+c.ls(d.WaterDepthAfter))
	}
	placed := "nothing but the ground settlement given"
	if len(after) > 0 {
		placed = joinAnd(after)
	}
	it := []item{
		{"Placed after installation", txt(placed), ""},
		{"Added stress on the ground (fill + surcharge)", num(c.S(d.Surcharge)), c.uS()},
		{"Sustained load Qd", num(c.F(d.Load)), c.uF()},
		{"Taken from", txt(d.LoadFrom), ""},
		{"Ground settlement with depth", txt(groundFrom(d, c)), ""},
		{"Neutral plane (depth)", num(c.L(d.NeutralPlane)), c.uL()},
		{"Drag load Qn (negative skin friction to the neutral plane)", num(c.F(d.DragLoad)), c.uF()},
		{"Largest axial force Qd + Qn (at the neutral plane)", num(c.F(d.MaxForce)), c.uF()},
		{"Positive shaft resistance below the neutral plane", num(c.F(d.ShaftBelow)), c.uF()},
		{"Shaft resistance of the whole pile (after the loads)", num(c.F(d.ShaftTotal)), c.uF()},
		{"Mobilised tip resistance Rt,mob", num(c.F(d.TipForce)), c.uF()},
		{"Tip resistance Qp·Ab", num(c.F(d.TipCapacity)), c.uF()},
		{"Tip force from", txt(tipFrom(d)), ""},
		{"Ground settlement at the neutral plane (= pile settlement there)", num(c.sm(d.GroundAtNP)), c.uSm()},
		{"Toe movement (q-z curve at Rt,mob)", num(c.sm(d.TipMovement)), c.uSm()},
		{"Pile shortening from the neutral plane to the tip", num(c.sm(d.ShorteningBelow)), c.uSm()},
		{"Pile's own settlement at the neutral plane (toe + shortening)", num(c.sm(d.PileAtNP)), c.uSm()},
		{"Mismatch (pile's own − ground's, at the neutral plane)", num(c.sm(d.Mismatch)), c.uSm()},
		{"Head settlement (pile's own + shortening above the neutral plane)", num(c.sm(d.HeadSettlement)), c.uSm()},
		{"Downdrag check", txt(downdragVerdict(d, c)), ""},
	}
	switch {
	case d.LengthFound:
		it = append(it, item{"Required length with the drag load", txt(fmt.Sprintf("%s (tip at %s)", c.ls(d.Length), c.ls(d.TipDepth))), ""})
	case r.Length != nil && r.Length.Found && len(d.Cases) > 0:
		it = append(it, item{"Required length with the drag load", txt("none within the search"), ""})
	}
	var notes []string
	if d.TipFull {
		notes = append(notes, "The tip is fully mobilised: the ground drags the pile further than the q-z curve's full mobilisation (the toe penetrates; settlement governs).")
	}
	if d.AllToTip {
		notes = append(notes, "The tip carries all the force arriving at it; the neutral plane is the deepest point where friction acts and the ground settles more than the pile along all of the pile above it.")
	}
	if d.Dragged && d.DragLoad == 0 {
		notes = append(notes, "The ground settles less than the pile at the head: no negative skin friction acts.")
	}
	blocks := []block{{items: it},
		{para: "Unified method (Fellenius 2004): the axial force from the head down is Qd + ∫p·fn dz, from the tip up Rt,mob + ∫p·fs dz; the neutral plane is where the two meet, the drag load the negative skin friction integrated to it and the largest axial force Qd + Qn. The unit negative skin friction fn is the pile analysis' own unit shaft resistance in the ground after the loads (β methods at the long-term σ′v, as Das's fn = K′σ′o tan δ′, Eq. 11.125; α methods with su as given). The pile settles with the ground at the neutral plane; Rt,mob is found so that the toe movement on the q-z curve plus the pile's shortening below the neutral plane equals the ground settlement there, unless it is given. The change from negative to positive friction is taken as sharp (no transition zone: the largest drag load); the pile's weight is left out; transient loads do not add to the drag load."}}
	if len(notes) > 0 {
		blocks = append(blocks, block{list: notes})
	}
	blocks = append(blocks, block{tbl: downdragTable(d, c)})
	if len(d.Cases) > 0 {
		t := &table{cols: []column{{"Case", ""}, {"γ on drag load", ""}, {"Ed", c.uF()}, {"Rd below NP", c.uF()}, {"Ed/Rd", ""}, {"Structural Ed at NP", c.uF()}, {"Result", ""}}}
		for _, cs := range d.Cases {
			res := "pass"
			if !cs.Pass {
				res = "FAIL"
			}
			t.rows = append(t.rows, []cell{txt(cs.Case), num(cs.DragFactor), num(c.F(cs.Ed)), num(c.F(cs.Rd)), useCell(cs.Use), num(c.F(cs.StructuralEd)), txt(res)})
		}
		from := ""
		if len(d.Cases) > 0 {
			from = d.Cases[0].DragFactorFrom
		}
		blocks = append(blocks, block{para: "Design check with the drag load: Ed = γG·G + γQ·Q + γDD·Qn against Rd, the design resistance of the pile with no shaft resistance above the neutral plane (the layers that settle more than the pile give none), by the multipliers of each case. The structural design force at the neutral plane is γG·Qd + γDD·Qn. γDD: " + from + "."},
			block{tbl: t})
	}
	return section{heading: headDowndrag, blocks: blocks}
}

func tipFrom(d *calc.DowndragResult) string {
	if d.TipFrom == "given" {
		return "downdrag.tip_force (given)"
	}
	return "settlement compatibility on the " + d.TipCurve + " q-z curve"
}

func joinAnd(s []string) string {
	switch len(s) {
	case 0:
		return ""
	case 1:
		return s[0]
	}
	out := s[0]
	for _, x := range s[1 : len(s)-1] {
		out += ", " + x
	}
	return out + " and " + s[len(s)-1]
}

// downdragTable is the axial force and the settlements with depth.
func downdragTable(d *calc.DowndragResult, c conv) *table {
	t := &table{cols: []column{{"Depth", c.uL()}, {"Force from the head", c.uF()}, {"Force from the tip", c.uF()}, {"Axial force", c.uF()},
		{"Ground settlement", c.uSm()}, {"Pile settlement", c.uSm()}, {"Friction", ""}}}
	for _, p := range d.Points {
		f := "positive"
		if p.NegativeFriction {
			f = "negative"
		}
		if p.Depth == d.NeutralPlane {
			f = "neutral plane"
		}
		t.rows = append(t.rows, []cell{num(c.L(p.Depth)), num(c.F(p.Down)), num(c.F(p.Up)), num(c.F(p.Force)), num(c.sm(p.Ground)), num(c.sm(p.Pile)), txt(f)})
	}
	return t
}

// downdragFigures adds the figures of the downdrag section (HTML, PDF):
// the axial force with depth (both curves and the neutral plane) and the
// settlement of the ground and of the pile with depth.
func downdragFigures(s *section, r *calc.Result, c conv) error {
	d := r.Downdrag
	if s.heading != headDowndrag || d == nil || len(d.Points) < 2 {
		return nil
	}
	var down, up, force, ground, pileS plotter.XYs
	// The two curves are drawn out to 1.5 times the larger of the largest
	// axial force and the force from the tip at the head, so that the
	// crossing stays readable.
	xcap := 1.5 * max(c.F(d.MaxForce), c.F(d.Points[0].Up))
	xmax, smax := 0.0, 0.0
	for _, p := range d.Points {
		z := -c.L(p.Depth)
		if x := c.F(p.Down); x <= xcap {
			down = append(down, plotter.XY{X: x, Y: z})
			xmax = max(xmax, x)
		}
		if x := c.F(p.Up); x <= xcap {
			up = append(up, plotter.XY{X: x, Y: z})
			xmax = max(xmax, x)
		}
		force = append(force, plotter.XY{X: c.F(p.Force), Y: z})
		ground = append(ground, plotter.XY{X: c.sm(p.Ground), Y: z})
		pileS = append(pileS, plotter.XY{X: c.sm(p.Pile), Y: z})
		xmax = max(xmax, c.F(p.Force))
		smax = max(smax, c.sm(p.Ground), c.sm(p.Pile))
	}
	dash := []vg.Length{vg.Points(6), vg.Points(3)}
	np := -c.L(d.NeutralPlane)
	npLabel := "neutral plane " + c.ls(d.NeutralPlane)
	// The curves fill the top of the plot (the force from the tip is
	// largest there): the legend goes to the bottom right.
	g, err := svgPlotLegend("Axial force with depth", "axial force ("+c.uF()+")", "depth ("+c.uL()+")", []series{
		{"from the head: Qd + negative skin friction", down, blue, dash, false},
		{"from the tip: Rt,mob + shaft resistance below", up, red, dash, false},
		{"axial force", force, black, nil, false},
		{npLabel, plotter.XYs{{X: 0, Y: np}, {X: xmax, Y: np}}, green, []vg.Length{vg.Points(2), vg.Points(2)}, false},
	}, false)
	if err != nil {
		return err
	}
	s.blocks = append(s.blocks, figBlock(g, "Axial force with depth by the unified method: the force from the head (sustained load plus negative skin friction) and from the tip (mobilised tip resistance plus positive shaft resistance) meet at the neutral plane, where the axial force is largest."))
	g, err = svgPlot("Settlement with depth", "settlement ("+c.uSm()+")", "depth ("+c.uL()+")", []series{
		{"ground", ground, orange, nil, false},
		{"pile", pileS, black, nil, false},
		{npLabel, plotter.XYs{{X: 0, Y: np}, {X: max(smax, 1e-9), Y: np}}, green, []vg.Length{vg.Points(2), vg.Points(2)}, false},
	})
	if err != nil {
		return err
	}
	s.blocks = append(s.blocks, figBlock(g, "Long-term settlement of the ground and of the pile with depth: above the neutral plane the ground settles more than the pile (negative skin friction), below it less."))
	return nil
}

// JSON of the downdrag section (documented in JSON.md).
type jDowndrag struct {
	Surcharge       qty              `json:"added_surcharge"`
	WaterDepthAfter *qty             `json:"water_depth_after"`
	Load            qty              `json:"load"`
	LoadFrom        string           `json:"load_from"`
	GroundFrom      string           `json:"ground_settlement_from"`
	NeutralPlane    qty              `json:"neutral_plane"`
	DragLoad        qty              `json:"drag_load"`
	MaxForce        qty              `json:"max_force"`
	ShaftBelow      qty              `json:"shaft_below"`
	ShaftTotal      qty              `json:"shaft_total"`
	TipForce        qty              `json:"tip_force"`
	TipCapacity     qty              `json:"tip_capacity"`
	TipFrom         string           `json:"tip_from"`
	TipCurve        string           `json:"tip_curve,omitempty"`
	GroundAtNP      qty              `json:"ground_settlement_at_np"`
	TipMovement     qty              `json:"toe_movement"`
	ShorteningBelow qty              `json:"shortening_below_np"`
	ShorteningAbove qty              `json:"shortening_above_np"`
	PileAtNP        qty              `json:"pile_settlement_at_np"`
	Mismatch        qty              `json:"mismatch"`
	HeadSettlement  qty              `json:"head_settlement"`
	Dragged         bool             `json:"dragged"`
	TipFull         bool             `json:"tip_fully_mobilised"`
	AllToTip        bool             `json:"all_to_tip"`
	NoEquilibrium   bool             `json:"no_equilibrium"`
	Pass            bool             `json:"pass"`
	RequiredLength  *jDowndragLength `json:"required_length"`
	Points          []jDowndragPoint `json:"with_depth"`
	Cases           []jDowndragCase  `json:"cases"`
}

type jDowndragLength struct {
	Found    bool `json:"found"`
	Length   *qty `json:"length"`
	TipDepth *qty `json:"tip_depth"`
}

type jDowndragPoint struct {
	Depth    qty  `json:"depth"`
	Down     qty  `json:"from_head"`
	Up       qty  `json:"from_tip"`
	Force    qty  `json:"axial_force"`
	Ground   qty  `json:"ground_settlement"`
	Pile     qty  `json:"pile_settlement"`
	Negative bool `json:"negative_friction"`
}

type jDowndragCase struct {
	Case           string `json:"case"`
	DragFactor     jnum   `json:"drag_load_factor"`
	DragFactorFrom string `json:"drag_load_factor_from"`
	Ed             qty    `json:"ed"`
	Rd             qty    `json:"rd"`
	Use            jnum   `json:"utilisation"`
	StructuralEd   qty    `json:"structural_ed"`
	Pass           bool   `json:"pass"`
}

func downdragJSON(r *calc.Result, c jconv) *jDowndrag {
	d := r.Downdrag
	if d == nil {
		return nil
	}
	sm := func(v units.Length) qty { return c.L(v) }
	j := &jDowndrag{Surcharge: c.S(d.Surcharge), Load: c.F(d.Load), LoadFrom: d.LoadFrom, GroundFrom: d.GroundFrom,
		NeutralPlane: c.L(d.NeutralPlane), DragLoad: c.F(d.DragLoad), MaxForce: c.F(d.MaxForce), ShaftBelow: c.F(d.ShaftBelow),
		ShaftTotal: c.F(d.ShaftTotal), TipForce: c.F(d.TipForce), TipCapacity: c.F(d.TipCapacity), TipFrom: d.TipFrom, TipCurve: d.TipCurve,
		GroundAtNP: sm(d.GroundAtNP), TipMovement: sm(d.TipMovement), ShorteningBelow: sm(d.ShorteningBelow), ShorteningAbove: sm(d.ShorteningAbove),
		PileAtNP: sm(d.PileAtNP), Mismatch: sm(d.Mismatch), HeadSettlement: sm(d.HeadSettlement),
		Dragged: d.Dragged, TipFull: d.TipFull, AllToTip: d.AllToTip, NoEquilibrium: d.NoEquilibrium, Pass: d.Pass,
		Points: []jDowndragPoint{}, Cases: []jDowndragCase{}}
	if r.Length != nil && r.Length.Found && len(d.Cases) > 0 {
		j.RequiredLength = &jDowndragLength{Found: d.LengthFound}
		if d.LengthFound {
			l, t := c.L(d.Length), c.L(d.TipDepth)
			j.RequiredLength.Length, j.RequiredLength.TipDepth = &l, &t
		}
	}
	if d.HasWater {
		q := c.L(d.WaterDepthAfter)
		j.WaterDepthAfter = &q
	}
	for _, p := range d.Points {
		j.Points = append(j.Points, jDowndragPoint{c.L(p.Depth), c.F(p.Down), c.F(p.Up), c.F(p.Force), sm(p.Ground), sm(p.Pile), p.NegativeFriction})
	}
	for _, cs := range d.Cases {
		j.Cases = append(j.Cases, jDowndragCase{cs.Case, jnum(cs.DragFactor), cs.DragFactorFrom, c.F(cs.Ed), c.F(cs.Rd), jnum(min(cs.Use, 1e300)), c.F(cs.StructuralEd), cs.Pass})
	}
	return j
}

func groundFrom(d *calc.DowndragResult, c conv) string {
	if d.GroundFrom == "points" {
		return "given as points (downdrag.ground_settlement)"
	}
	return "one-dimensional consolidation of the layers under the change of σ′v (surface settlement " + c.sms(d.GroundSurface) + ")"
}

// secDowndragLength is the required length with the drag load, for the
// length view.
func secDowndragLength(r *calc.Result, c conv) section {
	d := r.Downdrag
	if d == nil || r.Length == nil || !r.Length.Found || len(d.Cases) == 0 {
		return section{}
	}
	v := "none within the search: no pile passes the downdrag check"
	if d.LengthFound {
		v = fmt.Sprintf("%s (tip at %s)", c.ls(d.Length), c.ls(d.TipDepth))
	}
	return section{heading: "Required length with the drag load", blocks: []block{{items: []item{
		{"Required length (ordinary check)", txt(c.ls(r.Length.Length)), ""},
		{"Required length with the drag load", txt(v), ""},
		{"Neutral plane of the pile as given", txt(c.ls(d.NeutralPlane)), ""},
	}}, {para: "The shortest pile on the grid of the search, from the ordinary required length down, that also passes the downdrag check: Ed = γG·G + γQ·Q + γDD·Qn against the design resistance with no shaft resistance above the neutral plane."}}}
}
