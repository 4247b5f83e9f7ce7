package report

import (
	"bufio"
	"encoding/json"
	"math"
	"strconv"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/units"
)

// jnum is a JSON number rounded to jsonSig significant digits; NaN and
// ±Inf (which a result never holds) are written as null.
type jnum float64

func (x jnum) MarshalJSON() ([]byte, error) {
	f := float64(x)
	if math.IsNaN(f) || math.IsInf(f, 0) {
		return []byte("null"), nil
	}
	return strconv.AppendFloat(nil, roundSig(f, jsonSig), 'g', -1, 64), nil
}

// qty is a quantity in display units with its unit named alongside.
type qty struct {
	Value jnum   `json:"value"`
	Unit  string `json:"unit"`
}

type jconv struct{ conv }

func (c jconv) q(v float64, d units.Dimension) qty {
	x, u := c.sys.In(v, d)
	return qty{jnum(x), u}
}
func (c jconv) L(v units.Length) qty         { return c.q(float64(v), units.DimLength) }
func (c jconv) S(v units.Stress) qty         { return c.q(float64(v), units.DimStress) }
func (c jconv) F(v units.Force) qty          { return c.q(float64(v), units.DimForce) }
func (c jconv) G(v units.UnitWeight) qty     { return c.q(float64(v), units.DimUnitWeight) }
func (c jconv) A(v units.Area) qty           { return c.q(float64(v), units.DimArea) }
func (c jconv) Q(v units.ForcePerLength) qty { return c.q(float64(v), units.DimForcePerLength) }
func (c jconv) mod(v units.Stress) qty {
	x, u := c.modulus(v)
	return qty{jnum(x), u}
}
func (c jconv) deg(v units.Angle) qty { return qty{jnum(v.Degrees()), "deg"} }

// opt returns &q when ok, nil otherwise (omitted).
func opt(q qty, ok bool) *qty {
	if !ok {
		return nil
	}
	return &q
}

func optNumJ(x float64) *jnum {
	if x == 0 {
		return nil
	}
	v := jnum(x)
	return &v
}

type jResult struct {
	Schema    string       `json:"schema"`
	Version   string       `json:"qult_version"`
	Verify    string       `json:"verification,omitempty"`
	ID        string       `json:"id,omitempty"`
	Title     string       `json:"title"`
	Project   string       `json:"project,omitempty"`
	Revision  string       `json:"revision,omitempty"`
	Engineer  string       `json:"engineer,omitempty"`
	Date      string       `json:"date,omitempty"`
	Units     string       `json:"units"`
	Source    string       `json:"source,omitempty"`
	SHA256    string       `json:"source_sha256,omitempty"`
	Pile      jPile        `json:"pile"`
	Ground    jGround      `json:"ground"`
	Loads     jLoads       `json:"loads"`
	Segments  []jSegment   `json:"shaft_segments"`
	Lambda    *jLambda     `json:"lambda,omitempty"`
	Tip       jTip         `json:"tip"`
	Capacity  jCapacity    `json:"capacity"`
	Compared  *jCompared   `json:"methods_compared,omitempty"`
	Design    *jDesign     `json:"design"`
	Length    *jLength     `json:"required_length"`
	WithDepth []jDepthRow  `json:"capacity_with_depth"`
	Settle    *jSettle     `json:"settlement,omitempty"`
	LoadTest  *jLoadTest   `json:"load_test,omitempty"`
	Reliab    *jReliab     `json:"reliability,omitempty"`
	Group     *jGroup      `json:"group,omitempty"`
	Cands     *jCandidates `json:"candidates,omitempty"`
	Sounding  *jSounding   `json:"sounding,omitempty"`
	SPT       *jSPT        `json:"spt,omitempty"`
	Downdrag  *jDowndrag   `json:"downdrag,omitempty"`
	Warnings  []string     `json:"warnings"`
	Defaults  []defaultRow `json:"defaults"`
	Sources   []jSource    `json:"sources"`
	Cautions  []string     `json:"cautions"`
}

