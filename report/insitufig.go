package report

import (
	"image/color"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/units"
)

// The plots of the in-situ records: the cone sounding (qt, fs and Ic with
// depth, with Robertson's zone boundaries on Ic) and the SPTs (N60 and
// (N1)60 with depth, with each layer's own n60). Every panel of a figure
// shares one depth axis, from the ground surface to below the deeper of
// the last record and the pile tip, so that the panels and the two
// figures read at the same depths; the layer breaks and the pile (a bar
// from head to tip, and the tip across each panel) are drawn in each.

var (
	lightGrey = color.RGBA{0xaa, 0xaa, 0xaa, 255}
	pileGrey  = color.RGBA{0x44, 0x44, 0x44, 255}
)

// insituPanelW and insituH size the panels: three (or two) side by side
// fill the width of the other figures' pairs.
const (
	insituPanelW = 2.5 * vg.Inch
	insituH      = 5.6 * vg.Inch
)

// coneStress returns a cone resistance in MPa (SI) or tsf (US), the units
// soundings are read in.
func (c conv) coneStress(v units.Stress) (float64, string) {
	if c.sys == units.US {
		return float64(v / units.TSF), "tsf"
	}
	return v.MPa(), "MPa"
}

// span is a layer's top and bottom.
type span struct{ top, bottom units.Length }

// sptLayers returns the layers of the SPT result.
func sptLayers(r *calc.Result) []span {
	var out []span
	for _, l := range r.SPT.Layers {
		out = append(out, span{l.Top, l.Bottom})
	}
	return out
}

// depthFrame is the depth range and the lines every panel draws.
type depthFrame struct {
	bottom     float64   // display units, positive down
	breaks     []float64 // layer breaks inside the range, display units
	head, tip  float64
	tipLabel   string
	breakLabel string
}

func newDepthFrame(r *calc.Result, c conv, last units.Length, layers []span) depthFrame {
	f := depthFrame{head: c.L(r.Pile.HeadDepth), tip: c.L(r.Pile.Tip()), tipLabel: "pile tip " + c.ls(r.Pile.Tip()),
		breakLabel: "layer break"}
	f.bottom = max(c.L(last), f.tip)
	if len(layers) > 0 {
		f.bottom = min(max(f.bottom*1.05, f.tip), c.L(layers[len(layers)-1].bottom))
		f.bottom = max(f.bottom, c.L(last), f.tip)
	}
	// Down to the next tick of the depth axis, so that the axis ends on one.
	if h := niceStep(f.bottom, 8) / 2; h > 0 {
		f.bottom = math.Ceil(f.bottom/h-1e-9) * h
	}
	for _, l := range layers {
		if z := c.L(l.bottom); z > 0 && z < f.bottom {
			f.breaks = append(f.breaks, z)
		}
	}
	return f
}

// panel makes one depth panel with the frame's lines; xmin and xmax bound
// its values. The pile's bar stands in a strip left of xmin, so that it
// hides no reading; legendTop puts the legend at the top right (else the
// bottom left, where the pile's strip ends above the bottom of the
// plot and readings that grow with depth leave room).
func (f depthFrame) panel(title, xlabel, ulabel string, xmin, xmax float64, legend, legendTop bool) (*plot.Plot, error) {
	p := plot.New()
	sansPlot(p)
	p.Title.Text = title
	p.X.Label.Text = xlabel
	p.Y.Label.Text = "depth (" + ulabel + ")"
	p.Y.Tick.Marker = depthTicks
	p.X.Tick.Marker = plot.TickerFunc(func(lo, hi float64) []plot.Tick {
		var out []plot.Tick
		for _, t := range niceTicks(xmin, hi, 5, func(v float64) string { return fmtNum(v, sig) }) {
			if t.Value >= xmin {
				out = append(out, t)
			}
		}
		return out
	})
	strip := 0.1 * (xmax - xmin)
	xpile := xmin - strip/2
	xmin -= strip
	p.X.Min, p.X.Max = xmin, xmax
	p.Y.Min, p.Y.Max = -f.bottom, 0
	p.Legend.Top, p.Legend.Left = legendTop, !legendTop
	p.Add(plotter.NewGrid())
	for i, z := range f.breaks {
		l, err := plotter.NewLine(plotter.XYs{{X: xmin, Y: -z}, {X: xmax, Y: -z}})
		if err != nil {
			return nil, err
		}
		l.LineStyle.Color, l.LineStyle.Width = lightGrey, vg.Points(1)
		p.Add(l)
		if legend && i == 0 {
			p.Legend.Add(f.breakLabel, l)
		}
	}
	tip, err := plotter.NewLine(plotter.XYs{{X: xmin, Y: -f.tip}, {X: xmax, Y: -f.tip}})
	if err != nil {
		return nil, err
	}
	tip.LineStyle.Color, tip.LineStyle.Width, tip.LineStyle.Dashes = pileGrey, vg.Points(1), []vg.Length{vg.Points(2), vg.Points(2)}
	p.Add(tip)
	bar, err := plotter.NewLine(plotter.XYs{{X: xpile, Y: -f.head}, {X: xpile, Y: -f.tip}})
	if err != nil {
		return nil, err
	}
	bar.LineStyle.Color, bar.LineStyle.Width = pileGrey, vg.Points(5)
	p.Add(bar)
	if legend {
		p.Legend.Add("pile", bar)
		p.Legend.Add(f.tipLabel, tip)
	}
	return p, nil
}

