package units

import (
	"bytes"
	"encoding/json"
	"fmt"
	"math"
	"strconv"
)

// System is a display unit system: the unit each dimension is shown in, and
// the unit a bare number is counted in by ParseIn.
type System int

// The display systems.
const (
	// SI shows m, m², m³, kPa, kN, kN/m, kN/m³ and deg.
	SI System = iota
	// US shows ft, ft², ft³, ksf, kip, kip/ft, pcf and deg.
	US
)

var systemUnits = [2][]string{
	SI: {DimLength: "m", DimArea: "m2", DimVolume: "m3", DimStress: "kPa", DimForce: "kN",
		DimForcePerLength: "kN/m", DimUnitWeight: "kN/m3", DimAngle: "deg"},
	US: {DimLength: "ft", DimArea: "ft2", DimVolume: "ft3", DimStress: "ksf", DimForce: "kip",
		DimForcePerLength: "kip/ft", DimUnitWeight: "pcf", DimAngle: "deg"},
}

// String returns "SI" or "US".
func (s System) String() string {
	switch s {
	case SI:
		return "SI"
	case US:
		return "US"
	}
	return "System(" + strconv.Itoa(int(s)) + ")"
}

// ParseSystem reads "SI" or "US" (any case).
func ParseSystem(s string) (System, error) {
	switch s {
	case "SI", "si", "Si":
		return SI, nil
	case "US", "us", "Us":
		return US, nil
	}
	return 0, fmt.Errorf("units: unit system %q: want SI or US", s)
}

// Unit returns the display unit of dimension d in system s, or "" if
// either is unknown.
func (s System) Unit(d Dimension) string {
	if s < SI || s > US || d <= 0 || int(d) >= len(systemUnits[s]) {
		return ""
	}
	return systemUnits[s][d]
}

// In returns v, a value of dimension d in SI base units, counted in the
// display unit of system s, with that unit's symbol.
func (s System) In(v float64, d Dimension) (float64, string) {
	sym := s.Unit(d)
	u, ok := lookup(sym)
	if !ok {
		return v, ""
	}
	return v / u.factor, sym
}

// format writes v (SI base units) in the SI display unit of d.
func format(v float64, d Dimension) string {
	x, sym := SI.In(v, d)
	return formatNumber(x) + " " + sym
}

// formatNumber writes x rounded to 13 significant digits (so that
// 52.5 ft reads "16.002 m", not "16.002000000000002 m"), in fixed notation
// for ordinary magnitudes. Rounding to 13 digits keeps the relative error
// of a round trip through Parse below 5e-13.
func formatNumber(x float64) string {
	r, err := strconv.ParseFloat(strconv.FormatFloat(x, 'g', 13, 64), 64)
	if err == nil {
		x = r
	}
	a := math.Abs(x)
	if a == 0 || (a >= 1e-4 && a < 1e15) {
		return strconv.FormatFloat(x, 'f', -1, 64)
	}
	return strconv.FormatFloat(x, 'g', -1, 64)
}

// String returns l in metres, such as "0.45 m".
func (l Length) String() string { return format(float64(l), DimLength) }

// String returns a in square metres, such as "0.2827 m2".
func (a Area) String() string { return format(float64(a), DimArea) }

// String returns v in cubic metres.
func (v Volume) String() string { return format(float64(v), DimVolume) }

// String returns s in kilopascals, such as "120 kPa".
func (s Stress) String() string { return format(float64(s), DimStress) }

// String returns f in kilonewtons, such as "2200 kN".
func (f Force) String() string { return format(float64(f), DimForce) }

// String returns f in kilonewtons per metre.
func (f ForcePerLength) String() string { return format(float64(f), DimForcePerLength) }

// String returns g in kilonewtons per cubic metre, such as "18 kN/m3".
func (g UnitWeight) String() string { return format(float64(g), DimUnitWeight) }

