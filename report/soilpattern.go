package report

import (
	"image/color"
	"math"

	"gonum.org/v1/plot/vg"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/profile"
)

// The soil patterns of the ground drawing are our own, drawn in the
// conventional manner of lithologic patterns (dots for sand, circles for
// gravel, dashes for silt, ruled lines for clay, tufts for peat, hatching
// for fill) and explained by the drawing's key. They are not copied from
// any standard's plates: the FGDC Digital Cartographic Standard for
// Geologic Map Symbolization (FGDC-STD-013-2006) allows a symbol of one's
// own that does not conflict with the standard's "provided that it is
// clearly explained on the map" (its guidance on use, read), and the key
// does that.

var patternInk = color.RGBA{0x55, 0x55, 0x55, 255}

// soilPattern draws the pattern of s inside the rectangle at (x, y) of
// width w and height h (y downwards); every mark lies wholly inside it.
func (p painter) soilPattern(s profile.Soil, x, y, w, h vg.Length) {
	if w <= 2 || h <= 2 {
		return
	}
	switch s {
	case profile.Sand:
		p.grid(x, y, w, h, 6, 5, 0.8, func(cx, cy vg.Length) { p.dot(cx, cy, 0.7, true) })
	case profile.Gravel:
		p.grid(x, y, w, h, 11, 9, 2.4, func(cx, cy vg.Length) { p.dot(cx, cy, 1.9, false) })
	case profile.Silt:
		p.grid(x, y, w, h, 8, 5, 2.2, func(cx, cy vg.Length) { p.line(cx-2, cy, cx+2, cy, patternInk, 0.6, nil) })
	case profile.Clay:
		for yy := y + 3; yy <= y+h-1.5; yy += 4 {
			p.line(x+1.5, yy, x+w-1.5, yy, patternInk, 0.5, nil)
		}
	case profile.Peat:
		p.grid(x, y, w, h, 12, 8, 4, func(cx, cy vg.Length) {
			p.line(cx-3, cy+1.5, cx+3, cy+1.5, patternInk, 0.6, nil)
			p.line(cx, cy+1.5, cx, cy-2, patternInk, 0.6, nil)
			p.line(cx-2, cy+1.5, cx-3, cy-1.5, patternInk, 0.6, nil)
			p.line(cx+2, cy+1.5, cx+3, cy-1.5, patternInk, 0.6, nil)
		})
	case profile.Fill:
		p.hatch(x, y, w, h, 7)
	}
}

// grid calls mark at the points of a staggered grid of spacing dx by dy
// whose marks, of half-size m, lie inside the rectangle.
func (p painter) grid(x, y, w, h, dx, dy, m vg.Length, mark func(cx, cy vg.Length)) {
	for _, c := range gridPoints(w, h, dx, dy, m) {
		mark(x+c.X, y+c.Y)
	}
}

// gridPoints returns the centres, relative to the rectangle's corner, of a
// staggered grid of spacing dx by dy in a w by h rectangle, keeping those
// whose marks of half-size m lie wholly inside it.
func gridPoints(w, h, dx, dy, m vg.Length) []vg.Point {
	var out []vg.Point
	row := 0
	for cy := dy/2 + m/2; cy+m <= h; cy += dy {
		off := vg.Length(0)
		if row%2 == 1 {
			off = dx / 2
		}
		for cx := dx/2 + off; cx+m <= w; cx += dx {
			if cx-m >= 0 && cy-m >= 0 {
				out = append(out, vg.Point{X: cx, Y: cy})
			}
		}
		row++
	}
	return out
}

// dot draws a circle of radius r at (cx, cy), filled or open.
func (p painter) dot(cx, cy, r vg.Length, filled bool) {
	var c vg.Path
	c.Move(p.pt(cx+r, cy))
	c.Arc(p.pt(cx, cy), r, 0, 2*math.Pi)
	c.Close()
	p.dc.SetColor(patternInk)
	if filled {
		p.dc.Fill(c)
		return
	}
	p.dc.SetLineWidth(0.6)
	p.dc.SetLineDash(nil, 0)
	p.dc.Stroke(c)
}

// hatch draws lines at 45° (rising to the right) every s points across the
// rectangle, each clipped to it.
func (p painter) hatch(x, y, w, h, s vg.Length) {
	for _, sg := range hatchSegments(w, h, s) {
		p.line(x+sg[0].X, y+sg[0].Y, x+sg[1].X, y+sg[1].Y, patternInk, 0.5, nil)
	}
}

// hatchSegments returns the 45° lines every s points across a w by h
// rectangle, relative to its corner: in its own coordinates (u right, v
// down) a line is u + v = k, clipped to 0 ≤ u ≤ w, 0 ≤ v ≤ h.
func hatchSegments(w, h, s vg.Length) [][2]vg.Point {
	var out [][2]vg.Point
	for k := s; k < w+h; k += s {
		u0, v0 := max(0, k-h), min(h, k)
		u1, v1 := min(w, k), max(0, k-w)
		if u1-u0 < 1 {
			continue
		}
		out = append(out, [2]vg.Point{{X: u0, Y: v0}, {X: u1, Y: v1}})
	}
	return out
}

// hasSoil reports whether a layer of r names its soil.
func hasSoil(r *calc.Result) bool {
	for _, l := range r.Layers {
		if l.Soil != profile.SoilUnset {
			return true
		}
	}
	return false
}