// addLine adds a depth profile to p; points draws markers as well.
func addLine(p *plot.Plot, name string, xy plotter.XYs, col color.Color, dashes []vg.Length, points bool) error {
	if len(xy) >= 2 {
		l, err := plotter.NewLine(xy)
		if err != nil {
			return err
		}
		l.LineStyle.Color, l.LineStyle.Width, l.LineStyle.Dashes = col, vg.Points(1.2), dashes
		p.Add(l)
		if !points && name != "" {
			p.Legend.Add(name, l)
		}
	}
	if points && len(xy) > 0 {
		sc, err := plotter.NewScatter(xy)
		if err != nil {
			return err
		}
		sc.GlyphStyle.Color, sc.GlyphStyle.Shape, sc.GlyphStyle.Radius = col, draw.CircleGlyph{}, vg.Points(2.5)
		p.Add(sc)
		if name != "" {
			p.Legend.Add(name, sc)
		}
	}
	return nil
}

// panels draws plots side by side, aligned on their depth axes.
func panels(label string, ps []*plot.Plot) (figure, error) {
	w := insituPanelW * vg.Length(len(ps))
	return newFigure(label, w, insituH, func(dc draw.Canvas) {
		tiles := draw.Tiles{Rows: 1, Cols: len(ps), PadX: vg.Points(6)}
		row := [][]*plot.Plot{ps}
		canvases := plot.Align(row, tiles, dc)
		for i, p := range ps {
			p.Draw(canvases[0][i])
		}
	})
}

// niceMax returns a round upper bound for a value axis holding v.
func niceMax(v float64) float64 {
	if !(v > 0) {
		return 1
	}
	s := niceStep(v, 4)
	return s * float64(int(v/s)+1)
}

// soundingFigure plots qt, fs and Ic of the sounding with depth.
func soundingFigure(r *calc.Result, c conv) (figure, error) {
	s := r.Sounding
	var layers []span
	for _, l := range s.Layers {
		layers = append(layers, span{l.Top, l.Bottom})
	}
	f := newDepthFrame(r, c, s.Bottom, layers)
	var qt, fs, ic plotter.XYs
	qmax, fmax := 0.0, 0.0
	_, qu := c.coneStress(0)
	for _, pt := range s.Points {
		z := -c.L(pt.Depth)
		q, _ := c.coneStress(pt.Qt)
		qt = append(qt, plotter.XY{X: q, Y: z})
		fs = append(fs, plotter.XY{X: c.S(pt.Fs), Y: z})
		qmax, fmax = max(qmax, q), max(fmax, c.S(pt.Fs))
		if pt.Valid() {
			ic = append(ic, plotter.XY{X: pt.Ic, Y: z})
		}
	}
	qmax, fmax = niceMax(qmax), niceMax(fmax)
	pq, err := f.panel("Cone resistance qt", "qt ("+qu+")", c.uL(), 0, qmax, false, true)
	if err != nil {
		return figure{}, err
	}
	if err := addLine(pq, "", qt, blue, nil, false); err != nil {
		return figure{}, err
	}
	pf, err := f.panel("Sleeve friction fs", "fs ("+c.uS()+")", c.uL(), 0, fmax, false, true)
	if err != nil {
		return figure{}, err
	}
	if err := addLine(pf, "", fs, green, nil, false); err != nil {
		return figure{}, err
	}
	pi, err := f.panel("Soil behaviour type index", "Ic", c.uL(), 1, 4, true, false)
	if err != nil {
		return figure{}, err
	}
	for i, b := range insitu.ZoneBoundaries() {
		l, err := plotter.NewLine(plotter.XYs{{X: b, Y: 0}, {X: b, Y: -c.L(s.Bottom)}}) // to the last reading: the legend may sit below
		if err != nil {
			return figure{}, err
		}
		l.LineStyle.Color, l.LineStyle.Width, l.LineStyle.Dashes = orange, vg.Points(0.8), []vg.Length{vg.Points(1), vg.Points(2)}
		if b == 2.60 {
			l.LineStyle.Color, l.LineStyle.Width, l.LineStyle.Dashes = red, vg.Points(1), []vg.Length{vg.Points(5), vg.Points(2)}
			pi.Legend.Add("Ic 2.60: sand-like | clay-like", l)
		} else if i == 0 {
			pi.Legend.Add("zone boundary", l)
		}
		pi.Add(l)
	}
	if err := addLine(pi, "Ic", ic, purple, nil, false); err != nil {
		return figure{}, err
	}
	return panels("Cone sounding with depth", []*plot.Plot{pq, pf, pi})
}

