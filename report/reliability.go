package report

import (
	"bytes"
	"fmt"
	"image/color"
	"math"
	"strings"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/reliability"
	"github.com/qultgeo/qult/units"
	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgsvg"
)

const headReliability = "Probabilistic capacity"

// pv converts a parameter's SI value for display: its unit's value and
// symbol ("" for a plain number).
func (c conv) pv(v float64, d units.Dimension) (float64, string) {
	if d == 0 {
		return v, ""
	}
	return c.in(v, d), c.u(d)
}

// pcell is a parameter value for a table: blank for an infinite bound.
func (c conv) pcell(v float64, d units.Dimension) cell {
	if math.IsInf(v, 0) || math.IsNaN(v) {
		return txt("")
	}
	x, _ := c.pv(v, d)
	return num(x)
}

// secReliability is the reliability section: the parameters, the Monte
// Carlo and FOSM estimates side by side, and the sensitivity ranking.
func secReliability(r *calc.Result, c conv) section {
	rr := r.Reliability
	if rr == nil || rr.MonteCarlo == nil || rr.FOSM == nil {
		return section{}
	}
	fo := rr.FOSM
	how := "the full analysis of every sample (profile, methods and rules as in the deterministic calculation)"
	if rr.ClosedForm {
		how = "closed form (every layer along the pile with a factor given, no rule of the tip zone in play; checked against the full analysis at the values of the calculation)"
	}
	items := []item{
		{"Samples", num(float64(rr.Samples)), ""},
		{"Seed", txt(fmt.Sprint(rr.Seed)), ""},
		{"Workers", num(float64(rr.Workers)), ""},
		{"Each sample computed by", txt(how), ""},
	}
	blocks := []block{{items: items},
		{para: fmt.Sprintf("Monte Carlo: parameters drawn from their distributions (correlated through a Gaussian copula), the compression and tension capacity of the pile computed for each sample; the result is the same for a given seed whatever the number of workers. FOSM: the capacity and its central-difference gradient (step %g standard deviations) at the parameters' means, σR² = Σ Σ (∂R/∂xi)(∂R/∂xj)·ρij·σi·σj. Reliability index β = (μR − Q)/σR; βpf = −Φ⁻¹(pf) from the fraction pf of samples below the load. A sample outside a method's range stops the run: none is clamped or dropped.", reliability.FOSMStep)}}
	pt := &table{cols: []column{{"Parameter", ""}, {"Distribution", ""}, {"Mean", ""}, {"SD", ""}, {"Lower", ""}, {"Upper", ""}, {"Calculation value", ""}, {"Unit", ""}}}
	for _, p := range rr.Params {
		_, u := c.pv(0, p.Dim)
		if p.Dim == units.DimAngle {
			u = "deg"
		}
		pt.rows = append(pt.rows, []cell{txt(p.Name), txt(p.Distribution), c.pcell(p.Mean, p.Dim), c.pcell(p.SD, p.Dim),
			c.pcell(p.Lower, p.Dim), c.pcell(p.Upper, p.Dim), c.pcell(p.Base, p.Dim), txt(u)})
	}
	blocks = append(blocks, block{tbl: pt})
	if len(rr.Correlations) > 0 {
		ct := &table{cols: []column{{"Parameter", ""}, {"With", ""}, {"ρ", ""}}}
		for _, k := range rr.Correlations {
			ct.rows = append(ct.rows, []cell{txt(k.A), txt(k.B), num(k.Rho)})
		}
		blocks = append(blocks, block{tbl: ct})
	}
	blocks = append(blocks, block{tbl: reliabilityTable(rr, c)})
	st := &table{cols: []column{{"Rank", ""}, {"Parameter", ""}, {"ΔRc per σ", c.uF()}, {"Share of σ²Rc", ""}, {"ΔRt per σ", c.uF()}, {"Share of σ²Rt", ""}}}
	tens := map[string]reliability.Sensitivity{}
	for _, s := range fo.Tension.Ranking {
		tens[s.Param] = s
	}
	for i, s := range fo.Compression.Ranking {
		t := tens[s.Param]
		st.rows = append(st.rows, []cell{num(float64(i + 1)), txt(s.Param), num(c.F(units.Force(s.PerSD))), num(s.Share),
			num(c.F(units.Force(t.PerSD))), num(t.Share)})
	}
	blocks = append(blocks, block{para: "Sensitivity (FOSM), ranked by the change of the compression capacity for one standard deviation of each parameter:"}, block{tbl: st})
	return section{heading: headReliability, blocks: blocks}
}

