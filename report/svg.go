package report

import (
	"bytes"
	"image"
	"image/color"
	stddraw "image/draw"
	"image/png"
	"math"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
	"gonum.org/v1/plot/vg/vgsvg"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/pile"
)

// niceStep returns a step of 1, 2 or 5 × 10^k giving about n intervals
// over span.
func niceStep(span float64, n int) float64 {
	if !(span > 0) {
		return 1
	}
	raw := span / float64(n)
	p := math.Pow(10, math.Floor(math.Log10(raw)))
	for _, m := range []float64{1, 2, 5, 10} {
		if m*p >= raw {
			return m * p
		}
	}
	return 10 * p
}

// Plot settings: fixed sizes and the default Liberation fonts of
// gonum/plot keep the SVG identical from run to run.
const (
	plotW = 4.8 * vg.Inch
	plotH = 5.2 * vg.Inch
)

// niceTicks returns labelled ticks every niceStep(hi−lo, n) and unlabelled
// ones halfway between, the labels from label.
func niceTicks(lo, hi float64, n int, label func(float64) string) []plot.Tick {
	step := niceStep(hi-lo, n)
	var t []plot.Tick
	for v := math.Ceil(lo/step*2) * step / 2; v <= hi+step*1e-9; v += step / 2 {
		v := math.Round(v/step*2) * step / 2
		if k := math.Round(v / step * 2); math.Mod(k, 2) == 0 {
			t = append(t, plot.Tick{Value: v, Label: label(v)})
		} else {
			t = append(t, plot.Tick{Value: v})
		}
	}
	return t
}

// depthTicks labels a downward depth axis plotted as negative values,
// about eight labelled ticks over the depth.
var depthTicks = plot.TickerFunc(func(lo, hi float64) []plot.Tick {
	return niceTicks(lo, hi, 8, func(v float64) string { return fmtNum(-v, sig) })
})

// valueTicks labels a value axis, about five labelled ticks.
var valueTicks = plot.TickerFunc(func(lo, hi float64) []plot.Tick {
	return niceTicks(lo, hi, 5, func(v float64) string { return fmtNum(v, sig) })
})

type series struct {
	name   string
	xy     plotter.XYs
	colour color.Color
	dashes []vg.Length
	// points draws markers instead of a line (one point is enough).
	points bool
}

// figure is a drawing that can be written as inline SVG (HTML) or as a
// PNG image (PDF): its size and a function that paints it on a canvas of
// that size.
type figure struct {
	w, h  vg.Length
	paint func(dc draw.Canvas)
	svg   string // the inline SVG markup, without the XML prolog
}

