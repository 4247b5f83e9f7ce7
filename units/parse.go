package units

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"
	"unicode/utf8"
)

// Dimension names the physical dimension of a quantity.
type Dimension int

// The dimensions this package knows.
const (
	DimLength Dimension = iota + 1
	DimArea
	DimVolume
	DimStress
	DimForce
	DimForcePerLength
	DimUnitWeight
	DimAngle
)

var dimNames = [...]string{
	DimLength:         "length",
	DimArea:           "area",
	DimVolume:         "volume",
	DimStress:         "stress",
	DimForce:          "force",
	DimForcePerLength: "force per length",
	DimUnitWeight:     "unit weight",
	DimAngle:          "angle",
}

// String returns the dimension's name, such as "unit weight".
func (d Dimension) String() string {
	if d > 0 && int(d) < len(dimNames) {
		return dimNames[d]
	}
	return "Dimension(" + strconv.Itoa(int(d)) + ")"
}

// unit is one accepted spelling of a unit.
type unit struct {
	sym    string
	dim    Dimension
	factor float64 // SI base units per one of this unit
}

// units lists every accepted spelling. The first spelling of each
// dimension and system is the one used in messages. Spellings are matched
// exactly (case matters: MPa is not mPa), after ², ³ and ^2, ^3 are
// folded to 2 and 3.
var unitTable = []unit{
	{"m", DimLength, 1},
	{"mm", DimLength, float64(Millimetre)},
	{"cm", DimLength, float64(Centimetre)},
	{"km", DimLength, float64(Kilometre)},
	{"ft", DimLength, float64(Foot)},
	{"in", DimLength, float64(Inch)},

	{"m2", DimArea, 1},
	{"mm2", DimArea, float64(SquareMillimetre)},
	{"cm2", DimArea, float64(SquareCentimetre)},
	{"ft2", DimArea, float64(SquareFoot)},
	{"in2", DimArea, float64(SquareInch)},

	{"m3", DimVolume, 1},
	{"ft3", DimVolume, float64(CubicFoot)},
	{"in3", DimVolume, float64(CubicInch)},

	{"Pa", DimStress, 1},
	{"kPa", DimStress, float64(Kilopascal)},
	{"MPa", DimStress, float64(Megapascal)},
	{"GPa", DimStress, float64(Gigapascal)},
	{"kN/m2", DimStress, float64(Kilopascal)},
	{"N/m2", DimStress, 1},
	{"MN/m2", DimStress, float64(Megapascal)},
	{"psf", DimStress, float64(PSF)},
	{"ksf", DimStress, float64(KSF)},
	{"tsf", DimStress, float64(TSF)},
	{"psi", DimStress, float64(PSI)},
	{"ksi", DimStress, float64(KSI)},
	{"lbf/ft2", DimStress, float64(PSF)},
	{"kip/ft2", DimStress, float64(KSF)},
	{"lbf/in2", DimStress, float64(PSI)},
	{"kip/in2", DimStress, float64(KSI)},

	{"N", DimForce, 1},
	{"kN", DimForce, float64(Kilonewton)},
	{"MN", DimForce, float64(Meganewton)},
	{"lbf", DimForce, float64(PoundForce)},
	{"kip", DimForce, float64(Kip)},
	{"kips", DimForce, float64(Kip)},

	{"N/m", DimForcePerLength, 1},
	{"kN/m", DimForcePerLength, float64(KilonewtonPerMetre)},
	{"lbf/ft", DimForcePerLength, float64(PoundForcePerFoot)},
	{"kip/ft", DimForcePerLength, float64(KipPerFoot)},
	{"plf", DimForcePerLength, float64(PoundForcePerFoot)},
	{"klf", DimForcePerLength, float64(KipPerFoot)},

	{"N/m3", DimUnitWeight, 1},
	{"kN/m3", DimUnitWeight, float64(KilonewtonPerCubicMetre)},
	{"pcf", DimUnitWeight, float64(PCF)},
	{"kcf", DimUnitWeight, float64(KCF)},
	{"lbf/ft3", DimUnitWeight, float64(PCF)},
	{"kip/ft3", DimUnitWeight, float64(KCF)},

	{"deg", DimAngle, float64(Degree)},
	{"°", DimAngle, float64(Degree)},
	{"rad", DimAngle, 1},
}