// reliabilityTable is the summary table: Monte Carlo and FOSM for
// compression and tension.
func reliabilityTable(rr *calc.ReliabilityResult, c conv) *table {
	mc, fo := rr.MonteCarlo, rr.FOSM
	t := &table{cols: []column{{"Quantity", ""}, {"Rc Monte Carlo", ""}, {"Rc FOSM", ""}, {"Rt Monte Carlo", ""}, {"Rt FOSM", ""}, {"Unit", ""}}}
	f := func(v float64) cell { return num(c.F(units.Force(v))) }
	blank := txt("")
	opt := func(v float64, ok bool) cell {
		if !ok {
			return txt("not defined")
		}
		return num(v)
	}
	row := func(name string, a, b, cc, d cell, unit string) {
		t.rows = append(t.rows, []cell{txt(name), a, b, cc, d, txt(unit)})
	}
	mcC, mcT := mc.Compression, mc.Tension
	foC, foT := fo.Compression, fo.Tension
	row("Deterministic (values of the calculation)", f(rr.Deterministic.Compression), blank, f(rr.Deterministic.Tension), blank, c.uF())
	row("Mean μR", f(mcC.Mean), f(foC.Mean), f(mcT.Mean), f(foT.Mean), c.uF())
	row("Standard deviation σR", f(mcC.SD), f(foC.SD), f(mcT.SD), f(foT.SD), c.uF())
	row("Coefficient of variation", num(mcC.CoV), num(foC.CoV), num(mcT.CoV), num(foT.CoV), "")
	row("5 % percentile", f(mcC.P5), blank, f(mcT.P5), blank, c.uF())
	row("50 % percentile (median)", f(mcC.P50), blank, f(mcT.P50), blank, c.uF())
	row("95 % percentile", f(mcC.P95), blank, f(mcT.P95), blank, c.uF())
	loadC, loadT := blank, blank
	if mcC.HasLoad {
		loadC = f(mcC.Load)
	}
	if mcT.HasLoad {
		loadT = f(mcT.Load)
	}
	row("Load Q", loadC, loadC, loadT, loadT, c.uF())
	pf := func(s reliability.Summary) cell {
		if !s.HasLoad {
			return blank
		}
		return num(s.PBelow)
	}
	row("Probability R < Q", pf(mcC), blank, pf(mcT), blank, "")
	se := func(s reliability.Summary) cell {
		if !s.HasLoad {
			return blank
		}
		return num(s.PBelowSE)
	}
	row("its sampling error", se(mcC), blank, se(mcT), blank, "")
	bt := func(ok, has bool, v float64) cell {
		if !has {
			return blank
		}
		return opt(v, ok)
	}
	row("Reliability index β = (μR − Q)/σR", bt(mcC.BetaDefined, mcC.HasLoad, mcC.Beta), bt(foC.BetaDefined, foC.HasLoad, foC.Beta),
		bt(mcT.BetaDefined, mcT.HasLoad, mcT.Beta), bt(foT.BetaDefined, foT.HasLoad, foT.Beta), "")
	row("βpf = −Φ⁻¹(pf)", bt(mcC.BetaPfDefined, mcC.HasLoad, mcC.BetaPf), blank, bt(mcT.BetaPfDefined, mcT.HasLoad, mcT.BetaPf), blank, "")
	return t
}

