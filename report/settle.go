package report

import (
	"fmt"
	"strconv"
	"strings"

	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
)

// The section headings of the settlement and the load test (the HTML
// writer adds their figures).
const (
	headSettlement = "Settlement at the serviceability load"
	headLoadTest   = "Static load test"
)

// Settlements are shown in mm (SI) or in (US): metres and feet hide them.
func (c conv) sm(v units.Length) float64 {
	if c.sys == units.US {
		return v.Inches()
	}
	return v.Millimetres()
}

func (c conv) uSm() string {
	if c.sys == units.US {
		return "in"
	}
	return "mm"
}

func (c conv) sms(v units.Length) string { return fmtNum(c.sm(v), sig) + " " + c.uSm() }

// withDepthRows is at most about 20 nodes of the axial load with depth,
// head and tip always (the figure shows every node).
func withDepthRows(n int) []int {
	if n == 0 {
		return nil
	}
	step := max(1, (n-1+19)/20)
	var out []int
	for i := 0; i < n-1; i += step {
		out = append(out, i)
	}
	return append(out, n-1)
}

func methodName(m string) string {
	switch m {
	case calc.SettleLoadTransfer:
		return "load transfer (t-z and q-z springs)"
	case calc.SettleVesic:
		return "Vesic (1977), three components"
	case calc.SettleRandolphWroth:
		return "Randolph & Wroth (1978), closed-form head stiffness"
	}
	return m
}

func serviceText(s *calc.SettlementResult, c conv) string {
	switch {
	case s.Plunged:
		return fmt.Sprintf("FAIL: the pile cannot carry %s; it plunges at %s", c.fs(s.Load), c.fs(s.PlungeLoad))
	case !s.HasAllowable:
		return "no allowable settlement given"
	case s.Pass:
		return fmt.Sprintf("pass: %s ≤ %s", c.sms(s.Settlement), c.sms(s.Allowable))
	}
	return fmt.Sprintf("FAIL: %s > %s", c.sms(s.Settlement), c.sms(s.Allowable))
}

// secServiceability is the serviceability summary of the check view.
func secServiceability(r *calc.Result, c conv) section {
	s := r.Settlement
	if s == nil {
		return section{}
	}
	it := []item{{"Method", txt(s.Method), ""}, {"Serviceability load", num(c.F(s.Load)), c.uF()}}
	if !s.Plunged {
		it = append(it, item{"Settlement", num(c.sm(s.Settlement)), c.uSm()})
	}
	if s.HasAllowable {
		it = append(it, item{"Allowable", num(c.sm(s.Allowable)), c.uSm()})
	}
	it = append(it, item{"Result", txt(serviceText(s, c)), ""})
	return section{heading: "Serviceability", blocks: []block{{items: it}}}
}