// ambiguous lists spellings refused because they name more than one unit,
// or a mass where a force is meant, with the advice given instead.
var ambiguous = map[string]string{
	"ton":    "a short, long or metric ton; use tsf for a stress, or kip, lbf, kN for a force",
	"tons":   "a short, long or metric ton; use tsf for a stress, or kip, lbf, kN for a force",
	"tonne":  "a mass; use kN or MN for a force",
	"t":      "a mass or a ton; use kN or MN for a force, tsf for a stress",
	"lb":     "a mass or a force; use lbf for a force, pcf for a unit weight, psf for a stress",
	"lbs":    "a mass or a force; use lbf for a force, pcf for a unit weight, psf for a stress",
	"kg":     "a mass; use N or kN for a force",
	"k":      "a bare prefix; use kip or kN",
	"tf":     "a ton-force of unstated kind; use kN or kip",
	"ksc":    "a non-SI unit; use kPa or MPa",
	"bar":    "a non-SI unit; use kPa (1 bar = 100 kPa)",
	"atm":    "a non-SI unit; use kPa",
	"kg/m3":  "a density; use kN/m3 for a unit weight",
	"lb/ft3": "a mass or a force; use pcf (lbf/ft3)",
}

// Errors wrapped by ParseError.
var (
	ErrEmpty     = errors.New("empty")
	ErrSyntax    = errors.New("invalid syntax")
	ErrUnit      = errors.New("unknown unit")
	ErrAmbiguous = errors.New("ambiguous unit")
	ErrDimension = errors.New("wrong dimension")
	ErrRange     = errors.New("not a finite number")
	ErrNoUnit    = errors.New("missing unit")
)

// ParseError records a failed parse, in the manner of strconv.NumError.
type ParseError struct {
	Func  string // the function that failed, such as "ParseLength"
	Input string // the input as given
	Err   error  // the reason, wrapping one of the Err values above
}

func (e *ParseError) Error() string {
	return "units." + e.Func + ": parsing " + strconv.Quote(e.Input) + ": " + e.Err.Error()
}

// Unwrap returns the reason, so that errors.Is finds ErrUnit and the rest.
func (e *ParseError) Unwrap() error { return e.Err }

// Quantity is a parsed value with its dimension, in SI base units.
type Quantity struct {
	Value float64   // in SI base units (m, m², m³, Pa, N, N/m, N/m³, rad)
	Dim   Dimension // the dimension of the unit written
}

// normaliseUnit folds the superscript and caret forms of powers and
// removes spaces, so "kN/m³", "kN/m^3" and "kN / m3" all read "kN/m3".
func normaliseUnit(u string) string {
	if isASCIINoSpace(u) && !strings.Contains(u, "^") {
		return u
	}
	r := strings.NewReplacer("²", "2", "³", "3", "^2", "2", "^3", "3", " ", "", "\t", "")
	return r.Replace(u)
}

func isASCIINoSpace(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] >= utf8.RuneSelf || s[i] == ' ' || s[i] == '\t' {
			return false
		}
	}
	return true
}

func lookup(sym string) (unit, bool) {
	for _, u := range unitTable {
		if u.sym == sym {
			return u, true
		}
	}
	return unit{}, false
}