// reliabilityFigures adds the histogram, the distribution function and the
// sensitivity chart to the reliability section of an HTML document.
func reliabilityFigures(s *section, r *calc.Result, c conv) error {
	rr := r.Reliability
	if s.heading != headReliability || rr == nil || rr.MonteCarlo == nil {
		return nil
	}
	h, err := histogramSVG(rr, c)
	if err != nil {
		return err
	}
	s.blocks = append(s.blocks, block{svg: h, fig: "Histogram of the sampled compression (blue) and tension (red) capacity; the dashed lines are the loads."})
	g, err := cdfSVG(rr, c)
	if err != nil {
		return err
	}
	s.blocks = append(s.blocks, block{svg: g, fig: "Empirical distribution function of the sampled capacities, with the 5, 50 and 95 % percentiles marked."})
	k, err := sensitivitySVG(rr, c)
	if err != nil {
		return err
	}
	s.blocks = append(s.blocks, block{svg: k, fig: "Sensitivity (FOSM): change of the compression capacity for one standard deviation of each parameter."})
	return nil
}

func plotSVG(p *plot.Plot, w, h vg.Length) (string, error) {
	cv := vgsvg.New(w, h)
	p.Draw(draw.New(cv))
	var buf bytes.Buffer
	if _, err := cv.WriteTo(&buf); err != nil {
		return "", err
	}
	s := buf.String()
	if i := strings.Index(s, "<svg"); i >= 0 {
		s = s[i:]
	}
	return strings.TrimSpace(s), nil
}

func histogramSVG(rr *calc.ReliabilityResult, c conv) (string, error) {
	p := plot.New()
	p.Title.Text = "Sampled capacity"
	p.X.Label.Text = "capacity (" + c.uF() + ")"
	p.Y.Label.Text = "samples"
	p.Add(plotter.NewGrid())
	for i, s := range []reliability.Summary{rr.MonteCarlo.Compression, rr.MonteCarlo.Tension} {
		col := blue
		name := "compression"
		if i == 1 {
			col, name = red, "tension"
		}
		var bins []plotter.HistogramBin
		for _, b := range s.Histogram {
			bins = append(bins, plotter.HistogramBin{Min: c.F(units.Force(b.From)), Max: c.F(units.Force(b.To)), Weight: float64(b.Count)})
		}
		if len(bins) == 0 {
			continue
		}
		fill := color.NRGBA{R: col.R, G: col.G, B: col.B, A: 0x80}
		h := &plotter.Histogram{Bins: bins, Width: bins[0].Max - bins[0].Min, FillColor: fill}
		h.LineStyle.Color = col
		h.LineStyle.Width = vg.Points(0.5)
		p.Add(h)
		p.Legend.Add(name, h)
		if s.HasLoad {
			max := 0.0
			for _, b := range bins {
				max = math.Max(max, b.Weight)
			}
			l, err := plotter.NewLine(plotter.XYs{{X: c.F(units.Force(s.Load)), Y: 0}, {X: c.F(units.Force(s.Load)), Y: max}})
			if err != nil {
				return "", err
			}
			l.LineStyle.Color = col
			l.LineStyle.Dashes = []vg.Length{vg.Points(4), vg.Points(3)}
			p.Add(l)
		}
	}
	p.Legend.Top = true
	return plotSVG(p, 6*vg.Inch, 3.6*vg.Inch)
}

func cdfSVG(rr *calc.ReliabilityResult, c conv) (string, error) {
	p := plot.New()
	p.Title.Text = "Distribution function"
	p.X.Label.Text = "capacity (" + c.uF() + ")"
	p.Y.Label.Text = "fraction of samples at or below"
	p.Y.Min, p.Y.Max = 0, 1
	p.Add(plotter.NewGrid())
	for i, s := range []reliability.Summary{rr.MonteCarlo.Compression, rr.MonteCarlo.Tension} {
		col := blue
		name := "compression"
		if i == 1 {
			col, name = red, "tension"
		}
		var xy plotter.XYs
		for _, q := range s.CDF {
			xy = append(xy, plotter.XY{X: c.F(units.Force(q.Value)), Y: q.P})
		}
		l, err := plotter.NewLine(xy)
		if err != nil {
			return "", err
		}
		l.LineStyle.Color = col
		l.LineStyle.Width = vg.Points(1.5)
		p.Add(l)
		p.Legend.Add(name, l)
		pts, err := plotter.NewScatter(plotter.XYs{{X: c.F(units.Force(s.P5)), Y: 0.05}, {X: c.F(units.Force(s.P50)), Y: 0.5}, {X: c.F(units.Force(s.P95)), Y: 0.95}})
		if err != nil {
			return "", err
		}
		pts.GlyphStyle.Color = col
		pts.GlyphStyle.Radius = vg.Points(3)
		p.Add(pts)
	}
	p.Legend.Top = false
	p.Legend.Left = false
	return plotSVG(p, 6*vg.Inch, 3.6*vg.Inch)
}