type jPile struct {
	Shape        string `json:"shape"`
	Size         qty    `json:"size"`
	Wall         *qty   `json:"wall,omitempty"`
	GrossArea    qty    `json:"gross_area"`
	MaterialArea qty    `json:"material_area"`
	Perimeter    qty    `json:"outer_perimeter"`
	Length       qty    `json:"length"`
	HeadDepth    qty    `json:"head_depth"`
	TipDepth     qty    `json:"tip_depth"`
	Installation string `json:"installation"`
	Plug         string `json:"plug,omitempty"`
	Modulus      *qty   `json:"youngs_modulus,omitempty"`
	UnitWeight   *qty   `json:"unit_weight,omitempty"`
}

type jGround struct {
	WaterDepth      *qty      `json:"water_depth"`
	WaterUnitWeight qty       `json:"water_unit_weight"`
	Layers          []jLayer  `json:"layers"`
	Stresses        []jStress `json:"stresses"`
	Lines           *jLines   `json:"ground_lines"`
}

type jLines struct {
	Original     qty `json:"original"`
	Excavation   qty `json:"excavation_floor"`
	GeneralScour qty `json:"general_scour"`
	Design       qty `json:"design"`
}

type jLayer struct {
	Name                string `json:"name"`
	Top                 qty    `json:"top"`
	Bottom              qty    `json:"bottom"`
	Drainage            string `json:"drainage"`
	Soil                string `json:"soil,omitempty"`
	FrictionAngle       *qty   `json:"friction_angle,omitempty"`
	Cohesion            *qty   `json:"cohesion,omitempty"`
	SuTop               *qty   `json:"su_top,omitempty"`
	SuBottom            *qty   `json:"su_bottom,omitempty"`
	UnitWeight          *qty   `json:"unit_weight,omitempty"`
	SaturatedUnitWeight *qty   `json:"saturated_unit_weight,omitempty"`
	SubmergedUnitWeight *qty   `json:"submerged_unit_weight,omitempty"`
	WeightsBasis        string `json:"weights_basis"`
	ShaftMethod         string `json:"shaft_method,omitempty"`
	TipMethod           string `json:"tip_method,omitempty"`
	Removed             qty    `json:"removed"`
}

type jStress struct {
	Depth     qty `json:"depth"`
	Total     qty `json:"total"`
	Pore      qty `json:"pore"`
	Effective qty `json:"effective"`
}

type jLoads struct {
	CompressionPermanent qty `json:"compression_permanent"`
	CompressionVariable  qty `json:"compression_variable"`
	TensionPermanent     qty `json:"tension_permanent"`
	TensionVariable      qty `json:"tension_variable"`
}

type jSegment struct {
	Top          qty      `json:"top"`
	Bottom       qty      `json:"bottom"`
	Layer        int      `json:"layer"`
	LayerName    string   `json:"layer_name"`
	Drainage     string   `json:"drainage"`
	Method       string   `json:"method"`
	Equation     string   `json:"equation"`
	SigmaTop     qty      `json:"sigma_v_top"`
	SigmaBottom  qty      `json:"sigma_v_bottom"`
	SuTop        *qty     `json:"su_top,omitempty"`
	SuBottom     *qty     `json:"su_bottom,omitempty"`
	FsTop        *qty     `json:"fs_top,omitempty"`
	FsBottom     *qty     `json:"fs_bottom,omitempty"`
	K            *jnum    `json:"k,omitempty"`
	Delta        *qty     `json:"delta,omitempty"`
	Beta         *jnum    `json:"beta,omitempty"`
	Alpha        *jnum    `json:"alpha,omitempty"`
	Integral     qty      `json:"integral"`
	Perimeter    qty      `json:"perimeter"`
	Force        qty      `json:"force"`
	Flags        []string `json:"flags"`
	NoResistance string   `json:"no_resistance,omitempty"`
}