func secSettlement(r *calc.Result, c conv) section {
	s := r.Settlement
	if s == nil {
		return section{}
	}
	eaV, eaU := c.F(s.EA), c.uF()
	it := []item{
		{"Method", txt(methodName(s.Method)), ""},
		{"Serviceability load", num(c.F(s.Load)), c.uF()},
		{"Taken from", txt(s.LoadFrom), ""},
		{"Pile EA (E × material area)", num(eaV), eaU},
		{"Shaft capacity Qs (pile analysis)", num(c.F(s.ShaftCapacity)), c.uF()},
		{"Tip capacity Qp (pile analysis)", num(c.F(s.TipCapacity)), c.uF()},
	}
	if s.Plunged {
		it = append(it, item{"Plunges at", num(c.F(s.PlungeLoad)), c.uF()})
	} else {
		it = append(it, item{"Head settlement", num(c.sm(s.Settlement)), c.uSm()})
		if s.Method != calc.SettleVesic {
			it = append(it, item{"Tip displacement", num(c.sm(s.TipMove)), c.uSm()})
		}
		it = append(it,
			item{"Load carried by the shaft", num(c.F(s.ShaftLoad)), c.uF()},
			item{"Load carried by the tip", num(c.F(s.TipLoad)), c.uF()},
			item{"Shaft share", num(s.ShaftShare), ""},
			item{"Tip share", num(s.TipShare), ""})
		if s.Method == calc.SettleLoadTransfer {
			it = append(it, item{"Shaft capacity mobilised", num(s.ShaftMobilised), ""}, item{"Tip capacity mobilised", num(s.TipMobilised), ""})
		}
	}
	if s.HasAllowable {
		it = append(it, item{"Allowable settlement", num(c.sm(s.Allowable)), c.uSm()})
	}
	it = append(it, item{"Serviceability check", txt(serviceText(s, c)), ""})
	blocks := []block{{items: it}, {para: "Method: " + s.Equation}}
	switch s.Method {
	case calc.SettleLoadTransfer:
		t := &table{cols: []column{{"Layer", ""}, {"t-z curve", ""}}}
		for _, lc := range s.LayerCurves {
			t.rows = append(t.rows, []cell{txt(lc.Layer), txt(lc.Curve)})
		}
		t.rows = append(t.rows, []cell{txt("tip (q-z)"), txt(s.TipCurve)})
		blocks = append(blocks, block{para: fmt.Sprintf("Curves scaled by the unit shaft and tip resistances of the pile analysis (api-clay with a residual ratio of %s after its peak). %d elements; force tolerance %s of the capacity; %d iterations.",
			fmtNum(s.Residual, sig), s.Elements, strconv.FormatFloat(s.Tolerance, 'g', 3, 64), s.Iterations)}, block{tbl: t})
	case calc.SettleVesic:
		if v, in := s.Vesic, s.VesicInputs; v != nil && in != nil {
			eqs := []string{
				fmt.Sprintf("se1 = (Qwp + ξ·Qws)·L/(Ap·Ep) = (%s + %s × %s) × %s / %s %s = %s", c.fs(in.TipLoad), fmtNum(in.Xi, sig), c.fs(in.ShaftLoad), c.ls(in.Length), fmtNum(eaV, sig), eaU, c.sms(v.Shortening)),
			}
			if in.Form.String() == "elastic" {
				es, esU := c.modulus(in.SoilModulus)
				ess, _ := c.modulus(s.VesicShaftModulus)
				eqs = append(eqs,
					fmt.Sprintf("se2 = (qwp·D/Es)(1 − νs²)·Iwp, qwp = Qwp/Ap = %s, D = %s, Es = %s %s, νs = %s, Iwp = %s: se2 = %s",
						c.ss(units.Stress(float64(in.TipLoad)/float64(in.Area))), c.ls(in.Diameter), fmtNum(es, sig), esU, fmtNum(in.Poisson, sig), fmtNum(v.Iwp, sig), c.sms(v.Tip)),
					fmt.Sprintf("se3 = (Qws/(p·L))(D/Es)(1 − νs²)·Iws, p = %s, Es = %s %s, νs = %s, Iws = 2 + 0.35·√(L/D) = %s: se3 = %s",
						c.ls(in.Perimeter), fmtNum(ess, sig), esU, fmtNum(s.VesicShaftPoisson, sig), fmtNum(v.Iws, sig), c.sms(v.Shaft)))
			} else {
				eqs = append(eqs,
					fmt.Sprintf("se2 = Qwp·Cp/(D·qp) = %s × %s / (%s × %s) = %s", c.fs(in.TipLoad), fmtNum(in.Cp, sig), c.ls(in.Diameter), c.ss(in.UnitTip), c.sms(v.Tip)),
					fmt.Sprintf("se3 = Qws·Cs/(L·qp), Cs = (0.93 + 0.16·√(L/D))·Cp = %s: se3 = %s", fmtNum(v.Cs, sig), c.sms(v.Shaft)))
			}
			eqs = append(eqs, fmt.Sprintf("se = se1 + se2 + se3 = %s", c.sms(v.Total)))
			blocks = append(blocks, block{eqs: eqs})
		}
	case calc.SettleRandolphWroth:
		if g := s.RandolphWroth; g != nil {
			blocks = append(blocks, block{items: []item{
				{"η = rb/r0", num(g.Eta), ""}, {"ξ = GL/Gb", num(g.Xi), ""}, {"ρ = G(L/2)/GL", num(g.Rho), ""},
				{"λ = Ep/GL", num(g.Lambda), ""}, {"rm", num(c.L(g.Rm)), c.uL()}, {"ζ = ln(rm/r0)", num(g.Zeta), ""},
				{"μL", num(g.MuL), ""}, {"Pt/(GL·r0·wt)", num(g.Ratio), ""}, {"Rigid-pile limit", num(g.Rigid), ""},
				{"Pb/Pt", num(g.TipShare), ""}, {"wb/wt = 1/cosh μL", num(g.BaseRatio), ""},
			}})
		}
	}
	if len(s.Notes) > 0 {
		blocks = append(blocks, block{para: "Notes: " + strings.Join(s.Notes, "; ") + "."})
	}
	blocks = append(blocks, block{para: "Predicted load-settlement curve from the unloaded pile:"}, block{tbl: curveTable(s, c)})
	if len(s.Depth) > 0 {
		t := &table{cols: []column{{"Depth", c.uL()}, {"Axial load", c.uF()}, {"Displacement", c.uSm()}}}
		for _, i := range withDepthRows(len(s.Depth)) {
			t.rows = append(t.rows, []cell{num(c.L(s.Depth[i])), num(c.F(s.AxialLoad[i])), num(c.sm(s.Displacement[i]))})
		}
		blocks = append(blocks, block{para: "Axial load and displacement with depth at the serviceability load (head to tip):"}, block{tbl: t})
	}
	return section{heading: headSettlement, blocks: blocks}
}