func sensitivitySVG(rr *calc.ReliabilityResult, c conv) (string, error) {
	rk := rr.FOSM.Compression.Ranking
	n := len(rk)
	vals := make(plotter.Values, n)
	names := make([]string, n)
	for i, s := range rk {
		// The largest at the top: plotted from the bottom up.
		vals[n-1-i] = math.Abs(c.F(units.Force(s.PerSD)))
		names[n-1-i] = truncate(s.Param, 40)
	}
	p := plot.New()
	p.Title.Text = "Sensitivity of the compression capacity"
	p.X.Label.Text = "|ΔRc| for one standard deviation (" + c.uF() + ")"
	b, err := plotter.NewBarChart(vals, vg.Points(12))
	if err != nil {
		return "", err
	}
	b.Horizontal = true
	b.Color = blue
	b.LineStyle.Width = 0
	p.Add(b)
	p.NominalY(names...)
	return plotSVG(p, 6*vg.Inch, vg.Length(max(1.6, 0.3*float64(n)+1))*vg.Inch)
}

// The JSON form of the reliability section (see JSON.md).
type jReliab struct {
	Samples      int            `json:"samples"`
	Seed         uint64         `json:"seed"`
	Workers      int            `json:"workers"`
	ClosedForm   bool           `json:"closed_form"`
	FOSMStep     jnum           `json:"fosm_step"`
	Parameters   []jRelParam    `json:"parameters"`
	Correlations []jCorrelation `json:"correlations"`
	Compression  jRelCapacity   `json:"compression"`
	Tension      jRelCapacity   `json:"tension"`
	Notes        []string       `json:"notes"`
}

type jRelParam struct {
	Name         string `json:"name"`
	Layer        string `json:"layer,omitempty"`
	Key          string `json:"key"`
	Distribution string `json:"distribution"`
	// Mean, SD, Lower, Upper, Calculation: a quantity with its unit, or
	// a plain number for a dimensionless key; an absent bound is null.
	Mean        any `json:"mean"`
	SD          any `json:"sd"`
	Lower       any `json:"lower"`
	Upper       any `json:"upper"`
	Calculation any `json:"calculation_value"`
}

type jCorrelation struct {
	A   string `json:"a"`
	B   string `json:"b"`
	Rho jnum   `json:"rho"`
}

type jRelCapacity struct {
	Deterministic qty             `json:"deterministic"`
	MonteCarlo    *jRelMonteCarlo `json:"monte_carlo"`
	FOSM          *jRelFOSM       `json:"fosm"`
}

type jRelMonteCarlo struct {
	Mean      qty      `json:"mean"`
	SD        qty      `json:"sd"`
	CoV       jnum     `json:"cov"`
	P5        qty      `json:"p5"`
	P50       qty      `json:"p50"`
	P95       qty      `json:"p95"`
	Min       qty      `json:"min"`
	Max       qty      `json:"max"`
	SEMean    qty      `json:"se_mean"`
	SESD      qty      `json:"se_sd"`
	Load      *qty     `json:"load"`
	PBelow    *jnum    `json:"p_below"`
	PBelowSE  *jnum    `json:"p_below_se"`
	Beta      *jnum    `json:"beta"`
	BetaPf    *jnum    `json:"beta_pf"`
	Histogram []jBin   `json:"histogram"`
	CDF       []jQuant `json:"cdf"`
}

type jBin struct {
	From  qty `json:"from"`
	To    qty `json:"to"`
	Count int `json:"count"`
}

type jQuant struct {
	P        jnum `json:"p"`
	Capacity qty  `json:"capacity"`
}

type jRelFOSM struct {
	Mean        qty            `json:"mean"`
	SD          qty            `json:"sd"`
	CoV         jnum           `json:"cov"`
	Load        *qty           `json:"load"`
	Beta        *jnum          `json:"beta"`
	Sensitivity []jSensitivity `json:"sensitivity"`
}