type jLambda struct {
	Length qty  `json:"length"`
	SigmaV qty  `json:"mean_sigma_v"`
	Su     qty  `json:"mean_su"`
	Lambda jnum `json:"lambda"`
	Fav    qty  `json:"fs_average"`
}

type jTip struct {
	Depth     qty      `json:"depth"`
	Layer     int      `json:"layer"`
	LayerName string   `json:"layer_name"`
	Method    string   `json:"method"`
	Equation  string   `json:"equation"`
	Q         qty      `json:"sigma_v"`
	Phi       *qty     `json:"friction_angle,omitempty"`
	Su        *qty     `json:"su,omitempty"`
	Nq        *jnum    `json:"nq,omitempty"`
	Nc        *jnum    `json:"nc,omitempty"`
	Irr       *jnum    `json:"irr,omitempty"`
	Unlimited qty      `json:"qp_unlimited"`
	Limit     *qty     `json:"limit,omitempty"`
	Upper     *qty     `json:"qp_upper_layer,omitempty"`
	Qp        qty      `json:"qp"`
	Area      qty      `json:"area"`
	Force     qty      `json:"force"`
	Flags     []string `json:"flags"`

	N60             *jnum       `json:"n60,omitempty"`
	Ir              *jnum       `json:"ir,omitempty"`
	VesicDelta      *jnum       `json:"vesic_delta,omitempty"`
	VesicDeltaBasis string      `json:"vesic_delta_basis,omitempty"`
	Rule            string      `json:"rule,omitempty"`
	Reduction       *jnum       `json:"reduction_factor,omitempty"`
	BoredFactor     *jnum       `json:"bored_factor,omitempty"`
	LargeBaseFactor *jnum       `json:"large_base_factor,omitempty"`
	Cap             *qty        `json:"cap,omitempty"`
	SettlementBasis string      `json:"settlement_basis,omitempty"`
	MethodQp        qty         `json:"qp_method"`
	Embedment       *jEmbedment `json:"embedment,omitempty"`
	WeakLayer       *jWeak      `json:"weak_layer,omitempty"`
	Cone            *jCone      `json:"cone,omitempty"`
	MethodFlags     []string    `json:"method_flags"`
	Steps           []string    `json:"worked_equations"`
}

// jCone is what a direct CPT tip method averaged about the tip.
type jCone struct {
	Top    qty  `json:"zone_top"`
	Bottom qty  `json:"zone_bottom"`
	Q      qty  `json:"cone_resistance"`
	Factor jnum `json:"factor"`
	Below  *qty `json:"qc_below,omitempty"`
	Above  *qty `json:"qc_above,omitempty"`
	Raw    *qty `json:"mean_before_clipping,omitempty"`
}

type jEmbedment struct {
	Lb             qty  `json:"lb"`
	CriticalLength qty  `json:"critical_length"`
	CriticalRatio  jnum `json:"critical_ratio"`
	Factor         jnum `json:"factor"`
}

type jWeak struct {
	Layer     int    `json:"layer"`
	LayerName string `json:"layer_name"`
	QStrong   qty    `json:"q_strong"`
	QWeak     qty    `json:"q_weak"`
	H         qty    `json:"h"`
	Zone      qty    `json:"zone"`
	Qp        qty    `json:"qp"`
}

type jCapacity struct {
	Tip          qty      `json:"tip"`
	Shaft        qty      `json:"shaft"`
	Weight       qty      `json:"weight"`
	Compression  qty      `json:"compression"`
	TensionShaft qty      `json:"tension_shaft"`
	Tension      qty      `json:"tension"`
	Plugged      bool     `json:"plugged"`
	Flags        []string `json:"flags"`
}

type jCase struct {
	Case           string `json:"case"`
	CompressionEd  qty    `json:"compression_ed"`
	CompressionRd  qty    `json:"compression_rd"`
	CompressionUse jnum   `json:"compression_utilisation"`
	TensionEd      qty    `json:"tension_ed"`
	TensionRd      qty    `json:"tension_rd"`
	TensionUse     jnum   `json:"tension_utilisation"`
	Pass           bool   `json:"pass"`
}