// String returns a in degrees, such as "30 deg".
func (a Angle) String() string { return format(float64(a), DimAngle) }

// Text encoding. Each quantity marshals to its String form and unmarshals
// from a string with a unit. A bare number (a JSON number, or text with no
// unit) is counted in the SI display unit of its dimension (m, kPa, kN, …);
// a caller with a declared unit system reads bare numbers with ParseIn.

func unmarshalText(dst *float64, b []byte, d Dimension, fn string) error {
	u, _ := lookup(SI.Unit(d))
	v, err := parseDim(fn, string(b), d, &u)
	if err != nil {
		return err
	}
	*dst = v
	return nil
}

func unmarshalJSON(dst *float64, b []byte, d Dimension, fn string) error {
	b = bytes.TrimSpace(b)
	if string(b) == "null" {
		return nil
	}
	if len(b) > 0 && b[0] == '"' {
		var s string
		if err := json.Unmarshal(b, &s); err != nil {
			return err
		}
		b = []byte(s)
	}
	return unmarshalText(dst, b, d, fn)
}

// MarshalText implements encoding.TextMarshaler.
func (l Length) MarshalText() ([]byte, error) { return []byte(l.String()), nil }

// UnmarshalText implements encoding.TextUnmarshaler; a bare number is in metres.
func (l *Length) UnmarshalText(b []byte) error {
	return unmarshalText((*float64)(l), b, DimLength, "Length.UnmarshalText")
}

// UnmarshalJSON accepts a string with a unit or a number in metres.
func (l *Length) UnmarshalJSON(b []byte) error {
	return unmarshalJSON((*float64)(l), b, DimLength, "Length.UnmarshalJSON")
}

// MarshalText implements encoding.TextMarshaler.
func (a Area) MarshalText() ([]byte, error) { return []byte(a.String()), nil }

// UnmarshalText implements encoding.TextUnmarshaler; a bare number is in m².
func (a *Area) UnmarshalText(b []byte) error {
	return unmarshalText((*float64)(a), b, DimArea, "Area.UnmarshalText")
}

// UnmarshalJSON accepts a string with a unit or a number in m².
func (a *Area) UnmarshalJSON(b []byte) error {
	return unmarshalJSON((*float64)(a), b, DimArea, "Area.UnmarshalJSON")
}

// MarshalText implements encoding.TextMarshaler.
func (v Volume) MarshalText() ([]byte, error) { return []byte(v.String()), nil }

// UnmarshalText implements encoding.TextUnmarshaler; a bare number is in m³.
func (v *Volume) UnmarshalText(b []byte) error {
	return unmarshalText((*float64)(v), b, DimVolume, "Volume.UnmarshalText")
}

// UnmarshalJSON accepts a string with a unit or a number in m³.
func (v *Volume) UnmarshalJSON(b []byte) error {
	return unmarshalJSON((*float64)(v), b, DimVolume, "Volume.UnmarshalJSON")
}

// MarshalText implements encoding.TextMarshaler.
func (s Stress) MarshalText() ([]byte, error) { return []byte(s.String()), nil }

// UnmarshalText implements encoding.TextUnmarshaler; a bare number is in kPa.
func (s *Stress) UnmarshalText(b []byte) error {
	return unmarshalText((*float64)(s), b, DimStress, "Stress.UnmarshalText")
}

// UnmarshalJSON accepts a string with a unit or a number in kPa.
func (s *Stress) UnmarshalJSON(b []byte) error {
	return unmarshalJSON((*float64)(s), b, DimStress, "Stress.UnmarshalJSON")
}

// MarshalText implements encoding.TextMarshaler.
func (f Force) MarshalText() ([]byte, error) { return []byte(f.String()), nil }

// UnmarshalText implements encoding.TextUnmarshaler; a bare number is in kN.
func (f *Force) UnmarshalText(b []byte) error {
	return unmarshalText((*float64)(f), b, DimForce, "Force.UnmarshalText")
}

