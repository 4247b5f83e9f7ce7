package pile

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/units"
)

// Shape names a pile cross-section.
type Shape int

// The cross-sections.
const (
	// Circle is a solid circular section (a bored pile, a drilled shaft, a
	// closed precast pile).
	Circle Shape = iota + 1
	// Square is a solid square section (a precast concrete pile).
	Square
	// ClosedPipe is a steel pipe with a closed (plated or conical) tip.
	ClosedPipe
	// OpenPipe is a steel pipe driven open-ended; it may plug.
	OpenPipe
	// HSection is a rolled H (bearing pile) section.
	HSection
	// GivenSection is a section given only by its area, perimeter and width.
	GivenSection
)

var shapeIDs = [...]string{Circle: "circle", Square: "square", ClosedPipe: "closed-pipe",
	OpenPipe: "open-pipe", HSection: "h-section", GivenSection: "given"}

// String returns the shape's identifier, as used in calc files.
func (s Shape) String() string {
	if s > 0 && int(s) < len(shapeIDs) {
		return shapeIDs[s]
	}
	return fmt.Sprintf("Shape(%d)", int(s))
}

// ParseShape reads a shape identifier.
func ParseShape(id string) (Shape, error) {
	for s := Circle; s <= GivenSection; s++ {
		if shapeIDs[s] == id {
			return s, nil
		}
	}
	return 0, fmt.Errorf("shape %q: want one of circle, square, closed-pipe, open-pipe, h-section, given", id)
}

// Plug says how an open pipe or H-section mobilises tip and shaft
// resistance.
type Plug int

const (
	// PlugLesser, the default, takes the lesser of the plugged and the
	// unplugged resistance, as practice does when the plug is uncertain
	// (Tomlinson & Woodward 2008, §4.3; common practice).
	PlugLesser Plug = iota
	// Plugged takes the tip on the gross (box) area and the shaft on the
	// outside (box) perimeter.
	Plugged
	// Unplugged takes the tip on the steel area only, and the shaft on the
	// outside perimeter plus the inside perimeter of an open pipe (or the
	// steel perimeter of an H-section).
	Unplugged
)

var plugIDs = [...]string{PlugLesser: "lesser", Plugged: "plugged", Unplugged: "unplugged"}

// String returns the plug mode's identifier.
func (p Plug) String() string {
	if p >= 0 && int(p) < len(plugIDs) {
		return plugIDs[p]
	}
	return fmt.Sprintf("Plug(%d)", int(p))
}

// ParsePlug reads a plug mode identifier.
func ParsePlug(id string) (Plug, error) {
	for p := PlugLesser; p <= Unplugged; p++ {
		if plugIDs[p] == id {
			return p, nil
		}
	}
	return 0, fmt.Errorf("plug %q: want one of lesser, plugged, unplugged", id)
}

// Section is a pile cross-section. Fill the fields its Shape uses:
//
//	Circle        Diameter
//	Square        Width (side)
//	ClosedPipe    Diameter (outside), Wall
//	OpenPipe      Diameter (outside), Wall
//	HSection      Depth, Width (flange), Web, Flange (thicknesses)
//	GivenSection  Area, Perimeter, Width (the width used for L/D and critical depth)
type Section struct {
	Shape     Shape
	Diameter  units.Length
	Width     units.Length
	Wall      units.Length
	Depth     units.Length
	Web       units.Length
	Flange    units.Length
	Area      units.Area
	Perimeter units.Length
}

// Largest section dimensions accepted: 15 m covers the widest driven
// monopiles and drilled shafts in use (common practice; an offshore
// monopile is rarely over 12 m); an area of 200 m² and a perimeter of
// 60 m follow from it. Anything larger is a slip of units.
const (
	maxSize      = 15 * units.Metre
	maxArea      = 200 * units.SquareMetre
	maxPerimeter = 60 * units.Metre
)

// positive checks 0 < v ≤ maxSize. A value that reads as a size in
// millimetres counted in metres gets a hint.
func positive(field string, v units.Length) error {
	if v > 0 && v <= maxSize {
		return nil
	}
	msg := fmt.Sprintf("%v is outside (0, %v]", v, maxSize)
	if v > maxSize && v/1000 <= maxSize && !math.IsInf(float64(v), 0) {
		msg += fmt.Sprintf(" (if millimetres were meant: %g mm)", float64(v))
	}
	return &PathError{Path: field, Msg: msg}
}