type jDesign struct {
	Basis     string  `json:"basis"`
	Governing string  `json:"governing_case"`
	MaxUse    jnum    `json:"max_utilisation"`
	Pass      bool    `json:"pass"`
	Cases     []jCase `json:"cases"`
}

type jLength struct {
	Found    bool   `json:"found"`
	TipDepth *qty   `json:"tip_depth,omitempty"`
	Length   *qty   `json:"length,omitempty"`
	Governs  string `json:"governs,omitempty"`
	Use      *jnum  `json:"utilisation,omitempty"`

	Step         qty      `json:"step"`
	MaxTip       qty      `json:"max_tip"`
	Passing      []jRange `json:"passing"`
	BestTipDepth qty      `json:"best_tip_depth"`
	BestUse      jnum     `json:"best_utilisation"`
	BestGoverns  string   `json:"best_governs,omitempty"`
	NotFound     string   `json:"not_found,omitempty"`
	Warnings     []string `json:"warnings"`
}

type jRange struct {
	From qty `json:"from"`
	To   qty `json:"to"`
}

type jDepthRow struct {
	TipDepth          qty      `json:"tip_depth"`
	UnitTip           qty      `json:"qp"`
	Tip               qty      `json:"tip"`
	Shaft             qty      `json:"shaft"`
	Weight            qty      `json:"weight"`
	Compression       qty      `json:"compression"`
	Tension           qty      `json:"tension"`
	DesignCompression *qty     `json:"design_compression,omitempty"`
	TipRules          []string `json:"tip_rules"`
}

type jSource struct {
	Key         string `json:"key"`
	Authors     string `json:"authors"`
	Year        int    `json:"year"`
	Title       string `json:"title"`
	Publication string `json:"publication,omitempty"`
	Citation    string `json:"citation"`
}

func flagList(f pile.Flags) []string {
	m := f.Messages()
	if m == nil {
		m = []string{}
	}
	return m
}

func nonNil(s []string) []string {
	if s == nil {
		return []string{}
	}
	return s
}