type jSensitivity struct {
	Parameter string `json:"parameter"`
	PerSD     qty    `json:"per_sd"`
	Share     jnum   `json:"share"`
}

// pq is a parameter value: a quantity, or a plain number.
func (c jconv) pq(v float64, d units.Dimension) any {
	if d == 0 {
		return jnum(v)
	}
	return c.q(v, d)
}

func reliabilityJSON(r *calc.Result, c jconv) *jReliab {
	rr := r.Reliability
	if rr == nil || rr.MonteCarlo == nil || rr.FOSM == nil {
		return nil
	}
	j := &jReliab{Samples: rr.Samples, Seed: rr.Seed, Workers: rr.Workers, ClosedForm: rr.ClosedForm, FOSMStep: jnum(rr.FOSM.Step),
		Parameters: []jRelParam{}, Correlations: []jCorrelation{},
		Notes: []string{"β = (μR − Q)/σR; beta_pf = −Φ⁻¹(p_below); null where not defined (σR = 0, no load, or p_below 0 or 1)."}}
	for _, p := range rr.Params {
		jp := jRelParam{Name: p.Name, Layer: p.Layer, Key: p.Key, Distribution: p.Distribution,
			Mean: c.pq(p.Mean, p.Dim), SD: c.pq(p.SD, p.Dim), Calculation: c.pq(p.Base, p.Dim)}
		if !math.IsInf(p.Lower, 0) {
			jp.Lower = c.pq(p.Lower, p.Dim)
		}
		if !math.IsInf(p.Upper, 0) {
			jp.Upper = c.pq(p.Upper, p.Dim)
		}
		j.Parameters = append(j.Parameters, jp)
	}
	for _, k := range rr.Correlations {
		j.Correlations = append(j.Correlations, jCorrelation{k.A, k.B, jnum(k.Rho)})
	}
	f := func(v float64) qty { return c.F(units.Force(v)) }
	mc := func(s reliability.Summary) *jRelMonteCarlo {
		m := &jRelMonteCarlo{Mean: f(s.Mean), SD: f(s.SD), CoV: jnum(s.CoV), P5: f(s.P5), P50: f(s.P50), P95: f(s.P95),
			Min: f(s.Min), Max: f(s.Max), SEMean: f(s.SEMean), SESD: f(s.SESD), Histogram: []jBin{}, CDF: []jQuant{}}
		if s.HasLoad {
			l := f(s.Load)
			m.Load, m.PBelow, m.PBelowSE = &l, jn(s.PBelow), jn(s.PBelowSE)
			if s.BetaDefined {
				m.Beta = jn(s.Beta)
			}
			if s.BetaPfDefined {
				m.BetaPf = jn(s.BetaPf)
			}
		}
		for _, b := range s.Histogram {
			m.Histogram = append(m.Histogram, jBin{f(b.From), f(b.To), b.Count})
		}
		for _, q := range s.CDF {
			m.CDF = append(m.CDF, jQuant{jnum(q.P), f(q.Value)})
		}
		return m
	}
	fosm := func(e reliability.FOSMEstimate) *jRelFOSM {
		o := &jRelFOSM{Mean: f(e.Mean), SD: f(e.SD), CoV: jnum(e.CoV), Sensitivity: []jSensitivity{}}
		if e.HasLoad {
			l := f(e.Load)
			o.Load = &l
			if e.BetaDefined {
				o.Beta = jn(e.Beta)
			}
		}
		for _, s := range e.Ranking {
			o.Sensitivity = append(o.Sensitivity, jSensitivity{s.Param, f(s.PerSD), jnum(s.Share)})
		}
		return o
	}
	j.Compression = jRelCapacity{f(rr.Deterministic.Compression), mc(rr.MonteCarlo.Compression), fosm(rr.FOSM.Compression)}
	j.Tension = jRelCapacity{f(rr.Deterministic.Tension), mc(rr.MonteCarlo.Tension), fosm(rr.FOSM.Tension)}
	return j
}

// truncate shortens s to n runes, the last an ellipsis, for an axis label.
func truncate(s string, n int) string {
	r := []rune(s)
	if len(r) <= n {
		return s
	}
	return string(r[:n-1]) + "…"
}