// splitNumber splits s into its leading decimal number and the rest.
// The number is an optional sign, digits with an optional point, and an
// optional exponent. It returns ok false when s has no leading number.
func splitNumber(s string) (num, rest string, ok bool) {
	i := 0
	if i < len(s) && (s[i] == '+' || s[i] == '-') {
		i++
	}
	digits := 0
	for i < len(s) && s[i] >= '0' && s[i] <= '9' {
		i++
		digits++
	}
	if i < len(s) && s[i] == '.' {
		i++
		for i < len(s) && s[i] >= '0' && s[i] <= '9' {
			i++
			digits++
		}
	}
	if digits == 0 {
		return "", s, false
	}
	// An exponent only when e/E is followed by an optional sign and a digit.
	if i < len(s) && (s[i] == 'e' || s[i] == 'E') {
		j := i + 1
		if j < len(s) && (s[j] == '+' || s[j] == '-') {
			j++
		}
		if j < len(s) && s[j] >= '0' && s[j] <= '9' {
			for j < len(s) && s[j] >= '0' && s[j] <= '9' {
				j++
			}
			i = j
		}
	}
	return s[:i], s[i:], true
}

// parse reads a number and its unit. When the unit is missing and def is
// not nil, the number is counted in def.
func parse(fn, s string, def *unit) (Quantity, error) {
	fail := func(err error) (Quantity, error) {
		return Quantity{}, &ParseError{Func: fn, Input: s, Err: err}
	}
	t := strings.TrimSpace(s)
	if t == "" {
		return fail(ErrEmpty)
	}
	num, rest, ok := splitNumber(t)
	if !ok {
		low := strings.ToLower(strings.TrimLeft(t, "+-"))
		if strings.HasPrefix(low, "nan") || strings.HasPrefix(low, "inf") {
			return fail(ErrRange)
		}
		return fail(fmt.Errorf("%w: want a number followed by a unit, such as \"12.5 kPa\"", ErrSyntax))
	}
	v, err := strconv.ParseFloat(num, 64)
	if err != nil {
		if errors.Is(err, strconv.ErrRange) {
			return fail(fmt.Errorf("%w: %s overflows", ErrRange, num))
		}
		return fail(ErrSyntax)
	}
	sym := normaliseUnit(strings.TrimSpace(rest))
	var u unit
	switch {
	case sym == "" && def != nil:
		u = *def
	case sym == "":
		return fail(fmt.Errorf("%w: write a unit after the number, for example \"1.5 m\" or \"120 kPa\"", ErrNoUnit))
	default:
		if why, bad := ambiguous[sym]; bad {
			return fail(fmt.Errorf("%w %q: %s", ErrAmbiguous, sym, why))
		}
		var found bool
		u, found = lookup(sym)
		if !found {
			return fail(fmt.Errorf("%w %q; accepted: %s", ErrUnit, sym, allUnits()))
		}
	}
	q := v * u.factor
	if math.IsInf(q, 0) || math.IsNaN(q) {
		return fail(fmt.Errorf("%w: %s %s overflows", ErrRange, num, u.sym))
	}
	return Quantity{Value: q, Dim: u.dim}, nil
}

// Accepted returns the accepted unit spellings for dimension d, separated
// by commas, for use in messages.
func Accepted(d Dimension) string {
	var b strings.Builder
	for _, u := range unitTable {
		if u.dim != d {
			continue
		}
		if b.Len() > 0 {
			b.WriteString(", ")
		}
		b.WriteString(u.sym)
	}
	return b.String()
}

func allUnits() string {
	var b strings.Builder
	for d := DimLength; d <= DimAngle; d++ {
		if b.Len() > 0 {
			b.WriteString("; ")
		}
		b.WriteString(d.String())
		b.WriteString(" ")
		b.WriteString(Accepted(d))
	}
	return b.String()
}

// Parse reads a number followed by a unit, such as "450 mm", "2.5 ksf",
// "18 kN/m³" or "30°", and returns its value in SI base units with its
// dimension. Space between number and unit is optional. Units are matched
// case-sensitively; powers may be written 3, ³ or ^3.
//
// Errors are *ParseError wrapping ErrEmpty, ErrSyntax, ErrNoUnit, ErrUnit,
// ErrAmbiguous or ErrRange (NaN, Inf, or a value that overflows float64).
func Parse(s string) (Quantity, error) { return parse("Parse", s, nil) }