// toJSON builds the JSON document of r.
func toJSON(r *calc.Result, o Options) *jResult {
	c := jconv{conv{o.sys}}
	schema := r.Schema
	if schema == "" {
		schema = calc.ResultSchema
	}
	j := &jResult{Schema: schema, Version: r.Version, Verify: o.Verification, ID: r.ID, Title: r.Title, Project: r.Project, Revision: r.Revision,
		Engineer: r.Engineer, Date: date(r, o), Units: o.sys.String(), Source: string(r.Source), SHA256: SourceHash(r),
		Warnings: nonNil(allWarnings(r, c.conv)), Defaults: defaultRows(r, c.conv), Cautions: nonNil(r.Cautions), Sources: []jSource{}, WithDepth: []jDepthRow{}, Segments: []jSegment{}}
	j.Compared = compareJSON(r.Compared, c)
	p := r.Pile
	s := p.Section
	j.Pile = jPile{Shape: s.Shape.String(), Size: c.L(s.Size()), Wall: opt(c.L(s.Wall), s.Wall > 0),
		GrossArea: c.A(s.GrossArea()), MaterialArea: c.A(s.MaterialArea()), Perimeter: c.L(s.OuterPerimeter()),
		Length: c.L(p.Length), HeadDepth: c.L(p.HeadDepth), TipDepth: c.L(p.Tip()), Installation: p.Installation.String(),
		Modulus: opt(c.mod(p.Modulus), p.Modulus > 0), UnitWeight: opt(c.G(p.UnitWeight), p.UnitWeight > 0)}
	if s.CanPlug() {
		j.Pile.Plug = p.Plug.String()
	}
	if r.Ground != nil {
		zw, wet := r.Ground.WaterDepth()
		j.Ground.WaterDepth = opt(c.L(zw), wet)
		j.Ground.WaterUnitWeight = c.G(r.Ground.WaterUnitWeight())
		gl := r.Ground.GroundLines()
		j.Ground.Lines = &jLines{c.L(gl.Original), c.L(gl.Excavation), c.L(gl.GeneralScour), c.L(gl.Design)}
	}
	j.Ground.Layers = []jLayer{}
	for i, l := range r.Layers {
		jl := jLayer{Name: l.Name, Top: c.L(l.Top), Bottom: c.L(l.Bottom), Drainage: l.Drainage.String(), Soil: l.Soil.String(),
			FrictionAngle: opt(c.deg(l.Phi), l.Phi > 0), Cohesion: opt(c.S(l.Cohesion), l.Cohesion > 0),
			SuTop: opt(c.S(l.SuTop), l.HasSu), SuBottom: opt(c.S(l.SuBottom), l.HasSu),
			UnitWeight: opt(c.G(l.UnitWeight), l.UnitWeight > 0), SaturatedUnitWeight: opt(c.G(l.SaturatedUnitWeight), l.SaturatedUnitWeight > 0),
			SubmergedUnitWeight: opt(c.G(l.SubmergedUnitWeight), l.SaturatedUnitWeight > 0), WeightsBasis: l.Basis.String(),
			Removed: c.L(l.Removed)}
		if i < len(r.Methods) {
			jl.ShaftMethod, jl.TipMethod = r.Methods[i].Shaft, r.Methods[i].Tip
		}
		j.Ground.Layers = append(j.Ground.Layers, jl)
	}
	j.Ground.Stresses = []jStress{}
	for _, st := range r.Stresses {
		j.Ground.Stresses = append(j.Ground.Stresses, jStress{c.L(st.Depth), c.S(st.Total), c.S(st.Pore), c.S(st.Effective)})
	}
	l := r.Loads
	j.Loads = jLoads{c.F(l.Compression.Permanent), c.F(l.Compression.Variable), c.F(l.Tension.Permanent), c.F(l.Tension.Variable)}
	b := r.Breakdown
	for _, w := range b.Rows {
		hasSu := w.SuTop > 0 || w.SuBottom > 0
		fsOK := w.Method != "none" && w.Method != "lambda"
		a := w.At[0]
		seg := jSegment{Top: c.L(w.Top), Bottom: c.L(w.Bottom), Layer: w.Layer, LayerName: w.LayerName, Drainage: w.Drainage.String(),
			Method: w.Method, Equation: w.Equation, SigmaTop: c.S(w.SigmaTop), SigmaBottom: c.S(w.SigmaBottom),
			SuTop: opt(c.S(w.SuTop), hasSu), SuBottom: opt(c.S(w.SuBottom), hasSu),
			FsTop: opt(c.S(w.At[0].Fs), fsOK), FsBottom: opt(c.S(w.At[1].Fs), fsOK),
			K: optNumJ(a.K), Delta: opt(c.deg(a.Delta), a.Delta > 0), Beta: optNumJ(a.Beta), Alpha: optNumJ(a.Alpha),
			Integral: c.Q(w.Integral), Perimeter: c.L(w.Perimeter), Force: c.F(w.Force), Flags: flagList(w.Flags)}
		if w.Method == "none" {
			seg.NoResistance = noShaftReason(r, w)
		}
		j.Segments = append(j.Segments, seg)
	}
	if b.Lambda != nil {
		j.Lambda = &jLambda{c.L(b.Lambda.Length), c.S(b.Lambda.SigmaV), c.S(b.Lambda.Su), jnum(b.Lambda.Lambda), c.S(b.Lambda.Fav)}
	}
	t := b.Tip
	j.Tip = jTip{Depth: c.L(t.Depth), Layer: t.Layer, LayerName: t.LayerName, Method: t.Method, Equation: t.Equation,
		Q: c.S(t.Input.Q), Phi: opt(c.deg(t.Input.Phi), t.Input.Phi > 0), Su: opt(c.S(t.Input.Su), t.Input.Su > 0),
		Nq: optNumJ(t.Result.Nq), Nc: optNumJ(t.Result.Nc), Irr: optNumJ(t.Result.Irr), Unlimited: c.S(t.Result.Unlimited),
		Limit: opt(c.S(t.Result.Limit), t.Result.Limit > 0), Upper: opt(c.S(t.Upper), t.Upper > 0),
		Qp: c.S(t.Qp), Area: c.A(t.Area), Force: c.F(t.Force), Flags: flagList(t.Flags),
		N60: optNumJ(t.Input.N60), Ir: optNumJ(t.Result.Ir), Rule: t.Result.Rule, Reduction: optNumJ(t.Result.Reduction),
		Cap: opt(c.S(t.Result.Cap), t.Result.Cap > 0), SettlementBasis: settlementBasis(t), MethodQp: c.S(t.Own),
		MethodFlags: nonNil(bearingNotes(t.Result.Flags)), Steps: nonNil(tipSteps(r, c.conv))}
	if t.Result.Ir > 0 {
		j.Tip.VesicDeltaBasis = t.Result.DeltaBy.String()
		if t.Result.DeltaBy == bearing.DeltaGiven || t.Result.DeltaBy == bearing.DeltaCorrelation {
			d := jnum(t.Result.Delta)
			j.Tip.VesicDelta = &d
		}
	}
	if t.Result.Reduction > 0 {
		j.Tip.BoredFactor, j.Tip.LargeBaseFactor = optNumJ(boredFactor(t)), optNumJ(largeBaseFactor(t))
	}
	if t.Flags&pile.EmbedmentRamp != 0 {
		j.Tip.Embedment = &jEmbedment{Lb: c.L(embedment(r)), CriticalLength: c.L(t.EmbedLength), Factor: jnum(t.EmbedFactor)}
		if d := r.Pile.Section.Size(); d > 0 {
			j.Tip.Embedment.CriticalRatio = jnum(float64(t.EmbedLength / d))
		}
	}
	if cn := t.Result.Cone; cn.Q > 0 {
		j.Tip.Cone = &jCone{Top: c.L(cn.Top), Bottom: c.L(cn.Bottom), Q: c.S(cn.Q), Factor: jnum(cn.Factor),
			Below: opt(c.S(cn.Below), cn.Below > 0), Above: opt(c.S(cn.Above), cn.Above > 0), Raw: opt(c.S(cn.Raw), cn.Raw > 0)}
	}
	if t.WeakLayer >= 0 {
		name := ""
		if t.WeakLayer < len(r.Layers) {
			name = r.Layers[t.WeakLayer].Name
		}
		v := t.Weak + (t.Strong-t.Weak)*units.Stress(float64(t.H)/float64(t.WeakZone))
		j.Tip.WeakLayer = &jWeak{t.WeakLayer, name, c.S(t.Strong), c.S(t.Weak), c.L(t.H), c.L(t.WeakZone), c.S(v)}
	}
	k := b.Capacity
	j.Capacity = jCapacity{c.F(k.Tip), c.F(k.Shaft), c.F(k.Weight), c.F(k.Compression), c.F(k.TensionShaft), c.F(k.Tension), k.Plugged, flagList(k.Flags)}
	if d := r.Design; d != nil {
		jd := &jDesign{Basis: d.Basis, MaxUse: jnum(d.MaxUse()), Pass: d.Pass, Cases: []jCase{}}
		if d.Governing >= 0 && d.Governing < len(d.Cases) {
			jd.Governing = d.Cases[d.Governing].Case
		}
		for _, v := range d.Cases {
			jd.Cases = append(jd.Cases, jCase{v.Case, c.F(v.CompressionEd), c.F(v.CompressionRd), jnum(v.CompressionUse),
				c.F(v.TensionEd), c.F(v.TensionRd), jnum(v.TensionUse), v.Pass})
		}
		j.Design = jd
	}
	if ln := r.Length; ln != nil {
		jl := &jLength{Found: ln.Found, Step: c.L(ln.Step), MaxTip: c.L(ln.MaxTip), Passing: []jRange{},
			BestTipDepth: c.L(ln.BestTipDepth), BestUse: jnum(ln.BestUse), BestGoverns: ln.BestGoverns, Warnings: []string{}}
		for _, p := range ln.Passing {
			jl.Passing = append(jl.Passing, jRange{c.L(p.From), c.L(p.To)})
		}
		nf := ln.NotFound()
		if nf != "" {
			jl.NotFound = notFound(*ln, c.conv)
		}
		for _, w := range ln.Warnings {
			if nf != "" && w == nf {
				w = jl.NotFound
			}
			jl.Warnings = append(jl.Warnings, w)
		}
		if ln.Found {
			u := jnum(ln.Use)
			tip, length := c.L(ln.TipDepth), c.L(ln.Length)
			jl.TipDepth, jl.Length, jl.Governs, jl.Use = &tip, &length, ln.Governs, &u
		}
		j.Length = jl
	}
	des := len(r.DesignWithDepth) == len(r.WithDepth)
	for i, w := range r.WithDepth {
		row := jDepthRow{c.L(w.TipDepth), c.S(w.UnitTip), c.F(w.Tip), c.F(w.Shaft), c.F(w.Weight), c.F(w.Compression), c.F(w.Tension), nil,
			nonNil(tipRuleNames(w.Flags))}
		if des {
			q := c.F(r.DesignWithDepth[i])
			row.DesignCompression = &q
		}
		j.WithDepth = append(j.WithDepth, row)
	}
	for _, s := range sources(r) {
		j.Sources = append(j.Sources, jSource{s.Key, s.Authors, s.Year, s.Title, s.Publication, s.String()})
	}
	j.Settle, j.LoadTest = settleJSON(r, c), loadTestJSON(r, c)
	j.Reliab = reliabilityJSON(r, c)
	j.Group = groupJSON(r, c)
	j.Cands = candidatesJSON(r, c)
	j.Sounding = soundingJSON(r, c)
	j.SPT = sptJSON(r, c)
	j.Downdrag = downdragJSON(r, c)
	return j
}