// svgOf paints f on an SVG canvas and returns the markup without the XML
// prolog.
func svgOf(w, h vg.Length, paint func(draw.Canvas)) (string, error) {
	cv := vgsvg.New(w, h)
	paint(draw.New(cv))
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

// newFigure makes a figure and its SVG markup, named by label for
// assistive technology (role="img", aria-label).
func newFigure(label string, w, h vg.Length, paint func(draw.Canvas)) (figure, error) {
	s, err := svgOf(w, h, paint)
	if err == nil && strings.HasPrefix(s, "<svg") {
		s = `<svg role="img" aria-label="` + esc(label) + `"` + s[len("<svg"):]
	}
	return figure{w: w, h: h, paint: paint, svg: s}, err
}

// pngOf paints f at dpi dots per inch and returns the PNG bytes.
func (f figure) png(dpi int) ([]byte, error) {
	cv := vgimg.NewWith(vgimg.UseWH(f.w, f.h), vgimg.UseDPI(dpi), vgimg.UseBackgroundColor(color.White))
	f.paint(draw.New(cv))
	// Flattened on white into an opaque image, which image/png writes as
	// RGB without alpha: the PDF then keeps the PNG data as it is (an
	// alpha channel would be split off and compressed again, which fpdf
	// does not do the same way on every run).
	src := cv.Image()
	b := src.Bounds()
	flat := image.NewRGBA(b)
	stddraw.Draw(flat, b, image.NewUniform(color.White), image.Point{}, stddraw.Src)
	stddraw.Draw(flat, b, src, b.Min, stddraw.Over)
	var buf bytes.Buffer
	if err := png.Encode(&buf, flat); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

// svgPlot draws series against depth (downwards) as a figure, with the
// legend at the top right.
func svgPlot(title, xlabel, ylabel string, ss []series) (figure, error) {
	return svgPlotLegend(title, xlabel, ylabel, ss, true)
}

// svgPlotLegend is svgPlot with the legend at the top right (top) or the
// bottom right, for curves that fill the top of the plot.
func svgPlotLegend(title, xlabel, ylabel string, ss []series, top bool) (figure, error) {
	p := plot.New()
	sansPlot(p)
	p.Title.Text = title
	p.X.Label.Text = xlabel
	p.Y.Label.Text = ylabel
	p.Y.Tick.Marker = depthTicks
	p.X.Tick.Marker = valueTicks
	p.Legend.Top = top
	p.Legend.Left = false
	p.X.Min = 0
	p.Add(plotter.NewGrid())
	for _, s := range ss {
		if s.points && len(s.xy) > 0 {
			sc, err := plotter.NewScatter(s.xy)
			if err != nil {
				return figure{}, err
			}
			sc.GlyphStyle.Color = s.colour
			sc.GlyphStyle.Shape = draw.CircleGlyph{}
			sc.GlyphStyle.Radius = vg.Points(3)
			p.Add(sc)
			p.Legend.Add(s.name, sc)
			continue
		}
		if len(s.xy) < 2 {
			continue
		}
		l, err := plotter.NewLine(s.xy)
		if err != nil {
			return figure{}, err
		}
		l.LineStyle.Color = s.colour
		l.LineStyle.Width = vg.Points(1.5)
		l.LineStyle.Dashes = s.dashes
		p.Add(l)
		p.Legend.Add(s.name, l)
	}
	p.Y.Max = 0 // the ground surface at the top
	return newFigure(title, plotW, plotH, p.Draw)
}

var (
	black  = color.RGBA{0, 0, 0, 255}
	blue   = color.RGBA{0x1f, 0x5f, 0xa8, 255}
	red    = color.RGBA{0xb0, 0x30, 0x20, 255}
	green  = color.RGBA{0x2e, 0x7d, 0x32, 255}
	orange = color.RGBA{0xd9, 0x6c, 0x00, 255}
	purple = color.RGBA{0x6a, 0x1b, 0x9a, 255}
)

// stressSVG plots σv, u and σ′v with depth.
func stressSVG(r *calc.Result, c conv) (figure, error) {
	var tot, pore, eff plotter.XYs
	for _, s := range r.Stresses {
		z := -c.L(s.Depth)
		tot = append(tot, plotter.XY{X: c.S(s.Total), Y: z})
		pore = append(pore, plotter.XY{X: c.S(s.Pore), Y: z})
		eff = append(eff, plotter.XY{X: c.S(s.Effective), Y: z})
	}
	return svgPlot("Vertical stress", "stress ("+c.uS()+")", "depth ("+c.uL()+")", []series{
		{"total σv", tot, black, nil, false},
		{"pore pressure u", pore, blue, []vg.Length{vg.Points(5), vg.Points(3)}, false},
		{"effective σ′v", eff, red, nil, false},
	})
}

// capacitySVG plots the characteristic compression and tension resistance
// and the design compression resistance against tip depth, with the
// design compression action where there is one.
func capacitySVG(r *calc.Result, c conv) (figure, error) {
	var rc, rt, rd plotter.XYs
	for i, k := range r.WithDepth {
		z := -c.L(k.TipDepth)
		rc = append(rc, plotter.XY{X: c.F(k.Compression), Y: z})
		rt = append(rt, plotter.XY{X: c.F(k.Tension), Y: z})
		if len(r.DesignWithDepth) == len(r.WithDepth) {
			rd = append(rd, plotter.XY{X: c.F(r.DesignWithDepth[i]), Y: z})
		}
	}
	ss := []series{
		{"compression Rc", rc, black, nil, false},
		{"tension Rt", rt, blue, []vg.Length{vg.Points(5), vg.Points(3)}, false},
		{"design compression Rc,d", rd, red, []vg.Length{vg.Points(1.5), vg.Points(2)}, false},
	}
	if d := r.Design; d != nil && d.Governing >= 0 && d.Governing < len(d.Cases) && len(rc) > 0 {
		ed := c.F(d.Cases[d.Governing].CompressionEd)
		if ed > 0 {
			ss = append(ss, series{"design action Ed", plotter.XYs{{X: ed, Y: rc[0].Y}, {X: ed, Y: rc[len(rc)-1].Y}}, green, []vg.Length{vg.Points(8), vg.Points(3)}, false})
		}
	}
	// The pile's tip and the required length's tip, across the plot; the
	// depths where a weaker layer below reduces qp, marked on Rc.
	xmax := 0.0
	for _, p := range rc {
		xmax = max(xmax, p.X)
	}
	var weak plotter.XYs
	for i, k := range r.WithDepth {
		if k.Flags&pile.WeakLayerReduced != 0 {
			weak = append(weak, rc[i])
		}
	}
	if len(weak) > 0 {
		ss = append(ss, series{name: "qp reduced: weaker layer below", xy: weak, colour: orange, points: true})
	}
	if xmax > 0 {
		zt := -c.L(r.Pile.Tip())
		ss = append(ss, series{"pile tip " + c.ls(r.Pile.Tip()), plotter.XYs{{X: 0, Y: zt}, {X: xmax, Y: zt}}, grey, []vg.Length{vg.Points(2), vg.Points(2)}, false})
		if l := r.Length; l != nil && l.Found {
			zr := -c.L(l.TipDepth)
			ss = append(ss, series{"required tip " + c.ls(l.TipDepth), plotter.XYs{{X: 0, Y: zr}, {X: xmax, Y: zr}}, purple, []vg.Length{vg.Points(6), vg.Points(2), vg.Points(1), vg.Points(2)}, false})
		}
	}
	return svgPlot("Capacity with tip depth", "resistance ("+c.uF()+")", "tip depth ("+c.uL()+")", ss)
}

// sansPlot sets every text of p in the figures' typeface (Liberation
// Sans) at the sizes of the other figures: title 11 pt, axis labels 10,
// ticks 9, legend 8.5.
func sansPlot(p *plot.Plot) {
	for _, f := range []struct {
		f    *font.Font
		size vg.Length
	}{{&p.Title.TextStyle.Font, 11}, {&p.X.Label.TextStyle.Font, 10}, {&p.Y.Label.TextStyle.Font, 10},
		{&p.X.Tick.Label.Font, 9}, {&p.Y.Tick.Label.Font, 9}, {&p.Legend.TextStyle.Font, 8.5}} {
		f.f.Typeface, f.f.Variant, f.f.Size = sansFont.Typeface, sansFont.Variant, f.size
	}
}