// sptFigure plots N60 and (N1)60 of the tests with depth, with each
// layer's own n60 (the value the capacity reads) where given.
func sptFigure(r *calc.Result, c conv) (figure, error) {
	s := r.SPT
	last := s.Tests[len(s.Tests)-1].Test.Depth
	f := newDepthFrame(r, c, last, sptLayers(r))
	var n60, n160 plotter.XYs
	nmax := 0.0
	for _, t := range s.Tests {
		z := -c.L(t.Test.Depth)
		n60 = append(n60, plotter.XY{X: t.N60, Y: z})
		n160 = append(n160, plotter.XY{X: t.N160, Y: z})
		nmax = max(nmax, t.N60, t.N160)
	}
	for _, l := range s.Layers {
		nmax = max(nmax, l.N60Given)
	}
	nmax = niceMax(nmax)
	p1, err := f.panel("N60 with depth", "N60 (blows/0.3 m)", c.uL(), 0, nmax, true, false)
	if err != nil {
		return figure{}, err
	}
	if err := addLine(p1, "N60", n60, blue, nil, true); err != nil {
		return figure{}, err
	}
	first := true
	for _, l := range s.Layers {
		if l.N60Given <= 0 {
			continue
		}
		z0, z1 := -c.L(l.Top), -min(c.L(l.Bottom), f.bottom)
		name := ""
		if first {
			name, first = "n60 of the layer", false
		}
		if err := addLine(p1, name, plotter.XYs{{X: l.N60Given, Y: z0}, {X: l.N60Given, Y: z1}}, red, []vg.Length{vg.Points(5), vg.Points(2)}, false); err != nil {
			return figure{}, err
		}
	}
	p2, err := f.panel("(N1)60 with depth", "(N1)60 (blows/0.3 m)", c.uL(), 0, nmax, false, false)
	if err != nil {
		return figure{}, err
	}
	if err := addLine(p2, "(N1)60", n160, green, nil, true); err != nil {
		return figure{}, err
	}
	return panels("Standard penetration tests with depth", []*plot.Plot{p1, p2})
}

// insituFigures adds the plots of the in-situ records to their sections.
func insituFigures(s *section, r *calc.Result, c conv) error {
	switch {
	case s.heading == headSounding && r.Sounding != nil && len(r.Sounding.Points) >= 2:
		g, err := soundingFigure(r, c)
		if err != nil {
			return err
		}
		s.blocks = append(s.blocks, figBlock(g, "Cone sounding with depth: qt, fs and Ic of each reading interpreted, with Robertson's zone boundaries on Ic, the layer breaks of the ground model and the pile from head to tip, on one depth scale."))
	case s.heading == headSPT && r.SPT != nil && len(r.SPT.Tests) > 0:
		g, err := sptFigure(r, c)
		if err != nil {
			return err
		}
		s.blocks = append(s.blocks, figBlock(g, "Standard penetration tests with depth: N60 and (N1)60 of each test, the n60 given for each layer, the layer breaks of the ground model and the pile from head to tip, on one depth scale."))
	}
	return nil
}