func writeJSON(b *bufio.Writer, r *calc.Result, o Options) error {
	e := json.NewEncoder(b)
	e.SetIndent("", "  ")
	return e.Encode(toJSON(r, o))
}

type jCompared struct {
	Shaft []jCompareGroup `json:"shaft"`
	Tip   []jCompareGroup `json:"tip"`
}

type jCompareGroup struct {
	Drainage string        `json:"drainage"`
	Layers   []string      `json:"layers"`
	Methods  []jCompareRow `json:"methods"`
	Least    *qty          `json:"least,omitempty"`
	Greatest *qty          `json:"greatest,omitempty"`
}

type jCompareRow struct {
	Method     string `json:"method"`
	Equation   string `json:"equation"`
	Force      *qty   `json:"force,omitempty"`
	Total      *qty   `json:"total,omitempty"`
	Chosen     bool   `json:"chosen"`
	NotApplied string `json:"not_applied,omitempty"`
}

func compareJSON(cm *calc.Comparison, c jconv) *jCompared {
	if cm == nil {
		return nil
	}
	groups := func(gs []calc.CompareGroup) []jCompareGroup {
		out := []jCompareGroup{}
		for _, g := range gs {
			jg := jCompareGroup{Drainage: g.Drainage, Layers: nonNil(g.Layers), Methods: []jCompareRow{}}
			if lo, hi, n := g.Spread(); n > 0 {
				jg.Least, jg.Greatest = opt(c.F(lo), true), opt(c.F(hi), true)
			}
			for _, r := range g.Rows {
				ok := r.NotApplied == ""
				jg.Methods = append(jg.Methods, jCompareRow{Method: r.Method, Equation: r.Equation, Force: opt(c.F(r.Force), ok),
					Total: opt(c.F(r.Total), ok), Chosen: r.Chosen, NotApplied: r.NotApplied})
			}
			out = append(out, jg)
		}
		return out
	}
	return &jCompared{Shaft: groups(cm.Shaft), Tip: groups(cm.Tip)}
}
