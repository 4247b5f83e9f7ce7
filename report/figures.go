package report

import (
	"fmt"
	"image/color"
	"math"
	"slices"
	"sort"
	"strings"

	xfont "golang.org/x/image/font"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// The drawings of the package are painted on a gonum/plot vg.Canvas, so
// that one painter gives the inline SVG of HTML and the image of the PDF,
// and every text is measured with the font it is drawn in (Liberation
// Sans, metric-compatible with Arial, as in the plots), then wrapped to the
// room it has: nothing is clipped.

// sansFont is the typeface of every figure.
var sansFont = font.Font{Typeface: "Liberation", Variant: "Sans"}

func sans(size vg.Length, bold bool) font.Face {
	f := sansFont
	if bold {
		f.Weight = xfont.WeightBold
	}
	return font.DefaultCache.Lookup(f, size)
}

var (
	grey     = color.RGBA{0x55, 0x55, 0x55, 255}
	water    = color.RGBA{0x2b, 0x6c, 0xb0, 255}
	freeSea  = color.RGBA{0xdb, 0xea, 0xfb, 255}
	cutColor = color.RGBA{0x7a, 0x4a, 0x12, 255}
	// The neutral fills of the ground drawing: they show drainage only
	// (a key says so), not a soil type.
	drainedFill   = color.RGBA{0xf2, 0xf2, 0xf2, 255}
	undrainedFill = color.RGBA{0xd9, 0xd9, 0xd9, 255}
)

// wrapFace breaks s into lines no wider than w in face f (a single word
// wider than w is cut with an ellipsis, never left to run out).
func wrapFace(f font.Face, s string, w vg.Length) []string {
	s = clean(s)
	var out []string
	line := ""
	for _, word := range strings.Fields(s) {
		if f.Width(word) > w {
			r := []rune(word)
			for len(r) > 1 && f.Width(string(r)+"…") > w {
				r = r[:len(r)-1]
			}
			word = string(r) + "…"
		}
		try := word
		if line != "" {
			try = line + " " + word
		}
		if line != "" && f.Width(try) > w {
			out = append(out, line)
			line = word
			continue
		}
		line = try
	}
	if line != "" {
		out = append(out, line)
	}
	return out
}

// painter draws with a top-left origin (y downwards) on a canvas of
// height h, as the SVG and the page read.
type painter struct {
	dc draw.Canvas
	h  vg.Length
}

func (p painter) pt(x, y vg.Length) vg.Point { return vg.Point{X: x, Y: p.h - y} }

func (p painter) rect(x, y, w, h vg.Length, fill, stroke color.Color, lw vg.Length) {
	var path vg.Path
	path.Move(p.pt(x, y))
	path.Line(p.pt(x+w, y))
	path.Line(p.pt(x+w, y+h))
	path.Line(p.pt(x, y+h))
	path.Close()
	if fill != nil {
		p.dc.SetColor(fill)
		p.dc.Fill(path)
	}
	if stroke != nil {
		p.dc.SetColor(stroke)
		p.dc.SetLineWidth(lw)
		p.dc.SetLineDash(nil, 0)
		p.dc.Stroke(path)
	}
}

func (p painter) line(x0, y0, x1, y1 vg.Length, c color.Color, lw vg.Length, dash []vg.Length) {
	var path vg.Path
	path.Move(p.pt(x0, y0))
	path.Line(p.pt(x1, y1))
	p.dc.SetColor(c)
	p.dc.SetLineWidth(lw)
	p.dc.SetLineDash(dash, 0)
	p.dc.Stroke(path)
	p.dc.SetLineDash(nil, 0)
}

// text writes s with its vertical middle at y; align is 'l', 'r' or 'c'.
func (p painter) text(f font.Face, x, y vg.Length, s string, align byte, c color.Color) {
	s = clean(s)
	w := f.Width(s)
	switch align {
	case 'r':
		x -= w
	case 'c':
		x -= w / 2
	}
	e := f.Extents()
	base := y + (e.Ascent-e.Descent)/2
	p.dc.SetColor(c)
	p.dc.FillString(f, p.pt(x, base), s)
}

// label is one entry of the ground drawing's label column.
type label struct {
	at    vg.Length // the depth on the drawing it refers to
	lines []string
	bold  bool
	c     color.Color
}

// groundFigure draws the ground profile to scale: the layers (a neutral
// fill by drainage, with a key), free water, the water table, the pile
// with its width at the vertical scale, the ground lines of an excavation
// or scour. Every label sits in a column right of the ground, measured
// and wrapped to it, stacked without overlap, with a leader line where it
// had to move from the depth it names; so none crosses the pile.
func groundFigure(r *calc.Result, c conv) (figure, error) {
	const (
		W         = vg.Length(520)
		left      = vg.Length(54) // the ground column
		colW      = vg.Length(190)
		labelX    = left + colW + 16
		top       = vg.Length(26)
		keyRow    = vg.Length(18) // a row of the key
		drawH     = vg.Length(520)
		fontSize  = vg.Length(9.5)
		lineH     = vg.Length(11.5)
		labelGap  = vg.Length(3)
		tickFont  = vg.Length(9)
		keyBoxW   = vg.Length(22)
		keyBoxH   = vg.Length(11)
		labelWMax = W - labelX - 4
	)
	if r.Ground == nil || len(r.Layers) == 0 {
		return figure{}, nil
	}
	// The soils the log names, in the order of the layers, for the key.
	var soils []profile.Soil
	for _, l := range r.Layers {
		if l.Soil != profile.SoilUnset && !slices.Contains(soils, l.Soil) {
			soils = append(soils, l.Soil)
		}
	}
	bottom := vg.Length(52) // room for the key
	f := sans(fontSize, false)
	const soilKey = "Soil as logged:"
	if len(soils) > 0 {
		bottom += keyRow
		kx := left - 40 + f.Width(soilKey) + 10
		for _, s := range soils {
			if kx+keyBoxW+4+f.Width(s.String()) > W-2 {
				bottom += keyRow
				kx = left - 40
			}
			kx += keyBoxW + 4 + f.Width(s.String()) + 14
		}
	}
	H := top + drawH + bottom
	zBot := float64(r.Ground.Depth())
	zw, wet := r.Ground.WaterDepth()
	zTop := 0.0
	if wet && zw < 0 {
		zTop = float64(zw)
	}
	scale := float64(drawH) / (zBot - zTop) // pt per metre
	y := func(z float64) vg.Length { return top + vg.Length((z-zTop)*scale) }
	fb := sans(fontSize, true)
	ft := sans(tickFont, false)
	p0 := r.Pile
	tip := float64(p0.Tip())

	// The labels, in depth order.
	var labels []label
	for _, l := range r.Layers {
		text := l.Name + " (" + l.Drainage.String() + ")"
		labels = append(labels, label{at: (y(float64(l.Top)) + y(float64(l.Bottom))) / 2, lines: wrapFace(f, text, labelWMax), c: color.Black})
	}
	labels = append(labels, label{at: y(tip), lines: wrapFace(fb, "pile tip "+c.ls(p0.Tip()), labelWMax), bold: true, c: color.Black})
	if wet && float64(zw) <= zBot {
		wl := "water table " + c.ls(zw)
		if zw < 0 {
			wl = "free water " + c.ls(-zw) + " above ground"
		}
		labels = append(labels, label{at: y(float64(zw)), lines: wrapFace(f, wl, labelWMax), c: water})
	}
	zd := float64(r.Ground.DesignGround())
	if zd > 0 {
		gl := r.Ground.GroundLines()
		for _, ln := range []struct {
			z    units.Length
			name string
		}{{gl.Excavation, "excavation floor"}, {gl.GeneralScour, "general scour line"}} {
			if ln.z > 0 && float64(ln.z) < zd {
				labels = append(labels, label{at: y(float64(ln.z)), lines: wrapFace(f, ln.name+" "+c.ls(ln.z), labelWMax), c: cutColor})
			}
		}
		labels = append(labels, label{at: y(zd), lines: wrapFace(f, "design ground line "+c.ls(units.Length(zd)), labelWMax), c: cutColor},
			label{at: y(0), lines: []string{"original ground line"}, c: cutColor})
	}
	sort.SliceStable(labels, func(i, j int) bool { return labels[i].at < labels[j].at })
	// Stack: each label centred on its depth where it can be, pushed down
	// below the one above, then the whole column pulled up where it runs
	// past the drawing.
	ys := make([]vg.Length, len(labels)) // top of each label
	next := vg.Length(4)
	for i, l := range labels {
		h := vg.Length(len(l.lines)) * lineH
		ys[i] = max(l.at-h/2, next)
		next = ys[i] + h + labelGap
	}
	limit := H - bottom + 6
	for i := len(labels) - 1; i >= 0; i-- {
		h := vg.Length(len(labels[i].lines)) * lineH
		if ys[i]+h > limit {
			ys[i] = limit - h
		}
		limit = ys[i] - labelGap
	}

	paint := func(dc draw.Canvas) {
		p := painter{dc: dc, h: H}
		p.rect(0, 0, W, H, color.White, nil, 0)
		if wet && zw < 0 {
			p.rect(left, y(float64(zw)), colW, y(0)-y(float64(zw)), freeSea, nil, 0)
		}
		for _, l := range r.Layers {
			fill := drainedFill
			if l.Drainage == profile.Undrained {
				fill = undrainedFill
			}
			y0, y1 := y(float64(l.Top)), y(float64(l.Bottom))
			p.rect(left, y0, colW, y1-y0, fill, grey, 0.8)
			p.soilPattern(l.Soil, left, y0, colW, y1-y0)
		}
		// The soil removed above the design ground line is shaded out.
		if zd > 0 {
			p.rect(left, y(0), colW, y(zd)-y(0), color.RGBA{0xff, 0xff, 0xff, 0xa6}, nil, 0)
		}
		// depth axis in display units
		dispTop, dispBot := c.L(units.Length(zTop)), c.L(units.Length(zBot))
		unitLen := float64(units.Metre)
		if c.sys == units.US {
			unitLen = float64(units.Foot)
		}
		step := niceStep(dispBot-dispTop, 12)
		p.line(left-8, y(zTop), left-8, y(zBot), color.Black, 0.8, nil)
		for v := math.Ceil(dispTop/step) * step; v <= dispBot+1e-9; v += step {
			yy := y(v * unitLen)
			p.line(left-12, yy, left-8, yy, color.Black, 0.8, nil)
			p.text(ft, left-14, yy, fmtNum(v, sig), 'r', color.Black)
		}
		p.text(ft, 2, 10, "depth ("+c.uL()+")", 'l', color.Black)
		// the pile, to the vertical scale
		pw := vg.Length(max(2, float64(p0.Section.Size())*scale))
		cx := left + colW/2
		ph, pt := y(float64(p0.HeadDepth)), y(tip)
		p.rect(cx-pw/2, ph, pw, pt-ph, color.RGBA{0x8c, 0x8c, 0x8c, 255}, color.RGBA{0x22, 0x22, 0x22, 255}, 0.8)
		p.line(cx+pw/2, pt, left+colW+4, pt, color.RGBA{0x22, 0x22, 0x22, 255}, 0.8, []vg.Length{2, 2})
		// water table: a line across the column and the symbol at its
		// left edge, clear of the pile
		if wet && float64(zw) <= zBot {
			yw := y(float64(zw))
			p.line(left, yw, left+colW, yw, water, 1.5, []vg.Length{6, 3})
			var tri vg.Path
			tx := left + 14
			tri.Move(p.pt(tx-5, yw-9))
			tri.Line(p.pt(tx+5, yw-9))
			tri.Line(p.pt(tx, yw-1))
			tri.Close()
			dc.SetColor(water)
			dc.SetLineWidth(1.2)
			dc.Stroke(tri)
		}
		p.line(left-4, y(0), left+colW+4, y(0), color.Black, 1.5, nil)
		if zd > 0 {
			gl := r.Ground.GroundLines()
			for _, z := range []units.Length{gl.Excavation, gl.GeneralScour} {
				if z > 0 && float64(z) < zd {
					p.line(left, y(float64(z)), left+colW, y(float64(z)), cutColor, 1, []vg.Length{2, 3})
				}
			}
			p.line(left-4, y(zd), left+colW+4, y(zd), cutColor, 2, nil)
		}
		// the label column
		for i, l := range labels {
			h := vg.Length(len(l.lines)) * lineH
			mid := ys[i] + h/2
			face := f
			if l.bold {
				face = fb
			}
			if math.Abs(float64(mid-l.at)) > 2 {
				p.line(left+colW+2, l.at, labelX-3, mid, grey, 0.5, nil)
			} else {
				p.line(left+colW+2, l.at, labelX-3, l.at, grey, 0.5, []vg.Length{1, 2})
			}
			for k, s := range l.lines {
				p.text(face, labelX, ys[i]+lineH/2+vg.Length(k)*lineH, s, 'l', l.c)
			}
		}
		// the key: the fill shows drainage only
		ky := H - bottom + 24
		fillKey := "Fill shows drainage, not soil type:"
		if len(soils) > 0 {
			fillKey = "Shading shows drainage:"
		}
		p.text(f, left-40, ky+keyBoxH/2, fillKey, 'l', color.Black)
		kx := left - 40 + f.Width(fillKey) + 10
		for _, k := range []struct {
			fill color.Color
			name string
		}{{drainedFill, "drained"}, {undrainedFill, "undrained"}} {
			p.rect(kx, ky, keyBoxW, keyBoxH, k.fill, grey, 0.8)
			p.text(f, kx+keyBoxW+4, ky+keyBoxH/2, k.name, 'l', color.Black)
			kx += keyBoxW + 4 + f.Width(k.name) + 14
		}
		if wet {
			p.line(kx, ky+keyBoxH/2, kx+keyBoxW, ky+keyBoxH/2, water, 1.5, []vg.Length{6, 3})
			p.text(f, kx+keyBoxW+4, ky+keyBoxH/2, "water", 'l', color.Black)
		}
		// the second row: the pattern of each soil the log names
		if len(soils) > 0 {
			ky += keyRow
			p.text(f, left-40, ky+keyBoxH/2, soilKey, 'l', color.Black)
			kx = left - 40 + f.Width(soilKey) + 10
			for _, s := range soils {
				if kx+keyBoxW+4+f.Width(s.String()) > W-2 { // a further row when the key runs out of width
					ky += keyRow
					kx = left - 40
				}
				p.rect(kx, ky, keyBoxW, keyBoxH, color.White, grey, 0.8)
				p.soilPattern(s, kx, ky, keyBoxW, keyBoxH)
				p.text(f, kx+keyBoxW+4, ky+keyBoxH/2, s.String(), 'l', color.Black)
				kx += keyBoxW + 4 + f.Width(s.String()) + 14
			}
		}
	}
	return newFigure("Ground profile", W, H, paint)
}

// compareFigure draws the methods compared as horizontal bars, one panel
// per group (each with its own scale), the chosen method's bar dark and
// marked, the value at the end of each bar.
func compareFigure(r *calc.Result, c conv) (figure, error) {
	cm := r.Compared
	if cm == nil {
		return figure{}, nil
	}
	type panel struct {
		title string
		g     calc.CompareGroup
	}
	var panels []panel
	for _, g := range cm.Shaft {
		panels = append(panels, panel{"Qs of the " + g.Drainage + " layers (" + c.uF() + ")", g})
	}
	for _, g := range cm.Tip {
		panels = append(panels, panel{"Qp, tip in " + strings.Join(g.Layers, ", ") + " (" + c.uF() + ")", g})
	}
	const (
		W      = vg.Length(520)
		rowH   = vg.Length(15)
		headH  = vg.Length(24)
		valueW = vg.Length(60)
		size   = vg.Length(9.5)
	)
	f := sans(size, false)
	fb := sans(size, true)
	// The method names, measured in bold (the widest face), set the
	// width of the label column.
	labelW := vg.Length(60)
	for _, pn := range panels {
		for _, row := range pn.g.Rows {
			labelW = max(labelW, fb.Width(row.Method+" *")+8)
		}
	}
	H := vg.Length(8)
	for _, pn := range panels {
		n := 0
		for _, row := range pn.g.Rows {
			if row.NotApplied == "" {
				n++
			}
		}
		if n > 0 {
			H += headH + vg.Length(n)*rowH + 8
		}
	}
	if H <= 8 {
		return figure{}, nil
	}
	paint := func(dc draw.Canvas) {
		p := painter{dc: dc, h: H}
		p.rect(0, 0, W, H, color.White, nil, 0)
		y := vg.Length(8)
		for _, pn := range panels {
			lo, hi, n := pn.g.Spread()
			if n == 0 {
				continue
			}
			title := pn.title
			if lo > 0 && n > 1 {
				title += fmt.Sprintf("; greatest/least = %s", fmtNum(float64(hi/lo), 3))
			}
			lines := wrapFace(fb, title, W-8)
			p.text(fb, 4, y+headH/2-2, lines[0], 'l', color.Black)
			y += headH
			barMax := W - labelW - valueW - 16
			for _, row := range pn.g.Rows {
				if row.NotApplied != "" {
					continue
				}
				v := c.F(row.Force)
				w := vg.Length(0)
				if hi > 0 {
					w = barMax * vg.Length(float64(row.Force)/float64(hi))
				}
				fill, face, name := color.Color(color.RGBA{0xb5, 0xb5, 0xb5, 255}), f, row.Method
				if row.Chosen {
					fill, face, name = color.Color(color.RGBA{0x33, 0x33, 0x33, 255}), fb, row.Method+" *"
				}
				p.text(face, labelW, y+rowH/2, name, 'r', color.Black)
				p.rect(labelW+6, y+2, max(w, 0.5), rowH-4, fill, nil, 0)
				p.text(face, labelW+10+w, y+rowH/2, fmtNum(v, sig), 'l', color.Black)
				y += rowH
			}
			p.line(labelW+6, y-rowH*vg.Length(n)-1, labelW+6, y, color.Black, 0.8, nil)
			y += 8
		}
	}
	return newFigure("Methods compared", W, H, paint)
}
