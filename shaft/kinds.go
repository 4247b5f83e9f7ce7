package shaft

import (
	"strconv"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Range is a published range of a dimensionless factor.
type Range struct{ Lo, Hi float64 }

// Mid returns the middle of the range, the default this package takes
// within a published range.
func (r Range) Mid() float64 { return (r.Lo + r.Hi) / 2 }

// Installation is how a pile is put in the ground. It is the one
// installation type of the module: package pile uses it under the same
// name (pile.Installation is this type), so a value passes between the
// packages without conversion. It selects documented defaults (K/K0 and
// δ/φ′ in the β method, the EN 1997-1 resistance table), never hidden
// constants.
type Installation uint8

// The installation methods, numbered from 1 so that the zero value means
// "not given".
const (
	// DrivenHigh is a driven high-displacement pile (closed pipe, precast
	// concrete, timber).
	DrivenHigh Installation = iota + 1
	// DrivenLow is a driven low-displacement pile (H-section, open pipe).
	DrivenLow
	// Bored is a bored pile or drilled shaft.
	Bored
	// Augered is a continuous flight auger (CFA) pile.
	Augered
	// Jetted is a pile installed with jetting.
	Jetted
)

var installationIDs = [...]string{"", "driven-high", "driven-low", "bored", "augered", "jetted"}

// String returns the identifier used in calc files: "driven-high",
// "driven-low", "bored", "augered" or "jetted".
func (i Installation) String() string {
	if int(i) < len(installationIDs) && i != 0 {
		return installationIDs[i]
	}
	return "installation(" + strconv.Itoa(int(i)) + ")"
}

// ParseInstallation reads an identifier written by String.
func ParseInstallation(s string) (Installation, error) {
	for i := 1; i < len(installationIDs); i++ {
		if installationIDs[i] == s {
			return Installation(i), nil
		}
	}
	return 0, &ChoiceError{Field: "installation", Value: s, Accepted: installationIDs[1:]}
}

// Driven reports whether the pile is driven (high or low displacement).
func (i Installation) Driven() bool { return i == DrivenHigh || i == DrivenLow }

// KOverK0 returns Kulhawy's (1984) range of K/K0 for the installation:
//
//	jetted                    1/2 to 2/3
//	bored                     2/3 to 1
//	driven, low displacement  3/4 to 5/4
//	driven, high displacement 1   to 2
//
// A CFA (augered) pile takes the bored range: Kulhawy groups
// installations by the disturbance and the stress change they cause, and a
// CFA pile, cast against an augered hole, is nearer a bored pile than a
// driven one (our choice; common practice). These ranges were recalled, not
// read in the source (see the package doc).
func (i Installation) KOverK0() (Range, error) {
	switch i {
	case Jetted:
		return Range{1.0 / 2, 2.0 / 3}, nil
	case Bored, Augered:
		return Range{2.0 / 3, 1}, nil
	case DrivenLow:
		return Range{3.0 / 4, 5.0 / 4}, nil
	case DrivenHigh:
		return Range{1, 2}, nil
	}
	return Range{}, &ChoiceError{Field: "installation", Value: i.String(), Accepted: installationIDs[1:]}
}

// Surface is the shaft's surface against the soil, as Kulhawy (1984) groups
// interfaces for δ/φ′.
type Surface uint8

const (
	RoughConcrete  Surface = iota + 1 // cast against soil
	SmoothConcrete                    // precast
	RoughSteel                        // corrugated or heavily rusted
	SmoothSteel                       // coated or new
	Timber                            // timber
)

var surfaceIDs = [...]string{"", "rough-concrete", "smooth-concrete", "rough-steel", "smooth-steel", "timber"}

// String returns our identifier, such as "rough-steel".
func (s Surface) String() string {
	if int(s) < len(surfaceIDs) && s != 0 {
		return surfaceIDs[s]
	}
	return "surface(" + strconv.Itoa(int(s)) + ")"
}

// ParseSurface reads an identifier written by String.
func ParseSurface(v string) (Surface, error) {
	for i := 1; i < len(surfaceIDs); i++ {
		if surfaceIDs[i] == v {
			return Surface(i), nil
		}
	}
	return 0, &ChoiceError{Field: "surface", Value: v, Accepted: surfaceIDs[1:]}
}

// DeltaOverPhi returns Kulhawy's (1984) range of δ/φ′ for the surface:
//
//	rough concrete  1.0
//	smooth concrete 0.8 to 1.0
//	rough steel     0.7 to 0.9
//	smooth steel    0.5 to 0.7
//	timber          0.8 to 0.9
//
// These ranges were recalled, not read in the source (see the package doc).
func (s Surface) DeltaOverPhi() (Range, error) {
	switch s {
	case RoughConcrete:
		return Range{1, 1}, nil
	case SmoothConcrete:
		return Range{0.8, 1}, nil
	case RoughSteel:
		return Range{0.7, 0.9}, nil
	case SmoothSteel:
		return Range{0.5, 0.7}, nil
	case Timber:
		return Range{0.8, 0.9}, nil
	}
	return Range{}, &ChoiceError{Field: "surface", Value: s.String(), Accepted: surfaceIDs[1:]}
}

// Potyondy returns the ratio δ/φ′ that Potyondy (1961) measured in shear
// box tests of dense dry sand against each surface, as reproduced in a
// textbook table (read; see the tests):
//
//	rough concrete (cast against soil)   0.98
//	smooth concrete (formed)             0.80
//	rough steel (rusted)                 0.76
//	smooth steel                         0.54
//	timber (parallel to the grain)       0.76
//
// Kulhawy's ranges (DeltaOverPhi) bracket these measurements for concrete
// and steel; they are kept as the defaults, and these values serve as the
// read check on them. Timber is taken parallel to the grain, the direction
// of shaft friction (Potyondy's perpendicular value is 0.88).
//
// PotyondyRef gives the source to cite beside these values.
func (s Surface) Potyondy() (float64, error) {
	switch s {
	case RoughConcrete:
		return 0.98, nil
	case SmoothConcrete:
		return 0.80, nil
	case RoughSteel:
		return 0.76, nil
	case SmoothSteel:
		return 0.54, nil
	case Timber:
		return 0.76, nil
	}
	return 0, &ChoiceError{Field: "surface", Value: s.String(), Accepted: surfaceIDs[1:]}
}

// PotyondyRef returns the source of Surface.Potyondy.
func PotyondyRef() cite.Ref {
	return cite.Ref{Source: cite.Potyondy1961, Where: "δ/φ′ from shear box tests, dense dry sand"}
}

// SandClass is a soil class of API RP 2GEO (2011) for shaft friction of
// driven open-ended pipe piles in siliceous sand and silt. Classes for which
// the standard gives no design values (very loose and loose sand, loose
// sand-silt, medium dense silt) are left out.
type SandClass uint8

const (
	MediumDenseSandSilt SandClass = iota + 1 // medium dense sand-silt
	MediumDenseSand                          // medium dense sand, or dense sand-silt
	DenseSand                                // dense sand, or very dense sand-silt
	VeryDenseSand                            // very dense sand
)

var sandClassIDs = [...]string{"", "api-medium-dense-sand-silt", "api-medium-dense-sand", "api-dense-sand", "api-very-dense-sand"}

// String returns our identifier, such as "api-dense-sand".
func (c SandClass) String() string {
	if int(c) < len(sandClassIDs) && c != 0 {
		return sandClassIDs[c]
	}
	return "sand-class(" + strconv.Itoa(int(c)) + ")"
}

// ParseSandClass reads an identifier written by String.
func ParseSandClass(v string) (SandClass, error) {
	for i := 1; i < len(sandClassIDs); i++ {
		if sandClassIDs[i] == v {
			return SandClass(i), nil
		}
	}
	return 0, &ChoiceError{Field: "sand_class", Value: v, Accepted: sandClassIDs[1:]}
}

// API returns the shaft friction factor β and the limiting unit shaft
// friction fL of API RP 2GEO (2011) for the class:
//
//	class                   β     fL
//	medium dense sand-silt  0.29   67 kPa
//	medium dense sand       0.37   81 kPa
//	dense sand              0.46   96 kPa
//	very dense sand         0.56  115 kPa
//
// These values were recalled, not read in the standard (see the package doc).
func (c SandClass) API() (beta float64, limit units.Stress, err error) {
	switch c {
	case MediumDenseSandSilt:
		return 0.29, 67 * units.Kilopascal, nil
	case MediumDenseSand:
		return 0.37, 81 * units.Kilopascal, nil
	case DenseSand:
		return 0.46, 96 * units.Kilopascal, nil
	case VeryDenseSand:
		return 0.56, 115 * units.Kilopascal, nil
	}
	return 0, 0, &ChoiceError{Field: "sand_class", Value: c.String(), Accepted: sandClassIDs[1:]}
}

// ChoiceError reports a name or kind outside a fixed list.
type ChoiceError struct {
	Field    string
	Value    string
	Accepted []string
}

func (e *ChoiceError) Error() string {
	s := "shaft: " + e.Field + ": " + strconv.Quote(e.Value) + " is not one of "
	for i, a := range e.Accepted {
		if i > 0 {
			s += ", "
		}
		s += a
	}
	return s
}