// Validate checks that the fields the shape uses are positive and finite
// and consistent (a wall thinner than half the diameter, a web thinner than
// the flange width). Field names are prefixed with path.
func (s Section) Validate(path string) error {
	p := func(f string) string { return path + "." + f }
	switch s.Shape {
	case Circle:
		return positive(p("diameter"), s.Diameter)
	case Square:
		return positive(p("width"), s.Width)
	case ClosedPipe, OpenPipe:
		if err := positive(p("diameter"), s.Diameter); err != nil {
			return err
		}
		if err := positive(p("wall"), s.Wall); err != nil {
			return err
		}
		if s.Wall >= s.Diameter/2 {
			return pathErrorf(p("wall"), "%v must be less than half the diameter (%v)", s.Wall, s.Diameter/2)
		}
	case HSection:
		for _, f := range []struct {
			name string
			v    units.Length
		}{{"depth", s.Depth}, {"width", s.Width}, {"web", s.Web}, {"flange", s.Flange}} {
			if err := positive(p(f.name), f.v); err != nil {
				return err
			}
		}
		if s.Web >= s.Width {
			return pathErrorf(p("web"), "%v must be less than the flange width (%v)", s.Web, s.Width)
		}
		if 2*s.Flange >= s.Depth {
			return pathErrorf(p("flange"), "%v must be less than half the depth (%v)", s.Flange, s.Depth/2)
		}
	case GivenSection:
		if !(s.Area > 0 && s.Area <= maxArea) {
			return pathErrorf(p("area"), "%v is outside (0, %v]", s.Area, maxArea)
		}
		if !(s.Perimeter > 0 && s.Perimeter <= maxPerimeter) {
			return pathErrorf(p("perimeter"), "%v is outside (0, %v]", s.Perimeter, maxPerimeter)
		}
		return positive(p("width"), s.Width)
	default:
		return pathErrorf(p("shape"), "unknown shape %d: want circle, square, closed-pipe, open-pipe, h-section or given", int(s.Shape))
	}
	return nil
}

// Size returns the width used for slenderness L/D, for critical depth and
// for the zones measured in diameters around the tip: the diameter of a
// circle or pipe, the side of a square, the larger of depth and flange
// width of an H-section, and the given width otherwise.
func (s Section) Size() units.Length {
	switch s.Shape {
	case Circle, ClosedPipe, OpenPipe:
		return s.Diameter
	case HSection:
		return max(s.Depth, s.Width)
	default:
		return s.Width
	}
}

// GrossArea returns the area enclosed by the outside of the section (the
// box area d·bf of an H-section): the tip area of a solid or plugged pile.
func (s Section) GrossArea() units.Area {
	switch s.Shape {
	case Circle, ClosedPipe, OpenPipe:
		return units.Circle(s.Diameter)
	case Square:
		return units.Rectangle(s.Width, s.Width)
	case HSection:
		return units.Rectangle(s.Depth, s.Width)
	default:
		return s.Area
	}
}

// MaterialArea returns the area of pile material: the gross area of a
// solid section, the steel annulus of a pipe, π/4·(D² − (D − 2t)²), and
// the steel of an H-section, 2·bf·tf + (d − 2tf)·tw.
func (s Section) MaterialArea() units.Area {
	switch s.Shape {
	case ClosedPipe, OpenPipe:
		return units.Circle(s.Diameter) - units.Circle(s.Diameter-2*s.Wall)
	case HSection:
		return 2*units.Rectangle(s.Width, s.Flange) + units.Rectangle(s.Depth-2*s.Flange, s.Web)
	default:
		return s.GrossArea()
	}
}

// OuterPerimeter returns the perimeter in contact with the soil outside
// the pile: πD, 4B, the box perimeter 2(d + bf) of an H-section, or the
// given perimeter.
func (s Section) OuterPerimeter() units.Length {
	switch s.Shape {
	case Circle, ClosedPipe, OpenPipe:
		return math.Pi * s.Diameter
	case Square:
		return 4 * s.Width
	case HSection:
		return 2 * (s.Depth + s.Width)
	default:
		return s.Perimeter
	}
}

// InnerPerimeter returns the perimeter in contact with soil inside an
// unplugged pile: π(D − 2t) for an open pipe; for an H-section the extra
// steel perimeter between the flanges, 2·bf − 2·tw (so that outer plus
// inner is the whole steel perimeter 2d + 4bf − 2tw); zero otherwise.
func (s Section) InnerPerimeter() units.Length {
	switch s.Shape {
	case OpenPipe:
		return math.Pi * (s.Diameter - 2*s.Wall)
	case HSection:
		return 2*s.Width - 2*s.Web
	default:
		return 0
	}
}

// CanPlug reports whether the section may behave plugged or unplugged.
func (s Section) CanPlug() bool { return s.Shape == OpenPipe || s.Shape == HSection }
