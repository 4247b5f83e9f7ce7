package group

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// FieldError is a group input outside its accepted range: the field path
// (as in a calc file, below the group section) and what is wrong.
type FieldError struct {
	Path string // such as "rows" or "positions[3]"
	Msg  string // such as "0: want a whole number from 1 to 100"
}

func (e *FieldError) Error() string { return e.Path + ": " + e.Msg }

// Point is a pile's position in plan, metres from an origin of the
// caller's choice.
type Point struct{ X, Y units.Length }

// MaxPiles is the largest group accepted.
const MaxPiles = 10000

// Layout is the plan of a group: rows × columns at spacings, or a list of
// positions. Build it with Grid or Positions.
type Layout struct {
	// Rows and Cols are the grid's counts (0 for a list of positions); Sx
	// is the spacing between columns (along x), Sy between rows (along y).
	Rows, Cols int
	Sx, Sy     units.Length
	// Points are the piles' centres: for a grid, row by row from (0, 0).
	Points []Point
}

// Grid returns a layout of rows × cols piles at spacings sx (along x,
// between columns) and sy (along y, between rows). A single row or column
// needs no spacing across it (give 0).
func Grid(rows, cols int, sx, sy units.Length) (Layout, error) {
	if rows < 1 || cols < 1 || rows*cols > MaxPiles || rows > MaxPiles || cols > MaxPiles {
		f, v := "rows", rows
		if rows >= 1 && rows <= MaxPiles {
			f, v = "columns", cols
		}
		return Layout{}, &FieldError{f, fmt.Sprintf("%d: want a whole number from 1 with rows × columns at most %d", v, MaxPiles)}
	}
	for _, c := range []struct {
		f    string
		v    units.Length
		need bool
	}{{"spacing_x", sx, cols > 1}, {"spacing_y", sy, rows > 1}} {
		bad := math.IsNaN(float64(c.v)) || math.IsInf(float64(c.v), 0) || c.v < 0 || c.v > 1000
		if bad || (c.need && c.v == 0) {
			return Layout{}, &FieldError{c.f, fmt.Sprintf("%v: want more than 0 and at most 1000 m", c.v)}
		}
	}
	l := Layout{Rows: rows, Cols: cols, Sx: sx, Sy: sy, Points: make([]Point, 0, rows*cols)}
	for r := range rows {
		for c := range cols {
			l.Points = append(l.Points, Point{X: units.Length(c) * sx, Y: units.Length(r) * sy})
		}
	}
	return l, nil
}

// Positions returns a layout of piles at the points given.
func Positions(pts []Point) (Layout, error) {
	if len(pts) < 1 || len(pts) > MaxPiles {
		return Layout{}, &FieldError{"positions", fmt.Sprintf("%d points: want 1 to %d", len(pts), MaxPiles)}
	}
	for i, p := range pts {
		for _, v := range []units.Length{p.X, p.Y} {
			if math.IsNaN(float64(v)) || math.IsInf(float64(v), 0) || math.Abs(float64(v)) > 1e4 {
				return Layout{}, &FieldError{fmt.Sprintf("positions[%d]", i), fmt.Sprintf("(%v, %v): want coordinates within ±10 km", p.X, p.Y)}
			}
		}
	}
	return Layout{Points: append([]Point(nil), pts...)}, nil
}

// N returns the number of piles.
func (l Layout) N() int { return len(l.Points) }

// IsGrid reports whether the layout is rows × columns (the efficiency
// formulas need one).
func (l Layout) IsGrid() bool { return l.Rows > 0 && l.Cols > 0 }

// Geometry is the layout measured for piles of width D.
type Geometry struct {
	N int
	// Bg and Lg are the block's plan dimensions: the rectangle enclosing
	// the piles' outer faces (along x and y).
	Bg, Lg units.Length
	// MinX, MinY, MaxX, MaxY bound the pile centres.
	MinX, MinY, MaxX, MaxY units.Length
	// MinSpacing is the least centre-to-centre distance, between piles
	// Pair[0] and Pair[1] (0 and no pair for a single pile).
	MinSpacing units.Length
	Pair       [2]int
	// Cap is the cap's outline: the block widened by CapEdge on each side.
	CapMinX, CapMinY, CapMaxX, CapMaxY units.Length
	CapEdge                            units.Length
}