func curveTable(s *calc.SettlementResult, c conv) *table {
	t := &table{cols: []column{{"Head load", c.uF()}, {"Settlement", c.uSm()}}}
	for _, p := range s.Curve {
		t.rows = append(t.rows, []cell{num(c.F(p.Load)), num(c.sm(p.Settlement))})
	}
	return t
}

var criterionNames = map[string]string{
	"davisson":         "Davisson (1972) offset limit",
	"ten-percent":      "10 % of the diameter (EN ISO 22477-1)",
	"chin-kondner":     "Chin-Kondner hyperbola (asymptote)",
	"brinch-hansen-80": "Brinch Hansen 80 %",
}

func secLoadTest(r *calc.Result, c conv) section {
	lt := r.LoadTest
	if lt == nil {
		return section{}
	}
	pts := &table{cols: []column{{"Point", ""}, {"Head load", c.uF()}, {"Settlement", c.uSm()}}}
	for i, p := range lt.Points {
		pts.rows = append(pts.rows, []cell{num(float64(i)), num(c.F(p.Load)), num(c.sm(p.Settlement))})
	}
	cr := &table{cols: []column{{"Criterion", ""}, {"Load", c.uF()}, {"Settlement", c.uSm()}, {"Reached", ""}, {"Fit R²", ""}, {"Note", ""}}}
	for _, l := range lt.Limits {
		reached := "no"
		if l.Reached {
			reached = "yes"
		}
		r2 := optNum(l.R2, l.C1 != 0 || l.C2 != 0)
		cr.rows = append(cr.rows, []cell{txt(criterionNames[l.Criterion]), optNum(c.F(l.Load), l.Reached), optNum(c.sm(l.Settlement), l.Reached && l.Settlement > 0),
			txt(reached), r2, txt(dash(l.Note))})
	}
	blocks := []block{{tbl: pts}, {tbl: cr}, {para: fmt.Sprintf("Davisson's line s = Q·L/(A·E) + 3.81 mm + D/120 with L = %s and D = %s; the 10 %% criterion at 0.1·D; the hyperbolic fits over the points from point %d on. A criterion not reached is not extrapolated; the Chin-Kondner asymptote is reached only at infinite settlement (no settlement shown).",
		c.ls(lt.Length), c.ls(lt.Diameter), lt.FitFrom)}}
	return section{heading: headLoadTest, blocks: blocks}
}