// UnmarshalJSON accepts a string with a unit or a number in kN.
func (f *Force) UnmarshalJSON(b []byte) error {
	return unmarshalJSON((*float64)(f), b, DimForce, "Force.UnmarshalJSON")
}

// MarshalText implements encoding.TextMarshaler.
func (f ForcePerLength) MarshalText() ([]byte, error) { return []byte(f.String()), nil }

// UnmarshalText implements encoding.TextUnmarshaler; a bare number is in kN/m.
func (f *ForcePerLength) UnmarshalText(b []byte) error {
	return unmarshalText((*float64)(f), b, DimForcePerLength, "ForcePerLength.UnmarshalText")
}

// UnmarshalJSON accepts a string with a unit or a number in kN/m.
func (f *ForcePerLength) UnmarshalJSON(b []byte) error {
	return unmarshalJSON((*float64)(f), b, DimForcePerLength, "ForcePerLength.UnmarshalJSON")
}

// MarshalText implements encoding.TextMarshaler.
func (g UnitWeight) MarshalText() ([]byte, error) { return []byte(g.String()), nil }

// UnmarshalText implements encoding.TextUnmarshaler; a bare number is in kN/m³.
func (g *UnitWeight) UnmarshalText(b []byte) error {
	return unmarshalText((*float64)(g), b, DimUnitWeight, "UnitWeight.UnmarshalText")
}

// UnmarshalJSON accepts a string with a unit or a number in kN/m³.
func (g *UnitWeight) UnmarshalJSON(b []byte) error {
	return unmarshalJSON((*float64)(g), b, DimUnitWeight, "UnitWeight.UnmarshalJSON")
}

// MarshalText implements encoding.TextMarshaler.
func (a Angle) MarshalText() ([]byte, error) { return []byte(a.String()), nil }

// UnmarshalText implements encoding.TextUnmarshaler; a bare number is in degrees.
func (a *Angle) UnmarshalText(b []byte) error {
	return unmarshalText((*float64)(a), b, DimAngle, "Angle.UnmarshalText")
}

// UnmarshalJSON accepts a string with a unit or a number in degrees.
func (a *Angle) UnmarshalJSON(b []byte) error {
	return unmarshalJSON((*float64)(a), b, DimAngle, "Angle.UnmarshalJSON")
}

// FormatApart writes x with the fewest significant digits, at least 6, at
// which it does not read the same as bound written with 6, so that a value
// a hair past a range limit shows the digits that put it there:
//
//	FormatApart(20000.000000004, 20000) = "20000.000000004"
//	FormatApart(62, 50)                 = "62"
//
// A value equal to bound, NaN or an infinity is written with 6 digits.
func FormatApart(x, bound float64) string {
	b, _ := strconv.ParseFloat(strconv.FormatFloat(bound, 'g', 6, 64), 64)
	if x == bound || math.IsNaN(x) || math.IsInf(x, 0) {
		return strconv.FormatFloat(x, 'g', 6, 64)
	}
	for prec := 6; prec < 17; prec++ {
		r, _ := strconv.ParseFloat(strconv.FormatFloat(x, 'g', prec, 64), 64)
		if r != b {
			return shortest(r)
		}
	}
	return shortest(x)
}

// shortest writes x with the fewest digits that read back to x, in fixed
// notation for ordinary magnitudes.
func shortest(x float64) string {
	if a := math.Abs(x); a >= 1e-4 && a < 1e15 {
		return strconv.FormatFloat(x, 'f', -1, 64)
	}
	return strconv.FormatFloat(x, 'g', -1, 64)
}

// FormatNear is FormatApart against whichever of lo and hi is nearer x.
func FormatNear(x, lo, hi float64) string {
	if math.Abs(x-lo) <= math.Abs(x-hi) {
		return FormatApart(x, lo)
	}
	return FormatApart(x, hi)
}