// parseDim parses s and checks its dimension.
func parseDim(fn, s string, d Dimension, def *unit) (float64, error) {
	q, err := parse(fn, s, def)
	if err != nil {
		return 0, err
	}
	if q.Dim != d {
		return 0, &ParseError{Func: fn, Input: s, Err: fmt.Errorf("%w: %s is %s, want %s (%s)",
			ErrDimension, strings.TrimSpace(s), Article(q.Dim), Article(d), Accepted(d))}
	}
	return q.Value, nil
}

// ParseLength parses a length such as "16 m", "450 mm" or "52.5 ft".
func ParseLength(s string) (Length, error) {
	v, err := parseDim("ParseLength", s, DimLength, nil)
	return Length(v), err
}

// ParseArea parses an area such as "0.28 m2" or "3 ft²".
func ParseArea(s string) (Area, error) {
	v, err := parseDim("ParseArea", s, DimArea, nil)
	return Area(v), err
}

// ParseVolume parses a volume such as "1.2 m3".
func ParseVolume(s string) (Volume, error) {
	v, err := parseDim("ParseVolume", s, DimVolume, nil)
	return Volume(v), err
}

// ParseStress parses a stress such as "120 kPa", "2.5 ksf" or "30 GPa".
func ParseStress(s string) (Stress, error) {
	v, err := parseDim("ParseStress", s, DimStress, nil)
	return Stress(v), err
}

// ParseForce parses a force such as "2200 kN" or "450 kip".
func ParseForce(s string) (Force, error) {
	v, err := parseDim("ParseForce", s, DimForce, nil)
	return Force(v), err
}

// ParseForcePerLength parses a force per length such as "35 kN/m".
func ParseForcePerLength(s string) (ForcePerLength, error) {
	v, err := parseDim("ParseForcePerLength", s, DimForcePerLength, nil)
	return ForcePerLength(v), err
}

// ParseUnitWeight parses a unit weight such as "18 kN/m3" or "120 pcf".
func ParseUnitWeight(s string) (UnitWeight, error) {
	v, err := parseDim("ParseUnitWeight", s, DimUnitWeight, nil)
	return UnitWeight(v), err
}

// ParseAngle parses an angle such as "30 deg", "30°" or "0.52 rad".
func ParseAngle(s string) (Angle, error) {
	v, err := parseDim("ParseAngle", s, DimAngle, nil)
	return Angle(v), err
}

// ParseIn parses a quantity of dimension d. A bare number is counted in
// the display unit of system sys for d (see System.Unit); a number with a
// unit is read as Parse reads it, whatever sys is. The result is in SI base
// units.
func ParseIn(s string, d Dimension, sys System) (float64, error) {
	sym := sys.Unit(d)
	if sym == "" {
		return 0, &ParseError{Func: "ParseIn", Input: s, Err: fmt.Errorf("%w: %s has no unit in system %v", ErrDimension, d, sys)}
	}
	u, _ := lookup(sym)
	return parseDim("ParseIn", s, d, &u)
}

// Article returns the dimension's name with "a" or "an" before it, for
// messages: "an angle", "a length".
func Article(d Dimension) string {
	n := d.String()
	if n != "" && strings.ContainsRune("aeiou", rune(n[0])) {
		return "an " + n
	}
	return "a " + n
}

// Symbols returns every spelling of the units of dimension d that Parse
// accepts, in the order of Accepted (powers written as 2 and 3; Parse also
// reads ², ³, ^2 and ^3, and spaces around a slash).
func Symbols(d Dimension) []string {
	var out []string
	for _, u := range unitTable {
		if u.dim == d {
			out = append(out, u.sym)
		}
	}
	return out
}