// settleSVG plots the predicted load-settlement curve, the measured one
// and the serviceability load, settlement downwards.
func settleSVG(r *calc.Result, c conv) (figure, error) {
	s := r.Settlement
	var pred, meas plotter.XYs
	if s != nil {
		for _, p := range s.Curve {
			pred = append(pred, plotter.XY{X: c.F(p.Load), Y: -c.sm(p.Settlement)})
		}
	}
	if lt := r.LoadTest; lt != nil {
		for _, p := range lt.Points {
			meas = append(meas, plotter.XY{X: c.F(p.Load), Y: -c.sm(p.Settlement)})
		}
	}
	ss := []series{{"predicted", pred, black, nil, false}, {"measured (load test)", meas, red, []vg.Length{vg.Points(5), vg.Points(3)}, false}}
	if s != nil && !s.Plunged && s.Load > 0 {
		ss = append(ss, series{"serviceability load", plotter.XYs{{X: c.F(s.Load), Y: 0}, {X: c.F(s.Load), Y: -c.sm(s.Settlement)}}, green, []vg.Length{vg.Points(8), vg.Points(3)}, false})
	}
	if s != nil && s.HasAllowable && len(pred) > 0 {
		xmax := pred[len(pred)-1].X
		for _, p := range meas {
			xmax = max(xmax, p.X)
		}
		ss = append(ss, series{"allowable settlement", plotter.XYs{{X: 0, Y: -c.sm(s.Allowable)}, {X: xmax, Y: -c.sm(s.Allowable)}}, blue, []vg.Length{vg.Points(2), vg.Points(2)}, false})
	}
	return svgPlot("Load-settlement", "head load ("+c.uF()+")", "settlement ("+c.uSm()+")", ss)
}

// axialSVG plots the axial load with depth at the serviceability load.
func axialSVG(r *calc.Result, c conv) (figure, error) {
	s := r.Settlement
	var xy plotter.XYs
	for i, z := range s.Depth {
		xy = append(xy, plotter.XY{X: c.F(s.AxialLoad[i]), Y: -c.L(z)})
	}
	return svgPlot("Axial load at the serviceability load", "axial load ("+c.uF()+")", "depth ("+c.uL()+")", []series{{"axial load", xy, black, nil, false}})
}

// settleFigures adds the figures of the settlement and load-test
// sections (HTML).
func settleFigures(s *section, r *calc.Result, c conv) error {
	switch s.heading {
	case headSettlement:
		if r.Settlement == nil {
			return nil
		}
		g, err := settleSVG(r, c)
		if err != nil {
			return err
		}
		fig := "Predicted load-settlement curve"
		if r.LoadTest != nil {
			fig += " with the measured one of the load test"
		}
		s.blocks = append(s.blocks, figBlock(g, fig+", the serviceability load and the allowable settlement."))
		if len(r.Settlement.Depth) >= 2 {
			g, err := axialSVG(r, c)
			if err != nil {
				return err
			}
			s.blocks = append(s.blocks, figBlock(g, "Axial load in the pile with depth at the serviceability load."))
		}
	case headLoadTest:
		if r.Settlement == nil && r.LoadTest != nil {
			g, err := settleSVG(r, c)
			if err != nil {
				return err
			}
			s.blocks = append(s.blocks, figBlock(g, "Measured load-settlement curve of the load test."))
		}
	}
	return nil
}

// settleCSV is the table of the settle view in CSV: the predicted
// load-settlement curve, then the load test's points.
func settleCSV(r *calc.Result, c conv) *table {
	t := &table{cols: []column{{"Curve", ""}, {"Head load", c.uF()}, {"Settlement", c.uSm()}}}
	if s := r.Settlement; s != nil {
		for _, p := range s.Curve {
			t.rows = append(t.rows, []cell{txt("predicted"), num(c.F(p.Load)), num(c.sm(p.Settlement))})
		}
	}
	if lt := r.LoadTest; lt != nil {
		for _, p := range lt.Points {
			t.rows = append(t.rows, []cell{txt("measured"), num(c.F(p.Load)), num(c.sm(p.Settlement))})
		}
	}
	return t
}

// JSON of the settlement and the load test (documented in JSON.md).
type jSettle struct {
	Method         string        `json:"method"`
	Equation       string        `json:"equation"`
	Load           qty           `json:"load"`
	LoadFrom       string        `json:"load_from"`
	Allowable      *qty          `json:"allowable"`
	Settlement     *qty          `json:"settlement"`
	Plunged        bool          `json:"plunged"`
	PlungeLoad     *qty          `json:"plunge_load"`
	Pass           bool          `json:"pass"`
	ShaftLoad      *qty          `json:"shaft_load"`
	TipLoad        *qty          `json:"tip_load"`
	ShaftShare     *jnum         `json:"shaft_share"`
	TipShare       *jnum         `json:"tip_share"`
	TipMove        *qty          `json:"tip_displacement"`
	EA             qty           `json:"ea"`
	ShaftCapacity  qty           `json:"shaft_capacity"`
	TipCapacity    qty           `json:"tip_capacity"`
	Curve          []jCurvePoint `json:"curve"`
	WithDepth      []jAxial      `json:"with_depth"`
	LayerCurves    []jLayerCurve `json:"layer_curves,omitempty"`
	TipCurve       string        `json:"tip_curve,omitempty"`
	Elements       int           `json:"elements,omitempty"`
	Iterations     int           `json:"iterations,omitempty"`
	Tolerance      *jnum         `json:"tolerance,omitempty"`
	Residual       *jnum         `json:"residual,omitempty"`
	ShaftMobilised *jnum         `json:"shaft_mobilised,omitempty"`
	TipMobilised   *jnum         `json:"tip_mobilised,omitempty"`
	Vesic          *jVesic       `json:"vesic,omitempty"`
	RandolphWroth  *jRandolph    `json:"randolph_wroth,omitempty"`
	Notes          []string      `json:"notes"`
}