// MinSpacingRule returns the least centre-to-centre spacing AASHTO LRFD
// asks for, for piles of width d: the greater of 2.5 d and 30 in (762 mm)
// for driven piles (10.7.1.2), 3 d for bored piles (10.8.1.2); from memory.
func MinSpacingRule(d units.Length, bored bool) units.Length {
	if bored {
		return 3 * d
	}
	return max(2.5*d, 30*units.Inch)
}

// MinCapEdge is the least clear distance from a pile's face to the cap's
// edge, 9 in (229 mm; AASHTO LRFD 10.7.1.2, from memory).
const MinCapEdge = 9 * units.Inch

// SpacingRefs are the sources of the spacing and edge-distance checks.
func SpacingRefs() []cite.Ref {
	return []cite.Ref{{Source: cite.AASHTO2020, Where: "10.7.1.2 and 10.8.1.2, minimum spacing and cap edge distance (from memory)"}}
}

// Measure checks the layout for piles of width d under a cap whose edge
// lies capEdge outside the outer piles' faces, and measures it. Piles
// closer than d (centre to centre) are an error; a spacing under
// MinSpacingRule and a cap edge under MinCapEdge are warnings.
func (l Layout) Measure(d, capEdge units.Length, bored bool) (Geometry, []string, error) {
	if !(d > 0) || math.IsInf(float64(d), 0) {
		return Geometry{}, nil, &FieldError{"pile width", fmt.Sprintf("%v: want more than 0", d)}
	}
	if !(capEdge >= 0) || capEdge > 100 {
		return Geometry{}, nil, &FieldError{"cap_edge", fmt.Sprintf("%v: want 0 to 100 m", capEdge)}
	}
	if len(l.Points) == 0 {
		return Geometry{}, nil, &FieldError{"positions", "no piles"}
	}
	g := Geometry{N: len(l.Points), MinX: l.Points[0].X, MaxX: l.Points[0].X, MinY: l.Points[0].Y, MaxY: l.Points[0].Y, CapEdge: capEdge}
	for _, p := range l.Points[1:] {
		g.MinX, g.MaxX = min(g.MinX, p.X), max(g.MaxX, p.X)
		g.MinY, g.MaxY = min(g.MinY, p.Y), max(g.MaxY, p.Y)
	}
	g.Bg, g.Lg = g.MaxX-g.MinX+d, g.MaxY-g.MinY+d
	g.CapMinX, g.CapMaxX = g.MinX-d/2-capEdge, g.MaxX+d/2+capEdge
	g.CapMinY, g.CapMaxY = g.MinY-d/2-capEdge, g.MaxY+d/2+capEdge
	if len(l.Points) > 1 {
		g.MinSpacing = units.Length(math.Inf(1))
		for i := range l.Points {
			for j := i + 1; j < len(l.Points); j++ {
				s := units.Length(math.Hypot(float64(l.Points[i].X-l.Points[j].X), float64(l.Points[i].Y-l.Points[j].Y)))
				if s < g.MinSpacing {
					g.MinSpacing, g.Pair = s, [2]int{i, j}
				}
			}
		}
	}
	var warn []string
	if g.N > 1 {
		i, j := g.Pair[0], g.Pair[1]
		switch {
		case g.MinSpacing == 0:
			return g, nil, &FieldError{l.path(j), fmt.Sprintf("pile %d stands on pile %d (the same position): piles may not overlap", j+1, i+1)}
		case g.MinSpacing < d:
			return g, nil, &FieldError{l.path(j), fmt.Sprintf("piles %d and %d are %.4g m apart, centre to centre: less than one pile width (%v), so they overlap", i+1, j+1, float64(g.MinSpacing), d)}
		}
		if need := MinSpacingRule(d, bored); g.MinSpacing < need {
			warn = append(warn, fmt.Sprintf("the least spacing, %.4g m (piles %d and %d), is under the minimum of %.4g m (AASHTO LRFD 10.7.1.2/10.8.1.2)", float64(g.MinSpacing), i+1, j+1, float64(need)))
		}
	}
	if capEdge < MinCapEdge {
		warn = append(warn, fmt.Sprintf("the cap's edge is %v from the outer piles' faces, under the minimum of %v (AASHTO LRFD 10.7.1.2)", capEdge, MinCapEdge))
	}
	return g, warn, nil
}

// path names the field that placed pile i: a grid's spacing, or its
// position.
func (l Layout) path(i int) string {
	if l.IsGrid() {
		if l.Cols > 1 && (l.Rows == 1 || l.Sx <= l.Sy) {
			return "spacing_x"
		}
		return "spacing_y"
	}
	return fmt.Sprintf("positions[%d]", i)
}
