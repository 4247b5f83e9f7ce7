package report

import (
	"bytes"
	"fmt"
	"image/color"
	"math"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
	"gonum.org/v1/plot/vg/vgsvg"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
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

// truncate shortens s to n runes with an ellipsis.
func truncate(s string, n int) string {
	r := []rune(s)
	if len(r) <= n {
		return s
	}
	return string(r[:n-1]) + "…"
}

// groundSVG draws the ground profile to scale: the layers, the water
// table (and free water above the ground), and the pile with its width at
// the vertical scale. Layer names from the calc file are escaped.
func groundSVG(r *calc.Result, c conv) string {
	const (
		W, H          = 560.0, 600.0
		left, right   = 64.0, 300.0 // ground column
		top, bottom   = 28.0, 24.0
		labelX        = 312.0
		fontFamily    = "Helvetica, Arial, sans-serif"
		drainedFill   = "#efe2bd"
		undrainedFill = "#cdd6e0"
		waterColour   = "#2b6cb0"
	)
	if r.Ground == nil || len(r.Layers) == 0 {
		return ""
	}
	zBot := float64(r.Ground.Depth())
	zw, wet := r.Ground.WaterDepth()
	zTop := 0.0
	if wet && zw < 0 {
		zTop = float64(zw)
	}
	scale := (H - top - bottom) / (zBot - zTop) // px per metre
	y := func(z float64) float64 { return top + (z-zTop)*scale }
	var b strings.Builder
	fmt.Fprintf(&b, `<svg xmlns="http://www.w3.org/2000/svg" width="%g" height="%g" viewBox="0 0 %g %g" role="img" aria-label="Ground profile">`+"\n", W, H, W, H)
	fmt.Fprintf(&b, `<g font-family="%s" font-size="11">`+"\n", fontFamily)
	tipY := y(float64(r.Pile.Tip()))
	if wet && zw < 0 {
		fmt.Fprintf(&b, `<rect x="%g" y="%.2f" width="%g" height="%.2f" fill="#dbeafb" stroke="none"/>`+"\n", left, y(float64(zw)), right-left, y(0)-y(float64(zw)))
	}
	for _, l := range r.Layers {
		fill := drainedFill
		if l.Drainage == profile.Undrained {
			fill = undrainedFill
		}
		y0, y1 := y(float64(l.Top)), y(float64(l.Bottom))
		fmt.Fprintf(&b, `<rect x="%g" y="%.2f" width="%g" height="%.2f" fill="%s" stroke="#555" stroke-width="0.8"/>`+"\n", left, y0, right-left, y1-y0, fill)
		label := truncate(l.Name, 40) + " (" + l.Drainage.String() + ")"
		ly := (y0 + y1) / 2
		if math.Abs(ly-tipY) < 13 { // keep clear of the pile tip's label
			if ly < tipY {
				ly = tipY - 13
			} else {
				ly = tipY + 13
			}
		}
		fmt.Fprintf(&b, `<text x="%g" y="%.2f" dominant-baseline="middle">%s</text>`+"\n", labelX, ly, esc(label))
	}
	// The soil removed above the design ground line is shaded out.
	if zd := float64(r.Ground.DesignGround()); zd > 0 {
		fmt.Fprintf(&b, `<rect x="%g" y="%.2f" width="%g" height="%.2f" fill="#ffffff" fill-opacity="0.65" stroke="none"/>`+"\n", left, y(0), right-left, y(zd)-y(0))
	}
	// depth axis in display units
	dispBot := c.L(units.Length(zBot))
	dispTop := c.L(units.Length(zTop))
	unitLen := float64(units.Metre)
	if c.sys == units.US {
		unitLen = float64(units.Foot)
	}
	step := niceStep(dispBot-dispTop, 10)
	fmt.Fprintf(&b, `<line x1="%g" y1="%.2f" x2="%g" y2="%.2f" stroke="#000"/>`+"\n", left-8, y(zTop), left-8, y(zBot))
	for v := math.Ceil(dispTop/step) * step; v <= dispBot+1e-9; v += step {
		yy := y(v * unitLen)
		fmt.Fprintf(&b, `<line x1="%g" y1="%.2f" x2="%g" y2="%.2f" stroke="#000"/>`+"\n", left-12, yy, left-8, yy)
		fmt.Fprintf(&b, `<text x="%g" y="%.2f" text-anchor="end" dominant-baseline="middle">%s</text>`+"\n", left-14, yy, fmtNum(v, sig))
	}
	fmt.Fprintf(&b, `<text x="%g" y="%g" text-anchor="start">depth (%s)</text>`+"\n", 4.0, 14.0, c.uL())
	// the pile, to the vertical scale
	p := r.Pile
	pw := max(2, float64(p.Section.Size())*scale)
	cx := (left + right) / 2
	ph, pt := y(float64(p.HeadDepth)), y(float64(p.Tip()))
	fmt.Fprintf(&b, `<rect x="%.2f" y="%.2f" width="%.2f" height="%.2f" fill="#8c8c8c" stroke="#222" stroke-width="0.8"/>`+"\n", cx-pw/2, ph, pw, pt-ph)
	fmt.Fprintf(&b, `<line x1="%.2f" y1="%.2f" x2="%g" y2="%.2f" stroke="#222" stroke-dasharray="2 2"/>`+"\n", cx+pw/2, pt, right+4, pt)
	fmt.Fprintf(&b, `<text x="%g" y="%.2f" dominant-baseline="middle" font-weight="bold">pile tip %s</text>`+"\n", labelX, pt, esc(c.ls(p.Tip())))
	// water table
	if wet && float64(zw) <= zBot {
		yw := y(float64(zw))
		fmt.Fprintf(&b, `<line x1="%g" y1="%.2f" x2="%g" y2="%.2f" stroke="%s" stroke-width="1.5" stroke-dasharray="6 3"/>`+"\n", left, yw, right, yw, waterColour)
		tx := right - 30
		fmt.Fprintf(&b, `<path d="M %.2f %.2f L %.2f %.2f L %.2f %.2f Z" fill="none" stroke="%s" stroke-width="1.2"/>`+"\n", tx-6, yw-10, tx+6, yw-10, tx, yw-1, waterColour)
		wl := "water table " + c.ls(zw)
		if zw < 0 {
			wl = "free water " + c.ls(-zw) + " above ground"
		}
		fmt.Fprintf(&b, `<text x="%g" y="%.2f" fill="%s" stroke="#fff" stroke-width="3" paint-order="stroke" text-anchor="end">%s</text>`+"\n", tx-10, yw-4, waterColour, esc(wl))
	}
	fmt.Fprintf(&b, `<line x1="%g" y1="%.2f" x2="%g" y2="%.2f" stroke="#000" stroke-width="1.5"/>`+"\n", left-4, y(0), right+4, y(0))
	// The design ground line (excavation and scour) and the lines above
	// it, labelled with the original ground line.
	if zd := float64(r.Ground.DesignGround()); zd > 0 {
		gl := r.Ground.GroundLines()
		for _, ln := range []struct {
			z    units.Length
			name string
		}{{gl.Excavation, "excavation floor"}, {gl.GeneralScour, "general scour line"}} {
			if ln.z > 0 && float64(ln.z) < zd {
				fmt.Fprintf(&b, `<line x1="%g" y1="%.2f" x2="%g" y2="%.2f" stroke="#7a4a12" stroke-dasharray="2 3"/>`+"\n", left, y(float64(ln.z)), right, y(float64(ln.z)))
				fmt.Fprintf(&b, `<text x="%g" y="%.2f" fill="#7a4a12" stroke="#fff" stroke-width="3" paint-order="stroke">%s</text>`+"\n", left+4, y(float64(ln.z))-3, esc(ln.name+" "+c.ls(ln.z)))
			}
		}
		yd := y(zd)
		fmt.Fprintf(&b, `<line x1="%g" y1="%.2f" x2="%g" y2="%.2f" stroke="#7a4a12" stroke-width="2"/>`+"\n", left-4, yd, right+4, yd)
		fmt.Fprintf(&b, `<text x="%g" y="%.2f" fill="#7a4a12" stroke="#fff" stroke-width="3" paint-order="stroke">%s</text>`+"\n", left+4, yd-4, esc("design ground line "+c.ls(units.Length(zd))))
		fmt.Fprintf(&b, `<text x="%g" y="%.2f" stroke="#fff" stroke-width="3" paint-order="stroke">original ground line</text>`+"\n", left+4, y(0)-4)
	}
	b.WriteString("</g>\n</svg>")
	return b.String()
}

// Plot settings: fixed sizes and the default Liberation fonts of
// gonum/plot keep the SVG identical from run to run.
const (
	plotW = 4.8 * vg.Inch
	plotH = 5.2 * vg.Inch
)

// depthTicks labels a downward depth axis plotted as negative values.
var depthTicks = plot.TickerFunc(func(lo, hi float64) []plot.Tick {
	t := plot.DefaultTicks{}.Ticks(lo, hi)
	for i := range t {
		if t[i].Label != "" {
			t[i].Label = fmtNum(-t[i].Value, sig)
		}
	}
	return t
})

type series struct {
	name   string
	xy     plotter.XYs
	colour color.Color
	dashes []vg.Length
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

// newFigure makes a figure and its SVG markup.
func newFigure(w, h vg.Length, paint func(draw.Canvas)) (figure, error) {
	s, err := svgOf(w, h, paint)
	return figure{w: w, h: h, paint: paint, svg: s}, err
}

// pngOf paints f at dpi dots per inch and returns the PNG bytes.
func (f figure) png(dpi int) ([]byte, error) {
	cv := vgimg.NewWith(vgimg.UseWH(f.w, f.h), vgimg.UseDPI(dpi), vgimg.UseBackgroundColor(color.White))
	f.paint(draw.New(cv))
	var buf bytes.Buffer
	if _, err := (vgimg.PngCanvas{Canvas: cv}).WriteTo(&buf); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

// svgPlot draws series against depth (downwards) as a figure.
func svgPlot(title, xlabel, ylabel string, ss []series) (figure, error) {
	p := plot.New()
	p.Title.Text = title
	p.X.Label.Text = xlabel
	p.Y.Label.Text = ylabel
	p.Y.Tick.Marker = depthTicks
	p.Legend.Top = true
	p.Legend.Left = false
	p.X.Min = 0
	p.Add(plotter.NewGrid())
	for _, s := range ss {
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
	return newFigure(plotW, plotH, p.Draw)
}

var (
	black = color.RGBA{0, 0, 0, 255}
	blue  = color.RGBA{0x1f, 0x5f, 0xa8, 255}
	red   = color.RGBA{0xb0, 0x30, 0x20, 255}
	green = color.RGBA{0x2e, 0x7d, 0x32, 255}
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
		{"total σv", tot, black, nil},
		{"pore pressure u", pore, blue, []vg.Length{vg.Points(5), vg.Points(3)}},
		{"effective σ′v", eff, red, nil},
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
		{"compression Rc", rc, black, nil},
		{"tension Rt", rt, blue, []vg.Length{vg.Points(5), vg.Points(3)}},
		{"design compression Rc,d", rd, red, []vg.Length{vg.Points(1.5), vg.Points(2)}},
	}
	if d := r.Design; d != nil && d.Governing >= 0 && d.Governing < len(d.Cases) && len(rc) > 0 {
		ed := c.F(d.Cases[d.Governing].CompressionEd)
		if ed > 0 {
			ss = append(ss, series{"design action Ed", plotter.XYs{{X: ed, Y: rc[0].Y}, {X: ed, Y: rc[len(rc)-1].Y}}, green, []vg.Length{vg.Points(8), vg.Points(3)}})
		}
	}
	return svgPlot("Capacity with tip depth", "resistance ("+c.uF()+")", "tip depth ("+c.uL()+")", ss)
}