type jCurvePoint struct {
	Load       qty `json:"load"`
	Settlement qty `json:"settlement"`
}

type jAxial struct {
	Depth        qty `json:"depth"`
	AxialLoad    qty `json:"axial_load"`
	Displacement qty `json:"displacement"`
}

type jLayerCurve struct {
	Layer string `json:"layer"`
	Curve string `json:"curve"`
}

type jVesic struct {
	Form         string `json:"form"`
	Xi           jnum   `json:"xi"`
	TipLoad      qty    `json:"qwp"`
	ShaftLoad    qty    `json:"qws"`
	Shortening   qty    `json:"se1"`
	Tip          qty    `json:"se2"`
	Shaft        qty    `json:"se3"`
	TipModulus   *qty   `json:"es_tip,omitempty"`
	TipPoisson   *jnum  `json:"nu_tip,omitempty"`
	ShaftModulus *qty   `json:"es_shaft,omitempty"`
	ShaftPoisson *jnum  `json:"nu_shaft,omitempty"`
	Iwp          *jnum  `json:"iwp,omitempty"`
	Iws          *jnum  `json:"iws,omitempty"`
	Cp           *jnum  `json:"cp,omitempty"`
	Cs           *jnum  `json:"cs,omitempty"`
}

type jRandolph struct {
	ShearTop  qty  `json:"g_head"`
	ShearTip  qty  `json:"g_tip_level"`
	ShearBase qty  `json:"g_base"`
	Poisson   jnum `json:"nu"`
	Eta       jnum `json:"eta"`
	Xi        jnum `json:"xi"`
	Rho       jnum `json:"rho"`
	Lambda    jnum `json:"lambda"`
	Rm        qty  `json:"rm"`
	Zeta      jnum `json:"zeta"`
	MuL       jnum `json:"mu_l"`
	Ratio     jnum `json:"stiffness_ratio"`
	Rigid     jnum `json:"rigid_ratio"`
	TipShare  jnum `json:"tip_share"`
	BaseRatio jnum `json:"base_ratio"`
}

type jLoadTest struct {
	Points   []jCurvePoint `json:"points"`
	FitFrom  int           `json:"fit_from"`
	Criteria []jCriterion  `json:"criteria"`
}

type jCriterion struct {
	Criterion  string `json:"criterion"`
	Reached    bool   `json:"reached"`
	Load       *qty   `json:"load"`
	Settlement *qty   `json:"settlement"`
	C1         *jnum  `json:"c1,omitempty"`
	C2         *jnum  `json:"c2,omitempty"`
	R2         *jnum  `json:"r2,omitempty"`
	Note       string `json:"note,omitempty"`
}

// sm is a settlement in mm (SI) or in (US).
func (c jconv) sm(v units.Length) qty { return qty{jnum(c.conv.sm(v)), c.uSm()} }

func jn(x float64) *jnum { v := jnum(x); return &v }

func settleJSON(r *calc.Result, c jconv) *jSettle {
	s := r.Settlement
	if s == nil {
		return nil
	}
	j := &jSettle{Method: s.Method, Equation: s.Equation, Load: c.F(s.Load), LoadFrom: s.LoadFrom,
		Allowable: opt(c.sm(s.Allowable), s.HasAllowable), Plunged: s.Plunged, PlungeLoad: opt(c.F(s.PlungeLoad), s.Plunged),
		Pass: s.Pass, EA: c.F(s.EA), ShaftCapacity: c.F(s.ShaftCapacity), TipCapacity: c.F(s.TipCapacity),
		Curve: []jCurvePoint{}, WithDepth: []jAxial{}, Notes: nonNil(s.Notes), TipCurve: s.TipCurve,
		Elements: s.Elements, Iterations: s.Iterations}
	if !s.Plunged {
		j.Settlement = opt(c.sm(s.Settlement), true)
		j.ShaftLoad, j.TipLoad = opt(c.F(s.ShaftLoad), true), opt(c.F(s.TipLoad), true)
		j.ShaftShare, j.TipShare = jn(s.ShaftShare), jn(s.TipShare)
		if s.Method != calc.SettleVesic {
			j.TipMove = opt(c.sm(s.TipMove), true)
		}
	}
	for _, p := range s.Curve {
		j.Curve = append(j.Curve, jCurvePoint{c.F(p.Load), c.sm(p.Settlement)})
	}
	for i, z := range s.Depth {
		j.WithDepth = append(j.WithDepth, jAxial{c.L(z), c.F(s.AxialLoad[i]), c.sm(s.Displacement[i])})
	}
	for _, lc := range s.LayerCurves {
		j.LayerCurves = append(j.LayerCurves, jLayerCurve(lc))
	}
	if s.Method == calc.SettleLoadTransfer {
		j.Tolerance, j.Residual = jn(s.Tolerance), jn(s.Residual)
		if !s.Plunged {
			j.ShaftMobilised, j.TipMobilised = jn(s.ShaftMobilised), jn(s.TipMobilised)
		}
	}
	if v, in := s.Vesic, s.VesicInputs; v != nil && in != nil {
		jv := &jVesic{Form: in.Form.String(), Xi: jnum(in.Xi), TipLoad: c.F(in.TipLoad), ShaftLoad: c.F(in.ShaftLoad),
			Shortening: c.sm(v.Shortening), Tip: c.sm(v.Tip), Shaft: c.sm(v.Shaft)}
		if in.Form.String() == "elastic" {
			jv.TipModulus, jv.TipPoisson = opt(c.mod(in.SoilModulus), true), jn(in.Poisson)
			jv.ShaftModulus, jv.ShaftPoisson = opt(c.mod(s.VesicShaftModulus), true), jn(s.VesicShaftPoisson)
			jv.Iwp, jv.Iws = jn(v.Iwp), jn(v.Iws)
		} else {
			jv.Cp, jv.Cs = jn(in.Cp), jn(v.Cs)
		}
		j.Vesic = jv
	}
	if g, in := s.RandolphWroth, s.RandolphWrothInput; g != nil && in != nil {
		j.RandolphWroth = &jRandolph{ShearTop: c.mod(in.ShearTop), ShearTip: c.mod(in.ShearTip), ShearBase: c.mod(in.ShearBase),
			Poisson: jnum(in.Poisson), Eta: jnum(g.Eta), Xi: jnum(g.Xi), Rho: jnum(g.Rho), Lambda: jnum(g.Lambda), Rm: c.L(g.Rm),
			Zeta: jnum(g.Zeta), MuL: jnum(g.MuL), Ratio: jnum(g.Ratio), Rigid: jnum(g.Rigid), TipShare: jnum(g.TipShare), BaseRatio: jnum(g.BaseRatio)}
	}
	return j
}

func loadTestJSON(r *calc.Result, c jconv) *jLoadTest {
	lt := r.LoadTest
	if lt == nil {
		return nil
	}
	j := &jLoadTest{Points: []jCurvePoint{}, FitFrom: lt.FitFrom, Criteria: []jCriterion{}}
	for _, p := range lt.Points {
		j.Points = append(j.Points, jCurvePoint{c.F(p.Load), c.sm(p.Settlement)})
	}
	for _, l := range lt.Limits {
		jc := jCriterion{Criterion: l.Criterion, Reached: l.Reached, Load: opt(c.F(l.Load), l.Reached),
			Settlement: opt(c.sm(l.Settlement), l.Reached && l.Settlement > 0), Note: l.Note}
		if l.C1 != 0 || l.C2 != 0 {
			jc.C1, jc.C2, jc.R2 = jn(l.C1), jn(l.C2), jn(l.R2)
		}
		j.Criteria = append(j.Criteria, jc)
	}
	return j
}
